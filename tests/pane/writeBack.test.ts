/** What the pane writes: the DIAGRAM formula keeps every member argument of the source formula, units included. */
import { sheetDiagram } from "../../src/sheet";
import { findMember, type ResolvedMember } from "../../src/pane/memberFromSheet";
import { blockText } from "../../src/pane/addresses";
import { chartRequests, diagramFormula, diagramRows, planTable, tableHeader, writeTable } from "../../src/pane/writeBack";
import { FakeHost } from "./support/fakeHost";

async function memberAt(host: FakeHost, cell: string): Promise<ResolvedMember> {
  host.select(cell);
  const lookup = await findMember(host, await host.getSelection());
  if (!lookup.ok) throw new Error(lookup.message);
  return lookup.member;
}

const UNITS = '"length=ft, force=kip, EI=kip*in^2, deflection=in"';

describe("diagramFormula", () => {
  const cases: [string, string | undefined, string][] = [
    ["=SPAN.MOMENT(B1:C1,A5:F9,4,B2:D2,B3,B4,B6)", undefined, "=SPAN.DIAGRAM(B1:C1,A5:F9,101,B2:D2,B3,B4,B6)"],
    [`=SPAN.REACTIONS(B1:C1,A5:F9,B2:D2,B3,,${UNITS})`, undefined, `=SPAN.DIAGRAM(B1:C1,A5:F9,101,B2:D2,B3,,${UNITS})`],
    [`=SPAN.EXTREMES(B1:C1,A5:F9,B2:D2,B3,"1.2D+1.6L",${UNITS})`, "D", `=SPAN.DIAGRAM(B1:C1,A5:F9,101,B2:D2,B3,"D",${UNITS})`],
    [`=SPAN.SHEAR(B1:C1,A5:F9,3,,,,${UNITS})`, undefined, `=SPAN.DIAGRAM(B1:C1,A5:F9,101,,,,${UNITS})`],
    ["=SPAN.DEFLECTION(B1:C1,A5:F9,3,B2:D2,B3)", "", "=SPAN.DIAGRAM(B1:C1,A5:F9,101,B2:D2,B3)"],
    [`=SPAN.STRESS(B1:C1,A5:F9,H1:H4,B2:D2,B3,,${UNITS})`, undefined, `=SPAN.DIAGRAM(B1:C1,A5:F9,101,B2:D2,B3,,${UNITS})`],
  ];
  it.each(cases)("%s (combination %p) -> %s", async (formula, combo, expected) => {
    const host = new FakeHost().put("A1", [[null]]).putFormula("H9", formula);
    expect(diagramFormula(await memberAt(host, "H9"), 101, combo)).toBe(expected);
  });
});

describe("the written table's headers are in the formula's units", () => {
  it("labels x, V, M and deflection from the units argument, nothing without one", async () => {
    const host = new FakeHost()
      .put("A1", [["Spans (m)", 20, 12]])
      .putFormula("H1", `=SPAN.EXTREMES(B1:C1,"udl 1.5",,14790000,,${UNITS})`)
      .putFormula("H2", `=SPAN.EXTREMES(B1:C1,"udl 1.5",,14790000)`);
    const withUnits = await memberAt(host, "H1");
    expect(tableHeader(withUnits.units)).toEqual(["x (ft)", "V (kip)", "M (kip·ft)", "slope (rad)", "deflection (in)"]);
    const plain = await memberAt(host, "H2");
    expect(tableHeader(plain.units)).toEqual(["x", "V", "M", "slope (rad)", "deflection"]);
    const plan = planTable(withUnits, "H1:L4", 101, 101, undefined);
    expect(chartRequests(plan, true, withUnits.units).map((c) => c.yTitle)).toEqual(["V (kip)", "M (kip·ft)", "deflection (in)"]);
  });

  it("the DIAGRAM the pane writes computes in those units: deflection in inches, as SPAN.DIAGRAM with the same arguments", async () => {
    const host = new FakeHost().putFormula("H1", `=SPAN.EXTREMES("20 12","udl 1.5",,14790000,,${UNITS})`);
    const formula = diagramFormula(await memberAt(host, "H1"), 5, undefined);
    expect(formula).toBe(`=SPAN.DIAGRAM("20 12","udl 1.5",5,,14790000,,${UNITS})`);
    const withUnits = sheetDiagram("20 12", "udl 1.5", 5, null, 14790000, null, "length=ft, force=kip, EI=kip*in^2, deflection=in");
    const without = sheetDiagram("20 12", "udl 1.5", 5, null, 14790000, null);
    // Dropping the units would read EI in kip*ft^2 and give deflections in feet: 144 x 12 = 1728 times apart.
    const interior = withUnits.findIndex((row) => Math.abs(row[4] as number) > 0);
    expect((withUnits[interior][4] as number) / (without[interior][4] as number)).toBeCloseTo(1728, 9);
  });
});

