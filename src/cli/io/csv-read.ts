/**
 * Streaming CSV reader (RFC 4180, with the usual liberal line endings).
 *
 * The core {@link CsvParser} is a push parser: feed it text chunks of any size
 * (a chunk boundary may fall anywhere, even between the CR and LF of a CRLF or
 * inside a doubled quote) and it hands each complete record to a callback,
 * tagged with the 1-based line number on which the record starts. Nothing but
 * the record being built is kept, so memory stays flat however long the input.
 *
 * Dialect accepted:
 * - fields separated by `,` (configurable), records ended by CRLF, LF or a lone CR;
 * - a field may be enclosed in double quotes; inside quotes a doubled quote
 *   `""` stands for one `"`, and delimiters and line breaks are literal;
 * - a UTF-8 byte order mark (U+FEFF) at the very start of the stream is dropped;
 * - a final line break is optional; completely empty lines are skipped unless
 *   `skipEmptyLines: false`.
 *
 * Strictness (each reported as an `error` item, parsing then resumes at the
 * next line break, so one bad row never aborts a million-row run):
 * - `quote-in-unquoted-field`: a `"` inside a field that did not start with one;
 * - `text-after-closing-quote`: anything but a delimiter or line break after a closing quote;
 * - `unterminated-quote`: end of input inside a quoted field;
 * - `record-too-long`: a record longer than `maxRecordChars` (guards memory
 *   when a stray quote would otherwise swallow the rest of the file).
 *
 * Source: Y. Shafranovich, RFC 4180 "Common Format and MIME Type for
 * Comma-Separated Values (CSV) Files", IETF, 2005.
 *
 * @module
 */
import { parseChunks } from "./chunks";

/** Why a record was rejected. */
export type CsvErrorCode =
  | "quote-in-unquoted-field"
  | "text-after-closing-quote"
  | "unterminated-quote"
  | "record-too-long";

/** A complete record: its fields and the 1-based line where it starts. */
export interface CsvRecord {
  readonly kind: "record";
  /** 1-based line number of the record's first character. */
  readonly line: number;
  /** Field texts, unquoted, in order. */
  readonly fields: string[];
}

/** A rejected record: where it started, where the fault is, and why. */
export interface CsvRejected {
  readonly kind: "error";
  /** 1-based line number where the rejected record starts. */
  readonly line: number;
  /** 1-based line number where the fault was detected. */
  readonly errorLine: number;
  readonly code: CsvErrorCode;
  /** Human-readable message naming the line(s). */
  readonly message: string;
}

/** One item produced by the reader: a record or a rejected record. */
export type CsvItem = CsvRecord | CsvRejected;

/** Options for {@link CsvParser} and the readers built on it. */
export interface CsvOptions {
  /** Field delimiter, a single character other than `"`, CR or LF. Default `,`. */
  readonly delimiter?: string;
  /** Skip lines with no characters at all (default `true`). A line `""` is not empty. */
  readonly skipEmptyLines?: boolean;
  /** Reject a record once it exceeds this many characters (default 1 048 576). */
  readonly maxRecordChars?: number;
}

const QUOTE = 0x22;
const CR = 0x0d;
const LF = 0x0a;
const BOM = 0xfeff;

const enum State {
  /** At the start of a field (or of a record when `fields` is empty and `inRecord` false). */
  FieldStart,
  Unquoted,
  Quoted,
  /** Just saw a `"` inside a quoted field: doubled quote or closing quote. */
  QuoteSeen,
  /** Discarding the rest of a faulty record up to the next line break. */
  Skip,
}

/**
 * Incremental RFC 4180 parser. Call {@link CsvParser.push} with successive
 * chunks, then {@link CsvParser.end} once; every finished record or rejected
 * record is passed to the `emit` callback synchronously, in input order.
 *
 * @example
 * ```ts
 * const items: CsvItem[] = [];
 * const p = new CsvParser((item) => items.push(item));
 * p.push('name,teff [K]\n"Sun, the",57');
 * p.push("72\n");
 * p.end();
 * // items[1] is { kind: "record", line: 2, fields: ["Sun, the", "5772"] }
 * ```
 */
export class CsvParser {
  private readonly emit: (item: CsvItem) => void;
  private readonly delim: number;
  private readonly skipEmpty: boolean;
  private readonly maxChars: number;

  private state: State = State.FieldStart;
  private fields: string[] = [];
  private field = "";
  private inRecord = false;
  private recordLine = 1;
  private recordChars = 0;
  /** Line number of the character about to be read. */
  private line = 1;
  /** The last character consumed was a CR (for CRLF counting across chunks). */
  private prevCR = false;
  private started = false;
  private ended = false;
  private pendingError: { code: CsvErrorCode; errorLine: number; message: string } | null = null;

