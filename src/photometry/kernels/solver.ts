/**
 * Stellar-parameter solver: from any sufficient, consistent subset of
 * {effective temperature T, luminosity L, radius R, distance d (or parallax p),
 * bolometric flux f (or apparent bolometric magnitude m_bol), angular
 * diameter θ}, each with a standard uncertainty, derive all the others with
 * first-order uncertainties and their full covariance.
 *
 * ## Model
 * Three relations tie the six quantities (SI units throughout):
 *
 * 1. L = 4π R² σ T⁴ (Stefan–Boltzmann; σ from CODATA 2018 via `values.ts`)
 * 2. f = L / (4π d²) (inverse square, isotropic emitter, no extinction)
 * 3. θ = 2R / d (small-angle angular diameter; the exact sphere form
 *    2 asin(R/d) differs by a relative (R/d)²/6, < 1e-15 for every star seen
 *    from outside ~10⁷ stellar radii, i.e. all stars but the Sun)
 *
 * (f = (θ/2)² σ T⁴ follows.) Each is a product of powers, so in
 * ln-quantities they are linear. With the free parameters
 * z = (ln T, ln R, ln d):
 *
 *   ln T = z₁, ln R = z₂, ln d = z₃,
 *   ln L = ln 4πσ + 4z₁ + 2z₂,
 *   ln f = ln σ + 4z₁ + 2z₂ − 2z₃,
 *   ln θ = ln 2 + z₂ − z₃.
 *
 * A measured x ± σₓ is taken as ln x with standard uncertainty σₓ/x (first
 * order); a parallax as ln d = ln(1 au) − ln p with σ_p/p (d = 1 au / p, the
 * small-angle form); an apparent bolometric magnitude as
 * ln f = ln f₀ − (ln 10 / 2.5) m_bol with (ln 10 / 2.5) σ_m (IAU 2015 B2).
 *
 * ## Estimation
 * z is the weighted least-squares solution (weights 1/σ²_ln), computed by a
 * Householder QR factorisation of the weighted design matrix (no normal
 * equations, so widely different uncertainties do not square the condition
 * number). Because the model is linear in log space its Jacobian is constant,
 * so the covariance Cov(z) = (AᵀA)⁻¹ and Cov(ln q) = M Cov(z) Mᵀ propagate
 * the input covariance exactly to first order; correlations between outputs
 * that share an input are carried in the returned 6 × 6 matrices (of ln q and
 * of q, the latter Cov(qᵢ, qⱼ) = qᵢ qⱼ Cov(ln qᵢ, ln qⱼ)). Reported values are
 * exp(ln q̂) — the first-order estimate (the median of a log-normal, not its
 * mean; the difference is second order in the relative errors).
 *
 * - Exactly determined (3 independent inputs): z = M_S⁻¹ y with the exact
 *   inverse of the small-integer 3 × 3 matrix (weights cancel), Cov(z) =
 *   M_S⁻¹ diag(σ²) M_S⁻ᵀ; the inputs are reproduced (to ~1e-14) and χ² = 0.
 * - Numerics: quantities are scaled by reference units (T☉ᴺ, R☉ᴺ, 1 pc and the
 *   L, f, θ these imply) before taking logs, so |ln x′| stays small and the
 *   log/exp round trip costs ≲ 1e-14 relative.
 * - Under-determined (rank < 3): a `RangeError` names the quantities that
 *   cannot be determined and the inputs that would fix it.
 * - Over-determined: the solution is the weighted least-squares compromise,
 *   NOT a silent overwrite: `consistency` reports χ² of the weighted
 *   residuals, the degrees of freedom, the p-value, the two-sided
 *   Gaussian-equivalent disagreement in sigma, and each input's normalised
 *   residual (pull).
 *
 * Not every triple is sufficient: {L, R, T}, {L, d, f}, {R, d, θ} and
 * {T, f, θ} each satisfy one relation internally and leave a direction free.
 *
 * @module
 */
import { AU, F0, L0, PARSEC, R_SUN, SIGMA, T_SUN } from "../../values/constants";
import { requireFinite, requirePositive } from "../../internal/checks";
import { chiSquareLogSurvival, sigmaFromLogTailProbability } from "./chi-square";
import { PhotometryBatchReason } from "./common";

/** The six physical quantities of the solver, in the order used by its covariance matrices. */
export const STAR_QUANTITIES = [
  "temperatureK",
  "luminosityW",
  "radiusM",
  "distanceM",
  "bolometricFluxWm2",
  "angularDiameterRad",
] as const;

/** One of the six solver quantities, named with their SI unit: `"temperatureK"`, `"luminosityW"`, `"radiusM"`, `"distanceM"`, `"bolometricFluxWm2"`, `"angularDiameterRad"`. */
export type StarQuantitySI = (typeof STAR_QUANTITIES)[number];

/** Kinds of input the solver accepts (the six quantities plus parallax and apparent bolometric magnitude). */
export type StarInputKindSI = StarQuantitySI | "parallaxRad" | "apparentBolometricMag";

/** A measured value and its standard uncertainty, in the unit named by the field it is stored under. */
export interface MeasurementSI {
  /** Value (T in K, L in W, R in m, d in m, p in rad, f in W m^-2, m_bol in mag, θ in rad). */
  readonly value: number;
  /** Standard uncertainty, same unit, > 0 (use a tiny one for a value known exactly). */
  readonly sigma: number;
}

/** Inputs to {@link solveStarSI}: any subset; at least three independent ones are needed. */
export interface StarObservationsSI {
  readonly temperatureK?: MeasurementSI;
  readonly luminosityW?: MeasurementSI;
  readonly radiusM?: MeasurementSI;
  readonly distanceM?: MeasurementSI;
  readonly parallaxRad?: MeasurementSI;
  readonly bolometricFluxWm2?: MeasurementSI;
  readonly apparentBolometricMag?: MeasurementSI;
  readonly angularDiameterRad?: MeasurementSI;
}

/** A derived quantity: value, first-order standard uncertainty, and whether it was also an input. */
export interface DerivedQuantitySI {
  /** Best estimate, in the unit named by the field (K, W, m, W m⁻², rad or mag): exp of the least-squares ln q (the first-order, log-normal median value); the magnitudes follow from it. */
  readonly value: number;
  /** First-order standard uncertainty, same unit as `value`. */
  readonly sigma: number;
  /** σ / |value| (for the magnitudes: σ in mag). */
  readonly relativeSigma: number;
  /** True when this quantity (or its alias: parallax for distance, m_bol for flux) was among the inputs. */
  readonly measured: boolean;
}

