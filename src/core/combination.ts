import { invalid } from "./errors";
import type { Load } from "./model";

export interface CombinationTerm {
  factor: number;
  loadCase: string;
}

/** A parsed load combination; no terms means every load at factor 1. */
export interface Combination {
  text: string;
  terms: CombinationTerm[];
}

/**
 * One term, matched where the previous one ended (sticky). Linear time: the factor's digits
 * are one run, the point starts its own group, and the spaces around an optional "*" are
 * separate runs split by the "*" itself, so no two quantifiers compete for the same text.
 */
const TERM = /([+-])?\s*(?:(\d+(?:\.\d*)?|\.\d+)\s*(?:\*\s*)?)?([A-Za-z][A-Za-z0-9]*)\s*/y;
const LEADING_SPACE = /\s*/y;

/** Most terms one combination may have (a combination names each case once). */
export const MAX_TERMS = 100;

/**
 * Parses a combination such as `1.2D + 1.6L + 0.5S`: terms joined by + or -, each an
 * optional decimal factor (optionally followed by *) and a case label of letters and digits
 * starting with a letter. Labels are case-sensitive (L and Lr differ, and so do L and l).
 * Blank text means every load at 1.0. Malformed text throws #VALUE! naming the fault and its
 * position. At most MAX_TERMS terms.
 */
export function parseCombination(text: string | null | undefined): Combination {
  const source = text == null ? "" : String(text);
  const trimmed = source.trim();
  const terms: CombinationTerm[] = [];
  if (trimmed === "") return { text: "", terms };
  const seen = new Set<string>();
  LEADING_SPACE.lastIndex = 0;
  LEADING_SPACE.exec(source);
  let at = LEADING_SPACE.lastIndex;
  const end = at + trimmed.length;
  while (at < end) {
    TERM.lastIndex = at;
    const match = TERM.exec(source);
    const first = terms.length === 0;
    if (!match || (!first && !match[1])) {
      const found = source.slice(at, Math.min(end, at + 12));
      const signed = source[at] === "+" || source[at] === "-";
      const what = first || signed ? "a factor and a case label" : "'+' or '-' before the next term";
      throw invalid(`combination "${shortText(trimmed)}": expected ${what} at character ${at + 1}, found "${found}"`);
    }
    const magnitude = match[2] !== undefined ? Number(match[2]) : 1;
    const factor = match[1] === "-" ? -magnitude : magnitude;
    const loadCase = match[3];
    if (seen.has(loadCase)) throw invalid(`combination "${shortText(trimmed)}": case ${loadCase} appears more than once`);
    if (terms.length === MAX_TERMS) throw invalid(`combination "${shortText(trimmed)}": more than ${MAX_TERMS} terms; a combination names each case once`);
    seen.add(loadCase);
    terms.push({ factor, loadCase });
    at = TERM.lastIndex;
  }
  return { text: trimmed, terms };
}

/** A combination's text as a message quotes it: long text is cut. */
function shortText(text: string): string {
  return text.length <= 40 ? text : `${text.slice(0, 37)}...`;
}

/**
 * The exact decimal digits of an integer-valued double of any size, without BigInt (the
 * functions' runtime on Windows supports ECMAScript 2016 only): halve exactly down to a safe
 * integer, then double the digit string back up.
 */
export function integerDigits(value: number): string {
  let halvings = 0;
  let m = value;
  while (m > Number.MAX_SAFE_INTEGER) {
    m /= 2;
    halvings++;
  }
  const digits = String(m).split("").reverse().map(Number);
  for (let k = 0; k < halvings; k++) {
    let carry = 0;
    for (let i = 0; i < digits.length; i++) {
      const d = digits[i] * 2 + carry;
      digits[i] = d % 10;
      carry = d >= 10 ? 1 : 0;
    }
    if (carry) digits.push(carry);
  }
  return digits.reverse().join("");
}

/** A factor written without an exponent, so that the text parses back to the same factor. */
function plainDecimal(value: number): string {
  const text = String(value);
  if (!/e/i.test(text)) return text;
  if (value >= 1e21) return integerDigits(value);
  const digits = Math.min(100, Math.max(0, 20 - Math.floor(Math.log10(value))));
  return value.toFixed(digits).replace(/\.?0+$/, "");
}

/** The canonical text of a combination, e.g. `1.2D + 1.6L`. */
export function formatCombination(combination: Combination): string {
  return combination.terms
    .map((t, i) => {
      const sign = t.factor < 0 ? "-" : i === 0 ? "" : "+";
      const size = Math.abs(t.factor);
      const body = `${size === 1 ? "" : plainDecimal(size)}${t.loadCase}`;
      return i === 0 ? `${sign}${body}` : ` ${sign} ${body}`;
    })
    .join("");
}

/**
 * Factored copies of the loads under a combination. Loads whose case no term names are left
 * out; with no combination (or a blank one) every load is kept at factor 1. A load without a
 * case label under a non-blank combination is an error, since its factor is unknown.
 */
export function applyCombination(loads: Load[], combination: Combination | null): Load[] {
  if (!combination || combination.terms.length === 0) return loads;
  const factors = new Map(combination.terms.map((t) => [t.loadCase, t.factor]));
  const result: Load[] = [];
  for (const load of loads) {
    if (!load.loadCase) {
      throw invalid(`load row ${load.row} has no case label, but the combination "${combination.text}" needs one to know its factor`);
    }
    const factor = factors.get(load.loadCase);
    if (factor === undefined || factor === 0) continue;
    result.push({ ...load, magnitude: load.magnitude * factor, magnitudeEnd: load.magnitudeEnd * factor });
  }
  return result;
}

