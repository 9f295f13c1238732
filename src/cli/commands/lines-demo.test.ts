import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { csvRecords, runCli } from "../test-util";
import { diracCentroidTransitionEnergySI, transitionEnergySI, transitionVacuumWavelengthSI } from "../../spectra/kernels/transitions";
import { vacuumToAirWavelengthSI } from "../../spectra/kernels/air-vacuum";
import { relativisticDopplerWavelengthSI } from "../../spectra/kernels/doppler";
import { H, C, EV } from "../../values/constants";
import { ALPHA_PARTICLE_MASS_KG, PROTON_MASS_KG as M_P } from "../../spectra/kernels/hydrogen-like";

const scratch = mkdtempSync(join(tmpdir(), "starlume-lines-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("starlume lines", () => {
  it("lists Balmer lines equal to the kernel values (Dirac centroid, vacuum)", async () => {
    const r = await runCli(["lines", "--count", "6", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRecords(r.stdout);
    expect(rows.map((x) => x.label)).toEqual(["Hα", "Hβ", "Hγ", "Hδ", "Hε", "Hζ"]);
    for (const row of rows) {
      const n2 = Number(row.n_upper);
      const e = diracCentroidTransitionEnergySI(2, n2, 1, M_P);
      // printed in nm and eV from the SI value: a unit conversion and a shortest round-trip decimal (1e-14)
      expect(rel(Number(row["wavelength [nm]"]), ((H * C) / e) * 1e9)).toBeLessThan(1e-14);
      expect(rel(Number(row["energy [eV]"]), e / EV)).toBeLessThan(1e-14);
      expect(rel(Number(row["wavenumber [cm^-1]"]), e / (H * C) / 100)).toBeLessThan(1e-14);
    }
    // Measured Hα, NIST ASD (from memory): 656.4614 nm in vacuum; the Dirac centroid is within 1e-5.
    expect(rel(Number(rows[0]?.["wavelength [nm]"]), 656.4614)).toBeLessThan(1e-5);
  });

  it("Bohr model, air, Doppler shift and He II follow the kernels", async () => {
    const r = await runCli(["lines", "--model", "bohr", "--medium", "air", "--velocity", "-25 km/s", "--count", "3", "--unit", "A", "--format", "csv"]);
    expect(r.code).toBe(0);
    for (const row of csvRecords(r.stdout)) {
      const vac = transitionVacuumWavelengthSI(2, Number(row.n_upper), 1, M_P);
      const air = vacuumToAirWavelengthSI(vac);
      expect(rel(Number(row["wavelength [A]"]), air * 1e10)).toBeLessThan(1e-14);
      expect(rel(Number(row["observed [A]"]), relativisticDopplerWavelengthSI(air, -25000) * 1e10)).toBeLessThan(1e-14);
      expect(row.medium).toBe("air");
    }
    const he = await runCli(["lines", "--ion", "HeII", "--series", "paschen", "--model", "bohr", "--count", "2", "--format", "json"]);
    const out = JSON.parse(he.stdout) as Record<string, unknown>[];
    expect(out[0]?.label).toBe("He II 3-4");
    expect(rel(Number(out[0]?.["energy [eV]"]), transitionEnergySI(3, 4, 2, ALPHA_PARTICLE_MASS_KG) / EV)).toBeLessThan(1e-14);
  });

  it("keeps lines without an air wavelength as rejected rows (exit 1)", async () => {
    const r = await runCli(["lines", "--series", "lyman", "--medium", "air", "--count", "2", "--limit", "--format", "csv"]);
    expect(r.code).toBe(1);
    const rows = csvRecords(r.stdout);
    expect(rows).toHaveLength(3);
    expect(rows.map((x) => x.status)).toEqual(["rejected", "rejected", "rejected"]);
    expect(rows[2]?.n_upper).toBe("inf");
    expect(rows[0]?.reason).toContain("outside the air formula's range");
    expect(r.stderr).toContain("lines: Lyα: rejected:");
  });

  it("draws a spectrum with the lines marked (SVG and report)", async () => {
    const r = await runCli(["lines", "--count", "5", "--svg", "balmer.svg", "--report", "rep", "--format", "csv"], { cwd: scratch });
    expect(r.code).toBe(0);
    const svg = readFileSync(join(scratch, "balmer.svg"), "utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    for (const label of ["Hα", "Hβ", "Hγ", "Hδ", "Hε"]) expect(svg).toContain(label);
    const html = readFileSync(join(scratch, "rep", "index.html"), "utf8");
    expect(html.match(/<svg/g)).toHaveLength(1);
    expect(html).toContain("solar filters");
  });

  it("options of docs/naming.md §9: --unit wavelength=UNIT equals a bare UNIT, -d is --digits, -q silences stderr, -v is gone", async () => {
    const bare = await runCli(["lines", "--count", "3", "--unit", "A", "--format", "csv"]);
    const keyed = await runCli(["lines", "--count", "3", "-u", "wavelength=A", "--format", "csv"]);
    expect(keyed.code).toBe(0);
    expect(keyed.stdout).toBe(bare.stdout);
    expect(keyed.stdout).toContain("wavelength [A]");
    const long = await runCli(["lines", "--count", "3", "--digits", "4", "--format", "table"]);
    const short = await runCli(["lines", "--count", "3", "-d", "4", "--format", "table"]);
    expect(short.stdout).toBe(long.stdout);
    expect(short.stdout).not.toBe((await runCli(["lines", "--count", "3", "--format", "table"])).stdout);
    const quiet = await runCli(["lines", "--series", "lyman", "--medium", "air", "--count", "2", "-q", "--format", "csv"]);
    expect(quiet.code).toBe(1); // -q silences the messages, not the exit code
    expect(quiet.stderr).toBe("");
    const v = await runCli(["lines", "-v", "-25 km/s"]);
    expect(v.code).toBe(2);
  });

  it("refuses a wavelength unit of the wrong kind and superluminal velocities (exit 2)", async () => {
    expect((await runCli(["lines", "--unit", "eV"])).code).toBe(2);
    expect((await runCli(["lines", "--velocity", "400000 km/s"])).code).toBe(2);
    expect((await runCli(["lines", "--velocity", "3 K"])).stderr).toContain("is a temperature");
  });
});

describe("starlume demo", () => {
  it("fits and solves the twelve demo stars and compares them with the truth", async () => {
    const r = await runCli(["demo", "--no-report", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRecords(r.stdout);
    expect(rows).toHaveLength(12);
    // column keys of docs/naming.md §8 and §2: reduced_chi2 (was chi2/dof), radius in Rsun and luminosity in Lsun (the legacy Rsol, Lsol)
    const keys = Object.keys(rows[0] ?? {});
    expect(keys).toContain("reduced_chi2");
    expect(keys).not.toContain("chi2/dof");
    expect(keys).toContain("radius [Rsun]");
    expect(keys).toContain("luminosity [Lsun]");
    for (const row of rows) expect(Number(row.reduced_chi2)).toBeGreaterThan(0);
    for (const row of rows) {
      expect(row.status).toBe("ok");
      // z = (fit − truth)/σ for a fair draw of the committed noise; 3σ (see fit.test.ts)
      expect(Math.abs(Number(row["z(teff)"]))).toBeLessThan(3);
      expect(Math.abs(Number(row["z(radius)"]))).toBeLessThan(3);
    }
    const text = await runCli(["demo", "--no-report"]);
    expect(text.stdout).toContain("Tallmere Plateau Observatory");
    expect(text.stdout).toMatch(/TLM-0812 +\d+ ± \d+/);
  });

  it("writes the report where asked and says where", async () => {
    const r = await runCli(["demo", "--report", "demo-report"], { cwd: scratch });
    expect(r.code).toBe(0);
    const path = join(scratch, "demo-report", "index.html");
    expect(r.stdout).toContain(`HTML report: ${path}`);
    const html = readFileSync(path, "utf8");
    expect(html.match(/<svg/g)).toHaveLength(12 + 2);
  });
});
