/**
 * A lean stiffness-method solver for the per-row benchmark's floor: the general method the
 * product uses (two DOFs a node, deflection and rotation, either restrained or free at any
 * node: `fixedAt` restrains a rotation, `freeAt` frees a deflection; a banded system of the
 * free DOFs solved by Gaussian elimination without pivoting; element end forces K d plus the
 * fixed-end reactions, from all four DOFs), with none of the
 * product's guarantees: no validation, no mechanism sweep, no refinement residual, no
 * equilibrium check, no scales, no solution object, no pieces kept. It answers the yardstick's
 * question (the largest sagging moment of the yardstick's beams and where it is) so that the
 * bench can print what the method itself costs beside the yardstick's three-moment solve.
 *
 * Beam element stiffness 2EI/L^3 [[6, 3L, -6, 3L], [3L, 2L^2, -3L, L^2], ...] and fixed-end
 * forces of a full UDL (w L/2, w L^2/12) and a point load P at a (P b^2 (3a + b)/L^3,
 * P a b^2/L^2 and their mirror), e.g. Przemieniecki, Theory of Matrix Structural Analysis,
 * from memory; checked against the yardstick in yardstick.test.ts. Allocation-free after
 * the first call (scratch arrays reused).
 */
import type { YardstickBeam } from "./yardstick";

/** Half bandwidth of the free DOFs' system: a DOF couples with at most the next three (its node's other DOF and the next node's two). */
const BAND = 3;

let band = new Float64Array(0);
let rhs = new Float64Array(0);
let dofOf = new Int32Array(0);
let ends = new Float64Array(0);
/** One element's fixed-end reactions [force, moment at the left; force, moment at the right] and its upper-triangle stiffness, row by row. */
const fe = new Float64Array(4);
const ke = new Float64Array(10);

function grow(nodes: number): void {
  if (dofOf.length >= 2 * nodes) return;
  band = new Float64Array(2 * nodes * (BAND + 1));
  rhs = new Float64Array(2 * nodes);
  dofOf = new Int32Array(2 * nodes);
  ends = new Float64Array(4 * nodes);
}

/** The solved displacement of global DOF slot j (2 node + 0 deflection, + 1 rotation); 0 where restrained. */
function displacement(j: number): number {
  const dof = dofOf[j];
  return dof < 0 ? 0 : rhs[dof];
}

/** Sagging moment at t in a span from its left end moment m (sagging +), left shear v, UDL w and point load p at a. */
function momentAt(m: number, v: number, w: number, p: number, a: number, t: number): number {
  return m + v * t - (w * t * t) / 2 - (t > a ? p * (t - a) : 0);
}

/**
 * Largest sagging moment over the member and where it is. A node's deflection is restrained
 * unless `freeAt[node]`, its rotation free unless `fixedAt[node]` (both omitted: every node a
 * pin, the yardstick's beams). The caller keeps the member stable (no mechanism check).
 */
