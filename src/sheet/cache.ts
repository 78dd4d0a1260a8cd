/**
 * Solved members, keyed on the raw member arguments, so that a diagram, many x-cells of one
 * member, or a schedule row asking several functions about one member, solve once. Solving is
 * pure, so a cached solution is always the right one.
 *
 * The hot path is lean: the member used last is compared cell by cell first (no hashing);
 * otherwise a 32-bit hash of the cell values (no strings built, no parsing) finds the entry
 * and a cell-by-cell comparison with a copy of the arguments it was solved from confirms it,
 * so a hash collision is only ever a miss. Different spellings of one member (6 vs "6", a
 * range vs a text cell) just get separate entries.
 *
 * Two tiers (see MemberCache): the last RECENT_MEMBERS (8) members, each as a flat copy of
 * its cells in a buffer the slot reuses, and up to MEMBER_CACHE_SIZE (256) members admitted
 * on second sight (their hash was seen before, from a table of 4,096 recent hashes), each
 * with a structured copy of its arguments, least recently used dropped first. A schedule of
 * thousands of distinct members therefore retains only the recent tier, while a member that
 * comes back after leaving it is cached from then on.
 */
import type { Solution } from "../core";
import type { MemberArgs } from "./member";

const scratch = new Float64Array(1);
const scratchWords = new Uint32Array(scratch.buffer);

function mix(hash: number, value: number): number {
  let h = Math.imul(hash ^ value, 0x5bd1e995);
  h ^= h >>> 15;
  return h;
}

/** Hash of one primitive cell (null, undefined, number, string, boolean), or NaN when it cannot be keyed. */
function hashCell(cell: unknown, hash: number): number {
  if (cell === null || cell === undefined) return mix(hash, 1);
  switch (typeof cell) {
    case "number": {
      // The double's two words, the type tag folded into the high word (one mix per word).
      scratch[0] = cell === 0 ? 0 : cell;
      return mix(mix(hash, scratchWords[0]), scratchWords[1] ^ 0x2bd3);
    }
    case "string": {
      // Two characters per multiply (text cells are most of a schedule row's cells), then one full mix.
      const n = cell.length;
      let h = mix(hash, 3 + n * 16);
      let i = 0;
      for (; i + 1 < n; i += 2) {
        h = Math.imul(h ^ (cell.charCodeAt(i) | (cell.charCodeAt(i + 1) << 16)), 0x5bd1e995);
        h = (h << 13) | (h >>> 19);
      }
      if (i < n) h = Math.imul(h ^ cell.charCodeAt(i), 0x5bd1e995);
      return mix(h, 0);
    }
    case "boolean":
      return mix(hash, cell ? 4 : 5);
    default:
      return NaN;
  }
}

/**
 * Hash of one argument's cells, or NaN when a cell cannot be keyed (error objects). A range
 * (rows of cells) is hashed in two plain loops; deeper nesting, which the host never passes,
 * recurses.
 */
function hashOf(arg: unknown, hash: number): number {
  if (!Array.isArray(arg)) return typeof arg === "object" && arg !== null ? NaN : hashCell(arg, hash);
  let h = mix(hash, 6 + arg.length * 16);
  for (let i = 0; i < arg.length; i++) {
    const row: unknown = arg[i];
    if (Array.isArray(row)) {
      h = mix(h, 6 + row.length * 16);
      for (let j = 0; j < row.length; j++) {
        const cell: unknown = row[j];
        h = typeof cell === "object" && cell !== null ? hashOf(cell, h) : hashCell(cell, h);
        if (h !== h) return NaN;
      }
      h = mix(h, 7);
    } else {
      h = typeof row === "object" && row !== null ? NaN : hashCell(row, h);
      if (h !== h) return NaN;
    }
  }
  return mix(h, 7);
}

/** A 32-bit hash of the member arguments' cells, or null when they cannot be keyed. */
export function memberHash(args: MemberArgs): number | null {
  // NaN (a cell that cannot be keyed) is checked after each argument: mix() would turn it into a number.
  let h = hashOf(args.spans, mix(0x9e3779b9 | 0, 11));
  if (h === h) h = hashOf(args.loads, mix(h, 12));
  if (h === h) h = hashOf(args.supports, mix(h, 13));
  if (h === h) h = hashOf(args.EI, mix(h, 14));
  if (h === h) h = hashOf(args.combo, mix(h, 15));
  if (h === h) h = hashOf(args.units ?? null, mix(h, 16));
  return h !== h ? null : h >>> 0;
}

