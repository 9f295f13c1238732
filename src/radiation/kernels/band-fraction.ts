/**
 * Fraction of blackbody emission in a spectral band, energy and photon counts.
 *
 * With t = hc/(λkT) = hν/(kT), the fraction of the exitance at wavelengths
 * *below* λ (the "blackbody radiation function" F(0→λT) of heat-transfer
 * handbooks) is
 *   F(0→λT) = (15/π⁴) ∫_x^∞ t³/(eᵗ−1) dt,   x = c₂/(λT),
 * and for photon counts
 *   F_γ(0→λT) = (1/(2ζ(3))) ∫_x^∞ t²/(eᵗ−1) dt.
 *
 * Evaluation (both the fraction and its complement to ~1e-15 relative):
 * - x ≥ 2: the convergent series
 *   ∫_x^∞ t³/(eᵗ−1) dt = Σ_{n≥1} e^{−nx} (x³/n + 3x²/n² + 6x/n³ + 6/n⁴)
 *   (photons: Σ e^{−nx}(x²/n + 2x/n² + 2/n³)), ≤ 20 terms; the short-wave side
 *   is then the small one and is returned directly, the long-wave side as 1 − it.
 * - x < 2: the Bernoulli series ∫_0^x t³/(eᵗ−1) dt = Σ_k B_k x^{k+3}/(k!(k+3))
 *   = x³/3 − x⁴/8 + x⁵/60 − x⁷/5040 + x⁹/272160 − … (photons: Σ B_k x^{k+2}/(k!(k+2))),
 *   convergent for x < 2π, with B_k computed exactly (BigInt rationals) at load.
 * - a band narrower than Δt = 1 (where subtracting two tails would cancel) is
 *   integrated directly by 20-point Gauss–Legendre quadrature (integrand
 *   analytic within 2π of the real axis → error ≪ 1e-16).
 * x is formed in double-double (see exact.ts), so the Wien-tail sensitivity
 * (d ln F/d ln x ≈ −x) does not amplify rounding of x.
 *
 * Sources: both series are the standard expansions of the fractional
 * blackbody function (e.g. M. F. Modest, Radiative Heat Transfer, ch. 1); the
 * small-x one follows from t/(eᵗ−1) = Σ B_k tᵏ/k! integrated term by term.
 */
import { requirePositive } from "../../internal/checks";
import { C2, SIGMA } from "../../values/constants";
import { dd, rationalToDD } from "./exact";
import { FORM_LAMBDA_ENERGY, FORM_NU_ENERGY, computeX } from "./planck-core";
import { SIGMA_PHOTON, ZETA3, stefanBoltzmannExitanceSI, stefanBoltzmannExitanceUnchecked } from "./stefan-boltzmann";

/** 15/π⁴: normalization of ∫₀^∞ t³/(eᵗ−1) dt = π⁴/15. */
const NORM3 = 15 / Math.PI ** 4;
/** 1/(2ζ(3)): normalization of ∫₀^∞ t²/(eᵗ−1) dt = Γ(3)ζ(3). */
const NORM2 = 1 / (2 * ZETA3);
/** ln(σ/π), for band radiances in logarithms. */
const LN_SIGMA_OVER_PI = Math.log(SIGMA / Math.PI);
/** hc/k (c₂) as a plain double, for ln x from the logs of λ and T. */
const C2_OVER_HC_K = C2;

