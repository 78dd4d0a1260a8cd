/**
 * Cell references inside formula text, rewritten one by one: the one rule both the workbench's
 * fill (relative references follow the copy, `$` parts stay) and row insertion and deletion
 * (references to moved rows follow them) use. String literals are never touched, nor function
 * names that look like a cell (`LOG10(`), nor names with a dot (`SPAN.X1`). A reference moved
 * off the sheet becomes `#REF!`, as spreadsheets write it. Whole-column and whole-row ranges
 * (`A:A`, `3:5`) are left as they are.
 *
 * Why not the engine's own copy/paste or moveCells: they move the engine's formula text, in
 * which `A1#` has already been replaced by the range the spill covers now (and saved forms
 * normalized), so a filled `=SUM(H12#)` would become a fixed range; the workbook keeps the
 * typed text, and this rewrites that.
 */
import { columnLetters, columnNumber, mapCode } from "./formulaText";

/** The sheet size references must stay within (the workbook's limits). */
export interface SheetLimits {
  rows: number;
  cols: number;
}

export interface CellReference {
  /** The sheet prefix as written, without the "!" ("Member", "'My sheet'"); undefined when unqualified. */
  sheet: string | undefined;
  row: number;
  col: number;
  rowAbsolute: boolean;
  colAbsolute: boolean;
  /** Where the reference sits in a range: "start" of A1:B2, "end", or "single". */
  role: "start" | "end" | "single";
}

/** Group 1: the character before (no lookbehind: pane-bundled code), 2: sheet prefix, 3-6: $col$row. */
const CELL = /(^|[^\w$.!'"])((?:'(?:[^']|'')+'|[A-Za-z_][\w.]*)!)?(\$?)([A-Za-z]{1,3})(\$?)(\d+)(?![\w(.!])/g;

/**
 * Rewrites every cell reference: `map` gives the new row and column (absolute markers kept),
 * or null for a reference that no longer exists (`#REF!`).
 */
export function mapReferences(formula: string, limits: SheetLimits, map: (ref: CellReference) => { row: number; col: number } | null): string {
  return mapCode(formula, (code) =>
    code.replace(CELL, (whole, before: string, prefix: string | undefined, colDollar: string, letters: string, rowDollar: string, digits: string, at: number) => {
      const col = columnNumber(letters);
      const row = Number(digits) - 1;
      if (col >= limits.cols || row < 0 || row >= limits.rows) return whole;
      const end = at + whole.length;
      const role = code[end] === ":" ? "start" : before === ":" ? "end" : "single";
      const ref: CellReference = { sheet: prefix?.slice(0, -1), row, col, rowAbsolute: rowDollar === "$", colAbsolute: colDollar === "$", role };
      const moved = map(ref);
      if (moved === null) return `${before}${prefix ?? ""}#REF!`;
      if (moved.row < 0 || moved.col < 0 || moved.row >= limits.rows || moved.col >= limits.cols) return `${before}${prefix ?? ""}#REF!`;
      return `${before}${prefix ?? ""}${colDollar}${columnLetters(moved.col)}${rowDollar}${moved.row + 1}`;
    }),
  );
}

/** The formula as it reads when copied `rows` down and `cols` right: relative parts move, `$` parts stay. */
export function shiftFormula(formula: string, rows: number, cols: number, limits: SheetLimits): string {
  if (!formula.startsWith("=") || (rows === 0 && cols === 0)) return formula;
  return mapReferences(formula, limits, (ref) => ({ row: ref.rowAbsolute ? ref.row : ref.row + rows, col: ref.colAbsolute ? ref.col : ref.col + cols }));
}

/** Does a reference's sheet prefix name this sheet (unqualified references name the formula's own sheet)? */
export function namesSheet(prefix: string | undefined, sheetName: string, ownSheet: boolean): boolean {
  if (prefix === undefined) return ownSheet;
  const name = prefix.startsWith("'") ? prefix.slice(1, -1).replace(/''/g, "'") : prefix;
  return name.toLowerCase() === sheetName.toLowerCase();
}

/**
 * The formula after `count` rows were inserted (count > 0) before row `at`, or deleted
 * (count < 0) from row `at` on, in sheet `sheetName`; `ownSheet` says whether the formula
 * lives in that sheet. References to rows below follow them, absolute or not; a single
 * reference into deleted rows is `#REF!`; a range keeps the rows that remain.
 */
export function formulaAfterRows(formula: string, sheetName: string, ownSheet: boolean, at: number, count: number, limits: SheetLimits): string {
  if (!formula.startsWith("=") || count === 0) return formula;
  return mapReferences(formula, limits, (ref) => {
    if (!namesSheet(ref.sheet, sheetName, ownSheet) || ref.row < at) return { row: ref.row, col: ref.col };
    if (count > 0) return { row: ref.row + count, col: ref.col };
    const removed = -count;
    if (ref.row >= at + removed) return { row: ref.row - removed, col: ref.col };
    if (ref.role === "start") return { row: at, col: ref.col };
    if (ref.role === "end" && at > 0) return { row: at - 1, col: ref.col };
    return null;
  });
}
