/**
 * Solved members, keyed on the raw member arguments, so that a diagram, or many x-cells of
 * one member, solve once. Solving is pure, so a cached solution is always the right one.
 *
 * The hot path is lean: a 32-bit hash of the cell values (no strings built, no parsing)
 * finds the entry, and a cell-by-cell comparison with a copy of the arguments it was solved
 * from confirms it, so a hash collision is only ever a miss. Different spellings of one
 * member (6 vs "6", a range vs a text cell) just get separate entries. Least recently used
 * entries are dropped beyond the capacity.
 *
 * Admission on second sight: a member is kept in the cache only when its hash has been seen
 * before (a small table of recent hashes, no allocation). A schedule of thousands of distinct
 * members then retains nothing for the garbage collector to promote, which halves the cost
 * of a parametric study, while a member read twice (many x-cells, a diagram after a moment)
 * is cached from its second call on. The member solved last is always kept for the next call.
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
      let h = mix(hash, 3 + arg.length * 16);
      for (let i = 0; i < arg.length; i++) h = mix(h, arg.charCodeAt(i));
      return h;
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

interface Entry {
  args: MemberArgs;
  solution: Solution;
}

/** Solutions keyed on the raw member arguments. */
export class MemberCache {
  private readonly entries: LruCache<number, Entry>;
  /** The entry used last: already the most recent, so a repeat hit skips the LRU update. */
  private lastHash = -1;
  private lastEntry: Entry | undefined = undefined;
  /** Hashes seen recently, one per slot (0 = empty). */
  private readonly seen = new Uint32Array(SEEN_SLOTS);
  constructor(readonly capacity: number) {
    this.entries = new LruCache(capacity);
  }

  get size(): number {
    return this.entries.size;
  }

  /**
   * The solution of the last member used, when these arguments hold the same cells: the
   * common case of many x-cells of one member, answered without even hashing.
   */
  getLast(args: MemberArgs): Solution | undefined {
    const entry = this.lastEntry;
    return entry !== undefined && sameArgs(entry.args, args) ? entry.solution : undefined;
  }

  /** The solution cached for exactly these arguments, if any. */
  get(args: MemberArgs, hash: number): Solution | undefined {
    const entry = hash === this.lastHash ? this.lastEntry : this.entries.get(hash);
    if (entry === undefined) return undefined;
    this.lastHash = hash;
    this.lastEntry = entry;
    return sameArgs(entry.args, args) ? entry.solution : undefined;
  }

  set(args: MemberArgs, hash: number, solution: Solution): void {
    const entry = { args: copyOf(args), solution };
    this.entries.set(hash, entry);
    this.lastHash = hash;
    this.lastEntry = entry;
  }

  /**
   * Keeps a fresh solution: in the cache when its hash was seen before, otherwise only as
   * the last member used (and its hash is remembered for next time).
   */
  remember(args: MemberArgs, hash: number, solution: Solution): void {
    const slot = hash & (SEEN_SLOTS - 1);
    const tag = hash === 0 ? 1 : hash;
    if (this.seen[slot] === tag) {
      this.set(args, hash, solution);
      return;
    }
    this.seen[slot] = tag;
    this.lastHash = -1;
    this.lastEntry = { args: copyOf(args), solution };
  }

  clear(): void {
    this.entries.clear();
    this.seen.fill(0);
    this.lastHash = -1;
    this.lastEntry = undefined;
  }
}

/** How many solved members are kept. */
export const MEMBER_CACHE_SIZE = 256;

/** The solved-member cache shared by every sheet function. */
export const solvedMembers = new MemberCache(MEMBER_CACHE_SIZE);
