/**
 * Which pieces belong to which span (src/core/spanRuns.ts): the one rule behind spanPeaks,
 * spanSolution and spanDeflections. Cases at the edges of the rule (loads on nodes, within the
 * position tolerance of a node, decimal spans whose running sums round), then invariants on
 * random members.
 */
import { isSpanError, pieceList, solve, type Solution } from "../../src/core";
import { spanRuns } from "../../src/core/spanRuns";
import { POSITION_TOLERANCE } from "../../src/core/tolerance";
import { beam, couple, point, udl } from "./kit/members";
import { randomMember } from "./kit/random";

/** Each span's pieces lie inside it (to the position tolerance), the runs cover every piece once, and no span is empty. */
function expectRunsPartition(s: Solution): void {
  const runs = spanRuns(s);
  const pieces = pieceList(s.pieces);
  const tol = POSITION_TOLERANCE * s.length;
  expect(runs).toHaveLength(s.nodeX.length);
  expect(runs[0]).toBe(0);
  expect(runs[runs.length - 1]).toBe(pieces.length);
  for (let i = 0; i + 1 < runs.length; i++) {
    expect(runs[i + 1]).toBeGreaterThan(runs[i]);
    for (let k = runs[i]; k < runs[i + 1]; k++) {
      expect(pieces[k].x0).toBeGreaterThanOrEqual(s.nodeX[i] - tol);
      expect(pieces[k].x1).toBeLessThanOrEqual(s.nodeX[i + 1] + tol);
    }
    // The run ends exactly at the span's right node, and the next begins there.
    expect(pieces[runs[i + 1] - 1].x1).toBe(s.nodeX[i + 1]);
    expect(pieces[runs[i]].x0).toBe(s.nodeX[i]);
  }
}

describe("spanRuns: the pieces of each span", () => {
  test.each([
    ["a point load on an interior node", beam([3, 4], ["pin", "pin", "pin"], [point(5, 3), udl(1, 0, 7)])],
    ["a couple on an interior node", beam([3, 4], ["pin", "pin", "pin"], [couple(2, 3), udl(1, 0, 7)])],
    ["a point load within the position tolerance left of a node", beam([3, 4], ["pin", "pin", "pin"], [point(5, 3 - 3e-13 * 7)])],
    ["a point load within the position tolerance right of a node", beam([3, 4], ["pin", "pin", "pin"], [point(5, 3 + 3e-13 * 7)])],
    ["a point load just beyond the tolerance left of a node", beam([3, 4], ["pin", "pin", "pin"], [point(5, 3 - 1e-9)])],
    ["decimal spans (0.1 + 0.2 is not 0.3)", beam([0.1, 0.2, 0.3], ["pin", "pin", "pin", "pin"], [udl(1, 0, 0.6), point(2, 0.3)])],
    ["a partial load ending on a node", beam([2.5, 2.5, 2.5], ["fixed", "pin", "pin", "free"], [udl(3, 1, 5), point(1, 7.5)])],
    ["loads only on the last span", beam([1, 1, 1], ["pin", "pin", "pin", "pin"], [point(4, 2.5), point(4, 3)])],
  ])("%s", (_name, member) => {
    expectRunsPartition(solve(member));
  });

  test("the point load within tolerance of a node starts the span on its right (the one position rule)", () => {
    const s = solve(beam([3, 4], ["pin", "pin", "pin"], [point(5, 3 + 3e-13 * 7)]));
    const runs = spanRuns(s);
    // The first span has no load: one piece; the second starts at the node.
    expect(runs).toEqual([0, 1, s.pieces.count]);
  });

  test("invariants on 1,500 random members (kit generator)", () => {
    let checked = 0;
    for (let seed = 0; seed < 1500; seed++) {
      let s: Solution;
      try {
        s = solve(randomMember(700 + seed));
      } catch (error) {
        if (isSpanError(error)) continue;
        throw error;
      }
      expectRunsPartition(s);
      checked++;
    }
    expect(checked).toBeGreaterThan(1000);
  });
});
