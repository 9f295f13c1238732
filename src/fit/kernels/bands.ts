/**
 * Photometric bands for blackbody fitting, prepared once: normalised
 * quadrature weights on the band's wavelength grid, pivot and mean
 * wavelengths, and (built here) top-hat and Gaussian response curves.
 *
 * ## Band mean
 * A band measures the response-weighted mean flux density per unit
 * wavelength (band-response.ts, Bessell & Murphy 2012, PASP 124, 140):
 *
 *   energy counting:  ⟨f_λ⟩ = ∫ f_λ R dλ / ∫ R dλ
 *   photon counting:  ⟨f_λ⟩ = ∫ f_λ R λ dλ / ∫ R λ dλ
 *
 * Both integrals use the trapezoid rule on the given grid
 * (`responseWeights` of band-response.ts, so the weights are exactly those of
 * `bandMeanRadianceWavelengthSI`), and the weights are normalised to sum to 1:
 * ⟨f_λ⟩ = Σ ŵᵢ f_λ(λᵢ). Grid points with zero weight are dropped.
 *
 * ## Pivot wavelength and f_ν
 * With the matching frequency means (photon: ∫ f_ν R dν/ν / ∫ R dν/ν, the AB
 * convention; energy: ∫ f_ν R dν / ∫ R dν) one has exactly
 *
 *   ⟨f_ν⟩ = ⟨f_λ⟩ λ_p² / c,   λ_p² = Σ Wᵢ / Σ (Wᵢ / λᵢ²)
 *
 * where Wᵢ are the (unnormalised) trapezoid weights of the convention
 * (photon: λ_p² = ∫ R λ dλ / ∫ R λ⁻¹ dλ; energy: ∫ R dλ / ∫ R λ⁻² dλ; Tokunaga &
 * Vacca 2005, PASP 117, 421; Bessell & Murphy 2012). It is exact for the
 * discretised integrals too (the same nodes and weights appear on both
 * sides), so converting f_ν data to f_λ at λ_p loses nothing.
 *
 * @internal
 */
import { requirePositive } from "../../internal/checks";
import { responseWeights, type ResponseConvention, type ResponseCurveSI } from "../../radiation/kernels/band-response";

export type { ResponseConvention, ResponseCurveSI };

/** A band ready for the fitter: grid points with positive weight and their normalised weights. */
export interface PreparedBandSI {
  /** Grid wavelengths with positive weight, m (strictly increasing). */
  readonly wavelengthsM: Float64Array;
  /** Normalised quadrature weights ŵᵢ (> 0, Σ = 1): ⟨f_λ⟩ = Σ ŵᵢ f_λ(λᵢ). */
  readonly weights: Float64Array;
  /** Detector counting convention of the band. */
  readonly convention: ResponseConvention;
  /** Pivot wavelength λ_p, m: ⟨f_ν⟩ = ⟨f_λ⟩ λ_p²/c exactly. */
  readonly pivotWavelengthM: number;
  /** Weighted mean wavelength Σ ŵᵢ λᵢ, m (for plots and messages). */
  readonly meanWavelengthM: number;
}

/**
 * Prepare a tabulated response curve for fitting (validates it with the
 * messages of band-response.ts).
 *
 * @param curve - wavelengths (m, strictly increasing, ≥ 2 points) and response (≥ 0, not all 0)
 * @param convention - "energy" or "photon" counting
 * @returns the prepared band
 * @throws RangeError for an invalid curve or convention
 * @example
 * ```ts
 * const band = prepareBandSI({ wavelengthsM: [500e-9, 550e-9, 600e-9], response: [0, 1, 0] }, "photon");
 * band.pivotWavelengthM; // ≈ 5.49e-7
 * ```
 */
