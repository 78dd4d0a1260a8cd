import type { Load } from "./model";
import { locateInto, snapToNode, type Located } from "./positions";

/**
 * A load as one span sees it, in local coordinates t from the span's left node (exactly 0 or
 * the span length at a node), with the absolute positions it came from (`x`, `xFrom`, `xTo`:
 * the node's own x at a node), so that results there report the position as given.
 */
export type SpanLoad =
  | { kind: "force"; at: number; x: number; value: number }
  | { kind: "couple"; at: number; x: number; value: number }
  | { kind: "distributed"; from: number; to: number; xFrom: number; xTo: number; q0: number; q1: number };

/** Kinds of a span-load table's entries. */
export const FORCE = 0;
export const COUPLE = 1;
export const DISTRIBUTED = 2;

/**
 * The member's loads split onto its spans as struct-of-arrays (the solver's own form of
 * SpanLoad, no object per load): span e's loads are entries start[e] to start[e + 1] - 1, in
 * the member's order. A point force or couple (kind FORCE or COUPLE) has its t in `from` and
 * `to`, its x in `xFrom` and `xTo` and its value in `q0`; a distributed load runs from t =
 * `from` to `to` (x = `xFrom` to `xTo`) with intensity `q0` to `q1`. The arrays may be longer
 * than the entries: read them by index.
 */
export interface SpanLoadTable {
  start: Int32Array;
  kind: Int8Array;
  from: Float64Array;
  to: Float64Array;
  xFrom: Float64Array;
  xTo: Float64Array;
  q0: Float64Array;
  q1: Float64Array;
}

function emptyTable(): SpanLoadTable {
  return { start: new Int32Array(8), kind: new Int8Array(0), from: new Float64Array(0), to: new Float64Array(0), xFrom: new Float64Array(0), xTo: new Float64Array(0), q0: new Float64Array(0), q1: new Float64Array(0) };
}

/** Room for `entries` entries (keeping the first `keep`) and `spans` spans (doubling). */
function ensureTable(table: SpanLoadTable, entries: number, keep: number, spans: number): void {
  if (table.start.length < spans + 1) table.start = new Int32Array(Math.max(spans + 1, 2 * table.start.length));
  if (table.kind.length >= entries) return;
  const size = Math.max(entries, 2 * table.kind.length, 16);
  const grow = <T extends Float64Array | Int8Array>(old: T, fresh: T): T => {
    fresh.set(old.subarray(0, keep));
    return fresh;
  };
  table.kind = grow(table.kind, new Int8Array(size));
  table.from = grow(table.from, new Float64Array(size));
  table.to = grow(table.to, new Float64Array(size));
  table.xFrom = grow(table.xFrom, new Float64Array(size));
  table.xTo = grow(table.xTo, new Float64Array(size));
  table.q0 = grow(table.q0, new Float64Array(size));
  table.q1 = grow(table.q1, new Float64Array(size));
}

/**
 * Scratch tables (splitting is synchronous and never re-entered): the solver's, the one
 * loadsBySpan reads back into objects, and the entries in the member's order before they are
 * grouped by span (with each entry's span in `pendingSpan`).
 */
const solverTable = emptyTable();
const objectTable = emptyTable();
const pending = emptyTable();
let pendingSpan = new Int32Array(16);
/** Where a load falls, reused for each load. */
const located: Located = { span: 0, t: 0, node: -1 };

/** Appends entry `n` of the pending list; returns n + 1. */
function addPending(n: number, span: number, kind: number, from: number, to: number, xFrom: number, xTo: number, q0: number, q1: number): number {
  if (n >= pending.kind.length) {
    ensureTable(pending, n + 1, n, 0);
    const spansOf = new Int32Array(pending.kind.length);
    spansOf.set(pendingSpan.subarray(0, n));
    pendingSpan = spansOf;
  }
  pendingSpan[n] = span;
  pending.kind[n] = kind;
  pending.from[n] = from;
  pending.to[n] = to;
  pending.xFrom[n] = xFrom;
  pending.xTo[n] = xTo;
  pending.q0[n] = q0;
  pending.q1[n] = q1;
  return n + 1;
}