/** Consistency report of an over-determined solve. */
export interface StarConsistencySI {
  /** Weighted sum of squared log-residuals χ² (0 when exactly determined). */
  readonly chi2: number;
  /** Degrees of freedom = number of inputs − 3. */
  readonly dof: number;
  /** P(χ²_dof ≥ chi2); 1 when dof = 0. */
  readonly pValue: number;
  /** Natural log of pValue (finite even when pValue underflows to 0). */
  readonly lnPValue: number;
  /** Two-sided Gaussian-equivalent disagreement: erfc(sigma/√2) = pValue (= √χ² when dof = 1). */
  readonly sigma: number;
  /** Normalised residual (input − fitted)/σ in log space, per input kind. */
  readonly pulls: Readonly<Partial<Record<StarInputKindSI, number>>>;
}

/** Result of {@link solveStarSI}; plain JSON (numbers, booleans, strings, arrays). */
export interface StarSolutionSI {
  /** Effective temperature, K. */
  readonly temperatureK: DerivedQuantitySI;
  /** Luminosity L = 4πR²σT⁴, W. */
  readonly luminosityW: DerivedQuantitySI;
  /** Radius, m. */
  readonly radiusM: DerivedQuantitySI;
  /** Distance, m. */
  readonly distanceM: DerivedQuantitySI;
  /** Bolometric flux at the observer f = L/(4πd²), W m⁻². */
  readonly bolometricFluxWm2: DerivedQuantitySI;
  /** Angular diameter θ = 2R/d, rad. */
  readonly angularDiameterRad: DerivedQuantitySI;
  /** Parallax 1 au / d, rad. */
  readonly parallaxRad: DerivedQuantitySI;
  /** Apparent bolometric magnitude (IAU 2015 B2), mag. */
  readonly apparentBolometricMag: DerivedQuantitySI;
  /** Absolute bolometric magnitude (IAU 2015 B2), mag. */
  readonly absoluteBolometricMag: DerivedQuantitySI;
  /** Row/column order of the covariance matrices. */
  readonly quantities: readonly StarQuantitySI[];
  /** 6 × 6 covariance of the ln quantities (dimensionless). */
  readonly lnCovariance: number[][];
  /** 6 × 6 covariance of the quantities in SI units (products of the row and column units). */
  readonly covariance: number[][];
  /** χ² consistency of the inputs (chi2 = 0, dof = 0, p = 1 when exactly determined). */
  readonly consistency: StarConsistencySI;
}

// ---- model tables -----------------------------------------------------------

/**
 * Reference units. Working in x′ = x / x_ref with
 * T_ref = T☉ᴺ, R_ref = R☉ᴺ, d_ref = 1 pc, L_ref = 4πσ R_ref² T_ref⁴,
 * f_ref = L_ref / (4π d_ref²), θ_ref = 2 R_ref / d_ref
 * turns the three relations into pure products of powers with unit
 * coefficients (L′ = R′² T′⁴, f′ = L′ / d′², θ′ = R′ / d′), and keeps the
 * ln-values small (|ln x′| ≲ 30 for real stars) so the log/exp round trip
 * loses little precision.
 */
const T_REF = T_SUN;
const R_REF = R_SUN;
const D_REF = PARSEC;
const L_REF = 4 * Math.PI * SIGMA * R_REF * R_REF * T_REF ** 4;
const F_REF = L_REF / (4 * Math.PI * D_REF * D_REF);
const THETA_REF = (2 * R_REF) / D_REF;
/** x_ref for the six quantities, in STAR_QUANTITIES order. */
const REFS: readonly number[] = [T_REF, L_REF, R_REF, D_REF, F_REF, THETA_REF];
/** d′ = (1 au / 1 pc) / p = (π/648000) / p with p in rad (IAU 2015 B2 parsec). */
const ARCSEC_RAD = Math.PI / 648000;
const LN_ARCSEC = Math.log(ARCSEC_RAD);
/** f₀ / f_ref, so that f′ = (f₀/f_ref) 10^(−m_bol/2.5). */
const F0_SCALED = F0 / F_REF;
const LN_F0_SCALED = Math.log(F0_SCALED);
/** d ln f / d m_bol = −ln 10 / 2.5. */
const MAG_TO_LN = Math.LN10 / 2.5;

/** Rows of M (d ln q / dz) and offsets c for the six quantities, in STAR_QUANTITIES order. */
const M_ROWS: readonly (readonly [number, number, number])[] = [
  [1, 0, 0], // ln T
  [4, 2, 0], // ln L
  [0, 1, 0], // ln R
  [0, 0, 1], // ln d
  [4, 2, -2], // ln f
  [0, 1, -1], // ln θ
];

interface KindInfo {
  readonly quantity: number; // index into STAR_QUANTITIES
  readonly name: string; // for messages
  readonly unit: string;
  readonly positive: boolean; // value must be > 0
}

const KINDS: Readonly<Record<StarInputKindSI, KindInfo>> = {
  temperatureK: { quantity: 0, name: "temperature", unit: "K", positive: true },
  luminosityW: { quantity: 1, name: "luminosity", unit: "W", positive: true },
  radiusM: { quantity: 2, name: "radius", unit: "m", positive: true },
  distanceM: { quantity: 3, name: "distance", unit: "m", positive: true },
  parallaxRad: { quantity: 3, name: "parallax", unit: "rad", positive: true },
  bolometricFluxWm2: { quantity: 4, name: "bolometric flux", unit: "W m^-2", positive: true },
  apparentBolometricMag: { quantity: 4, name: "apparent bolometric magnitude", unit: "mag", positive: false },
  angularDiameterRad: { quantity: 5, name: "angular diameter", unit: "rad", positive: true },
};

const INPUT_ORDER: readonly StarInputKindSI[] = [
  "temperatureK",
  "luminosityW",
  "radiusM",
  "distanceM",
  "parallaxRad",
  "bolometricFluxWm2",
  "apparentBolometricMag",
  "angularDiameterRad",
];

/** What to ask for when a quantity's direction is missing (aliases grouped). */
const QUANTITY_REQUEST: readonly string[] = [
  "a temperature",
  "a luminosity",
  "a radius",
  "a distance or parallax",
  "a bolometric flux or apparent bolometric magnitude",
  "an angular diameter",
];
const QUANTITY_NAME: readonly string[] = ["temperature", "luminosity", "radius", "distance", "bolometric flux", "angular diameter"];

