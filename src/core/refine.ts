/**
 * Accuracy guards for the stiffness solve. Extreme ratios of span, EI and spring stiffness
 * make K d = f ill-conditioned: elimination is backward stable, yet the solved displacements
 * can leave out-of-balance forces far above the loads' rounding. Two guards:
 *
 * - `refine`: iterative refinement with the residual K d - f computed in compensated
 *   (double-double) arithmetic, so the correction is not drowned by cancellation;
 * - `staticsResidual`: the member's equilibrium (vertical forces, moments about x = 0) from
 *   the final reactions against the loads, which the solver refuses to report when it fails.
 */
import { solveBanded, type PivotStats } from "./banded";
import { productError } from "./doubleDouble";
import type { Load, Reaction } from "./model";
import type { StiffnessSystem } from "./stiffness";

/** Adds a * b to the double-double (hi, lo) held in acc, without losing the product's low part. */
function addProduct(acc: [number, number], a: number, b: number): void {
  const p = a * b;
  const pe = productError(a, b, p);
  const s = acc[0] + p;
  const v = s - acc[0];
  const se = acc[0] - (s - v) + (p - v);
  acc[0] = s;
  acc[1] += se + pe;
}

/** K d - f, each row summed in double-double. */
export function residualOf(system: StiffnessSystem, d: Float64Array): Float64Array {
  const { size: n, halfBandwidth: hb, band, rhs } = system;
  const stride = hb + 1;
  const r = new Float64Array(n);
  const acc: [number, number] = [0, 0];
  for (let i = 0; i < n; i++) {
    acc[0] = -rhs[i];
    acc[1] = 0;
    for (let j = Math.max(0, i - hb); j < i; j++) addProduct(acc, band[j * stride + (i - j)], d[j]);
    for (let j = i; j <= Math.min(n - 1, i + hb); j++) addProduct(acc, band[i * stride + (j - i)], d[j]);
    r[i] = acc[0] + acc[1];
  }
  return r;
}

/** Row r of a 4x4 element matrix times the element's displacements, minus its nodal load, in double-double. */
export function endForce(k: number[], r: number, local: number[], nodalLoad: number): number {
  const acc: [number, number] = [-nodalLoad, 0];
  for (let c = 0; c < 4; c++) addProduct(acc, k[r * 4 + c], local[c]);
  return acc[0] + acc[1];
}

const REFINEMENT_STEPS = 3;
/** A residual below this fraction of the largest load term is rounding: no refinement (results stay bit-identical). */
const SETTLED = 1e-13;

/** Solves K d = f and refines d while the residual is above rounding and shrinks (a few steps; O(n b^2) each). */
export function solveRefined(system: StiffnessSystem, stats?: PivotStats): Float64Array {
  const d = solveBanded(system, stats);
  let load = 0;
  for (const v of system.rhs) load = Math.max(load, Math.abs(v));
  let size = Infinity;
  for (let step = 0; step < REFINEMENT_STEPS; step++) {
    const r = residualOf(system, d);
    let next = 0;
    for (const v of r) next = Math.max(next, Math.abs(v));
    if (!(next < size) || next <= SETTLED * load) break;
    size = next;
    const delta = solveBanded({ ...system, rhs: r });
    for (let i = 0; i < d.length; i++) d[i] -= delta[i];
  }
  return d;
}

/**
 * Out-of-balance vertical force and moment about x = 0 of the reactions (up +, moments
 * counter-clockwise +) against the loads (down +, couples clockwise +). A settlement is no
 * force: the reactions it causes balance among themselves.
 */
export function staticsResidual(loads: Load[], reactions: Reaction[]): { force: number; moment: number } {
  let force = 0;
  let moment = 0;
  for (const r of reactions) {
    force += r.force;
    moment += r.force * r.x + r.moment;
  }
  for (const load of loads) {
    if (load.kind === "point") {
      force -= load.magnitude;
      moment -= load.magnitude * load.xStart;
    } else if (load.kind === "moment") {
      moment -= load.magnitude;
    } else if (load.kind !== "settle") {
      const a = load.xStart;
      const b = load.xEnd;
      const w1 = load.magnitude;
      const w2 = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
      force -= ((w1 + w2) * (b - a)) / 2;
      moment -= ((b - a) * (w1 * (2 * a + b) + w2 * (a + 2 * b))) / 6;
    }
  }
  return { force: Math.abs(force), moment: Math.abs(moment) };
}
