/**
 * Plain-number values of the constants, in SI base units (m, kg, s, K, mol).
 * These are the single source of every number in `src/constants`; the typed
 * constants are built from them, and plain-number kernels import them.
 *
 * Sources: CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021);
 * IAU 2015 Resolution B3 (nominal solar and planetary values); IAU 2015
 * Resolution B2 (bolometric zero points, parsec); IAU 2012 Resolution B2
 * (astronomical unit). Values derived from exact constants are computed here,
 * not typed in; tests compare them with the published digits.
 *
 * @internal
 */

// --- CODATA 2018 exact defining constants (SI 2019) ---
/** Planck constant h, J s (exact). */
export const H = 6.62607015e-34;
/** Speed of light in vacuum c, m s^-1 (exact). */
export const C = 299792458;
/** Boltzmann constant k, J K^-1 (exact). */
export const K_B = 1.380649e-23;
/** Elementary charge e, C (exact). */
export const E_CHARGE = 1.602176634e-19;
/** Avogadro constant N_A, mol^-1 (exact). */
export const N_A = 6.02214076e23;

// --- derived from exact constants (exact in principle; rounded to double here) ---
/** Reduced Planck constant ħ = h / 2π, J s. */
export const HBAR = H / (2 * Math.PI);
/** Electronvolt, J (exact: e × 1 V). */
export const EV = E_CHARGE;
/** Molar gas constant R = N_A k, J mol^-1 K^-1. */
export const R_GAS = N_A * K_B;
/**
 * Stefan–Boltzmann constant σ = 2π⁵k⁴ / (15h³c²), W m^-2 K^-4.
 * CODATA 2018 prints 5.670 374 419... × 10^-8 (exact, truncated).
 */
export const SIGMA = (2 * Math.PI ** 5 * K_B ** 4) / (15 * H ** 3 * C ** 2);
/** First radiation constant c₁ = 2πhc², W m². */
export const C1 = 2 * Math.PI * H * C * C;
/** First radiation constant for spectral radiance c₁L = 2hc², W m² sr^-1. */
export const C1L = 2 * H * C * C;
/** Second radiation constant c₂ = hc / k, m K. */
export const C2 = (H * C) / K_B;

// --- CODATA 2018 measured constants (value, standard uncertainty) ---
/** Newtonian constant of gravitation G, m³ kg^-1 s^-2. */
export const G = 6.6743e-11;
/** Standard uncertainty of G. */
export const G_UNC = 0.00015e-11;
/** Fine-structure constant α (dimensionless). */
export const ALPHA = 7.2973525693e-3;
/** Standard uncertainty of α. */
export const ALPHA_UNC = 0.0000000011e-3;
/** Rydberg constant R∞, m^-1. */
export const RYDBERG = 10973731.56816;
/** Standard uncertainty of R∞. */
export const RYDBERG_UNC = 0.000021;
/** Electron mass m_e, kg. */
export const M_E = 9.1093837015e-31;
/** Standard uncertainty of m_e. */
export const M_E_UNC = 0.0000000028e-31;
/** Proton mass m_p, kg. */
export const M_P = 1.67262192369e-27;
/** Standard uncertainty of m_p. */
export const M_P_UNC = 0.00000000051e-27;
/** Atomic mass constant m_u, kg. */
export const M_U = 1.6605390666e-27;
/** Standard uncertainty of m_u. */
export const M_U_UNC = 0.0000000005e-27;

// --- IAU 2012 Resolution B2 ---
/** Astronomical unit, m (exact by definition). */
export const AU = 149597870700;

// --- IAU 2015 Resolution B2 ---
/** Parsec, m: exactly (648000/π) au. */
export const PARSEC = (648000 / Math.PI) * AU;
/** Zero point of the absolute bolometric magnitude scale L₀, W (exact by definition). */
export const L0 = 3.0128e28;
/**
 * Zero point of the apparent bolometric magnitude scale f₀, W m^-2:
 * L₀ / (4π (10 pc)²), which IAU 2015 B2 prints as 2.518 021 002... × 10^-8.
 */
export const F0 = L0 / (4 * Math.PI * (10 * PARSEC) ** 2);

// --- IAU 2015 Resolution B3 nominal values (exact by definition) ---
/** Nominal solar radius R☉ᴺ, m. */
export const R_SUN = 6.957e8;
/** Nominal total solar irradiance S☉ᴺ, W m^-2. */
export const S_SUN = 1361;
/** Nominal solar luminosity L☉ᴺ, W. */
export const L_SUN = 3.828e26;
/** Nominal solar effective temperature T☉effᴺ, K. */
export const T_SUN = 5772;
/** Nominal solar mass parameter (GM)☉ᴺ, m³ s^-2. */
export const GM_SUN = 1.3271244e20;
/** Nominal equatorial Earth radius R⊕eᴺ, m. */
export const R_EARTH_EQ = 6.3781e6;
/** Nominal polar Earth radius R⊕pᴺ, m. */
export const R_EARTH_POLAR = 6.3568e6;
/** Nominal equatorial Jupiter radius RJeᴺ, m. */
export const R_JUPITER_EQ = 7.1492e7;
/** Nominal polar Jupiter radius RJpᴺ, m. */
export const R_JUPITER_POLAR = 6.6854e7;
/** Nominal terrestrial mass parameter (GM)⊕ᴺ, m³ s^-2. */
export const GM_EARTH = 3.986004e14;
/** Nominal jovian mass parameter (GM)Jᴺ, m³ s^-2. */
export const GM_JUPITER = 1.2668653e17;
/** Solar mass M☉ = (GM)☉ᴺ / G, kg (uncertainty dominated by G). */
export const M_SUN = GM_SUN / G;

// --- time and distance conventions ---
/** Day, s (86 400 s exactly). */
export const DAY = 86400;
/** Julian year, s: 365.25 d exactly (IAU). */
export const JULIAN_YEAR = 365.25 * DAY;
/** Light-year, m: c × one Julian year (IAU). */
export const LIGHT_YEAR = C * JULIAN_YEAR;
/** Jansky, W m^-2 Hz^-1 (10^-26 exactly). */
export const JANSKY = 1e-26;
/** Zero point of the AB magnitude system: 3631 Jy in W m^-2 Hz^-1 (common practice; Oke & Gunn 1983). */
export const AB_ZERO_POINT = 3631 * JANSKY;
