/**
 * Write the demo files to a folder (the one place in src/synthetic that touches the disk).
 * Not re-exported from the package barrel, so browser bundles of the barrel stay free of node:fs.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { buildDemoLogFiles, DEMO_LOGS_SEED } from "./demoFiles.js";

/**
 * Write every demo file under `outDir` (folders created as needed; existing files replaced).
 * @param outDir target folder, e.g. `demo-logs`
 * @param seed PRNG seed, default {@link DEMO_LOGS_SEED}
 * @returns the relative paths written, in order
 * @example writeDemoLogs("demo-logs").length // 27
 */
export function writeDemoLogs(outDir: string, seed: number = DEMO_LOGS_SEED): string[] {
  const files = buildDemoLogFiles(seed);
  for (const f of files) {
    const path = join(outDir, f.path);
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, f.text);
  }
  return files.map((f) => f.path);
}
