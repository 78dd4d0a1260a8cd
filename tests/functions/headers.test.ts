/**
 * The optional headers argument of the tabular functions: a first row naming each column with
 * its unit (from the units argument; just the names without units), the rest of the result
 * unchanged; column names from the one table in src/sheet/headers.ts.
 */
import {
  caseReactions,
  deflectionCheck,
  diagram,
  envelope,
  extremes,
  frequencies,
  maxMoment,
  moving,
  peaks,
  reactions,
  section,
  shearStress,
  spanPeaks,
  stress,
} from "../../functions/functions";

const none = null as any;
const spans = [["6 8"]];
const loads = [["udl 2 D; udl 3 L; point 10 at 9 L"]];
const EI = [[20000]];
const US = [["length=ft, force=kip, EI=kip*in^2, deflection=in"]];
const combos = [["1.2D+1.6L"], ["0.9D"]];
// An I section in inches (invented dimensions: depth, width, flange, web) for the stress checks.
const sectionIn = section("I", [["13.7 6.73 0.585 0.35"]], "in");
const CHECK_US = [["length=ft, force=kip, EI=kip*in^2, section=in, stress=ksi, deflection=in"]];
const usEI = [[29000 * 510]];

/** Each tabular function, called with its trailing arguments up to units, then a headers value. */
const calls: [string, (units: any, headers: any) => any[][]][] = [
  ["REACTIONS", (u, h) => reactions(spans, loads, none, EI, none, u, h)],
  ["MAXMOMENT", (u, h) => maxMoment(spans, loads, none, EI, none, u, h)],
  ["EXTREMES", (u, h) => extremes(spans, loads, none, EI, none, u, h)],
  ["DIAGRAM", (u, h) => diagram(spans, loads, 11, none, EI, none, u, h)],
  ["ENVELOPE", (u, h) => envelope(spans, loads, [[0], [3], [9]], combos, none, EI, "deflection", none, none, u, h)],
  ["PEAKS", (u, h) => peaks(spans, loads, combos, none, EI, "standard L", none, u, h)],
  ["MOVING", (u, h) => moving(spans, [[10, 20]], [[3]], "moment at 9", none, EI, u, h)],
  ["SPANPEAKS", (u, h) => spanPeaks(spans, loads, none, EI, none, u, h)],
  ["CASEREACTIONS", (u, h) => caseReactions(spans, loads, none, EI, "1.2D+1.6L", u, none, h)],
  // a section table in inches needs the member's units: both passes use them
  ["STRESS", (_u, h) => stress(spans, loads, sectionIn, none, usEI, none, CHECK_US, h)],
  ["SHEARSTRESS", (_u, h) => shearStress(spans, loads, sectionIn, none, usEI, none, CHECK_US, h)],
  ["DEFLECTIONCHECK", (u, h) => deflectionCheck(spans, loads, [["L/360"]], none, usEI, none, u === null ? none : CHECK_US, h)],
  ["FREQUENCIES", (u, h) => frequencies(spans, EI, [[0.3]], 3, none, none, none, u === null ? none : [["length=m, force=kN, EI=kN*m^2"]], none, h)],
];

function errorOf(call: () => unknown): { code: string; message: string } {
  try {
    call();
  } catch (e) {
    return e as { code: string; message: string };
  }
  throw new Error("expected an error");
}

describe.each(calls)("SPAN.%s headers", (_name, call) => {
  it.each([[true], [1], ["yes"], ["TRUE"], [[[true]]]])("%p adds one text row over the same result, as wide as it", (h) => {
    for (const units of [none, US]) {
      const plain = call(units, none);
      const headed = call(units, h);
      expect(headed.slice(1)).toEqual(plain);
      expect(headed[0]).toHaveLength(plain[0].length);
      for (const cell of headed[0]) expect(typeof cell).toBe("string");
    }
  });
  it.each([[false], [0], [""], ["no"], [null]])("%p adds no row", (h) => {
    expect(call(US, h)).toEqual(call(US, none));
  });
  it.each([["maybe"], [2], ["#N/A"], [[[true, false]]]])("%p is a #VALUE! naming the headers argument", (h) => {
    const e = errorOf(() => call(none, h));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(/^headers: /);
  });
});

