/**
 * The workbench's programmatic interface, published as `window.spanwiseWorkbench`: what a
 * diagram pane or a test needs from a sheet host — read the selection and its formula, read a
 * range's values, write a block, add a chart; and the grid's editing (undo, fill, paste, rows,
 * column widths) for tests and tools. Addresses are A1 text ("B3", "B3:D5", "Member!B3:D5");
 * without a sheet name, the active sheet.
 */
import type { CellInput, CellResult } from "../engine";
import { parseRange, rangeText, type RangeRef } from "./addresses";
import { drawChart, type ChartSpec } from "./chart";
import type { Workbench } from "./workbench";

export interface SelectionInfo {
  sheet: string;
  /** The selected range, e.g. "B3" or "B3:D5". */
  address: string;
  /** The active (first selected) cell and its formula as typed, if it holds one. */
  activeCell: string;
  formula: string | undefined;
}

export interface WorkbenchApi {
  sheets(): string[];
  activeSheet(): string;
  activateSheet(name: string): void;
  getSelection(): SelectionInfo;
  select(address: string): void;
  getFormula(address: string): string | undefined;
  getValues(range: string): CellResult[][];
  /** Writes a block (values or "=formulas") with its top-left cell at the range's top-left. */
  setValues(range: string, block: CellInput[][]): void;
  setFormula(address: string, formula: string): void;
  onSelectionChange(listener: (selection: SelectionInfo) => void): () => void;
  onChange(listener: () => void): () => void;
  /** Which workbook the page shows: changes each time another book is opened or a new one started. */
  bookSerial(): number;
  /** Draws a line chart under the grid; returns its element id. */
  addChart(spec: ChartSpec): string;
  /** The range a formula cell's result spills over ("B3:F12"), or undefined when it does not spill. */
  spillRange(address: string): string | undefined;
  /** For a cell another formula's result spills into, that formula's cell ("B3", sheet-qualified when the address is); undefined otherwise. */
  spillAnchor(address: string): string | undefined;
  /** Scrolls the grid so the cell is in view (its row is then in the DOM); activates its sheet when named. */
  reveal(address: string): void;
  /** Undoes / redoes the last edit (a block write is one step); false when there is none. */
  undo(): boolean;
  redo(): boolean;
  /** Fills `target` from `source` (both on the active sheet, or `target`'s sheet), relative references moved. */
  fill(source: string, target: string): void;
  /** Selects `at` (default: the selection) and pastes tab-separated text there, as Ctrl+V does. */
  paste(text: string, at?: string): void;
  /** Selects `range` (default: the selection) and gives it as tab-separated text, as Ctrl+C does. */
  copy(range?: string): string;
  /** Inserts / deletes the rows of `range` (e.g. "A5:A7": rows 5 to 7) on its sheet. */
  insertRows(range: string): void;
  deleteRows(range: string): void;
  /** A column's width in px on the active sheet ("B" or a cell of it). */
  columnWidth(column: string): number;
  setColumnWidth(column: string, px: number): void;
  /** The last block write: cells written, cells the engine reported changed, ms in the engine and in painting. */
  lastWriteTiming(): { cells: number; changed: number; engineMs: number; paintMs: number } | undefined;
  /** Milliseconds the grid took to build and show its first sheet. */
  firstRenderMs(): number;
}

