import { mkdtempSync, rmSync, writeFileSync, createReadStream } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Readable } from "node:stream";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CsvParser, parseCsv, readCsv } from "./csv-read";
import type { CsvItem } from "./csv-read";
import { formatCsvRow } from "./write";

/** Records only, as [line, fields] pairs. */
const recs = (items: CsvItem[]): [number, string[]][] =>
  items.map((it) => (it.kind === "record" ? [it.line, it.fields] : [it.line, [`ERROR:${it.code}`]]));

/** Parse `text` fed in pieces cut at the given offsets. */
function parseChunked(text: string, cuts: number[]): CsvItem[] {
  const out: CsvItem[] = [];
  const p = new CsvParser((it) => out.push(it));
  let prev = 0;
  for (const c of [...cuts].sort((a, b) => a - b)) {
    p.push(text.slice(prev, c));
    prev = c;
  }
  p.push(text.slice(prev));
  p.end();
  return out;
}

/**
 * Independent encoder for the oracle tests: quotes EVERY field (RFC 4180 §2.5
 * allows it) and ends every record with CRLF (§2.1), unlike the writer under
 * test, which quotes only when needed and uses LF.
 */
const encodeAllQuoted = (rows: string[][]): string =>
  rows.map((r) => r.map((f) => `"${f.split('"').join('""')}"`).join(",") + "\r\n").join("");

/** Line breaks (CRLF, CR or LF each count once) in a text. */
const breaks = (s: string): number => (s.match(/\r\n|\r|\n/g) ?? []).length;

// Alphabet heavy in the characters that matter to CSV, plus non-ASCII (2-unit emoji).
const unit = fc.constantFrom("a", "b", ",", '"', "\r", "\n", " ", "é", "😀");
const field = fc.string({ unit, maxLength: 6 });
const table = fc.array(fc.array(field, { minLength: 1, maxLength: 5 }), { maxLength: 8 });

describe("RFC 4180 cases (examples from RFC 4180 §2 and hand-written edge cases)", () => {
  it("splits plain records, with or without a final line break", () => {
    expect(recs(parseCsv("aaa,bbb,ccc\nzzz,yyy,xxx\n"))).toEqual([
      [1, ["aaa", "bbb", "ccc"]],
      [2, ["zzz", "yyy", "xxx"]],
    ]);
    expect(recs(parseCsv("aaa,bbb,ccc\nzzz,yyy,xxx"))).toEqual([
      [1, ["aaa", "bbb", "ccc"]],
      [2, ["zzz", "yyy", "xxx"]],
    ]);
  });

  it("accepts CRLF, LF and lone CR terminators", () => {
    expect(recs(parseCsv("a,b\r\nc,d\r\n"))).toEqual([
      [1, ["a", "b"]],
      [2, ["c", "d"]],
    ]);
    expect(recs(parseCsv("a\rb\r\nc\nd"))).toEqual([
      [1, ["a"]],
      [2, ["b"]],
      [3, ["c"]],
      [4, ["d"]],
    ]);
  });

  it("keeps a delimiter inside quotes", () => {
    expect(recs(parseCsv('"aaa","b,bb","ccc"'))).toEqual([[1, ["aaa", "b,bb", "ccc"]]]);
  });

  it("keeps line breaks inside quotes and numbers lines by record start", () => {
    const items = parseCsv('h1,h2\n"x\r\ny\nz",b\nc,"d\re"\nlast,1\n');
    expect(recs(items)).toEqual([
      [1, ["h1", "h2"]],
      [2, ["x\r\ny\nz", "b"]],
      [5, ["c", "d\re"]],
      [7, ["last", "1"]],
    ]);
  });

  it("turns a doubled quote into one quote", () => {
    expect(recs(parseCsv('"aaa","b""bb","ccc"\n""""\n'))).toEqual([
      [1, ["aaa", 'b"bb', "ccc"]],
      [2, ['"']],
    ]);
  });

  it("handles empty fields in every position", () => {
    expect(recs(parseCsv(",a,,b,\n,\n\"\",\"\"\n"))).toEqual([
      [1, ["", "a", "", "b", ""]],
      [2, ["", ""]],
      [3, ["", ""]],
    ]);
    // Input ending right after a delimiter: the last field is empty.
    expect(recs(parseCsv("a,"))).toEqual([[1, ["a", ""]]]);
  });

  it("skips empty lines by default but a quoted empty field is a record", () => {
    expect(recs(parseCsv("a\n\n\r\n\"\"\nb\n"))).toEqual([
      [1, ["a"]],
      [4, [""]],
      [5, ["b"]],
    ]);
    expect(recs(parseCsv("a\n\nb", { skipEmptyLines: false }))).toEqual([
      [1, ["a"]],
      [2, [""]],
      [3, ["b"]],
    ]);
  });

  it("drops a byte order mark only at the very start", () => {
    expect(recs(parseCsv("\uFEFFteff [K],x\n1,\uFEFF2\n"))).toEqual([
      [1, ["teff [K]", "x"]],
      [2, ["1", "\uFEFF2"]],
    ]);
  });

  it("keeps spaces (RFC 4180 §2.4: spaces are part of a field)", () => {
    expect(recs(parseCsv(" a , b \n"))).toEqual([[1, [" a ", " b "]]]);
  });

  it("supports another delimiter", () => {
    expect(recs(parseCsv('a\tb,c\t"d\te"\n', { delimiter: "\t" }))).toEqual([[1, ["a", "b,c", "d\te"]]]);
  });

  it("produces nothing for empty input", () => {
    expect(parseCsv("")).toEqual([]);
    expect(parseCsv("\n\r\n")).toEqual([]);
    expect(parseCsv("\uFEFF")).toEqual([]);
  });
});

