/**
 * The combinations argument of the envelope functions: a cell or range of combination texts
 * (`1.2D+1.6L`) and named sets (`ASCE7-2.3.1`, `ASCE7-2.4.1`, `EN1990-6.10`), blank cells
 * skipped. EN 1990 needs psi0: one number, or text such as `Q 0.7, S 0.5`.
 */
import { COMBINATION_SETS, expandCombinationSet, invalid, parseCombination, type Combination } from "../core";
import { errorCodeOf, isBlank, numberFromText, readNumber, show } from "./cells";
import { rowsOf, singleCell } from "./ranges";

const SET_NAMES = new Set<string>([...COMBINATION_SETS, "ASCE7-LRFD", "ASCE7-ASD"]);

function isSetName(text: string): boolean {
  return SET_NAMES.has(text.trim().toUpperCase().replace(/\s+/g, ""));
}

/** Reads psi0: blank = not given; a number; or text pairs "Q 0.7, S 0.5" (or "Q=0.7; S=0.5"). */
export function readPsi0(arg: unknown): number | Record<string, number> | undefined {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("psi0: give one cell: a number, or pairs such as Q 0.7, S 0.5");
  if (isBlank(cell)) return undefined;
  if (typeof cell === "number" || (typeof cell === "string" && numberFromText(cell) !== null)) {
    return readNumber(cell, () => "psi0");
  }
  if (typeof cell !== "string" || errorCodeOf(cell) !== null) throw invalid(`psi0: ${show(cell)} is not a number or a list of case values`);
  const pairs: Record<string, number> = {};
  for (const part of cell.split(/[;,]/)) {
    if (part.trim() === "") continue;
    const match = /^\s*([A-Za-z][A-Za-z0-9]*)\s*[=: ]\s*([+-]?(?:\d+\.?\d*|\.\d+))\s*$/.exec(part);
    if (!match) throw invalid(`psi0: "${part.trim()}" is not a pair such as Q 0.7`);
    pairs[match[1]] = Number(match[2]);
  }
  return pairs;
}

/**
 * The individual combinations named by a cell or range, in order. `caseLabels` are the
 * case labels of the member's loads (EN 1990's variable cases are every label but G).
 */
export function readCombinations(arg: unknown, psi0: unknown, caseLabels: string[]): Combination[] {
  const out: Combination[] = [];
  const rows = rowsOf(arg);
  rows.forEach((row, r) => {
    row.forEach((cell, c) => {
      const where = rows.length === 1 && row.length === 1 ? "combinations" : `combinations row ${r + 1}, column ${c + 1}`;
      if (isBlank(cell)) return;
      const code = errorCodeOf(cell);
      if (code !== null) throw invalid(`${where}: the cell holds the error ${code}`);
      if (typeof cell !== "string") throw invalid(`${where}: ${show(cell)} is not a combination; write one such as 1.2D+1.6L`);
      if (isSetName(cell)) {
        const variableCases = [...new Set(caseLabels.filter((label) => label !== "" && label !== "G"))];
        out.push(...expandCombinationSet(cell, { psi0: readPsi0(psi0), variableCases }));
        return;
      }
      try {
        out.push(parseCombination(cell));
      } catch (error) {
        throw invalid(`${where}: ${(error as Error).message}`);
      }
    });
  });
  if (out.length === 0) throw invalid("combinations: give at least one combination or set name");
  return out;
}