/**
 * Splits the member's loads onto its spans, into the solver's scratch table (valid until the
 * next call; the solver reads it within one solve). A point force or couple at a node (by the
 * one position rule of positions.ts) belongs to the span on its right (the last span at the
 * member end); a distributed load crossing nodes is cut there, its intensity interpolated.
 * Loads of zero magnitude and settlements (a prescribed displacement, taken by stiffness.ts)
 * put nothing on a span.
 */
export function splitLoads(nodeX: number[], spans: number[], loads: Load[]): SpanLoadTable {
  return splitInto(solverTable, nodeX, spans, loads);
}

function splitInto(table: SpanLoadTable, nodeX: number[], spans: number[], loads: Load[]): SpanLoadTable {
  const spanCount = spans.length;
  let n = 0;
  for (let i = 0; i < loads.length; i++) {
    const load = loads[i];
    if (load.kind === "settle") continue;
    if (load.kind === "point" || load.kind === "moment") {
      if (load.magnitude === 0) continue;
      const place = locateInto(nodeX, spans, load.xStart, located);
      const x = place.node >= 0 ? nodeX[place.node] : load.xStart;
      n = addPending(n, place.span, load.kind === "point" ? FORCE : COUPLE, place.t, place.t, x, x, load.magnitude, 0);
      continue;
    }
    const qStart = load.magnitude;
    const qEnd = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
    if (qStart === 0 && qEnd === 0) continue;
    const a = snapToNode(nodeX, load.xStart);
    const b = snapToNode(nodeX, load.xEnd);
    const slope = (qEnd - qStart) / (b - a);
    const first = locateInto(nodeX, spans, a, located).span;
    for (let e = first; e < spanCount && nodeX[e] < b; e++) {
      const xFrom = Math.max(a, nodeX[e]);
      const xTo = Math.min(b, nodeX[e + 1]);
      if (xTo <= xFrom) continue;
      const from = xFrom === nodeX[e] ? 0 : xFrom - nodeX[e];
      const to = xTo === nodeX[e + 1] ? spans[e] : Math.min(xTo - nodeX[e], spans[e]);
      if (to <= from) continue;
      const q0 = qStart + slope * (xFrom - a);
      const q1 = xTo === b ? qEnd : qStart + slope * (xTo - a);
      n = addPending(n, e, DISTRIBUTED, from, to, xFrom, xTo, q0, q1);
    }
  }
  // Grouped by span, each span's entries kept in the member's order (a stable counting sort).
  ensureTable(table, n, 0, spanCount);
  const start = table.start;
  for (let e = 0; e <= spanCount; e++) start[e] = 0;
  let sorted = true;
  for (let k = 0; k < n; k++) {
    start[pendingSpan[k] + 1]++;
    if (k > 0 && pendingSpan[k] < pendingSpan[k - 1]) sorted = false;
  }
  for (let e = 0; e < spanCount; e++) start[e + 1] += start[e];
  if (sorted) {
    // Loads listed left to right are grouped already: the pending arrays become the table's.
    swapEntries(table, pending);
    return table;
  }
  for (let k = 0; k < n; k++) {
    const e = pendingSpan[k];
    // start[e] runs ahead while span e's entries are placed, and is restored below.
    const j = start[e]++;
    table.kind[j] = pending.kind[k];
    table.from[j] = pending.from[k];
    table.to[j] = pending.to[k];
    table.xFrom[j] = pending.xFrom[k];
    table.xTo[j] = pending.xTo[k];
    table.q0[j] = pending.q0[k];
    table.q1[j] = pending.q1[k];
  }
  for (let e = spanCount; e > 0; e--) start[e] = start[e - 1];
  start[0] = 0;
  return table;
}

