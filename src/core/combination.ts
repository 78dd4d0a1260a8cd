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

const TERM = /^([+-])?\s*(?:(\d+(?:\.\d*)?|\.\d+)\s*\*?\s*)?([A-Za-z][A-Za-z0-9]*)\s*/;

/**
 * Parses a combination such as `1.2D + 1.6L + 0.5S`: terms joined by + or -, each an
 * optional decimal factor (optionally followed by *) and a case label of letters and digits
 * starting with a letter. Labels are case-sensitive (L and Lr differ). Blank text means
 * every load at 1.0. Malformed text throws #VALUE! naming the fault and its position.
 */
export function parseCombination(text: string | null | undefined): Combination {
  const source = text == null ? "" : String(text);
  const terms: CombinationTerm[] = [];
  let rest = source.trim();
  if (rest === "") return { text: "", terms };
  const seen = new Set<string>();
  let first = true;
  while (rest.length > 0) {
    const at = source.length - source.trimStart().length + (source.trim().length - rest.length) + 1;
    const match = TERM.exec(rest);
    if (!match || (!first && !match[1])) {
      const found = rest.slice(0, 12);
      const signed = /^[+-]/.test(rest);
      const what = first || signed ? "a factor and a case label" : "'+' or '-' before the next term";
      throw invalid(`combination "${source.trim()}": expected ${what} at character ${at}, found "${found}"`);
    }
    const magnitude = match[2] !== undefined ? Number(match[2]) : 1;
    const factor = match[1] === "-" ? -magnitude : magnitude;
    const loadCase = match[3];
    if (seen.has(loadCase)) throw invalid(`combination "${source.trim()}": case ${loadCase} appears more than once`);
    seen.add(loadCase);
    terms.push({ factor, loadCase });
    rest = rest.slice(match[0].length);
    first = false;
  }
  return { text: source.trim(), terms };
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
