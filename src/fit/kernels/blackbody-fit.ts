/**
 * Blackbody SED fitting: effective temperature T, angular diameter θ and
 * (optionally) interstellar extinction A_V from band fluxes, AB magnitudes
 * or a spectrum, by Levenberg–Marquardt with analytic derivatives.
 *
 * ## Model
 * The spectral flux density received from a uniformly bright sphere of
 * radius R at distance d is f_λ = Ω_eff B_λ with Ω_eff = π (R/d)² (the
 * surface exitance π B_λ diluted by (R/d)²). With the angular diameter
 * θ = 2R/d (small-angle form; the exact sphere has sin(θ/2) = R/d, a relative
 * difference (θ/2)²/3 in the flux, < 1e-15 for any star but the Sun):
 *
 *   f_λ(λ) = (θ/2)² π B_λ(λ, T) · 10^(−0.4 A_V k(λ)),   k(λ) = A_λ/A_V
 *
 * with k from CCM89 (photometry/kernels/extinction.ts) for a given R_V, or
 * k = 0 without extinction. A band measures ⟨f_λ⟩ = Σ ŵᵢ f_λ(λᵢ) (bands.ts),
 * so the extinction factor is integrated through the band with the SED:
 *
 *   ⟨f_λ⟩ = s Σ ŵᵢ eᵢ B_λ(λᵢ, T),   s = π θ²/4,   eᵢ = 10^(−0.4 A_V kᵢ)
 *
 * The effective weights ŵᵢeᵢ are recomputed only when A_V changes (cached
 * per A_V value); the CCM89 ratios kᵢ once, when the fitter is built. An AB
 * magnitude is modelled as m = −2.5 log10(⟨f_λ⟩ λ_p²/(c · 3631 Jy)) (pivot
 * wavelength λ_p, exact for the photon-counting AB definition, bands.ts).
 * A spectrum pixel is a one-node band with weight 1 (a monochromatic sample:
 * no line-spread or pixel integration).
 *
 * The inner loop evaluates B_λ in closed form with per-node constants
 * ({@link planckLambdaClosedFormSI}: one `expm1` per node and evaluation),
 * within 1e-13 of the library's Planck kernel over the fit's domain.
 *
 * ## Derivatives (analytic)
 * With S₀ = Σŵe B, S₁ = Σŵe T ∂B/∂T, S₂ = Σŵe k B and T ∂B_λ/∂T = B x/(1 − e^−x), x = hc/λkT:
 *   ∂⟨f⟩/∂ln T = s S₁,  ∂⟨f⟩/∂ln θ = 2⟨f⟩,  ∂⟨f⟩/∂A_V = −0.4 ln10 s S₂
 *   (for a monochromatic point −0.4 ln10 k f, the brief's form);
 *   for magnitudes ∂m/∂p = −(2.5/ln10) ∂ln⟨f⟩/∂p: −(2.5/ln10) S₁/S₀, −5/ln10, S₂/S₀.
 *
 * ## Fit
 * Parameters p = (ln T, ln θ[, A_V]); positivity of T and θ by the log
 * transform; ln T is kept in [ln T_min, ln T_max] and A_V ≥ 0 by projection
 * with an active set: a parameter sitting on its bound whose χ² gradient
 * points outward is held fixed for that iteration, the damped Gauss–Newton
 * step is solved for the others, and the trial point is clipped to the box.
 * Residuals: (y − model)/σ, in flux for flux data and in magnitudes for
 * magnitude data (each in the space its Gaussian error was quoted).
 * Marquardt damping (JᵀJ + λ diag JᵀJ) δ = Jᵀr, λ₀ = 1e-3, ÷10 on success,
 * ×10 on failure.
 *
 * Convergence (after a trial step Δp, |Δ| = max(|Δ ln T|, |Δ ln θ|, |ΔA_V|/mag)):
 *   - "step": |Δ| ≤ stepTolerance (default 1e-10: relative in T and θ, mag in A_V),
 *     for an accepted step, or for a rejected one (no decrease is possible by a
 *     larger step: the χ² floor of rounding);
 *   - "chi2": an accepted step lowered χ² by ≤ chi2Tolerance × χ² (default 1e-12)
 *     while the damping was ≤ 1 (a near-Gauss–Newton step, so a small decrease
 *     means the minimum, not a timid step);
 *   - "exact": χ² = 0 exactly;
 *   otherwise "maxIterations" (default 200 trial steps) or "stalled"
 *   (damping > 1e16 without progress) raise `notConverged`.
 *
 * Start: the colour temperature (radiation/kernels/colour-temperature.ts,
 * `colourTemperatureFromRatioSI` at the two pivot wavelengths — a start
 * only, so the monochromatic approximation of a band ratio is good enough
 * and costs ~0.1 ms rather than ~15 ms for the band-integrated solver) of
 * the two channels with the best S/N whose pivot wavelengths differ by ≥ 15 %
 * (dereddened with the starting A_V at the band-mean k), θ then solved
 * linearly; if that fails (no such pair, a non-positive flux, a ratio no
 * blackbody in range gives) or lands outside [T_min, T_max], a 61-point
 * log-spaced grid in T over [T_min, T_max] with θ solved linearly at each
 * point (weighted least squares in flux; in log flux when magnitudes are
 * present) and the best point taken.
 *
 * Output covariance: C = (JᵀWJ)⁻¹ at the solution in (ln T, ln θ, A_V),
 * transformed to (T, θ, A_V) by the Jacobian of the log transform,
 * C' = D C D with D = diag(T, θ, 1). It is NOT rescaled by χ²/dof. It is the
 * full inverse even when A_V sits on its bound (the local curvature; the
 * Gaussian picture is poor there, hence the `atLimit` flag).
 *
 * Flags: notConverged (see above); atLimit (fitted A_V = 0, or T within 1e-9
 * relative of T_min or T_max); tooFewBands (dof < 1 or a singular JᵀWJ: with
 * A_V free and only two channels A_V is held at its start value, and T, θ are
 * still fitted exactly, dof = 0; a singular information matrix gives NaN
 * covariance entries); poorFit (p = P(χ²_dof ≥ χ²) < 0.001, p-value.ts).
 *
 * Allocation: the fitter allocates its work arrays once; an iteration
 * allocates nothing (the colour-temperature start and the result object
 * allocate once per fit).
 *
 * @internal
 */
