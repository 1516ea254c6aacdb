/**
 * `shalepoint follow`: while drilling, watch a folder for new log chunks (LAS 2.0 files with
 * the well's curves, deeper than what is already loaded) and drilling-data CSV chunks; on
 * each new file, append it to the followed well and refresh the study's outputs and report.
 *
 * How a refresh works: the well's LAS so far (the study's LAS plus every chunk, in file-name
 * order) is written to `<out>/while-drilling/<id>.las`, the study runs with that file in place
 * of the well's LAS, and its outputs and report are rewritten (atomically, as `run` does).
 * Drilling-data chunks are validated and appended to `<out>/while-drilling/<id>.drilling-data.csv`.
 * The folder is polled (every --poll-s seconds) rather than watched with OS events, which
 * behave differently across file systems; a file is taken once its size has stayed the same
 * for one poll, so a half-copied chunk is not read.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync } from "node:fs";
import { basename, join } from "node:path";
import { ShalepointError } from "../errors.js";
import { readLas } from "../io/readLas.js";
import { writeLas } from "../io/writeLas.js";
import type { LasFile } from "../io/lasTypes.js";
import { readDrillingData } from "../io/drillingData.js";
import { readDrillingEvents } from "../io/tables.js";
import { UNITS } from "../units/index.js";
import { predictDcPorePressure } from "../pipeline/incrementalDrillingPorePressure.js";
import { compareMudWeightToPorePressure } from "../drilling/mudWeightMargin.js";
import { SAFETY_CAUTION_TEXT } from "../present/caution.js";
import type { StudyResult } from "../study/runStudy.js";
import { loadStudyConfig, type StudyConfig } from "../study/config.js";
import { runStudy } from "../study/runStudy.js";
import { writeStudyOutputs, writeFileAtomic } from "../study/writeStudyOutputs.js";
import { depthBracketIndex } from "../stress/stressSeries.js";

/** Where the follow command writes its lines. */
export interface FollowIo {
  out: (line: string) => void;
  err: (line: string) => void;
}

/** Parsed options of the follow command. */
export interface FollowOptions {
  studyPath: string;
  wellId: string;
  watchDir: string;
  outDir?: string;
  pollSeconds: number;
  /** Process the files present now, then return (no polling). */
  once: boolean;
  report: boolean;
  chartPng: boolean;
  /** Margin below which a drilling-data row is flagged, ppg (default 0.2). */
  minMarginPpg: number;
}

/** What one pass over the watched folder did. */
export interface FollowPassResult {
  /** Files appended in this pass, in order. */
  appended: string[];
  /** Files refused (with the reason); they are not retried. */
  refused: { file: string; reason: string }[];
  /** Deepest log index after the pass (file units), NaN before any LAS. */
  lastIndex: number;
  /** Whether the study outputs were rewritten. */
  refreshed: boolean;
}

/** Usage text of the command. */
export const FOLLOW_HELP = `shalepoint follow <study.json> --well <id> --watch <folder> [--out DIR] [--poll-s N] [--once] [--no-report] [--no-png]

While drilling: watches <folder> for new LAS chunks of well <id> (same curves as the study's
LAS, deeper samples only) and drilling-data CSV chunks, appends them in file-name order and
refreshes the study's outputs and report after each new file. --once processes the files
present and stops; otherwise the folder is checked every --poll-s seconds (default 5) until
Ctrl+C. With drilling data, <out>/while-drilling/<id>.while-drilling.csv gets the corrected
d-exponent, its pore pressure (Eaton's dc form, trend fitted on the study's sonic-trend
intervals), the log pore pressure, the mud weight and the rows whose margin is below
--min-margin-ppg (default 0.2).`;

/**
 * Parse the follow command's arguments.
 * @param args arguments after `follow`, e.g. `["study.json", "--well", "quillon-a1", "--watch", "incoming"]`
 * @returns {@link FollowOptions}
 * @throws ShalepointError E_USAGE for a missing study file, --well or --watch, or a bad --poll-s
 * @example parseFollowArgs(["s.json", "--well", "a", "--watch", "in", "--once"]).once // true
 */