/** True when two arguments hold the same cells in the same shape (same types, same values). */
export function sameCells(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (a === null || b === null || a === undefined || b === undefined) return (a ?? null) === (b ?? null);
  if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!sameCells(a[i], b[i])) return false;
  return true;
}

function sameArgs(a: MemberArgs, b: MemberArgs): boolean {
  return (
    sameCells(a.spans, b.spans) &&
    sameCells(a.loads, b.loads) &&
    sameCells(a.supports, b.supports) &&
    sameCells(a.EI, b.EI) &&
    sameCells(a.combo, b.combo) &&
    sameCells(a.units ?? null, b.units ?? null)
  );
}

/** A copy of an argument's cells (arrays copied, cell values are primitives). */
function snapshot(arg: unknown): unknown {
  return Array.isArray(arg) ? arg.map(snapshot) : arg;
}

/** A small least-recently-used map. */
export class LruCache<K, V> {
  private readonly entries = new Map<K, V>();
  constructor(readonly capacity: number) {}

  get size(): number {
    return this.entries.size;
  }

  get(key: K): V | undefined {
    const value = this.entries.get(key);
    if (value !== undefined) {
      this.entries.delete(key);
      this.entries.set(key, value);
    }
    return value;
  }

  set(key: K, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value as K);
  }

  clear(): void {
    this.entries.clear();
  }
}

function copyOf(args: MemberArgs): MemberArgs {
  return {
    spans: snapshot(args.spans),
    loads: snapshot(args.loads),
    supports: snapshot(args.supports),
    EI: snapshot(args.EI),
    combo: snapshot(args.combo),
    units: snapshot(args.units ?? null),
  };
}

/** Slots of the table of recently seen hashes (a power of two). */
const SEEN_SLOTS = 4096;

/** How many recently solved members are kept as a flat copy of their cells (a row's members). */
export const RECENT_MEMBERS = 8;

/** Marks the start of an array in a flat copy (followed by its length); never a cell value. */
const ARRAY_MARK: object = Object.freeze({});

/**
 * Stands for a number cell in a flat copy; the number itself is in the slot's `numbers` at the
 * same index (a typed buffer: no reference to the caller's boxed numbers is kept, so filling a
 * slot costs no write barrier per number).
 */
const NUMBER_MARK: object = Object.freeze({});

/** One recently solved member: its hash, a flat copy of its cells (buffers reused slot by slot) and its solution. */
export interface Recent {
  hash: number;
  cells: unknown[];
  numbers: Float64Array;
  size: number;
  solution: Solution | undefined;
}

/** Writes one primitive cell at index n of the slot's flat copy; the next index. */
function putCell(cell: unknown, slot: Recent, n: number): number {
  if (typeof cell === "number") {
    if (n >= slot.numbers.length) {
      const grown = new Float64Array(Math.max(64, 2 * (n + 1)));
      grown.set(slot.numbers);
      slot.numbers = grown;
    }
    slot.cells[n] = NUMBER_MARK;
    slot.numbers[n] = cell;
  } else slot.cells[n] = cell ?? null;
  return n + 1;
}

/** True when index n of the slot's flat copy holds exactly this primitive cell (===, as sameCells compares). */
function sameCell(cell: unknown, slot: Recent, n: number): boolean {
  if (typeof cell === "number") return slot.cells[n] === NUMBER_MARK && slot.numbers[n] === cell;
  return slot.cells[n] === (cell ?? null);
}

/**
 * Writes an argument's cells into the slot's flat copy from index n (arrays as mark, length,
 * items); the next index. A range's rows are written in a plain loop; deeper nesting recurses.
 */
