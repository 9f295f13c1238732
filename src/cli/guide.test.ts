import { mkdtempSync, readFileSync, rmSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { REPO_ROOT, runCli } from "./test-util";

/** Split a shell command line into words (double and single quotes; no escapes or expansions). */
function shellWords(line: string): string[] {
  const words: string[] = [];
  const re = /"([^"]*)"|'([^']*)'|(\S+)/g;
  for (let m = re.exec(line); m !== null; m = re.exec(line)) words.push(m[1] ?? m[2] ?? m[3] ?? "");
  return words;
}

/** The `starlume …` lines of the guide's ```sh blocks, with the exit code a trailing `# exit N` expects. */
function guideExamples(): { line: string; argv: string[]; exit: number }[] {
  const text = readFileSync(join(REPO_ROOT, "docs/guides/command-line.md"), "utf8");
  const out: { line: string; argv: string[]; exit: number }[] = [];
  for (const block of text.matchAll(/```sh\n([\s\S]*?)```/g)) {
    for (const raw of (block[1] ?? "").split("\n")) {
      const line = raw.trim();
      if (!line.startsWith("starlume ")) continue;
      const [cmd = "", comment = ""] = line.split(/\s+#\s*/);
      const exit = /^exit (\d)/.exec(comment);
      out.push({ line, argv: shellWords(cmd).slice(1), exit: exit !== null ? Number(exit[1]) : 0 });
    }
  }
  return out;
}

describe("docs/guides/command-line.md: every example runs as documented", () => {
  const scratch = mkdtempSync(join(tmpdir(), "starlume-guide-"));
  symlinkSync(join(REPO_ROOT, "examples"), join(scratch, "examples"));
  afterAll(() => rmSync(scratch, { recursive: true, force: true }));
  const examples = guideExamples();
  it("has examples for every command", () => {
    for (const c of ["solve", "fit", "planck", "convert", "lines", "demo"]) {
      expect(examples.some((e) => e.argv[0] === c)).toBe(true);
    }
  });
  for (const e of examples) {
    it(e.line, async () => {
      const r = await runCli(e.argv, { cwd: scratch });
      expect(r.code, r.stderr).toBe(e.exit);
      if (e.exit === 2) expect(r.stderr).toContain("error");
      else expect(r.stdout.length + r.stderr.length).toBeGreaterThan(0);
    }, 60_000);
  }
});
