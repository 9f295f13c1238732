import { Writable } from "node:stream";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseCsv } from "./csv-read";
import { parseHeader } from "./header";
import { parseJsonl } from "./jsonl-read";
import {
  AlignedTableWriter,
  CsvWriter,
  JsonWriter,
  TextOut,
  csvField,
  displayWidth,
  formatCsvRow,
  formatSignificant,
  formatValueAsymmetric,
  formatValueUncertainty,
} from "./write";
import type { TextSink } from "./write";

/** A sink that records what reaches it (never applies back-pressure). */
function memorySink(): TextSink & { text: () => string; writes: number } {
  const parts: string[] = [];
  const sink = {
    writes: 0,
    write(chunk: string): boolean {
      parts.push(chunk);
      sink.writes++;
      return true;
    },
    once: () => sink,
    removeListener: () => sink,
    text: () => parts.join(""),
  };
  return sink;
}

describe("CSV writing", () => {
  it("quotes only when needed (RFC 4180 §2.6, §2.7)", () => {
    expect(csvField("plain text")).toBe("plain text");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField("cr\r")).toBe('"cr\r"');
    expect(csvField("a;b", ";")).toBe('"a;b"');
    expect(csvField("a,b", ";")).toBe("a,b");
  });

  it("formats rows with numbers, nulls and the chosen terminator", () => {
    expect(formatCsvRow(["Sun", 5772, null, undefined, 1e-7])).toBe("Sun,5772,,,1e-7\n");
    expect(formatCsvRow(["a", "b"], { eol: "\r\n", delimiter: ";" })).toBe("a;b\r\n");
    // A lone empty field must not become an empty line (which readers skip).
    expect(formatCsvRow([""])).toBe('""\n');
    expect(formatCsvRow([null])).toBe('""\n');
  });

  it("CsvWriter streams rows through TextOut and round-trips numbers exactly", async () => {
    const sink = memorySink();
    const w = new CsvWriter(new TextOut(sink, { bufferChars: 16 }));
    const values = [0.1 + 0.2, 5772, -1.5e-300, 6.02214076e23];
    await w.writeRow(["x [1]"]);
    for (const v of values) await w.writeRow([v]);
    await w.end();
    expect(sink.writes).toBeGreaterThan(1); // small buffer → several flushes
    const items = parseCsv(sink.text());
    expect(items.slice(1).map((it) => (it.kind === "record" ? Number(it.fields[0]) : NaN))).toEqual(values);
    expect(() => new CsvWriter(new TextOut(sink), { delimiter: "\n" })).toThrow(/delimiter/);
  });
});

describe("JSON writing", () => {
  it("writes JSON Lines readable by the JSONL reader, non-finite as null", async () => {
    const sink = memorySink();
    const w = new JsonWriter(new TextOut(sink));
    await w.writeRecord({ star: "Sun", teff: 5772 });
    await w.writeRecord({ star: "odd\nname", teff: Number.NaN });
    await w.end();
    expect(parseJsonl(sink.text()).map((it) => (it.kind === "record" ? it.value : null))).toEqual([
      { star: "Sun", teff: 5772 },
      { star: "odd\nname", teff: null },
    ]);
  });

  it("writes a valid JSON array, including the empty one", async () => {
    const sink = memorySink();
    const w = new JsonWriter(new TextOut(sink), { mode: "array" });
    await w.writeRecord({ a: 1 });
    await w.writeRecord({ a: 2 });
    await w.end();
    expect(JSON.parse(sink.text())).toEqual([{ a: 1 }, { a: 2 }]);
    const empty = memorySink();
    await new JsonWriter(new TextOut(empty), { mode: "array" }).end();
    expect(JSON.parse(empty.text())).toEqual([]);
  });
});

