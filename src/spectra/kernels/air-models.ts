/**
 * Named air-index models, plain SI numbers: the refractive index of air
 * n(λ_vac) by three conventions that differ by parts in 10⁸ (≈ 3 m s⁻¹ of
 * radial velocity), and air ↔ vacuum conversions with the model chosen
 * explicitly. σ = 1/λ_vac in µm⁻¹ throughout. Coefficients are from memory
 * of the papers (stated as such; checked against each other and against
 * published worked figures in air-models.test.ts):
 *
 * - `"edlen1966"`: B. Edlén 1966, Metrologia 2, 71, standard air (15 °C,
 *   101 325 Pa, dry, 300 ppm CO₂):
 *   (n − 1)·10⁸ = 8342.13 + 2 406 030/(130 − σ²) + 15 997/(38.9 − σ²).
 *   This is the formula of `airFromVacuum`/`vacuumFromAir` (kernels/air-vacuum.ts).
 * - `"birch-downs1994"`: K. P. Birch & M. J. Downs 1994, Metrologia 31, 315
 *   (correcting their 1993 update of Edlén), as adopted for standard air by
 *   D. C. Morton 2000, ApJS 130, 403, eq. 8 (the IAU convention):
 *   n − 1 = 8.34254·10⁻⁵ + 2.406147·10⁻²/(130 − σ²) + 1.5998·10⁻⁴/(38.9 − σ²).
 * - `"ciddor1996"`: P. E. Ciddor 1996, Appl. Opt. 35, 1566, for real
 *   observing conditions: temperature, pressure, water vapour (partial
 *   pressure or relative humidity) and CO₂ mole fraction; the BIPM 1981/91
 *   compressibility, the Davis 1992 saturation vapour pressure and
 *   enhancement factor, as given in the paper's appendix (all from memory).
 *
 * @packageDocumentation
 */

import { show } from "../../internal/checks";

/** A named air-index model (module header). */
export type AirIndexModelName = "edlen1966" | "birch-downs1994" | "ciddor1996";

/** Observing conditions for `"ciddor1996"` (SI). Give at most one of the two humidity forms. */
export interface AirConditionsSI {
  /** Air temperature, K (default 288.15 K = 15 °C). */
  readonly temperatureK?: number;
  /** Total pressure, Pa (default 101 325 Pa). */
  readonly pressurePa?: number;
  /** Water-vapour partial pressure, Pa (default 0: dry air). */
  readonly waterVapourPressurePa?: number;
  /** Relative humidity as a fraction 0…1 (instead of the partial pressure). */
  readonly relativeHumidity?: number;
  /** CO₂ mole fraction (default 450e-6, Ciddor's standard air). */
  readonly co2MoleFraction?: number;
}

const R_CIDDOR = 8.31451; // J mol⁻¹ K⁻¹ as used by Ciddor 1996 (from memory)
const M_W = 0.018015; // kg/mol, water

/** Ciddor's compressibility Z(p, T, x_w) (BIPM-1981/91 form, from memory). */
function compressibility(p: number, tK: number, xw: number): number {
  const t = tK - 273.15;
  const a0 = 1.58123e-6;
  const a1 = -2.9331e-8;
  const a2 = 1.1043e-10;
  const b0 = 5.707e-6;
  const b1 = -2.051e-8;
  const c0 = 1.9898e-4;
  const c1 = -2.376e-6;
  const d = 1.83e-11;
  const e = -0.765e-8;
  const pt = p / tK;
  return 1 - pt * (a0 + a1 * t + a2 * t * t + (b0 + b1 * t) * xw + (c0 + c1 * t) * xw * xw) + pt * pt * (d + e * xw * xw);
}

/** Saturation vapour pressure over water, Pa (Davis 1992 as quoted by Ciddor; from memory). */
export function saturationVapourPressurePa(tK: number): number {
  return Math.exp(1.2378847e-5 * tK * tK - 1.9121316e-2 * tK + 33.93711047 - 6.3431645e3 / tK);
}

function requireCondition(name: string, v: number, ok: boolean, what: string): number {
  if (!ok) throw new RangeError(`${name} must be ${what}; got ${show(v)}`);
  return v;
}

