/**
 * Energy levels of hydrogen-like ions (one electron bound to a nucleus of
 * charge Z and mass M), in joules, plain SI numbers.
 *
 * Two models:
 * - Bohr/Rydberg with the reduced-mass correction:
 *   E_n = −h c R∞ Z² (μ/m_e) / n²,  μ = m_e M / (m_e + M).
 * - Dirac (point nucleus) with the same reduced-mass scaling, as in
 *   H. A. Bethe & E. E. Salpeter, "Quantum Mechanics of One- and Two-Electron
 *   Atoms" (1957), §14–§16 and the recoil discussion of §21 / §42:
 *   E(n, j) = μ c² [f(n, j) − 1],
 *   f = [1 + (Zα / (n − δ))²]^{−1/2},  δ = j + ½ − √((j + ½)² − (Zα)²).
 *   This omits the Lamb shift (QED; ~1e-6 relative for 1S of H), hyperfine
 *   structure (~1e-7 relative for H 1S), the finite nuclear size, and the
 *   next recoil term −μ²c²(f − 1)²/(2(m_e + M)) (≈ 7e-9 relative for H 1S).
 *
 * Energies are measured from the ionization limit (negative for bound
 * levels). Constants: CODATA 2018 via src/values/constants.ts.
 *
 * @packageDocumentation
 */

import { ALPHA, C, H, M_E, M_P, M_U, RYDBERG } from "../../values/constants";
import { show } from "../../internal/checks";

/**
 * Alpha-particle (⁴He nucleus) mass, kg. CODATA 2018 (Tiesinga et al.,
 * Rev. Mod. Phys. 93, 025010, 2021): 6.644 657 3357(20) × 10⁻²⁷ kg.
 * Checked against scipy.constants' CODATA 2018 table by
 * test/fixtures/gen/hydrogen-levels.py.
 */
export const ALPHA_PARTICLE_MASS_KG = 6.6446573357e-27;

/**
 * Deuteron mass, kg. CODATA 2018 (Tiesinga et al. 2021):
 * 3.343 583 7724(10) × 10⁻²⁷ kg. Checked as {@link ALPHA_PARTICLE_MASS_KG}.
 */
export const DEUTERON_MASS_KG = 3.3435837724e-27;

/** Proton mass, kg (CODATA 2018, from src/values/constants.ts): the ¹H nucleus. */
export const PROTON_MASS_KG = M_P;

/** Hydrogen-like ion: nuclear charge number Z and nuclear mass in kg. */
export interface HydrogenLikeIonSI {
  /** Nuclear charge number Z (integer ≥ 1). */
  readonly z: number;
  /** Nuclear mass, kg (Infinity for the infinite-mass limit, μ = m_e). */
  readonly nuclearMassKg: number;
}

/** ¹H: Z = 1, proton mass. */
export const HYDROGEN: HydrogenLikeIonSI = Object.freeze({ z: 1, nuclearMassKg: PROTON_MASS_KG });
/** ²H (deuterium): Z = 1, deuteron mass. */
export const DEUTERIUM: HydrogenLikeIonSI = Object.freeze({ z: 1, nuclearMassKg: DEUTERON_MASS_KG });
/** ⁴He II (He⁺): Z = 2, alpha-particle mass. */
export const HELIUM_II: HydrogenLikeIonSI = Object.freeze({ z: 2, nuclearMassKg: ALPHA_PARTICLE_MASS_KG });

/** Throw a RangeError unless `n` is an integer ≥ 1. @internal */
export function requireQuantumNumber(name: string, n: number): number {
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`${name} must be an integer >= 1 (principal quantum number); got ${show(n)}`);
  }
  return n;
}

/** Throw a RangeError unless Z is an integer in [1, 137] (Zα < 1). @internal */
export function requireNuclearCharge(z: number): number {
  if (!Number.isInteger(z) || z < 1 || z * ALPHA >= 1) {
    throw new RangeError(`z must be an integer in [1, 137] (nuclear charge number, Zα < 1); got ${show(z)}`);
  }
  return z;
}

