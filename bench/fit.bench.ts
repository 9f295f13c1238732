/**
 * Benchmark of blackbody SED fitting: fits per second for 5 bands with
 * 200-point response curves (2 free parameters, T and θ; 2 % noise).
 *
 * subject: the kernel fitter (built once, reused for every star: band
 *   weights precomputed, no per-iteration allocation) fitting M seeded noisy
 *   stars; checksum Σ fitted T.
 * baseline: a hand-written plain loop doing the same number of band-model
 *   evaluations as the fitter used (its mean `evaluations` per star, measured
 *   in setup), each one the bare Planck formula and its T-derivative summed
 *   through the 5 × 200 weights — i.e. the irreducible arithmetic of the fit
 *   with nothing around it (no start, no linear algebra, no checks). So
 *   subject/baseline is the overhead of the fitter over its model
 *   evaluations. Its checksum is Σ fitted T carried over from setup (so the
 *   runner can compare), with the model sums kept alive in `sink`.
 *
 * The runner prints items/s = stars per second: 10⁵ stars take 10⁵ / rate s.
 */
import { C1L, C2 } from "../src/constants/values";
import { prepareBandSI, type PreparedBandSI } from "../src/fit/kernels/bands";
import { createBlackbodyFitterSI, type BlackbodyFitterSI } from "../src/fit/kernels/blackbody-fit";
import { bandMeanRadianceWavelengthSI, type ResponseCurveSI } from "../src/radiation/kernels/band-response";
import type { BenchCase } from "./case";
import { mulberry32 } from "../test/support/random";

const M = 2000; // stars per call
const NB = 5;
const NODES = 200;

let bands: PreparedBandSI[] = [];
let fitter: BlackbodyFitterSI | null = null;
let data = new Float64Array(0); // M × NB fluxes
let sig = new Float64Array(0);
let trueT = new Float64Array(0);
let fittedTSum = 0;
let evalsPerStar = 0;
const kinds = new Uint8Array(NB);
/** Keeps the baseline's model sums observable. */
export let sink = 0;

function curve(center: number): ResponseCurveSI {
  const hw = 0.09 * center;
  const l = new Float64Array(NODES);
  const r = new Float64Array(NODES);
  for (let i = 0; i < NODES; i++) {
    const lam = center - 2 * hw + (4 * hw * i) / (NODES - 1);
    const u = (lam - center) / hw;
    l[i] = lam;
    r[i] = Math.max(0, Math.exp(-(u ** 4)) * (1 + 0.3 * u));
  }
  return { wavelengthsM: l, response: r };
}

function setup(): void {
  if (fitter !== null) return;
  const curves = [0.365e-6, 0.445e-6, 0.551e-6, 0.658e-6, 0.806e-6].map(curve);
  bands = curves.map((c) => prepareBandSI(c, "photon"));
  fitter = createBlackbodyFitterSI(bands);
  const rand = mulberry32(12345);
  data = new Float64Array(M * NB);
  sig = new Float64Array(M * NB);
  trueT = new Float64Array(M);
  for (let k = 0; k < M; k++) {
    const T = 3000 * 10 ** rand();
    const theta = 1e-10 * 100 ** rand();
    trueT[k] = T;
    for (let b = 0; b < NB; b++) {
      const f = ((Math.PI * theta * theta) / 4) * bandMeanRadianceWavelengthSI(curves[b]!, T, "photon");
      // Box–Muller normal deviate
      const z = Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
      sig[k * NB + b] = 0.02 * f;
      data[k * NB + b] = f * (1 + 0.02 * z);
    }
  }
  let evals = 0;
  fittedTSum = 0;
  for (let k = 0; k < M; k++) {
    const r = fitter.fit(data.subarray(k * NB, k * NB + NB), sig.subarray(k * NB, k * NB + NB), kinds);
    evals += r.evaluations;
    fittedTSum += r.temperatureK;
  }
  evalsPerStar = Math.round(evals / M);
}

export const cases: BenchCase[] = [
  {
    name: `blackbody fit, ${NB} bands × ${NODES}-point curves, ${M} stars (items = stars; baseline = same number of bare model evaluations)`,
    setup,
    items: M,
    baseline: () => {
      let acc = 0;
      for (let k = 0; k < M; k++) {
        const T0 = trueT[k] as number;
        for (let e = 0; e < evalsPerStar; e++) {
          const T = T0 * (1 + 1e-3 * e);
          for (let b = 0; b < NB; b++) {
            const band = bands[b] as PreparedBandSI;
            const lam = band.wavelengthsM;
            const w = band.weights;
            let s0 = 0;
            let s1 = 0;
            for (let i = 0; i < lam.length; i++) {
              const l = lam[i] as number;
              const x = C2 / (l * T);
              const ex = Math.exp(x);
              const bl = C1L / (l * l * l * l * l) / (ex - 1);
              s0 += (w[i] as number) * bl;
              s1 += ((w[i] as number) * bl * x * ex) / (ex - 1);
            }
            acc += s0 + 1e-30 * s1;
          }
        }
      }
      sink = acc;
      return fittedTSum;
    },
    subject: () => {
      const f = fitter as BlackbodyFitterSI;
      let s = 0;
      for (let k = 0; k < M; k++) {
        s += f.fit(data.subarray(k * NB, k * NB + NB), sig.subarray(k * NB, k * NB + NB), kinds).temperatureK;
      }
      return s;
    },
  },
];
