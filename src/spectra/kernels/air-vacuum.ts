/**
 * Conversion between vacuum and standard-air wavelengths.
 *
 * Formula implemented: Edlén (1966), "The refractive index of air",
 * Metrologia 2, 71, for standard dry air (15 °C, 101 325 Pa, 0.03 % CO₂):
 *
 *   n − 1 = 1e-8 [8342.13 + 2 406 030/(130 − σ²) + 15 997/(38.9 − σ²)],
 *
 * σ = 1/λ_vac in µm⁻¹ (vacuum wavenumber). This is the form used for the
 * IAU standard-air convention by Morton (1991, ApJS 77, 119; 2000, ApJS 130,
 * 403), the successor of the Edlén (1953) formula the IAU adopted in
 * 1957 (Trans. IAU 9, 1957). Between 200 nm and 20 µm the two formulae differ
 * by less than 1.4e-8 in n − 1, i.e. < 1.4e-8 relative in wavelength
 * (computed when this module was written; e.g. 0.009 pm at Hα).
 *
 * Validity range chosen here: air wavelengths 200 nm ≤ λ_air ≤ 20 µm (and the
 * corresponding vacuum wavelengths). Edlén's fit is to measurements between
 * ~0.2 and ~2 µm; the formula's poles lie at 87.7 nm and 160 nm and it is
 * smooth beyond 2 µm, where dry-air dispersion is weak (n − 1 changes by only
 * 3.7e-7 from 2 to 20 µm), so the extrapolation to 20 µm is the common
 * practice of infrared line lists; beyond that the omitted CO₂ 15 µm band and
 * water vapour make any dry-air formula questionable. Outside the range:
 * RangeError (scalar) or NaN + reported row (batch).
 *
 * vacuum → air is direct: λ_air = λ_vac / n(λ_vac). air → vacuum solves
 * λ_vac / n(λ_vac) = λ_air by Newton's method (analytic derivative, start
 * λ_vac = λ_air n(λ_air)), iterated until the update is below 1e-15
 * relative — round trips agree to ≤ 1e-14 relative, well inside the 1e-10
 * required.
 *
 * @packageDocumentation
 */

import { show } from "../../internal/checks";
import { BatchLog, type BatchResult } from "../../law/batch";
import { requireOutputLength } from "./batch";

/** Shortest air wavelength accepted, m (200 nm). */
export const AIR_WAVELENGTH_MIN_M = 200e-9;
/** Longest air wavelength accepted, m (20 µm). */
export const AIR_WAVELENGTH_MAX_M = 20e-6;

/** n − 1 of standard air (Edlén 1966) at vacuum wavelength λ (m). Unchecked. */
function refractivity(vacuumWavelengthM: number): number {
  const s = 1e-6 / vacuumWavelengthM; // σ in µm^-1
  const s2 = s * s;
  return 1e-8 * (8342.13 + 2406030 / (130 - s2) + 15997 / (38.9 - s2));
}

/** d(λ/n)/dλ at vacuum wavelength λ (m). Unchecked. */
function derivativeAirOverVacuum(vacuumWavelengthM: number): number {
  const s = 1e-6 / vacuumWavelengthM;
  const s2 = s * s;
  const n = 1 + 1e-8 * (8342.13 + 2406030 / (130 - s2) + 15997 / (38.9 - s2));
  // dn/d(σ²) = 1e-8 [B/(130 − σ²)² + C/(38.9 − σ²)²]; dσ²/dλ = −2σ²/λ
  const dnds2 = 1e-8 * (2406030 / ((130 - s2) * (130 - s2)) + 15997 / ((38.9 - s2) * (38.9 - s2)));
  const dndl = (dnds2 * -2 * s2) / vacuumWavelengthM;
  return 1 / n - (vacuumWavelengthM * dndl) / (n * n);
}

function solveVacuum(airWavelengthM: number): number {
  let v = airWavelengthM * (1 + refractivity(airWavelengthM));
  for (let i = 0; i < 20; i++) {
    const g = v / (1 + refractivity(v)) - airWavelengthM;
    const dv = g / derivativeAirOverVacuum(v);
    v -= dv;
    if (Math.abs(dv) <= 1e-15 * v) break;
  }
  return v;
}

/** Shortest vacuum wavelength accepted, m: the vacuum wavelength of 200 nm in air. */
export const VACUUM_WAVELENGTH_MIN_M = solveVacuum(AIR_WAVELENGTH_MIN_M);
/** Longest vacuum wavelength accepted, m: the vacuum wavelength of 20 µm in air. */
export const VACUUM_WAVELENGTH_MAX_M = solveVacuum(AIR_WAVELENGTH_MAX_M);

function vacuumRangeReason(vacuumWavelengthM: number): string {
  return `vacuumWavelengthM must be in [${VACUUM_WAVELENGTH_MIN_M}, ${VACUUM_WAVELENGTH_MAX_M}] m (standard-air formula range, 200 nm to 20 µm in air); got ${show(vacuumWavelengthM)}`;
}

function airRangeReason(airWavelengthM: number): string {
  return `airWavelengthM must be in [${AIR_WAVELENGTH_MIN_M}, ${AIR_WAVELENGTH_MAX_M}] m (standard-air formula range); got ${show(airWavelengthM)}`;
}

