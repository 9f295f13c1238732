/**
 * The Faddeeva function w(z) = e^{−z²} erfc(−iz) over the whole complex
 * plane, the complex kernel of the Voigt line profile.
 *
 * Algorithm (three regions, chosen for ≤ 1e-6 relative error of Re w — and of
 * Im w wherever it is not negligible against |w| — for real x of any size and
 * y ≥ 0; the measured worst errors against a 70-digit mpmath reference are
 * stated in faddeeva.test.ts):
 *
 * 1. 8 ≤ |z| < 50 (outer): Laplace continued fraction
 *    w(z) = (i/√π) / (z − (1/2)/(z − 1/(z − (3/2)/(z − …)))),
 *    evaluated bottom-up with a fixed depth that grows as |z| shrinks
 *    (Gautschi 1970, SIAM J. Numer. Anal. 7, 187; also the outer region of
 *    Poppe & Wijers 1990, ACM TOMS 16, 38). Its truncation error is of the
 *    order of e^{−x²}, below 1e-27 here. For |z| ≥ 50 the asymptotic series
 *    w ≈ (i/√π z) Σ_{k≤5} (2k−1)!!/(2z²)^k (Abramowitz & Stegun 7.1.23) is
 *    used instead (first omitted term ≤ 7e-19 relative).
 * 2. |z| < 8 and y ≥ 1e-3 (inner): Weideman's rational series
 *    (J. A. C. Weideman 1994, "Computation of the complex error function",
 *    SIAM J. Numer. Anal. 31, 1497–1518, eq. 3.11 with N = 40 terms):
 *    w(z) ≈ π^{−1/2}/(L − iz) + 2 Σ_{n=1}^{N} a_n Z^{n−1} / (L − iz)²,
 *    Z = (L + iz)/(L − iz), L = (N/√2)^{1/2}, where a_n are the Fourier
 *    coefficients of (L² + t²) e^{−t²} with t = L tan(θ/2), computed once at
 *    module load by the trapezoidal rule on 4N points, exactly as in
 *    Weideman's paper (no tabulated constants).
 * 3. |z| < 8 and y < 1e-3 (near the real axis): a Taylor series in y about
 *    the real axis, w(x+iy) = Σ_k (iy)^k w⁽ᵏ⁾(x)/k! to k = 3, with
 *    w(x) = e^{−x²} + i Im w(x) (Re w exact), Im w(x) from region 2 at y = 0,
 *    and the derivatives from w′ = −2zw + 2i/√π, w″ = −2w − 2zw′,
 *    w‴ = −4w′ − 2zw″. This keeps Re w accurate where it is tiny
 *    (e^{−x²} ≪ y), which a uniformly absolute-accurate approximation like
 *    region 2 alone cannot (its absolute error ~1e-15 would be large relative
 *    to Re w ≈ y/(√π x²) when y ~ 1e-8). The first neglected term is
 *    O(y⁴ w⁗), below 1e-12 relative for y < 1e-3.
 *
 * In region 1 with y < 1e-6 the subdominant term e^{−z²} (which the
 * truncated fraction omits; it is Re w itself on the real axis) is added.
 *
 * Symmetry w(−x + iy) = conj w(x + iy) reduces everything to x ≥ 0.
 *
 * 0. |x| ≥ 1e8 or y ≥ 1e8 (far): w = i/(√π z) to double precision (the next
 *    term is 1/(2z²) ≤ 5e-17 relative), with a scaled division so that no
 *    square overflows: finite for every finite z.
 *
 * The lower half-plane (y < 0) follows from the reflection
 * w(z) = 2e^{−z²} − w(−z) (Abramowitz & Stegun 7.1.11), with y² − x² and
 * 2xy formed by Dekker's exact products; there w grows like e^{y²−x²} and
 * overflows for y² − x² ≳ 709.
 *
 * @packageDocumentation
 */

const SQRT_PI = Math.sqrt(Math.PI);
const INV_SQRT_PI = 1 / SQRT_PI;
const TWO_INV_SQRT_PI = 2 / SQRT_PI;

