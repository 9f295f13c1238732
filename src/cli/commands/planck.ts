/**
 * `starlume planck`: tabulate Planck spectra (per wavelength or per
 * frequency, radiance or exitance, SI or CGS, in any units of the right
 * kind) with the typed radiation API, or draw a family of curves as SVG.
 *
 * @module
 */
import { writeFile } from "node:fs/promises";
import { resolve } from "node:path";
import { kinds } from "../../quantity/aliases";
import type { Frequency, Length, Temperature } from "../../quantity/aliases";
import type { SystemName } from "../../quantity/quantity";
import type { UnitSystem } from "../../quantity/system";
import type { Unit } from "../../quantity/unit";
import { units } from "../../quantity/units";
import { lambertianExitance, planckRadianceFrequency, planckRadianceWavelength } from "../../radiation/index";
import { PALETTE, svgChart } from "../../plot/index";
import { optFlag, optInteger, optList, optString, type ParsedArgs } from "../args";
import { keyValuePairs } from "../run-table";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { EXIT, UsageError, say, type CliIO } from "../context";
import type { CellValue } from "../io/write";
import { formatK, logGrid } from "../figures";
import { defaultFormat, openOutput, openTableWriter, OUTPUT_FORMATS, type OutColumn } from "../table-out";
import { optionQuantitySI, siIn, unitOfKind, valueIn, valueOf, type KindLike } from "../units";
import { systemOption } from "./solve";

type Axis = "wavelength" | "frequency";
type What = "radiance" | "exitance";

const VALUE_KIND: Record<Axis, Record<What, KindLike>> = {
  wavelength: { radiance: kinds.spectralRadiancePerWavelength, exitance: kinds.spectralFluxPerWavelength },
  frequency: { radiance: kinds.spectralRadiancePerFrequency, exitance: kinds.spectralFluxPerFrequency },
};

const DEFAULT_UNITS: Record<SystemName, Record<Axis, { axis: string; radiance: string; exitance: string }>> = {
  SI: {
    wavelength: { axis: "nm", radiance: "W m^-2 sr^-1 nm^-1", exitance: "W m^-2 nm^-1" },
    frequency: { axis: "THz", radiance: "W m^-2 sr^-1 Hz^-1", exitance: "W m^-2 Hz^-1" },
  },
  CGS: {
    wavelength: { axis: "A", radiance: "erg s^-1 cm^-2 sr^-1 A^-1", exitance: "erg s^-1 cm^-2 A^-1" },
    frequency: { axis: "Hz", radiance: "erg s^-1 cm^-2 sr^-1 Hz^-1", exitance: "erg s^-1 cm^-2 Hz^-1" },
  },
};

/** Default axis ranges in SI (m or Hz). */
const DEFAULT_RANGE: Record<Axis, [number, number]> = { wavelength: [100e-9, 10e-6], frequency: [3e12, 3e15] };

/** Parse `--temperature 3000,5772 K,1e4` into kelvins. */
export function temperaturesOption(text: string | undefined): number[] {
  if (text === undefined) throw new UsageError("option --temperature is required, e.g. --temperature 5772 or --temperature 3000,5772,10000");
  const parts = text.split(",").map((p) => p.trim()).filter((p) => p !== "");
  if (parts.length === 0 || parts.length > 12) throw new UsageError(`option --temperature takes 1 to 12 comma-separated temperatures; got '${text}'`);
  return parts.map((p) => {
    const t = optionQuantitySI(p, kinds.temperature, units.K, "--temperature");
    if (!(t > 0)) throw new UsageError(`--temperature: ${p} is not a temperature > 0 K`);
    return t;
  });
}

interface PlanckSetup {
  readonly sys: UnitSystem<SystemName>;
  readonly axis: Axis;
  readonly what: What;
  readonly temperatures: number[];
  readonly axisUnit: { text: string; unit: Unit };
  readonly valueUnit: { text: string; unit: Unit };
  /** Axis values in SI (m or Hz). */
  readonly grid: Float64Array;
}

