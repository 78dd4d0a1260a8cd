/**
 * The Office adapter against a fake Excel with the real API's batching rules (support/fakeExcel.ts):
 * selection to member, round trips per selection change, writes never over anything without
 * asking, failed writes surfaced with the host's error code, charts with the right ranges,
 * optional requirement sets refused with a message.
 * Sources: round trips — https://learn.microsoft.com/office/dev/add-ins/excel/performance
 * ("Batch loads and writes ... then make a single context.sync()") and
 * https://learn.microsoft.com/office/dev/add-ins/develop/application-specific-api-model;
 * error codes — https://learn.microsoft.com/office/dev/add-ins/testing/application-specific-api-error-handling
 * (tables "Error codes and messages" and "Excel-specific error codes and messages").
 */
import { extremes } from "../../src/core";
import { sheetExtremes } from "../../src/sheet";
import { SheetHostError, type CellValue } from "../../src/pane/host";
import { findMember, solveMember, type Lookup } from "../../src/pane/memberFromSheet";
import { OfficeHost, type OfficeLike } from "../../src/pane/officeHost";
import { chartRequests, planTable, writeTable } from "../../src/pane/writeBack";
import { FakeWorkbook } from "./support/fakeExcel";

const LOADS = [
  ["udl", 5.8, "", "", "", "D"],
  ["udl", 8.1, "", "", "", "L"],
  ["point", 12, 2.5, "", "", "L"],
];

function beamBook(formula = "=SPAN.EXTREMES(B3:C3,loadTable,B4:D4,B5,B6)"): FakeWorkbook {
  const book = new FakeWorkbook()
    .put("Beam!A3", [["Spans (m)", 5.5, 5.5]])
    .put("Beam!A4", [["Supports", "pin", "pin", "pin"]])
    .put("Beam!A5", [["EI (kN·m²)", 18500]])
    .put("Beam!A6", [["Combination", "1.2D+1.6L"]])
    .put("Beam!A10", LOADS)
    .put("'Load table'!A1", [["type", "magnitude", "x start", "x end", "magnitude at end", "case"], ...LOADS])
    .putFormula("Beam!H3", formula, "shear")
    .select("Beam!H3", "H3:H4");
  book.names.set("LOADTABLE", "Beam!A10:F12");
  return book;
}

function officeFor(book: FakeWorkbook, supported: (name: string, version: string) => boolean = () => true) {
  const handlers: (() => void)[] = [];
  const office = {
    context: {
      document: { addHandlerAsync: (_t: unknown, h: () => void) => void handlers.push(h), removeHandlerAsync: () => void handlers.pop() },
      officeTheme: { bodyBackgroundColor: "#262626" },
    },
    EventType: { DocumentSelectionChanged: "documentSelectionChanged" },
  } as unknown as OfficeLike;
  return { host: new OfficeHost(book.run, office, supported), handlers };
}

/** One selection change as the pane handles it: the selection, then the member behind it. */
async function selectionChange(host: OfficeHost): Promise<Lookup> {
  return findMember(host, await host.getSelection());
}

const nextTask = () => new Promise((resolve) => setTimeout(resolve, 5));

describe("OfficeHost: selection to member", () => {
  it("turns the selected formula cell into its member, solved like the sheet function", async () => {
    const { host } = officeFor(beamBook());
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
    const { host, handlers } = officeFor(beamBook());
    let calls = 0;
    const stop = host.onSelectionChange(() => calls++);
    handlers.forEach((h) => h());
    expect(calls).toBe(1);
    stop();
    expect(handlers).toHaveLength(0);
    expect(host.theme()).toBe("dark");
  });
});

