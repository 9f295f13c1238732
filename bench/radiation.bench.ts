/**
 * Benchmarks of the radiation kernels and of the typed API over them. Each
 * case returns a checksum so the work cannot be optimised away; `baseline` is
 * the bare formula written by hand, `subject` the kernel or the typed
 * function doing the same work, so subject/baseline is the cost multiple of
 * the kernel's robustness (double-double exponent, Wien-tail and log-space
 * branches, input checks) plus, for the typed cases, the wrapper (system
 * conversion, validation in the caller's unit, overflow check of the
 * converted result).
 */
import { C, C2, H } from "../src/constants/values";
import { planckRadianceWavelengthBatchSI, planckRadianceWavelengthSI } from "../src/radiation/kernels/planck";
import { blackbodyFractionBelowWavelengthSI } from "../src/radiation/kernels/band-fraction";
import { planckRadianceWavelength, planckRadianceWavelengthBatch } from "../src/radiation/planck";
import { CGS, SI } from "../src/quantity/system";
import { assume, assumeArray } from "../src/quantity/quantity";
import type { Length, LengthArray, Temperature } from "../src/quantity/aliases";
import type { BenchCase } from "./case";


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

/** The same grid as typed SI and CGS arrays (views of `lambdas`, and a CGS copy in cm). */
let lambdasSI = assumeArray<LengthArray<"SI">>(new Float64Array(0));
let lambdasCGS = assumeArray<LengthArray<"CGS">>(new Float64Array(0));
const tempTyped = assume<Temperature>(T);
function setupTyped(): void {
  setupLambdas();
  if (lambdasCGS.length === N) return;
  lambdasSI = assumeArray<LengthArray<"SI">>(lambdas);
  lambdasCGS = assumeArray<LengthArray<"CGS">>(Float64Array.from(lambdas, (l) => l * 100));
}

/** Bare B_λ loop (the hand-written baseline of the typed cases), in W m^-3 sr^-1. */
function bareLoop(): number {
  let s = 0;
  for (let i = 0; i < N; i++) {
    const l = lambdas[i] as number;
    const v = (2 * H * C * C) / l ** 5 / (Math.exp(C2 / (l * T)) - 1);
    out[i] = v;
    s += v;
  }
  return s;
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
    sameWork: false,
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
  {
    name: "typed planckRadianceWavelengthBatch(SI, …) over 1e6 wavelengths vs bare formula loop",
    setup: setupTyped,
    baseline: bareLoop,
    subject: () => {
      const { values } = planckRadianceWavelengthBatch(SI, lambdasSI, tempTyped);
      let s = 0;
      for (let i = 0; i < N; i++) s += values[i] as number;
      return s;
    },
  },
  {
    name: "typed planckRadianceWavelengthBatch(CGS, …) over 1e6 wavelengths (copy to m, ×10 back) vs bare formula loop",
    setup: setupTyped,
    baseline: bareLoop,
    subject: () => {
      const { values } = planckRadianceWavelengthBatch(CGS, lambdasCGS, tempTyped);
      let s = 0;
      for (let i = 0; i < N; i++) s += (values[i] as number) / 10; // back to SI for the same checksum
      return s;
    },
  },
  {
    name: "typed scalar planckRadianceWavelength(SI, …) in a loop over 1e6 wavelengths vs bare formula loop",
    setup: setupTyped,
    baseline: bareLoop,
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const v = planckRadianceWavelength(SI, lambdasSI[i] as Length<"SI">, tempTyped);
        out[i] = v;
        s += v;
      }
      return s;
    },
  },
];
