/**
 * The package-level changes a save may need beyond cached values: a fresh package for a book
 * that came from no file, worksheets added, worksheets renamed, and the dynamic-array cell
 * metadata new formulas point at. Parts are edited as text, by position, like the CLI's
 * writer: everything not named here stays byte for byte.
 *
 * Part names, content types and relationship types: ECMA-376 Part 1 §12.3 (SpreadsheetML
 * parts), Part 2 (Open Packaging Conventions). Dynamic-array metadata: as the CLI's demo
 * writer stores it (src/cli/dynamicArrays.ts, MS-XLSX dynamicArrayProperties).
 */
import JSZip from "jszip";
import { CURRENT_CALC_ID, METADATA_XML } from "../../cli/dynamicArrays";
import { attributes, decodeXml, encodeXml } from "../../cli/xmlText";
import { METADATA_CONTENT_TYPE, RELATIONSHIP, parseRelationships, type XlsxPackage } from "../../cli/xlsxPackage";
import { renameSheetReferences } from "../../engine/workbook";

const MAIN_NS = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
const REL_NS = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
const PKG_RELS_NS = "http://schemas.openxmlformats.org/package/2006/relationships";
const WORKSHEET_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml";
const XML_HEAD = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n';

export class SaveError extends Error {}

/** The parts of an empty workbook: no sheets yet (they are added as for any package), one default cell format. */
export async function blankPackage(): Promise<Uint8Array> {
  const zip = new JSZip();
  const date = new Date(Date.UTC(2024, 0, 1));
  const put = (path: string, text: string) => zip.file(path, text, { date });
  put(
    "[Content_Types].xml",
    `${XML_HEAD}<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">` +
      '<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/>' +
      '<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>' +
      '<Override PartName="/xl/styles.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.styles+xml"/></Types>',
  );
  put("_rels/.rels", `${XML_HEAD}<Relationships xmlns="${PKG_RELS_NS}"><Relationship Id="rId1" Type="${RELATIONSHIP.officeDocument}" Target="xl/workbook.xml"/></Relationships>`);
  put("xl/workbook.xml", `${XML_HEAD}<workbook xmlns="${MAIN_NS}" xmlns:r="${REL_NS}"><sheets></sheets><calcPr calcId="${CURRENT_CALC_ID}"/></workbook>`);
  put(
    "xl/_rels/workbook.xml.rels",
    `${XML_HEAD}<Relationships xmlns="${PKG_RELS_NS}"><Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/styles" Target="styles.xml"/></Relationships>`,
  );
  put(
    "xl/styles.xml",
    `${XML_HEAD}<styleSheet xmlns="${MAIN_NS}"><fonts count="1"><font><sz val="11"/><name val="Calibri"/></font></fonts>` +
      '<fills count="2"><fill><patternFill patternType="none"/></fill><fill><patternFill patternType="gray125"/></fill></fills>' +
      '<borders count="1"><border><left/><right/><top/><bottom/><diagonal/></border></borders>' +
      '<cellStyleXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0"/></cellStyleXfs>' +
      '<cellXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0" xfId="0"/></cellXfs>' +
      '<cellStyles count="1"><cellStyle name="Normal" xfId="0" builtinId="0"/></cellStyles></styleSheet>',
  );
  return zip.generateAsync({ type: "uint8array", compression: "DEFLATE", compressionOptions: { level: 6 } });
}

function relsPathOf(part: string): string {
  const slash = part.lastIndexOf("/");
  return `${part.slice(0, slash + 1)}_rels/${part.slice(slash + 1)}.rels`;
}

/** workbook.xml, its relationships and the content types, edited in memory and written back by flush(). */
export class PackageEditor {
  private workbook: string;
  private changed = new Set<string>();

  private constructor(
    private readonly pkg: XlsxPackage,
    private rels: string,
    private types: string,
  ) {
    this.workbook = pkg.workbookXml;
  }

  static async of(pkg: XlsxPackage): Promise<PackageEditor> {
    const rels = (await pkg.part(relsPathOf(pkg.workbookPath))) ?? `${XML_HEAD}<Relationships xmlns="${PKG_RELS_NS}"></Relationships>`;
    const types = await pkg.part("[Content_Types].xml");
    if (types === undefined) throw new SaveError("the package has no [Content_Types].xml");
    return new PackageEditor(pkg, rels, types);
  }

  private newRelationship(type: string, target: string): string {
    const ids = new Set(parseRelationships(this.rels).map((rel) => rel.id));
    let n = ids.size + 1;
    while (ids.has(`rId${n}`)) n++;
    const id = `rId${n}`;
    const at = this.rels.search(/<\/(?:\w+:)?Relationships>/);
    if (at < 0) throw new SaveError("the workbook's relationships part is not closed");
    const prefix = /<\/(\w+:)?Relationships>/.exec(this.rels)?.[1] ?? "";
    this.rels = `${this.rels.slice(0, at)}<${prefix}Relationship Id="${id}" Type="${type}" Target="${encodeXml(target)}"/>${this.rels.slice(at)}`;
    this.changed.add("rels");
    return id;
  }

