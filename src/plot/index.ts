/**
 * Browser-safe plotting: SVG charts and standalone HTML reports as strings.
 *
 * @module
 */
export { svgChart, PALETTE } from "./svg";
export type { AxisScale, AxisSpec, BandCurve, ChartSpec, LineSeries, MarkerLine, MarkerShape, ResidualPanel, ScatterSeries, Series } from "./svg";
export { linearTicks, logTicks, niceStep, powerOfTenLabel } from "./ticks";
export type { Ticks } from "./ticks";
export { htmlReport } from "./report";
export type { ReportFigure, ReportSpec, ReportTable } from "./report";
export { escapeXml, htmlFromMarkup, plainTextFromMarkup } from "./xml";
