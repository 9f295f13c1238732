/**
 * Row-by-row table writers for the command-line tool: CSV (RFC 4180), JSON
 * (one array, or JSON Lines) and a human-readable aligned text table.
 *
 * All writers push text through a {@link TextOut}, which batches small writes
 * into chunks of about 64 KiB and honours back-pressure of the underlying Node
 * stream (it waits for `drain` when `write` returns false). Nothing but the
 * current batch is held, so a 10⁶-row run stays in flat memory — except the
 * aligned table, which must know its column widths before printing the first
 * line: it takes them from `widths` if given, otherwise it buffers the first
 * `sampleRows` rows (default 200), measures them, and then streams. A later
 * cell wider than its column is printed in full (never truncated), shifting
 * the rest of that line to the right.
 *
 * Every writing method returns `Promise<void> | void`: `await` it (awaiting
 * `undefined` is harmless) so that back-pressure is respected.
 *
 * @module
 */

import { formatColumnHeader } from "./header";
import type { ColumnSpec } from "./header";

/** A table cell as handed to a writer. `null`/`undefined` mean "no value". */
export type CellValue = string | number | null | undefined;

/**
 * The part of a Node `Writable` that {@link TextOut} uses (`process.stdout`,
 * `fs.createWriteStream(...)` and test doubles all fit).
 */
export interface TextSink {
  write(chunk: string): boolean;
  once(event: "drain" | "error", listener: (err?: unknown) => void): unknown;
  removeListener(event: "drain" | "error", listener: (err?: unknown) => void): unknown;
  /** Called by {@link TextOut.end} only when `closeSink` is true. */
  end?(callback: () => void): unknown;
}

/** Options for {@link TextOut}. */
export interface TextOutOptions {
  /** Flush to the sink once this many characters are buffered (default 65 536). */
  readonly bufferChars?: number;
  /** End the sink in {@link TextOut.end} (default false: e.g. never end `process.stdout`). */
  readonly closeSink?: boolean;
}

/**
 * Buffered, back-pressure-aware text output over a {@link TextSink}.
 *
 * @example
 * ```ts
 * const out = new TextOut(process.stdout);
 * await out.write("hello\n");
 * await out.end();
 * ```
 */
export class TextOut {
  private readonly sink: TextSink;
  private readonly limit: number;
  private readonly closeSink: boolean;
  private parts: string[] = [];
  private chars = 0;

  constructor(sink: TextSink, options: TextOutOptions = {}) {
    const limit = options.bufferChars ?? 65_536;
    if (!Number.isInteger(limit) || limit < 1) {
      throw new RangeError(`bufferChars must be a positive integer; got ${String(limit)}`);
    }
    this.sink = sink;
    this.limit = limit;
    this.closeSink = options.closeSink ?? false;
  }

  /** Queue text; flushes (and may wait for `drain`) when the buffer is full. */
  write(text: string): Promise<void> | void {
    this.parts.push(text);
    this.chars += text.length;
    if (this.chars >= this.limit) return this.flush();
  }

  /** Send buffered text to the sink now; resolves once the sink can take more. */
  flush(): Promise<void> | void {
    if (this.parts.length === 0) return;
    const text = this.parts.length === 1 ? (this.parts[0] ?? "") : this.parts.join("");
    this.parts = [];
    this.chars = 0;
    if (this.sink.write(text)) return;
    return new Promise<void>((resolve, reject) => {
      const onDrain = (): void => {
        this.sink.removeListener("error", onError);
        resolve();
      };
      const onError = (err?: unknown): void => {
        this.sink.removeListener("drain", onDrain);
        reject(err instanceof Error ? err : new Error(String(err)));
      };
      this.sink.once("drain", onDrain);
      this.sink.once("error", onError);
    });
  }

  /** Flush, then end the sink if `closeSink` was set (resolving when it has finished). */
  async end(): Promise<void> {
    await this.flush();
    const sink = this.sink;
    if (this.closeSink && sink.end !== undefined) {
      await new Promise<void>((resolve) => {
        sink.end?.(() => resolve());
      });
    }
  }
}