// ---- exact Bernoulli numbers over factorials, β_k = B_k/k! (B_1 = −1/2) ----
type Rat = readonly [bigint, bigint];
function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}
function norm(n: bigint, d: bigint): Rat {
  if (d < 0n) [n, d] = [-n, -d];
  const g = gcd(n, d);
  return g === 0n ? [0n, 1n] : [n / g, d / g];
}
function ratToNumber(r: Rat): number {
  if (r[0] === 0n) return 0;
  const neg = r[0] < 0n;
  const v = rationalToDD(neg ? -r[0] : r[0], r[1])[0];
  return neg ? -v : v;
}
const K_MAX = 44;
/** β_k = B_k/k! from t/(eᵗ−1) = Σ β_k tᵏ: β_0 = 1, β_m = −Σ_{j<m} β_j/(m+1−j)!. */
function bernoulliOverFactorial(): Rat[] {
  const fact: bigint[] = [1n];
  for (let i = 1; i <= K_MAX + 2; i++) fact.push((fact[i - 1] as bigint) * BigInt(i));
  const beta: Rat[] = [[1n, 1n]];
  for (let m = 1; m <= K_MAX; m++) {
    let n = 0n;
    let d = 1n;
    for (let j = 0; j < m; j++) {
      const b = beta[j] as Rat;
      const f = fact[m + 1 - j] as bigint;
      // n/d += b0/(b1·f)
      const r = norm(n * b[1] * f + b[0] * d, d * b[1] * f);
      n = r[0];
      d = r[1];
    }
    beta.push(norm(-n, d));
  }
  return beta;
}
const BETA = bernoulliOverFactorial();
/** Even-index coefficients β_{2m}/(2m+3), m = 1..K_MAX/2, for the x³ series. */
const LOW3: number[] = [];
/** Even-index coefficients β_{2m}/(2m+2), m = 1..K_MAX/2, for the x² series. */
const LOW2: number[] = [];
for (let m = 1; 2 * m <= K_MAX; m++) {
  const b = BETA[2 * m] as Rat;
  LOW3.push(ratToNumber(norm(b[0], b[1] * BigInt(2 * m + 3))));
  LOW2.push(ratToNumber(norm(b[0], b[1] * BigInt(2 * m + 2))));
}

/** ∫₀^x t³/(eᵗ−1) dt for 0 ≤ x < 2 (Bernoulli series, Horner in x²). */
function lower3(x: number): number {
  const y = x * x;
  let p = 0;
  for (let i = LOW3.length - 1; i >= 0; i--) p = p * y + (LOW3[i] as number);
  return x * x * x * (1 / 3 - x / 8 + y * p);
}
/** ∫₀^x t²/(eᵗ−1) dt for 0 ≤ x < 2. */
function lower2(x: number): number {
  const y = x * x;
  let p = 0;
  for (let i = LOW2.length - 1; i >= 0; i--) p = p * y + (LOW2[i] as number);
  return x * x * (1 / 2 - x / 6 + y * p);
}
/** ∫_x^∞ t³/(eᵗ−1) dt for x ≥ 2. */
function upper3(x: number): number {
  if (x > 600) {
    if (x > 1e6) return 0;
    // n ≥ 2 terms are e^−x relative: negligible. Split e^−x to keep the true tiny value.
    const e = Math.exp(-0.5 * x);
    return e * (((x + 3) * x + 6) * x + 6) * e;
  }
  const q = Math.exp(-x);
  let en = 1;
  let s = 0;
  for (let n = 1; n <= 60; n++) {
    en *= q;
    const inv = 1 / n;
    const term = en * inv * (x * x * x + inv * (3 * x * x + inv * (6 * x + inv * 6)));
    s += term;
    if (term < 1e-17 * s) break;
  }
  return s;
}
/** ∫_x^∞ t²/(eᵗ−1) dt for x ≥ 2. */
function upper2(x: number): number {
  if (x > 600) {
    if (x > 1e6) return 0;
    const e = Math.exp(-0.5 * x);
    return e * ((x + 2) * x + 2) * e;
  }
  const q = Math.exp(-x);
  let en = 1;
  let s = 0;
  for (let n = 1; n <= 60; n++) {
    en *= q;
    const inv = 1 / n;
    const term = en * inv * (x * x + inv * (2 * x + inv * 2));
    s += term;
    if (term < 1e-17 * s) break;
  }
  return s;
}

// ---- 20-point Gauss–Legendre rule on [−1, 1], computed by Newton on P_20 ----
const GL_N = 20;
const GL_X: number[] = [];
const GL_W: number[] = [];
for (let i = 1; i <= GL_N; i++) {
  let z = Math.cos((Math.PI * (i - 0.25)) / (GL_N + 0.5));
  let pp = 0;
  for (let it = 0; it < 100; it++) {
    let p1 = 1;
    let p2 = 0;
    for (let j = 1; j <= GL_N; j++) {
      const p3 = p2;
      p2 = p1;
      p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
    }
    pp = (GL_N * (z * p1 - p2)) / (z * z - 1);
    const dz = p1 / pp;
    z -= dz;
    if (Math.abs(dz) < 1e-16) break;
  }
  GL_X.push(z);
  GL_W.push(2 / ((1 - z * z) * pp * pp));
}

