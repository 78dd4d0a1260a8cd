import { applyCombination, formatCombination, type Combination } from "./combination";
import { isSpanError } from "./errors";
import type { Load, Member, Piece, Quantity, Solution } from "./model";
import { checkCount, checkPatternSpans, checkWork, LIMITS } from "./limits";
import { loadsPerSpan, type PatternMode } from "./pattern";
import { coefficients, derivative, pieceValue } from "./polynomial";
import { rootsBetween } from "./roots";
import { solve } from "./solve";
import { RELATIVE_ZERO } from "./tolerance";
import { pieceOf, pieceStartX, scratchPiece } from "./pieceTable";

/**
 * Studies of many load arrangements by superposition: every load case (and, with a
 * patterned live case, the live load of each span) is solved once; a combination or an
 * arrangement is then a weighted sum of those exact solutions. Sums of exact pieces on a
 * common grid of breakpoints are themselves exact pieces (one member, one EI per span), so
 * peaks still come from the polynomials, never from sampling.
 */

/** Values per grid interval: V, M, slope, deflection, q0, q1 at the interval start. */
export const FIELDS = 6;

export interface StudyCombination {
  name: string;
  /** Factor on each solved case (Study.cases), 0 for a case the combination leaves out. */
  factors: Float64Array;
  /** Factor on the live parts (Study.parts); 0 when the live case is not patterned or not named. */
  live: number;
}

export interface Study {
  /** One of the solutions below (or the member solved without loads): its nodes and checks. */
  base: Solution;
  /** One solution per case label (the live case excluded when patterned), factor 1. */
  cases: Solution[];
  /** Patterned: the live case's loads on span i alone, factor 1 (null for a span without any). */
  parts: (Solution | null)[];
  combinations: StudyCombination[];
}

function nameOf(combination: Combination): string {
  return combination.terms.length === 0 ? "unfactored" : formatCombination(combination);
}

/**
 * The factor each case label takes under a combination, found by the combination rule itself
 * (applyCombination on one representative load per label, so every check it makes applies).
 */
function caseFactors(representatives: Load[], combination: Combination): Float64Array {
  const probes = representatives.map((load) => ({ ...load, magnitude: 1, magnitudeEnd: 1 }));
  const factored = applyCombination(probes, combination);
  const factors = new Float64Array(probes.length);
  let j = 0;
  for (let i = 0; i < probes.length && j < factored.length; i++) {
    if (factored[j] === probes[i] || (factored[j].row === probes[i].row && factored[j].loadCase === probes[i].loadCase)) {
      factors[i] = factored[j].magnitude;
      j++;
    }
  }
  return factors;
}

/**
 * The limits of a study, checked from its counts before any solve: pattern spans,
 * combinations, case labels, positions (ENVELOPE) and the size of the whole call.
 */
export function checkStudy(kind: "ENVELOPE" | "PEAKS", member: Member, combinations: Combination[], pattern: PatternMode, positions: number): void {
  checkPatternSpans(pattern, member.spans.length);
  checkCount(combinations.length, LIMITS.combinations, "combinations", "combinations (named sets expanded)");
  const cases = new Set(member.loads.map((l) => l.loadCase)).size;
  checkCount(cases, LIMITS.cases, "loads", "case labels in one study");
  if (kind === "ENVELOPE") checkCount(positions, LIMITS.positions, "x", "positions");
  checkWork(kind, {
    spans: member.spans.length,
    loads: member.loads.length,
    cases,
    pattern,
    combinations: combinations.length,
    positions,
    axles: 0,
  });
}

