/**
 * The shared loop of the table commands (`solve`, `fit`): open the input,
 * bind its columns, stream every row through the command's row function,
 * write each result row as it is produced (every input row appears in the
 * output, a rejected one with its reason), report rejected rows on stderr
 * with their line numbers, draw a progress line on a terminal, and return
 * the exit code.
 *
 * @module
 */
import { optInteger, optString, type ParsedArgs, type OptionSpec } from "./args";
import { EXIT, UsageError, say, type CliIO } from "./context";
import type { ColumnSpec } from "./io/header";
import { Progress } from "./io/progress";
import { defaultJobs, IN_FLIGHT_PER_JOB, MAX_JOBS, WorkerPool, type ReadableRow, type RowResult } from "./jobs";
import { tableWorker } from "./worker-state";
import type { CellValue } from "./io/write";
import { defaultFormat, openOutput, openTableWriter, OUTPUT_FORMATS, type OutColumn } from "./table-out";
import { inputFormatFor, openTable, type InCell, type TableItem } from "./table-in";

/** Options shared by the table commands. */
export const TABLE_OPTIONS: readonly OptionSpec[] = [
  { name: "input-format", kind: "value", valueName: "FMT", choices: ["csv", "jsonl", "fits"], help: "input format", defaultText: "from the file extension (stdin: from the content)" },
  { name: "format", short: "f", kind: "value", valueName: "FMT", choices: OUTPUT_FORMATS, help: "output format", defaultText: "table on a terminal, else csv" },
  { name: "output", short: "o", kind: "value", valueName: "FILE", help: "write the table to FILE instead of stdout" },
  { name: "id", kind: "value", valueName: "COLUMN", help: "column naming each star", defaultText: "name, star, id, designation or object" },
  { name: "digits", short: "d", kind: "value", valueName: "N", help: "significant digits of numbers without uncertainty in the aligned table", defaultText: "4" },
  { name: "report", kind: "value", valueName: "DIR", help: "write an HTML report with figures to DIR/index.html" },
  { name: "quiet", short: "q", kind: "flag", help: "no summary line and no per-row messages on stderr" },
  { name: "jobs", short: "j", kind: "value", valueName: "N", help: "process rows on N worker threads (output identical to --jobs 1)", defaultText: "the number of cores" },
  { name: "shard", kind: "value", valueName: "K/N", help: "process only input rows K, K+N, K+2N, … (for a job array; merge by the line column)" },
  { name: "line-offset", kind: "value", valueName: "M", help: "add M to every line number (for chunks of a larger file)", defaultText: "0" },
];

export type { ReadableRow, RowResult } from "./jobs";

/** A command's handling of one table, built once its header is known. */
export interface TableBinding {
  readonly columns: readonly OutColumn[];
  /** Process one readable row (must not throw: return a rejected row instead). */
  row(cells: readonly InCell[], line: number): RowResult;
  /**
   * Optional: process a run of readable rows at once, returning one result
   * per row in the same order (the same contract as {@link row}: never
   * throws, every row gets a result). When present, rows are read in chunks
   * of {@link BATCH_ROWS} and each chunk's output is written before the next
   * is read, so memory stays flat.
   */
  rows?(items: readonly ReadableRow[]): RowResult[];
  /** The output row of an input row that could not be read at all. */
  badRow(line: number, message: string): readonly CellValue[];
  /** Called once at the end (e.g. to write a report). */
  finish?(summary: RunSummary): Promise<void>;
}

/** Rows per chunk when a binding processes rows in batches (output is flushed after each chunk). */
export const BATCH_ROWS = 4096;

/** A chunk of input items and how to get its results (on this thread or from a worker). */
interface Pending {
  readonly chunk: readonly TableItem[];
  run(): readonly RowResult[] | Promise<readonly RowResult[]>;
}

/** `--shard K/N`: this run takes input rows K, K+N, K+2N, … (K from 1 to N). */
export function shardOption(args: ParsedArgs): { index: number; count: number } | undefined {
  const v = optString(args, "shard");
  if (v === undefined) return undefined;
  const m = /^\s*([0-9]+)\s*\/\s*([0-9]+)\s*$/.exec(v);
  const index = m !== null ? Number(m[1]) : NaN;
  const count = m !== null ? Number(m[2]) : NaN;
  if (!(Number.isSafeInteger(index) && Number.isSafeInteger(count) && count >= 1 && index >= 1 && index <= count)) {
    throw new UsageError(`option --shard must be K/N with integers 1 <= K <= N (e.g. 3/10); got '${v}'`);
  }
  return { index, count };
}

