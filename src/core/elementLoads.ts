import type { Load } from "./model";
import { locate, snapToNode } from "./positions";

/**
 * A load as one span sees it, in local coordinates t from the span's left node (exactly 0 or
 * the span length at a node), with the absolute positions it came from (`x`, `xFrom`, `xTo`:
 * the node's own x at a node), so that results there report the position as given.
 */
export type SpanLoad =
  | { kind: "force"; at: number; x: number; value: number }
  | { kind: "couple"; at: number; x: number; value: number }
  | { kind: "distributed"; from: number; to: number; xFrom: number; xTo: number; q0: number; q1: number };

/**
 * Splits the member's loads onto its spans. A point force or couple at a node (by the one
 * position rule of positions.ts) belongs to the span on its right (the last span at the
 * member end); a distributed load crossing nodes is cut there, its intensity interpolated.
 */
export function loadsBySpan(nodeX: number[], spans: number[], loads: Load[]): SpanLoad[][] {
  const spanCount = spans.length;
  const result: SpanLoad[][] = [];
  for (let e = 0; e < spanCount; e++) result.push([]);
  for (const load of loads) {
    // A settlement is a prescribed displacement, not a load on a span (stiffness.ts takes it).
    if (load.kind === "settle") continue;
    if (load.kind === "point" || load.kind === "moment") {
      if (load.magnitude === 0) continue;
      const place = locate(nodeX, spans, load.xStart);
      const x = place.node >= 0 ? nodeX[place.node] : load.xStart;
      const kind = load.kind === "point" ? "force" : "couple";
      result[place.span].push({ kind, at: place.t, x, value: load.magnitude });
      continue;
    }
    const qStart = load.magnitude;
    const qEnd = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
    if (qStart === 0 && qEnd === 0) continue;
    const a = snapToNode(nodeX, load.xStart);
    const b = snapToNode(nodeX, load.xEnd);
    const slope = (qEnd - qStart) / (b - a);
    const first = locate(nodeX, spans, a).span;
    for (let e = first; e < spanCount && nodeX[e] < b; e++) {
      const xFrom = Math.max(a, nodeX[e]);
      const xTo = Math.min(b, nodeX[e + 1]);
      if (xTo <= xFrom) continue;
      const from = xFrom === nodeX[e] ? 0 : xFrom - nodeX[e];
      const to = xTo === nodeX[e + 1] ? spans[e] : Math.min(xTo - nodeX[e], spans[e]);
      if (to <= from) continue;
      const q0 = qStart + slope * (xFrom - a);
      const q1 = xTo === b ? qEnd : qStart + slope * (xTo - a);
      result[e].push({ kind: "distributed", from, to, xFrom, xTo, q0, q1 });
    }
  }
  return result;
}

const GAUSS_POINT = Math.sqrt(3 / 5);
const GAUSS_NODES = [-GAUSS_POINT, 0, GAUSS_POINT];
const GAUSS_WEIGHTS = [5 / 9, 8 / 9, 5 / 9];

type Numbers = number[] | Float64Array;

/** Adds the Hermite shape functions (and, for couples, their slopes) at t into `out` from index `at`. */
function addShape(out: Numbers, at: number, t: number, span: number, value: number): void {
  const s = t / span;
  const s2 = s * s;
  const s3 = s2 * s;
  out[at] += value * (1 - 3 * s2 + 2 * s3);
  out[at + 1] += value * span * (s - 2 * s2 + s3);
  out[at + 2] += value * (3 * s2 - 2 * s3);
  out[at + 3] += value * span * (s3 - s2);
}

function addShapeSlope(out: Numbers, at: number, t: number, span: number, value: number): void {
  const s = t / span;
  out[at] += (value * (6 * s * s - 6 * s)) / span;
  out[at + 1] += value * (1 - 4 * s + 3 * s * s);
  out[at + 2] += (value * (6 * s - 6 * s * s)) / span;
  out[at + 3] += value * (3 * s * s - 2 * s);
}

/**
 * The shear-deformation parts of the Timoshenko shape functions (prismatic span, φ =
 * 12EI/(G·A_v L²)): N_i = (N_i of Euler–Bernoulli + φ·C_i)/(1 + φ), where for deflection
 * C = [1 - s, L(s - s²)/2, s, L(s² - s)/2] and for the section rotation (couples)
 * C = [0, 1 - s, 0, s]. They are the exact displacement fields of the element, so the
 * work-equivalent loads below are its exact fixed-end forces.
 */
function addShearShape(out: Numbers, t: number, span: number, value: number): void {
  const s = t / span;
  out[0] += value * (1 - s);
  out[1] += (value * span * (s - s * s)) / 2;
  out[2] += value * s;
  out[3] += (value * span * (s * s - s)) / 2;
}

function addShearShapeRotation(out: Numbers, t: number, span: number, value: number): void {
  const s = t / span;
  out[1] += value * (1 - s);
  out[3] += value * s;
}

/** The shear parts of one span's loads (a scratch buffer: the sum is synchronous and never re-entered). */
const shearParts = new Float64Array(4);

/**
 * Work-equivalent nodal loads of one span's loads, [force left, moment left, force right,
 * moment right] (down and clockwise positive). For Euler–Bernoulli elements these are exact:
 * the load times the cubic shape functions is at most a quartic, which three-point
 * Gauss–Legendre integrates exactly. With shear deformation (`phi` = 12EI/(G·A_v L²) > 0)
 * the Timoshenko shape functions (still cubic) give the exact fixed-end forces the same way;
 * with phi = 0 (Euler–Bernoulli) the shear parts are never touched. Written into `out` from
 * index `at` (four entries, set, not added to) when given.
 */
export function equivalentNodalLoads<T extends Numbers = number[]>(
  loads: SpanLoad[],
  span: number,
  out: T = [0, 0, 0, 0] as T,
  at = 0,
  phi = 0,
): T {
  out[at] = out[at + 1] = out[at + 2] = out[at + 3] = 0;
  const sheared = phi > 0;
  if (sheared) shearParts.fill(0);
  for (let i = 0; i < loads.length; i++) {
    const load = loads[i];
    if (load.kind === "force") {
      addShape(out, at, load.at, span, load.value);
      if (sheared) addShearShape(shearParts, load.at, span, load.value);
    } else if (load.kind === "couple") {
      addShapeSlope(out, at, load.at, span, load.value);
      if (sheared) addShearShapeRotation(shearParts, load.at, span, load.value);
    } else {
      const half = (load.to - load.from) / 2;
      const mid = (load.to + load.from) / 2;
      const rate = (load.q1 - load.q0) / (load.to - load.from);
      for (let g = 0; g < 3; g++) {
        const t = mid + half * GAUSS_NODES[g];
        const w = GAUSS_WEIGHTS[g] * half * (load.q0 + rate * (t - load.from));
        addShape(out, at, t, span, w);
        if (sheared) addShearShape(shearParts, t, span, w);
      }
    }
  }
  if (sheared) for (let r = 0; r < 4; r++) out[at + r] = (out[at + r] + phi * shearParts[r]) / (1 + phi);
  return out;
}
