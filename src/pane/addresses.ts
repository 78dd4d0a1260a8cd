/** A1 addresses as plain data: parse, offset, build ranges. Pure. */
import { columnLetters, columnNumber } from "../engine/formulaText";

export interface Cell {
  row: number;
  col: number;
}

export interface Block {
  from: Cell;
  to: Cell;
}

/** "B3" -> { row: 2, col: 1 } (0-based); `$` allowed. */
export function parseCell(text: string): Cell {
  const match = /^\$?([A-Za-z]{1,3})\$?(\d+)$/.exec(text.trim());
  if (!match) throw new Error(`not a cell address: "${text}"`);
  return { row: Number(match[2]) - 1, col: columnNumber(match[1]) };
}

/** "B3:D5" or "B3" (no sheet) as a block with from at the top-left. */
export function parseBlock(text: string): Block {
  const [a, b = a] = text.split(":");
  const p = parseCell(a);
  const q = parseCell(b);
  return {
    from: { row: Math.min(p.row, q.row), col: Math.min(p.col, q.col) },
    to: { row: Math.max(p.row, q.row), col: Math.max(p.col, q.col) },
  };
}

export function cellText(cell: Cell): string {
  return `${columnLetters(cell.col)}${cell.row + 1}`;
}

export function blockText(block: Block): string {
  const a = cellText(block.from);
  const b = cellText(block.to);
  return a === b ? a : `${a}:${b}`;
}

/** The block of `rows` x `cols` cells whose top-left is `from`. */
export function blockAt(from: Cell, rows: number, cols: number): Block {
  return { from, to: { row: from.row + rows - 1, col: from.col + cols - 1 } };
}
