/**
 * The load notation: a whole load table in one text cell, one load per ";".
 *
 *   point P at X [case]                    point force P at x = X
 *   moment C at X [case]                   couple C at x = X
 *   udl W [from A] [to B] [case]           uniform load W from A (default 0) to B (default member end)
 *   linear W1 to W2 [from A] [to B] [case] load varying from W1 at A to W2 at B
 *   settle D at X [case]                   support at x = X settles D (down +, deflection unit)
 *
 * Keywords are case-insensitive; numbers are plain decimals ("2.5", "-3", "1e3"); the case
 * label is optional and last (letters and digits starting with a letter, as combinations
 * name it). Every load-table row has exactly one text form (formatLoad): `from` is written
 * only when x start is not 0 and `to` only when x end is not the member end.
 */
import { invalid, MAX_LOADS, type LoadKind } from "../core";
import { decimalValue, numberFromText, SHORT_DIGITS, shortDecimal } from "./cells";
import { isCaseLabel, type LoadRow } from "./loadRow";

const KINDS = new Map<string, LoadKind>([
  ["point", "point"],
  ["moment", "moment"],
  ["udl", "udl"],
  ["linear", "linear"],
  ["settle", "settle"],
]);

class Tokens {
  private index = 0;
  constructor(
    private readonly words: string[],
    private readonly fail: (message: string) => never,
  ) {}

  get done(): boolean {
    return this.index >= this.words.length;
  }

  peek(offset = 0): string | undefined {
    return this.words[this.index + offset];
  }

  /** True (and consumed) when the next word is `keyword` followed by a number. */
  keywordWithNumber(keyword: string): boolean {
    const word = this.peek();
    const next = this.peek(1);
    if (word === undefined || word.toLowerCase() !== keyword || next === undefined || numberFromText(next) === null) return false;
    this.index++;
    return true;
  }

  expectKeyword(keyword: string, what: string): void {
    const word = this.peek();
    if (word === undefined || word.toLowerCase() !== keyword) this.fail(`expected "${keyword}" ${what}, found ${word === undefined ? "the end" : `"${word}"`}`);
    this.index++;
  }

  number(what: string): number {
    const word = this.peek();
    const value = word === undefined ? null : numberFromText(word);
    if (value === null) this.fail(`expected ${what} (a number), found ${word === undefined ? "the end" : `"${word}"`}`);
    this.index++;
    return value;
  }

  caseLabel(): string {
    const word = this.peek();
    if (word === undefined) return "";
    if (!isCaseLabel(word)) this.fail(`"${word}" is not a case label; use letters and digits starting with a letter, such as D, L or Lr`);
    this.index++;
    return word;
  }
}

function parseOne(text: string, row: number): LoadRow {
  const fail = (message: string): never => {
    throw invalid(`load ${row} of the loads text ("${text.length <= 60 ? text : `${text.slice(0, 57)}...`}"): ${message}`);
  };
  const tokens = new Tokens(text.split(/\s+/).filter((w) => w !== ""), fail);
  const word = tokens.peek() ?? "";
  const kind = KINDS.get(word.toLowerCase()) ?? fail(`"${word.length <= 20 ? word : `${word.slice(0, 17)}...`}" is not a load type; start with point, moment, udl, linear or settle`);
  tokens.expectKeyword(word.toLowerCase(), "");
  const magnitude = tokens.number("the magnitude");
  let xStart = 0;
  let xEnd: number | null = null;
  let magnitudeEnd = 0;
  if (kind === "point" || kind === "moment" || kind === "settle") {
    tokens.expectKeyword("at", "and the position after the magnitude");
    xStart = tokens.number("the position after \"at\"");
  } else {
    if (kind === "linear") {
      tokens.expectKeyword("to", "and the end magnitude after the start magnitude");
      magnitudeEnd = tokens.number("the end magnitude after \"to\"");
    }
    if (tokens.keywordWithNumber("from")) xStart = tokens.number("x start");
    if (tokens.keywordWithNumber("to")) {
      const end = tokens.number("x end");
      xEnd = end === 0 ? null : end;
    }
  }
  const loadCase = tokens.caseLabel();
  if (!tokens.done) fail(`unexpected "${tokens.peek()}" after the case label`);
  return { kind, magnitude, xStart, xEnd, magnitudeEnd, loadCase, row, fromText: true };
}

