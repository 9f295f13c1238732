/**
 * Reading quantities and units from text. The default syntax (`"any"`)
 * accepts starlume's own grammar and the syntaxes of the open standards —
 * the FITS Standard 4.0 (§4.3, units) and IVOA VOUnits 1.0 with the FITS,
 * OGIP and CDS conventions it describes — together with the spellings
 * astronomers write daily:
 *
 * ```text
 * quantity  := number [" "] [unit-expr]
 * number    := decimal with optional exponent: 6.957e8, -1.2, .5, 3E-13 ("−" U+2212 accepted as minus)
 * unit-expr := [scale] factor { product factor | "/" factor }
 * scale     := decimal number (1e-17, 1.5) | 10^k | 10**k | 10+k | 10-k   (a leading numeric factor)
 * product   := one or more ASCII spaces, or "." or "*" or "·" (spaces around them allowed)
 * factor    := atom [ power ]
 * power     := "^" int | "**" int | int written right after the atom (cm2, s-1) | superscript-integer
 * int       := [sign] digits, optionally in parentheses: ^(-2), **(-2)
 * atom      := unit-symbol | "(" unit-expr ")"
 * ```
 *
 * - Each `/` divides by the single factor after it, left to right as in
 *   ordinary arithmetic: `W/m^2/sr` is W m⁻² sr⁻¹, and `W/m2 sr` is
 *   (W/m²)·sr. Write `W/(m2 sr)` to divide by a product.
 * - Exponents are integers from -4 to 4 (`cm^-2`, `cm-2`, `cm**-2`, `cm⁻²`).
 * - Symbols: the catalogue's symbols and aliases (`Å`, `µm`, `R☉` …), the
 *   standards' symbols (`Angstrom`, `AU`, `au`, `solMass`, `solRad`,
 *   `solLum`, `lyr`, `mag` …) and daily spellings (`Lsun`, `L_sun`, `micron`,
 *   `AA`, `ergs`, `degrees`, `milliarcsec` …), with an SI prefix on
 *   prefixable units (`GHz`, `mJy`, `keV`, `Gpc`, `Myr`, `mmag`). An exact
 *   symbol always wins over a prefixed reading (`min` is the minute, `mas`
 *   the milliarcsecond); `Pa`, `ph` and the other symbols the standards
 *   define for quantities starlume lacks are refused, never read as
 *   peta-years or pico-hours.
 * - `A` is the ångström in the default syntax: starlume has no electric
 *   current dimension, so the standards' ampere cannot be meant. In a strict
 *   syntax (`{ syntax: "fits" }` and the others) `A` is refused with the
 *   advice to write `Angstrom`, since there the standards define it as the
 *   ampere.
 * - `mag` is a pure number of size 1 and may stand only on its own
 *   (magnitudes are logarithms, not scales).
 * - Only the ASCII space separates: tabs, no-break spaces, U+3000 and other
 *   Unicode spaces are refused. An empty unit means a pure number.
 * - Limits: {@link unitTextLimits}: text length and nesting depth are
 *   bounded, so parsing takes time linear in the length of the text.
 *
 * Bad text throws a {@link ParseError} with the position (0-based character
 * index), what was expected there and a suggested fix; its message quotes at
 * most a short excerpt around the position.
 *
 * @module
 */
import { baseDimensions, describeDimension, type Dimension } from "./dimension";
import { defineUnit, prefixes, type Unit } from "./unit";
import { unitAliases, units } from "./units";
import { kinds } from "./aliases";
import { dailySpellings, foreignSymbols, magnitude, standardSymbols } from "./unit-spellings";

/**
 * Limits on the text the parser reads: the number of characters (of a unit
 * text, or of a quantity text) and the depth of nested parentheses. Past
 * either, a {@link ParseError} says so.
 *
 * @example
 * ```ts
 * import { unitTextLimits } from "starlume";
 * unitTextLimits.maxLength; // 512
 * ```
 */
export const unitTextLimits = Object.freeze({
  /** Most characters in a unit or quantity text. */
  maxLength: 512,
  /** Most levels of nested parentheses. */
  maxNesting: 16,
});

