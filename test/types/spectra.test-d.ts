/**
 * Spectra: unit and medium mix-ups that must not compile, and honest code
 * that must. Each `@ts-expect-error` line is checked by `tsc` and by vitest's
 * typecheck mode: if it ever compiles, the directive is unused and fails.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  assumeArray,
  units,
  type Dimensionless,
  type DimensionlessArray,
  type Energy,
  type Frequency,
  type Length,
  type LengthArray,
  type Mass,
  type SpectralFluxPerWavelengthArray,
  type SpectralRadiancePerWavelengthArray,
  type Velocity,
  type Wavenumber,
  type WavenumberArray,
} from "../../src/quantity/index";
import {
  vacuumFromAir,
  vacuumFromAirBatch,
  airWavelength,
  airWavelengthArray,
  atomicMass,
  observedWavelengthFromRadialVelocity,
  observedWavelengthFromRadialVelocityBatch,
  dopplerWidth,
  equivalentWidth,
  frequencyFromVacuumWavelength,
  gaussianProfile,
  ion,
  ionizationEnergy,
  ions,
  lineCentroid,
  lineDepth,
  lorentzHwhm,
  photonEnergyFromVacuumWavelength,
  photonEnergyFromWavenumber,
  vacuumWavelengthFromPhotonEnergy,
  radialVelocityFromWavelengths,
  redshiftFromRadialVelocity,
  redshiftFromWavelengths,
  seriesVacuumWavelengths,
  synthesizePlanckSpectrum,
  synthesizeSpectrum,
  transitionEnergy,
  transitionFrequency,
  transitionVacuumWavelength,
  transitionWavenumber,
  airFromVacuum,
  airFromVacuumBatch,
  vacuumWavelength,
  vacuumWavelengthArray,
  radialVelocityFromRedshift,
  voigtFwhm,
  voigtProfileBatch,
  wavenumberFromVacuumWavelength,
  type AirWavelength,
  type AirWavelengthArray,
  type SynthesisLine,
  type VacuumWavelength,
  type VacuumWavelengthArray,
} from "../../src/spectra/index";

const vacSI = vacuumWavelength(SI, SI.of(656.46, units.nm));
const airSI = airWavelength(SI, SI.of(656.28, units.nm));
const plainSI = SI.of(500, units.nm);
const vacCGS = vacuumWavelength(CGS, CGS.of(6564.6, units.angstrom));
const lenCGS = CGS.of(1, units.angstrom);
const widthSI = SI.of(0.03, units.nm);
const freq = SI.of(456, units.THz);
const vSI = SI.of(30, units.km_per_s);
const vCGS = CGS.of(30, units.km_per_s);
const ergs = CGS.of(1e-12, units.erg);
const joules = SI.of(1e-19, units.J);
const z: Dimensionless = redshiftFromRadialVelocity(SI, vSI);
const gridSI = SI.arrayOf([656.0, 656.5, 657.0], units.nm);
const gridCGS = CGS.arrayOf([6560, 6565, 6570], units.angstrom);
const airGridSI = airWavelengthArray(SI, SI.arrayOf([656.0, 656.5, 657.0], units.nm));
const vacGridSI = vacuumWavelengthArray(SI, SI.arrayOf([656.0, 656.5, 657.0], units.nm));
declare const contSI: SpectralFluxPerWavelengthArray<"SI">;
declare const contCGS: SpectralFluxPerWavelengthArray<"CGS">;
declare const radianceSI: SpectralRadiancePerWavelengthArray<"SI">;
declare const normalised: DimensionlessArray;
declare function wantsVacuumSI(w: VacuumWavelength<"SI">): void;
declare function wantsAirSI(w: AirWavelength<"SI">): void;
declare function wantsVacuumArraySI(w: VacuumWavelengthArray<"SI">): void;
declare function wantsLengthSI(w: Length<"SI">): void;

describe("medium mix-ups that must not compile", () => {
  test("a vacuum wavelength where an air wavelength is expected", () => {
    // @ts-expect-error vacuumFromAir needs an AirWavelength
    vacuumFromAir(SI, vacSI);
  });
  test("an air wavelength where a vacuum wavelength is expected", () => {
    // @ts-expect-error airFromVacuum needs a VacuumWavelength
    airFromVacuum(SI, airSI);
  });
  test("converting an unbranded length: the conversion demands the medium be stated", () => {
    // @ts-expect-error a plain Length is not known to be in vacuum here
    airFromVacuum(SI, plainSI);
    // @ts-expect-error nor in air
    vacuumFromAir(SI, plainSI);
  });
  test("converting twice does not compile", () => {
    // @ts-expect-error airFromVacuum's result is an air wavelength
    airFromVacuum(SI, airFromVacuum(SI, vacSI));
  });
  test("an air wavelength into a photon conversion (E = hc/λ needs vacuum)", () => {
    // @ts-expect-error photon energy from an air wavelength
    photonEnergyFromVacuumWavelength(SI, airSI);
    // @ts-expect-error frequency from an air wavelength
    frequencyFromVacuumWavelength(SI, airSI);
    // @ts-expect-error wavenumber from an air wavelength
    wavenumberFromVacuumWavelength(SI, airSI);
  });
  test("re-branding an air wavelength as vacuum (and vice versa) does not compile", () => {
    // @ts-expect-error vacuumWavelength rejects an air wavelength
    vacuumWavelength(SI, airSI);
    // @ts-expect-error airWavelength rejects a vacuum wavelength
    airWavelength(SI, vacSI);
    // @ts-expect-error the array brands too
    vacuumWavelengthArray(SI, airGridSI);
  });
  test("line lists are vacuum wavelengths, not air", () => {
    // @ts-expect-error transitionVacuumWavelength returns a VacuumWavelength
    wantsAirSI(transitionVacuumWavelength(SI, ions.H, 2, 3));
    // @ts-expect-error series arrays too
    vacuumFromAirBatch(SI, seriesVacuumWavelengths(SI, ions.H, "balmer", 3));
  });
  test("a Doppler-shifted air wavelength stays air", () => {
    // @ts-expect-error the shift keeps the air brand
    wantsVacuumSI(observedWavelengthFromRadialVelocity(SI, airSI, vSI));
    // @ts-expect-error so does the array version
    wantsVacuumArraySI(observedWavelengthFromRadialVelocityBatch(SI, airGridSI, vSI).values);
  });
  test("observed and rest wavelengths in different media (an 83 km/s error)", () => {
    // @ts-expect-error air observed vs vacuum rest
    redshiftFromWavelengths(SI, airSI, vacSI);
    // @ts-expect-error vacuum observed vs air rest
    radialVelocityFromWavelengths(SI, vacSI, airSI);
  });
  test("synthesis: line centres in another medium than the grid", () => {
    // @ts-expect-error a vacuum line on an air grid
    synthesizeSpectrum(SI, airGridSI, contSI, [{ center: vacSI, dopplerWidth: widthSI, tau0: 1 }]);
    // @ts-expect-error an air line on a vacuum grid
    synthesizeSpectrum(SI, vacGridSI, contSI, [{ center: airSI, dopplerWidth: widthSI, tau0: 1 }]);
  });
  test("a Planck continuum on an air grid (B_λ is per vacuum wavelength)", () => {
    // @ts-expect-error synthesizePlanckSpectrum needs a vacuum or unbranded grid
    synthesizePlanckSpectrum(SI, airGridSI, SI.of(5772, units.K), []);
    // @ts-expect-error and vacuum (or unbranded) line centres
    synthesizePlanckSpectrum(SI, gridSI, SI.of(5772, units.K), [{ center: airSI, dopplerWidth: widthSI, tau0: 1 }]);
  });
  test("a measurement window in another medium than the grid; the centroid keeps the grid's medium", () => {
    // @ts-expect-error vacuum window on an air grid
    equivalentWidth(SI, airGridSI, contSI, contSI, vacSI, vacSI);
    // @ts-expect-error the centroid of an air grid is an air wavelength
    wantsVacuumSI(lineCentroid(SI, airGridSI, contSI, contSI, airSI, airSI));
  });
});

describe("system and dimension mix-ups that must not compile", () => {
  test("a CGS grid with the SI system", () => {
    // @ts-expect-error grid in cm, system SI
    synthesizeSpectrum(SI, gridCGS, contSI, []);
    // @ts-expect-error continuum in CGS, system SI
    synthesizeSpectrum(SI, gridSI, contCGS, []);
    // @ts-expect-error measurement on a CGS grid with SI
    lineDepth(SI, gridCGS, contSI, contSI, plainSI, plainSI);
    // @ts-expect-error Voigt profile over CGS offsets with SI
    voigtProfileBatch(SI, gridCGS, widthSI, widthSI);
  });
  test("a CGS wavelength in an SI call", () => {
    // @ts-expect-error vacuum wavelength in cm, system SI
    photonEnergyFromVacuumWavelength(SI, vacCGS);
    // @ts-expect-error also for the conversions
    airFromVacuum(SI, vacCGS);
    // @ts-expect-error and the line widths
    gaussianProfile(SI, lenCGS, widthSI);
  });
  test("a CGS wavelength in the medium-preserving (generic) functions with SI", () => {
    // @ts-expect-error Doppler shift of a cm wavelength with SI
    observedWavelengthFromRadialVelocity(SI, vacCGS, vSI);
    // @ts-expect-error redshift from cm wavelengths with SI
    redshiftFromWavelengths(SI, vacCGS, vacCGS);
    // @ts-expect-error rest wavelength in cm, observed in m
    radialVelocityFromWavelengths(SI, vacSI, vacCGS);
    // @ts-expect-error a line centre in cm on an SI grid
    synthesizeSpectrum(SI, gridSI, contSI, [{ center: vacCGS, dopplerWidth: widthSI, tau0: 1 }]);
    // @ts-expect-error a window bound in cm on an SI grid
    equivalentWidth(SI, gridSI, contSI, contSI, lenCGS, plainSI);
  });
  test("a frequency where a wavelength is wanted", () => {
    // @ts-expect-error ν is not λ
    photonEnergyFromVacuumWavelength(SI, freq);
    // @ts-expect-error nor a line centre
    dopplerWidth(SI, freq, SI.of(5772, units.K), atomicMass(SI, 56));
  });
  test("a velocity in the wrong system", () => {
    // @ts-expect-error cm/s velocity, SI system
    observedWavelengthFromRadialVelocity(SI, vacSI, vCGS);
    // @ts-expect-error also for the redshift
    redshiftFromRadialVelocity(SI, vCGS);
    // @ts-expect-error and microturbulence
    dopplerWidth(SI, vacSI, SI.of(5772, units.K), atomicMass(SI, 56), vCGS);
  });
  test("an energy in erg (CGS) to an SI call", () => {
    // @ts-expect-error erg into SI
    vacuumWavelengthFromPhotonEnergy(SI, ergs);
    // @ts-expect-error and J into CGS
    vacuumWavelengthFromPhotonEnergy(CGS, joules);
  });
  test("a redshift passed as a velocity, and a velocity as a redshift", () => {
    // @ts-expect-error z is dimensionless
    observedWavelengthFromRadialVelocity(SI, vacSI, z);
    // @ts-expect-error v is not z
    radialVelocityFromRedshift(SI, vSI);
  });
  test("an energy result is not a wavelength, a profile is not a length", () => {
    // @ts-expect-error Energy<"SI"> is not a Length
    wantsLengthSI(transitionEnergy(SI, ions.H, 1, 2));
    // @ts-expect-error the profile is per unit wavelength (1/length)
    wantsLengthSI(gaussianProfile(SI, plainSI, widthSI));
  });
  test("a wavenumber in the other system", () => {
    // @ts-expect-error cm^-1 into an SI call
    photonEnergyFromWavenumber(SI, transitionWavenumber(CGS, ions.H, 2, 3));
  });
  test("a damping constant must be a rate, a mass must be in the system", () => {
    // @ts-expect-error Γ as a velocity
    lorentzHwhm(SI, vacSI, vSI);
    // @ts-expect-error grams with SI
    dopplerWidth(SI, vacSI, SI.of(5772, units.K), atomicMass(CGS, 56));
    // @ts-expect-error a nuclear mass in g with SI
    ion(SI, 3, CGS.of(1.1647e-23, units.g));
  });
  test("flux and continuum of different types; widths of different systems", () => {
    // @ts-expect-error radiance flux against a flux continuum
    equivalentWidth(SI, gridSI, radianceSI, contSI, plainSI, plainSI);
    // @ts-expect-error FWHMs in m and cm
    voigtFwhm(widthSI, lenCGS);
  });
  test("synthesis lines: exactly one width and one strength", () => {
    // @ts-expect-error both a Doppler width and a σ
    const both: SynthesisLine<"SI"> = { center: vacSI, dopplerWidth: widthSI, gaussianSigma: widthSI, tau0: 1 };
    // @ts-expect-error no strength
    const none: SynthesisLine<"SI"> = { center: vacSI, dopplerWidth: widthSI };
    // @ts-expect-error an equivalent width must be a length, not a number
    const w: SynthesisLine<"SI"> = { center: vacSI, dopplerWidth: widthSI, equivalentWidth: 1e-12 };
    // @ts-expect-error τ₀ is dimensionless, not a length
    const t: SynthesisLine<"SI"> = { center: vacSI, dopplerWidth: widthSI, tau0: widthSI };
    void [both, none, w, t];
  });
});

describe("honest code compiles", () => {
  test("line-list functions return typed, branded results", () => {
    expectTypeOf(transitionEnergy(SI, ions.H, 2, 3)).toEqualTypeOf<Energy<"SI">>();
    expectTypeOf(transitionEnergy(CGS, ions.H, 2, 3)).toEqualTypeOf<Energy<"CGS">>();
    expectTypeOf(transitionWavenumber(CGS, ions.HeII, 3, 4)).toEqualTypeOf<Wavenumber<"CGS">>();
    expectTypeOf(transitionFrequency(CGS, ions.D, 1, 2)).toEqualTypeOf<Frequency>();
    expectTypeOf(transitionVacuumWavelength(CGS, ions.H, 1, 2)).toEqualTypeOf<VacuumWavelength<"CGS">>();
    expectTypeOf(seriesVacuumWavelengths(SI, ions.H, "paschen", 4)).toEqualTypeOf<VacuumWavelengthArray<"SI">>();
    expectTypeOf(ionizationEnergy(SI, ions.H)).toEqualTypeOf<Energy<"SI">>();
  });
  test("conversions: vacuum ↔ air, scalar and array", () => {
    expectTypeOf(airFromVacuum(SI, vacSI)).toEqualTypeOf<AirWavelength<"SI">>();
    expectTypeOf(vacuumFromAir(CGS, airFromVacuum(CGS, vacCGS))).toEqualTypeOf<VacuumWavelength<"CGS">>();
    expectTypeOf(airFromVacuumBatch(SI, vacGridSI).values).toEqualTypeOf<AirWavelengthArray<"SI">>();
  });
  test("a branded wavelength is still a Length; an unbranded Length counts as vacuum where vacuum is needed", () => {
    wantsLengthSI(vacSI);
    wantsLengthSI(airSI);
    expectTypeOf(photonEnergyFromVacuumWavelength(SI, plainSI)).toEqualTypeOf<Energy<"SI">>();
    expectTypeOf(photonEnergyFromVacuumWavelength(SI, vacSI)).toEqualTypeOf<Energy<"SI">>();
    expectTypeOf(vacuumWavelengthFromPhotonEnergy(CGS, CGS.of(2, units.eV))).toEqualTypeOf<VacuumWavelength<"CGS">>();
    expectTypeOf(SI.valueIn(vacSI, units.nm)).toEqualTypeOf<number>();
  });
  test("Doppler: shifts keep the input's type; redshift and velocity", () => {
    expectTypeOf(observedWavelengthFromRadialVelocity(SI, airSI, vSI)).toEqualTypeOf<AirWavelength<"SI">>();
    expectTypeOf(observedWavelengthFromRadialVelocity(SI, vacSI, vSI, "classical")).toEqualTypeOf<VacuumWavelength<"SI">>();
    expectTypeOf(observedWavelengthFromRadialVelocity(SI, plainSI, vSI)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(observedWavelengthFromRadialVelocityBatch(CGS, gridCGS, vCGS).values).toEqualTypeOf<LengthArray<"CGS">>();
    expectTypeOf(redshiftFromRadialVelocity(CGS, vCGS)).toEqualTypeOf<Dimensionless>();
    expectTypeOf(radialVelocityFromRedshift(SI, 0.1)).toEqualTypeOf<Velocity<"SI">>();
    expectTypeOf(radialVelocityFromRedshift(CGS, z)).toEqualTypeOf<Velocity<"CGS">>();
    // same medium, or one side unbranded
    expectTypeOf(redshiftFromWavelengths(SI, airSI, airSI)).toEqualTypeOf<Dimensionless>();
    expectTypeOf(redshiftFromWavelengths(SI, airSI, plainSI)).toEqualTypeOf<Dimensionless>();
    expectTypeOf(redshiftFromWavelengths(SI, plainSI, vacSI)).toEqualTypeOf<Dimensionless>();
  });
  test("profiles and widths", () => {
    expectTypeOf(gaussianProfile(CGS, lenCGS, lenCGS)).toEqualTypeOf<Wavenumber<"CGS">>();
    expectTypeOf(voigtProfileBatch(SI, gridSI, widthSI, widthSI).values).toEqualTypeOf<WavenumberArray<"SI">>();
    expectTypeOf(dopplerWidth(SI, airSI, SI.of(5772, units.K), atomicMass(SI, 55.845), vSI)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(lorentzHwhm(CGS, vacCGS, SI.of(1e8, units.Hz))).toEqualTypeOf<Length<"CGS">>();
    expectTypeOf(atomicMass(CGS, 1.008)).toEqualTypeOf<Mass<"CGS">>();
    expectTypeOf(voigtFwhm(widthSI, widthSI)).toEqualTypeOf<Length<"SI">>();
  });
  test("synthesis and measurement: any continuum type, result of the same type", () => {
    const lines: SynthesisLine<"SI">[] = [
      { center: vacSI, dopplerWidth: widthSI, tau0: 0.5 },
      { center: plainSI, gaussianSigma: widthSI, lorentzHwhm: widthSI, equivalentWidth: SI.of(0.01, units.nm) },
    ];
    expectTypeOf(synthesizeSpectrum(SI, gridSI, contSI, lines).flux).toEqualTypeOf<SpectralFluxPerWavelengthArray<"SI">>();
    expectTypeOf(synthesizeSpectrum(SI, vacGridSI, radianceSI, lines).flux).toEqualTypeOf<SpectralRadiancePerWavelengthArray<"SI">>();
    expectTypeOf(synthesizeSpectrum(CGS, gridCGS, normalised, []).flux).toEqualTypeOf<DimensionlessArray>();
    // air lines on an air grid, and on an unbranded one
    expectTypeOf(synthesizeSpectrum(SI, airGridSI, contSI, [{ center: airSI, dopplerWidth: widthSI, tau0: 1 }]).invalid).toEqualTypeOf<number[]>();
    expectTypeOf(synthesizeSpectrum(SI, gridSI, contSI, [{ center: airSI, dopplerWidth: widthSI, tau0: z }]).invalid).toEqualTypeOf<number[]>();
    expectTypeOf(synthesizePlanckSpectrum(CGS, gridCGS, SI.of(5772, units.K), []).flux).toEqualTypeOf<SpectralRadiancePerWavelengthArray<"CGS">>();
    expectTypeOf(equivalentWidth(SI, gridSI, contSI, contSI, plainSI, vacSI)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(lineCentroid(SI, airGridSI, contSI, contSI, airSI, plainSI)).toEqualTypeOf<AirWavelength<"SI">>();
    expectTypeOf(lineCentroid(SI, gridSI, contSI, contSI, airSI, plainSI)).toEqualTypeOf<Length<"SI">>();
    expectTypeOf(lineDepth(CGS, gridCGS, normalised, normalised, lenCGS, lenCGS)).toEqualTypeOf<Dimensionless>();
    const flux = assumeArray<DimensionlessArray>(new Float64Array(3));
    expectTypeOf(lineDepth(SI, vacGridSI, flux, normalised, vacSI, plainSI)).toEqualTypeOf<Dimensionless>();
  });
});
