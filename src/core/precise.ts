/**
 * The stiffness solve in double-double arithmetic, for members whose stiffness system is too
 * ill-conditioned for double precision to give every result to 1e-9 of its scale: a short
 * link beside a hinge, a spring far softer or stiffer than the spans, EI ratios near 1e6.
 * Element matrices (Timoshenko ones too), node positions, equivalent nodal loads, settlements
 * moved to the right-hand side, the elimination and the end forces are all carried in about 32 digits, so rigid-body motions of stiff parts cancel exactly
 * enough; only the final displacements and end forces are rounded to doubles.
 */
import { add, dd, div, mul, mulNumber, neg, sqrt, sub, toNumber, twoProduct, type DD } from "./doubleDouble";
import type { SpanLoad } from "./elementLoads";
import { invalid } from "./errors";
import { elementDofs, prescribedDisplacement, rotationalSpring, type Layout } from "./layout";
import type { Member } from "./model";

/** Smallest pivot, relative to its diagonal entry, that double-double elimination still trusts. */
const PIVOT_FLOOR = 1e-26;

const ZERO = dd(0);
const GAUSS_POINT = sqrt(div(dd(3), dd(5)));
const GAUSS_NODES = [neg(GAUSS_POINT), ZERO, GAUSS_POINT];
const GAUSS_WEIGHTS = [div(dd(5), dd(9)), div(dd(8), dd(9)), div(dd(5), dd(9))];

/** φ = 12EI/(G·A_v L²) in double-double (zero without shear deformation). */
function shearPhi(ei: number, span: number, shearFlexibility: number): DD {
  if (!(shearFlexibility > 0)) return ZERO;
  return div(mulNumber(mulNumber(dd(ei), 12), shearFlexibility), twoProduct(span, span));
}

/** The 4x4 element matrix in double-double, DOFs [w1, θ1, w2, θ2] (stiffness.elementMatrix; Timoshenko when φ > 0). */
function elementMatrix(ei: number, span: number, phi: DD): DD[] {
  const L2 = twoProduct(span, span);
  if (phi.hi > 0) {
    const k = div(dd(ei), mul(mulNumber(L2, span), add(dd(1), phi)));
    const a = mulNumber(k, 12);
    const b = mulNumber(mulNumber(k, 6), span);
    const c = mul(mul(k, add(dd(4), phi)), L2);
    const d = mul(mul(k, sub(dd(2), phi)), L2);
    return [a, b, neg(a), b, b, c, neg(b), d, neg(a), neg(b), a, neg(b), b, d, neg(b), c];
  }
  const k = div(dd(ei), mulNumber(L2, span));
  const a = mulNumber(k, 12);
  const b = mulNumber(mulNumber(k, 6), span);
  const c = mul(mulNumber(k, 4), L2);
  const d = mul(mulNumber(k, 2), L2);
  return [a, b, neg(a), b, b, c, neg(b), d, neg(a), neg(b), a, neg(b), b, d, neg(b), c];
}

/** The shear parts of the Timoshenko shape functions (elementLoads.addShearShape) in double-double. */
function addShearShape(out: DD[], s: DD, span: number, value: DD): void {
  const s2 = mul(s, s);
  out[0] = add(out[0], mul(value, sub(dd(1), s)));
  out[1] = add(out[1], mulNumber(mul(value, sub(s, s2)), span / 2));
  out[2] = add(out[2], mul(value, s));
  out[3] = add(out[3], mulNumber(mul(value, sub(s2, s)), span / 2));
}

function addShearShapeRotation(out: DD[], s: DD, value: DD): void {
  out[1] = add(out[1], mul(value, sub(dd(1), s)));
  out[3] = add(out[3], mul(value, s));
}

function addShape(out: DD[], s: DD, span: number, value: DD): void {
  const s2 = mul(s, s);
  const s3 = mul(s2, s);
  const three = mulNumber(s2, 3);
  const two = mulNumber(s3, 2);
  out[0] = add(out[0], mul(value, add(sub(dd(1), three), two)));
  out[1] = add(out[1], mulNumber(mul(value, add(sub(s, mulNumber(s2, 2)), s3)), span));
  out[2] = add(out[2], mul(value, sub(three, two)));
  out[3] = add(out[3], mulNumber(mul(value, sub(s3, s2)), span));
}

