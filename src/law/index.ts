export { defineLaw } from "./define";
export type { InputArray, InputValue, Kernel, Law, LawArgs, LawBatchArgs, LawDeclaration } from "./define";
export { LawInput, lawInput } from "./input";
export type { InputCheck, LawInputOptions } from "./input";
export { LawOutput, lawOutput } from "./output";
export type { BatchResult } from "./batch";
