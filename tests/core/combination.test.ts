import fc from "fast-check";
import { applyCombination, formatCombination, parseCombination } from "../../src/core/combination";
import type { CombinationTerm } from "../../src/core/combination";
import { linear, point, udl } from "./support/build";
import { caught } from "./support/expectError";

describe("parseCombination", () => {
  const cases: [string, string | null | undefined, CombinationTerm[]][] = [
    ["a typical strength combination", "1.2D+1.6L+0.5S", [
      { factor: 1.2, loadCase: "D" },
      { factor: 1.6, loadCase: "L" },
      { factor: 0.5, loadCase: "S" },
    ]],
    ["spaces, a star and a bare label", " 0.9 * D + W ", [
      { factor: 0.9, loadCase: "D" },
      { factor: 1, loadCase: "W" },
    ]],
    ["a minus term and labels with more than one letter", "1.2D - 1.0W + 0.5Lr", [
      { factor: 1.2, loadCase: "D" },
      { factor: -1, loadCase: "W" },
      { factor: 0.5, loadCase: "Lr" },
    ]],
    ["a leading sign", "-D+.75L", [
      { factor: -1, loadCase: "D" },
      { factor: 0.75, loadCase: "L" },
    ]],
    ["labels are case-sensitive: L and Lr differ", "L+Lr", [
      { factor: 1, loadCase: "L" },
      { factor: 1, loadCase: "Lr" },
    ]],
    ["blank text", "   ", []],
    ["null (a skipped argument)", null, []],
    ["undefined", undefined, []],
  ];
  test.each(cases)("%s", (_name, text, terms) => {
    expect(parseCombination(text).terms).toEqual(terms);
  });

  const bad: [string, string, RegExp][] = [
    ["a trailing plus", "1.2D+", /character 5/],
    ["two terms without a sign between", "1.2D 1.6L", /'\+' or '-'/],
    ["a factor without a label", "1.2", /case label/],
    ["a label starting with a digit after a factor's star", "1.2*3", /case label/],
    ["a doubled sign", "1.2D++L", /character/],
    ["a repeated case", "1.2D+1.6L+0.5D", /D appears more than once/],
    ["a decimal comma", "1,2D", /character/],
    ["a stray symbol", "1.2D+1.6L;", /character 10/],
  ];
  test.each(bad)("%s is #VALUE! naming the fault and where", (_name, text, message) => {
    const error = caught(() => parseCombination(text));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toContain(text.trim());
    expect(error.message).toMatch(message);
  });
});

describe("formatCombination", () => {
  test.each([
    ["1.2D+1.6L+0.5S", "1.2D + 1.6L + 0.5S"],
    ["D+L", "D + L"],
    ["-1.0W + 0.9D", "-W + 0.9D"],
    ["", ""],
  ])("%s is written as %s", (text, canonical) => {
    expect(formatCombination(parseCombination(text))).toBe(canonical);
  });

  const factor = fc.oneof(
    fc.integer({ min: 1, max: 4000 }).map((k) => k / 1000),
    fc.integer({ min: 1, max: 100 }).map((k) => k / 4),
    fc.constantFrom(1e-7, 2.5e-9, 1e21, 1 / 3),
  );
  const label = fc.stringMatching(/^[A-Z][a-z0-9]{0,2}$/);
  test("the canonical text parses back to the same terms (factors of any size)", () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.tuple(label, factor, fc.boolean()), { minLength: 1, maxLength: 5, selector: ([l]) => l }), (raw) => {
        const terms = raw.map(([loadCase, size, negative]) => ({ loadCase, factor: negative ? -size : size }));
        const text = formatCombination({ text: "", terms });
        expect(parseCombination(text).terms).toEqual(terms);
      }),
    );
  });
});

describe("applyCombination", () => {
  const loads = [point(10, 2, "D"), udl(3, 0, 4, "L"), linear(1, 0, 2, 4, "S"), point(5, 1, "W")];

  test("factors each load by its case's factor, both ends of a linear load included, and leaves out cases not named", () => {
    const result = applyCombination(loads, parseCombination("1.2D+1.6L+0.5S"));
    expect(result.map((l) => [l.loadCase, l.magnitude, l.magnitudeEnd])).toEqual([
      ["D", 12, 0],
      ["L", 1.6 * 3, 1.6 * 3],
      ["S", 0.5, 1],
    ]);
    expect(result.map((l) => l.row)).toEqual(loads.slice(0, 3).map((l) => l.row));
  });

  test("does not change the loads it was given", () => {
    const copy = JSON.parse(JSON.stringify(loads));
    applyCombination(loads, parseCombination("2D+2L"));
    expect(loads).toEqual(copy);
  });

  test("no combination, or a blank one, keeps every load at factor 1", () => {
    expect(applyCombination(loads, null)).toEqual(loads);
    expect(applyCombination(loads, parseCombination(""))).toEqual(loads);
  });

  test("a load without a case under a combination is #VALUE! naming its row", () => {
    const unlabelled = point(1, 1);
    const error = caught(() => applyCombination([...loads, unlabelled], parseCombination("D")));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toContain(`load row ${unlabelled.row}`);
  });

  test("superposition: a combination equals the factored sum of the cases taken one at a time", () => {
    const combo = parseCombination("1.2D+1.6L+0.5S-0.3W");
    const total = (ls: typeof loads) => ls.reduce((s, l) => s + l.magnitude + l.magnitudeEnd, 0);
    const byCase = combo.terms.reduce(
      (s, t) => s + t.factor * total(loads.filter((l) => l.loadCase === t.loadCase)),
      0,
    );
    expect(total(applyCombination(loads, combo))).toBeCloseTo(byCase, 12);
  });
});
