/**
 * Radiation laws are written for vacuum wavelengths: an air wavelength must
 * not reach them (convert it with vacuumFromAir first); vacuum or unbranded
 * lengths are fine.
 */
import { describe, expectTypeOf, test } from "vitest";
import { SI, units } from "../../src/quantity/index";
import {
  brightnessTemperatureWavelength,
  planckRadianceWavelength,
  planckRadianceWavelengthBatch,
  type SpectralRadiancePerWavelength,
} from "../../src/index";
import { vacuumFromAir, airWavelength, airWavelengthArray, vacuumWavelength } from "../../src/spectra/index";

const T = SI.of(5772, units.K);
const air = airWavelength(SI, SI.of(656.28, units.nm));

describe("air wavelengths never reach vacuum-wavelength laws", () => {
  test("Planck B_λ at an air wavelength", () => {
    // @ts-expect-error convert with vacuumFromAir first
    planckRadianceWavelength(SI, air, T);
  });
  test("a Planck batch over an air grid", () => {
    const grid = airWavelengthArray(SI, SI.arrayOf([500, 600], units.nm));
    // @ts-expect-error an air grid
    planckRadianceWavelengthBatch(SI, grid, T);
  });
  test("brightness temperature at an air wavelength", () => {
    const b = planckRadianceWavelength(SI, SI.of(500, units.nm), T);
    // @ts-expect-error an air wavelength
    brightnessTemperatureWavelength(SI, air, b);
  });
  test("vacuum, converted and unbranded wavelengths are accepted", () => {
    const viaVacuum = planckRadianceWavelength(SI, vacuumFromAir(SI, air), T);
    const plain = planckRadianceWavelength(SI, SI.of(500, units.nm), T);
    const vac = planckRadianceWavelength(SI, vacuumWavelength(SI, SI.of(500, units.nm)), T);
    expectTypeOf(viaVacuum).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
    expectTypeOf(plain).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
    expectTypeOf(vac).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
  });
});
