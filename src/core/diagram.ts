import { invalid } from "./errors";
import type { DiagramRow, Piece, Quantity, Solution } from "./model";
import { pieceList } from "./pieceTable";
import { coefficients, derivative, pieceValue } from "./polynomial";
import { rootsBetween } from "./roots";
import { cleanZero, POSITION_TOLERANCE, RELATIVE_ZERO } from "./tolerance";

function rowOf(solution: Solution, piece: Piece, x: number, s: number): DiagramRow {
  const { scales } = solution;
  const stiff = solution.hasStiffness;
  return {
    x,
    shear: cleanZero(pieceValue(piece, "shear", s), scales.shear),
    moment: cleanZero(pieceValue(piece, "moment", s), scales.moment),
    slope: stiff ? cleanZero(pieceValue(piece, "slope", s), scales.slope) : NaN,
    deflection: stiff ? cleanZero(pieceValue(piece, "deflection", s), scales.deflection) : NaN,
  };
}

/** Station priorities where stations fall within rounding of each other (higher wins). */
const PEAK = 0;
const EVEN = 1;
const BOUNDARY = 2;

/**
 * Every interior place a quantity can peak (the roots of its derivative on each piece, as
 * extremes.ts finds them), plus a piece's right end where it is not the next piece's left end,
 * sorted. Piece ends that are boundaries are not listed: the boundaries are stations of
 * their own, with the higher priority.
 */
function peakStations(pieces: Piece[], quantities: readonly Quantity[]): Float64Array {
  let out = new Float64Array(Math.max(16, pieces.length * 2));
  let n = 0;
  const push = (x: number): void => {
    if (n === out.length) {
      const grown = new Float64Array(out.length * 2);
      grown.set(out);
      out = grown;
    }
    out[n++] = x;
  };
  for (let i = 0; i < pieces.length; i++) {
    const piece = pieces[i];
    const span = piece.x1 - piece.x0;
    for (const q of quantities) for (const s of rootsBetween(derivative(coefficients(piece, q)), 0, span)) push(piece.x0 + s);
    if (i + 1 === pieces.length || pieces[i + 1].x0 !== piece.x1) push(piece.x1);
  }
  // A typed array sorts numerically, without a comparator.
  return out.subarray(0, n).sort();
}

/**
 * A diagram table: `points` evenly spaced stations from 0 to the member length, plus every
 * node, load position, piece boundary and peak location, in order of x. Where shear,
 * moment or slope (at a hinge) jumps, two rows share the x: the value just left, then just right. Slope and
 * deflection are NaN when the member was solved without EI.
 *
 * Stations within rounding of each other (POSITION_TOLERANCE of the length, measured from
 * the last station kept) are one: a piece boundary (exact node or load position) first, then
 * an evenly spaced station, then a peak location. The three lists are each in order, so they
 * are merged rather than sorted together (a member at the limits has some 70,000 stations).
 */
export function diagram(solution: Solution, points: number): DiagramRow[] {
  if (!Number.isInteger(points) || points < 2) throw invalid(`points must be a whole number of at least 2, got ${points}`);
  const { length } = solution;
  const pieces = pieceList(solution.pieces);
  const tol = POSITION_TOLERANCE * length;
  const quantities: Quantity[] = solution.hasStiffness ? ["shear", "moment", "slope", "deflection"] : ["shear", "moment"];
  const peaks = peakStations(pieces, quantities);
  const even = (i: number): number => (i === points - 1 ? length : (length * i) / (points - 1));

  const stations: number[] = [];
  let lastPriority = -1;
  const mark = (x: number, priority: number): void => {
    const last = stations[stations.length - 1];
    if (stations.length > 0 && x - last <= tol) {
      if (priority > lastPriority) {
        stations[stations.length - 1] = x;
        lastPriority = priority;
      }
      return;
    }
    stations.push(x);
    lastPriority = priority;
  };
  // Three-way merge by x; at equal x the order does not change the stations kept.
  let e = 0;
  let b = 0;
  let p = 0;
  let xe = even(0);
  while (e < points || b < pieces.length || p < peaks.length) {
    const xb = b < pieces.length ? pieces[b].x0 : Infinity;
    const xp = p < peaks.length ? peaks[p] : Infinity;
    if (e < points && xe <= xb && xe <= xp) {
      mark(xe, EVEN);
      if (++e < points) xe = even(e);
    } else if (xb <= xp) {
      mark(xb, BOUNDARY);
      b++;
    } else {
      mark(xp, PEAK);
      p++;
    }
  }

  const shearScale = solution.scales.shear;
  const momentScale = solution.scales.moment;
  const jumpTol = 1e3 * RELATIVE_ZERO;
  const rows: DiagramRow[] = [];
  // The stations ascend, so the piece of each (the last whose x0 <= x, as pieceIndexAt finds it) only moves right.
  let index = 0;
  for (const x of stations) {
    while (index + 1 < pieces.length && pieces[index + 1].x0 <= x) index++;
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
