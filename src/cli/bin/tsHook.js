/**
 * Lets Node run the project's TypeScript sources directly: each .ts file is transpiled on
 * load with the TypeScript compiler (types are checked by `npm run typecheck`, not here).
 * Used by src/cli/bin/spanwise.js and tests/bench/run.js so `npx spanwise ...` works right after `npm ci`, without a build.
 */
"use strict";
const fs = require("fs");
const ts = require("typescript");

const compilerOptions = {
  module: ts.ModuleKind.CommonJS,
  target: ts.ScriptTarget.ES2020,
  esModuleInterop: true,
  resolveJsonModule: true,
  sourceMap: false,
  inlineSourceMap: true,
};

require.extensions[".ts"] = function compileTypeScript(module, filename) {
  const source = fs.readFileSync(filename, "utf8");
  const { outputText } = ts.transpileModule(source, { compilerOptions, fileName: filename });
  module._compile(outputText, filename);
};
