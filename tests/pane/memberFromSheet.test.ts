import { extremes, solve, valueAt } from "../../src/core";
import { relDiff } from "../../src/core/tolerance";
import { deflection } from "../../functions/functions";
import { readMember, sheetExtremes, sheetReactions } from "../../src/sheet";
import { findMember, solveMember, type ResolvedMember } from "../../src/pane/memberFromSheet";
import { FakeHost } from "./support/fakeHost";
import { NO_UNITS } from "../../src/pane/units";
import { drawDiagrams } from "../../src/pane/draw/diagramSvg";
import { readoutAt, readoutText } from "../../src/pane/draw/readout";

/** A two-span member laid out on a "Beam" sheet, with a load table on "Load table". */
function beamBook(): FakeHost {
  return new FakeHost()
    .put("Beam!A3", [["Spans (m)", 5.5, 4]])
    .put("Beam!A4", [["Supports", "pin", "pin", "fixed"]])
    .put("Beam!A5", [["EI (kN·m²)", 18500]])
    .put("Beam!A6", [["Combination", "1.2D+1.6L"]])
    .put("'Load table'!A1", [
      ["type", "magnitude", "x start", "x end", "magnitude at end", "case"],
      ["udl", 5.8, null, null, null, "D"],
      ["udl", 8.1, null, null, null, "L"],
      ["point", 12, 2.5, null, null, "L"],
      ["moment", 4, 7, null, null, "D"],
    ]);
}

/** The text content of every <text> element of an SVG, joined. */
function texts(svg: string): string {
  return [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]).join(" | ");
}

async function found(host: FakeHost, cell: string): Promise<ResolvedMember> {
  host.select(cell);
  const lookup = await findMember(host, await host.getSelection());
  if (!lookup.ok) throw new Error(lookup.message);
  return lookup.member;
}

const directArgs = () =>
  [
    [[5.5, 4]],
    [
      ["udl", 5.8, null, null, null, "D"],
      ["udl", 8.1, null, null, null, "L"],
      ["point", 12, 2.5, null, null, "L"],
      ["moment", 4, 7, null, null, "D"],
    ],
    [["pin", "pin", "fixed"]],
    [[18500]],
    "1.2D+1.6L",
  ] as const;

