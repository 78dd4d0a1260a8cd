/**
 * `SINGLE(value)`: the implicit intersection operator `@`, as saved workbooks store it
 * (`_xlfn.SINGLE(...)`; normalizeFormula drops the prefix). The host's rule (Microsoft support,
 * "Implicit intersection operator: @"): a single value is returned as it is; a range gives the
 * value of its cell in the formula's row (a one-column range) or column (a one-row range), and
 * `#VALUE!` when the formula's row or column misses it; an array (a computed result) gives its
 * top-left value.
 */
import { ArraySize, CellError, ErrorType, FunctionPlugin, HyperFormula, SimpleRangeValue } from "hyperformula";
import type { ImplementedFunctions } from "hyperformula";
import type { CellAddress } from "./learnedSizes";

interface SingleNode {
  args: object[];
}

interface SingleState {
  formulaAddress: CellAddress;
}

interface RangeBounds {
  start: CellAddress;
  end: CellAddress;
}

/** The value implicit intersection picks from a block, given where the formula sits. */
export function intersect(block: readonly (readonly unknown[])[], range: RangeBounds | undefined, at: CellAddress): unknown | CellError {
  const height = block.length;
  const width = block[0]?.length ?? 0;
  if (height === 0 || width === 0) return new CellError(ErrorType.VALUE, "@ of an empty value");
  if (!range || (height === 1 && width === 1)) return block[0][0];
  if (range.start.sheet === at.sheet) {
    if (width === 1 && at.row >= range.start.row && at.row <= range.end.row) return block[at.row - range.start.row][0];
    if (height === 1 && at.col >= range.start.col && at.col <= range.end.col) return block[0][at.col - range.start.col];
  }
  return new CellError(ErrorType.VALUE, "@ of a range that the formula's row or column does not cross");
}

class SinglePlugin extends FunctionPlugin {
  static override implementedFunctions: ImplementedFunctions = {
    SINGLE: { method: "single", sizeOfResultArrayMethod: "singleSize", parameters: [{ argumentType: "ANY" as never }], vectorizationForbidden: true },
  };

  single(node: SingleNode, state: SingleState): unknown {
    if (node.args.length !== 1) return new CellError(ErrorType.NA, "@ (SINGLE) takes one argument");
    const value = this.evaluateAst(node.args[0] as never, state as never) as unknown;
    if (!(value instanceof SimpleRangeValue)) return value;
    const picked = intersect(value.rawData(), value.range as RangeBounds | undefined, state.formulaAddress);
    return picked === undefined || picked === null ? 0 : picked;
  }

  singleSize(): ArraySize {
    return ArraySize.scalar();
  }
}

let registered = false;

/** Registers SINGLE with the formula engine (once per process). */
export function registerSinglePlugin(): void {
  if (registered) return;
  HyperFormula.registerFunctionPlugin(SinglePlugin as never, { enGB: { SINGLE: "SINGLE" }, enUS: { SINGLE: "SINGLE" } });
  registered = true;
}
