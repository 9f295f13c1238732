/**
 * The library core runs unchanged in a browser: examples/browser.ts is
 * bundled for the browser with esbuild (platform "browser", so any Node API
 * would fail to resolve), run in headless Chromium (Debian's package), and its
 * numbers must equal the same computation in Node exactly.
 *
 * Skips, saying why, when /usr/bin/chromium is absent (.ci/run installs it).
 */
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { build } from "esbuild";
import { describe, expect, test } from "vitest";
import nodeResults from "../../examples/browser";

const CHROMIUM = "/usr/bin/chromium";
const haveChromium = existsSync(CHROMIUM);

describe("the core in a browser", () => {
  test.skipIf(!haveChromium)("bundles for the browser and computes the same numbers in headless Chromium", async () => {
    const bundle = await build({
      entryPoints: ["examples/browser.ts"],
      bundle: true,
      platform: "browser",
      format: "iife",
      write: false,
      logLevel: "silent",
    });
    const js = bundle.outputFiles[0]?.text ?? "";
    expect(js).not.toMatch(/require\("(node:)?(fs|path|os|child_process)"\)/);
    const dir = mkdtempSync(join(tmpdir(), "starlume-browser-"));
    const page = join(dir, "index.html");
    writeFileSync(page, `<!doctype html><html><body><pre id="out">pending</pre><script>${js.replace(/<\/script/g, "<\\/script")}</script></body></html>`);
    const dom = execFileSync(
      CHROMIUM,
      [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        "--disable-quic",
        `--user-data-dir=${join(dir, "profile")}`,
        "--dump-dom",
        `file://${page}`,
      ],
      { encoding: "utf8", timeout: 60_000, stdio: ["ignore", "pipe", "ignore"] },
    );
    const m = /<pre id="out">([^<]*)<\/pre>/.exec(dom);
    expect(m, dom.slice(0, 500)).not.toBeNull();
    const inBrowser = JSON.parse((m as RegExpExecArray)[1] as string) as typeof nodeResults;
    expect(inBrowser.userAgent).toMatch(/Chrome/);
    // IEEE-754 arithmetic and the same code: the numbers must be identical
    expect(inBrowser.planckSI).toBe(nodeResults.planckSI);
    expect(inBrowser.planckCGS).toBe(nodeResults.planckCGS);
    expect(inBrowser.luminosityLsun).toBe(nodeResults.luminosityLsun);
    expect(inBrowser.parsed).toBe(nodeResults.parsed);
  }, 90_000);
  test.runIf(!haveChromium)("is skipped: /usr/bin/chromium is not installed (apt-get install -y chromium)", () => {
    expect(haveChromium).toBe(false);
  });
});
