/**
 * Fill and paste of cell inputs: each target cell takes the input of the source cell it
 * repeats (the source tiled over the target), a formula with its relative references moved
 * by the offset ($ parts stay). Ctrl+D / Ctrl+R and paste copy values as they are; the fill
 * handle extends a series (seriesBlock): a column (dragging down) or row (dragging right) of
 * two or more numbers continues its linear trend, as a common spreadsheet's fill handle does
 * (1, 2 dragged down gives 3, 4, 5; from memory of the desktop spreadsheet's AutoFill, which
 * for unevenly spaced numbers continues the least-squares line: the same rule here).
 */
import { SHEET_LIMITS, type CellInput } from "../../engine";
import { formulaShifter } from "../../engine/references";
import { blockCols, blockRows, type Block } from "./selection";

/** The inputs of `target`, filled from the inputs of `source` (read through `inputAt`). */
export function filledBlock(source: Block, target: Block, inputAt: (row: number, col: number) => CellInput): CellInput[][] {
  const h = blockRows(source);
  const w = blockCols(source);
  // Each source cell once: its input, and for a formula its references found once for every copy.
  const cache = new Map<number, { input: CellInput; shift?: (rows: number, cols: number) => string }>();
  const sourceCell = (r: number, c: number) => {
    const key = r * w + c;
    let cell = cache.get(key);
    if (!cell) {
      const input = inputAt(source.top + r, source.left + c) ?? null;
      cell = typeof input === "string" && input.startsWith("=") ? { input, shift: formulaShifter(input, SHEET_LIMITS) } : { input };
      cache.set(key, cell);
    }
    return cell;
  };
  return Array.from({ length: blockRows(target) }, (_, i) => {
    const row = target.top + i;
    const r = (((row - source.top) % h) + h) % h;
    return Array.from({ length: blockCols(target) }, (_, j) => {
      const col = target.left + j;
      const c = (((col - source.left) % w) + w) % w;
      const cell = sourceCell(r, c);
      return cell.shift ? cell.shift(row - (source.top + r), col - (source.left + c)) : cell.input;
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

/** The least-squares line through values at x = 0..n-1 (evenly spaced values: their own line), as a function of x. */
function trendOf(values: number[]): (x: number) => number {
  const n = values.length;
  const meanX = (n - 1) / 2;
  let sum = 0;
  for (const v of values) sum += v;
  const meanY = sum / n;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < n; i++) {
    sxy += (i - meanX) * (values[i] - meanY);
    sxx += (i - meanX) * (i - meanX);
  }
  const slope = sxy / sxx;
  // Rounded to 15 significant digits, the digits a typed number keeps (0.1, 0.2 continue as 0.3,
  // not 0.30000000000000004, which would reach a span or x cell as typed; from memory of the
  // desktop spreadsheet's 15-digit precision).
  return (x) => Number((meanY + slope * (x - meanX)).toPrecision(15));
}

/**
 * The fill handle: `target` (the cells below or right of `source`, `direction` the drag) filled
 * from `source`; each source column (down) or row (right) of two or more numbers is extended as
 * a linear series, every other line is copied as filledBlock does.
 */
export function seriesBlock(source: Block, target: Block, direction: "down" | "right", inputAt: (row: number, col: number) => CellInput): CellInput[][] {
  const block = filledBlock(source, target, inputAt);
  const down = direction === "down";
  const length = down ? blockRows(source) : blockCols(source);
  if (length < 2) return block;
  const lines = down ? blockCols(target) : blockRows(target);
  for (let k = 0; k < lines; k++) {
    const values: number[] = [];
    for (let i = 0; i < length; i++) {
      const input = down ? inputAt(source.top + i, target.left + k) : inputAt(target.top + k, source.left + i);
      if (typeof input !== "number" || !Number.isFinite(input)) break;
      values.push(input);
    }
    if (values.length < length) continue;
    const trend = trendOf(values);
    const start = down ? target.top - source.top : target.left - source.left;
    const count = down ? blockRows(target) : blockCols(target);
    for (let j = 0; j < count; j++) {
      const value = trend(start + j);
      if (down) block[j][k] = value;
      else block[k][j] = value;
    }
  }
  return block;
}
