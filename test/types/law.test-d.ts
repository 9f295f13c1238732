/**
 * A law you define with `defineLaw` gets a checked signature: the system
 * first, then each input in that system (system-free kinds in either), plain
 * numbers for dimensionless inputs, a vacuum-only wavelength where declared,
 * and a result typed in the caller's system. Must-compile cases use
 * `expectTypeOf`; must-not-compile cases are lines under `@ts-expect-error`.
 */
import { describe, expectTypeOf, test } from "vitest";
import {
  CGS,
  SI,
  assume,
  assumeArray,
  defineLaw,
  kinds,
  lawInput,
  units,
  type Area,
  type BatchResult,
  type Dimensionless,
  type Energy,
  type Frequency,
  type FrequencyArray,
  type Length,
  type NotAirWavelength,
  type SpectralRadiancePerFrequency,
  type SpectralRadiancePerFrequencyArray,
  type SpectralRadiancePerWavelength,
  type SpectralRadiancePerWavelengthArray,
  type SystemName,
  type Temperature,
  type TemperatureArray,
  type UnitSystem,
} from "../../src/index";
import { airWavelength, airWavelengthArray, vacuumWavelength } from "../../src/spectra/index";

const frequency = lawInput("frequency", kinds.frequency);
const temperature = lawInput("temperature", kinds.temperature);
const beta = lawInput("beta", kinds.dimensionless, { check: "finite" });
const nu0 = lawInput("nu0", kinds.frequency);
const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
const side = lawInput("side", kinds.length);

/** A modified blackbody shape (the numbers do not matter here, only the types). */
const dust = defineLaw({
  name: "S_ν",
  inputs: [frequency, temperature, beta, nu0],
  result: kinds.spectralRadiancePerFrequency,
  kernel: (f, t, b, f0) => (f / f0) ** b * f * t,
});
const bLambda = defineLaw({
  name: "B_λ",
  inputs: [wavelength, temperature],
  result: kinds.spectralRadiancePerWavelength,
  kernel: (l, t) => t / l,
});
const rectangle = defineLaw({ name: "area", inputs: [side, side], result: kinds.area, kernel: (a, b) => a * b });
const constant = defineLaw({ name: "E0", inputs: [], result: kinds.energy, kernel: () => 1 });

const T = SI.of(20, units.K);
const nuSI = SI.of(353, units.GHz);
const lamSI = SI.of(500, units.nm);
const lamCGS = CGS.of(5000, units.angstrom);
const air = airWavelength(SI, SI.of(656.28, units.nm));
const freqs = assumeArray<FrequencyArray>(new Float64Array([1e11, 3e11]));
const temps = assumeArray<TemperatureArray>(new Float64Array([15, 20]));

