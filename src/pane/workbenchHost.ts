/**
 * The pane's host over the workbench page's programmatic interface (`window.spanwiseWorkbench`).
 * Charts go to the workbench's own chart strip, drawn from the values of the requested ranges.
 */
import type { WorkbenchApi } from "../workbench/api";
import { blockText, parseBlock } from "./addresses";
import { qualify, splitAddress, type FormulaCell, type CellInput, type CellValue, type ChartRequest, type Selection, type SheetHost } from "./host";

/** The parts of the workbench interface the pane uses; optional ones are used when present. */
export type WorkbenchLike = Pick<WorkbenchApi, "getSelection" | "getFormula" | "getValues" | "setValues" | "onSelectionChange" | "addChart" | "spillAnchor"> & {
  sheets?(): string[];
  spillRange?(address: string): string | undefined;
  resolveName?(name: string, scope?: string): string | undefined;
  bookSerial?(): number;
};

function cellValue(value: unknown): CellValue {
  if (value === null || value === undefined) return null;
  if (typeof value === "object") return String((value as { error?: unknown }).error ?? "#VALUE!");
  return value as CellValue;
}

/** The part of each workbench sheet searched for SPAN formulas: A1 to AZ1000. */
export const FORMULA_SCAN = { rows: 1000, cols: 52 };

function numbers(rows: CellValue[][]): number[] {
  return rows.map((row) => (typeof row[0] === "number" ? row[0] : Number.NaN));
}

export class WorkbenchHost implements SheetHost {
  readonly kind = "workbench";
  /** True while this host writes into the workbench (see onSelectionChange). */
  private writing = false;
  /**
   * The workbench's equivalent of the document settings: kept beside its in-page workbook for
   * as long as the page holds it (the workbench has no add-in settings of its own). Values are
   * stored as JSON text, so what is read back is a copy, as a host's settings would be. They
   * belong to one workbook: when the workbench shows another (a file opened, a new book),
   * they start empty, as a spreadsheet's document settings do for another document.
   */
  private readonly settings = new Map<string, string>();
  private settingsBook: number | undefined;
  constructor(private readonly api: WorkbenchLike) {}

  private write(address: string, block: CellInput[][]): void {
    this.writing = true;
    try {
      this.api.setValues(address, block);
    } finally {
      this.writing = false;
    }
  }

  async getSelection(): Promise<Selection> {
    const s = this.api.getSelection();
    const value = cellValue(this.api.getValues(qualify(s.sheet, s.activeCell))[0]?.[0]);
    return { sheet: s.sheet, cell: s.activeCell, formula: s.formula, value, range: s.address };
  }

  async getValues(address: string): Promise<CellValue[][]> {
    return this.api.getValues(address).map((row) => row.map(cellValue));
  }

  async resolveName(name: string, scope: string): Promise<string | undefined> {
    return this.api.resolveName?.(name, scope);
  }

  /**
   * The workbench reports spills itself when its interface has spillRange; otherwise the
   * spill is taken as the run of value cells right of and below the anchor that hold no
   * formula of their own (how a spill shows through getFormula and getValues).
   */
  async spillRange(address: string): Promise<string | undefined> {
    if (this.api.spillRange) return this.api.spillRange(address);
    const { sheet = this.api.getSelection().sheet, address: cell } = splitAddress(address);
    const anchor = parseBlock(cell).from;
    if (this.api.getFormula(qualify(sheet, blockText({ from: anchor, to: anchor }))) === undefined) return undefined;
    const spilled = (row: number, col: number): boolean => {
      const at = qualify(sheet, blockText({ from: { row, col }, to: { row, col } }));
      const value = cellValue(this.api.getValues(at)[0]?.[0]);
      return this.api.getFormula(at) === undefined && value !== null && value !== "";
    };
    let cols = 1;
    while (cols < 64 && spilled(anchor.row, anchor.col + cols)) cols++;
    let rows = 1;
    while (rows < 20000 && spilled(anchor.row + rows, anchor.col)) rows++;
    return qualify(sheet, blockText({ from: anchor, to: { row: anchor.row + rows - 1, col: anchor.col + cols - 1 } }));
  }

