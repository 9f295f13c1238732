/**
 * Figures for the tool's reports and `--svg` outputs, drawn with src/plot's
 * `svgChart` from the library's typed physics: a star's SED (data with error
 * bars, model band means, the fitted blackbody; a residual panel; band
 * responses), Planck curves at the fitted temperatures, a
 * temperature–luminosity diagram (temperature decreasing to the right), and
 * a spectrum with its lines marked. Wavelengths are in µm and flux densities
 * per µm throughout.
 *
 * @module
 */
import { AB_ZERO_POINT, C } from "../values/constants";
import { ccm89Ratio } from "../photometry/index";
import type { LengthArray } from "../quantity/aliases";
import { SI } from "../quantity/system";
import { units } from "../quantity/units";
import { planckRadianceWavelengthBatch } from "../radiation/planck";
import { PALETTE, powerOfTenLabel, svgChart, type BandCurve, type MarkerLine } from "../plot/index";
import { parseUnit } from "../quantity/parse";
import { formatValueUncertainty } from "./io/write";
import type { CliBand } from "./bands";
import type { StarMeasurement } from "./fit-adapter";

/**
 * Units of the figures: wavelengths in µm on every x axis, and flux densities
 * per µm (f_λ in W m⁻² µm⁻¹, B_λ in W m⁻² sr⁻¹ µm⁻¹), so that one
 * convention runs through the report.
 */
const FLAMBDA_PLOT = parseUnit("W m^-2 um^-1");
const BLAMBDA_PLOT = parseUnit("W m^-2 sr^-1 um^-1");
/** Axis texts of those units (with sub/superscript markup). */
export const FLAMBDA_LABEL = "f_{λ} [W m⁻² µm⁻¹]";
export const BLAMBDA_LABEL = "B_{λ} [W m⁻² sr⁻¹ µm⁻¹]";

/** Colours of the SED figures: Okabe–Ito blue line, vermilion data, near-black model squares, greys for bands. */
const SED_COLORS = { model: PALETTE[0] as string, data: PALETTE[1] as string, bandMean: "#222222", bands: ["#4d4d4d", "#8c8c8c"] } as const;
/** Marker radius of measured points in the SED (px); error bars shorter than this are hidden by the marker. */
const DATA_RADIUS = 2.5;

/** One star's data for an SED figure. */
export interface SedData {
  readonly name: string;
  readonly measurements: readonly StarMeasurement[];
  readonly temperatureK: number;
  readonly sigmaTemperatureK: number;
  readonly angularDiameterRad: number;
  readonly sigmaAngularDiameterRad: number;
  readonly extinctionAV: number;
  readonly rV: number | null;
  /** Model band means ⟨f_λ⟩ in W m⁻³, one per measurement. */
  readonly modelFLambdaSI: readonly number[];
  /** (measured − model)/σ per measurement, as in the fit's χ² (in magnitudes for AB data). */
  readonly pulls: readonly number[];
  readonly chi2: number;
  readonly dof: number;
}

/** A measurement as f_λ ± σ (W m⁻³) at the band's pivot wavelength. */
export function asFLambda(m: StarMeasurement): { pivotM: number; value: number; sigma: number } {
  const lp = m.band.band.si.pivotWavelengthM;
  if (m.kind === "flambda") return { pivotM: lp, value: m.value, sigma: m.sigma };
  const k = C / (lp * lp);
  if (m.kind === "fnu") return { pivotM: lp, value: m.value * k, sigma: m.sigma * k };
  const fl = AB_ZERO_POINT * 10 ** (-0.4 * m.value) * k;
  return { pivotM: lp, value: fl, sigma: fl * 0.4 * Math.LN10 * m.sigma };
}

/** Logarithmic grid from a to b (n ≥ 2 points). */
export function logGrid(a: number, b: number, n: number): Float64Array {
  const out = new Float64Array(n);
  const la = Math.log(a);
  const step = (Math.log(b) - la) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = Math.exp(la + step * i);
  out[0] = a;
  out[n - 1] = b;
  return out;
}

/** π (θ/2)² B_λ(λ, T) · 10^(−0.4 A_V k(λ)) on a grid (m → W m⁻³), via the typed Planck batch. */
export function blackbodyFluxSI(gridM: Float64Array, temperatureK: number, thetaRad: number, aV: number, rV: number | null): Float64Array {
  const { values } = planckRadianceWavelengthBatch(SI, gridM as LengthArray<"SI">, SI.of(temperatureK, units.K));
  const dilution = Math.PI * (thetaRad / 2) ** 2;
  const out = new Float64Array(gridM.length);
  for (let i = 0; i < gridM.length; i++) {
    let f = (values[i] as number) * dilution;
    if (aV > 0 && rV !== null) {
      const l = gridM[i] as number;
      if (l >= 0.1e-6 && l <= 3.33e-6) f *= 10 ** (-0.4 * aV * ccm89Ratio(SI, SI.of(l, units.m), rV));
    }
    out[i] = f;
  }
  return out;
}

