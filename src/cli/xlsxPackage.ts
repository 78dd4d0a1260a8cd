/**
 * An .xlsx package (ECMA-376 Part 2, Open Packaging Conventions: a zip of parts tied together
 * by relationships) opened for reading and for replacing a few parts. jszip keeps the
 * compressed bytes of every part that is not replaced and writes them back unchanged, so the
 * parts Spanwise does not touch come out exactly as they went in.
 */
import JSZip from "jszip";
import { binaryOf, joinChunks, textOfUtf8 } from "./byteText";
import { attributes, decodeXml, localName, textRuns } from "./xmlText";

export const RELATIONSHIP = {
  officeDocument: "http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument",
  worksheet: "http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet",
  sharedStrings: "http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings",
  sheetMetadata: "http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata",
} as const;

export const METADATA_CONTENT_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml";

export interface Relationship {
  id: string;
  type: string;
  target: string;
}

export interface SheetPart {
  name: string;
  path: string;
}

export interface DefinedName {
  name: string;
  /** The sheet index it is local to (localSheetId), or undefined for a workbook name. */
  localSheet?: number;
  formula: string;
}

export class PackageError extends Error {}

/** Each tag of an XML part, in order (start tags with their text, end tags flagged). */
function* tags(xml: string): Generator<{ tag: string; at: number; close: number }> {
  let i = 0;
  for (;;) {
    const open = xml.indexOf("<", i);
    if (open < 0) return;
    const close = xml.indexOf(">", open);
    if (close < 0) return;
    yield { tag: xml.slice(open + 1, close), at: open, close };
    i = close + 1;
  }
}

export function parseRelationships(xml: string): Relationship[] {
  const out: Relationship[] = [];
  for (const { tag } of tags(xml)) {
    if (localName(tag) !== "Relationship" || tag.startsWith("/")) continue;
    const a = attributes(tag);
    out.push({ id: a.get("Id") ?? "", type: a.get("Type") ?? "", target: a.get("Target") ?? "" });
  }
  return out;
}

/** A relationship target resolved against the folder of the part that holds it. */
export function resolveTarget(fromPart: string, target: string): string {
  if (target.startsWith("/")) return target.slice(1);
  const parts = fromPart.split("/").slice(0, -1);
  for (const piece of target.split("/")) {
    if (piece === "..") parts.pop();
    else if (piece !== "." && piece !== "") parts.push(piece);
  }
  return parts.join("/");
}

function relsPathOf(part: string): string {
  const slash = part.lastIndexOf("/");
  return `${part.slice(0, slash + 1)}_rels/${part.slice(slash + 1)}.rels`;
}

export class XlsxPackage {
  private constructor(
    readonly zip: JSZip,
    readonly workbookPath: string,
    readonly workbookXml: string,
    readonly workbookRels: Relationship[],
  ) {}

  /** Opens a package from its bytes (a Buffer in Node, any Uint8Array in a browser). */
  static async open(bytes: Uint8Array): Promise<XlsxPackage> {
    let zip: JSZip;
    try {
      zip = await JSZip.loadAsync(bytes, { checkCRC32: true });
    } catch (error) {
      const raw = error instanceof Error ? error.message : String(error);
      throw new PackageError(/end of central directory|is this a zip/i.test(raw) ? "the file is not a zip archive, as every .xlsx is" : `the zip archive is damaged (${raw})`);
    }
    const rootRels = await XlsxPackage.text(zip, "_rels/.rels");
    if (rootRels === undefined) throw new PackageError("it has no package relationships (_rels/.rels): not an Office Open XML package");
    const office = parseRelationships(rootRels).find((rel) => rel.type === RELATIONSHIP.officeDocument);
    if (!office) throw new PackageError("its package names no main document");
    const workbookPath = resolveTarget("", office.target);
    const workbookXml = await XlsxPackage.text(zip, workbookPath);
    if (workbookXml === undefined || !/<(?:\w+:)?workbook[\s>]/.test(workbookXml)) throw new PackageError("it holds no workbook part (it is not a spreadsheet)");
    const rels = await XlsxPackage.text(zip, relsPathOf(workbookPath));
    return new XlsxPackage(zip, workbookPath, workbookXml, rels === undefined ? [] : parseRelationships(rels));
  }

  private static async text(zip: JSZip, path: string): Promise<string | undefined> {
    const file = zip.file(path);
    return file ? file.async("string") : undefined;
  }

  /** Parts given as chunks of bytes (setPartBytes), joined only when the package is written. */
  private readonly chunked = new Map<string, Uint8Array[]>();

  async part(path: string): Promise<string | undefined> {
    const chunks = this.chunked.get(path);
    if (chunks) return textOfUtf8(binaryOf(joinChunks(chunks)));
    return XlsxPackage.text(this.zip, path);
  }

  /** A part as a byte string (one character per byte; see byteText.ts), for big parts read by position. */
  async partBinary(path: string): Promise<string | undefined> {
    const chunks = this.chunked.get(path);
    if (chunks) return binaryOf(joinChunks(chunks));
    const file = this.zip.file(path);
    return file ? binaryOf(await file.async("uint8array")) : undefined;
  }

  hasPart(path: string): boolean {
    return this.zip.file(path) !== null;
  }

  setPart(path: string, text: string): void {
    this.chunked.delete(path);
    this.zip.file(path, text);
  }

  /**
   * A part replaced by these bytes, kept in chunks until the package is written: a big sheet
   * is never one block of memory while the rest of the work still needs memory.
   */
  setPartBytes(path: string, chunks: Uint8Array[]): void {
    if (!this.zip.file(path)) this.zip.file(path, new Uint8Array(0));
    this.chunked.set(path, chunks);
  }

