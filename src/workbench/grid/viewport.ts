/**
 * Which rows of a sheet are in the DOM: the ones the scroll container shows, plus a few
 * either side so a small scroll needs no repaint. Rows have one fixed height.
 */
export const ROW_HEIGHT = 22;
export const HEADER_HEIGHT = 24;
export const OVERSCAN = 8;

export interface RowWindow {
  /** First and last row (0-based, inclusive) to render. */
  first: number;
  last: number;
}

export function rowWindow(scrollTop: number, viewHeight: number, totalRows: number, overscan = OVERSCAN): RowWindow {
  if (totalRows <= 0) return { first: 0, last: -1 };
  const top = Math.max(0, Math.floor(Math.max(0, scrollTop) / ROW_HEIGHT) - overscan);
  const shown = Math.ceil(Math.max(0, viewHeight - HEADER_HEIGHT) / ROW_HEIGHT) + 1;
  const last = Math.min(totalRows - 1, top + shown + 2 * overscan);
  return { first: Math.min(top, last), last };
}

/** The scroll position that brings a row into view ("nearest", as scrollIntoView does), or undefined when it shows. */
export function scrollFor(row: number, scrollTop: number, viewHeight: number): number | undefined {
  const top = row * ROW_HEIGHT;
  const bottom = top + ROW_HEIGHT;
  const visibleHeight = Math.max(ROW_HEIGHT, viewHeight - HEADER_HEIGHT);
  if (top < scrollTop) return top;
  if (bottom > scrollTop + visibleHeight) return bottom - visibleHeight;
  return undefined;
}
