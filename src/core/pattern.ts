import type { Load, Member } from "./model";
import { nodePositions, snapToNode } from "./positions";

/** The part of a load that lies on [a, b] (null when none does). */
export function clipLoad(load: Load, a: number, b: number, lastSpan: boolean): Load | null {
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
  return member.spans.map((_, i) => {
    const last = i === member.spans.length - 1;
    const out: Load[] = [];
    for (const given of loads) {
      const load = { ...given, xStart: snapToNode(nodeX, given.xStart), xEnd: snapToNode(nodeX, given.xEnd) };
      const part = clipLoad(load, nodeX[i], nodeX[i + 1], last);
      if (part) out.push(part);
    }
    return out;
  });
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

/** "spans 1, 3" (1-based) for an arrangement. */
export function describeArrangement(spans: number[]): string {
  return spans.length === 0 ? "no span" : `${spans.length === 1 ? "span" : "spans"} ${spans.map((i) => i + 1).join(", ")}`;
}
