/**
 * Reading a table for a command: open the file (or stdin), pick CSV or JSON
 * Lines (by `--input-format`, the file extension, or for stdin the content:
 * a first `{` means JSON Lines), parse the header with
 * the `name [unit]` convention, and yield the data rows one at a time with
 * their line numbers. Malformed rows are yielded too (as `bad` items with
 * the reason), so that a command can keep every input row in its output.
 *
 * @module
 */
import { createReadStream } from "node:fs";
import { readFile, stat } from "node:fs/promises";
import { extname, resolve } from "node:path";
import { UsageError, type CliIO } from "./context";
import { readCsv } from "./io/csv-read";
import { defaultUncertaintyPatterns, parseColumnHeader, parseHeader, type ColumnSpec } from "./io/header";
import { readJsonl } from "./io/jsonl-read";
import { FitsError, readFitsTable } from "./io/fits";

/** Input table formats; `"auto"` decides from the content (stdin without `--input-format`). */
export type InputFormat = "csv" | "jsonl" | "fits" | "auto";

/** A table cell as read: CSV gives text, JSON Lines numbers, text or null. */
export type InCell = string | number | null;

/** One data row, or a row that could not be read. */
export type TableItem =
  | { readonly kind: "row"; readonly line: number; readonly cells: readonly InCell[] }
  | { readonly kind: "bad"; readonly line: number; readonly message: string };

/** An open table: its columns and an iterator over its rows. */
export interface OpenTable {
  readonly columns: readonly ColumnSpec[];
  readonly items: AsyncIterator<TableItem>;
  /** Where the rows come from, for messages (`stars.csv`, `stdin`). */
  readonly source: string;
}

/** Choose the format from an explicit option or the file name. */
export function inputFormatFor(path: string, explicit: string | undefined): InputFormat {
  if (explicit !== undefined) {
    if (explicit !== "csv" && explicit !== "jsonl" && explicit !== "fits") throw new UsageError(`--input-format must be csv, jsonl or fits; got '${explicit}'`);
    return explicit;
  }
  const ext = extname(path).toLowerCase();
  if (ext === ".jsonl" || ext === ".ndjson") return "jsonl";
  if (ext === ".csv" || ext === ".txt") return "csv";
  if (ext === ".fits" || ext === ".fit" || ext === ".fts") return "fits";
  if (path === "-") return "auto";
  throw new UsageError(`cannot tell the format of '${path}' from its extension; use --input-format csv or --input-format jsonl`);
}

/** Open an input file (or stdin for `-`) as a byte/text source. */
export async function openSource(path: string, io: CliIO): Promise<AsyncIterable<string | Uint8Array>> {
  if (path === "-") {
    if (io.stdin === undefined) throw new UsageError("no standard input available for '-'");
    return io.stdin;
  }
  const full = resolve(io.cwd ?? process.cwd(), path);
  try {
    const s = await stat(full);
    if (!s.isFile()) throw new UsageError(`input '${path}' is not a file`);
  } catch (e) {
    if (e instanceof UsageError) throw e;
    const code = (e as NodeJS.ErrnoException).code ?? "";
    throw new UsageError(`cannot read input file '${path}'${code !== "" ? ` (${code})` : ""}`);
  }
  return createReadStream(full, { encoding: "utf8", highWaterMark: 1 << 16 });
}

/**
 * Open a table and read its header.
 *
 * @throws UsageError when the file cannot be read, is empty, or its header
 *   breaks the `name [unit]` rules (the message names the column)
 */
export async function openTable(path: string, format: InputFormat, io: CliIO): Promise<OpenTable> {
  const label = path === "-" ? "stdin" : path;
  if (format === "fits") return openFits(path, label, io);
  let source = await openSource(path, io);
  let chosen = format;
  if (chosen === "auto") {
    const peeked = await peekSource(source);
    source = peeked.source;
    chosen = detectFormat(peeked.head, label);
  }
  const warn = (message: string): void => {
    io.stderr.write(`${message}\n`);
  };
  const table = await (chosen === "csv" ? openCsv(source, label) : openJsonl(source, label, warn));
  for (const note of headerNotes(table.columns)) warn(`${label}: ${note}`);
  return table;
}

