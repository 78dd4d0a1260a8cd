/**
 * The solver against independent computations, member by member (kit/random.ts, named by seed):
 * - a dense stiffness model written from the textbook (kit/denseStiffness.ts): the assembled
 *   matrix and nodal loads, the band storage, the banded solve against ml-matrix's dense solve,
 *   and nodal deflections, slopes and reactions (f - K u) of the dense solution;
 * - the force method with singularity functions solved with ml-matrix (kit/forceMethod.ts):
 *   reactions, and shear, moment, slope and deflection at nodes, load ends and points between;
 * - statics of the left part (kit/statics.ts): V and M from the solver's reactions, integrating
 *   the loads by Simpson's rule.
 */
import fc from "fast-check";
import { Matrix, solve as mlSolve } from "ml-matrix";
import { assemble, solve, solveBanded, toDense, valueAt, type Member, type Quantity } from "../../src/core";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { isClose } from "./kit/close";
import { denseStiffnessSolve, denseSystem } from "./kit/denseStiffness";
import { forceMethodSolve } from "./kit/forceMethod";
import { lengthOf, nodesOf, scalesOf } from "./kit/members";
import { offGridFractions, randomMember } from "./kit/random";
import { statics } from "./kit/statics";

const TOL = HANDBOOK_TOLERANCE;
const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];
const seeds = Array.from({ length: 80 }, (_, i) => 1000 + 7919 * i);
const maxAbs = (xs: ArrayLike<number>): number => Array.from(xs).reduce((m, v) => Math.max(m, Math.abs(v)), 0);

function worst(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let out = 0;
  for (let i = 0; i < Math.max(a.length, b.length); i++) out = Math.max(out, Math.abs((a[i] ?? NaN) - (b[i] ?? NaN)));
  return Number.isNaN(out) ? Infinity : out;
}

function describeMember(m: Member): string {
  return JSON.stringify({ spans: m.spans, supports: m.supports, EI: m.stiffness, loads: m.loads });
}

/** Nodes, load ends and a few points off any grid, sorted. */
function stations(m: Member, seed: number): number[] {
  const L = lengthOf(m);
  const fractions = fc.sample(offGridFractions, { seed, numRuns: 1 })[0];
  const xs = new Set([...nodesOf(m), ...m.loads.flatMap((l) => [l.xStart, l.xEnd]), ...fractions.map((f) => f * L)]);
  return [...xs].sort((a, b) => a - b);
}

