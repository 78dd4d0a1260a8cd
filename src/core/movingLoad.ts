import { invalid } from "./errors";
import { valueAt } from "./evaluate";
import { chebyshevPoints, fitPolynomial } from "./fit";
import { checkEffect, measure, type Effect } from "./influence";
import { influencePieces, trainCubic } from "./movingInfluence";
import { isOnMember, nodePositions, snapToNode } from "./positions";
import type { Load, Member, Solution } from "./model";
import { derivative, evaluatePolynomial } from "./polynomial";
import { rootsBetween } from "./roots";
import { solve } from "./solve";
import { cleanZero, POSITION_TOLERANCE } from "./tolerance";
import { validateMember } from "./validate";
import { checkCount, checkWork, LIMITS } from "./limits";

/** A train of axle loads: `loads[i]` acts `offsets[i]` behind the first axle (offsets[0] = 0). */
export interface Train {
  loads: number[];
  offsets: number[];
}

export type MovingEffect = Effect | { kind: "absolute-moment" };

export type Direction = "as given" | "reversed";

/** Where the train stands when an effect peaks. */
export interface Placement {
  value: number;
  /** x of the first axle. */
  leadX: number;
  direction: Direction;
  /** Where the effect is measured (the section, or for absolute moment where it peaks). */
  x: number;
}

export interface MovingResult {
  max: Placement;
  min: Placement;
}

/** Builds a train from axle loads and the spacings between consecutive axles. */
export function trainFrom(loads: number[], spacings: number[]): Train {
  if (loads.length === 0) throw invalid("train: give at least one axle load");
  checkCount(loads.length, LIMITS.axles, "axles", "axle loads");
  if (spacings.length !== loads.length - 1) {
    throw invalid(`train: ${loads.length} axles need ${loads.length - 1} spacings, got ${spacings.length}`);
  }
  loads.forEach((p, i) => {
    if (!Number.isFinite(p)) throw invalid(`train: axle ${i + 1} load must be a finite number, got ${p}`);
  });
  const offsets = [0];
  spacings.forEach((s, i) => {
    if (!Number.isFinite(s) || s < 0) throw invalid(`train: spacing ${i + 1} must be a number of at least 0, got ${s}`);
    offsets.push(offsets[i] + s);
  });
  return { loads, offsets };
}

const FIT_POINTS = chebyshevPoints(5);

interface Probe {
  x: number;
  value: number;
}

function axlePositions(train: Train, leadX: number, direction: Direction): number[] {
  const sign = direction === "as given" ? 1 : -1;
  return train.offsets.map((o) => leadX + sign * o);
}

/**
 * Peaks of an effect as a train of axle loads crosses the member in both directions: the
 * largest and smallest value, the position of the first axle and where the effect is
 * measured. Between the positions where an axle meets a node or the section, every effect
 * is a polynomial in the train position (the member's response to a point load is cubic in
 * its position between nodes). An effect at a fixed place is the sum of the axles' exact
 * influence cubics (four solves per interval of the influence line, whatever the train);
 * absolute moment, measured under the moving axles, is a quartic fitted exactly from five
 * solves per stretch. Turning points come from the derivative; the placements of the peaks
 * are solved again exactly.
 * Limits at those positions are kept, so a peak reached just beyond a section counts.
 */
