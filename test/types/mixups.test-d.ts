/**
 * Unit mix-ups that must not compile. Each `@ts-expect-error` is checked by
 * `tsc` (npm run typecheck) and by vitest's typecheck mode: if a line ever
 * compiles, the directive is unused and the test fails.
 */
import { describe, test } from "vitest";
import {
  CGS,
  SI,
  add,
  cbrt,
  constants,
  div,
  kinds,
  lt,
  min,
  mul,
  scale,
  sqrt,
  sub,
  sum,
  units,
  type Angle,
  type Dimensionless,
  type Energy,
  type Flux,
  type LengthArray,
  type Length,
  type PhotonRadiance,
  type Power,
  type Pure,
  type Radiance,
  type SolidAngle,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SpectralRadiancePerFrequency,
  type SpectralRadiancePerWavelength,
  type SpectralRadiancePerWavenumber,
  type Temperature,
  type Velocity,
  type Wavenumber,
  type Action,
  type Mass,
} from "../../src/index";

const lenSI = SI.of(1, units.m);
const lenCGS = CGS.of(1, units.cm);
const timeS = SI.of(1, units.s);
const ergs = CGS.of(1, units.erg);
const joules = SI.of(1, units.J);
const watts = SI.of(1, units.W);
const tempK = SI.of(5772, units.K);
const arcsec = SI.of(1, units.arcsec);
const sqdeg = SI.of(1, units.sqdeg);
declare const radianceSI: Radiance<"SI">;
declare const fluxSI: Flux<"SI">;
declare const bLambdaSI: SpectralRadiancePerWavelength<"SI">;
declare const bNuSI: SpectralRadiancePerFrequency<"SI">;
declare const bSigmaSI: SpectralRadiancePerWavenumber<"SI">;
declare const fNuSI: SpectralFluxPerFrequency<"SI">;
declare const photonRadianceSI: PhotonRadiance<"SI">;
declare const wavenumberSI: Wavenumber<"SI">;
declare const arraySI: LengthArray<"SI">;
declare const arrayCGS: LengthArray<"CGS">;
declare function wantsFlux(f: Flux<"SI">): void;
declare function wantsRadiance(r: Radiance<"SI">): void;
declare function wantsBLambda(b: SpectralRadiancePerWavelength<"SI">): void;
declare function wantsBNu(b: SpectralRadiancePerFrequency<"SI">): void;
declare function wantsFLambda(f: SpectralFluxPerWavelength<"SI">): void;
declare function wantsLengthSI(x: Length<"SI">): void;
declare function wantsLengthCGS(x: Length<"CGS">): void;
declare function wantsPower(p: Power<"SI">): void;
declare function wantsPure(x: Pure): void;
declare function wantsRatio(x: Dimensionless): void;
declare function wantsAngle(a: Angle): void;
declare function wantsSolidAngle(o: SolidAngle): void;
declare function wantsWavenumberCGS(k: Wavenumber<"CGS">): void;
declare function wantsActionCGS(h: Action<"CGS">): void;
declare function wantsArrayCGS(a: LengthArray<"CGS">): void;
declare function wantsTemperature(t: Temperature): void;

describe("systems never mix", () => {
  test("adding an SI length to a CGS length", () => {
    // @ts-expect-error metres + centimetres
    add(lenSI, lenCGS);
  });
  test("subtracting erg from joules", () => {
    // @ts-expect-error J − erg
    sub(joules, ergs);
  });
  test("multiplying an SI length by a CGS length", () => {
    // @ts-expect-error m × cm
    mul(lenSI, lenCGS);
  });
  test("dividing an SI power by a CGS area", () => {
    // @ts-expect-error W / cm²
    div(watts, mul(lenCGS, lenCGS));
  });
  test("a CGS length into an SI relation", () => {
    // @ts-expect-error cm where m is expected
    wantsLengthSI(lenCGS);
  });
  test("an SI length into a CGS relation", () => {
    // @ts-expect-error m where cm is expected
    wantsLengthCGS(lenSI);
  });
  test("reading a CGS quantity through the SI system", () => {
    // @ts-expect-error SI.valueIn takes SI quantities only
    SI.valueIn(lenCGS, units.m);
  });
  test("assigning an SI velocity to a CGS velocity", () => {
    const v: Velocity<"SI"> = div(lenSI, timeS);
    // @ts-expect-error m/s is not cm/s
    const w: Velocity<"CGS"> = v;
    void w;
  });
  test("an SI wavenumber (m⁻¹) where cm⁻¹ is wanted", () => {
    // @ts-expect-error m^-1 vs cm^-1
    wantsWavenumberCGS(wavenumberSI);
  });
  test("an SI constant in a CGS formula", () => {
    // @ts-expect-error h in J s where erg s is wanted
    wantsActionCGS(constants.h.si);
  });
  test("converting a CGS quantity 'from CGS' into CGS", () => {
    // @ts-expect-error CGS.from takes SI quantities
    CGS.from(ergs, kinds.energy);
  });
  test("min over mixed systems", () => {
    // @ts-expect-error m and cm
    min(lenSI, lenCGS);
  });
  test("summing mixed systems", () => {
    // @ts-expect-error m and cm in one list
    sum([lenSI, lenCGS]);
  });
  test("an SI typed array where a CGS one is wanted", () => {
    // @ts-expect-error Float64Array of metres vs centimetres
    wantsArrayCGS(arraySI);
  });
  test("reading a CGS array through SI", () => {
    // @ts-expect-error SI.arrayIn takes SI arrays only
    SI.arrayIn(arrayCGS, units.m);
  });
});

