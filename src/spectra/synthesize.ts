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
import { show } from "../internal/checks";
import { BatchLog, type BatchResult } from "../law/batch";
import { defineLaw } from "../law/define";
import { type LawInput, lawInput } from "../law/input";
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
import {
  equivalentWidthFromTau0Unchecked,
  synthesizeSpectrumUnchecked,
  tau0FromEquivalentWidthUnchecked,
  type ResolvedLinesSI,
} from "./kernels/synthesize";
import type { MaybeInMedium, Medium, MediumOf, NotAirWavelengthArray } from "./medium";

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

/**
 * Result of {@link synthesizeSpectrum}: a {@link BatchResult} over the grid
 * (the flux in `values`, NaN where the continuum is not finite, those rows
 * in `invalid` with a reason each) plus the τ₀ of each line.
 */
export interface SynthesisResult<C> extends BatchResult<C> {
  /** F = F_c e^{−τ} on the grid, the continuum's type: the same array as `values`. */
  readonly flux: C;
  /** Central optical depth used for each line (solved when W was given). */
  readonly tau0: DimensionlessArray;
}

/** A grid value: finite, any sign (the grid's order is checked by {@link gridToSI}). */
const gridValue = lawInput("grid", kinds.length, { check: "finite" });

/**
 * Check that a wavelength grid is finite and strictly increasing, in the
 * caller's unit (RangeError naming the first bad element), and return it in
 * SI: the same array in SI, a converted copy in CGS. One pass.
 *
 * @internal
 */
export function gridToSI(sys: UnitSystem<SystemName>, grid: Float64Array): Float64Array {
  const n = grid.length;
  const si = sys.name === "SI" ? grid : new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = grid[i] as number;
    const x = gridValue.rowToSI(sys, v);
    if (x !== x || (i > 0 && !(v > (grid[i - 1] as number)))) {
      throw new RangeError(`grid must be finite and strictly increasing (${sys.coherentUnit(kinds.length.dimension)}); element ${i} is ${show(v)}`);
    }
    if (si !== grid) si[i] = x;
  }
  return si;
}

// The fields of a line, checked one by one (a message names `lines[i].<field>`).
const center = lawInput("center", kinds.length);
const dopplerWidthField = lawInput("dopplerWidth", kinds.length);
const gaussianSigmaField = lawInput("gaussianSigma", kinds.length);
const lorentzHwhmField = lawInput("lorentzHwhm", kinds.length, { check: "nonNegative" });
const tau0Field = lawInput("tau0", kinds.dimensionless, { check: "nonNegative" });
const equivalentWidthField = lawInput("equivalentWidth", kinds.length, { check: "nonNegative" });
const tauCutoffOption = lawInput("options.tauCutoff", kinds.dimensionless);

// The curve of growth, with and without a Lorentz width (γ = 0: a Gaussian line).
const widthOfTau0 = defineLaw({
  name: "equivalent width",
  inputs: [tau0Field, dopplerWidthField, lorentzHwhmField],
  result: kinds.length,
  kernel: equivalentWidthFromTau0Unchecked,
});
const widthOfTau0Gaussian = defineLaw({
  name: "equivalent width",
  inputs: [tau0Field, dopplerWidthField],
  result: kinds.length,
  kernel: (tau0, b) => equivalentWidthFromTau0Unchecked(tau0, b, 0),
});
const tau0OfWidth = defineLaw({
  name: "tau0",
  inputs: [equivalentWidthField, dopplerWidthField, lorentzHwhmField],
  result: kinds.dimensionless,
  kernel: tau0FromEquivalentWidthUnchecked,
});
const tau0OfWidthGaussian = defineLaw({
  name: "tau0",
  inputs: [equivalentWidthField, dopplerWidthField],
  result: kinds.dimensionless,
  kernel: (w, b) => tau0FromEquivalentWidthUnchecked(w, b, 0),
});

/** A field of line `i` checked and in SI; the RangeError names it as `lines[i].<field>`. */
function fieldToSI(sys: UnitSystem<SystemName>, i: number, field: LawInput, value: number): number {
  const x = field.rowToSI(sys, value);
  if (x !== x) throw new RangeError(`lines[${i}].${field.reason(sys, value)}`);
  return x;
}

