import type { SpanLoad } from "./elementLoads";
import type { Piece } from "./model";

/** Values just right of a span's left node, before any load sitting on that node. */
export interface SpanStart {
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}

function breakpoints(loads: SpanLoad[], span: number): number[] {
  const points = [0, span];
  for (const load of loads) {
    if (load.kind === "distributed") points.push(load.from, load.to);
    else points.push(load.at);
  }
  points.sort((a, b) => a - b);
  const unique: number[] = [];
  for (const t of points) if (t >= 0 && t <= span && (unique.length === 0 || t > unique[unique.length - 1])) unique.push(t);
  return unique;
}

/**
 * Integrates one span exactly by the area method: from the values at its left node, V
 * falls by the area under the load and by each point force, M rises by the area under V and
 * by each clockwise couple, slope falls by the area under M/EI and deflection rises by the
 * area under the slope. Appends the span's pieces to `out`.
 */
export function integrateSpan(
  start: SpanStart,
  loads: SpanLoad[],
  span: number,
  offset: number,
  flexibility: number,
  out: Piece[],
): void {
  const points = breakpoints(loads, span);
  let shear = start.shear;
  let moment = start.moment;
  let slope = start.slope;
  let deflection = start.deflection;
  for (let k = 0; k + 1 < points.length; k++) {
    const t0 = points[k];
    const t1 = points[k + 1];
    let q0 = 0;
    let q1 = 0;
    for (const load of loads) {
      if (load.kind === "force") {
        if (load.at === t0) shear -= load.value;
      } else if (load.kind === "couple") {
        if (load.at === t0) moment += load.value;
      } else if (load.from <= t0 && load.to >= t1) {
        const rate = (load.q1 - load.q0) / (load.to - load.from);
        q0 += load.q0 + rate * (t0 - load.from);
        q1 += rate;
      }
    }
    const piece: Piece = {
      x0: offset + t0,
      x1: k + 2 === points.length ? offset + span : offset + t1,
      shear0: shear,
      moment0: moment,
      slope0: slope,
      deflection0: deflection,
      q0,
      q1,
      flexibility,
    };
    out.push(piece);
    const s = t1 - t0;
    const nextShear = shear - q0 * s - (q1 * s * s) / 2;
    const nextMoment = moment + shear * s - (q0 * s * s) / 2 - (q1 * s * s * s) / 6;
    const s2 = s * s;
    const s3 = s2 * s;
    const s4 = s3 * s;
    const nextSlope = slope - flexibility * (moment * s + (shear * s2) / 2 - (q0 * s3) / 6 - (q1 * s4) / 24);
    const nextDeflection =
      deflection + slope * s - flexibility * ((moment * s2) / 2 + (shear * s3) / 6 - (q0 * s4) / 24 - (q1 * s4 * s) / 120);
    shear = nextShear;
    moment = nextMoment;
    slope = nextSlope;
    deflection = nextDeflection;
  }
}
