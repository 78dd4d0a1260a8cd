/**
 * The smallest reading of a cell's text for the per-row benchmark's floor: every run of digits
 * with an optional decimal fraction becomes a number (integer / 10^k, exact for the bench's
 * two-decimal values), summed; words, signs, exponents and checks are skipped. What any reader
 * of the text must at least do, so its time is a lower bound on reading the row's cells.
 */
export function scanDigits(text: string): number {
  let sum = 0;
  let i = 0;
  const n = text.length;
  while (i < n) {
    let c = text.charCodeAt(i);
    if (c < 48 || c > 57) {
      i++;
      continue;
    }
    let value = 0;
    while (i < n && (c = text.charCodeAt(i)) >= 48 && c <= 57) {
      value = value * 10 + (c - 48);
      i++;
    }
    let scale = 1;
    if (c === 46) {
      i++;
      while (i < n && (c = text.charCodeAt(i)) >= 48 && c <= 57) {
        value = value * 10 + (c - 48);
        scale *= 10;
        i++;
      }
    }
    sum += value / scale;
  }
  return sum;
}