/**
 * Which syntax `parseUnit` accepts: `"any"` (the default) reads every form
 * listed in the module notes; the others accept only one standard's syntax
 * and symbols:
 *
 * - `"fits"`: FITS Standard 4.0 §4.3: products by space, `.` or `*`; powers
 *   `^n`, `**n` or written after the symbol (`cm2`); scale `10^k`, `10**k`,
 *   `10±k`.
 * - `"ogip"`: OGIP 93-001: products by space or `*`; powers `**n`; scale `10**k`.
 * - `"cds"`: CDS catalogues: products by `.`; powers after the symbol
 *   (`cm-2`); scale `10±k` or a decimal number.
 * - `"vounits"`: IVOA VOUnits 1.0: products by `.`; powers `**n`; scale a
 *   decimal number or `10**k`; no spaces.
 *
 * The per-standard rules are written from the standards' text as described
 * in VOUnits 1.0 §1–2 (partly from memory of it); symbols in strict mode are
 * the standards' common list (`m`, `Angstrom`, `solMass`, `Jy`, …).
 */
export type UnitSyntax = "any" | "fits" | "ogip" | "cds" | "vounits";

/** Options of {@link parseUnit} and {@link parseQuantityText}. */
export interface UnitTextOptions {
  /** The syntax to accept (default `"any"`). */
  readonly syntax?: UnitSyntax;
}

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
  /** A suggested fix, also at the end of the message (empty when none applies). */
  readonly suggestion: string;

  constructor(input: string, position: number, expected: string, detail?: string, suggestion = "") {
    const found = position >= input.length ? "end of text" : quote(input.slice(position, position + 12));
    const base = detail ?? `cannot read ${excerpt(input, position)}: at position ${position} expected ${expected}, found ${found}`;
    super(suggestion === "" ? base : `${base}; ${suggestion}`);
    this.name = "ParseError";
    this.position = position;
    this.expected = expected;
    this.input = input;
    this.suggestion = suggestion;
  }
}

// Control, bidirectional and invisible characters are shown as \uXXXX escapes.
const INVISIBLE_CLASS = "[\\u007f-\\u00a0\\u00ad\\u061c\\u115f\\u1160\\u180e\\u2000-\\u200f\\u2028-\\u202f\\u205f-\\u206f\\u3000\\ufeff\\ufff9-\\ufffb]";
const INVISIBLE_ALL = new RegExp(INVISIBLE_CLASS, "g");
const INVISIBLE = new RegExp(INVISIBLE_CLASS);

