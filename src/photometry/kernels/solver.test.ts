import fc from "fast-check";
import { describe, expect, it } from "vitest";
import fixture from "../../../test/fixtures/photometry.json";
import { AU, L_SUN, PARSEC, R_SUN, S_SUN, SIGMA } from "../../values/constants";
import { PhotometryBatchReason } from "./common";
import { gaussian, mulberry32 } from "../../../test/support/random";
import {
  createStarBatchSolverSI,
  solveStarSI,
  STAR_QUANTITIES,
  type MeasurementSI,
  type StarInputKindSI,
  type StarObservationsSI,
  type StarQuantitySI,
} from "./solver";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const MAS = Math.PI / 648000 / 1000;

function meanStd(xs: Float64Array): { mean: number; std: number } {
  let m = 0;
  for (const x of xs) m += x;
  m /= xs.length;
  let v = 0;
  for (const x of xs) v += (x - m) ** 2;
  return { mean: m, std: Math.sqrt(v / (xs.length - 1)) };
}

const m = (value: number, relSigma: number): MeasurementSI => ({ value, sigma: Math.abs(value) * relSigma });

describe("stellar-parameter solver: references", () => {
  it("the Sun from IAU 2015 B3 nominal L, R at 1 au: T = 5772 K, f = 1361 W m^-2, M_bol = 4.74, m_bol = −26.832", () => {
    const sun = solveStarSI({
      luminosityW: m(L_SUN, 1e-6),
      radiusM: m(R_SUN, 1e-6),
      distanceM: m(AU, 1e-9),
    });
    // B3 prints T☉ᴺ = 5772 K (rounded to 1 K, ±0.5 K) as derived from L☉ᴺ and R☉ᴺ
    expect(Math.abs(sun.temperatureK.value - 5772)).toBeLessThan(0.5);
    // and matches mpmath (photometry.py) to the log/exp round-trip accuracy (≤ 60 ε ≈ 1.3e-14)
    expect(rel(sun.temperatureK.value, fixture.sun.teff_from_L_R)).toBeLessThan(2e-14);
    // S☉ᴺ = 1361 within the 1.31e-4 rounding of L☉ᴺ = 3.828e26 (see inverse-square.test.ts)
    expect(rel(sun.bolometricFluxWm2.value, S_SUN)).toBeLessThan(1.31e-4);
    expect(rel(sun.bolometricFluxWm2.value, fixture.sun.flux_at_1au)).toBeLessThan(2e-14);
    // IAU 2015 B2: M_bol,☉ = 4.74 (±0.005), m_bol,☉ = −26.832 (±0.0005); the derived f differs
    // from 1361 by 1.2e-4 relative = 1.3e-4 mag, inside the printed rounding
    expect(Math.abs(sun.absoluteBolometricMag.value - 4.74)).toBeLessThan(0.005);
    expect(Math.abs(sun.apparentBolometricMag.value - -26.832)).toBeLessThan(0.0005);
    expect(rel(sun.angularDiameterRad.value, fixture.sun.theta_small_1au)).toBeLessThan(2e-14);
    // T ∝ L^{1/4} R^{-1/2}: σ_lnT = √((1e-6/4)² + (1e-6/2)²) = 5.590e-7 (by hand)
    expect(rel(sun.temperatureK.relativeSigma, Math.sqrt(0.0625e-12 + 0.25e-12))).toBeLessThan(1e-9);
  });

  it("parallax + bolometric flux + temperature: values and first-order σ match mpmath direct formulas (photometry.py)", () => {
    const ref = fixture.solver_exact;
    const obs: StarObservationsSI = {
      parallaxRad: { value: ref.inputs.parallax_rad[0]!, sigma: ref.inputs.parallax_rad[1]! },
      bolometricFluxWm2: { value: ref.inputs.flux_Wm2[0]!, sigma: ref.inputs.flux_Wm2[1]! },
      temperatureK: { value: ref.inputs.temperature_K[0]!, sigma: ref.inputs.temperature_K[1]! },
    };
    const s = solveStarSI(obs);
    const pairs: [number, number, number[]][] = [
      [s.distanceM.value, s.distanceM.sigma, ref.distance_m],
      [s.luminosityW.value, s.luminosityW.sigma, ref.luminosity_W],
      [s.radiusM.value, s.radiusM.sigma, ref.radius_m],
      [s.angularDiameterRad.value, s.angularDiameterRad.sigma, ref.angular_diameter_rad],
    ];
    for (const [v, sig, [wantV, wantS]] of pairs) {
      // values: log/exp round trip (≤ 1e-14); σ: same first-order propagation computed by
      // numerical differentiation of the direct formulas in mpmath (independent path)
      expect(rel(v, wantV!)).toBeLessThan(2e-14);
      expect(rel(sig, wantS!)).toBeLessThan(1e-12);
    }
    expect(s.consistency.dof).toBe(0);
    expect(s.consistency.chi2).toBe(0);
    expect(s.consistency.pValue).toBe(1);
    expect(s.distanceM.measured).toBe(true);
    expect(s.radiusM.measured).toBe(false);
  });

  it("over-determined (T, L, R, d, θ): weighted least squares matches numpy lstsq (photometry.py)", () => {
    const ref = fixture.solver_overdetermined;
    const i = ref.inputs;
    const s = solveStarSI({
      temperatureK: { value: i.T[0]!, sigma: i.T[1]! },
      luminosityW: { value: i.L[0]!, sigma: i.L[1]! },
      radiusM: { value: i.R[0]!, sigma: i.R[1]! },
      distanceM: { value: i.d[0]!, sigma: i.d[1]! },
      angularDiameterRad: { value: i.theta[0]!, sigma: i.theta[1]! },
    });
    const got = [s.temperatureK, s.luminosityW, s.radiusM, s.distanceM, s.bolometricFluxWm2, s.angularDiameterRad];
    got.forEach((q, k) => {
      // two double LS solvers (QR here, LAPACK SVD in numpy) on a well-conditioned 5×3 problem: 1e-12
      expect(rel(q.value, ref.values[k]!)).toBeLessThan(1e-12);
      expect(rel(q.relativeSigma, ref.ln_sigmas[k]!)).toBeLessThan(1e-12);
      for (let j = 0; j < 6; j++) {
        expect(Math.abs(s.lnCovariance[k]![j]! - ref.ln_covariance[k]![j]!)).toBeLessThan(1e-12 * ref.ln_sigmas[k]! * ref.ln_sigmas[j]!);
      }
    });
    expect(rel(s.consistency.chi2, ref.chi2)).toBeLessThan(1e-10);
    expect(s.consistency.dof).toBe(ref.dof);
    expect(rel(s.consistency.pValue, ref.p_value)).toBeLessThan(1e-10);
    expect(s.quantities).toEqual([...STAR_QUANTITIES]);
  });

  it("reports the disagreement in sigma for an inconsistent over-determined set (dof 1: √χ²)", () => {
    // L, R, T, d: one redundant relation, L = 4πR²σT⁴. Shift L by +3 combined sigmas in ln space.
    const T = 5000, R = 2 * R_SUN;
    const sT = 0.004, sR = 0.01, sL = 0.02; // relative (= ln-space) uncertainties
    const combined = Math.sqrt(sL * sL + 4 * sR * sR + 16 * sT * sT); // var of lnL − 2lnR − 4lnT
    const L = 4 * Math.PI * R * R * SIGMA * T ** 4 * Math.exp(3 * combined);
    const s = solveStarSI({
      temperatureK: { value: T, sigma: sT * T },
      radiusM: { value: R, sigma: sR * R },
      luminosityW: { value: L, sigma: sL * L },
      distanceM: m(100 * PARSEC, 0.01),
    });
    expect(s.consistency.dof).toBe(1);
    // residual is exactly 3 combined sigmas by construction: χ² = 9 to rounding of the logs (1e-10)
    expect(Math.abs(s.consistency.chi2 - 9)).toBeLessThan(1e-10);
    expect(Math.abs(s.consistency.sigma - 3)).toBeLessThan(1e-10);
    // p for 3σ two-sided = 0.002699796 (normal table, 7 digits)
    expect(rel(s.consistency.pValue, 0.002699796)).toBeLessThan(5e-7);
    // the luminosity is pulled down, radius and temperature up
    expect(s.consistency.pulls.luminosityW!).toBeGreaterThan(0);
    expect(s.consistency.pulls.radiusM!).toBeLessThan(0);
    expect(s.consistency.pulls.temperatureK!).toBeLessThan(0);
    // the distance is not involved in the redundant relation: its pull is 0
    expect(Math.abs(s.consistency.pulls.distanceM!)).toBeLessThan(1e-12);
    // the compromise luminosity lies between the input and the L implied by R, T
    expect(s.luminosityW.value).toBeLessThan(L);
    expect(s.luminosityW.value).toBeGreaterThan(L / Math.exp(3 * combined));
  });

  it("converts apparent bolometric magnitude and parallax with their uncertainties", () => {
    const a = solveStarSI({
      apparentBolometricMag: { value: 5, sigma: 0.01 },
      parallaxRad: { value: 50 * MAS, sigma: 0.5 * MAS },
      temperatureK: { value: 6500, sigma: 65 },
    });
    // m_bol = 5 → f = f₀ × 10^-2; σ_lnf = 0.4 ln10 × 0.01 = 9.21e-3 (IAU 2015 B2 scale)
    expect(rel(a.bolometricFluxWm2.value, 2.518021002e-10)).toBeLessThan(4e-10);
    expect(rel(a.bolometricFluxWm2.relativeSigma, 0.004 * Math.LN10)).toBeLessThan(1e-12);
    expect(rel(a.distanceM.value, 20 * PARSEC)).toBeLessThan(1e-14);
    expect(rel(a.distanceM.relativeSigma, 0.01)).toBeLessThan(1e-12);
    expect(Math.abs(a.apparentBolometricMag.value - 5)).toBeLessThan(1e-13);
    expect(rel(a.apparentBolometricMag.sigma, 0.01)).toBeLessThan(1e-12);
    expect(rel(a.parallaxRad.value, 50 * MAS)).toBeLessThan(1e-14);
  });

  it("returns plain JSON", () => {
    const s = solveStarSI({ temperatureK: m(5000, 0.01), radiusM: m(R_SUN, 0.02), distanceM: m(PARSEC, 0.01) });
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
  });
});