/** Most words a load has in the notation ("linear 1 to 2 from 0 to 4 D"); a longer one is read by parseOne. */
const MAX_WORDS = 10;
const wordStart = new Int32Array(MAX_WORDS);
const wordEnd = new Int32Array(MAX_WORDS);
/** 1 when the word is a short decimal (shortDecimal) read while splitting, its value in wordValue; 0 otherwise. */
const wordShort = new Uint8Array(MAX_WORDS);
const wordValue = new Float64Array(MAX_WORDS);

/** Whitespace as /\s/ and trim() see it, for ASCII text. */
function isSpace(code: number): boolean {
  return code === 32 || (code >= 9 && code <= 13);
}

/** Whether word w of `text` is `keyword` (lower-case ASCII) in any case, as toLowerCase() compares. */
function isWord(text: string, w: number, keyword: string): boolean {
  const start = wordStart[w];
  if (wordEnd[w] - start !== keyword.length) return false;
  for (let i = 0; i < keyword.length; i++) {
    const c = text.charCodeAt(start + i);
    if ((c >= 65 && c <= 90 ? c + 32 : c) !== keyword.charCodeAt(i)) return false;
  }
  return true;
}

function isLetter(code: number): boolean {
  return (code >= 65 && code <= 90) || (code >= 97 && code <= 122);
}

/** True for a case label (isCaseLabel: a letter, then letters and digits) in text[start, end). */
function isLabel(text: string, start: number, end: number): boolean {
  if (end <= start || !isLetter(text.charCodeAt(start))) return false;
  for (let i = start + 1; i < end; i++) {
    const c = text.charCodeAt(i);
    if (!isLetter(c) && !(c >= 48 && c <= 57)) return false;
  }
  return true;
}

/** The number word w of `text` is (decimalValue), NaN when there is no such word or it is not a number. */
function numberOf(text: string, w: number, words: number): number {
  if (w >= words) return NaN;
  return wordShort[w] === 1 ? wordValue[w] : decimalValue(text, wordStart[w], wordEnd[w]);
}

/**
 * The load whose `words` words are in wordStart/wordEnd (ASCII text, no ';' inside), read
 * without building strings (only its case label is sliced), or null when it is not a plain,
 * well-formed load: then parseOne reads it, with its messages. When it gives a row, it is the
 * row parseOne gives.
 */
function plainRow(text: string, words: number, row: number): LoadRow | null {
  if (words < 2 || words > MAX_WORDS) return null;
  let kind: LoadKind;
  if (isWord(text, 0, "point")) kind = "point";
  else if (isWord(text, 0, "udl")) kind = "udl";
  else if (isWord(text, 0, "moment")) kind = "moment";
  else if (isWord(text, 0, "linear")) kind = "linear";
  else if (isWord(text, 0, "settle")) kind = "settle";
  else return null;
  const magnitude = numberOf(text, 1, words);
  if (magnitude !== magnitude) return null;
  let w = 2;
  let xStart = 0;
  let xEnd: number | null = null;
  let magnitudeEnd = 0;
  if (kind === "point" || kind === "moment" || kind === "settle") {
    if (words < 4 || !isWord(text, 2, "at")) return null;
    xStart = numberOf(text, 3, words);
    if (xStart !== xStart) return null;
    w = 4;
  } else {
    if (kind === "linear") {
      if (words < 4 || !isWord(text, 2, "to")) return null;
      magnitudeEnd = numberOf(text, 3, words);
      if (magnitudeEnd !== magnitudeEnd) return null;
      w = 4;
    }
    if (w + 1 < words && isWord(text, w, "from")) {
      const from = numberOf(text, w + 1, words);
      if (from === from) {
        xStart = from;
        w += 2;
      }
    }
    if (w + 1 < words && isWord(text, w, "to")) {
      const to = numberOf(text, w + 1, words);
      if (to === to) {
        xEnd = to === 0 ? null : to;
        w += 2;
      }
    }
  }
  let loadCase = "";
  if (w < words) {
    if (!isLabel(text, wordStart[w], wordEnd[w])) return null;
    loadCase = text.slice(wordStart[w], wordEnd[w]);
    w++;
  }
  if (w !== words) return null;
  return { kind, magnitude, xStart, xEnd, magnitudeEnd, loadCase, row, fromText: true };
}

/** Refuses a load past MAX_LOADS (one message for the one-pass reader and the full one). */
function requireRoom(rows: LoadRow[]): void {
  if (rows.length === MAX_LOADS) throw invalid(`loads text: at most ${MAX_LOADS} loads on one member, got more (combine loads that act together)`);
}

