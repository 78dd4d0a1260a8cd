/**
 * The workbench's work as kept in the browser's storage: where the book came from (the user's
 * file bytes, or plain sheets), the sheet names now, and the cells changed since (src/workbench/
 * files/document.ts). Restoring re-reads the origin and applies the rest, so the stored record
 * stays small next to the book and a stored file is saved again with the file's own fidelity.
 *
 * Stored data is never trusted: `decodeWork` checks every field against the open limits and
 * the sheet-name rules, and throws StoredDataError saying what is wrong, so a damaged or
 * foreign record is refused, never half-applied.
 */
import type { CellInput, SheetInput } from "../../engine";
import { SHEET_LIMITS } from "../../engine";
import type { Origin, SheetCellChange } from "./document";
import { OPEN_LIMITS } from "./limits";
import { sheetNameProblem } from "./sheetNames";

export const WORK_FORMAT = "spanwise-workbench";
export const WORK_VERSION = 1;
/** The spreadsheet host's limit on the characters in one cell (Microsoft support, "Excel specifications and limits"). */
export const MAX_CELL_TEXT = 32_767;

export interface StoredWork {
  format: typeof WORK_FORMAT;
  version: typeof WORK_VERSION;
  /** The file name shown and offered on save. */
  name: string;
  /** ISO time of the snapshot. */
  savedAt: string;
  origin: Origin;
  /** Sheet names now, in order (the origin's first, then those added). */
  sheets: string[];
  changes: SheetCellChange[];
  /** Changed since the book was opened, created or last saved as a file. */
  unsavedToFile: boolean;
}

export class StoredDataError extends Error {}

function fail(message: string): never {
  throw new StoredDataError(message);
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function checkInput(value: unknown, where: string): CellInput {
  if (value === null) return null;
  if (typeof value === "number") return Number.isFinite(value) ? value : fail(`${where}: the number ${String(value)} is not finite`);
  if (typeof value === "boolean") return value;
  if (typeof value === "string") return value.length <= MAX_CELL_TEXT ? value : fail(`${where}: the text is longer than ${MAX_CELL_TEXT} characters`);
  return fail(`${where}: a cell holds ${value === undefined ? "nothing" : typeof value}, not a value or formula`);
}

function checkIndex(value: unknown, limit: number, what: string): number {
  if (typeof value !== "number" || !Number.isInteger(value) || value < 0 || value >= limit) fail(`${what} ${String(value)} is not a whole number from 0 to ${limit - 1}`);
  return value;
}

/** Uint8Array from base64 text (localStorage keeps text only). */
export function fromBase64(text: string): Uint8Array {
  if (!/^[A-Za-z0-9+/]*={0,2}$/.test(text) || text.length % 4 !== 0) fail("the stored file is not base64 text");
  const binary = atob(text);
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) out[i] = binary.charCodeAt(i);
  return out;
}

export function toBase64(bytes: Uint8Array): string {
  let binary = "";
  const CHUNK = 0x2000;
  for (let i = 0; i < bytes.length; i += CHUNK) binary += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
  return btoa(binary);
}

function checkOrigin(value: unknown): Origin {
  if (!isRecord(value)) fail("the record names no origin");
  if (value.kind === "file") {
    const raw = value.bytes;
    const bytes = raw instanceof Uint8Array ? raw : typeof raw === "string" ? fromBase64(raw) : fail("the stored file has no bytes");
    if (bytes.byteLength === 0) fail("the stored file is empty");
    if (bytes.byteLength > OPEN_LIMITS.fileBytes) fail(`the stored file is larger than ${OPEN_LIMITS.fileBytes} bytes`);
    return { kind: "file", bytes };
  }
  if (value.kind === "sheets") {
    const sheets = value.sheets;
    if (!Array.isArray(sheets) || sheets.length === 0 || sheets.length > OPEN_LIMITS.sheets) fail(`the stored origin has no list of 1 to ${OPEN_LIMITS.sheets} sheets`);
    let cells = 0;
    const out: SheetInput[] = sheets.map((sheet, s) => {
      if (!isRecord(sheet) || typeof sheet.name !== "string" || !Array.isArray(sheet.cells)) fail(`origin sheet ${s + 1} has no name or no cells`);
      if (sheet.cells.length > SHEET_LIMITS.rows) fail(`origin sheet "${sheet.name}" has more rows than a sheet allows`);
      const rows = sheet.cells.map((row, r) => {
        if (row === null || row === undefined) return [];
        if (!Array.isArray(row) || row.length > SHEET_LIMITS.cols) fail(`origin sheet "${sheet.name}" row ${r + 1} is not a row of at most ${SHEET_LIMITS.cols} cells`);
        return row.map((cell, c) => {
          if (cell === undefined || cell === null) return null;
          cells++;
          return checkInput(cell, `origin sheet "${sheet.name}" row ${r + 1} column ${c + 1}`);
        });
      });
      return { name: sheet.name, cells: rows };
    });
    if (cells > OPEN_LIMITS.cells) fail(`the stored origin has more than ${OPEN_LIMITS.cells} cells`);
    checkNames(out.map((s) => s.name), "origin");
    return { kind: "sheets", sheets: out };
  }
  return fail(`the origin kind ${JSON.stringify(value.kind)} is not "file" or "sheets"`);
}

