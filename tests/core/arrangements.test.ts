/**
 * The load arrangements of a patterned live case (src/core/pattern.ts) serve ENVELOPE and
 * PEAKS alike. Both searches work by superposition of each span's live load solved once; here
 * they are proven against brute force: every arrangement the pattern stands for
 * (arrangementsOf), each solved on its own as a member with just those live loads.
 */
import { applyCombination, pieceList, arrangementsOf, envelope, extremes, governingPeaks, parseCombination, solve, valueAt } from "../../src/core";
import type { Load, Member, Quantity, Solution } from "../../src/core";
import type { PatternMode } from "../../src/core/pattern";
import { pieceValue } from "../../src/core/polynomial";
import { beam, couple, linear, nodesOf, point, udl } from "./kit/members";
import { randomMember } from "./kit/random";

/** A random stable member (the suite's generator) whose loads inside one span are live by turns, the rest dead. */
function randomStudy(seed: number): Case {
  const m = randomMember(seed, { maxSpans: 4, maxLoads: 7 });
  const nodes = nodesOf(m);
  const spanOf = (x: number) => nodes.findIndex((n, i) => i + 1 < nodes.length && x >= n && x < nodes[i + 1]);
  const loads = m.loads.map((l, i) => {
    const end = l.kind === "point" || l.kind === "moment" ? l.xStart : l.xEnd - 1e-9 * nodes[nodes.length - 1];
    const oneSpan = spanOf(l.xStart) >= 0 && spanOf(l.xStart) === spanOf(end);
    return { ...l, loadCase: oneSpan && i % 3 !== 2 ? "L" : "D" };
  });
  if (!loads.some((l) => l.loadCase === "D")) loads.push({ ...udl(1, 0, nodes[nodes.length - 1], "D"), row: loads.length + 1 });
  return { name: `random member, seed ${seed}`, member: { ...m, loads }, combos: ["1.2D + 1.6L", "0.9D - 1.0L"] };
}

interface Case {
  name: string;
  member: Member;
  combos: string[];
}

// Every live load lies inside one span, so the brute force picks an arrangement's loads by
// position alone, without the clipping the searches use.
const cases: Case[] = [
  {
    name: "three pinned spans, UDL live and dead",
    member: beam([6, 8, 5], ["pin", "pin", "pin", "pin"], [udl(3, 0, 19, "D"), udl(4, 0, 6, "L"), udl(4, 6, 14, "L"), udl(4, 14, 19, "L")], 1),
    combos: ["1.2D + 1.6L", "1.4D", "0.9D + 1.0L"],
  },
  {
    name: "fixed end, overhang, point and partial live loads, EI per span",
    member: beam(
      [5, 7, 2.5],
      ["fixed", "pin", "pin", "free"],
      [udl(2, 0, 14.5, "D"), point(10, 2, "L"), linear(1, 3, 6, 11, "L"), point(6, 13.5, "L"), couple(4, 9, "L")],
      [9000, 12000, 9000],
    ),
    combos: ["1.2D + 1.6L", "0.9D + 1.6L", "D"],
  },
  {
    name: "hinge and spring, live load up and down, negative live factor",
    member: beam(
      [4, 6, 5, 3],
      ["fixed", "pin", "hinge", 800, "pin"],
      [udl(1.5, 0, 18, "D"), udl(2, 0, 4, "L"), udl(-1, 4, 10, "L"), point(5, 12, "L"), udl(3, 15, 18, "L"), point(2, 11, "S")],
      20000,
    ),
    combos: ["1.2D + 1.6L + 0.5S", "1.2D - 0.5L", "1.0D + 1.0S"],
  },
  {
    name: "issue 11: one span, dead load up, live load down",
    member: beam([6], ["pin", "pin"], [udl(-1, 0, 6, "D"), udl(2, 0, 6, "L")], 1000),
    combos: ["D + L"],
  },
  {
    name: "five pinned spans, dead point loads off midspan (peaks away from the middle of a grid interval)",
    member: beam(
      [6, 6, 6, 6, 6],
      ["pin", "pin", "pin", "pin", "pin", "pin"],
      [udl(1, 0, 30, "D"), point(8, 13, "D"), point(8, 19.5, "D"), point(5, 26, "D"), ...[0, 1, 2, 3, 4].map((i) => udl(3, 6 * i, 6 * i + 6, "L"))],
      5000,
    ),
    combos: ["1.2D + 1.6L"],
  },
];

function liveOn(m: Member, spans: number[] | null): Load[] {
  const nodes = nodesOf(m);
  return m.loads.filter((l) => {
    if (l.loadCase !== "L" || spans === null) return true;
    return spans.some((i) => l.xStart >= nodes[i] && l.xStart < nodes[i + 1]);
  });
}

interface Brute {
  solution: Solution;
  combination: string;
  spans: number[] | null;
}

function bruteForce(c: Case, mode: PatternMode): Brute[] {
  const out: Brute[] = [];
  for (const text of c.combos) {
    const combination = parseCombination(text);
    for (const spans of arrangementsOf(mode, c.member.spans.length)) {
      const loads = applyCombination(liveOn(c.member, spans), combination);
      out.push({ solution: solve({ ...c.member, loads }), combination: text, spans });
    }
  }
  return out;
}

