import fc from "fast-check";
import { describe, expect, test } from "vitest";
import type { Length, Time } from "./aliases";
import { abs, add, cbrt, div, ge, gt, inv, le, lt, max, min, mul, near, neg, pow, scale, sqrt, sub, sum } from "./arithmetic";
import { SI } from "./system";
import { units } from "./units";

const ULP = Number.EPSILON;
const pos = fc.double({ min: -20, max: 20, noNaN: true }).map((e) => 10 ** e);

describe("arithmetic is plain-number arithmetic", () => {
  test("values", () => {
    const a = SI.of(3, units.m);
    const b = SI.of(4, units.m);
    const t = SI.of(2, units.s);
    expect(add(a, b) as number).toBe(7);
    expect(sub(a, b) as number).toBe(-1);
    expect(mul(a, b) as number).toBe(12);
    expect(div(a, t) as number).toBe(1.5);
    expect(inv(t) as number).toBe(0.5);
    expect(pow(a, 2) as number).toBe(9);
    expect(pow(a, -2) as number).toBe(1 / 9);
    expect(pow(a, 0) as number).toBe(1);
    expect(sqrt(mul(b, b)) as number).toBe(4);
    expect(cbrt(pow(a, 3)) as number).toBe(3);
    expect(scale(a, 2) as number).toBe(6);
    expect(neg(a) as number).toBe(-3);
    expect(abs(neg(a)) as number).toBe(3);
    expect([lt(a, b), le(a, a), gt(a, b), ge(b, a)]).toEqual([true, true, false, true]);
    expect(min(a, b, a) as number).toBe(3);
    expect(max(a, b) as number).toBe(4);
    expect(near(SI.of(1000, units.m), SI.of(1, units.km), 1e-15)).toBe(true);
  });
  test("min and max propagate NaN rather than hiding it", () => {
    const a = SI.of(3, units.m);
    const n = SI.of(Number.NaN, units.m);
    expect(Number.isNaN(min(a, n))).toBe(true);
    expect(Number.isNaN(max(n, a))).toBe(true);
  });
  test("sum is compensated: 1 + 1e-16 × 10⁴ keeps the small terms", () => {
    const xs: Length<"SI">[] = [SI.of(1, units.m)];
    for (let i = 0; i < 10000; i++) xs.push(SI.of(1e-16, units.m));
    // naive summation returns exactly 1; the exact sum is 1 + 1e-12
    expect(Math.abs(sum(xs) - (1 + 1e-12))).toBeLessThan(2 * ULP);
  });
  test("property: multiplying then dividing restores the value within 1 ulp", () => {
    fc.assert(
      fc.property(pos, pos, (x, y) => {
        const a = SI.of(x, units.m);
        const t: Time = SI.of(y, units.s);
        const back = mul(div(a, t), t) as number;
        return Math.abs(back - x) <= ULP * x;
      }),
    );
  });
  test("property: sqrt(a²) = |a| and cbrt(a³) = a within 1 ulp", () => {
    fc.assert(
      fc.property(pos, (x) => {
        const a = SI.of(x, units.m);
        return Math.abs(sqrt(pow(a, 2)) - x) <= ULP * x && Math.abs(cbrt(pow(a, 3)) - x) <= 2 * ULP * x;
      }),
    );
  });
});
