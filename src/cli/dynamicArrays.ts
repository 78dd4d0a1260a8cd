/**
 * Turning the formulas of a freshly written package into dynamic arrays, the way the host
 * stores them (used for the demo workbook, whose writer knows only legacy formulas):
 * - each formula becomes `<f t="array" ref="...">` on a cell with `cm="1"` (ECMA-376 Part 1
 *   §18.3.1.40 f; `cm` is a 1-based index into cellMetadata, MS-OI29500 2.1.589 a);
 * - xl/metadata.xml holds one cellMetadata block pointing at the XLDAPR metadata type, whose
 *   futureMetadata entry carries `xda:dynamicArrayProperties fDynamic="1"` (MS-XLSX, the
 *   dynamicarray schema http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray);
 * - the part gets its content-type override and a workbook relationship of type
 *   .../relationships/sheetMetadata;
 * - calcPr carries calcId 191029, the current host's, so it keeps the cached values on open
 *   (an older calcId makes it recalculate everything).
 * storeResults then sets each ref to the size the formula spills to.
 */
import { rewriteSheet, scanSheet, type SheetEdits } from "./sheetXml";
import { a1 } from "./xlsxBook";
import { METADATA_CONTENT_TYPE, RELATIONSHIP, XlsxPackage, parseRelationships, resolveTarget } from "./xlsxPackage";

export const CURRENT_CALC_ID = "191029";
/** The extension URI under which the host writes dynamicArrayProperties (MS-XLSX). */
export const DYNAMIC_ARRAY_EXT_URI = "{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}";

export const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  '<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">' +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" coerce="1" cellMeta="1"/></metadataTypes>' +
  `<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="${DYNAMIC_ARRAY_EXT_URI}"><xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>` +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata>' +
  "</metadata>";

function relsPath(part: string): string {
  const slash = part.lastIndexOf("/");
  return `${part.slice(0, slash + 1)}_rels/${part.slice(slash + 1)}.rels`;
}

/** The package with every formula stored as a dynamic array (see the file comment). */
export async function storeAsDynamicArrays(bytes: Buffer): Promise<Buffer> {
  const pkg = await XlsxPackage.open(bytes);
  if (pkg.relatedPath(RELATIONSHIP.sheetMetadata)) throw new Error("the package has cell metadata already");
  for (const sheet of pkg.sheets()) {
    const xml = (await pkg.part(sheet.path))!;
    const edits: SheetEdits = { replace: new Map(), insert: new Map() };
    scanSheet(xml, (cell) => {
      const f = cell.formula;
      if (!f) return;
      if (f.type === "shared") throw new Error(`${sheet.name}!${a1(cell.row, cell.col)}: a shared formula cannot become a dynamic array`);
      const startTag = xml.slice(cell.start, cell.tagEnd);
      const fTag = xml.slice(f.tagStart, f.tagEnd);
      const ref = a1(cell.row, cell.col);
      const newF = f.type === "array" ? fTag : fTag.replace(/^<(\w+:)?f/, (open) => `${open} t="array" ref="${ref}"`);
      const newStart = startTag.replace(/\s*(\/?>)$/, ' cm="1"$1');
      edits.replace.set(`${cell.row}:${cell.col}`, newStart + xml.slice(cell.tagEnd, f.tagStart) + newF + xml.slice(f.tagEnd, cell.end));
    });
    pkg.setPart(sheet.path, rewriteSheet(xml, edits));
  }
  pkg.setPart("xl/metadata.xml", METADATA_XML);
  const types = (await pkg.part("[Content_Types].xml"))!;
  pkg.setPart("[Content_Types].xml", types.replace("</Types>", `<Override PartName="/xl/metadata.xml" ContentType="${METADATA_CONTENT_TYPE}"/></Types>`));
  const relsFile = relsPath(pkg.workbookPath);
  const rels = (await pkg.part(relsFile))!;
  const ids = new Set(parseRelationships(rels).map((rel) => rel.id));
  let n = ids.size + 1;
  while (ids.has(`rId${n}`)) n++;
  const target = resolveTarget(pkg.workbookPath, "metadata.xml") === "xl/metadata.xml" ? "metadata.xml" : "/xl/metadata.xml";
  pkg.setPart(relsFile, rels.replace("</Relationships>", `<Relationship Id="rId${n}" Type="${RELATIONSHIP.sheetMetadata}" Target="${target}"/></Relationships>`));
  const workbook = pkg.workbookXml;
  const withCalc = /<calcPr\b[^>]*>/.test(workbook)
    ? workbook.replace(/<calcPr\b[^>]*?(\/?)>/, (tag) => (/calcId="/.test(tag) ? tag.replace(/calcId="[^"]*"/, `calcId="${CURRENT_CALC_ID}"`) : tag.replace(/<calcPr/, `<calcPr calcId="${CURRENT_CALC_ID}"`)))
    : workbook.replace("</workbook>", `<calcPr calcId="${CURRENT_CALC_ID}"/></workbook>`);
  pkg.setPart(pkg.workbookPath, withCalc);
  return pkg.write();
}