export function leanMaxMoment(beam: YardstickBeam, out: { max: number; x: number }, fixedAt?: readonly boolean[], freeAt?: readonly boolean[]): void {
  const { spans, udl, point, at } = beam;
  const n = spans.length;
  grow(n + 1);
  // Number the free DOFs in node order (deflection 2i, rotation 2i + 1); restrained get -1.
  let size = 0;
  for (let i = 0; i <= n; i++) {
    dofOf[2 * i] = freeAt !== undefined && freeAt[i] ? size++ : -1;
    dofOf[2 * i + 1] = fixedAt !== undefined && fixedAt[i] ? -1 : size++;
  }
  const width = BAND + 1;
  band.fill(0, 0, size * width);
  rhs.fill(0, 0, size);
  // Assembly: band[r * width + (c - r)] holds K[r][c] for c >= r (symmetric, upper band).
  for (let e = 0; e < n; e++) {
    const l = spans[e];
    const k = 2 / (l * l * l);
    const w = udl[e];
    const p = point[e];
    const a = at[e];
    const b = l - a;
    fe[0] = (w * l) / 2 + (p * b * b * (3 * a + b)) / (l * l * l);
    fe[1] = (w * l * l) / 12 + (p * a * b * b) / (l * l);
    fe[2] = (w * l) / 2 + (p * a * a * (a + 3 * b)) / (l * l * l);
    fe[3] = -((w * l * l) / 12) - (p * a * a * b) / (l * l);
    ke[0] = 6 * k;
    ke[1] = 3 * l * k;
    ke[2] = -6 * k;
    ke[3] = 3 * l * k;
    ke[4] = 2 * l * l * k;
    ke[5] = -3 * l * k;
    ke[6] = l * l * k;
    ke[7] = 6 * k;
    ke[8] = -3 * l * k;
    ke[9] = 2 * l * l * k;
    for (let r = 0; r < 4; r++) {
      const dr = dofOf[2 * e + r];
      if (dr < 0) continue;
      // The equivalent nodal loads are the fixed-end reactions reversed.
      rhs[dr] -= fe[r];
      for (let c = r; c < 4; c++) {
        const dc = dofOf[2 * e + c];
        if (dc < 0) continue;
        const entry = ke[r * 4 - (r * (r - 1)) / 2 + (c - r)];
        if (dc >= dr) band[dr * width + (dc - dr)] += entry;
        else band[dc * width + (dr - dc)] += entry;
      }
    }
    ends[4 * e] = fe[0];
    ends[4 * e + 1] = fe[1];
    ends[4 * e + 2] = fe[2];
    ends[4 * e + 3] = fe[3];
  }
  // Banded elimination (symmetric positive definite: no pivoting), then back substitution.
  for (let r = 0; r < size; r++) {
    const pivot = band[r * width];
    for (let j = 1; j < width && r + j < size; j++) {
      const f = band[r * width + j] / pivot;
      if (f === 0) continue;
      for (let c = j; c < width; c++) band[(r + j) * width + (c - j)] -= f * band[r * width + c];
      rhs[r + j] -= f * rhs[r];
    }
  }
  for (let r = size - 1; r >= 0; r--) {
    let s = rhs[r];
    for (let j = 1; j < width && r + j < size; j++) s -= band[r * width + j] * rhs[r + j];
    rhs[r] = s / band[r * width];
  }
  // End forces per span, then the span's largest sagging moment from its left end.
  let max = -Infinity;
  let xMax = 0;
  let x0 = 0;
  for (let e = 0; e < n; e++) {
    const l = spans[e];
    const k = 2 / (l * l * l);
    const d0 = displacement(2 * e);
    const d1 = displacement(2 * e + 1);
    const d2 = displacement(2 * e + 2);
    const d3 = displacement(2 * e + 3);
    // The first two rows of K d (the element matrix above) plus the fixed-end reactions.
    const shearLeft = k * (6 * d0 + 3 * l * d1 - 6 * d2 + 3 * l * d3) + ends[4 * e];
    const momentLeft = k * (3 * l * d0 + 2 * l * l * d1 - 3 * l * d2 + l * l * d3) + ends[4 * e + 1];
    const w = udl[e];
    const p = point[e];
    const a = at[e];
    // The element's end moment is counter-clockwise on the element: sagging at the left end is its negative.
    const m = -momentLeft;
    const v = shearLeft;
    // Candidates: both ends, the point load, and where the shear crosses zero on either side of it.
    for (let c = 0; c < 5; c++) {
      const t = c === 0 ? 0 : c === 1 ? l : c === 2 ? a : w > 0 ? (c === 3 ? v : v - p) / w : -1;
      if (c === 3 && !(t > 0 && t < a)) continue;
      if (c === 4 && !(t > a && t < l)) continue;
      const value = momentAt(m, v, w, p, a, t);
      if (value > max) {
        max = value;
        xMax = x0 + t;
      }
    }
    x0 += l;
  }
  out.max = max;
  out.x = xMax;
}
