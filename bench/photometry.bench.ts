/**
 * Photometry benchmarks: the distance → luminosity → radius (→ angular
 * diameter) chain with first-order uncertainties over 10⁶ stars (parallax,
 * bolometric flux and effective temperature per star), via the batch
 * stellar-parameter kernel and via the typed batch API, each against a
 * hand-written plain-number loop of the same formulas.
 *
 * The {parallax, flux, temperature} kernel solver runs a specialized loop;
 * the last case forces the general product-of-powers loop for comparison.
 * Every case computes the same outputs (d, L, R, θ and their σ) on both
 * sides; the hand loop does the validity test a careful engineer would write
 * (it is needed to produce NaN rows), but no reason codes. Each case's hand
 * loop is written out in full (no shared function), so that each side's call
 * sites stay monomorphic.
 */
import type { BenchCase } from "./case";
import { AU, SIGMA } from "../src/values/constants";
import { createStarBatchSolverSI } from "../src/photometry/kernels/solver";
import { createStarBatchSolver } from "../src/photometry/solver";
import { assumeArray, type AngleArray, type FluxArray, type LengthArray, type PowerArray, type TemperatureArray } from "../src/quantity/index";
import { SI } from "../src/quantity/system";

const N = 1_000_000;
const MAS = Math.PI / 648000 / 1000;

let parallax = new Float64Array(0);
let sigmaParallax = new Float64Array(0);
let flux = new Float64Array(0);
let sigmaFlux = new Float64Array(0);
let temperature = new Float64Array(0);
let sigmaTemperature = new Float64Array(0);
let distance = new Float64Array(0);
let sigmaDistance = new Float64Array(0);
let luminosity = new Float64Array(0);
let sigmaLuminosity = new Float64Array(0);
let radius = new Float64Array(0);
let sigmaRadius = new Float64Array(0);
let angularDiameter = new Float64Array(0);
let sigmaAngularDiameter = new Float64Array(0);
let reason = new Uint8Array(0);

function setup(): void {
  if (parallax.length === N) return;
  const c = () => new Float64Array(N);
  parallax = c(); sigmaParallax = c(); flux = c(); sigmaFlux = c(); temperature = c(); sigmaTemperature = c();
  distance = c(); sigmaDistance = c(); luminosity = c(); sigmaLuminosity = c(); radius = c(); sigmaRadius = c();
  angularDiameter = c(); sigmaAngularDiameter = c();
  reason = new Uint8Array(N);
  // deterministic pseudo-catalogue (LCG): parallaxes 0.1–100 mas, fluxes 1e-14–1e-8 W m^-2, T 2000–40000 K
  let s = 12345;
  const rand = () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  for (let i = 0; i < N; i++) {
    parallax[i] = Math.exp(Math.LN10 * (-1 + 3 * rand())) * MAS;
    sigmaParallax[i] = parallax[i]! * 0.02 * rand();
    flux[i] = Math.exp(Math.LN10 * (-14 + 6 * rand()));
    sigmaFlux[i] = flux[i]! * 0.03 * rand();
    temperature[i] = Math.exp(Math.LN10 * (3.3 + 1.3 * rand()));
    sigmaTemperature[i] = temperature[i]! * 0.02 * rand();
  }
}

const solver = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"]);
const generalSolver = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"], { specialize: false });
const typedSolver = createStarBatchSolver(SI, ["parallax", "bolometricFlux", "temperature"]);

function checksum(): number {
  let acc = 0;
  for (let i = 0; i < N; i += 997) {
    acc += distance[i]! * 1e-17 + luminosity[i]! * 1e-26 + radius[i]! * 1e-9;
    acc += sigmaDistance[i]! * 1e-16 + sigmaLuminosity[i]! * 1e-25 + sigmaRadius[i]! * 1e-8;
  }
  return acc;
}

function checksumWithAngle(): number {
  let acc = checksum();
  for (let i = 0; i < N; i += 997) acc += angularDiameter[i]! * 1e9 + sigmaAngularDiameter[i]! * 1e10;
  return acc;
}

