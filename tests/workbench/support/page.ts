/**
 * The workbench page alone, for browser tests and the benchmark: built with the workbench
 * webpack config into test-artifacts/workbench-<mode> (never dist/), served on a free port,
 * opened in Debian's headless Chromium through playwright-core.
 */
import fs from "fs";
import path from "path";
import webpack from "webpack";
import { chromium, type BrowserContext } from "playwright-core";
import { serve } from "../../pane/browser/pages";

export const ROOT = path.resolve(__dirname, "..", "..", "..");
const ARTIFACTS = path.join(ROOT, "test-artifacts");

export function buildWorkbench(mode: "development" | "production"): Promise<string> {
  const out = path.join(ARTIFACTS, `workbench-${mode}`);
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const configure = require(path.join(ROOT, "webpack.config.js"));
  const config = configure.workbenchConfig({}, { mode });
  return new Promise((resolve, reject) =>
    webpack({ ...config, devtool: false, output: { ...config.output, path: out }, infrastructureLogging: { level: "error" } }).run((error, stats) => {
      if (error) reject(error);
      else if (stats?.hasErrors()) reject(new Error(stats.toString("errors-only")));
      else resolve(out);
    }),
  );
}

export { serve };

export async function openChromium(name: string, viewport = { width: 1400, height: 820 }): Promise<{ context: BrowserContext; close(): Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(ARTIFACTS, `chromium-${name}-`));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: "/usr/bin/chromium",
    viewport,
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  return {
    context,
    async close() {
      await context.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
