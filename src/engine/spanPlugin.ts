/**
 * The SPAN functions as a formula-engine plugin. Each call converts its arguments the way the
 * spreadsheet host would, calls the worksheet function of the workbook's function table,
 * maps a thrown `{ code, message }` to an error value with that message, and compares the
 * result's size with the size reserved for it: a difference is learned and the cell is
 * marked to be set again (workbook.ts does that), so the spill takes the true size.
 */
import { ArraySize, CellError, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula } from "hyperformula";
import type { ImplementedFunctions } from "hyperformula";
import { argumentRange, entryFor, requiredArguments, SPAN_FUNCTIONS, type SpanFunctionEntry } from "./catalogue";
import { engineError, engineResult, firstError, hostArgument, resizeResult, resultSize } from "./cellValues";
import { cellKey, contextOf, sameSize, type CellAddress, type EngineContext } from "./learnedSizes";
import { predictSize, type ArgumentNode, type BlockSize } from "./resultSize";
import { copyArgs, sameArgs } from "./reusedResults";

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
 * An argument's text, made once per argument node. The engine copies a call's node for every
 * cell (it orders range ends afresh), but the argument nodes inside are shared by every cell
 * whose formula reads the same relative to the cell (a column filled down), so most calls join
 * texts already made instead of writing their arguments out again.
 */
const argumentTexts = new WeakMap<object, string>();

function argumentText(arg: object): string {
  let text = argumentTexts.get(arg);
  if (text === undefined) {
    text = JSON.stringify(arg);
    argumentTexts.set(arg, text);
  }
  return text;
}

/** Call texts by function name, then by each argument's text in turn (a trie of the texts made). */
interface TextTrie {
  text?: string;
  next: Map<string, TextTrie>;
}

/**
 * One string per distinct call text: the text (relative references) is the same down a column,
 * so a schedule of 800,000 calls keeps a few strings instead of 800,000 (about 300 bytes each).
 * A call's text is found by its function name and its argument texts, each the one string kept
 * for its node (its hash computed once), so finding it hashes no long text. Only memory depends
 * on this table: it is emptied when it holds INTERNED_TEXTS texts.
 */
const internedTexts = new Map<string, TextTrie>();
let internedCount = 0;
const INTERNED_TEXTS = 10_000;

/** The function's name and its arguments as JSON (the same text as `JSON.stringify(node.args)`). */
function callText(node: CallNode): string {
  const cached = callTexts.get(node);
  if (cached !== undefined) return cached;
  if (internedCount >= INTERNED_TEXTS) {
    internedTexts.clear();
    internedCount = 0;
  }
  let at: TextTrie | undefined = internedTexts.get(node.procedureName);
  if (!at) internedTexts.set(node.procedureName, (at = { next: new Map() }));
  const texts: string[] = [];
  for (const arg of node.args) {
    const text = argumentText(arg);
    texts.push(text);
    let next: TextTrie | undefined = at.next.get(text);
    if (!next) at.next.set(text, (next = { next: new Map() }));
    at = next;
  }
  if (at.text === undefined) {
    at.text = `${node.procedureName}[${texts.join(",")}]`;
    internedCount++;
  }
  callTexts.set(node, at.text);
  return at.text;
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
  private expectedSize(entry: SpanFunctionEntry, node: CallNode, state: CallState, call: string, readCells: boolean): { size: BlockSize; usedCells: boolean } {
    const learned = this.context().learned.get(state.formulaAddress, call);
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
    const call = callText(node);
    const { size, usedCells } = this.expectedSize(entry, node, state, call, true);
    const reserved = this.context().reserved;
    if (usedCells || reserved.has(state.formulaAddress, call)) reserved.set(state.formulaAddress, call, size);
    return new ArraySize(size.cols, size.rows);
  }

  /** The size reserved for the call when its formula was read. */
  private reservedSize(entry: SpanFunctionEntry, node: CallNode, state: CallState, call: string): BlockSize {
    return this.context().reserved.get(state.formulaAddress, call) ?? this.expectedSize(entry, node, state, call, false).size;
  }

  evaluate(node: CallNode, state: CallState): unknown {
    const entry = entryFor(node.procedureName);
    if (!entry) return new CellError(ErrorType.NAME, `unknown function ${node.procedureName}`);
    const context = this.context();
    const given = node.args.length;
    if (given < requiredArguments(entry) || given > entry.arguments.length) {
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
    const address = state.formulaAddress;
    const kept = context.computed.get(address, call);
    if (kept) context.computed.delete(address, call);
    let result: ReturnType<typeof engineResult>;
    if (kept && sameArgs(kept.args, args)) result = kept.result as ReturnType<typeof engineResult>;
    else {
      context.onCall?.();
      const answer = context.answers.answer(entry.exportName, args, () => context.functions[entry.exportName](...args));
      if ("thrown" in answer) return engineError(answer.thrown);
      try {
        result = engineResult(answer.returned);
      } catch (thrown) {
        return engineError(thrown);
      }
    }
    const actual = resultSize(result);
    if (!actual) return result;
    const expected = this.reservedSize(entry, node, state, call);
    if (sameSize(actual, expected)) return result;
    context.learned.set(address, call, actual);
    context.mismatched.set(cellKey(address), address);
    context.computed.set(address, call, { args: copyArgs(args), result });
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
