/**
 * `starlume demo`: fit the embedded demo survey (examples/demo-survey: the
 * invented Tallmere Plateau Observatory's six-band photometry of twelve
 * invented stars), derive each star's distance, radius and luminosity from
 * its parallax, compare with the chosen truth, print the table and write an
 * HTML report. `npm start` runs this command.
 *
 * @module
 */
import { join } from "node:path";
import { kinds } from "../../quantity/aliases";
import { SI } from "../../quantity/system";
import { units } from "../../quantity/units";
import type { ReportFigure } from "../../plot/index";
import { optFlag, optInteger, optString, type ParsedArgs } from "../args";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { EXIT, UsageError, say, type CliIO } from "../context";
import type { ColumnSpec } from "../io/header";
import type { CellValue } from "../io/write";
import { loadBands } from "../bands";
import { fitFigures, bindFit, sedData } from "./fit";
import { reportTable } from "./solve";
import { demoSurveyDir } from "../paths";
import { writeReport } from "../report-write";
import { numberCell, openTable, textCell } from "../table-in";
import { openTableWriter, OUTPUT_FORMATS, withSigma, type OutColumn } from "../table-out";
import { unitOfKind } from "../units";
import { hrFigure, type HrPoint, type SedData } from "../figures";

/** The chosen truth of one demo star (SI). */
interface Truth {
  readonly temperatureK: number;
  readonly radiusM: number;
  readonly distanceM: number;
}

/** Read truth.csv through the table reader, converting each column from its header unit. */
async function readTruth(dir: string, io: CliIO): Promise<Map<string, Truth>> {
  const table = await openTable(join(dir, "truth.csv"), "csv", io);
  const col = (name: string): { index: number; spec: ColumnSpec } => {
    const index = table.columns.findIndex((c) => c.name === name);
    if (index === -1) throw new UsageError(`demo truth.csv has no column '${name}'`);
    return { index, spec: table.columns[index] as ColumnSpec };
  };
  const t = col("teff");
  const r = col("radius");
  const d = col("distance");
  const tU = unitOfKind(t.spec.unit ?? "", kinds.temperature, "truth.csv teff");
  const rU = unitOfKind(r.spec.unit ?? "", kinds.length, "truth.csv radius");
  const dU = unitOfKind(d.spec.unit ?? "", kinds.length, "truth.csv distance");
  const out = new Map<string, Truth>();
  for (;;) {
    const it = await table.items.next();
    if (it.done === true) break;
    if (it.value.kind !== "row") continue;
    const cells = it.value.cells;
    const num = (c: { index: number; spec: ColumnSpec }): number => numberCell(cells[c.index], c.spec) ?? NaN;
    out.set(textCell(cells[0]), { temperatureK: SI.of(num(t), tU), radiusM: SI.of(num(r), rU), distanceM: SI.of(num(d), dU) });
  }
  return out;
}

const pull = (value: number, truth: number, sigma: number): number => Math.round(((value - truth) / sigma) * 100) / 100;
/** A z value for the report: explicit sign, two decimals, a true minus sign (U+2212). */
const signed = (z: number): string => (z >= 0 ? `+${z.toFixed(2)}` : `−${(-z).toFixed(2)}`);

/** Report-table headers of the demo's columns (with sub/superscript markup). */
const DISPLAY: Readonly<Record<string, string>> = {
  name: "star",
  teff: "T_{eff} [K]",
  theta: "θ [mas]",
  distance: "d [pc]",
  radius: "R [R_{☉}]",
  luminosity: "L [L_{☉}]",
  reduced_chi2: "χ²/dof",
  true_teff: "true T_{eff} [K]",
  "z(teff)": "z(T_{eff})",
  true_radius: "true R [R_{☉}]",
  "z(radius)": "z(R)",
  status: "status",
};

