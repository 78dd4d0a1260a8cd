/**
 * The shipped demo workbook (assets/spanwise-demo.xlsx, `npm run demo:xlsx`) stores every
 * formula as a dynamic array the way the host does, so the host keeps its cached values on open:
 * - xl/metadata.xml: metadata type XLDAPR, futureMetadata with xda:dynamicArrayProperties
 *   fDynamic="1" (MS-XLSX dynamicarray schema, learn.microsoft.com/openspecs/office_standards/
 *   ms-xlsx/878c8ac4-8548-4bfb-9ad4-b1378e0efed1), one cellMetadata block;
 * - its content-type override and the workbook relationship .../relationships/sheetMetadata;
 * - cm="1" on every anchor (1-based, MS-OI29500 2.1.589 a) beside <f t="array" ref=...>
 *   (ECMA-376 Part 1 §18.3.1.40);
 * - calcId 191029, the current host's (../shared/TOOLCHAIN.md, "Saved workbooks").
 * Every SPAN spill's ref is the size the engine spills it to, and every cached value in it is
 * the engine's value.
 */
import fs from "fs";
import path from "path";
import JSZip from "jszip";
import { scanSheet, type XmlCell } from "../../src/cli/sheetXml";
import { evaluateBook, parseArrayRef, readBook } from "../../src/cli/xlsxBook";
import { isCellError } from "../../src/engine";

const DEMO = path.resolve(__dirname, "..", "..", "assets", "spanwise-demo.xlsx");

describe("the demo workbook", () => {
  it("stores its spills as the host stores dynamic arrays, with a current calcId", async () => {
    const zip = await JSZip.loadAsync(fs.readFileSync(DEMO));
    const text = (name: string) => zip.file(name)!.async("string");
    const metadata = await text("xl/metadata.xml");
    expect(metadata).toMatch(/<metadataType name="XLDAPR"/);
    expect(metadata).toMatch(/<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="[^"]+"><xda:dynamicArrayProperties fDynamic="1"/);
    expect(metadata).toMatch(/<cellMetadata count="1"><bk><rc t="1" v="0"\/><\/bk><\/cellMetadata>/);
    expect(await text("[Content_Types].xml")).toContain('<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>');
    expect(await text("xl/_rels/workbook.xml.rels")).toMatch(/Type="http:\/\/schemas.openxmlformats.org\/officeDocument\/2006\/relationships\/sheetMetadata" Target="metadata.xml"/);
    expect(await text("xl/workbook.xml")).toMatch(/<calcPr calcId="191029"/);
    expect(await text("xl/workbook.xml")).not.toContain("171027");
  });

  it("has every SPAN spill's ref at the engine's size, every cached value the engine's", async () => {
    const bytes = fs.readFileSync(DEMO);
    const book = await readBook(bytes);
    const evaluated = evaluateBook(book);
    let spanSpills = 0;
    let spanFormulas = 0;
    for (const sheet of book.sheets) {
      const id = evaluated.sheetId(sheet.name);
      const cells = new Map<string, XmlCell>();
      scanSheet((await book.pkg.part(sheet.path))!, (cell) => cells.set(`${cell.row}:${cell.col}`, cell));
      for (const cell of cells.values()) {
        const f = cell.formula;
        if (!f) continue;
        expect({ at: `${sheet.name}!${cell.row}:${cell.col}`, cm: cell.attrs.get("cm"), t: f.type }).toEqual({ at: `${sheet.name}!${cell.row}:${cell.col}`, cm: "1", t: "array" });
        if (!/_xldudf_SPAN_/.test(f.text)) continue;
        expect(f.text).not.toMatch(/(?<!_xldudf_)SPAN\.|#/);
        spanFormulas++;
        const ref = parseArrayRef(f.ref, cell.row, cell.col, sheet.name);
        const size = evaluated.spillSize(id, cell.row, cell.col) ?? { rows: 1, cols: 1 };
        expect({ at: f.ref, rows: ref.bottom - ref.top + 1, cols: ref.right - ref.left + 1 }).toEqual({ at: f.ref, ...size });
        if (size.rows > 1 || size.cols > 1) spanSpills++;
        for (let row = ref.top; row <= ref.bottom; row++)
          for (let col = ref.left; col <= ref.right; col++) {
            const stored = cells.get(`${row}:${col}`);
            const value = evaluated.getValue(id, row, col);
            if (isCellError(value)) throw new Error(`${sheet.name} ${row}:${col} is an error: ${value.message}`);
            const cached = stored?.attrs.get("t") === "inlineStr" ? stored.inline : stored?.value;
            const expected = value === "" || value === null ? [undefined, ""] : [typeof value === "number" ? String(value) : typeof value === "boolean" ? (value ? "1" : "0") : value];
            expect(expected).toContain(cached);
          }
      }
    }
    evaluated.destroy();
    expect(spanFormulas).toBeGreaterThanOrEqual(60);
    expect(spanSpills).toBeGreaterThanOrEqual(15);
  });
});