// ---------------------------------------------------------------------------
// CSV

/** Options for CSV output. */
export interface CsvWriteOptions {
  /** Field delimiter (default `,`). */
  readonly delimiter?: string;
  /** Record terminator: `"\n"` (default) or `"\r\n"` (RFC 4180's own choice). */
  readonly eol?: "\n" | "\r\n";
}

/**
 * Quote one CSV field only when needed (RFC 4180 §2.6–2.7): when it contains
 * the delimiter, a double quote, CR or LF. Inner quotes are doubled.
 *
 * @example
 * ```ts
 * csvField("plain");      // "plain"
 * csvField('say "hi", ok'); // '"say ""hi"", ok"'
 * ```
 */
export function csvField(text: string, delimiter = ","): string {
  let needs = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '"' || c === "\n" || c === "\r" || c === delimiter) {
      needs = true;
      break;
    }
  }
  return needs ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Text of one cell for CSV/plain output: numbers by `String` (shortest round-trip form), null as empty. */
function cellText(v: CellValue): string {
  if (v === null || v === undefined) return "";
  return typeof v === "number" ? String(v) : v;
}

/**
 * Format one CSV record including its terminator. A record made of a single
 * empty field is written as `""` so that it is not read back as an empty line.
 *
 * @example
 * ```ts
 * formatCsvRow(["Sun", 5772, null]); // "Sun,5772,\n"
 * ```
 */
export function formatCsvRow(fields: readonly CellValue[], options: CsvWriteOptions = {}): string {
  const d = options.delimiter ?? ",";
  const eol = options.eol ?? "\n";
  if (fields.length === 1 && cellText(fields[0]) === "") return `""${eol}`;
  let s = "";
  for (let i = 0; i < fields.length; i++) {
    if (i > 0) s += d;
    s += csvField(cellText(fields[i]), d);
  }
  return s + eol;
}

/**
 * Streaming CSV writer.
 *
 * @example
 * ```ts
 * const w = new CsvWriter(new TextOut(process.stdout));
 * await w.writeRow(["star", "teff [K]"]);
 * await w.writeRow(["Sun", 5772]);
 * await w.end();
 * ```
 */
export class CsvWriter {
  private readonly out: TextOut;
  private readonly options: CsvWriteOptions;
  constructor(out: TextOut, options: CsvWriteOptions = {}) {
    const d = options.delimiter ?? ",";
    if (d.length !== 1 || d === '"' || d === "\r" || d === "\n") {
      throw new RangeError(`delimiter must be one character other than '"', CR or LF; got ${JSON.stringify(d)}`);
    }
    this.out = out;
    this.options = options;
  }
  /** Write one record. */
  writeRow(fields: readonly CellValue[]): Promise<void> | void {
    return this.out.write(formatCsvRow(fields, this.options));
  }
  /** Flush and end the underlying {@link TextOut}. */
  end(): Promise<void> {
    return this.out.end();
  }
}

// ---------------------------------------------------------------------------
// JSON

/** Options for {@link JsonWriter}. */
export interface JsonWriteOptions {
  /** `"array"`: one JSON array of objects; `"lines"`: JSON Lines, one object per line. Default `"lines"`. */
  readonly mode?: "array" | "lines";
}

/**
 * Streaming JSON writer. Non-finite numbers (NaN, ±Infinity) are not valid
 * JSON and are written as `null`, as `JSON.stringify` does.
 *
 * @example
 * ```ts
 * const w = new JsonWriter(new TextOut(process.stdout), { mode: "array" });
 * await w.writeRecord({ star: "Sun", teff_K: 5772 });
 * await w.end(); // prints [\n{"star":"Sun","teff_K":5772}\n]\n
 * ```
 */
