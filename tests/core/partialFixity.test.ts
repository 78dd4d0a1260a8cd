/**
 * Partial fixity: a rotational spring k (moment per radian) at a node, alone (`free`), with a
 * pin, or with a vertical spring. Limits (k huge = fixed, k tiny = pin), closed forms derived by
 * the force method (below), the mechanism check, and the reactions' equilibrium.
 */
import { checkStability, extremes, naturalFrequencies, solve, spanMasses, valueAt, type Member, type Support, type VibrationModel } from "../../src/core";
import fc from "fast-check";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { isClose } from "./kit/close";
import { thrown } from "./kit/errors";
import { forceMethodSolve } from "./kit/forceMethod";
import { beam, lengthOf, nodesOf, point, scalesOf, udl, couple } from "./kit/members";
import { randomMember } from "./kit/random";

const EI = 3.2e4;
const L = 6.5;
const w = 12.5;

function withSupports(base: Member, supports: Support[]): Member {
  return { ...base, supports };
}

/** |a - b| within 1e-9 of the quantity's own scale. */
function near(a: number, b: number, scale: number): void {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * scale);
}

const QUANTITIES = ["shear", "moment", "slope", "deflection"] as const;

/** Every quantity at a grid of x, and the reactions, agree within `tol` of each own scale. */
function sameMember(a: Member, b: Member, tol: number): void {
  const sa = solve(a);
  const sb = solve(b);
  for (const q of QUANTITIES) {
    const scale = sb.scales[q];
    for (let i = 0; i <= 20; i++) {
      const x = (sa.length * i) / 20;
      expect(Math.abs(valueAt(sa, q, x) - valueAt(sb, q, x))).toBeLessThanOrEqual(tol * scale);
    }
  }
  const force = Math.max(...sb.reactions.map((r) => Math.abs(r.force)));
  const moment = Math.max(...sb.reactions.map((r) => Math.abs(r.moment)), force * sa.length);
  sa.reactions.forEach((r, i) => {
    expect(Math.abs(r.force - sb.reactions[i].force)).toBeLessThanOrEqual(tol * force);
    expect(Math.abs(r.moment - sb.reactions[i].moment)).toBeLessThanOrEqual(tol * moment);
  });
}

describe("rotational spring: limits", () => {
  const two = beam([L, 4.2], ["pin", "pin", "pin"], [udl(w, 0, L + 4.2), point(30, 8.1), couple(-15, 2)], EI);
  const pinRot = (k: number): Support => ({ kind: "pin", rotational: k });

  it("a rotational spring of 0 is a pin", () => {
    sameMember(withSupports(two, [pinRot(0), { kind: "pin" }, pinRot(0)]), two, 1e-12);
  });

  it("a rotational spring 1e-12 of EI/L is a pin to 1e-9 of each scale", () => {
    sameMember(withSupports(two, [pinRot((1e-12 * EI) / L), { kind: "pin" }, pinRot((1e-12 * EI) / L)]), two, 1e-9);
  });

  it("a rotational spring 1e12 x EI/L is a fixed end to 1e-9 of each scale", () => {
    const fixed = withSupports(two, [{ kind: "fixed" }, { kind: "pin" }, { kind: "fixed" }]);
    sameMember(withSupports(two, [pinRot((1e12 * EI) / L), { kind: "pin" }, pinRot((1e12 * EI) / 4.2)]), fixed, 1e-9);
  });

  it("with a vertical spring: k huge is a guided spring (free + rot huge = slope held), k 0 is the vertical spring", () => {
    const onSpring = beam([L], ["fixed", 800], [udl(w, 0, L)], EI);
    sameMember(withSupports(onSpring, [{ kind: "fixed" }, { kind: "spring", stiffness: 800, rotational: 0 }]), onSpring, 1e-12);
    // fixed at the left, a free end with a huge rotational spring at the right: a guided (sliding-clamp) end.
    const guided = solve(withSupports(onSpring, [{ kind: "fixed" }, { kind: "free", rotational: 1e12 * (EI / L) }]));
    // Guided cantilever under UDL (force method, the tip couple M released: tip slope wL^3/(6EI)
    // from the load equals ML/EI from M): sagging moment wL^2/6 at the guided end (a right-end
    // couple counter-clockwise, so the reaction is +wL^2/6), tip deflection wL^4/(8EI) - ML^2/(2EI) = wL^4/(24EI).
    near(guided.reactions[1].moment, (w * L * L) / 6, (w * L * L) / 2);
    near(valueAt(guided, "moment", L), (w * L * L) / 6, guided.scales.moment);
    near(valueAt(guided, "deflection", L), (w * L ** 4) / (24 * EI), guided.scales.deflection);
  });
});

