/**
 * vitest setup: property tests run from a fixed seed so that CI is
 * reproducible (a failure prints its seed and counterexample and repeats on
 * every run). Explore other seeds locally with `FC_SEED=<n> npm test`.
 */
import fc from "fast-check";

const seed = Number(process.env.FC_SEED ?? 20261201);
fc.configureGlobal({ seed: Number.isFinite(seed) ? seed : 20261201 });
