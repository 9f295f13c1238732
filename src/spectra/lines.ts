/**
 * Lines of hydrogen-like ions, typed: the transition between two levels as
 * an energy (`Energy<S>`: J or erg), a vacuum wavenumber (`Wavenumber<S>`:
 * m⁻¹ or cm⁻¹), a frequency (`Frequency`, Hz) or a vacuum wavelength
 * ({@link VacuumWavelength}); the named series Lyman (n₁ = 1), Balmer (2),
 * Paschen (3), Brackett (4), Pfund (5) and Humphreys (6), with their limits.
 *
 * Bohr transitions: σ = R∞ Z² (μ/m_e)(1/n₁² − 1/n₂²), the bracket evaluated
 * as (n₂ − n₁)(n₂ + n₁)/(n₁² n₂²) (no cancellation); E = hcσ, ν = cσ,
 * λ = 1/σ. With `{ model: "dirac-centroid" }` the energy is the difference
 * of the Dirac shell centroids (levels.ts), then σ = E/(hc), ν = E/h,
 * λ = hc/E. Wavelengths are in vacuum: convert with `airFromVacuum`.
 *
 * Accuracy: ≤ 4e-15 relative to 50-digit mpmath (kernels/transitions.test.ts).
 * Against measured lines (NIST ASD, from memory; lines.test.ts): the Bohr
 * model is within 1.4 × 10⁻⁵ (H) and 3.1 × 10⁻⁵ (He II 4686) relative (fine
 * structure omitted), the Dirac centroid within 6 × 10⁻⁶ (H Lyα 121.5667 vs
 * 121.567 nm; Hα in air 656.2794 vs 656.279 nm; He II 4686 in air 468.5695
 * vs 468.57 nm).
 *
 * @module
 */
import { C, H } from "../values/constants";
import { show } from "../internal/checks";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { lawOutput } from "../law/output";
import { kinds } from "../quantity/aliases";
import type { Energy, Frequency, Wavenumber } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import { diracLevelCentroidEnergyUnchecked, requireJ, requireQuantumNumber } from "./kernels/hydrogen-like";
import {
  HYDROGEN_SERIES,
  diracCentroidTransitionEnergyUnchecked,
  diracTransitionEnergyUnchecked,
  ionizationEnergyUnchecked,
  requireLevelAbove,
  requireOrdered,
  seriesLimitVacuumWavelengthUnchecked,
  seriesLowerLevel as seriesLowerLevelKernel,
  transitionEnergyUnchecked,
  transitionFrequencyUnchecked,
  transitionVacuumWavelengthUnchecked,
  transitionWavenumberUnchecked,
} from "./kernels/transitions";
import type { SeriesName } from "./kernels/transitions";
import { checkedIon, modelOf, type Ion, type LevelModelOptions } from "./levels";
import type { VacuumWavelength, VacuumWavelengthArray } from "./medium";

export type { SeriesName };

const HC = H * C;

/**
 * Inputs of the internal laws below: quantum numbers and the ion's Z and
 * nuclear mass (kg), checked once by the typed functions (integers, ordering:
 * checks the law toolkit does not express) and passed through here
 * (`check: "any"`). The laws move the SI result into the caller's system.
 */
const nLowerIn = lawInput("nLower", kinds.dimensionless, { check: "any" });
const nUpperIn = lawInput("nUpper", kinds.dimensionless, { check: "any" });
const jLowerIn = lawInput("jLower", kinds.dimensionless, { check: "any" });
const jUpperIn = lawInput("jUpper", kinds.dimensionless, { check: "any" });
const zIn = lawInput("z", kinds.dimensionless, { check: "any" });
const massKgIn = lawInput("nuclearMassKg", kinds.dimensionless, { check: "any" });
const transition = [nLowerIn, nUpperIn, zIn, massKgIn] as const;
const limit = [nLowerIn, zIn, massKgIn] as const;

