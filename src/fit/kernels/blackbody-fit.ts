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
 * Since the model refactor this fitter is the blackbody model
 * (sed-model.ts `blackbodyComponentSI`, CCM89 `ccm89AttenuationSI`) on the
 * generic fitter (model-fit.ts) and the one least-squares engine
 * (least-squares.ts); the colour-temperature start is its start strategy.
 * Results agree with the pre-refactor fitter to ≤ 1e-12 relative (fixture
 * test/fixtures/fit/blackbody-fit-baseline.json).
 *
 * Allocation: the fitter allocates its work arrays once; an iteration
 * allocates nothing (the colour-temperature start and the result object
 * allocate once per fit).
 *
 * @internal
 */
import { C1L, C2 } from "../../values/constants";
import { requirePositive } from "../../internal/checks";
import { ccm89RatioSI, RV_DIFFUSE_ISM } from "../../photometry/kernels/extinction";
import { colourTemperatureFromRatioSI } from "../../radiation/kernels/colour-temperature";
import type { StopReason } from "./least-squares";
import { createSedFitterSI, DATA_AB_MAGNITUDE, DATA_FLUX_LAMBDA, type FitChannelSI, type StartContextSI } from "./model-fit";
import { blackbodyComponentSI, ccm89AttenuationSI, sedModelSI, type SedModelSI } from "./sed-model";

export { DATA_AB_MAGNITUDE, DATA_FLUX_LAMBDA, type FitChannelSI };

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
export type FitStopReason = StopReason;

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

const K04 = 0.4 * Math.LN10; // d ln f / d A (per mag)
const MAG_PER_LN = 2.5 / Math.LN10;
const DEFAULT_T_RANGE: readonly [number, number] = [300, 1e6];
const COLOUR_MIN_PIVOT_RATIO = 1.15;

/** The fitter's model: a blackbody disc, CCM89-attenuated when `extinction` is set. */
export function blackbodyModelSI(settings: BlackbodyFitSettingsSI = {}): SedModelSI {
  const ext = settings.extinction;
  const range = settings.temperatureRangeK ?? DEFAULT_T_RANGE;
  const star = blackbodyComponentSI({ temperatureRangeK: [range[0], range[1]] });
  if (ext === undefined) return sedModelSI([{ component: star }]);
  return sedModelSI([{ component: star, attenuation: ccm89AttenuationSI(ext.rV ?? RV_DIFFUSE_ISM, ext.aV ?? 0, ext.fitAV ?? true) }]);
}

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
  // ---- settings (checked here first, with the messages of the fitter's API)
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
  requirePositive("stepTolerance", settings.stepTolerance ?? 1e-10, "(dimensionless)");
  requirePositive("chi2Tolerance", settings.chi2Tolerance ?? 1e-12, "(dimensionless)");
  const startMode = settings.start ?? "auto";
  if (startMode !== "auto" && startMode !== "grid") throw new RangeError(`start must be "auto" or "grid"; got ${String(startMode)}`);

  // band-mean CCM89 ratio per channel (dereddening of the colour start)
  const kBar = new Float64Array(nCh);
  const pivot = new Float64Array(nCh);
  for (let c = 0; c < nCh; c++) {
    const ch = channels[c] as FitChannelSI;
    pivot[c] = ch.pivotWavelengthM;
    if (!ext) continue;
    let kb = 0;
    for (let i = 0; i < ch.wavelengthsM.length; i++) {
      const wi = ch.weights[i] as number;
      const l = ch.wavelengthsM[i] as number;
      if (!(wi > 0) || !(l > 0)) continue;
      try {
        kb += wi * ccm89RatioSI(l, rV);
      } catch {
        // reported by the model preparation, naming the channel
      }
    }
    kBar[c] = kb;
  }
  const order = new Int32Array(nCh);

  /** Colour-temperature start (NaN when not available). */
  function colourStart(ctx: StartContextSI, aV: number): number {
    if (nCh < 2) return NaN;
    const y = ctx.values;
    const sg = ctx.sigmas;
    const kind = ctx.kinds;
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
    const f1 = ctx.observedFluxLambda(c1);
    if (!(f1 > 0)) return NaN;
    let c2 = -1;
    for (let a = 1; a < nCh; a++) {
      const c = order[a] as number;
      const q = (pivot[c] as number) / (pivot[c1] as number);
      if ((q >= COLOUR_MIN_PIVOT_RATIO || q <= 1 / COLOUR_MIN_PIVOT_RATIO) && ctx.observedFluxLambda(c) > 0) {
        c2 = c;
        break;
      }
    }
    if (c2 < 0) return NaN;
    let ratio = f1 / ctx.observedFluxLambda(c2);
    if (ext && aV > 0) ratio *= Math.exp(K04 * aV * ((kBar[c1] as number) - (kBar[c2] as number)));
    if (!(ratio > 0) || ratio === Infinity) return NaN;
    try {
      return colourTemperatureFromRatioSI(pivot[c1] as number, pivot[c2] as number, ratio);
    } catch {
      return NaN;
    }
  }

  const fitter = createSedFitterSI(channels, blackbodyModelSI(settings), {
    maxIterations: maxIter,
    ...(settings.stepTolerance !== undefined ? { stepTolerance: settings.stepTolerance } : {}),
    ...(settings.chi2Tolerance !== undefined ? { chi2Tolerance: settings.chi2Tolerance } : {}),
    startMode,
    start: {
      name: "colour",
      strategy(ctx, q) {
        const tc = colourStart(ctx, aV0);
        if (!(tc >= tMin && tc <= tMax)) return false;
        q[0] = Math.log(tc);
        return ctx.profileAmplitudes(q) && Number.isFinite(q[1]);
      },
    },
  });
  const mask = new Uint8Array(ext ? 3 : 2);

  function fit(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>): BlackbodyFitSI {
    if (values.length === nCh && sigmas.length === nCh && kinds.length === nCh && nCh < 2) {
      throw new RangeError(`observations must include at least 2 bands (or spectrum pixels) to determine both T and θ; got ${nCh}`);
    }
    const fitAV = fitAVRequested && nCh >= 3;
    const np = fitAV ? 3 : 2;
    mask[0] = 1;
    mask[1] = 1;
    if (ext) mask[2] = fitAV ? 1 : 0;
    const out = fitter.fitDetailed(values, sigmas, kinds, mask);
    const res = out.result;
    const q = out.q;
    const T = Math.exp(q[0] as number);
    const theta = Math.exp(q[1] as number);
    const aV = ext ? (q[2] as number) : 0;
    const cov = res.covariance.matrix;
    const inv = out.internalCovariance;
    const logCov = res.covariance.internalMatrix;
    const dof = nCh - np;
    const atT = Math.abs((q[0] as number) - lnTMin) <= 1e-9 || Math.abs((q[0] as number) - lnTMax) <= 1e-9;
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
      correlation: res.correlation,
      chi2: res.chi2,
      dof,
      reducedChi2: res.reducedChi2,
      pValue: res.pValue,
      iterations: res.iterations,
      evaluations: res.evaluations,
      startTemperatureK: Math.exp(out.startInternal[0] as number),
      startMethod: res.startMethod === "colour" ? "colour" : "grid",
      stopReason: res.stopReason,
      model: res.model,
      pulls: res.pulls,
      flags: {
        notConverged: res.flags.notConverged,
        atLimit: atT || (fitAV && aV === 0),
        tooFewBands: dof < 1 || inv === null || (fitAVRequested && !fitAV),
        poorFit: res.flags.poorFit,
      },
    };
  }

  return { channels: nCh, fit };
}
