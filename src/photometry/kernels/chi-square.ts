/**
 * Chi-square tail probabilities and their Gaussian-equivalent significance,
 * used by the stellar-parameter solver to report the consistency of an
 * over-determined set of measurements. Everything is computed in log space so
 * that very large χ² give a finite significance rather than p = 0.
 *
 * Sources: the scaled complementary error function erfcx(u) = e^{u²} erfc(u);
 * its power series erf(u) = (2/√π) e^{−u²} Σ 2ⁿ u^{2n+1} / (2n+1)!! (all
 * terms positive) and the Laplace continued fraction for erfc (Abramowitz &
 * Stegun 1964, 7.1.6 and 7.1.15); the chi-square survival function for
 * integer degrees of freedom k in closed form (A&S 26.4.4–26.4.5):
 *   k even: Q = e^{−x/2} Σ_{j=0}^{k/2−1} (x/2)^j / j!
 *   k odd:  Q = erfc(√(x/2)) + e^{−x/2} Σ_{j=1}^{(k−1)/2} (x/2)^{j−1/2} / Γ(j+1/2)
 *
 * @module
 */
import { requireInRange, requireNonNegative } from "../../internal/checks";

const SQRT_PI = Math.sqrt(Math.PI);

/**
 * Scaled complementary error function erfcx(u) = e^{u²} erfc(u) for u ≥ 0.
 * Power series for u < 1.5 (relative cancellation ≤ 1/erfc(1.5) ≈ 30 ulp),
 * modified-Lentz evaluation of the continued fraction for u ≥ 1.5.
 *
 * @param u - argument (finite, ≥ 0)
 * @returns erfcx(u), in (0, 1]
 * @throws RangeError naming `u`
 * @example
 * ```ts
 * import { erfcxNonNegative } from "./chi-square";
 * const v = erfcxNonNegative(0); // 1
 * ```
 */
export function erfcxNonNegative(u: number): number {
  requireNonNegative("u", u, "(dimensionless)");
  if (u < 1.5) {
    // erf(u) = (2/√π) e^{-u²} Σ_n (2u²)^n u / (2n+1)!!
    const u2 = u * u;
    let term = u;
    let sum = u;
    for (let n = 1; n < 200; n++) {
      term *= (2 * u2) / (2 * n + 1);
      sum += term;
      if (term < 1e-17 * sum) break;
    }
    const erf = (2 / SQRT_PI) * Math.exp(-u2) * sum;
    return (1 - erf) * Math.exp(u2);
  }
  // erfcx(u) = 1 / (√π (u + (1/2)/(u + (2/2)/(u + (3/2)/(u + …)))))
  const tiny = 1e-300;
  let f = u;
  let c = f;
  let d = 0;
  for (let n = 1; n < 5000; n++) {
    const a = n / 2;
    d = u + a * d;
    if (d === 0) d = tiny;
    d = 1 / d;
    c = u + a / c;
    if (c === 0) c = tiny;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return 1 / (SQRT_PI * f);
}

/** ln of a sum of exponentials, stable. @internal */
function logSumExp(a: number, b: number): number {
  const m = Math.max(a, b);
  if (m === -Infinity) return -Infinity;
  return m + Math.log(Math.exp(a - m) + Math.exp(b - m));
}

/** ln Γ(j + 1/2) for integer j ≥ 0, by the recurrence Γ(x+1) = xΓ(x) from Γ(1/2) = √π. @internal */
function lnGammaHalfInteger(j: number): number {
  let g = 0.5 * Math.log(Math.PI);
  for (let i = 0; i < j; i++) g += Math.log(i + 0.5);
  return g;
}

/**
 * Natural log of the chi-square survival function, ln Q(χ² ≥ x | k), for an
 * integer number of degrees of freedom k ≥ 1.
 *
 * @param chi2 - x ≥ 0 (finite)
 * @param dof - k, integer in [1, 1000]
 * @returns ln Q, ≤ 0
 * @throws RangeError naming `chi2` or `dof`
 * @example
 * ```ts
 * import { chiSquareLogSurvival } from "./chi-square";
 * const lnQ = chiSquareLogSurvival(2, 2); // -1 (Q = e^{-1})
 * ```
 */
export function chiSquareLogSurvival(chi2: number, dof: number): number {
  requireNonNegative("chi2", chi2, "(dimensionless)");
  requireInRange("dof", dof, 1, 1000, "(integer degrees of freedom)");
  if (!Number.isInteger(dof)) throw new RangeError(`dof must be an integer; got ${String(dof)}`);
  if (chi2 === 0) return 0;
  const h = chi2 / 2;
  const lnH = Math.log(h);
  if (dof % 2 === 0) {
    // ln Q = -h + ln Σ_{j=0}^{k/2-1} h^j / j!
    let lnSum = -Infinity;
    let lnFact = 0;
    for (let j = 0; j < dof / 2; j++) {
      if (j > 0) lnFact += Math.log(j);
      lnSum = logSumExp(lnSum, j * lnH - lnFact);
    }
    return Math.min(0, -h + lnSum);
  }
  // ln Q = -h + ln( erfcx(√h) + Σ_{j=1}^{(k-1)/2} h^{j-1/2} / Γ(j+1/2) )
  let lnSum = Math.log(erfcxNonNegative(Math.sqrt(h)));
  for (let j = 1; j <= (dof - 1) / 2; j++) {
    lnSum = logSumExp(lnSum, (j - 0.5) * lnH - lnGammaHalfInteger(j));
  }
  return Math.min(0, -h + lnSum);
}

/**
 * Two-sided Gaussian-equivalent significance z of a tail probability given by
 * its natural log: P(|N(0,1)| > z) = p, i.e. erfc(z/√2) = p. Solved by
 * safeguarded Newton iteration on ln erfc(w) = ln p with
 * ln erfc(w) = −w² + ln erfcx(w); the root lies in [0, √(−ln p)] because
 * erfc(w) ≤ e^{−w²}.
 *
 * @param lnP - ln p, ≤ 0 (finite)
 * @returns z ≥ 0 (sigma)
 * @throws RangeError naming `lnP`
 * @example
 * ```ts
 * import { sigmaFromLogTailProbability } from "./chi-square";
 * const z = sigmaFromLogTailProbability(Math.log(0.0026997960632601866)); // ≈ 3
 * ```
 */
export function sigmaFromLogTailProbability(lnP: number): number {
  requireInRange("lnP", lnP, -Number.MAX_VALUE, 0, "(natural log of a probability)");
  if (lnP === 0) return 0;
  let lo = 0;
  let hi = Math.sqrt(-lnP);
  let w = 0.5 * (lo + hi);
  for (let it = 0; it < 200; it++) {
    const ex = erfcxNonNegative(w);
    const g = -w * w + Math.log(ex) - lnP; // decreasing in w
    if (g > 0) lo = w;
    else hi = w;
    const step = g / (-2 / (SQRT_PI * ex));
    let next = w - step;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - w) <= 1e-15 * Math.max(1, w)) {
      w = next;
      break;
    }
    w = next;
  }
  return Math.SQRT2 * w;
}
