/**
 * One load as the user wrote it, in a load-table row or the load notation, before the member
 * length is known: `xEnd` null means "to the member end" (blank or 0 in the table).
 */
import { invalid, positionTolerance, shownLength, type Load, type LoadKind } from "../core";

export interface LoadRow {
  kind: LoadKind;
  magnitude: number;
  xStart: number;
  /** null = to the member end (blank or 0 in the table; no `to` in the notation). */
  xEnd: number | null;
  /** linear only; 0 for the other kinds. */
  magnitudeEnd: number;
  /** "" when no case label was given. */
  loadCase: string;
  /** 1-based row of the load table, or 1-based position in the load notation text. */
  row: number;
  /** true when the load came from the notation text, false from a table. */
  fromText: boolean;
}

export const LOAD_KINDS: readonly LoadKind[] = ["point", "moment", "udl", "linear", "settle"];

/** Table column numbers and names, 1-based as the user counts them. */
export const COLUMNS = ["type", "magnitude", "x start", "x end", "magnitude at end", "case"] as const;
export type ColumnName = (typeof COLUMNS)[number];

const CASE_LABEL = /^[A-Za-z][A-Za-z0-9]*$/;

/** True for a case label a combination can name: letters and digits, starting with a letter. */
export function isCaseLabel(text: string): boolean {
  return CASE_LABEL.test(text);
}

/** Names a field of a load for messages: "load row 3, column 3 (x start)" or "load 2 of the loads text (x start)". */
export function placeOf(row: number, fromText: boolean, column: ColumnName): string {
  if (fromText) return `load ${row} of the loads text (${column})`;
  return `load row ${row}, column ${COLUMNS.indexOf(column) + 1} (${column})`;
}

function isDistributed(kind: LoadKind): boolean {
  return kind === "udl" || kind === "linear";
}

/**
 * The solver's load for a row on a member of the given length. Positions are checked here
 * so that the message names the column (a position within rounding of the member end, as
 * the solver's tolerance allows, is on the member); the solver validates again. The values
 * the user gave are passed on unchanged.
 */
export function toLoad(row: LoadRow, length: number): Load {
  const { xStart } = row;
  const tol = positionTolerance(length);
  if (xStart < -tol) throw invalid(`${placeOf(row.row, row.fromText, "x start")}: ${xStart} is before the member start 0`);
  if (xStart > length + tol) throw invalid(`${placeOf(row.row, row.fromText, "x start")}: ${xStart} is beyond the member end ${shownLength(length)}`);
  if (!isDistributed(row.kind)) {
    return { kind: row.kind, magnitude: row.magnitude, xStart, xEnd: xStart, magnitudeEnd: 0, loadCase: row.loadCase, row: row.row };
  }
  const xEnd = row.xEnd === null ? length : row.xEnd;
  if (xEnd > length + tol) throw invalid(`${placeOf(row.row, row.fromText, "x end")}: ${xEnd} is beyond the member end ${shownLength(length)}`);
  if (xEnd <= xStart) {
    throw invalid(`${placeOf(row.row, row.fromText, "x end")}: ${xEnd} is not beyond x start ${xStart}, so the load has no length`);
  }
  const magnitudeEnd = row.kind === "udl" ? row.magnitude : row.magnitudeEnd;
  return { kind: row.kind, magnitude: row.magnitude, xStart, xEnd, magnitudeEnd, loadCase: row.loadCase, row: row.row };
}