/** The command-line form of parsed options (for worker threads, which parse them again). */
export function argvOf(args: ParsedArgs): string[] {
  const argv: string[] = [];
  for (const [name, v] of args.options) {
    if (v === true) argv.push(`--${name}`);
    else if (typeof v === "string") argv.push(`--${name}=${v}`);
    else for (const x of v) argv.push(`--${name}=${x}`);
  }
  argv.push("--", ...args.positionals);
  return argv;
}

/** Counts of a run. */
export interface RunSummary {
  /** Input rows (every one is in the output): ok + flagged + rejected. */
  readonly rows: number;
  readonly rejected: number;
  /** Rows with a result and a warning (status "flagged"). */
  readonly flagged?: number;
}

/** How many rejected rows are listed on stderr before the rest are only counted. */
export const MAX_ROW_MESSAGES = 100;

/**
 * Run a table command: one positional input path (`-` for stdin).
 *
 * @param bind - builds the row handling from the input columns (throws UsageError for a bad header binding)
 */
export async function runTableCommand(
  command: string,
  args: ParsedArgs,
  io: CliIO,
  bind: (columns: readonly ColumnSpec[], source: string) => Promise<TableBinding> | TableBinding,
): Promise<number> {
  if (args.positionals.length !== 1) {
    throw new UsageError(`${command} needs exactly one input file (or - for stdin); got ${args.positionals.length === 0 ? "none" : args.positionals.join(" ")}`);
  }
  const path = args.positionals[0] as string;
  const quiet = args.options.get("quiet") === true;
  const format = inputFormatFor(path, optString(args, "input-format"));
  const digitsText = optString(args, "digits");
  const digits = digitsText === undefined ? 4 : Number(digitsText);
  if (!Number.isInteger(digits) || digits < 1 || digits > 17) throw new UsageError(`option --digits must be an integer from 1 to 17; got '${digitsText ?? ""}'`);
  const jobs = optInteger(args, "jobs", defaultJobs(), 1, MAX_JOBS);
  const shard = shardOption(args);
  const lineOffset = optInteger(args, "line-offset", 0, 0);
  const worker = tableWorker();
  if (worker !== undefined) {
    // Inside a worker of --jobs N: bind to the main thread's columns and serve chunks of rows.
    worker.serve(await bind(worker.columns, worker.source));
    return EXIT.OK;
  }
  const table = await openTable(path, format, io);
  const binding = await bind(table.columns, table.source);
  const outPath = optString(args, "output");
  const outFormat = defaultFormat(optString(args, "format"), outPath, io);
  const output = await openOutput(outPath, io);
  const writer = openTableWriter(output.sink, binding.columns, { format: outFormat, digits });
  const progress = new Progress({ stream: io.stderr, label: command });
  let rows = 0;
  let rejected = 0;
  let flagged = 0;
  // A row whose status column says "flagged" (a result, with a warning) is counted apart from ok and rejected.
  const statusIndex = binding.columns.findIndex((c) => c.name === "status" && (c.unit === null || c.unit === undefined));
  const reject = (line: number, why: string): void => {
    rejected++;
    if (!quiet && rejected <= MAX_ROW_MESSAGES) say(io.stderr, `${table.source}: line ${line}: rejected: ${why.replace(/^line \d+: /, "")}`);
  };
  const local = (readable: readonly ReadableRow[]): readonly RowResult[] =>
    readable.length === 0 ? [] : binding.rows !== undefined ? binding.rows(readable) : readable.map((r) => binding.row(r.cells, r.line));
  /** Write one processed chunk, in input order. */
  const flush = async (entry: Pending): Promise<void> => {
    const results = await entry.run();
    let readable = 0;
    for (const item of entry.chunk) if (item.kind === "row") readable++;
    if (results.length !== readable) throw new Error(`internal: ${command} returned ${results.length} results for ${readable} rows`);
    let k = 0;
    for (const item of entry.chunk) {
      rows++;
      let cells: readonly CellValue[];
      if (item.kind === "bad") {
        reject(item.line, item.message);
        cells = binding.badRow(item.line, item.message);
      } else {
        const res = results[k++] as RowResult;
        if (res.rejected !== undefined) reject(item.line, res.rejected);
        else if (statusIndex !== -1 && res.cells[statusIndex] === "flagged") flagged++;
        cells = res.cells;
      }
      const p = writer.writeRow(cells);
      if (p !== undefined) await p;
      progress.update(rows, rejected > 0 ? `${rejected} rejected` : undefined);
    }
  };
  let pool: WorkerPool | undefined;
  try {
    // Rows are read in chunks of BATCH_ROWS. With --jobs 1 each chunk is processed and written
    // before the next is read. With --jobs N chunks go to N worker threads, at most
    // IN_FLIGHT_PER_JOB per worker ahead of the writer (a table of one chunk, and with a report the
    // first chunk, which feeds the report's table and figures, are processed on this thread);
    // results are written in input order.
    const pending: Pending[] = [];
    const window = jobs === 1 ? 0 : jobs * IN_FLIGHT_PER_JOB;
    let index = 0; // input rows seen (for --shard)
    let chunks = 0;
    let done = false;
    while (!done) {
      const chunk: TableItem[] = [];
      while (chunk.length < BATCH_ROWS) {
        const r = await table.items.next();
        if (r.done === true) {
          done = true;
          break;
        }
        const item = r.value;
        if (shard !== undefined && index++ % shard.count !== shard.index - 1) continue;
        chunk.push(lineOffset === 0 ? item : { ...item, line: item.line + lineOffset });
      }
      if (chunk.length === 0) break;
      const readable: ReadableRow[] = [];
      for (const item of chunk) if (item.kind === "row") readable.push({ cells: item.cells, line: item.line });
      // On this thread: everything with --jobs 1; a table of one chunk (no worker start-up); the first chunk of a report.
      if (jobs === 1 || readable.length === 0 || (chunks === 0 && (done || binding.finish !== undefined))) {
        pending.push({ chunk, run: () => local(readable) });
      } else {
        pool ??= new WorkerPool(jobs, { starlumeTableWorker: 1, command, argv: argvOf(args), columns: table.columns, source: table.source, cwd: io.cwd ?? process.cwd() });
        const results = pool.submit(readable);
        results.catch(() => {}); // awaited in order by flush; avoid an unhandled rejection meanwhile
        pending.push({ chunk, run: () => results });
      }
      chunks++;
      while (pending.length > window) await flush(pending.shift() as Pending);
    }
    while (pending.length > 0) await flush(pending.shift() as Pending);
    await writer.end();
  } catch (e) {
    progress.done();
    if (pool !== undefined) await pool.close();
    await output.abort();
    throw e;
  }
  progress.done();
  if (pool !== undefined) await pool.close();
  await output.close();
  if (!quiet) {
    if (rejected > MAX_ROW_MESSAGES) say(io.stderr, `${table.source}: … and ${rejected - MAX_ROW_MESSAGES} more rejected rows (see the status and reason columns)`);
    say(io.stderr, `${command}: ${rows} row${rows === 1 ? "" : "s"}, ${rows - rejected - flagged} ok, ${flagged} flagged, ${rejected} rejected`);
  }
  if (binding.finish !== undefined) await binding.finish({ rows, rejected, flagged });
  return rejected > 0 ? EXIT.ROWS_REJECTED : EXIT.OK;
}

