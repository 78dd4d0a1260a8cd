/**
 * The Office adapter against office-addin-mock: selection to member, writes never over
 * anything without asking, charts requested with the right ranges. Collections (worksheets,
 * names, charts) are plain functions in the mock data, as the adapter only calls methods on them.
 */
import { OfficeMockObject } from "office-addin-mock";
import { extremes } from "../../src/core";
import { sheetExtremes } from "../../src/sheet";
import { findMember, solveMember } from "../../src/pane/memberFromSheet";
import { OfficeHost, type ExcelRun, type OfficeLike } from "../../src/pane/officeHost";
import { chartRequests, planTable, writeTable } from "../../src/pane/writeBack";

const LOADS = [
  ["udl", 5.8, "", "", "", "D"],
  ["udl", 8.1, "", "", "", "L"],
  ["point", 12, 2.5, "", "", "L"],
];

interface Calls {
  written: { address: string; formulas: unknown }[];
  cleared: string[];
  charts: { type: string; source: string; seriesBy: string; x?: string; position?: [string, string]; title?: string }[];
}

function officeMock(targetFormulas: string[][]) {
  const calls: Calls = { written: [], cleared: [], charts: [] };
  // The mock built from `data` below; collection methods hand out its objects, not the raw data.
  let mock: any = undefined;
  const range = (address: string, values: unknown[][], formulas = values) => ({
    address,
    values,
    formulas,
    where() {
      return address;
    },
    clear(applyTo: string) {
      calls.cleared.push(`${address} ${applyTo}`);
    },
  });
  const sheetRanges: Record<string, ReturnType<typeof range>> = {
    "B3:C3": range("Beam!B3:C3", [[5.5, 5.5]]),
    "A10:F12": range("Beam!A10:F12", LOADS),
    "B4:D4": range("Beam!B4:D4", [["pin", "pin", "pin"]]),
    B5: range("Beam!B5", [[18500]]),
    B6: range("Beam!B6", [["1.2D+1.6L"]]),
    A3: range("Beam!A3", [["Spans (m)"]]),
    A5: range("Beam!A5", [["EI (kN·m²)"]]),
    "B1:B2": range("Beam!B1:B2", [[""], [""]]),
    "B1:B4": range("Beam!B1:B4", [[""], [""], [5.5], ["pin"]]),
    "A1:A9": range("Beam!A1:A9", Array.from({ length: 9 }, () => [""])),
    "N3:R107": range("Beam!N3:R107", targetFormulas),
    "N3:R4": range("Beam!N3:R4", [[""]]),
  };
  for (const column of ["N", "O", "P", "R"]) sheetRanges[`${column}4:${column}107`] = range(`Beam!${column}4:${column}107`, [[0]]);
  const data = {
    context: {
      workbook: {
        selected: {
          address: "Beam!H3:H4",
          cell: { address: "Beam!H3", formulas: [["=SPAN.EXTREMES(B3:C3,loadTable,B4:D4,B5,B6)"]], values: [["shear"]] },
          getCell() {
            return this.cell;
          },
        },
        getSelectedRange() {
          return this.selected;
        },
        beam: {
          ranges: sheetRanges,
          localName: { range: { address: "", isNullObject: true }, getRangeOrNullObject() { return this.range; } },
          names: { getItemOrNullObject() { return mock.context.workbook.beam.localName; } },
          chart: {
            title: { text: "" },
            series: { first: { name: "", setXAxisValues(r: { where(): string }) { calls.charts[calls.charts.length - 1].x = r.where(); } }, getItemAt() { return this.first; }, add() { throw new Error("one series per chart"); } },
            axes: { categoryAxis: { title: { text: "" } }, valueAxis: { title: { text: "" } } },
            legend: { visible: true },
            setPosition(from: string, to: string) { calls.charts[calls.charts.length - 1].position = [from, to]; },
          },
          charts: {
            add(type: string, source: { where(): string }, seriesBy: string) {
              calls.charts.push({ type, source: source.where(), seriesBy });
              return mock.context.workbook.beam.chart;
            },
          },
          getRange(address: string) {
            const found = (this as any).ranges[address];
            if (!found) throw new Error(`the test has no range ${address}`);
            return found;
          },
        },
        worksheets: {
          getItem(name: string) {
            if (name !== "Beam") throw new Error(`no sheet ${name}`);
            return mock.context.workbook.beam;
          },
        },
        globalName: { range: { address: "Beam!A10:F12", isNullObject: false }, getRangeOrNullObject() { return this.range; } },
        names: { getItemOrNullObject() { return mock.context.workbook.globalName; } },
      },
    },
    run: async function (batch: (context: unknown) => Promise<unknown>) {
      return batch(this.context);
    },
  };
  mock = new OfficeMockObject(data) as any;
  // isNullObject is readable after sync without a load in Office; set it past the mock's load tracking.
  mock.context.workbook.beam.localName.range.isNullObject = true;
  mock.context.workbook.globalName.range.isNullObject = false;
  const handlers: (() => void)[] = [];
  const office: OfficeLike = {
    context: { document: { addHandlerAsync: (_t, h) => void handlers.push(h), removeHandlerAsync: () => handlers.pop() }, officeTheme: { bodyBackgroundColor: "#262626" } },
    EventType: { DocumentSelectionChanged: "documentSelectionChanged" },
  };
  const run: ExcelRun = (batch) => mock.run(batch);
  return { host: new OfficeHost(run, office), mock, calls, handlers, ranges: mock.context.workbook.beam.ranges };
}

