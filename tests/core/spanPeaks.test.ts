/**
 * Peaks per span (src/core/spanPeaks.ts) against closed forms, and invariants: each span's
 * peaks agree with the member's global extremes where they coincide, the hogging moment at an
 * interior support is the smallest moment of both adjacent spans.
 * Closed forms (steel construction manual, beam diagrams and formulas — from memory):
 * two equal spans, uniform load on both: M support = -wL^2/8, M max = 9wL^2/128 at 3L/8 from
 * the end support, V = 5wL/8 beside the middle support; the largest deflection wL^4/(185 EI)
 * (more exactly at x = 0.4215 L) as a propped cantilever, case 12. A simple span with a point
 * load P at a: M = P a b / L at a, V = P b / L, deflection peak at x = sqrt((L^2 - b^2)/3) for a > b.
 */
import { extremes, pieceList, solve, spanPeaks, spanSolution, signedPeak } from "../../src/core";
import { beam, point, udl } from "./kit/members";

const rel = (a: number, b: number, scale = Math.abs(b)) => Math.abs(a - b) / (scale || 1);
const TOL = 1e-9;

describe("two equal spans under a uniform load (SCM, two equal spans / propped cantilever case 12, from memory)", () => {
  const [L, w, EI] = [6, 2.5, 3e4];
  const peaks = spanPeaks(solve(beam([L, L], ["pin", "pin", "pin"], [udl(w, 0, 2 * L)], EI)));
  const xPeak = (L * (1 + Math.sqrt(33))) / 16;
  const deflection = (w * xPeak * (L ** 3 - 3 * L * xPeak * xPeak + 2 * xPeak ** 3)) / (48 * EI);
  test.each([
    ["span number", (i: number) => peaks[i].span, (i: number) => i + 1],
    ["length", (i: number) => peaks[i].length, () => L],
    ["largest M = 9wL^2/128", (i: number) => peaks[i].momentMax, () => (9 * w * L * L) / 128],
    ["x of largest M", (i: number) => peaks[i].xMomentMax, (i: number) => (i === 0 ? (3 * L) / 8 : 2 * L - (3 * L) / 8)],
    ["smallest M = -wL^2/8 (the middle support)", (i: number) => peaks[i].momentMin, () => (-w * L * L) / 8],
    ["x of smallest M", (i: number) => peaks[i].xMomentMin, () => L],
    ["largest |V| = 5wL/8 beside the middle support", (i: number) => peaks[i].shear, (i: number) => (i === 0 ? (-5 * w * L) / 8 : (5 * w * L) / 8)],
    ["x of largest |V|", (i: number) => peaks[i].xShear, () => L],
    ["largest deflection", (i: number) => peaks[i].deflection, () => deflection],
    ["x of largest deflection", (i: number) => peaks[i].xDeflection, (i: number) => (i === 0 ? xPeak : 2 * L - xPeak)],
  ])("%s", (_name, got, expected) => {
    for (const i of [0, 1]) expect(rel(got(i), expected(i), w * L * L)).toBeLessThan(TOL);
  });
});

describe("a simple span with an off-centre point load (SCM case 8, from memory)", () => {
  const [L, P, a, EI] = [10, 12, 6.5, 5e4];
  const b = L - a;
  const [peak] = spanPeaks(solve(beam([L], ["pin", "pin"], [point(P, a)], EI)));
  test("M = P a b / L at a; smallest M 0; |V| = P a / L (the larger, right of the load)", () => {
    expect(rel(peak.momentMax, (P * a * b) / L)).toBeLessThan(TOL);
    expect(rel(peak.xMomentMax, a)).toBeLessThan(TOL);
    expect(peak.momentMin).toBe(0);
    expect(rel(peak.shear, (-P * a) / L)).toBeLessThan(TOL);
    expect(peak.xShear).toBeGreaterThanOrEqual(a - 1e-12);
  });
  test("deflection peak P b (L^2 - b^2)^(3/2) / (9 sqrt(3) L EI) at x = sqrt((L^2 - b^2)/3)", () => {
    expect(rel(peak.xDeflection, Math.sqrt((L * L - b * b) / 3))).toBeLessThan(TOL);
    expect(rel(peak.deflection, (P * b * (L * L - b * b) ** 1.5) / (9 * Math.sqrt(3) * L * EI))).toBeLessThan(TOL);
  });
});

describe("invariants", () => {
  const member = beam([4, 7, 3, 5], ["fixed", "pin", 900, "hinge", "pin"], [udl(3, 0, 19), point(20, 9), point(-4, 13.5)], 2e4);
  const solution = solve(member);
  const peaks = spanPeaks(solution);
  test("one row per span; the spans' extremes bound the member's, and the member's are attained in some span", () => {
    expect(peaks.map((p) => p.span)).toEqual([1, 2, 3, 4]);
    const m = extremes(solution, "moment");
    expect(Math.max(...peaks.map((p) => p.momentMax))).toBe(m.max);
    expect(Math.min(...peaks.map((p) => p.momentMin))).toBe(m.min);
    const d = signedPeak(extremes(solution, "deflection"));
    expect(peaks.some((p) => p.deflection === d.value)).toBe(true);
  });
  test("the moment at a shared node is within both adjacent spans' ranges", () => {
    for (let i = 0; i + 1 < peaks.length; i++) {
      const x = solution.nodeX[i + 1];
      const at = pieceList(solution.pieces).find((p) => Math.abs(p.x0 - x) < 1e-12)!.moment0;
      for (const p of [peaks[i], peaks[i + 1]]) {
        expect(at).toBeLessThanOrEqual(p.momentMax + 1e-9);
        expect(at).toBeGreaterThanOrEqual(p.momentMin - 1e-9);
      }
    }
  });
  test("the single sweep picks each span's pieces as filtering by position does", () => {
    const many = beam([4, 7, 3, 5, 2], ["fixed", "pin", 900, "hinge", "pin", "free"], [udl(3, 0, 21), point(20, 9), point(-4, 13.5), point(5, 11), point(2, 4)], 2e4);
    const s = solve(many);
    spanPeaks(s).forEach((p, i) => {
      const alone = spanSolution(s, i);
      const m = extremes(alone, "moment");
      expect([p.momentMax, p.xMomentMax, p.momentMin, p.xMomentMin]).toEqual([m.max, m.xMax, m.min, m.xMin]);
      expect(p.shear).toBe(signedPeak(extremes(alone, "shear")).value);
    });
  });
  test("without EI the deflection is NaN (shown blank by the sheet)", () => {
    const [p] = spanPeaks(solve(beam([5], ["pin", "pin"], [udl(1, 0, 5)])));
    expect(p.deflection).toBeNaN();
  });
  test("signedPeak: equal magnitudes take the leftmost", () => {
    expect(signedPeak({ max: 5, xMax: 3, min: -5, xMin: 1 })).toEqual({ value: -5, x: 1 });
    expect(signedPeak({ max: 5, xMax: 1, min: -5, xMin: 3 })).toEqual({ value: 5, x: 1 });
    expect(signedPeak({ max: 4, xMax: 1, min: -5, xMin: 3 })).toEqual({ value: -5, x: 3 });
  });
});
