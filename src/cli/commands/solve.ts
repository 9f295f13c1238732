/**
 * `starlume solve`: stellar parameters for every row of a table with the
 * typed stellar-parameter solver (`solveStar`, src/photometry).
 *
 * @module
 */
import { kinds } from "../../quantity/aliases";
import type { Unit } from "../../quantity/unit";
import { CGS, SI, type UnitSystem } from "../../quantity/system";
import type { SystemName } from "../../quantity/quantity";
import {
  createStarBatchSolver,
  PARALLAX_BIAS_THRESHOLD,
  solveStar,
  StarBatchReason,
  type Measurement,
  type StarBatchSolver,
  type StarObservationName,
  type StarObservations,
  type StarSolution,
} from "../../photometry/index";
import { formatValueUncertainty } from "../io/write";
import type { CellValue } from "../io/write";
import type { ColumnSpec } from "../io/header";
import { optList, optString, type ParsedArgs } from "../args";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { UsageError, say, type CliIO } from "../context";
import { hrFigure, roundedK, luminosityLabel, planckFamilyFigure, spreadByTemperature } from "../figures";
import { writeReport } from "../report-write";
import { findColumn, keyValuePairs, runTableCommand, sigmaColumn, TABLE_OPTIONS, type RowResult, type TableBinding } from "../run-table";
import { idColumn, numberCell, textCell, type InCell } from "../table-in";
import { withSigma, type OutColumn } from "../table-out";
import { isMagnitudeUnit, unitOfKind, valueIn, valueOf, type KindLike } from "../units";

/** An input quantity of the solver as the tool names it. */
interface InputQuantity {
  /** Key used in `--column KEY=NAME` and in messages. */
  readonly key: string;
  readonly observation: StarObservationName;
  /** Column names recognized by default (case-insensitive). */
  readonly names: readonly string[];
  /** Kind of the unit; null for magnitudes. */
  readonly kind: KindLike | null;
  readonly example: string;
}

const INPUTS: readonly InputQuantity[] = [
  { key: "teff", observation: "temperature", names: ["teff", "t_eff", "temperature"], kind: kinds.temperature, example: "teff [K]" },
  { key: "luminosity", observation: "luminosity", names: ["luminosity", "lum"], kind: kinds.power, example: "luminosity [Lsun]" },
  { key: "radius", observation: "radius", names: ["radius"], kind: kinds.length, example: "radius [Rsun]" },
  { key: "distance", observation: "distance", names: ["distance", "dist"], kind: kinds.length, example: "distance [pc]" },
  { key: "parallax", observation: "parallax", names: ["parallax", "plx"], kind: kinds.angle, example: "parallax [mas]" },
  { key: "fbol", observation: "bolometricFlux", names: ["fbol", "f_bol", "bolometric_flux"], kind: kinds.flux, example: "fbol [erg s^-1 cm^-2]" },
  { key: "mbol", observation: "apparentBolometricMagnitude", names: ["mbol", "m_bol"], kind: null, example: "mbol [mag]" },
  { key: "theta", observation: "angularDiameter", names: ["theta", "angular_diameter"], kind: kinds.angle, example: "theta [mas]" },
];

/** Output quantities and their default units. */
const OUTPUT_KEYS = ["teff", "luminosity", "radius", "distance", "theta", "fbol"] as const;
type OutputKey = (typeof OUTPUT_KEYS)[number];

const OUTPUT_KIND: Record<OutputKey, KindLike> = {
  teff: kinds.temperature,
  luminosity: kinds.power,
  radius: kinds.length,
  distance: kinds.length,
  theta: kinds.angle,
  fbol: kinds.flux,
};

function defaultUnits(system: SystemName): Record<OutputKey, string> {
  return { teff: "K", luminosity: "Lsun", radius: "Rsun", distance: "pc", theta: "mas", fbol: system === "SI" ? "W m^-2" : "erg s^-1 cm^-2" };
}

/** Relative σ given to a value that has no uncertainty (treated as exact). */
export const EXACT_RELATIVE_SIGMA = 1e-9;
const MAG_PER_LN = 2.5 / Math.LN10;

