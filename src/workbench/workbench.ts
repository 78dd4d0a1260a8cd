/**
 * The workbench page: a grid over a SpanWorkbook with sheet tabs, a formula bar, an editable
 * name box, a status line and selection. Only the rows in view are in the DOM (grid/viewport);
 * after an edit only the cells the engine reports as changed are painted again. Blocks (paste,
 * fill, delete, undo) go to the engine in one call and are one undo step (grid/history).
 */
import { SHEET_LIMITS, isCellError, type CellInput, type SpanWorkbook } from "../engine";
import { cellText, rangeText, type CellRef } from "./addresses";
import { numberTexts } from "./format";
import { anchorKey, paintCell, type PaintContext } from "./grid/cells";
import { clipboardText, parseTsv, toTsv } from "./grid/clipboard";
import { ColumnWidths, ROW_HEADER_WIDTH, TextMeasure } from "./grid/columns";
import { filledBlock, fillDownSource, fillRightSource, seriesBlock } from "./grid/fill";
import { tableHint } from "./grid/headerHint";
import { History, type BlockStep, type Step } from "./grid/history";
import { mapReferences, namesSheet } from "../engine/references";
import { inputOf, shownText } from "./grid/inputs";
import { MAX_BLOCK_CELLS, blockCols, blockOf, blockRows, inBlock, parseNameBox, type Block, type Selection } from "./grid/selection";
import { HEADER_HEIGHT, ROW_HEIGHT, rowWindow, scrollFor, type RowWindow } from "./grid/viewport";

export type { Selection } from "./grid/selection";

const MIN_ROWS = 40;
const MIN_COLS = 12;
const EXTRA_ROWS = 10;
const EXTRA_COLS = 3;
/**
 * The most columns the grid shows (A to SR): rows are virtual, columns are not, so a selection
 * or block reaching column XFD does not put 16,384 cells a row into the page. Cells further
 * right still compute and are read and written through formulas and the API.
 */
export const MAX_SHOWN_COLS = 512;
const GRID_FONT = "13px system-ui, sans-serif";

export interface WorkbenchElements {
  sheet: HTMLElement;
  tabs: HTMLElement;
  formulaBar: HTMLInputElement;
  nameBox: HTMLElement;
  status: HTMLElement;
  /** Optional buttons: insert and delete the selected rows (default: #insert-rows, #delete-rows of the page). */
  insertRows?: HTMLElement;
  deleteRows?: HTMLElement;
}

type Listener = (selection: Selection) => void;

/** What the last copy inside the workbench held, so a paste of the same text pastes formulas. */
interface Copied {
  text: string;
  block: Block;
  inputs: CellInput[][];
  /** The sheet copied from. */
  sheet: string;
  /** A cut: the paste moves the cells (once), as a spreadsheet does. */
  cut?: boolean;
}

export class Workbench {
  private active = 0;
  private selection: Selection;
  private readonly selectionListeners = new Set<Listener>();
  private readonly changeListeners = new Set<() => void>();
  private readonly history = new History();
  readonly columns = new ColumnWidths();
  private readonly measure = new TextMeasure(GRID_FONT);
  /** Rendered rows by sheet row, and their cells. */
  private rendered = new Map<number, HTMLTableCellElement[]>();
  private window: RowWindow = { first: 0, last: -1 };
  /** The sheet height (rows) the spacers were last sized for. */
  private windowTotal = 0;
  private totalRows = 0;
  private totalCols = 0;
  private table!: HTMLTableElement;
  private colgroup!: HTMLTableColElement;
  private headRow!: HTMLTableRowElement;
  private body!: HTMLTableSectionElement;
  private topSpacer!: HTMLTableCellElement;
  private bottomSpacer!: HTMLTableCellElement;
  private fillHandle!: HTMLDivElement;
  private marked: HTMLTableCellElement[] = [];
  private copied: Copied | undefined;
  private drag: { kind: "select" | "fill"; target?: Block } | undefined;
  private nameBoxInput: HTMLInputElement | undefined;
  /** The book's sheet names when the grid last drew its tabs (see refresh). */
  private sheetNamesSeen = "";
  /** The selected cell's input as the formula bar last showed it (an edit differs from it). */
  private shownInput = "";

  constructor(
    private current: SpanWorkbook,
    private el: WorkbenchElements,
  ) {
    const started = performance.now();
    this.selection = { sheet: current.sheetNames()[0], anchor: { row: 0, col: 0 }, focus: { row: 0, col: 0 } };
    this.nameBoxInput = el.nameBox instanceof HTMLInputElement ? el.nameBox : undefined;
    // The row buttons of workbench.html, when the caller did not pass them.
    this.el = { ...el, insertRows: el.insertRows ?? document.getElementById("insert-rows") ?? undefined, deleteRows: el.deleteRows ?? document.getElementById("delete-rows") ?? undefined };
    this.buildGrid();
    this.sheetNamesSeen = current.sheetNames().join("\u0000");
    this.renderTabs();
    this.renderSheet();
    this.bindEvents();
    this.showSelection();
    this.firstRenderMs = performance.now() - started;
  }

  /** How long the grid took to build and show its first sheet (the workbook was evaluated before). */
  readonly firstRenderMs: number;

  /** Which workbook the grid shows: 0 for the first, one more at each replaceBook (the pane keeps its per-workbook settings by it). */
  private books = 0;
  bookSerial(): number {
    return this.books;
  }

  /** The workbook the grid shows (replaced by replaceBook). */
  get book(): SpanWorkbook {
    return this.current;
  }

