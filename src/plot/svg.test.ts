import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { svgChart } from "./svg";
import type { ChartSpec } from "./svg";
import { xmlProblems } from "./xml-check.test-util";

/** All numbers in geometric attributes (x, y, cx, cy, x1…, width, height, r, d, transform, points, viewBox). */
function coordinates(svg: string): number[] {
  const out: number[] = [];
  for (const m of svg.matchAll(/\s(?:x|y|cx|cy|x1|x2|y1|y2|width|height|r|d|transform|viewBox)="([^"]*)"/g)) {
    for (const n of (m[1] ?? "").matchAll(/-?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?|NaN|Infinity/gi)) out.push(Number(n[0]));
  }
  return out;
}

const hostile = `<script>alert("x")</script> & 'q' ]]> \u0001`;

describe("the XML checker used by these tests can fail", () => {
  it("flags malformed documents", () => {
    expect(xmlProblems("<a><b></a></b>")).not.toEqual([]);
    expect(xmlProblems('<a x="1" x="2"/>')).not.toEqual([]);
    expect(xmlProblems("<a>fish & chips</a>")).not.toEqual([]);
    expect(xmlProblems("<a>1 < 2</a>")).not.toEqual([]);
    expect(xmlProblems("<a x=1/>")).not.toEqual([]);
    expect(xmlProblems("<a/><b/>")).not.toEqual([]);
    expect(xmlProblems("<a>")).not.toEqual([]);
    expect(xmlProblems('<a x="&amp;">&lt;&#956;&#x3bc;</a>')).toEqual([]);
  });
});

