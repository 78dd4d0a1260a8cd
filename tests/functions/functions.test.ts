/**
 * The exports called exactly as the host calls them: 2-D arrays, blanks as "", null or 0,
 * skipped optional arguments as null. Outside values are classic beam-table formulas,
 * quoted from memory (standard handbook beam diagrams: simple span, two equal spans,
 * cantilever) beside each check.
 */
import * as fx from "../../functions/functions";
import { BLANKS, close, isSheetSafe, thrown } from "./host";

const w = 2;
const L = 6;
const EI = 20000;
const simpleSpan = { spans: [[L]], loads: [["udl", w, "", "", "", "D"]] };

describe("simple span, uniform load (from memory: R = wL/2, M = wL^2/8, deflection 5wL^4/384EI, end slope wL^3/24EI)", () => {
  test("REACTIONS: one row per node [x, up +, ccw +]", () => {
    const r = fx.reactions(simpleSpan.spans, simpleSpan.loads, null as any, null as any, null);
    expect(r).toHaveLength(2);
    expect(r[0][0]).toBe(0);
    expect(r[1][0]).toBe(L);
    expect(close(r[0][1], (w * L) / 2)).toBe(true);
    expect(close(r[1][1], (w * L) / 2)).toBe(true);
    expect(close(r[0][2], 0, w * L * L)).toBe(true);
    expect(isSheetSafe(r)).toBe(true);
  });

  test("MOMENT at a cell, a row, a column and a block keeps the shape, blank x cells give \"\"", () => {
    const m = (x: number) => (w * x * (L - x)) / 2;
    expect(close(fx.moment(simpleSpan.spans, simpleSpan.loads, [[3]], null as any, null as any, null)[0][0], (w * L * L) / 8)).toBe(true);
    const row = fx.moment(simpleSpan.spans, simpleSpan.loads, [[1, "", 2]], null as any, null as any, null);
    expect(row).toHaveLength(1);
    expect(row[0]).toHaveLength(3);
    expect(close(row[0][0], m(1))).toBe(true);
    expect(row[0][1]).toBe("");
    expect(close(row[0][2], m(2))).toBe(true);
    const column = fx.moment(simpleSpan.spans, simpleSpan.loads, [[1], [null], ["4.5"]], null as any, null as any, null);
    expect(column.map((r) => r.length)).toEqual([1, 1, 1]);
    expect(close(column[0][0], m(1))).toBe(true);
    expect(column[1][0]).toBe("");
    expect(close(column[2][0], m(4.5))).toBe(true);
    const block = fx.moment(simpleSpan.spans, simpleSpan.loads, [[0, 1.5], [3, ""]], null as any, null as any, null);
    expect(block.map((r) => r.length)).toEqual([2, 2]);
    expect(close(block[0][0], 0, 1)).toBe(true);
    expect(close(block[0][1], m(1.5))).toBe(true);
    expect(close(block[1][0], m(3))).toBe(true);
    expect(block[1][1]).toBe("");
    expect(isSheetSafe(block)).toBe(true);
  });

  test("SHEAR: V = dM/dx, left reaction gives positive shear", () => {
    const v = fx.shear(simpleSpan.spans, simpleSpan.loads, [[0, 1, 6]], null as any, null as any, null);
    expect(close(v[0][0], (w * L) / 2)).toBe(true);
    expect(close(v[0][1], (w * L) / 2 - w)).toBe(true);
    expect(close(v[0][2], -(w * L) / 2)).toBe(true);
  });

  test("SLOPE and DEFLECTION with EI (deflection down +, slope = d(deflection)/dx)", () => {
    const d = fx.deflection(simpleSpan.spans, simpleSpan.loads, [[3]], null as any, [[EI]], null);
    expect(close(d[0][0], (5 * w * L ** 4) / (384 * EI))).toBe(true);
    const s = fx.slope(simpleSpan.spans, simpleSpan.loads, [[0, 6]], null as any, [[EI]], null);
    expect(close(s[0][0], (w * L ** 3) / (24 * EI))).toBe(true);
    expect(close(s[0][1], -(w * L ** 3) / (24 * EI))).toBe(true);
  });

  test("MAXMOMENT: [[largest M, x], [smallest M, x]]", () => {
    const r = fx.maxMoment(simpleSpan.spans, simpleSpan.loads, null as any, null as any, null);
    expect(close(r[0][0], (w * L * L) / 8)).toBe(true);
    expect(close(r[0][1], L / 2)).toBe(true);
    expect(close(r[1][0], 0, w * L * L)).toBe(true);
  });

  test("EXTREMES: shear and moment rows without EI, four rows with EI", () => {
    const two = fx.extremes(simpleSpan.spans, simpleSpan.loads, null as any, null as any, null);
    expect(two.map((r) => r[0])).toEqual(["shear", "moment"]);
    expect(two.every((r) => r.length === 5)).toBe(true);
    expect(close(two[0][1], (w * L) / 2)).toBe(true);
    expect(close(two[0][3], -(w * L) / 2)).toBe(true);
    const four = fx.extremes(simpleSpan.spans, simpleSpan.loads, null as any, [[EI]], null);
    expect(four.map((r) => r[0])).toEqual(["shear", "moment", "slope", "deflection"]);
    expect(close(four[3][1], (5 * w * L ** 4) / (384 * EI))).toBe(true);
    expect(close(four[3][2], L / 2)).toBe(true);
    expect(isSheetSafe(four)).toBe(true);
  });

  test("DIAGRAM: default 101 stations, rows [x, V, M, slope, deflection], \"\" without EI", () => {
    const rows = fx.diagram(simpleSpan.spans, simpleSpan.loads, null, null as any, null as any, null);
    expect(rows.length).toBeGreaterThanOrEqual(101);
    expect(rows.every((r) => r.length === 5 && r[3] === "" && r[4] === "")).toBe(true);
    expect(rows[0][0]).toBe(0);
    expect(rows[rows.length - 1][0]).toBe(L);
    for (const r of rows) expect(close(r[2], (w * (r[0] as number) * (L - (r[0] as number))) / 2, w * L * L)).toBe(true);
    const withEI = fx.diagram(simpleSpan.spans, simpleSpan.loads, [[11]], null as any, [[EI]], null);
    expect(withEI.length).toBeGreaterThanOrEqual(11);
    expect(withEI.every((r) => typeof r[3] === "number" && typeof r[4] === "number")).toBe(true);
    expect(isSheetSafe(withEI)).toBe(true);
  });
});

