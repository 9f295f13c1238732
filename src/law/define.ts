/**
 * The law toolkit: from a plain-number SI kernel and a declaration of its
 * inputs and result, a typed function that takes the system first and works
 * in SI and CGS, and its batch form over typed arrays. Every law in starlume
 * is built with it, and so can yours.
 *
 * What a call does, in order: each input is checked once, in the caller's
 * unit (a `RangeError` names the parameter, the value, the unit and the
 * allowed range); in CGS it is moved to SI by one exact power of ten; the
 * kernel runs; its value is moved into the caller's system and refused with a
 * `RangeError` naming the arguments when it is not finite there. The scales
 * are fixed when the law is defined; nothing is allocated on the success path.
 *
 * @module
 */
import type { Dimension, NoDimension } from "../quantity/dimension";
import type { Kind } from "../quantity/aliases";
import type { NotAirWavelength, NotAirWavelengthArray } from "../quantity/medium";
import type { Pure, Quantity, QuantityArray, SystemName } from "../quantity/quantity";
import { CGS, SI, type UnitSystem } from "../quantity/system";
import { compileBatch, compileScalar } from "./compile";
import { BatchLog, batchLength, type BatchResult } from "./batch";
import { LawInput } from "./input";
import { LawOutput } from "./output";

/** A typed parameter for input `I` in system `S`. */
export type InputValue<I, S extends SystemName> =
  I extends LawInput<infer D, infer V>
    ? [V] extends [true]
      ? NotAirWavelength<S>
      : [D] extends [NoDimension]
        ? Pure
        : Quantity<D, S>
    : never;

/** A typed array parameter for input `I` in system `S`. */
export type InputArray<I, S extends SystemName> =
  I extends LawInput<infer D, infer V>
    ? [V] extends [true]
      ? NotAirWavelengthArray<S>
      : [D] extends [NoDimension]
        ? Float64Array
        : QuantityArray<D, S>
    : never;

/** The typed parameters of a law with inputs `A`, in system `S`. */
export type LawArgs<A extends readonly LawInput[], S extends SystemName> = {
  [K in keyof A]: InputValue<A[K], S>;
};

/** The parameters of a law's batch form: each a typed value (shared by every row) or a typed array (one per row). */
export type LawBatchArgs<A extends readonly LawInput[], S extends SystemName> = {
  [K in keyof A]: InputValue<A[K], S> | InputArray<A[K], S>;
};

/** A plain-number SI kernel: one number per input, in SI, to the SI result. */
export type Kernel = (...valuesSI: number[]) => number;

/**
 * A typed law (see {@link defineLaw}): call it with the system first, or use
 * its batch form.
 */
export interface Law<A extends readonly LawInput[], R extends Dimension> {
  /** The result in `sys`, from typed inputs in `sys` (system-free kinds fit either system). */
  <S extends SystemName>(sys: UnitSystem<S>, ...args: LawArgs<A, NoInfer<S>>): Quantity<R, S>;
  /**
   * The law over typed arrays (a value given instead of an array is shared by
   * every row): never throws part-way, see {@link BatchResult}.
   */
  batch<S extends SystemName>(sys: UnitSystem<S>, ...args: LawBatchArgs<A, NoInfer<S>>): BatchResult<QuantityArray<R, S>>;
  /** The declared inputs. */
  readonly inputs: A;
  /** The declared result. */
  readonly output: LawOutput<R>;
  /** The plain-number SI kernel (unchecked: the law checks before calling it). */
  readonly kernel: Kernel;
}

/** The declaration {@link defineLaw} takes. */
export interface LawDeclaration<A extends readonly LawInput[], R extends Dimension> {
  /** What the law computes, for messages (`"B_λ"`, `"luminosity"`). */
  readonly name: string;
  /** Inputs in parameter order, from {@link lawInput}. */
  readonly inputs: A;
  /** Kind of the result. */
  readonly result: Kind<R>;
  /**
   * The SI kernel: receives each input checked and in SI, in order; returns
   * the SI result. It may return ±Infinity or NaN to say the result is not
   * representable: the law turns that into a `RangeError` (or an invalid
   * batch row) naming the arguments in the caller's units.
   */
  readonly kernel: (...valuesSI: { [K in keyof A]: number }) => number;
}

/**
 * Define a typed law from a plain-number SI kernel.
 *
 * @param declaration - name, inputs ({@link lawInput}), result kind and kernel
 * @returns the typed law, with `.batch` for typed arrays
 * @throws RangeError (from the law, not from `defineLaw`) naming the input, value and unit
 * @example
 * ```ts
 * import { SI, CGS, defineLaw, kinds, lawInput, units } from "starlume";
 * const SIGMA = 5.670374419e-8; // W m^-2 K^-4 (CODATA 2018)
 * const luminosity = defineLaw({
 *   name: "luminosity",
 *   inputs: [lawInput("radius", kinds.length), lawInput("temperature", kinds.temperature)],
 *   result: kinds.power,
 *   kernel: (r, t) => 4 * Math.PI * r * r * SIGMA * (t * t) * (t * t),
 * });
 * const l = luminosity(SI, SI.of(1, units.Rsun), SI.of(5772, units.K));
 * SI.valueIn(l, units.Lsun); // ≈ 1.0
 * const lc = luminosity(CGS, CGS.of(1, units.Rsun), SI.of(5772, units.K)); // erg s^-1
 * ```
 */
