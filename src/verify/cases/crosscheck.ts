/**
 * Independent-reference cases: members no handbook tabulates (hinges, vertical and rotational
 * springs, EI changing by decades, decimal spans, every load kind), each compared with an
 * independent computation rather than a printed formula: the force method in BigInt fixed
 * point (src/verify/reference/exactForceMethod.ts, about 190 decimal places; a different
 * method, sharing nothing with the solver but the model types), the reference the exact audit
 * of the test suite (tests/core/exact.test.ts) uses on its 2,600 seeded members.
 *
 * One list, two uses: tests/verify/crosscheck.test.ts runs exactly these cases, and
 * `spanwise verify` writes them into the verification document. Each compared value is
 * judged at 1e-9 of that quantity's own largest magnitude on the member (the exact values'
 * own scale at the stations compared, floored at 1e-4 of the physical scale from the loads),
 * as the exact audit judges. The members are the named ones below and a seeded set
 * (SEEDED_COUNT members from SEED, a fixed generator here, so the list never changes unseen).
 */
import { checkStability, maxOf, validateMember, type Load, type Member, type Quantity, type Support } from "../../core";
import { beam, couple, linear, nodesOf, point, scalesOf, udl, type SupportWord } from "../members";
import { exactForceMethodSolve, type ExactSolution } from "../reference/exactForceMethod";
import type { Check } from "../compare";
import type { HandbookCase } from "./case";
import { seededRandom } from "../seededRandom";

export const REFERENCE_SOURCE =
  "independent computation: the force method (reactions, hinge slope jumps and end slope and deflection as unknowns; equilibrium, support, spring and hinge conditions; loads as singularity functions integrated exactly) carried out in BigInt fixed point with about 190 decimal places (src/verify/reference/exactForceMethod.ts), the reference of the test suite's exact audit";

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];
/** A quantity zero throughout is judged against this fraction of its physical scale from the loads. */
const FLOOR = 1e-4;

export const SEED = 20261202;
export const SEEDED_COUNT = 12;

const withRotation = (word: SupportWord, k: number): Support => ({ ...(typeof word === "number" ? { kind: "spring" as const, stiffness: word } : { kind: word as "pin" | "free" }), rotational: k });

/** The named members: what each exercises is in its name. */
function named(): { name: string; member: Member }[] {
  const all = (L: number): Load[] => [udl(3.1, 0, L * 0.6, "D"), linear(0, 4.2, L * 0.25, L, "L"), point(7.5, L * 0.41, "L"), couple(-5.5, L * 0.77, "D")];
  return [
    { name: "three spans, every load kind, decimal spans", member: beam([4.35, 6.1, 3.7], ["pin", "pin", "pin", "pin"], all(14.15), 21000) },
    { name: "fixed end, overhang, every load kind", member: beam([5.2, 1.65], ["fixed", "pin", "free"], all(6.85), 15500) },
    { name: "two spans with a hinge in the first, fixed ends", member: beam([2.4, 3.6, 5], ["fixed", "hinge", "pin", "fixed"], all(11), 18000) },
    { name: "vertical springs at the inner supports", member: beam([5, 5, 5], ["pin", 1200, 800, "pin"], all(15), 25000) },
    { name: "EI changing by three decades span to span", member: beam([3, 7.5, 2.25], ["fixed", "pin", "pin", "free"], all(12.75), [4e3, 4e6, 4e4]) },
    { name: "rotational springs at both ends (partial fixity), k = EI/L", member: { ...beam([6.4], ["pin", "pin"], all(6.4), 32000), supports: [withRotation("pin", 32000 / 6.4), withRotation("pin", 32000 / 6.4)] } },
    { name: "rotational spring 1e12 EI/L (nearly fixed) and 1e-9 EI/L (nearly pinned)", member: { ...beam([4.8, 4.8], ["pin", "pin", "pin"], all(9.6), 9000), supports: [withRotation("pin", 1e12 * 9000 / 4.8), { kind: "pin" }, withRotation("pin", 1e-9 * 9000 / 4.8)] } },
    { name: "spring with a rotational spring under a cantilever tip", member: { ...beam([7, 2.5], ["fixed", "pin", 400], all(9.5), 12000), supports: [{ kind: "fixed" }, { kind: "pin" }, withRotation(400, 3000)] } },
    { name: "short link beside a hinge", member: beam([6, 0.05, 6], ["fixed", "pin", "hinge", "fixed"], [udl(2, 0, 12.05, "D"), point(9, 6.03, "L")], 20000) },
    { name: "loads exactly at every node and at both ends", member: beam([4, 4, 4], ["pin", "pin", "pin", "pin"], [point(5, 0), point(6, 4), point(7, 8), point(8, 12), couple(3, 0), couple(-2, 12), udl(1.5, 4, 8)], 17000) },
  ];
}

