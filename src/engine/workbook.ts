/**
 * A workbook evaluated by the formula engine with the SPAN functions registered: the one
 * binding both the workbench page and the command-line calculator use.
 *
 * Two things the engine does not do by itself are done here, after every change:
 * - spill sizes the formula text cannot tell (a spans list in one text cell, DIAGRAM rows) are
 *   learned from the evaluation and the formula is set again with the learned size;
 * - the spilled-range operator `A1#` is rewritten to the range the spill covers now, and
 *   rewritten again whenever that spill changes size.
 * Both repeat until nothing changes (a few passes at most).
 */
import { DetailedCellError, ErrorType, HyperFormula } from "hyperformula";
import type { SpanFunctions } from "./catalogue";
import { ReusedResults } from "./reusedResults";
import { CallMap, cellKey, attachContext, buildingWith, type CellAddress, type EngineContext } from "./learnedSizes";
import { columnLetters, expandSpillReferences, hasSpillReference, mapCode, normalizeFormula, parseReference, soleSpillReference, type SpillReference } from "./formulaText";
import type { BlockSize } from "./resultSize";
import { formulaAfterRows } from "./references";
import { registerSpanPlugin } from "./spanPlugin";
import { registerSinglePlugin } from "./singlePlugin";
import { arrayError, patchErroredArrayRanges } from "./erroredArrays";
import { anchorArrayText, registerAnchorArrayPlugin } from "./anchorArray";
import { SPAN_EXPORTS } from "./spanFunctions";

/** What a cell holds as typed: text starting with "=" is a formula. */
export type CellInput = string | number | boolean | null | undefined;

export interface SheetInput {
  name: string;
  cells: CellInput[][];
}

export interface CellErrorValue {
  error: string;
  message: string;
}

export type CellResult = number | string | boolean | null | CellErrorValue;

export interface WorkbookOptions {
  /** The worksheet functions to call; the real exports unless a test passes others. */
  functions?: SpanFunctions;
  /** Called once per SPAN function evaluation (for progress bars). */
  onSpanCall?: () => void;
  /** Defined names: workbook-wide, or local to the sheet of index `localSheet`. */
  names?: readonly { name: string; formula: string; localSheet?: number }[];
}

const MAX_PASSES = 8;

/**
 * The spreadsheet host's sheet size (Microsoft support, "Excel specifications and limits":
 * 1,048,576 rows by 16,384 columns); the formula engine's own default is 40,000 rows.
 */
export const SHEET_LIMITS = { rows: 1_048_576, cols: 16_384 } as const;

const CONFIG = {
  licenseKey: "gpl-v3",
  maxRows: SHEET_LIMITS.rows,
  maxColumns: SHEET_LIMITS.cols,
  // Nothing here is ever undone: no undo history to keep (and scan) per change.
  undoLimit: 0,
  useArrayArithmetic: true,
  evaluateNullToZero: true,
  // Values leave the engine exactly as computed (no rounding to 10 digits on export).
  smartRounding: false,
  // Text such as "6 8 6" (a spans list) stays text: no dates are read from typed text.
  parseDateTime: () => undefined,
} as const;

const NAME = /^[A-Za-z_\\][\w.]*$/;

/** Defined names as the engine takes them; built-in names (_xlnm.Print_Area and the like) are no formulas' business. */
function namedExpressions(names: NonNullable<WorkbookOptions["names"]>): { name: string; expression: string; scope?: number }[] {
  return names
    .filter(({ name, formula }) => NAME.test(name) && !name.startsWith("_xlnm.") && formula.trim() !== "")
    .map(({ name, formula, localSheet }) => ({ name, expression: normalizeFormula(`=${formula}`), ...(localSheet === undefined ? {} : { scope: localSheet }) }));
}

export function isCellError(value: unknown): value is CellErrorValue {
  return typeof value === "object" && value !== null && "error" in value;
}

export class SpanWorkbook {
  private readonly hf: HyperFormula;
  private readonly context: EngineContext;
  /** Formulas as typed, where the engine holds another text (saved forms, `A1#`). */
  private readonly typed = new Map<string, { address: CellAddress; text: string; engineText: string }>();