function kernelFullChain(s: typeof solver): number {
  const invalid = s.solve(
    { values: [parallax, flux, temperature], sigmas: [sigmaParallax, sigmaFlux, sigmaTemperature] },
    {
      distanceM: distance, sigmaDistanceM: sigmaDistance, luminosityW: luminosity, sigmaLuminosityW: sigmaLuminosity,
      radiusM: radius, sigmaRadiusM: sigmaRadius, angularDiameterRad: angularDiameter, sigmaAngularDiameterRad: sigmaAngularDiameter,
      reason,
    },
  );
  return checksumWithAngle() + invalid;
}

export const cases: BenchCase[] = [
  {
    name: "star solver kernel (specialized): plx+f+T → d,L,R,θ ±σ",
    note: "createStarBatchSolverSI([parallax, flux, T]).solve over 1e6 stars (values, σ, reason codes) vs the hand loop of the same formulas",
    setup,
    items: N,
    baseline: () => {
  const fourPi = 4 * Math.PI;
  const fourPiSigma = 4 * Math.PI * SIGMA;
  let invalid = 0;
  for (let i = 0; i < N; i++) {
    const p = parallax[i]!, sp = sigmaParallax[i]!;
    const f = flux[i]!, sf = sigmaFlux[i]!;
    const t = temperature[i]!, st = sigmaTemperature[i]!;
    if (!(p > 0 && f > 0 && t > 0 && sp >= 0 && sf >= 0 && st >= 0) || !Number.isFinite(p + f + t + sp + sf + st)) {
      distance[i] = luminosity[i] = radius[i] = angularDiameter[i] = NaN;
      sigmaDistance[i] = sigmaLuminosity[i] = sigmaRadius[i] = sigmaAngularDiameter[i] = NaN;
      invalid++;
      continue;
    }
    const rp = sp / p, rf = sf / f, rt = st / t;
    const d = AU / p;
    const l = fourPi * d * d * f;
    const r = Math.sqrt(l / fourPiSigma) / (t * t);
    const a = (2 * r) / d;
    distance[i] = d;
    sigmaDistance[i] = d * rp;
    luminosity[i] = l;
    sigmaLuminosity[i] = l * Math.sqrt(4 * rp * rp + rf * rf);
    radius[i] = r;
    sigmaRadius[i] = r * Math.sqrt(rp * rp + 0.25 * rf * rf + 4 * rt * rt);
    angularDiameter[i] = a;
    sigmaAngularDiameter[i] = a * Math.sqrt(0.25 * rf * rf + 4 * rt * rt);
  }
  return checksumWithAngle() + invalid;
    },
    subject: () => {
      const invalid = solver.solve(
        {
          values: [parallax, flux, temperature],
          sigmas: [sigmaParallax, sigmaFlux, sigmaTemperature],
        },
        {
          distanceM: distance,
          sigmaDistanceM: sigmaDistance,
          luminosityW: luminosity,
          sigmaLuminosityW: sigmaLuminosity,
          radiusM: radius,
          sigmaRadiusM: sigmaRadius,
          angularDiameterRad: angularDiameter,
          sigmaAngularDiameterRad: sigmaAngularDiameter,
          reason,
        },
      );
      return checksumWithAngle() + invalid;
    },
  },
  {
    name: "star solver typed batch (SI): plx+f+T → d,L,R,θ ±σ",
    note: "createStarBatchSolver(SI, [parallax, bolometricFlux, temperature]).solve over 1e6 stars vs the hand loop",
    setup,
    items: N,
    baseline: () => {
  const fourPi = 4 * Math.PI;
  const fourPiSigma = 4 * Math.PI * SIGMA;
  let invalid = 0;
  for (let i = 0; i < N; i++) {
    const p = parallax[i]!, sp = sigmaParallax[i]!;
    const f = flux[i]!, sf = sigmaFlux[i]!;
    const t = temperature[i]!, st = sigmaTemperature[i]!;
    if (!(p > 0 && f > 0 && t > 0 && sp >= 0 && sf >= 0 && st >= 0) || !Number.isFinite(p + f + t + sp + sf + st)) {
      distance[i] = luminosity[i] = radius[i] = angularDiameter[i] = NaN;
      sigmaDistance[i] = sigmaLuminosity[i] = sigmaRadius[i] = sigmaAngularDiameter[i] = NaN;
      invalid++;
      continue;
    }
    const rp = sp / p, rf = sf / f, rt = st / t;
    const d = AU / p;
    const l = fourPi * d * d * f;
    const r = Math.sqrt(l / fourPiSigma) / (t * t);
    const a = (2 * r) / d;
    distance[i] = d;
    sigmaDistance[i] = d * rp;
    luminosity[i] = l;
    sigmaLuminosity[i] = l * Math.sqrt(4 * rp * rp + rf * rf);
    radius[i] = r;
    sigmaRadius[i] = r * Math.sqrt(rp * rp + 0.25 * rf * rf + 4 * rt * rt);
    angularDiameter[i] = a;
    sigmaAngularDiameter[i] = a * Math.sqrt(0.25 * rf * rf + 4 * rt * rt);
  }
  return checksumWithAngle() + invalid;
    },
    subject: () => {
      const r = typedSolver.solve(
        {
          parallax: { values: assumeArray<AngleArray>(parallax), sigmas: assumeArray<AngleArray>(sigmaParallax) },
          bolometricFlux: { values: assumeArray<FluxArray<"SI">>(flux), sigmas: assumeArray<FluxArray<"SI">>(sigmaFlux) },
          temperature: { values: assumeArray<TemperatureArray>(temperature), sigmas: assumeArray<TemperatureArray>(sigmaTemperature) },
        },
        {
          distance: assumeArray<LengthArray<"SI">>(distance),
          sigmaDistance: assumeArray<LengthArray<"SI">>(sigmaDistance),
          luminosity: assumeArray<PowerArray<"SI">>(luminosity),
          sigmaLuminosity: assumeArray<PowerArray<"SI">>(sigmaLuminosity),
          radius: assumeArray<LengthArray<"SI">>(radius),
          sigmaRadius: assumeArray<LengthArray<"SI">>(sigmaRadius),
          angularDiameter: assumeArray<AngleArray>(angularDiameter),
          sigmaAngularDiameter: assumeArray<AngleArray>(sigmaAngularDiameter),
          reason,
        },
      );
      return checksumWithAngle() + r.invalid.length;
    },
  },
  {
    name: "star solver kernel (general loop): plx+f+T → d,L,R,θ ±σ",
    note: "createStarBatchSolverSI(..., { specialize: false }): the general product-of-powers loop, vs the hand loop",
    setup,
    items: N,
    baseline: () => {
  const fourPi = 4 * Math.PI;
  const fourPiSigma = 4 * Math.PI * SIGMA;
  let invalid = 0;
  for (let i = 0; i < N; i++) {
    const p = parallax[i]!, sp = sigmaParallax[i]!;
    const f = flux[i]!, sf = sigmaFlux[i]!;
    const t = temperature[i]!, st = sigmaTemperature[i]!;
    if (!(p > 0 && f > 0 && t > 0 && sp >= 0 && sf >= 0 && st >= 0) || !Number.isFinite(p + f + t + sp + sf + st)) {
      distance[i] = luminosity[i] = radius[i] = angularDiameter[i] = NaN;
      sigmaDistance[i] = sigmaLuminosity[i] = sigmaRadius[i] = sigmaAngularDiameter[i] = NaN;
      invalid++;
      continue;
    }
    const rp = sp / p, rf = sf / f, rt = st / t;
    const d = AU / p;
    const l = fourPi * d * d * f;
    const r = Math.sqrt(l / fourPiSigma) / (t * t);
    const a = (2 * r) / d;
    distance[i] = d;
    sigmaDistance[i] = d * rp;
    luminosity[i] = l;
    sigmaLuminosity[i] = l * Math.sqrt(4 * rp * rp + rf * rf);
    radius[i] = r;
    sigmaRadius[i] = r * Math.sqrt(rp * rp + 0.25 * rf * rf + 4 * rt * rt);
    angularDiameter[i] = a;
    sigmaAngularDiameter[i] = a * Math.sqrt(0.25 * rf * rf + 4 * rt * rt);
  }
  return checksumWithAngle() + invalid;
    },
    subject: () => kernelFullChain(generalSolver),
  },
];