function seeded(count: number, seed: number): { name: string; member: Member }[] {
  const next = seededRandom(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)];
  const round = (v: number, step: number): number => Math.round(v / step) * step;
  const out: { name: string; member: Member }[] = [];
  for (let attempt = 0; out.length < count && attempt < count * 20; attempt++) {
    const n = 1 + Math.floor(next() * 4);
    const spans = Array.from({ length: n }, () => round(1 + next() * 9, 0.05));
    const L = spans.reduce((s, v) => s + v, 0);
    const words: SupportWord[] = Array.from({ length: n + 1 }, (_, i) =>
      i === 0 || i === n ? pick<SupportWord>(["pin", "fixed", "free", round(100 + next() * 5000, 1)]) : pick<SupportWord>(["pin", "pin", "fixed", "hinge", "free", round(100 + next() * 5000, 1)]),
    );
    const EI = Array.from({ length: n }, () => round(Math.pow(10, 3 + next() * 3), 1));
    const loads: Load[] = [];
    const loadCount = 1 + Math.floor(next() * 4);
    for (let k = 0; k < loadCount; k++) {
      const a = round(next() * L, 0.01);
      const b = Math.min(L, round(a + next() * (L - a), 0.01));
      const kind = pick(["point", "udl", "linear", "moment"] as const);
      const w = round(-5 + next() * 20, 0.1) || 1;
      if (kind === "point") loads.push(point(w, a, "D"));
      else if (kind === "moment") loads.push(couple(w, a, "D"));
      else if (b > a && kind === "udl") loads.push(udl(w, a, b, "L"));
      else if (b > a) loads.push(linear(w, round(next() * 10, 0.1), a, b, "L"));
    }
    if (loads.length === 0) loads.push(udl(2, 0, L, "D"));
    const member = beam(spans, words, loads, EI);
    const rotate = next() < 0.4;
    const withSprings: Member = rotate
      ? { ...member, supports: member.supports.map((s, i) => (s.kind === "pin" || s.kind === "spring" || s.kind === "free") && i % 2 === 0 ? { ...s, rotational: round(Math.pow(10, -2 + next() * 4) * EI[Math.min(i, n - 1)] / spans[Math.min(i, n - 1)], 1e-3) || 1 } : s) }
      : member;
    // Only members the functions accept: valid data and no mechanism, both judged from the
    // input alone (validate.ts, stability.ts), never from a solution.
    try {
      validateMember(withSprings);
      checkStability(withSprings);
      exactForceMethodSolve(withSprings);
    } catch {
      continue;
    }
    out.push({ name: `seeded member ${out.length + 1} of ${count} (seed ${seed}): ${n} span${n === 1 ? "" : "s"}, supports ${withSprings.supports.map((s) => s.kind + (s.kind === "spring" ? ` ${s.stiffness}` : "") + ("rotational" in s && s.rotational !== undefined ? " + rot" : "")).join(", ")}`, member: withSprings });
  }
  return out;
}

/** Nodes, span middles, load ends and two points off any grid: where the values are compared. */
function stations(m: Member, index: number): number[] {
  const xs = nodesOf(m);
  const L = xs[xs.length - 1];
  const set = new Set<number>(xs);
  xs.slice(1).forEach((x, i) => set.add((x + xs[i]) / 2));
  for (const l of m.loads) set.add(l.xStart).add(l.kind === "udl" || l.kind === "linear" ? l.xEnd : l.xStart);
  set.add(L * (((index * 0.618034) % 1) * 0.98 + 0.01)).add(L * (((index * 0.414214) % 1) * 0.98 + 0.01));
  return [...set].sort((a, b) => a - b);
}

function checksOf(m: Member, ref: ExactSolution, index: number): Check[] {
  const physical = scalesOf(m);
  const xs = stations(m, index);
  const values = new Map(QUANTITIES.map((q) => [q, xs.map((x) => ref.at(q, x))]));
  const own = (q: Quantity): number => maxOf(values.get(q)!.map(Math.abs), FLOOR * physical[q]);
  const force = maxOf(ref.reactions.map((r) => Math.abs(r.force)), FLOOR * physical.force);
  const moment = maxOf(ref.reactions.map((r) => Math.abs(r.moment)), FLOOR * physical.moment);
  const checks: Check[] = ref.reactions.map((r, i) => ({ reaction: i, force: r.force, moment: r.moment, scale: { force, moment } }));
  for (const q of QUANTITIES) {
    if (q !== "shear" && q !== "moment" && m.stiffness === null) continue;
    const scale = own(q);
    xs.forEach((x, i) => checks.push({ quantity: q, at: x, value: values.get(q)![i], scale }));
  }
  return checks;
}

let built: HandbookCase[] | undefined;

/** The independent-reference cases (built on first use: each needs the BigInt force method). */
export function crosscheckCases(): readonly HandbookCase[] {
  if (built) return built;
  built = [...named(), ...seeded(SEEDED_COUNT, SEED)].map(({ name, member }, index) => ({
    name: `independent reference: ${name}`,
    source: REFERENCE_SOURCE,
    member,
    checks: checksOf(member, exactForceMethodSolve(member), index),
  }));
  return built;
}
