/**
 * Peaks of each span: the largest and smallest moment, the largest shear by magnitude and
 * (with EI) the largest deflection by magnitude, each with its x, from the exact polynomial
 * pieces of that span alone (both ends included, so a support's hogging moment is the
 * smallest moment of both spans beside it, and both sides of every jump inside the span).
 */
import { extremes } from "./extremes";
import type { Extreme, Quantity, Solution } from "./model";
import { spanRuns, withPieces } from "./spanRuns";
import { RELATIVE_ZERO } from "./tolerance";

/** One span's peaks. Values in the solution's units; x from the member's left end. */
export interface SpanPeak {
  /** 1-based span number. */
  span: number;
  length: number;
  momentMax: number;
  xMomentMax: number;
  momentMin: number;
  xMomentMin: number;
  /** The shear of largest magnitude (signed) and where. */
  shear: number;
  xShear: number;
  /** The deflection of largest magnitude (signed, down +) and where; NaN without EI. */
  deflection: number;
  xDeflection: number;
}

/**
 * The signed value of largest magnitude and its x. When the largest and the smallest have
 * the same magnitude to rounding, the one at the smaller x is taken (then the larger value).
 */
export function signedPeak(e: Extreme): { value: number; x: number } {
  const size = Math.max(Math.abs(e.max), Math.abs(e.min));
  const tol = 64 * RELATIVE_ZERO * size;
  const maxIsPeak = Math.abs(e.max) >= size - tol;
  const minIsPeak = Math.abs(e.min) >= size - tol;
  if (maxIsPeak && (!minIsPeak || e.xMax <= e.xMin)) return { value: e.max, x: e.xMax };
  return { value: e.min, x: e.xMin };
}

/** The solution restricted to span `index` (0-based): its own pieces only (spanRuns' rule). */
export function spanSolution(solution: Solution, index: number): Solution {
  const runs = spanRuns(solution);
  return withPieces(solution, runs[index], runs[index + 1]);
}

/** The peaks of every span, left to right (the pieces are swept once: linear in their number). */
export function spanPeaks(solution: Solution): SpanPeak[] {
  const out: SpanPeak[] = [];
  const runs = spanRuns(solution);
  for (let i = 0; i + 1 < solution.nodeX.length; i++) {
    const span = withPieces(solution, runs[i], runs[i + 1]);
    const of = (quantity: Quantity) => extremes(span, quantity);
    const moment = of("moment");
    const shear = signedPeak(of("shear"));
    const deflection = solution.hasStiffness ? signedPeak(of("deflection")) : { value: NaN, x: NaN };
    out.push({
      span: i + 1,
      length: solution.nodeX[i + 1] - solution.nodeX[i],
      momentMax: moment.max,
      xMomentMax: moment.xMax,
      momentMin: moment.min,
      xMomentMin: moment.xMin,
      shear: shear.value,
      xShear: shear.x,
      deflection: deflection.value,
      xDeflection: deflection.x,
    });
  }
  return out;
}