import { AB_ZERO_POINT, C, C1L, C2 } from "../../values/constants";
import { requireFinite, requirePositive } from "../../internal/checks";
import { ccm89RatioSI, RV_DIFFUSE_ISM } from "../../photometry/kernels/extinction";
import { colourTemperatureFromRatioSI } from "../../radiation/kernels/colour-temperature";
import { chiSquarePValue } from "./p-value";

/** Data kind of a channel: band-mean f_λ (W m⁻³). */
export const DATA_FLUX_LAMBDA = 0;
/** Data kind of a channel: AB magnitude (mag). */
export const DATA_AB_MAGNITUDE = 1;

/** One channel (band or spectrum pixel) as the fitter sees it. */
export interface FitChannelSI {
  /** Nodes, m (> 0). */
  readonly wavelengthsM: ArrayLike<number>;
  /** Normalised weights (Σ = 1). */
  readonly weights: ArrayLike<number>;
  /** Pivot wavelength, m (for magnitudes and the colour-temperature start). */
  readonly pivotWavelengthM: number;
}

/**
 * Planck's B_λ in the closed form the fitter's inner loop uses,
 * (2hc²/λ⁵) / expm1(x) with x = (c₂/λ)(1/T) — per-node constants are
 * precomputed, so one `expm1` per node and evaluation. Relative difference
 * from the library kernel `planckRadianceWavelengthSI` (double-double
 * exponent) ≤ ~x·2e-16 from rounding in x: < 1e-13 for x < 500, i.e. over
 * 0.1–3.33 µm for T ≥ 300 K (tested); 0 once B underflows (x ≳ 700).
 * @internal
 */
export function planckLambdaClosedFormSI(lambdaM: number, temperatureK: number): number {
  const l2 = lambdaM * lambdaM;
  return C1L / (l2 * l2 * lambdaM) / Math.expm1((C2 / lambdaM) * (1 / temperatureK));
}

/** Extinction settings. */
export interface ExtinctionSettingsSI {
  /** R_V of the CCM89 law (default 3.1, > 0). */
  readonly rV?: number;
  /** Starting (or fixed) A_V, mag (default 0, ≥ 0). */
  readonly aV?: number;
  /** Fit A_V (default true); false holds it at `aV`. */
  readonly fitAV?: boolean;
}

/** Fitter settings. */
export interface BlackbodyFitSettingsSI {
  /** CCM89 extinction; omitted: no extinction (A_V = 0, not fitted). */
  readonly extinction?: ExtinctionSettingsSI;
  /** Allowed temperature range, K (default [300, 1e6]). */
  readonly temperatureRangeK?: readonly [number, number];
  /** Maximum number of LM trial steps (default 200). */
  readonly maxIterations?: number;
  /** Step threshold (default 1e-10). */
  readonly stepTolerance?: number;
  /** Relative χ² change threshold (default 1e-12). */
  readonly chi2Tolerance?: number;
  /** "auto" (colour temperature, grid fallback; default) or "grid". */
  readonly start?: "auto" | "grid";
}

/** Names of the fit parameters, in covariance order. */
export type FitParameterName = "temperatureK" | "angularDiameterRad" | "extinctionAV";

