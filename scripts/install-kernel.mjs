// Registers the TypeScript Jupyter kernel (tslab) for this project only.
//
// Uses tslab's own installer with:
//   --python  /usr/bin/python3 (Debian's Python, which has jupyter_client; another python3
//             earlier on PATH may not), overridable with SHALEPOINT_PYTHON;
//   --binary  this project's node_modules/.bin/tslab, so the kernel runs the pinned tslab;
//   --prefix  .jupyter-local/ (git-ignored), so nothing is written outside the repository.
// The kernel spec lands in .jupyter-local/share/jupyter/kernels/tslab/. Point Jupyter at it
// with JUPYTER_PATH=<repo>/.jupyter-local/share/jupyter (scripts/run-notebooks.py does this).
//
// Idempotent: running it again rewrites the same kernel spec. Prints what it did.
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const python = process.env.SHALEPOINT_PYTHON ?? "/usr/bin/python3";
const tslabCli = join(root, "node_modules", "tslab", "bin", "tslab");
const tslabBinary = join(root, "node_modules", ".bin", "tslab");
const prefix = join(root, ".jupyter-local");
const specFile = join(prefix, "share", "jupyter", "kernels", "tslab", "kernel.json");

if (!existsSync(tslabCli) || !existsSync(tslabBinary)) {
  console.error("install-kernel: tslab is not installed in node_modules; run `npm ci` first.");
  process.exit(1);
}
if (!existsSync(python)) {
  console.error(
    `install-kernel: ${python} not found. Install Debian's python3-ipykernel (scripts/setup.sh does) ` +
      "or set SHALEPOINT_PYTHON to a Python that has jupyter_client.",
  );
  process.exit(1);
}

const before = existsSync(specFile) ? readFileSync(specFile, "utf8") : undefined;
const run = spawnSync(
  process.execPath,
  [tslabCli, "install", `--python=${python}`, `--binary=${tslabBinary}`, `--prefix=${prefix}`],
  { cwd: root, encoding: "utf8" },
);
if (run.status !== 0) {
  console.error(run.stdout ?? "");
  console.error(run.stderr ?? "");
  console.error(`install-kernel: tslab install failed (exit ${run.status ?? "signal " + run.signal}).`);
  process.exit(1);
}
const after = readFileSync(specFile, "utf8");
const argv = JSON.parse(after).argv;
console.log(`install-kernel: ${before === undefined ? "registered" : before === after ? "already registered (unchanged)" : "updated"} the TypeScript kernel "tslab"`);
console.log(`  spec:    ${specFile}`);
console.log(`  command: ${argv.join(" ")}`);
console.log(`  python:  ${python}`);
console.log(`  use it:  JUPYTER_PATH=${join(prefix, "share", "jupyter")} jupyter ...`);
