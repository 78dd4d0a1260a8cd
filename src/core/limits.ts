import { invalid } from "./errors";
import type { PatternMode } from "./pattern";

/**
 * The documented limits of the load-arrangement studies (ENVELOPE, PEAKS, INFLUENCE, MOVING,
 * COMBOS) and of CASEREACTIONS, one place for all of them. Each keeps a call at its limits quick (the benchmark
 * tests/bench/limits.bench.ts walks every function to them) and turns pasted garbage into a
 * #VALUE! that names the limit and the argument. The member's own limits (loads, spans) live
 * with its validation.
 */
export const LIMITS = {
  /** ENVELOPE x cells and INFLUENCE positions. */
  positions: 10001,
  /** Cells of each range of UTILISATION (demand, capacity), CONVERT (value) and STIFFNESS (E, I). */
  cells: 10001,
  /** MOVING axle loads (on one span the size limit allows 35, or 25 for absolute moment; more spans allow fewer). */
  axles: 35,
  /** ENVELOPE and PEAKS combinations, after named sets are expanded. */
  combinations: 64,
  /** Distinct case labels of the loads in ENVELOPE and PEAKS. */
  cases: 32,
  /** EN 1990 variable cases (COMBOS cases, or the labels of the loads other than G). */
  variableCases: 16,
  /** EN 1990 psi0 pairs. */
  psi0Pairs: 16,
  /** Spans of a member with a patterned live case (standard or full). */
  patternSpans: 12,
} as const;

/**
 * The size of one call in work units (about 1-2 microseconds each of process CPU on the shared
 * benchmark machine at a load average of 3): a span or a load through one solve costs 10
 * (`solve`); through one peak search of PEAKS 20 (`scan`: at 12, PEAKS cost about 1.3 times the
 * other studies per unit); through a solve INFLUENCE repeats per position, or CASEREACTIONS per
 * case label, 15 (`repeatedSolve`: at 10 both took 1.7-2 µs of CPU per unit against 1.0-1.3 µs
 * for the other studies, limits bench 2026-12-02 at load 5, and missed 200 ms at the limit); and
 * one x cell of ENVELOPE 2 per case and live span it reads and 1 per arrangement it combines
 * (`station`). A call larger than WORK_LIMIT is refused before any work, since its size is known
 * from the counts alone. The weights and the limit come from tests/bench/limits.bench.ts, so
 * that a call at the limit answers within about 200 ms.
 */
export const WORK_LIMIT = 100_000;
export const WORK_WEIGHTS = { solve: 10, scan: 20, station: 1, repeatedSolve: 15 } as const;

export type StudyKind = "ENVELOPE" | "PEAKS" | "INFLUENCE" | "MOVING" | "CASEREACTIONS";

export interface StudyCounts {
  spans: number;
  loads: number;
  /** Distinct case labels of the loads. */
  cases: number;
  pattern: PatternMode;
  /** ENVELOPE and PEAKS combinations; CASEREACTIONS: 1 when a combination is solved besides the cases. */
  combinations: number;
  /** ENVELOPE x cells, INFLUENCE positions. */
  positions: number;
  axles: number;
  /** MOVING "absolute moment": every node and axle is a probe, about twice the work. */
  absoluteMoment?: boolean;
}

/** How many arrangements of the live case a pattern costs per combination. */
function arrangementCost(pattern: PatternMode, spans: number): number {
  return pattern === "standard" ? spans + 2 : pattern === "full" ? 2 : 1;
}

/**
 * The size of a call from its counts (s = spans + loads; live = spans when patterned, else 0;
 * arrangements a = 1 without a pattern, 2 for full, spans + 2 for standard):
 * - ENVELOPE: 10 (cases + live) s + positions (2 (cases + live) + combinations a);
 * - PEAKS: 10 (cases + live) s + 20 combinations a s;
 * - INFLUENCE: 15 positions (spans + 1), one solve per position;
 * - MOVING at a section, node or support: 40 (spans + 2) (spans + 1) + 2 (spans + 2) axles^2
 *   (four solves per interval of the influence line, then sums of the axles' cubics);
 * - MOVING absolute moment: 200 (spans + 2) axles (spans + axles): five solves per stretch
 *   between the positions where an axle meets a node, in both directions;
 * - CASEREACTIONS: 15 (cases spans + loads), a solve per case with that case's loads, plus
 *   30 (spans + loads) when the combination is given: it is read and solved again as the member
 *   functions do (about twice a case solve's cost, tests/bench/limits.bench.ts).
 */
export function workOf(kind: StudyKind, c: StudyCounts): number {
  const { solve, scan, station, repeatedSolve } = WORK_WEIGHTS;
  const size = c.spans + c.loads;
  const live = c.pattern === "none" ? 0 : c.spans;
  const arranged = c.combinations * arrangementCost(c.pattern, c.spans);
  switch (kind) {
    case "ENVELOPE":
      return solve * (c.cases + live) * size + station * c.positions * (2 * (c.cases + live) + arranged);
    case "PEAKS":
      return solve * (c.cases + live) * size + scan * arranged * size;
    case "INFLUENCE":
      return repeatedSolve * c.positions * (c.spans + 1);
    case "MOVING":
      return c.absoluteMoment
        ? solve * 20 * (c.spans + 2) * c.axles * (c.spans + c.axles)
        : solve * 4 * (c.spans + 2) * (c.spans + 1) + 2 * (c.spans + 2) * c.axles * c.axles;
    case "CASEREACTIONS":
      return repeatedSolve * (c.cases * c.spans + c.loads) + (c.combinations > 0 ? 2 * repeatedSolve * size : 0);
  }
}

/** Throws #VALUE! naming the counts when a call is larger than its budget. */
export function checkWork(kind: StudyKind, c: StudyCounts): void {
  const work = workOf(kind, c);
  if (work <= WORK_LIMIT) return;
  const counts: string[] = [`${c.spans} spans`];
  if (kind === "ENVELOPE" || kind === "PEAKS") counts.push(`${c.loads} loads`, `${c.cases} case labels`, `${c.combinations} combinations`, `pattern ${c.pattern}`);
  if (kind === "ENVELOPE" || kind === "INFLUENCE") counts.push(`${c.positions} positions`);
  if (kind === "MOVING") counts.push(`${c.axles} axles${c.absoluteMoment ? ", absolute moment" : ""}`);
  if (kind === "CASEREACTIONS") counts.push(`${c.loads} loads`, `${c.cases} case labels`, c.combinations > 0 ? "and the combination" : "no combination");
  throw invalid(
    `${kind}: this call is too large (${counts.join(", ")}: size ${work}, at most ${WORK_LIMIT}); use fewer of them (the README's limits section gives the size of each function)`,
  );
}

/** Throws #VALUE! "argument: at most limit nouns, got count (advice)" when count exceeds limit. */
export function checkCount(count: number, limit: number, argument: string, noun: string, advice = ""): void {
  if (count > limit) throw invalid(`${argument}: at most ${limit} ${noun}, got ${count}${advice ? ` (${advice})` : ""}`);
}

/** The pattern's span limit. */
export function checkPatternSpans(pattern: PatternMode, spanCount: number): void {
  if (pattern === "none") return;
  checkCount(spanCount, LIMITS.patternSpans, `pattern "${pattern}"`, "spans", "a patterned live case is searched span by span");
}
