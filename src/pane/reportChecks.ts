/**
 * The checks a workbook computes for one member, for its calculation report: every
 * SPAN.STRESS, SPAN.SHEARSTRESS and SPAN.DEFLECTIONCHECK cell whose member arguments (spans,
 * loads, supports, EI, units) read the same values as the member's own cell, and every
 * SPAN.UTILISATION cell whose demand is a result of that member (a cell, or inside the result
 * spilled from a cell, whose SPAN formula has the same member). Each check is computed again
 * by the same sheet-layer function the cell calls, with the cell's own arguments read
 * through the host, so the report shows what the cell computes (its error included). A
 * section argument that is a SPAN.SECTION result gives the report's section.
 *
 * The candidates are the workbook's SPAN formula cells as the caller lists them (the CLI
 * from the file, the pane through SheetHost.spanFormulas); at most MAX_CANDIDATES are looked
 * at and at most MAX_CHECKS reported, each limit said in `problems` when reached.
 */
import type { Member } from "../core";
import { describeError, memberInOwnUnits, readMember, readMemberUnits, sheetDeflectionCheck, sheetShearStress, sheetStress, sheetUtilisation } from "../sheet";
import { short } from "../report/describe";
import type { ReportCheck, ReportSection } from "../report/memberDocument";
import { cellText as addressOf, parseBlock } from "./addresses";
import { parseSpanFormula, type SpanCall } from "./formulaRefs";
import { qualify, splitAddress, type FormulaCell, type SheetHost } from "./host";
import { argumentValue, cellKindOf, findMember, type ResolvedMember } from "./memberFromSheet";

export type { FormulaCell } from "./host";

/** SPAN formula cells looked at, at most, and checks reported, at most. */
export const MAX_CANDIDATES = 500;
export const MAX_CHECKS = 30;

/** The member checks and the argument that is not the member's (section or limit). */
const MEMBER_CHECKS: Record<string, { extra: "section" | "limit"; run: (a: Record<string, unknown>) => unknown[][] }> = {
  "SPAN.STRESS": { extra: "section", run: (a) => sheetStress(a.spans, a.loads, a.section, a.supports, a.EI, a.combo, a.units, true) },
  "SPAN.SHEARSTRESS": { extra: "section", run: (a) => sheetShearStress(a.spans, a.loads, a.section, a.supports, a.EI, a.combo, a.units, true) },
  "SPAN.DEFLECTIONCHECK": { extra: "limit", run: (a) => sheetDeflectionCheck(a.spans, a.loads, a.limit, a.supports, a.EI, a.combo, a.units, true) },
};

/**
 * The member a cell's arguments describe, every load at factor 1, with EI in the cell's own
 * force and length units, and those units' factors (1 without a units argument); undefined
 * when the cell's arguments are refused.
 */
function ownMember(m: ResolvedMember): { member: Member; length: number; force: number } | undefined {
  try {
    const units = readMemberUnits(m.args.units ?? null);
    const member = readMember({ ...m.args, combo: "" });
    return units === null ? { member, length: 1, force: 1 } : { member: memberInOwnUnits(member, units), length: units.length.factor, force: units.force.factor };
  } catch {
    return undefined;
  }
}

/**
 * True when both cells describe one member: the same spans, supports, loads and EI once each
 * is read in its own units (a units argument that only adds section or stress units changes
 * nothing), and the same length and force units where both name them (a cell without a
 * units argument is in the member's own consistent units, as the other's). The combination
 * may differ: a check under another combination is still a check of this member.
 */
export function sameMember(a: ResolvedMember, b: ResolvedMember): boolean {
  const p = ownMember(a);
  const q = ownMember(b);
  if (!p || !q) return false;
  const named = a.args.units != null && a.args.units !== "" && b.args.units != null && b.args.units !== "";
  if (named && (p.length !== q.length || p.force !== q.force)) return false;
  return JSON.stringify(p.member) === JSON.stringify(q.member);
}

function cellText(value: unknown): string {
  if (typeof value === "number") return short(value, 6);
  if (value === null || value === undefined) return "";
  return String(value);
}

function inside(address: string, range: string | undefined): boolean {
  if (!range) return false;
  const a = splitAddress(address);
  const r = splitAddress(range);
  if ((a.sheet ?? "").toLowerCase() !== (r.sheet ?? "").toLowerCase()) return false;
  const at = parseBlock(a.address).from;
  const block = parseBlock(r.address);
  return at.row >= block.from.row && at.row <= block.to.row && at.col >= block.from.col && at.col <= block.to.col;
}

async function lookUp(host: SheetHost, cell: FormulaCell): Promise<ResolvedMember | undefined> {
  const found = await findMember(host, { sheet: cell.sheet, cell: cell.cell, formula: cell.formula, value: null, range: cell.cell });
  return found.ok ? found.member : undefined;
}

/** The section a stress check reads, when its argument is a range: the anchor cell and the rows read (property, value, unit). */
async function sectionOf(host: SheetHost, call: SpanCall, sheet: string): Promise<{ cell: string; rows: string[][] } | undefined> {
  const source = call.args.section;
  if (!source || (source.kind !== "range" && source.kind !== "spill" && source.kind !== "name")) return undefined;
  const read = await argumentValue(host, source, sheet).catch(() => undefined);
  if (!read?.range || !Array.isArray(read.value)) return undefined;
  const { sheet: at = sheet, address } = splitAddress(read.range);
  const rows = (read.value as unknown[][]).filter((row) => row.length >= 3 && typeof row[0] === "string" && typeof row[1] === "number");
  return { cell: qualify(at, addressOf(parseBlock(address).from)), rows: rows.map((row) => [cellText(row[0]), cellText(row[1]), cellText(row[2])]) };
}

