/**
 * One input of a typed law: its name, its kind (dimension), the check it must
 * pass in the caller's unit, and how it moves to SI in each system. Scales
 * are decided once, when the input is declared; a call only compares and, in
 * CGS, multiplies or divides by one exact power of ten.
 *
 * @module
 */
import type { Dimension } from "../quantity/dimension";
import type { Kind } from "../quantity/aliases";
import type { SystemName } from "../quantity/quantity";
import { SI, type UnitSystem } from "../quantity/system";
import { exactScale, type ExactScale } from "./scale";
import { show, unitSuffix } from "./text";

/**
 * What an input must be, checked in the caller's unit before the kernel runs:
 * `"positive"` (finite and > 0, the default), `"nonNegative"` (finite and
 * ≥ 0), `"finite"` (any sign) or `"any"` (no check: NaN and ±Infinity pass,
 * unless `min` or `max` is given: a range refuses what lies outside it, NaN included).
 */
export type InputCheck = "positive" | "nonNegative" | "finite" | "any";

/** Options of {@link lawInput}. */
export interface LawInputOptions<V extends boolean = boolean> {
  /** The check (default `"positive"`). */
  readonly check?: InputCheck;
  /** Smallest allowed value, in SI (inclusive). Messages show it in the caller's unit. */
  readonly min?: number;
  /** Largest allowed value, in SI (inclusive). */
  readonly max?: number;
  /** Why the range is what it is, shown in the message (e.g. `"CCM 1989 fit range"`). */
  readonly rangeNote?: string;
  /**
   * `true` for a wavelength the law needs in vacuum: the typed parameter is
   * then a `NotAirWavelength`, so a wavelength branded as measured in air
   * does not compile (compile time only; nothing is checked at run time).
   */
  readonly vacuum?: V;
  /**
   * Unit text messages print for a dimensionless input (`"mag"` for a
   * magnitude), which has no coherent unit to print. Not allowed on a
   * dimensioned input: that one always prints the caller's coherent unit.
   */
  readonly unit?: string;
}

const POSITIVE = 0;
const NON_NEGATIVE = 1;
const FINITE = 2;
const ANY = 3;
const CODES: Record<InputCheck, number> = { positive: POSITIVE, nonNegative: NON_NEGATIVE, finite: FINITE, any: ANY };
const WORDS = ["a finite number > 0", "a finite number >= 0", "a finite number", "a number"];

/**
 * A declared input of a law (see {@link lawInput}). `D` is its dimension and
 * `V` whether it must be a vacuum wavelength.
 */
export class LawInput<D extends Dimension = Dimension, V extends boolean = boolean> {
  /** Parameter name, as messages print it. */
  readonly name: string;
  /** Kind of quantity (dimension and readable name). */
  readonly kind: Kind<D>;
  /** The check applied in the caller's unit. */
  readonly check: InputCheck;
  /** Whether the parameter is a vacuum-or-unmarked wavelength (type level). */
  readonly vacuum: V;
  /** Smallest allowed SI value (−Infinity when unbounded). */
  readonly min: number;
  /** Largest allowed SI value (+Infinity when unbounded). */
  readonly max: number;
  /** Note printed with a range violation. */
  readonly rangeNote: string;
  /** Unit text of a dimensionless input (`"mag"`), or `""`. */
  readonly unit: string;
  private readonly code: number;
  private readonly ranged: boolean;
  /**
   * Whether a NaN passes (check `"any"` with no range): such a NaN goes to
   * the kernel as it is. A range is a check, so a ranged input refuses NaN.
   *
   * @internal
   */
  readonly nanPasses: boolean;
  /** CGS → SI scale of this input (SI needs none). */
  /** @internal */
  readonly cgs: ExactScale;

  /** Use {@link lawInput}. */
  constructor(name: string, kind: Kind<D>, options: LawInputOptions<V> = {}) {
    this.name = name;
    this.kind = kind;
    this.check = options.check ?? "positive";
    this.code = CODES[this.check];
    if (this.code === undefined) throw new RangeError(`input ${name}: check must be one of ${Object.keys(CODES).join(", ")}; got ${String(options.check)}`);
    this.vacuum = (options.vacuum ?? false) as V;
    this.min = options.min ?? -Infinity;
    this.max = options.max ?? Infinity;
    if (!(this.min <= this.max)) throw new RangeError(`input ${name}: min (${this.min}) must not exceed max (${this.max})`);
    this.ranged = this.min !== -Infinity || this.max !== Infinity;
    this.nanPasses = this.code === ANY && !this.ranged;
    this.rangeNote = options.rangeNote ?? "";
    const d = kind.dimension;
    this.unit = options.unit ?? "";
    if (this.unit !== "" && SI.coherentUnit(d) !== "") throw new RangeError(`input ${name}: a unit label is only for dimensionless inputs; ${kind.name} prints its system's unit`);
    this.cgs = exactScale(-2 * d.length - 3 * d.mass);
  }

