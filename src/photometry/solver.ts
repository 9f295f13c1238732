/**
 * The stellar-parameter solver, typed: from any sufficient set of measured
 * {temperature, luminosity, radius, distance or parallax, bolometric flux or
 * apparent bolometric magnitude, angular diameter}, each with a standard
 * uncertainty, derive all the others with first-order uncertainties, their
 * covariance and (when over-determined) a consistency report.
 *
 * The system comes first; luminosity, radius, distance and bolometric flux
 * are in that system (a CGS radius in an SI solve does not compile),
 * temperature and angles fit either, and the apparent bolometric magnitude is
 * a plain number in mag. Results come back typed in the same system.
 *
 * Model (see the kernel for the numerics): L = 4πR²σT⁴, f = L/(4πd²),
 * θ = 2R/d (small angle: the exact 2 asin(R/d) differs by (R/d)²/6 < 1e-15
 * for any star but the Sun), d = 1 au / p, f = f₀ 10^(−m_bol/2.5) (IAU 2015
 * B2). Linear in log space, so weighted least squares there is exact to
 * first order; values are the first-order (log-normal median) estimates.
 * Three independent inputs determine a star; the triples {L, R, T},
 * {L, d, f}, {R, d, θ} and {T, f, θ} do not (each satisfies one relation
 * internally), and the error says what to add.
 *
 * Source: Stefan–Boltzmann and inverse-square laws; constants CODATA 2018,
 * IAU 2015 B2/B3.
 *
 * @module
 */
import { show } from "../internal/checks";
import { BatchLog, type BatchResult } from "../law/batch";
import { lawInput, type LawInput } from "../law/input";
import { lawOutput, type LawOutput } from "../law/output";
import { kinds, type Kind } from "../quantity/aliases";
import type {
  Angle,
  AngleArray,
  Flux,
  FluxArray,
  Length,
  LengthArray,
  Power,
  PowerArray,
  Temperature,
  TemperatureArray,
} from "../quantity/aliases";
import type { Pure, SystemName } from "../quantity/quantity";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { PhotometryBatchReason } from "./kernels/common";
import {
  createStarBatchSolverSI,
  solveStarSI,
  starInputSufficiency,
  type MeasurementSI,
  type StarBatchOutputSI,
  type StarInputKindSI,
  type StarObservationsSI,
  type StarQuantitySI,
} from "./kernels/solver";

// ---- vocabulary ---------------------------------------------------------------

/** A measured value and its standard uncertainty, both of type `Q`. */
export interface Measurement<Q> {
  /** The measured value (> 0 for physical quantities; any finite number for a magnitude). */
  readonly value: Q;
  /** Standard uncertainty (> 0 for {@link solveStar}; ≥ 0 in a batch). */
  readonly sigma: Q;
}

/**
 * Measurements for {@link solveStar}: any subset; at least three independent
 * ones. Lengths, powers and fluxes are in system `S`.
 */
export interface StarObservations<S extends SystemName> {
  /** Effective temperature. */
  readonly temperature?: Measurement<Temperature>;
  /** Luminosity (W or erg s⁻¹). */
  readonly luminosity?: Measurement<Power<S>>;
  /** Radius. */
  readonly radius?: Measurement<Length<S>>;
  /** Distance. */
  readonly distance?: Measurement<Length<S>>;
  /** Trigonometric parallax (d = 1 au / p). */
  readonly parallax?: Measurement<Angle>;
  /** Bolometric flux (irradiance) at the observer. */
  readonly bolometricFlux?: Measurement<Flux<S>>;
  /** Apparent bolometric magnitude on the IAU 2015 B2 scale, mag (a plain number). */
  readonly apparentBolometricMagnitude?: Measurement<Pure>;
  /** Angular diameter. */
  readonly angularDiameter?: Measurement<Angle>;
}

/** Name of an observation accepted by the solver. */
export type StarObservationName = keyof StarObservations<SystemName>;

/** The six physical quantities of the solver, in the row/column order of its covariance matrices. */
export const STAR_QUANTITY_NAMES = ["temperature", "luminosity", "radius", "distance", "bolometricFlux", "angularDiameter"] as const;

/** One of {@link STAR_QUANTITY_NAMES}. */
export type StarQuantityName = (typeof STAR_QUANTITY_NAMES)[number];

const OBSERVATION_NAMES: readonly StarObservationName[] = [
  "temperature",
  "luminosity",
  "radius",
  "distance",
  "parallax",
  "bolometricFlux",
  "apparentBolometricMagnitude",
  "angularDiameter",
];

const KIND_OF: Readonly<Record<StarObservationName, StarInputKindSI>> = {
  temperature: "temperatureK",
  luminosity: "luminosityW",
  radius: "radiusM",
  distance: "distanceM",
  parallax: "parallaxRad",
  bolometricFlux: "bolometricFluxWm2",
  apparentBolometricMagnitude: "apparentBolometricMag",
  angularDiameter: "angularDiameterRad",
};

