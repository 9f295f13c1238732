import { describe, expect, it } from "vitest";
import { C, H, K_B } from "../../values/constants";
import { C2_HI, C2_LO, H_OVER_K_HI, ddDivProduct, ddMulDiv, dd, exactDecimalOf, rationalToDD } from "./exact";
import fx from "../../../test/fixtures/planck_constants.json";

describe("exact constants", () => {
  it("the shortest decimal strings of h, c, k are the SI 2019 defining values (CODATA 2018, exact)", () => {
    // CODATA 2018: h = 6.626 070 15e-34 J s, c = 299 792 458 m/s, k = 1.380 649e-23 J/K (exact).
    expect(exactDecimalOf(H)).toEqual({ mant: 662607015n, exp10: -42 });
    expect(exactDecimalOf(C)).toEqual({ mant: 299792458n, exp10: 0 });
    expect(exactDecimalOf(K_B)).toEqual({ mant: 1380649n, exp10: -29 });
  });

  it("c₂ double-double agrees with the 30-digit mpmath value", () => {
    // test/fixtures/planck_constants.json (mpmath, 40 digits): c2 = 0.0143877687750393380214667160154
    expect(C2_HI).toBe(fx.values.c2); // correctly rounded high part
    // Low part: convert the 30-significant-digit reference string to a double-double
    // independently; the string is exact to ±5e-32 absolute (half its last digit),
    // so the low parts must agree to ~1e-31.
    const ref = rationalToDD(143877687750393380214667160154n, 10n ** 31n);
    expect(ref[0]).toBe(C2_HI);
    expect(Math.abs(C2_LO - ref[1])).toBeLessThan(1e-31);
    // h/k = 6.62607015e-34 / 1.380649e-23 = 4.79924307336622…e-11 s K (exact ratio, mpmath)
    expect(Math.abs(H_OVER_K_HI / 4.799243073366221e-11 - 1)).toBeLessThan(2.3e-16);
  });

  it("rationalToDD rounds 1/3 to hi + lo with |lo| ≤ ulp(hi)/2 and hi + lo ≈ 1/3 to 1e-32", () => {
    const [hi, lo] = rationalToDD(1n, 3n);
    expect(hi).toBe(1 / 3);
    // 1/3 − fl(1/3) = 1/3 − 6004799503160661/2^54 = 1/(3·2^54) exactly (hand derivation)
    expect(lo).toBe(1 / (3 * 2 ** 54));
  });

  it("ddDivProduct and ddMulDiv: K/(a·b) and K·a/b carry ~32 digits", () => {
    // 1/(3·1) with K = 1 + 0: lo must be the 1/(3·2^54) remainder as above
    ddDivProduct(1, 0, 3, 1);
    expect(dd.hi).toBe(1 / 3);
    expect(Math.abs(dd.lo - 1 / (3 * 2 ** 54))).toBeLessThan(1e-32);
    ddMulDiv(1, 0, 1, 3);
    expect(dd.hi).toBe(1 / 3);
    expect(Math.abs(dd.lo - 1 / (3 * 2 ** 54))).toBeLessThan(1e-32);
  });
});
