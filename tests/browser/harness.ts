// Test-time helpers for the browser proof: find Debian's Chromium, serve the repository's files on 127.0.0.1,
// and drive the browser with playwright-core pointed at that binary (no browser download).
import { existsSync, readFileSync, statSync } from "node:fs";
import { createServer, type Server } from "node:http";
import { extname, join, normalize, resolve, sep } from "node:path";
import { chromium, type Browser } from "playwright-core";

/** The repository root (tests/browser/..). */
export const ROOT = resolve(import.meta.dirname, "..", "..");

/** `FLEXURA_CHROMIUM` names the binary when set (and only it is tried); otherwise Debian's paths. */
const CANDIDATES =
  process.env.FLEXURA_CHROMIUM !== undefined && process.env.FLEXURA_CHROMIUM !== ""
    ? [process.env.FLEXURA_CHROMIUM]
    : ["/usr/bin/chromium", "/usr/bin/chromium-browser"];

/** Path of the Chromium binary, or undefined when none is installed. */
export const chromiumPath: string | undefined = CANDIDATES.find((p) => existsSync(p));

/** Whether the browser tests run: required under CI=true, skipped with one line elsewhere when Chromium is missing. */
export function browserAvailable(): boolean {
  if (chromiumPath !== undefined) return true;
  if (process.env.CI === "true") {
    throw new Error("CI=true but Chromium is missing: .ci/run installs it with apt-get (package chromium)");
  }
  console.log("browser tests skipped: Chromium not found; install it with `apt-get install chromium` (Debian)");
  return false;
}

/** Whether the built package is present (the browser tests run after `npm run build`). */
export function assertBuilt(): void {
  if (!existsSync(join(ROOT, "dist", "index.js"))) throw new Error("dist/ is missing: run `npm run build` before the browser tests");
}

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json",
  ".svg": "image/svg+xml",
};

/** Folders the test server may serve, relative to the root. */
const SERVED = ["dist", join("node_modules", "decimal.js"), join("tests", "browser"), join("examples", "web"), join(".tmp", "browser")];

/** A static file server on 127.0.0.1 (a free port) for the served folders; `close` stops it. */
export async function serveRoot(): Promise<{ url: string; close: () => Promise<void> }> {
  const server: Server = createServer((req, res) => {
    const path = decodeURIComponent(new URL(req.url ?? "/", "http://127.0.0.1").pathname);
    const file = normalize(join(ROOT, path));
    const allowed = SERVED.some((folder) => file.startsWith(join(ROOT, folder) + sep));
    if (!allowed || !existsSync(file) || !statSync(file).isFile()) {
      res.writeHead(404, { "content-type": "text/plain" });
      res.end(`not found: ${path}`);
      return;
    }
    res.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream" });
    res.end(readFileSync(file));
  });
  await new Promise<void>((ok) => server.listen(0, "127.0.0.1", ok));
  const address = server.address();
  const port = typeof address === "object" && address !== null ? address.port : 0;
  return {
    url: `http://127.0.0.1:${port}`,
    close: () => new Promise<void>((ok) => server.close(() => ok())),
  };
}

/** Launches headless Chromium with the flags this closed-network machine needs. */
export async function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath ?? "chromium",
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}