  /** Asks the formula engine, cell by cell, which formula each cell's value spills from. */
  async spillsInto(address: string): Promise<string[]> {
    const { sheet = this.api.getSelection().sheet, address: range } = splitAddress(address);
    const block = parseBlock(range);
    const inside = (cell: string): boolean => {
      const at = parseBlock(cell).from;
      return at.row >= block.from.row && at.row <= block.to.row && at.col >= block.from.col && at.col <= block.to.col;
    };
    const found = new Set<string>();
    for (let r = block.from.row; r <= block.to.row; r++) {
      for (let c = block.from.col; c <= block.to.col; c++) {
        const anchor = this.api.spillAnchor(qualify(sheet, blockText({ from: { row: r, col: c }, to: { row: r, col: c } })));
        if (anchor === undefined) continue;
        const { address: cell } = splitAddress(anchor);
        if (!inside(cell)) found.add(qualify(sheet, cell));
      }
    }
    return [...found];
  }

  async isEmpty(address: string): Promise<boolean> {
    const { sheet = this.api.getSelection().sheet, address: range } = splitAddress(address);
    const block = parseBlock(range);
    const values = this.api.getValues(address);
    for (let r = block.from.row; r <= block.to.row; r++) {
      for (let c = block.from.col; c <= block.to.col; c++) {
        const value = cellValue(values[r - block.from.row]?.[c - block.from.col]);
        if (value !== null && value !== "") return false;
        if (this.api.getFormula(qualify(sheet, blockText({ from: { row: r, col: c }, to: { row: r, col: c } }))) !== undefined) return false;
      }
    }
    return true;
  }

  async writeBlock(address: string, block: CellInput[][]): Promise<void> {
    this.write(address, block);
  }

  async clear(address: string): Promise<void> {
    const block = parseBlock(splitAddress(address).address);
    const rows = block.to.row - block.from.row + 1;
    const cols = block.to.col - block.from.col + 1;
    this.write(address, Array.from({ length: rows }, () => Array.from({ length: cols }, () => null)));
  }

  async addChart(request: ChartRequest): Promise<void> {
    const x = numbers(await this.getValues(qualify(request.sheet, request.x)));
    const series = await Promise.all(
      request.series.map(async (s) => ({ name: s.name, values: numbers(await this.getValues(qualify(request.sheet, s.y))) })),
    );
    this.api.addChart({ title: request.title, x, series });
  }

  /**
   * Calls back on selection changes. The workbench re-announces its unchanged selection after
   * every write (its grid re-renders); the announcements made by this host's own writes are
   * dropped, since they are no selection change (the spreadsheet host's event is named for the
   * selection; that it stays silent on an add-in's write is on DEVELOPERS.md's list to confirm):
   * otherwise the pane's table write would re-read the member and wipe the outcome it just showed.
   */
  onSelectionChange(listener: () => void): () => void {
    return this.api.onSelectionChange(() => {
      if (!this.writing) listener();
    });
  }

  theme(): "light" | "dark" | undefined {
    return undefined;
  }

  /**
   * The SPAN formula cells of the workbench's sheets (FORMULA_SCAN of each), from its values:
   * a formula cell always has a value, so only cells with one are asked for their formula.
   */
  async spanFormulas(limit: number): Promise<FormulaCell[]> {
    const out: FormulaCell[] = [];
    const last = blockText({ from: { row: FORMULA_SCAN.rows - 1, col: FORMULA_SCAN.cols - 1 }, to: { row: FORMULA_SCAN.rows - 1, col: FORMULA_SCAN.cols - 1 } });
    for (const sheet of this.api.sheets?.() ?? [this.api.getSelection().sheet]) {
      const values = this.api.getValues(qualify(sheet, `A1:${last}`));
      for (let r = 0; r < values.length; r++) {
        for (let c = 0; c < values[r].length; c++) {
          if (values[r][c] === null || values[r][c] === undefined) continue;
          const cell = blockText({ from: { row: r, col: c }, to: { row: r, col: c } });
          const formula = this.api.getFormula(qualify(sheet, cell));
          if (formula === undefined || !/SPAN/i.test(formula)) continue;
          out.push({ sheet, cell, formula });
          if (out.length >= limit) return out;
        }
      }
    }
    return out;
  }

  workbookKey(): unknown {
    return this.api.bookSerial?.();
  }

  /** The settings of the workbook shown now (cleared when it is another one than they were kept for). */
  private bookSettings(): Map<string, string> {
    const book = this.api.bookSerial?.();
    if (book !== this.settingsBook) {
      this.settings.clear();
      this.settingsBook = book;
    }
    return this.settings;
  }

  async readSetting(name: string): Promise<unknown> {
    const text = this.bookSettings().get(name);
    return text === undefined ? undefined : JSON.parse(text);
  }

  async writeSetting(name: string, value: unknown): Promise<void> {
    this.bookSettings().set(name, JSON.stringify(value));
  }
}
