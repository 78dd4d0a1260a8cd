/**
 * `spanwise report`: a small workbook made with exceljs (two equal spans, dead and live uniform
 * load, a Title sheet) is reported; the PDF's text must hold the member mark, every reaction by
 * case and factored, every per-span peak with its x, the caution and the version.
 *
 * Expected values are closed forms, not the program's output: two equal continuous spans under
 * uniform load w behave as two propped cantilevers: R = 3wL/8, 10wL/8, 3wL/8; M = 9wL²/128 at
 * 3L/8 from each end, M = -wL²/8 over the middle support; largest shear 5wL/8 at the middle
 * support; deflection w x (L³ - 3Lx² + 2x³)/(48 EI), largest at x = L(1 + √33)/16 (steel
 * construction manual, beam diagrams and formulas, cases 12 and 29, from memory).
 */
import ExcelJS from "exceljs";
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import { main } from "../../src/cli/main";
import { short } from "../../src/report/describe";
import { CAUTION } from "../../src/report/meta";
import { pdfPages, pdfTextLines } from "../report/pdfText";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const VERSION = (require("../../package.json") as { version: string }).version;

const [L, wD, wL, EI] = [5, 2, 3, 20000];
const w = 1.2 * wD + 1.6 * wL;

function sink() {
  const out: string[] = [];
  const err: string[] = [];
  return { io: { stdout: { write: (t: string) => out.push(t) }, stderr: { write: (t: string) => err.push(t) } }, out, err };
}

/** True when `run` appears as consecutive text lines of the PDF (one table row, cell by cell). */
function hasRun(lines: string[], run: string[]): boolean {
  for (let i = 0; i + run.length <= lines.length; i++) if (run.every((t, k) => lines[i + k] === t)) return true;
  return false;
}

