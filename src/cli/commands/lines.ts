/**
 * `starlume lines`: the lines of a hydrogen-like series (H, D, He II), in
 * vacuum or standard air, optionally Doppler-shifted by a radial velocity,
 * with the typed spectra API; optionally an SVG or report of a synthetic
 * spectrum with the lines marked.
 *
 * @module
 */
import { writeFile } from "node:fs/promises";
import { resolve } from "node:path";
import { kinds } from "../../quantity/aliases";
import type { Velocity } from "../../quantity/aliases";
import { SI } from "../../quantity/system";
import type { Unit } from "../../quantity/unit";
import { units } from "../../quantity/units";
import {
  observedWavelengthFromRadialVelocity,
  hydrogenSeries,
  ions,
  seriesLimitVacuumWavelength,
  seriesLowerLevel,
  synthesizePlanckSpectrum,
  transitionEnergy,
  transitionVacuumWavelength,
  transitionWavenumber,
  airFromVacuum,
  type Ion,
  type LevelModel,
  type SeriesName,
  type VacuumWavelength,
} from "../../spectra/index";
import type { MarkerLine } from "../../plot/index";
import { optFlag, optInteger, optString, type ParsedArgs } from "../args";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { EXIT, UsageError, say, type CliIO } from "../context";
import type { CellValue } from "../io/write";
import { formatK, spectrumFigure } from "../figures";
import { writeReport } from "../report-write";
import { defaultFormat, openOutput, openTableWriter, OUTPUT_FORMATS, type OutColumn } from "../table-out";
import { optionQuantitySI, siIn, unitOfKind } from "../units";
import { reportTable } from "./solve";

const ION_CHOICES: Readonly<Record<string, Ion>> = { H: ions.H, D: ions.D, HeII: ions.HeII };
const SERIES = Object.keys(hydrogenSeries) as SeriesName[];
const PREFIX: Record<SeriesName, string> = { lyman: "Ly", balmer: "H", paschen: "Pa", brackett: "Br", pfund: "Pf", humphreys: "Hu" };
const GREEK = ["α", "β", "γ", "δ", "ε", "ζ", "η", "θ", "ι", "κ"];

/** Conventional label of a line: Hα, Lyβ, Pa10 for hydrogen; `He II 3-4` for other ions. */
export function lineLabel(ionKey: string, series: SeriesName, nLower: number, nUpper: number): string {
  if (ionKey === "HeII") return `He II ${nLower}-${nUpper}`;
  const k = nUpper - nLower;
  const base = `${PREFIX[series]}${k <= GREEK.length ? (GREEK[k - 1] as string) : String(nUpper)}`;
  return ionKey === "D" ? `D ${base}` : base;
}

/** One computed line (SI values), or the reason it could not be given. */
export interface LineRow {
  readonly label: string;
  readonly nLower: number;
  readonly nUpper: number | null;
  /** Rest vacuum wavelength, m. */
  readonly vacuumM: number;
  /** Rest wavelength in the chosen medium, m (NaN when rejected). */
  readonly restM: number;
  /** Observed wavelength in the chosen medium (shifted), m. */
  readonly observedM: number;
  /** Observed vacuum wavelength, m (for the figure). */
  readonly observedVacuumM: number;
  readonly energyJ: number;
  readonly wavenumberPerM: number;
  readonly reason: string | null;
}

/** The settings of a lines run. */
export interface LinesSetup {
  readonly ionKey: string;
  readonly ion: Ion;
  readonly series: SeriesName;
  readonly count: number;
  readonly medium: "vacuum" | "air";
  readonly velocityMs: number | null;
  readonly model: LevelModel;
  readonly unit: { text: string; unit: Unit };
  readonly limit: boolean;
}

