import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AU, F0, S_SUN, SIGMA } from "../values/constants";
import { toSI } from "../internal/typed";
import { kinds } from "../quantity/aliases";
import type { Angle, AngleArray, Flux, FluxArray, Length, LengthArray, Power, Temperature, TemperatureArray } from "../quantity/aliases";
import { assumeArray } from "../quantity/quantity";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import type { SystemName } from "../quantity/quantity";
import { solveStarSI } from "./kernels/solver";
import { createStarBatchSolver, solveStar, STAR_QUANTITY_NAMES, StarBatchReason, type StarObservations, type StarSolution } from "./solver";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((e) => 10 ** e);
const DIMS = {
  temperature: kinds.temperature.dimension,
  luminosity: kinds.power.dimension,
  radius: kinds.length.dimension,
  distance: kinds.length.dimension,
  bolometricFlux: kinds.flux.dimension,
  angularDiameter: kinds.angle.dimension,
} as const;
const KIND = { temperature: kinds.temperature, luminosity: kinds.power, radius: kinds.length, distance: kinds.length, bolometricFlux: kinds.flux, angularDiameter: kinds.angle, parallax: kinds.angle } as const;

/** A test star in SI, given T (K), R (m), d (m). */
function star(t: number, r: number, d: number) {
  const l = 4 * Math.PI * r * r * SIGMA * t ** 4;
  return { t, r, d, l, f: l / (4 * Math.PI * d * d), theta: (2 * r) / d, p: AU / d };
}

