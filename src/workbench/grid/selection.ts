/** Selected ranges: an anchor (the active cell) and a focus, on one sheet. */
import { SHEET_LIMITS, columnLetters } from "../../engine";
import { parseRange, type CellRef, type RangeRef } from "../addresses";

export interface Selection {
  sheet: string;
  anchor: CellRef;
  focus: CellRef;
}

export interface Block {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

export function blockOf(anchor: CellRef, focus: CellRef): Block {
  return {
    top: Math.min(anchor.row, focus.row),
    left: Math.min(anchor.col, focus.col),
    bottom: Math.max(anchor.row, focus.row),
    right: Math.max(anchor.col, focus.col),
  };
}

export function blockRows(block: Block): number {
  return block.bottom - block.top + 1;
}

export function blockCols(block: Block): number {
  return block.right - block.left + 1;
}

export function inBlock(block: Block, row: number, col: number): boolean {
  return row >= block.top && row <= block.bottom && col >= block.left && col <= block.right;
}

/** The most cells one selection-wide action (copy, delete, fill) takes: 1,000,000 (documented limit). */
export const MAX_BLOCK_CELLS = 1_000_000;

/** What the name box takes: "B2", "B2:D9", "Member!A1"; a message for anything else. */
export function parseNameBox(text: string): RangeRef | string {
  const trimmed = text.trim();
  if (trimmed === "") return "type a cell (B2) or a range (B2:D9), optionally with a sheet (Member!A1)";
  let range: RangeRef;
  try {
    range = parseRange(trimmed);
  } catch {
    return `"${trimmed}" is not a cell or range: type e.g. B2 or B2:D9`;
  }
  const { from, to } = range;
  if (from.row < 0 || to.row >= SHEET_LIMITS.rows || from.col < 0 || to.col >= SHEET_LIMITS.cols) {
    return `"${trimmed}" is outside the sheet (rows 1 to ${SHEET_LIMITS.rows}, columns A to ${columnLetters(SHEET_LIMITS.cols - 1)})`;
  }
  return range;
}
