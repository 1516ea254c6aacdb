/**
 * `npm run demo-logs`: regenerate the demo files under ./demo-logs (relative to the current
 * directory) from the default seed. Same seed → byte-identical files.
 */
import { DEMO_LOGS_SEED, DEMO_SAFETY_CAUTION } from "./demoFiles.js";
import { writeDemoLogs } from "./writeDemoLogs.js";

function main(): void {
  const outDir = "demo-logs";
  const paths = writeDemoLogs(outDir, DEMO_LOGS_SEED);
  process.stdout.write(`wrote ${paths.length} files under ${outDir}/ (seed ${DEMO_LOGS_SEED})\n${DEMO_SAFETY_CAUTION}\n`);
}

main();
