import { describe, expect, it } from "vitest";
import { kinds } from "../quantity/aliases";
import { CGS, SI } from "../quantity/system";
import { lawInput } from "./input";

describe("lawInput: unit label and range bounds in messages", () => {
  it("a dimensionless input may carry a unit label (mag), printed where a coherent unit would be", () => {
    const m = lawInput("extinction", kinds.dimensionless, { check: "finite", unit: "mag" });
    expect(m.reason(SI, NaN)).toBe("extinction must be a finite number mag; got NaN");
    expect(m.reason(CGS, Infinity)).toBe("extinction must be a finite number mag; got Infinity");
    expect(m.unitIn(CGS)).toBe(" mag");
    // without a label a pure number prints no unit
    expect(lawInput("R_V", kinds.dimensionless).reason(SI, 0)).toBe("R_V must be a finite number > 0; got 0");
  });

  it("refuses a unit label on a dimensioned input (its unit is the caller's coherent unit)", () => {
    expect(() => lawInput("distance", kinds.length, { unit: "pc" })).toThrow(/^input distance: a unit label is only for dimensionless inputs/);
  });

  it("prints SI bounds exactly and CGS bounds to 15 digits (the ×10ᵏ adds its rounding)", () => {
    const w = lawInput("wavelength", kinds.length, { min: 1e-7, max: 1e-6 / 0.3 });
    expect(w.reason(SI, 5e-8)).toBe("wavelength must be in [1e-7, 0.0000033333333333333333] m; got 5e-8");
    // 1e-7 m × 100 is 0.000009999999999999999 in doubles
    expect(w.reason(CGS, 5e-6)).toBe("wavelength must be in [0.00001, 0.000333333333333333] cm; got 0.000005");
    // an angle needs no conversion: its bound is printed exactly in both systems
    const p = lawInput("parallax", kinds.angle, { min: Number.MIN_VALUE, max: Math.PI / 2 - 2 ** -52 });
    expect(p.reason(CGS, 2)).toBe("parallax must be in [5e-324, 1.5707963267948963] rad; got 2");
  });
});
