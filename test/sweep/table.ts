/**
 * The sweep table: for every exported radiation and photometry function (SI
 * system; CGS differs by exact powers of ten checked in cgs-scaling tests),
 * its valid domain and how its true value is computed (decimal.js at 40
 * digits from the defining formula, `./reference.ts`). Tolerances: 1e-12
 * relative unless stated; the kernels document ≤ 1e-13 in their core ranges,
 * and 1e-12 leaves room for the ~2 ulp × condition number of x = hc/λkT in
 * the exponential tails (d ln B/d ln x ≈ x, bounded by the double range).
 */
import {
  bandPhotonRadianceWavelength,
  bandRadianceWavelength,
  blackbodyFractionAboveFrequency,
  blackbodyFractionAboveWavelength,
  blackbodyFractionBelowFrequency,
  blackbodyFractionBelowWavelength,
  blackbodyFractionBetweenWavelengths,
  blackbodyPhotonFractionAboveFrequency,
  blackbodyPhotonFractionAboveWavelength,
  blackbodyPhotonFractionBelowFrequency,
  blackbodyPhotonFractionBelowWavelength,
  blackbodyPhotonFractionBetweenWavelengths,
  brightnessTemperatureFrequency,
  brightnessTemperatureWavelength,
  lambertianExitance,
  lambertianRadiance,
  luminosityFromRadiusTemperature,
  photonEmissionRate,
  photonExitance,
  planckPhotonRadianceFrequency,
  planckPhotonRadianceWavelength,
  planckPhotonRadianceWavenumber,
  planckRadianceFrequency,
  planckRadianceFrequencyDerivativeT,
  planckRadianceWavelength,
  planckRadianceWavelengthDerivativeT,
  planckRadianceWavenumber,
  radiusFromLuminosityTemperature,
  rayleighJeansBrightnessTemperatureFrequency,
  rayleighJeansBrightnessTemperatureWavelength,
  rayleighJeansRadianceFrequency,
  rayleighJeansRadianceWavelength,
  rayleighJeansRelativeErrorFrequency,
  rayleighJeansRelativeErrorWavelength,
  stefanBoltzmannExitance,
  temperatureFromExitance,
  temperatureFromLuminosityRadius,
  temperatureFromPeakFrequency,
  temperatureFromPeakWavelength,
  temperatureFromPeakWavenumber,
  temperatureFromPhotonPeakFrequency,
  temperatureFromPhotonPeakWavelength,
  temperatureFromPhotonPeakWavenumber,
  peakFrequency,
  peakWavelength,
  peakWavenumber,
  photonPeakFrequency,
  photonPeakWavelength,
  photonPeakWavenumber,
  wienRadianceFrequency,
  wienRadianceWavelength,
  wienRelativeErrorFrequency,
  wienRelativeErrorWavelength,
} from "../../src/radiation/index";
import {
  angularDiameter,
  distanceFromAngularDiameter,
  radiusFromAngularDiameter,
  solidAngleFromAngularDiameter,
  surfaceBrightness,
  abMagnitude,
  absoluteBolometricMagnitude,
  absoluteMagnitude,
  apparentBolometricMagnitude,
  apparentMagnitude,
  bolometricFluxFromApparentBolometricMagnitude,
  dereddenFlux,
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
  magnitudeDifferenceFromFluxRatio,
  parallaxFromDistance,
  parallaxFromDistanceExact,
  reddenFlux,
} from "../../src/photometry/index";
import { SI } from "../../src/quantity/index";
import type { ArgSpec, SweepEntry } from "./harness";
import { logIn } from "./harness";
import * as R from "./reference";
import { D, type Dec } from "./reference";

/**
 * Tolerance of the closed forms that fall back to logarithms outside the
 * plain range (exp(ln a + p ln b …)): the rounding of a logarithm of size
 * up to |ln v| ≤ 745 costs |ln v|·2^−53 ≈ 8e-14 relative per rounded term,
 * two such terms at most → 3e-13.
 */
const LOG_PATH_TOL = 3e-13;

