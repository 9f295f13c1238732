/**
 * Every scalar law of the typed radiation API, called in CGS, returns exactly
 * its SI result times a power of ten fixed by the result's unit, when its SI
 * arguments are the CGS ones moved to SI by their own power of ten. Both
 * moves are one correctly rounded multiplication or division by an exact
 * double (10^|n|, |n| ≤ 22), so the kernel sees the same numbers in both
 * calls and the comparison is exact (`toBe`), not a tolerance.
 *
 * The powers of ten are written out here from the units, not taken from the
 * toolkit: 1 cm = 10⁻² m, 1 erg = 10⁻⁷ J, 1 g = 10⁻³ kg.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CGS, SI } from "../quantity/system";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import * as approximations from "./approximations";
import * as band from "./band";
import * as brightness from "./brightness-temperature";
import * as planck from "./planck";
import * as sb from "./stefan-boltzmann";
import * as wien from "./wien";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true }).map((u) => Math.exp(u));

/** v × 10ⁿ as one correctly rounded operation on an exact double (|n| ≤ 22). */
function times10(v: number, n: number): number {
  return n >= 0 ? v * Number(`1e${n}`) : v / Number(`1e${-n}`);
}

/** An argument: its CGS range and n such that its SI value is CGS × 10ⁿ. */
interface Arg {
  readonly lo: number;
  readonly hi: number;
  readonly toSI: number;
}
interface Case {
  readonly name: string;
  readonly f: (sys: UnitSystem<SystemName>, ...args: number[]) => number;
  readonly args: readonly Arg[];
  /** k such that the CGS result is the SI result × 10ᵏ. */
  readonly toCGS: number;
  /** Optional map of drawn CGS arguments (e.g. make λ₂ ≥ λ₁). */
  readonly shape?: (args: number[]) => number[];
}

// CGS ranges (cm, cm⁻¹, erg s⁻¹, …) wide enough to cross each law's regimes, narrow enough that no result overflows.
const lambdaCm: Arg = { lo: 1e-7, hi: 10, toSI: -2 }; // cm → m
const nuHz: Arg = { lo: 1e8, hi: 1e17, toSI: 0 }; // Hz in both
const sigmaPerCm: Arg = { lo: 0.1, hi: 1e7, toSI: 2 }; // cm⁻¹ → m⁻¹
const tempK: Arg = { lo: 1, hi: 1e6, toSI: 0 }; // K in both
const wideTempK: Arg = { lo: 1e-2, hi: 1e10, toSI: 0 };
const radiusCm: Arg = { lo: 1e-1, hi: 1e17, toSI: -2 };
const luminosityErgS: Arg = { lo: 1e10, hi: 1e40, toSI: -7 }; // erg s⁻¹ → W
const exitanceCgs: Arg = { lo: 1e-10, hi: 1e30, toSI: -3 }; // erg s⁻¹ cm⁻² → W m⁻²
const bLambdaCgs: Arg = { lo: 1e-20, hi: 1e20, toSI: -1 }; // erg s⁻¹ cm⁻² sr⁻¹ cm⁻¹ → W m⁻² sr⁻¹ m⁻¹
const bNuCgs: Arg = { lo: 1e-20, hi: 1e20, toSI: -3 }; // erg s⁻¹ cm⁻² sr⁻¹ Hz⁻¹ → W m⁻² sr⁻¹ Hz⁻¹
const bandFactor: Arg = { lo: 1.01, hi: 10, toSI: 0 }; // λ₂/λ₁, folded into λ₂ by `shape`
const band2 = (a: number[]) => [a[0] as number, (a[0] as number) * (a[1] as number), a[2] as number];

