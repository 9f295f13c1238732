/**
 * Extra-precision helpers shared by the radiation kernels: exact rational
 * values of the radiation constants rebuilt from the CODATA 2018 defining
 * constants, and a little double-double arithmetic (Dekker 1971, "A
 * floating-point technique for extending the available precision",
 * Numer. Math. 18, 224) used to form the Planck exponent x = hc/(λkT) to
 * about 1e-30 relative.
 *
 * Why: the Planck function's relative sensitivity to x is ≈ x (d ln B/d ln x
 * = −x e^x/(e^x−1)), and in the Wien tail x reaches ~800 while B is still a
 * normal double. A plain double x (a few ulp of error) would then cost
 * ~2e-13 relative in B; the double-double x keeps B at the 1e-15 level.
 *
 * @internal
 */
import { C, H, K_B } from "../../values/constants";

/** A decimal string parsed exactly: value = mant × 10^exp10. */
interface ExactDecimal {
  readonly mant: bigint;
  readonly exp10: number;
}

/**
 * Parse the shortest round-trip decimal form of a double (`String(v)`) into an
 * exact decimal. The SI 2019 defining constants h, c, k have at most 9
 * significant digits, so the shortest round-trip string of each double *is*
 * the exact defining value (checked in the tests against CODATA 2018).
 */
export function exactDecimalOf(v: number): ExactDecimal {
  const s = String(v);
  const m = /^(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/.exec(s);
  if (m === null) throw new RangeError(`exactDecimalOf: cannot parse ${s}`);
  const intPart = m[1] ?? "";
  const frac = m[2] ?? "";
  const e = m[3] === undefined ? 0 : Number(m[3]);
  return { mant: BigInt(intPart + frac), exp10: e - frac.length };
}

/** Round num/den (positive bigints) to a double-double [hi, lo]. */
export function rationalToDD(num: bigint, den: bigint): readonly [number, number] {
  // Pick a binary scale S so the integer quotient carries ~170 bits.
  const bitLen = (b: bigint): number => b.toString(2).length;
  const S = 170 - (bitLen(num) - bitLen(den));
  const scaled = S >= 0 ? (num << BigInt(S)) / den : num / (den << BigInt(-S));
  const hiInt = Number(scaled); // round-to-nearest of the 170-bit quotient
  const rem = scaled - BigInt(hiInt);
  const scale = 2 ** -S; // exact power of two for |S| < 1000
  return [hiInt * scale, Number(rem) * scale];
}

const dh = exactDecimalOf(H);
const dc = exactDecimalOf(C);
const dk = exactDecimalOf(K_B);

function pow10(n: number): bigint {
  return 10n ** BigInt(n);
}

/** Exact hc/k as num/den. */
function hcOverK(): readonly [bigint, bigint] {
  const e = dh.exp10 + dc.exp10 - dk.exp10;
  const n = dh.mant * dc.mant;
  return e >= 0 ? [n * pow10(e), dk.mant] : [n, dk.mant * pow10(-e)];
}
/** Exact h/k as num/den. */
function hOverK(): readonly [bigint, bigint] {
  const e = dh.exp10 - dk.exp10;
  return e >= 0 ? [dh.mant * pow10(e), dk.mant] : [dh.mant, dk.mant * pow10(-e)];
}

const c2dd = rationalToDD(...hcOverK());
const hkdd = rationalToDD(...hOverK());
/** Second radiation constant c₂ = hc/k (m K) as a double-double: high part. */
export const C2_HI = c2dd[0];
/** Low part of c₂ (c₂ ≈ C2_HI + C2_LO to ~1e-32 relative). */
export const C2_LO = c2dd[1];
/** h/k (s K) as a double-double: high part. */
export const H_OVER_K_HI = hkdd[0];
/** Low part of h/k. */
export const H_OVER_K_LO = hkdd[1];

/** Dekker's splitter 2^27 + 1. */
const SPLIT = 134217729;

/**
 * Scratch output of the double-double routines (allocation-free): the value
 * is `hi + lo` with |lo| ≤ ulp(hi).
 */
export const dd = { hi: 0, lo: 0 };

/**
 * x = K / (a·b) in double-double, K = kh + kl. Requires |a·b| within
 * [1e-280, 1e280] and a, b within [1e-290, 1e290] so the splits neither
 * overflow nor lose bits to underflow. Result in `dd`.
 */
export function ddDivProduct(kh: number, kl: number, a: number, b: number): void {
  // p = a·b exactly as ph + pl (Dekker TwoProduct).
  let t = SPLIT * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLIT * b;
  const bh = t - (t - b);
  const bl = b - bh;
  const ph = a * b;
  const pl = ah * bh - ph + ah * bl + al * bh + al * bl;
  // q = K / p.
  const q1 = kh / ph;
  t = SPLIT * q1;
  const qh = t - (t - q1);
  const ql = q1 - qh;
  t = SPLIT * ph;
  const ph_h = t - (t - ph);
  const ph_l = ph - ph_h;
  const m = q1 * ph;
  const me = qh * ph_h - m + qh * ph_l + ql * ph_h + ql * ph_l; // q1·ph = m + me exactly
  const r = kh - m - me + kl - q1 * pl;
  const q2 = r / ph;
  const s = q1 + q2;
  dd.hi = s;
  dd.lo = q2 - (s - q1);
}

/**
 * x = K·a / b in double-double, K = kh + kl. Requires a, b and K·a within
 * [1e-280, 1e280]. Result in `dd`.
 */
export function ddMulDiv(kh: number, kl: number, a: number, b: number): void {
  // p = K·a as ph + pl.
  let t = SPLIT * kh;
  const khh = t - (t - kh);
  const khl = kh - khh;
  t = SPLIT * a;
  const ah = t - (t - a);
  const al = a - ah;
  const ph = kh * a;
  const pl = khh * ah - ph + khh * al + khl * ah + khl * al + kl * a;
  // q = p / b.
  const q1 = ph / b;
  t = SPLIT * q1;
  const qh = t - (t - q1);
  const ql = q1 - qh;
  t = SPLIT * b;
  const bh = t - (t - b);
  const bl = b - bh;
  const m = q1 * b;
  const me = qh * bh - m + qh * bl + ql * bh + ql * bl;
  const r = ph - m - me + pl;
  const q2 = r / b;
  const s = q1 + q2;
  dd.hi = s;
  dd.lo = q2 - (s - q1);
}