/**
 * The trade's standard case labels. A combination may name one of these although no load of
 * the member carries it (a schedule's `1.2D + 1.6L + 0.5S` on a member without snow), and a
 * load may carry one although the combination leaves it out (`1.4D` leaves the live load out).
 * Sources, from memory: ASCE/SEI 7-16 section 2.2 (symbols: Ak, D, Di, E, F, Fa, H, L, Lr,
 * R, S, T, W, Wi) and EN 1990:2002 section 1.6 (G permanent, Q variable, P prestressing,
 * A accidental actions). Labels are case-sensitive, as the standards write them.
 */
export const STANDARD_CASE_LABELS: readonly string[] = ["D", "Di", "E", "F", "Fa", "H", "L", "Lr", "R", "S", "T", "W", "Wi", "Ak", "G", "Q", "P", "A"];

const STANDARD = new Set<string>(STANDARD_CASE_LABELS);

/** True for one of the trade's standard case labels (exact spelling). */
export function isStandardCaseLabel(label: string): boolean {
  return STANDARD.has(label);
}

/** What the rule needs of a load: its case label ("" for none) and the row that names it. */
export interface LabelledLoad {
  loadCase: string;
  row: number;
}

/** One combination as the argument gave it: typed, or one of a named set's combinations. */
export interface CombinationUse {
  combination: Combination;
  /** The set's name when the combination came from a named set. */
  set?: string;
}

const LISTED = 8;

function listOf(labels: Iterable<string>): string {
  const all = [...labels];
  return all.length <= LISTED ? all.join(", ") : `${all.slice(0, LISTED).join(", ")}, ...`;
}

/** A label of `among` that differs from `label` only in letter case, if any. */
function sameButCase(label: string, among: Iterable<string>): string | undefined {
  const lower = label.toLowerCase();
  for (const other of among) if (other !== label && other.toLowerCase() === lower) return other;
  return undefined;
}

function caseHint(label: string, among: Iterable<string>): string {
  const near = sameButCase(label, among);
  return near === undefined ? "" : `; labels are case-sensitive: did you mean ${near}?`;
}

/**
 * The combination and case-label rule, the one definition every function that takes a
 * combination uses (and the pane's combination box). With every combination blank, every
 * load counts at factor 1 and labels do not matter. Otherwise:
 *  1. every load carries a case label (its factor is unknown without one);
 *  2. every label a typed combination names is carried by some load, or is a standard label
 *     (STANDARD_CASE_LABELS), so a typo such as `1.6LL` is caught;
 *  3. every load whose label is not standard is named by some combination (a factor of 0,
 *     `+0Live`, names it and leaves it out), so a load labelled `Live` or `l` is never
 *     silently left out;
 *  4. every typed combination, and every named set as a whole, selects some load at a
 *     factor other than 0.
 * Labels match exactly: L and l differ (messages point out a label that differs only in
 * letter case). Throws #VALUE! naming the label, the load row (`place`) and the labels the
 * loads carry.
 */
export function checkCombinations(
  loads: readonly LabelledLoad[],
  uses: readonly CombinationUse[],
  place: (load: LabelledLoad) => string = (load) => `load row ${load.row}`,
): void {
  const active = uses.filter((use) => use.combination.terms.length > 0);
  if (active.length === 0) return;
  const carried = new Map<string, LabelledLoad>();
  for (const load of loads) {
    if (load.loadCase === "") {
      throw invalid(`${place(load)} has no case label, but the combination "${shortText(active[0].combination.text)}" needs one to know its factor`);
    }
    if (!carried.has(load.loadCase)) carried.set(load.loadCase, load);
  }
  const carriedText = carried.size === 0 ? "the member has no loads" : `the loads carry ${listOf(carried.keys())}`;
  const named = new Set<string>();
  for (const use of active) {
    for (const term of use.combination.terms) {
      named.add(term.loadCase);
      if (use.set === undefined && !carried.has(term.loadCase) && !STANDARD.has(term.loadCase)) {
        throw invalid(
          `combination "${shortText(use.combination.text)}": no load carries case ${term.loadCase} (${carriedText})${caseHint(term.loadCase, carried.keys())}`,
        );
      }
    }
  }
  for (const [label, load] of carried) {
    if (STANDARD.has(label) || named.has(label)) continue;
    const by = active.length === 1 ? `the combination "${shortText(active[0].combination.text)}"` : "any of the combinations";
    throw invalid(
      `${place(load)}: case ${label} is not named by ${by} and is not a standard label, so its loads would be left out; name it (for example +0${label} to leave it out)${caseHint(label, [...named, ...STANDARD_CASE_LABELS])}`,
    );
  }
  const selects = (c: Combination) => c.terms.some((t) => t.factor !== 0 && carried.has(t.loadCase));
  const sets = new Map<string, boolean>();
  for (const use of active) {
    if (use.set !== undefined) {
      sets.set(use.set, (sets.get(use.set) ?? false) || selects(use.combination));
    } else if (!selects(use.combination)) {
      const cases = use.combination.terms.map((t) => t.loadCase);
      throw invalid(`combination "${shortText(use.combination.text)}" selects no load: no load with case ${listOf(cases)} at a factor other than 0 (${carriedText})`);
    }
  }
  for (const [set, selected] of sets) {
    if (!selected) throw invalid(`combination set ${set} selects no load: none of its combinations names a case the loads carry (${carriedText})`);
  }
}
