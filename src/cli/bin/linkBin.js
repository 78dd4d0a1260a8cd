/**
 * Run by npm's "prepare" step after `npm ci` / `npm install` in this checkout: links the
 * project's own command into node_modules/.bin, so `npx spanwise ...` works here without a
 * global install (npm links only dependencies' commands, not the project's own).
 */
"use strict";
const fs = require("fs");
const path = require("path");

const root = path.resolve(__dirname, "../../..");
const binDir = path.join(root, "node_modules", ".bin");
const target = path.join(binDir, "spanwise");
const source = path.relative(binDir, path.join(__dirname, "spanwise.js"));

if (fs.existsSync(path.join(root, "node_modules"))) {
  fs.mkdirSync(binDir, { recursive: true });
  try {
    fs.unlinkSync(target);
  } catch {
    // nothing to replace
  }
  fs.symlinkSync(source, target);
  fs.chmodSync(path.join(__dirname, "spanwise.js"), 0o755);
}
