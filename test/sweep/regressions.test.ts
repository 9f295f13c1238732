/**
 * The counterexamples the full-range sweep found (issue 16), pinned one by one
 * against the decimal.js reference so that each fix stays in place even if
 * the seeded sweep stops drawing that input.
 */
import { describe, expect, it } from "vitest";
import { runSweep, type SweepEntry } from "./harness";
import { sweepTable } from "./table";

/** [export, arguments, what was wrong before the fix] */
const CASES: readonly [string, number[], string][] = [
  ["blackbodyFractionBelowWavelength", [2.8900278466939746e-209, 1.0991586479621785e-150], "NaN (x = ∞·0) where the answer is 0"],
  ["blackbodyPhotonFractionBelowFrequency", [1.2566e-319, 3.749414426529159e-268], "0 where the answer is 5.4e-125 (hν underflowed)"],
  ["blackbodyPhotonFractionBetweenWavelengths", [1.082844446130821e180, 1.2716846471139027e228, 9.826436018972832e139], "0/0 in the quadrature at t → 0"],
  ["bandRadianceWavelength", [1.6571793051806808e119, 1.9910979566593578e208, 3.3754812067264007e249], "0 where the answer is 2e-123 (fraction underflowed, σT⁴ overflowed)"],
  ["bandRadianceWavelength", [1e-310, 1e-310, 1.0139116573554393e102], "RangeError (∞·0 in the log path) for a band of zero width"],
  ["planckRadianceWavelengthDerivativeT", [4.4971748693250074e-36, 1.000078003210709e285], "RangeError where ∂B/∂T = 2e127 (B overflows)"],
  ["planckRadianceFrequencyDerivativeT", [1.7416701380513201e50, 6.651515686849248e283], "RangeError where ∂B/∂T = 9e60"],
  ["brightnessTemperatureFrequency", [9.926955173998439e-86, 1.9686178717576424e-302], "3.7e-4 relative error (ln(1+y) taken as y for y = 7e-5)"],
  ["brightnessTemperatureFrequency", [1.3038706432378598e93, 8.851570887575324e238], "1.9e-10 relative error"],
  ["rayleighJeansBrightnessTemperatureWavelength", [1.4684995199426646e-79, 4.6605723144017473e253], "4e-9 relative error (λ⁴ subnormal)"],
  ["photonEmissionRate", [6.548522740595919e83, 1.7077347730930592e-107], "3.7e-5 relative error (T³ subnormal)"],
  ["fluxFromLuminosity", [1.9693e-320, 1.2242857049283173e-212], "6e-4 relative error (L/4π subnormal)"],
  ["distanceFromLuminosityFlux", [4.634368667791122e-145, 1.3787497012871852e174], "9e-6 relative error"],
  ["distanceModulus", [3.2356293270796344e-306], "0.13 mag off (d/10 pc subnormal)"],
  ["absoluteMagnitude", [-7.22517410303094e130, 2.837986606e-315], "RangeError (log10 of an underflowed quotient)"],
  ["absoluteBolometricMagnitude", [1e-310], "RangeError where M_bol = 846.2"],
  ["abMagnitude", [1.7976931348623157e308], "RangeError where m_AB = −826.7"],
  ["luminosityFromAbsoluteBolometricMagnitude", [792.3123214393854], "2.5e-8 relative error (10^−316.9 subnormal)"],
  ["fNuFromFLambda", [7.378e-320, 4.2677554311889553e117], "1.6e-5 relative error"],
  ["lambertianExitance", [1.7976931348623157e308], "+Infinity instead of a RangeError"],
  ["angularDiameter (small-angle)", [1.7976931348623157e308, 1.144581243260426e157], "RangeError (2R overflowed) where θ = 3e151"],
  ["surfaceBrightness (small-angle)", [5.58183e-318, 5.481759653451597e-40], "1.3e-6 relative error"],
];

describe("sweep counterexamples stay fixed", () => {
  for (const [name, args, was] of CASES) {
    it(`${name}(${args.join(", ")}) — was: ${was}`, () => {
      const entry = sweepTable.find((e) => e.name === name) as SweepEntry;
      expect(entry).toBeDefined();
      const pinned: SweepEntry = { ...entry, focus: () => args };
      // focus is used for every third point from 0: one point, the pinned one
      const st = runSweep(pinned, 1, 1);
      expect(st.failures).toEqual([]);
      expect(st.points).toBe(1);
    });
  }
});