describe("dimensions never mix", () => {
  test("adding a length to a time", () => {
    // @ts-expect-error length + time
    add(lenSI, timeS);
  });
  test("a temperature where a length is wanted", () => {
    // @ts-expect-error K where m is wanted
    wantsLengthSI(tempK);
  });
  test("energy where power is wanted (J vs W)", () => {
    // @ts-expect-error energy is not luminosity
    wantsPower(joules);
  });
  test("a luminosity where a flux is wanted (forgot the inverse square)", () => {
    // @ts-expect-error W where W m^-2 is wanted
    wantsFlux(watts);
  });
  test("a mass where a length is wanted", () => {
    const mass: Mass<"SI"> = SI.of(1, units.kg);
    // @ts-expect-error kg where m is wanted
    wantsLengthSI(mass);
  });
  test("a plain number where a length is wanted", () => {
    // @ts-expect-error unbranded numbers carry no unit
    wantsLengthSI(6.957e8);
  });
  test("comparing energy with power", () => {
    // @ts-expect-error J < W
    lt(joules, watts);
  });
  test("a frequency where a wavenumber is wanted", () => {
    // @ts-expect-error Hz is not m^-1
    const k: Wavenumber<"SI"> = SI.of(1, units.Hz);
    void k;
  });
  test("a unit of the wrong dimension when reading", () => {
    // @ts-expect-error reading a length in seconds
    SI.valueIn(lenSI, units.s);
  });
  test("a unit of the wrong dimension when formatting", () => {
    // @ts-expect-error formatting a temperature in metres
    SI.format(tempK, units.m);
  });
  test("the square root of a length", () => {
    // @ts-expect-error odd length exponent
    sqrt(lenSI);
  });
  test("the cube root of an area", () => {
    // @ts-expect-error length exponent 2 is not divisible by 3
    cbrt(mul(lenSI, lenSI));
  });
});

describe("radiometric quantities never mix", () => {
  test("a radiance where a flux is wanted (the lost π)", () => {
    // @ts-expect-error per steradian vs not
    wantsFlux(radianceSI);
  });
  test("a flux where a radiance is wanted", () => {
    // @ts-expect-error missing sr^-1
    wantsRadiance(fluxSI);
  });
  test("per-wavelength density where per-frequency is wanted", () => {
    // @ts-expect-error B_λ is not B_ν
    wantsBNu(bLambdaSI);
  });
  test("per-frequency density where per-wavelength is wanted", () => {
    // @ts-expect-error B_ν is not B_λ
    wantsBLambda(bNuSI);
  });
  test("per-wavenumber density where per-wavelength is wanted", () => {
    // @ts-expect-error B_σ is not B_λ
    wantsBLambda(bSigmaSI);
  });
  test("f_ν (janskys) where f_λ is wanted", () => {
    // @ts-expect-error per Hz vs per m
    wantsFLambda(fNuSI);
  });
  test("a spectral radiance where a spectral flux is wanted", () => {
    // @ts-expect-error B_λ has sr^-1, f_λ does not
    wantsFLambda(bLambdaSI);
  });
  test("a photon radiance where an energy radiance is wanted", () => {
    // @ts-expect-error photons s^-1 m^-2 sr^-1 vs W m^-2 sr^-1
    wantsRadiance(photonRadianceSI);
  });
});

describe("angles are not plain numbers", () => {
  test("an angle in arcseconds where a plain number is wanted", () => {
    // @ts-expect-error arcsec is an angle
    wantsPure(arcsec);
  });
  test("an angle where a dimensionless ratio is wanted", () => {
    // @ts-expect-error angle vs ratio
    wantsRatio(arcsec);
  });
  test("scaling by an angle", () => {
    // @ts-expect-error scale takes pure numbers only
    scale(lenSI, arcsec);
  });
  test("a solid angle where an angle is wanted", () => {
    // @ts-expect-error sr vs rad
    wantsAngle(sqdeg);
  });
  test("deg × deg where a solid angle is wanted", () => {
    const d = SI.of(1, units.deg);
    // @ts-expect-error rad² is not sr without asSolidAngle
    wantsSolidAngle(mul(d, d));
  });
  test("an angle where a temperature is wanted", () => {
    // @ts-expect-error rad vs K
    wantsTemperature(arcsec);
  });
});
