/**
 * Per-workbook memory of spill sizes learned by evaluation. A SPAN call is identified by the
 * cell that holds it and the text of the call, so the same call keeps its learned size when
 * the formula is set again, and a different call in the same cell starts afresh.
 */
import type { BlockSize } from "./resultSize";
import type { SpanFunctions } from "./catalogue";
import type { ReusedResults } from "./reusedResults";

export interface CellAddress {
  sheet: number;
  row: number;
  col: number;
}

export interface EngineContext {
  functions: SpanFunctions;
  learned: CallMap<BlockSize>;
  /** Cells whose SPAN results came out in another size than reserved: set them again. */
  mismatched: Map<string, CellAddress>;
  /** Called once per SPAN evaluation (progress reporting). */
  onCall?: () => void;
  /** The plain text a cell holds as typed (not a formula), for size prediction. */
  textAt?: (address: CellAddress) => string | undefined;
  /**
   * Results computed in a size other than reserved, kept until the cell is set again with the
   * learned size: the second evaluation hands them back instead of calling the function again
   * when its arguments are the same (reusedResults.ts `sameArgs`, the one rule for that).
   */
  computed: CallMap<{ args: readonly unknown[]; result: unknown }>;
  /** Spill sizes reserved from a prediction that read another cell (see spanPlugin.ts). */
  reserved: CallMap<BlockSize>;
  /** Recent answers of each function by their arguments (reusedResults.ts). */
  answers: ReusedResults;
}

export function cellKey(address: CellAddress): string {
  return `${address.sheet}!${address.row}!${address.col}`;
}

/**
 * Values per SPAN call, a call being the cell that holds it and the text of the call: by cell,
 * then by call text. The call texts are the interned strings of spanPlugin.ts, so looking one up
 * hashes the short cell key only (a key joining both would be a new long string to hash on every
 * evaluation); an empty map is not looked into at all.
 */
export class CallMap<V> {
  private readonly cells = new Map<string, Map<string, V>>();

  get(address: CellAddress, call: string): V | undefined {
    return this.cells.size === 0 ? undefined : this.cells.get(cellKey(address))?.get(call);
  }

  has(address: CellAddress, call: string): boolean {
    return this.cells.size !== 0 && this.cells.get(cellKey(address))?.has(call) === true;
  }

  set(address: CellAddress, call: string, value: V): void {
    const key = cellKey(address);
    let calls = this.cells.get(key);
    if (!calls) this.cells.set(key, (calls = new Map()));
    calls.set(call, value);
  }

  delete(address: CellAddress, call: string): void {
    if (this.cells.size === 0) return;
    const key = cellKey(address);
    const calls = this.cells.get(key);
    if (!calls || !calls.delete(call)) return;
    if (calls.size === 0) this.cells.delete(key);
  }
}

const contexts = new WeakMap<object, EngineContext>();

/** The context of a workbook whose engine is being built (before its graph can be attached). */
let building: EngineContext | undefined;

/** The context of the workbook that owns `owner` (the engine's dependency graph). */
export function contextOf(owner: object): EngineContext | undefined {
  return contexts.get(owner) ?? building;
}

export function buildingWith<T>(context: EngineContext, build: () => T): T {
  const outer = building;
  building = context;
  try {
    return build();
  } finally {
    building = outer;
  }
}

export function attachContext(owner: object, context: EngineContext): void {
  contexts.set(owner, context);
}

export function sameSize(a: BlockSize, b: BlockSize): boolean {
  return a.rows === b.rows && a.cols === b.cols;
}
