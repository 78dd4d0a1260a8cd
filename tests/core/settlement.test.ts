/**
 * Support settlement: a `settle` load row prescribes the downward displacement Δ of a pin or
 * fixed node (or of a spring's base). Closed forms, an independent force-method solve on
 * random members, the deflection at the node equal to Δ, equilibrium, superposition with
 * loads, case reactions and combinations, and the refusals.
 *
 * Closed-form sources: the fixed-end actions for a relative end displacement Δ of a prismatic
 * member (fixed-fixed: M = 6EIΔ/L², V = 12EIΔ/L³; fixed-pinned: M = 3EIΔ/L², V = 3EIΔ/L³)
 * are the slope-deflection "fixed-end moments due to joint translation" of the standard
 * structural analysis texts (for example R. C. Hibbeler, Structural Analysis, chapter on the
 * slope-deflection method) — from memory, edition not at hand; each is re-derived below from
 * the cantilever tip deflections PL³/3EI and ML²/2EI so the check does not rest on memory.
 */
import { caseReactions, pieceList, solve, valueAt, type Load, type Member } from "../../src/core";
import { applyCombination, parseCombination } from "../../src/core";
import { pieceValue } from "../../src/core/polynomial";
import { thrown } from "./kit/errors";
import { forceMethodSolve } from "./kit/forceMethod";
import { beam, point, udl } from "./kit/members";
import { scalesOf } from "./kit/members";
import { randomMember } from "./kit/random";

const EI = 4.8e4;
const L = 5.5;
const D = 0.012;

const settle = (delta: number, x: number, loadCase = ""): Load => ({ kind: "settle", magnitude: delta, xStart: x, xEnd: x, magnitudeEnd: 0, loadCase, row: 0 });

function near(a: number, b: number, scale: number, tol = 1e-9): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(tol * scale);
}