/** Scaled ln-value ln x′ and ln-uncertainty of a measurement of a given kind (no validation). */
function lnOf(kind: StarInputKindSI, value: number, sigma: number, out: Float64Array): void {
  if (kind === "parallaxRad") {
    out[0] = LN_ARCSEC - Math.log(value);
    out[1] = sigma / value;
  } else if (kind === "apparentBolometricMag") {
    out[0] = LN_F0_SCALED - MAG_TO_LN * value;
    out[1] = MAG_TO_LN * sigma;
  } else {
    out[0] = Math.log(value / REFS[KINDS[kind].quantity]!);
    out[1] = sigma / value;
  }
}

// ---- small dense linear algebra ----------------------------------------------

/** Rank of a set of 3-vectors with small integer entries (exact elimination in doubles). */
function rankOf(rows: readonly (readonly number[])[]): number {
  const m = rows.map((r) => [r[0] ?? 0, r[1] ?? 0, r[2] ?? 0]);
  let rank = 0;
  for (let col = 0; col < 3 && rank < m.length; col++) {
    let piv = -1;
    let best = 1e-9;
    for (let i = rank; i < m.length; i++) {
      const v = Math.abs(m[i]![col]!);
      if (v > best) {
        best = v;
        piv = i;
      }
    }
    if (piv < 0) continue;
    const tmp = m[piv]!;
    m[piv] = m[rank]!;
    m[rank] = tmp;
    const p = tmp[col]!;
    for (let i = rank + 1; i < m.length; i++) {
      const row = m[i]!;
      const fct = row[col]! / p;
      for (let c = col; c < 3; c++) row[c] = row[c]! - fct * tmp[c]!;
    }
    rank++;
  }
  return rank;
}

/** What a set of input kinds determines: see {@link starInputSufficiency}. */
export interface StarInputSufficiency {
  /** Rank of the inputs' rows in the 3-parameter model (3 = sufficient). */
  readonly rank: number;
  /** Quantities whose value the inputs leave free (empty when sufficient); adding any one of them (or its alias) raises the rank. */
  readonly undetermined: readonly StarQuantitySI[];
}

/**
 * Whether a set of input kinds determines the star, and if not which of the
 * six quantities are left free. {@link solveStarSI} and
 * {@link createStarBatchSolverSI} throw the corresponding message; typed
 * wrappers use this to phrase it in their own vocabulary.
 *
 * @param kinds - input kinds (repeats allowed)
 * @returns the rank and the undetermined quantities
 * @example
 * ```ts
 * import { starInputSufficiency } from "./solver";
 * starInputSufficiency(["luminosityW", "radiusM", "temperatureK"]).undetermined; // ["distanceM", "bolometricFluxWm2", "angularDiameterRad"]
 * ```
 */
export function starInputSufficiency(kinds: readonly StarInputKindSI[]): StarInputSufficiency {
  const rows = kinds.map((k) => M_ROWS[KINDS[k].quantity]!);
  const rank = rankOf(rows);
  const undetermined: StarQuantitySI[] = [];
  if (rank < 3) {
    for (let q = 0; q < 6; q++) if (rankOf([...rows, M_ROWS[q]!]) > rank) undetermined.push(STAR_QUANTITIES[q]!);
  }
  return { rank, undetermined };
}

/** Throw a RangeError naming what is missing unless the kinds determine z. */
function requireSufficient(kinds: readonly StarInputKindSI[]): void {
  const { rank, undetermined: free } = starInputSufficiency(kinds);
  if (rank === 3) return;
  const undetermined: string[] = [];
  const helpful: string[] = [];
  for (const name of free) {
    const q = STAR_QUANTITIES.indexOf(name);
    undetermined.push(QUANTITY_NAME[q]!);
    helpful.push(QUANTITY_REQUEST[q]!);
  }
  const given = kinds.length === 0 ? "no inputs" : kinds.map((k) => KINDS[k].name).join(", ");
  const deficit = 3 - rank;
  const need =
    deficit === 1
      ? `need ${joinOr(helpful)}`
      : `need ${String(deficit)} more independent inputs among: ${helpful.join("; ")}`;
  throw new RangeError(`under-determined star: cannot determine ${undetermined.join(", ")} from ${given}; ${need}`);
}