  /**
   * Shows another workbook (a file opened, a new blank book): the grid, tabs and selection
   * start over on `sheet` (default the first sheet), the undo history is cleared. The previous
   * book is not destroyed here: the caller owns it. Change listeners are told, as after an edit.
   */
  replaceBook(book: SpanWorkbook, sheet?: string): void {
    const names = book.sheetNames();
    const index = sheet === undefined ? 0 : names.indexOf(sheet);
    if (index < 0) throw new Error(`no sheet named "${sheet}"`);
    this.current = book;
    this.books++;
    this.active = index;
    this.history.clear();
    this.sheetNamesSeen = names.join("\u0000");
    this.copied = undefined;
    this.selection = { sheet: names[index], anchor: { row: 0, col: 0 }, focus: { row: 0, col: 0 } };
    this.renderTabs();
    this.renderSheet();
    this.showSelection();
    this.changed();
  }

  /** Draws tabs and grid again from the book (after sheets were added or renamed in it). */
  refresh(): void {
    // Undo steps name their sheets: after sheets were renamed or removed they would write elsewhere.
    const names = this.book.sheetNames().join("\u0000");
    if (names !== this.sheetNamesSeen) this.history.clear();
    this.sheetNamesSeen = names;
    if (this.active >= this.book.sheetNames().length) this.active = 0;
    this.selection = { ...this.selection, sheet: this.activeSheet() };
    this.renderTabs();
    this.renderSheet();
    this.showSelection();
  }

  activeSheet(): string {
    return this.book.sheetNames()[this.active];
  }

  activate(name: string): void {
    const index = this.book.sheetNames().indexOf(name);
    if (index < 0) throw new Error(`no sheet named "${name}"`);
    if (index === this.active) return;
    this.active = index;
    this.selection = { sheet: name, anchor: { row: 0, col: 0 }, focus: { row: 0, col: 0 } };
    this.renderTabs();
    this.el.sheet.scrollTop = 0;
    this.el.sheet.scrollLeft = 0;
    this.renderSheet();
    this.showSelection();
  }

  getSelection(): Selection {
    return { ...this.selection, anchor: { ...this.selection.anchor }, focus: { ...this.selection.focus } };
  }

  select(anchor: CellRef, focus: CellRef = anchor, sheet?: string): void {
    if (sheet !== undefined) this.activate(sheet);
    const clamp = (ref: CellRef): CellRef => ({ row: Math.min(SHEET_LIMITS.rows - 1, Math.max(0, ref.row)), col: Math.min(SHEET_LIMITS.cols - 1, Math.max(0, ref.col)) });
    this.selection = { sheet: this.activeSheet(), anchor: clamp(anchor), focus: clamp(focus) };
    this.ensureSize(Math.max(anchor.row, focus.row) + 1, Math.max(anchor.col, focus.col) + 1);
    this.reveal(this.selection.focus);
    this.showSelection();
  }

  /** Scrolls so a cell is in view (its row then is in the DOM). */
  reveal(ref: CellRef, sheet?: string): void {
    if (sheet !== undefined && sheet !== this.activeSheet()) this.activate(sheet);
    this.ensureSize(ref.row + 1, ref.col + 1);
    const view = this.el.sheet;
    const top = scrollFor(ref.row, view.scrollTop, view.clientHeight);
    if (top !== undefined) view.scrollTop = top;
    const col = Math.min(ref.col, this.totalCols - 1);
    const left = ROW_HEADER_WIDTH + this.columnLeft(col);
    const right = left + this.width(col);
    if (left - ROW_HEADER_WIDTH < view.scrollLeft) view.scrollLeft = left - ROW_HEADER_WIDTH;
    else if (right > view.scrollLeft + view.clientWidth) view.scrollLeft = right - view.clientWidth;
    this.renderWindow();
  }

  onSelectionChange(listener: Listener): () => void {
    this.selectionListeners.add(listener);
    return () => this.selectionListeners.delete(listener);
  }

  /** Called after every edit (typed cell, paste, fill, delete, undo, redo, rows) and after replaceBook. */
  onChange(listener: () => void): () => void {
    this.changeListeners.add(listener);
    return () => this.changeListeners.delete(listener);
  }

  /** Sets a block of cells (values or "=formulas") from a top-left corner and recalculates: one engine call, one undo step. */
  setBlock(sheet: string, top: CellRef, block: readonly (readonly CellInput[])[]): void {
    this.writeBlock(sheet, top.row, top.col, block, true);
  }

  // ---- editing --------------------------------------------------------------------------

  undo(): boolean {
    const step = this.history.undo();
    if (!step) return false;
    return this.guarded("undo", () => this.revert(step));
  }

  redo(): boolean {
    const step = this.history.redo();
    if (!step) return false;
    return this.guarded("redo", () => this.apply(step, false));
  }

  /** An undo or redo that cannot be done (its sheet is gone) says so and forgets the history, never half-applies silently. */
  private guarded(what: string, run: () => void): boolean {
    try {
      run();
      return true;
    } catch (error) {
      this.history.clear();
      this.say(`cannot ${what}: ${(error as Error).message}`, true);
      return false;
    }
  }

  /** Fills `target` from `source` (a block of the active sheet), formulas' relative references moved; `series` (the fill handle): numbers extended as linear series (grid/fill seriesBlock). */
  fill(source: Block, target: Block, series?: "down" | "right"): void {
    const id = this.sheetId();
    const inputAt = (r: number, c: number) => this.book.getInput(id, r, c);
    const block = series ? seriesBlock(source, target, series, inputAt) : filledBlock(source, target, inputAt);
    this.writeBlock(this.activeSheet(), target.top, target.left, block, true);
  }

  fillDown(): void {
    const plan = fillDownSource(this.selectedBlock());
    if (plan) this.fill(plan.source, plan.target);
  }

