/**
 * Synthesis of an absorption spectrum on a wavelength grid:
 *
 *   F(λ) = F_c(λ) · exp(−Σ_i τ_i(λ)),
 *   τ_i(λ) = τ₀,i · K(u, a) / K(0, a),  u = (λ − λ_i)/b_i,  a = γ_i/b_i,
 *
 * where K(u, a) = Re w(u + ia) is the Voigt function (faddeeva.ts), b_i the
 * Doppler width (1/e half-width; b = √2 σ) and γ_i the Lorentz HWHM, both in
 * metres of wavelength, and τ₀,i the optical depth at line centre. The
 * continuum F_c is supplied by the caller (e.g. a Planck continuum from the
 * radiation module), in any unit; F has the same unit.
 *
 * Line strength is given either as τ₀ or as an equivalent width
 * W = ∫ (1 − e^{−τ(λ)}) dλ (m). For W, τ₀ is found by solving
 * W(τ₀) = W with the curve of growth {@link equivalentWidthFromTau0SI}
 * (the exact integral, evaluated by quadrature, not the weak-line limit
 * W ≈ τ₀ b √π / K(0, a)); W(τ₀) is strictly increasing, so the root is
 * unique, and it is bracketed from below by the weak-line value and found by
 * bisection/secant in ln τ₀ to 1e-10 relative in W.
 *
 * Truncation: each line is evaluated only where its optical depth can exceed
 * `tauCutoff` (default 1e-8): within ±Δ of its centre with
 * Δ = 1.1 b · max(√ln(τ₀/τ_cut), √(τ₀ a/(√π K(0,a) τ_cut))) — the larger of
 * the Gaussian-core and Lorentz-wing (τ ≈ τ₀ a/(√π K(0,a) u²)) distances —
 * and not at all when τ₀ ≤ τ_cut. The optical depth thrown away beyond ±Δ
 * is at most ≈ 2 τ_cut Δ (Lorentz wing, weak-line limit; smaller for pure
 * Gaussians), which bounds the equivalent width lost per line. The cutoff is
 * absolute, i.e. a flux criterion: the truncated flux differs from the
 * untruncated one by less than τ_cut (relative) per line at every point. For
 * a weak damped line the relative EW loss 2 τ_cut Δ / W can be sizeable — e.g.
 * τ₀ = 5e-4, a = γ/b = 0.01, τ_cut = 1e-8 gives Δ ≈ 20 b and a 3e-4 loss —
 * so lower `tauCutoff` (e.g. 1e-13) when equivalent widths of weak lines
 * must be preserved to better than that, at the cost of wider windows
 * (Δ ∝ τ_cut^{−1/2}).
 *
 * @packageDocumentation
 */

import { requireFinite, requireNonNegative, requirePositive, show } from "../../internal/checks";
import { BatchLog, type BatchResult } from "../../law/batch";
import { faddeeva } from "./faddeeva";

const SQRT_PI = Math.sqrt(Math.PI);
const w = new Float64Array(2);

/**
 * One absorption line for {@link synthesizeSpectrumSI}. Give exactly one of
 * `dopplerWidthM` / `gaussianSigmaM` and exactly one of `tau0` /
 * `equivalentWidthM`.
 */
export interface SynthesisLineSI {
  /** Line-centre wavelength, m (> 0). */
  readonly centreM: number;
  /** Doppler width b (1/e half-width of the Gaussian), m (> 0). */
  readonly dopplerWidthM?: number;
  /** Gaussian standard deviation σ = b/√2, m (> 0). */
  readonly gaussianSigmaM?: number;
  /** Lorentz half-width at half-maximum γ, m (≥ 0). */
  readonly lorentzHwhmM: number;
  /** Optical depth at line centre τ₀ (≥ 0). */
  readonly tau0?: number;
  /** Equivalent width W, m (≥ 0). */
  readonly equivalentWidthM?: number;
}

