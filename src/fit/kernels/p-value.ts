/**
 * Goodness-of-fit probability of a χ² with k degrees of freedom,
 * p = P(χ²_k ≥ χ²), for any integer k ≥ 1.
 *
 * - k ≤ 1000: the closed form of photometry/kernels/chi-square.ts
 *   (Abramowitz & Stegun 26.4.4–26.4.5), computed in log space.
 * - k > 1000 (long spectra): the Wilson–Hilferty cube-root normal
 *   approximation (Wilson & Hilferty 1931, PNAS 17, 684; A&S 26.4.14),
 *   z = ((χ²/k)^{1/3} − (1 − 2/(9k))) / √(2/(9k)), p = erfc(z/√2)/2. Its
 *   absolute error in p is below 1e-4 already for k ≈ 100 (from memory,
 *   confirmed at k = 1000 against the closed form in the tests), which is ample
 *   for the 0.001 threshold of the `poorFit` flag.
 *
 * @internal
 */
import { chiSquareLogSurvival, erfcxNonNegative } from "../../photometry/kernels/chi-square";

/** erfc(u) for any finite u, from the scaled erfcx (u ≥ 0) and erfc(−u) = 2 − erfc(u). */
function erfc(u: number): number {
  if (u >= 0) return u > 27 ? 0 : erfcxNonNegative(u) * Math.exp(-u * u);
  return 2 - erfc(-u);
}

/** Largest k handled by the closed form. */
export const CHI_SQUARE_EXACT_MAX_DOF = 1000;

/**
 * Wilson–Hilferty approximation to P(χ²_k ≥ x).
 * @internal
 */
export function chiSquarePValueWilsonHilferty(chi2: number, dof: number): number {
  const v = 2 / (9 * dof);
  const z = (Math.cbrt(chi2 / dof) - (1 - v)) / Math.sqrt(v);
  return 0.5 * erfc(z / Math.SQRT2);
}

/**
 * P(χ²_k ≥ chi2) for chi2 ≥ 0 and integer k ≥ 1 (no input checks beyond those
 * of the closed form).
 *
 * @param chi2 - χ² (finite, ≥ 0)
 * @param dof - k (integer ≥ 1)
 * @returns p in [0, 1]
 * @example
 * ```ts
 * chiSquarePValue(3, 3); // ≈ 0.392
 * ```
 */
export function chiSquarePValue(chi2: number, dof: number): number {
  if (dof <= CHI_SQUARE_EXACT_MAX_DOF) return Math.exp(chiSquareLogSurvival(chi2, dof));
  return chiSquarePValueWilsonHilferty(chi2, dof);
}