  fillRight(): void {
    const plan = fillRightSource(this.selectedBlock());
    if (plan) this.fill(plan.source, plan.target);
  }

  /** Empties the selected cells (one undo step). */
  clearSelection(): void {
    const block = this.selectedBlock();
    if (!this.withinLimit(block)) return;
    const empty = Array.from({ length: blockRows(block) }, () => Array<CellInput>(blockCols(block)).fill(null));
    this.writeBlock(this.activeSheet(), block.top, block.left, empty, true);
  }

  /** The selection as tab-separated text (values in full precision), remembered for a paste of formulas. */
  copySelection(): string {
    const block = this.selectedBlock();
    if (!this.withinLimit(block)) return "";
    const id = this.sheetId();
    const rows: string[][] = [];
    const inputs: CellInput[][] = [];
    for (let r = block.top; r <= block.bottom; r++) {
      const texts: string[] = [];
      const line: CellInput[] = [];
      for (let c = block.left; c <= block.right; c++) {
        texts.push(clipboardText(this.book.getValue(id, r, c)));
        line.push(this.book.getInput(id, r, c) ?? null);
      }
      rows.push(texts);
      inputs.push(line);
    }
    const text = toTsv(rows);
    this.copied = { text, block, inputs, sheet: this.activeSheet() };
    return text;
  }

  /**
   * Pastes clipboard text at the selection. Text copied from this workbench pastes its formulas
   * (relative references moved); other text pastes as typed values ("=..." stays a formula as
   * written). A selection that is a whole multiple of the pasted block is filled with it. Text
   * cut from this workbench moves the cells (see move).
   */
  paste(text: string): void {
    let source: CellInput[][];
    let shiftFrom: Block | undefined;
    try {
      if (this.copied && this.copied.text === text && this.copied.cut) {
        const cut = this.copied;
        this.copied = undefined;
        this.move(cut, this.selection.anchor);
        return;
      }
      if (this.copied && this.copied.text === text) {
        source = this.copied.inputs;
        shiftFrom = this.copied.block;
      } else source = parseTsv(text).map((row) => row.map(inputOf));
    } catch (error) {
      this.say((error as Error).message, true);
      return;
    }
    if (source.length === 0 || source[0].length === 0) return;
    const selected = this.selectedBlock();
    const h = source.length;
    const w = source[0].length;
    const tiles = blockRows(selected) % h === 0 && blockCols(selected) % w === 0;
    const target: Block = tiles ? selected : { top: selected.top, left: selected.left, bottom: selected.top + h - 1, right: selected.left + w - 1 };
    if (!this.withinLimit(target)) return;
    const origin = shiftFrom ?? { top: target.top, left: target.left, bottom: target.top + h - 1, right: target.left + w - 1 };
    const block = filledBlock(origin, target, (r, c) => source[r - origin.top][c - origin.left]);
    this.writeBlock(this.activeSheet(), target.top, target.left, block, true);
    this.selection = { sheet: this.activeSheet(), anchor: { row: target.top, col: target.left }, focus: { row: target.bottom, col: target.right } };
    this.showSelection();
  }

  /**
   * Moves cut cells to `to` (their new top-left), as a spreadsheet does, in one undo step: the
   * source is emptied, the cells are written at the target, and references into the moved
   * block (in the block itself and in every formula of the book) follow it; other references
   * stay. Limit: references from other sheets follow only a move within one sheet.
   */
  private move(cut: Copied, to: CellRef): void {
    const from = cut.block;
    const rows = blockRows(from);
    const cols = blockCols(from);
    const target: Block = { top: to.row, left: to.col, bottom: to.row + rows - 1, right: to.col + cols - 1 };
    if (!this.withinLimit(target)) return;
    const toSheet = this.activeSheet();
    const sameSheet = toSheet === cut.sheet;
    const dr = to.row - from.top;
    const dc = to.col - from.left;
    const follow = (formula: string, formulaSheet: string): string =>
      mapReferences(formula, SHEET_LIMITS, (ref) =>
        namesSheet(ref.sheet, cut.sheet, formulaSheet === cut.sheet) && inBlock(from, ref.row, ref.col) ? { row: ref.row + dr, col: ref.col + dc } : { row: ref.row, col: ref.col },
      );
    const moved = cut.inputs.map((row) => row.map((input) => (typeof input === "string" && input.startsWith("=") ? follow(input, cut.sheet) : input)));
    const others: { sheet: string; row: number; col: number; text: string }[] = [];
    if (sameSheet)
      for (const sheet of this.book.sheetNames()) {
        const sid = this.book.sheetId(sheet);
        for (const a of this.book.formulaCells(sid)) {
          if (sheet === cut.sheet && (inBlock(from, a.row, a.col) || inBlock(target, a.row, a.col))) continue;
          const text = this.book.getFormula(sid, a.row, a.col);
          if (text === undefined) continue;
          const next = follow(text, sheet);
          if (next !== text) others.push({ sheet, row: a.row, col: a.col, text: next });
        }
      }
    const steps: BlockStep[] = [];
    const write = (sheet: string, top: number, left: number, block: CellInput[][]): void => {
      const step = this.writeBlock(sheet, top, left, block, "collect");
      if (step) steps.push(step);
    };
    write(cut.sheet, from.top, from.left, Array.from({ length: rows }, () => Array<CellInput>(cols).fill(null)));
    write(toSheet, target.top, target.left, moved);
    for (const o of others) write(o.sheet, o.row, o.col, [[o.text]]);
    if (steps.length > 0) this.history.record({ kind: "multi", steps });
    this.selection = { sheet: toSheet, anchor: { row: target.top, col: target.left }, focus: { row: target.bottom, col: target.right } };
    this.showSelection();
  }

