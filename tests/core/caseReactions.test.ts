/**
 * Reactions by load case (src/core/caseReactions.ts). Handbook case: two equal spans on pins
 * under a uniform load, reactions 3wL/8, 10wL/8, 3wL/8 (steel construction manual, beam
 * diagrams and formulas, two equal spans with uniform load — from memory). Invariant:
 * superposition — every combination's reactions equal the factored sum of the cases'.
 */
import { applyCombination, caseReactions, MAX_CASES, parseCombination, solve, WORK_LIMIT, workOf } from "../../src/core";
import { beam, couple, point, udl } from "./kit/members";

describe("reactions by case", () => {
  const [L, wD, wL] = [5, 2, 3.5];
  const member = beam([L, L], ["pin", "pin", "pin"], [udl(wD, 0, 2 * L, "D"), udl(wL, 0, 2 * L, "L"), point(7, 2, "D")], 1e4);
  test("cases in the order the loads first use them", () => {
    expect(caseReactions(member).cases).toEqual(["D", "L"]);
  });
  test("two equal spans, uniform load: 3wL/8, 10wL/8, 3wL/8 (SCM, from memory)", () => {
    const { reactions } = caseReactions(member);
    const expected = [3, 10, 3].map((k) => (k * wL * L) / 8);
    reactions[1].forEach((r, i) => expect(Math.abs(r.force - expected[i])).toBeLessThan(1e-12 * wL * L));
  });
  test.each(["1.2D+1.6L", "D", "0.9D-1.0L", "1.4D+0.5L"])("superposition: %s equals the factored sum of the cases", (text) => {
    const combo = parseCombination(text);
    const direct = solve({ ...member, loads: applyCombination(member.loads, combo) }).reactions;
    const { cases, reactions } = caseReactions(member);
    direct.forEach((r, node) => {
      let force = 0;
      let moment = 0;
      cases.forEach((c, k) => {
        const factor = combo.terms.find((t) => t.loadCase === c)?.factor ?? 0;
        force += factor * reactions[k][node].force;
        moment += factor * reactions[k][node].moment;
      });
      expect(Math.abs(force - r.force)).toBeLessThan(1e-9 * 50);
      expect(Math.abs(moment - r.moment)).toBeLessThan(1e-9 * 250);
    });
  });
  test("a fixed end's moment reactions per case", () => {
    const m = beam([6], ["fixed", "fixed"], [udl(2, 0, 6, "D"), couple(3, 2, "W")], 1e4);
    const { reactions } = caseReactions(m);
    expect(Math.abs(reactions[0][0].moment - (2 * 36) / 12)).toBeLessThan(1e-12 * 72);
  });
  test("no load, and too many cases, are refused", () => {
    expect(() => caseReactions(beam([5], ["pin", "pin"], []))).toThrow(/no load case/);
    const many = Array.from({ length: MAX_CASES + 1 }, (_, i) => point(1, 2, `C${i}`));
    expect(() => caseReactions(beam([5], ["pin", "pin"], many))).toThrow(/at most 50/);
  });

  test("the size limit counts a solve per case and the combination's, and refuses before solving", () => {
    // 1,000 spans, one uniform load per case: size 15 (cases x 1000 + cases), plus 30 (1000 + cases) with the combination.
    const spans = Array.from({ length: 1000 }, () => 2);
    const supports = Array.from({ length: 1001 }, () => "pin" as const);
    const withCases = (n: number) => beam(spans, supports, Array.from({ length: n }, (_, i) => udl(1 + i, 0, 2000, `C${i}`)), 1e4);
    const counts = (n: number, combinations: number) => ({ spans: 1000, loads: n, cases: n, pattern: "none" as const, combinations, positions: 0, axles: 0 });
    expect(WORK_LIMIT).toBe(100000);
    expect(workOf("CASEREACTIONS", counts(6, 0))).toBe(90090);
    expect(workOf("CASEREACTIONS", counts(7, 0))).toBe(105105);
    expect(workOf("CASEREACTIONS", counts(4, 1))).toBe(90180);
    expect(workOf("CASEREACTIONS", counts(5, 1))).toBe(105225);
    expect(caseReactions(withCases(6)).cases).toHaveLength(6);
    expect(caseReactions(withCases(4), true).cases).toHaveLength(4);
    expect(() => caseReactions(withCases(5), true)).toThrow("CASEREACTIONS: this call is too large (1000 spans, 5 loads, 5 case labels, and the combination: size 105225, at most 100000)");
    expect(() => caseReactions(withCases(7))).toThrow(/CASEREACTIONS: this call is too large \(1000 spans, 7 loads, 7 case labels, no combination: size 105105, at most 100000\)/);
  });
});