/** Number of terms in Weideman's series (region 2). */
const WEIDEMAN_N = 40;
/** Weideman's optimal scale L = (N/√2)^{1/2}. */
const WEIDEMAN_L = Math.sqrt(WEIDEMAN_N / Math.SQRT2);
/** |z| at and beyond which the continued fraction is used. */
const OUTER_RADIUS = 8;
/** y below which the real-axis Taylor series is used inside the inner disc. */
const NEAR_AXIS_Y = 1e-3;
/** y below which e^{−z²} is added to the continued fraction in the outer region. */
const NEAR_AXIS_Y_OUTER = 1e-6;

/**
 * Weideman's coefficients a_1 … a_N: trapezoidal rule on θ_k = kπ/M,
 * k = −M+1 … M (M = 2N; the k = M node has t = ∞ and contributes 0), of
 * a_n = (1/2π) ∫ (L² + t²) e^{−t²} cos(nθ) dθ.
 */
const WEIDEMAN_A: Float64Array = (() => {
  const n = WEIDEMAN_N;
  const m = 2 * n;
  const L = WEIDEMAN_L;
  const a = new Float64Array(n);
  for (let j = 1; j <= n; j++) {
    let s = 0;
    for (let k = -m + 1; k <= m - 1; k++) {
      const theta = (k * Math.PI) / m;
      const t = L * Math.tan(theta / 2);
      s += Math.exp(-t * t) * (L * L + t * t) * Math.cos(j * theta);
    }
    a[j - 1] = s / (2 * m);
  }
  return a;
})();

/** Region 2: Weideman's series; writes into out[0], out[1]. Requires y ≥ 0. */
function weideman(x: number, y: number, out: Float64Array): void {
  const L = WEIDEMAN_L;
  // d = L − iz = (L + y) − i x ; u = L + iz = (L − y) + i x
  const dr = L + y;
  const di = -x;
  const ur = L - y;
  const ui = x;
  // Z = u / d
  const dd = dr * dr + di * di;
  const zr = (ur * dr + ui * di) / dd;
  const zi = (ui * dr - ur * di) / dd;
  // Horner for p(Z) = Σ a_n Z^{n−1}
  let pr = WEIDEMAN_A[WEIDEMAN_N - 1] as number;
  let pi = 0;
  for (let k = WEIDEMAN_N - 2; k >= 0; k--) {
    const tr = pr * zr - pi * zi + (WEIDEMAN_A[k] as number);
    pi = pr * zi + pi * zr;
    pr = tr;
  }
  // 1/d
  const ir = dr / dd;
  const ii = -di / dd;
  // 1/d²
  const i2r = ir * ir - ii * ii;
  const i2i = 2 * ir * ii;
  out[0] = 2 * (pr * i2r - pi * i2i) + INV_SQRT_PI * ir;
  out[1] = 2 * (pr * i2i + pi * i2r) + INV_SQRT_PI * ii;
}

/**
 * Region 1a (|z| ≥ 50): asymptotic series (Abramowitz & Stegun 7.1.23),
 * w ≈ (i/√π)(1/z) Σ_{k=0}^{5} (2k−1)!!/(2z²)^k; the first omitted term is
 * 10395/64 |z|^{−12} ≤ 7e-19 relative. Cheaper than the continued fraction
 * in the far line wings, where synthesis spends most evaluations.
 */
const ASYMPTOTIC_COEF = Float64Array.of(105 / 16, 15 / 8, 3 / 4, 1 / 2, 1);

function asymptotic(x: number, y: number, out: Float64Array): void {
  // q = 1/z²
  const zr2 = x * x - y * y;
  const zi2 = 2 * x * y;
  const d2 = zr2 * zr2 + zi2 * zi2;
  const qr = zr2 / d2;
  const qi = -zi2 / d2;
  // s = 1 + q/2 + 3q²/4 + 15q³/8 + 105q⁴/16 + 945q⁵/32 (Horner)
  let sr = 945 / 32;
  let si = 0;
  for (let k = 0; k < 5; k++) {
    const tr = sr * qr - si * qi + (ASYMPTOTIC_COEF[k] as number);
    si = sr * qi + si * qr;
    sr = tr;
  }
  // 1/z = z̄ / |z|²
  const m = x * x + y * y;
  const ir = x / m;
  const ii = -y / m;
  // p = s / z ; w = (i/√π) p → Re w = −Im p/√π, Im w = Re p/√π
  const pr = sr * ir - si * ii;
  const pi = sr * ii + si * ir;
  out[0] = -INV_SQRT_PI * pi;
  out[1] = INV_SQRT_PI * pr;
}

