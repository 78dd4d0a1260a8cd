/**
 * Saving the workbench's book as .xlsx (src/workbench/files/saveXlsx.ts), in Node on the same
 * modules the page bundles: unchanged, it is part for part what `spanwise calc` writes (its
 * reader and writer called in process); changed, the saved file reopened (by the CLI's reader)
 * evaluates to the values the workbench showed, and every part the edits do not concern is
 * kept. File-format sources: see tests/workbench/support/smallBook.ts.
 */
import fs from "fs";
import path from "path";
import { reactions } from "../../functions/functions";
import type { CellResult, SpanWorkbook } from "../../src/engine";
import { WorkbenchDocument } from "../../src/workbench/files/document";
import { SaveError, saveXlsx } from "../../src/workbench/files/saveXlsx";
import { direct } from "../engine/support/direct";
import { evaluateBook, readBook } from "../../src/cli/xlsxBook";
import { LOADS, SPANS, calcOutput, partsOf, smallBook } from "./support/smallBook";

const DEMO = path.resolve(__dirname, "..", "..", "assets", "spanwise-demo.xlsx");

/** Every value of every sheet. */
function values(book: SpanWorkbook): Record<string, CellResult[][]> {
  return Object.fromEntries(book.sheetNames().map((name, id) => [name, book.getSheetValues(id)]));
}

async function reopened(bytes: Uint8Array): Promise<SpanWorkbook> {
  return evaluateBook(await readBook(bytes));
}

