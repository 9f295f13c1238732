import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ALPHA, C, EV, M_E, M_P, M_U } from "../../values/constants";
import fx from "../../../test/fixtures/hydrogen-levels.json";
import {
  ALPHA_PARTICLE_MASS_KG,
  DEUTERIUM,
  DEUTERON_MASS_KG,
  HELIUM_II,
  HYDROGEN,
  bohrLevelEnergySI,
  diracLevelCentroidEnergySI,
  diracLevelEnergySI,
  nuclearMassFromMassNumberKg,
  reducedMassKg,
  reducedMassRatio,
} from "./hydrogen-like";

const ions = { H: HYDROGEN, D: DEUTERIUM, HeII: HELIUM_II } as const;

describe("nuclear masses (CODATA 2018)", () => {
  it("match scipy.constants' CODATA 2018 table (fixture hydrogen-levels.json)", () => {
    // Same printed CODATA 2018 digits (11 significant) → identical doubles expected.
    expect(ALPHA_PARTICLE_MASS_KG).toBe(fx.codata2018.m_alpha);
    expect(DEUTERON_MASS_KG).toBe(fx.codata2018.m_d);
    expect(M_P).toBe(fx.codata2018.m_p);
    expect(M_E).toBe(fx.codata2018.m_e);
  });

  it("reduced mass of H: μ/m_e = 1/(1 + m_e/m_p) = 0.999 455 679 (from memory, m_p/m_e = 1836.152 673)", () => {
    // 1/(1 + 1/1836.15267343) = 0.99945567942 — 10 digits printed → rel 1e-10.
    expect(reducedMassRatio(M_P)).toBeCloseTo(0.99945567942, 10);
    expect(reducedMassKg(Infinity)).toBe(M_E);
  });

  it("mass-number estimate is within the mass excess of the real nucleus", () => {
    // ⁴He: A m_u − 2 m_e vs CODATA alpha mass: the ⁴He mass excess is 2.4 MeV/c²
    // (0.0026 u, from memory) → relative difference ≈ 6.5e-4; check ≤ 1e-3.
    const est = nuclearMassFromMassNumberKg(4, 2);
    expect(Math.abs(est / ALPHA_PARTICLE_MASS_KG - 1)).toBeLessThan(1e-3);
    expect(est).toBeCloseTo(4 * M_U - 2 * M_E, 40);
  });
});

describe("level energies vs mpmath (fixture hydrogen-levels.json, 50 digits)", () => {
  it("Bohr levels of H, D, He II, n = 1–8", () => {
    // Double-precision evaluation of a product of ~6 factors: ≤ 1e-15 expected; 4e-15 allowed.
    for (const row of fx.levels) {
      const ion = ions[row.ion as keyof typeof ions];
      const e = bohrLevelEnergySI(row.n, ion.z, ion.nuclearMassKg);
      expect(Math.abs(e / row.bohr_J - 1)).toBeLessThan(4e-15);
    }
  });

  it("Dirac levels of H, D, He II, all j (stable f − 1 vs straightforward 50-digit formula)", () => {
    // f − 1 via expm1/log1p: a few ulp of the ~1e-5 result → ≤ 1e-14 relative.
    let worst = 0;
    for (const row of fx.levels) {
      const ion = ions[row.ion as keyof typeof ions];
      for (const [j, ref] of Object.entries(row.dirac_J)) {
        const e = diracLevelEnergySI(row.n, Number(j), ion.z, ion.nuclearMassKg);
        worst = Math.max(worst, Math.abs(e / ref - 1));
      }
    }
    expect(worst).toBeLessThan(1e-14);
  });
});

