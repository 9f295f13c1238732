/**
 * Doppler shifts of spectral lines.
 *
 * Relativistic longitudinal (radial) Doppler effect, source receding at
 * radial velocity v (β = v/c, positive = receding = redshift):
 *   λ_obs = λ_emit √((1 + β)/(1 − β)),  i.e. 1 + z = e^{atanh β},
 * so z = expm1(atanh β) is evaluated without cancellation for small β.
 * Inverse: z = (λ_obs − λ_emit)/λ_emit, then
 *   β = ((1 + z)² − 1)/((1 + z)² + 1) = z(2 + z)/(2 + z(2 + z)),
 * which has no cancellation for small z.
 * Classical (first-order) Doppler: λ_obs = λ_emit (1 + v/c), v = cz.
 * Standard special relativity (e.g. Rybicki & Lightman 1979, §4.8);
 * transverse motion and gravitational redshift are not included.
 *
 * Velocities must satisfy |v| < c (RangeError otherwise); wavelengths must be
 * finite and > 0. Batch functions follow batch.ts.
 *
 * @packageDocumentation
 */

import { C } from "../../values/constants";
import { requireFinite, requirePositive, show } from "../../internal/checks";
import { BatchLog, type BatchResult } from "../../law/batch";
import { requireOutputLength } from "./batch";

function requireSubluminal(name: string, vMs: number): number {
  if (!(Math.abs(vMs) < C)) {
    throw new RangeError(`${name} must be a finite number with |${name}| < c = ${C} m s^-1; got ${show(vMs)}`);
  }
  return vMs;
}

/**
 * Relativistic redshift from radial velocity, z = √((1+β)/(1−β)) − 1,
 * computed as expm1(atanh β). Dimensionless; v in m s⁻¹, |v| < c.
 *
 * @example
 * ```ts
 * redshiftFromRadialVelocitySI(0.6 * 299792458); // 1
 * ```
 */
export function redshiftFromRadialVelocitySI(radialVelocityMs: number): number {
  requireSubluminal("radialVelocityMs", radialVelocityMs);
  return redshiftFromVelocityUnchecked(radialVelocityMs);
}

/** {@link redshiftFromRadialVelocitySI} without the input check (|v| < c assumed). @internal */
export function redshiftFromVelocityUnchecked(radialVelocityMs: number): number {
  return Math.expm1(Math.atanh(radialVelocityMs / C));
}

/**
 * Radial velocity from relativistic redshift,
 * v = c z(2 + z)/(2 + z(2 + z)), m s⁻¹. z must be finite and > −1.
 *
 * @example
 * ```ts
 * radialVelocityFromRedshiftSI(1); // 0.6 c
 * ```
 */
export function radialVelocityFromRedshiftSI(redshift: number): number {
  requireFinite("redshift", redshift, "(dimensionless)");
  if (!(redshift > -1)) {
    throw new RangeError(`redshift must be a finite number > -1 (dimensionless); got ${show(redshift)}`);
  }
  return velocityFromRedshiftUnchecked(redshift);
}

/** {@link radialVelocityFromRedshiftSI} without the input check (z finite, > −1 assumed). @internal */
export function velocityFromRedshiftUnchecked(redshift: number): number {
  const q = redshift * (2 + redshift);
  return (C * q) / (2 + q);
}

/**
 * Redshift from observed and rest (emitted) wavelengths,
 * z = (λ_obs − λ_emit)/λ_emit. Dimensionless; wavelengths in m, > 0.
 *
 * @example
 * ```ts
 * redshiftFromWavelengthsSI(660e-9, 600e-9); // 0.1
 * ```
 */
export function redshiftFromWavelengthsSI(observedWavelengthM: number, restWavelengthM: number): number {
  requirePositive("observedWavelengthM", observedWavelengthM, "m");
  requirePositive("restWavelengthM", restWavelengthM, "m");
  return redshiftFromWavelengthsUnchecked(observedWavelengthM, restWavelengthM);
}

/** {@link redshiftFromWavelengthsSI} without the input checks (both finite, > 0 assumed). @internal */
export function redshiftFromWavelengthsUnchecked(observedWavelengthM: number, restWavelengthM: number): number {
  return (observedWavelengthM - restWavelengthM) / restWavelengthM;
}

/**
 * Observed wavelength from rest wavelength and redshift, λ_obs = λ_emit (1 + z), m.
 *
 * @example
 * ```ts
 * observedWavelengthFromRedshiftSI(121.567e-9, 3); // 486.268e-9 m
 * ```
 */
export function observedWavelengthFromRedshiftSI(restWavelengthM: number, redshift: number): number {
  requirePositive("restWavelengthM", restWavelengthM, "m");
  requireFinite("redshift", redshift, "(dimensionless)");
  if (!(redshift > -1)) {
    throw new RangeError(`redshift must be a finite number > -1 (dimensionless); got ${show(redshift)}`);
  }
  return observedWavelengthFromRedshiftUnchecked(restWavelengthM, redshift);
}

/** {@link observedWavelengthFromRedshiftSI} without the input checks. @internal */
export function observedWavelengthFromRedshiftUnchecked(restWavelengthM: number, redshift: number): number {
  return restWavelengthM * (1 + redshift);
}

