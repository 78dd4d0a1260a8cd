/**
 * SPANPEAKS, CASEREACTIONS, FREQUENCIES and MODESHAPE called as the host calls them (2-D
 * arrays, blanks as "", null or 0, skipped arguments as null), with every error path named.
 * Closed forms: two equal spans under a uniform load, M = 9wL^2/128 in the spans and
 * -wL^2/8 at the middle support, reactions 3wL/8, 10wL/8, 3wL/8 (steel construction manual,
 * beam diagrams and formulas — from memory); simple span f_n = (n^2 pi / 2) sqrt(EI/(m L^4))
 * (a vibration-formulas handbook's single-span table — from memory). Unit factors from NIST
 * SP 811 (from memory): 1 ft = 0.3048 m, 1 kip = 4448.2216152605 N, standard gravity 9.80665 m/s^2.
 */
import * as fx from "../../functions/functions";
import { BLANKS, close, isSheetSafe, thrown } from "./host";

const FT = 0.3048;
const KIP = 4448.2216152605;
const rel = (a: unknown, b: number) => (typeof a === "number" ? Math.abs(a - b) / Math.abs(b) : Infinity);

describe("SPAN.SPANPEAKS", () => {
  const [L, w, EI] = [6, 2.5, 3e4];
  const result = fx.spanPeaks([[L, L]], [["udl", w, "", "", "", "D"]], null as any, [[EI]], null, null as any);
  test("one row per span, ten columns, the two-span closed forms (SCM, from memory)", () => {
    expect(result.length).toBe(2);
    expect(result.every((row) => row.length === 10)).toBe(true);
    expect(isSheetSafe(result)).toBe(true);
    const [span, length, mMax, xMax, mMin, xMin, v, xv] = result[0];
    expect([span, length]).toEqual([1, L]);
    expect(close(mMax, (9 * w * L * L) / 128)).toBe(true);
    expect(close(xMax, (3 * L) / 8)).toBe(true);
    expect(close(mMin, (-w * L * L) / 8)).toBe(true);
    expect(close(xMin, L)).toBe(true);
    expect(close(v, (-5 * w * L) / 8)).toBe(true);
    expect(close(xv, L)).toBe(true);
    expect(close(result[1][4], (-w * L * L) / 8)).toBe(true);
    expect(close(result[1][5], L)).toBe(true);
  });
  test("without EI the deflection columns are blank", () => {
    const r = fx.spanPeaks([["6 6"]], [["udl 2.5"]], null as any, null as any, null, null as any);
    expect(r.map((row) => row.slice(8))).toEqual([["", ""], ["", ""]]);
  });
  test.each(BLANKS)("blank optional arguments (%p) read as skipped", (blank) => {
    expect(fx.spanPeaks([[L, L]], [["udl", w, "", "", "", "D"]], [[blank]], [[EI]], blank, [[blank]])).toEqual(result);
  });
  test("the same member in kip and ft, labelled, gives the SI answer divided by the factors", () => {
    const us = fx.spanPeaks([["20 15"]], [["udl 1.2 D; point 8 at 10 L"]], null as any, [[2.4e6]], "1.2D+1.6L", [["length=ft, force=kip, EI=kip*in^2, deflection=in"]]);
    const eiSI = 2.4e6 * KIP * 0.0254 * 0.0254;
    const si = fx.spanPeaks([[`${20 * FT} ${15 * FT}`]], [[`udl ${(1.2 * KIP) / FT} D; point ${8 * KIP} at ${10 * FT} L`]], null as any, [[eiSI]], "1.2D+1.6L", null as any);
    const factors = [1, FT, KIP * FT, FT, KIP * FT, FT, KIP, FT, 0.0254, FT];
    us.forEach((row, i) => row.forEach((cell, j) => expect(rel((cell as number) * factors[j], si[i][j] as number)).toBeLessThan(1e-9)));
  });
  test("bad input names the argument", () => {
    expect(thrown(() => fx.spanPeaks([["6 x"]], [["udl 2"]], null as any, null as any, null, null as any)).message).toMatch(/^spans entry 2/);
    expect(thrown(() => fx.spanPeaks([["6"]], [["udl 2"]], null as any, null as any, null, [["length=ft"]])).message).toMatch(/^units: give both length and force/);
  });
});

