/**
 * Shear deformation: an optional shear stiffness G·A_v per span (Member.shear) makes each span
 * an exact prismatic Timoshenko element; deflection adds the integral of V/(G·A_v), and slope
 * is the rotation of the section (from M/EI), so d(deflection)/dx = slope + V/(G·A_v).
 *
 * Closed-form sources: the shear-deflection terms (simple span UDL wL²/8GA, central point
 * PL/4GA; cantilever tip load PL/GA, UDL wL²/2GA) are the classic ones of Timoshenko beam
 * theory as given in the strength-of-materials texts (S. P. Timoshenko and J. M. Gere,
 * Mechanics of Materials, the section on shear deflections of beams) — from memory, edition
 * not at hand; each is re-derived beside its check from dw_s/dx = V/(G·A_v), so the check does
 * not rest on memory. Indeterminate members: derived by compatibility from those forms, and
 * an independent force-method solve (tests/core/kit/forceMethod.ts with ml-matrix) on random
 * members.
 */
import { applyCombination, pieceList, extremes, governingPeaks, movingLoad, parseCombination, solve, trainFrom, valueAt, type Load, type Member } from "../../src/core";
import { assembleMember } from "../../src/core/stiffness";
import { solvePrecise } from "../../src/core/precise";
import { thrown } from "./kit/errors";
import { forceMethodSolve } from "./kit/forceMethod";
import { beam, couple, linear, point, udl } from "./kit/members";
import { scalesOf } from "./kit/members";
import { randomMember } from "./kit/random";

const EI = 2.1e4;
const GA = 3.7e4;
const L = 4.5;
const w = 9.5;
const P = 22;

const sheared = (m: Member, ga: number | (number | null)[] = GA): Member => ({ ...m, shear: Array.isArray(ga) ? ga : [ga] });

function near(a: number, b: number, scale: number, tol = 1e-9): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(tol * scale);
}

