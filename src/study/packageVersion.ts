/**
 * The shalepoint version, read once from the package's own package.json.
 */
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

let cached: string | undefined;

/** Folder of the shalepoint package (the one holding its package.json), found upward from this file. */
export function shalepointPackageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let k = 0; k < 6; k++) {
    try {
      const pkg = JSON.parse(readFileSync(join(dir, "package.json"), "utf8")) as { name?: string };
      if (pkg.name === "shalepoint") return dir;
    } catch {
      // keep walking up
    }
    const up = dirname(dir);
    if (up === dir) break;
    dir = up;
  }
  return dirname(dirname(dirname(fileURLToPath(import.meta.url))));
}

/**
 * The version string of shalepoint from its package.json, e.g. `0.1.0` (`unknown` if not found).
 * @returns version text
 * @example shalepointVersion() // "0.1.0"
 */
export function shalepointVersion(): string {
  if (cached !== undefined) return cached;
  try {
    const pkg = JSON.parse(readFileSync(join(shalepointPackageRoot(), "package.json"), "utf8")) as { version?: string };
    cached = typeof pkg.version === "string" ? pkg.version : "unknown";
  } catch {
    cached = "unknown";
  }
  return cached;
}