/** Solves the cases and live parts of a study of `combinations` on `member`. */
export function prepareStudy(member: Member, combinations: Combination[], pattern: PatternMode, liveCase: string): Study {
  const labels: string[] = [];
  const groups = new Map<string, Load[]>();
  for (const load of member.loads) {
    let group = groups.get(load.loadCase);
    if (!group) {
      group = [];
      groups.set(load.loadCase, group);
      labels.push(load.loadCase);
    }
    group.push(load);
  }
  const representatives = labels.map((label) => groups.get(label)![0]);
  const perCombination = combinations.map((c) => caseFactors(representatives, c));
  const patterned = pattern !== "none";
  const liveIndex = patterned ? labels.indexOf(liveCase) : -1;
  const used = labels.map((_, k) => k !== liveIndex && perCombination.some((f) => f[k] !== 0));
  const caseIndex: number[] = [];
  let cases: Solution[] = [];
  let direct = false;
  try {
    labels.forEach((label, k) => {
      if (!used[k]) return;
      caseIndex.push(k);
      cases.push(solve({ ...member, loads: groups.get(label)! }));
    });
  } catch (error) {
    if (!isSpanError(error)) throw error;
    // A case alone can be beyond trust (a tiny case beside large ones) where its combinations
    // are not: then each combination's fixed loads are solved as they are, as one "case" each.
    direct = true;
    cases = combinations.map((c) => solve({ ...member, loads: applyCombination(liveIndex >= 0 ? member.loads.filter((l) => l.loadCase !== liveCase) : member.loads, c) }));
  }
  const liveUsed = liveIndex >= 0 && perCombination.some((f) => f[liveIndex] !== 0);
  const parts: (Solution | null)[] = liveUsed
    ? loadsPerSpan(member, groups.get(liveCase)!).map((loads) => (loads.length === 0 ? null : solve({ ...member, loads })))
    : [];
  // Any solution carries the member's grid and checks; a member with nothing to solve gets an empty one.
  const base = cases[0] ?? parts.find((p) => p !== null) ?? solve({ ...member, loads: [] });
  return {
    base,
    cases,
    parts,
    combinations: combinations.map((c, n) => ({
      name: nameOf(c),
      factors: direct ? Float64Array.from(cases, (_, j) => (j === n ? 1 : 0)) : Float64Array.from(caseIndex, (k) => perCombination[n][k]),
      live: liveIndex >= 0 ? perCombination[n][liveIndex] : 0,
    })),
  };
}

/** The scale rounding is judged by for a weighted sum of solutions. */
export function scaleOfSum(study: Study, combination: StudyCombination, quantity: Quantity): number {
  let scale = 0;
  study.cases.forEach((s, k) => (scale += Math.abs(combination.factors[k]) * s.scales[quantity]));
  for (const p of study.parts) if (p) scale += Math.abs(combination.live) * p.scales[quantity];
  return scale;
}

/** Every piece start of every solution (and the member end), ascending, without repeats. */
export function mergeBreaks(solutions: Solution[], extra: number[] = []): Float64Array {
  const all: number[] = [...extra];
  for (const s of solutions) for (let i = 0; i < s.pieces.count; i++) all.push(pieceStartX(s.pieces, i));
  all.push(solutions[0].length);
  all.sort((a, b) => a - b);
  const out: number[] = [];
  for (const x of all) if (out.length === 0 || x > out[out.length - 1]) out.push(x);
  return Float64Array.from(out);
}

/** A solution's piece values at the start of every grid interval (FIELDS per interval), plus 1/EI (and 1/GA) there. */
export function resample(solution: Solution, breaks: Float64Array, flexibility?: Float64Array, shearFlexibility?: Float64Array): Float64Array {
  const m = breaks.length - 1;
  const out = new Float64Array(FIELDS * m);
  const { pieces } = solution;
  const p = scratchPiece();
  let j = 0;
  for (let k = 0; k < m; k++) {
    const x = breaks[k];
    while (j + 1 < pieces.count && pieceStartX(pieces, j + 1) <= x) j++;
    pieceOf(pieces, j, p);
    const s = x - p.x0;
    const o = FIELDS * k;
    out[o] = pieceValue(p, "shear", s);
    out[o + 1] = pieceValue(p, "moment", s);
    out[o + 2] = pieceValue(p, "slope", s);
    out[o + 3] = pieceValue(p, "deflection", s);
    out[o + 4] = p.q0 + p.q1 * s;
    out[o + 5] = p.q1;
    if (flexibility) flexibility[k] = p.flexibility;
    if (shearFlexibility) shearFlexibility[k] = p.shearFlexibility;
  }
  return out;
}

