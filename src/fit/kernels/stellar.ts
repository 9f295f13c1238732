/**
 * From a blackbody fit and a distance (or parallax) to radius, luminosity and
 * bolometric flux, with uncertainties that include the distance's AND the
 * fit's T–θ correlation.
 *
 * Relations (photometry/kernels/solver.ts): R = θ d / 2 (small angle),
 * L = 4π R² σ T⁴ = π θ² d² σ T⁴, f_bol = (θ/2)² σ T⁴. The values come from
 * `solveStarSI` with the three inputs T, θ and d (or p). That solver treats
 * its inputs as independent, but T and θ from a fit are correlated
 * (typically strongly and negatively: a hotter blackbody needs a smaller
 * disc for the same flux). Because the solver's model is linear in
 * logarithms, its first-order propagation is Cov(ln q) = G Cov(y) Gᵀ with a
 * constant 6 × 3 matrix G (`createStarBatchSolverSI(...).jacobian`) and
 * y = (ln T, ln θ, ln d); the solver computes G diag(σ²_y) Gᵀ, so we add the
 * missing off-diagonal term
 *
 *   ΔCov(ln qᵢ, ln qⱼ) = c (G_iT G_jθ + G_iθ G_jT),   c = Cov(ln T, ln θ) from the fit,
 *
 * which makes the result exact to first order for the full input covariance
 * (e.g. Var ln L = 16 σ²_lnT + 4 σ²_lnθ + 4 σ²_lnd + 16 c). The distance is
 * independent of the photometry. A_V's uncertainty is already inside
 * Cov(T, θ) (the fit's covariance is the full inverse, i.e. marginal over A_V).
 *
 * @internal
 */
import {
  createStarBatchSolverSI,
  solveStarSI,
  STAR_QUANTITIES,
  type DerivedQuantitySI,
  type MeasurementSI,
  type StarInputKindSI,
  type StarSolutionSI,
} from "../../photometry/kernels/solver";
import type { BlackbodyFitSI } from "./blackbody-fit";

/** The distance: exactly one of a distance (m) or a parallax (rad), each with σ > 0. */
export type DistanceInputSI =
  | { readonly distanceM: MeasurementSI; readonly parallaxRad?: undefined }
  | { readonly parallaxRad: MeasurementSI; readonly distanceM?: undefined };

/** Stellar parameters from a fit: the solver's solution with the T–θ correlation included. */
export interface StellarFromFitSI extends StarSolutionSI {
  /** Cov(ln T, ln θ) taken from the fit. */
  readonly lnTemperatureLnAngularDiameterCovariance: number;
}

/**
 * Radius, luminosity and bolometric flux (with the distance and temperature)
 * from a fit and a distance or parallax.
 *
 * @param fit - a blackbody fit (its T and θ, their σ and covariance)
 * @param distance - `{ distanceM: { value, sigma } }` or `{ parallaxRad: { value, sigma } }`
 * @returns the solver's solution (values, σ, 6 × 6 covariances in STAR_QUANTITIES order) with the correlation term added
 * @throws RangeError when the fit has no finite covariance, or for a bad distance/parallax (naming it)
 * @example
 * ```ts
 * const star = stellarParametersFromFitSI(fit, { parallaxRad: { value: 1e-8, sigma: 1e-10 } });
 * star.radiusM.value;
 * ```
 */
export function stellarParametersFromFitSI(fit: BlackbodyFitSI, distance: DistanceInputSI): StellarFromFitSI {
  const hasD = distance.distanceM !== undefined;
  const hasP = distance.parallaxRad !== undefined;
  if (hasD === hasP) throw new RangeError("distance must give exactly one of distanceM or parallaxRad");
  const lnCov = fit.lnCovariance;
  const vT = lnCov[0]?.[0] as number;
  const vTh = lnCov[1]?.[1] as number;
  const c = lnCov[0]?.[1] as number;
  if (!(vT > 0 && vTh > 0 && Number.isFinite(c))) {
    throw new RangeError("fit has no finite covariance of T and θ (tooFewBands: singular information matrix); stellar parameters would have no uncertainty");
  }
  const dKind: StarInputKindSI = hasD ? "distanceM" : "parallaxRad";
  const dMeas = (hasD ? distance.distanceM : distance.parallaxRad) as MeasurementSI;
  const sol = solveStarSI({
    temperatureK: { value: fit.temperatureK, sigma: fit.sigmaTemperatureK },
    angularDiameterRad: { value: fit.angularDiameterRad, sigma: fit.sigmaAngularDiameterRad },
    [dKind]: dMeas,
  });
  const kinds: readonly [StarInputKindSI, StarInputKindSI, StarInputKindSI] = ["temperatureK", "angularDiameterRad", dKind];
  const G = createStarBatchSolverSI(kinds).jacobian; // 6 × 3, rows in STAR_QUANTITIES order
  const nq = STAR_QUANTITIES.length;
  const lnCovariance = sol.lnCovariance.map((row, i) =>
    row.map((v, j) => v + c * ((G[3 * i] as number) * (G[3 * j + 1] as number) + (G[3 * i + 1] as number) * (G[3 * j] as number))),
  );
  const values = STAR_QUANTITIES.map((q) => sol[q].value);
  const covariance = lnCovariance.map((row, i) => row.map((v, j) => (values[i] as number) * (values[j] as number) * v));
  const rel = (i: number): number => Math.sqrt(lnCovariance[i]?.[i] as number);
  const upd = (d: DerivedQuantitySI, r: number, absolute: boolean): DerivedQuantitySI => ({
    value: d.value,
    sigma: absolute ? r : Math.abs(d.value) * r,
    relativeSigma: r,
    measured: d.measured,
  });
  const magPerLn = 2.5 / Math.LN10;
  if (lnCovariance.length !== nq) throw new RangeError("internal: unexpected solver covariance size");
  return {
    ...sol,
    temperatureK: upd(sol.temperatureK, rel(0), false),
    luminosityW: upd(sol.luminosityW, rel(1), false),
    radiusM: upd(sol.radiusM, rel(2), false),
    distanceM: upd(sol.distanceM, rel(3), false),
    bolometricFluxWm2: upd(sol.bolometricFluxWm2, rel(4), false),
    angularDiameterRad: upd(sol.angularDiameterRad, rel(5), false),
    parallaxRad: upd(sol.parallaxRad, rel(3), false),
    apparentBolometricMag: { ...sol.apparentBolometricMag, sigma: rel(4) * magPerLn, relativeSigma: rel(4) * magPerLn },
    absoluteBolometricMag: { ...sol.absoluteBolometricMag, sigma: rel(1) * magPerLn, relativeSigma: rel(1) * magPerLn },
    lnCovariance,
    covariance,
    lnTemperatureLnAngularDiameterCovariance: c,
  };
}
