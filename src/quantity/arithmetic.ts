/**
 * Arithmetic on quantities. Every function here compiles to the plain-number
 * operation; the checking happens only in the types.
 *
 * - `add`, `sub`, comparisons, `min`, `max`, `sum`: operands must share
 *   dimension and system (a CGS length never adds to an SI length).
 * - `mul`, `div`: dimensions combine; an SI operand may meet an SI or a
 *   system-free operand, never a CGS one. A plain number is a dimensionless
 *   operand (`mul(r, 2)` keeps `r`'s type).
 * - `pow`, `sqrt`, `cbrt`: integer powers from -4 to 4; roots only where every
 *   exponent divides evenly (a compile error otherwise).
 *
 * @module
 */
import type { BaseDimension, CheckedDimension, Dimension, HasNever, DimCbrt, DimInverse, DimPower, DimProduct, DimQuotient, DimSqrt, PowerExponent } from "./dimension";
import type {
  AnyQuantity,
  Brand,
  CombinedTag,
  Quantity,
  DimensionOf,
  FactorFor,
  OperandFor,
  Pure,
  QuantityWithTag,
  SystemOf,
  SystemTag,
} from "./quantity";
import type { HalfTable, ThirdTable } from "./exponents";

/**
 * An operand of `mul`, `div`, `inv`, `pow`, `sqrt`, `cbrt`: a branded
 * quantity. (`mul` and `div` also take a plain number as a dimensionless
 * operand.)
 */
export type Operand = AnyQuantity;

/** The type of `a * b`. */
export type Product<A extends AnyQuantity, B extends AnyQuantity> = QuantityWithTag<
  DimProduct<DimensionOf<A>, DimensionOf<B>>,
  CombinedTag<SystemOf<A>, SystemOf<B>>
>;

/** The type of `a / b`. */
export type Quotient<A extends AnyQuantity, B extends AnyQuantity> = QuantityWithTag<
  DimQuotient<DimensionOf<A>, DimensionOf<B>>,
  CombinedTag<SystemOf<A>, SystemOf<B>>
>;


/**
 * The type of `mul(a, b)` where either operand may be a plain number (a
 * dimensionless factor: the other operand's type is kept as it is). The
 * tests use `Brand<any, any>` so that they hold for a generic system `S` too.
 */
export type MulResult<A, B> = A extends AnyBrand ? (B extends AnyBrand ? Product<A, B> : A) : B extends AnyBrand ? B : number;

/** The type of `div(a, b)` where either operand may be a plain number. */
export type DivResult<A, B> = A extends AnyBrand ? (B extends AnyBrand ? Quotient<A, B> : A) : B extends AnyBrand ? Inverse<B> : number;

type AnyBrand = number & Brand<any, any>;

/** The type of `1 / a`. */
export type Inverse<A extends AnyQuantity> = QuantityWithTag<DimInverse<DimensionOf<A>>, SystemOf<A>>;

/**
 * The type of a root: `never` where an exponent does not divide (the
 * argument is then already an error naming the odd exponent, and `never`
 * keeps a second, less helpful error off the result).
 */
export type Root<D, T extends SystemTag> =
  CheckedDimension<D> extends infer C ? (C extends Dimension ? Quantity<C, T> : never) : never;

/** The type of `a ** n` (named `Raised` because `Power` is the physical quantity). */
export type Raised<A extends AnyQuantity, N extends PowerExponent> = QuantityWithTag<DimPower<DimensionOf<A>, N>, SystemOf<A>>;

/** The names of the base dimensions whose exponent in `D` fails a root (`T` is the halving or third table). */
type FailingDimensions<D extends Dimension, T extends HalfTable | ThirdTable> = {
  [K in BaseDimension]: [T[`${D[K]}`]] extends [never] ? K : never;
}[BaseDimension];

/**
 * Marker in a compile error: a square root needs every exponent even. The
 * type argument names the base dimension(s) with an odd exponent, so the
 * first line of the error reads e.g.
 * `… not assignable to parameter of type 'SquareRootNeedsEvenExponents<"length">'`.
 */
export interface SquareRootNeedsEvenExponents<Odd extends BaseDimension> {
  /** The key is the message the compile error shows; `Odd` names the odd exponents. Never present at run time. */
  readonly "cannot take the square root: an exponent is odd": Odd;
}

/** Marker in a compile error: a cube root needs every exponent divisible by 3 (the type argument names those that are not). */
export interface CubeRootNeedsExponentsDivisibleBy3<Bad extends BaseDimension> {
  /** The key is the message the compile error shows; `Bad` names the exponents not divisible by 3. Never present at run time. */
  readonly "cannot take the cube root: an exponent is not divisible by 3": Bad;
}

