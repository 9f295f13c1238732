/**
 * `starlume fit`: blackbody SED fits for every star of a photometry table,
 * with the typed SED fitter (src/fit, through ../fit-adapter.ts); with a
 * parallax or distance column, radius and luminosity too.
 *
 * @module
 */
import { kinds } from "../../quantity/aliases";
import type { Unit } from "../../quantity/unit";
import { SI } from "../../quantity/system";
import type { ReportFigure } from "../../plot/index";
import type { CellValue } from "../io/write";
import type { ColumnSpec } from "../io/header";
import { optInteger, optString, type ParsedArgs } from "../args";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { UsageError, say, type CliIO } from "../context";
import { loadBands, type BandSet, type CliBand } from "../bands";
import { createStarFitter, raisedFlags, type StarDistance, type StarFitResult, type StarMeasurement } from "../fit-adapter";
import { chi2Text, roundedK, hrFigure, luminosityLabel, planckFamilyFigure, sedFigure, spreadByTemperature, temperatureText, type HrPoint, type SedData } from "../figures";
import { formatValueUncertainty } from "../io/write";
import { writeReport } from "../report-write";
import { findColumn, runTableCommand, sigmaColumn, TABLE_OPTIONS, type TableBinding } from "../run-table";
import { idColumn, numberCell, textCell, type InCell } from "../table-in";
import { withSigma, type OutColumn } from "../table-out";
import { isAbMagnitudeUnit, isMagnitudeUnit, readUnit, sameDimension, kindName, unitOfKind } from "../units";
import { outputUnits, reportTable } from "./solve";

/** How one band's column is read. */
interface BoundBand {
  readonly band: CliBand;
  readonly kind: StarMeasurement["kind"];
  readonly index: number;
  readonly spec: ColumnSpec;
  /** Unit of the value and of its σ (null for AB magnitudes). */
  readonly unit: Unit | null;
  readonly sigmaIndex: number;
  readonly sigmaUnit: Unit | null;
}

/** How the distance is read. */
interface BoundDistance {
  readonly kind: "distance" | "parallax";
  readonly index: number;
  readonly spec: ColumnSpec;
  readonly unit: Unit;
  readonly sigmaIndex: number;
  readonly sigmaUnit: Unit | null;
}

/** The outcome of fitting one row. */
export type FitOutcome =
  | { readonly ok: true; readonly id: string; readonly measurements: StarMeasurement[]; readonly result: StarFitResult; readonly flags: string[] }
  | { readonly ok: false; readonly id: string; readonly reason: string };

/** Everything the per-row fit needs, bound to one table's columns. */
export interface FitSetup {
  readonly bandSet: BandSet;
  readonly bands: readonly BoundBand[];
  readonly distance: BoundDistance | null;
  readonly id: number;
  readonly assumeSigma: number | undefined;
  readonly extinctionRV: number | undefined;
  /** Fit one row (never throws). */
  fitRow(cells: readonly InCell[]): FitOutcome;
}

const EXACT_RELATIVE_SIGMA = 1e-9;

/**
 * Bind a photometry table's columns to bands and a distance.
 *
 * @throws UsageError naming the column for a unit of the wrong kind, a band
 *   without an uncertainty column, or fewer than two bands found
 */
