/**
 * Column widths, per sheet, in CSS pixels: a default, widths the user drags on the column
 * header's right edge, and a first guess from the numbers a sheet holds when it is first shown.
 * Limits: 24 px to 800 px.
 */
export const DEFAULT_WIDTH = 96;
export const MIN_WIDTH = 24;
export const MAX_WIDTH = 800;
export const ROW_HEADER_WIDTH = 48;

export function clampWidth(px: number): number {
  if (!Number.isFinite(px)) return DEFAULT_WIDTH;
  return Math.round(Math.min(MAX_WIDTH, Math.max(MIN_WIDTH, px)));
}

export class ColumnWidths {
  private readonly sheets = new Map<string, Map<number, number>>();

  has(sheet: string): boolean {
    return this.sheets.has(sheet);
  }

  width(sheet: string, col: number): number {
    return this.sheets.get(sheet)?.get(col) ?? DEFAULT_WIDTH;
  }

  set(sheet: string, col: number, px: number): number {
    let widths = this.sheets.get(sheet);
    if (!widths) this.sheets.set(sheet, (widths = new Map()));
    const width = clampWidth(px);
    widths.set(col, width);
    return width;
  }

  /** Marks a sheet as seen (its first-guess widths are set). */
  touch(sheet: string): void {
    if (!this.sheets.has(sheet)) this.sheets.set(sheet, new Map());
  }

  /** Widths of every sheet, for saving with a workbook. */
  all(): Record<string, Record<number, number>> {
    const out: Record<string, Record<number, number>> = {};
    for (const [sheet, widths] of this.sheets) out[sheet] = Object.fromEntries(widths);
    return out;
  }

  /** A sheet renamed: its widths go with it. */
  rename(from: string, to: string): void {
    const widths = this.sheets.get(from);
    if (!widths) return;
    this.sheets.delete(from);
    this.sheets.set(to, widths);
  }
}

/** Text width in pixels in the grid's font (canvas measurement, cached per text). */
export class TextMeasure {
  private readonly context: CanvasRenderingContext2D | null;
  private readonly cache = new Map<string, number>();

  constructor(font: string) {
    this.context = document.createElement("canvas").getContext("2d");
    if (this.context) this.context.font = font;
  }

  width(text: string): number {
    let width = this.cache.get(text);
    if (width === undefined) {
      // Without a canvas (never in a browser): 7.5 px a character, common practice, no source.
      width = this.context ? this.context.measureText(text).width : text.length * 7.5;
      if (this.cache.size > 50_000) this.cache.clear();
      this.cache.set(text, width);
    }
    return width;
  }
}
