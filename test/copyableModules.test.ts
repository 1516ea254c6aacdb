/**
 * Copyable modules: a user can lift one core method file into a script. For each module,
 * this test copies the file and only the files it imports (followed transitively through
 * its relative `import` lines — what the file itself declares it needs) into an empty
 * folder, compiles them there with the project's TypeScript compiler, runs a three-line
 * script, and checks the value against an outside check value.
 */
import { describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, relative, resolve } from "node:path";

const ROOT = resolve(__dirname, "..");
const SRC = join(ROOT, "src");
const TSC = join(ROOT, "node_modules", "typescript", "bin", "tsc");

/** Relative .js imports of a TypeScript source (import and export-from lines). */
function relativeImports(file: string): string[] {
  const text = readFileSync(file, "utf8");
  const out: string[] = [];
  for (const m of text.matchAll(/(?:import|export)\s[^;]*?from\s+"(\.{1,2}\/[^"]+)\.js"/g)) {
    out.push(resolve(dirname(file), m[1] + ".ts"));
  }
  return out;
}

/** The file and everything it needs, transitively. */
function closure(entry: string): string[] {
  const seen = new Set<string>();
  const stack = [resolve(SRC, entry)];
  while (stack.length > 0) {
    const f = stack.pop()!;
    if (seen.has(f)) continue;
    seen.add(f);
    stack.push(...relativeImports(f));
  }
  return [...seen].sort();
}

function runCopied(entry: string, script: string): { files: string[]; output: string } {
  const files = closure(entry);
  const dir = mkdtempSync(join(tmpdir(), "shalepoint-copy-"));
  try {
    for (const f of files) {
      const to = join(dir, "lib", relative(SRC, f));
      mkdirSync(dirname(to), { recursive: true });
      copyFileSync(f, to);
    }
    // No Node or DOM typings in the copy: the core must not need them.
    writeFileSync(join(dir, "main.ts"), `declare const console: { log(...args: unknown[]): void };\n${script}`);
    writeFileSync(join(dir, "package.json"), JSON.stringify({ type: "module" }));
    writeFileSync(
      join(dir, "tsconfig.json"),
      JSON.stringify({
        compilerOptions: { target: "ES2022", module: "NodeNext", moduleResolution: "NodeNext", strict: true, outDir: "out", types: [], lib: ["ES2022"], skipLibCheck: true },
        include: ["main.ts", "lib/**/*.ts"],
      }),
    );
    try {
      execFileSync(process.execPath, [TSC, "-p", "tsconfig.json"], { cwd: dir, encoding: "utf8", stdio: "pipe" });
    } catch (e) {
      throw new Error(`copied module did not compile:\n${(e as { stdout?: string }).stdout ?? ""}`);
    }
    const output = execFileSync(process.execPath, ["out/main.js"], { cwd: dir, encoding: "utf8" }).trim();
    return { files: files.map((f) => relative(SRC, f)), output };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe("copyable core modules", () => {
  it("porepressure/eaton.ts alone (plus what it imports) computes Eaton sonic: 0.6904 psi/ft (CHECK-VALUES §3, own case)", () => {
    const { files, output } = runCopied(
      "porepressure/eaton.ts",
      `import { eatonPorePressure } from "./lib/porepressure/eaton.js";
       console.log(eatonPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [10000 / 12000], exponent: 3 }).ppPsi[0]);`,
    );
    expect(Number(output) / 10000).toBeCloseTo(0.6904, 4);
    expect(files.every((f) => !f.startsWith("io/") && !f.startsWith("present/"))).toBe(true);
    expect(files.length).toBeLessThanOrEqual(4);
  });

  it("porepressure/bowersPorePressure.ts: Sv 10,000 psi, V 8000 ft/s, A 10.11, B 0.777 → Pp 8480 psi (CHECK-VALUES §4, own case)", () => {
    const { files, output } = runCopied(
      "porepressure/bowersPorePressure.ts",
      `import { bowersPorePressure } from "./lib/porepressure/bowersPorePressure.js";
       console.log(bowersPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], velocityFtPerS: [8000], a: 10.11, b: 0.777 }).ppPsi[0]);`,
    );
    expect(Number(output)).toBeCloseTo(8480, -1);
    expect(files.length).toBeLessThanOrEqual(5);
  });

  it("trend/fitCompactionTrend.ts recovers R0 0.8 ohm·m, b 1e-4 /ft and evaluates 2.175 ohm·m at 10,000 ft (CHECK-VALUES §2, own case)", () => {
    const { files, output } = runCopied(
      "trend/fitCompactionTrend.ts",
      `import { fitCompactionTrend } from "./lib/trend/fitCompactionTrend.js";
       const z = [1000, 2000, 3000, 4000]; const r = z.map((d) => 0.8 * Math.exp(1e-4 * d));
       const f = fitCompactionTrend({ kind: "resistivityLogLinear", bmlFt: z, values: r, intervals: [{ topBmlFt: 0, baseBmlFt: 5000 }] });
       console.log(f.params.r0OhmM * Math.exp(f.params.growthPerFt * 10000));`,
    );
    expect(Number(output)).toBeCloseTo(2.175, 3);
    expect(files.every((f) => f.startsWith("trend/") || f === "errors.ts" || f.startsWith("units/"))).toBe(true);
  });

  it("stress/overburden.ts: 1000 m of 1.03 g/cc seawater over 2000 m of 2.20 g/cc sediment → 53.25 MPa (CHECK-VALUES §1, own case)", () => {
    const { files, output } = runCopied(
      "stress/overburden.ts",
      `import { integrateOverburden } from "./lib/stress/overburden.js";
       const ft = (m: number) => m / 0.3048;
       const r = integrateOverburden({ tvdFt: [0, ft(1000), ft(3000)], datums: { rtElevationFt: 0, waterDepthFt: ft(1000), seawaterDensityGcc: 1.03 }, densityGcc: [NaN, 2.2, 2.2] });
       console.log(r.svPsi[2] * 6894.757 / 1e6);`,
    );
    expect(Number(output)).toBeCloseTo(53.25, 2);
    expect(files).toContain("units/index.ts");
    expect(files.every((f) => !f.startsWith("io/") && !f.startsWith("present/") && !f.startsWith("pipeline/"))).toBe(true);
  });
});
