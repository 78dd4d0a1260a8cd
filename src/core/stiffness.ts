import { equivalentNodalLoads, loadsBySpan, splitLoads, type SpanLoad, type SpanLoadTable } from "./elementLoads";
import { buildLayout, elementDof, prescribedDisplacement, rotationalSpring, type Layout } from "./layout";
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
 * The 4x4 element matrix, row-major, DOFs [w1, θ1, w2, θ2] (θ the rotation of the section),
 * written into `out` from index `at`: the one definition of the element's stiffness.
 * Euler–Bernoulli without a shear flexibility; with one (1/(G·A_v) > 0), the exact prismatic
 * Timoshenko element, φ = 12EI/(G·A_v L²): EI/((1+φ)L³)·[12, 6L, -12, 6L; 6L, (4+φ)L²,
 * -6L, (2-φ)L²; ...].
 */
export function elementMatrixInto(out: number[] | Float64Array, at: number, ei: number, span: number, shearFlexibility = 0): void {
  let a: number;
  let b: number;
  let c: number;
  let d: number;
  if (shearFlexibility > 0) {
    const phi = shearPhi(ei, span, shearFlexibility);
    const k = ei / (span * span * span * (1 + phi));
    a = 12 * k;
    b = 6 * span * k;
    c = (4 + phi) * span * span * k;
    d = (2 - phi) * span * span * k;
  } else {
    const k = ei / (span * span * span);
    a = 12 * k;
    b = 6 * span * k;
    c = 4 * span * span * k;
    d = 2 * span * span * k;
  }
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

/** The 4x4 element matrix, row-major, DOFs [w1, θ1, w2, θ2] (Timoshenko with a shear flexibility > 0; see elementMatrixInto). */
export function elementMatrix(ei: number, span: number, shearFlexibility = 0): number[] {
  const out = new Array<number>(16);
  elementMatrixInto(out, 0, ei, span, shearFlexibility);
  return out;
}

/** φ = 12EI/(G·A_v L²) of a span (0 without shear deformation). */
export function shearPhi(ei: number, span: number, shearFlexibility: number): number {
  return shearFlexibility > 0 ? (12 * ei * shearFlexibility) / (span * span) : 0;
}

/**
 * A member's assembled system. `loads` is the span-load table the solver reads (a scratch
 * table, valid until the next assembly); `spanLoads`, the same loads as objects per span (the
 * double-double solve's form), is built from the member on first use.
 */
export class Assembly {
  private objects: SpanLoad[][] | null = null;

  constructor(
    readonly member: Member,
    readonly layout: Layout,
    readonly system: StiffnessSystem,
    readonly loads: SpanLoadTable,
    /** Per span, its element matrix (16 entries from 16 e) and its equivalent nodal loads (4 from 4 e). */
    readonly matrices: Float64Array,
    readonly nodalLoads: Float64Array,
  ) {}

  get spanLoads(): SpanLoad[][] {
    if (this.objects === null) this.objects = loadsBySpan(this.layout.nodeX, this.member.spans, this.member.loads);
    return this.objects;
  }
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

/** One span's four DOF numbers (elementDof order), filled per span. */
const dofs = new Int32Array(4);

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
    for (let i = n * stride - 1; i >= 0; i--) band[i] = 0;
    for (let i = 0; i < n; i++) rhs[i] = 0;
  } else {
    band = new Float64Array(n * stride);
    rhs = new Float64Array(n);
    matrices = new Float64Array(16 * spanCount);
    nodal = new Float64Array(4 * spanCount);
  }
  const loads = splitLoads(layout.nodeX, member.spans, member.loads);
  const { settlement } = layout;
  for (let e = 0; e < spanCount; e++) {
    const span = member.spans[e];
    const km = 16 * e;
    const fm = 4 * e;
    const g = layout.shearFlexibility[e];
    elementMatrixInto(matrices, km, layout.stiffness[e], span, g);
    equivalentNodalLoads(loads, e, span, nodal, fm, shearPhi(layout.stiffness[e], span, g));
    for (let r = 0; r < 4; r++) dofs[r] = elementDof(layout, e, r);
    for (let r = 0; r < 4; r++) {
      const i = dofs[r];
      if (i < 0) continue;
      rhs[i] += nodal[fm + r];
      // A settling restrained node moves K·Δ to the right-hand side.
      if (settlement !== null) for (let c = 0; c < 4; c++) rhs[i] -= matrices[km + r * 4 + c] * prescribedDisplacement(layout, e, c);
      for (let c = 0; c < 4; c++) {
        const j = dofs[c];
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
      // The spring's base settles: its force k(w - Δ) puts kΔ on the right-hand side.
      if (settlement !== null) rhs[i] += support.stiffness * settlement[node];
    }
    const rotational = rotationalSpring(support);
    if (rotational > 0) band[layout.rotationRightDof[node] * stride] += rotational;
  }
  return new Assembly(member, layout, { size: n, halfBandwidth, band, rhs }, loads, matrices, nodal);
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