describe("physics of the Dirac levels", () => {
  it("Dirac minus Bohr for 1s of H is the α²/4 binding correction (Bethe & Salpeter eq. 16.1 expansion)", () => {
    // E(n,j) ≈ E_n [1 + (Zα)²/n² (n/(j+½) − ¾)] to O(α⁴): for 1s, ratio − 1 = α²/4 + O(α⁴ ≈ 3e-9).
    const r = diracLevelEnergySI(1, 0.5, 1, M_P) / bohrLevelEnergySI(1, 1, M_P) - 1;
    expect(Math.abs(r - ALPHA * ALPHA / 4)).toBeLessThan(1e-8);
  });

  it("H 2p½–2p3/2 fine-structure splitting ≈ 10.969 GHz (from memory: 10 969 MHz incl. QED)", () => {
    // Dirac theory gives ≈ 10.944 GHz; QED (Lamb shift of 2p) adds ~0.02 GHz → tolerance 0.3 %.
    const dE = diracLevelEnergySI(2, 1.5, 1, M_P) - diracLevelEnergySI(2, 0.5, 1, M_P);
    const ghz = dE / 6.62607015e-34 / 1e9;
    expect(Math.abs(ghz / 10.969 - 1)).toBeLessThan(3e-3);
  });

  it("ionization energy of H 1s: 13.598 434 eV (from memory, NIST/CODATA)", () => {
    // Bohr (reduced mass) omits the Dirac binding correction α²/4 = 1.33e-5 (plus Lamb
    // shift 3e-6): tolerance 2e-5. Dirac omits the 1s Lamb shift (8.17 GHz = 3.4e-5 eV,
    // 2.5e-6 relative, from memory): tolerance 4e-6.
    expect(Math.abs(-bohrLevelEnergySI(1, 1, M_P) / EV / 13.598434 - 1)).toBeLessThan(2e-5);
    expect(Math.abs(-diracLevelEnergySI(1, 0.5, 1, M_P) / EV / 13.598434 - 1)).toBeLessThan(4e-6);
  });

  it("property: the j-weighted centroid lies between the lowest and highest j level", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1, max: 92 }), (n, z) => {
        const c = diracLevelCentroidEnergySI(n, z, Infinity);
        const lo = diracLevelEnergySI(n, 0.5, z, Infinity);
        const hi = diracLevelEnergySI(n, n - 0.5, z, Infinity);
        // Energies are negative: lo·(1 + 1e-14) is slightly below lo, hi·(1 − 1e-14) slightly above hi.
        return c >= lo * (1 + 1e-14) && c <= hi * (1 - 1e-14);
      }),
    );
  });

  it("property: Bohr levels scale as Z²/n² and Dirac → Bohr as Zα → 0", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1000 }), fc.integer({ min: 1, max: 137 }), (n, z) => {
        const e = bohrLevelEnergySI(n, z, Infinity);
        const e1 = bohrLevelEnergySI(1, 1, Infinity);
        // Z² n⁻² scaling: exact up to rounding (≤ 4 ulp).
        const ok1 = Math.abs(e / (e1 * z * z / (n * n)) - 1) < 1e-15;
        // Dirac/Bohr − 1 ≤ (Zα)²/n² · (n/(j+½)) · (1 + (Zα)²) bound (series of B&S 16.1).
        const za = z * ALPHA;
        const d = diracLevelEnergySI(n, n - 0.5, z, Infinity) / e - 1;
        const ok2 = d > 0 && d < (za * za) / (n * n) * 1.5;
        return ok1 && ok2;
      }),
    );
  });

  it("Dirac energy of 1s uses μc²: E(1,½) = μc²(√(1 − (Zα)²) − 1) exactly for n = 1", () => {
    // For n = 1, j = ½: f = √(1 − (Zα)²) (closed form); compare at Z = 92 (no cancellation there).
    const za = 92 * ALPHA;
    const ref = reducedMassKg(Infinity) * C * C * (Math.sqrt(1 - za * za) - 1);
    expect(Math.abs(diracLevelEnergySI(1, 0.5, 92, Infinity) / ref - 1)).toBeLessThan(1e-14);
  });
});

describe("bad input", () => {
  it("n ≤ 0 or non-integer → RangeError naming n", () => {
    expect(() => bohrLevelEnergySI(0, 1, M_P)).toThrow(/\bn must/);
    expect(() => bohrLevelEnergySI(-1, 1, M_P)).toThrow(RangeError);
    expect(() => bohrLevelEnergySI(2.5, 1, M_P)).toThrow(/\bn must/);
    expect(() => diracLevelEnergySI(Number.NaN, 0.5, 1, M_P)).toThrow(/\bn must/);
  });
  it("bad j, Z, nuclear mass → RangeError naming the parameter", () => {
    expect(() => diracLevelEnergySI(2, 2.5, 1, M_P)).toThrow(/\bj must/);
    expect(() => diracLevelEnergySI(2, 1, 1, M_P)).toThrow(/\bj must/);
    expect(() => bohrLevelEnergySI(1, 0, M_P)).toThrow(/\bz must/);
    expect(() => bohrLevelEnergySI(1, 138, M_P)).toThrow(/\bz must/);
    expect(() => bohrLevelEnergySI(1, 1, 0)).toThrow(/nuclearMassKg/);
    expect(() => bohrLevelEnergySI(1, 1, Number.NaN)).toThrow(/nuclearMassKg/);
    expect(() => nuclearMassFromMassNumberKg(0, 1)).toThrow(/massNumber/);
    expect(() => nuclearMassFromMassNumberKg(1, 2)).toThrow(/\bz must/);
  });
});
