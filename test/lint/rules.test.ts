/**
 * The lint rules against valid and invalid code, type-checked against the
 * library's own types (the fixture project imports `src/index.ts`).
 */
import { RuleTester } from "@typescript-eslint/rule-tester";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, it } from "vitest";
import plugin from "../../src/lint/index";

RuleTester.afterAll = afterAll;
RuleTester.describe = describe;
// the first case builds the TypeScript program over the library's sources: allow it time
RuleTester.it = (name: string, fn: () => void) => it(name, fn, 120_000);
RuleTester.itOnly = (name: string, fn: () => void) => it.only(name, fn, 120_000);

const fixture = path.join(path.dirname(fileURLToPath(import.meta.url)), "fixture");
const tester = new RuleTester({
  languageOptions: { parserOptions: { project: "./tsconfig.json", tsconfigRootDir: fixture } },
});

const head = `import { CGS, SI, units, add, lt, constants, kinds, planckRadianceWavelength, type Length, type Temperature, type Time, type Power, type Dimensionless, type SystemName, type AnyQuantity } from "./starlume";
declare const rSI: Length<"SI">;
declare const r2SI: Length<"SI">;
declare const rCGS: Length<"CGS">;
declare const t: Temperature;
declare const t2: Temperature;
declare const dt: Time;
declare const lSI: Power<"SI">;
declare const ratio: Dimensionless;
declare const x: number;
declare const maybe: Length<"SI"> | undefined;
`;
const code = (body: string) => `${head}${body}\n`;

tester.run("mixed-quantities", plugin.rules["mixed-quantities"], {
  valid: [
    code("const a = rSI + r2SI;"),
    code("const a = rSI < r2SI;"),
    code("const a = t - t2;"),
    code("const a = rSI * r2SI;"),
    code("const a = rSI * t;"), // system-free operand
    code("const a = rSI / dt;"),
    code("const a = rSI + x;"), // a plain number is not a quantity
    code("const a = x < rSI;"),
    code("let a = rSI; a += r2SI;"),
    code("const a = ratio + 1;"),
    code("const a = add(rSI, r2SI);"),
    code("const a = lt(t, t2);"),
    code("const a = t === t2;"),
    code("const a = x + x;"),
    code("const a = SI.of(1, units.m) + SI.of(2, units.km);"),
    code("const a = CGS.of(1, units.cm) - CGS.of(2, units.km);"),
    // generic code: system tags and exponents that are type parameters are not judged
    code("function f<S extends SystemName>(a: Length<S>, b: Length<S>) { return a + b; }"),
    code("function f<S extends SystemName>(a: Length<S>, b: Length<NoInfer<S>>) { return a < b; }"),
    code("function f<Q extends AnyQuantity>(a: Q, b: Q) { return a - b; }"),
  ],
  invalid: [
    { code: code("const a = rSI + rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("function f<S extends SystemName>(a: Length<S>, b: Time) { return a + b; }"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = rSI < rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("const a = rSI * rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("const a = rSI / rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("const a = rSI === rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("let a = rSI; a += rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("const a = rSI < t;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = rSI + t;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = t - dt;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = lSI > rSI;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = t >= ratio;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = rSI !== dt;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = rSI % dt;"), errors: [{ messageId: "dimension" }] },
    { code: code("let a = t; a -= dt;"), errors: [{ messageId: "dimension" }] },
    { code: code("const a = SI.of(1, units.m) + CGS.of(1, units.cm);"), errors: [{ messageId: "system" }] },
    { code: code("const a = maybe! + rCGS;"), errors: [{ messageId: "system" }] },
    { code: code("const a = constants.sigma.si + constants.sigma.cgs;"), errors: [{ messageId: "system" }] },
    { code: code("const b = planckRadianceWavelength(SI, rSI, t); const a = b > lSI;"), errors: [{ messageId: "dimension" }] },
    {
      code: code("const a = rSI + dt;"),
      errors: [{ messageId: "dimension", data: { op: "+", left: 'Length<"SI">', right: "Time", leftDim: "L", rightDim: "T", diff: "length 1 vs 0, time 0 vs 1" } }],
    },
  ],
});

tester.run("quantity-operators", plugin.rules["quantity-operators"], {
  valid: [code("const a = x + x;"), code("const a = add(rSI, r2SI);"), code("const a = lt(t, t2);"), code("let a = x; a *= 2;"), code("const a = rSI;")],
  invalid: [
    { code: code("const a = rSI + r2SI;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = rSI * 2;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = 2 * rSI;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = t < t2;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = t === t2;"), errors: [{ messageId: "operator" }] },
    { code: code("let a = rSI; a += r2SI;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = rSI / dt;"), errors: [{ messageId: "operator" }] },
    { code: code("const a = ratio - 1;"), errors: [{ messageId: "operator" }] },
  ],
});

tester.run("brand-drop", plugin.rules["brand-drop"], {
  valid: [
    code("const a = SI.valueIn(rSI, units.km);"),
    code("const a = SI.format(rSI, units.km);"),
    code("const a = Number(x);"),
    code("const a = `${x} m`;"),
    code("const a = Math.sqrt(x);"),
    code("const a = x.toFixed(2);"),
    code("const a = String(x);"),
  ],
  invalid: [
    { code: code("const a = Number(rSI);"), errors: [{ messageId: "number" }] },
    { code: code("const a = +t;"), errors: [{ messageId: "number" }] },
    { code: code("const a = `${rSI} m`;"), errors: [{ messageId: "text" }] },
    { code: code("const a = String(lSI);"), errors: [{ messageId: "text" }] },
    { code: code("const a = rSI.toFixed(3);"), errors: [{ messageId: "text" }] },
    { code: code("const a = t.toString();"), errors: [{ messageId: "text" }] },
    { code: code("const a = Math.sqrt(lSI);"), errors: [{ messageId: "math" }] },
    { code: code("const a = Math.max(rSI, r2SI);"), errors: [{ messageId: "math" }] },
    { code: code("const a = Math.abs(t);"), errors: [{ messageId: "math" }] },
    { code: code("const a = Math.log(t);"), errors: [{ messageId: "mathRead" }] },
    { code: code("const a = Math.exp(ratio);"), errors: [{ messageId: "mathRead" }] },
  ],
});
