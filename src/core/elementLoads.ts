import type { Load } from "./model";
import { POSITION_TOLERANCE } from "./tolerance";

/** A load as one span sees it, in local coordinates t from the span's left node. */
export type SpanLoad =
  | { kind: "force"; at: number; value: number }
  | { kind: "couple"; at: number; value: number }
  | { kind: "distributed"; from: number; to: number; q0: number; q1: number };

function spanIndexAt(nodeX: number[], x: number): number {
  let lo = 0;
  let hi = nodeX.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (nodeX[mid] <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Moves a position that is within rounding of a node onto the node. */
function snap(nodeX: number[], x: number, length: number): number {
  const tol = POSITION_TOLERANCE * length;
  const i = spanIndexAt(nodeX, x);
  if (Math.abs(x - nodeX[i]) <= tol) return nodeX[i];
  if (i + 1 < nodeX.length && Math.abs(x - nodeX[i + 1]) <= tol) return nodeX[i + 1];
  return x;
}

/**
 * Splits the member's loads onto its spans. A point force or couple exactly at a node
 * belongs to the span on its right (the last span at the member end); a distributed load
 * crossing nodes is cut there, its intensity interpolated.
 */
export function loadsBySpan(nodeX: number[], loads: Load[]): SpanLoad[][] {
  const spanCount = nodeX.length - 1;
  const length = nodeX[spanCount];
  const result: SpanLoad[][] = [];
  for (let e = 0; e < spanCount; e++) result.push([]);
  for (const load of loads) {
    if (load.kind === "point" || load.kind === "moment") {
      if (load.magnitude === 0) continue;
      const x = snap(nodeX, load.xStart, length);
      const e = spanIndexAt(nodeX, x);
      const kind = load.kind === "point" ? "force" : "couple";
      result[e].push({ kind, at: x - nodeX[e], value: load.magnitude });
      continue;
    }
    const qStart = load.magnitude;
    const qEnd = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
    if (qStart === 0 && qEnd === 0) continue;
    const a = snap(nodeX, load.xStart, length);
    const b = snap(nodeX, load.xEnd, length);
    const slope = (qEnd - qStart) / (b - a);
    const first = spanIndexAt(nodeX, a);
    for (let e = first; e < spanCount && nodeX[e] < b; e++) {
      const from = Math.max(a, nodeX[e]);
      const to = Math.min(b, nodeX[e + 1]);
      if (to <= from) continue;
      const q0 = qStart + slope * (from - a);
      const q1 = to === b ? qEnd : qStart + slope * (to - a);
      result[e].push({ kind: "distributed", from: from - nodeX[e], to: to - nodeX[e], q0, q1 });
    }
  }
  return result;
}

const GAUSS_POINT = Math.sqrt(3 / 5);
const GAUSS_NODES = [-GAUSS_POINT, 0, GAUSS_POINT];
const GAUSS_WEIGHTS = [5 / 9, 8 / 9, 5 / 9];

/** Adds the Hermite shape functions (and, for couples, their slopes) at t into `out`. */
function addShape(out: number[], t: number, span: number, value: number): void {
  const s = t / span;
  const s2 = s * s;
  const s3 = s2 * s;
  out[0] += value * (1 - 3 * s2 + 2 * s3);
  out[1] += value * span * (s - 2 * s2 + s3);
  out[2] += value * (3 * s2 - 2 * s3);
  out[3] += value * span * (s3 - s2);
}

function addShapeSlope(out: number[], t: number, span: number, value: number): void {
  const s = t / span;
  out[0] += (value * (6 * s * s - 6 * s)) / span;
  out[1] += value * (1 - 4 * s + 3 * s * s);
  out[2] += (value * (6 * s - 6 * s * s)) / span;
  out[3] += value * (3 * s * s - 2 * s);
}

/**
 * Work-equivalent nodal loads of one span's loads, [force left, moment left, force right,
 * moment right] (down and clockwise positive). For Euler–Bernoulli elements these are exact:
 * the load times the cubic shape functions is at most a quartic, which three-point
 * Gauss–Legendre integrates exactly.
 */
export function equivalentNodalLoads(loads: SpanLoad[], span: number): number[] {
  const out = [0, 0, 0, 0];
  for (const load of loads) {
    if (load.kind === "force") addShape(out, load.at, span, load.value);
    else if (load.kind === "couple") addShapeSlope(out, load.at, span, load.value);
    else {
      const half = (load.to - load.from) / 2;
      const mid = (load.to + load.from) / 2;
      const rate = (load.q1 - load.q0) / (load.to - load.from);
      for (let g = 0; g < 3; g++) {
        const t = mid + half * GAUSS_NODES[g];
        addShape(out, t, span, GAUSS_WEIGHTS[g] * half * (load.q0 + rate * (t - load.from)));
      }
    }
  }
  return out;
}
