/**
 * Invariants of the exact solution on random stable members: equilibrium, superposition,
 * reciprocity (Maxwell–Betti), mirror symmetry, and the role of EI.
 */
import fc from "fast-check";
import { solve } from "../../src/core/solve";
import { valueAt } from "../../src/core/evaluate";
import type { Load, Member, Quantity } from "../../src/core/model";
import { EQUILIBRIUM_TOLERANCE, HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { loadedMember, offGridFractions, stableShape } from "./support/arbitraries";
import { couple, member, memberLength, point, scales } from "./support/build";
import { expectClose } from "./support/expectClose";

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

/** Total downward load and its moment about x = 0 (counter-clockwise +). */
function loadResultants(loads: Load[]): { force: number; moment: number } {
  let force = 0;
  let moment = 0;
  for (const l of loads) {
    if (l.kind === "point") {
      force += l.magnitude;
      moment -= l.magnitude * l.xStart;
    } else if (l.kind === "moment") {
      moment -= l.magnitude;
    } else {
      const q0 = l.magnitude;
      const q1 = l.kind === "udl" ? l.magnitude : l.magnitudeEnd;
      const span = l.xEnd - l.xStart;
      const total = ((q0 + q1) / 2) * span;
      force += total;
      moment -= l.xStart * total + (q0 * span * span) / 2 + ((q1 - q0) * span * span) / 3;
    }
  }
  return { force, moment };
}

describe("equilibrium", () => {
  test("reactions balance the loads: vertical forces and moments about the left end", () => {
    fc.assert(
      fc.property(loadedMember, (m) => {
        const s = solve(m);
        const loads = loadResultants(m.loads);
        const length = memberLength(m);
        const up = s.reactions.reduce((sum, r) => sum + r.force, 0);
        const turning = s.reactions.reduce((sum, r) => sum + r.force * r.x + r.moment, 0);
        const scale = scales(m).force;
        expectClose("sum of vertical forces", up, loads.force, EQUILIBRIUM_TOLERANCE, scale);
        expectClose("sum of moments about x = 0", turning + loads.moment, 0, EQUILIBRIUM_TOLERANCE, scale * length);
      }),
      { numRuns: 300 },
    );
  });

  test("shear and moment vanish just past the free right end of a cantilever", () => {
    fc.assert(
      fc.property(loadedMember, (m) => {
        const atTip = (l: Load) => l.xStart === memberLength(m) && (l.kind === "point" || l.kind === "moment");
        const supports = ["fixed" as const, ...m.spans.map(() => "free" as const)];
        const cantilever = member({ spans: m.spans, supports, EI: 1000, loads: m.loads.filter((l) => !atTip(l)) });
        const s = solve(cantilever);
        const length = memberLength(m);
        const scale = scales(cantilever);
        expectClose("shear at the free end", valueAt(s, "shear", length), 0, EQUILIBRIUM_TOLERANCE, scale.force);
        expectClose("moment at the free end", valueAt(s, "moment", length), 0, EQUILIBRIUM_TOLERANCE, scale.moment);
      }),
      { numRuns: 100 },
    );
  });
});

describe("superposition", () => {
  test("the member under loads A and B together is the sum of A alone and B alone", () => {
    fc.assert(
      fc.property(loadedMember, loadedMember, offGridFractions, (m, other, fractions) => {
        const length = memberLength(m);
        const scaleToM = memberLength(other) / length;
        const extra = other.loads.map((l) => ({ ...l, xStart: l.xStart / scaleToM, xEnd: l.xEnd / scaleToM }));
        const extraFits = extra.every((l) => l.xStart <= length && l.xEnd <= length);
        fc.pre(extraFits);
        const a = solve(m);
        const b = solve({ ...m, loads: extra });
        const both = solve({ ...m, loads: [...m.loads, ...extra] });
        const scale = scales({ ...m, loads: [...m.loads, ...extra] });
        both.reactions.forEach((r, i) => {
          expectClose(`reaction ${i}`, r.force, a.reactions[i].force + b.reactions[i].force, HANDBOOK_TOLERANCE, scale.force);
          expectClose(`moment reaction ${i}`, r.moment, a.reactions[i].moment + b.reactions[i].moment, HANDBOOK_TOLERANCE, scale.moment);
        });
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            const x = f * length;
            const sum = valueAt(a, q, x) + valueAt(b, q, x);
            expectClose(`${q} at ${x}`, valueAt(both, q, x), sum, HANDBOOK_TOLERANCE, scale[q]);
          }
        }
      }),
      { numRuns: 150 },
    );
  });

  test("scaling every load scales every result", () => {
    fc.assert(
      fc.property(loadedMember, fc.integer({ min: -5, max: 5 }).filter((k) => k !== 0), offGridFractions, (m, k, fractions) => {
        const base = solve(m);
        const scaled = solve({ ...m, loads: m.loads.map((l) => ({ ...l, magnitude: k * l.magnitude, magnitudeEnd: k * l.magnitudeEnd })) });
        const scale = scales(m);
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            const x = f * memberLength(m);
            expectClose(`${q} at ${x}`, valueAt(scaled, q, x), k * valueAt(base, q, x), HANDBOOK_TOLERANCE, Math.abs(k) * scale[q]);
          }
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe("reciprocity (Maxwell–Betti)", () => {
  const positions = fc.tuple(fc.integer({ min: 0, max: 64 }), fc.integer({ min: 0, max: 64 }));
  test("deflection at j from a unit force at i equals deflection at i from a unit force at j", () => {
    fc.assert(
      fc.property(stableShape, positions, (shape, [i, j]) => {
        const length = shape.spans.reduce((s, v) => s + v, 0);
        const xi = (length * i) / 64;
        const xj = (length * j) / 64;
        const at = (x: number) => solve(member({ ...shape, loads: [point(1, x)] }));
        const scale = scales(member({ ...shape, loads: [point(1, 0)] }));
        expectClose("w_ij vs w_ji", valueAt(at(xi), "deflection", xj), valueAt(at(xj), "deflection", xi), HANDBOOK_TOLERANCE, scale.deflection);
      }),
      { numRuns: 200 },
    );
  });

  test("slope at j from a unit clockwise couple at i equals slope at i from one at j; force and couple cross terms match", () => {
    const shapesWithoutHinges = stableShape.filter((s) => !s.supports.includes("hinge"));
    fc.assert(
      fc.property(shapesWithoutHinges, positions, (shape, [i, j]) => {
        const length = shape.spans.reduce((s, v) => s + v, 0);
        const xi = (length * (i + 0.5)) / 65;
        const xj = (length * (j + 0.25)) / 65;
        const withCouple = (x: number) => solve(member({ ...shape, loads: [couple(1, x)] }));
        const withForce = (x: number) => solve(member({ ...shape, loads: [point(1, x)] }));
        const scale = scales(member({ ...shape, loads: [point(1, 0)] }));
        expectClose("θ_ij vs θ_ji", valueAt(withCouple(xi), "slope", xj), valueAt(withCouple(xj), "slope", xi), HANDBOOK_TOLERANCE, scale.slope);
        expectClose(
          "w at j from couple at i vs θ at i from force at j",
          valueAt(withCouple(xi), "deflection", xj),
          valueAt(withForce(xj), "slope", xi),
          HANDBOOK_TOLERANCE,
          scale.deflection,
        );
      }),
      { numRuns: 200 },
    );
  });
});

function mirror(m: Member): Member {
  const length = memberLength(m);
  return {
    spans: m.spans.slice().reverse(),
    supports: m.supports.slice().reverse(),
    stiffness: m.stiffness ? m.stiffness.slice().reverse() : null,
    loads: m.loads.map((l) => {
      if (l.kind === "point") return { ...l, xStart: length - l.xStart, xEnd: length - l.xStart };
      if (l.kind === "moment") return { ...l, magnitude: -l.magnitude, xStart: length - l.xStart, xEnd: length - l.xStart };
      const end = l.kind === "udl" ? l.magnitude : l.magnitudeEnd;
      return { ...l, xStart: length - l.xEnd, xEnd: length - l.xStart, magnitude: end, magnitudeEnd: l.magnitude };
    }),
  };
}

describe("mirror symmetry", () => {
  test("the mirrored member gives mirrored results: V and slope change sign, M and deflection do not", () => {
    fc.assert(
      fc.property(loadedMember, offGridFractions, (m, fractions) => {
        const length = memberLength(m);
        const s = solve(m);
        const t = solve(mirror(m));
        const scale = scales(m);
        const sign: Record<Quantity, number> = { shear: -1, moment: 1, slope: -1, deflection: 1 };
        for (const f of fractions) {
          for (const q of QUANTITIES) {
            expectClose(`${q} at ${f * length}`, valueAt(s, q, f * length), sign[q] * valueAt(t, q, length - f * length), HANDBOOK_TOLERANCE, scale[q]);
          }
        }
        s.reactions.forEach((r, i) => {
          const other = t.reactions[t.reactions.length - 1 - i];
          expectClose(`reaction ${i}`, r.force, other.force, HANDBOOK_TOLERANCE, scale.force);
          expectClose(`moment reaction ${i}`, r.moment, -other.moment, HANDBOOK_TOLERANCE, scale.moment);
        });
      }),
      { numRuns: 200 },
    );
  });
});

describe("stiffness", () => {
  test("without EI, forces and moments equal those of any uniform EI; slope and deflection are #N/A", () => {
    const noSprings = loadedMember.filter((m) => m.supports.every((s) => s.kind !== "spring"));
    fc.assert(
      fc.property(noSprings, fc.integer({ min: 1, max: 10 ** 6 }), offGridFractions, (m, ei, fractions) => {
        const without = solve({ ...m, stiffness: null });
        const uniform = solve({ ...m, stiffness: m.spans.map(() => ei) });
        const scale = scales(m);
        for (const f of fractions) {
          const x = f * memberLength(m);
          for (const q of ["shear", "moment"] as Quantity[]) {
            expectClose(`${q} at ${x}`, valueAt(without, q, x), valueAt(uniform, q, x), HANDBOOK_TOLERANCE, scale[q]);
          }
        }
        expect(without.hasStiffness).toBe(false);
        expect(() => valueAt(without, "deflection", 0)).toThrow(expect.objectContaining({ code: "#N/A" }));
      }),
      { numRuns: 100 },
    );
  });

  test("multiplying every EI and spring by k divides slope and deflection by k and leaves forces alone", () => {
    fc.assert(
      fc.property(loadedMember, fc.constantFrom(0.01, 3, 1000), offGridFractions, (m, k, fractions) => {
        const stiffer: Member = {
          ...m,
          stiffness: (m.stiffness as number[]).map((ei) => ei * k),
          supports: m.supports.map((s) => (s.kind === "spring" ? { kind: "spring", stiffness: s.stiffness * k } : s)),
        };
        const a = solve(m);
        const b = solve(stiffer);
        const scale = scales(m);
        for (const f of fractions) {
          const x = f * memberLength(m);
          for (const q of QUANTITIES) {
            const factor = q === "slope" || q === "deflection" ? 1 / k : 1;
            expectClose(`${q} at ${x}`, valueAt(b, q, x), factor * valueAt(a, q, x), HANDBOOK_TOLERANCE, factor * scale[q]);
          }
        }
      }),
      { numRuns: 100 },
    );
  });
});