/** Why the iteration stopped. */
export type FitStopReason = "step" | "chi2" | "exact" | "maxIterations" | "stalled";

/** Quality flags. */
export interface BlackbodyFitFlags {
  /** The iteration did not meet a convergence criterion. */
  readonly notConverged: boolean;
  /** Fitted A_V is 0, or T is at an end of the allowed range. */
  readonly atLimit: boolean;
  /** dof < 1 (or a singular information matrix): no goodness of fit; see the fitted parameters. */
  readonly tooFewBands: boolean;
  /** P(χ²_dof ≥ χ²) < 0.001. */
  readonly poorFit: boolean;
}

/** Result of a fit, plain JSON (numbers, strings, booleans, arrays, null). */
export interface BlackbodyFitSI {
  /** Fitted effective (blackbody) temperature T, K. */
  readonly temperatureK: number;
  /** Standard uncertainty of T, K (from the covariance, not rescaled by χ²/dof). */
  readonly sigmaTemperatureK: number;
  /** Fitted angular diameter θ = 2R/d, rad. */
  readonly angularDiameterRad: number;
  /** Standard uncertainty of θ, rad (from the covariance, not rescaled by χ²/dof). */
  readonly sigmaAngularDiameterRad: number;
  /** A_V, mag (0 without extinction; the held value when not fitted). */
  readonly extinctionAV: number;
  /** σ(A_V), mag (0 when not fitted). */
  readonly sigmaExtinctionAV: number;
  /** R_V used (null without extinction). */
  readonly rV: number | null;
  /** Fitted parameters: the row/column order of the matrices below. */
  readonly parameters: FitParameterName[];
  /** Covariance of the fitted parameters in K, rad, mag (products thereof). */
  readonly covariance: number[][];
  /** Covariance of (ln T, ln θ, A_V) for the fitted parameters. */
  readonly lnCovariance: number[][];
  /** Correlation matrix of the fitted parameters. */
  readonly correlation: number[][];
  /** χ² = Σ pulls² at the solution (flux residuals for flux data, magnitude residuals for magnitudes). */
  readonly chi2: number;
  /** Number of channels − number of fitted parameters. */
  readonly dof: number;
  /** χ²/dof (null when dof < 1). */
  readonly reducedChi2: number | null;
  /** P(χ²_dof ≥ χ²) (null when dof < 1). */
  readonly pValue: number | null;
  /** LM trial steps taken. */
  readonly iterations: number;
  /** Model evaluations (each: every node of every channel, with derivatives). */
  readonly evaluations: number;
  /** Temperature the iteration started from, K. */
  readonly startTemperatureK: number;
  /** How the start was found: `"colour"` (colour temperature of the two best channels) or `"grid"` (61-point log grid in T). */
  readonly startMethod: "colour" | "grid";
  /** Why the iteration stopped (`"maxIterations"` and `"stalled"` also set `flags.notConverged`). */
  readonly stopReason: FitStopReason;
  /** Model per channel in its data unit (f_λ W m⁻³ or AB mag). */
  readonly model: number[];
  /** (data − model)/σ per channel. */
  readonly pulls: number[];
  /** Quality flags: check them before trusting the result. */
  readonly flags: BlackbodyFitFlags;
}

/** A reusable fitter for a fixed set of channels (bands or pixels). */
export interface BlackbodyFitterSI {
  /** Number of channels. */
  readonly channels: number;
  /**
   * Fit one star. `kinds[c]` is DATA_FLUX_LAMBDA (values in W m⁻³, may be ≤ 0)
   * or DATA_AB_MAGNITUDE (mag); sigmas > 0.
   * @throws RangeError naming `values[c]`, `sigmas[c]` or `kinds[c]`
   */
  fit(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>): BlackbodyFitSI;
}

const LN10 = Math.LN10;
const K04 = 0.4 * LN10; // d ln f / d A (per mag)
const MAG_PER_LN = 2.5 / LN10;
const GRID_POINTS = 61;
const DEFAULT_T_RANGE: readonly [number, number] = [300, 1e6];
const COLOUR_MIN_PIVOT_RATIO = 1.15;

/**
 * Build a fitter for the given channels (weights and CCM89 ratios are
 * computed here, once).
 *
 * @param channels - bands (bands.ts) or one-node pixels; ≥ 1
 * @param settings - see {@link BlackbodyFitSettingsSI}
 * @throws RangeError naming `channels[c]`, `extinction.rV`, `extinction.aV`, `temperatureRange`, …
 * @example
 * ```ts
 * const fitter = createBlackbodyFitterSI([bandB, bandV, bandR], { extinction: { rV: 3.1 } });
 * const fit = fitter.fit(fluxes, sigmas, [0, 0, 0]);
 * ```
 */
