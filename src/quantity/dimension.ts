/**
 * Dimensions: the exponents of the seven base dimensions starlume tracks.
 *
 * Beside the SI base dimensions length, mass, time, thermodynamic temperature
 * and amount of substance, **angle** and **solid angle** are tracked as their
 * own dimensions. SI counts the radian and the steradian as dimensionless; we
 * do not, so that a radiance (per steradian) cannot be used where a flux is
 * expected and an angle in arcseconds cannot slip into a plain-number slot.
 * Electromagnetic quantities are out of scope: Gaussian CGS electromagnetism
 * is a different system of equations, not merely of units.
 *
 * @module
 */
import type { AddTable, Exponent, ExponentOutOfRange, HalfTable, NegTable, ThirdTable } from "./exponents";

export type { Exponent, ExponentOutOfRange } from "./exponents";

/** Names of the base dimensions, in the order used for display. */
export const baseDimensions = ["length", "mass", "time", "temperature", "amount", "angle", "solidAngle"] as const;

/** One of the base dimension names. */
export type BaseDimension = (typeof baseDimensions)[number];

/**
 * A dimension: an exponent for each base dimension. At the type level each
 * exponent is an integer literal from -12 to 12; at run time a plain object
 * with the same keys.
 *
 * @example
 * ```ts
 * import type { Dimension } from "starlume";
 * type Velocity = { length: 1; mass: 0; time: -1; temperature: 0; amount: 0; angle: 0; solidAngle: 0 };
 * const ok: Dimension = { length: 1, mass: 0, time: -1, temperature: 0, amount: 0, angle: 0, solidAngle: 0 } satisfies Velocity;
 * ```
 */
export interface Dimension {
  /** Exponent of length (base unit m in SI, cm in CGS). */
  readonly length: Exponent;
  /** Exponent of mass (base unit kg in SI, g in CGS). */
  readonly mass: Exponent;
  /** Exponent of time (s in both systems). */
  readonly time: Exponent;
  /** Exponent of thermodynamic temperature (K in both systems). */
  readonly temperature: Exponent;
  /** Exponent of amount of substance (mol in both systems). */
  readonly amount: Exponent;
  /** Exponent of plane angle (rad in both systems; tracked, unlike in SI). */
  readonly angle: Exponent;
  /** Exponent of solid angle (sr in both systems; tracked, unlike in SI). */
  readonly solidAngle: Exponent;
}

/**
 * A concrete dimension with its seven exponents as type arguments, in the
 * order Length, Mass, Time, temperature (K), amouNt, Angle, solid angle (Sr):
 * `L_M_T_K_N_A_Sr<2, 1, -3, 0, 0, 0, 0>` is power. Type arguments are
 * evaluated eagerly, so long chains of products stay flat and fast to check.
 */
export interface L_M_T_K_N_A_Sr<
  L extends Exponent,
  M extends Exponent,
  T extends Exponent,
  K extends Exponent,
  N extends Exponent,
  A extends Exponent,
  Sr extends Exponent,
> extends Dimension {
  /** Exponent of length, `L`. */
  readonly length: L;
  /** Exponent of mass, `M`. */
  readonly mass: M;
  /** Exponent of time, `T`. */
  readonly time: T;
  /** Exponent of thermodynamic temperature, `K`. */
  readonly temperature: K;
  /** Exponent of amount of substance, `N`. */
  readonly amount: N;
  /** Exponent of plane angle, `A`. */
  readonly angle: A;
  /** Exponent of solid angle, `Sr`. */
  readonly solidAngle: Sr;
}

// Two details below keep long chains of operations flat (no "excessively
// deep" errors): each result is wrapped in a conditional type, and its type
// arguments are written inline without helper aliases. TypeScript defers the
// type arguments of a reference that is a type alias's whole body, or whose
// arguments go through another alias; deferred arguments pile up as a chain.

/** Exponent-wise sum of two dimensions (the dimension of a product). */
export type DimProduct<A extends Dimension, B extends Dimension> = A extends Dimension
  ? L_M_T_K_N_A_Sr<
  AddTable[`${A["length"]}`][`${B["length"]}`],
  AddTable[`${A["mass"]}`][`${B["mass"]}`],
  AddTable[`${A["time"]}`][`${B["time"]}`],
  AddTable[`${A["temperature"]}`][`${B["temperature"]}`],
  AddTable[`${A["amount"]}`][`${B["amount"]}`],
  AddTable[`${A["angle"]}`][`${B["angle"]}`],
  AddTable[`${A["solidAngle"]}`][`${B["solidAngle"]}`]
  >
  : never;

