/**
 * `spanwise calc` on a workbook stored as the spreadsheet host stores dynamic arrays: every
 * part comes out byte for byte as it went in, except the worksheet, which differs from the
 * input only in the cached values (and the grown spill's ref) — checked against the whole
 * expected worksheet text, built from direct calls of the worksheet functions.
 *
 * How the host stores these (the file-format documents the test follows):
 * - ECMA-376 Part 1 §18.3.1.4 (c), §18.3.1.40 (f: t="array", ref), §18.3.1.96 (v);
 * - `cm` is a 1-based index into the metadata part's cellMetadata (MS-OI29500 2.1.589 a:
 *   "Office specifies that @cm is a one-based index into the cellMetadata collection");
 * - the dynamic-array flag: MS-XLSX, schema http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray,
 *   CT_DynamicArrayProperties @fDynamic (learn.microsoft.com/openspecs/office_standards/ms-xlsx/878c8ac4-8548-4bfb-9ad4-b1378e0efed1);
 * - `_xldudf_` for JavaScript custom functions (OfficeDev/Excel-Custom-Functions#108), `_xlfn.`
 *   for newer built-ins, `_xlfn.ANCHORARRAY` for A1#, `_xlfn.SINGLE` for @
 *   (Microsoft support, "Implicit intersection operator: @"); see ../shared/TOOLCHAIN.md.
 */
import { spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import JSZip from "jszip";
import { reactions } from "../../functions/functions";
import { direct } from "../engine/support/direct";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");

function run(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: "utf8" });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

const SPANS = "6 8 6";
const LOADS = "udl 2.5 D; point 10 at 3 L";
const NS = 'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';

const PARTS: Record<string, string> = {
  "[Content_Types].xml":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/><Override PartName="/xl/styles.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.styles+xml"/><Override PartName="/xl/sharedStrings.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml"/><Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/><Override PartName="/xl/drawings/drawing1.xml" ContentType="application/vnd.openxmlformats-officedocument.drawing+xml"/><Override PartName="/xl/charts/chart1.xml" ContentType="application/vnd.openxmlformats-officedocument.drawingml.chart+xml"/><Override PartName="/customXml/item1.xml" ContentType="application/xml"/></Types>',
  "_rels/.rels":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>',
  "xl/workbook.xml": `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<workbook ${NS}><sheets><sheet name="Beam" sheetId="1" r:id="rId1"/></sheets><definedNames><definedName name="Factor">Beam!$C$1</definedName></definedNames><calcPr calcId="191029"/></workbook>`,
  "xl/_rels/workbook.xml.rels":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/><Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/styles" Target="styles.xml"/><Relationship Id="rId3" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings" Target="sharedStrings.xml"/><Relationship Id="rId4" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata" Target="metadata.xml"/></Relationships>',
  "xl/styles.xml": `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<styleSheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><numFmts count="1"><numFmt numFmtId="164" formatCode="0.000"/></numFmts><fonts count="2"><font><sz val="11"/><name val="Calibri"/></font><font><b/><sz val="11"/><name val="Calibri"/></font></fonts><fills count="1"><fill><patternFill patternType="none"/></fill></fills><borders count="1"><border/></borders><cellStyleXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0"/></cellStyleXfs><cellXfs count="2"><xf numFmtId="0" fontId="0" fillId="0" borderId="0" xfId="0"/><xf numFmtId="164" fontId="1" fillId="0" borderId="0" xfId="0" applyNumberFormat="1" applyFont="1"/></cellXfs></styleSheet>`,
  "xl/sharedStrings.xml": `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" count="2" uniqueCount="2"><si><t>${SPANS}</t></si><si><r><t>udl 2.5 D; </t></r><r><rPr><b/></rPr><t>point 10 at 3 L</t></r></si></sst>`,
  // One cellMetadata block -> metadata type 1 (XLDAPR) -> futureMetadata XLDAPR block 0 with fDynamic="1".
  "xl/metadata.xml":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray"><metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes><futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata><cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>',
  "xl/worksheets/_rels/sheet1.xml.rels":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/drawing" Target="../drawings/drawing1.xml"/></Relationships>',
  "xl/drawings/drawing1.xml":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<xdr:wsDr xmlns:xdr="http://schemas.openxmlformats.org/drawingml/2006/spreadsheetDrawing" xmlns:a="http://schemas.openxmlformats.org/drawingml/2006/main"><xdr:twoCellAnchor><xdr:from><xdr:col>5</xdr:col><xdr:colOff>0</xdr:colOff><xdr:row>8</xdr:row><xdr:rowOff>0</xdr:rowOff></xdr:from><xdr:to><xdr:col>12</xdr:col><xdr:colOff>0</xdr:colOff><xdr:row>20</xdr:row><xdr:rowOff>0</xdr:rowOff></xdr:to><xdr:graphicFrame macro=""><xdr:nvGraphicFramePr><xdr:cNvPr id="2" name="Reactions"/><xdr:cNvGraphicFramePr/></xdr:nvGraphicFramePr><xdr:xfrm><a:off x="0" y="0"/><a:ext cx="0" cy="0"/></xdr:xfrm><a:graphic><a:graphicData uri="http://schemas.openxmlformats.org/drawingml/2006/chart"><c:chart xmlns:c="http://schemas.openxmlformats.org/drawingml/2006/chart" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships" r:id="rId1"/></a:graphicData></a:graphic></xdr:graphicFrame><xdr:clientData/></xdr:twoCellAnchor></xdr:wsDr>',
  "xl/drawings/_rels/drawing1.xml.rels":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/chart" Target="../charts/chart1.xml"/></Relationships>',
  "xl/charts/chart1.xml":
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<c:chartSpace xmlns:c="http://schemas.openxmlformats.org/drawingml/2006/chart"><c:chart><c:plotArea><c:barChart><c:barDir val="col"/><c:ser><c:idx val="0"/><c:val><c:numRef><c:f>Beam!$B$3:$B$6</c:f></c:numRef></c:val></c:ser></c:barChart></c:plotArea></c:chart></c:chartSpace>',
  "customXml/item1.xml": '<?xml version="1.0"?><notes><note>a part no spreadsheet code knows</note></notes>',
};

