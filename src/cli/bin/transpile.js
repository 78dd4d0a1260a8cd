/**
 * One definition of how the project's TypeScript becomes the JavaScript Node runs: the
 * compiler options, the per-file transform (TypeScript's transpileModule: CommonJS, no type
 * check; types are checked by `npm run typecheck`) and where the built command lives.
 * Used by build/cli.js (ahead of time, at `npm ci`) and by tsHook.js (on the fly, for any
 * module whose built output is missing or out of date).
 */
"use strict";
const crypto = require("crypto");
const path = require("path");

const ROOT = path.resolve(__dirname, "../../..");

/** Folder of the built command (gitignored); SPANWISE_CLI_BUILD_DIR points elsewhere, for tests. */
function buildDir() {
  return process.env.SPANWISE_CLI_BUILD_DIR ? path.resolve(process.env.SPANWISE_CLI_BUILD_DIR) : path.join(ROOT, "lib", "cli");
}

/**
 * Identifies the transform without loading the compiler: this file (the options) and the
 * installed TypeScript version. A build made by another transform is not used.
 */
function transformKey() {
  const fs = require("fs");
  const compiler = JSON.parse(fs.readFileSync(require.resolve("typescript/package.json"), "utf8")).version;
  return hashOf(`${fs.readFileSync(__filename, "utf8")}\ntypescript ${compiler}`);
}

function compilerOptions(ts) {
  return {
    module: ts.ModuleKind.CommonJS,
    target: ts.ScriptTarget.ES2020,
    esModuleInterop: true,
    resolveJsonModule: true,
    sourceMap: false,
    inlineSourceMap: true,
  };
}

/** CommonJS JavaScript of one TypeScript source, exactly as the loader would run it. */
function transpile(ts, source, fileName) {
  return ts.transpileModule(source, { compilerOptions: compilerOptions(ts), fileName }).outputText;
}

function hashOf(text) {
  return crypto.createHash("sha256").update(text).digest("hex");
}

module.exports = { ROOT, buildDir, transformKey, transpile, hashOf };
