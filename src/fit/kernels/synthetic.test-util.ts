/**
 * Test helpers for the fit area: a seeded PRNG, synthetic response curves,
 * and synthetic photometry computed independently of the fitter's model code
 * (through the radiation kernel `bandMeanRadianceWavelengthSI` and the
 * extinction kernel `ccm89RatioSI`).
 */
import { bandMeanRadianceWavelengthSI, responseWeights, type ResponseConvention, type ResponseCurveSI } from "../../radiation/kernels/band-response";
import { ccm89RatioSI } from "../../photometry/kernels/extinction";
export { gaussian, mulberry32 } from "../../../test/support/random";

/**
 * A smooth, slightly asymmetric filter-like response on `n` points over
 * c ± 2w: R = exp(−((λ−c)/w)⁴) (1 + 0.3 (λ−c)/w), clipped at 0.
 */
export function filterCurve(centreM: number, halfWidthM: number, n = 200): ResponseCurveSI {
  const l = new Float64Array(n);
  const r = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const lam = centreM - 2 * halfWidthM + (4 * halfWidthM * i) / (n - 1);
    const u = (lam - centreM) / halfWidthM;
    l[i] = lam;
    r[i] = Math.max(0, Math.exp(-(u ** 4)) * (1 + 0.3 * u));
  }
  return { wavelengthsM: l, response: r };
}

/** Five optical/near-IR bands (≈ U B V R I), 200-point curves. */
export const FIVE_CENTERS_M = [0.365e-6, 0.445e-6, 0.551e-6, 0.658e-6, 0.806e-6];
export function fiveCurves(n = 200): ResponseCurveSI[] {
  return FIVE_CENTERS_M.map((c) => filterCurve(c, 0.09 * c, n));
}

/**
 * Band-mean f_λ (W m⁻³) of a reddened blackbody disc of angular diameter θ:
 * π(θ/2)² ⟨B_λ 10^(−0.4 A_V k)⟩, via the radiation kernel on a curve whose
 * response carries the extinction factor, renormalised by the weight sums.
 */
export function syntheticBandFlux(
  curve: ResponseCurveSI,
  convention: ResponseConvention,
  T: number,
  theta: number,
  aV = 0,
  rV = 3.1,
): number {
  const s = (Math.PI * theta * theta) / 4;
  if (aV === 0) return s * bandMeanRadianceWavelengthSI(curve, T, convention);
  const n = curve.wavelengthsM.length;
  const rr = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const l = curve.wavelengthsM[i] as number;
    const ri = curve.response[i] as number;
    rr[i] = ri > 0 ? ri * 10 ** (-0.4 * aV * ccm89RatioSI(l, rV)) : 0;
  }
  const reddened = { wavelengthsM: curve.wavelengthsM, response: rr };
  const w0 = responseWeights(curve, convention);
  const w1 = responseWeights(reddened, convention);
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    a += w1[i] as number;
    b += w0[i] as number;
  }
  return s * bandMeanRadianceWavelengthSI(reddened, T, convention) * (a / b);
}
