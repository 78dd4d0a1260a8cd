import { applyCombination, formatCombination, type Combination } from "./combination";
import { invalid } from "./errors";
import { valueAt } from "./evaluate";
import { extremes } from "./extremes";
import type { Load, Member, Quantity, Solution } from "./model";
import { describeArrangement, loadsPerSpan, standardArrangements } from "./pattern";
import { solve } from "./solve";

/** How the live case is arranged: as given, the classical arrangements, or every subset of spans. */
export type PatternMode = "none" | "standard" | "full";

export interface EnvelopeOptions {
  pattern?: PatternMode;
  /** The case label of the load that is patterned span by span (default "L"). */
  liveCase?: string;
}

export interface Bound {
  value: number;
  x: number;
  combination: string;
  /** The loaded spans of the live case, when patterned ("" otherwise). */
  arrangement: string;
}

export interface EnvelopeStation {
  x: number;
  max: Record<Quantity, Bound | null>;
  min: Record<Quantity, Bound | null>;
}

export const ENVELOPE_QUANTITIES: Quantity[] = ["shear", "moment", "deflection"];

function emptyMember(member: Member, loads: Load[]): Member {
  return { ...member, loads };
}

function nameOf(combination: Combination): string {
  return combination.terms.length === 0 ? "unfactored" : formatCombination(combination);
}

interface Scenario {
  combination: string;
  fixed: Solution;
  live: { factor: number; parts: Solution[] } | null;
}

function scenarios(member: Member, combinations: Combination[], options: EnvelopeOptions): Scenario[] {
  const pattern = options.pattern ?? "none";
  const liveCase = options.liveCase ?? "L";
  if (combinations.length === 0) throw invalid("envelope: give at least one combination");
  const liveParts =
    pattern === "none"
      ? null
      : loadsPerSpan(
          member,
          member.loads.filter((l) => l.loadCase === liveCase),
        ).map((loads) => solve(emptyMember(member, loads)));
  return combinations.map((combination) => {
    const factored = applyCombination(member.loads, combination);
    const term = combination.terms.find((t) => t.loadCase === liveCase);
    const liveFactor = combination.terms.length === 0 ? 1 : (term?.factor ?? 0);
    if (!liveParts || liveFactor === 0) {
      return { combination: nameOf(combination), fixed: solve(emptyMember(member, factored)), live: null };
    }
    const rest = factored.filter((l) => l.loadCase !== liveCase);
    return { combination: nameOf(combination), fixed: solve(emptyMember(member, rest)), live: { factor: liveFactor, parts: liveParts } };
  });
}

function arrangementsFor(pattern: PatternMode, spanCount: number): number[][] {
  return pattern === "standard" ? standardArrangements(spanCount) : [];
}

/**
 * The envelope of shear, moment and deflection (deflection when EI is given) over a list of
 * combinations, at each x: largest and smallest value and the combination (and, with a
 * patterned live case, the loaded spans) that produces it. Pattern "full" searches every
 * subset of spans exactly: by superposition the worst subset at x loads exactly the spans
 * whose live load acts in the sense sought. Pattern "standard" uses the classical
 * arrangements only.
 */
export function envelope(member: Member, combinations: Combination[], xs: number[], options: EnvelopeOptions = {}): EnvelopeStation[] {
  const pattern = options.pattern ?? "none";
  const all = scenarios(member, combinations, options);
  const quantities = ENVELOPE_QUANTITIES.filter((q) => q !== "deflection" || member.stiffness !== null);
  const arrangements = arrangementsFor(pattern, member.spans.length);
  const liveParts = all.find((scenario) => scenario.live)?.live?.parts ?? [];
  const n = liveParts.length;
  const parts = new Float64Array(n);
  const sums = new Float64Array(arrangements.length);
  return xs.map((x) => {
    const max: Record<Quantity, Bound | null> = { shear: null, moment: null, slope: null, deflection: null };
    const min: Record<Quantity, Bound | null> = { shear: null, moment: null, slope: null, deflection: null };
    for (const q of quantities) {
      // The live parts do not depend on the combination: evaluate them once per station.
      for (let i = 0; i < n; i++) parts[i] = valueAt(liveParts[i], q, x);
      for (let a = 0; a < arrangements.length; a++) {
        let sum = 0;
        for (const i of arrangements[a]) sum += parts[i];
        sums[a] = sum;
      }
      let high = -Infinity;
      let low = Infinity;
      let highAt: Bound | null = null;
      let lowAt: Bound | null = null;
      for (const scenario of all) {
        const base = valueAt(scenario.fixed, q, x);
        const live = scenario.live;
        if (!live) {
          if (base > high) [high, highAt] = [base, { value: base, x, combination: scenario.combination, arrangement: "" }];
          if (base < low) [low, lowAt] = [base, { value: base, x, combination: scenario.combination, arrangement: "" }];
          continue;
        }
        const f = live.factor;
        if (pattern === "full") {
          let up = base;
          let down = base;
          for (let i = 0; i < n; i++) {
            const v = f * parts[i];
            if (v > 0) up += v;
            else if (v < 0) down += v;
          }
          if (up > high) [high, highAt] = [up, { value: up, x, combination: scenario.combination, arrangement: spansWhere(parts, f, 1) }];
          if (down < low) [low, lowAt] = [down, { value: down, x, combination: scenario.combination, arrangement: spansWhere(parts, f, -1) }];
          continue;
        }
        for (let a = 0; a < arrangements.length; a++) {
          const value = base + f * sums[a];
          if (value > high) [high, highAt] = [value, { value, x, combination: scenario.combination, arrangement: describeArrangement(arrangements[a]) }];
          if (value < low) [low, lowAt] = [value, { value, x, combination: scenario.combination, arrangement: describeArrangement(arrangements[a]) }];
        }
      }
      max[q] = highAt;
      min[q] = lowAt;
    }
    return { x, max, min };
  });
}