export function parseFollowArgs(args: readonly string[]): FollowOptions {
  const positional: string[] = [];
  const values: Record<string, string> = {};
  const flags = new Set<string>();
  const valueOptions = ["--well", "--watch", "--out", "--poll-s", "--min-margin-ppg"];
  const flagOptions = ["--once", "--no-report", "--no-png", "--quiet", "-q"];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (valueOptions.includes(a)) {
      const v = args[i + 1];
      if (v === undefined || v.startsWith("--")) throw new ShalepointError("E_USAGE", `${a} needs a value`, { param: a, hint: FOLLOW_HELP.split("\n")[0] });
      values[a] = v;
      i++;
    } else if (flagOptions.includes(a)) flags.add(a);
    else if (a.startsWith("-")) throw new ShalepointError("E_USAGE", `unknown option ${a}`, { param: a, allowed: [...valueOptions, ...flagOptions].join(", ") });
    else positional.push(a);
  }
  if (positional.length !== 1) throw new ShalepointError("E_USAGE", "follow needs exactly one study file", { hint: FOLLOW_HELP.split("\n")[0] });
  if (!values["--well"]) throw new ShalepointError("E_USAGE", "follow needs --well <id>", { param: "--well" });
  if (!values["--watch"]) throw new ShalepointError("E_USAGE", "follow needs --watch <folder>", { param: "--watch" });
  const poll = values["--poll-s"] === undefined ? 5 : Number(values["--poll-s"]);
  if (!(Number.isFinite(poll) && poll >= 0.2 && poll <= 3600)) {
    throw new ShalepointError("E_USAGE", "--poll-s must be a number of seconds from 0.2 to 3600", { param: "--poll-s", value: values["--poll-s"] });
  }
  const minMarginPpg = values["--min-margin-ppg"] === undefined ? 0.2 : Number(values["--min-margin-ppg"]);
  if (!(Number.isFinite(minMarginPpg) && minMarginPpg >= 0 && minMarginPpg <= 3)) {
    throw new ShalepointError("E_USAGE", "--min-margin-ppg must be a number of ppg from 0 to 3", { param: "--min-margin-ppg", value: values["--min-margin-ppg"] });
  }
  return {
    minMarginPpg,
    studyPath: positional[0],
    wellId: values["--well"],
    watchDir: values["--watch"],
    outDir: values["--out"],
    pollSeconds: poll,
    once: flags.has("--once"),
    report: !flags.has("--no-report"),
    chartPng: !flags.has("--no-png"),
  };
}

/** The state the follow loop carries between passes. */
export interface FollowSession {
  options: FollowOptions;
  config: StudyConfig;
  wellIndex: number;
  las: LasFile;
  drillingCsv?: { header: string; lastTvdFt: number; text: string };
  seen: Set<string>;
  /** Size of each pending file at the last pass (a file is read once its size is stable). */
  pendingSize: Map<string, number>;
  workDir: string;
  /** The last study run (after the latest refresh). */
  lastResult?: StudyResult;
}

/**
 * Open a follow session: load the study, find the well and read its LAS.
 * @param options from {@link parseFollowArgs}
 * @returns a {@link FollowSession}
 * @throws ShalepointError E_USAGE for an unknown well id or a missing watch folder; errors of loadStudyConfig and readLas
 * @example openFollowSession(parseFollowArgs(["demo-study.json", "--well", "quillon-a1", "--watch", "incoming", "--once"]))
 */
export function openFollowSession(options: FollowOptions): FollowSession {
  const config = loadStudyConfig(options.studyPath, { outDir: options.outDir });
  const wellIndex = config.file.wells.findIndex((w) => w.id === options.wellId);
  if (wellIndex < 0) {
    throw new ShalepointError("E_USAGE", `no well '${options.wellId}' in the study`, { param: "--well", value: options.wellId, allowed: config.file.wells.map((w) => w.id).join(", ") });
  }
  if (!existsSync(options.watchDir) || !statSync(options.watchDir).isDirectory()) {
    throw new ShalepointError("E_USAGE", "the watched folder does not exist", { param: "--watch", value: options.watchDir, hint: "Create it, or point --watch at the folder new files arrive in." });
  }
  const lasPath = config.wellPaths[wellIndex].las;
  const { las } = readLas(readFileSync(lasPath, "utf8"), { file: basename(lasPath) });
  const workDir = join(config.outDir, "while-drilling");
  return { options, config, wellIndex, las, seen: new Set(), pendingSize: new Map(), workDir };
}

