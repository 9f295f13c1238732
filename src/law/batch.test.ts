import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { kinds, type Kind } from "../quantity/aliases";
import type { Dimension } from "../quantity/dimension";
import type { SystemName } from "../quantity/quantity";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import { BatchLog, batchLength } from "./batch";
import { defineLaw, type Law } from "./define";
import { lawInput, type InputCheck, type LawInput } from "./input";
import {
  CGS_COPY,
  KIND_BY_POSITION,
  NAME_BY_POSITION,
  SI_COPY,
  anyDouble,
  call,
  callBatch,
  outcome,
  positiveDouble,
  productKernel,
  withoutCodegen,
  type Outcome,
} from "./law.test-util";

type AnyLaw = Law<readonly LawInput[], Dimension>;
type Sys = UnitSystem<SystemName>;
type Batch = { values: Float64Array; invalid: number[]; reasons: string[] };

/** A product law of n inputs whose kernel counts its calls. */
function counted(n: number, checks: readonly InputCheck[]): { make: () => AnyLaw; calls: () => number; reset: () => void } {
  let count = 0;
  const inner = productKernel(n);
  const kernel = (...x: number[]) => {
    count++;
    return inner(...x);
  };
  return {
    make: () =>
      defineLaw({
        name: `P${n}`,
        inputs: Array.from({ length: n }, (_, k) => lawInput(NAME_BY_POSITION[k]!, KIND_BY_POSITION[k]!, { check: checks[k]! })),
        result: kinds.energy as Kind<Dimension>,
        kernel,
      }) as unknown as AnyLaw,
    calls: () => count,
    reset: () => {
      count = 0;
    },
  };
}

/** The batch form on every path (see define.test.ts), each with the generated scalar form as reference. */
function batchPaths(make: () => AnyLaw): { label: string; batch: (s: "SI" | "CGS", args: readonly (number | Float64Array)[]) => Batch; scalar: (s: "SI" | "CGS", args: readonly number[]) => Outcome }[] {
  const compiled = make();
  const generic = withoutCodegen(make);
  const real = (s: "SI" | "CGS"): Sys => (s === "SI" ? SI : CGS);
  const copy = (s: "SI" | "CGS"): Sys => (s === "SI" ? SI_COPY : CGS_COPY);
  const scalar = (s: "SI" | "CGS", a: readonly number[]) => outcome(() => call(compiled, real(s), a));
  return [
    { label: "generated", batch: (s, a) => callBatch(compiled, real(s), a), scalar },
    { label: "generated law, copied system", batch: (s, a) => callBatch(compiled, copy(s), a), scalar },
    { label: "no codegen", batch: (s, a) => withoutCodegen(() => callBatch(generic, real(s), a)), scalar },
    { label: "no codegen, copied system", batch: (s, a) => withoutCodegen(() => callBatch(generic, copy(s), a)), scalar },
  ];
}

/** Every pattern of array (true) / shared value (false) for n inputs. */
function patterns(n: number): boolean[][] {
  return Array.from({ length: 2 ** n }, (_, m) => Array.from({ length: n }, (_, k) => ((m >> k) & 1) === 1));
}

const show = (v: number) => (Object.is(v, -0) ? "-0" : String(v));

/** Check a batch result row by row against the scalar form. */
function expectRowsMatchScalar(r: Batch, rows: number, rowArgs: (i: number) => number[], scalar: (args: number[]) => Outcome, where: string): void {
  expect(r.values).toBeInstanceOf(Float64Array);
  expect(r.values.length, where).toBe(rows);
  expect(r.reasons.length, where).toBe(r.invalid.length);
  for (let k = 1; k < r.invalid.length; k++) expect(r.invalid[k]! > r.invalid[k - 1]!, where).toBe(true);
  let bad = 0;
  for (let i = 0; i < rows; i++) {
    const o = scalar(rowArgs(i));
    const w = `${where} row ${i} (${rowArgs(i).map(show).join(", ")})`;
    if ("value" in o) {
      // bit-identical to the scalar form, and not listed
      expect(Object.is(r.values[i], o.value), `${w}: ${r.values[i]} vs ${o.value}`).toBe(true);
      expect(r.invalid.includes(i), w).toBe(false);
    } else {
      expect(r.values[i], w).toBeNaN();
      expect(r.invalid[bad], w).toBe(i);
      expect(r.reasons[bad], w).toBe(o.error);
      bad++;
    }
  }
  expect(bad, where).toBe(r.invalid.length);
}