interface BoundInput {
  readonly q: InputQuantity;
  readonly index: number;
  readonly spec: ColumnSpec;
  /** null for magnitudes. */
  readonly unit: Unit | null;
  readonly sigmaIndex: number;
  readonly sigmaUnit: Unit | null;
}

/** Resolve output units (`--unit KEY=UNIT`), each checked against its kind. */
export function outputUnits(args: ParsedArgs, system: SystemName, keys: readonly OutputKey[] = OUTPUT_KEYS): Record<OutputKey, { text: string; unit: Unit }> {
  const chosen = { ...defaultUnits(system), ...Object.fromEntries(keyValuePairs(optList(args, "unit"), "unit", keys)) } as Record<OutputKey, string>;
  const out = {} as Record<OutputKey, { text: string; unit: Unit }>;
  for (const k of OUTPUT_KEYS) out[k] = { text: chosen[k], unit: unitOfKind(chosen[k], OUTPUT_KIND[k], `--unit ${k}`) };
  return out;
}

/** `--system SI|CGS` as a system object. */
export function systemOption(args: ParsedArgs): UnitSystem<SystemName> {
  const s = optString(args, "system") ?? "SI";
  return (s === "CGS" ? CGS : SI) as UnitSystem<SystemName>;
}

function bindInputs(columns: readonly ColumnSpec[], args: ParsedArgs): BoundInput[] {
  const explicit = keyValuePairs(optList(args, "column"), "column", INPUTS.map((q) => q.key));
  const bound: BoundInput[] = [];
  for (const q of INPUTS) {
    const name = explicit.get(q.key);
    const index = name !== undefined ? columns.findIndex((c) => c.name === name && c.uncertaintyOf === null) : findColumn(columns, q.names);
    if (name !== undefined && index === -1) throw new UsageError(`--column ${q.key}=${name}: no value column named '${name}'`);
    if (index === -1) continue;
    const spec = columns[index] as ColumnSpec;
    const where = `column ${index + 1} '${spec.name}${spec.unit !== null ? ` [${spec.unit}]` : ""}'`;
    let unit: Unit | null = null;
    if (q.kind === null) {
      if (spec.unit !== null && !isMagnitudeUnit(spec.unit)) throw new UsageError(`${where}: an apparent bolometric magnitude is in [mag]; got [${spec.unit}]`);
    } else {
      if (spec.unit === null) throw new UsageError(`${where}: needs a unit, e.g. '${q.example}' (${q.kind.name})`);
      unit = unitOfKind(spec.unit, q.kind, where, q.key === "parallax" || q.key === "theta" ? `write it as an angle, e.g. '${q.example}'` : undefined);
    }
    const sigmaIndex = sigmaColumn(columns, spec.name, "solve");
    let sigmaUnit: Unit | null = null;
    if (sigmaIndex !== -1) {
      const s = columns[sigmaIndex] as ColumnSpec;
      const sWhere = `column ${sigmaIndex + 1} '${s.name}${s.unit !== null ? ` [${s.unit}]` : ""}'`;
      if (q.kind === null) {
        if (s.unit !== null && !isMagnitudeUnit(s.unit)) throw new UsageError(`${sWhere}: must be in [mag]`);
      } else {
        sigmaUnit = unitOfKind(s.unit ?? "", q.kind, sWhere);
      }
    }
    bound.push({ q, index, spec, unit, sigmaIndex, sigmaUnit });
  }
  return bound;
}

const fmt = (x: number): string => (Number.isFinite(x) ? String(x) : "");

