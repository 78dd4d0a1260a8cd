/**
 * Invariants of the exact solution on random stable members (kit/random.ts, fixed seed, so runs
 * repeat): equilibrium, superposition and homogeneity, Maxwell–Betti reciprocity, mirror
 * symmetry, the role of EI, the differential relations between V, M, slope and deflection, and
 * the conditions at nodes and ends.
 *
 * Sign conventions (src/core/model.ts): deflection w down +, slope = dw/dx, sagging M +,
 * V = dM/dx, M = -EI·w''. Hence d(slope)/dx = -M/EI (with deflection positive downward,
 * sagging curvature is w'' < 0).
 */
import fc from "fast-check";
import { pieceList, solve, valueAt, type Member, type Quantity, type Solution } from "../../src/core";
import { EQUILIBRIUM_TOLERANCE, HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { expectClose, isClose } from "./kit/close";
import { beam, couple, lengthOf, member, mirror, nodesOf, point, scalesOf } from "./kit/members";
import { pieceEnd, pieceStart } from "./kit/pieces";
import { loadedMember, offGridFractions, runs, stableShape } from "./kit/random";
import { intensity } from "./kit/statics";

const TOL = HANDBOOK_TOLERANCE;
const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];
const unit = fc.double({ min: 0.001, max: 0.999, noNaN: true });

describe("equilibrium", () => {
  it("sum of vertical forces and of moments about any point vanish (to EQUILIBRIUM_TOLERANCE of the load scale)", () => {
    fc.assert(
      fc.property(loadedMember, fc.double({ min: -2, max: 3, noNaN: true }), (m, where) => {
        const sol = solve(m);
        const L = lengthOf(m);
        const p = where * L;
        let force = 0;
        let moment = 0; // counter-clockwise +, about x = p
        for (const r of sol.reactions) {
          force += r.force;
          moment += r.force * (r.x - p) + r.moment;
        }
        for (const l of m.loads) {
          if (l.kind === "point") {
            force -= l.magnitude;
            moment -= l.magnitude * (l.xStart - p);
          } else if (l.kind === "moment") moment -= l.magnitude;
          else {
            const [q0, q1, a, len] = [l.magnitude, l.kind === "udl" ? l.magnitude : l.magnitudeEnd, l.xStart, l.xEnd - l.xStart];
            force -= (len * (q0 + q1)) / 2;
            moment -= len * (((a - p) * (q0 + q1)) / 2 + len * (q0 / 6 + q1 / 3));
          }
        }
        const scale = sol.loadScale > 0 ? sol.loadScale : scalesOf(m).force;
        expect(Math.abs(force)).toBeLessThanOrEqual(EQUILIBRIUM_TOLERANCE * scale);
        expect(Math.abs(moment)).toBeLessThanOrEqual(EQUILIBRIUM_TOLERANCE * scale * Math.max(L, Math.abs(p)));
      }),
      runs(150),
    );
  });

  it("shear and moment vanish just past the free right end of a cantilever", () => {
    fc.assert(
      fc.property(loadedMember, (m) => {
        const L = lengthOf(m);
        const atTip = (l: Member["loads"][number]) => l.xStart === L && (l.kind === "point" || l.kind === "moment");
        const cantilever = member({ spans: m.spans, supports: ["fixed", ...m.spans.map(() => "free" as const)], EI: 1000, loads: m.loads.filter((l) => !atTip(l)) });
        const s = solve(cantilever);
        const scale = scalesOf(cantilever);
        expectClose("shear at the free end", valueAt(s, "shear", L), 0, EQUILIBRIUM_TOLERANCE, scale.force);
        expectClose("moment at the free end", valueAt(s, "moment", L), 0, EQUILIBRIUM_TOLERANCE, scale.moment);
      }),
      runs(80),
    );
  });

  it("a free right end carries no shear beyond the loads on it: V(L) equals the point load at L (statics)", () => {
    const m = beam([3, 2], ["pin", "pin", "free"], [point(4, 5), point(1, 1)], 1e3);
    expect(isClose(valueAt(solve(m), "shear", 5), 4, TOL, 4)).toBe(true);
  });
});

