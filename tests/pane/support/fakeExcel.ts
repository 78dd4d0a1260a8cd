/**
 * A small fake of the Excel JavaScript API, as much of it as officeHost.ts calls, with the
 * batching rules of the real one: objects are proxies, `load` only queues, properties are
 * readable only after a `context.sync()` that followed their `load` (reading earlier throws,
 * as office.js does with PropertyNotLoaded), writes are queued and applied at the sync, and
 * a failing operation rejects the sync with an error carrying a `code` from Excel.ErrorCodes.
 * Every sync is counted: that is the round-trip count the tests bound.
 * Spills as the dynamic-arrays page describes them: a formula cell's result fills a rectangle
 * with that cell at its top-left (`getSpillingToRangeOrNullObject` on the formula's cell gives
 * it), `getSpillParentOrNullObject` on one cell of it gives the formula's cell (a null object
 * for a cell outside every spill, and for a range of more than one cell), and a write into a
 * spilled cell other than the formula's breaks the formula: its cell shows #SPILL! and the
 * spill is gone (https://learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-ranges-dynamic-arrays).
 * Source of the rules: https://learn.microsoft.com/office/dev/add-ins/develop/application-specific-api-model
 * ("load", "sync", "*OrNullObject methods and properties").
 */
import { blockText, parseBlock, type Block } from "../../../src/pane/addresses";
import { qualify, splitAddress, type CellValue } from "../../../src/pane/host";

export interface FakeCell {
  value: CellValue;
  formula?: string;
}

export interface FakeSheet {
  name: string;
  cells: Map<string, FakeCell>;
  /** Sheet-scoped names: upper-cased name to the range, unqualified ("A10:F12"). */
  names: Map<string, string>;
  /** Spilling anchors ("B3") to their whole spilled range ("B3:B8"). */
  spills: Map<string, string>;
}

/** An error the fake host raises at sync, shaped like OfficeExtension.Error. */
export class FakeExcelError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = "RichApi.Error";
  }
}

export interface ChartRecord {
  sheet: string;
  type: string;
  source: string;
  seriesBy: string;
  title: string;
  series: { name: string; x?: string; y?: string }[];
  xTitle: string;
  yTitle: string;
  legend: boolean;
  position?: [string, string];
}

function cellsOf(block: Block): { row: number; col: number }[] {
  const out: { row: number; col: number }[] = [];
  for (let row = block.from.row; row <= block.to.row; row++) for (let col = block.from.col; col <= block.to.col; col++) out.push({ row, col });
  return out;
}

function a1(row: number, col: number): string {
  return blockText({ from: { row, col }, to: { row, col } });
}

function overlaps(a: Block, b: Block): boolean {
  return a.from.row <= b.to.row && b.from.row <= a.to.row && a.from.col <= b.to.col && b.from.col <= a.to.col;
}

export class FakeWorkbook {
  readonly sheets = new Map<string, FakeSheet>();
  /** Workbook-scoped names: upper-cased name to a sheet-qualified range. */
  readonly names = new Map<string, string>();
  readonly charts: ChartRecord[] = [];
  selection = { sheet: "Sheet1", range: "A1" };
  syncs = 0;
  /** Writes, clears or charts over these cells fail at sync with the code given (a protected sheet, an array, merged cells...). */
  readonly refusals: { sheet: string; block: Block; code: string; message: string }[] = [];

  sheet(name: string): FakeSheet {
    let sheet = [...this.sheets.values()].find((s) => s.name.toUpperCase() === name.toUpperCase());
    if (!sheet) this.sheets.set(name, (sheet = { name, cells: new Map(), names: new Map(), spills: new Map() }));
    return sheet;
  }

