/**
 * A small tour of what starlume computes, on invented stars of an invented
 * survey. `npm start` runs the full command-line demo; this script is the
 * library-only version: `npx tsx examples/demo.ts`.
 */
import { CGS, SI, constants, lambertianExitance, mul, planckRadianceWavelength, pow, scale, units } from "../src/index";

const stars = [
  { name: "Vellar-A 12", teff: 3100, radiusRsol: 0.35 },
  { name: "Vellar-A 47", teff: 5772, radiusRsol: 1.0 },
  { name: "Vellar-B 3", teff: 9800, radiusRsol: 2.4 },
];

console.log("star            T_eff [K]   R [R☉]   L [L☉]     B_λ(550 nm) [erg s^-1 cm^-2 Å^-1 sr^-1]");
for (const s of stars) {
  const T = SI.of(s.teff, units.K);
  const R = SI.of(s.radiusRsol, units.Rsun);
  const L = scale(mul(mul(R, R), mul(constants.sigma.si, pow(T, 4))), 4 * Math.PI);
  const b = planckRadianceWavelength(CGS, CGS.of(550, units.nm), T);
  const perAngstrom = CGS.valueIn(lambertianExitance(b), units.erg_per_s_cm2_A) / Math.PI;
  console.log(
    `${s.name.padEnd(15)} ${String(s.teff).padStart(9)}   ${s.radiusRsol.toFixed(2).padStart(6)}   ${SI.valueIn(L, units.Lsun).toExponential(3).padStart(9)}   ${perAngstrom.toExponential(4)}`,
  );
}