const NAME_OF_KIND = Object.fromEntries(Object.entries(KIND_OF).map(([n, k]) => [k, n])) as Record<StarInputKindSI, StarObservationName>;

/** What to add when a quantity is undetermined, in the caller's vocabulary. */
const REQUEST: Readonly<Record<StarQuantitySI, string>> = {
  temperatureK: "temperature",
  luminosityW: "luminosity",
  radiusM: "radius",
  distanceM: "distance (or parallax)",
  bolometricFluxWm2: "bolometricFlux (or apparentBolometricMagnitude)",
  angularDiameterRad: "angularDiameter",
};

/** Kind of each observation (a magnitude is a pure number, printed in mag). */
const KIND: Readonly<Record<StarObservationName, Kind>> = {
  temperature: kinds.temperature,
  luminosity: kinds.power,
  radius: kinds.length,
  distance: kinds.length,
  parallax: kinds.angle,
  bolometricFlux: kinds.flux,
  apparentBolometricMagnitude: kinds.dimensionless,
  angularDiameter: kinds.angle,
};

/** The checks of one observation: its value, its σ in {@link solveStar} (> 0) and its σ in a batch (≥ 0). */
interface ObservationInputs {
  readonly value: LawInput;
  readonly sigma: LawInput;
  readonly batchSigma: LawInput;
}

const INPUTS = Object.fromEntries(
  OBSERVATION_NAMES.map((name): [StarObservationName, ObservationInputs] => {
    const kind = KIND[name];
    const magnitude = name === "apparentBolometricMagnitude";
    const unit = magnitude ? { unit: "mag" } : {};
    return [
      name,
      {
        value: lawInput(`${name}.value`, kind, { check: magnitude ? "finite" : "positive", ...unit }),
        sigma: lawInput(`${name}.sigma`, kind, { check: "positive", ...unit }),
        batchSigma: lawInput(`${name}.sigma`, kind, { check: "nonNegative", ...unit }),
      },
    ];
  }),
) as Readonly<Record<StarObservationName, ObservationInputs>>;

/** Each derived quantity's move from SI into the caller's system. */
const OUTPUTS = Object.fromEntries(
  [...STAR_QUANTITY_NAMES, "parallax" as const].map((name): [StarQuantityName | "parallax", LawOutput] => [name, lawOutput(`derived ${name}`, KIND[name])]),
) as Readonly<Record<StarQuantityName | "parallax", LawOutput>>;

/** Decimal exponent of each of the six quantities' coherent unit over SI, per system (covariance rows and columns). */
const COVARIANCE_EXP10: Readonly<Record<SystemName, readonly number[]>> = {
  SI: STAR_QUANTITY_NAMES.map((n) => SI.exp10(KIND[n].dimension)),
  CGS: STAR_QUANTITY_NAMES.map((n) => CGS.exp10(KIND[n].dimension)),
};

/** Readable, parseable unit strings of each system's coherent units (for JSON and messages). */
const UNIT: Readonly<Record<SystemName, Readonly<Record<StarObservationName, string>>>> = {
  SI: {
    temperature: "K",
    luminosity: "W",
    radius: "m",
    distance: "m",
    parallax: "rad",
    bolometricFlux: "W m^-2",
    apparentBolometricMagnitude: "mag",
    angularDiameter: "rad",
  },
  CGS: {
    temperature: "K",
    luminosity: "erg s^-1",
    radius: "cm",
    distance: "cm",
    parallax: "rad",
    bolometricFlux: "erg s^-1 cm^-2",
    apparentBolometricMagnitude: "mag",
    angularDiameter: "rad",
  },
};

/** Throw a RangeError in the caller's vocabulary unless the observation names determine a star. */
function requireSufficient(names: readonly StarObservationName[]): void {
  const { rank, undetermined } = starInputSufficiency(names.map((n) => KIND_OF[n]));
  if (rank === 3) return;
  const free = undetermined.map((q) => NAME_OF_KIND[q]);
  const helpful = undetermined.map((q) => REQUEST[q]);
  const given = names.length === 0 ? "no observations" : names.join(", ");
  const deficit = 3 - rank;
  const need =
    deficit === 1
      ? `add ${helpful.length === 1 ? helpful[0]! : `one of: ${helpful.join("; ")}`}`
      : `add ${String(deficit)} more independent observations among: ${helpful.join("; ")}`;
  throw new RangeError(`under-determined star: cannot determine ${free.join(", ")} from ${given}; ${need}`);
}

// ---- scalar solve ---------------------------------------------------------------

/** A derived quantity in the caller's system. */
export interface Estimate<Q> {
  /** Best estimate: the weighted least-squares solution in log space (first order; the log-normal median). */
  readonly value: Q;
  /** First-order standard uncertainty. */
  readonly sigma: Q;
  /** σ / value (for the magnitudes: σ in mag). */
  readonly relativeSigma: number;
  /** True when this quantity (or its alias: parallax for distance, m_bol for flux, L for M_bol) was measured. */
  readonly measured: boolean;
}

