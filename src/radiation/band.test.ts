import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fx from "../../test/fixtures/planck_band_fraction.json";
import typed from "../../test/fixtures/radiation_typed.json";
import { constants } from "../constants/index";
import { CGS, SI } from "../quantity/system";
import { units } from "../quantity/units";
import { assume, type Frequency, type Length, type Temperature } from "../quantity/index";
import * as K from "./kernels/band-fraction";
import {
  bandPhotonRadianceWavelength,
  bandRadianceWavelength,
  blackbodyFractionAboveFrequency,
  blackbodyFractionAboveWavelength,
  blackbodyFractionBelowFrequency,
  blackbodyFractionBelowWavelength,
  blackbodyFractionBetweenWavelengths,
  blackbodyPhotonFractionAboveFrequency,
  blackbodyPhotonFractionAboveWavelength,
  blackbodyPhotonFractionBelowFrequency,
  blackbodyPhotonFractionBelowWavelength,
  blackbodyPhotonFractionBetweenWavelengths,
} from "./band";
import { lambertianExitance } from "./planck";
import { photonExitance, stefanBoltzmannExitance } from "./stefan-boltzmann";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));
const T = (k: number) => assume<Temperature>(k);
const cm = (v: number) => assume<Length<"CGS">>(v);
const m = (v: number) => assume<Length<"SI">>(v);
const hz = (v: number) => assume<Frequency>(v);
const C = 299792458;

interface Single {
  lambda: number;
  T: number;
  x: number;
  photonAbove: number | null;
  above: number | null;
}
const single = (fx as unknown as { single: Single[] }).single;

describe("typed band fractions agree with the SI kernels", () => {
  it("SI: identical numbers; CGS: the kernel at λ_cm/100, unchanged (fractions are pure numbers)", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1.01, 10), logUniform(1, 1e6), (lcm, k, t) => {
        const l = lcm / 100;
        const l2cm = lcm * k;
        expect(blackbodyFractionBelowWavelength(SI, m(l), T(t))).toBe(K.blackbodyFractionBelowWavelengthSI(l, t));
        expect(blackbodyFractionBelowWavelength(CGS, cm(lcm), T(t))).toBe(K.blackbodyFractionBelowWavelengthSI(l, t));
        expect(blackbodyFractionAboveWavelength(CGS, cm(lcm), T(t))).toBe(K.blackbodyFractionAboveWavelengthSI(l, t));
        expect(blackbodyPhotonFractionBelowWavelength(CGS, cm(lcm), T(t))).toBe(K.blackbodyPhotonFractionBelowWavelengthSI(l, t));
        expect(blackbodyPhotonFractionAboveWavelength(CGS, cm(lcm), T(t))).toBe(K.blackbodyPhotonFractionAboveWavelengthSI(l, t));
        expect(blackbodyFractionBetweenWavelengths(CGS, cm(lcm), cm(l2cm), T(t))).toBe(
          K.blackbodyFractionBetweenWavelengthsSI(l, l2cm / 100, t),
        );
        expect(blackbodyPhotonFractionBetweenWavelengths(CGS, cm(lcm), cm(l2cm), T(t))).toBe(
          K.blackbodyPhotonFractionBetweenWavelengthsSI(l, l2cm / 100, t),
        );
        const nu = C / l;
        expect(blackbodyFractionAboveFrequency(CGS, hz(nu), T(t))).toBe(K.blackbodyFractionAboveFrequencySI(nu, t));
        expect(blackbodyFractionBelowFrequency(CGS, hz(nu), T(t))).toBe(K.blackbodyFractionBelowFrequencySI(nu, t));
        expect(blackbodyPhotonFractionAboveFrequency(SI, hz(nu), T(t))).toBe(K.blackbodyPhotonFractionAboveFrequencySI(nu, t));
      }),
      { numRuns: 100 },
    );
  });

  it("band radiance: erg s⁻¹ cm⁻² sr⁻¹ = 1000 × W m⁻² sr⁻¹; photon radiance per cm² = per m² ÷ 10⁴, exactly", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1.01, 10), logUniform(1, 1e6), (lcm, k, t) => {
        const l1 = lcm / 100;
        const l2 = (lcm * k) / 100;
        expect(bandRadianceWavelength(SI, m(l1), m(l2), T(t))).toBe(K.bandRadianceWavelengthSI(l1, l2, t));
        expect(bandRadianceWavelength(CGS, cm(lcm), cm(lcm * k), T(t))).toBe(K.bandRadianceWavelengthSI(l1, l2, t) * 1000);
        expect(bandPhotonRadianceWavelength(CGS, cm(lcm), cm(lcm * k), T(t))).toBe(K.bandPhotonRadianceWavelengthSI(l1, l2, t) / 1e4);
      }),
      { numRuns: 100 },
    );
  });
});