const bohrEnergy = defineLaw({ name: "transition energy", inputs: transition, result: kinds.energy, kernel: transitionEnergyUnchecked });
const diracEnergy = defineLaw({
  name: "transition energy",
  inputs: transition,
  result: kinds.energy,
  kernel: diracCentroidTransitionEnergyUnchecked,
});
const bohrWavenumber = defineLaw({ name: "wavenumber", inputs: transition, result: kinds.wavenumber, kernel: transitionWavenumberUnchecked });
const diracWavenumber = defineLaw({
  name: "wavenumber",
  inputs: transition,
  result: kinds.wavenumber,
  kernel: (nl, nu, z, m) => diracCentroidTransitionEnergyUnchecked(nl, nu, z, m) / HC,
});
const bohrFrequency = defineLaw({ name: "frequency", inputs: transition, result: kinds.frequency, kernel: transitionFrequencyUnchecked });
const diracFrequency = defineLaw({
  name: "frequency",
  inputs: transition,
  result: kinds.frequency,
  kernel: (nl, nu, z, m) => diracCentroidTransitionEnergyUnchecked(nl, nu, z, m) / H,
});
const bohrWavelength = defineLaw({
  name: "vacuum wavelength",
  inputs: transition,
  result: kinds.length,
  kernel: transitionVacuumWavelengthUnchecked,
});
const diracWavelength = defineLaw({
  name: "vacuum wavelength",
  inputs: transition,
  result: kinds.length,
  kernel: (nl, nu, z, m) => HC / diracCentroidTransitionEnergyUnchecked(nl, nu, z, m),
});
const diracLevelsEnergy = defineLaw({
  name: "transition energy",
  inputs: [nLowerIn, jLowerIn, nUpperIn, jUpperIn, zIn, massKgIn],
  result: kinds.energy,
  kernel: diracTransitionEnergyUnchecked,
});
const bohrLimitEnergy = defineLaw({ name: "series-limit energy", inputs: limit, result: kinds.energy, kernel: ionizationEnergyUnchecked });
const diracLimitEnergy = defineLaw({
  name: "series-limit energy",
  inputs: limit,
  result: kinds.energy,
  kernel: (n1, z, m) => -diracLevelCentroidEnergyUnchecked(n1, z, m),
});
const bohrLimitWavelength = defineLaw({
  name: "series-limit wavelength",
  inputs: limit,
  result: kinds.length,
  kernel: seriesLimitVacuumWavelengthUnchecked,
});
const diracLimitWavelength = defineLaw({
  name: "series-limit wavelength",
  inputs: limit,
  result: kinds.length,
  kernel: (n1, z, m) => HC / -diracLevelCentroidEnergyUnchecked(n1, z, m),
});
const wavelengthOut = lawOutput("vacuum wavelength", kinds.length);

/**
 * The named series and their lower levels n₁:
 * `{ lyman: 1, balmer: 2, paschen: 3, brackett: 4, pfund: 5, humphreys: 6 }`.
 *
 * @example
 * ```ts
 * import { hydrogenSeries } from "starlume";
 * hydrogenSeries.balmer; // 2
 * ```
 */
export const hydrogenSeries: typeof HYDROGEN_SERIES = HYDROGEN_SERIES;

/**
 * Lower level n₁ of a named series (RangeError for an unknown name, e.g.
 * from untyped JavaScript).
 *
 * @example
 * ```ts
 * import { seriesLowerLevel } from "starlume";
 * seriesLowerLevel("paschen"); // 3
 * ```
 */
export function seriesLowerLevel(series: SeriesName): number {
  return seriesLowerLevelKernel(series);
}

/**
 * Energy of the transition n_lower → n_upper, E = h c R∞ Z² (μ/m_e)(1/n₁² − 1/n₂²)
 * (Bohr, default) or the Dirac shell-centroid difference.
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param ionValue - the ion ({@link ions} has H, D, He II)
 * @param nLower - lower principal quantum number (integer ≥ 1)
 * @param nUpper - upper principal quantum number (integer > nLower)
 * @param options - level model
 * @throws RangeError when n is ≤ 0 or not an integer, or nUpper ≤ nLower (naming it)
 * @example
 * ```ts
 * import { SI, ions, transitionEnergy, units } from "starlume";
 * SI.valueIn(transitionEnergy(SI, ions.H, 1, 2), units.eV); // Lyman α ≈ 10.1987 eV
 * ```
 */
export function transitionEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  nLower: number,
  nUpper: number,
  options?: LevelModelOptions,
): Energy<S> {
  const i = checkedIon(ionValue);
  const bohr = modelOf(options) === "bohr";
  requireOrdered(nLower, nUpper);
  return (bohr ? bohrEnergy : diracEnergy)(sys, nLower, nUpper, i.z, i.nuclearMassKg);
}

