/**
 * The core in a browser: bundled by test/e2e/browser.test.ts for the
 * browser (no Node APIs), loaded in headless Chromium, and compared with the
 * same computation in Node. Writes its results as JSON into #out.
 */
import { CGS, SI, constants, kinds, mul, planckRadianceWavelength, pow, scale, units } from "../src/index";

const T = SI.of(5772, units.K);
const R = SI.of(1, units.Rsun);
const results = {
  planckSI: planckRadianceWavelength(SI, SI.of(500, units.nm), T) as number,
  planckCGS: planckRadianceWavelength(CGS, CGS.of(500, units.nm), T) as number,
  luminosityLsun: SI.valueIn(scale(mul(mul(R, R), mul(constants.sigma.si, pow(T, 4))), 4 * Math.PI), units.Lsun),
  parsed: CGS.parse("3.6e-13 erg s^-1 cm^-2 A^-1", kinds.spectralFluxPerWavelength) as number,
  userAgent: typeof navigator === "undefined" ? "none" : navigator.userAgent,
};

export default results;

declare const document: { getElementById(id: string): { textContent: string } | null } | undefined;
if (typeof document !== "undefined") {
  const el = document.getElementById("out");
  if (el !== null) el.textContent = JSON.stringify(results);
}
