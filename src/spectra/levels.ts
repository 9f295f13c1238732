/**
 * Energy levels of hydrogen-like ions (one electron bound to a nucleus of
 * charge Z and mass M), typed, in SI (J) or CGS (erg); eV via `units.eV`.
 *
 * Two models:
 * - **Bohr/Rydberg** with the reduced-mass correction:
 *   E_n = −h c R∞ Z² (μ/m_e) / n²,  μ = m_e M / (m_e + M).
 *   Omits fine structure (~(Zα)²/n relative: 5 × 10⁻⁵ for H n = 1).
 * - **Dirac** (point nucleus) with the same reduced-mass scaling
 *   (H. A. Bethe & E. E. Salpeter, "Quantum Mechanics of One- and Two-Electron
 *   Atoms", 1957, §14–§16): E(n, j) = μc² [f(n, j) − 1],
 *   f = [1 + (Zα/(n − δ))²]^(−1/2), δ = j + ½ − √((j + ½)² − (Zα)²).
 *   Omits the Lamb shift (QED: 8.17 GHz for H 1s, 2.5 × 10⁻⁶ of its binding
 *   energy and 2.9 × 10⁻⁶ of the 1s–2s interval, checked against the measured
 *   1s–2s frequency in levels.test.ts; 1.05 GHz for 2s), hyperfine structure
 *   (H 1s: 1420.4 MHz, so single hyperfine components sit up to 355 MHz,
 *   1.4 × 10⁻⁷ of Lyα, from the centroid this model gives), finite nuclear
 *   size (≈ 1 MHz for H 1s) and higher-order recoil (≈ 7 × 10⁻⁹ relative).
 *
 * The line and ionisation functions default to the Dirac shell centroids
 * (`{ model: "dirac-centroid" }`), the model closer to measured lines;
 * `{ model: "bohr" }` selects Bohr levels.
 *
 * Energies are measured from the ionization limit (negative for bound
 * levels). Constants: CODATA 2018. Accuracy against 50-digit mpmath: ≤ 4e-15
 * (Bohr) and ≤ 1e-14 (Dirac) relative (kernels/hydrogen-like.test.ts).
 *
 * @module
 */
import { show } from "../internal/checks";
import { defineLaw } from "../law/define";
import { lawInput } from "../law/input";
import { kinds } from "../quantity/aliases";
import type { Energy, Mass } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import {
  ALPHA_PARTICLE_MASS_KG,
  DEUTERON_MASS_KG,
  PROTON_MASS_KG,
  bohrLevelEnergyUnchecked,
  diracLevelCentroidEnergyUnchecked,
  diracLevelEnergyUnchecked,
  nuclearMassFromMassNumberKg,
  reducedMassUnchecked,
  requireJ,
  requireNuclearCharge,
  requireQuantumNumber,
} from "./kernels/hydrogen-like";
import { ionizationEnergyUnchecked } from "./kernels/transitions";

/**
 * Inputs of the internal laws below. Quantum numbers must be integers (or
 * half-integers) and the ion a valid record: checks the law toolkit does not
 * express, so the typed functions make them once, with the kernels' messages,
 * and these inputs pass their values through (`check: "any"`). The laws only
 * move the SI result into the caller's system.
 */
const nIn = lawInput("n", kinds.dimensionless, { check: "any" });
const jIn = lawInput("j", kinds.dimensionless, { check: "any" });
const zIn = lawInput("z", kinds.dimensionless, { check: "any" });
const massKgIn = lawInput("nuclearMassKg", kinds.dimensionless, { check: "any" });
const nuclearMassInput = lawInput("nuclearMass", kinds.mass);

const massOf = defineLaw({ name: "nuclear mass", inputs: [massKgIn], result: kinds.mass, kernel: (m) => m });
const reducedMassOf = defineLaw({ name: "reduced mass", inputs: [massKgIn], result: kinds.mass, kernel: reducedMassUnchecked });
const bohrLevel = defineLaw({ name: "level energy", inputs: [nIn, zIn, massKgIn], result: kinds.energy, kernel: bohrLevelEnergyUnchecked });
const diracLevel = defineLaw({ name: "level energy", inputs: [nIn, jIn, zIn, massKgIn], result: kinds.energy, kernel: diracLevelEnergyUnchecked });
const diracCentroid = defineLaw({
  name: "level energy",
  inputs: [nIn, zIn, massKgIn],
  result: kinds.energy,
  kernel: diracLevelCentroidEnergyUnchecked,
});
const bohrIonization = defineLaw({ name: "ionization energy", inputs: [nIn, zIn, massKgIn], result: kinds.energy, kernel: ionizationEnergyUnchecked });
const diracIonization = defineLaw({
  name: "ionization energy",
  inputs: [nIn, zIn, massKgIn],
  result: kinds.energy,
  kernel: (level, charge, mass) => -diracLevelCentroidEnergyUnchecked(level, charge, mass),
});

