/**
 * Typed synthesis of an absorption spectrum on a wavelength grid:
 *
 *   F(λ) = F_c(λ) · exp(−Σ_i τ_i(λ)),
 *   τ_i(λ) = τ₀,i · K(u, a)/K(0, a),  u = (λ − λ_i)/b_i,  a = γ_i/b_i,
 *
 * K(u, a) = Re w(u + ia) the Voigt function, b_i the Doppler width (1/e
 * half-width, b = √2 σ), γ_i the Lorentz HWHM, τ₀,i the central optical
 * depth. A line's strength is τ₀ or its equivalent width
 * W = ∫ (1 − e^{−τ}) dλ (`Length<S>`), converted to τ₀ on the exact curve of
 * growth (quadrature, ~1e-10 relative; kernels/synthesize.ts).
 *
 * The continuum is any array quantity in the system — a spectral flux or
 * radiance per wavelength, photon or energy, or a `DimensionlessArray` for
 * a normalised spectrum — and the flux comes back with the same type.
 * {@link synthesizePlanckSpectrum} builds a blackbody continuum B_λ(T) with
 * the radiation module's `planckRadianceWavelengthBatch`.
 *
 * Media: the grid and the line centres share one medium (medium.ts rule 4):
 * line centres branded differently from a branded grid do not compile; an
 * unbranded grid accepts either (then keep the centres in one medium
 * yourself — the type cannot see that). The Planck convenience takes a
 * vacuum (or unbranded) grid, since B_λ is defined per vacuum wavelength.
 *
 * Truncation: each line is evaluated only where its τ can exceed
 * `tauCutoff` (default 1e-8; kernels/synthesize.ts gives the window and the
 * bound 2 τ_cut Δ on the equivalent width lost per line). Lower it (e.g.
 * 1e-13) when weak damped lines must keep their W to better than ~1e-4.
 *
 * @module
 */