describe("shear deformation: closed forms", () => {
  it("simple span, UDL: mid-span deflection 5wL⁴/384EI + wL²/8GA; end slope (section rotation) wL³/24EI; reactions wL/2", () => {
    // Shear part: w_s(x) = ∫V/GA = w(Lx - x²)/2GA, wL²/8GA at mid-span.
    const s = solve(sheared(beam([L], ["pin", "pin"], [udl(w, 0, L)], EI)));
    const want = (5 * w * L ** 4) / (384 * EI) + (w * L * L) / (8 * GA);
    near(valueAt(s, "deflection", L / 2), want, want);
    near(valueAt(s, "slope", 0), (w * L ** 3) / (24 * EI), s.scales.slope);
    near(s.reactions[0].force, (w * L) / 2, w * L);
    const peak = extremes(s, "deflection");
    near(peak.max, want, want);
    near(peak.xMax, L / 2, L, 1e-7);
  });

  it("simple span, central point load: PL³/48EI + PL/4GA", () => {
    // Shear part: V = P/2 over half the span, P/2 · L/2 / GA.
    const s = solve(sheared(beam([L], ["pin", "pin"], [point(P, L / 2)], EI)));
    const want = (P * L ** 3) / (48 * EI) + (P * L) / (4 * GA);
    near(valueAt(s, "deflection", L / 2), want, want);
  });

  it("cantilever, tip load: PL³/3EI + PL/GA; tip slope (section rotation) PL²/2EI", () => {
    const s = solve(sheared(beam([L], ["fixed", "free"], [point(P, L)], EI)));
    const want = (P * L ** 3) / (3 * EI) + (P * L) / GA;
    near(valueAt(s, "deflection", L), want, want);
    near(valueAt(s, "slope", L), (P * L * L) / (2 * EI), s.scales.slope);
  });

  it("cantilever, UDL: wL⁴/8EI + wL²/2GA", () => {
    // Shear part: ∫ w(L - x)/GA from 0 to L.
    const s = solve(sheared(beam([L], ["fixed", "free"], [udl(w, 0, L)], EI)));
    const want = (w * L ** 4) / (8 * EI) + (w * L * L) / (2 * GA);
    near(valueAt(s, "deflection", L), want, want);
  });

  it("fixed-fixed, UDL: end moments -wL²/12 (unchanged by symmetry), mid-span wL⁴/384EI + wL²/8GA", () => {
    const s = solve(sheared(beam([L], ["fixed", "fixed"], [udl(w, 0, L)], EI)));
    near(valueAt(s, "moment", 0), (-w * L * L) / 12, (w * L * L) / 12);
    const want = (w * L ** 4) / (384 * EI) + (w * L * L) / (8 * GA);
    near(valueAt(s, "deflection", L / 2), want, want);
  });

  it("fixed-fixed, central point load: end moments -PL/8, mid-span PL³/192EI + PL/4GA", () => {
    const s = solve(sheared(beam([L], ["fixed", "fixed"], [point(P, L / 2)], EI)));
    near(valueAt(s, "moment", 0), (-P * L) / 8, (P * L) / 8);
    const want = (P * L ** 3) / (192 * EI) + (P * L) / (4 * GA);
    near(valueAt(s, "deflection", L / 2), want, want);
  });

  it("propped cantilever, UDL: prop reaction wL(3 + φ)/(2(4 + φ)), φ = 12EI/(GA L²) (3wL/8 at φ = 0)", () => {
    // Compatibility at the prop, from the cantilever forms above: R(L³/3EI + L/GA) = wL⁴/8EI + wL²/2GA.
    const phi = (12 * EI) / (GA * L * L);
    const s = solve(sheared(beam([L], ["fixed", "pin"], [udl(w, 0, L)], EI)));
    near(s.reactions[1].force, (w * L * (3 + phi)) / (2 * (4 + phi)), w * L);
  });

  it("fixed-fixed, point load at a: end moments Pab/L² · (b + φL/2)/(1 + φ) (by compatibility, released left-end cantilever)", () => {
    // Derived here: release the right end (cantilever from the left). Unknown right-end shear R
    // and moment M_B; rotation and deflection at the right end vanish. Solved with the
    // force-method kit, and the closed form written out for the left end.
    const a = 1.3;
    const b = L - a;
    const phi = (12 * EI) / (GA * L * L);
    const m = sheared(beam([L], ["fixed", "fixed"], [point(P, a)], EI));
    const s = solve(m);
    const ref = forceMethodSolve(m);
    near(s.reactions[0].moment, ref.reactions[0].moment, P * L);
    near(s.reactions[0].moment, ((P * a * b) / (L * L)) * ((b + (phi * L) / 2) / (1 + phi)), P * L);
  });
});

describe("shear deformation: limits and invariants", () => {
  const two = beam([L, 3.2], ["fixed", "pin", 900], [udl(w, 0, L + 3.2), point(P, 5.9), couple(-12, 1.1), linear(2, 7, 0.5, 3)], EI);

  it("no shear stiffness, or null for every span, is today's solve bit for bit", () => {
    const plain = solve(two);
    for (const m of [{ ...two, shear: null }, { ...two, shear: [null] }, { ...two, shear: [null, null] }]) {
      const s = solve(m);
      expect(s.reactions).toEqual(plain.reactions);
      expect(pieceList(s.pieces)).toEqual(pieceList(plain.pieces));
    }
  });

  it("G·A_v 1e12 times EI/L² is Euler–Bernoulli to 1e-9 of each scale", () => {
    const plain = solve(two);
    const s = solve(sheared(two, 1e12 * (EI / (L * L))));
    for (const q of ["shear", "moment", "slope", "deflection"] as const) {
      for (let k = 0; k <= 20; k++) near(valueAt(s, q, (k * s.length) / 20), valueAt(plain, q, (k * s.length) / 20), plain.scales[q]);
    }
  });

  it("d(deflection)/dx = slope + V/GA inside every piece (the axis slope against the section rotation)", () => {
    const s = solve(sheared(two, [GA, 2 * GA]));
    for (const p of pieceList(s.pieces)) {
      const h = 1e-6 * (p.x1 - p.x0);
      const x = (p.x0 + p.x1) / 2;
      const numeric = (valueAt(s, "deflection", x + h) - valueAt(s, "deflection", x - h)) / (2 * h);
      near(numeric, valueAt(s, "slope", x) + valueAt(s, "shear", x) * p.shearFlexibility, s.scales.slope, 1e-6);
    }
  });
});

