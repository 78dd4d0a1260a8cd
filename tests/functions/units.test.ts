/**
 * The analysis functions with the optional units argument: a member described in US units
 * and the same member in SI give the same physical answers. Conversion factors from NIST SP
 * 811 (2008), appendix B (from memory): 1 ft = 0.3048 m and 1 in = 0.0254 m exactly;
 * 1 lbf = 4.4482216152605 N exactly (0.45359237 kg x 9.80665 m/s^2); 1 kip = 1000 lbf.
 */
import { deflection, diagram, extremes, maxMoment, moment, reactions, shear } from "../../functions/functions";
import { relDiff } from "../../src/core/tolerance";

const FT = 0.3048;
const IN = 0.0254;
const KIP = 4448.2216152605; // N

const US = "length=ft, force=kip, EI=kip*in^2, deflection=in";
const SI = "length=m, force=kN, EI=kN*m^2, deflection=mm";
const spanFt = 20;
const wKipFt = 1.5;
const pointKip = 6;
const EIkipIn2 = 29000 * 510; // E = 29,000 ksi, I = 510 in^4
const usLoads = [[`udl ${wKipFt} D; point ${pointKip} at 8 L`]];
const siLoads = [[`udl ${(wKipFt * KIP) / 1000 / FT} D; point ${(pointKip * KIP) / 1000} at ${8 * FT} L`]];
const siSpan = [[spanFt * FT]];
const siEI = [[(EIkipIn2 * KIP * IN * IN) / 1000]];
const none = null as any;

const close = (a: number, b: number, rel = 1e-12) => expect(relDiff(a, b, 0)).toBeLessThan(rel);

describe("the units argument of the analysis functions", () => {
  it("simple span in ft, kip/ft and kip*in^2: midspan moment and deflection against closed forms in inches (independent)", () => {
    // Closed forms (simple beam, uniform load plus a point load; steel construction manual beam
    // diagrams, from memory), evaluated here in inches and kips.
    const L = spanFt * 12;
    const w = wKipFt / 12;
    const a = 8 * 12;
    const b = L - a;
    const x = L / 2;
    const mExpected = (w * x * (L - x)) / 2 + (pointKip * a * (L - x)) / L; // kip*in, x >= a
    const dUdl = (w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * EIkipIn2);
    const dPoint = (pointKip * a * (L - x) * (2 * L * x - x * x - a * a)) / (6 * EIkipIn2 * L); // x >= a
    expect(b).toBeGreaterThan(0);
    close(moment([[spanFt]], usLoads, [[10]], none, [[EIkipIn2]], null, [[US]])[0][0] as number, mExpected / 12);
    close(deflection([[spanFt]], usLoads, [[10]], none, [[EIkipIn2]], null, [[US]])[0][0] as number, dUdl + dPoint);
  });

  it("the same member in SI gives the same physical results (reactions, shear, moment, deflection, peaks, diagram)", () => {
    const usR = reactions([[spanFt]], usLoads, none, [[EIkipIn2]], null, [[US]]);
    const siR = reactions(siSpan, siLoads, none, siEI, null, [[SI]]);
    usR.forEach((row, i) => {
      close(row[0] * FT, siR[i][0]);
      close((row[1] * KIP) / 1000, siR[i][1]);
    });
    const xs = [[0, 4, 8, 12.5, 20]];
    const siXs = [xs[0].map((v) => v * FT)];
    const usV = shear([[spanFt]], usLoads, xs, none, [[EIkipIn2]], null, [[US]])[0] as number[];
    const siV = shear(siSpan, siLoads, siXs, none, siEI, null, [[SI]])[0] as number[];
    usV.forEach((v, i) => close((v * KIP) / 1000, siV[i], 1e-11));
    const usD = deflection([[spanFt]], usLoads, xs, none, [[EIkipIn2]], null, [[US]])[0] as number[];
    const siD = deflection(siSpan, siLoads, siXs, none, siEI, null, [[SI]])[0] as number[];
    usD.forEach((d, i) => (d === 0 ? expect(siD[i]).toBe(0) : close(d * 25.4, siD[i], 1e-11)));
    const usM = maxMoment([[spanFt]], usLoads, none, [[EIkipIn2]], null, [[US]]);
    const siM = maxMoment(siSpan, siLoads, none, siEI, null, [[SI]]);
    close((usM[0][0] * KIP * FT) / 1000, siM[0][0]);
    close(usM[0][1] * FT, siM[0][1]);
    const usE = extremes([[spanFt]], usLoads, none, [[EIkipIn2]], null, [[US]]);
    const siE = extremes(siSpan, siLoads, none, siEI, null, [[SI]]);
    close((usE[3][1] as number) * 25.4, siE[3][1] as number);
    close((usE[3][2] as number) * FT, siE[3][2] as number);
    const usDiagram = diagram([[spanFt]], usLoads, 5, none, [[EIkipIn2]], null, [[US]]);
    const siDiagram = diagram(siSpan, siLoads, 5, none, siEI, null, [[SI]]);
    expect(usDiagram.length).toBe(siDiagram.length);
    usDiagram.forEach((row, i) => {
      close((row[0] as number) * FT, siDiagram[i][0] as number, 1e-11);
      if (row[2] !== 0) close(((row[2] as number) * KIP * FT) / 1000, siDiagram[i][2] as number, 1e-11);
    });
  });

  it("without units the member is in consistent units: kip and inch give the same as the labelled call", () => {
    const inLoads = [[`udl ${wKipFt / 12} D; point ${pointKip} at 96 L`]];
    const plain = deflection([[240]], inLoads, [[120]], none, [[EIkipIn2]], null, none)[0][0] as number;
    const labelled = deflection([[spanFt]], usLoads, [[10]], none, [[EIkipIn2]], null, [[US]])[0][0] as number;
    close(plain, labelled);
  });

  it.each([
    ["a force unit for length", "length=kip, force=kip", /units length: "kip" measures force, not length/],
    ["a missing force unit", "length=ft", /units: give both length and force/],
    ["an unknown key", "length=ft, force=kip, colour=red", /units: unknown key "colour"/],
  ])("%s is #VALUE! naming the argument", (_name, text, message) => {
    let error: { code?: string; message?: string } = {};
    try {
      moment([[spanFt]], usLoads, [[10]], none, none, null, [[text]]);
    } catch (e) {
      error = e as typeof error;
    }
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(message);
  });

  it("x beyond the member is named in the user's length unit", () => {
    expect(() => moment([[spanFt]], usLoads, [[21]], none, none, null, [[US]])).toThrow(/x = 21 is outside the member, which runs from 0 to 20$/);
  });
});
