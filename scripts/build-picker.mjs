// Build the trend-picking page's browser bundle (one IIFE, no outside requests) into
// dist/picker/client.bundle.js, where src/picker/clientBundle.ts looks for it.
// Run after `tsc` (npm run build); needs the esbuild dev dependency.
import { build } from "esbuild";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
await build({
  entryPoints: [join(root, "src", "picker", "client", "main.ts")],
  outfile: join(root, "dist", "picker", "client.bundle.js"),
  bundle: true,
  format: "iife",
  platform: "browser",
  target: "es2020",
  minify: true,
  legalComments: "none",
  logLevel: "warning",
});
console.log("built dist/picker/client.bundle.js");
