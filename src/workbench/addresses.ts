/** A1-style addresses and ranges of the workbench, with an optional sheet name. */
import { columnLetters, columnNumber } from "../engine";

export interface CellRef {
  row: number;
  col: number;
}

export interface RangeRef {
  sheet?: string;
  from: CellRef;
  to: CellRef;
}

function cell(text: string): CellRef {
  const match = /^\$?([A-Za-z]{1,3})\$?(\d+)$/.exec(text.trim());
  if (!match) throw new Error(`not a cell address: "${text}"`);
  return { row: Number(match[2]) - 1, col: columnNumber(match[1]) };
}

/** "B3", "B3:D5", "Member!B3:D5" or "'My sheet'!B3". */
export function parseRange(text: string): RangeRef {
  const bang = text.lastIndexOf("!");
  const sheet = bang >= 0 ? text.slice(0, bang).replace(/^'(.*)'$/, "$1").replace(/''/g, "'") : undefined;
  const [a, b = a] = (bang >= 0 ? text.slice(bang + 1) : text).split(":");
  const from = cell(a);
  const to = cell(b);
  return {
    sheet,
    from: { row: Math.min(from.row, to.row), col: Math.min(from.col, to.col) },
    to: { row: Math.max(from.row, to.row), col: Math.max(from.col, to.col) },
  };
}

export function cellText(ref: CellRef): string {
  return `${columnLetters(ref.col)}${ref.row + 1}`;
}

export function rangeText(from: CellRef, to: CellRef): string {
  return from.row === to.row && from.col === to.col ? cellText(from) : `${cellText(from)}:${cellText(to)}`;
}