describe("shear deformation: independent force method (ml-matrix) on random members", () => {
  const quantities = ["shear", "moment", "slope", "deflection"] as const;
  let checked = 0;
  for (let seed = 1; seed <= 100; seed++) {
    const m0 = randomMember(9100 + seed, { hinges: true, springs: true });
    if (m0.stiffness === null) continue;
    checked++;
    // φ from about 0.01 to 10 per span, one span in five without shear deformation.
    const shear = m0.spans.map((span, i) => ((seed + i) % 5 === 0 ? null : (12 * m0.stiffness![i]) / (span * span * 10 ** (((seed * 7 + i * 3) % 30) / 10 - 2))));
    const nodes = [0];
    for (const span of m0.spans) nodes.push(nodes[nodes.length - 1] + span);
    const settlements: Load[] = [];
    m0.supports.forEach((support, i) => {
      if ((support.kind === "pin" || support.kind === "spring") && seed % 3 === 0) {
        settlements.push({ kind: "settle", magnitude: 2e-3 * ((i % 2) - 0.4), xStart: nodes[i], xEnd: nodes[i], magnitudeEnd: 0, loadCase: "", row: 50 + i });
      }
    });
    const m: Member = { ...m0, shear, loads: [...m0.loads, ...settlements] };
    it(`seed ${9100 + seed}: every quantity and reaction equals the force method's to 1e-9 of its scale`, () => {
      const s = solve(m);
      const ref = forceMethodSolve(m);
      // Each quantity's own scale, floored at the kit's load scales (a member whose loads cancel has scales of rounding).
      const floor = scalesOf(m);
      let force = floor.force;
      for (const r of ref.reactions) force = Math.max(force, Math.abs(r.force));
      s.reactions.forEach((r, i) => {
        near(r.force, ref.reactions[i].force, force);
        near(r.moment, ref.reactions[i].moment, force * s.length);
      });
      for (const q of quantities) {
        for (let k = 0; k <= 24; k++) {
          const x = (s.length * (k + 0.37)) / 25;
          near(valueAt(s, q, x), ref.at(q, x), Math.max(s.scales[q], floor[q]));
        }
      }
    });
    it(`seed ${9100 + seed}: the double-double solve gives the same displacements and end forces`, () => {
      const s = solve(m);
      const assembly = assembleMember(m);
      const precise = solvePrecise(m, assembly.layout, assembly.spanLoads, assembly.system.halfBandwidth);
      let largest = 0;
      for (const v of s.displacements) largest = Math.max(largest, Math.abs(v));
      precise.displacements.forEach((v, i) => near(v, s.displacements[i], largest, 1e-9));
    });
  }
  it("checked enough members", () => expect(checked).toBeGreaterThan(40));
});

describe("shear deformation: refusals", () => {
  const m = beam([L, L], ["pin", "pin", "pin"], [udl(w, 0, 2 * L)], EI);
  it.each([
    ["zero", sheared(m, 0), "shear stiffness of the member: GA must be a positive number (force units), got 0"],
    ["negative on span 2", sheared(m, [GA, -1]), "shear stiffness of span 2: GA must be a positive number (force units), got -1"],
    ["not finite", sheared(m, Infinity), "shear stiffness of the member: GA must be a positive number (force units), got Infinity"],
    ["wrong count", sheared(m, [GA, GA, GA]), "EI: give the shear stiffness once for the member or once per span (2), got 3"],
    ["without EI", { ...sheared(m), stiffness: null }, "shear stiffness of the member: shear deformation needs EI, since the result depends on EI relative to GA"],
  ])("%s", (_name, member, message) => {
    const error = thrown(() => solve(member as Member));
    expect([error.code, error.message]).toEqual(["#VALUE!", message]);
  });
});