  constructor(sheets: readonly SheetInput[], options: WorkbookOptions = {}) {
    registerSpanPlugin();
    registerSinglePlugin();
    registerAnchorArrayPlugin();
    patchErroredArrayRanges();
    for (const sheet of sheets) {
      const widest = sheet.cells.reduce((most, row) => Math.max(most, row?.length ?? 0), 0);
      if (sheet.cells.length > SHEET_LIMITS.rows || widest > SHEET_LIMITS.cols) {
        throw new RangeError(`sheet "${sheet.name}" is larger than a spreadsheet allows (${SHEET_LIMITS.rows} rows, ${SHEET_LIMITS.cols} columns)`);
      }
    }
    this.context = this.newContext(options);
    this.building = sheets;
    // Built from all sheets at once: an empty engine filled in a batch exports every change
    // when the batch ends, and the engine joins spilled changes by copying (quadratic).
    this.hf = this.build(sheets, options);
    attachContext(this.hf.dependencyGraph, this.context);
    this.building = undefined;
    this.settle();
  }

  /**
   * The context the SPAN plugin reads, made outside the constructor: a closure made in the
   * constructor would keep the constructor's variables (every sheet's cells) for the life of
   * the workbook.
   */
  private newContext(options: WorkbookOptions): EngineContext {
    return {
      functions: options.functions ?? SPAN_EXPORTS,
      learned: new CallMap(),
      mismatched: new Map(),
      computed: new CallMap(),
      reserved: new CallMap(),
      answers: new ReusedResults(),
      onCall: options.onSpanCall,
      textAt: (address) => this.textAt(address),
    };
  }

  /** The engine built from the sheets; the prepared copy of their cells is not kept. */
  private build(sheets: readonly SheetInput[], options: WorkbookOptions): HyperFormula {
    const contents: Record<string, CellInput[][]> = {};
    sheets.forEach((sheet, id) => {
      if (Object.prototype.hasOwnProperty.call(contents, sheet.name)) throw new RangeError(`two sheets are named "${sheet.name}"`);
      contents[sheet.name] = sheet.cells.map((row, r) => this.preparedRow(id, r, row ?? []));
    });
    return buildingWith(this.context, () => HyperFormula.buildFromSheets(contents as never, CONFIG, namedExpressions(options.names ?? [])));
  }

  /** A row as the engine takes it: the row itself when nothing in it changes (big sheets: no copy). */
  private preparedRow(sheet: number, row: number, cells: readonly CellInput[]): CellInput[] {
    let out: CellInput[] | undefined;
    for (let col = 0; col < cells.length; col++) {
      const input = cells[col];
      if (typeof input !== "string" || !input.startsWith("=")) continue;
      const prepared = this.prepare({ sheet, row, col }, input);
      if (prepared === input) continue;
      out ??= cells.slice();
      out[col] = prepared;
    }
    return out ?? (cells as CellInput[]);
  }

  /** While the sheets are first read, their inputs; afterwards the engine's value cells. */
  private building: readonly SheetInput[] | undefined;

  private textAt(address: CellAddress): string | undefined {
    const input = this.building ? this.building[address.sheet]?.cells[address.row]?.[address.col] : this.valueAt(address);
    if (typeof input !== "string" || input.startsWith("=")) return undefined;
    // An input behind an apostrophe is the text after it (how a saved text cell is read in, xlsxBook.ts).
    return this.building && input.startsWith("'") ? input.slice(1) : input;
  }

  private valueAt(address: CellAddress): unknown {
    const vertex = (this.hf.dependencyGraph as unknown as { getCell(a: CellAddress): unknown }).getCell(address) as { getValues?: () => { rawValue: unknown } } | undefined;
    return vertex && typeof vertex.getValues === "function" ? vertex.getValues().rawValue : undefined;
  }

  sheetNames(): string[] {
    return this.hf.getSheetNames();
  }

  sheetId(name: string): number {
    const id = this.hf.getSheetId(name);
    if (id === undefined) throw new Error(`no sheet named "${name}"`);
    return id;
  }

  /** Rows and columns in use on a sheet, spills included. */
  dimensions(sheet: number): BlockSize {
    const { height, width } = this.hf.getSheetDimensions(sheet);
    return { rows: height, cols: width };
  }

  /**
   * Sets cells from a top-left corner, then recalculates what depends on them. The block goes
   * to the engine in one call (many single-cell calls in one batch cost quadratic time).
   */
  setCells(sheet: number, top: number, left: number, block: readonly (readonly CellInput[])[]): void {
    this.write(sheet, top, left, block);
  }