export function bindFit(columns: readonly ColumnSpec[], bandSet: BandSet, args: ParsedArgs, io: CliIO, source: string): FitSetup {
  const quiet = args.options.get("quiet") === true;
  const assumeText = optString(args, "assume-sigma");
  const assumeSigma = assumeText === undefined ? undefined : Number(assumeText);
  if (assumeSigma !== undefined && !(assumeSigma > 0 && assumeSigma < 1)) {
    throw new UsageError(`option --assume-sigma must be a relative uncertainty between 0 and 1 (e.g. 0.02); got '${assumeText ?? ""}'`);
  }
  const rvText = optString(args, "rv");
  const extinction = args.options.get("extinction") === true || rvText !== undefined;
  const rV = rvText === undefined ? 3.1 : Number(rvText);
  if (!(rV > 0 && rV < 20)) throw new UsageError(`option --rv must be a number between 0 and 20 (R_V, e.g. 3.1); got '${rvText ?? ""}'`);
  const where = (i: number): string => {
    const c = columns[i] as ColumnSpec;
    return `column ${i + 1} '${c.name}${c.unit !== null ? ` [${c.unit}]` : ""}'`;
  };
  const bands: BoundBand[] = [];
  for (const band of bandSet.bands) {
    const index = columns.findIndex((c) => c.uncertaintyOf === null && c.name === band.name);
    if (index === -1) continue;
    const spec = columns[index] as ColumnSpec;
    let kind: StarMeasurement["kind"];
    let unit: Unit | null = null;
    if (spec.unit === null) throw new UsageError(`${where(index)}: band '${band.name}' needs a unit: a flux density per wavelength or frequency (e.g. [erg s^-1 cm^-2 A^-1], [mJy]) or [AB mag]`);
    if (isAbMagnitudeUnit(spec.unit)) kind = "abmag";
    else if (isMagnitudeUnit(spec.unit)) throw new UsageError(`${where(index)}: [mag] is ambiguous for band photometry; write [AB mag] for AB magnitudes (other magnitude systems are not supported: convert them to fluxes first)`);
    else {
      unit = readUnit(spec.unit, where(index));
      if (sameDimension(unit.dimension, kinds.spectralFluxPerWavelength.dimension)) kind = "flambda";
      else if (sameDimension(unit.dimension, kinds.spectralFluxPerFrequency.dimension)) kind = "fnu";
      else {
        throw new UsageError(
          `${where(index)}: unit '${spec.unit}' is a ${kindName(unit.dimension)}; band '${band.name}' needs a spectral flux per wavelength (e.g. erg s^-1 cm^-2 A^-1), per frequency (e.g. mJy) or [AB mag]`,
        );
      }
    }
    const sigmaIndex = sigmaColumn(columns, spec.name, "fit");
    let sigmaUnit: Unit | null = null;
    if (sigmaIndex === -1) {
      if (assumeSigma === undefined) throw new UsageError(`${where(index)}: band '${band.name}' has no sigma(${band.name}) column; add one, or pass --assume-sigma REL`);
      if (!quiet) say(io.stderr, `note: band '${band.name}' has no sigma(${band.name}); using the relative uncertainty ${assumeSigma} from --assume-sigma`);
    } else if (kind === "abmag") {
      const s = columns[sigmaIndex] as ColumnSpec;
      if (!isAbMagnitudeUnit(s.unit) && !isMagnitudeUnit(s.unit)) throw new UsageError(`${where(sigmaIndex)}: the uncertainty of an AB magnitude is in [mag] or [AB mag]`);
    } else {
      sigmaUnit = unitOfKind((columns[sigmaIndex] as ColumnSpec).unit ?? "", kind === "flambda" ? kinds.spectralFluxPerWavelength : kinds.spectralFluxPerFrequency, where(sigmaIndex));
    }
    bands.push({ band, kind, index, spec, unit, sigmaIndex, sigmaUnit });
  }
  if (bands.length < 2) {
    throw new UsageError(
      `${source}: found ${bands.length === 0 ? "no" : "only one"} band column (${bands.map((b) => b.band.name).join(", ")}); a fit needs at least 2. ` +
        `Columns must be named as the bands of ${bandSet.source}: ${bandSet.bands.map((b) => b.name).join(", ")}`,
    );
  }
  let distance: BoundDistance | null = null;
  for (const [kind, names, k] of [
    ["parallax", ["parallax", "plx"], kinds.angle],
    ["distance", ["distance", "dist"], kinds.length],
  ] as const) {
    const index = findColumn(columns, names);
    if (index === -1 || distance !== null) continue;
    const spec = columns[index] as ColumnSpec;
    if (spec.unit === null) throw new UsageError(`${where(index)}: needs a unit, e.g. '${kind === "parallax" ? "parallax [mas]" : "distance [pc]"}'`);
    const unit = unitOfKind(spec.unit, k, where(index));
    const sigmaIndex = sigmaColumn(columns, spec.name, "fit");
    const sigmaUnit = sigmaIndex === -1 ? null : unitOfKind((columns[sigmaIndex] as ColumnSpec).unit ?? "", k, where(sigmaIndex));
    if (sigmaIndex === -1 && !quiet) {
      say(io.stderr, `note: column '${spec.name}' has no sigma(${spec.name}); ${assumeSigma !== undefined ? `using the relative uncertainty ${assumeSigma}` : `treated as exact (relative σ ${EXACT_RELATIVE_SIGMA})`}`);
    }
    distance = { kind, index, spec, unit, sigmaIndex, sigmaUnit };
  }
  const id = idColumn(columns, optString(args, "id"));
  const extinctionRV = extinction ? rV : undefined;
  const sigmaSpec = (name: string): ColumnSpec => ({ name: `sigma(${name})`, unit: null, uncertaintyOf: null, uncertaintySide: null });

  const fitStar = createStarFitter(extinctionRV !== undefined ? { extinctionRV } : {}); // one fitter per set of bands present, reused across rows
  const fitRow = (cells: readonly InCell[]): FitOutcome => {
    const idText = id !== -1 ? textCell(cells[id]) : "";
    try {
      const measurements: StarMeasurement[] = [];
      for (const b of bands) {
        const v = numberCell(cells[b.index], b.spec);
        if (v === null) continue;
        let s = b.sigmaIndex === -1 ? null : numberCell(cells[b.sigmaIndex], sigmaSpec(b.spec.name));
        if (s === null) {
          if (assumeSigma === undefined) throw new RangeError(`band '${b.band.name}' has a value but sigma(${b.spec.name}) is empty`);
          s = b.kind === "abmag" ? (2.5 / Math.LN10) * assumeSigma : Math.abs(v) * assumeSigma;
        } else if (b.kind !== "abmag") {
          s = SI.of(s, b.sigmaUnit as Unit);
        }
        if (!(s > 0)) throw new RangeError(`sigma(${b.spec.name}) must be > 0; got ${String(s)}`);
        measurements.push({ band: b.band, kind: b.kind, value: b.unit === null ? v : SI.of(v, b.unit), sigma: s });
      }
      if (measurements.length < 2) throw new RangeError(`${measurements.length === 0 ? "no band has" : "only one band has"} a value; a fit needs at least 2`);
      let dist: StarDistance | null = null;
      if (distance !== null) {
        const v = numberCell(cells[distance.index], distance.spec);
        if (v !== null) {
          if (!(v > 0)) throw new RangeError(`'${distance.spec.name}' must be > 0 ${distance.spec.unit ?? ""}; got ${String(v)}${distance.kind === "parallax" ? " (a zero or negative parallax gives no distance)" : ""}`);
          const sCell = distance.sigmaIndex === -1 ? null : numberCell(cells[distance.sigmaIndex], sigmaSpec(distance.spec.name));
          if (distance.sigmaIndex !== -1 && sCell === null && assumeSigma === undefined) throw new RangeError(`'${distance.spec.name}' is given but sigma(${distance.spec.name}) is empty`);
          const value = SI.of(v, distance.unit);
          const sigma = sCell !== null ? SI.of(sCell, distance.sigmaUnit as Unit) : value * (assumeSigma ?? EXACT_RELATIVE_SIGMA);
          if (!(sigma > 0)) throw new RangeError(`sigma(${distance.spec.name}) must be > 0; got ${String(sCell)}`);
          dist = { kind: distance.kind, value, sigma };
        }
      }
      const result = fitStar(measurements, dist);
      return { ok: true, id: idText, measurements, result, flags: raisedFlags(result.fit) };
    } catch (e) {
      return { ok: false, id: idText, reason: e instanceof Error ? e.message : String(e) };
    }
  };
  return { bandSet, bands, distance, id, assumeSigma, extinctionRV, fitRow };
}

