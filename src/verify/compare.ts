/**
 * Compares solver results with expected values (handbook formulas and other outside values) at
 * the handbook tolerance. Collects every mismatch so a failing case shows all of them.
 */
import { extremes, tolerance, valueAt, type Member, type Quantity, type Solution } from "../core";
import { isClose } from "./close";
import { relDiff } from "../core/tolerance";
import { lengthOf, scalesOf } from "./members";

/**
 * A compared value. `scale`, when given, is the quantity's own scale on the member (an
 * independent reference's largest magnitude of it): the value then agrees when it is within
 * the tolerance of that scale, as the exact audit judges (a value near zero between larger
 * ones is not asked for relative accuracy it cannot have). Without it, relative agreement.
 */
export type Check =
  | { reaction: number; force?: number; moment?: number; scale?: { force: number; moment: number } }
  | { quantity: Quantity; at: number; value: number; scale?: number }
  | { peak: "max" | "min"; quantity: Quantity; value: number; x?: number };

const scaleKey = { shear: "force", moment: "moment", slope: "slope", deflection: "deflection" } as const;

/** Relative agreement; an expected zero is compared against the member's own scale. */
export function agrees(actual: number, expected: number, scale: number, rel = tolerance.HANDBOOK_TOLERANCE): boolean {
  return expected === 0 ? isClose(actual, 0, rel, scale) : isClose(actual, expected, rel);
}

/** Which worksheet function reports the value a check compares. */
export function functionOf(check: Check): string {
  if ("reaction" in check) return "SPAN.REACTIONS";
  if ("at" in check) return `SPAN.${check.quantity.toUpperCase()}`;
  return "SPAN.EXTREMES";
}

/** One compared value: what was compared, the expected and computed values, the relative difference and the verdict. */
export interface CheckRow {
  label: string;
  /** The worksheet function that reports this value (its core computation is what is compared). */
  fn: string;
  expected: number;
  /** NaN when the solution lacks the value (e.g. a reaction that does not exist). */
  computed: number;
  /** Relative difference as `agrees` measures it (an expected zero against the member's scale). */
  relDiff: number;
  pass: boolean;
}

/** Every compared value of every check, in order (one definition used by the test suite and `spanwise verify`). */
export function checkRows(member: Member, solution: Solution, checks: Check[]): CheckRow[] {
  const scales = scalesOf(member);
  const L = lengthOf(member);
  const out: CheckRow[] = [];
  let fn = "";
  const expect = (label: string, actual: number, expected: number, scale: number, own?: number): void => {
    if (own !== undefined) {
      const diff = Number.isFinite(actual) ? relDiff(actual, expected, own) : Infinity;
      out.push({ label, fn, expected, computed: actual, relDiff: diff, pass: isClose(actual, expected, tolerance.HANDBOOK_TOLERANCE, own) });
      return;
    }
    const pass = agrees(actual, expected, scale);
    const diff = Number.isFinite(actual) ? (expected === 0 ? relDiff(actual, 0, scale) : relDiff(actual, expected)) : Infinity;
    out.push({ label, fn, expected, computed: actual, relDiff: diff, pass });
  };
  for (const check of checks) {
    fn = functionOf(check);
    if ("reaction" in check) {
      const r = solution.reactions[check.reaction];
      if (check.force !== undefined) expect(`reaction ${check.reaction} force`, r ? r.force : NaN, check.force, scales.force, check.scale?.force);
      if (check.moment !== undefined) expect(`reaction ${check.reaction} moment`, r ? r.moment : NaN, check.moment, scales.moment, check.scale?.moment);
    } else if ("at" in check) {
      const scale = scales[scaleKey[check.quantity]];
      expect(`${check.quantity} at x = ${check.at}`, valueAt(solution, check.quantity, check.at), check.value, scale, check.scale);
    } else {
      const e = extremes(solution, check.quantity);
      const scale = scales[scaleKey[check.quantity]];
      const value = check.peak === "max" ? e.max : e.min;
      const x = check.peak === "max" ? e.xMax : e.xMin;
      expect(`${check.peak} ${check.quantity}`, value, check.value, scale);
      if (check.x !== undefined) expect(`x of ${check.peak} ${check.quantity}`, x, check.x, L);
    }
  }
  return out;
}

export function mismatches(member: Member, solution: Solution, checks: Check[]): string[] {
  return checkRows(member, solution, checks)
    .filter((row) => !row.pass)
    .map((row) => (Number.isNaN(row.computed) ? `${row.label}: missing` : `${row.label}: got ${row.computed}, expected ${row.expected}`));
}
