/**
 * A corpus of unit spellings, each with the dimension and SI size it must
 * parse to. Where each spelling comes from (the `src` column):
 *
 * - `fits`: written in the syntax of the FITS Standard 4.0 §4.3 (products by
 *   space or ".", powers as `cm-2`, `cm^-2` or `cm**-2`, scale `10^k`/`10±k`,
 *   symbols of its tables, e.g. `Angstrom`, `AU`, `solMass`, `lyr`);
 * - `vou`: IVOA VOUnits 1.0 syntax (products by ".", powers `**`, no spaces);
 * - `cds`: the CDS catalogue convention as VOUnits 1.0 describes it
 *   (products by ".", powers written after the symbol, `10-7` scale factors);
 * - `ogip`: the OGIP 93-001 convention as VOUnits 1.0 describes it (products
 *   by space or `*`, powers `**`);
 * - `sl`: starlume's own grammar before this change (must keep reading);
 * - `daily`: spellings seen in published table headers and papers (common
 *   practice; written from memory, not quoted from any one source).
 *
 * The standard-syntax spellings are constructed in each standard's syntax
 * (from memory of the standards' text), not quoted verbatim. Expected SI
 * sizes are written from the unit definitions by hand (erg = 1e-7 J,
 * Å = 1e-10 m, au = 149 597 870 700 m exactly (IAU 2012 B2), pc = (648 000/π)
 * au (IAU 2015 B2), L☉ = 3.828e26 W and R☉ = 6.957e8 m (IAU 2015 B3 nominal),
 * M☉ = (GM)☉ / G with (GM)☉ = 1.3271244e20 m³ s⁻² (IAU 2015 B3) and
 * G = 6.67430e-11 (CODATA 2018), Julian year = 31 557 600 s (IAU)).
 * Tolerance 1e-14 relative: at most a few roundings of double arithmetic in
 * both the parser and the expectation.
 */
import { describe, expect, test } from "vitest";
import { describeDimension } from "./dimension";
import { ParseError, parseUnit, type UnitSyntax } from "./parse";

type Src = "fits" | "vou" | "cds" | "ogip" | "sl" | "daily";
interface Entry {
  text: string;
  dim: string;
  factor: number;
  /** Every source the spelling is listed under (a spelling valid in two standards is listed once with both). */
  src: Src[];
}

const corpus: Entry[] = [];
/** One concept (dimension and size) in several spellings, each tagged with its source. */
function c(dim: string, factor: number, ...spellings: [Src, string][]): void {
  for (const [src, text] of spellings) {
    const seen = corpus.find((e) => e.text === text);
    if (seen === undefined) corpus.push({ text, dim, factor, src: [src] });
    else if (seen.dim !== dim || seen.factor !== factor) throw new Error(`corpus lists ${text} twice with different meanings`);
    else seen.src.push(src);
  }
}

const erg = 1e-7;
const cm = 1e-2;
const A = 1e-10;
const au = 149597870700;
const pc = (648000 / Math.PI) * au;
const Lsun = 3.828e26;
const Rsun = 6.957e8;
const Msun = 1.3271244e20 / 6.6743e-11;
const yr = 31557600;
const deg = Math.PI / 180;
const mas = deg / 3600e3;

