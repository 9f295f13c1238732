/**
 * The two systems, SI and CGS, as runtime objects. A quantity's number only
 * means something together with its system, and the system lives in the type;
 * so building, reading, parsing and converting go through `SI` or `CGS`,
 * whose methods accept only quantities of their own system (plus
 * system-free ones).
 *
 * @module
 */
import type { Dimension } from "./dimension";
import type { Kind } from "./aliases";
import { checkKind, parseQuantityText } from "./parse";
import type { Quantity, QuantityArray, SystemName } from "./quantity";
import { times10, type Unit } from "./unit";

/** The other system. */
export type OtherSystem<S extends SystemName> = S extends "SI" ? "CGS" : "SI";

/** Options for {@link UnitSystem.format}. */
export interface FormatOptions {
  /** Significant digits (1–17). Default 6. */
  readonly digits?: number;
  /** `"auto"` (default): plain notation for 1e-4 ≤ |x| < 1e6, exponent otherwise; or always `"exponential"` / `"fixed"` (then `digits` are decimals). */
  readonly notation?: "auto" | "exponential" | "fixed";
}

/** Anything carrying a runtime dimension: a {@link Unit} or a {@link Kind}. */
export interface HasDimension<D extends Dimension> {
  /** The runtime dimension object (exponents of the seven base dimensions). */
  readonly dimension: D;
}

/**
 * A system of units (SI or CGS): builds quantities from numbers in named
 * units, reads them back, parses and formats text, and converts from the
 * other system.
 */
export interface UnitSystem<S extends SystemName> {
  /** `"SI"` or `"CGS"`. */
  readonly name: S;
  /**
   * Decimal exponent of this system's coherent unit of a dimension, in SI
   * base units: 0 for SI; −2·L − 3·M for CGS (1 cm = 10⁻² m, 1 g = 10⁻³ kg).
   */
  exp10(d: Dimension): number;
  /**
   * The coherent unit of a dimension in this system, written in the parser's
   * grammar (for messages): `"cm"`, `"g cm^2 s^-3"` (erg s⁻¹), `"K"`.
   *
   * @example
   * ```ts
   * import { CGS, kinds } from "starlume";
   * CGS.coherentUnit(kinds.flux.dimension); // "g s^-3" (erg s^-1 cm^-2)
   * ```
   */
  coherentUnit(d: Dimension): string;
  /**
   * A quantity from a number in a unit.
   *
   * @example
   * ```ts
   * import { CGS, units } from "starlume";
   * const lambda = CGS.of(500, units.nm); // 5e-5 (cm)
   * ```
   */
  of<D extends Dimension>(value: number, unit: Unit<D>): Quantity<D, S>;
  /**
   * The number a quantity has in a unit of its dimension.
   *
   * @example
   * ```ts
   * import { SI, units } from "starlume";
   * SI.valueIn(SI.of(1, units.au), units.km); // 149597870.7
   * ```
   */
  valueIn<D extends Dimension>(q: Quantity<D, S>, unit: Unit<NoInfer<D>>): number;
  /**
   * Convert a quantity from the other system into this one. The dimension
   * must be given at run time (a unit or a kind of that dimension), since
   * the number alone does not carry it.
   *
   * @example
   * ```ts
   * import { CGS, SI, kinds, units } from "starlume";
   * const lsun = SI.of(1, units.Lsol);
   * const inErgPerS = CGS.from(lsun, kinds.power); // 3.828e33
   * ```
   */
  from<D extends Dimension>(q: Quantity<D, OtherSystem<S>>, kind: HasDimension<NoInfer<D>>): Quantity<D, S>;
  /**
   * Parse `"<number> <unit>"` and check that the unit is of the requested
   * kind; throws `ParseError` otherwise.
   *
   * @example
   * ```ts
   * import { SI, kinds } from "starlume";
   * const p = SI.parse("1.2 mas", kinds.angle);
   * ```
   */
  parse<D extends Dimension>(text: string, kind: HasDimension<D> & { readonly name: string }): Quantity<D, S>;
  /**
   * Format a quantity in a unit, e.g. `"656.28 nm"`. The output is valid
   * input for {@link UnitSystem.parse}.
   *
   * @example
   * ```ts
   * import { SI, units } from "starlume";
   * SI.format(SI.of(5772, units.K), units.K, { digits: 4 }); // "5772 K"
   * ```
   */
  format<D extends Dimension>(q: Quantity<D, S>, unit: Unit<NoInfer<D>>, options?: FormatOptions): string;
  /**
   * A typed array of quantities from numbers in a unit (a new array).
   *
   * @example
   * ```ts
   * import { SI, units } from "starlume";
   * const grid = SI.arrayOf([400, 500, 600], units.nm);
   * ```
   */
  arrayOf<D extends Dimension>(values: ArrayLike<number>, unit: Unit<D>): QuantityArray<D, S>;
  /**
   * The numbers of a typed array of quantities in a unit (a new array).
   *
   * @example
   * ```ts
   * import { SI, units } from "starlume";
   * SI.arrayIn(SI.arrayOf([1, 2], units.km), units.m); // Float64Array [1000, 2000]
   * ```
   */
  arrayIn<D extends Dimension>(values: QuantityArray<D, S>, unit: Unit<NoInfer<D>>): Float64Array;
}