function appendLasChunk(las: LasFile, chunk: LasFile, file: string): LasFile {
  const names = (l: LasFile) => l.curves.map((c) => c.mnemonic.toUpperCase()).join(",");
  if (names(las) !== names(chunk)) {
    throw new ShalepointError("E_FOLLOW_CURVES", "the chunk's curves differ from the well's", { file, value: names(chunk), allowed: names(las) });
  }
  const n0 = las.data[0].length;
  const m = chunk.data[0].length;
  const last = n0 > 0 ? las.data[0][n0 - 1] : -Infinity;
  if (m > 0 && !(chunk.data[0][0] > last)) {
    throw new ShalepointError("E_FOLLOW_DEPTH", "the chunk does not start below the last loaded depth", {
      file,
      value: chunk.data[0][0],
      allowed: `> ${last}`,
      hint: "Only new, deeper samples can be appended; re-run the study to revise older depths.",
    });
  }
  const data = las.data.map((col, k) => {
    const out = new Float64Array(n0 + m);
    out.set(col);
    const add = chunk.data[k];
    for (let i = 0; i < m; i++) out[n0 + i] = add[i] === chunk.nullValue ? las.nullValue : add[i];
    return out;
  });
  const stop = data[0][n0 + m - 1];
  const well = las.well.map((h) => (h.mnemonic.toUpperCase() === "STOP" ? { ...h, value: String(stop) } : h));
  return { ...las, well, data };
}

function appendDrillingChunk(session: FollowSession, text: string, file: string): void {
  const { data } = readDrillingData(text, { file });
  const lines = text.replace(/\r\n?/g, "\n").split("\n").filter((l) => l.trim() !== "" && !l.trimStart().startsWith("#"));
  const header = lines[0];
  const prev = session.drillingCsv;
  if (prev && prev.header !== header) {
    throw new ShalepointError("E_FOLLOW_CURVES", "the drilling-data chunk's columns differ from the first chunk's", { file, value: header, allowed: prev.header });
  }
  if (prev && data.tvdFt.length > 0 && !(data.tvdFt[0] > prev.lastTvdFt)) {
    throw new ShalepointError("E_FOLLOW_DEPTH", "the drilling-data chunk does not start below the last row", { file, value: data.tvdFt[0], unit: "ft", allowed: `> ${prev.lastTvdFt}` });
  }
  const body = lines.slice(1).join("\n");
  session.drillingCsv = {
    header,
    lastTvdFt: data.tvdFt.length > 0 ? data.tvdFt[data.tvdFt.length - 1] : (prev?.lastTvdFt ?? -Infinity),
    text: (prev ? prev.text : header + "\n") + (body ? body + "\n" : ""),
  };
}

/**
 * One pass: read new stable files in the watched folder (file-name order), append them, and
 * refresh the study's outputs when anything was appended.
 * @param session from {@link openFollowSession} (updated in place: it is the loop's state)
 * @param io output lines
 * @returns {@link FollowPassResult}
 * @throws errors of runStudy and writeStudyOutputs (bad chunks are refused, not thrown)
 * @example await followOnce(session, { out: console.log, err: console.error })
 */
