/**
 * The functions bundle's size (issue 15's target: `functions.js` at most 70 KB minified,
 * 1 KB = 1024 bytes), read from the production build users run (`npx webpack --mode
 * production` writes dist/functions.js), without its source-map comment, as
 * tests/project/bundleSize.test.ts counts it for the README's figure.
 */
import * as fs from "fs";
import { DIST_FUNCTIONS, reportTarget, requireBuilt, type TargetResult } from "./measure";

/** Issue 15's bundle target, KB. */
const BUNDLE_KB = 70;

/** The bytes of a built functions.js as it ships: without its source-map comment (the README's figure counts the same). */
export function shippedBytes(code: string): number {
  return Buffer.byteLength(code.replace(/\n\/\/# sourceMappingURL=.*\s*$/, ""), "utf8");
}

export function bundleTarget(file = DIST_FUNCTIONS): TargetResult {
  requireBuilt(file);
  const bytes = shippedBytes(fs.readFileSync(file, "utf8"));
  const kb = bytes / 1024;
  return { target: "bundle", measured: `dist/functions.js ${kb.toFixed(1)} KB minified (${bytes} bytes)`, ratio: kb / BUNDLE_KB, ratioOf: `of ${BUNDLE_KB} KB`, limit: 1 };
}

export function run(): void {
  reportTarget(bundleTarget());
}