import { arrayToSI, fromSI, nonNegative, positive, toSI } from "../internal/typed";
import { requireNonNegative } from "../internal/checks";
import { kinds } from "../quantity/aliases";
import type {
  Dimensionless,
  DimensionlessArray,
  Length,
  LengthArray,
  SpectralRadiancePerWavelengthArray,
  Temperature,
} from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import type { Brand, Pure, SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { planckRadianceWavelengthBatch } from "../radiation/planck";
import { increasingGrid } from "./checks";
import {
  equivalentWidthFromTau0SI,
  synthesizeSpectrumSI,
  tau0FromEquivalentWidthSI,
  type SynthesisLineSI,
} from "./kernels/synthesize";
import type { MaybeInMedium, Medium, MediumOf, NotAirWavelengthArray } from "./medium";

const L = kinds.length.dimension;

/**
 * Any typed array of quantities in system `S` (or system-free): what a
 * continuum or a flux may be.
 */
export type SpectrumArray<S extends SystemName> = Float64Array & Brand<Dimension, S | "SI=CGS">;

/** The Gaussian width of a line: exactly one of `dopplerWidth` (b, 1/e half-width) and `gaussianSigma` (σ = b/√2). */
export type SynthesisLineWidth<S extends SystemName> =
  | {
      /** Doppler width b, the 1/e half-width of the Gaussian core (> 0), a length in `S`. */
      readonly dopplerWidth: Length<S>;
      /** Not allowed together with `dopplerWidth`. */
      readonly gaussianSigma?: never;
    }
  | {
      /** Gaussian standard deviation σ = b/√2 (> 0), a length in `S`. */
      readonly gaussianSigma: Length<S>;
      /** Not allowed together with `gaussianSigma`. */
      readonly dopplerWidth?: never;
    };

/** The strength of a line: exactly one of `tau0` (central optical depth) and `equivalentWidth`. */
export type SynthesisLineStrength<S extends SystemName> =
  | {
      /** Central optical depth τ₀ (≥ 0), a pure number. */
      readonly tau0: Pure;
      /** Not allowed together with `tau0`. */
      readonly equivalentWidth?: never;
    }
  | {
      /** Equivalent width W = ∫ (1 − e^{−τ}) dλ (≥ 0), a length in `S`; converted to τ₀ on the curve of growth. */
      readonly equivalentWidth: Length<S>;
      /** Not allowed together with `equivalentWidth`. */
      readonly tau0?: never;
    };

/**
 * One absorption line for {@link synthesizeSpectrum}: a centre (a
 * wavelength in medium `M` or unbranded; by default a vacuum wavelength), a
 * Gaussian width, an optional Lorentz HWHM (default 0: a pure Gaussian) and
 * a strength. Giving both or neither of a pair does not compile.
 */
export type SynthesisLine<S extends SystemName, M extends Medium = "vacuum"> = {
  /** Line-centre wavelength (> 0). */
  readonly center: MaybeInMedium<S, M>;
  /** Lorentz half-width at half-maximum γ (≥ 0; default 0). */
  readonly lorentzHwhm?: Length<S>;
} & SynthesisLineWidth<S> &
  SynthesisLineStrength<S>;

/** Options of {@link synthesizeSpectrum}. */
export interface SynthesisOptions {
  /** Optical depth below which a line is not evaluated (default 1e-8; > 0). */
  readonly tauCutoff?: number;
}

/** Result of {@link synthesizeSpectrum}. */
export interface SynthesisResult<C> {
  /** F = F_c e^{−τ} on the grid, the continuum's type (NaN where the continuum is not finite). */
  readonly flux: C;
  /** Central optical depth used for each line (solved when W was given). */
  readonly tau0: DimensionlessArray;
  /** Ascending indices of rows written as NaN (non-finite continuum); empty when none. */
  readonly invalid: number[];
}

/** Validate lines in the caller's units and convert them to the kernel's SI form. */
function linesToSI(sys: UnitSystem<SystemName>, lines: readonly SynthesisLine<SystemName, Medium>[]): SynthesisLineSI[] {
  const out: SynthesisLineSI[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i] as SynthesisLine<SystemName, Medium>;
    const p = `lines[${i}]`;
    positive(sys, `${p}.center`, line.center, L);
    const hasB = line.dopplerWidth !== undefined;
    const hasS = line.gaussianSigma !== undefined;
    if (hasB === hasS) throw new RangeError(`${p} must give exactly one of dopplerWidth or gaussianSigma (${sys.coherentUnit(L)})`);
    if (hasB) positive(sys, `${p}.dopplerWidth`, line.dopplerWidth as number, L);
    else positive(sys, `${p}.gaussianSigma`, line.gaussianSigma as number, L);
    const gamma = line.lorentzHwhm ?? 0;
    nonNegative(sys, `${p}.lorentzHwhm`, gamma, L);
    const hasT = line.tau0 !== undefined;
    const hasW = line.equivalentWidth !== undefined;
    if (hasT === hasW) throw new RangeError(`${p} must give exactly one of tau0 or equivalentWidth`);
    if (hasT) requireNonNegative(`${p}.tau0`, line.tau0 as number, "(dimensionless)");
    else nonNegative(sys, `${p}.equivalentWidth`, line.equivalentWidth as number, L);
    const centerM = toSI(sys, line.center, L);
    const lorentzHwhmM = toSI(sys, gamma, L);
    const width = hasB
      ? { dopplerWidthM: toSI(sys, line.dopplerWidth as number, L) }
      : { gaussianSigmaM: toSI(sys, line.gaussianSigma as number, L) };
    const strength = hasT ? { tau0: line.tau0 as number } : { equivalentWidthM: toSI(sys, line.equivalentWidth as number, L) };
    out.push({ centerM, lorentzHwhmM, ...width, ...strength });
  }
  return out;
}

