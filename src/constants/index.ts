/**
 * Constants, typed in SI and CGS, each with its uncertainty and source.
 *
 * - CODATA 2018: E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor,
 *   "CODATA recommended values of the fundamental physical constants: 2018",
 *   Rev. Mod. Phys. 93, 025010 (2021).
 * - IAU 2015 Resolution B3 (nominal solar and planetary conversion constants).
 * - IAU 2015 Resolution B2 (zero points of the bolometric magnitude scales; parsec).
 * - IAU 2012 Resolution B2 (astronomical unit).
 *
 * Constants derived from exact ones (σ, c₁, c₁L, c₂, f₀, pc, ly) are computed,
 * not typed in; the tests compare them with the published digits.
 *
 * @module
 */
import { kinds } from "../quantity/aliases";
import { defineConstant } from "./constant";
import * as V from "../values/constants";
import { WIEN_X_ENERGY_FREQUENCY, WIEN_X_ENERGY_WAVELENGTH } from "../values/wien-roots";

const CODATA = "CODATA 2018";
const k = kinds;

/**
 * Every constant starlume uses. `constants.X.si` and `constants.X.cgs` are
 * typed quantities; `.uncertaintySI`, `.exact` and `.source` give provenance.
 *
 * @example
 * ```ts
 * import { constants, CGS, units } from "starlume";
 * const sigma = constants.sigma.cgs; // 5.670374419e-5 erg s^-1 cm^-2 K^-4
 * CGS.valueIn(constants.Lsun.cgs, units.erg_per_s); // 3.828e33
 * ```
 */