  private override(partName: string, contentType: string): void {
    const at = this.types.search(/<\/(?:\w+:)?Types>/);
    if (at < 0) throw new SaveError("[Content_Types].xml is not closed");
    this.types = `${this.types.slice(0, at)}<Override PartName="/${encodeXml(partName)}" ContentType="${contentType}"/>${this.types.slice(at)}`;
    this.changed.add("types");
  }

  /** A relationship target for a part, relative to the workbook's folder when the part is inside it. */
  private targetOf(part: string): string {
    const folder = this.pkg.workbookPath.slice(0, this.pkg.workbookPath.lastIndexOf("/") + 1);
    return folder !== "" && part.startsWith(folder) ? part.slice(folder.length) : `/${part}`;
  }

  /** Adds an empty worksheet at the end of the workbook; returns its part name. */
  addSheet(name: string): string {
    let n = 1;
    while (this.pkg.hasPart(`xl/worksheets/sheet${n}.xml`)) n++;
    const path = `xl/worksheets/sheet${n}.xml`;
    this.pkg.setPart(path, `${XML_HEAD}<worksheet xmlns="${MAIN_NS}" xmlns:r="${REL_NS}"><sheetData/></worksheet>`);
    this.override(path, WORKSHEET_TYPE);
    const id = this.newRelationship(RELATIONSHIP.worksheet, this.targetOf(path));
    const sheetIds = [...this.workbook.matchAll(/<(?:\w+:)?sheet\s[^>]*>/g)].map((m) => Number(attributes(m[0].slice(1)).get("sheetId")) || 0);
    const sheetId = sheetIds.reduce((most, v) => Math.max(most, v), 0) + 1;
    const close = /<\/(\w+:)?sheets>/.exec(this.workbook);
    const tag = `sheet name="${encodeXml(name)}" sheetId="${sheetId}" xmlns:r="${REL_NS}" r:id="${id}"/>`;
    if (close) {
      this.workbook = `${this.workbook.slice(0, close.index)}<${close[1] ?? ""}${tag}${this.workbook.slice(close.index)}`;
    } else {
      const empty = /<(\w+:)?sheets\s*\/>/.exec(this.workbook);
      if (!empty) throw new SaveError("the workbook part has no list of sheets");
      const p = empty[1] ?? "";
      this.workbook = `${this.workbook.slice(0, empty.index)}<${p}sheets><${p}${tag}</${p}sheets>${this.workbook.slice(empty.index + empty[0].length)}`;
    }
    this.changed.add("workbook");
    return path;
  }

  /** Renames a worksheet in the list of sheets and in the defined names that refer to it. */
  renameSheet(from: string, to: string): void {
    let found = false;
    this.workbook = this.workbook.replace(/<(?:\w+:)?sheet\s[^>]*>/g, (tag) => {
      if (found || attributes(tag.slice(1)).get("name") !== from) return tag;
      found = true;
      return tag.replace(/(\sname\s*=\s*)(?:"[^"]*"|'[^']*')/, `$1"${encodeXml(to)}"`);
    });
    if (!found) throw new SaveError(`the workbook part has no sheet named "${from}"`);
    this.workbook = this.workbook.replace(/(<(?:\w+:)?definedName\b[^>]*>)([^<]*)(<\/(?:\w+:)?definedName>)/g, (_whole, open: string, text: string, close: string) => {
      return `${open}${encodeXml(renameSheetReferences(decodeXml(text), from, to))}${close}`;
    });
    this.changed.add("workbook");
  }

  /**
   * The `cm` index that marks a cell as a dynamic array: the package's own, or a new metadata
   * part (the one the CLI writes) when it has none. A package with cell metadata of other
   * kinds only is refused rather than merged.
   */
  dynamicArrayIndex(): Promise<number> {
    this.cm ??= this.findOrAddDynamicArrayIndex();
    return this.cm;
  }

  private cm: Promise<number> | undefined;

  private async findOrAddDynamicArrayIndex(): Promise<number> {
    const known = await this.pkg.dynamicArrayIndexes();
    if (known.size > 0) return [...known].reduce((least, v) => Math.min(least, v));
    if (this.pkg.relatedPath(RELATIONSHIP.sheetMetadata)) {
      throw new SaveError("the workbook has cell metadata without a dynamic-array entry, so new formulas cannot be stored as the host stores them (type them in the desktop spreadsheet, or save a copy without those formulas)");
    }
    let path = "xl/metadata.xml";
    for (let n = 2; this.pkg.hasPart(path); n++) path = `xl/metadata${n}.xml`;
    this.pkg.setPart(path, METADATA_XML);
    this.override(path, METADATA_CONTENT_TYPE);
    this.newRelationship(RELATIONSHIP.sheetMetadata, this.targetOf(path));
    return 1;
  }

  flush(): void {
    if (this.changed.has("workbook")) this.pkg.setPart(this.pkg.workbookPath, this.workbook);
    if (this.changed.has("rels")) this.pkg.setPart(relsPathOf(this.pkg.workbookPath), this.rels);
    if (this.changed.has("types")) this.pkg.setPart("[Content_Types].xml", this.types);
    this.changed.clear();
  }
}
