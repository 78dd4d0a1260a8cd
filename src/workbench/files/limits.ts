/**
 * What the workbench opens in the browser. The whole workbook lives in the page's memory (the
 * file's bytes, kept for saving; the formula engine's cells), so a book beyond these is refused
 * with a message rather than left to exhaust the tab; `spanwise calc` has no such limits.
 * The numbers are our own choice for an ordinary desktop browser tab (common practice, no
 * source): a 2,000-row schedule of a dozen columns is about 24,000 cells.
 */
export const OPEN_LIMITS = {
  /** Size of the .xlsx file itself. */
  fileBytes: 20 * 1024 * 1024,
  /** Size of its parts once unpacked, as the zip's directory declares them. */
  unpackedBytes: 200 * 1024 * 1024,
  /** Non-empty cells (values and formulas) in all sheets together. */
  cells: 300_000,
  /** Sheets in the book. */
  sheets: 255,
} as const;

export class LimitError extends Error {}

function megabytes(bytes: number): string {
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

export function checkFileSize(bytes: number): void {
  if (bytes > OPEN_LIMITS.fileBytes) {
    throw new LimitError(`the file is ${megabytes(bytes)}; the workbench opens files up to ${megabytes(OPEN_LIMITS.fileBytes)} (use \`spanwise calc\` for larger workbooks)`);
  }
}

export function checkUnpackedSize(bytes: number): void {
  if (bytes > OPEN_LIMITS.unpackedBytes) {
    throw new LimitError(`its parts unpack to ${megabytes(bytes)}; the workbench opens workbooks that unpack to at most ${megabytes(OPEN_LIMITS.unpackedBytes)} (use \`spanwise calc\` for larger workbooks)`);
  }
}

export function checkCellCount(cells: number, sheets: number): void {
  if (sheets > OPEN_LIMITS.sheets) throw new LimitError(`it has ${sheets} sheets; the workbench opens at most ${OPEN_LIMITS.sheets}`);
  if (cells > OPEN_LIMITS.cells) {
    throw new LimitError(`it has ${cells.toLocaleString("en-US")} non-empty cells; the workbench opens at most ${OPEN_LIMITS.cells.toLocaleString("en-US")} (use \`spanwise calc\` for larger workbooks)`);
  }
}

/** Non-empty cells of sheets given as rows of inputs. */
export function countCells(sheets: readonly { cells: readonly (readonly unknown[] | undefined)[] }[]): number {
  let n = 0;
  for (const sheet of sheets) for (const row of sheet.cells) if (row) for (const cell of row) if (cell !== null && cell !== undefined && cell !== "") n++;
  return n;
}
