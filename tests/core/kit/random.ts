/**
 * Random stable members: one generator for the whole suite, written as fast-check arbitraries.
 * Property tests use them directly, always with the fixed seed of `runs` so CI repeats the same
 * members; tests that name each member by a seed use `randomMember(seed)`, a sample of the
 * same arbitrary.
 *
 * Load positions are drawn three ways: exactly on a node, on a grid of sixteenths of the member
 * (so loads sit on each other and at the ends, where the jump conventions matter), or anywhere.
 * Whether a layout can move as a mechanism is decided by the independent force-method reference
 * (forceMethod.ts), never by the core's own stability check.
 */
import fc from "fast-check";
import type { Load, Member } from "../../../src/core";
import { forceMethodSolve, ReferenceMechanism } from "./forceMethod";
import { beam, couple, linear, point, udl, type SupportWord } from "./members";

/** The seed of every property test in tests/core. */
export const SEED = 20260501;

/** fast-check parameters: `numRuns` runs from the fixed seed. */
export const runs = (numRuns: number): { numRuns: number; seed: number } => ({ numRuns, seed: SEED });

export interface MemberOptions {
  /** Spans per member, 1 to maxSpans (default 4). */
  maxSpans?: number;
  /** Loads per member, 1 to maxLoads (default 5). */
  maxLoads?: number;
  /** With EI per span (default true); without, no springs either, since a spring needs EI. */
  stiffness?: boolean;
  springs?: boolean;
  hinges?: boolean;
}

export interface Shape {
  spans: number[];
  supports: SupportWord[];
  EI: number[] | null;
}

/** True when the force-method reference finds the layout stable (its system is not singular). */
export function isStable(m: Member): boolean {
  try {
    forceMethodSolve({ ...m, loads: [] });
    return true;
  } catch (error) {
    if (error instanceof ReferenceMechanism) return false;
    throw error;
  }
}

function supportWord(springs: boolean, hinges: boolean): fc.Arbitrary<SupportWord> {
  const words: SupportWord[] = ["pin", "pin", "fixed", "free", ...(hinges ? (["hinge"] as const) : [])];
  const spring = fc.integer({ min: 1, max: 400 }).map((k) => k * 25);
  return springs ? fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...words) }, { weight: 1, arbitrary: spring }) : fc.constantFrom(...words);
}

/** Spans (0.5 to 10 in quarters), supports and per-span EI of a member that cannot move as a mechanism. */
export function shapeArbitrary(options: MemberOptions = {}): fc.Arbitrary<Shape> {
  const { maxSpans = 4, stiffness = true, springs = true, hinges = true } = options;
  return fc
    .integer({ min: 1, max: maxSpans })
    .chain((n) =>
      fc.record({
        spans: fc.array(fc.integer({ min: 2, max: 40 }).map((v) => v / 4), { minLength: n, maxLength: n }),
        supports: fc.array(supportWord(springs && stiffness, hinges), { minLength: n + 1, maxLength: n + 1 }),
        EI: stiffness ? fc.array(fc.integer({ min: 1, max: 250 }).map((v) => v * 200), { minLength: n, maxLength: n }) : fc.constant(null),
      }),
    )
    .map((shape) => ({
      ...shape,
      supports: shape.supports.map((s, i) => (s === "hinge" && (i === 0 || i === shape.spans.length) ? "pin" : s)),
    }))
    .filter((shape) => isStable(beam(shape.spans, shape.supports, [], shape.EI)));
}

function nodesOfShape(shape: Shape): number[] {
  const xs = [0];
  for (const s of shape.spans) xs.push(xs[xs.length - 1] + s);
  return xs;
}

/** A position on [0, L]: exactly on a node, on the sixteenths grid, or anywhere (off the grid). */
function position(nodeX: number[]): fc.Arbitrary<number> {
  const L = nodeX[nodeX.length - 1];
  return fc.oneof(
    fc.constantFrom(...nodeX),
    fc.integer({ min: 0, max: 16 }).map((k) => (k === 16 ? L : (L * k) / 16)),
    fc.integer({ min: 1, max: 9999 }).map((k) => (L * k) / 10000),
  );
}

/** Loads of every type; couples never sit exactly on a hinge (validation rejects that, see validate.test.ts). */
function loadsArbitrary(shape: Shape, maxLoads: number): fc.Arbitrary<Load[]> {
  const nodeX = nodesOfShape(shape);
  const L = nodeX[nodeX.length - 1];
  const hingeX = nodeX.filter((_, i) => shape.supports[i] === "hinge");
  const at = position(nodeX);
  const magnitude = fc.integer({ min: -160, max: 320 }).filter((v) => v !== 0).map((v) => v / 8);
  const range = fc
    .tuple(at, at)
    .map(([a, b]) => [Math.min(a, b), Math.max(a, b)])
    .filter(([a, b]) => b - a >= 1e-3 * L);
  const load = fc.oneof(
    fc.tuple(magnitude, at).map(([p, x]) => point(p, x)),
    fc.tuple(magnitude, at.filter((x) => !hingeX.includes(x))).map(([c, x]) => couple(c, x)),
    fc.tuple(magnitude, range).map(([q, [a, b]]) => udl(q, a, b)),
    fc.tuple(magnitude, magnitude, range).map(([q0, q1, [a, b]]) => linear(q0, q1, a, b)),
  );
  return fc.array(load, { minLength: 1, maxLength: maxLoads });
}

/** A stable member with 1 to maxLoads loads. */
export function memberArbitrary(options: MemberOptions = {}): fc.Arbitrary<Member> {
  return shapeArbitrary(options).chain((shape) =>
    loadsArbitrary(shape, options.maxLoads ?? 5).map((loads) => beam(shape.spans, shape.supports, loads, shape.EI)),
  );
}

/** The suite's usual random member: up to 4 spans, EI, springs and hinges, 1 to 5 loads. */
export const loadedMember = memberArbitrary();

/** The suite's usual random shape (with EI). */
export const stableShape = shapeArbitrary();

/** Interior positions off the sixteenths grid, as fractions of the length. */
export const offGridFractions = fc.array(
  fc.integer({ min: 1, max: 998 }).map((k) => (k + 0.37) / 1000),
  { minLength: 3, maxLength: 8 },
);

/** One member of `memberArbitrary(options)`, the same for the same seed. */
export function randomMember(seed: number, options: MemberOptions = {}): Member {
  return fc.sample(memberArbitrary(options), { seed, numRuns: 1 })[0];
}
