/**
 * Notebooks run top to bottom: each notebooks/*.ipynb is executed headless by
 * scripts/run-notebooks.py with the project-local TypeScript kernel; any cell error fails
 * the test, and the runner's report (failing cell source, kernel stderr) is in the message.
 * The committed copies must be clean (outputs cleared) and open with the safety caution.
 *
 * Needs the compiled package (`npm run build`, done by `npm test`) and Debian's Jupyter
 * packages (scripts/setup.sh). The kernel is registered here if it is missing.
 */
import { describe, expect, it, beforeAll } from "vitest";
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
const notebookDir = join(root, "notebooks");
const notebooks = readdirSync(notebookDir).filter((f) => f.endsWith(".ipynb")).sort();
const python = process.env.SHALEPOINT_PYTHON ?? "/usr/bin/python3";

interface NotebookJson {
  metadata: { kernelspec?: { name?: string } };
  cells: { cell_type: string; source: string | string[]; outputs?: unknown[]; execution_count?: number | null }[];
}
const text = (s: string | string[]): string => (Array.isArray(s) ? s.join("") : s);

beforeAll(() => {
  if (!existsSync(join(root, ".jupyter-local", "share", "jupyter", "kernels", "tslab", "kernel.json"))) {
    const r = spawnSync(process.execPath, [join(root, "scripts", "install-kernel.mjs")], { cwd: root, encoding: "utf8" });
    if (r.status !== 0) throw new Error(`kernel install failed:\n${r.stdout}\n${r.stderr}`);
  }
  if (!existsSync(join(root, "dist", "index.js"))) {
    throw new Error("dist/index.js is missing: run `npm run build` before the notebook tests");
  }
});

describe("notebooks/*.ipynb", () => {
  it("the folder holds at least one notebook", () => {
    expect(notebooks.length).toBeGreaterThan(0);
  });

  for (const name of notebooks) {
    describe(name, () => {
      const nb = JSON.parse(readFileSync(join(notebookDir, name), "utf8")) as NotebookJson;

      it("is committed clean, on the TypeScript kernel, opening with the safety caution", () => {
        expect(nb.metadata.kernelspec?.name).toBe("tslab");
        for (const cell of nb.cells) {
          if (cell.cell_type !== "code") continue;
          expect(cell.outputs ?? []).toEqual([]);
          expect(cell.execution_count ?? null).toBeNull();
        }
        // Project rule (common practice, no source): user-facing output carries the caution,
        // first thing in the notebook.
        const first = text(nb.cells[0].source);
        expect(first).toMatch(/estimates? for trained engineers/);
        expect(first).toMatch(/calibrated? to measured data/);
        expect(first).toMatch(/local regulations/);
      });

      it("run-notebooks.py executes every cell without an error", () => {
        const r = spawnSync(python, [join(root, "scripts", "run-notebooks.py"), join(notebookDir, name)], {
          cwd: root,
          encoding: "utf8",
          timeout: 180_000,
        });
        const report = `${r.stdout ?? ""}\n${r.stderr ?? ""}`;
        if (r.status !== 0) throw new Error(`notebook ${name} failed:\n${report}`);
        expect(r.stdout).toMatch(/^1 passed, 0 failed$/m);
        const executed = JSON.parse(readFileSync(join(notebookDir, "executed", name), "utf8")) as NotebookJson;
        const outputs = executed.cells.flatMap((c) => (c.outputs ?? []) as { output_type: string; name?: string }[]);
        expect(outputs.filter((o) => o.output_type === "error")).toEqual([]);
        expect(outputs.filter((o) => o.output_type === "stream" && o.name === "stderr")).toEqual([]);
      }, 180_000);
    });
  }
});
