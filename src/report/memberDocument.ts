/**
 * The member calculation report as a PrintDocument: title block, the member (definition and
 * dimensioned sketch), the load table by case, the combination, reactions by case and factored,
 * per-span peaks with x, and the shear, moment and deflection diagrams on a shared axis.
 * Pure: the member (unfactored, loads labelled by case) and the factored solve come in; case
 * reactions, peaks and diagram stations are computed here with the core.
 */
import { caseReactions, diagram, spanPeaks, type Member, type Reaction, type Solution } from "../core";
import { memberLines, short } from "./describe";
import type { Block, PrintDocument } from "./document";
import { diagramPanels, FIGURE_WIDTH, memberSketch } from "./figures";
import { CAUTION, footerLines, type BuildInfo } from "./meta";
import { TITLE_FIELDS, type TitleBlock } from "./titleBlock";

export interface MemberReportInput {
  title: TitleBlock;
  /** Sheet-qualified cell of the SPAN formula, and its text. */
  cell: string;
  formula: string;
  units: { length: string; force: string; deflection: string; deflectionFactor: number };
  /** The member with every load at factor 1 (the load table). */
  member: Member;
  /** The combination the formula applies ("" = every load at factor 1). */
  combo: string;
  /** The member and solution under that combination. */
  factored: { member: Member; solution: Solution };
  /** Checks the workbook computes for this member, in sheet order; none when it computes none. */
  checks?: ReportCheck[];
  /** The section, when a check names one from SPAN.SECTION. */
  section?: ReportSection;
}

/**
 * A check the workbook computes for this member (SPAN.STRESS, SPAN.SHEARSTRESS,
 * SPAN.DEFLECTIONCHECK, SPAN.UTILISATION), as that cell computes it with its own arguments.
 */
export interface ReportCheck {
  /** Sheet-qualified cell of the check's formula, its function and its text. */
  cell: string;
  fn: string;
  formula: string;
  columns: string[];
  rows: string[][];
  /** Per row: true where the row fails (a "fail" verdict, a utilisation above 1). */
  failing?: boolean[];
  /** Set when the check's cell errors: its code and message (then rows is empty). */
  error?: string;
}

/** The section a check uses when it is a SPAN.SECTION result: its cell, formula and rows (property, value, unit). */
export interface ReportSection {
  cell: string;
  formula: string;
  rows: string[][];
}

/** Stations of the printed diagrams (the peaks are added to them by the core's diagram). */
export const REPORT_POINTS = 201;

function unitText(u: string): string {
  return u ? ` (${u})` : "";
}

