/**
 * A small, dependency-free SVG chart builder: one function,
 * {@link svgChart}, turns a {@link ChartSpec} into a standalone SVG document
 * string (no DOM, no Node APIs — it runs in browsers and in Node alike).
 *
 * What it draws:
 * - linear or log10 axes with nice ticks (see `ticks.ts`), light grid lines,
 *   axis labels and a title;
 * - line series (one `<path>` each, broken at invalid points and clipped to
 *   the plot area geometrically, so coordinates are always finite and bounded);
 * - scatter series (circles, squares, diamonds or short dashes, filled or
 *   hollow) with optional vertical and horizontal error bars, symmetric or
 *   asymmetric; points outside the axis ranges are omitted, bars are clipped;
 * - reversed axes (`reverse: true`, e.g. temperature decreasing to the right)
 *   and explicit tick values and labels;
 * - an optional residual panel under the main one (its own linear y axis,
 *   a zero line, the same x axis), e.g. (measured − model)/σ;
 * - band response curves, normalised to a peak of 1, either against a
 *   secondary 0–1 axis on the right (`bandPlacement: "axis"`) or in a lower
 *   panel sharing the x axis (`"panel"`, range 0–1.1), named in the legend or
 *   by a label above each curve (`bandLabels: "inline"`);
 * - vertical marker lines with labels (e.g. spectral lines);
 * - a legend, placed in the corner of the main panel that covers the fewest
 *   drawn points (or where asked), and `<title>`/`<desc>` for accessibility.
 *
 * Titles, axis labels, legend names and band names may carry `_{…}`
 * (subscript) and `^{…}` (superscript) markup, e.g. `T_{eff} [K]`; it is
 * drawn with shifted `<tspan>`s and shown as `T_eff` in `<title>` text.
 *
 * Invalid data points (NaN, ±Infinity, or ≤ 0 on a log axis) are skipped
 * silently; invalid chart settings (sizes, ranges, mismatched array lengths)
 * throw a `RangeError` naming the setting.
 *
 * Default colours: the Okabe–Ito colour-blind-safe palette (M. Okabe and
 * K. Ito, "Color Universal Design", 2008), without its yellow, which is too
 * pale on white.
 *
 * @module
 */

import { escapeXml, plainTextFromMarkup, px, svgFromMarkup } from "./xml";
import { MIN_LINEAR_SPAN, linearTicks, logTicks, niceStep } from "./ticks";
import type { Ticks } from "./ticks";

/** Axis scale. */
export type AxisScale = "linear" | "log";

/** One axis. Unset `min`/`max` are taken from the data (rounded out to nice values). */
export interface AxisSpec {
  /** Axis title; may contain `_{…}`/`^{…}` markup and, on a y axis, line breaks (`\n`). */
  readonly label?: string;
  /** `"linear"` (default) or `"log"` (base 10; only values > 0 are drawn). */
  readonly scale?: AxisScale;
  /** Lower end of the axis, in data units (default: from the data, rounded out). */
  readonly min?: number;
  /** Upper end of the axis, in data units (default: from the data, rounded out); must exceed `min`. */
  readonly max?: number;
  /** Draw the axis with values decreasing along it (right to left on x, top to bottom on y). */
  readonly reverse?: boolean;
  /** Labelled tick values (those inside the range are drawn); replaces the automatic major ticks. */
  readonly ticks?: readonly number[];
  /** Labels of `ticks`, one per value (default: the shortest decimal form). */
  readonly tickLabels?: readonly string[];
}

/** Marker shape of a scatter series. */
export type MarkerShape = "circle" | "square" | "diamond" | "dash";

/** A line series (a polyline through the points in the given order). */
export interface LineSeries {
  /** Discriminant: `"line"`. */
  readonly type: "line";
  /** Series name for the legend and the SVG tooltip; may contain `_{…}`/`^{…}` markup. */
  readonly name: string;
  /** x values, in the x axis's data units. */
  readonly x: ArrayLike<number>;
  /** y values, one per x; a non-finite point (or one outside a log axis) breaks the line. */
  readonly y: ArrayLike<number>;
  /** Any SVG colour; default from the palette. */
  readonly color?: string;
  /** Stroke width in px (default 1.5). */
  readonly width?: number;
  /** Draw the line dashed (default false). */
  readonly dashed?: boolean;
}

/** Scatter points with optional vertical and horizontal error bars. */
export interface ScatterSeries {
  /** Discriminant: `"scatter"`. */
  readonly type: "scatter";
  /** Series name for the legend and the SVG tooltip; may contain `_{…}`/`^{…}` markup. */
  readonly name: string;
  /** x values, in the x axis's data units. */
  readonly x: ArrayLike<number>;
  /** y values, one per x; non-finite points and points outside the ranges are omitted. */
  readonly y: ArrayLike<number>;
  /** Symmetric 1σ error (≥ 0), used for both sides unless `yErrLow`/`yErrHigh` are given. */
  readonly yErr?: ArrayLike<number>;
  /** Error towards smaller y (≥ 0). */
  readonly yErrLow?: ArrayLike<number>;
  /** Error towards larger y (≥ 0). */
  readonly yErrHigh?: ArrayLike<number>;
  /** Symmetric horizontal 1σ error (≥ 0), used for both sides unless `xErrLow`/`xErrHigh` are given. */
  readonly xErr?: ArrayLike<number>;
  /** Horizontal error towards smaller x (≥ 0). */
  readonly xErrLow?: ArrayLike<number>;
  /** Horizontal error towards larger x (≥ 0). */
  readonly xErrHigh?: ArrayLike<number>;
  /** Any SVG colour; default from the palette. */
  readonly color?: string;
  /** Point radius in px (default 3): half the width of the marker. */
  readonly radius?: number;
  /** Marker shape (default `"circle"`); `"dash"` is a short horizontal line. */
  readonly marker?: MarkerShape;
  /** Draw the marker as an outline with a transparent inside instead of filled (default false). */
  readonly hollow?: boolean;
}

/** Any plotted series. */
export type Series = LineSeries | ScatterSeries;

