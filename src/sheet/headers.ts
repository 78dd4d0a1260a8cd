/**
 * The optional headers argument of the tabular functions, and the one definition of each
 * table's columns: a name and the kind of unit it is measured in. With headers the result gets
 * a first row naming each column with its unit from the units argument ("x (ft)",
 * "M (kip*ft)"); without units, just the names. The pane may use the same tables.
 */
import { invalid } from "../core";
import { errorCodeOf, isEmpty, show } from "./cells";
import { singleCell } from "./ranges";
import type { MemberUnits } from "./units";

/** What a column is measured in: a unit of the units argument, or none (labels, counts, ratios). */
export type ColumnUnit = "length" | "force" | "moment" | "slope" | "deflection" | "stress" | "none";

export interface Column {
  name: string;
  unit: ColumnUnit;
}

const col = (name: string, unit: ColumnUnit): Column => ({ name, unit });

/** The unit a quantity of the results is measured in. */
export function unitOfQuantity(quantity: string): ColumnUnit {
  switch (quantity) {
    case "shear":
    case "reaction":
      return "force";
    case "moment":
    case "moment-reaction":
    case "absolute-moment":
      return "moment";
    case "slope":
      return "slope";
    case "deflection":
      return "deflection";
    default:
      return "none";
  }
}

/** The columns of each tabular result, in order. */
export const COLUMNS = {
  reactions: [col("x", "length"), col("R", "force"), col("M reaction", "moment")],
  maxMoment: [col("M", "moment"), col("x", "length")],
  // the max and min columns hold a different quantity on each row: named without a unit
  extremes: [col("quantity", "none"), col("max", "none"), col("x at max", "length"), col("min", "none"), col("x at min", "length")],
  diagram: [col("x", "length"), col("V", "force"), col("M", "moment"), col("slope", "slope"), col("deflection", "deflection")],
  envelope: (quantity: string): Column[] => [
    col("x", "length"),
    col(`max ${quantity}`, unitOfQuantity(quantity)),
    col("max governed by", "none"),
    col(`min ${quantity}`, unitOfQuantity(quantity)),
    col("min governed by", "none"),
  ],
  peaks: [
    col("quantity", "none"),
    col("max", "none"),
    col("x at max", "length"),
    col("max governed by", "none"),
    col("min", "none"),
    col("x at min", "length"),
    col("min governed by", "none"),
  ],
  moving: (effect: string): Column[] => [col("bound", "none"), col(effect.replace("-", " "), unitOfQuantity(effect)), col("first axle x", "length"), col("direction", "none"), col("x measured", "length")],
  spanPeaks: [
    col("span", "none"),
    col("length", "length"),
    col("max M", "moment"),
    col("x at max M", "length"),
    col("min M", "moment"),
    col("x at min M", "length"),
    col("max |V|", "force"),
    col("x at max |V|", "length"),
    col("max |deflection|", "deflection"),
    col("x at max |deflection|", "length"),
  ],
  caseReactions: (cases: string[], combo: string | null, kind: "force" | "moment"): Column[] => [
    col("x", "length"),
    ...cases.map((c) => col(c === "" ? "unlabelled" : c, kind)),
    ...(combo === null ? [] : [col(combo, kind)]),
  ],
  stress: [col("fibre", "none"), col("max stress", "stress"), col("x at max", "length"), col("min stress", "stress"), col("x at min", "length")],
  shearStress: [col("stress", "none"), col("value", "stress"), col("x", "length")],
  deflectionCheck: [
    col("span", "none"),
    col("length", "length"),
    col("deflection", "deflection"),
    col("x", "length"),
    col("span/deflection", "none"),
    col("limit", "none"),
    col("result", "none"),
  ],
  // frequencies are in Hz and rad/s whatever the units argument
  frequencies: [col("mode", "none"), col("frequency (Hz)", "none"), col("circular frequency (rad/s)", "none")],
} as const;

/** The label of a unit kind in the given units (null: none). */
function unitText(unit: ColumnUnit, units: MemberUnits | null): string | null {
  if (unit === "slope") return "rad";
  if (units === null || unit === "none") return null;
  switch (unit) {
    case "length":
      return units.length.text;
    case "force":
      return units.force.text;
    case "moment":
      return `${units.force.text}*${units.length.text}`;
    case "deflection":
      return units.deflection.text;
    case "stress":
      return units.stress.text;
  }
}

/** The header row: each column's name, with its unit in brackets when there is one. */
export function headerRow(columns: readonly Column[], units: MemberUnits | null): string[] {
  return columns.map((c) => {
    const text = unitText(c.unit, units);
    return text === null ? c.name : `${c.name} (${text})`;
  });
}

const YES = new Set(["yes", "true", "y", "1"]);
const NO = new Set(["no", "false", "n", "0"]);

/** Reads the headers argument: blank, FALSE, 0 or "no" = none; TRUE, 1 or "yes" = a header row. */
export function readHeaders(arg: unknown): boolean {
  if (arg === null || arg === undefined) return false;
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("headers: give one cell: TRUE (or 1, yes) for a header row, blank or FALSE for none");
  if (isEmpty(cell)) return false;
  if (typeof cell === "boolean") return cell;
  if (cell === 1 || cell === 0) return cell === 1;
  if (typeof cell === "string" && errorCodeOf(cell) === null) {
    const word = cell.trim().toLowerCase();
    if (YES.has(word)) return true;
    if (NO.has(word)) return false;
  }
  throw invalid(`headers: ${show(cell)} is not TRUE or FALSE; write TRUE (or 1, yes) for a header row, blank or FALSE for none`);
}

/** The rows with the header row on top when asked for. */
export function withHeaders<T>(rows: T[][], headers: boolean, columns: readonly Column[], units: MemberUnits | null): (T | string)[][] {
  return headers ? [headerRow(columns, units), ...rows] : rows;
}
