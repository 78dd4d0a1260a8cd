/**
 * Valid random members written as the host passes them, and their equilibrium residual
 * computed from SPAN.REACTIONS and the load table alone (statics, independent of the
 * solver): sum of vertical forces and sum of moments about x = 0. Signs as DESIGN.md
 * states them: loads down +, couples clockwise +, reactions up +, moment reactions
 * counter-clockwise +. Not a test file.
 */
import fc from "fast-check";

export interface LoadSpec {
  kind: "point" | "moment" | "udl" | "linear";
  w1: number;
  a: number;
  b: number;
  w2: number;
  label: string;
}

export interface ValidMember {
  spans: number[];
  supports: (string | number)[];
  EI: number[] | null;
  loads: LoadSpec[];
  combo: string | null;
}

/** Factors a combination gives each case label ("1.2D+1.6L": D 1.2, L 1.6, others 0). */
export const COMBOS: Record<string, Record<string, number>> = {
  "1.2D+1.6L": { D: 1.2, L: 1.6 },
  "0.9D+1.0W": { D: 0.9, W: 1 },
  "D+L": { D: 1, L: 1 },
};

export function factorOf(member: ValidMember, label: string): number {
  return member.combo === null ? 1 : (COMBOS[member.combo][label] ?? 0);
}

export interface MemberOptions {
  span?: fc.Arbitrary<number>;
  ei?: fc.Arbitrary<number>;
  spring?: (eiOverL3: number) => fc.Arbitrary<number>;
  maxSpans?: number;
}

const round2 = (v: number) => Math.round(v * 100) / 100;

/** A well-formed member: positive spans, one support per node, loads inside the member, no couple on a hinge. */
export function validMember(options: MemberOptions = {}): fc.Arbitrary<ValidMember> {
  const span = options.span ?? fc.double({ min: 0.5, max: 20, noNaN: true }).map(round2);
  const ei = options.ei ?? fc.double({ min: 100, max: 1e5, noNaN: true });
  return fc.array(span, { minLength: 1, maxLength: options.maxSpans ?? 6 }).chain((spans) => {
    const nodeX = [0];
    for (const s of spans) nodeX.push(nodeX[nodeX.length - 1] + s);
    const length = nodeX[nodeX.length - 1];
    const n = spans.length;
    const stiffness = fc.oneof(fc.constant(null), ei.map((v) => new Array<number>(n).fill(v)), fc.array(ei, { minLength: n, maxLength: n }));
    return stiffness.chain((EI) => {
      const eiOverL3 = (EI ? Math.min(...EI) : 1) / Math.max(...spans) ** 3;
      const spring = options.spring ? options.spring(eiOverL3) : fc.double({ min: 0.1, max: 1e3, noNaN: true }).map((f) => f * eiOverL3);
      const support = fc.oneof(
        { weight: 4, arbitrary: fc.constantFrom<string | number>("pin", "fixed", "free") },
        { weight: 1, arbitrary: fc.constant<string | number>("hinge") },
        { weight: 2, arbitrary: EI ? spring : fc.constant<string | number>("pin") },
      );
      const where = fc.oneof(fc.constantFrom(...nodeX), fc.double({ min: 0, max: 1, noNaN: true }).map((f) => f * length));
      const w = fc.double({ min: -50, max: 50, noNaN: true }).map((v) => (Math.abs(v) < 1e-6 ? 0 : v));
      const label = fc.constantFrom("D", "L", "W", "S");
      const load: fc.Arbitrary<LoadSpec> = fc.tuple(fc.constantFrom("point", "moment", "udl", "linear"), w, where, where, w, label).map(([kind, w1, p, q, w2, l]) => {
        const [a, b] = p <= q ? [p, q] : [q, p];
        if (kind === "point" || kind === "moment") return { kind, w1, a: p, b: p, w2: 0, label: l };
        return b - a > 1e-6 * length ? { kind, w1, a, b, w2: kind === "linear" ? w2 : w1, label: l } : { kind: "point", w1, a, b: a, w2: 0, label: l };
      });
      return fc.record({
        spans: fc.constant(spans),
        // A hinge joins two spans, so the member ends never hold one.
        supports: fc.array(support, { minLength: n + 1, maxLength: n + 1 }).map((list) => list.map((s, i) => (s === "hinge" && (i === 0 || i === n) ? "pin" : s))),
        EI: fc.constant(EI),
        loads: fc.array(load, { minLength: 1, maxLength: 6 }),
        combo: fc.constantFrom<string | null>(null, null, ...Object.keys(COMBOS)),
      }).map((m) => {
        // A couple on a hinge is rejected by design: move such couples off the node.
        const hinges = new Set(m.supports.map((s, i) => (s === "hinge" ? nodeX[i] : NaN)));
        m.loads = m.loads.map((l) => (l.kind === "moment" && hinges.has(l.a) ? { ...l, kind: "point" as const } : l));
        return m;
      });
    });
  });
}

/** The member as worksheet-function arguments: spans, loads, supports, EI, combo. */
export function argsOf(m: ValidMember): unknown[] {
  const loads = m.loads.map((l) => {
    if (l.kind === "point" || l.kind === "moment") return [l.kind, l.w1, l.a, "", "", l.label];
    return [l.kind, l.w1, l.a, l.b, l.kind === "linear" ? l.w2 : "", l.label];
  });
  return [[m.spans.slice()], loads, [m.supports.slice()], m.EI ? [m.EI.slice()] : null, m.combo];
}

/** Total load (forces, couples over the length, distributed resultants): the scale residuals are judged by. */
export function loadScale(m: ValidMember): number {
  const length = m.spans.reduce((a, b) => a + b, 0);
  let scale = 0;
  for (const l of m.loads) {
    const f = Math.abs(factorOf(m, l.label));
    if (l.kind === "point") scale += f * Math.abs(l.w1);
    else if (l.kind === "moment") scale += (f * Math.abs(l.w1)) / length;
    else scale += (f * (Math.abs(l.w1) + Math.abs(l.w2)) * (l.b - l.a)) / 2;
  }
  return scale;
}

/**
 * Equilibrium residuals of the reactions against the loads, as fractions of the load scale
 * (moments over the load scale times the member length). Reactions rows: x, R (up +), M (ccw +).
 */
export function residuals(m: ValidMember, reactions: number[][]): { force: number; moment: number; scale: number } {
  const length = m.spans.reduce((a, b) => a + b, 0);
  let force = 0;
  let moment = 0;
  for (const [x, r, mr] of reactions) {
    force += r;
    moment += r * x + mr;
  }
  for (const l of m.loads) {
    const f = factorOf(m, l.label);
    if (l.kind === "point") {
      force -= f * l.w1;
      moment -= f * l.w1 * l.a;
    } else if (l.kind === "moment") {
      moment -= f * l.w1;
    } else {
      // w(x) linear from w1 at a to w2 at b: resultant and first moment about x = 0.
      const d = l.b - l.a;
      force -= (f * (l.w1 + l.w2) * d) / 2;
      moment -= (f * d * (l.w1 * (2 * l.a + l.b) + l.w2 * (l.a + 2 * l.b))) / 6;
    }
  }
  const scale = loadScale(m);
  if (scale === 0) return { force: Math.abs(force), moment: Math.abs(moment), scale };
  return { force: Math.abs(force) / scale, moment: Math.abs(moment) / (scale * length), scale };
}
