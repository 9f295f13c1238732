/**
 * Units for the command line: read a unit text with the library's parser and
 * check that it is of the kind a column or an option needs, with messages
 * that name the column or option; read quantities given as options
 * (`--from "300 nm"`, or a bare number in a default unit).
 *
 * Magnitudes are not units of the library (they are logarithms, not scales);
 * the tool recognizes the unit texts `mag` (any magnitude, e.g. apparent
 * bolometric) and `AB mag` (AB magnitudes in the fit command) itself.
 *
 * @module
 */
import { describeDimension, type Dimension } from "../quantity/dimension";
import { kinds } from "../quantity/aliases";
import { ParseError, parseQuantityText, parseUnit } from "../quantity/parse";
import { SI, type UnitSystem } from "../quantity/system";
import type { SystemName } from "../quantity/quantity";
import { units } from "../quantity/units";
import type { Unit } from "../quantity/unit";
import { UsageError } from "./context";

/** A kind of quantity: a name for messages and a dimension. */
export interface KindLike {
  readonly name: string;
  readonly dimension: Dimension;
}

/** Whether two dimensions are equal. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return (Object.keys(a) as (keyof Dimension)[]).every((k) => a[k] === b[k]);
}

/** Name of the built-in kind with this dimension, or its exponents (`L-1 M T-3`). */
export function kindName(d: Dimension): string {
  for (const k of Object.values(kinds) as KindLike[]) {
    if (sameDimension(k.dimension, d)) return `${k.name} (${describeDimension(d)})`;
  }
  return `dimension ${describeDimension(d)}`;
}

/** Parse a unit text; a ParseError becomes a UsageError prefixed with `where`. */
export function readUnit(text: string, where: string): Unit {
  try {
    return parseUnit(text);
  } catch (e) {
    if (e instanceof ParseError) throw new UsageError(`${where}: ${e.message}`);
    throw e;
  }
}

/**
 * Parse a unit and check its kind.
 *
 * @param where - what to name in messages, e.g. `column 'parallax [kg]'` or `--unit value`
 * @throws UsageError naming `where`, the unit, its kind and the kind expected
 */
export function unitOfKind(text: string, kind: KindLike, where: string, hint?: string): Unit {
  const u = readUnit(text, where);
  if (!sameDimension(u.dimension, kind.dimension)) {
    throw new UsageError(
      `${where}: unit '${text}' is a ${kindName(u.dimension)}, but ${kind.name} (${describeDimension(kind.dimension)}) is needed` +
        (hint !== undefined ? `; ${hint}` : ""),
    );
  }
  return u;
}

/** Whether a unit text means magnitudes (`mag`). */
export function isMagnitudeUnit(text: string | null): boolean {
  return text !== null && text.trim() === "mag";
}

/** Whether a unit text means AB magnitudes (`AB mag`, `mag AB`, `ABmag`). */
export function isAbMagnitudeUnit(text: string | null): boolean {
  return text !== null && /^(?:AB\s*mag|mag\s*AB)$/.test(text.trim());
}

/**
 * A quantity given on the command line: `"300 nm"`, `"5772 K"`, or a bare
 * number in `defaultUnit`. Returns the value in SI base units.
 *
 * @throws UsageError naming the option for unreadable text or the wrong kind
 */
export function optionQuantitySI(text: string, kind: KindLike, defaultUnit: Unit, option: string): number {
  const trimmed = text.trim();
  if (/^[+\-−]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+\-−]?[0-9]+)?$/.test(trimmed)) {
    return SI.of(Number(trimmed.replace(/−/g, "-")), defaultUnit);
  }
  let parsed: { value: number; unit: Unit };
  try {
    parsed = parseQuantityText(trimmed);
  } catch (e) {
    if (e instanceof ParseError) throw new UsageError(`${option}: ${e.message}`);
    throw e;
  }
  if (!sameDimension(parsed.unit.dimension, kind.dimension)) {
    throw new UsageError(`${option}: '${text}' is a ${kindName(parsed.unit.dimension)}, but ${kind.name} (${describeDimension(kind.dimension)}) is needed`);
  }
  return SI.of(parsed.value, parsed.unit);
}

/** A value in SI base units expressed in `unit`, through the typed system object. */
export function siIn(value: number, unit: Unit): number {
  return SI.valueIn(value as never, unit as never);
}

/** A value in `unit` as SI base units. */
export function siOf(value: number, unit: Unit): number {
  return SI.of(value, unit);
}

/** A value in `sys`'s coherent unit of `unit`'s dimension, expressed in `unit`. */
export function valueIn<S extends SystemName>(sys: UnitSystem<S>, value: number, unit: Unit): number {
  return sys.valueIn(value as never, unit as never);
}

/** A value in `unit`, in `sys`'s coherent unit of its dimension. */
export function valueOf<S extends SystemName>(sys: UnitSystem<S>, value: number, unit: Unit): number {
  return sys.of(value, unit);
}

/**
 * A display name of the coherent unit of a dimension in a system: the
 * built-in unit of exactly that size when there is one (`W` in SI,
 * `erg s^-1` in CGS), otherwise the system's base-unit product
 * (`kg m^-1 s^-3`).
 */
export function coherentUnitName<S extends SystemName>(sys: UnitSystem<S>, d: Dimension): string {
  const size = sys.name === "SI" ? 1 : 10 ** sys.exp10(d);
  for (const u of Object.values(units) as Unit[]) {
    if (sameDimension(u.dimension, d) && Math.abs(u.factor / size - 1) < 1e-15) return u.symbol;
  }
  return sys.coherentUnit(d);
}