describe("settlement: closed forms", () => {
  it("propped cantilever, the prop settling Δ: prop reaction -3EIΔ/L³ (down), wall moment 3EIΔ/L², deflection Δ(3ξ² - ξ³)/2", () => {
    // Derivation: the prop must pull the tip down by Δ; a cantilever's tip deflection under a
    // tip force P is PL³/3EI (cantilever formula, standard), so P = 3EIΔ/L³, and the wall
    // moment is PL. The elastic line of a tip-loaded cantilever is P x²(3L - x)/6EI.
    const s = solve(beam([L], ["fixed", "pin"], [settle(D, L)], EI));
    const P = (3 * EI * D) / L ** 3;
    near(s.reactions[1].force, -P, P);
    near(s.reactions[0].force, P, P);
    near(s.reactions[0].moment, P * L, P * L);
    near(valueAt(s, "moment", 0), -P * L, P * L);
    near(valueAt(s, "deflection", L), D, D, 1e-12);
    for (const xi of [0.2, 0.5, 0.9]) near(valueAt(s, "deflection", xi * L), (D * (3 * xi * xi - xi ** 3)) / 2, D);
  });

  it("fixed-fixed span, the right end settling Δ: end moments ∓6EIΔ/L², shear 12EIΔ/L³, elastic line Δ(3ξ² - 2ξ³)", () => {
    // Derivation: antisymmetric about mid-span, so M = 0 there; each half is a cantilever of
    // L/2 with tip force V deflecting Δ/2: V(L/2)³/3EI = Δ/2, V = 12EIΔ/L³, M_end = V L/2.
    const s = solve(beam([L], ["fixed", "fixed"], [settle(D, L)], EI));
    const V = (12 * EI * D) / L ** 3;
    const M = (6 * EI * D) / L ** 2;
    near(s.reactions[0].force, V, V);
    near(s.reactions[1].force, -V, V);
    near(s.reactions[0].moment, M, M);
    near(s.reactions[1].moment, M, M);
    near(valueAt(s, "moment", 0), -M, M);
    near(valueAt(s, "moment", L), M, M);
    near(valueAt(s, "moment", L / 2), 0, M);
    near(valueAt(s, "shear", L / 3), V, V);
    for (const xi of [0.25, 0.5, 0.8]) near(valueAt(s, "deflection", xi * L), D * (3 * xi * xi - 2 * xi ** 3), D);
    near(valueAt(s, "slope", L), 0, s.scales.slope);
  });

  it("two equal spans, the middle support settling Δ: middle reaction -6EIΔ/L³, ends +3EIΔ/L³, middle moment 3EIΔ/L²", () => {
    // Derivation: remove the middle support; a simple span of 2L under a central force P
    // deflects P(2L)³/48EI = PL³/6EI at mid-span (simple-span formula, standard), so
    // P = 6EIΔ/L³ pulls the middle down by Δ; mid-span moment P·2L/4.
    const s = solve(beam([L, L], ["pin", "pin", "pin"], [settle(D, L)], EI));
    const P = (6 * EI * D) / L ** 3;
    near(s.reactions[1].force, -P, P);
    near(s.reactions[0].force, P / 2, P);
    near(s.reactions[2].force, P / 2, P);
    near(valueAt(s, "moment", L), (P * L) / 2, P * L);
    near(valueAt(s, "deflection", L), D, D, 1e-12);
  });

  it("with loads: the reactions are the loads' plus the settlement's (superposition), and a combination factors Δ", () => {
    const loads = [udl(10, 0, 2 * L, "D"), point(25, 1.7, "L")];
    const base = beam([L, L], ["pin", "pin", "fixed"], loads, EI);
    const settled = { ...base, loads: [...base.loads, { ...settle(D, L, "SD"), row: 3 }] };
    const alone = solve({ ...base, loads: [{ ...settle(D, L), row: 1 }] });
    const both = solve(settled);
    const loadsOnly = solve(base);
    both.reactions.forEach((r, i) => {
      near(r.force, loadsOnly.reactions[i].force + alone.reactions[i].force, 100);
      near(r.moment, loadsOnly.reactions[i].moment + alone.reactions[i].moment, 100 * L);
    });
    const combined = solve({ ...settled, loads: applyCombination(settled.loads, parseCombination("1.2D+1.6L+1.2SD")) });
    const byCase = caseReactions(settled);
    expect(byCase.cases).toEqual(["D", "L", "SD"]);
    combined.reactions.forEach((r, i) => {
      const sum = 1.2 * byCase.reactions[0][i].force + 1.6 * byCase.reactions[1][i].force + 1.2 * byCase.reactions[2][i].force;
      near(r.force, sum, 100);
    });
    near(valueAt(combined, "deflection", L), 1.2 * D, D, 1e-12);
  });

  it("a spring's base settling: a single span on a pin and a spring moves rigidly (w = Δ at the spring, no force)", () => {
    const s = solve(beam([L], ["pin", 900], [settle(D, L)], EI));
    near(s.reactions[1].force, 0, (900 * D));
    near(valueAt(s, "deflection", L), D, D);
    near(valueAt(s, "deflection", L / 2), D / 2, D);
    near(valueAt(s, "moment", L / 2), 0, 900 * D * L);
  });

  it("a spring's base settling under a continuous member: R = -kΔ/(1 + k f), f = L³/6EI the beam's flexibility there", () => {
    // Compatibility: the beam deflects w = f·(-R) at the middle (simple span 2L, central
    // force: f = (2L)³/48EI); the spring's force is R = k(w - Δ); so w = fkΔ/(1 + fk).
    const k = 2.5e3;
    const s = solve(beam([L, L], ["pin", k, "pin"], [settle(D, L)], EI));
    const f = L ** 3 / (6 * EI);
    near(s.reactions[1].force, (-k * D) / (1 + k * f), k * D);
    near(valueAt(s, "deflection", L), (f * k * D) / (1 + f * k), D);
  });

  it("the deflection at a settling node equals Δ exactly, from both sides, and the statics residual holds", () => {
    const m = beam([3, 4.5, 2], ["fixed", "pin", "pin", "fixed"], [settle(-0.004, 3), settle(0.01, 9.5), udl(6, 0, 9.5)], EI);
    const s = solve(m);
    near(valueAt(s, "deflection", 3), -0.004, 0.01, 1e-12);
    near(valueAt(s, "deflection", 9.5), 0.01, 0.01, 1e-12);
    // The pieces on both sides of the node end and start at Δ.
    const left = pieceList(s.pieces).find((p) => p.x1 === 3)!;
    const right = pieceList(s.pieces).find((p) => p.x0 === 3)!;
    near(right.deflection0, -0.004, 0.01, 1e-12);
    near(pieceValue(left, "deflection", left.x1 - left.x0), -0.004, 0.01, 1e-12);
    let force = 0;
    let moment = 0;
    for (const r of s.reactions) {
      force += r.force;
      moment += r.force * r.x + r.moment;
    }
    force -= 6 * 9.5;
    moment -= (6 * 9.5 * 9.5) / 2;
    near(force, 0, s.loadScale, 1e-12);
    near(moment, 0, s.loadScale * 9.5, 1e-12);
  });
});