/** Find a value column by any of several names (case-insensitive). */
export function findColumn(columns: readonly ColumnSpec[], names: readonly string[]): number {
  const lower = names.map((n) => n.toLowerCase());
  return columns.findIndex((c) => c.uncertaintyOf === null && lower.includes(c.name.toLowerCase()));
}

/**
 * The uncertainty column of a value column: index, or -1 when there is none.
 *
 * @throws UsageError for asymmetric uncertainties, which these commands do not use
 */
export function sigmaColumn(columns: readonly ColumnSpec[], name: string, command: string): number {
  const i = columns.findIndex((c) => c.uncertaintyOf === name);
  if (i === -1) return -1;
  const c = columns[i] as ColumnSpec;
  if (c.uncertaintySide !== "both") {
    throw new UsageError(`column '${c.name}': ${command} uses symmetric standard uncertainties only; give sigma(${name}) instead of sigma-(${name})/sigma+(${name})`);
  }
  return i;
}

/** Parse `--unit key=UNIT` / `--column key=NAME` pairs. */
export function keyValuePairs(list: readonly string[], option: string, keys: readonly string[]): Map<string, string> {
  const out = new Map<string, string>();
  for (const item of list) {
    const eq = item.indexOf("=");
    const key = eq === -1 ? "" : item.slice(0, eq).trim();
    if (eq === -1 || !keys.includes(key)) {
      throw new UsageError(`option --${option} takes KEY=VALUE with KEY one of ${keys.join(", ")}; got '${item}'`);
    }
    out.set(key, item.slice(eq + 1).trim());
  }
  return out;
}
