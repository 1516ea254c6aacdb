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
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
const notebookDir = join(root, "notebooks");
const notebooks = readdirSync(notebookDir).filter((f) => f.endsWith(".ipynb")).sort();
const python = process.env.SHALEPOINT_PYTHON ?? "/usr/bin/python3";

interface NotebookJson {
  metadata: { kernelspec?: { name?: string } };
  cells: { cell_type: string; source: string | string[]; outputs?: unknown[]; execution_count?: number | null }[];
}
const text = (s: string | string[]): string => (Array.isArray(s) ? s.join("") : s);

/**
 * Files a notebook promises to save: the `name.json` / `name.csv` in backticks on the line of
 * its first cell that starts with "**Saves**" (the hand-over convention of notebooks/README.md).
 */
function promisedFiles(firstCell: string): string[] {
  const line = firstCell.split("\n").find((l) => l.startsWith("**Saves**")) ?? "";
  return [...line.matchAll(/`([\w.-]+\.(?:json|csv))`/g)].map((m) => m[1]);
}

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

      // Hand-over convention (own case, notebooks/README.md): every notebook after 01 says what it
      // needs from the one before and what it saves, so any notebook can be opened alone.
      if (!name.startsWith("01-")) {
        it("says what it needs from the notebook before and names the files it saves", () => {
          const first = text(nb.cells[0].source);
          expect(first).toMatch(/\*\*Needs from notebook 0\d:\*\*/);
          expect(promisedFiles(first).length).toBeGreaterThan(0);
        });
      }

      it("run-notebooks.py executes every cell without an error", async () => {
        const startedMs = Date.now();
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
        // Every file the first cell promises was written by this run (1 s for file-time granularity).
        for (const file of promisedFiles(text(nb.cells[0].source))) {
          const full = join(notebookDir, "work", file);
          expect(existsSync(full), `${name} promised notebooks/work/${file}`).toBe(true);
          expect(statSync(full).mtimeMs).toBeGreaterThanOrEqual(startedMs - 1000);
        }
        if (name.startsWith("01-")) {
          // A picture of the first figure of the executed notebook (its HTML export, drawn by
          // plotly) for a reviewer, written to test-output/ (git-ignored) by headless Chromium.
          // The PNG signature is read back (W3C PNG Specification §5.2).
          const html = join(notebookDir, "executed", name.replace(/\.ipynb$/, ".html"));
          const png = join(root, "test-output", "notebook-01-figure.png");
          mkdirSync(dirname(png), { recursive: true });
          const { chromium } = await import("playwright-core");
          const browser = await chromium.launch({
            executablePath: "/usr/bin/chromium",
            args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
          });
          try {
            const page = await browser.newPage({ viewport: { width: 1200, height: 1400 } });
            await page.goto(pathToFileURL(html).href);
            const figure = page.locator(".js-plotly-plot").first();
            await figure.waitFor({ state: "visible", timeout: 60_000 });
            await figure.locator(".main-svg").first().waitFor({ timeout: 60_000 });
            await figure.screenshot({ path: png });
          } finally {
            await browser.close();
          }
          expect(readFileSync(png).subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
        }
        if (name.startsWith("03-")) {
          // Own case: the trend file written by 03's refit cell is a shalepoint-trend file whose
          // recorded fit interval is the one typed in that cell (so the CLI reads what was fitted).
          const refitCell = nb.cells.map((c) => text(c.source)).find((src) => src.startsWith("const sonicFit = refitTrend("));
          expect(refitCell).toBeDefined();
          const typed = /kind: "(\w+)".*topBmlFt: (\d+), baseBmlFt: (\d+)/.exec(refitCell ?? "");
          expect(typed).not.toBeNull();
          const { parseTrendFile } = (await import(pathToFileURL(join(root, "dist", "index.js")).href)) as typeof import("../../src/index.js");
          const trend = parseTrendFile(readFileSync(join(notebookDir, "work", "quillon-a1.sonic-trend.json"), "utf8"), "quillon-a1.sonic-trend.json");
          expect(trend.kind).toBe(typed?.[1]);
          expect(trend.segments[0].fittedOn?.intervals).toEqual([{ topBmlFt: Number(typed?.[2]), baseBmlFt: Number(typed?.[3]) }]);
        }
      }, 180_000);
    });
  }
});
