/**
 * Local trend-picking server: one page, its data, and one save action, on 127.0.0.1 only.
 *
 * Security model (the page edits files on the user's disk):
 * - bound to a loopback address, random port by default;
 * - a per-launch random token (24 bytes, base64url) required on every request, in the query
 *   (`?token=`) or the `x-shalepoint-token` header, compared in constant time;
 * - the Host header must name the loopback address and port (defeats DNS rebinding), and any
 *   Origin header must be this server's own origin; a POST must carry that Origin;
 * - Save writes only a fixed file name inside the well folder (`<well>.sonic-trend.json` or
 *   `<well>.resistivity-trend.json`, chosen by the trend kind); the request cannot name a
 *   path. The body is validated with parseTrendFile before anything is written, then written
 *   to a temporary file in the same folder and renamed over the target (atomic on POSIX);
 * - request bodies over 256 KiB are refused (413); the page is served with a strict
 *   Content-Security-Policy (no outside source at all: it works offline).
 */
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import { randomBytes, timingSafeEqual } from "node:crypto";
import { rename, unlink, writeFile } from "node:fs/promises";
import { basename, dirname, join } from "node:path";
import { ShalepointError } from "../errors.js";
import { parseTrendFile, serializeTrendFile } from "../io/trendFile.js";
import { loadPickerWell, type PickerWellOptions } from "./loadPickerWell.js";
import { trendLogOf } from "./pickerModel.js";
import { pickerPageHtml } from "./pageHtml.js";
import { loadPickerClientBundle } from "./clientBundle.js";

/** Largest request body accepted, bytes. */
export const PICKER_MAX_BODY_BYTES = 256 * 1024;
/** Header that may carry the token instead of the query. */
export const PICKER_TOKEN_HEADER = "x-shalepoint-token";

/** Options of {@link startTrendPicker}. */
export interface TrendPickerOptions extends PickerWellOptions {
  /** Loopback address to bind; default and only accepted values "127.0.0.1" or "::1". */
  host?: string;
  /** Port; default 0 (a free port chosen by the system). */
  port?: number;
  /** Browser bundle to serve; default {@link loadPickerClientBundle}. */
  clientBundle?: string;
}

/** A running picker. */
export interface TrendPickerHandle {
  /** Page address including the token, e.g. `http://127.0.0.1:41234/?token=…`. */
  url: string;
  /** `http://127.0.0.1:41234` (no token). */
  origin: string;
  token: string;
  /** Absolute paths Save may write (by log). */
  savePaths: { sonic: string; resistivity: string };
  close(): Promise<void>;
}

/** Body keys that would name a location: refused with a clear message (the location is fixed). */
const SAVE_PATH_KEYS = new Set(["path", "file", "filename", "filepath", "target", "dir", "directory", "folder", "location", "name"]);

class HttpRefusal extends Error {
  constructor(readonly status: number, readonly code: string, message: string) {
    super(message);
  }
}

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  res.writeHead(status, {
    "content-type": "application/json; charset=utf-8",
    "content-length": Buffer.byteLength(text),
    "cache-control": "no-store",
    "x-content-type-options": "nosniff",
  });
  res.end(text);
}

function sendError(res: ServerResponse, status: number, code: string, message: string): void {
  sendJson(res, status, { error: { code, message } });
}

