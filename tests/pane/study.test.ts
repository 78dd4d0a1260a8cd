/**
 * Study cells in the pane: what is drawn is what the cell computes, through the same sheet
 * functions with the cell's own arguments. Closed forms are simple-span statics (moment wL^2/8
 * under a uniform load; reaction influence line 1 - x/L by statics), independent of the solver.
 */
import { sheetEnvelope, sheetMoving, sheetPeaks } from "../../src/sheet";
import { findMember, type ResolvedMember } from "../../src/pane/memberFromSheet";
import { computeStudy, envelopeAt, influenceAt, stationsFor } from "../../src/pane/study";
import { drawEnvelope, drawInfluence, drawMoving, placementText } from "../../src/pane/draw/studySvg";
import { FakeHost } from "./support/fakeHost";

async function memberAt(host: FakeHost, cell: string): Promise<ResolvedMember> {
  host.select(cell);
  const lookup = await findMember(host, await host.getSelection());
  if (!lookup.ok) throw new Error(lookup.message);
  return lookup.member;
}

const close = (a: number, b: number, scale: number): boolean => Math.abs(a - b) <= 1e-12 * scale;

function book(): FakeHost {
  return new FakeHost()
    .put("A1", [[6], ["udl 1 D; udl 2 L"], ["1.2D+1.6L"], ["0.9D"]])
    .putFormula("C1", "=SPAN.ENVELOPE(A1,A2,3,A3:A4)")
    .putFormula("C2", "=SPAN.PEAKS(A1,A2,A3:A4)")
    .putFormula("C3", '=SPAN.INFLUENCE(10,"reaction 1",B1:B5)')
    .putFormula("C4", '=SPAN.MOVING(10,{10,10},2,"moment at 5")')
    .putFormula("C5", '=SPAN.ENVELOPE(A1,A2,3,"1.2D+")')
    .putFormula("C6", '=SPAN.SECTION("rectangle",{0.2,0.4})');
}

describe("ENVELOPE and PEAKS cells draw the envelope", () => {
  it("upper and lower curves are SPAN.ENVELOPE's bounds at every station; midspan gives wL^2/8 of the governing combinations", async () => {
    const member = await memberAt(book(), "C1");
    expect(member.kind).toBe("envelope");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "envelope") throw new Error("no envelope");
    expect(study.curves.map((c) => c.quantity)).toEqual(["shear", "moment"]);
    const moment = study.curves[1];
    const direct = sheetEnvelope(6, "udl 1 D; udl 2 L", moment.xs.map((x) => [x]), [["1.2D+1.6L"], ["0.9D"]], null, null, "moment", null, null);
    expect(moment.max).toEqual(direct.map((r) => r[1]));
    expect(moment.min).toEqual(direct.map((r) => r[3]));
    const mid = moment.xs.indexOf(3);
    // 1.2D+1.6L: w = 1.2 + 3.2 = 4.4, M = 4.4 * 36 / 8 = 19.8; 0.9D: 0.9 * 36 / 8 = 4.05.
    expect(close(moment.max[mid], 19.8, 19.8)).toBe(true);
    expect(close(moment.min[mid], 4.05, 19.8)).toBe(true);
    for (const curve of study.curves) curve.max.forEach((v, i) => expect(v).toBeGreaterThanOrEqual(curve.min[i]));
    expect(envelopeAt(member, study.member, 3)[1]).toEqual(["moment", moment.max[mid], "1.2D + 1.6L", moment.min[mid], "0.9D"]);
    const figure = drawEnvelope({ member: study.member, curves: study.curves, theme: "light", width: 400, subtitle: "" });
    expect(figure.svg.match(/class="curve upper"/g)).toHaveLength(2);
    expect(figure.svg.match(/class="curve lower"/g)).toHaveLength(2);
    expect(figure.svg).not.toContain("every load at factor 1");
    expect(figure.svg).not.toContain('class="peak');
  });

  it("a PEAKS cell labels the governing peaks SPAN.PEAKS gives, with what governs them", async () => {
    const member = await memberAt(book(), "C2");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "peaks") throw new Error("no peaks");
    const rows = sheetPeaks(6, "udl 1 D; udl 2 L", [["1.2D+1.6L"], ["0.9D"]], null, null, null, null);
    const figure = drawEnvelope({ member: study.member, curves: study.curves, peaks: study.peaks, theme: "light", width: 400, subtitle: "" });
    const moment = rows.find((r) => r[0] === "moment")!;
    expect(figure.svg).toContain(`data-quantity="moment" data-kind="max" data-value="${moment[1]}" data-x="${moment[2]}" data-by="${moment[3]}"`);
    expect(close(moment[1] as number, 19.8, 19.8)).toBe(true);
  });

  it("a combination the sheet refuses is refused with the sheet's own message", async () => {
    const member = await memberAt(book(), "C5");
    const study = computeStudy(member);
    let expected = "";
    try {
      sheetEnvelope(6, "udl 1 D; udl 2 L", 3, "1.2D+", null, null, null, null, null);
    } catch (error) {
      expected = `${(error as { code: string }).code} ${(error as Error).message}`;
    }
    expect(expected).not.toBe("");
    expect(study).toEqual({ error: expected });
  });
});

