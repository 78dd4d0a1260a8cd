/**
 * Bodies of the worksheet functions that study many load arrangements of one member:
 * envelopes over combinations (with pattern live load), governing peaks, influence lines,
 * moving loads and the expansion of named combination sets.
 */
import {
  checkCount,
  checkInfluence,
  envelope,
  LIMITS,
  expandCombinationSet,
  governingPeaks,
  influenceLine,
  invalid,
  movingLoad,
  trainFrom,
  type Bound,
  type EnvelopeOptions,
  type Member,
  type PatternMode,
  type Quantity,
  type Train,
} from "../core";
import { errorCodeOf, isBlank, isEmpty, readNumber, show } from "./cells";
import { readCombinations, readPsi0 } from "./combinations";
import { readEffect } from "./effect";
import { guarded } from "./hostError";
import type { LoadRow } from "./loadRow";
import { readLoads, readMember } from "./member";
import { isAllBlank, listEntries, rowsOf, singleCell } from "./ranges";
import { finite, mapPositions } from "./shape";
import { COLUMNS, readHeaders, withHeaders } from "./headers";
import { memberInOwnUnits, readMemberUnits, type MemberUnits } from "./units";
import { outputScale } from "./worksheet";

/**
 * The member of a study and the factor that brings a deflection into the sheet's units. As for
 * the analysis functions, with units the member is studied in its own length and force units
 * (only EI converted), so spans, x, positions and effects are never converted; deflection
 * alone is shown in the deflection unit of the units argument.
 */
function memberOf(spans: unknown, loads: unknown, supports: unknown, EI: unknown, units: unknown): { member: Member; deflection: number; given: MemberUnits | null } {
  const given = readMemberUnits(units ?? null);
  const member = readMember({ spans, loads, supports: supports ?? null, EI: EI ?? null, combo: null });
  return { member: given === null ? member : memberInOwnUnits(member, given), deflection: outputScale(given).deflection, given };
}

/** A study value in the sheet's units: only a deflection (or deflection per unit force) is scaled. */
function shownAs(kind: string, value: number, deflection: number): number {
  return kind === "deflection" ? value / deflection : value;
}

/** Cells of a range argument (a single value is one cell), counted before any is read. */
function cellCount(arg: unknown): number {
  const rows = rowsOf(arg);
  let count = 0;
  for (const row of rows) count += Array.isArray(row) ? row.length : 1;
  return count;
}

/** Each non-blank combinations cell gives at least one combination: bounded before sets are expanded. */
function checkCombinationCells(combos: unknown): void {
  let count = 0;
  for (const row of rowsOf(combos)) for (const cell of Array.isArray(row) ? row : [row]) if (!isBlank(cell)) count++;
  checkCount(count, LIMITS.combinations, "combinations", "combinations (named sets expanded)");
}

/** The load rows, for the combination and case-label rule (their distinct labels counted first). */
function caseLabels(loads: unknown): LoadRow[] {
  const rows = readLoads(loads);
  checkCount(new Set(rows.map((row) => row.loadCase)).size, LIMITS.cases, "loads", "case labels in one study");
  return rows;
}

/** Reads the pattern argument: blank or "none", "standard" or "full", optionally followed by the live case label. */
export function readPattern(arg: unknown): EnvelopeOptions {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("pattern: give one cell such as full L");
  if (isBlank(cell)) return { pattern: "none" };
  if (typeof cell !== "string" || errorCodeOf(cell) !== null) throw invalid(`pattern: ${show(cell)} is not a pattern; write none, standard or full, then the live case (default L)`);
  const words = cell.trim().split(/\s+/);
  const mode = words[0].toLowerCase();
  if (mode !== "none" && mode !== "standard" && mode !== "full") {
    throw invalid(`pattern: "${words[0]}" is not a pattern; write none, standard or full, then the live case (default L)`);
  }
  if (words.length > 2 || (words[1] !== undefined && !/^[A-Za-z][A-Za-z0-9]*$/.test(words[1]))) {
    throw invalid(`pattern: "${cell.trim()}" should be the pattern and at most one case label, such as full L`);
  }
  return { pattern: mode as PatternMode, liveCase: words[1] ?? "L" };
}

function readQuantity(arg: unknown): Quantity {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("quantity: give one cell: shear, moment or deflection");
  if (isBlank(cell)) return "moment";
  const text = typeof cell === "string" ? cell.trim().toLowerCase() : "";
  if (text === "shear" || text === "moment" || text === "deflection") return text;
  throw invalid(`quantity: ${show(cell)} is not one of shear, moment, deflection`);
}

function governedBy(bound: Bound): string {
  return bound.arrangement ? `${bound.combination}; live on ${bound.arrangement}` : bound.combination;
}

function positionsOf(x: unknown): { cells: unknown[]; values: (number | null)[] } {
  checkCount(cellCount(x), LIMITS.positions, "x", "cells");
  const rows = rowsOf(x);
  const cells = rows.flatMap((row) => (Array.isArray(row) ? row : [row]));
  if (cells.length === 0) throw invalid("x: give a cell or a range of positions");
  const values = cells.map((cell, i) =>
    isEmpty(cell) ? null : readNumber(cell, () => (cells.length === 1 ? "x" : `x cell ${i + 1}`)),
  );
  return { cells, values };
}