export const constants = {
  // CODATA 2018 exact defining constants
  /** Planck constant (exact). */
  h: defineConstant("h", "Planck constant", k.action.dimension, V.H, "J s", CODATA),
  /** Reduced Planck constant h/2π (exact). */
  hbar: defineConstant("ħ", "reduced Planck constant", k.action.dimension, V.HBAR, "J s", CODATA),
  /** Speed of light in vacuum (exact). */
  c: defineConstant("c", "speed of light in vacuum", k.velocity.dimension, V.C, "m s^-1", CODATA),
  /** Boltzmann constant (exact). */
  kB: defineConstant("k", "Boltzmann constant", k.heatCapacity.dimension, V.K_B, "J K^-1", CODATA),
  /** Avogadro constant (exact). */
  NA: defineConstant("N_A", "Avogadro constant", k.perAmount.dimension, V.N_A, "mol^-1", CODATA),
  /** Molar gas constant N_A k (exact). */
  R: defineConstant("R", "molar gas constant", k.molarHeatCapacity.dimension, V.R_GAS, "J mol^-1 K^-1", CODATA),
  /** Electronvolt (exact): the energy e × 1 V. */
  eV: defineConstant("eV", "electron volt", k.energy.dimension, V.EV, "J", CODATA),
  /** Stefan–Boltzmann constant 2π⁵k⁴/(15h³c²) (exact). */
  sigma: defineConstant("σ", "Stefan–Boltzmann constant", k.fluxPerTemperature4.dimension, V.SIGMA, "W m^-2 K^-4", CODATA),
  /** First radiation constant 2πhc² (exact). */
  c1: defineConstant("c₁", "first radiation constant", k.powerArea.dimension, V.C1, "W m^2", CODATA),
  /** First radiation constant for spectral radiance 2hc² (exact; per steradian). */
  c1L: defineConstant("c₁L", "first radiation constant for spectral radiance", k.powerAreaPerSolidAngle.dimension, V.C1L, "W m^2 sr^-1", CODATA),
  /** Second radiation constant hc/k (exact). */
  c2: defineConstant("c₂", "second radiation constant", k.lengthTemperature.dimension, V.C2, "m K", CODATA),
  /** Wien wavelength displacement law constant b = c₂ / x₅ (exact; x₅ solves x = 5(1 − e⁻ˣ)). */
  wienB: defineConstant("b", "Wien wavelength displacement law constant", k.lengthTemperature.dimension, V.C2 / WIEN_X_ENERGY_WAVELENGTH, "m K", CODATA),
  /** Wien frequency displacement law constant b′ = x₃ k / h (exact; x₃ solves x = 3(1 − e⁻ˣ)). */
  wienBPrime: defineConstant("b′", "Wien frequency displacement law constant", k.frequencyPerTemperature.dimension, (WIEN_X_ENERGY_FREQUENCY * V.K_B) / V.H, "Hz K^-1", CODATA),
  // CODATA 2018 measured constants
  /** Newtonian constant of gravitation. */
  G: defineConstant("G", "Newtonian constant of gravitation", k.gravitationalConstant.dimension, V.G, "m^3 kg^-1 s^-2", CODATA, V.G_UNC),
  /** Fine-structure constant. */
  alpha: defineConstant("α", "fine-structure constant", k.dimensionless.dimension, V.ALPHA, "", CODATA, V.ALPHA_UNC),
  /** Rydberg constant R∞. */
  Rinf: defineConstant("R∞", "Rydberg constant", k.wavenumber.dimension, V.RYDBERG, "m^-1", CODATA, V.RYDBERG_UNC),
  /** Electron mass. */
  me: defineConstant("m_e", "electron mass", k.mass.dimension, V.M_E, "kg", CODATA, V.M_E_UNC),
  /** Proton mass. */
  mp: defineConstant("m_p", "proton mass", k.mass.dimension, V.M_P, "kg", CODATA, V.M_P_UNC),
  /** Atomic mass constant. */
  mu: defineConstant("m_u", "atomic mass constant", k.mass.dimension, V.M_U, "kg", CODATA, V.M_U_UNC),
  // IAU
  /** Astronomical unit (exact; IAU 2012 B2). */
  au: defineConstant("au", "astronomical unit", k.length.dimension, V.AU, "m", "IAU 2012 Resolution B2"),
  /** Parsec: (648000/π) au (exact; IAU 2015 B2). */
  pc: defineConstant("pc", "parsec", k.length.dimension, V.PARSEC, "m", "IAU 2015 Resolution B2"),
  /** Light-year: c × Julian year (exact; IAU). */
  ly: defineConstant("ly", "light-year", k.length.dimension, V.LIGHT_YEAR, "m", "IAU (Julian year of 365.25 d)"),
  /** Julian year: 365.25 × 86400 s (exact; IAU). */
  yr: defineConstant("a", "Julian year", k.time.dimension, V.JULIAN_YEAR, "s", "IAU"),
  /** Jansky: 10⁻²⁶ W m⁻² Hz⁻¹ (exact). */
  Jy: defineConstant("Jy", "jansky", k.spectralFluxPerFrequency.dimension, V.JANSKY, "W m^-2 Hz^-1", "IAU (definition of the jansky)"),
  /** Zero point of the absolute bolometric magnitude scale L₀ (exact; IAU 2015 B2). */
  L0: defineConstant("L₀", "zero point luminosity", k.power.dimension, V.L0, "W", "IAU 2015 Resolution B2"),
  /** Zero point of the apparent bolometric magnitude scale f₀ = L₀/(4π (10 pc)²) (exact; IAU 2015 B2). */
  f0: defineConstant("f₀", "zero point irradiance", k.flux.dimension, V.F0, "W m^-2", "IAU 2015 Resolution B2"),
  /** Nominal solar radius (exact; IAU 2015 B3). */
  Rsun: defineConstant("R☉ᴺ", "nominal solar radius", k.length.dimension, V.R_SUN, "m", "IAU 2015 Resolution B3"),
  /** Nominal total solar irradiance (exact; IAU 2015 B3). */
  Ssun: defineConstant("S☉ᴺ", "nominal total solar irradiance", k.flux.dimension, V.S_SUN, "W m^-2", "IAU 2015 Resolution B3"),
  /** Nominal solar luminosity (exact; IAU 2015 B3). */
  Lsun: defineConstant("L☉ᴺ", "nominal solar luminosity", k.power.dimension, V.L_SUN, "W", "IAU 2015 Resolution B3"),
  /** Nominal solar effective temperature (exact; IAU 2015 B3). */
  Tsun: defineConstant("T☉effᴺ", "nominal solar effective temperature", k.temperature.dimension, V.T_SUN, "K", "IAU 2015 Resolution B3"),
  /** Nominal solar mass parameter (exact; IAU 2015 B3). */
  GMsun: defineConstant("(GM)☉ᴺ", "nominal solar mass parameter", k.gravitationalParameter.dimension, V.GM_SUN, "m^3 s^-2", "IAU 2015 Resolution B3"),
  /** Solar mass (GM)☉ᴺ/G; uncertainty from G (CODATA 2018). */
  Msun: defineConstant("M☉", "solar mass", k.mass.dimension, V.M_SUN, "kg", "IAU 2015 Resolution B3 with CODATA 2018 G", (V.M_SUN * V.G_UNC) / V.G),
  /** Nominal equatorial Earth radius (exact; IAU 2015 B3). */
  REarthEq: defineConstant("R⊕eᴺ", "nominal equatorial Earth radius", k.length.dimension, V.R_EARTH_EQ, "m", "IAU 2015 Resolution B3"),
  /** Nominal polar Earth radius (exact; IAU 2015 B3). */
  REarthPolar: defineConstant("R⊕pᴺ", "nominal polar Earth radius", k.length.dimension, V.R_EARTH_POLAR, "m", "IAU 2015 Resolution B3"),
  /** Nominal equatorial Jupiter radius (exact; IAU 2015 B3). */
  RJupiterEq: defineConstant("RJeᴺ", "nominal equatorial Jupiter radius", k.length.dimension, V.R_JUPITER_EQ, "m", "IAU 2015 Resolution B3"),
  /** Nominal polar Jupiter radius (exact; IAU 2015 B3). */
  RJupiterPolar: defineConstant("RJpᴺ", "nominal polar Jupiter radius", k.length.dimension, V.R_JUPITER_POLAR, "m", "IAU 2015 Resolution B3"),
  /** Nominal terrestrial mass parameter (exact; IAU 2015 B3). */
  GMEarth: defineConstant("(GM)⊕ᴺ", "nominal terrestrial mass parameter", k.gravitationalParameter.dimension, V.GM_EARTH, "m^3 s^-2", "IAU 2015 Resolution B3"),
  /** Nominal jovian mass parameter (exact; IAU 2015 B3). */
  GMJupiter: defineConstant("(GM)Jᴺ", "nominal jovian mass parameter", k.gravitationalParameter.dimension, V.GM_JUPITER, "m^3 s^-2", "IAU 2015 Resolution B3"),
} as const;

export type { Constant } from "./constant";
