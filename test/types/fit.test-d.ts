/**
 * Blackbody fitting: unit mix-ups that must not compile (each line under a
 * `@ts-expect-error`; if it ever compiles the directive is unused and both
 * tsc and vitest fail) and honest calls that must (expectTypeOf).
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  blackbodyComponentSI,
  ccm89AttenuationSI,
  createSedFitterSI,
  sedModelSI,
  type ParameterEstimateSI,
  type SedComponentSI,
  type SedFitSI,
  createBlackbodyFitter,
  fitBlackbody,
  fitBlackbodySpectrum,
  gaussianBand,
  responseBand,
  stellarParametersFromFit,
  topHatBand,
  type BandObservation,
  type BlackbodyFit,
  type BlackbodyFitter,
  type BlackbodySpectrumFit,
  type FitBand,
  type StellarParameters,
} from "../../src/fit/index";
import {
  CGS,
  SI,
  assumeArray,
  units,
  type Angle,
  type Dimensionless,
  type Flux,
  type Length,
  type LengthArray,
  type Power,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SpectralFluxPerWavelengthArray,
  type SpectralRadiancePerWavelength,
  type SpectralRadiancePerWavelengthArray,
  type Temperature,
} from "../../src/quantity/index";

const vSI = gaussianBand(SI, SI.of(550, units.nm), SI.of(90, units.nm));
const vCGS = gaussianBand(CGS, CGS.of(5500, units.angstrom), CGS.of(900, units.angstrom));
const fLambdaSI = SI.of(3.6e-2, units.W_per_m2_Hz) as unknown as SpectralFluxPerWavelength<"SI">;
declare const fLambdaCGS: SpectralFluxPerWavelength<"CGS">;
declare const fNuSI: SpectralFluxPerFrequency<"SI">;
declare const bLambdaSI: SpectralRadiancePerWavelength<"SI">;
declare const gridSI: LengthArray<"SI">;
declare const gridCGS: LengthArray<"CGS">;
declare const fluxArraySI: SpectralFluxPerWavelengthArray<"SI">;
declare const radianceArraySI: SpectralRadiancePerWavelengthArray<"SI">;
declare const fit: BlackbodyFit<"SI">;

describe("fit: must not compile", () => {
  test("CGS fluxes with the SI system", () => {
    // @ts-expect-error f_λ in erg s⁻¹ cm⁻² cm⁻¹ given to an SI fit
    fitBlackbody(SI, [{ band: vSI, fluxPerWavelength: fLambdaCGS, sigma: fLambdaCGS }]);
  });
  test("a CGS band in an SI fit", () => {
    // @ts-expect-error band built with CGS wavelengths
    fitBlackbody(SI, [{ band: vCGS, fluxPerWavelength: fLambdaSI, sigma: fLambdaSI }]);
  });
  test("f_ν data where f_λ is declared", () => {
    // @ts-expect-error fluxPerWavelength must be a flux density per unit wavelength
    fitBlackbody(SI, [{ band: vSI, fluxPerWavelength: fNuSI, sigma: fNuSI }]);
  });
  test("f_λ uncertainty with f_ν data", () => {
    // @ts-expect-error sigma must have the dimension of the value it qualifies
    fitBlackbody(SI, [{ band: vSI, fluxPerFrequency: fNuSI, sigma: fLambdaSI }]);
  });
  test("a radiance where a flux density is expected", () => {
    // @ts-expect-error B_λ (per steradian) is not a flux density: multiply by a solid angle first
    fitBlackbody(SI, [{ band: vSI, fluxPerWavelength: bLambdaSI, sigma: bLambdaSI }]);
  });
  test("a radiance spectrum where a flux-density spectrum is expected", () => {
    // @ts-expect-error spectrum.fluxPerWavelength must be f_λ, not B_λ
    fitBlackbodySpectrum(SI, { wavelengths: gridSI, fluxPerWavelength: radianceArraySI, sigma: fluxArraySI });
  });
  test("CGS wavelengths in an SI spectrum fit", () => {
    // @ts-expect-error wavelengths in cm with the SI system
    fitBlackbodySpectrum(SI, { wavelengths: gridCGS, fluxPerWavelength: fluxArraySI, sigma: fluxArraySI });
  });
  test("a length given as an AB magnitude", () => {
    // @ts-expect-error abMagnitude is a pure number (mag)
    fitBlackbody(SI, [{ band: vSI, abMagnitude: SI.of(1, units.m), sigma: 0.02 }]);
  });
  test("band centre as an angle, band grid in the other system", () => {
    // @ts-expect-error the centre of a band is a wavelength
    topHatBand(SI, SI.of(1, units.arcsec), SI.of(90, units.nm));
    // @ts-expect-error wavelength grid in CGS for an SI band
    responseBand(SI, gridCGS, [0, 1, 0], "photon");
  });
  test("temperature range given as lengths", () => {
    // @ts-expect-error temperatureRange takes temperatures
    fitBlackbody(SI, [], { temperatureRange: [SI.of(1, units.m), SI.of(2, units.m)] });
  });
  test("hand-off: distance as an angle, parallax as a length, CGS distance with SI", () => {
    // @ts-expect-error a distance is a length
    stellarParametersFromFit(SI, fit, { distance: SI.of(1, units.mas), sigma: SI.of(1, units.mas) });
    // @ts-expect-error a parallax is an angle
    stellarParametersFromFit(SI, fit, { parallax: SI.of(10, units.pc), sigma: SI.of(1, units.pc) });
    // @ts-expect-error a CGS distance with the SI system
    stellarParametersFromFit(SI, fit, { distance: CGS.of(10, units.pc), sigma: CGS.of(1, units.pc) });
  });
  test("a reusable SI fitter given CGS data or CGS bands", () => {
    const fitter = createBlackbodyFitter(SI, [vSI, vSI]);
    // @ts-expect-error CGS f_λ for an SI fitter
    fitter.fit([{ fluxPerWavelength: fLambdaCGS, sigma: fLambdaCGS }]);
    // @ts-expect-error a CGS band in an SI fitter
    createBlackbodyFitter(SI, [vSI, vCGS]);
  });
  test("results keep their dimensions", () => {
    // @ts-expect-error a temperature is not a length
    const l: Length<"SI"> = fit.temperature;
    // @ts-expect-error an angular diameter is not a dimensionless A_V
    const a: Dimensionless = fit.angularDiameter;
    void l;
    void a;
  });
});

describe("fit: must compile", () => {
  test("SI photometry: f_λ, f_ν (Jy) and AB magnitudes mixed", () => {
    const obs: BandObservation<"SI">[] = [
      { band: vSI, fluxPerWavelength: fLambdaSI, sigma: fLambdaSI },
      { band: vSI, fluxPerFrequency: SI.of(3.1, units.mJy), sigma: SI.of(0.05, units.mJy) },
      { band: vSI, abMagnitude: 9.1, sigma: 0.02 },
    ];
    const r = fitBlackbody(SI, obs, { extinction: { rV: 3.1 }, temperatureRange: [SI.of(2000, units.K), SI.of(50000, units.K)] });
    expectTypeOf(r).toEqualTypeOf<BlackbodyFit<"SI">>();
    expectTypeOf(r.temperature).toEqualTypeOf<Temperature>();
    expectTypeOf(r.angularDiameter).toEqualTypeOf<Angle>();
    expectTypeOf(r.extinctionAV).toEqualTypeOf<Dimensionless>();
    expectTypeOf(r.modelFluxPerWavelength).toEqualTypeOf<SpectralFluxPerWavelengthArray<"SI">>();
    expectTypeOf(r.si.temperatureK).toEqualTypeOf<number>();
  });
  test("CGS photometry and spectrum", () => {
    const r = fitBlackbody(CGS, [{ band: vCGS, fluxPerWavelength: fLambdaCGS, sigma: fLambdaCGS }]);
    expectTypeOf(r.modelFluxPerWavelength).toEqualTypeOf<SpectralFluxPerWavelengthArray<"CGS">>();
    expectTypeOf(vCGS).toEqualTypeOf<FitBand<"CGS">>();
    expectTypeOf(vCGS.pivotWavelength).toEqualTypeOf<Length<"CGS">>();
    const s = fitBlackbodySpectrum(CGS, {
      wavelengths: gridCGS,
      fluxPerWavelength: assumeArray<SpectralFluxPerWavelengthArray<"CGS">>(new Float64Array(3)),
      sigma: assumeArray<SpectralFluxPerWavelengthArray<"CGS">>(new Float64Array(3)),
      exclude: [false, true, false],
    });
    expectTypeOf(s).toEqualTypeOf<BlackbodySpectrumFit<"CGS">>();
  });
  test("reusable fitter", () => {
    const fitter = createBlackbodyFitter(CGS, [vCGS, vCGS, vCGS], { extinction: {} });
    expectTypeOf(fitter).toEqualTypeOf<BlackbodyFitter<"CGS">>();
    expectTypeOf(fitter.fit([{ abMagnitude: 9, sigma: 0.02 }, { fluxPerWavelength: fLambdaCGS, sigma: fLambdaCGS }, { fluxPerFrequency: CGS.of(1, units.Jy), sigma: CGS.of(0.1, units.Jy) }])).toEqualTypeOf<BlackbodyFit<"CGS">>();
  });
  test("hand-off in SI and CGS; a fit from either system", () => {
    const a = stellarParametersFromFit(SI, fit, { parallax: SI.of(10, units.mas), sigma: SI.of(0.1, units.mas) });
    expectTypeOf(a).toEqualTypeOf<StellarParameters<"SI">>();
    expectTypeOf(a.radius).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(a.luminosity).toEqualTypeOf<Power<"SI">>();
    expectTypeOf(a.bolometricFlux).toEqualTypeOf<Flux<"SI">>();
    const b = stellarParametersFromFit(CGS, fit, { distance: CGS.of(100, units.pc), sigma: CGS.of(1, units.pc) });
    expectTypeOf(b.luminosity).toEqualTypeOf<Power<"CGS">>();
  });
  test("composable SED models: terms, attenuation, estimates; an incomplete component or a bad transform does not compile", () => {
    const model = sedModelSI([{ component: blackbodyComponentSI(), attenuation: ccm89AttenuationSI(3.1), label: "star" }]);
    const fit = createSedFitterSI([vCGS.si, vCGS.si], model).fit([1, 2], [0.1, 0.2], [0, 0]);
    expectTypeOf(fit).toEqualTypeOf<SedFitSI>();
    expectTypeOf(fit.parameters).toEqualTypeOf<ParameterEstimateSI[]>();
    // @ts-expect-error a component needs prepare(), its shape evaluator
    const noEvaluator: SedComponentSI = { kind: "x", parameters: [], amplitudeIndex: 0, amplitudeConstant: 1, amplitudePower: 1 };
    // @ts-expect-error the internal coordinate is "log" or "linear"
    const badTransform: SedComponentSI["parameters"][number] = { name: "t", unit: "K", transform: "sqrt", lower: 1, upper: 2, start: 1 };
    // @ts-expect-error a term takes a component, not a bare model
    sedModelSI([{ component: model }]);
    void noEvaluator;
    void badTransform;
  });
});
