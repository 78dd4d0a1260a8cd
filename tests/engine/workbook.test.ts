import { SpanWorkbook, SPAN_EXPORTS } from "../../src/engine";
import { deflection, diagram, extremes, maxMoment, moment, reactions, shear } from "../../functions/functions";
import { block, direct } from "./support/direct";

const spans = "6 8 6";
const loads = "udl 2.5 D; point 10 at 3 L";

function book(): SpanWorkbook {
  return new SpanWorkbook([
    {
      name: "Member",
      cells: [
        [spans, loads, "fixed pin pin pin", 12000, "1.2D+1.6L"],
        [0, 1.5, 3, 4.5, 6],
        ["=SPAN.REACTIONS(A1,B1)"],
        [], [], [],
        ["=SPAN.SHEAR(A1,B1,A2:E2,C1,D1,E1)"],
        ["=SPAN.MOMENT(A1,B1,A2:E2,C1,,E1)"],
        ["=SPAN.DEFLECTION(A1,B1,A2:E2,C1,D1)"],
        ["=SPAN.MAXMOMENT(A1,B1,C1,,E1)", null, "=SUM(A3#)", "=ROWS(A3#)", "=INDEX(A3#,2,2)"],
        [],
        ["=SPAN.EXTREMES(A1,B1,C1,D1)"],
        [], [], [],
        ["=SPAN.DIAGRAM(A1,B1,7,C1,D1,E1)"],
      ],
    },
  ]);
}

describe("SpanWorkbook", () => {
  const wb = book();
  const values = wb.getSheetValues(0);
  const x = [[0, 1.5, 3, 4.5, 6]];

  it("spills REACTIONS of a one-cell spans list in the size of the direct result", () => {
    const expected = direct(() => reactions([[spans]], [[loads]]));
    expect(expected).toHaveLength(4);
    expect(wb.spillSize(0, 2, 0)).toEqual({ rows: 4, cols: 3 });
    expect(block(values, 2, 0, 4, 3)).toEqual(expected);
  });

  it("spills SHEAR, MOMENT and DEFLECTION in the shape of x, skipped arguments as null", () => {
    expect(block(values, 6, 0, 1, 5)).toEqual(direct(() => shear([[spans]], [[loads]], x, [["fixed pin pin pin"]], [[12000]], "1.2D+1.6L")));
    expect(block(values, 7, 0, 1, 5)).toEqual(direct(() => moment([[spans]], [[loads]], x, [["fixed pin pin pin"]], null as never, "1.2D+1.6L")));
    expect(block(values, 8, 0, 1, 5)).toEqual(direct(() => deflection([[spans]], [[loads]], x, [["fixed pin pin pin"]], [[12000]], null)));
  });

  it("spills MAXMOMENT, EXTREMES and DIAGRAM like the direct calls", () => {
    expect(block(values, 9, 0, 2, 2)).toEqual(direct(() => maxMoment([[spans]], [[loads]], [["fixed pin pin pin"]], null as never, "1.2D+1.6L")));
    const ext = direct(() => extremes([[spans]], [[loads]], [["fixed pin pin pin"]], [[12000]], null));
    expect(block(values, 11, 0, ext.length, 5)).toEqual(ext);
    const diag = direct(() => diagram([[spans]], [[loads]], 7, [["fixed pin pin pin"]], [[12000]], "1.2D+1.6L"));
    expect(wb.spillSize(0, 15, 0)).toEqual({ rows: diag.length, cols: 5 });
    expect(block(values, 15, 0, diag.length, 5)).toEqual(diag);
  });

  it("resolves spilled-range references A3# for SUM, ROWS and INDEX", () => {
    const expected = direct(() => reactions([[spans]], [[loads]])) as number[][];
    const sum = expected.flat().reduce((a, b) => a + b, 0);
    expect(values[9][2]).toBeCloseTo(sum, 9);
    expect(values[9][3]).toBe(expected.length);
    expect(values[9][4]).toBe(expected[1][1]);
    expect(wb.getFormula(0, 9, 2)).toBe("=SUM(A3#)");
  });

  it("recalculates and resizes the spill when an input changes", () => {
    const edited = book();
    edited.setCell(0, 0, 0, "5 5");
    edited.setCell(0, 0, 2, "pin pin pin");
    const after = edited.getSheetValues(0);
    const expected = direct(() => reactions([["5 5"]], [[loads]]));
    expect(expected).toHaveLength(3);
    expect(edited.spillSize(0, 2, 0)).toEqual({ rows: 3, cols: 3 });
    expect(block(after, 2, 0, 3, 3)).toEqual(expected);
    expect(after[5][0]).toBeNull();
    expect(after[9][3]).toBe(3);
  });

  it("shows a thrown error with its code and message", () => {
    const bad = new SpanWorkbook([{ name: "S", cells: [[spans, "point 10 at 30 L", "=SPAN.MOMENT(A1,B1,2)", "=SPAN.SLOPE(A1,B1,2)"]] }]);
    expect(bad.getValue(0, 0, 2)).toEqual(direct(() => moment([[spans]], [["point 10 at 30 L"]], [[2]]))[0][0]);
    expect(bad.getValue(0, 0, 2)).toMatchObject({ error: "#VALUE!" });
    const noEi = direct(() => moment([[spans]], [["udl 1"]], [[2]]));
    expect(noEi[0][0]).toEqual(expect.any(Number));
    bad.setCell(0, 0, 1, "udl 1");
    expect(bad.getValue(0, 0, 2)).toEqual(noEi[0][0]);
    expect(bad.getValue(0, 0, 3)).toMatchObject({ error: "#N/A" });
    expect((bad.getValue(0, 0, 3) as { message: string }).message).not.toBe("");
  });

  it("reads saved-workbook forms of SPAN calls and spilled references", () => {
    const saved = new SpanWorkbook([
      {
        name: "S",
        cells: [
          [spans, loads, "=_xldudf_SPAN_REACTIONS(A1,B1)", null, null, "=SUM(_xlfn.ANCHORARRAY(C1))", "=_xll.SPAN.MAXMOMENT(A1,B1)"],
        ],
      },
    ]);
    const values2 = saved.getSheetValues(0);
    const expected = direct(() => reactions([[spans]], [[loads]])) as number[][];
    expect(block(values2, 0, 2, 4, 3)).toEqual(expected);
    expect(values2[0][5]).toBeCloseTo(expected.flat().reduce((a, b) => a + b, 0), 9);
    expect(block(values2, 0, 6, 2, 2)).toEqual(direct(() => maxMoment([[spans]], [[loads]])));
  });
});

