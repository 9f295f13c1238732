/**
 * Streaming JSON Lines reader: one JSON object per line, lines ended by LF or
 * CRLF. Blank (whitespace-only) lines are skipped. A line that is not valid
 * JSON, or is valid JSON but not an object (array, string, number, null…), is
 * reported as an `error` item with its 1-based line number and reading goes
 * on: one bad line never aborts a run.
 *
 * Format reference: the JSON Lines convention (one RFC 8259 JSON text per
 * line, UTF-8), restricted here to objects because each line is a table row.
 *
 * @module
 */
import { parseChunks } from "./chunks";

/** A parsed line: its 1-based number and the object it holds. */
export interface JsonlRecord {
  readonly kind: "record";
  readonly line: number;
  readonly value: Record<string, unknown>;
}

/** A rejected line: its 1-based number and why. */
export interface JsonlRejected {
  readonly kind: "error";
  readonly line: number;
  readonly message: string;
}

/** One item produced by the JSON Lines reader. */
export type JsonlItem = JsonlRecord | JsonlRejected;

/** Options for {@link JsonlParser} and {@link readJsonl}. */
export interface JsonlOptions {
  /** Reject a line longer than this many characters (default 1 048 576); guards memory. */
  readonly maxLineChars?: number;
}

/**
 * Incremental JSON Lines parser: {@link JsonlParser.push} chunks split
 * anywhere, then {@link JsonlParser.end}; each line's result is passed to
 * `emit` as soon as its line break is seen.
 *
 * @example
 * ```ts
 * const items: JsonlItem[] = [];
 * const p = new JsonlParser((it) => items.push(it));
 * p.push('{"star":"Vega","teff":96');
 * p.push('02}\nnot json\n');
 * p.end();
 * // items = [{ kind: "record", line: 1, value: { star: "Vega", teff: 9602 } },
 * //          { kind: "error", line: 2, message: "line 2: invalid JSON (…)" }]
 * ```
 */
export class JsonlParser {
  private readonly emit: (item: JsonlItem) => void;
  private readonly maxChars: number;
  private parts: string[] = [];
  private partsChars = 0;
  private tooLong = false;
  private line = 1;
  private started = false;
  private ended = false;

  /**
   * @param emit - receives each record or rejected line.
   * @param options - see {@link JsonlOptions}.
   * @throws RangeError if `maxLineChars` is not a positive integer.
   */
  constructor(emit: (item: JsonlItem) => void, options: JsonlOptions = {}) {
    const max = options.maxLineChars ?? 1_048_576;
    if (!Number.isInteger(max) || max < 1) {
      throw new RangeError(`maxLineChars must be a positive integer; got ${String(max)}`);
    }
    this.emit = emit;
    this.maxChars = max;
  }

  /** Feed the next chunk of text. */
  push(chunk: string): void {
    if (this.ended) throw new Error("JsonlParser.push called after end()");
    let start = 0;
    if (!this.started && chunk.length > 0) {
      this.started = true;
      if (chunk.charCodeAt(0) === 0xfeff) start = 1;
    }
    for (;;) {
      const nl = chunk.indexOf("\n", start);
      if (nl === -1) {
        this.append(chunk.slice(start));
        return;
      }
      this.append(chunk.slice(start, nl));
      this.finishLine();
      start = nl + 1;
    }
  }

  /** Signal end of input; a last line without a line break is still parsed. */
  end(): void {
    if (this.ended) return;
    this.ended = true;
    if (this.partsChars > 0 || this.tooLong) this.finishLine();
  }

  private append(s: string): void {
    if (s.length === 0 || this.tooLong) return;
    this.partsChars += s.length;
    if (this.partsChars > this.maxChars) {
      this.tooLong = true;
      this.parts = [];
      return;
    }
    this.parts.push(s);
  }

  private finishLine(): void {
    const line = this.line++;
    if (this.tooLong) {
      this.tooLong = false;
      this.parts = [];
      this.partsChars = 0;
      this.emit({ kind: "error", line, message: `line ${line}: longer than ${this.maxChars} characters` });
      return;
    }
    let text = this.parts.length === 1 ? (this.parts[0] ?? "") : this.parts.join("");
    this.parts = [];
    this.partsChars = 0;
    if (text.endsWith("\r")) text = text.slice(0, -1);
    if (text.trim() === "") return;
    let value: unknown;
    try {
      value = JSON.parse(text);
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      this.emit({ kind: "error", line, message: `line ${line}: invalid JSON (${why})` });
      return;
    }
    if (typeof value !== "object" || value === null || Array.isArray(value)) {
      const what = value === null ? "null" : Array.isArray(value) ? "an array" : `a ${typeof value}`;
      this.emit({ kind: "error", line, message: `line ${line}: expected a JSON object, got ${what}` });
      return;
    }
    this.emit({ kind: "record", line, value: value as Record<string, unknown> });
  }
}

/**
 * Parse a whole JSON Lines text held in memory.
 *
 * @example
 * ```ts
 * parseJsonl('{"a":1}\n\n[2]\n');
 * // [{ kind: "record", line: 1, value: { a: 1 } },
 * //  { kind: "error", line: 3, message: "line 3: expected a JSON object, got an array" }]
 * ```
 */
export function parseJsonl(text: string, options: JsonlOptions = {}): JsonlItem[] {
  const out: JsonlItem[] = [];
  const p = new JsonlParser((it) => out.push(it), options);
  p.push(text);
  p.end();
  return out;
}

/**
 * Read JSON Lines from an async source of text or UTF-8 byte chunks (e.g. a
 * Node `Readable` such as `fs.createReadStream(path, { encoding: "utf8" })`),
 * yielding each line's result as soon as the chunk containing its end has
 * arrived. Memory is bounded by one chunk plus the longest line.
 *
 * @example
 * ```ts
 * import { createReadStream } from "node:fs";
 * for await (const item of readJsonl(createReadStream("stars.jsonl", { encoding: "utf8" }))) {
 *   if (item.kind === "record") console.log(item.value);
 * }
 * ```
 */
export async function* readJsonl(
  source: AsyncIterable<string | Uint8Array>,
  options: JsonlOptions = {},
): AsyncGenerator<JsonlItem, void, undefined> {
  yield* parseChunks<JsonlItem>(source, (sink) => new JsonlParser(sink, options));
}