/** Region 1: Laplace continued fraction; writes into out[0], out[1]. */
function continuedFraction(x: number, y: number, out: Float64Array): void {
  const r2 = x * x + y * y;
  // Depth: enough that the truncation error (~ e^{-x²} for small y, far
  // smaller for larger y) is below 1e-16 relative; measured against mpmath.
  const depth = r2 >= 400 ? 12 : r2 >= 144 ? 24 : 40;
  // Bottom-up: t = z − (k/2)/t, starting from t = z.
  let tr = x;
  let ti = y;
  for (let k = depth; k >= 1; k--) {
    const c = k / 2;
    const d = tr * tr + ti * ti;
    tr = x - (c * tr) / d;
    ti = y + (c * ti) / d;
  }
  // w = (i/√π) / t
  const d = tr * tr + ti * ti;
  out[0] = (INV_SQRT_PI * ti) / d;
  out[1] = (INV_SQRT_PI * tr) / d;
}

/** Region 3: cubic Taylor expansion in y about the real axis (x ≥ 0, |x| < 8). */
function nearAxis(x: number, y: number, out: Float64Array): void {
  weideman(x, 0, out);
  const w0r = Math.exp(-x * x); // exact Re w on the real axis
  const w0i = out[1] as number;
  // w' = −2x w + 2i/√π (on the real axis)
  const w1r = -2 * x * w0r;
  const w1i = TWO_INV_SQRT_PI - 2 * x * w0i;
  // w'' = −2 w − 2x w'
  const w2r = -2 * w0r - 2 * x * w1r;
  const w2i = -2 * w0i - 2 * x * w1i;
  // w''' = −4 w' − 2x w''
  const w3r = -4 * w1r - 2 * x * w2r;
  const w3i = -4 * w1i - 2 * x * w2i;
  // Σ (iy)^k w^(k)/k!: i^0 = 1, i^1 = i, i^2 = −1, i^3 = −i
  const y2 = (y * y) / 2;
  const y3 = (y * y * y) / 6;
  out[0] = w0r - y * w1i - y2 * w2r + y3 * w3i;
  out[1] = w0i + y * w1r - y2 * w2i - y3 * w3r;
}

/** |x| or y at and beyond which w = i/(√π z) to double precision (region 0). */
const FAR_RADIUS = 1e8;

/**
 * Region 0 (|x| ≥ 1e8 or y ≥ 1e8, y ≥ 0): w = i/(√π z) (1 + 1/(2z²) + …),
 * the first correction ≤ 5e-17 relative, so w = i/(√π z) = (y + ix)/(√π|z|²)
 * to double precision (on the real axis also e^{−x²} = 0 there). Evaluated
 * with Smith's scaled division, so neither x² nor y² is formed: finite for
 * every finite argument, and Re w underflows gradually (to the correct
 * subnormal or 0) where y/|z|² does.
 */
function far(ax: number, y: number, out: Float64Array): void {
  // i/(√π z) = (y + i|x|)/(√π |z|²); with r the smaller over the larger of
  // |x|, y and t = 1/(1 + r²): the parts are r t/(√π M) and t/(√π M),
  // M = max(|x|, y), divided last so that only a true underflow rounds.
  if (ax >= y) {
    const r = y / ax;
    const t = INV_SQRT_PI / (1 + r * r);
    out[0] = (r * t) / ax;
    out[1] = t / ax;
  } else {
    const r = ax / y;
    const t = INV_SQRT_PI / (1 + r * r);
    out[0] = t / y;
    out[1] = (r * t) / y;
  }
}

/** Upper half-plane, x ≥ 0 (|x| passed), y ≥ 0, both finite. */
function upper(ax: number, y: number, out: Float64Array): void {
  if (ax >= FAR_RADIUS || y >= FAR_RADIUS) {
    far(ax, y, out);
    return;
  }
  const r2 = ax * ax + y * y;
  if (r2 >= 2500) {
    asymptotic(ax, y, out);
  } else if (r2 >= OUTER_RADIUS * OUTER_RADIUS) {
    continuedFraction(ax, y, out);
    if (y < NEAR_AXIS_Y_OUTER) {
      // The truncated fraction approximates only the asymptotic part; on and
      // next to the real axis the subdominant term e^{−z²} (≤ e^{−64} here)
      // is the whole of Re w when y = 0, so it is added back explicitly.
      const e = Math.exp(-ax * ax);
      out[0] = (out[0] as number) + e * Math.cos(2 * ax * y);
      out[1] = (out[1] as number) - e * Math.sin(2 * ax * y);
    }
  } else if (y < NEAR_AXIS_Y) {
    nearAxis(ax, y, out);
  } else {
    weideman(ax, y, out);
  }
}

