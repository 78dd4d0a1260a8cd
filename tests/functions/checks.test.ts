/**
 * SECTION, STRESS, SHEARSTRESS, DEFLECTIONCHECK, UTILISATION, CONVERT and STIFFNESS called as
 * the host calls them. The same invented member in US customary units, in SI with labels, and
 * in SI base units without labels must give the same physical answers. Conversion factors are
 * written out here from NIST SP 811 (2008), Appendix B (from memory): 1 ft = 0.3048 m,
 * 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N (0.45359237 kg x 9.80665 m/s^2), 1 kip = 1000 lbf.
 * Closed forms: simple span M = wL^2/8, deflection 5wL^4/(384EI) (handbook beam diagrams,
 * from memory); rectangle S = bh^2/6 (Roark, properties of plane areas, from memory).
 */
import fc from "fast-check";
import * as fx from "../../functions/functions";
import { LIMITS, tolerance } from "../../src/core";
import { isSheetSafe, thrown } from "./host";

const FT = 0.3048;
const IN = 0.0254;
const KIP = 4.4482216152605 * 1000;
const KSI_IN_MPA = KIP / (IN * IN) / 1e6;

const same = (a: unknown, b: number, rel = 1e-9) => {
  if (typeof a !== "number" || tolerance.relDiff(a, b) > rel) throw new Error(`got ${String(a)}, expected ${b}`);
};

/** An invented two-span floor beam, in kip and ft, with E = 29000 ksi and I = 510 in^4. */
const dims = [13.7, 6.73, 0.585, 0.35];
const us = {
  spans: [[20, 15]],
  loads: [
    ["udl", 1.2, "", "", "", "D"],
    ["point", 8, 10, "", "", "L"],
    ["moment", 5, 30, "", "", "L"],
    ["linear", 0, 22, 35, 0.6, "L"],
  ],
  EI: fx.stiffness([[29000]], [[510]], "ksi", "in^4", "kip*in^2"),
  section: fx.section("I", [[dims.join(" ")]], "in"),
  units: [["length=ft, force=kip, EI=kip*in^2, section=in, stress=ksi, deflection=in"]],
};
const si = {
  spans: [[20 * FT, 15 * FT]],
  loads: [
    ["udl", (1.2 * KIP) / FT / 1000, "", "", "", "D"],
    ["point", (8 * KIP) / 1000, 10 * FT, "", "", "L"],
    ["moment", (5 * KIP * FT) / 1000, 30 * FT, "", "", "L"],
    ["linear", 0, 22 * FT, 35 * FT, (0.6 * KIP) / FT / 1000, "L"],
  ],
  EI: fx.stiffness([[(29000 * KIP) / (IN * IN) / 1e9]], [[510 * (IN * 1000) ** 4]], "GPa", "mm^4", "kN*m^2"),
  section: fx.section("I", [dims.map((d) => d * 25.4)], "mm"),
  units: "length=m, force=kN, EI=kN*m^2, section=mm, stress=MPa, deflection=mm",
};
/** SI base units, no labels: N, m, N m^2, section in m. */
const base = {
  spans: si.spans,
  loads: si.loads.map((row) => row.map((cell, c) => (c === 1 || c === 4) && typeof cell === "number" ? cell * 1000 : cell)),
  EI: [[29000 * (KIP / (IN * IN)) * 510 * IN ** 4]],
  section: fx.section("I", [dims.map((d) => d * IN)], null),
};
const combo = "1.2D+1.6L";