/** Exchanges the entry arrays (not the span starts) of two tables. */
function swapEntries(a: SpanLoadTable, b: SpanLoadTable): void {
  const { kind, from, to, xFrom, xTo, q0, q1 } = a;
  a.kind = b.kind;
  a.from = b.from;
  a.to = b.to;
  a.xFrom = b.xFrom;
  a.xTo = b.xTo;
  a.q0 = b.q0;
  a.q1 = b.q1;
  b.kind = kind;
  b.from = from;
  b.to = to;
  b.xFrom = xFrom;
  b.xTo = xTo;
  b.q0 = q0;
  b.q1 = q1;
}

/** The loads of span e of a table as SpanLoad objects. */
function spanLoadsOf(table: SpanLoadTable, e: number): SpanLoad[] {
  const out: SpanLoad[] = [];
  for (let j = table.start[e]; j < table.start[e + 1]; j++) {
    const kind = table.kind[j];
    if (kind === DISTRIBUTED) out.push({ kind: "distributed", from: table.from[j], to: table.to[j], xFrom: table.xFrom[j], xTo: table.xTo[j], q0: table.q0[j], q1: table.q1[j] });
    else out.push({ kind: kind === FORCE ? "force" : "couple", at: table.from[j], x: table.xFrom[j], value: table.q0[j] });
  }
  return out;
}

/** The member's loads split onto its spans (splitLoads' rule), as objects per span (the double-double solve's form). */
export function loadsBySpan(nodeX: number[], spans: number[], loads: Load[]): SpanLoad[][] {
  const table = splitInto(objectTable, nodeX, spans, loads);
  const result: SpanLoad[][] = [];
  for (let e = 0; e < spans.length; e++) result.push(spanLoadsOf(table, e));
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
 * Work-equivalent nodal loads of span e's loads (from the table), [force left, moment left,
 * force right, moment right] (down and clockwise positive). For Euler–Bernoulli elements these are exact:
 * the load times the cubic shape functions is at most a quartic, which three-point
 * Gauss–Legendre integrates exactly. With shear deformation (`phi` = 12EI/(G·A_v L²) > 0)
 * the Timoshenko shape functions (still cubic) give the exact fixed-end forces the same way;
 * with phi = 0 (Euler–Bernoulli) the shear parts are never touched. Written into `out` from
 * index `at` (four entries, set, not added to).
 */
export function equivalentNodalLoads(table: SpanLoadTable, e: number, span: number, out: Numbers, at: number, phi = 0): void {
  out[at] = out[at + 1] = out[at + 2] = out[at + 3] = 0;
  const sheared = phi > 0;
  if (sheared) shearParts.fill(0);
  for (let j = table.start[e]; j < table.start[e + 1]; j++) {
    const kind = table.kind[j];
    if (kind === FORCE) {
      const t = table.from[j];
      const value = table.q0[j];
      addShape(out, at, t, span, value);
      if (sheared) addShearShape(shearParts, t, span, value);
    } else if (kind === COUPLE) {
      const t = table.from[j];
      const value = table.q0[j];
      addShapeSlope(out, at, t, span, value);
      if (sheared) addShearShapeRotation(shearParts, t, span, value);
    } else {
      const from = table.from[j];
      const to = table.to[j];
      const q0 = table.q0[j];
      const half = (to - from) / 2;
      const mid = (to + from) / 2;
      const rate = (table.q1[j] - q0) / (to - from);
      for (let g = 0; g < 3; g++) {
        const t = mid + half * GAUSS_NODES[g];
        const w = GAUSS_WEIGHTS[g] * half * (q0 + rate * (t - from));
        addShape(out, at, t, span, w);
        if (sheared) addShearShape(shearParts, t, span, w);
      }
    }
  }
  if (sheared) for (let r = 0; r < 4; r++) out[at + r] = (out[at + r] + phi * shearParts[r]) / (1 + phi);
}
