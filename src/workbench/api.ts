/**
 * The workbench's programmatic interface, published as `window.spanwiseWorkbench`: what a
 * diagram pane or a test needs from a sheet host — read the selection and its formula, read a
 * range's values, write a block, add a chart. Addresses are A1 text ("B3", "B3:D5",
 * "Member!B3:D5"); without a sheet name, the active sheet.
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
  /** Draws a line chart under the grid; returns its element id. */
  addChart(spec: ChartSpec): string;
  /** The range a formula cell's result spills over ("B3:F12"), or undefined when it does not spill. */
  spillRange(address: string): string | undefined;
  /** For a cell another formula's result spills into, that formula's cell ("B3", sheet-qualified when the address is); undefined otherwise. */
  spillAnchor(address: string): string | undefined;
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
  };
  return api;
}