/**
 * Stored sheet names: distinct (in any case), not blank, at most 255 characters. Looser than
 * the rename rules (sheetNames.ts): a file written elsewhere may hold names the host's own
 * rename dialog would refuse, and its work must restore all the same.
 */
function checkNames(names: readonly string[], what: string): void {
  const seen = new Set<string>();
  names.forEach((name, i) => {
    const where = `${what} sheet ${i + 1} ("${name.slice(0, 40)}")`;
    if (name.trim() === "" || name.length > 255) fail(`${where}: a stored sheet name is 1 to 255 characters, not blank`);
    if (seen.has(name.toLowerCase())) fail(`${where}: ${sheetNameProblem(name, names.slice(0, i)) ?? "the name is taken"}`);
    seen.add(name.toLowerCase());
  });
}

/** A stored record checked field by field (either form: IndexedDB's objects or localStorage's text). */
export function decodeWork(value: unknown): StoredWork {
  let record = value;
  if (typeof record === "string") {
    try {
      record = JSON.parse(record);
    } catch {
      fail("the stored text is not JSON");
    }
  }
  if (!isRecord(record)) fail("the stored record is not an object");
  if (record.format !== WORK_FORMAT) fail(`the stored record is not the workbench's (format ${JSON.stringify(record.format)})`);
  if (record.version !== WORK_VERSION) fail(`the stored record has version ${JSON.stringify(record.version)}; this page reads version ${WORK_VERSION}`);
  if (typeof record.name !== "string" || record.name.length > 255) fail("the stored record has no file name of at most 255 characters");
  if (typeof record.savedAt !== "string") fail("the stored record has no time");
  if (typeof record.unsavedToFile !== "boolean") fail("the stored record does not say whether it was saved to a file");
  const origin = checkOrigin(record.origin);
  const sheets = record.sheets;
  if (!Array.isArray(sheets) || sheets.length === 0 || sheets.length > OPEN_LIMITS.sheets || sheets.some((s) => typeof s !== "string")) fail(`the stored record has no list of 1 to ${OPEN_LIMITS.sheets} sheet names`);
  checkNames(sheets as string[], "stored");
  if (origin.kind === "sheets" && sheets.length < origin.sheets.length) fail(`the stored record names ${sheets.length} sheets, fewer than its origin's ${origin.sheets.length}`);
  const changes = record.changes;
  if (!Array.isArray(changes) || changes.length > OPEN_LIMITS.cells) fail(`the stored changes are not a list of at most ${OPEN_LIMITS.cells} cells`);
  const checked: SheetCellChange[] = changes.map((change, i) => {
    if (!Array.isArray(change) || change.length !== 4) fail(`stored change ${i + 1} is not [sheet, row, column, input]`);
    const sheet = checkIndex(change[0], sheets.length, `stored change ${i + 1}: sheet`);
    const row = checkIndex(change[1], SHEET_LIMITS.rows, `stored change ${i + 1}: row`);
    const col = checkIndex(change[2], SHEET_LIMITS.cols, `stored change ${i + 1}: column`);
    return [sheet, row, col, checkInput(change[3], `stored change ${i + 1}`)] as const;
  });
  return { format: WORK_FORMAT, version: WORK_VERSION, name: record.name, savedAt: record.savedAt, origin, sheets: sheets as string[], changes: checked, unsavedToFile: record.unsavedToFile };
}

/** The record as JSON text (file bytes in base64), for storage that keeps text only. */
export function encodeWorkText(work: StoredWork): string {
  const origin = work.origin.kind === "file" ? { kind: "file", bytes: toBase64(work.origin.bytes) } : work.origin;
  return JSON.stringify({ ...work, origin });
}
