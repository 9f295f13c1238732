/**
 * Locating the package's own files at run time (package.json for
 * `--version`, the demo survey), relative to this module, so the tool works
 * from the source tree (`tsx src/cli/bin.ts`) and from a bundle alike.
 *
 * @module
 */
import { existsSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

let cachedRoot: string | null | undefined;

/** The directory holding starlume's package.json, searching upwards from this module; null if not found. */
export function packageRoot(): string | null {
  if (cachedRoot !== undefined) return cachedRoot;
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 8; i++) {
    const p = join(dir, "package.json");
    if (existsSync(p)) {
      try {
        const pkg = JSON.parse(readFileSync(p, "utf8")) as { name?: unknown };
        if (pkg.name === "starlume") return (cachedRoot = dir);
      } catch {
        /* not ours; keep looking */
      }
    }
    const up = dirname(dir);
    if (up === dir) break;
    dir = up;
  }
  return (cachedRoot = null);
}

/** The version in starlume's package.json ("unknown" if it cannot be read). */
export function packageVersion(): string {
  const root = packageRoot();
  if (root === null) return "unknown";
  try {
    const pkg = JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as { version?: unknown };
    return typeof pkg.version === "string" ? pkg.version : "unknown";
  } catch {
    return "unknown";
  }
}

/** The demo survey directory (examples/demo-survey), or null when the package ships without it. */
export function demoSurveyDir(): string | null {
  const root = packageRoot();
  if (root === null) return null;
  const dir = join(root, "examples", "demo-survey");
  return existsSync(join(dir, "photometry.csv")) ? dir : null;
}
