#!/usr/bin/env node
/**
 * The hand-written counterpart of `starlume solve IN.csv --format csv` for
 * the comparison in scripts/cli-bench.mjs: a plain Node script, no library,
 * written for one known table layout (the demo survey's solve input: teff,
 * theta, parallax, fbol with their sigma columns, in K, mas, mas and
 * erg s^-1 cm^-2; unquoted CSV; theta may be empty), doing the same
 * arithmetic and writing the same columns:
 *
 *   unknowns z = (ln T, ln R, ln d); each input i is linear in z in log space,
 *   ln y_i = c_i + a_i·z, with weight 1/(σ_i/y_i)²:
 *     teff      a = (1, 0, 0)    c = 0
 *     parallax  a = (0, 0, −1)   c = ln au           (rad)
 *     fbol      a = (4, 2, −2)   c = ln σ_SB          (W m^-2)
 *     theta     a = (0, 1, −1)   c = ln 2             (rad)
 *   weighted least squares z = N⁻¹ b, N = Σ w a aᵀ, b = Σ w a (ln y − c);
 *   covariance N⁻¹; every output q = exp(c_q + g_q·z) with σ_q = q √(g_qᵀ N⁻¹ g_q);
 *   χ² = Σ pull², pull = (ln y − ln ŷ)/(σ/y); dof = n − 3; for dof = 1
 *   p = erfc(√(χ²/2)) and the Gaussian-equivalent tension is √χ².
 *
 * Run: node scripts/cli-bench-plain.mjs IN.csv OUT.csv
 */
import { readFileSync, writeFileSync } from "node:fs";

const [inPath, outPath] = process.argv.slice(2);
if (!inPath || !outPath) {
  console.error("usage: node scripts/cli-bench-plain.mjs IN.csv OUT.csv");
  process.exit(2);
}

// Constants (SI): CODATA 2018 exact h, c, k; IAU 2012 au; IAU 2015 nominal L☉, R☉; parsec per IAU 2015 B2.
const H = 6.62607015e-34;
const C = 299792458;
const K = 1.380649e-23;
const PI2 = Math.PI * Math.PI;
const K2 = K * K;
const SIGMA = (2 * PI2 * PI2 * Math.PI * K2 * K2) / (15 * H * H * H * C * C);
const AU = 149597870700;
const PC = (648000 / Math.PI) * AU;
const L_SUN = 3.828e26;
const R_SUN = 6.957e8;
const MAS = Math.PI / 648000 / 1000;
const ERG_CM2 = 1e-3; // erg s^-1 cm^-2 → W m^-2

const LN_AU = Math.log(AU);
const LN_SIGMA = Math.log(SIGMA);
const LN_2 = Math.log(2);
const LN_4PI_SIGMA = Math.log(4 * Math.PI * SIGMA);

