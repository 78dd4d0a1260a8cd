/**
 * Lets Node run the project's TypeScript sources: a `.ts` module runs from the built command
 * (lib/cli/, written by build/cli.js at `npm ci` through npm's "prepare" step) when the
 * build has that module and its source is unchanged (same SHA-256); otherwise the source is
 * compiled on load with the TypeScript compiler (transpile.js), so an edited checkout, a
 * missing build or a module outside the command (benchmarks) still runs, only slower to start.
 * The module keeps its own file name either way (__dirname, relative requires, stack traces).
 *
 * SPANWISE_CLI_BUILD=require refuses to compile anything on the fly (a missing or stale
 * build is an error naming the module and the fix); SPANWISE_CLI_BUILD=source ignores the
 * build. Used by src/cli/bin/spanwise.js and tests/bench/run.js.
 */
"use strict";
const fs = require("fs");
const path = require("path");
const { ROOT, buildDir, transformKey, transpile, hashOf } = require("./transpile");

const mode = process.env.SPANWISE_CLI_BUILD || "auto";
if (!["auto", "require", "source"].includes(mode)) throw new Error(`SPANWISE_CLI_BUILD is "${mode}": use auto, require or source`);

let manifest;
let typescript;

/** The build's manifest, read once; null when there is none (or it cannot be read). */
function builtManifest() {
  if (manifest === undefined) {
    manifest = null;
    if (mode !== "source") {
      try {
        const read = JSON.parse(fs.readFileSync(path.join(buildDir(), "manifest.json"), "utf8"));
        manifest = read.transform === transformKey() ? read : null;
      } catch {
        manifest = null;
      }
    }
  }
  return manifest;
}

/** The built JavaScript of a module whose source is `source`, or null when the build does not have it. */
function builtOutput(filename, source) {
  const built = builtManifest();
  if (!built) return null;
  const entry = built.files[path.relative(ROOT, filename).split(path.sep).join("/")];
  if (!entry || entry.source !== hashOf(source)) return null;
  let output;
  try {
    output = fs.readFileSync(path.join(buildDir(), entry.output), "utf8");
  } catch {
    return null;
  }
  return hashOf(output) === entry.hash ? output : null;
}

require.extensions[".ts"] = function compileTypeScript(module, filename) {
  const source = fs.readFileSync(filename, "utf8");
  let output = builtOutput(filename, source);
  if (output === null) {
    if (mode === "require") {
      throw new Error(
        `spanwise: the built command (${path.relative(ROOT, buildDir()) || buildDir()}) has no up-to-date ${path.relative(ROOT, filename)}; run \`npm run build:cli\``,
      );
    }
    typescript = typescript || require("typescript");
    output = transpile(typescript, source, filename);
  }
  module._compile(output, filename);
};
