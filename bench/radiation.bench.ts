/**
 * Benchmarks of the radiation laws. `baseline` is the formula written by hand
 * on plain numbers without any validation (λ⁵ by multiplication, e^x − 1 by
 * `Math.expm1`, CGS constants for the CGS loop), `subject` the typed function
 * or kernel doing the same work, so subject/baseline is the cost of the
 * library: validation in the caller's unit, system conversion, the kernel's
 * robustness (double-double exponent, Wien-tail and log-space branches) and,
 * for batches, the invalid-row bookkeeping.
 */
import { C, C1L, C2, H, SIGMA } from "../src/values/constants";
import { planckRadianceWavelengthBatchSI } from "../src/radiation/kernels/planck";
import { blackbodyFractionBelowWavelengthSI } from "../src/radiation/kernels/band-fraction";
import { planckRadianceWavelength, planckRadianceWavelengthBatch } from "../src/radiation/planck";
import { luminosityFromRadiusTemperature } from "../src/radiation/stefan-boltzmann";
import { CGS, SI } from "../src/quantity/system";
import { assume, assumeArray } from "../src/quantity/quantity";
import type { Length, LengthArray, Temperature } from "../src/quantity/aliases";
import type { BenchCase } from "./case";

const N = 1_000_000;
const T = 5772;
let lambdas = new Float64Array(0); // m
let lambdasCm = new Float64Array(0); // cm
let out = new Float64Array(0);

function setupLambdas(): void {
  if (lambdas.length === N) return;
  lambdas = new Float64Array(N);
  out = new Float64Array(N);
  // log-spaced 100 nm … 100 µm: both the Wien and the Rayleigh–Jeans sides of a 5772 K spectrum
  const lo = Math.log(1e-7);
  const hi = Math.log(1e-4);
  for (let i = 0; i < N; i++) lambdas[i] = Math.exp(lo + ((hi - lo) * i) / (N - 1));
  lambdasCm = Float64Array.from(lambdas, (l) => l * 100);
  lambdasSI = assumeArray<LengthArray<"SI">>(lambdas);
  lambdasCGS = assumeArray<LengthArray<"CGS">>(lambdasCm);
}

let lambdasSI = assumeArray<LengthArray<"SI">>(new Float64Array(0));
let lambdasCGS = assumeArray<LengthArray<"CGS">>(new Float64Array(0));
const tempTyped = assume<Temperature>(T);

// CGS constants as an engineer working in CGS would write them: h in erg s, c in cm s⁻¹.
const H_CGS = H * 1e7;
const C_CGS = C * 100;
const C1L_CGS = 2 * H_CGS * C_CGS * C_CGS; // erg cm² s⁻¹
const C2_CGS = C2 * 100; // cm K

// ---- stars for L = 4πR²σT⁴ ------------------------------------------------------------
let radii = new Float64Array(0); // m
let temps = new Float64Array(0); // K
function setupStars(): void {
  if (radii.length === N) return;
  radii = new Float64Array(N);
  temps = new Float64Array(N);
  let s = 12345;
  const rand = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  // R 0.1–1000 R☉, T 2500–40000 K, log-uniform
  for (let i = 0; i < N; i++) {
    radii[i] = 6.957e8 * Math.exp(Math.LN10 * (-1 + 4 * rand()));
    temps[i] = 2500 * Math.exp(Math.log(16) * rand());
  }
}

// ---- band fraction ---------------------------------------------------------------------
const M = 100_000;
let lambdaT = new Float64Array(0);
function setupLambdaT(): void {
  if (lambdaT.length === M) return;
  lambdaT = new Float64Array(M);
  for (let i = 0; i < M; i++) lambdaT[i] = 3e-7 + (3e-5 * i) / M;
}
// ∫₀ˣ t³/(eᵗ − 1) dt = Σ_k B_k x^(k+3) / (k! (k+3)) for x < 2π: coefficients of x^(2j+3), j ≥ 1
const BERNOULLI_EVEN = [1 / 6, -1 / 30, 1 / 42, -1 / 30, 5 / 66, -691 / 2730, 7 / 6, -3617 / 510, 43867 / 798, -174611 / 330];
const SMALL_X: number[] = [];
{
  let fact = 1;
  for (let j = 1; j <= BERNOULLI_EVEN.length; j++) {
    fact *= (2 * j - 1) * (2 * j);
    SMALL_X.push((BERNOULLI_EVEN[j - 1] as number) / (fact * (2 * j + 3)));
  }
}
const FIFTEEN_OVER_PI4 = 15 / (Math.PI * Math.PI * Math.PI * Math.PI);

