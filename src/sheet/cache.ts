/**
 * Solved members, keyed on the raw member arguments, so that a diagram, or many x-cells of
 * one member, solve once. Solving is pure, so a cached solution is always the right one.
 * The key is built straight from the cell values (before any parsing) to keep the hot path
 * lean; different spellings of one member just get separate entries. Least recently used
 * entries are dropped beyond `capacity`.
 */
import type { Solution } from "../core";
import type { MemberArgs } from "./member";

/** Appends one argument's cells to a key; false when a cell cannot be keyed (error objects). */
function keyOf(arg: unknown): string | null {
  if (arg === null || arg === undefined) return "_";
  switch (typeof arg) {
    case "number":
      return "n" + arg;
    case "string":
      return "s" + arg.length + ":" + arg;
    case "boolean":
      return arg ? "t" : "f";
    case "object":
      break;
    default:
      return null;
  }
  if (!Array.isArray(arg)) return null;
  let key = "[";
  for (let i = 0; i < arg.length; i++) {
    const part = keyOf(arg[i]);
    if (part === null) return null;
    key += part + ",";
  }
  return key + "]";
}

/** A cache key for the member arguments, or null when they cannot be keyed. */
export function memberKey(args: MemberArgs): string | null {
  const spans = keyOf(args.spans);
  const loads = keyOf(args.loads);
  const supports = keyOf(args.supports);
  const stiffness = keyOf(args.EI);
  const combo = keyOf(args.combo);
  if (spans === null || loads === null || supports === null || stiffness === null || combo === null) return null;
  return spans + "|" + loads + "|" + supports + "|" + stiffness + "|" + combo;
}

/** A small least-recently-used map. */
export class LruCache<V> {
  private readonly entries = new Map<string, V>();
  constructor(readonly capacity: number) {}

  get size(): number {
    return this.entries.size;
  }

  get(key: string): V | undefined {
    const value = this.entries.get(key);
    if (value !== undefined) {
      this.entries.delete(key);
      this.entries.set(key, value);
    }
    return value;
  }

  set(key: string, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) {
      const oldest = this.entries.keys().next().value as string;
      this.entries.delete(oldest);
    }
  }

  clear(): void {
    this.entries.clear();
  }
}

/** How many solved members are kept. */
export const MEMBER_CACHE_SIZE = 256;

/** The solved-member cache shared by every sheet function. */
export const solvedMembers = new LruCache<Solution>(MEMBER_CACHE_SIZE);
