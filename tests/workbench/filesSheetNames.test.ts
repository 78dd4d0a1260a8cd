/**
 * Sheet-name rules (src/workbench/files/sheetNames.ts). Sources: the spreadsheet host's own
 * refusal ("does not exceed 31 characters", none of : \ / ? * [ ], "You did not leave the name
 * blank", quoted in the Stack Overflow question "Is there a limit on an Excel worksheet's name
 * length?"); apostrophes at either end and uniqueness: DevExpress Office File API,
 * "Worksheet.Name" (third-party documentation); "History": third-party pages, not the host's
 * documentation.
 */
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
