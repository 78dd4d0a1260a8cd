/**
 * Putting the diagrams into the sheet: a live DIAGRAM table beside the member and native
 * scatter-line charts over its columns. The cells a table needs are checked first; when any
 * holds something, the caller is asked and nothing is written unless it agrees.
 */
import { blockAt, blockText, parseBlock, type Block } from "./addresses";
import { MEMBER_ARGUMENTS, type ArgSource } from "./formulaRefs";
import { qualify, splitAddress, type CellInput, type ChartRequest, type SheetHost } from "./host";
import type { ResolvedMember } from "./memberFromSheet";
import { quantityUnits, withUnit, type UnitLabels } from "./units";
import { sheetDiagram } from "../sheet";

export const TABLE_COLUMNS = 5;

export interface TablePlan {
  sheet: string;
  /** Header row plus the spilled rows, unqualified ("N3:R128"). */
  block: Block;
  header: string[];
  formula: string;
  /** Rows the DIAGRAM formula spills into. */
  rows: number;
}

function argText(source: ArgSource): string {
  return source.kind === "omitted" ? "" : source.text;
}

function quoted(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

/**
 * The DIAGRAM formula for the member: every member argument of the source formula as its own
 * text (so the table stays live and in the same units: spans, loads, supports, EI, combo and
 * units), the combination shown in the pane when it differs from the formula's, trailing
 * blanks dropped.
 */
export function diagramFormula(member: ResolvedMember, points: number, combo: string | undefined): string {
  const text: Record<string, string> = {};
  for (const name of MEMBER_ARGUMENTS) text[name] = argText(member.sources[name]);
  if (combo !== undefined) text.combo = combo === "" ? "" : quoted(combo);
  const args = [text.spans, text.loads, String(points), text.supports, text.EI, text.combo, text.units];
  while (args.length > 3 && args[args.length - 1] === "") args.pop();
  return `=SPAN.DIAGRAM(${args.join(",")})`;
}

/**
 * The rows the written DIAGRAM will spill into: SPAN.DIAGRAM's own body with the member's
 * arguments (the chosen combination in place of the formula's), so the cells checked before
 * writing are exactly the cells the table will take.
 */
export function diagramRows(member: ResolvedMember, points: number, combo: string | undefined): number {
  const a = member.args;
  return sheetDiagram(a.spans, a.loads, points, a.supports, a.EI, combo === undefined ? a.combo : combo, a.units ?? null).length;
}

/** Column headings in the units of the formula's units argument (none without one). */
export function tableHeader(units: UnitLabels): string[] {
  const u = quantityUnits(units);
  return [withUnit("x", u.x), withUnit("V", u.shear), withUnit("M", u.moment), withUnit("slope", u.slope), withUnit("deflection", u.deflection)];
}

/**
 * Where the table goes: on the member's sheet, starting one empty column right of the
 * formula cell (or of its spill), on the formula's row.
 */
export function planTable(member: ResolvedMember, formulaSpill: string | undefined, rows: number, points: number, combo: string | undefined): TablePlan {
  const right = formulaSpill ? parseBlock(splitAddress(formulaSpill).address).to.col : parseBlock(member.cell).from.col;
  const top = { row: parseBlock(member.cell).from.row, col: right + 2 };
  return {
    sheet: member.sheet,
    block: blockAt(top, rows + 1, TABLE_COLUMNS),
    header: tableHeader(member.units),
    formula: diagramFormula(member, points, combo),
    rows,
  };
}

/** The block to write: the header, then the formula in the first cell under it. */
export function tableBlock(plan: TablePlan): { address: string; block: CellInput[][] } {
  const from = plan.block.from;
  return {
    address: qualify(plan.sheet, blockText(blockAt(from, 2, TABLE_COLUMNS))),
    block: [plan.header, [plan.formula, null, null, null, null]],
  };
}

export type Confirm = (message: string) => Promise<boolean>;
export type WriteOutcome = { written: true; address: string } | { written: false; reason: string };

/**
 * Writes the table when its cells are empty, or when `confirm` agrees to overwrite them. A
 * write never breaks another formula: when any target cell holds a value spilled from a
 * formula outside the target (which a clear cannot remove, and a write would turn into
 * #SPILL!), nothing is written and the reason names that formula's cell. (A host without
 * spillsInto cannot tell; the check then rests on the read-back below.)
 */
export async function writeTable(host: SheetHost, plan: TablePlan, confirm: Confirm): Promise<WriteOutcome> {
  const target = qualify(plan.sheet, blockText(plan.block));
  const empty = await host.isEmpty(target);
  if (host.spillsInto) {
    const spills = await host.spillsInto(target);
    if (spills.length > 0) {
      const list = spills.length > 3 ? `${spills.slice(0, 3).join(", ")} and ${spills.length - 3} more` : spills.join(", ");
      return {
        written: false,
        reason: `nothing written: ${target} takes cells that the result of ${list} spills into; writing there would break ${spills.length > 1 ? "those formulas" : "that formula"} (#SPILL!). Move ${spills.length > 1 ? "them" : "it"}, or make room beside the member`,
      };
    }
  }
  if (!empty) {
    const ok = await confirm(`${target} already holds something. Write the diagram table over it?`);
    if (!ok) return { written: false, reason: `nothing written: ${target} holds something` };
    await host.clear(target);
  }
  const { address, block } = tableBlock(plan);
  await host.writeBlock(address, block);
  const anchor = qualify(plan.sheet, blockText(blockAt({ row: plan.block.from.row + 1, col: plan.block.from.col }, 1, 1)));
  const shown = await host.getValues(anchor).then((rows) => rows[0]?.[0], () => undefined);
  if (typeof shown === "string" && /^#SPILL!/i.test(shown)) {
    return { written: false, reason: `the diagram table at ${anchor} shows #SPILL!: something in ${target} blocks it` };
  }
  return { written: true, address: target };
}

/** True when the planned table is already there: its header as planned and x starting at 0 under it. */
export async function tableInPlace(host: SheetHost, plan: TablePlan): Promise<boolean> {
  const top = blockAt(plan.block.from, 2, TABLE_COLUMNS);
  const values = await host.getValues(qualify(plan.sheet, blockText(top)));
  return plan.header.every((text, i) => values[0]?.[i] === text) && values[1]?.[0] === 0;
}

/** Scatter-line charts of V, M and (with EI) deflection over the table's columns, right of the table. */
export function chartRequests(plan: TablePlan, withDeflection: boolean, units: UnitLabels): ChartRequest[] {
  const u = quantityUnits(units);
  const first = plan.block.from.row + 1;
  const last = plan.block.from.row + plan.rows;
  const col = (offset: number): string => blockText({ from: { row: first, col: plan.block.from.col + offset }, to: { row: last, col: plan.block.from.col + offset } });
  const quantities: { name: string; offset: number; title: string; unit: string }[] = [
    { name: "V", offset: 1, title: "Shear", unit: u.shear },
    { name: "M", offset: 2, title: "Moment", unit: u.moment },
  ];
  if (withDeflection) quantities.push({ name: "deflection", offset: 4, title: "Deflection", unit: u.deflection });
  const left = plan.block.to.col + 2;
  return quantities.map((q, i) => {
    const top = plan.block.from.row + i * 16;
    return {
      sheet: plan.sheet,
      title: q.title,
      x: col(0),
      series: [{ name: q.name, y: col(q.offset) }],
      placeAt: blockText({ from: { row: top, col: left }, to: { row: top + 14, col: left + 7 } }),
      xTitle: withUnit("x", u.x),
      yTitle: withUnit(q.name, q.unit),
    };
  });
}
