/**
 * Server-side preparation for the trend-picking page: read a well's LAS file (and survey,
 * when its folder has one), compute overburden, hydrostatic and shale points, and find the
 * trend to show first. File I/O lives here (picker/ is an edge folder); the computations are
 * the core modules'.
 */
import { existsSync, readFileSync, readdirSync, realpathSync, statSync } from "node:fs";
import { basename, dirname, extname, join, resolve } from "node:path";
import { ShalepointError } from "../errors.js";
import { UNITS, parseLasUnit } from "../units/index.js";
import { readWellFromLas } from "../io/loadWell.js";
import { readDirectionalSurvey } from "../io/tables.js";
import { parseTrendFile, TREND_FILE_CAUTION } from "../io/trendFile.js";
import { surveyPathAtMd } from "../well/surveyPathAtMd.js";
import { mudlineTvdFt } from "../well/depthReference.js";
import { depthReferenceArrays } from "../well/depthReferenceArrays.js";
import { flagBadHole } from "../logs/flagBadHole.js";
import { pickShalePoints } from "../logs/pickShalePoints.js";
import { integrateOverburden } from "../stress/overburden.js";
import { hydrostaticPressure } from "../stress/hydrostatic.js";
import { fitCompactionTrend } from "../trend/fitCompactionTrend.js";
import type { BmlInterval, CompactionTrend } from "../trend/trendTypes.js";
import { SAFETY_CAUTION_TEXT } from "../present/caution.js";
import { readInputText } from "../study/readInputFile.js";
import type { PickerWellData } from "./pickerModel.js";

/** Options of {@link loadPickerWell}. Give `wellDir` or `lasPath`. */
export interface PickerWellOptions {
  /** Folder holding one well's files (one `.las`, optionally `survey.csv`). */
  wellDir?: string;
  /** A LAS file; its folder is the well folder. */
  lasPath?: string;
  /** A trend file to show first (read only; Save always writes the fixed file in the well folder). */
  trendPath?: string;
  /** GR cutoff for shale, API; default 75 (common practice, no source: between sand ~35 and shale ~105 API). */
  shaleGrCutoffApi?: number;
  /** One shale point per TVD window of this size, ft; default 25. */
  pointWindowFt?: number;
  /** Brine gradient, psi/ft; default the LAS ~P item HYDG. */
  hydrostaticGradientPsiPerFt?: number;
  /** Intervals (ft below mudline) for the first fit; default the shallowest 30 % of the points. */
  intervalsBmlFt?: BmlInterval[];
  /** Matrix slowness for the exponential sonic trend, µs/ft; default 65. */
  dtMatrixUsPerFt?: number;
}

/** Result of {@link loadPickerWell}: page data plus where Save writes. */
export interface PickerWell {
  data: PickerWellData;
  /** Real path of the well folder. */
  wellDir: string;
  /** Absolute save paths by log (inside `wellDir`). */
  savePaths: { sonic: string; resistivity: string };
}

function finiteOrNull(a: ArrayLike<number>): number[] {
  const out: number[] = new Array(a.length);
  for (let i = 0; i < a.length; i++) out[i] = Number.isFinite(a[i]) ? a[i] : (null as unknown as number);
  return out;
}

function findLas(wellDir: string): string {
  let names: string[];
  try {
    names = readdirSync(wellDir).filter((n) => extname(n).toLowerCase() === ".las");
  } catch {
    throw new ShalepointError("E_PICKER_WELL_DIR", "cannot read the well folder", { file: wellDir, hint: "Give the folder that holds the well's .las file." });
  }
  if (names.length !== 1) {
    throw new ShalepointError("E_PICKER_WELL_DIR", `the well folder must hold exactly one .las file, found ${names.length}`, {
      file: wellDir, value: names.slice(0, 5).join(", "), hint: "Give the LAS file itself instead (lasPath / --las).",
    });
  }
  return join(wellDir, names[0]);
}

function hydrostaticFromHeader(parameters: { mnemonic: string; unit: string; value: string; line?: number }[], file: string): number {
  const item = parameters.find((p) => p.mnemonic.toUpperCase() === "HYDG");
  if (!item) {
    throw new ShalepointError("E_PICKER_HYDROSTATIC", "the LAS file has no HYDG (brine gradient) item in ~P", {
      file, hint: "Add HYDG.PSI/FT to the ~P section, or give hydrostaticGradientPsiPerFt (typical 0.44–0.465 psi/ft).",
    });
  }
  const id = parseLasUnit(item.unit);
  const v = Number(item.value);
  if (id === undefined || UNITS[id].quantity !== "gradient" || !Number.isFinite(v)) {
    throw new ShalepointError("E_PICKER_HYDROSTATIC", "HYDG needs a gradient unit and a number", {
      file, line: item.line, param: "HYDG", value: `${item.value} ${item.unit}`, allowed: "e.g. 0.445 PSI/FT or 10.07 KPA/M",
    });
  }
  return v * UNITS[id].factor;
}

