/**
 * A workbook package read into the engine and written back with new cached values.
 *
 * Reading takes every worksheet's cells from its XML (shared strings, inline strings, shared
 * formulas moved to each cell) and drops the cached values inside array formula ranges, so
 * the engine spills afresh. Writing changes only the cached values of formula cells and of
 * the cells a dynamic array spills into: each formula cell gets its new `<v>` and `t`, a
 * dynamic array (an anchor whose `cm` marks it dynamic) gets its new `ref`, cells its spill no
 * longer covers lose their cached value, cells it newly covers are added. Every other byte of
 * every part stays as it was.
 *
 * Formula kinds, as the host stores them (ECMA-376 Part 1 §18.3.1.40; MS-XLSX dynamic arrays):
 * - dynamic array: `<f t="array" ref=...>` on a cell with `cm` pointing at dynamicArrayProperties
 *   fDynamic="1": evaluated as typed, spills at its computed size;
 * - legacy array (no such `cm`): its range is fixed; the result is cut to it and the cells it
 *   does not reach show #N/A, as the host fills them;
 * - plain `<f>`: a single-cell formula. The host reads it with implicit intersection (Microsoft
 *   support, "Implicit intersection operator: @"); a result of several cells is refused with a
 *   message rather than guessed.
 */
import { isCellError, normalizeFormula, SHEET_LIMITS, SpanWorkbook, type CellInput, type CellResult, type SheetInput } from "../engine";
import { ByteSink, utf8Of } from "./byteText";
import { FormulaTable, type FormulaCell, type FormulaKind, type Rect } from "./formulaTable";
import { parseA1, rewriteSheetInto, scanSheet, type XmlCell } from "./sheetXml";
import { shiftFormula } from "./sharedFormula";
import { encodeXml } from "./xmlText";
import { XlsxPackage, type DefinedName } from "./xlsxPackage";

/** Problems with the file itself: it is refused as a whole (exit code for unreadable input). */
export class BookError extends Error {}

/** Cells in all legacy (fixed-size) array ranges together: each of them is written. */
export const MAX_LEGACY_ARRAY_CELLS = 2_000_000;

export { FormulaTable, type FormulaCell, type Rect };

export interface SheetBook {
  name: string;
  /** The worksheet part (its text is read again when written: big sheets hold one copy at a time). */
  path: string;
  /** Every formula cell, in document order. */
  formulas: FormulaTable;
  /** Plain (single-cell) formulas whose result spilled, by index in `formulas`: refused (see evaluateBook). */
  refused: Map<number, { rows: number; cols: number }>;
}

export interface LoadedBook {
  pkg: XlsxPackage;
  sheets: SheetBook[];
  inputs: SheetInput[];
  names: DefinedName[];
  formulaCount: number;
  /** SPAN calls written in formulas (an estimate of the solver work, for progress). */
  spanCallCount: number;
}

export interface CellProblem {
  sheet: string;
  address: string;
  error: string;
  message: string;
}

