import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C, H } from "../values/constants";
import { CGS, SI } from "../quantity/system";
import { times10 } from "../quantity/unit";
import { units } from "../quantity/units";
import {
  diracCentroidTransitionEnergySI,
  diracTransitionEnergySI,
  seriesLimitEnergySI,
  seriesLimitVacuumWavelengthSI,
  seriesVacuumWavelengthsSI,
  transitionEnergySI,
  transitionFrequencySI,
  transitionVacuumWavelengthSI,
  transitionWavenumberSI,
} from "./kernels/transitions";
import { ionizationEnergy, ions } from "./levels";
import {
  diracTransitionEnergy,
  hydrogenSeries,
  seriesLimitEnergy,
  seriesLimitVacuumWavelength,
  seriesLineEnergy,
  seriesLineVacuumWavelength,
  seriesLowerLevel,
  seriesVacuumWavelengths,
  transitionEnergy,
  transitionFrequency,
  transitionVacuumWavelength,
  transitionWavenumber,
  type SeriesName,
} from "./lines";
import type { LevelModel } from "./levels";
import { airFromVacuum } from "./medium";
import { vacuumWavelengthFromPhotonEnergy } from "./photon";

const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const HC = H * C;
const models: LevelModel[] = ["bohr", "dirac-centroid"];
const seriesNames = Object.keys(hydrogenSeries) as SeriesName[];

describe("typed = kernel (SI)", () => {
  it("Bohr transitions and series are the kernel's numbers", () => {
    for (const i of [ions.H, ions.D, ions.HeII]) {
      for (const [nl, nu] of [[1, 2], [2, 3], [3, 4], [4, 10]] as const) {
        expect(transitionEnergy(SI, i, nl, nu)).toBe(transitionEnergySI(nl, nu, i.z, i.nuclearMassKg));
        expect(transitionWavenumber(SI, i, nl, nu)).toBe(transitionWavenumberSI(nl, nu, i.z, i.nuclearMassKg));
        expect(transitionFrequency(SI, i, nl, nu)).toBe(transitionFrequencySI(nl, nu, i.z, i.nuclearMassKg));
        expect(transitionVacuumWavelength(SI, i, nl, nu)).toBe(transitionVacuumWavelengthSI(nl, nu, i.z, i.nuclearMassKg));
        expect(transitionEnergy(SI, i, nl, nu, { model: "dirac-centroid" })).toBe(diracCentroidTransitionEnergySI(nl, nu, i.z, i.nuclearMassKg));
      }
      for (const s of seriesNames) {
        expect(seriesLimitEnergy(SI, i, s)).toBe(seriesLimitEnergySI(s, i.z, i.nuclearMassKg));
        expect(seriesLimitVacuumWavelength(SI, i, s)).toBe(seriesLimitVacuumWavelengthSI(s, i.z, i.nuclearMassKg));
        expect(Array.from(seriesVacuumWavelengths(SI, i, s, 5))).toEqual(Array.from(seriesVacuumWavelengthsSI(s, 5, i.z, i.nuclearMassKg)));
      }
    }
    expect(diracTransitionEnergy(SI, ions.H, { n: 2, j: 0.5 }, { n: 3, j: 1.5 })).toBe(diracTransitionEnergySI(2, 0.5, 3, 1.5, 1, ions.H.nuclearMassKg));
  });
  it("the Dirac-centroid wavenumber, frequency and wavelength follow from its energy (σ = E/hc, ν = E/h, λ = hc/E)", () => {
    for (const [nl, nu] of [[1, 2], [2, 3], [2, 4], [3, 4]] as const) {
      const o = { model: "dirac-centroid" } as const;
      const e = transitionEnergy(SI, ions.H, nl, nu, o);
      // one division each: ≤ 1 ulp (H·C is computed once) → 4e-16
      expect(rel(transitionWavenumber(SI, ions.H, nl, nu, o), e / HC)).toBeLessThan(4e-16);
      expect(rel(transitionFrequency(SI, ions.H, nl, nu, o), e / H)).toBeLessThan(4e-16);
      expect(rel(transitionVacuumWavelength(SI, ions.H, nl, nu, o), vacuumWavelengthFromPhotonEnergy(SI, e))).toBeLessThan(4e-16);
    }
  });
});

