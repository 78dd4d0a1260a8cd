/**
 * Positions along the member: where the nodes are, how long the member is, and when a typed
 * position (an x, a load position, an axle) is on the member and when it is a node. The one
 * rule, used by every function: a position within POSITION_TOLERANCE of the member length of
 * a node IS that node (and reports the node's own x); anything beyond the ends by more than
 * that is off the member.
 */
import { invalid } from "./errors";
import { POSITION_TOLERANCE } from "./tolerance";

/** Node positions: 0, then the running sum of the spans, left to right. */
export function nodePositions(spans: readonly number[]): number[] {
  const nodeX = new Array<number>(spans.length + 1);
  let x = 0;
  nodeX[0] = 0;
  for (let i = 0; i < spans.length; i++) {
    x += spans[i];
    nodeX[i + 1] = x;
  }
  return nodeX;
}

/** The member length: the last node's position (the same sum, so the same number). */
export function memberLength(spans: readonly number[]): number {
  let total = 0;
  for (const span of spans) total += span;
  return total;
}

/** How far two positions on a member of this length may differ and still be the same place. */
export function positionTolerance(length: number): number {
  return POSITION_TOLERANCE * length;
}

/** True when x is on the member [0, length], to the position tolerance. */
export function isOnMember(x: number, length: number): boolean {
  const tol = positionTolerance(length);
  return x >= -tol && x <= length + tol;
}

/** Index of the span holding x (the span on the right at a node, the last span at the end). */
export function spanIndexAt(nodeX: readonly number[], x: number): number {
  let lo = 0;
  let hi = nodeX.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (nodeX[mid] <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** The index of the node x is at (to the position tolerance), or -1. */
export function nodeIndexAt(nodeX: readonly number[], x: number): number {
  const tol = positionTolerance(nodeX[nodeX.length - 1]);
  const i = spanIndexAt(nodeX, x);
  const below = Math.abs(x - nodeX[i]);
  const above = i + 1 < nodeX.length ? Math.abs(x - nodeX[i + 1]) : Infinity;
  if (below <= tol && below <= above) return i;
  if (above <= tol) return i + 1;
  return -1;
}

/** x on the member: the node's own x when x is at a node, otherwise x itself (clamped to the ends). */
export function snapToNode(nodeX: readonly number[], x: number): number {
  const j = nodeIndexAt(nodeX, x);
  if (j >= 0) return nodeX[j];
  return Math.min(Math.max(x, 0), nodeX[nodeX.length - 1]);
}

/** Where x is as one span sees it: the span (on the right at a node, the last at the end) and the local t, exactly 0 or the span length at nodes. */
export interface Located {
  span: number;
  t: number;
  /** The node x is at, or -1. */
  node: number;
}

export function locate(nodeX: readonly number[], spans: readonly number[], x: number): Located {
  return locateInto(nodeX, spans, x, { span: 0, t: 0, node: -1 });
}

/** locate, written into `out` (returned), so that a caller placing many loads builds no object per load. */
export function locateInto(nodeX: readonly number[], spans: readonly number[], x: number, out: Located): Located {
  const node = nodeIndexAt(nodeX, x);
  const last = spans.length - 1;
  out.node = node;
  if (node >= 0) {
    out.span = node > last ? last : node;
    out.t = node > last ? spans[last] : 0;
    return out;
  }
  const span = spanIndexAt(nodeX, x);
  out.span = span;
  out.t = Math.min(Math.max(x - nodeX[span], 0), spans[span]);
  return out;
}

/**
 * A position the user typed, checked against the member by the one rule: a finite number,
 * on the member to the position tolerance; returns the node's own x at a node. `what` names
 * it in the message ("x", "unit load position", "effect: x"); `joiner` sits between name and value.
 */
export function checkedPosition(nodeX: readonly number[], x: number, what: string, joiner = " = "): number {
  const length = nodeX[nodeX.length - 1];
  if (typeof x !== "number" || !Number.isFinite(x)) throw invalid(`${what} must be a finite number, got ${String(x)}`);
  if (!isOnMember(x, length)) throw invalid(`${what}${joiner}${x} is outside the member, which runs from 0 to ${shownLength(length)}`);
  return snapToNode(nodeX, x);
}

/** The member length as the user typed it: 12 significant digits hide binary rounding of the sum. */
export function shownLength(length: number): number {
  return Number(length.toPrecision(12));
}