/** SPAN.ENVELOPE: one row per x cell [x, max, governed by, min, governed by]. */
export function sheetEnvelope(
  spans: unknown,
  loads: unknown,
  x: unknown,
  combos: unknown,
  supports: unknown,
  EI: unknown,
  quantity: unknown,
  pattern: unknown,
  psi0: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const { member, deflection, given: unitsGiven } = memberOf(spans, loads, supports, EI, units);
    const header = readHeaders(headers);
    const q = readQuantity(quantity ?? null);
    if (q === "deflection" && member.stiffness === null) throw invalid("quantity deflection needs EI: give EI for the member or each span");
    checkCombinationCells(combos);
    const combinations = readCombinations(combos, psi0 ?? null, caseLabels(loads));
    const options = readPattern(pattern ?? null);
    const { values } = positionsOf(x);
    const given = values.filter((v): v is number => v !== null);
    const stations = envelope(member, combinations, given, options);
    let next = 0;
    const rows = values.map((v) => {
      if (v === null) return ["", "", "", "", ""];
      const s = stations[next++];
      const max = s.max[q]!;
      const min = s.min[q]!;
      return [
        v,
        finite(shownAs(q, max.value, deflection), `the largest ${q}`),
        governedBy(max),
        finite(shownAs(q, min.value, deflection), `the smallest ${q}`),
        governedBy(min),
      ];
    });
    return withHeaders(rows, header, COLUMNS.envelope(q), unitsGiven);
  });
}

/** SPAN.PEAKS: rows [label, max, x at max, governed by, min, x at min, governed by]. */
export function sheetPeaks(
  spans: unknown,
  loads: unknown,
  combos: unknown,
  supports: unknown,
  EI: unknown,
  pattern: unknown,
  psi0: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const { member, deflection, given } = memberOf(spans, loads, supports, EI, units);
    const header = readHeaders(headers);
    checkCombinationCells(combos);
    const combinations = readCombinations(combos, psi0 ?? null, caseLabels(loads));
    const peaks = governingPeaks(member, combinations, readPattern(pattern ?? null));
    const rows = peaks.map((p) => [
      p.quantity,
      finite(shownAs(p.quantity, p.max.value, deflection), `the largest ${p.quantity}`),
      p.max.x,
      governedBy(p.max),
      finite(shownAs(p.quantity, p.min.value, deflection), `the smallest ${p.quantity}`),
      p.min.x,
      governedBy(p.min),
    ]);
    return withHeaders(rows, header, COLUMNS.peaks, given);
  });
}

/**
 * SPAN.INFLUENCE: the effect of a unit load at each position, in the shape of positions. With
 * units the load is one force unit: a reaction or shear ordinate is dimensionless, a moment or
 * moment-reaction ordinate a length (the length unit), a deflection ordinate the deflection unit
 * per force unit.
 */
export function sheetInfluence(spans: unknown, effect: unknown, positions: unknown, supports: unknown, EI: unknown, units?: unknown): (number | string)[][] {
  return guarded(() => {
    const { member, deflection } = memberOf(spans, null, supports, EI, units);
    const e = readEffect(effect, false);
    if (e.kind === "absolute-moment") throw invalid("effect: absolute moment applies to moving loads only");
    checkInfluence(member, cellCount(positions));
    return mapPositions(positions, (p) => shownAs(e.kind, influenceLine(member, e, [p])[0], deflection), "positions");
  });
}

function readNumberList(arg: unknown, name: string, limit: number, noun: string): number[] {
  const entries = listEntries(arg, name);
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  checkCount(count, limit, name, noun);
  return entries.slice(0, count).map((cell, i) => readNumber(cell, () => `${name} entry ${i + 1}`));
}

/** The train of SPAN.MOVING from its axles and spacings arguments (the pane places it with this too). */
export function readTrain(axles: unknown, spacings: unknown): Train {
  const loads = readNumberList(axles, "axles", LIMITS.axles, "axle loads");
  const gaps = isAllBlank(spacings ?? null) ? [] : readNumberList(spacings, "spacings", LIMITS.axles, "spacings");
  return trainFrom(loads, gaps);
}

/** SPAN.MOVING: rows ["max" | "min", value, x of the first axle, direction, x where measured]. */
export function sheetMoving(
  spans: unknown,
  axles: unknown,
  spacings: unknown,
  effect: unknown,
  supports: unknown,
  EI: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const { member, deflection, given } = memberOf(spans, null, supports, EI, units);
    const header = readHeaders(headers);
    const train = readTrain(axles, spacings);
    const e = readEffect(effect, true);
    const result = movingLoad(member, train, e);
    const rows = (["max", "min"] as const).map((label) => {
      const p = result[label];
      return [label, finite(shownAs(e.kind, p.value, deflection), `the ${label} value`), p.leadX, p.direction, p.x];
    });
    return withHeaders(rows, header, COLUMNS.moving(e.kind), given);
  });
}

/** SPAN.COMBOS: the individual combinations of a named set, one per row. */
export function sheetCombinationSet(name: unknown, psi0: unknown, cases: unknown): string[][] {
  return guarded(() => {
    const cell = singleCell(name);
    if (typeof cell !== "string" || cell.trim() === "") throw invalid(`set: ${show(cell)} is not a set name; use ASCE7-2.3.1, ASCE7-2.4.1 or EN1990-6.10`);
    const entries = isAllBlank(cases ?? null) ? ["Q"] : listEntries(cases, "cases").filter((c) => !isBlank(c));
    checkCount(entries.length, LIMITS.variableCases, "cases", "variable cases");
    const variableCases = entries.map(String);
    return expandCombinationSet(cell, { psi0: readPsi0(psi0 ?? null), variableCases }).map((c) => [c.text]);
  });
}
