/**
 * Benchmark of spectrum synthesis on a 10⁵-point wavelength grid with 100
 * Voigt lines. The hand-written baseline does what an engineer would write
 * around a Voigt function: for each line, the window of the documented
 * τ-cutoff rule (±1.1 b max(√ln(τ₀/τ_cut), √(τ₀a/(√π K(0,a) τ_cut))), τ_cut
 * = 1e-8), found by binary search on the sorted grid, τ += τ₀ K(u, a)/K(0, a)
 * inside it, then F = F_c exp(−τ). K(u, a) = Re w(u + ia) comes from the
 * library's plain `faddeeva` (a Faddeeva evaluation is not something anyone
 * writes by hand for a script); what is compared is the synthesis around it. Subjects:
 * the SI kernel (synthesizeSpectrumSI, reusing its output array), the typed
 * path in SI (validation in the caller's units, a new output array per call)
 * and in CGS (grid and lines in centimetres, copied to SI per call). Checksum:
 * a strided sum of the flux (the CGS one scaled back to SI).
 */

import { assumeArray } from "../src/quantity/quantity";
import type { LengthArray, SpectralFluxPerWavelengthArray } from "../src/quantity/aliases";
import { synthesizeSpectrumSI } from "../src/spectra/kernels/synthesize";
import type { SynthesisLineSI } from "../src/spectra/kernels/synthesize";
import { synthesizeSpectrum, vacuumWavelength, type SynthesisLine } from "../src/spectra/index";
import { CGS, SI } from "../src/quantity/system";
import { assume } from "../src/quantity/quantity";
import type { Length } from "../src/quantity/aliases";
import { faddeeva } from "../src/spectra/kernels/faddeeva";
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
const centres = new Float64Array(N_LINES);
const bs = new Float64Array(N_LINES);
const gammas = new Float64Array(N_LINES);
const wb = new Float64Array(2); // Faddeeva result (re, im) for the hand loop
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
    const t0 = Math.exp(Math.LN10 * (-3 + 4 * rnd()));
    const a = Math.exp(Math.LN10 * (-3 + 2 * rnd()));
    centres[k] = c;
    bs[k] = b;
    gammas[k] = a * b;
    tau0s[k] = t0;
    lines.push({ centreM: c, dopplerWidthM: b, lorentzHwhmM: a * b, tau0: t0 });
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

function checksum(f: Float64Array): number {
  let s = 0;
  for (let i = 0; i < f.length; i += 7) s += f[i] as number;
  return s;
}

export const cases: BenchCase[] = [
  {
    name: "synthesis kernel (SI), 100 Voigt lines",
    note: "synthesizeSpectrumSI on a 1e5-point grid with 100 Voigt lines (τ_cut 1e-8) vs the hand windowed loop; items = grid points",
    items: N_GRID,
    setup,
    baseline: () => {
      const TAU_CUT = 1e-8;
      tau.fill(0);
      for (let k = 0; k < N_LINES; k++) {
        const t0 = tau0s[k] as number;
        if (!(t0 > TAU_CUT)) continue;
        const c = centres[k] as number;
        const b = bs[k] as number;
        const a = (gammas[k] as number) / b;
        faddeeva(0, a, wb);
        const k0 = wb[0] as number;
        const half = 1.1 * b * Math.max(Math.sqrt(Math.log(t0 / TAU_CUT)), Math.sqrt((t0 * a) / (Math.sqrt(Math.PI) * k0 * TAU_CUT)));
        // first grid index ≥ c − half, and ≥ c + half (binary search)
        let lo = 0;
        let hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c - half) lo = mid + 1;
          else hi = mid;
        }
        const j0 = lo;
        hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c + half) lo = mid + 1;
          else hi = mid;
        }
        const s = t0 / k0;
        const inv = 1 / b;
        for (let j = j0; j < lo; j++) {
          faddeeva(((grid[j] as number) - c) * inv, a, wb);
          tau[j] = (tau[j] as number) + s * (wb[0] as number);
        }
      }
      for (let i = 0; i < N_GRID; i++) flux[i] = (continuum[i] as number) * Math.exp(-(tau[i] as number));
      return checksum(flux);
    },
    subject: () => {
      synthesizeSpectrumSI(grid, continuum, lines, flux);
      return checksum(flux);
    },
  },
  {
    name: "synthesis typed (SI), 100 Voigt lines",
    note: "synthesizeSpectrum(SI, grid, continuum, lines) (new output array) vs the hand windowed loop",
    items: N_GRID,
    setup,
    baseline: () => {
      const TAU_CUT = 1e-8;
      tau.fill(0);
      for (let k = 0; k < N_LINES; k++) {
        const t0 = tau0s[k] as number;
        if (!(t0 > TAU_CUT)) continue;
        const c = centres[k] as number;
        const b = bs[k] as number;
        const a = (gammas[k] as number) / b;
        faddeeva(0, a, wb);
        const k0 = wb[0] as number;
        const half = 1.1 * b * Math.max(Math.sqrt(Math.log(t0 / TAU_CUT)), Math.sqrt((t0 * a) / (Math.sqrt(Math.PI) * k0 * TAU_CUT)));
        // first grid index ≥ c − half, and ≥ c + half (binary search)
        let lo = 0;
        let hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c - half) lo = mid + 1;
          else hi = mid;
        }
        const j0 = lo;
        hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c + half) lo = mid + 1;
          else hi = mid;
        }
        const s = t0 / k0;
        const inv = 1 / b;
        for (let j = j0; j < lo; j++) {
          faddeeva(((grid[j] as number) - c) * inv, a, wb);
          tau[j] = (tau[j] as number) + s * (wb[0] as number);
        }
      }
      for (let i = 0; i < N_GRID; i++) flux[i] = (continuum[i] as number) * Math.exp(-(tau[i] as number));
      return checksum(flux);
    },
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
    name: "synthesis typed (CGS), 100 Voigt lines",
    note: "synthesizeSpectrum(CGS, grid in cm, continuum in CGS, lines in cm) vs the hand windowed loop in SI; checksum scaled back to SI",
    items: N_GRID,
    setup,
    baseline: () => {
      const TAU_CUT = 1e-8;
      tau.fill(0);
      for (let k = 0; k < N_LINES; k++) {
        const t0 = tau0s[k] as number;
        if (!(t0 > TAU_CUT)) continue;
        const c = centres[k] as number;
        const b = bs[k] as number;
        const a = (gammas[k] as number) / b;
        faddeeva(0, a, wb);
        const k0 = wb[0] as number;
        const half = 1.1 * b * Math.max(Math.sqrt(Math.log(t0 / TAU_CUT)), Math.sqrt((t0 * a) / (Math.sqrt(Math.PI) * k0 * TAU_CUT)));
        // first grid index ≥ c − half, and ≥ c + half (binary search)
        let lo = 0;
        let hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c - half) lo = mid + 1;
          else hi = mid;
        }
        const j0 = lo;
        hi = N_GRID;
        while (lo < hi) {
          const mid = (lo + hi) >>> 1;
          if ((grid[mid] as number) < c + half) lo = mid + 1;
          else hi = mid;
        }
        const s = t0 / k0;
        const inv = 1 / b;
        for (let j = j0; j < lo; j++) {
          faddeeva(((grid[j] as number) - c) * inv, a, wb);
          tau[j] = (tau[j] as number) + s * (wb[0] as number);
        }
      }
      for (let i = 0; i < N_GRID; i++) flux[i] = (continuum[i] as number) * Math.exp(-(tau[i] as number));
      return checksum(flux);
    },
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