describe("rotational spring: closed forms (force method)", () => {
  // Propped cantilever, rotational spring k with a pin at the left, pin at the right, UDL w.
  // Release the left moment M (simple span): rotation at A from the UDL is wL^3/(24EI), from M
  // it is ML/(3EI) against it; compatibility wL^3/(24EI) - ML/(3EI) = M/k gives
  // M = (wL^2/8) / (1 + 3EI/(kL)) (hogging at A). k -> infinity: wL^2/8 (propped cantilever,
  // any structural analysis textbook, from memory); k -> 0: 0 (simple span).
  it.each([0.1, 1, 3, 10, 1000])("propped cantilever with a rotational spring k = %p x EI/L under UDL", (ratio) => {
    const k = (ratio * EI) / L;
    const s = solve(beam([L], ["pin", "pin"], [udl(w, 0, L)], EI));
    const m = solve(withSupports(beam([L], ["pin", "pin"], [udl(w, 0, L)], EI), [{ kind: "pin", rotational: k }, { kind: "pin" }]));
    const M = (w * L * L) / 8 / (1 + (3 * EI) / (k * L));
    const force = w * L;
    near(m.reactions[0].force, (w * L) / 2 + M / L, force);
    near(m.reactions[1].force, (w * L) / 2 - M / L, force);
    near(m.reactions[0].moment, M, m.scales.moment);
    near(valueAt(m, "moment", 0), -M, m.scales.moment);
    near(valueAt(m, "slope", 0), M / k, m.scales.slope);
    // the spring's moment is its stiffness times the node's rotation
    near(m.reactions[0].moment, k * valueAt(m, "slope", 0), m.scales.moment);
    // largest sagging moment: at V = 0, x0 = R_A / w, M = -M + R_A^2 / (2w)
    const RA = (w * L) / 2 + M / L;
    near(extremes(m, "moment").max, -M + (RA * RA) / (2 * w), m.scales.moment);
    expect(s.reactions[0].moment).toBe(0);
  });

  // Cantilever on a pin with a rotational spring (statically determinate): reaction moment PL,
  // tip deflection PL^3/(3EI) (cantilever, from memory) plus the rigid rotation PL/k times L.
  it.each([0.5, 2, 50])("cantilever on a rotational spring k = %p x EI/L with a tip load", (ratio) => {
    const k = (ratio * EI) / L;
    const P = 40;
    const m = solve(withSupports(beam([L], ["pin", "free"], [point(P, L)], EI), [{ kind: "pin", rotational: k }, { kind: "free" }]));
    near(m.reactions[0].force, P, P);
    near(m.reactions[0].moment, P * L, P * L);
    near(valueAt(m, "deflection", L), (P * L ** 3) / (3 * EI) + (P * L * L) / k, m.scales.deflection);
  });

  // Rotational spring on a vertical spring: both springs carry the determinate reactions, so the
  // tip deflection adds P/s (the spring's travel) to the case above.
  it("cantilever on a vertical spring s with a rotational spring k", () => {
    const k = (2 * EI) / L;
    const sV = 900;
    const P = 40;
    const m = solve(withSupports(beam([L], ["pin", "free"], [point(P, L)], EI), [{ kind: "spring", stiffness: sV, rotational: k }, { kind: "free" }]));
    near(m.reactions[0].force, P, P);
    near(m.reactions[0].moment, P * L, P * L);
    near(valueAt(m, "deflection", 0), P / sV, m.scales.deflection);
    near(valueAt(m, "deflection", L), P / sV + (P * L ** 3) / (3 * EI) + (P * L * L) / k, m.scales.deflection);
  });
});

describe("rotational spring: mechanisms and refusals", () => {
  const supported = (supports: Support[]): Member => withSupports(beam([L], ["pin", "pin"], [], EI), supports);

  it("a rotational spring alone at one end of a member with no vertical support is a mechanism", () => {
    const error = thrown(() => checkStability(supported([{ kind: "free", rotational: 1e6 }, { kind: "free" }])));
    expect(error.message).toMatch(/^unstable: the part of the member from x = 0 to x = 6\.5 can move freely/);
  });

  it("rotational springs at both ends without a vertical restraint are a mechanism (the member slides)", () => {
    expect(() => checkStability(supported([{ kind: "free", rotational: 1e6 }, { kind: "free", rotational: 1e6 }]))).toThrow(/unstable/);
  });

  it("a rotational spring with a pin elsewhere, or with a pin at its node, is stable", () => {
    expect(() => checkStability(supported([{ kind: "free", rotational: 1e6 }, { kind: "pin" }]))).not.toThrow();
    expect(() => checkStability(supported([{ kind: "pin", rotational: 1e6 }, { kind: "free" }]))).not.toThrow();
    expect(() => checkStability(supported([{ kind: "spring", stiffness: 10, rotational: 1e6 }, { kind: "free" }]))).not.toThrow();
  });

  it("a rotational spring of 0 restrains nothing: a pin with rot 0 and a free end is a mechanism", () => {
    expect(() => checkStability(supported([{ kind: "pin", rotational: 0 }, { kind: "free" }]))).toThrow(/unstable/);
  });

  it.each([
    ["negative", { kind: "pin", rotational: -1 }, /support 1 \(x = 0\): rotational spring stiffness must be a positive number \(moment per radian\), got -1/],
    ["not finite", { kind: "pin", rotational: Infinity }, /rotational spring stiffness must be a positive number/],
    ["with fixed", { kind: "fixed", rotational: 5 }, /a rotational spring belongs with pin, free or a vertical spring, not with fixed/],
  ])("refuses a rotational spring %s", (_name, support, message) => {
    expect(() => solve(supported([support as Support, { kind: "pin" }]))).toThrow(message);
  });

  it("needs EI", () => {
    const m: Member = { ...supported([{ kind: "pin", rotational: 5 }, { kind: "pin" }]), stiffness: null };
    expect(() => solve(m)).toThrow(/support 1 \(x = 0\): a rotational spring needs EI/);
  });
});

