/**
 * The column names of a spilled SPAN table, for a hint over its cells: taken from the one
 * definition of each table's columns (src/sheet/headers.ts). Only a formula whose outer call
 * is the SPAN function spills its table; anything else gets no hint.
 */
import { COLUMNS, type Column } from "../../sheet/headers";

const names = (columns: readonly Column[]): string[] => columns.map((c) => c.name);

const TABLES: Record<string, string[]> = {
  REACTIONS: names(COLUMNS.reactions),
  MAXMOMENT: names(COLUMNS.maxMoment),
  EXTREMES: names(COLUMNS.extremes),
  DIAGRAM: names(COLUMNS.diagram),
  PEAKS: names(COLUMNS.peaks),
  SPANPEAKS: names(COLUMNS.spanPeaks),
  STRESS: names(COLUMNS.stress),
  SHEARSTRESS: names(COLUMNS.shearStress),
  DEFLECTIONCHECK: names(COLUMNS.deflectionCheck),
  FREQUENCIES: names(COLUMNS.frequencies),
  ENVELOPE: names(COLUMNS.envelope("quantity")),
  MOVING: names(COLUMNS.moving("effect")),
};

export interface TableHint {
  name: string;
  columns: string[];
}

export function tableHint(formula: string | undefined): TableHint | undefined {
  const match = formula === undefined ? null : /^=\s*SPAN\.([A-Z]+)\s*\(/i.exec(formula);
  if (!match) return undefined;
  const key = match[1].toUpperCase();
  const columns = TABLES[key];
  return columns ? { name: `SPAN.${key}`, columns } : undefined;
}