  /**
   * As setCells, and says which cells' values changed, as the engine reports them from every
   * pass: the block itself, what depends on it, and the cells of spills that changed or grew.
   * Cells a shrinking spill leaves empty are not among them: a grid repaints the cells of an
   * old spill whose anchor is reported.
   */
  setCellsReporting(sheet: number, top: number, left: number, block: readonly (readonly CellInput[])[]): CellAddress[] {
    const changed: CellAddress[] = [];
    this.write(sheet, top, left, block, changed);
    return changed;
  }

  private write(sheet: number, top: number, left: number, block: readonly (readonly CellInput[])[], changed?: CellAddress[]): void {
    // Array.from, not block.map: a block from another frame (the pane writing into the workbench)
    // would map into that frame's arrays, which the engine does not take for arrays.
    // Formulas kept as typed in the block are forgotten first (one pass over the few kept, not a key per cell).
    const bottom = top + block.length;
    const right = left + block.reduce((most, row) => Math.max(most, row.length), 0);
    for (const [key, { address }] of this.typed)
      if (address.sheet === sheet && address.row >= top && address.row < bottom && address.col >= left && address.col < right && address.col < left + block[address.row - top].length) this.typed.delete(key);
    const prepared = Array.from(block, (row, r) => Array.from(row, (input, c) => this.prepare({ sheet, row: top + r, col: left + c }, input)));
    const width = prepared[0]?.length ?? 0;
    if (width === 0) return;
    const changes =
      prepared.every((row) => row.length === width)
        ? this.hf.setCellContents({ sheet, row: top, col: left }, prepared as never)
        : this.hf.batch(() => prepared.forEach((row, r) => row.length > 0 && this.hf.setCellContents({ sheet, row: top + r, col: left }, [row] as never)));
    if (changed) collect(changes, changed);
    this.retryBlocked(changed);
    this.settle(changed);
  }

  /** Inserts `count` empty rows before row `at`; formulas everywhere follow the rows that moved. */
  insertRows(sheet: number, at: number, count: number): void {
    if (!Number.isInteger(at) || !Number.isInteger(count) || at < 0 || count < 1) throw new RangeError(`cannot insert ${count} rows at row ${at + 1}`);
    if (this.dimensions(sheet).rows + count > SHEET_LIMITS.rows) throw new RangeError(`the sheet would have more than ${SHEET_LIMITS.rows} rows`);
    this.hf.addRows(sheet, [at, count]);
    this.afterRows(sheet, at, count);
  }

  /** Deletes rows `at` to `at + count - 1`; references into them become #REF!, ranges keep the rows left. */
  deleteRows(sheet: number, at: number, count: number): void {
    if (!Number.isInteger(at) || !Number.isInteger(count) || at < 0 || count < 1) throw new RangeError(`cannot delete ${count} rows at row ${at + 1}`);
    this.hf.removeRows(sheet, [at, count]);
    this.afterRows(sheet, at, -count);
  }

  /** Formulas kept as typed follow a row insertion (count > 0) or deletion (count < 0). */
  private afterRows(sheet: number, at: number, count: number): void {
    const name = this.hf.getSheetName(sheet) ?? "";
    const entries = [...this.typed.values()];
    this.typed.clear();
    for (const entry of entries) {
      let row = entry.address.row;
      if (entry.address.sheet === sheet && row >= at) {
        if (count < 0 && row < at - count) continue;
        row += count;
      }
      const address = { ...entry.address, row };
      const text = formulaAfterRows(entry.text, name, entry.address.sheet === sheet, at, count, SHEET_LIMITS);
      this.typed.set(cellKey(address), { address, text, engineText: this.hf.getCellFormula(address) ?? "" });
    }
    this.retryBlocked();
    this.settle();
  }