describe("OfficeHost: at most 2 round trips per selection change", () => {
  const sheetScoped = (book: FakeWorkbook) => book.sheet("Beam").names.set("SPANS", "B3:C3");
  const spilled = (book: FakeWorkbook) => {
    book.putFormula("Beam!J3", "=SEQUENCE(1,2)", 5.5).put("Beam!K3", [[5.5]]);
    book.sheet("Beam").spills.set("J3", "J3:K3");
  };
  it.each([
    ["ranges and a workbook name", "=SPAN.EXTREMES(B3:C3,loadTable,B4:D4,B5,B6)", undefined],
    ["a sheet-scoped name", "=SPAN.MOMENT(spans,loadTable,2,B4:D4,B5,B6)", sheetScoped],
    ["a spilled range", "=SPAN.MOMENT(J3#,'Load table'!A2:F4,2,$B$4:$D$4,Beam!B5)", spilled],
    ["a quoted sheet, literals and an array constant", "=SPAN.DEFLECTION({5.5,5.5},'Load table'!A2:F4,3,B4:D4,18500,\"1.2D+1.6L\")", undefined],
    ["a saved-workbook form", "=_xldudf_SPAN_MAXMOMENT(B3:C3,loadTable,B4:D4,B5,B6)", undefined],
  ])("%s: the same member as reading each range live, in at most 2 syncs", async (_name, formula, setup) => {
    const book = beamBook(formula);
    setup?.(book);
    const { host } = officeFor(book);
    const batched = await selectionChange(host);
    const batchedSyncs = book.syncs;
    if (!batched.ok) throw new Error(batched.message);
    expect(batchedSyncs).toBeLessThanOrEqual(2);
    // The same lookup with the read-ahead gone (next task): every read is a live round trip.
    book.syncs = 0;
    const selection = await host.getSelection();
    await nextTask();
    const live = await findMember(host, selection);
    expect(book.syncs).toBeGreaterThan(2);
    expect(live).toEqual(batched);
  });

  it("a cell without a SPAN formula costs one sync", async () => {
    const book = beamBook();
    book.select("Beam!B5");
    const { host } = officeFor(book);
    const selection = await host.getSelection();
    expect(selection.formula).toBeUndefined();
    expect(book.syncs).toBe(1);
  });

  it("never answers from an old read: a write, a selection change or the next task read live cells", async () => {
    const book = beamBook();
    const { host, handlers } = officeFor(book);
    host.onSelectionChange(() => undefined);
    await host.getSelection();
    await host.writeBlock("Beam!B3:C3", [[6, 6]]);
    expect(await host.getValues("Beam!B3:C3")).toEqual([[6, 6]]);
    await host.getSelection();
    book.put("Beam!B3", [[7, 7]]);
    handlers.forEach((h) => h());
    expect(await host.getValues("Beam!B3:C3")).toEqual([[7, 7]]);
    await host.getSelection();
    book.put("Beam!B3", [[8, 8]]);
    await nextTask();
    expect(await host.getValues("Beam!B3:C3")).toEqual([[8, 8]]);
  });

  it("a formula naming a missing sheet gives the lookup's own message, not an exception", async () => {
    const book = beamBook("=SPAN.MOMENT(Gone!B3:C3,loadTable,2)");
    const { host } = officeFor(book);
    const lookup = await selectionChange(host);
    expect(lookup.ok).toBe(false);
    if (lookup.ok) return;
    expect(lookup.message).toMatch(/Gone/);
  });
});

describe("OfficeHost: optional requirement sets", () => {
  const without = (missing: string) => (name: string, version: string) => `${name} ${version}` !== missing;

  it("without ExcelApi 1.12 a spilled argument is refused with a message naming the set", async () => {
    const book = beamBook("=SPAN.MOMENT(J3#,loadTable,2)");
    book.putFormula("Beam!J3", "=SEQUENCE(1,2)", 5.5);
    book.sheet("Beam").spills.set("J3", "J3:K3");
    const { host } = officeFor(book, without("ExcelApi 1.12"));
    const lookup = await selectionChange(host);
    expect(lookup).toMatchObject({ ok: false, reason: "invalid" });
    if (!lookup.ok) expect(lookup.message).toMatch(/spilled range.*ExcelApi 1\.12/);
    expect(book.syncs).toBeLessThanOrEqual(2);
  });

  it("without ExcelApi 1.7 charts are refused before anything reaches the host", async () => {
    const book = beamBook();
    const { host } = officeFor(book, without("ExcelApi 1.7"));
    const request = { sheet: "Beam", title: "Moment", x: "N4:N107", series: [{ name: "M", y: "P4:P107" }], placeAt: "T3:AA17", xTitle: "x (m)", yTitle: "M (kN·m)" };
    await expect(host.addChart(request)).rejects.toMatchObject({ code: "RequirementNotMet", message: expect.stringMatching(/inserting charts.*ExcelApi 1\.7/) });
    expect(book.syncs).toBe(0);
    expect(book.charts).toEqual([]);
  });

  it("without the baseline ExcelApi 1.4 the selection is refused with a message", async () => {
    const { host } = officeFor(beamBook(), without("ExcelApi 1.4"));
    await expect(host.getSelection()).rejects.toMatchObject({ code: "RequirementNotMet", message: expect.stringMatching(/ExcelApi 1\.4/) });
  });
});

