/**
 * solveBanded on its own: random symmetric positive definite banded systems against an
 * independent computation with ml-matrix (dense LU), and the refusal of systems whose
 * pivots collapse.
 */
import fc from "fast-check";
import { Matrix, solve as denseSolve } from "ml-matrix";
import { solveBanded } from "../../src/core/banded";
import { toDense, type StiffnessSystem } from "../../src/core/stiffness";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { thrown } from "./kit/errors";
import { runs } from "./kit/random";

/** A banded, diagonally dominant SPD system (well conditioned, so forward errors stay at rounding). */
function spdSystem(size: number, halfBandwidth: number, entries: number[], rhs: number[]): StiffnessSystem {
  const hb = Math.min(halfBandwidth, Math.max(0, size - 1));
  const stride = hb + 1;
  const band = new Float64Array(size * stride);
  const rowSums = new Array<number>(size).fill(0);
  let k = 0;
  for (let i = 0; i < size; i++) {
    for (let j = i + 1; j < Math.min(size, i + stride); j++) {
      const v = entries[k++ % entries.length];
      band[i * stride + (j - i)] = v;
      rowSums[i] += Math.abs(v);
      rowSums[j] += Math.abs(v);
    }
  }
  for (let i = 0; i < size; i++) band[i * stride] = 1 + rowSums[i] + Math.abs(entries[i % entries.length]);
  return { size, halfBandwidth: hb, band, rhs: Float64Array.from(rhs.slice(0, size)) };
}

describe("solveBanded", () => {
  test("matches ml-matrix's dense solve on random SPD banded systems", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 0, max: 3 }),
        fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 1, maxLength: 200 }),
        fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 30, maxLength: 30 }),
        (size, hb, entries, rhs) => {
          const system = spdSystem(size, hb, entries, rhs);
          const dense = new Matrix(toDense(system));
          expect(dense.isSymmetric()).toBe(true);
          const expected = denseSolve(dense, Matrix.columnVector(Array.from(system.rhs))).to1DArray();
          const actual = Array.from(solveBanded(system));
          const scale = Math.max(1e-300, ...expected.map(Math.abs));
          actual.forEach((v, i) => expect(Math.abs(v - expected[i])).toBeLessThanOrEqual(HANDBOOK_TOLERANCE * scale));
          const residual = dense.mmul(Matrix.columnVector(actual)).to1DArray();
          const rhsScale = Math.max(1e-300, ...Array.from(system.rhs).map(Math.abs));
          residual.forEach((v, i) => expect(Math.abs(v - system.rhs[i])).toBeLessThanOrEqual(HANDBOOK_TOLERANCE * rhsScale));
        },
      ),
      runs(150),
    );
  });

  test("leaves the system it was given unchanged", () => {
    const system = spdSystem(6, 1, [0.5, -1, 2, 0.25], [1, 2, 3, 4, 5, 6]);
    const band = Float64Array.from(system.band);
    const rhs = Float64Array.from(system.rhs);
    solveBanded(system);
    expect(system.band).toEqual(band);
    expect(system.rhs).toEqual(rhs);
  });

  test.each<[string, StiffnessSystem]>([
    ["a singular system (two equal rows)", { size: 2, halfBandwidth: 1, band: Float64Array.from([1, 1, 1, 0]), rhs: Float64Array.from([1, 1]) }],
    ["an indefinite system", { size: 2, halfBandwidth: 1, band: Float64Array.from([1, 2, 1, 0]), rhs: Float64Array.from([1, 1]) }],
    ["a zero diagonal", { size: 1, halfBandwidth: 0, band: Float64Array.from([0]), rhs: Float64Array.from([1]) }],
  ])("%s is #VALUE!, never NaN or Infinity", (_name, system) => {
    expect(thrown(() => solveBanded(system)).code).toBe("#VALUE!");
  });
});