export async function followOnce(session: FollowSession, io: FollowIo, options: { waitForStableSize?: boolean } = {}): Promise<FollowPassResult> {
  const { options: o } = session;
  const appended: string[] = [];
  const refused: FollowPassResult["refused"] = [];
  let lasChanged = false;
  const names = readdirSync(o.watchDir).filter((f) => /\.(las|csv)$/i.test(f)).sort();
  for (const name of names) {
    if (session.seen.has(name)) continue;
    const path = join(o.watchDir, name);
    const size = statSync(path).size;
    if (options.waitForStableSize && session.pendingSize.get(name) !== size) {
      session.pendingSize.set(name, size);
      continue;
    }
    session.seen.add(name);
    session.pendingSize.delete(name);
    try {
      const text = readFileSync(path, "utf8");
      if (/\.las$/i.test(name)) {
        session.las = appendLasChunk(session.las, readLas(text, { file: name }).las, name);
        lasChanged = true;
      } else {
        appendDrillingChunk(session, text, name);
      }
      appended.push(name);
    } catch (e) {
      const reason = e instanceof ShalepointError ? `${e.code}: ${e.message}` : String(e);
      refused.push({ file: name, reason });
      io.err(`follow: refused ${name}: ${reason}`);
    }
  }
  let refreshed = false;
  if (appended.length > 0) {
    mkdirSync(session.workDir, { recursive: true });
    const id = o.wellId;
    if (session.drillingCsv) writeFileAtomic(join(session.workDir, `${id}.drilling-data.csv`), session.drillingCsv.text);
    if (lasChanged || session.lastResult === undefined) {
      const lasPath = join(session.workDir, `${id}.las`);
      writeFileAtomic(lasPath, writeLas(session.las));
      const wellPaths = session.config.wellPaths.map((p, i) => (i === session.wellIndex ? { ...p, las: lasPath } : p));
      const result = runStudy({ ...session.config, wellPaths });
      const files = await writeStudyOutputs(result, session.config.outDir, { report: o.report ? undefined : false, chartPng: o.chartPng ? undefined : false });
      session.lastResult = result;
      refreshed = true;
      const w = result.wells[session.wellIndex];
      const n = w.prediction.tvdFt.length;
      let k = n - 1;
      while (k > 0 && !Number.isFinite(w.prediction.ppPsi[k])) k--;
      const ppg = w.prediction.ppPsi[k] / (w.prediction.tvdFt[k] * (12 / 231));
      io.out(`follow: ${appended.join(", ")} → ${id} to ${w.prediction.tvdFt[n - 1].toFixed(1)} ft TVD; pore pressure ${ppg.toFixed(2)} ppg at ${w.prediction.tvdFt[k].toFixed(1)} ft; outputs refreshed in ${files.outDir}`);
    }
    if (session.drillingCsv) {
      const summary = writeDrillingComparison(session, session.lastResult!);
      io.out(`follow: drilling data to ${session.drillingCsv.lastTvdFt.toFixed(1)} ft TVD; ${summary}`);
    }
  }
  const idx = session.las.data[0];
  return { appended, refused, lastIndex: idx.length > 0 ? idx[idx.length - 1] : NaN, refreshed };
}

/** Nearest sample, held at the first or last sample beyond the index (bracket search from stress/stressSeries). */
function nearestSample(tvdFt: Float64Array, z: number): number {
  const lo = depthBracketIndex(tvdFt, z);
  const hi = Math.min(lo + 1, tvdFt.length - 1);
  return Math.abs(tvdFt[hi] - z) < Math.abs(tvdFt[lo] - z) ? hi : lo;
}

/**
 * d-exponent pore pressure and the mud-weight comparison on the drilling data so far, written
 * to `<id>.while-drilling.csv` (caution first). Rows below the logged depth get no log values.
 * The dc trend is fitted on the study's sonic-trend intervals (the normally pressured shale the
 * user chose); without fit intervals in the study the dc columns are left out.
 */
