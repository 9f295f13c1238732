/**
 * Mix-ups drawn from pipeline practice that must not compile (issue 12):
 * system mixes through helpers and arrays, per-λ against per-ν, radiance
 * against flux, photon against energy counts, air against vacuum, angle
 * against solid angle against length, magnitudes against fluxes, parallax
 * against distance, plain numbers where a kind is wanted. One pattern per
 * `@ts-expect-error`; each is checked by `tsc` (an unused directive fails).
 */
import { describe, test } from "vitest";
import {
  CGS,
  SI,
  abMagnitude,
  add,
  vacuumFromAir,
  angularDiameter,
  apparentBolometricMagnitude,
  brightnessTemperatureFrequency,
  brightnessTemperatureWavelength,
  cbrt,
  ccm89Extinction,
  ccm89Ratio,
  dereddenFlux,
  distanceFromLuminosityFlux,
  distanceFromParallax,
  distanceModulus,
  div,
  fLambdaFromFNu,
  fNuFromFLambda,
  fluxFromLuminosity,
  frequencyFromVacuumWavelength,
  ge,
  gt,
  le,
  lt,
  luminosityFromFlux,
  luminosityFromRadiusTemperature,
  magnitudeDifference,
  max,
  min,
  mul,
  near,
  parallaxFromDistance,
  photonEnergyFromFrequency,
  photonEnergyFromVacuumWavelength,
  planckRadianceFrequency,
  planckRadianceWavelength,
  radiusFromAngularDiameter,
  reddenFlux,
  scale,
  solidAngleFromAngularDiameter,
  sqrt,
  stefanBoltzmannExitance,
  sub,
  sum,
  surfaceBrightness,
  temperatureFromExitance,
  temperatureFromPeakWavelength,
  units,
  airFromVacuum,
  peakWavelength,
  type AirWavelength,
  type Angle,
  type Area,
  type Energy,
  type Flux,
  type Frequency,
  type Length,
  type LengthArray,
  type PhotonFlux,
  type PhotonRate,
  type Power,
  type Radiance,
  type SolidAngle,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SpectralRadiancePerFrequency,
  type SpectralRadiancePerWavelength,
  type SystemName,
  type Temperature,
  type Time,
  type UnitSystem,
  type VacuumWavelength,
  type Velocity,
  type Wavenumber,
} from "../../src/index";

declare const rSI: Length<"SI">;
declare const rCGS: Length<"CGS">;
declare const dSI: Length<"SI">;
declare const dCGS: Length<"CGS">;
declare const T: Temperature;
declare const t: Time;
declare const nu: Frequency;
declare const plx: Angle;
declare const theta: Angle;
declare const omega: SolidAngle;
declare const LSI: Power<"SI">;
declare const LCGS: Power<"CGS">;
declare const FSI: Flux<"SI">;
declare const FCGS: Flux<"CGS">;
declare const ESI: Energy<"SI">;
declare const ECGS: Energy<"CGS">;
declare const fLamSI: SpectralFluxPerWavelength<"SI">;
declare const fLamCGS: SpectralFluxPerWavelength<"CGS">;
declare const fNuSI: SpectralFluxPerFrequency<"SI">;
declare const fNuCGS: SpectralFluxPerFrequency<"CGS">;
declare const bLamSI: SpectralRadiancePerWavelength<"SI">;
declare const bNuSI: SpectralRadiancePerFrequency<"SI">;
declare const ISI: Radiance<"SI">;
declare const photonsSI: PhotonFlux<"SI">;
declare const rate: PhotonRate;
declare const air: AirWavelength<"SI">;
declare const airCGS: AirWavelength<"CGS">;
declare const vac: VacuumWavelength<"SI">;
declare const vSI: Velocity<"SI">;
declare const kSI: Wavenumber<"SI">;
declare const gridSI: LengthArray<"SI">;
declare const gridCGS: LengthArray<"CGS">;
declare const mag: number;