/**
 * The ion, after checking Z and the nuclear mass (for ions built by hand
 * rather than with {@link ion}): RangeError naming the bad field.
 *
 * @internal
 */
export function checkedIon(ionValue: Ion): Ion {
  requireNuclearCharge(ionValue.z);
  if (!(ionValue.nuclearMassKg > 0)) {
    throw new RangeError(
      `ion.nuclearMassKg must be a number > 0 kg (Infinity for the infinite-mass limit); got ${show(ionValue.nuclearMassKg)}`,
    );
  }
  return ionValue;
}

/**
 * The level model named by the options (default `"dirac-centroid"`, the
 * model closer to measured lines); RangeError for an
 * unknown name (e.g. from untyped JavaScript).
 *
 * @internal
 */
export function modelOf(options: LevelModelOptions | undefined): LevelModel {
  const m = options?.model ?? "dirac-centroid";
  if (m !== "bohr" && m !== "dirac-centroid") {
    throw new RangeError(`options.model must be "bohr" or "dirac-centroid"; got ${JSON.stringify(m)}`);
  }
  return m;
}

/**
 * A hydrogen-like ion: nuclear charge number Z and nuclear mass. System-free
 * (use it with `SI` or `CGS`); build one with {@link ion} or
 * {@link ionFromMassNumber}, or take a preset from {@link ions}.
 */
export interface Ion {
  /** A label for messages and tables, e.g. `"H I"`, `"He II"`. */
  readonly name: string;
  /** Nuclear charge number Z (integer, 1–137). */
  readonly z: number;
  /**
   * Nuclear mass in kilograms (the kernels' unit; `Infinity` for the
   * infinite-mass limit μ = m_e). Read it typed with {@link nuclearMass}.
   */
  readonly nuclearMassKg: number;
}

/**
 * Presets: ¹H (proton mass), ²H (deuteron mass) and ⁴He⁺ (alpha-particle
 * mass), masses CODATA 2018; and `hydrogenInfiniteMass` (Z = 1, μ = m_e), whose
 * levels are exactly −h c R∞ / n².
 *
 * @example
 * ```ts
 * import { SI, bohrLevelEnergy, ions, units } from "starlume";
 * SI.valueIn(bohrLevelEnergy(SI, ions.HeII, 1), units.eV); // ≈ −54.4153 (Bohr)
 * ```
 */
export const ions = Object.freeze({
  /** ¹H: Z = 1, proton mass 1.672 621 923 69 × 10⁻²⁷ kg. */
  H: Object.freeze({ name: "H I", z: 1, nuclearMassKg: PROTON_MASS_KG }) as Ion,
  /** ²H (deuterium): Z = 1, deuteron mass 3.343 583 7724 × 10⁻²⁷ kg. */
  D: Object.freeze({ name: "D I", z: 1, nuclearMassKg: DEUTERON_MASS_KG }) as Ion,
  /** ⁴He⁺: Z = 2, alpha-particle mass 6.644 657 3357 × 10⁻²⁷ kg. */
  HeII: Object.freeze({ name: "He II", z: 2, nuclearMassKg: ALPHA_PARTICLE_MASS_KG }) as Ion,
  /** Z = 1 with an infinitely heavy nucleus (μ = m_e): the R∞ scale. */
  hydrogenInfiniteMass: Object.freeze({ name: "H (M = ∞)", z: 1, nuclearMassKg: Infinity }) as Ion,
});

