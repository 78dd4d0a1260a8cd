/**
 * The SPAN worksheet functions' bodies, taking arguments exactly as the host passes them
 * (2-D arrays, blanks as "", null or 0, skipped optional arguments as null) and returning
 * 2-D arrays. Every body runs guarded: only #VALUE! / #N/A host errors escape.
 */
import { diagram, extremes, invalid, solve, unavailable, valueAt, type Quantity, type Solution } from "../core";
import { errorCodeOf, isEmpty, readNumber } from "./cells";
import { solvedMembers } from "./cache";
import { COLUMNS, readHeaders, withHeaders } from "./headers";
import { guarded } from "./hostError";
import { readMember, type MemberArgs } from "./member";
import { memberInOwnUnits, readMemberUnits, type MemberUnits } from "./units";
import { singleCell } from "./ranges";
import { finite, mapPositions, orBlank } from "./shape";

/** Stations of a diagram when `points` is blank. */
export const DEFAULT_POINTS = 101;
/** Most stations a diagram may ask for. */
export const MAX_POINTS = 10001;

/**
 * The solution for the member arguments, from the cache when the same arguments were solved
 * before. `units` is the already-read units argument when the caller has it (read here on a
 * miss otherwise). With units the member is solved in its own length and force units (only
 * EI is brought to force x length^2 of them), so spans, x and load positions are never
 * converted and a node stays exactly the node the user typed.
 */
export function solvedMember(args: MemberArgs, units?: MemberUnits | null): Solution {
  const kept = solvedMembers.find(args);
  if (kept !== undefined) return kept;
  const given = units === undefined ? readMemberUnits(args.units ?? null) : units;
  const member = readMember(args);
  const solution = solve(given === null ? member : memberInOwnUnits(member, given));
  solvedMembers.keep(args, solution);
  return solution;
}

/**
 * Factors from the solution's units (the member's own length and force units) to the units
 * the sheet shows: only deflection differs, when the units argument names a deflection unit.
 */
export interface OutputScale {
  length: number;
  force: number;
  moment: number;
  deflection: number;
}

const UNIT_SCALE: OutputScale = { length: 1, force: 1, moment: 1, deflection: 1 };

export function outputScale(units: MemberUnits | null): OutputScale {
  if (units === null) return UNIT_SCALE;
  return { length: 1, force: 1, moment: 1, deflection: units.deflection.factor / units.length.factor };
}

/** The solved member and the factors that bring its results into the sheet's units; the units argument is read once. */
export function solvedWithScale(args: MemberArgs): { solution: Solution; scale: OutputScale; units: MemberUnits | null } {
  const units = readMemberUnits(args.units ?? null);
  return { solution: solvedMember(args, units), scale: outputScale(units), units };
}

/** Divides a quantity's value in the solution's units into the sheet's units. */
function shown(quantity: Quantity, value: number, scale: OutputScale): number {
  switch (quantity) {
    case "shear":
      return value / scale.force;
    case "moment":
      return value / scale.moment;
    case "deflection":
      return value / scale.deflection;
    default:
      return value;
  }
}

/** The member arguments as the host passes them (skipped optional arguments arrive as null or undefined). */
export function memberArgs(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, units?: unknown): MemberArgs {
  return { spans, loads, supports: supports ?? null, EI: EI ?? null, combo: combo ?? null, units: units ?? null };
}

function requireStiffness(solution: Solution, quantity: Quantity): void {
  if (!solution.hasStiffness) throw unavailable(`${quantity} needs EI: give EI for the member or each span`);
}

/** Reads DIAGRAM's points argument: blank (empty or 0) = DEFAULT_POINTS. */
export function readPoints(arg: unknown): number {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("points: give one cell with the number of stations");
  if (isEmpty(cell) || cell === 0) return DEFAULT_POINTS;
  if (errorCodeOf(cell) !== null || typeof cell !== "number") {
    const points = readNumber(cell, () => "points");
    return checkPoints(points);
  }
  return checkPoints(cell);
}

function checkPoints(points: number): number {
  if (!Number.isInteger(points) || points < 2 || points > MAX_POINTS) {
    throw invalid(`points: give a whole number of stations from 2 to ${MAX_POINTS}, got ${points}`);
  }
  return points;
}

/** SPAN.REACTIONS: one row per node [x, vertical reaction (up +), moment reaction (ccw +)], under an optional header row. */
export function sheetReactions(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, units?: unknown): number[][];
export function sheetReactions(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, units: unknown, headers: unknown): (number | string)[][];
export function sheetReactions(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, units?: unknown, headers?: unknown): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, scale, units: given } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    return withHeaders(solution.reactions.map((r) => [
      r.x / scale.length,
      finite(r.force / scale.force, "a vertical reaction"),
      finite(r.moment / scale.moment, "a moment reaction"),
    ]), header, COLUMNS.reactions, given);
  });
}

/** SPAN.SHEAR / MOMENT / SLOPE / DEFLECTION: the quantity at each x, in the shape of x. */
export function sheetValuesAt(
  quantity: Quantity,
  spans: unknown,
  loads: unknown,
  x: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const { solution, scale } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    if (quantity === "slope" || quantity === "deflection") requireStiffness(solution, quantity);
    return mapPositions(x, (position) => shown(quantity, valueAt(solution, quantity, position), scale));
  });
}

/** SPAN.MAXMOMENT: [[largest M, x], [smallest M, x]]. */
export function sheetMaxMoment(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, units?: unknown, headers?: unknown): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, scale, units: given } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    const e = extremes(solution, "moment");
    const rows = [
      [finite(e.max / scale.moment, "the largest moment"), e.xMax / scale.length],
      [finite(e.min / scale.moment, "the smallest moment"), e.xMin / scale.length],
    ];
    return withHeaders(rows, header, COLUMNS.maxMoment, given);
  });
}

/** SPAN.EXTREMES: rows [label, max, x at max, min, x at min]; slope and deflection only with EI. */
export function sheetExtremes(
  spans: unknown,
  loads: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, scale, units: given } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    const quantities: Quantity[] = solution.hasStiffness ? ["shear", "moment", "slope", "deflection"] : ["shear", "moment"];
    const rows = quantities.map((q) => {
      const e = extremes(solution, q);
      return [q, finite(shown(q, e.max, scale), `the largest ${q}`), e.xMax / scale.length, finite(shown(q, e.min, scale), `the smallest ${q}`), e.xMin / scale.length];
    });
    return withHeaders(rows, header, COLUMNS.extremes, given);
  });
}

/** SPAN.DIAGRAM: rows [x, V, M, slope, deflection]; slope and deflection "" without EI. */
export function sheetDiagram(
  spans: unknown,
  loads: unknown,
  points: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const count = readPoints(points);
    const header = readHeaders(headers);
    const { solution, scale, units: given } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    const rows = diagram(solution, count).map((row) => [
      row.x / scale.length,
      finite(row.shear / scale.force, "a shear value"),
      finite(row.moment / scale.moment, "a moment value"),
      orBlank(row.slope),
      orBlank(row.deflection / scale.deflection),
    ]);
    return withHeaders(rows, header, COLUMNS.diagram, given);
  });
}