function sameSecret(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

function readBody(req: IncomingMessage, limit: number): Promise<string> {
  return new Promise((resolveBody, reject) => {
    const declared = Number(req.headers["content-length"]);
    if (Number.isFinite(declared) && declared > limit) {
      reject(new HttpRefusal(413, "E_PICKER_TOO_LARGE", `request body over ${limit} bytes`));
      return;
    }
    const chunks: Buffer[] = [];
    let size = 0;
    let done = false;
    req.on("data", (c: Buffer) => {
      if (done) return;
      size += c.length;
      if (size > limit) {
        done = true;
        reject(new HttpRefusal(413, "E_PICKER_TOO_LARGE", `request body over ${limit} bytes`));
        return;
      }
      chunks.push(c);
    });
    req.on("end", () => {
      if (!done) {
        done = true;
        resolveBody(Buffer.concat(chunks).toString("utf8"));
      }
    });
    req.on("error", (e) => {
      if (!done) {
        done = true;
        reject(e);
      }
    });
  });
}

/** Write text to `target` through a temporary file in the same folder and a rename. */
async function writeAtomically(target: string, text: string): Promise<void> {
  const tmp = join(dirname(target), `.${basename(target)}.${randomBytes(6).toString("hex")}.tmp`);
  try {
    await writeFile(tmp, text, { encoding: "utf8", flag: "wx", mode: 0o644 });
    await rename(tmp, target);
  } catch (e) {
    await unlink(tmp).catch(() => undefined);
    throw e;
  }
}

/**
 * Start the local trend-picking page for one well.
 *
 * @param options well (wellDir or lasPath), optional trendPath, host (loopback), port (0 = random)
 * @returns {@link TrendPickerHandle} once listening
 * @throws ShalepointError E_PICKER_HOST (not a loopback address), every error of
 *   {@link loadPickerWell} (malformed trend file, no shale points, no HYDG, …)
 * @example const picker = await startTrendPicker({ wellDir: "demo-logs/quillon-a1" }); console.log(picker.url); await picker.close();
 */
export async function startTrendPicker(options: TrendPickerOptions): Promise<TrendPickerHandle> {
  const host = options.host ?? "127.0.0.1";
  if (host !== "127.0.0.1" && host !== "::1") {
    throw new ShalepointError("E_PICKER_HOST", "the picking page binds to a loopback address only", {
      param: "host", value: host, allowed: "127.0.0.1 or ::1",
    });
  }
  const port = options.port ?? 0;
  if (!(Number.isInteger(port) && port >= 0 && port <= 65535)) {
    throw new ShalepointError("E_RANGE", "port must be an integer in [0, 65535]", { param: "port", value: port, allowed: "0 (random) to 65535" });
  }
  const prepared = loadPickerWell(options);
  const bundle = options.clientBundle ?? (await loadPickerClientBundle());
  const token = randomBytes(24).toString("base64url");
  const nonce = randomBytes(16).toString("base64");
  const page = pickerPageHtml({ wellName: prepared.data.wellName, caution: prepared.data.caution, bundle, nonce });
  const dataJson = JSON.stringify(prepared.data);

  let allowedHosts: string[] = [];
  let allowedOrigins: string[] = [];

  const handle = async (req: IncomingMessage, res: ServerResponse): Promise<void> => {
    const hostHeader = req.headers.host ?? "";
    if (!allowedHosts.includes(hostHeader)) throw new HttpRefusal(403, "E_PICKER_HOST", "unexpected Host header");
    const origin = req.headers.origin;
    if (origin !== undefined && !allowedOrigins.includes(origin)) throw new HttpRefusal(403, "E_PICKER_ORIGIN", "requests from other origins are refused");
    const url = new URL(req.url ?? "/", `http://${hostHeader}`);
    const given = url.searchParams.get("token") ?? (req.headers[PICKER_TOKEN_HEADER] as string | undefined) ?? "";
    if (!sameSecret(given, token)) throw new HttpRefusal(403, "E_PICKER_TOKEN", "missing or wrong token");

    if (req.method === "GET" && url.pathname === "/") {
      res.writeHead(200, {
        "content-type": "text/html; charset=utf-8",
        "content-length": Buffer.byteLength(page),
        "cache-control": "no-store",
        "x-content-type-options": "nosniff",
        "referrer-policy": "no-referrer",
        "x-frame-options": "DENY",
        "content-security-policy":
          `default-src 'none'; script-src 'nonce-${nonce}'; style-src 'unsafe-inline'; connect-src 'self'; img-src 'self' data:; ` +
          "base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
      });
      res.end(page);
      return;
    }
    if (req.method === "GET" && url.pathname === "/data") {
      res.writeHead(200, {
        "content-type": "application/json; charset=utf-8",
        "content-length": Buffer.byteLength(dataJson),
        "cache-control": "no-store",
        "x-content-type-options": "nosniff",
      });
      res.end(dataJson);
      return;
    }
    if (url.pathname === "/save") {
      if (req.method !== "POST") throw new HttpRefusal(405, "E_PICKER_METHOD", "save needs POST");
      if (origin === undefined) throw new HttpRefusal(403, "E_PICKER_ORIGIN", "a save request must carry this page's Origin");
      for (const key of url.searchParams.keys()) {
        if (key !== "token") {
          throw new HttpRefusal(400, "E_PICKER_SAVE_PATH", `the save location is fixed (the well folder's trend file); '${key}' is not accepted`);
        }
      }
      const type = (req.headers["content-type"] ?? "").split(";")[0].trim().toLowerCase();
      if (type !== "application/json") throw new HttpRefusal(415, "E_PICKER_CONTENT_TYPE", "save needs Content-Type: application/json");
      const body = await readBody(req, PICKER_MAX_BODY_BYTES);
      let parsedBody: unknown;
      try {
        parsedBody = JSON.parse(body);
      } catch {
        parsedBody = undefined; // parseTrendFile below reports the JSON error with its line
      }
      if (parsedBody !== null && typeof parsedBody === "object" && !Array.isArray(parsedBody)) {
        const pathKey = Object.keys(parsedBody).find((k) => SAVE_PATH_KEYS.has(k.toLowerCase()));
        if (pathKey !== undefined) {
          throw new HttpRefusal(400, "E_PICKER_SAVE_PATH", `the save location is fixed (the well folder's trend file); the body may hold the trend only, not '${pathKey}'`);
        }
      }
      let trend;
      try {
        trend = parseTrendFile(body, "request body");
      } catch (e) {
        if (e instanceof ShalepointError) throw new HttpRefusal(400, e.code, e.message);
        throw e;
      }
      const target = trendLogOf(trend.kind) === "sonic" ? prepared.savePaths.sonic : prepared.savePaths.resistivity;
      await writeAtomically(target, serializeTrendFile(trend));
      sendJson(res, 200, { ok: true, file: basename(target), kind: trend.kind });
      return;
    }
    throw new HttpRefusal(404, "E_PICKER_NOT_FOUND", "no such page");
  };

  const server: Server = createServer((req, res) => {
    handle(req, res).catch((e: unknown) => {
      if (e instanceof HttpRefusal) {
        if (e.status === 413) res.setHeader("connection", "close");
        sendError(res, e.status, e.code, e.message);
      } else {
        sendError(res, 500, "E_PICKER_INTERNAL", e instanceof Error ? e.message : String(e));
      }
    });
  });
  server.headersTimeout = 10_000;
  server.requestTimeout = 30_000;
  await new Promise<void>((resolveListen, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => resolveListen());
  });
  const address = server.address();
  const boundPort = typeof address === "object" && address !== null ? address.port : port;
  const hostInUrl = host === "::1" ? "[::1]" : host;
  allowedHosts = [`${hostInUrl}:${boundPort}`, `localhost:${boundPort}`];
  allowedOrigins = allowedHosts.map((h) => `http://${h}`);
  const origin = `http://${hostInUrl}:${boundPort}`;
  return {
    url: `${origin}/?token=${token}`,
    origin,
    token,
    savePaths: { ...prepared.savePaths },
    close: () =>
      new Promise<void>((resolveClose, reject) => {
        server.close((err) => (err ? reject(err) : resolveClose()));
        server.closeAllConnections();
      }),
  };
}