type Cell = string;

function num(n: number): string {
  return String(n);
}

/** The worksheet, given each computed cell's text (`<c>` elements) — the rest fixed. */
function sheet(cells: Record<string, Cell>, reactionsRef: string, sequenceRef: string): string {
  const byRow = new Map<number, [number, string][]>();
  for (const [address, text] of Object.entries(cells)) {
    const [, letters, digits] = /^([A-Z]+)(\d+)$/.exec(address)!;
    const col = [...letters].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
    const list = byRow.get(Number(digits)) ?? [];
    list.push([col, text.replace("{REACTIONS_REF}", reactionsRef).replace("{SEQUENCE_REF}", sequenceRef)]);
    byRow.set(Number(digits), list);
  }
  const rows = [...byRow.keys()]
    .sort((a, b) => a - b)
    .map((r) => {
      const body = byRow.get(r)!.sort((a, b) => a[0] - b[0]).map(([, text]) => text).join("");
      return r === 7 ? `<row r="7">${body}</row>` : `<row r="${r}" spans="1:9" x14ac:dyDescent="0.25">${body}</row>`;
    })
    .join("");
  return (
    `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet ${NS} xmlns:x14ac="http://schemas.microsoft.com/office/spreadsheetml/2009/9/ac">` +
    '<dimension ref="A1:I6"/><cols><col min="1" max="1" width="18.7109375" customWidth="1"/></cols>' +
    `<sheetData>${rows}</sheetData>` +
    '<dataValidations count="1"><dataValidation type="decimal" operator="greaterThan" allowBlank="1" showErrorMessage="1" sqref="C1"><formula1>0</formula1></dataValidation></dataValidations>' +
    '<pageMargins left="0.7" right="0.7" top="0.75" bottom="0.75" header="0.3" footer="0.3"/><drawing r:id="rId1"/></worksheet>'
  );
}

const FIXED: Record<string, Cell> = {
  A1: '<c r="A1" t="s"><v>0</v></c>',
  B1: '<c r="B1" t="s"><v>1</v></c>',
  C1: '<c r="C1" s="1"><v>2</v></c>',
};

