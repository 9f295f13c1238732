/**
 * Photometry mix-ups that must not compile, and honest photometry code that
 * must. Each `@ts-expect-error` line is checked by `tsc` and by vitest's
 * typecheck mode: if it ever compiles, the directive is unused and both fail.
 */
import { describe, expectTypeOf, test } from "vitest";
import type { BatchResult } from "../../src/law/index";
import type { StarBatchColumns, StarBatchOutput } from "../../src/photometry/index";
import {
  abMagnitude,
  absoluteBolometricMagnitude,
  angularDiameter,
  apparentBolometricMagnitude,
  ccm89Ratio,
  createStarBatchSolver,
  distanceFromDistanceModulus,
  distanceFromLuminosityFlux,
  distanceFromParallax,
  distanceFromParallaxExact,
  distanceModulus,
  fLambdaFromFNu,
  fluxFromLuminosity,
  fluxRatioFromMagnitudeDifference,
  fNuFromAbMagnitude,
  fNuFromFLambda,
  luminosityFromAbsoluteBolometricMagnitude,
  luminosityFromFlux,
  magnitudeDifference,
  distanceEstimateFromParallax,
  parallaxFromDistance,
  radiusFromAngularDiameter,
  reddenFlux,
  solidAngleFromAngularDiameter,
  solveStar,
  surfaceBrightness,
  type StarSolution,
} from "../../src/photometry/index";
import {
  CGS,
  SI,
  assumeArray,
  units,
  type Angle,
  type AngleArray,
  type Dimensionless,
  type Flux,
  type FluxArray,
  type Length,
  type LengthArray,
  type Power,
  type PowerArray,
  type Radiance,
  type SolidAngle,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SystemName,
  type Temperature,
  type TemperatureArray,
  type UnitSystem,
} from "../../src/quantity/index";

const mas = SI.of(12.3, units.mas);
const pcSI = SI.of(10, units.pc);
const pcCGS = CGS.of(10, units.pc);
const lumSI = SI.of(1, units.Lsun);
const lumCGS = CGS.of(1, units.Lsun);
const fluxSI = SI.of(1e-9, units.W_per_m2);
const fluxCGS = CGS.of(1e-6, units.erg_per_s_cm2);
const jySI = SI.of(3631, units.Jy);
const lamSI = SI.of(550, units.nm);
const tK = SI.of(5772, units.K);
declare const fLamSI: SpectralFluxPerWavelength<"SI">;
declare const radianceSI: Radiance<"SI">;
declare const ratio: Dimensionless;