/** Ciddor 1996 refractivity n − 1 at vacuum wavenumber σ (µm⁻¹) and the given conditions. */
function ciddor(s2: number, c: AirConditionsSI): number {
  const tK = c.temperatureK ?? 288.15;
  const p = c.pressurePa ?? 101325;
  const xc = c.co2MoleFraction ?? 450e-6;
  requireCondition("temperatureK", tK, tK >= 233.15 && tK <= 373.15, "in [233.15, 373.15] K (Ciddor 1996 validity, −40 to 100 °C)");
  requireCondition("pressurePa", p, p >= 1e4 && p <= 1.4e5, "in [1e4, 1.4e5] Pa (Ciddor 1996 validity)");
  requireCondition("co2MoleFraction", xc, xc >= 0 && xc <= 0.01, "in [0, 0.01]");
  if (c.waterVapourPressurePa !== undefined && c.relativeHumidity !== undefined) {
    throw new RangeError("give waterVapourPressurePa or relativeHumidity, not both");
  }
  const t = tK - 273.15;
  const f = 1.00062 + 3.14e-8 * p + 5.6e-7 * t * t; // enhancement factor
  let pw: number;
  if (c.relativeHumidity !== undefined) {
    const h = requireCondition("relativeHumidity", c.relativeHumidity, c.relativeHumidity >= 0 && c.relativeHumidity <= 1, "a fraction in [0, 1]");
    pw = h * saturationVapourPressurePa(tK);
  } else {
    pw = c.waterVapourPressurePa ?? 0;
    requireCondition("waterVapourPressurePa", pw, pw >= 0 && pw <= p, "in [0, pressurePa] Pa");
  }
  const xw = (f * pw) / p;
  // standard air (15 °C, 101 325 Pa, dry, 450 ppm) and its CO₂ correction
  const nas = 1e-8 * (5792105 / (238.0185 - s2) + 167917 / (57.362 - s2));
  const naxs = nas * (1 + 0.534e-6 * (xc * 1e6 - 450));
  // pure water vapour at 20 °C, 1333 Pa
  const nws = 1e-8 * 1.022 * (295.235 + 2.6422 * s2 - 0.03238 * s2 * s2 + 0.004028 * s2 * s2 * s2);
  const ma = 1e-3 * (28.9635 + 12.011e-6 * (xc * 1e6 - 400));
  const rhoAxs = (101325 * ma) / (compressibility(101325, 288.15, 0) * R_CIDDOR * 288.15);
  const rhoWs = (1333 * M_W) / (compressibility(1333, 293.15, 1) * R_CIDDOR * 293.15);
  const z = compressibility(p, tK, xw);
  const rhoA = (p * ma * (1 - xw)) / (z * R_CIDDOR * tK);
  const rhoW = (p * M_W * xw) / (z * R_CIDDOR * tK);
  return (rhoA / rhoAxs) * naxs + (rhoW / rhoWs) * nws;
}

/**
 * Refractivity n − 1 of air at a vacuum wavelength by the named model
 * (module header). `conditions` apply to `"ciddor1996"` only (the two
 * standard-air models describe fixed conditions; passing conditions with
 * them throws). Valid for 200 nm – 20 µm (RangeError outside).
 *
 * @example
 * ```ts
 * airRefractivityModelSI(633e-9, "ciddor1996", { temperatureK: 293.15 }); // ≈ 2.71e-4
 * ```
 */
export function airRefractivityModelSI(vacuumWavelengthM: number, model: AirIndexModelName, conditions?: AirConditionsSI): number {
  if (!(vacuumWavelengthM >= 199.9e-9 && vacuumWavelengthM <= 20.01e-6)) {
    throw new RangeError(`vacuumWavelengthM must be in [2e-7, 0.00002] m (air-index model range); got ${show(vacuumWavelengthM)}`);
  }
  const s = 1e-6 / vacuumWavelengthM;
  const s2 = s * s;
  if (model !== "ciddor1996" && conditions !== undefined) {
    throw new RangeError(`model ${JSON.stringify(model)} is standard air (fixed conditions): conditions need model "ciddor1996"`);
  }
  switch (model) {
    case "edlen1966":
      return 1e-8 * (8342.13 + 2406030 / (130 - s2) + 15997 / (38.9 - s2));
    case "birch-downs1994":
      return 8.34254e-5 + 2.406147e-2 / (130 - s2) + 1.5998e-4 / (38.9 - s2);
    case "ciddor1996":
      return ciddor(s2, conditions ?? {});
    default:
      throw new RangeError(`model must be one of "edlen1966", "birch-downs1994", "ciddor1996"; got ${JSON.stringify(model)}`);
  }
}

/**
 * Air wavelength λ_air = λ_vac / n(λ_vac) by the named model, m.
 *
 * @example
 * ```ts
 * vacuumToAirModelSI(656.4614e-9, "birch-downs1994"); // ≈ 656.2797e-9
 * ```
 */
export function vacuumToAirModelSI(vacuumWavelengthM: number, model: AirIndexModelName, conditions?: AirConditionsSI): number {
  return vacuumWavelengthM / (1 + airRefractivityModelSI(vacuumWavelengthM, model, conditions));
}

/**
 * Vacuum wavelength from an air wavelength by the named model, m: the root of
 * λ_vac = λ_air · n(λ_vac), by fixed-point iteration (contraction factor
 * |λ dn/dλ| < 2e-5, so four steps reach rounding; at most eight are taken).
 *
 * @example
 * ```ts
 * airToVacuumModelSI(656.2797e-9, "birch-downs1994"); // ≈ 656.4614e-9
 * ```
 */
export function airToVacuumModelSI(airWavelengthM: number, model: AirIndexModelName, conditions?: AirConditionsSI): number {
  if (!(airWavelengthM >= 200e-9 && airWavelengthM <= 20e-6)) {
    throw new RangeError(`airWavelengthM must be in [2e-7, 0.00002] m (air-index model range); got ${show(airWavelengthM)}`);
  }
  let v = airWavelengthM;
  for (let i = 0; i < 8; i++) {
    const next = airWavelengthM * (1 + airRefractivityModelSI(v, model, conditions));
    if (next === v) break;
    v = next;
  }
  return v;
}
