/**
 * Whether this thread is a worker of `--jobs N` (jobs.ts): set by
 * worker-serve.ts before it runs the command, read by the table loop
 * (run-table.ts), which then binds to the main thread's columns and hands
 * its row handling to `serve` instead of reading a table.
 *
 * @module
 */
import type { ColumnSpec } from "./io/header";

/** What a table command does inside a worker thread. */
export interface TableWorkerContext {
  readonly columns: readonly ColumnSpec[];
  readonly source: string;
  /** Receives the command's `TableBinding` (run-table.ts). */
  serve(binding: unknown): void;
}

let current: TableWorkerContext | undefined;

/** Mark this thread as a table worker (worker-serve.ts). */
export function setTableWorker(context: TableWorkerContext): void {
  current = context;
}

/** The table-worker context of this thread, or undefined on the main thread. */
export function tableWorker(): TableWorkerContext | undefined {
  return current;
}