describe("OfficeHost: writes the host refuses are surfaced", () => {
  // Codes from the error-handling page's tables; which one a real host raises for each
  // situation is listed in DEVELOPERS.md under "Needs a real host to confirm".
  it.each([
    ["a protected sheet", "AccessDenied", "You cannot perform the requested operation.", /protected/],
    ["part of an array", "InvalidOperation", "The operation attempted is invalid on the object.", /part of an array/],
    ["merged cells", "MergedRangeConflict", "Cannot complete the operation.", /merged cells/],
    ["a PivotTable", "PivotTableRangeConflict", "The attempted operation causes a conflict with a PivotTable range.", /PivotTable/],
    ["cell edit mode", "InvalidOperationInCellEditMode", "The operation isn't available while Excel is in Edit cell mode.", /press Enter or Esc/],
    ["an unknown code", "SomethingNew", "odd", /Excel could not do it/],
  ])("%s (%s): writeBlock and clear reject with a SheetHostError the pane can show", async (_name, code, hostMessage, advice) => {
    const book = beamBook().refuse("Beam!N3:R107", code, hostMessage);
    const { host } = officeFor(book);
    const write = host.writeBlock("Beam!N3:R4", [["x (m)", "V (kN)", "M (kN·m)", "slope (rad)", "deflection (m)"]]);
    await expect(write).rejects.toBeInstanceOf(SheetHostError);
    await expect(write).rejects.toMatchObject({ code, address: "Beam!N3:R4", message: expect.stringMatching(advice) });
    await expect(write).rejects.toMatchObject({ message: expect.stringContaining(`Nothing written to Beam!N3:R4`) });
    await expect(host.clear("Beam!N3:R107")).rejects.toMatchObject({ code, message: expect.stringMatching(advice) });
    expect(book.sheet("Beam").cells.has("N3")).toBe(false);
  });

  it("a chart on a protected sheet rejects with the code and the chart it is about", async () => {
    const book = beamBook().refuse("Beam!A1", "AccessDenied", "You cannot perform the requested operation.");
    const { host } = officeFor(book);
    const request = { sheet: "Beam", title: "Moment", x: "N4:N107", series: [{ name: "M", y: "P4:P107" }], placeAt: "T3:AA17", xTitle: "x (m)", yTitle: "M (kN·m)" };
    await expect(host.addChart(request)).rejects.toMatchObject({ code: "AccessDenied", message: expect.stringMatching(/^The moment chart was not added on Beam: .*protected/) });
    expect(book.charts).toEqual([]);
  });
});