function synthesizeChecked(
  sys: UnitSystem<SystemName>,
  grid: Float64Array,
  continuum: Float64Array,
  lines: readonly SynthesisLine<SystemName, Medium>[],
  options: SynthesisOptions | undefined,
): SynthesisResult<Float64Array> {
  increasingGrid(sys, "grid", grid, L);
  const n = grid.length;
  if (continuum.length < n) throw new RangeError(`continuum must have length >= ${n} (the grid length); got ${continuum.length}`);
  const linesSI = linesToSI(sys, lines);
  const out = new Float64Array(n);
  const opts = options?.tauCutoff === undefined ? {} : { tauCutoff: options.tauCutoff };
  const r = synthesizeSpectrumSI(arrayToSI(sys, grid, L), continuum, linesSI, out, opts);
  return { flux: out, tau0: r.tau0 as DimensionlessArray, invalid: r.invalid };
}

/**
 * Synthesize F(λ) = F_c(λ) exp(−Σ τ_i(λ)) on a wavelength grid (module
 * header). Lines and options are validated before anything is written
 * (RangeError naming e.g. `lines[3].dopplerWidth` in the caller's unit);
 * the grid must be finite and strictly increasing and the continuum at
 * least as long. Rows whose continuum is not finite become NaN and are
 * listed in `invalid`.
 *
 * @param sys - `SI` or `CGS`
 * @param grid - wavelengths in `sys`, strictly increasing (vacuum, air or unbranded)
 * @param continuum - F_c on the grid: any quantity array in `sys`; the flux has its type
 * @param lines - the absorption lines; centres in the grid's medium
 * @param options - `tauCutoff`
 * @example
 * ```ts
 * import { SI, assumeArray, synthesizeSpectrum, units, vacuumWavelength, type SpectralFluxPerWavelengthArray } from "starlume";
 * const grid = SI.arrayOf(Array.from({ length: 2001 }, (_, i) => 656.0 + i * 0.0005), units.nm);
 * const continuum = assumeArray<SpectralFluxPerWavelengthArray<"SI">>(new Float64Array(2001).fill(1e-3));
 * const { flux } = synthesizeSpectrum(SI, grid, continuum, [
 *   { center: vacuumWavelength(SI, SI.of(656.46, units.nm)), dopplerWidth: SI.of(0.03, units.nm), equivalentWidth: SI.of(0.01, units.nm) },
 * ]); // SpectralFluxPerWavelengthArray<"SI">
 * ```
 */
export function synthesizeSpectrum<S extends SystemName, G extends LengthArray<S>, C extends SpectrumArray<S>>(
  sys: UnitSystem<S>,
  grid: G,
  continuum: C,
  lines: readonly SynthesisLine<NoInfer<S>, MediumOf<NoInfer<G>>>[],
  options?: SynthesisOptions,
): SynthesisResult<C> {
  return synthesizeChecked(sys, grid, continuum, lines, options) as SynthesisResult<C>;
}

/** Result of {@link synthesizePlanckSpectrum}: the synthesis plus its blackbody continuum. */
export interface PlanckSynthesisResult<S extends SystemName> extends SynthesisResult<SpectralRadiancePerWavelengthArray<S>> {
  /** The continuum B_λ(T) on the grid (NaN where a wavelength is ≤ 0). */
  readonly continuum: SpectralRadiancePerWavelengthArray<S>;
}

/**
 * Synthesize absorption lines on a blackbody continuum: F_c = B_λ(λ, T)
 * from `planckRadianceWavelengthBatch` (W m⁻² sr⁻¹ m⁻¹ or
 * erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹), then {@link synthesizeSpectrum}. The grid is a
 * vacuum (or unbranded) wavelength grid; line centres are vacuum wavelengths
 * or unbranded. Grid rows ≤ 0 give NaN and are listed in `invalid`.
 *
 * @param sys - `SI` or `CGS`
 * @param grid - vacuum wavelengths in `sys`, strictly increasing
 * @param temperature - blackbody temperature (> 0; RangeError otherwise)
 * @param lines - the absorption lines
 * @param options - `tauCutoff`
 * @example
 * ```ts
 * import { CGS, ions, synthesizePlanckSpectrum, transitionVacuumWavelength, units } from "starlume";
 * const grid = CGS.arrayOf(Array.from({ length: 4001 }, (_, i) => 6554 + i * 0.005), units.angstrom);
 * const ha = transitionVacuumWavelength(CGS, ions.H, 2, 3, { model: "dirac-centroid" });
 * const { flux, continuum } = synthesizePlanckSpectrum(CGS, grid, CGS.of(9500, units.K), [
 *   { center: ha, dopplerWidth: CGS.of(0.3, units.angstrom), lorentzHwhm: CGS.of(0.5, units.angstrom), tau0: 3 },
 * ]);
 * ```
 */