/* eslint-disable @typescript-eslint/no-explicit-any */
const q = (x: number): any => x;
const pos = (name: string, extra: Partial<ArgSpec> = {}): ArgSpec => ({ name, domain: "positive", ...extra });
const real = (name: string): ArgSpec => ({ name, domain: "real" });
const nonneg = (name: string): ArgSpec => ({ name, domain: "nonnegative" });
const lam = pos("wavelength");
const nu = pos("frequency");
const sig = pos("wavenumber");
const T = pos("temperature");
/** Planck-like focus: T log-uniform 1e-3…1e12 K, x = hc/λkT log-uniform 1e-8…1e3. */
const focusX = (toU: (x: number, t: number) => number) => (r: () => number): number[] => {
  const t = logIn(r, -3, 12);
  const x = logIn(r, -8, 3);
  return [toU(x, t), t];
};
const C2N = 0.014387768775039337;
const KH = 1.380649e-23 / 6.62607015e-34;
const lamOfX = (x: number, t: number): number => C2N / (x * t);
const nuOfX = (x: number, t: number): number => (x * t * KH);
const sigOfX = (x: number, t: number): number => x * t / C2N;

const planck2 = (name: string, u: ArgSpec, call: (u: number, t: number) => number, truth: (u: Dec, t: Dec) => Dec, focus: (x: number, t: number) => number, result: string, tol = 1e-12): SweepEntry => ({
  name,
  args: [u, T],
  call,
  truth,
  tol,
  result,
  focus: focusX(focus),
});

const fracLam = (p: 2 | 3, below: boolean) => (l: Dec, t: Dec): Dec => {
  const x = R.xLambda(l, t);
  return (below ? R.upper(p, x) : R.lower(p, x)).div(R.total(p));
};
const fracNu = (p: 2 | 3, below: boolean) => (n: Dec, t: Dec): Dec => {
  const x = R.xNu(n, t);
  return (below ? R.lower(p, x) : R.upper(p, x)).div(R.total(p));
};
const fracBetween = (p: 2 | 3) => (l1: Dec, l2: Dec, t: Dec): Dec | string =>
  l2.lt(l1) ? "wavelength2" : R.between(p, R.xLambda(l2, t), R.xLambda(l1, t)).div(R.total(p));
const bandFocus = (r: () => number): number[] => {
  const t = logIn(r, -3, 12);
  const l1 = lamOfX(logIn(r, -6, 3), t);
  return [l1, l1 * logIn(r, 0.001, 4), t];
};
const bandArgs = [pos("wavelength1"), pos("wavelength2"), T];
const photonTotalRadiance = (t: Dec): Dec => R.ZETA3.mul(4).mul(R.K.mul(t).pow(3)).div(R.C.pow(2).mul(R.H.pow(3)));

const magScale = (...x: number[]): number => x.reduce((a, b) => a + (Number.isFinite(b) ? Math.abs(b) : 0), 0);