function quote(s: string): string {
  return JSON.stringify(s).replace(INVISIBLE_ALL, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`);
}

/** The text quoted whole when short, else about 48 characters around `pos`. */
function excerpt(text: string, pos: number): string {
  if (text.length <= 64) return quote(text);
  const a = Math.max(0, pos - 24);
  const b = Math.min(text.length, pos + 24);
  return `${a > 0 ? "…" : ""}${quote(text.slice(a, b))}${b < text.length ? "…" : ""} (${text.length} characters)`;
}

// --- symbol tables -----------------------------------------------------------

const bySymbol = new Map<string, Unit>();
for (const unit of Object.values(units) as Unit[]) bySymbol.set(unit.symbol, unit);
for (const [alias, key] of Object.entries(unitAliases)) bySymbol.set(alias, units[key]);

/** Exact lookup in the default syntax: catalogue, standards, daily spellings. */
function exactAny(name: string): Unit | undefined {
  return bySymbol.get(name) ?? standardSymbols.get(name) ?? dailySpellings.get(name);
}

const prefixableAny = new Map<string, Unit>();
for (const [s, un] of [...bySymbol, ...standardSymbols]) if (un.prefixable) prefixableAny.set(s, un);
const prefixableStd = new Map<string, Unit>();
for (const [s, un] of standardSymbols) if (un.prefixable) prefixableStd.set(s, un);

const prefixList: { symbol: string; exp10: number; name: string }[] = [
  ...prefixes.map((p) => ({ symbol: p.symbol, exp10: p.exp10, name: p.name })),
  { symbol: "u", exp10: -6, name: "micro" },
  { symbol: "μ", exp10: -6, name: "micro" },
];

/** A unit symbol as read: a catalogue unit, or a prefixed one (built only when the whole text is that symbol). */
interface Atom {
  readonly symbol: string;
  readonly name: string;
  readonly dimension: Dimension;
  readonly mantissa: number;
  readonly exp10: number;
  readonly unit?: Unit;
}

function prefixedLookup(name: string, table: ReadonlyMap<string, Unit>, r: Reader): Atom | undefined {
  for (const p of prefixList) {
    r.steps++;
    if (!name.startsWith(p.symbol)) continue;
    const base = table.get(name.slice(p.symbol.length));
    if (base !== undefined) return { symbol: name, name: `${p.name}${base.name}`, dimension: base.dimension, mantissa: base.mantissa, exp10: base.exp10 + p.exp10 };
  }
  return undefined;
}

const atomOf = (u: Unit): Atom => ({ symbol: u.symbol, name: u.name, dimension: u.dimension, mantissa: u.mantissa, exp10: u.exp10, unit: u });

// Suggestions: a case-insensitive match, or one character inserted, deleted
// or replaced (looked up through the one-deletion neighbourhood of each
// known spelling, so a suggestion costs O(length) map lookups).
const known = [...bySymbol.keys(), ...standardSymbols.keys(), ...dailySpellings.keys()].filter((s) => /^[A-Za-z_]+$/.test(s));
const byLower = new Map<string, string>();
const byDeletion = new Map<string, string>();
for (const s of known) {
  const l = s.toLowerCase();
  if (!byLower.has(l)) byLower.set(l, s);
}
for (const s of known) {
  const l = s.toLowerCase();
  if (l.length < 3) continue;
  for (let i = 0; i < l.length; i++) {
    const d = l.slice(0, i) + l.slice(i + 1);
    if (!byDeletion.has(d)) byDeletion.set(d, s);
  }
}

function nearest(name: string): string | undefined {
  if (name.length > 32 || name.length < 2) return undefined;
  const l = name.toLowerCase();
  const direct = byLower.get(l) ?? byDeletion.get(l);
  if (direct !== undefined) return direct;
  const dels: string[] = [];
  for (let i = 0; i < l.length; i++) dels.push(l.slice(0, i) + l.slice(i + 1));
  for (const d of dels) {
    const hit = byLower.get(d); // one character too many
    if (hit !== undefined) return hit;
  }
  if (l.length <= 3) return undefined;
  for (const d of dels) {
    const hit = byDeletion.get(d); // one character replaced
    if (hit !== undefined) return hit;
  }
  return undefined;
}

// --- syntax rules ------------------------------------------------------------

interface Rules {
  readonly label: string;
  readonly strict: boolean;
  readonly products: string; // accepted product characters among " ", ".", "*", "·"
  readonly caret: boolean;
  readonly starstar: boolean;
  readonly implicit: boolean;
  readonly superscript: boolean;
  readonly scaleDecimal: boolean;
  readonly scaleSign: boolean; // 10+3, 10-7
  readonly spaces: boolean; // spaces anywhere (around / and products)
  /** How this syntax writes `sym` to the power n. */
  power(sym: string, n: string): string;
  /** How this syntax writes a product of two symbols. */
  readonly productExample: string;
}

const RULES: Record<UnitSyntax, Rules> = {
  any: {
    label: "starlume", strict: false, products: " .*·", caret: true, starstar: true, implicit: true, superscript: true,
    scaleDecimal: true, scaleSign: true, spaces: true, power: (s, n) => `${s}^${n} or ${s}${n}`, productExample: "erg s^-1",
  },
  fits: {
    label: "the FITS standard", strict: true, products: " .*", caret: true, starstar: true, implicit: true, superscript: false,
    scaleDecimal: false, scaleSign: true, spaces: true, power: (s, n) => `${s}^${n} or ${s}${n}`, productExample: "erg s-1 or erg.s-1",
  },
  ogip: {
    label: "the OGIP convention", strict: true, products: " *", caret: false, starstar: true, implicit: false, superscript: false,
    scaleDecimal: false, scaleSign: false, spaces: true, power: (s, n) => `${s}**${n}`, productExample: "erg s**-1 or erg*s**-1",
  },
  cds: {
    label: "the CDS convention", strict: true, products: ".", caret: false, starstar: false, implicit: true, superscript: false,
    scaleDecimal: true, scaleSign: true, spaces: false, power: (s, n) => `${s}${n}`, productExample: "erg.s-1",
  },
  vounits: {
    label: "VOUnits", strict: true, products: ".", caret: false, starstar: true, implicit: false, superscript: false,
    scaleDecimal: true, scaleSign: false, spaces: false, power: (s, n) => `${s}**${n}`, productExample: "erg.s**-1",
  },
};

// --- reader ------------------------------------------------------------------

const SUPERSCRIPTS: Record<string, string> = {
  "⁰": "0", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6", "⁷": "7", "⁸": "8", "⁹": "9", "⁻": "-", "⁺": "+",
};
const NAME_CHAR = /[\p{L}_☉⊕°′″]/u;
const isNameChar = (c: string): boolean => c !== "" && c !== "·" && NAME_CHAR.test(c);
const isDigit = (c: string): boolean => c >= "0" && c <= "9";
const isSign = (c: string): boolean => c === "-" || c === "+" || c === "−";

class Reader {
  pos = 0;
  /** Work done: characters looked at plus table probes (bounded by a constant times the length). */
  steps = 0;
  /** Position of a magnitude symbol, or -1. */
  magAt = -1;
  /** Factors read, and whether a power or scale applied (for the magnitude rule). */
  factors = 0;
  modified = false;
  constructor(readonly text: string, readonly rules: Rules) {}
  peek(): string {
    this.steps++;
    return this.text[this.pos] ?? "";
  }
  at(offset: number): string {
    this.steps++;
    return this.text[this.pos + offset] ?? "";
  }
  /** Skip ASCII spaces only. */
  skipSpaces(): boolean {
    const start = this.pos;
    while (this.peek() === " ") this.pos++;
    return this.pos > start;
  }
  fail(expected: string, suggestion = "", at = this.pos): never {
    throw new ParseError(this.text, at, expected, undefined, suggestion);
  }
}

let lastSteps = 0;

/**
 * Work done by the last call of `parseUnit` or `parseQuantityText`
 * (characters looked at plus table probes), for tests that bound the
 * parser's work by the length of its input.
 *
 * @internal
 */
export function lastUnitParseSteps(): number {
  return lastSteps;
}

function readInteger(r: Reader): string {
  const start = r.pos;
  let s = "";
  const c = r.peek();
  if (isSign(c)) {
    s += c === "−" ? "-" : c;
    r.pos++;
  }
  let digits = "";
  while (isDigit(r.peek()) && digits.length < 6) {
    digits += r.peek();
    r.pos++;
  }
  if (digits === "") {
    r.pos = start;
    r.fail("an integer exponent", "write powers as integers from -4 to 4, e.g. cm^-2 or cm-2");
  }
  return s + digits;
}

/** An exponent after ^ or **: an integer, optionally in parentheses. */
function readExponent(r: Reader): number {
  const paren = r.peek() === "(";
  if (paren) r.pos++;
  const n = readInteger(r);
  const c = r.peek();
  if (c === "/" && paren) r.fail("an integer exponent", "starlume reads integer powers only (from -4 to 4); m^(1/2) has no unit here");
  if (c === "." && isDigit(r.at(1))) r.fail("an integer exponent", "starlume reads integer powers only (from -4 to 4)");
  if (paren) {
    if (r.peek() !== ")") r.fail('")" closing the exponent');
    r.pos++;
  }
  return Number(n);
}

function readSuperscript(r: Reader): number | undefined {
  let s = "";
  while (SUPERSCRIPTS[r.peek()] !== undefined && s.length < 6) {
    s += SUPERSCRIPTS[r.peek()];
    r.pos++;
  }
  if (s === "") return undefined;
  if (!/^[+-]?[0-9]+$/.test(s)) r.fail("a superscript integer", "write e.g. cm⁻² or cm^-2");
  return Number(s);
}

/**
 * A unit being built: a flat product of atoms with integer exponents (equal
 * atoms merged), its dimension exponents and its decimal size. One unit is
 * defined from it at the end, so parsing allocates no intermediate units.
 */
interface Acc {
  parts: Map<string, { exp: number; name: string }>;
  dim: number[];
  mantissa: number;
  exp10: number;
  /** The catalogue unit when the text was exactly one symbol (returned as is). */
  single: Unit | undefined;
}

function accOf(a: Atom): Acc {
  return {
    parts: new Map([[a.symbol, { exp: 1, name: a.name }]]),
    dim: baseDimensions.map((k) => a.dimension[k]),
    mantissa: a.mantissa,
    exp10: a.exp10,
    single: a.unit,
  };
}

function checkDims(acc: Acc, r: Reader, at: number): Acc {
  for (const e of acc.dim) if (e < -12 || e > 12) r.fail("a unit whose dimension exponents stay within -12..12", "split the unit or simplify it", at);
  for (const p of acc.parts.values()) if (p.exp < -12 || p.exp > 12) r.fail("a unit whose powers stay within -12..12", "simplify the unit", at);
  return acc;
}

function applyPower(u: Acc, n: number, r: Reader, at: number): Acc {
  if (!Number.isInteger(n) || n < -4 || n > 4) {
    r.fail("an exponent from -4 to 4", `starlume's units take powers from -4 to 4; got ${n}`, at);
  }
  r.modified = true;
  r.steps += u.parts.size + 7;
  const parts = new Map<string, { exp: number; name: string }>();
  if (n !== 0) for (const [k, v] of u.parts) parts.set(k, { exp: v.exp * n, name: v.name });
  return checkDims({ parts, dim: u.dim.map((e) => e * n), mantissa: u.mantissa ** n, exp10: u.exp10 * n, single: undefined }, r, at);
}

