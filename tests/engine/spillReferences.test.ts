/**
 * Spilled-range references and ranges over an array formula that failed.
 *
 * Host rules (Microsoft support, "Spilled range operator"): `A2#` is the whole range A2's
 * formula spills into (`=SUM(A2#)` equals `=SUM(A2:A11)`), so a formula that is `=A2#` alone
 * returns that array and spills it (Microsoft Learn, "Handle dynamic arrays and spilling using
 * the Excel JavaScript API": a formula `=A4:D4` spills). An anchor whose spill is blocked
 * shows `#SPILL!`; a reference to it gives an error, never a value and never a crash.
 */
import { SpanWorkbook, type CellResult, type CellInput } from "../../src/engine";
import { reactions } from "../../functions/functions";
import { block, direct } from "./support/direct";

const SPANS = "6 8 6";
const GOOD = "udl 2.5 D; point 10 at 3 L";
const BAD = "point 10 at 30 L";
const table = (spans: string, loads: string) => direct(() => reactions([[spans]], [[loads]])) as number[][];

/** Sheet S: A1 spans, B1 loads, B2 =SPAN.REACTIONS (4 x 3 into B2:D5), C3 the blocker when given. */
function sheetS(loads: string, blocker: CellInput = null): CellInput[][] {
  return [[SPANS, loads], [null, "=SPAN.REACTIONS(A1,B1)"], [null, null, blocker]];
}

function errorOf(value: CellResult): { error: string; message: string } {
  expect(value).toEqual({ error: expect.any(String), message: expect.any(String) });
  return value as { error: string; message: string };
}

describe("a range or A1# over an array formula that failed", () => {
  interface Failure {
    name: string;
    loads: string;
    blocker: CellInput;
    error: string;
    toString(): string;
  }
  const blocked: Failure = { name: "blocked spill", loads: GOOD, blocker: "x", error: "#SPILL!", toString: () => "blocked spill" };
  const failing: Failure = { name: "function error", loads: BAD, blocker: null, error: "#VALUE!", toString: () => "function error" };
  // The formulas that made the engine throw "Unknown array" out of buildFromSheets/setCellContents.
  const formulas: [string, Failure, string][] = [
    ["=S!B2:B2", blocked, "the anchor cell as a range"],
    ["=S!B2#", blocked, "the spill reference alone"],
    ["=INDEX(S!B2#,1,1)", blocked, "INDEX of the spill reference"],
    ["=S!B2:D5", failing, "the reserved area as a range"],
    ["=S!B2#", failing, "the spill reference alone"],
    ["=INDEX(S!B2:D5,1,1)", failing, "INDEX of the reserved area"],
    ["=INDEX(S!B2#,2,2)", failing, "INDEX of the spill reference"],
    // Counted from the formula text by the engine: must not count the area of a failed array.
    ["=ROWS(S!B2#)", failing, "ROWS of the spill reference"],
    ["=COLUMNS(S!B2#)", blocked, "COLUMNS of the spill reference"],
    ["=SUM(S!B2#)", blocked, "SUM of the spill reference"],
  ];

  it.each(formulas)("%s on a %s (%s) is the anchor's error with its message, when read and when typed", (formula, kind) => {
    const anchorError = () => new SpanWorkbook([{ name: "S", cells: sheetS(kind.loads, kind.blocker) }]).getValue(0, 1, 1);
    const expected = errorOf(anchorError());
    expect(expected.error).toBe(kind.error);
    expect(expected.message).not.toBe("");

    const read = new SpanWorkbook([{ name: "S", cells: sheetS(kind.loads, kind.blocker) }, { name: "T", cells: [[formula]] }]);
    expect(read.getValue(1, 0, 0)).toEqual(expected);

    const typed = new SpanWorkbook([{ name: "S", cells: sheetS(kind.loads, kind.blocker) }, { name: "T", cells: [[]] }]);
    typed.setCell(1, 0, 0, formula);
    expect(typed.getValue(1, 0, 0)).toEqual(expected);
    expect(typed.getFormula(1, 0, 0)).toBe(formula);
  });

  it("follows the anchor as it breaks, is mended and is blocked: errors while it fails, the values when it spills", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: sheetS(GOOD) }, { name: "T", cells: [["=S!B2:B2", "=SUM(S!B2#)", "=ROWS(S!B2#)", "=S!B2#"]] }]);
    const good = table(SPANS, GOOD);
    const sum = good.flat().reduce((a, b) => a + b, 0);
    const healthy = () => {
      expect(wb.getValue(1, 0, 0)).toBe(good[0][0]);
      expect(wb.getValue(1, 0, 1)).toBeCloseTo(sum, 9);
      expect(wb.getValue(1, 0, 2)).toBe(good.length);
      expect(block(wb.getSheetValues(1), 0, 3, good.length, 3)).toEqual(good);
    };
    healthy();

    wb.setCell(0, 0, 1, BAD);
    const broken = errorOf(wb.getValue(0, 1, 1));
    expect(broken.error).toBe("#VALUE!");
    for (let col = 0; col < 4; col++) expect(wb.getValue(1, 0, col)).toEqual(broken);

    wb.setCell(0, 0, 1, GOOD);
    healthy();

    wb.setCell(0, 2, 2, "x");
    for (let col = 0; col < 4; col++) expect(wb.getValue(1, 0, col)).toMatchObject({ error: "#SPILL!" });
  });

  it("gives #REF! with a message for A1# where A1 holds no array formula, and for an unknown sheet", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: [[5, "=A1*2", "=A1#", "=SUM(B1#)", "=Nowhere!A1#", "=ROWS(A1#)"]] }]);
    for (const col of [2, 3, 4, 5]) {
      const value = errorOf(wb.getValue(0, 0, col));
      expect(value.error).toBe("#REF!");
      expect(value.message).toMatch(/spills none/);
    }
    expect(errorOf(wb.getValue(0, 0, 3)).message).toContain("B1#");
  });
});