describe("two equal spans, uniform load (from memory: R = 3wL/8, 10wL/8, 3wL/8; M over the middle support = -wL^2/8)", () => {
  const l = 5;
  const q = 4;
  const forms: [string, unknown[][], unknown[][], unknown[][] | null][] = [
    ["ranges", [[l, l]], [["udl", q]], [["pin", "pin", "pin"]]],
    ["text cells", [["5 5"]], [["udl 4"]], [["pin pin pin"]]],
    ["column ranges and numbers as text", [["5"], [" 5 "]], [["UDL", "4", "", "", "", ""]], [["Pin"], ["pin"], ["PIN"], [""], [null]]],
    ["supports skipped", [[l, l]], [["udl", q]], null],
  ];
  test.each(forms)("%s", (_label, spans, loads, supports) => {
    const r = fx.reactions(spans as any, loads as any, supports as any, null as any, null);
    expect(close(r[0][1], (3 * q * l) / 8)).toBe(true);
    expect(close(r[1][1], (10 * q * l) / 8)).toBe(true);
    expect(close(r[2][1], (3 * q * l) / 8)).toBe(true);
    const m = fx.moment(spans as any, loads as any, [[l]], supports as any, null as any, null);
    expect(close(m[0][0], -(q * l * l) / 8)).toBe(true);
  });
});

describe("cantilever with an end point load (from memory: R = P, fixed-end moment PL, tip deflection PL^3/3EI)", () => {
  const P = 10;
  const l = 3;
  test("reactions up + and ccw +, hogging moment at the wall", () => {
    const r = fx.reactions([[l]], [["point", P, l]], [["fixed", "free"]], null as any, null);
    expect(close(r[0][1], P)).toBe(true);
    expect(close(r[0][2], P * l)).toBe(true);
    expect(r[1][1]).toBe(0);
    const m = fx.moment([[l]], [["point", P, l]], [[0]], [["fixed free"]], null as any, null);
    expect(close(m[0][0], -P * l)).toBe(true);
    const d = fx.deflection([[l]], [["point", P, l]], [[l]], [["fixed free"]], [[EI]], null);
    expect(close(d[0][0], (P * l ** 3) / (3 * EI))).toBe(true);
  });
});

