/**
 * The loop-speed conversion API (`converter`, `reader`, `converterFrom`):
 * what must compile and what must not. Each `@ts-expect-error` line is a
 * must-not-compile case checked by `tsc` and by vitest's typecheck mode.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  kinds,
  units,
  type Length,
  type LengthDimension,
  type Mass,
  type Power,
  type QuantityReader,
  type SystemConverter,
  type Temperature,
  type UnitSystem,
  type SystemName,
} from "../../src/index";

describe("converter", () => {
  test("a converter of nm makes SI lengths from plain numbers", () => {
    const fromNm = SI.converter(units.nm);
    expectTypeOf(fromNm).parameter(0).toEqualTypeOf<number>();
    expectTypeOf(fromNm(500)).toEqualTypeOf<Length<"SI">>();
    const l: Length<"SI"> = fromNm(500);
    void l;
  });
  test("a converter of nm does not make an SI mass", () => {
    const fromNm = SI.converter(units.nm);
    // @ts-expect-error a length is not a mass
    const m: Mass<"SI"> = fromNm(500);
    void m;
  });
  test("a CGS converter's output is not an SI length", () => {
    const fromNm = CGS.converter(units.nm);
    expectTypeOf(fromNm(500)).toEqualTypeOf<Length<"CGS">>();
    // @ts-expect-error centimetres where metres are required
    const l: Length<"SI"> = fromNm(500);
    void l;
  });
  test("a system-free converter fits either system", () => {
    const fromK = CGS.converter(units.K);
    const t: Temperature = fromK(5772);
    expectTypeOf(SI.converter(units.K)(5772)).toEqualTypeOf<Temperature>();
    void t;
  });
});

describe("reader", () => {
  test("a reader of Å reads CGS lengths as numbers", () => {
    const inA = CGS.reader(units.angstrom);
    expectTypeOf(inA(CGS.of(500, units.nm))).toEqualTypeOf<number>();
    const r: QuantityReader<LengthDimension, "CGS"> = inA;
    void r;
  });
  test("an SI reader does not read CGS quantities", () => {
    const inNm = SI.reader(units.nm);
    // @ts-expect-error a CGS length given to an SI reader
    inNm(CGS.of(1, units.cm));
  });
  test("a length reader does not read a mass", () => {
    const inNm = SI.reader(units.nm);
    // @ts-expect-error a mass read in nanometres
    inNm(SI.of(1, units.kg));
  });
  test("a length reader does not read a plain number", () => {
    const inNm = SI.reader(units.nm);
    // @ts-expect-error a bare number has no unit to read from
    inNm(500);
  });
  test("an SI reader is not a CGS reader", () => {
    // @ts-expect-error readers of different systems do not mix
    const r: QuantityReader<LengthDimension, "CGS"> = SI.reader(units.nm);
    void r;
  });
  test("a system-free reader reads either system's temperature", () => {
    const inK = SI.reader(units.K);
    expectTypeOf(inK(CGS.of(5772, units.K))).toEqualTypeOf<number>();
  });
});

describe("converterFrom", () => {
  test("SI powers to erg s⁻¹", () => {
    const toCGS = CGS.converterFrom(kinds.power);
    expectTypeOf(toCGS(SI.of(1, units.Lsun))).toEqualTypeOf<Power<"CGS">>();
    const c: SystemConverter<LengthDimension, "SI", "CGS"> = CGS.converterFrom(units.m);
    void c;
  });
  test("converterFrom takes the other system only", () => {
    const toCGS = CGS.converterFrom(kinds.power);
    // @ts-expect-error a CGS power is already in CGS
    toCGS(CGS.of(1, units.erg_per_s));
  });
  test("converterFrom checks the dimension", () => {
    const toCGS = CGS.converterFrom(kinds.power);
    // @ts-expect-error a length given to a power converter
    toCGS(SI.of(1, units.m));
  });
  test("converterFrom's output is in the target system", () => {
    const toSI = SI.converterFrom(kinds.length);
    // @ts-expect-error SI.converterFrom makes SI lengths, not CGS ones
    const l: Length<"CGS"> = toSI(CGS.of(1, units.cm));
    void l;
  });
});

describe("systems stay assignable to the general system type", () => {
  test("UnitSystem<'SI'> and UnitSystem<'CGS'> are UnitSystem<SystemName>", () => {
    const systems: UnitSystem<SystemName>[] = [SI, CGS];
    void systems;
  });
});
