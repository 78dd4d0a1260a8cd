/**
 * The member calculation report of a SPAN cell, as one PrintDocument (src/report): the CLI
 * (`spanwise report`) and the pane build it here alike, then render it to HTML or PDF. The
 * member is read and solved exactly as the pane draws it (solveMember: the sheet layer's own
 * rules), once with every load at factor 1 for the load table and case reactions, once under
 * the cell's combination; a cell the worksheet functions refuse is refused with their message.
 */
import type { PrintDocument } from "../report/document";
import { memberDocument } from "../report/memberDocument";
import type { BuildInfo } from "../report/meta";
import type { TitleBlock } from "../report/titleBlock";
import { qualify } from "./host";
import { solveMember, type ResolvedMember } from "./memberFromSheet";
import type { MemberChecks } from "./reportChecks";

export interface ReportRequest {
  member: ResolvedMember;
  /** The cell's formula as shown. */
  formula: string;
  title: TitleBlock;
  checks?: MemberChecks;
}

/** The report, or why the cell has none (message names the cell). */
export function memberReport(request: ReportRequest, info: BuildInfo): PrintDocument | { error: string } {
  const { member } = request;
  const at = qualify(member.sheet, member.cell);
  if (member.kind !== "member") {
    const what = member.kind === "peaks" ? "an envelope of peaks" : `a ${member.kind} study`;
    return { error: `${at}: the report covers member cells (REACTIONS, SHEAR, MOMENT, ..., DIAGRAM, the checks); this cell computes ${what}` };
  }
  const plain = solveMember(member, "");
  const factored = solveMember(member);
  if ("error" in factored) return { error: `${at}: ${factored.error}` };
  if ("error" in plain) return { error: `${at}: ${plain.error}` };
  return memberDocument(
    {
      title: request.title,
      cell: at,
      formula: request.formula,
      units: member.units,
      member: plain.member,
      combo: factored.comboText,
      factored: { member: factored.member, solution: factored.solution },
      checks: request.checks?.checks,
      section: request.checks?.section,
    },
    info,
  );
}
