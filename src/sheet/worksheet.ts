/**
 * The SPAN worksheet functions' bodies, taking arguments exactly as the host passes them
 * (2-D arrays, blanks as "", null or 0, skipped optional arguments as null) and returning
 * 2-D arrays. Every body runs guarded: only #VALUE! / #N/A host errors escape.
 */
import { diagram, extremes, invalid, solve, unavailable, valueAt, type Quantity, type Solution } from "../core";
import { errorCodeOf, isEmpty, readNumber } from "./cells";
import { memberHash, solvedMembers } from "./cache";
import { guarded } from "./hostError";
import { readMember, type MemberArgs } from "./member";
import { singleCell } from "./ranges";
import { finite, mapPositions, orBlank } from "./shape";

/** Stations of a diagram when `points` is blank. */
export const DEFAULT_POINTS = 101;
/** Most stations a diagram may ask for. */
export const MAX_POINTS = 10001;

/** The solution for the member arguments, from the cache when the same arguments were solved before. */
export function solvedMember(args: MemberArgs): Solution {
  const last = solvedMembers.getLast(args);
  if (last !== undefined) return last;
  const hash = memberHash(args);
  if (hash !== null) {
    const cached = solvedMembers.get(args, hash);
    if (cached !== undefined) return cached;
  }
  const solution = solve(readMember(args));
  if (hash !== null) solvedMembers.remember(args, hash, solution);
  return solution;
}

function memberArgs(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown): MemberArgs {
  return { spans, loads, supports: supports ?? null, EI: EI ?? null, combo: combo ?? null };
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

/** SPAN.REACTIONS: one row per node [x, vertical reaction (up +), moment reaction (ccw +)]. */
export function sheetReactions(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown): number[][] {
  return guarded(() => {
    const solution = solvedMember(memberArgs(spans, loads, supports, EI, combo));
    return solution.reactions.map((r) => [r.x, finite(r.force, "a vertical reaction"), finite(r.moment, "a moment reaction")]);
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
): (number | string)[][] {
  return guarded(() => {
    const solution = solvedMember(memberArgs(spans, loads, supports, EI, combo));
    if (quantity === "slope" || quantity === "deflection") requireStiffness(solution, quantity);
    return mapPositions(x, (position) => valueAt(solution, quantity, position));
  });
}

/** SPAN.MAXMOMENT: [[largest M, x], [smallest M, x]]. */
export function sheetMaxMoment(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown): number[][] {
  return guarded(() => {
    const e = extremes(solvedMember(memberArgs(spans, loads, supports, EI, combo)), "moment");
    return [
      [finite(e.max, "the largest moment"), e.xMax],
      [finite(e.min, "the smallest moment"), e.xMin],
    ];
  });
}

/** SPAN.EXTREMES: rows [label, max, x at max, min, x at min]; slope and deflection only with EI. */
export function sheetExtremes(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown): (number | string)[][] {
  return guarded(() => {
    const solution = solvedMember(memberArgs(spans, loads, supports, EI, combo));
    const quantities: Quantity[] = solution.hasStiffness ? ["shear", "moment", "slope", "deflection"] : ["shear", "moment"];
    return quantities.map((q) => {
      const e = extremes(solution, q);
      return [q, finite(e.max, `the largest ${q}`), e.xMax, finite(e.min, `the smallest ${q}`), e.xMin];
    });
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
): (number | string)[][] {
  return guarded(() => {
    const count = readPoints(points);
    const solution = solvedMember(memberArgs(spans, loads, supports, EI, combo));
    return diagram(solution, count).map((row) => [
      row.x,
      finite(row.shear, "a shear value"),
      finite(row.moment, "a moment value"),
      orBlank(row.slope),
      orBlank(row.deflection),
    ]);
  });
}