  /**
   * Sets every array formula whose spill is blocked (`#SPILL!`) again, so that it spills once
   * the cells in its way are cleared, as in the spreadsheet. The engine tries a blocked array
   * again only when one of its own inputs changes, not when its area is freed (HyperFormula
   * issue #1287, "Setting a null value in the ARRAYFORMULA expansion area does not update the
   * NoSpaceForArrayResult error", open). Cheap: an array with no space is not evaluated.
   */
  private retryBlocked(changed?: CellAddress[]): void {
    const arrays = (this.hf.dependencyGraph as unknown as { arrayMapping?: { arrayMapping?: Map<string, { array?: unknown; cellAddress?: CellAddress }> } }).arrayMapping?.arrayMapping;
    if (!arrays) return;
    const blocked: { address: CellAddress; formula: string }[] = [];
    for (const vertex of arrays.values()) {
      if (arrayError(vertex.array)?.type !== ErrorType.SPILL || !vertex.cellAddress) continue;
      const formula = this.hf.getCellFormula(vertex.cellAddress);
      if (formula !== undefined) blocked.push({ address: { ...vertex.cellAddress }, formula });
    }
    if (blocked.length === 0) return;
    const changes = this.hf.batch(() => blocked.forEach(({ address, formula }) => this.hf.setCellContents(address, [[formula]])));
    if (changed) collect(changes, changed);
  }

  setCell(sheet: number, row: number, col: number, input: CellInput): void {
    this.setCells(sheet, row, col, [[input]]);
  }

  getValue(sheet: number, row: number, col: number): CellResult {
    return plain(this.hf.getCellValue({ sheet, row, col }));
  }

  /** Every value of a sheet, spilled cells included, as a rectangular block. */
  getSheetValues(sheet: number): CellResult[][] {
    const { rows, cols } = this.dimensions(sheet);
    return Array.from({ length: rows }, (_, row) => Array.from({ length: cols }, (_, col) => this.getValue(sheet, row, col)));
  }

  /** The formula as typed (with `=`), or undefined for a value cell or a spilled cell. */
  getFormula(sheet: number, row: number, col: number): string | undefined {
    const typed = this.typed.get(cellKey({ sheet, row, col }));
    if (typed) return typed.text;
    return this.hf.getCellFormula({ sheet, row, col });
  }

  /** What the cell holds as typed: its formula, or its value; undefined when empty. */
  getInput(sheet: number, row: number, col: number): CellInput {
    const formula = this.getFormula(sheet, row, col);
    if (formula !== undefined) return formula;
    if (this.spillAnchorOf(sheet, row, col)) return undefined;
    const serialized = this.hf.getCellSerialized({ sheet, row, col });
    if (serialized === null || serialized === undefined) return undefined;
    if (typeof serialized === "object") return String(serialized);
    return serialized as CellInput;
  }

  /**
   * What a block of cells holds as typed (`getInput` of each, null for an empty cell): the old
   * contents of a block about to be written. Cells past the sheet's used area (`dimensions`,
   * which covers every cell holding anything) are empty without asking.
   */
  inputBlock(sheet: number, top: number, left: number, rows: number, cols: number): CellInput[][] {
    const used = this.dimensions(sheet);
    return Array.from({ length: rows }, (_, r) =>
      Array.from({ length: cols }, (_, c) => (top + r < used.rows && left + c < used.cols ? (this.getInput(sheet, top + r, left + c) ?? null) : null)),
    );
  }

  /** Size of the array a formula cell spills into, when it spills (more than one cell). */
  spillSize(sheet: number, row: number, col: number): BlockSize | undefined {
    // While the engine is being built nothing has spilled yet (settle() resolves A1# after).
    if (this.hf === undefined) return undefined;
    const vertex = (this.hf.dependencyGraph as unknown as { getCell(a: CellAddress): unknown }).getCell({ sheet, row, col }) as
      | { width?: unknown; height?: unknown; isLeftCorner?: (a: CellAddress) => boolean }
      | undefined;
    if (!vertex || typeof vertex.width !== "number" || typeof vertex.height !== "number" || !vertex.isLeftCorner) return undefined;
    if (!vertex.isLeftCorner({ sheet, row, col })) return undefined;
    return { rows: vertex.height, cols: vertex.width };
  }

  /** The formula cell whose spill covers this (non-formula) cell. */
  spillAnchorOf(sheet: number, row: number, col: number): CellAddress | undefined {
    const vertex = (this.hf.dependencyGraph as unknown as { getCell(a: CellAddress): unknown }).getCell({ sheet, row, col }) as
      | { getAddress?: unknown; cellAddress?: CellAddress; isLeftCorner?: (a: CellAddress) => boolean }
      | undefined;
    if (!vertex || !vertex.isLeftCorner || !vertex.cellAddress) return undefined;
    if (vertex.isLeftCorner({ sheet, row, col })) return undefined;
    return { ...vertex.cellAddress };
  }