export function synthesizePlanckSpectrum<S extends SystemName, G extends NotAirWavelengthArray<S>>(
  sys: UnitSystem<S>,
  grid: G,
  temperature: Temperature,
  lines: readonly SynthesisLine<NoInfer<S>, "vacuum">[],
  options?: SynthesisOptions,
): PlanckSynthesisResult<S> {
  increasingGrid(sys, "grid", grid, L);
  const planck = planckRadianceWavelengthBatch(sys, grid, temperature);
  const r = synthesizeChecked(sys, grid, planck.values, lines, options);
  return {
    flux: r.flux as SpectralRadiancePerWavelengthArray<S>,
    continuum: planck.values,
    tau0: r.tau0,
    invalid: r.invalid,
  };
}

/**
 * Curve of growth: equivalent width of a Voigt absorption line of central
 * optical depth τ₀, W = ∫ (1 − exp(−τ₀ K(u,a)/K(0,a))) dλ, u = Δλ/b,
 * a = γ/b (quadrature, ~1e-10 relative; weak limit τ₀ b √π / K(0,a)).
 *
 * @param sys - `SI` (m) or `CGS` (cm)
 * @param tau0 - τ₀ ≥ 0
 * @param dopplerWidth - b > 0
 * @param lorentzHwhm - γ ≥ 0 (default 0)
 * @example
 * ```ts
 * import { SI, equivalentWidthFromTau0, units } from "starlume";
 * SI.valueIn(equivalentWidthFromTau0(SI, 1, SI.of(0.003, units.nm)), units.nm); // ≈ 0.00386
 * ```
 */
export function equivalentWidthFromTau0<S extends SystemName>(
  sys: UnitSystem<S>,
  tau0: Pure,
  dopplerWidth: Length<NoInfer<S>>,
  lorentzHwhm?: Length<NoInfer<S>>,
): Length<S> {
  requireNonNegative("tau0", tau0, "(dimensionless)");
  positive(sys, "dopplerWidth", dopplerWidth, L);
  const g = lorentzHwhm ?? 0;
  nonNegative(sys, "lorentzHwhm", g, L);
  return fromSI(sys, equivalentWidthFromTau0SI(tau0, toSI(sys, dopplerWidth, L), toSI(sys, g, L)), L) as Length<S>;
}

/**
 * Central optical depth of a Voigt line with equivalent width W: the unique
 * root of W(τ₀) = W on the curve of growth ({@link equivalentWidthFromTau0}).
 *
 * @example
 * ```ts
 * import { CGS, tau0FromEquivalentWidth, units } from "starlume";
 * tau0FromEquivalentWidth(CGS, CGS.of(0.05, units.angstrom), CGS.of(0.03, units.angstrom)); // ≈ 1.48
 * ```
 */
export function tau0FromEquivalentWidth<S extends SystemName>(
  sys: UnitSystem<S>,
  equivalentWidth: Length<NoInfer<S>>,
  dopplerWidth: Length<NoInfer<S>>,
  lorentzHwhm?: Length<NoInfer<S>>,
): Dimensionless {
  nonNegative(sys, "equivalentWidth", equivalentWidth, L);
  positive(sys, "dopplerWidth", dopplerWidth, L);
  const g = lorentzHwhm ?? 0;
  nonNegative(sys, "lorentzHwhm", g, L);
  return tau0FromEquivalentWidthSI(toSI(sys, equivalentWidth, L), toSI(sys, dopplerWidth, L), toSI(sys, g, L)) as Dimensionless;
}
