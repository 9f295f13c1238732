/**
 * SED models: analytic derivatives against central finite differences for
 * every model and parameter; noiseless recovery (≤ 1e-10 relative) and 1σ
 * coverage over 500 seeded noisy stars per model; χ² against dof; the
 * photosphere + dust excess comparison (Δχ², AIC, BIC) and its non-detection.
 *
 * Synthetic data are computed here from Planck's law written out directly
 * (h, c, k from CODATA 2018, exact SI values) on the bands' nodes and
 * weights, not through the model code.
 */
import { describe, expect, it } from "vitest";
import { prepareBandSI, topHatResponseSI, type PreparedBandSI } from "./bands";
import { compareExcessSI, createSedFitterSI, DATA_AB_MAGNITUDE, DATA_FLUX_LAMBDA, type SedFitSI } from "./model-fit";
import {
  blackbodyComponentSI,
  ccm89AttenuationSI,
  modifiedBlackbodyComponentSI,
  prepareSedModelSI,
  sedModelSI,
  sedSpectrumSI,
  toInternal,
  type SedModelSI,
} from "./sed-model";
import { ccm89RatioSI } from "../../photometry/kernels/extinction";
import { gaussian, mulberry32 } from "./synthetic.test-util";

const H = 6.62607015e-34;
const CL = 299792458;
const KB = 1.380649e-23;
const planck = (l: number, T: number): number => (2 * H * CL * CL) / l ** 5 / Math.expm1((H * CL) / (l * KB * T));

const band = (centreM: number): PreparedBandSI => prepareBandSI(topHatResponseSI(centreM, 0.2 * centreM, 21), "energy");
const OPTICAL = [0.365e-6, 0.445e-6, 0.551e-6, 0.658e-6, 0.806e-6, 1.22e-6, 1.63e-6, 2.19e-6].map(band);
const FAR_IR = [24e-6, 70e-6, 100e-6, 160e-6, 250e-6, 350e-6, 500e-6, 850e-6].map(band);
const MID_IR = [12e-6, 22e-6, 70e-6, 100e-6, 160e-6, 250e-6, 350e-6, 500e-6].map(band);

type Emitter = (l: number) => number;
const bandMean = (b: PreparedBandSI, f: Emitter): number => {
  let s = 0;
  for (let i = 0; i < b.wavelengthsM.length; i++) s += (b.weights[i] as number) * f(b.wavelengthsM[i] as number);
  return s;
};
const disc = (T: number, theta: number): Emitter => (l) => ((Math.PI * theta * theta) / 4) * planck(l, T);
const thin = (T: number, beta: number, omega: number, l0 = 100e-6): Emitter => (l) => omega * (l0 / l) ** beta * planck(l, T);
const general = (T: number, beta: number, omega: number, l0 = 100e-6): Emitter => (l) => omega * -Math.expm1(-((l0 / l) ** beta)) * planck(l, T);
const reddened = (f: Emitter, aV: number): Emitter => (l) => f(l) * 10 ** (-0.4 * aV * ccm89RatioSI(l, 3.1));
const sum = (a: Emitter, b: Emitter): Emitter => (l) => a(l) + b(l);

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("the model's band means equal the directly written formulae", () => {
  it("blackbody, reddened blackbody, thin and general modified blackbodies, star + dust: ≤ 1e-13 relative", () => {
    const cases: [SedModelSI, number[], Emitter, PreparedBandSI[]][] = [
      [sedModelSI([{ component: blackbodyComponentSI() }]), [5800, 1e-9], disc(5800, 1e-9), OPTICAL],
      [sedModelSI([{ component: blackbodyComponentSI(), attenuation: ccm89AttenuationSI(3.1) }]), [9000, 1e-9, 0.7], reddened(disc(9000, 1e-9), 0.7), OPTICAL],
      [sedModelSI([{ component: modifiedBlackbodyComponentSI() }]), [30, 1.7, 100e-6, 1e-14], thin(30, 1.7, 1e-14), FAR_IR],
      [sedModelSI([{ component: modifiedBlackbodyComponentSI({ opacity: "general" }) }]), [40, 2.1, 100e-6, 1e-14], general(40, 2.1, 1e-14), FAR_IR],
      [
        sedModelSI([
          { component: blackbodyComponentSI(), label: "star" },
          { component: modifiedBlackbodyComponentSI(), label: "dust" },
        ]),
        [6000, 1e-9, 80, 1.5, 100e-6, 1e-13],
        sum(disc(6000, 1e-9), thin(80, 1.5, 1e-13)),
        [...OPTICAL, ...MID_IR],
      ],
    ];
    for (const [model, values, f, bands] of cases) {
      const p = prepareSedModelSI(model, bands);
      const m = new Float64Array(bands.length);
      p.evaluate(model.parameters.map((q, a) => toInternal(q, values[a] as number)), m, new Float64Array(bands.length * values.length));
      bands.forEach((b, c) => expect(rel(m[c] as number, bandMean(b, f))).toBeLessThan(1e-13));
    }
  });
  it("sedSpectrumSI draws the model on a grid through the same evaluation", () => {
    const model = sedModelSI([{ component: modifiedBlackbodyComponentSI({ opacity: "general" }) }]);
    const ls = [50e-6, 100e-6, 300e-6];
    const s = sedSpectrumSI(model, [25, 2, 100e-6, 3e-14], ls);
    ls.forEach((l, i) => expect(rel(s[i] as number, general(25, 2, 3e-14)(l))).toBeLessThan(1e-13));
  });
});