  /** Addresses of every formula cell of a sheet. */
  formulaCells(sheet: number): CellAddress[] {
    const { rows, cols } = this.dimensions(sheet);
    const out: CellAddress[] = [];
    for (let row = 0; row < rows; row++)
      for (let col = 0; col < cols; col++) if (this.hf.doesCellHaveFormula({ sheet, row, col })) out.push({ sheet, row, col });
    return out;
  }

  /** A1-style text of an address, with the sheet name when asked. */
  addressText(address: CellAddress, withSheet = false): string {
    const cell = `${columnLetters(address.col)}${address.row + 1}`;
    if (!withSheet) return cell;
    const name = this.hf.getSheetName(address.sheet) ?? "";
    return `${/^[A-Za-z_][\w.]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`}!${cell}`;
  }

  /**
   * What every cell of a sheet holds as typed, as rows of inputs (formulas as typed, values,
   * undefined for empty cells and for cells another formula spills into): `getInput` for the
   * whole sheet at once, for saving and for telling what changed.
   */
  sheetInputs(sheet: number): CellInput[][] {
    const raw = this.hf.getSheetSerialized(sheet) as unknown[][];
    const out: CellInput[][] = [];
    raw.forEach((line, row) => {
      const cells: CellInput[] = [];
      line.forEach((value, col) => {
        if (value === null || value === undefined) return;
        if (this.spillAnchorOf(sheet, row, col)) return;
        cells[col] = typeof value === "object" ? String(value) : (value as CellInput);
      });
      out[row] = cells;
    });
    for (const { address, text } of this.typed.values()) if (address.sheet === sheet) (out[address.row] ??= [])[address.col] = text;
    for (let row = 0; row < out.length; row++) out[row] ??= [];
    return out;
  }

  /** Sets scattered cells (row, column, input) in one batch, then recalculates once. */
  setScattered(sheet: number, cells: readonly (readonly [number, number, CellInput])[]): void {
    if (cells.length === 0) return;
    for (const [row, col] of cells) this.typed.delete(cellKey({ sheet, row, col }));
    const prepared = cells.map(([row, col, input]) => [row, col, this.prepare({ sheet, row, col }, input)] as const);
    this.hf.batch(() => prepared.forEach(([row, col, input]) => this.hf.setCellContents({ sheet, row, col }, [[input]] as never)));
    this.retryBlocked();
    this.settle();
  }

  /** Adds an empty sheet at the end; returns its id. The name must be free (sheet names are compared case-insensitively). */
  addSheet(name: string): number {
    if (!this.hf.isItPossibleToAddSheet(name)) throw new Error(`a sheet named "${name}" cannot be added`);
    this.hf.addSheet(name);
    return this.sheetId(name);
  }

  /**
   * Renames a sheet. The engine rewrites the formulas that name it; formulas kept as typed
   * (saved forms, `A1#`) are rewritten here the same way.
   */
  renameSheet(sheet: number, name: string): void {
    const old = this.hf.getSheetName(sheet);
    if (old === undefined) throw new Error(`no sheet ${sheet}`);
    if (old === name) return;
    if (!this.hf.isItPossibleToRenameSheet(sheet, name)) throw new Error(`sheet "${old}" cannot be renamed to "${name}"`);
    this.hf.renameSheet(sheet, name);
    for (const entry of this.typed.values()) entry.text = renameSheetReferences(entry.text, old, name);
    this.settle();
  }

  destroy(): void {
    this.hf.destroy();
  }

  /** The input as the engine takes it; a formula the engine holds in another text is kept as typed (its old entry is gone: see write). */
  private prepare(address: CellAddress, input: CellInput): CellInput {
    if (typeof input !== "string" || !input.startsWith("=")) return input ?? null;
    const normalized = normalizeFormula(input);
    if (normalized === input && !hasSpillReference(input)) return input;
    const engineText = this.engineText(address, input);
    this.typed.set(cellKey(address), { address, text: input, engineText });
    return engineText;
  }

