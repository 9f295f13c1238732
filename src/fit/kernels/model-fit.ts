/**
 * Fit any SED model (sed-model.ts) to band fluxes, AB magnitudes or
 * spectrum pixels with the one least-squares engine (least-squares.ts).
 *
 * Residuals are (y − model)/σ in the space each error was quoted: flux for
 * f_λ data, magnitudes for AB data, m = −2.5 log10(⟨f_λ⟩ λ_p²/(c · 3631 Jy))
 * (pivot wavelength λ_p, bands.ts), ∂m/∂q = −(2.5/ln10) ∂⟨f⟩/∂q / ⟨f⟩.
 *
 * Start: a strategy may be given (the blackbody fitter's colour temperature
 * is one); otherwise, and when it fails, a grid over the free parameters
 * that declare `startGrid` points (log-spaced over their bounds; with g
 * gridded parameters, max(7, round(N^(1/g))) points each), the other
 * parameters at their `start` and the amplitudes profiled at each point:
 * weighted linear least squares in flux (a single component with magnitude
 * data: the weighted mean of ln(y/S) in log flux); a non-positive amplitude
 * of a sum is replaced by 1e-6 of its single-component value.
 *
 * Output: every parameter as an estimate `{ name, unit, value, sigma,
 * relativeSigma, fitted, atBound }` (sigma 0 when held), the covariance of the
 * fitted parameters in their units and in internal coordinates (ln p for log
 * parameters: C = D C_int D, D = diag(p or 1)), correlations, χ², dof, the
 * p-value P(χ²_dof ≥ χ²) (p-value.ts), and the information criteria
 * AIC = χ² + 2k and BIC = χ² + k ln n (Akaike 1974; Schwarz 1978; the
 * Gaussian likelihood's constant dropped, so only differences between fits of
 * the same data mean anything).
 *
 * @module
 */
import { AB_ZERO_POINT, C } from "../../values/constants";
import { requireFinite, requirePositive } from "../../internal/checks";
import { chiSquarePValue } from "./p-value";
import { createLeastSquaresSolver, type LeastSquaresSettings, type StopReason } from "./least-squares";
import { fromInternal, prepareSedModelSI, toInternal, type ModelParameterSI, type SedModelSI } from "./sed-model";

/** Data kind of a channel: band-mean f_λ (W m⁻³). */
export const DATA_FLUX_LAMBDA = 0;
/** Data kind of a channel: AB magnitude (mag). */
export const DATA_AB_MAGNITUDE = 1;

/** One channel (band or spectrum pixel) as the fitter sees it. */
export interface FitChannelSI {
  /** Nodes, m (> 0). */
  readonly wavelengthsM: ArrayLike<number>;
  /** Normalized weights (Σ = 1). */
  readonly weights: ArrayLike<number>;
  /** Pivot wavelength, m (for magnitudes and start guesses). */
  readonly pivotWavelengthM: number;
}

/** One fitted (or held) parameter: the estimate shape of docs/naming.md §6, in SI. */
export interface ParameterEstimateSI {
  /** Parameter name, as declared by its component (e.g. `temperatureK`). */
  readonly name: string;
  /** SI unit text of the value and σ (e.g. `K`, `sr`, `1`). */
  readonly unit: string;
  /** Best-fit value, in `unit`. */
  readonly value: number;
  /** First-order standard uncertainty (0 when held). */
  readonly sigma: number;
  /** sigma/|value| (sigma itself for a value of 0). */
  readonly relativeSigma: number;
  /** Fitted (false: held at its start value). */
  readonly fitted: boolean;
  /** Within 1e-9 (internal coordinate) of a bound. */
  readonly atBound: boolean;
}

/** Covariance of the fitted parameters (docs/naming.md §6 form, internal coordinates beside). */
export interface ParameterCovarianceSI {
  /** Parameter names in the order of the matrix rows and columns. */
  readonly order: string[];
  /** SI unit text of each parameter, in `order`. */
  readonly units: string[];
  /** Covariance of the parameters in their own units (σᵢ² on the diagonal). */
  readonly matrix: number[][];
  /** In internal coordinates (ln p for log parameters, p for linear ones). */
  readonly internalMatrix: number[][];
}