/** Save file names for a well: `<las base>.sonic-trend.json`, `<las base>.resistivity-trend.json`. */
export function pickerSaveFileNames(lasPath: string): { sonic: string; resistivity: string } {
  const base = basename(lasPath, extname(lasPath));
  return { sonic: `${base}.sonic-trend.json`, resistivity: `${base}.resistivity-trend.json` };
}

/**
 * Load a well for the picking page.
 *
 * Steps: LAS → Well (lasToWell; datums from ERT, WDEP, SWDEN); TVD from `survey.csv` by
 * minimum curvature when the folder has one, else TVD = MD; bad hole from caliper vs bit size
 * (1 in; common practice, no source); overburden by integrateOverburden (Zoback 2007 eq. 1.6,
 * near-mudline power law, Gardner patches); hydrostatic from sea level with the HYDG gradient;
 * shale points (GR cutoff, one per window) carrying DT and resistivity medians; the first
 * trend from `trendPath`, else the saved sonic trend file, else a least-squares semilog fit
 * on the first intervals.
 *
 * @param options see {@link PickerWellOptions}
 * @returns {@link PickerWell}
 * @throws ShalepointError E_PICKER_WELL_DIR (no single LAS), E_PICKER_HYDROSTATIC (no HYDG),
 *   E_PICKER_NO_SHALE (no shale point with a log value), E_TREND_FILE / E_TREND_FILE_JSON
 *   (malformed trend file, naming the file), E_TREND_TOO_FEW_POINTS (no shale points in the
 *   given intervals), every error of the LAS and table readers
 */