export class JsonWriter {
  private readonly out: TextOut;
  private readonly array: boolean;
  private count = 0;
  constructor(out: TextOut, options: JsonWriteOptions = {}) {
    this.out = out;
    this.array = (options.mode ?? "lines") === "array";
  }
  /** Write one object. */
  writeRecord(record: Readonly<Record<string, unknown>>): Promise<void> | void {
    const json = JSON.stringify(record);
    let text: string;
    if (this.array) text = (this.count === 0 ? "[\n" : ",\n") + json;
    else text = json + "\n";
    this.count++;
    return this.out.write(text);
  }
  /** Close the array (if any; an empty run gives `[]`), flush and end the {@link TextOut}. */
  async end(): Promise<void> {
    if (this.array) await this.out.write(this.count === 0 ? "[]\n" : "\n]\n");
    await this.out.end();
  }
}

// ---------------------------------------------------------------------------
// Number formatting for the aligned table

/**
 * Format a number to `digits` significant digits: fixed notation when the
 * decimal exponent is in [-3, 5], otherwise `m.mmme±x` (e.g. `1.23e-7`,
 * `4.56e8`). Non-finite values print as `NaN`, `inf`, `-inf`.
 *
 * @param x - the value.
 * @param digits - significant digits, an integer in [1, 17].
 * @throws RangeError if `digits` is out of range.
 *
 * @example
 * ```ts
 * formatSignificant(5772.04, 3);  // "5770"
 * formatSignificant(1.2345e-7, 3); // "1.23e-7"
 * formatSignificant(0.012345, 2);  // "0.012"
 * ```
 */
export function formatSignificant(x: number, digits: number): string {
  if (!Number.isInteger(digits) || digits < 1 || digits > 17) {
    throw new RangeError(`digits must be an integer in [1, 17]; got ${String(digits)}`);
  }
  if (!Number.isFinite(x)) return Number.isNaN(x) ? "NaN" : x > 0 ? "inf" : "-inf";
  if (x === 0) return (0).toFixed(digits - 1);
  const [mant = "", expText = "0"] = x.toExponential(digits - 1).split("e");
  const exp = Number(expText);
  if (exp < -3 || exp > 5) return `${mant}e${exp}`;
  // Round first, so digits left of the point beyond `digits` become zeros (5772 → "5770" at 3 digits).
  return Number(`${mant}e${exp}`).toFixed(Math.max(0, digits - 1 - exp));
}

/** Decimal exponent of |x| after rounding to `digits` significant digits. */
function roundedExponent(x: number, digits: number): number {
  return Number(Math.abs(x).toExponential(digits - 1).split("e")[1]);
}

/**
 * Format a value with its uncertainty by the usual convention: the
 * uncertainty to `uncDigits` significant digits (default 2) and the value
 * rounded to the same decimal place, e.g. `5772 ± 12`, `0.3521 ± 0.0014`,
 * or with a shared power of ten `(1.234 ± 0.056)e-7` when the value's
 * exponent is outside [-3, 5]. A zero, negative or non-finite uncertainty
 * is shown as given, after the value printed by `String`.
 *
 * Source for the rounding convention: JCGM 100:2008 (GUM) §7.2.6, which
 * recommends at most two significant digits for a stated uncertainty.
 *
 * @example
 * ```ts
 * formatValueUncertainty(5772.04, 12.3);         // "5772 ± 12"
 * formatValueUncertainty(1.2344e-7, 5.61e-9);    // "(1.234 ± 0.056)e-7"
 * ```
 */
export function formatValueUncertainty(value: number, uncertainty: number, uncDigits = 2): string {
  return formatAsym(value, uncertainty, uncertainty, true, uncDigits);
}

/**
 * Like {@link formatValueUncertainty} for an asymmetric interval:
 * `value +upper -lower`, rounded to the decimal place of the smaller of the two.
 *
 * @example
 * ```ts
 * formatValueAsymmetric(4.438, 0.052, 0.031); // "4.438 +0.052 -0.031"
 * ```
 */
export function formatValueAsymmetric(value: number, upper: number, lower: number, uncDigits = 2): string {
  return formatAsym(value, upper, lower, false, uncDigits);
}

