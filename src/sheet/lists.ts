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
import { decimalValue, isBlank, isEmpty, numberFromText, readNumber } from "./cells";
import { isAllBlank, listEntries, singleCell, splitList } from "./ranges";

/**
 * Most spans one member may have (a real continuous member has far fewer). A span costs about
 * twice a load to read and solve (tests/bench/limits.bench.ts: 10,000 spans and one load took
 * 250 ms, one span and 10,000 loads 115 ms), so this limit with MAX_LOADS keeps a member at
 * both limits near 70 ms.
 */
export const MAX_SPANS = 1000;

function positive(entries: readonly unknown[], count: number, name: string, what: string): number[] {
  const values = new Array<number>(count);
  for (let i = 0; i < count; i++) {
    const value = readNumber(entries[i], () => `${name} entry ${i + 1}`);
    if (!(value > 0)) throw invalid(`${name} entry ${i + 1}: ${what} must be positive, got ${value}`);
    values[i] = value;
  }
  return values;
}

/**
 * The spans of one ASCII text cell of plain positive decimals separated by spaces or commas
 * ("6 8 6", "6, 8.50, 1e1"), read in one pass without building strings; null for any other
 * text (a character past ASCII, a word, a blank or non-positive entry, no entry, more than
 * MAX_SPANS), which the full reader then reads or refuses with its message. When it gives
 * spans, they are the spans the full reader gives.
 */
function plainSpansText(text: string): number[] | null {
  const spans: number[] = [];
  const n = text.length;
  let i = 0;
  while (i < n) {
    let c = text.charCodeAt(i);
    // Separators as splitList's /[\s,]+/ sees them in ASCII: whitespace (9-13, 32) and commas.
    if (c === 32 || c === 44 || (c >= 9 && c <= 13)) {
      i++;
      continue;
    }
    const start = i;
    do {
      if (c > 127) return null;
      c = ++i < n ? text.charCodeAt(i) : 32;
    } while (!(c === 32 || c === 44 || (c >= 9 && c <= 13)));
    const value = decimalValue(text, start, i);
    if (!(value > 0) || spans.length === MAX_SPANS) return null;
    spans.push(value);
  }
  return spans.length === 0 ? null : spans;
}

/**
 * The spans of a range of plain cells: one row or one column of finite positive numbers with
 * no blank after them; null for anything else (the full reader then reads or refuses it).
 */
function plainSpansRange(arg: unknown[]): number[] | null {
  if (arg.length === 0 || arg.length > MAX_SPANS) return null;
  const first: unknown = arg[0];
  if (!Array.isArray(first)) return null;
  if (arg.length === 1) {
    const count = first.length;
    if (count === 0 || count > MAX_SPANS) return null;
    const spans = new Array<number>(count);
    for (let i = 0; i < count; i++) {
      const value: unknown = first[i];
      if (typeof value !== "number" || !(value > 0) || value === Infinity) return null;
      spans[i] = value;
    }
    return spans;
  }
  const spans = new Array<number>(arg.length);
  for (let i = 0; i < arg.length; i++) {
    const row: unknown = arg[i];
    if (!Array.isArray(row) || row.length !== 1) return null;
    const value: unknown = row[0];
    if (typeof value !== "number" || !(value > 0) || value === Infinity) return null;
    spans[i] = value;
  }
  return spans;
}

/** Span lengths, left to right, each positive; at most MAX_SPANS. */
export function readSpans(arg: unknown): number[] {
  // The common spellings first (see plainSpansText, plainSpansRange), each falling back to the full reader.
  if (Array.isArray(arg)) {
    const single = arg.length === 1 && Array.isArray(arg[0]) && arg[0].length === 1 ? (arg[0] as unknown[])[0] : undefined;
    const plain = typeof single === "string" ? plainSpansText(single) : plainSpansRange(arg);
    if (plain !== null) return plain;
  } else if (typeof arg === "string") {
    const plain = plainSpansText(arg);
    if (plain !== null) return plain;
  }
  return readSpansFully(arg);
}

/** readSpans without the fast paths: every spelling, and every message. Exported for the tests that compare the two. */
export function readSpansFully(arg: unknown): number[] {
  const entries = listEntries(arg, "spans");
  let count = entries.length;
  while (count > 0 && isEmpty(entries[count - 1])) count--;
  if (count === 0) throw invalid("spans: give at least one span length");
  if (count > MAX_SPANS) throw invalid(`spans: at most ${MAX_SPANS} spans on one member, got ${count}`);
  return positive(entries, count, "spans", "a span length");
}

/** The word that follows an EI value with that span's shear stiffness G·A_v (force units). */
export const SHEAR_WORD = "shear";

