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

/** Hash of one argument's cells, or NaN when a cell cannot be keyed (error objects). */
function hashOf(arg: unknown, hash: number): number {
  if (arg === null || arg === undefined) return mix(hash, 1);
  switch (typeof arg) {
    case "number":
      scratch[0] = arg === 0 ? 0 : arg;
      return mix(mix(mix(hash, 2), scratchWords[0]), scratchWords[1]);
    case "string": {
      // One multiply per character (FNV-1a's step), then one full mix: text cells are most of a schedule row's cells.
      let h = mix(hash, 3 + arg.length * 16);
      for (let i = 0; i < arg.length; i++) h = Math.imul(h ^ arg.charCodeAt(i), 0x01000193);
      return mix(h, 0);
    }
    case "boolean":
      return mix(hash, arg ? 4 : 5);
    case "object": {
      if (!Array.isArray(arg)) return NaN;
      let h = mix(hash, 6 + arg.length * 16);
      for (let i = 0; i < arg.length; i++) {
        h = hashOf(arg[i], h);
        if (h !== h) return NaN;
      }
      return mix(h, 7);
    }
    default:
      return NaN;
  }
}

/** A 32-bit hash of the member arguments' cells, or null when they cannot be keyed. */
export function memberHash(args: MemberArgs): number | null {
  const parts = [args.spans, args.loads, args.supports, args.EI, args.combo, args.units ?? null];
  let h = 0x9e3779b9 | 0;
  for (let i = 0; i < parts.length; i++) {
    h = hashOf(parts[i], mix(h, 11 + i));
    if (h !== h) return null;
  }
  return h >>> 0;
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

/** Writes an argument's cells into `cells` from index n (arrays as mark, length, items); the next index. */
function flatten(arg: unknown, cells: unknown[], n: number): number {
  if (Array.isArray(arg)) {
    cells[n++] = ARRAY_MARK;
    cells[n++] = arg.length;
    for (let i = 0; i < arg.length; i++) n = flatten(arg[i], cells, n);
    return n;
  }
  cells[n] = arg ?? null;
  return n + 1;
}

/** The index after the argument when `cells` from n hold exactly its cells (as sameCells judges), else -1. */
function matchFlat(arg: unknown, cells: unknown[], n: number): number {
  if (Array.isArray(arg)) {
    if (cells[n] !== ARRAY_MARK || cells[n + 1] !== arg.length) return -1;
    n += 2;
    for (let i = 0; i < arg.length && n >= 0; i++) n = matchFlat(arg[i], cells, n);
    return n;
  }
  return cells[n] === (arg ?? null) ? n + 1 : -1;
}

/** One recently solved member: its hash, a flat copy of its cells (a buffer reused slot by slot) and its solution. */
export interface Recent {
  hash: number;
  cells: unknown[];
  size: number;
  solution: Solution | undefined;
}

function flattenArgs(args: MemberArgs, cells: unknown[]): number {
  let n = flatten(args.spans, cells, 0);
  n = flatten(args.loads, cells, n);
  n = flatten(args.supports, cells, n);
  n = flatten(args.EI, cells, n);
  n = flatten(args.combo, cells, n);
  return flatten(args.units ?? null, cells, n);
}

function matchesRecent(args: MemberArgs, slot: Recent): boolean {
  if (slot.solution === undefined) return false;
  const { cells } = slot;
  let n = matchFlat(args.spans, cells, 0);
  if (n >= 0) n = matchFlat(args.loads, cells, n);
  if (n >= 0) n = matchFlat(args.supports, cells, n);
  if (n >= 0) n = matchFlat(args.EI, cells, n);
  if (n >= 0) n = matchFlat(args.combo, cells, n);
  if (n >= 0) n = matchFlat(args.units ?? null, cells, n);
  return n === slot.size;
}

/** A flat copy of member arguments and whether arguments match it: the recent tier's comparison, exported for tests. */
export function flatCopy(args: MemberArgs): Recent {
  const cells: unknown[] = [];
  return { hash: 0, cells, size: flattenArgs(args, cells), solution: {} as Solution };
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
    for (let i = 0; i < recentCapacity; i++) this.recent.push({ hash: 0, cells: [], size: 0, solution: undefined });
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
    slot.size = flattenArgs(args, slot.cells);
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
