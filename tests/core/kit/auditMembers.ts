/**
 * Members for the exact audit (exact.test.ts): random, from a fixed seed, and built to find
 * what well-placed members hide. Spans are decimals as typed (0.01 to 10 in hundredths), or
 * spread over decades within one member (ill-conditioned); EI per span spreads over up to six
 * decades; springs range from 1e-9 to 1e12 of the adjacent span's EI/L^3; hinges sit beside
 * short links. Loads sit exactly at every node and at both member ends (as the engineer types
 * them: the decimal the node prints as, which can differ from the sum of the spans by a unit
 * of rounding), on a grid of sixteenths, or anywhere. Stability is decided by the exact force
 * method (ExactMechanism), never by the product.
 */
import fc from "fast-check";
import type { Load, Member } from "../../../src/core";
import { ExactMechanism, exactForceMethodSolve } from "./exactForceMethod";
import { beam, couple, linear, point, udl, type SupportWord } from "./members";

/** The seed of the exact audit. */
export const AUDIT_SEED = 20261201;

/** The position of a node as the engineer types it: 12 significant digits of the running sum. */
export function typed(x: number): number {
  return Number(x.toPrecision(12));
}

export function nodesOfSpans(spans: number[]): number[] {
  const xs = [0];
  for (const s of spans) xs.push(xs[xs.length - 1] + s);
  return xs;
}

export function isExactlyStable(m: Member): boolean {
  try {
    exactForceMethodSolve({ ...m, loads: [] });
    return true;
  } catch (error) {
    if (error instanceof ExactMechanism) return false;
    throw error;
  }
}

const decimalSpan = fc.integer({ min: 1, max: 1000 }).map((k) => k / 100);
const decadeSpan = fc.tuple(fc.integer({ min: -3, max: 2 }), fc.integer({ min: 10, max: 99 })).map(([p, m]) => typed((m / 10) * 10 ** p));

interface Shape {
  spans: number[];
  supports: SupportWord[];
  EI: number[];
}

function shape(kind: "decimal" | "ill"): fc.Arbitrary<Shape> {
  return fc.integer({ min: 1, max: 4 }).chain((n) =>
    fc
      .record({
        spans: fc.array(kind === "decimal" ? decimalSpan : fc.oneof(decimalSpan, decadeSpan), { minLength: n, maxLength: n }),
        words: fc.array(fc.constantFrom("pin", "pin", "fixed", "free", "hinge", "spring"), { minLength: n + 1, maxLength: n + 1 }),
        eiDecade: fc.array(fc.integer({ min: 0, max: kind === "decimal" ? 1 : 6 }), { minLength: n, maxLength: n }),
        eiDigits: fc.array(fc.integer({ min: 1, max: 99 }), { minLength: n, maxLength: n }),
        springDecade: fc.array(fc.integer({ min: kind === "decimal" ? -2 : -9, max: kind === "decimal" ? 3 : 12 }), { minLength: n + 1, maxLength: n + 1 }),
      })
      .map(({ spans, words, eiDecade, eiDigits, springDecade }) => {
        const EI = eiDecade.map((d, i) => eiDigits[i] * 1000 * 10 ** d);
        const supports: SupportWord[] = words.map((w, i) => {
          if (w === "hinge" && (i === 0 || i === spans.length)) return "pin";
          if (w !== "spring") return w as SupportWord;
          const near = Math.max(i > 0 ? EI[i - 1] / spans[i - 1] ** 3 : 0, i < spans.length ? EI[i] / spans[i] ** 3 : 0);
          return Number((near * 10 ** springDecade[i]).toPrecision(3));
        });
        return { spans, supports, EI };
      }),
  ).filter((s) => isExactlyStable(beam(s.spans, s.supports, [], s.EI)));
}

/** A position: a node as typed, a member end, on the sixteenths grid, or anywhere. */
function position(nodeX: number[]): fc.Arbitrary<number> {
  const L = nodeX[nodeX.length - 1];
  return fc.oneof(
    fc.constantFrom(...nodeX.map(typed)),
    fc.constantFrom(0, typed(L)),
    fc.integer({ min: 0, max: 16 }).map((k) => typed((L * k) / 16)),
    fc.integer({ min: 1, max: 9999 }).map((k) => (L * k) / 10000),
  );
}

function loads(s: Shape): fc.Arbitrary<Load[]> {
  const nodeX = nodesOfSpans(s.spans);
  const L = nodeX[nodeX.length - 1];
  const hinges = nodeX.filter((_, i) => s.supports[i] === "hinge").map(typed);
  const at = position(nodeX);
  const magnitude = fc.integer({ min: -160, max: 320 }).filter((v) => v !== 0).map((v) => v / 8);
  const range = fc
    .tuple(at, at)
    .map(([a, b]) => [Math.min(a, b), Math.max(a, b)])
    .filter(([a, b]) => b - a >= 1e-3 * L);
  const load = fc.oneof(
    fc.tuple(magnitude, at).map(([p, x]) => point(p, x)),
    fc.tuple(magnitude, at.filter((x) => !hinges.some((h) => Math.abs(h - x) <= 1e-9 * L))).map(([c, x]) => couple(c, x)),
    fc.tuple(magnitude, range).map(([q, [a, b]]) => udl(q, a, b)),
    fc.tuple(magnitude, magnitude, range).map(([q0, q1, [a, b]]) => linear(q0, q1, a, b)),
  );
  return fc.array(load, { minLength: 1, maxLength: 5 });
}

/** Stable members with decimal spans (kind "decimal") or spread over decades, EI and springs (kind "ill"). */
export function auditMember(kind: "decimal" | "ill"): fc.Arbitrary<Member> {
  return shape(kind).chain((s) => loads(s).map((l) => beam(s.spans, s.supports, l, s.EI)));
}
