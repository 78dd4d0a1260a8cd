import { equivalentNodalLoads, loadsBySpan, type SpanLoad } from "./elementLoads";
import { buildLayout, elementDof, rotationalSpring, type Layout } from "./layout";
import type { Member } from "./model";

/**
 * The reduced stiffness system K d = f over the free DOFs, stored as the upper band of the
 * symmetric K: entry (i, j), j >= i, sits at band[i * (halfBandwidth + 1) + (j - i)]. The
 * arrays may be longer than `size` needs (the solver's scratch buffers): read them by index.
 */
export interface StiffnessSystem {
  size: number;
  halfBandwidth: number;
  band: Float64Array;
  rhs: Float64Array;
}

/**
 * The 4x4 Euler–Bernoulli element matrix, row-major, DOFs [w1, θ1, w2, θ2], written into
 * `out` from index `at`: the one definition of the element's stiffness.
 */
export function elementMatrixInto(out: number[] | Float64Array, at: number, ei: number, span: number): void {
  const k = ei / (span * span * span);
  const a = 12 * k;
  const b = 6 * span * k;
  const c = 4 * span * span * k;
  const d = 2 * span * span * k;
  out[at] = a;
  out[at + 1] = b;
  out[at + 2] = -a;
  out[at + 3] = b;
  out[at + 4] = b;
  out[at + 5] = c;
  out[at + 6] = -b;
  out[at + 7] = d;
  out[at + 8] = -a;
  out[at + 9] = -b;
  out[at + 10] = a;
  out[at + 11] = -b;
  out[at + 12] = b;
  out[at + 13] = d;
  out[at + 14] = -b;
  out[at + 15] = c;
}

/** The 4x4 Euler–Bernoulli element matrix, row-major, DOFs [w1, θ1, w2, θ2]. */
export function elementMatrix(ei: number, span: number): number[] {
  const out = new Array<number>(16);
  elementMatrixInto(out, 0, ei, span);
  return out;
}

export interface Assembly {
  layout: Layout;
  system: StiffnessSystem;
  spanLoads: SpanLoad[][];
  /** Per span, its element matrix (16 entries from 16 e) and its equivalent nodal loads (4 from 4 e). */
  matrices: Float64Array;
  nodalLoads: Float64Array;
}

function halfBandwidthOf(layout: Layout, spanCount: number): number {
  let width = 0;
  for (let e = 0; e < spanCount; e++) {
    let low = Infinity;
    let high = -Infinity;
    for (let r = 0; r < 4; r++) {
      const d = elementDof(layout, e, r);
      if (d < 0) continue;
      if (d < low) low = d;
      if (d > high) high = d;
    }
    if (high > low) width = Math.max(width, high - low);
  }
  return width;
}

/** Scratch buffers of the solver's own assembly (see assembleMember's `reuse`). */
let scratchBand: Float64Array = new Float64Array(64);
let scratchRhs: Float64Array = new Float64Array(16);
let scratchMatrices: Float64Array = new Float64Array(64);
let scratchNodal: Float64Array = new Float64Array(16);

/** The scratch buffer, or a longer one (doubling) when it holds fewer than `length` entries. */
function atLeast(buffer: Float64Array, length: number): Float64Array {
  return buffer.length >= length ? buffer : new Float64Array(Math.max(length, 2 * buffer.length));
}

/**
 * Builds the layout, the span loads and the banded system of a (validated) member. With
 * `reuse` the layout's DOF arrays, the band, the right-hand side, the element matrices and
 * the nodal loads are scratch buffers shared by every call (no allocation once grown; possibly
 * longer than needed): valid only until the next such call, for the solver's own use within one solve.
 */
export function assembleMember(member: Member, nodeX?: number[], reuse = false): Assembly {
  const layout = buildLayout(member, nodeX, reuse);
  const spanCount = member.spans.length;
  const halfBandwidth = halfBandwidthOf(layout, spanCount);
  const stride = halfBandwidth + 1;
  const n = layout.size;
  let band: Float64Array;
  let rhs: Float64Array;
  let matrices: Float64Array;
  let nodal: Float64Array;
  if (reuse) {
    band = scratchBand = atLeast(scratchBand, n * stride);
    rhs = scratchRhs = atLeast(scratchRhs, n);
    matrices = scratchMatrices = atLeast(scratchMatrices, 16 * spanCount);
    nodal = scratchNodal = atLeast(scratchNodal, 4 * spanCount);
    band.fill(0, 0, n * stride);
    rhs.fill(0, 0, n);
  } else {
    band = new Float64Array(n * stride);
    rhs = new Float64Array(n);
    matrices = new Float64Array(16 * spanCount);
    nodal = new Float64Array(4 * spanCount);
  }
  const spanLoads = loadsBySpan(layout.nodeX, member.spans, member.loads);
  for (let e = 0; e < spanCount; e++) {
    const span = member.spans[e];
    const km = 16 * e;
    const fm = 4 * e;
    elementMatrixInto(matrices, km, layout.stiffness[e], span);
    equivalentNodalLoads(spanLoads[e], span, nodal, fm);
    for (let r = 0; r < 4; r++) {
      const i = elementDof(layout, e, r);
      if (i < 0) continue;
      rhs[i] += nodal[fm + r];
      for (let c = 0; c < 4; c++) {
        const j = elementDof(layout, e, c);
        if (j < i) continue;
        band[i * stride + (j - i)] += matrices[km + r * 4 + c];
      }
    }
  }
  const { supports } = member;
  for (let node = 0; node < supports.length; node++) {
    const support = supports[node];
    if (support.kind === "spring") {
      const i = layout.deflectionDof[node];
      band[i * stride] += support.stiffness;
    }
    const rotational = rotationalSpring(support);
    if (rotational > 0) band[layout.rotationRightDof[node] * stride] += rotational;
  }
  return { layout, system: { size: n, halfBandwidth, band, rhs }, spanLoads, matrices, nodalLoads: nodal };
}

/** The reduced stiffness system of a (validated) member. */
export function assemble(member: Member): StiffnessSystem {
  return assembleMember(member).system;
}

/** The full symmetric matrix of a banded system, for cross-checks with dense solvers. */
export function toDense(system: StiffnessSystem): number[][] {
  const { size, halfBandwidth, band } = system;
  const stride = halfBandwidth + 1;
  const dense: number[][] = [];
  for (let i = 0; i < size; i++) dense.push(new Array<number>(size).fill(0));
  for (let i = 0; i < size; i++) {
    for (let j = i; j < Math.min(size, i + stride); j++) {
      dense[i][j] = dense[j][i] = band[i * stride + (j - i)];
    }
  }
  return dense;
}
