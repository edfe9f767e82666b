// Adds up the test counts of the vitest and Playwright JSON reports into one closing line;
// each lint error counts as one failure.
import { existsSync, readFileSync } from "node:fs";

let passed = 0, failed = 0, skipped = 0;
for (const file of [".local/test-results/unit.json", ".local/test-results/integration.json", ".local/test-results/integration-s3.json"]) {
  if (!existsSync(file)) continue;
  const report = JSON.parse(readFileSync(file, "utf8"));
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
}
for (const file of [".local/test-results/e2e.json", ".local/test-results/e2e-s3.json"]) {
  if (!existsSync(file)) continue;
  const stats = JSON.parse(readFileSync(file, "utf8")).stats ?? {};
  passed += (stats.expected ?? 0) + (stats.flaky ?? 0);
  failed += stats.unexpected ?? 0;
  skipped += stats.skipped ?? 0;
}
if (existsSync(".local/test-results/lint.json")) {
  const lint = JSON.parse(readFileSync(".local/test-results/lint.json", "utf8"));
  failed += lint.errors ?? 0;
  console.log(`\nlint: ${lint.files} files, ${lint.errors} errors, ${lint.warnings} warnings in ${lint.seconds} s`);
}
console.log(`\nsummary: ${passed} passed, ${failed} failed, ${skipped} skipped`);