describe("combinations and blanks", () => {
  const spans = [["4 6"]];
  const table = [
    ["udl", 2, "", "", "", "D"],
    ["point", 10, 3, "", "", "L"],
    ["", "", "", "", "", ""],
  ];
  test("a combination scales each case (superposition)", () => {
    const at = [[1, 3, 4, 7.5]];
    const combined = fx.moment(spans, table, at, null as any, null as any, "1.2D+1.6L");
    const dead = fx.moment(spans, table, at, null as any, null as any, "D");
    const live = fx.moment(spans, table, at, null as any, null as any, "L");
    for (let i = 0; i < 4; i++) {
      expect(close(combined[0][i], 1.2 * (dead[0][i] as number) + 1.6 * (live[0][i] as number), 100)).toBe(true);
    }
  });

  test.each(BLANKS.map((b) => [b]))("optional arguments given as blank cells (%p) mean omitted", (blank) => {
    const base = fx.maxMoment(spans, table, null as any, null as any, null);
    expect(fx.maxMoment(spans, table, [[blank]], [[blank]], blank)).toEqual(base);
    expect(fx.maxMoment(spans, table, [[blank, blank, blank]], [[blank]], [[blank]])).toEqual(base);
  });

  test.each(BLANKS.map((b) => [b]))("blank rows (%p) and missing columns in the load table", (blank) => {
    const tableWithBlanks = [
      [blank, blank, blank, blank, blank, blank],
      ["udl", 2, blank, blank, blank, "D"],
      ["point", 10, 3, blank, blank, "L"],
    ];
    expect(fx.maxMoment(spans, tableWithBlanks, null as any, null as any, null)).toEqual(fx.maxMoment(spans, [["udl 2 D; point 10 at 3 L"]], null as any, null as any, null));
  });

  test("a schedule row in text cells gives the same result as ranges", () => {
    const text = fx.extremes([["4 6"]], [["udl 2 D; point 10 at 3 L"]], [["pin, pin, pin"]], [["3e4"]], [["1.2D+1.6L"]]);
    const ranges = fx.extremes([[4, 6]], table, [["pin", "pin", "pin"]], [[30000, 30000]], "1.2D+1.6L");
    expect(text).toEqual(ranges);
  });

  test("a member without loads gives zeros", () => {
    expect(fx.reactions([[5]], [[""]], null as any, null as any, null)).toEqual([
      [0, 0, 0],
      [5, 0, 0],
    ]);
  });
});

interface ErrorCase {
  label: string;
  call: () => unknown;
  code: "#VALUE!" | "#N/A";
  message: RegExp;
}