/**
 * ∫_a^b t^p/(eᵗ−1) dt (p = 2 or 3) by Gauss–Legendre, for b − a ≤ 1, with
 * a = a + al and b = b + bl in double-double (the width b − a of a very
 * narrow band must not lose its digits to the rounding of a and b).
 */
function narrowBand(p: number, a: number, al: number, b: number, bl: number): number {
  const half = 0.5 * (b - a + (bl - al));
  let s = 0;
  for (let i = 0; i < GL_N; i++) {
    // Offset from a formed directly (not as t − a) so that the exponential,
    // the only factor sensitive to absolute rounding of t, sees no rounding of a.
    const off = half * (1 + (GL_X[i] as number));
    const t = a + off;
    // t^p e^{−(t−a)} / (1 − e^{−t}); the factor e^{−a} is applied at the end.
    const tp = p === 3 ? t * t * t : t * t;
    s += (GL_W[i] as number) * ((tp * Math.exp(-off)) / -Math.expm1(-t));
  }
  s *= half * (1 - al); // e^{−(a+al)} = e^{−a}(1 − al)
  if (a <= 600) return s * Math.exp(-a);
  const e = Math.exp(-0.5 * a);
  return s * e * e;
}

/** Fraction of emission at t > x (short-wave side); xl = low part of x. */
function shortSide(p: number, x: number, xl: number): number {
  if (x > 1e6) return 0; // e^−x underflows for any x this large (x = ∞ included: the low-part correction would be ∞·0)
  if (x >= 2) {
    if (p === 3) return NORM3 * upper3(x) * (1 - (xl * x * x * x) / (((x + 3) * x + 6) * x + 6));
    return NORM2 * upper2(x) * (1 - (xl * x * x) / ((x + 2) * x + 2));
  }
  return p === 3 ? 1 - NORM3 * lower3(x) : 1 - NORM2 * lower2(x);
}
/** Fraction of emission at t < x (long-wave side). */
function longSide(p: number, x: number): number {
  if (x < 2) return p === 3 ? NORM3 * lower3(x) : NORM2 * lower2(x);
  return p === 3 ? 1 - NORM3 * upper3(x) : 1 - NORM2 * upper2(x);
}
/** Fraction with x2 < t < x1 (x1 ≥ x2 ≥ 0; x1l, x2l the low parts). */
function between(p: number, x1: number, x1l: number, x2: number, x2l: number): number {
  if (x1 === x2 && x1l === x2l) return 0;
  if (x1 < 1e-30) {
    // deep Rayleigh–Jeans side: ∫₀^x t^p/(eᵗ−1) dt = x^p/p to 1e-30, so the
    // fraction is (x1^p/p)(1 − r^p), r = x2/x1, with 1 − r from the exact
    // difference of the double-double x's (no 0/0 of the quadrature at t → 0)
    if (x1 === 0) return 0;
    const r = x2 / x1;
    const oneMinusR = (x1 - x2 + (x1l - x2l)) / x1;
    const oneMinusRp = oneMinusR * (p === 3 ? 1 + r + r * r : 1 + r);
    return (p === 3 ? NORM3 * (x1 * x1 * x1) / 3 : NORM2 * (x1 * x1) / 2) * oneMinusRp;
  }
  if (x1 - x2 <= 1) return Math.max(0, (p === 3 ? NORM3 : NORM2) * narrowBand(p, x2, x2l, x1, x1l));
  if (x2 >= 2) {
    return p === 3 ? NORM3 * (upper3(x2) - upper3(x1)) : NORM2 * (upper2(x2) - upper2(x1));
  }
  if (x1 <= 2) {
    return p === 3 ? NORM3 * (lower3(x1) - lower3(x2)) : NORM2 * (lower2(x1) - lower2(x2));
  }
  return 1 - shortSide(p, x1, 0) - longSide(p, x2);
}

// ---- logarithms of the band integrals, for results whose factors leave the double range ----

