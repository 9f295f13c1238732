#!/usr/bin/env node
/**
 * The `starlume` executable: runs {@link main} with the process's streams
 * and sets the exit code. Run from the source tree with
 * `npx tsx src/cli/bin.ts <command> …`.
 *
 * The same file is the entry of the worker threads of `--jobs N`
 * (jobs.ts): started with a table worker's `workerData`, it serves rows
 * instead of running the command line.
 *
 * @module
 */
import { isMainThread, workerData } from "node:worker_threads";
import { isTableWorkerData } from "./jobs";
import { EXIT } from "./context";
import { main } from "./main";
import { removeTemporaryOutputs } from "./table-out";
import { serveTableWorker } from "./worker-serve";

if (!isMainThread && isTableWorkerData(workerData)) {
  await serveTableWorker();
} else {
  // A closed pipe (`starlume … | head`, also `2>&1 | head`) ends the run quietly with code 0;
  // any other failure to write standard output (e.g. a full disk) with code 4 and one line.
  process.stdout.on("error", (e: NodeJS.ErrnoException) => {
    if (e.code !== "EPIPE") {
      try {
        process.stderr.write(`starlume: error: cannot write the output (${e.code ?? e.message})\n`);
      } catch {
        /* stderr is gone too */
      }
    }
    removeTemporaryOutputs();
    process.exit(e.code === "EPIPE" ? EXIT.OK : EXIT.OUTPUT_FAILED);
  });
  process.stderr.on("error", () => {
    /* messages cannot be shown any more; the results still go to stdout */
  });
  // Ctrl-C or a termination signal: no half-written --output file is left behind.
  for (const [signal, code] of [["SIGINT", 130], ["SIGTERM", 143]] as const) {
    process.on(signal, () => {
      removeTemporaryOutputs();
      process.exit(code);
    });
  }

  const code = await main(process.argv.slice(2), {
    stdout: process.stdout,
    stderr: process.stderr,
    stdin: process.stdin,
    cwd: process.cwd(),
  });
  process.exitCode = code;
}
