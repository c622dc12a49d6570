// Prints the plain closing line CI reads ("N passed, N failed, N skipped") from vitest's JSON report.
import { readFileSync } from "node:fs";

const file = process.argv[2];
let report;
try {
  report = JSON.parse(readFileSync(file, "utf8"));
} catch {
  console.log("0 passed, 1 failed");
  process.exit(1);
}
const passed = report.numPassedTests ?? 0;
// A suite that fails to load has no tests but counts as a failure.
const failedSuites = (report.testResults ?? []).filter((r) => r.status === "failed" && (r.assertionResults ?? []).length === 0).length;
const failed = (report.numFailedTests ?? 0) + failedSuites;
const skipped = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