describe.each(seeds)("random member (seed %i)", (seed) => {
  const m = randomMember(seed);
  const label = describeMember(m);

  it("assembles the same stiffness matrix and nodal loads as the dense textbook model", () => {
    const sys = assemble(m);
    const reference = denseSystem(m);
    expect({ label, size: sys.size }).toEqual({ label, size: reference.K.length });
    expect(worst(toDense(sys).flat(), reference.K.flat())).toBeLessThanOrEqual(TOL * maxAbs(reference.K.flat()));
    const fScale = Math.max(maxAbs(reference.f), scalesOf(m).force);
    expect(worst(sys.rhs, reference.f)).toBeLessThanOrEqual(TOL * fScale);
  });

  it("band storage matches the dense matrix, which is symmetric", () => {
    const sys = assemble(m);
    const dense = toDense(sys);
    const w = sys.halfBandwidth;
    for (let i = 0; i < sys.size; i++) {
      for (let j = 0; j < sys.size; j++) {
        expect(dense[i][j]).toBe(dense[j][i]);
        if (j >= i && j - i <= w) expect(dense[i][j]).toBe(sys.band[i * (w + 1) + (j - i)]);
        else if (Math.abs(j - i) > w) expect(dense[i][j]).toBe(0);
      }
    }
  });

  it("banded LDLᵀ solve and solution.displacements agree with ml-matrix's dense solve", () => {
    const sys = assemble(m);
    if (sys.size === 0) return;
    const dense = mlSolve(new Matrix(toDense(sys)), Matrix.columnVector(Array.from(sys.rhs))).to1DArray();
    const scale = maxAbs(dense);
    expect(worst(solveBanded(sys), dense)).toBeLessThanOrEqual(TOL * scale);
    expect(worst(solve(m).displacements, dense)).toBeLessThanOrEqual(TOL * scale);
  });

  it("nodal deflection, slope and reactions agree with the dense stiffness solution", () => {
    const sol = solve(m);
    const ref = denseStiffnessSolve(m);
    const s = scalesOf(m);
    const L = lengthOf(m);
    const off: string[] = [];
    const check = (what: string, got: number, want: number, scale: number) => {
      if (!isClose(got, want, TOL, scale)) off.push(`${what}: got ${got}, want ${want}`);
    };
    nodesOf(m).forEach((x, n) => {
      check(`deflection at node ${n}`, valueAt(sol, "deflection", x), ref.deflection[n], s.deflection);
      if (x < L) check(`slope right of node ${n}`, valueAt(sol, "slope", x), ref.slopeRight[n], s.slope);
      else check(`slope left of node ${n}`, valueAt(sol, "slope", x), ref.slopeLeft[n], s.slope);
      check(`reaction force at node ${n}`, sol.reactions[n].force, ref.reactions[n].force, s.force);
      check(`reaction moment at node ${n}`, sol.reactions[n].moment, ref.reactions[n].moment, s.moment);
      expect(sol.reactions[n].x).toBe(x);
    });
    expect({ label, off }).toEqual({ label, off: [] });
  });

  it("reactions and V, M, slope, deflection at nodes, load ends and between agree with the force method", () => {
    const sol = solve(m);
    const ref = forceMethodSolve(m);
    const s = scalesOf(m);
    const off: string[] = [];
    const check = (what: string, got: number, want: number, scale: number) => {
      if (!isClose(got, want, TOL, scale)) off.push(`${what}: got ${got}, want ${want}`);
    };
    expect(sol.reactions).toHaveLength(m.supports.length);
    sol.reactions.forEach((r, i) => {
      check(`reaction force at node ${i}`, r.force, ref.reactions[i].force, s.force);
      check(`reaction moment at node ${i}`, r.moment, ref.reactions[i].moment, s.moment);
    });
    for (const x of stations(m, seed)) for (const q of QUANTITIES) check(`${q} at x = ${x}`, valueAt(sol, q, x), ref.at(q, x), s[q]);
    expect({ label, off }).toEqual({ label, off: [] });
  });

  it("V and M agree with statics of the left part (Simpson integration of the loads)", () => {
    const sol = solve(m);
    const s = scalesOf(m);
    const L = lengthOf(m);
    const off: string[] = [];
    for (const x of stations(m, seed ^ 0x5bd1e995)) {
      const want = statics(m, sol.reactions, x, x === L);
      const shear = valueAt(sol, "shear", x);
      const moment = valueAt(sol, "moment", x);
      if (!(Math.abs(shear - want.shear) <= TOL * s.force)) off.push(`V(${x}) = ${shear}, statics ${want.shear}`);
      if (!(Math.abs(moment - want.moment) <= TOL * s.moment)) off.push(`M(${x}) = ${moment}, statics ${want.moment}`);
    }
    expect({ label, off }).toEqual({ label, off: [] });
  });
});

describe.each(seeds.slice(0, 15))("random member without EI (seed %i): uniform EI = 1 is used", (seed) => {
  const m = randomMember(seed, { stiffness: false });

  it("stiffness system and reactions match the dense model with EI = 1", () => {
    const sys = assemble(m);
    const reference = denseSystem(m);
    expect(worst(toDense(sys).flat(), reference.K.flat())).toBeLessThanOrEqual(TOL * maxAbs(reference.K.flat()));
    const sol = solve(m);
    const ref = denseStiffnessSolve(m);
    const s = scalesOf(m);
    expect(sol.hasStiffness).toBe(false);
    expect(worst(sol.displacements, ref.displacements)).toBeLessThanOrEqual(TOL * maxAbs(ref.displacements));
    expect(worst(sol.reactions.map((r) => r.force), ref.reactions.map((r) => r.force))).toBeLessThanOrEqual(TOL * s.force);
    expect(worst(sol.reactions.map((r) => r.moment), ref.reactions.map((r) => r.moment))).toBeLessThanOrEqual(TOL * s.moment);
  });
});
