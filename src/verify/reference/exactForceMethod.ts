/**
 * The force method of forceMethod.ts carried out in BigInt fixed point (fixed.ts): unknowns
 * are the support reactions, the slope jumps at hinges and the slope and deflection at the
 * left end; equations are equilibrium past the right end, zero deflection (and slope) at
 * supports, spring compatibility (vertical, and rotational: moment = k x rotation) and zero moment at hinges; every quantity is a sum of
 * singularity functions (Macaulay brackets) integrated exactly span by span. With about 190
 * decimal places of resolution it is exact for the suite's purposes however ill-conditioned
 * the member (a short link beside a hinge, springs 1e-9 or 1e12 of the spans' stiffness, EI
 * ratios of 1e6), so the product can be held to 1e-9 of each quantity's own scale.
 *
 * Positions follow the documented rule (src/core/positions.ts, restated here, not imported):
 * a position within 1e-12 of the member length of a node is that node. Node positions are
 * the exact sums of the spans. It shares nothing with src/core but the model types.
 */
import type { Member, Quantity } from "../../core";
import * as F from "./fixed";
import type { Fixed } from "./fixed";

const RULE = 1e-12;

interface Term {
  at: Fixed;
  power: number;
  /** Coefficient per unknown, then the constant. */
  coefficient: Fixed[];
}

interface Resolved {
  at: Fixed;
  power: number;
  c: Fixed;
}

export class ExactMechanism extends Error {}

export interface ExactSolution {
  length: number;
  nodeX: number[];
  reactions: { x: number; force: number; moment: number }[];
  /** Value just right of x (just left at the member's right end) unless a side is given. */
  at(quantity: Quantity, x: number, side?: "left" | "right"): number;
}

const INTEGERS = Array.from({ length: 8 }, (_, i) => F.fromInteger(i));

function bracket(x: Fixed, at: Fixed, power: number, includeAt: boolean): Fixed {
  if (x < at || (x === at && !includeAt && power === 0)) return 0n;
  return power === 0 ? F.ONE : F.pow(x - at, power);
}

/** Integral of <t-a>^n over [s, x]. */
function integral1(s: Fixed, x: Fixed, at: Fixed, power: number): Fixed {
  const lo = s > at ? s : at;
  if (x <= lo) return 0n;
  return F.div(F.pow(x - at, power + 1) - F.pow(lo - at, power + 1), INTEGERS[power + 1]);
}

/** Integral of (x-t)<t-a>^n over [s, x]. */
function integral2(s: Fixed, x: Fixed, at: Fixed, power: number): Fixed {
  const lo = s > at ? s : at;
  if (x <= lo) return 0n;
  const u1 = x - at;
  const u0 = lo - at;
  const f = (u: Fixed): Fixed => F.div(F.mul(u1, F.pow(u, power + 1)), INTEGERS[power + 1]) - F.div(F.pow(u, power + 2), INTEGERS[power + 2]);
  return f(u1) - f(u0);
}

/** Gaussian elimination with partial pivoting; null when a pivot vanishes against the matrix (a mechanism). */
function solveLinear(a: Fixed[][], b: Fixed[]): Fixed[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  let largest = 0n;
  for (const row of a) for (const v of row) if (F.abs(v) > largest) largest = F.abs(v);
  const floor = largest >> 300n;
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (F.abs(m[r][col]) > F.abs(m[pivot][col])) pivot = r;
    if (F.abs(m[pivot][col]) <= floor) return null;
    [m[col], m[pivot]] = [m[pivot], m[col]];
    for (let r = col + 1; r < n; r++) {
      if (m[r][col] === 0n) continue;
      const factor = F.div(m[r][col], m[col][col]);
      for (let c = col; c <= n; c++) m[r][c] -= F.mul(factor, m[col][c]);
    }
  }
  const x = new Array<Fixed>(n).fill(0n);
  for (let r = n - 1; r >= 0; r--) {
    let sum = m[r][n];
    for (let c = r + 1; c < n; c++) sum -= F.mul(m[r][c], x[c]);
    x[r] = F.div(sum, m[r][r]);
  }
  return x;
}

/** A node's rotational spring (moment per radian), read here independently of src/core. */
function rotationalOf(support: Member["supports"][number]): number {
  const k = (support as { rotational?: number }).rotational;
  return k === undefined ? 0 : k;
}

