/**
 * Handbook cases: each member is solved and compared with closed-form values at the handbook
 * tolerance (relative 1e-9). The source of every formula is named in the case (see handbook/).
 */
import { solve } from "../../src/core";
import { mismatches } from "./kit/compare";
import { cantileverCases } from "./handbook/cantilever";
import type { HandbookCase } from "./handbook/case";
import { indeterminateCases } from "./handbook/indeterminate";
import { simpleCases } from "./handbook/simple";

const cases: HandbookCase[] = [...simpleCases, ...cantileverCases, ...indeterminateCases];

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
