// Installs the runtimes of test/runtimes/runtimes.json (exact versions of
// packages from the npm registry: node, deno, bun) into .runtimes/NAME/, one
// private prefix each, so none of them shadows the `node` that runs npm.
// Kept out of devDependencies: they are large and only the runtime smoke
// tests (test/runtimes/packed.test.ts) use them. A runtime that fails to
// install is reported and left out; its tests then skip and say so.
//
//   node scripts/install-runtimes.mjs           install what is missing
//   node scripts/install-runtimes.mjs deno bun  only these
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";

const root = resolve(import.meta.dirname, "..");
const pins = JSON.parse(readFileSync(join(root, "test/runtimes/runtimes.json"), "utf8"));
const wanted = process.argv.slice(2);
const npm = process.platform === "win32" ? "npm.cmd" : "npm";
let failures = 0;

for (const [name, pin] of Object.entries(pins)) {
  if (name.startsWith("$") || (wanted.length > 0 && !wanted.includes(name))) continue;
  const dir = join(root, ".runtimes", name);
  const bin = join(dir, "node_modules", ".bin", pin.bin);
  const stamp = join(dir, "installed.txt");
  const spec = `${pin.package}@${pin.version}`;
  if (existsSync(bin) && existsSync(stamp) && readFileSync(stamp, "utf8").trim() === spec) {
    console.log(`runtimes: ${name}: ${spec} already installed`);
    continue;
  }
  mkdirSync(dir, { recursive: true });
  // The node package's install script fetches its platform's binary (another
  // npm package): approve that one script, the others need none.
  const allowScripts = pin.package === "node" ? { node: true } : {};
  writeFileSync(
    join(dir, "package.json"),
    `${JSON.stringify({ name: `starlume-runtime-${name}`, private: true, allowScripts })}\n`,
  );
  const started = Date.now();
  try {
    execFileSync(npm, ["install", "--no-audit", "--no-fund", "--save-exact", "--loglevel=error", spec], {
      cwd: dir,
      stdio: ["ignore", "inherit", "inherit"],
      timeout: 600_000,
    });
    const version = execFileSync(bin, ["--version"], { encoding: "utf8", timeout: 60_000 }).trim().split("\n")[0];
    writeFileSync(stamp, `${spec}\n`);
    console.log(`runtimes: ${name}: ${spec} installed (${version}) in ${((Date.now() - started) / 1000).toFixed(0)} s`);
  } catch (e) {
    failures++;
    console.log(`runtimes: ${name}: could not install ${spec} (${String(e.message).split("\n")[0]}); its smoke tests will skip`);
  }
}
// Missing runtimes make their tests skip (and say so); never fail CI here.
if (failures > 0) console.log(`runtimes: ${failures} runtime(s) not installed`);
