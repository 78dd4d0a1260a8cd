import { invalid } from "./errors";
import type { Member } from "./model";
import { rotationalSpring } from "./layout";
import { nodePositions } from "./positions";

/**
 * Rigid-body motions still free at the current point of a left-to-right sweep: `count` (0, 1
 * or 2) parameters, each moving the current rigid segment by `a + b * u` (u = x / length).
 * At most two are ever free: a hinge is passed only with at most one left, and adds one. Held
 * in scalars (one sweep at a time; no allocation).
 */
let count = 0;
let a0 = 0;
let a1 = 0;
let b0 = 0;
let b1 = 0;

const ZERO = 1e-9;

/** Imposes r0 p0 + r1 p1 = 0 on the free parameters: removes one (the largest entry's, the first on a tie) when the row is not zero. */
function constrain(r0: number, r1: number): void {
  let pivot = -1;
  let largest = ZERO;
  if (count > 0 && Math.abs(r0) > largest) {
    largest = Math.abs(r0);
    pivot = 0;
  }
  if (count > 1 && Math.abs(r1) > largest) pivot = 1;
  if (pivot < 0) return;
  if (count === 2) {
    if (pivot === 0) {
      const ratio = r1 / r0;
      a0 = a1 - ratio * a0;
      b0 = b1 - ratio * b0;
    } else {
      const ratio = r0 / r1;
      a0 = a0 - ratio * a1;
      b0 = b0 - ratio * b1;
    }
  }
  count--;
}

/** The member's deflection at u must vanish (a pin, a spring or a fixed end). */
function constrainDeflection(u: number): void {
  constrain(a0 + b0 * u, a1 + b1 * u);
}

/** The member's slope must vanish (a fixed end or a rotational spring). */
function constrainSlope(): void {
  constrain(b0, b1);
}

function fail(from: number, to: number): never {
  throw invalid(
    `unstable: the part of the member from x = ${+from.toPrecision(12)} to x = ${+to.toPrecision(12)} can move freely (a mechanism); add a support or a fixed end, or remove a hinge`,
  );
}

/**
 * Checks from the supports and hinges alone (never from the loads) that the member cannot
 * move as a mechanism. The member is a chain of rigid segments joined at hinges; a sweep from
 * the left keeps the motions not yet prevented, and a motion that no later restraint can
 * reach (one that leaves a hinge, or the member end, unmoved) is a mechanism.
 * Springs count as restraints; a rotational spring restrains only the slope. Throws a #VALUE! SpanError naming the part that can move.
 */
export function checkStability(member: Member, nodeX: readonly number[] = nodePositions(member.spans)): void {
  const { spans, supports } = member;
  const length = nodeX[spans.length];
  count = 2;
  a0 = 1;
  a1 = 0;
  b0 = 0;
  b1 = 1;
  let lastFixedX = 0;
  let x = 0;
  for (let node = 0; node < supports.length; node++) {
    const support = supports[node];
    const u = x / length;
    if (count === 0) lastFixedX = x;
    if (support.kind === "pin" || support.kind === "spring" || support.kind === "free") {
      if (support.kind !== "free") constrainDeflection(u);
      // A rotational spring restrains the slope of the segment, as a fixed end does, but no deflection.
      if (rotationalSpring(support) > 0) constrainSlope();
    } else if (support.kind === "fixed") {
      constrainDeflection(u);
      constrainSlope();
    } else if (support.kind === "hinge") {
      // The segment on the right moves with the left one's deflection at the hinge, plus a new rotation about it.
      const row = a0 + b0 * u;
      if (count > 1 || (count === 1 && !(Math.abs(row) > ZERO))) fail(lastFixedX, x);
      if (count === 1) {
        a0 = row;
        b0 = 0;
        a1 = -u;
        b1 = 1;
        count = 2;
      } else {
        a0 = -u;
        b0 = 1;
        count = 1;
      }
    }
    if (count === 0) lastFixedX = x;
    if (node < spans.length) x = nodeX[node + 1];
  }
  if (count > 0) fail(lastFixedX, length);
}
