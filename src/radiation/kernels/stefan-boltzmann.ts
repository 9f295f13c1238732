/**
 * Stefan–Boltzmann law and its photon-count analogue.
 *
 * Energy: M = σT⁴, σ = 2π⁵k⁴/(15h³c²) (CODATA 2018 value from `values.ts`).
 * Photons: the photon exitance is π∫N_ν dν = (2π/c²)(kT/h)³ ∫₀^∞ t²/(eᵗ−1) dt
 * = (2π/c²)(kT/h)³ Γ(3)ζ(3), so M_γ = σ_γ T³ with
 * σ_γ = 4π ζ(3) k³/(h³c²) ≈ 1.5205e15 photons s^-1 m^-2 K^-3.
 * ζ(3) (Apéry's constant) is computed here from Apéry's series
 * ζ(3) = (5/2) Σ_{k≥1} (−1)^{k+1} / (k³ C(2k, k)) (R. Apéry, Astérisque 61, 11, 1979).
 *
 * Products are formed directly when every intermediate stays a normal double
 * and otherwise in logarithms, so no finite input gives NaN or Infinity; a
 * result that truly exceeds the double range throws a RangeError (the
 * `…Unchecked` cores, for callers that have checked their inputs, return
 * +Infinity there instead).
 * Source: J. Stefan (1879), L. Boltzmann (1884); IAU 2015 B3 for L = 4πR²σT⁴.
 */
import { C, H, K_B, SIGMA } from "../../values/constants";
import { requirePositive } from "../../internal/checks";
import { scaledPower2 } from "./scaled";

/** ζ(3) by Apéry's alternating series, summed smallest term first. */
function apery(): number {
  // C(2k,k) is an exact double for k ≤ 28 (C(56,28) ≈ 7.6e15 < 2^53); term 28 ≈ 6e-21.
  const terms: number[] = [];
  let binom = 1;
  for (let k = 1; k <= 28; k++) {
    binom = (binom * (2 * k) * (2 * k - 1)) / (k * k);
    terms.push((k % 2 === 1 ? 1 : -1) / (k * k * k * binom));
  }
  let s = 0;
  for (let i = terms.length - 1; i >= 0; i--) s += terms[i] as number;
  return 2.5 * s;
}

/** Apéry's constant ζ(3) = 1.2020569031595942…, computed (see module notes). */
export const ZETA3 = apery();

/** Photon Stefan–Boltzmann constant σ_γ = 4πζ(3)k³/(h³c²), photons s^-1 m^-2 K^-3. */
export const SIGMA_PHOTON = (4 * Math.PI * ZETA3 * (K_B / H) ** 3) / (C * C);

const FOUR_PI = 4 * Math.PI;
const SQRT_4PI_SIGMA = Math.sqrt(FOUR_PI * SIGMA);
const QRT_SIGMA = Math.sqrt(Math.sqrt(SIGMA));
const NORMAL_MIN = 2.2250738585072014e-308;

/** The checked kernels' RangeError for a true result beyond the double range. */
function overflow(what: string, args: string): RangeError {
  return new RangeError(`${what} overflows the double range for ${args}`);
}

function normal(v: number): boolean {
  return v >= NORMAL_MIN && v !== Infinity;
}

/** σT⁴ without input checks (T finite, > 0); +Infinity signals overflow. @internal */
export function stefanBoltzmannExitanceUnchecked(temperatureK: number): number {
  const t2 = temperatureK * temperatureK;
  const v = SIGMA * t2 * t2;
  if (normal(t2) && normal(v)) return v;
  return Math.exp(Math.log(SIGMA) + 4 * Math.log(temperatureK));
}

/** (M/σ)^¼ without input checks (M finite, > 0). @internal */
export function temperatureFromExitanceUnchecked(exitanceWm2: number): number {
  return Math.sqrt(Math.sqrt(exitanceWm2)) / QRT_SIGMA; // no overflow of M/σ for huge M
}