/** The bands' response curves in µm, in alternating neutral greys (the data keep the colours). */
function bandCurves(bands: readonly CliBand[]): BandCurve[] {
  return bands.map((b, i) => ({
    name: b.name,
    x: Array.from(b.curveM.wavelengths, (l) => l * 1e6),
    response: b.curveM.response,
    color: SED_COLORS.bands[i % 2] as string,
  }));
}

/** "photon counting", "energy counting" or "photon and energy counting" for the response axis title. */
function countingOf(bands: readonly CliBand[]): string {
  const kinds = [...new Set(bands.map((b) => b.convention))].sort().reverse();
  return kinds.length === 0 ? "" : `${kinds.join(" and ")} counting`;
}

/** "T = 3041.8 ± 8.3 K", rounded as in the report table (two significant digits of σ). */
export function temperatureText(t: number, sigma: number): string {
  return sigma > 0 && Number.isFinite(sigma) ? `${formatValueUncertainty(t, sigma)} K` : formatK(t);
}

/** "χ²/dof = 4.21/4 = 1.05", or "χ² = 0 (dof = 0)" without degrees of freedom. */
export function chi2Text(chi2: number, dof: number): string {
  if (!(dof > 0)) return `χ² = ${chi2.toPrecision(3)} (dof = 0)`;
  return `χ²/dof = ${chi2.toPrecision(3)}/${dof} = ${(chi2 / dof).toFixed(2)}`;
}

/** The reduced χ² as table text: "1.05", or "" when dof = 0. */
export function reducedChi2Text(chi2: number, dof: number): string {
  return dof > 0 ? (chi2 / dof).toFixed(2) : "";
}

/** What an SED figure shows, with the facts its caption needs. */
export interface SedFigure {
  readonly svg: string;
  /** True when every measured error bar is shorter than the marker radius (so none is visible). */
  readonly barsHidden: boolean;
}

/** Plot height of the SED's upper panel (px), as laid out by svgChart for the figure's size and panels. */
const SED_SIZE = { width: 720, height: 600 } as const;

/** SED figure of one fitted star: data, model band means and blackbody; residuals; band responses. */
export function sedFigure(d: SedData, bands: readonly CliBand[]): SedFigure {
  const points = d.measurements.map(asFLambda);
  const grid = logGrid(0.2e-6, 5e-6, 240);
  const model = blackbodyFluxSI(grid, d.temperatureK, d.angularDiameterRad, d.extinctionAV, d.rV);
  const toPlot = (x: number): number => SI.valueIn(x as never, FLAMBDA_PLOT as never);
  const ys = points.map((p) => toPlot(p.value)).filter((y) => y > 0);
  const peak = Math.max(...Array.from(model, toPlot), ...ys);
  // Range: from a factor 5 below the faintest point to a factor 2.5 above the peak (the legend finds a free corner).
  const floor = Math.min(...ys, peak) / 5;
  const top = peak * 2.5;
  const tText = temperatureText(d.temperatureK, d.sigmaTemperatureK);
  // Are the error bars visible? Half-length in px of the largest bar on the log axis against the marker radius.
  const mainH = approxMainHeight();
  const pxPerDex = mainH / Math.log10(top / floor);
  const barsHidden = points.every((p) => {
    const up = Math.log10((p.value + p.sigma) / p.value) * pxPerDex;
    return !(up >= DATA_RADIUS);
  });
  const maxPull = Math.max(3, ...d.pulls.map((p) => (Number.isFinite(p) ? Math.abs(p) : 0)));
  const lim = Math.ceil(maxPull);
  const svg = svgChart({
    title: `${d.name}: T = ${tText}, ${chi2Text(d.chi2, d.dof)}`,
    description: `Spectral energy distribution of ${d.name}: measured band fluxes with 1σ error bars, the fitted model's band means and the fitted blackbody; below, (measured − model)/σ per band; at the bottom, the band response curves.`,
    width: SED_SIZE.width,
    height: SED_SIZE.height,
    x: { label: "wavelength [µm]", scale: "log", min: 0.2, max: 5 },
    y: { label: FLAMBDA_LABEL, scale: "log", min: floor, max: top },
    series: [
      { type: "line", name: "blackbody fit", x: Array.from(grid, (l) => l * 1e6), y: Array.from(model, toPlot), color: SED_COLORS.model },
      {
        type: "scatter",
        name: "measured ± 1σ",
        x: points.map((p) => p.pivotM * 1e6),
        y: points.map((p) => toPlot(p.value)),
        yErr: points.map((p) => toPlot(p.sigma)),
        color: SED_COLORS.data,
        radius: DATA_RADIUS,
      },
      {
        type: "scatter",
        name: "model band mean",
        x: points.map((p) => p.pivotM * 1e6),
        y: d.modelFLambdaSI.map(toPlot),
        color: SED_COLORS.bandMean,
        radius: 4.5,
        marker: "square",
        hollow: true,
      },
    ],
    residual: {
      y: { label: "residual [σ]", min: -lim, max: lim, ...(lim === 3 ? { ticks: [-3, 0, 3] } : {}) },
      series: [{ type: "scatter", name: "(measured − model)/σ", x: points.map((p) => p.pivotM * 1e6), y: d.pulls, color: SED_COLORS.data, radius: 3 }],
      height: 0.17,
    },
    bands: bandCurves(bands),
    bandPlacement: "panel",
    bandLabel: `normalised response\n(${countingOf(bands)})`,
    bandLabels: "inline",
    legend: true,
  });
  return { svg, barsHidden };
}

