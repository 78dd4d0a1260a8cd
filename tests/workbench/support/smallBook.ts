/**
 * A small .xlsx written part by part, as the spreadsheet host stores it (ECMA-376 Part 1
 * §18.3.1: c, f, v; shared formulas §18.3.1.40 t="shared"/si; a legacy array t="array" without
 * cell metadata; a dynamic array with cm="1" pointing at dynamicArrayProperties fDynamic="1",
 * MS-XLSX), for the workbench's open and save tests. Styles: cell format 1 is bold with 0.000.
 */
import JSZip from "jszip";
import { evaluateBook, readBook, storeResults } from "../../../src/cli/xlsxBook";

export const SPANS = "6 8 6";
export const LOADS = "udl 2.5 D; point 10 at 3 L";
const NS = 'xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"';
const HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n';

/**
 * Sheet "Beam": A1 spans, A2 loads (shared strings), C1 factor 2 (styled), B3 the reactions
 * as a dynamic array (stale cached values), A8:A10 1..3, B8 =A8*$C$1 shared down to B10,
 * D8:D9 a legacy array {=A8:A9*10}. Sheet "Other sheet": A1 =Beam!C1*3, with the defined name
 * Factor = Beam!$C$1, and C1:C2 the legacy array {=Beam!A8:A9*2}.
 */
export async function smallBook(options: { metadata?: boolean } = {}): Promise<Uint8Array> {
  const metadata = options.metadata ?? true;
  const zip = new JSZip();
  const date = new Date(Date.UTC(2024, 0, 1));
  const put = (path: string, text: string) => zip.file(path, text, { date });
  put(
    "[Content_Types].xml",
    `${HEAD}<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/><Override PartName="/xl/worksheets/sheet2.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/><Override PartName="/xl/styles.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.styles+xml"/><Override PartName="/xl/sharedStrings.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml"/>${metadata ? '<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>' : ""}</Types>`,
  );
  put("_rels/.rels", `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>`);
  put(
    "xl/workbook.xml",
    `${HEAD}<workbook ${NS}><sheets><sheet name="Beam" sheetId="1" r:id="rId1"/><sheet name="Other sheet" sheetId="2" r:id="rId5"/></sheets><definedNames><definedName name="Factor">Beam!$C$1</definedName></definedNames><calcPr calcId="191029"/></workbook>`,
  );
  put(
    "xl/_rels/workbook.xml.rels",
    `${HEAD}<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/><Relationship Id="rId5" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet2.xml"/><Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/styles" Target="styles.xml"/><Relationship Id="rId3" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings" Target="sharedStrings.xml"/>${metadata ? '<Relationship Id="rId4" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata" Target="metadata.xml"/>' : ""}</Relationships>`,
  );
  put(
    "xl/styles.xml",
    `${HEAD}<styleSheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><numFmts count="1"><numFmt numFmtId="164" formatCode="0.000"/></numFmts><fonts count="2"><font><sz val="11"/><name val="Calibri"/></font><font><b/><sz val="11"/><name val="Calibri"/></font></fonts><fills count="1"><fill><patternFill patternType="none"/></fill></fills><borders count="1"><border/></borders><cellStyleXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0"/></cellStyleXfs><cellXfs count="2"><xf numFmtId="0" fontId="0" fillId="0" borderId="0" xfId="0"/><xf numFmtId="164" fontId="1" fillId="0" borderId="0" xfId="0" applyNumberFormat="1" applyFont="1"/></cellXfs></styleSheet>`,
  );
  put("xl/sharedStrings.xml", `${HEAD}<sst xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" count="2" uniqueCount="2"><si><t>${SPANS}</t></si><si><t>${LOADS}</t></si></sst>`);
  if (metadata) {
    put(
      "xl/metadata.xml",
      `${HEAD}<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray"><metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes><futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata><cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>`,
    );
  }
  const dynamic = metadata
    ? '<c r="B3" cm="1"><f t="array" ref="B3:C4">_xldudf_SPAN_REACTIONS(A1,A2)</f><v>1</v></c><c r="C3"><v>2</v></c>'
    : '<c r="B3"><f>1+1</f><v>2</v></c>';
  const dynamicRow4 = metadata ? '<row r="4"><c r="B4"><v>3</v></c><c r="C4"><v>4</v></c></row>' : "";
  put(
    "xl/worksheets/sheet1.xml",
    `${HEAD}<worksheet ${NS}><sheetData>` +
      '<row r="1"><c r="A1" t="s"><v>0</v></c><c r="C1" s="1"><v>2</v></c></row>' +
      '<row r="2"><c r="A2" t="s"><v>1</v></c></row>' +
      `<row r="3">${dynamic}</row>${dynamicRow4}` +
      '<row r="8"><c r="A8"><v>1</v></c><c r="B8" s="1"><f t="shared" ref="B8:B10" si="0">A8*$C$1</f><v>0</v></c><c r="D8"><f t="array" ref="D8:D9">A8:A9*10</f><v>0</v></c></row>' +
      '<row r="9"><c r="A9"><v>2</v></c><c r="B9" s="1"><f t="shared" si="0"/><v>0</v></c><c r="D9"><v>0</v></c></row>' +
      '<row r="10"><c r="A10"><v>3</v></c><c r="B10" s="1"><f t="shared" si="0"/><v>0</v></c></row>' +
      "</sheetData></worksheet>",
  );
  put(
    "xl/worksheets/sheet2.xml",
    `${HEAD}<worksheet ${NS}><sheetData><row r="1"><c r="A1"><f>Beam!C1*3</f><v>0</v></c><c r="B1"><f>Factor+1</f><v>0</v></c><c r="C1"><f t="array" ref="C1:C2">Beam!A8:A9*2</f><v>0</v></c></row><row r="2"><c r="C2"><v>0</v></c></row></sheetData></worksheet>`,
  );
  return zip.generateAsync({ type: "uint8array", compression: "DEFLATE" });
}

/** Every part of a package as text, by name. */
export async function partsOf(bytes: Uint8Array): Promise<Record<string, string>> {
  const zip = await JSZip.loadAsync(bytes);
  const out: Record<string, string> = {};
  for (const name of Object.keys(zip.files).sort()) if (!zip.files[name].dir) out[name] = await zip.files[name].async("string");
  return out;
}

/** What `spanwise calc` writes for these bytes (its reader, evaluator and writer, in process). */
export async function calcOutput(bytes: Uint8Array): Promise<Uint8Array> {
  const book = await readBook(bytes);
  const evaluated = evaluateBook(book);
  await storeResults(book, evaluated);
  evaluated.destroy();
  return book.pkg.bytes();
}
