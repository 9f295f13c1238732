/**
 * starlume: stellar physics with units checked by the compiler.
 *
 * - Quantities are branded numbers: dimension and system (SI or CGS) live in
 *   the type, the value is a plain `number` at run time.
 * - Laws take the system first (`SI` or `CGS`) and return results in it.
 *
 * @packageDocumentation
 * @module starlume
 */
export * from "./quantity/index";
export { constants } from "./constants/index";
export type { Constant } from "./constants/index";
export * from "./law/index";
export * from "./radiation/index";
export * from "./photometry/index";
export * from "./spectra/index";
export * from "./fit/index";
export * from "./plot/index";
