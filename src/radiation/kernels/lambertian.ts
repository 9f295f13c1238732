/**
 * Lambertian (isotropic) emitter: hemispherical exitance M = π L from the
 * radiance L, and back. Works for any spectral density (per m, per Hz, per
 * m^-1) or for band-integrated quantities, since the conversion is only the
 * solid-angle integral ∫_hemisphere cos θ dΩ = π sr.
 * Source: Lambert, Photometria (1760); e.g. Rybicki & Lightman,
 * Radiative Processes in Astrophysics (1979), §1.3.
 */
import { requireNonNegative } from "../../internal/checks";

/**
 * Exitance (flux per unit area leaving a surface) of a Lambertian emitter,
 * M = π L.
 *
 * @param radiance - radiance L, W m^-2 sr^-1 (or spectral: ... per m / per Hz) (finite, ≥ 0)
 * @returns exitance M, W m^-2 (or spectral, same density as the input)
 * @throws RangeError for negative or non-finite input
 * @example
 * ```ts
 * const m = lambertianExitanceFromRadianceSI(planckRadianceWavelengthSI(5e-7, 5772));
 * ```
 */
export function lambertianExitanceFromRadianceSI(radiance: number): number {
  requireNonNegative("radiance", radiance, "W m^-2 sr^-1 (per spectral unit)");
  return Math.PI * radiance;
}

/**
 * Radiance of a Lambertian emitter from its exitance, L = M / π.
 *
 * @param exitance - exitance M, W m^-2 (or spectral) (finite, ≥ 0)
 * @returns radiance L, W m^-2 sr^-1 (or spectral)
 * @throws RangeError for negative or non-finite input
 * @example
 * ```ts
 * const l = radianceFromLambertianExitanceSI(6.3e7);
 * ```
 */
export function radianceFromLambertianExitanceSI(exitance: number): number {
  requireNonNegative("exitance", exitance, "W m^-2 (per spectral unit)");
  return exitance / Math.PI;
}
