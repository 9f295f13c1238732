/**
 * Photometry benchmarks: the full distance → luminosity → radius chain with
 * first-order uncertainties over 10⁶ stars (parallax, bolometric flux and
 * effective temperature per star), via the batch stellar-parameter kernel vs a
 * hand-written plain-number loop of the same formulas.
 */
import { AU, SIGMA } from "../src/constants/values";
import { createStarBatchSolverSI } from "../src/photometry/kernels/solver";

/** One benchmark case (a runner will be written later). */
interface BenchCase {
  name: string;
  setup?: () => void;
  baseline: () => number;
  subject: () => number;
}

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
let reason = new Uint8Array(0);

function setup(): void {
  if (parallax.length === N) return;
  const c = () => new Float64Array(N);
  parallax = c(); sigmaParallax = c(); flux = c(); sigmaFlux = c(); temperature = c(); sigmaTemperature = c();
  distance = c(); sigmaDistance = c(); luminosity = c(); sigmaLuminosity = c(); radius = c(); sigmaRadius = c();
  reason = new Uint8Array(N);
  // deterministic pseudo-catalogue (LCG): parallaxes 0.1–100 mas, fluxes 1e-14–1e-8 W m^-2, T 2000–40000 K
  let s = 12345;
  const rand = () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  for (let i = 0; i < N; i++) {
    parallax[i] = 10 ** (-1 + 3 * rand()) * MAS;
    sigmaParallax[i] = parallax[i]! * 0.02 * rand();
    flux[i] = 10 ** (-14 + 6 * rand());
    sigmaFlux[i] = flux[i]! * 0.03 * rand();
    temperature[i] = 10 ** (3.3 + 1.3 * rand());
    sigmaTemperature[i] = temperature[i]! * 0.02 * rand();
  }
}

const solver = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"]);

function checksum(): number {
  let acc = 0;
  for (let i = 0; i < N; i += 997) {
    acc += distance[i]! * 1e-17 + luminosity[i]! * 1e-26 + radius[i]! * 1e-9;
    acc += sigmaDistance[i]! * 1e-16 + sigmaLuminosity[i]! * 1e-25 + sigmaRadius[i]! * 1e-8;
  }
  return acc;
}

export const cases: BenchCase[] = [
  {
    name: "photometry: parallax + flux + T → d, L, R with σ (1e6 stars)",
    setup,
    baseline: () => {
      const fourPi = 4 * Math.PI;
      const fourPiSigma = 4 * Math.PI * SIGMA;
      let invalid = 0;
      for (let i = 0; i < N; i++) {
        const p = parallax[i]!, sp = sigmaParallax[i]!;
        const f = flux[i]!, sf = sigmaFlux[i]!;
        const t = temperature[i]!, st = sigmaTemperature[i]!;
        if (!(p > 0 && f > 0 && t > 0 && sp >= 0 && sf >= 0 && st >= 0) || !Number.isFinite(p + f + t + sp + sf + st)) {
          distance[i] = luminosity[i] = radius[i] = NaN;
          sigmaDistance[i] = sigmaLuminosity[i] = sigmaRadius[i] = NaN;
          invalid++;
          continue;
        }
        const rp = sp / p, rf = sf / f, rt = st / t;
        const d = AU / p;
        const l = fourPi * d * d * f;
        const r = Math.sqrt(l / fourPiSigma) / (t * t);
        distance[i] = d;
        sigmaDistance[i] = d * rp;
        luminosity[i] = l;
        sigmaLuminosity[i] = l * Math.sqrt(4 * rp * rp + rf * rf);
        radius[i] = r;
        sigmaRadius[i] = r * Math.sqrt(rp * rp + 0.25 * rf * rf + 4 * rt * rt);
      }
      return checksum() + invalid;
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
          reason,
        },
      );
      return checksum() + invalid;
    },
  },
];
