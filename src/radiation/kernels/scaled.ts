/**
 * Products, quotients and powers of finite positive doubles without spurious
 * overflow or underflow of their intermediates: the plain expression when
 * every partial result is a normal double (the fast path, bit-identical to
 * the textbook formula), otherwise binary mantissas and exponents kept
 * apart and joined with one final rounding (so a true result that is a
 * normal double comes out to a few ulp, a subnormal one correctly rounded,
 * and 0 / +Infinity only beyond the double range). Used where a law's
 * factors can individually leave the range while the answer does not
 * (λ⁵B, 4πd²F, L/(4πd²), f_ν c/λ²).
 *
 * @internal
 */
/** Smallest positive normal double, 2^−1022. */
const MIN_NORMAL = 2.2250738585072014e-308;

/** True when v is a normal double (|v| ≥ 2^−1022 and finite): no precision was lost to underflow or overflow. */
export function normal(v: number): boolean {
  return v >= MIN_NORMAL && v !== Infinity;
}

/**
 * x = m·2^e with m in [1, 2), for finite x > 0 (subnormals included); the
 * exponent goes to {@link frexpExponent}. @internal
 */
let frexpExponent = 0;
function frexpMantissa(x: number): number {
  let e = Math.floor(Math.log2(x));
  // 2^−e in two exact halves (2^1074 alone would overflow).
  const h = Math.trunc(-e / 2);
  let m = x * 2 ** h * 2 ** (-e - h);
  if (m >= 2) {
    m /= 2;
    e++;
  } else if (m < 1) {
    m *= 2;
    e--;
  }
  frexpExponent = e;
  return m;
}

/** m·2^e with a single final rounding (correct subnormals; ±Infinity beyond the range). @internal */
function ldexp(m: number, e: number): number {
  if (e > 1023) return e > 2100 ? m * Infinity : m * 2 ** 1023 * 2 ** (e - 1023);
  if (e < -1022) return e < -2200 ? 0 : m * 2 ** -1022 * 2 ** (e + 1022);
  return m * 2 ** e;
}

/**
 * (n1·n2·n3·n4)/(d1·d2·d3) for finite positive factors, without spurious
 * overflow or underflow of the intermediates (inverse-square laws, f_ν ↔ f_λ):
 * the plain expression when every partial product is a normal double,
 * otherwise mantissas and binary exponents separately, with one final
 * rounding. Returns 0 or +Infinity only when the true value is beyond the
 * double range (or a correctly rounded subnormal below it). @internal
 */
export function scaledQuotient(n1: number, n2: number, n3: number, n4: number, d1: number, d2: number, d3: number): number {
  const p = n1 * n2 * n3 * n4;
  const q = d1 * d2 * d3;
  if (normal(n1 * n2) && normal(n1 * n2 * n3) && normal(p) && normal(d1 * d2) && normal(q)) return p / q;
  let m = frexpMantissa(n1);
  let e = frexpExponent;
  m *= frexpMantissa(n2);
  e += frexpExponent;
  m *= frexpMantissa(n3);
  e += frexpExponent;
  m *= frexpMantissa(n4);
  e += frexpExponent;
  m /= frexpMantissa(d1);
  e -= frexpExponent;
  m /= frexpMantissa(d2);
  e -= frexpExponent;
  m /= frexpMantissa(d3);
  e -= frexpExponent;
  return ldexp(m, e);
}

/** √(n/(d1·d2)) for finite positive inputs, with no spurious overflow or underflow of n/(d1·d2). @internal */
export function scaledSqrtQuotient(n: number, d1: number, d2: number): number {
  const q = n / (d1 * d2);
  if (normal(q) && normal(d1 * d2)) return Math.sqrt(q);
  let m = frexpMantissa(n);
  let e = frexpExponent;
  m /= frexpMantissa(d1);
  e -= frexpExponent;
  m /= frexpMantissa(d2);
  e -= frexpExponent;
  if (e % 2 !== 0) {
    m *= 2;
    e -= 1;
  }
  return ldexp(Math.sqrt(m), e / 2);
}

/**
 * log₁₀(a/b) for finite positive a, b: log₁₀ of the quotient when it is a
 * normal double (exact for exact powers of ten), otherwise the difference of
 * the logarithms (no spurious ±Infinity from an overflowing or underflowing
 * quotient, no precision lost to a subnormal one). @internal
 */
export function log10Ratio(a: number, b: number): number {
  const r = a / b;
  return normal(r) ? Math.log10(r) : Math.log10(a) - Math.log10(b);
}

/**
 * k·10^e for finite k > 0 and finite e, with 10^e split in two when it alone
 * would leave the normal range (a star 800 mag faint still has a representable
 * flux in W m^-2 once the zero point multiplies it). 0 / +Infinity only when
 * the true value is beyond the double range. @internal
 */
export function timesPow10(k: number, e: number): number {
  const r = 10 ** e;
  if (normal(r)) return k * r;
  if (e > 1e4) return Infinity;
  if (e < -1e4) return 0;
  const e1 = Math.trunc(e / 2);
  return k * 10 ** e1 * 10 ** (e - e1);
}

/**
 * k·u^p/d for finite positive k, u, d and a small integer p (|p| ≤ 6), with
 * no spurious overflow or underflow of u^p or of the partial products. @internal
 */
export function scaledPower(k: number, u: number, p: number, d: number): number {
  let up = 1;
  for (let i = 0; i < Math.abs(p); i++) up *= u;
  if (p < 0) up = 1 / up;
  const v = (k * up) / d;
  if (normal(up) && normal(k * up) && normal(v)) return v;
  const mu = frexpMantissa(u);
  const eu = frexpExponent;
  let m = frexpMantissa(k);
  let e = frexpExponent + p * eu;
  let mp = 1;
  for (let i = 0; i < Math.abs(p); i++) mp *= mu;
  m = p < 0 ? m / mp : m * mp;
  m /= frexpMantissa(d);
  e -= frexpExponent;
  return ldexp(m, e);
}

/** k·u^p·v^q for finite positive k, u, v and small integers p, q (|p|, |q| ≤ 6), without spurious overflow or underflow. @internal */
export function scaledPower2(k: number, u: number, p: number, v: number, q: number): number {
  let up = 1;
  for (let i = 0; i < Math.abs(p); i++) up *= u;
  if (p < 0) up = 1 / up;
  let vq = 1;
  for (let i = 0; i < Math.abs(q); i++) vq *= v;
  if (q < 0) vq = 1 / vq;
  const r = k * up * vq;
  if (normal(up) && normal(vq) && normal(k * up) && normal(r)) return r;
  let m = frexpMantissa(k);
  let e = frexpExponent;
  const mu = frexpMantissa(u);
  e += p * frexpExponent;
  const mv = frexpMantissa(v);
  e += q * frexpExponent;
  for (let i = 0; i < Math.abs(p); i++) m = p < 0 ? m / mu : m * mu;
  for (let i = 0; i < Math.abs(q); i++) m = q < 0 ? m / mv : m * mv;
  return ldexp(m, e);
}
