/**
 * `spanwise demo [--out <file.xlsx>] [--force]`: writes the demo workbook (assets/demo) as a
 * real .xlsx with its SPAN formulas in saved form and their cached values, every formula a
 * dynamic array as the host stores them (dynamicArrays.ts), so the host shows the values on
 * open. `npm run demo:xlsx` regenerates assets/spanwise-demo.xlsx with it.
 */
import fs from "fs";
import ExcelJS from "exceljs";
import { DEMO_SHEETS, DEMO_TITLE } from "../../assets/demo/floorFraming";
import { type SheetInput } from "../engine";
import { storeAsDynamicArrays } from "./dynamicArrays";
import { UsageError, type Io } from "./io";
import { writeFileSafely } from "./safeWrite";
import { toSavedForm } from "./savedForm";
import { evaluateBook, readBook, storeResults } from "./xlsxBook";

export const DEMO_WORKBOOK = "assets/spanwise-demo.xlsx";

export async function writeDemoWorkbook(out: string, force: boolean, io: Io): Promise<number> {
  if (fs.existsSync(out) && !force) throw new UsageError(`${out} exists already: add --force to replace it`, 1);
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Spanwise";
  workbook.title = DEMO_TITLE;
  // Fixed document dates: regenerating changes the file only where the demo changed.
  workbook.created = new Date(Date.UTC(2024, 0, 1));
  workbook.modified = workbook.created;
  const sheets: SheetInput[] = DEMO_SHEETS.map((sheet) => ({
    name: sheet.name,
    cells: sheet.cells.map((row) => row.map((input) => (typeof input === "string" && input.startsWith("=") ? toSavedForm(input) : input))),
  }));
  for (const sheet of sheets) {
    const worksheet = workbook.addWorksheet(sheet.name);
    sheet.cells.forEach((row, r) =>
      row.forEach((input, c) => {
        if (input === null || input === undefined) return;
        worksheet.getCell(r + 1, c + 1).value = typeof input === "string" && input.startsWith("=") ? { formula: input.slice(1) } : input;
      }),
    );
    worksheet.getRow(1).font = { bold: true, size: 13 };
    worksheet.getRow(2).font = { italic: true };
    worksheet.columns.forEach((column, index) => {
      column.width = index === 0 ? 24 : 15;
    });
  }
  const book = await readBook(await storeAsDynamicArrays(Buffer.from(await workbook.xlsx.writeBuffer())));
  const evaluated = evaluateBook(book);
  const { problems } = await storeResults(book, evaluated);
  evaluated.destroy();
  if (problems.length > 0) throw new Error(`the demo workbook has error cells: ${problems.map((p) => `${p.sheet}!${p.address} ${p.error} ${p.message}`).join("; ")}`);
  writeFileSafely(out, await book.pkg.write(), undefined, true);
  io.stderr.write(`spanwise: wrote the demo workbook to ${out}\n`);
  return 0;
}
