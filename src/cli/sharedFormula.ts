/**
 * Shared formulas (ECMA-376 Part 1, §18.3.1.40 `f`, t="shared"): the text is stored once, in
 * the first cell of the group, and every other cell of the group (same `si`) uses it with its
 * relative references moved by the cell's offset from that first cell — as a fill does.
 * Absolute parts (`$A`, `$1`) stay. References are found outside string literals and quoted
 * sheet names, and a name followed by `(` is a function, not a reference.
 */

const MAX_COL = 16_384;
const MAX_ROW = 1_048_576;

function columnNumber(letters: string): number {
  let col = 0;
  for (const letter of letters.toUpperCase()) col = col * 26 + (letter.charCodeAt(0) - 64);
  return col;
}

function columnLetters(col: number): string {
  let letters = "";
  for (let n = col; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}

/** Code outside "string" literals and 'quoted sheet' names, with its pieces in order. */
function pieces(text: string): { code: boolean; text: string }[] {
  const out: { code: boolean; text: string }[] = [];
  let last = 0;
  let i = 0;
  while (i < text.length) {
    const ch = text[i];
    if (ch !== '"' && ch !== "'") {
      i++;
      continue;
    }
    if (i > last) out.push({ code: true, text: text.slice(last, i) });
    let j = i + 1;
    for (;;) {
      const end = text.indexOf(ch, j);
      if (end < 0) {
        j = text.length;
        break;
      }
      if (text[end + 1] === ch) {
        j = end + 2;
        continue;
      }
      j = end + 1;
      break;
    }
    out.push({ code: false, text: text.slice(i, j) });
    last = i = j;
  }
  if (last < text.length) out.push({ code: true, text: text.slice(last) });
  return out;
}

const CELL = /(?<![A-Za-z0-9_.$\\])(\$?)([A-Za-z]{1,3})(\$?)([0-9]{1,7})(?![A-Za-z0-9_.(!\\])/g;
const COLUMNS = /(?<![A-Za-z0-9_.$:\\])(\$?)([A-Za-z]{1,3}):(\$?)([A-Za-z]{1,3})(?![A-Za-z0-9_.(!:\\])/g;
const ROWS = /(?<![A-Za-z0-9_.$:\\])(\$?)([0-9]{1,7}):(\$?)([0-9]{1,7})(?![A-Za-z0-9_.(!:\\])/g;

/** Moves the relative references of `formula` by `rows` and `cols`; a reference moved off the sheet becomes #REF!. */
export function shiftFormula(formula: string, rows: number, cols: number): string {
  if (rows === 0 && cols === 0) return formula;
  const col = (dollar: string, letters: string): string | undefined => {
    const n = dollar ? columnNumber(letters) : columnNumber(letters) + cols;
    return n < 1 || n > MAX_COL ? undefined : `${dollar}${columnLetters(n)}`;
  };
  const row = (dollar: string, digits: string): string | undefined => {
    const n = dollar ? Number(digits) : Number(digits) + rows;
    return n < 1 || n > MAX_ROW ? undefined : `${dollar}${n}`;
  };
  return pieces(formula)
    .map((piece) => {
      if (!piece.code) return piece.text;
      return piece.text
        .replace(COLUMNS, (whole, d1: string, c1: string, d2: string, c2: string) => {
          const a = col(d1, c1);
          const b = col(d2, c2);
          return a && b ? `${a}:${b}` : "#REF!";
        })
        .replace(ROWS, (whole, d1: string, r1: string, d2: string, r2: string) => {
          const a = row(d1, r1);
          const b = row(d2, r2);
          return a && b ? `${a}:${b}` : "#REF!";
        })
        .replace(CELL, (whole, d1: string, letters: string, d2: string, digits: string) => {
          if (columnNumber(letters) > MAX_COL) return whole;
          const a = col(d1, letters);
          const b = row(d2, digits);
          return a && b ? `${a}${b}` : "#REF!";
        });
    })
    .join("");
}
