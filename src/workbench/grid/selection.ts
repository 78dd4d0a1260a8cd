/** Selected ranges: an anchor (the active cell) and a focus, on one sheet. */
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
  try {
    return parseRange(trimmed);
  } catch {
    return `"${trimmed}" is not a cell or range: type e.g. B2 or B2:D9`;
  }
}
