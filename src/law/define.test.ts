import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { kinds, type Kind } from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import type { SystemName } from "../quantity/quantity";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import { defineLaw, type Law } from "./define";
import { lawInput, type InputCheck, type LawInput, type LawInputOptions } from "./input";
import { lawOutput } from "./output";
import {
  CGS_COPY,
  KIND_BY_POSITION,
  NAME_BY_POSITION,
  SI_COPY,
  SPECIALS,
  anyDouble,
  call,
  cgsToSIExp,
  neighbour,
  fromSIModel,
  outcome,
  positiveDouble,
  productKernel,
  toSIModel,
  withoutCodegen,
  type Outcome,
} from "./law.test-util";

type AnyLaw = Law<readonly LawInput[], Dimension>;
type Sys = UnitSystem<SystemName>;

/**
 * Every way a law can be run: generated code with `SI`/`CGS`, the same law
 * with copies of the systems (not recognized by identity: the generic
 * closure), and the law defined with generated code off, with the systems
 * and with copies. All must give the same value or the same message.
 */
function paths(make: () => AnyLaw): { label: string; run: (sys: "SI" | "CGS", args: readonly number[]) => Outcome }[] {
  const compiled = make();
  const generic = withoutCodegen(make);
  const real = (s: "SI" | "CGS"): Sys => (s === "SI" ? SI : CGS);
  const copy = (s: "SI" | "CGS"): Sys => (s === "SI" ? SI_COPY : CGS_COPY);
  return [
    { label: "generated", run: (s, a) => outcome(() => call(compiled, real(s), a)) },
    { label: "generated law, copied system", run: (s, a) => outcome(() => call(compiled, copy(s), a)) },
    { label: "no codegen", run: (s, a) => withoutCodegen(() => outcome(() => call(generic, real(s), a))) },
    { label: "no codegen, copied system", run: (s, a) => withoutCodegen(() => outcome(() => call(generic, copy(s), a))) },
  ];
}

const WORDS: Record<InputCheck, string> = {
  positive: "a finite number > 0",
  nonNegative: "a finite number >= 0",
  finite: "a finite number",
  any: "a number",
};

/** The checks as the documentation states them, written independently of input.ts. */
function passesSpec(check: InputCheck, v: number): boolean {
  switch (check) {
    case "positive":
      return Number.isFinite(v) && v > 0;
    case "nonNegative":
      return Number.isFinite(v) && v >= 0;
    case "finite":
      return Number.isFinite(v);
    case "any":
      return true;
  }
}

const show = (v: number) => (Object.is(v, -0) ? "-0" : String(v));
const suffix = (u: string) => (u === "" ? "" : ` ${u}`);

/** The documented outcome of an unranged law: checks in the caller's unit, exact scaling, kernel, result check. */
function model(
  sys: Sys,
  name: string,
  inputs: readonly { name: string; kind: Kind<Dimension>; check: InputCheck }[],
  result: Kind<Dimension>,
  kernel: (...x: number[]) => number,
  args: readonly number[],
): Outcome {
  const si: number[] = [];
  for (let k = 0; k < inputs.length; k++) {
    const input = inputs[k]!;
    const a = args[k]!;
    const unit = sys.coherentUnit(input.kind.dimension);
    if (!passesSpec(input.check, a)) return { error: `${input.name} must be ${WORDS[input.check]}${suffix(unit)}; got ${show(a)}`, type: "RangeError" };
    const x = toSIModel(sys, a, input.kind.dimension);
    if (input.check !== "any" && !passesSpec(input.check, x)) {
      return {
        error: `${input.name} = ${show(a)}${suffix(unit)} is outside the double range once converted to SI (${show(x)}${suffix(SI.coherentUnit(input.kind.dimension))})`,
        type: "RangeError",
      };
    }
    si.push(x);
  }
  const v = kernel(...si);
  const r = fromSIModel(sys, v, result.dimension);
  if (Number.isFinite(r)) return { value: r };
  const list = inputs.map((input, k) => `${input.name}=${show(args[k]!)}${suffix(sys.coherentUnit(input.kind.dimension))}`).join(", ");
  if (Number.isNaN(v)) return { error: `${name} has no finite value for ${list}`, type: "RangeError" };
  return { error: `${name} overflows the double range in ${sys.coherentUnit(result.dimension) || "its unit"} for ${list}`, type: "RangeError" };
}

/** Compare outcomes, values bit for bit (Object.is: −0 and NaN payload-free identity). */
function expectSame(actual: Outcome, expected: Outcome, where: string): void {
  if ("value" in expected && "value" in actual) {
    expect(Object.is(actual.value, expected.value), `${where}: ${actual.value} vs ${expected.value}`).toBe(true);
  } else {
    expect(actual, where).toEqual(expected);
  }
}

