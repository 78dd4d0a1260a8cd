/**
 * Runs the handbook cases and gathers, for each compared value, the expected and computed values,
 * the relative difference and the verdict; then a summary per worksheet function. Pure: the cases
 * and the solver are parameters (the CLI passes the shipped list and the real solver; a test
 * passes a broken case to prove a failure is reported and turns into a non-zero exit).
 */
import { solve, tolerance, type Member, type Solution } from "../core";
import { handbookCases, type HandbookCase } from "./cases";
import { checkRows, functionOf, type CheckRow } from "./compare";

export interface CaseResult {
  name: string;
  source: string;
  member: Member;
  rows: CheckRow[];
  /** Set when the solver refused or failed on the case (then every row fails). */
  error?: string;
  pass: boolean;
}

export interface FunctionSummary {
  /** The worksheet function whose core computation the rows exercise. */
  fn: string;
  checks: number;
  passed: number;
}

export interface Verification {
  cases: CaseResult[];
  summary: FunctionSummary[];
  tolerance: number;
  pass: boolean;
}

export function runVerification(cases: readonly HandbookCase[] = handbookCases, solver: (m: Member) => Solution = solve): Verification {
  const tally = new Map<string, FunctionSummary>();
  const results = cases.map((c): CaseResult => {
    let rows: CheckRow[];
    let error: string | undefined;
    try {
      rows = checkRows(c.member, solver(c.member), c.checks);
    } catch (e) {
      error = e instanceof Error ? e.message : String(e);
      rows = [];
    }
    const counted = error ? c.checks.map((check) => ({ fn: functionOf(check), pass: false })) : rows;
    for (const row of counted) {
      const entry = tally.get(row.fn) ?? { fn: row.fn, checks: 0, passed: 0 };
      entry.checks++;
      if (row.pass) entry.passed++;
      tally.set(row.fn, entry);
    }
    const pass = !error && rows.length > 0 && rows.every((r) => r.pass);
    return { name: c.name, source: c.source, member: c.member, rows, error, pass };
  });
  const summary = [...tally.values()].sort((a, b) => a.fn.localeCompare(b.fn));
  return { cases: results, summary, tolerance: tolerance.HANDBOOK_TOLERANCE, pass: results.length > 0 && results.every((r) => r.pass) };
}