const S = [[6]];
const U = [["udl", 2]];
const errorCases: ErrorCase[] = [
  { label: "spans text", call: () => fx.reactions([["six"]], U, null as any, null as any, null), code: "#VALUE!", message: /spans entry 1: "six" is not a number/ },
  { label: "spans blank", call: () => fx.moment([[""]], U, [[1]], null as any, null as any, null), code: "#VALUE!", message: /spans: give at least one span length/ },
  { label: "spans error value", call: () => fx.maxMoment([[{ code: "#REF!" }]], U, null as any, null as any, null), code: "#VALUE!", message: /spans entry 1: the cell holds the error #REF!/ },
  { label: "spans block", call: () => fx.extremes([[1, 2], [3, 4]], U, null as any, null as any, null), code: "#VALUE!", message: /spans: give a single row or column/ },
  { label: "load type", call: () => fx.reactions(S, [["udl", 2], ["pont", 1, 2]], null as any, null as any, null), code: "#VALUE!", message: /load row 2, column 1 \(type\): "pont" is not a load type/ },
  { label: "load x start text", call: () => fx.shear(S, [["point", 1, "mid"]], [[1]], null as any, null as any, null), code: "#VALUE!", message: /load row 1, column 3 \(x start\): "mid" is not a number/ },
  { label: "load beyond the member", call: () => fx.reactions(S, [["", ""], ["point", 1, 7]], null as any, null as any, null), code: "#VALUE!", message: /load row 2, column 3 \(x start\): 7 is beyond the member end 6/ },
  { label: "load before the member", call: () => fx.reactions(S, [["point", 1, -1]], null as any, null as any, null), code: "#VALUE!", message: /load row 1, column 3 \(x start\): -1 is before the member start 0/ },
  { label: "udl end beyond the member", call: () => fx.reactions(S, [["udl", 1, 1, 8]], null as any, null as any, null), code: "#VALUE!", message: /load row 1, column 4 \(x end\): 8 is beyond the member end 6/ },
  { label: "udl end before start", call: () => fx.reactions(S, [["udl", 1, 4, 2]], null as any, null as any, null), code: "#VALUE!", message: /load row 1, column 4 \(x end\): 2 is not beyond x start 4/ },
  { label: "error value in the load table", call: () => fx.diagram(S, [["udl", { code: "#N/A" }]], null, null as any, null as any, null), code: "#VALUE!", message: /load row 1, column 2 \(magnitude\): the cell holds the error #N\/A/ },
  { label: "load notation", call: () => fx.maxMoment(S, [["udl 2; point 3 at"]], null as any, null as any, null), code: "#VALUE!", message: /load 2 of the loads text \("point 3 at"\)/ },
  { label: "load notation beyond the member", call: () => fx.maxMoment(S, [["point 3 at 9"]], null as any, null as any, null), code: "#VALUE!", message: /load 1 of the loads text \(x start\): 9 is beyond the member end 6/ },
  { label: "supports count", call: () => fx.reactions([[3, 3]], U, [["pin pin"]], null as any, null), code: "#VALUE!", message: /supports: need 3 entries/ },
  { label: "supports word", call: () => fx.reactions(S, U, [["pin", "roller"]], null as any, null), code: "#VALUE!", message: /supports entry 2: "roller" is not a support/ },
  { label: "unstable member", call: () => fx.reactions(S, U, [["free free"]], null as any, null), code: "#VALUE!", message: /./ },
  { label: "spring without EI", call: () => fx.reactions(S, U, [["pin 100"]], null as any, null), code: "#VALUE!", message: /spring/ },
  { label: "EI count", call: () => fx.reactions([[3, 3, 3]], U, null as any, [[1, 2]], null), code: "#VALUE!", message: /EI: give one value for the member or one per span \(3\), got 2/ },
  { label: "EI text", call: () => fx.deflection(S, U, [[1]], null as any, [["big"]], null), code: "#VALUE!", message: /EI entry 1: "big" is not a number/ },
  { label: "EI negative", call: () => fx.deflection(S, U, [[1]], null as any, [[-5]], null), code: "#VALUE!", message: /EI/ },
  { label: "combo malformed", call: () => fx.maxMoment(S, [["udl 2 D"]], null as any, null as any, "1.2D+*L"), code: "#VALUE!", message: /combination/ },
  { label: "combo as a number", call: () => fx.maxMoment(S, [["udl 2 D"]], null as any, null as any, 5), code: "#VALUE!", message: /combo: 5 is not a combination/ },
  { label: "combo error value", call: () => fx.maxMoment(S, [["udl 2 D"]], null as any, null as any, { code: "#N/A" }), code: "#VALUE!", message: /combo: the cell holds the error #N\/A/ },
  { label: "combo over two cells", call: () => fx.maxMoment(S, [["udl 2 D"]], null as any, null as any, [["D", "L"]]), code: "#VALUE!", message: /combo: give one cell/ },
  { label: "combo needs case labels", call: () => fx.maxMoment(S, [["udl 2"]], null as any, null as any, "1.4D"), code: "#VALUE!", message: /no case label/ },
  { label: "x outside the member", call: () => fx.moment(S, U, [[1, 7]], null as any, null as any, null), code: "#VALUE!", message: /x = 7 is outside the member/ },
  { label: "x negative", call: () => fx.shear(S, U, [[-0.5]], null as any, null as any, null), code: "#VALUE!", message: /-0\.5/ },
  { label: "x text", call: () => fx.moment(S, U, [[1], ["mid"]], null as any, null as any, null), code: "#VALUE!", message: /x row 2, column 1: "mid" is not a number/ },
  { label: "x error value", call: () => fx.moment(S, U, [[{ code: "#DIV/0!" }]], null as any, null as any, null), code: "#VALUE!", message: /x: the cell holds the error #DIV\/0!/ },
  { label: "slope without EI", call: () => fx.slope(S, U, [[1]], null as any, null as any, null), code: "#N/A", message: /^slope needs EI: give EI for the member or each span$/ },
  { label: "deflection without EI", call: () => fx.deflection(S, U, [[""]], null as any, null as any, null), code: "#N/A", message: /^deflection needs EI/ },
  { label: "points too few", call: () => fx.diagram(S, U, 1, null as any, null as any, null), code: "#VALUE!", message: /points: give a whole number of stations from 2 to 10001, got 1/ },
  { label: "points fractional", call: () => fx.diagram(S, U, 10.5, null as any, null as any, null), code: "#VALUE!", message: /got 10.5/ },
  { label: "points too many", call: () => fx.diagram(S, U, 10002, null as any, null as any, null), code: "#VALUE!", message: /got 10002/ },
  { label: "points text", call: () => fx.diagram(S, U, "many", null as any, null as any, null), code: "#VALUE!", message: /points: "many" is not a number/ },
  { label: "points error value", call: () => fx.diagram(S, U, { code: "#N/A" }, null as any, null as any, null), code: "#VALUE!", message: /points: the cell holds the error #N\/A/ },
];

describe("every error path gives a code and a message, never a number", () => {
  test.each(errorCases.map((c) => [c.label, c]))("%s", (_label, c) => {
    const e = thrown(c.call);
    expect(e.code).toBe(c.code);
    expect(e.message).toMatch(c.message);
    expect(e.message.length).toBeGreaterThan(0);
  });
});

describe("the runtime's error class is used when it exists", () => {
  class RuntimeError {
    constructor(
      readonly code: string,
      readonly message?: string,
    ) {}
  }
  const g = globalThis as { CustomFunctions?: unknown };
  beforeAll(() => {
    g.CustomFunctions = { Error: RuntimeError, ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A" } };
  });
  afterAll(() => {
    delete g.CustomFunctions;
  });

  test.each([
    ["#VALUE!", () => fx.moment(S, U, [[9]], null as any, null as any, null)],
    ["#N/A", () => fx.slope(S, U, [[1]], null as any, null as any, null)],
  ] as const)("%s", (code, call) => {
    const e = thrown(call);
    expect(e).toBeInstanceOf(RuntimeError);
    expect(e.code).toBe(code);
    expect(e.message).toMatch(/\w/);
  });
});

describe("fuzzed cells never escape as anything but a host error, never NaN", () => {
  const junk: unknown[] = ["", null, 0, -1, 1e308, NaN, "abc", "#N/A", { code: "#REF!" }, true, [[]], [], "udl", "point 1 at 1", undefined];
  test("every function, junk in every argument position", () => {
    let calls = 0;
    const fns: [string, (...a: any[]) => any[][]][] = [
      ["reactions", fx.reactions],
      ["shear", fx.shear],
      ["moment", fx.moment],
      ["slope", fx.slope],
      ["deflection", fx.deflection],
      ["maxMoment", fx.maxMoment],
      ["extremes", fx.extremes],
      ["diagram", fx.diagram],
    ];
    const good: Record<string, unknown[]> = {
      reactions: [S, U, null, null, null],
      maxMoment: [S, U, null, null, null],
      extremes: [S, U, null, null, null],
      diagram: [S, U, 5, null, [[1]], null],
    };
    for (const [name, fn] of fns) {
      const base = good[name] ?? [S, U, [[1]], null, [[1]], null];
      for (let position = 0; position < base.length; position++) {
        for (const value of junk) {
          const args = base.slice();
          args[position] = Array.isArray(value) || value === null || value === undefined ? value : [[value]];
          calls++;
          try {
            const result = fn(...args);
            expect(isSheetSafe(result)).toBe(true);
          } catch (e) {
            expect(["#VALUE!", "#N/A"]).toContain((e as { code: string }).code);
            expect(typeof (e as { message: string }).message).toBe("string");
          }
        }
      }
    }
    expect(calls).toBeGreaterThan(300);
  });
});