describe("svgChart output", () => {
  const full: ChartSpec = {
    title: `Spectrum ${hostile}`,
    description: `Described ${hostile}`,
    x: { label: `λ [nm] ${hostile}`, scale: "log", min: 100, max: 10000 },
    y: { label: "F_λ", scale: "log" },
    series: [
      { type: "line", name: `model ${hostile}`, x: [50, 100, 300, 1000, 3000, 20000], y: [1e-9, 1e-8, 3e-7, 1e-6, 2e-7, 1e-9] },
      { type: "line", name: "dashed", x: [200, 400, 800], y: [1e-7, 2e-7, 1e-7], dashed: true, colour: "#123456" },
      {
        type: "scatter",
        name: "photometry",
        x: [350, 450, 650, 1200],
        y: [2e-7, 5e-7, 8e-7, 4e-7],
        yErrLow: [1e-8, 5e-7, 1e-8, 2e-8],
        yErrHigh: [2e-8, 1e-7, 1e-8, 1e-6],
      },
    ],
    bands: [
      { name: "B", x: [350, 400, 450, 500, 550], response: [0, 0.6, 1.2, 0.5, 0] },
      { name: "V", x: [480, 530, 580, 630, 680], response: [0, 30, 45, 20, 0] },
    ],
    markers: [
      { x: 656.28, label: `Hα ${hostile}` },
      { x: 50, label: "off the axis" },
    ],
  };

  it("is a well-formed standalone SVG with title, desc, xmlns, viewBox and size", () => {
    const svg = svgChart(full);
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" width="720" height="440" viewBox="0 0 720 440" role="img"/);
    expect(svg).toMatch(/^<svg[^>]*>\n<title>Spectrum &lt;script&gt;/);
    expect(svg).toContain("<desc>Described &lt;script&gt;");
    expect(svg).not.toContain("<script");
    expect(svg).not.toContain("\u0001");
    expect(svg).toContain("Hα &lt;script&gt;");
    expect(svg).not.toContain("off the axis"); // marker outside the x range is not drawn
    // Log x axis 100…10000 → decade labels.
    for (const label of ["100", "1000", "10000"]) expect(svg).toContain(`>${label}</text>`);
    expect(svg).toContain("band response");
  });

  it("has only finite coordinates, inside the canvas, even with hostile data", () => {
    const spec: ChartSpec = {
      title: "extremes",
      series: [
        { type: "line", name: "a", x: [0, 1, 2, 3, 4, 5], y: [1, Number.NaN, 1e300, -1e308, Infinity, 2] },
        { type: "scatter", name: "b", x: [0, 1e308, -1e308, 2], y: [1, 2, 3, Number.NaN], yErr: [Infinity, 1, -1, 1] },
      ],
      x: { min: 0, max: 5 },
      y: { min: 0, max: 3 },
    };
    const svg = svgChart(spec);
    expect(xmlProblems(svg)).toEqual([]);
    const c = coordinates(svg);
    expect(c.length).toBeGreaterThan(20);
    for (const v of c) {
      expect(Number.isFinite(v)).toBe(true);
      // Canvas is 720×440; rotation angles (-90) are the only negatives expected.
      expect(v).toBeGreaterThanOrEqual(-90);
      expect(v).toBeLessThanOrEqual(720);
    }
  });

  it("property: random data never yields NaN/Infinity and is always well-formed", () => {
    const num = fc.oneof(
      fc.double({ min: -1e6, max: 1e6, noNaN: true }),
      fc.constantFrom(Number.NaN, Infinity, -Infinity, 0, 1e-300, 1e300, -1e300),
    );
    fc.assert(
      fc.property(
        fc.array(fc.tuple(num, num, fc.double({ min: 0, max: 1e3, noNaN: true })), { maxLength: 30 }),
        fc.boolean(),
        fc.boolean(),
        (pts, xLog, yLog) => {
          const svg = svgChart({
            title: "random",
            x: { scale: xLog ? "log" : "linear" },
            y: { scale: yLog ? "log" : "linear" },
            series: [
              { type: "line", name: "l", x: pts.map((p) => p[0]), y: pts.map((p) => p[1]) },
              { type: "scatter", name: "s", x: pts.map((p) => p[0]), y: pts.map((p) => p[1]), yErr: pts.map((p) => p[2]), xErr: pts.map((p) => p[2]) },
            ],
            bands: [{ name: "band", x: pts.map((p) => p[0]), response: pts.map((p) => Math.abs(p[1])) }],
          });
          expect(svg).not.toMatch(/NaN|Infinity/);
          expect(xmlProblems(svg)).toEqual([]);
          for (const v of coordinates(svg)) expect(Math.abs(v)).toBeLessThanOrEqual(720);
        },
      ),
      { numRuns: 60 },
    );
  });

  it("property: reversed axes, x error bars, markers, residual and band panels keep every coordinate finite and inside the canvas", () => {
    const num = fc.oneof(
      fc.double({ min: -1e6, max: 1e6, noNaN: true }),
      fc.constantFrom(Number.NaN, Infinity, -Infinity, 0, 1e-300, 1e300, -1e300),
    );
    fc.assert(
      fc.property(
        fc.array(fc.tuple(num, num, fc.double({ min: 0, max: 1e3, noNaN: true })), { maxLength: 25 }),
        fc.boolean(),
        fc.boolean(),
        fc.constantFrom("circle", "square", "diamond", "dash") as fc.Arbitrary<"circle" | "square" | "diamond" | "dash">,
        (pts, xLog, rev, marker) => {
          const svg = svgChart({
            title: "random T_{eff}",
            x: { scale: xLog ? "log" : "linear", reverse: rev },
            y: { reverse: !rev },
            series: [{ type: "scatter", name: "s", x: pts.map((p) => p[0]), y: pts.map((p) => p[1]), xErrLow: pts.map((p) => p[2]), yErrHigh: pts.map((p) => p[2]), hollow: rev, marker }],
            residual: { series: [{ type: "scatter", name: "r", x: pts.map((p) => p[0]), y: pts.map((p) => p[1] / 1e3) }] },
            bands: [{ name: "b_{1}", x: pts.map((p) => p[0]), response: pts.map((p) => Math.abs(p[2])) }],
            bandPlacement: "panel",
            bandLabels: "inline",
          });
          expect(svg).not.toMatch(/NaN|Infinity/);
          expect(xmlProblems(svg)).toEqual([]);
          for (const v of coordinates(svg)) expect(Math.abs(v)).toBeLessThanOrEqual(720);
        },
      ),
      { numRuns: 60 },
    );
  });

  it("labels a log axis over 1e-7…1e-5 with its decades", () => {
    const svg = svgChart({ title: "decades", y: { scale: "log" }, series: [{ type: "line", name: "l", x: [0, 1, 2], y: [1e-7, 3e-6, 1e-5] }] });
    for (const label of ["10⁻⁷", "10⁻⁶", "10⁻⁵"]) expect(svg).toContain(`>${label}</text>`);
    expect(svg).not.toContain(">10⁻⁸<");
    expect(svg).not.toContain(">10⁻⁴<");
  });

  it("omits scatter points outside the ranges and clips lines to the plot area", () => {
    const svg = svgChart({
      title: "clip",
      legend: false,
      x: { min: 0, max: 10 },
      y: { min: 0, max: 10 },
      series: [
        { type: "scatter", name: "p", x: [5, 20, 5, -1], y: [5, 5, 50, 5] },
        { type: "line", name: "l", x: [-10, 20], y: [5, 5] },
      ],
    });
    expect(svg.match(/<circle /g)).toHaveLength(1);
    // The horizontal line is cut at the frame: its path spans exactly the plot rectangle.
    const frame = /<rect x="([\d.]+)" y="[\d.]+" width="([\d.]+)" height="[\d.]+" fill="none" stroke="#333333"/.exec(svg);
    const line = /<path d="M([\d.]+) ([\d.]+)L([\d.]+) ([\d.]+)" fill="none" stroke="#D55E00"/.exec(svg);
    expect(frame).not.toBeNull();
    expect(line).not.toBeNull();
    const left = Number(frame?.[1]);
    const w = Number(frame?.[2]);
    expect(Number(line?.[1])).toBeCloseTo(left, 2);
    expect(Number(line?.[3])).toBeCloseTo(left + w, 2);
  });

  it("draws asymmetric error bars in proportion", () => {
    const svg = svgChart({
      title: "bars",
      x: { min: 0, max: 2 },
      y: { min: 0, max: 20 },
      series: [{ type: "scatter", name: "p", x: [1], y: [10], yErrLow: [1], yErrHigh: [3] }],
    });
    const cy = Number(/<circle cx="[\d.]+" cy="([\d.]+)"/.exec(svg)?.[1]);
    const bar = /<path d="M[\d.]+ ([\d.]+)V([\d.]+)[^"]*" fill="none" stroke-width="1"\/>/.exec(svg);
    expect(bar).not.toBeNull();
    const yLo = Number(bar?.[1]);
    const yHi = Number(bar?.[2]);
    // Pixels round to 0.01; the bar halves are ≈ 9 and 27 px, so the ratio is good to ~1e-3.
    expect((cy - yHi) / (yLo - cy)).toBeCloseTo(3, 2);
  });

  it("handles empty data", () => {
    for (const spec of [
      { title: "empty" },
      { title: "empty log", x: { scale: "log" as const }, y: { scale: "log" as const }, series: [{ type: "line" as const, name: "n", x: [], y: [] }] },
      { title: "all invalid", y: { scale: "log" as const }, series: [{ type: "scatter" as const, name: "n", x: [1, 2], y: [-1, Number.NaN] }] },
    ]) {
      const svg = svgChart(spec);
      expect(xmlProblems(svg)).toEqual([]);
      expect(svg).toContain(">no data</text>");
      expect(svg).not.toMatch(/NaN|Infinity/);
    }
  });

  it("automatic linear ranges always contain the data (regression: 1…2 ended at 1.9999999999999996 and dropped y = 2)", () => {
    const svg = svgChart({ title: "", legend: false, series: [{ type: "scatter", name: "d", x: [1, 2], y: [1, 2] }] });
    expect(svg.match(/<circle /g)).toHaveLength(2);
    expect(svg).toContain(">2.0</text>");
  });

  it("handles a single point (degenerate range)", () => {
    const svg = svgChart({ title: "one", series: [{ type: "scatter", name: "p", x: [3], y: [7] }] });
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg.match(/<circle /g)).toHaveLength(1);
  });

  it("puts bands in a lower panel when asked", () => {
    const svg = svgChart({ ...full, bandPlacement: "panel" });
    expect(xmlProblems(svg)).toEqual([]);
    // Two framed plot areas: main and lower panel.
    expect(svg.match(/fill="none" stroke="#333333" stroke-width="1"\/>/g)).toHaveLength(2);
    expect(svg.match(/<path [^>]*fill-opacity="0.25"/g)).toHaveLength(2);
  });

  it("rejects invalid settings with RangeErrors naming them", () => {
    expect(() => svgChart({ title: "t", width: 0 })).toThrow(/width/);
    expect(() => svgChart({ title: "t", height: Number.NaN })).toThrow(/height/);
    expect(() => svgChart({ title: "t", x: { min: 2, max: 1 } })).toThrow(/x\.min must be < x\.max/);
    expect(() => svgChart({ title: "t", y: { scale: "log", min: 0 } })).toThrow(/y\.min.*log/);
    expect(() => svgChart({ title: "t", series: [{ type: "line", name: "bad", x: [1, 2], y: [1] }] })).toThrow(/series\[0\] \(bad\): y/);
    expect(() =>
      svgChart({ title: "t", series: [{ type: "scatter", name: "e", x: [1], y: [1], yErrHigh: [1, 2] }] }),
    ).toThrow(/yErrHigh/);
    expect(() => svgChart({ title: "t", bands: [{ name: "B", x: [1], response: [] }] })).toThrow(/bands\[0\]/);
  });
});

