/**
 * The Faddeeva function w(z) = e^{−z²} erfc(−iz), exported for code that
 * needs the complex function itself (plasma dispersion Z(ζ) = i√π w(ζ),
 * radiative transfer, line fitting with dispersion profiles), not only the
 * Voigt profile built on its real part.
 *
 * @module
 */
import { show } from "../internal/checks";
import { faddeeva as faddeevaKernel } from "./kernels/faddeeva";

/** A complex number: real part `re` and imaginary part `im` (plain, dimensionless numbers). */
export interface Complex {
  /** Real part. */
  readonly re: number;
  /** Imaginary part. */
  readonly im: number;
}

const out = new Float64Array(2);

/**
 * Faddeeva function w(z) = e^{−z²} erfc(−iz) (Abramowitz & Stegun 7.1.3;
 * DLMF 7.2.3), for any finite complex z. Dimensionless in and out.
 *
 * Re w(x + iy) for y > 0 is the Voigt function K(x, y) (the Voigt profile
 * is K/(b√π)); Im w is the dispersion (Faraday–Voigt) function L(x, y);
 * w(iy) = erfcx(y) for y ≥ 0; w(x) = e^{−x²} + (2i/√π) D(x) on the real
 * axis (D Dawson's integral).
 *
 * Algorithm (kernels/faddeeva.ts): Weideman's 40-term rational series
 * (SIAM J. Numer. Anal. 31, 1497, 1994) for |z| < 8, a Taylor series about
 * the real axis for y < 10⁻³ there, the Laplace continued fraction for
 * 8 ≤ |z| < 50, the asymptotic series (A&S 7.1.23) for 50 ≤ |z| < 10⁸, and
 * i/(√π z) with a scaled division beyond (no square is formed, so every
 * finite z has its finite answer); for y < 0 the reflection
 * w(z) = 2e^{−z²} − w(−z) (A&S 7.1.11) with y² − x² and 2xy formed exactly.
 *
 * Accuracy, measured against mpmath at 60 digits on 19 490 points over the
 * whole plane (test/fixtures/faddeeva-plane.json: |x|, |y| from 10⁻⁶ to
 * 10¹² at four points a decade, both axes, the algorithm's region
 * boundaries, and arguments up to 1.8 × 10³⁰⁸) and 2 110 points of
 * faddeeva.json:
 * - upper half-plane (y ≥ 0), including the real axis, the imaginary axis
 *   and |z| → ∞: relative error of Re w ≤ 5 × 10⁻¹² (worst where Re w ≪ |Im w|, near
 *   y = 10⁻³ and |x| ≈ 8), of Im w ≤ 1 × 10⁻¹²
 *   wherever |Im w| > 10⁻¹⁰ |w| (Im w = 0 exactly on the imaginary axis);
 * - lower half-plane (y < 0), where w grows like e^{y² − x²}: error
 *   ≤ 1 × 10⁻¹³ relative to 2|e^{−z²}| + |w(−z)| (the two terms of the
 *   reflection; w has zeros there, near which no relative bound can hold);
 *   on the negative imaginary axis w = 2e^{y²} − erfcx(|y|) to ≤ 6 × 10⁻¹⁴
 *   relative (the condition number y² of e^{y²} reaches 700 there).
 * - every finite z whose |w| is a double gives a finite answer.
 *
 * @param z - the argument, finite real and imaginary parts
 * @returns w(z) as `{ re, im }`
 * @throws RangeError when a part of z is not finite, or when |w(z)| exceeds
 *   the double range (y < 0 with y² − x² ≳ 709)
 * @example
 * ```ts
 * import { faddeeva } from "starlume";
 * const w = faddeeva({ re: 0, im: 1 }); // { re: erfcx(1) = 0.42758…, im: 0 }
 * const k = faddeeva({ re: 1.5, im: 0.1 }).re; // Voigt function K(1.5, 0.1)
 * ```
 */
export function faddeeva(z: Complex): Complex {
  const x = z.re;
  const y = z.im;
  if (!(x - x === 0)) throw new RangeError(`z.re must be a finite number (dimensionless); got ${show(x)}`);
  if (!(y - y === 0)) throw new RangeError(`z.im must be a finite number (dimensionless); got ${show(y)}`);
  faddeevaKernel(x, y, out);
  const re = out[0] as number;
  const im = out[1] as number;
  if (!(re - re === 0 && im - im === 0)) {
    throw new RangeError(
      `w(z) overflows the double range for z = ${show(x)} + ${show(y)}i: |w| ≈ 2e^(y² − x²) with z.im = ${show(y)} (y² − x² must be below about 709)`,
    );
  }
  return { re: re === 0 ? 0 : re, im: im === 0 ? 0 : im };
}