const SPAN_CALL = /(?:_xldudf_|_xll\.)?SPAN[._][A-Z]+\s*\(/gi;

export function a1(row: number, col: number): string {
  let letters = "";
  for (let n = col + 1; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return `${letters}${row + 1}`;
}

export function rectText(rect: Rect): string {
  const from = a1(rect.top, rect.left);
  return rect.bottom === rect.top && rect.right === rect.left ? from : `${from}:${a1(rect.bottom, rect.right)}`;
}

/** An array formula's `ref`, checked against its cell and the sheet's bounds. */
export function parseArrayRef(ref: string | undefined, row: number, col: number, where: string): Rect {
  const text = ref ?? "";
  const [from, to = from, extra] = text.split(":");
  const a = from === undefined ? undefined : parseA1(from);
  const b = to === undefined ? undefined : parseA1(to);
  if (extra !== undefined || !a || !b) throw new BookError(`${where}: the array formula's range "${text.slice(0, 40)}" is not a cell range`);
  if (a.row !== row || a.col !== col) throw new BookError(`${where}: the array formula's range ${text} does not start at its own cell`);
  if (b.row < a.row || b.col < a.col) throw new BookError(`${where}: the array formula's range ${text} runs backwards`);
  if (b.row >= SHEET_LIMITS.rows || b.col >= SHEET_LIMITS.cols) {
    throw new BookError(`${where}: the array formula's range ${text} reaches beyond the sheet (${SHEET_LIMITS.rows} rows, ${SHEET_LIMITS.cols} columns)`);
  }
  return { top: a.row, left: a.col, bottom: b.row, right: b.col };
}

/**
 * Rectangles met row by row, in order of their top row: `at(row)` gives those covering the
 * row, sorted by left column (pairwise apart, which `add` checks), `find(col)` the one
 * covering a column. Rows must be asked in increasing order.
 */
export class RowSweep<T extends Rect> {
  private readonly pending: T[];
  private next = 0;
  private active: T[] = [];
  private minBottom = Number.POSITIVE_INFINITY;
  private maxBottom = Number.NEGATIVE_INFINITY;
  private row = -1;

  constructor(
    rects: readonly T[],
    private readonly onOverlap?: (a: T, b: T) => void,
  ) {
    this.pending = [...rects].sort((x, y) => x.top - y.top || x.left - y.left);
  }

  at(row: number): readonly T[] {
    if (row !== this.row) {
      this.row = row;
      // Each rectangle leaves once: the list is filtered only when the nearest bottom is passed.
      if (this.minBottom < row) {
        this.active = this.active.filter((rect) => rect.bottom >= row);
        this.minBottom = this.active.reduce((least, rect) => Math.min(least, rect.bottom), Number.POSITIVE_INFINITY);
        this.maxBottom = this.active.reduce((most, rect) => Math.max(most, rect.bottom), Number.NEGATIVE_INFINITY);
      }
      while (this.next < this.pending.length && this.pending[this.next].top <= row) {
        const rect = this.pending[this.next++];
        if (rect.bottom >= row) {
          this.insert(rect);
          this.minBottom = Math.min(this.minBottom, rect.bottom);
          this.maxBottom = Math.max(this.maxBottom, rect.bottom);
        }
      }
    }
    return this.active;
  }

  /** The first row at or after `row` that some rectangle covers, or undefined. */
  nextRow(row: number): number | undefined {
    if (this.maxBottom >= row) return row;
    return this.next < this.pending.length ? Math.max(row, this.pending[this.next].top) : undefined;
  }

  find(col: number): T | undefined {
    let lo = 0;
    let hi = this.active.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const rect = this.active[mid];
      if (col < rect.left) hi = mid - 1;
      else if (col > rect.right) lo = mid + 1;
      else return rect;
    }
    return undefined;
  }

  private insert(rect: T): void {
    let lo = 0;
    let hi = this.active.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.active[mid].left < rect.left) lo = mid + 1;
      else hi = mid;
    }
    const before = this.active[lo - 1];
    const after = this.active[lo];
    if (before && before.right >= rect.left) this.onOverlap?.(before, rect);
    else if (after && after.left <= rect.right) this.onOverlap?.(rect, after);
    this.active.splice(lo, 0, rect);
  }
}

function cellInput(cell: XmlCell, strings: readonly string[], where: () => string): CellInput {
  const type = cell.attrs.get("t");
  if (type === "inlineStr") return textInput(cell.inline ?? "");
  const v = cell.value;
  if (v === undefined) return null;
  switch (type) {
    case "s": {
      // The shared strings are made engine text once (readBook), not once per cell.
      const text = strings[Number(v)];
      if (text === undefined) throw new BookError(`${where()}: shared string ${v} does not exist`);
      return text;
    }
    case "str":
      return textInput(v);
    case "b":
      return v === "1" || v === "true";
    case "e":
      return v;
    default: {
      const n = Number(v);
      if (v.trim() === "" || !Number.isFinite(n)) throw new BookError(`${where()}: the value "${v.slice(0, 40)}" is not a number`);
      return n;
    }
  }
}

/**
 * Raw text the formula engine would not keep as text: a formula ("="), a leading apostrophe
 * (dropped), a number ("123", " 42 ", "1e3", "-5", ".5", "12%", "$12", "12$"), a truth value
 * ("TRUE"), an error ("#N/A"). A wider net than the engine's own reading (text starting with
 * a digit, a sign, ".", "$" or "#"): an apostrophe too many costs nothing, one too few turns
 * text into a number. Checked against the engine over every 1-3 piece combination of digits,
 * signs, "." "," "%" "$" "e" "#N/A" "TRUE" "=" "'" and spaces (none missed).
 */