describe("superposition and homogeneity", () => {
  it("the member under loads A and B together is the sum of A alone and B alone (reactions and every quantity)", () => {
    fc.assert(
      fc.property(loadedMember, loadedMember, offGridFractions, (m, other, fractions) => {
        const L = lengthOf(m);
        const stretch = L / lengthOf(other);
        const extra = other.loads.map((l, i) => ({ ...l, xStart: l.xStart * stretch, xEnd: l.xEnd * stretch, row: 50 + i }));
        fc.pre(extra.every((l) => l.xStart <= L && l.xEnd <= L && l.xEnd - l.xStart >= 0));
        const hinges = nodesOf(m).filter((_, i) => m.supports[i].kind === "hinge");
        fc.pre(extra.every((l) => l.kind !== "moment" || !hinges.includes(l.xStart)));
        const both: Member = { ...m, loads: [...m.loads, ...extra] };
        const [a, b, ab] = [solve(m), solve({ ...m, loads: extra }), solve(both)];
        const s = scalesOf(both);
        ab.reactions.forEach((r, i) => {
          expectClose(`reaction ${i}`, r.force, a.reactions[i].force + b.reactions[i].force, TOL, s.force);
          expectClose(`moment reaction ${i}`, r.moment, a.reactions[i].moment + b.reactions[i].moment, TOL, s.moment);
        });
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            const x = f * L;
            expectClose(`${q} at ${x}`, valueAt(ab, q, x), valueAt(a, q, x) + valueAt(b, q, x), TOL, s[q]);
          }
        }
      }),
      runs(100),
    );
  });

  it("scaling every load by k scales every result by k", () => {
    fc.assert(
      fc.property(loadedMember, fc.integer({ min: -5, max: 5 }).filter((k) => k !== 0), offGridFractions, (m, k, fractions) => {
        const base = solve(m);
        const scaled = solve({ ...m, loads: m.loads.map((l) => ({ ...l, magnitude: k * l.magnitude, magnitudeEnd: k * l.magnitudeEnd })) });
        const s = scalesOf(m);
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            const x = f * lengthOf(m);
            expectClose(`${q} at ${x}`, valueAt(scaled, q, x), k * valueAt(base, q, x), TOL, Math.abs(k) * s[q]);
          }
        }
      }),
      runs(60),
    );
  });
});

describe("Maxwell–Betti reciprocity", () => {
  const positions = fc.tuple(fc.integer({ min: 0, max: 64 }), fc.integer({ min: 0, max: 64 }));

  it("deflection at j from a unit force at i equals deflection at i from a unit force at j", () => {
    fc.assert(
      fc.property(stableShape, positions, unit, (shape, [i, j], u) => {
        const L = shape.spans.reduce((s, v) => s + v, 0);
        // on the 1/64 grid (nodes, ends) and, with u, anywhere
        const [xi, xj] = [(L * i) / 64, u * L];
        const at = (x: number) => solve(beam(shape.spans, shape.supports, [point(1, x)], shape.EI));
        const s = scalesOf(beam(shape.spans, shape.supports, [point(1, 0)], shape.EI));
        expectClose("w_ij vs w_ji", valueAt(at(xi), "deflection", xj), valueAt(at(xj), "deflection", xi), TOL, s.deflection);
        const xk = (L * j) / 64;
        expectClose("w_ik vs w_ki (grid)", valueAt(at(xi), "deflection", xk), valueAt(at(xk), "deflection", xi), TOL, s.deflection);
      }),
      runs(120),
    );
  });

  it("slope at j from a unit couple at i equals slope at i from one at j; force and couple cross terms match", () => {
    const withoutHinges = stableShape.filter((s) => !s.supports.includes("hinge"));
    fc.assert(
      fc.property(withoutHinges, positions, (shape, [i, j]) => {
        const L = shape.spans.reduce((s, v) => s + v, 0);
        const [xi, xj] = [(L * (i + 0.5)) / 65, (L * (j + 0.25)) / 65];
        const withCouple = (x: number) => solve(beam(shape.spans, shape.supports, [couple(1, x)], shape.EI));
        const withForce = (x: number) => solve(beam(shape.spans, shape.supports, [point(1, x)], shape.EI));
        const s = scalesOf(beam(shape.spans, shape.supports, [point(1, 0)], shape.EI));
        expectClose("θ_ij vs θ_ji", valueAt(withCouple(xi), "slope", xj), valueAt(withCouple(xj), "slope", xi), TOL, s.slope);
        expectClose("w at j from a couple at i vs θ at i from a force at j", valueAt(withCouple(xi), "deflection", xj), valueAt(withForce(xj), "slope", xi), TOL, s.deflection);
      }),
      runs(120),
    );
  });
});

