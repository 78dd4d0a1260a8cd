import { invalid } from "./errors";
import type { Member } from "./model";
import { rotationalSpring } from "./layout";
import { nodePositions } from "./positions";

/**
 * Rigid-body motions still free at the current point of a left-to-right sweep. Each free
 * parameter moves the current rigid segment by `a + b * u` (u = x / length).
 */
interface Freedom {
  a: number[];
  b: number[];
}

const ZERO = 1e-9;

/** Imposes a(u)·p = 0 (or the slope b·p = 0): removes one parameter when the row is not zero. */
function constrain(free: Freedom, row: number[]): void {
  let pivot = -1;
  let largest = ZERO;
  row.forEach((value, j) => {
    if (Math.abs(value) > largest) {
      largest = Math.abs(value);
      pivot = j;
    }
  });
  if (pivot < 0) return;
  const a: number[] = [];
  const b: number[] = [];
  row.forEach((value, j) => {
    if (j === pivot) return;
    const ratio = value / row[pivot];
    a.push(free.a[j] - ratio * free.a[pivot]);
    b.push(free.b[j] - ratio * free.b[pivot]);
  });
  free.a = a;
  free.b = b;
}

function displacementRow(free: Freedom, u: number): number[] {
  return free.a.map((a, j) => a + free.b[j] * u);
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
export function checkStability(member: Member): void {
  const { spans, supports } = member;
  const nodeX = nodePositions(spans);
  const length = nodeX[spans.length];
  let free: Freedom = { a: [1, 0], b: [0, 1] };
  let lastFixedX = 0;
  let x = 0;
  for (let node = 0; node < supports.length; node++) {
    const support = supports[node];
    const u = x / length;
    if (free.a.length === 0) lastFixedX = x;
    if (support.kind === "pin" || support.kind === "spring" || support.kind === "free") {
      if (support.kind !== "free") constrain(free, displacementRow(free, u));
      // A rotational spring restrains the slope of the segment, as a fixed end does, but no deflection.
      if (rotationalSpring(support) > 0) constrain(free, free.b.slice());
    } else if (support.kind === "fixed") {
      constrain(free, displacementRow(free, u));
      constrain(free, free.b.slice());
    } else if (support.kind === "hinge") {
      const row = displacementRow(free, u);
      const moving = row.filter((value) => Math.abs(value) > ZERO).length;
      if (free.a.length > 1 || (free.a.length === 1 && moving === 0)) fail(lastFixedX, x);
      free = { a: [...row, -u], b: [...row.map(() => 0), 1] };
    }
    if (free.a.length === 0) lastFixedX = x;
    if (node < spans.length) x = nodeX[node + 1];
  }
  if (free.a.length > 0) fail(lastFixedX, length);
}
