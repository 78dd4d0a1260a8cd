/**
 * Worksheet XML (ECMA-376 Part 1, §18.3.1: `sheetData`, `row`, `c`, `f`, `v`, `is`) read and
 * rewritten in one linear pass each, by position: reading reports every row and cell with its
 * byte range; rewriting copies the part unchanged except the cells it is given new text for
 * and the cells and rows it is asked to add, so everything else stays byte for byte.
 *
 * A cell or row without `r` takes the next column or row (MS-OI29500 2.1.589 c: "the cell
 * shall be located in the column with the index that is 1 greater than that of the previous
 * cell").
 *
 * The part is given either as text or as a byte string (see byteText.ts; `{ bytes: true }`):
 * then positions are byte offsets, the decoded texts of a cell (formula, value, inline string,
 * attribute values) are read as UTF-8 into fresh strings, and a rewrite copies the untouched
 * bytes exactly. A big sheet is read that way so that nothing read from it keeps the whole
 * part alive, and written through a sink (rewriteSheetInto) so that it never exists as one
 * string.
 */
import { textOfUtf8 } from "./byteText";
import { attributes, decodeXml, localName, textRuns } from "./xmlText";

export interface ScanOptions {
  /** The part is a byte string (one character per byte), its text UTF-8. */
  bytes?: boolean;
}

const NON_ASCII = /[\u0080-\uffff]/;

/** A start tag's attributes; in a byte string a tag that is not ASCII is read as UTF-8 first (before its entities). */
function cellAttributes(tag: string, bytes: boolean): Map<string, string> {
  return attributes(bytes && NON_ASCII.test(tag) ? textOfUtf8(tag) : tag);
}

export interface XmlFormula {
  text: string;
  type?: string;
  ref?: string;
  si?: string;
  /** Where the `<f>` element's start tag is, within the part. */
  tagStart: number;
  tagEnd: number;
}

export interface XmlCell {
  row: number;
  col: number;
  /** The whole `<c>` element: [start, end). */
  start: number;
  end: number;
  /** The start tag: [start, tagEnd). */
  tagEnd: number;
  attrs: Map<string, string>;
  formula?: XmlFormula;
  /** Decoded `<v>` text. */
  value?: string;
  /** Decoded inline string (`<is>`). */
  inline?: string;
  /** Where the `<v>` element is, when there is one: [start, end). */
  valueStart?: number;
  valueEnd?: number;
}

export interface XmlRow {
  row: number;
  start: number;
  tagEnd: number;
  /** End of the row element (after `</row>` or `/>`). */
  end: number;
  /** Start of `</row>`, or tagEnd for a self-closing row. */
  closeStart: number;
  selfClosing: boolean;
  prefix: string;
}

export class SheetXmlError extends Error {}

/** Row and column (0-based) of an A1 reference such as `B12` or `$B$12`. */
export function parseA1(text: string): { row: number; col: number } | undefined {
  let i = 0;
  if (text[i] === "$") i++;
  let col = 0;
  const letters = i;
  while (i < text.length && i - letters < 4) {
    const code = text.charCodeAt(i) & ~32;
    if (code < 65 || code > 90) break;
    col = col * 26 + code - 64;
    i++;
  }
  if (i === letters || i - letters > 3) return undefined;
  if (text[i] === "$") i++;
  const digits = i;
  let row = 0;
  while (i < text.length && text.charCodeAt(i) >= 48 && text.charCodeAt(i) <= 57 && i - digits < 8) row = row * 10 + text.charCodeAt(i++) - 48;
  if (i === digits || i !== text.length || row === 0) return undefined;
  return { row: row - 1, col: col - 1 };
}

function tagAt(xml: string, open: number): { tag: string; close: number } {
  const close = xml.indexOf(">", open);
  if (close < 0) throw new SheetXmlError("a tag is not closed");
  return { tag: xml.slice(open + 1, close), close };
}

/** Bounds of `<sheetData>`'s content, or undefined for an empty `<sheetData/>`. */
function sheetDataBounds(xml: string): { start: number; end: number; selfClosing: boolean; at: number } {
  let from = 0;
  for (;;) {
    const open = xml.indexOf("sheetData", from);
    if (open < 0) throw new SheetXmlError("the worksheet has no sheetData");
    const lt = xml.lastIndexOf("<", open);
    const { tag, close } = tagAt(xml, lt);
    if (localName(tag) === "sheetData" && !tag.startsWith("/")) {
      if (tag.endsWith("/")) return { start: close + 1, end: close + 1, selfClosing: true, at: lt };
      const prefix = tag.slice(0, tag.indexOf("sheetData"));
      const end = xml.indexOf(`</${prefix}sheetData>`, close);
      if (end < 0) throw new SheetXmlError("sheetData is not closed");
      return { start: close + 1, end, selfClosing: false, at: lt };
    }
    from = open + 9;
  }
}