/** Veltkamp splitting constant 2^27 + 1 (Dekker 1971, Numer. Math. 18, 224). */
const SPLIT = 134217729;

/** Rounding error of the product a·b (Dekker's two-product: a·b = fl(a·b) + err exactly, barring over/underflow). */
function productError(a: number, b: number, p: number): number {
  const ca = SPLIT * a;
  const ah = ca - (ca - a);
  const al = a - ah;
  const cb = SPLIT * b;
  const bh = cb - (cb - b);
  const bl = b - bh;
  return al * bl - (((p - ah * bh) - al * bh) - ah * bl);
}

let twoPiFixed: { bits: number; value: bigint } | undefined;

/** ⌊2π · 2^bits⌋ by Machin's formula π/4 = 4 arctan(1/5) − arctan(1/239), in BigInt fixed point (cached). */
function twoPiScaled(bits: number): bigint {
  if (twoPiFixed === undefined || twoPiFixed.bits < bits) {
    const guard = 32;
    const one = 1n << BigInt(bits + guard);
    const arctanInv = (m: bigint): bigint => {
      let term = one / m;
      let sum = term;
      const m2 = m * m;
      for (let k = 1n; term !== 0n; k++) {
        term /= m2;
        const t = term / (2n * k + 1n);
        sum += k % 2n === 1n ? -t : t;
      }
      return sum;
    };
    const piG = 4n * (4n * arctanInv(5n) - arctanInv(239n));
    twoPiFixed = { bits, value: (2n * piG) >> BigInt(guard) };
  }
  return twoPiFixed.value >> BigInt(twoPiFixed.bits - bits);
}

/**
 * 2·a·b reduced modulo 2π, for doubles whose product overflows (so both are
 * integers above 2^53): exact BigInt product, reduced against 2π to
 * bitLength + 64 bits (Machin's π), so the reduced angle is correct to
 * double precision. Only reached in the lower half-plane at |x| ≈ |y| ≳ 1e154.
 */
function reducedPhase(a: number, b: number): number {
  const n = 2n * BigInt(a) * BigInt(b);
  const neg = n < 0n;
  const m = neg ? -n : n;
  const bits = m.toString(2).length + 64;
  const P = twoPiScaled(bits);
  const r = (m << BigInt(bits)) % P; // (m mod 2π) · 2^bits, to within m/2π units of 2^-bits·2^bits
  const t = Number(r >> BigInt(bits - 60)) / 2 ** 60;
  return neg ? -t : t;
}

/** ln(DBL_MAX / 2): beyond it 2e^E overflows. */
const LN_HALF_MAX = Math.log(Number.MAX_VALUE / 2);

/**
 * Lower half-plane (y < 0) by the reflection w(z) = 2e^{−z²} − w(−z)
 * (Abramowitz & Stegun 7.1.11 with w = e^{−z²} erfc(−iz)), −z in the upper
 * half-plane. e^{−z²} = e^{E} (cos θ + i sin θ) with E = y² − x² and
 * θ = −2xy, both formed with Dekker's exact products so that neither the
 * modulus nor the phase loses digits to cancellation or to a huge 2xy.
 * When 2e^{E} overflows, out holds ±Infinity (the typed function throws).
 */
