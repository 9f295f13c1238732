/**
 * The result of a typed law: its name and kind, and how a kernel's SI value
 * moves into the caller's system. A result that is not finite there (a true
 * value beyond the double range, possibly only after the ×10ᵏ into CGS) is
 * refused with a `RangeError` naming the caller's arguments in their units.
 *
 * @module
 */
import type { Dimension } from "../quantity/dimension";
import type { Kind } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import type { UnitSystem } from "../quantity/system";
import type { LawInput } from "./input";
import { exactScale, type ExactScale } from "./scale";
import { show } from "./text";

/** The declared result of a law (see {@link lawOutput}). */
export class LawOutput<D extends Dimension = Dimension> {
  /** What the law computes, as messages print it (`"B_λ"`, `"luminosity"`). */
  readonly name: string;
  /** Kind of the result. */
  readonly kind: Kind<D>;
  /** @internal */
  readonly cgs: ExactScale;

  /** Use {@link lawOutput}. */
  constructor(name: string, kind: Kind<D>) {
    this.name = name;
    this.kind = kind;
    const d = kind.dimension;
    this.cgs = exactScale(2 * d.length + 3 * d.mass);
  }

  /** An SI value in the caller's system, or NaN when it is not finite there. */
  fromSI(sys: UnitSystem<SystemName>, valueSI: number): number {
    if (sys.name === "SI") return valueSI - valueSI === 0 ? valueSI : NaN;
    const v = this.cgs.apply(valueSI);
    return v - v === 0 ? v : NaN;
  }

  /**
   * The message for a kernel value `valueSI` that {@link LawOutput.fromSI}
   * refused, naming the arguments (`inputs[i]` = `values[i]`) in the caller's units.
   */
  reason(sys: UnitSystem<SystemName>, valueSI: number, inputs: readonly LawInput[], values: readonly number[]): string {
    const args = inputs.map((input, i) => `${input.name}=${show(values[i] as number)}${input.unitIn(sys)}`).join(", ");
    if (valueSI !== valueSI) return `${this.name} has no finite value for ${args}`;
    const unit = sys.coherentUnit(this.kind.dimension);
    return `${this.name} overflows the double range${unit === "" ? "" : ` in ${unit}`} for ${args}`;
  }
}

/**
 * Declare the result of a law: what it is called in messages and its kind.
 *
 * @example
 * ```ts
 * import { kinds, lawOutput } from "starlume";
 * const luminosity = lawOutput("luminosity", kinds.power);
 * ```
 */
/* @__NO_SIDE_EFFECTS__ */
export function lawOutput<D extends Dimension>(name: string, kind: Kind<D>): LawOutput<D> {
  return new LawOutput(name, kind);
}
