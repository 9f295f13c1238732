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
import { optString, type ParsedArgs, type OptionSpec } from "./args";
import { EXIT, UsageError, say, type CliIO } from "./context";
import type { ColumnSpec } from "./io/header";
import { Progress } from "./io/progress";
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
];

/** Result of processing one row. */
export interface RowResult {
  readonly cells: readonly CellValue[];
  /** Why the row was rejected (it is still written), or undefined. */
  readonly rejected?: string;
}

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

/** A readable input row and its 1-based line number. */
export interface ReadableRow {
  readonly cells: readonly InCell[];
  readonly line: number;
}

/** Rows per chunk when a binding processes rows in batches (output is flushed after each chunk). */
export const BATCH_ROWS = 4096;

/** Counts of a run. */
export interface RunSummary {
  readonly rows: number;
  readonly rejected: number;
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
  const table = await openTable(path, format, io);
  const binding = await bind(table.columns, table.source);
  const outPath = optString(args, "output");
  const outFormat = defaultFormat(optString(args, "format"), outPath, io);
  const output = await openOutput(outPath, io);
  const writer = openTableWriter(output.sink, binding.columns, { format: outFormat, digits });
  const progress = new Progress({ stream: io.stderr, label: command });
  let rows = 0;
  let rejected = 0;
  const reject = (line: number, why: string): void => {
    rejected++;
    if (!quiet && rejected <= MAX_ROW_MESSAGES) say(io.stderr, `${table.source}: line ${line}: rejected: ${why.replace(/^line \d+: /, "")}`);
  };
  const emit = async (cells: readonly CellValue[]): Promise<void> => {
    const p = writer.writeRow(cells);
    if (p !== undefined) await p;
    progress.update(rows, rejected > 0 ? `${rejected} rejected` : undefined);
  };
  try {
    if (binding.rows === undefined) {
      for (;;) {
        const r = await table.items.next();
        if (r.done === true) break;
        const item = r.value;
        rows++;
        let cells: readonly CellValue[];
        if (item.kind === "bad") {
          reject(item.line, item.message);
          cells = binding.badRow(item.line, item.message);
        } else {
          const res = binding.row(item.cells, item.line);
          if (res.rejected !== undefined) reject(item.line, res.rejected);
          cells = res.cells;
        }
        await emit(cells);
      }
    } else {
      // Chunked: read up to BATCH_ROWS items, process the readable ones together, write all in input order.
      const rowsOf = binding.rows.bind(binding);
      let done = false;
      while (!done) {
        const chunk: TableItem[] = [];
        while (chunk.length < BATCH_ROWS) {
          const r = await table.items.next();
          if (r.done === true) {
            done = true;
            break;
          }
          chunk.push(r.value);
        }
        const readable: ReadableRow[] = [];
        for (const item of chunk) if (item.kind === "row") readable.push({ cells: item.cells, line: item.line });
        const results = readable.length > 0 ? rowsOf(readable) : [];
        if (results.length !== readable.length) throw new Error(`internal: ${command} returned ${results.length} results for ${readable.length} rows`);
        let k = 0;
        for (const item of chunk) {
          rows++;
          let cells: readonly CellValue[];
          if (item.kind === "bad") {
            reject(item.line, item.message);
            cells = binding.badRow(item.line, item.message);
          } else {
            const res = results[k++] as RowResult;
            if (res.rejected !== undefined) reject(item.line, res.rejected);
            cells = res.cells;
          }
          await emit(cells);
        }
      }
    }
    await writer.end();
  } finally {
    progress.done();
    await output.close();
  }
  if (!quiet) {
    if (rejected > MAX_ROW_MESSAGES) say(io.stderr, `${table.source}: … and ${rejected - MAX_ROW_MESSAGES} more rejected rows (see the status and reason columns)`);
    say(io.stderr, `${command}: ${rows} row${rows === 1 ? "" : "s"}, ${rows - rejected} ok, ${rejected} rejected`);
  }
  if (binding.finish !== undefined) await binding.finish({ rows, rejected });
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