/**
 * Relativistic longitudinal Doppler: observed wavelength
 * λ_obs = λ_emit √((1+β)/(1−β)), m (v > 0 receding).
 *
 * @param restWavelengthM emitted wavelength, m (> 0)
 * @param radialVelocityMs radial velocity, m s⁻¹ (|v| < c)
 * @example
 * ```ts
 * relativisticDopplerWavelengthSI(656.28e-9, 3e5); // +0.657 nm
 * ```
 */
export function relativisticDopplerWavelengthSI(restWavelengthM: number, radialVelocityMs: number): number {
  requirePositive("restWavelengthM", restWavelengthM, "m");
  requireSubluminal("radialVelocityMs", radialVelocityMs);
  return relativisticDopplerWavelengthUnchecked(restWavelengthM, radialVelocityMs);
}

/** {@link relativisticDopplerWavelengthSI} without the input checks (λ finite, > 0; |v| < c assumed). @internal */
export function relativisticDopplerWavelengthUnchecked(restWavelengthM: number, radialVelocityMs: number): number {
  const z = Math.expm1(Math.atanh(radialVelocityMs / C));
  return restWavelengthM + restWavelengthM * z;
}

/**
 * Radial velocity from observed and rest wavelengths (relativistic
 * longitudinal Doppler inverted): z = (λ_obs − λ_emit)/λ_emit,
 * v = c z(2 + z)/(2 + z(2 + z)), m s⁻¹ (positive = receding).
 *
 * @example
 * ```ts
 * radialVelocityFromWavelengthsSI(656.28e-9 * 1.001, 656.28e-9); // ≈ 299 642 m/s
 * ```
 */
export function radialVelocityFromWavelengthsSI(observedWavelengthM: number, restWavelengthM: number): number {
  requirePositive("observedWavelengthM", observedWavelengthM, "m");
  requirePositive("restWavelengthM", restWavelengthM, "m");
  return radialVelocityFromWavelengthsUnchecked(observedWavelengthM, restWavelengthM);
}

/** {@link radialVelocityFromWavelengthsSI} without the input checks. @internal */
export function radialVelocityFromWavelengthsUnchecked(observedWavelengthM: number, restWavelengthM: number): number {
  return velocityFromRedshiftUnchecked(redshiftFromWavelengthsUnchecked(observedWavelengthM, restWavelengthM));
}

/**
 * Classical (first-order) Doppler shift, λ_obs = λ_emit (1 + v/c), m.
 * Accurate to O(β²) against the relativistic formula.
 *
 * @example
 * ```ts
 * classicalDopplerWavelengthSI(500e-9, 299792.458); // 500.5e-9 m
 * ```
 */
export function classicalDopplerWavelengthSI(restWavelengthM: number, radialVelocityMs: number): number {
  requirePositive("restWavelengthM", restWavelengthM, "m");
  requireSubluminal("radialVelocityMs", radialVelocityMs);
  return classicalDopplerWavelengthUnchecked(restWavelengthM, radialVelocityMs);
}

/** {@link classicalDopplerWavelengthSI} without the input checks. @internal */
export function classicalDopplerWavelengthUnchecked(restWavelengthM: number, radialVelocityMs: number): number {
  return restWavelengthM * (1 + radialVelocityMs / C);
}

/**
 * Classical radial velocity, v = c (λ_obs − λ_emit)/λ_emit, m s⁻¹.
 *
 * @example
 * ```ts
 * classicalVelocityFromWavelengthsSI(500.5e-9, 500e-9); // 299 792.458 m/s
 * ```
 */
export function classicalVelocityFromWavelengthsSI(observedWavelengthM: number, restWavelengthM: number): number {
  return C * redshiftFromWavelengthsSI(observedWavelengthM, restWavelengthM);
}

/** {@link classicalVelocityFromWavelengthsSI} without the input checks. @internal */
export function classicalVelocityFromWavelengthsUnchecked(observedWavelengthM: number, restWavelengthM: number): number {
  return C * redshiftFromWavelengthsUnchecked(observedWavelengthM, restWavelengthM);
}

/**
 * Shift a whole line list by one radial velocity (relativistic),
 * out[i] = rest[i] √((1+β)/(1−β)). The velocity is checked once (RangeError
 * for |v| ≥ c); rows with a non-positive or non-finite wavelength become NaN
 * and are reported (batch.ts). `out` may be the input array.
 *
 * @example
 * ```ts
 * const lines = Float64Array.of(656.28e-9, 486.13e-9);
 * dopplerShiftWavelengthsSI(lines, 1e5, lines); // in place, { invalid: [] }
 * ```
 */
export function dopplerShiftWavelengthsSI(
  restWavelengthsM: Float64Array,
  radialVelocityMs: number,
  out: Float64Array,
): BatchResult<Float64Array> {
  requireSubluminal("radialVelocityMs", radialVelocityMs);
  requireOutputLength(restWavelengthsM, out);
  const z = Math.expm1(Math.atanh(radialVelocityMs / C));
  const log = new BatchLog();
  for (let i = 0; i < restWavelengthsM.length; i++) {
    const l = restWavelengthsM[i] as number;
    if (l > 0 && l !== Infinity) {
      out[i] = l + l * z;
    } else {
      out[i] = NaN;
      log.add(i, `restWavelengthM must be a finite number > 0 m; got ${show(l)}`);
    }
  }
  return log.result(out);
}
