/**
 * End to end: run `starlume demo`, open its HTML report in headless Chromium
 * and check that every figure drew (a non-zero bounding box, with drawn
 * marks inside). Needs /usr/bin/chromium (Debian's `chromium` package);
 * without it the test is skipped with a message.
 *
 * The report itself carries no script (htmlReport refuses scripting); the
 * test writes a copy with a small inline script that measures each <svg>
 * and writes the numbers into the page, then reads them from Chromium's
 * --dump-dom output.
 */
import { execFile } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { promisify } from "node:util";
import { afterAll, describe, expect, it } from "vitest";
import { runCli } from "../../src/cli/test-util";

const CHROMIUM = "/usr/bin/chromium";
const HAVE_CHROMIUM = existsSync(CHROMIUM);
const run = promisify(execFile);

if (!HAVE_CHROMIUM) {
  console.warn(`test/e2e/report.test.ts: skipped — ${CHROMIUM} is not installed (apt-get install chromium)`);
}

const MEASURE = `<pre id="measure"></pre>
<script>
const main = document.querySelector("main").getBoundingClientRect();
const figures = [...document.querySelectorAll("figure svg")].map((svg) => {
  const r = svg.getBoundingClientRect();
  const cap = svg.closest("figure").querySelector("figcaption").getBoundingClientRect();
  const marks = [...svg.querySelectorAll("path, circle, line, rect, polyline")];
  const drawn = marks.filter((m) => { const b = m.getBBox(); return b.width > 0 || b.height > 0; }).length;
  const subs = svg.querySelectorAll("tspan").length;
  return { w: r.width, h: r.height, left: r.left - main.left, right: main.right - r.right, capW: cap.width, capLeft: cap.left - r.left, marks: marks.length, drawn, subs, title: svg.querySelector("title")?.textContent ?? "" };
});
const cell = document.querySelector("td");
const wrap = document.querySelector(".table-wrap");
const table = { whiteSpace: getComputedStyle(cell).whiteSpace, rowH: cell.getBoundingClientRect().height, overflowX: getComputedStyle(wrap).overflowX, subs: document.querySelectorAll("th sub").length, caption: document.querySelector("caption")?.textContent ?? "" };
document.getElementById("measure").textContent = "MEASURE" + JSON.stringify({ figures, table }) + "END";
</script>
</body>`;

function chromiumArgs(profile: string): string[] {
  return [
    "--headless",
    "--no-sandbox",
    "--disable-gpu",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
    "--no-first-run",
    "--disable-quic",
    `--user-data-dir=${profile}`,
  ];
}

describe.skipIf(!HAVE_CHROMIUM)(`demo report in headless Chromium${HAVE_CHROMIUM ? "" : ` (skipped: ${CHROMIUM} not installed)`}`, () => {
  const dir = mkdtempSync(join(tmpdir(), "starlume-e2e-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("every figure of the demo report draws with a non-zero size", async () => {
    const r = await runCli(["demo", "--report", "report"], { cwd: dir });
    expect(r.code).toBe(0);
    const html = readFileSync(join(dir, "report", "index.html"), "utf8");
    expect(html).not.toContain("<script");
    const page = join(dir, "report", "measure.html");
    writeFileSync(page, html.replace("</body>", MEASURE));
    const { stdout } = await run(CHROMIUM, [...chromiumArgs(join(dir, "profile")), "--window-size=1200,2000", "--dump-dom", `file://${page}`], {
      timeout: 90_000,
      maxBuffer: 64 << 20,
    });
    const m = /MEASURE(.*?)END/s.exec(stdout);
    expect(m, "Chromium ran the measuring script").not.toBeNull();
    const measured = JSON.parse((m?.[1] ?? "{}").replace(/&amp;/g, "&").replace(/&lt;/g, "<").replace(/&gt;/g, ">")) as {
      figures: { w: number; h: number; left: number; right: number; capW: number; capLeft: number; marks: number; drawn: number; subs: number; title: string }[];
      table: { whiteSpace: string; rowH: number; overflowX: string; subs: number; caption: string };
    };
    const figures = measured.figures;
    // 12 SEDs (one per demo star), the Planck family, the temperature–luminosity diagram
    expect(figures).toHaveLength(14);
    for (const f of figures) {
      expect(f.w, f.title).toBeGreaterThan(200);
      expect(f.h, f.title).toBeGreaterThan(150);
      expect(f.drawn, f.title).toBeGreaterThan(10);
      // Centred in the page column (to a pixel), caption no wider than the figure and aligned with it.
      expect(Math.abs(f.left - f.right), f.title).toBeLessThan(1.5);
      expect(f.capW, f.title).toBeLessThanOrEqual(f.w + 0.5);
      expect(Math.abs(f.capLeft), f.title).toBeLessThan(1);
      // Subscripts (f_λ, B_λ, T_eff) are drawn as shifted tspans, never as literal underscores.
      expect(f.subs, f.title).toBeGreaterThan(0);
    }
    // Each SED's title carries T ± σ and the fit quality.
    expect(figures.filter((f) => /^TLM-\d{4}: T = \d+(\.\d+)? ± \d+(\.\d+)? K, χ²\/dof = /.test(f.title))).toHaveLength(12);
    // Table: cells on one line (one text line per row), sideways scrolling, sub/superscripts in headers, a caption.
    expect(measured.table.whiteSpace).toBe("nowrap");
    expect(measured.table.rowH).toBeLessThan(40);
    expect(measured.table.overflowX).toBe("auto");
    expect(measured.table.subs).toBeGreaterThanOrEqual(4); // T_eff ×3, R☉ ×2, L☉
    expect(measured.table.caption).toContain("z = (fit − truth)/σ");
    expect(html).not.toMatch(/[fB]_λ|T_eff/); // no literal underscores left in the page
  }, 180_000);

  it("takes a screenshot of the report", async () => {
    const png = join(dir, "report.png");
    const page = join(dir, "report", "index.html");
    if (!existsSync(page)) await runCli(["demo", "--report", "report"], { cwd: dir });
    await run(CHROMIUM, [...chromiumArgs(join(dir, "profile2")), "--window-size=1200,2000", `--screenshot=${png}`, `file://${page}`], { timeout: 90_000 });
    const head = readFileSync(png).subarray(0, 8);
    expect([...head]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature
    expect(statSync(png).size).toBeGreaterThan(20_000);
  }, 180_000);
});
