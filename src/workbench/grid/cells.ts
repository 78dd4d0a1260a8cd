/**
 * One grid cell painted from the workbook: its shown text (fitted to the column), exact value,
 * classes (number, formula, spill, anchor, error) and tooltip (the full error message, or the
 * column of the SPAN table the cell shows).
 */
import { isCellError, type SpanWorkbook } from "../../engine";
import { cellText } from "../addresses";
import { displayText, exactText } from "../format";
import { tableHint, type TableHint } from "./headerHint";

/** Horizontal padding and border of a cell, in px (grid CSS: 4 px each side, 1 px border). */
const CELL_CHROME = 9;

export interface PaintContext {
  book: SpanWorkbook;
  sheet: number;
  /** Column width in px. */
  width(col: number): number;
  textWidth(text: string): number;
  /** Table hints by anchor key, filled as cells are painted. */
  hints: Map<string, TableHint | undefined>;
}

export function anchorKey(row: number, col: number): string {
  return `${row},${col}`;
}

function hintOf(context: PaintContext, row: number, col: number): TableHint | undefined {
  const key = anchorKey(row, col);
  if (!context.hints.has(key)) context.hints.set(key, tableHint(context.book.getFormula(context.sheet, row, col)));
  return context.hints.get(key);
}

function isBlank(book: SpanWorkbook, sheet: number, row: number, col: number): boolean {
  const value = book.getValue(sheet, row, col);
  return (value === null || value === "") && book.getFormula(sheet, row, col) === undefined;
}

export function paintCell(td: HTMLTableCellElement, context: PaintContext, row: number, col: number): void {
  const { book, sheet } = context;
  const value = book.getValue(sheet, row, col);
  const formula = book.getFormula(sheet, row, col);
  const spilledFrom = formula === undefined ? book.spillAnchorOf(sheet, row, col) : undefined;
  const size = formula !== undefined ? book.spillSize(sheet, row, col) : undefined;
  const anchor = size !== undefined && (size.rows > 1 || size.cols > 1);
  const room = context.width(col) - CELL_CHROME;
  const text = displayText(value, typeof value === "number" ? (t) => context.textWidth(t) <= room : undefined);
  if (td.firstChild?.nodeType !== Node.TEXT_NODE || td.childNodes.length !== 1 || td.firstChild.nodeValue !== text) td.textContent = text;
  td.dataset.value = exactText(value);
  let className = "";
  if (typeof value === "number") className += " num";
  if (formula !== undefined) className += " formula";
  if (spilledFrom || anchor) className += " spill";
  if (anchor) className += " anchor";
  if (isCellError(value)) className += " error";
  // Text runs on over an empty neighbour, as in a spreadsheet (numbers never do: they fit or show ###).
  if (typeof value === "string" && value !== "" && context.textWidth(value) > room && isBlank(book, sheet, row, col + 1)) className += " overflow";
  td.className = className.trim();
  if (spilledFrom) td.dataset.anchor = anchorKey(spilledFrom.row, spilledFrom.col);
  else if (anchor) td.dataset.anchor = anchorKey(row, col);
  else delete td.dataset.anchor;
  let title = "";
  if (isCellError(value)) title = `${value.error} ${value.message}`.trim();
  else if (spilledFrom) {
    const hint = hintOf(context, spilledFrom.row, spilledFrom.col);
    const column = hint?.columns[col - spilledFrom.col];
    if (hint && column !== undefined) title = `${column}: column ${col - spilledFrom.col + 1} of the ${hint.name} table at ${cellText(spilledFrom)}`;
  } else if (anchor) {
    const hint = hintOf(context, row, col);
    if (hint) title = `${hint.name} table, columns: ${hint.columns.join(" | ")}`;
  }
  if (text === "###" && title === "") title = exactText(value);
  if (title) td.title = title;
  else td.removeAttribute("title");
}
