import { invalid } from "./errors";
import { valueAt } from "./evaluate";
import type { Load, Member, Solution } from "./model";
import { solve } from "./solve";
import { checkedPosition, nodePositions } from "./positions";
import { checkCount, checkWork, LIMITS } from "./limits";

/** The limits of an influence line of `count` positions (the sheet checks the whole range before asking one by one). */
export function checkInfluence(member: Member, count: number): void {
  checkCount(count, LIMITS.positions, "positions", "positions");
  checkWork("INFLUENCE", { spans: member.spans.length, loads: 0, cases: 0, pattern: "none", combinations: 0, positions: count, axles: 0 });
}

/** What an influence line or a moving load measures. */
export type Effect =
  | { kind: "reaction"; node: number }
  | { kind: "moment-reaction"; node: number }
  | { kind: "shear"; x: number }
  | { kind: "moment"; x: number }
  | { kind: "deflection"; x: number };

function unitLoad(x: number): Load {
  return { kind: "point", magnitude: 1, xStart: x, xEnd: x, magnitudeEnd: 0, loadCase: "", row: 1 };
}

/** Checks an effect against a member; returns it with its x on the member (a node's own x at a node). */
export function checkEffect(member: Member, effect: Effect): Effect {
  if (effect.kind === "reaction" || effect.kind === "moment-reaction") {
    if (!Number.isInteger(effect.node) || effect.node < 1 || effect.node > member.spans.length + 1) {
      throw invalid(`effect: node ${effect.node} does not exist; nodes are numbered 1 to ${member.spans.length + 1}`);
    }
    return effect;
  }
  const x = checkedPosition(nodePositions(member.spans), effect.x, "effect: x");
  if (effect.kind === "deflection" && member.stiffness === null) throw invalid("effect: deflection needs EI");
  return { ...effect, x };
}

/** The value of an effect in a solved member. */
export function measure(solution: Solution, effect: Effect): number {
  switch (effect.kind) {
    case "reaction":
      return solution.reactions[effect.node - 1].force;
    case "moment-reaction":
      return solution.reactions[effect.node - 1].moment;
    default:
      return valueAt(solution, effect.kind, effect.x);
  }
}

/**
 * Influence line ordinates: the effect caused by a unit downward load placed at each
 * position in turn, each an exact solve of the member (supports, springs, hinges and EI
 * included). For shear at x, a unit load exactly at x counts as just left of the section
 * (the value just right of x is measured), so the ordinate there is the lower one.
 */
export function influenceLine(member: Member, effect: Effect, positions: number[]): number[] {
  const checked = checkEffect(member, effect);
  checkInfluence(member, positions.length);
  const nodeX = nodePositions(member.spans);
  return positions.map((p) => measure(solve({ ...member, loads: [unitLoad(checkedPosition(nodeX, p, "unit load position", " "))] }), checked));
}
