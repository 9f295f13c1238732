/**
 * Benchmarks of the radiation kernels. Each case returns a checksum so the
 * work cannot be optimised away; `baseline` is the bare formula written by
 * hand, `subject` the kernel doing the same work, so subject/baseline is the
 * cost multiple of the kernel's robustness (double-double exponent, Wien-tail
 * and log-space branches, input checks).
 */
import { C, C2, H } from "../src/constants/values";
import { planckRadianceWavelengthBatchSI, planckRadianceWavelengthSI } from "../src/radiation/kernels/planck";
import { blackbodyFractionBelowWavelengthSI } from "../src/radiation/kernels/band-fraction";

interface BenchCase {
  name: string;
  setup?: () => void;
  baseline: () => number;
  subject: () => number;
}

const N = 1_000_000;
const T = 5772;
let lambdas = new Float64Array(0);
let out = new Float64Array(0);

function setupLambdas(): void {
  if (lambdas.length === N) return;
  lambdas = new Float64Array(N);
  out = new Float64Array(N);
  // log-spaced 100 nm … 100 µm: both the Wien and the Rayleigh–Jeans sides of a 5772 K spectrum
  const lo = Math.log(1e-7);
  const hi = Math.log(1e-4);
  for (let i = 0; i < N; i++) lambdas[i] = Math.exp(lo + ((hi - lo) * i) / (N - 1));
}

const M = 100_000; // calls per band-fraction case
let lambdaT = new Float64Array(0);
function setupLambdaT(): void {
  if (lambdaT.length === M) return;
  lambdaT = new Float64Array(M);
  for (let i = 0; i < M; i++) lambdaT[i] = 3e-7 + (3e-5 * i) / M;
}

export const cases: BenchCase[] = [
  {
    name: "Planck B_λ over 1e6 wavelengths (batch kernel vs bare formula)",
    setup: setupLambdas,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const l = lambdas[i] as number;
        const v = (2 * H * C * C) / l ** 5 / (Math.exp(C2 / (l * T)) - 1);
        out[i] = v;
        s += v;
      }
      return s;
    },
    subject: () => {
      const { values } = planckRadianceWavelengthBatchSI(lambdas, T, out);
      let s = 0;
      for (let i = 0; i < N; i++) s += values[i] as number;
      return s;
    },
  },
  {
    name: "band fraction F(0→λT) per call vs one Planck evaluation per call",
    setup: setupLambdaT,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < M; i++) s += planckRadianceWavelengthSI(lambdaT[i] as number, T);
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < M; i++) s += blackbodyFractionBelowWavelengthSI(lambdaT[i] as number, T);
      return s;
    },
  },
];
