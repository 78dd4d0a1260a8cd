/**
 * Reads the text of a formula holding a SPAN call and says where each of the call's
 * arguments comes from: a range, a spilled range (`A1#`), a named range, a literal, an array
 * constant, a skipped argument, or an expression the pane cannot resolve by itself. Pure.
 *
 * Saved-workbook forms (`_xldudf_SPAN_MOMENT(`, `_xll.SPAN.MOMENT(`, `_xlfn.ANCHORARRAY(A1)`)
 * are first turned into the typed forms by the engine's normalizeFormula. The first SPAN call
 * in the text is the one read, so `=INDEX(SPAN.MAXMOMENT(...),1,1)` names its member too.
 */
import { entryFor, type SpanFunctionEntry } from "../engine/catalogue";
import { normalizeFormula } from "../engine/formulaText";

export type Scalar = string | number | boolean;

export type ArgSource =
  | { kind: "omitted"; text: "" }
  | { kind: "literal"; value: Scalar; text: string }
  | { kind: "array"; rows: Scalar[][]; text: string }
  /** `address` is the range without sheet or `$` ("B3:C3"); `sheet` as named in the text, if any. */
  | { kind: "range"; sheet?: string; address: string; text: string }
  | { kind: "spill"; sheet?: string; address: string; text: string }
  | { kind: "name"; sheet?: string; name: string; text: string }
  | { kind: "expression"; text: string };

export interface SpanCall {
  /** The catalogue's name, e.g. "SPAN.MOMENT". */
  functionName: string;
  entry: SpanFunctionEntry;
  /** Every given argument by the catalogue's name; arguments not written are absent. */
  args: Record<string, ArgSource>;
}

export type ParseResult = { ok: true; call: SpanCall } | { ok: false; message: string };

/** The arguments every SPAN function shares: the member. */
export const MEMBER_ARGUMENTS = ["spans", "loads", "supports", "EI", "combo", "units"] as const;
export type MemberArgument = (typeof MEMBER_ARGUMENTS)[number];

