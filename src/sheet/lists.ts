/**
 * Number-list arguments of a member: spans (one length per span) and EI (one value for the
 * member or one per span). Each takes a row or column of cells or one text cell of values
 * separated by spaces or commas.
 *
 * The blank and zero rule: a wholly blank argument (every cell empty or 0) means its default.
 * A range may be wider than the member: empty cells after the last span, and blank cells (empty
 * or 0) beyond the spans' count of EI values, are ignored. Any other blank or 0 is an error naming
 * the entry, because a computed 0 must never change the structure (a span of 0 dropped, one EI
 * cell of two blank read as uniform EI).
 */
import { invalid } from "../core";
import { isBlank, isEmpty, readNumber } from "./cells";
import { isAllBlank, listEntries } from "./ranges";

/** Most spans one member may have. */
export const MAX_SPANS = 10000;

function positive(entries: readonly unknown[], count: number, name: string, what: string): number[] {
  const values = new Array<number>(count);
  for (let i = 0; i < count; i++) {
    const value = readNumber(entries[i], () => `${name} entry ${i + 1}`);
    if (!(value > 0)) throw invalid(`${name} entry ${i + 1}: ${what} must be positive, got ${value}`);
    values[i] = value;
  }
  return values;
}

/** Span lengths, left to right, each positive; at most MAX_SPANS. */
export function readSpans(arg: unknown): number[] {
  const entries = listEntries(arg, "spans");
  let count = entries.length;
  while (count > 0 && isEmpty(entries[count - 1])) count--;
  if (count === 0) throw invalid("spans: give at least one span length");
  if (count > MAX_SPANS) throw invalid(`spans: ${count} spans; a member has at most ${MAX_SPANS}`);
  return positive(entries, count, "spans", "a span length");
}

/**
 * EI per span, or null when omitted (uniform member; slope and deflection unavailable). One
 * value is the whole member's; otherwise one positive value per span, none of them blank.
 */
export function readStiffness(arg: unknown, spanCount: number): number[] | null {
  if (isAllBlank(arg)) return null;
  const entries = listEntries(arg, "EI");
  let count = entries.length;
  while (count > Math.max(spanCount, 1) && isBlank(entries[count - 1])) count--;
  if (count === spanCount) return positive(entries, count, "EI", "EI");
  if (count === 1) return new Array<number>(spanCount).fill(positive(entries, 1, "EI", "EI")[0]);
  let blank = 1;
  while (blank < count && !isBlank(entries[blank])) blank++;
  if (blank < count) {
    throw invalid(`EI entry ${blank + 1}: the cell is blank or 0; give one EI per span (${spanCount}), or one value for the whole member in a single cell`);
  }
  throw invalid(`EI: give one value for the member or one per span (${spanCount}), got ${count}`);
}
