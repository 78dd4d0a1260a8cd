/**
 * The checks and the section in a member report: on the demo workbook's Checks sheet (beam
 * B-213, a steel I section), the report of the SPAN.STRESS cell lists that stress check, the
 * shear stress, the live-load deflection check (another combination and another units
 * argument, the same member), the utilisation of the two SPAN.MAXMOMENT cells, and the
 * SPAN.SECTION properties; every number is the one the workbook itself computes in those
 * cells (the engine's values), and the rendered PDF carries them. A member with no checks
 * says so; a check that errors is shown as erring.
 */
import { DEMO_SHEETS } from "../../assets/demo/floorFraming";
import { SpanWorkbook, isCellError, type SheetInput } from "../../src/engine";
import { BookHost } from "../../src/cli/bookHost";
import { blockText } from "../../src/pane/addresses";
import type { FormulaCell } from "../../src/pane/host";
import { findMember } from "../../src/pane/memberFromSheet";
import { memberReport } from "../../src/pane/report";
import { checksFor, sameMember } from "../../src/pane/reportChecks";
import { short } from "../../src/report/describe";
import { renderPdf } from "../../src/report/pdf";
import { EMPTY_TITLE } from "../../src/report/titleBlock";
import { pdfTextLines } from "./pdfText";

const INFO = { version: "9.9.9", commit: "abc", platform: "test", date: "2026-12-02T00:00:00Z" };

function formulaCells(sheets: readonly SheetInput[]): FormulaCell[] {
  const out: FormulaCell[] = [];
  for (const sheet of sheets)
    sheet.cells.forEach((row, r) =>
      (row ?? []).forEach((input, c) => {
        if (typeof input === "string" && input.startsWith("=") && /SPAN/i.test(input)) out.push({ sheet: sheet.name, cell: blockText({ from: { row: r, col: c }, to: { row: r, col: c } }), formula: input });
      }),
    );
  return out;
}

function text(v: unknown): string {
  return typeof v === "number" ? short(v, 6) : v === null ? "" : String(v);
}

async function resolved(host: BookHost, sheet: string, cell: string) {
  host.select(sheet, cell);
  const found = await findMember(host, await host.getSelection());
  if (!found.ok) throw new Error(found.message);
  return found.member;
}