describe("strict errors are reported as rejected records with line numbers", () => {
  it("rejects a quote inside an unquoted field and resumes on the next line", () => {
    const items = parseCsv('a,b\nab"c,d\ne,f\n');
    expect(items[1]).toMatchObject({ kind: "error", code: "quote-in-unquoted-field", line: 2, errorLine: 2 });
    expect(items[1]?.kind === "error" && items[1].message).toMatch(/line 2/);
    expect(recs(items)).toEqual([
      [1, ["a", "b"]],
      [2, ["ERROR:quote-in-unquoted-field"]],
      [3, ["e", "f"]],
    ]);
  });

  it("rejects text after a closing quote, naming both lines when the record spans several", () => {
    const items = parseCsv('x\n"multi\nline"z,1\nok\n');
    expect(items[1]).toMatchObject({ kind: "error", code: "text-after-closing-quote", line: 2, errorLine: 3 });
    expect(items[1]?.kind === "error" && items[1].message).toMatch(/line 3 \(record starts on line 2\)/);
    expect(recs(items)[2]).toEqual([4, ["ok"]]);
  });

  it("rejects an unterminated quote at end of input with the record's line", () => {
    const items = parseCsv('a\nb\n"never closed,\nmore\n');
    expect(items).toHaveLength(3);
    expect(items[2]).toMatchObject({ kind: "error", code: "unterminated-quote", line: 3 });
    expect(items[2]?.kind === "error" && items[2].message).toMatch(/line 3/);
  });

  it("bounds memory with maxRecordChars", () => {
    const items = parseCsv(`${"x".repeat(50)}\nshort\n"${"y".repeat(50)}\nz\n`, { maxRecordChars: 20 });
    expect(recs(items)).toEqual([
      [1, ["ERROR:record-too-long"]],
      [2, ["short"]],
      [3, ["ERROR:record-too-long"]],
      [4, ["z"]],
    ]);
  });

  it("rejects bad options with a RangeError naming the option", () => {
    expect(() => parseCsv("a", { delimiter: '"' })).toThrow(/delimiter/);
    expect(() => parseCsv("a", { delimiter: ";;" })).toThrow(RangeError);
    expect(() => parseCsv("a", { maxRecordChars: 0 })).toThrow(/maxRecordChars/);
  });

  it("refuses push after end", () => {
    const p = new CsvParser(() => undefined);
    p.end();
    expect(() => p.push("a")).toThrow(/after end/);
  });
});

