/**
 * An independent dense stiffness model, written from the textbook (not from src/core): cubic
 * Hermite beam elements, one per span, degrees of freedom numbered as the core documents
 * (node by node: deflection w unless restrained, then rotation dw/dx unless restrained; a
 * hinge has rotation-left then rotation-right), springs on the w diagonal, and nodal loads as
 * the work of each load on the shape functions (distributed loads by Simpson quadrature).
 * Also: statics along the member from reactions, by direct integration of the loads.
 */
import type { Load, Member, Reaction } from "../../../src/core";
import { nodesOf } from "./members";
import { integrate } from "./quadrature";

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

/** Load intensity of a distributed load at x (0 outside it). */
export function intensity(load: Load, x: number): number {
  if (load.kind === "point" || load.kind === "moment" || x < load.xStart || x > load.xEnd) return 0;
  const end = load.kind === "udl" ? load.magnitude : load.magnitudeEnd;
  return load.magnitude + ((end - load.magnitude) * (x - load.xStart)) / (load.xEnd - load.xStart);
}

/** Global DOF index per element end: [w_i, θ_i(right side), w_j, θ_j(left side)], -1 where restrained. */
function numbering(member: Member): number[][] {
  let next = 0;
  const w: number[] = [];
  const left: number[] = [];
  const right: number[] = [];
  for (const s of member.supports) {
    w.push(s.kind === "pin" || s.kind === "fixed" ? -1 : next++);
    if (s.kind === "fixed") {
      left.push(-1);
      right.push(-1);
    } else if (s.kind === "hinge") {
      left.push(next++);
      right.push(next++);
    } else {
      left.push(next);
      right.push(next++);
    }
  }
  return member.spans.map((_, e) => [w[e], right[e], w[e + 1], left[e + 1]]);
}

export function denseSystem(member: Member): DenseSystem {
  const dofs = numbering(member);
  const size = Math.max(-1, ...dofs.flat()) + 1;
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
    const map = dofs[e];
    for (let i = 0; i < 4; i++) {
      if (map[i] < 0) continue;
      for (let j = 0; j < 4; j++) if (map[j] >= 0) K[map[i]][map[j]] += c * k[i][j];
    }
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
        for (let i = 0; i < 4; i++) shares[i] = integrate((s) => intensity(load, s) * hermite(l, s - x0)[i], a, b);
      }
      shares.forEach((v, i) => {
        if (map[i] >= 0) f[map[i]] += v;
      });
    }
  });
  member.supports.forEach((s, n) => {
    if (s.kind !== "spring") return;
    const dof = n < member.spans.length ? dofs[n][0] : dofs[n - 1][2];
    K[dof][dof] += s.stiffness;
  });
  return { K, f };
}

/** Breakpoints of the load along the member (where the intensity may jump or kink). */
export function loadBreaks(member: Member): number[] {
  return member.loads.flatMap((l) => [l.xStart, l.xEnd]);
}

/**
 * Shear and moment just right of x (just left at the member end) by statics of the part to
 * the left of x: reactions and point loads at or left of x, couples, and the integral of the
 * distributed load. Reaction moments are counter-clockwise +, so they enter M with a minus.
 */
export function statics(member: Member, reactions: Reaction[], x: number, atEnd: boolean): { shear: number; moment: number } {
  const left = (p: number) => (atEnd ? p < x : p <= x);
  let shear = 0;
  let moment = 0;
  for (const r of reactions) {
    if (!left(r.x)) continue;
    shear += r.force;
    moment += r.force * (x - r.x) - r.moment;
  }
  const breaks = loadBreaks(member);
  for (const load of member.loads) {
    if (load.kind === "point" && left(load.xStart)) {
      shear -= load.magnitude;
      moment -= load.magnitude * (x - load.xStart);
    } else if (load.kind === "moment" && left(load.xStart)) {
      moment += load.magnitude;
    } else if (load.kind === "udl" || load.kind === "linear") {
      shear -= integrate((s) => intensity(load, s), 0, x, breaks);
      moment -= integrate((s) => intensity(load, s) * (x - s), 0, x, breaks);
    }
  }
  return { shear, moment };
}
