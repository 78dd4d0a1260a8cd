/** An in-memory SheetHost for tests: sheets of cells, names, spills, charts and writes recorded. */
import { blockText, parseBlock } from "../../../src/pane/addresses";
import { splitAddress, type CellInput, type CellValue, type ChartRequest, type Selection, type SheetHost } from "../../../src/pane/host";

type Grid = Map<string, { value: CellValue; formula?: string }>;

export class FakeHost implements SheetHost {
  readonly kind = "fake";
  readonly sheets = new Map<string, Grid>();
  readonly names = new Map<string, string>();
  readonly spills = new Map<string, string>();
  /** Cells ("Sheet1!C5") holding a value spilled from the formula cell given ("Sheet1!B5"). */
  readonly spilledFrom = new Map<string, string>();
  readonly writes: { address: string; block: CellInput[][] }[] = [];
  readonly charts: ChartRequest[] = [];
  selection: Selection = { sheet: "Sheet1", cell: "A1", formula: undefined, value: null, range: "A1" };
  private listeners = new Set<() => void>();

  /** Puts rows of values with their top-left at `address` ("Sheet!B3"). */
  put(address: string, rows: CellValue[][]): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    const grid = this.grid(sheet);
    const from = parseBlock(at).from;
    rows.forEach((row, r) => row.forEach((value, c) => grid.set(blockText({ from: { row: from.row + r, col: from.col + c }, to: { row: from.row + r, col: from.col + c } }), { value })));
    return this;
  }

  putFormula(address: string, formula: string, value: CellValue = 0): this {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    this.grid(sheet).set(at, { value, formula });
    return this;
  }

  select(address: string): void {
    const { sheet = "Sheet1", address: at } = splitAddress(address);
    const cell = this.grid(sheet).get(at);
    this.selection = { sheet, cell: at, formula: cell?.formula, value: cell?.value ?? null, range: at };
    for (const listener of this.listeners) listener();
  }

  private grid(sheet: string): Grid {
    let grid = this.sheets.get(sheet);
    if (!grid) this.sheets.set(sheet, (grid = new Map()));
    return grid;
  }

  private cells(address: string): { value: CellValue; formula?: string }[][] {
    const { sheet = this.selection.sheet, address: range } = splitAddress(address);
    if (!this.sheets.has(sheet)) throw new Error(`no sheet named ${sheet}`);
    const block = parseBlock(range);
    const grid = this.grid(sheet);
    const out: { value: CellValue; formula?: string }[][] = [];
    for (let r = block.from.row; r <= block.to.row; r++) {
      const row: { value: CellValue; formula?: string }[] = [];
      for (let c = block.from.col; c <= block.to.col; c++) row.push(grid.get(blockText({ from: { row: r, col: c }, to: { row: r, col: c } })) ?? { value: null });
      out.push(row);
    }
    return out;
  }

  async getSelection(): Promise<Selection> {
    return { ...this.selection };
  }
  async getValues(address: string): Promise<CellValue[][]> {
    return this.cells(address).map((row) => row.map((cell) => cell.value));
  }
  async resolveName(name: string): Promise<string | undefined> {
    return this.names.get(name);
  }
  async spillRange(address: string): Promise<string | undefined> {
    return this.spills.get(address);
  }
  async spillsInto(address: string): Promise<string[]> {
    const { sheet = this.selection.sheet, address: range } = splitAddress(address);
    const block = parseBlock(range);
    const inside = (cell: string): boolean => {
      const at = parseBlock(splitAddress(cell).address).from;
      return at.row >= block.from.row && at.row <= block.to.row && at.col >= block.from.col && at.col <= block.to.col;
    };
    const out = new Set<string>();
    for (const [cell, anchor] of this.spilledFrom) {
      const where = splitAddress(cell);
      if ((where.sheet ?? "Sheet1") === sheet && inside(cell) && !inside(anchor)) out.add(anchor);
    }
    return [...out];
  }
  async isEmpty(address: string): Promise<boolean> {
    return this.cells(address).every((row) => row.every((cell) => (cell.value === null || cell.value === "") && cell.formula === undefined));
  }
  async writeBlock(address: string, block: CellInput[][]): Promise<void> {
    this.writes.push({ address, block });
    const { sheet = this.selection.sheet, address: range } = splitAddress(address);
    const from = parseBlock(range).from;
    const grid = this.grid(sheet);
    block.forEach((row, r) =>
      row.forEach((input, c) => {
        const at = blockText({ from: { row: from.row + r, col: from.col + c }, to: { row: from.row + r, col: from.col + c } });
        grid.set(at, typeof input === "string" && input.startsWith("=") ? { value: 0, formula: input } : { value: input });
      }),
    );
  }
  readonly cleared: string[] = [];
  async clear(address: string): Promise<void> {
    this.cleared.push(address);
    const { sheet = this.selection.sheet, address: range } = splitAddress(address);
    const block = parseBlock(range);
    const grid = this.grid(sheet);
    for (let r = block.from.row; r <= block.to.row; r++) for (let c = block.from.col; c <= block.to.col; c++) grid.delete(blockText({ from: { row: r, col: c }, to: { row: r, col: c } }));
  }
  async addChart(request: ChartRequest): Promise<void> {
    this.charts.push(request);
  }
  onSelectionChange(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }
  theme(): "light" | "dark" | undefined {
    return undefined;
  }
}