/** Covariance of the six quantities, in the caller's system. */
export interface StarCovariance {
  /** Row/column order. */
  readonly order: readonly StarQuantityName[];
  /** Unit of each row's quantity in the caller's system (entry (i, j) is in units[i] × units[j]). */
  readonly units: readonly string[];
  /** 6 × 6 covariance of the quantities. */
  readonly matrix: number[][];
  /** 6 × 6 covariance of their natural logarithms (the same in every system). */
  readonly lnMatrix: number[][];
}

/** Consistency of an over-determined solve (all zeros and p = 1 when exactly determined). */
export interface StarConsistencyReport {
  /** Weighted sum of squared log-residuals. */
  readonly chi2: number;
  /** Degrees of freedom: number of observations − 3. */
  readonly dof: number;
  /** P(χ²_dof ≥ chi2). */
  readonly pValue: number;
  /** ln pValue, finite even when pValue underflows. */
  readonly lnPValue: number;
  /** Two-sided Gaussian-equivalent disagreement, in σ. */
  readonly sigma: number;
  /** Normalised residual (observed − fitted)/σ of each observation, in log space. */
  readonly pulls: Readonly<Partial<Record<StarObservationName, number>>>;
}

/** One estimate in plain JSON: numbers with their unit string. */
export interface EstimateJSON {
  /** Best estimate, in `unit`. */
  readonly value: number;
  /** First-order standard uncertainty, in `unit`. */
  readonly sigma: number;
  /** Unit of `value` and `sigma`, in the parser's grammar (`"erg s^-1"`, `"rad"`, `"mag"`). */
  readonly unit: string;
  /** σ / value (for the magnitudes: σ in mag). */
  readonly relativeSigma: number;
  /** True when this quantity (or its alias: parallax for distance, m_bol for flux, L for M_bol) was measured. */
  readonly measured: boolean;
}

/** The plain-JSON form of a {@link StarSolution} (what `JSON.stringify` writes). */
export interface StarSolutionJSON {
  /** The system of every unit string below: `"SI"` or `"CGS"`. */
  readonly system: SystemName;
  /** Effective temperature, K. */
  readonly temperature: EstimateJSON;
  /** Luminosity, `"W"` (SI) or `"erg s^-1"` (CGS). */
  readonly luminosity: EstimateJSON;
  /** Radius, `"m"` or `"cm"`. */
  readonly radius: EstimateJSON;
  /** Distance, `"m"` or `"cm"`. */
  readonly distance: EstimateJSON;
  /** Bolometric flux at the observer, `"W m^-2"` or `"erg s^-1 cm^-2"`. */
  readonly bolometricFlux: EstimateJSON;
  /** Angular diameter θ = 2R/d, rad. */
  readonly angularDiameter: EstimateJSON;
  /** Parallax 1 au / d, rad. */
  readonly parallax: EstimateJSON;
  /** Apparent bolometric magnitude (IAU 2015 B2), mag. */
  readonly apparentBolometricMagnitude: EstimateJSON;
  /** Absolute bolometric magnitude (IAU 2015 B2), mag. */
  readonly absoluteBolometricMagnitude: EstimateJSON;
  /** Covariance of the six quantities, in the units of `system`, and of their logarithms. */
  readonly covariance: StarCovariance;
  /** χ² consistency of the observations (chi2 = 0, dof = 0, p = 1 when exactly determined). */
  readonly consistency: StarConsistencyReport;
}

/** Result of {@link solveStar}, typed in the caller's system. */
export interface StarSolution<S extends SystemName> {
  /** The system of the solve: luminosity, radius, distance and bolometric flux are in it. */
  readonly system: S;
  /** Effective temperature (K in both systems). */
  readonly temperature: Estimate<Temperature>;
  /** Luminosity L = 4πR²σT⁴, in `S` (W or erg s⁻¹). */
  readonly luminosity: Estimate<Power<S>>;
  /** Radius, in `S` (m or cm). */
  readonly radius: Estimate<Length<S>>;
  /** Distance, in `S` (m or cm). */
  readonly distance: Estimate<Length<S>>;
  /** Bolometric flux at the observer f = L/(4πd²), in `S` (W m⁻² or erg s⁻¹ cm⁻²). */
  readonly bolometricFlux: Estimate<Flux<S>>;
  /** Angular diameter θ = 2R/d (rad in both systems). */
  readonly angularDiameter: Estimate<Angle>;
  /** Parallax 1 au / d. */
  readonly parallax: Estimate<Angle>;
  /** Apparent bolometric magnitude (IAU 2015 B2), mag. */
  readonly apparentBolometricMagnitude: Estimate<number>;
  /** Absolute bolometric magnitude (IAU 2015 B2), mag. */
  readonly absoluteBolometricMagnitude: Estimate<number>;
  /** Covariance of the six quantities, in `S`, and of their logarithms. */
  readonly covariance: StarCovariance;
  /** χ² consistency of the observations (chi2 = 0, dof = 0, p = 1 when exactly determined). */
  readonly consistency: StarConsistencyReport;
  /** Plain JSON (numbers with unit strings) for tools; `JSON.stringify(solution)` writes this. */
  toJSON(): StarSolutionJSON;
}

