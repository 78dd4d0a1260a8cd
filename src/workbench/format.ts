/** How cell values are shown in the workbench grid (the exact value stays in data-value). */
import { isCellError, type CellResult } from "../engine";

export function displayText(value: CellResult): string {
  if (value === null || value === "") return "";
  if (isCellError(value)) return value.error;
  if (typeof value === "number") {
    if (value === 0) return "0";
    const magnitude = Math.abs(value);
    if (magnitude >= 1e9 || magnitude < 1e-4) return value.toExponential(4);
    return String(Number(value.toPrecision(8)));
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
