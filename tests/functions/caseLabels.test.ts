/**
 * The combination and case-label rule (issue 11, "Case labels and combinations"), called as
 * the host calls the functions. Every row of the table: the input and the expected
 * value or message. The rule's one definition is core checkCombinations; these tests prove
 * that every function taking a combination goes through it.
 *
 * Outside value: a simple span under a uniform load w has end reactions wL/2 (standard
 * handbook beam diagram, from memory).
 */
import * as fx from "../../functions/functions";
import { checkCombination, readLoads } from "../../src/sheet";
import { thrown } from "./host";

const spans = [[6]];
/** Loads D (udl 1) and L (udl 2) on a 6 m simple span. */
const loadsDL = [["udl 1 D; udl 2 L"]];
const reactionOf = (loads: unknown, combo: unknown) => fx.reactions(spans, loads as any[][], null as any, null as any, combo)[0][1];
const messageOf = (call: () => unknown) => {
  const e = thrown(call);
  expect(e.code).toBe("#VALUE!");
  return e.message;
};

describe("the issue's table, through SPAN.REACTIONS", () => {
  test("1.2D+1.6L works: R = (1.2 x 1 + 1.6 x 2) x 6 / 2 = 13.2 (wL/2)", () => {
    expect(reactionOf(loadsDL, "1.2D+1.6L")).toBeCloseTo(13.2, 12);
  });

  test("a typo 1.2D+1.6LL is #VALUE! naming LL and the cases the loads carry", () => {
    const message = messageOf(() => reactionOf(loadsDL, "1.2D+1.6LL"));
    expect(message).toMatch(/no load carries case LL/);
    expect(message).toMatch(/the loads carry D, L/);
  });

  test("labels are case-sensitive: 1.2d+1.6l is #VALUE! naming d and pointing to D", () => {
    const message = messageOf(() => reactionOf(loadsDL, "1.2d+1.6l"));
    expect(message).toMatch(/no load carries case d \(the loads carry D, L\); labels are case-sensitive: did you mean D\?/);
  });

  test("1.6W selects no load: #VALUE!", () => {
    expect(messageOf(() => reactionOf(loadsDL, "1.6W"))).toMatch(/combination "1\.6W" selects no load/);
  });

  test("every factor 0 selects no load either", () => {
    expect(messageOf(() => reactionOf(loadsDL, "0D+0L"))).toMatch(/selects no load/);
  });

  test("a load row with case l under 1.2D+1.6L is #VALUE! naming the row and L", () => {
    const table = [
      ["udl", 1, "", "", "", "D"],
      ["udl", 2, "", "", "", "l"],
    ];
    const message = messageOf(() => reactionOf(table, "1.2D+1.6L"));
    expect(message).toMatch(/^load row 2, column 6 \(case\): case l is not named by the combination "1\.2D\+1\.6L"/);
    expect(message).toMatch(/did you mean L\?/);
  });

  test("a load with case Live under 1.2D+1.6L is #VALUE!, and +0Live names it (left out)", () => {
    const loads = [["udl 1 D; udl 2 L; udl 5 Live"]];
    const message = messageOf(() => reactionOf(loads, "1.2D+1.6L"));
    expect(message).toMatch(/^load 3 of the loads text \(case\): case Live is not named .* \+0Live to leave it out/);
    expect(reactionOf(loads, "1.2D+1.6L+0Live")).toBeCloseTo(13.2, 12);
    expect(reactionOf(loads, "1.2D+1.6L+1.0Live")).toBeCloseTo(13.2 + 15, 12);
  });

  test("a schedule combination 1.2D+1.6L+0.5S on a member without snow keeps working", () => {
    expect(reactionOf(loadsDL, "1.2D+1.6L+0.5S")).toBeCloseTo(13.2, 12);
  });

  test("a standard label the combination leaves out is left out (1.4D on D and L)", () => {
    expect(reactionOf(loadsDL, "1.4D")).toBeCloseTo(4.2, 12);
  });

  test("a blank combination counts every load at 1, whatever its label", () => {
    expect(reactionOf([["udl 1 D; udl 2 Whatever"]], null)).toBeCloseTo(9, 12);
  });
});

