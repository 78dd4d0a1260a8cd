/**
 * Seeded random members for the cross-checks and properties. Supports are drawn at random and
 * redrawn until the layout passes the core's stability check (the stability tests check that
 * check independently against the rank of a stiffness matrix).
 */
import { checkStability, type Load, type Member } from "../../../src/core";
import { beam, couple, linear, nodesOf, point, udl, type SupportWord } from "./members";

/** mulberry32: a small, well-known 32-bit seeded generator. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type Rng = () => number;
export const between = (r: Rng, lo: number, hi: number): number => lo + (hi - lo) * r();
export const pick = <T>(r: Rng, items: readonly T[]): T => items[Math.floor(r() * items.length)];

export function isStable(m: Member): boolean {
  try {
    checkStability(m);
    return true;
  } catch {
    return false;
  }
}

export function randomSupports(r: Rng, spans: number, withSprings: boolean): SupportWord[] {
  const words: SupportWord[] = [];
  for (let i = 0; i <= spans; i++) {
    const interior = i > 0 && i < spans;
    const options: SupportWord[] = ["pin", "pin", "pin", "fixed", "free"];
    if (interior) options.push("hinge", "free");
    if (withSprings) options.push(Math.round(between(r, 50, 5000)));
    words.push(pick(r, options));
  }
  return words;
}

/** Random loads on [0, L]; some sit exactly on nodes. Couples avoid hinge nodes (ambiguous side). */
export function randomLoads(r: Rng, nodeX: number[], count: number, avoid: number[] = []): Load[] {
  const L = nodeX[nodeX.length - 1];
  const loads: Load[] = [];
  const at = (): number => (r() < 0.15 ? pick(r, nodeX) : between(r, 0, L));
  while (loads.length < count) {
    const kind = pick(r, ["point", "moment", "udl", "linear"] as const);
    const magnitude = Math.round(between(r, -20, 40) * 8) / 8;
    if (kind === "point") loads.push(point(magnitude, at()));
    else if (kind === "moment") {
      const x = at();
      if (!avoid.includes(x)) loads.push(couple(magnitude, x));
    } else {
      let a = at();
      let b = at();
      if (a > b) [a, b] = [b, a];
      if (b - a < 1e-3 * L) continue;
      if (kind === "udl") loads.push(udl(magnitude, a, b));
      else loads.push(linear(magnitude, Math.round(between(r, -20, 40) * 8) / 8, a, b));
    }
  }
  return loads;
}

export interface RandomOptions {
  maxSpans?: number;
  maxLoads?: number;
  stiffness?: boolean;
  springs?: boolean;
  hinges?: boolean;
}

/** A stable random member. */
export function randomMember(seed: number, options: RandomOptions = {}): Member {
  const r = prng(seed);
  const { maxSpans = 5, maxLoads = 5, stiffness = true, springs = true, hinges = true } = options;
  const n = 1 + Math.floor(r() * maxSpans);
  const spans = Array.from({ length: n }, () => Math.round(between(r, 0.5, 10) * 4) / 4);
  const EI = stiffness ? spans.map(() => Math.round(between(r, 500, 50000))) : null;
  for (let attempt = 0; attempt < 200; attempt++) {
    let words = randomSupports(r, n, springs && stiffness);
    if (!hinges) words = words.map((w) => (w === "hinge" ? "free" : w));
    const trial = beam(spans, words, [], EI);
    if (!isStable(trial)) continue;
    const nodeX = nodesOf(trial);
    const hingeX = nodeX.filter((_, i) => words[i] === "hinge");
    return beam(spans, words, randomLoads(r, nodeX, 1 + Math.floor(r() * maxLoads), hingeX), EI);
  }
  const nodeX = nodesOf(beam(spans, [], [], EI));
  return beam(spans, spans.concat([0]).map(() => "pin" as const), randomLoads(r, nodeX, 2), EI);
}