function lookup(r: Reader, name: string, start: number): Atom {
  r.steps += name.length;
  const rules = r.rules;
  const foreign = foreignSymbols.get(name);
  if (rules.strict) {
    if (name === "A") {
      r.fail("a unit symbol of " + rules.label, `${rules.label} reads A as the ampere, which starlume does not have: write Angstrom for the ångström`, start);
    }
    const std = standardSymbols.get(name);
    if (foreign === undefined && std !== undefined) return atomOf(std);
    const u = foreign === undefined ? prefixedLookup(name, prefixableStd, r) : undefined;
    if (u !== undefined) return u;
    const lenient = foreign === undefined ? (exactAny(name) ?? prefixedLookup(name, prefixableAny, r)) : undefined;
    if (lenient !== undefined) {
      const std = [...standardSymbols].find(([, v]) => v.symbol === lenient.symbol)?.[0];
      throw new ParseError(
        r.text, start, "a unit symbol of " + rules.label,
        `cannot read ${excerpt(r.text, start)}: ${quote(name)} at position ${start} is not a symbol of ${rules.label}`,
        std !== undefined ? `write ${std}, or read with the default syntax` : "read with the default syntax, which accepts it",
      );
    }
  } else if (foreign === undefined) {
    const exact = exactAny(name);
    if (exact !== undefined) return atomOf(exact);
    const u = prefixedLookup(name, prefixableAny, r);
    if (u !== undefined) return u;
  }
  let suggestion: string;
  if (foreign !== undefined) suggestion = `${quote(name)} is ${foreign}`;
  else {
    const near = nearest(name);
    suggestion = near !== undefined ? `did you mean ${quote(near)}?` : "see the unit list in docs/guides/quantities.md";
  }
  throw new ParseError(r.text, start, "a known unit symbol", `cannot read ${excerpt(r.text, start)}: unknown unit ${quote(name.length > 40 ? `${name.slice(0, 40)}…` : name)} at position ${start}`, suggestion);
}

