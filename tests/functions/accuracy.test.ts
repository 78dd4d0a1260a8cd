/**
 * Issue cases at the worksheet functions, as the engineer types them: positions at nodes of
 * decimal spans and through the units argument, members double precision answered wrongly or
 * refused, and SPAN.SECTION at extreme sizes. Expected values: hand statics (a load on a
 * support goes straight into it; determinate links by free bodies), and where a member is
 * indeterminate the exact force method in BigInt fixed point (tests/core/kit/exactForceMethod.ts)
 * on the same member.
 */
import fc from "fast-check";
import * as fx from "../../functions/functions";
import { beam, scalesOf, udl } from "../core/kit/members";
import { exactForceMethodSolve } from "../core/kit/exactForceMethod";
import { auditMember, typed } from "../core/kit/auditMembers";
import { memberLength, type Member } from "../../src/core";

const c = (v: unknown) => [[v]];
const none = null as any;
const outcome = (f: () => any[][]): number | string => {
  try {
    return f()[0][0];
  } catch (error) {
    const e = error as { code?: string; message?: string };
    return `${e.code}: ${e.message}`;
  }
};

describe("positions at nodes: decimal spans and the units path", () => {
  test.each([
    ["SHEAR(\"0.4 1\", \"point 10 at 1.4\", 1.4, \"pin pin pin\"): the load goes into the end pin", () => fx.shear(c("0.4 1"), c("point 10 at 1.4"), c(1.4), c("pin pin pin")), 0],
    ["MOMENT(\"0.3 0.4\", \"moment 10 at 0.7\", 0.7, \"pin pin free\"): the couple at the free end", () => fx.moment(c("0.3 0.4"), c("moment 10 at 0.7"), c(0.7), c("pin pin free")), -10],
    ["SHEAR(\"12 8\", \"point 3 at 20\", 20, \"pin pin free\", , , \"length=ft, force=kip\")", () => fx.shear(c("12 8"), c("point 3 at 20"), c(20), c("pin pin free"), none, none, c("length=ft, force=kip")), 3],
    ["SHEAR(\"12 8\", \"point 3 at 20\", 20, \"pin pin free\") without units", () => fx.shear(c("12 8"), c("point 3 at 20"), c(20), c("pin pin free")), 3],
    ["SHEAR(\"6\", \"udl 1\", -1e-14): a hair below 0 is 0", () => fx.shear(c("6"), c("udl 1"), c(-1e-14)), 3],
    ["SHEAR(\"6\", \"udl 1\", -1e-14, , , , \"length=ft, force=kip\"): the same rule with units", () => fx.shear(c("6"), c("udl 1"), c(-1e-14), none, none, none, c("length=ft, force=kip")), 3],
  ])("%s = %s", (_, f, expected) => {
    const got = outcome(f);
    expect(typeof got).toBe("number");
    expect(Math.abs((got as number) - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
  });

  test("SHEAR(\"9.9 9.8 0.7 9.6\", \"udl 1\", 20.4): the value just right of the interior support (5.8981, not -7.0095)", () => {
    const exact = exactForceMethodSolve(beam([9.9, 9.8, 0.7, 9.6], ["pin", "pin", "pin", "pin", "pin"], [udl(1, 0, 30)]));
    expect(exact.at("shear", 20.4, "right")).toBeCloseTo(5.8981, 4);
    const got = fx.shear(c("9.9 9.8 0.7 9.6"), c("udl 1"), c(20.4))[0][0] as number;
    expect(Math.abs(got - exact.at("shear", 20.4, "right"))).toBeLessThanOrEqual(1e-9 * 10);
  });

  test("INFLUENCE and MOVING accept the typed member end where the spans sum one unit short (35.099999999999994)", () => {
    const member = beam([9.6, 13.2, 12.3], ["fixed", 420, "pin", "free"], [], 49700);
    const exact = exactForceMethodSolve({ ...member, loads: [{ kind: "point", magnitude: 1, xStart: 35.1, xEnd: 35.1, magnitudeEnd: 1, loadCase: "", row: 1 }] });
    const got = fx.influence(c("9.6 13.2 12.3"), "reaction 1", c(35.1), c("fixed 420 pin free"), c(49700))[0][0] as number;
    expect(Math.abs(got - exact.reactions[0].force)).toBeLessThanOrEqual(1e-9);
    // One axle of 10 at the free end: the shear just left of the end is the whole axle (statics of the part right of the section).
    const moving = fx.moving(c("9.6 13.2 12.3"), c("10"), c(""), "shear at 35.1", c("fixed 420 pin free"), c(49700));
    expect(moving[0][0]).toBe("max");
    expect(Math.abs((moving[0][1] as number) - 10)).toBeLessThanOrEqual(1e-9 * 10);
    const shear = fx.shear(c("9.6 13.2 12.3"), c("point 1 at 35.1"), c(35.1), c("fixed 420 pin free"), c(49700))[0][0];
    expect(typeof shear).toBe("number");
  });

  test("results at nodes report the node's own x with units: REACTIONS x column and DIAGRAM stations are the typed positions", () => {
    const r = fx.reactions(c("1.1 1.9 3"), c("point 1 at 3; point 2 at 4.4"), none, c(1000), none, c("length=ft, force=kip, EI=kip*ft^2"));
    expect(r.map((row) => row[0])).toEqual([0, 1.1, 3, 6]);
    const d = fx.diagram(c("1.1 1.9 3"), c("point 1 at 3; point 2 at 4.4"), c(7), none, c(1000), none, c("length=ft, force=kip, EI=kip*ft^2"));
    const xs = d.map((row) => row[0]);
    for (const x of [0, 1.1, 3, 4.4, 6]) expect(xs).toContain(x);
    expect(xs.some((x) => typeof x === "number" && Math.abs(x - 3) < 1e-9 && x !== 3)).toBe(false);
  });
});

describe("members double precision answered wrongly or refused", () => {
  test.each([
    ["REACTIONS(\"0.05 8\", \"udl 1\", \"pin hinge fixed\", 50000)", "0.05 8", "pin hinge fixed", [[0, 0.025, 0], [0.05, 0, 0], [8.05, 8.025, -32.2]]],
    ["REACTIONS(\"0.03125 8\", \"udl 1\", \"pin hinge fixed\", 50000)", "0.03125 8", "pin hinge fixed", [[0, 0.015625, 0], [0.03125, 0, 0], [8.03125, 8.015625, -32.125]]],
    ["REACTIONS(\"6\", \"udl 1\", \"1e-9 1e-9\", 50000): a simple span on very soft springs", "6", "1e-9 1e-9", [[0, 3, 0], [6, 3, 0]]],
  ])("%s (hand statics)", (_, spans, supports, expected) => {
    const got = fx.reactions(c(spans), c("udl 1"), c(supports), c(50000));
    expect(got.length).toBe(expected.length);
    got.forEach((row, i) => row.forEach((v, j) => expect(Math.abs((v as number) - expected[i][j])).toBeLessThanOrEqual(1e-9 * 32.2)));
  });
});

describe("SPAN.SECTION at extreme dimensions: finite numbers or a coded #VALUE!", () => {
  test.each([
    ["rectangle 1e-200 1e-200", [[1e-200, 1e-200]], /#VALUE!: .*area .*too small/],
    ["rectangle 1e200 1e200", [[1e200, 1e200]], /#VALUE!: .*area .*too large/],
  ])("%s", (_, dims, message) => {
    expect(String(outcome(() => fx.section("rectangle", dims)))).toMatch(message);
  });

  test("rectangle 1e-70 1e-70: every row finite and positive (area 1e-140)", () => {
    const rows = fx.section("rectangle", [[1e-70, 1e-70]]);
    for (const row of rows) expect(Number.isFinite(row[1]) && (row[1] as number) >= 0).toBe(true);
    expect(Math.abs((rows[0][1] as number) / 1e-140 - 1)).toBeLessThan(1e-15);
  });
});

describe("the units path against the exact force method (300 seeded members in ft, kip and kip*in^2)", () => {
  // EI typed in kip*in^2 is EI/144 in kip*ft^2; deflection asked in inches is 12 x the ft value (NIST SP 811, 1 ft = 12 in).
  const members = fc.sample(auditMember("decimal"), { seed: 20261202, numRuns: 300 });
  const units = c("length=ft, force=kip, EI=kip*in^2, deflection=in");
  const text = (m: Member) => ({
    spans: c(m.spans.join(" ")),
    supports: c(m.supports.map((s) => (s.kind === "spring" ? String(s.stiffness) : s.kind)).join(" ")),
    EI: c((m.stiffness ?? [1]).map((ei) => ei * 144).join(" ")),
    loads: m.loads.map((l) => [l.kind, l.magnitude, l.xStart, l.kind === "udl" || l.kind === "linear" ? l.xEnd : "", l.kind === "linear" ? l.magnitudeEnd : "", ""]),
  });
  test("reactions, and V, M, slope, deflection at every typed node and load position, to 1e-9 of each quantity's own scale", () => {
    const off: string[] = [];
    members.forEach((m) => {
      const exact = exactForceMethodSolve(m);
      const t = text(m);
      const L = memberLength(m.spans);
      const xs = [...new Set([0, typed(L), ...exact.nodeX.map(typed), ...m.loads.map((l) => l.xStart)])];
      const column = xs.map((x) => [x]);
      const got = {
        shear: fx.shear(t.spans, t.loads, column, t.supports, t.EI, none, units),
        moment: fx.moment(t.spans, t.loads, column, t.supports, t.EI, none, units),
        slope: fx.slope(t.spans, t.loads, column, t.supports, t.EI, none, units),
        deflection: fx.deflection(t.spans, t.loads, column, t.supports, t.EI, none, units),
      };
      for (const q of ["shear", "moment", "slope", "deflection"] as const) {
        const factor = q === "deflection" ? 12 : 1;
        const want = xs.map((x) => exact.at(q, x) * factor);
        // A quantity zero at every station is judged against 1e-4 of its physical scale (as in tests/core/exact.test.ts).
        const scale = Math.max(...want.map(Math.abs), 1e-4 * scalesOf(m)[q] * factor);
        xs.forEach((x, i) => {
          const g = got[q][i][0] as number;
          if (!(Math.abs(g - want[i]) <= 1e-9 * scale)) off.push(`${JSON.stringify(t)} ${q}(${x}) = ${g}, exact ${want[i]}`);
        });
      }
      const r = fx.reactions(t.spans, t.loads, t.supports, t.EI, none, units);
      const scale = Math.max(...exact.reactions.map((e) => Math.abs(e.force)), 1e-4 * scalesOf(m).force);
      r.forEach((row, i) => {
        // The node's own x: the running sum of the spans as typed (within a unit of rounding of the exact sum).
        if (!(Math.abs((row[0] as number) - exact.nodeX[i]) <= 1e-15 * L)) off.push(`node ${i + 1} reported at x = ${row[0]}`);
        if (!(Math.abs((row[1] as number) - exact.reactions[i].force) <= 1e-9 * scale)) off.push(`${JSON.stringify(t)} R${i + 1} = ${row[1]}, exact ${exact.reactions[i].force}`);
      });
    });
    expect(off.slice(0, 5)).toEqual([]);
  });
});
