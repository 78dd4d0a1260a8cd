/**
 * Checks of a solved member against values the engineer states: extreme-fibre bending
 * stress M/S, shear stress (average V/A and peak V Q/(I t)), deflection as span/deflection
 * against a stated limit such as L/360, and utilisation = demand/capacity. These are
 * arithmetic on the engineer's numbers, not code design: the governing code and a qualified
 * engineer decide which limits and capacities apply.
 *
 * Stress signs: tension +, compression -. Sagging moment (+) compresses the top fibre.
 */
import { invalid } from "./errors";
import { extremes } from "./extremes";
import type { Extreme, Solution } from "./model";
import { spanRuns, withPieces } from "./spanRuns";

function positive(value: number, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw invalid(`${what} must be a positive number, got ${value}`);
}

/** Extreme-fibre bending stress M/S (S > 0). */
export function bendingStress(moment: number, modulus: number): number {
  positive(modulus, "the section modulus S");
  return moment / modulus;
}

/** Average shear stress V/A (A > 0). */
export function averageShearStress(shear: number, area: number): number {
  positive(area, "the area A");
  return shear / area;
}

/** Peak shear stress V Q/(I t), Q the first moment about the neutral axis of the area beyond the point, t the width there. */
export function peakShearStress(shear: number, firstMoment: number, inertia: number, width: number): number {
  positive(firstMoment, "the first moment Q");
  positive(inertia, "the second moment I");
  positive(width, "the width t");
  return (shear * firstMoment) / (inertia * width);
}

/** Stresses at one fibre: largest (most tensile) and smallest (most compressive), with x. */
export interface FibreStress {
  fibre: "top" | "bottom";
  max: number;
  xMax: number;
  min: number;
  xMin: number;
}

/**
 * Top and bottom fibre stresses from the member's moment extremes (tension +): the top fibre
 * carries -M/S top, the bottom fibre +M/S bottom.
 */
export function fibreStresses(moment: Extreme, topModulus: number, bottomModulus: number): FibreStress[] {
  positive(topModulus, "the top section modulus S");
  positive(bottomModulus, "the bottom section modulus S");
  const zero = (v: number) => (v === 0 ? 0 : v);
  return [
    { fibre: "top", max: zero(-moment.min / topModulus), xMax: moment.xMin, min: zero(-moment.max / topModulus), xMin: moment.xMax },
    { fibre: "bottom", max: zero(moment.max / bottomModulus), xMax: moment.xMax, min: zero(moment.min / bottomModulus), xMin: moment.xMin },
  ];
}

/** The largest magnitude of an extreme, signed, with its x. */
export function largestMagnitude(e: Extreme): { value: number; x: number } {
  return Math.abs(e.min) > Math.abs(e.max) ? { value: e.min, x: e.xMin } : { value: e.max, x: e.xMax };
}

const LIMIT_TEXT = /^(?:(?:l|span)\s*\/\s*)?(\d+(?:\.\d*)?|\.\d+)$/i;

/** Reads a deflection limit written 360, "360", "L/360" or "span/360": the divisor (> 1). */
export function parseDeflectionLimit(limit: number | string, name: string): number {
  let divisor: number;
  if (typeof limit === "number") divisor = limit;
  else {
    const match = LIMIT_TEXT.exec(limit.trim());
    if (!match) throw invalid(`${name}: "${limit}" is not a deflection limit; write it as L/360, span/360 or 360`);
    divisor = Number(match[1]);
  }
  if (!(Number.isFinite(divisor) && divisor > 1)) throw invalid(`${name}: the limit's divisor must be a number above 1 (as in L/360), got ${divisor}`);
  return divisor;
}

/** span / |deflection|: Infinity when the deflection is 0. */
export function deflectionRatio(span: number, deflection: number): number {
  positive(span, "the span");
  return deflection === 0 ? Infinity : span / Math.abs(deflection);
}

/** One span's deflection check. */
export interface SpanDeflection {
  /** 1-based span number. */
  span: number;
  length: number;
  /** The largest deflection in the span by magnitude (down +), and where. */
  deflection: number;
  x: number;
  /** length / |deflection| (Infinity when it is 0). */
  ratio: number;
  /** The stated limit's divisor: the check asks ratio >= limit, i.e. |deflection| <= length / limit. */
  limit: number;
  pass: boolean;
}

/**
 * Largest deflection (by magnitude, measured from the undeflected axis) in each span, as
 * span/deflection against each span's stated limit divisor (one for all spans, or one per span).
 */
export function spanDeflections(solution: Solution, limits: number[]): SpanDeflection[] {
  const spanCount = solution.nodeX.length - 1;
  if (limits.length !== 1 && limits.length !== spanCount) {
    throw invalid(`limit: give one limit for the member or one per span (${spanCount}), got ${limits.length}`);
  }
  const out: SpanDeflection[] = [];
  const runs = spanRuns(solution);
  for (let i = 0; i < spanCount; i++) {
    const peak = largestMagnitude(extremes(withPieces(solution, runs[i], runs[i + 1]), "deflection"));
    const length = solution.nodeX[i + 1] - solution.nodeX[i];
    const limit = limits.length === 1 ? limits[0] : limits[i];
    const ratio = deflectionRatio(length, peak.value);
    out.push({ span: i + 1, length, deflection: peak.value, x: peak.x, ratio, limit, pass: ratio >= limit });
  }
  return out;
}

/** Utilisation |demand| / capacity (capacity > 0): at most 1 passes. */
export function utilisation(demand: number, capacity: number): number {
  if (!Number.isFinite(demand)) throw invalid(`the demand must be a finite number, got ${demand}`);
  positive(capacity, "the capacity");
  return Math.abs(demand) / capacity;
}
