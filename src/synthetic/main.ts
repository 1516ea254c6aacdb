/**
 * `npm run demo-logs`: regenerate the demo files under ./demo-logs (relative to the current
 * directory) from the default seed. Same seed → byte-identical files.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { buildDemoLogFiles, DEMO_LOGS_SEED, DEMO_SAFETY_CAUTION } from "./demoFiles.js";

function main(): void {
  const outDir = "demo-logs";
  const files = buildDemoLogFiles(DEMO_LOGS_SEED);
  for (const f of files) {
    const path = join(outDir, f.path);
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, f.text);
  }
  process.stdout.write(`wrote ${files.length} files under ${outDir}/ (seed ${DEMO_LOGS_SEED})\n${DEMO_SAFETY_CAUTION}\n`);
}

main();