describe("typed stellar-parameter solver", () => {
  it("the Sun from IAU 2015 B3 nominal L☉, R☉ at 1 au: T = 5772 K, f = 1361 W m^-2, M_bol = 4.74, m_bol = −26.832 (B2)", () => {
    for (const sys of [SI, CGS] as UnitSystem<SystemName>[]) {
      const s = solveStar(sys, {
        luminosity: { value: sys.of(1, units.Lsun) as Power<SystemName>, sigma: sys.of(1e-4, units.Lsun) as Power<SystemName> },
        radius: { value: sys.of(1, units.Rsun) as Length<SystemName>, sigma: sys.of(1e-4, units.Rsun) as Length<SystemName> },
        distance: { value: sys.of(1, units.au) as Length<SystemName>, sigma: sys.of(1e-9, units.au) as Length<SystemName> },
      } as StarObservations<SystemName>);
      // B3 rounds L☉ᴺ to 4 digits (1.31e-4): T ∝ L^(1/4) → 3.3e-5; f ∝ L → 1.31e-4
      expect(rel(SI.valueIn(s.temperature.value, units.K), 5772)).toBeLessThan(3.3e-5);
      const f = sys.name === "SI" ? SI.valueIn(s.bolometricFlux.value as Flux<"SI">, units.W_per_m2) : CGS.valueIn(s.bolometricFlux.value as Flux<"CGS">, units.W_per_m2);
      expect(rel(f, S_SUN)).toBeLessThan(1.31e-4);
      expect(Math.abs(s.absoluteBolometricMagnitude.value - 4.74)).toBeLessThan(0.005);
      expect(Math.abs(s.apparentBolometricMagnitude.value + 26.832)).toBeLessThan(0.0005);
      expect(s.system).toBe(sys.name);
    }
  });

  it("in SI equals the kernel exactly; in CGS every value and σ is SI × 10^k exactly when the inputs convert exactly", () => {
    const st = star(5800, 1.1 * 6.957e8, 3.0856775814913673e17);
    const obsSI = {
      parallax: { value: st.p as Angle, sigma: (st.p * 0.01) as Angle },
      bolometricFlux: { value: st.f as Flux<"SI">, sigma: (st.f * 0.02) as Flux<"SI"> },
      temperature: { value: st.t as Temperature, sigma: 50 as Temperature },
      radius: { value: (st.r * 1.01) as Length<"SI">, sigma: (st.r * 0.05) as Length<"SI"> },
    };
    const s = solveStar(SI, obsSI);
    const k = solveStarSI({
      parallaxRad: { value: st.p, sigma: st.p * 0.01 },
      bolometricFluxWm2: { value: st.f, sigma: st.f * 0.02 },
      temperatureK: { value: st.t, sigma: 50 },
      radiusM: { value: st.r * 1.01, sigma: st.r * 0.05 },
    });
    expect(s.radius.value).toBe(k.radiusM.value);
    expect(s.luminosity.sigma).toBe(k.luminosityW.sigma);
    expect(s.covariance.matrix).toEqual(k.covariance);
    expect(s.consistency.chi2).toBe(k.consistency.chi2);
    expect(s.consistency.pulls.radius).toBe(k.consistency.pulls.radiusM);
    // CGS: exact conversion of the inputs (checked), then outputs exactly ×10^k
    const conv = (x: number, d: (typeof DIMS)[keyof typeof DIMS]) => {
      const c = times10(x, -CGS.exp10(d));
      expect(toSI(CGS, c, d)).toBe(x);
      return c;
    };
    const c = solveStar(CGS, {
      parallax: obsSI.parallax,
      bolometricFlux: { value: conv(st.f, DIMS.bolometricFlux) as Flux<"CGS">, sigma: conv(st.f * 0.02, DIMS.bolometricFlux) as Flux<"CGS"> },
      temperature: obsSI.temperature,
      radius: { value: conv(st.r * 1.01, DIMS.radius) as Length<"CGS">, sigma: conv(st.r * 0.05, DIMS.radius) as Length<"CGS"> },
    });
    for (const q of STAR_QUANTITY_NAMES) {
      const e = -CGS.exp10(DIMS[q]);
      expect(c[q].value).toBe(times10(s[q].value, e));
      expect(c[q].sigma).toBe(times10(s[q].sigma, e));
    }
    expect(c.covariance.lnMatrix).toEqual(s.covariance.lnMatrix);
    // covariance of L (erg s^-1) with R (cm): ×10^(7+2)
    expect(rel(c.covariance.matrix[1]![2]!, s.covariance.matrix[1]![2]! * 1e9)).toBeLessThan(4.5e-16);
    expect(c.covariance.units).toEqual(["K", "erg s^-1", "cm", "cm", "erg s^-1 cm^-2", "rad"]);
  });

  it("gives the same star from several sufficient subsets of typed measurements (property; log-space solve ≲ 1e-13)", () => {
    fc.assert(
      fc.property(logUniform(3.4, 4.6), logUniform(-1, 3), logUniform(0, 4), (t, rSun, dPc) => {
        const st = star(t, rSun * 6.957e8, dPc * 3.0856775814913673e16);
        const m = <Q extends number>(x: number): { value: Q; sigma: Q } => ({ value: x as Q, sigma: (x * 0.01) as Q });
        const mbol = -2.5 * Math.log10(st.f / F0);
        const subsets: StarObservations<"SI">[] = [
          { temperature: m(st.t), radius: m(st.r), distance: m(st.d) },
          { parallax: m(st.p), bolometricFlux: m(st.f), temperature: m(st.t) },
          { luminosity: m(st.l), angularDiameter: m(st.theta), distance: m(st.d) },
          { apparentBolometricMagnitude: { value: mbol, sigma: 0.01 }, angularDiameter: m(st.theta), parallax: m(st.p) },
          { bolometricFlux: m(st.f), radius: m(st.r), luminosity: m(st.l) },
        ];
        for (const obs of subsets) {
          const s = solveStar(SI, obs);
          // inputs derived by ≤ 10 roundings, solve in log space with |ln x′| ≲ 30: 2e-13; m_bol adds
          // (ln10/2.5)·|m_bol|·ε from the magnitude (|m_bol| ≲ 40): 4e-13
          const tol = obs.apparentBolometricMagnitude === undefined ? 2e-13 : 4e-13;
          expect(rel(s.temperature.value, st.t)).toBeLessThan(tol);
          expect(rel(s.radius.value, st.r)).toBeLessThan(tol);
          expect(rel(s.distance.value, st.d)).toBeLessThan(tol);
          expect(rel(s.luminosity.value, st.l)).toBeLessThan(tol);
          expect(s.consistency.dof).toBe(0);
        }
      }),
      { numRuns: 30 },
    );
  });

  it("errors for insufficient input name what is missing in the caller's vocabulary", () => {
    const m = (x: number) => ({ value: x, sigma: x / 100 });
    expect(() =>
      solveStar(SI, { luminosity: m(3.8e26) as never, radius: m(7e8) as never, temperature: m(5800) as never }),
    ).toThrow(/^under-determined star: cannot determine distance, bolometricFlux, angularDiameter from temperature, luminosity, radius; add one of: distance \(or parallax\); bolometricFlux \(or apparentBolometricMagnitude\); angularDiameter$/);
    expect(() => solveStar(CGS, { parallax: m(1e-8) as never })).toThrow(/^under-determined star: .* from parallax; add 2 more independent observations among: temperature; luminosity; radius;/);
    expect(() => solveStar(SI, {})).toThrow(/from no observations/);
    expect(() => createStarBatchSolver(SI, ["distance", "parallax", "temperature"])).toThrow(/^under-determined star: .* from distance, parallax, temperature/);
    expect(() => createStarBatchSolver(SI, ["radius", "radius", "temperature"])).toThrow(/distinct/);
  });

  it("errors for bad values name the observation, value and the caller's unit", () => {
    const good = {
      parallax: { value: SI.of(10, units.mas), sigma: SI.of(0.1, units.mas) },
      temperature: { value: SI.of(5800, units.K), sigma: SI.of(50, units.K) },
    };
    expect(() => solveStar(CGS, { ...good, bolometricFlux: { value: CGS.of(1e-9, units.erg_per_s_cm2), sigma: -1 as Flux<"CGS"> } })).toThrow(
      // the law toolkit's one message: the caller's coherent unit (erg s^-1 cm^-2 = g s^-3 in CGS)
      /^bolometricFlux\.sigma must be a finite number > 0 g s\^-3; got -1$/,
    );
    expect(() => solveStar(SI, { ...good, radius: { value: -7 as Length<"SI">, sigma: SI.of(1, units.km) } })).toThrow(/^radius\.value must be a finite number > 0 m; got -7$/);
    expect(() => solveStar(CGS, { ...good, radius: { value: -7 as Length<"CGS">, sigma: CGS.of(1, units.km) } })).toThrow(/^radius\.value must be a finite number > 0 cm; got -7$/);
    expect(() => solveStar(SI, { ...good, apparentBolometricMagnitude: { value: NaN, sigma: 0.1 } })).toThrow(/^apparentBolometricMagnitude\.value must be a finite number mag; got NaN$/);
    expect(() => solveStar(SI, { ...good, temprature: { value: 1, sigma: 1 } } as never)).toThrow(/^unknown observation "temprature"/);
    // σ/value overflows: named in the caller's terms, not left to the kernel
    expect(() => solveStar(SI, { ...good, radius: { value: 1e-300 as Length<"SI">, sigma: 1e300 as Length<"SI"> } })).toThrow(/^radius\.sigma \/ radius\.value is not a finite number/);
  });

  it("reports consistency with pulls keyed by observation name", () => {
    const st = star(5000, 6.957e8, 3.0856775814913673e17);
    const m = <Q extends number>(x: number, r = 0.01): { value: Q; sigma: Q } => ({ value: x as Q, sigma: (x * r) as Q });
    const s = solveStar(SI, { temperature: m(st.t), radius: m(st.r), distance: m(st.d), luminosity: m(st.l * 1.2) });
    expect(s.consistency.dof).toBe(1);
    // ln 1.2 = 0.182 against σ_ln L = 0.01 and the model σ: several sigma; dof 1 → sigma = √χ²
    expect(s.consistency.sigma).toBeGreaterThan(3);
    expect(s.consistency.sigma).toBeCloseTo(Math.sqrt(s.consistency.chi2), 12);
    expect(Object.keys(s.consistency.pulls).sort()).toEqual(["distance", "luminosity", "radius", "temperature"]);
    expect(s.luminosity.measured).toBe(true);
    expect(s.bolometricFlux.measured).toBe(false);
  });

  it("its plain-JSON form round-trips through JSON.stringify/parse, and the unit strings parse back to the same values", () => {
    for (const sys of [SI, CGS] as UnitSystem<SystemName>[]) {
      const s = solveStar(sys, {
        parallax: { value: sys.of(37.2, units.mas), sigma: sys.of(0.3, units.mas) },
        bolometricFlux: { value: sys.of(2.1e-9, units.W_per_m2) as Flux<SystemName>, sigma: sys.of(4e-11, units.W_per_m2) as Flux<SystemName> },
        temperature: { value: sys.of(6100, units.K), sigma: sys.of(80, units.K) },
        angularDiameter: { value: sys.of(0.2, units.mas), sigma: sys.of(0.01, units.mas) },
      } as StarObservations<SystemName>) as StarSolution<SystemName>;
      const text = JSON.stringify(s);
      const back = JSON.parse(text) as ReturnType<typeof s.toJSON>;
      expect(back).toEqual(s.toJSON());
      expect(back.system).toBe(sys.name);
      expect(text).not.toMatch(/null/); // no NaN/Infinity became null
      for (const q of [...STAR_QUANTITY_NAMES, "parallax"] as const) {
        const e = back[q];
        const parsed: number = sys.parse(`${String(e.value)} ${e.unit}`, KIND[q] as typeof kinds.length);
        expect(rel(parsed, s[q].value)).toBeLessThan(2.3e-16);
        expect(e.value).toBe(s[q].value);
      }
      expect(back.apparentBolometricMagnitude.unit).toBe("mag");
      expect(back.covariance.matrix).toEqual(s.covariance.matrix);
      expect(back.consistency.dof).toBe(1);
    }
  });
});