/** Quality flags of a model fit. */
export interface SedFitFlagsSI {
  /** The iteration stopped before its convergence criterion. */
  readonly notConverged: boolean;
  /** A fitted parameter ends at one of its bounds (its σ is then only indicative). */
  readonly atLimit: boolean;
  /** Fewer data points than fitted parameters (no degrees of freedom). */
  readonly tooFewBands: boolean;
  /** χ² is improbably large for its degrees of freedom (p < 0.001). */
  readonly poorFit: boolean;
  /** Some pair of fitted parameters has |ρ| > 0.95 (a degeneracy: see `strongCorrelations`). */
  readonly strongCorrelation: boolean;
}

/** Result of a model fit, plain JSON. */
export interface SedFitSI {
  /** Every model parameter with its value and σ (held ones with σ = 0). */
  readonly parameters: ParameterEstimateSI[];
  /** Covariance of the fitted parameters. */
  readonly covariance: ParameterCovarianceSI;
  /** Correlation matrix of the fitted parameters (in `covariance.order`). */
  readonly correlation: number[][];
  /** Pairs of fitted parameters with |ρ| > 0.95: [name, name, ρ]. */
  readonly strongCorrelations: [string, string, number][];
  /** χ² at the best fit. */
  readonly chi2: number;
  /** Degrees of freedom: data points minus fitted parameters. */
  readonly dof: number;
  /** χ²/dof, or null without degrees of freedom. */
  readonly reducedChi2: number | null;
  /** Probability of a χ² at least this large for `dof` degrees of freedom, or null without them. */
  readonly pValue: number | null;
  /** χ² + 2k (k fitted parameters). */
  readonly aic: number;
  /** χ² + k ln n (n channels). */
  readonly bic: number;
  /** Levenberg–Marquardt iterations taken. */
  readonly iterations: number;
  /** Model evaluations taken (including rejected steps). */
  readonly evaluations: number;
  /** How the start was found (the strategy's name, or `grid`). */
  readonly startMethod: string;
  /** Why the iteration stopped. */
  readonly stopReason: StopReason;
  /** Model per channel in its data unit. */
  readonly model: number[];
  /** (data − model)/σ for each data point. */
  readonly pulls: number[];
  /** Warnings about the fit. */
  readonly flags: SedFitFlagsSI;
}

/** What a start strategy can use. */
export interface StartContextSI {
  /** The model being fitted. */
  readonly model: SedModelSI;
  /** Number of data points (bands or spectrum pixels). */
  readonly channels: number;
  /** Data values, in the kind given by `kinds` (f_λ in W m⁻³ or AB mag). */
  readonly values: Float64Array;
  /** Standard uncertainties of `values`, same units. */
  readonly sigmas: Float64Array;
  /** Data kind of each point (0: band-mean f_λ, 1: AB magnitude). */
  readonly kinds: Uint8Array;
  /** Pivot wavelength of each point, m. */
  readonly pivotsM: Float64Array;
  /** Observed band-mean f_λ of a channel (NaN for a non-positive flux). */
  observedFluxLambda(c: number): number;
  /** Set every amplitude in q (internal) to its profiled value; false when none can be found. */
  profileAmplitudes(q: Float64Array): boolean;
  /** χ² at internal q (Infinity when not finite). */
  chi2(q: Float64Array): number;
}

/** A start strategy: internal start values, or null to fall back to the grid. */
export type StartStrategySI = (ctx: StartContextSI, q: Float64Array) => boolean;

