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
import { columnLetters, columnNumber, formulaPieces } from "./formulaText";

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

/** A reference found in formula text, with the text around its cell part kept as written. */
interface FoundReference {
  ref: CellReference;
  /** The character before the reference, and its sheet prefix with the "!" ("" when unqualified). */
  lead: string;
  colDollar: string;
  rowDollar: string;
}

/** Formula text cut into the text between references (strings) and the references themselves. */
type Template = (string | FoundReference)[];

/** The references of a formula, found once: string literals and references off the sheet stay text. */
function templateOf(formula: string, limits: SheetLimits): Template {
  const parts: Template = [];
  let text = "";
  for (const piece of formulaPieces(formula)) {
    if (!piece.code) {
      text += piece.text;
      continue;
    }
    const code = piece.text;
    let last = 0;
    for (const match of code.matchAll(CELL)) {
      const [whole, before, prefix, colDollar, letters, rowDollar, digits] = match;
      const at = match.index ?? 0;
      const col = columnNumber(letters);
      const row = Number(digits) - 1;
      text += code.slice(last, at);
      last = at + whole.length;
      if (col >= limits.cols || row < 0 || row >= limits.rows) {
        text += whole;
        continue;
      }
      const role = code[last] === ":" ? "start" : before === ":" ? "end" : "single";
      if (text !== "") parts.push(text);
      text = "";
      const ref: CellReference = { sheet: prefix?.slice(0, -1), row, col, rowAbsolute: rowDollar === "$", colAbsolute: colDollar === "$", role };
      parts.push({ ref, lead: `${before}${prefix ?? ""}`, colDollar, rowDollar });
    }
    text += code.slice(last);
  }
  if (text !== "") parts.push(text);
  return parts;
}

/** A reference's text up to its row number when it moves to column `col`; undefined off the sheet. */
function referenceHead(part: FoundReference, col: number, limits: SheetLimits): string | undefined {
  return col < 0 || col >= limits.cols ? undefined : `${part.lead}${part.colDollar}${columnLetters(col)}${part.rowDollar}`;
}

/** A moved reference's text from its head (referenceHead) and new row: `#REF!` when either is off the sheet. */
function referenceText(part: FoundReference, head: string | undefined, row: number, limits: SheetLimits): string {
  return head === undefined || row < 0 || row >= limits.rows ? `${part.lead}#REF!` : `${head}${row + 1}`;
}

/** The formula written from its template, each reference where `map` puts it (`#REF!` for null or off the sheet). */
function render(parts: Template, limits: SheetLimits, map: (ref: CellReference) => { row: number; col: number } | null): string {
  let out = "";
  for (const part of parts) {
    if (typeof part === "string") {
      out += part;
      continue;
    }
    const moved = map(part.ref);
    out += moved === null ? `${part.lead}#REF!` : referenceText(part, referenceHead(part, moved.col, limits), moved.row, limits);
  }
  return out;
}

/**
 * Rewrites every cell reference: `map` gives the new row and column (absolute markers kept),
 * or null for a reference that no longer exists (`#REF!`).
 */
export function mapReferences(formula: string, limits: SheetLimits, map: (ref: CellReference) => { row: number; col: number } | null): string {
  return render(templateOf(formula, limits), limits, map);
}

/**
 * The formula as it reads copied `rows` down and `cols` right, for any offset: the references
 * are found once (a fill writes one source formula into thousands of cells).
 */
export function formulaShifter(formula: string, limits: SheetLimits): (rows: number, cols: number) => string {
  if (!formula.startsWith("=")) return () => formula;
  const parts = templateOf(formula, limits);
  // Each reference's head (referenceHead) for the last column offset asked (a fill down asks one).
  let heads: (string | undefined)[] = [];
  let headsFor: number | undefined;
  return (rows, cols) => {
    if (rows === 0 && cols === 0) return formula;
    if (headsFor !== cols) {
      heads = parts.map((part) => (typeof part === "string" ? part : referenceHead(part, part.ref.colAbsolute ? part.ref.col : part.ref.col + cols, limits)));
      headsFor = cols;
    }
    let out = "";
    for (let i = 0; i < parts.length; i++) {
      const part = parts[i];
      if (typeof part === "string") {
        out += part;
        continue;
      }
      out += referenceText(part, heads[i], part.ref.rowAbsolute ? part.ref.row : part.ref.row + rows, limits);
    }
    return out;
  };
}

/** The formula as it reads when copied `rows` down and `cols` right: relative parts move, `$` parts stay. */
export function shiftFormula(formula: string, rows: number, cols: number, limits: SheetLimits): string {
  if (!formula.startsWith("=") || (rows === 0 && cols === 0)) return formula;
  return formulaShifter(formula, limits)(rows, cols);
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