/** Pixel geometry of the default 720 × 440 chart without a band axis: plot area x 78…700, y 38…390 (hand-computed from the layout constants). */
const PLOT = { left: 78, width: 622, top: 38, height: 352 } as const;
const circles = (svg: string): { cx: number; cy: number }[] =>
  [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)"/g)].map((m) => ({ cx: Number(m[1]), cy: Number(m[2]) }));

describe("svgChart: reversed axes", () => {
  it("puts larger x values further left on a reversed linear axis, and reverses the tick labels", () => {
    const spec: ChartSpec = { title: "rev", legend: false, x: { min: 0, max: 10, reverse: true }, y: { min: 0, max: 10 }, series: [{ type: "scatter", name: "p", x: [2, 8], y: [5, 5] }] };
    const [a, b] = circles(svgChart(spec));
    // x = 2 sits 20 % from the right edge, x = 8 20 % from the left edge.
    expect(a?.cx).toBeCloseTo(PLOT.left + 0.8 * PLOT.width, 2);
    expect(b?.cx).toBeCloseTo(PLOT.left + 0.2 * PLOT.width, 2);
    const svg = svgChart(spec);
    const x0 = Number(/<text x="([\d.]+)" y="[\d.]+" text-anchor="middle">0<\/text>/.exec(svg)?.[1]);
    const x10 = Number(/<text x="([\d.]+)" y="[\d.]+" text-anchor="middle">10<\/text>/.exec(svg)?.[1]);
    expect(x0).toBeCloseTo(PLOT.left + PLOT.width, 2);
    expect(x10).toBeCloseTo(PLOT.left, 2);
  });

  it("reverses a log axis the same way (hot stars on the left)", () => {
    const svg = svgChart({ title: "T", legend: false, x: { scale: "log", min: 1000, max: 100000, reverse: true }, y: { min: 0, max: 1 }, series: [{ type: "scatter", name: "p", x: [10000, 31622.776601683792], y: [0.5, 0.5] }] });
    const [a, b] = circles(svg);
    expect(a?.cx).toBeCloseTo(PLOT.left + 0.5 * PLOT.width, 2); // 10⁴ is mid-way on 10³…10⁵
    expect(b?.cx).toBeCloseTo(PLOT.left + 0.25 * PLOT.width, 2); // 10^4.5 a quarter from the left
  });

  it("reverses a y axis: larger values lower", () => {
    const svg = svgChart({ title: "y", legend: false, x: { min: 0, max: 1 }, y: { min: 0, max: 4, reverse: true }, series: [{ type: "scatter", name: "p", x: [0.5], y: [1] }] });
    expect(circles(svg)[0]?.cy).toBeCloseTo(PLOT.top + 0.25 * PLOT.height, 2);
  });
});