function readFactor(r: Reader, depth: number): Acc {
  let u: Acc;
  const start = r.pos;
  const c = r.peek();
  if (c === "(") {
    if (depth >= unitTextLimits.maxNesting) {
      r.fail(`at most ${unitTextLimits.maxNesting} nested parentheses`, "flatten the expression: write W m^-2 sr^-1 rather than W/(m^2 (sr))");
    }
    r.pos++;
    if (r.skipSpaces() && !r.rules.spaces) r.fail("a unit symbol", `${r.rules.label} writes no spaces`);
    u = readExpr(r, depth + 1, false);
    u.single = undefined;
    if (r.skipSpaces() && !r.rules.spaces) r.fail('")"', `${r.rules.label} writes no spaces`);
    if (r.peek() !== ")") r.fail('")"', depth === 0 ? "close the parenthesis opened before" : "close every parenthesis");
    r.pos++;
  } else {
    let name = "";
    while (isNameChar(r.peek())) {
      name += r.text[r.pos];
      r.pos++;
    }
    if (name === "") {
      if (isDigit(c) || isSign(c)) r.fail("a unit symbol", "a number may stand only at the start of a unit (a scale factor, as in 1e-17 erg s^-1), and a power goes right after its symbol (cm2, cm^2)");
      if (c === "") r.fail("a unit symbol", "remove the trailing operator or add the unit after it");
      r.fail("a unit symbol", `write factors as symbols separated by spaces or ".", e.g. ${r.rules.productExample}`);
    }
    const atom = lookup(r, name, start);
    if (atom.name.endsWith("magnitude")) r.magAt = start;
    u = accOf(atom);
  }
  const at = r.pos;
  const rules = r.rules;
  const sym = r.text.slice(start, at);
  const p = r.peek();
  if (p === "^") {
    if (!rules.caret) r.fail(`a power as ${rules.label} writes it`, `write ${rules.power(sym, "n")}`);
    r.pos++;
    u = applyPower(u, readExponent(r), r, at);
  } else if (p === "*" && r.at(1) === "*") {
    if (!rules.starstar) r.fail(`a power as ${rules.label} writes it`, `write ${rules.power(sym, "n")}`);
    r.pos += 2;
    u = applyPower(u, readExponent(r), r, at);
  } else if (isDigit(p) || (isSign(p) && isDigit(r.at(1)))) {
    const n = readInteger(r);
    if (!rules.implicit) r.fail(`a power as ${rules.label} writes it`, `write ${rules.power(sym, n)}`, at);
    if (r.peek() === "." && isDigit(r.at(1))) r.fail("an integer exponent", "starlume reads integer powers only (from -4 to 4)");
    u = applyPower(u, Number(n), r, at);
  } else if (SUPERSCRIPTS[p] !== undefined) {
    if (!rules.superscript) r.fail(`a power as ${rules.label} writes it`, `write ${rules.power(sym, "n")} (no superscripts)`);
    const sup = readSuperscript(r) as number;
    u = applyPower(u, sup, r, at);
  }
  r.factors++;
  return u;
}