/** Settings of a model fitter. */
export interface SedFitterSettingsSI extends LeastSquaresSettings {
  /** Start strategy tried before the grid (its name goes to `startMethod`). */
  readonly start?: {
    /** Name recorded in `startMethod`. */
    readonly name: string;
    /** Returns start values (internal coordinates) from the data. */
    readonly strategy: StartStrategySI;
  };
  /** "auto" (strategy, then grid; default) or "grid". */
  readonly startMode?: "auto" | "grid";
}

/** Lower-level outcome (internal coordinates) for wrappers. */
export interface SedFitOutcomeSI {
  /** The fit as returned to users. */
  readonly result: SedFitSI;
  /** Best fit in the internal coordinates (log for positive scales). */
  readonly q: Float64Array;
  /** Covariance in the internal coordinates, or null when singular. */
  readonly internalCovariance: number[][] | null;
  /** The start point in the internal coordinates. */
  readonly startInternal: Float64Array;
}

/** A reusable fitter for one model on one set of channels. */
export interface SedFitterSI {
  /** Number of data points this fitter was prepared for. */
  readonly channels: number;
  /** The model this fitter fits. */
  readonly model: SedModelSI;
  /**
   * Fit one star. `kinds[c]`: DATA_FLUX_LAMBDA (W m⁻³) or DATA_AB_MAGNITUDE (mag); sigmas > 0.
   * @throws RangeError naming `values[c]`, `sigmas[c]` or `kinds[c]`
   */
  fit(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>): SedFitSI;
  /** As `fit`, with a per-fit held mask (1 = fitted) and the internal outcome. */
  fitDetailed(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>, fitted?: ArrayLike<number>): SedFitOutcomeSI;
}

const MAG_PER_LN = 2.5 / Math.LN10;

/**
 * Build a fitter for a model on channels (prepared once; reuse it for every
 * star observed in the same bands).
 *
 * @throws RangeError for no channels, bad nodes or weights, or a bad setting
 * @example
 * ```ts
 * const model = sedModelSI([{ component: blackbodyComponentSI() }]);
 * const fitter = createSedFitterSI([bandB, bandV, bandR], model);
 * const fit = fitter.fit(fluxes, sigmas, [0, 0, 0]);
 * fit.parameters[0]!.value; // T, K
 * ```
 */
