/**
 * Area-normalized line profiles φ(Δ) with ∫ φ dΔ = 1, where Δ is the offset
 * from line centre. Offsets and widths may be in any one unit (m of
 * wavelength, Hz of frequency, …); the result is in the inverse unit
 * (m⁻¹, s, …). Parameter conventions:
 * - Gaussian with Doppler width b (the 1/e half-width, b = √2 σ):
 *   φ_G = exp(−Δ²/b²) / (b √π).
 * - Lorentzian with half-width at half-maximum γ:
 *   φ_L = γ / (π (Δ² + γ²)).
 * - Voigt (their convolution): φ_V = Re w((Δ + iγ)/b) / (b √π), with w the
 *   Faddeeva function (faddeeva.ts; Weideman 1994 and continued fraction).
 *   Limits: γ → 0 gives φ_G; b → 0 gives φ_L (b = 0 is accepted and returns
 *   φ_L exactly).
 * Widths must be finite; b > 0 for the Gaussian, γ > 0 for the Lorentzian;
 * b ≥ 0, γ ≥ 0, not both 0, for the Voigt (RangeError naming the parameter).
 *
 * @packageDocumentation
 */

import { requireFinite, requireNonNegative, requirePositive, show } from "../../internal/checks";
import { BatchLog, type BatchResult } from "../../law/batch";
import { requireOutputLength } from "./batch";
import { faddeeva } from "./faddeeva";

const SQRT_PI = Math.sqrt(Math.PI);
const w = new Float64Array(2);

/**
 * Gaussian line profile φ_G(Δ) = exp(−(Δ/b)²)/(b√π), area 1.
 *
 * @param offset Δ = x − x₀ (any unit, same as b)
 * @param dopplerWidth b = √2 σ (1/e half-width), > 0
 * @example
 * ```ts
 * gaussianProfileSI(0, 1e-12); // 1/(√π · 1e-12) m^-1
 * ```
 */
export function gaussianProfileSI(offset: number, dopplerWidth: number): number {
  requireFinite("offset", offset, "(unit of the width)");
  requirePositive("dopplerWidth", dopplerWidth, "(unit of the offset)");
  return gaussianProfileUnchecked(offset, dopplerWidth);
}

/** {@link gaussianProfileSI} without the input checks (Δ finite, b finite and > 0 assumed). @internal */
export function gaussianProfileUnchecked(offset: number, dopplerWidth: number): number {
  const u = offset / dopplerWidth;
  return Math.exp(-u * u) / SQRT_PI / dopplerWidth;
}

/**
 * Lorentzian line profile φ_L(Δ) = γ / (π(Δ² + γ²)), area 1.
 *
 * @param offset Δ (any unit, same as γ)
 * @param lorentzHwhm γ, half-width at half-maximum, > 0
 * @example
 * ```ts
 * lorentzianProfileSI(0, 2); // 1/(2π)
 * ```
 */
export function lorentzianProfileSI(offset: number, lorentzHwhm: number): number {
  requireFinite("offset", offset, "(unit of the width)");
  requirePositive("lorentzHwhm", lorentzHwhm, "(unit of the offset)");
  return lorentzianProfileUnchecked(offset, lorentzHwhm);
}

/** {@link lorentzianProfileSI} without the input checks (Δ finite, γ finite and > 0 assumed). @internal */
export function lorentzianProfileUnchecked(offset: number, lorentzHwhm: number): number {
  const d = Math.abs(offset);
  if (d <= lorentzHwhm) {
    const u = d / lorentzHwhm;
    return 1 / Math.PI / lorentzHwhm / (1 + u * u);
  }
  // far wing: γ/(π(Δ² + γ²)) = (r/|Δ|)/(π(1 + r²)), r = γ/|Δ| < 1 — no square
  // of Δ or γ is formed, so the value underflows only where it is below the
  // double range
  const r = lorentzHwhm / d;
  return r / (Math.PI * (1 + r * r)) / d;
}

