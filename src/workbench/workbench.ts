/**
 * The workbench page: a grid over a SpanWorkbook with sheet tabs, a formula bar, a status
 * line and selection. Editing a cell sets it in the engine, which recalculates what depends
 * on it; the grid then shows the new values, spills included.
 */
import { isCellError, type CellInput, type CellResult, type SpanWorkbook } from "../engine";
import { cellText, rangeText, type CellRef } from "./addresses";
import { displayText, exactText } from "./format";

const MIN_ROWS = 40;
const MIN_COLS = 12;

export interface Selection {
  sheet: string;
  anchor: CellRef;
  focus: CellRef;
}

export interface WorkbenchElements {
  sheet: HTMLElement;
  tabs: HTMLElement;
  formulaBar: HTMLInputElement;
  nameBox: HTMLElement;
  status: HTMLElement;
}

type Listener = (selection: Selection) => void;

export class Workbench {
  private active: number;
  private selection: Selection;
  private readonly selectionListeners = new Set<Listener>();
  private readonly changeListeners = new Set<() => void>();
  private cells: HTMLTableCellElement[][] = [];

  constructor(
    private current: SpanWorkbook,
    private readonly el: WorkbenchElements,
  ) {
    const book = current;
    this.active = 0;
    this.selection = { sheet: book.sheetNames()[0], anchor: { row: 0, col: 0 }, focus: { row: 0, col: 0 } };
    this.renderTabs();
    this.renderGrid();
    this.bindEvents();
    this.showSelection();
  }

  /** The workbook the grid shows (replaced by replaceBook). */
  get book(): SpanWorkbook {
    return this.current;
  }

  /**
   * Shows another workbook (a file opened, a new blank book): the grid, tabs and selection
   * start over on `sheet` (default the first sheet). The previous book is not destroyed here:
   * the caller owns it. Change listeners are told, as after an edit.
   */
  replaceBook(book: SpanWorkbook, sheet?: string): void {
    this.current = book;
    const names = book.sheetNames();
    const index = sheet === undefined ? 0 : names.indexOf(sheet);
    if (index < 0) throw new Error(`no sheet named "${sheet}"`);
    this.active = index;
    this.selection = { sheet: names[index], anchor: { row: 0, col: 0 }, focus: { row: 0, col: 0 } };
    this.refresh();
    for (const listener of this.changeListeners) listener();
  }

  /** Draws tabs and grid again from the book (after sheets were added or renamed in it). */
  refresh(): void {
    if (this.active >= this.book.sheetNames().length) this.active = 0;
    this.selection = { ...this.selection, sheet: this.activeSheet() };
    this.renderTabs();
    this.renderGrid();
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
    this.renderGrid();
    this.showSelection();
  }

  getSelection(): Selection {
    return { ...this.selection, anchor: { ...this.selection.anchor }, focus: { ...this.selection.focus } };
  }

  select(anchor: CellRef, focus: CellRef = anchor, sheet?: string): void {
    if (sheet !== undefined) this.activate(sheet);
    this.selection = { sheet: this.activeSheet(), anchor, focus };
    this.ensureSize(Math.max(anchor.row, focus.row) + 1, Math.max(anchor.col, focus.col) + 1);
    this.showSelection();
  }

  onSelectionChange(listener: Listener): () => void {
    this.selectionListeners.add(listener);
    return () => this.selectionListeners.delete(listener);
  }

  onChange(listener: () => void): () => void {
    this.changeListeners.add(listener);
    return () => this.changeListeners.delete(listener);
  }

  /** Sets a block of cells (values or "=formulas") from a top-left corner and recalculates. */
  setBlock(sheet: string, top: CellRef, block: readonly (readonly CellInput[])[]): void {
    this.book.setCells(this.book.sheetId(sheet), top.row, top.col, block);
    if (sheet === this.activeSheet()) this.renderGrid();
    this.showSelection();
    for (const listener of this.changeListeners) listener();
  }

