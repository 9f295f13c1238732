/**
 * Axis tick placement for the SVG charts: "nice" 1-2-5 steps on linear axes
 * and decades (with 2…9 minor ticks) on log10 axes, plus the tick labels.
 *
 * The 1-2-5 rule (steps of 1, 2 or 5 times a power of ten) is common practice
 * in plotting; see e.g. P. S. Heckbert, "Nice numbers for graph labels",
 * Graphics Gems (1990), whose idea is used here with its own thresholds.
 *
 * Pure functions, no DOM and no Node APIs.
 *
 * @module
 */

/** Tick positions (in data units) and the labels of the major ticks. */
export interface Ticks {
  /** Labelled tick values, ascending, all within [min, max]. */
  readonly major: number[];
  /** Unlabelled tick values, ascending, within [min, max], not coinciding with a major tick. */
  readonly minor: number[];
  /** One label per major tick. */
  readonly labels: string[];
}

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
  "-": "⁻",
};

/**
 * `10ⁿ` with a Unicode superscript exponent.
 *
 * @example
 * ```ts
 * import { powerOfTenLabel } from "starlume";
 * powerOfTenLabel(-7); // "10⁻⁷"
 * ```
 */
export function powerOfTenLabel(exponent: number): string {
  return "10" + [...String(exponent)].map((c) => SUPERSCRIPT[c] ?? c).join("");
}

/**
 * The nice step (1, 2 or 5 × 10^p) for about `target` intervals over `span`.
 *
 * @returns `[mantissa, p]` so that step = mantissa · 10^p exactly.
 *
 * @example
 * ```ts
 * import { niceStep } from "starlume";
 * niceStep(15.9, 6); // [2, 0]: 15.9 / 6 = 2.65 → step 2
 * ```
 */
export function niceStep(span: number, target: number): [1 | 2 | 5, number] {
  const raw = span / Math.max(1, target);
  let p = Math.floor(Math.log10(raw));
  const norm = raw / 10 ** p;
  let m: 1 | 2 | 5;
  if (norm < 1.5) m = 1;
  else if (norm < 3.5) m = 2;
  else if (norm < 7.5) m = 5;
  else {
    m = 1;
    p += 1;
  }
  return [m, p];
}

/** i · m · 10^p computed so that decimal steps come out exact (3 · 0.1 → 0.3, not 0.30000000000000004). */
function stepValue(i: number, m: number, p: number): number {
  // Parsing the decimal literal gives the correctly rounded double (pow(10, p) need not be).
  return Number(`${i * m}e${p}`);
}

/**
 * Nice linear ticks on [min, max]: majors at multiples of a 1-2-5 step giving
 * about `target` intervals, minors subdividing each step (5 parts for steps
 * 1 and 5, 4 parts for step 2).
 *
 * Labels all print the decimals the step needs (0.0, 0.2, …, 1.0); when the
 * values are ≥ 10⁶ or the step is below 10⁻⁴ the labels use a power of ten,
 * e.g. `2×10⁻⁵`.
 *
 * @param min - lower end (finite).
 * @param max - upper end (finite, > min).
 * @param target - wished number of intervals (default 6).
 * @throws RangeError unless min < max, both finite, 1e-300 ≤ max − min < ∞, and target ≥ 1.
 *
 * @example
 * ```ts
 * import { linearTicks } from "starlume";
 * linearTicks(0, 1).major; // [0, 0.2, 0.4, 0.6, 0.8, 1]
 * ```
 */
export function linearTicks(min: number, max: number, target = 6): Ticks {
  checkRange(min, max);
  const span = max - min;
  if (!(span >= MIN_LINEAR_SPAN && span < Infinity)) {
    throw new RangeError(`max - min must be finite and >= ${MIN_LINEAR_SPAN}; got ${String(span)}`);
  }
  if (!(target >= 1)) throw new RangeError(`target must be >= 1; got ${String(target)}`);
  const [m, p] = niceStep(max - min, target);
  const step = stepValue(1, m, p);
  const eps = 1e-9;
  const i0 = Math.ceil(min / step - eps);
  const i1 = Math.floor(max / step + eps);
  const major: number[] = [];
  for (let i = i0; i <= i1; i++) major.push(stepValue(i, m, p));
  const parts = m === 2 ? 4 : 5;
  const minor: number[] = [];
  const minorStepM = m * 10; // minor step = (m·10 / parts) · 10^(p-1)
  const j0 = Math.ceil((min / step) * parts - eps);
  const j1 = Math.floor((max / step) * parts + eps);
  if (j1 - j0 <= 2000) {
    for (let j = j0; j <= j1; j++) {
      if (j % parts !== 0) minor.push(stepValue(j, minorStepM / parts, p - 1));
    }
  }
  const biggest = Math.max(Math.abs(min), Math.abs(max));
  const labels = major.map((v) => linearLabel(v, p, biggest));
  return { major, minor, labels };
}