/**
 * A FITS binary table (the first BINTABLE extension) as a table: columns
 * `TTYPEn [TUNITn]`, rows numbered from 1. The file is read whole (not
 * streamed); FITS on stdin is not read.
 */
async function openFits(path: string, label: string, io: CliIO): Promise<OpenTable> {
  if (path === "-") throw new UsageError("stdin: FITS is read from a file, not from standard input");
  let bytes: Uint8Array;
  try {
    bytes = await readFile(resolve(io.cwd ?? process.cwd(), path));
  } catch (e) {
    throw new UsageError(`cannot read input file '${path}' (${(e as NodeJS.ErrnoException).code ?? "error"})`);
  }
  let table;
  try {
    table = readFitsTable(bytes);
  } catch (e) {
    if (e instanceof FitsError) throw new UsageError(`${label}: ${e.message}`);
    throw e;
  }
  let columns: ColumnSpec[];
  try {
    columns = parseHeader(table.columns.map((c) => (c.unit === null || c.unit.trim() === "" ? c.name : `${c.name} [${c.unit}]`)));
  } catch (e) {
    throw new UsageError(`${label}: ${(e as Error).message}`);
  }
  const rows = table.rows;
  async function* items(): AsyncGenerator<TableItem> {
    for (let r = 0; r < rows.length; r++) {
      const cells = (rows[r] as readonly (number | string | boolean | null)[]).map((x): InCell => (typeof x === "boolean" ? (x ? "T" : "F") : x));
      yield { kind: "row", line: r + 1, cells };
    }
  }
  for (const note of headerNotes(columns)) io.stderr.write(`${label}: ${note}\n`);
  return { columns, items: items(), source: label };
}

/** Spellings that look like an uncertainty column but are never read as one (`{x}` is the value column). */
const LOOKALIKE_PATTERNS = ["sigma_{x}", "{x}_sigma", "{x}_unc", "unc_{x}", "{x}_uncertainty", "{x}_e"];

/**
 * Notes on columns that are, or look like, uncertainty columns, so that
 * nothing about them is silent: a column read as an uncertainty through a
 * conventional spelling (`e_teff`), and a column that looks like an
 * uncertainty but is not read as one, with the reason and the fix.
 *
 * @example
 * ```ts
 * headerNotes(parseHeader(["teff [K]", "teff_err"]));
 * // ["column 'teff_err' looks like the uncertainty of 'teff' but is not read as one: 'teff' is in [K] and 'teff_err' has no unit; write 'sigma(teff) [K]'"]
 * ```
 */
export function headerNotes(columns: readonly ColumnSpec[]): string[] {
  const notes: string[] = [];
  const byName = new Map(columns.map((c) => [c.name, c]));
  for (const c of columns) {
    if (c.uncertaintyOf !== null) {
      if (c.uncertaintyPattern !== undefined) notes.push(`column '${c.name}' is read as the standard uncertainty of '${c.uncertaintyOf}'`);
      continue;
    }
    for (const p of [...defaultUncertaintyPatterns, ...LOOKALIKE_PATTERNS]) {
      const at = p.indexOf("{x}");
      const before = p.slice(0, at);
      const after = p.slice(at + 3);
      if (c.name.length <= before.length + after.length || !c.name.startsWith(before) || !c.name.endsWith(after)) continue;
      const x = c.name.slice(before.length, c.name.length - after.length);
      const target = byName.get(x);
      if (target === undefined || target.uncertaintyOf !== null) continue;
      const fix = `write '${target.unit === null ? `sigma(${x})` : `sigma(${x}) [${target.unit}]`}'`;
      const taken = columns.find((d) => d.uncertaintyOf === x);
      const why =
        taken !== undefined
          ? `'${taken.name}' already is`
          : (target.unit === null) !== (c.unit === null)
            ? target.unit === null
              ? `'${x}' has no unit and '${c.name}' has one`
              : `'${x}' is in [${target.unit}] and '${c.name}' has no unit`
            : `'${p.replace("{x}", "x")}' is not an uncertainty spelling`;
      notes.push(`column '${c.name}' looks like the uncertainty of '${x}' but is not read as one: ${why}; ${taken !== undefined ? "remove one of them" : fix}`);
      break;
    }
  }
  return notes;
}