export function exactForceMethodSolve(member: Member): ExactSolution {
  const spanCount = member.spans.length;
  const nodes: Fixed[] = [0n];
  for (const span of member.spans) nodes.push(nodes[nodes.length - 1] + F.fromNumber(span));
  const doubleLength = member.spans.reduce((s, v) => s + v, 0);
  const length = nodes[spanCount];
  const tolerance = RULE * doubleLength;
  /** A position by the rule: the exact node when within the tolerance of one. */
  const place = (x: number): Fixed => {
    for (const node of nodes) if (Math.abs(x - F.toNumber(node)) <= tolerance) return node;
    return F.fromNumber(x);
  };
  const flexibility = member.spans.map((_, i) => F.div(F.ONE, F.fromNumber(member.stiffness ? (member.stiffness.length === 1 ? member.stiffness[0] : member.stiffness[i]) : 1)));

  const forceIndex: (number | null)[] = [];
  const momentIndex: (number | null)[] = [];
  const hingeIndex: (number | null)[] = [];
  let count = 0;
  member.supports.forEach((support) => {
    const vertical = support.kind === "pin" || support.kind === "fixed" || support.kind === "spring";
    forceIndex.push(vertical ? count++ : null);
    momentIndex.push(support.kind === "fixed" || rotationalOf(support) > 0 ? count++ : null);
  });
  member.supports.forEach((support, i) => {
    hingeIndex.push(support.kind === "hinge" && i > 0 && i < spanCount ? count++ : null);
  });
  const slopeIndex = count++;
  const deflectionIndex = count++;
  const size = count;

  const zero = (): Fixed[] => new Array<Fixed>(size + 1).fill(0n);
  const constant = (c: Fixed): Fixed[] => {
    const v = zero();
    v[size] = c;
    return v;
  };
  const unit = (index: number, scale: Fixed = F.ONE): Fixed[] => {
    const v = zero();
    v[index] = scale;
    return v;
  };
  const addScaled = (acc: Fixed[], b: Fixed[], scale: Fixed): void => {
    if (scale === 0n) return;
    for (let i = 0; i <= size; i++) if (b[i] !== 0n) acc[i] += F.mul(scale, b[i]);
  };

  const terms: Term[] = [];
  member.supports.forEach((_, i) => {
    const f = forceIndex[i];
    const m = momentIndex[i];
    if (f !== null) terms.push({ at: nodes[i], power: 1, coefficient: unit(f) });
    if (m !== null) terms.push({ at: nodes[i], power: 0, coefficient: unit(m, -F.ONE) });
  });
  for (const load of member.loads) {
    const magnitude = F.fromNumber(load.magnitude);
    if (load.kind === "point") terms.push({ at: place(load.xStart), power: 1, coefficient: constant(-magnitude) });
    else if (load.kind === "moment") terms.push({ at: place(load.xStart), power: 0, coefficient: constant(magnitude) });
    else {
      const a = place(load.xStart);
      const b = place(load.xEnd);
      const q0 = magnitude;
      const q1 = load.kind === "udl" ? magnitude : F.fromNumber(load.magnitudeEnd);
      const k = F.div(q1 - q0, b - a);
      const loadTerms: [Fixed, number, Fixed][] = [
        [a, 0, q0],
        [a, 1, k],
        [b, 0, -q1],
        [b, 1, -k],
      ];
      for (const [at, m, c] of loadTerms) {
        if (c !== 0n) terms.push({ at, power: m + 2, coefficient: constant(F.div(-c, INTEGERS[(m + 1) * (m + 2)] ?? F.fromInteger((m + 1) * (m + 2)))) });
      }
    }
  }

  const momentAt = (x: Fixed, includeAt: boolean): Fixed[] => {
    const acc = zero();
    for (const t of terms) addScaled(acc, t.coefficient, bracket(x, t.at, t.power, includeAt));
    return acc;
  };
  const shearAt = (x: Fixed, includeAt: boolean): Fixed[] => {
    const acc = zero();
    for (const t of terms) if (t.power > 0) addScaled(acc, t.coefficient, INTEGERS[t.power] === undefined ? 0n : F.mul(INTEGERS[t.power], bracket(x, t.at, t.power - 1, includeAt)));
    return acc;
  };
  const slopeIn = (span: number, start: Fixed[], x: Fixed): Fixed[] => {
    const acc = start.slice();
    for (const t of terms) addScaled(acc, t.coefficient, -F.mul(flexibility[span], integral1(nodes[span], x, t.at, t.power)));
    return acc;
  };
  const deflectionIn = (span: number, startSlope: Fixed[], startDeflection: Fixed[], x: Fixed): Fixed[] => {
    const acc = startDeflection.slice();
    addScaled(acc, startSlope, x - nodes[span]);
    for (const t of terms) addScaled(acc, t.coefficient, -F.mul(flexibility[span], integral2(nodes[span], x, t.at, t.power)));
    return acc;
  };

  const spanStartSlope: Fixed[][] = [];
  const spanStartDeflection: Fixed[][] = [];
  let slope = unit(slopeIndex);
  let deflection = unit(deflectionIndex);
  for (let span = 0; span < spanCount; span++) {
    const hinge = hingeIndex[span];
    if (hinge !== null) {
      slope = slope.slice();
      addScaled(slope, unit(hinge), F.ONE);
    }
    spanStartSlope.push(slope);
    spanStartDeflection.push(deflection);
    const end = nodes[span + 1];
    const nextSlope = slopeIn(span, slope, end);
    deflection = deflectionIn(span, slope, deflection, end);
    slope = nextSlope;
  }
  const spanOf = (x: Fixed, side: "left" | "right"): number => {
    for (let span = 0; span < spanCount; span++) {
      if (side === "right" ? x < nodes[span + 1] : x <= nodes[span + 1]) return span;
    }
    return spanCount - 1;
  };

  const equations: Fixed[][] = [shearAt(length, true), momentAt(length, true)];
  member.supports.forEach((support, i) => {
    const x = nodes[i];
    const span = spanOf(x, "left");
    const w = deflectionIn(span, spanStartSlope[span], spanStartDeflection[span], x);
    if (support.kind === "pin" || support.kind === "fixed") equations.push(w);
    if (support.kind === "fixed") {
      const s = spanOf(x, i === 0 ? "right" : "left");
      equations.push(slopeIn(s, spanStartSlope[s], x));
    }
    if (support.kind === "spring") {
      const row = w.slice();
      addScaled(row, unit(forceIndex[i] as number), -F.div(F.ONE, F.fromNumber(support.stiffness)));
      equations.push(row);
    }
    const k = rotationalOf(support);
    if (k > 0) {
      // A rotational spring's reaction moment (counter-clockwise +) is k times the node's rotation.
      const s = spanOf(x, i === 0 ? "right" : "left");
      const row = slopeIn(s, spanStartSlope[s], x).slice();
      addScaled(row, unit(momentIndex[i] as number), -F.div(F.ONE, F.fromNumber(k)));
      equations.push(row);
    }
    if (hingeIndex[i] !== null) equations.push(momentAt(x, false));
  });
  if (equations.length !== size) throw new Error(`exact force method: ${equations.length} equations for ${size} unknowns`);
  const unknowns = solveLinear(
    equations.map((row) => row.slice(0, size)),
    equations.map((row) => -row[size]),
  );
  if (unknowns === null) throw new ExactMechanism("exact force method: mechanism");
  const value = (v: Fixed[]): Fixed => {
    let sum = v[size];
    for (let j = 0; j < size; j++) if (v[j] !== 0n) sum += F.mul(v[j], unknowns[j]);
    return sum;
  };
  const resolved: Resolved[] = terms.map((t) => ({ at: t.at, power: t.power, c: value(t.coefficient) }));
  const startSlope = spanStartSlope.map(value);
  const startDeflection = spanStartDeflection.map(value);

  const nodeX = nodes.map(F.toNumber);
  return {
    length: F.toNumber(length),
    nodeX,
    reactions: nodes.map((x, i) => ({
      x: F.toNumber(x),
      force: forceIndex[i] === null ? 0 : F.toNumber(unknowns[forceIndex[i] as number]),
      moment: momentIndex[i] === null ? 0 : F.toNumber(unknowns[momentIndex[i] as number]),
    })),
    at(quantity: Quantity, xNumber: number, side?: "left" | "right"): number {
      const x = place(xNumber);
      const s = side ?? (x >= length ? "left" : "right");
      const include = s === "right";
      let sum = 0n;
      if (quantity === "moment") for (const t of resolved) sum += F.mul(t.c, bracket(x, t.at, t.power, include));
      else if (quantity === "shear") for (const t of resolved) {
        if (t.power > 0) sum += F.mul(F.mul(t.c, INTEGERS[t.power]), bracket(x, t.at, t.power - 1, include));
      }
      else {
        const span = spanOf(x, s);
        const f = flexibility[span];
        if (quantity === "slope") {
          sum = startSlope[span];
          for (const t of resolved) sum -= F.mul(F.mul(f, t.c), integral1(nodes[span], x, t.at, t.power));
        } else {
          sum = startDeflection[span] + F.mul(startSlope[span], x - nodes[span]);
          for (const t of resolved) sum -= F.mul(F.mul(f, t.c), integral2(nodes[span], x, t.at, t.power));
        }
      }
      return F.toNumber(sum);
    },
  };
}
