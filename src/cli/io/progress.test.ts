import { describe, expect, it } from "vitest";
import { Progress } from "./progress";

function fakeStream(isTTY: boolean): { isTTY: boolean; out: string[]; write: (s: string) => boolean } {
  const out: string[] = [];
  return { isTTY, out, write: (s: string) => (out.push(s), true) };
}

describe("Progress", () => {
  it("writes nothing when the stream is not a TTY", () => {
    const s = fakeStream(false);
    const p = new Progress({ stream: s, now: () => 0 });
    p.update(10);
    p.done();
    expect(s.out).toEqual([]);
    expect(p.enabled).toBe(false);
  });

  it("throttles redraws to one per interval (fake clock) and clears at the end", () => {
    const s = fakeStream(true);
    let t = 0;
    const p = new Progress({ stream: s, now: () => t, intervalMs: 250, label: "reading", total: 1000 });
    t = 100;
    p.update(100); // first update always draws
    t = 200;
    p.update(200); // 100 ms later: skipped
    t = 349;
    p.update(300); // 249 ms after the last draw: skipped
    t = 350;
    p.update(350); // 250 ms: drawn
    expect(s.out).toEqual(["\rreading: 100 / 1,000 rows (10.0%)  1,000 rows/s", "\rreading: 350 / 1,000 rows (35.0%)  1,000 rows/s"]);
    p.done();
    const last = s.out.at(-1) ?? "";
    expect(last).toBe(`\r${" ".repeat(47)}\r`);
    expect(last.length - 2).toBe((s.out[1] ?? "").length - 1);
    p.done(); // second call writes nothing more
    expect(s.out).toHaveLength(3);
  });

  it("pads a shorter line over a longer one", () => {
    const s = fakeStream(true);
    let t = 1000;
    const p = new Progress({ stream: s, now: () => t, intervalMs: 0, unit: "stars" });
    t = 2000;
    p.update(123456, "eta 5 s");
    t = 3000;
    p.update(1);
    expect(s.out[0]).toBe("\rprogress: 123,456 stars  123,456 stars/s  eta 5 s");
    const second = s.out[1] ?? "";
    expect(second.length).toBe((s.out[0] ?? "").length);
    expect(second.trimEnd()).toBe("\rprogress: 1 stars  1 stars/s");
  });

  it("rejects bad options with RangeErrors naming them", () => {
    expect(() => new Progress({ stream: fakeStream(true), intervalMs: -1 })).toThrow(/intervalMs/);
    expect(() => new Progress({ stream: fakeStream(true), total: Number.NaN })).toThrow(/total/);
  });
});
