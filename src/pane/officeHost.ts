/**
 * The pane's host in the spreadsheet, over Office.js — the only file that uses `Office` or
 * `Excel`. Both are passed in (the globals by default) so tests can hand in fakes.
 *
 * Round trips: every `context.sync()` is one round trip to the host, slow above all on the
 * web, and the documentation asks for loads to be batched before one sync
 * (https://learn.microsoft.com/office/dev/add-ins/excel/performance, "Batch loads and writes";
 * https://learn.microsoft.com/office/dev/add-ins/develop/application-specific-api-model).
 * So `getSelection` reads the selection and its formula (sync 1), then, when the formula holds
 * a SPAN call, everything the member lookup will ask for — every range the formula names,
 * spills, named ranges and their label cells — in one more batch (sync 2). The lookup that
 * follows is answered from that read. The read is kept only until the current task ends (the
 * lookup runs in microtasks right after `getSelection`), and is dropped on any write or
 * selection change, so it never answers later questions with old cells; anything not in it is
 * read live.
 *
 * Failures: a write or chart the host refuses (protected sheet, part of an array, merged
 * cells, cell edit mode) rejects with a SheetHostError whose message says what to do, by the
 * documented error codes (https://learn.microsoft.com/office/dev/add-ins/testing/application-specific-api-error-handling).
 * Optional requirement sets (requirements.ts) are checked before the API that needs them.
 */
import { cellText, parseBlock } from "./addresses";
import { isDarkColour } from "./draw/palette";
import { SheetHostError, qualify, splitAddress, type CellInput, type CellValue, type ChartRequest, type FormulaCell, type Selection, type SheetHost } from "./host";
import { addressKey, nameKey, planReads, rangeOfNameFormula } from "./readAhead";
import { BASELINE, OPTIONAL, missingSetMessage, officeRequirements, type Feature, type IsSetSupported } from "./requirements";

/** Cells of one sheet's used range read for SPAN formulas, at most (a larger sheet is skipped). */
export const FORMULA_SCAN_CELLS = 200_000;

export type ExcelRun = <T>(batch: (context: Excel.RequestContext) => Promise<T>) => Promise<T>;

/** The parts of `Office` the host uses (typed from office.js so the requirement-set check sees them). */
export interface OfficeLike {
  context: {
    document: Pick<Office.Document, "addHandlerAsync" | "removeHandlerAsync"> & { settings?: Pick<Office.Settings, "get" | "set" | "saveAsync"> };
    officeTheme?: Pick<Office.OfficeTheme, "bodyBackgroundColor">;
    requirements?: Pick<Office.RequirementSetSupport, "isSetSupported">;
  };
  EventType: { DocumentSelectionChanged: Office.EventType };
}