/**
 * Voigt line profile φ_V(Δ) = Re w((Δ + iγ)/b)/(b√π), the convolution of a
 * Gaussian (Doppler width b) with a Lorentzian (HWHM γ); area 1.
 * b = 0 returns the Lorentzian, γ = 0 the Gaussian.
 *
 * @param offset Δ (any unit)
 * @param dopplerWidth b ≥ 0 (same unit)
 * @param lorentzHwhm γ ≥ 0 (same unit); b and γ not both 0
 * @example
 * ```ts
 * voigtProfileSI(0, 1, 0.1); // ≈ 0.5037
 * ```
 */
export function voigtProfileSI(offset: number, dopplerWidth: number, lorentzHwhm: number): number {
  requireFinite("offset", offset, "(unit of the widths)");
  requireNonNegative("dopplerWidth", dopplerWidth, "(unit of the offset)");
  requireNonNegative("lorentzHwhm", lorentzHwhm, "(unit of the offset)");
  if (dopplerWidth === 0) requirePositive("lorentzHwhm", lorentzHwhm, "(unit of the offset; dopplerWidth is 0)");
  return voigtProfileUnchecked(offset, dopplerWidth, lorentzHwhm);
}

/**
 * {@link voigtProfileSI} without the input checks (Δ finite; b, γ finite
 * and ≥ 0, not both 0, assumed); b = 0 gives the Lorentzian. @internal
 */
export function voigtProfileUnchecked(offset: number, dopplerWidth: number, lorentzHwhm: number): number {
  if (dopplerWidth === 0) return lorentzianProfileUnchecked(offset, lorentzHwhm);
  const u = offset / dopplerWidth;
  if (lorentzHwhm === 0) return Math.exp(-u * u) / SQRT_PI / dopplerWidth;
  const a = lorentzHwhm / dopplerWidth;
  // |u + ia| ≥ 1e8 (or u, a beyond the double range): Re w = a/(√π|z|²) to
  // double precision (kernels/faddeeva.ts, region 0), i.e. the profile is the
  // Lorentzian itself — evaluated in the caller's offsets and widths, so a
  // huge offset or a vanishing Doppler width never forms ∞/∞.
  if (Math.abs(u) >= VOIGT_LORENTZ_LIMIT || a >= VOIGT_LORENTZ_LIMIT) return lorentzianProfileUnchecked(offset, lorentzHwhm);
  faddeeva(u, a, w);
  return (w[0] as number) / SQRT_PI / dopplerWidth;
}

/** |u| or a at and beyond which the Voigt profile equals the Lorentzian to double precision. */
const VOIGT_LORENTZ_LIMIT = 1e8;

/**
 * Batch Voigt profile over offsets (batch.ts convention: a non-finite offset
 * gives NaN and is reported; widths are checked once and throw).
 *
 * @example
 * ```ts
 * const out = new Float64Array(3);
 * voigtProfilesSI(Float64Array.of(-1, 0, 1), 1, 0.1, out);
 * ```
 */
export function voigtProfilesSI(
  offsets: Float64Array,
  dopplerWidth: number,
  lorentzHwhm: number,
  out: Float64Array,
): BatchResult<Float64Array> {
  requireNonNegative("dopplerWidth", dopplerWidth, "(unit of the offset)");
  requireNonNegative("lorentzHwhm", lorentzHwhm, "(unit of the offset)");
  if (dopplerWidth === 0) requirePositive("lorentzHwhm", lorentzHwhm, "(unit of the offset; dopplerWidth is 0)");
  requireOutputLength(offsets, out);
  const log = new BatchLog();
  for (let i = 0; i < offsets.length; i++) {
    const d = offsets[i] as number;
    if (!Number.isFinite(d)) {
      out[i] = NaN;
      log.add(i, `offset must be a finite number (unit of the widths); got ${show(d)}`);
    } else {
      out[i] = voigtProfileUnchecked(d, dopplerWidth, lorentzHwhm);
    }
  }
  return log.result(out);
}