describe("mirror symmetry", () => {
  it("the mirrored member gives M(x) = M'(L-x), V(x) = -V'(L-x), w(x) = w'(L-x), slope(x) = -slope'(L-x) and mirrored reactions", () => {
    fc.assert(
      fc.property(loadedMember, offGridFractions, (m, fractions) => {
        const [sol, image] = [solve(m), solve(mirror(m))];
        const L = lengthOf(m);
        const s = scalesOf(m);
        const n = sol.reactions.length;
        sol.reactions.forEach((r, i) => {
          const twin = image.reactions[n - 1 - i];
          expectClose(`reaction ${i}`, r.force, twin.force, TOL, s.force);
          expectClose(`moment reaction ${i}`, r.moment, -twin.moment, TOL, s.moment);
        });
        const sign = { shear: -1, moment: 1, slope: -1, deflection: 1 } as const;
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            expectClose(`${q} at ${f * L}`, valueAt(sol, q, f * L), sign[q] * valueAt(image, q, L - f * L), TOL, s[q]);
          }
        }
      }),
      runs(120),
    );
  });
});

describe("the role of EI", () => {
  it("without EI, forces and moments equal those of any uniform EI; slope and deflection are #N/A", () => {
    const noSprings = loadedMember.filter((m) => m.supports.every((s) => s.kind !== "spring"));
    fc.assert(
      fc.property(noSprings, fc.integer({ min: 1, max: 10 ** 6 }), offGridFractions, (m, ei, fractions) => {
        const without = solve({ ...m, stiffness: null });
        const uniform = solve({ ...m, stiffness: m.spans.map(() => ei) });
        const s = scalesOf(m);
        for (const f of fractions) {
          const x = f * lengthOf(m);
          for (const q of ["shear", "moment"] as const) expectClose(`${q} at ${x}`, valueAt(without, q, x), valueAt(uniform, q, x), TOL, s[q]);
        }
        expect(without.hasStiffness).toBe(false);
        expect(() => valueAt(without, "deflection", 0)).toThrow(expect.objectContaining({ code: "#N/A" }));
      }),
      runs(60),
    );
  });

  it("multiplying every EI and spring by k divides slope and deflection by k and leaves forces alone", () => {
    fc.assert(
      fc.property(loadedMember, fc.constantFrom(0.01, 3, 1000), offGridFractions, (m, k, fractions) => {
        const stiffer: Member = {
          ...m,
          stiffness: (m.stiffness as number[]).map((ei) => ei * k),
          supports: m.supports.map((s) => (s.kind === "spring" ? { kind: "spring", stiffness: s.stiffness * k } : s)),
        };
        const [a, b] = [solve(m), solve(stiffer)];
        const s = scalesOf(m);
        for (const f of fractions) {
          const x = f * lengthOf(m);
          for (const q of QUANTITIES) {
            const factor = q === "slope" || q === "deflection" ? 1 / k : 1;
            expectClose(`${q} at ${x}`, valueAt(b, q, x), factor * valueAt(a, q, x), TOL, factor * s[q]);
          }
        }
      }),
      runs(60),
    );
  });
});

/** Where any quantity may jump or have a kink in its load: nodes and load ends. */
function breaks(m: Member): number[] {
  return [...nodesOf(m), ...m.loads.flatMap((l) => [l.xStart, l.xEnd])];
}

/** Five-point central difference: exact for polynomials up to degree 4. */
function derivative(sol: Solution, q: Quantity, x: number, h: number): number {
  const f = (t: number) => valueAt(sol, q, t);
  return (f(x - 2 * h) - 8 * f(x - h) + 8 * f(x + h) - f(x + 2 * h)) / (12 * h);
}

