import type { Member, Support } from "./model";
import { nodePositions } from "./positions";

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
  return { length: nodeX[count - 1], nodeX, deflectionDof, rotationLeftDof, rotationRightDof, size: next, stiffness };
}

/** The four DOF numbers of span e: [w left, rotation left, w right, rotation right]. */
/** The rotational spring at a node (moment per radian), 0 when it has none. */
export function rotationalSpring(support: Support): number {
  return "rotational" in support && support.rotational !== undefined ? support.rotational : 0;
}

export function elementDofs(layout: Layout, e: number): [number, number, number, number] {
  return [layout.deflectionDof[e], layout.rotationRightDof[e], layout.deflectionDof[e + 1], layout.rotationLeftDof[e + 1]];
}
