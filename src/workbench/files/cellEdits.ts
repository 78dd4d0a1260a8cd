/**
 * The cells a user changed, written into a worksheet part before its cached values are
 * stored (src/cli/xlsxBook.ts storeResults does that, as for `spanwise calc`). Each changed
 * cell keeps its style (`s`) and takes its new content; everything else is copied as it was.
 *
 * - A value is stored as the engine reads it (a number as a number, text as an inline string,
 *   TRUE/FALSE as a boolean, an error code as an error).
 * - A formula is stored as the host stores a dynamic array (`<f t="array" ref=...>` on a cell
 *   with the dynamic-array `cm`; ECMA-376 Part 1 §18.3.1.40, MS-XLSX), in saved form
 *   (`_xldudf_SPAN_...`, src/cli/savedForm.ts): the workbench spills every formula, so the
 *   saved file spills it too. A legacy (fixed-size) array whose formula only had a sheet
 *   renamed in it stays legacy, with its range, and a single-cell formula whose result is one
 *   cell stays a single-cell formula.
 * - A changed cell that anchored an array formula loses the cached values of the cells its
 *   range covered. A cell changed inside another dynamic array's range shrinks that range to
 *   its anchor (storeResults sets it to the size it spills to now). A cell changed inside a
 *   legacy array's range is refused: the host edits such an array only as a whole.
 * - When the first cell of a shared formula changes, the other cells of that group get their
 *   own formula text (the shared text is the first cell's).
 */
import { isCellError, mapCode, type CellInput, type CellResult } from "../../engine";
import { toSavedForm } from "../../cli/savedForm";
import { parseA1, rewriteSheet, scanSheet, type SheetEdits, type XmlCell } from "../../cli/sheetXml";
import { a1, rectText, type Rect } from "../../cli/xlsxBook";
import { encodeXml } from "../../cli/xmlText";
import type { CellChange } from "./document";
import { SaveError } from "./packageParts";

export interface SheetContext {
  sheet: string;
  /** 1-based `cm` indexes that mark dynamic arrays in this package. */
  dynamic: ReadonlySet<number>;
  /** The `cm` new formulas take (adds the metadata when the package has none). */
  dynamicIndex(): Promise<number>;
  /** The engine's formula of a cell (for shared-formula cells given their own text). */
  formulaAt(row: number, col: number): string | undefined;
  /** The engine's value of a cell (how a typed value is stored). */
  valueAt(row: number, col: number): CellResult;
  /** Whether a formula cell's result covers more than its own cell. */
  spills(row: number, col: number): boolean;
}

interface ArrayArea {
  rect: Rect;
  legacy: boolean;
  anchor: XmlCell;
}

/**
 * The spreadsheet host's limits: "Total number of characters that a cell can contain: 32,767"
 * and "Length of formula contents: 8,192 characters" (Microsoft support, "Excel specifications
 * and limits"). A cell beyond them is refused with its address rather than written for the host
 * to cut.
 */
export const MAX_TEXT = 32_767;
export const MAX_FORMULA = 8_192;

const LEGACY = /^=ARRAY_CONSTRAIN\(([\s\S]*),(\d+),(\d+)\)$/;

function numberText(n: number): string {
  return Object.is(n, -0) ? "0" : String(n);
}

/** Formula text as a saved file stores it (without the "="). */
function savedText(formula: string): string {
  return toSavedForm(mapCode(formula, (code) => code.replace(/\bspan\./gi, "SPAN."))).slice(1);
}

function styleOf(cell: XmlCell | undefined): string {
  const s = cell?.attrs.get("s");
  return s === undefined ? "" : ` s="${encodeXml(s)}"`;
}

/** A cell holding only its style (or nothing at all when it has none). */
function bareCell(ref: string, cell: XmlCell | undefined): string {
  const style = styleOf(cell);
  return style ? `<c r="${ref}"${style}/>` : "";
}