  /** Rows of values with their top-left at "Sheet!B3". */
  put(address: string, rows: CellValue[][]): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    const s = this.sheet(sheet);
    const from = parseBlock(at).from;
    rows.forEach((row, r) => row.forEach((value, c) => value !== null && s.cells.set(a1(from.row + r, from.col + c), { value })));
    return this;
  }

  putFormula(address: string, formula: string, value: CellValue): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    this.sheet(sheet).cells.set(at, { value, formula });
    return this;
  }

  /** A formula at "Sheet!J3" whose result `rows` spills from there (right and down). */
  putSpill(address: string, formula: string, rows: CellValue[][]): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    const from = parseBlock(at).from;
    this.put(address, rows);
    this.putFormula(address, formula, rows[0][0]);
    const to = { row: from.row + rows.length - 1, col: from.col + Math.max(...rows.map((r) => r.length)) - 1 };
    this.sheet(sheet).spills.set(at, blockText({ from, to }));
    return this;
  }

  /** The formula cell ("J3") whose spill covers the cell, or undefined. */
  spillParent(sheet: FakeSheet, row: number, col: number): string | undefined {
    for (const [anchor, range] of sheet.spills) {
      const block = parseBlock(range);
      if (row >= block.from.row && row <= block.to.row && col >= block.from.col && col <= block.to.col) return anchor;
    }
    return undefined;
  }

  /** The spill of the formula at `anchor` goes (its formula cell overwritten or cleared, or the spill blocked): its spilled values with it. */
  dropSpill(sheet: FakeSheet, anchor: string): void {
    const range = sheet.spills.get(anchor);
    if (range === undefined) return;
    for (const cell of cellsOf(parseBlock(range))) if (a1(cell.row, cell.col) !== anchor) sheet.cells.delete(a1(cell.row, cell.col));
    sheet.spills.delete(anchor);
  }

  select(address: string, range = splitAddress(address).address): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    this.sheet(sheet);
    this.selection = { sheet, range: at === range ? at : range };
    return this;
  }

  refuse(address: string, code: string, message: string): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    this.refusals.push({ sheet: this.sheet(sheet).name, block: parseBlock(at), code, message });
    return this;
  }

  find(name: string): FakeSheet {
    const sheet = [...this.sheets.values()].find((s) => s.name.toUpperCase() === name.toUpperCase());
    if (!sheet) throw new FakeExcelError("ItemNotFound", `The requested resource doesn't exist. (sheet ${name})`);
    return sheet;
  }

  checkWrite(sheet: FakeSheet, block: Block): void {
    const refusal = this.refusals.find((r) => r.sheet === sheet.name && overlaps(r.block, block));
    if (refusal) throw new FakeExcelError(refusal.code, refusal.message);
  }

  /** A request context over this workbook, as Excel.run hands one to its batch. */
  context(): FakeContext {
    return new FakeContext(this);
  }

  /** Excel.run over this workbook. */
  run = <T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T> => batch(this.context() as unknown as Excel.RequestContext);
}

type Op = () => void;

class FakeContext {
  private queue: Op[] = [];
  readonly workbook: unknown;

  constructor(readonly book: FakeWorkbook) {
    this.workbook = {
      getSelectedRange: () => new RangeProxy(this, () => ({ sheet: book.find(book.selection.sheet), block: parseBlock(book.selection.range) })),
      worksheets: new SheetsProxy(this),
      names: new NamesProxy(this, undefined),
    };
  }

  enqueue(op: Op): void {
    this.queue.push(op);
  }

  async sync(): Promise<void> {
    this.book.syncs++;
    const ops = this.queue;
    this.queue = [];
    await Promise.resolve();
    for (const op of ops) op();
  }
}

/** Base of every proxy: loaded properties readable only after the sync that followed load. */
class FakeProxy<T> {
  protected loaded = new Map<string, unknown>();
  private nullObject: boolean | undefined;

  constructor(
    protected readonly context: FakeContext,
    protected readonly target: () => T | null,
  ) {}

  protected props(_target: T): Record<string, unknown> {
    return {};
  }