describe("a formula that is a spill reference alone spills the referenced array", () => {
  it("=B2# spills the REACTIONS table it refers to, on its own sheet and from another, saved form included", () => {
    const good = table(SPANS, GOOD);
    const wb = new SpanWorkbook([
      { name: "S", cells: [...sheetS(GOOD), [], [], [null, "=B2#", null, null, "= $B$2# "], [], [], [], [], ["=_xlfn.ANCHORARRAY(B2)"]] },
      { name: "Other sheet", cells: [["='S'!B2#"]] },
    ]);
    const values = wb.getSheetValues(0);
    expect(block(values, 5, 1, good.length, 3)).toEqual(good);
    expect(block(values, 5, 4, good.length, 3)).toEqual(good);
    expect(block(values, 10, 0, good.length, 3)).toEqual(good);
    expect(block(wb.getSheetValues(1), 0, 0, good.length, 3)).toEqual(good);
    for (const [sheet, row, col] of [[0, 5, 1], [0, 5, 4], [0, 10, 0], [1, 0, 0]]) expect(wb.spillSize(sheet, row, col)).toEqual({ rows: good.length, cols: 3 });
    expect(wb.getFormula(0, 5, 1)).toBe("=B2#");
    expect(wb.getFormula(0, 10, 0)).toBe("=_xlfn.ANCHORARRAY(B2)");
    expect(wb.getInput(0, 6, 1)).toBeUndefined();
  });

  it("resizes with the referenced spill, and shows #SPILL! when its own spill is blocked", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: [...sheetS(GOOD), [], [], [], ["=B2#"]] }]);
    wb.setCell(0, 0, 0, "5 5");
    const shorter = table("5 5", GOOD);
    expect(shorter).toHaveLength(3);
    expect(wb.spillSize(0, 6, 0)).toEqual({ rows: 3, cols: 3 });
    const values = wb.getSheetValues(0);
    expect(block(values, 6, 0, 3, 3)).toEqual(shorter);
    expect(values[9]?.[0] ?? null).toBeNull();

    wb.setCell(0, 7, 2, "in the way");
    expect(wb.getValue(0, 6, 0)).toMatchObject({ error: "#SPILL!" });
    wb.setCell(0, 7, 2, null);
    expect(block(wb.getSheetValues(0), 6, 0, 3, 3)).toEqual(shorter);
  });
});

describe("a blocked spill", () => {
  // The host (Microsoft support, "How to correct a #SPILL! error", section "Spill range isn't
  // blank"; read in its stored uk-UA and ru-RU copies): once the obstructing cell is cleared,
  // the array formula spills as intended.
  it("spills again once the cell in its way is cleared, by setCell and by setScattered, and what refers to it follows", () => {
    const good = table(SPANS, GOOD);
    const wb = new SpanWorkbook([{ name: "S", cells: sheetS(GOOD, "x") }, { name: "T", cells: [["=SUM(S!B2#)"]] }]);
    expect(wb.getValue(0, 1, 1)).toMatchObject({ error: "#SPILL!" });
    expect(wb.getValue(1, 0, 0)).toMatchObject({ error: "#SPILL!" });
    wb.setCell(0, 2, 2, null);
    expect(block(wb.getSheetValues(0), 1, 1, good.length, 3)).toEqual(good);
    expect(wb.getValue(1, 0, 0)).toBeCloseTo(good.flat().reduce((a, b) => a + b, 0), 9);
    wb.setScattered(0, [[3, 3, "y"]]);
    expect(wb.getValue(0, 1, 1)).toMatchObject({ error: "#SPILL!" });
    wb.setScattered(0, [[3, 3, null]]);
    expect(block(wb.getSheetValues(0), 1, 1, good.length, 3)).toEqual(good);
  });
});

describe("formulas kept as typed (A1#) when a block is written over them", () => {
  it("forgets exactly the cells the block covers, ragged rows included, on this sheet only", () => {
    // Row 3 (index 2): A1# formulas in A..D; the same on sheet T.
    const kept = [[SPANS, GOOD], [null, "=SPAN.REACTIONS(A1,B1)"], [], [], [], [], ["=B2#", "=SUM(B2#)", "=ROWS(B2#)", "=B2#"]];
    const wb = new SpanWorkbook([{ name: "S", cells: kept }, { name: "T", cells: [["=S!B2#"]] }]);
    expect(wb.getFormula(0, 6, 1)).toBe("=SUM(B2#)");
    // A ragged block: its first row reaches columns A..B of row 7 only, its second A..D of row 8.
    wb.setCells(0, 6, 0, [[7, "=ROWS(B2#)+1"], [1, 2, 3, 4]]);
    expect(wb.getFormula(0, 6, 0)).toBeUndefined();
    expect(wb.getInput(0, 6, 0)).toBe(7);
    expect(wb.getFormula(0, 6, 1)).toBe("=ROWS(B2#)+1");
    expect(wb.getValue(0, 6, 1)).toBe(5);
    expect(wb.getInput(0, 7, 3)).toBe(4);
    expect(wb.getFormula(0, 6, 2)).toBe("=ROWS(B2#)");
    expect(wb.getFormula(0, 6, 3)).toBe("=B2#");
    expect(wb.getFormula(1, 0, 0)).toBe("=S!B2#");
    // Scattered writes forget what they cover too.
    wb.setScattered(0, [[6, 3, null]]);
    expect(wb.getFormula(0, 6, 3)).toBeUndefined();
    expect(wb.getFormula(0, 6, 2)).toBe("=ROWS(B2#)");
  });
});