function formatAsym(value: number, upper: number, lower: number, symmetric: boolean, uncDigits: number): string {
  if (!Number.isInteger(uncDigits) || uncDigits < 1 || uncDigits > 6) {
    throw new RangeError(`uncDigits must be an integer in [1, 6]; got ${String(uncDigits)}`);
  }
  const tail = (u: string, l: string): string => (symmetric ? ` ± ${u}` : ` +${u} -${l}`);
  if (!Number.isFinite(value) || !(upper > 0) || !(lower > 0) || upper === Infinity || lower === Infinity) {
    return String(value) + tail(String(upper), String(lower));
  }
  const small = Math.min(upper, lower);
  // Decimal place of the last kept digit of the smaller uncertainty.
  const q = roundedExponent(small, uncDigits) - (uncDigits - 1);
  const scale = 10 ** q;
  const vr = Math.round(value / scale) * scale;
  const ev = vr === 0 ? roundedExponent(Math.max(upper, lower), uncDigits) : roundedExponent(vr, 1);
  const e = Math.max(ev, roundedExponent(Math.max(upper, lower), uncDigits));
  if (e >= -3 && e <= 5) {
    const dec = Math.max(0, -q);
    const f = (x: number): string => (Math.round(x / scale) * scale).toFixed(dec);
    return f(value) + tail(f(upper), f(lower));
  }
  const p = 10 ** e;
  const dec = Math.max(0, e - q);
  const f = (x: number): string => (Math.round(x / scale) * scale / p).toFixed(dec);
  return symmetric ? `(${f(value)} ± ${f(upper)})e${e}` : `(${f(value)} +${f(upper)} -${f(lower)})e${e}`;
}

// ---------------------------------------------------------------------------
// Aligned text table

/** A column of the aligned table: a header spec as produced by `parseHeader` (only `name` is required). */
export interface TableColumn {
  readonly name: string;
  readonly unit?: string | null;
  readonly uncertaintyOf?: string | null;
  readonly uncertaintySide?: ColumnSpec["uncertaintySide"];
}

/** Options for {@link AlignedTableWriter}. */
export interface AlignedTableOptions {
  /** Significant digits for numbers (default: shortest round-trip form, `String(x)`). */
  readonly digits?: number;
  /**
   * Merge each value column with its uncertainty column(s) (`sigma(x)`, or
   * `sigma-(x)` + `sigma+(x)`) into one `value ± unc` column. Default false.
   */
  readonly plusMinus?: boolean;
  /** Significant digits of uncertainties in merged columns (default 2). */
  readonly uncertaintyDigits?: number;
  /** Explicit widths of the displayed columns (after merging); if given, nothing is buffered. */
  readonly widths?: readonly number[];
  /** Rows buffered to measure widths when `widths` is absent (default 200). */
  readonly sampleRows?: number;
  /** Spaces between columns (default 2). */
  readonly gap?: number;
  /** Character repeated under the header (default `-`). */
  readonly underline?: string;
}

/**
 * Number of displayed characters, counting a surrogate pair once (East Asian
 * wide forms and combining marks are not special-cased).
 *
 * @example
 * ```ts
 * displayWidth("5772 ± 1"); // 8
 * ```
 */
export function displayWidth(s: string): number {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 0xdc00 || c > 0xdfff) n++;
  }
  return n;
}

interface DisplayColumn {
  header: string;
  value: number;
  sym: number;
  lo: number;
  hi: number;
  numeric: boolean;
}

const NUMBER_TEXT = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$|^\s*[+-]?(?:inf|Infinity)\s*$|^\s*NaN\s*$/;

/**
 * Streaming writer of a readable, aligned text table: header line
 * (`name [unit]`), an underline, then one line per row; numbers are
 * right-aligned and text left-aligned (a column is numeric when every
 * non-empty cell seen while measuring is a number or numeric text; merged
 * `±` columns are always numeric). Trailing spaces are trimmed.
 *
 * Column widths: from `options.widths` if given (alignment is then judged
 * on the first row); otherwise the first `sampleRows` rows are buffered and
 * measured (see the module notes).
 *
 * @example
 * ```ts
 * const t = new AlignedTableWriter(new TextOut(process.stdout),
 *   [{ name: "star" }, { name: "teff", unit: "K" }, { name: "sigma(teff)", unit: "K", uncertaintyOf: "teff", uncertaintySide: "both" }],
 *   { plusMinus: true });
 * await t.writeRow(["Sun", 5772, 0.8]);
 * await t.end();
 * // star        teff [K]
 * // ----  --------------
 * // Sun   5772.00 ± 0.80
 * ```
 */
