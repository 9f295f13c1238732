import type { BenchCase } from "./case";

/** SED-fitting benchmarks (filled in with the fitter). */
export const cases: BenchCase[] = [];