/** A band (filter) response curve; it is divided by its own maximum before drawing. */
export interface BandCurve {
  /** Band name; may contain `_{…}`/`^{…}` markup. */
  readonly name: string;
  /** x values (e.g. wavelengths), in the x axis's data units. */
  readonly x: ArrayLike<number>;
  /** Response at each x (any scale; negative values are drawn as 0), same length as `x`. */
  readonly response: ArrayLike<number>;
  /** Any SVG colour; default from the palette, after the series colours. */
  readonly color?: string;
}

/** A labelled vertical line at `x`, drawn only if `x` is inside the x range. */
export interface MarkerLine {
  /** Position on the x axis, in its data units. */
  readonly x: number;
  /** Text drawn beside the line, rotated along it (plain text; none when omitted or empty). */
  readonly label?: string;
  /** Any SVG colour (default `"#555555"`). */
  readonly color?: string;
}

/** Everything {@link svgChart} needs. Only `title` is required. */
export interface ChartSpec {
  /** Chart title; also the SVG `<title>` (accessible name). */
  readonly title: string;
  /** Longer text for `<desc>` (screen readers); not drawn. */
  readonly description?: string;
  /** Width in px (default 720). */
  readonly width?: number;
  /** Height in px (default 440). */
  readonly height?: number;
  /** The x axis. */
  readonly x?: AxisSpec;
  /** The y axis of the main panel. */
  readonly y?: AxisSpec;
  /** Data series, drawn in order in the main panel. */
  readonly series?: readonly Series[];
  /** Band (filter) response curves, each scaled to a peak of 1. */
  readonly bands?: readonly BandCurve[];
  /** Where band curves go: `"axis"` (secondary 0–1 axis on the right, default) or `"panel"` (lower panel). */
  readonly bandPlacement?: "axis" | "panel";
  /** Label of the band axis (default `"band response"`). */
  readonly bandLabel?: string;
  /** Name the bands in the legend (`"legend"`, default) or by a label above each curve (`"inline"`). */
  readonly bandLabels?: "legend" | "inline";
  /** Labelled vertical lines (e.g. spectral lines). */
  readonly markers?: readonly MarkerLine[];
  /** A residual panel between the main panel and the band panel, sharing the x axis. */
  readonly residual?: ResidualPanel;
  /** Show the legend (default: when there are two or more entries). */
  readonly legend?: boolean;
  /** Legend corner in the main panel; `"auto"` (default) picks the corner covering the fewest drawn points, preferring top right. */
  readonly legendPosition?: "auto" | "top-right" | "top-left" | "bottom-right" | "bottom-left";
}

/** A panel under the main one with its own linear y axis, e.g. normalised residuals. */
export interface ResidualPanel {
  /** Linear y axis; unset `min`/`max` give a symmetric range ±max(3, largest |value| rounded up). */
  readonly y?: AxisSpec;
  /** Residual series (e.g. (data − model)/σ), plotted against the shared x axis. */
  readonly series: readonly Series[];
  /** Draw a line at y = 0 (default true). */
  readonly zeroLine?: boolean;
  /** Height as a fraction of the plotting height (default 0.2). */
  readonly height?: number;
}

/** The default colour cycle (Okabe–Ito, without yellow). */
export const PALETTE: readonly string[] = ["#0072B2", "#D55E00", "#009E73", "#CC79A7", "#E69F00", "#56B4E9", "#000000"];

interface Scale {
  readonly log: boolean;
  readonly reverse: boolean;
  readonly min: number;
  readonly max: number;
  readonly ticks: Ticks;
}

interface Rect {
  readonly x: number;
  readonly y: number;
  readonly w: number;
  readonly h: number;
}

/** Largest normalised coordinate kept before clipping; keeps arithmetic finite. */
const LIMIT = 1e6;

/**
 * Build a standalone SVG document (with `xmlns`, `width`, `height`,
 * `viewBox`, `role="img"`, `<title>` and optional `<desc>`) from a chart spec.
 * All text is XML-escaped; all coordinates are finite.
 *
 * @param spec - the chart; see {@link ChartSpec}.
 * @returns the SVG markup.
 * @throws RangeError naming the setting when a size, axis range or data
 *   array length is invalid.
 *
 * @example
 * ```ts
 * import { svgChart } from "starlume";
 * const svg = svgChart({
 *   title: "Planck spectrum, 5772 K",
 *   x: { label: "wavelength [nm]", scale: "log" },
 *   y: { label: "spectral radiance [W m⁻² sr⁻¹ nm⁻¹]" },
 *   series: [{ type: "line", name: "B_λ", x: [100, 500, 1000, 5000], y: [0.2, 26.5, 14.9, 0.1] }],
 *   markers: [{ x: 656.28, label: "Hα" }],
 * });
 * ```
 */