export const radiationTable: SweepEntry[] = [
  planck2("planckRadianceWavelength", lam, (l, t) => planckRadianceWavelength(SI, q(l), q(t)), R.bLambda, lamOfX, "B_λ"),
  planck2("planckRadianceFrequency", nu, (n, t) => planckRadianceFrequency(SI, q(n), q(t)), R.bNu, nuOfX, "B_ν"),
  planck2("planckRadianceWavenumber", sig, (s, t) => planckRadianceWavenumber(SI, q(s), q(t)), R.bSigma, sigOfX, "B_σ̃"),
  planck2("planckPhotonRadianceWavelength", lam, (l, t) => planckPhotonRadianceWavelength(SI, q(l), q(t)), (l, t) => R.bLambda(l, t).mul(l).div(R.HC), lamOfX, "N_λ"),
  planck2("planckPhotonRadianceFrequency", nu, (n, t) => planckPhotonRadianceFrequency(SI, q(n), q(t)), (n, t) => R.bNu(n, t).div(R.H.mul(n)), nuOfX, "N_ν"),
  planck2("planckPhotonRadianceWavenumber", sig, (s, t) => planckPhotonRadianceWavenumber(SI, q(s), q(t)), (s, t) => R.bSigma(s, t).div(R.HC.mul(s)), sigOfX, "N_σ̃"),
  planck2("planckRadianceWavelengthDerivativeT", lam, (l, t) => planckRadianceWavelengthDerivativeT(SI, q(l), q(t)), R.dbLambda, lamOfX, "∂B_λ/∂T"),
  planck2("planckRadianceFrequencyDerivativeT", nu, (n, t) => planckRadianceFrequencyDerivativeT(SI, q(n), q(t)), R.dbNu, nuOfX, "∂B_ν/∂T"),
  planck2("rayleighJeansRadianceWavelength", lam, (l, t) => rayleighJeansRadianceWavelength(SI, q(l), q(t)), (l, t) => R.C.mul(2).mul(R.K).mul(t).div(l.pow(4)), lamOfX, "Rayleigh–Jeans B_λ"),
  planck2("rayleighJeansRadianceFrequency", nu, (n, t) => rayleighJeansRadianceFrequency(SI, q(n), q(t)), (n, t) => n.pow(2).mul(2).mul(R.K).mul(t).div(R.C.pow(2)), nuOfX, "Rayleigh–Jeans B_ν"),
  planck2("wienRadianceWavelength", lam, (l, t) => wienRadianceWavelength(SI, q(l), q(t)), (l, t) => R.HC.mul(R.C).mul(2).div(l.pow(5)).mul(R.exp(R.xLambda(l, t).neg())), lamOfX, "Wien B_λ"),
  planck2("wienRadianceFrequency", nu, (n, t) => wienRadianceFrequency(SI, q(n), q(t)), (n, t) => R.H.mul(2).mul(n.pow(3)).div(R.C.pow(2)).mul(R.exp(R.xNu(n, t).neg())), nuOfX, "Wien B_ν"),
  planck2("rayleighJeansRelativeErrorWavelength", lam, (l, t) => rayleighJeansRelativeErrorWavelength(SI, q(l), q(t)), (l, t) => { const x = R.xLambda(l, t); return x.lt(1e-12) ? x.div(2).add(x.pow(2).div(6)) : R.expm1(x).div(x).sub(1); }, lamOfX, "relative error"),
  planck2("rayleighJeansRelativeErrorFrequency", nu, (n, t) => rayleighJeansRelativeErrorFrequency(SI, q(n), q(t)), (n, t) => { const x = R.xNu(n, t); return x.lt(1e-12) ? x.div(2).add(x.pow(2).div(6)) : R.expm1(x).div(x).sub(1); }, nuOfX, "relative error"),
  planck2("wienRelativeErrorWavelength", lam, (l, t) => wienRelativeErrorWavelength(SI, q(l), q(t)), (l, t) => R.exp(R.xLambda(l, t).neg()).neg(), lamOfX, "relative error"),
  planck2("wienRelativeErrorFrequency", nu, (n, t) => wienRelativeErrorFrequency(SI, q(n), q(t)), (n, t) => R.exp(R.xNu(n, t).neg()).neg(), nuOfX, "relative error"),
  // Wien's displacement law: x_n = n(1 − e^−x_n) solved in 40 digits.
  { name: "peakWavelength", args: [T], call: (t) => peakWavelength(SI, q(t)), truth: (t) => R.C2.div(R.wienRoot(5).mul(t)), tol: 1e-14, result: "wavelength" },
  { name: "peakFrequency", args: [T], call: (t) => peakFrequency(SI, q(t)), truth: (t) => R.wienRoot(3).mul(R.K).mul(t).div(R.H), tol: 1e-14, result: "frequency" },
  { name: "peakWavenumber", args: [T], call: (t) => peakWavenumber(SI, q(t)), truth: (t) => R.wienRoot(3).mul(t).div(R.C2), tol: 1e-14, result: "wavenumber" },
  { name: "photonPeakWavelength", args: [T], call: (t) => photonPeakWavelength(SI, q(t)), truth: (t) => R.C2.div(R.wienRoot(4).mul(t)), tol: 1e-14, result: "wavelength" },
  { name: "photonPeakFrequency", args: [T], call: (t) => photonPeakFrequency(SI, q(t)), truth: (t) => R.wienRoot(2).mul(R.K).mul(t).div(R.H), tol: 1e-14, result: "frequency" },
  { name: "photonPeakWavenumber", args: [T], call: (t) => photonPeakWavenumber(SI, q(t)), truth: (t) => R.wienRoot(2).mul(t).div(R.C2), tol: 1e-14, result: "wavenumber" },
  { name: "temperatureFromPeakWavelength", args: [pos("peakWavelength")], call: (l) => temperatureFromPeakWavelength(SI, q(l)), truth: (l) => R.C2.div(R.wienRoot(5).mul(l)), tol: 1e-14, result: "temperature" },
  { name: "temperatureFromPeakFrequency", args: [pos("peakFrequency")], call: (n) => temperatureFromPeakFrequency(SI, q(n)), truth: (n) => R.H.mul(n).div(R.wienRoot(3).mul(R.K)), tol: 1e-14, result: "temperature" },
  { name: "temperatureFromPeakWavenumber", args: [pos("peakWavenumber")], call: (s) => temperatureFromPeakWavenumber(SI, q(s)), truth: (s) => R.C2.mul(s).div(R.wienRoot(3)), tol: 1e-14, result: "temperature" },
  { name: "temperatureFromPhotonPeakWavelength", args: [pos("peakWavelength")], call: (l) => temperatureFromPhotonPeakWavelength(SI, q(l)), truth: (l) => R.C2.div(R.wienRoot(4).mul(l)), tol: 1e-14, result: "temperature" },
  { name: "temperatureFromPhotonPeakFrequency", args: [pos("peakFrequency")], call: (n) => temperatureFromPhotonPeakFrequency(SI, q(n)), truth: (n) => R.H.mul(n).div(R.wienRoot(2).mul(R.K)), tol: 1e-14, result: "temperature" },
  { name: "temperatureFromPhotonPeakWavenumber", args: [pos("peakWavenumber")], call: (s) => temperatureFromPhotonPeakWavenumber(SI, q(s)), truth: (s) => R.C2.mul(s).div(R.wienRoot(2)), tol: 1e-14, result: "temperature" },
  // Stefan–Boltzmann, σ = 2π⁵k⁴/(15h³c²); photon exitance 4πζ(3)(kT)³/(c²h³).
  { name: "stefanBoltzmannExitance", args: [T], call: (t) => stefanBoltzmannExitance(SI, q(t)), truth: (t) => R.SIGMA.mul(t.pow(4)), tol: LOG_PATH_TOL, result: "exitance" },
  { name: "temperatureFromExitance", args: [pos("exitance")], call: (m) => temperatureFromExitance(SI, q(m)), truth: (m) => m.div(R.SIGMA).pow(0.25), tol: LOG_PATH_TOL, result: "temperature" },
  { name: "luminosityFromRadiusTemperature", args: [pos("radius"), T], call: (r, t) => luminosityFromRadiusTemperature(SI, q(r), q(t)), truth: (r, t) => R.PI.mul(4).mul(r.pow(2)).mul(R.SIGMA).mul(t.pow(4)), tol: LOG_PATH_TOL, result: "luminosity" },
  { name: "radiusFromLuminosityTemperature", args: [pos("luminosity"), T], call: (l, t) => radiusFromLuminosityTemperature(SI, q(l), q(t)), truth: (l, t) => l.div(R.PI.mul(4).mul(R.SIGMA).mul(t.pow(4))).sqrt(), tol: LOG_PATH_TOL, result: "radius" },
  { name: "temperatureFromLuminosityRadius", args: [pos("luminosity"), pos("radius")], call: (l, r) => temperatureFromLuminosityRadius(SI, q(l), q(r)), truth: (l, r) => l.div(R.PI.mul(4).mul(R.SIGMA).mul(r.pow(2))).pow(0.25), tol: LOG_PATH_TOL, result: "temperature" },
  { name: "photonExitance", args: [T], call: (t) => photonExitance(SI, q(t)), truth: (t) => photonTotalRadiance(t).mul(R.PI), tol: LOG_PATH_TOL, result: "photon exitance" },
  { name: "photonEmissionRate", args: [pos("radius"), T], call: (r, t) => photonEmissionRate(SI, q(r), q(t)), truth: (r, t) => photonTotalRadiance(t).mul(R.PI).mul(R.PI.mul(4).mul(r.pow(2))), tol: 1e-14, result: "photon" },
  { name: "lambertianExitance", args: [nonneg("radiance")], call: (l) => lambertianExitance(q(l)) as unknown as number, truth: (l) => l.mul(R.PI), tol: 1e-15, result: "exitance" },
  { name: "lambertianRadiance", args: [nonneg("exitance")], call: (m) => lambertianRadiance(q(m)) as unknown as number, truth: (m) => m.div(R.PI), tol: 1e-15, result: "radiance" },
  // Brightness temperatures: T = (hc/λk) / ln(1 + 2hc²/(λ⁵B)), T = (hν/k) / ln(1 + 2hν³/(c²B)).
  { name: "brightnessTemperatureWavelength", args: [lam, pos("radiance")], call: (l, b) => brightnessTemperatureWavelength(SI, q(l), q(b)), truth: (l, b) => R.C2.div(l).div(R.log1p(R.HC.mul(R.C).mul(2).div(l.pow(5).mul(b)))), tol: 1e-12, result: "temperature",
    focus: (r) => { const t = logIn(r, -3, 12); const l = lamOfX(logIn(r, -8, 3), t); return [l, R.bLambda(R.exact(l), R.exact(t)).toNumber()]; } },
  { name: "brightnessTemperatureFrequency", args: [nu, pos("radiance")], call: (n, b) => brightnessTemperatureFrequency(SI, q(n), q(b)), truth: (n, b) => R.H.mul(n).div(R.K).div(R.log1p(R.H.mul(2).mul(n.pow(3)).div(R.C.pow(2).mul(b)))), tol: 1e-12, result: "temperature",
    focus: (r) => { const t = logIn(r, -3, 12); const n = nuOfX(logIn(r, -8, 3), t); return [n, R.bNu(R.exact(n), R.exact(t)).toNumber()]; } },
  { name: "rayleighJeansBrightnessTemperatureWavelength", args: [lam, pos("radiance")], call: (l, b) => rayleighJeansBrightnessTemperatureWavelength(SI, q(l), q(b)), truth: (l, b) => l.pow(4).mul(b).div(R.C.mul(2).mul(R.K)), tol: 1e-14, result: "temperature" },
  { name: "rayleighJeansBrightnessTemperatureFrequency", args: [nu, pos("radiance")], call: (n, b) => rayleighJeansBrightnessTemperatureFrequency(SI, q(n), q(b)), truth: (n, b) => R.C.pow(2).mul(b).div(n.pow(2).mul(2).mul(R.K)), tol: 1e-14, result: "temperature" },
  // Band fractions: (15/π⁴)∫t³/(eᵗ−1), (1/2ζ(3))∫t²/(eᵗ−1) by the two standard series in 40 digits.
  planck2("blackbodyFractionBelowWavelength", lam, (l, t) => blackbodyFractionBelowWavelength(SI, q(l), q(t)), fracLam(3, true), lamOfX, "fraction"),
  planck2("blackbodyFractionAboveWavelength", lam, (l, t) => blackbodyFractionAboveWavelength(SI, q(l), q(t)), fracLam(3, false), lamOfX, "fraction"),
  planck2("blackbodyFractionBelowFrequency", nu, (n, t) => blackbodyFractionBelowFrequency(SI, q(n), q(t)), fracNu(3, true), nuOfX, "fraction"),
  planck2("blackbodyFractionAboveFrequency", nu, (n, t) => blackbodyFractionAboveFrequency(SI, q(n), q(t)), fracNu(3, false), nuOfX, "fraction"),
  planck2("blackbodyPhotonFractionBelowWavelength", lam, (l, t) => blackbodyPhotonFractionBelowWavelength(SI, q(l), q(t)), fracLam(2, true), lamOfX, "fraction"),
  planck2("blackbodyPhotonFractionAboveWavelength", lam, (l, t) => blackbodyPhotonFractionAboveWavelength(SI, q(l), q(t)), fracLam(2, false), lamOfX, "fraction"),
  planck2("blackbodyPhotonFractionBelowFrequency", nu, (n, t) => blackbodyPhotonFractionBelowFrequency(SI, q(n), q(t)), fracNu(2, true), nuOfX, "fraction"),
  planck2("blackbodyPhotonFractionAboveFrequency", nu, (n, t) => blackbodyPhotonFractionAboveFrequency(SI, q(n), q(t)), fracNu(2, false), nuOfX, "fraction"),
  { name: "blackbodyFractionBetweenWavelengths", args: bandArgs, call: (a, b, t) => blackbodyFractionBetweenWavelengths(SI, q(a), q(b), q(t)), truth: fracBetween(3), tol: 1e-12, result: "fraction", focus: bandFocus },
  { name: "blackbodyPhotonFractionBetweenWavelengths", args: bandArgs, call: (a, b, t) => blackbodyPhotonFractionBetweenWavelengths(SI, q(a), q(b), q(t)), truth: fracBetween(2), tol: 1e-12, result: "fraction", focus: bandFocus },
  { name: "bandRadianceWavelength", args: bandArgs, call: (a, b, t) => bandRadianceWavelength(SI, q(a), q(b), q(t)),
    truth: (a, b, t) => (b.lt(a) ? "wavelength2" : R.between(3, R.xLambda(b, t), R.xLambda(a, t)).mul(R.SIGMA).mul(t.pow(4)).div(R.PI).div(R.total(3))), tol: 1e-12, result: "band radiance", focus: bandFocus },
  { name: "bandPhotonRadianceWavelength", args: bandArgs, call: (a, b, t) => bandPhotonRadianceWavelength(SI, q(a), q(b), q(t)),
    truth: (a, b, t) => (b.lt(a) ? "wavelength2" : R.between(2, R.xLambda(b, t), R.xLambda(a, t)).mul(photonTotalRadiance(t)).div(R.total(2))), tol: 1e-12, result: "photon radiance", focus: bandFocus },
];