// spectral flux density per wavelength, CGS per ångström
c("L-1 M T-3", erg / cm ** 2 / A,
  ["sl", "erg s^-1 cm^-2 Å^-1"], ["sl", "erg s^-1 cm^-2 A^-1"], ["sl", "erg/s/cm^2/Å"], ["sl", "erg·s⁻¹·cm⁻²·Å⁻¹"], ["sl", "erg s⁻¹ cm⁻² Å⁻¹"],
  ["fits", "erg s-1 cm-2 Angstrom-1"], ["fits", "erg/s/cm2/Angstrom"], ["fits", "erg s^-1 cm^-2 Angstrom^-1"], ["fits", "erg/(s cm2 Angstrom)"],
  ["fits", "erg.s-1.cm-2.Angstrom-1"], ["cds", "erg.s-1.cm-2.Angstrom-1"], ["vou", "erg.s**-1.cm**-2.Angstrom**-1"], ["vou", "erg/s/cm**2/Angstrom"],
  ["ogip", "erg s**-1 cm**-2 Angstrom**-1"], ["ogip", "erg*s**-1*cm**-2*Angstrom**-1"], ["ogip", "erg/s/cm**2/angstrom"],
  ["daily", "erg/s/cm2/A"], ["daily", "erg/s/cm^2/A"], ["daily", "erg/(s cm2 A)"], ["daily", "erg cm^-2 s^-1 A^-1"], ["daily", "ergs/s/cm^2/Angstrom"],
  ["daily", "erg/s/cm2/AA"], ["daily", "erg s-1 cm-2 Å-1"], ["daily", "erg s-1 cm-2 A-1"], ["daily", "erg/cm2/s/A"], ["daily", "erg cm-2 s-1 Angstrom-1"],
  ["daily", "erg/s/cm**2/Angstrom"], ["daily", "erg s^-1 cm^-2 angstrom^-1"], ["daily", "erg/s/cm2/Ang"],
);
// scaled F_λ, as spectroscopic surveys write it
c("L-1 M T-3", 1e-17 * erg / cm ** 2 / A,
  ["daily", "1e-17 erg/s/cm2/Angstrom"], ["daily", "1e-17 erg/s/cm^2/A"], ["daily", "1E-17 erg s^-1 cm^-2 Å^-1"], ["fits", "10-17 erg s-1 cm-2 Angstrom-1"],
  ["fits", "10**-17 erg s-1 cm-2 Angstrom-1"], ["fits", "10^-17 erg/s/cm2/Angstrom"], ["fits", "10^(-17) erg/s/cm2/Angstrom"], ["ogip", "10**(-17) erg s**-1 cm**-2 Angstrom**-1"],
  ["cds", "10-17erg.s-1.cm-2.Angstrom-1"], ["vou", "1e-17erg.s**-1.cm**-2.Angstrom**-1"], ["vou", "1e-17.erg.s**-1.cm**-2.Angstrom**-1"],
);
c("L-1 M T-3", 1e-16 * erg / cm ** 2 / A, ["cds", "10-16erg/s/cm2/Angstrom"], ["daily", "1e-16 erg/s/cm2/A"], ["daily", "0.1e-15 erg/s/cm2/A"]);
// F_λ SI
c("L-1 M T-3", 1e9, ["sl", "W m^-2 nm^-1"], ["fits", "W/m2/nm"], ["fits", "W m-2 nm-1"], ["cds", "W.m-2.nm-1"], ["vou", "W.m**-2.nm**-1"], ["ogip", "W m**-2 nm**-1"], ["daily", "W/m^2/nm"], ["cds", "W/m2/nm"]);
c("L-1 M T-3", 1e6, ["sl", "W m^-2 um^-1"], ["sl", "W m^-2 µm^-1"], ["fits", "W/m2/um"], ["fits", "W m-2 um-1"], ["daily", "W/m2/micron"], ["daily", "W m-2 micron-1"], ["vou", "W.m**-2.um**-1"], ["ogip", "W m**-2 um**-1"], ["cds", "W.m-2.um-1"]);
c("L-1 M T-3", 1, ["sl", "W m^-3"], ["fits", "W m-3"], ["cds", "W.m-3"], ["vou", "W.m**-3"], ["ogip", "W m**-3"], ["fits", "W/m3"]);
// spectral flux density per frequency
c("M T-2", 1e-26, ["sl", "Jy"], ["daily", "jansky"], ["fits", "10-26 W m-2 Hz-1"], ["vou", "1e-26W.m**-2.Hz**-1"]);
c("M T-2", 1e-29, ["sl", "mJy"], ["fits", "mJy"]);
c("M T-2", 1e-32, ["sl", "uJy"], ["sl", "µJy"], ["sl", "μJy"], ["vou", "uJy"]);
c("M T-2", 1e-20, ["fits", "MJy"]);
c("M T-2", 1e-35, ["fits", "nJy"]);
c("M T-2", erg / cm ** 2, ["sl", "erg s^-1 cm^-2 Hz^-1"], ["fits", "erg/s/cm2/Hz"], ["fits", "erg s-1 cm-2 Hz-1"], ["cds", "erg.s-1.cm-2.Hz-1"], ["vou", "erg.s**-1.cm**-2.Hz**-1"], ["ogip", "erg s**-1 cm**-2 Hz**-1"], ["daily", "erg/s/cm^2/Hz"], ["daily", "erg cm^-2 s^-1 Hz^-1"]);
c("M T-2", 1e-23 * erg / cm ** 2, ["daily", "1e-23 erg/s/cm2/Hz"], ["fits", "10-23 erg s-1 cm-2 Hz-1"], ["cds", "10-23erg.s-1.cm-2.Hz-1"]);
c("M T-2", 1, ["sl", "W m^-2 Hz^-1"], ["fits", "W/m2/Hz"], ["cds", "W.m-2.Hz-1"], ["vou", "W.m**-2.Hz**-1"], ["ogip", "W m**-2 Hz**-1"]);
c("M T-2", 1e-3, ["fits", "mW/m2/Hz"], ["vou", "mW.m**-2.Hz**-1"]);
// spectral radiance
c("L-1 M T-3 Ω-1", erg / cm ** 2 / A, ["sl", "erg s^-1 cm^-2 sr^-1 Å^-1"], ["sl", "erg s^-1 cm^-2 sr^-1 A^-1"], ["fits", "erg/s/cm2/sr/Angstrom"], ["fits", "erg s-1 cm-2 sr-1 Angstrom-1"], ["cds", "erg.s-1.cm-2.sr-1.Angstrom-1"], ["vou", "erg.s**-1.cm**-2.sr**-1.Angstrom**-1"], ["ogip", "erg s**-1 cm**-2 sr**-1 Angstrom**-1"], ["daily", "erg/(s cm2 sr A)"], ["daily", "erg/s/cm2/sr/A"]);
c("L-1 M T-3 Ω-1", erg / cm ** 3, ["sl", "erg s^-1 cm^-2 sr^-1 cm^-1"], ["fits", "erg s-1 cm-3 sr-1"], ["vou", "erg.s**-1.cm**-3.sr**-1"]);
c("L-1 M T-3 Ω-1", 1e9, ["sl", "W m^-2 sr^-1 nm^-1"], ["fits", "W/m2/sr/nm"], ["cds", "W.m-2.sr-1.nm-1"], ["vou", "W.m**-2.sr**-1.nm**-1"]);
c("L-1 M T-3 Ω-1", 1e6, ["sl", "W m^-2 sr^-1 um^-1"], ["daily", "W/m2/sr/micron"], ["fits", "W m-2 sr-1 um-1"]);
c("M T-2 Ω-1", 1e-20, ["fits", "MJy/sr"], ["fits", "MJy sr-1"], ["cds", "MJy.sr-1"], ["vou", "MJy.sr**-1"], ["ogip", "MJy sr**-1"], ["sl", "MJy sr^-1"]);
c("M T-2 Ω-1", 1, ["sl", "W m^-2 sr^-1 Hz^-1"], ["fits", "W/m2/sr/Hz"], ["cds", "W.m-2.sr-1.Hz-1"], ["vou", "W.m**-2.sr**-1.Hz**-1"]);
c("M T-2 Ω-1", erg / cm ** 2, ["sl", "erg s^-1 cm^-2 sr^-1 Hz^-1"], ["fits", "erg/s/cm2/sr/Hz"], ["cds", "erg.s-1.cm-2.sr-1.Hz-1"]);
c("M T-3 Ω-1", 1, ["sl", "W m^-2 sr^-1"], ["sl", "W/m^2/sr"], ["sl", "W / (m^2 sr)"], ["sl", "W*m**-2*sr**-1"], ["fits", "W/(m2 sr)"], ["cds", "W.m-2.sr-1"], ["vou", "W.m**-2.sr**-1"]);
// flux
c("M T-3", 1, ["sl", "W m^-2"], ["fits", "W/m2"], ["fits", "W m-2"], ["cds", "W.m-2"], ["vou", "W.m**-2"], ["ogip", "W m**-2"], ["daily", "W/m^2"]);
c("M T-3", erg / cm ** 2, ["sl", "erg s^-1 cm^-2"], ["fits", "erg/s/cm2"], ["fits", "erg s-1 cm-2"], ["cds", "erg.s-1.cm-2"], ["vou", "erg.s**-1.cm**-2"], ["ogip", "erg s**-1 cm**-2"], ["daily", "erg/cm2/s"], ["daily", "erg cm^-2 s^-1"], ["daily", "ergs/s/cm2"]);
c("M T-3", 1e-15 * erg / cm ** 2, ["daily", "1e-15 erg/s/cm2"], ["fits", "10-15 erg s-1 cm-2"], ["cds", "10-15erg.s-1.cm-2"]);
// power, luminosity
c("L2 M T-3", 1, ["sl", "W"], ["fits", "J/s"], ["vou", "J.s**-1"]);
c("L2 M T-3", erg, ["sl", "erg s^-1"], ["fits", "erg/s"], ["fits", "erg s-1"], ["cds", "erg.s-1"], ["vou", "erg.s**-1"], ["ogip", "erg s**-1"], ["daily", "ergs/s"], ["daily", "erg/sec"]);
c("L2 M T-3", 1e33 * erg, ["fits", "10+33 erg s-1"], ["cds", "10+33erg.s-1"], ["daily", "1e33 erg/s"]);
c("L2 M T-3", Lsun, ["fits", "solLum"], ["vou", "solLum"], ["daily", "Lsun"], ["daily", "L_sun"], ["sl", "L☉"], ["sl", "Lsun"], ["cds", "Lsun"]);
// energy
c("L2 M T-2", 1, ["sl", "J"], ["fits", "J"]);
c("L2 M T-2", erg, ["sl", "erg"], ["daily", "ergs"], ["fits", "10-7 J"], ["fits", "10**-7 J"], ["fits", "10^-7 J"], ["cds", "10-7J"], ["vou", "1e-7J"], ["vou", "1e-7.J"]);
c("L2 M T-2", 1.602176634e-19, ["sl", "eV"], ["fits", "eV"]);
c("L2 M T-2", 1.602176634e-16, ["sl", "keV"], ["fits", "keV"]);
c("L2 M T-2", 1.602176634e-13, ["sl", "MeV"]);
// length
c("L", A, ["sl", "Å"], ["sl", "A"], ["sl", "angstrom"], ["sl", "\u212B"], ["fits", "Angstrom"], ["vou", "Angstrom"], ["vou", "angstrom"], ["daily", "AA"], ["daily", "Angstroms"], ["daily", "Ang"], ["daily", "0.1 nm"]);
c("L", 1e-9, ["sl", "nm"], ["fits", "nm"], ["fits", "10-9 m"], ["fits", "10**-9 m"]);
c("L", 1e-6, ["sl", "µm"], ["sl", "um"], ["sl", "μm"], ["fits", "um"], ["daily", "micron"], ["daily", "microns"]);
c("L", 1e-3, ["sl", "mm"]);
c("L", cm, ["sl", "cm"]);
c("L", 1e3, ["sl", "km"]);
c("L", 1, ["sl", "m"], ["daily", "metre"], ["daily", "meter"]);
c("L", au, ["sl", "au"], ["fits", "AU"], ["vou", "au"]);
c("L", pc, ["sl", "pc"], ["daily", "parsec"]);
c("L", pc * 1e3, ["sl", "kpc"]);
c("L", pc * 1e6, ["sl", "Mpc"]);
c("L", pc * 1e9, ["sl", "Gpc"]);
c("L", 9460730472580800, ["sl", "ly"], ["fits", "lyr"]);
c("L", Rsun, ["sl", "R☉"], ["sl", "Rsun"], ["fits", "solRad"], ["vou", "solRad"], ["daily", "Rsun"], ["daily", "R_sun"]);
// mass
c("M", 1, ["sl", "kg"]);
c("M", 1e-3, ["sl", "g"]);
c("M", Msun, ["sl", "M☉"], ["sl", "Msun"], ["fits", "solMass"], ["daily", "Msun"], ["daily", "M_sun"]);
c("M T-1", Msun / yr, ["fits", "solMass/yr"], ["daily", "Msun/yr"], ["fits", "solMass yr-1"], ["cds", "solMass.yr-1"], ["vou", "solMass.yr**-1"], ["ogip", "solMass yr**-1"], ["sl", "M☉ yr^-1"], ["fits", "solMass/a"]);
// time
c("T", 1, ["sl", "s"], ["daily", "sec"]);
c("T", 1e-3, ["sl", "ms"]);
c("T", 60, ["sl", "min"]);
c("T", 3600, ["sl", "h"], ["daily", "hr"]);
c("T", 86400, ["sl", "d"], ["daily", "day"]);
c("T", yr, ["sl", "a"], ["sl", "yr"], ["daily", "year"]);
c("T", yr * 1e6, ["sl", "Myr"], ["fits", "Ma"]);
c("T", yr * 1e9, ["sl", "Gyr"], ["fits", "Ga"]);
// frequency
c("T-1", 1, ["sl", "Hz"], ["fits", "s-1"], ["vou", "s**-1"]);
c("T-1", 1e9, ["sl", "GHz"]);
c("T-1", 1e6, ["sl", "MHz"]);
// temperature
c("Θ", 1, ["sl", "K"], ["daily", "kelvin"]);
c("Θ", 1e-3, ["sl", "mK"]);
// angles
c("A", deg, ["sl", "deg"], ["sl", "°"], ["daily", "degrees"], ["daily", "degree"]);
c("A", deg / 60, ["sl", "arcmin"], ["sl", "′"]);
c("A", deg / 3600, ["sl", "arcsec"], ["sl", "″"], ["daily", "arcsecond"]);
c("A", mas, ["sl", "mas"], ["daily", "milliarcsec"]);
c("A", mas * 1e-3, ["sl", "µas"], ["sl", "uas"]);
c("A", 1, ["sl", "rad"]);
c("A", 1e-3, ["sl", "mrad"]);
c("A2", deg * deg, ["sl", "deg^2"], ["fits", "deg2"], ["vou", "deg**2"]);
c("T-1 A", mas / yr, ["fits", "mas/yr"], ["fits", "mas yr-1"], ["cds", "mas.yr-1"], ["vou", "mas.yr**-1"], ["ogip", "mas yr**-1"], ["fits", "mas/a"], ["sl", "mas yr^-1"]);
c("Ω", 1, ["sl", "sr"]);
c("Ω", deg * deg, ["sl", "sqdeg"]);
// velocity, acceleration, density, wavenumber, Hubble constant
c("L T-1", 1e3, ["sl", "km s^-1"], ["fits", "km/s"], ["fits", "km s-1"], ["cds", "km.s-1"], ["vou", "km.s**-1"], ["ogip", "km s**-1"], ["ogip", "km*s**-1"]);
c("L T-1", 1, ["sl", "m s^-1"], ["fits", "m/s"]);
c("L T-2", cm, ["sl", "cm s^-2"], ["fits", "cm/s2"], ["cds", "cm.s-2"], ["vou", "cm.s**-2"], ["ogip", "cm s**-2"]);
c("L-3 M", 1e3, ["sl", "g cm^-3"], ["fits", "g/cm3"], ["cds", "g.cm-3"], ["vou", "g.cm**-3"], ["ogip", "g cm**-3"]);
c("L-1", 100, ["sl", "cm^-1"], ["fits", "cm-1"], ["daily", "1/cm"], ["vou", "cm**-1"], ["sl", "cm⁻¹"]);
c("L-3", 1e6, ["sl", "cm^-3"], ["fits", "cm-3"], ["vou", "cm**-3"]);
c("L-2", 1e4, ["sl", "cm^-2"], ["fits", "cm-2"], ["cds", "cm-2"]);
c("T-1", 1e3 / (pc * 1e6), ["fits", "km s-1 Mpc-1"], ["fits", "km/s/Mpc"], ["cds", "km.s-1.Mpc-1"], ["vou", "km.s**-1.Mpc**-1"], ["ogip", "km s**-1 Mpc**-1"]);
c("L3 T-2", 1e9, ["fits", "km3 s-2"], ["vou", "km**3.s**-2"], ["sl", "km^3 s^-2"]);
// pure numbers and magnitudes
c("1", 1, ["sl", ""], ["sl", "   "], ["fits", "mag"], ["vou", "mag"], ["daily", "mag_AB"], ["daily", "ABmag"], ["daily", "AB"]);
c("1", 1e-3, ["fits", "mmag"]);
c("1", 1e-3, ["vou", "1e-3"], ["cds", "10-3"]);