const SCALE_POW = /10(\^|\*\*)(\()?([+\-−]?[0-9]{1,4})(\))?/y;
const SCALE_SIGN = /10([+\-−][0-9]{1,4})/y;
const SCALE_DEC = /([0-9]{1,40}(?:\.[0-9]{0,40})?|\.[0-9]{1,40})(?:[eE]([+\-−]?[0-9]{1,4}))?/y;

/** A leading numeric scale factor, as a pure-number unit. */
function readScale(r: Reader): Acc {
  const rules = r.rules;
  const start = r.pos;
  let mantissa: number;
  let exp: number;
  r.steps += 8;
  SCALE_POW.lastIndex = start;
  SCALE_SIGN.lastIndex = start;
  SCALE_DEC.lastIndex = start;
  let m = SCALE_POW.exec(r.text);
  if (m !== null) {
    if ((m[1] === "^" && !rules.caret) || (m[1] === "**" && !rules.starstar)) {
      r.fail(`a scale factor as ${rules.label} writes it`, `write ${rules.power("10", "k")}`);
    }
    if ((m[2] === undefined) !== (m[4] === undefined)) r.fail("a balanced exponent", "write 10^(-7) or 10^-7");
    mantissa = 1;
    exp = Number((m[3] as string).replace("−", "-"));
  } else if ((m = SCALE_SIGN.exec(r.text)) !== null) {
    if (!rules.scaleSign) r.fail(`a scale factor as ${rules.label} writes it`, `write ${rules.power("10", "k")}`);
    mantissa = 1;
    exp = Number((m[1] as string).replace("−", "-"));
  } else if ((m = SCALE_DEC.exec(r.text)) !== null) {
    if (!rules.scaleDecimal && !/^10*$/.test(m[0])) {
      r.fail(`a scale factor as ${rules.label} writes it`, `${rules.label} writes scale factors as powers of ten: ${rules.power("10", "k")}`);
    }
    mantissa = Number(m[1]);
    exp = m[2] === undefined ? 0 : Number(m[2].replace("−", "-"));
  } else {
    return r.fail("a scale factor");
  }
  if (!(mantissa > 0)) r.fail("a scale factor > 0", "a unit cannot be scaled by zero");
  r.pos = start + m[0].length;
  const symbol = exp === 0 ? String(mantissa) : `${mantissa}e${exp}`;
  const size = Number(`${mantissa}e${exp}`);
  if (!(size >= 2.2250738585072014e-308) || !Number.isFinite(size)) {
    r.fail("a scale factor a double can hold", "a scale factor from 1e-307 to 1e308", start);
  }
  r.modified = true;
  r.factors++;
  const parts = new Map<string, { exp: number; name: string }>();
  if (mantissa !== 1 || exp !== 0) parts.set(symbol, { exp: 1, name: `scale ${symbol}` });
  return { parts, dim: [0, 0, 0, 0, 0, 0, 0], mantissa, exp10: exp, single: undefined };
}

function combine(a: Acc, b: Acc, divide: boolean, r: Reader, at: number): Acc {
  const sign = divide ? -1 : 1;
  r.steps += b.parts.size + 7;
  for (const [k, v] of b.parts) {
    const e = (a.parts.get(k)?.exp ?? 0) + sign * v.exp;
    if (e === 0) a.parts.delete(k);
    else a.parts.set(k, { exp: e, name: v.name });
  }
  for (let i = 0; i < a.dim.length; i++) (a.dim[i] as number) += sign * (b.dim[i] as number);
  a.mantissa = divide ? a.mantissa / b.mantissa : a.mantissa * b.mantissa;
  a.exp10 += sign * b.exp10;
  a.single = undefined;
  return checkDims(a, r, at);
}