/** Both sides of x: just left (the piece ending there) and just right. */
function sidesAt(s: Solution, q: Quantity, x: number): number[] {
  const values = [valueAt(s, q, x)];
  for (const p of pieceList(s.pieces)) if (Math.abs(p.x1 - x) <= 1e-12 * s.length) values.push(pieceValue(p, q, p.x1 - p.x0));
  return values;
}

function spansOf(arrangement: string): number[] {
  if (arrangement === "no span") return [];
  return arrangement.replace(/^spans? /, "").split(", ").map((v) => Number(v) - 1);
}

for (let seed = 1; seed <= 24; seed++) cases.push(randomStudy(seed));

const modes: PatternMode[] = ["standard", "full"];
const table = cases.flatMap((c) => modes.map((mode) => [c.name, mode, c] as const));

describe.each(table)("%s, pattern %s", (_name, mode, c) => {
  const brute = bruteForce(c, mode);
  const combos = c.combos.map(parseCombination);
  const quantities: Quantity[] = ["shear", "moment", "slope", "deflection"];
  const scaleOf = (q: Quantity) => Math.max(...brute.map((b) => b.solution.scales[q]));

  it("PEAKS equals the largest and smallest over every arrangement solved on its own, and its (x, combination, arrangement) reproduces the value", () => {
    const peaks = governingPeaks(c.member, combos, { pattern: mode, liveCase: "L" });
    expect(peaks.map((p) => p.quantity)).toEqual(quantities);
    for (const peak of peaks) {
      const q = peak.quantity;
      const each = brute.map((b) => extremes(b.solution, q));
      const scale = scaleOf(q);
      expect(Math.abs(peak.max.value - Math.max(...each.map((e) => e.max)))).toBeLessThanOrEqual(1e-10 * scale);
      expect(Math.abs(peak.min.value - Math.min(...each.map((e) => e.min)))).toBeLessThanOrEqual(1e-10 * scale);
      for (const bound of [peak.max, peak.min]) {
        const combination = parseCombination(bound.combination);
        const spans = bound.arrangement === "" ? null : spansOf(bound.arrangement);
        const again = solve({ ...c.member, loads: applyCombination(liveOn(c.member, spans), combination) });
        const gap = Math.min(...sidesAt(again, q, bound.x).map((v) => Math.abs(v - bound.value)));
        expect(gap).toBeLessThanOrEqual(1e-10 * scale);
      }
    }
  });

  it("ENVELOPE equals the largest and smallest over every arrangement at each station", () => {
    const L = c.member.spans.reduce((a, b) => a + b, 0);
    const xs = Array.from({ length: 41 }, (_, i) => (L * i) / 40).concat(nodesOf(c.member));
    const stations = envelope(c.member, combos, xs, { pattern: mode, liveCase: "L" });
    for (const station of stations) {
      for (const q of ["shear", "moment", "deflection"] as Quantity[]) {
        const values = brute.map((b) => valueAt(b.solution, q, station.x));
        const scale = scaleOf(q);
        expect(Math.abs(station.max[q]!.value - Math.max(...values))).toBeLessThanOrEqual(1e-10 * scale);
        expect(Math.abs(station.min[q]!.value - Math.min(...values))).toBeLessThanOrEqual(1e-10 * scale);
      }
    }
  });
});

describe("the arrangements a pattern stands for", () => {
  it.each([
    ["full, 1 span: none and the span", "full", 1, [[], [0]]],
    ["full, 2 spans: none first, then every subset", "full", 2, [[], [0], [1], [0, 1]]],
    ["standard, 3 spans: all, alternates, adjacent pairs with alternates beyond", "standard", 3, [[0, 1, 2], [0, 2], [1], [0, 1], [1, 2]]],
    ["none: the live case as given", "none", 3, [null]],
  ] as const)("%s", (_name, mode, n, expected) => {
    expect(arrangementsOf(mode as PatternMode, n)).toEqual(expected);
  });

  it("issue 11: with pattern full the arrangement without live load counts, in PEAKS as in ENVELOPE (moment minimum -4.5 at midspan)", () => {
    // Dead load 1 up on a 6 m simple span: M = -w L^2 / 8 = -4.5 (simple-span moment, from memory).
    const m = cases[3].member;
    const combos = [parseCombination("D + L")];
    const peaks = governingPeaks(m, combos, { pattern: "full", liveCase: "L" });
    const moment = peaks.find((p) => p.quantity === "moment")!;
    expect(moment.min.value).toBeCloseTo(-4.5, 12);
    expect(moment.min.x).toBeCloseTo(3, 12);
    expect(moment.min.arrangement).toBe("no span");
    expect(moment.max.value).toBeCloseTo(4.5, 12);
    const [mid] = envelope(m, combos, [3], { pattern: "full", liveCase: "L" });
    expect(mid.min.moment!.value).toBeCloseTo(-4.5, 12);
    expect(mid.min.moment!.arrangement).toBe("no span");
  });
});