/** Throw a RangeError unless the nuclear mass is > 0 kg (Infinity allowed). @internal */
export function requireNuclearMass(m: number): number {
  if (!(m > 0)) {
    throw new RangeError(`nuclearMassKg must be a number > 0 kg (Infinity for the infinite-mass limit); got ${show(m)}`);
  }
  return m;
}

/**
 * Ratio μ/m_e of the reduced mass to the electron mass,
 * μ/m_e = 1 / (1 + m_e/M). Dimensionless; M = Infinity gives 1.
 *
 * @example
 * ```ts
 * reducedMassRatio(PROTON_MASS_KG); // 0.999 455 679…
 * ```
 */
export function reducedMassRatio(nuclearMassKg: number): number {
  requireNuclearMass(nuclearMassKg);
  return reducedMassRatioUnchecked(nuclearMassKg);
}

/** {@link reducedMassRatio} without the check (M > 0 or Infinity assumed). @internal */
export function reducedMassRatioUnchecked(nuclearMassKg: number): number {
  return 1 / (1 + M_E / nuclearMassKg);
}

/**
 * Reduced mass μ = m_e M / (m_e + M) of an electron bound to a nucleus of
 * mass M, kg. M = Infinity gives m_e.
 *
 * @example
 * ```ts
 * reducedMassKg(PROTON_MASS_KG); // 9.1044e-31
 * ```
 */
export function reducedMassKg(nuclearMassKg: number): number {
  return reducedMassUnchecked(requireNuclearMass(nuclearMassKg));
}

/** {@link reducedMassKg} without the check (M > 0 or Infinity assumed). @internal */
export function reducedMassUnchecked(nuclearMassKg: number): number {
  return M_E * reducedMassRatioUnchecked(nuclearMassKg);
}

/**
 * Approximate nuclear mass from the mass number A and charge Z:
 * M ≈ A m_u − Z m_e, kg (the atomic mass approximated by A m_u; electron
 * binding and the nuclear mass excess are neglected). The mass excess (at most
 * ~0.1 u, 0.78% for ¹H, below 0.1% for A ≥ 12) changes μ/m_e by about
 * (m_e/M)·(ΔM/M): 4e-6 for ¹H — use {@link PROTON_MASS_KG},
 * {@link DEUTERON_MASS_KG}, {@link ALPHA_PARTICLE_MASS_KG} for H, D and ⁴He —
 * and below 5e-9 for A ≥ 12.
 *
 * @example
 * ```ts
 * nuclearMassFromMassNumberKg(12, 6); // ¹²C nucleus ≈ 1.99209e-26 kg
 * ```
 */
export function nuclearMassFromMassNumberKg(massNumber: number, z: number): number {
  if (!Number.isInteger(massNumber) || massNumber < 1) {
    throw new RangeError(`massNumber must be an integer >= 1; got ${show(massNumber)}`);
  }
  requireNuclearCharge(z);
  if (z > massNumber) {
    throw new RangeError(`z must not exceed massNumber (${massNumber}); got ${show(z)}`);
  }
  return massNumber * M_U - z * M_E;
}

/**
 * Bohr (Rydberg) energy of level n with reduced-mass correction,
 * E_n = −h c R∞ Z² (μ/m_e) / n², J (negative: measured from the ionization
 * limit). Fine structure, Lamb shift and hyperfine structure are omitted
 * (fine structure is ~(Zα)²/n relative: 5e-5 for H n = 1).
 *
 * @param n principal quantum number (integer ≥ 1)
 * @param z nuclear charge number (integer 1–137)
 * @param nuclearMassKg nuclear mass, kg (Infinity allowed)
 * @example
 * ```ts
 * bohrLevelEnergySI(1, 1, PROTON_MASS_KG) / 1.602176634e-19; // −13.598 287 eV
 * ```
 */
export function bohrLevelEnergySI(n: number, z: number, nuclearMassKg: number): number {
  requireQuantumNumber("n", n);
  requireNuclearCharge(z);
  return bohrLevelEnergyUnchecked(n, z, requireNuclearMass(nuclearMassKg));
}

/** {@link bohrLevelEnergySI} without the checks (n, Z and M valid). @internal */
export function bohrLevelEnergyUnchecked(n: number, z: number, nuclearMassKg: number): number {
  return (-H * C * RYDBERG * z * z * reducedMassRatioUnchecked(nuclearMassKg)) / n / n;
}