export interface MemberChecks {
  checks: ReportCheck[];
  section?: ReportSection;
  problems: string[];
}

/** The checks of `member` among the workbook's SPAN formula `cells` (the member's own cell counts when it is a check). */
export async function checksFor(host: SheetHost, member: ResolvedMember, cells: readonly FormulaCell[]): Promise<MemberChecks> {
  const formulas = new Map(cells.map((c) => [qualify(c.sheet, c.cell).toLowerCase(), c.formula]));
  const formulaOf = (address: string): string | undefined => formulas.get(address.toLowerCase());
  const problems: string[] = [];
  const checks: ReportCheck[] = [];
  let section: ReportSection | undefined;
  const own = qualify(member.sheet, member.cell);
  const looked = cells.slice(0, MAX_CANDIDATES);
  if (cells.length > MAX_CANDIDATES) problems.push(`the workbook has more than ${MAX_CANDIDATES} SPAN formulas; only the first ${MAX_CANDIDATES} were searched for checks of this member`);
  /** Cells (and their spills) whose SPAN formula computes this member: where a utilisation's demand may come from. */
  const results: { cell: string; spill: string | undefined }[] = [{ cell: own, spill: await host.spillRange(own).catch(() => undefined) }];
  const utilisations: { at: string; cell: FormulaCell; call: SpanCall }[] = [];
  const add = (check: ReportCheck): void => {
    if (checks.length < MAX_CHECKS) checks.push(check);
    else if (checks.length === MAX_CHECKS && !problems.some((p) => p.startsWith("more than"))) problems.push(`more than ${MAX_CHECKS} checks of this member; the first ${MAX_CHECKS} are reported`);
  };
  for (const cell of looked) {
    const at = qualify(cell.sheet, cell.cell);
    const parsed = parseSpanFormula(cell.formula);
    if (!parsed.ok) continue;
    const call = parsed.call;
    if (call.functionName === "SPAN.UTILISATION") {
      utilisations.push({ at, cell, call });
      continue;
    }
    if (cellKindOf(call) !== "member") continue;
    const other = at === own ? member : await lookUp(host, cell);
    if (!other || !sameMember(member, other)) continue;
    if (at !== own) results.push({ cell: at, spill: await host.spillRange(at).catch(() => undefined) });
    const spec = MEMBER_CHECKS[call.functionName];
    if (!spec) continue;
    const check: ReportCheck = { cell: at, fn: call.functionName, formula: cell.formula, columns: [], rows: [] };
    try {
      const extra = await argumentValue(host, call.args[spec.extra], cell.sheet);
      const table = spec.run({ ...other.args, [spec.extra]: extra.value });
      check.columns = table[0].map(cellText);
      check.rows = table.slice(1).map((row) => row.map(cellText));
      check.failing = table.slice(1).map((row) => row.some((v) => v === "fail"));
      if (spec.extra === "section" && !section) {
        const found = await sectionOf(host, call, cell.sheet);
        const formula = found ? formulaOf(found.cell) : undefined;
        const parsedSection = formula === undefined ? undefined : parseSpanFormula(formula);
        if (found && formula !== undefined && parsedSection?.ok && parsedSection.call.functionName === "SPAN.SECTION") section = { ...found, formula };
      }
    } catch (error) {
      const { code, message } = describeError(error);
      check.error = `${code} ${message}`;
    }
    add(check);
  }
  for (const { at, cell, call } of utilisations) {
    const demand = call.args.demand;
    if (!demand || (demand.kind !== "range" && demand.kind !== "spill" && demand.kind !== "name")) continue;
    let read: { value: unknown; range?: string };
    try {
      read = await argumentValue(host, demand, cell.sheet);
    } catch {
      continue;
    }
    if (!read.range || !results.some((r) => r.cell === qualify(splitAddress(read.range!).sheet ?? cell.sheet, parseBlockTopLeft(read.range!)) || inside(read.range!, r.spill))) continue;
    const check: ReportCheck = { cell: at, fn: call.functionName, formula: cell.formula, columns: ["Demand cell", "Demand", "Capacity", "Utilisation"], rows: [] };
    try {
      const capacity = await argumentValue(host, call.args.capacity, cell.sheet);
      const demandUnit = await argumentValue(host, call.args.demandUnit, cell.sheet);
      const capacityUnit = await argumentValue(host, call.args.capacityUnit, cell.sheet);
      const ratios = sheetUtilisation(read.value, capacity.value, demandUnit.value, capacityUnit.value);
      const demands = (Array.isArray(read.value) ? read.value : [[read.value]]) as unknown[][];
      const capacities = (Array.isArray(capacity.value) ? capacity.value : [[capacity.value]]) as unknown[][];
      const start = parseBlock(splitAddress(read.range).address).from;
      ratios.forEach((row, r) =>
        row.forEach((ratio, c) => {
          const cap = capacities.length === 1 && capacities[0].length === 1 ? capacities[0][0] : capacities[r]?.[c];
          check.rows.push([addressOf({ row: start.row + r, col: start.col + c }), cellText(demands[r]?.[c]), cellText(cap), cellText(ratio)]);
        }),
      );
      const units = [demandUnit.value, capacityUnit.value].filter((u) => typeof u === "string" && u.trim() !== "");
      if (units.length === 2) check.columns = ["Demand cell", `Demand (${units[0]})`, `Capacity (${units[1]})`, "Utilisation"];
      check.failing = ratios.flat().map((v) => typeof v === "number" && v > 1);
    } catch (error) {
      const { code, message } = describeError(error);
      check.error = `${code} ${message}`;
    }
    add(check);
  }
  return { checks, section, problems };
}

function parseBlockTopLeft(range: string): string {
  return addressOf(parseBlock(splitAddress(range).address).from);
}
