/**
 * Benchmark of blackbody SED fitting: fits per second for 5 bands with
 * 200-point response curves (2 free parameters, T and θ; 2 % noise).
 *
 * subject: the kernel fitter (built once, reused for every star: band
 *   weights precomputed, no per-iteration allocation; Levenberg–Marquardt in
 *   (ln T, ln θ) with a colour-temperature start) fitting M seeded noisy
 *   stars; checksum Σ fitted T.
 * baseline: the fitter an engineer would write by hand for this job: the
 *   band model s Σ ŵᵢ B_λ(λᵢ, T) (s = πθ²/4) with per-node constants
 *   (1/λ⁵, hc/λk) precomputed, a Wien colour-temperature start from the two
 *   outer bands, θ from the linear least-squares scale, then Gauss–Newton in
 *   (ln T, ln s) with analytic derivatives and step halving, stopping when
 *   the step is ≤ 1e-10 (the library's default step tolerance). The band
 *   quadrature weights ŵᵢ are taken from `prepareBandSI` in setup (untimed;
 *   they are data, the same numbers on both sides). Checksum Σ fitted T.
 *
 * Items = stars: 10⁵ stars take 10⁵ × (ns/item) × 1e-9 s.
 */
import { C1L, C2 } from "../src/values/constants";
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
const kinds = new Uint8Array(NB);
// Per-node constants for the hand fitter: ŵ C1L/λ⁵ and hc/(λk), bands concatenated.
let nodeW = new Float64Array(0);
let nodeX = new Float64Array(0);
const bandStart = new Int32Array(NB + 1);
// Effective wavelengths of the outer bands, for the Wien colour-temperature start.
let lamFirst = 0;
let lamLast = 0;