/** The inverse dimension (all exponents negated). */
export type DimInverse<A extends Dimension> = A extends Dimension
  ? L_M_T_K_N_A_Sr<
  NegTable[`${A["length"]}`],
  NegTable[`${A["mass"]}`],
  NegTable[`${A["time"]}`],
  NegTable[`${A["temperature"]}`],
  NegTable[`${A["amount"]}`],
  NegTable[`${A["angle"]}`],
  NegTable[`${A["solidAngle"]}`]
  >
  : never;

/** Exponent-wise difference (the dimension of a quotient). */
export type DimQuotient<A extends Dimension, B extends Dimension> = A extends Dimension
  ? L_M_T_K_N_A_Sr<
  AddTable[`${A["length"]}`][`${NegTable[`${B["length"]}`]}`],
  AddTable[`${A["mass"]}`][`${NegTable[`${B["mass"]}`]}`],
  AddTable[`${A["time"]}`][`${NegTable[`${B["time"]}`]}`],
  AddTable[`${A["temperature"]}`][`${NegTable[`${B["temperature"]}`]}`],
  AddTable[`${A["amount"]}`][`${NegTable[`${B["amount"]}`]}`],
  AddTable[`${A["angle"]}`][`${NegTable[`${B["angle"]}`]}`],
  AddTable[`${A["solidAngle"]}`][`${NegTable[`${B["solidAngle"]}`]}`]
  >
  : never;

/** Half of every exponent (never where one is odd). */
export type DimSqrt<A extends Dimension> = A extends Dimension
  ? L_M_T_K_N_A_Sr<
  HalfTable[`${A["length"]}`],
  HalfTable[`${A["mass"]}`],
  HalfTable[`${A["time"]}`],
  HalfTable[`${A["temperature"]}`],
  HalfTable[`${A["amount"]}`],
  HalfTable[`${A["angle"]}`],
  HalfTable[`${A["solidAngle"]}`]
  >
  : never;

/** A third of every exponent (never where one is not divisible by 3). */
export type DimCbrt<A extends Dimension> = A extends Dimension
  ? L_M_T_K_N_A_Sr<
  ThirdTable[`${A["length"]}`],
  ThirdTable[`${A["mass"]}`],
  ThirdTable[`${A["time"]}`],
  ThirdTable[`${A["temperature"]}`],
  ThirdTable[`${A["amount"]}`],
  ThirdTable[`${A["angle"]}`],
  ThirdTable[`${A["solidAngle"]}`]
  >
  : never;

/** Supported integer powers for {@link pow}. */
export type PowerExponent = -4 | -3 | -2 | -1 | 0 | 1 | 2 | 3 | 4;

/** A dimension raised to an integer power from -4 to 4. */
export type DimPower<A extends Dimension, N extends PowerExponent> = N extends 0
  ? NoDimension
  : N extends 1
    ? A
    : N extends 2
      ? DimProduct<A, A>
      : N extends 3
        ? DimProduct<DimProduct<A, A>, A>
        : N extends 4
          ? DimProduct<DimProduct<A, A>, DimProduct<A, A>>
          : N extends -1
            ? DimInverse<A>
            : N extends -2
              ? DimInverse<DimProduct<A, A>>
              : N extends -3
                ? DimInverse<DimProduct<DimProduct<A, A>, A>>
                : DimInverse<DimProduct<DimProduct<A, A>, DimProduct<A, A>>>;

/** `true` when some exponent of a computed dimension is `never` (out of range, or an impossible root). */
export type HasNever<D> = D extends Dimension
  ? [D["length"]] extends [never]
    ? true
    : [D["mass"]] extends [never]
      ? true
      : [D["time"]] extends [never]
        ? true
        : [D["temperature"]] extends [never]
          ? true
          : [D["amount"]] extends [never]
            ? true
            : [D["angle"]] extends [never]
              ? true
              : [D["solidAngle"]] extends [never]
                ? true
                : false
  : true;

/** A computed dimension, or the out-of-range marker when an exponent left -12..12. */
export type CheckedDimension<D> = HasNever<D> extends true ? ExponentOutOfRange : D;

