/**
 * Saving the workbench's book as .xlsx with the fidelity of `spanwise calc`: the package is
 * the user's own file (or a blank one for a book that came from no file), sheets added and
 * renamed are written into it, the cells the user changed are written in (cellEdits.ts), and
 * then the CLI's own writer stores every formula's cached value and every spill
 * (src/cli/xlsxBook.ts storeResults). A book opened and saved unchanged comes out part for
 * part as `spanwise calc` writes it.
 */
import { readBook, storeResults } from "../../cli/xlsxBook";
import { XlsxPackage } from "../../cli/xlsxPackage";
import { writeChanges } from "./cellEdits";
import type { WorkbenchDocument } from "./document";
import { PackageEditor, SaveError, blankPackage } from "./packageParts";

export { SaveError };

/** The file name a save offers: the book's name with .xlsx. */
export function saveName(name: string): string {
  const base = name.replace(/\.xlsx$/i, "").trim() || "workbook";
  return `${base}.xlsx`;
}

export async function saveXlsx(doc: WorkbenchDocument): Promise<Uint8Array> {
  const book = doc.book;
  const names = book.sheetNames();
  const fromFile = doc.origin.kind === "file";
  const pkg = await XlsxPackage.open(doc.origin.kind === "file" ? doc.origin.bytes : await blankPackage());
  const editor = await PackageEditor.of(pkg);
  const parts = fromFile ? pkg.sheets() : [];
  if (fromFile && parts.length !== doc.originSheets.length) throw new SaveError(`the file's package lists ${parts.length} worksheets, the book read from it ${doc.originSheets.length}`);
  const paths: string[] = [];
  let structural = false;
  names.forEach((name, id) => {
    if (id < parts.length) {
      paths[id] = parts[id].path;
      if (parts[id].name !== name) {
        editor.renameSheet(parts[id].name, name);
        structural = true;
      }
    } else {
      paths[id] = editor.addSheet(name);
      structural = true;
    }
  });
  const dynamic = await pkg.dynamicArrayIndexes();
  let edited = false;
  for (let id = 0; id < names.length; id++) {
    const changes = doc.changes(id, "package");
    if (changes.length === 0) continue;
    const xml = await pkg.part(paths[id]);
    if (xml === undefined) throw new SaveError(`sheet "${names[id]}" is missing from the package (${paths[id]})`);
    pkg.setPart(
      paths[id],
      await writeChanges(xml, changes, {
        sheet: names[id],
        dynamic,
        dynamicIndex: () => editor.dynamicArrayIndex(),
        formulaAt: (row, col) => book.getFormula(id, row, col),
        valueAt: (row, col) => book.getValue(id, row, col),
        spills: (row, col) => {
          const size = book.spillSize(id, row, col);
          return size !== undefined && (size.rows > 1 || size.cols > 1);
        },
      }),
    );
    edited = true;
  }
  editor.flush();
  // Unchanged: the user's own bytes go to the CLI's writer, exactly as `spanwise calc` reads them.
  const bytes = doc.origin.kind === "file" && !structural && !edited ? doc.origin.bytes : await pkg.bytes();
  const loaded = await readBook(bytes);
  loaded.inputs.splice(0);
  const stored = loaded.sheets.map((sheet) => sheet.name);
  if (stored.join("\u0000") !== names.join("\u0000")) throw new SaveError(`the saved package's sheets (${stored.join(", ")}) are not the book's (${names.join(", ")})`);
  await storeResults(loaded, book);
  return loaded.pkg.bytes();
}
