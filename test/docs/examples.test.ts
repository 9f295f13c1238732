/**
 * Every ```ts example in the README, the guides and the TSDoc of the public modules
 * must compile against the library. The examples are written to a cache
 * folder with `from "starlume"` pointed at src/index.ts and type-checked in
 * one TypeScript program; each example is one test.
 */
import { mkdirSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { describe, expect, test } from "vitest";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "../..");
const cache = join(root, "node_modules/.cache/starlume-examples");

interface Example {
  where: string;
  code: string;
}

function walk(dir: string, out: string[]): void {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) {
      // kernels, internal helpers and the command-line tool are not library API
      if (name === "kernels" || name === "internal" || name === "cli") continue;
      walk(p, out);
    } else if (p.endsWith(".ts") && !p.endsWith(".test.ts") && !p.endsWith(".test-util.ts")) out.push(p);
  }
}

function blocks(text: string, file: string, inComments: boolean): Example[] {
  const out: Example[] = [];
  const lines = text.split("\n");
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i] as string;
    const strip = (l: string) => (inComments ? l.replace(/^\s*\*\s?/, "") : l);
    if (/^```ts\b/.test(strip(line).trim()) && (!inComments || /^\s*\*/.test(line))) {
      const start = i + 1;
      // a guide block opened with ```ts continued is checked together with the block before it
      const continued = /^```ts\s+continued\b/.test(strip(line).trim()) ? out[out.length - 1] : undefined;
      const body: string[] = continued === undefined ? [] : [continued.code];
      i++;
      while (i < lines.length && strip(lines[i] as string).trim() !== "```") {
        body.push(strip(lines[i] as string));
        i++;
      }
      out.push({ where: `${relative(root, file)}:${start}`, code: body.join("\n") });
    }
  }
  return out;
}

const sources: string[] = [];
walk(join(root, "src"), sources);
const examples: Example[] = [];
examples.push(...blocks(readFileSync(join(root, "README.md"), "utf8"), join(root, "README.md"), false));
for (const name of readdirSync(join(root, "docs/guides")).filter((n) => n.endsWith(".md")).sort()) {
  const file = join(root, "docs/guides", name);
  examples.push(...blocks(readFileSync(file, "utf8"), file, false));
}
for (const f of sources) {
  const text = readFileSync(f, "utf8");
  // only TSDoc examples (blocks inside /** … */ after an @example tag)
  const tsdoc = text.replace(/```ts[\s\S]*?```/g, (m, offset: number) => {
    const before = text.slice(Math.max(0, offset - 400), offset);
    return /@example\s*(\n\s*\*\s*)*$/.test(before) ? m : m.replace(/```ts/, "```text");
  });
  examples.push(...blocks(tsdoc, f, true));
}

rmSync(cache, { recursive: true, force: true });
mkdirSync(cache, { recursive: true });
const indexPath = join(root, "src/index").replace(/\\/g, "/");
const files = examples.map((ex, i) => {
  const file = join(cache, `example_${i}.ts`);
  const code = ex.code.replace(/from\s+"starlume"/g, `from "${indexPath}"`);
  writeFileSync(file, `${code}\nexport {};\n`);
  return file;
});

const config = ts.readConfigFile(join(root, "tsconfig.json"), ts.sys.readFile);
const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, root);
const program = ts.createProgram(files, { ...parsed.options, noEmit: true, noUnusedLocals: false });
const diagnosticsByFile = new Map<string, string[]>();
for (const d of ts.getPreEmitDiagnostics(program)) {
  const name = d.file?.fileName ?? "";
  const list = diagnosticsByFile.get(name) ?? [];
  list.push(ts.flattenDiagnosticMessageText(d.messageText, "\n"));
  diagnosticsByFile.set(name, list);
}

describe("documentation examples compile", () => {
  test("there are examples to check", () => {
    expect(examples.length).toBeGreaterThan(50);
  });
  examples.forEach((ex, i) => {
    test(ex.where, () => {
      const file = (files[i] as string).replace(/\\/g, "/");
      const errs = [...diagnosticsByFile.entries()].filter(([k]) => k.replace(/\\/g, "/") === file).flatMap(([, v]) => v);
      expect(errs, ex.code).toEqual([]);
    });
  });
});
