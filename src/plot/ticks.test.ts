import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { linearTicks, logTicks, niceStep, powerOfTenLabel } from "./ticks";

// Expected ticks are worked out by hand from the documented rules (1-2-5 steps, decades with 2…9 minors).

describe("log10 ticks", () => {
  it("1e-7…1e-5 gives the decades 1e-7, 1e-6, 1e-5 with 2…9 minors", () => {
    const t = logTicks(1e-7, 1e-5);
    expect(t.major).toEqual([1e-7, 1e-6, 1e-5]);
    expect(t.labels).toEqual(["10⁻⁷", "10⁻⁶", "10⁻⁵"]);
    expect(t.minor).toEqual([2e-7, 3e-7, 4e-7, 5e-7, 6e-7, 7e-7, 8e-7, 9e-7, 2e-6, 3e-6, 4e-6, 5e-6, 6e-6, 7e-6, 8e-6, 9e-6]);
  });

  it("uses plain labels when all decades are between 10⁻³ and 10⁴", () => {
    expect(logTicks(0.001, 1000).labels).toEqual(["0.001", "0.01", "0.1", "1", "10", "100", "1000"]);
    expect(logTicks(0.001, 1e5).labels[0]).toBe("10⁻³");
  });

  it("labels partial decades only where a decade falls inside", () => {
    const t = logTicks(3e2, 4e4);
    expect(t.major).toEqual([1e3, 1e4]);
    expect(t.minor[0]).toBe(300);
    expect(t.minor.at(-1)).toBe(40000);
  });

  it("labels 2 and 5 inside a single decade", () => {
    const t = logTicks(1.5, 8);
    expect(t.major).toEqual([2, 5]);
    expect(t.labels).toEqual(["2", "5"]);
    expect(t.minor).toEqual([3, 4, 6, 7, 8]);
  });

  it("labels 1, 2 and 5 × each decade over less than two decades (0.2–5 µm, 2500–40 000 K)", () => {
    const w = logTicks(0.2, 5);
    expect(w.major).toEqual([0.2, 0.5, 1, 2, 5]);
    expect(w.labels).toEqual(["0.2", "0.5", "1", "2", "5"]);
    expect(w.minor).toEqual([0.3, 0.4, 0.6, 0.7, 0.8, 0.9, 3, 4]);
    const t = logTicks(2500, 40000);
    expect(t.major).toEqual([5000, 10000, 20000]);
    expect(t.labels).toEqual(["5000", "10000", "20000"]);
    // Exactly two decades keeps decade labels only.
    expect(logTicks(0.1, 10).major).toEqual([0.1, 1, 10]);
  });

  it("falls back to linear ticks in a very narrow range", () => {
    const t = logTicks(3, 4);
    expect(t.major).toEqual([3, 3.2, 3.4, 3.6, 3.8, 4]);
  });

  it("thins the majors over many decades", () => {
    const t = logTicks(1e-30, 1e30);
    // 60 decades → every 6th decade labelled.
    expect(t.major).toEqual([1e-30, 1e-24, 1e-18, 1e-12, 1e-6, 1, 1e6, 1e12, 1e18, 1e24, 1e30]);
    expect(t.minor).toContain(1e-29);
    expect(t.minor).not.toContain(2e-29);
  });

  it("rejects non-positive or reversed ranges", () => {
    expect(() => logTicks(0, 1)).toThrow(/min must be > 0/);
    expect(() => logTicks(10, 1)).toThrow(/min must be < max/);
    expect(() => logTicks(1, Infinity)).toThrow(/max must be a finite/);
  });

  it("property: majors are powers of ten (or 1-2-5 multiples) inside the range, ascending", () => {
    fc.assert(
      fc.property(fc.double({ min: -200, max: 200, noNaN: true }), fc.double({ min: 0.05, max: 100, noNaN: true }), (lg, span) => {
        const min = 10 ** lg;
        const max = 10 ** (lg + span);
        fc.pre(Number.isFinite(max) && min > 0 && max > min * (1 + 1e-12));
        const t = logTicks(min, max);
        expect(t.major.length).toBe(t.labels.length);
        for (const v of [...t.major, ...t.minor]) {
          expect(v).toBeGreaterThanOrEqual(min * (1 - 1e-9));
          expect(v).toBeLessThanOrEqual(max * (1 + 1e-9));
        }
        for (let i = 1; i < t.major.length; i++) expect(t.major[i]).toBeGreaterThan(t.major[i - 1] ?? -Infinity);
        if (span < 1.9999) {
          // Less than two decades: the majors are the 1, 2, 5 × 10^n inside the range (when there are two or more).
          const expected: number[] = [];
          for (let e = Math.floor(lg) - 1; e <= Math.ceil(lg + span) + 1; e++) {
            for (const m of [1, 2, 5]) {
              const v = Number(`${m}e${e}`);
              if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) expected.push(v);
            }
          }
          if (expected.length >= 2) expect(t.major).toEqual(expected);
        }
        if (span >= 2.0001) {
          // Two decades or more: every major is 10^n (to printing precision).
          for (const v of t.major) {
            const e = Math.log10(v);
            expect(Math.abs(e - Math.round(e))).toBeLessThan(1e-12);
          }
        }
      }),
    );
  });
});

