/**
 * Formula text as a saved workbook stores it: SPAN calls in the add-in function form
 * `_xldudf_SPAN_MOMENT(...)` (the host writes JavaScript custom functions with this prefix and
 * the namespace dot as `_`), and `A1#` as `_xlfn.ANCHORARRAY(A1)`. The inverse of the
 * engine's normalizeFormula for what the demo uses.
 */
import { mapCode, SPILL } from "../engine";

export function toSavedForm(formula: string): string {
  return mapCode(formula, (code) =>
    code.replace(/\bSPAN\.([A-Za-z]+)\s*\(/g, (_whole, name: string) => `_xldudf_SPAN_${name.toUpperCase()}(`).replace(SPILL, "_xlfn.ANCHORARRAY($1)"),
  );
}
