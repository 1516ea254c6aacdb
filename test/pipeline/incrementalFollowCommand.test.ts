/**
 * The while-drilling folder follow (src/cli/followCommand.ts): chunks of the demo well's LAS
 * dropped into a folder are appended and the study outputs refreshed; the refreshed result
 * equals the study run on the whole LAS (own case: the reference is the project's own study
 * runner on the uncut file, compared value for value).
 */
import { describe, it, expect } from "vitest";
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync, existsSync } from "node:fs";
import { join } from "node:path";
import { tmpdir } from "node:os";
import { readLas } from "../../src/io/readLas.js";
import { writeLas } from "../../src/io/writeLas.js";
import type { LasFile } from "../../src/io/lasTypes.js";
import { loadStudyConfig } from "../../src/study/config.js";
import { runStudy } from "../../src/study/runStudy.js";
import { parseFollowArgs, openFollowSession, followOnce } from "../../src/cli/followCommand.js";
import { DEMO } from "./demoWells.js";

function cut(las: LasFile, from: number, to: number): string {
  const data = las.data.map((c) => c.slice(from, to));
  const well = las.well.map((h) =>
    h.mnemonic === "STRT" ? { ...h, value: String(data[0][0]) } : h.mnemonic === "STOP" ? { ...h, value: String(data[0][data[0].length - 1]) } : h,
  );
  return writeLas({ ...las, well, data });
}

describe("followOnce", () => {
  it("appends LAS chunks in name order, refuses an overlapping chunk, and refreshes the study to equal a run on the whole LAS", async () => {
    const dir = mkdtempSync(join(tmpdir(), "shalepoint-follow-"));
    try {
      const { las } = readLas(readFileSync(join(DEMO, "quillon-a1", "quillon-a1.las"), "utf8"));
      const n = las.data[0].length;
      const a = Math.floor(n * 0.7);
      const b = Math.floor(n * 0.85);
      writeFileSync(join(dir, "a1-base.las"), cut(las, 0, a));
      writeFileSync(join(dir, "a1-full.las"), cut(las, 0, n));
      const well = {
        las: "a1-base.las",
        methods: {
          shale: { grCutoffApi: 85 },
          sonicTrend: { fitIntervals: [{ top: 900, base: 4300, unit: "ft" }], dtMatrixUsPerFt: 65 },
          eatonSonic: { exponent: 3.0 },
          primary: "eatonSonic",
        },
        fracture: { method: "eaton1969", poissonRatio: 0.42 },
      };
      const study = (las: string) => ({ title: "follow test (invented data)", output: { folder: "out", report: false, chartPng: false }, wells: [{ ...well, id: "quillon-a1", las }] });
      writeFileSync(join(dir, "study.json"), JSON.stringify(study("a1-base.las")));
      writeFileSync(join(dir, "study-full.json"), JSON.stringify({ ...study("a1-full.las"), output: { folder: "out-full", report: false, chartPng: false } }));
      const incoming = join(dir, "incoming");
      mkdirSync(incoming);
      writeFileSync(join(incoming, "chunk-002.las"), cut(las, b, n));
      writeFileSync(join(incoming, "chunk-001.las"), cut(las, a, b));
      writeFileSync(join(incoming, "chunk-003-overlap.las"), cut(las, n - 10, n));
      // Drilling data in two chunks (header repeated), then a chunk that goes back up the hole.
      const drill = readFileSync(join(DEMO, "quillon-a1", "drilling-data.csv"), "utf8").trim().split("\n");
      writeFileSync(join(incoming, "drill-001.csv"), [drill[0], ...drill.slice(1, 3001)].join("\n") + "\n");
      writeFileSync(join(incoming, "drill-002.csv"), [drill[0], ...drill.slice(3001)].join("\n") + "\n");
      writeFileSync(join(incoming, "drill-003-back.csv"), [drill[0], drill[10]].join("\n") + "\n");

      const session = openFollowSession(parseFollowArgs([join(dir, "study.json"), "--well", "quillon-a1", "--watch", incoming, "--once", "--no-png", "--no-report"]));
      const lines: string[] = [];
      const errs: string[] = [];
      const pass = await followOnce(session, { out: (l) => lines.push(l), err: (l) => errs.push(l) });
      expect(pass.appended).toEqual(["chunk-001.las", "chunk-002.las", "drill-001.csv", "drill-002.csv"]); // file-name order, not write order
      expect(pass.refused.map((r) => r.file)).toEqual(["chunk-003-overlap.las", "drill-003-back.csv"]);
      expect(pass.refused.map((r) => r.reason.slice(0, 14))).toEqual(["E_FOLLOW_DEPTH", "E_FOLLOW_DEPTH"]);
      expect(pass.lastIndex).toBe(las.data[0][n - 1]);
      expect(pass.refreshed).toBe(true);
      expect(existsSync(join(dir, "out", "while-drilling", "quillon-a1.las"))).toBe(true);
      expect(lines.length).toBe(2); // the refresh line and the drilling-data line

      // The drilling-data comparison: caution first, one row per drilling-data row, the log pore
      // pressure read at the same depth as the study's own result (own case, same numbers).
      const cmp = readFileSync(join(dir, "out", "while-drilling", "quillon-a1.while-drilling.csv"), "utf8").trim().split("\n");
      expect(cmp[0]).toMatch(/^# .*estimates for trained engineers/);
      expect(cmp[1]).toBe("tvd_ft,pp_dc_ppg,pp_logs_ppg,mud_weight_ppg,margin_ppg,low_margin");
      expect(cmp.length).toBe(2 + drill.length - 1);
      const result = session.lastResult!.wells[0].prediction;
      const row = cmp[2 + 2500].split(",").map(Number); // 10,000 ft TVD (5,000 + 2 × 2,500)
      expect(row[0]).toBe(10000);
      let k = 0;
      while (result.tvdFt[k] < 10000) k++;
      expect(row[2]).toBeCloseTo(result.ppPsi[k] / (10000 * (12 / 231)), 4); // written to 4 decimals
      expect(row[1]).toBeGreaterThan(8); // dc pore pressure present (ppg)

      // A second pass with nothing new does nothing.
      const again = await followOnce(session, { out: (l) => lines.push(l), err: (l) => errs.push(l) });
      expect(again.appended).toEqual([]);
      expect(again.refreshed).toBe(false);

      // The refreshed outputs equal a study run on the uncut LAS (same values, same order).
      const followed = readFileSync(join(dir, "out", "quillon-a1.result.csv"), "utf8");
      const fullResult = runStudy(loadStudyConfig(join(dir, "study-full.json")));
      const { writeStudyOutputs } = await import("../../src/study/writeStudyOutputs.js");
      await writeStudyOutputs(fullResult, join(dir, "out-full"), { report: false, chartPng: false });
      expect(followed).toBe(readFileSync(join(dir, "out-full", "quillon-a1.result.csv"), "utf8"));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000); // two study runs on a 30,000-sample well: a generous ceiling, not a speed check

  it("parseFollowArgs rejects a missing --watch and a bad --poll-s", () => {
    expect(() => parseFollowArgs(["s.json", "--well", "a"])).toThrow(expect.objectContaining({ code: "E_USAGE" }));
    expect(() => parseFollowArgs(["s.json", "--well", "a", "--watch", "in", "--poll-s", "0"])).toThrow(/--poll-s/);
    expect(parseFollowArgs(["s.json", "--well", "a", "--watch", "in"]).pollSeconds).toBe(5);
  });
});