const pogson = (r: Dec): Dec => R.log10(r).mul(-2.5);
const fromMag = (m: Dec): Dec => R.pow10(m.div(-2.5));
const magFocus = (r: () => number): number[] => [(r() - 0.5) * 1600];

export const photometryTable: SweepEntry[] = [
  { name: "fluxFromLuminosity", args: [pos("luminosity"), pos("distance")], call: (l, d) => fluxFromLuminosity(SI, q(l), q(d)), truth: (l, d) => l.div(R.PI.mul(4).mul(d.pow(2))), tol: 1e-14, underflow: "throw", result: "flux" },
  { name: "luminosityFromFlux", args: [pos("flux"), pos("distance")], call: (f, d) => luminosityFromFlux(SI, q(f), q(d)), truth: (f, d) => f.mul(R.PI.mul(4).mul(d.pow(2))), tol: 1e-14, underflow: "throw", result: "luminosity" },
  { name: "distanceFromLuminosityFlux", args: [pos("luminosity"), pos("flux")], call: (l, f) => distanceFromLuminosityFlux(SI, q(l), q(f)), truth: (l, f) => l.div(R.PI.mul(4).mul(f)).sqrt(), tol: 1e-14, underflow: "throw", result: "distance" },
  { name: "magnitudeDifferenceFromFluxRatio", args: [pos("flux ratio")], call: (r) => magnitudeDifferenceFromFluxRatio(q(r)), truth: pogson, tol: 1e-14, result: "magnitude" },
  { name: "fluxRatioFromMagnitudeDifference", args: [real("magnitude difference")], call: (m) => fluxRatioFromMagnitudeDifference(q(m)), truth: fromMag, tol: 1e-12, underflow: "zero", result: "flux ratio", focus: magFocus },
  { name: "magnitudeDifference", args: [pos("flux1"), pos("flux2")], call: (a, b) => magnitudeDifference(q(a), q(b)), truth: (a, b) => pogson(a.div(b)), tol: 1e-14, scale: (a, b) => 2.5 * (Math.abs(Math.log10(a)) + Math.abs(Math.log10(b))), result: "magnitude" },
  { name: "distanceModulus", args: [pos("distance")], call: (d) => distanceModulus(SI, q(d)), truth: (d) => R.log10(d.div(R.TEN_PC)).mul(5), tol: 1e-14, scale: (d) => 5 * Math.abs(Math.log10(d)), result: "distance modulus" },
  { name: "distanceFromDistanceModulus", args: [real("distance modulus")], call: (m) => distanceFromDistanceModulus(SI, q(m)), truth: (m) => R.TEN_PC.mul(R.pow10(m.div(5))), tol: 1e-12, underflow: "throw", result: "distance", focus: (r) => [(r() - 0.5) * 3300] },
  { name: "absoluteMagnitude", args: [real("apparent magnitude"), pos("distance")], call: (m, d) => absoluteMagnitude(SI, q(m), q(d)), truth: (m, d) => m.sub(R.log10(d.div(R.TEN_PC)).mul(5)), tol: 1e-14, scale: (m, d) => Math.abs(m) + 5 * Math.abs(Math.log10(d)), result: "magnitude", focus: (r) => [(r() - 0.5) * 60, logIn(r, 10, 26)] },
  { name: "apparentMagnitude", args: [real("absolute magnitude"), pos("distance")], call: (m, d) => apparentMagnitude(SI, q(m), q(d)), truth: (m, d) => m.add(R.log10(d.div(R.TEN_PC)).mul(5)), tol: 1e-14, scale: (m, d) => Math.abs(m) + 5 * Math.abs(Math.log10(d)), result: "magnitude", focus: (r) => [(r() - 0.5) * 60, logIn(r, 10, 26)] },
  { name: "absoluteBolometricMagnitude", args: [pos("luminosity")], call: (l) => absoluteBolometricMagnitude(SI, q(l)), truth: (l) => pogson(l.div(R.L0)), tol: 1e-14, scale: (l) => 2.5 * Math.abs(Math.log10(l)), result: "magnitude" },
  { name: "luminosityFromAbsoluteBolometricMagnitude", args: [real("absolute bolometric magnitude")], call: (m) => luminosityFromAbsoluteBolometricMagnitude(SI, q(m)), truth: (m) => R.L0.mul(fromMag(m)), tol: 1e-12, underflow: "throw", result: "luminosity", focus: magFocus },
  { name: "apparentBolometricMagnitude", args: [pos("bolometric flux")], call: (f) => apparentBolometricMagnitude(SI, q(f)), truth: (f) => pogson(f.div(R.F0)), tol: 1e-14, scale: (f) => 2.5 * Math.abs(Math.log10(f)), result: "magnitude" },
  { name: "bolometricFluxFromApparentBolometricMagnitude", args: [real("apparent bolometric magnitude")], call: (m) => bolometricFluxFromApparentBolometricMagnitude(SI, q(m)), truth: (m) => R.F0.mul(fromMag(m)), tol: 1e-12, underflow: "throw", result: "flux", focus: magFocus },
  { name: "abMagnitude", args: [pos("spectral flux density")], call: (f) => abMagnitude(SI, q(f)), truth: (f) => pogson(f.div(R.AB0)), tol: 1e-14, scale: (f) => 2.5 * Math.abs(Math.log10(f)), result: "magnitude" },
  { name: "fNuFromAbMagnitude", args: [real("AB magnitude")], call: (m) => fNuFromAbMagnitude(SI, q(m)), truth: (m) => R.AB0.mul(fromMag(m)), tol: 1e-12, underflow: "throw", result: "spectral flux density", focus: magFocus },
  { name: "fLambdaFromFNu", args: [pos("f_nu"), pos("wavelength")], call: (f, l) => fLambdaFromFNu(SI, q(f), q(l)), truth: (f, l) => f.mul(R.C).div(l.pow(2)), tol: 1e-14, underflow: "throw", result: "f_lambda" },
  { name: "fNuFromFLambda", args: [pos("f_lambda"), pos("wavelength")], call: (f, l) => fNuFromFLambda(SI, q(f), q(l)), truth: (f, l) => f.mul(l.pow(2)).div(R.C), tol: 1e-14, underflow: "throw", result: "f_nu" },
  { name: "distanceFromParallax", args: [pos("parallax")], call: (p) => distanceFromParallax(SI, q(p)), truth: (p) => R.AU.div(p), tol: 1e-14, underflow: "throw", result: "distance" },
  { name: "parallaxFromDistance", args: [pos("distance")], call: (d) => parallaxFromDistance(SI, q(d)), truth: (d) => R.AU.div(d), tol: 1e-14, underflow: "throw", result: "parallax" },
  { name: "distanceFromParallaxExact", args: [pos("parallax", { max: Math.PI / 2 })], call: (p) => distanceFromParallaxExact(SI, q(p)), truth: (p) => R.AU.div(p.tan()), tol: 1e-13, underflow: "throw", result: "distance" },
  { name: "parallaxFromDistanceExact", args: [pos("distance")], call: (d) => parallaxFromDistanceExact(SI, q(d)), truth: (d) => R.AU.div(d).atan(), tol: 1e-14, underflow: "throw", result: "parallax" },
  { name: "reddenFlux", args: [pos("flux"), real("extinction")], call: (f, a) => reddenFlux(q(f), q(a)), truth: (f, a) => f.mul(fromMag(a)), tol: 1e-12, underflow: "throw", result: "flux", focus: (r) => [logIn(r, -300, 300), (r() - 0.5) * 200] },
  { name: "dereddenFlux", args: [pos("flux"), real("extinction")], call: (f, a) => dereddenFlux(q(f), q(a)), truth: (f, a) => f.mul(fromMag(a.neg())), tol: 1e-12, underflow: "throw", result: "flux", focus: (r) => [logIn(r, -300, 300), (r() - 0.5) * 200] },
  // Angular size (the geometries without a bounded domain; "sphere" needs d ≥ R and is checked in its own tests)
  { name: "angularDiameter (disk)", args: [pos("radius"), pos("distance")], call: (r, d) => angularDiameter(SI, q(r), q(d), "disk"), truth: (r, d) => r.div(d).atan().mul(2), tol: 1e-14, underflow: "throw", result: "angular diameter" },
  { name: "angularDiameter (small-angle)", args: [pos("radius"), pos("distance")], call: (r, d) => angularDiameter(SI, q(r), q(d), "small-angle"), truth: (r, d) => r.mul(2).div(d), tol: 1e-14, underflow: "throw", result: "angular diameter" },
  { name: "radiusFromAngularDiameter (small-angle)", args: [pos("angular diameter"), pos("distance")], call: (t, d) => radiusFromAngularDiameter(SI, q(t), q(d), "small-angle"), truth: (t, d) => t.mul(d).div(2), tol: 1e-14, underflow: "throw", result: "radius" },
  { name: "distanceFromAngularDiameter (small-angle)", args: [pos("angular diameter"), pos("radius")], call: (t, r) => distanceFromAngularDiameter(SI, q(t), q(r), "small-angle"), truth: (t, r) => r.mul(2).div(t), tol: 1e-14, underflow: "throw", result: "distance" },
  { name: "solidAngleFromAngularDiameter (small-angle)", args: [pos("angular diameter")], call: (t) => solidAngleFromAngularDiameter(q(t), "small-angle"), truth: (t) => R.PI.mul(t.div(2).pow(2)), tol: 1e-14, underflow: "throw", result: "solid angle" },
  { name: "surfaceBrightness (small-angle)", args: [pos("flux"), pos("angular diameter")], call: (f, t) => surfaceBrightness(SI, q(f), q(t), "small-angle"), truth: (f, t) => f.div(R.PI.mul(t.div(2).pow(2))), tol: 1e-14, underflow: "throw", result: "surface brightness" },
];

export const sweepTable: SweepEntry[] = [...radiationTable, ...photometryTable];