type IsUnion<T, U = T> = T extends unknown ? ([U] extends [T] ? false : true) : never;

/** Marker in a compile error: a list mixes quantities of different kinds or systems. */
export interface MixedQuantities<Q> {
  /** The key is the message the compile error shows; `Q` is the union of the mixed quantity types. Never present at run time. */
  readonly "all values must share one dimension and one system": Q;
}

/** `unknown` when `Q` is one quantity type; an error marker when it is a union (mixed list). */
export type OneKind<Q> = true extends IsUnion<Q> ? MixedQuantities<Q> : unknown;

/**
 * Sum of two quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, add, units } from "starlume";
 * const total = add(SI.of(1, units.au), SI.of(1, units.km)); // metres
 * ```
 */
export function add<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): Q {
  return (a + b) as Q;
}

/**
 * Difference of two quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { CGS, sub, units } from "starlume";
 * const gap = sub(CGS.of(656.3, units.nm), CGS.of(486.1, units.nm)); // centimetres
 * ```
 */
export function sub<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): Q {
  return (a - b) as Q;
}

/**
 * Negation.
 *
 * @example
 * ```ts
 * import { SI, neg, units } from "starlume";
 * neg(SI.of(3, units.km_per_s));
 * ```
 */
export function neg<Q extends AnyQuantity>(a: Q): Q {
  return -a as Q;
}

/**
 * Absolute value.
 *
 * @example
 * ```ts
 * import { SI, abs, units } from "starlume";
 * abs(SI.of(-3, units.km_per_s));
 * ```
 */
export function abs<Q extends AnyQuantity>(a: Q): Q {
  return Math.abs(a) as Q;
}

/**
 * Product; dimensions add exponent-wise. Mixing SI and CGS operands does not
 * compile; system-free quantities and plain numbers combine with either. A
 * plain number is a dimensionless operand: `mul(r, 2)` and `mul(2, r)` are
 * `r`'s type, like `scale(r, 2)`.
 *
 * @example
 * ```ts
 * import { SI, mul, units, type Area, type Length } from "starlume";
 * const r = SI.of(1, units.Rsun);
 * const a: Area<"SI"> = mul(r, r);
 * const d: Length<"SI"> = mul(2, r);
 * ```
 */
export function mul<A extends number, B extends FactorFor<SystemOf<A & AnyQuantity>>>(a: A, b: B): MulResult<A, B> {
  return (a * b) as MulResult<A, B>;
}

/**
 * Quotient; dimensions subtract exponent-wise. Same system rule as {@link mul};
 * a plain number is a dimensionless operand (`div(r, 2)` is a length,
 * `div(1, t)` a frequency).
 *
 * @example
 * ```ts
 * import { SI, div, units, type Velocity } from "starlume";
 * const v: Velocity<"SI"> = div(SI.of(1, units.au), SI.of(1, units.day));
 * ```
 */
export function div<A extends number, B extends FactorFor<SystemOf<A & AnyQuantity>>>(a: A, b: B): DivResult<A, B> {
  return (a / b) as DivResult<A, B>;
}

/**
 * Reciprocal `1 / a`.
 *
 * @example
 * ```ts
 * import { SI, inv, units, type Wavenumber } from "starlume";
 * const k: Wavenumber<"SI"> = inv(SI.of(500, units.nm));
 * ```
 */
export function inv<A extends Operand>(a: A): Inverse<A> {
  return (1 / a) as Inverse<A>;
}

/**
 * Integer power from -4 to 4 (dimension exponents multiply). Uses repeated
 * multiplication for small powers, which is exact where `Math.pow` may not be.
 *
 * @example
 * ```ts
 * import { SI, pow, units, type Volume } from "starlume";
 * const v: Volume<"SI"> = pow(SI.of(2, units.m), 3);
 * ```
 */
export function pow<A extends Operand, N extends PowerExponent>(a: A, n: N): Raised<A, N> {
  let r: number;
  switch (n) {
    case 0:
      r = 1;
      break;
    case 1:
      r = a;
      break;
    case 2:
      r = a * a;
      break;
    case -1:
      r = 1 / a;
      break;
    case -2:
      r = 1 / (a * a);
      break;
    case 3:
      r = a * a * a;
      break;
    case 4: {
      const a2 = a * a;
      r = a2 * a2;
      break;
    }
    case -3:
      r = 1 / (a * a * a);
      break;
    default: {
      const a2 = a * a;
      r = 1 / (a2 * a2);
    }
  }
  return r as Raised<A, N>;
}

/**
 * Square root; a compile error unless every dimension exponent is even.
 *
 * @example
 * ```ts
 * import { SI, sqrt, units, type Length } from "starlume";
 * const area = SI.of(9, units.m2);
 * const side: Length<"SI"> = sqrt(area);
 * ```
 */