describe("one input, each check: exactly the right values pass, with the documented message", () => {
  const checks: InputCheck[] = ["positive", "nonNegative", "finite", "any"];
  // length: CGS → SI ÷ 10² (a value can underflow); wavenumber: × 10² (a value can overflow);
  // temperature: the same in both; dimensionless: no unit in the message.
  const kindsUnderTest: [Kind<Dimension>, string, string][] = [
    [kinds.length, "m", "cm"],
    [kinds.wavenumber, "m^-1", "cm^-1"],
    [kinds.temperature, "K", "K"],
    [kinds.dimensionless, "", ""],
  ];
  for (const check of checks) {
    for (const [kind, siUnit, cgsUnit] of kindsUnderTest) {
      it(`${check} ${kind.name}: SPECIALS in SI and CGS, on every path`, () => {
        let seen: number[] = [];
        const make = () =>
          defineLaw({
            name: "f",
            inputs: [lawInput("x", kind, { check })],
            result: kinds.dimensionless,
            kernel: (x) => {
              seen.push(x);
              return 1;
            },
          }) as unknown as AnyLaw;
        for (const path of paths(make)) {
          for (const s of ["SI", "CGS"] as const) {
            const sys = s === "SI" ? SI : CGS;
            const unit = s === "SI" ? siUnit : cgsUnit;
            for (const v of SPECIALS) {
              seen = [];
              const got = path.run(s, [v]);
              const where = `${path.label} ${s} ${show(v)}`;
              const x = toSIModel(sys, v, kind.dimension);
              if (!passesSpec(check, v)) {
                expect(got, where).toEqual({ error: `x must be ${WORDS[check]}${suffix(unit)}; got ${show(v)}`, type: "RangeError" });
                expect(seen, where).toEqual([]);
              } else if (check !== "any" && !passesSpec(check, x)) {
                // valid in the caller's unit, but not once moved to SI
                expect(got, where).toEqual({
                  error: `x = ${show(v)}${suffix(unit)} is outside the double range once converted to SI (${show(x)}${suffix(siUnit)})`,
                  type: "RangeError",
                });
                expect(seen, where).toEqual([]);
              } else {
                expect(got, where).toEqual({ value: 1 });
                // the kernel saw the value moved to SI by one exact operation (−0 kept)
                expect(seen.length > 0 && seen.every((y) => Object.is(y, x)), where).toBe(true);
              }
            }
          }
        }
      });
    }
  }

  it("the messages read as documented (literal text)", () => {
    const t = defineLaw({ name: "f", inputs: [lawInput("temperature", kinds.temperature)], result: kinds.dimensionless, kernel: () => 1 });
    expect(() => t(SI, -3 as never)).toThrow(new RangeError("temperature must be a finite number > 0 K; got -3"));
    expect(() => t(CGS, -0 as never)).toThrow(new RangeError("temperature must be a finite number > 0 K; got -0"));
    const l = defineLaw({ name: "f", inputs: [lawInput("depth", kinds.length, { check: "nonNegative" })], result: kinds.dimensionless, kernel: () => 1 });
    expect(() => l(CGS, NaN as never)).toThrow(new RangeError("depth must be a finite number >= 0 cm; got NaN"));
    expect(() => l(SI, -Infinity as never)).toThrow(new RangeError("depth must be a finite number >= 0 m; got -Infinity"));
    const b = defineLaw({ name: "f", inputs: [lawInput("beta", kinds.dimensionless, { check: "finite" })], result: kinds.dimensionless, kernel: () => 1 });
    expect(() => b(SI, Infinity)).toThrow(new RangeError("beta must be a finite number; got Infinity"));
    const e = defineLaw({ name: "f", inputs: [lawInput("energy", kinds.energy)], result: kinds.dimensionless, kernel: () => 1 });
    // 1e-320 erg = 1e-327 J: below the smallest double, so 0 in SI
    expect(() => e(CGS, 1e-320 as never)).toThrow(
      new RangeError("energy = 1e-320 cm^2 g s^-2 is outside the double range once converted to SI (0 m^2 kg s^-2)"),
    );
    // the same value is fine in SI, and 1e-320 cm is 1e-322 m (still a positive subnormal)
    expect(e(SI, 1e-320 as never)).toBe(1);
    const l2 = defineLaw({ name: "f", inputs: [lawInput("x", kinds.length)], result: kinds.length, kernel: (x) => x });
    expect(l2(CGS, 1e-320 as never)).toBe(1e-322 * 100); // 1e-320 cm → 1e-322 m (÷100), back × 100 (subnormals round)
    expect(() => l2(CGS, 5e-324 as never)).toThrow(new RangeError("x = 5e-324 cm is outside the double range once converted to SI (0 m)"));
  });

  it("an invalid option is refused when the input is declared", () => {
    expect(() => lawInput("x", kinds.length, { check: "positiv" as InputCheck })).toThrow(
      new RangeError("input x: check must be one of positive, nonNegative, finite, any; got positiv"),
    );
    expect(() => lawInput("x", kinds.length, { min: 2, max: 1 })).toThrow(new RangeError("input x: min (2) must not exceed max (1)"));
    expect(() => defineLaw({ name: "g", inputs: [{ name: "x" } as never], result: kinds.length, kernel: () => 1 })).toThrow(
      new TypeError("law g: every input must come from lawInput()"),
    );
  });
});