/** Options of {@link synthesizeSpectrumSI}. */
export interface SynthesisOptionsSI {
  /** Optical depth below which a line is not evaluated (default 1e-8; > 0). */
  readonly tauCutoff?: number;
}

/** Result of {@link synthesizeSpectrumSI}: the batch result over the grid (`values` is `out`) plus the τ₀ used for each line. */
export interface SynthesisReportSI extends BatchResult<Float64Array> {
  /** Central optical depth used for each line (solved when W was given). */
  readonly tau0: Float64Array;
}

/** Voigt function K(u, a) for a ≥ 0 (Gaussian when a = 0). Unchecked. */
function voigtK(u: number, a: number): number {
  if (a === 0) return Math.exp(-u * u);
  faddeeva(u, a, w);
  return w[0] as number;
}

/** ∫ f over [lo, hi] by composite Simpson with n (even) intervals. */
function simpson(f: (x: number) => number, lo: number, hi: number, n: number): number {
  const h = (hi - lo) / n;
  let s = f(lo) + f(hi);
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(lo + i * h);
  return (s * h) / 3;
}

function curveOfGrowth(tau0: number, b: number, gamma: number): number {
  if (tau0 === 0) return 0;
  const a = gamma / b;
  const k0 = voigtK(0, a);
  const f = (u: number): number => -Math.expm1((-tau0 * voigtK(u, a)) / k0);
  // Core: [0, U1] with U1 so that τ₀ e^{−U1²} < e^{−40}.
  const u1 = Math.sqrt(Math.max(16, Math.log(Math.max(tau0, 1)) + 40));
  let integral = simpson(f, 0, u1, 2000);
  if (a > 0) {
    // Damping wings: [U1, Umax] in s = ln u (integrand f(e^s) e^s), then the
    // analytic weak Lorentz tail ∫_Umax^∞ τ₀ a/(√π K(0,a) u²) du.
    const uSat = Math.sqrt((tau0 * a) / (SQRT_PI * k0));
    const uMax = Math.max(1e4 * u1, 1e4 * uSat);
    const sLo = Math.log(u1);
    const sHi = Math.log(uMax);
    const n = 2 * Math.ceil((sHi - sLo) / 0.02 / 2);
    integral += simpson((s) => {
      const u = Math.exp(s);
      return f(u) * u;
    }, sLo, sHi, n);
    integral += (tau0 * a) / (SQRT_PI * k0 * uMax);
  }
  return 2 * b * integral;
}

/**
 * Curve of growth: equivalent width of a Voigt absorption line with central
 * optical depth τ₀, W = ∫ (1 − exp(−τ₀ K(u,a)/K(0,a))) dλ, m, with
 * u = Δλ/b, a = γ/b. Evaluated by composite Simpson quadrature on the core
 * (|u| ≤ √(40 + ln τ₀)) and in ln u on the damping wings, plus the analytic
 * far-wing tail; relative accuracy ~1e-10 (tests compare with the weak-line
 * limit τ₀ b √π / K(0,a) and the saturated Gaussian limit).
 *
 * @param tau0 central optical depth (≥ 0)
 * @param dopplerWidthM b, m (> 0)
 * @param lorentzHwhmM γ, m (≥ 0)
 * @example
 * ```ts
 * equivalentWidthFromTau0SI(1e-3, 1e-12, 0); // ≈ 1e-3 · 1e-12 · √π m
 * ```
 */
export function equivalentWidthFromTau0SI(tau0: number, dopplerWidthM: number, lorentzHwhmM: number): number {
  requireNonNegative("tau0", tau0, "(dimensionless)");
  requirePositive("dopplerWidthM", dopplerWidthM, "m");
  requireNonNegative("lorentzHwhmM", lorentzHwhmM, "m");
  return curveOfGrowth(tau0, dopplerWidthM, lorentzHwhmM);
}

/** {@link equivalentWidthFromTau0SI} without the input checks (τ₀ ≥ 0, b > 0, γ ≥ 0, all finite). @internal */
export function equivalentWidthFromTau0Unchecked(tau0: number, dopplerWidthM: number, lorentzHwhmM: number): number {
  return curveOfGrowth(tau0, dopplerWidthM, lorentzHwhmM);
}

