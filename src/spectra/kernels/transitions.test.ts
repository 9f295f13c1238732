import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { C, H } from "../../values/constants";
import fx from "../../../test/fixtures/hydrogen-levels.json";
import { vacuumToAirWavelengthSI } from "./air-vacuum";
import { HELIUM_II, HYDROGEN, PROTON_MASS_KG, bohrLevelEnergySI } from "./hydrogen-like";
import {
  HYDROGEN_SERIES,
  diracCentroidTransitionEnergySI,
  diracTransitionEnergySI,
  ionizationEnergySI,
  seriesLimitEnergySI,
  seriesLimitVacuumWavelengthSI,
  seriesLineEnergySI,
  seriesLineVacuumWavelengthSI,
  seriesVacuumWavelengthsSI,
  transitionEnergySI,
  transitionFrequencySI,
  transitionVacuumWavelengthSI,
  transitionWavenumberSI,
} from "./transitions";
import type { SeriesName } from "./transitions";

const HC = H * C;
const ionOf = { H: HYDROGEN, HeII: HELIUM_II } as const;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

/** Vacuum wavelength of the Dirac shell-centroid transition, m. */
function diracCentroidVac(nl: number, nu: number, ion = HYDROGEN): number {
  return HC / diracCentroidTransitionEnergySI(nl, nu, ion.z, ion.nuclearMassKg);
}

describe("series vs mpmath (fixture hydrogen-levels.json)", () => {
  it("first five lines and the limit of all six series, H and He II", () => {
    // (n₂−n₁)(n₂+n₁)/(n₁²n₂²) form: a few roundings → ≤ 1e-15; 4e-15 allowed.
    for (const s of fx.series) {
      const ion = ionOf[s.ion as keyof typeof ionOf];
      const name = s.series as SeriesName;
      for (const [n2, lam] of s.lines as [number, number][]) {
        expect(rel(seriesLineVacuumWavelengthSI(name, n2, ion.z, ion.nuclearMassKg), lam)).toBeLessThan(4e-15);
      }
      expect(rel(seriesLimitVacuumWavelengthSI(name, ion.z, ion.nuclearMassKg), s.limit_m)).toBeLessThan(4e-15);
    }
  });

  it("energy, wavenumber, frequency and wavelength agree with E = hcσ = hν = hc/λ", () => {
    const s = transitionWavenumberSI(2, 3, 1, PROTON_MASS_KG);
    expect(rel(transitionEnergySI(2, 3, 1, PROTON_MASS_KG), HC * s)).toBeLessThan(1e-15);
    expect(rel(transitionFrequencySI(2, 3, 1, PROTON_MASS_KG), C * s)).toBeLessThan(1e-15);
    expect(rel(transitionVacuumWavelengthSI(2, 3, 1, PROTON_MASS_KG), 1 / s)).toBeLessThan(1e-15);
    // difference of two Bohr levels (fixture-independent identity)
    const d = bohrLevelEnergySI(3, 1, PROTON_MASS_KG) - bohrLevelEnergySI(2, 1, PROTON_MASS_KG);
    expect(rel(transitionEnergySI(2, 3, 1, PROTON_MASS_KG), d)).toBeLessThan(1e-15);
  });
});

describe("against NIST Atomic Spectra Database wavelengths (from memory (NIST ASD))", () => {
  // Tolerances. Bohr levels omit fine structure, whose size relative to a line is
  // ~ (Zα)² × O(1) = 5e-5 (Z = 1) … 2e-4 (Z = 2): Bohr tolerance 5e-5 (H), 1e-4 (He II).
  // The Dirac shell-centroid transition omits only QED (≤ 3e-6 relative for Lyα) but its
  // 2j+1 level weighting differs from the intensity weighting of the published blend; the
  // fine-structure components of a Balmer line span ≈ 2.4e-5 relative (n = 2 splitting
  // 0.365 cm⁻¹ over 15 233 cm⁻¹ for Hα), so the centroid tolerance is 1e-5 — about half
  // that span — which also covers the remembered digits (≥ 4e-6 rel.).
  it("Lyman α: 121.567 nm vacuum", () => {
    expect(rel(transitionVacuumWavelengthSI(1, 2, 1, PROTON_MASS_KG), 121.567e-9)).toBeLessThan(5e-5);
    expect(rel(diracCentroidVac(1, 2), 121.567e-9)).toBeLessThan(1e-5);
  });
  it("Hα: 656.461 nm vacuum, 656.279 nm air", () => {
    expect(rel(transitionVacuumWavelengthSI(2, 3, 1, PROTON_MASS_KG), 656.461e-9)).toBeLessThan(5e-5);
    expect(rel(diracCentroidVac(2, 3), 656.461e-9)).toBeLessThan(1e-5);
    expect(rel(vacuumToAirWavelengthSI(diracCentroidVac(2, 3)), 656.279e-9)).toBeLessThan(1e-5);
  });
  it("Hβ: 486.135 nm air", () => {
    expect(rel(vacuumToAirWavelengthSI(transitionVacuumWavelengthSI(2, 4, 1, PROTON_MASS_KG)), 486.135e-9)).toBeLessThan(5e-5);
    expect(rel(vacuumToAirWavelengthSI(diracCentroidVac(2, 4)), 486.135e-9)).toBeLessThan(1e-5);
  });
  it("Paschen α: 1875.1 nm air (5 significant digits → rel 3e-5 on the digits alone)", () => {
    expect(rel(vacuumToAirWavelengthSI(transitionVacuumWavelengthSI(3, 4, 1, PROTON_MASS_KG)), 1875.1e-9)).toBeLessThan(5e-5);
    expect(rel(vacuumToAirWavelengthSI(diracCentroidVac(3, 4)), 1875.1e-9)).toBeLessThan(3e-5);
  });
  it("He II 3→4: 468.57 nm air (He II fine structure is 4× hydrogen's)", () => {
    const bohr = transitionVacuumWavelengthSI(3, 4, 2, HELIUM_II.nuclearMassKg);
    expect(rel(vacuumToAirWavelengthSI(bohr), 468.57e-9)).toBeLessThan(1e-4);
    // 5 significant digits (rel 1.1e-5) + centroid weighting → 2e-5
    expect(rel(vacuumToAirWavelengthSI(diracCentroidVac(3, 4, HELIUM_II)), 468.57e-9)).toBeLessThan(2e-5);
  });
  it("Lyman limit: 91.18 nm (4 digits → half-unit rel 5.5e-5)", () => {
    expect(rel(seriesLimitVacuumWavelengthSI("lyman", 1, PROTON_MASS_KG), 91.18e-9)).toBeLessThan(5.5e-5);
  });
});