describe("ranges (min/max in SI, inclusive), shown in the caller's unit with the note", () => {
  const make = (options: LawInputOptions) => () =>
    defineLaw({ name: "f", inputs: [lawInput("x", kinds.length, options)], result: kinds.length, kernel: (x) => x }) as unknown as AnyLaw;
  const fit = make({ min: 1e-7, max: 1e-3, rangeNote: "fit range" });

  it("bounds are inclusive; the next double outside is refused, in SI and CGS, on every path", () => {
    for (const path of paths(fit)) {
      expect(path.run("SI", [1e-7])).toEqual({ value: 1e-7 });
      expect(path.run("SI", [1e-3])).toEqual({ value: 1e-3 });
      expect(neighbour(1e-7, -1)).toBe(9.999999999999998e-8);
      expect(path.run("SI", [9.999999999999998e-8])).toEqual({ error: "x must be in [1e-7, 0.001] m (fit range); got 9.999999999999998e-8", type: "RangeError" });
      expect(neighbour(1e-3, 1)).toBe(0.0010000000000000002);
      expect(path.run("SI", [0.0010000000000000002])).toEqual({ error: "x must be in [1e-7, 0.001] m (fit range); got 0.0010000000000000002", type: "RangeError" });
      // 1e-5 cm / 100 is the double 1e-7 (the bound), 0.1 cm / 100 the double 1e-3
      expect(path.run("CGS", [1e-5])).toEqual({ value: 1e-5 });
      expect(path.run("CGS", [0.1])).toEqual({ value: 0.1 });
      // the bound is printed in cm (to 15 digits: 1e-7 × 100 is 0.000009999999999999999 as a double)
      expect(path.run("CGS", [0.2])).toEqual({ error: "x must be in [0.00001, 0.1] cm (fit range); got 0.2", type: "RangeError" });
      expect(path.run("CGS", [9e-6])).toEqual({ error: "x must be in [0.00001, 0.1] cm (fit range); got 0.000009", type: "RangeError" });
    }
  });

  it("the check comes before the range; no note, no parentheses; one-sided ranges print Infinity", () => {
    for (const path of paths(fit)) expect(path.run("SI", [NaN])).toEqual({ error: "x must be a finite number > 0 m; got NaN", type: "RangeError" });
    for (const path of paths(make({ max: 1 }))) {
      expect(path.run("SI", [2])).toEqual({ error: "x must be in [-Infinity, 1] m; got 2", type: "RangeError" });
      expect(path.run("CGS", [1000])).toEqual({ error: "x must be in [-Infinity, 100] cm; got 1000", type: "RangeError" });
    }
    for (const path of paths(make({ min: 1, check: "finite" }))) {
      expect(path.run("SI", [-1])).toEqual({ error: "x must be in [1, Infinity] m; got -1", type: "RangeError" });
    }
  });

  it("a ranged 'any' input refuses NaN and ±Infinity with the range message (a range is a check)", () => {
    for (const path of paths(make({ check: "any", min: -1, max: 1, rangeNote: "domain" }))) {
      expect(path.run("SI", [NaN])).toEqual({ error: "x must be in [-1, 1] m (domain); got NaN", type: "RangeError" });
      expect(path.run("SI", [Infinity])).toEqual({ error: "x must be in [-1, 1] m (domain); got Infinity", type: "RangeError" });
      expect(path.run("CGS", [-Infinity])).toEqual({ error: "x must be in [-100, 100] cm (domain); got -Infinity", type: "RangeError" });
      expect(path.run("CGS", [-0])).toEqual({ value: -0 });
    }
    // without a range, NaN and ±Infinity go to the kernel as they are
    for (const path of paths(make({ check: "any" }))) {
      expect(path.run("SI", [NaN])).toEqual({ error: "f has no finite value for x=NaN m", type: "RangeError" });
      expect(path.run("CGS", [Infinity])).toEqual({ error: "f overflows the double range in cm for x=Infinity cm", type: "RangeError" });
    }
  });

  it("a finite CGS value whose SI value leaves the double range is named as such, even when ranged", () => {
    const w = () =>
      defineLaw({ name: "f", inputs: [lawInput("k", kinds.wavenumber, { check: "any", max: 1e300 })], result: kinds.dimensionless, kernel: () => 1 }) as unknown as AnyLaw;
    for (const path of paths(w)) {
      expect(path.run("CGS", [1e307])).toEqual({ error: "k = 1e+307 cm^-1 is outside the double range once converted to SI (Infinity m^-1)", type: "RangeError" });
      expect(path.run("CGS", [1e299])).toEqual({ error: "k must be in [-Infinity, 1e+298] cm^-1; got 1e+299", type: "RangeError" });
    }
  });
});

