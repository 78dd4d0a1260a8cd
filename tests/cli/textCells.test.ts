/**
 * A text cell of a saved workbook stays text in the engine, however it reads: a shared string
 * (`t="s"`), an inline string (`t="inlineStr"`) or a string (`t="str"`) is text (ECMA-376 Part 1
 * §18.18.11 ST_CellType), whatever its characters — "123", "1e3", "12%", "$12", "TRUE", "#N/A",
 * "'quoted". The host shows it as text and ISTEXT is TRUE for it (Microsoft support, "IS
 * functions": ISTEXT "Value refers to text"); a worksheet function is handed the text.
 * The formula engine would read such raw text as a number, a truth value or an error, and drops
 * a leading apostrophe, unless the text is given to it behind an apostrophe.
 */
import { spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import JSZip from "jszip";
import { evaluateBook, readBook } from "../../src/cli/xlsxBook";
import { SPAN_EXPORTS, SpanWorkbook } from "../../src/engine";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");
const NS = 'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
const HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n';

/** Texts that the engine would read as something else, each stored three ways in row 1..3. */
const TEXTS = ["123", "1e3", " 42 ", "12%", "$12", "-5", "TRUE", "false", "#N/A", "'quoted", "=1+1", "6 8 6"];
const SPANS = "6";
const LOADS = "udl 2";

function column(index: number): string {
  return String.fromCharCode(65 + index);
}

function escape(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
}

/**
 * Sheet "Text": row 1 the texts as shared strings, row 2 as inline strings, row 3 as t="str";
 * row 4 ISTEXT of row 1, row 5 ISTEXT of row 2, row 6 ISTEXT of row 3; A8 the spans "6" and B8
 * the loads as shared strings, C8 x "3" as a shared string, D8 =SPAN.MOMENT(A8,B8,C8).
 */
async function textBook(): Promise<Buffer> {
  const zip = new JSZip();
  zip.file(
    "[Content_Types].xml",
    `${HEAD}<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/><Override PartName="/xl/sharedStrings.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml"/></Types>`,
  );
  zip.file("_rels/.rels", `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>`);
  zip.file("xl/workbook.xml", `${HEAD}<workbook ${NS}><sheets><sheet name="Text" sheetId="1" r:id="rId1"/></sheets><calcPr calcId="191029"/></workbook>`);
  zip.file(
    "xl/_rels/workbook.xml.rels",
    `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/><Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings" Target="sharedStrings.xml"/></Relationships>`,
  );
  const shared = [...TEXTS, SPANS, LOADS, "3"];
  const t = (text: string) => `<t${/^\s|\s$/.test(text) ? ' xml:space="preserve"' : ""}>${escape(text)}</t>`;
  zip.file("xl/sharedStrings.xml", `${HEAD}<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" count="${shared.length}" uniqueCount="${shared.length}">${shared.map((s) => `<si>${t(s)}</si>`).join("")}</sst>`);
  const row = (r: number, cells: string[]) => `<row r="${r}">${cells.join("")}</row>`;
  const rows = [
    row(1, TEXTS.map((_, i) => `<c r="${column(i)}1" t="s"><v>${i}</v></c>`)),
    row(2, TEXTS.map((text, i) => `<c r="${column(i)}2" t="inlineStr"><is>${t(text)}</is></c>`)),
    row(3, TEXTS.map((text, i) => `<c r="${column(i)}3" t="str"><v xml:space="preserve">${escape(text)}</v></c>`)),
    ...[1, 2, 3].map((source) => row(source + 3, TEXTS.map((_, i) => `<c r="${column(i)}${source + 3}" t="b"><f>ISTEXT(${column(i)}${source})</f><v>0</v></c>`))),
    row(8, [
      `<c r="A8" t="s"><v>${TEXTS.length}</v></c>`,
      `<c r="B8" t="s"><v>${TEXTS.length + 1}</v></c>`,
      `<c r="C8" t="s"><v>${TEXTS.length + 2}</v></c>`,
      '<c r="D8"><f>_xldudf_SPAN_MOMENT(A8,B8,C8)</f><v>0</v></c>',
    ]),
  ];
  zip.file("xl/worksheets/sheet1.xml", `${HEAD}<worksheet ${NS}><sheetData>${rows.join("")}</sheetData></worksheet>`);
  return zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
}

describe("text cells of a saved workbook stay text", () => {
  it.each([
    [1, "shared strings"],
    [2, "inline strings"],
    [3, 't="str" strings'],
  ])("row %i (%s): the engine holds each text as it is written, and ISTEXT is TRUE", async (sourceRow) => {
    const wb = evaluateBook(await readBook(await textBook()));
    TEXTS.forEach((text, col) => {
      expect([text, wb.getValue(0, sourceRow - 1, col)]).toEqual([text, text]);
      expect([text, wb.getValue(0, sourceRow + 2, col)]).toEqual([text, true]);
    });
  });

  it("hands a SPAN function the text, as the host hands it", async () => {
    const book = await readBook(await textBook());
    const seen: unknown[][] = [];
    const functions = { ...SPAN_EXPORTS, moment: (...args: unknown[]) => (seen.push(args), SPAN_EXPORTS.moment(...(args as Parameters<typeof SPAN_EXPORTS.moment>))) };
    new SpanWorkbook(book.inputs, { functions, names: book.names });
    expect(seen).toHaveLength(1);
    expect(seen[0].slice(0, 3)).toEqual([[[SPANS]], [[LOADS]], [["3"]]]);
  });

  it("spanwise calc prints the texts as text", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-text-"));
    try {
      const input = path.join(dir, "text.xlsx");
      fs.writeFileSync(input, await textBook());
      const result = spawnSync(process.execPath, [BIN, "calc", input, "--csv", "Text"], { cwd: ROOT, encoding: "utf8" });
      expect(result.status).toBe(0);
      const lines = result.stdout.split("\n");
      // CSV quoting and the formula guard as src/cli/csv.ts writes text.
      const expected = "123,1e3, 42 ,12%,$12,\"'-5\",TRUE,false,#N/A,'quoted,\"'=1+1\",6 8 6";
      expect(lines.slice(0, 3)).toEqual([expected, expected, expected]);
      expect(lines.slice(3, 6)).toEqual(Array(3).fill(Array(TEXTS.length).fill("TRUE").join(",")));
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