export function svgChart(spec: ChartSpec): string {
  const width = spec.width ?? 720;
  const height = spec.height ?? 440;
  checkSize("width", width);
  checkSize("height", height);
  const series = spec.series ?? [];
  const bands = spec.bands ?? [];
  const markers = spec.markers ?? [];
  const resid = spec.residual;
  const residSeries = resid?.series ?? [];
  series.forEach((s, i) => checkSeries(s, `series[${i}]`));
  residSeries.forEach((s, i) => checkSeries(s, `residual.series[${i}]`));
  bands.forEach((b, i) => {
    if (b.x.length !== b.response.length) {
      throw new RangeError(`bands[${i}] (${b.name}): x and response must have the same length; got ${b.x.length} and ${b.response.length}`);
    }
  });

  const xLog = spec.x?.scale === "log";
  const yLog = spec.y?.scale === "log";
  checkAxis("x", spec.x);
  checkAxis("y", spec.y);
  if (resid !== undefined) {
    if (resid.y?.scale === "log") throw new RangeError(`residual.y.scale must be "linear"; got "log"`);
    checkAxis("residual.y", resid.y);
    const hf = resid.height ?? 0.2;
    if (!(hf >= 0.05 && hf <= 0.6)) throw new RangeError(`residual.height must be a fraction in [0.05, 0.6]; got ${String(resid.height)}`);
  }

  // ---- ranges
  const xs = collectX([...series, ...residSeries], bands, xLog, yLog);
  const xRange = autoRange(spec.x?.min, spec.x?.max, xs.lo, xs.hi, xLog);
  const ys = collectY(series, yLog, xRange, xLog);
  const yRange = autoRange(spec.y?.min, spec.y?.max, ys.lo, ys.hi, yLog);
  const hasData = xs.count > 0 || bands.length > 0;

  // ---- layout
  const showBands = bands.length > 0;
  const panel = showBands && spec.bandPlacement === "panel";
  const bandAxis = showBands && !panel;
  const top = spec.title !== "" ? 38 : 14;
  const left = 78;
  const right = bandAxis ? 62 : 20;
  const bottom = 50;
  const plotW = Math.max(10, width - left - right);
  const totalH = Math.max(20, height - top - bottom);
  const gap = 10;
  const bandH = panel ? Math.round(totalH * 0.24) : 0;
  const residH = resid !== undefined ? Math.round(totalH * (resid.height ?? 0.2)) : 0;
  const mainH = Math.max(10, totalH - bandH - residH - (panel ? gap : 0) - (resid !== undefined ? gap : 0));
  const main: Rect = { x: left, y: top, w: plotW, h: mainH };
  const residRect: Rect = { x: left, y: top + mainH + gap, w: plotW, h: residH };
  const lower: Rect = { x: left, y: top + mainH + (resid !== undefined ? gap + residH : 0) + gap, w: plotW, h: bandH };
  const lowest = panel ? lower : resid !== undefined ? residRect : main;

  const xScale = makeScale(xRange, xLog, Math.max(2, Math.round(plotW / 90)), spec.x);
  const yScale = makeScale(yRange, yLog, Math.max(2, Math.round(main.h / 55)), spec.y);
  const bandScale: Scale = panel
    ? { log: false, reverse: false, min: 0, max: 1.1, ticks: { major: [0, 0.5, 1], minor: [0.25, 0.75], labels: ["0", "0.5", "1"] } }
    : { log: false, reverse: false, min: 0, max: 1, ticks: { major: [0, 0.5, 1], minor: [], labels: ["0", "0.5", "1"] } };
  let residScale: Scale | null = null;
  if (resid !== undefined) {
    let big = 3;
    for (const s of residSeries) {
      for (let i = 0; i < s.y.length; i++) {
        const v = s.y[i] ?? NaN;
        if (Number.isFinite(v) && Math.abs(v) > big && Math.abs(v) < 1e300) big = Math.abs(v);
      }
    }
    const lim = Math.ceil(big);
    const rRange = autoRange(resid.y?.min ?? -lim, resid.y?.max ?? lim, -lim, lim, false);
    residScale = makeScale(rRange, false, Math.max(2, Math.round(residH / 30)), resid.y);
  }

  const o: string[] = [];
  o.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${px(width)}" height="${px(height)}" viewBox="0 0 ${px(width)} ${px(height)}" role="img" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
  );
  o.push(`<title>${escapeXml(plainTextFromMarkup(spec.title))}</title>`);
  if (spec.description !== undefined) o.push(`<desc>${escapeXml(plainTextFromMarkup(spec.description))}</desc>`);
  o.push(`<rect x="0" y="0" width="${px(width)}" height="${px(height)}" fill="#ffffff"/>`);

  // ---- grid and frame
  drawGrid(o, main, xScale, yScale);
  if (residScale !== null) drawGrid(o, residRect, xScale, residScale);
  if (panel) drawGrid(o, lower, xScale, bandScale);

  // ---- bands (behind the data)
  const bandRect = panel ? lower : main;
  const bandYScale: Scale = { ...bandScale, ticks: { major: [], minor: [], labels: [] } };
  const inline = spec.bandLabels === "inline";
  bands.forEach((b, i) => {
    const color = b.color ?? PALETTE[(series.length + i) % PALETTE.length] ?? "#000";
    drawBand(o, b, color, bandRect, xScale, bandYScale, inline);
  });

  // ---- markers
  for (const m of markers) {
    if (!Number.isFinite(m.x)) continue;
    const u = norm(m.x, xScale);
    if (!(u >= 0 && u <= 1)) continue;
    const x = main.x + u * main.w;
    const color = escapeXml(m.color ?? "#555555");
    const y1 = lowest.y + lowest.h;
    o.push(`<line x1="${px(x)}" y1="${px(main.y)}" x2="${px(x)}" y2="${px(y1)}" stroke="${color}" stroke-width="1" stroke-dasharray="4 3"/>`);
    if (m.label !== undefined && m.label !== "") {
      o.push(
        `<text x="${px(x - 3)}" y="${px(main.y + 4)}" transform="rotate(-90 ${px(x - 3)} ${px(main.y + 4)})" text-anchor="end" font-size="10" fill="${color}">${escapeXml(m.label)}</text>`,
      );
    }
  }

  // ---- series (the pixel points they cover are collected for the legend placement)
  const covered: number[] = [];
  series.forEach((s, i) => {
    const color = s.color ?? PALETTE[i % PALETTE.length] ?? "#000";
    if (s.type === "line") drawLine(o, s, color, main, xScale, yScale, covered);
    else drawScatter(o, s, color, main, xScale, yScale, covered);
  });
  if (residScale !== null) {
    if (resid?.zeroLine ?? true) {
      const u = norm(0, residScale);
      if (u >= 0 && u <= 1) {
        const y = residRect.y + (1 - u) * residRect.h;
        o.push(`<path d="M${px(residRect.x)} ${px(y)}H${px(residRect.x + residRect.w)}" stroke="#555555" stroke-width="1"/>`);
      }
    }
    residSeries.forEach((s, i) => {
      const color = s.color ?? PALETTE[i % PALETTE.length] ?? "#000";
      if (s.type === "line") drawLine(o, s, color, residRect, xScale, residScale, []);
      else drawScatter(o, s, color, residRect, xScale, residScale, []);
    });
  }

  if (!hasData) {
    o.push(`<text x="${px(main.x + main.w / 2)}" y="${px(main.y + main.h / 2)}" text-anchor="middle" fill="#777777">no data</text>`);
  }

  // ---- axes
  drawXAxis(o, main, xScale, lowest === main, lowest === main ? spec.x?.label : undefined);
  drawYAxis(o, main, yScale, "left", spec.y?.label);
  if (residScale !== null) {
    drawXAxis(o, residRect, xScale, lowest === residRect, lowest === residRect ? spec.x?.label : undefined);
    drawYAxis(o, residRect, residScale, "left", resid?.y?.label);
  }
  if (panel) {
    drawXAxis(o, lower, xScale, true, spec.x?.label);
    drawYAxis(o, lower, bandScale, "left", spec.bandLabel ?? "band response");
  }
  if (bandAxis) drawYAxis(o, main, bandScale, "right", spec.bandLabel ?? "band response");

  if (spec.title !== "") {
    o.push(`<text x="${px(width / 2)}" y="24" text-anchor="middle" font-size="15" font-weight="bold">${svgFromMarkup(spec.title, 15)}</text>`);
  }

  // ---- legend
  const legendBands = inline ? [] : bands;
  const entries = series.length + legendBands.length;
  if (spec.legend ?? entries >= 2) drawLegend(o, main, series, legendBands, series.length, spec.legendPosition ?? "auto", covered);

  o.push("</svg>");
  return o.join("\n") + "\n";
}