/**
 * Vacuum wavenumber of the transition, σ = R∞ Z² (μ/m_e)(1/n₁² − 1/n₂²)
 * (Bohr) or E/(hc) (Dirac centroid).
 *
 * @param sys - `SI` (m⁻¹) or `CGS` (cm⁻¹)
 * @example
 * ```ts
 * import { CGS, ions, transitionWavenumber, units } from "starlume";
 * CGS.valueIn(transitionWavenumber(CGS, ions.H, 2, 3), units.per_cm); // Hα ≈ 15233.00 cm^-1 (Bohr)
 * ```
 */
export function transitionWavenumber<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  nLower: number,
  nUpper: number,
  options?: LevelModelOptions,
): Wavenumber<S> {
  const i = checkedIon(ionValue);
  const bohr = modelOf(options) === "bohr";
  requireOrdered(nLower, nUpper);
  return (bohr ? bohrWavenumber : diracWavenumber)(sys, nLower, nUpper, i.z, i.nuclearMassKg);
}

/**
 * Frequency of the transition, ν = cσ (Bohr) or E/h (Dirac centroid).
 * The system argument only fixes the call shape (a frequency is the same
 * in SI and CGS).
 *
 * @example
 * ```ts
 * import { SI, ions, transitionFrequency, units } from "starlume";
 * SI.valueIn(transitionFrequency(SI, ions.H, 1, 2), units.THz); // ≈ 2466.0 THz
 * ```
 */
export function transitionFrequency<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  nLower: number,
  nUpper: number,
  options?: LevelModelOptions,
): Frequency {
  const i = checkedIon(ionValue);
  const bohr = modelOf(options) === "bohr";
  requireOrdered(nLower, nUpper);
  return (bohr ? bohrFrequency : diracFrequency)(sys, nLower, nUpper, i.z, i.nuclearMassKg);
}

/**
 * Vacuum wavelength of the transition, λ = 1/σ (Bohr) or hc/E (Dirac
 * centroid), branded {@link VacuumWavelength}.
 *
 * @example
 * ```ts
 * import { SI, ions, transitionVacuumWavelength, units, airFromVacuum } from "starlume";
 * const ha = transitionVacuumWavelength(SI, ions.H, 2, 3, { model: "dirac-centroid" });
 * SI.valueIn(airFromVacuum(SI, ha), units.nm); // ≈ 656.2794 (NIST: 656.279 in air)
 * ```
 */
export function transitionVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  nLower: number,
  nUpper: number,
  options?: LevelModelOptions,
): VacuumWavelength<S> {
  const i = checkedIon(ionValue);
  const bohr = modelOf(options) === "bohr";
  requireOrdered(nLower, nUpper);
  return (bohr ? bohrWavelength : diracWavelength)(sys, nLower, nUpper, i.z, i.nuclearMassKg) as VacuumWavelength<S>;
}

/** A Dirac fine-structure level: principal quantum number n and total angular momentum j (½ ≤ j ≤ n − ½). */
export interface DiracLevel {
  /** Principal quantum number (integer ≥ 1). */
  readonly n: number;
  /** Total angular momentum, a half-integer in [½, n − ½]. */
  readonly j: number;
}

/**
 * Energy of the transition between two Dirac fine-structure levels,
 * E = μc² [f(n_u, j_u) − f(n_l, j_l)] (levels.ts; no Lamb shift). The lower
 * level must come first (same n with a larger j is a fine-structure
 * transition).
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param ionValue - the ion
 * @param lower - lower level {n, j}
 * @param upper - upper level {n, j}
 * @throws RangeError for bad quantum numbers or an upper level not above the lower one
 * @example
 * ```ts
 * import { SI, diracTransitionEnergy, ions, frequencyFromPhotonEnergy, units } from "starlume";
 * const fs = diracTransitionEnergy(SI, ions.H, { n: 2, j: 0.5 }, { n: 2, j: 1.5 });
 * SI.valueIn(frequencyFromPhotonEnergy(SI, fs), units.GHz); // ≈ 10.94 (2p fine structure, no QED)
 * ```
 */
export function diracTransitionEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  lower: DiracLevel,
  upper: DiracLevel,
): Energy<S> {
  const i = checkedIon(ionValue);
  requireQuantumNumber("nLower", lower.n);
  requireQuantumNumber("nUpper", upper.n);
  requireJ("jLower", lower.j, lower.n);
  requireJ("jUpper", upper.j, upper.n);
  requireLevelAbove(lower.n, lower.j, upper.n, upper.j);
  return diracLevelsEnergy(sys, lower.n, lower.j, upper.n, upper.j, i.z, i.nuclearMassKg);
}

