/**
 * No source spreads an array into Math.max or Math.min (issue 14): a spread passes every
 * element as an argument, and past about 120,000 elements the call dies with "Maximum call
 * stack size exceeded". Loops or reduce have no such limit.
 */
import { readdirSync, readFileSync, statSync } from "fs";
import { join } from "path";

const SPREAD_INTO_MIN_MAX = /Math\.(?:max|min)\([^)]*\.\.\./;

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : /\.tsx?$/.test(name) ? [path] : [];
  });
}

test("no Math.max(...) or Math.min(...) spread anywhere in src or functions", () => {
  const root = join(__dirname, "..", "..");
  const found = [...sources(join(root, "src")), ...sources(join(root, "functions"))].flatMap((file) =>
    readFileSync(file, "utf8")
      .split("\n")
      .map((line, i) => (SPREAD_INTO_MIN_MAX.test(line) ? `${file.slice(root.length + 1)}:${i + 1}: ${line.trim()}` : null))
      .filter((hit): hit is string => hit !== null),
  );
  expect(found).toEqual([]);
});

test("control: the pattern finds a spread and passes a loop", () => {
  expect(SPREAD_INTO_MIN_MAX.test("const longest = Math.max(...spans);")).toBe(true);
  expect(SPREAD_INTO_MIN_MAX.test("const m = Math.max(0, ...all);")).toBe(true);
  expect(SPREAD_INTO_MIN_MAX.test("const longest = spans.reduce((a, b) => Math.max(a, b), 0);")).toBe(false);
});

test("a spread of 2,000,000 numbers does overflow here (so the rule is not hypothetical)", () => {
  const many = new Array(2000000).fill(1);
  let overflowed = false;
  try {
    Math.max(...many);
  } catch (error) {
    overflowed = error instanceof RangeError;
  }
  expect(overflowed).toBe(true);
});
