/**
 * Least permission: the manifest asks for the lowest level that covers what the code does.
 * Levels, lowest first (Office add-in manifests, task pane): Restricted, ReadDocument,
 * ReadAllDocument, WriteDocument, ReadWriteDocument. The custom functions receive cell
 * values as arguments and call no document API (Restricted would do); the pane reads the
 * selection and its formula and writes tables and charts, so it needs to read and write
 * the document: ReadWriteDocument. The needs are found in the source, not assumed.
 */
import * as fs from "fs";
import * as path from "path";

const ROOT = path.resolve(__dirname, "../..");
type Level = "Restricted" | "ReadDocument" | "ReadAllDocument" | "WriteDocument" | "ReadWriteDocument";

const READS = /getSelectedRange\(|\.load\(|getRange\(/;
const WRITES = /\.values\s*=|\.formulas\s*=|charts\.add\(|\.setValues\(|\.clear\(|\.delete\(/;

function sources(dir: string): string {
  const full = path.join(ROOT, dir);
  if (!fs.existsSync(full)) return "";
  return fs
    .readdirSync(full, { recursive: true, encoding: "utf8" })
    .filter((f) => f.endsWith(".ts"))
    .map((f) => fs.readFileSync(path.join(full, f), "utf8"))
    .join("\n");
}

/** The least level covering the document calls in `code`. */
export function neededLevel(code: string): Level {
  const documentApi = /Excel\.run|context\.workbook/.test(code);
  if (!documentApi) return "Restricted";
  const reads = READS.test(code);
  const writes = WRITES.test(code);
  return writes && reads ? "ReadWriteDocument" : writes ? "WriteDocument" : reads ? "ReadDocument" : "Restricted";
}

test("control: the needs follow the calls", () => {
  expect(neededLevel("export const f = (a: number) => a * 2;")).toBe("Restricted");
  expect(neededLevel("Excel.run(async (context) => { const r = context.workbook.getSelectedRange(); r.load('values'); })")).toBe("ReadDocument");
  expect(neededLevel("Excel.run(async (context) => { context.workbook.getSelectedRange().values = [[1]]; })")).toBe("ReadWriteDocument");
});

test("the functions alone need no document access", () => {
  expect(neededLevel(sources("functions") + sources("src/sheet") + sources("src/core"))).toBe("Restricted");
});

test("the manifest asks for exactly the least level the shipped code needs", () => {
  const manifest = fs.readFileSync(path.join(ROOT, "manifest.xml"), "utf8");
  const asked = /<Permissions>\s*(\w+)\s*<\/Permissions>/.exec(manifest)?.[1];
  const needed = neededLevel(sources("functions") + sources("src/sheet") + sources("src/core") + sources("src/pane"));
  expect(asked).toBe(needed);
});