function solveTau0(wTarget: number, b: number, gamma: number): number {
  if (wTarget === 0) return 0;
  const a = gamma / b;
  const k0 = voigtK(0, a);
  // Weak-line limit W = τ₀ b √π / K(0,a) is an upper bound on W(τ₀), so its
  // τ₀ is a lower bound on the root.
  let lo = (wTarget * k0) / (b * SQRT_PI);
  let wLo = curveOfGrowth(lo, b, gamma);
  if (Math.abs(wLo - wTarget) <= 1e-12 * wTarget) return lo;
  let hi = lo * 2;
  let wHi = curveOfGrowth(hi, b, gamma);
  for (let i = 0; wHi < wTarget && i < 2000; i++) {
    lo = hi;
    wLo = wHi;
    hi *= 4;
    wHi = curveOfGrowth(hi, b, gamma);
  }
  // Illinois (regula falsi) in ln τ₀ on f = W(τ₀) − W.
  let xl = Math.log(lo);
  let xh = Math.log(hi);
  let fl = wLo - wTarget;
  let fh = wHi - wTarget;
  let side = 0;
  let x = xl;
  for (let it = 0; it < 200; it++) {
    x = (xl * fh - xh * fl) / (fh - fl);
    if (!(x > xl && x < xh)) x = 0.5 * (xl + xh);
    const fx = curveOfGrowth(Math.exp(x), b, gamma) - wTarget;
    if (Math.abs(fx) <= 1e-10 * wTarget || xh - xl < 1e-14) break;
    if (fx < 0) {
      xl = x;
      fl = fx;
      if (side === -1) fh /= 2;
      side = -1;
    } else {
      xh = x;
      fh = fx;
      if (side === 1) fl /= 2;
      side = 1;
    }
  }
  return Math.exp(x);
}

/**
 * Central optical depth τ₀ of a Voigt line with equivalent width W: the root
 * of W(τ₀) = W on the curve of growth ({@link equivalentWidthFromTau0SI}),
 * unique because W(τ₀) is strictly increasing. Dimensionless.
 *
 * @param equivalentWidthM W, m (≥ 0)
 * @param dopplerWidthM b, m (> 0)
 * @param lorentzHwhmM γ, m (≥ 0)
 * @example
 * ```ts
 * tau0FromEquivalentWidthSI(1e-13, 1e-12, 1e-14);
 * ```
 */
export function tau0FromEquivalentWidthSI(equivalentWidthM: number, dopplerWidthM: number, lorentzHwhmM: number): number {
  requireNonNegative("equivalentWidthM", equivalentWidthM, "m");
  requirePositive("dopplerWidthM", dopplerWidthM, "m");
  requireNonNegative("lorentzHwhmM", lorentzHwhmM, "m");
  return solveTau0(equivalentWidthM, dopplerWidthM, lorentzHwhmM);
}

/** {@link tau0FromEquivalentWidthSI} without the input checks (W ≥ 0, b > 0, γ ≥ 0, all finite). @internal */
export function tau0FromEquivalentWidthUnchecked(equivalentWidthM: number, dopplerWidthM: number, lorentzHwhmM: number): number {
  return solveTau0(equivalentWidthM, dopplerWidthM, lorentzHwhmM);
}

/** Validate the grid: finite and strictly increasing. @internal */
export function requireIncreasingGrid(name: string, grid: Float64Array): void {
  for (let i = 0; i < grid.length; i++) {
    const v = grid[i] as number;
    if (!Number.isFinite(v) || (i > 0 && !(v > (grid[i - 1] as number)))) {
      throw new RangeError(`${name} must be finite and strictly increasing (m); element ${i} is ${show(v)}`);
    }
  }
}

