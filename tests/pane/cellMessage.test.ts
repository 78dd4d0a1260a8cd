/**
 * The pane shows the message behind a selected SPAN cell's #VALUE!/#N/A, whole: the message
 * the same worksheet function throws for the same arguments, called here directly as the
 * host calls it (functions/functions.ts exports, ranges as 2-D arrays, skipped as null).
 * Why the pane must compute it: the host shows the message only on hover on desktop
 * (../shared/TOOLCHAIN.md, "Error messages in the host"), and Excel.ValueErrorCellValue carries
 * no message (https://learn.microsoft.com/javascript/api/excel/excel.valueerrorcellvalue).
 */
import { deflection, diagram, moment } from "../../functions/functions";
import { cellMessage } from "../../src/pane/cellMessage";
import { findMember } from "../../src/pane/memberFromSheet";
import { OfficeHost, type OfficeLike } from "../../src/pane/officeHost";
import { FakeHost } from "./support/fakeHost";
import { FakeWorkbook } from "./support/fakeExcel";

/** A skipped optional argument, as the host passes it. */
const SKIP = null as unknown as any[][];

const LOADS = [
  ["udl", 5.8, null, null, null, "D"],
  ["point", 12, 2.5, null, null, "L"],
];

function thrown(call: () => unknown): string {
  try {
    call();
  } catch (error) {
    return (error as Error).message;
  }
  throw new Error("the function did not fail");
}

function book(): FakeHost {
  return new FakeHost()
    .put("Beam!A3", [["Spans (m)", 5.5, 5.5]])
    .put("Beam!A4", [["Supports", "pin", "pin", "pin"]])
    .put("Beam!A5", [["EI (kN·m²)", 18500]])
    .put("Beam!A8", [["x (m)", 20]])
    .put("Beam!A10", LOADS);
}

describe("cellMessage", () => {
  it.each([
    ["x beyond the member, from a cell", "=SPAN.MOMENT(B3:C3,A10:F11,B8,B4:D4,B5)", () => moment([[5.5, 5.5]], LOADS, [[20]], [["pin", "pin", "pin"]], [[18500]], SKIP, SKIP)],
    ["a negative x literal", "=SPAN.DEFLECTION(B3:C3,A10:F11,-1,B4:D4,B5)", () => deflection([[5.5, 5.5]], LOADS, [[-1]], [["pin", "pin", "pin"]], [[18500]], SKIP, SKIP)],
    ["too few diagram points", "=SPAN.DIAGRAM(B3:C3,A10:F11,1)", () => diagram([[5.5, 5.5]], LOADS, 1, SKIP, SKIP, SKIP, SKIP)],
    ["an unknown support word", "=SPAN.MOMENT(B3:C3,A10:F11,2,{\"pin\",\"pinn\",\"pin\"})", () => moment([[5.5, 5.5]], LOADS, [[2]], [["pin", "pinn", "pin"]], SKIP, SKIP, SKIP)],
  ])("%s: the function's own message, whole", async (_name, formula, direct) => {
    const host = book().putFormula("Beam!H3", formula, "#VALUE!");
    host.select("Beam!H3");
    const expected = thrown(direct);
    expect(expected.length).toBeGreaterThan(10);
    expect(await cellMessage(host, await host.getSelection())).toBe(`H3 shows #VALUE!: ${expected}`);
  });

  it("says nothing for a cell that shows a value, or a formula without a SPAN call", async () => {
    const host = book().putFormula("Beam!H3", "=SPAN.MOMENT(B3:C3,A10:F11,2)", 12.5).putFormula("Beam!H4", "=SUM(B3:C3)", "#VALUE!");
    host.select("Beam!H3");
    expect(await cellMessage(host, await host.getSelection())).toBeUndefined();
    host.select("Beam!H4");
    expect(await cellMessage(host, await host.getSelection())).toBeUndefined();
  });

  it("an argument it cannot read is named, never thrown", async () => {
    const host = book().putFormula("Beam!H3", "=SPAN.MOMENT(B3:C3,A10:F11,B8*2)", "#VALUE!");
    host.select("Beam!H3");
    expect(await cellMessage(host, await host.getSelection())).toBe("H3 shows #VALUE!; the pane could not read its arguments: B8*2: the pane cannot work out this expression");
  });

  it("a cell whose formula evaluates cleanly says so instead of inventing a reason", async () => {
    const host = book().putFormula("Beam!H3", "=SPAN.MOMENT(B3:C3,A10:F11,2)", "#VALUE!");
    host.select("Beam!H3");
    expect(await cellMessage(host, await host.getSelection())).toMatch(/^H3 shows #VALUE!, but the same formula evaluated by the pane gives no error/);
  });

  it("in Excel the selection, its member and the cell's message take at most 2 syncs together", async () => {
    const excel = new FakeWorkbook()
      .put("Beam!A3", [["Spans (m)", 5.5, 5.5]])
      .put("Beam!A4", [["Supports", "pin", "pin", "pin"]])
      .put("Beam!A5", [["EI (kN·m²)", 18500]])
      .put("Beam!A8", [["x (m)", 20]])
      .put("Beam!A10", LOADS.map((row) => row.map((v) => v ?? "")))
      .putFormula("Beam!H3", "=SPAN.MOMENT(B3:C3,A10:F11,B8,B4:D4,B5)", "#VALUE!")
      .select("Beam!H3");
    const office = { context: { document: {} }, EventType: {} } as unknown as OfficeLike;
    const host = new OfficeHost(excel.run, office, () => true);
    const selection = await host.getSelection();
    const lookup = await findMember(host, selection);
    expect(lookup.ok).toBe(true);
    const message = await cellMessage(host, selection);
    expect(message).toBe(`H3 shows #VALUE!: ${thrown(() => moment([[5.5, 5.5]], LOADS, [[20]], [["pin", "pin", "pin"]], [[18500]], SKIP, SKIP))}`);
    expect(excel.syncs).toBeLessThanOrEqual(2);
  });
});