describe("system mixes through helpers and arrays", () => {
  test("helpers that return one system fed to another", () => {
    // @ts-expect-error an SI peak wavelength into a CGS Planck call
    planckRadianceWavelength(CGS, peakWavelength(SI, T), T);
    // @ts-expect-error a CGS luminosity into an SI inverse-square law
    fluxFromLuminosity(SI, luminosityFromRadiusTemperature(CGS, rCGS, T), dSI);
    // @ts-expect-error an SI flux into a CGS luminosity
    luminosityFromFlux(CGS, stefanBoltzmannExitance(SI, T), dCGS);
    // @ts-expect-error an SI exitance read back through CGS
    temperatureFromExitance(CGS, stefanBoltzmannExitance(SI, T));
    // @ts-expect-error a CGS distance into an SI distance modulus
    distanceModulus(SI, distanceFromParallax(CGS, plx));
    // @ts-expect-error a CGS distance into SI parallax
    parallaxFromDistance(SI, dCGS);
    // @ts-expect-error an SI radius with a CGS distance
    angularDiameter(SI, rSI, dCGS);
    // @ts-expect-error a CGS flux density converted with SI
    fLambdaFromFNu(SI, fNuCGS, vac);
    // @ts-expect-error a CGS wavelength with an SI f_λ
    fNuFromFLambda(SI, fLamSI, CGS.of(500, units.nm));
  });
  test("mixed systems in arithmetic", () => {
    // @ts-expect-error add SI and CGS lengths
    add(rSI, rCGS);
    // @ts-expect-error subtract a CGS power from an SI one
    sub(LSI, LCGS);
    // @ts-expect-error SI × CGS product
    mul(rSI, rCGS);
    // @ts-expect-error CGS ÷ SI quotient
    div(ECGS, rSI);
    // @ts-expect-error compare SI and CGS fluxes
    lt(FSI, FCGS);
    // @ts-expect-error compare SI and CGS energies
    ge(ESI, ECGS);
    // @ts-expect-error nearly-equal across systems
    near(fNuSI, fNuCGS, 1e-9);
    // @ts-expect-error min over mixed systems
    min(rSI, rCGS);
    // @ts-expect-error max over mixed systems
    max(LSI, LCGS);
  });
  test("mixed systems in arrays and lists", () => {
    // @ts-expect-error sum of a list mixing systems
    sum([rSI, rCGS]);
    // @ts-expect-error sum of a list mixing kinds
    sum([rSI, ESI]);
    // @ts-expect-error a CGS grid where an SI one is declared
    const g: LengthArray<"SI"> = gridCGS;
    // @ts-expect-error a CGS array built into an SI array slot
    const h: LengthArray<"SI"> = CGS.arrayOf([1, 2], units.nm);
    // @ts-expect-error reading an SI value in a CGS-only helper type
    const l: Length<"CGS">[] = [rSI];
    // @ts-expect-error an SI element pushed onto a CGS list
    ([] as Length<"CGS">[]).push(rSI);
    // @ts-expect-error a list of temperatures summed as lengths
    const s: Length<"SI"> = sum([T, T]);
    void g; void h; void l; void s;
  });
  test("generic helpers keep their system", () => {
    function toFlux<S extends SystemName>(sys: UnitSystem<S>, L: Power<NoInfer<S>>, d: Length<NoInfer<S>>): Flux<S> {
      return fluxFromLuminosity(sys, L, d);
    }
    // @ts-expect-error a generic helper refuses the other system's luminosity
    toFlux(SI, LCGS, dSI);
    // @ts-expect-error and the other system's distance
    toFlux(CGS, LCGS, dSI);
    // @ts-expect-error its SI result is not a CGS flux
    const f: Flux<"CGS"> = toFlux(SI, LSI, dSI);
    void f;
  });
  test("SI.valueIn / CGS.valueIn on the wrong system", () => {
    // @ts-expect-error a CGS length read by SI
    SI.valueIn(rCGS, units.km);
    // @ts-expect-error an SI energy read by CGS
    CGS.valueIn(ESI, units.erg);
    // @ts-expect-error right system, wrong kind of unit
    SI.valueIn(rSI, units.s);
  });
});

