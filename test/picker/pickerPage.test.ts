import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { mkdirSync, readFileSync } from "node:fs";
import { chromium, type Browser } from "playwright-core";
import { startTrendPicker, type TrendPickerHandle } from "../../src/picker/server.js";
import { loadPickerClientBundle } from "../../src/picker/clientBundle.js";
import { parseTrendFile } from "../../src/io/trendFile.js";
import { evaluateCompactionTrend } from "../../src/trend/evaluateCompactionTrend.js";
import { eatonSonicPorePressure } from "../../src/porepressure/eaton.js";
import type { CompactionTrend } from "../../src/trend/trendTypes.js";
import type { PickerWellData } from "../../src/picker/pickerModel.js";
import { copyDemoWell, rawRequest, removeDemoWellCopies } from "./pickerHttp.js";

let picker: TrendPickerHandle;
let browser: Browser;
let data: PickerWellData;

beforeAll(async () => {
  const { wellDir } = copyDemoWell("quillon-a1");
  // The page's script is the real esbuild bundle of src/picker/client/main.ts.
  picker = await startTrendPicker({ wellDir, host: "127.0.0.1", port: 0, clientBundle: await loadPickerClientBundle() });
  data = JSON.parse((await rawRequest(picker.origin, `/data?token=${picker.token}`)).text) as PickerWellData;
  browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
});
afterAll(async () => {
  await browser?.close();
  await picker?.close();
  removeDemoWellCopies();
});

/** Eaton sonic pore pressure at one shale point, computed here with the core modules (not the page's code path). */
function eatonAtPoint(trend: CompactionTrend, i: number): number {
  const dtn = evaluateCompactionTrend({ trend, bmlFt: [data.points.bmlFt[i]] });
  return eatonSonicPorePressure({
    overburdenPsi: [data.points.svPsi[i]],
    hydrostaticPsi: [data.points.phPsi[i]],
    dtUsPerFt: [data.points.dtUsPerFt[i]],
    dtTrendUsPerFt: dtn,
  }).ppPsi[0];
}

describe("trend-picking page in Chromium", () => {
  it("dragging a handle recomputes pore pressure as the core Eaton module does; Save writes the dragged trend", async () => {
    const page = await browser.newPage({ viewport: { width: 1040, height: 1000 } });
    const outside: string[] = [];
    page.on("request", (r) => {
      if (!r.url().startsWith(picker.origin)) outside.push(r.url());
    });
    const pageErrors: string[] = [];
    page.on("pageerror", (e) => pageErrors.push(e.message));
    await page.goto(picker.url);
    await page.waitForSelector("body[data-ready='1']");
    await expect.poll(() => page.locator("#status").textContent()).toContain("shale points");

    const readout = page.locator("#pp-readout");
    const trendOf = async (): Promise<CompactionTrend> => JSON.parse((await page.locator("#trend-params").getAttribute("data-trend")) ?? "null");
    const index = Number(await readout.getAttribute("data-point-index"));
    const pp0 = Number(await readout.getAttribute("data-pp-psi"));
    const trend0 = await trendOf();
    expect(index).toBeGreaterThanOrEqual(0);
    // The page's first readout equals Eaton 1975 (exponent 3.0) computed here for the page's first trend
    // (CHECK-VALUES §3 checks the Eaton module itself against published/own cases). Same double arithmetic: 1e-12.
    expect(Math.abs(pp0 - eatonAtPoint(trend0, index)) / pp0).toBeLessThan(1e-12);

    // Drag the lower handle 80 px to the right (slower trend at depth → lower pore pressure at depth).
    const handle = page.locator("#trend-handle-1");
    const box = await handle.boundingBox();
    expect(box).not.toBeNull();
    const cx = box!.x + box!.width / 2;
    const cy = box!.y + box!.height / 2;
    await page.mouse.move(cx, cy);
    await page.mouse.down();
    for (let k = 1; k <= 8; k++) await page.mouse.move(cx + 10 * k, cy);
    await page.mouse.up();

    const pp1 = Number(await readout.getAttribute("data-pp-psi"));
    const trend1 = await trendOf();
    expect(Number(await readout.getAttribute("data-point-index"))).toBe(index);
    expect(trend1.segments[0].fittedOn).toBeNull(); // moved by hand
    expect(trend1.segments[0].params).not.toEqual(trend0.segments[0].params);
    expect(Math.abs(pp1 - pp0)).toBeGreaterThan(1); // the readout changed
    // ... and equals what the core modules compute for the dragged trend
    expect(Math.abs(pp1 - eatonAtPoint(trend1, index)) / pp1).toBeLessThan(1e-12);
    // The upper handle did not move: the dragged trend still passes through the first trend's value at its
    // depth (the page puts it at 15 % of the shale-point depth span below mudline; two-point line, to round-off).
    const b = data.points.bmlFt;
    const zHandle0 = Math.round(Math.max(0, b[0]) + 0.15 * (b[b.length - 1] - Math.max(0, b[0])));
    const before = evaluateCompactionTrend({ trend: trend0, bmlFt: [zHandle0] })[0];
    const after = evaluateCompactionTrend({ trend: trend1, bmlFt: [zHandle0] })[0];
    expect(Math.abs(after - before) / before).toBeLessThan(1e-9);

    await page.locator("#save-button").click();
    await expect.poll(() => page.locator("#status").textContent()).toContain("Saved quillon-a1.sonic-trend.json");
    const saved = parseTrendFile(readFileSync(picker.savePaths.sonic, "utf8"));
    expect(saved.kind).toBe(trend1.kind);
    expect(saved.segments[0].params).toEqual(trend1.segments[0].params);

    mkdirSync("test-output", { recursive: true });
    await page.screenshot({ path: "test-output/picker.png", fullPage: true });

    // A fit with no interval selected shows the core module's message in the status line and changes nothing.
    await page.locator("#clear-intervals").click();
    await page.locator("#fit-button").click();
    await expect.poll(() => page.locator("#status").getAttribute("class")).toBe("bad");
    expect(await page.locator("#status").textContent()).toContain("no depth interval given");
    expect((await trendOf()).segments[0].params).toEqual(trend1.segments[0].params);

    expect(pageErrors).toEqual([]);
    expect(outside).toEqual([]); // offline: no request leaves the local server
    await page.close();
  });
});