// ---------------------------------------------------------------------------
// validation and ranges

function checkSize(name: string, v: number): void {
  if (!(v >= 50 && v <= 20000)) throw new RangeError(`${name} must be a number in [50, 20000] px; got ${String(v)}`);
}

function checkAxis(name: string, a: AxisSpec | undefined): void {
  if (a === undefined) return;
  if (a.ticks !== undefined) {
    for (const v of Array.from(a.ticks)) {
      if (!Number.isFinite(v) || (a.scale === "log" && !(v > 0))) throw new RangeError(`${name}.ticks must hold finite numbers${a.scale === "log" ? " > 0 (log axis)" : ""}; got ${String(v)}`);
    }
    if (a.tickLabels !== undefined && a.tickLabels.length !== a.ticks.length) {
      throw new RangeError(`${name}.tickLabels must have one label per tick (${a.ticks.length}); got ${a.tickLabels.length}`);
    }
  } else if (a.tickLabels !== undefined) {
    throw new RangeError(`${name}.tickLabels needs ${name}.ticks`);
  }
  const log = a.scale === "log";
  for (const key of ["min", "max"] as const) {
    const v = a[key];
    if (v === undefined) continue;
    if (!Number.isFinite(v) || (log && !(v > 0))) {
      throw new RangeError(`${name}.${key} must be a finite number${log ? " > 0 (log axis)" : ""}; got ${String(v)}`);
    }
  }
  if (a.min !== undefined && a.max !== undefined) {
    if (!(a.min < a.max)) throw new RangeError(`${name}.min must be < ${name}.max; got ${a.min} and ${a.max}`);
    if (!log && !(a.max - a.min >= MIN_LINEAR_SPAN && a.max - a.min < Infinity)) {
      throw new RangeError(`${name}.max - ${name}.min must be finite and >= ${MIN_LINEAR_SPAN}; got ${a.max - a.min}`);
    }
  }
}

function checkSeries(s: Series, where: string): void {
  const n = s.x.length;
  const bad = (what: string, len: number): RangeError =>
    new RangeError(`${where} (${s.name}): ${what} must have the same length as x (${n}); got ${len}`);
  if (s.y.length !== n) throw bad("y", s.y.length);
  if (s.type === "scatter") {
    for (const key of ["yErr", "yErrLow", "yErrHigh", "xErr", "xErrLow", "xErrHigh"] as const) {
      const a = s[key];
      if (a !== undefined && a.length !== n) throw bad(key, a.length);
    }
    if (s.marker !== undefined && !MARKERS.includes(s.marker)) {
      throw new RangeError(`${where} (${s.name}): marker must be one of ${MARKERS.join(", ")}; got ${String(s.marker)}`);
    }
  }
}

const MARKERS: readonly MarkerShape[] = ["circle", "square", "diamond", "dash"];

const valid = (v: number | undefined, log: boolean): v is number =>
  v !== undefined && Number.isFinite(v) && (!log || v > 0);

function collectX(
  series: readonly Series[],
  bands: readonly BandCurve[],
  log: boolean,
  yLog: boolean,
): { lo: number; hi: number; count: number } {
  let lo = Infinity;
  let hi = -Infinity;
  let count = 0;
  const take = (v: number): void => {
    if (!valid(v, log)) return;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  };
  for (const s of series) {
    for (let i = 0; i < s.x.length; i++) {
      const x = s.x[i];
      if (!valid(x, log) || !valid(s.y[i], yLog)) continue;
      take(x);
      count++;
      if (s.type === "scatter") {
        const eLo = s.xErrLow?.[i] ?? s.xErr?.[i];
        const eHi = s.xErrHigh?.[i] ?? s.xErr?.[i];
        if (eLo !== undefined && eLo >= 0 && Number.isFinite(eLo)) take(x - eLo);
        if (eHi !== undefined && eHi >= 0 && Number.isFinite(eHi)) take(x + eHi);
      }
    }
  }
  if (count === 0) {
    // Only bands (or nothing): let the bands set the x range.
    for (const b of bands) {
      for (let i = 0; i < b.x.length; i++) {
        const x = b.x[i];
        if (!valid(x, log)) continue;
        if (x < lo) lo = x;
        if (x > hi) hi = x;
      }
    }
  }
  return { lo, hi, count };
}

function collectY(
  series: readonly Series[],
  log: boolean,
  xRange: readonly [number, number],
  xLog: boolean,
): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  const take = (v: number): void => {
    if (!valid(v, log)) return;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  };
  for (const s of series) {
    for (let i = 0; i < s.x.length; i++) {
      const x = s.x[i];
      const y = s.y[i];
      if (!valid(x, xLog) || !valid(y, log) || x < xRange[0] || x > xRange[1]) continue;
      take(y);
      if (s.type === "scatter") {
        const eLo = s.yErrLow?.[i] ?? s.yErr?.[i];
        const eHi = s.yErrHigh?.[i] ?? s.yErr?.[i];
        if (eLo !== undefined && eLo >= 0 && Number.isFinite(eLo)) take(y - eLo);
        if (eHi !== undefined && eHi >= 0 && Number.isFinite(eHi)) take(y + eHi);
      }
    }
  }
  return { lo, hi };
}

