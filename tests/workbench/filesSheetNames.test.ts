/**
 * Sheet-name rules (src/workbench/files/sheetNames.ts). Sources: the spreadsheet host's own
 * refusal ("does not exceed 31 characters", none of : \ / ? * [ ], "You did not leave the name
 * blank", quoted in the Stack Overflow question "Is there a limit on an Excel worksheet's name
 * length?"); apostrophes at either end and uniqueness: DevExpress Office File API,
 * "Worksheet.Name" (third-party documentation); "History": third-party pages, not the host's
 * documentation.
 */
import { SpanWorkbook } from "../../src/engine";
import { renameSheetReferences } from "../../src/engine/workbook";
import { MAX_SHEET_NAME, nextSheetName, sheetNameProblem } from "../../src/workbench/files/sheetNames";

const EXISTING = ["Schedule", "Member", "Level 2"];

describe("sheet names", () => {
  it.each([
    ["Beam B-12", undefined],
    ["Café §1", undefined],
    ["x".repeat(MAX_SHEET_NAME), undefined],
    ["it's", undefined],
    ["", /blank/],
    ["   ", /blank/],
    ["x".repeat(MAX_SHEET_NAME + 1), /at most 31 characters \(this one has 32\)/],
    ["a:b", /cannot contain :/],
    ["a\\b", /cannot contain \\/],
    ["a/b", /cannot contain \//],
    ["a?b", /cannot contain \?/],
    ["a*b", /cannot contain \*/],
    ["a[b", /cannot contain \[/],
    ["a]b", /cannot contain \]/],
    ["a\tb", /control characters/],
    ["line\nbreak", /control characters/],
    ["'quoted", /apostrophe/],
    ["quoted'", /apostrophe/],
    ["History", /reserved/],
    ["history", /reserved/],
    ["schedule", /there is a sheet named "Schedule" already/],
    ["LEVEL 2", /there is a sheet named "Level 2" already/],
  ])("%j -> %s", (name, problem) => {
    const found = sheetNameProblem(name, EXISTING);
    if (problem === undefined) expect(found).toBeUndefined();
    else expect(found).toMatch(problem);
  });

  it("counts characters, not UTF-16 units (31 emoji are allowed)", () => {
    expect(sheetNameProblem("🏗".repeat(31), [])).toBeUndefined();
    expect(sheetNameProblem("🏗".repeat(32), [])).toMatch(/31 characters/);
  });

  it("lets a sheet keep its own name, or change only its case, when renamed", () => {
    expect(sheetNameProblem("Member", EXISTING, "Member")).toBeUndefined();
    expect(sheetNameProblem("MEMBER", EXISTING, "Member")).toBeUndefined();
    expect(sheetNameProblem("Schedule", EXISTING, "Member")).toMatch(/already/);
  });

  it("offers the first free SheetN", () => {
    expect(nextSheetName([])).toBe("Sheet1");
    expect(nextSheetName(["Sheet1"])).toBe("Sheet2");
    expect(nextSheetName(["A", "sheet3"])).toBe("Sheet4");
    for (const names of [[], ["Sheet1"], ["A", "sheet3"], EXISTING]) expect(sheetNameProblem(nextSheetName(names), names)).toBeUndefined();
  });
});

describe("references that follow a renamed sheet", () => {
  it.each([
    ["=Beam!A1+1", "Beam", "Level 2", "='Level 2'!A1+1"],
    ["=beam!A1+BEAM!B2", "Beam", "Girder", "=Girder!A1+Girder!B2"],
    ["='Level 2'!A1*2", "level 2", "L2", "=L2!A1*2"],
    ["='it''s'!A1", "it's", "ok", "=ok!A1"],
    ["=Beams!A1+XBeam!A1+Beam.2!A1", "Beam", "New", "=Beams!A1+XBeam!A1+Beam.2!A1"],
    ['=Beam!A1&"Beam!A1"', "Beam", "B 2", '=\'B 2\'!A1&"Beam!A1"'],
    ["=SUM(Beam!A1:A3,Other!B1)", "Beam", "it's", "=SUM('it''s'!A1:A3,Other!B1)"],
    ["Beam!$C$1", "Beam", "Level 2 beam", "'Level 2 beam'!$C$1"],
  ])("%s, %s -> %s: %s", (formula, from, to, expected) => {
    expect(renameSheetReferences(formula, from, to)).toBe(expected);
  });

  it("rewrites formulas the engine keeps as typed (a spill reference) when their sheet is renamed", () => {
    const book = new SpanWorkbook([
      { name: "Source", cells: [["=SEQUENCE(3)"]] },
      { name: "Use", cells: [["=SUM(Source!A1#)"]] },
    ]);
    expect(book.getValue(1, 0, 0)).toBe(6);
    book.renameSheet(0, "New source");
    expect(book.getFormula(1, 0, 0)).toBe("=SUM('New source'!A1#)");
    book.setCell(0, 0, 0, "=SEQUENCE(4)");
    expect(book.getValue(1, 0, 0)).toBe(10);
    expect(book.sheetInputs(1)).toEqual([["=SUM('New source'!A1#)"]]);
    expect(book.sheetInputs(0)).toEqual([["=SEQUENCE(4)"], [], [], []]);
    expect(() => book.renameSheet(1, "new SOURCE")).toThrow(/cannot be renamed/);
    expect(book.addSheet("Third")).toBe(2);
    expect(() => book.addSheet("third")).toThrow(/cannot be added/);
    book.destroy();
  });
});
