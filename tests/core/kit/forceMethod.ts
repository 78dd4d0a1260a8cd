/**
 * An independent reference solver for the core tests: the force method with singularity
 * functions (Macaulay brackets) and compatibility equations, solved with ml-matrix.
 *
 * It shares nothing with src/core but the model types: unknowns are the support reactions,
 * the slope jumps at hinges and the slope and deflection at the left end; equations are the
 * two equilibrium conditions past the right end, zero deflection (and slope) at supports,
 * spring compatibility (vertical, and rotational: moment = k x rotation) and zero moment at hinges. Every quantity is an affine function of the
 * unknowns, integrated exactly span by span (EI is constant within a span).
 *
 * Shear deformation (member.shear, G·A_v per span): the deflection adds the integral of V/(G·A_v)
 * (Timoshenko: slope is the rotation of the section, d(deflection)/dx = slope + V/(G·A_v)).
 * Settlement (settle loads): the deflection condition at a pin or fixed node becomes w = Δ,
 * at a spring w - R/k = Δ (the spring's base settles).
 */
import { Matrix, SingularValueDecomposition } from "ml-matrix";
import type { Member, Quantity, Support } from "../../../src/core";

type Affine = number[];

interface Term {
  at: number;
  power: number;
  coefficient: Affine;
}

export interface ForceMethodReaction {
  x: number;
  force: number;
  moment: number;
}

export interface ForceMethodSolution {
  length: number;
  nodeX: number[];
  reactions: ForceMethodReaction[];
  /** Value just right of x (just left at the member's right end), like the core's convention. */
  at(quantity: Quantity, x: number, side?: "left" | "right"): number;
}

export class ReferenceMechanism extends Error {}

function bracket(x: number, at: number, power: number, includeAt: boolean): number {
  if (x < at || (x === at && !includeAt && power === 0)) return 0;
  return power === 0 ? 1 : Math.pow(x - at, power);
}

/** Integral of <t-a>^n over [s, x]. */
function integral1(s: number, x: number, at: number, power: number): number {
  const lo = Math.max(s, at);
  if (x <= lo) return 0;
  return (Math.pow(x - at, power + 1) - Math.pow(lo - at, power + 1)) / (power + 1);
}

/** Integral of (x-t)<t-a>^n over [s, x]. */
function integral2(s: number, x: number, at: number, power: number): number {
  const lo = Math.max(s, at);
  if (x <= lo) return 0;
  const u1 = x - at;
  const u0 = lo - at;
  const f = (u: number) => (u1 * Math.pow(u, power + 1)) / (power + 1) - Math.pow(u, power + 2) / (power + 2);
  return f(u1) - f(u0);
}

/** A node's rotational spring, read here independently of src/core. */
function rotationalOf(support: Support): number {
  const k = (support as { rotational?: number }).rotational;
  return k === undefined ? 0 : k;
}

