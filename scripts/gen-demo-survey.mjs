#!/usr/bin/env node
/**
 * Generates the embedded demo survey in examples/demo-survey/ from chosen
 * true stellar parameters, with seeded noise:
 *
 *   bands.json       six invented photometric bands (smooth response curves on
 *                    200-point grids, 300 nm – 2.5 µm), in the band-definition
 *                    format of `starlume fit --bands`
 *   truth.csv        the chosen truth: T_eff, R, d, and what follows from them
 *                    (parallax, angular diameter, luminosity)
 *   photometry.csv   band fluxes (f_λ, f_ν or AB magnitudes) and parallaxes with
 *                    1–3 % Gaussian noise and their standard uncertainties
 *   solve-input.csv  an input for `starlume solve`: spectroscopic T_eff (1.5 %),
 *                    interferometric angular diameters (3 %, only where
 *                    θ > 0.15 mas), the parallaxes and bolometric fluxes (3 %)
 *
 * Everything here is invented: the Tallmere Plateau Observatory, its six-band
 * survey, the band shapes and the star designations (TLM-…).
 *
 * The physics is computed here independently of the library (plain Node, no
 * imports), so the demo also checks the library end to end: the fluxes are the
 * photon-counting band means of π (θ/2)² B_λ(T) by the trapezoid rule on the
 * committed grids (Bessell & Murphy 2012, PASP 124, 140), f_ν = ⟨f_λ⟩ λ_p²/c at
 * the pivot wavelength λ_p² = ∫Rλ dλ / ∫R/λ dλ (Tokunaga & Vacca 2005, PASP
 * 117, 421), m_AB = −2.5 log10(⟨f_ν⟩ / 3631 Jy). Constants: CODATA 2018
 * (h, c, k exact), IAU 2015 B3 nominal R☉ and L☉, IAU 2012 au, parsec per IAU
 * 2015 B2.
 *
 * Run: `node scripts/gen-demo-survey.mjs` (writes the three files; the output
 * is deterministic: the noise comes from a fixed-seed generator).
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const outDir = join(root, "examples", "demo-survey");

// ---- constants (SI) -----------------------------------------------------------
const H = 6.62607015e-34; // J s, exact (SI 2019)
const C = 299792458; // m/s, exact
const K = 1.380649e-23; // J/K, exact
const SIGMA = (2 * Math.PI ** 5 * K ** 4) / (15 * H ** 3 * C ** 2); // Stefan–Boltzmann
const AU = 149597870700; // m, IAU 2012 B2
const PC = (648000 / Math.PI) * AU; // m, IAU 2015 B2
const R_SUN = 6.957e8; // m, IAU 2015 B3 nominal
const L_SUN = 3.828e26; // W, IAU 2015 B3 nominal
const MAS = Math.PI / 648000 / 1000; // rad
const AB0 = 3631e-26; // W m^-2 Hz^-1

// ---- seeded PRNG --------------------------------------------------------------
/** mulberry32-style 32-bit generator (public-domain construction), fixed seed. */
function prng(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
/** A standard normal generator (Box–Muller) over a seeded uniform stream. */
function normals(seed) {
  const uniform = prng(seed);
  return () => {
    let u = 0;
    while (u === 0) u = uniform();
    const v = uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
}
const gauss = normals(20240917); // photometry and parallaxes
const gaussSolve = normals(77001); // solve-input.csv (an independent stream)

// ---- bands ----------------------------------------------------------------------
/**
 * Each band: a plateau between two logistic edges (λ_lo, λ_hi, edge scales
 * w_lo, w_hi) with a gentle linear tilt, tabulated on 200 equally spaced nodes
 * from λ_lo − 6 w_lo to λ_hi + 6 w_hi and normalised to a peak of 1. The
 * committed values (nm to 0.001, response to 5 significant digits) are what
 * both this script and the fitter integrate.
 */
const BAND_SHAPES = [
  { name: "tp340", lo: 322, hi: 368, wlo: 3.5, whi: 4.5, tilt: 0.25, unit: "flambda", noise: 0.03 },
  { name: "tp450", lo: 398, hi: 505, wlo: 6, whi: 7, tilt: 0.15, unit: "flambda", noise: 0.02 },
  { name: "tp610", lo: 545, hi: 682, wlo: 8, whi: 9, tilt: -0.1, unit: "flambda", noise: 0.015 },
  { name: "tp800", lo: 728, hi: 880, wlo: 10, whi: 12, tilt: -0.2, unit: "flambda", noise: 0.015 },
  { name: "tp1250", lo: 1110, hi: 1390, wlo: 18, whi: 22, tilt: 0.1, unit: "fnu", noise: 0.02 },
  { name: "tp2150", lo: 1990, hi: 2330, wlo: 22, whi: 26, tilt: -0.15, unit: "abmag", noise: 0.025 },
];
const POINTS = 200;

const sig = (x, n) => Number(x.toPrecision(n));

function makeBand(s) {
  const a = s.lo - 6 * s.wlo;
  const b = s.hi + 6 * s.whi;
  const wl = [];
  const r = [];
  for (let i = 0; i < POINTS; i++) {
    const l = a + ((b - a) * i) / (POINTS - 1);
    const mid = (s.lo + s.hi) / 2;
    const edge = 1 / (1 + Math.exp(-(l - s.lo) / s.wlo)) / (1 + Math.exp((l - s.hi) / s.whi));
    const tilt = 1 + (s.tilt * (l - mid)) / (s.hi - s.lo);
    wl.push(Number(l.toFixed(3)));
    r.push(edge * tilt);
  }
  const peak = Math.max(...r);
  return { wl, r: r.map((x) => (x / peak < 1e-6 ? 0 : sig(x / peak, 5))) };
}

const bands = BAND_SHAPES.map((s) => ({ ...s, ...makeBand(s) }));

/** Trapezoid weights of ∫ g(λ) dλ on the grid (m), times R λ (photon counting). */
function photonWeights(wlM, r) {
  const n = wlM.length;
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const left = i > 0 ? wlM[i] - wlM[i - 1] : 0;
    const right = i < n - 1 ? wlM[i + 1] - wlM[i] : 0;
    w[i] = 0.5 * (left + right) * r[i] * wlM[i];
  }
  return w;
}

for (const b of bands) {
  b.wlM = b.wl.map((x) => x * 1e-9);
  b.w = photonWeights(b.wlM, b.r);
  let tot = 0;
  let inv2 = 0;
  for (let i = 0; i < b.w.length; i++) {
    tot += b.w[i];
    inv2 += b.w[i] / (b.wlM[i] * b.wlM[i]);
  }
  b.total = tot;
  b.pivotM = Math.sqrt(tot / inv2);
}

/** B_λ(λ, T), W m^-2 sr^-1 m^-1 (Planck 1901), expm1 for accuracy at long λ. */
function planck(l, t) {
  return (2 * H * C * C) / l ** 5 / Math.expm1((H * C) / (l * K * t));
}

/** Photon-counting band mean of f_λ = π (θ/2)² B_λ, W m^-3. */
function bandMean(b, t, thetaRad) {
  const omega = Math.PI * (thetaRad / 2) ** 2;
  let s = 0;
  for (let i = 0; i < b.w.length; i++) s += b.w[i] * planck(b.wlM[i], t);
  return (omega * s) / b.total;
}

// ---- the stars ----------------------------------------------------------------------
/** Chosen truth: designation, T_eff (K), R (R☉), d (pc), a short description. */
const STARS = [
  ["TLM-0041", 3050, 0.24, 6.2, "cool dwarf"],
  ["TLM-0107", 3420, 0.44, 11.8, "cool dwarf"],
  ["TLM-0163", 3880, 0.61, 19.5, "cool dwarf"],
  ["TLM-0219", 4610, 0.74, 34.0, "orange dwarf"],
  ["TLM-0288", 5310, 0.91, 47.5, "dwarf"],
  ["TLM-0302", 5890, 1.14, 61.0, "dwarf"],
  ["TLM-0375", 6620, 1.46, 84.0, "dwarf"],
  ["TLM-0456", 4320, 13.8, 245.0, "giant"],
  ["TLM-0521", 7810, 2.08, 118.0, "main sequence"],
  ["TLM-0608", 9750, 2.62, 176.0, "main sequence"],
  ["TLM-0744", 15600, 4.4, 410.0, "hot main sequence"],
  ["TLM-0812", 27400, 9.6, 1080.0, "hot giant"],
];

const fmt = (x, n) => String(sig(x, n));

const truthRows = [
  "name,description,teff [K],radius [Rsun],distance [pc],parallax [mas],angular_diameter [mas],luminosity [Lsun]",
];
const photHeader = ["name"];
for (const b of bands) {
  const u = b.unit === "flambda" ? "erg s^-1 cm^-2 A^-1" : b.unit === "fnu" ? "mJy" : "AB mag";
  photHeader.push(`${b.name} [${u}]`, `sigma(${b.name}) [${u}]`);
}
photHeader.push("parallax [mas]", "sigma(parallax) [mas]");
const photRows = [photHeader.join(",")];
const solveRows = [
  "name,teff [K],sigma(teff) [K],theta [mas],sigma(theta) [mas],parallax [mas],sigma(parallax) [mas],fbol [erg s^-1 cm^-2],sigma(fbol) [erg s^-1 cm^-2]",
];

for (const [name, t, rSun, dPc, desc] of STARS) {
  const rM = rSun * R_SUN;
  const dM = dPc * PC;
  const theta = (2 * rM) / dM; // rad, small angle
  const plxMas = 1000 / dPc;
  const lum = 4 * Math.PI * rM * rM * SIGMA * t ** 4;
  truthRows.push(
    [name, desc, t, rSun, dPc, fmt(plxMas, 10), fmt(theta / MAS, 10), fmt(lum / L_SUN, 10)].join(","),
  );
  const row = [name];
  for (const b of bands) {
    const fl = bandMean(b, t, theta); // W m^-3
    const e = gauss();
    if (b.unit === "flambda") {
      const v = fl * 1e-7; // W m^-3 → erg s^-1 cm^-2 Å^-1 (1 W m^-3 = 1e7 erg s^-1 / (1e4 cm² · 1e10 Å))
      const obs = v * (1 + b.noise * e);
      row.push(fmt(obs, 5), fmt(b.noise * obs, 3));
    } else if (b.unit === "fnu") {
      const fnu = (fl * b.pivotM * b.pivotM) / C; // W m^-2 Hz^-1
      const mJy = fnu / 1e-29;
      const obs = mJy * (1 + b.noise * e);
      row.push(fmt(obs, 5), fmt(b.noise * obs, 3));
    } else {
      const fnu = (fl * b.pivotM * b.pivotM) / C;
      const m = -2.5 * Math.log10(fnu / AB0);
      const sm = (2.5 / Math.LN10) * b.noise; // σ_m ≈ 1.0857 σ_f/f
      row.push((m + sm * e).toFixed(4), sm.toFixed(4));
    }
  }
  const sp = Math.sqrt(0.03 ** 2 + (0.005 * plxMas) ** 2);
  const plxObs = plxMas + sp * gauss();
  row.push(fmt(plxObs, 6), fmt(sp, 3));
  photRows.push(row.join(","));

  // solve-input.csv: T from spectra, θ from interferometry (resolved stars only), f_bol
  const tObs = t * (1 + 0.015 * gaussSolve());
  const thetaMas = theta / MAS;
  const thetaObs = thetaMas * (1 + 0.03 * gaussSolve());
  const fbol = (SIGMA * t ** 4 * theta * theta) / 4; // W m^-2 = (θ/2)² σ T⁴
  const fbolObs = fbol * 1e3 * (1 + 0.03 * gaussSolve()); // erg s^-1 cm^-2
  const resolved = thetaMas > 0.15;
  solveRows.push(
    [
      name,
      fmt(tObs, 5),
      fmt(0.015 * tObs, 2),
      resolved ? fmt(thetaObs, 4) : "",
      resolved ? fmt(0.03 * thetaObs, 2) : "",
      fmt(plxObs, 6),
      fmt(sp, 3),
      fmt(fbolObs, 5),
      fmt(0.03 * fbolObs, 2),
    ].join(","),
  );
}

// ---- write ------------------------------------------------------------------------------
mkdirSync(outDir, { recursive: true });
const bandsJson = {
  format: "starlume-bands/1",
  description:
    "Tallmere Plateau Observatory six-band survey (invented for the starlume demo): smooth response curves, photon-counting detectors.",
  bands: bands.map((b) => ({
    name: b.name,
    convention: "photon",
    wavelengthUnit: "nm",
    wavelengths: b.wl,
    response: b.r,
  })),
};
// One band per block, each array on one line: readable and diff-friendly.
const bandText = bandsJson.bands
  .map((b) =>
    [
      "  {",
      `    "name": ${JSON.stringify(b.name)}, "convention": ${JSON.stringify(b.convention)}, "wavelengthUnit": ${JSON.stringify(b.wavelengthUnit)},`,
      `    "wavelengths": ${JSON.stringify(b.wavelengths)},`,
      `    "response": ${JSON.stringify(b.response)}`,
      "  }",
    ].join("\n"),
  )
  .join(",\n");
const text = `{\n "format": ${JSON.stringify(bandsJson.format)},\n "description": ${JSON.stringify(bandsJson.description)},\n "bands": [\n${bandText}\n ]\n}\n`;
JSON.parse(text); // must be valid JSON
writeFileSync(join(outDir, "bands.json"), text);
writeFileSync(join(outDir, "truth.csv"), truthRows.join("\n") + "\n");
writeFileSync(join(outDir, "photometry.csv"), photRows.join("\n") + "\n");
writeFileSync(join(outDir, "solve-input.csv"), solveRows.join("\n") + "\n");
console.log(`wrote ${STARS.length} stars, ${bands.length} bands to ${outDir}`);
for (const b of bands) console.log(`  ${b.name}: pivot ${(b.pivotM * 1e9).toFixed(1)} nm`);
