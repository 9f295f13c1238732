/**
 * Column-header convention for starlume tables (CSV and aligned text).
 *
 * Each header cell is `name [unit]`:
 *
 * | header cell                        | name               | unit                     | uncertaintyOf |
 * | ---------------------------------- | ------------------ | ------------------------ | ------------- |
 * | `teff [K]`                         | `teff`             | `K`                      | null          |
 * | `flux_g [erg s^-1 cm^-2 A^-1]`     | `flux_g`           | `erg s^-1 cm^-2 A^-1`    | null          |
 * | `sigma(parallax) [mas]`            | `sigma(parallax)`  | `mas`                    | `parallax`    |
 * | `sigma-(logg) [dex]`               | `sigma-(logg)`     | `dex`                    | `logg` (lower)|
 * | `star` or `n_obs`                  | `star` / `n_obs`   | null                     | null          |
 *
 * - The unit is everything between the single pair of square brackets at the
 *   end of the cell, trimmed. It is passed verbatim to the unit parser
 *   elsewhere in the library; this module only splits it out.
 * - A cell without brackets is a text column or a pure (dimensionless) number.
 *   Empty brackets `[]` are an error: omit them for pure numbers.
 * - The standard (1σ) uncertainty of column `x` is spelled `sigma(x)` (or
 *   `σ(x)`), or, when a column `x` exists, `x_error`, `x_err`, `e_x` or
 *   `err_x` (configurable: {@link HeaderOptions}). Asymmetric uncertainties are `sigma-(x)` (towards smaller values)
 *   and `sigma+(x)` (towards larger values); both are given as positive
 *   magnitudes. An uncertainty column must name a value column of the same
 *   table, and carries a unit exactly when that column does.
 *
 * The full rules, with examples, are in `docs/guides/table-format.md`.
 *
 * @module
 */

/** Which side of the value an uncertainty column describes. */
export type UncertaintySide = "both" | "lower" | "upper";

/** One parsed header cell. */
export interface ColumnSpec {
  /** Column name: the header text before the brackets, trimmed (e.g. `teff`, `sigma(parallax)`). */
  readonly name: string;
  /** Unit text between the brackets, trimmed, or `null` for text / pure-number columns. */
  readonly unit: string | null;
  /** For an uncertainty column, the name of the value column it belongs to; otherwise `null`. */
  readonly uncertaintyOf: string | null;
  /** `"both"` for `sigma(x)`, `"lower"` for `sigma-(x)`, `"upper"` for `sigma+(x)`; `null` for value columns. */
  readonly uncertaintySide: UncertaintySide | null;
  /**
   * The template that made this an uncertainty column when it is not spelled
   * `sigma(x)` (e.g. `"e_{x}"` for `e_teff`), so that a command can say how it
   * read the column; absent otherwise.
   */
  readonly uncertaintyPattern?: string;
}

/** Matches `sigma(x)`, `sigma-(x)`, `sigma+(x)` and the same with `σ`. */
const UNCERTAINTY = /^(?:sigma|σ)([+-]?)\((.*)\)$/u;

/**
 * The other spellings of a symmetric (1σ) uncertainty column that
 * {@link parseHeader} recognises by default, as templates in which `{x}`
 * stands for the value column's name: `x_error`, `x_err`, `e_x`, `err_x`
 * (common practice in published catalogues). `sigma(x)` and `σ(x)` are
 * always recognised.
 */
export const defaultUncertaintyPatterns: readonly string[] = ["{x}_error", "{x}_err", "e_{x}", "err_{x}"];

/** Options of {@link parseHeader}. */
export interface HeaderOptions {
  /**
   * Templates of uncertainty-column names besides `sigma(x)` (`{x}` is the
   * value column's name); default {@link defaultUncertaintyPatterns}; `[]`
   * recognises `sigma(x)` only.
   */
  readonly uncertaintyPatterns?: readonly string[];
}

/** The value-column name a template matches in `name`, or undefined (`"e_{x}"` on `"e_teff"` gives `"teff"`). */
function matchPattern(pattern: string, name: string): string | undefined {
  const at = pattern.indexOf("{x}");
  if (at < 0) return undefined;
  const before = pattern.slice(0, at);
  const after = pattern.slice(at + 3);
  if (name.length <= before.length + after.length || !name.startsWith(before) || !name.endsWith(after)) return undefined;
  return name.slice(before.length, name.length - after.length);
}

/**
 * Parse one header cell `name [unit]` (see the module description for the convention).
 *
 * @param cell - the raw header text.
 * @param column - 1-based column number, used only in error messages.
 * @returns the parsed column specification (the cross-column checks of
 *   {@link parseHeader} are not applied).
 * @throws SyntaxError naming the column and its text when the cell is empty,
 *   the brackets are malformed or empty, or the name contains a bracket.
 *
 * @example
 * ```ts
 * parseColumnHeader("sigma(parallax) [mas]");
 * // { name: "sigma(parallax)", unit: "mas", uncertaintyOf: "parallax", uncertaintySide: "both" }
 * ```
 */