let dir: string;
let book: string;

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-report-"));
  book = path.join(dir, "book.xlsx");
  const wb = new ExcelJS.Workbook();
  const title = wb.addWorksheet("Title");
  for (const row of [["Project", "Test hall"], ["Job no.", "J-042"], ["Member mark", "B-7"], ["By", "AE"], ["Checked", "CK"], ["Date", "2026-11-30"], ["Revision", "B"]]) title.addRow(row);
  const s = wb.addWorksheet("Beam");
  s.getCell("A1").value = "Spans";
  s.getCell("B1").value = L;
  s.getCell("C1").value = L;
  s.getCell("A2").value = "Supports";
  ["B2", "C2", "D2"].forEach((a) => (s.getCell(a).value = "pin"));
  s.getCell("A3").value = "EI";
  s.getCell("B3").value = EI;
  s.getCell("A4").value = "Combination";
  s.getCell("B4").value = "1.2D+1.6L";
  const loads = [["udl", wD, null, null, null, "D"], ["udl", wL, null, null, null, "L"]];
  loads.forEach((row, i) => row.forEach((v, c) => (s.getCell(6 + i, 1 + c).value = v)));
  s.getCell("A10").value = { formula: "SPAN.REACTIONS(B1:C1,A6:F7,B2:D2,B3,B4)" } as ExcelJS.CellFormulaValue;
  s.getCell("A15").value = "not a formula";
  s.getCell("A20").value = { formula: "SPAN.MOMENT(B1:C1,A6:F7,2.5,B2:D2,B3,B4)" } as ExcelJS.CellFormulaValue;
  await wb.xlsx.writeFile(book);
});
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe("spanwise report --cell", () => {
  let lines: string[] = [];
  let text = "";

  beforeAll(async () => {
    const s = sink();
    const out = path.join(dir, "member.pdf");
    const code = await main(["report", book, "--cell", "Beam!A10", "--out", out], s.io);
    expect(s.err.join("")).toBe("");
    expect(code).toBe(0);
    lines = pdfTextLines(fs.readFileSync(out));
    text = lines.join("\n");
  });

  it("prints the title block, the caution and the version", () => {
    expect(text).toContain("Member calculation: B-7");
    for (const v of ["Test hall", "J-042", "AE", "CK", "2026-11-30"]) expect(lines).toContain(v);
    expect(text).toContain(CAUTION);
    expect(text).toContain(`Spanwise ${VERSION}`);
  });

  it("prints every reaction by case and factored (closed forms)", () => {
    const r = (q: number) => [(3 * q * L) / 8, (10 * q * L) / 8, (3 * q * L) / 8];
    const [d, l, f] = [r(wD), r(wL), r(w)];
    [0, 1, 2].forEach((i) => expect(hasRun(lines, [`${i + 1} (pin)`, short(i * L), short(d[i]), short(l[i]), short(f[i])])).toBe(true));
    expect(text).toContain("1.2D+1.6L");
  });

  it("prints every per-span peak with its x (closed forms)", () => {
    const x = (L * (1 + Math.sqrt(33))) / 16;
    const defl = (w * x * (L ** 3 - 3 * L * x * x + 2 * x ** 3)) / (48 * EI);
    const m = (9 * w * L * L) / 128;
    const support = (-w * L * L) / 8;
    const v = (5 * w * L) / 8;
    expect(hasRun(lines, ["1", short(m), short((3 * L) / 8), short(support), short(L), short(-v), short(L), short(defl), short(x)])).toBe(true);
    expect(hasRun(lines, ["2", short(m), short(2 * L - (3 * L) / 8), short(support), short(L), short(v), short(L), short(defl), short(2 * L - x)])).toBe(true);
    expect(text).toContain(`min ${short(support)} at x = ${short(L)}`);
    expect(text).toContain(`max ${short(m)} at x = ${short((3 * L) / 8)}`);
  });

  it("writes A4 by default, letter on request, and print-ready HTML", async () => {
    expect(pdfPages(fs.readFileSync(path.join(dir, "member.pdf"))).mediaBox.map(Math.round)).toEqual([0, 0, 595, 842]);
    const letter = path.join(dir, "letter.pdf");
    expect(await main(["report", book, "--cell", "Beam!A10", "--out", letter, "--paper", "letter"], sink().io)).toBe(0);
    expect(pdfPages(fs.readFileSync(letter)).mediaBox).toEqual([0, 0, 612, 792]);
    const html = path.join(dir, "member.html");
    expect(await main(["report", book, "--cell", "Beam!A10", "--out", html], sink().io)).toBe(0);
    const page = fs.readFileSync(html, "utf8");
    expect(page).toContain("B-7");
    expect(page).toContain("<svg");
    expect(page).toMatch(/@page \{ size: A4;/);
  });
});

describe("spanwise report --range and refusals", () => {
  it("writes one report per member cell of a range, each marked with its cell", async () => {
    const out = path.join(dir, "range.pdf");
    const s = sink();
    expect(await main(["report", book, "--range", "Beam!A1:A25", "--out", out], s.io)).toBe(0);
    expect(s.out.join("")).toContain("2 member reports");
    const text = pdfTextLines(fs.readFileSync(out)).join("\n");
    expect(text).toContain("Member calculation: B-7 Beam!A10");
    expect(text).toContain("Member calculation: B-7 Beam!A20");
  });

  it("refuses a cell without a SPAN formula, a missing sheet, a missing workbook and an existing output", async () => {
    const a = sink();
    expect(await main(["report", book, "--cell", "Beam!A15", "--out", path.join(dir, "none.pdf")], a.io)).toBe(1);
    expect(a.err.join("")).toMatch(/Beam!A15: .+/);
    expect(fs.existsSync(path.join(dir, "none.pdf"))).toBe(false);
    const b = sink();
    expect(await main(["report", book, "--cell", "Nope!A1", "--out", path.join(dir, "n.pdf")], b.io)).toBe(1);
    expect(b.err.join("")).toContain('no sheet named "Nope"');
    expect(await main(["report", path.join(dir, "missing.xlsx"), "--cell", "Beam!A10", "--out", path.join(dir, "m.pdf")], sink().io)).toBe(1);
    const c = sink();
    expect(await main(["report", book, "--cell", "Beam!A10", "--out", path.join(dir, "member.pdf")], c.io)).toBe(1);
    expect(c.err.join("")).toContain("exists already");
    expect(await main(["report", book, "--out", path.join(dir, "x.pdf")], sink().io)).toBe(2);
    expect(await main(["report", book, "--cell", "A10", "--out", path.join(dir, "x.pdf")], sink().io)).toBe(2);
  });
});

describe("spanwise report on the demo workbook", () => {
  it("reports the Member sheet's beam with the factored reactions the workbook's own SPAN.REACTIONS computes", async () => {
    const demo = path.join(dir, "demo.xlsx");
    expect(await main(["demo", "--out", demo], sink().io)).toBe(0);
    const out = path.join(dir, "demo.pdf");
    const s = sink();
    expect(await main(["report", demo, "--cell", "Member!A17", "--out", out], s.io)).toBe(0);
    const lines = pdfTextLines(fs.readFileSync(out));
    expect(lines.join("\n")).toContain("Member calculation: Member!A17");
    expect(lines.join("\n")).toContain(CAUTION);
    // The workbook's REACTIONS spill (x, vertical, moment per support), computed by the engine.
    const { readBook, evaluateBook } = await import("../../src/cli/xlsxBook");
    const book = evaluateBook(await readBook(fs.readFileSync(demo)));
    try {
      const sheet = book.sheetId("Member");
      const forces = [16, 17, 18].map((row) => book.getValue(sheet, row, 1));
      expect(forces.every((f) => typeof f === "number" && f > 0)).toBe(true);
      forces.forEach((f, i) => {
        const row = lines.indexOf(`${i + 1} (pin)`);
        expect(row).toBeGreaterThanOrEqual(0);
        expect(lines.slice(row, row + 6)).toContain(short(f as number));
      });
    } finally {
      book.destroy();
    }
  });
});