describe("one member in US units, SI with labels and SI base units gives one physical answer", () => {
  test("SECTION: properties match after conversion (in^4 to mm^4, in^3 to mm^3)", () => {
    const byLabel = (t: unknown[][], label: string) => t.find((r) => r[0] === label)!;
    expect(byLabel(us.section, "Ix")[2]).toBe("in^4");
    expect(byLabel(si.section, "Sx top")[2]).toBe("mm^3");
    same(byLabel(si.section, "Ix")[1], (byLabel(us.section, "Ix")[1] as number) * 25.4 ** 4);
    same(byLabel(si.section, "Zx")[1], (byLabel(us.section, "Zx")[1] as number) * 25.4 ** 3);
    same(byLabel(base.section, "area")[1], (byLabel(us.section, "area")[1] as number) * IN * IN);
    expect(isSheetSafe(us.section)).toBe(true);
    expect(us.section).toHaveLength(16);
  });

  test("STIFFNESS: 29000 ksi x 510 in^4 in kip*in^2 is the product; in kN*m^2 the same physical value", () => {
    same(us.EI[0][0], 29000 * 510, 1e-14);
    same(si.EI[0][0], (29000 * 510 * KIP * IN * IN) / 1000, 1e-12);
  });

  test("STRESS: ksi x 6.894757 = MPa = Pa / 1e6, at the same x (ft x 0.3048 = m)", () => {
    const a = fx.stress(us.spans, us.loads, us.section, null as any, us.EI, combo, us.units);
    const b = fx.stress(si.spans, si.loads, si.section, null as any, si.EI, combo, si.units as any);
    const c = fx.stress(base.spans, base.loads, base.section, null as any, base.EI, combo, null as any);
    expect(a.map((r) => r[0])).toEqual(["top", "bottom"]);
    for (let r = 0; r < 2; r++) {
      for (const col of [1, 3]) {
        if (a[r][col] === 0) continue;
        same(b[r][col], (a[r][col] as number) * KSI_IN_MPA);
        same(c[r][col], (a[r][col] as number) * KSI_IN_MPA * 1e6);
      }
      for (const col of [2, 4]) {
        same(b[r][col], (a[r][col] as number) * FT);
        same(c[r][col], (a[r][col] as number) * FT);
      }
    }
    expect(a[1][1] as number).toBeGreaterThan(0);
    expect(isSheetSafe(a)).toBe(true);
  });

  test("SHEARSTRESS from the section tables and from A I Q t numbers", () => {
    const a = fx.shearStress(us.spans, us.loads, us.section, null as any, us.EI, combo, us.units);
    const b = fx.shearStress(si.spans, si.loads, si.section, null as any, si.EI, combo, si.units as any);
    const c = fx.shearStress(base.spans, base.loads, base.section, null as any, base.EI, combo, null as any);
    expect(a.map((r) => r[0])).toEqual(["average", "peak"]);
    for (let r = 0; r < 2; r++) {
      same(b[r][1], (a[r][1] as number) * KSI_IN_MPA);
      same(c[r][1], (a[r][1] as number) * KSI_IN_MPA * 1e6);
      same(b[r][2], (a[r][2] as number) * FT);
    }
    const get = (label: string) => us.section.find((r) => r[0] === label)![1] as number;
    const numbers = [[get("area"), get("Ix"), get("Qx"), get("width at axis")]];
    const d = fx.shearStress(us.spans, us.loads, numbers, null as any, us.EI, combo, us.units);
    same(d[1][1], a[1][1] as number);
    same(d[0][1], a[0][1] as number);
    const onlyArea = fx.shearStress(us.spans, us.loads, [[get("area")]], null as any, us.EI, combo, us.units);
    expect(onlyArea[1]).toEqual(["peak", "", ""]);
  });

  test("DEFLECTIONCHECK: deflection in x 25.4 = mm, ratios and verdicts equal; deflection agrees with SPAN.DEFLECTION", () => {
    const a = fx.deflectionCheck(us.spans, us.loads, [["L/360"]], null as any, us.EI, combo, us.units);
    const b = fx.deflectionCheck(si.spans, si.loads, [["L/360"]], null as any, si.EI, combo, si.units as any);
    const c = fx.deflectionCheck(base.spans, base.loads, [[360]], null as any, base.EI, combo, null as any);
    expect(a).toHaveLength(2);
    for (let r = 0; r < 2; r++) {
      expect(a[r][0]).toBe(r + 1);
      same(b[r][1], (a[r][1] as number) * FT);
      same(b[r][2], (a[r][2] as number) * 25.4);
      same(c[r][2], (a[r][2] as number) * IN);
      same(b[r][3], (a[r][3] as number) * FT);
      same(b[r][4], a[r][4] as number);
      same(c[r][4], a[r][4] as number);
      expect(b[r][6]).toBe(a[r][6]);
      expect(c[r].slice(5)).toEqual(a[r].slice(5));
      const direct = fx.deflection(base.spans, base.loads, [[c[r][3]]], null as any, base.EI, combo)[0][0] as number;
      same(direct, c[r][2] as number);
    }
  });

  test("UTILISATION and CONVERT across systems", () => {
    same(fx.utilisation([[100]], [[200]], "kip*ft", "kN*m")[0][0], (100 * KIP * FT) / 1000 / 200);
    same(fx.convertUnits([[1.2, -3]], "kip/ft", "kN/m")[0][1], (-3 * KIP) / FT / 1000);
    const row = fx.convertUnits([[1, ""]], "ft", "in")[0];
    same(row[0], 12, 1e-15);
    expect(row[1]).toBe("");
  });
});