describe("checks of a member in its report", () => {
  let book: SpanWorkbook;
  let host: BookHost;
  const cells = formulaCells(DEMO_SHEETS);

  beforeAll(() => {
    book = new SpanWorkbook(DEMO_SHEETS);
    host = new BookHost(book);
  });
  afterAll(() => book.destroy());

  /** The engine's values of a block, as the report prints them. */
  const engine = (sheet: string, row: number, col: number, rows: number, cols: number): string[][] =>
    Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => text(book.getValue(book.sheetId(sheet), row + r, col + c))));

  it("finds the stress, shear stress, deflection and utilisation checks of beam B-213 with the values its cells compute", async () => {
    const member = await resolved(host, "Checks", "E9");
    const found = await checksFor(host, member, cells);
    expect(found.problems).toEqual([]);
    expect(found.checks.map((c) => `${c.fn} ${c.cell}`)).toEqual(["SPAN.STRESS Checks!E9", "SPAN.SHEARSTRESS Checks!E13", "SPAN.DEFLECTIONCHECK Checks!E17", "SPAN.UTILISATION Checks!F21"]);
    const [stress, shear, deflection, utilisation] = found.checks;
    // E9 spills the stress rows (no header row in the cell): the report adds the header.
    expect(stress.rows).toEqual(engine("Checks", 8, 4, 2, 5));
    expect(stress.columns[1]).toMatch(/max stress.*MPa/);
    expect(shear.rows).toEqual(engine("Checks", 12, 4, 2, 3));
    expect(deflection.rows).toEqual(engine("Checks", 16, 4, 1, 7));
    expect(deflection.failing).toEqual([engine("Checks", 16, 10, 1, 1)[0][0] === "fail"]);
    const ratios = engine("Checks", 20, 5, 2, 1).map((r) => r[0]);
    expect(utilisation.rows).toEqual([
      ["F19", text(book.getValue(book.sheetId("Checks"), 18, 5)), "180", ratios[0]],
      ["F20", text(book.getValue(book.sheetId("Checks"), 19, 5)), "180", ratios[1]],
    ]);
    expect(ratios.every((r) => Number(r) > 0 && Number(r) < 1)).toBe(true);
    expect(found.section?.cell).toBe("Checks!A9");
    expect(found.section?.formula).toBe('=SPAN.SECTION(B5,D5,"mm")');
    expect(found.section?.rows).toEqual(engine("Checks", 8, 0, 16, 3));
  });

  it("prints the section and every check in the PDF", async () => {
    const member = await resolved(host, "Checks", "E9");
    const doc = memberReport({ member, formula: book.getFormula(book.sheetId("Checks"), 8, 4) ?? "", title: EMPTY_TITLE, checks: await checksFor(host, member, cells) }, INFO);
    if ("error" in doc) throw new Error(doc.error);
    const lines = pdfTextLines(await renderPdf(doc));
    for (const heading of ["Section", "Checks", "SPAN.STRESS at Checks!E9", "SPAN.DEFLECTIONCHECK at Checks!E17", "SPAN.UTILISATION at Checks!F21"]) expect(lines).toContain(heading);
    for (const value of [...engine("Checks", 8, 4, 2, 5).flat(), ...engine("Checks", 16, 4, 1, 7).flat(), ...engine("Checks", 20, 5, 2, 1).flat(), ...engine("Checks", 8, 1, 16, 1).flat()]) {
      if (value !== "") expect(lines).toContain(value);
    }
  });

  it("a member with no check cells says so, and other members' checks are not its own", async () => {
    const member = await resolved(host, "Member", "A17");
    const found = await checksFor(host, member, cells);
    expect(found.checks).toEqual([]);
    expect(found.section).toBeUndefined();
    const doc = memberReport({ member, formula: "", title: EMPTY_TITLE, checks: found }, INFO);
    if ("error" in doc) throw new Error(doc.error);
    expect(JSON.stringify(doc.blocks)).toContain("computes no stress, deflection-limit or utilisation check for this member");
  });

  it("one member in two units arguments is one member; another EI or another load is not", async () => {
    const stress = await resolved(host, "Checks", "E9");
    const deflection = await resolved(host, "Checks", "E17");
    expect(sameMember(stress, deflection)).toBe(true);
    expect(sameMember(stress, { ...stress, args: { ...stress.args, EI: [[1]] } })).toBe(false);
    expect(sameMember(stress, { ...stress, args: { ...stress.args, loads: "udl 7 D" } })).toBe(false);
    expect(sameMember(stress, { ...stress, args: { ...stress.args, units: "length=ft, force=kip" } })).toBe(false);
  });

  it("a check whose cell errors is reported as erring, with the sheet layer's message", async () => {
    const bad = DEMO_SHEETS.map((s) => (s.name !== "Checks" ? s : { ...s, cells: s.cells.map((row, r) => (r === 16 ? [null, null, null, null, '=SPAN.DEFLECTIONCHECK(B3,B4,"L/0",E3,B6,"L")'] : row)) }));
    const other = new SpanWorkbook(bad);
    try {
      const h = new BookHost(other);
      expect(isCellError(other.getValue(other.sheetId("Checks"), 16, 4))).toBe(true);
      const member = await resolved(h, "Checks", "E9");
      const found = await checksFor(h, member, formulaCells(bad));
      const check = found.checks.find((c) => c.fn === "SPAN.DEFLECTIONCHECK");
      expect(check?.error).toMatch(/^#(VALUE!|N\/A) .*limit/i);
      expect(check?.rows).toEqual([]);
    } finally {
      other.destroy();
    }
  });
});
