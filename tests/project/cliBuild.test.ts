/**
 * The built command (build/cli.js, run by npm's "prepare" step at `npm ci`): it holds every
 * module the command can load, each exactly the on-the-fly compiler's output for the current
 * source; the bin runs it without compiling anything (SPANWISE_CLI_BUILD=require) and prints
 * what the source-compiled command prints; a missing or stale module falls back to compiling
 * that source (the default) or, in require mode, fails naming the module and the fix.
 */
import { spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import ts from "typescript";
import ExcelJS from "exceljs";
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { transpile, hashOf } = require("../../src/cli/bin/transpile") as { transpile: (t: typeof ts, source: string, file: string) => string; hashOf: (text: string) => string };

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");

interface Manifest {
  transform: string;
  files: Record<string, { source: string; output: string; hash: string }>;
}

let dir: string;
let buildDir: string;
let book: string;

function spanwise(args: string[], env: Record<string, string>): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: "utf8", env: { ...process.env, ...env } });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

function manifestOf(folder: string): Manifest {
  return JSON.parse(fs.readFileSync(path.join(folder, "manifest.json"), "utf8")) as Manifest;
}

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-cli-build-"));
  buildDir = path.join(dir, "build");
  const built = spawnSync(process.execPath, [path.join(ROOT, "build", "cli.js"), "--out", buildDir], { cwd: ROOT, encoding: "utf8" });
  expect(built.stderr).toBe("");
  expect(built.status).toBe(0);
  book = path.join(dir, "one-cell.xlsx");
  const workbook = new ExcelJS.Workbook();
  workbook.addWorksheet("Sheet1").getCell("A1").value = { formula: 'INDEX(SPAN.MAXMOMENT("6 8 6","udl 2.5 D"),1,1)' } as ExcelJS.CellFormulaValue;
  await workbook.xlsx.writeFile(book);
}, 120000);

afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe("the built command", () => {
  it("is made at install: npm's prepare step runs build/cli.js", () => {
    const scripts = (JSON.parse(fs.readFileSync(path.join(ROOT, "package.json"), "utf8")) as { scripts: Record<string, string> }).scripts;
    expect(scripts.prepare).toMatch(/(^|&& )node build\/cli\.js( |$)/);
    expect(scripts["build:cli"]).toBe("node build/cli.js");
    expect(fs.readFileSync(path.join(ROOT, ".gitignore"), "utf8").split("\n")).toContain("/lib/");
  });

  it("holds each module as the on-the-fly compiler would compile its current source", () => {
    const { files } = manifestOf(buildDir);
    expect(Object.keys(files).length).toBeGreaterThan(20);
    for (const [relative, entry] of Object.entries(files)) {
      const source = fs.readFileSync(path.join(ROOT, relative), "utf8");
      expect([relative, entry.source]).toEqual([relative, hashOf(source)]);
      const output = fs.readFileSync(path.join(buildDir, entry.output), "utf8");
      expect([relative, output === transpile(ts, source, path.join(ROOT, relative))]).toEqual([relative, true]);
      expect(entry.hash).toBe(hashOf(output));
    }
  });

  it("holds the modules every command loads only when it runs", () => {
    const { files } = manifestOf(buildDir);
    const lazy = [...fs.readFileSync(path.join(ROOT, "src", "cli", "main.ts"), "utf8").matchAll(/import\("\.\/(\w+)"\)/g)].map((m) => `src/cli/${m[1]}.ts`);
    expect(lazy).toEqual(expect.arrayContaining(["src/cli/verify.ts", "src/cli/report.ts", "src/cli/start.ts", "src/cli/stop.ts", "src/cli/demoWorkbook.ts"]));
    for (const module of lazy) expect([module, module in files]).toEqual([module, true]);
  });

  it("runs calc and demo without compiling anything, printing what the source-compiled command prints", () => {
    const required = { SPANWISE_CLI_BUILD: "require", SPANWISE_CLI_BUILD_DIR: buildDir };
    const fromBuild = spanwise(["calc", book, "--csv", "Sheet1"], required);
    const fromSource = spanwise(["calc", book, "--csv", "Sheet1"], { SPANWISE_CLI_BUILD: "source" });
    expect(fromBuild.stderr).toBe(fromSource.stderr);
    expect(fromBuild.status).toBe(0);
    expect(fromBuild.stdout).toBe(fromSource.stdout);
    expect(Number(fromBuild.stdout.trim())).toBeCloseTo(7.36111111111111, 12);
    const demo = spanwise(["demo", "--out", path.join(dir, "demo.xlsx")], required);
    expect(demo.stderr).toBe(`spanwise: wrote the demo workbook to ${path.join(dir, "demo.xlsx")}\n`);
    expect(demo.status).toBe(0);
    expect(fs.statSync(path.join(dir, "demo.xlsx")).size).toBeGreaterThan(1000);
  }, 60000);

  it("falls back to compiling a stale module's source, and require mode names it", () => {
    const stale = path.join(dir, "stale");
    fs.cpSync(buildDir, stale, { recursive: true });
    const manifest = manifestOf(stale);
    manifest.files["src/cli/csv.ts"].source = hashOf("an older source");
    fs.writeFileSync(path.join(stale, "manifest.json"), JSON.stringify(manifest));
    const fallback = spanwise(["calc", book, "--csv", "Sheet1"], { SPANWISE_CLI_BUILD_DIR: stale });
    expect(fallback.status).toBe(0);
    expect(Number(fallback.stdout.trim())).toBeCloseTo(7.36111111111111, 12);
    const refused = spanwise(["calc", book, "--csv", "Sheet1"], { SPANWISE_CLI_BUILD: "require", SPANWISE_CLI_BUILD_DIR: stale });
    expect(refused.status).not.toBe(0);
    expect(refused.stderr).toContain("has no up-to-date src/cli/csv.ts; run `npm run build:cli`");
  }, 60000);

  it("runs from source when there is no build at all", () => {
    const none = spanwise(["calc", book, "--csv", "Sheet1"], { SPANWISE_CLI_BUILD_DIR: path.join(dir, "absent") });
    expect(none.status).toBe(0);
    expect(Number(none.stdout.trim())).toBeCloseTo(7.36111111111111, 12);
    const refused = spanwise(["help"], { SPANWISE_CLI_BUILD: "require", SPANWISE_CLI_BUILD_DIR: path.join(dir, "absent") });
    expect(refused.status).not.toBe(0);
    expect(refused.stderr).toContain("has no up-to-date src/cli/main.ts");
  }, 60000);
});
