import type { SpanLoad } from "./elementLoads";
import type { Piece } from "./model";

/** Values just right of a span's left node, before any load sitting on that node. */
export interface SpanStart {
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}

/** The span's breakpoints in t, ascending and distinct, and the absolute x of each (a node's or a load's own x). */
function breakpoints(loads: SpanLoad[], span: number, xLeft: number, xRight: number): { t: number[]; x: number[] } {
  if (loads.length === 0) return { t: [0, span], x: [xLeft, xRight] };
  const ts = [0, span];
  const xs = [xLeft, xRight];
  for (const load of loads) {
    if (load.kind === "distributed") {
      ts.push(load.from, load.to);
      xs.push(load.xFrom, load.xTo);
    } else {
      ts.push(load.at);
      xs.push(load.x);
    }
  }
  const order = ts.map((_, i) => i);
  order.sort((a, b) => ts[a] - ts[b]);
  const t: number[] = [];
  const x: number[] = [];
  for (const i of order) {
    const pt = ts[i];
    if (pt < 0 || pt > span || (t.length > 0 && pt <= t[t.length - 1])) continue;
    t.push(pt);
    x.push(pt === 0 ? xLeft : pt === span ? xRight : xs[i]);
  }
  return { t, x };
}

function indexOf(points: number[], t: number): number {
  let lo = 0;
  let hi = points.length - 1;
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
 * the span's nodes). Appends the span's pieces to `out`. The loads are swept once in
 * order of position, so the cost grows as n log n in the number of loads.
 */
export function integrateSpan(
  start: SpanStart,
  loads: SpanLoad[],
  span: number,
  xLeft: number,
  xRight: number,
  flexibility: number,
  out: Piece[],
  shearFlexibility = 0,
): void {
  const { t: points, x: places } = breakpoints(loads, span, xLeft, xRight);
  const count = points.length;
  const force = new Float64Array(count);
  const couple = new Float64Array(count);
  const intensity = new Float64Array(count);
  const rate = new Float64Array(count);
  const opened = new Int32Array(count);
  for (const load of loads) {
    if (load.kind === "force") force[indexOf(points, load.at)] += load.value;
    else if (load.kind === "couple") couple[indexOf(points, load.at)] += load.value;
    else {
      const slope = (load.q1 - load.q0) / (load.to - load.from);
      const from = indexOf(points, load.from);
      const to = indexOf(points, load.to);
      intensity[from] += load.q0;
      rate[from] += slope;
      intensity[to] -= load.q1;
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
    const piece: Piece = {
      x0: places[k],
      x1: places[k + 1],
      shear0: shear,
      moment0: moment,
      slope0: slope,
      deflection0: deflection,
      q0,
      q1,
      flexibility,
      shearFlexibility,
    };
    out.push(piece);
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
}
