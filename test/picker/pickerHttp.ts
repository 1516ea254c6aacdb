/** Test helpers: a copy of a demo well in a temporary folder, and raw HTTP requests. */
import { request } from "node:http";
import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const repo = join(fileURLToPath(new URL(".", import.meta.url)), "..", "..");

const made: string[] = [];

/** Remove every temporary well copy made by {@link copyDemoWell} in this test file. */
export function removeDemoWellCopies(): void {
  for (const dir of made.splice(0)) rmSync(dir, { recursive: true, force: true });
}

/** Copy demo-logs/<well>/<well>.las into <tmp>/<well>/ and return that folder (inside a parent folder). */
export function copyDemoWell(well = "quillon-a1"): { parent: string; wellDir: string } {
  const parent = mkdtempSync(join(tmpdir(), "shalepoint-picker-"));
  made.push(parent);
  const wellDir = join(parent, well);
  mkdirSync(wellDir);
  copyFileSync(join(repo, "demo-logs", well, `${well}.las`), join(wellDir, `${well}.las`));
  return { parent, wellDir };
}

export interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  text: string;
  json(): { error?: { code: string; message: string }; ok?: boolean; file?: string };
}

/** One HTTP request with full control of Host and Origin. */
export function rawRequest(
  origin: string,
  path: string,
  { method = "GET", headers = {}, body }: { method?: string; headers?: Record<string, string>; body?: string | Buffer } = {},
): Promise<RawResponse> {
  const u = new URL(origin);
  return new Promise((resolve, reject) => {
    const req = request({ host: u.hostname, port: Number(u.port), path, method, headers: { host: u.host, ...headers } }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => {
        const text = Buffer.concat(chunks).toString("utf8");
        resolve({ status: res.statusCode ?? 0, headers: res.headers, text, json: () => JSON.parse(text) });
      });
    });
    req.on("error", (e: NodeJS.ErrnoException) => {
      // The server may close early after refusing an oversized body; that is a refusal, not a failure.
      if (e.code === "EPIPE" || e.code === "ECONNRESET") resolve({ status: -1, headers: {}, text: "", json: () => ({}) });
      else reject(e);
    });
    if (body !== undefined) req.write(body);
    req.end();
  });
}