export const cases: BenchCase[] = [
  {
    name: "B_λ typed scalar (SI), per call",
    note: "planckRadianceWavelength(SI, λ, 5772 K) per call over 1e6 log-spaced λ (100 nm–100 µm), validation included, vs a hand loop C1L/λ⁵/expm1(C2/λT) without validation",
    items: N,
    setup: setupLambdas,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const l = lambdas[i] as number;
        const l2 = l * l;
        s += C1L / (l2 * l2 * l) / Math.expm1(C2 / (l * T));
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += planckRadianceWavelength(SI, lambdasSI[i] as Length<"SI">, tempTyped);
      return s;
    },
  },
  {
    name: "B_λ typed scalar (CGS), per call",
    note: "planckRadianceWavelength(CGS, λ in cm, 5772 K) per call over 1e6 λ vs a hand loop with CGS constants (2hc² in erg cm² s⁻¹, hc/k in cm K)",
    items: N,
    setup: setupLambdas,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const l = lambdasCm[i] as number;
        const l2 = l * l;
        s += C1L_CGS / (l2 * l2 * l) / Math.expm1(C2_CGS / (l * T));
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += planckRadianceWavelength(CGS, lambdasCGS[i] as Length<"CGS">, tempTyped);
      return s;
    },
  },
  {
    name: "L = 4πR²σT⁴ typed scalar (SI), per call",
    note: "luminosityFromRadiusTemperature(SI, R, T) (src/radiation/stefan-boltzmann.ts) per star over 1e6 stars vs 4πσ R² T⁴ by hand",
    items: N,
    setup: setupStars,
    baseline: () => {
      const k = 4 * Math.PI * SIGMA;
      let s = 0;
      for (let i = 0; i < N; i++) {
        const r = radii[i] as number;
        const t = temps[i] as number;
        const t2 = t * t;
        s += k * r * r * t2 * t2;
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += luminosityFromRadiusTemperature(SI, radii[i] as Length<"SI">, temps[i] as Temperature);
      return s;
    },
  },
  {
    name: "B_λ typed batch (SI)",
    note: "planckRadianceWavelengthBatch(SI, 1e6 λ, 5772 K) (new array + invalid/reasons) vs a hand loop into a new Float64Array; checksum Σ values",
    items: N,
    setup: setupLambdas,
    baseline: () => {
      const v = new Float64Array(N);
      for (let i = 0; i < N; i++) {
        const l = lambdas[i] as number;
        const l2 = l * l;
        v[i] = C1L / (l2 * l2 * l) / Math.expm1(C2 / (l * T));
      }
      let s = 0;
      for (let i = 0; i < N; i++) s += v[i] as number;
      return s;
    },
    subject: () => {
      const { values } = planckRadianceWavelengthBatch(SI, lambdasSI, tempTyped);
      let s = 0;
      for (let i = 0; i < N; i++) s += values[i] as number;
      return s;
    },
  },
  {
    name: "B_λ typed batch (CGS)",
    note: "planckRadianceWavelengthBatch(CGS, 1e6 λ in cm, 5772 K) vs a hand CGS loop into a new Float64Array",
    items: N,
    setup: setupLambdas,
    baseline: () => {
      const v = new Float64Array(N);
      for (let i = 0; i < N; i++) {
        const l = lambdasCm[i] as number;
        const l2 = l * l;
        v[i] = C1L_CGS / (l2 * l2 * l) / Math.expm1(C2_CGS / (l * T));
      }
      let s = 0;
      for (let i = 0; i < N; i++) s += v[i] as number;
      return s;
    },
    subject: () => {
      const { values } = planckRadianceWavelengthBatch(CGS, lambdasCGS, tempTyped);
      let s = 0;
      for (let i = 0; i < N; i++) s += values[i] as number;
      return s;
    },
  },
  {
    name: "B_λ kernel batch (SI, caller's array)",
    note: "planckRadianceWavelengthBatchSI(1e6 λ, T, out) vs a hand loop into the same preallocated array",
    items: N,
    setup: setupLambdas,
    baseline: () => {
      for (let i = 0; i < N; i++) {
        const l = lambdas[i] as number;
        const l2 = l * l;
        out[i] = C1L / (l2 * l2 * l) / Math.expm1(C2 / (l * T));
      }
      let s = 0;
      for (let i = 0; i < N; i++) s += out[i] as number;
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
    name: "band fraction F(0→λ) kernel, per call",
    note:
      "blackbodyFractionBelowWavelengthSI(λ, 5772 K) per call over 1e5 λ (300 nm–30 µm) vs the textbook hand series: " +
      "15/π⁴ Σ e^(−nx)/n (x³ + 3x²/n + 6x/n² + 6/n³) for x = hc/λkT ≥ 1.5, 1 − 15/π⁴ Σ B_k x^(k+3)/(k!(k+3)) below",
    items: M,
    setup: setupLambdaT,
    baseline: () => {
      let s = 0;
      for (let i = 0; i < M; i++) {
        const x = C2 / ((lambdaT[i] as number) * T);
        let f: number;
        if (x >= 1.5) {
          const x2 = x * x;
          const x3 = x2 * x;
          let sum = 0;
          for (let n = 1; n < 200; n++) {
            const e = Math.exp(-n * x);
            const term = (e / n) * (x3 + (3 * x2) / n + (6 * x) / (n * n) + 6 / (n * n * n));
            sum += term;
            if (term < 1e-17 * sum) break;
          }
          f = FIFTEEN_OVER_PI4 * sum;
        } else {
          const x2 = x * x;
          let p = x2 * x;
          let integral = p / 3 - (p * x) / 8;
          for (let j = 0; j < SMALL_X.length; j++) {
            p *= x2;
            integral += (SMALL_X[j] as number) * p;
          }
          f = 1 - FIFTEEN_OVER_PI4 * integral;
        }
        s += f;
      }
      return s;
    },
    subject: () => {
      let s = 0;
      for (let i = 0; i < M; i++) s += blackbodyFractionBelowWavelengthSI(lambdaT[i] as number, T);
      return s;
    },
  },
];
