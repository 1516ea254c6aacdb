#!/usr/bin/env node
/**
 * The shalepoint command line: run a study, run the demo study, inspect a LAS or CSV file,
 * start the trend-picking page.
 *
 * Exit codes: 0 ok; 1 unexpected error; 2 bad input (usage, study file, input file);
 * 3 the run completed but with critical findings (mud-weight window inverted, or pore
 * pressure at or above the least principal stress).
 */
import { realpathSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { ShalepointError } from "../errors.js";
import { SAFETY_CAUTION_TEXT } from "../present/caution.js";
import { loadStudyConfig } from "../study/config.js";
import { runStudy, type StudyProgress } from "../study/runStudy.js";
import { writeStudyOutputs } from "../study/writeStudyOutputs.js";
import { shalepointPackageRoot, shalepointVersion } from "../study/packageVersion.js";
import { inspectInputFile } from "./inspectInputFile.js";
import { runFollowCommand, FOLLOW_HELP } from "./followCommand.js";

/** Exit codes of the CLI. */
export const CLI_EXIT = { ok: 0, unexpected: 1, badInput: 2, criticalFindings: 3 } as const;

/** Where the CLI writes; defaults to the process streams. */
export interface CliIo {
  out: (line: string) => void;
  err: (line: string) => void;
  /** Whether progress may be drawn on stderr (a TTY). */
  isTty: boolean;
  /** Write a progress line without a newline (carriage return overwrite). */
  progress?: (text: string) => void;
}

const EXIT_TEXT = `Exit codes:
  0  ok
  1  unexpected error (a bug: please report it with the message)
  2  bad input: wrong usage, a study-file key, a missing, binary or too large file,
     a LAS or CSV error
  3  the run completed, outputs were written, but with critical findings:
     mud-weight window inverted, or pore pressure at or above the least stress`;

const HELP: Record<string, string> = {
  main: `shalepoint ${"<command>"} [options]

Pore-pressure and fracture-gradient estimates from well logs.

Commands:
  run <study.json>        run a study and write its outputs
  demo                    run the demo study on the three invented Quillon Basin wells
  inspect <file>          check a LAS 2.0 or CSV file: what was found and what is wrong
  pick                    start the local trend-picking page for one well
  follow <study.json>     while drilling: append new log chunks from a folder, refresh the outputs

Options:
  --help, -h              help (also: shalepoint <command> --help)
  --version               print the version
  --quiet, -q             no progress and no summary lines (errors still go to stderr)

${EXIT_TEXT}`,
  run: `shalepoint run <study.json> [--out DIR] [--no-report] [--no-png] [--quiet]

Runs every well of the study file and writes into the output folder (output.folder in the
study, or --out): <well>.result.las, <well>.result.csv, study-summary.json, report.html,
pressure-chart.png. Files are written atomically; inputs are only read.

${EXIT_TEXT}`,
  demo: `shalepoint demo [--out DIR] [--no-report] [--no-png] [--quiet]

Runs demo-logs/demo-study.json (three invented wells of the fictional Quillon Basin) and
prints where the report is. Default output folder: ./shalepoint-demo-output.

${EXIT_TEXT}`,
  inspect: `shalepoint inspect <file.las|file.csv> [--max-size-mb N]

Reads one file and prints what was found (header, datums, curves with units, null fractions
and ranges; or the table kind, columns and rows) and what is wrong (errors with line and
column, warnings). Files above the size limit (default 500 MB) or holding NUL bytes are
refused before they are read.

${EXIT_TEXT}`,
  follow: `${FOLLOW_HELP}

${EXIT_TEXT}`,
  pick: `shalepoint pick (--well-dir <folder> | --las <file.las>) [--trend <trend.json>] [--port N]

Starts the trend-picking page on 127.0.0.1 and prints its address. Ctrl+C stops it.

${EXIT_TEXT}`,
};

function parseFlags(args: string[], allowed: Record<string, "flag" | "value">): { positional: string[]; flags: Record<string, string | true> } {
  const positional: string[] = [];
  const flags: Record<string, string | true> = {};
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a.startsWith("-") && a !== "-") {
      const name = a === "-q" ? "--quiet" : a === "-h" ? "--help" : a;
      const kind = allowed[name];
      if (kind === undefined) {
        throw new ShalepointError("E_USAGE", `unknown option ${a}`, { param: a, allowed: Object.keys(allowed).join(", ") });
      }
      if (kind === "value") {
        const v = args[i + 1];
        if (v === undefined || v.startsWith("--")) throw new ShalepointError("E_USAGE", `${name} needs a value`, { param: name });
        flags[name] = v;
        i++;
      } else flags[name] = true;
    } else positional.push(a);
  }
  return { positional, flags };
}

