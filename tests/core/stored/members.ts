/**
 * The fixed members of the stored-results guard (tests/core/stored.test.ts) and what is read
 * from each solution. Shared by the generator (generate.ts, run once to write results.json from
 * the solver as it was then) and the test, which must reproduce those results.
 *
 * Members are random (a fixed-seed generator, so the same list every run) but chosen to be
 * well conditioned, so that the guard judges a restructuring of the solver and not its
 * handling of hard cases: springs from 1e-3 to 1e3 of EI/L^3 of the neighbouring span, EI
 * ratios at most 10 along a member, no span shorter than 1, hinges only between spans of at
 * least 2, and every position (spans, load ends, load points at nodes) an exact binary
 * fraction (multiples of 0.25), so the positions themselves carry no rounding. A member is
 * kept only when the solver's own rounding on it is small: its reactions agree with those of its
 * mirror image (solved in the opposite elimination order) to 1e-13 of their scale, ten times
 * inside the guard's 1e-12 (soft springs beside free ends fail this and are left out).
 */
import { extremes, solve, valueAt, type Load, type Member, type Quantity, type Solution, type Support } from "../../../src/core";

export const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

/** The seeded generator (mulberry32) the verification cases use too, so the list never changes. */
export { seededRandom as generator } from "../../../src/verify/seededRandom";

const SPANS = [1, 1.5, 2, 2.5, 3, 3.75, 4, 5, 6, 6.25, 7.5, 8];

export function randomMember(random: () => number): Member {
  const pick = <T>(list: T[]): T => list[Math.floor(random() * list.length)];
  const count = 1 + Math.floor(random() * 5);
  const spans = Array.from({ length: count }, () => pick(SPANS));
  const baseEI = pick([1, 100, 2.1e4, 5e5]);
  const perSpan = random() < 0.4;
  const stiffness = perSpan ? spans.map(() => baseEI * pick([1, 2, 4, 10])) : [baseEI];
  const eiOf = (e: number): number => stiffness[perSpan ? e : 0];
  const spring = (e: number): Support => {
    const l = spans[e];
    return { kind: "spring", stiffness: (eiOf(e) / (l * l * l)) * pick([1e-3, 0.01, 0.5, 1, 10, 1e3]) };
  };
  const supports: Support[] = [];
  for (let n = 0; n <= count; n++) {
    const end = n === 0 || n === count;
    const neighbour = n === 0 ? 0 : n - 1;
    const r = random();
    if (end) supports.push(r < 0.45 ? { kind: "pin" } : r < 0.75 ? { kind: "fixed" } : r < 0.9 ? { kind: "free" } : spring(neighbour));
    else {
      const hingeOk = spans[n - 1] >= 2 && spans[n] >= 2;
      supports.push(r < 0.6 ? { kind: "pin" } : r < 0.75 ? spring(neighbour) : r < 0.85 && hingeOk ? { kind: "hinge" } : r < 0.9 ? { kind: "fixed" } : { kind: "pin" });
    }
  }
  const nodeX = [0];
  for (const l of spans) nodeX.push(nodeX[nodeX.length - 1] + l);
  const length = nodeX[count];
  // Positions on a quarter grid: exact in binary, and sums of them too.
  const position = (): number => Math.floor(random() * (4 * length + 1)) / 4;
  const magnitude = (): number => pick([-1, 1, 1, 1]) * pick([0.5, 1, 2.5, 10, 12.5, 100]);
  const loads: Load[] = [];
  const loadCount = 1 + Math.floor(random() * 4);
  for (let i = 0; i < loadCount; i++) {
    const r = random();
    const row = i + 1;
    if (r < 0.35) {
      const x = random() < 0.2 ? pick(nodeX) : position();
      const m = magnitude();
      loads.push({ kind: "point", magnitude: m, xStart: x, xEnd: x, magnitudeEnd: m, loadCase: "D", row });
    } else if (r < 0.5) {
      const x = position();
      const m = magnitude();
      loads.push({ kind: "moment", magnitude: m, xStart: x, xEnd: x, magnitudeEnd: m, loadCase: "D", row });
    } else {
      let a = random() < 0.4 ? 0 : position();
      let b = random() < 0.4 ? length : position();
      if (a > b) [a, b] = [b, a];
      if (b - a < 0.5) [a, b] = [0, length];
      const m = magnitude();
      const linear = r >= 0.8;
      loads.push({ kind: linear ? "linear" : "udl", magnitude: m, xStart: a, xEnd: b, magnitudeEnd: linear ? magnitude() : m, loadCase: "D", row });
    }
  }
  return { spans, supports, stiffness, loads };
}

/**
 * Positions read from a solution: every node and load point, each from both sides (the side
 * just left is read a millionth of the length before it), plus the middle of every span.
 * Returned as [x, side] with side -1 for just left, +1 for the value at x (just right).
 */