describe("the result: a kernel's Infinity or NaN, and CGS overflow after conversion", () => {
  // mode selects what the kernel returns; result an energy (× 10⁷ into CGS)
  const make = () =>
    defineLaw({
      name: "E",
      inputs: [lawInput("x", kinds.length), lawInput("mode", kinds.dimensionless, { check: "finite" })],
      result: kinds.energy,
      kernel: (x, mode) => (mode === 1 ? Infinity : mode === 2 ? NaN : mode === 3 ? -Infinity : mode === 4 ? 1e302 : mode === 5 ? 5e-324 : x),
    }) as unknown as AnyLaw;

  it("names the law, the unit of the result and every argument in the caller's units, on every path", () => {
    for (const path of paths(make)) {
      expect(path.run("SI", [2, 1])).toEqual({ error: "E overflows the double range in m^2 kg s^-2 for x=2 m, mode=1", type: "RangeError" });
      expect(path.run("CGS", [200, 1])).toEqual({ error: "E overflows the double range in cm^2 g s^-2 for x=200 cm, mode=1", type: "RangeError" });
      expect(path.run("SI", [2, 2])).toEqual({ error: "E has no finite value for x=2 m, mode=2", type: "RangeError" });
      expect(path.run("CGS", [200, 2])).toEqual({ error: "E has no finite value for x=200 cm, mode=2", type: "RangeError" });
      expect(path.run("SI", [2, 3])).toEqual({ error: "E overflows the double range in m^2 kg s^-2 for x=2 m, mode=3", type: "RangeError" });
      // finite in SI, beyond the double range only after × 10⁷ into erg
      expect(path.run("SI", [2, 4])).toEqual({ value: 1e302 });
      expect(path.run("CGS", [200, 4])).toEqual({ error: "E overflows the double range in cm^2 g s^-2 for x=200 cm, mode=4", type: "RangeError" });
      // a tiny SI result is not an error (× 10⁷ keeps it; a result that underflows to 0 is returned as 0)
      expect(path.run("CGS", [200, 5])).toEqual({ value: 5e-324 * 1e7 });
      expect(path.run("SI", [2, 0])).toEqual({ value: 2 });
      expect(path.run("CGS", [200, 0])).toEqual({ value: 2e7 });
    }
  });

  it("a result that underflows to 0 in CGS is returned as 0 (not refused)", () => {
    // photon radiance per wavelength: SI → CGS is × 10⁻⁶
    const law = defineLaw({ name: "N", inputs: [], result: kinds.spectralPhotonRadiancePerWavelength, kernel: () => 5e-324 });
    expect(law(SI)).toBe(5e-324);
    expect(Object.is(law(CGS), 0)).toBe(true);
  });

  it("a dimensionless result names 'its unit'", () => {
    const law = defineLaw({ name: "ratio", inputs: [lawInput("q", kinds.dimensionless)], result: kinds.dimensionless, kernel: (q) => q * 1e308 * 10 });
    expect(() => law(CGS, 3)).toThrow(new RangeError("ratio overflows the double range for q=3"));
  });

  it("lawOutput on its own: fromSI and reason", () => {
    const out = lawOutput("L", kinds.power);
    expect(out.fromSI(SI, 3.8e26)).toBe(3.8e26);
    expect(out.fromSI(CGS, 3.8e26)).toBe(3.8e26 * 1e7);
    expect(out.fromSI(CGS, 1e302)).toBeNaN();
    expect(out.fromSI(SI, -Infinity)).toBeNaN();
    expect(out.reason(CGS, 1e302, [lawInput("r", kinds.length)], [7])).toBe("L overflows the double range in cm^2 g s^-3 for r=7 cm");
  });
});