/** Reads one `<c>` element starting at `open` (its start tag already read). */
function readCell(xml: string, open: number, tag: string, close: number, row: number, col: number, bytes: boolean): XmlCell {
  const selfClosing = tag.endsWith("/");
  const attrs = cellAttributes(tag, bytes);
  const text = bytes ? textOfUtf8 : (raw: string) => raw;
  const cell: XmlCell = { row, col, start: open, end: close + 1, tagEnd: close + 1, attrs };
  if (selfClosing) return cell;
  const endTag = `</${tag.split(/[\s/]/, 1)[0]}>`;
  const end = xml.indexOf(endTag, close);
  if (end < 0) throw new SheetXmlError(`cell ${row + 1}:${col + 1} is not closed`);
  cell.end = end + endTag.length;
  let i = close + 1;
  while (i < end) {
    const lt = xml.indexOf("<", i);
    if (lt < 0 || lt >= end) break;
    const inner = tagAt(xml, lt);
    const name = localName(inner.tag);
    const innerSelf = inner.tag.endsWith("/");
    if (inner.tag.startsWith("/")) {
      i = inner.close + 1;
      continue;
    }
    const qualified = inner.tag.split(/[\s/]/, 1)[0];
    const innerEnd = innerSelf ? inner.close + 1 : xml.indexOf(`</${qualified}>`, inner.close);
    if (innerEnd < 0 || innerEnd > end) throw new SheetXmlError(`cell ${row + 1}:${col + 1}: <${qualified}> is not closed`);
    const content = innerSelf ? "" : xml.slice(inner.close + 1, innerEnd);
    const after = innerSelf ? innerEnd : innerEnd + qualified.length + 3;
    if (name === "f") {
      const fa = cellAttributes(inner.tag, bytes);
      cell.formula = { text: decodeXml(text(content)), type: fa.get("t"), ref: fa.get("ref"), si: fa.get("si"), tagStart: lt, tagEnd: inner.close + 1 };
    } else if (name === "v") {
      cell.value = decodeXml(text(content));
      cell.valueStart = lt;
      cell.valueEnd = after;
    } else if (name === "is") {
      cell.inline = textRuns(text(content));
    }
    i = after;
  }
  return cell;
}

/** Calls back for every row and cell of the sheet, in document order. */
export function scanSheet(
  xml: string,
  onCell: (cell: XmlCell) => void,
  onRow?: (row: XmlRow) => void,
  onRowStart?: (row: XmlRow) => void,
  options: ScanOptions = {},
): void {
  const bytes = options.bytes === true;
  const data = sheetDataBounds(xml);
  let i = data.start;
  let rowNumber = -1;
  let col = -1;
  let currentRow: XmlRow | undefined;
  while (i < data.end) {
    const lt = xml.indexOf("<", i);
    if (lt < 0 || lt >= data.end) break;
    const { tag, close } = tagAt(xml, lt);
    const name = localName(tag);
    if (tag.startsWith("/")) {
      if (name === "row" && currentRow) {
        currentRow.closeStart = lt;
        currentRow.end = close + 1;
        onRow?.(currentRow);
        currentRow = undefined;
      }
      i = close + 1;
      continue;
    }
    if (name === "row") {
      const selfClosing = tag.endsWith("/");
      const r = attributes(tag).get("r");
      const next = r === undefined ? rowNumber + 1 : Number(r) - 1;
      if (!Number.isInteger(next) || next < 0 || next <= rowNumber) throw new SheetXmlError(`row ${r ?? "?"} is out of order or not a row number`);
      rowNumber = next;
      col = -1;
      const prefix = tag.slice(0, tag.indexOf("row"));
      currentRow = { row: rowNumber, start: lt, tagEnd: close + 1, end: close + 1, closeStart: close + 1, selfClosing, prefix };
      onRowStart?.(currentRow);
      if (selfClosing) {
        onRow?.(currentRow);
        currentRow = undefined;
      }
      i = close + 1;
      continue;
    }
    if (name === "c") {
      if (rowNumber < 0) throw new SheetXmlError("a cell outside any row");
      const r = attributes(tag).get("r");
      let cellCol = col + 1;
      if (r !== undefined) {
        const parsed = parseA1(r);
        if (!parsed || parsed.row !== rowNumber) throw new SheetXmlError(`cell reference "${r}" does not belong to row ${rowNumber + 1}`);
        cellCol = parsed.col;
      }
      if (cellCol <= col) throw new SheetXmlError(`cell ${r ?? cellCol} is out of order in row ${rowNumber + 1}`);
      col = cellCol;
      const cell = readCell(xml, lt, tag, close, rowNumber, col, bytes);
      onCell(cell);
      i = cell.end;
      continue;
    }
    i = close + 1;
  }
}

/** A new or replaced cell: its whole XML text. */
export type CellText = string;

