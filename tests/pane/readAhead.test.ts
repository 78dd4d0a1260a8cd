/** What one selection change reads in its batch, from the formula text alone. */
import { addressKey, labelWindows, planReads, rangeOfNameFormula } from "../../src/pane/readAhead";
import type { Selection } from "../../src/pane/host";

const at = (formula: string | undefined, sheet = "Beam"): Selection => ({ sheet, cell: "H3", formula, value: 0, range: "H3" });

describe("planReads", () => {
  it.each([
    ["a value cell", undefined],
    ["a formula without SPAN", "=SUM(B3:C3)"],
    ["a SPAN formula that does not parse", "=SPAN.MOMENT(B3:C3,(A1"],
  ])("%s reads nothing more", (_name, formula) => {
    expect(planReads(at(formula))).toEqual({ ranges: [], spills: [], names: [] });
  });

  it("reads every range argument, the member's label cells, spills and names, each once", () => {
    const plan = planReads(at("=SPAN.MOMENT(B3:C3,loads,$E$8,b3:c3,Other!J3#,'Load table'!A2:F9)"), (name) => (name === "loads" ? "Beam!A10:F12" : undefined));
    expect(plan.ranges).toEqual(["Beam!B3:C3", "Beam!A3", "Beam!B1:B2", "Beam!A1:A9", "Beam!E8", "Other!I3", "Other!J1:J2", "'Load table'!A2:F9", "'Load table'!A1"]);
    expect(plan.spills).toEqual(["Other!J3"]);
    expect(plan.names).toEqual([{ name: "loads", scope: "Beam" }]);
  });

  it("x, points and other non-member arguments are read without label cells", () => {
    expect(planReads(at("=SPAN.DIAGRAM(B3:C3,A10:F12,Z40)")).ranges).toEqual(["Beam!B3:C3", "Beam!A3", "Beam!B1:B2", "Beam!A10:F12", "Beam!A1:A9", "Beam!Z40"]);
  });
});

describe("labelWindows", () => {
  it.each([
    ["A1", []],
    ["A2:A5", ["Beam!A1"]],
    ["B1", ["Beam!A1"]],
    ["C20:D20", ["Beam!B20", "Beam!C8:C19"]],
    ["not a range", []],
  ])("%s", (address, expected) => {
    expect(labelWindows(`Beam!${address}`)).toEqual(expected);
  });
});

describe("addresses as keys", () => {
  it("sheet case, $ and the default sheet do not matter; the cells do", () => {
    expect(addressKey("beam!$B$3:$C$3", "X")).toBe(addressKey("Beam!B3:C3", "Y"));
    expect(addressKey("B3", "Beam")).toBe(addressKey("'Beam'!B3", "Other"));
    expect(addressKey("Beam!B3", "")).not.toBe(addressKey("Beam!B4", ""));
  });

  it("a defined name's formula text gives its range only when it is one range", () => {
    expect(rangeOfNameFormula("=Beam!$A$10:$F$12", "X")).toBe("Beam!A10:F12");
    expect(rangeOfNameFormula("='Load table'!$A$2", "X")).toBe("'Load table'!A2");
    expect(rangeOfNameFormula("=$B$3:$C$3", "Beam")).toBe("Beam!B3:C3");
    expect(rangeOfNameFormula("=0.05", "Beam")).toBeUndefined();
    expect(rangeOfNameFormula("=OFFSET(A1,0,0,3)", "Beam")).toBeUndefined();
    expect(rangeOfNameFormula(7, "Beam")).toBeUndefined();
  });
});