describe("analytic derivatives agree with central finite differences for every model and parameter", () => {
  // Central differences with step h = 1e-5 in the internal coordinate: truncation ~ h² f'''/6 ≈ 1e-11
  // relative, rounding ~ ε/h ≈ 2e-11 relative to f; tolerance 1e-7 of max(|∂f|, 1e-3 |f|).
  const models: [string, SedModelSI, number[], PreparedBandSI[]][] = [
    ["blackbody", sedModelSI([{ component: blackbodyComponentSI() }]), [5800, 1e-9], OPTICAL],
    ["blackbody × CCM89", sedModelSI([{ component: blackbodyComponentSI(), attenuation: ccm89AttenuationSI(3.1) }]), [9000, 1e-9, 0.7], OPTICAL],
    [
      "thin modified blackbody (λ₀ free)",
      sedModelSI([{ component: modifiedBlackbodyComponentSI({ fitReferenceWavelength: true }) }]),
      [30, 1.7, 120e-6, 1e-14],
      FAR_IR,
    ],
    [
      "general modified blackbody (λ₀ free)",
      sedModelSI([{ component: modifiedBlackbodyComponentSI({ opacity: "general", fitReferenceWavelength: true }) }]),
      [40, 2.1, 150e-6, 1e-14],
      FAR_IR,
    ],
    [
      "reddened star + dust",
      sedModelSI([
        { component: blackbodyComponentSI(), attenuation: ccm89AttenuationSI(3.1), label: "star" },
        { component: modifiedBlackbodyComponentSI({ opacity: "general" }), label: "dust" },
      ]),
      [6000, 1e-9, 500, 1.5, 2e-6, 1e-13, 0.4],
      OPTICAL.slice(0, 6),
    ],
  ];
  it.each(models)("%s", (_, model, values, bands) => {
    const np = values.length;
    const nCh = bands.length;
    const p = prepareSedModelSI(model, bands);
    const q = model.parameters.map((par, a) => toInternal(par, values[a] as number));
    const m = new Float64Array(nCh);
    const d = new Float64Array(nCh * np);
    p.evaluate(q, m, d);
    const mp = new Float64Array(nCh);
    const mm = new Float64Array(nCh);
    const scratch = new Float64Array(nCh * np);
    const h = 1e-5;
    for (let a = 0; a < np; a++) {
      const qp = q.slice();
      const qm = q.slice();
      qp[a] = (qp[a] as number) + h;
      qm[a] = (qm[a] as number) - h;
      p.evaluate(qp, mp, scratch);
      p.evaluate(qm, mm, scratch);
      for (let c = 0; c < nCh; c++) {
        const fd = ((mp[c] as number) - (mm[c] as number)) / (2 * h);
        const an = d[c * np + a] as number;
        expect(Math.abs(an - fd), `${model.names[a]} channel ${c}`).toBeLessThanOrEqual(1e-7 * Math.max(Math.abs(fd), 1e-3 * (m[c] as number)));
      }
    }
  });
});