function observationsOf(
  sys: UnitSystem<SystemName>,
  bound: readonly BoundInput[],
  cells: readonly InCell[],
  assumeSigma: number | undefined,
): { observations: StarObservations<SystemName>; used: string[] } {
  const obs: Partial<Record<StarObservationName, Measurement<number>>> = {};
  const used: string[] = [];
  for (const b of bound) {
    const v = numberCell(cells[b.index], b.spec);
    if (v === null) continue;
    const unitText = b.spec.unit ?? "mag";
    let s: number | null = null;
    if (b.sigmaIndex !== -1) {
      s = numberCell(cells[b.sigmaIndex], { name: `sigma(${b.spec.name})`, unit: null, uncertaintyOf: null, uncertaintySide: null });
      if (s === null && assumeSigma === undefined) throw new RangeError(`'${b.spec.name}' is given but sigma(${b.spec.name}) is empty (fill it, or pass --assume-sigma)`);
    }
    if (b.q.kind !== null && !(v > 0)) throw new RangeError(`'${b.spec.name}' must be > 0 ${unitText}; got ${fmt(v) || String(v)}`);
    let sigmaValue: number;
    if (s !== null) {
      if (!(s > 0)) throw new RangeError(`sigma(${b.spec.name}) must be > 0; got ${String(s)}`);
      sigmaValue = b.unit === null ? s : valueOf(sys, s, b.sigmaUnit as Unit);
    } else {
      const rel = assumeSigma ?? EXACT_RELATIVE_SIGMA;
      sigmaValue = b.unit === null ? rel * MAG_PER_LN : rel * valueOf(sys, v, b.unit);
    }
    const value = b.unit === null ? v : valueOf(sys, v, b.unit);
    obs[b.q.observation] = { value, sigma: sigmaValue };
    used.push(b.q.key);
  }
  return { observations: obs as StarObservations<SystemName>, used };
}

function worstPull(sol: StarSolution<SystemName>): string {
  let best = "";
  let mag = -1;
  for (const [k, v] of Object.entries(sol.consistency.pulls)) {
    if (v !== undefined && Math.abs(v) > mag) {
      mag = Math.abs(v);
      const key = INPUTS.find((q) => q.observation === k)?.key ?? k;
      best = `${key}:${v >= 0 ? "+" : ""}${v.toFixed(2)}`;
    }
  }
  return sol.consistency.dof > 0 ? best : "";
}

/**
 * The reason text of a parallax whose inversion is biased (σ_ϖ/ϖ above the
 * library's {@link PARALLAX_BIAS_THRESHOLD}, 0.1), naming the user's
 * column; "" when there is no parallax or it is precise enough.
 */
export function parallaxBias(observations: StarObservations<SystemName>, column: string): string {
  const p = (observations as Partial<Record<StarObservationName, Measurement<number>>>).parallax;
  if (p === undefined) return "";
  const rel = p.sigma / p.value;
  return rel > PARALLAX_BIAS_THRESHOLD
    ? `parallax bias: sigma(${column})/${column} = ${rel.toPrecision(2)} > ${PARALLAX_BIAS_THRESHOLD}, so the distance from inverting it is biased (Lutz-Kelker)`
    : "";
}

/** Inputs that a `starlume fit` output derives from its fitted T and θ (and the distance). */
const DERIVED_BY_FIT = ["luminosity", "radius", "fbol"] as const;

/**
 * Refuse a table written by `starlume fit` (recognised by its n_bands and
 * flags columns) when its derived columns would be solved together with the
 * fitted T and θ they were computed from: that counts the same photometry
 * twice (σ(T) shrinks and χ² → 0 without any new information).
 *
 * @throws UsageError naming the derived columns and what to keep
 */
export function refuseDerivedInputs(columns: readonly ColumnSpec[], bound: readonly { readonly q: { readonly key: string }; readonly spec: ColumnSpec }[], source: string): void {
  const names = new Set(columns.map((c) => c.name.toLowerCase()));
  if (!(names.has("n_bands") && names.has("flags"))) return;
  const derived = bound.filter((b) => (DERIVED_BY_FIT as readonly string[]).includes(b.q.key)).map((b) => `'${b.spec.name}'`);
  const fitted = bound.filter((b) => b.q.key === "teff" || b.q.key === "theta");
  if (derived.length === 0 || fitted.length === 0) return;
  throw new UsageError(
    `${source} is the output of 'starlume fit': its column${derived.length === 1 ? "" : "s"} ${derived.join(", ")} ${derived.length === 1 ? "was" : "were"} derived from the fitted teff and theta, so solving ${derived.length === 1 ? "it" : "them"} together with ${fitted.map((b) => `'${b.spec.name}'`).join(" and ")} would count the same photometry twice (the fit's T-theta covariance is not in the table). Remove the derived columns (keep teff, theta and the distance or parallax with their sigma columns) and solve again.`,
  );
}

/** The consistency columns of an exactly determined star (as the scalar solver reports them: χ² 0, dof 0, p 1, tension 0). */
const EXACT_CONSISTENCY = { chi2: 0, dof: 0, pValue: 1, tensionSigma: 0 } as const;

