/**
 * Support settlement (`settle` load rows) and shear deformation (`shear` after EI), called as
 * the host calls the functions: table and text forms, units, combinations, case reactions,
 * studies, and the refusals. The core closed forms (with their sources) are in
 * tests/core/settlement.test.ts and tests/core/shearDeformation.test.ts; the values here are
 * the same closed forms: two equal spans with the middle support settling Δ (middle reaction
 * -6EIΔ/L³, derived from the simple-span central-load deflection PL³/48EI, standard handbook
 * formula) and a simple span under UDL with shear deformation (5wL⁴/384EI + wL²/8GA,
 * Timoshenko beam theory, from memory; re-derived in the core test).
 */
import * as fx from "../../functions/functions";
import { thrown } from "./host";

const EI = 1.2e4;
const L = 6;
const D = 0.01;
const near = (got: unknown, want: number, scale: number): void => {
  expect(typeof got).toBe("number");
  expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-9 * scale);
};
const message = (call: () => unknown): string => {
  const e = thrown(call);
  expect(e.code).toBe("#VALUE!");
  return e.message;
};

describe("settlement through the functions", () => {
  const P = (6 * EI * D) / L ** 3;

  test.each([
    ["text form", [["settle 0.01 at 6 SD"]]],
    ["table form", [["settle", 0.01, 6, "", "", "SD"]]],
  ])("%s: two equal spans, middle support settling Δ: R = -6EIΔ/L³, ends 3EIΔ/L³, deflection Δ at the node", (_name, loads) => {
    const r = fx.reactions([["6 6"]], loads as any[][], null as any, [[EI]]);
    near(r[1][1], -P, P);
    near(r[0][1], P / 2, P);
    near(fx.deflection([["6 6"]], loads as any[][], [[6]], null as any, [[EI]])[0][0], D, D);
  });

  test("units: Δ in the deflection unit (mm), EI in kN*m^2: the same reactions in kN", () => {
    const units = [["length=m, force=kN, deflection=mm"]];
    const r = fx.reactions([["6 6"]], [["settle 10 at 6 SD"]], null as any, [[EI]], null, units);
    near(r[1][1], -P, P);
    near(fx.deflection([["6 6"]], [["settle 10 at 6 SD"]], [[6]], null as any, [[EI]], null, units)[0][0], 10, 10);
  });

  test("a combination factors the settlement; CASEREACTIONS gives it a column of its own", () => {
    const loads = [["udl 2 D; settle 0.01 at 6 SD"]];
    const both = fx.reactions([["6 6"]], loads, null as any, [[EI]], "1.2D+1.5SD");
    const byCase = fx.caseReactions([["6 6"]], loads, null as any, [[EI]]);
    // rows: x, then one column per case in first-use order (D, SD).
    near(byCase[1][2], -P, P);
    near(both[1][1], 1.2 * byCase[1][1] + 1.5 * byCase[1][2], 100);
  });

  test("PEAKS and ENVELOPE take the settlement as a case; a patterned live case refuses one", () => {
    const loads = [["udl 2 D; udl 3 L; settle 0.01 at 6 SD"]];
    const peaks = fx.peaks([["6 6"]], loads, [["1.2D+1.6L+1.2SD"]], null as any, [[EI]], "standard");
    expect(peaks.length).toBeGreaterThan(0);
    const patterned = [["udl 2 D; udl 3 L; settle 0.01 at 6 L"]];
    expect(message(() => fx.peaks([["6 6"]], patterned, [["1.2D+1.6L"]], null as any, [[EI]], "standard"))).toMatch(
      /^load row 3: a settlement belongs to a support, not to a span, so it cannot be arranged span by span/,
    );
  });

  test.each([
    ["not at a node", [["udl 1; settle 0.01 at 4"]], [[EI]], /^load row 2: a settlement belongs at a support node; x = 4 is not a node/],
    ["without EI", [["settle 0.01 at 6"]], null, /^load row 1: the forces from a settlement depend on the real EI/],
    ["x end given", [["settle", 0.01, 6, 7]], [[EI]], /^load row 1, column 4 \(x end\): 7 given, but a settlement acts at x start only/],
    ["beyond the member", [["settle 0.01 at 13"]], [[EI]], /^load 1 of the loads text \(x start\): 13 is beyond the member end 12/],
  ])("refused: %s", (_name, loads, ei, pattern) => {
    expect(message(() => fx.reactions([["6 6"]], loads as any[][], null as any, ei as any))).toMatch(pattern);
  });

  test("FREQUENCIES refuses a settlement among the loads that give the mass", () => {
    expect(message(() => fx.frequencies([["6 6"]], [[EI]], null as any, 1, null as any, [["udl 2; settle 0.01 at 6"]], null, null as any, 9.81))).toMatch(
      /^load row 2: a settlement carries no mass/,
    );
  });
});