interface Spec {
  readonly name: string;
  readonly model: () => SedModelSI;
  readonly bands: PreparedBandSI[];
  /** Draw a true parameter vector (fitted parameters only, model order; held ones at their start). */
  readonly truth: (u: () => number) => number[];
  readonly emitter: (v: number[]) => Emitter;
}

const SPECS: Spec[] = [
  {
    name: "thin modified blackbody (T, β, Ω)",
    model: () => sedModelSI([{ component: modifiedBlackbodyComponentSI() }]),
    bands: FAR_IR,
    truth: (u) => [15 + 45 * u(), 1.2 + 1.0 * u(), 100e-6, 1e-14 * (1 + 9 * u())],
    emitter: (v) => thin(v[0] as number, v[1] as number, v[3] as number),
  },
  {
    name: "general modified blackbody (T, β, Ω; λ₀ = 100 µm held)",
    model: () => sedModelSI([{ component: modifiedBlackbodyComponentSI({ opacity: "general" }) }]),
    bands: FAR_IR,
    truth: (u) => [15 + 45 * u(), 1.2 + 1.0 * u(), 100e-6, 1e-14 * (1 + 9 * u())],
    emitter: (v) => general(v[0] as number, v[1] as number, v[3] as number),
  },
  {
    name: "photosphere + thin dust excess",
    model: () =>
      sedModelSI([
        { component: blackbodyComponentSI({ temperatureRangeK: [2000, 50000] }), label: "star" },
        { component: modifiedBlackbodyComponentSI({ temperatureRangeK: [10, 1000] }), label: "dust" },
      ]),
    bands: [...OPTICAL, ...MID_IR],
    truth: (u) => [4000 + 6000 * u(), 1e-9 * (1 + u()), 40 + 80 * u(), 1.2 + 1.0 * u(), 100e-6, 3e-13 * (1 + 2 * u())],
    emitter: (v) => sum(disc(v[0] as number, v[1] as number), thin(v[2] as number, v[3] as number, v[5] as number)),
  },
];

function fitNoisy(spec: Spec, truth: number[], rel: number, normal: (() => number) | null, fitter = createSedFitterSI(spec.bands, spec.model())): SedFitSI {
  const f = spec.emitter(truth);
  const y = spec.bands.map((b) => bandMean(b, f));
  const s = y.map((x) => rel * x);
  const obs = y.map((x, i) => x + (normal === null ? 0 : (s[i] as number) * normal()));
  return fitter.fit(obs, s, obs.map(() => DATA_FLUX_LAMBDA));
}

describe("noiseless recovery (≤ 1e-10 relative) from the default grid start", () => {
  it.each(SPECS)("$name", (spec) => {
    const u = mulberry32(7);
    const fitter = createSedFitterSI(spec.bands, spec.model());
    for (let n = 0; n < 5; n++) {
      const truth = spec.truth(u);
      const r = fitNoisy(spec, truth, 0.03, null, fitter);
      expect(r.flags.notConverged).toBe(false);
      r.parameters.forEach((p, a) => {
        if (p.fitted) expect(rel(p.value, truth[a] as number), p.name).toBeLessThanOrEqual(1e-10);
      });
    }
  });
  it("AB magnitudes of a modified blackbody recover the same parameters", () => {
    const spec = SPECS[0] as Spec;
    const truth = [25, 1.6, 100e-6, 5e-14];
    const f = spec.emitter(truth);
    const mags = spec.bands.map((b) => -2.5 * Math.log10((bandMean(b, f) * b.pivotWavelengthM ** 2) / CL / 3631e-26));
    const r = createSedFitterSI(spec.bands, spec.model()).fit(mags, mags.map(() => 0.03), mags.map(() => DATA_AB_MAGNITUDE));
    r.parameters.forEach((p, a) => {
      if (p.fitted) expect(rel(p.value, truth[a] as number), p.name).toBeLessThanOrEqual(1e-10);
    });
  });
});

