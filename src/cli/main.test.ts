import { mkdtempSync, readFileSync, rmSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { COMMANDS, toolHelp } from "./main";
import { REPO_ROOT, runCli } from "./test-util";

describe("starlume: help, version, usage errors", () => {
  it("--help lists every command and the exit codes, exit 0", async () => {
    const r = await runCli(["--help"]);
    expect(r.code).toBe(0);
    for (const c of COMMANDS) expect(r.stdout).toContain(`  ${c.name} `);
    expect(r.stdout).toContain("Exit codes:");
    expect(r.stdout).toMatch(/1 +some rows were rejected/);
    expect(r.stdout).toMatch(/2 +usage error/);
    expect(r.stdout).toBe(toolHelp());
  });

  it("--version prints the version in package.json", async () => {
    const pkg = JSON.parse(readFileSync(join(REPO_ROOT, "package.json"), "utf8")) as { version: string };
    const r = await runCli(["--version"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(`starlume ${pkg.version}\n`);
    expect((await runCli(["-V"])).stdout).toBe(r.stdout);
  });

  it("no command: overview on stderr, exit 2", async () => {
    const r = await runCli([]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toContain("no command given");
  });

  it("unknown command and unknown option: exit 2 with a message naming them", async () => {
    const a = await runCli(["frobnicate"]);
    expect(a.code).toBe(2);
    expect(a.stderr).toContain("unknown command 'frobnicate'");
    const b = await runCli(["convert", "--bogus", "1 m", "km"]);
    expect(b.code).toBe(2);
    expect(b.stderr).toContain("unknown option --bogus for 'convert'");
    const c = await runCli(["planck", "-T", "5772", "--axis", "sideways"]);
    expect(c.code).toBe(2);
    expect(c.stderr).toContain("--axis must be one of wavelength, frequency; got 'sideways'");
    const d = await runCli(["planck", "-T"]);
    expect(d.code).toBe(2);
    expect(d.stderr).toContain("option --temperature needs a value");
  });

  for (const c of COMMANDS) {
    it(`${c.name} --help: usage, options, examples, exit codes`, async () => {
      const r = await runCli([c.name, "--help"]);
      expect(r.code).toBe(0);
      expect(r.stdout).toContain(`Usage: starlume ${c.name}`);
      expect(r.stdout).toContain("Options:");
      expect(r.stdout).toContain("Examples:");
      expect(r.stdout).toContain("Exit codes:");
      for (const o of c.options) expect(r.stdout).toContain(`--${o.name}`);
      expect((await runCli(["help", c.name])).stdout).toBe(r.stdout);
    });
  }

  // docs/naming.md §10: each command's help lists only the exit codes it can return.
  const expected: Record<string, readonly number[]> = { solve: [0, 1, 2, 3, 4], fit: [0, 1, 2, 3, 4], planck: [0, 2, 3, 4], lines: [0, 1, 2, 3, 4], convert: [0, 2, 3, 4], demo: [0, 1, 2, 3, 4] };
  for (const c of COMMANDS) {
    it(`${c.name} --help lists exactly the exit codes ${c.name} can return`, async () => {
      expect(c.exitCodes.map((e) => e.code)).toEqual(expected[c.name]);
      const help = (await runCli([c.name, "--help"])).stdout;
      const block = help.slice(help.indexOf("Exit codes:"));
      const listed = [...block.matchAll(/^ {2}(\d) {2}/gm)].map((m) => Number(m[1]));
      expect(listed).toEqual(expected[c.name]);
      // a command that cannot reject rows never returns 1: its source does not name the code
      const source = readFileSync(join(REPO_ROOT, "src/cli/commands", `${c.name}.ts`), "utf8");
      const returnsRejected = /EXIT\.ROWS_REJECTED|runTableCommand\(/.test(source);
      expect(returnsRejected).toBe(expected[c.name]?.includes(1));
    });
  }
  it("starlume --help keeps the general table of all five codes", () => {
    const block = toolHelp().slice(toolHelp().indexOf("Exit codes:"));
    expect([...block.matchAll(/^ {2}(\d) {2}/gm)].map((m) => Number(m[1]))).toEqual([0, 1, 2, 3, 4]);
  });
});

describe("every example in the help texts runs", () => {
  // Examples use paths relative to the repository (examples/demo-survey/…) and may
  // write files (planck.svg): run them in a scratch directory that links to examples/.
  const scratch = mkdtempSync(join(tmpdir(), "starlume-examples-"));
  symlinkSync(join(REPO_ROOT, "examples"), join(scratch, "examples"));
  afterAll(() => rmSync(scratch, { recursive: true, force: true }));
  for (const c of COMMANDS) {
    for (const e of c.examples) {
      it(`starlume ${c.name} ${e.args.join(" ")}`, async () => {
        const r = await runCli([c.name, ...e.args], { cwd: scratch });
        expect(r.stderr).not.toContain("error");
        expect(r.code).toBe(0);
        expect(r.stdout.length + r.stderr.length).toBeGreaterThan(0);
      }, 60_000);
    }
  }
});