export function forceMethodSolve(member: Member): ForceMethodSolution {
  const nodeX = [0];
  for (const span of member.spans) nodeX.push(nodeX[nodeX.length - 1] + span);
  const length = nodeX[nodeX.length - 1];
  const flexibility = member.spans.map((_, i) => 1 / (member.stiffness ? member.stiffness[i] : 1));
  const shearGiven = member.shear ?? null;
  const shearFlexibility = member.spans.map((_, i) => {
    const ga = shearGiven === null ? null : shearGiven.length === 1 ? shearGiven[0] : shearGiven[i];
    return ga === null || ga === undefined ? 0 : 1 / ga;
  });
  const settlementAt = (x: number): number =>
    member.loads.reduce((sum, l) => (l.kind === "settle" && Math.abs(l.xStart - x) <= 1e-9 * Math.max(1, x) ? sum + l.magnitude : sum), 0);

  const forceIndex: (number | null)[] = [];
  const momentIndex: (number | null)[] = [];
  const hingeIndex: (number | null)[] = [];
  let count = 0;
  member.supports.forEach((support: Support) => {
    const vertical = support.kind === "pin" || support.kind === "fixed" || support.kind === "spring";
    forceIndex.push(vertical ? count++ : null);
    momentIndex.push(support.kind === "fixed" || rotationalOf(support) > 0 ? count++ : null);
  });
  member.supports.forEach((support, i) => {
    const interior = i > 0 && i < member.supports.length - 1;
    hingeIndex.push(support.kind === "hinge" && interior ? count++ : null);
  });
  const slopeIndex = count++;
  const deflectionIndex = count++;
  const size = count;

  const constant = (c: number): Affine => {
    const v = new Array(size + 1).fill(0);
    v[size] = c;
    return v;
  };
  const unit = (index: number, scale = 1): Affine => {
    const v = new Array(size + 1).fill(0);
    v[index] = scale;
    return v;
  };
  const add = (a: Affine, b: Affine, scale = 1): Affine => a.map((v, i) => v + scale * b[i]);

  const terms: Term[] = [];
  member.supports.forEach((_, i) => {
    const f = forceIndex[i];
    const m = momentIndex[i];
    if (f !== null) terms.push({ at: nodeX[i], power: 1, coefficient: unit(f) });
    if (m !== null) terms.push({ at: nodeX[i], power: 0, coefficient: unit(m, -1) });
  });
  for (const load of member.loads) {
    if (load.kind === "settle") continue;
    if (load.kind === "point") terms.push({ at: load.xStart, power: 1, coefficient: constant(-load.magnitude) });
    else if (load.kind === "moment") terms.push({ at: load.xStart, power: 0, coefficient: constant(load.magnitude) });
    else {
      const a = load.xStart;
      const b = load.xEnd;
      const q0 = load.magnitude;
      const q1 = load.kind === "udl" ? load.magnitude : load.magnitudeEnd;
      const k = (q1 - q0) / (b - a);
      const loadTerms: [number, number, number][] = [
        [a, 0, q0],
        [a, 1, k],
        [b, 0, -q1],
        [b, 1, -k],
      ];
      for (const [at, m, c] of loadTerms) {
        if (c !== 0) terms.push({ at, power: m + 2, coefficient: constant(-c / ((m + 1) * (m + 2))) });
      }
    }
  }

  const momentAt = (x: number, includeAt: boolean): Affine =>
    terms.reduce((acc, t) => add(acc, t.coefficient, bracket(x, t.at, t.power, includeAt)), constant(0));
  const shearAt = (x: number, includeAt: boolean): Affine =>
    terms.reduce(
      (acc, t) => (t.power === 0 ? acc : add(acc, t.coefficient, t.power * bracket(x, t.at, t.power - 1, includeAt))),
      constant(0),
    );

  const spanStartSlope: Affine[] = [];
  const spanStartDeflection: Affine[] = [];
  let slope = unit(slopeIndex);
  let deflection = unit(deflectionIndex);
  const slopeIn = (span: number, start: Affine, x: number): Affine =>
    terms.reduce((acc, t) => add(acc, t.coefficient, -flexibility[span] * integral1(nodeX[span], x, t.at, t.power)), start);
  // The shear part: the integral of V = sum of power * c * <t-a>^(power-1) over [node, x], over G·A_v.
  const deflectionIn = (span: number, startSlope: Affine, startDeflection: Affine, x: number): Affine =>
    terms.reduce(
      (acc, t) =>
        add(
          acc,
          t.coefficient,
          -flexibility[span] * integral2(nodeX[span], x, t.at, t.power) + (t.power >= 1 ? shearFlexibility[span] * t.power * integral1(nodeX[span], x, t.at, t.power - 1) : 0),
        ),
      add(startDeflection, startSlope, x - nodeX[span]),
    );
  for (let span = 0; span < member.spans.length; span++) {
    const hinge = hingeIndex[span];
    if (hinge !== null) slope = add(slope, unit(hinge));
    spanStartSlope.push(slope);
    spanStartDeflection.push(deflection);
    const end = nodeX[span + 1];
    const nextSlope = slopeIn(span, slope, end);
    const nextDeflection = deflectionIn(span, slope, deflection, end);
    slope = nextSlope;
    deflection = nextDeflection;
  }
  const spanOf = (x: number, side: "left" | "right"): number => {
    for (let span = 0; span < member.spans.length; span++) {
      const inside = side === "right" ? x < nodeX[span + 1] : x <= nodeX[span + 1];
      if (inside) return span;
    }
    return member.spans.length - 1;
  };
  const slopeAt = (x: number, side: "left" | "right"): Affine => {
    const span = spanOf(x, side);
    return slopeIn(span, spanStartSlope[span], x);
  };
  const deflectionAt = (x: number, side: "left" | "right"): Affine => {
    const span = spanOf(x, side);
    return deflectionIn(span, spanStartSlope[span], spanStartDeflection[span], x);
  };

  const equations: Affine[] = [shearAt(length, true), momentAt(length, true)];
  member.supports.forEach((support, i) => {
    const x = nodeX[i];
    const settled = settlementAt(x);
    if (support.kind === "pin" || support.kind === "fixed") equations.push(add(deflectionAt(x, "left"), constant(-settled)));
    if (support.kind === "fixed") {
      equations.push(slopeAt(x, i === 0 ? "right" : "left"));
    }
    if (support.kind === "spring") {
      equations.push(add(add(deflectionAt(x, "left"), unit(forceIndex[i] as number), -1 / support.stiffness), constant(-settled)));
    }
    const k = rotationalOf(support);
    // A rotational spring's reaction moment (counter-clockwise +) is k times the node's rotation.
    if (k > 0) equations.push(add(slopeAt(x, i === 0 ? "right" : "left"), unit(momentIndex[i] as number), -1 / k));
    if (hingeIndex[i] !== null) equations.push(momentAt(x, false));
  });
  if (equations.length !== size) throw new Error(`force method: ${equations.length} equations for ${size} unknowns`);

  const a = new Matrix(equations.map((row) => row.slice(0, size)));
  const b = Matrix.columnVector(equations.map((row) => -row[size]));
  const columnScale = Array.from({ length: size }, (_, j) => {
    const norm = Math.sqrt(a.getColumn(j).reduce((s, v) => s + v * v, 0));
    return norm > 0 ? 1 / norm : 1;
  });
  const scaled = a.clone();
  for (let j = 0; j < size; j++) for (let i = 0; i < size; i++) scaled.set(i, j, a.get(i, j) * columnScale[j]);
  const svd = new SingularValueDecomposition(scaled, { autoTranspose: true });
  if (svd.condition > 1e11 || !Number.isFinite(svd.condition)) throw new ReferenceMechanism("force method: mechanism");
  const scaledSolution = svd.solve(b);
  const solution = Array.from({ length: size }, (_, j) => scaledSolution.get(j, 0) * columnScale[j]);
  const value = (v: Affine): number => v.slice(0, size).reduce((s, c, j) => s + c * solution[j], v[size]);

  const reactions = nodeX.map((x, i) => ({
    x,
    force: forceIndex[i] === null ? 0 : solution[forceIndex[i] as number],
    moment: momentIndex[i] === null ? 0 : solution[momentIndex[i] as number],
  }));

  return {
    length,
    nodeX,
    reactions,
    at(quantity: Quantity, x: number, side?: "left" | "right"): number {
      const s = side ?? (x >= length ? "left" : "right");
      const include = s === "right";
      switch (quantity) {
        case "shear":
          return value(shearAt(x, include));
        case "moment":
          return value(momentAt(x, include));
        case "slope":
          return value(slopeAt(x, s));
        case "deflection":
          return value(deflectionAt(x, s));
      }
    },
  };
}