describe("svgChart: horizontal error bars", () => {
  it("draws symmetric x error bars to scale, with caps", () => {
    const svg = svgChart({ title: "xerr", legend: false, x: { min: 0, max: 10 }, y: { min: 0, max: 10 }, series: [{ type: "scatter", name: "p", x: [5], y: [5], xErr: [1] }] });
    const cy = PLOT.top + 0.5 * PLOT.height;
    const xa = PLOT.left + 0.4 * PLOT.width; // 4
    const xb = PLOT.left + 0.6 * PLOT.width; // 6
    const bar = /<path d="M([\d.]+) ([\d.]+)H([\d.]+)M([\d.]+) [\d.]+v[\d.]+M([\d.]+) [\d.]+v[\d.]+" fill="none"/.exec(svg);
    expect(bar).not.toBeNull();
    expect(Number(bar?.[1])).toBeCloseTo(xa, 2);
    expect(Number(bar?.[2])).toBeCloseTo(cy, 2);
    expect(Number(bar?.[3])).toBeCloseTo(xb, 2);
    expect(Number(bar?.[4])).toBeCloseTo(xa, 2);
    expect(Number(bar?.[5])).toBeCloseTo(xb, 2);
  });

  it("draws asymmetric x errors in proportion, mirrored on a reversed axis", () => {
    for (const reverse of [false, true]) {
      const svg = svgChart({ title: "xerr", legend: false, x: { min: 0, max: 20, reverse }, y: { min: 0, max: 2 }, series: [{ type: "scatter", name: "p", x: [10], y: [1], xErrLow: [1], xErrHigh: [3] }] });
      const cx = circles(svg)[0]?.cx ?? NaN;
      const bar = /<path d="M([\d.]+) [\d.]+H([\d.]+)/.exec(svg);
      const toLow = Number(bar?.[1]); // end at x − xErrLow
      const toHigh = Number(bar?.[2]); // end at x + xErrHigh
      // Pixels round to 0.01 on bars of ≈ 31 and 93 px: the ratio is good to ~1e-3.
      expect((toHigh - cx) / (cx - toLow)).toBeCloseTo(3, 2);
      expect(toHigh > cx).toBe(!reverse);
    }
  });

  it("clips x bars at the frame and drops the cap there; takes x errors into the automatic range", () => {
    const clipped = svgChart({ title: "c", legend: false, x: { min: 0, max: 10 }, y: { min: 0, max: 10 }, series: [{ type: "scatter", name: "p", x: [9], y: [5], xErr: [5] }] });
    const bar = /<path d="M([\d.]+) [\d.]+H([\d.]+)((?:M[^"]*)?)" fill="none"/.exec(clipped);
    expect(Number(bar?.[2])).toBeCloseTo(PLOT.left + PLOT.width, 2);
    expect(bar?.[3]?.match(/M/g)).toHaveLength(1); // one cap only (at x = 4)
    const auto = svgChart({ title: "a", legend: false, series: [{ type: "scatter", name: "p", x: [5, 6], y: [1, 2], xErr: [0, 20] }] });
    expect(auto).toContain(">25</text>"); // 6 + 20 = 26 → the range reaches past 25
  });

  it("rejects x error arrays of the wrong length", () => {
    expect(() => svgChart({ title: "t", series: [{ type: "scatter", name: "e", x: [1, 2], y: [1, 2], xErr: [1] }] })).toThrow(/series\[0\] \(e\): xErr must have the same length as x \(2\); got 1/);
    expect(() => svgChart({ title: "t", series: [{ type: "scatter", name: "e", x: [1], y: [1], xErrLow: [] }] })).toThrow(/xErrLow/);
  });
});

