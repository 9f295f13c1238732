/**
 * Units: named scales of a dimension. A unit knows its dimension and its size
 * in SI base units, stored as `mantissa × 10^exp10` so that decimal units
 * (cm, nm, Å, km, erg, …) convert with one correctly rounded operation: a
 * multiplication or division by an exact power of ten, chosen once when the
 * unit is defined, for each system. (A power beyond 10^±22 is not a double:
 * such a unit, like the jansky at 10⁻²⁶ W m⁻² Hz⁻¹, converts by its correctly
 * rounded size, as units such as the parsec do.)
 *
 * @module
 */
import {
  describeDimension,
  divideDimensions,
  multiplyDimensions,
  powerDimension,
  type DimPower,
  type DimProduct,
  type DimQuotient,
  type Dimension,
  type PowerExponent,
} from "./dimension";
import { factorScaling, inCGS, inSI, pow10Scaling, type Scaling } from "./converter";

/**
 * A unit of dimension `D`.
 *
 * @example
 * ```ts
 * import { units } from "starlume";
 * units.nm.symbol; // "nm"
 * units.nm.factor; // 1e-9 (metres in one nanometre)
 * ```
 */
export interface Unit<D extends Dimension = Dimension> {
  /** Symbol, in the text grammar the parser reads (e.g. `"erg s^-1 cm^-2"`). */
  readonly symbol: string;
  /** Readable name. */
  readonly name: string;
  /** The unit's dimension. */
  readonly dimension: D;
  /** Decimal mantissa of the SI size: one unit = `mantissa × 10^exp10` SI base units. */
  readonly mantissa: number;
  /** Decimal exponent of the SI size. */
  readonly exp10: number;
  /** One unit in SI base units (`mantissa × 10^exp10`, correctly rounded). */
  readonly factor: number;
  /** Whether SI prefixes may be attached to the symbol when parsing (`k`, `M`, `µ`, …). */
  readonly prefixable: boolean;
  /**
   * How a value in this unit becomes a value in SI base units and back,
   * decided when the unit is defined (see `converter.ts`).
   * @internal
   */
  readonly [inSI]: Scaling;
  /**
   * How a value in this unit becomes a value in CGS base units and back.
   * @internal
   */
  readonly [inCGS]: Scaling;
}

// MUL[n + 22] / DIV[n + 22] = 10^n for |n| ≤ 22, one of the two being 1 and
// the other an exact power of ten, so that times10 is one correctly rounded
// operation. (Units and systems use the ready converters of converter.ts;
// times10 serves code that computes n at run time.)
const MUL = new Float64Array(45);
const DIV = new Float64Array(45);
for (let n = -22; n <= 22; n++) {
  MUL[n + 22] = n >= 0 ? Number(`1e${n}`) : 1;
  DIV[n + 22] = n >= 0 ? 1 : Number(`1e${-n}`);
}

/**
 * `v × 10^n`, correctly rounded for integer |n| ≤ 22 (10^n is exact in binary
 * there, so one multiplication or division is a single rounding).
 *
 * @internal
 */
export function times10(v: number, n: number): number {
  const i = n + 22;
  if (i >= 0 && i <= 44) {
    // one of the two is 1; skipping the division by 1 keeps the common
    // multiply path as cheap as hand-written code (the branch is predictable)
    const d = DIV[i] as number;
    return d === 1 ? v * (MUL[i] as number) : v / d;
  }
  return v * Number(`1e${n}`);
}

/**
 * The exponent k when `mantissa` is exactly 10^k in its shortest decimal form
 * (1, 1000, 0.001 …), else undefined.
 */
function decimalPowerOf(mantissa: number): number | undefined {
  const m = /^1e([+-]\d+)$/.exec(mantissa.toExponential());
  return m === null ? undefined : Number(m[1]);
}

