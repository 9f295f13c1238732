import { beforeAll, describe, expect, it } from "vitest";
import { loadBands, type BandSet } from "./bands";
import { asFLambda, chi2Text, hrFigure, planckFamilyFigure, roundedK, sedFigure, spreadByTemperature, temperatureAxis, type SedData } from "./figures";
import { MemoryStream } from "./test-util";
import { xmlProblems } from "../plot/xml-check.test-util";

let bandSet: BandSet;
beforeAll(async () => {
  bandSet = await loadBands("demo", { stdout: new MemoryStream(), stderr: new MemoryStream() });
});

/** A synthetic star: f_λ data at relative uncertainty `rel`, the model equal to the data, residuals as given. */
function star(rel: number, pulls: readonly number[]): SedData {
  const measurements = bandSet.bands.map((band, i) => {
    const value = 1e-9 * (1 + 0.2 * i); // W m⁻³ (= 1e-15 W m⁻² µm⁻¹ …): any positive numbers do
    return { band, kind: "flambda" as const, value, sigma: value * rel };
  });
  return {
    name: "S <1>",
    measurements,
    temperatureK: 5772.04,
    sigmaTemperatureK: 12.3,
    angularDiameterRad: 1e-9,
    sigmaAngularDiameterRad: 1e-11,
    extinctionAV: 0,
    rV: null,
    modelFLambdaSI: measurements.map((m) => m.value),
    pulls,
    chi2: 4.2,
    dof: 4,
  };
}

/** The plot frames (main, residual, band panel) of an SED: y and height in px. */
function frames(svg: string): { y: number; h: number }[] {
  return [...svg.matchAll(/<rect x="78" y="([\d.]+)" width="[\d.]+" height="([\d.]+)" fill="none" stroke="#333333"/g)].map((m) => ({ y: Number(m[1]), h: Number(m[2]) }));
}

/** The scatter groups of an SED by series name: marker centres (circles) and error-bar path. */
function group(svg: string, name: string): string {
  const esc = name.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return new RegExp(`<g fill="[^"]+" stroke="[^"]+"><title>${esc}</title>([\\s\\S]*?)</g>`).exec(svg)?.[1] ?? "";
}

