import { equivalentNodalLoads, loadsBySpan, type SpanLoad } from "./elementLoads";
import { buildLayout, elementDofs, prescribedDisplacement, rotationalSpring, type Layout } from "./layout";
import type { Member } from "./model";

/**
 * The reduced stiffness system K d = f over the free DOFs, stored as the upper band of the
 * symmetric K: entry (i, j), j >= i, sits at band[i * (halfBandwidth + 1) + (j - i)].
 */
export interface StiffnessSystem {
  size: number;
  halfBandwidth: number;
  band: Float64Array;
  rhs: Float64Array;
}

/**
 * The 4x4 element matrix, row-major, DOFs [w1, θ1, w2, θ2] (θ the rotation of the section).
 * Euler–Bernoulli without a shear flexibility; with one (1/(G·A_v) > 0), the exact prismatic
 * Timoshenko element, φ = 12EI/(G·A_v L²): EI/((1+φ)L³)·[12, 6L, -12, 6L; 6L, (4+φ)L²,
 * -6L, (2-φ)L²; ...].
 */
export function elementMatrix(ei: number, span: number, shearFlexibility = 0): number[] {
  if (shearFlexibility > 0) return timoshenkoMatrix(ei, span, shearPhi(ei, span, shearFlexibility));
  const k = ei / (span * span * span);
  const a = 12 * k;
  const b = 6 * span * k;
  const c = 4 * span * span * k;
  const d = 2 * span * span * k;
  return [a, b, -a, b, b, c, -b, d, -a, -b, a, -b, b, d, -b, c];
}

/** φ = 12EI/(G·A_v L²) of a span (0 without shear deformation). */
export function shearPhi(ei: number, span: number, shearFlexibility: number): number {
  return shearFlexibility > 0 ? (12 * ei * shearFlexibility) / (span * span) : 0;
}

function timoshenkoMatrix(ei: number, span: number, phi: number): number[] {
  const k = ei / (span * span * span * (1 + phi));
  const a = 12 * k;
  const b = 6 * span * k;
  const c = (4 + phi) * span * span * k;
  const d = (2 - phi) * span * span * k;
  return [a, b, -a, b, b, c, -b, d, -a, -b, a, -b, b, d, -b, c];
}

export interface Assembly {
  layout: Layout;
  system: StiffnessSystem;
  spanLoads: SpanLoad[][];
  nodalLoads: number[][];
}

function halfBandwidthOf(layout: Layout, spanCount: number): number {
  let width = 0;
  for (let e = 0; e < spanCount; e++) {
    let low = Infinity;
    let high = -Infinity;
    for (const d of elementDofs(layout, e)) {
      if (d < 0) continue;
      if (d < low) low = d;
      if (d > high) high = d;
    }
    if (high > low) width = Math.max(width, high - low);
  }
  return width;
}

/** Builds the layout, the span loads and the banded system of a (validated) member. */
export function assembleMember(member: Member): Assembly {
  const layout = buildLayout(member);
  const spanCount = member.spans.length;
  const halfBandwidth = halfBandwidthOf(layout, spanCount);
  const stride = halfBandwidth + 1;
  const band = new Float64Array(layout.size * stride);
  const rhs = new Float64Array(layout.size);
  const spanLoads = loadsBySpan(layout.nodeX, member.spans, member.loads);
  const nodalLoads: number[][] = [];
  for (let e = 0; e < spanCount; e++) {
    const span = member.spans[e];
    const g = layout.shearFlexibility[e];
    const k = elementMatrix(layout.stiffness[e], span, g);
    const dofs = elementDofs(layout, e);
    const f = equivalentNodalLoads(spanLoads[e], span, shearPhi(layout.stiffness[e], span, g));
    nodalLoads.push(f);
    // A settling restrained node moves K·Δ to the right-hand side.
    const settled = layout.settlement === null ? null : [0, 1, 2, 3].map((r) => prescribedDisplacement(layout, e, r));
    for (let r = 0; r < 4; r++) {
      const i = dofs[r];
      if (i < 0) continue;
      rhs[i] += f[r];
      if (settled !== null) for (let c = 0; c < 4; c++) rhs[i] -= k[r * 4 + c] * settled[c];
      for (let c = 0; c < 4; c++) {
        const j = dofs[c];
        if (j < i) continue;
        band[i * stride + (j - i)] += k[r * 4 + c];
      }
    }
  }
  member.supports.forEach((support, node) => {
    if (support.kind === "spring") {
      const i = layout.deflectionDof[node];
      band[i * stride] += support.stiffness;
      // The spring's base settles: its force k(w - Δ) puts kΔ on the right-hand side.
      if (layout.settlement !== null) rhs[i] += support.stiffness * layout.settlement[node];
    }
    const rotational = rotationalSpring(support);
    if (rotational > 0) band[layout.rotationRightDof[node] * stride] += rotational;
  });
  return { layout, system: { size: layout.size, halfBandwidth, band, rhs }, spanLoads, nodalLoads };
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