/** 4πR²σT⁴ without input checks; +Infinity signals overflow. @internal */
export function luminosityFromRadiusTemperatureUnchecked(radiusM: number, temperatureK: number): number {
  const rt2 = radiusM * temperatureK * temperatureK;
  const v = FOUR_PI * SIGMA * rt2 * rt2;
  if (normal(rt2) && normal(v)) return v;
  return Math.exp(Math.log(FOUR_PI * SIGMA) + 2 * Math.log(radiusM) + 4 * Math.log(temperatureK));
}

/** √(L/(4πσ))/T² without input checks; +Infinity signals overflow. @internal */
export function radiusFromLuminosityTemperatureUnchecked(luminosityW: number, temperatureK: number): number {
  const t2 = temperatureK * temperatureK;
  const v = Math.sqrt(luminosityW) / SQRT_4PI_SIGMA / t2;
  if (normal(t2) && normal(v)) return v;
  return Math.exp(0.5 * (Math.log(luminosityW) - Math.log(FOUR_PI * SIGMA)) - 2 * Math.log(temperatureK));
}

/** (L/(4πσR²))^¼ without input checks (never overflows). @internal */
export function temperatureFromLuminosityRadiusUnchecked(luminosityW: number, radiusM: number): number {
  const q = Math.sqrt(luminosityW) / SQRT_4PI_SIGMA / radiusM; // = T²
  if (normal(q)) return Math.sqrt(q);
  return Math.exp(0.25 * (Math.log(luminosityW) - Math.log(FOUR_PI * SIGMA)) - 0.5 * Math.log(radiusM));
}

/** σ_γT³ without input checks; +Infinity signals overflow. @internal */
export function photonExitanceUnchecked(temperatureK: number): number {
  const v = SIGMA_PHOTON * temperatureK * temperatureK * temperatureK;
  if (normal(v)) return v;
  return Math.exp(Math.log(SIGMA_PHOTON) + 3 * Math.log(temperatureK));
}

/** 4πR²σ_γT³ without input checks; +Infinity signals overflow. @internal */
export function photonEmissionRateUnchecked(radiusM: number, temperatureK: number): number {
  // 4πσ_γ·R²·T³ with no spurious under/overflow of R², T³ or their product
  return scaledPower2(FOUR_PI * SIGMA_PHOTON, radiusM, 2, temperatureK, 3);
}

/**
 * Blackbody exitance (power per unit area into a hemisphere), M = σT⁴.
 *
 * @param temperatureK - temperature T, K (finite, > 0)
 * @returns M, W m^-2
 * @throws RangeError for bad input or T ≳ 1e79 K (overflow)
 * Source: Stefan–Boltzmann law; CODATA 2018 σ.
 * @example
 * ```ts
 * stefanBoltzmannExitanceSI(5772); // ≈ 6.294e7 W m^-2
 * ```
 */
export function stefanBoltzmannExitanceSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  const v = stefanBoltzmannExitanceUnchecked(temperatureK);
  if (v === Infinity) throw overflow("exitance σT⁴", `temperature=${temperatureK} K`);
  return v;
}

/**
 * Temperature of a blackbody with the given exitance, T = (M/σ)^{1/4}.
 *
 * @param exitanceWm2 - M, W m^-2 (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * @example
 * ```ts
 * temperatureFromExitanceSI(6.294e7); // ≈ 5772 K
 * ```
 */
export function temperatureFromExitanceSI(exitanceWm2: number): number {
  requirePositive("exitance", exitanceWm2, "W m^-2");
  return temperatureFromExitanceUnchecked(exitanceWm2);
}

/**
 * Luminosity of a spherical blackbody, L = 4πR²σT⁴.
 *
 * @param radiusM - radius R, m (finite, > 0)
 * @param temperatureK - effective temperature T, K (finite, > 0)
 * @returns L, W
 * @throws RangeError for bad input or overflow
 * Source: Stefan–Boltzmann law; IAU 2015 Resolution B3 (defines T☉ through L☉ and R☉ this way).
 * @example
 * ```ts
 * luminosityFromRadiusTemperatureSI(6.957e8, 5772); // ≈ 3.828e26 W
 * ```
 */
