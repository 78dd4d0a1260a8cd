/** What the files commands need from the grid that shows the book (src/workbench/workbench.ts, wired in main.ts). */
import type { SpanWorkbook } from "../../engine";

export interface BookHost {
  /** Shows another workbook, on `sheet` (default its first). */
  replace(book: SpanWorkbook, sheet?: string): void;
  /** Draws tabs and grid again after sheets were added or renamed in the book. */
  refresh(): void;
  activeSheet(): string;
  activate(sheet: string): void;
  /** Called after every edit of the book's cells. */
  onChange(listener: () => void): () => void;
}
