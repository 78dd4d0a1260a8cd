/**
 * Units as the pane shows them. They come from one place only: the formula's `units`
 * argument, read by the sheet layer's own reader (readMemberUnits). Without one, the member is
 * in consistent units the pane cannot know, so every quantity is shown without a unit. The
 * pane never guesses units from text near the cells and never relabels numbers.
 *
 * The pane solves the member in the length and force units the formula names (only EI is
 * converted, see memberInOwnUnits), so x, V and M come out in those units; deflection comes out
 * in the length unit and is multiplied by `deflectionFactor` into the formula's deflection unit.
 */
import type { MemberUnits } from "../sheet";

export interface Units {
  /** Length unit of the spans and of every x, e.g. "ft"; "" without a units argument. */
  length: string;
  /** Force unit of the loads, e.g. "kip"; "" without a units argument. */
  force: string;
  /** Deflection unit of the results (the formula's deflection key, default the length unit). */
  deflection: string;
  /** Multiplies a deflection in the length unit into the deflection unit (1 without units). */
  deflectionFactor: number;
}

/** No units argument: quantities without units. */
export const NO_UNITS: Units = { length: "", force: "", deflection: "", deflectionFactor: 1 };

/** The pane's units from the units argument as the sheet layer read it (null = none given). */
export function paneUnits(units: MemberUnits | null): Units {
  if (units === null) return NO_UNITS;
  return {
    length: units.length.text,
    force: units.force.text,
    deflection: units.deflection.text,
    deflectionFactor: units.length.factor / units.deflection.factor,
  };
}

/** The unit labels of a member: deflection defaults to the length unit, as in the units argument. */
export type UnitLabels = Pick<Units, "length" | "force"> & { deflection?: string };

/** Unit text of each quantity shown in the pane. */
export function quantityUnits(units: UnitLabels): { x: string; shear: string; moment: string; slope: string; deflection: string; intensity: string } {
  const moment = units.force && units.length ? `${units.force}·${units.length}` : "";
  const intensity = units.force && units.length ? `${units.force}/${units.length}` : "";
  return { x: units.length, shear: units.force, moment, slope: "rad", deflection: units.deflection ?? units.length, intensity };
}

/** "M (kN·m)" or just "M" when the unit is unknown. */
export function withUnit(name: string, unit: string): string {
  return unit ? `${name} (${unit})` : name;
}
