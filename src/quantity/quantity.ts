/**
 * The branded quantity type. At run time a quantity is a plain `number`; its
 * dimension and its system (SI or CGS) live only in its type, so typed code
 * runs at plain-number speed while inconsistent code does not compile.
 *
 * @module
 */
import type { CheckedDimension, Dimension, NoDimension, IsSystemFree } from "./dimension";


declare const dimensionBrand: unique symbol;
declare const systemBrand: unique symbol;

/** The two systems of units starlume works in. */
export type SystemName = "SI" | "CGS";

/**
 * The system tag stored in a quantity's type: `"SI"`, `"CGS"`, or
 * `"SI=CGS"` for quantities with neither length nor mass in their dimension
 * (temperature, time, frequency, angle, …), whose value is the same in both
 * systems and which either system accepts.
 */
export type SystemTag = SystemName | "SI=CGS";

/** The tag a dimension gets in system `S`: `"SI=CGS"` when the dimension is system-free. */
export type TagFor<D extends Dimension, S extends SystemTag> = IsSystemFree<D> extends true ? "SI=CGS" : S;

/**
 * A physical quantity of dimension `D` expressed in the coherent base units of
 * system `S` (SI: m, kg, s; CGS: cm, g, s). A plain number at run time.
 *
 * The system argument is normalized: for a system-free dimension (no length,
 * no mass) `Quantity<D, "SI">` and `Quantity<D, "CGS">` are the same type.
 * (`S` may also be the tag `"SI=CGS"`, which only system-free dimensions
 * should use; library code builds it from computed dimensions.)
 *
 * @example
 * ```ts
 * import { SI, units, type Quantity, type Dim } from "starlume";
 * const v: Quantity<Dim<{ length: 1; time: -1 }>, "SI"> = SI.of(30, units.km_per_s);
 * ```
 */
export type Quantity<D extends Dimension, S extends SystemTag> = number &
  Brand<D, D["length"] extends 0 ? (D["mass"] extends 0 ? "SI=CGS" : S) : S>;

/**
 * The compile-time-only brand of a quantity. An interface (rather than an
 * object literal type) so that its type arguments are computed once, eagerly:
 * long chains of typed operations stay flat and quick to check.
 */
export interface Brand<D extends Dimension, T extends SystemTag> {
  /** The dimension `D` (compile time only: no such property exists at run time). */
  readonly [dimensionBrand]: D;
  /** The system tag `T` (compile time only: no such property exists at run time). */
  readonly [systemBrand]: T;
}

/** Any quantity of any dimension and system (for constraints). */
export type AnyQuantity = number & Brand<Dimension, SystemTag>;

/**
 * A pure number: a plain `number`, or a dimensionless quantity. A branded
 * quantity of any other dimension (an angle, a length…) is rejected.
 */
export type Pure = number & {
  /** Absent (a plain number) or the empty dimension (compile time only). */
  readonly [dimensionBrand]?: NoDimension;
  /** Absent (a plain number) or `"SI=CGS"`: a pure number is the same in both systems (compile time only). */
  readonly [systemBrand]?: "SI=CGS";
};

/** A typed array of quantities: a `Float64Array` with the same brands. */
export type QuantityArray<D extends Dimension, S extends SystemName> = D extends unknown
  ? Float64Array & Brand<D, D["length"] extends 0 ? (D["mass"] extends 0 ? "SI=CGS" : S) : S>
  : never;

/** Any typed array of quantities. */
export type AnyQuantityArray = Float64Array & Brand<Dimension, SystemTag>;

/** The dimension of a quantity type (an indexed access, so it resolves even inside generic code). */
export type DimensionOf<Q extends AnyQuantity> = Q[typeof dimensionBrand];

/** The system tag of a quantity type. */
export type SystemOf<Q extends AnyQuantity> = Q[typeof systemBrand];

/**
 * The system tag of a product or quotient of quantities tagged `A` and `B`
 * (operands are already known to be compatible). Written so that generic
 * code over `S extends SystemName` resolves without deferral where possible.
 */
export type CombinedTag<A extends SystemTag, B extends SystemTag> = [B] extends ["SI=CGS"]
  ? A
  : [A] extends ["SI=CGS"]
    ? B
    : A;

/** `Quantity<D, …>` from a computed dimension and a tag; an out-of-range dimension is passed through as an error marker. */
export type QuantityWithTag<D, T extends SystemTag> =
  CheckedDimension<D> extends infer C
    ? C extends Dimension
      ? Quantity<C, T>
      : C
    : never;

/** Quantities that may meet a quantity of system tag `T` in a product or quotient: the same system, or system-free. */
export type OperandFor<T extends SystemTag> = AnyQuantity & {
  /** The operand's system tag: `T`, or `"SI=CGS"` (and either system when `T` is itself `"SI=CGS"`); compile time only. */
  readonly [systemBrand]?: T | "SI=CGS" | (T extends "SI=CGS" ? SystemName : never);
};

/**
 * Operands that may meet an operand of system tag `T` in `mul` or `div`: a
 * quantity of the same system, a system-free quantity, or a plain number (a
 * dimensionless factor).
 */
export type FactorFor<T extends SystemTag> = number & {
  /** Absent (a plain number), `T` or `"SI=CGS"` (and either system when `T` is itself `"SI=CGS"`); compile time only. */
  readonly [systemBrand]?: T | "SI=CGS" | (T extends "SI=CGS" ? SystemName : never);
};

/** A quantity in SI, a system-free quantity or a plain number. */
export type SIOperand = number & {
  /** Absent (a plain number), `"SI"` or `"SI=CGS"` (compile time only). */
  readonly [systemBrand]?: "SI" | "SI=CGS";
};

/** A quantity in CGS, a system-free quantity or a plain number. */
export type CGSOperand = number & {
  /** Absent (a plain number), `"CGS"` or `"SI=CGS"` (compile time only). */
  readonly [systemBrand]?: "CGS" | "SI=CGS";
};

/**
 * Treat a plain number as a quantity of type `Q` without checking anything.
 * The escape hatch for typed code built on top of starlume (for example to
 * brand the output of your own plain-number kernel). Prefer `SI.of` and
 * `CGS.of`, which convert from a named unit.
 *
 * @example
 * ```ts
 * import { assume, type Length } from "starlume";
 * const r = assume<Length<"SI">>(6.957e8); // metres, by your own promise
 * ```
 */
export function assume<Q extends AnyQuantity>(value: number): Q {
  return value as Q;
}

/**
 * Treat a `Float64Array` as an array of quantities of type `A` without copying
 * or checking. See {@link assume}.
 *
 * @example
 * ```ts
 * import { assumeArray, type Dim, type QuantityArray } from "starlume";
 * const temps = assumeArray<QuantityArray<Dim<{ temperature: 1 }>, "SI">>(new Float64Array([3000, 5772]));
 * ```
 */
export function assumeArray<A extends AnyQuantityArray>(values: Float64Array): A {
  return values as A;
}

/**
 * The bare number inside a quantity, in its system's coherent base unit,
 * with the brand removed. Reading a value in a named unit (`SI.valueIn`) is
 * almost always what you want instead.
 *
 * @example
 * ```ts
 * import { SI, raw, units } from "starlume";
 * raw(SI.of(5, units.cm)); // 0.05
 * ```
 */
export function raw(q: AnyQuantity | number): number {
  return q;
}
