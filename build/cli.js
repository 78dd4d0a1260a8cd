#!/usr/bin/env node
/**
 * Builds the `spanwise` command ahead of time, so a launch does not compile TypeScript (the
 * compiler alone takes longer to load than a one-cell workbook takes to calculate). Run by
 * npm's "prepare" step at `npm ci` / `npm install`, and by `npm run build:cli`.
 *
 * Every TypeScript module the command can load is compiled, starting at src/cli/main.ts and
 * following static imports, dynamic `import()` and `export ... from` (TypeScript's own
 * preProcessFile lists them), with the one transform of src/cli/bin/transpile.js, into
 * lib/cli/<source path>.js, beside a manifest of each source's and output's SHA-256 and of
 * the transform. src/cli/bin/tsHook.js runs a built module only while its source has that
 * hash and compiles the source otherwise. The new build replaces the old one by renaming a
 * whole folder, so a command started meanwhile sees one build or the other, never a mix.
 *
 *   node build/cli.js [--out <folder>]     # default lib/cli (or SPANWISE_CLI_BUILD_DIR)
 */
"use strict";
const fs = require("fs");
const path = require("path");
const ts = require("typescript");
const { ROOT, buildDir, transformKey, transpile, hashOf } = require("../src/cli/bin/transpile");

const ENTRY = path.join(ROOT, "src", "cli", "main.ts");

/** The project's .ts file a relative import names, or null (a package, a .js or .json file). */
function resolveImport(from, specifier) {
  if (!specifier.startsWith(".")) return null;
  const base = path.resolve(path.dirname(from), specifier);
  for (const candidate of [`${base}.ts`, path.join(base, "index.ts"), base]) {
    if (candidate.endsWith(".ts") && fs.existsSync(candidate) && fs.statSync(candidate).isFile()) return candidate;
  }
  return null;
}

/** Every module reachable from the entry, with its source text. */
function reachable(entry) {
  const sources = new Map();
  const pending = [entry];
  while (pending.length > 0) {
    const file = pending.pop();
    if (sources.has(file)) continue;
    const source = fs.readFileSync(file, "utf8");
    sources.set(file, source);
    for (const imported of ts.preProcessFile(source, true, true).importedFiles) {
      const target = resolveImport(file, imported.fileName);
      if (target && !sources.has(target)) pending.push(target);
    }
  }
  return sources;
}

function build(out) {
  const started = Date.now();
  const sources = reachable(ENTRY);
  const parent = path.dirname(out);
  fs.mkdirSync(parent, { recursive: true });
  const staging = fs.mkdtempSync(path.join(parent, `.${path.basename(out)}-`));
  const files = {};
  for (const [file, source] of [...sources].sort(([a], [b]) => (a < b ? -1 : 1))) {
    const relative = path.relative(ROOT, file).split(path.sep).join("/");
    const output = transpile(ts, source, file);
    const target = relative.replace(/\.ts$/, ".js");
    fs.mkdirSync(path.dirname(path.join(staging, target)), { recursive: true });
    fs.writeFileSync(path.join(staging, target), output);
    files[relative] = { source: hashOf(source), output: target, hash: hashOf(output) };
  }
  fs.writeFileSync(path.join(staging, "manifest.json"), `${JSON.stringify({ transform: transformKey(), entry: "src/cli/main.ts", files }, null, 1)}\n`);
  const old = `${staging}.old`;
  let replaced = false;
  try {
    fs.renameSync(out, old);
    replaced = true;
  } catch (error) {
    if (error.code !== "ENOENT") throw error;
  }
  fs.renameSync(staging, out);
  if (replaced) fs.rmSync(old, { recursive: true, force: true });
  console.log(`spanwise: built the command (${sources.size} modules) into ${path.relative(process.cwd(), out) || out} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

const args = process.argv.slice(2);
const at = args.indexOf("--out");
if (args.length > 0 && (at !== 0 || args.length !== 2)) {
  console.error("usage: node build/cli.js [--out <folder>]");
  process.exit(2);
}
build(at === 0 ? path.resolve(args[1]) : buildDir());