describe("photometry mix-ups that must not compile", () => {
  test("a parallax given as a plain number", () => {
    // @ts-expect-error 12.3 what? a parallax must be a typed Angle (SI.of(12.3, units.mas))
    distanceFromParallax(SI, 12.3);
  });
  test("a parallax given as a length", () => {
    // @ts-expect-error a distance is not a parallax
    distanceFromParallax(SI, pcSI);
  });
  test("a parallax given as a length to the exact form and to the bias check", () => {
    // @ts-expect-error a length is not an angle
    distanceFromParallaxExact(CGS, pcCGS);
    // @ts-expect-error the parallax uncertainty must be an angle too
    distanceEstimateFromParallax(SI, mas, pcSI);
  });
  test("f_ν where f_λ is wanted", () => {
    // @ts-expect-error f_ν (per Hz) is not f_λ (per metre)
    fNuFromFLambda(SI, jySI, lamSI);
  });
  test("f_λ where f_ν is wanted", () => {
    // @ts-expect-error f_λ into the f_ν → f_λ conversion
    fLambdaFromFNu(SI, fLamSI, lamSI);
    // @ts-expect-error AB magnitudes are defined on f_ν
    abMagnitude(SI, fLamSI);
  });
  test("converting f_ν to f_λ and calling the result f_ν", () => {
    // @ts-expect-error the result is per wavelength
    const f: SpectralFluxPerFrequency<"SI"> = fLambdaFromFNu(SI, jySI, lamSI);
    void f;
  });
  test("luminosity where flux is wanted", () => {
    // @ts-expect-error a luminosity (W) is not a flux (W m^-2)
    luminosityFromFlux(SI, lumSI, pcSI);
    // @ts-expect-error m_bol is defined on the bolometric flux
    apparentBolometricMagnitude(SI, lumSI);
  });
  test("flux where luminosity is wanted", () => {
    // @ts-expect-error a flux is not a luminosity
    fluxFromLuminosity(SI, fluxSI, pcSI);
    // @ts-expect-error M_bol is defined on the luminosity
    absoluteBolometricMagnitude(CGS, fluxCGS);
  });
  test("a CGS distance in an SI call", () => {
    // @ts-expect-error centimetres into an SI call
    fluxFromLuminosity(SI, lumSI, pcCGS);
    // @ts-expect-error an erg s^-1 luminosity into an SI call
    distanceFromLuminosityFlux(SI, lumCGS, fluxSI);
    // @ts-expect-error centimetres into an SI distance modulus
    distanceModulus(SI, pcCGS);
  });
  test("an SI result taken as CGS", () => {
    // @ts-expect-error the distance comes back in the system passed first
    const d: Length<"CGS"> = distanceFromParallax(SI, mas);
    void d;
  });
  test("radiance where flux is wanted in the inverse-square law", () => {
    // @ts-expect-error a radiance (per steradian) is not a flux
    luminosityFromFlux(SI, radianceSI, pcSI);
    // @ts-expect-error and not a flux for the distance either
    distanceFromLuminosityFlux(SI, lumSI, radianceSI);
  });
  test("a surface brightness is a radiance, not a flux", () => {
    // @ts-expect-error F/Ω has the sr^-1 of a radiance
    const f: Flux<"SI"> = surfaceBrightness(SI, fluxSI, mas);
    void f;
  });
  test("an angle in mas passed as a Dimensionless magnitude", () => {
    // @ts-expect-error mas is an angle, not a magnitude
    distanceFromDistanceModulus(SI, mas);
    // @ts-expect-error nor a magnitude difference
    fluxRatioFromMagnitudeDifference(mas);
    // @ts-expect-error nor an AB magnitude
    fNuFromAbMagnitude(SI, SI.of(3, units.mas));
  });
  test("a luminosity passed as an absolute magnitude", () => {
    // @ts-expect-error M_bol is a number of magnitudes, not a power
    luminosityFromAbsoluteBolometricMagnitude(SI, lumSI);
  });
  test("a length where an angular diameter is wanted, and mixed systems in angular size", () => {
    // @ts-expect-error the angular diameter must be an angle
    radiusFromAngularDiameter(SI, pcSI, pcSI);
    // @ts-expect-error CGS radius with an SI call
    angularDiameter(SI, CGS.of(1, units.Rsun), pcSI);
    // @ts-expect-error a solid angle needs an angle
    solidAngleFromAngularDiameter(pcSI);
  });
  test("a frequency where the extinction law wants a wavelength", () => {
    // @ts-expect-error CCM89 takes a wavelength
    ccm89Ratio(SI, SI.of(545, units.THz));
  });
  test("magnitudes between different kinds of flux", () => {
    // @ts-expect-error f_ν against f_λ
    magnitudeDifference(jySI, fLamSI);
    // @ts-expect-error SI flux against CGS flux
    magnitudeDifference(fluxSI, fluxCGS);
  });
  test("reddening something that is not a flux", () => {
    // @ts-expect-error a temperature is not dimmed by dust
    reddenFlux(tK, 0.3);
    // @ts-expect-error nor is a distance
    reddenFlux(pcSI, 0.3);
  });
  test("the solver: CGS radius in an SI solve, plain-number parallax, luminosity as flux, a typo", () => {
    const temperature = { value: tK, sigma: SI.of(50, units.K) };
    const parallax = { value: mas, sigma: SI.of(0.1, units.mas) };
    solveStar(SI, {
      temperature,
      parallax,
      // @ts-expect-error centimetres in an SI solve
      radius: { value: CGS.of(1, units.Rsun), sigma: CGS.of(0.1, units.Rsun) },
    });
    solveStar(SI, {
      temperature,
      // @ts-expect-error a parallax must be a typed angle
      parallax: { value: 12.3, sigma: 0.1 },
      bolometricFlux: { value: fluxSI, sigma: fluxSI },
    });
    solveStar(SI, {
      temperature,
      parallax,
      // @ts-expect-error a luminosity given as the bolometric flux
      bolometricFlux: { value: lumSI, sigma: lumSI },
    });
    solveStar(SI, {
      temperature,
      parallax,
      // @ts-expect-error misspelt observation name
      bolometricFlx: { value: fluxSI, sigma: fluxSI },
    });
  });
  test("the solver's results are in the caller's system", () => {
    const s = solveStar(CGS, { temperature: { value: tK, sigma: tK }, parallax: { value: mas, sigma: mas }, bolometricFlux: { value: fluxCGS, sigma: fluxCGS } });
    // @ts-expect-error a CGS radius is not an SI length
    const r: Length<"SI"> = s.radius.value;
    void r;
  });
  test("the batch solver: wrong column types and unknown names", () => {
    const solver = createStarBatchSolver(SI, ["parallax", "bolometricFlux", "temperature"]);
    const temps = assumeArray<TemperatureArray>(new Float64Array(1));
    const angles = assumeArray<AngleArray>(new Float64Array(1));
    const fluxes = assumeArray<FluxArray<"SI">>(new Float64Array(1));
    const lengthsCGS = assumeArray<LengthArray<"CGS">>(new Float64Array(1));
    solver.solve({
      // @ts-expect-error a parallax column of lengths
      parallax: { values: lengthsCGS, sigmas: lengthsCGS },
      bolometricFlux: { values: fluxes, sigmas: fluxes },
      temperature: { values: temps, sigmas: temps },
    });
    const magSolver = createStarBatchSolver(SI, ["apparentBolometricMagnitude", "angularDiameter", "parallax"]);
    magSolver.solve({
      // @ts-expect-error an array of angles as magnitudes
      apparentBolometricMagnitude: { values: angles, sigmas: angles },
      angularDiameter: { values: angles, sigmas: angles },
      parallax: { values: angles, sigmas: angles },
    });
    // @ts-expect-error "flux" is not an observation name (bolometricFlux is)
    createStarBatchSolver(SI, ["parallax", "flux", "temperature"]);
  });
});

