/**
 * Radiation API, compile-time: unit mix-ups that must not compile (each line
 * under `@ts-expect-error`; if it ever compiles the directive is unused and
 * tsc and vitest fail), and honest code that must compile with the right
 * result types.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  div,
  units,
  type Dimensionless,
  type Flux,
  type Frequency,
  type Length,
  type LengthArray,
  type PhotonFlux,
  type PhotonRadiance,
  type PhotonRate,
  type Power,
  type Radiance,
  type SpectralFluxPerFrequency,
  type SpectralFluxPerWavelength,
  type SpectralRadiancePerFrequency,
  type SpectralRadiancePerWavelength,
  type SpectralRadiancePerWavelengthArray,
  type SystemName,
  type Temperature,
  type UnitSystem,
  type Wavenumber,
} from "../../src/quantity/index";
import { constants } from "../../src/constants/index";
import {
  bandMeanRadiance,
  bandMeanRadianceDerivativeT,
  bandPhotonRadianceWavelength,
  bandRadianceWavelength,
  blackbodyFractionBelowWavelength,
  blackbodyFractionBetweenWavelengths,
  brightnessTemperatureFrequency,
  brightnessTemperatureWavelength,
  colourTemperatureFromBandRatio,
  colourTemperatureFromRatio,
  colourTemperatureFromSpectralDensities,
  lambertianExitance,
  luminosityFromRadiusTemperature,
  photonEmissionRate,
  photonExitance,
  planckRadianceFrequency,
  planckRadianceWavelength,
  planckRadianceWavelengthBatch,
  planckRadianceWavelengthDerivativeT,
  planckRadianceWavenumber,
  radiusFromLuminosityTemperature,
  rayleighJeansBrightnessTemperatureFrequency,
  rayleighJeansRadianceWavelength,
  rayleighJeansRelativeErrorWavelength,
  stefanBoltzmannExitance,
  temperatureFromExitance,
  temperatureFromLuminosityRadius,
  temperatureFromPeakWavenumber,
  peakFrequency,
  peakWavelength,
  peakWavenumber,
  wienRadianceFrequency,
  type ResponseCurve,
  type SpectralRadiancePerWavelengthPerTemperature,
} from "../../src/radiation/index";

const tempK = SI.of(5772, units.K);
const lamSI = SI.of(500, units.nm);
const lamCGS = CGS.of(500, units.nm);
const nu = SI.of(600, units.THz);
const kSI = SI.of(2e6, units.per_m);
const kCGS = CGS.of(2e4, units.per_cm);
declare const radianceSI: Radiance<"SI">;
declare const fluxSI: Flux<"SI">;
declare const fluxCGS: Flux<"CGS">;
declare const powerSI: Power<"SI">;
declare const bLambdaSI: SpectralRadiancePerWavelength<"SI">;
declare const bLambdaCGS: SpectralRadiancePerWavelength<"CGS">;
declare const bNuSI: SpectralRadiancePerFrequency<"SI">;
declare const fLambdaSI: SpectralFluxPerWavelength<"SI">;
declare const fNuSI: SpectralFluxPerFrequency<"SI">;
declare const gridSI: LengthArray<"SI">;
declare const gridCGS: LengthArray<"CGS">;
const curveSI: ResponseCurve<"SI"> = { wavelengths: SI.arrayOf([500, 550, 600], units.nm), response: [0, 1, 0] };
const curveCGS: ResponseCurve<"CGS"> = { wavelengths: CGS.arrayOf([500, 550, 600], units.nm), response: [0, 1, 0] };

describe("must not compile: systems never mix", () => {
  test("a CGS wavelength into an SI Planck call", () => {
    // @ts-expect-error cm where m is wanted
    planckRadianceWavelength(SI, lamCGS, tempK);
  });
  test("an SI wavelength into a CGS Planck call", () => {
    // @ts-expect-error m where cm is wanted
    planckRadianceWavelength(CGS, lamSI, tempK);
  });
  test("an SI response curve with the CGS system", () => {
    // @ts-expect-error the curve's wavelengths are in m
    bandMeanRadiance(CGS, curveSI, tempK);
  });
  test("two bands in different systems", () => {
    // @ts-expect-error band2 is in cm
    colourTemperatureFromBandRatio(SI, curveSI, curveCGS, 1.1);
  });
  test("a CGS wavelength grid into an SI batch", () => {
    // @ts-expect-error Float64Array of cm vs m
    planckRadianceWavelengthBatch(SI, gridCGS, tempK);
  });
  test("a CGS exitance into an SI inversion", () => {
    // @ts-expect-error erg s^-1 cm^-2 where W m^-2 is wanted
    temperatureFromExitance(SI, fluxCGS);
  });
  test("a CGS wavenumber into an SI inverse Wien law", () => {
    // @ts-expect-error cm^-1 where m^-1 is wanted
    temperatureFromPeakWavenumber(SI, kCGS);
  });
  test("a CGS radiance with an SI wavelength for the brightness temperature", () => {
    // @ts-expect-error B_λ in CGS, system SI
    brightnessTemperatureWavelength(SI, lamSI, bLambdaCGS);
  });
  test("a CGS result kept as SI", () => {
    // @ts-expect-error the radius comes back in cm
    const r: Length<"SI"> = radiusFromLuminosityTemperature(CGS, constants.Lsun.cgs, tempK);
    void r;
  });
  test("an SI radius from the constants into a CGS luminosity", () => {
    // @ts-expect-error constants.Rsun.si is in m
    luminosityFromRadiusTemperature(CGS, constants.Rsun.si, tempK);
  });
});

describe("must not compile: radiometric kinds never mix", () => {
  test("a radiance where the exitance (a flux) is wanted", () => {
    // @ts-expect-error W m^-2 sr^-1 is not W m^-2: apply lambertianExitance first
    temperatureFromExitance(SI, radianceSI);
  });
  test("a luminosity where an exitance (flux) is wanted", () => {
    // @ts-expect-error W is not W m^-2
    temperatureFromExitance(SI, powerSI);
  });
  test("a flux where a luminosity is wanted", () => {
    // @ts-expect-error W m^-2 is not W
    temperatureFromLuminosityRadius(SI, fluxSI, constants.Rsun.si);
  });
  test("B_ν passed to the brightness temperature for B_λ", () => {
    // @ts-expect-error per Hz vs per m
    brightnessTemperatureWavelength(SI, lamSI, bNuSI);
  });
  test("B_λ passed to the brightness temperature for B_ν", () => {
    // @ts-expect-error per m vs per Hz
    brightnessTemperatureFrequency(SI, nu, bLambdaSI);
  });
  test("a flux density (no sr^-1) where a radiance is wanted", () => {
    // @ts-expect-error f_λ must be divided by the source's solid angle first
    brightnessTemperatureWavelength(SI, lamSI, fLambdaSI);
  });
  test("a flux density f_ν where the radio brightness temperature wants B_ν", () => {
    // @ts-expect-error f_ν has no sr^-1
    rayleighJeansBrightnessTemperatureFrequency(SI, nu, fNuSI);
  });
  test("a frequency where a wavenumber is wanted", () => {
    // @ts-expect-error Hz is not m^-1
    planckRadianceWavenumber(SI, nu, tempK);
  });
  test("a wavenumber where a frequency is wanted", () => {
    // @ts-expect-error m^-1 is not Hz
    planckRadianceFrequency(SI, kSI, tempK);
  });
  test("a wavelength where a wavenumber is wanted (1/λ forgotten)", () => {
    // @ts-expect-error m is not m^-1
    temperatureFromPeakWavenumber(SI, lamSI);
  });
  test("a wavelength where a temperature is wanted", () => {
    // @ts-expect-error m is not K
    peakWavelength(SI, lamSI);
  });
  test("a spectral exitance (π B_λ, per m) where the bolometric exitance is wanted", () => {
    // @ts-expect-error W m^-2 m^-1 is not W m^-2: integrate over the band first
    temperatureFromExitance(CGS, lambertianExitance(rayleighJeansRadianceWavelength(CGS, lamCGS, tempK)));
  });
  test("the exitance kept as a radiance", () => {
    // @ts-expect-error σT⁴ is a flux, not per steradian
    const l: Radiance<"SI"> = stefanBoltzmannExitance(SI, tempK);
    void l;
  });
  test("a band radiance used as a flux without the π", () => {
    // @ts-expect-error per steradian
    const f: Flux<"SI"> = bandRadianceWavelength(SI, lamSI, SI.of(600, units.nm), tempK);
    void f;
  });
  test("photon flux where energy flux is wanted", () => {
    // @ts-expect-error photons s^-1 m^-2 vs W m^-2
    const f: Flux<"SI"> = photonExitance(SI, tempK);
    void f;
  });
  test("a band photon radiance where the energy band radiance is wanted", () => {
    // @ts-expect-error photons vs W
    const r: Radiance<"SI"> = bandPhotonRadianceWavelength(SI, lamSI, SI.of(600, units.nm), tempK);
    void r;
  });
  test("∂B_λ/∂T where B_λ is wanted", () => {
    // @ts-expect-error K^-1
    const b: SpectralRadiancePerWavelength<"SI"> = bandMeanRadianceDerivativeT(SI, curveSI, tempK);
    void b;
  });
  test("the peak frequency where a wavenumber is wanted", () => {
    // @ts-expect-error ν_max is in Hz; σ̃_max has its own function
    const k: Wavenumber<"SI"> = peakFrequency(SI, tempK);
    void k;
  });
  test("F_ν values into the colour temperature from per-wavelength densities", () => {
    // @ts-expect-error a ratio of F_ν gives the wrong temperature
    colourTemperatureFromSpectralDensities(SI, lamSI, fNuSI, SI.of(550, units.nm), fNuSI);
  });
  test("a mixed pair: B_λ over F_λ", () => {
    // @ts-expect-error one radiance, one flux density
    colourTemperatureFromSpectralDensities(SI, lamSI, bLambdaSI, SI.of(550, units.nm), fLambdaSI);
  });
  test("a dimensioned quantity as the ratio", () => {
    // @ts-expect-error the ratio is a pure number
    colourTemperatureFromRatio(SI, lamSI, SI.of(550, units.nm), bLambdaSI);
  });
  test("a fraction read as a radiance", () => {
    // @ts-expect-error band fractions are dimensionless
    const r: Radiance<"SI"> = blackbodyFractionBetweenWavelengths(SI, lamSI, SI.of(600, units.nm), tempK);
    void r;
  });
});

describe("must compile: honest code", () => {
  test("result types follow the system", () => {
    expectTypeOf(planckRadianceWavelength(SI, lamSI, tempK)).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
    expectTypeOf(planckRadianceWavelength(CGS, lamCGS, tempK)).toEqualTypeOf<SpectralRadiancePerWavelength<"CGS">>();
    expectTypeOf(wienRadianceFrequency(CGS, nu, tempK)).toEqualTypeOf<SpectralRadiancePerFrequency<"CGS">>();
    expectTypeOf(planckRadianceWavelengthDerivativeT(CGS, lamCGS, tempK)).toEqualTypeOf<SpectralRadiancePerWavelengthPerTemperature<"CGS">>();
    expectTypeOf(stefanBoltzmannExitance(CGS, tempK)).toEqualTypeOf<Flux<"CGS">>();
    expectTypeOf(luminosityFromRadiusTemperature(SI, constants.Rsun.si, constants.Tsun.si)).toEqualTypeOf<Power<"SI">>();
    expectTypeOf(photonExitance(CGS, tempK)).toEqualTypeOf<PhotonFlux<"CGS">>();
    expectTypeOf(photonEmissionRate(CGS, constants.Rsun.cgs, tempK)).toEqualTypeOf<PhotonRate>();
    expectTypeOf(peakWavelength(CGS, tempK)).toEqualTypeOf<Length<"CGS">>();
    expectTypeOf(peakWavenumber(SI, tempK)).toEqualTypeOf<Wavenumber<"SI">>();
    expectTypeOf(peakFrequency(CGS, tempK)).toEqualTypeOf<Frequency>();
    expectTypeOf(bandPhotonRadianceWavelength(CGS, lamCGS, CGS.of(600, units.nm), tempK)).toEqualTypeOf<PhotonRadiance<"CGS">>();
    expectTypeOf(bandMeanRadiance(CGS, curveCGS, tempK, "photon")).toEqualTypeOf<SpectralRadiancePerWavelength<"CGS">>();
    expectTypeOf(planckRadianceWavelengthBatch(SI, gridSI, tempK).values).toEqualTypeOf<SpectralRadiancePerWavelengthArray<"SI">>();
  });
  test("system-free arguments fit either system", () => {
    const t = CGS.of(5772, units.K); // a temperature built through CGS works in SI calls
    expectTypeOf(temperatureFromExitance(SI, stefanBoltzmannExitance(SI, t))).toEqualTypeOf<Temperature>();
    const f = CGS.of(160, units.GHz);
    expectTypeOf(planckRadianceFrequency(SI, f, constants.Tsun.cgs)).toEqualTypeOf<SpectralRadiancePerFrequency<"SI">>();
  });
  test("pure-number results are Dimensionless and usable as plain numbers", () => {
    const frac = blackbodyFractionBelowWavelength(CGS, lamCGS, tempK);
    expectTypeOf(frac).toEqualTypeOf<Dimensionless>();
    expectTypeOf(rayleighJeansRelativeErrorWavelength(SI, lamSI, tempK)).toEqualTypeOf<Dimensionless>();
    const asNumber: number = frac;
    void asNumber;
  });
  test("the π goes back with lambertianExitance: band radiance → flux", () => {
    const m = lambertianExitance(bandRadianceWavelength(CGS, lamCGS, CGS.of(600, units.nm), tempK));
    expectTypeOf(m).toEqualTypeOf<Flux<"CGS">>();
    expectTypeOf(temperatureFromExitance(CGS, m)).toEqualTypeOf<Temperature>();
  });
  test("colour temperature from a plain ratio, a Dimensionless ratio, or two densities of one kind", () => {
    const b1 = planckRadianceWavelength(SI, lamSI, tempK);
    const b2 = planckRadianceWavelength(SI, SI.of(550, units.nm), tempK);
    expectTypeOf(colourTemperatureFromRatio(SI, lamSI, SI.of(550, units.nm), 1.2)).toEqualTypeOf<Temperature>();
    expectTypeOf(colourTemperatureFromRatio(SI, lamSI, SI.of(550, units.nm), div(b1, b2))).toEqualTypeOf<Temperature>();
    expectTypeOf(colourTemperatureFromSpectralDensities(SI, lamSI, b1, SI.of(550, units.nm), b2)).toEqualTypeOf<Temperature>();
    const f1 = CGS.of(3.1e-9, units.erg_per_s_cm2_A);
    expectTypeOf(colourTemperatureFromSpectralDensities(CGS, lamCGS, f1, CGS.of(550, units.nm), f1)).toEqualTypeOf<Temperature>();
    expectTypeOf(colourTemperatureFromBandRatio(CGS, curveCGS, curveCGS, 1, "energy")).toEqualTypeOf<Temperature>();
  });
  test("generic code over the system keeps S", () => {
    function peakRadiance<S extends SystemName>(sys: UnitSystem<S>, t: Temperature): SpectralRadiancePerWavelength<S> {
      return planckRadianceWavelength(sys, peakWavelength(sys, t), t);
    }
    expectTypeOf(peakRadiance(CGS, tempK)).toEqualTypeOf<SpectralRadiancePerWavelength<"CGS">>();
    expectTypeOf(brightnessTemperatureWavelength(CGS, lamCGS, peakRadiance(CGS, tempK))).toEqualTypeOf<Temperature>();
  });
});