/**
 * ln ∫_x^∞ t^p/(eᵗ−1) dt for x ≥ 2 (x = xh + xl): −x + ln Σ_n e^{−(n−1)x}·poly_n(x),
 * the same series as {@link upper3} / {@link upper2} with e^{−x} taken out,
 * so it neither underflows nor loses digits for any finite x.
 */
function lnUpper(p: number, x: number, xl: number): number {
  if (x === Infinity) return -x;
  if (x > 1e6) return -x + p * Math.log(x); // poly(x) = x^p(1 + O(1/x)) and e^−x ≪ 1e-16: exact to double precision (−∞ for x = ∞)
  const q = x > 745 ? 0 : Math.exp(-x);
  let en = 1;
  let s = 0;
  for (let n = 1; n <= 60; n++) {
    const inv = 1 / n;
    const poly = p === 3 ? inv * (x * x * x + inv * (3 * x * x + inv * (6 * x + inv * 6))) : inv * (x * x + inv * (2 * x + inv * 2));
    const term = en * poly;
    s += term;
    if (term < 1e-17 * s) break;
    en *= q;
  }
  const lead = p === 3 ? (((x + 3) * x + 6) * x + 6) : ((x + 2) * x + 2);
  // Low part of x: d/dx ln(upper) ≈ −x^p/poly(x) (first term), times xl.
  return -x + Math.log(s) - (xl * (p === 3 ? x * x * x : x * x)) / lead;
}

/**
 * ln of the fraction between x2 < t < x1 (x1 ≥ x2 ≥ 0) — the log-space twin
 * of {@link between}, for band radiances whose fraction underflows while σT⁴
 * is huge (or the reverse):
 * - the plain fraction when it is a normal double > 1e-300;
 * - both ends in the Wien tail (x2 ≥ 2): ln upper(x2) + log1p(−upper(x1)/upper(x2));
 * - both ends deep in the Rayleigh–Jeans tail (x1 < 1e-30, where
 *   ∫₀^x t^p/(eᵗ−1) dt = x^p/p to 1e-30): ln(x1^p/p) + ln(1 − (λ1/λ2)^p),
 *   the last factor from the wavelengths ((λ2−λ1)/λ2 is exact for close edges);
 * - otherwise the plain fraction (it cannot underflow there).
 */
function lnBetween(p: 2 | 3, l1: number, l2: number, T: number): number {
  computeX(FORM_LAMBDA_ENERGY, l1, T);
  const x1 = dd.hi;
  const x1l = dd.lo;
  computeX(FORM_LAMBDA_ENERGY, l2, T);
  const x2 = dd.hi;
  const x2l = dd.lo;
  const f = between(p, x1, x1l, x2, x2l);
  if (f > 1e-300) return Math.log(f);
  if (l1 === l2) return -Infinity; // a band of zero width
  const lnNorm = Math.log(p === 3 ? NORM3 : NORM2);
  if (x2 >= 2) {
    if (x1 - x2 <= 1) {
      // narrow band in the Wien tail: Gauss–Legendre on the scaled integrand, e^{−x2} in logs
      return lnNorm + lnNarrowBand(p, x2, x2l, x1, x1l);
    }
    const u2 = lnUpper(p, x2, x2l);
    if (u2 === -Infinity) return u2;
    const u1 = lnUpper(p, x1, x1l);
    return lnNorm + u2 + Math.log1p(-Math.exp(u1 - u2));
  }
  if (x1 < 1e-30) {
    const r = l1 / l2;
    const oneMinus = ((l2 - l1) / l2) * (p === 3 ? 1 + r + r * r : 1 + r);
    // ln x1 from the logs when x1 itself left the normal range
    const lnX1 = x1 >= 1e-300 ? Math.log(x1) : Math.log(C2_OVER_HC_K) - Math.log(l1) - Math.log(T);
    return lnNorm + p * lnX1 - Math.log(p) + Math.log(oneMinus);
  }
  return Math.log(f);
}

