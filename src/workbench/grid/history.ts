/**
 * Undo and redo of edits. One step is one user action (a typed cell, a paste, a fill, a
 * delete, a row insertion or deletion), however many cells it wrote: what the cells held as
 * typed before and after. The formula engine's own undo is not used: one edit here is
 * several engine operations (the write, then formulas set again with learned spill sizes and
 * resolved A1# ranges), and typed formula texts live outside the engine.
 * Limit: the last 100 steps are kept.
 */
import type { CellInput } from "../../engine";

export const HISTORY_LIMIT = 100;

export interface BlockStep {
  kind: "block";
  sheet: string;
  top: number;
  left: number;
  before: CellInput[][];
  after: CellInput[][];
}

export interface RowsStep {
  kind: "rows";
  sheet: string;
  at: number;
  /** Rows inserted (> 0) or deleted (< 0). */
  count: number;
  /** For a deletion: the deleted rows' inputs, and every formula of the book as it was before (cells whose references the deletion cut). */
  removed?: CellInput[][];
  formulas?: { sheet: string; row: number; col: number; text: string }[];
}

/** Several block writes done as one action (a cut and paste: the source emptied, the target written, references elsewhere moved). */
export interface MultiStep {
  kind: "multi";
  steps: BlockStep[];
}

export type Step = BlockStep | RowsStep | MultiStep;

export class History {
  private readonly done: Step[] = [];
  private readonly undone: Step[] = [];

  record(step: Step): void {
    this.done.push(step);
    if (this.done.length > HISTORY_LIMIT) this.done.shift();
    this.undone.length = 0;
  }

  /** The step to revert, moved to the redo list. */
  undo(): Step | undefined {
    const step = this.done.pop();
    if (step) this.undone.push(step);
    return step;
  }

  /** The step to apply again, moved back to the undo list. */
  redo(): Step | undefined {
    const step = this.undone.pop();
    if (step) this.done.push(step);
    return step;
  }

  clear(): void {
    this.done.length = 0;
    this.undone.length = 0;
  }

  get canUndo(): boolean {
    return this.done.length > 0;
  }

  get canRedo(): boolean {
    return this.undone.length > 0;
  }
}