  /**
   * The typed formula as the engine takes it: saved forms normalized, `A1#` resolved. A formula
   * that is `=A1#` alone becomes the array `={A1:C4}`, so it spills as the host's does.
   */
  private engineText(address: CellAddress, formula: string): string {
    const normalized = normalizeFormula(formula);
    const sole = soleSpillReference(normalized);
    if (sole !== undefined) {
      const target = this.spillTarget(address, parseReference(sole), sole);
      return target.range ? `={${target.range}}` : `=${target.text}`;
    }
    return expandSpillReferences(normalized, (reference, written) => this.spillTarget(address, reference, written).text);
  }

  /**
   * What `written#` stands for now: the range its anchor's array covers, or — no array spills
   * there — ANCHORARRAY, which gives the failed array formula's error or #REF! (anchorArray.ts).
   */
  private spillTarget(address: CellAddress, reference: SpillReference, written: string): { text: string; range?: string } {
    const sheet = reference.sheetName === undefined ? address.sheet : this.hf?.getSheetId(reference.sheetName);
    if (sheet === undefined) return { text: anchorArrayText(written, false) };
    const array = this.arrayAt(sheet, reference.row, reference.col);
    if (!array || array.error) return { text: anchorArrayText(written, array !== undefined) };
    const range = `${written}:${columnLetters(reference.col + array.size.cols - 1)}${reference.row + array.size.rows}`;
    return { text: range, range };
  }

  /** The array formula anchored at a cell: its size, and whether it failed (blocked spill, error result). */
  private arrayAt(sheet: number, row: number, col: number): { size: BlockSize; error: boolean } | undefined {
    // While the engine is being built nothing has spilled yet (settle() resolves A1# after).
    if (this.hf === undefined) return undefined;
    const size = this.spillSize(sheet, row, col);
    if (!size) return undefined;
    const vertex = (this.hf.dependencyGraph as unknown as { getCell(a: CellAddress): unknown }).getCell({ sheet, row, col }) as { array?: unknown };
    return { size, error: arrayError(vertex.array) !== undefined };
  }

  private settle(changed?: CellAddress[]): void {
    for (let pass = 0; pass < MAX_PASSES; pass++) {
      const pending = new Map<string, { address: CellAddress; text: string }>();
      for (const [key, address] of this.context.mismatched) {
        const typed = this.typed.get(key);
        const formula = typed ? this.engineText(address, typed.text) : this.hf.getCellFormula(address);
        if (formula !== undefined) pending.set(key, { address, text: formula });
      }
      this.context.mismatched.clear();
      for (const [key, entry] of this.typed) {
        const text = this.engineText(entry.address, entry.text);
        if (text !== entry.engineText) pending.set(key, { address: entry.address, text });
      }
      if (pending.size === 0) return;
      const changes = this.hf.batch(() => {
        for (const [key, { address, text }] of pending) {
          const typed = this.typed.get(key);
          if (typed) typed.engineText = text;
          this.hf.setCellContents(address, [[text]]);
        }
      });
      if (changed) collect(changes, changed);
    }
  }
}

/** The cell addresses among the engine's exported changes (named expressions have none). */
function collect(changes: readonly unknown[], into: CellAddress[]): void {
  for (const change of changes) {
    const address = (change as { address?: CellAddress }).address;
    if (address) into.push(address);
  }
}

function plain(value: unknown): CellResult {
  if (value instanceof DetailedCellError) return { error: value.value, message: value.message ?? "" };
  if (value === undefined) return null;
  return value as CellResult;
}

/** A sheet name as formulas write it: bare when it is a plain name, else quoted ('it''s'). */
export function quoteSheetName(name: string): string {
  return /^[A-Za-z_][\w.]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}

/**
 * Formula text with every reference to sheet `from` (`From!A1`, `'From sheet'!A1`, matched
 * case-insensitively as sheet names are) naming sheet `to` instead; string literals untouched.
 */
export function renameSheetReferences(formula: string, from: string, to: string): string {
  const wanted = from.toLowerCase();
  return mapCode(formula, (code) =>
    code.replace(/(^|[^\w.'])('(?:[^']|'')+'|[A-Za-z_][\w.]*)!/g, (whole, before: string, sheet: string) => {
      const name = sheet.startsWith("'") ? sheet.slice(1, -1).replace(/''/g, "'") : sheet;
      return name.toLowerCase() === wanted ? `${before}${quoteSheetName(to)}!` : whole;
    }),
  );
}