function setup(args: ParsedArgs): LinesSetup {
  const ionKey = optString(args, "ion") ?? "H";
  const series = (optString(args, "series") ?? "balmer") as SeriesName;
  const velocityText = optString(args, "velocity");
  const velocityMs = velocityText === undefined ? null : optionQuantitySI(velocityText, kinds.velocity, units.km_per_s, "--velocity");
  if (velocityMs !== null && !(Math.abs(velocityMs) < 299792458)) throw new UsageError(`--velocity must be slower than light; got ${velocityText ?? ""}`);
  const unitOption = optString(args, "unit");
  // `--unit wavelength=UNIT` (the key of the wavelength and observed columns) or a bare UNIT (docs/naming.md §9)
  const unitText = unitOption === undefined ? "nm" : unitOption.replace(/^\s*wavelength\s*=\s*/, "");
  return {
    ionKey,
    ion: ION_CHOICES[ionKey] as Ion,
    series,
    count: optInteger(args, "count", 8, 1, 500),
    medium: (optString(args, "medium") ?? "vacuum") as "vacuum" | "air",
    velocityMs,
    model: (optString(args, "model") ?? "dirac-centroid") as LevelModel,
    unit: { text: unitText, unit: unitOfKind(unitText, kinds.length, "--unit") },
    limit: optFlag(args, "limit"),
  };
}

/** Compute the lines of a setup with the typed spectra API (SI). */
export function computeLines(s: LinesSetup): LineRow[] {
  const n1 = seriesLowerLevel(s.series);
  const opts = { model: s.model };
  const v = s.velocityMs === null ? null : (s.velocityMs as Velocity<"SI">);
  const rows: LineRow[] = [];
  const make = (label: string, nUpper: number | null, vac: VacuumWavelength<"SI">, energyJ: number, sigma: number): LineRow => {
    const obsVac = v === null ? vac : observedWavelengthFromRadialVelocity(SI, vac, v);
    let rest = NaN;
    let observed = NaN;
    let reason: string | null = null;
    try {
      if (s.medium === "vacuum") {
        rest = vac;
        observed = obsVac;
      } else {
        const air = airFromVacuum(SI, vac);
        rest = air;
        observed = v === null ? air : observedWavelengthFromRadialVelocity(SI, air, v);
      }
    } catch (e) {
      if (!(e instanceof RangeError)) throw e;
      reason = `no standard-air wavelength: the vacuum wavelength ${Number(siIn(vac, s.unit.unit).toPrecision(9))} ${s.unit.text} is outside the air formula's range (200 nm – 20 µm in air)`;
    }
    return { label, nLower: n1, nUpper, vacuumM: vac, restM: rest, observedM: observed, observedVacuumM: obsVac, energyJ, wavenumberPerM: sigma, reason };
  };
  for (let k = 1; k <= s.count; k++) {
    const n2 = n1 + k;
    const vac = transitionVacuumWavelength(SI, s.ion, n1, n2, opts);
    rows.push(make(lineLabel(s.ionKey, s.series, n1, n2), n2, vac, transitionEnergy(SI, s.ion, n1, n2, opts), transitionWavenumber(SI, s.ion, n1, n2, opts)));
  }
  if (s.limit) {
    const vac = seriesLimitVacuumWavelength(SI, s.ion, s.series, opts);
    const hc = 6.62607015e-34 * 299792458;
    rows.push(make(`${s.series} limit`, null, vac, hc / vac, 1 / vac));
  }
  return rows;
}

/** A synthetic spectrum (Planck continuum with Voigt-free Gaussian absorption lines) with the lines marked. */
export function linesSvg(s: LinesSetup, rows: readonly LineRow[], temperatureK: number): string {
  const centres = rows.map((r) => r.observedVacuumM);
  const lo = Math.min(...centres) * 0.97;
  const hi = Math.max(...centres) * 1.03;
  const sigmaOf = (l: number): number => l * 4e-4;
  const step = sigmaOf(lo) / 4;
  const n = Math.min(20000, Math.max(200, Math.ceil((hi - lo) / step)));
  const grid = new Float64Array(n);
  for (let i = 0; i < n; i++) grid[i] = lo + ((hi - lo) * i) / (n - 1);
  const lines = rows
    .filter((r) => r.nUpper !== null)
    .map((r, k) => ({ centre: r.observedVacuumM as VacuumWavelength<"SI">, gaussianSigma: SI.of(sigmaOf(r.observedVacuumM), units.m), tau0: 2.5 / Math.sqrt(k + 1) }));
  const { flux } = synthesizePlanckSpectrum(SI, SI.arrayOf(grid, units.m), SI.of(temperatureK, units.K), lines);
  const yUnit = units.W_per_m2_sr_nm;
  const markers: MarkerLine[] = rows.map((r, i) => ({ x: r.observedVacuumM * 1e9, ...(i < 10 || r.nUpper === null ? { label: r.label } : {}) }));
  return spectrumFigure(
    `${s.ion.name} ${s.series} lines on a ${formatK(temperatureK)} blackbody`,
    Array.from(grid, (l) => l * 1e9),
    Array.from(flux, (f) => SI.valueIn(f as never, yUnit as never)),
    "B_λ [W m⁻² sr⁻¹ nm⁻¹]",
    markers,
  );
}