describe("chunk boundaries never change the result", () => {
  const tricky = '\uFEFFa,"b\r\nc",""""\r\n\r\n"x""y",z\r"q"\n,\nend"';

  it("every two-chunk split of a tricky text (exhaustive)", () => {
    const whole = parseCsv(tricky);
    expect(whole.length).toBe(5); // hand-counted: 4 records + 1 error
    for (let k = 0; k <= tricky.length; k++) expect(parseChunked(tricky, [k])).toEqual(whole);
  });

  it("one character at a time", () => {
    const cuts = Array.from({ length: tricky.length }, (_, i) => i);
    expect(parseChunked(tricky, cuts)).toEqual(parseCsv(tricky));
  });

  it("property: same with a tiny maxRecordChars (the overflow point must not depend on chunking)", () => {
    const opts = { maxRecordChars: 5 };
    fc.assert(
      fc.property(fc.string({ unit, maxLength: 40 }), fc.array(fc.nat(40), { maxLength: 6 }), (text, cuts) => {
        const out: CsvItem[] = [];
        const p = new CsvParser((it) => out.push(it), opts);
        let prev = 0;
        for (const c of cuts.map((x) => Math.min(x, text.length)).sort((a, b) => a - b)) {
          p.push(text.slice(prev, c));
          prev = c;
        }
        p.push(text.slice(prev));
        p.end();
        expect(out).toEqual(parseCsv(text, opts));
      }),
      { numRuns: 300 },
    );
  });

  it("property: random text (valid or not), random cuts → same items as whole", () => {
    fc.assert(
      fc.property(fc.string({ unit, maxLength: 60 }), fc.array(fc.nat(60), { maxLength: 8 }), (text, cuts) => {
        const c = cuts.map((x) => Math.min(x, text.length));
        expect(parseChunked(text, c)).toEqual(parseCsv(text));
      }),
      { numRuns: 300 },
    );
  });
});

describe("oracles independent of the writer", () => {
  it("property: an all-quoted CRLF encoding parses back to the table, with line numbers", () => {
    fc.assert(
      fc.property(table, (rows) => {
        const text = encodeAllQuoted(rows);
        const items = parseCsv(text);
        // Expected start line of record k = 1 + line breaks in the encoding of records before it.
        let prefix = "";
        const expected = rows.map((r) => {
          const line = 1 + breaks(prefix);
          prefix += encodeAllQuoted([r]);
          return [line, r] as [number, string[]];
        });
        expect(recs(items)).toEqual(expected);
      }),
      { numRuns: 200 },
    );
  });

  it("property: writer → reader round trip (minimal quoting, LF)", () => {
    fc.assert(
      fc.property(table, fc.array(fc.nat(200), { maxLength: 5 }), (rows, cuts) => {
        const text = rows.map((r) => formatCsvRow(r)).join("");
        const items = parseChunked(
          text,
          cuts.map((c) => Math.min(c, text.length)),
        );
        expect(items.map((it) => (it.kind === "record" ? it.fields : null))).toEqual(rows);
      }),
      { numRuns: 200 },
    );
  });
});

describe("readCsv over streams", () => {
  it("reads a file through fs.createReadStream with tiny chunks", async () => {
    const dir = mkdtempSync(join(tmpdir(), "starlume-csv-"));
    try {
      const path = join(dir, "t.csv");
      writeFileSync(path, '\uFEFFstar,teff [K]\r\n"Sun, the",5772\r\n"Vega\nα Lyr",9602\r\nbad"row,1\r\n', "utf8");
      const got: CsvItem[] = [];
      for await (const it of readCsv(createReadStream(path, { encoding: "utf8", highWaterMark: 5 }))) got.push(it);
      expect(recs(got)).toEqual([
        [1, ["star", "teff [K]"]],
        [2, ["Sun, the", "5772"]],
        [3, ["Vega\nα Lyr", "9602"]],
        [5, ["ERROR:quote-in-unquoted-field"]],
      ]);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("decodes UTF-8 bytes split inside a multi-byte character", async () => {
    const bytes = new TextEncoder().encode("é,😀\nα,β\n");
    // Cut after the first byte of "é" and inside the 4-byte emoji.
    const chunks = [bytes.slice(0, 1), bytes.slice(1, 4), bytes.slice(4, 6), bytes.slice(6)];
    const got: CsvItem[] = [];
    for await (const it of readCsv(Readable.from(chunks))) got.push(it);
    expect(recs(got)).toEqual([
      [1, ["é", "😀"]],
      [2, ["α", "β"]],
    ]);
  });

  it("yields records before the source is exhausted (streaming, not buffering)", async () => {
    let pulled = 0;
    async function* source(): AsyncGenerator<string> {
      for (let i = 0; i < 1000; i++) {
        pulled++;
        yield `${i},x\n`;
      }
    }
    const it = readCsv(source());
    const first = await it.next();
    expect(first.value).toEqual({ kind: "record", line: 1, fields: ["0", "x"] });
    expect(pulled).toBe(1);
    await it.return(undefined);
  });
});