const plus0 = (x: number): number => x + 0; // JSON cannot keep −0

function validate(sys: UnitSystem<SystemName>, name: StarObservationName, m: Measurement<number>): MeasurementSI {
  if (typeof m !== "object" || m === null) throw new RangeError(`${name} must be { value, sigma }; got ${String(m)}`);
  const checks = INPUTS[name];
  // each checked in the caller's unit and moved to SI (a RangeError names the field, value and unit)
  const value = checks.value.toSI(sys, m.value);
  const sigma = checks.sigma.toSI(sys, m.sigma);
  if (name !== "apparentBolometricMagnitude" && !(m.sigma / m.value < Infinity)) {
    throw new RangeError(`${name}.sigma / ${name}.value is not a finite number (got ${show(m.sigma)} / ${show(m.value)}${checks.value.unitIn(sys)})`);
  }
  return { value, sigma };
}

/**
 * Solve for every stellar parameter from a sufficient set of typed
 * measurements, with first-order uncertainties, their covariance and a
 * consistency report.
 *
 * @param sys - `SI` or `CGS`: the system of the inputs and of the results
 * @param observations - measurements by name, each `{ value, sigma }` with σ > 0
 * @returns every quantity (value, σ, relative σ, measured flag), parallax and
 *   bolometric magnitudes, the 6 × 6 covariance, the χ² report, and `toJSON()`
 * @throws RangeError naming the observation (`bolometricFlux.sigma must be a
 *   finite number > 0 erg s^-1 cm^-2 …`, in the unit of `sys`); or, when the
 *   observations do not determine a star, naming what cannot be determined
 *   and which observations to add
 * @example
 * ```ts
 * import { SI, solveStar, units } from "starlume";
 * const star = solveStar(SI, {
 *   parallax: { value: SI.of(100, units.mas), sigma: SI.of(0.1, units.mas) },
 *   bolometricFlux: { value: SI.of(3.2e-9, units.W_per_m2), sigma: SI.of(0.05e-9, units.W_per_m2) },
 *   temperature: { value: SI.of(5800, units.K), sigma: SI.of(50, units.K) },
 * });
 * SI.valueIn(star.radius.value, units.Rsun); // ≈ 3.13 (L ≈ 10 L☉)
 * JSON.stringify(star); // plain numbers with unit strings
 * ```
 */
export function solveStar<S extends SystemName>(sys: UnitSystem<S>, observations: StarObservations<NoInfer<S>>): StarSolution<S> {
  if (typeof observations !== "object" || observations === null) {
    throw new RangeError(`observations must be an object of measurements; got ${String(observations)}`);
  }
  for (const key of Object.keys(observations)) {
    if (!OBSERVATION_NAMES.includes(key as StarObservationName)) {
      throw new RangeError(`unknown observation ${JSON.stringify(key)}; expected one of ${OBSERVATION_NAMES.join(", ")}`);
    }
  }
  const names: StarObservationName[] = [];
  const obsSI: Partial<Record<StarInputKindSI, MeasurementSI>> = {};
  for (const name of OBSERVATION_NAMES) {
    const m = (observations as Partial<Record<StarObservationName, Measurement<number>>>)[name];
    if (m === undefined) continue;
    obsSI[KIND_OF[name]] = validate(sys, name, m);
    names.push(name);
  }
  requireSufficient(names);
  const r = solveStarSI(obsSI as StarObservationsSI);

  const units = UNIT[sys.name];
  const estimate = (name: StarQuantityName | "parallax", q: { value: number; sigma: number; relativeSigma: number; measured: boolean }) => {
    const out = OUTPUTS[name];
    const value = out.fromSI(sys, q.value); // NaN when not finite in `sys`
    const sigma = out.fromSI(sys, q.sigma);
    if (!(value > 0) || !(sigma >= 0)) {
      throw new RangeError(`derived ${name} is not representable as a finite number > 0 ${units[name]}; inputs are out of the double-precision range`);
    }
    return { value, sigma, relativeSigma: q.relativeSigma, measured: q.measured };
  };
  const exps = COVARIANCE_EXP10[sys.name];
  const matrix = r.covariance.map((row, i) => row.map((c, j) => plus0(fromSIBoth(c, exps[i]!, exps[j]!))));
  for (const row of matrix) {
    for (const c of row) {
      if (!Number.isFinite(c)) throw new RangeError(`the covariance is not representable in ${sys.name}; inputs are out of the double-precision range`);
    }
  }
  const pulls: Partial<Record<StarObservationName, number>> = {};
  for (const [kind, v] of Object.entries(r.consistency.pulls) as [StarInputKindSI, number][]) pulls[NAME_OF_KIND[kind]] = plus0(v);

  const base = {
    system: sys.name,
    temperature: estimate("temperature", r.temperatureK),
    luminosity: estimate("luminosity", r.luminosityW),
    radius: estimate("radius", r.radiusM),
    distance: estimate("distance", r.distanceM),
    bolometricFlux: estimate("bolometricFlux", r.bolometricFluxWm2),
    angularDiameter: estimate("angularDiameter", r.angularDiameterRad),
    parallax: estimate("parallax", r.parallaxRad),
    apparentBolometricMagnitude: { ...r.apparentBolometricMag },
    absoluteBolometricMagnitude: { ...r.absoluteBolometricMag },
    covariance: {
      order: [...STAR_QUANTITY_NAMES],
      units: STAR_QUANTITY_NAMES.map((n) => units[n]),
      matrix,
      lnMatrix: r.lnCovariance.map((row) => row.map(plus0)),
    },
    consistency: {
      chi2: plus0(r.consistency.chi2),
      dof: r.consistency.dof,
      pValue: r.consistency.pValue,
      lnPValue: plus0(r.consistency.lnPValue),
      sigma: plus0(r.consistency.sigma),
      pulls,
    },
  };
  const toJSON = (): StarSolutionJSON => {
    const e = (name: StarObservationName | "absoluteBolometricMagnitude", q: { value: number; sigma: number; relativeSigma: number; measured: boolean }): EstimateJSON => ({
      value: plus0(q.value),
      sigma: plus0(q.sigma),
      unit: name === "absoluteBolometricMagnitude" ? "mag" : units[name],
      relativeSigma: plus0(q.relativeSigma),
      measured: q.measured,
    });
    return {
      system: base.system,
      temperature: e("temperature", base.temperature),
      luminosity: e("luminosity", base.luminosity),
      radius: e("radius", base.radius),
      distance: e("distance", base.distance),
      bolometricFlux: e("bolometricFlux", base.bolometricFlux),
      angularDiameter: e("angularDiameter", base.angularDiameter),
      parallax: e("parallax", base.parallax),
      apparentBolometricMagnitude: e("apparentBolometricMagnitude", base.apparentBolometricMagnitude),
      absoluteBolometricMagnitude: e("absoluteBolometricMagnitude", base.absoluteBolometricMagnitude),
      covariance: {
        order: [...base.covariance.order],
        units: [...base.covariance.units],
        matrix: base.covariance.matrix.map((row) => [...row]),
        lnMatrix: base.covariance.lnMatrix.map((row) => [...row]),
      },
      consistency: { ...base.consistency, pulls: { ...base.consistency.pulls } },
    };
  };
  return { ...base, toJSON } as unknown as StarSolution<S>;
}

