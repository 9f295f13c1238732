/**
 * docs/guides/writing-a-law.md runs as written: its code blocks are executed
 * against src/index.ts, and the worked example's numbers are checked against
 * an independent evaluation of the modified blackbody with decimal.js from
 * the CODATA 2018 exact constants. (test/docs/examples.test.ts type-checks
 * the same blocks.)
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { Decimal } from "decimal.js";
import { afterAll, describe, expect, it } from "vitest";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const guide = readFileSync(join(root, "docs/guides/writing-a-law.md"), "utf8");
const index = join(root, "src/index").replace(/\\/g, "/");
const scratch = mkdtempSync(join(tmpdir(), "starlume-law-guide-"));

/** The ```ts blocks of the guide, each with whether it continues the one before. */
function blocks(): { code: string; continued: boolean }[] {
  return [...guide.matchAll(/^```ts( continued)?\n([\s\S]*?)^```$/gm)].map((m) => ({ code: m[2] ?? "", continued: m[1] !== undefined }));
}

/**
 * A block made runnable: `from "starlume"` points at the sources, and each
 * statement followed by a `// RangeError: …` comment becomes an entry of
 * `__errors` (the statement as a function, and the message the guide states).
 */
function runnable(code: string, exports: readonly string[]): string {
  const body = code
    .replace(/from\s+"starlume"/g, `from "${index}"`)
    .replace(/^(.*);\n\/\/ RangeError: (.*)$/gm, (_, statement: string, message: string) => `__errors.push([() => { ${statement}; }, ${JSON.stringify(message)}]);`);
  return `const __errors: [() => unknown, string][] = [];\n${body}\nexport { __errors${exports.map((e) => `, ${e}`).join("")} };\n`;
}

