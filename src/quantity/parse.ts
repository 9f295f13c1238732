/**
 * Reading quantities from text, with a compound-unit grammar of our own:
 *
 * ```text
 * quantity  := number [unit-expr]
 * number    := decimal with optional exponent: 6.957e8, -1.2, .5, 3E-13 ("−" U+2212 accepted as minus)
 * unit-expr := factor { separator factor | "/" factor }
 * separator := one or more spaces, or "*" or "·" (spaces around them allowed)
 * factor    := atom [ "^" integer | superscript-integer ]
 * atom      := unit-symbol | "(" unit-expr ")"
 * ```
 *
 * - Each `/` divides by the single factor after it: `W/m^2/sr` is W m⁻² sr⁻¹.
 * - Exponents are integers: `cm^-2`, `cm⁻²`, `s^+1`.
 * - Symbols are the built-in units' symbols and their aliases (`Å`, `A`,
 *   `angstrom`; `µm`, `um`; `mas`, `µas`, `uas`; `R☉`, `Rsun` …), with an SI
 *   prefix allowed on prefixable units (`GHz`, `mJy`, `keV`, `Gpc`, `Myr`).
 *   An exact symbol always wins over a prefixed reading (`min` is the minute,
 *   `mas` the milliarcsecond, `Pa`… is not a unit here).
 * - An empty unit means a pure number.
 *
 * Bad text throws a {@link ParseError} with the position (0-based character
 * index) and what was expected there.
 *
 * @module
 */
import { describeDimension, type Dimension } from "./dimension";
import { defineUnit, divideUnits, multiplyUnits, powerUnit, prefixes, type Unit } from "./unit";
import { unitAliases, units } from "./units";
import { kinds } from "./aliases";

/**
 * Error thrown for text that is not a quantity or unit in starlume's grammar,
 * or whose unit is of the wrong kind.
 *
 * @example
 * ```ts
 * import { ParseError, parseUnit } from "starlume";
 * try { parseUnit("erg s^-x"); } catch (e) { if (e instanceof ParseError) e.position; }
 * ```
 */
export class ParseError extends Error {
  /** 0-based character index in the input where the problem was found. */
  readonly position: number;
  /** What the parser expected at that position. */
  readonly expected: string;
  /** The whole input text. */
  readonly input: string;

  constructor(input: string, position: number, expected: string, detail?: string) {
    const found = position >= input.length ? "end of text" : JSON.stringify(input.slice(position, position + 12));
    super(
      detail ??
        `cannot read ${JSON.stringify(input)}: at position ${position} expected ${expected}, found ${found}`,
    );
    this.name = "ParseError";
    this.position = position;
    this.expected = expected;
    this.input = input;
  }
}

const bySymbol = new Map<string, Unit>();
for (const unit of Object.values(units) as Unit[]) bySymbol.set(unit.symbol, unit);
for (const [alias, key] of Object.entries(unitAliases)) bySymbol.set(alias, units[key]);
const prefixable = [...bySymbol.entries()].filter(([, u]) => u.prefixable);
const prefixSymbols = [...prefixes.map((p) => p.symbol), "u", "μ"];

function prefixExp(symbol: string): number | undefined {
  if (symbol === "u" || symbol === "μ") return -6;
  return prefixes.find((p) => p.symbol === symbol)?.exp10;
}

/**
 * Look up one unit symbol (no exponent, no compound): the exact symbol or
 * alias first, then an SI prefix on a prefixable unit.
 */
function lookupSymbol(name: string): Unit | undefined {
  const exact = bySymbol.get(name);
  if (exact !== undefined) return exact;
  for (const ps of prefixSymbols) {
    if (!name.startsWith(ps)) continue;
    const rest = name.slice(ps.length);
    for (const [sym, u] of prefixable) {
      if (sym === rest) {
        const e = prefixExp(ps) as number;
        const prefixName = prefixes.find((p) => p.exp10 === e)?.name ?? ps;
        return defineUnit(name, `${prefixName}${u.name}`, u.dimension, u.mantissa, u.exp10 + e);
      }
    }
  }
  return undefined;
}