/**
 * The format of a table from its first characters: `{` starts JSON Lines;
 * XML, FITS and a JSON array are named in a UsageError (not read here);
 * anything else is read as CSV.
 */
export function detectFormat(head: string, label: string): "csv" | "jsonl" {
  const t = head.replace(/^\ufeff/, "").trimStart();
  if (t.startsWith("{")) return "jsonl";
  if (t.startsWith("<")) throw new UsageError(`${label}: looks like XML (a VOTable?); starlume reads CSV and JSON Lines tables`);
  if (t.startsWith("SIMPLE  =")) throw new UsageError(`${label}: looks like a FITS file; starlume reads CSV and JSON Lines tables`);
  if (t.startsWith("[")) throw new UsageError(`${label}: looks like a JSON array; JSON Lines needs one object per line`);
  return "csv";
}

/** Read chunks until some non-blank text is seen (at most 64 KiB), and give them back in front of the rest. */
async function peekSource(src: AsyncIterable<string | Uint8Array>): Promise<{ head: string; source: AsyncIterable<string | Uint8Array> }> {
  const it = src[Symbol.asyncIterator]();
  const held: (string | Uint8Array)[] = [];
  const decoder = new TextDecoder();
  let head = "";
  for (;;) {
    if (head.trim().replace(/^\ufeff/, "") !== "" || head.length > 1 << 16) break;
    const r = await it.next();
    if (r.done === true) break;
    held.push(r.value);
    head += typeof r.value === "string" ? r.value : decoder.decode(r.value, { stream: true });
  }
  const source = {
    async *[Symbol.asyncIterator](): AsyncGenerator<string | Uint8Array> {
      yield* held;
      for (;;) {
        const r = await it.next();
        if (r.done === true) return;
        yield r.value;
      }
    },
  };
  return { head: head.slice(0, 256), source };
}

async function openCsv(source: AsyncIterable<string | Uint8Array>, label: string): Promise<OpenTable> {
  const it = readCsv(source);
  const first = await it.next();
  if (first.done === true) throw new UsageError(`${label}: empty table (no header line)`);
  if (first.value.kind === "error") throw new UsageError(`${label}: header ${first.value.message}`);
  let columns: ColumnSpec[];
  try {
    columns = parseHeader(first.value.fields);
  } catch (e) {
    throw new UsageError(`${label}: ${(e as Error).message}`);
  }
  const n = columns.length;
  async function* rows(): AsyncGenerator<TableItem> {
    for (;;) {
      const r = await it.next();
      if (r.done === true) return;
      const item = r.value;
      if (item.kind === "error") {
        yield { kind: "bad", line: item.line, message: item.message };
      } else if (item.fields.length !== n) {
        yield { kind: "bad", line: item.line, message: `line ${item.line}: expected ${n} fields (as in the header), got ${item.fields.length}` };
      } else {
        yield { kind: "row", line: item.line, cells: item.fields };
      }
    }
  }
  return { columns, items: rows(), source: label };
}

