/**
 * The cases of the blackbody-fitter refactor check: 120 seeded stars (flux,
 * AB magnitudes, CCM89 extinction, grid start, a spectrum-like 40-pixel set)
 * whose fits by the pre-refactor fitter (commit 1932b1e) are stored in
 * test/fixtures/fit/blackbody-fit-baseline.json.
 */
import { prepareBandSI, type PreparedBandSI } from "./bands";
import type { BlackbodyFitSettingsSI, FitChannelSI } from "./blackbody-fit";
import { fiveCurves, gaussian, mulberry32, syntheticBandFlux } from "./synthetic.test-util";

export interface BaselineCase {
  readonly channels: readonly FitChannelSI[];
  readonly settings: BlackbodyFitSettingsSI;
  readonly values: number[];
  readonly sigmas: number[];
  readonly kinds: number[];
}

export function baselineCases(): BaselineCase[] {
  const curves = fiveCurves();
  const bands: PreparedBandSI[] = curves.map((c) => prepareBandSI(c, "photon"));
  const rand = mulberry32(20261202);
  const gauss = gaussian(rand);
  const out: BaselineCase[] = [];
  const pixels: FitChannelSI[] = [];
  for (let i = 0; i < 40; i++) {
    const l = 0.4e-6 + (0.6e-6 * i) / 39;
    pixels.push({ wavelengthsM: [l], weights: [1], pivotWavelengthM: l });
  }
  for (let n = 0; n < 120; n++) {
    const kindCase = n % 6;
    const T = Math.exp(Math.log(3000) + rand() * Math.log(30000 / 3000));
    const theta = 1e-9 * Math.exp(rand() * 2);
    const aV = kindCase === 2 ? 1.5 * rand() : 0;
    const settings: BlackbodyFitSettingsSI =
      kindCase === 2 ? { extinction: { rV: 3.1 } } : kindCase === 3 ? { start: "grid" } : kindCase === 4 ? { extinction: { rV: 3.1, fitAV: false, aV: 0.3 } } : {};
    const noisy = n % 2 === 0 || n % 4 === 1;
    if (kindCase === 5) {
      const f = pixels.map((p) => ((Math.PI * theta * theta) / 4) * planck(p.pivotWavelengthM, T));
      const s = f.map((x) => 0.02 * x);
      out.push({ channels: pixels, settings: {}, values: f.map((x, i) => x + (noisy ? (s[i] as number) * gauss() : 0)), sigmas: s, kinds: f.map(() => 0) });
      continue;
    }
    const trueAV = kindCase === 4 ? 0.3 : aV;
    const f = curves.map((c) => syntheticBandFlux(c, "photon", T, theta, trueAV));
    const s = f.map((x) => 0.02 * x);
    const values = f.map((x, i) => x + (noisy ? (s[i] as number) * gauss() : 0));
    if (kindCase === 1) {
      const mags = values.map((x, i) => -2.5 * Math.log10((x * (bands[i] as PreparedBandSI).pivotWavelengthM ** 2) / 299792458 / 3631e-26));
      out.push({ channels: bands, settings, values: mags, sigmas: mags.map(() => 0.02), kinds: mags.map(() => 1) });
    } else {
      out.push({ channels: bands, settings, values, sigmas: s, kinds: values.map(() => 0) });
    }
  }
  return out;
}

function planck(l: number, T: number): number {
  const h = 6.62607015e-34;
  const c = 299792458;
  const k = 1.380649e-23;
  return (2 * h * c * c) / l ** 5 / Math.expm1((h * c) / (l * k * T));
}
