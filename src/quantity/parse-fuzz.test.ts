/**
 * Parser hardening: a seeded fuzz of mutated unit texts, and the limits on
 * nesting, length, separators and underflow. The fuzz asserts the outcome
 * (a unit of finite positive size, or a ParseError with a bounded message)
 * and a bound on the work done per string (characters looked at plus table
 * probes, from `lastUnitParseSteps`), never wall time; the time per string is
 * measured and printed only (timings are indicative).
 */
import { describe, expect, test } from "vitest";
import { mulberry32 } from "../../test/support/random";
import { lastUnitParseSteps, ParseError, parseQuantityText, parseUnit, unitTextLimits, type UnitSyntax } from "./parse";

const seeds = [
  "erg s^-1 cm^-2 Å^-1", "erg/s/cm2/Angstrom", "1e-17 erg/s/cm2/A", "10-7 J", "W.m**-2.sr**-1.Hz**-1", "km s-1 Mpc-1",
  "solMass/yr", "mas/yr", "W / (m^2 sr)", "erg/(s cm2 A)", "MJy/sr", "Lsun", "mag", "10^(-17) erg s**-1", "cm⁻²", "µJy",
];
const alphabet = [
  ..."abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789",
  ..."()()^^**//..  +--−·⁻²³_", "Å", "µ", "μ", "☉", "°", "″", "\t", "\u00a0", "\u3000", "\ufeff", "\u2028", "\u202e", "\v", "\f", "\u0000", "é", "😀",
];
const syntaxes: UnitSyntax[] = ["any", "fits", "ogip", "cds", "vounits"];

/** One random edit: insert, delete, replace, duplicate a slice, wrap in parentheses, or truncate. */
function mutate(s: string, rand: () => number): string {
  const pick = <T>(a: readonly T[]): T => a[Math.floor(rand() * a.length)] as T;
  const i = Math.floor(rand() * (s.length + 1));
  switch (Math.floor(rand() * 7)) {
    case 0:
      return s.slice(0, i) + pick(alphabet) + s.slice(i);
    case 1:
      return s.slice(0, i) + s.slice(i + 1);
    case 2:
      return s.slice(0, i) + pick(alphabet) + s.slice(i + 1);
    case 3: {
      const j = i + Math.floor(rand() * 8);
      return s.slice(0, j) + s.slice(i, j) + s.slice(j);
    }
    case 4: {
      const n = Math.floor(rand() * 30);
      return "(".repeat(n) + s + ")".repeat(Math.floor(rand() * (n + 1)));
    }
    case 5:
      return s.slice(0, i);
    default:
      return s + pick([" ", "/", ".", "*", "^", "-", "2", "s", "(", ")"]) + pick(seeds);
  }
}

// Work bound: the steps the parser counts per character of input (measured
// worst ≈ 10 on the seeds' mutations; 40 leaves room without hiding a
// super-linear path, which would grow with the text length).
const STEPS_PER_CHAR = 40;
const STEPS_CONSTANT = 120;

describe("fuzz of mutated unit texts", () => {
  // ~10 s on a shared 2-core machine (indicative): the timeout is generous on purpose
  test("100 000 mutated strings: a unit or a ParseError, bounded work and message", { timeout: 120_000 }, () => {
    const rand = mulberry32(20261202);
    const N = 100_000;
    let units = 0;
    let errors = 0;
    let worstRatio = 0;
    let worstMs = 0;
    let worstText = "";
    const times = new Float64Array(N);
    for (let k = 0; k < N; k++) {
      let s = seeds[k % seeds.length] as string;
      const edits = 1 + Math.floor(rand() * 4);
      for (let e = 0; e < edits; e++) s = mutate(s, rand);
      const syntax = syntaxes[k % syntaxes.length] as UnitSyntax;
      const t0 = performance.now();
      try {
        const u = parseUnit(s, { syntax });
        if (!(u.factor > 0 && Number.isFinite(u.factor))) throw new Error(`${JSON.stringify(s)} gave size ${u.factor}`);
        units++;
      } catch (e) {
        if (!(e instanceof ParseError)) throw new Error(`${JSON.stringify(s)} threw ${String(e)}`);
        if (e.message.length >= 400) throw new Error(`${JSON.stringify(s)}: message of ${e.message.length} characters`);
        errors++;
      }
      const ms = performance.now() - t0;
      times[k] = ms;
      if (ms > worstMs) {
        worstMs = ms;
        worstText = s;
      }
      const steps = lastUnitParseSteps();
      if (steps > STEPS_PER_CHAR * s.length + STEPS_CONSTANT) throw new Error(`${JSON.stringify(s)}: ${steps} steps`);
      worstRatio = Math.max(worstRatio, steps / (s.length + 1));
    }
    expect(units + errors).toBe(N);
    expect(units).toBeGreaterThan(1000); // the fuzz reaches valid units, not only errors
    times.sort();
    const q = (f: number): string => ((times[Math.floor(f * (N - 1))] as number) * 1000).toFixed(0);
    console.log(
      `unit fuzz: ${N} strings, ${units} units, ${errors} ParseErrors, worst steps/char ${worstRatio.toFixed(1)}; ` +
        `time per string (indicative, includes GC pauses) median ${q(0.5)} µs, p99 ${q(0.99)} µs, p99.9 ${q(0.999)} µs, ` +
        `worst ${worstMs.toFixed(2)} ms on ${JSON.stringify(worstText.slice(0, 40))}`,
    );
  });
});

