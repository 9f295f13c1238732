import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { csvRecords, csvRows, runCli } from "../test-util";
import { planckRadianceFrequencySI, planckRadianceWavelengthSI } from "../../radiation/kernels/planck";

const scratch = mkdtempSync(join(tmpdir(), "starlume-planck-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

// Tolerances: the tool converts the kernel's SI value to the requested unit (one or two correctly
// rounded operations) and prints the shortest round-trip decimal, so 1e-14 relative covers it.
const TOL = 1e-14;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("starlume planck", () => {
  it("tabulates B_λ in the requested units, equal to the kernel", async () => {
    const r = await runCli(["planck", "-T", "5772,10000", "--from", "300 nm", "--to", "2 um", "--points", "7", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRecords(r.stdout);
    expect(rows).toHaveLength(7);
    expect(Object.keys(rows[0] ?? {})).toEqual(["wavelength [nm]", "radiance_5772K [W m^-2 sr^-1 nm^-1]", "radiance_10000K [W m^-2 sr^-1 nm^-1]"]);
    expect(Number(rows[0]?.["wavelength [nm]"])).toBe(300);
    expect(Number(rows[6]?.["wavelength [nm]"])).toBe(2000);
    for (const row of rows) {
      const l = Number(row["wavelength [nm]"]) * 1e-9;
      // kernel in W m^-2 sr^-1 m^-1; per nm is 1e-9 of it
      expect(rel(Number(row["radiance_5772K [W m^-2 sr^-1 nm^-1]"]), planckRadianceWavelengthSI(l, 5772) * 1e-9)).toBeLessThan(1e-12);
      expect(rel(Number(row["radiance_10000K [W m^-2 sr^-1 nm^-1]"]), planckRadianceWavelengthSI(l, 10000) * 1e-9)).toBeLessThan(1e-12);
    }
  });

  it("exitance per frequency in CGS is π B_ν × 10³ (W → erg s⁻¹, m⁻² → cm⁻²)", async () => {
    const r = await runCli(["planck", "-T", "3000 K", "--axis", "frequency", "--quantity", "exitance", "--system", "CGS", "--axis-unit", "THz", "--points", "4", "--format", "csv"]);
    expect(r.code).toBe(0);
    const rows = csvRows(r.stdout);
    expect(rows[0]).toEqual(["frequency [THz]", "exitance_3000K [erg s^-1 cm^-2 Hz^-1]"]);
    for (const [nu, v] of rows.slice(1)) {
      expect(rel(Number(v), Math.PI * planckRadianceFrequencySI(Number(nu) * 1e12, 3000) * 1e3)).toBeLessThan(1e-12);
    }
  });

  it("refuses a value unit of the wrong kind with a hint, and missing temperatures (exit 2)", async () => {
    const a = await runCli(["planck", "-T", "5772", "--value-unit", "W m^-2 nm^-1"]);
    expect(a.code).toBe(2);
    expect(a.stderr).toContain("use --quantity exitance");
    const b = await runCli(["planck", "-T", "5772", "--axis-unit", "Hz"]);
    expect(b.code).toBe(2);
    expect(b.stderr).toContain("--axis-unit: unit 'Hz' is a frequency");
    const c = await runCli(["planck"]);
    expect(c.code).toBe(2);
    expect(c.stderr).toContain("--temperature is required");
    const d = await runCli(["planck", "-T", "5772 m"]);
    expect(d.code).toBe(2);
    expect(d.stderr).toContain("is a length");
    const e = await runCli(["planck", "-T", "5772", "--from", "2 um", "--to", "1 um"]);
    expect(e.code).toBe(2);
  });

  it("writes an SVG family of curves", async () => {
    const r = await runCli(["planck", "-T", "3000,6000", "--svg", "fam.svg"], { cwd: scratch });
    expect(r.code).toBe(0);
    expect(r.stdout).toBe("");
    const svg = readFileSync(join(scratch, "fam.svg"), "utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain("3000 K");
    expect(svg).toContain("6000 K");
  });
});

describe("starlume convert", () => {
  it("converts the documented example exactly (a power-of-ten factor: one rounding)", async () => {
    const r = await runCli(["convert", "3.6e-13 erg s^-1 cm^-2 A^-1", "W m^-2 nm^-1"]);
    expect(r.code).toBe(0);
    // 1 erg s^-1 cm^-2 Å^-1 = 1e-7 W / (1e-4 m² · 0.1 nm) = 1e-2 W m^-2 nm^-1 (exact by definition)
    expect(r.stdout).toBe("3.6e-15 W m^-2 nm^-1\n");
  });

  it("converts to SI and CGS coherent units, with named units where they exist", async () => {
    expect((await runCli(["convert", "1 Lsun", "CGS"])).stdout).toBe("3.828e33 erg s^-1\n"); // IAU 2015 B3 nominal L☉
    expect((await runCli(["convert", "1 au", "SI"])).stdout).toBe("149597870700 m\n"); // IAU 2012 B2, exact
    expect((await runCli(["convert", "1 pc", "ly", "--digits", "6"])).stdout).toBe("3.26156 ly\n");
    expect((await runCli(["convert", "1500 mas", "arcsec", "--number"])).stdout).toBe("1.5\n");
  });

  it("refuses a change of kind with both kinds named (exit 2)", async () => {
    const r = await runCli(["convert", "500 nm", "THz"]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toContain("'nm' is a length (L) but 'THz' is a frequency (T-1)");
    expect(r.stderr).toContain("ν = c/λ");
    const f = await runCli(["convert", "1 Jy", "erg s^-1 cm^-2 A^-1"]);
    expect(f.code).toBe(2);
    expect(f.stderr).toContain("depends on the wavelength");
    const u = await runCli(["convert", "5 furlong", "m"]);
    expect(u.code).toBe(2);
    expect(u.stderr).toContain(`unknown unit "furlong"`);
    const n = await runCli(["convert", "fast", "m"]);
    expect(n.code).toBe(2);
    expect(n.stderr).toContain("expected a number");
    const one = await runCli(["convert", "1 m"]);
    expect(one.code).toBe(2);
  });
});
