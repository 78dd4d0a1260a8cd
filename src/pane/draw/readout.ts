/** The values under the pointer: x from the pixel, then V, M, slope and deflection there. Pure. */
import { valueAt, type Solution } from "../../core";
import type { UnitLabels } from "../units";
import { quantityUnits } from "../units";
import { withUnitValue } from "./format";
import type { Layout } from "./layout";

export interface Readout {
  x: number;
  shear: number;
  moment: number;
  slope: number | undefined;
  deflection: number | undefined;
}

/** x under a pixel column, clamped to the member. */
export function xAtPixel(layout: Layout, px: number): number {
  const [lo, hi] = layout.x.domain();
  return Math.min(hi, Math.max(lo, layout.x.invert(px)));
}

/** The values at x; deflection multiplied by `deflectionFactor` into the deflection unit. */
export function readoutAt(solution: Solution, x: number, deflectionFactor = 1): Readout {
  const stiff = solution.hasStiffness;
  return {
    x,
    shear: valueAt(solution, "shear", x),
    moment: valueAt(solution, "moment", x),
    slope: stiff ? valueAt(solution, "slope", x) : undefined,
    deflection: stiff ? valueAt(solution, "deflection", x) * deflectionFactor : undefined,
  };
}

/** The readout as labelled pieces of text, in display order. */
export function readoutText(readout: Readout, units: UnitLabels): [string, string][] {
  const u = quantityUnits(units);
  const out: [string, string][] = [
    ["x", withUnitValue(readout.x, u.x)],
    ["V", withUnitValue(readout.shear, u.shear)],
    ["M", withUnitValue(readout.moment, u.moment)],
  ];
  if (readout.slope !== undefined) out.push(["slope", withUnitValue(readout.slope, u.slope)]);
  if (readout.deflection !== undefined) out.push(["deflection", withUnitValue(readout.deflection, u.deflection)]);
  return out;
}