describe("properties", () => {
  const names = Object.keys(HYDROGEN_SERIES) as SeriesName[];
  it("every series converges to its limit from below in energy", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...names),
        fc.integer({ min: 1, max: 10000 }),
        fc.integer({ min: 1, max: 30 }),
        (name, k, z) => {
          const n1 = HYDROGEN_SERIES[name];
          const m = PROTON_MASS_KG;
          const e = seriesLineEnergySI(name, n1 + k, z, m);
          const e2 = seriesLineEnergySI(name, n1 + k + 1, z, m);
          const lim = seriesLimitEnergySI(name, z, m);
          // Strict increase with n_upper, always below the limit, and the gap to the
          // limit is exactly the ionization energy of the upper level.
          const gap = lim - e;
          return e2 > e && e < lim && rel(gap, ionizationEnergySI(n1 + k, z, m)) < 1e-14 + (4e-16 * lim) / gap;
        },
      ),
    );
  });

  it("seriesVacuumWavelengthsSI lists decreasing wavelengths above the limit", () => {
    const ws = seriesVacuumWavelengthsSI("balmer", 30, 1, PROTON_MASS_KG);
    const lim = seriesLimitVacuumWavelengthSI("balmer", 1, PROTON_MASS_KG);
    for (let i = 1; i < ws.length; i++) expect(ws[i]).toBeLessThan(ws[i - 1] as number);
    expect(ws[29]).toBeGreaterThan(lim);
  });

  it("Dirac transitions are additive: E(a→c) = E(a→b) + E(b→c)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 5 }), (n, d1, d2) => {
        const ac = diracTransitionEnergySI(n, 0.5, n + d1 + d2, 0.5, 1, PROTON_MASS_KG);
        const ab = diracTransitionEnergySI(n, 0.5, n + d1, 0.5, 1, PROTON_MASS_KG);
        const bc = diracTransitionEnergySI(n + d1, 0.5, n + d1 + d2, 0.5, 1, PROTON_MASS_KG);
        return rel(ab + bc, ac) < 1e-12;
      }),
    );
  });
});

describe("bad input", () => {
  it("n ≤ 0 or non-integer → RangeError naming the level", () => {
    expect(() => transitionEnergySI(0, 2, 1, PROTON_MASS_KG)).toThrow(/nLower/);
    expect(() => transitionEnergySI(1, 2.5, 1, PROTON_MASS_KG)).toThrow(/nUpper/);
    expect(() => ionizationEnergySI(-3, 1, PROTON_MASS_KG)).toThrow(/\bn must/);
    expect(() => seriesLineVacuumWavelengthSI("balmer", 1.5, 1, PROTON_MASS_KG)).toThrow(RangeError);
  });
  it("lower ≥ upper → RangeError naming nUpper", () => {
    expect(() => transitionEnergySI(3, 2, 1, PROTON_MASS_KG)).toThrow(/nUpper must be greater/);
    expect(() => transitionVacuumWavelengthSI(2, 2, 1, PROTON_MASS_KG)).toThrow(/nUpper/);
    expect(() => seriesLineEnergySI("paschen", 3, 1, PROTON_MASS_KG)).toThrow(/nUpper/);
    expect(() => diracTransitionEnergySI(2, 1.5, 2, 0.5, 1, PROTON_MASS_KG)).toThrow(/jUpper/);
    expect(() => diracCentroidTransitionEnergySI(3, 3, 1, PROTON_MASS_KG)).toThrow(/nUpper/);
  });
  it("unknown series name → RangeError", () => {
    expect(() => seriesLimitEnergySI("balmr" as SeriesName, 1, PROTON_MASS_KG)).toThrow(/series must be one of/);
    expect(() => seriesVacuumWavelengthsSI("lyman", 0, 1, PROTON_MASS_KG)).toThrow(/count/);
  });
});
