/**
 * Pieces of the messages every law writes: a value printed without losing
 * its sign or NaN, and a unit written after it.
 *
 * @internal
 */
export { show } from "../internal/checks";

/** `" cm"` for `"cm"`, `""` for a pure number's empty unit. */
export function unitSuffix(unit: string): string {
  return unit === "" ? "" : ` ${unit}`;
}
