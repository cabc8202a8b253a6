// Prints one plain closing line, "N passed, N failed, N skipped", from the vitest and Playwright JSON
// reports of this run (CI reads that line).
import fs from "node:fs";
import path from "node:path";

const dir = process.argv[2] ?? ".run";
let passed = 0,
  failed = 0,
  skipped = 0;
for (const f of fs.readdirSync(dir).filter((n) => n.startsWith("results-") && n.endsWith(".json"))) {
  const data = JSON.parse(fs.readFileSync(path.join(dir, f), "utf8"));
  if (typeof data.numPassedTests === "number") {
    passed += data.numPassedTests;
    failed += data.numFailedTests + (data.numRuntimeErrorTests ?? 0);
    skipped += (data.numPendingTests ?? 0) + (data.numTodoTests ?? 0);
  } else if (data.stats) {
    passed += data.stats.expected + (data.stats.flaky ?? 0);
    failed += data.stats.unexpected;
    skipped += data.stats.skipped;
  }
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 ? 1 : 0);