const f = (g: unknown) => g as Case["f"];
const cases: Case[] = [
  // B per λ: W m⁻³ sr⁻¹ = 10⁷ erg s⁻¹ / (10⁶ cm³) sr⁻¹ → ×10; per Hz: 10⁷/10⁴ → ×10³; per m⁻¹: 10⁷/10² … → ×10⁵
  { name: "planckRadianceWavelength", f: f(planck.planckRadianceWavelength), args: [lambdaCm, tempK], toCGS: 1 },
  { name: "planckRadianceFrequency", f: f(planck.planckRadianceFrequency), args: [nuHz, tempK], toCGS: 3 },
  { name: "planckRadianceWavenumber", f: f(planck.planckRadianceWavenumber), args: [sigmaPerCm, tempK], toCGS: 5 },
  // photons m⁻³ → cm⁻³: ÷10⁶; per Hz m⁻²: ÷10⁴; per m⁻¹ m⁻²: ÷10²
  { name: "planckPhotonRadianceWavelength", f: f(planck.planckPhotonRadianceWavelength), args: [lambdaCm, tempK], toCGS: -6 },
  { name: "planckPhotonRadianceFrequency", f: f(planck.planckPhotonRadianceFrequency), args: [nuHz, tempK], toCGS: -4 },
  { name: "planckPhotonRadianceWavenumber", f: f(planck.planckPhotonRadianceWavenumber), args: [sigmaPerCm, tempK], toCGS: -2 },
  { name: "planckRadianceWavelengthDerivativeT", f: f(planck.planckRadianceWavelengthDerivativeT), args: [lambdaCm, tempK], toCGS: 1 },
  { name: "planckRadianceFrequencyDerivativeT", f: f(planck.planckRadianceFrequencyDerivativeT), args: [nuHz, tempK], toCGS: 3 },
  { name: "rayleighJeansRadianceWavelength", f: f(approximations.rayleighJeansRadianceWavelength), args: [lambdaCm, tempK], toCGS: 1 },
  { name: "rayleighJeansRadianceFrequency", f: f(approximations.rayleighJeansRadianceFrequency), args: [nuHz, tempK], toCGS: 3 },
  { name: "wienRadianceWavelength", f: f(approximations.wienRadianceWavelength), args: [lambdaCm, tempK], toCGS: 1 },
  { name: "wienRadianceFrequency", f: f(approximations.wienRadianceFrequency), args: [nuHz, tempK], toCGS: 3 },
  // pure numbers: unchanged
  { name: "wienRelativeErrorWavelength", f: f(approximations.wienRelativeErrorWavelength), args: [lambdaCm, tempK], toCGS: 0 },
  { name: "wienRelativeErrorFrequency", f: f(approximations.wienRelativeErrorFrequency), args: [nuHz, tempK], toCGS: 0 },
  // (x = c₂/(λT) ≤ 1.44/(1e-3 · 1e3) ≈ 1.4 here: far from the x ≈ 716 overflow of the Rayleigh–Jeans error)
  {
    name: "rayleighJeansRelativeErrorWavelength",
    f: f(approximations.rayleighJeansRelativeErrorWavelength),
    args: [{ lo: 1e-3, hi: 10, toSI: -2 }, { lo: 1e3, hi: 1e6, toSI: 0 }],
    toCGS: 0,
  },
  {
    name: "rayleighJeansRelativeErrorFrequency",
    f: f(approximations.rayleighJeansRelativeErrorFrequency),
    args: [{ lo: 1e8, hi: 1e13, toSI: 0 }, { lo: 1e3, hi: 1e6, toSI: 0 }],
    toCGS: 0,
  },
  // Wien peaks: m → cm ×10²; Hz unchanged; m⁻¹ → cm⁻¹ ÷10²; temperatures unchanged
  { name: "peakWavelength", f: f(wien.peakWavelength), args: [wideTempK], toCGS: 2 },
  { name: "peakFrequency", f: f(wien.peakFrequency), args: [wideTempK], toCGS: 0 },
  { name: "peakWavenumber", f: f(wien.peakWavenumber), args: [wideTempK], toCGS: -2 },
  { name: "photonPeakWavelength", f: f(wien.photonPeakWavelength), args: [wideTempK], toCGS: 2 },
  { name: "photonPeakFrequency", f: f(wien.photonPeakFrequency), args: [wideTempK], toCGS: 0 },
  { name: "photonPeakWavenumber", f: f(wien.photonPeakWavenumber), args: [wideTempK], toCGS: -2 },
  { name: "temperatureFromPeakWavelength", f: f(wien.temperatureFromPeakWavelength), args: [lambdaCm], toCGS: 0 },
  { name: "temperatureFromPeakFrequency", f: f(wien.temperatureFromPeakFrequency), args: [nuHz], toCGS: 0 },
  { name: "temperatureFromPeakWavenumber", f: f(wien.temperatureFromPeakWavenumber), args: [sigmaPerCm], toCGS: 0 },
  { name: "temperatureFromPhotonPeakWavelength", f: f(wien.temperatureFromPhotonPeakWavelength), args: [lambdaCm], toCGS: 0 },
  { name: "temperatureFromPhotonPeakFrequency", f: f(wien.temperatureFromPhotonPeakFrequency), args: [nuHz], toCGS: 0 },
  { name: "temperatureFromPhotonPeakWavenumber", f: f(wien.temperatureFromPhotonPeakWavenumber), args: [sigmaPerCm], toCGS: 0 },
  // W m⁻² = 10⁷ erg s⁻¹ / 10⁴ cm² → ×10³; W → erg s⁻¹ ×10⁷; photons m⁻² → cm⁻² ÷10⁴; photons s⁻¹ unchanged
  { name: "stefanBoltzmannExitance", f: f(sb.stefanBoltzmannExitance), args: [wideTempK], toCGS: 3 },
  { name: "temperatureFromExitance", f: f(sb.temperatureFromExitance), args: [exitanceCgs], toCGS: 0 },
  { name: "luminosityFromRadiusTemperature", f: f(sb.luminosityFromRadiusTemperature), args: [radiusCm, tempK], toCGS: 7 },
  { name: "radiusFromLuminosityTemperature", f: f(sb.radiusFromLuminosityTemperature), args: [luminosityErgS, tempK], toCGS: 2 },
  { name: "temperatureFromLuminosityRadius", f: f(sb.temperatureFromLuminosityRadius), args: [luminosityErgS, radiusCm], toCGS: 0 },
  { name: "photonExitance", f: f(sb.photonExitance), args: [wideTempK], toCGS: -4 },
  { name: "photonEmissionRate", f: f(sb.photonEmissionRate), args: [radiusCm, tempK], toCGS: 0 },
  // band fractions are pure numbers; band radiance W m⁻² sr⁻¹ → ×10³; photon band radiance ÷10⁴
  { name: "blackbodyFractionBelowWavelength", f: f(band.blackbodyFractionBelowWavelength), args: [lambdaCm, tempK], toCGS: 0 },
  { name: "blackbodyFractionAboveWavelength", f: f(band.blackbodyFractionAboveWavelength), args: [lambdaCm, tempK], toCGS: 0 },
  { name: "blackbodyFractionAboveFrequency", f: f(band.blackbodyFractionAboveFrequency), args: [nuHz, tempK], toCGS: 0 },
  { name: "blackbodyFractionBelowFrequency", f: f(band.blackbodyFractionBelowFrequency), args: [nuHz, tempK], toCGS: 0 },
  { name: "blackbodyPhotonFractionBelowWavelength", f: f(band.blackbodyPhotonFractionBelowWavelength), args: [lambdaCm, tempK], toCGS: 0 },
  { name: "blackbodyPhotonFractionAboveWavelength", f: f(band.blackbodyPhotonFractionAboveWavelength), args: [lambdaCm, tempK], toCGS: 0 },
  { name: "blackbodyPhotonFractionAboveFrequency", f: f(band.blackbodyPhotonFractionAboveFrequency), args: [nuHz, tempK], toCGS: 0 },
  { name: "blackbodyPhotonFractionBelowFrequency", f: f(band.blackbodyPhotonFractionBelowFrequency), args: [nuHz, tempK], toCGS: 0 },
  {
    name: "blackbodyFractionBetweenWavelengths",
    f: f(band.blackbodyFractionBetweenWavelengths),
    args: [lambdaCm, bandFactor, tempK],
    toCGS: 0,
    shape: band2,
  },
  {
    name: "blackbodyPhotonFractionBetweenWavelengths",
    f: f(band.blackbodyPhotonFractionBetweenWavelengths),
    args: [lambdaCm, bandFactor, tempK],
    toCGS: 0,
    shape: band2,
  },
  { name: "bandRadianceWavelength", f: f(band.bandRadianceWavelength), args: [lambdaCm, bandFactor, tempK], toCGS: 3, shape: band2 },
  { name: "bandPhotonRadianceWavelength", f: f(band.bandPhotonRadianceWavelength), args: [lambdaCm, bandFactor, tempK], toCGS: -4, shape: band2 },
  // brightness temperatures: kelvin in both systems
  { name: "brightnessTemperatureWavelength", f: f(brightness.brightnessTemperatureWavelength), args: [lambdaCm, bLambdaCgs], toCGS: 0 },
  { name: "brightnessTemperatureFrequency", f: f(brightness.brightnessTemperatureFrequency), args: [nuHz, bNuCgs], toCGS: 0 },
  {
    name: "rayleighJeansBrightnessTemperatureWavelength",
    f: f(brightness.rayleighJeansBrightnessTemperatureWavelength),
    args: [lambdaCm, bLambdaCgs],
    toCGS: 0,
  },
  {
    name: "rayleighJeansBrightnessTemperatureFrequency",
    f: f(brightness.rayleighJeansBrightnessTemperatureFrequency),
    args: [nuHz, bNuCgs],
    toCGS: 0,
  },
];