describe("CGS = SI × 10^k exactly (system-free inputs)", () => {
  it("energy × 10⁷, wavenumber × 10⁻², wavelength × 10², frequency unchanged", () => {
    for (const model of models) {
      for (const [nl, nu] of [[1, 2], [2, 3], [3, 7]] as const) {
        const o = { model };
        expect(transitionEnergy(CGS, ions.HeII, nl, nu, o)).toBe(times10(transitionEnergy(SI, ions.HeII, nl, nu, o), 7));
        expect(transitionWavenumber(CGS, ions.HeII, nl, nu, o)).toBe(times10(transitionWavenumber(SI, ions.HeII, nl, nu, o), -2));
        expect(transitionVacuumWavelength(CGS, ions.HeII, nl, nu, o)).toBe(times10(transitionVacuumWavelength(SI, ions.HeII, nl, nu, o), 2));
        expect(transitionFrequency(CGS, ions.HeII, nl, nu, o)).toBe(transitionFrequency(SI, ions.HeII, nl, nu, o));
      }
      const cgs = seriesVacuumWavelengths(CGS, ions.H, "brackett", 6, { model });
      const si = seriesVacuumWavelengths(SI, ions.H, "brackett", 6, { model });
      for (let k = 0; k < 6; k++) expect(cgs[k]).toBe(times10(si[k] as number, 2));
    }
  });
});

describe("against NIST ASD (from memory (NIST ASD)), with air and vacuum correctly branded", () => {
  // Tolerances as in kernels/transitions.test.ts: the Bohr model omits fine structure,
  // ~(Zα)² relative → 5e-5 (H), 1e-4 (He II); the Dirac shell centroid omits QED (≤ 3e-6)
  // and weights levels by 2j+1 rather than by line intensity; the fine-structure components of
  // a Balmer line span ≈ 2.4e-5 → 1e-5; remembered digits add ≤ 1e-5 (5-digit values).
  const dirac = { model: "dirac-centroid" } as const;
  it("Lyman α: 121.567 nm in vacuum", () => {
    const bohr = transitionVacuumWavelength(SI, ions.H, 1, 2);
    const d = transitionVacuumWavelength(SI, ions.H, 1, 2, dirac);
    expect(rel(SI.valueIn(bohr, units.nm), 121.567)).toBeLessThan(5e-5);
    expect(rel(SI.valueIn(d, units.nm), 121.567)).toBeLessThan(1e-5);
  });
  it("Hα: 656.461 nm in vacuum, 656.279 nm in air (via airFromVacuum on the branded line)", () => {
    const vac = transitionVacuumWavelength(CGS, ions.H, 2, 3, dirac);
    expect(rel(CGS.valueIn(vac, units.nm), 656.461)).toBeLessThan(1e-5);
    expect(rel(CGS.valueIn(airFromVacuum(CGS, vac), units.nm), 656.279)).toBeLessThan(1e-5);
    expect(rel(SI.valueIn(airFromVacuum(SI, transitionVacuumWavelength(SI, ions.H, 2, 3)), units.nm), 656.279)).toBeLessThan(5e-5);
  });
  it("Hβ: 486.135 nm in air", () => {
    const air = airFromVacuum(SI, seriesLineVacuumWavelength(SI, ions.H, "balmer", 4, dirac));
    expect(rel(SI.valueIn(air, units.nm), 486.135)).toBeLessThan(1e-5);
  });
  it("He II 4686: 4685.7 Å in air (n = 3 → 4; 5 significant digits → 1.1e-5)", () => {
    const bohr = airFromVacuum(CGS, transitionVacuumWavelength(CGS, ions.HeII, 3, 4));
    const d = airFromVacuum(CGS, transitionVacuumWavelength(CGS, ions.HeII, 3, 4, dirac));
    expect(rel(CGS.valueIn(bohr, units.angstrom), 4685.7)).toBeLessThan(1e-4);
    expect(rel(CGS.valueIn(d, units.angstrom), 4685.7)).toBeLessThan(2e-5);
  });
  it("Lyman limit 91.18 nm in vacuum (4 digits → 5.5e-5); Balmer limit 3646 Å in air (4 digits → 1.4e-4)", () => {
    expect(rel(SI.valueIn(seriesLimitVacuumWavelength(SI, ions.H, "lyman"), units.nm), 91.18)).toBeLessThan(5.5e-5);
    const balmer = seriesLimitVacuumWavelength(CGS, ions.H, "balmer", dirac);
    expect(rel(CGS.valueIn(airFromVacuum(CGS, balmer), units.angstrom), 3646)).toBeLessThan(1.4e-4);
    // the vacuum value, 3647.0 Å, is 2.8e-4 longer: the tolerance separates the two media
    expect(rel(CGS.valueIn(balmer, units.angstrom), 3646)).toBeGreaterThan(2.5e-4);
  });
  it("Lyman α energy 10.199 eV (from memory; 5 digits → 5e-5)", () => {
    expect(rel(SI.valueIn(transitionEnergy(SI, ions.H, 1, 2, dirac), units.eV), 10.199)).toBeLessThan(5e-5);
  });
  it("2p fine-structure interval of H: 10.969 GHz incl. QED; Dirac gives 10.944 GHz (0.3 %, as the kernel test)", () => {
    const e = diracTransitionEnergy(SI, ions.H, { n: 2, j: 0.5 }, { n: 2, j: 1.5 });
    expect(rel(e / H / 1e9, 10.969)).toBeLessThan(3e-3);
  });
});

