/**
 * Command-line entry of the trend-picking page (wired into the CLI elsewhere).
 *
 * Arguments (our own names): `--well-dir <folder>` or `--las <file.las>`, optional
 * `--trend <file.json>` (a trend to show first; read only), `--port <n>` (default 0 = random).
 */
import { ShalepointError } from "../errors.js";
import { SAFETY_CAUTION_TEXT } from "../present/caution.js";
import { startTrendPicker, type TrendPickerHandle, type TrendPickerOptions } from "./server.js";

/** Where the command writes its lines (stdout by default). */
export interface PickerCommandOutput {
  out: (line: string) => void;
}

/**
 * Parse the picker's arguments.
 * @param args command arguments after the command name
 * @returns options for {@link startTrendPicker}
 * @throws ShalepointError E_PICKER_ARGS for an unknown option, a missing value, or no well given
 * @example parsePickerArgs(["--well-dir", "demo-logs/quillon-a1", "--port", "0"]) // { wellDir: "demo-logs/quillon-a1", port: 0 }
 */
export function parsePickerArgs(args: readonly string[]): TrendPickerOptions {
  const opts: TrendPickerOptions = {};
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    const value = (): string => {
      const v = args[i + 1];
      if (v === undefined || v.startsWith("--")) {
        throw new ShalepointError("E_PICKER_ARGS", `${a} needs a value`, { param: a });
      }
      i++;
      return v;
    };
    if (a === "--well-dir") opts.wellDir = value();
    else if (a === "--las") opts.lasPath = value();
    else if (a === "--trend") opts.trendPath = value();
    else if (a === "--port") {
      const v = value();
      const p = Number(v);
      if (!(Number.isInteger(p) && p >= 0 && p <= 65535)) {
        throw new ShalepointError("E_PICKER_ARGS", "--port must be an integer in [0, 65535]", { param: "--port", value: v });
      }
      opts.port = p;
    } else {
      throw new ShalepointError("E_PICKER_ARGS", `unknown option ${a}`, { param: a, allowed: "--well-dir, --las, --trend, --port" });
    }
  }
  if (opts.wellDir === undefined && opts.lasPath === undefined) {
    throw new ShalepointError("E_PICKER_ARGS", "give the well: --well-dir <folder> or --las <file.las>", { param: "--well-dir | --las" });
  }
  if (opts.wellDir !== undefined && opts.lasPath !== undefined) {
    throw new ShalepointError("E_PICKER_ARGS", "give --well-dir or --las, not both", { param: "--well-dir | --las" });
  }
  return opts;
}

/**
 * Start the trend-picking page and print its address (with the token) and the caution.
 * The server runs until `close()` is called (or the process ends).
 *
 * @param args e.g. `["--well-dir", "demo-logs/quillon-a1"]`
 * @param output where to print (default console.log)
 * @returns the running picker
 * @throws every error of {@link parsePickerArgs} and {@link startTrendPicker}
 */
export async function runPickerCommand(
  args: readonly string[],
  output: PickerCommandOutput = { out: (line) => console.log(line) },
): Promise<TrendPickerHandle> {
  const picker = await startTrendPicker({ ...parsePickerArgs(args), host: "127.0.0.1" });
  output.out(`Trend picking page: ${picker.url}`);
  output.out("Open it in a browser on this machine; the address holds a one-time token. Press Ctrl+C to stop.");
  output.out(`Save writes only ${picker.savePaths.sonic} or ${picker.savePaths.resistivity}.`);
  output.out(SAFETY_CAUTION_TEXT);
  return picker;
}