describe("honest photometry code compiles", () => {
  test("parallax in mas, arcsec or µas; distance in the system passed first", () => {
    expectTypeOf(distanceFromParallax(SI, SI.of(12.3, units.mas))).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(distanceFromParallax(CGS, SI.of(0.0123, units.arcsec))).toEqualTypeOf<Length<"CGS">>();
    expectTypeOf(parallaxFromDistance(CGS, pcCGS)).toEqualTypeOf<Angle>();
    expectTypeOf(distanceEstimateFromParallax(SI, mas, SI.of(0.1, units.uas)).distance).toEqualTypeOf<Length<"SI">>();
  });
  test("inverse square in SI and CGS", () => {
    expectTypeOf(fluxFromLuminosity(SI, lumSI, pcSI)).toEqualTypeOf<Flux<"SI">>();
    expectTypeOf(luminosityFromFlux(CGS, fluxCGS, pcCGS)).toEqualTypeOf<Power<"CGS">>();
    expectTypeOf(distanceFromLuminosityFlux(CGS, lumCGS, fluxCGS)).toEqualTypeOf<Length<"CGS">>();
  });
  test("magnitudes are plain numbers; Dimensionless is accepted where a magnitude is", () => {
    expectTypeOf(abMagnitude(SI, SI.of(1, units.uJy))).toEqualTypeOf<number>();
    expectTypeOf(fNuFromAbMagnitude(CGS, 20)).toEqualTypeOf<SpectralFluxPerFrequency<"CGS">>();
    expectTypeOf(fluxRatioFromMagnitudeDifference(ratio)).toEqualTypeOf<number>();
    const m = distanceModulus(SI, pcSI, 0.3) + 10;
    expectTypeOf(distanceFromDistanceModulus(SI, m)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(magnitudeDifference(fLamSI, fLamSI)).toEqualTypeOf<number>();
  });
  test("f_ν ↔ f_λ at a wavelength, in Jy and erg s^-1 cm^-2 Å^-1", () => {
    const fl = fLambdaFromFNu(CGS, CGS.of(3631, units.Jy), CGS.of(5500, units.angstrom));
    expectTypeOf(fl).toEqualTypeOf<SpectralFluxPerWavelength<"CGS">>();
    expectTypeOf(fNuFromFLambda(CGS, fl, CGS.of(5500, units.angstrom))).toEqualTypeOf<SpectralFluxPerFrequency<"CGS">>();
  });
  test("angular size and surface brightness", () => {
    expectTypeOf(angularDiameter(SI, SI.of(1, units.Rsun), SI.of(1, units.au), "disk")).toEqualTypeOf<Angle>();
    expectTypeOf(solidAngleFromAngularDiameter(mas)).toEqualTypeOf<SolidAngle>();
    expectTypeOf(surfaceBrightness(CGS, fluxCGS, mas)).toEqualTypeOf<Radiance<"CGS">>();
  });
  test("reddening returns the type it was given", () => {
    expectTypeOf(reddenFlux(jySI, 0.5)).toEqualTypeOf<SpectralFluxPerFrequency<"SI">>();
    expectTypeOf(reddenFlux(fLamSI, 0.5)).toEqualTypeOf<SpectralFluxPerWavelength<"SI">>();
    expectTypeOf(reddenFlux(radianceSI, 0.5)).toEqualTypeOf<Radiance<"SI">>();
    expectTypeOf(ccm89Ratio(CGS, CGS.of(2.2, units.um), 3.1)).toEqualTypeOf<number>();
  });
  test("the solver takes system-free temperatures and angles in either system and answers in the caller's", () => {
    const s = solveStar(CGS, {
      temperature: { value: SI.of(5800, units.K), sigma: SI.of(50, units.K) },
      parallax: { value: SI.of(12.3, units.mas), sigma: SI.of(0.1, units.mas) },
      bolometricFlux: { value: fluxCGS, sigma: fluxCGS },
      apparentBolometricMagnitude: { value: 5.2, sigma: 0.02 },
    });
    expectTypeOf(s).toEqualTypeOf<StarSolution<"CGS">>();
    expectTypeOf(s.luminosity.value).toEqualTypeOf<Power<"CGS">>();
    expectTypeOf(s.temperature.sigma).toEqualTypeOf<Temperature>();
    expectTypeOf(s.apparentBolometricMagnitude.value).toEqualTypeOf<number>();
    expectTypeOf(JSON.parse(JSON.stringify(s.toJSON())) as ReturnType<typeof s.toJSON>).toHaveProperty("covariance");
  });
  test("generic code over the system compiles", () => {
    function luminosityAt<S extends SystemName>(sys: UnitSystem<S>, p: Angle, f: Flux<S>): Power<S> {
      return luminosityFromFlux(sys, f, distanceFromParallax(sys, p));
    }
    expectTypeOf(luminosityAt(CGS, mas, fluxCGS)).toEqualTypeOf<Power<"CGS">>();
  });
  test("the batch solver with typed columns and plain magnitude arrays", () => {
    const solver = createStarBatchSolver(CGS, ["apparentBolometricMagnitude", "angularDiameter", "parallax"]);
    const angles = assumeArray<AngleArray>(new Float64Array(2));
    const out = solver.solve({
      apparentBolometricMagnitude: { values: new Float64Array(2), sigmas: new Float64Array(2) },
      angularDiameter: { values: angles, sigmas: angles },
      parallax: { values: angles, sigmas: angles },
    });
    expectTypeOf(out.radius).toEqualTypeOf<LengthArray<"CGS">>();
    expectTypeOf(out.reason).toEqualTypeOf<Uint8Array>();
    // the one batch contract: indices of invalid rows and a reason for each
    expectTypeOf(out.invalid).toEqualTypeOf<number[]>();
    expectTypeOf(out.reasons).toEqualTypeOf<string[]>();
    expectTypeOf(out).toExtend<BatchResult<StarBatchColumns<"CGS">>>();
    expectTypeOf(out.values.luminosity).toEqualTypeOf<PowerArray<"CGS">>();
    const into = solver.solve(
      {
        apparentBolometricMagnitude: { values: new Float64Array(2), sigmas: new Float64Array(2) },
        angularDiameter: { values: angles, sigmas: angles },
        parallax: { values: angles, sigmas: angles },
      },
      { radius: assumeArray<LengthArray<"CGS">>(new Float64Array(2)) },
    );
    expectTypeOf(into).toExtend<BatchResult<StarBatchOutput<"CGS">>>();
    expectTypeOf(into.values.radius).toEqualTypeOf<LengthArray<"CGS"> | undefined>();
  });
});