const READ_AS_OTHER = /^(?:['=#]|\s*[-+.$\d]|\s*(?:true|false)\s*$)/i;

/**
 * A text cell as the engine must take it to keep it text, as the host keeps it (a text cell
 * is text: ISTEXT TRUE, handed to functions as text): behind an apostrophe, which the engine
 * reads as "the rest is text" and drops.
 */
export function textInput(text: string): string {
  return READ_AS_OTHER.test(text) ? `'${text}` : text;
}

/** Reads a package; throws BookError (or PackageError) saying why it cannot be used. */
export async function readBook(bytes: Uint8Array): Promise<LoadedBook> {
  const pkg = await XlsxPackage.open(bytes);
  const parts = pkg.sheets();
  if (parts.length === 0) throw new BookError("it holds no worksheets");
  const strings = (await pkg.sharedStrings()).map(textInput);
  const dynamic = await pkg.dynamicArrayIndexes();
  const sheets: SheetBook[] = [];
  const inputs: SheetInput[] = [];
  let formulaCount = 0;
  let spanCallCount = 0;
  let legacyCells = 0;
  for (const part of parts) {
    // Read as bytes: every text taken from it is a fresh string, so the part itself is let go after.
    const xml = await pkg.partBinary(part.path);
    if (xml === undefined) throw new BookError(`sheet "${part.name}" is missing from the package (${part.path})`);
    const cells: CellInput[][] = [];
    const formulas = new FormulaTable();
    const masters = new Map<string, { row: number; col: number; text: string }>();
    const followers: { row: number; col: number; si: string; kind: FormulaKind; ref?: Rect }[] = [];
    const whereOf = (row: number, col: number) => `${part.name}!${a1(row, col)}`;
    try {
      scanSheet(xml, (cell) => {
        const row = (cells[cell.row] ??= []);
        const f = cell.formula;
        if (!f) {
          row[cell.col] = cellInput(cell, strings, () => whereOf(cell.row, cell.col));
          return;
        }
        formulaCount++;
        let text = f.text;
        const follows = f.type === "shared" && f.si !== undefined && text.trim() === "";
        if (f.type === "shared" && f.si !== undefined && !follows) masters.set(f.si, { row: cell.row, col: cell.col, text });
        if (follows) text = "";
        let kind: FormulaKind = "plain";
        let ref: Rect | undefined;
        if (f.type === "array") {
          ref = parseArrayRef(f.ref, cell.row, cell.col, whereOf(cell.row, cell.col));
          const cm = Number(cell.attrs.get("cm"));
          kind = dynamic.has(cm) ? "dynamic" : "legacy";
          if (kind === "legacy") {
            legacyCells += (ref.bottom - ref.top + 1) * (ref.right - ref.left + 1);
            if (legacyCells > MAX_LEGACY_ARRAY_CELLS) throw new BookError(`${whereOf(cell.row, cell.col)}: legacy array formulas cover more than ${MAX_LEGACY_ARRAY_CELLS} cells in all`);
          }
        }
        formulas.add(cell.row, cell.col, kind, ref);
        if (follows) followers.push({ row: cell.row, col: cell.col, si: f.si!, kind, ref });
        spanCallCount += text.match(SPAN_CALL)?.length ?? 0;
        row[cell.col] = text === "" ? null : engineFormula(text, kind, ref);
      }, undefined, undefined, { bytes: true });
    } catch (error) {
      if (error instanceof BookError) throw error;
      throw new BookError(`sheet "${part.name}" cannot be read: ${error instanceof Error ? error.message : String(error)}`);
    }
    for (const follower of followers) {
      const master = masters.get(follower.si);
      if (!master) throw new BookError(`${whereOf(follower.row, follower.col)}: its shared formula ${follower.si} has no first cell`);
      const text = shiftFormula(master.text, follower.row - master.row, follower.col - master.col);
      spanCallCount += text.match(SPAN_CALL)?.length ?? 0;
      cells[follower.row][follower.col] = engineFormula(text, follower.kind, follower.ref);
    }
    checkArrayRanges(part.name, formulas, cells);
    for (let r = 0; r < cells.length; r++) cells[r] ??= [];
    sheets.push({ name: part.name, path: part.path, formulas, refused: new Map() });
    inputs.push({ name: part.name, cells });
  }
  return { pkg, sheets, inputs, names: pkg.definedNames(), formulaCount, spanCallCount };
}

function engineFormula(text: string, kind: FormulaKind, ref: Rect | undefined): string {
  const typed = normalizeFormula(`=${text}`);
  if (kind !== "legacy" || !ref) return typed;
  return `=ARRAY_CONSTRAIN(${typed.slice(1)},${ref.bottom - ref.top + 1},${ref.right - ref.left + 1})`;
}

/** The stored ranges that cover more than their own cell (a one-cell range holds only its formula), with their anchors. */
function widerRanges(formulas: FormulaTable): (Rect & { anchor: FormulaCell })[] {
  const out: (Rect & { anchor: FormulaCell })[] = [];
  for (let i = 0; i < formulas.length; i++) {
    if (formulas.coversOthers(i)) out.push({ ...formulas.ref(i)!, anchor: { row: formulas.row(i), col: formulas.col(i), kind: formulas.kind(i) } });
  }
  return out;
}

/**
 * Array ranges must not overlap, nor hold another formula; their cached values are dropped.
 * (A one-cell range inside another is the formula it covers.)
 */
function checkArrayRanges(sheet: string, formulas: FormulaTable, cells: CellInput[][]): void {
  const arrays = widerRanges(formulas);
  if (arrays.length === 0) return;
  const sweep = new RowSweep(arrays, (a, b) => {
    throw new BookError(`${sheet}!${a1(b.anchor.row, b.anchor.col)}: the array formula's range ${rectText(b)} overlaps the range ${rectText(a)} of ${a1(a.anchor.row, a.anchor.col)}`);
  });
  // Only rows that hold cells are visited: a range's area is never walked.
  for (let row = sweep.nextRow(0); row !== undefined && row < cells.length; row = sweep.nextRow(row + 1)) {
    const active = sweep.at(row);
    const line = cells[row];
    if (!line) continue;
    if (active.length === 0) continue;
    for (let col = 0; col < line.length; col++) {
      if (line[col] === undefined) continue;
      const rect = sweep.find(col);
      if (!rect || (rect.anchor.row === row && rect.anchor.col === col)) continue;
      if (formulas.indexOf(row, col) >= 0) {
        throw new BookError(`${sheet}!${a1(rect.anchor.row, rect.anchor.col)}: the array formula's range ${rectText(rect)} covers the formula in ${a1(row, col)}`);
      }
      line[col] = null;
    }
  }
}

/**
 * A workbook evaluated from a loaded book. A plain (single-cell) formula whose result spills
 * is refused (see the file comment): the engine holds an error there instead, so nothing
 * reads values the host would not show.
 */
export function evaluateBook(book: LoadedBook, onSpanCall?: () => void): SpanWorkbook {
  const evaluated = new SpanWorkbook(book.inputs, { onSpanCall, names: book.names });
  // The engine holds the cells now: the read copy is let go (big schedules).
  book.inputs.splice(0);
  book.sheets.forEach((sheet) => {
    const id = evaluated.sheetId(sheet.name);
    const formulas = sheet.formulas;
    for (let i = 0; i < formulas.length; i++) {
      if (formulas.kind(i) !== "plain") continue;
      const size = evaluated.spillSize(id, formulas.row(i), formulas.col(i));
      if (size && (size.rows > 1 || size.cols > 1)) {
        sheet.refused.set(i, size);
        evaluated.setCell(id, formulas.row(i), formulas.col(i), "=#VALUE!");
      }
    }
  });
  return evaluated;
}

/** Text of a number as the file stores it (xsd:double; shortest text that reads back the same). */
function numberText(n: number): string {
  return Object.is(n, -0) ? "0" : String(n);
}

interface ValueXml {
  type?: string;
  content: string;
}

/** The XML of a value, as the part's bytes (UTF-8; the sheet is written as a byte string). */
function formulaValue(value: CellResult): ValueXml {
  if (value === null) return { content: "" };
  if (isCellError(value)) return { type: "e", content: `<v>${utf8Of(encodeXml(value.error))}</v>` };
  if (typeof value === "number") return { content: `<v>${numberText(value)}</v>` };
  if (typeof value === "boolean") return { type: "b", content: `<v>${value ? 1 : 0}</v>` };
  return { type: "str", content: `<v>${utf8Of(encodeXml(value))}</v>` };
}

function plainValue(value: CellResult): ValueXml {
  if (typeof value === "string") {
    const space = /^\s|\s$/.test(value) ? ' xml:space="preserve"' : "";
    return { type: "inlineStr", content: `<is><t${space}>${utf8Of(encodeXml(value))}</t></is>` };
  }
  return formulaValue(value);
}

/** The start tag with its `t` attribute set to `type` (or removed). */
function withType(startTag: string, type: string | undefined): string {
  const closing = startTag.endsWith("/>") ? "/>" : ">";
  const body = startTag.slice(0, -closing.length).replace(/\s+t\s*=\s*(?:"[^"]*"|'[^']*')/, "");
  return `${body.trimEnd()}${type ? ` t="${type}"` : ""}${closing}`;
}

/** The `<f>` start tag with a new `ref`. */
function withRef(tag: string, ref: string): string {
  return tag.replace(/(\sref\s*=\s*)(?:"[^"]*"|'[^']*')/, `$1"${ref}"`);
}

function closeTagOf(xml: string, cell: XmlCell): string {
  return `</${xml.slice(cell.start + 1, cell.tagEnd).split(/[\s/>]/, 1)[0]}>`;
}

/** A formula cell with its new cached value (and `ref`), everything else as it was. */
function formulaCellText(xml: string, cell: XmlCell, value: CellResult, ref: string | undefined): string {
  const next = formulaValue(value);
  const startTag = withType(xml.slice(cell.start, cell.tagEnd), next.type);
  const f = cell.formula!;
  const fTag = ref === undefined ? xml.slice(f.tagStart, f.tagEnd) : withRef(xml.slice(f.tagStart, f.tagEnd), ref);
  let body = xml.slice(cell.tagEnd, cell.end - closeTagOf(xml, cell).length);
  const offset = cell.tagEnd;
  if (cell.valueStart !== undefined) {
    body = body.slice(0, cell.valueStart - offset) + next.content + body.slice(cell.valueEnd! - offset);
  } else {
    const fEnd = body.indexOf(">", f.tagStart - offset) + 1;
    const selfClosingF = body[fEnd - 2] === "/";
    const after = selfClosingF ? fEnd : body.indexOf("</", fEnd) >= 0 ? body.indexOf(">", body.indexOf("</", fEnd)) + 1 : fEnd;
    body = body.slice(0, after) + next.content + body.slice(after);
  }
  body = body.slice(0, f.tagStart - offset) + fTag + body.slice(f.tagEnd - offset);
  return `${startTag}${body}${closeTagOf(xml, cell)}`;
}

/** A value cell (inside a spill) with a new value, its other attributes (style) kept; null empties it. */
function valueCellText(xml: string, cell: XmlCell | undefined, row: number, col: number, value: CellResult): string {
  if (!cell) {
    if (value === null) return "";
    const next = plainValue(value);
    return `<c r="${a1(row, col)}"${next.type ? ` t="${next.type}"` : ""}>${next.content}</c>`;
  }
  const startTag = xml.slice(cell.start, cell.tagEnd);
  if (value === null) {
    const bare = withType(startTag, undefined);
    return bare.endsWith("/>") ? bare : `${bare.slice(0, -1)}/>`;
  }
  const next = plainValue(value);
  const open = withType(startTag.endsWith("/>") ? `${startTag.slice(0, -2)}>` : startTag, next.type);
  return `${open}${next.content}${startTag.endsWith("/>") ? `</${startTag.slice(1).split(/[\s/>]/, 1)[0]}>` : closeTagOf(xml, cell)}`;
}

interface Spill extends Rect {
  /** Rows and columns the engine's result covers (a legacy range may be larger). */
  rows: number;
  cols: number;
}

export interface StoreResult {
  problems: CellProblem[];
}

/**
 * Writes the engine's values into the package's sheets (see the file comment). `onCell` is
 * called once per formula cell, for progress.
 */
export async function storeResults(book: LoadedBook, evaluated: SpanWorkbook, onCell?: () => void): Promise<StoreResult> {
  const problems: CellProblem[] = [];
  for (const sheet of book.sheets) {
    const sheetXml = (await book.pkg.partBinary(sheet.path))!;
    const id = evaluated.sheetId(sheet.name);
    const formulas = sheet.formulas;
    const spills: Spill[] = [];
    for (let i = 0; i < formulas.length; i++) {
      const kind = formulas.kind(i);
      if (kind === "plain") continue;
      const row = formulas.row(i);
      const col = formulas.col(i);
      const size = evaluated.spillSize(id, row, col) ?? { rows: 1, cols: 1 };
      if (kind === "dynamic") {
        if (size.rows > 1 || size.cols > 1) spills.push({ top: row, left: col, bottom: row + size.rows - 1, right: col + size.cols - 1, ...size });
      } else spills.push({ ...formulas.ref(i)!, ...size });
    }
    // Cells the stored ranges cover besides their anchors (a one-cell range covers only its formula).
    const oldAreas = widerRanges(formulas);
    const spillValue = (spill: Spill, row: number, col: number): CellResult => {
      if (row - spill.top >= spill.rows || col - spill.left >= spill.cols) return { error: "#N/A", message: "" };
      return evaluated.getValue(id, row, col);
    };
    const formulaText = (cell: XmlCell, index: number): string => {
      const formula = { row: formulas.row(index), col: formulas.col(index), kind: formulas.kind(index) };
      let value = evaluated.getValue(id, formula.row, formula.col);
      const refused = sheet.refused.get(index);
      let ref: string | undefined;
      if (refused) {
        value = {
          error: "#VALUE!",
          message: `a single-cell (legacy) formula whose result is ${refused.rows} x ${refused.cols} cells: the host reads it with implicit intersection, which spanwise calc does not evaluate; enter it as a dynamic array, or pick one value with INDEX`,
        };
      } else if (formula.kind === "dynamic") {
        const size = evaluated.spillSize(id, formula.row, formula.col) ?? { rows: 1, cols: 1 };
        ref = rectText({ top: formula.row, left: formula.col, bottom: formula.row + size.rows - 1, right: formula.col + size.cols - 1 });
      }
      if (isCellError(value)) problems.push({ sheet: sheet.name, address: a1(formula.row, formula.col), error: value.error, message: value.message });
      onCell?.();
      return formulaCellText(sheetXml, cell, value, ref);
    };
    const newSweep = new RowSweep(spills);
    const oldSweep = new RowSweep(oldAreas);
    let nextFormula = 0;
    // Written into chunks of bytes as it goes: the new sheet is never one string.
    const sink = new ByteSink();
    rewriteSheetInto(sheetXml, {
      cell: (cell) => {
        if (cell.formula && nextFormula < formulas.length && formulas.row(nextFormula) === cell.row && formulas.col(nextFormula) === cell.col) {
          return formulaText(cell, nextFormula++);
        }
        const spill = newSweep.at(cell.row) && newSweep.find(cell.col);
        if (spill) return valueCellText(sheetXml, cell, cell.row, cell.col, spillValue(spill, cell.row, cell.col));
        oldSweep.at(cell.row);
        if (oldSweep.find(cell.col)) return valueCellText(sheetXml, cell, cell.row, cell.col, null);
        return undefined;
      },
      adds: (row) => {
        const adds: { col: number; text: string }[] = [];
        for (const spill of newSweep.at(row)) {
          for (let col = spill.left; col <= spill.right; col++) {
            if (row === spill.top && col === spill.left) continue;
            const text = valueCellText(sheetXml, undefined, row, col, spillValue(spill, row, col));
            if (text) adds.push({ col, text });
          }
        }
        return adds;
      },
      nextRow: (row) => newSweep.nextRow(row),
    }, (piece) => sink.push(piece), { bytes: true });
    book.pkg.setPartBytes(sheet.path, sink.chunks());
    formulas.clear();
    sheet.refused.clear();
  }
  return { problems };
}
