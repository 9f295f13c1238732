/**
 * The one place where the command-line tool calls the SED fitter
 * (src/fit): one star's photometry in, the fit and (with a distance or
 * parallax) radius and luminosity out, all in SI. Keeping the calls here
 * means a change of the fitter's API touches one file.
 *
 * @module
 */
import {
  createBlackbodyFitter,
  stellarParametersFromFit,
  type BlackbodyFit,
  type BandDatum,
  type BlackbodyFitOptions,
  type BlackbodyFitter,
  type StellarParameters,
} from "../fit/index";
import type { Angle, Length, SpectralFluxPerFrequency, SpectralFluxPerWavelength } from "../quantity/aliases";
import { SI } from "../quantity/system";
import type { CliBand } from "./bands";

/** One band's measurement for {@link fitStar}, in SI (W m⁻³, W m⁻² Hz⁻¹) or AB mag. */
export interface StarMeasurement {
  readonly band: CliBand;
  readonly kind: "flambda" | "fnu" | "abmag";
  readonly value: number;
  readonly sigma: number;
}

/** A distance or parallax in SI (m or rad) with its σ. */
export type StarDistance = { readonly kind: "distance" | "parallax"; readonly value: number; readonly sigma: number };

/** Settings of the fit (passed through to the fitter). */
export interface StarFitSettings {
  /** Fit CCM89 extinction A_V with this R_V; omit for no extinction. */
  readonly extinctionRV?: number;
}

/** What {@link fitStar} returns. */
export interface StarFitResult {
  readonly fit: BlackbodyFit<"SI">;
  /** Radius and luminosity, when a distance or parallax was given. */
  readonly stellar: StellarParameters<"SI"> | null;
}

/** Fits stars one by one, reusing one fitter per set of bands present (built on first use). */
export type StarFitter = (measurements: readonly StarMeasurement[], distance: StarDistance | null) => StarFitResult;

/**
 * A star fitter for a table: the typed fitter (weights, CCM89 ratios, work
 * arrays) is built once per set of bands present in a row and reused for
 * every later row with the same set, instead of once per row.
 *
 * @throws RangeError from the fitter (naming the observation) for invalid input, when called
 */
export function createStarFitter(settings: StarFitSettings): StarFitter {
  const options: BlackbodyFitOptions = settings.extinctionRV !== undefined ? { extinction: { rV: settings.extinctionRV } } : {};
  const cache = new Map<string, BlackbodyFitter<"SI">>();
  return (measurements, distance) => {
    const key = measurements.map((m) => m.band.name).join("\u0000");
    let fitter = cache.get(key);
    if (fitter === undefined) {
      fitter = createBlackbodyFitter(
        SI,
        measurements.map((m) => m.band.band),
        options,
      );
      cache.set(key, fitter);
    }
    const data: BandDatum<"SI">[] = measurements.map((m) => {
      switch (m.kind) {
        case "flambda":
          return { fluxPerWavelength: m.value as SpectralFluxPerWavelength<"SI">, sigma: m.sigma as SpectralFluxPerWavelength<"SI"> };
        case "fnu":
          return { fluxPerFrequency: m.value as SpectralFluxPerFrequency<"SI">, sigma: m.sigma as SpectralFluxPerFrequency<"SI"> };
        case "abmag":
          return { abMagnitude: m.value, sigma: m.sigma };
      }
    });
    const fit = fitter.fit(data);
    let stellar: StellarParameters<"SI"> | null = null;
    if (distance !== null) {
      stellar = stellarParametersFromFit(
        SI,
        fit,
        distance.kind === "distance"
          ? { distance: distance.value as Length<"SI">, sigma: distance.sigma as Length<"SI"> }
          : { parallax: distance.value as Angle, sigma: distance.sigma as Angle },
      );
    }
    return { fit, stellar };
  };
}

/**
 * Fit a blackbody to one star's bands with the typed fitter, then derive R
 * and L when a distance or parallax is given (a fresh fitter each call: use
 * {@link createStarFitter} for a table).
 *
 * @throws RangeError from the fitter (naming the observation) for invalid input
 */
export function fitStar(measurements: readonly StarMeasurement[], distance: StarDistance | null, settings: StarFitSettings): StarFitResult {
  return createStarFitter(settings)(measurements, distance);
}

/** The names of the fit's raised flags, e.g. `["poorFit"]`. */
export function raisedFlags(fit: BlackbodyFit<"SI">): string[] {
  return Object.entries(fit.flags)
    .filter(([, v]) => v === true)
    .map(([k]) => k);
}