  load(spec?: string): this {
    const wanted = (spec ?? "").split(",").map((p) => p.trim().replace(/^items\//, "")).filter(Boolean);
    this.context.enqueue(() => {
      const target = this.target();
      this.nullObject = target === null;
      if (target === null) return;
      const all = this.props(target);
      for (const name of wanted) {
        if (!(name in all)) throw new FakeExcelError("InvalidArgument", `the fake has no property ${name}`);
        this.loaded.set(name, all[name]);
      }
    });
    return this;
  }

  protected read(name: string): unknown {
    if (!this.loaded.has(name)) throw new Error(`PropertyNotLoaded: ${name} was read before load and sync`);
    return this.loaded.get(name);
  }

  get isNullObject(): boolean {
    if (this.nullObject === undefined) throw new Error("PropertyNotLoaded: isNullObject was read before a sync");
    return this.nullObject;
  }
}

interface RangeTarget {
  sheet: FakeSheet;
  block: Block;
}

class RangeProxy extends FakeProxy<RangeTarget> {
  protected override props({ sheet, block }: RangeTarget): Record<string, unknown> {
    const grid = (pick: (cell: FakeCell | undefined) => unknown) => {
      const rows: unknown[][] = [];
      for (let r = block.from.row; r <= block.to.row; r++) {
        const row: unknown[] = [];
        for (let c = block.from.col; c <= block.to.col; c++) row.push(pick(sheet.cells.get(a1(r, c))));
        rows.push(row);
      }
      return rows;
    };
    const lazy: Record<string, unknown> = {
      address: qualify(sheet.name, blockText(block)),
      rowCount: block.to.row - block.from.row + 1,
      columnCount: block.to.col - block.from.col + 1,
    };
    // Values and formulas are built only when loaded (a used range may be large).
    Object.defineProperty(lazy, "values", { enumerable: true, get: () => grid((cell) => cell?.value ?? "") });
    Object.defineProperty(lazy, "formulas", { enumerable: true, get: () => grid((cell) => cell?.formula ?? cell?.value ?? "") });
    return lazy;
  }

  get rowCount(): number {
    return this.read("rowCount") as number;
  }
  get columnCount(): number {
    return this.read("columnCount") as number;
  }

  get address(): string {
    return this.read("address") as string;
  }
  get values(): unknown[][] {
    return this.read("values") as unknown[][];
  }
  get formulas(): unknown[][] {
    return this.read("formulas") as unknown[][];
  }
  set formulas(rows: unknown[][]) {
    this.context.enqueue(() => {
      const t = this.target();
      if (!t) throw new FakeExcelError("InvalidReference", "null range");
      this.context.book.checkWrite(t.sheet, t.block);
      rows.forEach((row, r) =>
        row.forEach((input, c) => {
          if (input === null) return;
          const at = a1(t.block.from.row + r, t.block.from.col + c);
          const parent = this.context.book.spillParent(t.sheet, t.block.from.row + r, t.block.from.col + c);
          if (parent !== undefined) {
            // Over the formula's own cell the spill goes with the formula; elsewhere the write
            // blocks the other formula's spill: its values go, its cell shows #SPILL!.
            this.context.book.dropSpill(t.sheet, parent);
            if (parent !== at) t.sheet.cells.set(parent, { value: "#SPILL!", formula: t.sheet.cells.get(parent)?.formula });
          }
          t.sheet.cells.set(at, typeof input === "string" && input.startsWith("=") ? { value: 0, formula: input } : { value: input as CellValue });
        }),
      );
    });
  }

  get worksheet(): SheetProxy {
    return new SheetProxy(this.context, () => this.target()?.sheet ?? null);
  }

  getCell(row: number, col: number): RangeProxy {
    return new RangeProxy(this.context, () => {
      const t = this.target();
      if (!t) return null;
      const at = { row: t.block.from.row + row, col: t.block.from.col + col };
      return { sheet: t.sheet, block: { from: at, to: at } };
    });
  }

  getSpillingToRangeOrNullObject(): RangeProxy {
    return new RangeProxy(this.context, () => {
      const t = this.target();
      if (!t) return null;
      const spill = t.sheet.spills.get(a1(t.block.from.row, t.block.from.col));
      return spill ? { sheet: t.sheet, block: parseBlock(spill) } : null;
    });
  }

  getSpillParentOrNullObject(): RangeProxy {
    return new RangeProxy(this.context, () => {
      const t = this.target();
      if (!t) return null;
      if (t.block.from.row !== t.block.to.row || t.block.from.col !== t.block.to.col) return null;
      const parent = this.context.book.spillParent(t.sheet, t.block.from.row, t.block.from.col);
      return parent === undefined ? null : { sheet: t.sheet, block: parseBlock(parent) };
    });
  }

  clear(_applyTo: string): void {
    this.context.enqueue(() => {
      const t = this.target();
      if (!t) throw new FakeExcelError("InvalidReference", "null range");
      this.context.book.checkWrite(t.sheet, t.block);
      const inBlock = (cell: string): boolean => overlaps(parseBlock(cell), t.block);
      for (const { row, col } of cellsOf(t.block)) {
        // Values spilled from a formula outside the range cannot be cleared: the formula fills them again.
        const parent = this.context.book.spillParent(t.sheet, row, col);
        if (parent !== undefined && !inBlock(parent)) continue;
        this.context.book.dropSpill(t.sheet, a1(row, col));
        t.sheet.cells.delete(a1(row, col));
      }
    });
  }

  /** The address now, for chart records (not a property of the API). */
  where(): string {
    const t = this.target();
    return t ? qualify(t.sheet.name, blockText(t.block)) : "(null)";
  }
}

/** workbook.worksheets: getItem, getActiveWorksheet, and load("items/name") then items. */
class SheetsProxy {
  private listed: SheetProxy[] | undefined;
  constructor(private readonly context: FakeContext) {}
  getItem(name: string): SheetProxy {
    return new SheetProxy(this.context, () => this.context.book.find(name));
  }
  getActiveWorksheet(): SheetProxy {
    return new SheetProxy(this.context, () => this.context.book.find(this.context.book.selection.sheet));
  }
  load(spec: string): this {
    if (spec !== "items/name") throw new FakeExcelError("InvalidArgument", `the fake loads only items/name, not ${spec}`);
    this.context.enqueue(() => {
      this.listed = [...this.context.book.sheets.values()].map((sheet) => new SheetProxy(this.context, () => sheet).primed({ name: sheet.name }));
    });
    return this;
  }
  get items(): SheetProxy[] {
    if (!this.listed) throw new Error("PropertyNotLoaded: items was read before load and sync");
    return this.listed;
  }
}

class SheetProxy extends FakeProxy<FakeSheet> {
  protected override props(sheet: FakeSheet): Record<string, unknown> {
    return { name: sheet.name };
  }

  /** Marks properties as loaded (what a collection's load of items/... does for its items). */
  primed(values: Record<string, unknown>): this {
    for (const [k, v] of Object.entries(values)) this.loaded.set(k, v);
    return this;
  }

  get name(): string {
    return this.read("name") as string;
  }

  /** The block from the first to the last cell holding a value or formula, or a null object. */
  getUsedRangeOrNullObject(_valuesOnly?: boolean): RangeProxy {
    return new RangeProxy(this.context, () => {
      const sheet = this.target();
      if (!sheet || sheet.cells.size === 0) return null;
      const at = [...sheet.cells.keys()].map((k) => parseBlock(k).from);
      const from = { row: Math.min(...at.map((c) => c.row)), col: Math.min(...at.map((c) => c.col)) };
      const to = { row: Math.max(...at.map((c) => c.row)), col: Math.max(...at.map((c) => c.col)) };
      return { sheet, block: { from, to } };
    });
  }

  getRange(address: string): RangeProxy {
    return new RangeProxy(this.context, () => {
      const sheet = this.target();
      if (!sheet) return null;
      try {
        return { sheet, block: parseBlock(address) };
      } catch {
        throw new FakeExcelError("InvalidArgument", `The argument is invalid or missing or has an incorrect format. (${address})`);
      }
    });
  }

  get names(): NamesProxy {
    return new NamesProxy(this.context, () => this.target());
  }

  get charts(): { add(type: string, source: RangeProxy, seriesBy: string): unknown } {
    const context = this.context;
    return {
      add: (type: string, source: RangeProxy, seriesBy: string) => {
        const record: ChartRecord = { sheet: "", type, source: "", seriesBy, title: "", series: [{ name: "" }], xTitle: "", yTitle: "", legend: true };
        const series = (item: ChartRecord["series"][number]) => ({
          set name(text: string) {
            item.name = text;
          },
          setXAxisValues(range: RangeProxy) {
            item.x = range.where();
          },
          setValues(range: RangeProxy) {
            item.y = range.where();
          },
        });
        context.enqueue(() => {
          const sheet = this.target();
          if (!sheet) throw new FakeExcelError("ItemNotFound", "no sheet");
          context.book.checkWrite(sheet, { from: { row: 0, col: 0 }, to: { row: 1048575, col: 16383 } });
          record.sheet = sheet.name;
          record.source = source.where();
          record.series[0].y = record.source;
          context.book.charts.push(record);
        });
        return {
          title: {
            set text(t: string) {
              record.title = t;
            },
          },
          series: {
            getItemAt: (i: number) => series(record.series[i]),
            add: (name: string) => {
              const item = { name };
              record.series.push(item);
              return series(item);
            },
          },
          axes: {
            categoryAxis: { title: { set text(t: string) { record.xTitle = t; } } },
            valueAxis: { title: { set text(t: string) { record.yTitle = t; } } },
          },
          legend: { set visible(v: boolean) { record.legend = v; } },
          setPosition: (from: string, to: string) => {
            record.position = [from, to];
          },
        };
      },
    };
  }
}

/** A names collection: the workbook's (scope undefined) or a sheet's. */
class NamesProxy extends FakeProxy<Map<string, string>> {
  constructor(
    context: FakeContext,
    private readonly scope: (() => FakeSheet | null) | undefined,
  ) {
    super(context, () => (scope ? (scope()?.names ?? null) : context.book.names));
  }

  protected override props(names: Map<string, string>): Record<string, unknown> {
    const sheet = this.scope?.();
    return {
      name: [...names.keys()],
      type: [...names.keys()].map(() => "Range"),
      // As the host reports a defined name's formula: "=Beam!$A$10:$F$12".
      value: [...names.values()].map((address) => {
        const { sheet: on, address: cells } = splitAddress(sheet ? qualify(sheet.name, address) : address);
        return `=${qualify(on ?? "", cells.replace(/([A-Z]+)(\d+)/g, "$$$1$$$2"))}`;
      }),
    };
  }

  get items(): { name: string; type: string; value: string }[] {
    const names = this.read("name") as string[];
    const types = this.read("type") as string[];
    const values = this.read("value") as string[];
    return names.map((name, i) => ({ name, type: types[i], value: values[i] }));
  }

  getItemOrNullObject(name: string): { getRangeOrNullObject(): RangeProxy } {
    const book = this.context.book;
    const resolve = (): RangeTarget | null => {
      const sheet = this.scope?.();
      if (this.scope && !sheet) throw new FakeExcelError("ItemNotFound", "no sheet");
      const address = (sheet ? sheet.names : book.names).get(name.toUpperCase());
      if (address === undefined) return null;
      const { sheet: on, address: cells } = splitAddress(address);
      return { sheet: on === undefined ? sheet! : book.find(on), block: parseBlock(cells) };
    };
    return { getRangeOrNullObject: () => new RangeProxy(this.context, resolve) };
  }
}