/** The EI argument read: EI per span, and G·A_v per span (null where none) or null when no entry gives one. */
export interface Flexure {
  stiffness: number[] | null;
  shear: (number | null)[] | null;
}

interface FlexureEntry {
  ei: unknown;
  shear: string | null;
}

const isShearWord = (token: string): boolean => token.toLowerCase() === SHEAR_WORD;

/**
 * The EI entries with their shear stiffness: in one text cell, `shear G` after an EI value
 * belongs to it ("2.1e5 shear 8e4" is one entry; "2e5 shear 8e4, 3e5" two); in a range, a cell
 * is a number or text "EI" or "EI shear G". One pass over the tokens (linear).
 */
function flexureEntries(arg: unknown): FlexureEntry[] {
  const single = singleCell(arg);
  const fromText = typeof single === "string" && !single.trim().startsWith("#");
  const cells = fromText ? [single] : listEntries(arg, "EI");
  const out: FlexureEntry[] = [];
  for (const cell of cells) {
    if (typeof cell !== "string" || (!fromText && !/shear/i.test(cell))) {
      out.push({ ei: cell, shear: null });
      continue;
    }
    const tokens = splitList(cell);
    const first = out.length;
    for (let i = 0; i < tokens.length; i++) {
      if (!isShearWord(tokens[i])) {
        out.push({ ei: tokens[i], shear: null });
        continue;
      }
      const entry = out.length > first ? out[out.length - 1] : null;
      if (entry === null || entry.shear !== null) {
        throw invalid(`EI entry ${out.length + (entry === null ? 1 : 0)}: "${SHEAR_WORD}" must follow an EI value, as in 2.1e5 ${SHEAR_WORD} 8e4 (EI, then the shear stiffness G·A_v)`);
      }
      entry.shear = i + 1 < tokens.length ? tokens[++i] : "";
    }
    if (!fromText && out.length !== first + 1) {
      throw invalid(`EI entry ${first + 1}: ${JSON.stringify(cell.trim().length <= 40 ? cell.trim() : `${cell.trim().slice(0, 37)}...`)} is not one EI; write EI or EI ${SHEAR_WORD} G·A_v in each cell`);
    }
  }
  return out;
}

function shearOf(entry: FlexureEntry, index: number): number | null {
  if (entry.shear === null) return null;
  const value = numberFromText(entry.shear);
  if (value === null || !(value > 0)) {
    throw invalid(`EI entry ${index + 1}: ${SHEAR_WORD} must be followed by a positive shear stiffness G·A_v (force units), got ${JSON.stringify(entry.shear.length <= 20 ? entry.shear : `${entry.shear.slice(0, 17)}...`)}`);
  }
  return value;
}

/**
 * EI per span, or null when omitted (uniform member; slope and deflection unavailable), and
 * the optional shear stiffness G·A_v per span written after EI with the word `shear`. One
 * value is the whole member's; otherwise one positive value per span, none of them blank.
 */
export function readFlexure(arg: unknown, spanCount: number): Flexure {
  if (isAllBlank(arg)) return { stiffness: null, shear: null };
  const entries = flexureEntries(arg);
  let count = entries.length;
  while (count > Math.max(spanCount, 1) && isBlank(entries[count - 1].ei) && entries[count - 1].shear === null) count--;
  const used = count === 1 ? 1 : count;
  const stiffness = readStiffnessEntries(entries.map((e) => e.ei), count, spanCount);
  let shear: (number | null)[] | null = null;
  for (let i = 0; i < used; i++) {
    const ga = shearOf(entries[i], i);
    if (ga === null) continue;
    if (shear === null) shear = new Array<number | null>(spanCount).fill(null);
    if (count === 1) shear.fill(ga);
    else shear[i] = ga;
  }
  return { stiffness, shear };
}

/**
 * EI per span, or null when omitted (uniform member; slope and deflection unavailable). One
 * value is the whole member's; otherwise one positive value per span, none of them blank.
 */
export function readStiffness(arg: unknown, spanCount: number): number[] | null {
  return readFlexure(arg, spanCount).stiffness;
}

function readStiffnessEntries(entries: unknown[], count: number, spanCount: number): number[] {
  if (count === spanCount) return positive(entries, count, "EI", "EI");
  if (count === 1) return new Array<number>(spanCount).fill(positive(entries, 1, "EI", "EI")[0]);
  let blank = 1;
  while (blank < count && !isBlank(entries[blank])) blank++;
  if (blank < count) {
    throw invalid(`EI entry ${blank + 1}: the cell is blank or 0; give one EI per span (${spanCount}), or one value for the whole member in a single cell`);
  }
  throw invalid(`EI: give one value for the member or one per span (${spanCount}), got ${count}`);
}
