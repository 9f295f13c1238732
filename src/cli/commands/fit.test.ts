import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { csvRecords, REPO_ROOT, runCli } from "../test-util";
import { planckRadianceWavelengthSI } from "../../radiation/kernels/planck";
import { gaussianResponseSI } from "../../fit/kernels/bands";

const scratch = mkdtempSync(join(tmpdir(), "starlume-fit-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("starlume fit", () => {
  it("recovers the demo survey's true temperatures and radii within 3σ", async () => {
    const r = await runCli(["fit", "examples/demo-survey/photometry.csv", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRecords(r.stdout);
    expect(rows).toHaveLength(12);
    const truth = csvRecords(readFileSync(join(REPO_ROOT, "examples/demo-survey/truth.csv"), "utf8"));
    for (const row of rows) {
      const t = truth.find((x) => x.name === row.name);
      if (t === undefined) throw new Error(`no truth for ${row.name ?? "?"}`);
      expect(row.status).toBe("ok");
      expect(row.n_bands).toBe("6");
      // The demo data carry 1.5–3 % Gaussian noise (scripts/gen-demo-survey.mjs); 3σ bounds a fair draw.
      const zT = (Number(row["teff [K]"]) - Number(t["teff [K]"])) / Number(row["sigma(teff) [K]"]);
      const zR = (Number(row["radius [Rsun]"]) - Number(t["radius [Rsun]"])) / Number(row["sigma(radius) [Rsun]"]);
      expect(Math.abs(zT)).toBeLessThan(3);
      expect(Math.abs(zR)).toBeLessThan(3);
    }
  });

  it("recovers T exactly from noise-free f_ν data in Gaussian bands of a band file", async () => {
    const bands = [0.45, 0.6, 0.8, 1.2, 2.2].map((c, i) => ({ name: `g${i}`, shape: "gaussian", center: `${c} um`, fwhm: `${(0.2 * c).toFixed(3)} um` }));
    const bandsPath = join(scratch, "gauss.json");
    writeFileSync(bandsPath, JSON.stringify({ format: "starlume-bands/1", bands }));
    // Photon-counting band means of π(θ/2)²B_λ computed here with the Planck kernel and the trapezoid
    // rule on the same nodes the band file produces, then f_ν = ⟨f_λ⟩ λ_p²/c at the pivot wavelength.
    const t = 6543;
    const theta = 1e-9; // rad
    const cols: string[] = ["name"];
    const vals: string[] = ["synthetic"];
    for (const b of bands) {
      const c = Number(b.center.split(" ")[0]) * 1e-6;
      const curve = gaussianResponseSI(c, 0.2 * c);
      const l = curve.wavelengthsM;
      let num = 0;
      let den = 0;
      let inv = 0;
      for (let i = 0; i < l.length; i++) {
        const dl = 0.5 * ((i > 0 ? l[i]! - l[i - 1]! : 0) + (i < l.length - 1 ? l[i + 1]! - l[i]! : 0));
        const w = dl * curve.response[i]! * l[i]!;
        num += w * Math.PI * (theta / 2) ** 2 * planckRadianceWavelengthSI(l[i]!, t);
        den += w;
        inv += w / (l[i]! * l[i]!);
      }
      const fnuJy = ((num / den) * (den / inv)) / 299792458 / 1e-26;
      cols.push(`${b.name} [Jy]`, `sigma(${b.name}) [Jy]`);
      vals.push(String(fnuJy), String(fnuJy * 0.01));
    }
    const r = await runCli(["fit", "-", "--bands", bandsPath, "--format", "csv", "--unit", "theta=rad"], { stdin: `${cols.join(",")}\n${vals.join(",")}\n` });
    expect(r.code).toBe(0);
    const row = csvRecords(r.stdout)[0] as Record<string, string>;
    // Exact data: the fit converges to the generating parameters (1e-7 relative: LM step tolerance 1e-10 in ln T).
    expect(Math.abs(Number(row["teff [K]"]) / t - 1)).toBeLessThan(1e-7);
    expect(Math.abs(Number(row["theta [rad]"]) / theta - 1)).toBeLessThan(1e-7);
    expect(Number(row.chi2)).toBeLessThan(1e-10);
  });

  it("keeps rows with too few bands or a bad parallax, with reasons and line numbers (exit 1)", async () => {
    const src = readFileSync(join(REPO_ROOT, "examples/demo-survey/photometry.csv"), "utf8").trim().split("\n");
    const header = src[0] as string;
    const fields = (src[1] as string).split(",");
    const oneBand = fields.map((v, i) => (i >= 3 && i <= 12 ? "" : v)).join(","); // keep tp340 only
    const negPlx = fields.map((v, i) => (i === 13 ? "-1" : v)).join(",");
    const r = await runCli(["fit", "-", "--format", "csv"], { stdin: [header, src[1], oneBand, negPlx, src[2]].join("\n") });
    expect(r.code).toBe(1);
    const rows = csvRecords(r.stdout);
    expect(rows.map((x) => x.status)).toEqual(["ok", "rejected", "rejected", "ok"]);
    expect(rows[1]?.reason).toContain("only one band has a value");
    expect(rows[2]?.reason).toContain("'parallax' must be > 0");
    expect(r.stderr).toContain("stdin: line 3: rejected: only one band has a value");
    expect(r.stderr).toContain("stdin: line 4: rejected:");
  });

  it("refuses wrong units per column and ambiguous magnitudes (exit 2)", async () => {
    const kelvin = await runCli(["fit", "-"], { stdin: "name,tp450 [K],sigma(tp450) [K],tp610 [mJy],sigma(tp610) [mJy]\na,1,1,1,1\n" });
    expect(kelvin.code).toBe(2);
    expect(kelvin.stderr).toContain("column 2 'tp450 [K]': unit 'K' is a temperature (Θ); band 'tp450' needs a spectral flux");
    const mag = await runCli(["fit", "-"], { stdin: "name,tp450 [mag],sigma(tp450) [mag],tp610 [mJy],sigma(tp610) [mJy]\na,1,1,1,1\n" });
    expect(mag.code).toBe(2);
    expect(mag.stderr).toContain("[mag] is ambiguous");
    const nosigma = await runCli(["fit", "-"], { stdin: "name,tp450 [mJy],tp610 [mJy]\na,1,1\n" });
    expect(nosigma.code).toBe(2);
    expect(nosigma.stderr).toContain("band 'tp450' has no sigma(tp450) column");
    const oneband = await runCli(["fit", "-"], { stdin: "name,tp450 [mJy],sigma(tp450) [mJy],V [mJy]\na,1,1,1\n" });
    expect(oneband.code).toBe(2);
    expect(oneband.stderr).toContain("found only one band column");
  });

  it("validates band files and names the band (exit 2)", async () => {
    const write = (name: string, content: string): string => {
      const p = join(scratch, name);
      writeFileSync(p, content);
      return p;
    };
    const cases: [string, string][] = [
      ["{not json", "not valid JSON"],
      [JSON.stringify({ format: "other", bands: [] }), `"format" must be "starlume-bands/1"`],
      [JSON.stringify({ format: "starlume-bands/1", bands: [{ name: "x", wavelengthUnit: "nm", wavelengths: [500, 490], response: [1, 1] }] }), "band 'x' (bands[0]): wavelengths must be strictly increasing"],
      [JSON.stringify({ format: "starlume-bands/1", bands: [{ name: "x", wavelengthUnit: "K", wavelengths: [1, 2], response: [1, 1] }] }), "unit 'K' is a temperature"],
      [JSON.stringify({ format: "starlume-bands/1", bands: [{ name: "y", shape: "gaussian", center: "550", fwhm: "90 nm" }] }), `band 'y' (bands[0]): "center" must carry a unit`],
      [JSON.stringify({ format: "starlume-bands/1", bands: [{ name: "z", shape: "round", center: "550 nm" }] }), `"shape" must be "gaussian" or "top-hat"`],
    ];
    for (const [i, [content, message]] of cases.entries()) {
      const r = await runCli(["fit", "examples/demo-survey/photometry.csv", "--bands", write(`b${i}.json`, content)]);
      expect(r.code).toBe(2);
      expect(r.stderr).toContain(message);
    }
  });

  it("fits extinction when asked (A_V columns), and A_V ≈ 0 for the unreddened demo stars", async () => {
    const r = await runCli(["fit", "examples/demo-survey/photometry.csv", "--extinction", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRecords(r.stdout);
    for (const row of rows) {
      expect(row).toHaveProperty("av [mag]");
      // The demo data have no extinction: A_V is consistent with 0 within 3σ (or pinned at the A_V ≥ 0 limit).
      const av = Number(row["av [mag]"]);
      const s = Number(row["sigma(av) [mag]"]);
      expect(av === 0 || av < 3 * s).toBe(true);
    }
  });

  it("writes a report with one SED per star (up to --report-stars)", async () => {
    const dir = join(scratch, "report");
    const r = await runCli(["fit", "examples/demo-survey/photometry.csv", "--report", dir, "--report-stars", "3", "--quiet", "--format", "csv"]);
    expect(r.code).toBe(0);
    const html = readFileSync(join(dir, "index.html"), "utf8");
    expect(html.match(/<svg/g)).toHaveLength(3 + 2); // 3 SEDs, Planck family, T–L diagram
    expect(html).toContain("never point a telescope");
    expect(html).toContain("without warranty");
  });
});
