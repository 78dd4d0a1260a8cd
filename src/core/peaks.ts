import type { Combination } from "./combination";
import type { Bound, EnvelopeOptions } from "./envelope";
import { invalid } from "./errors";
import type { Member, Quantity, Solution } from "./model";
import { describeArrangement, governingSpans, standardArrangements } from "./pattern";
import { coefficients } from "./polynomial";
import { rootsBetween } from "./roots";
import { addScaled, checkStudy, FIELDS, loadPiece, mergeBreaks, peaksOf, prepareStudy, resample, scaleOfSum, type Study } from "./superposition";
import { pieceList, scratchPiece } from "./pieceTable";
import { cleanZero, ROUNDING_NOISE } from "./tolerance";

export interface GoverningPeak {
  quantity: Quantity;
  max: Bound;
  min: Bound;
}

/** Grid, 1/EI and every solution of a study resampled on it, for one quantity. */
interface Sampled {
  breaks: Float64Array;
  flexibility: Float64Array;
  shearFlexibility: Float64Array;
  cases: Float64Array[];
  parts: (Float64Array | null)[];
}

function sample(study: Study, breaks: Float64Array): Sampled {
  const flexibility = new Float64Array(breaks.length - 1);
  const shearFlexibility = new Float64Array(breaks.length - 1);
  resample(study.base, breaks, flexibility, shearFlexibility);
  return {
    breaks,
    flexibility,
    shearFlexibility,
    cases: study.cases.map((s) => resample(s, breaks)),
    parts: study.parts.map((s) => (s ? resample(s, breaks) : null)),
  };
}

/** Where each live part changes sign inside its own pieces: the full pattern's extra breakpoints. */
function signChanges(parts: (Solution | null)[], quantity: Quantity): number[] {
  const out: number[] = [];
  for (const part of parts) {
    if (!part) continue;
    for (const p of pieceList(part.pieces)) for (const s of rootsBetween(coefficients(p, quantity), 0, p.x1 - p.x0)) out.push(p.x0 + s);
  }
  return out;
}

function fixedFields(sampled: Sampled, factors: Float64Array): Float64Array {
  const out = new Float64Array(FIELDS * (sampled.breaks.length - 1));
  sampled.cases.forEach((c, k) => addScaled(out, factors[k], c));
  return out;
}

/** Each part's value at the middle of each grid interval (parts x intervals), for the full pattern's rule. */
function midValues(sampled: Sampled, quantity: Quantity): Float64Array[] {
  const m = sampled.breaks.length - 1;
  const piece = scratchPiece();
  return sampled.parts.map((fields) => {
    const values = new Float64Array(m);
    if (!fields) return values;
    for (let k = 0; k < m; k++) {
      loadPiece(piece, fields, k, sampled.breaks, sampled.flexibility, sampled.shearFlexibility);
      values[k] = pieceValueMid(piece, quantity);
    }
    return values;
  });
}

function pieceValueMid(piece: ReturnType<typeof scratchPiece>, quantity: Quantity): number {
  const c = coefficients(piece, quantity);
  const s = (piece.x1 - piece.x0) / 2;
  let v = 0;
  for (let i = c.length - 1; i >= 0; i--) v = v * s + c[i];
  return v;
}

/**
 * The governing peaks over a list of combinations: for shear, moment and (with EI) slope and
 * deflection, the largest and smallest value anywhere on the member, its x and the
 * combination (and arrangement) that produces it. Every case and every span's live load is
 * solved once; each combination and arrangement is their superposition, and its peaks come
 * from the superposed polynomial pieces. Pattern "full" takes every subset of spans, none
 * included, without listing them: between the points where some span's live effect changes
 * sign, the subset giving the largest value loads exactly the spans whose factored effect is
 * positive there (the smallest: negative), so the peak over all subsets is the peak of that
 * piecewise sum.
 */
