/**
 * SPAN.SPANPEAKS and SPAN.CASEREACTIONS bodies: results per span and per load case, read
 * with the same member readers, units and combination rules as the analysis functions.
 */
import { caseReactions, invalid, spanPeaks } from "../core";
import { errorCodeOf, isBlank, show } from "./cells";
import { COLUMNS, readHeaders, withHeaders } from "./headers";
import { guarded } from "./hostError";
import { readComboText, readMember } from "./member";
import { singleCell } from "./ranges";
import { finite, orBlank } from "./shape";
import { memberInOwnUnits, readMemberUnits } from "./units";
import { memberArgs, outputScale, solvedMember, solvedWithScale } from "./worksheet";

/** SPAN.SPANPEAKS: one row per span [span, length, M max, x, M min, x, V, x, deflection, x]; deflection "" without EI. */
export function sheetSpanPeaks(
  spans: unknown,
  loads: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units?: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, scale, units: given } = solvedWithScale(memberArgs(spans, loads, supports, EI, combo, units));
    const rows = spanPeaks(solution).map((p) => {
      const what = (q: string) => `span ${p.span}'s ${q}`;
      return [
        p.span,
        p.length / scale.length,
        finite(p.momentMax / scale.moment, what("largest moment")),
        p.xMomentMax / scale.length,
        finite(p.momentMin / scale.moment, what("smallest moment")),
        p.xMomentMin / scale.length,
        finite(p.shear / scale.force, what("largest shear")),
        p.xShear / scale.length,
        orBlank(p.deflection / scale.deflection),
        orBlank(p.xDeflection / scale.length),
      ];
    });
    return withHeaders(rows, header, COLUMNS.spanPeaks, given);
  });
}

/** Which reaction CASEREACTIONS reports: blank or "vertical" (force, up +), or "moment" (counter-clockwise +). */
export function readReactionKind(arg: unknown): "force" | "moment" {
  const cell = singleCell(arg ?? null);
  if (cell === undefined) throw invalid("reaction: give one cell, vertical or moment");
  if (isBlank(cell)) return "force";
  const code = errorCodeOf(cell);
  if (code !== null) throw invalid(`reaction: the cell holds the error ${code}`);
  const word = typeof cell === "string" ? cell.trim().toLowerCase() : "";
  if (word === "vertical" || word === "force") return "force";
  if (word === "moment") return "moment";
  throw invalid(`reaction: ${show(cell)} is not a reaction; write vertical (the default) or moment`);
}

/**
 * SPAN.CASEREACTIONS: one row per node [x, reaction of each case (unfactored, in the order the
 * loads first use the labels), then the combination's reaction when combo is given].
 */
export function sheetCaseReactions(
  spans: unknown,
  loads: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units: unknown,
  reaction: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const kind = readReactionKind(reaction);
    const header = readHeaders(headers);
    const args = memberArgs(spans, loads, supports, EI, combo, units);
    const given = readMemberUnits(args.units);
    const scale = outputScale(given);
    const member = readMember({ ...args, combo: null });
    const withCombo = readComboText(args.combo) !== "";
    const { cases, reactions } = caseReactions(given === null ? member : memberInOwnUnits(member, given), withCombo);
    const combined = withCombo ? solvedMember(args, given).reactions : null;
    const unit = kind === "force" ? scale.force : scale.moment;
    const what = kind === "force" ? "a vertical reaction" : "a moment reaction";
    const rows = reactions[0].map((node, i) => {
      const row = [node.x / scale.length];
      for (const byCase of reactions) row.push(finite(byCase[i][kind] / unit, what));
      if (combined !== null) row.push(finite(combined[i][kind] / unit, what));
      return row;
    });
    const columns = COLUMNS.caseReactions(cases, withCombo ? readComboText(args.combo) : null, kind === "force" ? "force" : "moment");
    return withHeaders(rows, header, columns, given);
  });
}