/** `mantissa × 10^exp`, correctly rounded from the mantissa's shortest decimal form. */
export function decimalScale(mantissa: number, exp: number): number {
  if (mantissa === 1) return times10(1, exp);
  const s = String(mantissa);
  if (s.includes("e")) {
    const [m, e] = s.split("e");
    return Number(`${m}e${Number(e) + exp}`);
  }
  return Number(`${s}e${exp}`);
}

/**
 * Define a unit. `mantissa × 10^exp10` is the size of one unit in SI base
 * units (m, kg, s, K, mol, rad, sr). How the unit converts in each system
 * is decided here, once: when the size is 10ⁿ (a mantissa that is itself a
 * power of ten, such as 1 or 0.001, is folded into n) and |n| ≤ 22, by one
 * multiplication or division by the exact double 10^|n|; otherwise by
 * multiplying by the correctly rounded size (and dividing by it to read
 * values back).
 *
 * @example
 * ```ts
 * import { defineUnit, kinds } from "starlume";
 * const furlong = defineUnit("fur", "furlong", kinds.length.dimension, 201.168);
 * ```
 */
export function defineUnit<D extends Dimension>(
  symbol: string,
  name: string,
  dimension: D,
  mantissa: number,
  exp10 = 0,
  prefixable = false,
): Unit<D> {
  if (!(mantissa > 0) || !Number.isFinite(mantissa)) {
    throw new RangeError(`unit ${symbol}: mantissa must be a finite number > 0; got ${mantissa}`);
  }
  const cgsShift = exp10 + 2 * dimension.length + 3 * dimension.mass;
  // Decided once: a decimal unit (a power of ten, once the mantissa's own
  // power of ten is folded in) converts by one multiplication or division by
  // an exact power of ten; any other unit by its correctly rounded factor.
  const k = decimalPowerOf(mantissa);
  const si = k !== undefined ? pow10Scaling(k + exp10) : factorScaling(decimalScale(mantissa, exp10));
  const cgs = k !== undefined ? pow10Scaling(k + cgsShift) : factorScaling(decimalScale(mantissa, cgsShift));
  const unit: Unit<D> = {
    symbol,
    name,
    dimension,
    mantissa,
    exp10,
    factor: decimalScale(mantissa, exp10),
    prefixable,
    [inSI]: si,
    [inCGS]: cgs,
  };
  return Object.freeze(unit);
}

/** An SI prefix. */
export interface Prefix {
  /** Symbol written before a unit symbol, e.g. `"k"`, `"µ"`. */
  readonly symbol: string;
  /** Name written before a unit name, e.g. `"kilo"`, `"micro"`. */
  readonly name: string;
  /** Decimal exponent: the prefix multiplies a unit by 10^exp10 (exact). */
  readonly exp10: number;
}

/** The SI prefixes (BIPM SI Brochure, 9th edition, 2019, with the 2022 additions ronna/quetta/ronto/quecto). */
export const prefixes: readonly Prefix[] = [
  { symbol: "Q", name: "quetta", exp10: 30 },
  { symbol: "R", name: "ronna", exp10: 27 },
  { symbol: "Y", name: "yotta", exp10: 24 },
  { symbol: "Z", name: "zetta", exp10: 21 },
  { symbol: "E", name: "exa", exp10: 18 },
  { symbol: "P", name: "peta", exp10: 15 },
  { symbol: "T", name: "tera", exp10: 12 },
  { symbol: "G", name: "giga", exp10: 9 },
  { symbol: "M", name: "mega", exp10: 6 },
  { symbol: "k", name: "kilo", exp10: 3 },
  { symbol: "h", name: "hecto", exp10: 2 },
  { symbol: "da", name: "deca", exp10: 1 },
  { symbol: "d", name: "deci", exp10: -1 },
  { symbol: "c", name: "centi", exp10: -2 },
  { symbol: "m", name: "milli", exp10: -3 },
  { symbol: "µ", name: "micro", exp10: -6 },
  { symbol: "n", name: "nano", exp10: -9 },
  { symbol: "p", name: "pico", exp10: -12 },
  { symbol: "f", name: "femto", exp10: -15 },
  { symbol: "a", name: "atto", exp10: -18 },
  { symbol: "z", name: "zepto", exp10: -21 },
  { symbol: "y", name: "yocto", exp10: -24 },
  { symbol: "r", name: "ronto", exp10: -27 },
  { symbol: "q", name: "quecto", exp10: -30 },
];

