// Adds up the runners' JSON reports into the one line scripts/test.sh ends with:
// "N passed, N failed". Type-check and lint count as one check each. Exits 1 on any failure.
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

const [reportDir, failedStepCount, ...checks] = process.argv.slice(2);
let passed = 0;
let failed = 0;

for (const check of checks) {
  const [, didFail] = check.split(":");
  if (didFail === "1") failed += 1;
  else passed += 1;
}

for (const name of ["unit.json", "integration.json"]) {
  const file = join(reportDir, name);
  if (!existsSync(file)) continue;
  const report = JSON.parse(readFileSync(file, "utf8"));
  passed += report.numPassedTests;
  failed += report.numFailedTests;
}

const e2eFile = join(reportDir, "e2e.json");
if (existsSync(e2eFile)) {
  const { stats } = JSON.parse(readFileSync(e2eFile, "utf8"));
  passed += stats.expected + stats.flaky;
  failed += stats.unexpected;
}

console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 || Number(failedStepCount) > 0 ? 1 : 0);