describe("SPAN.CASEREACTIONS", () => {
  const [L, wD, wL] = [5, 2, 3];
  const loads = [
    ["udl", wD, "", "", "", "D"],
    ["udl", wL, "", "", "", "L"],
    ["point", 7, 2, "", "", "D"],
  ];
  test("x, then one column per case in first-use order (D, L); the L column is 3wL/8, 10wL/8, 3wL/8 (SCM, from memory)", () => {
    const r = fx.caseReactions([[L, L]], loads, null as any, null as any, null, null as any, null);
    expect(r.map((row) => row[0])).toEqual([0, L, 2 * L]);
    expect(r.every((row) => row.length === 3)).toBe(true);
    [3, 10, 3].forEach((k, i) => expect(close(r[i][2], (k * wL * L) / 8)).toBe(true));
  });
  test("with combo: a last column equal to SPAN.REACTIONS with that combo, and to the factored sum of the cases", () => {
    const r = fx.caseReactions([[L, L]], loads, null as any, null as any, "1.2D+1.6L", null as any, null);
    const direct = fx.reactions([[L, L]], loads, null as any, null as any, "1.2D+1.6L", null as any);
    r.forEach((row, i) => {
      expect(row.length).toBe(4);
      expect(row[3]).toBe(direct[i][1]);
      expect(Math.abs(1.2 * (row[1] as number) + 1.6 * (row[2] as number) - (row[3] as number))).toBeLessThan(1e-9 * 60);
    });
  });
  test("moment reactions of fixed ends: wL^2/12 per case (SCM fixed-fixed uniform load, from memory)", () => {
    const r = fx.caseReactions([[6]], [["udl 2 D; udl 1 L"]], [["fixed fixed"]], null as any, null, null as any, "moment");
    expect(close(r[0][1], (2 * 36) / 12)).toBe(true);
    expect(close(r[0][2], 36 / 12)).toBe(true);
    expect(close(r[1][1], (-2 * 36) / 12)).toBe(true);
  });
  test("units: forces in kip, x in ft", () => {
    const us = fx.caseReactions([["20"]], [["udl 1.5 D"]], null as any, null as any, null, [["length=ft, force=kip"]], null);
    expect(close(us[1][0], 20)).toBe(true);
    expect(close(us[1][1], 15)).toBe(true);
  });
  test.each([
    ["an unknown reaction word", () => fx.caseReactions([[5]], [["udl 2 D"]], null as any, null as any, null, null as any, "sideways"), /^reaction: "sideways" is not a reaction/],
    ["no loads", () => fx.caseReactions([[5]], [[""]], null as any, null as any, null, null as any, null), /no load case/],
    ["a combo with an unlabelled load", () => fx.caseReactions([[5]], [["udl 2"]], null as any, null as any, "1.4D", null as any, null), /no case label/],
  ])("%s is refused with a message", (_name, call, message) => {
    const e = thrown(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});

describe("SPAN.FREQUENCIES", () => {
  const [L, EI, m] = [7.5, 2.1e5, 0.35];
  const unit = Math.sqrt(EI / (m * L ** 4));
  test("simple span: f1 = (pi/2) sqrt(EI/(m L^4)), f_n = n^2 f1; rows mode, Hz, rad/s", () => {
    const r = fx.frequencies([[L]], [[EI]], [[m]], 3, null as any, null as any, null, null as any, null);
    expect(r.map((row) => row[0])).toEqual([1, 2, 3]);
    r.forEach((row, i) => {
      expect(rel(row[1], ((i + 1) ** 2 * Math.PI * unit) / 2)).toBeLessThan(1e-11);
      expect(rel(row[2], (i + 1) ** 2 * Math.PI ** 2 * unit)).toBeLessThan(1e-11);
    });
  });
  test.each(BLANKS)("modes blank (%p) gives one row", (blank) => {
    expect(fx.frequencies([[L]], [[EI]], [[m]], blank, null as any, null as any, null, null as any, null).length).toBe(1);
  });
  test("mass from loads / g: a udl of m g with g given equals the mass given directly", () => {
    const direct = fx.frequencies([[L]], [[EI]], [[m]], 2, null as any, null as any, null, null as any, null);
    const fromLoads = fx.frequencies([[L]], [[EI]], [[""]], 2, null as any, [[`udl ${m * 9.81} D; udl 5 L`]], "D", null as any, 9.81);
    fromLoads.forEach((row, i) => expect(rel(row[1], direct[i][1] as number)).toBeLessThan(1e-12));
  });
  test("mass and loads add; with units g defaults to standard gravity in the length unit (9.80665 m/s^2)", () => {
    const sum = fx.frequencies([[L]], [[EI]], [[m / 2]], 1, null as any, [[`udl ${(m / 2) * 9.80665}`]], null, [["length=m, force=N"]], null);
    const direct = fx.frequencies([[L]], [[EI]], [[m]], 1, null as any, null as any, null, null as any, null);
    expect(rel(sum[0][1], direct[0][1] as number)).toBeLessThan(1e-12);
  });
  test("kip, ft and kip*in^2 give the SI member's frequencies", () => {
    const eiUS = 1.2e7; // kip*in^2
    const mUS = 0.002; // kip*s^2/ft^2
    const us = fx.frequencies([["24 18"]], [[eiUS]], [[mUS]], 3, [["pin pin fixed"]], null as any, null, [["length=ft, force=kip, EI=kip*in^2"]], null);
    const si = fx.frequencies([[`${24 * FT} ${18 * FT}`]], [[eiUS * KIP * 0.0254 ** 2]], [[(mUS * KIP) / FT ** 2]], 3, [["pin pin fixed"]], null as any, null, null as any, null);
    us.forEach((row, i) => expect(rel(row[1], si[i][1] as number)).toBeLessThan(1e-11));
  });
  test("a point load at mid-span of a massless simple span: sqrt(48 EI g / (P L^3)) (handbook deflection formula, from memory)", () => {
    const P = 12;
    const g = 9.81;
    const r = fx.frequencies([[L]], [[EI]], [[0]], 1, null as any, [[`point ${P} at ${L / 2}`]], null, null as any, g);
    expect(rel(r[0][2], Math.sqrt((48 * EI * g) / (P * L ** 3)))).toBeLessThan(1e-11);
  });
  test.each([
    ["no EI", () => fx.frequencies([[L]], null as any, [[m]], 1, null as any, null as any, null, null as any, null), "#N/A", /^EI: natural frequencies need/],
    ["modes 0", () => fx.frequencies([[L]], [[EI]], [[m]], -1, null as any, null as any, null, null as any, null), "#VALUE!", /^modes: give a whole number from 1 to 50, got -1/],
    ["modes 51", () => fx.frequencies([[L]], [[EI]], [[m]], 51, null as any, null as any, null, null as any, null), "#VALUE!", /^modes: give a whole number from 1 to 50/],
    ["modes 2.5", () => fx.frequencies([[L]], [[EI]], [[m]], 2.5, null as any, null as any, null, null as any, null), "#VALUE!", /^modes: give a whole number/],
    ["modes as a range", () => fx.frequencies([[L]], [[EI]], [[m]], [[1, 2]], null as any, null as any, null, null as any, null), "#VALUE!", /^modes: give one cell/],
    ["a negative mass", () => fx.frequencies([[L]], [[EI]], [[-1]], 1, null as any, null as any, null, null as any, null), "#VALUE!", /^mass: a mass per length must be 0 or more/],
    ["mass as text", () => fx.frequencies([[L]], [[EI]], [["heavy"]], 1, null as any, null as any, null, null as any, null), "#VALUE!", /^mass: "heavy" is not a number/],
    ["two masses for three spans", () => fx.frequencies([["3 3 3"]], [[EI]], [[1, 2]], 1, null as any, null as any, null, null as any, null), "#VALUE!", /^mass: give one mass per length for the member or one per span \(3\), got 2/],
    ["no mass at all", () => fx.frequencies([[L]], [[EI]], [[""]], 1, null as any, null as any, null, null as any, null), "#VALUE!", /^mass: give a mass per length, or loads/],
    ["loads without g or units", () => fx.frequencies([[L]], [[EI]], [[""]], 1, null as any, [["udl 2"]], null, null as any, null), "#VALUE!", /^g: the mass from the loads needs/],
    ["g of -9.81", () => fx.frequencies([[L]], [[EI]], [[""]], 1, null as any, [["udl 2"]], null, null as any, -9.81), "#VALUE!", /^g: must be a positive number/],
    ["a couple among the mass loads", () => fx.frequencies([[L]], [[EI]], [[""]], 1, null as any, [["udl 2; moment 3 at 2"]], null, null as any, 9.81), "#VALUE!", /^load 2 of the loads text|^load row 2: a couple carries no mass/],
    ["a load beyond the member", () => fx.frequencies([[L]], [[EI]], [[m]], 1, null as any, [["point 2 at 9"]], null, null as any, 9.81), "#VALUE!", /beyond the member end/],
    ["a mechanism", () => fx.frequencies([[L]], [[EI]], [[m]], 1, [["pin free"]], null as any, null, null as any, null), "#VALUE!", /./],
  ])("%s", (_name, call, code, message) => {
    const e = thrown(call);
    expect(e.code).toBe(code);
    expect(e.message).toMatch(message);
  });
});

describe("SPAN.MODESHAPE", () => {
  const [L, EI, m] = [6, 5e4, 1.2];
  test("simple span mode 2: sin(2 pi x / L) in the shape of x, blanks kept", () => {
    const x = [[0, 0.75, ""], [1.5, 4.5, 6]];
    const r = fx.modeShape([[L]], [[EI]], [[m]], 2, x, null as any, null as any, null, null as any, null);
    expect(r.length).toBe(2);
    expect(r[0][2]).toBe("");
    [[0, 0], [0, 1], [1, 0], [1, 1], [1, 2]].forEach(([i, j]) => expect(Math.abs((r[i][j] as number) - Math.sin((2 * Math.PI * (x[i][j] as number)) / L))).toBeLessThan(1e-9));
  });
  test.each([
    ["mode blank", () => fx.modeShape([[L]], [[EI]], [[m]], "", [[1]], null as any, null as any, null, null as any, null), /^mode: give the mode number/],
    ["x off the member", () => fx.modeShape([[L]], [[EI]], [[m]], 1, [[7]], null as any, null as any, null, null as any, null), /^x = 7 is outside the member/],
    ["x as text", () => fx.modeShape([[L]], [[EI]], [[m]], 1, [["mid"]], null as any, null as any, null, null as any, null), /^x: "mid" is not a number/],
    ["too many x cells", () => fx.modeShape([[L]], [[EI]], [[m]], 1, Array.from({ length: 10002 }, () => [1]), null as any, null as any, null, null as any, null), /^x: 10002 cells; at most 10001/],
  ])("%s is refused", (_name, call, message) => {
    const e = thrown(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});