/** Cap on rows kept for the report. */
const REPORT_ROWS = 100;
const REPORT_POINTS = 2000;

async function bind(columns: readonly ColumnSpec[], args: ParsedArgs, io: CliIO, source: string): Promise<TableBinding> {
  const sys = systemOption(args);
  const units = outputUnits(args, sys.name);
  const bound = bindInputs(columns, args);
  refuseDerivedInputs(columns, bound, source);
  if (bound.length === 0) {
    throw new UsageError(
      `${source}: no solver input columns found; name them ${INPUTS.map((q) => `'${q.example}'`).join(", ")} (or map yours with --column KEY=NAME)`,
    );
  }
  const quiet = args.options.get("quiet") === true;
  const assumeText = optString(args, "assume-sigma");
  const assumeSigma = assumeText === undefined ? undefined : Number(assumeText);
  if (assumeSigma !== undefined && !(assumeSigma > 0 && assumeSigma < 1)) throw new UsageError(`option --assume-sigma must be a relative uncertainty between 0 and 1 (e.g. 0.02); got '${assumeText ?? ""}'`);
  for (const b of bound) {
    if (b.sigmaIndex === -1 && !quiet) {
      say(
        io.stderr,
        assumeSigma !== undefined
          ? `note: column '${b.spec.name}' has no sigma(${b.spec.name}); using the relative uncertainty ${assumeSigma} from --assume-sigma`
          : `note: column '${b.spec.name}' has no sigma(${b.spec.name}); its values are treated as exact (relative σ ${EXACT_RELATIVE_SIGMA})`,
      );
    }
  }
  const id = idColumn(columns, optString(args, "id"));
  const out: OutColumn[] = [{ name: "line", unit: null }];
  if (id !== -1) out.push({ name: (columns[id] as ColumnSpec).name, unit: null });
  out.push({ name: "status", unit: null }, { name: "inputs", unit: null });
  for (const k of OUTPUT_KEYS) out.push(...withSigma(k, units[k].text));
  out.push({ name: "chi2", unit: null }, { name: "dof", unit: null }, { name: "p_value", unit: null }, { name: "tension_sigma", unit: null }, { name: "worst_pull", unit: null }, { name: "reason", unit: null });
  const nOut = out.length;
  const parallaxColumn = bound.find((b) => b.q.key === "parallax")?.spec.name ?? "parallax";
  const kept: CellValue[][] = [];
  const points: { name: string; temperatureK: number; sigmaT: number; luminosity: number; sigmaL: number }[] = [];
  const blank = (line: number, idText: string, reason: string): CellValue[] => {
    const cells: CellValue[] = new Array<CellValue>(nOut).fill(null);
    cells[0] = line;
    let k = 1;
    if (id !== -1) cells[k++] = idText;
    cells[k] = "rejected";
    cells[nOut - 1] = reason;
    return cells;
  };
  const keep = (cells: CellValue[]): void => {
    if (kept.length < REPORT_ROWS) kept.push(cells);
  };
  const observationKey = new Map(INPUTS.map((q) => [q.key, q.observation]));
  /** The output row of a solved star, from each quantity's value and σ in `sys`. */
  const solvedRow = (line: number, idText: string, used: string, est: readonly (readonly [number, number])[], c: { chi2: number; dof: number; pValue: number; tensionSigma: number }, worst: string, observations: StarObservations<SystemName>): CellValue[] => {
    const row: CellValue[] = [line];
    if (id !== -1) row.push(idText);
    const bias = parallaxBias(observations, parallaxColumn);
    row.push(bias === "" ? "ok" : "flagged", used);
    OUTPUT_KEYS.forEach((k, j) => {
      const e = est[j] as readonly [number, number];
      row.push(valueIn(sys, e[0], units[k].unit), valueIn(sys, e[1], units[k].unit));
    });
    row.push(c.chi2, c.dof, c.pValue, c.tensionSigma, worst, bias);
    keep(row);
    if (points.length < REPORT_POINTS) {
      const t = est[0] as readonly [number, number];
      const l = est[1] as readonly [number, number];
      points.push({
        name: idText,
        temperatureK: t[0],
        sigmaT: t[1],
        luminosity: valueIn(sys, l[0], units.luminosity.unit),
        sigmaL: valueIn(sys, l[1], units.luminosity.unit),
      });
    }
    return row;
  };
  const rejectedRow = (line: number, idText: string, e: unknown): RowResult => {
    const reason = e instanceof Error ? e.message : String(e);
    const row = blank(line, idText, reason);
    keep(row);
    return { cells: row, rejected: reason };
  };
  /** One row through the scalar solver (any number of inputs, consistency report). */
  const scalarRow = (line: number, idText: string, observations: StarObservations<SystemName>, used: readonly string[]): RowResult => {
    try {
      const sol = solveStar(sys, observations);
      const est = [sol.temperature, sol.luminosity, sol.radius, sol.distance, sol.angularDiameter, sol.bolometricFlux].map((e) => [e.value, e.sigma] as const);
      return { cells: solvedRow(line, idText, used.join("+"), est, sol.consistency, worstPull(sol), observations) };
    } catch (e) {
      return rejectedRow(line, idText, e);
    }
  };
  // Batch solvers by input set ("teff+parallax+fbol"); null when the set does not determine a star.
  const batchSolvers = new Map<string, StarBatchSolver<SystemName, StarObservationName> | null>();
  const batchSolverFor = (used: readonly string[]): StarBatchSolver<SystemName, StarObservationName> | null => {
    const key = used.join("+");
    let solver = batchSolvers.get(key);
    if (solver === undefined) {
      const names = used.map((k) => observationKey.get(k) as StarObservationName) as [StarObservationName, StarObservationName, StarObservationName];
      try {
        solver = createStarBatchSolver(sys, names);
      } catch {
        solver = null; // under-determined: the scalar solver gives the message
      }
      batchSolvers.set(key, solver);
    }
    return solver;
  };
  const binding: TableBinding = {
    columns: out,
    row(cells, line) {
      const idText = id !== -1 ? textCell(cells[id]) : "";
      try {
        const { observations, used } = observationsOf(sys, bound, cells, assumeSigma);
        if (used.length === 0) throw new RangeError("no input values in this row");
        return scalarRow(line, idText, observations, used);
      } catch (e) {
        return rejectedRow(line, idText, e);
      }
    },
    rows(items) {
      // Exactly determined rows (three independent inputs) go through the typed batch solver,
      // grouped by their set of inputs; the others (and any row the batch marks invalid, to get
      // the scalar solver's message) go through the scalar solver. Results keep the input order.
      const results = new Array<RowResult | undefined>(items.length);
      const parsed = new Array<{ idText: string; observations: StarObservations<SystemName>; used: string[] } | undefined>(items.length);
      const failed = new Array<unknown>(items.length);
      const groups = new Map<string, number[]>();
      items.forEach((item, i) => {
        const idText = id !== -1 ? textCell(item.cells[id]) : "";
        try {
          const { observations, used } = observationsOf(sys, bound, item.cells, assumeSigma);
          if (used.length === 0) throw new RangeError("no input values in this row");
          parsed[i] = { idText, observations, used };
          if (used.length === 3) {
            const key = used.join("+");
            const g = groups.get(key);
            if (g === undefined) groups.set(key, [i]);
            else g.push(i);
          }
        } catch (e) {
          failed[i] = e;
        }
      });
      // Keep the report's rows in input order: solve the groups first, then assemble in order.
      const batched = new Array<{ est: [number, number][] } | undefined>(items.length);
      for (const [, idx] of groups) {
        const first = parsed[idx[0] as number] as { used: string[] };
        const solver = batchSolverFor(first.used);
        if (solver === null) continue;
        const n = idx.length;
        const input: Record<string, { values: Float64Array; sigmas: Float64Array }> = {};
        for (const name of solver.inputs) input[name] = { values: new Float64Array(n), sigmas: new Float64Array(n) };
        idx.forEach((i, r) => {
          const obs = (parsed[i] as { observations: Partial<Record<StarObservationName, Measurement<number>>> }).observations;
          for (const name of solver.inputs) {
            const m = obs[name] as Measurement<number>;
            const col = input[name] as { values: Float64Array; sigmas: Float64Array };
            col.values[r] = m.value;
            col.sigmas[r] = m.sigma;
          }
        });
        const o = solver.solve(input as never);
        const cols = [o.temperature, o.sigmaTemperature, o.luminosity, o.sigmaLuminosity, o.radius, o.sigmaRadius, o.distance, o.sigmaDistance, o.angularDiameter, o.sigmaAngularDiameter, o.bolometricFlux, o.sigmaBolometricFlux] as Float64Array[];
        idx.forEach((i, r) => {
          if (o.reason[r] !== StarBatchReason.OK) return; // the scalar solver names the problem
          const est: [number, number][] = [];
          for (let q = 0; q < 6; q++) {
            const v = (cols[2 * q] as Float64Array)[r] as number;
            const sg = (cols[2 * q + 1] as Float64Array)[r] as number;
            if (!(v > 0 && v < Infinity && sg >= 0 && sg < Infinity)) return;
            est.push([v, sg]);
          }
          batched[i] = { est };
        });
      }
      items.forEach((item, i) => {
        const p = parsed[i];
        if (p === undefined) {
          results[i] = rejectedRow(item.line, id !== -1 ? textCell(item.cells[id]) : "", failed[i]);
          return;
        }
        const q = p as { idText: string; observations: StarObservations<SystemName>; used: string[] };
        const b = batched[i];
        results[i] =
          b !== undefined
            ? { cells: solvedRow(item.line, q.idText, q.used.join("+"), b.est, EXACT_CONSISTENCY, "", q.observations) }
            : scalarRow(item.line, q.idText, q.observations, q.used);
      });
      return results as RowResult[];
    },
    badRow(line, message) {
      const row = blank(line, "", message.replace(/^line \d+: /, ""));
      keep(row);
      return row;
    },
  };
  const reportDir = optString(args, "report");
  if (reportDir !== undefined) {
    binding.finish = async (summary) => {
      const header = out.map((c) => (c.unit !== null && c.unit !== undefined ? `${c.name} [${c.unit}]` : c.name));
      const table = reportTable(out, header, kept);
      const figures = [];
      if (points.length > 0) {
        figures.push({
          svg: hrFigure(points, units.luminosity.text, undefined, "solved"),
          caption: `Effective temperature (decreasing to the right) and luminosity [${luminosityLabel(units.luminosity.text)}] of ${points.length === REPORT_POINTS ? `the first ${REPORT_POINTS}` : `the ${points.length}`} solved star${points.length === 1 ? "" : "s"}, with 1σ error bars in both.`,
        });
        const shown = spreadByTemperature(points.map((p) => ({ name: p.name, temperatureK: p.temperatureK, sigmaTemperatureK: p.sigmaT })));
        figures.push({
          svg: planckFamilyFigure(shown, [], "Planck curves at the solved temperatures"),
          caption: `Planck curves B_{λ} [W m⁻² sr⁻¹ µm⁻¹] of ${shown.length < points.length ? `${shown.length} of the solved stars, spread evenly in temperature from the coolest to the hottest` : "the solved stars"}: ${shown.map((s) => `${s.name !== "" ? `${s.name} ` : ""}(${roundedK(s.temperatureK, s.sigmaTemperatureK)})`).join(", ")}.`,
        });
      }
      const path = await writeReport(
        reportDir,
        {
          title: `starlume solve: ${source}`,
          description: `Stellar parameters from ${source}: ${summary.rows} rows, ${summary.rows - summary.rejected} solved, ${summary.rejected} rejected. Model: L = 4πR²σT⁴, f = L/(4πd²), θ = 2R/d, d = 1 au/p; weighted least squares in log space with first-order uncertainties (stellar-parameter solver). ${kept.length < summary.rows ? `The table shows the first ${kept.length} rows.` : ""}`,
          table,
          figures,
        },
        io,
      );
      if (!quiet) say(io.stderr, `report written to ${path}`);
    };
  }
  return binding;
}

