/**
 * The combinations argument of the envelope functions: a cell or range of combination texts
 * (`1.2D+1.6L`) and named sets (`ASCE7-2.3.1`, `ASCE7-2.4.1`, `EN1990-6.10`), blank cells
 * skipped. EN 1990 needs psi0: one number, or text such as `Q 0.7, S 0.5`.
 */
import { checkCombinations, COMBINATION_SETS, expandCombinationSet, invalid, isStandardCaseLabel, parseCombination, type Combination, type CombinationUse } from "../core";
import { errorCodeOf, isBlank, numberFromText, readNumber, show } from "./cells";
import type { LoadRow } from "./loadRow";
import { casePlace } from "./member";
import { rowsOf, singleCell } from "./ranges";

const SET_NAMES = new Set<string>([...COMBINATION_SETS, "ASCE7-LRFD", "ASCE7-ASD"]);

function isSetName(text: string): boolean {
  return SET_NAMES.has(text.trim().toUpperCase().replace(/\s+/g, ""));
}

/**
 * One psi0 pair of trimmed text, label then value, separated by "=", ":" or spaces. Linear
 * time: the separator is either spaces around "=" or ":", or spaces alone, and the value's
 * digits before the point are one run.
 */
const PSI0_PAIR = /^([A-Za-z][A-Za-z0-9]*)(?:\s*[=:]\s*|\s+)([+-]?(?:\d+(?:\.\d*)?|\.\d+))$/;

/** Most psi0 pairs (one per variable case). */
export const MAX_PSI0_PAIRS = 100;

/** Reads psi0: blank = not given; a number; or text pairs "Q 0.7, S 0.5" (or "Q=0.7; S=0.5"). */
export function readPsi0(arg: unknown): number | Record<string, number> | undefined {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid("psi0: give one cell: a number, or pairs such as Q 0.7, S 0.5");
  if (isBlank(cell)) return undefined;
  if (typeof cell === "number" || (typeof cell === "string" && numberFromText(cell) !== null)) {
    return readNumber(cell, () => "psi0");
  }
  if (typeof cell !== "string" || errorCodeOf(cell) !== null) throw invalid(`psi0: ${show(cell)} is not a number or a list of case values`);
  const pairs: Record<string, number> = Object.create(null);
  let count = 0;
  for (const part of cell.split(/[;,]/)) {
    const text = part.trim();
    if (text === "") continue;
    const match = PSI0_PAIR.exec(text);
    if (!match) throw invalid(`psi0: "${text.length <= 40 ? text : `${text.slice(0, 37)}...`}" is not a pair such as Q 0.7`);
    if (++count > MAX_PSI0_PAIRS) throw invalid(`psi0: more than ${MAX_PSI0_PAIRS} pairs`);
    if (match[1] in pairs) throw invalid(`psi0: case ${match[1]} is given twice`);
    pairs[match[1]] = Number(match[2]);
  }
  return pairs;
}

/** Set names as messages list them. */
const SET_LIST = `${COMBINATION_SETS.join(", ")} (or ASCE7-LRFD, ASCE7-ASD)`;

/**
 * The individual combinations named by a cell or range, in order, checked against the
 * member's load rows by the combination and case-label rule (core checkCombinations; EN
 * 1990's variable cases are every label the loads carry but G).
 */
export function readCombinations(arg: unknown, psi0: unknown, loads: readonly LoadRow[]): Combination[] {
  const caseLabels = loads.map((row) => row.loadCase);
  const carried = new Set(caseLabels);
  const uses: CombinationUse[] = [];
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
        const set = cell.trim();
        for (const combination of expandCombinationSet(cell, { psi0: readPsi0(psi0), variableCases })) uses.push({ combination, set });
        return;
      }
      let combination: Combination;
      try {
        combination = parseCombination(cell);
      } catch (error) {
        throw invalid(`${where}: ${(error as Error).message} (or give a set name: ${SET_LIST})`);
      }
      const bare = cell.trim();
      if (combination.terms.length === 1 && combination.terms[0].loadCase === bare && !carried.has(bare) && !isStandardCaseLabel(bare)) {
        throw invalid(`${where}: "${bare}" is not a set name, and no load carries a case ${bare}; set names: ${SET_LIST}`);
      }
      uses.push({ combination });
    });
  });
  if (uses.length === 0) throw invalid("combinations: give at least one combination or set name");
  try {
    checkCombinations(loads, uses, casePlace);
  } catch (error) {
    throw invalid(`combinations: ${(error as Error).message}`);
  }
  return uses.map((use) => use.combination);
}