describe("svgChart: explicit ticks", () => {
  it("labels exactly the given ticks inside the range, with the given labels; the automatic ones become minor", () => {
    const svg = svgChart({
      title: "t",
      legend: false,
      x: { scale: "log", min: 2500, max: 40000, ticks: [1000, 3000, 5000, 10000, 20000], tickLabels: ["1000", "3000", "5000", "10⁴", "2×10⁴"] },
      y: { min: 0, max: 1 },
      series: [{ type: "scatter", name: "p", x: [5000], y: [0.5] }],
    });
    for (const label of ["3000", "5000", "10⁴", "2×10⁴"]) expect(svg).toContain(`>${label}</text>`);
    expect(svg).not.toContain(">1000</text>"); // outside the range
    expect(svg).not.toContain(">10000</text>"); // the automatic label is replaced
  });

  it("validates ticks and labels", () => {
    expect(() => svgChart({ title: "t", x: { ticks: [1, 2], tickLabels: ["a"] } })).toThrow(/x\.tickLabels must have one label per tick \(2\); got 1/);
    expect(() => svgChart({ title: "t", x: { scale: "log", ticks: [0, 1] } })).toThrow(/x\.ticks must hold finite numbers > 0/);
    expect(() => svgChart({ title: "t", y: { tickLabels: ["a"] } })).toThrow(/y\.tickLabels needs y\.ticks/);
  });
});