describe("OfficeHost: diagram table and charts", () => {
  async function plan(host: OfficeHost) {
    const lookup = await selectionChange(host);
    if (!lookup.ok) throw new Error(lookup.message);
    return planTable(lookup.member, "Beam!H3:L6", 104, 101, undefined);
  }

  it("writes the table into empty cells without asking", async () => {
    const book = beamBook();
    const { host } = officeFor(book);
    const asked: string[] = [];
    const outcome = await writeTable(host, await plan(host), async (q) => (asked.push(q), true));
    expect(outcome).toEqual({ written: true, address: "Beam!N3:R107" });
    expect(asked).toEqual([]);
    // No units argument in the formula: the headers carry no units (the pane never guesses them).
    expect(await host.getValues("Beam!N3:R3")).toEqual([["x", "V", "M", "slope (rad)", "deflection"]]);
    expect(book.sheet("Beam").cells.get("N4")?.formula).toBe("=SPAN.DIAGRAM(B3:C3,loadTable,101,B4:D4,B5,B6)");
  });

  it.each([
    ["a zero in the first cell", "N3", 0],
    ["a formula in the last cell", "R107", "=B3"],
    ["text in the middle", "P55", "note"],
    ["a FALSE", "O13", false],
    ["a single space", "Q73", " "],
  ] as const)("%s counts as occupied: the user is asked, and refusing writes and clears nothing", async (_name, at, content) => {
    const book = beamBook();
    if (typeof content === "string" && content.startsWith("=")) book.putFormula(`Beam!${at}`, content, 0);
    else book.put(`Beam!${at}`, [[content]]);
    const before = JSON.stringify([...book.sheet("Beam").cells]);
    const { host } = officeFor(book);
    const questions: string[] = [];
    const outcome = await writeTable(host, await plan(host), async (q) => (questions.push(q), false));
    expect(outcome).toEqual({ written: false, reason: "nothing written: Beam!N3:R107 holds something" });
    expect(questions).toEqual(["Beam!N3:R107 already holds something. Write the diagram table over it?"]);
    expect(JSON.stringify([...book.sheet("Beam").cells])).toBe(before);
  });

  it("clears and writes when the user agrees", async () => {
    const book = beamBook().put("Beam!P43", [["old"]]);
    const { host } = officeFor(book);
    expect(await writeTable(host, await plan(host), async () => true)).toEqual({ written: true, address: "Beam!N3:R107" });
    expect(book.sheet("Beam").cells.has("P43")).toBe(false);
  });

  it("asks for scatter-line charts over the table's columns, beside it", async () => {
    const book = beamBook();
    const { host } = officeFor(book);
    const p = await plan(host);
    for (const request of chartRequests(p, true, { length: "m", force: "kN" })) await host.addChart(request);
    expect(book.charts.map((c) => [c.type, c.source, c.seriesBy, c.series[0].x, c.position, c.title, c.yTitle])).toEqual([
      ["XYScatterLinesNoMarkers", "Beam!O4:O107", "Columns", "Beam!N4:N107", ["T3", "AA17"], "Shear", "V (kN)"],
      ["XYScatterLinesNoMarkers", "Beam!P4:P107", "Columns", "Beam!N4:N107", ["T19", "AA33"], "Moment", "M (kN·m)"],
      ["XYScatterLinesNoMarkers", "Beam!R4:R107", "Columns", "Beam!N4:N107", ["T35", "AA49"], "Deflection", "deflection (m)"],
    ]);
  });
});

describe("OfficeHost: a write aimed at a sheet that is gone", () => {
  it("the check before writing rejects with ItemNotFound and the range, as a SheetHostError", async () => {
    const { host } = officeFor(beamBook());
    await expect(host.isEmpty("Gone!N3:R107")).rejects.toMatchObject({ name: "SheetHostError", code: "ItemNotFound", address: "Gone!N3:R107", message: expect.stringMatching(/^Gone!N3:R107 could not be checked before writing: the sheet or range no longer exists/) });
  });
});