describe("laws of 0 to 5 inputs: SI is the kernel's number, CGS the kernel's number × an exact power of ten", () => {
  // inputs a..e are length, energy, wavenumber, temperature, momentum: CGS → SI exponents −2, −7, +2, 0, −5
  for (let n = 0; n <= 5; n++) {
    for (const checks of [["positive", "positive", "positive", "positive", "positive"], ["any", "finite", "nonNegative", "any", "finite"]] as InputCheck[][]) {
      if (n === 0 && checks[0] === "any") continue;
      it(`${n} input(s), checks ${checks.slice(0, n).join(", ") || "none"}: every path agrees with the documented model (log-uniform over the double range)`, () => {
        const kernel = productKernel(n);
        const inputs = Array.from({ length: n }, (_, k) => ({ name: NAME_BY_POSITION[k]!, kind: KIND_BY_POSITION[k]!, check: checks[k]! }));
        const make = () =>
          defineLaw({
            name: `P${n}`,
            inputs: inputs.map((i) => lawInput(i.name, i.kind, { check: i.check })),
            result: kinds.energy as Kind<Dimension>,
            kernel,
          }) as unknown as AnyLaw;
        const all = paths(make);
        const arb = checks[0] === "positive" ? positiveDouble : anyDouble;
        let finite = 0;
        fc.assert(
          fc.property(fc.array(arb, { minLength: n, maxLength: n }), fc.constantFrom("SI" as const, "CGS" as const), (args, s) => {
            const sys = s === "SI" ? SI : CGS;
            const expected = model(sys, `P${n}`, inputs, kinds.energy as Kind<Dimension>, kernel, args);
            if ("value" in expected) finite++;
            for (const path of all) expectSame(path.run(s, args), expected, `${path.label} ${s} ${args.map(show).join(", ")}`);
          }),
          { numRuns: n === 0 ? 10 : 300 },
        );
        // the property must have exercised the success path, not only refusals
        expect(finite).toBeGreaterThan(0);
      });
    }
  }

  it("CGS = SI result × 10⁷ (energy) with each argument ÷ its exact power, on ordinary values", () => {
    const kernel = productKernel(3);
    const law = defineLaw({
      name: "P3",
      inputs: [lawInput("a", kinds.length), lawInput("b", kinds.energy), lawInput("c", kinds.wavenumber)],
      result: kinds.energy,
      kernel,
    });
    // 1 cm = 10⁻² m, 1 erg = 10⁻⁷ J, 1 cm⁻¹ = 10² m⁻¹ (definitions of the CGS units)
    const viaSI = kernel(150 / 100, 3e7 / 1e7, 2 * 100) * 1e7;
    expect(law(CGS, 150 as never, 3e7 as never, 2 as never)).toBe(viaSI);
    expect(cgsToSIExp(kinds.energy.dimension)).toBe(-7);
  });
});

describe("defineLaw's product", () => {
  it("exposes its inputs, output and kernel", () => {
    const a = lawInput("a", kinds.length);
    const kernel = (x: number) => 2 * x;
    const law = defineLaw({ name: "twice", inputs: [a], result: kinds.length, kernel });
    expect(law.inputs).toEqual([a]);
    expect(law.inputs[0]).toBe(a);
    expect(law.kernel).toBe(kernel);
    expect(law.output.name).toBe("twice");
    expect(law.output.kind).toBe(kinds.length);
  });

  it("a vacuum input behaves like any other length at run time (the brand is compile-time only)", () => {
    const make = () =>
      defineLaw({ name: "f", inputs: [lawInput("wavelength", kinds.length, { vacuum: true })], result: kinds.length, kernel: (l) => l }) as unknown as AnyLaw;
    expect(lawInput("w", kinds.length, { vacuum: true }).vacuum).toBe(true);
    expect(lawInput("w", kinds.length).vacuum).toBe(false);
    for (const path of paths(make)) {
      expect(path.run("CGS", [5e-5])).toEqual({ value: (5e-5 / 100) * 100 });
      expect(path.run("SI", [-1])).toEqual({ error: "wavelength must be a finite number > 0 m; got -1", type: "RangeError" });
    }
  });

  it("a kernel that throws is not caught: its own error reaches the caller", () => {
    const law = defineLaw({
      name: "f",
      inputs: [lawInput("x", kinds.length)],
      result: kinds.length,
      kernel: () => {
        throw new Error("kernel bug");
      },
    });
    expect(() => law(SI, 1 as never)).toThrow(new Error("kernel bug"));
  });
});
