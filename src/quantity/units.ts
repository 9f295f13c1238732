/**
 * The unit catalogue. Sizes come from `src/constants/values.ts` (CODATA 2018,
 * IAU 2012 B2, IAU 2015 B2/B3) or are exact by definition.
 *
 * @module
 */
import * as V from "../constants/values";
import { kinds } from "./aliases";
import { defineUnit, type Unit } from "./unit";

const k = kinds;
const deg = Math.PI / 180;

/**
 * Every built-in unit, by an ASCII key. Symbols (for parsing and printing)
 * follow SI and IAU usage: `units.angstrom.symbol` is `"Å"`,
 * `units.Rsol.symbol` is `"R☉"`.
 *
 * Solar, terrestrial and jovian radii are the IAU 2015 B3 nominal
 * *equatorial* values (R⊕ = 6.3781e6 m, RJ = 7.1492e7 m); the solar mass is
 * (GM)☉ᴺ / G (CODATA 2018 G), so it carries G's relative uncertainty 2.2e-5.
 *
 * @example
 * ```ts
 * import { SI, CGS, units } from "starlume";
 * const lambda = CGS.of(5000, units.angstrom); // 5e-5 (centimetres)
 * SI.valueIn(SI.of(1, units.pc), units.ly); // ≈ 3.2616
 * ```
 */