  /**
   * @param emit - receives each record or rejected record as soon as it is complete.
   * @param options - dialect and limits, see {@link CsvOptions}.
   * @throws RangeError if the delimiter is not a single allowed character or
   *   `maxRecordChars` is not a positive integer.
   */
  constructor(emit: (item: CsvItem) => void, options: CsvOptions = {}) {
    const d = options.delimiter ?? ",";
    if (d.length !== 1 || d === '"' || d === "\r" || d === "\n") {
      throw new RangeError(`delimiter must be one character other than '"', CR or LF; got ${JSON.stringify(d)}`);
    }
    const max = options.maxRecordChars ?? 1_048_576;
    if (!Number.isInteger(max) || max < 1) {
      throw new RangeError(`maxRecordChars must be a positive integer; got ${String(max)}`);
    }
    this.emit = emit;
    this.delim = d.charCodeAt(0);
    this.skipEmpty = options.skipEmptyLines ?? true;
    this.maxChars = max;
  }

  /** Feed the next chunk of text. Records completed by it are emitted before this returns. */
  push(chunk: string): void {
    if (this.ended) throw new Error("CsvParser.push called after end()");
    const n = chunk.length;
    let i = 0;
    if (!this.started && n > 0) {
      this.started = true;
      if (chunk.charCodeAt(0) === BOM) i = 1;
    }
    const delim = this.delim;
    while (i < n) {
      switch (this.state) {
        case State.FieldStart: {
          const c = chunk.charCodeAt(i);
          if (c === LF && this.prevCR) {
            // Second half of a CRLF that ended the previous record (or an empty line).
            this.prevCR = false;
            i++;
            break;
          }
          this.prevCR = false;
          if (!this.inRecord) {
            if (c === CR || c === LF) {
              // An empty line.
              this.newline(c);
              i++;
              if (!this.skipEmpty) {
                this.emit({ kind: "record", line: this.line - 1, fields: [""] });
              }
              break;
            }
            this.inRecord = true;
            this.recordLine = this.line;
            this.recordChars = 0;
          }
          if (c === QUOTE) {
            this.state = State.Quoted;
            this.field = "";
            i++;
          } else if (c === delim) {
            this.fields.push("");
            i++;
            this.recordChars++;
          } else if (c === CR || c === LF) {
            this.fields.push("");
            this.newline(c);
            i++;
            this.finishRecord();
          } else {
            this.state = State.Unquoted;
            this.field = "";
          }
          break;
        }
        case State.Unquoted: {
          let j = i;
          let c = 0;
          // Stop one character past the record limit so an overlong record is caught where it overflows.
          const stop = Math.min(n, i + (this.maxChars - this.recordChars) + 1);
          while (j < stop) {
            c = chunk.charCodeAt(j);
            if (c === delim || c === CR || c === LF || c === QUOTE) break;
            j++;
          }
          this.field += j > i ? chunk.slice(i, j) : "";
          this.recordChars += j - i;
          i = j;
          if (this.recordChars > this.maxChars) {
            this.fail("record-too-long", `record longer than ${this.maxChars} characters`);
            break;
          }
          if (j === n) break;
          if (c === QUOTE) {
            this.fail("quote-in-unquoted-field", `'"' inside an unquoted field (quote the whole field and double the quote)`);
            break;
          }
          this.fields.push(this.field);
          this.field = "";
          i++;
          if (c === delim) {
            this.recordChars++;
            this.state = State.FieldStart;
          } else {
            this.newline(c);
            this.finishRecord();
          }
          break;
        }
        case State.Quoted: {
          let j = i;
          let prevCR = this.prevCR;
          let line = this.line;
          const stop = Math.min(n, i + (this.maxChars - this.recordChars) + 1);
          while (j < stop) {
            const c = chunk.charCodeAt(j);
            if (c === QUOTE) break;
            if (c === CR) {
              line++;
              prevCR = true;
            } else {
              if (c === LF && !prevCR) line++;
              prevCR = false;
            }
            j++;
          }
          this.line = line;
          this.prevCR = prevCR;
          this.field += j > i ? chunk.slice(i, j) : "";
          this.recordChars += j - i;
          i = j;
          if (this.recordChars > this.maxChars) {
            this.fail("record-too-long", `record longer than ${this.maxChars} characters (an unbalanced quote?)`);
            break;
          }
          if (j < stop) {
            // Found a quote.
            this.prevCR = false;
            this.state = State.QuoteSeen;
            i++;
          }
          break;
        }
        case State.QuoteSeen: {
          const c = chunk.charCodeAt(i);
          if (c === QUOTE) {
            this.field += '"';
            this.recordChars++;
            this.state = State.Quoted;
            i++;
          } else if (c === delim) {
            this.fields.push(this.field);
            this.field = "";
            this.recordChars++;
            this.state = State.FieldStart;
            i++;
          } else if (c === CR || c === LF) {
            this.fields.push(this.field);
            this.field = "";
            this.newline(c);
            i++;
            this.finishRecord();
          } else {
            this.fail("text-after-closing-quote", `text after the closing '"' of a quoted field`);
          }
          break;
        }
        case State.Skip: {
          if (this.prevCR && chunk.charCodeAt(i) === LF) {
            // The fault was detected right after a CR inside quotes: this LF belongs to it.
            this.prevCR = false;
            i++;
            break;
          }
          this.prevCR = false;
          let j = i;
          let c = 0;
          while (j < n) {
            c = chunk.charCodeAt(j);
            if (c === CR || c === LF) break;
            j++;
          }
          i = j;
          if (j === n) break;
          this.newline(c);
          i++;
          this.flushError();
          break;
        }
      }
    }
  }

