/**
 * `spanwise calc` on spilled-range references (Microsoft support, "Spilled range operator":
 * `A2#` is the whole range A2's formula spills into; Microsoft Learn, "Handle dynamic arrays
 * and spilling using the Excel JavaScript API": a formula that returns a range spills):
 * - a dynamic array `=B2#` alone (saved `_xlfn.ANCHORARRAY(B2)`) spills the table it refers to,
 *   and the output stores it as a dynamic array over the spilled range;
 * - a range that is exactly a blocked anchor (`=B2:B2`, `=B2#`) is #SPILL! with its message,
 *   never a crash of the calculator.
 */
import { spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import JSZip from "jszip";
import { reactions } from "../../functions/functions";
import { direct } from "../engine/support/direct";
import { EXIT } from "../../src/cli/calc";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");
const NS = 'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
const HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n';
const SPANS = "6 8 6";
const LOADS = "udl 2.5 D; point 10 at 3 L";

function run(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: "utf8" });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** One sheet "Beam": A1 spans, B1 loads, B2 REACTIONS and `rest` (more cells of rows 2..), dynamic arrays marked by cm="1" (MS-XLSX dynamicArrayProperties). */
async function book(rows: string): Promise<Buffer> {
  const zip = new JSZip();
  zip.file(
    "[Content_Types].xml",
    `${HEAD}<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/><Override PartName="/xl/sharedStrings.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml"/><Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/></Types>`,
  );
  zip.file("_rels/.rels", `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>`);
  zip.file("xl/workbook.xml", `${HEAD}<workbook ${NS}><sheets><sheet name="Beam" sheetId="1" r:id="rId1"/></sheets><calcPr calcId="191029"/></workbook>`);
  zip.file(
    "xl/_rels/workbook.xml.rels",
    `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/><Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings" Target="sharedStrings.xml"/><Relationship Id="rId3" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata" Target="metadata.xml"/></Relationships>`,
  );
  zip.file("xl/sharedStrings.xml", `${HEAD}<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" count="2" uniqueCount="2"><si><t>${SPANS}</t></si><si><t>${LOADS}</t></si></sst>`);
  zip.file(
    "xl/metadata.xml",
    `${HEAD}<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray"><metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes><futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata><cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>`,
  );
  zip.file("xl/worksheets/sheet1.xml", `${HEAD}<worksheet ${NS}><sheetData><row r="1"><c r="A1" t="s"><v>0</v></c><c r="B1" t="s"><v>1</v></c></row>${rows}</sheetData></worksheet>`);
  return zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" });
}

const REACTIONS = '<c r="B2" cm="1"><f t="array" ref="B2:D5">_xldudf_SPAN_REACTIONS(A1,B1)</f><v>0</v></c>';

describe("spanwise calc and spilled-range references", () => {
  let dir: string;
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-spillref-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("spills =B2# (saved _xlfn.ANCHORARRAY(B2)) as the REACTIONS table, and stores it as a dynamic array over it", async () => {
    const expected = direct(() => reactions([[SPANS]], [[LOADS]])) as number[][];
    expect(expected).toHaveLength(4);
    const input = path.join(dir, "anchor.xlsx");
    // F2's ref is stale (one cell): the output gets the spilled range.
    fs.writeFileSync(input, await book(`<row r="2">${REACTIONS}<c r="F2" cm="1"><f t="array" ref="F2">_xlfn.ANCHORARRAY(B2)</f><v>0</v></c></row>`));
    const csv = run(["calc", input, "--csv", "Beam"]);
    expect(csv.stderr).not.toMatch(/with errors/);
    expect(csv.status).toBe(0);
    const lines = csv.stdout.split("\n").slice(1, 5).map((line) => line.split(","));
    const shown = expected.map((row) => row.map((value) => Number(Number(value).toPrecision(15))));
    expect(lines.map((line) => line.slice(1, 4).map(Number))).toEqual(shown);
    expect(lines.map((line) => line.slice(5, 8).map(Number))).toEqual(shown);

    const out = path.join(dir, "anchor-out.xlsx");
    expect(run(["calc", input, "--out", out]).status).toBe(0);
    const xml = await (await JSZip.loadAsync(fs.readFileSync(out))).file("xl/worksheets/sheet1.xml")!.async("string");
    expect(xml).toContain('<f t="array" ref="F2:H5">_xlfn.ANCHORARRAY(B2)</f>');
    expect(/<c r="G3"[^>]*><v>([^<]*)<\/v>/.exec(xml)?.[1]).toBe(String(expected[1][1]));
  });

  it("evaluates a range that is exactly a blocked anchor (B2:B2, B2#) to #SPILL! with its message, not a crash", async () => {
    const input = path.join(dir, "blocked.xlsx");
    fs.writeFileSync(
      input,
      // C3 is a value of its own (outside B2's saved ref), in the way of the 4 x 3 spill.
      await book(`<row r="2">${REACTIONS.replace('ref="B2:D5"', 'ref="B2"')}<c r="F2"><f>B2:B2</f><v>0</v></c><c r="G2"><f>SUM(_xlfn.ANCHORARRAY(B2))</f><v>0</v></c><c r="H2" cm="1"><f t="array" ref="H2">_xlfn.ANCHORARRAY(B2)</f><v>0</v></c></row><row r="3"><c r="C3"><v>1</v></c></row>`),
    );
    const report = path.join(dir, "blocked-errors.csv");
    const result = run(["calc", input, "--out", path.join(dir, "blocked-out.xlsx"), "--report", report]);
    expect(result.stderr).not.toMatch(/Unknown array|Error:/);
    // Exit 1: cells with errors (EXIT.cellErrors in src/cli/calc.ts), not 5 (internal failure).
    expect(result.status).toBe(EXIT.cellErrors);
    const lines = fs.readFileSync(report, "utf8").trim().split("\n");
    expect(lines[0]).toBe("sheet,cell,error,message");
    expect(lines.slice(1).sort()).toEqual(["B2", "F2", "G2", "H2"].map((cell) => `Beam,${cell},#SPILL!,No space for array result.`));
  });
});