describe("svgChart: markers and legend", () => {
  it("draws squares, diamonds and dashes, filled or hollow, and the legend shows the same marker", () => {
    const svg = svgChart({
      title: "m",
      x: { min: 0, max: 4 },
      y: { min: 0, max: 4 },
      series: [
        { type: "scatter", name: "sq", x: [1], y: [1], marker: "square", hollow: true, radius: 4, colour: "#111111" },
        { type: "scatter", name: "di", x: [2], y: [2], marker: "diamond", colour: "#222222" },
        { type: "scatter", name: "da", x: [3], y: [3], marker: "dash", colour: "#333333" },
      ],
    });
    expect(xmlProblems(svg)).toEqual([]);
    // One hollow square in the plot and one in the legend, both transparent inside.
    expect(svg.match(/<rect [^>]*width="8" height="8" fill="none" stroke-width="1.5"\/>/g)).toHaveLength(2);
    expect(svg.match(/<path d="M[\d.]+ [\d.]+L[\d.]+ [\d.]+L[\d.]+ [\d.]+L[\d.]+ [\d.]+Z"\/>/g)).toHaveLength(2); // diamonds
    expect(svg.match(/<path d="M[\d.]+ [\d.]+H[\d.]+" fill="none" stroke-width="2"\/>/g)).toHaveLength(2); // dashes
    expect(svg).not.toContain("<circle");
    expect(() => svgChart({ title: "t", series: [{ type: "scatter", name: "x", x: [1], y: [1], marker: "star" as never }] })).toThrow(/marker must be one of/);
  });

  it("places the legend in the corner covering the fewest points (top right first)", () => {
    const corner = (xs: number[], ys: number[]): { x: number; y: number } => {
      const svg = svgChart({ title: "l", x: { min: 0, max: 10 }, y: { min: 0, max: 10 }, series: [{ type: "line", name: "a", x: xs, y: ys }, { type: "line", name: "b", x: [], y: [] }] });
      const m = /<g font-size="11">\n<rect x="([\d.]+)" y="([\d.]+)"/.exec(svg);
      return { x: Number(m?.[1]), y: Number(m?.[2]) };
    };
    const empty = corner([0, 1], [0, 1]); // nothing in the top right
    expect(empty.x).toBeGreaterThan(PLOT.left + PLOT.width / 2);
    expect(empty.y).toBeLessThan(PLOT.top + PLOT.height / 2);
    const rising = corner([0, 10], [0, 10]); // a diagonal through the top right and bottom left
    expect(rising.x).toBeLessThan(PLOT.left + PLOT.width / 2); // top left
    expect(rising.y).toBeLessThan(PLOT.top + PLOT.height / 2);
    const high = corner([0, 10], [9.5, 9.5]); // a line along the top
    expect(high.y).toBeGreaterThan(PLOT.top + PLOT.height / 2);
  });

  it("names bands by a label above each curve instead of in the legend when asked", () => {
    const svg = svgChart({
      title: "b",
      series: [{ type: "line", name: "model", x: [1, 2], y: [1, 2] }, { type: "scatter", name: "data", x: [1.5], y: [1.5] }],
      bands: [{ name: "tp_{450}", x: [1.2, 1.3, 1.4], response: [0, 5, 0] }],
      bandPlacement: "panel",
      bandLabels: "inline",
    });
    expect(xmlProblems(svg)).toEqual([]);
    const label = /<text x="([\d.]+)" y="([\d.]+)" text-anchor="middle" font-size="10" fill="#333333">tp<tspan dy="3" font-size="7.5">450<\/tspan><\/text>/.exec(svg);
    expect(label).not.toBeNull();
    expect(svg.match(/<g font-size="11">[\s\S]*?<\/g>\n<\/svg>/)?.[0]).not.toContain("450"); // not in the legend
    // Centred on the half-maximum part of the curve (x = 1.3 here).
    const axis = svgChart({ title: "b", legend: false, x: { min: 1, max: 2 }, bands: [{ name: "B", x: [1.2, 1.3, 1.4], response: [0, 5, 0] }], bandPlacement: "panel", bandLabels: "inline" });
    const lx = Number(/<text x="([\d.]+)"[^>]*fill="#333333">B</.exec(axis)?.[1]);
    expect(lx).toBeCloseTo(PLOT.left + 0.3 * PLOT.width, 1);
  });
});