  /** Inserts as many rows as are selected, above the selection (one undo step). */
  insertRows(at = this.selectedBlock().top, count = blockRows(this.selectedBlock())): void {
    this.apply({ kind: "rows", sheet: this.activeSheet(), at, count }, true);
  }

  /** Deletes the selected rows (one undo step). */
  deleteRows(at = this.selectedBlock().top, count = blockRows(this.selectedBlock())): void {
    const id = this.sheetId();
    const cols = this.book.dimensions(id).cols;
    if (!this.withinLimit({ top: at, left: 0, bottom: at + count - 1, right: Math.max(0, cols - 1) })) return;
    const removed = Array.from({ length: count }, (_, r) => Array.from({ length: Math.max(1, cols) }, (_, c) => this.book.getInput(id, at + r, c) ?? null));
    const formulas: { sheet: string; row: number; col: number; text: string }[] = [];
    for (const sheet of this.book.sheetNames()) {
      const sid = this.book.sheetId(sheet);
      for (const a of this.book.formulaCells(sid)) {
        const text = this.book.getFormula(sid, a.row, a.col);
        if (text !== undefined && !(sid === id && a.row >= at && a.row < at + count)) formulas.push({ sheet, row: a.row, col: a.col, text });
      }
    }
    this.apply({ kind: "rows", sheet: this.activeSheet(), at, count: -count, removed, formulas }, true);
  }

  /** A column's width in px on the active sheet; set it with setColumnWidth. */
  width(col: number, sheet = this.activeSheet()): number {
    return this.columns.width(sheet, col);
  }

  setColumnWidth(col: number, px: number): void {
    this.columns.set(this.activeSheet(), col, px);
    this.layoutColumns();
    this.repaintAll();
    this.placeFillHandle();
  }

  // ---- writing ---------------------------------------------------------------------------

  private withinLimit(block: Block): boolean {
    if (blockRows(block) * blockCols(block) <= MAX_BLOCK_CELLS) return true;
    this.say(`${rangeText({ row: block.top, col: block.left }, { row: block.bottom, col: block.right })} has more than ${MAX_BLOCK_CELLS} cells: select fewer`, true);
    return false;
  }

  /** Writes a block in one engine call and repaints what changed; `record`: onto the undo list, or "collect": give the step back. */
  private writeBlock(sheet: string, top: number, left: number, block: readonly (readonly CellInput[])[], record: boolean | "collect"): BlockStep | undefined {
    const id = this.book.sheetId(sheet);
    const rows = block.length;
    const cols = block.reduce((most, row) => Math.max(most, row.length), 0);
    if (rows === 0 || cols === 0) return undefined;
    if (top + rows > SHEET_LIMITS.rows || left + cols > SHEET_LIMITS.cols) {
      this.say(`the block does not fit on the sheet (${SHEET_LIMITS.rows} rows, ${SHEET_LIMITS.cols} columns)`, true);
      return undefined;
    }
    const square = Array.from(block, (row) => (row.length === cols ? Array.from(row) : [...Array.from(row), ...Array<CellInput>(cols - row.length).fill(null)]));
    let step: BlockStep | undefined;
    if (record) {
      const before = this.book.inputBlock(id, top, left, rows, cols);
      step = { kind: "block", sheet, top, left, before, after: square };
      if (record === true) this.history.record(step);
    }
    const started = performance.now();
    const changed = this.book.setCellsReporting(id, top, left, square);
    const computed = performance.now();
    // The shown sheet's changed cells, whichever sheet was written (formulas refer across sheets).
    const shown = this.sheetId();
    // Only keys repaint asks for: cells of rendered rows, and anchors of rendered spilled cells
    // (keys of 30,000 changed cells would cost more than the repaint itself).
    const anchorRows = new Set<number>();
    for (const cells of this.rendered.values())
      for (const td of cells) {
        const anchor = td.dataset.anchor;
        if (anchor !== undefined) anchorRows.add(Number(anchor.slice(0, anchor.indexOf(","))));
      }
    const keys = new Set<string>();
    for (const a of changed) if (a.sheet === shown && (this.rendered.has(a.row) || anchorRows.has(a.row))) keys.add(anchorKey(a.row, a.col));
    if (id === shown) for (let r = 0; r < rows; r++) if (this.rendered.has(top + r)) for (let c = 0; c < cols; c++) keys.add(anchorKey(top + r, left + c));
    if (keys.size > 0 || id === shown) this.repaint(keys);
    this.showSelection();
    this.lastWrite = { cells: rows * cols, changed: changed.length, engineMs: computed - started, paintMs: performance.now() - computed };
    this.changed();
    return step;
  }

  /** How long the last block write took in the engine and in painting the grid (for the benchmark). */
  lastWrite: { cells: number; changed: number; engineMs: number; paintMs: number } | undefined;

  /** Applies a step (again, for a redo); `record` puts a new row step on the undo list. */
  private apply(step: Step, record: boolean): void {
    if (step.kind === "block") this.writeBlock(step.sheet, step.top, step.left, step.after, false);
    else if (step.kind === "multi") for (const s of step.steps) this.writeBlock(s.sheet, s.top, s.left, s.after, false);
    else {
      const id = this.book.sheetId(step.sheet);
      try {
        if (step.count > 0) this.book.insertRows(id, step.at, step.count);
        else this.book.deleteRows(id, step.at, -step.count);
      } catch (error) {
        this.say((error as Error).message, true);
        return;
      }
      if (record) this.history.record(step);
      this.afterStructure();
    }
  }