/** Character code of ';', the loads' separator. */
const SEMICOLON = 59;

/**
 * Parses the load notation into rows (numbered 1, 2, ... in order). Empty pieces are skipped.
 *
 * One pass over the text: each piece (up to the next ';') is split into words as it is read,
 * the first MAX_WORDS of them kept as offsets. An ASCII piece (whitespace and case are then
 * the ASCII rules, as trim() and /\s/ apply them) is read by plainRow, or by parseOne when it
 * is not plain; a piece with any other character is trimmed and read by parseOne, as
 * text.split(";") and trim() give it. The pieces and their numbering are those of the split.
 */
export function parseLoadNotation(text: string): LoadRow[] {
  const rows: LoadRow[] = [];
  const n = text.length;
  let i = 0;
  for (;;) {
    const from = i;
    let words = 0;
    let ascii = true;
    let lastEnd = i;
    let c = i < n ? text.charCodeAt(i) : SEMICOLON;
    while (c !== SEMICOLON) {
      if (isSpace(c)) {
        c = ++i < n ? text.charCodeAt(i) : SEMICOLON;
        continue;
      }
      // The word's digits are gathered as it is read: a short decimal (sign, digits, one point)
      // then needs no second pass; any other word is read by decimalValue when a number is expected.
      const start = i;
      let negative = false;
      let mantissa = 0;
      let digits = 0;
      let fraction = -1;
      let short = true;
      do {
        if (c >= 48 && c <= 57) {
          mantissa = mantissa * 10 + (c - 48);
          digits++;
          if (fraction >= 0) fraction++;
        } else if (c === 46 && fraction < 0) fraction = 0;
        else if ((c === 45 || c === 43) && i === start) negative = c === 45;
        else {
          short = false;
          if (c > 127) ascii = false;
        }
        c = ++i < n ? text.charCodeAt(i) : SEMICOLON;
      } while (c !== SEMICOLON && !isSpace(c));
      if (words < MAX_WORDS) {
        wordStart[words] = start;
        wordEnd[words] = i;
        if (short && digits > 0 && digits <= SHORT_DIGITS) {
          wordShort[words] = 1;
          wordValue[words] = shortDecimal(negative, mantissa, fraction);
        } else wordShort[words] = 0;
      }
      words++;
      lastEnd = i;
    }
    // text[from, i) is the piece; i is at its ';' or the end of the text.
    if (ascii) {
      if (words > 0) {
        requireRoom(rows);
        const start = wordStart[0];
        rows.push(plainRow(text, words, rows.length + 1) ?? parseOne(text.slice(start, lastEnd), rows.length + 1));
      }
    } else {
      const trimmed = text.slice(from, i).trim();
      if (trimmed !== "") {
        requireRoom(rows);
        rows.push(parseOne(trimmed, rows.length + 1));
      }
    }
    if (i >= n) return rows;
    i++;
  }
}

/**
 * parseLoadNotation without its one-pass reader: text.split(";"), each piece trimmed and read
 * by parseOne. The reference the fast path must agree with (exported for the tests that
 * compare the two; every result and message is the same).
 */
export function parseLoadNotationFully(text: string): LoadRow[] {
  const rows: LoadRow[] = [];
  for (const piece of text.split(";")) {
    const trimmed = piece.trim();
    if (trimmed === "") continue;
    requireRoom(rows);
    rows.push(parseOne(trimmed, rows.length + 1));
  }
  return rows;
}

function num(value: number): string {
  return String(value === 0 ? 0 : value);
}

/** The one text form of a load row. */
export function formatLoad(row: LoadRow): string {
  const parts: string[] = [row.kind, num(row.magnitude)];
  if (row.kind === "point" || row.kind === "moment" || row.kind === "settle") parts.push("at", num(row.xStart));
  else {
    if (row.kind === "linear") parts.push("to", num(row.magnitudeEnd));
    if (row.xStart !== 0) parts.push("from", num(row.xStart));
    if (row.xEnd !== null && row.xEnd !== 0) parts.push("to", num(row.xEnd));
  }
  if (row.loadCase !== "") parts.push(row.loadCase);
  return parts.join(" ");
}

/** The text form of a whole load table, loads joined by "; ". */
export function formatLoadNotation(rows: LoadRow[]): string {
  return rows.map(formatLoad).join("; ");
}
