import { invalid } from "./errors";
import type { Load, Member } from "./model";
import { nodePositions, snapToNode } from "./positions";

/**
 * The one definition of the load arrangements a pattern searches, used by ENVELOPE and PEAKS
 * alike (the live case is split span by span; each arrangement loads some of the spans):
 * - "none": the live case as given, every load where it stands (no arrangement);
 * - "standard": the classical arrangements (standardArrangements);
 * - "full": every subset of spans, the empty one (no live load at all) included.
 * "full" is never listed in the searches: by superposition the subset that makes the factored
 * effect at a point largest loads exactly the spans whose factored live effect there is
 * positive, and the smallest exactly those whose effect is negative (governingSpans).
 */
export type PatternMode = "none" | "standard" | "full";

/** The part of a load that lies on [a, b] (null when none does). */
export function clipLoad(load: Load, a: number, b: number, lastSpan: boolean): Load | null {
  if (load.kind === "settle") {
    throw invalid(`load row ${load.row}: a settlement belongs to a support, not to a span, so it cannot be arranged span by span; give it a case label other than the patterned live case`);
  }
  if (load.kind === "point" || load.kind === "moment") {
    const inside = load.xStart >= a && (load.xStart < b || (lastSpan && load.xStart <= b));
    return inside ? load : null;
  }
  const from = Math.max(a, load.xStart);
  const to = Math.min(b, load.xEnd);
  if (!(to > from)) return null;
  const qStart = load.magnitude;
  const qEnd = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
  const rate = (qEnd - qStart) / (load.xEnd - load.xStart);
  return {
    ...load,
    kind: "linear",
    xStart: from,
    xEnd: to,
    magnitude: qStart + rate * (from - load.xStart),
    magnitudeEnd: to === load.xEnd ? qEnd : qStart + rate * (to - load.xStart),
  };
}

/** The loads of `loads` that fall on each span, span by span (a load at a node goes right). */
export function loadsPerSpan(member: Member, loads: Load[]): Load[][] {
  const nodeX = nodePositions(member.spans);
  const out: Load[][] = member.spans.map(() => []);
  const last = member.spans.length - 1;
  for (const given of loads) {
    const load = { ...given, xStart: snapToNode(nodeX, given.xStart), xEnd: snapToNode(nodeX, given.xEnd) };
    // Only the spans the load can reach are visited (a binary search for the first one).
    let lo = 0;
    let hi = last;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (nodeX[mid] <= load.xStart) lo = mid;
      else hi = mid - 1;
    }
    const end = load.kind === "point" || load.kind === "moment" ? load.xStart : load.xEnd;
    for (let i = Math.max(0, lo - 1); i <= last && nodeX[i] <= end; i++) {
      const part = clipLoad(load, nodeX[i], nodeX[i + 1], i === last);
      if (part) out[i].push(part);
    }
  }
  return out;
}

/**
 * The classical pattern arrangements of a live load over n spans, as 0-based span lists:
 * every span; alternate spans (odd and even), which give the largest positive moment in
 * each loaded span; and for each interior support, the two adjacent spans with every
 * other span beyond them, which give the largest negative moment there.
 */
export function standardArrangements(spanCount: number): number[][] {
  const all = Array.from({ length: spanCount }, (_, i) => i);
  const result: number[][] = [all];
  if (spanCount > 1) {
    result.push(all.filter((i) => i % 2 === 0));
    result.push(all.filter((i) => i % 2 === 1));
  }
  for (let support = 1; support < spanCount; support++) {
    const left = support - 1;
    const right = support;
    result.push(all.filter((i) => i === left || i === right || (i < left && (left - i) % 2 === 0) || (i > right && (i - right) % 2 === 0)));
  }
  const seen = new Set<string>();
  return result.filter((spans) => {
    const key = spans.join(",");
    if (spans.length === 0 || seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/**
 * Every arrangement a pattern stands for, listed (the definition the searches are proven
 * against; "full" is listed only for small members, 2^n subsets, the empty one first).
 * "none" has the single arrangement "as given", written as null.
 */
export function arrangementsOf(mode: PatternMode, spanCount: number): (number[] | null)[] {
  if (mode === "none") return [null];
  if (mode === "standard") return standardArrangements(spanCount);
  if (spanCount > 20) throw new RangeError(`arrangementsOf: ${spanCount} spans have too many subsets to list`);
  return Array.from({ length: 2 ** spanCount }, (_, k) => Array.from({ length: spanCount }, (_, i) => i).filter((i) => (k >> i) & 1));
}

/**
 * The full pattern's rule at one point: the spans whose factored live effect `factor *
 * values[i]` has the sense sought (+1 largest, -1 smallest), which is the subset of spans
 * that makes the total largest (smallest) there. Effects no larger than `noise[i]` (rounding
 * of that span's own solution) count as none: such a span is left unloaded.
 */
export function governingSpans(values: ArrayLike<number>, factor: number, sense: 1 | -1, noise?: ArrayLike<number>): number[] {
  const spans: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = factor * values[i];
    if (sense * v > 0 && Math.abs(values[i]) > (noise ? noise[i] : 0)) spans.push(i);
  }
  return spans;
}

/** "spans 1, 3" (1-based) for an arrangement. */
export function describeArrangement(spans: number[]): string {
  return spans.length === 0 ? "no span" : `${spans.length === 1 ? "span" : "spans"} ${spans.map((i) => i + 1).join(", ")}`;
}