describe("per wavelength against per frequency", () => {
  test("spectral densities are not interchangeable", () => {
    // @ts-expect-error f_ν where f_λ is declared
    const a: SpectralFluxPerWavelength<"SI"> = fNuSI;
    // @ts-expect-error f_λ where f_ν is declared
    const b: SpectralFluxPerFrequency<"SI"> = fLamSI;
    // @ts-expect-error B_ν where B_λ is declared
    const c: SpectralRadiancePerWavelength<"SI"> = planckRadianceFrequency(SI, nu, T);
    // @ts-expect-error B_λ where B_ν is declared
    const d: SpectralRadiancePerFrequency<"SI"> = planckRadianceWavelength(SI, vac, T);
    // @ts-expect-error AB magnitude of an f_λ
    abMagnitude(SI, fLamSI);
    // @ts-expect-error f_λ → f_ν conversion given f_ν
    fNuFromFLambda(SI, fNuSI, vac);
    // @ts-expect-error f_ν → f_λ conversion given f_λ
    fLambdaFromFNu(SI, fLamSI, vac);
    // @ts-expect-error adding f_λ to f_ν
    add(fLamSI, fNuSI);
    // @ts-expect-error brightness temperature from B_ν at a wavelength
    brightnessTemperatureWavelength(SI, vac, bNuSI);
    // @ts-expect-error brightness temperature from B_λ at a frequency
    brightnessTemperatureFrequency(SI, nu, bLamSI);
    // @ts-expect-error a frequency where a wavelength is asked
    planckRadianceWavelength(SI, nu, T);
    // @ts-expect-error a wavelength where a frequency is asked
    planckRadianceFrequency(SI, vac, T);
    // @ts-expect-error a wavenumber where a wavelength is asked
    planckRadianceWavelength(SI, kSI, T);
    void a; void b; void c; void d;
  });
});

describe("radiance against flux", () => {
  test("per steradian or not", () => {
    // @ts-expect-error a radiance is not a flux
    const a: Flux<"SI"> = ISI;
    // @ts-expect-error a flux is not a radiance
    const b: Radiance<"SI"> = FSI;
    // @ts-expect-error a spectral radiance is not a flux density
    const c: SpectralFluxPerWavelength<"SI"> = bLamSI;
    // @ts-expect-error B_ν is not f_ν
    const d: SpectralFluxPerFrequency<"SI"> = bNuSI;
    // @ts-expect-error luminosity from a radiance
    luminosityFromFlux(SI, ISI, dSI);
    // @ts-expect-error surface brightness of a radiance
    surfaceBrightness(SI, ISI, theta);
    // @ts-expect-error exitance temperature from a radiance
    temperatureFromExitance(SI, ISI);
    // @ts-expect-error adding radiance and flux
    add(ISI, FSI);
    // @ts-expect-error radiance × area is not a power
    const e: Power<"SI"> = mul(ISI, mul(rSI, rSI));
    // @ts-expect-error reddening a radiance through the flux function
    reddenFlux(ISI, 0.3);
    void a; void b; void c; void d; void e;
  });
});

describe("photon counts against energy", () => {
  test("photons are not joules", () => {
    // @ts-expect-error a photon flux is not an energy flux
    const a: Flux<"SI"> = photonsSI;
    // @ts-expect-error an energy flux is not a photon flux
    const b: PhotonFlux<"SI"> = FSI;
    // @ts-expect-error a photon rate is not a luminosity
    const c: Power<"SI"> = rate;
    // @ts-expect-error a photon rate is not a frequency-free count
    const d: Energy<"SI"> = rate;
    // @ts-expect-error a photon energy is not a temperature
    const e: Temperature = photonEnergyFromFrequency(SI, nu);
    // @ts-expect-error photon energy from a temperature
    photonEnergyFromFrequency(SI, T);
    // @ts-expect-error photon flux into an energy-flux magnitude
    apparentBolometricMagnitude(SI, photonsSI);
    // @ts-expect-error adding photon flux and energy flux
    add(photonsSI, FSI);
    void a; void b; void c; void d; void e;
  });
});

