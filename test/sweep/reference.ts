/**
 * High-precision reference values for the full-range sweep, computed with
 * decimal.js (a devDependency) at 40 significant digits and an exponent range
 * far beyond the double range, from the defining formulas and the exact SI
 * constants (CODATA 2018: h, c, k exact; IAU 2015 B2: L₀, au, parsec). No
 * library code is used here: the reference is independent of the kernels.
 */
import Decimal from "decimal.js";

/** 40 digits, exponents to ±9e15 (so 1e−1620 or 1e1600 are representable). */
export const D = Decimal.clone({ precision: 40, minE: -9e15, maxE: 9e15, rounding: Decimal.ROUND_HALF_EVEN });
export type Dec = InstanceType<typeof D>;
/** 120-digit context for the Bernoulli recurrence (it cancels ~k·log10(2π) digits). */
const DH = Decimal.clone({ precision: 120, minE: -9e15, maxE: 9e15 });

export const H = new D("6.62607015e-34");
export const C = new D("299792458");
export const K = new D("1.380649e-23");
export const PI = D.acos(-1);
export const HC = H.mul(C);
export const C2 = HC.div(K);
export const ZETA3 = new D("1.202056903159594285399738161511449990764986292");
/** σ = 2π⁵k⁴/(15h³c²). */
export const SIGMA = PI.pow(5).mul(2).mul(K.pow(4)).div(H.pow(3).mul(C.pow(2)).mul(15));
export const AU = new D("149597870700");
export const PARSEC = AU.mul(648000).div(PI);
export const TEN_PC = PARSEC.mul(10);
export const L0 = new D("3.0128e28");
export const F0 = L0.div(PI.mul(4).mul(TEN_PC.pow(2)));
export const AB0 = new D("3631e-26");
export const ZERO = new D(0);
export const INF = new D(Infinity);

/** e^x, with exact 0 / Infinity far outside any double-relevant range (|x| > 1e7: the true value is < 10^-4e6 or > 10^4e6). */
export function exp(x: Dec): Dec {
  if (x.gt(1e7)) return INF;
  if (x.lt(-1e7)) return ZERO;
  return x.exp();
}
/** e^x − 1 without cancellation. */
export function expm1(x: Dec): Dec {
  if (x.abs().lt(1e-8)) return x.add(x.pow(2).div(2)).add(x.pow(3).div(6)).add(x.pow(4).div(24));
  return exp(x).sub(1);
}
/** ln(1 + y) for y ≥ 0 without cancellation. */
export function log1p(y: Dec): Dec {
  if (y.lt(1e-10)) return y.sub(y.pow(2).div(2)).add(y.pow(3).div(3)).sub(y.pow(4).div(4));
  return y.add(1).ln();
}
/** 10^e, with exact 0 / Infinity far outside the double range. */
export function pow10(e: Dec): Dec {
  if (e.gt(1e7)) return INF;
  if (e.lt(-1e7)) return ZERO;
  return new D(10).pow(e);
}
export function log10(x: Dec): Dec {
  return x.log(10);
}

// ---- Planck ----
/** x = hc/(λkT). */
export const xLambda = (l: Dec, T: Dec): Dec => C2.div(l.mul(T));
/** x = hν/(kT). */
export const xNu = (nu: Dec, T: Dec): Dec => H.mul(nu).div(K.mul(T));
/** 1/(e^x − 1), from e^−x for large x. */
function bose(x: Dec): Dec {
  if (x.gt(50)) {
    const e = exp(x.neg());
    return e.div(D.sub(1, e));
  }
  return D.div(1, expm1(x));
}
export const bLambda = (l: Dec, T: Dec): Dec => HC.mul(C).mul(2).div(l.pow(5)).mul(bose(xLambda(l, T)));
export const bNu = (nu: Dec, T: Dec): Dec => H.mul(2).mul(nu.pow(3)).div(C.pow(2)).mul(bose(xNu(nu, T)));
export const bSigma = (s: Dec, T: Dec): Dec => HC.mul(C).mul(2).mul(s.pow(3)).mul(bose(C2.mul(s).div(T)));
/** ∂B/∂T = B · (x/T) / (1 − e^−x). */
export const dbLambda = (l: Dec, T: Dec): Dec => {
  const x = xLambda(l, T);
  const den = x.lt(1e-8) ? expm1(x.neg()).neg() : D.sub(1, exp(x.neg()));
  return bLambda(l, T).mul(x).div(T).div(den);
};
export const dbNu = (nu: Dec, T: Dec): Dec => {
  const x = xNu(nu, T);
  const den = x.lt(1e-8) ? expm1(x.neg()).neg() : D.sub(1, exp(x.neg()));
  return bNu(nu, T).mul(x).div(T).div(den);
};