export const demoCommand: Command = {
  name: "demo",
  summary: "fit the built-in demo survey, solve each star and write an HTML report",
  usage: "[options]",
  description: `
Runs the whole chain on the embedded demo survey (examples/demo-survey): the
invented Tallmere Plateau Observatory's six-band photometry (tp340 … tp2150,
fluxes with 1.5–3 % noise, in f_λ, f_ν and AB magnitudes) of twelve invented
stars from ~3000 K dwarfs to a ~27000 K giant, with parallaxes. Each star is
fitted with a blackbody (T, θ), then solved for distance, radius and
luminosity from its parallax, and compared with the chosen truth (truth.csv):
z(T) and z(R) are (fit − truth)/σ and should mostly lie within ±2;
reduced_chi2 is the fit's reduced χ² (χ²/dof).
The table is printed and an HTML report (SED of every star with its band
responses and residuals, Planck curves, temperature–luminosity diagram) is written to
--report DIR (default ./starlume-report/index.html). 'npm start' runs this.`,
  options: [
    { name: "report", kind: "value", valueName: "DIR", help: "directory of the HTML report", defaultText: "starlume-report" },
    { name: "no-report", kind: "flag", help: "do not write the report" },
    { name: "format", short: "f", kind: "value", valueName: "FMT", choices: OUTPUT_FORMATS, help: "table format", defaultText: "table" },
    { name: "digits", short: "d", kind: "value", valueName: "N", help: "significant digits of plain numbers in the table", defaultText: "3" },
    { name: "quiet", short: "q", kind: "flag", help: "no per-row messages on stderr" },
  ],
  exitCodes: [
    { code: 0, meaning: "every demo star fitted and solved" },
    { code: 1, meaning: "a demo star rejected (not expected with the shipped data; please report it)" },
    {
      code: 2,
      meaning: "arguments given, the demo survey not installed, or an unwritable report\ndirectory",
    },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [{ args: ["--no-report"], note: "fit and solve the demo stars, print the table only" }],
  async run(args: ParsedArgs, io: CliIO): Promise<number> {
    if (args.positionals.length > 0) throw new UsageError(`demo takes no arguments; got ${args.positionals.join(" ")}`);
    const dir = demoSurveyDir();
    if (dir === null) throw new UsageError("the demo survey (examples/demo-survey) is not installed with this copy of starlume");
    const format = optString(args, "format") ?? "table";
    const digits = optInteger(args, "digits", 3, 1, 17);
    const quiet = optFlag(args, "quiet");
    const bandSet = await loadBands("demo", io);
    const truth = await readTruth(dir, io);
    const table = await openTable(join(dir, "photometry.csv"), "csv", io);
    const setup = bindFit(table.columns, bandSet, args, io, "demo photometry");

    const columns: OutColumn[] = [
      { name: "name", unit: null },
      ...withSigma("teff", "K"),
      ...withSigma("theta", "mas"),
      ...withSigma("distance", "pc"),
      ...withSigma("radius", "Rsun"),
      ...withSigma("luminosity", "Lsun"),
      { name: "reduced_chi2", unit: null },
      { name: "true_teff", unit: "K" },
      { name: "z(teff)", unit: null },
      { name: "true_radius", unit: "Rsun" },
      { name: "z(radius)", unit: null },
      { name: "status", unit: null },
    ];
    const text = format === "table";
    const zIndex = new Set(["z(teff)", "z(radius)"].map((n) => columns.findIndex((c) => c.name === n)));
    const chiIndex = columns.findIndex((c) => c.name === "reduced_chi2");
    if (text) say(io.stdout, `Tallmere Plateau Observatory six-band survey (invented demo data): blackbody fits with parallaxes, ${bandSet.bands.length} bands\n`);
    const writer = openTableWriter(io.stdout, columns, { format: format as "table", digits });
    const rows: CellValue[][] = [];
    const seds: SedData[] = [];
    const hr: HrPoint[] = [];
    const truthHr: { temperatureK: number; luminosity: number }[] = [];
    let rejected = 0;
    const u = (x: number, unit: (typeof units)[keyof typeof units]): number => SI.valueIn(x as never, unit as never);
    for (;;) {
      const it = await table.items.next();
      if (it.done === true) break;
      const item = it.value;
      let row: CellValue[];
      if (item.kind === "bad") {
        rejected++;
        if (!quiet) say(io.stderr, `demo photometry: line ${item.line}: rejected: ${item.message}`);
        row = [`line ${item.line}`, ...new Array<CellValue>(columns.length - 2).fill(null), "rejected"];
      } else {
        const o = setup.fitRow(item.cells);
        const tr = truth.get(o.id);
        if (!o.ok || o.result.stellar === null) {
          rejected++;
          const why = o.ok ? "no parallax" : o.reason;
          if (!quiet) say(io.stderr, `demo photometry: line ${item.line}: rejected: ${why}`);
          row = [o.id, ...new Array<CellValue>(columns.length - 2).fill(null), "rejected"];
        } else {
          const f = o.result.fit;
          const st = o.result.stellar;
          row = [
            o.id,
            f.temperature,
            f.sigmaTemperature,
            u(f.angularDiameter, units.mas),
            u(f.sigmaAngularDiameter, units.mas),
            u(st.distance, units.pc),
            u(st.sigmaDistance, units.pc),
            u(st.radius, units.Rsun),
            u(st.sigmaRadius, units.Rsun),
            u(st.luminosity, units.Lsun),
            u(st.sigmaLuminosity, units.Lsun),
            f.dof > 0 ? Math.round((f.chi2 / f.dof) * 100) / 100 : null,
            tr !== undefined ? Number(tr.temperatureK.toPrecision(6)) : null,
            tr !== undefined ? pull(f.temperature, tr.temperatureK, f.sigmaTemperature) : null,
            tr !== undefined ? Number(u(tr.radiusM, units.Rsun).toPrecision(6)) : null,
            tr !== undefined ? pull(st.radius, tr.radiusM, st.sigmaRadius) : null,
            o.flags.length === 0 ? "ok" : `flagged: ${o.flags.join("+")}`,
          ];
          seds.push(sedData(o.id, o));
          hr.push({ name: o.id, temperatureK: f.temperature, sigmaT: f.sigmaTemperature, luminosity: u(st.luminosity, units.Lsun), sigmaL: u(st.sigmaLuminosity, units.Lsun) });
          if (tr !== undefined) {
            const lTrue = 4 * Math.PI * tr.radiusM ** 2 * 5.670374419e-8 * tr.temperatureK ** 4; // L = 4πR²σT⁴, σ from CODATA 2018
            truthHr.push({ temperatureK: tr.temperatureK, luminosity: u(lTrue, units.Lsun) });
          }
        }
      }
      rows.push(row);
      // The aligned text table shows z with an explicit sign and χ²/dof with two decimals; machine formats keep numbers.
      const shown = text ? row.map((c, k) => (typeof c !== "number" ? c : zIndex.has(k) ? (c >= 0 ? `+${c.toFixed(2)}` : c.toFixed(2)) : k === chiIndex ? c.toFixed(2) : c)) : row;
      const p = writer.writeRow(shown);
      if (p !== undefined) await p;
    }
    await writer.end();

    if (!optFlag(args, "no-report")) {
      const reportDir = optString(args, "report") ?? "starlume-report";
      const figures: ReportFigure[] = fitFigures(seds, [], bandSet, "Lsun");
      figures.push({
        svg: hrFigure(hr, "Lsun", truthHr),
        caption:
          "Fitted effective temperature (decreasing to the right, as in a Hertzsprung–Russell diagram) against luminosity from the fit and the parallax, with 1σ error bars in both (circles), and the true values chosen when the demo data were generated (hollow diamonds).",
      });
      // Report cells: z with an explicit sign and a true minus, χ²/dof with two decimals.
      const reportRows = rows.map((r) => r.map((c, k) => (typeof c !== "number" ? c : zIndex.has(k) ? signed(c) : k === chiIndex ? c.toFixed(2) : c)));
      const header = columns.map((c) => DISPLAY[c.uncertaintyOf ?? c.name] ?? c.name);
      const table = {
        ...reportTable(columns, header, reportRows),
        caption: "Fitted and derived parameters of the twelve demo stars (value ± 1σ), the fit's reduced χ², the true values and z = (fit − truth)/σ.",
      };
      const path = await writeReport(
        reportDir,
        {
          title: "starlume demo: the Tallmere Plateau six-band survey",
          description:
            "An invented observatory on an invented plateau observed twelve invented stars in six invented bands (tp340 … tp2150, smooth response curves, photon-counting). The fluxes were generated from chosen true temperatures, radii and distances (examples/demo-survey/truth.csv) with 1.5–3 % Gaussian noise and noisy parallaxes (scripts/gen-demo-survey.mjs, fixed seed). Each star is fitted with a blackbody (T, θ), then its distance, radius and luminosity follow from the parallax. z = (fit − truth)/σ.",
          table,
          figures,
        },
        io,
      );
      say(text ? io.stdout : io.stderr, `\nHTML report: ${path}`);
    }
    return rejected > 0 ? EXIT.ROWS_REJECTED : EXIT.OK;
  },
};