function linearLabel(v: number, p: number, biggest: number): string {
  if (biggest >= 1e6 || p < -4) {
    if (v === 0) return "0";
    // toExponential gives mantissa and exponent without dividing by 10^e (safe for subnormals).
    const e = Number(Math.abs(v).toExponential(15).split("e")[1]);
    const digits = Math.max(0, Math.min(15, e - p));
    const [mant = "", exp = "0"] = v.toExponential(digits).split("e");
    const mantText = mant.includes(".") ? mant.replace(/\.?0+$/, "") : mant;
    const pow = powerOfTenLabel(Number(exp));
    if (mantText === "1") return pow;
    if (mantText === "-1") return "−" + pow;
    return `${mantText.replace("-", "−")}×${pow}`;
  }
  return (v === 0 ? 0 : v).toFixed(Math.max(0, -p)).replace("-", "−");
}

/**
 * Log10 ticks on [min, max] (both > 0): majors at the decades inside the
 * range, minors at 2…9 × each decade. Over more than 10 decades the majors
 * are thinned to every k-th decade (minors at the skipped decades); over
 * less than two decades, 2× and 5× are labelled too (a short log axis has too
 * few decades to read values from), and if that still gives fewer than two
 * labels, linear 1-2-5 ticks are used instead.
 *
 * Decade labels are plain numbers (`0.001` … `10000`) when every labelled
 * decade lies in 10⁻³…10⁴, otherwise `10ⁿ` with a superscript exponent.
 *
 * @param min - lower end, finite and > 0.
 * @param max - upper end, finite and > min.
 * @throws RangeError unless 0 < min < max < ∞.
 *
 * @example
 * ```ts
 * import { logTicks } from "starlume";
 * logTicks(1e-7, 1e-5).major;  // [1e-7, 1e-6, 1e-5]
 * logTicks(1e-7, 1e-5).labels; // ["10⁻⁷", "10⁻⁶", "10⁻⁵"]
 * ```
 */
export function logTicks(min: number, max: number): Ticks {
  checkRange(min, max);
  if (!(min > 0)) throw new RangeError(`min must be > 0 on a log axis; got ${String(min)}`);
  const lo = Math.log10(min);
  const hi = Math.log10(max);
  const eps = 1e-9;
  const d0 = Math.ceil(lo - eps);
  const d1 = Math.floor(hi + eps);
  const span = hi - lo;
  const k = span > 10 ? Math.ceil(span / 10) : 1;
  const inRange = (v: number): boolean => v >= min * (1 - eps) && v <= max * (1 + eps);
  const decade = (e: number): number => Number(`1e${e}`);

  const majorExp: number[] = [];
  for (let e = d0; e <= d1; e++) if (((e % k) + k) % k === 0) majorExp.push(e);

  if (k === 1 && (majorExp.length < 2 || span < 2 - 1e-9)) {
    // Less than two decades: label 1, 2 and 5 × 10^e.
    const major: number[] = [];
    const labels: string[] = [];
    const minor: number[] = [];
    for (let e = Math.floor(lo); e <= Math.ceil(hi); e++) {
      for (let m = 1; m <= 9; m++) {
        const v = Number(`${m}e${e}`);
        if (!inRange(v)) continue;
        if (m === 1 || m === 2 || m === 5) {
          major.push(v);
          labels.push(mantissaLabel(m, e));
        } else minor.push(v);
      }
    }
    if (major.length >= 2) return { major, minor, labels };
    return linearTicks(min, max, 4);
  }

  const plain = majorExp.every((e) => e >= -3 && e <= 4);
  const major = majorExp.map(decade);
  const labels = majorExp.map((e) => (plain ? plainDecade(e) : powerOfTenLabel(e)));
  const minor: number[] = [];
  const eStart = Math.floor(lo);
  const eEnd = Math.ceil(hi);
  if (eEnd - eStart <= 400) {
    for (let e = eStart; e <= eEnd; e++) {
      const isMajor = ((e % k) + k) % k === 0;
      if (!isMajor && inRange(decade(e))) minor.push(decade(e));
      if (k === 1) {
        for (let m = 2; m <= 9; m++) {
          const v = Number(`${m}e${e}`);
          if (inRange(v)) minor.push(v);
        }
      }
    }
  }
  return { major, minor, labels };
}

function plainDecade(e: number): string {
  return e >= 0 ? String(10 ** e) : (1 / 10 ** -e).toFixed(-e);
}

function mantissaLabel(m: number, e: number): string {
  if (e >= -3 && e <= 4) return e >= 0 ? String(m * 10 ** e) : (m / 10 ** -e).toFixed(-e);
  return m === 1 ? powerOfTenLabel(e) : `${m}×${powerOfTenLabel(e)}`;
}

function checkRange(min: number, max: number): void {
  if (!Number.isFinite(min)) throw new RangeError(`min must be a finite number; got ${String(min)}`);
  if (!Number.isFinite(max)) throw new RangeError(`max must be a finite number; got ${String(max)}`);
  if (!(min < max)) throw new RangeError(`min must be < max; got min=${String(min)}, max=${String(max)}`);
}

/** Smallest linear span handled (keeps steps out of the subnormal range). */
export const MIN_LINEAR_SPAN = 1e-300;