const SUPERSCRIPTS: Record<string, string> = {
  "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9", "⁻": "-", "⁺": "+",
};
const isNameChar = (c: string): boolean => /[\p{L}_☉⊕°′″]/u.test(c) && c !== "·";

class Reader {
  pos = 0;
  constructor(readonly text: string) {}
  peek(): string {
    return this.text[this.pos] ?? "";
  }
  skipSpaces(): boolean {
    const start = this.pos;
    while (this.pos < this.text.length && /\s/.test(this.text[this.pos] as string)) this.pos++;
    return this.pos > start;
  }
  fail(expected: string): never {
    throw new ParseError(this.text, this.pos, expected);
  }
}

function readInteger(r: Reader): number {
  const start = r.pos;
  let s = "";
  if (r.peek() === "-" || r.peek() === "+" || r.peek() === "−") {
    s += r.peek() === "−" ? "-" : r.peek();
    r.pos++;
  }
  let digits = "";
  while (/[0-9]/.test(r.peek())) {
    digits += r.peek();
    r.pos++;
  }
  if (digits === "") {
    r.pos = start;
    r.fail("an integer exponent");
  }
  return Number(s + digits);
}

function readSuperscript(r: Reader): number | undefined {
  let s = "";
  while (SUPERSCRIPTS[r.peek()] !== undefined) {
    s += SUPERSCRIPTS[r.peek()];
    r.pos++;
  }
  if (s === "") return undefined;
  if (!/^[+-]?[0-9]+$/.test(s)) {
    r.fail("a superscript integer");
  }
  return Number(s);
}

function applyPower(u: Unit, n: number, r: Reader, at: number): Unit {
  if (!Number.isInteger(n) || n < -4 || n > 4) {
    throw new ParseError(r.text, at, "an exponent from -4 to 4");
  }
  try {
    return powerUnit(u, n as -4 | -3 | -2 | -1 | 0 | 1 | 2 | 3 | 4);
  } catch {
    throw new ParseError(r.text, at, "an exponent that keeps every dimension within -12..12");
  }
}

function readFactor(r: Reader): Unit {
  let u: Unit;
  const start = r.pos;
  if (r.peek() === "(") {
    r.pos++;
    r.skipSpaces();
    u = readExpr(r);
    r.skipSpaces();
    if (r.peek() !== ")") r.fail('")"');
    r.pos++;
  } else {
    let name = "";
    while (r.pos < r.text.length && isNameChar(r.peek())) {
      name += r.peek();
      r.pos++;
    }
    if (name === "") r.fail("a unit symbol");
    const found = lookupSymbol(name);
    if (found === undefined) {
      throw new ParseError(r.text, start, "a known unit symbol", `cannot read ${JSON.stringify(r.text)}: unknown unit ${JSON.stringify(name)} at position ${start}`);
    }
    u = found;
  }
  const at = r.pos;
  if (r.peek() === "^") {
    r.pos++;
    u = applyPower(u, readInteger(r), r, at);
  } else if (r.text.startsWith("**", r.pos)) {
    r.pos += 2;
    u = applyPower(u, readInteger(r), r, at);
  } else {
    const sup = readSuperscript(r);
    if (sup !== undefined) u = applyPower(u, sup, r, at);
  }
  return u;
}

function combine(a: Unit, b: Unit, divide: boolean, r: Reader, at: number): Unit {
  try {
    return divide ? divideUnits(a, b) : multiplyUnits(a, b);
  } catch {
    throw new ParseError(r.text, at, "a unit whose dimension exponents stay within -12..12");
  }
}