function formatNumber(x: number, options: FormatOptions | undefined): string {
  const notation = options?.notation ?? "auto";
  const digits = options?.digits ?? 6;
  if (!Number.isInteger(digits) || digits < 1 || digits > 17) {
    throw new RangeError(`digits must be an integer in [1, 17]; got ${digits}`);
  }
  if (notation === "fixed") return x.toFixed(Math.min(digits, 100));
  const a = Math.abs(x);
  if (notation === "exponential") return x.toExponential(digits - 1).replace("e+", "e");
  if (a !== 0 && (a < 1e-4 || a >= 1e6)) {
    // auto: drop trailing zeros of the mantissa, as plain notation does
    return x.toExponential(digits - 1).replace(/\.?0+e/, "e").replace("e+", "e");
  }
  return String(Number(x.toPrecision(digits)));
}

function makeSystem<S extends SystemName>(name: S, exp10: (d: Dimension) => number): UnitSystem<S> {
  // One `unit` in this system's coherent unit, precomputed on the unit as
  // (v × mul) / div with one of mul, div equal to 1: a single correctly
  // rounded operation for decimal units, no branches, no allocation.
  const toBase =
    name === "SI"
      ? (value: number, unit: Unit): number => (unit.scales.divSI === 1 ? value * unit.scales.mulSI : value / unit.scales.divSI)
      : (value: number, unit: Unit): number =>
          unit.scales.divCGS === 1 ? value * unit.scales.mulCGS : value / unit.scales.divCGS;
  const fromBase =
    name === "SI"
      ? (value: number, unit: Unit): number => (unit.scales.mulSI === 1 ? value * unit.scales.divSI : value / unit.scales.mulSI)
      : (value: number, unit: Unit): number =>
          unit.scales.mulCGS === 1 ? value * unit.scales.divCGS : value / unit.scales.mulCGS;
  const base: Record<keyof Dimension, string> = {
    length: name === "SI" ? "m" : "cm",
    mass: name === "SI" ? "kg" : "g",
    time: "s",
    temperature: "K",
    amount: "mol",
    angle: "rad",
    solidAngle: "sr",
  };
  const system: UnitSystem<S> = {
    name,
    exp10,
    coherentUnit: (d) => {
      const parts: string[] = [];
      for (const key of Object.keys(base) as (keyof Dimension)[]) {
        const e = d[key];
        if (e !== 0) parts.push(e === 1 ? base[key] : `${base[key]}^${e}`);
      }
      return parts.join(" ");
    },
    of: (value, unit) => toBase(value, unit) as never,
    valueIn: (q, unit) => fromBase(q, unit),
    from:
      name === "SI"
        ? (q, kind) => times10(q, -2 * kind.dimension.length - 3 * kind.dimension.mass) as never
        : (q, kind) => times10(q, 2 * kind.dimension.length + 3 * kind.dimension.mass) as never,
    parse: (text, kind) => {
      const { value, unit } = parseQuantityText(text);
      checkKind(text, unit, kind);
      return toBase(value, unit) as never;
    },
    format: (q, unit, options) => {
      const text = formatNumber(fromBase(q, unit), options);
      return unit.symbol === "" ? text : `${text} ${unit.symbol}`;
    },
    arrayOf: (values, unit) => {
      const out = new Float64Array(values.length);
      for (let i = 0; i < values.length; i++) out[i] = toBase(values[i] as number, unit);
      return out as never;
    },
    arrayIn: (values, unit) => {
      const out = new Float64Array(values.length);
      for (let i = 0; i < values.length; i++) out[i] = fromBase(values[i] as number, unit);
      return out;
    },
  };
  return Object.freeze(system);
}

function cgsExp10(d: Dimension): number {
  return -2 * d.length - 3 * d.mass;
}

/**
 * The International System of Units: lengths in metres, masses in
 * kilograms, energies in joules, powers in watts.
 *
 * @example
 * ```ts
 * import { SI, units } from "starlume";
 * const d = SI.of(10, units.pc);
 * SI.valueIn(d, units.ly); // ≈ 32.6
 * ```
 */
export const SI: UnitSystem<"SI"> = makeSystem("SI", () => 0);

/**
 * The centimetre–gram–second system as astronomers use it: lengths in
 * centimetres, masses in grams, energies in erg, powers in erg s⁻¹.
 * (Electromagnetic units are out of scope: Gaussian CGS electromagnetism is
 * a different system of equations.)
 *
 * @example
 * ```ts
 * import { CGS, units } from "starlume";
 * CGS.of(1, units.J); // 1e7 (erg)
 * ```
 */
export const CGS: UnitSystem<"CGS"> = makeSystem("CGS", cgsExp10);

/**
 * The system object for a name.
 *
 * @example
 * ```ts
 * import { systemNamed } from "starlume";
 * systemNamed("CGS").name; // "CGS"
 * ```
 */
export function systemNamed<S extends SystemName>(name: S): UnitSystem<S> {
  return (name === "SI" ? SI : CGS) as unknown as UnitSystem<S>;
}

/** Re-export for users of `UnitSystem.from`. */
export type { Kind };
