/**
 * The functions bundle as it ships (production build, tests/functions/build.ts): its modules
 * are concatenated into one scope (ES modules, tsconfig.functions.json), and the size the
 * README quotes is the built size within 2 KB (1 KB = 1024 bytes).
 */
import fs from "fs";
import path from "path";
import { shippedBytes } from "../bench/bundle.bench";
import { buildAddin } from "../functions/build";

const ROOT = path.resolve(__dirname, "..", "..");

let code: string;

beforeAll(async () => {
  code = fs.readFileSync(path.join(await buildAddin(), "functions.js"), "utf8");
}, 300000);

describe("functions.js", () => {
  it("is one concatenated scope, not CommonJS modules with export objects", () => {
    // TypeScript's CommonJS output marks every module: Object.defineProperty(exports, "__esModule", ...).
    expect(code.match(/"__esModule"/g) ?? []).toEqual([]);
    expect(code).toContain('CustomFunctions.associate("MAXMOMENT"');
  });

  it("has the size the README quotes", () => {
    const readme = fs.readFileSync(path.join(ROOT, "README.md"), "utf8");
    const quoted = /The add-in's functions bundle is about (\d+) KB minified/.exec(readme);
    expect(quoted).not.toBeNull();
    const built = shippedBytes(code) / 1024;
    // "about": within 2 KB, so the figure is updated when the code grows, not on every edit.
    expect(Math.abs(Number(quoted![1]) - built)).toBeLessThanOrEqual(2);
  });
});