describe("TextOut back-pressure", () => {
  it("waits for drain when the stream is full and loses nothing", async () => {
    const received: string[] = [];
    let falseReturns = 0;
    const slow = new Writable({
      highWaterMark: 8,
      decodeStrings: false,
      write(chunk: string, _enc, cb) {
        received.push(chunk);
        setImmediate(cb);
      },
    });
    const origWrite = slow.write.bind(slow);
    slow.write = ((chunk: string) => {
      const ok = origWrite(chunk);
      if (!ok) falseReturns++;
      return ok;
    }) as typeof slow.write;
    const out = new TextOut(slow, { bufferChars: 10, closeSink: true });
    const w = new CsvWriter(out);
    for (let i = 0; i < 200; i++) await w.writeRow([i, "row"]);
    await w.end();
    expect(falseReturns).toBeGreaterThan(0); // back-pressure really happened
    expect(received.join("")).toBe(Array.from({ length: 200 }, (_, i) => `${i},row\n`).join(""));
    expect(slow.writableFinished).toBe(true);
  });

  it("rejects a bad buffer size", () => {
    expect(() => new TextOut(memorySink(), { bufferChars: 0 })).toThrow(/bufferChars/);
  });
});

describe("number formatting", () => {
  it("formatSignificant (values hand-rounded)", () => {
    expect(formatSignificant(5772.04, 3)).toBe("5770");
    expect(formatSignificant(5772.04, 6)).toBe("5772.04");
    expect(formatSignificant(0.012345, 2)).toBe("0.012");
    expect(formatSignificant(1.2345e-7, 3)).toBe("1.23e-7");
    expect(formatSignificant(-6.02214076e23, 4)).toBe("-6.022e23");
    expect(formatSignificant(999999, 3)).toBe("1.00e6"); // rounding carries into the next decade
    expect(formatSignificant(0, 3)).toBe("0.00");
    expect(formatSignificant(Number.NaN, 3)).toBe("NaN");
    expect(formatSignificant(-Infinity, 3)).toBe("-inf");
    expect(() => formatSignificant(1, 0)).toThrow(/digits/);
    expect(() => formatSignificant(1, 1.5)).toThrow(RangeError);
  });

  it("value ± uncertainty follows the GUM rounding convention", () => {
    // JCGM 100:2008 (GUM) §7.2.2 example: m_S = 100.02147 g, u_c = 0.35 mg → "(100.02147 ± 0.00035) g".
    expect(formatValueUncertainty(100.02147, 0.00035)).toBe("100.02147 ± 0.00035");
    expect(formatValueUncertainty(5772.04, 12.3)).toBe("5772 ± 12");
    expect(formatValueUncertainty(9602, 180)).toBe("9600 ± 180");
    expect(formatValueUncertainty(0.35214, 0.00137)).toBe("0.3521 ± 0.0014");
    expect(formatValueUncertainty(1.2344e-7, 5.61e-9)).toBe("(1.234 ± 0.056)e-7");
    expect(formatValueUncertainty(6.674e-11, 1.5e-15, 2)).toBe("(6.67400 ± 0.00015)e-11");
    expect(formatValueUncertainty(3.2, 0.123, 1)).toBe("3.2 ± 0.1");
    expect(formatValueUncertainty(1, 0)).toBe("1 ± 0");
    expect(formatValueUncertainty(1, Number.NaN)).toBe("1 ± NaN");
    expect(formatValueAsymmetric(4.438, 0.052, 0.031)).toBe("4.438 +0.052 -0.031");
    expect(() => formatValueUncertainty(1, 1, 0)).toThrow(/uncDigits/);
  });

  it("displayWidth counts code points", () => {
    expect(displayWidth("a±b")).toBe(3);
    expect(displayWidth("😀x")).toBe(2);
  });
});

