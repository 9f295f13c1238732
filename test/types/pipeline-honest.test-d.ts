/**
 * Honest pipeline code that must compile (issue 12), including generic code
 * over `S extends SystemName`: each `test` body holds one or more patterns,
 * counted by the `// ok:` comments. If the types ever refuse one, `tsc`
 * fails.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  add,
  vacuumFromAir,
  angularDiameter,
  asSolidAngle,
  ccm89Extinction,
  ccm89Ratio,
  dereddenFlux,
  distanceFromParallax,
  distanceModulus,
  div,
  fLambdaFromFNu,
  fNuFromFLambda,
  fluxFromLuminosity,
  inv,
  lt,
  luminosityFromFlux,
  luminosityFromRadiusTemperature,
  magnitudeDifference,
  max,
  min,
  mul,
  parallaxFromDistance,
  photonEnergyFromVacuumWavelength,
  planckRadianceWavelength,
  pow,
  reddenFlux,
  scale,
  solidAngleFromAngularDiameter,
  sqrt,
  stefanBoltzmannExitance,
  sub,
  sum,
  surfaceBrightness,
  temperatureFromExitance,
  units,
  vacuumWavelength,
  peakWavelength,
  type AirWavelength,
  type Angle,
  type Area,
  type Dimensionless,
  type Energy,
  type Flux,
  type Frequency,
  type Length,
  type PhotonFlux,
  type Power,
  type Radiance,
  type SolidAngle,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SpectralFluxPerWavenumber,
  type SpectralRadiancePerWavelength,
  type SystemName,
  type Temperature,
  type Time,
  type UnitSystem,
  type VacuumWavelength,
  type Velocity,
  type Volume,
  type Wavenumber,
} from "../../src/index";

declare const rSI: Length<"SI">;
declare const rCGS: Length<"CGS">;
declare const T: Temperature;
declare const t: Time;
declare const theta: Angle;
declare const LSI: Power<"SI">;
declare const FSI: Flux<"SI">;
declare const FCGS: Flux<"CGS">;
declare const fNuCGS: SpectralFluxPerFrequency<"CGS">;
declare const fLamSI: SpectralFluxPerWavelength<"SI">;
declare const fSigmaSI: SpectralFluxPerWavenumber<"SI">;
declare const photonsCGS: PhotonFlux<"CGS">;
declare const air: AirWavelength<"SI">;
declare const vac: VacuumWavelength<"SI">;

describe("plain numbers as dimensionless operands of mul and div", () => {
  test("a factor keeps the kind", () => {
    // ok: quantity × number
    expectTypeOf(mul(rSI, 2)).toEqualTypeOf<Length<"SI">>();
    // ok: number × quantity
    expectTypeOf(mul(2, rCGS)).toEqualTypeOf<Length<"CGS">>();
    // ok: quantity ÷ number
    expectTypeOf(div(LSI, 4)).toEqualTypeOf<Power<"SI">>();
    // ok: number ÷ time is a frequency
    const f: Frequency = div(1, t);
    // ok: number × number is a number
    expectTypeOf(mul(2, 3)).toEqualTypeOf<number>();
    // ok: 4π R² as mul(4 * Math.PI, mul(R, R))
    const area: Area<"SI"> = mul(4 * Math.PI, mul(rSI, rSI));
    // ok: a dimensionless quantity as a factor in either system
    const z: Dimensionless = div(rSI, rSI);
    const grown: Length<"CGS"> = mul(rCGS, z);
    void f; void area; void grown;
  });
});

describe("generic code over S extends SystemName", () => {
  test("helpers written once for both systems", () => {
    // ok: luminosity from radius and temperature, generic
    function lum<S extends SystemName>(sys: UnitSystem<S>, r: Length<NoInfer<S>>, temp: Temperature): Power<S> {
      return luminosityFromRadiusTemperature(sys, r, temp);
    }
    // ok: flux at a distance, generic
    function fluxAt<S extends SystemName>(sys: UnitSystem<S>, L: Power<NoInfer<S>>, d: Length<NoInfer<S>>): Flux<S> {
      return fluxFromLuminosity(sys, L, d);
    }
    // ok: area of a sphere, generic, with a plain factor
    function sphereArea<S extends SystemName>(r: Length<S>): Area<S> {
      return mul(4 * Math.PI, mul(r, r));
    }
    // ok: volume via pow, generic
    function volume<S extends SystemName>(r: Length<S>): Volume<S> {
      return pow(r, 3);
    }
    // ok: radius back from an area, generic square root
    function radiusOf<S extends SystemName>(a: Area<S>): Length<S> {
      return sqrt(a);
    }
    // ok: halving a length, generic
    function half<S extends SystemName>(r: Length<S>): Length<S> {
      return div(r, 2);
    }
    // ok: velocity from a length and a (system-free) time, generic
    function speed<S extends SystemName>(d: Length<S>, dt: Time): Velocity<S> {
      return div(d, dt);
    }
    // ok: wavenumber from a length, generic
    function wavenumber<S extends SystemName>(l: Length<S>): Wavenumber<S> {
      return inv(l);
    }
    // ok: comparisons and sums, generic
    function longest<S extends SystemName>(a: Length<S>, b: Length<S>): Length<S> {
      return lt(a, b) ? b : a;
    }
    function total<S extends SystemName>(xs: readonly Flux<S>[]): Flux<S> {
      return sum(xs);
    }
    // ok: a generic reddening helper over flux kinds
    function dim<S extends SystemName>(f: SpectralFluxPerWavelength<S>, a: number): SpectralFluxPerWavelength<S> {
      return reddenFlux(f, a);
    }
    // ok: a generic pipeline step: T → peak λ → photon energy
    function peakPhoton<S extends SystemName>(sys: UnitSystem<S>, temp: Temperature): Energy<S> {
      return photonEnergyFromVacuumWavelength(sys, peakWavelength(sys, temp));
    }
    // ok: each used in both systems
    expectTypeOf(lum(SI, rSI, T)).toEqualTypeOf<Power<"SI">>();
    expectTypeOf(lum(CGS, rCGS, T)).toEqualTypeOf<Power<"CGS">>();
    expectTypeOf(fluxAt(CGS, lum(CGS, rCGS, T), rCGS)).toEqualTypeOf<Flux<"CGS">>();
    expectTypeOf(sphereArea(rCGS)).toEqualTypeOf<Area<"CGS">>();
    expectTypeOf(volume(rSI)).toEqualTypeOf<Volume<"SI">>();
    expectTypeOf(radiusOf(sphereArea(rSI))).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(half(rCGS)).toEqualTypeOf<Length<"CGS">>();
    expectTypeOf(speed(rSI, t)).toEqualTypeOf<Velocity<"SI">>();
    expectTypeOf(wavenumber(rCGS)).toEqualTypeOf<Wavenumber<"CGS">>();
    expectTypeOf(longest(rSI, rSI)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(total([FCGS, FCGS])).toEqualTypeOf<Flux<"CGS">>();
    expectTypeOf(dim(fLamSI, 0.2)).toEqualTypeOf<SpectralFluxPerWavelength<"SI">>();
    expectTypeOf(peakPhoton(CGS, T)).toEqualTypeOf<Energy<"CGS">>();
  });
});

describe("system-free kinds read the same in both systems", () => {
  test("no system argument", () => {
    // ok: a temperature from SI fits a CGS law
    planckRadianceWavelength(CGS, CGS.of(500, units.nm), SI.of(5772, units.K));
    // ok: a time from CGS divides an SI length
    const v: Velocity<"SI"> = div(rSI, CGS.of(1, units.s));
    // ok: an angle from SI gives a CGS distance
    const d: Length<"CGS"> = distanceFromParallax(CGS, SI.of(10, units.mas));
    // ok: the alias takes no system argument
    const tt: Time = SI.of(1, units.day);
    const k: Temperature = CGS.of(10, units.K);
    void v; void d; void tt; void k;
  });
});

describe("vacuum-wavelength laws", () => {
  test("vacuum or unmarked wavelengths pass", () => {
    // ok: unmarked wavelength to f_λ ← f_ν
    fLambdaFromFNu(CGS, fNuCGS, CGS.of(5500, units.angstrom));
    // ok: branded vacuum wavelength to f_ν ← f_λ
    fNuFromFLambda(SI, fLamSI, vac);
    // ok: an air wavelength converted first
    fNuFromFLambda(SI, fLamSI, vacuumFromAir(SI, air));
    // ok: CCM89 at a vacuum wavelength
    ccm89Ratio(SI, vac);
    // ok: CCM89 at an unmarked wavelength
    ccm89Extinction(CGS, CGS.of(0.55, units.um), 1, 3.1);
    // ok: vacuumWavelength brands an unmarked one
    ccm89Ratio(SI, vacuumWavelength(SI, SI.of(550, units.nm)));
    // ok: Planck at a vacuum wavelength, the result is B_λ
    const b: SpectralRadiancePerWavelength<"SI"> = planckRadianceWavelength(SI, vac, T);
    void b;
  });
});

describe("flux-like reddening", () => {
  test("every flux kind in either system", () => {
    // ok: bolometric flux SI
    expectTypeOf(reddenFlux(FSI, 0.1)).toEqualTypeOf<Flux<"SI">>();
    // ok: bolometric flux CGS
    expectTypeOf(dereddenFlux(FCGS, 0.1)).toEqualTypeOf<Flux<"CGS">>();
    // ok: f_ν CGS
    expectTypeOf(reddenFlux(fNuCGS, 0.1)).toEqualTypeOf<SpectralFluxPerFrequency<"CGS">>();
    // ok: f_λ SI
    expectTypeOf(dereddenFlux(fLamSI, 0.1)).toEqualTypeOf<SpectralFluxPerWavelength<"SI">>();
    // ok: f_σ SI
    expectTypeOf(reddenFlux(fSigmaSI, 0.1)).toEqualTypeOf<SpectralFluxPerWavenumber<"SI">>();
    // ok: photon flux CGS
    expectTypeOf(reddenFlux(photonsCGS, 0.1)).toEqualTypeOf<PhotonFlux<"CGS">>();
    // ok: from a units constructor
    reddenFlux(SI.of(3, units.mJy), ccm89Extinction(SI, SI.of(2.2, units.um), 1));
  });
});

describe("pipeline steps", () => {
  test("star from observations", () => {
    // ok: parallax → distance → modulus
    const d = distanceFromParallax(SI, SI.of(20, units.mas));
    const mu: number = distanceModulus(SI, d);
    // ok: distance → parallax
    const p: Angle = parallaxFromDistance(SI, d);
    // ok: L = 4πd²F
    const L: Power<"SI"> = luminosityFromFlux(SI, FSI, d);
    // ok: angular diameter from radius and distance
    const th: Angle = angularDiameter(SI, rSI, d);
    // ok: surface brightness of a disk
    const I: Radiance<"SI"> = surfaceBrightness(SI, FSI, th);
    // ok: solid angle of a disk
    const om: SolidAngle = solidAngleFromAngularDiameter(th);
    // ok: angle² made a solid angle explicitly
    const om2: SolidAngle = asSolidAngle(mul(theta, theta));
    // ok: radiance × solid angle is a flux
    const F2: Flux<"SI"> = mul(I, om);
    // ok: exitance round trip
    const T2: Temperature = temperatureFromExitance(SI, stefanBoltzmannExitance(SI, T));
    // ok: flux ratio as a magnitude difference
    const dm: number = magnitudeDifference(FSI, F2);
    // ok: sums, min and max of one kind
    const Ltot: Power<"SI"> = add(L, sub(L, scale(L, 0.5)));
    const Fmin: Flux<"SI"> = min(FSI, F2, FSI);
    const Fmax: Flux<"CGS"> = max(FCGS, FCGS);
    void mu; void p; void om2; void T2; void dm; void Ltot; void Fmin; void Fmax;
  });
});
