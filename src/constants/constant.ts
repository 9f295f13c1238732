/**
 * The typed constant record.
 *
 * @module
 */
import type { Dimension } from "../quantity/dimension";
import type { Quantity } from "../quantity/quantity";
import { decimalScale } from "../quantity/unit";

/**
 * A physical or astronomical constant, typed in both systems, with its
 * uncertainty and source.
 *
 * @example
 * ```ts
 * import { constants } from "starlume";
 * constants.h.si;   // 6.62607015e-34 (J s)
 * constants.h.cgs;  // 6.62607015e-27 (erg s)
 * constants.h.exact; // true
 * ```
 */
export interface Constant<D extends Dimension> {
  /** Usual symbol, e.g. `"h"`, `"σ"`, `"L☉ᴺ"`. */
  readonly symbol: string;
  /** Name as the source gives it. */
  readonly name: string;
  /** Runtime dimension. */
  readonly dimension: D;
  /** Value in SI coherent units. */
  readonly si: Quantity<D, "SI">;
  /** Value in CGS coherent units. */
  readonly cgs: Quantity<D, "CGS">;
  /** Standard uncertainty in SI units (0 for exact and nominal values). */
  readonly uncertaintySI: number;
  /** Relative standard uncertainty (0 for exact and nominal values). */
  readonly relativeUncertainty: number;
  /** Exact by definition (SI defining constants, IAU nominal values and definitions). */
  readonly exact: boolean;
  /** The published standard the value comes from. */
  readonly source: string;
  /** The SI unit written out, for display. */
  readonly unitSI: string;
}

/** @internal */
export function defineConstant<D extends Dimension>(
  symbol: string,
  name: string,
  dimension: D,
  valueSI: number,
  unitSI: string,
  source: string,
  uncertaintySI = 0,
): Constant<D> {
  const cgsExp = -2 * dimension.length - 3 * dimension.mass;
  return Object.freeze({
    symbol,
    name,
    dimension,
    si: valueSI as Quantity<D, "SI">,
    // shift the decimal point of the shortest decimal form, so that a value
    // published in decimal (G = 6.6743e-11) becomes exactly the published CGS
    // decimal (6.6743e-8), not 6.6743e-11 × 1000 rounded in binary.
    cgs: decimalScale(valueSI, -cgsExp) as Quantity<D, "CGS">,
    uncertaintySI,
    relativeUncertainty: uncertaintySI / Math.abs(valueSI),
    exact: uncertaintySI === 0,
    source,
    unitSI,
  });
}
