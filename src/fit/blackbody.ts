/**
 * Blackbody SED fitting, typed: effective temperature, angular diameter and
 * (optionally) CCM89 extinction A_V from band fluxes (f_λ or f_ν), AB
 * magnitudes or a spectrum, in SI or CGS; then radius and luminosity from a
 * distance or parallax.
 *
 * Model (small-angle; see kernels/blackbody-fit.ts for the derivation, the
 * derivatives, the start, the convergence criteria and the flags):
 *
 *   f_λ(λ) = (θ/2)² π B_λ(λ, T) · 10^(−0.4 A_V k(λ)),  k = A_λ/A_V (CCM89, R_V)
 *
 * integrated through each band's response (energy- or photon-counting
 * trapezoid weights, kernels/bands.ts), extinction included inside the
 * integral. f_ν data are converted to band-mean f_λ at the band's pivot
 * wavelength, which is exact for the band means used here; AB magnitudes
 * are fitted in magnitude space.
 *
 * Source: Planck's law; Cardelli, Clayton & Mathis 1989 (ApJ 345, 245);
 * Levenberg 1944, Marquardt 1963; Bessell & Murphy 2012 (PASP 124, 140) for
 * the band conventions; Tokunaga & Vacca 2005 (PASP 117, 421) for the pivot
 * wavelength.
 *
 * @module
 */
