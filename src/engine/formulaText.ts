/**
 * Formula text as people type it or as saved workbooks store it, made ready for the engine.
 *
 * Saved .xlsx files write newer functions with prefixes (`_xlfn.SEQUENCE`, `_xlfn._xlws.SORT`,
 * `_xlpm.` for LAMBDA parameters), a spilled-range reference `A1#` as `_xlfn.ANCHORARRAY(A1)`,
 * and add-in functions with `_xldudf_` (the namespace dot turned into `_`:
 * `_xldudf_SPAN_MOMENT(...)`) or, for add-ins saved in compatibility form, `_xll.SPAN.MOMENT`.
 * `normalizeFormula` turns all of these into the forms typed in a cell. The spilled-range
 * operator itself is resolved by `expandSpillReferences` against the current spill sizes.
 * String literals are never touched.
 */

/** Splits formula text into code and "string literal" pieces, in order (joined, they are the text). */
export function formulaPieces(text: string): { code: boolean; text: string }[] {
  const out: { code: boolean; text: string }[] = [];
  const literal = /"(?:[^"]|"")*"?/g;
  let last = 0;
  for (const match of text.matchAll(literal)) {
    const at = match.index ?? 0;
    if (at > last) out.push({ code: true, text: text.slice(last, at) });
    out.push({ code: false, text: match[0] });
    last = at + match[0].length;
  }
  if (last < text.length) out.push({ code: true, text: text.slice(last) });
  return out;
}

/** Applies `change` to the parts of formula text outside string literals. */
export function mapCode(text: string, change: (code: string) => string): string {
  return formulaPieces(text)
    .map((piece) => (piece.code ? change(piece.text) : piece.text))
    .join("");
}

export const REFERENCE = String.raw`(?:(?:'(?:[^']|'')+'|[A-Za-z_][\w.]*)!)?\$?[A-Za-z]{1,3}\$?\d+`;

/** Every saved form below has one of these in it: text without them is already in typed form. */
const SAVED_FORM = /_xl|anchorarray/i;

/** Saved-workbook forms to typed forms. Accepts text with or without the leading `=`. */
export function normalizeFormula(text: string): string {
  if (!SAVED_FORM.test(text)) return text;
  return mapCode(text, (code) =>
    code
      .replace(/_xll\.SPAN[._]/gi, "SPAN.")
      .replace(/_xldudf_SPAN[._]/gi, "SPAN.")
      .replace(/_xlfn\.|_xlws\.|_xlpm\./gi, "")
      .replace(new RegExp(String.raw`\bANCHORARRAY\(\s*(${REFERENCE})\s*\)`, "gi"), "$1#"),
  );
}

export interface SpillReference {
  sheetName: string | undefined;
  row: number;
  col: number;
}

/** `A1#`: group 1 is the character before the reference (no lookbehind: the pane runs where ES2018 may not), group 2 the reference. */
export const SPILL = new RegExp(String.raw`(^|[^\w$.!'])(${REFERENCE})#`, "g");

export function columnNumber(letters: string): number {
  let col = 0;
  for (const letter of letters.toUpperCase()) col = col * 26 + (letter.charCodeAt(0) - 64);
  return col - 1;
}

export function columnLetters(col: number): string {
  let letters = "";
  for (let n = col + 1; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}

export function parseReference(reference: string): SpillReference {
  const bang = reference.lastIndexOf("!");
  const sheetPart = bang >= 0 ? reference.slice(0, bang) : undefined;
  const cell = (bang >= 0 ? reference.slice(bang + 1) : reference).replace(/\$/g, "");
  const match = /^([A-Za-z]+)(\d+)$/.exec(cell);
  if (!match) throw new Error(`not a cell reference: ${reference}`);
  const sheetName = sheetPart === undefined ? undefined : sheetPart.replace(/^'(.*)'$/, "$1").replace(/''/g, "'");
  return { sheetName, row: Number(match[2]) - 1, col: columnNumber(match[1]) };
}

export function hasSpillReference(text: string): boolean {
  if (!text.includes("#")) return false;
  return formulaPieces(text).some((piece) => piece.code && new RegExp(SPILL.source).test(piece.text));
}

/**
 * Replaces every `A1#` by the range its spill covers now, as `resolve` reports it (for
 * example `A1:C4`, or `#REF!` where the cell does not spill).
 */
export function expandSpillReferences(text: string, resolve: (reference: SpillReference, written: string) => string): string {
  return mapCode(text, (code) => code.replace(SPILL, (_whole, before: string, reference: string) => before + resolve(parseReference(reference), reference)));
}

/**
 * The reference of a formula that is one spilled-range reference and nothing else (`=A1#`,
 * `= Sheet2!$B$3# `), else undefined. Such a formula returns the whole spilled array, which
 * spills in its turn (Microsoft support, "Spilled range operator": `A2#` is the range A2's
 * formula spills into; Microsoft Learn, "Handle dynamic arrays and spilling using the Excel
 * JavaScript API": a formula `=A4:D4` spills), where a bare range in the formula engine is
 * "Cell range not allowed".
 */
export function soleSpillReference(formula: string): string | undefined {
  const match = new RegExp(String.raw`^=\s*(${REFERENCE})#\s*$`).exec(formula);
  return match ? match[1] : undefined;
}
