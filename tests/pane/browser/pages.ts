/**
 * Browser-test support: builds the add-in and workbench pages into test-artifacts/pane-dist
 * (development mode, never touching dist/), serves them over HTTP on a free port, and opens
 * Debian's headless Chromium through playwright-core.
 */
import fs from "fs";
import http from "http";
import path from "path";
import webpack from "webpack";
import { chromium, type BrowserContext, type Frame, type Page } from "playwright-core";

export const ROOT = path.resolve(__dirname, "..", "..", "..");
export const ARTIFACTS = path.join(ROOT, "test-artifacts");
export const OUT = path.join(ARTIFACTS, "pane-dist");

export function buildPages(): Promise<void> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const config = require(path.join(ROOT, "webpack.config.js")) as {
    addinConfig(env: unknown, argv: unknown): webpack.Configuration;
    paneConfig(env: unknown, argv: unknown): webpack.Configuration;
    workbenchConfig(env: unknown, argv: unknown): webpack.Configuration;
  };
  const argv = { mode: "development" };
  const configs = [config.addinConfig({}, argv), config.paneConfig({}, argv), config.workbenchConfig({}, argv)].map((c) => ({
    ...c,
    devtool: false as const,
    output: { ...c.output, path: OUT },
    infrastructureLogging: { level: "error" as const },
  }));
  return new Promise((resolve, reject) => {
    webpack(configs, (error, stats) => {
      if (error) reject(error);
      else if (stats?.hasErrors()) reject(new Error(stats.toString({ preset: "errors-only" })));
      else resolve();
    });
  });
}

const TYPES: Record<string, string> = { ".html": "text/html", ".js": "text/javascript", ".json": "application/json", ".png": "image/png", ".xml": "application/xml" };

export function serve(root: string): Promise<{ url: string; close(): Promise<void> }> {
  const server = http.createServer((request, response) => {
    const file = path.resolve(root, "." + decodeURIComponent(new URL(request.url ?? "/", "http://x").pathname));
    if (!file.startsWith(root + path.sep) || !fs.existsSync(file) || !fs.statSync(file).isFile()) {
      response.writeHead(404).end();
      return;
    }
    response.writeHead(200, { "Content-Type": TYPES[path.extname(file)] ?? "application/octet-stream" });
    fs.createReadStream(file).pipe(response);
  });
  return new Promise((resolve) =>
    server.listen(0, "127.0.0.1", () => {
      const port = (server.address() as { port: number }).port;
      resolve({ url: `http://127.0.0.1:${port}`, close: () => new Promise((done) => server.close(() => done())) });
    }),
  );
}

export async function openBrowser(name: string): Promise<BrowserContext> {
  const dir = path.join(ARTIFACTS, `chromium-${name}-${process.pid}`);
  return chromium.launchPersistentContext(dir, {
    executablePath: "/usr/bin/chromium",
    viewport: { width: 1280, height: 900 },
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
}

/** The pane page with the workbench in its frame, as the browser tests drive it. */
export interface PaneOnWorkbench {
  context: BrowserContext;
  server: { url: string; close(): Promise<void> };
  page: Page;
  bench: Frame;
}

/** Builds the pages, serves them, and opens the pane (with the workbench frame) ready to use. */
export async function openPaneOnWorkbench(name: string): Promise<PaneOnWorkbench> {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  await buildPages();
  const server = await serve(OUT);
  const context = await openBrowser(name);
  const page = await context.newPage();
  page.on("pageerror", (error) => console.error("page error:", error.message));
  await page.goto(`${server.url}/taskpane.html`);
  await page.waitForSelector("body[data-pane-ready='true']", { timeout: 60000 });
  const bench = page.frames().find((f) => f.url().endsWith("/workbench.html"));
  if (!bench) throw new Error("the workbench frame is missing");
  return { context, server, page, bench };
}

/** Runs `body` in the workbench frame with `api` = window.spanwiseWorkbench and `args`. */
export async function inWorkbench<T>(bench: Frame, body: string, ...args: unknown[]): Promise<T> {
  return bench.evaluate(([code, a]) => new Function("api", "args", code)((window as any).spanwiseWorkbench, a), [body, args] as const) as Promise<T>;
}

/** Clicks a sheet tab and a cell as a user would, then waits until the pane has followed. */
export async function clickCellIn(page: Page, bench: Frame, sheet: string, address: string): Promise<void> {
  await bench.locator("#tabs button", { hasText: sheet }).click();
  // The grid keeps only the rows in view in the DOM: scroll to the cell first, as a user would.
  await inWorkbench(bench, "api.reveal(args[0])", `${sheet}!${address}`);
  const before = await page.$eval("#pane", (p) => Number((p as HTMLElement).dataset.refreshed ?? 0));
  await bench.locator(`td[data-address="${address}"]`).dispatchEvent("mousedown");
  await page.waitForFunction((b) => Number((document.querySelector("#pane") as HTMLElement).dataset.refreshed ?? 0) > b, before);
}
