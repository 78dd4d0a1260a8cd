/**
 * Units as the user labels them: the pane never converts, it only shows the user's own unit
 * names, guessed from labels such as "Spans (m)" or "EI (kN·m²)" and editable in the pane.
 */

export interface Units {
  /** Length unit of the spans and of every x, e.g. "m". */
  length: string;
  /** Force unit of the loads, e.g. "kN". */
  force: string;
}

/** The text inside the last pair of brackets of a label: "Spans (m)" -> "m". */
export function unitIn(label: unknown): string | undefined {
  if (typeof label !== "string") return undefined;
  const match = /\(([^()]{1,16})\)\s*$/.exec(label.trim()) ?? /\[([^[\]]{1,16})\]\s*$/.exec(label.trim());
  return match ? match[1].trim() : undefined;
}

/** The force unit inside a stiffness unit ("kN·m²", "kip*in^2", "N mm2") or a line-load unit ("kN/m"). */
export function forceFromStiffness(unit: string): string | undefined {
  const match = /^(.+?)\s*[·*.\-\u22C5 ]\s*[A-Za-z]+\s*(?:²|\^2|2)$/.exec(unit.trim());
  return match ? match[1].trim() : undefined;
}

export function forceFromLineLoad(unit: string): string | undefined {
  const match = /^(.+?)\s*\/\s*[A-Za-z]+$/.exec(unit.trim());
  return match ? match[1].trim() : undefined;
}

/** Units from the labels found near the member's inputs; blanks where nothing tells. */
export function guessUnits(labels: { spans: unknown[]; EI: unknown[]; loads: unknown[] }): Units {
  const first = <T>(values: unknown[], pick: (unit: string) => T | undefined): T | undefined => {
    for (const value of values) {
      const unit = unitIn(value);
      const picked = unit === undefined ? undefined : pick(unit);
      if (picked !== undefined) return picked;
    }
    return undefined;
  };
  const length = first(labels.spans, (unit) => unit) ?? "";
  const force =
    first(labels.EI, forceFromStiffness) ??
    first(labels.loads, (unit) => forceFromLineLoad(unit) ?? (/^[A-Za-z]+$/.test(unit) ? unit : undefined)) ??
    "";
  return { length, force };
}

/** Unit text of each quantity shown in the pane. */
export function quantityUnits(units: Units): { x: string; shear: string; moment: string; slope: string; deflection: string; intensity: string } {
  const moment = units.force && units.length ? `${units.force}·${units.length}` : "";
  const intensity = units.force && units.length ? `${units.force}/${units.length}` : "";
  return { x: units.length, shear: units.force, moment, slope: "rad", deflection: units.length, intensity };
}

/** "M (kN·m)" or just "M" when the unit is unknown. */
export function withUnit(name: string, unit: string): string {
  return unit ? `${name} (${unit})` : name;
}
