/**
 * Fill and paste of cell inputs: each target cell takes the input of the source cell it
 * repeats (the source tiled over the target), a formula with its relative references moved
 * by the offset ($ parts stay). Values are copied as they are (no series are extended).
 */
import { SHEET_LIMITS, type CellInput } from "../../engine";
import { shiftFormula } from "../../engine/references";
import { blockCols, blockRows, type Block } from "./selection";

/** The inputs of `target`, filled from the inputs of `source` (read through `inputAt`). */
export function filledBlock(source: Block, target: Block, inputAt: (row: number, col: number) => CellInput): CellInput[][] {
  const h = blockRows(source);
  const w = blockCols(source);
  const cache = new Map<number, CellInput>();
  const sourceInput = (r: number, c: number): CellInput => {
    const key = r * w + c;
    if (!cache.has(key)) cache.set(key, inputAt(source.top + r, source.left + c) ?? null);
    return cache.get(key);
  };
  return Array.from({ length: blockRows(target) }, (_, i) => {
    const row = target.top + i;
    const r = (((row - source.top) % h) + h) % h;
    return Array.from({ length: blockCols(target) }, (_, j) => {
      const col = target.left + j;
      const c = (((col - source.left) % w) + w) % w;
      const input = sourceInput(r, c);
      return typeof input === "string" && input.startsWith("=") ? shiftFormula(input, row - (source.top + r), col - (source.left + c), SHEET_LIMITS) : input;
    });
  });
}

/** Ctrl+D: the top row of the selection down over the rest (one row selected: from the row above). */
export function fillDownSource(selection: Block): { source: Block; target: Block } | undefined {
  if (selection.bottom > selection.top) return { source: { ...selection, bottom: selection.top }, target: { ...selection, top: selection.top + 1 } };
  if (selection.top === 0) return undefined;
  return { source: { ...selection, top: selection.top - 1, bottom: selection.top - 1 }, target: selection };
}

/** Ctrl+R: the left column of the selection right over the rest (one column selected: from the column left). */
export function fillRightSource(selection: Block): { source: Block; target: Block } | undefined {
  if (selection.right > selection.left) return { source: { ...selection, right: selection.left }, target: { ...selection, left: selection.left + 1 } };
  if (selection.left === 0) return undefined;
  return { source: { ...selection, left: selection.left - 1, right: selection.left - 1 }, target: selection };
}
