/**
 * The blackbody fitter on the model interface and the shared engine gives
 * today's results: 120 seeded cases (noiseless and noisy flux, AB magnitudes,
 * fitted and held CCM89 A_V, grid starts, 40 spectrum pixels) against the
 * pre-refactor fitter's output stored in test/fixtures/fit/blackbody-fit-baseline.json.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { baselineCases } from "./baseline-cases.test-util";
import { createBlackbodyFitterSI } from "./blackbody-fit";

interface Stored {
  temperatureK: number;
  angularDiameterRad: number;
  extinctionAV: number;
  sigmaTemperatureK: number;
  sigmaAngularDiameterRad: number;
  sigmaExtinctionAV: number;
  chi2: number;
  model: number[];
}
const stored = (JSON.parse(readFileSync(new URL("../../../test/fixtures/fit/blackbody-fit-baseline.json", import.meta.url), "utf8")) as { results: Stored[] }).results;

const rel = (a: number, b: number): number => (a === b ? 0 : Math.abs(a - b) / Math.max(Math.abs(b), 1e-300));

describe("refactor: same results as the pre-refactor fitter", () => {
  const cases = baselineCases();
  it("has the 120 stored cases", () => expect(stored.length).toBe(cases.length));
  it("T, θ, A_V, their σ, χ² and the model per band agree to ≤ 1e-12 relative (A_V: 1e-12 mag absolute)", () => {
    let worst = 0;
    cases.forEach((c, n) => {
      const r = createBlackbodyFitterSI(c.channels, c.settings).fit(c.values, c.sigmas, c.kinds);
      const s = stored[n] as Stored;
      const d = [
        rel(r.temperatureK, s.temperatureK),
        rel(r.angularDiameterRad, s.angularDiameterRad),
        Math.abs(r.extinctionAV - s.extinctionAV),
        rel(r.sigmaTemperatureK, s.sigmaTemperatureK),
        rel(r.sigmaAngularDiameterRad, s.sigmaAngularDiameterRad),
        Math.abs(r.sigmaExtinctionAV - s.sigmaExtinctionAV),
        // χ² of a noiseless fit is rounding noise (~1e-20): compare it absolutely there
        Math.abs(r.chi2 - s.chi2) / Math.max(s.chi2, 1e-6),
        ...r.model.map((m, i) => rel(m, s.model[i] as number)),
      ];
      for (const x of d) worst = Math.max(worst, x);
    });
    console.log("refactor: worst difference", worst);
    expect(worst).toBeLessThanOrEqual(1e-12);
  });
});