/* @__NO_SIDE_EFFECTS__ */
export function defineLaw<const A extends readonly LawInput[], R extends Dimension>(declaration: LawDeclaration<A, R>): Law<A, R> {
  const inputs = declaration.inputs;
  const output = new LawOutput(declaration.name, declaration.result);
  const kernel = declaration.kernel as Kernel;
  for (const input of inputs) {
    if (!(input instanceof LawInput)) throw new TypeError(`law ${declaration.name}: every input must come from lawInput()`);
  }
  const generic = scalarLaw(inputs, output, kernel);
  const law = (compileScalar(declaration.name, inputs, output, kernel, generic, SI, CGS) ?? generic) as Law<A, R> & { batch: unknown; inputs: A; output: LawOutput<R>; kernel: Kernel };
  Object.defineProperties(law, {
    batch: { value: batchLaw(declaration.name, inputs, output, kernel) },
    inputs: { value: inputs },
    output: { value: output },
    kernel: { value: kernel },
  });
  return law;
}

type Sys = UnitSystem<SystemName>;

/** Throw the output's RangeError (kept out of line so that the success path stays small). */
function refuse(sys: Sys, output: LawOutput, valueSI: number, inputs: readonly LawInput[], values: number[]): never {
  throw new RangeError(output.reason(sys, valueSI, inputs, values));
}

function scalarLaw(inputs: readonly LawInput[], output: LawOutput, kernel: Kernel): (sys: Sys, ...args: number[]) => number {
  // One closure per arity, so that a call allocates nothing.
  switch (inputs.length) {
    case 0:
      return (sys) => {
        const v = kernel();
        const r = output.fromSI(sys, v);
        return r === r ? r : refuse(sys, output, v, inputs, []);
      };
    case 1: {
      const i0 = inputs[0] as LawInput;
      return (sys, a) => {
        if (sys === SI) {
          const w = kernel(i0.si(a as number));
          if (w - w === 0) return w;
        }
        const v = kernel(i0.toSI(sys, a as number));
        const r = output.fromSI(sys, v);
        return r === r ? r : refuse(sys, output, v, inputs, [a as number]);
      };
    }
    case 2: {
      const i0 = inputs[0] as LawInput;
      const i1 = inputs[1] as LawInput;
      return (sys, a, b) => {
        if (sys === SI) {
          const w = kernel(i0.si(a as number), i1.si(b as number));
          if (w - w === 0) return w;
        }
        const v = kernel(i0.toSI(sys, a as number), i1.toSI(sys, b as number));
        const r = output.fromSI(sys, v);
        return r === r ? r : refuse(sys, output, v, inputs, [a as number, b as number]);
      };
    }
    case 3: {
      const i0 = inputs[0] as LawInput;
      const i1 = inputs[1] as LawInput;
      const i2 = inputs[2] as LawInput;
      return (sys, a, b, c) => {
        if (sys === SI) {
          const w = kernel(i0.si(a as number), i1.si(b as number), i2.si(c as number));
          if (w - w === 0) return w;
        }
        const v = kernel(i0.toSI(sys, a as number), i1.toSI(sys, b as number), i2.toSI(sys, c as number));
        const r = output.fromSI(sys, v);
        return r === r ? r : refuse(sys, output, v, inputs, [a as number, b as number, c as number]);
      };
    }
    default: {
      const n = inputs.length;
      return (sys, ...args) => {
        const si = new Array<number>(n);
        for (let k = 0; k < n; k++) si[k] = (inputs[k] as LawInput).toSI(sys, args[k] as number);
        const v = kernel(...si);
        const r = output.fromSI(sys, v);
        return r === r ? r : refuse(sys, output, v, inputs, args);
      };
    }
  }
}

/** A compiled row loop (see `compileBatch`). */
type RowLoop = (out: Float64Array, arrays: readonly (Float64Array | null)[], shared: Float64Array, bad: (i: number) => void) => void;