  relatedPath(type: string): string | undefined {
    const rel = this.workbookRels.find((r) => r.type === type);
    return rel ? resolveTarget(this.workbookPath, rel.target) : undefined;
  }

  /** The worksheets in workbook order (chart sheets and others are left alone). */
  sheets(): SheetPart[] {
    const out: SheetPart[] = [];
    for (const { tag } of tags(this.workbookXml)) {
      if (localName(tag) !== "sheet" || tag.startsWith("/")) continue;
      const a = attributes(tag);
      const id = [...a.entries()].find(([key]) => key === "r:id" || key.endsWith(":id"))?.[1];
      const rel = this.workbookRels.find((r) => r.id === id);
      if (!rel || rel.type !== RELATIONSHIP.worksheet) continue;
      out.push({ name: a.get("name") ?? "", path: resolveTarget(this.workbookPath, rel.target) });
    }
    return out;
  }

  definedNames(): DefinedName[] {
    const out: DefinedName[] = [];
    const xml = this.workbookXml;
    for (const { tag, close } of tags(xml)) {
      if (localName(tag) !== "definedName" || tag.startsWith("/") || tag.endsWith("/")) continue;
      const end = xml.indexOf("<", close);
      const a = attributes(tag);
      const local = a.get("localSheetId");
      out.push({ name: a.get("name") ?? "", localSheet: local === undefined ? undefined : Number(local), formula: decodeXml(xml.slice(close + 1, end)) });
    }
    return out;
  }

  async sharedStrings(): Promise<string[]> {
    const path = this.relatedPath(RELATIONSHIP.sharedStrings);
    const xml = path ? await this.part(path) : undefined;
    if (!xml) return [];
    const out: string[] = [];
    let from = 0;
    for (;;) {
      const open = xml.indexOf("<", from);
      if (open < 0) break;
      const close = xml.indexOf(">", open);
      if (close < 0) break;
      const tag = xml.slice(open + 1, close);
      if (localName(tag) === "si" && !tag.startsWith("/")) {
        if (tag.endsWith("/")) {
          out.push("");
          from = close + 1;
          continue;
        }
        const qualified = tag.split(/[\s/]/, 1)[0];
        const end = xml.indexOf(`</${qualified}>`, close);
        if (end < 0) break;
        out.push(textRuns(xml.slice(close + 1, end)));
        from = end;
        continue;
      }
      from = close + 1;
    }
    return out;
  }

  /**
   * The 1-based cell-metadata indexes (`cm`) that mark a dynamic array: a cellMetadata block
   * whose record points at the XLDAPR metadata type and a futureMetadata entry whose
   * dynamicArrayProperties has fDynamic="1" (MS-XLSX 2.6.x dynamicArrayProperties; the `cm`
   * index is 1-based in Office, MS-OI29500 2.1.589 a).
   */
  async dynamicArrayIndexes(): Promise<Set<number>> {
    const path = this.relatedPath(RELATIONSHIP.sheetMetadata);
    const xml = path ? await this.part(path) : undefined;
    const out = new Set<number>();
    if (!xml) return out;
    const typeNames: string[] = [];
    const future = new Map<string, boolean[]>();
    let section = "";
    let futureName = "";
    let cellBlock = 0;
    let inFutureBk = false;
    for (const { tag } of tags(xml)) {
      const name = localName(tag);
      const closing = tag.startsWith("/");
      if (name === "metadataType" && !closing) typeNames.push(attributes(tag).get("name") ?? "");
      else if (name === "futureMetadata") {
        section = closing ? "" : "future";
        if (!closing) {
          futureName = attributes(tag).get("name") ?? "";
          future.set(futureName, []);
        }
      } else if (name === "cellMetadata") section = closing ? "" : "cell";
      else if (name === "bk") {
        if (section === "future") {
          if (!closing) {
            future.get(futureName)!.push(false);
            inFutureBk = !tag.endsWith("/");
          } else inFutureBk = false;
        } else if (section === "cell" && !closing) cellBlock++;
      } else if (name === "dynamicArrayProperties" && section === "future" && inFutureBk) {
        const flag = attributes(tag).get("fDynamic");
        const list = future.get(futureName)!;
        list[list.length - 1] = flag === "1" || flag === "true";
      } else if (name === "rc" && section === "cell" && !closing) {
        const a = attributes(tag);
        const type = typeNames[Number(a.get("t")) - 1];
        const index = Number(a.get("v"));
        if (type !== undefined && future.get(type)?.[index] === true) out.add(cellBlock);
      }
    }
    return out;
  }

  async write(): Promise<Buffer> {
    return this.generate("nodebuffer");
  }

  /** The package's bytes where there is no Buffer (a browser): the same zip as write(). */
  async bytes(): Promise<Uint8Array> {
    return this.generate("uint8array");
  }

  /** The zip of every part: the one way write() and bytes() produce it (chunked parts joined first). */
  private generate<T extends "nodebuffer" | "uint8array">(type: T): Promise<T extends "nodebuffer" ? Buffer : Uint8Array> {
    for (const [path, chunks] of this.chunked) {
      this.zip.file(path, joinChunks(chunks));
      // The joined copy is the zip's now: the chunks go.
      chunks.length = 0;
    }
    this.chunked.clear();
    return this.zip.generateAsync({ type, compression: "DEFLATE", compressionOptions: { level: 6 } }) as never;
  }
}