/** Resolve an axis range from explicit limits and data extremes, rounding data-derived ends out to nice values. */
function autoRange(
  min: number | undefined,
  max: number | undefined,
  dataLo: number,
  dataHi: number,
  log: boolean,
): [number, number] {
  // Keep every derived number finite: linear data within ±8e307 (so spans fit in a double),
  // log data within 1e-323…1e308 (decade ends must be representable and > 0).
  const BIG = 8e307;
  let lo = min ?? (log ? Math.max(dataLo, 1e-323) : Math.max(dataLo, -BIG));
  let hi = max ?? (log ? Math.min(dataHi, 1e308) : Math.min(dataHi, BIG));
  if (!(dataLo <= dataHi) && (min === undefined || max === undefined)) {
    // No data: a default range, respecting whichever end was given.
    if (log) {
      lo = min ?? (max !== undefined ? max / 10 : 1);
      hi = max ?? lo * 10;
    } else {
      lo = min ?? (max !== undefined ? max - 1 : 0);
      hi = max ?? lo + 1;
    }
    return [lo, hi];
  }
  if (log) {
    let elo = Math.log10(lo);
    let ehi = Math.log10(hi);
    if (!(elo < ehi)) {
      // Degenerate: widen by half a decade each way, never past an explicit end.
      if (min === undefined) elo -= 0.5;
      if (max === undefined) ehi += 0.5;
    }
    const nlo = min ?? Number(`1e${Math.max(-323, Math.floor(elo + 1e-9))}`);
    const nhi = max ?? Number(`1e${Math.min(308, Math.ceil(ehi - 1e-9))}`);
    if (nlo < nhi) return [nlo, nhi];
    return nlo < 1e307 ? [nlo, nlo * 10] : [nhi / 10, nhi];
  }
  if (!(hi - lo >= MIN_LINEAR_SPAN)) {
    // Degenerate (or narrower than the tick code handles): widen, never past an explicit end.
    const pad = lo === 0 ? 1 : Math.max(Math.abs(lo) * 0.1, MIN_LINEAR_SPAN);
    if (min === undefined) lo -= pad;
    if (max === undefined) hi += pad;
    if (!(hi - lo >= MIN_LINEAR_SPAN)) return [lo, lo + Math.max(1, Math.abs(lo) * 0.1)];
  }
  // Round out to multiples of the 1-2-5 step, computed as decimal literals so that they are exact
  // (a step taken as a difference of ticks, 1.2 − 1 = 0.19999999999999996, could end the range
  // just short of the data); never cut off data.
  const [m, p] = niceStep(hi - lo, 6);
  const step = Number(`${m}e${p}`);
  let nlo = min ?? Number(`${Math.floor(lo / step + 1e-9) * m}e${p}`);
  let nhi = max ?? Number(`${Math.ceil(hi / step - 1e-9) * m}e${p}`);
  if (min === undefined && nlo > lo) nlo = lo;
  if (max === undefined && nhi < hi) nhi = hi;
  return Number.isFinite(nlo) && Number.isFinite(nhi) && nlo < nhi ? [nlo, nhi] : [lo, hi];
}

function makeScale(range: readonly [number, number], log: boolean, target: number, axis: AxisSpec | undefined): Scale {
  const [min, max] = range;
  const auto = log ? logTicks(min, max) : linearTicks(min, max, target);
  const reverse = axis?.reverse === true;
  if (axis?.ticks === undefined) return { log, reverse, min, max, ticks: auto };
  // Explicit ticks: those inside the range are the labelled majors; the automatic ticks become minors.
  const eps = 1e-9 * (log ? 1 : max - min);
  const inside = (v: number): boolean => (log ? v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9) : v >= min - eps && v <= max + eps);
  const major: number[] = [];
  const labels: string[] = [];
  Array.from(axis.ticks).forEach((v, i) => {
    if (!inside(v)) return;
    major.push(v);
    labels.push(axis.tickLabels?.[i] ?? String(Number(v.toPrecision(12))).replace("-", "−"));
  });
  const same = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  const minor = [...auto.major, ...auto.minor].filter((v) => !major.some((m) => same(m, v))).sort((a, b) => a - b);
  return { log, reverse, min, max, ticks: { major, minor, labels } };
}

/** Position of `v` on the axis as a fraction of its length (0 at min, 1 at max), or NaN if not drawable. */
function norm(v: number, s: Scale): number {
  let u: number;
  if (s.log) {
    if (!(v > 0) || v === Infinity) return NaN;
    u = (Math.log10(v) - Math.log10(s.min)) / (Math.log10(s.max) - Math.log10(s.min));
  } else {
    if (!Number.isFinite(v)) return NaN;
    u = v / (s.max - s.min) - s.min / (s.max - s.min);
  }
  if (!Number.isFinite(u)) return NaN;
  if (s.reverse) u = 1 - u;
  return u < -LIMIT ? -LIMIT : u > LIMIT ? LIMIT : u;
}

/**
 * Liang–Barsky clipping of the segment (u0,v0)–(u1,v1) to the unit square.
 * Returns the entry/exit parameters [t0, t1] or null when the segment misses.
 * Source: Y.-D. Liang and B. A. Barsky, "A new concept and method for line
 * clipping", ACM Transactions on Graphics 3(1), 1984.
 */
function clipUnit(u0: number, v0: number, u1: number, v1: number): [number, number] | null {
  const du = u1 - u0;
  const dv = v1 - v0;
  let t0 = 0;
  let t1 = 1;
  const p = [-du, du, -dv, dv];
  const q = [u0, 1 - u0, v0, 1 - v0];
  for (let k = 0; k < 4; k++) {
    const pk = p[k] ?? 0;
    const qk = q[k] ?? 0;
    if (pk === 0) {
      if (qk < 0) return null;
    } else {
      const r = qk / pk;
      if (pk < 0) {
        if (r > t1) return null;
        if (r > t0) t0 = r;
      } else {
        if (r < t0) return null;
        if (r < t1) t1 = r;
      }
    }
  }
  return [t0, t1];
}

// ---------------------------------------------------------------------------
// drawing

