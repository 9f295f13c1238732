/**
 * One benchmark comparison: a hand-written plain-number `baseline` (what a
 * competent engineer would write on plain numbers, without the library) and
 * the `subject` (typed path or kernel) doing the same work. Both return a
 * checksum; the runner flags the case when the two disagree beyond
 * `tolerance` (relative; 1e-12 unless the case declares and justifies more).
 *
 * Rules for baselines (see bench/run.ts): no `**` or `Math.pow` (powers by
 * multiplication), `Math.expm1` where the formula has e^x − 1, each case's
 * loops written out as their own function literals (no shared closure
 * factory: it would make the call sites inside megamorphic and distort the
 * ratio).
 */
export interface BenchCase {
  /** Short name for the table, e.g. "B_λ typed scalar (SI)". */
  name: string;
  /** What exactly is compared (written to BENCH_JSON with the results). */
  note?: string;
  /** Work items per call (rows, stars, wavelengths): times are reported per item. */
  items: number;
  /** Builds inputs once, before timing. */
  setup?: () => void;
  /** The plain-number version written by hand. */
  baseline: () => number;
  /** The library path under test. */
  subject: () => number;
  /**
   * Relative tolerance of the checksum comparison when the two sides cannot
   * agree to 1e-12 (e.g. two iterative fits), with the reason.
   */
  tolerance?: { rel: number; why: string };
}