describe("SpanWorkbook sizes, single evaluation and @", () => {
  it("evaluates each SPAN call once, a spans list typed in one cell included", () => {
    const calls: Record<string, number> = {};
    const counted = Object.fromEntries(
      Object.entries(SPAN_EXPORTS).map(([name, fn]) => [name, (...args: unknown[]) => ((calls[name] = (calls[name] ?? 0) + 1), fn(...args))]),
    ) as typeof SPAN_EXPORTS;
    const wb = new SpanWorkbook(
      [{ name: "S", cells: [[spans, loads, "=SPAN.REACTIONS(A1,B1)", null, null, "=SPAN.DIAGRAM(A1,B1,5)", null, null, null, null, "=_xldudf_SPAN_MAXMOMENT(A1,B1)"]] }],
      { functions: counted },
    );
    expect(wb.spillSize(0, 0, 2)).toEqual({ rows: 4, cols: 3 });
    expect(wb.spillSize(0, 0, 5)?.rows).toBe(direct(() => diagram([[spans]], [[loads]], 5)).length);
    // DIAGRAM's rows are learned from its first evaluation; the learned result is kept, not recomputed.
    expect(calls).toEqual({ reactions: 1, diagram: 1, maxMoment: 1 });
    wb.setCell(0, 0, 0, "5 5");
    expect(wb.spillSize(0, 0, 2)).toEqual({ rows: 3, cols: 3 });
    expect(calls).toEqual({ reactions: 2, diagram: 2, maxMoment: 2 });
  });

  it("takes sheets past the engine's default 40,000 rows, up to the host's 1,048,576", () => {
    const cells: (string | number | null)[][] = Array.from({ length: 60_000 }, () => []);
    cells[59_999] = [6, "=A60000*2"];
    const wb = new SpanWorkbook([{ name: "Tall", cells }]);
    expect(wb.getValue(0, 59_999, 1)).toBe(12);
    expect(() => new SpanWorkbook([{ name: "Huge", cells: Array.from({ length: 1_048_577 }, () => []) }])).toThrow(/1048576 rows/);
  });

  it("reads _xlfn.SINGLE (an explicit @) as implicit intersection", () => {
    // Microsoft support, "Implicit intersection operator: @": a range gives the cell in the
    // formula's row or column, an array its top-left value, a single value itself.
    const wb = new SpanWorkbook([
      {
        name: "S",
        cells: [
          [10, "=_xlfn.SINGLE(A1:A3)", "=_xlfn.SINGLE(_xldudf_SPAN_REACTIONS(\"6 8 6\",\"udl 2.5 D; point 10 at 3 L\"))", "=_xlfn.SINGLE(A1:B2)"],
          [20, "=_xlfn.SINGLE(A1:A3)", "=_xlfn.SINGLE(7)", "=_xlfn.SINGLE(A1:A2)"],
          [30],
          [null, null, null, null],
        ],
      },
    ]);
    expect(wb.getValue(0, 0, 1)).toBe(10);
    expect(wb.getValue(0, 1, 1)).toBe(20);
    expect(wb.getValue(0, 0, 2)).toBe(0); // REACTIONS' first cell is the x of node 1
    expect(wb.getValue(0, 1, 2)).toBe(7);
    expect(wb.getValue(0, 0, 3)).toMatchObject({ error: "#VALUE!" });
    expect(wb.getValue(0, 1, 3)).toBe(20);
    expect(wb.spillSize(0, 0, 2)).toBeUndefined();
  });

  it("inputBlock gives each cell's getInput (null when empty), past the used area too", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: [[spans, loads, "=SPAN.REACTIONS(A1,B1)"], [7, "'12", "=SUM(C1#)", "=_xlfn.SINGLE(A1:A2)"]] }]);
    wb.setCell(0, 30, 1, "late");
    const used = wb.dimensions(0);
    const rows = used.rows + 3;
    const cols = used.cols + 2;
    const expected = Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => wb.getInput(0, r, c) ?? null));
    expect(wb.inputBlock(0, 0, 0, rows, cols)).toEqual(expected);
    expect(expected[1][2]).toBe("=SUM(C1#)");
    expect(expected[2][2]).toBeNull(); // a spilled cell holds nothing as typed
    expect(expected[30][1]).toBe("late");
    expect(wb.inputBlock(0, used.rows, 0, 2, 2)).toEqual([[null, null], [null, null]]);
  });
});