export function loadPickerWell(options: PickerWellOptions): PickerWell {
  let lasPath: string;
  if (options.lasPath !== undefined) lasPath = resolve(options.lasPath);
  else if (options.wellDir !== undefined) lasPath = findLas(resolve(options.wellDir));
  else throw new ShalepointError("E_PICKER_WELL_DIR", "give a well folder or a LAS file", { param: "wellDir | lasPath" });
  if (!existsSync(lasPath) || !statSync(lasPath).isFile()) {
    throw new ShalepointError("E_PICKER_WELL_DIR", "LAS file not found", { file: lasPath });
  }
  const wellDir = realpathSync(dirname(lasPath));
  const lasName = basename(lasPath);
  // Size and binary checks before reading (a 2 GB or binary file is refused early).
  const text = readInputText(lasPath, { param: "lasPath" }).text;

  const surveyPath = join(wellDir, "survey.csv");
  const survey = existsSync(surveyPath)
    ? readDirectionalSurvey(readInputText(surveyPath, { param: "survey.csv" }).text, { file: "survey.csv" }).records.map((r) => ({ mdFt: r.mdFt, incDeg: r.incDeg, aziDeg: r.aziDeg }))
    : undefined;
  const { well, las } = readWellFromLas(text, {
    file: lasName,
    tvd: survey ? { kind: "callback", tvdFromMd: (md) => surveyPathAtMd({ survey, mdFt: md }).tvdFt } : { kind: "vertical" },
  });
  const gradient = options.hydrostaticGradientPsiPerFt ?? hydrostaticFromHeader(las.parameters, lasName);
  const tvd = well.tvdFt;
  const n = tvd.length;
  const nanCurve = (): Float64Array => new Float64Array(n).fill(NaN);
  const gr = well.curves.gammaRay?.values ?? nanCurve();
  const dt = well.curves.slowness?.values ?? nanCurve();
  const res = well.curves.resistivity?.values ?? nanCurve();
  const rho = well.curves.density?.values ?? nanCurve();
  const cal = well.curves.caliper?.values;
  const bit = well.curves.bitSize?.values;
  const badHole = cal && bit ? flagBadHole({ caliperIn: cal, bitSizeIn: bit }).isBadHole : undefined;

  const ob = integrateOverburden({ tvdFt: tvd, datums: well.datums, densityGcc: rho, slownessUsPerFt: dt, badHoleFlag: badHole });
  const ph = hydrostaticPressure({ tvdFt: tvd, datums: well.datums, gradientPsiPerFt: gradient });
  const { bmlFt } = depthReferenceArrays({ tvdFt: tvd, datums: well.datums });

  const pick = pickShalePoints({
    tvdFt: tvd,
    grApi: gr,
    criterion: { kind: "grCutoff", cutoffApi: options.shaleGrCutoffApi ?? 75 },
    decimation: { kind: "window", windowFt: options.pointWindowFt ?? 25 },
    curves: { dt, res },
  });
  const p = pick.points;
  const m = p.index.length;
  let nWithLog = 0;
  for (let k = 0; k < m; k++) if (Number.isFinite(p.values.dt[k]) || Number.isFinite(p.values.res[k])) nWithLog++;
  if (nWithLog === 0) {
    throw new ShalepointError("E_PICKER_NO_SHALE", "the well has no shale point with a sonic or resistivity value", {
      file: lasName, param: "shaleGrCutoffApi", value: options.shaleGrCutoffApi ?? 75, unit: "API",
      hint: "Lower the GR cutoff, or check the GR, DT and resistivity curves of the file.",
    });
  }
  const pointBml = Array.from(p.index, (i) => bmlFt[i]);
  const points = {
    tvdFt: Array.from(p.tvdFt),
    bmlFt: pointBml,
    dtUsPerFt: finiteOrNull(p.values.dt),
    resistivityOhmM: finiteOrNull(p.values.res),
    svPsi: finiteOrNull(Array.from(p.index, (i) => ob.svPsi[i])),
    phPsi: finiteOrNull(Array.from(p.index, (i) => ph[i])),
  };

  // Coarse profile (about 400 samples) for the pressure track.
  const stride = Math.max(1, Math.floor(n / 400));
  const profile = { tvdFt: [] as number[], svPsi: [] as number[], phPsi: [] as number[] };
  for (let i = 0; i < n; i += stride) {
    if (!Number.isFinite(ob.svPsi[i])) continue;
    profile.tvdFt.push(tvd[i]);
    profile.svPsi.push(ob.svPsi[i]);
    profile.phPsi.push(ph[i]);
  }

  const zTop = Math.min(...pointBml.filter(Number.isFinite));
  const zBase = Math.max(...pointBml.filter(Number.isFinite));
  const intervals = options.intervalsBmlFt?.map((iv) => ({ ...iv })) ?? [
    { topBmlFt: Math.floor(zTop), baseBmlFt: Math.ceil(zTop + 0.3 * (zBase - zTop)) },
  ];
  const dtMatrixUsPerFt = options.dtMatrixUsPerFt ?? 65;
  const saveFileNames = pickerSaveFileNames(lasName);
  const savePaths = { sonic: join(wellDir, saveFileNames.sonic), resistivity: join(wellDir, saveFileNames.resistivity) };

  let trend: CompactionTrend;
  let trendSource: string;
  const readTrend = (path: string): CompactionTrend => {
    let body: string;
    try {
      body = readFileSync(path, "utf8");
    } catch {
      throw new ShalepointError("E_TREND_FILE", "cannot read the trend file", { file: basename(path), hint: "Check the path given for the trend file." });
    }
    return parseTrendFile(body, basename(path));
  };
  if (options.trendPath !== undefined) {
    trend = readTrend(resolve(options.trendPath));
    trendSource = basename(options.trendPath);
  } else if (existsSync(savePaths.sonic)) {
    trend = readTrend(savePaths.sonic);
    trendSource = saveFileNames.sonic;
  } else {
    const fit = fitCompactionTrend({
      kind: "sonicLogLinear",
      bmlFt: pointBml,
      values: p.values.dt,
      intervals,
    });
    trend = {
      kind: "sonicLogLinear",
      segments: [{
        topBmlFt: 0,
        params: fit.params,
        fittedOn: {
          method: "leastSquares",
          intervals: intervals.map((iv) => ({ ...iv })),
          n: fit.diagnostics.n,
          rSquared: Number.isFinite(fit.diagnostics.rSquared) ? fit.diagnostics.rSquared : null,
          residualStd: Number.isFinite(fit.diagnostics.residualStd) ? fit.diagnostics.residualStd : null,
          depthRange: fit.diagnostics.depthRange,
        },
      }],
    };
    trendSource = "initial least-squares fit";
  }
  const firstFit = trend.segments[0].fittedOn;
  const shownIntervals = options.intervalsBmlFt !== undefined || !firstFit ? intervals : firstFit.intervals.map((iv) => ({ ...iv }));

  return {
    wellDir,
    savePaths,
    data: {
      wellName: well.name,
      mudlineTvdFt: mudlineTvdFt(well.datums),
      hydrostaticGradientPsiPerFt: gradient,
      points,
      profile,
      trend,
      trendSource,
      intervals: shownIntervals,
      dtMatrixUsPerFt,
      saveFileNames,
      caution: `${SAFETY_CAUTION_TEXT} ${TREND_FILE_CAUTION}`,
    },
  };
}
