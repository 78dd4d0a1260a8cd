/**
 * Reactions by load case: the member solved once per case label, each case unfactored, in
 * the order the loads first use the labels. By superposition, any combination's reactions
 * are the factored sum of these (a checked invariant in the tests).
 */
import { invalid } from "./errors";
import { checkWork } from "./limits";
import type { Load, Member, Reaction } from "./model";
import { solve } from "./solve";

/** Most case labels one call reports (one solve and one result column each). */
export const MAX_CASES = 50;

export interface CaseReactions {
  /** Case labels in the order the loads first use them ("" for loads without a label). */
  cases: string[];
  /** reactions[c][node]: the reactions of case c alone, at factor 1. */
  reactions: Reaction[][];
}

/** Case labels in first-use order. */
export function caseOrder(loads: Load[]): string[] {
  const seen = new Set<string>();
  const order: string[] = [];
  for (const load of loads) {
    if (!seen.has(load.loadCase)) {
      seen.add(load.loadCase);
      order.push(load.loadCase);
    }
  }
  return order;
}

/**
 * Each case's reactions: the member with that case's loads only, at factor 1. The call's size
 * (limits.ts) counts these solves, and the combination's when `withCombination` (the caller
 * solves it besides), before any of them.
 */
export function caseReactions(member: Member, withCombination = false): CaseReactions {
  const cases = caseOrder(member.loads);
  if (cases.length === 0) throw invalid("loads: the member carries no load, so there is no load case to report");
  if (cases.length > MAX_CASES) {
    throw invalid(`loads: ${cases.length} different case labels; at most ${MAX_CASES} can be reported side by side (combine cases that act together)`);
  }
  checkWork("CASEREACTIONS", { spans: member.spans.length, loads: member.loads.length, cases: cases.length, pattern: "none", combinations: withCombination ? 1 : 0, positions: 0, axles: 0 });
  const reactions = cases.map((label) => solve({ ...member, loads: member.loads.filter((load) => load.loadCase === label) }).reactions);
  return { cases, reactions };
}
