/**
 * The solve core reuses scratch buffers across calls (layout DOFs, band, right-hand side,
 * element matrices, end forces, breakpoints, extreme candidates): a solution must hold none of
 * them. Invariant: solving other members afterwards (smaller ones, larger ones that make the
 * buffers grow, ill-conditioned ones that take the double-double path, refused ones that throw
 * halfway) never changes a solution already returned, nor its extremes, nor an assembled system.
 */
import fc from "fast-check";
import { assemble, extremes, solve, type Member, type Quantity, type Solution } from "../../src/core";
import { auditMember } from "./kit/auditMembers";

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

function snapshot(solution: Solution): string {
  const peaks = QUANTITIES.map((q) => extremes(solution, q));
  return JSON.stringify({ solution, peaks });
}

function continuous(spans: number, magnitude: number): Member {
  const lengths = Array.from({ length: spans }, (_, i) => 3 + (i % 4));
  const loads: Member["loads"] = [];
  let x = 0;
  lengths.forEach((l, i) => {
    loads.push({ kind: "udl", magnitude, xStart: x, xEnd: x + l, magnitudeEnd: magnitude, loadCase: "", row: 2 * i + 1 });
    loads.push({ kind: "point", magnitude: 10 + i, xStart: x + l / 3, xEnd: x + l / 3, magnitudeEnd: 0, loadCase: "", row: 2 * i + 2 });
    x += l;
  });
  const supports: Member["supports"] = lengths.concat([0]).map((_, i) => (i === 0 ? { kind: "fixed" } : i === 2 && spans > 3 ? { kind: "hinge" } : { kind: "pin" }));
  return { spans: lengths, supports, stiffness: [2e4], loads };
}

/** A member the solver refuses after validation (a mechanism: hinges side by side). */
const mechanism: Member = {
  spans: [4, 4, 4],
  supports: [{ kind: "pin" }, { kind: "hinge" }, { kind: "hinge" }, { kind: "pin" }],
  stiffness: [1],
  loads: [{ kind: "point", magnitude: 1, xStart: 2, xEnd: 2, magnitudeEnd: 0, loadCase: "", row: 1 }],
};

describe("solutions share no scratch buffer with the solver", () => {
  test("a small member's solution survives larger, smaller, refused and ill-conditioned solves after it", () => {
    const first = solve(continuous(3, 2));
    const before = snapshot(first);
    const others: Member[] = [continuous(200, 3), continuous(2, 4), continuous(1000, 5), ...fc.sample(auditMember("ill"), { seed: 7, numRuns: 40 })];
    for (const m of others) {
      try {
        solve(m);
      } catch {
        // Refusals are allowed here; only their effect on the first solution is judged.
      }
    }
    expect(() => solve(mechanism)).toThrow();
    expect(snapshot(first)).toBe(before);
  });

  test("a large member's solution survives the small solves after it", () => {
    const first = solve(continuous(500, 1.5));
    const before = snapshot(first);
    for (let i = 0; i < 50; i++) solve(continuous(1 + (i % 5), 1 + i));
    expect(snapshot(first)).toBe(before);
  });

  test("solving again gives the same numbers bit for bit (no state carried between calls)", () => {
    const members = [continuous(4, 2), ...fc.sample(auditMember("decimal"), { seed: 8, numRuns: 30 }), ...fc.sample(auditMember("ill"), { seed: 9, numRuns: 30 })];
    const outcome = (m: Member): string => {
      try {
        return snapshot(solve(m));
      } catch (error) {
        return `refused: ${(error as Error).message}`;
      }
    };
    const once = members.map(outcome);
    const reversed = members.slice().reverse().map(outcome).reverse();
    expect(reversed).toEqual(once);
  });

  test("shear stiffness and settlement reach every solve through the scratch buffers, and leave nothing behind", () => {
    // The same member with G·A_v on every span (φ = 12EI/(GA L²) between 0.3 and 1.3 here) and/or a settlement of its second node.
    const withPhysics = (m: Member, shear: boolean, settle: boolean): Member => ({
      ...m,
      shear: shear ? [2e4] : undefined,
      loads: settle ? [...m.loads, { kind: "settle", magnitude: 0.01, xStart: m.spans[0], xEnd: m.spans[0], magnitudeEnd: 0, loadCase: "", row: 99 }] : m.loads,
    });
    const plain = continuous(5, 2);
    const plainFirst = snapshot(solve(plain));
    const variants = [withPhysics(plain, true, false), withPhysics(plain, false, true), withPhysics(plain, true, true)];
    const first = variants.map((m) => snapshot(solve(m)));
    // Each feature changes the answer (a dropped 1/GA or settlement would give the plain one) ...
    for (const o of first) expect(o).not.toBe(plainFirst);
    expect(new Set(first).size).toBe(3);
    // ... and a plain solve after them, or after a larger sheared and settled one, is bit for bit the plain one.
    expect(snapshot(solve(plain))).toBe(plainFirst);
    solve(withPhysics(continuous(300, 3), true, true));
    expect(snapshot(solve(plain))).toBe(plainFirst);
    // The featured members again, after plain and larger solves: the same bits.
    solve(continuous(400, 1));
    expect(variants.map((m) => snapshot(solve(m)))).toEqual(first);
  });

  test("an assembled system is the caller's own", () => {
    const system = assemble(continuous(6, 2));
    const band = Array.from(system.band);
    const rhs = Array.from(system.rhs);
    solve(continuous(300, 9));
    expect(Array.from(system.band)).toEqual(band);
    expect(Array.from(system.rhs)).toEqual(rhs);
  });
});