describe("rotational spring: vibration", () => {
  // Cantilever roots beta L = 1.8751 and simple span pi (Blevins, from memory): a huge
  // rotational spring with a pin is a fixed end; a tiny one is a pin.
  const m = 0.85;
  const unit = Math.sqrt(EI / (m * L ** 4));
  const model = (supports: Support[]): VibrationModel => ({ member: { spans: [L], supports, stiffness: [EI], loads: [] }, masses: spanMasses([L], [m]) });
  it("pin + rot huge with a free end vibrates as a cantilever; pin + rot tiny with a pin as a simple span", () => {
    const [cantilever] = naturalFrequencies(model([{ kind: "pin", rotational: 1e12 * (EI / L) }, { kind: "free" }]), 1);
    expect(Math.abs(cantilever / (1.8751040687 ** 2 * unit) - 1)).toBeLessThan(1e-8);
    const [simple] = naturalFrequencies(model([{ kind: "pin", rotational: 1e-12 * (EI / L) }, { kind: "pin" }]), 1);
    expect(Math.abs(simple / (Math.PI ** 2 * unit) - 1)).toBeLessThan(1e-8);
  });
});

describe("rotational springs on random members against the force method (kit/forceMethod.ts, rotational compatibility M = k·θ)", () => {
  // Each seed's random member (kit/random.ts) gets a rotational spring of 0.05 to 50 x the EI/L
  // of the span beside it at every other pin, free or spring node; adding a restraint keeps it stable.
  const seeds = Array.from({ length: 40 }, (_, i) => 4242 + 104729 * i);
  it.each(seeds)("seed %i", (seed) => {
    const base = randomMember(seed);
    const rng = fc.sample(fc.array(fc.double({ min: Math.log(0.05), max: Math.log(50), noNaN: true }), { minLength: 64, maxLength: 64 }), { seed, numRuns: 1 })[0];
    const ei = (span: number): number => (base.stiffness === null ? 1 : base.stiffness.length === 1 ? base.stiffness[0] : base.stiffness[span]);
    const supports = base.supports.map((s, n): Support => {
      if ((s.kind !== "pin" && s.kind !== "free" && s.kind !== "spring") || (n + seed) % 2 === 1) return s;
      const span = Math.min(n, base.spans.length - 1);
      return { ...s, rotational: (Math.exp(rng[n % 64]) * ei(span)) / base.spans[span] };
    });
    const m: Member = { ...base, supports };
    const sol = solve(m);
    const ref = forceMethodSolve(m);
    const s = scalesOf(m);
    const off: string[] = [];
    const check = (what: string, got: number, want: number, scale: number): void => {
      if (!isClose(got, want, HANDBOOK_TOLERANCE, scale)) off.push(`${what}: got ${got}, want ${want}`);
    };
    sol.reactions.forEach((r, i) => {
      check(`reaction force at node ${i}`, r.force, ref.reactions[i].force, s.force);
      check(`reaction moment at node ${i}`, r.moment, ref.reactions[i].moment, s.moment);
    });
    const L = lengthOf(m);
    const xs = [...new Set([...nodesOf(m), ...m.loads.flatMap((l) => [l.xStart, l.xEnd]), 0.137 * L, 0.618 * L, 0.9 * L])].sort((a, b) => a - b);
    for (const x of xs) for (const q of QUANTITIES) check(`${q} at x = ${x}`, valueAt(sol, q, x), ref.at(q, x), s[q]);
    expect({ supports: JSON.stringify(m.supports), off }).toEqual({ supports: JSON.stringify(m.supports), off: [] });
  });

  it("the seeds reach rotational springs with a pin, a vertical spring and alone", () => {
    const kinds = new Set<string>();
    for (const seed of seeds) {
      randomMember(seed).supports.forEach((s, n) => {
        if ((s.kind === "pin" || s.kind === "free" || s.kind === "spring") && (n + seed) % 2 === 0) kinds.add(s.kind);
      });
    }
    expect([...kinds].sort()).toEqual(["free", "pin", "spring"]);
  });
});