function cellValue(value: unknown): CellValue {
  if (value === undefined || value === null) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

/** What the user can do about a host error code, by the codes the error-handling page lists. */
function advice(code: string): string {
  switch (code) {
    case "AccessDenied":
      return "Excel refused the change: the sheet may be protected or the workbook read-only; unprotect it or choose another sheet";
    case "InvalidOperation":
      return "Excel does not allow the change there: the cells may be part of an array or a spilled range, merged, or in a table";
    case "MergedRangeConflict":
      return "the cells overlap merged cells, a table or a PivotTable; unmerge them or make room";
    case "PivotTableRangeConflict":
      return "the cells overlap a PivotTable; make room beside the member";
    case "FilteredRangeConflict":
      return "the cells overlap a filtered range; clear the filter or make room";
    case "InvalidOperationInCellEditMode":
      return "Excel is editing a cell; press Enter or Esc, then try again";
    case "ItemNotFound":
      return "the sheet or range no longer exists";
    case "InvalidArgument":
    case "InvalidReference":
      return "Excel does not accept that range";
    case "ApiNotFound":
    case "NotImplemented":
      return "this Excel does not support the operation";
    case "RangeExceedsLimit":
    case "ResponsePayloadSizeLimitExceeded":
    case "RequestPayloadSizeLimitExceeded":
      return "the range is larger than Excel lets an add-in handle at once";
    default:
      return "Excel could not do it";
  }
}

/** A host failure as the user-facing typed error. */
export function hostFailure(error: unknown, action: string, address?: string): SheetHostError {
  if (error instanceof SheetHostError) return error;
  const code = typeof (error as { code?: unknown })?.code === "string" ? (error as { code: string }).code : "Unknown";
  const said = error instanceof Error || typeof (error as { message?: unknown })?.message === "string" ? String((error as { message: string }).message) : String(error);
  return new SheetHostError(`${action}: ${advice(code)} (${code}${said && said !== code ? `: ${said}` : ""})`, code, address);
}

/** What one selection's batch read: values by address key, spills by anchor key, names by name key. */
interface ReadAhead {
  values: Map<string, CellValue[][]>;
  spills: Map<string, string | undefined>;
  names: Map<string, string | undefined>;
}

export class OfficeHost implements SheetHost {
  readonly kind = "office";
  private readAhead: ReadAhead | undefined;
  private readonly supports: IsSetSupported;

  constructor(
    private readonly run: ExcelRun = (batch) => Excel.run(batch),
    private readonly office: OfficeLike = Office as unknown as OfficeLike,
    supports?: IsSetSupported,
  ) {
    this.supports = supports ?? officeRequirements(office);
  }

  /** True when the host has the feature's requirement set. */
  has(feature: Feature): boolean {
    return this.supports(feature.name, feature.version);
  }

  /** Refuses, with the message the pane shows, a feature whose set the host lacks. */
  private need(feature: Feature): void {
    if (!this.has(feature)) throw new SheetHostError(missingSetMessage(feature), "RequirementNotMet");
  }

  private range(context: Excel.RequestContext, address: string): Excel.Range {
    const { sheet, address: cells } = splitAddress(address);
    const worksheet = sheet === undefined ? context.workbook.worksheets.getActiveWorksheet() : context.workbook.worksheets.getItem(sheet);
    return worksheet.getRange(cells);
  }

  private forget(): void {
    this.readAhead = undefined;
  }

  async getSelection(): Promise<Selection> {
    this.forget();
    const { selection, read } = await this.run(async (context) => {
      this.need(BASELINE);
      const selected = context.workbook.getSelectedRange();
      selected.load("address");
      const cell = selected.getCell(0, 0);
      cell.load("address, formulas, values");
      // Names are listed with the selection so that their label cells can join the second batch.
      const bookNames = context.workbook.names;
      bookNames.load("items/name, items/type, items/value");
      const sheetNames = selected.worksheet.names;
      sheetNames.load("items/name, items/type, items/value");
      await context.sync();
      const whole = splitAddress(selected.address);
      const active = splitAddress(cell.address);
      const formula = cell.formulas?.[0]?.[0];
      const selection: Selection = {
        sheet: active.sheet ?? whole.sheet ?? "",
        cell: active.address,
        formula: typeof formula === "string" && formula.startsWith("=") ? formula : undefined,
        value: cellValue(cell.values?.[0]?.[0]),
        range: whole.address,
      };
      const listed = (collection: Excel.NamedItemCollection, name: string, scope: string): string | undefined => {
        const item = collection.items.find((n) => n.name.toUpperCase() === name.toUpperCase());
        return item && item.type === "Range" ? rangeOfNameFormula(item.value, scope) : undefined;
      };
      const plan = planReads(selection, (name, scope) =>
        scope.toUpperCase() === selection.sheet.toUpperCase() ? (listed(sheetNames, name, scope) ?? listed(bookNames, name, scope)) : listed(bookNames, name, scope),
      );
      if (plan.ranges.length + plan.spills.length + plan.names.length === 0) return { selection, read: undefined };
      return { selection, read: await this.readPlan(context, plan, selection.sheet) };
    });
    if (read) {
      this.readAhead = read;
      // Kept for the lookup that follows in this task only; later questions read live cells.
      setTimeout(() => {
        if (this.readAhead === read) this.forget();
      }, 0);
    }
    return selection;
  }

  /** The second batch: every read of the plan queued, one sync. Undefined when the batch fails (then every read goes live and reports its own error). */
  private async readPlan(context: Excel.RequestContext, plan: ReturnType<typeof planReads>, sheet: string): Promise<ReadAhead | undefined> {
    const ranges = plan.ranges.map((address) => {
      const range = this.range(context, address);
      range.load("values");
      return { address, range };
    });
    const spills = this.has(OPTIONAL.spill)
      ? plan.spills.map((anchor) => {
          const spill = this.range(context, anchor).getSpillingToRangeOrNullObject();
          spill.load("address, values");
          return { anchor, spill };
        })
      : [];
    const names = plan.names.map(({ name, scope }) => {
      const local = context.workbook.worksheets.getItem(scope).names.getItemOrNullObject(name).getRangeOrNullObject();
      const global = context.workbook.names.getItemOrNullObject(name).getRangeOrNullObject();
      local.load("address, values");
      global.load("address, values");
      return { name, scope, local, global };
    });
    try {
      await context.sync();
    } catch {
      return undefined;
    }
    const read: ReadAhead = { values: new Map(), spills: new Map(), names: new Map() };
    const rows = (values: unknown[][]): CellValue[][] => values.map((row) => row.map(cellValue));
    for (const { address, range } of ranges) read.values.set(addressKey(address, sheet), rows(range.values));
    for (const { anchor, spill } of spills) {
      read.spills.set(addressKey(anchor, sheet), spill.isNullObject ? undefined : spill.address);
      if (!spill.isNullObject) read.values.set(addressKey(spill.address, sheet), rows(spill.values));
    }
    for (const { name, scope, local, global } of names) {
      const found = !local.isNullObject ? local : !global.isNullObject ? global : undefined;
      read.names.set(nameKey(name, scope), found?.address);
      if (found) read.values.set(addressKey(found.address, sheet), rows(found.values));
    }
    return read;
  }

  async getValues(address: string): Promise<CellValue[][]> {
    const known = this.readAhead?.values.get(addressKey(address, ""));
    if (known) return known.map((row) => [...row]);
    return this.run(async (context) => {
      const range = this.range(context, address);
      range.load("values");
      await context.sync();
      return range.values.map((row) => row.map(cellValue));
    });
  }

  async resolveName(name: string, scope: string): Promise<string | undefined> {
    const key = nameKey(name, scope);
    if (this.readAhead?.names.has(key)) return this.readAhead.names.get(key);
    return this.run(async (context) => {
      const local = context.workbook.worksheets.getItem(scope).names.getItemOrNullObject(name);
      const global = context.workbook.names.getItemOrNullObject(name);
      const localRange = local.getRangeOrNullObject();
      const globalRange = global.getRangeOrNullObject();
      localRange.load("address");
      globalRange.load("address");
      await context.sync();
      if (!localRange.isNullObject) return localRange.address;
      if (!globalRange.isNullObject) return globalRange.address;
      return undefined;
    });
  }

  async spillRange(address: string): Promise<string | undefined> {
    const key = addressKey(address, "");
    if (this.readAhead?.spills.has(key)) return this.readAhead.spills.get(key);
    this.need(OPTIONAL.spill);
    return this.run(async (context) => {
      const spill = this.range(context, address).getSpillingToRangeOrNullObject();
      spill.load("address");
      await context.sync();
      return spill.isNullObject ? undefined : spill.address;
    });
  }

  /**
   * The formulas outside the range whose results spill into it (writeBack.ts refuses such a
   * write before any question or clear: a clear cannot remove spilled values, and a write
   * there breaks the other formula with #SPILL!).
   *
   * One sync. A spill is a rectangle whose top-left cell is its formula's cell (the
   * documentation's example: G4 holding `=A4:D4` spills to "G4:J4"; "Handle dynamic arrays and
   * spilling using the Excel JavaScript API",
   * https://learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-ranges-dynamic-arrays).
   * So a spill from a cell outside the range that covers any cell of it covers the top-left
   * cell of the overlap, which lies in the range's first row or first column; asking those
   * cells alone finds every such formula, also where the spilled values are "" (which a
   * values read cannot tell from an empty cell). `Range.getSpillParentOrNullObject` answers
   * for one cell only (a null object for several; ExcelApi 1.12 in the office-js reference,
   * https://learn.microsoft.com/javascript/api/excel/excel.range#excel-excel-range-getspillparentornullobject-member(1)),
   * so one look-up per edge cell is queued: rows + columns - 1 of them (105 + 5 - 1 for a
   * diagram table), all in the same batch.
   *
   * Without ExcelApi 1.12 the answer is [] and nothing is asked: a host without that set has
   * no dynamic arrays, hence no spills (the read-back after writing stays the safety net).
   */
  async spillsInto(address: string): Promise<string[]> {
    if (!this.has(OPTIONAL.spill)) return [];
    const { sheet, address: cells } = splitAddress(address);
    const block = parseBlock(cells.replace(/\$/g, ""));
    const rows = block.to.row - block.from.row + 1;
    const cols = block.to.col - block.from.col + 1;
    try {
      return await this.run(async (context) => {
        const range = this.range(context, address);
        const edge: [number, number][] = [];
        for (let c = 0; c < cols; c++) edge.push([0, c]);
        for (let r = 1; r < rows; r++) edge.push([r, 0]);
        const parents = edge.map(([r, c]) => {
          const parent = range.getCell(r, c).getSpillParentOrNullObject();
          parent.load("address");
          return parent;
        });
        await context.sync();
        const found = new Set<string>();
        for (const parent of parents) {
          if (parent.isNullObject) continue;
          const at = splitAddress(parent.address);
          const cell = at.address.replace(/\$/g, "");
          const { row, col } = parseBlock(cell).from;
          const inside = row >= block.from.row && row <= block.to.row && col >= block.from.col && col <= block.to.col;
          if (!inside) found.add(qualify(at.sheet ?? sheet ?? "", cell));
        }
        return [...found];
      });
    } catch (error) {
      throw hostFailure(error, `${address} could not be checked for spilled results before writing`, address);
    }
  }

  async isEmpty(address: string): Promise<boolean> {
    try {
      return await this.run(async (context) => {
        const range = this.range(context, address);
        range.load("formulas");
        await context.sync();
        return range.formulas.every((row) => row.every((cell) => cell === "" || cell === null || cell === undefined));
      });
    } catch (error) {
      throw hostFailure(error, `${address} could not be checked before writing`, address);
    }
  }

  async writeBlock(address: string, block: CellInput[][]): Promise<void> {
    this.forget();
    try {
      await this.run(async (context) => {
        // Office leaves a cell unchanged where the formulas array holds null.
        this.range(context, address).formulas = block as unknown as string[][];
        await context.sync();
      });
    } catch (error) {
      throw hostFailure(error, `Nothing written to ${address}`, address);
    }
  }

  async clear(address: string): Promise<void> {
    this.forget();
    try {
      await this.run(async (context) => {
        this.range(context, address).clear("Contents");
        await context.sync();
      });
    } catch (error) {
      throw hostFailure(error, `${address} was not cleared`, address);
    }
  }

  async addChart(request: ChartRequest): Promise<void> {
    this.forget();
    this.need(OPTIONAL.chartSeries);
    try {
      await this.run(async (context) => {
        const sheet = context.workbook.worksheets.getItem(request.sheet);
        const first = request.series[0];
        const chart = sheet.charts.add("XYScatterLinesNoMarkers", sheet.getRange(first.y), "Columns");
        chart.title.text = request.title;
        request.series.forEach((series, index) => {
          const item = index === 0 ? chart.series.getItemAt(0) : chart.series.add(series.name);
          item.name = series.name;
          item.setXAxisValues(sheet.getRange(request.x));
          if (index > 0) item.setValues(sheet.getRange(series.y));
        });
        chart.axes.categoryAxis.title.text = request.xTitle;
        chart.axes.valueAxis.title.text = request.yTitle;
        chart.legend.visible = request.series.length > 1;
        const [from, to] = request.placeAt.split(":");
        chart.setPosition(from, to);
        await context.sync();
      });
    } catch (error) {
      throw hostFailure(error, `The ${request.title.toLowerCase()} chart was not added on ${request.sheet}`, request.placeAt);
    }
  }

  onSelectionChange(listener: () => void): () => void {
    const type = this.office.EventType.DocumentSelectionChanged;
    const handler = (): void => {
      this.forget();
      listener();
    };
    this.office.context.document.addHandlerAsync(type, handler);
    return () => this.office.context.document.removeHandlerAsync(type, { handler });
  }

  /**
   * The SPAN formula cells of the workbook, from each sheet's used range: sync 1 lists the
   * sheets and the size of each used range (value cells only, so formatting alone does not
   * count), sync 2 loads the formulas of those within FORMULA_SCAN_CELLS (a larger sheet is
   * skipped, never read in part: a partial read could miss a check and say nothing).
   */
  async spanFormulas(limit: number): Promise<FormulaCell[]> {
    try {
      return await this.run(async (context) => {
        const sheets = context.workbook.worksheets;
        sheets.load("items/name");
        await context.sync();
        const used = sheets.items.map((sheet) => {
          const range = sheet.getUsedRangeOrNullObject(true);
          range.load("address, rowCount, columnCount");
          return { name: sheet.name, range };
        });
        await context.sync();
        const read = used.filter((u) => !u.range.isNullObject && u.range.rowCount * u.range.columnCount <= FORMULA_SCAN_CELLS);
        for (const u of read) u.range.load("formulas");
        await context.sync();
        const out: FormulaCell[] = [];
        for (const u of read) {
          const from = parseBlock(splitAddress(u.range.address).address).from;
          u.range.formulas.forEach((row, r) =>
            row.forEach((formula, c) => {
              if (out.length < limit && typeof formula === "string" && formula.startsWith("=") && /SPAN/i.test(formula)) out.push({ sheet: u.name, cell: cellText({ row: from.row + r, col: from.col + c }), formula });
            }),
          );
        }
        return out;
      });
    } catch (error) {
      throw hostFailure(error, "The workbook's formulas could not be read");
    }
  }

  /** A document setting of this add-in (Office.Settings.get: the in-memory copy loaded with the document). */
  async readSetting(name: string): Promise<unknown> {
    this.need(OPTIONAL.settings);
    const settings = this.office.context.document.settings;
    if (!settings) throw new SheetHostError(missingSetMessage(OPTIONAL.settings), "RequirementNotMet");
    const value: unknown = settings.get(name);
    return value === null ? undefined : value;
  }

  /**
   * Sets a document setting and saves it into the workbook: `set` changes only the in-memory
   * copy, and "the developer is responsible for calling the saveAsync method"
   * (https://learn.microsoft.com/javascript/api/office/office.settings). A failed save rejects.
   */
  async writeSetting(name: string, value: unknown): Promise<void> {
    this.need(OPTIONAL.settings);
    const settings = this.office.context.document.settings;
    if (!settings) throw new SheetHostError(missingSetMessage(OPTIONAL.settings), "RequirementNotMet");
    settings.set(name, value);
    await new Promise<void>((resolve, reject) => {
      settings.saveAsync((result) => {
        if (String(result.status) === "succeeded") resolve();
        else reject(new SheetHostError(`Excel did not save the setting in the workbook: ${result.error?.message ?? "no reason given"}`, "SaveFailed"));
      });
    });
  }

  theme(): "light" | "dark" | undefined {
    const background = this.office.context.officeTheme?.bodyBackgroundColor;
    if (!background) return undefined;
    return isDarkColour(background) ? "dark" : "light";
  }
}
