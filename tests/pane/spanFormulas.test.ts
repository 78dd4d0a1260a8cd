/**
 * SheetHost.spanFormulas, where the member report looks for the member's checks: in Excel from
 * each sheet's used range (fake Excel with the real batching rules: load before read, values at
 * sync), in three round trips whatever the number of sheets, a sheet above FORMULA_SCAN_CELLS
 * skipped rather than read in part; on the workbench from its values and formulas.
 * Batching: https://learn.microsoft.com/office/dev/add-ins/excel/performance ("Batch loads and writes").
 */
import type { OfficeLike } from "../../src/pane/officeHost";
import { FORMULA_SCAN_CELLS, OfficeHost } from "../../src/pane/officeHost";
import { WorkbenchHost, type WorkbenchLike } from "../../src/pane/workbenchHost";
import { FakeWorkbook } from "./support/fakeExcel";

const office = { context: { document: { addHandlerAsync: () => undefined, removeHandlerAsync: () => undefined } }, EventType: { DocumentSelectionChanged: "x" } } as unknown as OfficeLike;

describe("SPAN formula cells of the workbook", () => {
  it("Excel: every sheet's SPAN formulas, row by row, in three syncs; other formulas and values left out", async () => {
    const book = new FakeWorkbook()
      .put("Beam!A1", [["Spans", 5, 5]])
      .putFormula("Beam!B4", "=SPAN.REACTIONS(B1:C1,\"udl 2\")", 5)
      .putFormula("Beam!A6", "=SUM(B1:C1)", 10)
      .putFormula("Checks!E9", "=SPAN.STRESS(B3,B4,A9:C24)", 1)
      .putFormula("Checks!C2", "=_xldudf_SPAN_MOMENT(B3,B4,1)", 1);
    const host = new OfficeHost(book.run, office, () => true);
    const before = book.syncs;
    const found = await host.spanFormulas(100);
    expect(book.syncs - before).toBe(3);
    expect(found).toEqual([
      { sheet: "Beam", cell: "B4", formula: "=SPAN.REACTIONS(B1:C1,\"udl 2\")" },
      { sheet: "Checks", cell: "C2", formula: "=_xldudf_SPAN_MOMENT(B3,B4,1)" },
      { sheet: "Checks", cell: "E9", formula: "=SPAN.STRESS(B3,B4,A9:C24)" },
    ]);
    expect(await host.spanFormulas(2)).toHaveLength(2);
  });

  it("Excel: a sheet whose used range exceeds the scan limit is skipped whole; an empty sheet is no error", async () => {
    const rows = Math.ceil(FORMULA_SCAN_CELLS / 26) + 10;
    const book = new FakeWorkbook()
      .putFormula("Big!A1", "=SPAN.MOMENT(B3,B4,1)", 1)
      .put(`Big!Z${rows}`, [[1]])
      .putFormula("Small!B2", "=SPAN.SHEAR(B3,B4,1)", 1);
    book.sheet("Empty");
    const found = await new OfficeHost(book.run, office, () => true).spanFormulas(100);
    expect(found).toEqual([{ sheet: "Small", cell: "B2", formula: "=SPAN.SHEAR(B3,B4,1)" }]);
  });

  it("workbench: from each sheet's values, asking the formula of value cells only", async () => {
    const cells: Record<string, { value: unknown; formula?: string }> = {
      "Member!A17": { value: 0, formula: "=SPAN.REACTIONS(B3:C3,A10:F14)" },
      "Member!B17": { value: 3 },
      "Member!A5": { value: "EI" },
      "Checks!F21": { value: 0.4, formula: "=SPAN.UTILISATION(F19:F20,H19)" },
    };
    const asked: string[] = [];
    const api = {
      sheets: () => ["Member", "Checks"],
      getSelection: () => ({ sheet: "Member", address: "A1", activeCell: "A1", formula: undefined }),
      getValues: (range: string) => {
        const [sheet] = range.split("!");
        return Array.from({ length: 1000 }, (_, r) => Array.from({ length: 52 }, (_, c) => {
          const key = `${sheet}!${String.fromCharCode(65 + c)}${r + 1}`;
          return c < 26 && cells[key] ? cells[key].value : null;
        }));
      },
      getFormula: (address: string) => {
        asked.push(address);
        return cells[address]?.formula;
      },
    } as unknown as WorkbenchLike;
    const found = await new WorkbenchHost(api).spanFormulas(100);
    expect(found).toEqual([
      { sheet: "Member", cell: "A17", formula: "=SPAN.REACTIONS(B3:C3,A10:F14)" },
      { sheet: "Checks", cell: "F21", formula: "=SPAN.UTILISATION(F19:F20,H19)" },
    ]);
    expect(asked.sort()).toEqual(["Checks!F21", "Member!A17", "Member!A5", "Member!B17"]);
  });
});
