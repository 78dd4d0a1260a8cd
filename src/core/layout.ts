import type { Member, Support } from "./model";
import { nodeIndexAt, nodePositions } from "./positions";

export { nodePositions };

/**
 * Where the member's nodes are and which degrees of freedom are free. Free DOFs are numbered
 * node by node, left to right: deflection (down +) unless restrained, then rotation
 * (clockwise +) unless restrained; a hinge node has a rotation for the span on its left and
 * another for the span on its right. Restrained DOFs are -1.
 */
export interface Layout {
  length: number;
  nodeX: number[];
  deflectionDof: number[];
  rotationLeftDof: number[];
  rotationRightDof: number[];
  size: number;
  stiffness: number[];
  /** 1/(G·A_v) per span, 0 for a span without shear deformation. */
  shearFlexibility: number[];
  /**
   * Settlement per node (down +, the sum of the node's settle loads), or null when the member
   * has none: the prescribed deflection of a pin or fixed node, or of a spring's base.
   */
  settlement: number[] | null;
}

export function buildLayout(member: Member): Layout {
  const { spans, supports } = member;
  const nodeX = nodePositions(spans);
  const count = nodeX.length;
  const deflectionDof = new Array<number>(count);
  const rotationLeftDof = new Array<number>(count);
  const rotationRightDof = new Array<number>(count);
  let next = 0;
  for (let i = 0; i < count; i++) {
    const kind = supports[i].kind;
    deflectionDof[i] = kind === "pin" || kind === "fixed" ? -1 : next++;
    if (kind === "fixed") {
      rotationLeftDof[i] = rotationRightDof[i] = -1;
    } else if (kind === "hinge") {
      rotationLeftDof[i] = next++;
      rotationRightDof[i] = next++;
    } else {
      rotationLeftDof[i] = rotationRightDof[i] = next++;
    }
  }
  const given = member.stiffness;
  const stiffness = spans.map((_, i) => (given === null ? 1 : given.length === 1 ? given[0] : given[i]));
  return {
    length: nodeX[count - 1],
    nodeX,
    deflectionDof,
    rotationLeftDof,
    rotationRightDof,
    size: next,
    stiffness,
    shearFlexibility: shearFlexibilities(member),
    settlement: nodeSettlements(member, nodeX),
  };
}

/** 1/(G·A_v) of each span (0 where no shear stiffness is given). */
export function shearFlexibilities(member: Member): number[] {
  const shear = member.shear;
  return member.spans.map((_, i) => {
    const ga = shear === undefined || shear === null ? null : shear.length === 1 ? shear[0] : shear[i];
    return ga === null || ga === undefined ? 0 : 1 / ga;
  });
}

/** The settlement of each node (sum of its settle loads), or null when no load is a settlement. */
export function nodeSettlements(member: Member, nodeX: number[]): number[] | null {
  let out: number[] | null = null;
  for (const load of member.loads) {
    if (load.kind !== "settle") continue;
    const node = nodeIndexAt(nodeX, load.xStart);
    if (node < 0) continue;
    if (out === null) out = new Array<number>(nodeX.length).fill(0);
    out[node] += load.magnitude;
  }
  return out;
}

/** The four DOF numbers of span e: [w left, rotation left, w right, rotation right]. */
/** The rotational spring at a node (moment per radian), 0 when it has none. */
export function rotationalSpring(support: Support): number {
  return "rotational" in support && support.rotational !== undefined ? support.rotational : 0;
}

/**
 * The prescribed displacement of local DOF r of span e ([w left, θ left, w right, θ right])
 * when that DOF is restrained: a settling pin or fixed node's settlement, else 0.
 */
export function prescribedDisplacement(layout: Layout, e: number, r: number): number {
  if (layout.settlement === null || r % 2 === 1) return 0;
  const node = r === 0 ? e : e + 1;
  return layout.deflectionDof[node] < 0 ? layout.settlement[node] : 0;
}

export function elementDofs(layout: Layout, e: number): [number, number, number, number] {
  return [layout.deflectionDof[e], layout.rotationRightDof[e], layout.deflectionDof[e + 1], layout.rotationLeftDof[e + 1]];
}