export function memberDocument(input: MemberReportInput, info: BuildInfo): PrintDocument {
  const { member, factored, units, title } = input;
  const mark = title.mark || input.cell;
  const len = units.length;
  const force = units.force;
  const moment = force && len ? `${force}·${len}` : "";
  const blocks: Block[] = [
    { kind: "heading", level: 1, text: `Member calculation: ${mark}` },
    { kind: "text", tone: "caution", text: CAUTION },
    {
      kind: "table",
      columns: ["Title block", "", "", ""],
      widths: [1, 2, 1, 2],
      rows: pairs(TITLE_FIELDS.map(([k, label]) => [label, k === "mark" ? mark : title[k]])),
    },
    { kind: "heading", level: 2, text: "Member" },
    { kind: "text", text: `From ${input.cell}: ${input.formula}` },
    ...memberLines(member).slice(0, 3).map((text): Block => ({ kind: "text", text })),
    { kind: "text", tone: "muted", text: `Units: length ${len || "as entered"}, force ${force || "as entered"}; results are in the workbook's own units.` },
  ];
  const sketch = memberSketch(member, len);
  blocks.push({ kind: "figure", width: FIGURE_WIDTH, height: sketch.height, shapes: sketch.shapes, caption: "Member sketch: supports numbered left to right, span lengths dimensioned; loads by case above the beam (not to scale)." });

  blocks.push({ kind: "heading", level: 2, text: "Loads by case" });
  blocks.push({
    kind: "table",
    columns: ["Row", "Case", "Kind", `Magnitude${unitText(force)}`, "End magnitude", `x start${unitText(len)}`, `x end${unitText(len)}`],
    align: ["right", "left", "left", "right", "right", "right", "right"],
    rows: member.loads.map((l) => [String(l.row), l.loadCase || "(none)", l.kind, short(l.magnitude, 6), l.kind === "linear" ? short(l.magnitudeEnd, 6) : "", short(l.xStart, 6), l.kind === "point" || l.kind === "moment" ? "" : short(l.xEnd, 6)]),
  });
  blocks.push({ kind: "heading", level: 2, text: "Combination" });
  blocks.push({ kind: "text", text: input.combo ? `Factored results use ${input.combo}.` : "Factored results use every load at factor 1 (the formula gives no combination)." });

  const byCase = member.loads.length ? caseReactions(member) : { cases: [], reactions: [] as Reaction[][] };
  const solution = factored.solution;
  const anyMoment = solution.reactions.some((r) => r.moment !== 0) || byCase.reactions.some((rs) => rs.some((r) => r.moment !== 0));
  const supported = solution.reactions.map((_, i) => i).filter((i) => member.supports[i]?.kind !== "free" && member.supports[i]?.kind !== "hinge");
  blocks.push({ kind: "heading", level: 2, text: "Reactions (upward +)" });
  const caseNames = byCase.cases.map((c) => c || "(none)");
  blocks.push({
    kind: "table",
    columns: ["Support", `x${unitText(len)}`, ...caseNames.map((c) => `${c}${unitText(force)}`), `Factored${unitText(force)}`],
    align: ["left", "right", ...caseNames.map(() => "right" as const), "right"],
    rows: supported.map((i) => [`${i + 1} (${member.supports[i].kind})`, short(solution.reactions[i].x, 6), ...byCase.reactions.map((rs) => short(rs[i].force)), short(solution.reactions[i].force)]),
  });
  if (anyMoment) {
    blocks.push({
      kind: "table",
      columns: ["Support", "Moment reaction", ...caseNames.map((c) => `${c}${unitText(moment)}`), `Factored${unitText(moment)}`],
      align: ["left", "left", ...caseNames.map(() => "right" as const), "right"],
      rows: supported.map((i) => [`${i + 1} (${member.supports[i].kind})`, "", ...byCase.reactions.map((rs) => short(rs[i].moment)), short(solution.reactions[i].moment)]),
    });
  }

  const peaks = spanPeaks(solution);
  const dFactor = units.deflectionFactor;
  const hasEI = solution.hasStiffness;
  blocks.push({ kind: "heading", level: 2, text: `Per-span peaks, factored${input.combo ? ` (${input.combo})` : ""}` });
  blocks.push({
    kind: "table",
    columns: ["Span", `Max moment${unitText(moment)}`, "at x", `Min moment${unitText(moment)}`, "at x", `Shear${unitText(force)}`, "at x", `Deflection${unitText(units.deflection)}`, "at x"],
    align: ["left", "right", "right", "right", "right", "right", "right", "right", "right"],
    rows: peaks.map((p) => [
      String(p.span),
      short(p.momentMax),
      short(p.xMomentMax),
      short(p.momentMin),
      short(p.xMomentMin),
      short(p.shear),
      short(p.xShear),
      hasEI ? short(p.deflection * dFactor) : "no EI",
      hasEI ? short(p.xDeflection) : "",
    ]),
  });
  blocks.push({ kind: "text", tone: "muted", text: "Shear is the value of largest magnitude in the span; deflection is down-positive, the value of largest magnitude in the span. x is measured from the member's left end." });

  blocks.push(...checkBlocks(input.checks ?? [], input.section));

  const rows = diagram(solution, REPORT_POINTS);
  const panels = [
    { title: `Shear V${unitText(force)}`, values: rows.map((r) => r.shear) },
    { title: `Bending moment M${unitText(moment)}`, values: rows.map((r) => r.moment) },
    ...(hasEI ? [{ title: `Deflection${unitText(units.deflection)}, down +, drawn downward`, values: rows.map((r) => r.deflection * dFactor), downward: true }] : []),
  ];
  const figure = diagramPanels(rows, panels, solution.nodeX, len);
  blocks.push({ kind: "pageBreak" });
  blocks.push({ kind: "heading", level: 2, text: `Diagrams, factored${input.combo ? ` (${input.combo})` : ""}: ${mark}` });
  blocks.push({ kind: "figure", width: FIGURE_WIDTH, height: figure.height, shapes: figure.shapes, caption: "Shared x axis; dashed lines mark the supports; each diagram's maximum and minimum are marked with value and x." });
  return { title: `Member calculation ${mark}`, footer: footerLines(info, CAUTION), blocks };
}

/** The section and the checks, as the workbook computes them; a sentence when there are none. */
export function checkBlocks(checks: readonly ReportCheck[], section: ReportSection | undefined): Block[] {
  const blocks: Block[] = [];
  if (section) {
    blocks.push({ kind: "heading", level: 2, text: "Section" });
    blocks.push({ kind: "text", text: `From ${section.cell}: ${section.formula}` });
    blocks.push({ kind: "table", columns: ["Property", "Value", "Unit"], widths: [2, 1.4, 1], align: ["left", "right", "left"], rows: section.rows });
  }
  blocks.push({ kind: "heading", level: 2, text: "Checks" });
  if (checks.length === 0) {
    blocks.push({ kind: "text", tone: "muted", text: "The workbook computes no stress, deflection-limit or utilisation check for this member (SPAN.STRESS, SPAN.SHEARSTRESS, SPAN.DEFLECTIONCHECK, SPAN.UTILISATION of its results)." });
    return blocks;
  }
  for (const check of checks) {
    blocks.push({ kind: "heading", level: 3, text: `${check.fn} at ${check.cell}` });
    blocks.push({ kind: "text", text: check.formula });
    if (check.error) {
      blocks.push({ kind: "text", tone: "fail", text: `The cell errors: ${check.error}` });
      continue;
    }
    blocks.push({
      kind: "table",
      columns: check.columns,
      align: check.columns.map((_, i) => (check.rows.every((r) => /^[-+\d.e]*$/i.test(r[i] ?? "")) ? "right" : "left")),
      rows: check.rows,
      tones: check.rows.map((_, i) => (check.failing?.[i] ? "fail" : "normal")),
    });
  }
  blocks.push({ kind: "text", tone: "muted", text: "Each check is computed with its own cell's arguments (its combination may differ from the member cell's). Allowable stresses, deflection limits and capacities are the engineer's, from the governing code." });
  return blocks;
}

function pairs(items: string[][]): string[][] {
  const rows: string[][] = [];
  for (let i = 0; i < items.length; i += 2) rows.push([...items[i], ...(items[i + 1] ?? ["", ""])]);
  return rows;
}