/** c × 10^(−a) × 10^(−b): a covariance entry from SI into a system whose row and column exponents are a and b. */
function fromSIBoth(c: number, a: number, b: number): number {
  return times10(times10(c, -a), -b);
}

// ---- batch --------------------------------------------------------------------

/**
 * A `Float64Array` of pure numbers (magnitudes): a plain `Float64Array` or a
 * `DimensionlessArray`; a typed array of angles, lengths, … is rejected.
 */
export type PureArray = Float64Array & { readonly [K in Exclude<keyof Pure, keyof number>]?: Pure[K] };

/** The typed-array type of a batch column for an observation name. */
export type StarBatchColumnArray<N extends StarObservationName, S extends SystemName> = N extends "temperature"
  ? TemperatureArray
  : N extends "luminosity"
    ? PowerArray<S>
    : N extends "radius" | "distance"
      ? LengthArray<S>
      : N extends "parallax" | "angularDiameter"
        ? AngleArray
        : N extends "bolometricFlux"
          ? FluxArray<S>
          : N extends "apparentBolometricMagnitude"
            ? PureArray
            : never;

/** One input column of a batch: values and standard uncertainties (≥ 0), same length. */
export interface StarBatchColumn<A> {
  /** One measured value per row (a row whose value is invalid is written as NaN with a reason code). */
  readonly values: A;
  /** One standard uncertainty per row (≥ 0; 0 is allowed and contributes no uncertainty). */
  readonly sigmas: A;
}

/** Batch input: one column per observation name the solver was built for. */
export type StarBatchInput<S extends SystemName, N extends StarObservationName> = {
  readonly [K in N]: StarBatchColumn<StarBatchColumnArray<K, S>>;
};

/** Output columns of a batch solve, in system `S` (value and σ of each quantity) plus per-row reason codes. */
export interface StarBatchColumns<S extends SystemName> {
  /** Effective temperature per row (K in both systems). */
  readonly temperature: TemperatureArray;
  /** First-order standard uncertainty of `temperature`. */
  readonly sigmaTemperature: TemperatureArray;
  /** Luminosity per row, in `S` (W or erg s⁻¹). */
  readonly luminosity: PowerArray<S>;
  /** First-order standard uncertainty of `luminosity`. */
  readonly sigmaLuminosity: PowerArray<S>;
  /** Radius per row, in `S` (m or cm). */
  readonly radius: LengthArray<S>;
  /** First-order standard uncertainty of `radius`. */
  readonly sigmaRadius: LengthArray<S>;
  /** Distance per row, in `S` (m or cm). */
  readonly distance: LengthArray<S>;
  /** First-order standard uncertainty of `distance`. */
  readonly sigmaDistance: LengthArray<S>;
  /** Bolometric flux at the observer per row, in `S` (W m⁻² or erg s⁻¹ cm⁻²). */
  readonly bolometricFlux: FluxArray<S>;
  /** First-order standard uncertainty of `bolometricFlux`. */
  readonly sigmaBolometricFlux: FluxArray<S>;
  /** Angular diameter θ = 2R/d per row (rad in both systems). */
  readonly angularDiameter: AngleArray;
  /** First-order standard uncertainty of `angularDiameter`. */
  readonly sigmaAngularDiameter: AngleArray;
  /** One {@link StarBatchReason} code per row (0 = OK). */
  readonly reason: Uint8Array;
}