/**
 * Energy of the line of a named series with upper level nUpper (> n₁).
 *
 * @example
 * ```ts
 * import { SI, ions, seriesLineEnergy, units } from "starlume";
 * SI.valueIn(seriesLineEnergy(SI, ions.H, "balmer", 4), units.eV); // Hβ ≈ 2.5496 eV
 * ```
 */
export function seriesLineEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  series: SeriesName,
  nUpper: number,
  options?: LevelModelOptions,
): Energy<S> {
  return transitionEnergy(sys, ionValue, seriesLowerLevelKernel(series), nUpper, options);
}

/**
 * Vacuum wavelength of the line of a named series with upper level nUpper.
 *
 * @example
 * ```ts
 * import { SI, ions, seriesLineVacuumWavelength, units } from "starlume";
 * SI.valueIn(seriesLineVacuumWavelength(SI, ions.H, "lyman", 2), units.nm); // Lyα ≈ 121.5684 (Bohr)
 * ```
 */
export function seriesLineVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  series: SeriesName,
  nUpper: number,
  options?: LevelModelOptions,
): VacuumWavelength<S> {
  return transitionVacuumWavelength(sys, ionValue, seriesLowerLevelKernel(series), nUpper, options);
}

/**
 * Series-limit energy (n_upper → ∞): the ionisation energy of the series'
 * lower level, h c R∞ Z² (μ/m_e)/n₁² (Bohr) or −Ē_{n₁} (Dirac centroid).
 *
 * @example
 * ```ts
 * import { SI, ions, seriesLimitEnergy, units } from "starlume";
 * SI.valueIn(seriesLimitEnergy(SI, ions.H, "balmer"), units.eV); // ≈ 3.3996 eV
 * ```
 */
export function seriesLimitEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  series: SeriesName,
  options?: LevelModelOptions,
): Energy<S> {
  const i = checkedIon(ionValue);
  const n1 = seriesLowerLevelKernel(series);
  return (modelOf(options) === "bohr" ? bohrLimitEnergy : diracLimitEnergy)(sys, n1, i.z, i.nuclearMassKg);
}

/**
 * Series-limit vacuum wavelength, λ∞ = n₁² / (R∞ Z² μ/m_e) (Bohr) or
 * hc/(−Ē_{n₁}) (Dirac centroid).
 *
 * @example
 * ```ts
 * import { SI, ions, seriesLimitVacuumWavelength, units } from "starlume";
 * SI.valueIn(seriesLimitVacuumWavelength(SI, ions.H, "lyman"), units.nm); // ≈ 91.1763
 * ```
 */
export function seriesLimitVacuumWavelength<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  series: SeriesName,
  options?: LevelModelOptions,
): VacuumWavelength<S> {
  const i = checkedIon(ionValue);
  const n1 = seriesLowerLevelKernel(series);
  const law = modelOf(options) === "bohr" ? bohrLimitWavelength : diracLimitWavelength;
  return law(sys, n1, i.z, i.nuclearMassKg) as VacuumWavelength<S>;
}

/**
 * Vacuum wavelengths of the first `count` lines of a named series
 * (n_upper = n₁ + 1 … n₁ + count), longest first, as a new array.
 *
 * @param count - number of lines (integer ≥ 1)
 * @throws RangeError for a bad count
 * @example
 * ```ts
 * import { SI, ions, seriesVacuumWavelengths, units } from "starlume";
 * SI.arrayIn(seriesVacuumWavelengths(SI, ions.H, "balmer", 4), units.nm); // Hα, Hβ, Hγ, Hδ
 * ```
 */
export function seriesVacuumWavelengths<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  series: SeriesName,
  count: number,
  options?: LevelModelOptions,
): VacuumWavelengthArray<S> {
  const i = checkedIon(ionValue);
  const n1 = seriesLowerLevelKernel(series);
  const bohr = modelOf(options) === "bohr";
  if (!Number.isInteger(count) || count < 1) {
    throw new RangeError(`count must be an integer >= 1; got ${show(count)}`);
  }
  const out = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const nUpper = n1 + 1 + k;
    const si = bohr
      ? transitionVacuumWavelengthUnchecked(n1, nUpper, i.z, i.nuclearMassKg)
      : HC / diracCentroidTransitionEnergyUnchecked(n1, nUpper, i.z, i.nuclearMassKg);
    out[k] = wavelengthOut.fromSI(sys, si);
  }
  return out as VacuumWavelengthArray<S>;
}
