import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { D, exactDecimal, isNearest, positiveDouble } from "./law.test-util";
import { exactScale } from "./scale";

describe("ExactScale: one correctly rounded operation by an exact power of ten", () => {
  it("apply(v) is the double nearest to v × 10ⁿ, and invert(v) to v × 10⁻ⁿ, for |n| ≤ 22 (checked exactly with decimal.js)", () => {
    // 10^|n| is an exact double for |n| ≤ 22 (5^22 < 2^53), so v·10^n or v/10^-n is one IEEE operation,
    // correctly rounded by definition; a multiply by the inexact double nearest 10^-7 would not be.
    fc.assert(
      fc.property(positiveDouble, fc.integer({ min: -22, max: 22 }), fc.boolean(), (x, n, negative) => {
        const v = negative ? -x : x;
        const s = exactScale(n);
        const up = s.apply(v);
        const down = s.invert(v);
        const p = new D(10).pow(n);
        if (up - up === 0) expect(isNearest(up, exactDecimal(v).times(p))).toBe(true);
        else expect(exactDecimal(v).times(p).abs().gte(exactDecimal(Number.MAX_VALUE))).toBe(true);
        if (down - down === 0) expect(isNearest(down, exactDecimal(v).div(p))).toBe(true);
        else expect(exactDecimal(v).div(p).abs().gte(exactDecimal(Number.MAX_VALUE))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("the scales the systems use are exact: 10^7 and 10^-7 are not the same operation (1e-7 is not an exact double)", () => {
    const s = exactScale(-7);
    expect(s.div).toBe(1e7);
    expect(s.mul).toBe(1);
    // a value where multiplying by the double nearest 1e-7 and dividing by 1e7 differ
    expect(s.apply(13)).toBe(1.3e-6);
    expect(13 * 1e-7).toBe(0.0000012999999999999998);
    expect(isNearest(s.apply(13), new D(13).div(new D(10).pow(7)))).toBe(true);
    expect(isNearest(13 * 1e-7, new D(13).div(new D(10).pow(7)))).toBe(false);
    expect(exactScale(0).apply(-0)).toBe(-0);
  });
});