/** Caller-supplied output columns: any subset of {@link StarBatchColumns}; only those are written. */
export type StarBatchOutput<S extends SystemName> = Partial<StarBatchColumns<S>>;

/**
 * Result of a batch solve: the one batch contract of starlume
 * ({@link BatchResult}: `values`, `invalid` ascending, `reasons` aligned with
 * it), plus the per-row reason codes. Nothing is dropped: every input row has
 * an output row, NaN in every written column when invalid.
 */
export interface StarBatchResult<V = StarBatchOutput<SystemName>> extends BatchResult<V> {
  /** The output columns written (with `reason`). */
  readonly values: V;
  /** Ascending indices of the rows whose reason is not OK; empty when every row is valid. */
  readonly invalid: number[];
  /** `reasons[k]` says why row `invalid[k]` is invalid, naming the field, its value and the caller's unit. */
  readonly reasons: string[];
  /** One {@link StarBatchReason} code per row (0 = OK). */
  readonly reason: Uint8Array;
}

/**
 * Per-row reason codes of batch solves: `OK` 0, `NON_FINITE` 1 (a value or σ
 * is NaN or ±∞), `NON_POSITIVE` 2 (a value that must be > 0 is not),
 * `NEGATIVE_UNCERTAINTY` 3, `RESULT_OUT_OF_RANGE` 4 (valid input, but a
 * result is not a finite positive double in the caller's system).
 */
export const StarBatchReason = PhotometryBatchReason;

/** A typed batch solver for a fixed set of three observation names. */
export interface StarBatchSolver<S extends SystemName, N extends StarObservationName> {
  /** The system of every input and output column (`"SI"` or `"CGS"`). */
  readonly system: S;
  /** The observation names, in the order given. */
  readonly inputs: readonly N[];
  /**
   * Solve every row into newly allocated columns (all six quantities with σ).
   * Never throws mid-array.
   * @throws RangeError only for a missing input column or mismatched lengths, before any row is written
   */
  solve(input: StarBatchInput<S, N>): StarBatchColumns<S> & StarBatchResult<StarBatchColumns<S>>;
  /**
   * Solve every row into the caller's output columns (only those given are
   * written; `reason` is allocated when not given). Never throws mid-array.
   * @throws RangeError only for a missing input column or mismatched lengths, before any row is written
   */
  solve(input: StarBatchInput<S, N>, output: StarBatchOutput<S>): StarBatchResult<StarBatchOutput<S>>;
}

const OUTPUT_KEYS: readonly (readonly [keyof StarBatchColumns<SystemName>, keyof StarBatchOutputSI, StarQuantityName])[] = [
  ["temperature", "temperatureK", "temperature"],
  ["sigmaTemperature", "sigmaTemperatureK", "temperature"],
  ["luminosity", "luminosityW", "luminosity"],
  ["sigmaLuminosity", "sigmaLuminosityW", "luminosity"],
  ["radius", "radiusM", "radius"],
  ["sigmaRadius", "sigmaRadiusM", "radius"],
  ["distance", "distanceM", "distance"],
  ["sigmaDistance", "sigmaDistanceM", "distance"],
  ["bolometricFlux", "bolometricFluxWm2", "bolometricFlux"],
  ["sigmaBolometricFlux", "sigmaBolometricFluxWm2", "bolometricFlux"],
  ["angularDiameter", "angularDiameterRad", "angularDiameter"],
  ["sigmaAngularDiameter", "sigmaAngularDiameterRad", "angularDiameter"],
];

