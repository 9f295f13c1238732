/**
 * Plotting: chart settings that must not compile (each line under a
 * `@ts-expect-error`; if it ever compiles the directive is unused and both
 * tsc and vitest fail) and honest calls that must (expectTypeOf).
 */
import { describe, expectTypeOf, test } from "vitest";
import { htmlFromMarkup, plainTextFromMarkup, svgChart, type ChartSpec, type MarkerShape, type ResidualPanel, type ScatterSeries } from "../../src/plot/index";

describe("svgChart settings", () => {
  test("a reversed log axis, x/y error bars, hollow squares, a residual panel and inline band labels compile", () => {
    const spec: ChartSpec = {
      title: "T_{eff}",
      x: { scale: "log", reverse: true, ticks: [3000, 10000], tickLabels: ["3000", "10⁴"] },
      series: [{ type: "scatter", name: "s", x: [5000], y: [1], xErr: [50], yErrLow: [0.1], yErrHigh: [0.2], marker: "square", hollow: true }],
      residual: { y: { min: -3, max: 3 }, series: [], zeroLine: true, height: 0.2 },
      bands: [{ name: "b", x: [1, 2], response: [0, 1] }],
      bandPlacement: "panel",
      bandLabels: "inline",
      legendPosition: "auto",
    };
    expectTypeOf(svgChart(spec)).toEqualTypeOf<string>();
    expectTypeOf<MarkerShape>().toEqualTypeOf<"circle" | "square" | "diamond" | "dash">();
    expectTypeOf(htmlFromMarkup("T_{eff}")).toEqualTypeOf<string>();
    expectTypeOf(plainTextFromMarkup("T_{eff}")).toEqualTypeOf<string>();
  });

  test("an unknown marker shape does not compile", () => {
    // @ts-expect-error "star" is not a MarkerShape
    const s: ScatterSeries = { type: "scatter", name: "s", x: [1], y: [1], marker: "star" };
    void s;
  });

  test("reverse is a boolean, not a direction word", () => {
    // @ts-expect-error reverse takes true/false
    const spec: ChartSpec = { title: "t", x: { reverse: "right-to-left" } };
    void spec;
  });

  test("horizontal errors are numbers, not text", () => {
    // @ts-expect-error xErr holds numbers
    const s: ScatterSeries = { type: "scatter", name: "s", x: [1], y: [1], xErr: ["5 %"] };
    void s;
  });

  test("a residual panel needs its series", () => {
    // @ts-expect-error series is required
    const r: ResidualPanel = { y: { min: -3, max: 3 } };
    void r;
  });

  test("band labels are placed in the legend or inline, nowhere else", () => {
    // @ts-expect-error "above" is not a placement
    const spec: ChartSpec = { title: "t", bandLabels: "above" };
    void spec;
  });
});
