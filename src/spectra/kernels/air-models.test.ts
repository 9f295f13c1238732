import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { airRefractivityModelSI as refr, airToVacuumModelSI, saturationVapourPressurePa, vacuumToAirModelSI, type AirIndexModelName } from "./air-models";
import { airRefractiveIndexSI } from "./air-vacuum";

const models: AirIndexModelName[] = ["edlen1966", "birch-downs1994", "ciddor1996"];

describe("named air-index models", () => {
  it("edlen1966 is the formula of the existing conversion, bit for bit", () => {
    for (const l of [250e-9, 500e-9, 656.4614e-9, 2e-6, 15e-6]) expect(1 + refr(l, "edlen1966")).toBe(airRefractiveIndexSI(l));
  });
  it("standard air: Birch & Downs 1994 is 1.35e-8 above Edlén 1966 in the visible (their update, from memory: ≈ 1e-8)", () => {
    for (const l of [400e-9, 500e-9, 633e-9, 800e-9]) {
      const d = refr(l, "birch-downs1994") - refr(l, "edlen1966");
      expect(d).toBeGreaterThan(1.2e-8);
      expect(d).toBeLessThan(1.5e-8);
    }
  });
  it("Ciddor at its standard air (15 °C, 101 325 Pa, dry, 450 ppm) is its own dispersion formula (density ratio 1)", () => {
    for (const l of [300e-9, 633e-9, 1.5e-6]) {
      const s2 = (1e-6 / l) ** 2;
      const nas = 1e-8 * (5792105 / (238.0185 - s2) + 167917 / (57.362 - s2));
      expect(Math.abs(refr(l, "ciddor1996") / nas - 1)).toBeLessThan(1e-14);
    }
  });
  it("Ciddor standard air agrees with Birch & Downs 1994 to 1e-8 over 300 nm – 2 µm (independent fits to the same data)", () => {
    for (let l = 300e-9; l <= 2e-6; l *= 1.1) expect(Math.abs(refr(l, "ciddor1996") - refr(l, "birch-downs1994"))).toBeLessThan(1e-8);
  });
  it("633 nm, 20 °C, 101 325 Pa, dry, 450 ppm: n = 1.000 271 80 (worked value, from memory) and the Birch & Downs 1993 t–p scaling (from memory) to 5e-9", () => {
    const n1 = refr(633e-9, "ciddor1996", { temperatureK: 293.15 });
    expect(Math.abs(n1 - 2.718e-4)).toBeLessThan(5e-9);
    const t = 20;
    const p = 101325;
    const scale = (p * (1 + p * (0.601 - 0.00972 * t) * 1e-8)) / (96095.43 * (1 + 0.003661 * t));
    expect(Math.abs(n1 - refr(633e-9, "birch-downs1994") * scale)).toBeLessThan(5e-9);
  });
  it("water vapour: 50 % RH at 20 °C lowers n − 1 by f p_w (3.7345 − 0.0401σ²)·1e-10 (Birch & Downs 1993, from memory) to 2 %", () => {
    const l = 633e-9;
    const s2 = (1e-6 / l) ** 2;
    const dry = refr(l, "ciddor1996", { temperatureK: 293.15 });
    const wet = refr(l, "ciddor1996", { temperatureK: 293.15, relativeHumidity: 0.5 });
    const pw = 0.5 * saturationVapourPressurePa(293.15);
    const expected = pw * (3.7345 - 0.0401 * s2) * 1e-10;
    expect(Math.abs((dry - wet) / expected - 1)).toBeLessThan(0.02);
    // the two humidity forms agree: RH·svp·(f applied inside) = the same partial pressure
    expect(refr(l, "ciddor1996", { temperatureK: 293.15, waterVapourPressurePa: pw })).toBe(wet);
  });
  it("saturation vapour pressure at 20 °C: 2339 Pa (steam tables, from memory) to 0.1 %", () => {
    expect(Math.abs(saturationVapourPressurePa(293.15) / 2339 - 1)).toBeLessThan(1e-3);
  });
  it("CO₂: +100 ppm raises n − 1 by 0.534e-4 relative (Ciddor's coefficient) to 10 %", () => {
    const a = refr(633e-9, "ciddor1996", { co2MoleFraction: 450e-6 });
    const b = refr(633e-9, "ciddor1996", { co2MoleFraction: 550e-6 });
    expect(Math.abs((b / a - 1) / 0.534e-4 - 1)).toBeLessThan(0.1);
  });
  it("cross-model differences at Hα are parts in 10⁸ of the wavelength (≈ 4 m/s): the reason to name the model", () => {
    const v = 656.4614e-9;
    const e = vacuumToAirModelSI(v, "edlen1966");
    const b = vacuumToAirModelSI(v, "birch-downs1994");
    expect(Math.abs(e / b - 1) * 299792458).toBeGreaterThan(3);
    expect(Math.abs(e / b - 1) * 299792458).toBeLessThan(5);
  });
  it("property: round trip air → vacuum → air to 1e-15 for every model, 200 nm – 20 µm, any valid conditions", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...models),
        fc.double({ min: Math.log(200e-9), max: Math.log(20e-6), noNaN: true }),
        fc.double({ min: 250, max: 320, noNaN: true }),
        fc.double({ min: 6e4, max: 1.1e5, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (m, ll, tK, p, h) => {
          const air = Math.min(Math.max(Math.exp(ll), 200e-9), 20e-6); // exp(log(200e-9)) may round below the range
          const c = m === "ciddor1996" ? { temperatureK: tK, pressurePa: p, relativeHumidity: h } : undefined;
          const vac = airToVacuumModelSI(air, m, c);
          return vac > air && Math.abs(vacuumToAirModelSI(vac, m, c) / air - 1) <= 1e-15;
        },
      ),
    );
  });
  it("property: n − 1 grows with pressure and falls with temperature (ideal-gas density, Ciddor)", () => {
    fc.assert(
      fc.property(fc.double({ min: 250, max: 320, noNaN: true }), fc.double({ min: 2e4, max: 1.2e5, noNaN: true }), (tK, p) => {
        const n = refr(500e-9, "ciddor1996", { temperatureK: tK, pressurePa: p });
        return refr(500e-9, "ciddor1996", { temperatureK: tK, pressurePa: p * 1.01 }) > n && refr(500e-9, "ciddor1996", { temperatureK: tK + 1, pressurePa: p }) < n;
      }),
    );
  });
  it("bad input: RangeError naming the parameter and value", () => {
    expect(() => refr(633e-9, "ciddor1996", { temperatureK: 500 })).toThrow(/^temperatureK must be in .*; got 500$/);
    expect(() => refr(633e-9, "ciddor1996", { relativeHumidity: 1.5 })).toThrow(/relativeHumidity must be a fraction/);
    expect(() => refr(633e-9, "ciddor1996", { relativeHumidity: 0.5, waterVapourPressurePa: 10 })).toThrow(/not both/);
    expect(() => refr(633e-9, "edlen1966", { temperatureK: 293.15 })).toThrow(/conditions need model "ciddor1996"/);
    expect(() => refr(100e-9, "birch-downs1994")).toThrow(/vacuumWavelengthM must be in/);
    expect(() => refr(633e-9, "nope" as AirIndexModelName)).toThrow(/model must be one of/);
    expect(() => refr(633e-9, "ciddor1996", { pressurePa: Number.NaN })).toThrow(/got NaN/);
  });
});