describe("differential relations (five-point central differences away from jumps)", () => {
  it("dV/dx = -q, dM/dx = V, d(slope)/dx = -M/EI, d(deflection)/dx = slope", () => {
    fc.assert(
      fc.property(loadedMember, unit, (m, u) => {
        const L = lengthOf(m);
        const x = u * L;
        const gap = Math.min(...breaks(m).map((b) => Math.abs(b - x)));
        // a fixed step of L/1000 keeps cancellation in the differences far below the tolerance
        fc.pre(gap > 3e-3 * L);
        const h = 1e-3 * L;
        const sol = solve(m);
        const s = scalesOf(m);
        const span = nodesOf(m).findIndex((nx) => nx > x) - 1;
        const EI = m.stiffness ? m.stiffness[span] : 1;
        const q = m.loads.reduce((sum, l) => sum + intensity(l, x), 0);
        expectClose("dV/dx", derivative(sol, "shear", x, h), -q, TOL, s.force / L);
        expectClose("dM/dx", derivative(sol, "moment", x, h), valueAt(sol, "shear", x), TOL, s.force);
        expectClose("d(slope)/dx", derivative(sol, "slope", x, h), -valueAt(sol, "moment", x) / EI, TOL, s.slope / L);
        // the deflection is quintic where the load is linear: the stencil's error is O(h⁴), far below the tolerance
        expectClose("d(deflection)/dx", derivative(sol, "deflection", x, h), valueAt(sol, "slope", x), TOL, s.slope);
      }),
      runs(120),
    );
  });
});

describe("conditions at nodes and ends", () => {
  it("deflection is continuous everywhere, slope everywhere but at hinges; restraints and releases hold", () => {
    fc.assert(
      fc.property(loadedMember, (m) => {
        const sol = solve(m);
        const s = scalesOf(m);
        const nodes = nodesOf(m);
        const L = lengthOf(m);
        const zero = (v: number, scale: number) => Math.abs(v) <= TOL * scale;
        const hingeAt = (x: number) => nodes.some((nx, i) => nx === x && m.supports[i].kind === "hinge");
        for (let i = 0; i + 1 < pieceList(sol.pieces).length; i++) {
          const [p, next] = [pieceList(sol.pieces)[i], pieceList(sol.pieces)[i + 1]];
          expect(p.x1).toBe(next.x0);
          expectClose(`deflection at ${p.x1}`, pieceEnd(p, "deflection"), pieceStart(next, "deflection"), TOL, s.deflection);
          if (!hingeAt(p.x1)) expectClose(`slope at ${p.x1}`, pieceEnd(p, "slope"), pieceStart(next, "slope"), TOL, s.slope);
        }
        const couplesAt = (x: number) => m.loads.filter((l) => l.kind === "moment" && l.xStart === x).reduce((t, l) => t + l.magnitude, 0);
        m.supports.forEach((support, i) => {
          const x = nodes[i];
          const kind = support.kind;
          if (kind === "pin" || kind === "fixed") expect(zero(valueAt(sol, "deflection", x), s.deflection)).toBe(true);
          if (kind === "fixed") expect(zero(valueAt(sol, "slope", x), s.slope)).toBe(true);
          if (kind === "hinge") {
            const left = pieceList(sol.pieces).filter((p) => p.x1 === x).map((p) => pieceEnd(p, "moment"));
            expect(left.length).toBe(1);
            expect(zero(left[0], s.moment)).toBe(true);
            expect(zero(valueAt(sol, "moment", x), s.moment)).toBe(true);
          }
          const released = kind === "pin" || kind === "free" || kind === "spring";
          if (released && i === 0) expectClose("moment at 0", valueAt(sol, "moment", 0), couplesAt(0), TOL, s.moment);
          if (released && i === nodes.length - 1) expectClose("moment at L", valueAt(sol, "moment", L), -couplesAt(L), TOL, s.moment);
          if (kind !== "fixed") expect(sol.reactions[i].moment).toBe(0);
          if (kind === "free" || kind === "hinge") expect(sol.reactions[i].force).toBe(0);
        });
      }),
      runs(120),
    );
  });
});
