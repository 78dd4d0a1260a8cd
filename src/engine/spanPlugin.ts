/**
 * The SPAN functions as a formula-engine plugin. Each call converts its arguments the way the
 * spreadsheet host would, calls the worksheet function of the workbook's function table,
 * maps a thrown `{ code, message }` to an error value with that message, and compares the
 * result's size with the size reserved for it: a difference is learned and the cell is
 * marked to be set again (workbook.ts does that), so the spill takes the true size.
 */
import { ArraySize, CellError, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula } from "hyperformula";
import type { ImplementedFunctions } from "hyperformula";
import { argumentRange, entryFor, SPAN_FUNCTIONS, type SpanFunctionEntry } from "./catalogue";
import { engineError, engineResult, firstError, hostArgument, resizeResult, resultSize } from "./cellValues";
import { callKey, cellKey, contextOf, sameSize, type CellAddress, type EngineContext } from "./learnedSizes";
import { predictSize, type ArgumentNode, type BlockSize } from "./resultSize";

interface CallNode {
  procedureName: string;
  args: (ArgumentNode & object)[];
}

interface ReferenceNode {
  type: string;
  reference?: { toSimpleCellAddress(base: CellAddress): CellAddress };
}

interface CallState {
  formulaAddress: CellAddress;
}

function methodName(entry: SpanFunctionEntry): string {
  return `call_${entry.exportName}`;
}

function sizeMethodName(entry: SpanFunctionEntry): string {
  return `size_${entry.exportName}`;
}

/** A call's text, made once per syntax tree node. */
const callTexts = new WeakMap<CallNode, string>();

/**
 * One string per distinct call text: the engine gives every cell its own syntax tree, but the
 * text (relative references) is the same down a column, so a schedule of 800,000 calls keeps
 * a few strings instead of 800,000 (about 300 bytes each). Only memory depends on this table:
 * it is emptied when it holds INTERNED_TEXTS texts.
 */
const internedTexts = new Map<string, string>();
const INTERNED_TEXTS = 10_000;

function callText(node: CallNode): string {
  let text = callTexts.get(node);
  if (text === undefined) {
    const made = `${node.procedureName}${JSON.stringify(node.args)}`;
    text = internedTexts.get(made);
    if (text === undefined) {
      if (internedTexts.size >= INTERNED_TEXTS) internedTexts.clear();
      internedTexts.set(made, made);
      text = made;
    }
    callTexts.set(node, text);
  }
  return text;
}

class SpanPlugin extends FunctionPlugin {
  static override implementedFunctions: ImplementedFunctions = Object.fromEntries(
    SPAN_FUNCTIONS.map((entry) => [
      entry.sheetName,
      {
        method: methodName(entry),
        sizeOfResultArrayMethod: sizeMethodName(entry),
        parameters: entry.arguments.map(() => ({ argumentType: FunctionArgumentType.ANY, optionalArg: true })),
        vectorizationForbidden: true,
      },
    ]),
  );

  private context(): EngineContext {
    const context = contextOf(this.dependencyGraph);
    if (!context) throw new Error("SPAN functions are evaluated only inside a SpanWorkbook");
    return context;
  }

  /** The size a call gets: learned from an earlier evaluation, else predicted from its text. */
  private expectedSize(entry: SpanFunctionEntry, node: CallNode, state: CallState, readCells: boolean): { size: BlockSize; usedCells: boolean } {
    const learned = this.context().learned.get(callKey(state.formulaAddress, callText(node)));
    if (learned) return { size: learned, usedCells: false };
    const textAt = readCells ? this.context().textAt : undefined;
    let usedCells = false;
    const size = predictSize(
      entry,
      node.args,
      (arg) => {
        const size = this.arraySizeForAst(arg as never, state as never);
        return { rows: size.height, cols: size.width };
      },
      textAt
        ? (arg) => {
            const reference = (arg as ReferenceNode).reference;
            const text = reference ? textAt(reference.toSimpleCellAddress(state.formulaAddress)) : undefined;
            if (text !== undefined) usedCells = true;
            return text;
          }
        : undefined,
    );
    return { size, usedCells };
  }