/** Throw unless j is a half-integer with ½ ≤ j ≤ n − ½. @internal */
export function requireJ(name: string, j: number, n: number): number {
  if (!Number.isInteger(j - 0.5) || j < 0.5 || j > n - 0.5) {
    throw new RangeError(`${name} must be a half-integer in [1/2, n - 1/2] = [0.5, ${n - 0.5}]; got ${show(j)}`);
  }
  return j;
}

/**
 * f(n, j) − 1 for the Dirac energy, computed without cancellation:
 * with a = Zα/(n − δ), f − 1 = expm1(−½ log1p(a²)); δ is evaluated as
 * (Zα)² / ((j + ½) + √((j + ½)² − (Zα)²)). Unchecked. @internal
 */
export function diracFMinusOne(n: number, j: number, z: number): number {
  const za = z * ALPHA;
  const k = j + 0.5;
  const delta = (za * za) / (k + Math.sqrt((k - za) * (k + za)));
  const a = za / (n - delta);
  return Math.expm1(-0.5 * Math.log1p(a * a));
}

/**
 * Dirac energy of the level (n, j) with the reduced-mass scaling,
 * E(n, j) = μ c² [f(n, j) − 1], f = [1 + (Zα/(n − δ))²]^{−1/2},
 * δ = j + ½ − √((j + ½)² − (Zα)²) — Bethe & Salpeter (1957) §14 with
 * m_e → μ. J, negative (from the ionization limit). Omitted: Lamb shift,
 * hyperfine structure, finite nuclear size, higher-order recoil (module
 * header). f − 1 (~1e-5) is computed with expm1/log1p.
 *
 * @param n principal quantum number (integer ≥ 1)
 * @param j total angular momentum (half-integer, ½ ≤ j ≤ n − ½)
 * @param z nuclear charge number (integer 1–137)
 * @param nuclearMassKg nuclear mass, kg (Infinity allowed)
 * @example
 * ```ts
 * diracLevelEnergySI(2, 0.5, 1, PROTON_MASS_KG); // 2s½ and 2p½ of H
 * ```
 */
export function diracLevelEnergySI(n: number, j: number, z: number, nuclearMassKg: number): number {
  requireQuantumNumber("n", n);
  requireJ("j", j, n);
  requireNuclearCharge(z);
  return diracLevelEnergyUnchecked(n, j, z, requireNuclearMass(nuclearMassKg));
}

/** {@link diracLevelEnergySI} without the checks (n, j, Z and M valid). @internal */
export function diracLevelEnergyUnchecked(n: number, j: number, z: number, nuclearMassKg: number): number {
  return reducedMassUnchecked(nuclearMassKg) * C * C * diracFMinusOne(n, j, z);
}

/**
 * Statistical-weight centroid of the Dirac fine-structure levels of shell n:
 * Ē_n = Σ_j g_j E(n, j) / (2n²), with g_j = 2(2j + 1) for j < n − ½ (two
 * orbital l = j ± ½ states) and g_j = 2j + 1 = 2n for j = n − ½. J, negative.
 * This is the "level centre of gravity" of the shell; with it, a transition
 * energy Ē_up − Ē_low approximates the centroid of the unresolved multiplet.
 *
 * @example
 * ```ts
 * diracLevelCentroidEnergySI(3, 1, PROTON_MASS_KG);
 * ```
 */
export function diracLevelCentroidEnergySI(n: number, z: number, nuclearMassKg: number): number {
  requireQuantumNumber("n", n);
  requireNuclearCharge(z);
  return diracLevelCentroidEnergyUnchecked(n, z, requireNuclearMass(nuclearMassKg));
}

/** {@link diracLevelCentroidEnergySI} without the checks (n, Z and M valid). @internal */
export function diracLevelCentroidEnergyUnchecked(n: number, z: number, nuclearMassKg: number): number {
  const mc2 = reducedMassUnchecked(nuclearMassKg) * C * C;
  return mc2 * diracCentroidFMinusOne(n, z);
}

