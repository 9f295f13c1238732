/**
 * starlume: stellar physics with units checked by the compiler.
 *
 * @packageDocumentation
 */
export * from "./quantity/index";
export { constants } from "./constants/index";
export type { Constant } from "./constants/index";
export * from "./radiation/planck";
