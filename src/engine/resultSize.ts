/**
 * Spill size of a SPAN call predicted from the formula text, before anything is evaluated.
 * The formula engine reserves the spill area from this prediction; where the text cannot tell
 * (a spans list in one text cell, a DIAGRAM whose rows depend on the member), the prediction
 * is a first guess and the workbook learns the true size from the first evaluation
 * (see learnedSizes.ts and workbook.ts).
 */
import type { SizeRule, SpanFunctionEntry } from "./catalogue";

export interface BlockSize {
  rows: number;
  cols: number;
}

/** The little of the engine's syntax tree this module reads. */
export interface ArgumentNode {
  type: string;
  value?: unknown;
  /** The function's name, for a call such as TRUE() or FALSE(). */
  procedureName?: unknown;
}

/** Size of an argument's value as the engine predicts it (a range's shape, 1 x 1 for a cell). */
export type ArgumentSize = (node: ArgumentNode) => BlockSize;

/** The text a single-cell reference holds as typed, when it is a plain text (not a formula). */
export type ReferencedText = (node: ArgumentNode) => string | undefined;

export const DEFAULT_DIAGRAM_POINTS = 101;

export function isGiven(node: ArgumentNode | undefined): node is ArgumentNode {
  return node !== undefined && node.type !== "EMPTY";
}

/** Number of spans written in the spans argument, as far as the text tells. */
export function spanCountFromText(node: ArgumentNode, sizeOf: ArgumentSize, textOf?: ReferencedText): number {
  const text = node.type === "STRING" && typeof node.value === "string" ? node.value : node.type === "CELL_REFERENCE" ? textOf?.(node) : undefined;
  if (text !== undefined) return Math.max(1, countEntries(text));
  if (node.type === "NUMBER") return 1;
  const size = sizeOf(node);
  return Math.max(1, size.rows * size.cols);
}

/** Entries of a one-cell list such as "6 8 6" or "6, 8": a linear scan, no backtracking. */
export function countEntries(text: string): number {
  let count = 0;
  let inEntry = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    const separator = ch === 32 || ch === 44 || ch === 59 || (ch >= 9 && ch <= 13) || ch === 160;
    if (!separator && !inEntry) count++;
    inEntry = !separator;
  }
  return count;
}

/**
 * Whether a headers argument asks for a header row, as far as the text tells: blank, 0, FALSE
 * and "no" do not; a literal yes does; a reference or formula is taken to (the workbook learns
 * the true size from the first evaluation if not). Words as in src/sheet/headers.ts.
 */
export function headersAsked(node: ArgumentNode | undefined): boolean {
  if (!isGiven(node)) return false;
  if (node.type === "NUMBER") return node.value !== 0;
  if (node.type === "STRING") return typeof node.value === "string" && !["", "no", "false", "n", "0"].includes(node.value.trim().toLowerCase());
  if (node.type === "FUNCTION_CALL" && typeof node.procedureName === "string") return node.procedureName.toUpperCase() !== "FALSE";
  return true;
}

export function predictSize(entry: SpanFunctionEntry, args: readonly ArgumentNode[], sizeOf: ArgumentSize, textOf?: ReferencedText): BlockSize {
  const argument = (name: string): ArgumentNode | undefined => args[entry.arguments.findIndex((arg) => arg.name === name)];
  const size = bodySize(entry, argument, sizeOf, textOf);
  const hasHeaders = entry.arguments.some((arg) => arg.name === "headers");
  return hasHeaders && headersAsked(argument("headers")) ? { rows: size.rows + 1, cols: size.cols } : size;
}

/** The size of the result without its header row. */
function bodySize(entry: SpanFunctionEntry, argument: (name: string) => ArgumentNode | undefined, sizeOf: ArgumentSize, textOf?: ReferencedText): BlockSize {
  const rule: SizeRule = entry.sizeRule;
  switch (rule) {
    case "perNode": {
      const spans = argument("spans");
      return { rows: (spans ? spanCountFromText(spans, sizeOf, textOf) : 1) + 1, cols: 3 };
    }
    case "shapeOfX": {
      const x = argument("x");
      return isGiven(x) ? sizeOf(x) : { rows: 1, cols: 1 };
    }
    case "twoByTwo":
      return { rows: 2, cols: 2 };
    case "extremes":
      return { rows: isGiven(argument("EI")) ? 4 : 2, cols: 5 };
    case "rowPerX": {
      const x = argument("x");
      const size = isGiven(x) ? sizeOf(x) : { rows: 1, cols: 1 };
      return { rows: Math.max(1, size.rows * size.cols), cols: 5 };
    }
    case "peaks":
      return { rows: isGiven(argument("EI")) ? 4 : 2, cols: 7 };
    case "shapeOfPositions": {
      const positions = argument("positions");
      return isGiven(positions) ? sizeOf(positions) : { rows: 1, cols: 1 };
    }
    case "twoByFive":
      return { rows: 2, cols: 5 };
    case "learned":
      return { rows: 1, cols: 1 };
    case "diagram": {
      const points = argument("points");
      const count = points && points.type === "NUMBER" && typeof points.value === "number" ? Math.trunc(points.value) : DEFAULT_DIAGRAM_POINTS;
      return { rows: Math.max(2, count), cols: 5 };
    }
  }
}