/**
 * Build a typed batch solver for catalogues in which every star has the
 * same three independent observations (e.g. parallax, bolometric flux and
 * temperature). Columns are `Float64Array`s typed as quantity arrays in
 * `sys` (magnitudes: plain `Float64Array`s). Each output is a product of
 * powers of the inputs, evaluated without a log/exp round trip (a few ulp);
 * σ is first order with independent inputs, and σ = 0 inputs are allowed.
 * Never throws part-way (the one batch contract, {@link BatchResult}): an
 * invalid row is written as NaN, listed in `invalid` (ascending) with the
 * sentence its scalar form would throw in `reasons` (in the caller's unit),
 * and keeps a reason code in `reason`; nothing is dropped. Every valid row
 * costs nothing extra: reasons are written only when a row is invalid.
 * In SI the kernel reads and writes the caller's arrays directly; in CGS the
 * system-dependent inputs are copied to SI and the outputs converted in place.
 * The common set {parallax, bolometricFlux, temperature} runs a specialised
 * loop.
 *
 * @param sys - `SI` or `CGS`
 * @param inputs - three distinct observation names that determine a star
 * @returns the solver
 * @throws RangeError for unknown or repeated names, or when the three do not
 *   determine a star (naming what is missing)
 * @example
 * ```ts
 * import { SI, createStarBatchSolver, units } from "starlume";
 * const solver = createStarBatchSolver(SI, ["parallax", "bolometricFlux", "temperature"]);
 * const out = solver.solve({
 *   parallax: { values: SI.arrayOf([100, 5, -1], units.mas), sigmas: SI.arrayOf([0.1, 0.1, 0.1], units.mas) },
 *   bolometricFlux: { values: SI.arrayOf([3.2e-9, 1e-11, 1e-11], units.W_per_m2), sigmas: SI.arrayOf([5e-11, 1e-13, 1e-13], units.W_per_m2) },
 *   temperature: { values: SI.arrayOf([5800, 4500, 4500], units.K), sigmas: SI.arrayOf([50, 80, 80], units.K) },
 * });
 * out.invalid; // [2] (its outputs NaN, out.reason[2] === StarBatchReason.NON_POSITIVE)
 * out.reasons; // ["parallax.value must be a finite number > 0 rad; got -4.848…e-9"]
 * SI.arrayIn(out.radius, units.Rsun); // [≈ 3.13, ≈ 5.82, NaN]
 * ```
 */
export function createStarBatchSolver<S extends SystemName, const N extends StarObservationName>(
  sys: UnitSystem<S>,
  inputs: readonly [N, N, N],
): StarBatchSolver<S, N> {
  if (!Array.isArray(inputs) || inputs.length !== 3) {
    throw new RangeError(`inputs must list exactly 3 observation names; got ${String(inputs)}`);
  }
  for (const n of inputs) {
    if (!OBSERVATION_NAMES.includes(n)) {
      throw new RangeError(`unknown observation ${JSON.stringify(n)}; expected one of ${OBSERVATION_NAMES.join(", ")}`);
    }
  }
  if (new Set(inputs).size !== 3) throw new RangeError(`inputs must be 3 distinct observation names; got ${inputs.join(", ")}`);
  requireSufficient(inputs);
  const names = [inputs[0], inputs[1], inputs[2]] as const;
  const kernelSolver = createStarBatchSolverSI([KIND_OF[names[0]], KIND_OF[names[1]], KIND_OF[names[2]]]);
  const checks = names.map((n) => INPUTS[n]);
  const inSI = sys.name === "SI";

  function solve(input: StarBatchInput<S, N>): StarBatchColumns<S> & StarBatchResult<StarBatchColumns<S>>;
  function solve(input: StarBatchInput<S, N>, output: StarBatchOutput<S>): StarBatchResult<StarBatchOutput<S>>;
  function solve(input: StarBatchInput<S, N>, output?: StarBatchOutput<S>): StarBatchResult<StarBatchOutput<S>> {
    const cols = names.map((n) => {
      const c = (input as Partial<Record<StarObservationName, StarBatchColumn<Float64Array>>>)[n];
      if (c === undefined || !(c.values instanceof Float64Array) || !(c.sigmas instanceof Float64Array)) {
        throw new RangeError(`input.${n} must be { values: Float64Array, sigmas: Float64Array }`);
      }
      return c;
    });
    const n = cols[0]!.values.length;
    // In SI the kernel reads the caller's arrays; in CGS the dimensioned columns are copied to SI
    // (unchecked: the kernel's own row checks then give each bad row its code).
    const values = cols.map((c, k) => (inSI ? c.values : copyToSI(c.values, checks[k]!.value)));
    const sigmas = cols.map((c, k) => (inSI ? c.sigmas : copyToSI(c.sigmas, checks[k]!.value)));
    const out: Partial<Record<keyof StarBatchColumns<SystemName>, Float64Array | Uint8Array>> =
      output === undefined ? Object.fromEntries(OUTPUT_KEYS.map(([k]) => [k, new Float64Array(n)])) : { ...output };
    const reason = out.reason instanceof Uint8Array ? out.reason : new Uint8Array(n);
    out.reason = reason;
    const outSI: Record<string, Float64Array | Uint8Array> = { reason };
    for (const [k, kk] of OUTPUT_KEYS) {
      const a = out[k];
      if (a !== undefined) outSI[kk] = a;
    }
    let count = kernelSolver.solve(
      { values: [values[0]!, values[1]!, values[2]!], sigmas: [sigmas[0]!, sigmas[1]!, sigmas[2]!] },
      outSI as unknown as StarBatchOutputSI,
    );
    let overflowed: Map<number, StarQuantityName> | undefined;
    if (!inSI) {
      overflowed = new Map();
      count += toSystemInPlace(sys, out, reason, overflowed);
    }
    // the common case (every row valid) costs one comparison
    const log = count === 0 ? { invalid: [], reasons: [] } : batchReasons(sys, names, cols, values, reason, overflowed);
    const result: StarBatchResult<StarBatchOutput<S>> = { values: out as StarBatchOutput<S>, invalid: log.invalid, reasons: log.reasons, reason };
    return output === undefined ? { ...out, ...result } : result;
  }

  return { system: sys.name, inputs: names, solve };
}

