/**
 * Production builds of every shipped page for the hardening tests: the add-in (functions
 * and pane, through the shared tests/functions/build.ts) and the workbench, copied into one
 * folder so the pane's standalone mode finds the workbench beside it. Not a test file.
 */
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import webpack from "webpack";
import { buildAddin } from "../functions/build";

const ROOT = path.resolve(__dirname, "../..");

async function buildWorkbench(out: string): Promise<void> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const config = require(path.join(ROOT, "webpack.config.js")).workbenchConfig({}, { mode: "production" });
  const stats = await new Promise<webpack.Stats>((resolve, reject) =>
    webpack({ ...config, context: ROOT, devtool: false, output: { ...config.output, path: out } }, (err, s) => (err || !s ? reject(err) : resolve(s))),
  );
  if (stats.hasErrors()) throw new Error(stats.toString({ all: false, errors: true }));
}

/** Builds everything into a fresh temp folder and returns it. */
export async function buildAllPages(): Promise<string> {
  const out = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-pages-"));
  const addin = await buildAddin();
  fs.cpSync(addin, out, { recursive: true });
  await buildWorkbench(out);
  return out;
}

/** The shipped bundles (ours), not the copied host library under office-js/. */
export const OUR_BUNDLES = ["functions.js", "taskpane.js", "workbench.js"];
export const PAGES = ["functions.html", "taskpane.html", "workbench.html"];
