/**
 * Band-definition files for `starlume fit` (format `starlume-bands/1`, a
 * JSON design of our own):
 *
 * ```json
 * {
 *   "format": "starlume-bands/1",
 *   "description": "optional text",
 *   "bands": [
 *     { "name": "tp450", "convention": "photon", "wavelengthUnit": "nm",
 *       "wavelengths": [390, 391, …], "response": [0, 0.01, …] },
 *     { "name": "k22", "shape": "gaussian", "centre": "2.2 um", "fwhm": "0.35 um" },
 *     { "name": "box", "shape": "top-hat", "centre": "550 nm", "width": "90 nm", "convention": "energy" }
 *   ]
 * }
 * ```
 *
 * - `name`: the band's name; the photometry column of the same name holds its data.
 * - `convention`: `"photon"` (default: CCDs, AB magnitudes) or `"energy"`.
 * - A tabulated band gives `wavelengths` (strictly increasing, in
 *   `wavelengthUnit`, any length unit the parser reads) and `response`
 *   (≥ 0, any scale, same length).
 * - A shaped band gives `shape` (`"gaussian"` with `centre` and `fwhm`, or
 *   `"top-hat"` with `centre` and `width`) as quantity texts with units
 *   (the legacy key `center` is still read).
 *
 * @module
 */
import { readFile } from "node:fs/promises";
import { resolve } from "node:path";
import { kinds } from "../quantity/aliases";
import type { LengthArray } from "../quantity/aliases";
import { SI } from "../quantity/system";
import { units } from "../quantity/units";
import { gaussianBand, responseBand, topHatBand, type FitBand } from "../fit/index";
import { gaussianResponseSI, topHatResponseSI } from "../fit/kernels/bands";
import { UsageError, type CliIO } from "./context";
import { demoSurveyDir } from "./paths";
import { optionQuantitySI, unitOfKind } from "./units";

/** A band ready for fitting and plotting. */
export interface CliBand {
  readonly name: string;
  readonly band: FitBand<"SI">;
  /** Response curve for plots: wavelengths in m and response (any scale). */
  readonly curveM: { readonly wavelengths: Float64Array; readonly response: Float64Array };
  /** How the response counts light: per photon (CCDs, AB magnitudes) or per unit energy. */
  readonly convention: "photon" | "energy";
}

/** A set of bands read from a file. */
export interface BandSet {
  readonly source: string;
  readonly description: string;
  readonly bands: readonly CliBand[];
}

/** The format tag of band files. */
export const BANDS_FORMAT = "starlume-bands/1";

/**
 * Read a band-definition file; `demo` reads the demo survey's bands.
 *
 * @throws UsageError naming the file and the band for anything malformed
 */