/** A caller's column in CGS copied to SI by the input's exact power of ten (no checks; pure numbers are shared). */
function copyToSI(column: Float64Array, input: LawInput): Float64Array {
  const scale = input.cgs;
  if (scale.exp10 === 0) return column;
  const out = new Float64Array(column.length);
  for (let i = 0; i < column.length; i++) out[i] = scale.apply(column[i]!);
  return out;
}

/**
 * The invalid rows of a batch, ascending, each with the sentence its scalar
 * form would throw (run only when some row is invalid): the first field that
 * fails the check its code names, in the caller's unit; or, for a result out
 * of range, the quantity (when known) and the row's inputs.
 */
function batchReasons(
  sys: UnitSystem<SystemName>,
  names: readonly StarObservationName[],
  cols: readonly StarBatchColumn<Float64Array>[],
  valuesSI: readonly Float64Array[],
  reason: Uint8Array,
  overflowed: Map<number, StarQuantityName> | undefined,
): { invalid: number[]; reasons: string[] } {
  const log = new BatchLog();
  for (let i = 0; i < reason.length; i++) {
    const code = reason[i]!;
    if (code !== PhotometryBatchReason.OK) log.add(i, rowReason(sys, names, cols, valuesSI, i, code, overflowed?.get(i)));
  }
  return log;
}

function rowReason(
  sys: UnitSystem<SystemName>,
  names: readonly StarObservationName[],
  cols: readonly StarBatchColumn<Float64Array>[],
  valuesSI: readonly Float64Array[],
  i: number,
  code: number,
  quantity: StarQuantityName | undefined,
): string {
  for (let k = 0; k < names.length; k++) {
    const checks = INPUTS[names[k]!];
    const v = cols[k]!.values[i]!;
    const s = cols[k]!.sigmas[i]!;
    if (code === PhotometryBatchReason.NON_FINITE) {
      if (!(v - v === 0)) return checks.value.reason(sys, v);
      if (!(s - s === 0)) return checks.batchSigma.reason(sys, s);
    } else if (code === PhotometryBatchReason.NON_POSITIVE) {
      // a caller's value that passes may still leave the double range once in SI: reason() says so
      if (checks.value.check === "positive" && !(valuesSI[k]![i]! > 0)) return checks.value.reason(sys, v);
    } else if (code === PhotometryBatchReason.NEGATIVE_UNCERTAINTY) {
      if (s < 0) return checks.batchSigma.reason(sys, s);
    }
  }
  const args = names
    .map((name, k) => {
      const checks = INPUTS[name];
      return `${name}.value=${show(cols[k]!.values[i]!)}${checks.value.unitIn(sys)}, ${name}.sigma=${show(cols[k]!.sigmas[i]!)}${checks.value.unitIn(sys)}`;
    })
    .join(", ");
  return quantity === undefined
    ? `a derived quantity or its σ is not representable as a finite double in ${sys.name} for ${args}; inputs are out of the double-precision range`
    : `derived ${quantity} is not representable as a finite number > 0 ${UNIT[sys.name][quantity]} for ${args}; inputs are out of the double-precision range`;
}

/**
 * Convert SI output columns to `sys` in place (each by its quantity's exact
 * power of ten); a valid row whose converted value overflows becomes
 * RESULT_OUT_OF_RANGE with NaN in every column, and `overflowed` records the
 * first quantity that did. Returns the number of rows newly made invalid.
 */
function toSystemInPlace(
  sys: UnitSystem<SystemName>,
  out: Partial<Record<keyof StarBatchColumns<SystemName>, Float64Array | Uint8Array>>,
  reason: Uint8Array,
  overflowed: Map<number, StarQuantityName>,
): number {
  const present: Float64Array[] = [];
  let added = 0;
  for (const [k, , q] of OUTPUT_KEYS) {
    const a = out[k] as Float64Array | undefined;
    if (a === undefined) continue;
    present.push(a);
    const o = OUTPUTS[q];
    for (let i = 0; i < a.length; i++) {
      const v = a[i]!;
      if (reason[i] !== PhotometryBatchReason.OK) continue;
      const c = o.fromSI(sys, v); // NaN when not finite in `sys`
      a[i] = c;
      if (!(c >= 0)) {
        reason[i] = PhotometryBatchReason.RESULT_OUT_OF_RANGE;
        overflowed.set(i, q);
        added++;
      }
    }
  }
  if (added > 0) {
    for (let i = 0; i < reason.length; i++) {
      if (overflowed.has(i)) for (const a of present) a[i] = NaN;
    }
  }
  return added;
}
