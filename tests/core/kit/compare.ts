/**
 * Compares solver results with expected values (handbook formulas and other outside values) at
 * the handbook tolerance. Collects every mismatch so a failing case shows all of them.
 */
import { extremes, tolerance, valueAt, type Member, type Quantity, type Solution } from "../../../src/core";
import { isClose } from "./close";
import { lengthOf, scalesOf } from "./members";

export type Check =
  | { reaction: number; force?: number; moment?: number }
  | { quantity: Quantity; at: number; value: number }
  | { peak: "max" | "min"; quantity: Quantity; value: number; x?: number };

const scaleKey = { shear: "force", moment: "moment", slope: "slope", deflection: "deflection" } as const;

/** Relative agreement; an expected zero is compared against the member's own scale. */
export function agrees(actual: number, expected: number, scale: number, rel = tolerance.HANDBOOK_TOLERANCE): boolean {
  return expected === 0 ? isClose(actual, 0, rel, scale) : isClose(actual, expected, rel);
}

export function mismatches(member: Member, solution: Solution, checks: Check[]): string[] {
  const scales = scalesOf(member);
  const L = lengthOf(member);
  const out: string[] = [];
  const expect = (label: string, actual: number, expected: number, scale: number): void => {
    if (!agrees(actual, expected, scale)) out.push(`${label}: got ${actual}, expected ${expected}`);
  };
  for (const check of checks) {
    if ("reaction" in check) {
      const r = solution.reactions[check.reaction];
      if (!r) {
        out.push(`reaction ${check.reaction}: missing`);
        continue;
      }
      if (check.force !== undefined) expect(`reaction ${check.reaction} force`, r.force, check.force, scales.force);
      if (check.moment !== undefined) expect(`reaction ${check.reaction} moment`, r.moment, check.moment, scales.moment);
    } else if ("at" in check) {
      const scale = scales[scaleKey[check.quantity]];
      expect(`${check.quantity} at x = ${check.at}`, valueAt(solution, check.quantity, check.at), check.value, scale);
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