function batchLaw(
  name: string,
  inputs: readonly LawInput[],
  output: LawOutput,
  kernel: Kernel,
): (sys: Sys, ...args: (number | Float64Array)[]) => BatchResult<Float64Array> {
  const names = inputs.map((i) => i.name);
  const n = inputs.length;
  // Compiled row loops, one per system and pattern of array / shared inputs, built on first use.
  const loops = new Map<string, RowLoop | null>();
  return (sys, ...args) => {
    const rows = batchLength(names, args);
    // Shared (scalar) arguments are the caller's error: checked before any row is written.
    const shared = new Float64Array(n);
    const arrays: (Float64Array | null)[] = [];
    let key = sys === SI ? "S" : sys === CGS ? "C" : "";
    for (let k = 0; k < n; k++) {
      const a = args[k];
      if (typeof a === "number") {
        shared[k] = (inputs[k] as LawInput).toSI(sys, a);
        arrays.push(null);
        key += "0";
      } else {
        arrays.push(a as Float64Array);
        key += "1";
      }
    }
    const values = new Float64Array(rows);
    const log = new BatchLog();
    let loop = key[0] === "S" || key[0] === "C" ? loops.get(key) : null;
    if (loop === undefined) {
      loop = compileBatch(name, inputs, output, kernel, arrays.map((a) => a !== null), key[0] === "C") as RowLoop | null;
      loops.set(key, loop);
    }
    if (loop !== null) {
      // the generic path below writes the row's NaN and reason
      const raw = new Array<number>(n);
      loop(values, arrays, shared, (i) => {
        for (let k = 0; k < n; k++) raw[k] = arrays[k] === null ? (args[k] as number) : ((arrays[k] as Float64Array)[i] as number);
        values[i] = NaN;
        log.add(i, rowReason(sys, inputs, output, kernel, raw));
      });
    } else if (n === 1 && arrays[0] !== null) {
      batch1(sys, inputs[0] as LawInput, arrays[0] as Float64Array, output, kernel, values, log);
    } else if (n === 2 && arrays[0] !== null && arrays[1] === null) {
      batch2a(sys, inputs, arrays[0] as Float64Array, shared[1] as number, args[1] as number, output, kernel, values, log);
    } else {
      batchN(sys, inputs, arrays, shared, args, output, kernel, values, log);
    }
    return log.result(values);
  };
}

/** Why one row (caller's values `raw`) has no value: its first failing input, or its result. */
function rowReason(sys: Sys, inputs: readonly LawInput[], output: LawOutput, kernel: Kernel, raw: readonly number[]): string {
  const si = new Array<number>(raw.length);
  for (let k = 0; k < raw.length; k++) {
    const input = inputs[k] as LawInput;
    const a = raw[k] as number;
    const x = input.rowToSI(sys, a);
    if (x !== x && !(a !== a && input.nanPasses)) return input.reason(sys, a);
    si[k] = x;
  }
  return output.reason(sys, kernel(...si), inputs, raw);
}

/** One array input. */
function batch1(sys: Sys, i0: LawInput, xs: Float64Array, output: LawOutput, kernel: Kernel, values: Float64Array, log: BatchLog): void {
  for (let i = 0; i < xs.length; i++) {
    const a = xs[i] as number;
    const x = i0.rowToSI(sys, a);
    if (x !== x && !(a !== a && i0.nanPasses)) {
      values[i] = NaN;
      log.add(i, i0.reason(sys, a));
      continue;
    }
    const v = kernel(x);
    const r = output.fromSI(sys, v);
    values[i] = r;
    if (r !== r) log.add(i, output.reason(sys, v, [i0], [a]));
  }
}

/** First input an array, second shared (the common "grid at one temperature" shape). */
function batch2a(
  sys: Sys,
  inputs: readonly LawInput[],
  xs: Float64Array,
  ySI: number,
  y: number,
  output: LawOutput,
  kernel: Kernel,
  values: Float64Array,
  log: BatchLog,
): void {
  const i0 = inputs[0] as LawInput;
  for (let i = 0; i < xs.length; i++) {
    const a = xs[i] as number;
    const x = i0.rowToSI(sys, a);
    if (x !== x && !(a !== a && i0.nanPasses)) {
      values[i] = NaN;
      log.add(i, i0.reason(sys, a));
      continue;
    }
    const v = kernel(x, ySI);
    const r = output.fromSI(sys, v);
    values[i] = r;
    if (r !== r) log.add(i, output.reason(sys, v, inputs, [a, y]));
  }
}

/** Any mix of arrays and shared values. */
function batchN(
  sys: Sys,
  inputs: readonly LawInput[],
  arrays: readonly (Float64Array | null)[],
  shared: Float64Array,
  args: readonly (number | Float64Array)[],
  output: LawOutput,
  kernel: Kernel,
  values: Float64Array,
  log: BatchLog,
): void {
  const n = inputs.length;
  const si = new Array<number>(n);
  const raw = new Array<number>(n);
  rows: for (let i = 0; i < values.length; i++) {
    for (let k = 0; k < n; k++) {
      const arr = arrays[k];
      if (arr === null || arr === undefined) {
        si[k] = shared[k] as number;
        raw[k] = args[k] as number;
        continue;
      }
      const input = inputs[k] as LawInput;
      const a = arr[i] as number;
      const x = input.rowToSI(sys, a);
      if (x !== x && !(a !== a && input.nanPasses)) {
        values[i] = NaN;
        log.add(i, input.reason(sys, a));
        continue rows;
      }
      si[k] = x;
      raw[k] = a;
    }
    const v = kernel(...si);
    const r = output.fromSI(sys, v);
    values[i] = r;
    if (r !== r) log.add(i, output.reason(sys, v, inputs, raw));
  }
}