  private sheetId(): number {
    return this.active;
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

  private ensureSize(rows: number, cols: number): void {
    if (rows > this.cells.length || cols > (this.cells[0]?.length ?? 0)) this.renderGrid(rows, cols);
  }

  private renderGrid(minRows = 0, minCols = 0): void {
    const id = this.sheetId();
    const used = this.book.dimensions(id);
    const rows = Math.max(MIN_ROWS, used.rows + 10, minRows);
    const cols = Math.max(MIN_COLS, used.cols + 3, minCols);
    const table = document.createElement("table");
    const head = table.createTHead().insertRow();
    head.appendChild(document.createElement("th")).className = "row";
    for (let c = 0; c < cols; c++) head.appendChild(document.createElement("th")).textContent = cellText({ row: 0, col: c }).replace(/\d+$/, "");
    const body = table.createTBody();
    this.cells = [];
    for (let r = 0; r < rows; r++) {
      const tr = body.insertRow();
      const th = tr.appendChild(document.createElement("th"));
      th.className = "row";
      th.textContent = String(r + 1);
      const line: HTMLTableCellElement[] = [];
      for (let c = 0; c < cols; c++) {
        const td = tr.insertCell();
        td.dataset.row = String(r);
        td.dataset.col = String(c);
        td.dataset.address = cellText({ row: r, col: c });
        line.push(td);
      }
      this.cells.push(line);
    }
    this.el.sheet.replaceChildren(table);
    this.refreshValues();
  }

  private refreshValues(): void {
    const id = this.sheetId();
    const values = this.book.getSheetValues(id);
    this.cells.forEach((line, r) =>
      line.forEach((td, c) => {
        const value: CellResult = values[r]?.[c] ?? null;
        const formula = this.book.getFormula(id, r, c);
        const anchor = formula === undefined ? this.book.spillAnchorOf(id, r, c) : undefined;
        const spill = formula !== undefined ? this.book.spillSize(id, r, c) : undefined;
        td.textContent = displayText(value);
        td.dataset.value = exactText(value);
        const classes: string[] = [];
        if (typeof value === "number") classes.push("num");
        if (formula !== undefined) classes.push("formula");
        if (anchor || (spill && (spill.rows > 1 || spill.cols > 1))) classes.push("spill");
        if (spill && (spill.rows > 1 || spill.cols > 1)) classes.push("anchor");
        if (isCellError(value)) {
          classes.push("error");
          td.title = `${value.error} ${value.message}`.trim();
        } else td.removeAttribute("title");
        td.className = classes.join(" ");
      }),
    );
  }

  private showSelection(): void {
    const { anchor, focus } = this.selection;
    const top = { row: Math.min(anchor.row, focus.row), col: Math.min(anchor.col, focus.col) };
    const bottom = { row: Math.max(anchor.row, focus.row), col: Math.max(anchor.col, focus.col) };
    for (const td of this.el.sheet.querySelectorAll("td.selected, td.in-range")) td.classList.remove("selected", "in-range");
    for (let r = top.row; r <= bottom.row; r++)
      for (let c = top.col; c <= bottom.col; c++) this.cells[r]?.[c]?.classList.add(r === anchor.row && c === anchor.col ? "selected" : "in-range");
    this.el.nameBox.textContent = rangeText(top, bottom);
    const id = this.sheetId();
    const input = this.book.getInput(id, anchor.row, anchor.col);
    const spilledFrom = this.book.spillAnchorOf(id, anchor.row, anchor.col);
    this.el.formulaBar.value = input === undefined || input === null ? "" : String(input);
    this.el.formulaBar.placeholder = spilledFrom ? `spilled from ${cellText(spilledFrom)}: ${this.book.getFormula(id, spilledFrom.row, spilledFrom.col) ?? ""}` : "";
    const value = this.book.getValue(id, anchor.row, anchor.col);
    if (isCellError(value)) {
      this.el.status.textContent = `${cellText(anchor)}: ${value.error} ${value.message}`.trim();
      this.el.status.className = "status error";
    } else {
      this.el.status.textContent = spilledFrom ? `${cellText(anchor)} is part of the spill of ${cellText(spilledFrom)}` : `${cellText(anchor)}`;
      this.el.status.className = "status";
    }
    this.cells[anchor.row]?.[anchor.col]?.scrollIntoView({ block: "nearest", inline: "nearest" });
    const snapshot = this.getSelection();
    for (const listener of this.selectionListeners) listener(snapshot);
  }

  private commit(text: string, move: CellRef): void {
    const { anchor } = this.selection;
    const trimmed = text.trim();
    const numeric = trimmed !== "" && !Number.isNaN(Number(trimmed)) ? Number(trimmed) : undefined;
    const input: CellInput = trimmed === "" ? null : numeric !== undefined ? numeric : text;
    this.setBlock(this.activeSheet(), anchor, [[input]]);
    this.select({ row: Math.max(0, anchor.row + move.row), col: Math.max(0, anchor.col + move.col) });
  }

  private bindEvents(): void {
    this.el.sheet.addEventListener("mousedown", (event) => {
      const td = (event.target as HTMLElement).closest("td");
      if (!td) return;
      const ref = { row: Number(td.dataset.row), col: Number(td.dataset.col) };
      if (event.shiftKey) this.select(this.selection.anchor, ref);
      else this.select(ref);
    });
    this.el.sheet.addEventListener("dblclick", () => this.el.formulaBar.focus());
    this.el.formulaBar.addEventListener("keydown", (event) => {
      if (event.key === "Enter") {
        event.preventDefault();
        this.commit(this.el.formulaBar.value, { row: event.shiftKey ? -1 : 1, col: 0 });
      } else if (event.key === "Tab") {
        event.preventDefault();
        this.commit(this.el.formulaBar.value, { row: 0, col: event.shiftKey ? -1 : 1 });
      } else if (event.key === "Escape") {
        this.showSelection();
        this.el.formulaBar.blur();
      }
    });
    document.addEventListener("keydown", (event) => {
      if (document.activeElement === this.el.formulaBar) return;
      const moves: Record<string, CellRef> = { ArrowUp: { row: -1, col: 0 }, ArrowDown: { row: 1, col: 0 }, ArrowLeft: { row: 0, col: -1 }, ArrowRight: { row: 0, col: 1 } };
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
        this.commit("", { row: 0, col: 0 });
      } else if (event.key.length === 1 && !event.ctrlKey && !event.metaKey && !event.altKey) {
        event.preventDefault();
        this.el.formulaBar.value = event.key;
        this.el.formulaBar.focus();
      }
    });
  }
}
