// Applies the mechanical part of scripts/renames.json to the working tree:
// every entry whose note is not marked SCOPED or MERGE and that is not a CLI
// option or column, replaced on identifier boundaries in source, tests,
// benches, examples, scripts and docs. The scoped entries are done by hand
// (their notes say where). Idempotent: running it twice changes nothing more.
//
//   node scripts/apply-renames.mjs            # apply
//   node scripts/apply-renames.mjs --dry-run  # list files that would change
import { readFileSync, writeFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";

const dry = process.argv.includes("--dry-run");
const renames = JSON.parse(readFileSync("scripts/renames.json", "utf8")).filter(
  (r) => !/SCOPED|MERGE/.test(r.note ?? "") && !r.kind.startsWith("cli"),
);
// longest first, so that a name containing another is replaced whole
renames.sort((a, b) => b.from.length - a.from.length);
const roots = ["src", "test", "bench", "examples", "scripts", "docs/guides", "README.md", "DEVELOPERS.md"];
const skip = /node_modules|docs\/api|\.json$|renames|apply-renames|fixtures\//;
const files = [];
function walk(p) {
  if (skip.test(p)) return;
  const s = statSync(p, { throwIfNoEntry: false });
  if (s === undefined) return;
  if (s.isDirectory()) for (const n of readdirSync(p)) walk(join(p, n));
  else if (/\.(ts|mts|mjs|js|md)$/.test(p)) files.push(p);
}
roots.forEach(walk);
const patterns = renames.map((r) => ({ re: new RegExp(`(?<![A-Za-z0-9_$])${r.from.replace(/[$]/g, "\\$")}(?![A-Za-z0-9_$])`, "g"), to: r.to }));
let changed = 0;
for (const f of files) {
  const text = readFileSync(f, "utf8");
  // Lines that name a legacy spelling on purpose (parser aliases, their tests
  // and docs) say "legacy" or "0.1 spelling" and are left alone, so that a
  // second run changes nothing.
  const out = text
    .split("\n")
    .map((line) => {
      if (/legacy|0\.1 spelling/i.test(line)) return line;
      let l = line;
      for (const { re, to } of patterns) l = l.replace(re, to);
      return l;
    })
    .join("\n");
  if (out !== text) {
    changed++;
    if (dry) console.log(f);
    else writeFileSync(f, out);
  }
}
console.log(`${dry ? "would change" : "changed"} ${changed} of ${files.length} files (${renames.length} renames)`);