function drawGrid(o: string[], r: Rect, xs: Scale, ys: Scale): void {
  const parts: string[] = [];
  for (const v of xs.ticks.major) {
    const x = r.x + norm(v, xs) * r.w;
    parts.push(`M${px(x)} ${px(r.y)}V${px(r.y + r.h)}`);
  }
  for (const v of ys.ticks.major) {
    const y = r.y + (1 - norm(v, ys)) * r.h;
    parts.push(`M${px(r.x)} ${px(y)}H${px(r.x + r.w)}`);
  }
  if (parts.length > 0) o.push(`<path d="${parts.join("")}" stroke="#e3e3e3" stroke-width="1" fill="none"/>`);
  o.push(`<rect x="${px(r.x)}" y="${px(r.y)}" width="${px(r.w)}" height="${px(r.h)}" fill="none" stroke="#333333" stroke-width="1"/>`);
}

function drawXAxis(o: string[], r: Rect, s: Scale, labels: boolean, title: string | undefined): void {
  const base = r.y + r.h;
  const d: string[] = [];
  for (const v of s.ticks.major) d.push(`M${px(r.x + norm(v, s) * r.w)} ${px(base)}v5`);
  for (const v of s.ticks.minor) d.push(`M${px(r.x + norm(v, s) * r.w)} ${px(base)}v3`);
  if (d.length > 0) o.push(`<path d="${d.join("")}" stroke="#333333" stroke-width="1" fill="none"/>`);
  if (labels) {
    s.ticks.major.forEach((v, i) => {
      o.push(
        `<text x="${px(r.x + norm(v, s) * r.w)}" y="${px(base + 18)}" text-anchor="middle">${escapeXml(s.ticks.labels[i] ?? "")}</text>`,
      );
    });
  }
  if (title !== undefined && title !== "") {
    o.push(`<text x="${px(r.x + r.w / 2)}" y="${px(base + 40)}" text-anchor="middle" font-size="13">${svgFromMarkup(title, 13)}</text>`);
  }
}

function drawYAxis(o: string[], r: Rect, s: Scale, side: "left" | "right", title: string | undefined): void {
  const xEdge = side === "left" ? r.x : r.x + r.w;
  const dir = side === "left" ? -1 : 1;
  const d: string[] = [];
  const yOf = (v: number): number => r.y + (1 - norm(v, s)) * r.h;
  for (const v of s.ticks.major) d.push(`M${px(xEdge)} ${px(yOf(v))}h${dir * 5}`);
  for (const v of s.ticks.minor) d.push(`M${px(xEdge)} ${px(yOf(v))}h${dir * 3}`);
  const faint = side === "right" ? ' opacity="0.6"' : "";
  if (d.length > 0) o.push(`<path d="${d.join("")}" stroke="#333333" stroke-width="1" fill="none"${faint}/>`);
  s.ticks.major.forEach((v, i) => {
    o.push(
      `<text x="${px(xEdge + dir * 8)}" y="${px(yOf(v) + 4)}" text-anchor="${side === "left" ? "end" : "start"}"${faint}>${escapeXml(s.ticks.labels[i] ?? "")}</text>`,
    );
  });
  if (title !== undefined && title !== "") {
    // One rotated line per "\n"-separated part; a title that would not fit the panel's height is drawn smaller.
    const lines = title.split("\n");
    const longest = Math.max(...lines.map((l) => [...plainTextFromMarkup(l)].length));
    const size = Math.max(9, Math.min(13, Math.floor(r.h / (0.56 * Math.max(1, longest)))));
    const step = size + 2;
    const y = r.y + r.h / 2;
    lines.forEach((line, k) => {
      const offset = (k - (lines.length - 1) / 2) * step;
      const x = side === "left" ? r.x - 60 + offset : r.x + r.w + 46 + offset;
      o.push(
        `<text x="${px(x)}" y="${px(y)}" transform="rotate(-90 ${px(x)} ${px(y)})" text-anchor="middle" font-size="${size}"${faint}>${svgFromMarkup(line, size)}</text>`,
      );
    });
  }
}

/** Visible pieces of a polyline through (x[i], y[i]), clipped to the rect; each piece is a list of pixel points. */
function clippedPieces(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  r: Rect,
  xs: Scale,
  ys: Scale,
): number[][] {
  const pieces: number[][] = [];
  let cur: number[] | null = null;
  let pu = NaN;
  let pv = NaN;
  const toPx = (u: number, v: number, into: number[]): void => {
    into.push(r.x + u * r.w, r.y + (1 - v) * r.h);
  };
  for (let i = 0; i < x.length; i++) {
    const u = norm(x[i] ?? NaN, xs);
    const v = norm(y[i] ?? NaN, ys);
    if (Number.isNaN(u) || Number.isNaN(v)) {
      cur = null;
      pu = NaN;
      continue;
    }
    if (!Number.isNaN(pu)) {
      const t = clipUnit(pu, pv, u, v);
      if (t === null) cur = null;
      else {
        const [t0, t1] = t;
        const du = u - pu;
        const dv = v - pv;
        if (cur === null || t0 > 0) {
          cur = [];
          pieces.push(cur);
          toPx(pu + t0 * du, pv + t0 * dv, cur);
        }
        toPx(pu + t1 * du, pv + t1 * dv, cur);
        if (t1 < 1) cur = null;
      }
    }
    pu = u;
    pv = v;
  }
  return pieces;
}

function pathData(pieces: readonly number[][]): string {
  let d = "";
  for (const p of pieces) {
    for (let k = 0; k < p.length; k += 2) d += `${k === 0 ? "M" : "L"}${px(p[k] ?? 0)} ${px(p[k + 1] ?? 0)}`;
  }
  return d;
}

/** Add points every ~6 px along each piece to `covered` (pixel x, y pairs), for the legend placement. */
function coverPieces(pieces: readonly number[][], covered: number[]): void {
  for (const p of pieces) {
    for (let k = 0; k + 3 < p.length; k += 2) {
      const x0 = p[k] ?? 0;
      const y0 = p[k + 1] ?? 0;
      const x1 = p[k + 2] ?? 0;
      const y1 = p[k + 3] ?? 0;
      const n = Math.min(200, Math.max(1, Math.ceil(Math.hypot(x1 - x0, y1 - y0) / 6)));
      for (let j = 0; j <= n; j++) covered.push(x0 + ((x1 - x0) * j) / n, y0 + ((y1 - y0) * j) / n);
    }
  }
}

