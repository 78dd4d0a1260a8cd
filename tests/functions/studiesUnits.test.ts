/**
 * The units argument of the load-arrangement functions (ENVELOPE, PEAKS, INFLUENCE, MOVING): a
 * member written in ft, kip and kip*in^2 (deflection in inches) against the same member written
 * in metres, newtons and N*m^2 without units, converted here by hand. Conversion factors from
 * NIST SP 811 (2008), appendix B (from memory): 1 ft = 0.3048 m and 1 in = 0.0254 m exactly;
 * 1 kip = 1000 lbf = 4448.2216152605 N exactly.
 */
import { envelope, influence, moving, peaks } from "../../functions/functions";
import { relDiff } from "../../src/core/tolerance";

const FT = 0.3048;
const IN = 0.0254;
const KIP = 4448.2216152605; // N
const TOL = 1e-9;

const US = [["length=ft, force=kip, EI=kip*in^2, deflection=in"]];
const usSpans = [[20, 24]];
const siSpans = [usSpans[0].map((s) => s * FT)];
const usEI = [[29000 * 510, 29000 * 800]];
const siEI = [usEI[0].map((ei) => ei * KIP * IN * IN)];
// A spring at the right end (kip/ft, N/m) so the conversion of every input is exercised.
const usSupports = [["pin", "pin", 60]];
const siSupports = [["pin", "pin", (60 * KIP) / FT]];
const usLoads = [["udl 1.2 D; udl 0.8 L; point 9 at 30 L; moment 15 at 8 D"]];
const siLoads = [[`udl ${(1.2 * KIP) / FT} D; udl ${(0.8 * KIP) / FT} L; point ${9 * KIP} at ${30 * FT} L; moment ${15 * KIP * FT} at ${8 * FT} D`]];
const combos = [["1.2D+1.6L"], ["0.9D"], ["1.4D"]];
const none = null as any;

/** Each value (after conversion) within TOL of the SI one, on the scale of the SI series. */
function expectSame(converted: number[], si: number[]): void {
  expect(converted).toHaveLength(si.length);
  const scale = Math.max(...si.map(Math.abs));
  expect(scale).toBeGreaterThan(0);
  converted.forEach((v, i) => expect(relDiff(v, si[i], scale)).toBeLessThan(TOL));
}

const num = (v: unknown) => v as number;

describe("SPAN.ENVELOPE with units", () => {
  const usX = [[0], [5], [10], [20], [31], [44]];
  const siX = usX.map((r) => [r[0] * FT]);
  it.each([
    ["moment", KIP * FT],
    ["shear", KIP],
    ["deflection", IN],
  ])("%s: the US envelope converted equals the SI one, with the same governing combinations", (quantity, factor) => {
    const us = envelope(usSpans, usLoads, usX, combos, usSupports, usEI, quantity, "full L", none, US);
    const si = envelope(siSpans, siLoads, siX, combos, siSupports, siEI, quantity, "full L", none, none);
    expectSame(us.map((r) => num(r[0]) * FT), si.map((r) => num(r[0])));
    expectSame(us.map((r) => num(r[1]) * factor), si.map((r) => num(r[1])));
    expectSame(us.map((r) => num(r[3]) * factor), si.map((r) => num(r[3])));
    expect(us.map((r) => [r[2], r[4]])).toEqual(si.map((r) => [r[2], r[4]]));
  });
});

describe("SPAN.PEAKS with units", () => {
  it("shear, moment, slope and deflection peaks and their x convert to the SI ones", () => {
    const us = peaks(usSpans, usLoads, combos, usSupports, usEI, "standard L", none, US);
    const si = peaks(siSpans, siLoads, combos, siSupports, siEI, "standard L", none, none);
    expect(us.map((r) => r[0])).toEqual(["shear", "moment", "slope", "deflection"]);
    const factor: Record<string, number> = { shear: KIP, moment: KIP * FT, slope: 1, deflection: IN };
    us.forEach((row, i) => {
      const f = factor[row[0] as string];
      expectSame([num(row[1]) * f, num(row[4]) * f], [num(si[i][1]), num(si[i][4])]);
      expectSame([num(row[2]) * FT, num(row[5]) * FT], [num(si[i][2]), num(si[i][5])]);
      expect([row[3], row[6]]).toEqual([si[i][3], si[i][6]]);
    });
  });
});