describe("OfficeHost: a write never breaks another formula's spill", () => {
  // Range.getSpillParentOrNullObject (ExcelApi 1.12; one cell at a time, a null object for a
  // cell no formula spills into) and the shape of a spill (a rectangle with the formula's cell
  // at its top-left: G4 holding =A4:D4 spills to "G4:J4"), from "Handle dynamic arrays and
  // spilling using the Excel JavaScript API",
  // https://learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-ranges-dynamic-arrays,
  // and the office-js reference of Excel.Range. The table's target here is Beam!N3:R107.
  async function plan(host: OfficeHost) {
    const lookup = await selectionChange(host);
    if (!lookup.ok) throw new Error(lookup.message);
    return planTable(lookup.member, "Beam!H3:L6", 104, 101, undefined);
  }
  const seq = (rows: number, cols: number, value: CellValue = 1): CellValue[][] => Array.from({ length: rows }, () => Array.from({ length: cols }, () => value));

  it.each([
    ["from the left, over the first column", (b: FakeWorkbook) => b.putSpill("Beam!M10", "=SEQUENCE(3,3)", seq(3, 3)), ["Beam!M10"]],
    ["from above, over the first row", (b: FakeWorkbook) => b.putSpill("Beam!P1", "=SEQUENCE(5)", seq(5, 1)), ["Beam!P1"]],
    ["from above and left, over the corner", (b: FakeWorkbook) => b.putSpill("Beam!L1", "=SEQUENCE(4,4)", seq(4, 4)), ["Beam!L1"]],
    ["of empty texts (values that read as empty cells)", (b: FakeWorkbook) => b.putSpill("Beam!A50", "=IF(B50:Q51>0,\"\",\"\")", seq(2, 16, "")), ["Beam!A50"]],
    [
      "two formulas",
      (b: FakeWorkbook) => b.putSpill("Beam!P1", "=SEQUENCE(5)", seq(5, 1)).putSpill("Beam!K100", "=SEQUENCE(2,8)", seq(2, 8)),
      ["Beam!P1", "Beam!K100"],
    ],
  ])("a spill %s: writeTable refuses naming the formula's cell; nothing asked, cleared or written", async (_name, setup, cells) => {
    const book = beamBook();
    setup(book);
    const { host } = officeFor(book);
    const p = await plan(host);
    expect((await host.spillsInto("Beam!N3:R107")).sort()).toEqual([...cells].sort());
    const before = JSON.stringify([...book.sheet("Beam").cells]);
    const questions: string[] = [];
    const outcome = await writeTable(host, p, async (q) => (questions.push(q), true));
    expect(outcome.written).toBe(false);
    if (!outcome.written) for (const cell of cells) expect(outcome.reason).toContain(cell);
    if (!outcome.written) expect(outcome.reason).toMatch(/#SPILL!/);
    expect(questions).toEqual([]);
    expect(JSON.stringify([...book.sheet("Beam").cells])).toBe(before);
    expect([...book.sheet("Beam").cells.values()].some((cell) => cell.value === "#SPILL!")).toBe(false);
  });

  it("the fake models the harm being prevented: a write into another formula's spill breaks it (#SPILL!)", async () => {
    const book = beamBook().putSpill("Beam!M10", "=SEQUENCE(3,3)", seq(3, 3));
    const { host } = officeFor(book);
    await host.writeBlock("Beam!N11", [["x"]]);
    expect(book.sheet("Beam").cells.get("M10")).toEqual({ value: "#SPILL!", formula: "=SEQUENCE(3,3)" });
  });

  it("a spill whose formula lies inside the target is not reported (the write asks, then replaces the formula)", async () => {
    // On the edge the check asks about (N60 in the first column, R3 in the first row, spilling out of the target) and inside (Q106).
    const book = beamBook().putSpill("Beam!N60", "=SEQUENCE(3,2)", seq(3, 2)).putSpill("Beam!R3", "=SEQUENCE(1,3)", seq(1, 3)).putSpill("Beam!Q106", "=SEQUENCE(5)", seq(5, 1));
    const { host } = officeFor(book);
    const p = await plan(host);
    expect(await host.spillsInto("Beam!N3:R107")).toEqual([]);
    const questions: string[] = [];
    expect(await writeTable(host, p, async (q) => (questions.push(q), true))).toEqual({ written: true, address: "Beam!N3:R107" });
    expect(questions).toEqual(["Beam!N3:R107 already holds something. Write the diagram table over it?"]);
    expect(book.sheet("Beam").cells.get("N4")?.formula).toBe("=SPAN.DIAGRAM(B3:C3,loadTable,101,B4:D4,B5,B6)");
  });

  it("one sync, also for an empty target and a spill elsewhere; addresses sheet-qualified and deduplicated", async () => {
    const book = beamBook().putSpill("Beam!A1", "=SEQUENCE(2,2)", seq(2, 2));
    const { host } = officeFor(book);
    book.syncs = 0;
    expect(await host.spillsInto("Beam!N3:R107")).toEqual([]);
    expect(book.syncs).toBe(1);
    book.putSpill("'Load table'!B20", "=SEQUENCE(4,4)", seq(4, 4));
    book.syncs = 0;
    // Every cell of C21:E23 is spilled from B20: one entry, quoted as the host's other addresses are.
    expect(await host.spillsInto("'Load table'!C21:E23")).toEqual(["'Load table'!B20"]);
    expect(book.syncs).toBe(1);
  });

  it("without ExcelApi 1.12 the answer is [] with no round trip and no exception (no dynamic arrays, no spills)", async () => {
    const book = beamBook();
    const { host } = officeFor(book, (name, version) => `${name} ${version}` !== "ExcelApi 1.12");
    book.syncs = 0;
    await expect(host.spillsInto("Beam!N3:R107")).resolves.toEqual([]);
    expect(book.syncs).toBe(0);
  });

  it("a host failure is a SheetHostError naming the range", async () => {
    const { host } = officeFor(beamBook());
    await expect(host.spillsInto("Gone!N3:R107")).rejects.toMatchObject({ name: "SheetHostError", code: "ItemNotFound", address: "Gone!N3:R107", message: expect.stringMatching(/^Gone!N3:R107 could not be checked for spilled results before writing: the sheet or range no longer exists/) });
  });
});
