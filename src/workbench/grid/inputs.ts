/**
 * Text typed or pasted into a cell, as the cell's input: a decimal number, TRUE/FALSE, a
 * formula ("=..."), blank, or text. "1e3" is a number; "0x10", "Infinity", "1,5", "1,234.5",
 * "12%" and "12 m" stay text (no number is read from anything but plain decimal notation, so
 * no locale is guessed: a SPAN function given such text refuses it with a message). A leading
 * apostrophe keeps the rest as text ("'5" is the text 5, "'=A1" the text =A1), as in a spreadsheet.
 * The formula bar shows that apostrophe only while the cell is edited (shownText), so a text
 * cell reads the same wherever it came from (typed, or a file's text cell, which the reader
 * guards with one: src/cli/xlsxBook.ts textInput), and editing it keeps it text.
 */
import type { CellInput } from "../../engine";

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** The formula bar's text for a cell's edit text when the cell is not being edited: a leading (guard) apostrophe hidden. */
export function shownText(editText: string): string {
  return editText.startsWith("'") ? editText.slice(1) : editText;
}

export function inputOf(text: string): CellInput {
  // The engine reads a leading apostrophe itself (the rest is text) and keeps it in the input.
  if (text.startsWith("'")) return text;
  const trimmed = text.trim();
  if (trimmed === "") return null;
  if (trimmed.startsWith("=")) return trimmed;
  if (DECIMAL.test(trimmed)) {
    const value = Number(trimmed);
    if (Number.isFinite(value)) return value;
  }
  const upper = trimmed.toUpperCase();
  if (upper === "TRUE") return true;
  if (upper === "FALSE") return false;
  return text;
}
