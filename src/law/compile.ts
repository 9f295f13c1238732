/**
 * Specialized code for each law. A law's checks and scales are fixed when it
 * is defined, so its success path can be written out once with them as
 * literals: in SI the checks and the kernel call, in CGS the same with one
 * exact multiply or divide per input and for the result. Each law gets a
 * function of its own, so the JavaScript engine sees one kernel at each call
 * site and can inline it; a generic closure shared by every law would see
 * them all and could not (measured: 2–4× slower per call).
 *
 * Anything off the success path (an input that fails its check, a result out
 * of range, a system object other than `SI` and `CGS`) goes to the generic
 * closure, which writes the message. Where the host forbids generating code
 * (a Content-Security-Policy without 'unsafe-eval'), the generic closures are
 * used throughout: the same results, only slower.
 *
 * @internal
 */
import type { LawInput } from "./input";
import type { LawOutput } from "./output";
import type { ExactScale } from "./scale";

/** Whether this host lets us build functions from text (decided once). */
const hostCompiles: boolean = (() => {
  try {
    return new Function("return 1")() === 1;
  } catch {
    return false;
  }
})();

/** Whether laws defined (and batch patterns first used) from now on get generated code. */
let canCompile = hostCompiles;

/**
 * Tests only: turn generated code off (`false`) or back on (`true`, where the
 * host allows it) for laws defined, and batch patterns first used, while it
 * is off, so that the generic closures can be checked against the generated
 * code. Returns the previous setting. Not exported from the package.
 *
 * @internal
 */
export function setCodegenForTests(enabled: boolean): boolean {
  const previous = canCompile;
  canCompile = enabled && hostCompiles;
  return previous;
}

/** A number as a JavaScript literal that reads back to the same double. */
function literal(x: number): string {
  if (x === Infinity) return "Infinity";
  if (x === -Infinity) return "-Infinity";
  return Object.is(x, -0) ? "-0" : `(${String(x)})`;
}

/** `x × 10ⁿ` as source text for the scale `s` applied to the expression `x`. */
function scaled(x: string, s: ExactScale): string {
  if (s.exp10 === 0) return x;
  return s.div === 1 ? `${x} * ${literal(s.mul)}` : `${x} / ${literal(s.div)}`;
}

/** The check of an input on the caller's value `a`. */
function callerCheck(input: LawInput, a: string): string {
  switch (input.check) {
    case "positive":
      return `(${a} > 0 && ${a} < Infinity)`;
    case "nonNegative":
      return `(${a} >= 0 && ${a} < Infinity)`;
    case "finite":
      return `(${a} - ${a} === 0)`;
    default:
      return "true";
  }
}

/** The check on the SI value `x` after conversion from CGS (the double range), plus the SI range. */
function siCheck(input: LawInput, x: string, converted: boolean): string {
  const parts: string[] = [];
  if (converted && input.cgs.exp10 !== 0) {
    if (input.check === "positive") parts.push(`(${x} > 0 && ${x} < Infinity)`);
    else if (input.check === "nonNegative") parts.push(`(${x} < Infinity)`);
    else if (input.check === "finite") parts.push(`(${x} - ${x} === 0)`);
  }
  if (input.min !== -Infinity) parts.push(`(${x} >= ${literal(input.min)})`);
  if (input.max !== Infinity) parts.push(`(${x} <= ${literal(input.max)})`);
  return parts.length === 0 ? "true" : parts.join(" && ");
}

type Fn = (...args: never[]) => unknown;

/**
 * The scalar law `(sys, a0, a1, …) => result` specialized for its inputs, or
 * `null` where code cannot be generated. `slow` is the generic closure.
 */
export function compileScalar(
  name: string,
  inputs: readonly LawInput[],
  output: LawOutput,
  kernel: Fn,
  slow: Fn,
  SI: object,
  CGS: object,
): Fn | null {
  if (!canCompile) return null;
  const args = inputs.map((_, k) => `a${k}`);
  const si = args.join(", ");
  const siChecks = inputs.map((input, k) => `${callerCheck(input, args[k] as string)} && ${siCheck(input, args[k] as string, false)}`).join(" && ");
  const cgsConv = inputs.map((input, k) => `const x${k} = ${scaled(args[k] as string, input.cgs)};`).join(" ");
  const cgsChecks = inputs.map((input, k) => `${callerCheck(input, args[k] as string)} && ${siCheck(input, `x${k}`, true)}`).join(" && ");
  const cgsArgs = inputs.map((_, k) => `x${k}`).join(", ");
  const source = `"use strict";
return function ${safeName(name)}(sys${args.length > 0 ? ", " : ""}${si}) {
  if (sys === SI) {
    if (${siChecks || "true"}) {
      const w = kernel(${si});
      if (w - w === 0) return w;
    }
  } else if (sys === CGS) {
    ${cgsConv}
    if (${cgsChecks || "true"}) {
      const w = ${scaled(`kernel(${cgsArgs})`, output.cgs)};
      if (w - w === 0) return w;
    }
  }
  return slow(sys${args.length > 0 ? ", " : ""}${si});
};`;
  return new Function("kernel", "slow", "SI", "CGS", source)(kernel, slow, SI, CGS) as Fn;
}

/**
 * The row loop of a batch, specialized for which inputs are arrays (`arrays[k]`
 * true) and for the system; `null` where code cannot be generated. The
 * generated function is `(out, inputs, shared, bad) => void`: `inputs[k]` is
 * the array of input k (or unused), `shared[k]` the SI value of a shared input,
 * and `bad(i)` is called for each row that fails (it writes NaN and the reason).
 */
export function compileBatch(
  name: string,
  inputs: readonly LawInput[],
  output: LawOutput,
  kernel: Fn,
  arrays: readonly boolean[],
  cgs: boolean,
): Fn | null {
  if (!canCompile) return null;
  const lines: string[] = [];
  const checks: string[] = [];
  inputs.forEach((input, k) => {
    if (!arrays[k]) {
      lines.push(`const x${k} = s${k};`);
      return;
    }
    lines.push(`const a${k} = A${k}[i];`);
    if (cgs) {
      lines.push(`const x${k} = ${scaled(`a${k}`, input.cgs)};`);
      checks.push(`${callerCheck(input, `a${k}`)} && ${siCheck(input, `x${k}`, true)}`);
    } else {
      lines.push(`const x${k} = a${k};`);
      checks.push(`${callerCheck(input, `a${k}`)} && ${siCheck(input, `x${k}`, false)}`);
    }
  });
  const head = inputs
    .map((_, k) => (arrays[k] ? `const A${k} = inputs[${k}];` : `const s${k} = shared[${k}];`))
    .join(" ");
  const call = `kernel(${inputs.map((_, k) => `x${k}`).join(", ")})`;
  const source = `"use strict";
return function ${safeName(name)}Rows(out, inputs, shared, bad) {
  ${head}
  for (let i = 0; i < out.length; i++) {
    ${lines.join(" ")}
    if (${checks.join(" && ") || "true"}) {
      const w = ${cgs ? scaled(call, output.cgs) : call};
      if (w - w === 0) { out[i] = w; continue; }
    }
    bad(i);
  }
};`;
  return new Function("kernel", source)(kernel) as Fn;
}

/** A function name made of identifier characters only (for stack traces). */
function safeName(name: string): string {
  const s = name.replace(/[^A-Za-z0-9_$]/g, "_");
  return /^[A-Za-z_$]/.test(s) ? s : `law_${s}`;
}