/**
 * A hydrogen-like ion from its nuclear charge and nuclear mass (a typed
 * mass, or `"infinite"` for the μ = m_e limit).
 *
 * @param sys - `SI` or `CGS` (the system of `nuclearMass`)
 * @param z - nuclear charge number, integer 1–137
 * @param nuclearMass - mass of the nucleus (not of the atom), in `sys`, or `"infinite"`
 * @param name - label (default `"Z = <z>"`)
 * @throws RangeError for a bad Z or a mass that is not finite and > 0
 * @example
 * ```ts
 * import { CGS, ion, units } from "starlume";
 * const li = ion(CGS, 3, CGS.of(1.1647e-23, units.g), "Li III"); // ⁷Li³⁺, nuclear mass ≈ 7.0144 u
 * ```
 */
export function ion<S extends SystemName>(
  sys: UnitSystem<S>,
  z: number,
  nuclearMass: Mass<NoInfer<S>> | "infinite",
  name?: string,
): Ion {
  requireNuclearCharge(z);
  const kg = nuclearMass === "infinite" ? Infinity : nuclearMassInput.toSI(sys, nuclearMass);
  return Object.freeze({ name: name ?? `Z = ${z}`, z, nuclearMassKg: kg });
}

/**
 * A hydrogen-like ion with nuclear mass approximated from the mass number:
 * M ≈ A m_u − Z m_e (the atomic mass taken as A m_u; electron binding and
 * the nuclear mass excess neglected). The excess (≤ ~0.1 u) changes μ/m_e
 * by about (m_e/M)(ΔM/M): below 5 × 10⁻⁹ for A ≥ 12, but 4 × 10⁻⁶ for ¹H —
 * use the {@link ions} presets for H, D and ⁴He.
 *
 * @param z - nuclear charge number (1–137)
 * @param massNumber - mass number A (integer ≥ Z)
 * @param name - label (default `"Z = <z>, A = <A>"`)
 * @example
 * ```ts
 * import { SI, bohrLevelEnergy, ionFromMassNumber, units } from "starlume";
 * const c6 = ionFromMassNumber(6, 12, "C VI");
 * SI.valueIn(bohrLevelEnergy(SI, c6, 1), units.eV); // ≈ −489.78
 * ```
 */
export function ionFromMassNumber(z: number, massNumber: number, name?: string): Ion {
  const kg = nuclearMassFromMassNumberKg(massNumber, z);
  return Object.freeze({ name: name ?? `Z = ${z}, A = ${massNumber}`, z, nuclearMassKg: kg });
}

/**
 * The nuclear mass of an ion, typed (`Infinity` for the infinite-mass limit).
 *
 * @example
 * ```ts
 * import { CGS, ions, nuclearMass } from "starlume";
 * nuclearMass(CGS, ions.H); // 1.67262192369e-24 (g)
 * ```
 */
export function nuclearMass<S extends SystemName>(sys: UnitSystem<S>, ionValue: Ion): Mass<S> {
  const kg = checkedIon(ionValue).nuclearMassKg;
  // the infinite-mass limit is Infinity in every system (a law refuses non-finite results)
  return kg === Infinity ? (kg as Mass<S>) : massOf(sys, kg);
}

/**
 * Reduced mass of the electron–nucleus system, μ = m_e M / (m_e + M)
 * (m_e for an infinitely heavy nucleus).
 *
 * @example
 * ```ts
 * import { SI, ions, reducedMass } from "starlume";
 * reducedMass(SI, ions.H); // ≈ 9.1044e-31 kg
 * ```
 */
export function reducedMass<S extends SystemName>(sys: UnitSystem<S>, ionValue: Ion): Mass<S> {
  return reducedMassOf(sys, checkedIon(ionValue).nuclearMassKg);
}

/**
 * Bohr (Rydberg) energy of level n with the reduced-mass correction,
 * E_n = −h c R∞ Z² (μ/m_e) / n² (negative: from the ionization limit).
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param ionValue - the ion
 * @param n - principal quantum number (integer ≥ 1)
 * @throws RangeError when n is not an integer ≥ 1
 * @example
 * ```ts
 * import { SI, bohrLevelEnergy, ions, units } from "starlume";
 * SI.valueIn(bohrLevelEnergy(SI, ions.H, 1), units.eV); // ≈ −13.598287
 * ```
 */
export function bohrLevelEnergy<S extends SystemName>(sys: UnitSystem<S>, ionValue: Ion, n: number): Energy<S> {
  const i = checkedIon(ionValue);
  requireQuantumNumber("n", n);
  return bohrLevel(sys, n, i.z, i.nuclearMassKg);
}

