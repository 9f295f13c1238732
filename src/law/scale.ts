/**
 * Multiplication by an exact power of ten, decided once: `v × 10ⁿ` is one
 * correctly rounded multiplication (n ≥ 0) or division (n < 0) by an exact
 * double 10^|n| (exact for |n| ≤ 22), so converting between SI and CGS
 * never adds more than half an ulp.
 *
 * @internal
 */
import { times10 } from "../quantity/unit";

/** A fixed power-of-ten scale: one multiply or one divide. @internal */
export class ExactScale {
  /** The decimal exponent n. */
  readonly exp10: number;
  /** 10^n when n ≥ 0, else 1. */
  readonly mul: number;
  /** 10^−n when n < 0, else 1. */
  readonly div: number;
  constructor(exp10: number) {
    this.exp10 = exp10;
    this.mul = exp10 >= 0 ? times10(1, exp10) : 1;
    this.div = exp10 < 0 ? times10(1, -exp10) : 1;
  }
  /** v × 10ⁿ, correctly rounded for |n| ≤ 22. */
  apply(v: number): number {
    return this.div === 1 ? v * this.mul : v / this.div;
  }
  /** v × 10⁻ⁿ. */
  invert(v: number): number {
    return this.div === 1 ? v / this.mul : v * this.div;
  }
}

/** The scale `× 10ⁿ`. @internal */
export function exactScale(exp10: number): ExactScale {
  return new ExactScale(exp10);
}
