/**
 * The shared leading arguments of every SPAN function (spans, loads, supports, EI, combo)
 * read into the solver's Member, with the combination applied.
 */
import { applyCombination, checkCombinations, invalid, parseCombination, type Combination, type Load, type Member } from "../core";
import { errorCodeOf, isEmpty, show } from "./cells";
import { readFlexure, readSpans } from "./lists";
import type { LoadRow } from "./loadRow";
import { placeOf, toLoad } from "./loadRow";
import { parseLoadNotation } from "./loadNotation";
import { readLoadTable } from "./loadTable";
import { rowsOf, singleCell } from "./ranges";
import { readSupports } from "./supports";

/** The raw member arguments as the host passes them. */
export interface MemberArgs {
  spans: unknown;
  loads: unknown;
  supports: unknown;
  EI: unknown;
  combo: unknown;
  /** The units argument (key=unit pairs); absent or blank = consistent units. */
  units?: unknown;
}

/** Load rows from a table range, or from one text cell in the load notation. */
export function readLoads(arg: unknown): LoadRow[] {
  const single = singleCell(arg);
  if (single !== undefined) {
    if (isEmpty(single) || single === 0) return [];
    if (typeof single === "string" && errorCodeOf(single) === null) return parseLoadNotation(single);
  }
  return readLoadTable(rowsOf(arg));
}

/** The combination text of the combo argument ("" for none). */
export function readComboText(arg: unknown): string {
  const single = singleCell(arg);
  if (single === undefined) throw invalid("combo: give one cell with a combination such as 1.2D+1.6L");
  if (isEmpty(single) || single === 0) return "";
  const code = errorCodeOf(single);
  if (code !== null) throw invalid(`combo: the cell holds the error ${code}`);
  if (typeof single !== "string") throw invalid(`combo: ${show(single)} is not a combination; write one such as 1.2D+1.6L`);
  return single;
}

/** Names a load row's case cell in messages: "load row 3, column 6 (case)" or "load 2 of the loads text (case)". */
export function casePlace(load: { row: number; fromText?: boolean }): string {
  return placeOf(load.row, load.fromText === true, "case");
}

/** Applies the combination and case-label rule (core checkCombinations) to load rows under one combination. */
export function checkMemberCombination(rows: readonly LoadRow[], combination: Combination | null): void {
  if (combination !== null) checkCombinations(rows, [{ combination }], casePlace);
}

/**
 * The combination and case-label rule for a combination box: the loads (table rows or the
 * loads text, as readLoads gives them) and the combination text. Returns null when the
 * combination may be used, or the message the functions would give (#VALUE!) otherwise.
 */
export function checkCombination(loads: readonly LoadRow[], comboText: string): string | null {
  try {
    const text = comboText.trim();
    checkMemberCombination(loads, text === "" ? null : parseCombination(text));
    return null;
  } catch (error) {
    if (error instanceof Error || (typeof error === "object" && error !== null && "message" in error)) return String((error as { message: unknown }).message);
    return String(error);
  }
}

/** Reads and checks the member arguments at the cell level; physics is left to the solver. */
export function readMember(args: MemberArgs): Member {
  const spans = readSpans(args.spans);
  let length = 0;
  for (const span of spans) length += span;
  const { stiffness, shear } = readFlexure(args.EI, spans.length);
  const supports = readSupports(args.supports, spans.length);
  const rows = readLoads(args.loads);
  const comboText = readComboText(args.combo);
  const combination = comboText === "" ? null : parseCombination(comboText);
  checkMemberCombination(rows, combination);
  const read = new Array<Load>(rows.length);
  for (let i = 0; i < rows.length; i++) read[i] = toLoad(rows[i], length);
  const loads = applyCombination(read, combination);
  return shear === null ? { spans, supports, stiffness, loads } : { spans, supports, stiffness, loads, shear };
}
