/**
 * The worker side of `--jobs N` (see jobs.ts): parse the command's
 * arguments as the main thread did, bind the command to the input's
 * columns once, then answer each chunk of rows with its results, in order.
 * Messages the command would print while binding (notes about columns)
 * were already printed by the main thread and are dropped here.
 *
 * @module
 */
import { parentPort, workerData } from "node:worker_threads";
import { parseArgs } from "./args";
import type { CliIO, OutStream } from "./context";
import { isTableWorkerData, type FromWorker, type ToWorker } from "./jobs";
import { COMMANDS } from "./main";
import type { TableBinding } from "./run-table";
import { setTableWorker } from "./worker-state";

const silent: OutStream = {
  write: () => true,
  once() {
    return this;
  },
  removeListener() {
    return this;
  },
};

/** Serve chunks of rows to the main thread until it terminates this worker. */
export async function serveTableWorker(): Promise<void> {
  const port = parentPort;
  const data: unknown = workerData;
  if (port === null || !isTableWorkerData(data)) throw new Error("serveTableWorker: not started as a table worker");
  const cmd = COMMANDS.find((c) => c.name === data.command);
  if (cmd === undefined) throw new Error(`serveTableWorker: unknown command '${data.command}'`);
  const io: CliIO = { stdout: silent, stderr: silent, cwd: data.cwd };
  setTableWorker({
    columns: data.columns,
    source: data.source,
    serve(b) {
      const binding = b as TableBinding;
      {
        port.on("message", (m: ToWorker) => {
          let reply: FromWorker;
          try {
            const results = binding.rows !== undefined ? binding.rows(m.rows) : m.rows.map((r) => binding.row(r.cells, r.line));
            reply = { id: m.id, results };
          } catch (e) {
            reply = { id: m.id, error: e instanceof Error ? (e.stack ?? e.message) : String(e) };
          }
          port.postMessage(reply);
        });
      }
    },
  });
  await cmd.run(parseArgs(data.argv, cmd.options, cmd.name), io);
}
