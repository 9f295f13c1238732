/**
 * The sweep harness: seeded log-uniform inputs over the whole double range
 * (plus 0, −0, subnormals, the smallest normal, MAX_VALUE and the invalid
 * NaN / ±Infinity / negatives), and the classification of each call against
 * the high-precision reference:
 * - true value a normal double → finite, within the entry's relative tolerance;
 * - true value below the smallest normal → 0 or the correct subnormal (within
 *   two subnormal steps of the tolerance band), or, where the entry documents
 *   it, a RangeError (photometry results must be > 0);
 * - true value beyond MAX_VALUE → a RangeError naming an argument or the result;
 * - input outside the domain → a RangeError naming that argument;
 * - never NaN, never a silent ±Infinity.
 */
import { mulberry32 } from "../support/random";
import { D, exact, type Dec } from "./reference";

export type Domain = "positive" | "nonnegative" | "real";
export interface ArgSpec {
  /** Name used in the RangeError message. */
  readonly name: string;
  readonly domain: Domain;
  /** Upper bound (inclusive) of the valid domain, where the law has one. */
  readonly max?: number;
  /** Lower bound (exclusive) beyond "positive". */
  readonly minExclusive?: number;
}
export interface SweepEntry {
  /** Exported function (and variant) under test. */
  readonly name: string;
  readonly args: readonly ArgSpec[];
  /** Calls the exported function in SI with plain numbers. */
  readonly call: (...x: number[]) => number;
  /** The true value (decimal.js), or a string: the name of the argument the law must reject. */
  readonly truth: (...x: Dec[]) => Dec | string;
  /** Relative tolerance where the true value is a normal double (justified in the table). */
  readonly tol: number;
  /** Error scale for additive results (magnitudes): |err| ≤ tol·scale instead of tol·|truth|. */
  readonly scale?: (...x: number[]) => number;
  /** "throw": the law documents a RangeError when a positive result underflows. Default "zero". */
  readonly underflow?: "zero" | "throw";
  /** The result's name, accepted in overflow messages besides the argument names. */
  readonly result: string;
  /** Optional focused sampler: inputs where the answer is an ordinary number (a third of the points). */
  readonly focus?: (r: () => number) => number[];
  /** Where the sweep still fails (open work): the reason, reported and not asserted. */
  readonly open?: string;
}

const MIN_NORMAL = 2.2250738585072014e-308;
const MIN_SUB = 5e-324;
/** Values at or above 2^1024 − 2^970 round to Infinity; below it they round to at most MAX_VALUE. */
const OVERFLOW = new D(2).pow(1024).sub(new D(2).pow(970));
const SPECIAL_POS = [0, -0, MIN_SUB, 1e-310, MIN_NORMAL, 1, Number.MAX_VALUE];
const SPECIAL_BAD = [NaN, Infinity, -Infinity, -1, -Number.MAX_VALUE];

/** log-uniform over [2^-1074, MAX_VALUE]. */
export function logUniform(r: () => number): number {
  const e = -1074 + r() * 2098;
  const v = 2 ** e;
  return v === Infinity ? Number.MAX_VALUE : v;
}
/** log-uniform in [10^a, 10^b]. */
export function logIn(r: () => number, a: number, b: number): number {
  return 10 ** (a + r() * (b - a));
}

function sampleArg(r: () => number, spec: ArgSpec): number {
  const u = r();
  if (u < 0.04) return SPECIAL_POS[Math.floor(r() * SPECIAL_POS.length)]!;
  if (u < 0.06) return SPECIAL_BAD[Math.floor(r() * SPECIAL_BAD.length)]!;
  const v = logUniform(r);
  if (spec.domain === "real") return r() < 0.5 ? -v : v;
  if (spec.max !== undefined && r() < 0.5) return spec.max * r(); // inside a bounded domain
  return v;
}

export interface Failure {
  readonly args: number[];
  readonly got: string;
  readonly want: string;
}
export interface SweepStats {
  points: number;
  valueChecks: number;
  underflows: number;
  overflows: number;
  invalid: number;
  worstRel: number;
  worstArgs: number[];
  nonFinite: number;
  failures: Failure[];
  failureCount: number;
}

function domainViolation(spec: ArgSpec, x: number): boolean {
  if (!Number.isFinite(x)) return true;
  if (spec.domain === "positive" && !(x > 0)) return true;
  if (spec.domain === "nonnegative" && !(x >= 0)) return true;
  if (spec.minExclusive !== undefined && !(x > spec.minExclusive)) return true;
  if (spec.max !== undefined && x > spec.max) return true;
  return false;
}

const show = (d: Dec): string => d.toSignificantDigits(17).toString();

export function runSweep(e: SweepEntry, points: number, seed: number): SweepStats {
  const r = mulberry32(seed);
  const st: SweepStats = { points: 0, valueChecks: 0, underflows: 0, overflows: 0, invalid: 0, worstRel: 0, worstArgs: [], nonFinite: 0, failures: [], failureCount: 0 };
  const fail = (args: number[], got: string, want: string): void => {
    st.failureCount++;
    if (st.failures.length < 8) st.failures.push({ args, got, want });
  };
  for (let i = 0; i < points; i++) {
    const args = e.focus && i % 3 === 0 ? e.focus(r) : e.args.map((a) => sampleArg(r, a));
    st.points++;
    let got: number | undefined;
    let err: unknown;
    try {
      got = e.call(...args);
    } catch (ex) {
      err = ex;
    }
    if (got !== undefined && !Number.isFinite(got)) st.nonFinite++;
    const bad = e.args.findIndex((a, k) => domainViolation(a, args[k]!));
    let truth: Dec | string;
    if (bad >= 0) truth = e.args[bad]!.name;
    else truth = e.truth(...args.map(exact));
    const names = [...e.args.map((a) => a.name), e.result];
    if (typeof truth === "string") {
      st.invalid++;
      if (!(err instanceof RangeError) || !err.message.includes(truth)) {
        fail(args, err ? String(err) : String(got), `RangeError naming ${truth}`);
      }
      continue;
    }
    const abs = truth.abs();
    if (abs.gte(OVERFLOW)) {
      st.overflows++;
      if (!(err instanceof RangeError) || !names.some((n) => (err as Error).message.includes(n))) {
        fail(args, err ? String(err) : String(got), `RangeError (true value ${show(truth)} overflows)`);
      }
      continue;
    }
    if (err !== undefined || got === undefined) {
      if (abs.lt(MIN_NORMAL) && e.underflow === "throw" && err instanceof RangeError) {
        st.underflows++;
        continue;
      }
      fail(args, String(err), show(truth));
      continue;
    }
    if (Number.isNaN(got) || !Number.isFinite(got)) {
      fail(args, String(got), show(truth));
      continue;
    }
    if (abs.lt(MIN_NORMAL)) {
      st.underflows++;
      // 0 or the correct subnormal: within the tolerance band plus two subnormal steps
      const diff = exact(got).sub(truth).abs();
      if (got !== 0 && diff.gt(abs.mul(e.tol).add(2 * MIN_SUB))) fail(args, String(got), `${show(truth)} (subnormal)`);
      continue;
    }
    st.valueChecks++;
    const scale = e.scale ? exact(e.scale(...args)).abs().add(abs) : abs;
    const rel = exact(got).sub(truth).abs().div(scale).toNumber();
    if (rel > st.worstRel) {
      st.worstRel = rel;
      st.worstArgs = args;
    }
    if (!(rel <= e.tol)) fail(args, String(got), `${show(truth)} (rel err ${rel.toExponential(2)} > ${e.tol})`);
  }
  return st;
}