describe("findMember", () => {
  it("reads references, quoted sheet names and the combination, and solves like the sheet function", async () => {
    const host = beamBook().putFormula("Beam!H3", "=SPAN.EXTREMES(B3:C3,'Load table'!A2:F5,B4:D4,B5,B6)");
    const member = await found(host, "Beam!H3");
    expect(member.ranges).toEqual({ spans: "Beam!B3:C3", loads: "'Load table'!A2:F5", supports: "Beam!B4:D4", EI: "Beam!B5", combo: "Beam!B6" });
    expect(member.cases).toEqual(["D", "L"]);
    // The labels "Spans (m)" and "EI (kN·m²)" beside the inputs are never read as units.
    expect(member.units).toEqual(NO_UNITS);
    const solved = solveMember(member);
    if ("error" in solved) throw new Error(solved.error);
    expect(solved.comboText).toBe("1.2D+1.6L");
    const [spans, loads, supports, EI, combo] = directArgs();
    const table = sheetExtremes(spans, loads, supports, EI, combo);
    const moment = extremes(solved.solution, "moment");
    expect(table[1]).toEqual(["moment", moment.max, moment.xMax, moment.min, moment.xMin]);
  });

  it("honours the formula's units argument: draws in the user's length and force units, EI converted", async () => {
    const host = new FakeHost()
      .put("US!A1", [["Spans (ft)", 20], ["EI", 14790000]])
      .putFormula("US!D1", '=SPAN.DEFLECTION(B1,"udl 1.5 D",10,,B2,,"length=ft, force=kip, EI=kip*in^2, deflection=ft")');
    const member = await found(host, "US!D1");
    expect(member.units).toEqual({ length: "ft", force: "kip", deflection: "ft", deflectionFactor: 1 });
    const solved = solveMember(member);
    if ("error" in solved) throw new Error(solved.error);
    const sheet = deflection([[20]], [["udl 1.5 D"]], [[10]], null as any, [[14790000]], null, [["length=ft, force=kip, EI=kip*in^2, deflection=ft"]]);
    expect(relDiff(valueAt(solved.solution, "deflection", 10), sheet[0][0] as number)).toBeLessThan(1e-12);
    // Closed form 5wL^4/384EI in kip and inches, shown in feet (steel construction manual, simple beam, uniform load; from memory).
    expect(relDiff(valueAt(solved.solution, "deflection", 10), (5 * (1.5 / 12) * 240 ** 4) / (384 * 14790000) / 12)).toBeLessThan(1e-12);
    expect(relDiff(valueAt(solved.solution, "moment", 10), 1.5 * 400 / 8)).toBeLessThan(1e-12);
  });

  it("labels and draws in the units argument's units, deflection in its own unit, numbers as the sheet computes them", async () => {
    const unitsText = "length=ft, force=kip, EI=kip*in^2, deflection=in";
    const host = new FakeHost()
      .put("US!A1", [["Spans (m)", 20, 12], ["EI (kN)", 14790000], ["Supports", "pin", "pin", "free"]])
      .put("US!A5", [[unitsText]])
      .putFormula("US!D1", "=SPAN.EXTREMES(B1:C1,\"udl 1.5 D; point 4 at 26 D\",B3:D3,B2,,A5)");
    const member = await found(host, "US!D1");
    // 1 ft = 12 in exactly (ANSI/NIST definition of the international foot).
    expect(member.units).toMatchObject({ length: "ft", force: "kip", deflection: "in" });
    expect(relDiff(member.units.deflectionFactor, 12)).toBeLessThan(1e-15);
    const solved = solveMember(member);
    if ("error" in solved) throw new Error(solved.error);
    const drawing = drawDiagrams({ member: solved.member, solution: solved.solution, units: member.units, theme: "light", width: 400 });
    const table = sheetExtremes([[20, 12]], "udl 1.5 D; point 4 at 26 D", [["pin", "pin", "free"]], [[14790000]], null, [[unitsText]]);
    for (const panel of drawing.panels) {
      const row = table.find((r) => r[0] === panel.quantity) as [string, number, number, number, number];
      const max = panel.labels.find((l) => l.kind === "max")!;
      const min = panel.labels.find((l) => l.kind === "min")!;
      expect(relDiff(max.value, row[1])).toBeLessThan(1e-12);
      expect(relDiff(max.x, row[2])).toBeLessThan(1e-12);
      expect(relDiff(min.value, row[3])).toBeLessThan(1e-12);
    }
    expect(drawing.svg).toContain("Deflection, down + (in)");
    expect(drawing.svg).toContain("Moment M, sagging + (kip·ft)");
    expect(texts(drawing.svg)).not.toMatch(/\(m\)|kN/);
    const at = readoutAt(solved.solution, 10, member.units.deflectionFactor);
    const sheet = deflection([[20, 12]], [["udl 1.5 D; point 4 at 26 D"]], [[10]], [["pin", "pin", "free"]], [[14790000]], null, [[unitsText]]);
    expect(relDiff(at.deflection!, sheet[0][0] as number)).toBeLessThan(1e-12);
    expect(readoutText(at, member.units).find(([name]) => name === "deflection")?.[1]).toMatch(/ in$/);
  });

  it("without a units argument shows every quantity without units, whatever the labels say", async () => {
    const host = beamBook().putFormula("Beam!H3", "=SPAN.EXTREMES(B3:C3,'Load table'!A2:F5,B4:D4,B5,B6)");
    const member = await found(host, "Beam!H3");
    const solved = solveMember(member);
    if ("error" in solved) throw new Error(solved.error);
    const drawing = drawDiagrams({ member: solved.member, solution: solved.solution, units: member.units, theme: "light", width: 400 });
    expect(drawing.svg).toContain(">Moment M, sagging +<");
    expect(texts(drawing.svg)).not.toMatch(/kN|\bm\b/);
    // slope is in radians whatever the length unit; nothing else carries a unit
    expect(readoutText(readoutAt(solved.solution, 2), member.units).map(([, text]) => text).join(" ").replace(/ rad\b/, "")).not.toMatch(/[a-z]/);
  });

  it("takes literals, array constants, names and spilled ranges", async () => {
    const host = beamBook()
      .putFormula("Beam!H4", '=SPAN.MAXMOMENT({5.5,4},beamLoads,Beam!B4#,18500,"D+L")')
      .put("Beam!J1", [["skip"]]);
    host.names.set("beamLoads", "'Load table'!A2:F5");
    host.spills.set("Beam!B4", "Beam!B4:D4");
    const member = await found(host, "Beam!H4");
    expect(member.ranges).toEqual({ loads: "'Load table'!A2:F5", supports: "Beam!B4:D4" });
    const solved = solveMember(member);
    if ("error" in solved) throw new Error(solved.error);
    const [spans, loads, supports, EI] = directArgs();
    const direct = solve(readMember({ spans, loads, supports, EI, combo: "D+L" }));
    expect(solved.solution.reactions).toEqual(direct.reactions);
  });

  it("solves under another combination when asked, and with every load at 1 for blank", async () => {
    const member = await found(beamBook().putFormula("Beam!H3", "=SPAN.REACTIONS(B3:C3,'Load table'!A2:F5,B4:D4,B5,B6)"), "Beam!H3");
    const [spans, loads, supports, EI] = directArgs();
    for (const combo of ["D", "", "0.9D"]) {
      const solved = solveMember(member, combo);
      if ("error" in solved) throw new Error(solved.error);
      expect(solved.solution.reactions).toEqual(solve(readMember({ spans, loads, supports, EI, combo })).reactions);
    }
  });

  it("says which arguments are expressions and offers to pick ranges", async () => {
    const host = beamBook().putFormula("Beam!H5", "=SPAN.MOMENT(B3:C3*2,'Load table'!A2:F5,3)");
    host.select("Beam!H5");
    const lookup = await findMember(host, await host.getSelection());
    expect(lookup).toMatchObject({ ok: false, reason: "unresolved", unresolved: ["spans"] });
    if (!lookup.ok) expect(lookup.message).toBe("H5: the pane cannot work out spans (B3:C3*2); pick the input ranges instead");
  });

  it("explains a cell without a SPAN formula, an unknown name and a missing spill", async () => {
    const host = beamBook().putFormula("Beam!H6", "=SPAN.REACTIONS(nothing,B3)").putFormula("Beam!H7", "=SPAN.REACTIONS(B3:C3,Z9#)");
    host.select("Beam!B3");
    expect(await findMember(host, await host.getSelection())).toEqual({ ok: false, reason: "no-formula", message: "B3: the cell holds no formula" });
    host.select("Beam!H6");
    expect(await findMember(host, await host.getSelection())).toEqual({ ok: false, reason: "invalid", message: "nothing: no range has that name" });
    host.select("Beam!H7");
    expect(await findMember(host, await host.getSelection())).toEqual({ ok: false, reason: "invalid", message: "Z9#: Z9 does not spill" });
  });

  it("turns bad member input into the sheet layer's message, never a throw", async () => {
    const host = beamBook().putFormula("Beam!H3", "=SPAN.REACTIONS(B3:C3,'Load table'!A2:F5,B4:C4)");
    const solved = solveMember(await found(host, "Beam!H3"));
    expect(solved).toHaveProperty("error");
    if ("error" in solved) expect(solved.error).toMatch(/^#VALUE! supports/);
  });
});

describe("the combination box follows the worksheet functions' rule", () => {
  /** What SPAN.REACTIONS says for the member under a combination: its rows, or its code and message. */
  function sheetSays(combo: string): { rows: number[][] } | { error: string } {
    const [spans, loads, supports, EI] = directArgs();
    try {
      return { rows: sheetReactions(spans, loads, supports, EI, combo) };
    } catch (error) {
      return { error: `${(error as { code: string }).code} ${(error as Error).message}` };
    }
  }

  const combos = ["1.2D+1.6L", "1.2D+1.6LL", "1.2d+1.6l", "1.6W", "1.2D+1.6L+0.5S", "1.2D+", "D", ""];
  it.each(combos)("combination %p: the pane draws exactly when SPAN.REACTIONS answers, and otherwise shows its message", async (combo) => {
    const member = await found(beamBook().putFormula("Beam!H3", "=SPAN.REACTIONS(B3:C3,'Load table'!A2:F5,B4:D4,B5,B6)"), "Beam!H3");
    const solved = solveMember(member, combo);
    const sheet = sheetSays(combo);
    if ("error" in sheet) expect(solved).toEqual({ error: sheet.error });
    else {
      if ("error" in solved) throw new Error(solved.error);
      solved.solution.reactions.forEach((r, i) => {
        expect(r.force).toBeCloseTo(sheet.rows[i][1], 9);
        expect(r.moment).toBeCloseTo(sheet.rows[i][2], 9);
      });
    }
  });

  it("a combination that cannot be read is refused with the sheet's message", async () => {
    const member = await found(beamBook().putFormula("Beam!H3", "=SPAN.REACTIONS(B3:C3,'Load table'!A2:F5,B4:D4,B5,B6)"), "Beam!H3");
    const solved = solveMember(member, "1.2D+");
    expect(solved).toHaveProperty("error");
    if ("error" in solved) expect(solved.error).toMatch(/^#VALUE! /);
  });
});