export function createSedFitterSI(channels: readonly FitChannelSI[], model: SedModelSI, settings: SedFitterSettingsSI = {}): SedFitterSI {
  const nCh = channels.length;
  if (nCh < 1) throw new RangeError("channels must contain at least one band or pixel; got 0");
  const np = model.parameters.length;
  const params = model.parameters;
  const pivots = new Float64Array(nCh);
  const pf = new Float64Array(nCh);
  for (let c = 0; c < nCh; c++) {
    const ch = channels[c] as FitChannelSI;
    const n = ch.wavelengthsM.length;
    if (n < 1 || ch.weights.length !== n) {
      throw new RangeError(`channels[${c}] must have at least one node and as many weights as wavelengths; got ${n} and ${ch.weights.length}`);
    }
    requirePositive(`channels[${c}].pivotWavelength`, ch.pivotWavelengthM, "m");
    for (let i = 0; i < n; i++) {
      requirePositive(`channels[${c}].wavelengths[${i}]`, ch.wavelengthsM[i] as number, "m");
      const wi = ch.weights[i] as number;
      if (!(wi >= 0) || wi === Infinity) throw new RangeError(`channels[${c}].weights[${i}] must be a finite number >= 0; got ${String(wi)}`);
    }
    pivots[c] = ch.pivotWavelengthM;
    pf[c] = (ch.pivotWavelengthM * ch.pivotWavelengthM) / C / AB_ZERO_POINT;
  }
  const prepared = prepareSedModelSI(model, channels);
  const solver = createLeastSquaresSolver(nCh, np, settings);
  const startMode = settings.startMode ?? "auto";
  if (startMode !== "auto" && startMode !== "grid") throw new RangeError(`start must be "auto" or "grid"; got ${String(startMode)}`);
  const lower = new Float64Array(np);
  const upper = new Float64Array(np);
  const defaultFitted = new Uint8Array(np);
  const q0 = new Float64Array(np);
  for (let a = 0; a < np; a++) {
    const p = params[a] as ModelParameterSI;
    lower[a] = toInternal(p, p.lower);
    upper[a] = toInternal(p, p.upper);
    defaultFitted[a] = p.fixed === true ? 0 : 1;
    q0[a] = toInternal(p, p.start);
  }
  const terms = model.terms;
  const ampIndex = new Int32Array(terms.length);
  {
    let first = 0;
    for (let t = 0; t < terms.length; t++) {
      const comp = (terms[t] as (typeof terms)[number]).component;
      ampIndex[t] = first + comp.amplitudeIndex;
      first += comp.parameters.length;
    }
  }

  // per-fit data and work arrays
  const y = new Float64Array(nCh);
  const sg = new Float64Array(nCh);
  const kind = new Uint8Array(nCh);
  const means = new Float64Array(nCh);
  const dm = new Float64Array(nCh * np);
  const shapeBuf = terms.map(() => new Float64Array(nCh));
  const rScratch = new Float64Array(nCh);
  const jScratch = new Float64Array(nCh * np);
  const qWork = new Float64Array(np);
  const qBest = new Float64Array(np);
  const fittedMask = new Uint8Array(np);
  let evaluations = 0;

  function evaluate(q: Float64Array, r: Float64Array, J: Float64Array): number {
    evaluations++;
    prepared.evaluate(q, means, dm);
    let chi2 = 0;
    for (let c = 0; c < nCh; c++) {
      const sig = sg[c] as number;
      const f = means[c] as number;
      let m: number;
      if (kind[c] === DATA_FLUX_LAMBDA) {
        m = f;
        for (let a = 0; a < np; a++) J[c * np + a] = (dm[c * np + a] as number) / sig;
      } else {
        if (!(f > 0)) return Infinity;
        m = -2.5 * Math.log10(f * (pf[c] as number));
        for (let a = 0; a < np; a++) J[c * np + a] = (-MAG_PER_LN * ((dm[c * np + a] as number) / f)) / sig;
      }
      const rr = ((y[c] as number) - m) / sig;
      r[c] = rr;
      chi2 += rr * rr;
    }
    return Number.isFinite(chi2) ? chi2 : Infinity;
  }
  const problem = { residuals: nCh, parameters: np, evaluate };

  function observedFluxLambda(c: number): number {
    if (kind[c] === DATA_FLUX_LAMBDA) return (y[c] as number) > 0 ? (y[c] as number) : NaN;
    return 10 ** ((y[c] as number) / -2.5) / (pf[c] as number);
  }

  function setAmplitude(q: Float64Array, t: number, x: number): void {
    const comp = (terms[t] as (typeof terms)[number]).component;
    q[ampIndex[t] as number] = Math.log(x) / comp.amplitudePower;
  }

  function profileAmplitudes(q: Float64Array): boolean {
    evaluations++;
    const nt = terms.length;
    for (let t = 0; t < nt; t++) prepared.termShapeMeans(t, q, shapeBuf[t] as Float64Array);
    let allFlux = true;
    for (let c = 0; c < nCh; c++) if (kind[c] !== DATA_FLUX_LAMBDA) allFlux = false;
    if (nt === 1) {
      const s0b = shapeBuf[0] as Float64Array;
      if (allFlux) {
        let num = 0;
        let den = 0;
        for (let c = 0; c < nCh; c++) {
          const s0 = s0b[c] as number;
          const iv = 1 / ((sg[c] as number) * (sg[c] as number));
          num += (y[c] as number) * s0 * iv;
          den += s0 * s0 * iv;
        }
        const s = num / den;
        if (s > 0 && s !== Infinity) {
          setAmplitude(q, 0, s);
          return true;
        }
      }
      let num = 0;
      let den = 0;
      for (let c = 0; c < nCh; c++) {
        const s0 = s0b[c] as number;
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
      if (!(den > 0)) return false;
      const comp = (terms[0] as (typeof terms)[number]).component;
      q[ampIndex[0] as number] = num / den / comp.amplitudePower;
      return Number.isFinite(q[ampIndex[0] as number]);
    }
    // several terms: weighted linear least squares in flux (normal equations, nt ≤ a few)
    const M = new Float64Array(nt * nt);
    const v = new Float64Array(nt);
    const single = new Float64Array(nt);
    for (let c = 0; c < nCh; c++) {
      let yc: number;
      let sc: number;
      if (kind[c] === DATA_FLUX_LAMBDA) {
        yc = y[c] as number;
        sc = sg[c] as number;
      } else {
        yc = observedFluxLambda(c);
        sc = (yc * (sg[c] as number)) / MAG_PER_LN;
      }
      const iv = 1 / (sc * sc);
      for (let a = 0; a < nt; a++) {
        const sa = (shapeBuf[a] as Float64Array)[c] as number;
        v[a] = (v[a] as number) + yc * sa * iv;
        for (let b = 0; b < nt; b++) M[a * nt + b] = (M[a * nt + b] as number) + sa * ((shapeBuf[b] as Float64Array)[c] as number) * iv;
      }
    }
    for (let a = 0; a < nt; a++) single[a] = (v[a] as number) / (M[a * nt + a] as number);
    const x = solveSmall(M, v, nt);
    let any = false;
    for (let t = 0; t < nt; t++) {
      let xt = x === null ? NaN : (x[t] as number);
      if (!(xt > 0) || xt === Infinity) xt = 1e-6 * Math.abs(single[t] as number);
      if (!(xt > 0) || xt === Infinity) xt = 1e-30;
      else any = true;
      setAmplitude(q, t, xt);
    }
    return any;
  }

  const ctx: StartContextSI = {
    model,
    channels: nCh,
    values: y,
    sigmas: sg,
    kinds: kind,
    pivotsM: pivots,
    observedFluxLambda,
    profileAmplitudes,
    chi2: (q) => evaluate(q, rScratch, jScratch),
  };

  function gridStart(fitted: ArrayLike<number>): boolean {
    const gridParams: number[] = [];
    for (let a = 0; a < np; a++) if (fitted[a] === 1 && ((params[a] as ModelParameterSI).startGrid ?? 0) > 0) gridParams.push(a);
    const g = gridParams.length;
    const counts = gridParams.map((a) => {
      const n = (params[a] as ModelParameterSI).startGrid as number;
      return g === 1 ? n : Math.max(7, Math.round(n ** (1 / g)));
    });
    let totalPts = 1;
    for (const n of counts) totalPts *= n;
    let best = Infinity;
    for (let k = 0; k < totalPts; k++) {
      qWork.set(q0);
      let rem = k;
      for (let j = 0; j < g; j++) {
        const a = gridParams[j] as number;
        const n = counts[j] as number;
        const i = rem % n;
        rem = (rem - i) / n;
        qWork[a] = (lower[a] as number) + (((upper[a] as number) - (lower[a] as number)) * i) / (n - 1);
      }
      if (!profileAmplitudes(qWork)) continue;
      const chi = evaluate(qWork, rScratch, jScratch);
      if (chi < best) {
        best = chi;
        qBest.set(qWork);
      }
    }
    return best < Infinity;
  }

  function fitDetailed(values: ArrayLike<number>, sigmas: ArrayLike<number>, kinds: ArrayLike<number>, fitted?: ArrayLike<number>): SedFitOutcomeSI {
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
    let anyPositive = false;
    for (let c = 0; c < nCh; c++) if (kind[c] === DATA_AB_MAGNITUDE || (y[c] as number) > 0) anyPositive = true;
    if (!anyPositive) throw new RangeError("observations: no flux is > 0, so no model can be fitted");
    for (let a = 0; a < np; a++) fittedMask[a] = fitted === undefined ? (defaultFitted[a] as number) : fitted[a] === 1 ? 1 : 0;
    evaluations = 0;
    // ---- start
    let startMethod = "grid";
    let started = false;
    if (startMode === "auto" && settings.start !== undefined) {
      qBest.set(q0);
      if (settings.start.strategy(ctx, qBest)) {
        started = true;
        startMethod = settings.start.name;
      }
    }
    if (!started && !gridStart(fittedMask)) {
      throw new RangeError("observations: no start on the model's start grid gives a finite χ² for these data");
    }
    const startInternal = Float64Array.from(qBest);
    const out = solver.solve(problem, qBest, fittedMask, lower, upper);
    // model values per channel at the solution
    prepared.evaluate(out.p, means, dm);
    const modelOut: number[] = [];
    for (let c = 0; c < nCh; c++) {
      const f = means[c] as number;
      modelOut.push(kind[c] === DATA_FLUX_LAMBDA ? f : -2.5 * Math.log10(f * (pf[c] as number)));
    }
    const inv = solver.covariance(fittedMask);
    const fittedIdx: number[] = [];
    for (let a = 0; a < np; a++) if (fittedMask[a] === 1) fittedIdx.push(a);
    const k = fittedIdx.length;
    const natural = params.map((p, a) => fromInternal(p, out.p[a] as number));
    const scale = fittedIdx.map((a) => ((params[a] as ModelParameterSI).transform === "log" ? (natural[a] as number) : 1));
    const internalMatrix: number[][] = [];
    const matrix: number[][] = [];
    const correlation: number[][] = [];
    for (let i = 0; i < k; i++) {
      const li: number[] = [];
      const mi: number[] = [];
      const ci: number[] = [];
      for (let j = 0; j < k; j++) {
        const v = inv === null ? NaN : (inv[i]?.[j] as number);
        li.push(v);
        mi.push((scale[i] as number) * (scale[j] as number) * v);
        ci.push(inv === null ? NaN : v / Math.sqrt((inv[i]?.[i] as number) * (inv[j]?.[j] as number)));
      }
      internalMatrix.push(li);
      matrix.push(mi);
      correlation.push(ci);
    }
    const strong: [string, string, number][] = [];
    for (let i = 0; i < k; i++) {
      for (let j = i + 1; j < k; j++) {
        const rho = correlation[i]?.[j] as number;
        if (Math.abs(rho) > 0.95) strong.push([model.names[fittedIdx[i] as number] as string, model.names[fittedIdx[j] as number] as string, rho]);
      }
    }
    let atLimit = false;
    const estimates: ParameterEstimateSI[] = params.map((p, a) => {
      const fi = fittedIdx.indexOf(a);
      const value = natural[a] as number;
      const sigma = fi < 0 ? 0 : Math.sqrt(matrix[fi]?.[fi] as number);
      const qa = out.p[a] as number;
      const atBound = fi >= 0 && (Math.abs(qa - (lower[a] as number)) <= 1e-9 || Math.abs(qa - (upper[a] as number)) <= 1e-9);
      if (atBound) atLimit = true;
      return { name: model.names[a] as string, unit: p.unit, value, sigma, relativeSigma: value === 0 ? sigma : sigma / Math.abs(value), fitted: fi >= 0, atBound };
    });
    const chi2 = out.chi2;
    const dof = nCh - k;
    const pValue = dof >= 1 ? chiSquarePValue(chi2, dof) : null;
    const result: SedFitSI = {
      parameters: estimates,
      covariance: { order: fittedIdx.map((a) => model.names[a] as string), units: fittedIdx.map((a) => (params[a] as ModelParameterSI).unit), matrix, internalMatrix },
      correlation,
      strongCorrelations: strong,
      chi2,
      dof,
      reducedChi2: dof >= 1 ? chi2 / dof : null,
      pValue,
      aic: chi2 + 2 * k,
      bic: chi2 + k * Math.log(nCh),
      iterations: out.iterations,
      evaluations,
      startMethod,
      stopReason: out.stop,
      model: modelOut,
      pulls: Array.from(out.r),
      flags: {
        notConverged: out.stop === "maxIterations" || out.stop === "stalled",
        atLimit,
        tooFewBands: dof < 1 || inv === null,
        poorFit: pValue !== null && pValue < 0.001,
        strongCorrelation: strong.length > 0,
      },
    };
    return { result, q: Float64Array.from(out.p), internalCovariance: inv, startInternal };
  }

  return {
    channels: nCh,
    model,
    fit: (values, sigmas, kinds) => fitDetailed(values, sigmas, kinds).result,
    fitDetailed,
  };
}

/** Gaussian elimination with partial pivoting for a tiny system; null when singular. */
function solveSmall(M: Float64Array, v: Float64Array, n: number): Float64Array | null {
  const a = Float64Array.from(M);
  const b = Float64Array.from(v);
  for (let i = 0; i < n; i++) {
    let piv = i;
    for (let r = i + 1; r < n; r++) if (Math.abs(a[r * n + i] as number) > Math.abs(a[piv * n + i] as number)) piv = r;
    if (!((a[piv * n + i] as number) !== 0)) return null;
    if (piv !== i) {
      for (let c = 0; c < n; c++) {
        const t = a[i * n + c] as number;
        a[i * n + c] = a[piv * n + c] as number;
        a[piv * n + c] = t;
      }
      const t = b[i] as number;
      b[i] = b[piv] as number;
      b[piv] = t;
    }
    for (let r = i + 1; r < n; r++) {
      const f = (a[r * n + i] as number) / (a[i * n + i] as number);
      for (let c = i; c < n; c++) a[r * n + c] = (a[r * n + c] as number) - f * (a[i * n + c] as number);
      b[r] = (b[r] as number) - f * (b[i] as number);
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i] as number;
    for (let c = i + 1; c < n; c++) s -= (a[i * n + c] as number) * (b[c] as number);
    b[i] = s / (a[i * n + i] as number);
  }
  return b;
}

/** Comparison of a one-component fit with a two-component (excess) fit of the same data. */
export interface ExcessComparisonSI {
  /** χ²(one) − χ²(two) (≥ 0 for nested models at their minima). */
  readonly deltaChi2: number;
  /** Extra fitted parameters of the two-component model. */
  readonly deltaDof: number;
  /** P(χ²_Δdof ≥ Δχ²): the likelihood-ratio test's p-value (approximate: the null sits on the amplitude's boundary). */
  readonly pValue: number;
  /** AIC(two) − AIC(one) (< 0 favours the excess). */
  readonly deltaAic: number;
  /** BIC(two) − BIC(one) (< 0 favours the excess). */
  readonly deltaBic: number;
  /** The excess counts as detected: p < 0.0027 (3σ, common practice) and ΔBIC < 0. */
  readonly detected: boolean;
}

/**
 * Compare a one-component fit and a two-component fit of the same channels
 * (Δχ², the likelihood-ratio p-value, ΔAIC, ΔBIC) and decide whether the
 * excess is detected.
 *
 * @example
 * ```ts
 * const cmp = compareExcessSI(starOnly, starPlusDust);
 * cmp.detected;
 * ```
 */
export function compareExcessSI(one: SedFitSI, two: SedFitSI): ExcessComparisonSI {
  const deltaChi2 = Math.max(0, one.chi2 - two.chi2);
  const deltaDof = one.dof - two.dof;
  if (!(deltaDof >= 1)) throw new RangeError(`two must have more fitted parameters than one; got Δdof ${deltaDof}`);
  const pValue = chiSquarePValue(deltaChi2, deltaDof);
  const deltaAic = two.aic - one.aic;
  const deltaBic = two.bic - one.bic;
  return { deltaChi2, deltaDof, pValue, deltaAic, deltaBic, detected: pValue < 0.0027 && deltaBic < 0 };
}