const SHEET = String.raw`(?:'((?:[^']|'')+)'|([A-Za-z_][\w.]*))!`;
const CELL = String.raw`\$?[A-Za-z]{1,3}\$?\d+`;
const RANGE = new RegExp(String.raw`^(?:${SHEET})?(${CELL}(?::${CELL})?)(#?)$`);
const NAME = new RegExp(String.raw`^(?:${SHEET})?([A-Za-z_\\][\w.]*)$`);
const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?%?$/;
// No lookbehind (ES2018; older Safari webviews reject the whole script): the character before
// the name is matched instead, so the name is group 1 and match[0] may start one early.
const CALL_START = /(?:^|[^\w.])(?:_xll\.|_xldudf_)?SPAN[._]([A-Za-z]+)\s*\(/i;

/** Index just past the string literal starting at `at` (a `"`). */
function skipString(text: string, at: number): number {
  let i = at + 1;
  while (i < text.length) {
    if (text[i] === '"') {
      if (text[i + 1] === '"') i += 2;
      else return i + 1;
    } else i++;
  }
  return i;
}

/** Index just past the quoted sheet name starting at `at` (a `'`). */
function skipQuoted(text: string, at: number): number {
  let i = at + 1;
  while (i < text.length) {
    if (text[i] === "'") {
      if (text[i + 1] === "'") i += 2;
      else return i + 1;
    } else i++;
  }
  return i;
}

/** Splits `text` at top-level `separators` (outside strings, quoted names, () and {}). */
function splitTopLevel(text: string, separators: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let last = 0;
  for (let i = 0; i < text.length; ) {
    const ch = text[i];
    if (ch === '"') i = skipString(text, i);
    else if (ch === "'") i = skipQuoted(text, i);
    else {
      if (ch === "(" || ch === "{") depth++;
      else if (ch === ")" || ch === "}") depth--;
      else if (depth === 0 && separators.includes(ch)) {
        parts.push(text.slice(last, i));
        last = i + 1;
      }
      i++;
    }
  }
  parts.push(text.slice(last));
  return parts;
}

/** Finds the first SPAN call outside string literals: its name and the text of its argument list. */
function findCall(formula: string): { name: string; argsText: string } | { error: string } | null {
  let i = 0;
  while (i < formula.length) {
    const quote = formula.indexOf('"', i);
    const code = formula.slice(i, quote < 0 ? formula.length : quote);
    const match = CALL_START.exec(code);
    if (match) {
      const open = i + (match.index ?? 0) + match[0].length;
      let depth = 1;
      let j = open;
      while (j < formula.length && depth > 0) {
        const ch = formula[j];
        if (ch === '"') j = skipString(formula, j);
        else if (ch === "'") j = skipQuoted(formula, j);
        else {
          if (ch === "(") depth++;
          else if (ch === ")") depth--;
          j++;
        }
      }
      if (depth !== 0) return { error: "the formula's brackets do not close" };
      return { name: `SPAN.${match[1].toUpperCase()}`, argsText: formula.slice(open, j - 1) };
    }
    if (quote < 0) return null;
    i = skipString(formula, quote);
  }
  return null;
}

function unquoteSheet(quoted: string | undefined, plain: string | undefined): string | undefined {
  if (quoted !== undefined) return quoted.replace(/''/g, "'");
  return plain;
}

function scalarOf(text: string): Scalar | undefined {
  const t = text.trim();
  if (t.startsWith('"') && t.endsWith('"') && t.length >= 2 && skipString(t, 0) === t.length) return t.slice(1, -1).replace(/""/g, '"');
  if (NUMBER.test(t)) return t.endsWith("%") ? Number(t.slice(0, -1)) / 100 : Number(t);
  if (/^true$/i.test(t)) return true;
  if (/^false$/i.test(t)) return false;
  return undefined;
}

function arrayOf(text: string): Scalar[][] | undefined {
  const inner = text.slice(1, -1);
  const rows = splitTopLevel(inner, ";").map((row) => splitTopLevel(row, ","));
  const out: Scalar[][] = [];
  for (const row of rows) {
    const cells: Scalar[] = [];
    for (const cell of row) {
      const value = scalarOf(cell);
      if (value === undefined) return undefined;
      cells.push(value);
    }
    out.push(cells);
  }
  const width = out[0]?.length ?? 0;
  return out.every((row) => row.length === width) ? out : undefined;
}

/** Classifies one argument's text. */
export function classifyArgument(raw: string): ArgSource {
  const text = raw.trim();
  if (text === "") return { kind: "omitted", text: "" };
  const scalar = scalarOf(text);
  if (scalar !== undefined) return { kind: "literal", value: scalar, text };
  if (text.startsWith("{") && text.endsWith("}") && splitTopLevel(text, "").length === 1) {
    const rows = arrayOf(text);
    if (rows) return { kind: "array", rows, text };
    return { kind: "expression", text };
  }
  const range = RANGE.exec(text);
  if (range) {
    const sheet = unquoteSheet(range[1], range[2]);
    const address = range[3].replace(/\$/g, "").toUpperCase();
    const base = sheet === undefined ? {} : { sheet };
    return range[4] === "#" ? { kind: "spill", ...base, address, text } : { kind: "range", ...base, address, text };
  }
  const name = NAME.exec(text);
  if (name) {
    const sheet = unquoteSheet(name[1], name[2]);
    return sheet === undefined ? { kind: "name", name: name[3], text } : { kind: "name", sheet, name: name[3], text };
  }
  return { kind: "expression", text };
}

/**
 * Parses formula text (with or without `=`, typed or saved form) into its first SPAN call,
 * its arguments mapped by the catalogue's order.
 */
export function parseSpanFormula(formula: string | null | undefined): ParseResult {
  if (formula == null || formula.trim() === "") return { ok: false, message: "the cell holds no formula" };
  const text = normalizeFormula(formula.trim());
  const found = findCall(text);
  if (found === null) return { ok: false, message: "the formula holds no SPAN function" };
  if ("error" in found) return { ok: false, message: found.error };
  const entry = entryFor(found.name);
  if (!entry) return { ok: false, message: `${found.name} is not a SPAN function` };
  const parts = found.argsText.trim() === "" ? [] : splitTopLevel(found.argsText, ",");
  if (parts.length > entry.arguments.length) {
    return { ok: false, message: `${entry.sheetName} takes at most ${entry.arguments.length} arguments, the formula gives ${parts.length}` };
  }
  const args: Record<string, ArgSource> = {};
  parts.forEach((part, index) => {
    args[entry.arguments[index].name] = classifyArgument(part);
  });
  return { ok: true, call: { functionName: entry.sheetName, entry, args } };
}

/** The member arguments the pane cannot resolve by itself (expressions), by name. */
export function unresolvedArguments(call: SpanCall): MemberArgument[] {
  return MEMBER_ARGUMENTS.filter((name) => call.args[name]?.kind === "expression");
}