let counter = 0;
async function load(code: string, exports: readonly string[] = []): Promise<Record<string, unknown>> {
  const file = join(scratch, `block_${counter++}.ts`);
  writeFileSync(file, runnable(code, exports));
  return (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
}

afterAll(() => rmSync(scratch, { recursive: true, force: true }));

// Independent evaluation, 50 significant digits. CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)):
// h = 6.62607015e-34 J s, c = 299792458 m s^-1, k = 1.380649e-23 J K^-1, all exact by the 2019 SI.
const Dec = Decimal.clone({ precision: 50 });
const H = new Dec("6.62607015e-34");
const C = new Dec("299792458");
const K = new Dec("1.380649e-23");
/** S_ν = (ν/ν₀)^β · 2hν³/c² / (exp(hν/kT) − 1), W m⁻² sr⁻¹ Hz⁻¹ (Planck, Ann. Phys. 4, 553 (1901)). */
function reference(nu: string, t: string, beta: string, nu0: string): number {
  const f = new Dec(nu);
  const x = H.times(f).div(K.times(t));
  const planck = H.times(2).times(f.pow(3)).div(C.pow(2)).div(x.exp().minus(1));
  return f.div(nu0).pow(beta).times(planck).toNumber();
}
// The kernel evaluates about ten correctly rounded operations plus Math.expm1 and one pow (each within ~1 ulp
// in V8), so its relative error is a few times 1e-16; 1e-14 leaves a wide margin and still catches any error
// in a constant, a unit (GHz) or a formula.
const TOL = 1e-14;
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe("docs/guides/writing-a-law.md", () => {
  const all = blocks();

  it("has a worked example continued over several blocks, and self-contained blocks", () => {
    expect(all.filter((b) => b.continued).length).toBeGreaterThanOrEqual(4);
    expect(all.filter((b) => !b.continued).length).toBeGreaterThanOrEqual(3);
  });

  it("the five-minute example runs and gives the solar constant from L☉ and 1 au", async () => {
    const block = all.find((b) => b.code.includes("fluxAt"));
    const m = await load(block!.code, ["f", "fc"]);
    // IAU 2015 B3: L☉ = 3.828e26 W; IAU 2012 B2: 1 au = 149597870700 m. L/(4π au²) = 1361.0 W m^-2.
    const expected = 3.828e26 / (4 * Math.PI * 149597870700 ** 2);
    expect(rel(m.f as number, expected)).toBeLessThan(1e-15);
    expect((m.f as number).toPrecision(4)).toBe("1361");
    expect(rel(m.fc as number, expected * 1000)).toBeLessThan(1e-15);
  });

  describe("the worked example (modified blackbody)", async () => {
    const start = all.findIndex((b) => b.code.includes("const modifiedBlackbody = defineLaw"));
    let end = start + 1;
    while (end < all.length && all[end]!.continued) end++;
    const code = all
      .slice(start, end)
      .map((b) => b.code)
      .join("\n");
    const m = await load(code, ["sSI", "sCGS", "spectrum", "grid", "nu", "nu0", "T"]);
    type Fn = (...a: unknown[]) => number;
    const scalar = m.modifiedBlackbodyRadiance as Fn;
    const { SI, CGS } = await import("../index");

    it("spans the definition, the calls, the batch and the errors", () => {
      expect(end - start).toBeGreaterThanOrEqual(5);
      expect((m.__errors as unknown[]).length).toBe(4);
    });

    it("S_ν(600 GHz, 18 K, β = 1.7, ν₀ = 353 GHz) matches the decimal.js evaluation, and the digits the guide prints", () => {
      const want = reference("600e9", "18", "1.7", "353e9");
      expect(rel(m.sSI as number, want)).toBeLessThan(TOL);
      expect((m.sSI as number).toPrecision(6)).toBe("1.98585e-15");
      expect(guide).toContain("≈ 1.98585e-15 W m^-2 sr^-1 Hz^-1");
    });

    it("the CGS value is the SI value × 1000, bit for bit (1 W m^-2 Hz^-1 = 10^7 erg s^-1 / 10^4 cm^2 / Hz)", () => {
      expect(m.sCGS).toBe((m.sSI as number) * 1000);
      expect((m.sCGS as number).toPrecision(6)).toBe("1.98585e-12");
      expect(guide).toContain("≈ 1.98585e-12 erg s^-1 cm^-2 sr^-1 Hz^-1");
    });

    it("the batch matches the scalar form row by row and the reference, and the guide states its values", () => {
      const r = m.spectrum as { values: Float64Array; invalid: number[]; reasons: string[] };
      const grid = m.grid as Float64Array;
      expect(r.invalid).toEqual([4]);
      expect(r.reasons).toEqual(["frequency must be a finite number > 0 s^-1; got -5000000000"]);
      expect(guide).toContain('spectrum.reasons; // ["frequency must be a finite number > 0 s^-1; got -5000000000"]');
      expect(r.values[4]).toBeNaN();
      const stated = /spectrum\.values; \/\/ Float64Array \[(.*)\]/.exec(guide)![1]!.split(", ");
      ["200e9", "353e9", "600e9", "857e9"].forEach((nu, i) => {
        const v = r.values[i]!;
        expect(Object.is(v, scalar(SI, grid[i], m.T, 1.7, m.nu0))).toBe(true);
        expect(rel(v, reference(nu, "18", "1.7", "353e9"))).toBeLessThan(TOL);
        expect(stated[i]).toBe(`≈ ${v.toPrecision(6)}`);
      });
      // at ν = ν₀ the emissivity factor is exactly 1: S_ν is B_ν itself
      expect(rel(r.values[1]!, reference("353e9", "18", "0", "353e9"))).toBeLessThan(TOL);
    });

    it("every error the guide shows is thrown with exactly the text the guide prints", () => {
      for (const [f, message] of m.__errors as [() => unknown, string][]) {
        expect(f).toThrow(new RangeError(message));
      }
    });

    it("the law takes CGS callers' values too (system-free inputs are the same numbers)", () => {
      expect(scalar(CGS, m.nu, m.T, 1.7, m.nu0)).toBe(m.sCGS);
      expect(() => scalar(CGS, m.nu, m.T, 1.7, -1)).toThrow(new RangeError("referenceFrequency must be a finite number > 0 s^-1; got -1"));
    });
  });

  it("the 'When not to use defineLaw' example runs and gives L☉ for R☉ and 5772 K", async () => {
    const block = all.find((b) => b.code.includes("starLuminosity"));
    const m = await load(block!.code);
    const { SI, CGS, units } = await import("../index");
    const f = m.starLuminosity as (...a: unknown[]) => number;
    // 4π R☉² σ T☉⁴ with the IAU 2015 B3 nominal R☉ = 6.957e8 m, T☉ = 5772 K: 3.828e26 W to 4 digits
    const l = f(SI, { radius: SI.of(1, units.Rsun), temperature: SI.of(5772, units.K) });
    expect(l.toPrecision(4)).toBe("3.828e+26");
    expect(() => f(CGS, { radius: -1, temperature: 5772 })).toThrow(new RangeError("radius must be a finite number > 0 cm; got -1"));
    expect(() => f(SI, { radius: 1e300, temperature: 1e30 })).toThrow(
      new RangeError("luminosity overflows the double range in m^2 kg s^-3 for radius=1e+300 m, temperature=1e+30 K"),
    );
  });
});