describe("SED figure", () => {
  it("titles the star with T ± σ rounded as in the table and χ²/dof; escapes the name", () => {
    const { svg } = sedFigure(star(0.02, [0, 0, 0, 0, 0, 0]), bandSet.bands);
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).toContain("<title>S &lt;1&gt;: T = 5772 ± 12 K, χ²/dof = 4.20/4 = 1.05</title>");
    expect(chi2Text(0, 0)).toBe("χ² = 0.00 (dof = 0)");
  });

  it("has three panels: SED, residuals, band responses; the residuals sit at (measured − model)/σ", () => {
    const pulls = [2, -1, 0, 0.5, -2.5, 1];
    const { svg } = sedFigure(star(0.02, pulls), bandSet.bands);
    const f = frames(svg);
    expect(f).toHaveLength(3);
    const resid = f[1] as { y: number; h: number };
    const cys = [...group(svg, "(measured − model)/σ").matchAll(/cy="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(cys).toHaveLength(6);
    // Range ±3: the point at p is (0.5 − p/6) of the panel height from its top (pixels round to 0.01).
    cys.forEach((cy, i) => expect(cy).toBeCloseTo(resid.y + resid.h * (0.5 - (pulls[i] as number) / 6), 1));
    expect(svg).toContain(">residual [σ]</text>");
    expect(svg).toContain(">−3</text>");
  });

  it("widens the residual range to ±⌈largest |pull|⌉ for a large pull", () => {
    const { svg } = sedFigure(star(0.02, [7.2, 0, 0, 0, 0, 0]), bandSet.bands);
    const resid = frames(svg)[1] as { y: number; h: number };
    const cy = Number(/cy="([\d.]+)"/.exec(group(svg, "(measured − model)/σ"))?.[1]);
    expect(cy).toBeCloseTo(resid.y + resid.h * (0.5 - 7.2 / 16), 1); // range ±8
  });

  it("draws model band means as hollow squares over the data, and the legend has exactly three matching entries", () => {
    const { svg } = sedFigure(star(0.02, [0, 0, 0, 0, 0, 0]), bandSet.bands);
    const squares = svg.match(/<rect [^>]*fill="none" stroke-width="1.5"\/>/g) ?? [];
    expect(squares).toHaveLength(6 + 1); // six bands + the legend marker
    // Drawn after (on top of) the measured points.
    expect(svg.indexOf("<title>model band mean</title>")).toBeGreaterThan(svg.indexOf("<title>measured ± 1σ</title>"));
    const legend = /<g font-size="11">([\s\S]*?)<\/g>\n<\/svg>/.exec(svg)?.[1] ?? "";
    expect(legend.match(/<text /g)).toHaveLength(3);
    // Band names are written above their curves instead.
    for (const b of bandSet.bands) expect(svg).toContain(`fill="#333333">${b.name}</text>`);
    expect(svg).toContain("normalised response</text>");
    expect(svg).toContain("(photon counting)</text>");
    expect(svg).toContain('f<tspan dy="3.9" font-size="9.75">λ</tspan><tspan dy="-3.9"> [W m⁻² µm⁻¹]</tspan>');
  });

  it("reports whether every error bar is shorter than the marker — consistent with the bars actually drawn", () => {
    for (const rel of [0.005, 0.02, 0.1, 0.3]) {
      const { svg, barsHidden } = sedFigure(star(rel, [0, 0, 0, 0, 0, 0]), bandSet.bands);
      const bars = [...group(svg, "measured ± 1σ").matchAll(/M[\d.]+ ([\d.]+)V([\d.]+)/g)];
      const cys = [...group(svg, "measured ± 1σ").matchAll(/cy="([\d.]+)"/g)].map((m) => Number(m[1]));
      expect(bars).toHaveLength(6);
      // The upper half (to value + σ) against the 2.5 px marker radius.
      const upper = bars.map((b, i) => (cys[i] as number) - Number(b[2]));
      expect(barsHidden, `rel ${rel}`).toBe(upper.every((u) => u < 2.5));
    }
    expect(sedFigure(star(0.005, [0, 0, 0, 0, 0, 0]), bandSet.bands).barsHidden).toBe(true);
    expect(sedFigure(star(0.3, [0, 0, 0, 0, 0, 0]), bandSet.bands).barsHidden).toBe(false);
  });

  it("converts AB magnitudes and f_ν to f_λ at the pivot wavelength (f_λ = f_ν c/λ², AB zero point 3631 Jy)", () => {
    const band = bandSet.bands[2];
    if (band === undefined) throw new Error("no band");
    const lp = band.band.si.pivotWavelengthM;
    const c = 299792458; // m s⁻¹, exact (SI)
    const fnu = asFLambda({ band, kind: "fnu", value: 3631e-26, sigma: 1e-28 });
    const ab = asFLambda({ band, kind: "abmag", value: 0, sigma: 0.01 });
    expect(fnu.value / ((3631e-26 * c) / (lp * lp)) - 1).toBeLessThan(1e-12);
    // AB = 0 is 3631 Jy (Oke & Gunn 1983; common practice): the same f_λ as the f_ν above, to the zero point's rounding.
    expect(Math.abs(ab.value / fnu.value - 1)).toBeLessThan(1e-3);
    // σ(f) = f · 0.4 ln 10 · σ(m) (first order).
    expect(ab.sigma / ab.value).toBeCloseTo(0.4 * Math.LN10 * 0.01, 12);
  });
});

describe("temperature–luminosity diagram", () => {
  it("has hot stars on the left, 2500–40 000 K by default, labelled 3000, 5000, 10⁴, 2×10⁴, 3×10⁴", () => {
    const axis = temperatureAxis([3000, 9000]);
    expect([axis.min, axis.max, axis.reverse]).toEqual([2500, 40000, true]);
    expect(axis.ticks).toEqual([3000, 5000, 10000, 20000, 30000]);
    expect(axis.tickLabels).toEqual(["3000", "5000", "10⁴", "2×10⁴", "3×10⁴"]);
    // Stars outside the default range widen it (by 15 %).
    expect(temperatureAxis([50000]).max).toBeCloseTo(57500, 6);
    expect(temperatureAxis([2000]).min).toBeCloseTo(2000 / 1.15, 6);
  });

  it("draws both error bars, hotter to the left, with hollow diamonds for the truth", () => {
    const svg = hrFigure(
      [
        { name: "cool", temperatureK: 3000, sigmaT: 30, luminosity: 0.01, sigmaL: 0.001 },
        { name: "hot", temperatureK: 20000, sigmaT: 2000, luminosity: 1000, sigmaL: 100 },
      ],
      "Lsun",
      [{ temperatureK: 21000, luminosity: 1100 }],
    );
    expect(xmlProblems(svg)).toEqual([]);
    const cx = [...group(svg, "fitted ± 1σ").matchAll(/<circle cx="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(cx[1]).toBeLessThan(cx[0] as number);
    const bars = group(svg, "fitted ± 1σ");
    expect(bars).toMatch(/M[\d.]+ [\d.]+V[\d.]+/); // vertical
    expect(bars).toMatch(/M[\d.]+ [\d.]+H[\d.]+/); // horizontal
    expect(group(svg, "true values")).toMatch(/Z" fill="none" stroke-width="1.5"\/>/);
    expect(svg).toContain('T<tspan dy="3.9" font-size="9.75">eff</tspan><tspan dy="-3.9"> [K]</tspan>');
    expect(svg).toContain('L [L<tspan dy="3.9" font-size="9.75">☉</tspan><tspan dy="-3.9">]</tspan>');
  });
});

describe("Planck curves and helpers", () => {
  it("labels 0.1, 0.2, 0.5, 1, 2, 5, 10 µm, names each star, and marks the band pivots", () => {
    const svg = planckFamilyFigure(
      [{ name: "A", temperatureK: 3041.77, sigmaTemperatureK: 8.3 }, { name: "B", temperatureK: 27853, sigmaTemperatureK: 1012 }],
      [{ name: "tp450", pivotM: 0.45e-6 }],
    );
    expect(xmlProblems(svg)).toEqual([]);
    for (const l of ["0.1", "0.2", "0.5", "1", "2", "5", "10"]) expect(svg).toContain(`text-anchor="middle">${l}</text>`);
    expect(svg).toContain(">A, 3041.8 K</text>");
    expect(svg).toContain(">B, 27900 K</text>");
    expect(svg).toContain(">tp450</text>");
  });

  it("rounds T to its σ as the table does, and spreads the stars shown over the temperature range", () => {
    expect(roundedK(3041.77, 8.3)).toBe("3041.8 K");
    expect(roundedK(27853, 1012)).toBe("27900 K");
    expect(roundedK(5772, undefined)).toBe("5772 K");
    const stars = Array.from({ length: 12 }, (_, i) => ({ temperatureK: 3000 + 1000 * ((i * 7) % 12) }));
    const picked = spreadByTemperature(stars, 6).map((s) => s.temperatureK);
    expect(picked).toHaveLength(6);
    expect(picked[0]).toBe(3000);
    expect(picked.at(-1)).toBe(14000);
    expect([...picked].sort((a, b) => a - b)).toEqual(picked);
  });
});