describe("header names and units", () => {
  it("without units the names alone; with units each name carries its unit (slope in rad either way)", () => {
    expect(reactions(spans, loads, none, EI, none, none, true)[0]).toEqual(["x", "R", "M reaction"]);
    expect(reactions(spans, loads, none, EI, none, US, true)[0]).toEqual(["x (ft)", "R (kip)", "M reaction (kip*ft)"]);
    expect(diagram(spans, loads, 11, none, EI, none, US, true)[0]).toEqual(["x (ft)", "V (kip)", "M (kip*ft)", "slope (rad)", "deflection (in)"]);
    expect(diagram(spans, loads, 11, none, EI, none, none, true)[0]).toEqual(["x", "V", "M", "slope (rad)", "deflection"]);
    expect(maxMoment(spans, loads, none, EI, none, US, true)[0]).toEqual(["M (kip*ft)", "x (ft)"]);
  });
  it("ENVELOPE names its quantity with the quantity's unit; MOVING its effect's", () => {
    const row = (q: string) => envelope(spans, loads, [[3]], combos, none, EI, q, none, none, US, true)[0];
    expect(row("deflection")).toEqual(["x (ft)", "max deflection (in)", "max governed by", "min deflection (in)", "min governed by"]);
    expect(row("shear")[1]).toBe("max shear (kip)");
    expect(row("moment")[3]).toBe("min moment (kip*ft)");
    expect(moving(spans, [[10]], none, "reaction 2", none, EI, US, true)[0][1]).toBe("reaction (kip)");
    expect(moving(spans, [[10]], none, "absolute moment", none, EI, US, true)[0][1]).toBe("absolute moment (kip*ft)");
  });
  it("EXTREMES and PEAKS, whose max and min columns change quantity by row, give those columns no unit", () => {
    expect(extremes(spans, loads, none, EI, none, US, true)[0]).toEqual(["quantity", "max", "x at max (ft)", "min", "x at min (ft)"]);
    expect(peaks(spans, loads, combos, none, EI, none, none, US, true)[0]).toEqual(["quantity", "max", "x at max (ft)", "max governed by", "min", "x at min (ft)", "min governed by"]);
  });
  it("CASEREACTIONS names each case column by its label and the combination's by its text, in the reaction's unit", () => {
    expect(caseReactions(spans, loads, none, EI, "1.2D+1.6L", US, none, true)[0]).toEqual(["x (ft)", "D (kip)", "L (kip)", "1.2D+1.6L (kip)"]);
    expect(caseReactions([["6"]], [["udl 2"]], [["fixed free"]], EI, none, US, "moment", "yes")[0]).toEqual(["x (ft)", "unlabelled (kip*ft)"]);
  });
  it("the checks name stress in the stress unit and deflection in the deflection unit; frequencies are in Hz and rad/s", () => {
    expect(stress(spans, loads, sectionIn, none, usEI, none, CHECK_US, true)[0]).toEqual(["fibre", "max stress (ksi)", "x at max (ft)", "min stress (ksi)", "x at min (ft)"]);
    expect(shearStress(spans, loads, sectionIn, none, usEI, none, CHECK_US, true)[0]).toEqual(["stress", "value (ksi)", "x (ft)"]);
    expect(deflectionCheck(spans, loads, [["L/360"]], none, usEI, none, CHECK_US, true)[0]).toEqual(["span", "length (ft)", "deflection (in)", "x (ft)", "span/deflection", "limit", "result"]);
    expect(frequencies(spans, EI, [[0.3]], 2, none, none, none, none, none, true)[0]).toEqual(["mode", "frequency (Hz)", "circular frequency (rad/s)"]);
  });
});