describe("photon fraction below a frequency (composed in the typed layer)", () => {
  it("equals the mpmath photon fraction above λ = c/ν (test/fixtures/planck_band_fraction.json) to 1e-13", () => {
    // Source: mpmath polylog at 40 digits. ν = c/λ and then λ' = c/ν add two roundings (≤ 2.3e-16 in x);
    // on the long-wave side the fraction's sensitivity d ln F/d ln x is ≤ 2 (→ 2 for x → 0), and where the
    // fraction is near 1 it is flat, so ~5e-16 + the kernel's own ≤ 1e-15: 1e-13 is generous but far
    // below any use. Measured worst is logged.
    let worst = 0;
    let n = 0;
    for (const r of single) {
      if (r.photonAbove === null) continue;
      const nu = C / r.lambda;
      const v = blackbodyPhotonFractionBelowFrequency(CGS, hz(nu), T(r.T));
      worst = Math.max(worst, Math.abs(v / r.photonAbove - 1));
      n++;
    }
    console.log(`photon fraction below ν: worst relative error ${worst.toExponential(2)} over ${n} fixture rows`);
    expect(n).toBeGreaterThan(100);
    expect(worst).toBeLessThan(1e-13);
  });
  it("complements the photon fraction above ν (sum 1 to 2 ulp) and is 0 for ν below c/MAX_VALUE", () => {
    fc.assert(
      fc.property(logUniform(1e8, 1e17), logUniform(1, 1e6), (nu, t) => {
        const s = blackbodyPhotonFractionBelowFrequency(SI, hz(nu), T(t)) + blackbodyPhotonFractionAboveFrequency(SI, hz(nu), T(t));
        expect(Math.abs(s - 1)).toBeLessThan(4.5e-16);
      }),
      { numRuns: 100 },
    );
    expect(blackbodyPhotonFractionBelowFrequency(SI, hz(1e-301), T(1e-2))).toBe(0);
  });
});

describe("physics through the typed API", () => {
  it("fractions below + above = 1 (both wavelength and frequency forms, to 2 ulp)", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 10), logUniform(1e-2, 1e8), (lcm, t) => {
        const s = blackbodyFractionBelowWavelength(CGS, cm(lcm), T(t)) + blackbodyFractionAboveWavelength(CGS, cm(lcm), T(t));
        expect(Math.abs(s - 1)).toBeLessThan(4.5e-16);
        const nu = 29979245800 / lcm;
        const f = blackbodyFractionBelowFrequency(CGS, hz(nu), T(t)) + blackbodyFractionAboveFrequency(CGS, hz(nu), T(t));
        expect(Math.abs(f - 1)).toBeLessThan(4.5e-16);
      }),
      { numRuns: 100 },
    );
  });
  it("bands add: F(λ₁, λ₂) + F(λ₂, λ₃) = F(λ₁, λ₃) (absolute 1e-15: each fraction is ≤ ~1e-15 relative)", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 1), logUniform(1.01, 5), logUniform(1.01, 5), logUniform(10, 1e6), (a, k1, k2, t) => {
        const b = a * k1;
        const c = b * k2;
        const sum = blackbodyFractionBetweenWavelengths(CGS, cm(a), cm(b), T(t)) + blackbodyFractionBetweenWavelengths(CGS, cm(b), cm(c), T(t));
        expect(Math.abs(sum - blackbodyFractionBetweenWavelengths(CGS, cm(a), cm(c), T(t)))).toBeLessThan(1e-15);
      }),
      { numRuns: 100 },
    );
  });
  it("π × band radiance over the whole spectrum = σT⁴ and the photon analogue = σ_γT³ (CGS, 1e-14)", () => {
    // λT from 1e-4 to 1e9 m K holds all but e^−144 of the energy on the short side and ~1e-25 on the long side
    fc.assert(
      fc.property(logUniform(1e-2, 1e8), (t) => {
        const l1 = cm(1e-2 / t);
        const l2 = cm(1e11 / t);
        const mE = lambertianExitance(bandRadianceWavelength(CGS, l1, l2, T(t)));
        expect(Math.abs(mE / stefanBoltzmannExitance(CGS, T(t)) - 1)).toBeLessThan(1e-14);
        const mP = lambertianExitance(bandPhotonRadianceWavelength(CGS, l1, l2, T(t)));
        expect(Math.abs(mP / photonExitance(CGS, T(t)) - 1)).toBeLessThan(1e-14);
      }),
      { numRuns: 50 },
    );
  });
  it("F(0→b) at the B_λ peak (λT = b) and the 380–780 nm share at 5772 K match mpmath (test/fixtures/radiation_typed.json)", () => {
    // Source: test/fixtures/gen/radiation_typed.py (mpmath polylog, 40 digits). The kernels are ≤ ~1e-15 relative
    // (kernels/band-fraction.test.ts); b and the band edges as doubles move x by ≤ 1 ulp (sensitivity ≤ ~5 here): 1e-14.
    const f = blackbodyFractionBelowWavelength(SI, assume<Length<"SI">>(constants.wienB.si), T(1));
    expect(Math.abs(f / typed.fractionBelowPeak - 1)).toBeLessThan(1e-14);
    expect(Math.abs(f - 0.25)).toBeLessThan(1e-4); // "a quarter of the energy lies shortward of the peak" (common practice)
    const v = blackbodyFractionBetweenWavelengths(CGS, CGS.of(380, units.nm), CGS.of(780, units.nm), constants.Tsun.cgs);
    expect(Math.abs(v / typed.visibleFraction5772 - 1)).toBeLessThan(1e-14);
  });
});