/** erfc(x) for x ≥ 0: Maclaurin series of erf below 2.5, Lentz continued fraction above. */
function erfc(x) {
  if (x < 2.5) {
    // erf x = 2/√π Σ (−1)ⁿ x^(2n+1) / (n! (2n+1))
    const x2 = x * x;
    let term = x;
    let sum = x;
    for (let n = 1; n < 100; n++) {
      term *= -x2 / n;
      const t = term / (2 * n + 1);
      sum += t;
      if (Math.abs(t) < 1e-17 * Math.abs(sum)) break;
    }
    return 1 - (2 / Math.sqrt(Math.PI)) * sum;
  }
  // erfc x = e^(−x²)/√π · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + …))))
  const tiny = 1e-300;
  let f = x;
  let cc = x;
  let d = 0;
  for (let n = 1; n < 200; n++) {
    const an = n / 2;
    d = x + an * d;
    d = d === 0 ? tiny : 1 / d;
    cc = x + an / cc;
    if (cc === 0) cc = tiny;
    const delta = cc * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(-x * x) / Math.sqrt(Math.PI) / f;
}

const text = readFileSync(inPath, "utf8");
const lines = text.split("\n");
const head = lines[0].split(",");
const col = (name) => head.indexOf(name);
const iName = col("name");
const iT = col("teff [K]");
const iST = col("sigma(teff) [K]");
const iTh = col("theta [mas]");
const iSTh = col("sigma(theta) [mas]");
const iP = col("parallax [mas]");
const iSP = col("sigma(parallax) [mas]");
const iF = col("fbol [erg s^-1 cm^-2]");
const iSF = col("sigma(fbol) [erg s^-1 cm^-2]");

const out = [
  "line,name,status,inputs,teff [K],sigma(teff) [K],luminosity [Lsun],sigma(luminosity) [Lsun],radius [Rsun],sigma(radius) [Rsun]," +
    "distance [pc],sigma(distance) [pc],theta [mas],sigma(theta) [mas],fbol [W m^-2],sigma(fbol) [W m^-2],chi2,dof,p_value,tension_sigma,worst_pull,reason",
];

// Per-input design rows and offsets, in the CLI's input order (teff, parallax, fbol, theta).
const A = [
  [1, 0, 0],
  [0, 0, -1],
  [4, 2, -2],
  [0, 1, -1],
];
const OFF = [0, LN_AU, LN_SIGMA, LN_2];
const KEY = ["teff", "parallax", "fbol", "theta"];
const y = new Float64Array(4);
const s = new Float64Array(4);
const used = [0, 0, 0, 0];

for (let li = 1; li < lines.length; li++) {
  const line = lines[li];
  if (line === "") continue;
  const f = line.split(",");
  let n = 0;
  const add = (k, v, sv, scale) => {
    y[n] = Math.log(Number(v) * scale);
    s[n] = Number(sv) / Number(v);
    used[n] = k;
    n++;
  };
  add(0, f[iT], f[iST], 1);
  add(1, f[iP], f[iSP], MAS);
  add(2, f[iF], f[iSF], ERG_CM2);
  if (f[iTh] !== "") add(3, f[iTh], f[iSTh], MAS);

  // normal equations (symmetric 3×3) and right-hand side
  let n00 = 0, n01 = 0, n02 = 0, n11 = 0, n12 = 0, n22 = 0, b0 = 0, b1 = 0, b2 = 0;
  for (let i = 0; i < n; i++) {
    const a = A[used[i]];
    const w = 1 / (s[i] * s[i]);
    const r = y[i] - OFF[used[i]];
    n00 += w * a[0] * a[0]; n01 += w * a[0] * a[1]; n02 += w * a[0] * a[2];
    n11 += w * a[1] * a[1]; n12 += w * a[1] * a[2]; n22 += w * a[2] * a[2];
    b0 += w * a[0] * r; b1 += w * a[1] * r; b2 += w * a[2] * r;
  }
  // inverse by cofactors
  const c00 = n11 * n22 - n12 * n12;
  const c01 = n02 * n12 - n01 * n22;
  const c02 = n01 * n12 - n02 * n11;
  const c11 = n00 * n22 - n02 * n02;
  const c12 = n01 * n02 - n00 * n12;
  const c22 = n00 * n11 - n01 * n01;
  const det = n00 * c00 + n01 * c01 + n02 * c02;
  const v00 = c00 / det, v01 = c01 / det, v02 = c02 / det, v11 = c11 / det, v12 = c12 / det, v22 = c22 / det;
  const z0 = v00 * b0 + v01 * b1 + v02 * b2;
  const z1 = v01 * b0 + v11 * b1 + v12 * b2;
  const z2 = v02 * b0 + v12 * b1 + v22 * b2;
  const rel = (g0, g1, g2) =>
    Math.sqrt(g0 * g0 * v00 + g1 * g1 * v11 + g2 * g2 * v22 + 2 * (g0 * g1 * v01 + g0 * g2 * v02 + g1 * g2 * v12));

  const T = Math.exp(z0);
  const R = Math.exp(z1);
  const D = Math.exp(z2);
  const L = Math.exp(LN_4PI_SIGMA + 4 * z0 + 2 * z1);
  const TH = Math.exp(LN_2 + z1 - z2);
  const FB = Math.exp(LN_SIGMA + 4 * z0 + 2 * z1 - 2 * z2);

  let chi2 = 0;
  let worst = "";
  let mag = -1;
  for (let i = 0; i < n; i++) {
    const a = A[used[i]];
    const pull = (y[i] - (OFF[used[i]] + a[0] * z0 + a[1] * z1 + a[2] * z2)) / s[i];
    chi2 += pull * pull;
    if (Math.abs(pull) > mag) {
      mag = Math.abs(pull);
      worst = `${KEY[used[i]]}:${pull >= 0 ? "+" : ""}${pull.toFixed(2)}`;
    }
  }
  const dof = n - 3;
  let p = 1;
  let tension = 0;
  if (dof === 0) {
    chi2 = 0;
    worst = "";
  } else {
    // dof = 1 in this table (at most four inputs)
    p = erfc(Math.sqrt(chi2 / 2));
    tension = Math.sqrt(chi2);
  }
  const inputs = used.slice(0, n).map((k) => KEY[k]).join("+");
  out.push(
    [
      li + 1, f[iName], "ok", inputs,
      T, T * rel(1, 0, 0),
      L / L_SUN, (L / L_SUN) * rel(4, 2, 0),
      R / R_SUN, (R / R_SUN) * rel(0, 1, 0),
      D / PC, (D / PC) * rel(0, 0, 1),
      TH / MAS, (TH / MAS) * rel(0, 1, -1),
      FB, FB * rel(4, 2, -2),
      chi2, dof, p, tension, worst, "",
    ].join(","),
  );
}
writeFileSync(outPath, out.join("\n") + "\n");
