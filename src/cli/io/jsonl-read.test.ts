import { Readable } from "node:stream";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { JsonlParser, parseJsonl, readJsonl } from "./jsonl-read";
import type { JsonlItem } from "./jsonl-read";

const summary = (items: JsonlItem[]): [number, unknown][] =>
  items.map((it) => [it.line, it.kind === "record" ? it.value : "ERROR"]);

describe("JSON Lines reader", () => {
  it("parses one object per line, LF or CRLF, with or without a final break", () => {
    expect(summary(parseJsonl('{"a":1}\r\n{"b":"x\\ny"}'))).toEqual([
      [1, { a: 1 }],
      [2, { b: "x\ny" }],
    ]);
  });

  it("skips blank lines but keeps counting them", () => {
    expect(summary(parseJsonl('\n  \n{"a":1}\n\r\n{"a":2}\n'))).toEqual([
      [3, { a: 1 }],
      [5, { a: 2 }],
    ]);
  });

  it("reports bad lines with their numbers and goes on", () => {
    const items = parseJsonl('{"a":1}\n{"a":\n[1,2]\n42\nnull\n"s"\n{"ok":true}\n');
    expect(summary(items)).toEqual([
      [1, { a: 1 }],
      [2, "ERROR"],
      [3, "ERROR"],
      [4, "ERROR"],
      [5, "ERROR"],
      [6, "ERROR"],
      [7, { ok: true }],
    ]);
    const messages = items.flatMap((it) => (it.kind === "error" ? [it.message] : []));
    expect(messages[0]).toMatch(/^line 2: invalid JSON/);
    expect(messages[1]).toBe("line 3: expected a JSON object, got an array");
    expect(messages[2]).toBe("line 4: expected a JSON object, got a number");
    expect(messages[3]).toBe("line 5: expected a JSON object, got null");
    expect(messages[4]).toBe("line 6: expected a JSON object, got a string");
  });

  it("drops a leading BOM", () => {
    expect(summary(parseJsonl('\uFEFF{"a":1}\n'))).toEqual([[1, { a: 1 }]]);
  });

  it("rejects overlong lines without keeping them", () => {
    const items = parseJsonl(`{"a":"${"x".repeat(100)}"}\n{"b":2}\n`, { maxLineChars: 50 });
    expect(summary(items)).toEqual([
      [1, "ERROR"],
      [2, { b: 2 }],
    ]);
    expect(() => new JsonlParser(() => undefined, { maxLineChars: -1 })).toThrow(/maxLineChars/);
  });

  it("property: random objects, random chunk cuts → the same objects and line numbers", () => {
    const obj = fc.dictionary(fc.string({ maxLength: 5 }), fc.oneof(fc.string(), fc.integer(), fc.boolean(), fc.constant(null)), {
      maxKeys: 4,
    });
    fc.assert(
      fc.property(fc.array(obj, { maxLength: 10 }), fc.array(fc.nat(400), { maxLength: 6 }), (objs, cuts) => {
        // JSON.stringify escapes control characters, so each object takes exactly one line.
        const text = objs.map((o) => JSON.stringify(o) + "\n").join("");
        const out: JsonlItem[] = [];
        const p = new JsonlParser((it) => out.push(it));
        let prev = 0;
        for (const c of cuts.map((x) => Math.min(x, text.length)).sort((a, b) => a - b)) {
          p.push(text.slice(prev, c));
          prev = c;
        }
        p.push(text.slice(prev));
        p.end();
        expect(summary(out)).toEqual(objs.map((o, i) => [i + 1, o]));
      }),
    );
  });

  it("reads from a stream of UTF-8 bytes", async () => {
    const bytes = new TextEncoder().encode('{"name":"α Lyr"}\n{"name":"😀"}\n');
    const got: JsonlItem[] = [];
    for await (const it of readJsonl(Readable.from([bytes.slice(0, 11), bytes.slice(11, 22), bytes.slice(22)]))) got.push(it);
    expect(summary(got)).toEqual([
      [1, { name: "α Lyr" }],
      [2, { name: "😀" }],
    ]);
  });
});
