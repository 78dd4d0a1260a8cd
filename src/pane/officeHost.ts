/**
 * The pane's host in the spreadsheet, over Office.js — the only file that uses `Office` or
 * `Excel`. Both are passed in (the globals by default) so tests can hand in mocks.
 */
import { isDarkColour } from "./draw/palette";
import { splitAddress, type CellInput, type CellValue, type ChartRequest, type Selection, type SheetHost } from "./host";

export type ExcelRun = <T>(batch: (context: Excel.RequestContext) => Promise<T>) => Promise<T>;

export interface OfficeLike {
  context: {
    document: {
      addHandlerAsync(type: unknown, handler: () => void, callback?: (result: unknown) => void): void;
      removeHandlerAsync(type: unknown, options: unknown, callback?: (result: unknown) => void): void;
    };
    officeTheme?: { bodyBackgroundColor?: string };
  };
  EventType: { DocumentSelectionChanged: unknown };
}

function cellValue(value: unknown): CellValue {
  if (value === undefined || value === null) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

export class OfficeHost implements SheetHost {
  readonly kind = "office";
  constructor(
    private readonly run: ExcelRun = (batch) => Excel.run(batch),
    private readonly office: OfficeLike = Office as unknown as OfficeLike,
  ) {}

  private range(context: Excel.RequestContext, address: string): Excel.Range {
    const { sheet, address: cells } = splitAddress(address);
    const worksheet = sheet === undefined ? context.workbook.worksheets.getActiveWorksheet() : context.workbook.worksheets.getItem(sheet);
    return worksheet.getRange(cells);
  }

  getSelection(): Promise<Selection> {
    return this.run(async (context) => {
      const selected = context.workbook.getSelectedRange();
      selected.load("address");
      const cell = selected.getCell(0, 0);
      cell.load("address, formulas, values");
      await context.sync();
      const whole = splitAddress(selected.address);
      const active = splitAddress(cell.address);
      const formula = cell.formulas?.[0]?.[0];
      return {
        sheet: active.sheet ?? whole.sheet ?? "",
        cell: active.address,
        formula: typeof formula === "string" && formula.startsWith("=") ? formula : undefined,
        value: cellValue(cell.values?.[0]?.[0]),
        range: whole.address,
      };
    });
  }

  getValues(address: string): Promise<CellValue[][]> {
    return this.run(async (context) => {
      const range = this.range(context, address);
      range.load("values");
      await context.sync();
      return range.values.map((row) => row.map(cellValue));
    });
  }

  resolveName(name: string, scope: string): Promise<string | undefined> {
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

  spillRange(address: string): Promise<string | undefined> {
    return this.run(async (context) => {
      const spill = this.range(context, address).getSpillingToRangeOrNullObject();
      spill.load("address");
      await context.sync();
      return spill.isNullObject ? undefined : spill.address;
    });
  }

  isEmpty(address: string): Promise<boolean> {
    return this.run(async (context) => {
      const range = this.range(context, address);
      range.load("formulas");
      await context.sync();
      return range.formulas.every((row) => row.every((cell) => cell === "" || cell === null || cell === undefined));
    });
  }

  writeBlock(address: string, block: CellInput[][]): Promise<void> {
    return this.run(async (context) => {
      // Office leaves a cell unchanged where the formulas array holds null.
      this.range(context, address).formulas = block as unknown as string[][];
      await context.sync();
    });
  }

  clear(address: string): Promise<void> {
    return this.run(async (context) => {
      this.range(context, address).clear("Contents");
      await context.sync();
    });
  }

  addChart(request: ChartRequest): Promise<void> {
    return this.run(async (context) => {
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
  }

  onSelectionChange(listener: () => void): () => void {
    const type = this.office.EventType.DocumentSelectionChanged;
    this.office.context.document.addHandlerAsync(type, listener);
    return () => this.office.context.document.removeHandlerAsync(type, { handler: listener });
  }

  theme(): "light" | "dark" | undefined {
    const background = this.office.context.officeTheme?.bodyBackgroundColor;
    if (!background) return undefined;
    return isDarkColour(background) ? "dark" : "light";
  }
}