describe("OfficeHost", () => {
  it("turns the selected formula cell into its member, solved like the sheet function", async () => {
    const { host } = officeMock([[""]]);
    const selection = await host.getSelection();
    expect(selection).toEqual({ sheet: "Beam", cell: "H3", formula: "=SPAN.EXTREMES(B3:C3,loadTable,B4:D4,B5,B6)", value: "shear", range: "H3:H4" });
    const lookup = await findMember(host, selection);
    if (!lookup.ok) throw new Error(lookup.message);
    expect(lookup.member.ranges.loads).toBe("Beam!A10:F12");
    // No units argument: no units (labels beside the inputs are never read as units).
    expect(lookup.member.units).toEqual({ length: "", force: "", deflection: "", deflectionFactor: 1 });
    const solved = solveMember(lookup.member);
    if ("error" in solved) throw new Error(solved.error);
    const moment = extremes(solved.solution, "moment");
    expect(sheetExtremes([[5.5, 5.5]], LOADS, [["pin", "pin", "pin"]], [[18500]], "1.2D+1.6L")[1]).toEqual(["moment", moment.max, moment.xMax, moment.min, moment.xMin]);
  });

  it("follows selection changes through the document handler and reads the host's theme", () => {
    const { host, handlers } = officeMock([[""]]);
    let calls = 0;
    const stop = host.onSelectionChange(() => calls++);
    handlers.forEach((h) => h());
    expect(calls).toBe(1);
    stop();
    expect(handlers).toHaveLength(0);
    expect(host.theme()).toBe("dark");
  });

  async function plan(host: OfficeHost) {
    const lookup = await findMember(host, await host.getSelection());
    if (!lookup.ok) throw new Error(lookup.message);
    return planTable(lookup.member, "Beam!H3:L6", 104, 101, undefined);
  }

  it("writes the table into empty cells without asking", async () => {
    const { host, calls, ranges } = officeMock(Array.from({ length: 105 }, () => ["", "", "", "", ""]));
    const p = await plan(host);
    const asked: string[] = [];
    const outcome = await writeTable(host, p, async (q) => (asked.push(q), true));
    expect(outcome).toEqual({ written: true, address: "Beam!N3:R107" });
    expect(asked).toEqual([]);
    expect(calls.cleared).toEqual([]);
    expect(ranges["N3:R4"].formulas).toEqual([["x", "V", "M", "slope (rad)", "deflection"], ["=SPAN.DIAGRAM(B3:C3,loadTable,101,B4:D4,B5,B6)", null, null, null, null]]);
  });

  it("never writes over a cell holding anything unless the user agrees", async () => {
    const target = Array.from({ length: 105 }, () => ["", "", "", "", ""]);
    target[40][2] = "=A1*2";
    const refused = officeMock(target);
    const p = await plan(refused.host);
    const questions: string[] = [];
    expect(await writeTable(refused.host, p, async (q) => (questions.push(q), false))).toEqual({ written: false, reason: "nothing written: Beam!N3:R107 holds something" });
    expect(questions).toEqual(["Beam!N3:R107 already holds something. Write the diagram table over it?"]);
    // never assigned: the mock still reports the property as not loaded
    expect(Array.isArray(refused.ranges["N3:R4"].formulas)).toBe(false);
    const agreed = officeMock(target);
    expect(await writeTable(agreed.host, await plan(agreed.host), async () => true)).toEqual({ written: true, address: "Beam!N3:R107" });
    expect(agreed.calls.cleared).toEqual(["Beam!N3:R107 Contents"]);
  });

  it.each([
    ["a zero in the first cell", 0, 0, 0],
    ["a formula in the last cell", 104, 4, "=B3"],
    ["text in the middle", 52, 2, "note"],
    ["a FALSE", 10, 1, false],
    ["a single space", 70, 3, " "],
  ] as const)("%s counts as occupied: the user is asked, and refusing writes and clears nothing", async (_name, row, col, content) => {
    const target: unknown[][] = Array.from({ length: 105 }, () => ["", "", "", "", ""]);
    target[row][col] = content;
    const { host, calls, ranges } = officeMock(target as string[][]);
    const questions: string[] = [];
    const outcome = await writeTable(host, await plan(host), async (q) => (questions.push(q), false));
    expect(outcome.written).toBe(false);
    expect(questions).toHaveLength(1);
    expect(calls.cleared).toEqual([]);
    expect(calls.written).toEqual([]);
    expect(Array.isArray(ranges["N3:R4"].formulas)).toBe(false);
  });

  it("asks for scatter-line charts over the table's columns, beside it", async () => {
    const { host, calls, mock } = officeMock([[""]]);
    const p = await plan(host);
    for (const request of chartRequests(p, true, { length: "m", force: "kN" })) await host.addChart(request);
    expect(calls.charts).toEqual([
      { type: "XYScatterLinesNoMarkers", source: "Beam!O4:O107", seriesBy: "Columns", x: "Beam!N4:N107", position: ["T3", "AA17"] },
      { type: "XYScatterLinesNoMarkers", source: "Beam!P4:P107", seriesBy: "Columns", x: "Beam!N4:N107", position: ["T19", "AA33"] },
      { type: "XYScatterLinesNoMarkers", source: "Beam!R4:R107", seriesBy: "Columns", x: "Beam!N4:N107", position: ["T35", "AA49"] },
    ]);
    expect(mock.context.workbook.beam.chart.axes.valueAxis.title.text).toBe("deflection (m)");
    expect(mock.context.workbook.beam.chart.title.text).toBe("Deflection");
  });
});