/** Shells up to this n are summed term by term (at most 16 384 terms); above it the closed form is used. */
export const DIRAC_CENTROID_SUM_MAX_N = 16384;

/**
 * Σ_j g_j (f(n, j) − 1) / (2n²), the weighted mean of f − 1 over the shell:
 * summed exactly for n ≤ {@link DIRAC_CENTROID_SUM_MAX_N}, and above it by
 * the closed form from the expansion of f − 1 to third order in ε = (Zα)²
 * (k = j + ½; δ = ε/(2k) + ε²/(8k³) + …; derived here, checked against the
 * exact sum in hydrogen-like.test.ts):
 *
 *   f − 1 = −ε/(2n²) − ε²/(2kn³) + 3ε²/(8n⁴)
 *           − ε³/(8k³n³) − 3ε³/(8k²n⁴) + 3ε³/(4kn⁵) − 5ε³/(16n⁶) + O(ε⁴),
 *
 * averaged with the weights w_k = g_k/(2n²) (g_k = 4k for k < n, 2n for
 * k = n, Σ w_k = 1), which needs S_p = Σ w_k/k^p:
 * S₁ = (2n − 1)/n², S₂ = (2H_{n−1} + 1/n)/n², S₃ = (2H⁽²⁾_{n−1} + 1/n²)/n²,
 * with the harmonic numbers H_{n−1} = ln n + γ − 1/(2n) − 1/(12n²) + …
 * and H⁽²⁾_{n−1} = π²/6 − 1/n − 1/(2n²) − 1/(6n³) + … (Euler–Maclaurin;
 * their next terms are below 1e-17 relative for n > 16 384). The
 * neglected O(ε⁴) terms are at most ≈ 4ε³/n³ relative to the leading
 * term: below 1e-12 for Zα < 1 and n > 16 384 (1e-26 for hydrogen).
 * Bounded work: at most 16 384 loop steps, otherwise a constant number.
 * @internal
 */
export function diracCentroidFMinusOne(n: number, z: number): number {
  return n <= DIRAC_CENTROID_SUM_MAX_N ? diracCentroidFMinusOneSum(n, z) : diracCentroidFMinusOneClosed(n, z);
}

/** The term-by-term sum of {@link diracCentroidFMinusOne} (n steps). @internal */
export function diracCentroidFMinusOneSum(n: number, z: number): number {
  let s = 0;
  for (let twoJ = 1; twoJ <= 2 * n - 1; twoJ += 2) {
    const j = twoJ / 2;
    const g = twoJ === 2 * n - 1 ? twoJ + 1 : 2 * (twoJ + 1);
    s += g * diracFMinusOne(n, j, z);
  }
  return s / (2 * n) / n;
}

/** The closed form of {@link diracCentroidFMinusOne} for large n (constant work). @internal */
export function diracCentroidFMinusOneClosed(n: number, z: number): number {
  const za = z * ALPHA;
  const e = za * za;
  const inv = 1 / n; // its powers underflow gracefully for huge n
  const inv2 = inv * inv;
  const h1 = Math.log(n) + EULER_GAMMA - inv / 2 - inv2 / 12;
  const h2 = (Math.PI * Math.PI) / 6 - inv - inv2 / 2 - (inv2 * inv) / 6;
  const s1 = (2 - inv) * inv; // S₁ = (2n − 1)/n²
  const s2 = (2 * h1 + inv) * inv2; // S₂
  const s3 = (2 * h2 + inv2) * inv2; // S₃
  // f − 1 = (ε/n²)·[−½ + ε(−S₁/(2n) + 3/(8n²)) + ε²(−S₃/(8n) − 3S₂/(8n²) + 3S₁/(4n³) − 5/(16n⁴))]
  const second = e * (-(s1 * inv) / 2 + (3 / 8) * inv2);
  const third = e * e * (-(s3 * inv) / 8 - (3 / 8) * s2 * inv2 + (3 / 4) * s1 * inv2 * inv - (5 / 16) * inv2 * inv2);
  return ((e * inv) * inv) * (-0.5 + second + third);
}

/** Euler–Mascheroni constant γ (from memory; 0.5772156649015329 to double precision). */
const EULER_GAMMA = 0.5772156649015329;