describe("air against vacuum", () => {
  test("vacuum laws refuse air wavelengths", () => {
    // @ts-expect-error f_λ from f_ν at an air wavelength
    fLambdaFromFNu(SI, fNuSI, air);
    // @ts-expect-error f_ν from f_λ at an air wavelength
    fNuFromFLambda(SI, fLamSI, air);
    // @ts-expect-error CCM89 ratio at an air wavelength
    ccm89Ratio(SI, air);
    // @ts-expect-error CCM89 extinction at an air wavelength (CGS)
    ccm89Extinction(CGS, airCGS, 1);
    // @ts-expect-error Planck at an air wavelength
    planckRadianceWavelength(SI, air, T);
    // @ts-expect-error photon energy at an air wavelength
    photonEnergyFromVacuumWavelength(SI, air);
    // @ts-expect-error frequency of an air wavelength
    frequencyFromVacuumWavelength(SI, air);
    // @ts-expect-error Wien temperature from an air peak
    temperatureFromPeakWavelength(SI, air);
    // @ts-expect-error brightness temperature at an air wavelength
    brightnessTemperatureWavelength(SI, air, bLamSI);
    // @ts-expect-error converting air to air
    vacuumFromAir(SI, vac);
    // @ts-expect-error converting vacuum to vacuum
    airFromVacuum(SI, air);
    // @ts-expect-error an air wavelength is not a vacuum wavelength
    const v: VacuumWavelength<"SI"> = air;
    // @ts-expect-error a vacuum wavelength is not an air wavelength
    const a: AirWavelength<"SI"> = vac;
    void v; void a;
  });
});

describe("angle, solid angle and length", () => {
  test("three different things", () => {
    // @ts-expect-error an angle is not a solid angle
    const a: SolidAngle = theta;
    // @ts-expect-error a solid angle is not an angle
    const b: Angle = omega;
    // @ts-expect-error an angle squared is not a solid angle without asSolidAngle
    const c: SolidAngle = mul(theta, theta);
    // @ts-expect-error an angle is not a length
    const d: Length<"SI"> = theta;
    // @ts-expect-error a length is not an angle
    const e: Angle = rSI;
    // @ts-expect-error surface brightness takes the angular diameter, not a solid angle
    surfaceBrightness(SI, FSI, omega);
    // @ts-expect-error solid angle of a disk from a length
    solidAngleFromAngularDiameter(rSI);
    // @ts-expect-error radius from a solid angle
    radiusFromAngularDiameter(SI, omega, dSI);
    // @ts-expect-error adding an angle and a solid angle
    add(theta, omega);
    // @ts-expect-error an arcsecond scale factor that is an angle
    scale(rSI, theta);
    // @ts-expect-error angle in degrees read as an area unit
    SI.valueIn(theta, units.sqdeg);
    void a; void b; void c; void d; void e;
  });
});

describe("magnitudes against fluxes", () => {
  test("a magnitude is a plain number, a flux is not", () => {
    // @ts-expect-error a flux where a magnitude (pure number) is asked
    distanceModulus(SI, dSI, FSI);
    // @ts-expect-error reddening a magnitude through the flux function
    reddenFlux(mag, 0.3);
    // @ts-expect-error dereddening a plain number
    dereddenFlux(12.5, 0.3);
    // @ts-expect-error a flux as the extinction
    reddenFlux(FSI, FSI);
    // @ts-expect-error magnitude difference of a flux and a plain number
    magnitudeDifference(FSI, mag);
    // @ts-expect-error a magnitude is not a flux
    const f: Flux<"SI"> = mag;
    // @ts-expect-error apparent bolometric magnitude of a luminosity
    apparentBolometricMagnitude(SI, LSI);
    void f;
  });
  test("reddening takes flux-like kinds only", () => {
    // @ts-expect-error a luminosity is not reddened by this function
    reddenFlux(LSI, 0.3);
    // @ts-expect-error nor an energy
    reddenFlux(ESI, 0.3);
    // @ts-expect-error nor a force
    reddenFlux(SI.of(1, units.N), 0.3);
    // @ts-expect-error nor a CGS luminosity
    dereddenFlux(LCGS, 0.3);
    // @ts-expect-error nor a spectral radiance
    dereddenFlux(bLamSI, 0.3);
    // @ts-expect-error the result keeps its kind: f_ν stays f_ν
    const a: SpectralFluxPerWavelength<"SI"> = reddenFlux(fNuSI, 0.3);
    // @ts-expect-error and its system
    const b: Flux<"CGS"> = dereddenFlux(FSI, 0.3);
    void a; void b;
  });
});

