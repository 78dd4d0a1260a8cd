/** Load combinations: parsing, formatting (canonical text that parses back) and applying factors. */
import fc from "fast-check";
import { applyCombination, checkCombinations, formatCombination, parseCombination, solve, STANDARD_CASE_LABELS, tolerance, valueAt } from "../../src/core";
import { thrown } from "./kit/errors";
import { beam, linear, point, udl } from "./kit/members";
import { runs } from "./kit/random";

const terms = (text: string | null | undefined) => parseCombination(text as string).terms;

describe("parseCombination", () => {
  it.each([
    ["1.2D+1.6L+0.5S", [[1.2, "D"], [1.6, "L"], [0.5, "S"]]],
    ["  1.2 D  +  1.6 L ", [[1.2, "D"], [1.6, "L"]]],
    ["1.2*D + 1.6 * L", [[1.2, "D"], [1.6, "L"]]],
    [".5D + 2.W", [[0.5, "D"], [2, "W"]]],
    ["D + L", [[1, "D"], [1, "L"]]],
    ["0.9D - 1.0W", [[0.9, "D"], [-1, "W"]]],
    ["-D", [[-1, "D"]]],
    ["+1.4D", [[1.4, "D"]]],
    ["1.2D + 1.6L + 0.5Lr", [[1.2, "D"], [1.6, "L"], [0.5, "Lr"]]],
    ["1.2D + 1.0E1", [[1.2, "D"], [1, "E1"]]],
  ])("%s", (text, expected) => {
    expect(terms(text).map((t) => [t.factor, t.loadCase])).toEqual(expected);
  });

  it.each([[""], ["   "], [null], [undefined]])("blank (%p) means every load at factor 1: no terms", (text) => {
    expect(terms(text)).toEqual([]);
  });

  it("keeps labels case-sensitive: L, Lr and l are three cases", () => {
    expect(terms("L + Lr + l").map((t) => t.loadCase)).toEqual(["L", "Lr", "l"]);
  });

  it.each([
    ["1.2D 1.6L", /expected '\+' or '-' before the next term at character 6, found "1\.6L"/],
    ["1.2D +", /expected a factor and a case label|expected/],
    ["1.2", /expected a factor and a case label at character 1/],
    ["*D", /at character 1, found "\*D"/],
    ["1.2D ++ L", /character/],
    ["D, L", /found ", L"/],
    ["2 * 3D", /character 1/],
    ["1.2D + (L)", /at character 6, found "\+ \(L\)"/],
    ["1.2D+1.6L;", /character 10/],
  ])("malformed %p is #VALUE! naming the text and the fault", (text, fault) => {
    const error = thrown(() => parseCombination(text));
    expect(error.code).toBe("#VALUE!");
    expect(error.message.startsWith(`combination "${text.trim()}": `)).toBe(true);
    expect(error.message).toMatch(fault);
  });

  it("rejects a repeated label", () => {
    const error = thrown(() => parseCombination("D + 1.2L + 0.5D"));
    expect([error.code, error.message]).toEqual(["#VALUE!", 'combination "D + 1.2L + 0.5D": case D appears more than once']);
  });

  it("formats canonically and round-trips", () => {
    for (const text of ["1.2D+1.6L+0.5S", "0.9D - W", "-D + 2.5Lr", ".5 * D"]) {
      const c = parseCombination(text);
      expect(parseCombination(formatCombination(c)).terms).toEqual(c.terms);
    }
    expect(formatCombination(parseCombination("1.2D+1.6L-0.5S"))).toBe("1.2D + 1.6L - 0.5S");
  });

  it.each([
    ["D+L", "D + L"],
    ["-1.0W + 0.9D", "-W + 0.9D"],
    ["", ""],
  ])("%p is written as %p", (text, canonical) => {
    expect(formatCombination(parseCombination(text))).toBe(canonical);
  });

  it("the canonical text parses back to the same terms, for factors of any size", () => {
    const factor = fc.oneof(
      fc.integer({ min: 1, max: 4000 }).map((k) => k / 1000),
      fc.integer({ min: 1, max: 100 }).map((k) => k / 4),
      fc.constantFrom(1e-7, 2.5e-9, 1e21, 1 / 3),
    );
    const label = fc.stringMatching(/^[A-Z][a-z0-9]{0,2}$/);
    fc.assert(
      fc.property(fc.uniqueArray(fc.tuple(label, factor, fc.boolean()), { minLength: 1, maxLength: 5, selector: ([l]) => l }), (raw) => {
        const terms = raw.map(([loadCase, size, negative]) => ({ loadCase, factor: negative ? -size : size }));
        expect(parseCombination(formatCombination({ text: "", terms })).terms).toEqual(terms);
      }),
      runs(100),
    );
  });
});