function lower(x: number, y: number, out: Float64Array): void {
  const ax = Math.abs(x);
  const ay = -y;
  upper(ax, ay, out); // w(|x| + i|y|) = w(−z) when x ≥ 0, its conjugate when x < 0
  let wr = out[0] as number;
  let wi = out[1] as number;
  if (x > 0) {
    // −z = −x + i|y|: w(−z) = conj w(|x| + i|y|)
    wi = -wi;
  } else {
    // x ≤ 0: −z = |x| + i|y| itself
  }
  // E = |y|² − |x|² without cancellation (exact squares, then one rounding).
  let e: number;
  if (ay === ax) {
    e = 0;
  } else if (ay < ax && ax > 1e154) {
    e = -Infinity; // |x| − |y| ≥ ulp(|x|) ≥ 1e138 and |x| + |y| > 1e154
  } else if (ay > ax && ay > 1e154) {
    e = Infinity;
  } else {
    const py = ay * ay;
    const px = ax * ax;
    e = py - px + (productError(ay, ay, py) - productError(ax, ax, px));
  }
  if (e < -745.2) {
    out[0] = -wr;
    out[1] = -wi;
    return;
  }
  const mag = e > LN_HALF_MAX ? Infinity : 2 * Math.exp(e);
  // θ = −2xy = 2x|y| = p + q exactly (p the rounded product, q its error).
  const p = 2 * x * ay;
  let c: number;
  let s: number;
  if (Math.abs(p) < Number.MAX_VALUE) {
    const q = productError(2 * x, ay, p);
    // q is exact but not small (up to ulp(p)/2): the addition theorem with
    // both angles reduced by Math.cos/Math.sin (exact argument reduction).
    const cp = Math.cos(p);
    const sp = Math.sin(p);
    const cq = Math.cos(q);
    const sq = Math.sin(q);
    c = cp * cq - sp * sq;
    s = sp * cq + cp * sq;
  } else {
    const t = reducedPhase(x, ay);
    c = Math.cos(t);
    s = Math.sin(t);
  }
  if (mag === Infinity) {
    out[0] = c === 0 ? 0 : c > 0 ? Infinity : -Infinity;
    out[1] = s === 0 ? 0 : s > 0 ? Infinity : -Infinity;
    return;
  }
  out[0] = mag * c - wr;
  out[1] = mag * s - wi;
}

/**
 * Faddeeva function w(z) = e^{−z²} erfc(−iz) for z = x + iy anywhere in the
 * complex plane (finite x, y). Writes Re w to `out[0]` and Im w to `out[1]`
 * (no allocation).
 *
 * Dimensionless. Algorithm and sources: see the module header (Weideman 1994
 * rational series, Laplace continued fraction, real-axis Taylor series, the
 * far-field form i/(√π z), and the reflection w(z) = 2e^{−z²} − w(−z) for
 * y < 0). Accuracy (measured against mpmath, test/fixtures/faddeeva.json and
 * faddeeva-plane.json): upper half-plane ≤ 5e-12 relative on Re w, and on
 * Im w where |Im w| > 1e-10 |w| (≤ 1e-12); lower half-plane ≤ 1e-13 relative to
 * 2|e^{−z²}| + |w(−z)| (the two terms of the reflection; w has zeros there,
 * so no relative bound is possible near them). When |w| overflows
 * (y² − x² ≳ 709) the parts are ±Infinity. Non-finite x or y give NaN.
 *
 * @example
 * ```ts
 * const w = new Float64Array(2);
 * faddeeva(0, 1, w); // w[0] = erfcx(1) ≈ 0.4276, w[1] = 0
 * ```
 */
export function faddeeva(x: number, y: number, out: Float64Array): void {
  if (x - x !== 0 || y - y !== 0) {
    out[0] = NaN;
    out[1] = NaN;
    return;
  }
  if (y < 0) {
    lower(x, y, out);
    return;
  }
  upper(Math.abs(x), y, out);
  if (x < 0) out[1] = -(out[1] as number);
}

const scratch = new Float64Array(2);

/**
 * Real part of the Faddeeva function, K(x, y) = Re w(x + iy), the Voigt
 * function of the spectroscopic literature (e.g. Armstrong 1967, JQSRT 7, 61):
 * K(x, y) = (y/π) ∫ e^{−t²} / ((x − t)² + y²) dt for y > 0, e^{−x²} at y = 0.
 * Dimensionless; y ≥ 0 (NaN otherwise). Same algorithm as {@link faddeeva}.
 *
 * @example
 * ```ts
 * voigtFunctionK(0, 0); // 1
 * ```
 */
export function voigtFunctionK(x: number, y: number): number {
  faddeeva(x, y, scratch);
  return scratch[0] as number;
}

/**
 * Scaled complementary error function erfcx(y) = e^{y²} erfc(y) for y ≥ 0,
 * computed as Re w(iy). Dimensionless.
 *
 * @example
 * ```ts
 * erfcxNonNegative(0); // 1
 * ```
 */
export function erfcxNonNegative(y: number): number {
  faddeeva(0, y, scratch);
  return scratch[0] as number;
}
