// Prints the closing line CI reads, "N passed, N failed", summed over Vitest, Playwright and the
// script's other steps (type-check, lint, build, …), and exits non-zero when anything failed.
import { existsSync, readFileSync } from "node:fs";

let passed = 0;
let failed = 0;

function readJson(path) {
  return existsSync(path) ? JSON.parse(readFileSync(path, "utf8")) : undefined;
}

const vitest = readJson("test-results/vitest.json");
if (vitest) {
  passed += vitest.numPassedTests;
  failed += vitest.numFailedTests;
}

const playwright = readJson("test-results/playwright.json");
if (playwright) {
  passed += playwright.stats.expected;
  failed += playwright.stats.unexpected + playwright.stats.flaky;
}

// A step that failed counts once (a failed build also means Playwright never ran).
const steps = existsSync("test-results/steps.txt") ? readFileSync("test-results/steps.txt", "utf8").trim().split("\n") : [];
const failedSteps = steps.filter((line) => line.endsWith(" failed"));
for (const line of failedSteps) console.log(`step ${line}`);
failed += failedSteps.length;
if (!vitest || !playwright) {
  console.log(`missing report: ${!vitest ? "vitest " : ""}${!playwright ? "playwright" : ""}`);
  failed += 1;
}

console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