function setup(args: ParsedArgs): PlanckSetup {
  const sys = systemOption(args);
  const axis = (optString(args, "axis") ?? "wavelength") as Axis;
  const what = (optString(args, "quantity") ?? "radiance") as What;
  const temperatures = temperaturesOption(optString(args, "temperature"));
  const defaults = DEFAULT_UNITS[sys.name][axis];
  const axisKind = axis === "wavelength" ? kinds.length : kinds.frequency;
  const unitOptions = keyValuePairs(optList(args, "unit"), "unit", ["axis", "value"]);
  const axisText = unitOptions.get("axis") ?? defaults.axis;
  const axisUnit = unitOfKind(axisText, axisKind, "--unit axis", axis === "wavelength" ? "use a length, or --axis frequency for a frequency unit" : "use a frequency, or --axis wavelength for a length unit");
  const valueText = unitOptions.get("value") ?? defaults[what];
  const other: What = what === "radiance" ? "exitance" : "radiance";
  const valueUnit = unitOfKind(valueText, VALUE_KIND[axis][what], "--unit value", `for ${other} use --quantity ${other}${what === "radiance" ? " (radiance is per steradian: sr^-1)" : " (exitance has no sr^-1)"}`);
  const from = optString(args, "from");
  const to = optString(args, "to");
  const lo = from === undefined ? DEFAULT_RANGE[axis][0] : optionQuantitySI(from, axisKind, axisUnit, "--from");
  const hi = to === undefined ? DEFAULT_RANGE[axis][1] : optionQuantitySI(to, axisKind, axisUnit, "--to");
  if (!(lo > 0) || !(hi > lo)) throw new UsageError(`--from and --to must satisfy 0 < from < to; got ${siIn(lo, axisUnit)} and ${siIn(hi, axisUnit)} ${axisText}`);
  const n = optInteger(args, "points", 200, 2, 1_000_000);
  const spacing = optString(args, "spacing") ?? "log";
  let grid: Float64Array;
  if (spacing === "log") grid = logGrid(lo, hi, n);
  else {
    grid = new Float64Array(n);
    for (let i = 0; i < n; i++) grid[i] = lo + ((hi - lo) * i) / (n - 1);
    grid[n - 1] = hi;
  }
  return { sys, axis, what, temperatures, axisUnit: { text: axisText, unit: axisUnit }, valueUnit: { text: valueText, unit: valueUnit }, grid };
}

/** The value at one axis point (SI m or Hz) and temperature, in the value unit, via the typed API in `s.sys`. */
function valueAt(s: PlanckSetup, xSI: number, t: number): number {
  const sys = s.sys;
  let v: number;
  if (s.axis === "wavelength") {
    const lambda = valueOf(sys, siIn(xSI, units.m), units.m) as Length<SystemName>;
    const b = planckRadianceWavelength(sys, lambda as never, t as Temperature);
    v = s.what === "exitance" ? lambertianExitance(b) : b;
  } else {
    const b = planckRadianceFrequency(sys, xSI as Frequency, t as Temperature);
    v = s.what === "exitance" ? lambertianExitance(b) : b;
  }
  return valueIn(sys, v, s.valueUnit.unit);
}

function columnName(s: PlanckSetup, t: number): string {
  return `${s.what}_${formatK(t).replace(" ", "")}`;
}

/** SVG of the family. */
export function planckSvg(s: PlanckSetup): string {
  let peak = 0;
  const x = Array.from(s.grid, (g) => siIn(g, s.axisUnit.unit));
  const series = s.temperatures.map((t, i) => {
    const y = Array.from(s.grid, (g) => valueAt(s, g, t));
    for (const v of y) if (v > peak) peak = v;
    return { type: "line" as const, name: formatK(t), x, y, colour: PALETTE[i % PALETTE.length] as string };
  });
  const symbol = s.axis === "wavelength" ? "λ" : "ν";
  return svgChart({
    title: `Planck ${s.what} per unit ${s.axis}`,
    description: `Blackbody ${s.what} ${s.what === "radiance" ? `B_${symbol}` : `π B_${symbol}`} at ${s.temperatures.map(formatK).join(", ")}.`,
    x: { label: `${s.axis} [${s.axisUnit.text}]`, scale: "log" },
    y: { label: `${s.what} [${s.valueUnit.text}]`, scale: "log", min: peak / 1e8, max: peak * 3 },
    series,
    legend: true,
  });
}

