/**
 * Checks against stated values. Outside values: classic beam-table formulas (simple span
 * under uniform load: M = wL^2/8, deflection 5wL^4/(384EI); cantilever tip 1 wL^4/(8EI);
 * beam fixed at one end and propped at the other under uniform load: deflection
 * w x (L^3 - 3 L x^2 + 2 x^3)/(48 EI), largest at x = (1 + sqrt 33) L/16 from the propped
 * end: the same curve as each span of two equal continuous spans) — standard handbook beam
 * diagrams, from memory.
 *
 * Deflection limits such as L/360 and L/240 are the engineer's to state. For reference (from
 * memory, not checked against the book): the International Building Code's table of
 * deflection limits (Table 1604.3 in its 2015-2021 editions) gives floor members L/360 under
 * live load and L/240 under dead plus live load, and for cantilevers takes L as twice the
 * cantilever's length. The tests only use such numbers as examples.
 */
import {
  averageShearStress,
  bendingStress,
  deflectionRatio,
  extremes,
  fibreStresses,
  largestMagnitude,
  parseDeflectionLimit,
  peakShearStress,
  solve,
  spanDeflections,
  tolerance,
  utilisation,
} from "../../src/core";
import { member, udl } from "./kit/members";
import { thrown } from "./kit/errors";

const close = (a: number, b: number) => expect(tolerance.relDiff(a, b)).toBeLessThanOrEqual(tolerance.HANDBOOK_TOLERANCE);

describe("stresses", () => {
  test("M/S, V/A, VQ/(It); a rectangle's VQ/(It) is 3/2 V/A (from memory)", () => {
    expect(bendingStress(90, 0.003)).toBeCloseTo(30000, 9);
    expect(averageShearStress(60, 0.015)).toBeCloseTo(4000, 9);
    const [b, h, V] = [0.1, 0.15, 60];
    close(peakShearStress(V, (b * h * h) / 8, (b * h ** 3) / 12, b), 1.5 * averageShearStress(V, b * h));
  });

  test("fibre stresses: tension +, sagging compresses the top; simple span M = wL^2/8 (from memory)", () => {
    const [w, L, St, Sb] = [12, 5, 2e-4, 3e-4];
    const solution = solve(member({ spans: [L], loads: [udl(w, 0, L)] }));
    const [top, bottom] = fibreStresses(extremes(solution, "moment"), St, Sb);
    expect(top.fibre).toBe("top");
    close(top.min, -(w * L * L) / 8 / St);
    close(top.xMin, L / 2);
    expect(top.max).toBe(0);
    close(bottom.max, (w * L * L) / 8 / Sb);
    expect(bottom.min).toBe(0);
  });

  test("cantilever hogging puts the top fibre in tension at the root (wL^2/2, from memory)", () => {
    const [w, L, S] = [3, 2, 1e-4];
    const solution = solve(member({ spans: [L], supports: ["fixed", "free"], loads: [udl(w, 0, L)] }));
    const [top, bottom] = fibreStresses(extremes(solution, "moment"), S, S);
    close(top.max, (w * L * L) / 2 / S);
    expect(top.xMax).toBe(0);
    close(bottom.min, -(w * L * L) / 2 / S);
  });

  test("largest magnitude keeps its sign", () => {
    expect(largestMagnitude({ max: 2, xMax: 1, min: -5, xMin: 3 })).toEqual({ value: -5, x: 3 });
    expect(largestMagnitude({ max: 5, xMax: 1, min: -5, xMin: 3 })).toEqual({ value: 5, x: 1 });
  });
});