/** A report table from result rows: value ± σ merged, full text otherwise. */
export function reportTable(columns: readonly OutColumn[], header: readonly string[], rows: readonly (readonly CellValue[])[]): { header: string[]; rows: string[][] } {
  const skip = new Set<number>();
  const sigmaOf = new Map<number, number>();
  columns.forEach((c, i) => {
    if (c.uncertaintyOf !== undefined && c.uncertaintyOf !== null) {
      const j = columns.findIndex((d) => d.name === c.uncertaintyOf);
      if (j !== -1) {
        skip.add(i);
        sigmaOf.set(j, i);
      }
    }
  });
  const keep = columns.map((_, i) => i).filter((i) => !skip.has(i));
  const cellText = (row: readonly CellValue[], i: number): string => {
    const v = row[i];
    if (v === null || v === undefined) return "";
    if (typeof v === "string") return v;
    const si = sigmaOf.get(i);
    const s = si !== undefined ? row[si] : undefined;
    if (typeof s === "number" && s > 0 && Number.isFinite(v)) return formatValueUncertainty(v, s);
    return Number.isInteger(v) ? String(v) : String(Number(v.toPrecision(6)));
  };
  return { header: keep.map((i) => header[i] as string), rows: rows.map((r) => keep.map((i) => cellText(r, i))) };
}

