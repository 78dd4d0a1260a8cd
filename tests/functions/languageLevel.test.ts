/**
 * The built bundles parse at the language level of the runtime that runs them (levels and
 * sources in webpack.config.js):
 * - functions.js at ECMAScript 2016: with separate runtimes, Windows runs it in the
 *   JavaScript-only custom-functions runtime, which supports ECMAScript 2016 (maintainer answer,
 *   OfficeDev/office-js-docs-pr#4496). Built-ins newer than that are allowed only through
 *   functions/es2016.ts, checked by type-checking the entry against the ES2016 library.
 * - taskpane.js at ECMAScript 2017: the webviews listed in "Browsers and webview controls used
 *   by Office Add-ins" (WebView2, EdgeHTML, WKWebView).
 * acorn (webpack's own parser, in node_modules) refuses any syntax above the level.
 */
import { execFileSync } from "child_process";
import * as fs from "fs";
import * as path from "path";
import { buildAddin } from "./build";
import { entries, flatMap, trimStart, values } from "../../functions/es2016";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const acorn = require("acorn") as typeof import("acorn");

const root = path.resolve(__dirname, "../..");

/** Parses at `level`; returns the syntax error (or "") and every regular expression the level rejects. */
function parse(code: string, level: 2016 | 2017 | 2020): { error: string; regexps: string[] } {
  const regexps: string[] = [];
  class Recording extends (acorn.Parser as unknown as { new (...args: unknown[]): { parse(): unknown } }) {
    raiseRecoverable(pos: number, message: string): void {
      if (message.startsWith("Invalid regular expression")) {
        const pattern = message.replace(/: [^:]*$/, "");
        if (!regexps.includes(pattern)) regexps.push(pattern);
      }
      else (acorn.Parser.prototype as unknown as { raise(p: number, m: string): void }).raise.call(this, pos, message);
    }
  }
  try {
    new Recording({ ecmaVersion: level, sourceType: "script" }, code).parse();
    return { error: "", regexps };
  } catch (e) {
    return { error: (e as Error).message, regexps };
  }
}

describe("control: the parser refuses what the level lacks", () => {
  test.each([
    ["a ?? b", 2016],
    ["a?.b", 2016],
    ["x = { ...y }", 2016],
    ["async function f() { await g(); }", 2016],
    ["x = 10n", 2017],
    ["async function f() { for await (const x of y) {} }", 2017],
  ] as const)("%s fails at ES%i", (code, level) => {
    expect(parse(code, level).error).not.toBe("");
    expect(parse(code, 2020).error).toBe("");
  });

  test("a lookbehind is reported as a regular expression above ES2017, not as a syntax error", () => {
    expect(parse("x = /(?<!a)b/", 2017)).toEqual({ error: "", regexps: [expect.stringMatching(/Invalid regular expression/)] });
    expect(parse("x = /(?<!a)b/", 2020)).toEqual({ error: "", regexps: [] });
  });
});

describe("built bundles", () => {
  let out: string;
  beforeAll(async () => {
    out = await buildAddin();
  }, 300_000);

  test("functions.js parses as ECMAScript 2016, regular expressions included, and names no newer global", () => {
    const code = fs.readFileSync(path.join(out, "functions.js"), "utf8");
    expect(code.length).toBeGreaterThan(10_000);
    expect(parse(code, 2016)).toEqual({ error: "", regexps: [] });
    // Globals that parse but do not exist in an ES2016 engine.
    expect(code.match(/\b(globalThis|BigInt|queueMicrotask|structuredClone|WeakRef|FinalizationRegistry|AggregateError)\b/g)).toBeNull();
  });

  test.each(["taskpane.js", "report-pdf.js"])("%s parses as ECMAScript 2017 syntax (report-pdf.js: the pane's PDF chunk, loaded on first use)", (file) => {
    const code = fs.readFileSync(path.join(out, file), "utf8");
    expect(code.length).toBeGreaterThan(10_000);
    expect(parse(code, 2017).error).toBe("");
  });

  // A lookbehind literal (ES2018) makes the whole script fail to parse in Safari before 16.4
  // (lookbehind support from memory), so the pane would not load in older Mac hosts.
  test("taskpane.js holds no regular expression above ECMAScript 2017 (lookbehind)", () => {
    const code = fs.readFileSync(path.join(out, "taskpane.js"), "utf8");
    expect(parse(code, 2017).regexps).toEqual([]);
    expect(code).not.toMatch(/\(\?<[!=]/);
  });
});

describe("built-ins newer than ES2016", () => {
  test("the functions entry type-checks against the ES2016 library plus functions/es2016.ts only", () => {
    const tsc = path.join(root, "node_modules", "typescript", "bin", "tsc");
    let output = "";
    try {
      execFileSync(process.execPath, [tsc, "-p", path.join(root, "tsconfig.functions.json")], { cwd: root, stdio: "pipe", encoding: "utf8" });
    } catch (e) {
      output = String((e as { stdout?: string }).stdout ?? e);
    }
    expect(output).toBe("");
  }, 120_000);

  test("control: that check rejects a newer built-in", () => {
    const probe = path.join(root, "functions", ".probe-es2017.ts");
    const config = path.join(root, ".probe-tsconfig.json");
    fs.writeFileSync(probe, 'export const padded = "1".padStart(3, "0");\n');
    fs.writeFileSync(config, JSON.stringify({ extends: "./tsconfig.functions.json", files: ["functions/es2016.d.ts", "functions/.probe-es2017.ts"] }));
    let output = "";
    try {
      execFileSync(process.execPath, [path.join(root, "node_modules", "typescript", "bin", "tsc"), "-p", config], { cwd: root, stdio: "pipe", encoding: "utf8" });
    } catch (e) {
      output = String((e as { stdout?: string }).stdout ?? e);
    } finally {
      fs.rmSync(probe, { force: true });
      fs.rmSync(config, { force: true });
    }
    expect(output).toMatch(/padStart/);
  }, 120_000);

  test("the supplied built-ins agree with the native ones", () => {
    const arrays: unknown[][] = [[], [1, 2, 3], [[1], [2, [3]], 4], ["a", ["b", "c"]]];
    const fns = [(v: unknown) => v, (v: unknown) => [v, v], (v: unknown, i: number) => (Array.isArray(v) ? v : [i])];
    for (const a of arrays) for (const f of fns) expect(flatMap.call(a, f)).toEqual(a.flatMap(f));
    // eslint-disable-next-line no-sparse-arrays
    const sparse = [1, , 3];
    expect(flatMap.call(sparse, (v) => [v])).toEqual(sparse.flatMap((v) => [v]));
    for (const o of [{}, { a: 1, b: "x" }, Object.assign(Object.create({ inherited: 1 }), { own: 2 })]) {
      expect(entries(o)).toEqual(Object.entries(o));
      expect(values(o)).toEqual(Object.values(o));
    }
    for (const s of ["", "  a ", "\t\n\u00a0\ufeffb c", "x"]) expect(trimStart.call(s)).toBe(s.trimStart());
  });
});
