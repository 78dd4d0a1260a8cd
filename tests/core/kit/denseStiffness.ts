/**
 * An independent dense stiffness model, written from the textbook (not from src/core): cubic
 * Hermite beam elements, one per span, degrees of freedom numbered as the core documents
 * (node by node: deflection w unless restrained, then rotation dw/dx unless restrained; a
 * hinge has rotation-left then rotation-right), springs on the w diagonal, and nodal loads as
 * the work of each load on the shape functions (distributed loads by 4-point Gauss quadrature, exact for these degrees).
 * Reactions come from the residual f - K u at restrained DOFs (force up +, moment
 * counter-clockwise +), springs from k w.
 */
import { EigenvalueDecomposition, Matrix, solve } from "ml-matrix";
import type { Member, Reaction } from "../../../src/core";
import { nodesOf } from "./members";
import { gauss } from "./quadrature";
import { intensity } from "./statics";

export interface DenseSystem {
  K: number[][];
  f: number[];
}

const hermite = (l: number, s: number): number[] => {
  const t = s / l;
  return [1 - 3 * t * t + 2 * t ** 3, l * (t - 2 * t * t + t ** 3), 3 * t * t - 2 * t ** 3, l * (-t * t + t ** 3)];
};
const hermiteSlope = (l: number, s: number): number[] => {
  const t = s / l;
  return [(-6 * t + 6 * t * t) / l, 1 - 4 * t + 3 * t * t, (6 * t - 6 * t * t) / l, -2 * t + 3 * t * t];
};

interface Numbering {
  /** Per element: global index of [w_i, θ_i (right side), w_j, θ_j (left side)]. */
  ends: number[][];
  /** Per node: indices of w and of the rotations left and right of it. */
  nodes: { w: number; left: number; right: number }[];
  /** Whether each global index is free (not restrained by a pin or fixed support). */
  free: boolean[];
}

function numbering(member: Member): Numbering {
  const free: boolean[] = [];
  const add = (isFree: boolean): number => free.push(isFree) - 1;
  const nodes = member.supports.map((s) => {
    const w = add(s.kind !== "pin" && s.kind !== "fixed");
    if (s.kind === "hinge") return { w, left: add(true), right: add(true) };
    const r = add(s.kind !== "fixed");
    return { w, left: r, right: r };
  });
  const ends = member.spans.map((_, e) => [nodes[e].w, nodes[e].right, nodes[e + 1].w, nodes[e + 1].left]);
  return { ends, nodes, free };
}

/** Stiffness and nodal loads over every degree of freedom, restrained ones included. */
function fullSystem(member: Member): DenseSystem & Numbering {
  const dofs = numbering(member);
  const size = dofs.free.length;
  const K = Array.from({ length: size }, () => new Array<number>(size).fill(0));
  const f = new Array<number>(size).fill(0);
  const x = nodesOf(member);
  member.spans.forEach((l, e) => {
    const EI = member.stiffness ? member.stiffness[e] : 1;
    const c = EI / l ** 3;
    const k = [
      [12, 6 * l, -12, 6 * l],
      [6 * l, 4 * l * l, -6 * l, 2 * l * l],
      [-12, -6 * l, 12, -6 * l],
      [6 * l, 2 * l * l, -6 * l, 4 * l * l],
    ];
    const map = dofs.ends[e];
    for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) K[map[i]][map[j]] += c * k[i][j];
    const [x0, x1] = [x[e], x[e + 1]];
    const last = e === member.spans.length - 1;
    for (const load of member.loads) {
      const shares = new Array<number>(4).fill(0);
      if (load.kind === "point" || load.kind === "moment") {
        const inside = load.xStart >= x0 && (load.xStart < x1 || (last && load.xStart <= x1));
        if (!inside) continue;
        const values = load.kind === "point" ? hermite(l, load.xStart - x0) : hermiteSlope(l, load.xStart - x0);
        values.forEach((v, i) => (shares[i] = load.magnitude * v));
      } else {
        const [a, b] = [Math.max(x0, load.xStart), Math.min(x1, load.xEnd)];
        if (b <= a) continue;
        for (let i = 0; i < 4; i++) shares[i] = gauss((s) => intensity(load, s) * hermite(l, s - x0)[i], a, b);
      }
      shares.forEach((v, i) => (f[map[i]] += v));
    }
  });
  member.supports.forEach((s, n) => {
    if (s.kind === "spring") K[dofs.nodes[n].w][dofs.nodes[n].w] += s.stiffness;
  });
  return { K, f, ...dofs };
}

/** The system over the free degrees of freedom only, numbered as the core numbers them. */
export function denseSystem(member: Member): DenseSystem {
  const full = fullSystem(member);
  const keep = full.free.flatMap((isFree, i) => (isFree ? [i] : []));
  return { K: keep.map((i) => keep.map((j) => full.K[i][j])), f: keep.map((i) => full.f[i]) };
}

export interface DenseStiffnessSolution {
  displacements: number[];
  deflection: number[];
  slopeLeft: number[];
  slopeRight: number[];
  reactions: Reaction[];
}

/** Solves the free system with ml-matrix and recovers reactions as f - K u at restrained DOFs. */
export function denseStiffnessSolve(member: Member): DenseStiffnessSolution {
  const full = fullSystem(member);
  const keep = full.free.flatMap((isFree, i) => (isFree ? [i] : []));
  const Kff = new Matrix(keep.map((i) => keep.map((j) => full.K[i][j])));
  const u = keep.length ? solve(Kff, Matrix.columnVector(keep.map((i) => full.f[i]))).to1DArray() : [];
  const all = new Array<number>(full.free.length).fill(0);
  keep.forEach((i, k) => (all[i] = u[k]));
  const residual = full.K.map((row, i) => row.reduce((sum, v, j) => sum + v * all[j], 0) - full.f[i]);
  const x = nodesOf(member);
  const reactions = member.supports.map((s, n) => {
    const d = full.nodes[n];
    if (s.kind === "spring") return { x: x[n], force: s.stiffness * all[d.w], moment: 0 };
    const force = full.free[d.w] ? 0 : -residual[d.w];
    const moment = s.kind === "fixed" ? -residual[d.left] : 0;
    return { x: x[n], force, moment };
  });
  return {
    displacements: u,
    deflection: full.nodes.map((d) => all[d.w]),
    slopeLeft: full.nodes.map((d) => all[d.left]),
    slopeRight: full.nodes.map((d) => all[d.right]),
    reactions,
  };
}

/** Ratio of the smallest to the largest eigenvalue of the free stiffness matrix (1 when nothing is free to move). */
export function stiffnessConditionRatio(member: Member): number {
  const { K } = denseSystem(member);
  if (K.length === 0) return 1;
  const values = new EigenvalueDecomposition(new Matrix(K), { assumeSymmetric: true }).realEigenvalues;
  const largest = Math.max(...values.map(Math.abs));
  return Math.min(...values) / largest;
}