describe("parallax against distance", () => {
  test("an angle is not a distance", () => {
    // @ts-expect-error a parallax where a distance is asked
    distanceModulus(SI, plx);
    // @ts-expect-error a distance where a parallax is asked
    distanceFromParallax(SI, dSI);
    // @ts-expect-error parallax in a plain number of mas
    distanceFromParallax(SI, 12.3);
    // @ts-expect-error a parallax is not a length
    const d: Length<"SI"> = parallaxFromDistance(SI, dSI);
    // @ts-expect-error inverse square with a parallax
    fluxFromLuminosity(SI, LSI, plx);
    // @ts-expect-error angular diameter with a parallax for distance
    angularDiameter(SI, rSI, plx);
    void d;
  });
});

describe("plain numbers where a kind is wanted", () => {
  test("no silent unit", () => {
    // @ts-expect-error a bare temperature
    planckRadianceWavelength(SI, vac, 5772);
    // @ts-expect-error a bare wavelength
    planckRadianceWavelength(SI, 5e-7, T);
    // @ts-expect-error a bare luminosity
    fluxFromLuminosity(SI, 3.8e26, dSI);
    // @ts-expect-error a bare distance
    luminosityFromFlux(SI, FSI, 3.1e16);
    // @ts-expect-error a bare radius
    luminosityFromRadiusTemperature(SI, 7e8, T);
    // @ts-expect-error adding a plain number to a length
    add(rSI, 1);
    // @ts-expect-error comparing a length with a plain number
    gt(rSI, 0);
    // @ts-expect-error plain number declared a temperature
    const x: Temperature = 300;
    void x;
  });
});

describe("kind mix-ups in products, roots and results", () => {
  test("computed results", () => {
    // @ts-expect-error L = 4πR²σT⁴ needs T⁴: a flux × area with T² is not a power
    const a: Power<"SI"> = mul(mul(rSI, rSI), mul(T, T));
    // @ts-expect-error distance / time is a velocity, not a length
    const b: Length<"SI"> = div(dSI, t);
    // @ts-expect-error energy / time is a power, not an energy
    const c: Energy<"SI"> = div(ESI, t);
    // @ts-expect-error flux × area is a power, not a flux
    const d: Flux<"SI"> = mul(FSI, mul(rSI, rSI));
    // @ts-expect-error velocity × time is a length, not a velocity
    const e: Velocity<"SI"> = mul(vSI, t);
    // @ts-expect-error 1 / wavelength is a wavenumber, not a frequency
    const f: Frequency = div(1, vac);
    // @ts-expect-error 1 / time is a frequency, not a time
    const g: Time = div(1, t);
    // @ts-expect-error a plain factor keeps the kind: 2 × length is not an area
    const h: Area<"SI"> = mul(2, rSI);
    // @ts-expect-error a plain divisor keeps the kind: length / 2 is not a wavenumber
    const i: Wavenumber<"SI"> = div(rSI, 2);
    // @ts-expect-error √(energy) has odd exponents
    sqrt(ESI);
    // @ts-expect-error √(flux) has an odd mass exponent
    sqrt(FSI);
    // @ts-expect-error ∛(area) has a length exponent not divisible by 3
    cbrt(mul(rSI, rSI));
    // @ts-expect-error √ of a radius in generic code has an odd exponent
    const j = <S extends SystemName>(r: Length<S>) => sqrt(r);
    // @ts-expect-error le with a temperature against a length
    le(T, rSI);
    void a; void b; void c; void d; void e; void f; void g; void h; void i; void j;
  });
});