describe("aligned text table", () => {
  const header = parseHeader(["star", "teff [K]", "sigma(teff) [K]", "logg [dex]"]);

  it("lays out ± columns, right-aligned numbers, left-aligned text, underline", async () => {
    const sink = memorySink();
    const t = new AlignedTableWriter(new TextOut(sink), header, { plusMinus: true, digits: 3 });
    expect(t.displayedHeaders).toEqual(["star", "teff [K]", "logg [dex]"]);
    await t.writeRow(["Sun", 5772, 0.8, 4.438]);
    await t.writeRow(["Vega", 9602, 180, 3.95]);
    await t.end();
    // Expected layout worked out by hand from the documented rules (gap 2, widths = widest cell).
    expect(sink.text()).toBe(
      [
        "star        teff [K]  logg [dex]",
        "----  --------------  ----------",
        "Sun   5772.00 ± 0.80        4.44",
        "Vega      9600 ± 180        3.95",
        "",
      ].join("\n"),
    );
  });

  it("without plusMinus keeps the uncertainty as its own column", async () => {
    const sink = memorySink();
    const t = new AlignedTableWriter(new TextOut(sink), header, { gap: 1 });
    await t.writeRow(["Sun", 5772, 0.8, null]);
    await t.end();
    expect(sink.text()).toBe(
      ["star teff [K] sigma(teff) [K] logg [dex]", "---- -------- --------------- ----------", "Sun      5772             0.8", ""].join("\n"),
    );
  });

  it("merges asymmetric sigma-(x)/sigma+(x) pairs", async () => {
    const cols = parseHeader(["logg [dex]", "sigma-(logg) [dex]", "sigma+(logg) [dex]"]);
    const sink = memorySink();
    const t = new AlignedTableWriter(new TextOut(sink), cols, { plusMinus: true });
    await t.writeRow([4.438, 0.031, 0.052]);
    await t.end();
    expect(sink.text()).toBe(["         logg [dex]", "-------------------", "4.438 +0.052 -0.031", ""].join("\n"));
  });

  it("streams after the sample; a wider later cell is printed whole, not cut", async () => {
    const sink = memorySink();
    const t = new AlignedTableWriter(new TextOut(sink), [{ name: "id" }, { name: "x" }], { sampleRows: 2 });
    await t.writeRow(["a", 1]);
    await t.writeRow(["b", 22]);
    // Header and first two rows are out (in the TextOut buffer) once the sample is full.
    await t.writeRow(["long-name", 333]);
    await t.end();
    expect(sink.text()).toBe(["id   x", "--  --", "a    1", "b   22", "long-name  333", ""].join("\n"));
  });

  it("explicit widths: nothing buffered, alignment judged on the first row", async () => {
    const sink = memorySink();
    const out = new TextOut(sink, { bufferChars: 1 });
    const t = new AlignedTableWriter(out, [{ name: "id" }, { name: "v", unit: "K" }], { widths: [4, 8] });
    await t.writeRow(["ab", "12.5"]);
    expect(sink.text()).toBe(["id       v [K]", "----  --------", "ab        12.5", ""].join("\n"));
    await t.end();
    expect(() => new AlignedTableWriter(out, [{ name: "id" }], { widths: [0] })).toThrow(/widths/);
    expect(() => new AlignedTableWriter(out, [{ name: "id" }], { sampleRows: 0 })).toThrow(/sampleRows/);
    expect(() => new AlignedTableWriter(out, [{ name: "id" }], { digits: 30 })).toThrow(/digits/);
  });

  it("empty table prints just the header", async () => {
    const sink = memorySink();
    await new AlignedTableWriter(new TextOut(sink), [{ name: "a" }, { name: "bb" }]).end();
    expect(sink.text()).toBe("a  bb\n-  --\n");
  });

  it("property: every line of the table has the header's column starts (cells no wider than the sample)", async () => {
    const cell = fc.oneof(fc.string({ unit: fc.constantFrom("a", "b", "±", "é"), maxLength: 6 }), fc.double({ noNaN: true, noDefaultInfinity: true }));
    await fc.assert(
      fc.asyncProperty(fc.array(fc.tuple(cell, cell), { minLength: 1, maxLength: 10 }), async (rows) => {
        const sink = memorySink();
        const t = new AlignedTableWriter(new TextOut(sink), [{ name: "p" }, { name: "q" }], { sampleRows: 100 });
        for (const r of rows) await t.writeRow(r);
        await t.end();
        const lines = sink.text().split("\n").slice(0, -1);
        const rule = lines[1] ?? "";
        const w0 = rule.indexOf(" ");
        // Column 2 starts at w0 + 2 on every line: the part before it is column 1 padded to w0, then the gap.
        for (const line of lines.slice(2)) {
          expect(displayWidth(line.slice(0, Math.min(line.length, w0 + 2)).padEnd(w0 + 2))).toBe(w0 + 2);
          expect(line.slice(w0, w0 + 2).trim()).toBe("");
        }
        expect(lines).toHaveLength(rows.length + 2);
      }),
      { numRuns: 50 },
    );
  });
});
