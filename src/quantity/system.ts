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
import { inCGS, inSI, SHIFT_MUL_DIV, SHIFT_ZERO, shiftBy } from "./converter";
import type { Unit } from "./unit";

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
 * A function that reads quantities of dimension `D` in system `S` as plain
 * numbers in one unit, from {@link UnitSystem.reader}. (Written as a method
 * type so that `UnitSystem<"SI">` stays assignable to
 * `UnitSystem<SystemName>`; a call still accepts only quantities of `S` or
 * system-free ones.)
 *
 * @example
 * ```ts
 * import { SI, units, type LengthDimension, type QuantityReader } from "starlume";
 * const inKm: QuantityReader<LengthDimension, "SI"> = SI.reader(units.km);
 * inKm(SI.of(1, units.au)); // 149597870.7
 * ```
 */
export type QuantityReader<D extends Dimension, S extends SystemName> = {
  /** The number `q` has in the reader's unit. */
  read(q: Quantity<D, S>): number;
}["read"];

/**
 * A function that converts quantities of dimension `D` from system `From`
 * into system `To`, from {@link UnitSystem.converterFrom} (a method type for
 * the same reason as {@link QuantityReader}).
 *
 * @example
 * ```ts
 * import { CGS, SI, kinds, units, type LengthDimension, type SystemConverter } from "starlume";
 * const toCm: SystemConverter<LengthDimension, "SI", "CGS"> = CGS.converterFrom(kinds.length);
 * toCm(SI.of(1, units.m)); // 100 (cm)
 * ```
 */
export type SystemConverter<D extends Dimension, From extends SystemName, To extends SystemName> = {
  /** `q` (in `From`) expressed in `To`. */
  convert(q: Quantity<D, From>): Quantity<D, To>;
}["convert"];

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
   * The conversion from numbers in `unit` to quantities of this system, as a
   * function to take out of a loop: `value ↦ value × size`, where `size` is
   * one `unit` in this system's coherent unit (m, kg, s… or cm, g, s…). The
   * choice is made when the unit is defined: decimal units (nm, Å, km, erg,
   * Jy…) multiply or divide by an exact power of ten, one correctly rounded
   * operation; other units multiply by their correctly rounded size. The
   * result is bit-for-bit `this.of(value, unit)`.
   *
   * @example
   * ```ts
   * import { SI, units, type Length } from "starlume";
   * const fromNm = SI.converter(units.nm);
   * const grid: Length<"SI">[] = [];
   * for (let nm = 400; nm <= 700; nm += 50) grid.push(fromNm(nm)); // metres: 4e-7, 4.5e-7, …
   * ```
   */
  converter<D extends Dimension>(unit: Unit<D>): (value: number) => Quantity<D, S>;
  /**
   * The reading of quantities of this system in `unit`, as a function to
   * take out of a loop: `q ↦ q ÷ size` (the inverse of
   * {@link UnitSystem.converter}: a division or multiplication by an exact
   * power of ten for decimal units, a division by the correctly rounded size
   * otherwise). The result is bit-for-bit `this.valueIn(q, unit)`.
   *
   * @example
   * ```ts
   * import { CGS, units } from "starlume";
   * const inAngstrom = CGS.reader(units.angstrom);
   * inAngstrom(CGS.of(656.28, units.nm)); // 6562.8
   * ```
   */
  reader<D extends Dimension>(unit: Unit<D>): QuantityReader<D, S>;
  /**
   * Convert a quantity from the other system into this one. The dimension
   * must be given at run time (a unit or a kind of that dimension), since
   * the number alone does not carry it.
   *
   * @example
   * ```ts
   * import { CGS, SI, kinds, units } from "starlume";
   * const lsun = SI.of(1, units.Lsun);
   * const inErgPerS = CGS.from(lsun, kinds.power); // 3.828e33
   * ```
   */
  from<D extends Dimension>(q: Quantity<D, OtherSystem<S>>, kind: HasDimension<NoInfer<D>>): Quantity<D, S>;
  /**
   * The conversion from the other system into this one for one kind, as a
   * function to take out of a loop: `q ↦ q × 10ⁿ` with n = 2·L + 3·M into
   * CGS and n = −(2·L + 3·M) into SI (L, M: the exponents of length and mass
   * in the kind's dimension; 1 m = 10² cm, 1 kg = 10³ g). 10ⁿ is an exact
   * double for |n| ≤ 22 (every kind in `kinds`), so each call is one
   * correctly rounded multiplication or division. The result is bit-for-bit
   * `this.from(q, kind)`.
   *
   * @example
   * ```ts
   * import { CGS, SI, kinds, units } from "starlume";
   * const toErgPerS = CGS.converterFrom(kinds.power);
   * toErgPerS(SI.of(1, units.Lsun)); // 3.828e33 (erg s^-1)
   * ```
   */
  converterFrom<D extends Dimension>(kind: HasDimension<D>): SystemConverter<D, OtherSystem<S>, S>;
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