/** out += a * x, field by field. */
export function addScaled(out: Float64Array, a: number, x: Float64Array): void {
  if (a === 0) return;
  for (let i = 0; i < out.length; i++) out[i] += a * x[i];
}

/** A scratch piece holding grid interval k of `fields`. */
export function loadPiece(piece: Piece, fields: Float64Array, k: number, breaks: Float64Array, flexibility: Float64Array, shearFlexibility?: Float64Array): Piece {
  const o = FIELDS * k;
  piece.x0 = breaks[k];
  piece.x1 = breaks[k + 1];
  piece.shear0 = fields[o];
  piece.moment0 = fields[o + 1];
  piece.slope0 = fields[o + 2];
  piece.deflection0 = fields[o + 3];
  piece.q0 = fields[o + 4];
  piece.q1 = fields[o + 5];
  piece.flexibility = flexibility[k];
  piece.shearFlexibility = shearFlexibility ? shearFlexibility[k] : 0;
  return piece;
}

export interface PeakAt {
  /** The peak in the sense sought (the largest, or the smallest). */
  value: number;
  x: number;
  /** The grid interval it lies in (at its start or end, or inside). */
  interval: number;
}

/**
 * The largest (sense +1) and/or smallest (sense -1) value of a quantity over pieces given on
 * a grid: both ends of every interval (so both sides of every jump) and every interior root
 * of the derivative, the leftmost x when reached more than once (to rounding of `scale`).
 * The ends come first; an interval whose coefficient bound cannot beat the peak they give
 * skips the root search, which is where the time goes.
 */
export function peaksOf(
  breaks: Float64Array,
  fields: Float64Array,
  flexibility: Float64Array,
  quantity: Quantity,
  senses: readonly (1 | -1)[],
  scale: number,
  shearFlexibility?: Float64Array,
): PeakAt[] {
  const m = breaks.length - 1;
  const piece = scratchPiece();
  const tol = 64 * RELATIVE_ZERO * scale;
  const start = new Float64Array(m);
  const end = new Float64Array(m);
  let high = -Infinity;
  let low = Infinity;
  for (let k = 0; k < m; k++) {
    loadPiece(piece, fields, k, breaks, flexibility, shearFlexibility);
    const a = pieceValue(piece, quantity, 0);
    const b = pieceValue(piece, quantity, piece.x1 - piece.x0);
    start[k] = a;
    end[k] = b;
    high = Math.max(high, a, b);
    low = Math.min(low, a, b);
  }
  const inner = new Map<number, { s: number; v: number }[]>();
  for (let k = 0; k < m; k++) {
    loadPiece(piece, fields, k, breaks, flexibility, shearFlexibility);
    const length = piece.x1 - piece.x0;
    const c = coefficients(piece, quantity);
    let spread = 0;
    let power = 1;
    for (let i = 1; i < c.length; i++) {
      power *= length;
      spread += Math.abs(c[i]) * power;
    }
    const wanted = senses.some((sense) => (sense === 1 ? c[0] + spread > high + tol : c[0] - spread < low - tol));
    if (!wanted) continue;
    const found: { s: number; v: number }[] = [];
    for (const s of rootsBetween(derivative(c), 0, length)) {
      const v = pieceValue(piece, quantity, s);
      found.push({ s, v });
      high = Math.max(high, v);
      low = Math.min(low, v);
    }
    if (found.length > 0) inner.set(k, found);
  }
  return senses.map((sense) => {
    const best = sense === 1 ? high : low;
    const reaches = (v: number) => sense * (v - best) >= -tol;
    for (let k = 0; k < m; k++) {
      if (reaches(start[k])) return { value: best, x: breaks[k], interval: k };
      for (const { s, v } of inner.get(k) ?? []) if (reaches(v)) return { value: best, x: breaks[k] + s, interval: k };
      if (reaches(end[k])) return { value: best, x: breaks[k + 1], interval: k };
    }
    return { value: best, x: breaks[0], interval: 0 };
  });
}
