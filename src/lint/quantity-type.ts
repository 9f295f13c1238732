/**
 * Reading starlume's compile-time brands from a TypeScript type: a quantity
 * is a `number` intersected with `Brand<D, T>`, whose two properties are keyed
 * by the unique symbols `dimensionBrand` and `systemBrand`. A plain `number`,
 * or a `Pure` (whose brand properties are optional), is not a quantity.
 *
 * @internal
 */
import type ts from "typescript";

/** The seven base dimensions, in display order (as `src/quantity/dimension.ts`). */
const BASES = ["length", "mass", "time", "temperature", "amount", "angle", "solidAngle"] as const;
const SYMBOLS = ["L", "M", "T", "Θ", "N", "A", "Ω"];

/** A quantity's brand as read from its type. */
export interface QuantityBrand {
  /** Exponents by base dimension, as the type writes them (`"1"`, `"-2"`, or a type parameter's name). */
  readonly exponents: readonly string[];
  /** The system tag: `"SI"`, `"CGS"`, `"SI=CGS"`, or a type parameter's name. */
  readonly system: string;
  /** The type as TypeScript prints it, for messages. */
  readonly text: string;
}

function brandProperty(checker: ts.TypeChecker, type: ts.Type, prefix: string): ts.Symbol | undefined {
  for (const p of checker.getPropertiesOfType(type)) {
    const name = p.escapedName as string;
    if (name.startsWith(`__@${prefix}@`)) return p;
  }
  return undefined;
}

/** The brand of `type`, or `null` when it is not a quantity (plain numbers, `Pure`, unions of different brands…). */
export function quantityBrand(checker: ts.TypeChecker, type: ts.Type, at: ts.Node): QuantityBrand | null {
  if (type.isUnion()) {
    // `Q | undefined` and the like: a quantity when every numeric member carries the same brand
    let found: QuantityBrand | null = null;
    for (const member of type.types) {
      if ((member.flags & 0x8000 /* Undefined */) !== 0 || (member.flags & 0x10000 /* Null */) !== 0) continue;
      const b = quantityBrand(checker, member, at);
      if (b === null || (found !== null && key(found) !== key(b))) return null;
      found = b;
    }
    return found;
  }
  const dim = brandProperty(checker, type, "dimensionBrand");
  const sys = brandProperty(checker, type, "systemBrand");
  if (dim === undefined || sys === undefined) return null;
  // optional brands mark `Pure` (a plain number or a dimensionless quantity)
  if ((dim.flags & 0x1000000) /* Optional */ !== 0) return null;
  const dimType = checker.getTypeOfSymbolAtLocation(dim, at);
  const exponents = BASES.map((b) => {
    const p = checker.getPropertyOfType(dimType, b);
    return p === undefined ? "?" : checker.typeToString(checker.getTypeOfSymbolAtLocation(p, at));
  });
  const system = checker.typeToString(checker.getTypeOfSymbolAtLocation(sys, at)).replace(/"/g, "");
  // system-free aliases print an unused default parameter (`Time<S>`): drop it
  return { exponents, system, text: checker.typeToString(type).replace(/<S>/g, "") };
}

function key(b: QuantityBrand): string {
  return `${b.exponents.join(",")}|${b.system}`;
}

const TAGS = new Set(["SI", "CGS", "SI=CGS"]);
const LITERAL_EXPONENT = /^-?\d+$/;

/**
 * Whether two brands may have the same dimension: false only when every
 * exponent of both is a literal and some differ (generic code, whose
 * exponents are type parameters, is given the benefit of the doubt).
 */
export function sameDimension(a: QuantityBrand, b: QuantityBrand): boolean {
  if (![...a.exponents, ...b.exponents].every((e) => LITERAL_EXPONENT.test(e))) return true;
  return a.exponents.every((e, i) => e === b.exponents[i]);
}

/** Whether two system tags can meet: equal, one of them system-free, or either not a literal tag (generic code). */
export function compatibleSystems(a: QuantityBrand, b: QuantityBrand): boolean {
  if (!TAGS.has(a.system) || !TAGS.has(b.system)) return true;
  return a.system === b.system || a.system === "SI=CGS" || b.system === "SI=CGS";
}

/** `L2 M1 T-3` for a brand's dimension (`1` for a pure number). */
export function dimensionText(b: QuantityBrand): string {
  const parts: string[] = [];
  b.exponents.forEach((e, i) => {
    if (e !== "0") parts.push(e === "1" ? (SYMBOLS[i] as string) : `${SYMBOLS[i]}${e}`);
  });
  return parts.length === 0 ? "1" : parts.join(" ");
}

/** Which base dimensions differ, e.g. `length 1 vs 0, time 0 vs 1`. */
export function dimensionDifference(a: QuantityBrand, b: QuantityBrand): string {
  const parts: string[] = [];
  BASES.forEach((base, i) => {
    if (a.exponents[i] !== b.exponents[i]) parts.push(`${base} ${a.exponents[i]} vs ${b.exponents[i]}`);
  });
  return parts.join(", ");
}