export const solveCommand: Command = {
  name: "solve",
  summary: "derive T, L, R, d, θ with uncertainties for every row of a table",
  usage: "[options] FILE",
  description: `
Reads a table (CSV or JSON Lines, '-' for stdin) with any sufficient subset of
these columns, each with a unit in brackets and optionally its uncertainty
column sigma(NAME) in a compatible unit:

  teff [K]          effective temperature        (also: t_eff, temperature)
  luminosity [Lsun] luminosity, any power unit   (also: lum)
  radius [Rsun]     radius, any length unit
  distance [pc]     distance                     (also: dist)
  parallax [mas]    trigonometric parallax       (also: plx)
  fbol [W m^-2]     bolometric flux              (also: f_bol, bolometric_flux)
  mbol [mag]        apparent bolometric magnitude, IAU 2015 scale (also: m_bol)
  theta [mas]       angular diameter             (also: angular_diameter)

Three independent inputs determine a star; more are combined by weighted least
squares and the consistency columns report chi2, dof, p_value, the
Gaussian-equivalent tension in sigma and the input with the largest pull. Rows
are processed as they are read, in chunks (flat memory). A value without an uncertainty
column is treated as exact (relative sigma ${EXACT_RELATIVE_SIGMA}) unless --assume-sigma is given.
Units of the output are set with --unit KEY=UNIT (KEY: ${OUTPUT_KEYS.join(", ")}); each
is checked to be of the right kind. Table format: docs/guides/table-format.md.`,
  options: [
    ...TABLE_OPTIONS,
    { name: "system", kind: "value", valueName: "SYS", choices: ["SI", "CGS"], help: "system of the solve and of the default flux unit", defaultText: "SI" },
    { name: "unit", short: "u", kind: "list", valueName: "KEY=UNIT", help: "output unit of a quantity, e.g. --unit radius=km (repeatable)" },
    { name: "column", kind: "list", valueName: "KEY=NAME", help: "use column NAME for input KEY, e.g. --column parallax=plx_dr9 (repeatable)" },
    { name: "assume-sigma", kind: "value", valueName: "REL", help: "relative uncertainty for values without one, e.g. 0.02" },
  ],
  exitCodes: [
    { code: 0, meaning: "every row solved" },
    {
      code: 1,
      meaning:
        "some rows rejected: a value <= 0, an empty sigma(x) cell, or inputs that do not\ndetermine the star; rejected rows stay in the output with status 'rejected' and\nthe reason, and are listed on stderr with their line numbers",
    },
    {
      code: 2,
      meaning: "usage: unknown option or bad value, unreadable input, a header unit of the\nwrong kind, or no solver input column",
    },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [
    { args: ["examples/demo-survey/solve-input.csv", "--format", "table"], note: "solve the demo stars (temperature, angular diameter, parallax, bolometric flux)" },
    { args: ["examples/demo-survey/solve-input.csv", "--unit", "radius=km", "--unit", "distance=ly", "--format", "csv"], note: "the same, radius in km and distance in light-years, as CSV" },
    { args: ["examples/demo-survey/solve-input.csv", "--system", "CGS", "--format", "jsonl", "--quiet"], note: "CGS bolometric flux, JSON Lines output" },
  ],
  async run(args, io) {
    return runTableCommand("solve", args, io, (columns, source) => bind(columns, args, io, source));
  },
};