async function openJsonl(source: AsyncIterable<string | Uint8Array>, label: string, warn: (message: string) => void = () => {}): Promise<OpenTable> {
  const it = readJsonl(source);
  // The first readable object fixes the columns (its keys, in order); bad lines before it are kept.
  const early: TableItem[] = [];
  let first: { line: number; value: Record<string, unknown> } | undefined;
  for (;;) {
    const r = await it.next();
    if (r.done === true) break;
    if (r.value.kind === "error") {
      early.push({ kind: "bad", line: r.value.line, message: r.value.message });
      continue;
    }
    first = { line: r.value.line, value: r.value.value };
    break;
  }
  if (first === undefined) throw new UsageError(`${label}: no JSON object found (JSON Lines needs one object per line)`);
  const keys = Object.keys(first.value);
  let columns: ColumnSpec[];
  try {
    columns = parseHeader(keys);
  } catch (e) {
    throw new UsageError(`${label}: keys of the object on line ${first.line}: ${(e as Error).message.replace(/^header /, "")}`);
  }
  const index = new Map<string, number>();
  keys.forEach((k, i) => index.set(k, i));
  // Keys absent from the first object: the row is kept, the key's values
  // are not read, and a summary goes to stderr at the end (never silently).
  const extra = new Map<string, { firstLine: number; rows: number }>();
  const firstLine = first.line;
  const toRow = (line: number, value: Record<string, unknown>): TableItem => {
    const cells: InCell[] = new Array<InCell>(keys.length).fill(null);
    for (const [k, v] of Object.entries(value)) {
      const i = index.get(k);
      if (i === undefined) {
        const seen = extra.get(k);
        if (seen === undefined) extra.set(k, { firstLine: line, rows: 1 });
        else seen.rows++;
        continue;
      }
      if (v === null || typeof v === "number" || typeof v === "string") cells[i] = v;
      else return { kind: "bad", line, message: `line ${line}: value of '${k}' must be a number, a string or null; got ${Array.isArray(v) ? "an array" : typeof v}` };
    }
    return { kind: "row", line, cells };
  };
  const firstRow = toRow(first.line, first.value);
  async function* rows(): AsyncGenerator<TableItem> {
    yield* early;
    yield firstRow;
    for (;;) {
      const r = await it.next();
      if (r.done === true) break;
      if (r.value.kind === "error") yield { kind: "bad", line: r.value.line, message: r.value.message };
      else yield toRow(r.value.line, r.value.value);
    }
    if (extra.size > 0) {
      const listed = [...extra].slice(0, 10).map(([k, e]) => `'${columnName(k)}' (${e.rows} row${e.rows === 1 ? "" : "s"}, first on line ${e.firstLine})`);
      const more = extra.size > 10 ? ` and ${extra.size - 10} more` : "";
      warn(`${label}: keys not in the first object (line ${firstLine}) were not read: ${listed.join(", ")}${more}; put every key in the first object to read it`);
    }
  }
  return { columns, items: rows(), source: label };
}

function columnName(key: string): string {
  try {
    return parseColumnHeader(key).name;
  } catch {
    return key;
  }
}

const DECIMAL = /^\s*[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?\s*$/;

/**
 * A cell as a number: `null` for an empty cell (a missing value), the
 * number for decimal text or a JSON number; a RangeError naming the column
 * for anything else (text, NaN, infinities).
 */
export function numberCell(cell: InCell | undefined, column: ColumnSpec): number | null {
  if (cell === null || cell === undefined) return null;
  if (typeof cell === "number") {
    if (!Number.isFinite(cell)) throw new RangeError(`column '${column.name}': ${String(cell)} is not a finite number`);
    return cell;
  }
  if (cell.trim() === "") return null;
  if (!DECIMAL.test(cell)) throw new RangeError(`column '${column.name}': ${JSON.stringify(cell)} is not a number`);
  const x = Number(cell);
  if (!Number.isFinite(x)) throw new RangeError(`column '${column.name}': ${cell.trim()} is out of the double-precision range`);
  return x;
}

/** A cell as text (numbers by their shortest form; null as ""). */
export function textCell(cell: InCell | undefined): string {
  if (cell === null || cell === undefined) return "";
  return typeof cell === "number" ? String(cell) : cell;
}

/** Index of the column that names each star: `--id NAME`, else the first of name/star/id/designation, else none. */
export function idColumn(columns: readonly ColumnSpec[], explicit: string | undefined): number {
  if (explicit !== undefined) {
    const i = columns.findIndex((c) => c.name === explicit);
    if (i === -1) throw new UsageError(`--id '${explicit}': no such column (columns: ${columns.map((c) => c.name).join(", ")})`);
    return i;
  }
  for (const name of ["name", "star", "id", "designation", "object"]) {
    const i = columns.findIndex((c) => c.name.toLowerCase() === name && c.unit === null);
    if (i !== -1) return i;
  }
  return -1;
}