describe("batch: every pattern of arrays and shared values, 1–4 inputs, equals the scalar form row by row", () => {
  const checkSets: InputCheck[][] = [
    ["positive", "positive", "positive", "positive"],
    ["any", "nonNegative", "finite", "any"],
  ];
  for (let n = 1; n <= 4; n++) {
    for (const checks of checkSets) {
      it(`${n} input(s), checks ${checks.slice(0, n).join(", ")}: all ${2 ** n} patterns, SI and CGS, every path`, () => {
        const law = counted(n, checks);
        const all = batchPaths(law.make);
        const pats = patterns(n);
        let valid = 0;
        let invalid = 0;
        for (let p = 0; p < pats.length; p++) fc.assert(
          fc.property(
            fc.integer({ min: 0, max: 7 }),
            fc.array(fc.array(anyDouble, { minLength: 7, maxLength: 7 }), { minLength: n, maxLength: n }),
            fc.array(positiveDouble, { minLength: n, maxLength: n }),
            fc.constantFrom("SI" as const, "CGS" as const),
            (rows, columns, sharedValues, s) => {
              const pattern = pats[p]!;
              const arrays = columns.map((c) => Float64Array.from(c.slice(0, rows)));
              const copies = arrays.map((a) => Float64Array.from(a));
              const args = pattern.map((isArray, k) => (isArray ? arrays[k]! : sharedValues[k]!));
              // shared values may themselves be refused (e.g. 1e-320 cm of energy): then the batch must throw that message
              const sharedError = pattern
                .map((isArray, k) => (isArray ? null : all[0]!.scalar(s, pattern.map((_, j) => (j === k ? sharedValues[k]! : 1)))))
                .find((o) => o !== null && "error" in o && !o.error.includes(" for ")) as { error: string } | undefined;
              const nRows = pattern.some((x) => x) ? rows : 1;
              const rowArgs = (i: number) => pattern.map((isArray, k) => (isArray ? arrays[k]![i]! : sharedValues[k]!));
              for (const path of all) {
                const where = `${path.label} ${s} pattern ${pattern.map((x) => (x ? "A" : "v")).join("")}`;
                if (sharedError !== undefined) {
                  law.reset();
                  expect(() => path.batch(s, args), where).toThrow(new RangeError(sharedError.error));
                  expect(law.calls(), `${where}: no row computed`).toBe(0);
                  continue;
                }
                const r = path.batch(s, args);
                invalid += r.invalid.length;
                valid += r.values.length - r.invalid.length;
                expectRowsMatchScalar(r, nRows, rowArgs, (a) => path.scalar(s, a), where);
                // the caller's arrays are read, never written (also in CGS, where each row is scaled)
                arrays.forEach((a, k) => expect(a, where).toEqual(copies[k]));
              }
            },
          ),
          { numRuns: 40 },
        );
        // both kinds of row were exercised
        expect(valid).toBeGreaterThan(0);
        expect(invalid).toBeGreaterThan(0);
      });
    }
  }
});