/**
 * Dirac energy of the fine-structure level (n, j), with reduced-mass
 * scaling: E(n, j) = μc² [f(n, j) − 1] (module header; no Lamb shift).
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param ionValue - the ion
 * @param n - principal quantum number (integer ≥ 1)
 * @param j - total angular momentum, a half-integer with ½ ≤ j ≤ n − ½
 * @throws RangeError for a bad n or j
 * @example
 * ```ts
 * import { SI, diracLevelEnergy, ions } from "starlume";
 * const e2p32 = diracLevelEnergy(SI, ions.H, 2, 1.5); // 2p3/2 of hydrogen, J
 * ```
 */
export function diracLevelEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  n: number,
  j: number,
): Energy<S> {
  const i = checkedIon(ionValue);
  requireQuantumNumber("n", n);
  requireJ("j", j, n);
  return diracLevel(sys, n, j, i.z, i.nuclearMassKg);
}

/**
 * Statistical-weight centroid of the Dirac levels of shell n,
 * Ē_n = Σ_j g_j E(n, j) / (2n²), g_j = 2(2j + 1) for j < n − ½ and 2n for
 * j = n − ½: the "centre of gravity" of the shell, whose differences
 * approximate the centroids of unresolved hydrogenic multiplets (Hα, …).
 *
 * @example
 * ```ts
 * import { CGS, diracLevelCentroidEnergy, ions } from "starlume";
 * const e3 = diracLevelCentroidEnergy(CGS, ions.H, 3); // erg
 * ```
 */
export function diracLevelCentroidEnergy<S extends SystemName>(sys: UnitSystem<S>, ionValue: Ion, n: number): Energy<S> {
  const i = checkedIon(ionValue);
  requireQuantumNumber("n", n);
  return diracCentroid(sys, n, i.z, i.nuclearMassKg);
}

/** The level model of the line and ionization functions. */
export type LevelModel = "bohr" | "dirac-centroid";

/** Options of the level-model–dependent functions. */
export interface LevelModelOptions {
  /**
   * `"dirac-centroid"` (default): statistical-weight centroids of the Dirac
   * fine-structure levels ({@link diracLevelCentroidEnergy}), within
   * 3.3 × 10⁻⁶ of measured hydrogen lines (Lyα; the 1s Lamb shift of
   * 8.17 GHz is the residual, 1 × 10⁻⁷ for Balmer lines) and 6 × 10⁻⁶ of
   * He II 4686 (limited by the 6-digit reference); `"bohr"`: Rydberg levels
   * with reduced mass, 1.2–1.4 × 10⁻⁵ from measured H lines and 3.1 × 10⁻⁵
   * from He II 4686 (fine structure omitted).
   */
  readonly model?: LevelModel;
}

/**
 * Ionization energy from level n (positive): I_n = h c R∞ Z² (μ/m_e) / n²
 * in the Bohr model, or −Ē_n (the Dirac shell centroid, which for n = 1 is
 * the 1s½ level) with `{ model: "dirac-centroid" }`.
 *
 * Against NIST's 13.598 434 eV for ¹H 1s (from memory): Bohr 13.598 287 eV
 * (−1.1 × 10⁻⁵ relative: the omitted α²/4 binding correction), Dirac
 * 13.598 468 eV (+2.5 × 10⁻⁶: the omitted 1s Lamb shift).
 *
 * @param sys - `SI` (J) or `CGS` (erg)
 * @param ionValue - the ion
 * @param n - principal quantum number of the level (default 1)
 * @param options - level model: `"dirac-centroid"` (default, closer to measured lines) or `"bohr"`
 * @example
 * ```ts
 * import { SI, ionizationEnergy, ions, units } from "starlume";
 * SI.valueIn(ionizationEnergy(SI, ions.H, 1, { model: "bohr" }), units.eV); // ≈ 13.598287
 * SI.valueIn(ionizationEnergy(SI, ions.H, 1, { model: "dirac-centroid" }), units.eV); // ≈ 13.598468
 * ```
 */
export function ionizationEnergy<S extends SystemName>(
  sys: UnitSystem<S>,
  ionValue: Ion,
  n = 1,
  options?: LevelModelOptions,
): Energy<S> {
  const i = checkedIon(ionValue);
  const model = modelOf(options);
  requireQuantumNumber("n", n);
  return model === "bohr" ? bohrIonization(sys, n, i.z, i.nuclearMassKg) : diracIonization(sys, n, i.z, i.nuclearMassKg);
}