describe("closed forms without units (consistent units, as before)", () => {
  test("simple span, rectangle: bottom stress (wL^2/8)/(bh^2/6), deflection ratio 384EI/(5wL^3)", () => {
    const [w, L, b, h, EI] = [10, 6, 0.2, 0.4, 30000];
    const section = fx.section("rectangle", [[b, h]], null);
    const s = fx.stress([[L]], [["udl", w]], section, null as any, null as any, null, null as any);
    same(s[1][1], (w * L * L) / 8 / ((b * h * h) / 6));
    same(s[0][3], -(w * L * L) / 8 / ((b * h * h) / 6));
    same(s[1][2], L / 2);
    const d = fx.deflectionCheck([[L]], [["udl", w]], [[240]], null as any, [[EI]], null, null as any);
    same(d[0][4], (384 * EI) / (5 * w * L ** 3));
    expect(d[0][6]).toBe((384 * EI) / (5 * w * L ** 3) >= 240 ? "pass" : "fail");
  });
});

describe("bad units and bad input give #VALUE! naming the argument", () => {
  const cases: [string, () => unknown, RegExp][] = [
    ["member length in kip", () => fx.stress(us.spans, us.loads, us.section, null as any, us.EI, combo, [["length=kip, force=kip"]]), /^units length: "kip" measures force, not length$/],
    ["EI in ksi", () => fx.deflectionCheck(us.spans, us.loads, [["L/360"]], null as any, us.EI, null, [["length=ft, force=kip, EI=ksi"]]), /^units EI: "ksi" measures force\/length\^2/],
    ["section unit ksi", () => fx.section("I", [dims], "ksi"), /^unit: "ksi" measures force\/length\^2, not length$/],
    ["section result unit in^2", () => fx.section("I", [dims], "in", "in^2"), /^result unit: "in\^2" measures length\^2, not length$/],
    ["convert ft to kN", () => fx.convertUnits([[1]], "ft", "kN"), /^to: "kN" measures force, but from "ft" measures length$/],
    ["convert unknown", () => fx.convertUnits([[1]], "ft", "yard"), /^to: unknown unit "yard"/],
    ["E unit in^4", () => fx.stiffness([[29000]], [[510]], "in^4", "ksi"), /^E unit: "in\^4" measures length\^4, not force\/length\^2$/],
    ["I unit only", () => fx.stiffness([[29000]], [[510]], null, "in^4"), /^E unit: give the units of both E and I/],
    ["utilisation units differ", () => fx.utilisation([[1]], [[2]], "kip*ft", "kN"), /^capacity unit: "kN" measures force, but demand unit "kip\*ft" measures force x length$/],
    ["table units without member units", () => fx.stress(us.spans, us.loads, us.section, null as any, us.EI, combo, null as any), /^units: the section table carries units \(in\^3\)/],
    ["limit", () => fx.deflectionCheck(us.spans, us.loads, [["L360"]], null as any, us.EI, null, us.units), /^limit: "L360" is not a deflection limit/],
    ["shape", () => fx.section("hexagon", [[1]]), /^shape: "hexagon" is not a shape/],
    ["dimension count", () => fx.section("tee", [[10, 5, 1]]), /^dimensions: a tee takes 4: d \(overall depth\), bf \(flange width\), tf \(flange thickness\), tw \(stem thickness\); got 3$/],
    ["wall too thick", () => fx.section("box", [["4 6 2"]], "in"), /^dimensions: box t: 4 must be less than half the width b/],
    ["section count", () => fx.stress(us.spans, us.loads, [[1, 2, 3]], null as any, null as any, null, null as any), /^section: give S \(one value\) or S top and S bottom/],
    ["negative S", () => fx.stress(us.spans, us.loads, [[-1]], null as any, null as any, null, null as any), /^section: S top must be a positive number, got -1/],
    ["capacity zero", () => fx.utilisation([[1]], [[0]]), /^capacity: must be a positive number, got 0/],
  ];
  test.each(cases)("%s", (_name, call, message) => {
    const e = thrown(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });

  // One past the cells limit (LIMITS.cells, src/core/limits.ts) is refused naming the argument; at it, every cell is answered.
  const column = (n: number, value: number) => Array.from({ length: n }, () => [value]);
  const over = LIMITS.cells + 1;
  test.each([
    ["UTILISATION demand", () => fx.utilisation(column(over, 1), [[2]]), `demand: at most ${LIMITS.cells} cells, got ${over}`],
    ["UTILISATION capacity", () => fx.utilisation([[1]], column(over, 2)), `capacity: at most ${LIMITS.cells} cells, got ${over}`],
    ["CONVERT value", () => fx.convertUnits(column(over, 1), "ft", "m"), `value: at most ${LIMITS.cells} cells, got ${over}`],
    ["STIFFNESS E", () => fx.stiffness(column(over, 29000), [[510]]), `E: at most ${LIMITS.cells} cells, got ${over}`],
    ["STIFFNESS I", () => fx.stiffness([[29000]], column(over, 510)), `I: at most ${LIMITS.cells} cells, got ${over}`],
  ])("%s: one cell past the limit is #VALUE! naming it", (_name, call, message) => {
    const e = thrown(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toBe(message);
  });

  test.each([
    ["UTILISATION", () => fx.utilisation(column(LIMITS.cells, 1), column(LIMITS.cells, 4)), 0.25],
    ["CONVERT", () => fx.convertUnits(column(LIMITS.cells, 1), "ft", "in"), 12],
    ["STIFFNESS", () => fx.stiffness(column(LIMITS.cells, 3), column(LIMITS.cells, 5)), 15],
  ])("%s at the cells limit answers every cell", (_name, call, expected) => {
    const rows = call() as number[][];
    expect(LIMITS.cells).toBe(10001);
    expect(rows).toHaveLength(LIMITS.cells);
    expect(rows[LIMITS.cells - 1][0]).toBeCloseTo(expected, 12);
  });

  test("deflection check without EI is #N/A", () => {
    expect(thrown(() => fx.deflectionCheck(us.spans, us.loads, [["L/360"]], null as any, null as any, null, null as any)).code).toBe("#N/A");
  });
});

describe("fuzzed arguments: a sheet-safe result or a #VALUE!/#N/A error with a message of ours, never anything else", () => {
  const cell = fc.oneof(
    fc.constantFrom<unknown>(null, "", 0, "#N/A", "L/360", "kip/ft", "length=ft, force=kip", "ksi", "in^4", "I", "tee", "udl 2", "6 8", "pin pin pin", "1e400", "-3", true),
    fc.double({ noNaN: false }),
    fc.string({ maxLength: 8 }),
  );
  const range = fc.oneof(cell, fc.array(fc.array(cell, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 3 }));
  const calls: [string, (a: unknown[]) => unknown[][]][] = [
    ["section", (a) => fx.section(a[0], a[1] as any, a[2], a[3])],
    ["stress", (a) => fx.stress(a[0] as any, a[1] as any, a[2] as any, a[3] as any, a[4] as any, a[5], a[6] as any)],
    ["shearStress", (a) => fx.shearStress(a[0] as any, a[1] as any, a[2] as any, a[3] as any, a[4] as any, a[5], a[6] as any)],
    ["deflectionCheck", (a) => fx.deflectionCheck(a[0] as any, a[1] as any, a[2] as any, a[3] as any, a[4] as any, a[5], a[6] as any)],
    ["utilisation", (a) => fx.utilisation(a[0] as any, a[1] as any, a[2], a[3])],
    ["convertUnits", (a) => fx.convertUnits(a[0] as any, a[1], a[2])],
    ["stiffness", (a) => fx.stiffness(a[0] as any, a[1] as any, a[2], a[3], a[4])],
  ];
  test.each(calls)("%s", (_name, call) => {
    fc.assert(
      fc.property(fc.array(range, { minLength: 7, maxLength: 7 }), (args) => {
        try {
          return isSheetSafe(call(args));
        } catch (e) {
          const code = (e as { code?: unknown }).code;
          const message = (e as { message?: unknown }).message;
          return (code === "#VALUE!" || code === "#N/A") && typeof message === "string" && !message.startsWith("unexpected problem");
        }
      }),
      { seed: 11, numRuns: 150 },
    );
  });
});
