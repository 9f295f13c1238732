/**
 * Streaming memory demonstration for the CSV reader and writer.
 *
 * Generates 10⁶ CSV rows on the fly into a temporary file (with quoted
 * multi-line fields every 100th row), then streams the file through
 * `readCsv` → `CsvWriter` → /dev/null, sampling the resident set size (RSS)
 * every 20 ms and at row 10⁴. If the pipeline buffered the file, the peak
 * would grow with the file size (~60 MB of text → hundreds of MB of strings);
 * with streaming it stays near the value seen after 10⁴ rows.
 *
 * Run: `npx tsx scripts/stream-memory-check.ts [rows]`
 */
import { createReadStream, createWriteStream, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { once } from "node:events";
import { readCsv } from "../src/cli/io/csv-read";
import { CsvWriter, TextOut } from "../src/cli/io/write";

const rows = Number(process.argv[2] ?? 1_000_000);
const mib = (b: number): string => `${(b / 1048576).toFixed(1)} MiB`;

async function generate(path: string): Promise<void> {
  const ws = createWriteStream(path, { encoding: "utf8" });
  const out = new TextOut(ws, { closeSink: true });
  const w = new CsvWriter(out);
  await w.writeRow(["star", "ra [deg]", "dec [deg]", "teff [K]", "sigma(teff) [K]", "note"]);
  for (let i = 0; i < rows; i++) {
    const note = i % 100 === 0 ? `checked, "twice"\nsee log ${i}` : "";
    await w.writeRow([`HD${i}`, (i * 0.000359) % 360, ((i * 0.00017) % 180) - 90, 3000 + (i % 20000), 5 + (i % 50) / 10, note]);
  }
  await w.end();
}

async function main(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), "starlume-mem-"));
  const path = join(dir, "rows.csv");
  try {
    const t0 = performance.now();
    await generate(path);
    const size = statSync(path).size;
    console.log(`generated ${rows.toLocaleString("en-US")} rows, ${mib(size)} in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

    const rssStart = process.memoryUsage().rss;
    let peak = rssStart;
    const timer = setInterval(() => {
      peak = Math.max(peak, process.memoryUsage().rss);
    }, 20);
    const sink = createWriteStream("/dev/null");
    const writer = new CsvWriter(new TextOut(sink, { closeSink: true }));
    let n = 0;
    let errors = 0;
    let rssAt1e4 = 0;
    const t1 = performance.now();
    for await (const item of readCsv(createReadStream(path, { encoding: "utf8" }))) {
      if (item.kind === "error") {
        errors++;
        continue;
      }
      await writer.writeRow(item.fields);
      n++;
      if (n === 10_001) {
        rssAt1e4 = process.memoryUsage().rss;
        peak = Math.max(peak, rssAt1e4);
      }
    }
    await writer.end();
    if (!sink.closed) await once(sink, "close");
    clearInterval(timer);
    const rssEnd = process.memoryUsage().rss;
    peak = Math.max(peak, rssEnd);
    const secs = (performance.now() - t1) / 1000;
    console.log(`streamed ${(n - 1).toLocaleString("en-US")} data rows (+ header), ${errors} rejected, in ${secs.toFixed(1)} s (${Math.round((n / secs)).toLocaleString("en-US")} rows/s)`);
    console.log(`RSS before streaming : ${mib(rssStart)}`);
    console.log(`RSS after 1e4 rows   : ${mib(rssAt1e4)}`);
    console.log(`peak RSS (sampled)   : ${mib(peak)}`);
    console.log(`RSS at end           : ${mib(rssEnd)}`);
    console.log(`file size            : ${mib(size)}`);
    console.log(`peak − after-1e4     : ${mib(peak - rssAt1e4)}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
