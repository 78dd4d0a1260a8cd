import { invalid } from "./errors";
import { candidates } from "./extremes";
import type { DiagramRow, Piece, Quantity, Solution } from "./model";
import { pieceValue } from "./polynomial";
import { cleanZero, POSITION_TOLERANCE, RELATIVE_ZERO } from "./tolerance";
import { pieceIndexAt } from "./evaluate";

function rowOf(solution: Solution, piece: Piece, x: number, s: number): DiagramRow {
  const stiff = solution.hasStiffness;
  const value = (q: Quantity): number => cleanZero(pieceValue(piece, q, s), solution.scales[q]);
  return {
    x,
    shear: value("shear"),
    moment: value("moment"),
    slope: stiff ? value("slope") : NaN,
    deflection: stiff ? value("deflection") : NaN,
  };
}

/**
 * A diagram table: `points` evenly spaced stations from 0 to the member length, plus every
 * node, load position, piece boundary and peak location, in order of x. Where shear,
 * moment or slope (at a hinge) jumps, two rows share the x: the value just left, then just right. Slope and
 * deflection are NaN when the member was solved without EI.
 */
export function diagram(solution: Solution, points: number): DiagramRow[] {
  if (!Number.isInteger(points) || points < 2) throw invalid(`points must be a whole number of at least 2, got ${points}`);
  const { length, pieces } = solution;
  const tol = POSITION_TOLERANCE * length;
  const boundaries = new Set(pieces.map((p) => p.x0));
  // Priority where stations fall within rounding of each other: a piece boundary (exact
  // node or load position) first, then an evenly spaced station, then a peak location.
  const marked: Array<[number, number]> = [];
  for (let i = 0; i < points; i++) marked.push([i === points - 1 ? length : (length * i) / (points - 1), 1]);
  for (const p of pieces) marked.push([p.x0, 2]);
  const quantities: Quantity[] = solution.hasStiffness ? ["shear", "moment", "slope", "deflection"] : ["shear", "moment"];
  for (const q of quantities) for (const c of candidates(solution, q)) marked.push([c.x, boundaries.has(c.x) ? 2 : 0]);
  marked.sort((a, b) => a[0] - b[0]);
  const stations: number[] = [];
  let lastPriority = -1;
  for (const [x, priority] of marked) {
    const last = stations[stations.length - 1];
    if (stations.length > 0 && x - last <= tol) {
      if (priority > lastPriority) {
        stations[stations.length - 1] = x;
        lastPriority = priority;
      }
      continue;
    }
    stations.push(x);
    lastPriority = priority;
  }
  const shearScale = solution.scales.shear;
  const momentScale = solution.scales.moment;
  const jumpTol = 1e3 * RELATIVE_ZERO;
  const rows: DiagramRow[] = [];
  for (const x of stations) {
    const index = pieceIndexAt(pieces, x);
    const piece = pieces[index];
    if (x >= length) {
      rows.push(rowOf(solution, piece, length, piece.x1 - piece.x0));
      continue;
    }
    if (index > 0 && piece.x0 === x) {
      const before = pieces[index - 1];
      const left = rowOf(solution, before, x, before.x1 - before.x0);
      const right = rowOf(solution, piece, x, 0);
      const jumps =
        Math.abs(left.shear - right.shear) > jumpTol * shearScale ||
        Math.abs(left.moment - right.moment) > jumpTol * momentScale ||
        Math.abs(left.slope - right.slope) > jumpTol * solution.scales.slope;
      if (jumps) rows.push(left);
      rows.push(right);
      continue;
    }
    rows.push(rowOf(solution, piece, x, x - piece.x0));
  }
  return rows;
}