describe("a typed law in CGS is its SI result × an exact power of ten", () => {
  it("the table covers every scalar law of the four modules (none forgotten)", () => {
    const exported = [planck, approximations, wien, sb, band, brightness]
      .flatMap((m) => Object.entries(m))
      .filter(([name, v]) => typeof v === "function" && !name.endsWith("Batch") && !name.startsWith("lambertian"))
      .map(([name]) => name)
      .sort();
    expect(cases.map((c) => c.name).sort()).toEqual(exported);
  });

  it.each(cases)("$name", (c) => {
    // The shared band edge λ₁ of `shape` is moved to SI by the same ÷100 in both calls: λ₂ = λ₁·k is formed in cm first.
    const siArgsOf = (cgs: number[]): number[] => {
      if (c.shape === undefined) return cgs.map((v, i) => times10(v, (c.args[i] as Arg).toSI));
      return cgs.map((v, i) => (i < 2 ? times10(v, -2) : v));
    };
    fc.assert(
      fc.property(fc.tuple(...c.args.map((a) => logUniform(a.lo, a.hi))), (drawn) => {
        const cgs = c.shape === undefined ? drawn : c.shape(drawn);
        const si = siArgsOf(cgs);
        const inSI = c.f(SI, ...si);
        expect(Number.isFinite(inSI)).toBe(true);
        expect(c.f(CGS, ...cgs)).toBe(times10(inSI, c.toCGS));
      }),
      { numRuns: 60 },
    );
  });
});
