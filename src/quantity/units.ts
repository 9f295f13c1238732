/**
 * The unit catalogue. Sizes come from `src/values/constants.ts` (CODATA 2018,
 * IAU 2012 B2, IAU 2015 B2/B3) or are exact by definition.
 *
 * @module
 */
import * as V from "../values/constants";
import { kinds } from "./aliases";
import { defineUnit, type Unit } from "./unit";

const k = kinds;
const deg = Math.PI / 180;

/**
 * Every built-in unit, by an ASCII key. Symbols (for parsing and printing)
 * follow SI and IAU usage: `units.angstrom.symbol` is `"Å"`,
 * `units.Rsun.symbol` is `"R☉"`.
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
  /** Metre (m), the SI base unit of length. SI prefixes are accepted in parsed text (`km`, `nm`, …). */
  m: defineUnit("m", "metre", k.length.dimension, 1, 0, true),
  /** Centimetre (cm) = 1e-2 m, the CGS base unit of length. */
  cm: defineUnit("cm", "centimetre", k.length.dimension, 1, -2),
  /** Millimetre (mm) = 1e-3 m. */
  mm: defineUnit("mm", "millimetre", k.length.dimension, 1, -3),
  /** Kilometre (km) = 1e3 m. */
  km: defineUnit("km", "kilometre", k.length.dimension, 1, 3),
  /** Micrometre (symbol `µm`; `um` and Greek `μm` also parse) = 1e-6 m. */
  um: defineUnit("µm", "micrometre", k.length.dimension, 1, -6),
  /** Nanometre (nm) = 1e-9 m. */
  nm: defineUnit("nm", "nanometre", k.length.dimension, 1, -9),
  /** Ångström (symbol `Å`; `A` and `angstrom` also parse) = 1e-10 m. */
  angstrom: defineUnit("Å", "ångström", k.length.dimension, 1, -10),
  /** Astronomical unit (au) = 149 597 870 700 m exactly (IAU 2012 B2). */
  au: defineUnit("au", "astronomical unit", k.length.dimension, V.AU),
  /** Parsec (pc) = (648 000/π) au ≈ 3.085 677 6e16 m (IAU 2015 B2). SI prefixes are accepted in parsed text. */
  pc: defineUnit("pc", "parsec", k.length.dimension, V.PARSEC, 0, true),
  /** Kiloparsec (kpc) = 1e3 pc ≈ 3.085 677 6e19 m. */
  kpc: defineUnit("kpc", "kiloparsec", k.length.dimension, V.PARSEC, 3),
  /** Megaparsec (Mpc) = 1e6 pc ≈ 3.085 677 6e22 m. */
  Mpc: defineUnit("Mpc", "megaparsec", k.length.dimension, V.PARSEC, 6),
  /** Light-year (ly) = c × 1 Julian year = 9 460 730 472 580 800 m exactly (IAU). */
  ly: defineUnit("ly", "light-year", k.length.dimension, V.LIGHT_YEAR),
  /** Nominal solar radius R☉ᴺ (symbol `R☉`; `Rsun` also parses) = 6.957e8 m (IAU 2015 B3). */
  Rsun: defineUnit("R☉", "nominal solar radius", k.length.dimension, V.R_SUN),
  /** Nominal equatorial Earth radius R⊕ᴺ (symbol `R⊕`; `REarth` also parses) = 6.3781e6 m (IAU 2015 B3). */
  REarth: defineUnit("R⊕", "nominal equatorial Earth radius", k.length.dimension, V.R_EARTH_EQ),
  /** Nominal equatorial Jupiter radius RJᴺ (symbol `RJ`; `RJupiter` also parses) = 7.1492e7 m (IAU 2015 B3). */
  RJupiter: defineUnit("RJ", "nominal equatorial Jupiter radius", k.length.dimension, V.R_JUPITER_EQ),
  // mass
  /** Kilogram (kg), the SI base unit of mass. */
  kg: defineUnit("kg", "kilogram", k.mass.dimension, 1),
  /** Gram (g) = 1e-3 kg, the CGS base unit of mass. SI prefixes are accepted in parsed text (`mg`, `kg`, …). */
  g: defineUnit("g", "gram", k.mass.dimension, 1, -3, true),
  /** Solar mass (symbol `M☉`; `Msun` also parses) = (GM)☉ᴺ / G ≈ 1.988 41e30 kg (IAU 2015 B3 with CODATA 2018 G; relative uncertainty 2.2e-5 from G). */
  Msun: defineUnit("M☉", "solar mass", k.mass.dimension, V.M_SUN),
  /** Earth mass (symbol `M⊕`; `MEarth` also parses) = (GM)⊕ᴺ / G ≈ 5.972 17e24 kg (IAU 2015 B3 with CODATA 2018 G; relative uncertainty 2.2e-5 from G). */
  MEarth: defineUnit("M⊕", "Earth mass", k.mass.dimension, V.GM_EARTH / V.G),
  /** Jupiter mass (symbol `MJ`; `MJupiter` also parses) = (GM)Jᴺ / G ≈ 1.898 12e27 kg (IAU 2015 B3 with CODATA 2018 G; relative uncertainty 2.2e-5 from G). */
  MJupiter: defineUnit("MJ", "Jupiter mass", k.mass.dimension, V.GM_JUPITER / V.G),
  // time
  /** Second (s), the base unit of time in both systems. SI prefixes are accepted in parsed text (`ms`, `µs`, …). */
  s: defineUnit("s", "second", k.time.dimension, 1, 0, true),
  /** Minute (min) = 60 s. */
  min: defineUnit("min", "minute", k.time.dimension, 60),
  /** Hour (h) = 3600 s. */
  h: defineUnit("h", "hour", k.time.dimension, 3600),
  /** Day (symbol `d`) = 86 400 s. */
  day: defineUnit("d", "day", k.time.dimension, V.DAY),
  /** Julian year (symbol `a`; `yr` also parses) = 365.25 d = 31 557 600 s (IAU). SI prefixes are accepted in parsed text (`Ga`, `Myr`, …). */
  yr: defineUnit("a", "Julian year", k.time.dimension, V.JULIAN_YEAR, 0, true),
  // frequency
  /** Hertz (Hz) = 1 s⁻¹, frequency in both systems. SI prefixes are accepted in parsed text. */
  Hz: defineUnit("Hz", "hertz", k.frequency.dimension, 1, 0, true),
  /** Kilohertz (kHz) = 1e3 Hz. */
  kHz: defineUnit("kHz", "kilohertz", k.frequency.dimension, 1, 3),
  /** Megahertz (MHz) = 1e6 Hz. */
  MHz: defineUnit("MHz", "megahertz", k.frequency.dimension, 1, 6),
  /** Gigahertz (GHz) = 1e9 Hz. */
  GHz: defineUnit("GHz", "gigahertz", k.frequency.dimension, 1, 9),
  /** Terahertz (THz) = 1e12 Hz. */
  THz: defineUnit("THz", "terahertz", k.frequency.dimension, 1, 12),
  // temperature, amount
  /** Kelvin (K), thermodynamic temperature in both systems. SI prefixes are accepted in parsed text. */
  K: defineUnit("K", "kelvin", k.temperature.dimension, 1, 0, true),
  /** Mole (mol), amount of substance in both systems. SI prefixes are accepted in parsed text. */
  mol: defineUnit("mol", "mole", k.amount.dimension, 1, 0, true),
  // energy
  /** Joule (J), the SI unit of energy. SI prefixes are accepted in parsed text. */
  J: defineUnit("J", "joule", k.energy.dimension, 1, 0, true),
  /** Erg (erg) = 1e-7 J, the CGS unit of energy. */
  erg: defineUnit("erg", "erg", k.energy.dimension, 1, -7),
  /** Electronvolt (eV) = 1.602 176 634e-19 J exactly (SI 2019). SI prefixes are accepted in parsed text. */
  eV: defineUnit("eV", "electronvolt", k.energy.dimension, V.EV, 0, true),
  /** Kiloelectronvolt (keV) = 1e3 eV. */
  keV: defineUnit("keV", "kiloelectronvolt", k.energy.dimension, V.EV, 3),
  /** Megaelectronvolt (MeV) = 1e6 eV. */
  MeV: defineUnit("MeV", "megaelectronvolt", k.energy.dimension, V.EV, 6),
  // power
  /** Watt (W) = 1 J s⁻¹, the SI unit of power. SI prefixes are accepted in parsed text. */
  W: defineUnit("W", "watt", k.power.dimension, 1, 0, true),
  /** Erg per second (erg s⁻¹) = 1e-7 W, the CGS unit of power. */
  erg_per_s: defineUnit("erg s^-1", "erg per second", k.power.dimension, 1, -7),
  /** Nominal solar luminosity L☉ᴺ (symbol `L☉`; `Lsun` also parses) = 3.828e26 W (IAU 2015 B3). */
  Lsun: defineUnit("L☉", "nominal solar luminosity", k.power.dimension, V.L_SUN),
  // force
  /** Newton (N) = 1 kg m s⁻², the SI unit of force. SI prefixes are accepted in parsed text. */
  N: defineUnit("N", "newton", k.force.dimension, 1, 0, true),
  /** Dyne (dyn) = 1 g cm s⁻² = 1e-5 N, the CGS unit of force. */
  dyn: defineUnit("dyn", "dyne", k.force.dimension, 1, -5),
  // spectral flux density
  /** Jansky (Jy) = 1e-26 W m⁻² Hz⁻¹ = 1e-23 erg s⁻¹ cm⁻² Hz⁻¹, spectral flux density per frequency. SI prefixes are accepted in parsed text. */
  Jy: defineUnit("Jy", "jansky", k.spectralFluxPerFrequency.dimension, 1, -26, true),
  /** Millijansky (mJy) = 1e-29 W m⁻² Hz⁻¹. */
  mJy: defineUnit("mJy", "millijansky", k.spectralFluxPerFrequency.dimension, 1, -29),
  /** Microjansky (symbol `µJy`; `uJy` and Greek `μJy` also parse) = 1e-32 W m⁻² Hz⁻¹. */
  uJy: defineUnit("µJy", "microjansky", k.spectralFluxPerFrequency.dimension, 1, -32),
  // angle
  /** Radian (rad), plane angle in both systems (a dimension of its own here). SI prefixes are accepted in parsed text. */
  rad: defineUnit("rad", "radian", k.angle.dimension, 1, 0, true),
  /** Degree (deg; `°` also parses) = π/180 rad. */
  deg: defineUnit("deg", "degree", k.angle.dimension, deg),
  /** Arcminute (arcmin; `′` also parses) = 1/60 deg. */
  arcmin: defineUnit("arcmin", "arcminute", k.angle.dimension, deg / 60),
  /** Arcsecond (arcsec; `″` also parses) = 1/3600 deg ≈ 4.848 14e-6 rad. */
  arcsec: defineUnit("arcsec", "arcsecond", k.angle.dimension, deg / 3600),
  /** Milliarcsecond (mas) = 1e-3 arcsec. */
  mas: defineUnit("mas", "milliarcsecond", k.angle.dimension, deg / 3600, -3),
  /** Microarcsecond (symbol `µas`; `uas` and Greek `μas` also parse) = 1e-6 arcsec. */
  uas: defineUnit("µas", "microarcsecond", k.angle.dimension, deg / 3600, -6),
  // solid angle
  /** Steradian (sr), solid angle in both systems (a dimension of its own here). SI prefixes are accepted in parsed text. */
  sr: defineUnit("sr", "steradian", k.solidAngle.dimension, 1, 0, true),
  /** Square degree (sqdeg) = (π/180)² sr. */
  sqdeg: defineUnit("sqdeg", "square degree", k.solidAngle.dimension, deg * deg),
  /** Square arcminute (sqarcmin) = (π/10 800)² sr. */
  sqarcmin: defineUnit("sqarcmin", "square arcminute", k.solidAngle.dimension, (deg / 60) ** 2),
  /** Square arcsecond (sqarcsec) = (π/648 000)² sr. */
  sqarcsec: defineUnit("sqarcsec", "square arcsecond", k.solidAngle.dimension, (deg / 3600) ** 2),
  // handy compounds
  /** Square metre (m²), SI area. */
  m2: defineUnit("m^2", "square metre", k.area.dimension, 1),
  /** Square centimetre (cm²) = 1e-4 m², CGS area. */
  cm2: defineUnit("cm^2", "square centimetre", k.area.dimension, 1, -4),
  /** Metre per second (m s⁻¹), SI velocity. */
  m_per_s: defineUnit("m s^-1", "metre per second", k.velocity.dimension, 1),
  /** Kilometre per second (km s⁻¹) = 1e3 m s⁻¹. */
  km_per_s: defineUnit("km s^-1", "kilometre per second", k.velocity.dimension, 1, 3),
  /** Per centimetre (cm⁻¹) = 100 m⁻¹, the CGS (spectroscopic) wavenumber unit. */
  per_cm: defineUnit("cm^-1", "per centimetre", k.wavenumber.dimension, 1, 2),
  /** Per metre (m⁻¹), SI wavenumber. */
  per_m: defineUnit("m^-1", "per metre", k.wavenumber.dimension, 1),
  /** Watt per square metre (W m⁻²), SI flux (irradiance). */
  W_per_m2: defineUnit("W m^-2", "watt per square metre", k.flux.dimension, 1),
  /** Erg per second per square centimetre (erg s⁻¹ cm⁻²) = 1e-3 W m⁻², CGS flux. */
  erg_per_s_cm2: defineUnit("erg s^-1 cm^-2", "erg per second per square centimetre", k.flux.dimension, 1, -3),
  /** Watt per square metre per steradian per nanometre (W m⁻² sr⁻¹ nm⁻¹) = 1e9 W m⁻² sr⁻¹ m⁻¹, spectral radiance per wavelength. */
  W_per_m2_sr_nm: defineUnit("W m^-2 sr^-1 nm^-1", "watt per square metre per steradian per nanometre", k.spectralRadiancePerWavelength.dimension, 1, 9),
  /** Erg per second per square centimetre per ångström (erg s⁻¹ cm⁻² Å⁻¹) = 1e7 W m⁻³ = 1e8 erg s⁻¹ cm⁻³, spectral flux density per wavelength. */
  erg_per_s_cm2_A: defineUnit("erg s^-1 cm^-2 Å^-1", "erg per second per square centimetre per ångström", k.spectralFluxPerWavelength.dimension, 1, 7),
  /** Watt per square metre per hertz (W m⁻² Hz⁻¹) = 1e26 Jy, SI spectral flux density per frequency. */
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
  Rsun: "Rsun",
  REarth: "REarth",
  RJupiter: "RJupiter",
  Msun: "Msun",
  MEarth: "MEarth",
  MJupiter: "MJupiter",
  Lsun: "Lsun",
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