function defaultIo(): CliIo {
  return {
    out: (l) => process.stdout.write(l + "\n"),
    err: (l) => process.stderr.write(l + "\n"),
    isTty: Boolean(process.stderr.isTTY) && !process.env.CI,
    progress: (t) => process.stderr.write("\r" + t.padEnd(72).slice(0, 79)),
  };
}

async function runAndWrite(configPath: string, flags: Record<string, string | true>, io: CliIo, quiet: boolean): Promise<number> {
  const outOverride = typeof flags["--out"] === "string" ? (flags["--out"] as string) : undefined;
  const config = loadStudyConfig(configPath, { outDir: outOverride });
  const showProgress = io.isTty && !quiet && io.progress !== undefined;
  const onProgress = showProgress
    ? (p: StudyProgress) => io.progress!(`[${Math.round(p.fraction * 100).toString().padStart(3)}%] ${p.well}: ${p.stage}`)
    : undefined;
  const result = runStudy(config, { onProgress });
  if (showProgress) io.progress!("");
  if (showProgress) io.err("");
  const files = await writeStudyOutputs(result, config.outDir, {
    report: flags["--no-report"] ? false : undefined,
    chartPng: flags["--no-png"] ? false : undefined,
  });
  if (!quiet) {
    io.out(`Study: ${result.title} (${result.wells.length} well${result.wells.length === 1 ? "" : "s"})`);
    for (const w of result.wells) {
      const shoes = (w.stressWindow.casing?.shoeTvdFt ?? []).map((d) => d.toFixed(0)).join(", ") || "none";
      io.out(`  ${w.well.name}: primary ${w.prediction.primary}; casing shoes at ${shoes} ft TVD`);
    }
    io.out(`Outputs in ${files.outDir}`);
    if (files.report) io.out(`Report: ${files.report}`);
    for (const s of files.skipped) io.out(`Skipped ${s.file}: ${s.reason}`);
  }
  if (result.criticalFindings.length > 0) {
    io.err(`Critical findings (${result.criticalFindings.length}):`);
    for (const f of result.criticalFindings.slice(0, 20)) io.err(`  ${f.well ?? ""} ${f.code}: ${f.message}`);
    return CLI_EXIT.criticalFindings;
  }
  return CLI_EXIT.ok;
}

/**
 * Run the command line with the given arguments (without `node` and the script).
 *
 * Prints the safety caution once per run (on stdout, after the command's output; on stderr
 * with --quiet). Progress goes to stderr on a TTY only, never with --quiet or in CI.
 *
 * @param argv arguments, e.g. `["run", "study.json", "--out", "results"]`
 * @param io output sinks (default: process stdout/stderr)
 * @returns the exit code (see {@link CLI_EXIT})
 * @throws nothing: every error becomes a message and an exit code
 * @example await main(["--version"]) // prints "0.1.0", returns 0
 */
