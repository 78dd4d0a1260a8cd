/**
 * A read-only SheetHost over a workbook computed by the engine, so the CLI reads a SPAN cell's
 * arguments exactly as the pane does (src/pane/memberFromSheet.ts). Writing, charts and
 * selection events are refused: the report never changes the workbook.
 */
import type { SpanWorkbook } from "../engine";
import { isCellError } from "../engine";
import { blockText, parseBlock } from "../pane/addresses";
import { qualify, splitAddress, type CellValue, type Selection, type SheetHost } from "../pane/host";

export class BookHost implements SheetHost {
  readonly kind = "workbook file";
  private selected: { sheet: string; cell: string } | undefined;

  constructor(private readonly book: SpanWorkbook) {}

  /** The sheet id of a name, matched as the host matches sheet names (case-insensitively). */
  sheetOf(name: string): number {
    const found = this.book.sheetNames().find((n) => n.toLowerCase() === name.toLowerCase());
    if (found === undefined) throw new Error(`the workbook has no sheet named "${name}" (sheets: ${this.book.sheetNames().join(", ")})`);
    return this.book.sheetId(found);
  }

  sheetName(name: string): string {
    return this.book.sheetNames()[this.sheetOf(name)] ?? name;
  }

  select(sheet: string, cell: string): void {
    this.selected = { sheet: this.sheetName(sheet), cell };
  }

  formulaAt(sheet: string, cell: string): string | undefined {
    const at = parseBlock(cell).from;
    return this.book.getFormula(this.sheetOf(sheet), at.row, at.col);
  }

  async getSelection(): Promise<Selection> {
    if (!this.selected) throw new Error("no cell selected");
    const { sheet, cell } = this.selected;
    const value = (await this.getValues(qualify(sheet, cell)))[0][0];
    return { sheet, cell, formula: this.formulaAt(sheet, cell), value, range: cell };
  }

  async getValues(address: string): Promise<CellValue[][]> {
    const { sheet = this.selected?.sheet, address: range } = splitAddress(address);
    if (sheet === undefined) throw new Error(`${address}: no sheet`);
    const id = this.sheetOf(sheet);
    const block = parseBlock(range);
    const rows: CellValue[][] = [];
    for (let r = block.from.row; r <= block.to.row; r++) {
      const row: CellValue[] = [];
      for (let c = block.from.col; c <= block.to.col; c++) {
        const v = this.book.getValue(id, r, c);
        row.push(isCellError(v) ? v.error : v);
      }
      rows.push(row);
    }
    return rows;
  }

  /** The engine keeps no defined names, so a name argument is reported as unresolved by the reader. */
  async resolveName(): Promise<string | undefined> {
    return undefined;
  }

  async spillRange(address: string): Promise<string | undefined> {
    const { sheet = this.selected?.sheet ?? "", address: cell } = splitAddress(address);
    const at = parseBlock(cell).from;
    const size = this.book.spillSize(this.sheetOf(sheet), at.row, at.col);
    if (!size) return undefined;
    return qualify(this.sheetName(sheet), blockText({ from: at, to: { row: at.row + size.rows - 1, col: at.col + size.cols - 1 } }));
  }

  async isEmpty(address: string): Promise<boolean> {
    return (await this.getValues(address)).every((row) => row.every((v) => v === null || v === ""));
  }

  async writeBlock(): Promise<void> {
    throw new Error("the report reads the workbook only");
  }

  async clear(): Promise<void> {
    throw new Error("the report reads the workbook only");
  }

  async addChart(): Promise<void> {
    throw new Error("the report reads the workbook only");
  }

  onSelectionChange(): () => void {
    return () => undefined;
  }

  theme(): "light" | "dark" | undefined {
    return undefined;
  }
}