/** Height of the SED's main panel as svgChart lays it out (title 38, bottom 50, band panel 24 %, residual 17 %, two 10 px gaps). */
function approxMainHeight(): number {
  const total = SED_SIZE.height - 38 - 50;
  return total - Math.round(total * 0.24) - Math.round(total * 0.17) - 20;
}

/** Labelled wavelengths (µm) of the Planck-curve figure: 1-2-5 steps, so that its two decades can be read. */
const WAVELENGTH_TICKS_UM = [0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100];

/** A star shown in the Planck-curve figure. */
export interface PlanckStar {
  readonly name: string;
  readonly temperatureK: number;
  /** σ(T): when given, T is shown rounded as in the report table. */
  readonly sigmaTemperatureK?: number;
}

/** T rounded to the decimal place of its σ (two significant digits of σ), as in the report table: "27900 K". */
export function roundedK(t: number, sigma: number | undefined): string {
  if (sigma === undefined || !(sigma > 0) || !Number.isFinite(sigma)) return formatK(t);
  const text = formatValueUncertainty(t, sigma);
  return text.startsWith("(") ? formatK(t) : `${text.split(" ± ")[0] ?? ""} K`;
}

/**
 * Planck curves B_λ(λ, T) of a few stars on a log–log plot, x in µm,
 * B_λ per µm, with the bands' pivot wavelengths marked when given.
 */
export function planckFamilyFigure(stars: readonly PlanckStar[], pivotsM: readonly { name: string; pivotM: number }[] = [], title = "Planck curves at the fitted temperatures"): string {
  const fromM = 0.1e-6;
  const toM = 10e-6;
  const grid = logGrid(fromM, toM, 300);
  let peak = 0;
  const series = stars.map((st, i) => {
    const { values } = planckRadianceWavelengthBatch(SI, grid as LengthArray<"SI">, SI.of(st.temperatureK, units.K));
    const y = Array.from(values, (v) => SI.valueIn(v as never, BLAMBDA_PLOT as never));
    for (const v of y) if (v > peak) peak = v;
    const tText = roundedK(st.temperatureK, st.sigmaTemperatureK);
    const label = st.name !== "" ? `${st.name}, ${tText}` : tText;
    return { type: "line" as const, name: label, x: Array.from(grid, (l) => l * 1e6), y, color: PALETTE[i % PALETTE.length] as string };
  });
  const lowest = Math.min(...stars.map((s) => peakRadiance(s.temperatureK)));
  return svgChart({
    title,
    description: `Blackbody spectral radiance per unit wavelength for ${stars.map((s) => roundedK(s.temperatureK, s.sigmaTemperatureK)).join(", ")}${pivotsM.length > 0 ? ", with the bands' pivot wavelengths marked" : ""}.`,
    x: { label: "wavelength [µm]", scale: "log", min: fromM * 1e6, max: toM * 1e6, ticks: WAVELENGTH_TICKS_UM },
    y: { label: BLAMBDA_LABEL, scale: "log", min: Math.max(lowest / 1e3, peak / 1e9), max: peak * 3 },
    series,
    markers: pivotsM.map((p) => ({ x: p.pivotM * 1e6, label: p.name, color: "#8c8c8c" })),
    legend: true,
  });
}