function addShapeSlope(out: DD[], s: DD, span: number, value: DD): void {
  const s2 = mul(s, s);
  const six = sub(mulNumber(s2, 6), mulNumber(s, 6));
  out[0] = add(out[0], div(mul(value, six), dd(span)));
  out[1] = add(out[1], mul(value, add(sub(dd(1), mulNumber(s, 4)), mulNumber(s2, 3))));
  out[2] = add(out[2], div(mul(value, neg(six)), dd(span)));
  out[3] = add(out[3], mul(value, sub(mulNumber(s2, 3), mulNumber(s, 2))));
}

/** Local position in double-double: exactly 0 or the span at the nodes, else x less the node's exact position. */
function local(t: number, x: number, span: number, nodeStart: DD): DD {
  if (t === 0) return ZERO;
  if (t === span) return dd(span);
  return sub(dd(x), nodeStart);
}

/** Work-equivalent nodal loads of one span in double-double (see elementLoads.equivalentNodalLoads). */
function nodalLoads(loads: SpanLoad[], span: number, nodeStart: DD, phi: DD): DD[] {
  const out = [ZERO, ZERO, ZERO, ZERO];
  const shear = [ZERO, ZERO, ZERO, ZERO];
  const sheared = phi.hi > 0;
  const L = dd(span);
  for (const load of loads) {
    if (load.kind === "force") {
      const s = div(local(load.at, load.x, span, nodeStart), L);
      addShape(out, s, span, dd(load.value));
      if (sheared) addShearShape(shear, s, span, dd(load.value));
    } else if (load.kind === "couple") {
      const s = div(local(load.at, load.x, span, nodeStart), L);
      addShapeSlope(out, s, span, dd(load.value));
      if (sheared) addShearShapeRotation(shear, s, dd(load.value));
    } else {
      const from = local(load.from, load.xFrom, span, nodeStart);
      const to = local(load.to, load.xTo, span, nodeStart);
      const length = sub(to, from);
      const half = mulNumber(length, 0.5);
      const mid = mulNumber(add(to, from), 0.5);
      const rate = div(sub(dd(load.q1), dd(load.q0)), length);
      for (let g = 0; g < 3; g++) {
        const t = add(mid, mul(half, GAUSS_NODES[g]));
        const q = add(dd(load.q0), mul(rate, sub(t, from)));
        const w = mul(mul(GAUSS_WEIGHTS[g], half), q);
        addShape(out, div(t, L), span, w);
        if (sheared) addShearShape(shear, div(t, L), span, w);
      }
    }
  }
  if (!sheared) return out;
  const onePlus = add(dd(1), phi);
  return out.map((v, r) => div(add(v, mul(phi, shear[r])), onePlus));
}

export interface PreciseSolution {
  /** Free DOFs, rounded to doubles. */
  displacements: Float64Array;
  /** Per span: end forces [force left, moment left, force right, moment right] (K d - f). */
  endForces: number[][];
}

/**
 * Solves the member's stiffness system in double-double. Throws #VALUE! naming the worst
 * stiffness ratio when even that precision cannot resolve it.
 */
export function solvePrecise(member: Member, layout: Layout, spanLoads: SpanLoad[][], halfBandwidth: number): PreciseSolution {
  const n = layout.size;
  const stride = halfBandwidth + 1;
  const band: DD[] = new Array(n * stride).fill(ZERO);
  const rhs: DD[] = new Array(n).fill(ZERO);
  const matrices: DD[][] = [];
  const loads: DD[][] = [];
  let nodeStart = ZERO;
  for (let e = 0; e < member.spans.length; e++) {
    const span = member.spans[e];
    const phi = shearPhi(layout.stiffness[e], span, layout.shearFlexibility[e]);
    const k = elementMatrix(layout.stiffness[e], span, phi);
    const f = nodalLoads(spanLoads[e], span, nodeStart, phi);
    matrices.push(k);
    loads.push(f);
    nodeStart = add(nodeStart, dd(span));
    const dofs = elementDofs(layout, e);
    const settled = [0, 1, 2, 3].map((r) => prescribedDisplacement(layout, e, r));
    for (let r = 0; r < 4; r++) {
      const i = dofs[r];
      if (i < 0) continue;
      rhs[i] = add(rhs[i], f[r]);
      for (let c = 0; c < 4; c++) if (settled[c] !== 0) rhs[i] = sub(rhs[i], mulNumber(k[r * 4 + c], settled[c]));
      for (let c = 0; c < 4; c++) {
        const j = dofs[c];
        if (j < i) continue;
        band[i * stride + (j - i)] = add(band[i * stride + (j - i)], k[r * 4 + c]);
      }
    }
  }
  member.supports.forEach((support, node) => {
    if (support.kind === "spring") {
      const i = layout.deflectionDof[node];
      band[i * stride] = add(band[i * stride], dd(support.stiffness));
      if (layout.settlement !== null) rhs[i] = add(rhs[i], twoProduct(support.stiffness, layout.settlement[node]));
    }
    const rotational = rotationalSpring(support);
    if (rotational > 0) {
      const i = layout.rotationRightDof[node];
      band[i * stride] = add(band[i * stride], dd(rotational));
    }
  });
  const x = eliminate(band, rhs, n, halfBandwidth, member);
  const displacements = Float64Array.from(x, toNumber);
  const endForces = member.spans.map((_, e) => {
    const dofs = elementDofs(layout, e);
    const localD = dofs.map((dof, r) => (dof >= 0 ? x[dof] : dd(prescribedDisplacement(layout, e, r))));
    const out: number[] = [];
    for (let r = 0; r < 4; r++) {
      let sum = neg(loads[e][r]);
      for (let c = 0; c < 4; c++) sum = add(sum, mul(matrices[e][r * 4 + c], localD[c]));
      out.push(toNumber(sum));
    }
    return out;
  });
  return { displacements, endForces };
}

