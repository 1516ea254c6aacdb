// Runs the whole test suite (vitest: unit, property, browser and notebook tests) and
// ends with one plain closing line, "N passed, M failed", that CI reads.
import { spawnSync } from "node:child_process";
import { mkdirSync, readFileSync, existsSync } from "node:fs";

mkdirSync("test-output", { recursive: true });
const report = "test-output/vitest.json";
const args = ["vitest", "run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`, ...process.argv.slice(2)];
const run = spawnSync("npx", args, { stdio: "inherit" });

let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const r = JSON.parse(readFileSync(report, "utf8"));
  passed = r.numPassedTests ?? 0;
  failed = (r.numFailedTests ?? 0) + (r.numFailedTestSuites ?? 0);
}
if (run.status !== 0 && failed === 0) failed = 1; // runner crashed before reporting
console.log(`\ntests: ${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