function curve(centre: number): ResponseCurveSI {
  const hw = 0.09 * centre;
  const l = new Float64Array(NODES);
  const r = new Float64Array(NODES);
  for (let i = 0; i < NODES; i++) {
    const lam = centre - 2 * hw + (4 * hw * i) / (NODES - 1);
    const u = (lam - centre) / hw;
    l[i] = lam;
    const u2 = u * u;
    r[i] = Math.max(0, Math.exp(-(u2 * u2)) * (1 + 0.3 * u));
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
  for (let k = 0; k < M; k++) {
    const T = 3000 * Math.exp(Math.LN10 * rand());
    const theta = 1e-10 * Math.exp(2 * Math.LN10 * rand());
    for (let b = 0; b < NB; b++) {
      const f = ((Math.PI * theta * theta) / 4) * bandMeanRadianceWavelengthSI(curves[b]!, T, "photon");
      // Box–Muller normal deviate
      const z = Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
      sig[k * NB + b] = 0.02 * f;
      data[k * NB + b] = f * (1 + 0.02 * z);
    }
  }
  let total = 0;
  for (const b of bands) total += b.wavelengthsM.length;
  nodeW = new Float64Array(total);
  nodeX = new Float64Array(total);
  let j = 0;
  for (let b = 0; b < NB; b++) {
    bandStart[b] = j;
    const band = bands[b] as PreparedBandSI;
    for (let i = 0; i < band.wavelengthsM.length; i++, j++) {
      const l = band.wavelengthsM[i] as number;
      const l2 = l * l;
      nodeW[j] = ((band.weights[i] as number) * C1L) / (l2 * l2 * l);
      nodeX[j] = C2 / l;
    }
  }
  bandStart[NB] = j;
  const effective = (b: PreparedBandSI): number => {
    let s = 0;
    for (let i = 0; i < b.wavelengthsM.length; i++) s += (b.weights[i] as number) * (b.wavelengthsM[i] as number);
    return s;
  };
  lamFirst = effective(bands[0] as PreparedBandSI);
  lamLast = effective(bands[NB - 1] as PreparedBandSI);
}

export const cases: BenchCase[] = [
  {
    name: "blackbody fit, 5 bands × 200 nodes",
    note: `${M} seeded stars, T and θ free: kernel Levenberg–Marquardt fitter vs a hand Gauss–Newton fitter of the same model; items = stars`,
    tolerance: {
      rel: 1e-9,
      why: "two iterative fits of the same χ² stop on a step ≤ 1e-10 in ln T (library default stepTolerance, used by both): each fitted T agrees to ≲ 1e-10, the sum likewise",
    },
    setup,
    items: M,
    baseline: () => {
      const m0 = new Float64Array(NB);
      const m1 = new Float64Array(NB);
      let sumT = 0;
      for (let k = 0; k < M; k++) {
        const o = k * NB;
        // Wien colour temperature from the outer bands: f1/f2 = (λ2/λ1)⁵ exp(−(hc/k)(1/λ1 − 1/λ2)/T)
        const ratio = (data[o] as number) / (data[o + NB - 1] as number);
        let lnT = Math.log((C2 * (1 / lamFirst - 1 / lamLast)) / (5 * Math.log(lamLast / lamFirst) - Math.log(ratio)));
        if (!(lnT > 6.9 && lnT < 11.6)) lnT = Math.log(6000);
        let lnS = 0;
        let chi2 = Infinity;
        let first = true;
        let stepT = 0;
        let stepS = 0;
        for (let it = 0; it < 100; it++) {
          // model sums at lnT: S0 = Σ ŵB, S1 = Σ ŵ T∂B/∂T = Σ ŵB x(1 + 1/expm1(x))
          const invT = Math.exp(-lnT);
          for (let b = 0; b < NB; b++) {
            let s0 = 0;
            let s1 = 0;
            for (let j = bandStart[b] as number; j < (bandStart[b + 1] as number); j++) {
              const x = (nodeX[j] as number) * invT;
              const em = Math.expm1(x);
              const v = (nodeW[j] as number) / em;
              s0 += v;
              s1 += v * x * (1 + 1 / em);
            }
            m0[b] = s0;
            m1[b] = s1;
          }
          if (first) {
            // linear least-squares scale at the start temperature
            let num = 0;
            let den = 0;
            for (let b = 0; b < NB; b++) {
              const w = 1 / ((sig[o + b] as number) * (sig[o + b] as number));
              num += w * (data[o + b] as number) * (m0[b] as number);
              den += w * (m0[b] as number) * (m0[b] as number);
            }
            lnS = Math.log(num / den);
            first = false;
          }
          const sc = Math.exp(lnS);
          // χ², gradient and Gauss–Newton matrix in (ln T, ln s)
          let c2 = 0;
          let a11 = 0;
          let a12 = 0;
          let a22 = 0;
          let g1 = 0;
          let g2 = 0;
          for (let b = 0; b < NB; b++) {
            const is = 1 / (sig[o + b] as number);
            const m = sc * (m0[b] as number);
            const r = ((data[o + b] as number) - m) * is;
            const j1 = sc * (m1[b] as number) * is;
            const j2 = m * is;
            c2 += r * r;
            a11 += j1 * j1;
            a12 += j1 * j2;
            a22 += j2 * j2;
            g1 += j1 * r;
            g2 += j2 * r;
          }
          if (c2 > chi2) {
            // the last step went uphill: go back half of it
            stepT *= 0.5;
            stepS *= 0.5;
            lnT -= stepT;
            lnS -= stepS;
            if (Math.max(Math.abs(stepT), Math.abs(stepS)) <= 1e-10) break;
            continue;
          }
          chi2 = c2;
          const det = a11 * a22 - a12 * a12;
          stepT = (a22 * g1 - a12 * g2) / det;
          stepS = (a11 * g2 - a12 * g1) / det;
          lnT += stepT;
          lnS += stepS;
          if (Math.max(Math.abs(stepT), Math.abs(stepS)) <= 1e-10) break;
        }
        sumT += Math.exp(lnT);
      }
      return sumT;
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
