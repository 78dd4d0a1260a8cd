/**
 * Per-workbook memory of spill sizes learned by evaluation. A SPAN call is identified by the
 * cell that holds it and the text of the call, so the same call keeps its learned size when
 * the formula is set again, and a different call in the same cell starts afresh.
 */
import type { BlockSize } from "./resultSize";
import type { SpanFunctions } from "./catalogue";

export interface CellAddress {
  sheet: number;
  row: number;
  col: number;
}

export interface EngineContext {
  functions: SpanFunctions;
  learned: Map<string, BlockSize>;
  /** Cells whose SPAN results came out in another size than reserved: set them again. */
  mismatched: Map<string, CellAddress>;
  /** Called once per SPAN evaluation (progress reporting). */
  onCall?: () => void;
  /** The plain text a cell holds as typed (not a formula), for size prediction. */
  textAt?: (address: CellAddress) => string | undefined;
  /**
   * Results computed in a size other than reserved, kept until the cell is set again with the
   * learned size: the second evaluation hands them back instead of calling the function again.
   */
  computed: Map<string, { args: string; result: unknown }>;
  /** Spill sizes reserved from a prediction that read another cell (see spanPlugin.ts). */
  reserved: Map<string, BlockSize>;
}

export function cellKey(address: CellAddress): string {
  return `${address.sheet}!${address.row}!${address.col}`;
}

export function callKey(address: CellAddress, callText: string): string {
  return `${cellKey(address)}|${callText}`;
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