describe("must compile: a user-defined law's signature", () => {
  test("SI call: the result is in SI", () => {
    expectTypeOf(dust(SI, nuSI, T, 1.8, nuSI)).toEqualTypeOf<SpectralRadiancePerFrequency<"SI">>();
  });
  test("CGS call: the same law, result in CGS", () => {
    expectTypeOf(dust(CGS, CGS.of(353, units.GHz), CGS.of(20, units.K), 1.8, nuSI)).toEqualTypeOf<SpectralRadiancePerFrequency<"CGS">>();
  });
  test("system-free kinds (frequency, temperature) made in SI fit a CGS call", () => {
    const f: Frequency = nuSI;
    const t: Temperature = T;
    expectTypeOf(dust(CGS, f, t, 2, f)).toEqualTypeOf<SpectralRadiancePerFrequency<"CGS">>();
  });
  test("a dimensionless input takes a plain number or a Dimensionless quantity", () => {
    expectTypeOf(dust(SI, nuSI, T, 1.5, nuSI)).toEqualTypeOf<SpectralRadiancePerFrequency<"SI">>();
    expectTypeOf(dust(SI, nuSI, T, assume<Dimensionless>(1.5), nuSI)).toEqualTypeOf<SpectralRadiancePerFrequency<"SI">>();
  });
  test("a vacuum input takes unbranded and vacuum-branded lengths of the call's system", () => {
    expectTypeOf(bLambda(SI, lamSI, T)).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
    expectTypeOf(bLambda(SI, vacuumWavelength(SI, lamSI), T)).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
    expectTypeOf(bLambda(CGS, lamCGS, T)).toEqualTypeOf<SpectralRadiancePerWavelength<"CGS">>();
  });
  test("two inputs of one system-bound kind", () => {
    expectTypeOf(rectangle(SI, SI.of(2, units.m), SI.of(3, units.m))).toEqualTypeOf<Area<"SI">>();
    expectTypeOf(rectangle(CGS, CGS.of(2, units.cm), CGS.of(3, units.cm))).toEqualTypeOf<Area<"CGS">>();
  });
  test("a law with no inputs takes only the system", () => {
    expectTypeOf(constant(SI)).toEqualTypeOf<Energy<"SI">>();
    expectTypeOf(constant(CGS)).toEqualTypeOf<Energy<"CGS">>();
  });
  test("batch: an array and a shared value", () => {
    const grid = SI.arrayOf([400, 500], units.nm);
    expectTypeOf(bLambda.batch(SI, grid, T)).toEqualTypeOf<BatchResult<SpectralRadiancePerWavelengthArray<"SI">>>();
    expectTypeOf(bLambda.batch(CGS, lamCGS, temps)).toEqualTypeOf<BatchResult<SpectralRadiancePerWavelengthArray<"CGS">>>();
  });
  test("batch: arrays and values mixed freely, a Float64Array for a dimensionless input", () => {
    const betas = new Float64Array([1.5, 2]);
    expectTypeOf(dust.batch(SI, freqs, temps, betas, nuSI)).toEqualTypeOf<BatchResult<SpectralRadiancePerFrequencyArray<"SI">>>();
    expectTypeOf(dust.batch(CGS, nuSI, T, 1.7, freqs)).toEqualTypeOf<BatchResult<SpectralRadiancePerFrequencyArray<"CGS">>>();
  });
  test("an exported wrapper with a declared signature needs no cast (as planck.ts does)", () => {
    function modifiedBlackbody<S extends SystemName>(sys: UnitSystem<S>, f: Frequency, t: Temperature, b: number, f0: Frequency): SpectralRadiancePerFrequency<S> {
      return dust(sys, f, t, b, f0);
    }
    function planckish<S extends SystemName>(sys: UnitSystem<S>, l: NotAirWavelength<NoInfer<S>>, t: Temperature): SpectralRadiancePerWavelength<S> {
      return bLambda(sys, l, t);
    }
    expectTypeOf(modifiedBlackbody(CGS, nuSI, T, 2, nuSI)).toEqualTypeOf<SpectralRadiancePerFrequency<"CGS">>();
    expectTypeOf(planckish(SI, lamSI, T)).toEqualTypeOf<SpectralRadiancePerWavelength<"SI">>();
  });
  test("the kernel's parameters are plain numbers, one per input", () => {
    expectTypeOf(dust.kernel).toBeFunction();
    defineLaw({ name: "k", inputs: [side, temperature], result: kinds.length, kernel: (a: number, b: number) => a * b });
    // a kernel may ignore trailing inputs (fewer parameters is fine in TypeScript)
    defineLaw({ name: "k", inputs: [side, temperature], result: kinds.length, kernel: (a: number) => a });
  });
  test("the declared inputs keep their order and kinds", () => {
    expectTypeOf(bLambda.inputs).toEqualTypeOf<readonly [typeof wavelength, typeof temperature]>();
  });
});