describe("500 seeded noisy stars per model (3 % errors): 1σ coverage 68 % ± 5 % and mean χ² = dof", () => {
  it.each(SPECS)(
    "$name",
    (spec) => {
      const u = mulberry32(2026);
      const normal = gaussian(mulberry32(1202));
      const fitter = createSedFitterSI(spec.bands, spec.model());
      const n = 500;
      let covered: number[] = [];
      let chi2Sum = 0;
      let dof = 0;
      let bad = 0;
      for (let k = 0; k < n; k++) {
        const truth = spec.truth(u);
        const r = fitNoisy(spec, truth, 0.03, normal, fitter);
        if (r.flags.notConverged) bad++;
        if (covered.length === 0) covered = r.parameters.map(() => 0);
        r.parameters.forEach((p, a) => {
          if (p.fitted && Math.abs(p.value - (truth[a] as number)) <= p.sigma) covered[a] = (covered[a] as number) + 1;
        });
        chi2Sum += r.chi2;
        dof = r.dof;
      }
      const fractions = covered.map((c) => c / n);
      console.log(spec.name, "coverage", fractions.map((x) => x.toFixed(3)).join(" "), "mean χ²", (chi2Sum / n).toFixed(3), "dof", dof);
      expect(bad).toBe(0);
      const fitted = createSedFitterSI(spec.bands, spec.model()).model.parameters.map((p) => p.fixed !== true);
      fractions.forEach((x, a) => {
        if (fitted[a]) {
          expect(x).toBeGreaterThanOrEqual(0.63);
          expect(x).toBeLessThanOrEqual(0.73);
        }
      });
      // mean of 500 χ²_dof draws: sd √(2 dof/500); 4 sd
      expect(Math.abs(chi2Sum / n - dof)).toBeLessThan(4 * Math.sqrt((2 * dof) / n));
    },
    120_000,
  );
});

describe("photosphere + dust excess against the photosphere alone", () => {
  const bands = [...OPTICAL, ...MID_IR];
  const one = createSedFitterSI(bands, sedModelSI([{ component: blackbodyComponentSI({ temperatureRangeK: [2000, 50000] }) }]));
  const two = createSedFitterSI(bands, (SPECS[2] as Spec).model());
  const normal = gaussian(mulberry32(99));
  const observe = (f: Emitter): [number[], number[]] => {
    const y = bands.map((b) => bandMean(b, f));
    const s = y.map((x) => 0.03 * x);
    return [y.map((x, i) => x + (s[i] as number) * normal()), s];
  };
  it("a clear excess is detected (Δχ² large, ΔAIC and ΔBIC < 0) and its dust temperature recovered within 3σ", () => {
    for (let k = 0; k < 20; k++) {
      const [y, s] = observe(sum(disc(5500, 1e-9), thin(60, 1.5, 1e-12)));
      const a = one.fit(y, s, y.map(() => 0));
      const b = two.fit(y, s, y.map(() => 0));
      const cmp = compareExcessSI(a, b);
      expect(cmp.detected).toBe(true);
      expect(cmp.deltaAic).toBeLessThan(0);
      expect(cmp.deltaBic).toBeLessThan(0);
      expect(cmp.deltaDof).toBe(3);
      const td = b.parameters[2]!;
      expect(td.name).toBe("dust.temperatureK");
      expect(Math.abs(td.value - 60)).toBeLessThan(3 * td.sigma);
    }
  });
  it("a bare photosphere is rarely flagged: ≤ 3 of 100 seeded stars (the 3σ test's rate, 0.27 %, is approximate at the boundary)", () => {
    let detected = 0;
    for (let k = 0; k < 100; k++) {
      const [y, s] = observe(disc(5500, 1e-9));
      const cmp = compareExcessSI(one.fit(y, s, y.map(() => 0)), two.fit(y, s, y.map(() => 0)));
      expect(cmp.deltaChi2).toBeGreaterThanOrEqual(0);
      if (cmp.detected) detected++;
    }
    expect(detected).toBeLessThanOrEqual(3);
  });
});

describe("model definition checks", () => {
  it("duplicate parameter names need labels; bad options are named", () => {
    expect(() => sedModelSI([{ component: blackbodyComponentSI() }, { component: blackbodyComponentSI() }])).toThrow(/unique/);
    expect(() => modifiedBlackbodyComponentSI({ opacity: "thick" as "thin" })).toThrow(/opacity/);
    expect(() => modifiedBlackbodyComponentSI({ beta: 9 })).toThrow(/beta start/);
    expect(() => ccm89AttenuationSI(-1)).toThrow(/extinction.rV/);
    expect(() => createSedFitterSI(FAR_IR, sedModelSI([{ component: blackbodyComponentSI(), attenuation: ccm89AttenuationSI() }]))).toThrow(/channels\[0\].*CCM89/);
  });
});
