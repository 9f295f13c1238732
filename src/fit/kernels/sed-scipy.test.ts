/**
 * Cross-check against scipy.optimize.least_squares (trf, analytic Jacobian,
 * tolerances 1e-15) on the same data (the fit stops at steps ≤ 1e-10 in the
 * internal coordinates, so 1e-6 σ is ample; measured worst 1.5e-7 σ): test/fixtures/fit/sed-models-scipy.json,
 * written by test/fixtures/gen/sed-models-scipy.py (bands, noisy data and
 * scipy's solutions in internal coordinates ln T, β, ln amplitude).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { createSedFitterSI, type FitChannelSI } from "./model-fit";
import { blackbodyComponentSI, modifiedBlackbodyComponentSI, sedModelSI, type SedModelSI } from "./sed-model";

interface Star {
  values: number[];
  sigmas: number[];
  scipyInternal: number[];
  chi2: number;
}
interface Entry {
  name: string;
  bands: { wavelengthsM: number[]; weights: number[] }[];
  stars: Star[];
}
const fixture = JSON.parse(readFileSync(new URL("../../../test/fixtures/fit/sed-models-scipy.json", import.meta.url), "utf8")) as { models: Entry[] };

const MODELS: Record<string, { model: () => SedModelSI; fitted: number[] }> = {
  thin: { model: () => sedModelSI([{ component: modifiedBlackbodyComponentSI() }]), fitted: [0, 1, 3] },
  general: { model: () => sedModelSI([{ component: modifiedBlackbodyComponentSI({ opacity: "general" }) }]), fitted: [0, 1, 3] },
  starDust: {
    model: () =>
      sedModelSI([
        { component: blackbodyComponentSI({ temperatureRangeK: [2000, 50000] }), label: "star" },
        { component: modifiedBlackbodyComponentSI({ temperatureRangeK: [10, 1000] }), label: "dust" },
      ]),
    fitted: [0, 1, 2, 3, 5],
  },
};

describe("same minimum as scipy.optimize.least_squares on the same data", () => {
  it.each(fixture.models.map((m) => [m.name, m] as const))("%s: parameters within 1e-6 σ, χ² within 1e-9 relative", (name, entry) => {
    const spec = MODELS[name]!;
    const channels: FitChannelSI[] = entry.bands.map((b) => ({
      wavelengthsM: b.wavelengthsM,
      weights: b.weights,
      pivotWavelengthM: b.wavelengthsM.reduce((s, l, i) => s + l * b.weights[i]!, 0),
    }));
    const fitter = createSedFitterSI(channels, spec.model());
    let worstSigma = 0;
    for (const star of entry.stars) {
      const out = fitter.fitDetailed(star.values, star.sigmas, star.values.map(() => 0));
      spec.fitted.forEach((a, j) => {
        const sd = Math.sqrt(out.internalCovariance![j]![j]!);
        worstSigma = Math.max(worstSigma, Math.abs(out.q[a]! - star.scipyInternal[j]!) / sd);
      });
      expect(Math.abs(out.result.chi2 - star.chi2) / star.chi2).toBeLessThan(1e-9);
    }
    console.log(name, "worst |Δq|/σ against scipy", worstSigma.toExponential(2));
    expect(worstSigma).toBeLessThan(1e-6);
  });
});