export function stations(member: Member): [number, number][] {
  const nodeX = [0];
  for (const l of member.spans) nodeX.push(nodeX[nodeX.length - 1] + l);
  const length = nodeX[nodeX.length - 1];
  const points = new Set<number>(nodeX);
  for (const load of member.loads) {
    points.add(load.xStart);
    points.add(load.xEnd);
  }
  const list: [number, number][] = [];
  for (const x of [...points].sort((a, b) => a - b)) {
    if (x > 0) list.push([x, -1]);
    list.push([x, 1]);
  }
  for (let e = 0; e < member.spans.length; e++) list.push([(nodeX[e] + nodeX[e + 1]) / 2, 1]);
  void length;
  return list;
}

/** The x read for a station. */
export function stationX(member: Member, [x, side]: [number, number]): number {
  const length = member.spans.reduce((a, b) => a + b, 0);
  return side < 0 ? x - 1e-6 * length : x;
}

/**
 * Every number read from a solution, in a fixed order: reactions (force, moment per node),
 * then per quantity its value at each station, then per quantity its extremes (max, xMax,
 * min, xMin). Slope and deflection are skipped when the member has no EI (never here).
 */
export function readings(member: Member, solution: Solution): number[] {
  const out: number[] = [];
  for (const r of solution.reactions) out.push(r.force, r.moment);
  const list = stations(member);
  for (const q of QUANTITIES) for (const s of list) out.push(valueAt(solution, q, stationX(member, s)));
  for (const q of QUANTITIES) {
    const e = extremes(solution, q);
    out.push(e.max, e.xMax, e.min, e.xMin);
  }
  return out;
}

/** Encodes numbers exactly and compactly: the bytes of a Float64Array, base64. */
export function encode(values: number[]): string {
  return Buffer.from(new Float64Array(values).buffer).toString("base64");
}

export function decode(text: string): number[] {
  const bytes = Buffer.from(text, "base64");
  const copy = new Uint8Array(bytes.length);
  copy.set(bytes);
  return Array.from(new Float64Array(copy.buffer));
}

/** Compact JSON form of a member (supports as letters, loads as tuples) and back. */
export type StoredMember = [number[], (string | number)[], number[], (string | number)[][]];

export function storeMember(m: Member): StoredMember {
  const supports = m.supports.map((s) => (s.kind === "spring" ? s.stiffness : s.kind));
  const loads = m.loads.map((l) => [l.kind, l.magnitude, l.xStart, l.xEnd, l.magnitudeEnd]);
  return [m.spans, supports, m.stiffness ?? [], loads];
}

export function loadMember([spans, supports, stiffness, loads]: StoredMember): Member {
  return {
    spans,
    supports: supports.map((s) => (typeof s === "number" ? { kind: "spring", stiffness: s } : ({ kind: s } as Support))),
    stiffness: stiffness.length ? stiffness : null,
    loads: loads.map(([kind, magnitude, xStart, xEnd, magnitudeEnd], i) => ({
      kind: kind as Load["kind"],
      magnitude: magnitude as number,
      xStart: xStart as number,
      xEnd: xEnd as number,
      magnitudeEnd: magnitudeEnd as number,
      loadCase: "D",
      row: i + 1,
    })),
  };
}

/** The member seen from its right end: x -> length - x, couples change sign. */
export function mirror(m: Member): Member {
  const length = m.spans.reduce((a, b) => a + b, 0);
  return {
    spans: m.spans.slice().reverse(),
    supports: m.supports.slice().reverse(),
    stiffness: m.stiffness ? m.stiffness.slice().reverse() : null,
    loads: m.loads.map((l) => {
      if (l.kind === "point") return { ...l, xStart: length - l.xStart, xEnd: length - l.xStart };
      if (l.kind === "moment") return { ...l, magnitude: -l.magnitude, magnitudeEnd: -l.magnitude, xStart: length - l.xStart, xEnd: length - l.xStart };
      return { ...l, xStart: length - l.xEnd, xEnd: length - l.xStart, magnitude: l.magnitudeEnd, magnitudeEnd: l.magnitude };
    }),
  };
}

/**
 * Largest difference between the member's reactions and its mirror image's (forces against
 * the largest reaction force, moments against the largest reaction moment or force times
 * length): a measure of the solver's rounding on this member.
 */
export function mirrorDiscrepancy(member: Member, solution: Solution): number {
  const length = member.spans.reduce((a, b) => a + b, 0);
  const a = solution.reactions;
  const b = solve(mirror(member)).reactions.slice().reverse();
  const forceScale = Math.max(...a.map((r) => Math.abs(r.force)));
  const momentScale = Math.max(...a.map((r) => Math.abs(r.moment)), forceScale * length);
  let worst = 0;
  a.forEach((r, i) => {
    const d = Math.max(Math.abs(r.force - b[i].force) / forceScale, Math.abs(r.moment + b[i].moment) / momentScale);
    worst = d > worst || d !== d ? d : worst;
  });
  return worst;
}