function drawLine(o: string[], s: LineSeries, color: string, r: Rect, xs: Scale, ys: Scale, covered: number[]): void {
  const pieces = clippedPieces(s.x, s.y, r, xs, ys);
  const d = pathData(pieces);
  if (d === "") return;
  coverPieces(pieces, covered);
  const w = s.width !== undefined && s.width > 0 && Number.isFinite(s.width) ? s.width : 1.5;
  const dash = s.dashed === true ? ' stroke-dasharray="6 4"' : "";
  o.push(
    `<path d="${d}" fill="none" stroke="${escapeXml(color)}" stroke-width="${px(w)}" stroke-linejoin="round"${dash}><title>${escapeXml(plainTextFromMarkup(s.name))}</title></path>`,
  );
}

/**
 * SVG markup of one marker centred at (cx, cy); `fill` and `stroke` come from
 * the enclosing group. A hollow marker is an outline with a transparent
 * inside, so a point drawn under it stays visible.
 */
function markerShape(shape: MarkerShape, cx: number, cy: number, rad: number, hollow: boolean): string {
  const h = hollow ? ' fill="none" stroke-width="1.5"' : "";
  switch (shape) {
    case "square":
      return `<rect x="${px(cx - rad)}" y="${px(cy - rad)}" width="${px(2 * rad)}" height="${px(2 * rad)}"${h}/>`;
    case "diamond": {
      const q = rad * 1.3;
      return `<path d="M${px(cx)} ${px(cy - q)}L${px(cx + q)} ${px(cy)}L${px(cx)} ${px(cy + q)}L${px(cx - q)} ${px(cy)}Z"${h}/>`;
    }
    case "dash":
      return `<path d="M${px(cx - 1.6 * rad)} ${px(cy)}H${px(cx + 1.6 * rad)}" fill="none" stroke-width="2"/>`;
    default:
      return `<circle cx="${px(cx)}" cy="${px(cy)}" r="${px(rad)}"${h}/>`;
  }
}

function drawScatter(o: string[], s: ScatterSeries, color: string, r: Rect, xs: Scale, ys: Scale, covered: number[]): void {
  const rad = s.radius !== undefined && s.radius > 0 && Number.isFinite(s.radius) ? s.radius : 3;
  const shape = s.marker ?? "circle";
  const hollow = s.hollow === true;
  const bars: string[] = [];
  const dots: string[] = [];
  const okErr = (e: number | undefined): e is number => e !== undefined && e >= 0 && Number.isFinite(e);
  /** Normalised ends of an error bar along one axis; off-axis ends are clipped (and lose their cap). */
  const ends = (value: number, u: number, eLo: number | undefined, eHi: number | undefined, sc: Scale): { a: number; b: number; capA: boolean; capB: boolean } | null => {
    if (!okErr(eLo) && !okErr(eHi)) return null;
    // "a" is the end at value − eLo, "b" at value + eHi; on a reversed axis a lies above b in u.
    let a = okErr(eLo) ? norm(value - eLo, sc) : u;
    if (Number.isNaN(a)) a = sc.reverse ? 1 : 0; // ≤ 0 on a log axis: off the low end
    let b = okErr(eHi) ? norm(value + eHi, sc) : u;
    if (Number.isNaN(b)) b = sc.reverse ? 0 : 1;
    const capA = okErr(eLo) && a >= 0 && a <= 1;
    const capB = okErr(eHi) && b >= 0 && b <= 1;
    return { a: Math.min(1, Math.max(0, a)), b: Math.min(1, Math.max(0, b)), capA, capB };
  };
  const cap = rad + 1;
  for (let i = 0; i < s.x.length; i++) {
    const x = s.x[i] ?? NaN;
    const y = s.y[i] ?? NaN;
    const u = norm(x, xs);
    const v = norm(y, ys);
    if (!(u >= 0 && u <= 1 && v >= 0 && v <= 1)) continue; // invalid or outside the ranges: omitted
    const cx = r.x + u * r.w;
    const cy = r.y + (1 - v) * r.h;
    dots.push(markerShape(shape, cx, cy, rad, hollow));
    covered.push(cx, cy);
    const ey = ends(y, v, s.yErrLow?.[i] ?? s.yErr?.[i], s.yErrHigh?.[i] ?? s.yErr?.[i], ys);
    if (ey !== null) {
      const ya = r.y + (1 - ey.a) * r.h;
      const yb = r.y + (1 - ey.b) * r.h;
      let d = `M${px(cx)} ${px(ya)}V${px(yb)}`;
      if (ey.capA) d += `M${px(cx - cap)} ${px(ya)}h${px(2 * cap)}`;
      if (ey.capB) d += `M${px(cx - cap)} ${px(yb)}h${px(2 * cap)}`;
      bars.push(d);
    }
    const ex = ends(x, u, s.xErrLow?.[i] ?? s.xErr?.[i], s.xErrHigh?.[i] ?? s.xErr?.[i], xs);
    if (ex !== null) {
      const xa = r.x + ex.a * r.w;
      const xb = r.x + ex.b * r.w;
      let d = `M${px(xa)} ${px(cy)}H${px(xb)}`;
      if (ex.capA) d += `M${px(xa)} ${px(cy - cap)}v${px(2 * cap)}`;
      if (ex.capB) d += `M${px(xb)} ${px(cy - cap)}v${px(2 * cap)}`;
      bars.push(d);
    }
  }
  const c = escapeXml(color);
  o.push(`<g fill="${c}" stroke="${c}"><title>${escapeXml(plainTextFromMarkup(s.name))}</title>`);
  if (bars.length > 0) o.push(`<path d="${bars.join("")}" fill="none" stroke-width="1"/>`);
  o.push(...dots);
  o.push("</g>");
}

