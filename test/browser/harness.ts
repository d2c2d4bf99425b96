import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import { extname, join, normalize, resolve } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

/**
 * Browser-test harness: serves the BUILT dist/ on 127.0.0.1 (random port), drives Debian's
 * Chromium through playwright-core (never a downloaded browser), answers the Office.js request
 * with office-stub.js and aborts every other request that leaves 127.0.0.1, keeping a list.
 */
export const CHROMIUM = "/usr/bin/chromium";
export const OFFICE_JS = "https://appsforoffice.microsoft.com/lib/1/hosted/office.js";
export const DIST = resolve(__dirname, "../../dist");
const STUB = readFileSync(join(__dirname, "office-stub.js"), "utf8");

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".json": "application/json",
  ".png": "image/png",
  ".svg": "image/svg+xml",
  ".xml": "application/xml",
};

export interface Harness {
  origin: string;
  context: BrowserContext;
  /** URLs outside 127.0.0.1 that the pages asked for, other than Office.js (should stay empty). */
  blocked: string[];
  /** How many times Office.js was asked for. */
  officeJsRequests: number;
  close(): Promise<void>;
}

export async function startHarness(): Promise<Harness> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: the browser tests need Debian's Chromium (apt-get install -y chromium; .ci/run does it)`);
  if (!existsSync(join(DIST, "taskpane.html"))) throw new Error("dist/taskpane.html is missing: run `npm run build` (npm test does it)");

  const server: Server = createServer((req, res) => {
    const path = normalize(decodeURIComponent(new URL(req.url ?? "/", "http://x").pathname)).replace(/^([/\\])+/, "");
    const file = join(DIST, path);
    if (!file.startsWith(DIST) || !existsSync(file)) {
      res.writeHead(404).end();
      return;
    }
    res.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream", "cache-control": "no-store" }).end(readFileSync(file));
  });
  await new Promise<void>((ok) => server.listen(0, "127.0.0.1", ok));
  const origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  const profile = mkdtempSync(join(tmpdir(), "orbit-pane-profile-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
    viewport: { width: 320, height: 900 },
    deviceScaleFactor: 1,
  });

  const h: Harness = {
    origin,
    context,
    blocked: [],
    officeJsRequests: 0,
    async close() {
      await context.close();
      await new Promise<void>((ok) => server.close(() => ok()));
      rmSync(profile, { recursive: true, force: true });
    },
  };
  await context.route("**/*", async (route) => {
    const url = route.request().url();
    if (url.startsWith(origin + "/")) return route.continue();
    if (url === OFFICE_JS) {
      h.officeJsRequests++;
      return route.fulfill({ status: 200, contentType: "text/javascript; charset=utf-8", body: STUB });
    }
    if (url.startsWith("data:") || url === "about:blank") return route.continue();
    h.blocked.push(url);
    return route.abort("blockedbyclient");
  });
  return h;
}

/** Office's dark and light theme colours as the host reports them (shape of Office.context.officeTheme). */
export const OFFICE_DARK = { bodyBackgroundColor: "#292929", bodyForegroundColor: "#FFFFFF", controlBackgroundColor: "#3D3D3D", controlForegroundColor: "#FFFFFF" };
export const OFFICE_LIGHT = { bodyBackgroundColor: "#FFFFFF", bodyForegroundColor: "#262626", controlBackgroundColor: "#F3F3F3", controlForegroundColor: "#262626" };

export interface StubConfig {
  theme?: Record<string, string | boolean> | null;
  host?: string | null;
  colorScheme?: "light" | "dark";
  width?: number;
}

export interface PanePage {
  page: Page;
  pageErrors: string[];
  consoleErrors: string[];
}

/** Opens the pane with the stub configured; resolves once the pane is built and Excel is ready. */
export async function openPane(h: Harness, cfg: StubConfig = {}): Promise<PanePage> {
  const page = await h.context.newPage();
  const pageErrors: string[] = [];
  const consoleErrors: string[] = [];
  page.on("pageerror", (e) => pageErrors.push(String(e)));
  page.on("console", (m) => {
    if (m.type() === "error") consoleErrors.push(m.text());
  });
  await page.setViewportSize({ width: cfg.width ?? 320, height: 900 });
  await page.emulateMedia({ colorScheme: cfg.colorScheme ?? "light" });
  const stubConfig = { theme: cfg.theme ?? null, host: cfg.host === undefined ? "Excel" : cfg.host };
  await page.addInitScript((c) => {
    (window as unknown as { __stubConfig: unknown }).__stubConfig = c;
    const w = window as unknown as { __csp: string[]; __shifts: number[] };
    w.__csp = [];
    w.__shifts = [];
    document.addEventListener("securitypolicyviolation", (e) => w.__csp.push(`${e.violatedDirective} ${e.blockedURI}`));
    new PerformanceObserver((list) => {
      // Shifts right after user input do not count as layout instability (as in CLS).
      for (const entry of list.getEntries() as unknown as { value: number; hadRecentInput: boolean }[]) if (!entry.hadRecentInput) w.__shifts.push(entry.value);
    }).observe({ type: "layout-shift", buffered: true });
  }, stubConfig);
  await page.goto(`${h.origin}/taskpane.html`);
  await page.waitForSelector("body:not(.pending)");
  if (stubConfig.host === "Excel") await page.waitForSelector("#insert-table:not([disabled])");
  return { page, pageErrors, consoleErrors };
}

/** Calls a test hook of the stub in the page. */
export function stub<T>(page: Page, fn: string, ...args: unknown[]): Promise<T> {
  return page.evaluate(([f, a]) => (window as unknown as { __orbitStub: Record<string, (...x: unknown[]) => unknown> }).__orbitStub[f as string](...(a as unknown[])), [fn, args] as const) as Promise<T>;
}