function flatten(arg: unknown, slot: Recent, n: number): number {
  if (!Array.isArray(arg)) return putCell(arg, slot, n);
  const { cells } = slot;
  cells[n++] = ARRAY_MARK;
  cells[n++] = arg.length;
  for (let i = 0; i < arg.length; i++) {
    const row: unknown = arg[i];
    if (!Array.isArray(row)) {
      n = putCell(row, slot, n);
      continue;
    }
    cells[n++] = ARRAY_MARK;
    cells[n++] = row.length;
    for (let j = 0; j < row.length; j++) {
      const cell: unknown = row[j];
      n = Array.isArray(cell) ? flatten(cell, slot, n) : putCell(cell, slot, n);
    }
  }
  return n;
}

/** The index after the argument when the slot's flat copy from n holds exactly its cells (as sameCells judges), else -1. */
function matchFlat(arg: unknown, slot: Recent, n: number): number {
  if (!Array.isArray(arg)) return sameCell(arg, slot, n) ? n + 1 : -1;
  const { cells } = slot;
  if (cells[n] !== ARRAY_MARK || cells[n + 1] !== arg.length) return -1;
  n += 2;
  for (let i = 0; i < arg.length; i++) {
    const row: unknown = arg[i];
    if (!Array.isArray(row)) {
      if (!sameCell(row, slot, n++)) return -1;
      continue;
    }
    if (cells[n] !== ARRAY_MARK || cells[n + 1] !== row.length) return -1;
    n += 2;
    for (let j = 0; j < row.length; j++) {
      const cell: unknown = row[j];
      if (Array.isArray(cell)) {
        n = matchFlat(cell, slot, n);
        if (n < 0) return -1;
      } else if (!sameCell(cell, slot, n++)) return -1;
    }
  }
  return n;
}

function flattenArgs(args: MemberArgs, slot: Recent): number {
  let n = flatten(args.spans, slot, 0);
  n = flatten(args.loads, slot, n);
  n = flatten(args.supports, slot, n);
  n = flatten(args.EI, slot, n);
  n = flatten(args.combo, slot, n);
  return flatten(args.units ?? null, slot, n);
}

function matchesRecent(args: MemberArgs, slot: Recent): boolean {
  if (slot.solution === undefined) return false;
  let n = matchFlat(args.spans, slot, 0);
  if (n >= 0) n = matchFlat(args.loads, slot, n);
  if (n >= 0) n = matchFlat(args.supports, slot, n);
  if (n >= 0) n = matchFlat(args.EI, slot, n);
  if (n >= 0) n = matchFlat(args.combo, slot, n);
  if (n >= 0) n = matchFlat(args.units ?? null, slot, n);
  return n === slot.size;
}

function emptySlot(): Recent {
  return { hash: 0, cells: [], numbers: new Float64Array(64), size: 0, solution: undefined };
}

/** A flat copy of member arguments and whether arguments match it: the recent tier's comparison, exported for tests. */
export function flatCopy(args: MemberArgs): Recent {
  const copy = emptySlot();
  copy.size = flattenArgs(args, copy);
  copy.solution = {} as Solution;
  return copy;
}

export function matchesFlatCopy(args: MemberArgs, copy: Recent): boolean {
  return matchesRecent(args, copy);
}

interface Entry {
  args: MemberArgs;
  solution: Solution;
}

/** What the cache did, for tests and benchmarks (never for timing). */
export interface CacheCounts {
  /** Lookups that found nothing: each is followed by exactly one solve. */
  misses: number;
  /** Lookups answered by a recent member. */
  recentHits: number;
  /** Lookups answered by the least-recently-used cache. */
  cachedHits: number;
  /** Members copied into the least-recently-used cache (on second sight). */
  admitted: number;
}

/**
 * Solutions keyed on the raw member arguments, in two tiers:
 * - the last RECENT_MEMBERS members solved or found, each as a flat copy of its cells written
 *   into a buffer the slot reuses (no allocation once the buffer has grown), so a spreadsheet
 *   row that asks several functions about a few members solves each member once;
 * - up to `capacity` members admitted on second sight (their hash was seen before, so they came
 *   back after leaving the recent tier), each with a structured copy of its arguments.
 * Both confirm a hash match cell by cell, so a hash collision is only ever a miss.
 */
