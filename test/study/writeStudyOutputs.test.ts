/**
 * writeStudyOutputs: the result CSV holds exactly the in-memory curves written with
 * ECMAScript's Number.prototype.toFixed(4) (ECMA-262 §21.1.3.3, published), empty where not
 * finite — the expected text is built here independently, row by row.
 */
import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { loadStudyConfig } from "../../src/study/config.js";
import { runStudy, type StudyResult } from "../../src/study/runStudy.js";
import { studyOutputCurves, writeStudyOutputs } from "../../src/study/writeStudyOutputs.js";

const DEMO = resolve("demo-logs/demo-study.json");

describe("writeStudyOutputs", () => {
  let dir = "";
  let result: StudyResult;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), "sp-outputs-"));
    result = runStudy(loadStudyConfig(DEMO, { outDir: dir }));
    await writeStudyOutputs(result, dir, { report: false, chartPng: false });
  }, 120_000);

  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("writeStudyOutputs writes each well's CSV as header + toFixed(4) rows (empty when not finite)", () => {
    for (const w of result.wells) {
      const curves = studyOutputCurves(w);
      const expected = [curves.map((c) => c.csvHeader).join(",")];
      for (let i = 0; i < curves[0].values.length; i++) {
        expected.push(curves.map((c) => (Number.isFinite(c.values[i]) ? c.values[i].toFixed(4) : "")).join(","));
      }
      expect(readFileSync(join(dir, `${w.id}.result.csv`), "utf8")).toBe(expected.join("\n") + "\n");
    }
  });

  it("writeStudyOutputs with report and PNG off writes the LAS, CSV and summary only, no temporary file", () => {
    const ids = result.wells.map((w) => w.id);
    expect(readdirSync(dir).sort()).toEqual([...ids.flatMap((id) => [`${id}.result.csv`, `${id}.result.las`]), "study-summary.json"].sort());
  });
});