describe("typed batch solver", () => {
  const n = 64;
  const columns = () => {
    const p = new Float64Array(n), sp = new Float64Array(n), f = new Float64Array(n), sf = new Float64Array(n), t = new Float64Array(n), st = new Float64Array(n);
    let seed = 7;
    const rand = () => {
      seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
      return seed / 4294967296;
    };
    for (let i = 0; i < n; i++) {
      p[i] = 10 ** (-1 + 3 * rand()) * (Math.PI / 648e6);
      sp[i] = p[i]! * 0.05 * rand();
      f[i] = 10 ** (-14 + 6 * rand());
      sf[i] = f[i]! * 0.05 * rand();
      t[i] = 10 ** (3.3 + 1.3 * rand());
      st[i] = t[i]! * 0.05 * rand() + 1;
    }
    return { p, sp, f, sf, t, st };
  };

  it("agrees with the scalar typed solver row by row (SI), and CGS columns are SI × 10^k", () => {
    const c = columns();
    const solver = createStarBatchSolver(SI, ["parallax", "bolometricFlux", "temperature"]);
    const out = solver.solve({
      parallax: { values: assumeArray<AngleArray>(c.p), sigmas: assumeArray<AngleArray>(c.sp) },
      bolometricFlux: { values: assumeArray<FluxArray<"SI">>(c.f), sigmas: assumeArray<FluxArray<"SI">>(c.sf) },
      temperature: { values: assumeArray<TemperatureArray>(c.t), sigmas: assumeArray<TemperatureArray>(c.st) },
    });
    expect(out.invalid).toEqual([]);
    expect(out.reasons).toEqual([]);
    expect(out.values.radius).toBe(out.radius);
    for (let i = 0; i < n; i += 7) {
      const s = solveStar(SI, {
        parallax: { value: c.p[i]! as Angle, sigma: c.sp[i]! as Angle },
        bolometricFlux: { value: c.f[i]! as Flux<"SI">, sigma: c.sf[i]! as Flux<"SI"> },
        temperature: { value: c.t[i]! as Temperature, sigma: c.st[i]! as Temperature },
      });
      // batch: direct formulas; scalar: log space with |ln x′| ≲ 40 → 2e-14 (kernel tests)
      expect(rel(out.radius[i]!, s.radius.value)).toBeLessThan(2e-14);
      expect(rel(out.sigmaLuminosity[i]!, s.luminosity.sigma)).toBeLessThan(2e-14);
      expect(rel(out.angularDiameter[i]!, s.angularDiameter.value)).toBeLessThan(2e-14);
    }
    // CGS: copy the system-dependent inputs (flux ×10³) and compare
    const cg = createStarBatchSolver(CGS, ["temperature", "parallax", "bolometricFlux"]);
    const fc_ = CGS.arrayOf(c.f, units.W_per_m2), sfc = CGS.arrayOf(c.sf, units.W_per_m2);
    const oc = cg.solve({
      parallax: { values: assumeArray<AngleArray>(c.p), sigmas: assumeArray<AngleArray>(c.sp) },
      bolometricFlux: { values: fc_, sigmas: sfc },
      temperature: { values: assumeArray<TemperatureArray>(c.t), sigmas: assumeArray<TemperatureArray>(c.st) },
    });
    for (let i = 0; i < n; i++) {
      // flux input round trip ×10³ ÷10³ may move 1 ulp: ≤ 2 ulp at the end
      expect(rel(oc.radius[i]!, out.radius[i]! * 100)).toBeLessThan(4.5e-16);
      expect(rel(oc.luminosity[i]!, out.luminosity[i]! * 1e7)).toBeLessThan(4.5e-16);
      expect(rel(oc.bolometricFlux[i]!, out.bolometricFlux[i]! * 1e3)).toBeLessThan(4.5e-16);
      expect(oc.temperature[i]).toBe(out.temperature[i]);
    }
  });

  it("never throws mid-array: bad rows get NaN and a reason code, nothing is dropped, only requested columns are written", () => {
    const c = columns();
    c.p[3] = -1; // NON_POSITIVE
    c.f[5] = NaN; // NON_FINITE
    c.st[9] = -2; // NEGATIVE_UNCERTAINTY
    const solver = createStarBatchSolver(CGS, ["parallax", "bolometricFlux", "temperature"]);
    const radius = assumeArray<LengthArray<"CGS">>(new Float64Array(n));
    const res = solver.solve(
      {
        parallax: { values: assumeArray<AngleArray>(c.p), sigmas: assumeArray<AngleArray>(c.sp) },
        bolometricFlux: { values: assumeArray<FluxArray<"CGS">>(c.f), sigmas: assumeArray<FluxArray<"CGS">>(c.sf) },
        temperature: { values: assumeArray<TemperatureArray>(c.t), sigmas: assumeArray<TemperatureArray>(c.st) },
      },
      { radius },
    );
    expect(res.invalid).toEqual([3, 5, 9]);
    // the sentence the scalar form would throw, in the caller's unit (a batch allows σ = 0, hence >= 0)
    expect(res.reasons).toEqual([
      "parallax.value must be a finite number > 0 rad; got -1",
      "bolometricFlux.value must be a finite number > 0 g s^-3; got NaN",
      `temperature.sigma must be a finite number >= 0 K; got -2`,
    ]);
    expect(res.reason.length).toBe(n);
    expect(res.reason[3]).toBe(StarBatchReason.NON_POSITIVE);
    expect(res.reason[5]).toBe(StarBatchReason.NON_FINITE);
    expect(res.reason[9]).toBe(StarBatchReason.NEGATIVE_UNCERTAINTY);
    for (let i = 0; i < n; i++) {
      if ([3, 5, 9].includes(i)) expect(radius[i]).toBeNaN();
      else expect(radius[i]).toBeGreaterThan(0);
    }
    expect(Object.keys(res).sort()).toEqual(["invalid", "reason", "reasons", "values"]);
    expect(res.values.radius).toBe(radius);
  });

  it("flags a row whose result overflows only in CGS as RESULT_OUT_OF_RANGE (no Infinity written)", () => {
    const one = (x: number) => Float64Array.of(x);
    // R = 1e150 cm, T = 1000 K: L = 4πR²σT⁴ = 7.1e301 W fits in SI, but 7.1e308 erg s^-1 does not
    const solver = createStarBatchSolver(CGS, ["radius", "temperature", "distance"]);
    const res = solver.solve({
      radius: { values: assumeArray<LengthArray<"CGS">>(one(1e150)), sigmas: assumeArray<LengthArray<"CGS">>(one(0)) },
      temperature: { values: assumeArray<TemperatureArray>(one(1000)), sigmas: assumeArray<TemperatureArray>(one(0)) },
      distance: { values: assumeArray<LengthArray<"CGS">>(one(1e160)), sigmas: assumeArray<LengthArray<"CGS">>(one(0)) },
    });
    // the same star in SI is fine
    const si = createStarBatchSolver(SI, ["radius", "temperature", "distance"]).solve({
      radius: { values: assumeArray<LengthArray<"SI">>(one(1e148)), sigmas: assumeArray<LengthArray<"SI">>(one(0)) },
      temperature: { values: assumeArray<TemperatureArray>(one(1000)), sigmas: assumeArray<TemperatureArray>(one(0)) },
      distance: { values: assumeArray<LengthArray<"SI">>(one(1e158)), sigmas: assumeArray<LengthArray<"SI">>(one(0)) },
    });
    expect(si.invalid).toEqual([]);
    expect(si.luminosity[0]).toBeGreaterThan(7e301);
    expect(res.invalid).toEqual([0]);
    expect(res.reasons).toEqual([
      "derived luminosity is not representable as a finite number > 0 erg s^-1 for radius.value=1e+150 cm, radius.sigma=0 cm, " +
        "temperature.value=1000 K, temperature.sigma=0 K, distance.value=1e+160 cm, distance.sigma=0 cm; inputs are out of the double-precision range",
    ]);
    expect(res.reason[0]).toBe(StarBatchReason.RESULT_OUT_OF_RANGE);
    expect(res.luminosity[0]).toBeNaN();
    expect(res.radius[0]).toBeNaN();
  });

  it("accepts magnitude columns as plain Float64Arrays", () => {
    const st = star(5800, 6.957e8, 3.0856775814913673e17);
    const mbol = -2.5 * Math.log10(st.f / F0);
    const solver = createStarBatchSolver(SI, ["apparentBolometricMagnitude", "angularDiameter", "parallax"]);
    const res = solver.solve({
      apparentBolometricMagnitude: { values: Float64Array.of(mbol), sigmas: Float64Array.of(0.01) },
      angularDiameter: { values: assumeArray<AngleArray>(Float64Array.of(st.theta)), sigmas: assumeArray<AngleArray>(Float64Array.of(st.theta * 0.01)) },
      parallax: { values: assumeArray<AngleArray>(Float64Array.of(st.p)), sigmas: assumeArray<AngleArray>(Float64Array.of(st.p * 0.01)) },
    });
    // m_bol ≈ 7 mag through a power of ten and back: a few 1e-15
    expect(rel(res.temperature[0]!, 5800)).toBeLessThan(1e-14);
    expect(rel(res.radius[0]!, 6.957e8)).toBeLessThan(1e-14);
  });

  it("names each bad row's field in the caller's unit and in mag, in row order, whatever the code's precedence", () => {
    const col = (...x: number[]) => Float64Array.from(x);
    const solver = createStarBatchSolver(CGS, ["apparentBolometricMagnitude", "angularDiameter", "parallax"]);
    const theta = assumeArray<AngleArray>(col(1e-9, 1e-9, 1e-9, 1e-9, 1e-9));
    const res = solver.solve({
      // row 0 fine; row 1 magnitude NaN; row 2 its σ negative; row 3 θ ≤ 0 and another σ NaN (NaN wins: NON_FINITE); row 4 fine
      apparentBolometricMagnitude: { values: col(7, NaN, 7, 7, 7), sigmas: col(0.01, 0.01, -0.5, 0.01, 0.01) },
      angularDiameter: { values: assumeArray<AngleArray>(col(1e-9, 1e-9, 1e-9, 0, 1e-9)), sigmas: theta },
      parallax: { values: theta, sigmas: assumeArray<AngleArray>(col(0, 0, 0, NaN, 0)) },
    });
    expect(res.invalid).toEqual([1, 2, 3]);
    expect([...res.reason]).toEqual([0, StarBatchReason.NON_FINITE, StarBatchReason.NEGATIVE_UNCERTAINTY, StarBatchReason.NON_FINITE, 0]);
    expect(res.reasons).toEqual([
      "apparentBolometricMagnitude.value must be a finite number mag; got NaN",
      "apparentBolometricMagnitude.sigma must be a finite number >= 0 mag; got -0.5",
      "parallax.sigma must be a finite number >= 0 rad; got NaN",
    ]);
    expect(res.radius[1]).toBeNaN();
    expect(res.radius[4]).toBe(res.radius[0]);
  });

  it("a CGS value valid in its unit but below the double range once in SI is invalid, and says so", () => {
    const one = (x: number) => Float64Array.of(x);
    const solver = createStarBatchSolver(CGS, ["radius", "temperature", "distance"]);
    // 5e-324 cm is 5e-326 m: 0 in doubles
    const res = solver.solve({
      radius: { values: assumeArray<LengthArray<"CGS">>(one(5e-324)), sigmas: assumeArray<LengthArray<"CGS">>(one(0)) },
      temperature: { values: assumeArray<TemperatureArray>(one(5000)), sigmas: assumeArray<TemperatureArray>(one(0)) },
      distance: { values: assumeArray<LengthArray<"CGS">>(one(1e20)), sigmas: assumeArray<LengthArray<"CGS">>(one(0)) },
    });
    expect(res.invalid).toEqual([0]);
    expect(res.reason[0]).toBe(StarBatchReason.NON_POSITIVE);
    expect(res.reasons).toEqual(["radius.value = 5e-324 cm is outside the double range once converted to SI (0 m)"]);
    // and the scalar solver refuses the same value with the same sentence
    expect(() =>
      solveStar(CGS, {
        radius: { value: 5e-324 as Length<"CGS">, sigma: 1 as Length<"CGS"> },
        temperature: { value: 5000 as Temperature, sigma: 1 as Temperature },
        distance: { value: 1e20 as Length<"CGS">, sigma: 1 as Length<"CGS"> },
      }),
    ).toThrow(/^radius\.value = 5e-324 cm is outside the double range once converted to SI \(0 m\)$/);
  });

  it("shared-shape errors (a missing column, mismatched lengths) throw before any row is written", () => {
    const solver = createStarBatchSolver(SI, ["parallax", "bolometricFlux", "temperature"]);
    const radius = assumeArray<LengthArray<"SI">>(Float64Array.of(-7, -7));
    const a2 = assumeArray<AngleArray>(Float64Array.of(1e-8, 1e-8));
    const f2 = assumeArray<FluxArray<"SI">>(Float64Array.of(1e-9, 1e-9));
    const t1 = assumeArray<TemperatureArray>(Float64Array.of(5000));
    expect(() =>
      solver.solve({ parallax: { values: a2, sigmas: a2 }, bolometricFlux: { values: f2, sigmas: f2 }, temperature: { values: t1, sigmas: t1 } }, { radius }),
    ).toThrow(/^batch columns must all have length 2; got one of length 1$/);
    expect([...radius]).toEqual([-7, -7]);
    expect(() => solver.solve({ parallax: { values: a2, sigmas: a2 }, bolometricFlux: { values: f2, sigmas: f2 } } as never)).toThrow(/^input\.temperature must be/);
  });
});