function valueCell(ref: string, style: string, value: CellResult): string {
  if (value === null || value === "") return style ? `<c r="${ref}"${style}/>` : "";
  if (isCellError(value)) return `<c r="${ref}"${style} t="e"><v>${encodeXml(value.error)}</v></c>`;
  if (typeof value === "number") return `<c r="${ref}"${style}><v>${numberText(value)}</v></c>`;
  if (typeof value === "boolean") return `<c r="${ref}"${style} t="b"><v>${value ? 1 : 0}</v></c>`;
  const space = /^\s|\s$/.test(value) ? ' xml:space="preserve"' : "";
  return `<c r="${ref}"${style} t="inlineStr"><is><t${space}>${encodeXml(value)}</t></is></c>`;
}

function inside(rect: Rect, row: number, col: number): boolean {
  return row >= rect.top && row <= rect.bottom && col >= rect.left && col <= rect.right;
}

/** Rows to the rectangles covering them (a rectangle's rows are listed once each). */
function byRow(rects: readonly Rect[]): Map<number, Rect[]> {
  const out = new Map<number, Rect[]>();
  for (const rect of rects) {
    for (let row = rect.top; row <= rect.bottom; row++) {
      let list = out.get(row);
      if (!list) out.set(row, (list = []));
      list.push(rect);
    }
  }
  return out;
}