// ---- Wien roots x = n(1 − e^−x) ----
const wienRoots = new Map<number, Dec>();
export function wienRoot(n: number): Dec {
  let x = wienRoots.get(n);
  if (x) return x;
  x = new D(n);
  for (let i = 0; i < 200; i++) x = D.sub(1, x.neg().exp()).mul(n);
  wienRoots.set(n, x);
  return x;
}

/** The exact value of a double (new D(x) would take its shortest decimal form, which for a subnormal is far from exact). */
export function exact(x: number): Dec {
  if (x === 0 || !Number.isFinite(x)) return new D(x);
  const dv = new DataView(new ArrayBuffer(8));
  dv.setFloat64(0, x);
  const hi = dv.getUint32(0);
  const lo = dv.getUint32(4);
  const sign = hi >>> 31 ? -1 : 1;
  const be = (hi >>> 20) & 0x7ff;
  const mant = (BigInt(hi & 0xfffff) << 32n) | BigInt(lo);
  const m = be === 0 ? mant : mant | (1n << 52n);
  const e = (be === 0 ? 1 : be) - 1075;
  return new D(m.toString()).mul(new D(2).pow(e)).mul(sign);
}

// ---- fractional blackbody functions ----
/** β_k = B_k/k! for k ≤ 60 (B_1 = −1/2), from the recurrence in 120 digits. */
const BETA: Dec[] = (() => {
  const fact: InstanceType<typeof DH>[] = [new DH(1)];
  for (let i = 1; i <= 64; i++) fact.push(fact[i - 1]!.mul(i));
  const beta: InstanceType<typeof DH>[] = [new DH(1)];
  for (let m = 1; m <= 60; m++) {
    let s = new DH(0);
    for (let j = 0; j < m; j++) s = s.add(beta[j]!.div(fact[m + 1 - j]!));
    beta.push(s.neg());
  }
  return beta.map((b) => new D(b.toString()));
})();
/** ∫₀^x t^(p)/(eᵗ−1) dt for x ≤ 1 (Bernoulli series). */
function lowerSeries(p: 2 | 3, x: Dec): Dec {
  let s = new D(0);
  for (let k = 0; k <= 60; k++) {
    if (k > 1 && k % 2 === 1) continue; // B_k = 0 for odd k > 1
    const b = BETA[k]!;
    const term = b.mul(x.pow(k + p)).div(k + p);
    s = s.add(term);
    if (k > 2 && term.abs().lt(s.abs().mul(1e-45))) break;
  }
  return s;
}
/** ∫_x^∞ t^(p)/(eᵗ−1) dt for x ≥ 1 (Σ e^{−nx} series). */
function upperSeries(p: 2 | 3, x: Dec): Dec {
  if (x.gt(1e7)) return ZERO;
  let s = new D(0);
  const q = exp(x.neg());
  let e = new D(1);
  for (let n = 1; n < 400; n++) {
    e = e.mul(q);
    if (e.isZero()) break;
    const inv = new D(1).div(n);
    const poly =
      p === 3
        ? x.pow(3).mul(inv).add(x.pow(2).mul(3).mul(inv.pow(2))).add(x.mul(6).mul(inv.pow(3))).add(inv.pow(4).mul(6))
        : x.pow(2).mul(inv).add(x.mul(2).mul(inv.pow(2))).add(inv.pow(3).mul(2));
    const term = e.mul(poly);
    s = s.add(term);
    if (term.lt(s.mul(1e-45))) break;
  }
  return s;
}
/** Γ(p+1)ζ(p+1): the full integral (π⁴/15 or 2ζ(3)). */
export const total = (p: 2 | 3): Dec => (p === 3 ? PI.pow(4).div(15) : ZETA3.mul(2));
export const upper = (p: 2 | 3, x: Dec): Dec => (x.gte(1) ? upperSeries(p, x) : total(p).sub(lowerSeries(p, x)));
export const lower = (p: 2 | 3, x: Dec): Dec => (x.lt(1) ? lowerSeries(p, x) : total(p).sub(upperSeries(p, x)));
/** ∫_{x1}^{x2} (x1 < x2) as a difference of the smaller-side integrals. */
export function between(p: 2 | 3, x1: Dec, x2: Dec): Dec {
  if (x1.gt(x2)) [x1, x2] = [x2, x1];
  return x2.lt(1) ? lower(p, x2).sub(lower(p, x1)) : upper(p, x1).sub(upper(p, x2));
}