describe("shear deformation through the functions", () => {
  const GA = 5e3;
  const w = 2.5;
  const want = (5 * w * L ** 4) / (384 * EI) + (w * L * L) / (8 * GA);

  test.each([
    ["one text cell", [["1.2e4 shear 5e3"]]],
    ["a range with a blank cell beyond the one span", [["1.2e4 shear 5e3", ""]]],
  ])("%s: simple span UDL, mid-span deflection 5wL⁴/384EI + wL²/8GA", (_name, ei) => {
    near(fx.deflection([[L]], [["udl 2.5"]], [[3]], null as any, ei as any)[0][0], want, want);
  });

  test("units: GA in the force unit (kip), EI in kip*in^2, deflection in inches", () => {
    const units = [["length=ft, force=kip, EI=kip*in^2, deflection=in"]];
    const eiIn = EI * 144; // kip*ft^2 -> kip*in^2
    const got = fx.deflection([[L]], [["udl 2.5"]], [[3]], null as any, [[`${eiIn} shear ${GA}`]], null, units)[0][0];
    near(got, want * 12, want * 12);
  });

  test("slope at the end is the rotation of the section, wL³/24EI, unchanged by shear", () => {
    const s = fx.slope([[L]], [["udl 2.5"]], [[0]], null as any, [["1.2e4 shear 5e3"]])[0][0];
    near(s, (w * L ** 3) / (24 * EI), (w * L ** 3) / (24 * EI));
  });

  test("an indeterminate member redistributes: propped cantilever UDL, prop reaction wL(3 + φ)/(2(4 + φ))", () => {
    const phi = (12 * EI) / (GA * L * L);
    const r = fx.reactions([[L]], [["udl 2.5"]], [["fixed pin"]], [["1.2e4 shear 5e3"]]);
    near(r[1][1], (w * L * (3 + phi)) / (2 * (4 + phi)), w * L);
  });

  test("EXTREMES and DIAGRAM carry the shear deflection", () => {
    const ex = fx.extremes([[L]], [["udl 2.5"]], null as any, [["1.2e4 shear 5e3"]]);
    const row = ex.find((r) => r[0] === "deflection")!;
    near(row[1], want, want);
  });

  test.each([
    ["shear of 0", [["1.2e4 shear 0"]], /^EI entry 1: shear must be followed by a positive shear stiffness/],
    ["shear without EI", [["shear 5e3"]], /^EI entry 1: "shear" must follow an EI value/],
  ])("refused: %s", (_name, ei, pattern) => {
    expect(message(() => fx.deflection([[L]], [["udl 2.5"]], [[3]], null as any, ei as any))).toMatch(pattern);
  });

  test("FREQUENCIES and MODESHAPE refuse a shear stiffness (Euler-Bernoulli only)", () => {
    const pattern = /^EI: natural frequencies are computed for Euler-Bernoulli spans only/;
    expect(message(() => fx.frequencies([[L]], [["1.2e4 shear 5e3"]], [[1]], 1))).toMatch(pattern);
    expect(message(() => fx.modeShape([[L]], [["1.2e4 shear 5e3"]], [[1]], 1, [[3]]))).toMatch(pattern);
  });
});