describe("saving the workbench's book", () => {
  it.each([
    ["the demo workbook", () => new Uint8Array(fs.readFileSync(DEMO))],
    ["a small workbook with shared, legacy and dynamic arrays", () => smallBook()],
  ])("writes %s unchanged exactly as spanwise calc does, part for part", async (_name, make) => {
    const bytes = await make();
    const doc = await WorkbenchDocument.fromFile("book.xlsx", bytes);
    expect(doc.allChanges()).toEqual([]);
    const saved = await partsOf(await saveXlsx(doc));
    expect(saved).toEqual(await partsOf(await calcOutput(bytes)));
    doc.destroy();
  });

  it("stores changed values and formulas, keeps styles and untouched cells, and reopens to the same values", async () => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook());
    const beam = doc.book.sheetId("Beam");
    doc.book.setCell(beam, 0, 2, 4); // C1, styled: a new factor
    doc.book.setCell(beam, 0, 0, "5 5"); // A1: new spans
    doc.book.setCell(beam, 11, 0, "=SUM(A8:A10)*Factor"); // A12: a new formula
    doc.book.setCell(beam, 11, 1, "'=not a formula"); // B12: text that looks like a formula
    doc.book.setCell(beam, 12, 0, true); // A13
    const saved = await saveXlsx(doc);
    const parts = await partsOf(saved);
    const sheet = parts["xl/worksheets/sheet1.xml"];
    expect(sheet).toContain('<c r="C1" s="1"><v>4</v></c>');
    expect(sheet).toContain('<c r="A1" t="inlineStr"><is><t>5 5</t></is></c>');
    expect(sheet).toMatch(/<c r="A12" cm="1"><f t="array" ref="A12">SUM\(A8:A10\)\*Factor<\/f><v>24<\/v><\/c>/);
    expect(sheet).toContain('<c r="B12" t="inlineStr"><is><t>=not a formula</t></is></c>');
    // The shared formula is untouched (its first cell did not change) and its values are new.
    expect(sheet).toContain('<c r="B9" s="1"><f t="shared" si="0"/><v>8</v></c>');
    const original = await partsOf(await smallBook());
    for (const part of ["xl/styles.xml", "xl/sharedStrings.xml", "xl/metadata.xml", "xl/workbook.xml", "[Content_Types].xml"]) expect(parts[part]).toBe(original[part]);

    const again = await reopened(saved);
    expect(values(again)).toEqual(values(doc.book));
    const expected = direct(() => reactions([["5 5"]], [[LOADS]]));
    const b = again.sheetId("Beam");
    expect(Array.from({ length: expected.length }, (_, r) => Array.from({ length: expected[0].length }, (_, c) => again.getValue(b, 2 + r, 1 + c)))).toEqual(expected);
    expect(again.getValue(again.sheetId("Other sheet"), 0, 0)).toBe(12);
    again.destroy();
    doc.destroy();
  });

  it("gives the other cells of a shared formula their own text when its first cell changes", async () => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook());
    const beam = doc.book.sheetId("Beam");
    doc.book.setCell(beam, 7, 1, "=A8+100");
    const saved = await saveXlsx(doc);
    const sheet = (await partsOf(saved))["xl/worksheets/sheet1.xml"];
    expect(sheet).toContain('<c r="B9" s="1"><f>A9*$C$1</f><v>4</v></c>');
    const again = await reopened(saved);
    expect(values(again)).toEqual(values(doc.book));
    again.destroy();
    doc.destroy();
  });

  it("shrinks a dynamic array typed into and refuses a change inside a legacy array", async () => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook());
    const beam = doc.book.sheetId("Beam");
    doc.book.setCell(beam, 4, 2, 99); // C5, inside the reactions' spill: #SPILL!
    const saved = await saveXlsx(doc);
    const again = await reopened(saved);
    expect(values(again)).toEqual(values(doc.book));
    expect(isSpillError(again.getValue(again.sheetId("Beam"), 2, 1))).toBe(true);
    again.destroy();

    doc.book.setCell(beam, 4, 2, null);
    doc.book.setCell(beam, 8, 3, 5); // D9, inside {=A8:A9*10}
    await expect(saveXlsx(doc)).rejects.toThrow(SaveError);
    await expect(saveXlsx(doc)).rejects.toThrow(/Beam!D9 was changed inside the fixed-size \(legacy\) array formula of Beam!D8:D9/);
    doc.destroy();
  });

  it("refuses a cell beyond the host's limits (32,767 characters of text, 8,192 of formula) with its address", async () => {
    const doc = WorkbenchDocument.fromSheets("new.xlsx", [{ name: "Sheet1", cells: [["x".repeat(32_767)]] }]);
    await expect(saveXlsx(doc)).resolves.toBeInstanceOf(Uint8Array);
    doc.book.setCell(0, 1, 0, "x".repeat(32_768));
    await expect(saveXlsx(doc)).rejects.toThrow("Sheet1!A2: its text is 32768 characters; a cell of the spreadsheet host holds at most 32767");
    doc.book.setCell(0, 1, 0, null);
    doc.book.setCell(0, 2, 0, `=LEN("${"y".repeat(8_190)}")`);
    await expect(saveXlsx(doc)).rejects.toThrow(/Sheet1!A3: its formula is 8198 characters as saved; the spreadsheet host takes at most 8192/);
    doc.destroy();
  });

  it("renames sheets in the workbook, its defined names and the formulas that name them; adds sheets with new formulas", async () => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook({ metadata: false }));
    doc.renameSheet("Beam", "Level 2 beam");
    const added = doc.addSheet("Added");
    doc.book.setCells(added, 0, 0, [[SPANS, LOADS], ["='Level 2 beam'!C1*10", "=SPAN.REACTIONS(A1,B1)"]]);
    const saved = await saveXlsx(doc);
    const parts = await partsOf(saved);
    expect(parts["xl/workbook.xml"]).toContain('<sheet name="Level 2 beam" sheetId="1" r:id="rId1"/>');
    expect(parts["xl/workbook.xml"]).toContain("<definedName name=\"Factor\">'Level 2 beam'!$C$1</definedName>");
    expect(parts["xl/worksheets/sheet2.xml"]).toContain("<c r=\"A1\"><f>'Level 2 beam'!C1*3</f><v>6</v></c>");
    // The legacy array naming the renamed sheet keeps its fixed range.
    expect(parts["xl/worksheets/sheet2.xml"]).toContain("<c r=\"C1\"><f t=\"array\" ref=\"C1:C2\">'Level 2 beam'!A8:A9*2</f><v>2</v></c>");
    expect(parts["xl/worksheets/sheet2.xml"]).toContain('<c r="C2"><v>4</v></c>');
    expect(parts["xl/metadata.xml"]).toContain('fDynamic="1"');
    expect(parts["[Content_Types].xml"]).toContain('PartName="/xl/worksheets/sheet3.xml"');
    expect(parts["xl/worksheets/sheet3.xml"]).toContain("_xldudf_SPAN_REACTIONS(A1,B1)");
    const again = await reopened(saved);
    expect(again.sheetNames()).toEqual(["Level 2 beam", "Other sheet", "Added"]);
    expect(values(again)).toEqual(values(doc.book));
    const a = again.sheetId("Added");
    const expected = direct(() => reactions([[SPANS]], [[LOADS]]));
    expect(expected.length).toBeGreaterThan(1);
    expect(Array.from({ length: expected.length }, (_, r) => Array.from({ length: expected[0].length }, (_, c) => again.getValue(a, 1 + r, 1 + c)))).toEqual(expected);
    again.destroy();
    doc.destroy();
  });

  it("writes a book of plain sheets (the demo, a new book) into a fresh package that reopens to the same values", async () => {
    const doc = WorkbenchDocument.fromSheets("new.xlsx", [{ name: "Sheet1", cells: [[SPANS, LOADS], [null, "=SPAN.REACTIONS(A1,B1)"], ["text", true]] }]);
    doc.addSheet("Second");
    doc.book.setCells(doc.book.sheetId("Second"), 0, 0, [["=SUM(Sheet1!B2#)"]]);
    const saved = await saveXlsx(doc);
    const parts = await partsOf(saved);
    expect(parts["xl/worksheets/sheet2.xml"]).toContain("_xlfn.ANCHORARRAY(Sheet1!B2)");
    const again = await reopened(saved);
    expect(again.sheetNames()).toEqual(["Sheet1", "Second"]);
    expect(values(again)).toEqual(values(doc.book));
    again.destroy();
    doc.destroy();
  });
});

function isSpillError(value: CellResult): boolean {
  return typeof value === "object" && value !== null && (value as { error: string }).error === "#SPILL!";
}