export function prepareBandSI(curve: ResponseCurveSI, convention: ResponseConvention): PreparedBandSI {
  const w = responseWeights(curve, convention);
  const n = w.length;
  let m = 0;
  let total = 0;
  let inv2 = 0;
  for (let i = 0; i < n; i++) {
    const wi = w[i] as number;
    if (wi > 0) {
      const l = curve.wavelengthsM[i] as number;
      m++;
      total += wi;
      inv2 += wi / (l * l);
    }
  }
  const lam = new Float64Array(m);
  const wn = new Float64Array(m);
  let j = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    const wi = w[i] as number;
    if (wi > 0) {
      const l = curve.wavelengthsM[i] as number;
      lam[j] = l;
      wn[j] = wi / total;
      mean += (wi / total) * l;
      j++;
    }
  }
  return {
    wavelengthsM: lam,
    weights: wn,
    convention,
    pivotWavelengthM: Math.sqrt(total / inv2),
    meanWavelengthM: mean,
  };
}

function requirePoints(points: number): number {
  if (!Number.isInteger(points) || points < 3 || points > 100000) {
    throw new RangeError(`points must be an integer in [3, 100000]; got ${String(points)}`);
  }
  return points;
}

/**
 * A top-hat response: R = 1 on [λ_c − Δλ/2, λ_c + Δλ/2], tabulated on
 * `points` equally spaced nodes including both edges (the trapezoid rule
 * then integrates the box exactly: the edge nodes get half weight).
 *
 * @param centreM - centre λ_c, m (> 0)
 * @param widthM - full width Δλ, m (> 0, < 2 λ_c)
 * @param points - number of nodes (integer, 3 … 100000; default 201)
 * @throws RangeError naming `center`, `width` or `points`
 * @example
 * ```ts
 * const box = topHatResponseSI(550e-9, 90e-9);
 * ```
 */
export function topHatResponseSI(centreM: number, widthM: number, points = 201): ResponseCurveSI {
  requirePositive("center", centreM, "m");
  requirePositive("width", widthM, "m");
  requirePoints(points);
  if (!(widthM < 2 * centreM)) {
    throw new RangeError(`width must be < 2 × center (${2 * centreM} m) so that the band stays at positive wavelengths; got ${widthM} m`);
  }
  const lo = centreM - widthM / 2;
  const l = new Float64Array(points);
  const r = new Float64Array(points).fill(1);
  for (let i = 0; i < points; i++) l[i] = lo + (widthM * i) / (points - 1);
  return { wavelengthsM: l, response: r };
}

/** Half-width of the tabulated Gaussian, in standard deviations. */
export const GAUSSIAN_BAND_HALF_WIDTH_SIGMA = 5;

/**
 * A Gaussian response R = exp(−(λ − λ_c)²/2s²), s = FWHM/(2√(2 ln 2)),
 * tabulated on `points` equally spaced nodes over λ_c ± 5s (the truncated
 * tails hold a fraction erfc(5/√2) ≈ 5.7e-7 of the area).
 *
 * @param centreM - centre λ_c, m (> 0)
 * @param fwhmM - full width at half maximum, m (> 0, with λ_c − 5s > 0)
 * @param points - number of nodes (integer, 3 … 100000; default 201)
 * @throws RangeError naming `center`, `fwhm` or `points`
 * @example
 * ```ts
 * const g = gaussianResponseSI(2.2e-6, 0.35e-6);
 * ```
 */
export function gaussianResponseSI(centreM: number, fwhmM: number, points = 201): ResponseCurveSI {
  requirePositive("center", centreM, "m");
  requirePositive("fwhm", fwhmM, "m");
  requirePoints(points);
  const s = fwhmM / (2 * Math.sqrt(2 * Math.LN2));
  const half = GAUSSIAN_BAND_HALF_WIDTH_SIGMA * s;
  if (!(centreM - half > 0)) {
    throw new RangeError(`fwhm must be < ${(centreM / half) * fwhmM} m for a band centred at ${centreM} m (the tabulated ±5σ must stay at positive wavelengths); got ${fwhmM} m`);
  }
  const l = new Float64Array(points);
  const r = new Float64Array(points);
  for (let i = 0; i < points; i++) {
    const lam = centreM - half + (2 * half * i) / (points - 1);
    l[i] = lam;
    const u = (lam - centreM) / s;
    r[i] = Math.exp(-0.5 * u * u);
  }
  return { wavelengthsM: l, response: r };
}
