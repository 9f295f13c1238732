// Reads vitest's JSON report and prints the one closing line CI looks for:
// "Tests: N passed, N failed". Exits 1 when the report is missing, when any
// test failed, or when no test ran.
import { existsSync, readFileSync } from "node:fs";

const file = process.argv[2] ?? ".vitest-report.json";
if (!existsSync(file)) {
  console.log("Tests: 0 passed, 1 failed");
  console.error(`no vitest report at ${file} (did the type-check fail before the tests ran?)`);
  process.exit(1);
}
const report = JSON.parse(readFileSync(file, "utf8"));
const passed = report.numPassedTests ?? 0;
const failed = report.numFailedTests ?? 0;
// a failed suite with no failed test means a test file could not even load
const brokenFiles = (report.testResults ?? []).filter((f) => f.status === "failed" && (f.assertionResults ?? []).every((a) => a.status !== "failed")).length;
console.log(`Tests: ${passed} passed, ${failed} failed`);
if (brokenFiles > 0) console.error(`${brokenFiles} test file(s) failed to load`);
process.exit(failed > 0 || brokenFiles > 0 || passed === 0 ? 1 : 0);