export const planckCommand: Command = {
  name: "planck",
  summary: "tabulate Planck spectra (per λ or ν, radiance or exitance, SI or CGS) or plot them as SVG",
  usage: "--temperature T[,T…] [options]",
  description: `
Tabulates the blackbody spectral radiance B (per steradian) or exitance π B
(a Lambertian surface's emitted flux) per unit wavelength or frequency, at one
or more temperatures, on a logarithmic (or linear) grid. Units of the axis and
of the values are any of the right kind (checked): the defaults are nm and
W m^-2 sr^-1 nm^-1 in SI, Å and erg s^-1 cm^-2 sr^-1 A^-1 in CGS. Temperatures
are comma-separated, in K unless a unit is given. With --svg FILE the family of
curves is drawn as an SVG figure; the table is then written only if --output is
given too.`,
  options: [
    { name: "temperature", short: "T", kind: "value", valueName: "LIST", help: "temperature(s), e.g. 5772 or 3000,5772,10000 (K)" },
    { name: "axis", kind: "value", valueName: "AXIS", choices: ["wavelength", "frequency"], help: "per unit wavelength or per unit frequency", defaultText: "wavelength" },
    { name: "quantity", kind: "value", valueName: "Q", choices: ["radiance", "exitance"], help: "B (per sr) or π B", defaultText: "radiance" },
    { name: "system", kind: "value", valueName: "SYS", choices: ["SI", "CGS"], help: "system of the computation and the default units", defaultText: "SI" },
    { name: "unit", short: "u", kind: "list", valueName: "KEY=UNIT", help: "output unit: axis=UNIT (the wavelength or frequency column), value=UNIT (the values); repeatable" },
    { name: "from", kind: "value", valueName: "X", help: "start of the axis, e.g. '200 nm' (bare numbers in the axis unit)", defaultText: "100 nm or 3 THz" },
    { name: "to", kind: "value", valueName: "X", help: "end of the axis", defaultText: "10 µm or 3000 THz" },
    { name: "points", short: "n", kind: "value", valueName: "N", help: "number of grid points", defaultText: "200" },
    { name: "spacing", kind: "value", valueName: "S", choices: ["log", "linear"], help: "grid spacing", defaultText: "log" },
    { name: "svg", kind: "value", valueName: "FILE", help: "write an SVG plot of the curves to FILE" },
    { name: "format", short: "f", kind: "value", valueName: "FMT", choices: OUTPUT_FORMATS, help: "table format", defaultText: "table on a terminal, else csv" },
    { name: "output", short: "o", kind: "value", valueName: "FILE", help: "write the table to FILE" },
    { name: "digits", short: "d", kind: "value", valueName: "N", help: "significant digits in the aligned table", defaultText: "6" },
    { name: "quiet", short: "q", kind: "flag", help: "no wrote-file message on stderr" },
  ],
  exitCodes: [
    { code: 0, meaning: "the table (and SVG) written" },
    {
      code: 2,
      meaning:
        "usage: a bad temperature list, a --unit of the wrong kind (the message suggests\n--quantity exitance when that is the mix-up), or a bad axis range",
    },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [
    { args: ["--temperature", "5772", "--from", "300 nm", "--to", "1 um", "--points", "8", "--format", "table"], note: "the Sun's effective temperature, 300 nm – 1 µm, 8 points" },
    { args: ["-T", "3000,10000", "--axis", "frequency", "--quantity", "exitance", "--system", "CGS", "--points", "5", "--format", "csv"], note: "exitance per unit frequency in CGS (erg s^-1 cm^-2 Hz^-1)" },
    { args: ["-T", "3000,5772,10000,30000", "--svg", "planck.svg"], note: "draw a family of curves as SVG" },
  ],
  async run(args, io) {
    if (args.positionals.length > 0) throw new UsageError(`planck takes no file arguments; got ${args.positionals.join(" ")}`);
    const s = setup(args);
    const digits = optInteger(args, "digits", 6, 1, 17);
    const svgPath = optString(args, "svg");
    if (svgPath !== undefined) {
      const full = resolve(io.cwd ?? process.cwd(), svgPath);
      try {
        await writeFile(full, planckSvg(s), "utf8");
      } catch (e) {
        throw new UsageError(`cannot write '${svgPath}' (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
      }
      if (!optFlag(args, "quiet")) say(io.stderr, `wrote ${full}`);
      if (optString(args, "output") === undefined) return EXIT.OK;
    }
    const outPath = optString(args, "output");
    const output = await openOutput(outPath, io);
    const columns: OutColumn[] = [{ name: s.axis, unit: s.axisUnit.text }, ...s.temperatures.map((t) => ({ name: columnName(s, t), unit: s.valueUnit.text }))];
    const writer = openTableWriter(output.sink, columns, { format: defaultFormat(optString(args, "format"), outPath, io), digits });
    try {
      for (const x of s.grid) {
        const row: CellValue[] = [siIn(x, s.axisUnit.unit)];
        for (const t of s.temperatures) row.push(valueAt(s, x, t));
        const p = writer.writeRow(row);
        if (p !== undefined) await p;
      }
      await writer.end();
    } finally {
      await output.close();
    }
    return EXIT.OK;
  },
};