function peakRadiance(t: number): number {
  const lp = 2.897771955e-3 / t; // Wien displacement constant b (CODATA 2018), m K
  const { values } = planckRadianceWavelengthBatch(SI, Float64Array.of(lp) as LengthArray<"SI">, SI.of(t, units.K));
  return SI.valueIn((values[0] as number) as never, BLAMBDA_PLOT as never);
}

/** "5772 K", "27 400 K" → "27400 K". */
export function formatK(t: number): string {
  return `${Number(t.toPrecision(4))} K`;
}

/** Pick up to `n` stars spread evenly over the temperature range (coolest and hottest included). */
export function spreadByTemperature<T extends { temperatureK: number }>(stars: readonly T[], n = 6): T[] {
  const sorted = [...stars].sort((a, b) => a.temperatureK - b.temperatureK);
  if (sorted.length <= n) return sorted;
  const idx = [...new Set(Array.from({ length: n }, (_, i) => Math.round((i * (sorted.length - 1)) / (n - 1))))];
  return idx.map((i) => sorted[i] as T);
}

/** A point of the temperature–luminosity diagram (luminosity in the figure's unit). */
export interface HrPoint {
  readonly name: string;
  readonly temperatureK: number;
  readonly sigmaT?: number;
  readonly luminosity: number;
  readonly sigmaL?: number;
}

/** The temperature axis of the T–L diagrams: hot on the left, 2500–40 000 K unless the data need more. */
export function temperatureAxis(temps: readonly number[]): { label: string; scale: "log"; min: number; max: number; reverse: true; ticks: number[]; tickLabels: string[] } {
  const ok = temps.filter((t) => t > 0 && Number.isFinite(t));
  const min = Math.min(2500, ...ok.map((t) => t / 1.15));
  const max = Math.max(40000, ...ok.map((t) => t * 1.15));
  const ticks: number[] = [];
  const tickLabels: string[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (const m of [1, 2, 3, 5]) {
      const v = m * 10 ** e;
      if (v < min || v > max) continue;
      ticks.push(v);
      tickLabels.push(e < 4 ? String(v) : m === 1 ? powerOfTenLabel(e) : `${m}×${powerOfTenLabel(e)}`);
    }
  }
  return { label: "T_{eff} [K]", scale: "log", min, max, reverse: true, ticks, tickLabels };
}

/** Temperature–luminosity diagram (log–log, temperature decreasing to the right) with 1σ error bars in both. */
export function hrFigure(points: readonly HrPoint[], luminosityUnit: string, truth?: readonly { temperatureK: number; luminosity: number }[], what = "fitted"): string {
  return svgChart({
    title: truth !== undefined ? `Temperature and luminosity: ${what} and true` : "Temperature and luminosity",
    description: "Effective temperature (decreasing to the right) against luminosity of the stars in this run, log–log, with 1σ error bars.",
    x: temperatureAxis(points.map((p) => p.temperatureK)),
    y: { label: `L [${luminosityLabel(luminosityUnit)}]`, scale: "log" },
    series: [
      {
        type: "scatter",
        name: `${what} ± 1σ`,
        x: points.map((p) => p.temperatureK),
        y: points.map((p) => p.luminosity),
        xErr: points.map((p) => p.sigmaT ?? 0),
        yErr: points.map((p) => p.sigmaL ?? 0),
        color: PALETTE[1] as string,
        radius: 3,
      },
      ...(truth !== undefined
        ? [{ type: "scatter" as const, name: "true values", x: truth.map((p) => p.temperatureK), y: truth.map((p) => p.luminosity), color: "#222222", radius: 5, marker: "diamond" as const, hollow: true }]
        : []),
    ],
    legend: truth !== undefined,
  });
}

/** Luminosity unit text for axis labels: `Lsun` → `L_{☉}`. */
export function luminosityLabel(unit: string): string {
  return unit === "Lsun" ? "L_{☉}" : unit;
}

/** A spectrum with its lines marked. */
export function spectrumFigure(title: string, xNm: ArrayLike<number>, y: ArrayLike<number>, yLabel: string, markers: readonly MarkerLine[]): string {
  return svgChart({
    title,
    description: `${title}: synthetic spectrum with the listed lines marked.`,
    x: { label: "wavelength [nm]" },
    y: { label: yLabel },
    series: [{ type: "line", name: "spectrum", x: xNm, y, color: PALETTE[0] as string }],
    markers: markers.map((m) => ({ ...m, color: m.color ?? (PALETTE[1] as string) })),
    legend: false,
  });
}
