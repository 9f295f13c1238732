/**
 * Honest code that must compile, so the types never reject correct work.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  add,
  asSolidAngle,
  constants,
  div,
  inv,
  kinds,
  mul,
  pow,
  radians,
  scale,
  sqrt,
  units,
  type Angle,
  type Area,
  type Dimensionless,
  type Flux,
  type Frequency,
  type Length,
  type Power,
  type SolidAngle,
  type SpectralRadiancePerWavelength,
  type SystemName,
  type Temperature,
  type Time,
  type Velocity,
  type Wavenumber,
} from "../../src/index";

describe("building and reading", () => {
  test("SI.of and CGS.of give typed lengths", () => {
    expectTypeOf(SI.of(1, units.au)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(CGS.of(1, units.au)).toEqualTypeOf<Length<"CGS">>();
    expectTypeOf(SI.valueIn(SI.of(1, units.au), units.km)).toEqualTypeOf<number>();
  });
  test("system-free quantities are the same type in both systems", () => {
    expectTypeOf<Temperature<"SI">>().toEqualTypeOf<Temperature<"CGS">>();
    const t = SI.of(5772, units.K);
    expectTypeOf(CGS.valueIn(t, units.K)).toEqualTypeOf<number>();
    const f: Frequency = CGS.of(1, units.GHz);
    expectTypeOf(SI.valueIn(f, units.Hz)).toEqualTypeOf<number>();
  });
  test("parsing returns the requested kind in the chosen system", () => {
    expectTypeOf(CGS.parse("3.6e-13 erg s^-1 cm^-2 A^-1", kinds.spectralFluxPerWavelength)).toMatchTypeOf<number>();
    const p = SI.parse("1.2 mas", kinds.angle);
    expectTypeOf(p).toEqualTypeOf<Angle>();
  });
  test("converting between systems", () => {
    const l: Power<"CGS"> = CGS.from(SI.of(1, units.Lsun), kinds.power);
    const back: Power<"SI"> = SI.from(l, kinds.power);
    expectTypeOf(back).toEqualTypeOf<Power<"SI">>();
  });
});

describe("arithmetic", () => {
  test("same-system addition", () => {
    expectTypeOf(add(SI.of(1, units.au), SI.of(1, units.km))).toEqualTypeOf<Length<"SI">>();
  });
  test("products and quotients combine dimensions", () => {
    const r = SI.of(1, units.Rsun);
    const a: Area<"SI"> = mul(r, r);
    const v: Velocity<"CGS"> = div(CGS.of(1, units.km), CGS.of(1, units.s));
    const k: Wavenumber<"SI"> = inv(SI.of(500, units.nm));
    expectTypeOf(sqrt(a)).toEqualTypeOf<Length<"SI">>();
    void v;
    void k;
  });
  test("system-free operands combine with either system", () => {
    const nu: Frequency = SI.of(1, units.GHz);
    const c1: Velocity<"SI"> = mul(SI.of(1, units.m), nu);
    const c2: Velocity<"CGS"> = mul(CGS.of(1, units.cm), nu);
    void c1;
    void c2;
  });
  test("scaling by plain numbers and dimensionless quantities", () => {
    const ratio: Dimensionless = radians(SI.of(1, units.deg));
    scale(SI.of(1, units.au), 2);
    scale(SI.of(1, units.au), ratio);
  });
  test("σT⁴ is a flux in the constant's system", () => {
    const t = SI.of(5772, units.K);
    const si: Flux<"SI"> = mul(constants.sigma.si, pow(t, 4));
    const cgs: Flux<"CGS"> = mul(constants.sigma.cgs, pow(t, 4));
    void si;
    void cgs;
  });
  test("2hc²/λ⁵ per steradian is a spectral radiance per wavelength", () => {
    const lambda = CGS.of(500, units.nm);
    const b: SpectralRadiancePerWavelength<"CGS"> = div(constants.c1L.cgs, mul(pow(lambda, 4), lambda));
    void b;
  });
  test("deg × deg becomes a solid angle on purpose", () => {
    const side = SI.of(1, units.deg);
    const omega: SolidAngle = asSolidAngle(mul(side, side));
    void omega;
  });
  test("generic code over the system", () => {
    function speed<S extends SystemName>(d: Length<S>, t: Time): Velocity<S> {
      return div(d, t);
    }
    expectTypeOf(speed(SI.of(1, units.au), SI.of(1, units.day))).toEqualTypeOf<Velocity<"SI">>();
    expectTypeOf(speed(CGS.of(1, units.au), SI.of(1, units.day))).toEqualTypeOf<Velocity<"CGS">>();
  });
});