  private revert(step: Step): void {
    if (step.kind === "block") {
      this.writeBlock(step.sheet, step.top, step.left, step.before, false);
      return;
    }
    if (step.kind === "multi") {
      for (const s of [...step.steps].reverse()) this.writeBlock(s.sheet, s.top, s.left, s.before, false);
      return;
    }
    const id = this.book.sheetId(step.sheet);
    if (step.count > 0) this.book.deleteRows(id, step.at, step.count);
    else {
      this.book.insertRows(id, step.at, -step.count);
      if (step.removed) this.book.setCells(id, step.at, 0, step.removed);
      for (const f of step.formulas ?? []) {
        const sid = this.book.sheetId(f.sheet);
        if (this.book.getFormula(sid, f.row, f.col) !== f.text) this.book.setCells(sid, f.row, f.col, [[f.text]]);
      }
    }
    this.afterStructure();
  }

  private afterStructure(): void {
    this.renderSheet();
    this.showSelection();
    this.changed();
  }

  private changed(): void {
    for (const listener of this.changeListeners) listener();
  }

  // ---- rendering -------------------------------------------------------------------------

  private sheetId(): number {
    return this.active;
  }

  private selectedBlock(): Block {
    return blockOf(this.selection.anchor, this.selection.focus);
  }

  private paintContext(): PaintContext {
    return { book: this.book, sheet: this.sheetId(), width: (c) => this.width(c), textWidth: (t) => this.measure.width(t), hints: new Map() };
  }

  private renderTabs(): void {
    this.el.tabs.replaceChildren(
      ...this.book.sheetNames().map((name, index) => {
        const button = document.createElement("button");
        button.textContent = name;
        button.className = index === this.active ? "active" : "";
        button.addEventListener("click", () => this.activate(name));
        return button;
      }),
    );
  }

  private buildGrid(): void {
    this.table = document.createElement("table");
    this.table.className = "grid";
    this.colgroup = document.createElement("colgroup");
    this.table.appendChild(this.colgroup);
    this.headRow = this.table.createTHead().insertRow();
    this.body = this.table.createTBody();
    const spacer = (): HTMLTableCellElement => {
      const tr = document.createElement("tr");
      tr.className = "spacer";
      const td = tr.insertCell();
      td.className = "spacer";
      return td;
    };
    this.topSpacer = spacer();
    this.bottomSpacer = spacer();
    this.fillHandle = document.createElement("div");
    this.fillHandle.className = "fill-handle";
    this.fillHandle.title = "Drag to fill down or right";
    this.el.sheet.replaceChildren(this.table, this.fillHandle);
  }

  private ensureSize(rows: number, cols: number): void {
    cols = Math.min(cols, MAX_SHOWN_COLS);
    if (rows > this.totalRows || cols > this.totalCols) {
      const grewCols = cols > this.totalCols;
      this.totalRows = Math.max(this.totalRows, rows);
      this.totalCols = Math.max(this.totalCols, cols);
      if (grewCols) this.layoutColumns();
      this.renderWindow(grewCols);
    }
  }

  /** The whole sheet afresh: size, columns, rows in view. */
  private renderSheet(): void {
    const id = this.sheetId();
    const used = this.book.dimensions(id);
    const { anchor, focus } = this.selection;
    this.totalRows = Math.max(MIN_ROWS, used.rows + EXTRA_ROWS, anchor.row + 1, focus.row + 1);
    this.totalCols = Math.min(MAX_SHOWN_COLS, Math.max(MIN_COLS, used.cols + EXTRA_COLS, anchor.col + 1, focus.col + 1));
    if (!this.columns.has(this.activeSheet())) this.guessWidths(used.rows, used.cols);
    this.layoutColumns();
    this.renderWindow(true);
  }

  /** First widths of a sheet: wide enough for the numbers of its first 200 rows at 6 significant figures (up to 160 px). */
  private guessWidths(rows: number, cols: number): void {
    const sheet = this.activeSheet();
    const id = this.sheetId();
    this.columns.touch(sheet);
    for (let c = 0; c < Math.min(cols, MAX_SHOWN_COLS); c++) {
      let widest = 0;
      for (let r = 0; r < Math.min(rows, 200); r++) {
        const value = this.book.getValue(id, r, c);
        if (typeof value === "number") widest = Math.max(widest, this.measure.width(numberTexts(value)[0]));
      }
      if (widest + 14 > this.columns.width(sheet, c)) this.columns.set(sheet, c, Math.min(160, widest + 14));
    }
  }

  private columnLeft(col: number): number {
    let left = 0;
    for (let c = 0; c < col; c++) left += this.width(c);
    return left;
  }

  private layoutColumns(): void {
    const cols: HTMLTableColElement[] = [];
    const heads: HTMLTableCellElement[] = [];
    const rowHead = document.createElement("col");
    rowHead.style.width = `${ROW_HEADER_WIDTH}px`;
    cols.push(rowHead);
    const corner = document.createElement("th");
    corner.className = "corner";
    heads.push(corner);
    let total = ROW_HEADER_WIDTH;
    for (let c = 0; c < this.totalCols; c++) {
      const w = this.width(c);
      total += w;
      const col = document.createElement("col");
      col.style.width = `${w}px`;
      cols.push(col);
      const th = document.createElement("th");
      th.className = "col";
      th.dataset.col = String(c);
      th.textContent = cellText({ row: 0, col: c }).replace(/\d+$/, "");
      const grip = document.createElement("span");
      grip.className = "resize";
      grip.dataset.col = String(c);
      th.appendChild(grip);
      heads.push(th);
    }
    this.colgroup.replaceChildren(...cols);
    this.headRow.replaceChildren(...heads);
    this.table.style.width = `${total}px`;
    this.topSpacer.colSpan = this.totalCols + 1;
    this.bottomSpacer.colSpan = this.totalCols + 1;
  }