import { AB_ZERO_POINT, C } from "../values/constants";
import { requireFinite, requirePositive } from "../internal/checks";
import { arrayToSI, finite, fromSI, positive, toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import type {
  Angle,
  Dimensionless,
  Flux,
  Length,
  LengthArray,
  Power,
  SpectralFluxPerFrequency,
  SpectralFluxPerWavelength,
  SpectralFluxPerWavelengthArray,
  Temperature,
} from "../quantity/aliases";
import type { Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { gaussianResponseSI, prepareBandSI, topHatResponseSI, type PreparedBandSI, type ResponseConvention } from "./kernels/bands";
import {
  createBlackbodyFitterSI,
  DATA_AB_MAGNITUDE,
  DATA_FLUX_LAMBDA,
  type BlackbodyFitFlags,
  type BlackbodyFitterSI,
  type BlackbodyFitSettingsSI,
  type BlackbodyFitSI,
  type FitChannelSI,
  type FitParameterName,
  type FitStopReason,
} from "./kernels/blackbody-fit";
import { stellarParametersFromFitSI, type StellarFromFitSI } from "./kernels/stellar";

export type { BlackbodyFitFlags, BlackbodyFitSI, FitParameterName, FitStopReason, ResponseConvention, StellarFromFitSI };

const L = kinds.length.dimension;
const FL = kinds.spectralFluxPerWavelength.dimension;
const FN = kinds.spectralFluxPerFrequency.dimension;
const PW = kinds.power.dimension;
const FX = kinds.flux.dimension;

declare const bandSystem: unique symbol;

/**
 * A photometric band prepared for fitting (normalised quadrature weights
 * computed once). Bound to the system it was built in: a band built with
 * `CGS` cannot be used in an `SI` fit.
 */
export interface FitBand<S extends SystemName> {
  /** Compile-time only: the system of the band's wavelengths. */
  readonly [bandSystem]: S;
  /** Pivot wavelength λ_p (⟨f_ν⟩ = ⟨f_λ⟩ λ_p²/c), in the band's system. */
  readonly pivotWavelength: Length<S>;
  /** Weighted mean wavelength, in the band's system. */
  readonly meanWavelength: Length<S>;
  /** Detector counting convention. */
  readonly convention: ResponseConvention;
  /** The prepared SI band. @internal */
  readonly si: PreparedBandSI;
}

function makeBand<S extends SystemName>(sys: UnitSystem<S>, si: PreparedBandSI): FitBand<S> {
  return {
    pivotWavelength: fromSI(sys, si.pivotWavelengthM, L) as Length<S>,
    meanWavelength: fromSI(sys, si.meanWavelengthM, L) as Length<S>,
    convention: si.convention,
    si,
  } as FitBand<S>;
}

function checkConvention(convention: unknown): ResponseConvention {
  if (convention !== "energy" && convention !== "photon") {
    throw new RangeError(`convention must be "energy" or "photon"; got ${String(convention)}`);
  }
  return convention;
}

/**
 * A band from a tabulated response curve (filter × detector × atmosphere…).
 * The band measures ⟨f_λ⟩ = ∫f_λ R dλ/∫R dλ (energy counting) or
 * ∫f_λ R λ dλ/∫R λ dλ (photon counting), by the trapezoid rule on your grid
 * (second order: resolve both R and the SED; 200 points across a broad band
 * give ≲ 1e-5 relative).
 *
 * @param sys - `SI` or `CGS`
 * @param wavelengths - strictly increasing grid (≥ 2 points), in `sys`
 * @param response - response at each grid point (≥ 0, not all 0; any scale)
 * @param convention - "photon" (CCDs, AB magnitudes) or "energy" (bolometers)
 * @throws RangeError naming `wavelengths[i]`, `response[i]` or `convention`
 * @example
 * ```ts
 * import { SI, responseBand, units } from "starlume";
 * const v = responseBand(SI, SI.arrayOf([480, 520, 550, 580, 640], units.nm), [0, 0.6, 1, 0.7, 0], "photon");
 * SI.valueIn(v.pivotWavelength, units.nm); // ≈ 553
 * ```
 */
export function responseBand<S extends SystemName>(
  sys: UnitSystem<S>,
  wavelengths: LengthArray<NoInfer<S>>,
  response: ArrayLike<number>,
  convention: ResponseConvention,
): FitBand<S> {
  checkConvention(convention);
  if (wavelengths.length < 2) throw new RangeError(`wavelengths must have at least 2 points; got ${wavelengths.length}`);
  if (response.length !== wavelengths.length) {
    throw new RangeError(`response must have as many entries as wavelengths (${wavelengths.length}); got ${response.length}`);
  }
  for (let i = 0; i < wavelengths.length; i++) {
    const v = wavelengths[i] as number;
    positive(sys, `wavelengths[${i}]`, v, L);
    if (i > 0 && !(v > (wavelengths[i - 1] as number))) {
      throw new RangeError(`wavelengths must be strictly increasing; got wavelengths[${i}] = ${v} ${sys.coherentUnit(L)} after ${String(wavelengths[i - 1])}`);
    }
  }
  return makeBand(sys, prepareBandSI({ wavelengthsM: arrayToSI(sys, wavelengths, L), response }, convention));
}

/** Shape options of {@link topHatBand} and {@link gaussianBand}. */
export interface BandShapeOptions {
  /** Counting convention (default "photon"). */
  readonly convention?: ResponseConvention;
  /** Number of tabulation nodes (default 201, 3 … 100000). */
  readonly points?: number;
}

/**
 * A top-hat band of full width Δλ about λ_c, tabulated as a response curve
 * (equally spaced nodes including both edges; the trapezoid rule integrates
 * the box exactly).
 *
 * @param sys - `SI` or `CGS`
 * @param center - centre λ_c, in `sys`
 * @param width - full width Δλ (< 2 λ_c), in `sys`
 * @param options - convention (default "photon") and number of nodes (default 201)
 * @throws RangeError naming `center`, `width`, `points` or `convention`
 * @example
 * ```ts
 * import { CGS, topHatBand, units } from "starlume";
 * const band = topHatBand(CGS, CGS.of(5500, units.angstrom), CGS.of(900, units.angstrom));
 * ```
 */
export function topHatBand<S extends SystemName>(
  sys: UnitSystem<S>,
  center: Length<NoInfer<S>>,
  width: Length<NoInfer<S>>,
  options: BandShapeOptions = {},
): FitBand<S> {
  positive(sys, "center", center, L);
  positive(sys, "width", width, L);
  const convention = checkConvention(options.convention ?? "photon");
  const curve = topHatResponseSI(toSI(sys, center, L), toSI(sys, width, L), options.points ?? 201);
  return makeBand(sys, prepareBandSI(curve, convention));
}

/**
 * A Gaussian band of the given FWHM about λ_c, tabulated over λ_c ± 5σ.
 *
 * @param sys - `SI` or `CGS`
 * @param center - centre λ_c, in `sys`
 * @param fwhm - full width at half maximum, in `sys`
 * @param options - convention (default "photon") and number of nodes (default 201)
 * @throws RangeError naming `center`, `fwhm`, `points` or `convention`
 * @example
 * ```ts
 * import { SI, gaussianBand, units } from "starlume";
 * const k = gaussianBand(SI, SI.of(2.2, units.um), SI.of(0.35, units.um));
 * ```
 */
export function gaussianBand<S extends SystemName>(
  sys: UnitSystem<S>,
  center: Length<NoInfer<S>>,
  fwhm: Length<NoInfer<S>>,
  options: BandShapeOptions = {},
): FitBand<S> {
  positive(sys, "center", center, L);
  positive(sys, "fwhm", fwhm, L);
  const convention = checkConvention(options.convention ?? "photon");
  const curve = gaussianResponseSI(toSI(sys, center, L), toSI(sys, fwhm, L), options.points ?? 201);
  return makeBand(sys, prepareBandSI(curve, convention));
}

/** A band-mean flux density per unit wavelength with its standard uncertainty. */
export interface FluxPerWavelengthObservation<S extends SystemName> {
  /** The band, built in system `S` by {@link responseBand}, {@link topHatBand} or {@link gaussianBand}. */
  readonly band: FitBand<S>;
  /** ⟨f_λ⟩ (finite; may be ≤ 0 for faint sources). */
  readonly fluxPerWavelength: SpectralFluxPerWavelength<S>;
  /** Standard uncertainty of ⟨f_λ⟩ (> 0). */
  readonly sigma: SpectralFluxPerWavelength<S>;
}

/** A band-mean flux density per unit frequency (e.g. in Jy) with its standard uncertainty. */
export interface FluxPerFrequencyObservation<S extends SystemName> {
  /** The band, built in system `S` by {@link responseBand}, {@link topHatBand} or {@link gaussianBand}. */
  readonly band: FitBand<S>;
  /** ⟨f_ν⟩ (finite; may be ≤ 0). Converted to ⟨f_λ⟩ = ⟨f_ν⟩ c/λ_p² (exact for the band means used). */
  readonly fluxPerFrequency: SpectralFluxPerFrequency<S>;
  /** Standard uncertainty of ⟨f_ν⟩ (> 0). */
  readonly sigma: SpectralFluxPerFrequency<S>;
}

/** An AB magnitude with its standard uncertainty (fitted in magnitude space). */
export interface AbMagnitudeObservation<S extends SystemName> {
  /** The band, built in system `S` by {@link responseBand}, {@link topHatBand} or {@link gaussianBand}. */
  readonly band: FitBand<S>;
  /** m_AB = −2.5 log10(⟨f_ν⟩ / 3631 Jy), mag (finite). */
  readonly abMagnitude: Pure;
  /** Standard uncertainty, mag (> 0). */
  readonly sigma: Pure;
}

/** One photometric measurement: f_λ, f_ν or an AB magnitude, in one band. */
export type BandObservation<S extends SystemName> =
  | FluxPerWavelengthObservation<S>
  | FluxPerFrequencyObservation<S>
  | AbMagnitudeObservation<S>;

/** Options of {@link fitBlackbody} and {@link fitBlackbodySpectrum}. */
export interface BlackbodyFitOptions {
  /**
   * CCM89 interstellar extinction. Omitted: none (A_V = 0, not fitted).
   * `rV` default 3.1; `aV` the starting value (or the held value when
   * `fitAV` is false), default 0; `fitAV` default true. A_V is kept ≥ 0.
   * Every band node with non-zero response must lie in 0.1–3.33 µm.
   */
  readonly extinction?: {
    /** R_V = A_V / E(B−V) of the CCM89 law (> 0; default 3.1). */
    readonly rV?: Pure;
    /** Starting A_V, mag (≥ 0; default 0); the held value when `fitAV` is false. */
    readonly aV?: Pure;
    /** Fit A_V (default true); false holds it at `aV`. */
    readonly fitAV?: boolean;
  };
  /** Allowed temperature range (default 300 K … 1e6 K). */
  readonly temperatureRange?: readonly [Temperature, Temperature];
  /** Maximum Levenberg–Marquardt trial steps (default 200). */
  readonly maxIterations?: number;
  /** Convergence threshold on the step in ln T, ln θ, A_V (default 1e-10). */
  readonly stepTolerance?: number;
  /** Convergence threshold on the relative χ² decrease (default 1e-12). */
  readonly chi2Tolerance?: number;
  /** Start: "auto" (colour temperature, grid fallback; default) or "grid". */
  readonly start?: "auto" | "grid";
}

/** A typed blackbody fit. Temperature, angle and A_V are the same in SI and CGS. */
export interface BlackbodyFit<S extends SystemName> {
  /** Fitted effective (blackbody) temperature T (K in both systems). */
  readonly temperature: Temperature;
  /** Standard uncertainty of T (not rescaled by χ²/dof). */
  readonly sigmaTemperature: Temperature;
  /** Fitted angular diameter θ = 2R/d (rad in both systems). */
  readonly angularDiameter: Angle;
  /** Standard uncertainty of θ (not rescaled by χ²/dof). */
  readonly sigmaAngularDiameter: Angle;
  /** A_V, mag (0 without extinction). */
  readonly extinctionAV: Dimensionless;
  /** σ(A_V), mag (0 when not fitted). */
  readonly sigmaExtinctionAV: Dimensionless;
  /** Band-mean model ⟨f_λ⟩ for every fitted channel (observation, or used pixel), in `S`. */
  readonly modelFluxPerWavelength: SpectralFluxPerWavelengthArray<S>;
  /** (data − model)/σ per fitted channel (in magnitudes for magnitude data). */
  readonly pulls: readonly number[];
  /** χ² = Σ pulls² at the solution. */
  readonly chi2: number;
  /** Degrees of freedom: number of channels − number of fitted parameters. */
  readonly dof: number;
  /** χ²/dof (null when dof < 1). */
  readonly reducedChi2: number | null;
  /** P(χ²_dof ≥ χ²) (null when dof < 1). */
  readonly pValue: number | null;
  /** Quality flags (notConverged, atLimit, tooFewBands, poorFit): check them before trusting the result. */
  readonly flags: BlackbodyFitFlags;
  /** Fitted parameters, the order of `covariance` and `correlation`. */
  readonly parameters: readonly FitParameterName[];
  /** Covariance of the fitted parameters in K, rad and mag (products thereof). */
  readonly covariance: readonly (readonly number[])[];
  /** Correlation matrix of the fitted parameters (order of `parameters`). */
  readonly correlation: readonly (readonly number[])[];
  /** Levenberg–Marquardt trial steps taken. */
  readonly iterations: number;
  /** Why the iteration stopped (`"maxIterations"` and `"stalled"` also set `flags.notConverged`). */
  readonly stopReason: FitStopReason;
  /** The plain-JSON form (SI units; names carry their unit). */
  readonly json: BlackbodyFitSI;
}

function settingsFrom(options: BlackbodyFitOptions): BlackbodyFitSettingsSI {
  const s: {
    -readonly [K in keyof BlackbodyFitSettingsSI]: BlackbodyFitSettingsSI[K];
  } = {};
  if (options.extinction !== undefined) {
    const e = options.extinction;
    s.extinction = {
      ...(e.rV !== undefined ? { rV: e.rV } : {}),
      ...(e.aV !== undefined ? { aV: e.aV } : {}),
      ...(e.fitAV !== undefined ? { fitAV: e.fitAV } : {}),
    };
  }
  if (options.temperatureRange !== undefined) {
    requirePositive("temperatureRange[0]", options.temperatureRange[0], "K");
    requirePositive("temperatureRange[1]", options.temperatureRange[1], "K");
    s.temperatureRangeK = [options.temperatureRange[0], options.temperatureRange[1]];
  }
  if (options.maxIterations !== undefined) s.maxIterations = options.maxIterations;
  if (options.stepTolerance !== undefined) s.stepTolerance = options.stepTolerance;
  if (options.chi2Tolerance !== undefined) s.chi2Tolerance = options.chi2Tolerance;
  if (options.start !== undefined) s.start = options.start;
  return s;
}

function typedFit<S extends SystemName>(
  sys: UnitSystem<S>,
  r: BlackbodyFitSI,
  kindsUsed: ArrayLike<number>,
  pivots: ArrayLike<number>,
): BlackbodyFit<S> {
  const model = new Float64Array(r.model.length);
  for (let c = 0; c < model.length; c++) {
    const m = r.model[c] as number;
    const fl = kindsUsed[c] === DATA_AB_MAGNITUDE ? (AB_ZERO_POINT * 10 ** (m / -2.5) * C) / ((pivots[c] as number) * (pivots[c] as number)) : m;
    model[c] = fromSI(sys, fl, FL);
  }
  return {
    temperature: r.temperatureK as Temperature,
    sigmaTemperature: r.sigmaTemperatureK as Temperature,
    angularDiameter: r.angularDiameterRad as Angle,
    sigmaAngularDiameter: r.sigmaAngularDiameterRad as Angle,
    extinctionAV: r.extinctionAV as Dimensionless,
    sigmaExtinctionAV: r.sigmaExtinctionAV as Dimensionless,
    modelFluxPerWavelength: model as SpectralFluxPerWavelengthArray<S>,
    pulls: r.pulls,
    chi2: r.chi2,
    dof: r.dof,
    reducedChi2: r.reducedChi2,
    pValue: r.pValue,
    flags: r.flags,
    parameters: r.parameters,
    covariance: r.covariance,
    correlation: r.correlation,
    iterations: r.iterations,
    stopReason: r.stopReason,
    json: r,
  };
}

/**
 * Fit a blackbody (T, θ, optionally A_V) to photometry by Levenberg–Marquardt
 * with analytic derivatives. Each observation is a band with ⟨f_λ⟩, ⟨f_ν⟩ or
 * an AB magnitude and its standard uncertainty; flux residuals are formed in
 * flux, magnitude residuals in magnitudes. Check `flags` before trusting the
 * result (notConverged, atLimit, tooFewBands, poorFit: p < 0.001).
 *
 * @param sys - `SI` or `CGS` (fluxes, their σ and the bands must be in it)
 * @param observations - at least 2 bands (3 to fit A_V too)
 * @param options - extinction, temperature range, iteration controls
 * @returns T, θ, A_V with σ, covariance (not rescaled by χ²/dof), χ², dof, flags, and the plain-JSON form
 * @throws RangeError naming the field (e.g. `observations[2].sigma`) for a non-finite value or σ ≤ 0;
 *   for a single observation; or for band nodes outside 0.1–3.33 µm with extinction
 * @example
 * ```ts
 * import { SI, fitBlackbody, gaussianBand, units } from "starlume";
 * const bands = [0.44, 0.55, 0.65, 0.8, 1.25].map((c) => gaussianBand(SI, SI.of(c, units.um), SI.of(0.2 * c, units.um)));
 * const fnu = [12.0, 19.1, 23.6, 26.7, 24.0]; // mJy
 * const fit = fitBlackbody(SI, bands.map((band, i) => ({
 *   band,
 *   fluxPerFrequency: SI.of(fnu[i] ?? 0, units.mJy),
 *   sigma: SI.of(0.02 * (fnu[i] ?? 0), units.mJy),
 * })));
 * SI.valueIn(fit.temperature, units.K); // ≈ 5795
 * SI.valueIn(fit.angularDiameter, units.mas); // ≈ 0.0200
 * ```
 */
export function fitBlackbody<S extends SystemName>(
  sys: UnitSystem<S>,
  observations: readonly BandObservation<NoInfer<S>>[],
  options: BlackbodyFitOptions = {},
): BlackbodyFit<S> {
  const n = observations.length;
  if (n < 2) {
    throw new RangeError(`observations must include at least 2 bands to determine both T and θ; got ${n}`);
  }
  const bands = observations.map((o, i) => checkedBand((o as { band?: unknown }).band, `observations[${i}].band`) as FitBand<S>);
  return createBlackbodyFitter(sys, bands, options).fit(observations as readonly BandDatum<S>[]);
}

function checkedBand(band: unknown, name: string): FitBand<SystemName> {
  if (band === undefined || band === null || typeof band !== "object" || !("si" in band)) {
    throw new RangeError(`${name} must be a band made by responseBand, topHatBand or gaussianBand`);
  }
  return band as FitBand<SystemName>;
}

/** One star's measurement in a band of a {@link BlackbodyFitter} (the band is the fitter's). */
export type BandDatum<S extends SystemName> =
  | Omit<FluxPerWavelengthObservation<S>, "band">
  | Omit<FluxPerFrequencyObservation<S>, "band">
  | Omit<AbMagnitudeObservation<S>, "band">;

/** A reusable fitter for one set of bands: for catalogues (weights, CCM89 ratios and work arrays built once). */
export interface BlackbodyFitter<S extends SystemName> {
  /** The bands, in the order `fit` expects the data. */
  readonly bands: readonly FitBand<S>[];
  /**
   * Fit one star: one datum per band, in band order (f_λ, f_ν or AB magnitude
   * may differ from star to star).
   * @throws RangeError naming `observations[i].…` for a bad value or σ
   */
  fit(data: readonly BandDatum<NoInfer<S>>[]): BlackbodyFit<S>;
}

/**
 * Build a {@link BlackbodyFitter} for a fixed set of bands and options, to fit
 * many stars without rebuilding anything: each fit allocates only its input
 * and result arrays, never per iteration (≈ 2e3 fits s⁻¹ for 5 bands × 200
 * nodes on a 2-core 2020s machine; bench/fit.bench.ts).
 *
 * @param sys - `SI` or `CGS`
 * @param bands - at least 2 bands (3 to fit A_V)
 * @param options - as for {@link fitBlackbody}
 * @throws RangeError naming `bands[i]` or the option at fault
 * @example
 * ```ts
 * import { SI, createBlackbodyFitter, gaussianBand, units } from "starlume";
 * const bands = [0.44, 0.55, 0.8].map((c) => gaussianBand(SI, SI.of(c, units.um), SI.of(0.2 * c, units.um)));
 * const fitter = createBlackbodyFitter(SI, bands);
 * const catalogue = [[9.1, 8.8, 8.7], [12.3, 11.6, 11.1]];
 * const temps = catalogue.map((m) => fitter.fit(m.map((v) => ({ abMagnitude: v, sigma: 0.02 }))).temperature);
 * ```
 */
export function createBlackbodyFitter<S extends SystemName>(
  sys: UnitSystem<S>,
  bands: readonly FitBand<NoInfer<S>>[],
  options: BlackbodyFitOptions = {},
): BlackbodyFitter<S> {
  const n = bands.length;
  if (n < 2) throw new RangeError(`bands must include at least 2 bands to determine both T and θ; got ${n}`);
  const channels: FitChannelSI[] = bands.map((b, i) => checkedBand(b, `bands[${i}]`).si);
  const pivots = Float64Array.from(channels, (c) => c.pivotWavelengthM);
  let kernel: BlackbodyFitterSI;
  try {
    kernel = createBlackbodyFitterSI(channels, settingsFrom(options));
  } catch (e) {
    throw new RangeError((e as Error).message.replace(/channels\[(\d+)\]/, "bands[$1]"));
  }
  const values = new Float64Array(n);
  const sigmas = new Float64Array(n);
  const kindArr = new Uint8Array(n);
  const fit = (data: readonly BandDatum<S>[]): BlackbodyFit<S> => {
    if (data.length !== n) throw new RangeError(`observations must have one entry per band (${n}); got ${data.length}`);
    for (let i = 0; i < n; i++) {
      const o = data[i] as { readonly fluxPerWavelength?: number; readonly fluxPerFrequency?: number; readonly abMagnitude?: number; readonly sigma?: number };
      const p = `observations[${i}]`;
      const count = (o.fluxPerWavelength !== undefined ? 1 : 0) + (o.fluxPerFrequency !== undefined ? 1 : 0) + (o.abMagnitude !== undefined ? 1 : 0);
      if (count !== 1) throw new RangeError(`${p} must give exactly one of fluxPerWavelength, fluxPerFrequency or abMagnitude`);
      const lp = pivots[i] as number;
      if (o.fluxPerWavelength !== undefined) {
        finite(sys, `${p}.fluxPerWavelength`, o.fluxPerWavelength, FL);
        positive(sys, `${p}.sigma`, o.sigma as number, FL);
        values[i] = toSI(sys, o.fluxPerWavelength, FL);
        sigmas[i] = toSI(sys, o.sigma as number, FL);
        kindArr[i] = DATA_FLUX_LAMBDA;
      } else if (o.fluxPerFrequency !== undefined) {
        finite(sys, `${p}.fluxPerFrequency`, o.fluxPerFrequency, FN);
        positive(sys, `${p}.sigma`, o.sigma as number, FN);
        const k = C / (lp * lp); // ⟨f_λ⟩ = ⟨f_ν⟩ c/λ_p²
        values[i] = toSI(sys, o.fluxPerFrequency, FN) * k;
        sigmas[i] = toSI(sys, o.sigma as number, FN) * k;
        kindArr[i] = DATA_FLUX_LAMBDA;
      } else {
        requireFinite(`${p}.abMagnitude`, o.abMagnitude as number, "mag");
        requirePositive(`${p}.sigma`, o.sigma as number, "mag");
        values[i] = o.abMagnitude as number;
        sigmas[i] = o.sigma as number;
        kindArr[i] = DATA_AB_MAGNITUDE;
      }
    }
    return typedFit(sys, kernel.fit(values, sigmas, kindArr), kindArr, pivots);
  };
  return { bands: bands as readonly FitBand<S>[], fit };
}

/** A spectrum for {@link fitBlackbodySpectrum}. */
export interface SpectrumObservation<S extends SystemName> {
  /** Pixel wavelengths (vacuum), in `S`; any order. */
  readonly wavelengths: LengthArray<S>;
  /** f_λ per pixel, in `S` (finite for every pixel that is not excluded). */
  readonly fluxPerWavelength: SpectralFluxPerWavelengthArray<S>;
  /** Standard uncertainty per pixel, in `S` (> 0 for every pixel that is not excluded). */
  readonly sigma: SpectralFluxPerWavelengthArray<S>;
  /** Pixels to leave out (true or non-zero), e.g. absorption or emission lines, telluric bands. */
  readonly exclude?: ArrayLike<boolean | number>;
}

/** A spectrum fit: the fit plus the indices of the pixels used (the order of its per-channel arrays). */
export interface BlackbodySpectrumFit<S extends SystemName> extends BlackbodyFit<S> {
  /** Ascending indices (into the input spectrum) of the pixels fitted: those not excluded. */
  readonly usedPixels: readonly number[];
}

/**
 * Fit a blackbody continuum to a flux-calibrated spectrum. Each used pixel is
 * a monochromatic sample f_λ(λᵢ) (no line-spread or pixel integration: the
 * pixel-averaging error is ≈ (Δλ)²/24 · B″/B relative, negligible for
 * resolving spectra). Mask lines with `exclude`: the model is a pure
 * continuum.
 *
 * @param sys - `SI` or `CGS`
 * @param spectrum - wavelengths, f_λ, σ and an optional exclusion mask
 * @param options - as for {@link fitBlackbody}
 * @throws RangeError naming e.g. `spectrum.fluxPerWavelength[17]` or `spectrum.sigma[3]`; fewer than 2 used pixels
 * @example
 * ```ts
 * import { SI, fitBlackbodySpectrum, planckRadianceWavelengthBatch, units, type SpectralFluxPerWavelengthArray } from "starlume";
 * const wavelengths = SI.arrayOf(Array.from({ length: 500 }, (_, i) => 400 + i), units.nm);
 * const b = planckRadianceWavelengthBatch(SI, wavelengths, SI.of(6000, units.K)).values;
 * const flux = b.map((v) => v * Math.PI * 1e-18) as SpectralFluxPerWavelengthArray<"SI">;
 * const sigma = flux.map((v) => 0.01 * v) as SpectralFluxPerWavelengthArray<"SI">;
 * const fit = fitBlackbodySpectrum(SI, { wavelengths, fluxPerWavelength: flux, sigma });
 * ```
 */
export function fitBlackbodySpectrum<S extends SystemName>(
  sys: UnitSystem<S>,
  spectrum: SpectrumObservation<NoInfer<S>>,
  options: BlackbodyFitOptions = {},
): BlackbodySpectrumFit<S> {
  const { wavelengths, fluxPerWavelength, sigma, exclude } = spectrum;
  const n = wavelengths.length;
  if (fluxPerWavelength.length !== n || sigma.length !== n || (exclude !== undefined && exclude.length !== n)) {
    throw new RangeError(
      `spectrum.fluxPerWavelength, spectrum.sigma (and spectrum.exclude) must have as many entries as spectrum.wavelengths (${n}); got ` +
        `${fluxPerWavelength.length}, ${sigma.length}${exclude !== undefined ? `, ${exclude.length}` : ""}`,
    );
  }
  const used: number[] = [];
  for (let i = 0; i < n; i++) {
    const ex = exclude?.[i];
    if (ex === true || (typeof ex === "number" && ex !== 0)) continue;
    positive(sys, `spectrum.wavelengths[${i}]`, wavelengths[i] as number, L);
    finite(sys, `spectrum.fluxPerWavelength[${i}]`, fluxPerWavelength[i] as number, FL);
    positive(sys, `spectrum.sigma[${i}]`, sigma[i] as number, FL);
    used.push(i);
  }
  const m = used.length;
  if (m < 2) throw new RangeError(`spectrum must have at least 2 pixels that are not excluded; got ${m}`);
  const one = Float64Array.of(1);
  const channels: FitChannelSI[] = new Array<FitChannelSI>(m);
  const values = new Float64Array(m);
  const sigmas = new Float64Array(m);
  const pivots = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const i = used[j] as number;
    const l = toSI(sys, wavelengths[i] as number, L);
    channels[j] = { wavelengthsM: Float64Array.of(l), weights: one, pivotWavelengthM: l };
    pivots[j] = l;
    values[j] = toSI(sys, fluxPerWavelength[i] as number, FL);
    sigmas[j] = toSI(sys, sigma[i] as number, FL);
  }
  const kindArr = new Uint8Array(m); // all f_λ
  let fitter: BlackbodyFitterSI;
  try {
    fitter = createBlackbodyFitterSI(channels, settingsFrom(options));
  } catch (e) {
    // name the pixel rather than the internal channel
    const msg = (e as Error).message.replace(/channels\[(\d+)\]/, (_, j: string) => `spectrum.wavelengths[${String(used[Number(j)])}]`);
    throw new RangeError(msg);
  }
  return { ...typedFit(sys, fitter.fit(values, sigmas, kindArr), kindArr, pivots), usedPixels: used };
}

/** A distance or a parallax with its standard uncertainty. */
export type DistanceMeasurement<S extends SystemName> =
  | {
      /** Distance (> 0), a length in `S`. */
      readonly distance: Length<S>;
      /** Standard uncertainty of the distance (> 0), a length in `S`. */
      readonly sigma: Length<S>;
    }
  | {
      /** Trigonometric parallax (> 0); d = 1 au / p. */
      readonly parallax: Angle;
      /** Standard uncertainty of the parallax (> 0). */
      readonly sigma: Angle;
    };

/** Radius, luminosity and bolometric flux from a fit and a distance. */
export interface StellarParameters<S extends SystemName> {
  /** Radius R = θd/2, in `S` (m or cm). */
  readonly radius: Length<S>;
  /** First-order standard uncertainty of R (includes the fit's T–θ covariance and the distance's σ). */
  readonly sigmaRadius: Length<S>;
  /** Luminosity L = 4πR²σT⁴, in `S` (W or erg s⁻¹). */
  readonly luminosity: Power<S>;
  /** First-order standard uncertainty of L. */
  readonly sigmaLuminosity: Power<S>;
  /** Bolometric flux at the observer (θ/2)²σT⁴, in `S` (W m⁻² or erg s⁻¹ cm⁻²). */
  readonly bolometricFlux: Flux<S>;
  /** First-order standard uncertainty of the bolometric flux. */
  readonly sigmaBolometricFlux: Flux<S>;
  /** Distance used (1 au / p when a parallax was given), in `S`. */
  readonly distance: Length<S>;
  /** First-order standard uncertainty of the distance. */
  readonly sigmaDistance: Length<S>;
  /** Correlation of R and L (both depend on θ and d). */
  readonly radiusLuminosityCorrelation: number;
  /** The solver's plain-JSON solution (SI), with the fit's T–θ covariance included. */
  readonly json: StellarFromFitSI;
}

/**
 * Radius R = θd/2, luminosity L = 4πR²σT⁴ and bolometric flux (θ/2)²σT⁴ from
 * a blackbody fit and a distance or parallax, through the stellar-parameter
 * solver, with first-order uncertainties that include the distance's and
 * the fit's T–θ covariance (the solver alone would treat T and θ as
 * independent; see kernels/stellar.ts).
 *
 * @param sys - `SI` or `CGS` (the distance and the results)
 * @param fit - a result of {@link fitBlackbody} or {@link fitBlackbodySpectrum}
 * @param distance - `{ distance, sigma }` (lengths in `sys`) or `{ parallax, sigma }` (angles)
 * @throws RangeError for a non-positive distance, parallax or σ (naming it), or a fit without covariance
 * @example
 * ```ts
 * import { SI, fitBlackbody, gaussianBand, stellarParametersFromFit, units } from "starlume";
 * const bands = [0.44, 0.55, 0.8].map((c) => gaussianBand(SI, SI.of(c, units.um), SI.of(0.2 * c, units.um)));
 * const fit = fitBlackbody(SI, bands.map((band, i) => ({ band, abMagnitude: [9.1, 8.8, 8.7][i] ?? 0, sigma: 0.02 })));
 * const star = stellarParametersFromFit(SI, fit, { parallax: SI.of(10, units.mas), sigma: SI.of(0.05, units.mas) });
 * SI.valueIn(star.radius, units.Rsun); // ≈ 1.06 (fit.temperature ≈ 7100 K)
 * ```
 */
export function stellarParametersFromFit<S extends SystemName>(
  sys: UnitSystem<S>,
  fit: { readonly json: BlackbodyFitSI },
  distance: DistanceMeasurement<NoInfer<S>>,
): StellarParameters<S> {
  let r: StellarFromFitSI;
  if ("distance" in distance) {
    positive(sys, "distance", distance.distance, L);
    positive(sys, "distance sigma", distance.sigma, L);
    r = stellarParametersFromFitSI(fit.json, { distanceM: { value: toSI(sys, distance.distance, L), sigma: toSI(sys, distance.sigma, L) } });
  } else {
    requirePositive("parallax", distance.parallax, "rad");
    requirePositive("parallax sigma", distance.sigma, "rad");
    r = stellarParametersFromFitSI(fit.json, { parallaxRad: { value: distance.parallax, sigma: distance.sigma } });
  }
  const iR = 2;
  const iL = 1;
  const cRL = (r.lnCovariance[iR]?.[iL] as number) / Math.sqrt((r.lnCovariance[iR]?.[iR] as number) * (r.lnCovariance[iL]?.[iL] as number));
  return {
    radius: fromSI(sys, r.radiusM.value, L) as Length<S>,
    sigmaRadius: fromSI(sys, r.radiusM.sigma, L) as Length<S>,
    luminosity: fromSI(sys, r.luminosityW.value, PW) as Power<S>,
    sigmaLuminosity: fromSI(sys, r.luminosityW.sigma, PW) as Power<S>,
    bolometricFlux: fromSI(sys, r.bolometricFluxWm2.value, FX) as Flux<S>,
    sigmaBolometricFlux: fromSI(sys, r.bolometricFluxWm2.sigma, FX) as Flux<S>,
    distance: fromSI(sys, r.distanceM.value, L) as Length<S>,
    sigmaDistance: fromSI(sys, r.distanceM.sigma, L) as Length<S>,
    radiusLuminosityCorrelation: cRL,
    json: r,
  };
}
