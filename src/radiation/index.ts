/**
 * Blackbody radiation, typed in SI and CGS: Planck's law and its limits,
 * Wien's displacement law, the Stefan–Boltzmann law, band fractions and band
 * radiances, radiance through a response curve, brightness and colour
 * temperatures. Every function takes the system (`SI` or `CGS`) first and
 * returns quantities in it; the plain-number SI kernels behind them stay
 * internal.
 *
 * @module
 */
export * from "./planck";
export * from "./approximations";
export * from "./displacement";
export * from "./stefan-boltzmann";
export * from "./band";
export * from "./response";
export * from "./brightness-temperature";
export * from "./colour-temperature";
