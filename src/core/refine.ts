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
import { factorBanded, solveFactored, type PivotStats } from "./banded";
import { highPart, productError, splitProductError } from "./doubleDouble";
import type { Load, Reaction } from "./model";
import type { StiffnessSystem } from "./stiffness";

/** K d - f, each row summed in double-double (a + b = hi + lo kept in locals, the product's low part by productError), into r. */
function residualInto(system: StiffnessSystem, d: Float64Array, r: Float64Array): void {
  const { size: n, halfBandwidth: hb, band, rhs } = system;
  const stride = hb + 1;
  for (let i = 0; i < n; i++) {
    let hi = -rhs[i];
    let lo = 0;
    const first = Math.max(0, i - hb);
    const last = Math.min(n - 1, i + hb);
    for (let j = first; j <= last; j++) {
      const a = j < i ? band[j * stride + (i - j)] : band[i * stride + (j - i)];
      const b = d[j];
      const p = a * b;
      const pe = productError(a, b, p);
      const s = hi + p;
      const v = s - hi;
      const se = hi - (s - v) + (p - v);
      hi = s;
      lo += se + pe;
    }
    r[i] = hi + lo;
  }
}

/** K d - f, each row summed in double-double. */
export function residualOf(system: StiffnessSystem, d: Float64Array): Float64Array {
  const r = new Float64Array(system.size);
  residualInto(system, d, r);
  return r;
}

/** The halves of an element's four local displacements (each is a factor of four products). */
const localHigh = new Float64Array(4);
const localLow = new Float64Array(4);

/**
 * An element's four end forces K_e u - f (row r of the 4x4 matrix, row-major from `at` in k,
 * times the local displacements `local`, minus nodal load r from `nodalAt`), each row summed
 * in double-double, into `ends` from `endsAt`; and into `terms` (4 entries) the sum of the
 * magnitudes of each row's terms (|f| + Σ|k u|), the size its rounding is relative to. Each
 * displacement is split once for its four products.
 */
export function elementEndForces(
  k: ArrayLike<number>,
  at: number,
  local: ArrayLike<number>,
  nodal: ArrayLike<number>,
  nodalAt: number,
  ends: Float64Array,
  endsAt: number,
  terms: Float64Array,
): void {
  for (let c = 0; c < 4; c++) {
    const b = local[c];
    const bh = highPart(b);
    localHigh[c] = bh;
    localLow[c] = b - bh;
  }
  for (let r = 0; r < 4; r++) {
    const f = nodal[nodalAt + r];
    let hi = -f;
    let lo = 0;
    let sum = Math.abs(f);
    for (let c = 0; c < 4; c++) {
      const a = k[at + r * 4 + c];
      const p = a * local[c];
      const ah = highPart(a);
      const pe = splitProductError(ah, a - ah, localHigh[c], localLow[c], p);
      const s = hi + p;
      const v = s - hi;
      const se = hi - (s - v) + (p - v);
      hi = s;
      lo += se + pe;
      sum += Math.abs(p);
    }
    ends[endsAt + r] = hi + lo;
    terms[r] = sum;
  }
}

const REFINEMENT_STEPS = 3;
/** A residual below this fraction of the largest load term is rounding: no refinement (results stay bit-identical). */
const SETTLED = 1e-13;

/** Scratch buffers of the refined solve, reused across calls (the solve is synchronous and never re-entered). */
let factored = new Float64Array(64);
let solution = new Float64Array(16);
let residual = new Float64Array(16);

/**
 * Solves K d = f and refines d while the residual is above rounding and shrinks (a few steps;
 * O(n b^2) each). The band is factored once and the factors reused for each correction. The
 * result is a scratch buffer (its first `size` entries; it may be longer): valid until the
 * next call, so the caller copies what it keeps.
 */
export function solveRefined(system: StiffnessSystem, stats?: PivotStats): Float64Array {
  const { size: n, halfBandwidth: hb } = system;
  const cells = n * (hb + 1);
  if (factored.length < cells) factored = new Float64Array(Math.max(cells, 2 * factored.length));
  if (solution.length < n) {
    solution = new Float64Array(Math.max(n, 2 * solution.length));
    residual = new Float64Array(solution.length);
  }
  const a = factored;
  const d = solution;
  const r = residual;
  for (let i = 0; i < cells; i++) a[i] = system.band[i];
  for (let i = 0; i < n; i++) d[i] = system.rhs[i];
  factorBanded(a, system.band, n, hb, stats);
  solveFactored(a, n, hb, d);
  let load = 0;
  for (let i = 0; i < n; i++) load = Math.max(load, Math.abs(system.rhs[i]));
  let size = Infinity;
  for (let step = 0; step < REFINEMENT_STEPS; step++) {
    residualInto(system, d, r);
    let next = 0;
    for (let i = 0; i < n; i++) next = Math.max(next, Math.abs(r[i]));
    if (!(next < size) || next <= SETTLED * load) break;
    size = next;
    solveFactored(a, n, hb, r);
    for (let i = 0; i < n; i++) d[i] -= r[i];
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