describe("writeTable never breaks another formula's spill", () => {
  /** A member at H3 whose table goes to J3:N104, and a formula at I10 spilling right over J10:K10. */
  async function setUp(): Promise<{ host: FakeHost; member: ResolvedMember }> {
    const host = new FakeHost().putFormula("H3", '=SPAN.REACTIONS("6","udl 2")').putFormula("I10", "=SEQUENCE(1,3)", 1).put("J10", [[2, 3]]);
    host.spilledFrom.set("Sheet1!J10", "Sheet1!I10").set("Sheet1!K10", "Sheet1!I10");
    return { host, member: await memberAt(host, "H3") };
  }

  it("refuses, names the spilling formula's cell, and neither asks, clears nor writes", async () => {
    const { host, member } = await setUp();
    const plan = planTable(member, undefined, 101, 101, undefined);
    expect(blockText(plan.block)).toBe("J3:N104");
    const asked: string[] = [];
    const outcome = await writeTable(host, plan, async (q) => (asked.push(q), true));
    expect(outcome).toEqual({
      written: false,
      reason: "nothing written: Sheet1!J3:N104 takes cells that the result of Sheet1!I10 spills into; writing there would break that formula (#SPILL!). Move it, or make room beside the member",
    });
    expect(asked).toEqual([]);
    expect(host.cleared).toEqual([]);
    expect(host.writes).toEqual([]);
  });

  it("writes over a formula whose own cell is inside the target once the user agrees (clearing it removes its spill)", async () => {
    const { host, member } = await setUp();
    host.spilledFrom.clear();
    host.putFormula("J10", "=SEQUENCE(1,2)", 1).put("K10", [[2]]);
    host.spilledFrom.set("Sheet1!K10", "Sheet1!J10");
    const plan = planTable(member, undefined, 101, 101, undefined);
    const asked: string[] = [];
    const outcome = await writeTable(host, plan, async (q) => (asked.push(q), true));
    expect(outcome).toEqual({ written: true, address: "Sheet1!J3:N104" });
    expect(asked).toEqual(["Sheet1!J3:N104 already holds something. Write the diagram table over it?"]);
    expect(host.cleared).toEqual(["Sheet1!J3:N104"]);
  });

  it("reports a table that shows #SPILL! after the write instead of claiming success", async () => {
    const { host, member } = await setUp();
    host.spilledFrom.clear();
    const plan = planTable(member, undefined, 101, 101, undefined);
    const write = host.writeBlock.bind(host);
    host.writeBlock = async (address, block) => {
      await write(address, block);
      host.putFormula("J4", String(block[1][0]), "#SPILL!");
    };
    const outcome = await writeTable(host, plan, async () => true);
    expect(outcome).toEqual({ written: false, reason: "the diagram table at Sheet1!J4 shows #SPILL!: something in Sheet1!J3:N104 blocks it" });
  });
});

describe("diagramRows", () => {
  it("is the number of rows SPAN.DIAGRAM spills for the member's own arguments, units and chosen combination included", async () => {
    const host = new FakeHost().putFormula("H1", `=SPAN.EXTREMES("20 12","udl 1.5 D; point 4 at 26 L",,14790000,"D+L",${UNITS})`);
    const member = await memberAt(host, "H1");
    const units = "length=ft, force=kip, EI=kip*in^2, deflection=in";
    expect(diagramRows(member, 101, undefined)).toBe(sheetDiagram("20 12", "udl 1.5 D; point 4 at 26 L", 101, null, 14790000, "D+L", units).length);
    expect(diagramRows(member, 101, "D")).toBe(sheetDiagram("20 12", "udl 1.5 D; point 4 at 26 L", 101, null, 14790000, "D", units).length);
    // The point load adds both sides of its jump: more rows than stations.
    expect(diagramRows(member, 101, undefined)).toBeGreaterThan(101);
  });
});
