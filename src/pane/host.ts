/**
 * The one small interface between the diagram pane and a sheet host (the spreadsheet through
 * Office.js, or the workbench page). Addresses are A1 text, sheet-qualified where it matters
 * ("Member!B3:C3", "'Load table'!A2:F9"); every call is asynchronous because the spreadsheet
 * host answers over a round trip.
 */

/** A cell value as a host hands it back: numbers, text, booleans, blanks ("" or null), error text ("#N/A"). */
export type CellValue = string | number | boolean | null;

/** What the pane writes: values or formula text starting with "=". */
export type CellInput = string | number | boolean | null;

export interface Selection {
  /** Sheet of the selection. */
  sheet: string;
  /** The active cell, without sheet: "H3". */
  cell: string;
  /** The active cell's formula as the host reports it, or undefined for a value cell. */
  formula: string | undefined;
  /** The active cell's value. */
  value: CellValue;
  /** The whole selected range, without sheet: "B3:C3". */
  range: string;
}

/** A scatter chart with straight lines, its series read from ranges of one sheet. */
export interface ChartRequest {
  sheet: string;
  title: string;
  /** The x values: a column range such as "K4:K104". */
  x: string;
  /** One series per y range, same length as x. */
  series: { name: string; y: string }[];
  /** Where the chart goes: the cells it covers ("Q3:W18"). */
  placeAt: string;
  /** Axis titles as the user labels units, e.g. "x (m)", "M (kN·m)". */
  xTitle: string;
  yTitle: string;
}

/** A formula cell of the workbook. */
export interface FormulaCell {
  sheet: string;
  /** The cell without sheet ("B7"). */
  cell: string;
  formula: string;
}

export interface SheetHost {
  /** "office" or "workbench": shown in the pane and used by nothing else. */
  readonly kind: string;
  getSelection(): Promise<Selection>;
  /** The values of a range, rows of cells. A missing sheet or bad address rejects with a message. */
  getValues(address: string): Promise<CellValue[][]>;
  /** The range a defined name refers to (sheet-qualified), or undefined when there is no such name. `scope` is the sheet the formula sits on. */
  resolveName(name: string, scope: string): Promise<string | undefined>;
  /** The range a formula cell spills into (sheet-qualified), or undefined when it does not spill. */
  spillRange(address: string): Promise<string | undefined>;
  /**
   * The cells (sheet-qualified) of the formulas whose results spill into a cell of the range
   * while the formula's own cell lies outside it: writing there would break that spill
   * (#SPILL!), and clearing cannot remove spilled values. Optional while a host cannot tell.
   * In the spreadsheet host, Range.getSpillParentOrNullObject answers this for one cell at a
   * time ("Handle dynamic arrays and spilling using the Excel JavaScript API",
   * learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-ranges-dynamic-arrays).
   */
  spillsInto?(address: string): Promise<string[]>;
  /** True when no cell of the range holds a value or a formula. */
  isEmpty(address: string): Promise<boolean>;
  /** Writes a block with its top-left cell at the range's top-left; the range must have the block's size. */
  writeBlock(address: string, block: CellInput[][]): Promise<void>;
  /** Empties the cells of a range (contents only), after the user agreed to overwrite them. */
  clear(address: string): Promise<void>;
  addChart(request: ChartRequest): Promise<void>;
  /** Calls back on every selection change; returns the unsubscribe function. */
  onSelectionChange(listener: () => void): () => void;
  /** The host's theme when it tells one, otherwise undefined (the page then follows prefers-color-scheme). */
  theme(): "light" | "dark" | undefined;
  /**
   * A value the add-in keeps in the workbook under `name` (undefined when none is kept), and
   * keeping one. In the spreadsheet host these are the document settings
   * (`Office.context.document.settings`: saved per add-in and per document, persisted by
   * `saveAsync`; https://learn.microsoft.com/javascript/api/office/office.settings); the
   * workbench keeps them with its workbook. Optional; a host that has the call but not the
   * requirement set rejects with a SheetHostError of code "RequirementNotMet".
   */
  readSetting?(name: string): Promise<unknown>;
  /**
   * The workbook's cells whose formula holds a SPAN call, sheet by sheet, row by row, at most
   * `limit` of them (the report looks for checks of its member among them). Optional.
   */
  spanFormulas?(limit: number): Promise<FormulaCell[]>;
  writeSetting?(name: string, value: unknown): Promise<void>;
  /**
   * Which workbook the host shows, for what the pane keeps per workbook (the title block):
   * a different value means another workbook. Optional: without it the pane lives in one
   * workbook (the spreadsheet host starts a pane per document).
   */
  workbookKey?(): unknown;
}

/** "Sheet!A1" with the sheet name quoted when it needs it. */
export function qualify(sheet: string, address: string): string {
  const plain = /^[A-Za-z_][\w.]*$/.test(sheet) && !/^[A-Za-z]{1,3}\d+$/.test(sheet);
  return `${plain ? sheet : `'${sheet.replace(/'/g, "''")}'`}!${address}`;
}

/** Splits "Sheet!A1:B2" / "'My sheet'!A1" into sheet (if any) and address. */
export function splitAddress(text: string): { sheet?: string; address: string } {
  const bang = text.lastIndexOf("!");
  if (bang < 0) return { address: text };
  const sheet = text.slice(0, bang).replace(/^'(.*)'$/, "$1").replace(/''/g, "'");
  return { sheet, address: text.slice(bang + 1) };
}

/**
 * A host operation that failed in a way the user can act on: a write into a protected sheet,
 * part of an array, merged cells; a feature this version of the spreadsheet lacks. `message`
 * is written for the user (shown as is in the pane); `code` is the host's error code
 * ("AccessDenied", "MergedRangeConflict", ... or "RequirementNotMet"); `address` is the range
 * the operation was about, when there was one.
 */
export class SheetHostError extends Error {
  constructor(
    message: string,
    readonly code: string,
    readonly address?: string,
  ) {
    super(message);
    this.name = "SheetHostError";
  }
}