export async function loadBands(path: string, io: CliIO): Promise<BandSet> {
  let full: string;
  let label = path;
  if (path === "demo") {
    const dir = demoSurveyDir();
    if (dir === null) throw new UsageError("the demo survey (examples/demo-survey) is not installed with this copy of starlume");
    full = resolve(dir, "bands.json");
    label = "demo bands";
  } else {
    full = resolve(io.cwd ?? process.cwd(), path);
  }
  let text: string;
  try {
    text = await readFile(full, "utf8");
  } catch (e) {
    throw new UsageError(`cannot read bands file '${path}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    throw new UsageError(`bands file '${path}': not valid JSON (${(e as Error).message})`);
  }
  return parseBands(json, label);
}

/** Build bands from the parsed JSON of a band file (exported for tests). */
export function parseBands(json: unknown, label: string): BandSet {
  const fail = (msg: string): never => {
    throw new UsageError(`bands file '${label}': ${msg}`);
  };
  if (typeof json !== "object" || json === null || Array.isArray(json)) fail("must be a JSON object");
  const obj = json as Record<string, unknown>;
  if (obj.format !== BANDS_FORMAT) fail(`"format" must be "${BANDS_FORMAT}"; got ${JSON.stringify(obj.format)}`);
  if (!Array.isArray(obj.bands) || obj.bands.length === 0) fail(`"bands" must be a non-empty array`);
  const seen = new Set<string>();
  const bands = (obj.bands as unknown[]).map((b, i): CliBand => {
    if (typeof b !== "object" || b === null) fail(`bands[${i}] must be an object`);
    const o = b as Record<string, unknown>;
    if (typeof o.name !== "string" || o.name.trim() === "") fail(`bands[${i}].name must be a non-empty string`);
    const name = (o.name as string).trim();
    const where = `band '${name}' (bands[${i}])`;
    if (seen.has(name)) fail(`${where}: duplicate band name`);
    seen.add(name);
    const convention = o.convention ?? "photon";
    if (convention !== "photon" && convention !== "energy") fail(`${where}: "convention" must be "photon" or "energy"; got ${JSON.stringify(convention)}`);
    const conv = convention as "photon" | "energy";
    try {
      if (o.shape === undefined) {
        const unitText = typeof o.wavelengthUnit === "string" ? o.wavelengthUnit : fail(`${where}: "wavelengthUnit" (e.g. "nm") is required with "wavelengths"`);
        const unit = unitOfKind(unitText, kinds.length, `${where}: "wavelengthUnit"`);
        const wl = numbers(o.wavelengths, `${where}: "wavelengths"`, fail);
        const resp = numbers(o.response, `${where}: "response"`, fail);
        const grid = SI.arrayOf(wl, unit) as LengthArray<"SI">;
        const band = responseBand(SI, grid, resp, conv);
        return { name, band, convention: conv, curveM: { wavelengths: Float64Array.from(grid), response: Float64Array.from(resp) } };
      }
      // "centre" is the key; the 0.1 spelling "center" is still read (docs/naming.md §1)
      if (o.centre !== undefined && o.center !== undefined) fail(`${where}: give "centre" or its legacy spelling "center", not both`);
      const centreKey = o.centre === undefined && o.center !== undefined ? "center" : "centre";
      const centre = quantity(o[centreKey], `${where}: "${centreKey}"`, fail);
      if (o.shape === "gaussian") {
        const fwhm = quantity(o.fwhm, `${where}: "fwhm"`, fail);
        const band = gaussianBand(SI, SI.of(centre, units.m), SI.of(fwhm, units.m), { convention: conv });
        const c = gaussianResponseSI(centre, fwhm);
        return { name, band, convention: conv, curveM: { wavelengths: Float64Array.from(c.wavelengthsM), response: Float64Array.from(c.response) } };
      }
      if (o.shape === "top-hat") {
        const width = quantity(o.width, `${where}: "width"`, fail);
        const band = topHatBand(SI, SI.of(centre, units.m), SI.of(width, units.m), { convention: conv });
        const c = topHatResponseSI(centre, width);
        return { name, band, convention: conv, curveM: { wavelengths: Float64Array.from(c.wavelengthsM), response: Float64Array.from(c.response) } };
      }
      return fail(`${where}: "shape" must be "gaussian" or "top-hat"; got ${JSON.stringify(o.shape)}`);
    } catch (e) {
      if (e instanceof RangeError) fail(`${where}: ${e.message}`);
      throw e;
    }
  });
  return { source: label, description: typeof obj.description === "string" ? obj.description : "", bands };
}

function numbers(v: unknown, where: string, fail: (m: string) => never): number[] {
  if (!Array.isArray(v) || v.length < 2) return fail(`${where} must be an array of at least 2 numbers`);
  return v.map((x, i) => (typeof x === "number" && Number.isFinite(x) ? x : fail(`${where}[${i}] must be a finite number; got ${JSON.stringify(x)}`)));
}

function quantity(v: unknown, where: string, fail: (m: string) => never): number {
  if (typeof v !== "string") return fail(`${where} must be a quantity text with a unit, e.g. "550 nm"`);
  if (/^\s*[+-]?[0-9.eE+-]+\s*$/.test(v)) return fail(`${where} must carry a unit, e.g. "${v.trim()} nm"`);
  return optionQuantitySI(v, kinds.length, units.m, where);
}