export function governingPeaks(member: Member, combinations: Combination[], options: EnvelopeOptions = {}): GoverningPeak[] {
  const pattern = options.pattern ?? "none";
  const liveCase = options.liveCase ?? "L";
  if (combinations.length === 0) throw invalid("peaks: give at least one combination");
  checkStudy("PEAKS", member, combinations, pattern, 0);
  const quantities: Quantity[] = member.stiffness === null ? ["shear", "moment"] : ["shear", "moment", "slope", "deflection"];
  const study = prepareStudy(member, combinations, pattern, liveCase);
  const all = [study.base, ...study.cases, ...study.parts.filter((p): p is Solution => p !== null)];
  const common = mergeBreaks(all);
  const arrangements = pattern === "standard" ? standardArrangements(member.spans.length) : [];
  const names = arrangements.map(describeArrangement);
  return quantities.map((q) => {
    const breaks = pattern === "full" ? mergeBreaks(all, signChanges(study.parts, q)) : common;
    const sampled = sample(study, breaks);
    const m = breaks.length - 1;
    const noise = study.parts.map((p) => (p ? ROUNDING_NOISE * p.scales[q] : Infinity));
    // Standard: each arrangement's live fields, summed once for every combination.
    const arranged = arrangements.map((spans) => {
      const out = new Float64Array(FIELDS * m);
      for (const i of spans) if (sampled.parts[i]) addScaled(out, 1, sampled.parts[i]!);
      return out;
    });
    // Full: the sums of the parts that are positive and negative inside each interval.
    let mids: Float64Array[] = [];
    let up: Float64Array | null = null;
    let down: Float64Array | null = null;
    if (pattern === "full" && study.parts.length > 0) {
      mids = midValues(sampled, q);
      up = new Float64Array(FIELDS * m);
      down = new Float64Array(FIELDS * m);
      for (let k = 0; k < m; k++) {
        for (let i = 0; i < sampled.parts.length; i++) {
          const fields = sampled.parts[i];
          const v = mids[i][k];
          if (!fields || Math.abs(v) <= noise[i]) continue;
          const target = v > 0 ? up : down;
          for (let f = FIELDS * k; f < FIELDS * (k + 1); f++) target[f] += fields[f];
        }
      }
    }
    let max: Bound | null = null;
    let min: Bound | null = null;
    const offer = (value: number, x: number, combination: string, arrangement: string, sense: 1 | -1): void => {
      if (sense === 1 && (max === null || value > max.value)) max = { value, x, combination, arrangement };
      if (sense === -1 && (min === null || value < min.value)) min = { value, x, combination, arrangement };
    };
    for (const combination of study.combinations) {
      const fixed = fixedFields(sampled, combination.factors);
      const scale = scaleOfSum(study, combination, q);
      const f = combination.live;
      const both = (fields: Float64Array, arrangement: string): void => {
        const [high, low] = peaksOf(breaks, fields, sampled.flexibility, q, [1, -1], scale, sampled.shearFlexibility);
        offer(cleanZero(high.value, scale), high.x, combination.name, arrangement, 1);
        offer(cleanZero(low.value, scale), low.x, combination.name, arrangement, -1);
      };
      if (f === 0 || pattern === "none") {
        both(fixed, "");
      } else if (pattern === "standard") {
        arranged.forEach((live, a) => {
          const total = fixed.slice();
          addScaled(total, f, live);
          both(total, names[a]);
        });
      } else if (up && down) {
        for (const sense of [1, -1] as const) {
          // f * part has the sense sought where the part has the sign sense * sign(f).
          const total = fixed.slice();
          addScaled(total, f, sense * f > 0 ? up : down);
          const [peak] = peaksOf(breaks, total, sampled.flexibility, q, [sense], scale, sampled.shearFlexibility);
          const spans = governingSpans(
            mids.map((v) => v[peak.interval]),
            f,
            sense,
            noise,
          );
          offer(cleanZero(peak.value, scale), peak.x, combination.name, describeArrangement(spans), sense);
        }
      } else {
        both(fixed, describeArrangement([]));
      }
    }
    return { quantity: q, max: max!, min: min! };
  });
}