describe("stellar-parameter solver: sufficiency", () => {
  const base = { temperatureK: 5000, luminosityW: 0, radiusM: 3 * R_SUN, distanceM: 40 * PARSEC, bolometricFluxWm2: 0, angularDiameterRad: 0 };
  base.luminosityW = 4 * Math.PI * base.radiusM ** 2 * SIGMA * base.temperatureK ** 4;
  base.bolometricFluxWm2 = base.luminosityW / (4 * Math.PI * base.distanceM ** 2);
  base.angularDiameterRad = (2 * base.radiusM) / base.distanceM;

  const triples: [StarQuantitySI, StarQuantitySI, StarQuantitySI][] = [];
  for (let a = 0; a < 6; a++) for (let b = a + 1; b < 6; b++) for (let c = b + 1; c < 6; c++) triples.push([STAR_QUANTITIES[a]!, STAR_QUANTITIES[b]!, STAR_QUANTITIES[c]!]);
  const dependent = new Set([
    "temperatureK,luminosityW,radiusM",
    "luminosityW,distanceM,bolometricFluxWm2",
    "radiusM,distanceM,angularDiameterRad",
    "temperatureK,bolometricFluxWm2,angularDiameterRad",
  ]);

  it("exactly the four dependent triples of the 20 are rejected; the other 16 recover the star", () => {
    let ok = 0;
    for (const t of triples) {
      const obs: Record<string, MeasurementSI> = {};
      for (const q of t) obs[q] = m(base[q], 0.01);
      if (dependent.has(t.join(","))) {
        expect(() => solveStarSI(obs)).toThrow(/under-determined star/);
        continue;
      }
      ok++;
      const s = solveStarSI(obs);
      for (const q of STAR_QUANTITIES) expect(rel(s[q].value, base[q])).toBeLessThan(3e-14);
    }
    expect(ok).toBe(16);
  });

  it("names what is missing", () => {
    expect(() => solveStarSI({ luminosityW: m(L_SUN, 0.01), radiusM: m(R_SUN, 0.01), temperatureK: m(5772, 0.01) })).toThrow(
      /cannot determine distance, bolometric flux, angular diameter .*need a distance or parallax, a bolometric flux or apparent bolometric magnitude or an angular diameter/,
    );
    expect(() => solveStarSI({ parallaxRad: m(1e-8, 0.01), bolometricFluxWm2: m(1e-9, 0.01), luminosityW: m(L_SUN, 0.01) })).toThrow(
      /need a temperature, a radius or an angular diameter/,
    );
    expect(() => solveStarSI({ temperatureK: m(5772, 0.01) })).toThrow(/need 2 more independent inputs/);
    expect(() => solveStarSI({})).toThrow(/from no inputs; need 3 more/);
  });

  it("recovers the same star from any sufficient subset of its own outputs (property)", () => {
    const kinds = [...STAR_QUANTITIES];
    fc.assert(
      fc.property(
        fc.double({ min: 3.3, max: 4.7, noNaN: true }),
        fc.double({ min: -1.5, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 4, noNaN: true }),
        fc.subarray(kinds, { minLength: 3, maxLength: 6 }),
        (lt, lr, ld, subset) => {
          const full = solveStarSI({
            temperatureK: m(10 ** lt, 0.01),
            radiusM: m(10 ** lr * R_SUN, 0.02),
            distanceM: m(10 ** ld * PARSEC, 0.03),
          });
          const obs: Record<string, MeasurementSI> = {};
          for (const q of subset) obs[q] = { value: full[q].value, sigma: full[q].sigma };
          let again;
          try {
            again = solveStarSI(obs);
          } catch (e) {
            // only the four dependent triples may fail
            expect(subset.length).toBe(3);
            expect(String(e)).toMatch(/under-determined/);
            return;
          }
          for (const q of STAR_QUANTITIES) expect(rel(again[q].value, full[q].value)).toBeLessThan(5e-14);
          // consistent inputs: χ² ≈ 0 (rounding of the logs only)
          expect(again.consistency.chi2).toBeLessThan(1e-18);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("stellar-parameter solver: uncertainties", () => {
  it("first-order σ and the L–R correlation agree with a seeded Monte Carlo (20000 draws, ≤ 1 % errors)", () => {
    const p0 = 25 * MAS, sp = 0.25 * MAS; // 1 %
    const f0 = 3e-10, sf = 3e-12; // 1 %
    const t0 = 6000, st = 30; // 0.5 %
    const s = solveStarSI({
      parallaxRad: { value: p0, sigma: sp },
      bolometricFluxWm2: { value: f0, sigma: sf },
      temperatureK: { value: t0, sigma: st },
    });
    const rand = gaussian(mulberry32(20240611));
    const N = 20000;
    const d = new Float64Array(N), l = new Float64Array(N), r = new Float64Array(N), th = new Float64Array(N);
    for (let k = 0; k < N; k++) {
      const p = p0 + sp * rand();
      const f = f0 + sf * rand();
      const t = t0 + st * rand();
      d[k] = AU / p;
      l[k] = 4 * Math.PI * d[k]! ** 2 * f;
      r[k] = Math.sqrt(l[k]! / (4 * Math.PI * SIGMA)) / (t * t);
      th[k] = (2 * r[k]!) / d[k]!;
    }
    // Tolerance 3 %: the sample σ has a statistical error of 1/√(2N) = 0.5 %, and the
    // non-linearity of the relations adds O(σ_rel) ≈ 1–2 % at these error levels.
    const pairs: [Float64Array, number][] = [
      [d, s.distanceM.sigma],
      [l, s.luminosityW.sigma],
      [r, s.radiusM.sigma],
      [th, s.angularDiameterRad.sigma],
    ];
    for (const [xs, sigma] of pairs) expect(rel(meanStd(xs).std, sigma)).toBeLessThan(0.03);
    // correlation of L and R (shared parallax and flux): analytic vs sample, ±0.03
    const iL = 1, iR = 2;
    const rhoAnalytic = s.covariance[iL]![iR]! / Math.sqrt(s.covariance[iL]![iL]! * s.covariance[iR]![iR]!);
    const ml = meanStd(l), mr = meanStd(r);
    let c = 0;
    for (let k = 0; k < N; k++) c += (l[k]! - ml.mean) * (r[k]! - mr.mean);
    const rhoMc = c / (N - 1) / (ml.std * mr.std);
    expect(rhoAnalytic).toBeGreaterThan(0.3); // non-trivial correlation
    expect(Math.abs(rhoMc - rhoAnalytic)).toBeLessThan(0.03);
  });

  it("σ of derived quantities scale as the power laws say: θ from f and T is independent of the distance", () => {
    const s = solveStarSI({ bolometricFluxWm2: m(1e-9, 0.02), temperatureK: m(5000, 0.01), parallaxRad: m(1e-8, 0.1) });
    // θ = 2√(f/σ)/T²: σ_lnθ² = (½·0.02)² + (2·0.01)² — no parallax term (by hand)
    expect(rel(s.angularDiameterRad.relativeSigma, Math.sqrt(1e-4 + 4e-4))).toBeLessThan(1e-12);
  });
});

describe("stellar-parameter solver: bad input", () => {
  it("rejects zero/negative/non-finite values and uncertainties, naming the parameter", () => {
    const good = { temperatureK: m(5000, 0.01), radiusM: m(R_SUN, 0.01), distanceM: m(PARSEC, 0.01) };
    const names: [StarInputKindSI, RegExp][] = [
      ["temperatureK", /temperature/],
      ["radiusM", /radius/],
      ["distanceM", /distance/],
      ["parallaxRad", /parallax/],
      ["luminosityW", /luminosity/],
      ["bolometricFluxWm2", /bolometric flux/],
      ["angularDiameterRad", /angular diameter/],
    ];
    for (const [k, re] of names) {
      for (const bad of [0, -1, NaN, Infinity]) {
        expect(() => solveStarSI({ ...good, [k]: { value: bad, sigma: 1 } })).toThrow(re);
        expect(() => solveStarSI({ ...good, [k]: { value: 1, sigma: bad } })).toThrow(new RegExp(`${re.source} uncertainty`));
      }
    }
    expect(() => solveStarSI({ ...good, apparentBolometricMag: { value: NaN, sigma: 0.1 } })).toThrow(/apparent bolometric magnitude/);
    // a negative magnitude is fine
    expect(() => solveStarSI({ ...good, apparentBolometricMag: { value: -1, sigma: 1 } })).not.toThrow();
  });
});

describe("batch solver", () => {
  const kinds = ["parallaxRad", "bolometricFluxWm2", "temperatureK"] as const;

  function columns(n: number) {
    const c = () => new Float64Array(n);
    return {
      input: { values: [c(), c(), c()] as [Float64Array, Float64Array, Float64Array], sigmas: [c(), c(), c()] as [Float64Array, Float64Array, Float64Array] },
      output: {
        temperatureK: c(), sigmaTemperatureK: c(), luminosityW: c(), sigmaLuminosityW: c(), radiusM: c(), sigmaRadiusM: c(),
        distanceM: c(), sigmaDistanceM: c(), bolometricFluxWm2: c(), sigmaBolometricFluxWm2: c(),
        angularDiameterRad: c(), sigmaAngularDiameterRad: c(), reason: new Uint8Array(n),
      },
    };
  }

  it("agrees with the scalar solver and with hand-written direct formulas row by row", () => {
    const n = 500;
    const { input, output } = columns(n);
    const rand = mulberry32(7);
    for (let i = 0; i < n; i++) {
      input.values[0][i] = 10 ** (-1 + 3 * rand()) * MAS;
      input.sigmas[0][i] = input.values[0][i]! * 0.05 * rand();
      input.values[1][i] = 10 ** (-14 + 6 * rand());
      input.sigmas[1][i] = input.values[1][i]! * 0.05 * rand();
      input.values[2][i] = 10 ** (3.3 + 1.3 * rand());
      input.sigmas[2][i] = input.values[2][i]! * 0.05 * rand();
    }
    const invalid = createStarBatchSolverSI(kinds).solve(input, output);
    expect(invalid).toBe(0);
    for (let i = 0; i < n; i++) {
      const p = input.values[0][i]!, sp = input.sigmas[0][i]!;
      const f = input.values[1][i]!, sf = input.sigmas[1][i]!;
      const t = input.values[2][i]!, st = input.sigmas[2][i]!;
      // direct formulas (independent of the log-space Jacobian)
      const d = AU / p;
      const lum = 4 * Math.PI * d * d * f;
      const r = Math.sqrt(lum / (4 * Math.PI * SIGMA)) / (t * t);
      const sLnR = Math.sqrt((sp / p) ** 2 + 0.25 * (sf / f) ** 2 + 4 * (st / t) ** 2);
      // the batch evaluates products of powers (no log/exp): ≤ ~8 roundings on each side → 3e-15
      expect(rel(output.distanceM[i]!, d)).toBeLessThan(3e-15);
      expect(rel(output.luminosityW[i]!, lum)).toBeLessThan(3e-15);
      expect(rel(output.radiusM[i]!, r)).toBeLessThan(3e-15);
      expect(rel(output.sigmaRadiusM[i]!, r * sLnR)).toBeLessThan(5e-15);
      expect(output.reason[i]).toBe(PhotometryBatchReason.OK);
      if (i % 10 === 0) {
        const s = solveStarSI({
          parallaxRad: { value: p, sigma: sp },
          bolometricFluxWm2: { value: f, sigma: sf },
          temperatureK: { value: t, sigma: st },
        });
        // scalar solver works in log space: |ln x′| ≲ 40 here → ≲ 40 ε ≈ 1e-14
        for (const q of STAR_QUANTITIES) expect(rel(output[q][i]!, s[q].value)).toBeLessThan(2e-14);
        expect(rel(output.sigmaLuminosityW[i]!, s.luminosityW.sigma)).toBeLessThan(2e-14);
        expect(rel(output.sigmaAngularDiameterRad[i]!, s.angularDiameterRad.sigma)).toBeLessThan(2e-14);
      }
    }
  });

  it("marks invalid rows with NaN and a reason code, never throws mid-array, drops nothing", () => {
    const { input, output } = columns(7);
    const good = [30 * MAS, 1e-10, 5000];
    for (let i = 0; i < 7; i++)
      for (let k = 0; k < 3; k++) {
        input.values[k as 0 | 1 | 2][i] = good[k]!;
        input.sigmas[k as 0 | 1 | 2][i] = good[k]! * 0.01;
      }
    input.values[0][1] = 0; // non-positive parallax
    input.values[1][2] = NaN; // non-finite flux
    input.sigmas[2][3] = -1; // negative uncertainty
    input.sigmas[0][4] = Infinity; // non-finite uncertainty
    input.values[1][5] = 1e-300; // tiny flux (1e-300 W m^-2): still a valid star
    input.sigmas[1][5] = 1e-302;
    input.sigmas[2][6] = 0; // zero uncertainty is allowed in the batch
    const invalid = createStarBatchSolverSI(kinds).solve(input, output);
    expect(invalid).toBe(4);
    expect(Array.from(output.reason)).toEqual([
      PhotometryBatchReason.OK,
      PhotometryBatchReason.NON_POSITIVE,
      PhotometryBatchReason.NON_FINITE,
      PhotometryBatchReason.NEGATIVE_UNCERTAINTY,
      PhotometryBatchReason.NON_FINITE,
      PhotometryBatchReason.OK,
      PhotometryBatchReason.OK,
    ]);
    for (const i of [1, 2, 3, 4]) {
      for (const q of STAR_QUANTITIES) expect(output[q][i]).toBeNaN();
      expect(output.sigmaRadiusM[i]).toBeNaN();
    }
    for (const i of [0, 5, 6]) for (const q of STAR_QUANTITIES) expect(output[q][i]).toBeGreaterThan(0);
  });

  it("reports unrepresentable results as RESULT_OUT_OF_RANGE", () => {
    const solver = createStarBatchSolverSI(["luminosityW", "temperatureK", "distanceM"]);
    const { input, output } = columns(1);
    input.values[0][0] = 1e300; // L
    input.values[1][0] = 1e-100; // T: R = √(L/4πσ)/T² overflows
    input.values[2][0] = 1;
    expect(solver.solve(input, output)).toBe(1);
    expect(output.reason[0]).toBe(PhotometryBatchReason.RESULT_OUT_OF_RANGE);
    expect(output.radiusM[0]).toBeNaN();
  });

  it("works with magnitude inputs and only the requested output columns", () => {
    const solver = createStarBatchSolverSI(["apparentBolometricMag", "angularDiameterRad", "distanceM"]);
    const one = (x: number) => Float64Array.of(x);
    const out = { temperatureK: new Float64Array(1), reason: new Uint8Array(1) };
    // m_bol = 0 → f = f₀; θ, d given: T = (4f/(θ²σ))^{1/4}
    const theta = 1e-8;
    expect(solver.solve({ values: [one(0), one(theta), one(PARSEC)], sigmas: [one(0.01), one(1e-10), one(1e15)] }, out)).toBe(0);
    const f0 = 2.518021002e-8; // IAU 2015 B2 (truncated 10 digits, 4e-10 relative → 1e-10 in T)
    expect(rel(out.temperatureK[0]!, ((4 * f0) / (theta * theta * SIGMA)) ** 0.25)).toBeLessThan(2e-10);
  });

  it("rejects insufficient or repeated kinds and mismatched columns at the call, before any row", () => {
    expect(() => createStarBatchSolverSI(["luminosityW", "radiusM", "temperatureK"])).toThrow(/need a distance or parallax/);
    expect(() => createStarBatchSolverSI(["distanceM", "parallaxRad", "temperatureK"])).toThrow(/under-determined/);
    expect(() => createStarBatchSolverSI(["radiusM", "radiusM", "temperatureK"])).toThrow(/distinct/);
    const solver = createStarBatchSolverSI(kinds);
    const { input } = columns(3);
    expect(() => solver.solve(input, { reason: new Uint8Array(2) })).toThrow(/length 3/);
  });
});

describe("batch solver: specialised {parallax, flux, temperature} loop vs the general loop", () => {
  const all = () => {
    const n = 2000;
    const c = () => new Float64Array(n);
    return {
      n,
      out: {
        temperatureK: c(), sigmaTemperatureK: c(), luminosityW: c(), sigmaLuminosityW: c(), radiusM: c(), sigmaRadiusM: c(),
        distanceM: c(), sigmaDistanceM: c(), bolometricFluxWm2: c(), sigmaBolometricFluxWm2: c(),
        angularDiameterRad: c(), sigmaAngularDiameterRad: c(), reason: new Uint8Array(n),
      },
    };
  };

  it("is chosen for the three kinds in any order, and only for them", () => {
    expect(createStarBatchSolverSI(["temperatureK", "parallaxRad", "bolometricFluxWm2"]).specialised).toBe(true);
    expect(createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"], { specialise: false }).specialised).toBe(false);
    expect(createStarBatchSolverSI(["distanceM", "bolometricFluxWm2", "temperatureK"]).specialised).toBe(false);
  });

  it("gives the general loop's values (≤ 3e-15) and identical reason codes, bad rows included, in any column order", () => {
    const rand = mulberry32(2024);
    const { n, out: a } = all();
    const { out: b } = all();
    const p = new Float64Array(n), sp = new Float64Array(n), f = new Float64Array(n), sf = new Float64Array(n), t = new Float64Array(n), st = new Float64Array(n);
    const bad = [NaN, Infinity, -Infinity, 0, -1, -0, 1e-320, 1e300, 1e-300];
    for (let i = 0; i < n; i++) {
      p[i] = 10 ** (-2 + 5 * rand()) * MAS;
      sp[i] = p[i]! * 0.3 * rand();
      f[i] = 10 ** (-16 + 10 * rand());
      sf[i] = f[i]! * 0.3 * rand();
      t[i] = 10 ** (3 + 2 * rand());
      st[i] = t[i]! * 0.3 * rand();
      if (i % 7 === 0) {
        // one input set to an invalid or extreme value
        const cols = [p, sp, f, sf, t, st];
        cols[Math.floor(rand() * 6)]![i] = bad[Math.floor(rand() * bad.length)]!;
      }
      if (i % 11 === 0) sp[i] = 0; // zero uncertainty is allowed in a batch
    }
    // specialised, column order (T, p, f); general, order (p, f, T)
    const fast = createStarBatchSolverSI(["temperatureK", "parallaxRad", "bolometricFluxWm2"]);
    const general = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"], { specialise: false });
    const nf = fast.solve({ values: [t, p, f], sigmas: [st, sp, sf] }, a);
    const ng = general.solve({ values: [p, f, t], sigmas: [sp, sf, st] }, b);
    expect(nf).toBe(ng);
    expect(nf).toBeGreaterThan(50); // the bad rows really are exercised
    expect(Array.from(a.reason)).toEqual(Array.from(b.reason));
    const codes = new Set(a.reason);
    for (const c of [0, 1, 2, 3]) expect(codes.has(c)).toBe(true);
    const keys = Object.keys(a).filter((k) => k !== "reason") as (keyof typeof a & `${string}${"K" | "W" | "M" | "Wm2" | "Rad"}`)[];
    for (let i = 0; i < n; i++) {
      for (const k of keys) {
        const x = (a[k] as Float64Array)[i]!, y = (b[k] as Float64Array)[i]!;
        if (a.reason[i] !== 0) {
          expect(x).toBeNaN();
          expect(y).toBeNaN();
        } else if (y === 0) {
          // σ of a zero-uncertainty input; or the general loop's r² underflowed (relative σ < 1.5e-154)
          // where the specialised one multiplies by r directly: then x/value is below that too
          const valueKey = k.replace(/^sigma(.)/, (_m, c: string) => c.toLowerCase()) as typeof k;
          expect(x / (a[valueKey] as Float64Array)[i]!).toBeLessThan(1.5e-154);
        } else {
          // general: products of scaled powers (≤ ~8 roundings); specialised: direct formulas (≤ ~6):
          // together ≲ 14 ε ≈ 3e-15
          expect(rel(x, y)).toBeLessThan(3e-15);
        }
      }
    }
  });

  it("writes only the requested columns and flags a row only for a requested output out of range", () => {
    const fast = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"]);
    const general = createStarBatchSolverSI(["parallaxRad", "bolometricFluxWm2", "temperatureK"], { specialise: false });
    const one = (x: number) => Float64Array.of(x);
    // L = 4π f d² overflows (f = 1e300 W m^-2 at d = 1e10 m) but θ = 2√(f/σ)/T² does not
    const input = { values: [one(AU / 1e10), one(1e300), one(1e5)], sigmas: [one(0), one(0), one(0)] } as const;
    for (const s of [fast, general]) {
      const onlyTheta = { angularDiameterRad: one(-1), reason: new Uint8Array(1) };
      expect(s.solve(input, onlyTheta)).toBe(0);
      expect(rel(onlyTheta.angularDiameterRad[0]!, (2 * Math.sqrt(1e300 / SIGMA)) / 1e10)).toBeLessThan(1e-15);
      const withL = { luminosityW: one(-1), angularDiameterRad: one(-1), reason: new Uint8Array(1) };
      expect(s.solve(input, withL)).toBe(1);
      expect(withL.reason[0]).toBe(PhotometryBatchReason.RESULT_OUT_OF_RANGE);
      expect(withL.luminosityW[0]).toBeNaN();
      expect(withL.angularDiameterRad[0]).toBeNaN();
    }
  });
});