function eliminate(band: DD[], rhs: DD[], n: number, hb: number, member: Member): DD[] {
  const stride = hb + 1;
  const a = band.slice();
  const x = rhs.slice();
  for (let k = 0; k < n; k++) {
    const pivot = a[k * stride];
    if (!(pivot.hi > PIVOT_FLOOR * band[k * stride].hi)) throw tooIllConditioned(member);
    const last = Math.min(n - 1, k + hb);
    for (let i = k + 1; i <= last; i++) {
      const entry = a[k * stride + (i - k)];
      if (entry.hi === 0) continue;
      const factor = div(entry, pivot);
      const row = i * stride - i;
      for (let j = i; j <= last; j++) a[row + j] = sub(a[row + j], mul(factor, a[k * stride + (j - k)]));
      x[i] = sub(x[i], mul(factor, x[k]));
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let sum = x[k];
    const last = Math.min(n - 1, k + hb);
    for (let j = k + 1; j <= last; j++) sum = sub(sum, mul(a[k * stride + (j - k)], x[j]));
    x[k] = div(sum, a[k * stride]);
  }
  return x;
}

/** The largest ratio of neighbouring stiffnesses (span EI/L^3 against span, spring against span), described. */
export function worstStiffnessRatio(member: Member): string {
  const ei = (i: number): number => (member.stiffness === null ? 1 : member.stiffness.length === 1 ? member.stiffness[0] : member.stiffness[i]);
  const spanStiffness = member.spans.map((L, i) => ei(i) / (L * L * L));
  let worst = 1;
  let text = "";
  const offer = (ratio: number, describe: string): void => {
    const r = ratio >= 1 ? ratio : 1 / ratio;
    if (r > worst) {
      worst = r;
      text = describe;
    }
  };
  const g = (v: number): string => v.toPrecision(3);
  for (let i = 0; i + 1 < member.spans.length; i++) {
    offer(spanStiffness[i] / spanStiffness[i + 1], `span ${i + 1}'s EI/L^3 is ${g(spanStiffness[i] / spanStiffness[i + 1])} times span ${i + 2}'s`);
  }
  member.supports.forEach((support, node) => {
    const rotational = rotationalSpring(support);
    if (rotational > 0) {
      const bending = Math.max(node > 0 ? spanStiffness[node - 1] * member.spans[node - 1] ** 2 : 0, node < member.spans.length ? spanStiffness[node] * member.spans[node] ** 2 : 0);
      offer(rotational / bending, `the rotational spring at node ${node + 1} is ${g(rotational / bending)} times the EI/L of the span beside it`);
    }
    if (support.kind !== "spring") return;
    const near = Math.max(node > 0 ? spanStiffness[node - 1] : 0, node < member.spans.length ? spanStiffness[node] : 0);
    offer(support.stiffness / near, `the spring at node ${node + 1} is ${g(support.stiffness / near)} times the EI/L^3 of the span beside it`);
  });
  return text === "" ? "the stiffnesses are too disparate" : text;
}

function tooIllConditioned(member: Member) {
  return invalid(
    `the stiffness system cannot be solved to 1e-9 even in extended precision: ${worstStiffnessRatio(member)}; results would not be trustworthy (check spans, EI and spring stiffness)`,
  );
}