function requireVacuum(vacuumWavelengthM: number): void {
  if (!(vacuumWavelengthM >= VACUUM_WAVELENGTH_MIN_M && vacuumWavelengthM <= VACUUM_WAVELENGTH_MAX_M)) {
    throw new RangeError(vacuumRangeReason(vacuumWavelengthM));
  }
}

function requireAir(airWavelengthM: number): void {
  if (!(airWavelengthM >= AIR_WAVELENGTH_MIN_M && airWavelengthM <= AIR_WAVELENGTH_MAX_M)) {
    throw new RangeError(airRangeReason(airWavelengthM));
  }
}

/**
 * Refractive index of standard air at a vacuum wavelength, Edlén (1966)
 * (module header). Dimensionless, ≈ 1.000 276 at 656 nm.
 *
 * @param vacuumWavelengthM vacuum wavelength, m (range: module header)
 * @example
 * ```ts
 * airRefractiveIndexSI(656.4614e-9); // ≈ 1.000276
 * ```
 */
export function airRefractiveIndexSI(vacuumWavelengthM: number): number {
  requireVacuum(vacuumWavelengthM);
  return airRefractiveIndexUnchecked(vacuumWavelengthM);
}

/** {@link airRefractiveIndexSI} without the range check (λ in range assumed). @internal */
export function airRefractiveIndexUnchecked(vacuumWavelengthM: number): number {
  return 1 + refractivity(vacuumWavelengthM);
}

/**
 * Standard-air wavelength from a vacuum wavelength, λ_air = λ_vac / n(λ_vac),
 * m (Edlén 1966; module header).
 *
 * @example
 * ```ts
 * vacuumToAirWavelengthSI(656.4614e-9); // Hα: ≈ 656.2801e-9 m
 * ```
 */
export function vacuumToAirWavelengthSI(vacuumWavelengthM: number): number {
  requireVacuum(vacuumWavelengthM);
  return vacuumToAirWavelengthUnchecked(vacuumWavelengthM);
}

/** {@link vacuumToAirWavelengthSI} without the range check (λ in range assumed). @internal */
export function vacuumToAirWavelengthUnchecked(vacuumWavelengthM: number): number {
  return vacuumWavelengthM / (1 + refractivity(vacuumWavelengthM));
}

/**
 * Vacuum wavelength from a standard-air wavelength: the solution of
 * λ_vac / n(λ_vac) = λ_air by Newton's method (Edlén 1966; module header), m.
 *
 * @example
 * ```ts
 * airToVacuumWavelengthSI(656.2801e-9); // Hα: ≈ 656.4614e-9 m
 * ```
 */
export function airToVacuumWavelengthSI(airWavelengthM: number): number {
  requireAir(airWavelengthM);
  return solveVacuum(airWavelengthM);
}

/** {@link airToVacuumWavelengthSI} without the range check (λ in range assumed). @internal */
export function airToVacuumWavelengthUnchecked(airWavelengthM: number): number {
  return solveVacuum(airWavelengthM);
}

/**
 * Batch vacuum → air over a Float64Array (batch.ts convention: invalid or
 * out-of-range rows become NaN and are reported with their reasons).
 *
 * @example
 * ```ts
 * const out = new Float64Array(2);
 * vacuumToAirWavelengthsSI(Float64Array.of(500e-9, 1e-9), out); // { values: out, invalid: [1], reasons: ["vacuumWavelengthM must be in …; got 1e-9"] }
 * ```
 */
export function vacuumToAirWavelengthsSI(vacuumWavelengthsM: Float64Array, out: Float64Array): BatchResult<Float64Array> {
  requireOutputLength(vacuumWavelengthsM, out);
  const log = new BatchLog();
  for (let i = 0; i < vacuumWavelengthsM.length; i++) {
    const v = vacuumWavelengthsM[i] as number;
    if (v >= VACUUM_WAVELENGTH_MIN_M && v <= VACUUM_WAVELENGTH_MAX_M) {
      out[i] = v / (1 + refractivity(v));
    } else {
      out[i] = NaN;
      log.add(i, vacuumRangeReason(v));
    }
  }
  return log.result(out);
}

/**
 * Batch air → vacuum over a Float64Array (batch.ts convention).
 *
 * @example
 * ```ts
 * const out = new Float64Array(1);
 * airToVacuumWavelengthsSI(Float64Array.of(589.1583e-9), out); // Na D2
 * ```
 */
export function airToVacuumWavelengthsSI(airWavelengthsM: Float64Array, out: Float64Array): BatchResult<Float64Array> {
  requireOutputLength(airWavelengthsM, out);
  const log = new BatchLog();
  for (let i = 0; i < airWavelengthsM.length; i++) {
    const a = airWavelengthsM[i] as number;
    if (a >= AIR_WAVELENGTH_MIN_M && a <= AIR_WAVELENGTH_MAX_M) {
      out[i] = solveVacuum(a);
    } else {
      out[i] = NaN;
      log.add(i, airRangeReason(a));
    }
  }
  return log.result(out);
}