/** The worksheet part with `changes` written in (see the file comment). */
export async function writeChanges(xml: string, changes: readonly CellChange[], context: SheetContext): Promise<string> {
  if (changes.length === 0) return xml;
  const changed = new Map<string, CellInput>();
  const changedRows = new Map<number, number[]>();
  for (const [row, col, input] of changes) {
    changed.set(`${row}:${col}`, input);
    let cols = changedRows.get(row);
    if (!cols) changedRows.set(row, (cols = []));
    cols.push(col);
  }
  const cells = new Map<string, XmlCell>();
  const arrays: ArrayArea[] = [];
  const sharedMasters = new Map<string, XmlCell>();
  scanSheet(xml, (cell) => {
    const key = `${cell.row}:${cell.col}`;
    cells.set(key, cell);
    const f = cell.formula;
    if (!f) return;
    if (f.type === "array" && f.ref) {
      const [from, to = from] = f.ref.split(":");
      const a = parseA1(from);
      const b = parseA1(to);
      if (a && b) arrays.push({ rect: { top: a.row, left: a.col, bottom: b.row, right: b.col }, legacy: !context.dynamic.has(Number(cell.attrs.get("cm"))), anchor: cell });
    }
    if (f.type === "shared" && f.si !== undefined && f.text.trim() !== "" && changed.has(key)) sharedMasters.set(f.si, cell);
  });

  const replace = new Map<string, string>();
  const clear: Rect[] = [];
  const keptLegacy = new Set<string>();
  for (const area of arrays) {
    const anchorKey = `${area.anchor.row}:${area.anchor.col}`;
    const input = changed.get(anchorKey);
    if (changed.has(anchorKey)) {
      // A legacy array whose formula text changed only by a rename keeps its range.
      const legacy = area.legacy && typeof input === "string" ? LEGACY.exec(input) : null;
      const rows = area.rect.bottom - area.rect.top + 1;
      const cols = area.rect.right - area.rect.left + 1;
      if (!legacy || Number(legacy[2]) !== rows || Number(legacy[3]) !== cols) {
        clear.push(area.rect);
        continue;
      }
      keptLegacy.add(anchorKey);
      const ref = rectText(area.rect);
      replace.set(anchorKey, `<c r="${a1(area.anchor.row, area.anchor.col)}"${styleOf(area.anchor)}><f t="array" ref="${ref}">${encodeXml(savedText(`=${legacy[1]}`))}</f></c>`);
    }
    let hit: [number, number] | undefined;
    for (let row = area.rect.top; row <= area.rect.bottom && !hit; row++) {
      const col = changedRows.get(row)?.find((c) => inside(area.rect, row, c) && !(row === area.anchor.row && c === area.anchor.col));
      if (col !== undefined) hit = [row, col];
    }
    if (!hit) continue;
    if (area.legacy) {
      throw new SaveError(
        `${context.sheet}!${a1(hit[0], hit[1])} was changed inside the fixed-size (legacy) array formula of ${context.sheet}!${rectText(area.rect)}, which the spreadsheet host edits only as a whole: undo that change, or enter the array formula again`,
      );
    }
    // A dynamic array the user typed into: its range shrinks to its anchor until it is stored again.
    const anchor = area.anchor;
    const f = anchor.formula!;
    const fTag = xml.slice(f.tagStart, f.tagEnd).replace(/(\sref\s*=\s*)(?:"[^"]*"|'[^']*')/, `$1"${a1(anchor.row, anchor.col)}"`);
    replace.set(anchorKey, xml.slice(anchor.start, f.tagStart) + fTag + xml.slice(f.tagEnd, anchor.end));
    clear.push(area.rect);
  }
  const clearRows = byRow(clear);

  const needsIndex = changes.some(([, , input]) => typeof input === "string" && input.startsWith("="));
  const cm = needsIndex ? await context.dynamicIndex() : 0;
  const newCell = (row: number, col: number, input: CellInput, existing: XmlCell | undefined): string => {
    const ref = a1(row, col);
    const style = styleOf(existing);
    if (typeof input === "string" && input.startsWith("=")) {
      const length = savedText(input).length + 1;
      if (length > MAX_FORMULA) throw new SaveError(`${context.sheet}!${ref}: its formula is ${length} characters as saved; the spreadsheet host takes at most ${MAX_FORMULA}`);
      // A single-cell formula whose text changed (a sheet renamed in it) stays one while its result is one cell.
      const f = existing?.formula;
      if (f && f.type === undefined && !context.spills(row, col)) return `<c r="${ref}"${style}><f>${encodeXml(savedText(input))}</f></c>`;
      return `<c r="${ref}"${style} cm="${cm}"><f t="array" ref="${ref}">${encodeXml(savedText(input))}</f></c>`;
    }
    if (input === null || input === undefined || input === "") return bareCell(ref, existing);
    const value = context.valueAt(row, col);
    if (typeof value === "string" && value.length > MAX_TEXT) throw new SaveError(`${context.sheet}!${ref}: its text is ${value.length} characters; a cell of the spreadsheet host holds at most ${MAX_TEXT}`);
    return valueCell(ref, style, value);
  };

  for (const [key, cell] of cells) {
    if (keptLegacy.has(key)) continue;
    if (changed.has(key)) {
      replace.set(key, newCell(cell.row, cell.col, changed.get(key), cell));
      continue;
    }
    const isAnchor = replace.has(key);
    if (!isAnchor && clearRows.get(cell.row)?.some((rect) => inside(rect, cell.row, cell.col))) {
      replace.set(key, bareCell(a1(cell.row, cell.col), cell));
      continue;
    }
    const f = cell.formula;
    if (!isAnchor && f && f.type === "shared" && f.si !== undefined && f.text.trim() === "" && sharedMasters.has(f.si)) {
      const formula = context.formulaAt(cell.row, cell.col);
      if (formula === undefined) throw new SaveError(`${context.sheet}!${a1(cell.row, cell.col)}: its shared formula could not be given its own text`);
      replace.set(key, `<c r="${a1(cell.row, cell.col)}"${styleOf(cell)}><f>${encodeXml(savedText(formula))}</f></c>`);
    }
  }

  const insert: SheetEdits["insert"] = new Map();
  for (const [row, col, input] of changes) {
    if (cells.has(`${row}:${col}`)) continue;
    const text = newCell(row, col, input, undefined);
    if (text === "") continue;
    let list = insert.get(row);
    if (!list) insert.set(row, (list = []));
    list.push({ col, text });
  }
  return rewriteSheet(xml, { replace, insert });
}
