/**
 * The formula cells of one sheet, in document order (row by row, columns increasing), held
 * in typed arrays: a schedule of 200,000 rows has 800,000 of them, which as objects (with
 * their ranges) took about 140 bytes each; here they take about 20.
 */

export type FormulaKind = "dynamic" | "legacy" | "plain";

const KINDS: readonly FormulaKind[] = ["plain", "dynamic", "legacy"];

export interface Rect {
  top: number;
  left: number;
  bottom: number;
  right: number;
}

export interface FormulaCell {
  row: number;
  col: number;
  kind: FormulaKind;
  /** The stored range of an array formula. */
  ref?: Rect;
}

const FIRST_SIZE = 64;

export class FormulaTable {
  private rows = new Int32Array(FIRST_SIZE);
  private cols = new Int32Array(FIRST_SIZE);
  private kinds = new Uint8Array(FIRST_SIZE);
  /** Bottom row and right column of an array formula's range (it starts at its own cell); -1 for none. */
  private bottoms = new Int32Array(FIRST_SIZE);
  private rights = new Int32Array(FIRST_SIZE);
  private count = 0;

  get length(): number {
    return this.count;
  }

  /** Adds a formula cell after every one added before (document order); its index. */
  add(row: number, col: number, kind: FormulaKind, ref?: Rect): number {
    const last = this.count - 1;
    if (last >= 0 && (row < this.rows[last] || (row === this.rows[last] && col <= this.cols[last]))) {
      throw new RangeError(`formula cells are added in document order (${row}:${col} after ${this.rows[last]}:${this.cols[last]})`);
    }
    if (ref && (ref.top !== row || ref.left !== col)) throw new RangeError("an array formula's range starts at its own cell");
    if (this.count === this.rows.length) this.grow();
    const i = this.count++;
    this.rows[i] = row;
    this.cols[i] = col;
    this.kinds[i] = KINDS.indexOf(kind);
    this.bottoms[i] = ref ? ref.bottom : -1;
    this.rights[i] = ref ? ref.right : -1;
    return i;
  }

  row(i: number): number {
    return this.rows[i];
  }

  col(i: number): number {
    return this.cols[i];
  }

  kind(i: number): FormulaKind {
    return KINDS[this.kinds[i]];
  }

  /** The stored range of an array formula, or undefined. */
  ref(i: number): Rect | undefined {
    if (this.bottoms[i] < 0) return undefined;
    return { top: this.rows[i], left: this.cols[i], bottom: this.bottoms[i], right: this.rights[i] };
  }

  /** True when the formula's stored range covers more than its own cell. */
  coversOthers(i: number): boolean {
    return this.bottoms[i] > this.rows[i] || this.rights[i] > this.cols[i];
  }

  get(i: number): FormulaCell {
    const ref = this.ref(i);
    return { row: this.rows[i], col: this.cols[i], kind: this.kind(i), ...(ref ? { ref } : {}) };
  }

  /** The index of the formula in this cell, or -1 (binary search: the cells are in document order). */
  indexOf(row: number, col: number): number {
    let lo = 0;
    let hi = this.count - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const r = this.rows[mid];
      const c = this.cols[mid];
      if (r < row || (r === row && c < col)) lo = mid + 1;
      else if (r > row || c > col) hi = mid - 1;
      else return mid;
    }
    return -1;
  }

  /** Lets the arrays go (the table is empty afterwards). */
  clear(): void {
    this.rows = new Int32Array(0);
    this.cols = new Int32Array(0);
    this.kinds = new Uint8Array(0);
    this.bottoms = new Int32Array(0);
    this.rights = new Int32Array(0);
    this.count = 0;
  }

  private grow(): void {
    const size = Math.max(FIRST_SIZE, this.rows.length * 2);
    const widen = <T extends Int32Array | Uint8Array>(old: T, make: (n: number) => T): T => {
      const next = make(size);
      next.set(old);
      return next;
    };
    this.rows = widen(this.rows, (n) => new Int32Array(n));
    this.cols = widen(this.cols, (n) => new Int32Array(n));
    this.kinds = widen(this.kinds, (n) => new Uint8Array(n));
    this.bottoms = widen(this.bottoms, (n) => new Int32Array(n));
    this.rights = widen(this.rights, (n) => new Int32Array(n));
  }
}