export const units = Object.freeze({
  // length
  m: defineUnit("m", "metre", k.length.dimension, 1, 0, true),
  cm: defineUnit("cm", "centimetre", k.length.dimension, 1, -2),
  mm: defineUnit("mm", "millimetre", k.length.dimension, 1, -3),
  km: defineUnit("km", "kilometre", k.length.dimension, 1, 3),
  um: defineUnit("µm", "micrometre", k.length.dimension, 1, -6),
  nm: defineUnit("nm", "nanometre", k.length.dimension, 1, -9),
  angstrom: defineUnit("Å", "ångström", k.length.dimension, 1, -10),
  au: defineUnit("au", "astronomical unit", k.length.dimension, V.AU),
  pc: defineUnit("pc", "parsec", k.length.dimension, V.PARSEC, 0, true),
  kpc: defineUnit("kpc", "kiloparsec", k.length.dimension, V.PARSEC, 3),
  Mpc: defineUnit("Mpc", "megaparsec", k.length.dimension, V.PARSEC, 6),
  ly: defineUnit("ly", "light-year", k.length.dimension, V.LIGHT_YEAR),
  Rsol: defineUnit("R☉", "nominal solar radius", k.length.dimension, V.R_SUN),
  Rterra: defineUnit("R⊕", "nominal equatorial Earth radius", k.length.dimension, V.R_EARTH_EQ),
  Rjove: defineUnit("RJ", "nominal equatorial Jupiter radius", k.length.dimension, V.R_JUPITER_EQ),
  // mass
  kg: defineUnit("kg", "kilogram", k.mass.dimension, 1),
  g: defineUnit("g", "gram", k.mass.dimension, 1, -3, true),
  Msol: defineUnit("M☉", "solar mass", k.mass.dimension, V.M_SUN),
  Mterra: defineUnit("M⊕", "Earth mass", k.mass.dimension, V.GM_EARTH / V.G),
  Mjove: defineUnit("MJ", "Jupiter mass", k.mass.dimension, V.GM_JUPITER / V.G),
  // time
  s: defineUnit("s", "second", k.time.dimension, 1, 0, true),
  min: defineUnit("min", "minute", k.time.dimension, 60),
  h: defineUnit("h", "hour", k.time.dimension, 3600),
  day: defineUnit("d", "day", k.time.dimension, V.DAY),
  yr: defineUnit("a", "Julian year", k.time.dimension, V.JULIAN_YEAR, 0, true),
  // frequency
  Hz: defineUnit("Hz", "hertz", k.frequency.dimension, 1, 0, true),
  kHz: defineUnit("kHz", "kilohertz", k.frequency.dimension, 1, 3),
  MHz: defineUnit("MHz", "megahertz", k.frequency.dimension, 1, 6),
  GHz: defineUnit("GHz", "gigahertz", k.frequency.dimension, 1, 9),
  THz: defineUnit("THz", "terahertz", k.frequency.dimension, 1, 12),
  // temperature, amount
  K: defineUnit("K", "kelvin", k.temperature.dimension, 1, 0, true),
  mol: defineUnit("mol", "mole", k.amount.dimension, 1, 0, true),
  // energy
  J: defineUnit("J", "joule", k.energy.dimension, 1, 0, true),
  erg: defineUnit("erg", "erg", k.energy.dimension, 1, -7),
  eV: defineUnit("eV", "electronvolt", k.energy.dimension, V.EV, 0, true),
  keV: defineUnit("keV", "kiloelectronvolt", k.energy.dimension, V.EV, 3),
  MeV: defineUnit("MeV", "megaelectronvolt", k.energy.dimension, V.EV, 6),
  // power
  W: defineUnit("W", "watt", k.power.dimension, 1, 0, true),
  erg_per_s: defineUnit("erg s^-1", "erg per second", k.power.dimension, 1, -7),
  Lsol: defineUnit("L☉", "nominal solar luminosity", k.power.dimension, V.L_SUN),
  // force
  N: defineUnit("N", "newton", k.force.dimension, 1, 0, true),
  dyn: defineUnit("dyn", "dyne", k.force.dimension, 1, -5),
  // spectral flux density
  Jy: defineUnit("Jy", "jansky", k.spectralFluxPerFrequency.dimension, 1, -26, true),
  mJy: defineUnit("mJy", "millijansky", k.spectralFluxPerFrequency.dimension, 1, -29),
  uJy: defineUnit("µJy", "microjansky", k.spectralFluxPerFrequency.dimension, 1, -32),
  // angle
  rad: defineUnit("rad", "radian", k.angle.dimension, 1, 0, true),
  deg: defineUnit("deg", "degree", k.angle.dimension, deg),
  arcmin: defineUnit("arcmin", "arcminute", k.angle.dimension, deg / 60),
  arcsec: defineUnit("arcsec", "arcsecond", k.angle.dimension, deg / 3600),
  mas: defineUnit("mas", "milliarcsecond", k.angle.dimension, deg / 3600, -3),
  uas: defineUnit("µas", "microarcsecond", k.angle.dimension, deg / 3600, -6),
  // solid angle
  sr: defineUnit("sr", "steradian", k.solidAngle.dimension, 1, 0, true),
  sqdeg: defineUnit("sqdeg", "square degree", k.solidAngle.dimension, deg * deg),
  sqarcmin: defineUnit("sqarcmin", "square arcminute", k.solidAngle.dimension, (deg / 60) ** 2),
  sqarcsec: defineUnit("sqarcsec", "square arcsecond", k.solidAngle.dimension, (deg / 3600) ** 2),
  // handy compounds
  m2: defineUnit("m^2", "square metre", k.area.dimension, 1),
  cm2: defineUnit("cm^2", "square centimetre", k.area.dimension, 1, -4),
  m_per_s: defineUnit("m s^-1", "metre per second", k.velocity.dimension, 1),
  km_per_s: defineUnit("km s^-1", "kilometre per second", k.velocity.dimension, 1, 3),
  per_cm: defineUnit("cm^-1", "per centimetre", k.wavenumber.dimension, 1, 2),
  per_m: defineUnit("m^-1", "per metre", k.wavenumber.dimension, 1),
  W_per_m2: defineUnit("W m^-2", "watt per square metre", k.flux.dimension, 1),
  erg_per_s_cm2: defineUnit("erg s^-1 cm^-2", "erg per second per square centimetre", k.flux.dimension, 1, -3),
  W_per_m2_sr_nm: defineUnit("W m^-2 sr^-1 nm^-1", "watt per square metre per steradian per nanometre", k.spectralRadiancePerWavelength.dimension, 1, 9),
  erg_per_s_cm2_A: defineUnit("erg s^-1 cm^-2 Å^-1", "erg per second per square centimetre per ångström", k.spectralFluxPerWavelength.dimension, 1, 7),
  W_per_m2_Hz: defineUnit("W m^-2 Hz^-1", "watt per square metre per hertz", k.spectralFluxPerFrequency.dimension, 1),
} as const);

/**
 * Extra spellings the parser accepts for built-in units (ASCII fallbacks and
 * Unicode variants). Keys are spellings, values the unit keys of {@link units}.
 */
export const unitAliases: Readonly<Record<string, keyof typeof units>> = {
  A: "angstrom",
  angstrom: "angstrom",
  "\u212B": "angstrom", // Å ANGSTROM SIGN
  um: "um",
  "μm": "um", // Greek mu
  Rsol: "Rsol",
  Rterra: "Rterra",
  Rjove: "Rjove",
  Msol: "Msol",
  Mterra: "Mterra",
  Mjove: "Mjove",
  Lsol: "Lsol",
  yr: "yr",
  "°": "deg",
  "′": "arcmin",
  "″": "arcsec",
  uas: "uas",
  "μas": "uas",
  uJy: "uJy",
  "μJy": "uJy",
};

/** Any built-in unit's key. */
export type UnitKey = keyof typeof units;

/** Type of the unit under a key. */
export type BuiltinUnit<K extends UnitKey> = (typeof units)[K];

/** Re-exported for convenience. */
export type { Unit };