describe(`unit corpus (${corpus.length} spellings)`, () => {
  test("has at least 200 distinct spellings", () => {
    expect(corpus.length).toBeGreaterThanOrEqual(200);
  });
  test.each(corpus.map((e) => [e.text, e.src.join("+"), e] as const))("%j (%s)", (_t, _s, e) => {
    const u = parseUnit(e.text);
    expect(describeDimension(u.dimension)).toBe(e.dim);
    expect(Math.abs(u.factor - e.factor) / e.factor).toBeLessThan(1e-14);
    // the printed symbol reads back to the same unit
    const back = parseUnit(u.symbol);
    expect(describeDimension(back.dimension)).toBe(e.dim);
    expect(Math.abs(back.factor - u.factor) / u.factor).toBeLessThan(1e-15);
  });
  const strictOf: Partial<Record<Src, UnitSyntax>> = { fits: "fits", vou: "vounits", cds: "cds", ogip: "ogip" };
  test("every standard-syntax spelling also parses in its standard's strict mode", () => {
    let checked = 0;
    for (const e of corpus) {
      for (const src of e.src) {
        const syntax = strictOf[src];
        if (syntax === undefined) continue;
        const u = parseUnit(e.text, { syntax });
        expect(Math.abs(u.factor - e.factor) / e.factor, `${e.text} (${syntax})`).toBeLessThan(1e-14);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(100);
  });
});

describe("refusals name a fix", () => {
  const refusals: [string, UnitSyntax, RegExp][] = [
    ["erg s^-1", "vounits", /write erg\.s\*\*-1|no space/],
    ["erg.s^-1", "vounits", /write s\*\*n/],
    ["erg s-1", "ogip", /write s\*\*-1/],
    ["erg.s**-1", "cds", /write s-1|CDS/],
    ["erg s**-1", "cds", /writes no spaces|CDS/],
    ["A", "fits", /ampere.*write Angstrom/],
    ["erg/s/cm2/A", "fits", /write Angstrom/],
    ["erg.s-1.cm-2.A-1", "cds", /write Angstrom/],
    ["L_sun", "vounits", /write solLum/],
    ["micron", "fits", /default syntax/],
    ["Å", "fits", /write Angstrom|default syntax/],
    ["cm⁻²", "fits", /no superscripts/],
    ["1.5e-3 m", "fits", /powers of ten/],
    ["W·m-2", "fits", /write/],
    ["Kelvinn", "any", /did you mean "kelvin"\?/i],
    ["arcsecs", "any", /did you mean "arcsec"\?/],
    ["furlong", "any", /unit list/],
    ["Pa", "any", /base units/],
    ["ph", "any", /count/],
    ["ct/s", "any", /count/],
    ["T", "any", /electric current/],
    ["mag/arcsec2", "any", /logarithm/],
    ["10-3 mag", "any", /logarithm/],
    ["m^(1/2)", "any", /integer powers/],
    ["m^0.5", "any", /integer powers/],
    ["m^5", "any", /-4 to 4/],
    ["cm 2", "any", /right after its symbol/],
    ["W\tm-2", "any", /ASCII space/],
    ["W m-2)", "any", /unmatched/],
    ["(W m-2", "any", /close/],
    ["erg/", "any", /trailing operator/],
    ["0 erg", "any", /scaled by zero/],
    ["1e-400 m", "any", /from 1e-307/],
  ];
  test.each(refusals)("%j in %s", (text, syntax, re) => {
    let err: unknown;
    try {
      parseUnit(text, { syntax });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ParseError);
    const pe = err as ParseError;
    expect(pe.suggestion.length).toBeGreaterThan(0);
    expect(pe.message).toMatch(re);
  });
});