export function createBlackbodyFitterSI(channels: readonly FitChannelSI[], settings: BlackbodyFitSettingsSI = {}): BlackbodyFitterSI {
  const nCh = channels.length;
  if (nCh < 1) throw new RangeError("channels must contain at least one band or pixel; got 0");
  // ---- settings
  const ext = settings.extinction !== undefined;
  const rV = ext ? requirePositive("extinction.rV", settings.extinction?.rV ?? RV_DIFFUSE_ISM, "(dimensionless)") : 0;
  const aV0 = ext ? settings.extinction?.aV ?? 0 : 0;
  if (ext && (!(aV0 >= 0) || aV0 === Infinity)) {
    throw new RangeError(`extinction.aV must be a finite number >= 0 mag; got ${String(aV0)}`);
  }
  const fitAVRequested = ext && (settings.extinction?.fitAV ?? true);
  const range = settings.temperatureRangeK ?? DEFAULT_T_RANGE;
  const tMin = requirePositive("temperatureRange[0]", range[0], "K");
  const tMax = requirePositive("temperatureRange[1]", range[1], "K");
  if (!(tMax > tMin)) throw new RangeError(`temperatureRange[1] must exceed temperatureRange[0] (${tMin} K); got ${tMax} K`);
  const lnTMin = Math.log(tMin);
  const lnTMax = Math.log(tMax);
  const maxIter = settings.maxIterations ?? 200;
  if (!Number.isInteger(maxIter) || maxIter < 1) throw new RangeError(`maxIterations must be an integer >= 1; got ${String(maxIter)}`);
  const xtol = requirePositive("stepTolerance", settings.stepTolerance ?? 1e-10, "(dimensionless)");
  const ftol = requirePositive("chi2Tolerance", settings.chi2Tolerance ?? 1e-12, "(dimensionless)");
  const startMode = settings.start ?? "auto";
  if (startMode !== "auto" && startMode !== "grid") throw new RangeError(`start must be "auto" or "grid"; got ${String(startMode)}`);

  // ---- flatten channels
  const offs = new Int32Array(nCh + 1);
  let total = 0;
  for (let c = 0; c < nCh; c++) {
    const ch = channels[c] as FitChannelSI;
    const n = ch.wavelengthsM.length;
    if (n < 1 || ch.weights.length !== n) {
      throw new RangeError(`channels[${c}] must have at least one node and as many weights as wavelengths; got ${n} and ${ch.weights.length}`);
    }
    requirePositive(`channels[${c}].pivotWavelength`, ch.pivotWavelengthM, "m");
    offs[c] = total;
    total += n;
  }
  offs[nCh] = total;
  const aC = new Float64Array(total); // 2hc²/λ⁵
  const cX = new Float64Array(total); // c₂/λ
  const w = new Float64Array(total);
  const kx = new Float64Array(total);
  const we = new Float64Array(total);
  const pf = new Float64Array(nCh); // ⟨f_ν⟩/3631 Jy = ⟨f_λ⟩ · pf
  const kBar = new Float64Array(nCh); // band-mean k (for dereddening the colour start)
  const pivot = new Float64Array(nCh);
  for (let c = 0; c < nCh; c++) {
    const ch = channels[c] as FitChannelSI;
    const o = offs[c] as number;
    const n = ch.wavelengthsM.length;
    let kb = 0;
    for (let i = 0; i < n; i++) {
      const l = requirePositive(`channels[${c}].wavelengths[${i}]`, ch.wavelengthsM[i] as number, "m");
      const wi = ch.weights[i] as number;
      if (!(wi >= 0) || wi === Infinity) throw new RangeError(`channels[${c}].weights[${i}] must be a finite number >= 0; got ${String(wi)}`);
      const l2 = l * l;
      aC[o + i] = C1L / (l2 * l2 * l);
      cX[o + i] = C2 / l;
      w[o + i] = wi;
      we[o + i] = wi;
      if (ext && wi > 0) {
        let k: number;
        try {
          k = ccm89RatioSI(l, rV);
        } catch (e) {
          throw new RangeError(
            `channels[${c}] has a node at ${l} m, outside the CCM89 extinction law's domain [1e-7, 3.333e-6] m; ` +
              `trim the band or fit without extinction (${(e as Error).message})`,
          );
        }
        kx[o + i] = k;
        kb += wi * k;
      }
    }
    kBar[c] = kb;
    pivot[c] = ch.pivotWavelengthM;
    pf[c] = (ch.pivotWavelengthM * ch.pivotWavelengthM) / C / AB_ZERO_POINT;
  }
  let cachedAV = ext ? NaN : 0;

  // ---- per-fit data and work arrays (allocated once)
  const y = new Float64Array(nCh);
  const sg = new Float64Array(nCh);
  const kind = new Uint8Array(nCh);
  let r = new Float64Array(nCh);
  let rT = new Float64Array(nCh);
  let J = new Float64Array(nCh * 3);
  let JT = new Float64Array(nCh * 3);
  let mod = new Float64Array(nCh);
  let modT = new Float64Array(nCh);
  const s0buf = new Float64Array(nCh);
  const H = new Float64Array(9);
  const g = new Float64Array(3);
  const A = new Float64Array(9);
  const delta = new Float64Array(3);
  const p = new Float64Array(3);
  const zs = new Float64Array(3);
  const free = new Uint8Array(3);
  const idx = new Int32Array(3);
  const order = new Int32Array(nCh);
  let evaluations = 0;

  function setAV(aV: number): void {
    if (aV === cachedAV) return;
    for (let i = 0; i < total; i++) we[i] = (w[i] as number) * Math.exp(-K04 * aV * (kx[i] as number));
    cachedAV = aV;
  }

  /** χ² at (ln T, ln θ, A_V); fills residuals, Jacobian (stride 3) and model. Infinity when not finite. */
  function evaluate(lnT: number, lnTh: number, aV: number, rOut: Float64Array, jOut: Float64Array, mOut: Float64Array): number {
    evaluations++;
    const invT = Math.exp(-lnT);
    const s = (Math.PI / 4) * Math.exp(2 * lnTh);
    if (ext) setAV(aV);
    let chi2 = 0;
    for (let c = 0; c < nCh; c++) {
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      const end = offs[c + 1] as number;
      for (let i = offs[c] as number; i < end; i++) {
        // B = a/expm1(x); T ∂B/∂T = B x eˣ/(eˣ − 1) = B x (em + 1)/em
        const x = (cX[i] as number) * invT;
        const em = Math.expm1(x);
        if (em === Infinity) continue; // B underflows to 0
        const wb = ((we[i] as number) * (aC[i] as number)) / em;
        s0 += wb;
        s1 += (wb * x * (em + 1)) / em;
        s2 += wb * (kx[i] as number);
      }
      const sig = sg[c] as number;
      let m: number;
      let j0: number;
      let j1: number;
      let j2: number;
      if (kind[c] === DATA_FLUX_LAMBDA) {
        m = s * s0;
        j0 = (s * s1) / sig;
        j1 = (2 * m) / sig;
        j2 = (-K04 * s * s2) / sig;
      } else {
        const f = s * s0;
        if (!(f > 0)) return Infinity;
        m = -2.5 * Math.log10(f * (pf[c] as number));
        j0 = (-MAG_PER_LN * (s1 / s0)) / sig;
        j1 = (-2 * MAG_PER_LN) / sig;
        j2 = s2 / s0 / sig;
      }
      const rr = ((y[c] as number) - m) / sig;
      rOut[c] = rr;
      mOut[c] = m;
      jOut[3 * c] = j0;
      jOut[3 * c + 1] = j1;
      jOut[3 * c + 2] = j2;
      chi2 += rr * rr;
    }
    return Number.isFinite(chi2) ? chi2 : Infinity;
  }

  /** Band-mean B (S₀) per channel at (T, A_V) into s0buf. */
  function fillS0(T: number, aV: number): void {
    evaluations++;
    if (ext) setAV(aV);
    for (let c = 0; c < nCh; c++) {
      let s0 = 0;
      const end = offs[c + 1] as number;
      const invT = 1 / T;
      for (let i = offs[c] as number; i < end; i++) s0 += ((we[i] as number) * (aC[i] as number)) / Math.expm1((cX[i] as number) * invT);
      s0buf[c] = s0;
    }
  }

  /** ln θ minimising χ² (flux-only: linear least squares in s; otherwise in log flux) at (T, A_V); NaN if none. */
  function profileLnTheta(T: number, aV: number): number {
    fillS0(T, aV);
    let allFlux = true;
    for (let c = 0; c < nCh; c++) if (kind[c] !== DATA_FLUX_LAMBDA) allFlux = false;
    if (allFlux) {
      let num = 0;
      let den = 0;
      for (let c = 0; c < nCh; c++) {
        const s0 = s0buf[c] as number;
        const iv = 1 / ((sg[c] as number) * (sg[c] as number));
        num += (y[c] as number) * s0 * iv;
        den += s0 * s0 * iv;
      }
      const s = num / den;
      if (s > 0 && s !== Infinity) return 0.5 * Math.log((4 * s) / Math.PI);
    }
    let num = 0;
    let den = 0;
    for (let c = 0; c < nCh; c++) {
      const s0 = s0buf[c] as number;
      if (!(s0 > 0)) continue;
      let lnF: number;
      let sl: number;
      if (kind[c] === DATA_FLUX_LAMBDA) {
        if (!((y[c] as number) > 0)) continue;
        lnF = Math.log(y[c] as number);
        sl = (sg[c] as number) / (y[c] as number);
      } else {
        lnF = -((y[c] as number) / MAG_PER_LN) - Math.log(pf[c] as number);
        sl = (sg[c] as number) / MAG_PER_LN;
      }
      const iv = 1 / (sl * sl);
      num += (lnF - Math.log(s0)) * iv;
      den += iv;
    }
    if (!(den > 0)) return NaN;
    const lnS = num / den;
    return 0.5 * (lnS + Math.log(4 / Math.PI));
  }

  /** Observed band-mean f_λ of channel c (NaN for a non-positive flux). */
  function observedFLambda(c: number): number {
    if (kind[c] === DATA_FLUX_LAMBDA) return (y[c] as number) > 0 ? (y[c] as number) : NaN;
    return 10 ** ((y[c] as number) / -2.5) / (pf[c] as number);
  }

  /** Colour-temperature start (NaN when not available). */
  function colourStart(aV: number): number {
    if (nCh < 2) return NaN;
    // S/N order (insertion sort of indices; nCh is small for photometry)
    const snr = (c: number): number =>
      kind[c] === DATA_FLUX_LAMBDA ? (y[c] as number) / (sg[c] as number) : MAG_PER_LN / (sg[c] as number);
    for (let c = 0; c < nCh; c++) order[c] = c;
    for (let a = 1; a < nCh; a++) {
      const v = order[a] as number;
      let b = a - 1;
      while (b >= 0 && snr(order[b] as number) < snr(v)) {
        order[b + 1] = order[b] as number;
        b--;
      }
      order[b + 1] = v;
    }
    const c1 = order[0] as number;
    const f1 = observedFLambda(c1);
    if (!(f1 > 0)) return NaN;
    let c2 = -1;
    for (let a = 1; a < nCh; a++) {
      const c = order[a] as number;
      const q = (pivot[c] as number) / (pivot[c1] as number);
      if ((q >= COLOUR_MIN_PIVOT_RATIO || q <= 1 / COLOUR_MIN_PIVOT_RATIO) && observedFLambda(c) > 0) {
        c2 = c;
        break;
      }
    }
    if (c2 < 0) return NaN;
    let ratio = f1 / observedFLambda(c2);
    if (ext && aV > 0) ratio *= Math.exp(K04 * aV * ((kBar[c1] as number) - (kBar[c2] as number)));
    if (!(ratio > 0) || ratio === Infinity) return NaN;
    try {
      return colourTemperatureFromRatioSI(pivot[c1] as number, pivot[c2] as number, ratio);
    } catch {
      return NaN;
    }
  }

  /** Cholesky solve of the k×k system in A (row-major, stride 3) with rhs g[idx]; result into delta[idx]. */
  function choleskySolve(k: number): boolean {
    // in-place lower factor in A
    for (let i = 0; i < k; i++) {
      for (let j = 0; j <= i; j++) {
        let sum = A[i * 3 + j] as number;
        for (let m = 0; m < j; m++) sum -= (A[i * 3 + m] as number) * (A[j * 3 + m] as number);
        if (i === j) {
          // A pivot within 64 ulp of the diagonal it came from is rounding noise (forming
          // H and the subtraction each cost a few ulp of it): treat it as singular, so an
          // exactly rank-deficient H is flagged whatever the sign of its last bits.
          if (!(sum > 64 * Number.EPSILON * (A[i * 3 + i] as number)) || !Number.isFinite(sum)) return false;
          A[i * 3 + i] = Math.sqrt(sum);
        } else {
          A[i * 3 + j] = sum / (A[j * 3 + j] as number);
        }
      }
    }
    const z = zs; // scratch for forward and back substitution
    for (let i = 0; i < k; i++) {
      let sum = g[idx[i] as number] as number;
      for (let m = 0; m < i; m++) sum -= (A[i * 3 + m] as number) * (z[m] as number);
      z[i] = sum / (A[i * 3 + i] as number);
    }
    for (let i = k - 1; i >= 0; i--) {
      let sum = z[i] as number;
      for (let m = i + 1; m < k; m++) sum -= (A[m * 3 + i] as number) * (z[m] as number);
      z[i] = sum / (A[i * 3 + i] as number);
    }
    for (let i = 0; i < 3; i++) delta[i] = 0;
    for (let i = 0; i < k; i++) delta[idx[i] as number] = z[i] as number;
    return true;
  }

  /** Inverse of the np×np matrix H (stride 3) into a nested array; null if not positive definite. */
  function inverseH(np: number): number[][] | null {
    // column by column through the Cholesky solver (np ≤ 3); null when not positive definite
    for (let i = 0; i < np; i++) idx[i] = i;
    const out: number[][] = [];
    for (let col = 0; col < np; col++) {
      for (let i = 0; i < 9; i++) A[i] = H[i] as number;
      for (let i = 0; i < 3; i++) g[i] = i === col ? 1 : 0;
      if (!choleskySolve(np)) return null;
      out.push(Array.from(delta.subarray(0, np)));
    }
    // symmetric: out[col][row]; return as rows
    return out.map((_, i) => out.map((colv) => colv[i] as number));
  }

  function fit(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>): BlackbodyFitSI {
    if (values.length !== nCh || sigmas.length !== nCh || kinds.length !== nCh) {
      throw new RangeError(`values, sigmas and kinds must each have ${nCh} entries (one per channel); got ${values.length}, ${sigmas.length}, ${kinds.length}`);
    }
    for (let c = 0; c < nCh; c++) {
      const k = kinds[c] as number;
      if (k !== DATA_FLUX_LAMBDA && k !== DATA_AB_MAGNITUDE) throw new RangeError(`kinds[${c}] must be 0 (f_λ) or 1 (AB magnitude); got ${String(k)}`);
      requireFinite(`values[${c}]`, values[c] as number, k === DATA_FLUX_LAMBDA ? "W m^-3" : "mag");
      requirePositive(`sigmas[${c}]`, sigmas[c] as number, k === DATA_FLUX_LAMBDA ? "W m^-3" : "mag");
      y[c] = values[c] as number;
      sg[c] = sigmas[c] as number;
      kind[c] = k;
    }
    if (nCh < 2) {
      throw new RangeError(`observations must include at least 2 bands (or spectrum pixels) to determine both T and θ; got ${nCh}`);
    }
    let anyPositive = false;
    for (let c = 0; c < nCh; c++) if (kind[c] === DATA_AB_MAGNITUDE || (y[c] as number) > 0) anyPositive = true;
    if (!anyPositive) throw new RangeError("observations: no flux is > 0, so no blackbody can be fitted");
    evaluations = 0;
    const fitAV = fitAVRequested && nCh >= 3;
    const np = fitAV ? 3 : 2;
    const aVStart = aV0;

    // ---- start
    let startMethod: "colour" | "grid" = "grid";
    let lnT0 = NaN;
    let lnTh0 = NaN;
    if (startMode === "auto") {
      const tc = colourStart(aVStart);
      if (tc >= tMin && tc <= tMax) {
        const lt = profileLnTheta(tc, aVStart);
        if (Number.isFinite(lt)) {
          lnT0 = Math.log(tc);
          lnTh0 = lt;
          startMethod = "colour";
        }
      }
    }
    if (startMethod === "grid") {
      let best = Infinity;
      for (let i = 0; i < GRID_POINTS; i++) {
        const lt = lnTMin + ((lnTMax - lnTMin) * i) / (GRID_POINTS - 1);
        const lth = profileLnTheta(Math.exp(lt), aVStart);
        if (!Number.isFinite(lth)) continue;
        const chi = evaluate(lt, lth, aVStart, rT, JT, modT);
        if (chi < best) {
          best = chi;
          lnT0 = lt;
          lnTh0 = lth;
        }
      }
      if (!Number.isFinite(lnT0)) {
        throw new RangeError(`observations: no blackbody between ${tMin} K and ${tMax} K gives a finite χ² for these data`);
      }
    }
    const startT = Math.exp(lnT0);

    // ---- Levenberg–Marquardt
    p[0] = lnT0;
    p[1] = lnTh0;
    p[2] = aVStart;
    let chi2 = evaluate(p[0] as number, p[1] as number, p[2] as number, r, J, mod);
    if (chi2 === Infinity) throw new RangeError("observations: the model is not finite at the starting point");
    let lambda = 1e-3;
    let iterations = 0;
    let stop: FitStopReason = "maxIterations";
    if (chi2 === 0) stop = "exact";
    while (stop === "maxIterations" && iterations < maxIter) {
      // normal equations
      for (let a = 0; a < 3; a++) {
        let ga = 0;
        for (let c = 0; c < nCh; c++) ga += (J[3 * c + a] as number) * (r[c] as number);
        g[a] = ga;
        for (let b = 0; b <= a; b++) {
          let h = 0;
          for (let c = 0; c < nCh; c++) h += (J[3 * c + a] as number) * (J[3 * c + b] as number);
          H[a * 3 + b] = h;
          H[b * 3 + a] = h;
        }
      }
      // active set
      const p0 = p[0] as number;
      free[0] = (p0 <= lnTMin && (g[0] as number) < 0) || (p0 >= lnTMax && (g[0] as number) > 0) ? 0 : 1;
      free[1] = 1;
      free[2] = np === 3 && !((p[2] as number) <= 0 && (g[2] as number) <= 0) ? 1 : 0;
      let k = 0;
      for (let a = 0; a < 3; a++) if (free[a] === 1) idx[k++] = a;
      for (let i = 0; i < k; i++) {
        for (let j = 0; j < k; j++) {
          const ai = idx[i] as number;
          const aj = idx[j] as number;
          const h = H[ai * 3 + aj] as number;
          A[i * 3 + j] = i === j ? h * (1 + lambda) + (h === 0 ? lambda : 0) : h;
        }
      }
      iterations++;
      if (!choleskySolve(k)) {
        lambda *= 10;
        if (lambda > 1e16) {
          stop = "stalled";
          break;
        }
        continue;
      }
      // trial point, projected onto the box
      let tl: number = (p[0] as number) + (delta[0] as number);
      if (tl < lnTMin) tl = lnTMin;
      if (tl > lnTMax) tl = lnTMax;
      let ta: number = (p[2] as number) + (delta[2] as number);
      if (np < 3) ta = p[2] as number;
      if (ta < 0) ta = 0;
      const th: number = (p[1] as number) + (delta[1] as number);
      const step = Math.max(Math.abs(tl - (p[0] as number)), Math.abs(th - (p[1] as number)), Math.abs(ta - (p[2] as number)));
      const chiT = evaluate(tl, th, ta, rT, JT, modT);
      if (chiT < chi2) {
        const rel = (chi2 - chiT) / chiT;
        const usedLambda = lambda;
        p[0] = tl;
        p[1] = th;
        p[2] = ta;
        chi2 = chiT;
        let t = r; r = rT; rT = t;
        t = J; J = JT; JT = t;
        t = mod; mod = modT; modT = t;
        if (chi2 === 0) stop = "exact";
        else if (step <= xtol) stop = "step";
        else if (rel <= ftol && usedLambda <= 1) stop = "chi2";
        lambda = Math.max(lambda / 10, 1e-12);
      } else {
        if (step <= xtol) {
          stop = "step";
          break;
        }
        lambda *= 10;
        if (lambda > 1e16) {
          stop = "stalled";
          break;
        }
      }
    }

    // ---- covariance at the solution (full JᵀJ of the fitted parameters)
    for (let a = 0; a < np; a++) {
      for (let b = 0; b < np; b++) {
        let h = 0;
        for (let c = 0; c < nCh; c++) h += (J[3 * c + a] as number) * (J[3 * c + b] as number);
        H[a * 3 + b] = h;
      }
    }
    const inv = inverseH(np);
    const T = Math.exp(p[0] as number);
    const theta = Math.exp(p[1] as number);
    const aV = p[2] as number;
    const dScale = [T, theta, 1];
    const logCov: number[][] = [];
    const cov: number[][] = [];
    const cor: number[][] = [];
    for (let a = 0; a < np; a++) {
      const lc: number[] = [];
      const cc: number[] = [];
      const rc: number[] = [];
      for (let b = 0; b < np; b++) {
        const v = inv === null ? NaN : (inv[a]?.[b] as number);
        lc.push(v);
        cc.push((dScale[a] as number) * (dScale[b] as number) * v);
        rc.push(inv === null ? NaN : v / Math.sqrt((inv[a]?.[a] as number) * (inv[b]?.[b] as number)));
      }
      logCov.push(lc);
      cov.push(cc);
      cor.push(rc);
    }
    const dof = nCh - np;
    const tooFew = dof < 1 || inv === null || (fitAVRequested && !fitAV);
    const pValue = dof >= 1 ? chiSquarePValue(chi2, dof) : null;
    const atT = Math.abs((p[0] as number) - lnTMin) <= 1e-9 || Math.abs((p[0] as number) - lnTMax) <= 1e-9;
    const params: FitParameterName[] = ["temperatureK", "angularDiameterRad"];
    if (fitAV) params.push("extinctionAV");
    return {
      temperatureK: T,
      sigmaTemperatureK: Math.sqrt(cov[0]?.[0] as number),
      angularDiameterRad: theta,
      sigmaAngularDiameterRad: Math.sqrt(cov[1]?.[1] as number),
      extinctionAV: aV,
      sigmaExtinctionAV: fitAV ? Math.sqrt(cov[2]?.[2] as number) : 0,
      rV: ext ? rV : null,
      parameters: params,
      covariance: cov,
      lnCovariance: logCov,
      correlation: cor,
      chi2,
      dof,
      reducedChi2: dof >= 1 ? chi2 / dof : null,
      pValue,
      iterations,
      evaluations,
      startTemperatureK: startT,
      startMethod,
      stopReason: stop,
      model: Array.from(mod),
      pulls: Array.from(r),
      flags: {
        notConverged: stop === "maxIterations" || stop === "stalled",
        atLimit: atT || (fitAV && aV === 0),
        tooFewBands: tooFew,
        poorFit: pValue !== null && pValue < 0.001,
      },
    };
  }

  return { channels: nCh, fit };
}
