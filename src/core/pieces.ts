import { COUPLE, DISTRIBUTED, FORCE, type SpanLoadTable } from "./elementLoads";
import type { PieceTable } from "./model";
import { DEFLECTION0, FLEXIBILITY, MOMENT0, PIECE_FIELDS, Q0, Q1, SHEAR0, SHEAR_FLEXIBILITY, SLOPE0, X0, X1 } from "./pieceTable";

/** Values just right of a span's left node, before any load sitting on that node. */
export interface SpanStart {
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}

/**
 * Scratch arrays of integrateSpan, reused across calls (integration is synchronous and never
 * re-entered): breakpoints in t and their x, and per breakpoint the point force, the couple,
 * the change of intensity and of its rate, and the change in the count of open distributed loads.
 */
let capacity = 0;
let points = new Float64Array(0);
let places = new Float64Array(0);
let force = new Float64Array(0);
let couple = new Float64Array(0);
let intensity = new Float64Array(0);
let rate = new Float64Array(0);
let opened = new Int32Array(0);
let candidateT = new Float64Array(0);
let candidateX = new Float64Array(0);
/**
 * The pieces integrated so far in this solve, PIECE_FIELDS numbers each (takePieces copies
 * them out). A list of unboxed doubles (filled with a fraction, so it holds doubles from the
 * start, and grown by pushing), so that the copy is one flat copy.
 */
const rows: number[] = [];
function growRows(size: number): void {
  while (rows.length < size) rows.push(0.5);
}
growRows(16 * PIECE_FIELDS);

function ensureCapacity(n: number): void {
  if (capacity >= n) return;
  capacity = Math.max(n, 2 * capacity, 16);
  points = new Float64Array(capacity);
  places = new Float64Array(capacity);
  force = new Float64Array(capacity);
  couple = new Float64Array(capacity);
  intensity = new Float64Array(capacity);
  rate = new Float64Array(capacity);
  opened = new Int32Array(capacity);
  candidateT = new Float64Array(capacity);
  candidateX = new Float64Array(capacity);
}

/** Above this many candidate points a span's breakpoints are ordered by the library sort (n log n); below it by insertion. */
const INSERTION_LIMIT = 24;

/**
 * The span's breakpoints in t, ascending and distinct, and the absolute x of each (a node's or
 * a load's own x), into `points` and `places`; returns their count. Candidates are the span's
 * ends and every load's positions, ordered stably (on equal t the first listed gives the x).
 */
function breakpoints(loads: SpanLoadTable, e: number, span: number, xLeft: number, xRight: number): number {
  const first = loads.start[e];
  const last = loads.start[e + 1];
  let n = 2;
  for (let j = first; j < last; j++) n += loads.kind[j] === DISTRIBUTED ? 2 : 1;
  ensureCapacity(n);
  const ts = candidateT;
  const xs = candidateX;
  ts[0] = 0;
  xs[0] = xLeft;
  ts[1] = span;
  xs[1] = xRight;
  let m = 2;
  for (let j = first; j < last; j++) {
    ts[m] = loads.from[j];
    xs[m++] = loads.xFrom[j];
    if (loads.kind[j] === DISTRIBUTED) {
      ts[m] = loads.to[j];
      xs[m++] = loads.xTo[j];
    }
  }
  if (m <= INSERTION_LIMIT) {
    // Stable insertion sort of the candidates by t (equal t keep their order).
    for (let i = 1; i < m; i++) {
      const t = ts[i];
      const x = xs[i];
      let j = i - 1;
      while (j >= 0 && ts[j] > t) {
        ts[j + 1] = ts[j];
        xs[j + 1] = xs[j];
        j--;
      }
      ts[j + 1] = t;
      xs[j + 1] = x;
    }
  } else {
    const order = new Array<number>(m);
    for (let i = 0; i < m; i++) order[i] = i;
    const t = Array.from(ts.subarray(0, m));
    const x = Array.from(xs.subarray(0, m));
    order.sort((a, b) => t[a] - t[b]);
    for (let i = 0; i < m; i++) {
      ts[i] = t[order[i]];
      xs[i] = x[order[i]];
    }
  }
  let count = 0;
  for (let i = 0; i < m; i++) {
    const pt = ts[i];
    if (pt < 0 || pt > span || (count > 0 && pt <= points[count - 1])) continue;
    points[count] = pt;
    places[count] = pt === 0 ? xLeft : pt === span ? xRight : xs[i];
    count++;
  }
  return count;
}

