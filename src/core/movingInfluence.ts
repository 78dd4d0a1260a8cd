import { chebyshevPoints, fitPolynomial } from "./fit";
import { measure, type Effect } from "./influence";
import type { Load, Member } from "./model";
import { solve } from "./solve";

/**
 * An influence line as exact cubics: between consecutive breaks (the nodes and the section)
 * the effect of a unit load is a cubic in the load's position (the member's response to a
 * point load is cubic in its position between nodes), so four solves inside each interval
 * give it exactly. `cubics[j]` holds coefficients in v = (p - centre) / half of interval j
 * (null for an interval of no length).
 */
export interface InfluencePieces {
  breaks: number[];
  cubics: (number[] | null)[];
}

const POINTS = chebyshevPoints(4);

function unitLoad(x: number): Load {
  return { kind: "point", magnitude: 1, xStart: x, xEnd: x, magnitudeEnd: 0, loadCase: "", row: 1 };
}

export function influencePieces(member: Member, effect: Effect, breaks: number[], tol: number): InfluencePieces {
  const cubics = breaks.slice(0, -1).map((a, j) => {
    const b = breaks[j + 1];
    if (b - a <= tol) return null;
    const centre = (a + b) / 2;
    const half = (b - a) / 2;
    return fitPolynomial(POINTS, POINTS.map((v) => measure(solve({ ...member, loads: [unitLoad(centre + half * v)] }), effect)));
  });
  return { breaks, cubics };
}

/**
 * The effect of axle loads `loads[i]` standing at `centres[i] + half * u` (u in [-1, 1]) as a
 * cubic in u: the sum of each axle's influence cubic, taken in the interval its centre lies
 * in (axles off the member add nothing). The caller keeps every axle inside one interval for
 * the whole stretch.
 */
export function trainCubic(line: InfluencePieces, loads: number[], centres: number[], half: number): number[] {
  const { breaks, cubics } = line;
  const last = breaks.length - 1;
  const out = [0, 0, 0, 0];
  for (let i = 0; i < loads.length; i++) {
    const p = centres[i];
    if (loads[i] === 0 || p < breaks[0] || p > breaks[last]) continue;
    let lo = 0;
    let hi = last - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (breaks[mid] <= p) lo = mid;
      else hi = mid - 1;
    }
    const c = cubics[lo];
    if (!c) continue;
    const r = (breaks[lo + 1] - breaks[lo]) / 2;
    const alpha = (p - (breaks[lo] + r)) / r;
    const beta = half / r;
    // c0 + c1 (a + b u) + c2 (a + b u)^2 + c3 (a + b u)^3, expanded in powers of u.
    const P = loads[i];
    const a2 = alpha * alpha;
    const b2 = beta * beta;
    out[0] += P * (c[0] + c[1] * alpha + c[2] * a2 + c[3] * a2 * alpha);
    out[1] += P * beta * (c[1] + 2 * c[2] * alpha + 3 * c[3] * a2);
    out[2] += P * b2 * (c[2] + 3 * c[3] * alpha);
    out[3] += P * b2 * beta * c[3];
  }
  return out;
}
