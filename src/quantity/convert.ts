/**
 * Conversions between the angle and solid-angle dimensions and pure numbers.
 *
 * starlume tracks angle and solid angle as dimensions, so the radian is
 * dropped only on purpose, where a formula such as arc length = angle ×
 * radius needs it.
 *
 * @module
 */
import type { Angle, AngularArea, Dimensionless, SolidAngle } from "./aliases";

/**
 * The angle's value in radians as a pure number (for arc length s = θ r,
 * small-angle formulas and trigonometry).
 *
 * @example
 * ```ts
 * import { SI, radians, units } from "starlume";
 * Math.sin(radians(SI.of(30, units.deg))); // 0.5
 * ```
 */
export function radians(angle: Angle): Dimensionless {
  return angle as number as Dimensionless;
}

/**
 * An angle from a number of radians.
 *
 * @example
 * ```ts
 * import { angleFromRadians, SI, units } from "starlume";
 * SI.valueIn(angleFromRadians(Math.PI), units.deg); // 180
 * ```
 */
export function angleFromRadians(value: number): Angle {
  return value as Angle;
}

/**
 * The solid angle subtended by a square of side `a` *in the small-angle
 * sense*: a (rad)² read as steradians. Exact for an infinitesimal patch; use
 * it to turn square degrees computed as deg × deg into a solid angle.
 *
 * @example
 * ```ts
 * import { SI, asSolidAngle, mul, units } from "starlume";
 * const side = SI.of(1, units.deg);
 * SI.valueIn(asSolidAngle(mul(side, side)), units.sqdeg); // 1
 * ```
 */
export function asSolidAngle(area: AngularArea): SolidAngle {
  return area as number as SolidAngle;
}

/**
 * A solid angle's value in steradians as a pure number.
 *
 * @example
 * ```ts
 * import { SI, steradians, units } from "starlume";
 * steradians(SI.of(1, units.sr)); // 1
 * ```
 */
export function steradians(omega: SolidAngle): Dimensionless {
  return omega as number as Dimensionless;
}