describe("every function that takes a combination uses the rule", () => {
  const x = [[3]];
  const section = fx.section("rectangle", [[0.1, 0.2]]);
  const calls: [string, (combo: string) => unknown][] = [
    ["SHEAR", (c) => fx.shear(spans, loadsDL, x, null as any, null as any, c)],
    ["MOMENT", (c) => fx.moment(spans, loadsDL, x, null as any, null as any, c)],
    ["SLOPE", (c) => fx.slope(spans, loadsDL, x, null as any, [[1000]], c)],
    ["DEFLECTION", (c) => fx.deflection(spans, loadsDL, x, null as any, [[1000]], c)],
    ["MAXMOMENT", (c) => fx.maxMoment(spans, loadsDL, null as any, null as any, c)],
    ["EXTREMES", (c) => fx.extremes(spans, loadsDL, null as any, null as any, c)],
    ["DIAGRAM", (c) => fx.diagram(spans, loadsDL, 11, null as any, null as any, c)],
    ["STRESS", (c) => fx.stress(spans, loadsDL, section, null as any, null as any, c)],
    ["SHEARSTRESS", (c) => fx.shearStress(spans, loadsDL, section, null as any, null as any, c)],
    ["DEFLECTIONCHECK", (c) => fx.deflectionCheck(spans, loadsDL, [["L/360"]], null as any, [[1000]], c)],
    ["ENVELOPE", (c) => fx.envelope(spans, loadsDL, x, [[c]], null as any, null as any, null, null, null)],
    ["PEAKS", (c) => fx.peaks(spans, loadsDL, [[c]], null as any, null as any, null, null)],
  ];
  test.each(calls)("%s refuses 1.2D+1.6LL and accepts 1.2D+1.6L", (_name, call) => {
    expect(messageOf(() => call("1.2D+1.6LL"))).toMatch(/no load carries case LL/);
    expect(() => call("1.2D+1.6L")).not.toThrow();
  });
});

describe("ENVELOPE and PEAKS: combination lists and named sets", () => {
  const x = [[3]];
  test("ASCE7 is not a combination: #VALUE! listing the set names", () => {
    for (const call of [
      () => fx.envelope(spans, loadsDL, x, [["ASCE7"]], null as any, null as any, null, null, null),
      () => fx.peaks(spans, loadsDL, [["ASCE7"]], null as any, null as any, null, null),
    ]) {
      const message = messageOf(call);
      expect(message).toMatch(/"ASCE7" is not a set name/);
      expect(message).toMatch(/ASCE7-2\.3\.1, ASCE7-2\.4\.1, EN1990-6\.10/);
    }
  });

  test("a misspelt set name that does not parse lists the set names too", () => {
    expect(messageOf(() => fx.peaks(spans, loadsDL, [["ASCE7-2.3"]], null as any, null as any, null, null))).toMatch(/set name: ASCE7-2\.3\.1/);
  });

  test("a load whose non-standard label no combination of the list names is #VALUE!", () => {
    const loads = [["udl 1 D; udl 2 Live"]];
    expect(messageOf(() => fx.peaks(spans, loads, [["1.4D"], ["1.2D+1.6L"]], null as any, null as any, null, null))).toMatch(
      /case Live is not named by any of the combinations/,
    );
    expect(messageOf(() => fx.peaks(spans, loads, [["ASCE7-2.3.1"]], null as any, null as any, null, null))).toMatch(/case Live is not named/);
  });

  test("naming the label in one combination of the list is enough (1.4D leaves it out on purpose)", () => {
    const loads = [["udl 1 D; udl 2 Live"]];
    const out = fx.envelope(spans, loads, x, [["1.4D"], ["1.2D+1.6Live"]], null as any, null as any, null, null, null);
    // M at midspan, w L^2 / 8 (handbook, from memory): 1.2 x 1 + 1.6 x 2 = 4.4 -> 19.8; 1.4 x 1 -> 6.3
    expect(out[0][1]).toBeCloseTo(19.8, 12);
    expect(out[0][2]).toBe("1.2D + 1.6Live");
  });

  test("a set on a member whose loads carry none of its cases selects no load", () => {
    expect(messageOf(() => fx.peaks(spans, [["udl 1 G"]], [["ASCE7-2.4.1"]], null as any, null as any, null, null))).toMatch(
      /set ASCE7-2\.4\.1 selects no load/,
    );
  });

  test("a set's combinations without a carried case are kept (1.4D on live load only gives 0)", () => {
    const out = fx.peaks(spans, [["udl 2 L"]], [["ASCE7-2.3.1"]], null as any, null as any, null, null);
    const moment = out.find((row) => row[0] === "moment")!;
    expect(moment[1]).toBeCloseTo(1.6 * 2 * 36 / 8, 12);
  });
});

describe("checkCombination, for the pane's combination box", () => {
  const rows = readLoads([["udl 1 D; udl 2 L"]]);
  test.each([
    ["1.2D+1.6L", null],
    ["", null],
    ["1.2D+1.6L+0.5S", null],
    ["1.2D+1.6LL", /no load carries case LL/],
    ["1.6W", /selects no load/],
    ["1.2D+", /expected a factor and a case label/],
  ] as const)("%s", (combo, expected) => {
    const message = checkCombination(rows, combo);
    if (expected === null) expect(message).toBeNull();
    else expect(message).toMatch(expected);
  });
});