  /**
   * Signal end of input: emits the last record if it had no final line break,
   * or an `unterminated-quote` rejection if input ended inside quotes.
   * Further calls are ignored.
   */
  end(): void {
    if (this.ended) return;
    this.ended = true;
    switch (this.state) {
      case State.Quoted:
        this.fail(
          "unterminated-quote",
          `quoted field opened in the record starting on line ${this.recordLine} is never closed (end of input)`,
        );
        this.flushError();
        break;
      case State.Skip:
        this.flushError();
        break;
      case State.Unquoted:
      case State.QuoteSeen:
        this.fields.push(this.field);
        this.field = "";
        this.finishRecord();
        break;
      case State.FieldStart:
        if (this.inRecord) {
          // Input ended right after a delimiter: the last field is empty.
          this.fields.push("");
          this.finishRecord();
        }
        break;
    }
  }

  /** Count a line break character just consumed outside quotes. */
  private newline(c: number): void {
    this.line++;
    this.prevCR = c === CR;
  }

  private finishRecord(): void {
    const fields = this.fields;
    this.fields = [];
    this.inRecord = false;
    this.state = State.FieldStart;
    this.emit({ kind: "record", line: this.recordLine, fields });
  }

  /** Abandon the current record; the rest of its physical line is discarded. */
  private fail(code: CsvErrorCode, what: string): void {
    const errorLine = this.line;
    const where = errorLine === this.recordLine ? `line ${errorLine}` : `line ${errorLine} (record starts on line ${this.recordLine})`;
    this.pendingError = { code, errorLine, message: `${where}: ${what}` };
    this.fields = [];
    this.field = "";
    this.state = State.Skip;
  }

  private flushError(): void {
    const e = this.pendingError;
    this.pendingError = null;
    this.fields = [];
    this.field = "";
    this.inRecord = false;
    this.state = State.FieldStart;
    if (e !== null) {
      this.emit({ kind: "error", line: this.recordLine, errorLine: e.errorLine, code: e.code, message: e.message });
    }
  }
}

/**
 * Parse a whole CSV text held in memory (convenience for small inputs and tests).
 *
 * @param text - the CSV text.
 * @param options - dialect and limits, see {@link CsvOptions}.
 * @returns every record and rejected record, in input order.
 *
 * @example
 * ```ts
 * const items = parseCsv('a,b\r\n"x ""y""",2\r\n');
 * // [{ kind: "record", line: 1, fields: ["a", "b"] },
 * //  { kind: "record", line: 2, fields: ['x "y"', "2"] }]
 * ```
 */
export function parseCsv(text: string, options: CsvOptions = {}): CsvItem[] {
  const out: CsvItem[] = [];
  const p = new CsvParser((item) => out.push(item), options);
  p.push(text);
  p.end();
  return out;
}

/**
 * Read CSV records from any async source of text or byte chunks, e.g. a Node
 * `Readable` from `fs.createReadStream(path, { encoding: "utf8" })` or
 * `process.stdin`. Byte chunks are decoded as UTF-8 with a streaming decoder,
 * so a multi-byte character split across chunks is handled. Records are
 * yielded as soon as they are complete; at most one chunk's worth of records
 * is held at a time, so memory is flat in the file length.
 *
 * @param source - async iterable of `string` or `Uint8Array` chunks.
 * @param options - dialect and limits, see {@link CsvOptions}.
 * @returns an async iterator of records and rejected records.
 *
 * @example
 * ```ts
 * import { createReadStream } from "node:fs";
 * for await (const item of readCsv(createReadStream("stars.csv", { encoding: "utf8" }))) {
 *   if (item.kind === "error") console.error(item.message);
 *   else console.log(item.line, item.fields);
 * }
 * ```
 */
export async function* readCsv(
  source: AsyncIterable<string | Uint8Array>,
  options: CsvOptions = {},
): AsyncGenerator<CsvItem, void, undefined> {
  yield* parseChunks<CsvItem>(source, (sink) => new CsvParser(sink, options));
}
