/**
 * One benchmark comparison: a hand-written plain-number `baseline` and the
 * `subject` (typed path or kernel) doing the same work. Both return a
 * checksum so the work cannot be optimised away.
 */
export interface BenchCase {
  /** What is measured, e.g. "Planck B_λ over 10⁶ wavelengths". */
  name: string;
  /** Builds inputs once, before timing. */
  setup?: () => void;
  /** The plain-number version written by hand. */
  baseline: () => number;
  /** The library path under test. */
  subject: () => number;
  /** Work items per call (rows, stars, wavelengths) for a throughput column. */
  items?: number;
  /**
   * Whether baseline and subject compute the same numbers (default true); set
   * false where the baseline is a reference cost (e.g. one Planck evaluation
   * vs one band fraction), so differing checksums are expected.
   */
  sameWork?: boolean;
}