export function movingLoad(member: Member, train: Train, effect: MovingEffect): MovingResult {
  validateMember(member);
  checkWork("MOVING", { spans: member.spans.length, loads: 0, cases: 0, pattern: "none", combinations: 0, positions: 0, axles: train.loads.length, absoluteMoment: effect.kind === "absolute-moment" });
  if (effect.kind !== "absolute-moment") checkEffect(member, effect);
  const nodeX = nodePositions(member.spans);
  const length = nodeX[nodeX.length - 1];
  const tol = POSITION_TOLERANCE * length;
  const breaks = [...nodeX];
  if (effect.kind !== "absolute-moment" && "x" in effect) breaks.push(effect.x);
  const sortedBreaks = [...new Set(breaks)].sort((a, b) => a - b);
  const line = effect.kind === "absolute-moment" ? null : influencePieces(member, effect, sortedBreaks, tol);
  let max: Placement | null = null;
  let min: Placement | null = null;
  // Where a peak came from the fit inside a segment: solved again there exactly at the end.
  let maxProbe = -1;
  let minProbe = -1;
  const offer = (value: number, leadX: number, direction: Direction, x: number, probe = -1): void => {
    if (max === null || value > max.value) [max, maxProbe] = [{ value, leadX, direction, x }, probe];
    if (min === null || value < min.value) [min, minProbe] = [{ value, leadX, direction, x }, probe];
  };
  const solveAt = (leadX: number, direction: Direction): Solution => {
    const loads: Load[] = [];
    axlePositions(train, leadX, direction).forEach((x, i) => {
      if (isOnMember(x, length) && train.loads[i] !== 0) {
        const at = snapToNode(nodeX, x);
        loads.push({ kind: "point", magnitude: train.loads[i], xStart: at, xEnd: at, magnitudeEnd: 0, loadCase: "", row: i + 1 });
      }
    });
    return solve({ ...member, loads });
  };
  const probes = (solution: Solution, leadX: number, direction: Direction): Probe[] => {
    if (effect.kind !== "absolute-moment") return [{ x: "x" in effect ? effect.x : nodeX[effect.node - 1], value: measure(solution, effect) }];
    const list: Probe[] = nodeX.map((x) => ({ x, value: valueAt(solution, "moment", x) }));
    // One probe per axle whatever the train position (an axle off the member is probed at
    // the member end), so every sample of a segment has the same probes to fit.
    for (const axle of axlePositions(train, leadX, direction)) {
      const x = Math.min(Math.max(axle, 0), length);
      list.push({ x, value: valueAt(solution, "moment", x) });
    }
    return list;
  };
  for (const direction of ["as given", "reversed"] as Direction[]) {
    const sign = direction === "as given" ? 1 : -1;
    const events = new Set<number>();
    for (const b of breaks) for (const o of train.offsets) events.add(b - sign * o);
    const sorted = [...events].sort((a, b) => a - b);
    if (line) {
      // An effect at a fixed place: the train's effect is the sum of the axles' influence
      // cubics, itself a cubic in the train position between events.
      const at = effect.kind === "absolute-moment" ? 0 : "x" in effect ? effect.x : nodeX[effect.node - 1];
      for (let k = 0; k + 1 < sorted.length; k++) {
        const lo = sorted[k];
        const hi = sorted[k + 1];
        if (hi - lo <= tol) continue;
        const mid = (lo + hi) / 2;
        const half = (hi - lo) / 2;
        const cubic = trainCubic(line, train.loads, train.offsets.map((o) => mid + sign * o), half);
        offer(evaluatePolynomial(cubic, -1), lo, direction, at);
        offer(evaluatePolynomial(cubic, 1), hi, direction, at);
        for (const u of rootsBetween(derivative(cubic), -1, 1)) offer(evaluatePolynomial(cubic, u), mid + half * u, direction, at, 0);
      }
      // At a member end the value at the end (just right of 0, just left of the length) with an
      // axle exactly there is none of the limits from inside (the load is beyond the section on
      // the side not measured), so those placements are solved exactly.
      if (effect.kind !== "absolute-moment" && (Math.abs(at) <= tol || Math.abs(at - length) <= tol)) {
        const end = Math.abs(at) <= tol ? 0 : length;
        for (const o of train.offsets) {
          const leadX = end - sign * o;
          offer(measure(solveAt(leadX, direction), effect), leadX, direction, at);
        }
      }
      continue;
    }
    // Every segment between events is fitted from five solves inside it; its ends are the
    // limits from inside, and the value exactly at an event is one of those limits (the
    // conventions take one side at a jump), so events need no solve of their own.
    for (let k = 0; k + 1 < sorted.length; k++) {
      const lo = sorted[k];
      const hi = sorted[k + 1];
      if (hi - lo <= tol) continue;
      const mid = (lo + hi) / 2;
      const half = (hi - lo) / 2;
      const samples = FIT_POINTS.map((u) => probes(solveAt(mid + half * u, direction), mid + half * u, direction));
      const count = samples[0].length;
      for (let c = 0; c < count; c++) {
        const fit = fitPolynomial(FIT_POINTS, samples.map((s) => s[c].value));
        // Where the effect is measured moves linearly with the train (or stays put): fit it once.
        const place = fitPolynomial(FIT_POINTS, samples.map((s) => s[c].x));
        offer(evaluatePolynomial(fit, -1), lo, direction, evaluatePolynomial(place, -1));
        offer(evaluatePolynomial(fit, 1), hi, direction, evaluatePolynomial(place, 1));
        for (const u of rootsBetween(derivative(fit), -1, 1)) {
          offer(evaluatePolynomial(fit, u), mid + half * u, direction, evaluatePolynomial(place, u), c);
        }
      }
    }
  }
  const exactly = (p: Placement, probe: number): Placement => {
    if (probe < 0) return p;
    const at = probes(solveAt(p.leadX, p.direction), p.leadX, p.direction)[probe];
    return { ...p, value: at.value, x: at.x };
  };
  max = exactly(max!, maxProbe);
  min = exactly(min!, minProbe);
  const scale = train.loads.reduce((sum, p) => sum + Math.abs(p), 0) * length;
  const found = { max, min } as MovingResult;
  found.max.value = cleanZero(found.max.value, scale);
  found.min.value = cleanZero(found.min.value, scale);
  return found;
}
