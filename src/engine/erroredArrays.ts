/**
 * A range that is exactly the area of an array formula whose result is an error.
 *
 * The formula engine (HyperFormula 3.5.0) keeps an array formula that failed — its spill
 * blocked (`#SPILL!`, then a 1 x 1 area: the anchor cell alone) or its function returning an
 * error (the reserved area kept) — as an "errored array". When a formula's range is exactly
 * that area (`=S!B2:B2` on a blocked anchor, `=B2:D5` or `=INDEX(B2:D5,1,1)` on a table whose
 * function failed), the engine's interpreter looks the array up, expects a computed array or a
 * plain error, finds neither and throws `Error("Unknown array")` out of `setCellContents` and
 * `buildFromSheets` (node_modules/hyperformula/commonjs/interpreter/Interpreter.js, case
 * CELL_RANGE: it tests `array instanceof CellError`, but a failed array is an `ErroredArray`
 * holding the error; ArrayValue.js, FormulaVertex.js `setNoSpace`/`setErrorValue`). No report of
 * it was found among the engine's GitHub issues (searched for "Unknown array").
 *
 * The range then means what the engine's own code intends and what the spreadsheet shows:
 * the array formula's error, with its message. The lookup the interpreter uses is
 * `DependencyGraph.prototype.getArray` (nothing else in the engine calls it; the dependency
 * graph builds its edges through its array mapping directly), so it is wrapped to hand back
 * the error itself for a failed array.
 */
import { CellError, HyperFormula } from "hyperformula";

interface ArrayLookup {
  getArray(range: unknown): { array?: unknown } | undefined;
}

let patched = false;

/** The error a failed array formula holds, or undefined when it computed an array. */
export function arrayError(array: unknown): CellError | undefined {
  if (array instanceof CellError) return array;
  const error = typeof array === "object" && array !== null ? (array as { error?: unknown }).error : undefined;
  return error instanceof CellError ? error : undefined;
}

/** Makes a range over a failed array formula evaluate to that formula's error (once per process). */
export function patchErroredArrayRanges(): void {
  if (patched) return;
  const probe = HyperFormula.buildEmpty({ licenseKey: "gpl-v3" });
  const graph = Object.getPrototypeOf(probe.dependencyGraph) as ArrayLookup;
  probe.destroy();
  const lookUp = graph.getArray;
  if (typeof lookUp !== "function") throw new Error("the formula engine has no array lookup to guard (HyperFormula changed?)");
  graph.getArray = function (this: unknown, range: unknown) {
    const vertex = lookUp.call(this, range);
    const error = vertex ? arrayError(vertex.array) : undefined;
    return error ? { array: error } : vertex;
  };
  patched = true;
}