  /** Puts the rows in view into the DOM (reusing rows already there unless `force`). */
  private renderWindow(force = false): void {
    const view = this.el.sheet;
    const next = rowWindow(view.scrollTop, view.clientHeight || 600, this.totalRows);
    if (!force && next.first === this.window.first && next.last === this.window.last && this.windowTotal === this.totalRows) return;
    this.windowTotal = this.totalRows;
    const context = this.paintContext();
    const kept = force ? new Map<number, HTMLTableCellElement[]>() : this.rendered;
    const rendered = new Map<number, HTMLTableCellElement[]>();
    const rows: HTMLTableRowElement[] = [];
    for (let r = next.first; r <= next.last; r++) {
      let cells = kept.get(r);
      if (!cells) {
        const tr = document.createElement("tr");
        const th = document.createElement("th");
        th.className = "row";
        th.dataset.row = String(r);
        th.textContent = String(r + 1);
        tr.appendChild(th);
        cells = [];
        for (let c = 0; c < this.totalCols; c++) {
          const td = tr.insertCell();
          td.dataset.row = String(r);
          td.dataset.col = String(c);
          td.dataset.address = cellText({ row: r, col: c });
          paintCell(td, context, r, c);
          cells.push(td);
        }
      }
      rendered.set(r, cells);
      rows.push(cells[0]?.parentElement as HTMLTableRowElement);
    }
    this.rendered = rendered;
    this.window = next;
    this.topSpacer.style.height = `${next.first * ROW_HEIGHT}px`;
    this.bottomSpacer.style.height = `${Math.max(0, this.totalRows - 1 - next.last) * ROW_HEIGHT}px`;
    this.body.replaceChildren(this.topSpacer.parentElement as HTMLTableRowElement, ...rows, this.bottomSpacer.parentElement as HTMLTableRowElement);
    this.markSelection();
  }

  /** Paints again the rendered cells with these keys, and the rendered cells of spills anchored at them. */
  private repaint(keys: Set<string>): void {
    const used = this.book.dimensions(this.sheetId());
    if (used.rows + EXTRA_ROWS > this.totalRows || Math.min(MAX_SHOWN_COLS, used.cols + EXTRA_COLS) > this.totalCols) {
      this.ensureSize(used.rows + EXTRA_ROWS, used.cols + EXTRA_COLS);
    }
    const context = this.paintContext();
    for (const [r, cells] of this.rendered)
      for (let c = 0; c < cells.length; c++) {
        const td = cells[c];
        // The left neighbour too: whether its text runs on over this cell may have changed.
        if (keys.has(anchorKey(r, c)) || keys.has(anchorKey(r, c + 1)) || (td.dataset.anchor !== undefined && keys.has(td.dataset.anchor))) paintCell(td, context, r, c);
      }
    this.markSelection();
  }

  private repaintAll(): void {
    const context = this.paintContext();
    for (const [r, cells] of this.rendered) cells.forEach((td, c) => paintCell(td, context, r, c));
    this.markSelection();
  }

  private markSelection(): void {
    for (const td of this.marked) td.classList.remove("selected", "in-range");
    this.marked = [];
    const { anchor } = this.selection;
    const block = this.selectedBlock();
    for (let r = Math.max(block.top, this.window.first); r <= Math.min(block.bottom, this.window.last); r++) {
      const cells = this.rendered.get(r);
      if (!cells) continue;
      for (let c = block.left; c <= Math.min(block.right, cells.length - 1); c++) {
        const td = cells[c];
        td.classList.add(r === anchor.row && c === anchor.col ? "selected" : "in-range");
        this.marked.push(td);
      }
    }
    if (this.drag?.kind === "fill" && this.drag.target) {
      const t = this.drag.target;
      for (const [r, cells] of this.rendered)
        if (r >= t.top && r <= t.bottom)
          for (let c = t.left; c <= Math.min(t.right, cells.length - 1); c++)
            if (!inBlock(block, r, c)) {
              cells[c].classList.add("in-range");
              this.marked.push(cells[c]);
            }
    }
    this.placeFillHandle();
  }

  private placeFillHandle(): void {
    const block = this.selectedBlock();
    this.fillHandle.style.left = `${ROW_HEADER_WIDTH + this.columnLeft(block.right + 1) - 4}px`;
    this.fillHandle.style.top = `${HEADER_HEIGHT + (block.bottom + 1) * ROW_HEIGHT - 4}px`;
  }

  private say(text: string, error = false): void {
    this.el.status.textContent = text;
    this.el.status.className = error ? "status error" : "status";
  }