describe("limits (issue 16 §4)", () => {
  test("deep nesting is a ParseError naming the depth, not a stack overflow", () => {
    for (const n of [unitTextLimits.maxNesting + 1, 200, 5000]) {
      const s = "(".repeat(n) + "m" + ")".repeat(n);
      const text = s.length > unitTextLimits.maxLength ? s.slice(0, unitTextLimits.maxLength) : s;
      expect(() => parseUnit(text)).toThrow(ParseError);
    }
    expect(() => parseUnit("(".repeat(20) + "m" + ")".repeat(20))).toThrow(/at most 16 nested parentheses/);
    const ok = "(".repeat(unitTextLimits.maxNesting) + "m" + ")".repeat(unitTextLimits.maxNesting);
    expect(parseUnit(ok).factor).toBe(1);
  });
  test("text beyond the length limit is refused before any parsing, with a short message", () => {
    const huge = Array.from({ length: 100_000 }, () => "m").join(" ");
    let err: unknown;
    try {
      parseUnit(huge);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ParseError);
    expect((err as ParseError).message).toMatch(/199999 characters, more than the limit of 512/);
    expect((err as ParseError).message.length).toBeLessThan(300);
    expect(() => parseQuantityText(`1 ${huge}`)).toThrow(/limit of 512/);
    // within the limit the work stays linear
    const long = Array.from({ length: 200 }, () => "m").join(" ").slice(0, 399);
    try {
      parseUnit(long);
    } catch {
      /* dimension overflow is fine */
    }
    expect(lastUnitParseSteps()).toBeLessThanOrEqual(STEPS_PER_CHAR * long.length + STEPS_CONSTANT);
  });
  test("only the ASCII space separates", () => {
    for (const sp of ["\t", "\v", "\f", "\u00a0", "\u3000", "\ufeff", "\u2028", "\u2029", "\u1680", "\u2003"]) {
      expect(() => parseQuantityText(`5${sp}K`), JSON.stringify(sp)).toThrow(ParseError);
      expect(() => parseUnit(`W${sp}m-2`), JSON.stringify(sp)).toThrow(/ASCII space/);
      expect(() => parseQuantityText(`${sp}5 K`), JSON.stringify(sp)).toThrow(ParseError);
    }
    expect(parseQuantityText("  5  K  ").value).toBe(5);
  });
  test("a written value that underflows or overflows is an error, not 0 or Infinity", () => {
    expect(() => parseQuantityText("1e-400 m")).toThrow(/underflows to 0/);
    expect(() => parseQuantityText("-2.5e-999 K")).toThrow(/underflows/);
    expect(() => parseQuantityText("1e400 m")).toThrow(/finite/);
    expect(parseQuantityText("0 m").value).toBe(0);
    expect(parseQuantityText("0.000e-400 m").value).toBe(0); // a written zero stays zero
    expect(parseQuantityText("5e-324 m").value).toBe(5e-324); // the smallest subnormal is a value
  });
  test("messages quote a bounded excerpt and escape invisible characters", () => {
    const s = `${"m/m ".repeat(100)}\u202equux`;
    let err: ParseError | undefined;
    try {
      parseUnit(s);
    } catch (e) {
      err = e as ParseError;
    }
    expect(err).toBeInstanceOf(ParseError);
    expect(err?.message.length).toBeLessThan(300);
    expect(err?.message).not.toContain("\u202e");
    expect(err?.message).toContain("\\u202e");
    expect(err?.message).toMatch(/\(\d+ characters\)/);
  });
});