/** Build a dimension type from a partial list of exponents (the rest are 0). */
export type Dim<P extends Partial<Record<BaseDimension, Exponent>>> = P extends unknown
  ? L_M_T_K_N_A_Sr<
  P["length"] extends Exponent ? P["length"] : 0,
  P["mass"] extends Exponent ? P["mass"] : 0,
  P["time"] extends Exponent ? P["time"] : 0,
  P["temperature"] extends Exponent ? P["temperature"] : 0,
  P["amount"] extends Exponent ? P["amount"] : 0,
  P["angle"] extends Exponent ? P["angle"] : 0,
  P["solidAngle"] extends Exponent ? P["solidAngle"] : 0
  >
  : never;

/** The dimension of a pure number. */
export type NoDimension = Dim<{}>;

/**
 * A dimension whose numeric value does not depend on the system (no length
 * and no mass): temperature, time, frequency, angle, solid angle, amount and
 * their combinations.
 */
export type IsSystemFree<D extends Dimension> = D["length"] extends 0 ? (D["mass"] extends 0 ? true : false) : false;

/**
 * Make a runtime dimension object from a partial list of exponents.
 *
 * @example
 * ```ts
 * import { dimension } from "starlume";
 * const velocity = dimension({ length: 1, time: -1 });
 * velocity.mass; // 0
 * ```
 */
export function dimension<const P extends Partial<Record<BaseDimension, Exponent>>>(exponents: P): Dim<P> {
  return {
    length: exponents.length ?? 0,
    mass: exponents.mass ?? 0,
    time: exponents.time ?? 0,
    temperature: exponents.temperature ?? 0,
    amount: exponents.amount ?? 0,
    angle: exponents.angle ?? 0,
    solidAngle: exponents.solidAngle ?? 0,
  } as unknown as Dim<P>;
}

function checkExponent(value: number): Exponent {
  if (!Number.isInteger(value) || value < -12 || value > 12) {
    throw new RangeError(`dimension exponent must be an integer in [-12, 12]; got ${value}`);
  }
  return value as Exponent;
}

/** Runtime product of two dimensions. */
export function multiplyDimensions<A extends Dimension, B extends Dimension>(a: A, b: B): DimProduct<A, B> {
  const out: Record<string, Exponent> = {};
  for (const k of baseDimensions) out[k] = checkExponent(a[k] + b[k]);
  return out as unknown as DimProduct<A, B>;
}

/** Runtime quotient of two dimensions. */
export function divideDimensions<A extends Dimension, B extends Dimension>(a: A, b: B): DimQuotient<A, B> {
  const out: Record<string, Exponent> = {};
  for (const k of baseDimensions) out[k] = checkExponent(a[k] - b[k]);
  return out as unknown as DimQuotient<A, B>;
}

/** Runtime integer power of a dimension. */
export function powerDimension<A extends Dimension, N extends PowerExponent>(a: A, n: N): DimPower<A, N> {
  const out: Record<string, Exponent> = {};
  for (const k of baseDimensions) out[k] = checkExponent(a[k] * n);
  return out as unknown as DimPower<A, N>;
}

/** Runtime root of a dimension; throws when an exponent is not divisible. */
export function rootDimension(a: Dimension, n: 2 | 3): Dimension {
  const out: Record<string, Exponent> = {};
  for (const k of baseDimensions) {
    if (a[k] % n !== 0) throw new RangeError(`cannot take root ${n} of a dimension with ${k} exponent ${a[k]}`);
    out[k] = (a[k] / n) as Exponent;
  }
  return out as unknown as Dimension;
}

/** Whether two runtime dimensions are equal. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  for (const k of baseDimensions) if (a[k] !== b[k]) return false;
  return true;
}

/** Whether a runtime dimension has neither length nor mass (same value in SI and CGS). */
export function isSystemFree(d: Dimension): boolean {
  return d.length === 0 && d.mass === 0;
}

const symbols: Record<BaseDimension, string> = {
  length: "L",
  mass: "M",
  time: "T",
  temperature: "Θ",
  amount: "N",
  angle: "A",
  solidAngle: "Ω",
};

/**
 * A compact text form of a dimension, e.g. `L2 M1 T-3` for power, `1` for a
 * pure number. Used in error messages.
 *
 * @example
 * ```ts
 * import { describeDimension, dimension } from "starlume";
 * describeDimension(dimension({ length: 1, time: -1 })); // "L T-1"
 * ```
 */
export function describeDimension(d: Dimension): string {
  const parts: string[] = [];
  for (const k of baseDimensions) {
    const e = d[k];
    if (e !== 0) parts.push(e === 1 ? symbols[k] : `${symbols[k]}${e}`);
  }
  return parts.length === 0 ? "1" : parts.join(" ");
}