/**
 * Attach an SI prefix to a unit (by prefix symbol or name).
 *
 * @example
 * ```ts
 * import { prefixed, units } from "starlume";
 * const GHz = prefixed("G", units.Hz);
 * const microjansky = prefixed("micro", units.Jy);
 * ```
 */
export function prefixed<D extends Dimension>(prefix: string, unit: Unit<D>): Unit<D> {
  const p = prefixes.find((x) => x.symbol === prefix || x.name === prefix || (prefix === "u" && x.symbol === "µ"));
  if (p === undefined) throw new RangeError(`unknown SI prefix ${JSON.stringify(prefix)}`);
  return defineUnit(`${p.symbol}${unit.symbol}`, `${p.name}${unit.name}`, unit.dimension, unit.mantissa, unit.exp10 + p.exp10);
}

function group(symbol: string): string {
  return /[\s/^]/.test(symbol) ? `(${symbol})` : symbol;
}

/** `symbol^n` written so that the parser reads it back: `cm^2` to the -1 is `cm^-2`, not `cm^2^-1`. */
function powerSymbol(symbol: string, n: number): string {
  const m = /^([^\s()/^]+)\^(-?\d+)$/.exec(symbol);
  if (m !== null) {
    const e = Number(m[2]) * n;
    return e === 1 ? (m[1] as string) : `${m[1]}^${e}`;
  }
  return `${group(symbol)}^${n}`;
}

/**
 * Product of two units (`erg` × `s^-1` …).
 *
 * @example
 * ```ts
 * import { multiplyUnits, units } from "starlume";
 * const Js = multiplyUnits(units.J, units.s);
 * ```
 */
export function multiplyUnits<A extends Dimension, B extends Dimension>(a: Unit<A>, b: Unit<B>): Unit<DimProduct<A, B>> {
  const d = multiplyDimensions(a.dimension, b.dimension);
  return defineUnit(`${a.symbol} ${b.symbol}`, `${a.name} ${b.name}`, d, a.mantissa * b.mantissa, a.exp10 + b.exp10);
}

/**
 * Quotient of two units.
 *
 * @example
 * ```ts
 * import { divideUnits, units } from "starlume";
 * const kmPerS = divideUnits(units.km, units.s);
 * ```
 */
export function divideUnits<A extends Dimension, B extends Dimension>(a: Unit<A>, b: Unit<B>): Unit<DimQuotient<A, B>> {
  const d = divideDimensions(a.dimension, b.dimension);
  const inverse = powerSymbol(b.symbol, -1);
  return defineUnit(`${a.symbol} ${inverse}`, `${a.name} per ${b.name}`, d, a.mantissa / b.mantissa, a.exp10 - b.exp10);
}

/**
 * Integer power of a unit (-4 to 4).
 *
 * @example
 * ```ts
 * import { powerUnit, units } from "starlume";
 * const perCm3 = powerUnit(units.cm, -3);
 * ```
 */
export function powerUnit<A extends Dimension, N extends PowerExponent>(a: Unit<A>, n: N): Unit<DimPower<A, N>> {
  const d = powerDimension(a.dimension, n) as unknown as DimPower<A, N> & Dimension;
  return defineUnit(powerSymbol(a.symbol, n), `${a.name}^${n}`, d, a.mantissa ** n, a.exp10 * n);
}

/** Text form of a unit's dimension, e.g. for error messages. */
export function describeUnit(u: Unit): string {
  return `${u.symbol} (${describeDimension(u.dimension)})`;
}