function drawBand(o: string[], b: BandCurve, color: string, r: Rect, xs: Scale, ys: Scale, inlineLabel: boolean): void {
  let peak = 0;
  for (let i = 0; i < b.response.length; i++) {
    const v = b.response[i] ?? NaN;
    if (Number.isFinite(v) && v > peak) peak = v;
  }
  if (!(peak > 0)) return;
  const norm01 = Array.from({ length: b.response.length }, (_, i) => {
    const v = b.response[i] ?? NaN;
    return Number.isFinite(v) ? Math.max(0, v / peak) : NaN;
  });
  const pieces = clippedPieces(b.x, norm01, r, xs, ys);
  if (pieces.length === 0) return;
  const base = r.y + r.h;
  let fill = "";
  for (const p of pieces) {
    if (p.length < 4) continue;
    fill += `M${px(p[0] ?? 0)} ${px(base)}`;
    for (let k = 0; k < p.length; k += 2) fill += `L${px(p[k] ?? 0)} ${px(p[k + 1] ?? 0)}`;
    fill += `L${px(p[p.length - 2] ?? 0)} ${px(base)}Z`;
  }
  const c = escapeXml(color);
  o.push(
    `<path d="${fill}" fill="${c}" fill-opacity="0.25" stroke="${c}" stroke-width="1.2"><title>${escapeXml(plainTextFromMarkup(b.name))}</title></path>`,
  );
  if (inlineLabel) {
    // Centre of the part at or above half maximum, just above the curve's peak (y = 1).
    let lo = NaN;
    let hi = NaN;
    for (let i = 0; i < norm01.length; i++) {
      const u = norm(b.x[i] ?? NaN, xs);
      if (!((norm01[i] ?? 0) >= 0.5) || !(u >= 0 && u <= 1)) continue;
      lo = Number.isNaN(lo) ? u : Math.min(lo, u);
      hi = Number.isNaN(hi) ? u : Math.max(hi, u);
    }
    if (Number.isNaN(lo)) return;
    const x = r.x + ((lo + hi) / 2) * r.w;
    const y = r.y + (1 - norm(1, ys)) * r.h - 2;
    o.push(`<text x="${px(x)}" y="${px(y)}" text-anchor="middle" font-size="10" fill="#333333">${svgFromMarkup(b.name, 10)}</text>`);
  }
}

function drawLegend(
  o: string[],
  r: Rect,
  series: readonly Series[],
  bands: readonly BandCurve[],
  bandColourOffset: number,
  position: NonNullable<ChartSpec["legendPosition"]>,
  covered: readonly number[],
): void {
  const names = [...series.map((s) => s.name), ...bands.map((b) => b.name)];
  if (names.length === 0) return;
  const rowH = 16;
  const longest = Math.max(...names.map((n) => [...plainTextFromMarkup(n)].length));
  const w = Math.min(r.w - 8, 34 + longest * 6.5);
  const h = names.length * rowH + 8;
  const corners = {
    "top-right": [r.x + r.w - w - 6, r.y + 6],
    "top-left": [r.x + 6, r.y + 6],
    "bottom-right": [r.x + r.w - w - 6, r.y + r.h - h - 6],
    "bottom-left": [r.x + 6, r.y + r.h - h - 6],
  } as const;
  let pick: keyof typeof corners = position === "auto" ? "top-right" : position;
  if (position === "auto") {
    // The corner whose box (with a 4 px margin) covers the fewest drawn points; ties keep the first in this order.
    let best = Infinity;
    for (const k of ["top-right", "top-left", "bottom-right", "bottom-left"] as const) {
      const [bx, by] = corners[k];
      let n = 0;
      for (let i = 0; i + 1 < covered.length; i += 2) {
        const px0 = covered[i] ?? 0;
        const py0 = covered[i + 1] ?? 0;
        if (px0 >= bx - 4 && px0 <= bx + w + 4 && py0 >= by - 4 && py0 <= by + h + 4) n++;
      }
      if (n < best) {
        best = n;
        pick = k;
      }
    }
  }
  const [x0, y0] = corners[pick];
  o.push(`<g font-size="11">`);
  o.push(`<rect x="${px(x0)}" y="${px(y0)}" width="${px(w)}" height="${px(h)}" fill="#ffffff" fill-opacity="0.85" stroke="#bbbbbb"/>`);
  let row = 0;
  const entry = (swatch: string, name: string): void => {
    const y = y0 + 4 + row * rowH + rowH / 2;
    o.push(swatch.replaceAll("{Y}", px(y)));
    o.push(`<text x="${px(x0 + 28)}" y="${px(y + 4)}">${svgFromMarkup(name, 11)}</text>`);
    row++;
  };
  series.forEach((s, i) => {
    const c = escapeXml(s.color ?? PALETTE[i % PALETTE.length] ?? "#000");
    if (s.type === "line") {
      const dash = s.dashed === true ? ' stroke-dasharray="6 4"' : "";
      entry(`<line x1="${px(x0 + 6)}" y1="{Y}" x2="${px(x0 + 22)}" y2="{Y}" stroke="${c}" stroke-width="2"${dash}/>`, s.name);
    } else {
      // The same marker as plotted (shape, size up to 5 px, filled or hollow), with a bar when the series has error bars.
      const rad = Math.min(5, s.radius !== undefined && s.radius > 0 && Number.isFinite(s.radius) ? s.radius : 3);
      const y = y0 + 4 + row * rowH + rowH / 2;
      const hasY = s.yErr !== undefined || s.yErrLow !== undefined || s.yErrHigh !== undefined;
      const hasX = s.xErr !== undefined || s.xErrLow !== undefined || s.xErrHigh !== undefined;
      let bar = "";
      if (hasY) bar += `M${px(x0 + 14)} ${px(y - 6)}V${px(y + 6)}`;
      if (hasX) bar += `M${px(x0 + 6)} ${px(y)}H${px(x0 + 22)}`;
      const barPath = bar !== "" ? `<path d="${bar}" fill="none" stroke-width="1"/>` : "";
      entry(`<g fill="${c}" stroke="${c}">${barPath}${markerShape(s.marker ?? "circle", x0 + 14, y, rad, s.hollow === true)}</g>`, s.name);
    }
  });
  bands.forEach((b, i) => {
    const c = escapeXml(b.color ?? PALETTE[(bandColourOffset + i) % PALETTE.length] ?? "#000");
    const y = y0 + 4 + row * rowH + rowH / 2;
    entry(`<rect x="${px(x0 + 6)}" y="${px(y - 5)}" width="16" height="10" fill="${c}" fill-opacity="0.25" stroke="${c}"/>`, b.name);
  });
  o.push(`</g>`);
}