describe("must not compile: misuse of a user-defined law", () => {
  test("a CGS length in an SI call", () => {
    // @ts-expect-error cm where m is wanted
    bLambda(SI, lamCGS, T);
  });
  test("an SI length in a CGS call", () => {
    // @ts-expect-error m where cm is wanted
    rectangle(CGS, SI.of(2, units.m), CGS.of(3, units.cm));
  });
  test("mixed systems between two inputs of one call", () => {
    // @ts-expect-error the second side is in cm
    rectangle(SI, SI.of(2, units.m), CGS.of(3, units.cm));
  });
  test("a wrong kind: a frequency where a wavelength is wanted", () => {
    // @ts-expect-error frequency is not a length
    bLambda(SI, nuSI, T);
  });
  test("a wrong kind: a temperature where a frequency is wanted", () => {
    // @ts-expect-error temperature and frequency swapped
    dust(SI, T, nuSI, 1.8, nuSI);
  });
  test("a dimensionful quantity into a dimensionless input", () => {
    // @ts-expect-error a length is not a pure number
    dust(SI, nuSI, T, SI.of(1, units.m), nuSI);
  });
  test("a plain number where a length is wanted", () => {
    // @ts-expect-error a plain number has no unit
    bLambda(SI, 5e-7, T);
  });
  test("an air wavelength into a vacuum: true input", () => {
    // @ts-expect-error convert with vacuumFromAir first
    bLambda(SI, air, T);
  });
  test("an air grid into the batch form of a vacuum: true input", () => {
    // @ts-expect-error an air grid
    bLambda.batch(SI, airWavelengthArray(SI, SI.arrayOf([500, 600], units.nm)), T);
  });
  test("too few arguments", () => {
    // @ts-expect-error temperature is missing
    bLambda(SI, lamSI);
  });
  test("too many arguments", () => {
    // @ts-expect-error the law has two inputs
    bLambda(SI, lamSI, T, T);
  });
  test("the system is missing", () => {
    // @ts-expect-error the system comes first
    bLambda(lamSI, T);
  });
  test("the result assigned to the wrong kind", () => {
    // @ts-expect-error B_ν is not B_λ
    const b: SpectralRadiancePerWavelength<"SI"> = dust(SI, nuSI, T, 1.8, nuSI);
    void b;
  });
  test("the result assigned to the wrong system", () => {
    // @ts-expect-error an SI call returns SI
    const b: SpectralRadiancePerFrequency<"CGS"> = dust(SI, nuSI, T, 1.8, nuSI);
    void b;
  });
  test("a batch array in the other system", () => {
    // @ts-expect-error the grid is in m, the call in CGS
    bLambda.batch(CGS, SI.arrayOf([400, 500], units.nm), T);
  });
  test("a batch result taken as a plain scalar result", () => {
    // @ts-expect-error .batch returns a BatchResult
    const b: SpectralRadiancePerWavelength<"SI"> = bLambda.batch(SI, lamSI, T);
    void b;
  });
  test("a kernel with more parameters than the law has inputs", () => {
    // @ts-expect-error the law has two inputs, the kernel wants three
    defineLaw({ name: "k", inputs: [side, temperature], result: kinds.length, kernel: (a: number, b: number, c: number) => a * b * c });
  });
  test("a kernel that does not return a number", () => {
    // @ts-expect-error a kernel returns the SI number
    defineLaw({ name: "k", inputs: [side], result: kinds.length, kernel: (a: number) => `${a}` });
  });
  test("an input that does not come from lawInput", () => {
    // @ts-expect-error inputs are declared with lawInput
    defineLaw({ name: "k", inputs: [{ name: "x", kind: kinds.length }], result: kinds.length, kernel: (a: number) => a });
  });
  test("a wrapper that declares the wrong result", () => {
    function wrong<S extends SystemName>(sys: UnitSystem<S>, l: Length<NoInfer<S>>, t: Temperature): SpectralRadiancePerFrequency<S> {
      // @ts-expect-error the law returns B_λ
      return bLambda(sys, l, t);
    }
    void wrong;
  });
});
