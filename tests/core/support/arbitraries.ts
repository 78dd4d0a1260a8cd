/**
 * fast-check generators of stable members with loads. Positions are drawn on a grid of
 * sixteenths of the member, so loads often sit exactly on nodes, on each other, and at the
 * member ends, where the jump conventions matter.
 */
import fc from "fast-check";
import type { Load, Member } from "../../../src/core/model";
import { couple, linear, member, point, udl, type SupportWord } from "./build";
import { ReferenceMechanism, referenceSolve } from "./reference";

const supportWord = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<SupportWord>("pin", "fixed", "free", "hinge") },
  { weight: 1, arbitrary: fc.integer({ min: 1, max: 400 }).map((k) => k * 25) },
);

export interface Shape {
  spans: number[];
  supports: SupportWord[];
  EI: number[];
}

export function isStable(m: Member): boolean {
  try {
    referenceSolve({ ...m, loads: [] });
    return true;
  } catch (error) {
    if (error instanceof ReferenceMechanism) return false;
    throw error;
  }
}

/** Spans, supports and per-span EI of a member that cannot move as a mechanism. */
export const stableShape: fc.Arbitrary<Shape> = fc
  .integer({ min: 1, max: 4 })
  .chain((n) =>
    fc.record({
      spans: fc.array(fc.integer({ min: 2, max: 40 }).map((v) => v / 4), { minLength: n, maxLength: n }),
      supports: fc.array(supportWord, { minLength: n + 1, maxLength: n + 1 }),
      EI: fc.array(fc.integer({ min: 1, max: 50 }).map((v) => v * 200), { minLength: n, maxLength: n }),
    }),
  )
  .map((shape) => ({
    ...shape,
    supports: shape.supports.map((s, i) => (s === "hinge" && (i === 0 || i === shape.supports.length - 1) ? "pin" : s)),
  }))
  .filter((shape) => isStable(member(shape)));

const magnitude = fc.integer({ min: -20, max: 20 }).filter((v) => v !== 0);
const sixteenth = fc.integer({ min: 0, max: 16 });

function loadArbitrary(length: number): fc.Arbitrary<Load> {
  const at = sixteenth.map((k) => (k === 16 ? length : (length * k) / 16));
  const range = fc
    .tuple(sixteenth, sixteenth)
    .filter(([i, j]) => i !== j)
    .map(([i, j]) => [Math.min(i, j), Math.max(i, j)].map((k) => (k === 16 ? length : (length * k) / 16)));
  return fc.oneof(
    fc.tuple(magnitude, at).map(([p, x]) => point(p, x)),
    fc.tuple(magnitude, at).map(([c, x]) => couple(c, x)),
    fc.tuple(magnitude, range).map(([q, [a, b]]) => udl(q, a, b)),
    fc.tuple(magnitude, magnitude, range).map(([q0, q1, [a, b]]) => linear(q0, a, q1, b)),
  );
}

function hingePositions(shape: Shape): number[] {
  const xs: number[] = [];
  let x = 0;
  shape.supports.forEach((s, i) => {
    if (s === "hinge") xs.push(x);
    if (i < shape.spans.length) x += shape.spans[i];
  });
  return xs;
}

/**
 * A stable member with EI and 1 to 5 loads. No couple sits exactly on a hinge: that is
 * rejected by validation (it has no side to act on) and tested in validate.test.ts.
 */
export const loadedMember: fc.Arbitrary<Member> = stableShape.chain((shape) => {
  const length = shape.spans.reduce((s, v) => s + v, 0);
  const hinges = hingePositions(shape);
  const allowed = (l: Load) => l.kind !== "moment" || !hinges.includes(l.xStart);
  return fc.array(loadArbitrary(length).filter(allowed), { minLength: 1, maxLength: 5 }).map((loads) => member({ ...shape, loads }));
});

/** Interior positions off the sixteenths grid, as fractions of the length. */
export const offGridFractions = fc.array(
  fc.integer({ min: 1, max: 998 }).map((k) => (k + 0.37) / 1000),
  { minLength: 3, maxLength: 8 },
);