const SI_BASE: Readonly<Record<keyof Dimension, string>> = {
  length: "m",
  mass: "kg",
  time: "s",
  temperature: "K",
  amount: "mol",
  angle: "rad",
  solidAngle: "sr",
};
const CGS_BASE: Readonly<Record<keyof Dimension, string>> = { ...SI_BASE, length: "cm", mass: "g" };

function coherentUnit(d: Dimension, base: Readonly<Record<keyof Dimension, string>>): string {
  const parts: string[] = [];
  for (const key of Object.keys(base) as (keyof Dimension)[]) {
    const e = d[key];
    if (e !== 0) parts.push(e === 1 ? base[key] : `${base[key]}^${e}`);
  }
  return parts.join(" ");
}

function format(value: number, unit: Unit, options: FormatOptions | undefined): string {
  const text = formatNumber(value, options);
  return unit.symbol === "" ? text : `${text} ${unit.symbol}`;
}

// How the methods convert (all decided when the unit was defined, see
// converter.ts; nothing is compared with 1 or branched on per call):
// - `converter`, `reader`, `converterFrom` hand out the unit's ready function
//   (`v => v * k` or `v => v / k`): at the caller's call site it sees one
//   function and is inlined, so a loop runs at hand-written speed.
// - `arrayOf` / `arrayIn` call the unit's ready loop (a multiply loop or a
//   divide loop), chosen once per array.
// - `of` / `valueIn` / `from` compute `(v * mul) / div` from two numbers
//   (one of them 1, so the extra operation is exact): the same bits as the
//   ready function, without a call. These methods see every unit of a
//   program, and a call site that has seen both function shapes is no
//   longer inlined (measured: 4-5x slower per call than two loads).
// The two systems are built by two separate functions so that each method
// keeps its own type feedback, and the symbol and table they use are
// function locals: a bundler turns top-level `const` into `var`, which the
// JIT cannot fold, whereas these stay immutable and become constants once a
// method is inlined into the caller's loop.

function cgsExp10(d: Dimension): number {
  return -2 * d.length - 3 * d.mass;
}

function buildSI(): UnitSystem<"SI"> {
  // locals, not module constants (see above)
  const key: typeof inSI = inSI;
  const table = SHIFT_MUL_DIV;
  return Object.freeze<UnitSystem<"SI">>({
    name: "SI",
    exp10: () => 0,
    coherentUnit: (d) => coherentUnit(d, SI_BASE),
    of: (value, unit) => {
      const s = unit[key];
      return ((value * s.mul) / s.div) as never;
    },
    valueIn: (q, unit) => {
      const s = unit[key];
      return (q * s.div) / s.mul;
    },
    converter: (unit) => unit[key].to as never,
    reader: (unit) => unit[key].from,
    from: (q, kind) => {
      const d = kind.dimension;
      const i = 2 * (60 + -2 * d.length - 3 * d.mass);
      return ((q * (table[i] as number)) / (table[i + 1] as number)) as never;
    },
    converterFrom: (kind) => shiftBy(-2 * kind.dimension.length - 3 * kind.dimension.mass) as never,
    parse: (text, kind) => {
      const { value, unit } = parseQuantityText(text);
      checkKind(text, unit, kind);
      return unit[key].to(value) as never;
    },
    format: (q, unit, options) => format(unit[key].from(q), unit, options),
    arrayOf: (values, unit) => unit[key].arrayTo(values, new Float64Array(values.length)) as never,
    arrayIn: (values, unit) => unit[key].arrayFrom(values, new Float64Array(values.length)),
  });
}

function buildCGS(): UnitSystem<"CGS"> {
  // locals, not module constants (see above)
  const key: typeof inCGS = inCGS;
  const table = SHIFT_MUL_DIV;
  return Object.freeze<UnitSystem<"CGS">>({
    name: "CGS",
    exp10: cgsExp10,
    coherentUnit: (d) => coherentUnit(d, CGS_BASE),
    of: (value, unit) => {
      const s = unit[key];
      return ((value * s.mul) / s.div) as never;
    },
    valueIn: (q, unit) => {
      const s = unit[key];
      return (q * s.div) / s.mul;
    },
    converter: (unit) => unit[key].to as never,
    reader: (unit) => unit[key].from,
    from: (q, kind) => {
      const d = kind.dimension;
      const i = 2 * (60 + 2 * d.length + 3 * d.mass);
      return ((q * (table[i] as number)) / (table[i + 1] as number)) as never;
    },
    converterFrom: (kind) => shiftBy(2 * kind.dimension.length + 3 * kind.dimension.mass) as never,
    parse: (text, kind) => {
      const { value, unit } = parseQuantityText(text);
      checkKind(text, unit, kind);
      return unit[key].to(value) as never;
    },
    format: (q, unit, options) => format(unit[key].from(q), unit, options),
    arrayOf: (values, unit) => unit[key].arrayTo(values, new Float64Array(values.length)) as never,
    arrayIn: (values, unit) => unit[key].arrayFrom(values, new Float64Array(values.length)),
  });
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
export const SI: UnitSystem<"SI"> = buildSI();

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
export const CGS: UnitSystem<"CGS"> = buildCGS();

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
