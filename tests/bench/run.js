#!/usr/bin/env node
/**
 * Benchmark runner: `node tests/bench/run.js [filter]` runs every tests/bench/*.bench.ts (or
 * .bench.js) whose file name contains the filter, one after another. TypeScript is compiled
 * on the fly with the project's `typescript` (transpile only, no type check) through a
 * require hook, so benches import src/ modules directly. A bench file exports `run()` (which
 * may return a promise); the runner loads each file and calls it.
 */
const fs = require("fs");
const path = require("path");
require("../../src/cli/bin/tsHook");

async function main() {
  const filter = process.argv[2] || "";
  const files = fs
    .readdirSync(__dirname)
    .filter((name) => /\.bench\.(ts|js)$/.test(name) && name.includes(filter))
    .sort();
  if (files.length === 0) {
    console.error(`no benchmarks match "${filter}" in ${__dirname}`);
    process.exit(1);
  }
  for (const name of files) {
    console.log(`\n# ${name}`);
    const loaded = require(path.join(__dirname, name));
    if (typeof loaded.run !== "function") throw new Error(`${name} does not export run()`);
    await loaded.run();
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
