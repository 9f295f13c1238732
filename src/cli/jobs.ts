/**
 * Rows on worker threads (`--jobs N`): the main thread reads the table and
 * writes the results; each worker builds the command's row handling once
 * (the same `bind` as the main thread, so fitters and solvers are built once
 * per worker and reused) and processes whole chunks of rows sent to it. The
 * main thread keeps the chunks in input order, so the output is identical,
 * row for row, to a run with `--jobs 1`; at most {@link IN_FLIGHT_PER_JOB}
 * chunks per worker are in flight, so memory stays flat in the number of rows.
 *
 * A worker runs the tool's own entry file (src/cli/bin.ts, or the bundled
 * dist/cli.js) with {@link TableWorkerData} as its `workerData`; the entry
 * sees it and calls {@link serveTableWorker} (worker-serve.ts) instead of the
 * command line.
 *
 * @module
 */
import { availableParallelism, cpus } from "node:os";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { Worker } from "node:worker_threads";
import type { ColumnSpec } from "./io/header";
import type { InCell } from "./table-in";
import type { CellValue } from "./io/write";

/** Result of processing one row. */
export interface RowResult {
  readonly cells: readonly CellValue[];
  /** Why the row was rejected (it is still written), or undefined. */
  readonly rejected?: string;
}

/** A readable input row and its 1-based line number. */
export interface ReadableRow {
  readonly cells: readonly InCell[];
  readonly line: number;
}

/** Chunks sent ahead to each worker before the main thread waits for the oldest. */
export const IN_FLIGHT_PER_JOB = 2;

/** Upper limit of `--jobs`. */
export const MAX_JOBS = 256;

/** What a table worker is started with. */
export interface TableWorkerData {
  readonly starlumeTableWorker: 1;
  /** Command name (`solve`, `fit`). */
  readonly command: string;
  /** The command's arguments as given (the worker parses them as the main thread did). */
  readonly argv: readonly string[];
  /** The input's columns, as read from its header by the main thread. */
  readonly columns: readonly ColumnSpec[];
  /** Name of the input, for messages. */
  readonly source: string;
  /** Working directory of the run. */
  readonly cwd: string;
}

/** Messages main → worker. */
export type ToWorker = { readonly id: number; readonly rows: readonly ReadableRow[] };
/** Messages worker → main. */
export type FromWorker = { readonly id: number; readonly results: readonly RowResult[] } | { readonly id: number; readonly error: string };

/** Whether `data` (a worker's `workerData`) asks for a table worker. */
export function isTableWorkerData(data: unknown): data is TableWorkerData {
  return typeof data === "object" && data !== null && (data as { starlumeTableWorker?: unknown }).starlumeTableWorker === 1;
}

/** The number of cores available to this process (the default of `--jobs`). */
export function defaultJobs(): number {
  const n = typeof availableParallelism === "function" ? availableParallelism() : cpus().length;
  return Math.max(1, Math.min(MAX_JOBS, n));
}

/**
 * What a worker runs: the tool's own entry file (cli.js when bundled); from
 * the TypeScript sources, bin.ts loaded through tsx's loader (a development
 * dependency, registered in the worker first).
 */
function workerEntry(): { script: URL | string; eval: boolean } {
  const here = import.meta.url;
  if (!here.endsWith(".ts")) return { script: new URL(here), eval: false };
  const api = pathToFileURL(join(dirname(createRequire(here).resolve("tsx/package.json")), "dist", "esm", "api", "index.mjs")).href;
  const bin = new URL("./bin.ts", here).href;
  return { script: `import(${JSON.stringify(api)}).then((t) => { t.register(); return import(${JSON.stringify(bin)}); });`, eval: true };
}

interface Slot {
  readonly worker: Worker;
  inFlight: number;
}

/**
 * A pool of table workers processing chunks of rows in parallel.
 * {@link WorkerPool.submit} returns the chunk's results as a promise; the
 * caller awaits them in submission order.
 */
export class WorkerPool {
  private readonly slots: Slot[] = [];
  private readonly waiting = new Map<number, { resolve: (r: readonly RowResult[]) => void; reject: (e: Error) => void; slot: Slot }>();
  private nextId = 0;
  private failure: Error | undefined;
  private closing = false;

  constructor(jobs: number, data: TableWorkerData) {
    const entry = workerEntry();
    for (let i = 0; i < jobs; i++) {
      const worker = new Worker(entry.script, { workerData: data, eval: entry.eval, stdout: false, stderr: false });
      const slot: Slot = { worker, inFlight: 0 };
      worker.on("message", (m: FromWorker) => {
        const w = this.waiting.get(m.id);
        if (w === undefined) return;
        this.waiting.delete(m.id);
        w.slot.inFlight--;
        if ("error" in m) w.reject(new Error(`worker: ${m.error}`));
        else w.resolve(m.results);
      });
      worker.on("error", (e) => this.fail(e instanceof Error ? e : new Error(String(e))));
      worker.on("exit", (code) => {
        if (code !== 0 && !this.closing) this.fail(new Error(`a worker thread exited with code ${code}`));
      });
      this.slots.push(slot);
    }
  }

  private fail(e: Error): void {
    this.failure ??= e;
    for (const [id, w] of this.waiting) {
      this.waiting.delete(id);
      w.reject(e);
    }
  }

  /** Number of workers. */
  get size(): number {
    return this.slots.length;
  }

  /** Send a chunk to the least busy worker. */
  submit(rows: readonly ReadableRow[]): Promise<readonly RowResult[]> {
    if (this.failure !== undefined) return Promise.reject(this.failure);
    let slot = this.slots[0] as Slot;
    for (const s of this.slots) if (s.inFlight < slot.inFlight) slot = s;
    const id = this.nextId++;
    slot.inFlight++;
    return new Promise((resolve, reject) => {
      this.waiting.set(id, { resolve, reject, slot });
      slot.worker.postMessage({ id, rows } satisfies ToWorker);
    });
  }

  /** Stop the workers (after the last result, or on an error). */
  async close(): Promise<void> {
    this.closing = true;
    await Promise.all(this.slots.map((s) => s.worker.terminate()));
  }
}
