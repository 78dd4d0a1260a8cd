import { invalid } from "./errors";
import type { PatternMode } from "./pattern";

/**
 * The documented limits of the load-arrangement studies (ENVELOPE, PEAKS, INFLUENCE, MOVING,
 * COMBOS), one place for all of them. Each keeps a call at its limits quick (the benchmark
 * tests/bench/limits.bench.ts walks every function to them) and turns pasted garbage into a
 * #VALUE! that names the limit and the argument. The member's own limits (loads, spans) live
 * with its validation.
 */
export const LIMITS = {
  /** ENVELOPE x cells and INFLUENCE positions. */
  positions: 10001,
  /** MOVING axle loads. */
  axles: 64,
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
  /**
   * Work of one study, counted as solves of one span: INFLUENCE positions x spans; MOVING
   * (spans + 1) x axles x (spans + axles); ENVELOPE and PEAKS combinations x arrangements x
   * (spans + loads), with stations for ENVELOPE.
   */
  work: 20_000_000,
} as const;

/** Throws #VALUE! "argument: at most limit nouns, got count (advice)" when count exceeds limit. */
export function checkCount(count: number, limit: number, argument: string, noun: string, advice = ""): void {
  if (count > limit) throw invalid(`${argument}: at most ${limit} ${noun}, got ${count}${advice ? ` (${advice})` : ""}`);
}

/** The pattern's span limit. */
export function checkPatternSpans(pattern: PatternMode, spanCount: number): void {
  if (pattern === "none") return;
  checkCount(spanCount, LIMITS.patternSpans, `pattern "${pattern}"`, "spans", "a patterned live case is searched span by span");
}