  private showSelection(): void {
    this.markSelection();
    const { anchor } = this.selection;
    const block = this.selectedBlock();
    const address = rangeText({ row: block.top, col: block.left }, { row: block.bottom, col: block.right });
    if (this.nameBoxInput) {
      if (document.activeElement !== this.nameBoxInput) this.nameBoxInput.value = address;
    } else this.el.nameBox.textContent = address;
    const id = this.sheetId();
    const input = this.book.getInput(id, anchor.row, anchor.col);
    const spilledFrom = this.book.spillAnchorOf(id, anchor.row, anchor.col);
    const anchorFormula = spilledFrom ? this.book.getFormula(id, spilledFrom.row, spilledFrom.col) : undefined;
    this.shownInput = input === undefined || input === null ? "" : String(input);
    this.el.formulaBar.value = document.activeElement === this.el.formulaBar ? this.shownInput : shownText(this.shownInput);
    this.el.formulaBar.placeholder = spilledFrom ? `spilled from ${cellText(spilledFrom)}: ${anchorFormula ?? ""}` : "";
    const value = this.book.getValue(id, anchor.row, anchor.col);
    const here = cellText(anchor);
    if (isCellError(value)) this.say(`${here}: ${value.error} ${value.message}`.trim(), true);
    else {
      const exact = typeof value === "number" ? ` = ${String(value)}` : "";
      let text = `${here}${exact}`;
      const ownFormula = this.book.getFormula(id, anchor.row, anchor.col);
      const size = ownFormula !== undefined ? this.book.spillSize(id, anchor.row, anchor.col) : undefined;
      const from = spilledFrom ?? (size && (size.rows > 1 || size.cols > 1) ? anchor : undefined);
      if (from) {
        const hint = tableHint(spilledFrom ? anchorFormula : ownFormula);
        const column = hint?.columns[anchor.col - from.col];
        text += spilledFrom ? `, part of the spill of ${cellText(spilledFrom)}` : ", spills";
        if (hint) text += ` (${hint.name}: ${hint.columns.join(" | ")}${column !== undefined ? `; this column: ${column}` : ""})`;
      }
      this.say(text);
    }
    const snapshot = this.getSelection();
    for (const listener of this.selectionListeners) listener(snapshot);
  }

  private commit(text: string, move: CellRef): void {
    const { anchor } = this.selection;
    this.setBlock(this.activeSheet(), anchor, [[inputOf(text)]]);
    this.select({ row: Math.max(0, anchor.row + move.row), col: Math.max(0, anchor.col + move.col) });
  }

  // ---- events ----------------------------------------------------------------------------

  private cellOf(target: EventTarget | null): CellRef | undefined {
    const td = (target as HTMLElement | null)?.closest?.("td[data-row]") as HTMLElement | null;
    if (!td) return undefined;
    return { row: Number(td.dataset.row), col: Number(td.dataset.col) };
  }

  private editing(): boolean {
    const active = document.activeElement;
    return active instanceof HTMLInputElement || active instanceof HTMLTextAreaElement;
  }

  private bindEvents(): void {
    const sheet = this.el.sheet;
    sheet.addEventListener("scroll", () => this.renderWindow());
    window.addEventListener("resize", () => this.renderWindow());
    sheet.addEventListener("mousedown", (event) => {
      const target = event.target as HTMLElement;
      if (target.classList.contains("resize")) return this.startResize(event, Number(target.dataset.col));
      if (target === this.fillHandle) {
        event.preventDefault();
        this.drag = { kind: "fill" };
        return;
      }
      if (target.matches("th.row")) {
        const row = Number(target.dataset.row);
        const last = this.totalCols - 1;
        if (event.shiftKey) this.select(this.selection.anchor, { row, col: last });
        else this.select({ row, col: 0 }, { row, col: last });
        return;
      }
      const ref = this.cellOf(target);
      if (!ref) return;
      // An edit in progress in the formula bar is kept (committed in place) when another cell is clicked.
      if (document.activeElement === this.el.formulaBar && this.el.formulaBar.value !== this.shownInput) {
        const { anchor } = this.selection;
        this.setBlock(this.activeSheet(), anchor, [[inputOf(this.el.formulaBar.value)]]);
      }
      if (document.activeElement instanceof HTMLElement && this.editing()) document.activeElement.blur();
      if (event.shiftKey) this.select(this.selection.anchor, ref);
      else this.select(ref);
      this.drag = { kind: "select" };
    });
    sheet.addEventListener("mouseover", (event) => {
      if (!this.drag) return;
      if ((event.buttons & 1) === 0) {
        this.drag = undefined;
        this.markSelection();
        return;
      }
      const ref = this.cellOf(event.target);
      if (!ref) return;
      if (this.drag.kind === "select") this.select(this.selection.anchor, ref);
      else {
        const block = this.selectedBlock();
        const down = ref.row - block.bottom;
        const right = ref.col - block.right;
        this.drag.target =
          down <= 0 && right <= 0 ? undefined : down >= right ? { ...block, bottom: Math.max(block.bottom, ref.row) } : { ...block, right: Math.max(block.right, ref.col) };
        this.markSelection();
      }
    });
    document.addEventListener("mouseup", () => {
      const drag = this.drag;
      this.drag = undefined;
      if (drag?.kind === "fill" && drag.target) {
        const source = this.selectedBlock();
        const target = drag.target;
        const down = target.bottom > source.bottom;
        const rest = down ? { ...target, top: source.bottom + 1 } : { ...target, left: source.right + 1 };
        this.fill(source, rest, down ? "down" : "right");
        this.select({ row: target.top, col: target.left }, { row: target.bottom, col: target.right });
      } else if (drag?.kind === "fill") this.markSelection();
    });
    sheet.addEventListener("dblclick", (event) => {
      if ((event.target as HTMLElement).classList.contains("resize")) return;
      this.el.formulaBar.focus();
    });
    // The edit text (with a text cell's apostrophe) only while editing (grid/inputs shownText).
    this.el.formulaBar.addEventListener("focus", () => {
      if (this.el.formulaBar.value === shownText(this.shownInput)) this.el.formulaBar.value = this.shownInput;
    });
    this.el.formulaBar.addEventListener("blur", () => {
      if (this.el.formulaBar.value === this.shownInput) this.el.formulaBar.value = shownText(this.shownInput);
    });
    this.el.formulaBar.addEventListener("keydown", (event) => {
      // stopPropagation: the grid's own keys (document) must not see the key that ends an edit.
      if (event.key === "Enter") {
        event.preventDefault();
        event.stopPropagation();
        this.commit(this.el.formulaBar.value, { row: event.shiftKey ? -1 : 1, col: 0 });
        this.el.formulaBar.blur();
      } else if (event.key === "Tab") {
        event.preventDefault();
        event.stopPropagation();
        this.commit(this.el.formulaBar.value, { row: 0, col: event.shiftKey ? -1 : 1 });
        this.el.formulaBar.blur();
      } else if (event.key === "Escape") {
        this.showSelection();
        this.el.formulaBar.blur();
      }
    });
    const nameBox = this.nameBoxInput;
    if (nameBox) {
      nameBox.addEventListener("focus", () => nameBox.select());
      nameBox.addEventListener("keydown", (event) => {
        if (event.key === "Enter") {
          event.preventDefault();
          event.stopPropagation();
          const ref = parseNameBox(nameBox.value);
          if (typeof ref === "string") return this.say(ref, true);
          if (ref.sheet !== undefined && !this.book.sheetNames().includes(ref.sheet)) return this.say(`no sheet named "${ref.sheet}"`, true);
          nameBox.blur();
          this.select(ref.from, ref.to, ref.sheet);
        } else if (event.key === "Escape") {
          nameBox.blur();
          this.showSelection();
        }
      });
      nameBox.addEventListener("blur", () => this.showSelection());
    }
    this.el.insertRows?.addEventListener("click", () => this.insertRows());
    this.el.deleteRows?.addEventListener("click", () => this.deleteRows());
    document.addEventListener("copy", (event) => {
      if (this.editing() || !event.clipboardData) return;
      event.preventDefault();
      event.clipboardData.setData("text/plain", this.copySelection());
    });
    document.addEventListener("cut", (event) => {
      if (this.editing() || !event.clipboardData) return;
      event.preventDefault();
      event.clipboardData.setData("text/plain", this.copySelection());
      // The cells move when the cut is pasted (here), as in a spreadsheet; until then they stay.
      if (this.copied) this.copied.cut = true;
    });
    document.addEventListener("paste", (event) => {
      if (this.editing() || !event.clipboardData) return;
      event.preventDefault();
      this.paste(event.clipboardData.getData("text/plain"));
    });
    document.addEventListener("keydown", (event) => this.onKey(event));
  }

