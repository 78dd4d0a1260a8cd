/**
 * The headers argument through the formula engine: the spill size predicted from the formula
 * text (resultSize.ts) counts the header row, so each call is evaluated once and spills exactly
 * what the direct call returns; a headers cell the text cannot read is learned from the first
 * evaluation. The engine (HyperFormula) writes the logical values as the functions TRUE() and
 * FALSE(); a bare TRUE is a #NAME? there (seen here: "Named expression TRUE not recognized").
 */
import { SpanWorkbook, predictSize } from "../../src/engine";
import { entryFor } from "../../src/engine/catalogue";
import { headersAsked } from "../../src/engine/resultSize";
import { diagram, envelope, extremes, moving, peaks, reactions } from "../../functions/functions";
import { block, direct } from "./support/direct";

const none = null as any;
const spans = "6 8";
const loads = "udl 2 D; udl 3 L";
const US = "length=ft, force=kip, EI=kip*in^2, deflection=in";

/** Formula (in A1 of its own sheet) and the direct call it should equal. */
const cases: [string, () => unknown[][]][] = [
  [`=SPAN.REACTIONS("${spans}","${loads}",,,,"${US}",TRUE())`, () => reactions([[spans]], [[loads]], none, none, none, [[US]], true)],
  [`=SPAN.EXTREMES("${spans}","${loads}",,20000,,,1)`, () => extremes([[spans]], [[loads]], none, [[20000]], none, none, 1)],
  [`=SPAN.DIAGRAM("${spans}","${loads}",7,,,,,"yes")`, () => diagram([[spans]], [[loads]], 7, none, none, none, none, "yes")],
  [`=SPAN.ENVELOPE("${spans}","${loads}",{0;3;9},"1.2D+1.6L",,,,,,,TRUE())`, () => envelope([[spans]], [[loads]], [[0], [3], [9]], [["1.2D+1.6L"]], none, none, none, none, none, none, true)],
  [`=SPAN.PEAKS("${spans}","${loads}","1.2D+1.6L",,,,,,TRUE())`, () => peaks([[spans]], [[loads]], [["1.2D+1.6L"]], none, none, none, none, none, true)],
  [`=SPAN.MOVING("${spans}","10 20","3","moment at 6",,,,TRUE())`, () => moving([[spans]], [["10 20"]], [["3"]], "moment at 6", none, none, none, true)],
  [`=SPAN.REACTIONS("${spans}","${loads}",,,,,FALSE())`, () => reactions([[spans]], [[loads]], none, none, none, none, false)],
];

describe("headers through the formula engine", () => {
  it.each(cases)("%s spills the direct call's rows after one evaluation", (formula, call) => {
    let calls = 0;
    const wb = new SpanWorkbook([{ name: "S", cells: [[formula]] }], { onSpanCall: () => calls++ });
    const expected = direct(call as () => unknown[][]);
    expect(typeof expected[0][0]).toBe(formula.includes("FALSE") ? "number" : "string");
    expect(wb.spillSize(0, 0, 0)).toEqual({ rows: expected.length, cols: expected[0].length });
    expect(block(wb.getSheetValues(0), 0, 0, expected.length, expected[0].length)).toEqual(expected);
    // DIAGRAM's rows beyond the even stations (supports, jumps, extremes) are learned anyway
    if (!formula.startsWith("=SPAN.DIAGRAM")) expect(calls).toBe(1);
    wb.destroy();
  });

  it("a headers cell the text cannot read is learned: FALSE in a cell still spills right", () => {
    let calls = 0;
    const wb = new SpanWorkbook([{ name: "S", cells: [[false], [`=SPAN.REACTIONS("${spans}","${loads}",,,,,A1)`]] }], { onSpanCall: () => calls++ });
    const expected = direct(() => reactions([[spans]], [[loads]], none, none, none, none, false));
    expect(wb.spillSize(0, 1, 0)).toEqual({ rows: expected.length, cols: 3 });
    expect(block(wb.getSheetValues(0), 1, 0, expected.length, 3)).toEqual(expected);
    expect(calls).toBe(1); // the first guess (a header row) is corrected from the result itself: the function is not called again
    wb.destroy();
  });

  it("a bad headers value is the #VALUE! the direct call gives", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: [[`=SPAN.REACTIONS("${spans}","${loads}",,,,,"maybe")`]] }]);
    const value = wb.getValue(0, 0, 0) as { error: string; message: string };
    expect(value).toEqual(direct(() => reactions([[spans]], [[loads]], none, none, none, none, "maybe"))[0][0]);
    expect(value.error).toBe("#VALUE!");
    wb.destroy();
  });
});

describe("headersAsked and predictSize", () => {
  it.each([
    [{ type: "EMPTY" }, false],
    [{ type: "NUMBER", value: 0 }, false],
    [{ type: "NUMBER", value: 1 }, true],
    [{ type: "STRING", value: " No " }, false],
    [{ type: "STRING", value: "" }, false],
    [{ type: "STRING", value: "yes" }, true],
    [{ type: "FUNCTION_CALL", procedureName: "FALSE" }, false],
    [{ type: "FUNCTION_CALL", procedureName: "TRUE" }, true],
    [{ type: "CELL_REFERENCE" }, true],
  ])("%p -> %p", (node, asked) => {
    expect(headersAsked(node)).toBe(asked);
  });
  it("adds exactly one row for every function that takes headers, and none for one that does not", () => {
    const sizeOf = () => ({ rows: 1, cols: 1 });
    for (const name of ["SPAN.REACTIONS", "SPAN.EXTREMES", "SPAN.DIAGRAM", "SPAN.MAXMOMENT", "SPAN.PEAKS", "SPAN.MOVING", "SPAN.ENVELOPE", "SPAN.SPANPEAKS", "SPAN.CASEREACTIONS", "SPAN.STRESS", "SPAN.SHEARSTRESS", "SPAN.DEFLECTIONCHECK", "SPAN.FREQUENCIES"]) {
      const entry = entryFor(name)!;
      const at = entry.arguments.findIndex((a) => a.name === "headers");
      expect(at).toBe(entry.arguments.length - 1);
      const args = entry.arguments.map(() => ({ type: "EMPTY" }));
      const plain = predictSize(entry, args, sizeOf);
      args[at] = { type: "NUMBER", value: 1 } as any;
      expect(predictSize(entry, args, sizeOf)).toEqual({ rows: plain.rows + 1, cols: plain.cols });
    }
    const influence = entryFor("SPAN.INFLUENCE")!;
    expect(influence.arguments.some((a) => a.name === "headers")).toBe(false);
  });
});