function readExpr(r: Reader, depth: number, allowScale: boolean): Acc {
  const rules = r.rules;
  let u: Acc;
  const c0 = r.peek();
  if (allowScale && (isDigit(c0) || (c0 === "." && isDigit(r.at(1))))) {
    u = readScale(r);
    const save = r.pos;
    const spaced = r.skipSpaces();
    const c = r.peek();
    if (c === "" || c === "/" || c === ")") {
      r.pos = save;
    } else if ((c === "." || c === "*" || c === "·") && r.at(1) !== "*") {
      if (!rules.products.includes(c)) r.fail(`a product as ${rules.label} writes it`, `write ${rules.productExample}`);
      r.pos++;
      r.skipSpaces();
      const at = r.pos;
      u = combine(u, readFactor(r, depth), false, r, at);
    } else if (isNameChar(c) || c === "(") {
      if (spaced && !rules.spaces) r.fail(`a product as ${rules.label} writes it`, `${rules.label} writes no spaces: write ${rules.productExample}`, save);
      const at = r.pos;
      u = combine(u, readFactor(r, depth), false, r, at);
    } else {
      r.fail("a unit after the scale factor", "write e.g. 1e-17 erg s^-1 cm^-2 Angstrom^-1");
    }
  } else {
    u = readFactor(r, depth);
  }
  for (;;) {
    const save = r.pos;
    const spaced = r.skipSpaces();
    const c = r.peek();
    if (spaced && !rules.spaces && c !== "") r.fail(`no space: ${rules.label} writes none`, `write ${rules.productExample}`, save);
    if (c === "/") {
      r.pos++;
      r.skipSpaces();
      const at = r.pos;
      u = combine(u, readFactor(r, depth), true, r, at);
    } else if ((c === "*" && r.at(1) !== "*") || c === "." || c === "·") {
      if (!rules.products.includes(c)) r.fail(`a product as ${rules.label} writes it`, `write ${rules.productExample}`);
      r.pos++;
      r.skipSpaces();
      const at = r.pos;
      u = combine(u, readFactor(r, depth), false, r, at);
    } else if (spaced && (isNameChar(c) || c === "(")) {
      if (!rules.products.includes(" ")) r.fail(`a product as ${rules.label} writes it`, `write ${rules.productExample}`, save);
      const at = r.pos;
      u = combine(u, readFactor(r, depth), false, r, at);
    } else {
      r.pos = save;
      return u;
    }
  }
}

function endHint(r: Reader): string {
  const c = r.text[r.pos] ?? "";
  if (/\s/.test(c) || INVISIBLE.test(c)) {
    return `only the ASCII space separates factors: replace ${quote(c)} with " "`;
  }
  if (isDigit(c) || isSign(c)) return "a power goes right after its symbol with no space (cm2, cm^2)";
  if (c === ")") return "remove the unmatched \")\"";
  return `write factors separated by spaces or ".", e.g. ${r.rules.productExample}`;
}

/** Parse a unit text starting at `start` in `text` (positions refer to the whole text). */
function parseUnitAt(text: string, start: number, options: UnitTextOptions | undefined): Unit {
  const rules = RULES[options?.syntax ?? "any"];
  if (rules === undefined) throw new ParseError(text, 0, "a known syntax", undefined, 'use one of "any", "fits", "ogip", "cds", "vounits"');
  const r = new Reader(text, rules);
  r.pos = start;
  try {
    r.skipSpaces();
    if (r.pos >= text.length) return dimensionlessUnit;
    const acc = readExpr(r, 0, true);
    r.skipSpaces();
    if (r.pos < text.length) r.fail('a separator, "/" or the end of the unit', endHint(r));
    if (r.magAt >= 0 && (r.factors > 1 || r.modified)) {
      r.fail("a magnitude on its own", "a magnitude is a logarithm, not a scale: write mag (or mmag) alone", r.magAt);
    }
    if (acc.single !== undefined) return acc.single;
    if (!(acc.mantissa > 0) || !Number.isFinite(acc.mantissa)) {
      r.fail("a unit whose size is a finite double", "the unit's size in SI overflows or underflows a double", start);
    }
    const parts = [...acc.parts];
    const symbol = parts.map(([k, v]) => (v.exp === 1 ? k : `${k}^${v.exp}`)).join(" ");
    const name = parts.map(([, v]) => (v.exp === 1 ? v.name : `${v.name}^${v.exp}`)).join(" ");
    const d: Record<string, number> = {};
    baseDimensions.forEach((k, i) => (d[k] = acc.dim[i] as number));
    const u = defineUnit(symbol, name, d as unknown as Dimension, acc.mantissa, acc.exp10);
    if (!(u.factor > 0) || !Number.isFinite(u.factor)) {
      r.fail("a unit whose size is a finite double", "the unit's size in SI overflows or underflows a double", start);
    }
    return u;
  } finally {
    lastSteps = r.steps;
  }
}

