/**
 * The figures in the README and the guides, drawn by starlume's own plotting
 * from starlume's own laws. `npx tsx scripts/doc-figures.ts` rewrites
 * docs/figures/*.svg; test/docs/figures.test.ts checks they are up to date.
 */
import {
  SI,
  planckRadianceWavelengthBatch,
  rayleighJeansRelativeErrorWavelength,
  svgChart,
  units,
  peakWavelength,
  wienRelativeErrorWavelength,
} from "../src/index";

const grid = (a: number, b: number, n: number): number[] =>
  Array.from({ length: n }, (_, i) => a * (b / a) ** (i / (n - 1)));

/** B_λ per µm for a family of temperatures, with the Wien peaks marked. */
export function planckFamily(): string {
  const lambdaUm = grid(0.05, 20, 300);
  const temps = [3000, 5772, 10000, 30000];
  const series = temps.map((t) => {
    const T = SI.of(t, units.K);
    const b = planckRadianceWavelengthBatch(SI, SI.arrayOf(lambdaUm, units.um), T);
    // W m^-2 sr^-1 m^-1 → W m^-2 sr^-1 µm^-1
    return { type: "line" as const, name: `${t} K`, x: lambdaUm, y: Array.from(b.values, (v) => v * 1e-6) };
  });
  return svgChart({
    title: "Planck's law: B_{λ} of blackbodies from 3000 K to 30 000 K",
    description: "Spectral radiance per unit wavelength, computed with planckRadianceWavelengthBatch; Wien peaks marked.",
    x: { label: "wavelength [µm]", scale: "log", min: 0.05, max: 20 },
    y: { label: "B_{λ} [W m^{−2} sr^{−1} µm^{−1}]", scale: "log", min: 1e-2, max: 1e12 },
    series,
    markers: temps.map((t) => ({
      x: SI.valueIn(peakWavelength(SI, SI.of(t, units.K)), units.um),
      label: `peak, ${t} K`,
    })),
  });
}

/** Relative error of the Rayleigh–Jeans and Wien approximations against x = hc/λkT. */
export function approximationErrors(): string {
  const T = SI.of(5772, units.K);
  const lambdaUm = grid(0.1, 1000, 300);
  const x = lambdaUm.map((l) => 14387.768775039337 / (l * 5772)); // hc/λkT with λ in µm (c₂ = 14387.77 µm K)
  const rj = lambdaUm.map((l) => Math.abs(rayleighJeansRelativeErrorWavelength(SI, SI.of(l, units.um), T)));
  const wien = lambdaUm.map((l) => Math.abs(wienRelativeErrorWavelength(SI, SI.of(l, units.um), T)));
  return svgChart({
    title: "Where the approximations hold: |relative error| against x = hc/λkT",
    description: "Rayleigh–Jeans and Wien relative errors from the library's error functions.",
    x: { label: "x = hc/λkT", scale: "log", min: 0.01, max: 200 },
    y: { label: "|relative error|", scale: "log", min: 1e-12, max: 1e3 },
    series: [
      { type: "line", name: "Rayleigh–Jeans", x, y: rj },
      { type: "line", name: "Wien", x, y: wien },
    ],
  });
}

export const figures: Record<string, () => string> = {
  "planck-family.svg": planckFamily,
  "approximation-errors.svg": approximationErrors,
};

// run as a script: write the files
if (process.argv[1]?.endsWith("doc-figures.ts")) {
  const { writeFileSync } = await import("node:fs");
  for (const [name, draw] of Object.entries(figures)) {
    writeFileSync(new URL(`../docs/figures/${name}`, import.meta.url), draw());
    console.log(`docs/figures/${name}`);
  }
}
