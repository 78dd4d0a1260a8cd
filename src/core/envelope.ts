import type { Combination } from "./combination";
import { invalid } from "./errors";
import { valueAt } from "./evaluate";
import type { Member, Quantity } from "./model";
import { describeArrangement, governingSpans, standardArrangements, type PatternMode } from "./pattern";
import { checkStudy, prepareStudy, scaleOfSum } from "./superposition";
import { cleanZero, ROUNDING_NOISE } from "./tolerance";

export type { PatternMode } from "./pattern";

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

/**
 * The envelope of shear, moment and deflection (deflection when EI is given) over a list of
 * combinations, at each x: largest and smallest value and the combination (and, with a
 * patterned live case, the loaded spans) that produces it. Every case and every span's live
 * load is solved once and combined by superposition. Pattern "full" searches every subset of
 * spans, none included, exactly: the worst subset at x loads exactly the spans whose live load
 * acts in the sense sought there. Pattern "standard" uses the classical arrangements only.
 */
export function envelope(member: Member, combinations: Combination[], xs: number[], options: EnvelopeOptions = {}): EnvelopeStation[] {
  const pattern = options.pattern ?? "none";
  const liveCase = options.liveCase ?? "L";
  if (combinations.length === 0) throw invalid("envelope: give at least one combination");
  checkStudy("ENVELOPE", member, combinations, pattern, xs.length);
  const study = prepareStudy(member, combinations, pattern, liveCase);
  const quantities = ENVELOPE_QUANTITIES.filter((q) => q !== "deflection" || member.stiffness !== null);
  const arrangements = pattern === "standard" ? standardArrangements(member.spans.length) : [];
  const names = arrangements.map(describeArrangement);
  const { cases, parts } = study;
  const caseValues = new Float64Array(cases.length);
  const partValues = new Float64Array(parts.length);
  const sums = new Float64Array(arrangements.length);
  const scales = new Map(quantities.map((q) => [q, study.combinations.map((c) => scaleOfSum(study, c, q))]));
  const noise = new Map(quantities.map((q) => [q, parts.map((p) => (p ? ROUNDING_NOISE * p.scales[q] : Infinity))]));
  return xs.map((x) => {
    const max: Record<Quantity, Bound | null> = { shear: null, moment: null, slope: null, deflection: null };
    const min: Record<Quantity, Bound | null> = { shear: null, moment: null, slope: null, deflection: null };
    for (const q of quantities) {
      valueAt(study.base, q, x);
      for (let k = 0; k < cases.length; k++) caseValues[k] = valueAt(cases[k], q, x);
      for (let i = 0; i < parts.length; i++) partValues[i] = parts[i] ? valueAt(parts[i]!, q, x) : 0;
      for (let a = 0; a < arrangements.length; a++) {
        let sum = 0;
        for (const i of arrangements[a]) sum += partValues[i];
        sums[a] = sum;
      }
      let high: Bound | null = null;
      let low: Bound | null = null;
      const offer = (value: number, combination: string, arrangement: string): void => {
        if (high === null || value > high.value) high = { value, x, combination, arrangement };
        if (low === null || value < low.value) low = { value, x, combination, arrangement };
      };
      study.combinations.forEach((combination, c) => {
        const scale = scales.get(q)![c];
        let base = 0;
        for (let k = 0; k < cases.length; k++) base += combination.factors[k] * caseValues[k];
        const f = combination.live;
        if (f === 0 || pattern === "none") {
          offer(cleanZero(base, scale), combination.name, "");
          return;
        }
        if (pattern === "full") {
          // The full pattern's rule (governingSpans), summed in place; the spans are listed only for a new bound.
          const spanNoise = noise.get(q)!;
          let up = base;
          let down = base;
          for (let i = 0; i < parts.length; i++) {
            const v = f * partValues[i];
            if (Math.abs(partValues[i]) <= spanNoise[i]) continue;
            if (v > 0) up += v;
            else down += v;
          }
          up = cleanZero(up, scale);
          down = cleanZero(down, scale);
          if (high === null || up > high.value) high = { value: up, x, combination: combination.name, arrangement: describeArrangement(governingSpans(partValues, f, 1, spanNoise)) };
          if (low === null || down < low.value) low = { value: down, x, combination: combination.name, arrangement: describeArrangement(governingSpans(partValues, f, -1, spanNoise)) };
          return;
        }
        for (let a = 0; a < arrangements.length; a++) offer(cleanZero(base + f * sums[a], scale), combination.name, names[a]);
      });
      max[q] = high;
      min[q] = low;
    }
    return { x, max, min };
  });
}

export { governingPeaks } from "./peaks";
export type { GoverningPeak } from "./peaks";