export function parseColumnHeader(cell: string, column = 1): ColumnSpec {
  const text = cell.trim();
  const bad = (why: string): SyntaxError =>
    new SyntaxError(`header column ${column} (${JSON.stringify(cell)}): ${why}`);
  if (text === "") throw bad("empty column name");
  const open = text.indexOf("[");
  let name: string;
  let unit: string | null = null;
  if (open === -1) {
    if (text.includes("]")) throw bad("']' without '['");
    name = text;
  } else {
    if (!text.endsWith("]")) throw bad("the unit must be the last thing in the cell, as 'name [unit]'");
    const inner = text.slice(open + 1, -1);
    if (inner.includes("[") || inner.includes("]")) throw bad("only one pair of square brackets is allowed");
    unit = inner.trim();
    if (unit === "") throw bad("empty unit '[]'; omit the brackets for text or pure numbers");
    name = text.slice(0, open).trim();
    if (name === "") throw bad("missing column name before '['");
  }
  let uncertaintyOf: string | null = null;
  let uncertaintySide: UncertaintySide | null = null;
  const m = UNCERTAINTY.exec(name);
  if (m !== null) {
    const target = (m[2] ?? "").trim();
    if (target === "") throw bad("sigma() must name a column");
    uncertaintyOf = target;
    uncertaintySide = m[1] === "-" ? "lower" : m[1] === "+" ? "upper" : "both";
  }
  return { name, unit, uncertaintyOf, uncertaintySide };
}

/**
 * Parse a header row into column specifications and check the table-level
 * rules: names are unique, every uncertainty column names an existing value
 * column (not another uncertainty), has a unit exactly when that column has
 * one, and a column does not mix a symmetric `sigma(x)` with `sigma-(x)` /
 * `sigma+(x)`.
 *
 * @param cells - the header record's fields, in column order.
 * @returns one {@link ColumnSpec} per cell, in the same order.
 * @throws SyntaxError naming the column number and text of the first violation.
 *
 * @example
 * ```ts
 * const cols = parseHeader(["star", "parallax [mas]", "sigma(parallax) [mas]"]);
 * // cols[0] = { name: "star", unit: null, uncertaintyOf: null, uncertaintySide: null }
 * // cols[2].uncertaintyOf === "parallax"
 * ```
 */
export function parseHeader(cells: readonly string[], options: HeaderOptions = {}): ColumnSpec[] {
  const specs = cells.map((cell, i) => parseColumnHeader(cell, i + 1));
  const patterns = options.uncertaintyPatterns ?? defaultUncertaintyPatterns;
  const names = new Set(specs.map((s) => s.name));
  // Conventional spellings (e_teff, teff_err …): an uncertainty only when the
  // value column exists, is not itself such a column, and the units agree in
  // presence; otherwise the column stays a plain column (and a command can
  // report it as looking like an unused uncertainty).
  for (let i = 0; i < specs.length; i++) {
    const s = specs[i] as ColumnSpec;
    if (s.uncertaintyOf !== null) continue;
    for (const p of patterns) {
      const x = matchPattern(p, s.name);
      if (x === undefined || !names.has(x) || x === s.name) continue;
      const target = specs.find((t) => t.name === x);
      if (target === undefined || target.uncertaintyOf !== null || (target.unit === null) !== (s.unit === null)) continue;
      if (specs.some((t) => t.uncertaintyOf === x)) continue; // sigma(x) or an earlier spelling wins
      specs[i] = { ...s, uncertaintyOf: x, uncertaintySide: "both", uncertaintyPattern: p };
      break;
    }
  }
  const index = new Map<string, number>();
  specs.forEach((s, i) => {
    const prev = index.get(s.name);
    if (prev !== undefined) {
      throw new SyntaxError(
        `header column ${i + 1} (${JSON.stringify(cells[i])}): duplicate column name '${s.name}' (also column ${prev + 1})`,
      );
    }
    index.set(s.name, i);
  });
  const sides = new Map<string, Set<UncertaintySide>>();
  specs.forEach((s, i) => {
    if (s.uncertaintyOf === null || s.uncertaintySide === null) return;
    const where = `header column ${i + 1} (${JSON.stringify(cells[i])})`;
    const j = index.get(s.uncertaintyOf);
    const target = j === undefined ? undefined : specs[j];
    if (target === undefined) {
      throw new SyntaxError(`${where}: uncertainty of '${s.uncertaintyOf}', but there is no such column`);
    }
    if (target.uncertaintyOf !== null) {
      throw new SyntaxError(`${where}: '${s.uncertaintyOf}' is itself an uncertainty column`);
    }
    if ((target.unit === null) !== (s.unit === null)) {
      throw new SyntaxError(
        target.unit === null
          ? `${where}: has a unit but '${s.uncertaintyOf}' has none`
          : `${where}: needs a unit because '${s.uncertaintyOf}' is in [${target.unit}]`,
      );
    }
    const set = sides.get(s.uncertaintyOf) ?? new Set<UncertaintySide>();
    set.add(s.uncertaintySide);
    if (set.has("both") && set.size > 1) {
      throw new SyntaxError(`${where}: '${s.uncertaintyOf}' has both a symmetric sigma() and a one-sided sigma-()/sigma+()`);
    }
    sides.set(s.uncertaintyOf, set);
  });
  return specs;
}

/**
 * Write a column specification back as a header cell: `name [unit]`, or
 * `name` when the unit is null. Inverse of {@link parseColumnHeader} for
 * specs it produced.
 *
 * @example
 * ```ts
 * formatColumnHeader({ name: "teff", unit: "K", uncertaintyOf: null, uncertaintySide: null }); // "teff [K]"
 * ```
 */
export function formatColumnHeader(spec: Pick<ColumnSpec, "name" | "unit">): string {
  return spec.unit === null ? spec.name : `${spec.name} [${spec.unit}]`;
}
