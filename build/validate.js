/**
 * Offline manifest validation: `npm run validate [manifest.xml ...]` checks each XML manifest
 * (default: manifest.xml, and dist/manifest.xml and release/manifest.xml when built) with
 * xmllint against Microsoft's XSDs for the add-in-only manifest in ../shared/office-schemas/
 * (see its README; xmllint is Debian's libxml2-utils). Exits 1 on any failure.
 *
 * The schemas are looked for in `shared/office-schemas` beside the repository (a fresh clone
 * with shared/ as ../shared), then beside each parent folder (a git worktree nested deeper),
 * or where SPANWISE_OFFICE_SCHEMAS points.
 */
"use strict";
const { execFileSync } = require("child_process");
const fs = require("fs");
const path = require("path");

const ROOT = path.resolve(__dirname, "..");
const MAIN_SCHEMA = "OfficeAppManifestV1_1.xsd";

/** The folder holding the XSDs, or null. */
function findSchemas(root = ROOT, env = process.env) {
  if (env.SPANWISE_OFFICE_SCHEMAS) return fs.existsSync(path.join(env.SPANWISE_OFFICE_SCHEMAS, MAIN_SCHEMA)) ? path.resolve(env.SPANWISE_OFFICE_SCHEMAS) : null;
  for (let dir = path.resolve(root); ; dir = path.dirname(dir)) {
    const candidate = path.join(path.dirname(dir), "shared", "office-schemas");
    if (fs.existsSync(path.join(candidate, MAIN_SCHEMA))) return candidate;
    if (path.dirname(dir) === dir) return null;
  }
}

/** Validates one manifest; returns { ok, output }. Throws when xmllint or the schemas are missing. */
function validateManifest(file, schemas = findSchemas()) {
  if (!schemas) throw new Error(`no ${MAIN_SCHEMA}: put the shared folder beside the repository (../shared/office-schemas) or set SPANWISE_OFFICE_SCHEMAS`);
  try {
    const output = execFileSync("xmllint", ["--noout", "--nonet", "--schema", path.join(schemas, MAIN_SCHEMA), file], { encoding: "utf8", stdio: "pipe" });
    return { ok: true, output };
  } catch (error) {
    if (error.code === "ENOENT") throw new Error("xmllint is not installed (Debian/Ubuntu: apt-get install libxml2-utils; macOS ships it)");
    return { ok: false, output: `${error.stdout || ""}${error.stderr || ""}`.trim() };
  }
}

function main(args) {
  const files = args.length > 0 ? args : ["manifest.xml", "dist/manifest.xml", "release/manifest.xml"].filter((f, i) => i === 0 || fs.existsSync(path.join(ROOT, f)));
  let failed = 0;
  for (const file of files) {
    const full = path.resolve(ROOT, file);
    try {
      const result = validateManifest(full);
      if (result.ok) console.log(`${file}: valid against ${MAIN_SCHEMA}`);
      else {
        failed++;
        console.error(`${file}: INVALID\n${result.output}`);
      }
    } catch (error) {
      console.error(`validate: ${error.message}`);
      return 1;
    }
  }
  return failed ? 1 : 0;
}

if (require.main === module) process.exitCode = main(process.argv.slice(2));

module.exports = { findSchemas, validateManifest, MAIN_SCHEMA };