export function sqrt<Q extends Operand>(
  a: HasNever<DimSqrt<DimensionOf<Q>>> extends true ? (FailingDimensions<DimensionOf<Q>, HalfTable> extends infer N extends BaseDimension ? SquareRootNeedsEvenExponents<N & BaseDimension> : never) : Q,
): Root<DimSqrt<DimensionOf<Q>>, SystemOf<Q>> {
  return Math.sqrt(a as number) as Root<DimSqrt<DimensionOf<Q>>, SystemOf<Q>>;
}

/**
 * Cube root; a compile error unless every dimension exponent is divisible by 3.
 *
 * @example
 * ```ts
 * import { SI, cbrt, pow, units, type Length } from "starlume";
 * const side: Length<"SI"> = cbrt(pow(SI.of(2, units.m), 3));
 * ```
 */
export function cbrt<Q extends Operand>(
  a: HasNever<DimCbrt<DimensionOf<Q>>> extends true ? (FailingDimensions<DimensionOf<Q>, ThirdTable> extends infer N extends BaseDimension ? CubeRootNeedsExponentsDivisibleBy3<N & BaseDimension> : never) : Q,
): Root<DimCbrt<DimensionOf<Q>>, SystemOf<Q>> {
  return Math.cbrt(a as number) as Root<DimCbrt<DimensionOf<Q>>, SystemOf<Q>>;
}

/**
 * Multiply a quantity by a pure number (a plain number or a dimensionless
 * quantity; an angle or any other quantity is rejected).
 *
 * @example
 * ```ts
 * import { SI, scale, units } from "starlume";
 * const twoAu = scale(SI.of(1, units.au), 2);
 * ```
 */
export function scale<Q extends AnyQuantity>(a: Q, factor: Pure): Q {
  return (a * factor) as Q;
}

/**
 * `a < b` for quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, lt, units } from "starlume";
 * lt(SI.of(1, units.pc), SI.of(1, units.ly)); // false
 * ```
 */
export function lt<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): boolean {
  return a < b;
}

/**
 * `a <= b` for quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, le, units } from "starlume";
 * le(SI.of(1, units.au), SI.of(1, units.pc)); // true
 * ```
 */
export function le<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): boolean {
  return a <= b;
}

/**
 * `a > b` for quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, gt, units } from "starlume";
 * gt(SI.of(1, units.pc), SI.of(1, units.ly)); // true
 * ```
 */
export function gt<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): boolean {
  return a > b;
}

/**
 * `a >= b` for quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, ge, units } from "starlume";
 * ge(SI.of(1, units.pc), SI.of(1, units.pc)); // true
 * ```
 */
export function ge<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>): boolean {
  return a >= b;
}

/**
 * Whether `|a - b| <= rel * max(|a|, |b|)`; for quantities of the same
 * dimension and system.
 *
 * @example
 * ```ts
 * import { SI, near, units } from "starlume";
 * near(SI.of(1000, units.m), SI.of(1, units.km), 1e-15); // true
 * ```
 */
export function near<Q extends AnyQuantity>(a: Q, b: NoInfer<Q>, rel: number): boolean {
  return Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Smallest of one or more quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, min, units } from "starlume";
 * min(SI.of(3, units.K), SI.of(2, units.K));
 * ```
 */
export function min<Q extends AnyQuantity>(first: Q, ...rest: NoInfer<Q>[]): Q {
  let m: number = first;
  for (const x of rest) if (x < m || Number.isNaN(x)) m = x;
  return m as Q;
}

/**
 * Largest of one or more quantities of the same dimension and system.
 *
 * @example
 * ```ts
 * import { SI, max, units } from "starlume";
 * max(SI.of(3, units.K), SI.of(2, units.K));
 * ```
 */
export function max<Q extends AnyQuantity>(first: Q, ...rest: NoInfer<Q>[]): Q {
  let m: number = first;
  for (const x of rest) if (x > m || Number.isNaN(x)) m = x;
  return m as Q;
}

/**
 * Sum of a list of quantities of the same dimension and system, with
 * Neumaier's compensated summation (error bounded independent of length).
 *
 * @example
 * ```ts
 * import { SI, sum, units } from "starlume";
 * sum([SI.of(1, units.W), SI.of(2, units.W)]);
 * ```
 */
export function sum<Q extends AnyQuantity>(values: readonly Q[] & OneKind<Q>): Q {
  let s = 0;
  let c = 0;
  for (const x of values) {
    const t = s + x;
    c += Math.abs(s) >= Math.abs(x) ? s - t + x : x - t + s;
    s = t;
  }
  return (s + c) as Q;
}