/** Check the lines in the caller's units (before anything is written) and resolve them for the kernel: b, γ and τ₀ (W solved). */
function resolveLines(sys: UnitSystem<SystemName>, lines: readonly SynthesisLine<SystemName, Medium>[]): ResolvedLinesSI {
  const nl = lines.length;
  const out: ResolvedLinesSI = {
    centreM: new Float64Array(nl),
    dopplerWidthM: new Float64Array(nl),
    lorentzHwhmM: new Float64Array(nl),
    tau0: new Float64Array(nl),
  };
  for (let i = 0; i < nl; i++) {
    const line = lines[i] as SynthesisLine<SystemName, Medium>;
    out.centreM[i] = fieldToSI(sys, i, center, line.center);
    const hasB = line.dopplerWidth !== undefined;
    if (hasB === (line.gaussianSigma !== undefined)) {
      throw new RangeError(`lines[${i}] must give exactly one of dopplerWidth or gaussianSigma (${sys.coherentUnit(kinds.length.dimension)})`);
    }
    const b = hasB
      ? fieldToSI(sys, i, dopplerWidthField, line.dopplerWidth as number)
      : Math.SQRT2 * fieldToSI(sys, i, gaussianSigmaField, line.gaussianSigma as number);
    const gamma = line.lorentzHwhm === undefined ? 0 : fieldToSI(sys, i, lorentzHwhmField, line.lorentzHwhm);
    const hasT = line.tau0 !== undefined;
    if (hasT === (line.equivalentWidth !== undefined)) throw new RangeError(`lines[${i}] must give exactly one of tau0 or equivalentWidth`);
    out.dopplerWidthM[i] = b;
    out.lorentzHwhmM[i] = gamma;
    out.tau0[i] = hasT
      ? fieldToSI(sys, i, tau0Field, line.tau0 as number)
      : tau0FromEquivalentWidthUnchecked(fieldToSI(sys, i, equivalentWidthField, line.equivalentWidth as number), b, gamma);
  }
  return out;
}

/**
 * The synthesis on a grid already checked and in SI (`gridSI`); `rowReason(i, c)`
 * says why row i, whose continuum value c is not finite, has no flux.
 */
function synthesizeOnGrid(
  sys: UnitSystem<SystemName>,
  gridSI: Float64Array,
  continuum: Float64Array,
  lines: readonly SynthesisLine<SystemName, Medium>[],
  options: SynthesisOptions | undefined,
  rowReason: (i: number, c: number) => string,
): SynthesisResult<Float64Array> {
  const n = gridSI.length;
  if (continuum.length < n) throw new RangeError(`continuum must have length >= ${n} (the grid length); got ${continuum.length}`);
  const tauCut = tauCutoffOption.toSI(sys, options?.tauCutoff ?? 1e-8);
  const resolved = resolveLines(sys, lines);
  const out = new Float64Array(n);
  const log = new BatchLog();
  synthesizeSpectrumUnchecked(gridSI, continuum, resolved, tauCut, out, (i, c) => log.add(i, rowReason(i, c)));
  return { ...log.result(out), flux: out, tau0: resolved.tau0 as DimensionlessArray };
}

/**
 * Synthesize F(λ) = F_c(λ) exp(−Σ τ_i(λ)) on a wavelength grid (module
 * header). Lines and options are validated before anything is written
 * (RangeError naming e.g. `lines[3].dopplerWidth` in the caller's unit);
 * the grid must be finite and strictly increasing and the continuum at
 * least as long. Rows whose continuum is not finite become NaN and are
 * listed in `invalid`, each with a reason in `reasons`.
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
  const gridSI = gridToSI(sys, grid);
  const r = synthesizeOnGrid(sys, gridSI, continuum, lines, options, (i, c) => `continuum must be finite on the grid; element ${i} is ${show(c)}`);
  return r as SynthesisResult<C>;
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
 * or unbranded. Grid rows ≤ 0 give NaN and are listed in `invalid`, with
 * the Planck batch's reason for each in `reasons`.
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
  const gridSI = gridToSI(sys, grid);
  const planck = planckRadianceWavelengthBatch(sys, grid, temperature);
  // the rows without a continuum are the Planck batch's invalid rows: give its reasons
  const why = new Map(planck.invalid.map((i, k) => [i, planck.reasons[k] as string]));
  const r = synthesizeOnGrid(sys, gridSI, planck.values, lines, options, (i) => why.get(i) ?? `continuum B_λ is not finite at element ${i}`);
  return { ...r, flux: r.flux as SpectralRadiancePerWavelengthArray<S>, values: r.flux as SpectralRadiancePerWavelengthArray<S>, continuum: planck.values };
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
  return lorentzHwhm === undefined
    ? widthOfTau0Gaussian(sys, tau0, dopplerWidth)
    : widthOfTau0(sys, tau0, dopplerWidth, lorentzHwhm);
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
  return lorentzHwhm === undefined
    ? tau0OfWidthGaussian(sys, equivalentWidth, dopplerWidth)
    : tau0OfWidth(sys, equivalentWidth, dopplerWidth, lorentzHwhm);
}
