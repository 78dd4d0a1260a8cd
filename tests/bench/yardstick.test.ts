/**
 * The per-row benchmark's yardstick (yardstick.ts) against closed forms, so that its agreement
 * with SPAN.MAXMOMENT, which the bench prints, means something.
 */
import { yardstickMaxMoment } from "./yardstick";

const out = { max: 0, x: 0 };

describe("yardstick: largest sagging moment of a continuous beam on pins", () => {
  test("simple span, UDL: w L^2 / 8 at mid-span (statics)", () => {
    yardstickMaxMoment({ spans: [6], udl: [2], point: [0], at: [3] }, out);
    expect(out.max).toBeCloseTo((2 * 36) / 8, 12);
    expect(out.x).toBeCloseTo(3, 12);
  });

  test("simple span, point load: P a b / L under the load (statics)", () => {
    yardstickMaxMoment({ spans: [5], udl: [0], point: [10], at: [2] }, out);
    expect(out.max).toBeCloseTo((10 * 2 * 3) / 5, 12);
    expect(out.x).toBe(2);
  });

  test("two equal spans, UDL: support moment -w L^2 / 8, largest sagging 9 w L^2 / 128 at 3L/8 (three-moment equation, from memory)", () => {
    const w = 3;
    const l = 4;
    yardstickMaxMoment({ spans: [l, l], udl: [w, w], point: [0, 0], at: [l / 2, l / 2] }, out);
    expect(out.max).toBeCloseTo((9 * w * l * l) / 128, 12);
    expect(out.x).toBeCloseTo((3 * l) / 8, 12);
  });

  test("three equal spans, UDL: largest sagging 0.08 w L^2 in the end spans at 0.4 L (support moments -w L^2 / 10; three-moment equation, from memory)", () => {
    const w = 1;
    const l = 5;
    yardstickMaxMoment({ spans: [l, l, l], udl: [w, w, w], point: [0, 0, 0], at: [1, 1, 1] }, out);
    expect(out.max).toBeCloseTo(0.08 * w * l * l, 12);
    expect(out.x).toBeCloseTo(0.4 * l, 12);
  });
});