describe("linear ticks", () => {
  it("0…1 in steps of 0.2 with exact decimals", () => {
    const t = linearTicks(0, 1);
    expect(t.major).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(t.labels).toEqual(["0.0", "0.2", "0.4", "0.6", "0.8", "1.0"]);
    // Step 2 → 4 minor parts: 0.05 apart.
    expect(t.minor.slice(0, 3)).toEqual([0.05, 0.1, 0.15]);
  });

  it("chooses 1-2-5 steps", () => {
    expect(niceStep(15.9, 6)).toEqual([2, 0]);
    expect(niceStep(1, 10)).toEqual([1, -1]);
    expect(niceStep(30, 6)).toEqual([5, 0]);
    expect(niceStep(80, 10)).toEqual([1, 1]); // 8 rounds up to the next decade
    expect(linearTicks(-3.7, 12.2).major).toEqual([-2, 0, 2, 4, 6, 8, 10, 12]);
    expect(linearTicks(-3.7, 12.2).labels[0]).toBe("−2");
  });

  it("uses powers of ten for tiny steps and large values", () => {
    const t = linearTicks(0, 3e-5);
    expect(t.major).toEqual([0, 5e-6, 1e-5, 1.5e-5, 2e-5, 2.5e-5, 3e-5]);
    expect(t.labels).toEqual(["0", "5×10⁻⁶", "10⁻⁵", "1.5×10⁻⁵", "2×10⁻⁵", "2.5×10⁻⁵", "3×10⁻⁵"]);
    expect(linearTicks(0, 4e6, 4).labels).toEqual(["0", "10⁶", "2×10⁶", "3×10⁶", "4×10⁶"]);
  });

  it("rejects bad ranges", () => {
    expect(() => linearTicks(1, 1)).toThrow(/min must be < max/);
    expect(() => linearTicks(Number.NaN, 1)).toThrow(/min must be a finite/);
  });

  it("property: majors inside [min, max], evenly spaced by a 1-2-5 step, about `target` intervals", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: -8, max: 8, noNaN: true }),
        fc.integer({ min: 2, max: 12 }),
        (a, lgSpan, target) => {
          const min = a;
          const max = a + 10 ** lgSpan;
          fc.pre(max > min && (max - min) / Math.max(1, Math.abs(min)) > 1e-9);
          const t = linearTicks(min, max, target);
          const [m, p] = niceStep(max - min, target);
          const step = m * 10 ** p;
          expect([1, 2, 5]).toContain(m);
          // With a 1-2-5 step the interval count is within a factor ~2.5 of the target (+1 for rounding at the ends).
          const intervals = (max - min) / step;
          expect(intervals).toBeGreaterThan(target / 2.5 - 1e-9);
          expect(intervals).toBeLessThan(target * 2.5 + 1e-9);
          for (const v of t.major) {
            expect(v).toBeGreaterThanOrEqual(min - step * 1e-6);
            expect(v).toBeLessThanOrEqual(max + step * 1e-6);
          }
          for (let i = 1; i < t.major.length; i++) {
            // rel 1e-9: values are parsed decimal literals, so spacing is exact to a few ulps.
            expect(Math.abs((t.major[i] ?? 0) - (t.major[i - 1] ?? 0) - step)).toBeLessThan(step * 1e-9 + Math.abs(t.major[i] ?? 0) * 1e-15);
          }
        },
      ),
    );
  });

  it("powerOfTenLabel", () => {
    expect(powerOfTenLabel(-12)).toBe("10⁻¹²");
    expect(powerOfTenLabel(0)).toBe("10⁰");
  });
});