function joinOr(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} or ${items[items.length - 1]!}`;
}

/** Inverse of a 3 × 3 matrix given by rows (cofactors; exact for the solver's small-integer matrices up to one division). */
function inverse3(rows: readonly (readonly [number, number, number])[]): Float64Array {
  const [m00, m01, m02] = rows[0]!;
  const [m10, m11, m12] = rows[1]!;
  const [m20, m21, m22] = rows[2]!;
  const det = m00 * (m11 * m22 - m12 * m21) - m01 * (m10 * m22 - m12 * m20) + m02 * (m10 * m21 - m11 * m20);
  return Float64Array.of(
    (m11 * m22 - m12 * m21) / det, (m02 * m21 - m01 * m22) / det, (m01 * m12 - m02 * m11) / det,
    (m12 * m20 - m10 * m22) / det, (m00 * m22 - m02 * m20) / det, (m02 * m10 - m00 * m12) / det,
    (m10 * m21 - m11 * m20) / det, (m01 * m20 - m00 * m21) / det, (m00 * m11 - m01 * m10) / det,
  );
}

/**
 * Weighted least squares min ‖A z − b‖ for an n × 3 matrix A (row-major, n ≥ 3,
 * full column rank) by Householder QR. Returns z and R⁻¹ (upper-triangular,
 * 3 × 3, row-major), so Cov(z) = R⁻¹ R⁻ᵀ.
 */
function qrSolve(a: Float64Array, b: Float64Array, n: number): { z: Float64Array; rInv: Float64Array } {
  for (let k = 0; k < 3; k++) {
    let norm = 0;
    for (let i = k; i < n; i++) norm = Math.hypot(norm, a[i * 3 + k]!);
    const akk = a[k * 3 + k]!;
    const alpha = akk > 0 ? -norm : norm;
    // v = x − alpha e_k, stored in column k below the diagonal (v_k separately)
    const vk = akk - alpha;
    let vnorm2 = vk * vk;
    for (let i = k + 1; i < n; i++) vnorm2 += a[i * 3 + k]! ** 2;
    if (vnorm2 > 0) {
      for (let j = k + 1; j < 3; j++) {
        let s = vk * a[k * 3 + j]!;
        for (let i = k + 1; i < n; i++) s += a[i * 3 + k]! * a[i * 3 + j]!;
        const t = (2 * s) / vnorm2;
        a[k * 3 + j] = a[k * 3 + j]! - t * vk;
        for (let i = k + 1; i < n; i++) a[i * 3 + j] = a[i * 3 + j]! - t * a[i * 3 + k]!;
      }
      let s = vk * b[k]!;
      for (let i = k + 1; i < n; i++) s += a[i * 3 + k]! * b[i]!;
      const t = (2 * s) / vnorm2;
      b[k] = b[k]! - t * vk;
      for (let i = k + 1; i < n; i++) b[i] = b[i]! - t * a[i * 3 + k]!;
    }
    a[k * 3 + k] = alpha;
  }
  // Back substitution R z = (Qᵀb)[0..2]; R⁻¹ by columns.
  const z = new Float64Array(3);
  for (let i = 2; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < 3; j++) s -= a[i * 3 + j]! * z[j]!;
    z[i] = s / a[i * 3 + i]!;
  }
  const rInv = new Float64Array(9);
  for (let col = 0; col < 3; col++) {
    for (let i = col; i >= 0; i--) {
      let s = i === col ? 1 : 0;
      for (let j = i + 1; j <= col; j++) s -= a[i * 3 + j]! * rInv[j * 3 + col]!;
      rInv[i * 3 + col] = s / a[i * 3 + i]!;
    }
  }
  return { z, rInv };
}

function validateMeasurement(kind: StarInputKindSI, m: MeasurementSI): void {
  const info = KINDS[kind];
  if (info.positive) requirePositive(info.name, m.value, info.unit);
  else requireFinite(info.name, m.value, info.unit);
  requirePositive(`${info.name} uncertainty`, m.sigma, info.unit);
}

// ---- scalar solver -------------------------------------------------------------

/**
 * Solve for all stellar parameters from a sufficient subset of measurements,
 * with first-order uncertainties, full covariance and (when over-determined)
 * a consistency report. See the module documentation for the model.
 *
 * @param obs - measurements keyed by kind; each value with a standard uncertainty > 0
 * @returns every quantity with value and σ, the 6 × 6 covariances, and the χ² report
 * @throws RangeError naming the parameter for a non-positive or non-finite value or
 *   uncertainty; RangeError naming the missing inputs when under-determined
 * @example
 * ```ts
 * import { solveStarSI } from "./solver";
 * const mas = Math.PI / 648000 / 1000;
 * const star = solveStarSI({
 *   parallaxRad: { value: 100 * mas, sigma: 0.1 * mas },
 *   bolometricFluxWm2: { value: 3.2e-9, sigma: 0.05e-9 },
 *   temperatureK: { value: 5800, sigma: 50 },
 * });
 * const rSun = star.radiusM.value / 6.957e8;
 * ```
 */
export function solveStarSI(obs: StarObservationsSI): StarSolutionSI {
  const kinds: StarInputKindSI[] = [];
  for (const k of INPUT_ORDER) {
    const m = obs[k];
    if (m !== undefined) {
      validateMeasurement(k, m);
      kinds.push(k);
    }
  }
  requireSufficient(kinds);
  const n = kinds.length;
  const a = new Float64Array(n * 3);
  const b = new Float64Array(n);
  const ys = new Float64Array(n);
  const ss = new Float64Array(n);
  const tmp = new Float64Array(2);
  for (let i = 0; i < n; i++) {
    const k = kinds[i]!;
    const m = obs[k]!;
    lnOf(k, m.value, m.sigma, tmp);
    const q = KINDS[k].quantity;
    const row = M_ROWS[q]!;
    const y = tmp[0]!;
    const s = tmp[1]!;
    if (!(s > 0) || !Number.isFinite(s) || !Number.isFinite(y)) {
      throw new RangeError(`${KINDS[k].name} uncertainty gives a relative uncertainty that is not a finite number > 0 (got ${String(s)})`);
    }
    ys[i] = y;
    ss[i] = s;
    for (let j = 0; j < 3; j++) a[i * 3 + j] = row[j]! / s;
    b[i] = y / s;
  }
  // Exactly determined (n = 3): z = M_S⁻¹ y with the exact inverse of the small
  // integer matrix M_S (the weights cancel; using them would only add the
  // conditioning of very different 1/σ). Over-determined: weighted QR.
  const covZ = new Float64Array(9);
  let z: Float64Array;
  if (n === 3) {
    const inv = inverse3(kinds.map((k) => M_ROWS[KINDS[k].quantity]!));
    z = new Float64Array(3);
    for (let i = 0; i < 3; i++) z[i] = inv[i * 3]! * ys[0]! + inv[i * 3 + 1]! * ys[1]! + inv[i * 3 + 2]! * ys[2]!;
    // Cov(z) = M_S⁻¹ diag(s²) M_S⁻ᵀ
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) {
        let acc = 0;
        for (let k = 0; k < 3; k++) acc += inv[i * 3 + k]! * inv[j * 3 + k]! * ss[k]! * ss[k]!;
        covZ[i * 3 + j] = acc;
      }
  } else {
    const sol = qrSolve(a, b, n);
    z = sol.z;
    const rInv = sol.rInv;
    // Cov(z) = R⁻¹ R⁻ᵀ
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) {
        let acc = 0;
        for (let k = Math.max(i, j); k < 3; k++) acc += rInv[i * 3 + k]! * rInv[j * 3 + k]!;
        covZ[i * 3 + j] = acc;
      }
  }
  const lnQ = new Float64Array(6);
  for (let q = 0; q < 6; q++) {
    const r = M_ROWS[q]!;
    lnQ[q] = r[0] * z[0]! + r[1] * z[1]! + r[2] * z[2]!;
  }
  const lnCovariance: number[][] = [];
  for (let p = 0; p < 6; p++) {
    const rp = M_ROWS[p]!;
    const line: number[] = [];
    for (let q = 0; q < 6; q++) {
      const rq = M_ROWS[q]!;
      let s = 0;
      for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) s += rp[i]! * covZ[i * 3 + j]! * rq[j]!;
      line.push(s);
    }
    lnCovariance.push(line);
  }
  const values = Array.from(lnQ, (v, q) => {
    const x = REFS[q]! * Math.exp(v);
    if (!(x > 0) || x === Infinity) {
      throw new RangeError(`derived ${QUANTITY_NAME[q]!} is not representable as a finite number > 0 (ln value ${String(v)})`);
    }
    return x;
  });
  const covariance = lnCovariance.map((line, p) => line.map((c, q) => values[p]! * values[q]! * c));

  // consistency
  let chi2 = 0;
  const pulls: Partial<Record<StarInputKindSI, number>> = {};
  for (let i = 0; i < n; i++) {
    const k = kinds[i]!;
    const r = (ys[i]! - lnQ[KINDS[k].quantity]!) / ss[i]!;
    pulls[k] = r;
    chi2 += r * r;
  }
  const dof = n - 3;
  let lnPValue = 0;
  let sigma = 0;
  if (dof > 0) {
    lnPValue = chiSquareLogSurvival(chi2, dof);
    sigma = dof === 1 ? Math.sqrt(chi2) : sigmaFromLogTailProbability(lnPValue);
  } else {
    chi2 = 0;
  }
  const measured = new Set(kinds.map((k) => KINDS[k].quantity));
  const derived = (q: number): DerivedQuantitySI => {
    const value = values[q]!;
    const rel = Math.sqrt(lnCovariance[q]![q]!);
    return { value, sigma: value * rel, relativeSigma: rel, measured: measured.has(q) };
  };
  const sLnD = Math.sqrt(lnCovariance[3]![3]!);
  const sLnF = Math.sqrt(lnCovariance[4]![4]!);
  const sLnL = Math.sqrt(lnCovariance[1]![1]!);
  const parallax = AU / values[3]!;
  const mBol = (LN_F0_SCALED - lnQ[4]!) / MAG_TO_LN;
  const absBol = -2.5 * Math.log10(values[1]! / L0);
  return {
    temperatureK: derived(0),
    luminosityW: derived(1),
    radiusM: derived(2),
    distanceM: derived(3),
    bolometricFluxWm2: derived(4),
    angularDiameterRad: derived(5),
    parallaxRad: { value: parallax, sigma: parallax * sLnD, relativeSigma: sLnD, measured: measured.has(3) },
    apparentBolometricMag: { value: mBol, sigma: sLnF / MAG_TO_LN, relativeSigma: sLnF / MAG_TO_LN, measured: measured.has(4) },
    absoluteBolometricMag: { value: absBol, sigma: sLnL / MAG_TO_LN, relativeSigma: sLnL / MAG_TO_LN, measured: measured.has(1) },
    quantities: [...STAR_QUANTITIES],
    lnCovariance,
    covariance,
    consistency: { chi2, dof, pValue: Math.exp(lnPValue), lnPValue, sigma, pulls },
  };
}

// ---- batch solver ----------------------------------------------------------------

/**
 * Input columns of a batch solve, in the order of the kinds given to
 * {@link createStarBatchSolverSI}. Uncertainties may be 0 (an exactly
 * determined batch needs no weights; a zero σ simply contributes nothing).
 */
export interface StarBatchInputSI {
  readonly values: readonly [Float64Array, Float64Array, Float64Array];
  readonly sigmas: readonly [Float64Array, Float64Array, Float64Array];
}

/**
 * Output columns of a batch solve. Every column is optional: only the ones
 * supplied are written. `reason` is required: one code per row from
 * `PhotometryBatchReason` (0 = OK).
 */
export interface StarBatchOutputSI {
  readonly temperatureK?: Float64Array;
  readonly sigmaTemperatureK?: Float64Array;
  readonly luminosityW?: Float64Array;
  readonly sigmaLuminosityW?: Float64Array;
  readonly radiusM?: Float64Array;
  readonly sigmaRadiusM?: Float64Array;
  readonly distanceM?: Float64Array;
  readonly sigmaDistanceM?: Float64Array;
  readonly bolometricFluxWm2?: Float64Array;
  readonly sigmaBolometricFluxWm2?: Float64Array;
  readonly angularDiameterRad?: Float64Array;
  readonly sigmaAngularDiameterRad?: Float64Array;
  readonly reason: Uint8Array;
}

/** A batch solver for a fixed, exactly determined set of three input kinds. */
export interface StarBatchSolverSI {
  /** The input kinds, in column order. */
  readonly inputs: readonly [StarInputKindSI, StarInputKindSI, StarInputKindSI];
  /**
   * d ln qⱼ / d yₖ: row j (in STAR_QUANTITIES order) of the constant 6 × 3
   * matrix mapping the inputs' ln-values yₖ to the outputs (row-major copy).
   */
  readonly jacobian: Float64Array;
  /**
   * True when this solver runs the specialised loop for {parallax, bolometric
   * flux, temperature} (see {@link createStarBatchSolverSI}).
   */
  readonly specialised: boolean;
  /**
   * Solve every row. Never throws mid-array: invalid rows get NaN in every
   * output column and a non-zero reason code. Allocation-free per row.
   * @returns the number of invalid rows
   * @throws RangeError only for mismatched column lengths (before any row is written)
   */
  solve(input: StarBatchInputSI, output: StarBatchOutputSI): number;
}

/**
 * Build a batch solver for catalogues in which every star has the same three
 * independent inputs (e.g. parallax, bolometric flux and temperature). Since
 * the three inputs determine the star exactly, each output is a product of
 * powers of the (reference-scaled) inputs, qⱼ′ = Πₖ uₖ^{Jⱼₖ}, with the constant
 * exponent matrix J = M M_S⁻¹ precomputed here (exponents such as ±½, ±1, ±2,
 * ±4 use sqrt/multiplication rather than `Math.pow`), and its first-order
 * relative variance is Σₖ Jⱼₖ² (σₖ/xₖ)² (inputs independent). Rounding error is
 * a few ulp (no log/exp round trip). Results agree with {@link solveStarSI}
 * for the same inputs to ≲ 1e-14 (the scalar solver works in log space).
 * A row whose result, or an intermediate power, is not representable gets
 * reason RESULT_OUT_OF_RANGE.
 * Per-row output covariances are not written (use the scalar solver for
 * those); over-determined batches are not supported (use the scalar solver).
 *
 * @param inputs - three distinct, independent input kinds
 * @returns the solver
 * @throws RangeError when the kinds are not three distinct independent ones, naming what is missing
 * @example
 * ```ts
 * import { createStarBatchSolverSI } from "./solver";
 * const solver = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"]);
 * const n = 2;
 * const cols = () => new Float64Array(n);
 * const input = { values: [cols(), cols(), cols()], sigmas: [cols(), cols(), cols()] } as const;
 * const output = { radiusM: cols(), sigmaRadiusM: cols(), reason: new Uint8Array(n) };
 * const invalid = solver.solve(input, output);
 * ```
 */
export function createStarBatchSolverSI(
  inputs: readonly [StarInputKindSI, StarInputKindSI, StarInputKindSI],
  options: StarBatchSolverOptions = {},
): StarBatchSolverSI {
  if (inputs.length !== 3) throw new RangeError(`inputs must list exactly 3 input kinds; got ${String(inputs.length)}`);
  for (const k of inputs) {
    if (!(k in KINDS)) throw new RangeError(`inputs: unknown input kind ${String(k)}`);
  }
  if (new Set(inputs).size !== 3) throw new RangeError(`inputs must be 3 distinct kinds; got ${inputs.join(", ")}`);
  requireSufficient(inputs);
  const kinds: readonly [StarInputKindSI, StarInputKindSI, StarInputKindSI] = [inputs[0], inputs[1], inputs[2]];
  // M_S (3×3) and its inverse by cofactors (entries are small integers).
  const inv = inverse3(kinds.map((k) => M_ROWS[KINDS[k].quantity]!));
  const jac = new Float64Array(18);
  const jac2 = new Float64Array(18);
  for (let q = 0; q < 6; q++) {
    const r = M_ROWS[q]!;
    for (let k = 0; k < 3; k++) {
      const j = r[0] * inv[0 * 3 + k]! + r[1] * inv[1 * 3 + k]! + r[2] * inv[2 * 3 + k]!;
      jac[q * 3 + k] = j;
      jac2[q * 3 + k] = j * j;
    }
  }
  // Input transforms to the scaled value u (> 0) and its relative uncertainty:
  // 0: u = x / x_ref;  1: parallax, u = d′ = (π/648000) / p;  2: magnitude, u = f′ = (f₀/f_ref) 10^(−m/2.5)
  const mode = new Uint8Array(3);
  const scale = new Float64Array(3);
  const mustBePositive = new Uint8Array(3);
  for (let k = 0; k < 3; k++) {
    const kind = kinds[k]!;
    mustBePositive[k] = KINDS[kind].positive ? 1 : 0;
    if (kind === "parallaxRad") {
      mode[k] = 1;
      scale[k] = ARCSEC_RAD;
    } else if (kind === "apparentBolometricMag") {
      mode[k] = 2;
      scale[k] = F0_SCALED;
    } else {
      mode[k] = 0;
      scale[k] = REFS[KINDS[kind].quantity]!;
    }
  }
  const expCode = new Uint8Array(18);
  for (let i = 0; i < 18; i++) expCode[i] = exponentCode(jac[i]!);

  function solve(input: StarBatchInputSI, output: StarBatchOutputSI): number {
    const v0 = input.values[0], v1 = input.values[1], v2 = input.values[2];
    const e0 = input.sigmas[0], e1 = input.sigmas[1], e2 = input.sigmas[2];
    const n = v0.length;
    const reason = output.reason;
    const cols: (Float64Array | undefined)[] = [
      output.temperatureK, output.luminosityW, output.radiusM,
      output.distanceM, output.bolometricFluxWm2, output.angularDiameterRad,
    ];
    const sigCols: (Float64Array | undefined)[] = [
      output.sigmaTemperatureK, output.sigmaLuminosityW, output.sigmaRadiusM,
      output.sigmaDistanceM, output.sigmaBolometricFluxWm2, output.sigmaAngularDiameterRad,
    ];
    for (const arr of [v1, v2, e0, e1, e2, reason, ...cols, ...sigCols]) {
      if (arr !== undefined && arr.length !== n) {
        throw new RangeError(`batch columns must all have length ${String(n)}; got one of length ${String(arr.length)}`);
      }
    }
    // Active outputs, compacted once per call so the row loop touches only those.
    const active: number[] = [];
    for (let q = 0; q < 6; q++) if (cols[q] !== undefined || sigCols[q] !== undefined) active.push(q);
    const na = active.length;
    const md0 = mode[0]!, md1 = mode[1]!, md2 = mode[2]!;
    const sc0 = scale[0]!, sc1 = scale[1]!, sc2 = scale[2]!;
    const pos0 = mustBePositive[0] === 1, pos1 = mustBePositive[1] === 1, pos2 = mustBePositive[2] === 1;
    let invalid = 0;
    for (let i = 0; i < n; i++) {
      const x0 = v0[i]!, x1 = v1[i]!, x2 = v2[i]!;
      const s0 = e0[i]!, s1 = e1[i]!, s2 = e2[i]!;
      let code: number = PhotometryBatchReason.OK;
      if (!Number.isFinite(x0) || !Number.isFinite(x1) || !Number.isFinite(x2) || !Number.isFinite(s0) || !Number.isFinite(s1) || !Number.isFinite(s2)) {
        code = PhotometryBatchReason.NON_FINITE;
      } else if ((pos0 && !(x0 > 0)) || (pos1 && !(x1 > 0)) || (pos2 && !(x2 > 0))) {
        code = PhotometryBatchReason.NON_POSITIVE;
      } else if (s0 < 0 || s1 < 0 || s2 < 0) {
        code = PhotometryBatchReason.NEGATIVE_UNCERTAINTY;
      } else {
        const u0 = scaledInput(md0, sc0, x0), u1 = scaledInput(md1, sc1, x1), u2 = scaledInput(md2, sc2, x2);
        const r0 = relativeInputSigma(md0, x0, s0), r1 = relativeInputSigma(md1, x1, s1), r2 = relativeInputSigma(md2, x2, s2);
        const q0 = r0 * r0, q1 = r1 * r1, q2 = r2 * r2;
        for (let a = 0; a < na; a++) {
          const q = active[a]!;
          const b = q * 3;
          const val = REFS[q]! * powCode(u0, expCode[b]!, jac[b]!) * powCode(u1, expCode[b + 1]!, jac[b + 1]!) * powCode(u2, expCode[b + 2]!, jac[b + 2]!);
          const sig = val * Math.sqrt(jac2[b]! * q0 + jac2[b + 1]! * q1 + jac2[b + 2]! * q2);
          if (!(val > 0) || val === Infinity || !(sig >= 0) || sig === Infinity) {
            code = PhotometryBatchReason.RESULT_OUT_OF_RANGE;
            break;
          }
          const col = cols[q];
          const sc = sigCols[q];
          if (col !== undefined) col[i] = val;
          if (sc !== undefined) sc[i] = sig;
        }
      }
      reason[i] = code;
      if (code !== PhotometryBatchReason.OK) {
        invalid++;
        for (let a = 0; a < na; a++) {
          const q = active[a]!;
          const col = cols[q];
          const sc = sigCols[q];
          if (col !== undefined) col[i] = NaN;
          if (sc !== undefined) sc[i] = NaN;
        }
      }
    }
    return invalid;
  }

  const ip = kinds.indexOf("parallaxRad");
  const iF = kinds.indexOf("bolometricFluxWm2");
  const iT = kinds.indexOf("temperatureK");
  if (options.specialise !== false && ip >= 0 && iF >= 0 && iT >= 0) {
    return { inputs: kinds, jacobian: jac.slice(), specialised: true, solve: (input, output) => solveParallaxFluxTemperature(input, output, ip, iF, iT) };
  }
  return { inputs: kinds, jacobian: jac.slice(), specialised: false, solve };
}

/** Options of {@link createStarBatchSolverSI}. */
export interface StarBatchSolverOptions {
  /**
   * Use the specialised loop when the inputs are {parallax, bolometric flux,
   * temperature} in any order (default true). `false` forces the general
   * product-of-powers loop (for tests that compare the two).
   */
  readonly specialise?: boolean;
}

/** 1/√σ, for θ/2 = √f / (√σ T²) without forming f/σ (which overflows for f ≳ 1e301 W m^-2). */
const INV_SQRT_SIGMA = 1 / Math.sqrt(SIGMA);
const FOUR_PI_K = 4 * Math.PI;

/** Throw (before any row is written) unless every present column has length n. */
function requireLengths(n: number, arrays: readonly (Float64Array | Uint8Array | undefined)[]): void {
  for (const arr of arrays) {
    if (arr !== undefined && arr.length !== n) {
      throw new RangeError(`batch columns must all have length ${String(n)}; got one of length ${String(arr.length)}`);
    }
  }
}

/**
 * The specialised batch loop for the commonest catalogue: parallax p,
 * bolometric flux f and effective temperature T (columns ip, iF, iT), all
 * six outputs by direct formulas
 *
 *   d = 1 au / p,  L = 4π f d²,  θ/2 = √f / (√σ T²),  R = d θ/2,
 *
 * with first-order relative uncertainties (inputs independent; r_x = σ_x/x)
 *
 *   σ_d/d = r_p,  σ_L/L = √(4r_p² + r_f²),  σ_R/R = √(r_p² + r_f²/4 + 4r_T²),
 *   σ_θ/θ = √(r_f²/4 + 4r_T²),  and T, f and their σ copied from the input.
 *
 * The same reason codes, with the same precedence, as the general loop; a
 * row is RESULT_OUT_OF_RANGE when a requested output (or its σ) is not a
 * finite double (> 0 for values). Agrees with the general loop to a few ulp
 * (tested); at the very edges of the double range the two may disagree on
 * whether a row is representable, since their intermediates differ. @internal
 */
function solveParallaxFluxTemperature(input: StarBatchInputSI, output: StarBatchOutputSI, ip: number, iF: number, iT: number): number {
  const P = input.values[ip as 0 | 1 | 2], SP = input.sigmas[ip as 0 | 1 | 2];
  const F = input.values[iF as 0 | 1 | 2], SF = input.sigmas[iF as 0 | 1 | 2];
  const T = input.values[iT as 0 | 1 | 2], ST = input.sigmas[iT as 0 | 1 | 2];
  const n = P.length;
  const reason = output.reason;
  requireLengths(n, [
    SP, F, SF, T, ST, reason,
    output.temperatureK, output.sigmaTemperatureK, output.luminosityW, output.sigmaLuminosityW,
    output.radiusM, output.sigmaRadiusM, output.distanceM, output.sigmaDistanceM,
    output.bolometricFluxWm2, output.sigmaBolometricFluxWm2, output.angularDiameterRad, output.sigmaAngularDiameterRad,
  ]);
  const wantL = output.luminosityW !== undefined || output.sigmaLuminosityW !== undefined;
  const wantR = output.radiusM !== undefined || output.sigmaRadiusM !== undefined;
  const wantD = output.distanceM !== undefined || output.sigmaDistanceM !== undefined;
  const wantA = output.angularDiameterRad !== undefined || output.sigmaAngularDiameterRad !== undefined;
  const wantT = output.temperatureK !== undefined || output.sigmaTemperatureK !== undefined;
  const wantF = output.bolometricFluxWm2 !== undefined || output.sigmaBolometricFluxWm2 !== undefined;
  // Stores go to columns typed Float64Array, never Float64Array | undefined
  // (a store guarded by "column !== undefined" made this loop about 2.5×
  // slower in V8, measured): every column not requested points at one shared
  // scratch array, allocated only when needed.
  let scratch: Float64Array | undefined;
  const col = (a: Float64Array | undefined): Float64Array => a ?? (scratch ??= new Float64Array(n));
  const oT = col(output.temperatureK), sT = col(output.sigmaTemperatureK);
  const oL = col(output.luminosityW), sL = col(output.sigmaLuminosityW);
  const oR = col(output.radiusM), sR = col(output.sigmaRadiusM);
  const oD = col(output.distanceM), sD = col(output.sigmaDistanceM);
  const oF = col(output.bolometricFluxWm2), sF = col(output.sigmaBolometricFluxWm2);
  const oA = col(output.angularDiameterRad), sA = col(output.sigmaAngularDiameterRad);
  const flags = (wantT ? 1 : 0) | (wantF ? 2 : 0) | (wantD ? 4 : 0) | (wantL ? 8 : 0) | (wantR ? 16 : 0) | (wantA ? 32 : 0);
  return parallaxFluxTemperatureLoop(n, P, SP, F, SF, T, ST, oT, sT, oF, sF, oD, sD, oL, sL, oR, sR, oA, sA, reason, flags);
}

/**
 * The row loop of {@link solveParallaxFluxTemperature}, kept apart so that it
 * sees only typed arrays and numbers (no property reads): V8 then optimises
 * it once and keeps it optimised across calls. `flags` bits: 1 T, 2 f, 4 d,
 * 8 L, 16 R, 32 θ requested. @internal
 */
function parallaxFluxTemperatureLoop(
  n: number,
  P: Float64Array, SP: Float64Array, F: Float64Array, SF: Float64Array, T: Float64Array, ST: Float64Array,
  oT: Float64Array, sT: Float64Array, oF: Float64Array, sF: Float64Array, oD: Float64Array, sD: Float64Array,
  oL: Float64Array, sL: Float64Array, oR: Float64Array, sR: Float64Array, oA: Float64Array, sA: Float64Array,
  reason: Uint8Array,
  flags: number,
): number {
  const wantTF = (flags & 3) !== 0, wantD = (flags & 4) !== 0;
  const wantL = (flags & 8) !== 0, wantR = (flags & 16) !== 0, wantA = (flags & 32) !== 0;
  // module bindings hoisted into locals: the hot loop then reads no imported binding
  const OK = PhotometryBatchReason.OK;
  const OUT_OF_RANGE = PhotometryBatchReason.RESULT_OUT_OF_RANGE;
  const au = AU;
  const k = INV_SQRT_SIGMA;
  const fourPi = FOUR_PI_K;
  let invalid = 0;
  for (let i = 0; i < n; i++) {
    const p = P[i]!, sp = SP[i]!, f = F[i]!, sf = SF[i]!, t = T[i]!, st = ST[i]!;
    let code: number = OK;
    // one test for the common case (NaN fails every comparison); the precise code only for bad rows
    if (p > 0 && f > 0 && t > 0 && sp >= 0 && sf >= 0 && st >= 0 && p < Infinity && f < Infinity && t < Infinity && sp < Infinity && sf < Infinity && st < Infinity) {
      const rp = sp / p, rf = sf / f, rt = st / t;
      const rp2 = rp * rp, rf2 = rf * rf, rt2 = rt * rt;
      const d = au / p;
      const g = (Math.sqrt(f) * k) / t / t; // θ/2
      const l = fourPi * f * d * d;
      const r = d * g;
      const a = 2 * g;
      const sd = d * rp;
      const sl = l * Math.sqrt(4 * rp2 + rf2);
      const ang = 0.25 * rf2 + 4 * rt2;
      const sr = r * Math.sqrt(rp2 + ang);
      const sa = a * Math.sqrt(ang);
      // Fast test: every value > 0 and the sum of all eight finite (NaN or ∞
      // anywhere makes it fail). Only when it fails are the requested outputs
      // examined one by one (so an overflow in a column nobody asked for, or
      // a sum that overflows although each term is finite, is not an error).
      const sum = d + sd + l + sl + r + sr + a + sa;
      if (
        !(sum < Infinity && l > 0 && r > 0 && a > 0) &&
        ((wantD && !(d < Infinity && sd < Infinity)) ||
          (wantL && !(l > 0 && l < Infinity && sl < Infinity)) ||
          (wantR && !(r > 0 && r < Infinity && sr < Infinity)) ||
          (wantA && !(a > 0 && a < Infinity && sa < Infinity)))
      ) {
        code = OUT_OF_RANGE;
      } else {
        // Unconditional stores (unrequested columns point at a scratch
        // array): guarding each pair by its flag cost ~50 % in V8 (measured).
        if (wantTF) {
          oT[i] = t;
          sT[i] = st;
          oF[i] = f;
          sF[i] = sf;
        }
        oD[i] = d;
        sD[i] = sd;
        oL[i] = l;
        sL[i] = sl;
        oR[i] = r;
        sR[i] = sr;
        oA[i] = a;
        sA[i] = sa;
        reason[i] = OK;
        continue;
      }
    } else if (!Number.isFinite(p) || !Number.isFinite(f) || !Number.isFinite(t) || !Number.isFinite(sp) || !Number.isFinite(sf) || !Number.isFinite(st)) {
      code = PhotometryBatchReason.NON_FINITE;
    } else if (!(p > 0) || !(f > 0) || !(t > 0)) {
      code = PhotometryBatchReason.NON_POSITIVE;
    } else {
      code = PhotometryBatchReason.NEGATIVE_UNCERTAINTY;
    }
    reason[i] = code;
    invalid++;
    oT[i] = NaN;
    sT[i] = NaN;
    oF[i] = NaN;
    sF[i] = NaN;
    oD[i] = NaN;
    sD[i] = NaN;
    oL[i] = NaN;
    sL[i] = NaN;
    oR[i] = NaN;
    sR[i] = NaN;
    oA[i] = NaN;
    sA[i] = NaN;
  }
  return invalid;
}

/** Scaled input u: 0 → x / x_ref; 1 → parallax, (π/648000)/p; 2 → magnitude, (f₀/f_ref) 10^(−m/2.5). @internal */
function scaledInput(mode: number, scale: number, x: number): number {
  return mode === 0 ? x / scale : mode === 1 ? scale / x : scale * 10 ** (x / -2.5);
}

/** Relative (ln-space) uncertainty of an input: σ/x, or (ln10/2.5) σ for a magnitude. @internal */
function relativeInputSigma(mode: number, x: number, sigma: number): number {
  return mode === 2 ? MAG_TO_LN * sigma : sigma / x;
}

/** Code for an exponent that {@link powCode} evaluates without `Math.pow` (9 = generic). @internal */
function exponentCode(e: number): number {
  const table = [0, 1, -1, 2, -2, 0.5, -0.5, 4, 0.25, -0.25, -4];
  const k = table.indexOf(e);
  return k < 0 ? 255 : k;
}

/**
 * x^e for the exponents that occur in the solver, via exact-as-possible
 * operations selected by a precomputed code; `Math.pow` otherwise. @internal
 */
function powCode(x: number, code: number, e: number): number {
  switch (code) {
    case 0:
      return 1;
    case 1:
      return x;
    case 2:
      return 1 / x;
    case 3:
      return x * x;
    case 4:
      return 1 / (x * x);
    case 5:
      return Math.sqrt(x);
    case 6:
      return 1 / Math.sqrt(x);
    case 7: {
      const x2 = x * x;
      return x2 * x2;
    }
    case 8:
      return Math.sqrt(Math.sqrt(x));
    case 9:
      return 1 / Math.sqrt(Math.sqrt(x));
    case 10: {
      const x2 = x * x;
      return 1 / (x2 * x2);
    }
    default:
      return Math.pow(x, e);
  }
}
