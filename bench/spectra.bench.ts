/**
 * Benchmark of spectrum synthesis on a 10⁵-point wavelength grid with 100
 * Voigt lines (windows from the default τ cutoff 1e-8), against a baseline
 * hand-written plain-number loop of 100 Gaussian-only lines evaluated over the
 * whole grid followed by F = F_c exp(−τ). Three subjects do the same work:
 * the SI kernel (synthesizeSpectrumSI, reusing its output array), the typed
 * path in SI (synthesizeSpectrum: validation in the caller's units, a new
 * output array per call) and the typed path in CGS (the grid and the lines
 * in centimetres, copied to SI on each call). Each case returns a checksum
 * of the flux.
 */

import { assumeArray } from "../src/quantity/quantity";
import type { LengthArray, SpectralFluxPerWavelengthArray } from "../src/quantity/aliases";
import { synthesizeSpectrumSI } from "../src/spectra/kernels/synthesize";
import type { SynthesisLineSI } from "../src/spectra/kernels/synthesize";
import { synthesizeSpectrum, vacuumWavelength, type SynthesisLine } from "../src/spectra/index";
import { CGS, SI } from "../src/quantity/system";
import { assume } from "../src/quantity/quantity";
import type { Length } from "../src/quantity/aliases";
import type { BenchCase } from "./case";


const N_GRID = 100_000;
const N_LINES = 100;
const LAMBDA0 = 500e-9;
const STEP = 1e-13; // 0.1 pm → 10 nm span

const grid = new Float64Array(N_GRID);
const continuum = new Float64Array(N_GRID);
const flux = new Float64Array(N_GRID);
const tau = new Float64Array(N_GRID);
const lines: SynthesisLineSI[] = [];
const typedLinesSI: SynthesisLine<"SI">[] = [];
const typedLinesCGS: SynthesisLine<"CGS">[] = [];
const gridCGS = new Float64Array(N_GRID);
const continuumCGS = new Float64Array(N_GRID);
const centers = new Float64Array(N_LINES);
const bs = new Float64Array(N_LINES);
const tau0s = new Float64Array(N_LINES);

function setup(): void {
  for (let i = 0; i < N_GRID; i++) {
    grid[i] = LAMBDA0 + i * STEP;
    continuum[i] = 1 + 1e-3 * Math.sin(i * 1e-4);
    gridCGS[i] = (grid[i] as number) * 100;
    continuumCGS[i] = (continuum[i] as number) * 0.1; // W m⁻² m⁻¹ → erg s⁻¹ cm⁻² cm⁻¹
  }
  lines.length = 0;
  typedLinesSI.length = 0;
  typedLinesCGS.length = 0;
  // Deterministic pseudo-random line list (LCG), strengths 1e-3 … 10, b ≈ 2–6 pm, a ≈ 1e-3 … 0.1.
  let s = 12345;
  const rnd = (): number => {
    s = (s * 1103515245 + 12345) % 2147483648;
    return s / 2147483648;
  };
  for (let k = 0; k < N_LINES; k++) {
    const c = LAMBDA0 + (0.02 + 0.96 * rnd()) * N_GRID * STEP;
    const b = 2e-12 + 4e-12 * rnd();
    const t0 = 10 ** (-3 + 4 * rnd());
    const a = 10 ** (-3 + 2 * rnd());
    centers[k] = c;
    bs[k] = b;
    tau0s[k] = t0;
    lines.push({ centerM: c, dopplerWidthM: b, lorentzHwhmM: a * b, tau0: t0 });
    typedLinesSI.push({
      center: vacuumWavelength(SI, assume<Length<"SI">>(c)),
      dopplerWidth: assume<Length<"SI">>(b),
      lorentzHwhm: assume<Length<"SI">>(a * b),
      tau0: t0,
    });
    typedLinesCGS.push({
      center: vacuumWavelength(CGS, assume<Length<"CGS">>(c * 100)),
      dopplerWidth: assume<Length<"CGS">>(b * 100),
      lorentzHwhm: assume<Length<"CGS">>(a * b * 100),
      tau0: t0,
    });
  }
}

function baseline(): number {
  tau.fill(0);
  for (let k = 0; k < N_LINES; k++) {
    const c = centers[k] as number;
    const inv = 1 / (bs[k] as number);
    const t0 = tau0s[k] as number;
    for (let i = 0; i < N_GRID; i++) {
      const u = ((grid[i] as number) - c) * inv;
      tau[i] = (tau[i] as number) + t0 * Math.exp(-u * u);
    }
  }
  for (let i = 0; i < N_GRID; i++) flux[i] = (continuum[i] as number) * Math.exp(-(tau[i] as number));
  return checksum(flux);
}

function checksum(f: Float64Array): number {
  let s = 0;
  for (let i = 0; i < f.length; i += 7) s += f[i] as number;
  return s;
}

export const cases: BenchCase[] = [
  {
    name: "synthesis: 1e5-point grid, 100 Voigt lines (baseline: 100 Gaussian lines, full grid, plain loop)",
    sameWork: false,
    setup,
    baseline,
    subject: () => {
      synthesizeSpectrumSI(grid, continuum, lines, flux);
      return checksum(flux);
    },
  },
  {
    name: "synthesis, typed path in SI: synthesizeSpectrum(SI, …) (baseline as above)",
    sameWork: false,
    setup,
    baseline,
    subject: () =>
      checksum(
        synthesizeSpectrum(
          SI,
          assumeArray<LengthArray<"SI">>(grid),
          assumeArray<SpectralFluxPerWavelengthArray<"SI">>(continuum),
          typedLinesSI,
        ).flux,
      ),
  },
  {
    name: "synthesis, typed path in CGS: grid and lines in cm, copied to SI per call (baseline as above)",
    sameWork: false,
    setup,
    baseline,
    // the CGS continuum is 0.1 × the SI one: scale the checksum back for comparability
    subject: () =>
      10 *
      checksum(
        synthesizeSpectrum(
          CGS,
          assumeArray<LengthArray<"CGS">>(gridCGS),
          assumeArray<SpectralFluxPerWavelengthArray<"CGS">>(continuumCGS),
          typedLinesCGS,
        ).flux,
      ),
  },
];
