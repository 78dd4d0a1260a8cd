/**
 * The load table: one load per row, columns type, magnitude, x start, x end, magnitude at
 * end, case. A `settle` row is a support settlement: magnitude = the downward displacement Δ
 * (deflection unit), x start = the support node, x end and magnitude at end blank. Fewer than six columns = the missing ones blank. Wholly blank rows (every cell
 * "", null or 0) are skipped. Row numbers in messages are 1-based rows of the given range.
 */
import { invalid, MAX_LOADS, type LoadKind } from "../core";
import { errorCodeOf, isBlank, isEmpty, readNumber, readText, show } from "./cells";
import { COLUMNS, isCaseLabel, placeOf, type ColumnName, type LoadRow } from "./loadRow";

const KINDS = new Map<string, LoadKind>([
  ["point", "point"],
  ["moment", "moment"],
  ["udl", "udl"],
  ["linear", "linear"],
  ["settle", "settle"],
]);

function isBlankRow(cells: unknown[]): boolean {
  for (const cell of cells) if (!isBlank(cell)) return false;
  return true;
}

function readKind(cell: unknown, row: number): LoadKind {
  // The common spelling first, with no string built; messages only when throwing.
  const plain = typeof cell === "string" ? KINDS.get(cell) : undefined;
  if (plain !== undefined) return plain;
  if (isBlank(cell)) throw invalid(`${placeOf(row, false, "type")}: the load type is blank; use point, moment, udl, linear or settle`);
  const code = errorCodeOf(cell);
  if (code !== null) throw invalid(`${placeOf(row, false, "type")}: the cell holds the error ${code}`);
  const kind = typeof cell === "string" ? KINDS.get(cell.trim().toLowerCase()) : undefined;
  if (!kind) throw invalid(`${placeOf(row, false, "type")}: ${show(cell)} is not a load type; use point, moment, udl, linear or settle`);
  return kind;
}

/** Why a column must be blank for a load of this kind (built only when refusing). */
type BlankReason = "x end" | "magnitude at end" | "udl magnitude at end";

function whyBlank(reason: BlankReason, kind: LoadKind): string {
  if (reason === "x end") return `a ${kind === "point" ? "point load" : kind === "moment" ? "couple" : "settlement"} acts at x start only`;
  return reason === "magnitude at end" ? "only a linear load has a magnitude at end" : "only a linear load has a magnitude at end (a udl is uniform)";
}

function requireBlank(cell: unknown, row: number, column: ColumnName, reason: BlankReason, kind: LoadKind): void {
  if (isBlank(cell)) return;
  const code = errorCodeOf(cell);
  if (code !== null) throw invalid(`${placeOf(row, false, column)}: the cell holds the error ${code}`);
  throw invalid(`${placeOf(row, false, column)}: ${show(cell)} given, but ${whyBlank(reason, kind)}; leave it blank`);
}

function readCase(cell: unknown, row: number): string {
  if (isBlank(cell)) return "";
  const where = (): string => placeOf(row, false, "case");
  const label = readText(cell, where);
  if (!isCaseLabel(label)) {
    throw invalid(`${where()}: ${show(cell)} is not a case label; use letters and digits starting with a letter, such as D, L or Lr`);
  }
  return label;
}

/** A number cell of a load row: a finite number as it is, anything else by readNumber (with its message). */
function numberCell(cells: unknown[], column: number, row: number, blank: number): number {
  const cell = cells[column];
  if (typeof cell === "number" && Number.isFinite(cell)) return cell;
  // A blank cell reads as `blank`, as readNumber reads it (no closure built for the message).
  if (cell === "" || cell === null || cell === undefined) return blank;
  return readNumber(cell, () => placeOf(row, false, COLUMNS[column]), blank);
}

/** Reads one non-blank table row (cells beyond the sixth must be blank). */
export function readLoadRow(cells: unknown[], row: number): LoadRow {
  const kind = readKind(cells[0], row);
  const magnitude = numberCell(cells, 1, row, 0);
  const xStart = numberCell(cells, 2, row, 0);
  let xEnd: number | null = null;
  let magnitudeEnd = 0;
  if (kind === "point" || kind === "moment" || kind === "settle") {
    requireBlank(cells[3], row, "x end", "x end", kind);
    requireBlank(cells[4], row, "magnitude at end", "magnitude at end", kind);
  } else {
    const end = numberCell(cells, 3, row, 0);
    xEnd = end === 0 ? null : end;
    if (kind === "linear") magnitudeEnd = numberCell(cells, 4, row, 0);
    else requireBlank(cells[4], row, "magnitude at end", "udl magnitude at end", kind);
  }
  const loadCase = readCase(cells[5], row);
  for (let c = 6; c < cells.length; c++) {
    if (!isEmpty(cells[c]) && cells[c] !== 0) {
      throw invalid(`load row ${row}, column ${c + 1}: the load table has six columns (${COLUMNS.join(", ")}); column ${c + 1} must be blank`);
    }
  }
  return { kind, magnitude, xStart, xEnd, magnitudeEnd, loadCase, row, fromText: false };
}

/** Reads every non-blank row of a load table given as rows of cells. */
export function readLoadTable(rows: unknown[][]): LoadRow[] {
  const loads: LoadRow[] = [];
  for (let r = 0; r < rows.length; r++) {
    const cells = Array.isArray(rows[r]) ? rows[r] : [rows[r]];
    if (isBlankRow(cells)) continue;
    if (loads.length === MAX_LOADS) {
      throw invalid(`loads: at most ${MAX_LOADS} loads on one member, got more (row ${r + 1} is one too many; combine loads that act together)`);
    }
    loads.push(readLoadRow(cells, r + 1));
  }
  return loads;
}