/** The SED figure data of a successful fit. */
export function sedData(name: string, o: Extract<FitOutcome, { ok: true }>): SedData {
  const f = o.result.fit;
  return {
    name,
    measurements: o.measurements,
    temperatureK: f.temperature,
    sigmaTemperatureK: f.sigmaTemperature,
    angularDiameterRad: f.angularDiameter,
    sigmaAngularDiameterRad: f.sigmaAngularDiameter,
    extinctionAV: f.extinctionAV,
    rV: f.si.rV,
    modelFLambdaSI: Array.from(f.modelFluxPerWavelength),
    pulls: [...f.pulls],
    chi2: f.chi2,
    dof: f.dof,
  };
}

const REPORT_ROWS = 100;

async function bind(columns: readonly ColumnSpec[], args: ParsedArgs, io: CliIO, source: string): Promise<TableBinding> {
  const bandSet = await loadBands(optString(args, "bands") ?? "demo", io);
  const setup = bindFit(columns, bandSet, args, io, source);
  const units = outputUnits(args, "SI");
  const reportStars = optInteger(args, "report-stars", 12, 0, 1000);
  const out: OutColumn[] = [{ name: "line", unit: null }];
  if (setup.id !== -1) out.push({ name: (columns[setup.id] as ColumnSpec).name, unit: null });
  out.push({ name: "status", unit: null }, { name: "n_bands", unit: null });
  out.push(...withSigma("teff", units.teff.text), ...withSigma("theta", units.theta.text));
  if (setup.extinctionRV !== undefined) out.push(...withSigma("av", "mag"));
  out.push({ name: "chi2", unit: null }, { name: "dof", unit: null }, { name: "p_value", unit: null }, { name: "flags", unit: null });
  if (setup.distance !== null) {
    out.push(...withSigma("distance", units.distance.text), ...withSigma("radius", units.radius.text), ...withSigma("luminosity", units.luminosity.text), ...withSigma("fbol", units.fbol.text));
  }
  out.push({ name: "reason", unit: null });
  const n = out.length;
  const kept: CellValue[][] = [];
  const seds: SedData[] = [];
  const hr: HrPoint[] = [];
  const keep = (row: CellValue[]): void => {
    if (kept.length < REPORT_ROWS) kept.push(row);
  };
  const rejectedRow = (line: number, idText: string, reason: string): CellValue[] => {
    const row = new Array<CellValue>(n).fill(null);
    row[0] = line;
    let k = 1;
    if (setup.id !== -1) row[k++] = idText;
    row[k] = "rejected";
    row[n - 1] = reason;
    return row;
  };
  const u = (x: number, unit: Unit): number => SI.valueIn(x as never, unit as never);
  const binding: TableBinding = {
    columns: out,
    row(cells, line) {
      const o = setup.fitRow(cells);
      if (!o.ok) {
        const row = rejectedRow(line, o.id, o.reason);
        keep(row);
        return { cells: row, rejected: o.reason };
      }
      const f = o.result.fit;
      const row: CellValue[] = [line];
      if (setup.id !== -1) row.push(o.id);
      row.push(o.flags.length === 0 ? "ok" : "flagged", o.measurements.length);
      row.push(u(f.temperature, units.teff.unit), u(f.sigmaTemperature, units.teff.unit), u(f.angularDiameter, units.theta.unit), u(f.sigmaAngularDiameter, units.theta.unit));
      if (setup.extinctionRV !== undefined) row.push(f.extinctionAV, f.sigmaExtinctionAV);
      row.push(f.chi2, f.dof, f.pValue, o.flags.join("+"));
      const st = o.result.stellar;
      if (setup.distance !== null) {
        if (st !== null) {
          row.push(u(st.distance, units.distance.unit), u(st.sigmaDistance, units.distance.unit), u(st.radius, units.radius.unit), u(st.sigmaRadius, units.radius.unit));
          row.push(u(st.luminosity, units.luminosity.unit), u(st.sigmaLuminosity, units.luminosity.unit), u(st.bolometricFlux, units.fbol.unit), u(st.sigmaBolometricFlux, units.fbol.unit));
          if (hr.length < 2000) hr.push({ name: o.id, temperatureK: f.temperature, sigmaT: f.sigmaTemperature, luminosity: u(st.luminosity, units.luminosity.unit), sigmaL: u(st.sigmaLuminosity, units.luminosity.unit) });
        } else {
          row.push(null, null, null, null, null, null, null, null);
        }
      }
      row.push("");
      keep(row);
      if (seds.length < reportStars) seds.push(sedData(o.id !== "" ? o.id : `line ${line}`, o));
      return { cells: row };
    },
    badRow(line, message) {
      const row = rejectedRow(line, "", message.replace(/^line \d+: /, ""));
      keep(row);
      return row;
    },
  };
  const reportDir = optString(args, "report");
  if (reportDir !== undefined) {
    binding.finish = async (summary) => {
      const header = out.map((c) => (c.unit !== null && c.unit !== undefined ? `${c.name} [${c.unit}]` : c.name));
      const figures = fitFigures(seds, hr, bandSet, units.luminosity.text);
      const path = await writeReport(
        reportDir,
        {
          title: `starlume fit: ${source}`,
          description: `Blackbody fits to ${source} with the bands of ${bandSet.source}${bandSet.description !== "" ? ` (${bandSet.description})` : ""}: ${summary.rows} rows, ${summary.rows - summary.rejected} fitted, ${summary.rejected} rejected. Model: f_λ = π (θ/2)² B_λ(T)${setup.extinctionRV !== undefined ? ` · 10^(−0.4 A_V k(λ)) (CCM89, R_V = ${setup.extinctionRV})` : ""}, integrated through each band's response; Levenberg–Marquardt fit with first-order uncertainties.${kept.length < summary.rows ? ` The table shows the first ${kept.length} rows.` : ""}`,
          table: reportTable(out, header, kept),
          figures,
        },
        io,
      );
      if (args.options.get("quiet") !== true) say(io.stderr, `report written to ${path}`);
    };
  }
  return binding;
}