describe("deflection limits", () => {
  test.each([
    [360, 360],
    ["360", 360],
    ["L/360", 360],
    ["l / 240", 240],
    ["span/180", 180],
    ["SPAN/ 480.5", 480.5],
  ] as [number | string, number][])("%j reads as %d", (text, divisor) => {
    expect(parseDeflectionLimit(text, "limit")).toBe(divisor);
  });

  test.each([["L360"], ["L/"], ["1/360"], ["L/0"], [0.5], ["360mm"], [-360], [1]] as [number | string][])("%j is an error naming the argument", (text) => {
    const e = thrown(() => parseDeflectionLimit(text, "limit"));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(/^limit: /);
  });

  test("simple span: span/deflection = 384 EI/(5 w L^3) (from memory), pass or fail at the stated limit", () => {
    const [w, L, EI] = [10, 6, 2e4];
    const solution = solve(member({ spans: [L], EI, loads: [udl(w, 0, L)] }));
    const expected = (384 * EI) / (5 * w * L ** 3);
    const [row] = spanDeflections(solution, [300]);
    close(row.deflection, (5 * w * L ** 4) / (384 * EI));
    close(row.x, L / 2);
    close(row.ratio, expected);
    expect(row.pass).toBe(expected >= 300);
    expect(spanDeflections(solution, [Math.floor(expected)])[0].pass).toBe(true);
    expect(spanDeflections(solution, [Math.ceil(expected)])[0].pass).toBe(false);
  });

  test("two equal continuous spans: each span checked on its own length (propped-cantilever curve, from memory)", () => {
    const [w, L, EI] = [4, 5, 1e4];
    const solution = solve(member({ spans: [L, L], EI, loads: [udl(w, 0, 2 * L)] }));
    const x = ((1 + Math.sqrt(33)) * L) / 16;
    const peak = (w * x * (L ** 3 - 3 * L * x * x + 2 * x ** 3)) / (48 * EI);
    const rows = spanDeflections(solution, [360, 240]);
    expect(rows.map((r) => r.span)).toEqual([1, 2]);
    close(rows[0].deflection, peak);
    close(rows[0].x, x);
    close(rows[1].deflection, peak);
    close(rows[1].x, 2 * L - x);
    close(rows[0].ratio, L / peak);
    expect(rows.map((r) => r.limit)).toEqual([360, 240]);
  });

  test("a cantilever's tip deflection wL^4/(8EI) (from memory); upward deflection is measured by magnitude", () => {
    const [w, L, EI] = [-2, 3, 5e3];
    const solution = solve(member({ spans: [L], supports: ["fixed", "free"], EI, loads: [udl(w, 0, L)] }));
    const [row] = spanDeflections(solution, [180]);
    close(row.deflection, (w * L ** 4) / (8 * EI));
    expect(row.deflection).toBeLessThan(0);
    close(row.ratio, L / Math.abs((w * L ** 4) / (8 * EI)));
  });

  test("an unloaded span passes with an infinite ratio; a limit count that fits no span layout is an error", () => {
    const solution = solve(member({ spans: [4, 4], EI: 100, loads: [udl(1, 0, 4)] }));
    expect(spanDeflections(solution, [360])).toHaveLength(2);
    expect(deflectionRatio(4, 0)).toBe(Infinity);
    expect(thrown(() => spanDeflections(solution, [360, 240, 180])).message).toMatch(/^limit: give one limit for the member or one per span \(2\), got 3$/);
  });
});

describe("utilisation", () => {
  test("|demand| / capacity", () => {
    expect(utilisation(-45, 60)).toBeCloseTo(0.75, 15);
    expect(utilisation(0, 60)).toBe(0);
  });

  test("capacity must be positive; bad values never give a number", () => {
    expect(thrown(() => utilisation(1, 0)).message).toMatch(/the capacity must be a positive number, got 0/);
    expect(thrown(() => utilisation(NaN, 2)).message).toMatch(/the demand must be a finite number/);
    expect(thrown(() => bendingStress(1, -2)).message).toMatch(/section modulus S must be a positive number/);
    expect(thrown(() => peakShearStress(1, 1, 1, 0)).message).toMatch(/the width t must be a positive number/);
  });
});