describe("applyCombination", () => {
  const loads = [udl(2, 0, 6, "D"), point(10, 3, "L"), point(4, 2, "Lr"), udl(1, 1, 5, "S")].map((l, i) => ({ ...l, row: i + 1 }));

  it("blank or no combination keeps every load at factor 1", () => {
    expect(applyCombination(loads, parseCombination(""))).toEqual(loads);
    expect(applyCombination(loads, null)).toEqual(loads);
  });

  it("factors magnitudes of the named cases and drops the others, without touching the input", () => {
    const before = JSON.stringify(loads);
    const out = applyCombination(loads, parseCombination("1.2D + 1.6L"));
    expect(out.map((l) => [l.row, l.magnitude, l.magnitudeEnd, l.xStart, l.xEnd])).toEqual([
      [1, 2.4, 2.4, 0, 6],
      [2, 16, 16, 3, 3],
    ]);
    expect(JSON.stringify(loads)).toBe(before);
  });

  it("factors both ends of a linear load", () => {
    const out = applyCombination([{ ...linear(1, 2, 0, 4, "S"), row: 9 }], parseCombination("0.5S"));
    expect(out.map((l) => [l.row, l.magnitude, l.magnitudeEnd])).toEqual([[9, 0.5, 1]]);
  });

  it("Lr is not L: each gets its own factor", () => {
    const out = applyCombination(loads, parseCombination("0.5Lr + 1.6L"));
    expect(out.map((l) => [l.loadCase, l.magnitude])).toEqual([
      ["L", 16],
      ["Lr", 2],
    ]);
  });

  it("a label no load carries contributes nothing", () => {
    expect(applyCombination(loads, parseCombination("1.0E"))).toEqual([]);
    expect(applyCombination(loads, parseCombination("1.4D + 1.0E")).map((l) => l.row)).toEqual([1]);
  });

  it("a load without a case under a non-blank combination is #VALUE! naming its row", () => {
    const error = thrown(() => applyCombination([...loads, { ...point(1, 1), row: 7 }], parseCombination("1.2D")));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/^load row 7\b/);
  });

  it("solving a combination equals the factored sum of the cases solved alone (linearity)", () => {
    const geometry = beam([6], ["fixed", "pin"], []);
    const only = (c: string) => solve({ ...geometry, loads: loads.filter((l) => l.loadCase === c) });
    const combined = solve({ ...geometry, loads: applyCombination(loads, parseCombination("1.2D + 1.6L - 0.5S")) });
    for (const x of [0, 1.7, 3, 4.4, 6]) {
      const expected = 1.2 * valueAt(only("D"), "moment", x) + 1.6 * valueAt(only("L"), "moment", x) - 0.5 * valueAt(only("S"), "moment", x);
      expect(tolerance.relClose(valueAt(combined, "moment", x), expected, tolerance.HANDBOOK_TOLERANCE, 100)).toBe(true);
    }
  });
});

describe("checkCombinations: the combination and case-label rule", () => {
  const loads = (...labels: string[]) => labels.map((loadCase, i) => ({ loadCase, row: i + 1 }));
  const check = (labels: string[], ...combos: string[]) => () => checkCombinations(loads(...labels), combos.map((text) => ({ combination: parseCombination(text) })));
  test.each([
    [["D", "L"], ["1.2D+1.6L"]],
    [["D", "L"], ["1.2D+1.6L+0.5S"]],
    [["D", "L"], ["1.4D"]],
    [["D", "Live"], ["1.4D", "1.2D+1.6Live"]],
    [["D", "Live"], ["1.2D+0Live"]],
    [["D", "Whatever"], [""]],
    [["", ""], [""]],
  ])("accepts loads %j under %j", (labels, combos) => {
    expect(check(labels, ...combos)).not.toThrow();
  });
  test.each([
    [["D", "L"], ["1.2D+1.6LL"], /no load carries case LL \(the loads carry D, L\)/],
    [["D", "L"], ["1.2d+1.6l"], /no load carries case d .*did you mean D\?/],
    [["D", "L"], ["1.6W"], /selects no load/],
    [["D", "L"], ["0D"], /selects no load/],
    [["D", "l"], ["1.2D+1.6L"], /load row 2: case l is not named .*did you mean L\?/],
    [["D", "Live"], ["1.2D+1.6L"], /load row 2: case Live is not named by the combination/],
    [["D", "Live"], ["1.4D", "1.2D+1.6L"], /case Live is not named by any of the combinations/],
    [["D", ""], ["1.2D"], /load row 2 has no case label/],
    [[], ["1.2D"], /selects no load.*the member has no loads/],
  ])("refuses loads %j under %j", (labels, combos, message) => {
    expect(check(labels, ...combos)).toThrow(message);
  });
  test("a set's combinations may name labels no load carries and select nothing one by one, but not all", () => {
    const uses = ["1.4D", "1.2D + 1.6L"].map((text) => ({ combination: parseCombination(text), set: "S1" }));
    expect(() => checkCombinations(loads("L"), uses)).not.toThrow();
    expect(() => checkCombinations(loads("W"), uses)).toThrow(/set S1 selects no load/);
  });
  test("every standard label is accepted unnamed and uncarried", () => {
    for (const label of STANDARD_CASE_LABELS) expect(check(["D", label], `1.2D+1.0${label === "D" ? "L" : label}`)).not.toThrow();
  });
});
