/**
 * Text typed or pasted into a cell, as the cell's input: a decimal number, TRUE/FALSE, a
 * formula ("=..."), blank, or text. "1e3" is a number; "0x10", "Infinity", "1,5" and "12 m"
 * stay text (no number is read from anything but plain decimal notation).
 */
import type { CellInput } from "../../engine";

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

export function inputOf(text: string): CellInput {
  const trimmed = text.trim();
  if (trimmed === "") return null;
  if (trimmed.startsWith("=")) return trimmed;
  if (DECIMAL.test(trimmed)) {
    const value = Number(trimmed);
    if (Number.isFinite(value)) return value;
  }
  const upper = trimmed.toUpperCase();
  if (upper === "TRUE") return true;
  if (upper === "FALSE") return false;
  return text;
}