export class MemberCache {
  private readonly entries: LruCache<number, Entry>;
  private readonly recent: Recent[] = [];
  /** The slot looked at first (the one used last) and the slot overwritten next. */
  private newest = 0;
  private nextSlot = 0;
  /** Hashes seen recently, one per slot (0 = empty). */
  private readonly seen = new Uint32Array(SEEN_SLOTS);
  /** The arguments of the last miss and their hash, so keeping its solution does not hash again. */
  private missArgs: MemberArgs | undefined = undefined;
  private missHash: number | null = null;
  readonly counts: CacheCounts = { misses: 0, recentHits: 0, cachedHits: 0, admitted: 0 };

  constructor(
    readonly capacity: number,
    readonly recentCapacity: number = RECENT_MEMBERS,
  ) {
    this.entries = new LruCache(capacity);
    for (let i = 0; i < recentCapacity; i++) this.recent.push(emptySlot());
  }

  /** Members in the least-recently-used tier. */
  get size(): number {
    return this.entries.size;
  }

  /** Members in the recent tier. */
  get recentSize(): number {
    return this.recent.filter((slot) => slot.solution !== undefined).length;
  }

  /**
   * The solution for exactly these arguments, if kept: the member used last is checked first
   * without hashing (many x-cells of one member), then the recent members, then the cache.
   */
  find(args: MemberArgs): Solution | undefined {
    const first = this.recent[this.newest];
    if (first !== undefined && matchesRecent(args, first)) {
      this.counts.recentHits++;
      return first.solution;
    }
    const hash = memberHash(args);
    this.missArgs = args;
    this.missHash = hash;
    if (hash === null) {
      this.counts.misses++;
      return undefined;
    }
    for (let i = 0; i < this.recent.length; i++) {
      const slot = this.recent[i];
      if (i !== this.newest && slot.hash === hash && matchesRecent(args, slot)) {
        this.newest = i;
        this.counts.recentHits++;
        return slot.solution;
      }
    }
    const cached = this.get(args, hash);
    if (cached !== undefined) {
      this.counts.cachedHits++;
      this.putRecent(args, hash, cached);
      return cached;
    }
    this.counts.misses++;
    return undefined;
  }

  /**
   * Keeps a fresh solution of these arguments (after a miss): among the recent members, and
   * in the cache when its hash was seen before (the member came back).
   */
  keep(args: MemberArgs, solution: Solution): void {
    const hash = args === this.missArgs ? this.missHash : memberHash(args);
    this.missArgs = undefined;
    if (hash === null) return;
    const slot = hash & (SEEN_SLOTS - 1);
    const tag = hash === 0 ? 1 : hash;
    if (this.seen[slot] === tag) this.set(args, hash, solution);
    else this.seen[slot] = tag;
    this.putRecent(args, hash, solution);
  }

  /** The solution in the cache tier for exactly these arguments, if any. */
  get(args: MemberArgs, hash: number): Solution | undefined {
    const entry = this.entries.get(hash);
    return entry !== undefined && sameArgs(entry.args, args) ? entry.solution : undefined;
  }

  /** Admits a member to the cache tier, with a copy of its arguments. */
  set(args: MemberArgs, hash: number, solution: Solution): void {
    this.counts.admitted++;
    this.entries.set(hash, { args: copyOf(args), solution });
  }

  private putRecent(args: MemberArgs, hash: number, solution: Solution): void {
    if (this.recent.length === 0) return;
    const index = this.nextSlot;
    const slot = this.recent[index];
    slot.hash = hash;
    slot.size = flattenArgs(args, slot);
    slot.solution = solution;
    this.newest = index;
    this.nextSlot = (index + 1) % this.recent.length;
  }

  /** Forgets every member, the seen hashes and the counts. */
  clear(): void {
    this.entries.clear();
    this.seen.fill(0);
    for (const slot of this.recent) {
      slot.cells.length = 0;
      slot.size = 0;
      slot.solution = undefined;
    }
    this.newest = 0;
    this.nextSlot = 0;
    this.missArgs = undefined;
    this.counts.misses = this.counts.recentHits = this.counts.cachedHits = this.counts.admitted = 0;
  }
}

/** How many solved members are kept. */
export const MEMBER_CACHE_SIZE = 256;

/** The solved-member cache shared by every sheet function. */
export const solvedMembers = new MemberCache(MEMBER_CACHE_SIZE);
