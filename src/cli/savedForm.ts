/**
 * Formula text as a saved workbook stores it: SPAN calls in the add-in function form
 * `_xldudf_SPAN_MOMENT(...)` (the host writes JavaScript custom functions with this prefix and
 * the namespace dot as `_`; OfficeDev/Excel-Custom-Functions#108), `A1#` as
 * `_xlfn.ANCHORARRAY(A1)`, and functions newer than the 2007 file format with `_xlfn.`
 * (`_xlfn._xlws.` for SORT and FILTER), as the host writes them. The inverse of the engine's
 * normalizeFormula.
 */
import { mapCode, SPILL } from "../engine";

/** Built-ins the host saves with a prefix (the ones a Spanwise workbook is likely to use). */
const NEWER = ["SEQUENCE", "UNIQUE", "SORTBY", "XLOOKUP", "XMATCH", "RANDARRAY", "LET", "LAMBDA", "TEXTJOIN", "CONCAT", "IFS", "SWITCH", "MAXIFS", "MINIFS", "TAKE", "DROP", "VSTACK", "HSTACK", "CHOOSEROWS", "CHOOSECOLS", "TOCOL", "TOROW", "EXPAND", "SINGLE"];
const WORKSHEET_ONLY = ["SORT", "FILTER"];

export function toSavedForm(formula: string): string {
  return mapCode(formula, (code) =>
    code
      .replace(/\bSPAN\.([A-Za-z]+)\s*\(/g, (_whole, name: string) => `_xldudf_SPAN_${name.toUpperCase()}(`)
      .replace(SPILL, "$1_xlfn.ANCHORARRAY($2)")
      .replace(new RegExp(String.raw`(?<![\w.])(${NEWER.join("|")})\s*\(`, "gi"), (_whole, name: string) => `_xlfn.${name.toUpperCase()}(`)
      .replace(new RegExp(String.raw`(?<![\w.])(${WORKSHEET_ONLY.join("|")})\s*\(`, "gi"), (_whole, name: string) => `_xlfn._xlws.${name.toUpperCase()}(`),
  );
}
