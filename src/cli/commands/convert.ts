/**
 * `starlume convert`: a value from one unit to another of the same kind, or
 * to a system's coherent unit (`SI`, `CGS`), with the library's parser and
 * its correctly rounded conversions.
 *
 * @module
 */
import type { Dimension } from "../../quantity/dimension";
import { kinds } from "../../quantity/aliases";
import { ParseError, parseQuantityText } from "../../quantity/parse";
import { CGS, SI, type UnitSystem } from "../../quantity/system";
import type { SystemName } from "../../quantity/quantity";
import type { Unit } from "../../quantity/unit";
import { optFlag, optInteger, type ParsedArgs } from "../args";
import { INTERNAL_EXIT, OUTPUT_EXIT, type Command } from "../command";
import { EXIT, UsageError, say, type CliIO } from "../context";
import { formatSignificant } from "../io/write";
import { coherentUnitName, kindName, readUnit, sameDimension } from "../units";

const SPECTRAL = [kinds.length, kinds.frequency, kinds.energy, kinds.wavenumber];

/** A hint when two kinds are related by physics rather than by a unit change. */
function relationHint(a: Dimension, b: Dimension): string {
  const isSpectral = (d: Dimension): boolean => SPECTRAL.some((k) => sameDimension(k.dimension, d));
  if (isSpectral(a) && isSpectral(b)) {
    return " A wavelength, a frequency, a photon energy and a wavenumber are related by ν = c/λ, E = hν, σ = 1/λ: a physical relation, not a change of unit.";
  }
  if (sameDimension(a, kinds.spectralFluxPerWavelength.dimension) && sameDimension(b, kinds.spectralFluxPerFrequency.dimension)) {
    return " f_λ and f_ν differ by a factor λ²/c that depends on the wavelength; it is not a change of unit.";
  }
  if (sameDimension(b, kinds.spectralFluxPerWavelength.dimension) && sameDimension(a, kinds.spectralFluxPerFrequency.dimension)) {
    return " f_ν and f_λ differ by a factor c/λ² that depends on the wavelength; it is not a change of unit.";
  }
  return "";
}

/** The conversion of `value` to `target`: text, the number and the unit text written. */
export function convertText(valueText: string, target: string): { value: number; unitText: string } {
  let parsed: { value: number; unit: Unit };
  try {
    parsed = parseQuantityText(valueText);
  } catch (e) {
    if (e instanceof ParseError) throw new UsageError(e.message);
    throw e;
  }
  const d = parsed.unit.dimension;
  if (target === "SI" || target === "CGS") {
    const sys = (target === "SI" ? SI : CGS) as UnitSystem<SystemName>;
    return { value: sys.of(parsed.value, parsed.unit), unitText: coherentUnitName(sys, d) };
  }
  const to = readUnit(target, "target unit");
  if (!sameDimension(d, to.dimension)) {
    throw new UsageError(
      `cannot convert '${valueText}' to '${target}': '${parsed.unit.symbol === "" ? "(no unit)" : parsed.unit.symbol}' is a ${kindName(d)} but '${target}' is a ${kindName(to.dimension)}.${relationHint(d, to.dimension)}`,
    );
  }
  return { value: SI.valueIn(SI.of(parsed.value, parsed.unit) as never, to as never), unitText: target.trim() };
}

export const convertCommand: Command = {
  name: "convert",
  summary: "convert a value between units of the same kind, or to SI / CGS",
  usage: "[options] 'VALUE UNIT' TARGET",
  description: `
Converts a quantity written as 'number unit' into TARGET, a unit of the same
kind (dimension) or one of the words SI and CGS (the system's coherent unit).
Units follow the library's grammar: products with spaces, '/' for division,
integer powers with '^' (cm^-2) or superscripts, SI prefixes (nm, mJy, kpc),
and symbols such as A (ångström), um, mas, pc, Lsun, Rsun, Jy, erg. A change of
kind (e.g. wavelength to frequency) is refused with exit code 2.
The result is printed with the shortest decimal that reads back as the same
double, unless --digits is given.`,
  options: [
    { name: "digits", short: "d", kind: "value", valueName: "N", help: "significant digits of the result" },
    { name: "number", kind: "flag", help: "print only the number" },
  ],
  exitCodes: [
    { code: 0, meaning: "converted" },
    {
      code: 2,
      meaning: "an unparseable value or unit, a change of kind (e.g. wavelength to frequency),\nor a result outside the double range",
    },
    INTERNAL_EXIT,
    OUTPUT_EXIT,
  ],
  examples: [
    { args: ["3.6e-13 erg s^-1 cm^-2 A^-1", "W m^-2 nm^-1"], note: "a spectral flux density from CGS per ångström to SI per nanometre" },
    { args: ["1 Lsun", "CGS"], note: "the nominal solar luminosity in erg s^-1" },
    { args: ["42 mas", "arcsec", "--digits", "3"], note: "milliarcseconds to arcseconds, 3 significant digits" },
  ],
  async run(args: ParsedArgs, io: CliIO): Promise<number> {
    if (args.positionals.length !== 2) {
      throw new UsageError(`convert needs two arguments, 'VALUE UNIT' and TARGET (quote each one); got ${args.positionals.length}`);
    }
    const [valueText, target] = args.positionals as [string, string];
    const digitsGiven = args.options.has("digits");
    const digits = optInteger(args, "digits", 17, 1, 17);
    const r = convertText(valueText, target);
    if (!Number.isFinite(r.value)) throw new UsageError(`'${valueText}' in ${r.unitText} is out of the double-precision range`);
    const num = digitsGiven ? formatSignificant(r.value, digits) : String(r.value).replace("e+", "e");
    say(io.stdout, optFlag(args, "number") || r.unitText === "" ? num : `${num} ${r.unitText}`);
    return EXIT.OK;
  },
};