describe("svgChart: residual panel", () => {
  const spec: ChartSpec = {
    title: "r",
    legend: false,
    x: { min: 0, max: 10 },
    y: { min: 1, max: 100, scale: "log" },
    series: [{ type: "scatter", name: "d", x: [5], y: [10] }],
    residual: { y: { label: "residual [σ]" }, series: [{ type: "scatter", name: "z", x: [5], y: [1.5] }] },
    bands: [{ name: "B", x: [4, 5, 6], response: [0, 1, 0] }],
    bandPlacement: "panel",
  };

  it("adds a framed panel between the main and band panels with a zero line and a default ±3 range", () => {
    const svg = svgChart(spec);
    expect(xmlProblems(svg)).toEqual([]);
    const frames = [...svg.matchAll(/<rect x="78" y="([\d.]+)" width="622" height="([\d.]+)" fill="none" stroke="#333333"/g)].map((m) => ({ y: Number(m[1]), h: Number(m[2]) }));
    expect(frames).toHaveLength(3);
    const [main, resid, band] = frames as [{ y: number; h: number }, { y: number; h: number }, { y: number; h: number }];
    expect(resid.y).toBeGreaterThan(main.y + main.h);
    expect(band.y).toBeGreaterThan(resid.y + resid.h);
    // Zero line at the middle of the ±3 panel; the point at +1.5 a quarter of the height above it.
    const zero = /<path d="M78 ([\d.]+)H700" stroke="#555555" stroke-width="1"\/>/.exec(svg);
    expect(Number(zero?.[1])).toBeCloseTo(resid.y + resid.h / 2, 2);
    const cy = circles(svg)[1]?.cy ?? NaN;
    expect(cy).toBeCloseTo(resid.y + resid.h * 0.25, 2);
    expect(svg).toContain(">residual [σ]</text>");
    // Only the lowest panel carries the x tick labels.
    expect(svg.match(/text-anchor="middle">5<\/text>/g)).toHaveLength(1);
  });

  it("widens the range symmetrically to the largest |value| rounded up, and refuses a log residual axis", () => {
    const svg = svgChart({ ...spec, residual: { series: [{ type: "scatter", name: "z", x: [5], y: [-4.2] }] } });
    expect(svg).toContain(">−5</text>");
    expect(svg).toContain(">5</text>");
    const frames = [...svg.matchAll(/<rect x="78" y="([\d.]+)" width="622" height="([\d.]+)" fill="none"/g)].map((m) => ({ y: Number(m[1]), h: Number(m[2]) }));
    const resid = frames[1] as { y: number; h: number };
    expect(circles(svg)[1]?.cy).toBeCloseTo(resid.y + resid.h * (0.5 + 4.2 / 10), 2); // range ±5
    expect(() => svgChart({ ...spec, residual: { y: { scale: "log" }, series: [] } })).toThrow(/residual\.y\.scale/);
    expect(() => svgChart({ ...spec, residual: { height: 0.9, series: [] } })).toThrow(/residual\.height/);
  });
});

describe("svgChart: sub- and superscript markup", () => {
  it("draws T_{eff} with a shifted tspan, escapes its content, and keeps T_eff in <title>", () => {
    const svg = svgChart({ title: "T_{eff} of <b>", x: { label: "T_{<i>} [K]" }, y: { label: "L [L_{☉}]\n(second line)" }, series: [{ type: "line", name: "x^{2}", x: [1, 2], y: [1, 4] }] });
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).toContain("<title>T_eff of &lt;b&gt;</title>");
    expect(svg).toContain('T<tspan dy="4.5" font-size="11.25">eff</tspan><tspan dy="-4.5"> of &lt;b&gt;</tspan>');
    expect(svg).toContain('T<tspan dy="3.9" font-size="9.75">&lt;i&gt;</tspan><tspan dy="-3.9"> [K]</tspan>');
    expect(svg).toContain("<title>x^2</title>");
    expect(svg).not.toContain("_{");
    // A y title with a line break is drawn as two rotated lines, side by side.
    expect(svg).toMatch(/rotate\(-90[^)]*\)" text-anchor="middle" font-size="\d+">L \[L<tspan[^>]*>☉<\/tspan><tspan[^>]*>\]<\/tspan><\/text>/);
    expect(svg).toMatch(/rotate\(-90[^)]*\)" text-anchor="middle" font-size="\d+">\(second line\)<\/text>/);
  });
});
