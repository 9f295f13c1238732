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
      { type: "line", name: "dashed", x: [200, 400, 800], y: [1e-7, 2e-7, 1e-7], dashed: true, color: "#123456" },
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
              { type: "scatter", name: "s", x: pts.map((p) => p[0]), y: pts.map((p) => p[1]), yErr: pts.map((p) => p[2]) },
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
    expect(svg.match(/fill-opacity="0.12"/g)).toHaveLength(2);
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