export interface SheetEdits {
  /** New text for existing cells, by `${row}:${col}` (an empty string deletes the cell). */
  replace: Map<string, CellText>;
  /** Cells to add, by row, each list sorted by column. */
  insert: Map<number, { col: number; text: CellText }[]>;
}

/** What to change while a sheet is copied (see rewriteSheetWith). */
export interface SheetRewrite {
  /** New text for an existing cell ("" deletes it), or undefined to keep it. Called in document order. */
  cell(cell: XmlCell): string | undefined;
  /**
   * Cells a row should hold, sorted by column; those it has already are left out when
   * written. Called once per row, in increasing row order, before the row's cells.
   */
  adds(row: number): { col: number; text: CellText }[];
  /** The first row at or after `row` that may need cells even where the sheet has no row element. */
  nextRow(row: number): number | undefined;
}

/**
 * The sheet copied in one pass with the changes applied: replaced cells take their new text,
 * added cells go into their row in column order (a row element is added where none exists),
 * every other byte is copied as it was.
 */
export function rewriteSheetWith(xml: string, hooks: SheetRewrite, options: ScanOptions = {}): string {
  const out: string[] = [];
  rewriteSheetInto(xml, hooks, (piece) => out.push(piece), options);
  return out.join("");
}

/**
 * rewriteSheetWith, handing the result to `push` piece by piece, in order (slices of the part
 * and the new texts): for a big sheet written to a ByteSink.
 */
export function rewriteSheetInto(xml: string, hooks: SheetRewrite, push: (piece: string) => void, options: ScanOptions = {}): void {
  const data = sheetDataBounds(xml);
  const newRow = (row: number, adds: readonly { text: string }[]): string => `<row r="${row + 1}">${adds.map((cell) => cell.text).join("")}</row>`;
  let copied = 0;
  const copyTo = (at: number): void => {
    if (at > copied) {
      push(xml.slice(copied, at));
      copied = at;
    }
  };
  let done = -1;
  /** New rows before `limit` (where the sheet has none), each handed to `emit` after the part is copied up to `at`. */
  const rowsBefore = (limit: number, at: number, emit: (text: string) => void = push): void => {
    for (let row = hooks.nextRow(done + 1); row !== undefined && row < limit; row = hooks.nextRow(row + 1)) {
      const adds = hooks.adds(row);
      done = row;
      if (adds.length === 0) continue;
      copyTo(at);
      emit(newRow(row, adds));
    }
  };
  if (data.selfClosing) {
    const tag = tagAt(xml, data.at);
    const prefix = tag.tag.slice(0, tag.tag.indexOf("sheetData"));
    const rows: string[] = [];
    copied = data.at;
    rowsBefore(SHEET_ROWS, data.at, (text) => rows.push(text));
    if (rows.length === 0) {
      push(xml);
      return;
    }
    push(xml.slice(0, data.at));
    push(`<${prefix}sheetData>`);
    rows.forEach(push);
    push(`</${prefix}sheetData>`);
    push(xml.slice(tag.close + 1));
    return;
  }
  let pending: { col: number; text: CellText }[] = [];
  let next = 0;
  const emitUntil = (col: number, at: number): void => {
    while (next < pending.length && pending[next].col < col) {
      copyTo(at);
      push(pending[next++].text);
    }
    if (next < pending.length && pending[next].col === col) next++;
  };
  scanSheet(
    xml,
    (cell) => {
      emitUntil(cell.col, cell.start);
      const replacement = hooks.cell(cell);
      if (replacement !== undefined) {
        copyTo(cell.start);
        push(replacement);
        copied = cell.end;
      }
    },
    (row) => {
      if (row.selfClosing) {
        if (next < pending.length) {
          copyTo(row.start);
          const tag = xml.slice(row.start, row.tagEnd);
          push(`${tag.slice(0, -2).trimEnd()}>${pending.slice(next).map((cell) => cell.text).join("")}</${row.prefix}row>`);
          copied = row.end;
        }
      } else emitUntil(Number.POSITIVE_INFINITY, row.closeStart);
      pending = [];
      next = 0;
    },
    (row) => {
      rowsBefore(row.row, row.start);
      done = row.row;
      pending = hooks.adds(row.row);
      next = 0;
    },
    options,
  );
  copyTo(data.end);
  rowsBefore(SHEET_ROWS, data.end);
  copyTo(xml.length);
}

const SHEET_ROWS = 1_048_576;

/** The sheet with fixed edits applied (see rewriteSheetWith). */
export function rewriteSheet(xml: string, edits: SheetEdits): string {
  const rows = [...edits.insert.keys()].sort((a, b) => a - b);
  return rewriteSheetWith(xml, {
    cell: (cell) => edits.replace.get(`${cell.row}:${cell.col}`),
    adds: (row) => edits.insert.get(row) ?? [],
    nextRow: (row) => rows.find((r) => r >= row),
  });
}