/** ln of {@link narrowBand} (a = x2 ≥ 2), keeping e^{−a} in the logarithm. */
function lnNarrowBand(p: number, a: number, al: number, b: number, bl: number): number {
  const half = 0.5 * (b - a + (bl - al));
  let s = 0;
  for (let i = 0; i < GL_N; i++) {
    const off = half * (1 + (GL_X[i] as number));
    const t = a + off;
    const tp = p === 3 ? t * t * t : t * t;
    s += (GL_W[i] as number) * ((tp * Math.exp(-off)) / -Math.expm1(-t));
  }
  return Math.log(s * half) - a - al;
}

function xLambda(lambda: number, T: number): number {
  computeX(FORM_LAMBDA_ENERGY, lambda, T);
  return dd.hi;
}

// ---- cores without input checks (inputs finite and > 0) ----

/** Fraction (p = 3 energy, p = 2 photons) below λ without input checks. @internal */
export function fractionBelowWavelengthUnchecked(p: 2 | 3, wavelengthM: number, temperatureK: number): number {
  const x = xLambda(wavelengthM, temperatureK);
  return shortSide(p, x, dd.lo);
}

/** Fraction (p = 3 energy, p = 2 photons) above λ without input checks. @internal */
export function fractionAboveWavelengthUnchecked(p: 2 | 3, wavelengthM: number, temperatureK: number): number {
  return longSide(p, xLambda(wavelengthM, temperatureK));
}

/** Fraction (p = 3 energy, p = 2 photons) between λ₁ and λ₂ without input checks; NaN when λ₂ < λ₁. @internal */
export function fractionBetweenWavelengthsUnchecked(p: 2 | 3, wavelength1M: number, wavelength2M: number, temperatureK: number): number {
  if (wavelength2M < wavelength1M) return NaN;
  const x1 = xLambda(wavelength1M, temperatureK);
  const x1l = dd.lo;
  const x2 = xLambda(wavelength2M, temperatureK);
  return between(p, x1, x1l, x2, dd.lo);
}

/** Fraction (p = 3 energy, p = 2 photons) above ν without input checks. @internal */
export function fractionAboveFrequencyUnchecked(p: 2 | 3, frequencyHz: number, temperatureK: number): number {
  computeX(FORM_NU_ENERGY, frequencyHz, temperatureK);
  return shortSide(p, dd.hi, dd.lo);
}

/** Fraction (p = 3 energy, p = 2 photons) below ν without input checks. @internal */
export function fractionBelowFrequencyUnchecked(p: 2 | 3, frequencyHz: number, temperatureK: number): number {
  computeX(FORM_NU_ENERGY, frequencyHz, temperatureK);
  return longSide(p, dd.hi);
}

/** {@link bandRadianceWavelengthSI} without input checks; +Infinity signals overflow, NaN λ₂ < λ₁. @internal */
export function bandRadianceWavelengthUnchecked(wavelength1M: number, wavelength2M: number, temperatureK: number): number {
  const f = fractionBetweenWavelengthsUnchecked(3, wavelength1M, wavelength2M, temperatureK);
  if (f !== f) return f;
  const m = stefanBoltzmannExitanceUnchecked(temperatureK) / Math.PI;
  const v = m * f;
  if (f > 1e-300 && m >= 1e-300 && m !== Infinity && v >= 1e-300 && v !== Infinity) return v;
  // σT⁴ or the fraction outside the double range, or a subnormal product: in logarithms
  return Math.exp(LN_SIGMA_OVER_PI + 4 * Math.log(temperatureK) + lnBetween(3, wavelength1M, wavelength2M, temperatureK));
}

/** {@link bandPhotonRadianceWavelengthSI} without input checks; NaN when λ₂ < λ₁. @internal */
export function bandPhotonRadianceWavelengthUnchecked(wavelength1M: number, wavelength2M: number, temperatureK: number): number {
  const f = fractionBetweenWavelengthsUnchecked(2, wavelength1M, wavelength2M, temperatureK);
  if (f !== f) return f;
  const t3 = temperatureK * temperatureK * temperatureK;
  const m = (SIGMA_PHOTON * t3) / Math.PI;
  const v = m * f;
  if (f > 1e-300 && m >= 1e-300 && m !== Infinity && v >= 1e-300 && v !== Infinity) return v;
  return Math.exp(Math.log(SIGMA_PHOTON / Math.PI) + 3 * Math.log(temperatureK) + lnBetween(2, wavelength1M, wavelength2M, temperatureK));
}

