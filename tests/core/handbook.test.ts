/**
 * Handbook cases: each member is solved and compared with closed-form values at the handbook
 * tolerance (relative 1e-9). The source of every formula is named in the case (src/verify/cases/,
 * the same list `spanwise verify` runs).
 */
import { solve } from "../../src/core";
import { handbookCases } from "../../src/verify/cases";
import { mismatches } from "../../src/verify/compare";

const cases = [...handbookCases];

describe("handbook cases", () => {
  it("has at least 15 distinct cases, each with a source", () => {
    expect(new Set(cases.map((c) => c.name)).size).toBe(cases.length);
    expect(cases.length).toBeGreaterThanOrEqual(15);
    for (const c of cases) expect(c.source.length).toBeGreaterThan(10);
  });

  it.each(cases.map((c) => [c.name, c] as const))("%s", (_name, c) => {
    const solution = solve(c.member);
    expect(mismatches(c.member, solution, c.checks)).toEqual([]);
  });
});