function writeDrillingComparison(session: FollowSession, result: StudyResult): string {
  const { data } = readDrillingData(session.drillingCsv!.text, { file: `${session.options.wellId}.drilling-data.csv` });
  const w = result.wells[session.wellIndex];
  const p = w.prediction;
  const last = p.tvdFt[p.tvdFt.length - 1];
  const idx = Array.from(data.tvdFt, (z) => (z <= last + 1 ? nearestSample(p.tvdFt, z) : -1));
  const pick = (a: ArrayLike<number>): Float64Array => Float64Array.from(idx, (i) => (i >= 0 ? a[i] : NaN));
  const ppLogs = pick(p.ppPsi);
  const sonic = session.config.file.wells[session.wellIndex].methods.sonicTrend;
  let ppDc: Float64Array | undefined;
  let note = "";
  if (sonic && "fitIntervals" in sonic) {
    try {
      const intervals = sonic.fitIntervals.map((iv) => ({ topBmlFt: iv.top * UNITS[iv.unit].factor, baseBmlFt: iv.base * UNITS[iv.unit].factor }));
      ppDc = predictDcPorePressure(data, { isShale: Float64Array.from(idx, (i) => (i >= 0 ? p.shale.isShale[i] : 0)), overburdenPsi: pick(p.overburden.svPsi) }, {
        datums: w.well.datums,
        hydrostaticGradientPsiPerFt: w.hydrostaticGradientPsiPerFt,
        trend: { use: "fit", intervals },
      }).ppPsi;
    } catch (e) {
      note = `; dc pore pressure not computed (${e instanceof ShalepointError ? e.code : "error"}: ${(e as Error).message})`;
    }
  } else note = "; dc pore pressure not computed (the study's sonic trend has no fit intervals)";
  const eventsPath = session.config.wellPaths[session.wellIndex].drillingEvents;
  const shows = eventsPath ? readDrillingEvents(readFileSync(eventsPath, "utf8"), { file: basename(eventsPath) }).records : [];
  const cmp = compareMudWeightToPorePressure({
    tvdFt: data.tvdFt,
    ppPsi: ppLogs,
    mudWeightPsiPerFt: data.mudWeightPsiPerFt,
    minMarginPpg: session.options.minMarginPpg,
    shows: shows.map((s) => ({ tvdFt: s.tvdFt, event: s.event, emwPsiPerFt: s.emwPsiPerFt, gasUnits: s.gasUnits })),
  });
  const ppg = (psi: number, z: number): number => psi / (z * (12 / 231));
  const fmt = (v: number): string => (Number.isFinite(v) ? String(Math.round(v * 1e4) / 1e4) : "");
  const rows = Array.from(data.tvdFt, (z, i) =>
    [z, ppDc ? ppg(ppDc[i], z) : NaN, cmp.ppEmwPpg[i], cmp.mudWeightPpg[i], cmp.marginPpg[i]].map(fmt).join(",") + `,${cmp.lowMargin[i]}`,
  );
  const text = `# ${SAFETY_CAUTION_TEXT}\ntvd_ft,pp_dc_ppg,pp_logs_ppg,mud_weight_ppg,margin_ppg,low_margin\n${rows.join("\n")}\n`;
  writeFileAtomic(join(session.workDir, `${session.options.wellId}.while-drilling.csv`), text);
  return `${cmp.runs.length} low-margin interval(s) below ${session.options.minMarginPpg} ppg, ${cmp.missedShowCount} kick/gas show(s) not near one${note}`;
}

/**
 * Run the follow command (the CLI's `follow`): one pass with --once, else a polling loop
 * until the process is stopped.
 * @param args arguments after `follow`
 * @param io output lines
 * @returns exit code 0 (bad chunks are reported and skipped)
 * @throws ShalepointError E_USAGE and the errors of {@link openFollowSession}
 * @example await runFollowCommand(["study.json", "--well", "quillon-a1", "--watch", "incoming", "--once"], io) // 0
 */
export async function runFollowCommand(args: readonly string[], io: FollowIo): Promise<number> {
  const options = parseFollowArgs(args);
  const session = openFollowSession(options);
  if (options.once) {
    await followOnce(session, io);
    return 0;
  }
  io.out(`follow: watching ${options.watchDir} for ${options.wellId} every ${options.pollSeconds} s (Ctrl+C stops)`);
  for (;;) {
    await followOnce(session, io, { waitForStableSize: true });
    await new Promise((r) => setTimeout(r, options.pollSeconds * 1000));
  }
}