  private onKey(event: KeyboardEvent): void {
    if (this.editing()) return;
    const ctrl = event.ctrlKey || event.metaKey;
    const key = event.key.length === 1 ? event.key.toLowerCase() : event.key;
    if (ctrl && !event.altKey) {
      const action: Record<string, () => unknown> = {
        z: () => (event.shiftKey ? this.redo() : this.undo()),
        y: () => this.redo(),
        d: () => this.fillDown(),
        r: () => this.fillRight(),
        Home: () => this.select({ row: 0, col: 0 }),
        a: () => this.select({ row: 0, col: 0 }, { row: Math.max(0, this.book.dimensions(this.sheetId()).rows - 1), col: Math.max(0, this.book.dimensions(this.sheetId()).cols - 1) }),
        "+": () => this.insertRows(),
        "=": () => event.shiftKey && this.insertRows(),
        "-": () => this.deleteRows(),
      };
      const run = action[key];
      if (run) {
        event.preventDefault();
        run();
      }
      return;
    }
    const page = Math.max(1, Math.floor((this.el.sheet.clientHeight - HEADER_HEIGHT) / ROW_HEIGHT) - 1);
    const moves: Record<string, CellRef> = {
      ArrowUp: { row: -1, col: 0 },
      ArrowDown: { row: 1, col: 0 },
      ArrowLeft: { row: 0, col: -1 },
      ArrowRight: { row: 0, col: 1 },
      PageUp: { row: -page, col: 0 },
      PageDown: { row: page, col: 0 },
    };
    const onGrid = document.activeElement === document.body || document.activeElement === null || this.el.sheet.contains(document.activeElement);
    if (event.key === "Tab" && onGrid) {
      event.preventDefault();
      this.select({ row: this.selection.anchor.row, col: Math.max(0, this.selection.anchor.col + (event.shiftKey ? -1 : 1)) });
      return;
    }
    if (event.key === "Home") {
      event.preventDefault();
      this.select({ row: this.selection.anchor.row, col: 0 });
      return;
    }
    const move = moves[event.key];
    const { anchor, focus } = this.selection;
    if (move) {
      event.preventDefault();
      const base = event.shiftKey ? focus : anchor;
      const next = { row: Math.max(0, base.row + move.row), col: Math.max(0, base.col + move.col) };
      if (event.shiftKey) this.select(anchor, next);
      else this.select(next);
    } else if (event.key === "Enter" || event.key === "F2") {
      event.preventDefault();
      this.el.formulaBar.focus();
    } else if (event.key === "Delete" || event.key === "Backspace") {
      event.preventDefault();
      this.clearSelection();
    } else if (event.key === "Escape") {
      this.drag = undefined;
      this.markSelection();
    } else if (event.key.length === 1 && !event.altKey) {
      event.preventDefault();
      this.el.formulaBar.focus();
      this.el.formulaBar.value = event.key;
    }
  }

  private startResize(event: MouseEvent, col: number): void {
    event.preventDefault();
    event.stopPropagation();
    const start = event.clientX;
    const from = this.width(col);
    const move = (e: MouseEvent): void => {
      this.columns.set(this.activeSheet(), col, from + e.clientX - start);
      this.layoutColumns();
    };
    const up = (): void => {
      document.removeEventListener("mousemove", move);
      document.removeEventListener("mouseup", up);
      this.setColumnWidth(col, this.width(col));
    };
    document.addEventListener("mousemove", move);
    document.addEventListener("mouseup", up);
  }
}
