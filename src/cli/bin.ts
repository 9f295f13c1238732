#!/usr/bin/env node
/**
 * The `starlume` executable: runs {@link main} with the process's streams
 * and sets the exit code. Run from the source tree with
 * `npx tsx src/cli/bin.ts <command> …`.
 *
 * @module
 */
import { main } from "./main";

// A closed pipe (`starlume … | head`) ends the run quietly, as other tools do.
process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  throw e;
});

const code = await main(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  stdin: process.stdin,
  cwd: process.cwd(),
});
process.exitCode = code;
