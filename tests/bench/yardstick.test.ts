/**
 * The per-row benchmark's yardstick (yardstick.ts) against closed forms, so that its agreement
 * with SPAN.MAXMOMENT, which the bench prints, means something.
 */
import { leanMaxMoment } from "./leanStiffness";
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

/**
 * The floor's lean stiffness solver (leanStiffness.ts) against the yardstick and closed forms,
 * so that its time, which the row bench prints beside the yardstick's, is the time of a right answer.
 */
describe("lean stiffness solver: the same answers by the stiffness method", () => {
  function random(seed: number): () => number {
    let state = seed >>> 0;
    return () => {
      state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
      return state / 4294967296;
    };
  }

  test("agrees with the three-moment yardstick on 2,000 random beams of 1 to 8 spans (1e-10 of the moment, position to 1e-10 of the length)", () => {
    const next = random(42);
    const lean = { max: 0, x: 0 };
    for (let k = 0; k < 2000; k++) {
      const n = 1 + Math.floor(8 * next());
      const spans = Array.from({ length: n }, () => 1 + 9 * next());
      const beam = { spans, udl: spans.map(() => (next() < 0.2 ? 0 : 5 * next())), point: spans.map(() => 20 * next()), at: spans.map((l) => l * (0.05 + 0.9 * next())) };
      yardstickMaxMoment(beam, out);
      leanMaxMoment(beam, lean);
      const scale = Math.max(Math.abs(out.max), 1e-300);
      expect(Math.abs(lean.max - out.max) / scale).toBeLessThan(1e-10);
      expect(Math.abs(lean.x - out.x) / spans.reduce((a, b) => a + b, 0)).toBeLessThan(1e-10);
    }
  });

  test("one span fixed at both ends, UDL: largest sagging w L^2 / 24 at mid-span (fixed-end moments w L^2 / 12, from memory)", () => {
    const lean = { max: 0, x: 0 };
    leanMaxMoment({ spans: [6], udl: [2], point: [0], at: [1] }, lean, [true, true]);
    expect(lean.max).toBeCloseTo((2 * 36) / 24, 12);
    expect(lean.x).toBeCloseTo(3, 12);
  });

  test("two spans fixed at the outer ends, the middle node unsupported (its deflection free), UDL: one fixed-fixed span of 2L, largest sagging w (2L)^2 / 24 at the middle node (from memory)", () => {
    const lean = { max: 0, x: 0 };
    leanMaxMoment({ spans: [3, 3], udl: [2, 2], point: [0, 0], at: [1, 1] }, lean, [true, false, true], [false, true, false]);
    expect(lean.max).toBeCloseTo((2 * 36) / 24, 12);
    expect(lean.x).toBeCloseTo(3, 12);
  });

  test("propped cantilever (fixed left, pin right), UDL: largest sagging 9 w L^2 / 128 at 5L/8 from the fixed end (from memory)", () => {
    const lean = { max: 0, x: 0 };
    leanMaxMoment({ spans: [4], udl: [3], point: [0], at: [1] }, lean, [true, false]);
    expect(lean.max).toBeCloseTo((9 * 3 * 16) / 128, 12);
    expect(lean.x).toBeCloseTo(2.5, 12);
  });
});