/** The caption of one SED figure. */
export function sedCaption(d: SedData, barsHidden: boolean, bandSource: string): string {
  const mas = Math.PI / 648e6;
  const theta = formatValueUncertainty(d.angularDiameterRad / mas, d.sigmaAngularDiameterRad / mas);
  return (
    `${d.name}. Top: measured band-mean fluxes f_{λ} [W m⁻² µm⁻¹] at each band's pivot wavelength (circles, 1σ error bars${barsHidden ? " — smaller than the symbols here" : ""}), ` +
    `the fitted model's band means (hollow squares) and the fitted blackbody π (θ/2)² B_{λ}(T) (line), T = ${temperatureText(d.temperatureK, d.sigmaTemperatureK)}, θ = ${theta} mas` +
    `${d.extinctionAV > 0 ? `, A_{V} = ${d.extinctionAV.toFixed(3)} mag` : ""}. ` +
    `Middle: (measured − model)/σ per band, the terms of χ² (${chi2Text(d.chi2, d.dof)}). ` +
    `Bottom: the bands' response curves (${bandSource}), each scaled to a peak of 1.`
  );
}

/** The figures of a fit report: one SED per star, Planck curves of up to six of them, and T–L when known. */
export function fitFigures(seds: readonly SedData[], hr: readonly HrPoint[], bandSet: BandSet, luminosityUnit: string): ReportFigure[] {
  const figures: ReportFigure[] = seds.map((d) => {
    const f = sedFigure(d, bandSet.bands);
    return { svg: f.svg, caption: sedCaption(d, f.barsHidden, bandSet.source) };
  });
  if (seds.length > 0) {
    const shown = spreadByTemperature(seds.map((d) => ({ name: d.name, temperatureK: d.temperatureK, sigmaTemperatureK: d.sigmaTemperatureK })));
    const pivots = bandSet.bands.map((b) => ({ name: b.name, pivotM: b.band.si.pivotWavelengthM }));
    const which =
      shown.length < seds.length
        ? `${shown.length} of the ${seds.length} stars, spread evenly in fitted temperature from the coolest to the hottest`
        : `every star of the report`;
    figures.push({
      svg: planckFamilyFigure(shown, pivots),
      caption:
        `Planck curves B_{λ} [W m⁻² sr⁻¹ µm⁻¹] at the fitted temperatures of ${which}: ${shown.map((s) => `${s.name} (${roundedK(s.temperatureK, s.sigmaTemperatureK)})`).join(", ")}. ` +
        `Dashed grey lines: the bands' pivot wavelengths. The peak moves as λ_{max} ≈ 2898 µm K / T (Wien), so the bands sample the peak of the cool stars but only the Rayleigh–Jeans side of the hot ones, whose temperatures are therefore less certain.`,
    });
  }
  if (hr.length > 0) {
    figures.push({
      svg: hrFigure(hr, luminosityUnit),
      caption: `Fitted effective temperature (decreasing to the right) against luminosity [${luminosityLabel(luminosityUnit)}] from the fit and the parallax, with 1σ error bars in both.`,
    });
  }
  return figures;
}