export class AlignedTableWriter {
  private readonly out: TextOut;
  private readonly cols: DisplayColumn[];
  private readonly digits: number | undefined;
  private readonly uncDigits: number;
  private readonly sample: number;
  private readonly gap: string;
  private readonly underline: string;
  private widths: number[] | null;
  private buffered: string[][] = [];
  private headerDone = false;

  /**
   * @param out - destination.
   * @param columns - the input columns, in the order of the cells of each row.
   * @param options - see {@link AlignedTableOptions}.
   * @throws RangeError for invalid digits, widths, sampleRows or gap.
   */
  constructor(out: TextOut, columns: readonly TableColumn[], options: AlignedTableOptions = {}) {
    this.out = out;
    this.digits = options.digits;
    if (this.digits !== undefined) formatSignificant(1, this.digits); // validates
    this.uncDigits = options.uncertaintyDigits ?? 2;
    formatValueUncertainty(1, 1, this.uncDigits); // validates
    const sample = options.sampleRows ?? 200;
    if (!Number.isInteger(sample) || sample < 1) {
      throw new RangeError(`sampleRows must be a positive integer; got ${String(sample)}`);
    }
    this.sample = sample;
    const gap = options.gap ?? 2;
    if (!Number.isInteger(gap) || gap < 1) throw new RangeError(`gap must be a positive integer; got ${String(gap)}`);
    this.gap = " ".repeat(gap);
    this.underline = options.underline ?? "-";
    if (displayWidth(this.underline) !== 1) {
      throw new RangeError(`underline must be one character; got ${JSON.stringify(this.underline)}`);
    }
    this.cols = buildDisplayColumns(columns, options.plusMinus ?? false);
    if (options.widths !== undefined) {
      if (options.widths.length !== this.cols.length || options.widths.some((w) => !Number.isInteger(w) || w < 1)) {
        throw new RangeError(
          `widths must list ${this.cols.length} positive integers (one per displayed column); got [${options.widths.join(", ")}]`,
        );
      }
      this.widths = [...options.widths];
    } else {
      this.widths = null;
    }
  }

  /** Headers of the displayed columns (after any `±` merging), in order. */
  get displayedHeaders(): string[] {
    return this.cols.map((c) => c.header);
  }

  /** Write one row; `row[i]` is the cell of input column `i`. */
  writeRow(row: readonly CellValue[]): Promise<void> | void {
    const cells = this.cols.map((c) => this.formatCell(c, row));
    if (this.widths === null) {
      this.buffered.push(cells);
      this.detect(row);
      if (this.buffered.length >= this.sample) return this.release();
      return;
    }
    if (!this.headerDone) {
      // Explicit widths: alignment is judged on the first row alone.
      this.detect(row);
      const p = this.writeHeader();
      if (p !== undefined) return p.then(() => this.out.write(this.line(cells)));
    }
    return this.out.write(this.line(cells));
  }

  /** Print buffered rows (if fewer than `sampleRows` came), flush and end the {@link TextOut}. */
  async end(): Promise<void> {
    if (this.widths === null) await this.release();
    else if (!this.headerDone) await this.writeHeader();
    await this.out.end();
  }

  /** Mark plain columns holding non-numeric text as left-aligned. */
  private detect(row: readonly CellValue[]): void {
    for (const col of this.cols) {
      const v = row[col.value];
      if (col.sym < 0 && col.lo < 0 && typeof v === "string" && v !== "" && !NUMBER_TEXT.test(v)) col.numeric = false;
    }
  }