  /**
   * Called when the engine reads the formula: the spill it reserves. A prediction that read
   * another cell (a spans list typed in one cell) is remembered, since that cell may change
   * before the call is evaluated.
   */
  predict(node: CallNode, state: CallState): ArraySize {
    const entry = entryFor(node.procedureName);
    if (!entry) return ArraySize.error();
    const { size, usedCells } = this.expectedSize(entry, node, state, true);
    const reserved = this.context().reserved;
    const key = callKey(state.formulaAddress, callText(node));
    if (usedCells || reserved.has(key)) reserved.set(key, size);
    return new ArraySize(size.cols, size.rows);
  }

  /** The size reserved for the call when its formula was read. */
  private reservedSize(entry: SpanFunctionEntry, node: CallNode, state: CallState, key: string): BlockSize {
    return this.context().reserved.get(key) ?? this.expectedSize(entry, node, state, false).size;
  }

  evaluate(node: CallNode, state: CallState): unknown {
    const entry = entryFor(node.procedureName);
    if (!entry) return new CellError(ErrorType.NAME, `unknown function ${node.procedureName}`);
    const context = this.context();
    const given = node.args.length;
    const required = entry.arguments.filter((arg) => !arg.optional).length;
    if (given < required || given > entry.arguments.length) {
      return new CellError(ErrorType.NA, `${entry.sheetName} takes ${argumentRange(entry)} arguments, not ${given}`);
    }
    const args: unknown[] = [];
    for (let index = 0; index < entry.arguments.length; index++) {
      const spec = entry.arguments[index];
      const arg = node.args[index];
      const skipped = arg === undefined || arg.type === "EMPTY";
      const value = skipped ? undefined : this.evaluateAst(arg as never, state as never);
      const error = firstError(value);
      if (error) return error;
      args.push(hostArgument(value, spec.kind, skipped));
    }
    const call = callText(node);
    const key = callKey(state.formulaAddress, call);
    const kept = context.computed.get(key);
    if (kept) context.computed.delete(key);
    let result: ReturnType<typeof engineResult>;
    if (kept && kept.args === JSON.stringify(args)) result = kept.result as ReturnType<typeof engineResult>;
    else {
      context.onCall?.();
      try {
        result = engineResult(context.functions[entry.exportName](...args));
      } catch (thrown) {
        return engineError(thrown);
      }
    }
    const actual = resultSize(result);
    if (!actual) return result;
    const expected = this.reservedSize(entry, node, state, key);
    if (sameSize(actual, expected)) return result;
    context.learned.set(key, actual);
    context.mismatched.set(cellKey(state.formulaAddress), state.formulaAddress);
    context.computed.set(key, { args: JSON.stringify(args), result });
    // The engine cannot grow a reserved spill: hand back the reserved size until the cell is set again.
    return resizeResult(result, expected);
  }
}

for (const entry of SPAN_FUNCTIONS) {
  Object.defineProperty(SpanPlugin.prototype, methodName(entry), {
    value: function (this: SpanPlugin, node: CallNode, state: CallState) {
      return this.evaluate(node, state);
    },
  });
  Object.defineProperty(SpanPlugin.prototype, sizeMethodName(entry), {
    value: function (this: SpanPlugin, node: CallNode, state: CallState) {
      return this.predict(node, state);
    },
  });
}

let registered = false;

/** Registers the SPAN functions with the formula engine (once per process). */
export function registerSpanPlugin(): void {
  if (registered) return;
  const names = Object.fromEntries(SPAN_FUNCTIONS.map((entry) => [entry.sheetName, entry.sheetName]));
  HyperFormula.registerFunctionPlugin(SpanPlugin as never, { enGB: names, enUS: names });
  registered = true;
}
