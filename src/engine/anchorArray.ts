/**
 * `A1#` where A1 spills no array. The spilled-range operator is resolved in the formula text
 * (formulaText.ts, workbook.ts) to the range the spill covers; where there is no such range
 * the text gets `ANCHORARRAY("A1", A1)` or `ANCHORARRAY("A1")` instead, evaluated here:
 * - the anchor is an array formula that failed (its spill blocked: `#SPILL!`, or its function
 *   returned an error): that error, with its message, as the spreadsheet shows in the anchor;
 * - the anchor holds no array formula (a value, a blank, a single-value formula): `#REF!`, the
 *   host's answer for a spilled-range reference to a cell that does not spill (Microsoft
 *   support, "Spilled range operator": the operator references "the entire spill range").
 * Typed text never reaches the engine with ANCHORARRAY in it (normalizeFormula turns the saved
 * `_xlfn.ANCHORARRAY(A1)` into `A1#`), so the function is only ever this resolution's.
 */
import { ArraySize, CellError, ErrorType, FunctionPlugin, HyperFormula } from "hyperformula";
import type { ImplementedFunctions } from "hyperformula";
import type { CellAddress } from "./learnedSizes";

interface AnchorNode {
  args: { type: string; value?: unknown }[];
}

interface AnchorState {
  formulaAddress: CellAddress;
}

/** Formula text of a string literal ("" for each "). */
export function stringLiteral(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}

/** Engine text for `written#` when nothing spills there; `failed`: the anchor is an array formula that failed. */
export function anchorArrayText(written: string, failed: boolean): string {
  return failed ? `ANCHORARRAY(${stringLiteral(written)},${written})` : `ANCHORARRAY(${stringLiteral(written)})`;
}

class AnchorArrayPlugin extends FunctionPlugin {
  static override implementedFunctions: ImplementedFunctions = {
    ANCHORARRAY: {
      method: "anchorArray",
      sizeOfResultArrayMethod: "anchorArraySize",
      parameters: [{ argumentType: "ANY" as never }, { argumentType: "ANY" as never, optionalArg: true }],
      vectorizationForbidden: true,
    },
  };

  anchorArray(node: AnchorNode, state: AnchorState): unknown {
    const [name, anchor] = node.args;
    const written = name?.type === "STRING" && typeof name.value === "string" ? name.value : "the cell";
    if (anchor !== undefined) {
      const value = this.evaluateAst(anchor as never, state as never) as unknown;
      if (value instanceof CellError) return value;
    }
    return new CellError(ErrorType.REF, `${written}# refers to the array a formula in ${written} spills, and ${written} spills none`);
  }

  anchorArraySize(): ArraySize {
    return ArraySize.scalar();
  }
}

let registered = false;

/** Registers ANCHORARRAY with the formula engine (once per process). */
export function registerAnchorArrayPlugin(): void {
  if (registered) return;
  HyperFormula.registerFunctionPlugin(AnchorArrayPlugin as never, { enGB: { ANCHORARRAY: "ANCHORARRAY" }, enUS: { ANCHORARRAY: "ANCHORARRAY" } });
  registered = true;
}
