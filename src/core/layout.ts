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
  deflectionDof: Int32Array;
  rotationLeftDof: Int32Array;
  rotationRightDof: Int32Array;
  size: number;
  /** EI of each span (1 when the member has none). */
  stiffness: Float64Array;
  /** 1/(G·A_v) of each span, 0 for a span without shear deformation (all 0 for a member without shear stiffness). */
  shearFlexibility: Float64Array;
  /**
   * Settlement per node (down +, the sum of the node's settle loads), or null when the member
   * has none: the prescribed deflection of a pin or fixed node, or of a spring's base.
   */
  settlement: number[] | null;
}

/** Scratch DOF and EI arrays for the solver's own layout (see buildLayout's `reuse`). */
let scratchNodes = 0;
let scratchDeflection: Int32Array = new Int32Array(0);
let scratchLeft: Int32Array = new Int32Array(0);
let scratchRight: Int32Array = new Int32Array(0);
let scratchStiffness: Float64Array = new Float64Array(0);
let scratchShear: Float64Array = new Float64Array(0);

function growScratch(nodes: number): void {
  if (scratchNodes >= nodes) return;
  scratchNodes = Math.max(nodes, 2 * scratchNodes, 8);
  scratchDeflection = new Int32Array(scratchNodes);
  scratchLeft = new Int32Array(scratchNodes);
  scratchRight = new Int32Array(scratchNodes);
  scratchStiffness = new Float64Array(scratchNodes);
  scratchShear = new Float64Array(scratchNodes);
}

/**
 * The layout of a (validated) member. With `reuse` the DOF, EI and 1/GA arrays are scratch buffers
 * shared by every call (no allocation; they may be longer than the member needs, so read
 * them by node and span index only): valid only until the next such call, for the solver's own
 * use within one solve; nodeX is always a fresh array, and the settlements (null without a settle
 * load) a fresh one.
 */
export function buildLayout(member: Member, nodeX: number[] = nodePositions(member.spans), reuse = false): Layout {
  const { spans, supports } = member;
  const count = nodeX.length;
  if (reuse) growScratch(count);
  const deflectionDof = reuse ? scratchDeflection : new Int32Array(count);
  const rotationLeftDof = reuse ? scratchLeft : new Int32Array(count);
  const rotationRightDof = reuse ? scratchRight : new Int32Array(count);
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
  const stiffness = reuse ? scratchStiffness : new Float64Array(spans.length);
  for (let i = 0; i < spans.length; i++) stiffness[i] = given === null ? 1 : given.length === 1 ? given[0] : given[i];
  const shearFlexibility = reuse ? scratchShear : new Float64Array(spans.length);
  shearFlexibilitiesInto(member, shearFlexibility);
  return {
    length: nodeX[count - 1],
    nodeX,
    deflectionDof,
    rotationLeftDof,
    rotationRightDof,
    size: next,
    stiffness,
    shearFlexibility,
    settlement: nodeSettlements(member, nodeX),
  };
}

/** 1/(G·A_v) of each span into `out` (0 where no shear stiffness is given; all 0 for a member without one). */
function shearFlexibilitiesInto(member: Member, out: Float64Array): void {
  const shear = member.shear;
  const spanCount = member.spans.length;
  if (shear === undefined || shear === null) {
    for (let i = 0; i < spanCount; i++) out[i] = 0;
    return;
  }
  for (let i = 0; i < spanCount; i++) {
    const ga = shear.length === 1 ? shear[0] : shear[i];
    out[i] = ga === null || ga === undefined ? 0 : 1 / ga;
  }
}

/** The settlement of each node (sum of its settle loads), or null when no load is a settlement. */
export function nodeSettlements(member: Member, nodeX: number[]): number[] | null {
  const { loads } = member;
  let out: number[] | null = null;
  for (let i = 0; i < loads.length; i++) {
    const load = loads[i];
    if (load.kind !== "settle") continue;
    const node = nodeIndexAt(nodeX, load.xStart);
    if (node < 0) continue;
    if (out === null) out = new Array<number>(nodeX.length).fill(0);
    out[node] += load.magnitude;
  }
  return out;
}

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

/** The four DOF numbers of span e: [w left, rotation left, w right, rotation right]. */
export function elementDofs(layout: Layout, e: number): [number, number, number, number] {
  return [layout.deflectionDof[e], layout.rotationRightDof[e], layout.deflectionDof[e + 1], layout.rotationLeftDof[e + 1]];
}

/** DOF r (0..3, in elementDofs order) of span e, without building the tuple. */
export function elementDof(layout: Layout, e: number, r: number): number {
  switch (r) {
    case 0:
      return layout.deflectionDof[e];
    case 1:
      return layout.rotationRightDof[e];
    case 2:
      return layout.deflectionDof[e + 1];
    default:
      return layout.rotationLeftDof[e + 1];
  }
}
