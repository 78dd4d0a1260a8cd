/**
 * .xlsx workbooks in and out of the engine (exceljs reads and writes; the engine computes).
 *
 * Reading keeps every formula as stored (saved forms such as `_xldudf_SPAN_MOMENT` or
 * `_xlfn.ANCHORARRAY` are understood by the engine) and drops the cached values that fill an
 * array formula's range, so the engine spills into it afresh. Writing keeps each formula's
 * text and stores its new value; a formula whose result spills is written as an array formula
 * over the range it covers now, with the spilled values in that range.
 */
import ExcelJS from "exceljs";
import { columnLetters, isCellError, type CellInput, type CellResult, type SheetInput, type SpanWorkbook } from "../engine";

export interface LoadedBook {
  workbook: ExcelJS.Workbook;
  sheets: SheetInput[];
  formulaCount: number;
  /** SPAN calls written in formulas (an estimate of the solver work, for progress). */
  spanCallCount: number;
}

const EXCEL_EPOCH = Date.UTC(1899, 11, 30);
const SPAN_CALL = /(?:_xldudf_|_xll\.)?SPAN[._][A-Z]+\s*\(/gi;

function serialOf(date: Date): number {
  return (date.getTime() - EXCEL_EPOCH) / 86400000;
}

function inputOf(cell: ExcelJS.Cell): CellInput {
  if (cell.type === ExcelJS.ValueType.Formula) return `=${cell.formula}`;
  const value = cell.value as unknown;
  if (value === null || value === undefined) return null;
  if (typeof value === "number" || typeof value === "boolean") return value;
  if (typeof value === "string") return value.startsWith("=") ? `'${value}` : value;
  if (value instanceof Date) return serialOf(value);
  if (typeof value === "object") {
    const v = value as { richText?: { text: string }[]; text?: unknown; error?: string; result?: unknown };
    if (v.richText) return v.richText.map((run) => run.text).join("");
    if (typeof v.text === "string") return v.text;
    if (typeof v.error === "string") return v.error;
  }
  return String(value);
}

/** Reads a workbook; throws an Error whose message says why it cannot be read. */
export async function readBook(path: string): Promise<LoadedBook> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(path);
  if (workbook.worksheets.length === 0) throw new Error("it holds no worksheets");
  const sheets: SheetInput[] = [];
  let formulaCount = 0;
  let spanCallCount = 0;
  for (const sheet of workbook.worksheets) {
    const cells: CellInput[][] = [];
    const spilledInto: string[] = [];
    sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
      row.eachCell({ includeEmpty: false }, (cell, colNumber) => {
        const input = inputOf(cell);
        (cells[rowNumber - 1] ??= [])[colNumber - 1] = input;
        if (typeof input === "string" && input.startsWith("=")) {
          formulaCount++;
          spanCallCount += input.match(SPAN_CALL)?.length ?? 0;
          const model = cell.value as { shareType?: string; ref?: string };
          if (model && model.shareType === "array" && model.ref) spilledInto.push(model.ref);
        }
      });
    });
    for (const ref of spilledInto) clearSpillArea(cells, ref);
    for (let r = 0; r < cells.length; r++) cells[r] ??= [];
    sheets.push({ name: sheet.name, cells });
  }
  return { workbook, sheets, formulaCount, spanCallCount };
}

function parseCell(text: string): { row: number; col: number } {
  const match = /^\$?([A-Za-z]+)\$?(\d+)$/.exec(text);
  if (!match) throw new Error(`bad cell address ${text}`);
  let col = 0;
  for (const letter of match[1].toUpperCase()) col = col * 26 + letter.charCodeAt(0) - 64;
  return { row: Number(match[2]) - 1, col: col - 1 };
}

/** Empties an array formula's range except its top-left cell (cached values of the last spill). */
function clearSpillArea(cells: CellInput[][], ref: string): void {
  const [from, to = from] = ref.split(":");
  const a = parseCell(from);
  const b = parseCell(to);
  for (let row = a.row; row <= b.row; row++)
    for (let col = a.col; col <= b.col; col++) if ((row !== a.row || col !== a.col) && cells[row]) cells[row][col] = null;
}

function excelValue(value: CellResult): ExcelJS.CellValue {
  if (value === null) return null;
  if (isCellError(value)) return { error: value.error as ExcelJS.CellErrorValue["error"] };
  return value;
}

/** Stores the engine's values into the workbook read by readBook. */
export function storeResults(book: LoadedBook, evaluated: SpanWorkbook, onCell?: () => void): void {
  book.workbook.worksheets.forEach((sheet, index) => {
    const id = evaluated.sheetId(book.sheets[index].name);
    const values = evaluated.getSheetValues(id);
    const inputs = book.sheets[index].cells;
    const covered = new Set<string>();
    for (const address of evaluated.formulaCells(id)) {
      const formula = inputs[address.row]?.[address.col];
      if (typeof formula !== "string" || !formula.startsWith("=")) continue;
      const cell = sheet.getCell(address.row + 1, address.col + 1);
      const result = excelValue(values[address.row][address.col]);
      const spill = evaluated.spillSize(id, address.row, address.col);
      if (spill && (spill.rows > 1 || spill.cols > 1)) {
        const ref = `${columnLetters(address.col)}${address.row + 1}:${columnLetters(address.col + spill.cols - 1)}${address.row + spill.rows}`;
        cell.value = { formula: formula.slice(1), result, shareType: "array", ref } as ExcelJS.CellValue;
        for (let r = 0; r < spill.rows; r++)
          for (let c = 0; c < spill.cols; c++) {
            if (r === 0 && c === 0) continue;
            covered.add(`${address.row + r}:${address.col + c}`);
            sheet.getCell(address.row + r + 1, address.col + c + 1).value = excelValue(values[address.row + r]?.[address.col + c] ?? null);
          }
      } else {
        cell.value = { formula: formula.slice(1), result } as ExcelJS.CellValue;
      }
      onCell?.();
    }
    // Cells an old spill covered and the new one does not: empty, as in the spreadsheet.
    inputs.forEach((row, r) =>
      row.forEach((input, c) => {
        if (input === null && !covered.has(`${r}:${c}`)) {
          const cell = sheet.getCell(r + 1, c + 1);
          if (cell.value !== null && cell.type !== ExcelJS.ValueType.Merge) cell.value = null;
        }
      }),
    );
  });
}
