/**
 * The workbook the workbench holds, and where it came from: a user's .xlsx (its bytes are kept,
 * so saving rewrites that package as `spanwise calc` does) or plain sheets (the demo, a new
 * blank book). What the user changed is never tracked edit by edit: it is the difference
 * between the engine's cells now and the cells as first read (`baseline`), so every way of
 * editing (typing, paste, fill, undo) is covered, and undoing back to the original leaves
 * nothing changed.
 */
import JSZip from "jszip";
import { SpanWorkbook, type CellInput, type SheetInput } from "../../engine";
import { evaluateBook, readBook } from "../../cli/xlsxBook";
import { checkCellCount, checkFileSize, checkUnpackedSize, countCells } from "./limits";

export type Origin = { kind: "file"; bytes: Uint8Array } | { kind: "sheets"; sheets: SheetInput[] };

/** A cell as it should be now: row, column and input (null: empty). */
export type CellChange = readonly [row: number, col: number, input: CellInput];

/** Sheet `sheet` (engine id) and one cell of it. */
export type SheetCellChange = readonly [sheet: number, row: number, col: number, input: CellInput];

function isEmpty(input: CellInput): boolean {
  return input === null || input === undefined || input === "";
}

function key(row: number, col: number): string {
  return `${row}:${col}`;
}

/** The non-empty inputs of a sheet, by "row:col". */
function snapshot(book: SpanWorkbook, sheet: number): Map<string, CellInput> {
  const out = new Map<string, CellInput>();
  book.sheetInputs(sheet).forEach((line, row) =>
    line.forEach((input, col) => {
      if (!isEmpty(input)) out.set(key(row, col), input);
    }),
  );
  return out;
}

/** The zip's declared unpacked size (jszip keeps it from the central directory; undefined where it does not). */
export async function declaredUnpackedSize(bytes: Uint8Array): Promise<number | undefined> {
  const zip = await JSZip.loadAsync(bytes);
  let total = 0;
  let known = false;
  zip.forEach((_path, file) => {
    const size = (file as unknown as { _data?: { uncompressedSize?: unknown } })._data?.uncompressedSize;
    if (typeof size === "number") {
      total += size;
      known = true;
    }
  });
  return known ? total : undefined;
}

export class WorkbenchDocument {
  private constructor(
    /** The file name shown and offered on save. */
    public name: string,
    readonly origin: Origin,
    readonly book: SpanWorkbook,
    /** The origin's sheet names, in order: engine ids 0 .. n-1; sheets added later follow. */
    readonly originSheets: readonly string[],
    private readonly baseline: Map<string, CellInput>[],
  ) {}

  /** Reads and evaluates a user's .xlsx as `spanwise calc` does; throws (LimitError, BookError, PackageError) saying why not. */
  static async fromFile(name: string, bytes: Uint8Array): Promise<WorkbenchDocument> {
    checkFileSize(bytes.byteLength);
    const unpacked = await declaredUnpackedSize(bytes).catch(() => undefined);
    if (unpacked !== undefined) checkUnpackedSize(unpacked);
    const loaded = await readBook(bytes);
    checkCellCount(countCells(loaded.inputs), loaded.inputs.length);
    const book = evaluateBook(loaded);
    const names = loaded.sheets.map((sheet) => sheet.name);
    return new WorkbenchDocument(name, { kind: "file", bytes }, book, names, names.map((_, id) => snapshot(book, id)));
  }

  /** A book of plain sheets (the demo, a blank book); the sheets are copied. */
  static fromSheets(name: string, sheets: readonly SheetInput[]): WorkbenchDocument {
    checkCellCount(countCells(sheets), sheets.length);
    const copy = sheets.map((sheet) => ({ name: sheet.name, cells: sheet.cells.map((row) => (row ? row.slice() : [])) }));
    const book = new SpanWorkbook(copy.map((sheet) => ({ name: sheet.name, cells: sheet.cells.map((row) => row.slice()) })));
    return new WorkbenchDocument(name, { kind: "sheets", sheets: copy }, book, copy.map((s) => s.name), copy.map((_, id) => snapshot(book, id)));
  }

  /**
   * The cells of sheet `sheet` that differ from `against`: the origin as first read
   * ("origin"), or what the saved package holds ("package": the origin for a file, nothing for
   * plain sheets, which are written afresh). Sorted by row, then column.
   */
  changes(sheet: number, against: "origin" | "package" = "origin"): CellChange[] {
    const base = against === "package" && this.origin.kind === "sheets" ? new Map<string, CellInput>() : (this.baseline[sheet] ?? new Map<string, CellInput>());
    const out: CellChange[] = [];
    const seen = new Set<string>();
    this.book.sheetInputs(sheet).forEach((line, row) =>
      line.forEach((input, col) => {
        if (isEmpty(input)) return;
        const k = key(row, col);
        seen.add(k);
        if (base.get(k) !== input) out.push([row, col, input]);
      }),
    );
    for (const k of base.keys()) {
      if (seen.has(k)) continue;
      const [row, col] = k.split(":").map(Number);
      out.push([row, col, null]);
    }
    return out.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  }

  /** Every change from the origin, all sheets. */
  allChanges(): SheetCellChange[] {
    const out: SheetCellChange[] = [];
    this.book.sheetNames().forEach((_, sheet) => {
      for (const [row, col, input] of this.changes(sheet)) out.push([sheet, row, col, input]);
    });
    return out;
  }

  /** Sheet names now, by engine id. */
  sheetNames(): string[] {
    return this.book.sheetNames();
  }

  addSheet(name: string): number {
    const id = this.book.addSheet(name);
    this.baseline[id] ??= new Map();
    return id;
  }

  renameSheet(from: string, to: string): void {
    this.book.renameSheet(this.book.sheetId(from), to);
  }

  /**
   * Brings the document to a stored state: sheets beyond the origin's are added, every sheet
   * takes its stored name, then the changed cells are set (one batch per sheet).
   */
  apply(sheetNames: readonly string[], changes: readonly SheetCellChange[]): void {
    if (sheetNames.length < this.originSheets.length) throw new Error(`the stored work has ${sheetNames.length} sheets, its origin ${this.originSheets.length}`);
    sheetNames.forEach((_, id) => {
      if (id >= this.book.sheetNames().length) this.addSheet(`\u0001new ${id}`);
    });
    // Through temporary names, so that names swapped between sheets never clash on the way.
    const renamed = sheetNames.map((name, id) => (this.book.sheetNames()[id] === name ? -1 : id)).filter((id) => id >= 0);
    for (const id of renamed) this.book.renameSheet(id, `\u0001${id}`);
    for (const id of renamed) this.book.renameSheet(id, sheetNames[id]);
    const bySheet = new Map<number, [number, number, CellInput][]>();
    for (const [sheet, row, col, input] of changes) {
      if (sheet >= sheetNames.length) throw new Error(`a stored cell belongs to sheet ${sheet + 1}, of ${sheetNames.length}`);
      let list = bySheet.get(sheet);
      if (!list) bySheet.set(sheet, (list = []));
      list.push([row, col, input]);
    }
    for (const [sheet, cells] of bySheet) this.book.setScattered(sheet, cells);
  }

  destroy(): void {
    this.book.destroy();
  }
}