/** Cached values as a stale file holds them: REACTIONS spilled two rows, SEQUENCE two. */
function staleCells(): Record<string, Cell> {
  return {
    ...FIXED,
    A3: '<c r="A3" s="1" cm="1"><f t="array" ref="{REACTIONS_REF}">_xldudf_SPAN_REACTIONS(A1,B1)</f><v>99</v></c>',
    B3: '<c r="B3" s="1"><v>99</v></c>',
    C3: '<c r="C3"><v>99</v></c>',
    A4: '<c r="A4"><v>99</v></c>',
    B4: '<c r="B4" s="1"><v>99</v></c>',
    C4: '<c r="C4"><v>99</v></c>',
    E3: '<c r="E3" cm="1"><f t="array" ref="{SEQUENCE_REF}">_xlfn.SEQUENCE(3)</f><v>7</v></c>',
    E4: '<c r="E4"><v>7</v></c>',
    G3: '<c r="G3" s="1"><f>SUM(_xlfn.ANCHORARRAY(A3))</f><v>0</v></c>',
    H3: '<c r="H3" t="str"><f>_xlfn.SINGLE(E3:E5)*Factor</f><v>stale</v></c>',
    I3: '<c r="I3" t="e"><f>ROWS(_xlfn.ANCHORARRAY(E3))</f><v>#NAME?</v></c>',
    A7: '<c r="A7" t="inlineStr"><is><t>note kept</t></is></c>',
  };
}

function expectedCells(values: number[][]): Record<string, Cell> {
  const cells: Record<string, Cell> = { ...FIXED };
  const style = (address: string) => (["A3", "B3", "B4"].includes(address) ? ' s="1"' : "");
  values.forEach((row, r) =>
    row.forEach((value, c) => {
      const address = `${"ABC"[c]}${r + 3}`;
      cells[address] =
        r === 0 && c === 0
          ? `<c r="A3" s="1" cm="1"><f t="array" ref="{REACTIONS_REF}">_xldudf_SPAN_REACTIONS(A1,B1)</f><v>${num(value)}</v></c>`
          : `<c r="${address}"${style(address)}><v>${num(value)}</v></c>`;
    }),
  );
  cells.E3 = '<c r="E3" cm="1"><f t="array" ref="{SEQUENCE_REF}">_xlfn.SEQUENCE(3)</f><v>1</v></c>';
  cells.E4 = '<c r="E4"><v>2</v></c>';
  cells.E5 = '<c r="E5"><v>3</v></c>';
  const sum = values.flat().reduce((a, b) => a + b, 0);
  cells.G3 = `<c r="G3" s="1"><f>SUM(_xlfn.ANCHORARRAY(A3))</f><v>${num(sum)}</v></c>`;
  // Row 3 crosses E3:E5 at E3 = 1; Factor (Beam!$C$1) = 2.
  cells.H3 = '<c r="H3"><f>_xlfn.SINGLE(E3:E5)*Factor</f><v>2</v></c>';
  cells.I3 = '<c r="I3"><f>ROWS(_xlfn.ANCHORARRAY(E3))</f><v>3</v></c>';
  cells.A7 = '<c r="A7" t="inlineStr"><is><t>note kept</t></is></c>';
  return cells;
}

async function writePackage(file: string, sheetXml: string): Promise<void> {
  const zip = new JSZip();
  for (const [name, text] of Object.entries(PARTS)) zip.file(name, text);
  zip.file("xl/worksheets/sheet1.xml", sheetXml);
  fs.writeFileSync(file, await zip.generateAsync({ type: "nodebuffer", compression: "DEFLATE" }));
}

async function parts(file: string): Promise<Map<string, Buffer>> {
  const zip = await JSZip.loadAsync(fs.readFileSync(file));
  const out = new Map<string, Buffer>();
  for (const name of Object.keys(zip.files)) if (!zip.files[name].dir) out.set(name, await zip.files[name].async("nodebuffer"));
  return out;
}