describe("INFLUENCE and MOVING cells", () => {
  it("an INFLUENCE cell draws the influence line: reaction 1 of a simple span is 1 - x/L", async () => {
    const member = await memberAt(book(), "C3");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "influence") throw new Error("no influence line");
    study.xs.forEach((x, i) => expect(close(study.values[i], 1 - x / 10, 1)).toBe(true));
    expect(close(influenceAt(member, 2.5), 0.75, 1)).toBe(true);
    const figure = drawInfluence({ member: study.member, effect: study.effect, xs: study.xs, values: study.values, theme: "light", width: 400, subtitle: "" });
    expect(figure.svg).toContain("Influence line: reaction 1, unit load at x");
    expect(figure.svg.match(/class="curve influence"/g)).toHaveLength(1);
  });

  it("a MOVING cell places the train at each extreme: two 10 axles 2 apart give 40 at midspan of a 10 span", async () => {
    const member = await memberAt(book(), "C4");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "moving") throw new Error("no moving load");
    const rows = sheetMoving(10, [[10, 10]], 2, "moment at 5", null, null);
    expect(study.placements.map((p) => [p.label, p.value, p.leadX, p.direction, p.x])).toEqual(rows);
    const max = study.placements[0];
    // Axles at a <= 5 <= a + 2: 10 * a / 2 + 10 * (10 - a - 2) / 2 = 40 wherever they straddle midspan.
    expect(close(max.value, 40, 40)).toBe(true);
    const [first, second] = max.axles.map((a) => a.xStart).sort((a, b) => a - b);
    expect(first).toBeLessThanOrEqual(5 + 1e-12);
    expect(second).toBeGreaterThanOrEqual(5 - 1e-12);
    const sign = max.direction === "reversed" ? -1 : 1;
    expect(max.axles.map((a) => a.xStart)).toEqual([max.leadX, max.leadX + sign * 2].filter((x) => x >= 0 && x <= 10));
    const figure = drawMoving({ member: study.member, effect: study.effect, placements: study.placements, line: study.line, theme: "light", width: 400, subtitle: "" });
    expect(figure.svg.match(/class="placement"/g)).toHaveLength(2);
    expect(figure.svg.match(/class="load point"/g)?.length).toBeGreaterThanOrEqual(2);
    expect(placementText(max, study.effect)).toMatch(/^max moment at 5 = 40: first axle at x = /);
  });

  it("a cell without a member says so plainly", async () => {
    const host = book();
    host.select("C6");
    expect(await findMember(host, await host.getSelection())).toEqual({
      ok: false,
      reason: "no-member",
      message: "C6: SPAN.SECTION computes no member, so the pane has nothing to draw for this cell",
    });
  });

  it("stations include both sides of every node and load point, inside the member", () => {
    const xs = stationsFor({ spans: [4, 6], supports: [], stiffness: null, loads: [{ kind: "point", magnitude: 1, xStart: 2.5, xEnd: 2.5, magnitudeEnd: 0, loadCase: "", row: 1 }] }, [7]);
    for (const m of [2.5, 4, 7]) {
      expect(xs.some((x) => x < m && m - x < 1e-5)).toBe(true);
      expect(xs.some((x) => x > m && x - m < 1e-5)).toBe(true);
    }
    expect(xs[0]).toBe(0);
    expect(xs[xs.length - 1]).toBe(10);
  });
});

describe("a study cell that shows an error is not drawn", () => {
  const cases: [string, RegExp][] = [
    ['=SPAN.ENVELOPE(A1,A2,3,A3:A4,,,"deflection")', /^#VALUE! quantity deflection needs EI/],
    ["=SPAN.ENVELOPE(A1,A2,9,A3:A4)", /^#(VALUE|N\/A)! .*9/],
    ['=SPAN.INFLUENCE(10,"reaction 1",12)', /^#(VALUE|N\/A)! .*12/],
  ];
  it.each(cases)("%s", async (formula, message) => {
    const host = book().putFormula("D9", formula);
    const study = computeStudy(await memberAt(host, "D9"));
    expect(study).toHaveProperty("error");
    if ("error" in study) expect(study.error).toMatch(message);
  });
});

describe("a study cell with units is drawn in those units", () => {
  it("an ENVELOPE cell's deflection curve is SPAN.ENVELOPE's with the cell's units argument (EI in kip*in^2, deflection in in)", async () => {
    const units = "length=ft, force=kip, EI=kip*in^2, deflection=in";
    const host = new FakeHost()
      .put("A1", [[20], ["udl 1 D; udl 2 L"], ["1.2D+1.6L"], ["0.9D"], [14790000], [units]])
      .putFormula("C1", '=SPAN.ENVELOPE(A1,A2,3,A3:A4,,A5,"deflection",,,A6)');
    const member = await memberAt(host, "C1");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "envelope") throw new Error("no envelope");
    const deflection = study.curves.find((c) => c.quantity === "deflection")!;
    const xs = deflection.xs.map((x) => [x]);
    const withUnits = sheetEnvelope(20, "udl 1 D; udl 2 L", xs, [["1.2D+1.6L"], ["0.9D"]], null, 14790000, "deflection", null, null, units);
    const without = sheetEnvelope(20, "udl 1 D; udl 2 L", xs, [["1.2D+1.6L"], ["0.9D"]], null, 14790000, "deflection", null, null);
    expect(deflection.max).toEqual(withUnits.map((r) => r[1]));
    expect(deflection.max).not.toEqual(without.map((r) => r[1]));
  });
});