/** First index with grid[i] >= x (grid increasing). */
function lowerBound(grid: Float64Array, x: number): number {
  let lo = 0;
  let hi = grid.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((grid[mid] as number) < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function resolveLine(line: SynthesisLineSI, i: number): { b: number; gamma: number } {
  const p = `lines[${i}]`;
  requirePositive(`${p}.centreM`, line.centreM, "m");
  const hasB = line.dopplerWidthM !== undefined;
  const hasS = line.gaussianSigmaM !== undefined;
  if (hasB === hasS) {
    throw new RangeError(`${p} must give exactly one of dopplerWidthM or gaussianSigmaM (m)`);
  }
  const b = hasB
    ? requirePositive(`${p}.dopplerWidthM`, line.dopplerWidthM as number, "m")
    : Math.SQRT2 * requirePositive(`${p}.gaussianSigmaM`, line.gaussianSigmaM as number, "m");
  const gamma = requireNonNegative(`${p}.lorentzHwhmM`, line.lorentzHwhmM, "m");
  const hasT = line.tau0 !== undefined;
  const hasW = line.equivalentWidthM !== undefined;
  if (hasT === hasW) {
    throw new RangeError(`${p} must give exactly one of tau0 or equivalentWidthM`);
  }
  if (hasT) requireNonNegative(`${p}.tau0`, line.tau0 as number, "(dimensionless)");
  else requireNonNegative(`${p}.equivalentWidthM`, line.equivalentWidthM as number, "m");
  return { b, gamma };
}

/**
 * Synthesize F(λ) = F_c(λ) exp(−Σ τ_i(λ)) on a wavelength grid (module
 * header for the model, the W → τ₀ solution and the truncation).
 *
 * Lines and options are validated before anything is written (RangeError
 * naming e.g. `lines[3].tau0`); the grid must be finite and strictly
 * increasing, `continuum` and `out` at least as long as the grid. Rows whose
 * continuum value is not finite become NaN and are reported in `invalid`
 * (batch.ts). `out` doubles as the optical-depth accumulator (no
 * allocation); it may be the same array as `continuum`, in which case a
 * scratch array is allocated.
 *
 * @param wavelengthsM grid, m (strictly increasing)
 * @param continuum continuum F_c on the grid (any unit)
 * @param lines absorption lines
 * @param out output flux F on the grid (same unit as the continuum)
 * @example
 * ```ts
 * const grid = new Float64Array(1001).map((_, i) => 656e-9 + i * 1e-12);
 * const cont = new Float64Array(1001).fill(1);
 * const flux = new Float64Array(1001);
 * synthesizeSpectrumSI(grid, cont, [{ centreM: 656.5e-9, dopplerWidthM: 3e-11, lorentzHwhmM: 1e-12, tau0: 2 }], flux);
 * ```
 */
export function synthesizeSpectrumSI(
  wavelengthsM: Float64Array,
  continuum: Float64Array,
  lines: readonly SynthesisLineSI[],
  out: Float64Array,
  options: SynthesisOptionsSI = {},
): SynthesisReportSI {
  const n = wavelengthsM.length;
  requireIncreasingGrid("wavelengthsM", wavelengthsM);
  if (continuum.length < n) {
    throw new RangeError(`continuum must have length >= ${n} (the grid length); got ${continuum.length}`);
  }
  if (out.length < n) {
    throw new RangeError(`out must have length >= ${n} (the grid length); got ${out.length}`);
  }
  const tauCut = requirePositive("options.tauCutoff", options.tauCutoff ?? 1e-8, "(dimensionless)");
  requireFinite("options.tauCutoff", tauCut, "(dimensionless)");
  const nl = lines.length;
  const resolved: ResolvedLinesSI = {
    centreM: new Float64Array(nl),
    dopplerWidthM: new Float64Array(nl),
    lorentzHwhmM: new Float64Array(nl),
    tau0: new Float64Array(nl),
  };
  for (let i = 0; i < nl; i++) {
    const r = resolveLine(lines[i] as SynthesisLineSI, i);
    resolved.centreM[i] = (lines[i] as SynthesisLineSI).centreM;
    resolved.dopplerWidthM[i] = r.b;
    resolved.lorentzHwhmM[i] = r.gamma;
  }
  for (let i = 0; i < nl; i++) {
    const line = lines[i] as SynthesisLineSI;
    resolved.tau0[i] =
      line.tau0 !== undefined ? line.tau0 : solveTau0(line.equivalentWidthM as number, resolved.dopplerWidthM[i] as number, resolved.lorentzHwhmM[i] as number);
  }
  const log = new BatchLog();
  synthesizeSpectrumUnchecked(wavelengthsM, continuum, resolved, tauCut, out, (j, c) =>
    log.add(j, `continuum must be finite; element ${j} is ${show(c)}`),
  );
  return { ...log.result(out), tau0: resolved.tau0 };
}

/**
 * Lines checked and resolved for {@link synthesizeSpectrumUnchecked}, one
 * entry per line: centre, Doppler width b (σ already turned into b = √2 σ),
 * Lorentz HWHM γ (m) and central optical depth τ₀ (W already solved for).
 *
 * @internal
 */
export interface ResolvedLinesSI {
  /** Line centres, m (finite, > 0). */
  readonly centreM: Float64Array;
  /** Doppler widths b, m (finite, > 0). */
  readonly dopplerWidthM: Float64Array;
  /** Lorentz HWHM γ, m (finite, ≥ 0). */
  readonly lorentzHwhmM: Float64Array;
  /** Central optical depths τ₀ (finite, ≥ 0). */
  readonly tau0: Float64Array;
}

/**
 * {@link synthesizeSpectrumSI} without the checks: the grid finite and
 * strictly increasing, `continuum` and `out` at least as long, the lines
 * resolved and valid, the cutoff `tauCut` finite and > 0. Each row whose
 * continuum value `c` is not finite is written as NaN and passed to
 * `bad(j, c)`, in ascending order.
 *
 * @internal
 */
export function synthesizeSpectrumUnchecked(
  wavelengthsM: Float64Array,
  continuum: Float64Array,
  lines: ResolvedLinesSI,
  tauCut: number,
  out: Float64Array,
  bad: (j: number, c: number) => void,
): void {
  const n = wavelengthsM.length;
  const nl = lines.tau0.length;
  // Optical depth accumulator: `out`, unless it aliases the continuum.
  const tau = out === continuum ? new Float64Array(n) : out;
  tau.fill(0, 0, n);
  for (let i = 0; i < nl; i++) {
    const t0 = lines.tau0[i] as number;
    if (!(t0 > tauCut)) continue;
    const b = lines.dopplerWidthM[i] as number;
    const a = (lines.lorentzHwhmM[i] as number) / b;
    const center = lines.centreM[i] as number;
    const k0 = voigtK(0, a);
    const uCore = Math.sqrt(Math.log(t0 / tauCut));
    const uWing = a > 0 ? Math.sqrt((t0 * a) / (SQRT_PI * k0 * tauCut)) : 0;
    const half = 1.1 * b * Math.max(uCore, uWing);
    const j0 = lowerBound(wavelengthsM, center - half);
    const j1 = lowerBound(wavelengthsM, center + half);
    const scale = t0 / k0;
    const invB = 1 / b;
    if (a === 0) {
      for (let j = j0; j < j1; j++) {
        const u = ((wavelengthsM[j] as number) - center) * invB;
        tau[j] = (tau[j] as number) + scale * Math.exp(-u * u);
      }
    } else {
      for (let j = j0; j < j1; j++) {
        faddeeva(((wavelengthsM[j] as number) - center) * invB, a, w);
        tau[j] = (tau[j] as number) + scale * (w[0] as number);
      }
    }
  }
  for (let j = 0; j < n; j++) {
    const c = continuum[j] as number;
    if (Number.isFinite(c)) {
      out[j] = c * Math.exp(-(tau[j] as number));
    } else {
      out[j] = NaN;
      bad(j, c);
    }
  }
}
