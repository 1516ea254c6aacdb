/**
 * The picking page's browser code as one script (an IIFE built by esbuild from
 * client/main.ts, which imports the core trend and Eaton modules directly).
 *
 * A built copy (`client.bundle.js` next to this module, written by scripts/build-picker.mjs
 * into dist/picker/) is used when present; otherwise the bundle is built in memory with
 * esbuild (a development dependency), from `client/main.ts` or the compiled `client/main.js`.
 */
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";
import { ShalepointError } from "../errors.js";

/** File name of the prebuilt bundle, next to this module. */
export const PICKER_BUNDLE_FILE = "client.bundle.js";

/**
 * Load (or build) the browser bundle of the picking page.
 * @returns JavaScript text (an IIFE, no imports, no outside requests)
 * @throws ShalepointError E_PICKER_BUNDLE when no prebuilt bundle exists and esbuild is not installed
 */
export async function loadPickerClientBundle(): Promise<string> {
  const here = dirname(fileURLToPath(import.meta.url));
  const prebuilt = join(here, PICKER_BUNDLE_FILE);
  if (existsSync(prebuilt)) return readFileSync(prebuilt, "utf8");
  const entry = [join(here, "client", "main.ts"), join(here, "client", "main.js")].find((p) => existsSync(p));
  let esbuild: typeof import("esbuild");
  try {
    esbuild = await import("esbuild");
  } catch {
    esbuild = undefined as never;
  }
  if (entry === undefined || esbuild === undefined) {
    throw new ShalepointError("E_PICKER_BUNDLE", "the picking page's browser bundle is missing", {
      file: prebuilt,
      hint: "Run `node scripts/build-picker.mjs` after `npm run build` (it needs the esbuild dev dependency).",
    });
  }
  const result = await esbuild.build({
    entryPoints: [entry],
    bundle: true,
    format: "iife",
    platform: "browser",
    target: "es2020",
    minify: true,
    write: false,
    logLevel: "silent",
    legalComments: "none",
  });
  return result.outputFiles[0].text;
}