/** The checks of the between-wavelengths kernels (RangeError naming the argument, in SI units). */
function checkBand(wavelength1M: number, wavelength2M: number, temperatureK: number): void {
  requirePositive("wavelength1", wavelength1M, "m");
  requirePositive("wavelength2", wavelength2M, "m");
  requirePositive("temperature", temperatureK, "K");
  if (wavelength2M < wavelength1M) {
    throw new RangeError(`wavelength2 must be >= wavelength1 (${wavelength1M} m); got ${wavelength2M}`);
  }
}

/**
 * Fraction of a blackbody's exitance emitted at wavelengths below λ,
 * F(0→λT) = (15/π⁴) ∫_{c₂/(λT)}^∞ t³/(eᵗ−1) dt (the handbook "blackbody
 * radiation function"). Accurate to ~1e-15 relative even where it is tiny
 * (use {@link blackbodyFractionAboveWavelengthSI} for the complement, which is
 * equally accurate where *it* is tiny).
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * Source: Planck's law integrated; series as in the module notes.
 * @example
 * ```ts
 * blackbodyFractionBelowWavelengthSI(2898e-6, 1); // ≈ 0.250 (λT at the peak)
 * ```
 */
export function blackbodyFractionBelowWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return fractionBelowWavelengthUnchecked(3, wavelengthM, temperatureK);
}

/**
 * Fraction of a blackbody's exitance emitted at wavelengths above λ,
 * 1 − F(0→λT), computed directly (not by subtraction) where it is small.
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyFractionAboveWavelengthSI(1e-3, 5772); // ≈ 7.9e-10 (far-IR tail of the Sun)
 * ```
 */
export function blackbodyFractionAboveWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return fractionAboveWavelengthUnchecked(3, wavelengthM, temperatureK);
}

/**
 * Fraction of a blackbody's exitance between two wavelengths
 * λ₁ ≤ λ < λ₂: F(0→λ₂T) − F(0→λ₁T), evaluated without catastrophic
 * cancellation (difference of the smaller tails, or direct quadrature for a
 * band narrower than Δ(hc/λkT) = 1).
 *
 * @param wavelength1M - λ₁, m (finite, > 0)
 * @param wavelength2M - λ₂, m (finite, ≥ λ₁)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input or λ₂ < λ₁
 * @example
 * ```ts
 * blackbodyFractionBetweenWavelengthsSI(380e-9, 780e-9, 5772); // ≈ 0.45 (visible light)
 * ```
 */
export function blackbodyFractionBetweenWavelengthsSI(
  wavelength1M: number,
  wavelength2M: number,
  temperatureK: number,
): number {
  checkBand(wavelength1M, wavelength2M, temperatureK);
  return fractionBetweenWavelengthsUnchecked(3, wavelength1M, wavelength2M, temperatureK);
}

/**
 * Fraction of a blackbody's exitance emitted at frequencies above ν
 * (= at wavelengths below c/ν): (15/π⁴) ∫_{hν/kT}^∞ t³/(eᵗ−1) dt.
 *
 * @param frequencyHz - ν, Hz (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyFractionAboveFrequencySI(2.47e15, 10000); // fraction beyond the Lyman limit (13.6 eV)
 * ```
 */
export function blackbodyFractionAboveFrequencySI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  return fractionAboveFrequencyUnchecked(3, frequencyHz, temperatureK);
}

/**
 * Fraction of a blackbody's exitance emitted at frequencies below ν.
 *
 * @param frequencyHz - ν, Hz (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyFractionBelowFrequencySI(1e12, 5772); // tiny: the Sun's sub-mm emission
 * ```
 */
export function blackbodyFractionBelowFrequencySI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  return fractionBelowFrequencyUnchecked(3, frequencyHz, temperatureK);
}

/**
 * Fraction of a blackbody's *photon* emission at wavelengths below λ,
 * (1/(2ζ(3))) ∫_{c₂/(λT)}^∞ t²/(eᵗ−1) dt.
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyPhotonFractionBelowWavelengthSI(500e-9, 5772);
 * ```
 */
export function blackbodyPhotonFractionBelowWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return fractionBelowWavelengthUnchecked(2, wavelengthM, temperatureK);
}

/**
 * Fraction of a blackbody's photon emission at wavelengths above λ.
 *
 * @param wavelengthM - λ, m (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyPhotonFractionAboveWavelengthSI(1e-6, 5772);
 * ```
 */
export function blackbodyPhotonFractionAboveWavelengthSI(wavelengthM: number, temperatureK: number): number {
  requirePositive("wavelength", wavelengthM, "m");
  requirePositive("temperature", temperatureK, "K");
  return fractionAboveWavelengthUnchecked(2, wavelengthM, temperatureK);
}

/**
 * Fraction of a blackbody's photon emission between two wavelengths λ₁ ≤ λ < λ₂.
 *
 * @param wavelength1M - λ₁, m (finite, > 0)
 * @param wavelength2M - λ₂, m (finite, ≥ λ₁)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input or λ₂ < λ₁
 * @example
 * ```ts
 * blackbodyPhotonFractionBetweenWavelengthsSI(400e-9, 700e-9, 5772);
 * ```
 */
export function blackbodyPhotonFractionBetweenWavelengthsSI(
  wavelength1M: number,
  wavelength2M: number,
  temperatureK: number,
): number {
  checkBand(wavelength1M, wavelength2M, temperatureK);
  return fractionBetweenWavelengthsUnchecked(2, wavelength1M, wavelength2M, temperatureK);
}

/**
 * Fraction of a blackbody's photon emission at frequencies above ν.
 *
 * @param frequencyHz - ν, Hz (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns fraction in [0, 1]
 * @throws RangeError for bad input
 * @example
 * ```ts
 * blackbodyPhotonFractionAboveFrequencySI(3.288e15, 40000); // H-ionizing photons of an O star
 * ```
 */
export function blackbodyPhotonFractionAboveFrequencySI(frequencyHz: number, temperatureK: number): number {
  requirePositive("frequency", frequencyHz, "Hz");
  requirePositive("temperature", temperatureK, "K");
  return fractionAboveFrequencyUnchecked(2, frequencyHz, temperatureK);
}

/**
 * Blackbody radiance integrated over a wavelength band,
 * ∫_{λ₁}^{λ₂} B_λ dλ = (σT⁴/π)·[F(0→λ₂T) − F(0→λ₁T)].
 *
 * @param wavelength1M - λ₁, m (finite, > 0)
 * @param wavelength2M - λ₂, m (finite, ≥ λ₁)
 * @param temperatureK - T, K (finite, > 0)
 * @returns W m^-2 sr^-1
 * @throws RangeError for bad input or overflow of σT⁴
 * @example
 * ```ts
 * bandRadianceWavelengthSI(380e-9, 780e-9, 5772);
 * ```
 */
export function bandRadianceWavelengthSI(wavelength1M: number, wavelength2M: number, temperatureK: number): number {
  const f = blackbodyFractionBetweenWavelengthsSI(wavelength1M, wavelength2M, temperatureK);
  return f === 0 ? 0 : (stefanBoltzmannExitanceSI(temperatureK) / Math.PI) * f;
}

/**
 * Blackbody photon radiance integrated over a wavelength band,
 * (σ_γT³/π)·(photon fraction between λ₁ and λ₂), σ_γ = 4πζ(3)k³/(h³c²).
 *
 * @param wavelength1M - λ₁, m (finite, > 0)
 * @param wavelength2M - λ₂, m (finite, ≥ λ₁)
 * @param temperatureK - T, K (finite, > 0)
 * @returns photons s^-1 m^-2 sr^-1
 * @throws RangeError for bad input
 * @example
 * ```ts
 * bandPhotonRadianceWavelengthSI(380e-9, 780e-9, 5772);
 * ```
 */
export function bandPhotonRadianceWavelengthSI(
  wavelength1M: number,
  wavelength2M: number,
  temperatureK: number,
): number {
  checkBand(wavelength1M, wavelength2M, temperatureK);
  return bandPhotonRadianceWavelengthUnchecked(wavelength1M, wavelength2M, temperatureK);
}
