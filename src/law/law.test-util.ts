/**
 * Helpers shared by the law toolkit's tests: test laws of every arity, the
 * same laws on the generic (non-generated) path, an independent model of the
 * SI ↔ CGS scaling, and generators of doubles across the whole range.
 */
import fc from "fast-check";
import { Decimal } from "decimal.js";
import { kinds } from "../quantity/aliases";
import { dimension } from "../quantity/dimension";
import type { Kind } from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import type { SystemName } from "../quantity/quantity";
import { defineLaw, type Law } from "./define";
import { lawInput, type LawInput } from "./input";
import { setCodegenForTests } from "./compile";

/** Run `f` with generated code off (laws defined and batch patterns first used inside take the generic path). */
export function withoutCodegen<T>(f: () => T): T {
  const previous = setCodegenForTests(false);
  try {
    return f();
  } finally {
    setCodegenForTests(previous);
  }
}

/**
 * System objects that are neither `SI` nor `CGS` but behave like them: the
 * law cannot recognize them by identity, so every call takes the generic path.
 */
export const SI_COPY = Object.freeze({ ...SI }) as UnitSystem<"SI">;
export const CGS_COPY = Object.freeze({ ...CGS }) as UnitSystem<"CGS">;

/** The CGS → SI exponent of a dimension, from its definition (1 cm = 10⁻² m, 1 g = 10⁻³ kg). */
export function cgsToSIExp(d: Dimension): number {
  return -2 * d.length - 3 * d.mass;
}

/** `v × 10ⁿ` as one correctly rounded operation on the exact double 10^|n| (n ≤ 22). */
export function times10Exact(v: number, n: number): number {
  return n >= 0 ? v * 10 ** n : v / 10 ** -n;
}

/** A caller's value in `sys` moved to SI the way the law must (one exact operation). */
export function toSIModel(sys: UnitSystem<SystemName>, v: number, d: Dimension): number {
  return sys.name === "SI" ? v : times10Exact(v, cgsToSIExp(d));
}

/** An SI result moved into `sys`. */
export function fromSIModel(sys: UnitSystem<SystemName>, v: number, d: Dimension): number {
  return sys.name === "SI" ? v : times10Exact(v, -cgsToSIExp(d));
}

/** What a call did: its value (compared with Object.is) or the message of the error it threw. */
export type Outcome = { value: number } | { error: string; type: string };

export function outcome(f: () => number): Outcome {
  try {
    return { value: f() };
  } catch (e) {
    return { error: (e as Error).message, type: (e as Error).constructor.name };
  }
}

/** A dimension for each CGS scale the tests need (the exponent is CGS → SI). */
const momentum = { name: "momentum", dimension: dimension({ length: 1, mass: 1, time: -1 }) } as Kind<Dimension>;

/**
 * Inputs with different CGS scales, one per position, so that a value moved
 * to the wrong input's scale would show: length (÷10²), energy (÷10⁷),
 * wavenumber (×10²), temperature (×1), momentum (÷10⁵).
 */
export const KIND_BY_POSITION: readonly Kind<Dimension>[] = [kinds.length, kinds.energy, kinds.wavenumber, kinds.temperature, momentum];
export const NAME_BY_POSITION = ["a", "b", "c", "d", "e"] as const;

/** A kernel of `n` SI numbers: a product of powers, so that it spans (and leaves) the double range. */
export function productKernel(n: number): (...x: number[]) => number {
  // distinct exponents, so swapped arguments give different values
  const powers = [1, -1, 2, 1, -2];
  return (...x: number[]) => {
    let p = 1.5;
    for (let k = 0; k < n; k++) p *= (x[k] as number) ** (powers[k] as number);
    return p;
  };
}

