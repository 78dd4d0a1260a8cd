/**
 * Ranges as tab-separated text, the plain-text form spreadsheets put on the system clipboard
 * and take from it: cells split by tabs, rows by CRLF or LF, a cell holding a tab, a line
 * break or a quote written in double quotes with quotes doubled; one trailing line break is
 * no extra row. Limits: 1,000,000 cells (more is refused with a message, never truncated).
 */
import { isCellError, type CellResult } from "../../engine";
import { MAX_BLOCK_CELLS } from "./selection";

export function parseTsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = "";
  let count = 0;
  let i = 0;
  const endCell = (): void => {
    row.push(cell);
    cell = "";
    if (++count > MAX_BLOCK_CELLS) throw new RangeError(`the pasted text has more than ${MAX_BLOCK_CELLS} cells`);
  };
  while (i < text.length) {
    const ch = text[i];
    if (ch === '"' && cell === "") {
      // A quoted cell: up to the closing quote; "" is one quote.
      let j = i + 1;
      let quoted = "";
      let closed = false;
      while (j < text.length) {
        if (text[j] === '"') {
          if (text[j + 1] === '"') {
            quoted += '"';
            j += 2;
            continue;
          }
          closed = true;
          j++;
          break;
        }
        quoted += text[j++];
      }
      const next = text[j];
      if (closed && (j >= text.length || next === "\t" || next === "\n" || next === "\r")) {
        cell = quoted;
        i = j;
        continue;
      }
      // Not a well-formed quoted cell: the quote is an ordinary character.
      cell += ch;
      i++;
      continue;
    }
    if (ch === "\t") {
      endCell();
      i++;
    } else if (ch === "\r" || ch === "\n") {
      endCell();
      rows.push(row);
      row = [];
      i += ch === "\r" && text[i + 1] === "\n" ? 2 : 1;
    } else {
      cell += ch;
      i++;
    }
  }
  if (cell !== "" || row.length > 0) {
    endCell();
    rows.push(row);
  }
  const width = rows.reduce((most, r) => Math.max(most, r.length), 0);
  return rows.map((r) => (r.length < width ? [...r, ...Array<string>(width - r.length).fill("")] : r));
}

function tsvCell(text: string): string {
  return /[\t\r\n"]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A cell's value as clipboard text: numbers in full precision, errors by their code. */
export function clipboardText(value: CellResult): string {
  if (value === null) return "";
  if (isCellError(value)) return value.error;
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  return String(value);
}

export function toTsv(rows: readonly (readonly string[])[]): string {
  return rows.map((row) => row.map(tsvCell).join("\t")).join("\r\n") + "\r\n";
}