export const fitCommand: Command = {
  name: "fit",
  summary: "fit blackbody SEDs (T, θ; with a parallax also R, L) to every star of a photometry table",
  usage: "[options] FILE",
  description: `
Reads a photometry table, one row per star. Each band of the band file has a
column of the same name holding a band-mean flux density per wavelength (e.g.
[erg s^-1 cm^-2 A^-1], [W m^-2 nm^-1]), per frequency (e.g. [mJy], [Jy]) or an AB
magnitude ([AB mag]), and its uncertainty column sigma(NAME). An empty cell
leaves that band out for that star (at least 2 bands are needed). An optional
'parallax [mas]' (or 'distance [pc]') column with its sigma gives radius,
luminosity and bolometric flux, with the fit's T–θ correlation included.

Bands come from --bands FILE (format starlume-bands/1: tabulated response
curves, or Gaussian / top-hat shapes; see docs/guides/command-line.md) or the
built-in demo bands ('--bands demo', the default). Status is 'ok', 'flagged'
(the fit ran but raised flags: notConverged, atLimit, tooFewBands, poorFit
— listed in the flags column) or 'rejected' (with the reason).`,
  options: [
    ...TABLE_OPTIONS,
    { name: "bands", short: "b", kind: "value", valueName: "FILE", help: "band-definition file, or 'demo' for the demo survey's bands", defaultText: "demo" },
    { name: "extinction", kind: "flag", help: "also fit interstellar extinction A_V (CCM89 law)" },
    { name: "rv", kind: "value", valueName: "RV", help: "R_V of the CCM89 law (implies --extinction)", defaultText: "3.1" },
    { name: "unit", short: "u", kind: "list", valueName: "KEY=UNIT", help: "output unit: teff, theta, distance, radius, luminosity, fbol (repeatable)" },
    { name: "assume-sigma", kind: "value", valueName: "REL", help: "relative uncertainty for values without one" },
    { name: "report-stars", kind: "value", valueName: "N", help: "number of stars drawn in the report", defaultText: "12" },
  ],
  exitCodes: [
    { code: 0, meaning: "every row fitted ('flagged' rows count as fitted)" },
    {
      code: 1,
      meaning: "some rows rejected: fewer than 2 bands with values, sigma <= 0, or a bad\ndistance/parallax (kept in the output with status 'rejected', listed on stderr)",
    },
    {
      code: 2,
      meaning:
        "usage: unknown option or bad value, unreadable input or band file, fewer than\ntwo band columns, or [mag] where [AB mag] is needed",
    },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [
    { args: ["examples/demo-survey/photometry.csv", "--format", "table"], note: "fit the demo survey with the built-in demo bands" },
    { args: ["examples/demo-survey/photometry.csv", "--bands", "examples/demo-survey/bands.json", "--unit", "radius=km", "--format", "csv", "--quiet"], note: "the same with the band file given explicitly, radii in km, as CSV" },
    { args: ["examples/demo-survey/photometry.csv", "--extinction", "--format", "jsonl", "--quiet"], note: "also fit extinction A_V (CCM89, R_V = 3.1), JSON Lines output" },
  ],
  async run(args, io) {
    return runTableCommand("fit", args, io, (columns, source) => bind(columns, args, io, source));
  },
};