function readExpr(r: Reader): Unit {
  let u = readFactor(r);
  for (;;) {
    const save = r.pos;
    const spaced = r.skipSpaces();
    const c = r.peek();
    if (c === "/" || c === "*" || c === "·") {
      r.pos++;
      r.skipSpaces();
      const at = r.pos;
      u = combine(u, readFactor(r), c === "/", r, at);
    } else if (spaced && (isNameChar(c) || c === "(")) {
      const at = r.pos;
      u = combine(u, readFactor(r), false, r, at);
    } else {
      r.pos = save;
      return u;
    }
  }
}

/**
 * Parse a unit expression such as `"erg s^-1 cm^-2 Å^-1"` or `"W/m^2/sr"`.
 *
 * @example
 * ```ts
 * import { parseUnit } from "starlume";
 * parseUnit("erg s^-1 cm^-2 A^-1").factor; // 1e3 (SI value of one such unit, W m^-3)
 * ```
 */
export function parseUnit(text: string): Unit {
  if (typeof text !== "string") throw new ParseError(String(text), 0, "a string");
  const r = new Reader(text);
  r.skipSpaces();
  if (r.pos >= text.length) return dimensionlessUnit;
  const u = readExpr(r);
  r.skipSpaces();
  if (r.pos < text.length) r.fail("a separator, \"/\" or the end of the unit");
  return u;
}

/** The unit of a pure number (symbol ""). */
export const dimensionlessUnit: Unit = defineUnit("", "one", kinds.dimensionless.dimension, 1);

const NUMBER = /^[+\-−]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+\-−]?[0-9]+)?/;

/**
 * Parse `"<number> <unit>"` into its number and its unit (no kind check, no
 * system: see `SI.parse` / `CGS.parse` for typed results).
 *
 * @example
 * ```ts
 * import { parseQuantityText } from "starlume";
 * const { value, unit } = parseQuantityText("1.2 mas");
 * ```
 */
export function parseQuantityText(text: string): {
  /** The number as written (in `unit`, not converted to any system). */
  value: number;
  /** The unit that followed the number (the dimensionless unit when none did). */
  unit: Unit;
} {
  if (typeof text !== "string") throw new ParseError(String(text), 0, "a string");
  let i = 0;
  while (i < text.length && /\s/.test(text[i] as string)) i++;
  const m = NUMBER.exec(text.slice(i));
  if (m === null) throw new ParseError(text, i, "a number");
  const value = Number(m[0].replace(/−/g, "-"));
  if (!Number.isFinite(value)) throw new ParseError(text, i, "a finite number");
  const rest = text.slice(i + m[0].length);
  if (rest.length > 0 && !/^\s/.test(rest) && !/^[(]/.test(rest)) {
    // allow "5772K"? no: a unit must be separated from the number by a space
    throw new ParseError(text, i + m[0].length, "a space between the number and its unit");
  }
  let unit: Unit;
  try {
    unit = parseUnit(rest);
  } catch (e) {
    if (e instanceof ParseError) {
      const offset = i + m[0].length;
      throw new ParseError(text, e.position + offset, e.expected, e.message.replace(JSON.stringify(rest), JSON.stringify(text)).replace(/position (\d+)/, (_, p: string) => `position ${Number(p) + offset}`));
    }
    throw e;
  }
  return { value, unit };
}

/**
 * Check that a parsed unit has the dimension a caller asked for.
 *
 * @internal
 */
export function checkKind(text: string, unit: Unit, kind: { name: string; dimension: Dimension }): void {
  const d = unit.dimension;
  const want = kind.dimension;
  for (const key of Object.keys(want) as (keyof Dimension)[]) {
    if (d[key] !== want[key]) {
      throw new ParseError(
        text,
        0,
        `a ${kind.name}`,
        `cannot read ${JSON.stringify(text)} as a ${kind.name} (${describeDimension(want)}): its unit ${JSON.stringify(unit.symbol)} has dimension ${describeDimension(d)}`,
      );
    }
  }
}
