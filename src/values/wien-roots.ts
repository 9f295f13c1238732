/**
 * The dimensionless roots behind Wien's displacement law, computed (not typed
 * in): x = n (1 − e⁻ˣ) for n = 5 (peak of B_λ), 3 (peak of B_ν), 4 (peak of the
 * photon spectrum per wavelength) and 2 (per frequency).
 *
 * Newton's iteration on g(x) = x − n + n e⁻ˣ from x = n converges in a few
 * steps (g is convex, g(n) > 0 and g′ > 0 on [n − 1, n]). Written this way
 * (rather than x − n(1 − e⁻ˣ)) the residual keeps its last bits, and the
 * roots come out correctly rounded (checked against mpmath).
 *
 * @internal
 */
export function wienRoot(n: number): number {
  let x = n;
  for (let i = 0; i < 50; i++) {
    const e = Math.exp(-x);
    const g = x - n + n * e;
    const dg = 1 - n * e;
    const next = x - g / dg;
    if (next === x) break;
    x = next;
  }
  return x;
}

/** Root of x = 5(1 − e⁻ˣ), ≈ 4.965114231744276. */
export const WIEN_X_ENERGY_WAVELENGTH = wienRoot(5);
/** Root of x = 3(1 − e⁻ˣ), ≈ 2.821439372122079. */
export const WIEN_X_ENERGY_FREQUENCY = wienRoot(3);
/** Root of x = 4(1 − e⁻ˣ), ≈ 3.920690394872886. */
export const WIEN_X_PHOTON_WAVELENGTH = wienRoot(4);
/** Root of x = 2(1 − e⁻ˣ), ≈ 1.593624260040040. */
export const WIEN_X_PHOTON_FREQUENCY = wienRoot(2);