export async function main(argv: readonly string[], io: CliIo = defaultIo()): Promise<number> {
  const args = [...argv];
  const quiet = args.includes("--quiet") || args.includes("-q");
  let cautionShown = false;
  const caution = (): void => {
    if (cautionShown) return;
    cautionShown = true;
    (quiet ? io.err : io.out)(SAFETY_CAUTION_TEXT);
  };
  try {
    const command = args[0];
    if (command === undefined || command === "--help" || command === "-h" || command === "help") {
      io.out(HELP[args[1] ?? "main"] ?? HELP.main);
      caution();
      return CLI_EXIT.ok;
    }
    if (command === "--version") {
      io.out(shalepointVersion());
      return CLI_EXIT.ok;
    }
    const rest = args.slice(1);
    if (rest.includes("--help") || rest.includes("-h")) {
      if (!(command in HELP) || command === "main") throw new ShalepointError("E_USAGE", `unknown command '${command}'`, { allowed: "run, demo, inspect, pick" });
      io.out(HELP[command]);
      caution();
      return CLI_EXIT.ok;
    }
    switch (command) {
      case "run": {
        const { positional, flags } = parseFlags(rest, { "--out": "value", "--no-report": "flag", "--no-png": "flag", "--quiet": "flag" });
        if (positional.length !== 1) throw new ShalepointError("E_USAGE", "run needs exactly one study file", { hint: "shalepoint run <study.json>" });
        const code = await runAndWrite(positional[0], flags, io, quiet);
        caution();
        return code;
      }
      case "demo": {
        const { positional, flags } = parseFlags(rest, { "--out": "value", "--no-report": "flag", "--no-png": "flag", "--quiet": "flag" });
        if (positional.length > 0) throw new ShalepointError("E_USAGE", "demo takes no file argument", { value: positional[0], hint: "shalepoint demo [--out DIR]" });
        const study = join(shalepointPackageRoot(), "demo-logs", "demo-study.json");
        const out = typeof flags["--out"] === "string" ? flags["--out"] : resolve("shalepoint-demo-output");
        const code = await runAndWrite(study, { ...flags, "--out": out }, io, quiet);
        caution();
        return code;
      }
      case "inspect": {
        const { positional, flags } = parseFlags(rest, { "--max-size-mb": "value", "--quiet": "flag" });
        if (positional.length !== 1) throw new ShalepointError("E_USAGE", "inspect needs exactly one file", { hint: "shalepoint inspect <file.las|file.csv>" });
        let maxBytes: number | undefined;
        if (flags["--max-size-mb"] !== undefined) {
          const mb = Number(flags["--max-size-mb"]);
          if (!(Number.isFinite(mb) && mb > 0)) throw new ShalepointError("E_USAGE", "--max-size-mb must be a positive number", { param: "--max-size-mb", value: flags["--max-size-mb"] });
          maxBytes = Math.round(mb * 1e6);
        }
        const report = inspectInputFile(positional[0], { maxBytes });
        for (const line of report.lines) io.out(line);
        caution();
        return report.ok ? CLI_EXIT.ok : CLI_EXIT.badInput;
      }
      case "pick": {
        const { runPickerCommand } = await import("../picker/runPickerCommand.js");
        caution();
        // The picker prints its own caution line; ours above is the run's one notice.
        await runPickerCommand(rest.filter((a) => a !== "--quiet" && a !== "-q"), { out: (l) => (l === SAFETY_CAUTION_TEXT ? undefined : io.out(l)) });
        return CLI_EXIT.ok;
      }
      case "follow": {
        caution();
        return await runFollowCommand(rest.filter((a) => a !== "--quiet" && a !== "-q"), io);
      }
      default:
        throw new ShalepointError("E_USAGE", `unknown command '${command}'`, { value: command, allowed: "run, demo, inspect, pick, follow", hint: "shalepoint --help" });
    }
  } catch (e) {
    if (e instanceof ShalepointError) {
      io.err(`shalepoint: ${e.code}: ${e.message}`);
      caution();
      return CLI_EXIT.badInput;
    }
    io.err(`shalepoint: unexpected error: ${(e as Error)?.stack ?? String(e)}`);
    caution();
    return CLI_EXIT.unexpected;
  }
}

function invokedDirectly(): boolean {
  const script = process.argv[1];
  if (!script) return false;
  try {
    return pathToFileURL(realpathSync(script)).href === pathToFileURL(realpathSync(fileURLToPath(import.meta.url))).href;
  } catch {
    return false;
  }
}

if (invokedDirectly()) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (e: unknown) => {
      process.stderr.write(`shalepoint: ${String(e)}\n`);
      process.exitCode = CLI_EXIT.unexpected;
    },
  );
}
