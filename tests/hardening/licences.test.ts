/**
 * The README's "## Runtime dependencies and licences" section names every runtime
 * dependency (package.json "dependencies" and every package bundled into the shipped
 * pages) with its licence as node_modules/<name>/package.json states it. The table is
 * printed by `node tests/bench/run.js licences`.
 */
import * as fs from "fs";
import * as path from "path";
import { runtimeDependencies, packageOf, type Dependency } from "./dependencies";

const SECTION = "## Runtime dependencies and licences";

function section(readme: string): string | null {
  const start = readme.indexOf(SECTION);
  if (start < 0) return null;
  const rest = readme.slice(start + SECTION.length);
  const next = rest.search(/\n## /);
  return next < 0 ? rest : rest.slice(0, next);
}

/** Dependencies the section does not name with their licence on one line. */
function missing(text: string, deps: Dependency[]): string[] {
  const lines = text.split("\n");
  const named = (name: string) => new RegExp(`(^|[^\\w@/-])${name.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&")}([^\\w/-]|$)`);
  return deps.filter((d) => !lines.some((line) => named(d.name).test(line) && line.includes(d.licence))).map((d) => `${d.name} (${d.licence})`);
}

let deps: Dependency[];

beforeAll(async () => {
  deps = await runtimeDependencies();
}, 300_000);

test("control: the check finds a dependency missing, or listed with the wrong licence", () => {
  const d: Dependency[] = [{ name: "tiny-emitter", version: "1", licence: "MIT", why: "" }];
  expect(missing("| tiny-emitter | MIT |", d)).toEqual([]);
  expect(missing("| tiny-emitter | ISC |", d)).toEqual(["tiny-emitter (MIT)"]);
  expect(missing("| tiny-emitter-extra | MIT |", d)).toEqual(["tiny-emitter (MIT)"]);
  expect(packageOf("/a/node_modules/@scope/pkg/lib/x.js")).toBe("@scope/pkg");
  expect(packageOf("/a/node_modules/x/node_modules/y/index.js")).toBe("y");
});

test("the list covers package.json dependencies and what the pages bundle", () => {
  const pkg = JSON.parse(fs.readFileSync(path.resolve(__dirname, "../../package.json"), "utf8"));
  for (const name of Object.keys(pkg.dependencies ?? {})) expect(deps.map((d) => d.name)).toContain(name);
  expect(deps.every((d) => d.licence && d.licence !== "UNKNOWN")).toBe(true);
});

test(`README.md has "${SECTION}" naming every runtime dependency with its licence`, () => {
  const readme = fs.readFileSync(path.resolve(__dirname, "../../README.md"), "utf8");
  const text = section(readme);
  if (text === null) throw new Error(`README.md has no "${SECTION}" section; print the table with: node tests/bench/run.js licences`);
  expect(missing(text, deps)).toEqual([]);
});
