/**
 * The unit spellings the parser reads beyond the catalogue's own symbols and
 * aliases: the symbols of the open standards (FITS Standard 4.0 §4.3,
 * IVOA VOUnits 1.0 and the FITS, OGIP and CDS conventions it describes) and
 * the spellings astronomers write daily in table headers.
 *
 * Which standard lists which symbol is written from the standards' text where
 * it was at hand and otherwise from memory of it (marked so); symbols the
 * standards define for quantities starlume has no dimension for (the ampere,
 * the tesla, counts, pixels, bits) are refused with a message instead.
 *
 * @module
 * @internal
 */
import { kinds } from "./aliases";
import { defineUnit, type Unit } from "./unit";
import { units } from "./units";

const u = units;

/**
 * Magnitude (`mag`), a pure number of size 1, prefixable (`mmag`). A
 * magnitude is a logarithm, not a scale: the parser reads it only on its own
 * (optionally prefixed), never in a product, quotient, power or after a
 * scale factor. The number it gives is the magnitude as written; the
 * photometric system is not part of the unit. Not in the catalogue
 * `units` on purpose (the catalogue holds scales).
 */
export const magnitude: Unit = defineUnit("mag", "magnitude", kinds.dimensionless.dimension, 1, 0, true);

/** An AB magnitude (`mag_AB`; `ABmag` and `AB` also read): like {@link magnitude}, with the system kept in the symbol and name. */
export const magnitudeAB: Unit = defineUnit("mag_AB", "AB magnitude", kinds.dimensionless.dimension, 1);

/**
 * Symbols the standards define, with starlume's unit for each. Prefixes on
 * them are handled by the parser (on the catalogue's prefixable units).
 * `A` is absent on purpose: the standards define it as the ampere.
 */
export const standardSymbols: ReadonlyMap<string, Unit> = new Map<string, Unit>([
  ["m", u.m], ["g", u.g], ["s", u.s], ["K", u.K], ["mol", u.mol], ["rad", u.rad], ["sr", u.sr],
  ["Hz", u.Hz], ["J", u.J], ["W", u.W], ["N", u.N], ["Jy", u.Jy], ["eV", u.eV], ["erg", u.erg],
  ["dyn", u.dyn], ["deg", u.deg], ["arcmin", u.arcmin], ["arcsec", u.arcsec], ["mas", u.mas],
  ["min", u.min], ["h", u.h], ["d", u.day], ["a", u.yr], ["yr", u.yr], ["pc", u.pc],
  // FITS 4.0 Table 5 writes AU, VOUnits 1.0 writes au (IAU 2012): both read
  ["AU", u.au], ["au", u.au],
  ["Angstrom", u.angstrom], ["angstrom", u.angstrom],
  ["solMass", u.Msun], ["solRad", u.Rsun], ["solLum", u.Lsun],
  // light year: FITS writes lyr (from memory)
  ["lyr", u.ly],
  ["mag", magnitude],
  // CDS writes the Sun's units Msun, Rsun, Lsun (from memory of the CDS list)
  ["Msun", u.Msun], ["Rsun", u.Rsun], ["Lsun", u.Lsun],
]);

/**
 * Daily spellings (common practice in published table headers and in
 * papers), read in the default (`"any"`) syntax only.
 */
export const dailySpellings: ReadonlyMap<string, Unit> = new Map<string, Unit>([
  ["Lsun", u.Lsun], ["Rsun", u.Rsun], ["Msun", u.Msun],
  ["L_sun", u.Lsun], ["R_sun", u.Rsun], ["M_sun", u.Msun],
  ["Lsolar", u.Lsun], ["Rsolar", u.Rsun], ["Msolar", u.Msun],
  ["L_☉", u.Lsun], ["R_☉", u.Rsun], ["M_☉", u.Msun],
  ["Angstroms", u.angstrom], ["angstroms", u.angstrom], ["AA", u.angstrom], ["Ang", u.angstrom],
  ["micron", u.um], ["microns", u.um],
  ["ergs", u.erg], ["kelvin", u.K], ["Kelvin", u.K],
  ["degree", u.deg], ["degrees", u.deg],
  ["arcsecond", u.arcsec], ["arcseconds", u.arcsec], ["arcminute", u.arcmin], ["arcminutes", u.arcmin],
  ["milliarcsec", u.mas], ["milliarcsecond", u.mas], ["milliarcseconds", u.mas],
  ["microarcsec", u.uas],
  ["sec", u.s], ["second", u.s], ["seconds", u.s],
  ["hr", u.h], ["hour", u.h], ["hours", u.h], ["day", u.day], ["days", u.day],
  ["year", u.yr], ["years", u.yr], ["yrs", u.yr],
  ["metre", u.m], ["meter", u.m], ["metres", u.m], ["meters", u.m],
  ["parsec", u.pc], ["parsecs", u.pc], ["ly", u.ly],
  ["jansky", u.Jy], ["hertz", u.Hz], ["joule", u.J], ["watt", u.W], ["radian", u.rad], ["steradian", u.sr],
  ["mags", magnitude], ["mag_AB", magnitudeAB], ["ABmag", magnitudeAB], ["AB", magnitudeAB],
]);

/**
 * Spellings the standards define for quantities starlume has no dimension
 * or no unit for; the parser names them in its refusal.
 */
export const foreignSymbols: ReadonlyMap<string, string> = new Map([
  ...["ct", "count", "counts", "ph", "photon", "photons", "pix", "pixel", "pixels", "beam", "bit", "byte", "chan", "adu", "ADU", "DN", "voxel", "electron", "Sun"].map(
    (s) => [s, "a count, not a physical unit: leave the unit empty for a pure number"] as const,
  ),
  ...["C", "V", "T", "G", "Wb", "Ohm", "ohm", "F", "S", "Gauss", "gauss", "D", "Debye"].map(
    (s) => [s, "an electromagnetic unit: starlume has no electric current dimension"] as const,
  ),
  ...["Pa", "bar", "Ba", "barn", "b", "Ry", "u", "Da", "lm", "lx", "cd", "Bq", "Gy", "Sv", "kat", "l", "L"].map(
    (s) => [s, "not in starlume's unit catalogue: write it in the base units it stands for"] as const,
  ),
  ...["dex", "dB"].map((s) => [s, "a logarithmic unit: give the column no unit (a pure number)"] as const),
]);