  /** Whether `value` passes the check (before any range test). */
  passes(value: number): boolean {
    const c = this.code;
    return c === POSITIVE
      ? value > 0 && value < Infinity
      : c === FINITE
        ? value - value === 0
        : c === NON_NEGATIVE
          ? value >= 0 && value < Infinity
          : true;
  }

  /**
   * The caller's value checked and moved to SI; throws a `RangeError` naming
   * the input, the value and the caller's unit.
   */
  toSI(sys: UnitSystem<SystemName>, value: number): number {
    // Shaped for the common case (an SI call whose value passes): one test of
    // the check, one identity test of the system, nothing else.
    if (this.passes(value)) {
      if (sys === SI && !this.ranged) return value;
      const v = this.convertedToSI(sys, value);
      if (v === v || (value !== value && this.nanPasses)) return v;
    }
    return this.refuse(sys, value);
  }

  /** {@link LawInput.toSI} for an SI caller: the value itself when it passes. */
  si(value: number): number {
    return this.passes(value) && !this.ranged ? value : this.toSI(SI, value);
  }

  /**
   * The caller's value checked and moved to SI, or NaN when it fails (for
   * batch rows, which never throw; {@link LawInput.reason} says why).
   */
  rowToSI(sys: UnitSystem<SystemName>, value: number): number {
    if (this.passes(value)) {
      if (sys === SI && !this.ranged) return value;
      return this.convertedToSI(sys, value);
    }
    return NaN;
  }

  /** A value that passed the check, in SI; NaN when it leaves the double range or the SI range. */
  private convertedToSI(sys: UnitSystem<SystemName>, value: number): number {
    let v = value;
    if (sys.name !== "SI") {
      v = this.cgs.apply(value);
      // a value valid in the caller's unit may leave the double range in SI (1e-320 cm)
      if (this.code === POSITIVE ? !(v > 0 && v < Infinity) : this.code === NON_NEGATIVE ? !(v < Infinity) : this.code === FINITE && !(v - v === 0)) return NaN;
    }
    if (this.ranged && !(v >= this.min && v <= this.max)) return NaN;
    return v;
  }

  /** Throw the RangeError for a value that failed (kept out of line: the success path stays small). */
  private refuse(sys: UnitSystem<SystemName>, value: number): never {
    throw new RangeError(this.reason(sys, value));
  }

  /**
   * An SI bound in the caller's unit for a message: in CGS to 15 significant
   * digits, which hides only the half-ulp rounding of the ×10ᵏ (1e-7 m reads
   * 0.00001 cm, not 0.000009999999999999999 cm).
   */
  private bound(sys: UnitSystem<SystemName>, boundSI: number): string {
    if (sys.name === "SI" || this.cgs.exp10 === 0 || boundSI - boundSI !== 0) return show(boundSI);
    const x = this.cgs.invert(boundSI);
    return x === 0 ? show(x) : show(Number(x.toPrecision(15)));
  }

  /** The message for a value that {@link LawInput.rowToSI} turns into NaN. */
  reason(sys: UnitSystem<SystemName>, value: number): string {
    const d = this.kind.dimension;
    const unit = this.unitIn(sys);
    if (!this.passes(value)) return `${this.name} must be ${WORDS[this.code]}${unit}; got ${show(value)}`;
    const v = sys.name === "SI" ? value : this.cgs.apply(value);
    // the range message, unless a finite value left the double range on its way to SI
    if (this.ranged && !(v >= this.min && v <= this.max) && (v - v === 0 || value - value !== 0)) {
      const note = this.rangeNote === "" ? "" : ` (${this.rangeNote})`;
      return `${this.name} must be in [${this.bound(sys, this.min)}, ${this.bound(sys, this.max)}]${unit}${note}; got ${show(value)}`;
    }
    return `${this.name} = ${show(value)}${unit} is outside the double range once converted to SI (${show(v)}${unitSuffix(SI.coherentUnit(d))})`;
  }

  /** The unit messages print after a value of this input in `sys` (with its leading space), or `""`. */
  unitIn(sys: UnitSystem<SystemName>): string {
    return this.unit !== "" ? ` ${this.unit}` : unitSuffix(sys.coherentUnit(this.kind.dimension));
  }
}

/**
 * Declare an input of a law: its parameter name, its kind and its check.
 *
 * @param name - the parameter name messages print (`"temperature"`)
 * @param kind - its kind, from `kinds` (`kinds.temperature`) or your own `{ name, dimension }`
 * @param options - the check (default `"positive"`), an SI range, `vacuum: true` for vacuum wavelengths
 * @example
 * ```ts
 * import { kinds, lawInput } from "starlume";
 * const wavelength = lawInput("wavelength", kinds.length, { vacuum: true });
 * const beta = lawInput("beta", kinds.dimensionless, { check: "finite" });
 * ```
 */
/* @__NO_SIDE_EFFECTS__ */
export function lawInput<D extends Dimension, V extends boolean = false>(
  name: string,
  kind: Kind<D>,
  options?: LawInputOptions<V>,
): LawInput<D, V> {
  return new LawInput(name, kind, options);
}