function checkLength(text: string): void {
  if (text.length > unitTextLimits.maxLength) {
    throw new ParseError(
      text, unitTextLimits.maxLength, `at most ${unitTextLimits.maxLength} characters`,
      `cannot read ${excerpt(text, 0)}: the text has ${text.length} characters, more than the limit of ${unitTextLimits.maxLength}`,
      "shorten the unit (a unit is rarely longer than 60 characters)",
    );
  }
}

/**
 * Parse a unit expression such as `"erg s^-1 cm^-2 Å^-1"`, `"W/m^2/sr"`,
 * `"erg/s/cm2/Angstrom"` or `"1e-17 erg.s**-1.cm**-2.Angstrom**-1"`.
 *
 * @param options - `syntax` to accept one standard's syntax only (see {@link UnitSyntax})
 * @throws ParseError with the position, what was expected and a suggested fix
 * @example
 * ```ts
 * import { parseUnit } from "starlume";
 * parseUnit("erg s^-1 cm^-2 A^-1").factor; // 1e7 (SI value of one such unit, W m^-3)
 * parseUnit("erg s-1 cm-2 Angstrom-1", { syntax: "fits" }).factor; // 1e7
 * parseUnit("10-7 J").factor; // 1e-7
 * ```
 */
export function parseUnit(text: string, options?: UnitTextOptions): Unit {
  if (typeof text !== "string") throw new ParseError(String(text).slice(0, 64), 0, "a string", undefined, "pass the unit as text");
  checkLength(text);
  return parseUnitAt(text, 0, options);
}

/** The unit of a pure number (symbol ""). */
export const dimensionlessUnit: Unit = defineUnit("", "one", kinds.dimensionless.dimension, 1);

const NUMBER = /[+\-−]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+\-−]?[0-9]+)?/y;

/**
 * Parse `"<number> <unit>"` into its number and its unit (no kind check, no
 * system: see `SI.parse` / `CGS.parse` for typed results). The space between
 * number and unit may be left out (`"5772K"`).
 *
 * @throws ParseError for text that is not a number and a unit, a number that
 *   overflows or underflows a double (`"1e-400 m"` is an error, not 0), or
 *   text beyond {@link unitTextLimits}
 * @example
 * ```ts
 * import { parseQuantityText } from "starlume";
 * const { value, unit } = parseQuantityText("1.2 mas");
 * ```
 */
export function parseQuantityText(
  text: string,
  options?: UnitTextOptions,
): {
  /** The number as written (in `unit`, not converted to any system). */
  value: number;
  /** The unit that followed the number (the dimensionless unit when none did). */
  unit: Unit;
} {
  if (typeof text !== "string") throw new ParseError(String(text).slice(0, 64), 0, "a string", undefined, "pass the quantity as text");
  checkLength(text);
  let i = 0;
  while (text[i] === " ") i++;
  NUMBER.lastIndex = i;
  const m = NUMBER.exec(text);
  if (m === null) {
    const c = text[i] ?? "";
    throw new ParseError(text, i, "a number", undefined, /\s/.test(c) || INVISIBLE.test(c) ? `only the ASCII space may surround the number: remove ${quote(c)}` : 'write the number first, e.g. "5772 K"');
  }
  const written = m[0].replace(/−/g, "-");
  const value = Number(written);
  if (!Number.isFinite(value)) throw new ParseError(text, i, "a finite number", undefined, "the number overflows a double (largest about 1.8e308)");
  if (value === 0 && /[1-9]/.test(written.split(/[eE]/)[0] as string)) {
    throw new ParseError(text, i, "a number that a double can hold", undefined, `${written} underflows to 0 (smallest about 5e-324): write it in a smaller unit`);
  }
  const j = i + m[0].length;
  const next = text[j] ?? "";
  if (next !== "" && next !== " " && next !== "(" && !isNameChar(next)) {
    throw new ParseError(text, j, "a space between the number and its unit", undefined, /\s/.test(next) || INVISIBLE.test(next) ? `only the ASCII space separates: replace ${quote(next)} with " "` : 'write e.g. "5772 K"');
  }
  return { value, unit: parseUnitAt(text, j, options) };
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