  private formatCell(c: DisplayColumn, row: readonly CellValue[]): string {
    const v = row[c.value];
    if (v === null || v === undefined) return "";
    if (typeof v === "string") {
      if (c.sym < 0 && c.lo < 0) return v;
      const n = Number(v);
      if (v.trim() === "" || !Number.isFinite(n)) return v;
      return this.formatCell(c, row.map((x, i) => (i === c.value ? n : x)));
    }
    const num = (i: number): number => {
      const x = row[i];
      return typeof x === "number" ? x : typeof x === "string" && x.trim() !== "" ? Number(x) : NaN;
    };
    if (c.sym >= 0) {
      const u = num(c.sym);
      if (Number.isNaN(u)) return this.plain(v);
      return formatValueUncertainty(v, u, this.uncDigits);
    }
    if (c.lo >= 0 && c.hi >= 0) {
      const lo = num(c.lo);
      const hi = num(c.hi);
      if (Number.isNaN(lo) || Number.isNaN(hi)) return this.plain(v);
      return formatValueAsymmetric(v, hi, lo, this.uncDigits);
    }
    return this.plain(v);
  }

  private plain(x: number): string {
    return this.digits === undefined ? String(x) : formatSignificant(x, this.digits);
  }

  private release(): Promise<void> | void {
    const rows = this.buffered;
    this.buffered = [];
    const widths = this.cols.map((c) => displayWidth(c.header));
    for (const r of rows) {
      r.forEach((cell, k) => {
        const w = displayWidth(cell);
        if (w > (widths[k] ?? 0)) widths[k] = w;
      });
    }
    this.widths = widths;
    let text = this.headerText();
    for (const r of rows) text += this.line(r);
    this.headerDone = true;
    return this.out.write(text);
  }

  private writeHeader(): Promise<void> | void {
    this.headerDone = true;
    return this.out.write(this.headerText());
  }

  private headerText(): string {
    const widths = this.widths ?? [];
    const head = this.line(this.cols.map((c) => c.header));
    const rule = this.cols.map((_, k) => this.underline.repeat(widths[k] ?? 1)).join(this.gap);
    return head + rule + "\n";
  }

  private line(cells: readonly string[]): string {
    const widths = this.widths ?? [];
    let s = "";
    for (let k = 0; k < cells.length; k++) {
      const cell = cells[k] ?? "";
      const pad = " ".repeat(Math.max(0, (widths[k] ?? 0) - displayWidth(cell)));
      if (k > 0) s += this.gap;
      s += this.cols[k]?.numeric ? pad + cell : cell + pad;
    }
    return s.trimEnd() + "\n";
  }
}

function buildDisplayColumns(columns: readonly TableColumn[], plusMinus: boolean): DisplayColumn[] {
  const byName = new Map<string, number>();
  columns.forEach((c, i) => byName.set(c.name, i));
  const merged = new Set<number>();
  const sym = new Map<number, number>();
  const lo = new Map<number, number>();
  const hi = new Map<number, number>();
  if (plusMinus) {
    columns.forEach((c, i) => {
      if (c.uncertaintyOf === null || c.uncertaintyOf === undefined) return;
      const target = byName.get(c.uncertaintyOf);
      if (target === undefined) return;
      const side = c.uncertaintySide ?? "both";
      (side === "both" ? sym : side === "lower" ? lo : hi).set(target, i);
    });
    for (const [t, i] of sym) {
      merged.add(i);
      lo.delete(t);
      hi.delete(t);
    }
    for (const [t, i] of lo) {
      const j = hi.get(t);
      if (j === undefined) lo.delete(t);
      else merged.add(i).add(j);
    }
  }
  const out: DisplayColumn[] = [];
  columns.forEach((c, i) => {
    if (merged.has(i)) return;
    const s = sym.get(i) ?? -1;
    const l = lo.get(i) ?? -1;
    const h = l >= 0 ? (hi.get(i) ?? -1) : -1;
    out.push({
      header: formatColumnHeader({ name: c.name, unit: c.unit ?? null }),
      value: i,
      sym: s,
      lo: l,
      hi: h,
      numeric: true,
    });
  });
  return out;
}