describe("properties", () => {
  it("energies are additive: E(a→c) = E(a→b) + E(b→c), both models, CGS", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 1, max: 20 }),
        fc.integer({ min: 1, max: 20 }),
        fc.constantFrom(...models),
        (n, d1, d2, model) => {
          const o = { model };
          const ac = transitionEnergy(CGS, ions.HeII, n, n + d1 + d2, o);
          const ab = transitionEnergy(CGS, ions.HeII, n, n + d1, o);
          const bc = transitionEnergy(CGS, ions.HeII, n + d1, n + d1 + d2, o);
          // differences of level energies of similar size: cancellation up to (E_n/E_ac) ulp;
          // with n ≤ 30, d ≤ 40 that ratio is ≤ ~1e3 → 1e-12 allowed
          return rel(ab + bc, ac) < 1e-12;
        },
      ),
      { numRuns: 100 },
    );
  });
  it("every series line lies below its limit, and the gap is the upper level's ionisation energy", () => {
    fc.assert(
      fc.property(fc.constantFrom(...seriesNames), fc.integer({ min: 1, max: 500 }), fc.constantFrom(...models), (s, k, model) => {
        const o = { model };
        const n1 = seriesLowerLevel(s);
        const e = seriesLineEnergy(SI, ions.H, s, n1 + k, o);
        const lim = seriesLimitEnergy(SI, ions.H, s, o);
        const gap = lim - e;
        // the gap is a difference: absolute rounding ≈ 4e-16·lim → relative 4e-16·lim/gap
        return e < lim && rel(gap, ionizationEnergy(SI, ions.H, n1 + k, o)) < 1e-13 + (4e-16 * lim) / gap;
      }),
      { numRuns: 100 },
    );
  });
  it("series wavelength arrays list the lines in order, longest first, above the limit", () => {
    for (const model of models) {
      const ws = seriesVacuumWavelengths(SI, ions.H, "pfund", 12, { model });
      for (let k = 0; k < ws.length; k++) {
        expect(ws[k]).toBe(seriesLineVacuumWavelength(SI, ions.H, "pfund", 6 + k, { model }));
        if (k > 0) expect(ws[k]).toBeLessThan(ws[k - 1] as number);
      }
      expect(ws[11]).toBeGreaterThan(seriesLimitVacuumWavelength(SI, ions.H, "pfund", { model }));
    }
  });
});

describe("bad input: RangeError naming the parameter", () => {
  it("n ≤ 0, non-integer n, lower ≥ upper", () => {
    expect(() => transitionEnergy(SI, ions.H, 0, 2)).toThrow(/^nLower must be an integer >= 1/);
    expect(() => transitionVacuumWavelength(CGS, ions.H, 2, 3.5)).toThrow(/^nUpper must be an integer >= 1/);
    expect(() => transitionWavenumber(SI, ions.H, 3, 2)).toThrow(/^nUpper must be greater than nLower \(3\); got 2$/);
    expect(() => transitionFrequency(SI, ions.H, 2, 2, { model: "dirac-centroid" })).toThrow(/^nUpper must be greater/);
    expect(() => seriesLineVacuumWavelength(SI, ions.H, "paschen", 3)).toThrow(/^nUpper must be greater/);
    expect(() => diracTransitionEnergy(SI, ions.H, { n: 2, j: 1.5 }, { n: 2, j: 0.5 })).toThrow(/jUpper/);
  });
  it("bad series name, count and model", () => {
    expect(() => seriesLimitEnergy(SI, ions.H, "balmr" as SeriesName)).toThrow(/^series must be one of/);
    expect(() => seriesVacuumWavelengths(SI, ions.H, "lyman", 0)).toThrow(/^count must be an integer >= 1/);
    expect(() => seriesVacuumWavelengths(SI, ions.H, "lyman", 2.5, { model: "dirac-centroid" })).toThrow(/^count must/);
    expect(() => transitionEnergy(SI, ions.H, 1, 2, { model: "dirac" as LevelModel })).toThrow(/^options\.model/);
  });
});