describe("spanwise calc keeps a dynamic-array workbook as it was, values aside", () => {
  let dir: string;
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-roundtrip-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("changes only cached values (and the grown spill's ref); every other part is byte for byte the same", async () => {
    const values = direct(() => reactions([[SPANS]], [[LOADS]])) as number[][];
    expect(values).toHaveLength(4);
    const input = path.join(dir, "beam.xlsx");
    // The stale file: REACTIONS's ref covers two rows only (A3:C4), SEQUENCE's two (E3:E4).
    await writePackage(input, sheet(staleCells(), "A3:C4", "E3:E4"));
    const out = path.join(dir, "beam-out.xlsx");
    const result = run(["calc", input, "--out", out]);
    expect(result.stderr).toContain(`wrote ${out}`);
    expect(result.status).toBe(0);

    const before = await parts(input);
    const after = await parts(out);
    expect([...after.keys()].sort()).toEqual([...before.keys()].sort());
    for (const [name, bytes] of before) {
      if (name === "xl/worksheets/sheet1.xml") continue;
      expect({ name, same: after.get(name)!.equals(bytes) }).toEqual({ name, same: true });
    }
    const expectedSheet = sheet(expectedCells(values), "A3:C6", "E3:E5")
      // Rows 5 and 6 did not exist in the input: the spill adds them without attributes.
      .replace(/<row r="([56])" spans="1:9" x14ac:dyDescent="0.25">/g, '<row r="$1">');
    expect(after.get("xl/worksheets/sheet1.xml")!.toString("utf8")).toBe(expectedSheet);
  });

  it("keeps every byte of a big sheet with non-ASCII text, a byte-order mark and CRLF, values aside", async () => {
    // Read and written as bytes (src/cli/byteText.ts) through 1 MB chunks: 6,000 rows make the
    // sheet span several chunks. Text cells in three UTF-8 lengths (2, 3 and 4 bytes), a text
    // formula whose result is non-ASCII, a number formula, styled empty cells, whitespace.
    const rows = 6000;
    const sheetWith = (text: (r: number) => string, number: (r: number) => string): string => {
      const body = Array.from({ length: rows }, (_, i) => {
        const r = i + 1;
        return (
          `<row r="${r}" spans="1:5">` +
          `<c r="A${r}" t="inlineStr"><is><t xml:space="preserve">Träger ${r} – 梁 🧱 </t></is></c>` +
          `<c r="B${r}"><v>${r}</v></c>` +
          `<c r="C${r}" t="str"><f>"µ"&amp;B${r}*2</f><v>${text(r)}</v></c>` +
          `<c r="D${r}" s="1"><f>B${r}/4</f><v>${number(r)}</v></c>` +
          `<c r="E${r}" s="1"/>` +
          `</row>`
        );
      }).join("\r\n  ");
      return (
        `\uFEFF<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n<worksheet ${NS}>\r\n` +
        `<sheetData>\r\n  ${body}\r\n</sheetData>\r\n<!-- Anmerkung: Größe ≤ 5 % -->\r\n</worksheet>`
      );
    };
    const input = path.join(dir, "big.xlsx");
    const stale = sheetWith(() => "alt", () => "0");
    await writePackage(input, stale);
    const out = path.join(dir, "big-out.xlsx");
    const result = run(["calc", input, "--out", out]);
    expect(result.stderr).toContain(`wrote ${out}`);
    expect(result.status).toBe(0);

    const before = await parts(input);
    const after = await parts(out);
    expect(before.get("xl/worksheets/sheet1.xml")!.length).toBeGreaterThan(1.5 * (1 << 20));
    for (const [name, bytes] of before) {
      if (name === "xl/worksheets/sheet1.xml") continue;
      expect({ name, same: after.get(name)!.equals(bytes) }).toEqual({ name, same: true });
    }
    const expected = Buffer.from(sheetWith((r) => `µ${r * 2}`, (r) => String(r / 4)), "utf8");
    const written = after.get("xl/worksheets/sheet1.xml")!;
    expect(written.subarray(0, 3)).toEqual(Buffer.from([0xef, 0xbb, 0xbf]));
    // Compared as bytes (a text comparison would hide a changed encoding).
    expect(written.equals(expected)).toBe(true);
  });
});