/** The spans whose factored live part acts in the sense sought (sign +1 up, -1 down), described. */
function spansWhere(parts: Float64Array, factor: number, sign: number): string {
  const spans: number[] = [];
  for (let i = 0; i < parts.length; i++) if (sign * factor * parts[i] > 0) spans.push(i);
  return describeArrangement(spans);
}

export interface GoverningPeak {
  quantity: Quantity;
  max: Bound;
  min: Bound;
}

/**
 * The governing peaks over a list of combinations: for shear, moment and (with EI) slope and
 * deflection, the largest and smallest value anywhere on the member, its x and the
 * combination (and arrangement) that produces it. Peaks come from each combination's exact
 * solution; with a patterned live case, every classical arrangement ("standard") or, for
 * at most 12 spans, every subset of spans ("full") is solved.
 */
export function governingPeaks(member: Member, combinations: Combination[], options: EnvelopeOptions = {}): GoverningPeak[] {
  const pattern = options.pattern ?? "none";
  const liveCase = options.liveCase ?? "L";
  if (combinations.length === 0) throw invalid("peaks: give at least one combination");
  const n = member.spans.length;
  if (pattern === "full" && n > 12) throw invalid(`pattern "full" searches every subset of spans: at most 12 spans, got ${n}`);
  const quantities: Quantity[] = member.stiffness === null ? ["shear", "moment"] : ["shear", "moment", "slope", "deflection"];
  const best = new Map<Quantity, { max: Bound | null; min: Bound | null }>();
  for (const q of quantities) best.set(q, { max: null, min: null });
  const consider = (solution: Solution, combination: string, arrangement: string): void => {
    for (const q of quantities) {
      const e = extremes(solution, q);
      const slot = best.get(q)!;
      if (slot.max === null || e.max > slot.max.value) slot.max = { value: e.max, x: e.xMax, combination, arrangement };
      if (slot.min === null || e.min < slot.min.value) slot.min = { value: e.min, x: e.xMin, combination, arrangement };
    }
  };
  const perSpan = pattern === "none" ? null : loadsPerSpan(member, member.loads.filter((l) => l.loadCase === liveCase));
  const subsets: number[][] =
    pattern === "full"
      ? Array.from({ length: (1 << n) - 1 }, (_, k) => Array.from({ length: n }, (_, i) => i).filter((i) => ((k + 1) >> i) & 1))
      : standardArrangements(n);
  for (const combination of combinations) {
    const factored = applyCombination(member.loads, combination);
    const name = nameOf(combination);
    const patterned = perSpan !== null && (combination.terms.length === 0 || combination.terms.some((t) => t.loadCase === liveCase));
    if (!patterned) {
      consider(solve(emptyMember(member, factored)), name, "");
      continue;
    }
    const rest = factored.filter((l) => l.loadCase !== liveCase);
    const factor = combination.terms.length === 0 ? 1 : combination.terms.find((t) => t.loadCase === liveCase)!.factor;
    for (const spans of subsets) {
      const live = spans.flatMap((i) => perSpan[i]).map((l) => ({ ...l, magnitude: l.magnitude * factor, magnitudeEnd: l.magnitudeEnd * factor }));
      consider(solve(emptyMember(member, [...rest, ...live])), name, describeArrangement(spans));
    }
  }
  return quantities.map((q) => ({ quantity: q, max: best.get(q)!.max!, min: best.get(q)!.min! }));
}