/** A test law of `n` inputs with the given checks (default positive), result an energy (CGS ×10⁷). */
export function productLaw(n: number, checks: readonly ("positive" | "nonNegative" | "finite" | "any")[] = []): { law: Law<readonly LawInput[], Dimension>; kernel: (...x: number[]) => number; inputs: LawInput[] } {
  const inputs = Array.from({ length: n }, (_, k) =>
    lawInput(NAME_BY_POSITION[k] as string, KIND_BY_POSITION[k] as Kind<Dimension>, { check: checks[k] ?? "positive" }),
  );
  const kernel = productKernel(n);
  const law = defineLaw({ name: `P${n}`, inputs, result: kinds.energy as Kind<Dimension>, kernel }) as unknown as Law<readonly LawInput[], Dimension>;
  return { law, kernel, inputs };
}

/** Call a law with untyped numbers (the type tests check the typed signature; these check the run-time). */
export function call(law: Law<readonly LawInput[], Dimension>, sys: UnitSystem<SystemName>, args: readonly number[]): number {
  return (law as unknown as (sys: UnitSystem<SystemName>, ...a: number[]) => number)(sys, ...args);
}

/** Call a law's batch form with untyped numbers and arrays. */
export function callBatch(
  law: Law<readonly LawInput[], Dimension>,
  sys: UnitSystem<SystemName>,
  args: readonly (number | Float64Array)[],
): { values: Float64Array; invalid: number[]; reasons: string[] } {
  return (law.batch as unknown as (sys: UnitSystem<SystemName>, ...a: (number | Float64Array)[]) => { values: Float64Array; invalid: number[]; reasons: string[] })(
    sys,
    ...args,
  );
}

/**
 * A positive double drawn log-uniformly over the whole range, subnormals
 * included: m × 2^e with e uniform in [−1074, 1023] and m in [1, 2).
 */
export const positiveDouble: fc.Arbitrary<number> = fc
  .tuple(fc.integer({ min: -1074, max: 1023 }), fc.double({ min: 1, max: 2, maxExcluded: true, noNaN: true }))
  .map(([e, m]) => m * 2 ** e);

/** The values on the edges of every check. */
export const SPECIALS: readonly number[] = [0, -0, NaN, Infinity, -Infinity, Number.MIN_VALUE, -Number.MIN_VALUE, 2.2250738585072014e-308, Number.MAX_VALUE, -Number.MAX_VALUE, 1, -1];

/** Any double: mostly log-uniform of either sign, sometimes a special value. */
export const anyDouble: fc.Arbitrary<number> = fc.oneof(
  { weight: 6, arbitrary: positiveDouble },
  { weight: 2, arbitrary: positiveDouble.map((x) => -x) },
  { weight: 2, arbitrary: fc.constantFrom(...SPECIALS) },
);

/** Exact decimal value of a double (decimal.js with enough digits for any double). */
export const D = Decimal.clone({ precision: 2000, toExpNeg: -9e15, toExpPos: 9e15 });

export function exactDecimal(x: number): Decimal {
  if (x === 0) return new D(0);
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const hi = view.getUint32(0);
  const lo = view.getUint32(4);
  const expBits = (hi >>> 20) & 0x7ff;
  let m = (BigInt(hi & 0xfffff) << 32n) + BigInt(lo);
  let e = -1074;
  if (expBits !== 0) {
    m += 1n << 52n;
    e = expBits - 1075;
  }
  const v = new D(m.toString()).times(new D(2).pow(e));
  return hi >>> 31 ? v.neg() : v;
}

/** The next double above (`+1`) or below (`−1`) a finite `x`. */
export function neighbour(x: number, dir: 1 | -1): number {
  if (x === 0) return dir * Number.MIN_VALUE;
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const away = (x > 0) === (dir > 0);
  view.setBigUint64(0, away ? bits + 1n : bits - 1n);
  return view.getFloat64(0);
}

/** Whether the double `r` is a nearest double to the exact value `exact` (no other double is closer). */
export function isNearest(r: number, exact: Decimal): boolean {
  const d0 = exact.minus(exactDecimal(r)).abs();
  for (const dir of [1, -1] as const) {
    const n = neighbour(r, dir);
    if (n - n !== 0) continue; // beyond MAX_VALUE: only the finite side counts
    if (exact.minus(exactDecimal(n)).abs().lt(d0)) return false;
  }
  return true;
}
