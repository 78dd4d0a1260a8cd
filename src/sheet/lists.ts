/**
 * Number-list arguments of a member: spans (one length per span) and EI (one value for the
 * member or one per span). Each takes a row or column of cells or one text cell of values
 * separated by spaces or commas. Blank cells after the last value are ignored.
 */
import { invalid } from "../core";
import { isBlank, readNumber } from "./cells";
import { isAllBlank, listEntries } from "./ranges";

function readNumbers(arg: unknown, name: string): number[] {
  const entries = listEntries(arg, name);
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  const values = new Array<number>(count);
  for (let i = 0; i < count; i++) values[i] = readNumber(entries[i], () => `${name} entry ${i + 1}`);
  return values;
}

/** Span lengths, left to right, each positive. */
export function readSpans(arg: unknown): number[] {
  const spans = readNumbers(arg, "spans");
  if (spans.length === 0) throw invalid("spans: give at least one span length");
  for (let i = 0; i < spans.length; i++) {
    if (!(spans[i] > 0)) throw invalid(`spans entry ${i + 1}: a span length must be positive, got ${spans[i]}`);
  }
  return spans;
}

/** EI per span, or null when omitted (uniform member; slope and deflection unavailable). */
export function readStiffness(arg: unknown, spanCount: number): number[] | null {
  if (isAllBlank(arg)) return null;
  const values = readNumbers(arg, "EI");
  if (values.length === 1) return new Array<number>(spanCount).fill(values[0]);
  if (values.length !== spanCount) {
    throw invalid(`EI: give one value for the member or one per span (${spanCount}), got ${values.length}`);
  }
  return values;
}