export function luminosityFromRadiusTemperatureSI(radiusM: number, temperatureK: number): number {
  requirePositive("radius", radiusM, "m");
  requirePositive("temperature", temperatureK, "K");
  const v = luminosityFromRadiusTemperatureUnchecked(radiusM, temperatureK);
  if (v === Infinity) throw overflow("luminosity 4πR²σT⁴", `radius=${radiusM} m, temperature=${temperatureK} K`);
  return v;
}

/**
 * Radius of a spherical blackbody from its luminosity and temperature,
 * R = √(L/(4πσ)) / T².
 *
 * @param luminosityW - L, W (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns R, m
 * @throws RangeError for bad input or overflow
 * @example
 * ```ts
 * radiusFromLuminosityTemperatureSI(3.828e26, 5772); // ≈ 6.957e8 m
 * ```
 */
export function radiusFromLuminosityTemperatureSI(luminosityW: number, temperatureK: number): number {
  requirePositive("luminosity", luminosityW, "W");
  requirePositive("temperature", temperatureK, "K");
  const v = radiusFromLuminosityTemperatureUnchecked(luminosityW, temperatureK);
  if (v === Infinity) throw overflow("radius", `luminosity=${luminosityW} W, temperature=${temperatureK} K`);
  return v;
}

/**
 * Effective temperature of a spherical blackbody from its luminosity and
 * radius, T = (L/(4πσR²))^{1/4}.
 *
 * @param luminosityW - L, W (finite, > 0)
 * @param radiusM - R, m (finite, > 0)
 * @returns T, K
 * @throws RangeError for bad input
 * Source: IAU 2015 Resolution B3 (T☉ = 5772 K from L☉, R☉).
 * @example
 * ```ts
 * temperatureFromLuminosityRadiusSI(3.828e26, 6.957e8); // ≈ 5772 K
 * ```
 */
export function temperatureFromLuminosityRadiusSI(luminosityW: number, radiusM: number): number {
  requirePositive("luminosity", luminosityW, "W");
  requirePositive("radius", radiusM, "m");
  return temperatureFromLuminosityRadiusUnchecked(luminosityW, radiusM);
}

/**
 * Blackbody photon exitance (photons per unit time and area into a
 * hemisphere), M_γ = σ_γT³, σ_γ = 4πζ(3)k³/(h³c²).
 *
 * @param temperatureK - T, K (finite, > 0)
 * @returns photons s^-1 m^-2
 * @throws RangeError for bad input or overflow
 * Source: Planck's law integrated over frequency (see module notes).
 * @example
 * ```ts
 * photonExitanceSI(2.7255); // ≈ 3.08e16 photons s^-1 m^-2 (CMB)
 * ```
 */
export function photonExitanceSI(temperatureK: number): number {
  requirePositive("temperature", temperatureK, "K");
  const v = photonExitanceUnchecked(temperatureK);
  if (v === Infinity) throw overflow("photon exitance", `temperature=${temperatureK} K`);
  return v;
}

/**
 * Photon emission rate of a spherical blackbody, Ṅ = 4πR²σ_γT³.
 *
 * @param radiusM - R, m (finite, > 0)
 * @param temperatureK - T, K (finite, > 0)
 * @returns photons s^-1
 * @throws RangeError for bad input or overflow
 * @example
 * ```ts
 * photonEmissionRateSI(6.957e8, 5772);
 * ```
 */
export function photonEmissionRateSI(radiusM: number, temperatureK: number): number {
  requirePositive("radius", radiusM, "m");
  requirePositive("temperature", temperatureK, "K");
  const v = photonEmissionRateUnchecked(radiusM, temperatureK);
  if (v === Infinity) throw overflow("photon emission rate", `radius=${radiusM} m, temperature=${temperatureK} K`);
  return v;
}