describe("SPAN.INFLUENCE with units: the unit load is one force unit", () => {
  const usPositions = [[0, 3, 7.5, 12, 20, 26, 33, 44]];
  const siPositions = [usPositions[0].map((p) => p * FT)];
  it.each([
    // reaction and shear per unit force: no unit; moment per unit force: a length; deflection: in/kip against m/N
    ["reaction 2", "reaction 2", 1],
    ["moment reaction 1", "moment reaction 1", FT],
    ["shear at 9", `shear at ${9 * FT}`, 1],
    ["moment at 8", `moment at ${8 * FT}`, FT],
    ["deflection at 30", `deflection at ${30 * FT}`, IN / KIP],
  ])("%s", (usEffect, siEffect, factor) => {
    const supportsUs = usEffect.startsWith("moment reaction") ? [["fixed", "pin", 60]] : usSupports;
    const supportsSi = usEffect.startsWith("moment reaction") ? [["fixed", "pin", (60 * KIP) / FT]] : siSupports;
    const us = influence(usSpans, usEffect, usPositions, supportsUs, usEI, US)[0].map(num);
    const si = influence(siSpans, siEffect, siPositions, supportsSi, siEI, none)[0].map(num);
    expectSame(us.map((v) => v * factor), si);
  });
  it("a deflection unit other than the length unit scales only deflection ordinates", () => {
    const feet = influence(usSpans, "deflection at 30", usPositions, usSupports, usEI, [["length=ft, force=kip, EI=kip*in^2"]])[0].map(num);
    const inches = influence(usSpans, "deflection at 30", usPositions, usSupports, usEI, US)[0].map(num);
    expectSame(inches.map((v) => v / 12), feet);
    const m1 = influence(usSpans, "moment at 8", usPositions, usSupports, usEI, [["length=ft, force=kip, EI=kip*in^2"]])[0].map(num);
    const m2 = influence(usSpans, "moment at 8", usPositions, usSupports, usEI, US)[0].map(num);
    expect(m2).toEqual(m1);
  });
});

describe("SPAN.MOVING with units", () => {
  it.each([
    ["absolute moment", "absolute moment", KIP * FT],
    ["moment at 10", `moment at ${10 * FT}`, KIP * FT],
    ["reaction 2", "reaction 2", KIP],
    ["deflection at 30", `deflection at ${30 * FT}`, IN],
  ])("%s: value, train position and section convert to the SI ones", (usEffect, siEffect, factor) => {
    const us = moving(usSpans, [[8, 32, 32]], [[14, 14]], usEffect, usSupports, usEI, US);
    const si = moving(siSpans, [[8 * KIP, 32 * KIP, 32 * KIP]], [[14 * FT, 14 * FT]], siEffect, siSupports, siEI, none);
    expectSame(us.map((r) => num(r[1]) * factor), si.map((r) => num(r[1])));
    expectSame(us.map((r) => num(r[2]) * FT), si.map((r) => num(r[2])));
    expectSame(us.map((r) => num(r[4]) * FT), si.map((r) => num(r[4])));
    expect(us.map((r) => [r[0], r[3]])).toEqual(si.map((r) => [r[0], r[3]]));
  });
});

describe("the units argument of the studies is checked like the analysis functions'", () => {
  it("a bad units text is a #VALUE! naming it", () => {
    let error: any;
    try {
      influence(usSpans, "reaction 1", [[3]], none, none, [["length=ft, force=furlong"]]);
    } catch (e) {
      error = e;
    }
    expect(error?.code).toBe("#VALUE!");
    expect(String(error?.message)).toMatch(/furlong/);
  });
});