describe("settlement: independent force method (ml-matrix) on random members", () => {
  const quantities = ["shear", "moment", "slope", "deflection"] as const;
  let checked = 0;
  for (let seed = 1; seed <= 120; seed++) {
    const m0 = randomMember(7000 + seed, { hinges: true, springs: true });
    if (m0.stiffness === null) continue;
    const nodes = [0];
    for (const span of m0.spans) nodes.push(nodes[nodes.length - 1] + span);
    const settlements: Load[] = [];
    m0.supports.forEach((support, i) => {
      if ((support.kind === "pin" || support.kind === "fixed" || support.kind === "spring") && (seed + i) % 2 === 0) {
        settlements.push({ ...settle(((i % 3) - 1.3) * 1e-3 * (1 + seed / 40), nodes[i], "S"), row: m0.loads.length + settlements.length + 1 });
      }
    });
    if (settlements.length === 0) continue;
    checked++;
    const m: Member = { ...m0, loads: [...m0.loads, ...settlements] };
    it(`seed ${7000 + seed}: every quantity and reaction equals the force method's to 1e-9 of its scale`, () => {
      const s = solve(m);
      const ref = forceMethodSolve(m);
      const length = s.length;
      // Each quantity's own scale, floored at the kit's load scales (a member whose loads cancel has scales of rounding).
      const floor = scalesOf(m);
      let force = floor.force;
      for (const r of ref.reactions) force = Math.max(force, Math.abs(r.force));
      s.reactions.forEach((r, i) => {
        near(r.force, ref.reactions[i].force, force);
        near(r.moment, ref.reactions[i].moment, force * length);
      });
      for (const q of quantities) {
        for (let k = 0; k <= 24; k++) {
          const x = (length * (k + 0.31)) / 25;
          near(valueAt(s, q, x), ref.at(q, x), Math.max(s.scales[q], floor[q]));
        }
      }
    });
  }
  it("checked enough members", () => expect(checked).toBeGreaterThan(40));
});

describe("settlement: refusals name the load row", () => {
  const at = (x: number, row = 2): Load => ({ ...settle(D, x), row });
  it.each([
    ["not at a node", beam([L, L], ["pin", "pin", "pin"], [udl(1, 0, L), at(2)], EI), "load row 2: a settlement belongs at a support node; x = 2 is not a node (nodes are at the span ends)"],
    ["at a free end", beam([L], ["fixed", "free"], [at(L)], EI), "load row 2: the node at x = 5.5 is free, with no vertical restraint to settle; a settlement belongs at a pin, fixed or spring support"],
    ["at a hinge", beam([L, L, L], ["fixed", "hinge", "pin", "pin"], [at(L)], EI), "load row 2: the node at x = 5.5 is hinge, with no vertical restraint to settle; a settlement belongs at a pin, fixed or spring support"],
    ["without EI", beam([L, L], ["pin", "pin", "pin"], [at(L)], null), "load row 2: the forces from a settlement depend on the real EI (without EI the member is taken as uniform); give EI"],
    ["not finite", beam([L], ["fixed", "pin"], [{ ...at(L), magnitude: NaN }], EI), "load row 2: magnitude must be a finite number, got NaN"],
  ])("%s", (_name, m, message) => {
    const error = thrown(() => solve(m as Member));
    expect([error.code, error.message]).toEqual(["#VALUE!", message]);
  });
});