export function createApi(bench: Workbench, charts: HTMLElement): WorkbenchApi {
  const sheetOf = (ref: RangeRef): string => ref.sheet ?? bench.activeSheet();
  const info = (): SelectionInfo => {
    const s = bench.getSelection();
    const id = bench.book.sheetId(s.sheet);
    const top = { row: Math.min(s.anchor.row, s.focus.row), col: Math.min(s.anchor.col, s.focus.col) };
    const bottom = { row: Math.max(s.anchor.row, s.focus.row), col: Math.max(s.anchor.col, s.focus.col) };
    return {
      sheet: s.sheet,
      address: rangeText(top, bottom),
      activeCell: rangeText(s.anchor, s.anchor),
      formula: bench.book.getFormula(id, s.anchor.row, s.anchor.col),
    };
  };
  const column = (text: string): number => parseRange(/^[A-Za-z]{1,3}$/.test(text.trim()) ? `${text.trim()}1` : text).from.col;
  const rows = (range: string): { at: number; count: number } => {
    const ref = parseRange(range);
    if (ref.sheet !== undefined) bench.activate(ref.sheet);
    return { at: ref.from.row, count: ref.to.row - ref.from.row + 1 };
  };
  const api: WorkbenchApi = {
    sheets: () => bench.book.sheetNames(),
    activeSheet: () => bench.activeSheet(),
    activateSheet: (name) => bench.activate(name),
    getSelection: info,
    select(address) {
      const ref = parseRange(address);
      bench.select(ref.from, ref.to, ref.sheet);
    },
    getFormula(address) {
      const ref = parseRange(address);
      return bench.book.getFormula(bench.book.sheetId(sheetOf(ref)), ref.from.row, ref.from.col);
    },
    getValues(range) {
      const ref = parseRange(range);
      const id = bench.book.sheetId(sheetOf(ref));
      const out: CellResult[][] = [];
      for (let r = ref.from.row; r <= ref.to.row; r++) {
        const row: CellResult[] = [];
        for (let c = ref.from.col; c <= ref.to.col; c++) row.push(bench.book.getValue(id, r, c));
        out.push(row);
      }
      return out;
    },
    setValues(range, block) {
      const ref = parseRange(range);
      const rows = ref.to.row - ref.from.row + 1;
      const cols = ref.to.col - ref.from.col + 1;
      const single = rows === 1 && cols === 1;
      if (!single && (block.length !== rows || block.some((row) => row.length !== cols))) {
        throw new Error(`the block is ${block.length} x ${block[0]?.length ?? 0}, the range ${range} is ${rows} x ${cols}`);
      }
      bench.setBlock(sheetOf(ref), ref.from, block);
    },
    setFormula(address, formula) {
      api.setValues(address, [[formula]]);
    },
    onSelectionChange(listener) {
      return bench.onSelectionChange(() => listener(info()));
    },
    onChange: (listener) => bench.onChange(listener),
    bookSerial: () => bench.bookSerial(),
    addChart: (spec) => drawChart(charts, spec),
    spillRange(address) {
      const ref = parseRange(address);
      const sheet = sheetOf(ref);
      const size = bench.book.spillSize(bench.book.sheetId(sheet), ref.from.row, ref.from.col);
      if (!size) return undefined;
      const to = { row: ref.from.row + size.rows - 1, col: ref.from.col + size.cols - 1 };
      return `${ref.sheet ? `${ref.sheet}!` : ""}${rangeText(ref.from, to)}`;
    },
    spillAnchor(address) {
      const ref = parseRange(address);
      const anchor = bench.book.spillAnchorOf(bench.book.sheetId(sheetOf(ref)), ref.from.row, ref.from.col);
      if (!anchor) return undefined;
      return `${ref.sheet ? `${ref.sheet}!` : ""}${rangeText(anchor, anchor)}`;
    },
    reveal(address: string) {
      const ref = parseRange(address);
      bench.reveal(ref.from, ref.sheet);
    },
    undo: () => bench.undo(),
    redo: () => bench.redo(),
    fill(source: string, target: string) {
      const from = parseRange(source);
      const to = parseRange(target);
      if (to.sheet !== undefined) bench.activate(to.sheet);
      const block = (r: RangeRef) => ({ top: r.from.row, left: r.from.col, bottom: r.to.row, right: r.to.col });
      bench.fill(block(from), block(to));
    },
    paste(text: string, at?: string) {
      if (at !== undefined) api.select(at);
      bench.paste(text);
    },
    copy(range?: string) {
      if (range !== undefined) api.select(range);
      return bench.copySelection();
    },
    insertRows(range: string) {
      const { at, count } = rows(range);
      bench.insertRows(at, count);
    },
    deleteRows(range: string) {
      const { at, count } = rows(range);
      bench.deleteRows(at, count);
    },
    columnWidth: (text: string) => bench.width(column(text)),
    setColumnWidth: (text: string, px: number) => bench.setColumnWidth(column(text), px),
    lastWriteTiming: () => (bench.lastWrite ? { ...bench.lastWrite } : undefined),
    firstRenderMs: () => bench.firstRenderMs,
  };
  return api;
}
