/**
 * How cell values are shown in the workbench grid (the exact value stays in data-value and in
 * the formula bar). Numbers get up to 6 significant figures, never fewer digits left of the
 * decimal point than the number has (1234567 shows as 1234567, not 1234570); very large and
 * very small magnitudes in E notation. A number that does not fit its column is rounded to
 * fewer decimals as a spreadsheet's General format does, and when even that does not fit it
 * shows as ### (never cut mid-number).
 */
import { isCellError, type CellResult } from "../engine";

export const SIGNIFICANT = 6;
const PLAIN_MAX = 1e11;
const PLAIN_MIN = 1e-4;

/** Trailing zeros of a decimal fraction dropped ("2.500" -> "2.5", "3.000" -> "3"). */
function trimmed(text: string): string {
  return text.includes(".") ? text.replace(/0+$/, "").replace(/\.$/, "") : text;
}

function exponential(value: number, digits: number): string {
  const [mantissa, exponent] = value.toExponential(Math.max(0, digits - 1)).split("e");
  return `${trimmed(mantissa)}E${exponent.startsWith("-") ? exponent : `+${exponent.replace("+", "")}`}`;
}

/** The candidate texts of a number, most precise first (each at most SIGNIFICANT significant digits). */
export function numberTexts(value: number): string[] {
  if (!Number.isFinite(value)) return [String(value)];
  if (value === 0) return ["0"];
  const magnitude = Math.abs(value);
  const out: string[] = [];
  if (magnitude >= PLAIN_MIN && magnitude < PLAIN_MAX) {
    const integerDigits = magnitude >= 1 ? Math.floor(Math.log10(magnitude)) + 1 : 0;
    const leadingZeros = magnitude < 1 ? -Math.floor(Math.log10(magnitude)) - 1 : 0;
    const most = integerDigits > 0 ? Math.max(0, SIGNIFICANT - integerDigits) : leadingZeros + SIGNIFICANT;
    for (let decimals = Math.min(most, 20); decimals >= 0; decimals--) {
      const text = trimmed(value.toFixed(decimals));
      if (text === "0" || text === "-0") break;
      if (out[out.length - 1] !== text) out.push(text);
    }
  }
  for (let digits = SIGNIFICANT; digits >= 1; digits--) {
    const text = exponential(value, digits);
    if (out[out.length - 1] !== text && !out.includes(text)) out.push(text);
  }
  return out;
}

/**
 * The text shown for a value. `fits` says whether a text fits the cell (the grid measures);
 * without it the most precise text.
 */
export function displayText(value: CellResult, fits?: (text: string) => boolean): string {
  if (value === null || value === "") return "";
  if (isCellError(value)) return value.error;
  if (typeof value === "number") {
    const texts = numberTexts(value);
    if (!fits) return texts[0];
    for (const text of texts) if (fits(text)) return text;
    return "###";
  }
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  return value;
}

/** The exact value as text, so tests and tools can read it back from the page. */
export function exactText(value: CellResult): string {
  if (value === null) return "";
  if (isCellError(value)) return value.error;
  return String(value);
}