describe("errors name the caller's unit", () => {
  it.each([0, -1, NaN, Infinity])("%s → RangeError in cm for a CGS caller", (v) => {
    expect(() => blackbodyFractionBelowWavelength(CGS, cm(v), T(5772))).toThrow(/^wavelength must be a finite number > 0 cm; got/);
    expect(() => bandRadianceWavelength(CGS, cm(v), cm(1), T(5772))).toThrow(/^wavelength1 must be a finite number > 0 cm; got/);
    expect(() => bandRadianceWavelength(CGS, cm(1), cm(v), T(5772))).toThrow(/^wavelength2 must be a finite number > 0 cm; got/);
    expect(() => bandPhotonRadianceWavelength(CGS, cm(1), cm(2), T(v))).toThrow(/^temperature must be a finite number > 0 K; got/);
  });
  it("a band radiance finite in W m⁻² sr⁻¹ but beyond the double range in erg s⁻¹ cm⁻² sr⁻¹ names the CGS arguments", () => {
    // T = 2e78 K: σT⁴ ≈ 9.1e305 W m⁻², so ∫B_λ dλ over a band holding all of it (x from ≈ 144 down to ≈ 1e-10) is
    // ≈ 2.9e305 W m⁻² sr⁻¹, finite; ×10³ into CGS overflows.
    expect(Number.isFinite(bandRadianceWavelength(SI, m(5e-83), m(5e-71), T(2e78)))).toBe(true);
    expect(() => bandRadianceWavelength(CGS, cm(5e-81), cm(5e-69), T(2e78))).toThrow(
      "the band radiance overflows the double range in g s^-3 sr^-1 for wavelength1=5e-81 cm, wavelength2=5e-69 cm, temperature=2e+78 K",
    );
  });
  it("reversed edges are reported after each edge's own check, as the scalar checks run", () => {
    expect(() => bandRadianceWavelength(CGS, cm(Infinity), cm(1), T(5772))).toThrow("wavelength1 must be a finite number > 0 cm; got Infinity");
    expect(() => bandRadianceWavelength(CGS, cm(2), cm(1), T(-1))).toThrow("temperature must be a finite number > 0 K; got -1");
    expect(() => bandPhotonRadianceWavelength(SI, m(2e-6), m(1e-6), T(5772))).toThrow("wavelength2 must be >= wavelength1 (0.000002 m); got 0.000001");
  });
  it("reversed band edges name both in the caller's unit", () => {
    expect(() => blackbodyFractionBetweenWavelengths(CGS, cm(2e-4), cm(1e-4), T(5772))).toThrow(
      "wavelength2 must be >= wavelength1 (0.0002 cm); got 0.0001",
    );
  });
});