describe("shear deformation and settlement in studies (superposition)", () => {
  it("PEAKS of a combination equals the extremes of the combination solved directly, deflection included", () => {
    const settle: Load = { kind: "settle", magnitude: 0.004, xStart: 4.5, xEnd: 4.5, magnitudeEnd: 0, loadCase: "SD", row: 3 };
    const m: Member = {
      ...beam([L, 3.2, 4], ["pin", "pin", "pin", "fixed"], [udl(w, 0, 11.7, "D"), point(P, 6, "L")], EI),
      shear: [GA, null, 2 * GA],
    };
    const member: Member = { ...m, loads: [...m.loads, settle] };
    const combination = parseCombination("1.2D+1.6L+1.2SD");
    const [peaks] = [governingPeaks(member, [combination])];
    const direct = solve({ ...member, loads: applyCombination(member.loads, combination) });
    for (const row of peaks) {
      const e = extremes(direct, row.quantity);
      near(row.max.value, e.max, direct.scales[row.quantity]);
      near(row.min.value, e.min, direct.scales[row.quantity]);
    }
    expect(peaks.map((r) => r.quantity)).toEqual(["shear", "moment", "slope", "deflection"]);
  });
});

describe("shear deformation under a moving load", () => {
  it("MOVING's peak deflection of a two-axle train equals the best of a dense sweep of direct solves (and is reached by it)", () => {
    const m: Member = { ...beam([L, 3.2], ["fixed", "pin", "pin"], [], EI), shear: [GA, GA / 3] };
    const train = trainFrom([10, 6], [1.1]);
    const effect = { kind: "deflection" as const, x: 2.1 };
    const result = movingLoad(m, train, effect);
    let best = -Infinity;
    let scale = 0;
    const length = L + 3.2;
    // An even sweep plus every placement with an axle at the section (the influence line's kink from shear).
    const leads = Array.from({ length: 4001 }, (_, k) => -1.1 + ((length + 2.2) * k) / 4000).concat([effect.x, effect.x + 1.1, effect.x - 1.1]);
    for (const lead of leads) {
      for (const reversed of [false, true]) {
        const loads: Load[] = [];
        [0, 1].forEach((i) => {
          const at = reversed ? lead - (i === 0 ? 0 : -1.1) : lead + (i === 0 ? 0 : -1.1);
          if (at >= 0 && at <= length) loads.push({ ...point(train.loads[i], at), row: i + 1 });
        });
        if (loads.length === 0) continue;
        const s = solve({ ...m, loads });
        const v = valueAt(s, "deflection", effect.x);
        best = Math.max(best, v);
        scale = Math.max(scale, s.scales.deflection);
      }
    }
    expect(result.max.value).toBeGreaterThanOrEqual(best - 1e-9 * scale);
    // a smooth peak between sweep steps of 4 mm is missed by far less than 1e-8 of the scale
    expect(result.max.value - best).toBeLessThanOrEqual(1e-8 * scale);
  });
});

describe("shear deformation and settlement on the double-double path", () => {
  // The double solve of this member is not assured (its pivots lose digits), so solve() takes precise.ts.
  it("a 0.05 link beside a hinge (solved in double-double) agrees with the force method", () => {
    const settle: Load = { kind: "settle", magnitude: 0.003, xStart: 9.05, xEnd: 9.05, magnitudeEnd: 0, loadCase: "", row: 3 };
    const base = beam([4, 0.05, 5], ["fixed", "hinge", "pin", "fixed"], [udl(w, 0, 9.05), point(P, 2)], [EI, 50 * EI, EI]);
    const m: Member = { ...base, shear: [GA, 40 * GA, null], loads: [...base.loads, settle] };
    const s = solve(m);
    const ref = forceMethodSolve(m);
    const floor = scalesOf(m);
    for (const q of ["shear", "moment", "slope", "deflection"] as const) {
      for (let k = 0; k <= 30; k++) {
        const x = (s.length * (k + 0.41)) / 31;
        near(valueAt(s, q, x), ref.at(q, x), Math.max(s.scales[q], floor[q]));
      }
    }
  });
});

describe("shear deformation and stability", () => {
  it("a shear stiffness adds no mechanism and removes none: the same refusal with and without it", () => {
    const mechanism = beam([L, L], ["pin", "hinge", "pin"], [udl(w, 0, 2 * L)], EI);
    const plain = thrown(() => solve(mechanism));
    const withShear = thrown(() => solve(sheared(mechanism)));
    expect([withShear.code, withShear.message]).toEqual([plain.code, plain.message]);
    expect(() => solve(sheared(beam([L, L], ["fixed", "hinge", "pin"], [udl(w, 0, 2 * L)], EI)))).not.toThrow();
  });
});