export const linesCommand: Command = {
  name: "lines",
  summary: "list the lines of a hydrogen-like series (H, D, He II), vacuum or air, Doppler-shifted",
  usage: "[options]",
  description: `
Lists the first --count lines of a series of hydrogen (H), deuterium (D) or
ionized helium (HeII): label, levels, rest wavelength in vacuum or standard air
(Edlén 1966 formula, defined for 200 nm – 20 µm in air; lines outside are kept
with status 'rejected' and the reason, exit code 1), the wavelength observed
from a source with radial velocity --velocity (relativistic Doppler, positive
when receding), photon energy and vacuum wavenumber. Levels by the Dirac
shell-centroid model (default, within ~1e-5 of measured lines) or Bohr.
With --svg FILE or --report DIR a synthetic spectrum (blackbody continuum at
--temperature with the lines as absorption) is drawn with the lines marked.`,
  options: [
    { name: "series", short: "s", kind: "value", valueName: "NAME", choices: SERIES, help: "series", defaultText: "balmer" },
    { name: "ion", kind: "value", valueName: "ION", choices: Object.keys(ION_CHOICES), help: "ion", defaultText: "H" },
    { name: "count", short: "n", kind: "value", valueName: "N", help: "number of lines (1–500)", defaultText: "8" },
    { name: "limit", kind: "flag", help: "add the series limit as a last row" },
    { name: "medium", kind: "value", valueName: "M", choices: ["vacuum", "air"], help: "wavelengths in vacuum or standard air", defaultText: "vacuum" },
    { name: "velocity", kind: "value", valueName: "V", help: "radial velocity, e.g. '-25 km/s' (bare numbers in km/s)" },
    { name: "model", kind: "value", valueName: "M", choices: ["dirac-centroid", "bohr"], help: "level model", defaultText: "dirac-centroid" },
    { name: "unit", short: "u", kind: "value", valueName: "[wavelength=]UNIT", help: "unit of the wavelength and observed columns", defaultText: "nm" },
    { name: "format", short: "f", kind: "value", valueName: "FMT", choices: OUTPUT_FORMATS, help: "table format", defaultText: "table on a terminal, else csv" },
    { name: "output", short: "o", kind: "value", valueName: "FILE", help: "write the table to FILE" },
    { name: "digits", short: "d", kind: "value", valueName: "N", help: "significant digits in the aligned table", defaultText: "9" },
    { name: "quiet", short: "q", kind: "flag", help: "no rejected-line, wrote-file or report messages on stderr" },
    { name: "svg", kind: "value", valueName: "FILE", help: "write a synthetic spectrum with the lines marked as SVG" },
    { name: "report", kind: "value", valueName: "DIR", help: "write an HTML report (table and spectrum) to DIR/index.html" },
    { name: "temperature", short: "T", kind: "value", valueName: "T", help: "continuum temperature of the figure", defaultText: "9500 K" },
  ],
  exitCodes: [
    { code: 0, meaning: "every line listed" },
    {
      code: 1,
      meaning: "with --medium air, lines outside the range of the air formula (200 nm – 20 µm),\nkept with status 'rejected'",
    },
    { code: 2, meaning: "usage: unknown option or bad value" },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [
    { args: ["--format", "table"], note: "the first 8 Balmer lines of hydrogen in vacuum" },
    { args: ["--series", "balmer", "--medium", "air", "--velocity", "-25 km/s", "--count", "4", "--unit", "A", "--format", "csv"], note: "Hα–Hδ in air, in ångström, seen from a source approaching at 25 km/s" },
    { args: ["--ion", "HeII", "--series", "pfund", "--count", "3", "--limit", "--format", "json"], note: "He II lines with the series limit, as JSON" },
  ],
  async run(args, io) {
    if (args.positionals.length > 0) throw new UsageError(`lines takes no file arguments; got ${args.positionals.join(" ")}`);
    const s = setup(args);
    const temperatureK = optionQuantitySI(optString(args, "temperature") ?? "9500", kinds.temperature, units.K, "--temperature");
    if (!(temperatureK > 0)) throw new UsageError("--temperature must be > 0 K");
    const rows = computeLines(s);
    const u = s.unit.unit;
    const columns: OutColumn[] = [
      { name: "label", unit: null },
      { name: "ion", unit: null },
      { name: "series", unit: null },
      { name: "n_lower", unit: null },
      { name: "n_upper", unit: null },
      { name: "medium", unit: null },
      { name: "wavelength", unit: s.unit.text },
    ];
    if (s.velocityMs !== null) columns.push({ name: "observed", unit: s.unit.text });
    columns.push({ name: "energy", unit: "eV" }, { name: "wavenumber", unit: "cm^-1" }, { name: "status", unit: null }, { name: "reason", unit: null });
    const cells: CellValue[][] = rows.map((r) => {
      const row: CellValue[] = [r.label, s.ion.name, s.series, r.nLower, r.nUpper === null ? "inf" : r.nUpper, s.medium, r.reason === null ? siIn(r.restM, u) : null];
      if (s.velocityMs !== null) row.push(r.reason === null ? siIn(r.observedM, u) : null);
      row.push(siIn(r.energyJ, units.eV), siIn(r.wavenumberPerM, units.per_cm), r.reason === null ? "ok" : "rejected", r.reason ?? "");
      return row;
    });
    const outPath = optString(args, "output");
    const output = await openOutput(outPath, io);
    const writer = openTableWriter(output.sink, columns, { format: defaultFormat(optString(args, "format"), outPath, io), digits: optInteger(args, "digits", 9, 1, 17) });
    try {
      for (const row of cells) {
        const p = writer.writeRow(row);
        if (p !== undefined) await p;
      }
      await writer.end();
    } finally {
      await output.close();
    }
    const rejected = rows.filter((r) => r.reason !== null);
    const quiet = optFlag(args, "quiet");
    if (!quiet) for (const r of rejected) say(io.stderr, `lines: ${r.label}: rejected: ${r.reason ?? ""}`);
    const svgPath = optString(args, "svg");
    const reportDir = optString(args, "report");
    if (svgPath !== undefined || reportDir !== undefined) {
      const svg = linesSvg(s, rows, temperatureK);
      if (svgPath !== undefined) {
        const full = resolve(io.cwd ?? process.cwd(), svgPath);
        try {
          await writeFile(full, svg, "utf8");
        } catch (e) {
          throw new UsageError(`cannot write '${svgPath}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
        }
        if (!quiet) say(io.stderr, `wrote ${full}`);
      }
      if (reportDir !== undefined) {
        const header = columns.map((c) => (c.unit !== null && c.unit !== undefined ? `${c.name} [${c.unit}]` : c.name));
        const path = await writeReport(
          reportDir,
          {
            title: `starlume lines: ${s.ion.name} ${s.series}`,
            description: `The first ${s.count} lines of the ${s.series} series of ${s.ion.name} (${s.model} levels), wavelengths in ${s.medium}${s.velocityMs !== null ? `, observed from a source with radial velocity ${siIn(s.velocityMs, units.km_per_s)} km/s` : ""}.`,
            table: reportTable(columns, header, cells),
            figures: [
              {
                svg,
                caption: `Synthetic spectrum: a ${formatK(temperatureK)} blackbody with Gaussian absorption lines at the ${s.velocityMs !== null ? "observed" : "rest"} vacuum wavelengths of the listed lines (marked; the figure is in vacuum wavelengths whatever --medium says). Line depths and widths are illustrative, not a model atmosphere.`,
              },
            ],
          },
          io,
        );
        if (!quiet) say(io.stderr, `report written to ${path}`);
      }
    }
    return rejected.length > 0 ? EXIT.ROWS_REJECTED : EXIT.OK;
  },
};