function indexOf(count: number, t: number): number {
  let lo = 0;
  let hi = count - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (points[mid] < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Integrates one span exactly by the area method: from the values at its left node, V
 * falls by the area under the load and by each point force, M rises by the area under V and
 * by each clockwise couple, slope falls by the area under M/EI and deflection rises by the
 * area under the slope plus, with shear deformation (`shearFlexibility` = 1/(G·A_v) > 0), the
 * area under V/(G·A_v). Pieces start and end at the nodes' and loads' own x (xLeft, xRight:
 * the span's nodes). Writes the span's pieces after the first `written` of this solve's
 * scratch rows and returns the new count (takePieces copies them out). The loads are swept
 * once in order of position, so the cost grows as n log n in the number of loads.
 */
export function integrateSpan(
  start: SpanStart,
  loads: SpanLoadTable,
  e: number,
  span: number,
  xLeft: number,
  xRight: number,
  flexibility: number,
  shearFlexibility: number,
  written: number,
): number {
  const count = breakpoints(loads, e, span, xLeft, xRight);
  const needed = (written + count - 1) * PIECE_FIELDS;
  if (rows.length < needed) growRows(Math.max(needed, 2 * rows.length));
  let o = written * PIECE_FIELDS;
  // A loop, not five fill calls: a span has only a few breakpoints.
  for (let k = 0; k < count; k++) {
    force[k] = 0;
    couple[k] = 0;
    intensity[k] = 0;
    rate[k] = 0;
    opened[k] = 0;
  }
  for (let j = loads.start[e]; j < loads.start[e + 1]; j++) {
    const kind = loads.kind[j];
    if (kind === FORCE) force[indexOf(count, loads.from[j])] += loads.q0[j];
    else if (kind === COUPLE) couple[indexOf(count, loads.from[j])] += loads.q0[j];
    else {
      const q0 = loads.q0[j];
      const q1 = loads.q1[j];
      const slope = (q1 - q0) / (loads.to[j] - loads.from[j]);
      const from = indexOf(count, loads.from[j]);
      const to = indexOf(count, loads.to[j]);
      intensity[from] += q0;
      rate[from] += slope;
      intensity[to] -= q1;
      rate[to] -= slope;
      opened[from] += 1;
      opened[to] -= 1;
    }
  }
  let shear = start.shear;
  let moment = start.moment;
  let slope = start.slope;
  let deflection = start.deflection;
  let q0 = 0;
  let q1 = 0;
  let active = 0;
  for (let k = 0; k + 1 < count; k++) {
    const t0 = points[k];
    const t1 = points[k + 1];
    shear -= force[k];
    moment += couple[k];
    q0 += intensity[k];
    q1 += rate[k];
    active += opened[k];
    if (active === 0) {
      q0 = 0;
      q1 = 0;
    }
    rows[o + X0] = places[k];
    rows[o + X1] = places[k + 1];
    rows[o + SHEAR0] = shear;
    rows[o + MOMENT0] = moment;
    rows[o + SLOPE0] = slope;
    rows[o + DEFLECTION0] = deflection;
    rows[o + Q0] = q0;
    rows[o + Q1] = q1;
    rows[o + FLEXIBILITY] = flexibility;
    rows[o + SHEAR_FLEXIBILITY] = shearFlexibility;
    o += PIECE_FIELDS;
    const s = t1 - t0;
    const s2 = s * s;
    const s3 = s2 * s;
    const s4 = s3 * s;
    const nextShear = shear - q0 * s - (q1 * s2) / 2;
    const nextMoment = moment + shear * s - (q0 * s2) / 2 - (q1 * s3) / 6;
    const nextSlope = slope - flexibility * (moment * s + (shear * s2) / 2 - (q0 * s3) / 6 - (q1 * s4) / 24);
    let nextDeflection =
      deflection + slope * s - flexibility * ((moment * s2) / 2 + (shear * s3) / 6 - (q0 * s4) / 24 - (q1 * s4 * s) / 120);
    if (shearFlexibility > 0) nextDeflection += shearFlexibility * (shear * s - (q0 * s2) / 2 - (q1 * s3) / 6);
    shear = nextShear;
    moment = nextMoment;
    slope = nextSlope;
    deflection = nextDeflection;
    // The running intensity is carried to the next piece's start along its own slope.
    q0 += q1 * s;
  }
  return written + count - 1;
}

/** The first `count` pieces integrated in this solve, as the solution's own table (a copy of the scratch rows). */
export function takePieces(count: number): PieceTable {
  return { count, data: rows.slice(0, count * PIECE_FIELDS) };
}