describe("batch: the caller's errors throw before any row is computed", () => {
  it("an invalid shared value throws the scalar form's message, on every path and in both systems", () => {
    const law = counted(3, ["positive", "finite", "positive"]);
    for (const path of batchPaths(law.make)) {
      const xs = new Float64Array([1, 2, 3]);
      law.reset();
      expect(() => path.batch("SI", [xs, NaN, xs])).toThrow(new RangeError("b must be a finite number m^2 kg s^-2; got NaN"));
      expect(() => path.batch("CGS", [xs, 1, -2])).toThrow(new RangeError("c must be a finite number > 0 cm^-1; got -2"));
      // valid in cm, 0 in metres
      expect(() => path.batch("CGS", [1e-323, xs, xs])).toThrow(new RangeError("a = 1e-323 cm is outside the double range once converted to SI (0 m)"));
      expect(law.calls()).toBe(0);
      // the same shapes with valid shared values compute every row once
      expect(path.batch("CGS", [xs, 1e7, xs]).invalid).toEqual([]);
      expect(law.calls()).toBe(3);
    }
  });

  it("arrays of different lengths throw naming both inputs, before any row is computed", () => {
    const law = counted(4, ["positive", "positive", "positive", "positive"]);
    for (const path of batchPaths(law.make)) {
      law.reset();
      const three = new Float64Array([1, 2, 3]);
      const two = new Float64Array([1, 2]);
      expect(() => path.batch("SI", [three, two, 1, 1])).toThrow(new RangeError("b must have the same length as a (3); got 2"));
      expect(() => path.batch("CGS", [1, three, 1, two])).toThrow(new RangeError("d must have the same length as b (3); got 2"));
      // a bad shared value and a length mismatch: the length is reported first
      expect(() => path.batch("SI", [three, -1, 1, two])).toThrow(new RangeError("d must have the same length as a (3); got 2"));
      expect(law.calls()).toBe(0);
    }
  });

  it("batchLength and BatchLog on their own", () => {
    expect(batchLength(["a", "b"], [1, 2])).toBe(1);
    expect(batchLength(["a", "b"], [new Float64Array(0), 2])).toBe(0);
    expect(batchLength(["a", "b"], [[1, 2], new Float64Array(2)])).toBe(2);
    expect(() => batchLength(["a", "b"], [[1], [1, 2]])).toThrow(new RangeError("b must have the same length as a (1); got 2"));
    const log = new BatchLog();
    log.add(1, "one");
    log.add(4, "four");
    const v = new Float64Array(5);
    expect(log.result(v)).toEqual({ values: v, invalid: [1, 4], reasons: ["one", "four"] });
    expect(log.result(v).values).toBe(v);
  });
});

describe("batch: edge shapes", () => {
  it("empty arrays give an empty result; all-shared values give one row; a 0-input law gives one row", () => {
    const law = counted(2, ["positive", "positive"]);
    for (const path of batchPaths(law.make)) {
      expect(path.batch("SI", [new Float64Array(0), 2])).toEqual({ values: new Float64Array(0), invalid: [], reasons: [] });
      const one = path.batch("CGS", [3, 4]);
      expect(one.values.length).toBe(1);
      expect(path.scalar("CGS", [3, 4])).toEqual({ value: one.values[0] });
    }
    const constant = defineLaw({ name: "E0", inputs: [], result: kinds.energy, kernel: () => 2 });
    expect(Array.from(constant.batch(SI).values)).toEqual([2]);
    expect(Array.from(constant.batch(CGS).values)).toEqual([2e7]);
    const overflowing = defineLaw({ name: "E0", inputs: [], result: kinds.energy, kernel: () => 1e305 });
    expect(overflowing.batch(CGS)).toEqual({ values: new Float64Array([NaN]), invalid: [0], reasons: ["E0 overflows the double range in cm^2 g s^-2 for "] });
  });

  it("rows whose result overflows only in CGS, or has no value, are listed with the scalar message naming that row's arguments", () => {
    const law = defineLaw({
      name: "E",
      inputs: [lawInput("x", kinds.length), lawInput("mode", kinds.dimensionless, { check: "finite" })],
      result: kinds.energy,
      kernel: (x, mode) => (mode === 2 ? NaN : mode === 4 ? 1e302 : x),
    });
    const r = law.batch(CGS, new Float64Array([100, 200, 300, -1]) as never, new Float64Array([0, 4, 2, 0]));
    expect(r.invalid).toEqual([1, 2, 3]);
    expect(r.reasons).toEqual([
      "E overflows the double range in cm^2 g s^-2 for x=200 cm, mode=4",
      "E has no finite value for x=300 cm, mode=2",
      "x must be a finite number > 0 cm; got -1",
    ]);
    expect(r.values[0]).toBe(law(CGS, 100 as never, 0));
    expect(law.batch(SI, new Float64Array([2]) as never, 4).values[0]).toBe(1e302);
  });
});
