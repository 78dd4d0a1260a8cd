/**
 * The one position rule (src/core/positions.ts): a position within 1e-12 of the member length
 * of a node is that node; beyond the ends by more is off the member. Expected values are the
 * node sums as doubles (IEEE 754 addition), so the cases where a typed decimal differs from
 * the sum of the spans by a unit of rounding are exactly those the issue lists.
 */
import { checkedPosition, isOnMember, nodeIndexAt, nodePositions, snapToNode } from "../../src/core";
import { locate } from "../../src/core/positions";
import { thrown } from "./kit/errors";

describe("nodes and member length from one sum", () => {
  test.each([
    ["0.4 1", [0.4, 1], 1.4],
    ["9.6 13.2 12.3 (sums to 35.099999999999994)", [9.6, 13.2, 12.3], 35.1],
    ["9.9 9.8 0.7 9.6", [9.9, 9.8, 0.7, 9.6], 30],
    ["0.1 0.2 (0.30000000000000004)", [0.1, 0.2], 0.3],
  ])("%s: the typed end %s is the last node", (_, spans, typedEnd) => {
    const nodeX = nodePositions(spans);
    expect(nodeIndexAt(nodeX, typedEnd)).toBe(spans.length);
    expect(snapToNode(nodeX, typedEnd)).toBe(nodeX[spans.length]);
    expect(checkedPosition(nodeX, typedEnd, "x")).toBe(nodeX[spans.length]);
  });

  test.each([
    ["20.4 at the third node of 9.9 9.8 0.7 9.6", [9.9, 9.8, 0.7, 9.6], 20.4, 3, 3, 0],
    ["1.4 at the end of 0.4 1: the last span, t = its length", [0.4, 1], 1.4, 2, 1, 1],
    ["0.4 at the interior node: the span on the right, t = 0", [0.4, 1], 0.4, 1, 1, 0],
    ["0.9 inside span 2", [0.4, 1], 0.9, -1, 1, 0.5],
  ])("%s", (_, spans, x, node, span, t) => {
    const nodeX = nodePositions(spans);
    const at = locate(nodeX, spans, x);
    expect(at.node).toBe(node);
    expect(at.span).toBe(span);
    expect(at.t).toBeCloseTo(t, 14);
    if (node >= 0) expect(at.t === 0 || at.t === spans[span]).toBe(true);
  });

  test.each([
    ["a hair below 0 (-1e-14 on 6)", -1e-14, true, 0],
    ["a hair beyond the end (6 + 1e-13)", 6 + 1e-13, true, 6],
    ["clearly before the start (-1e-9)", -1e-9, false, null],
    ["clearly beyond the end (6.000001)", 6.000001, false, null],
  ])("%s: on the member %s", (_, x, on, snapped) => {
    const nodeX = nodePositions([2, 4]);
    expect(isOnMember(x, 6)).toBe(on);
    if (snapped !== null) expect(checkedPosition(nodeX, x, "x")).toBe(snapped);
    else expect(thrown(() => checkedPosition(nodeX, x, "x")).message).toMatch(/x = .* is outside the member, which runs from 0 to 6/);
  });
});
