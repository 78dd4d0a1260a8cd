/**
 * Natural frequencies and mode shapes of a member in free flexural vibration, exact for the
 * Euler-Bernoulli model: every stretch of uniform EI and mass per length is one exact
 * dynamic-stiffness element (dynamicStiffness.ts), point masses sit at nodes, and the
 * Wittrick-Williams algorithm counts the natural frequencies below any trial frequency
 * (J = J0 + the negative pivots of the assembled dynamic stiffness), so bisection on that
 * count brackets every mode in turn and none is missed. Rotary inertia and shear deformation
 * are not modelled. Units: consistent (EI in force x length^2, mass in force x time^2 /
 * length^2 per length, so sqrt(EI / (m L^4)) is in 1/time); circular frequencies out.
 */
import { maxOf, minOf } from "./tolerance";
import { clampedCount, elementMatrix, krylov } from "./dynamicStiffness";
import { invalid, unavailable } from "./errors";
import { rotationalSpring } from "./layout";
import type { Load, Member } from "./model";
import { checkStability } from "./stability";
import { POSITION_TOLERANCE } from "./tolerance";
import { validateMember } from "./validate";

/** Most modes one call may ask for. */
export const MAX_MODES = 50;

/**
 * Most elements x modes one call may take (elements: the spans cut at every mass boundary):
 * each mode costs about fifty factorisations of the whole member. At 100,000 (2,000 spans and
 * 50 modes) a call took 2.3-2.7 s on a heavily loaded machine (tests/bench/vibration.bench.ts),
 * and at 5,000 (1,000 elements and 5 modes) SPAN.MODESHAPE with 10,001 x cells still took
 * 310 ms of CPU at a load average of 3.3 (tests/bench/limits.bench.ts), so the limit is 2,500,
 * to keep a call well within the 200 ms the limits section promises.
 */
export const MAX_VIBRATION_WORK = 2_500;

/**
 * Most elements one call may take, whatever the modes: the search grows faster than the
 * elements (tests/bench/limits.bench.ts, one loaded run: 2,000 elements and 5 modes cost about
 * what 200 elements and 50 modes do, 100 ms; 10,000 elements and 1 mode 480-680 ms; at a load
 * average of 3.3, 999 point masses on one span and 5 modes took 210 ms of CPU, and at 4,
 * SPAN.MODESHAPE of 500 elements, mode 4 and 10,001 x cells 230 ms, while 200 elements and
 * mode 11 took 110 ms; hence 250).
 */
export const MAX_VIBRATION_ELEMENTS = 250;

/** Bisection stops when the bracket is this fraction of the frequency (well inside 1e-12). */
export const FREQUENCY_TOLERANCE = 2e-14;

/** Neighbouring frequencies closer than this (relative) make a mode shape not unique. */
export const REPEATED_FREQUENCY = 1e-8;

/** Mass on the member: per length over a stretch, or concentrated at a point. */
export type Mass =
  | { kind: "distributed"; from: number; to: number; perLength: number; row: number }
  | { kind: "point"; at: number; mass: number; row: number };

/** A member for vibration: its spans, supports and EI (required), and the masses on it. */
export interface VibrationModel {
  member: Member;
  masses: Mass[];
}

/** Uniform mass per length over each span (one value for all spans, or one per span). */
export function spanMasses(spans: number[], perLength: number[]): Mass[] {
  const out: Mass[] = [];
  let x = 0;
  spans.forEach((span, i) => {
    const m = perLength.length === 1 ? perLength[0] : perLength[i];
    if (!(Number.isFinite(m) && m >= 0)) throw invalid(`mass of span ${i + 1}: must be a number of at least 0, got ${m}`);
    if (m > 0) out.push({ kind: "distributed", from: x, to: x + span, perLength: m, row: 0 });
    x += span;
  });
  return out;
}

/**
 * Masses from gravity loads: each load divided by g (a point load gives a point mass, a
 * uniform load a uniform mass over its extent). A couple carries no mass and a linearly
 * varying load a varying mass, which the uniform elements cannot take exactly: both refused.
 */
export function massesFromLoads(loads: Load[], g: number): Mass[] {
  if (!(Number.isFinite(g) && g > 0)) throw invalid(`g: the acceleration of gravity must be a positive number, got ${g}`);
  return loads.map((load): Mass => {
    const where = `load row ${load.row}`;
    if (load.kind === "moment") throw invalid(`${where}: a couple carries no mass; leave couples out of the loads (or the combination) that give the mass`);
    if (load.kind === "settle") throw invalid(`${where}: a settlement carries no mass; leave settlements out of the loads (or the combination) that give the mass`);
    if (load.kind === "point") return { kind: "point", at: load.xStart, mass: load.magnitude / g, row: load.row };
    if (load.kind === "linear" && load.magnitudeEnd !== load.magnitude) {
      throw invalid(`${where}: a linearly varying load gives a mass that varies along the member, which is not taken exactly; give uniform loads or the mass per length`);
    }
    return { kind: "distributed", from: load.xStart, to: load.xEnd, perLength: load.magnitude / g, row: load.row };
  });
}

interface Element {
  x0: number;
  length: number;
  ei: number;
  mass: number;
  dofs: [number, number, number, number];
}

interface Mesh {
  elements: Element[];
  size: number;
  /** Nodal terms: spring stiffness and point mass on a free deflection DOF. */
  springs: { dof: number; stiffness: number }[];
  pointMasses: { dof: number; mass: number }[];
  bandwidth: number;
  length: number;
}

function snapped(points: number[], x: number, tol: number): number {
  for (const p of points) if (Math.abs(p - x) <= tol) return p;
  return x;
}

/** Nodes at span ends and at every mass boundary; one element per stretch between nodes. */
function buildMesh(model: VibrationModel): Mesh {
  const { member, masses } = model;
  const { spans, supports } = member;
  const stiffness = member.stiffness as number[];
  const spanEnds = [0];
  for (const span of spans) spanEnds.push(spanEnds[spanEnds.length - 1] + span);
  const length = spanEnds[spanEnds.length - 1];
  spanEnds[spanEnds.length - 1] = length;
  const tol = POSITION_TOLERANCE * length;
  const extra: number[] = [];
  for (const m of masses) {
    if (m.kind === "point") extra.push(m.at);
    else extra.push(m.from, m.to);
  }
  const points = [...spanEnds];
  for (const x of extra) {
    const at = snapped(spanEnds, Math.min(Math.max(x, 0), length), tol);
    if (!spanEnds.includes(at)) points.push(at);
  }
  points.sort((a, b) => a - b);
  const nodes: number[] = [];
  for (const p of points) if (nodes.length === 0 || p - nodes[nodes.length - 1] > tol) nodes.push(p);
  nodes[nodes.length - 1] = length;
  const supportAt = new Map<number, number>();
  spanEnds.forEach((x, i) => supportAt.set(x, i));
  const near = (x: number): number => {
    let lo = 0;
    let hi = nodes.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (nodes[mid] < x - tol) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  // DOFs node by node: deflection unless restrained, then rotation(s).
  const wDof: number[] = [];
  const leftDof: number[] = [];
  const rightDof: number[] = [];
  const springs: Mesh["springs"] = [];
  let next = 0;
  nodes.forEach((x) => {
    const index = supportAt.get(x);
    const support = index === undefined ? { kind: "free" as const } : supports[index];
    const kind = support.kind;
    wDof.push(kind === "pin" || kind === "fixed" ? -1 : next++);
    if (kind === "fixed") {
      leftDof.push(-1);
      rightDof.push(-1);
    } else if (kind === "hinge") {
      leftDof.push(next++);
      rightDof.push(next++);
    } else {
      const dof = next++;
      leftDof.push(dof);
      rightDof.push(dof);
    }
    if (support.kind === "spring") springs.push({ dof: wDof[wDof.length - 1], stiffness: support.stiffness });
    const rotational = rotationalSpring(support);
    if (rotational > 0) springs.push({ dof: rightDof[rightDof.length - 1], stiffness: rotational });
  });
  const perLength = new Float64Array(nodes.length - 1);
  const pointMass = new Float64Array(nodes.length);
  for (const m of masses) {
    if (m.kind === "point") {
      if (!(m.mass >= 0)) throw invalid(`load row ${m.row}: gives a negative mass (${m.mass}); the loads that give the mass must act downward`);
      pointMass[near(m.at)] += m.mass;
    } else {
      const a = near(m.from);
      const b = near(m.to);
      for (let e = a; e < b; e++) perLength[e] += m.perLength;
    }
  }
  const elements: Element[] = [];
  let span = 0;
  let bandwidth = 0;
  let largest = 0;
  for (const m of perLength) largest = Math.max(largest, Math.abs(m));
  for (let e = 0; e + 1 < nodes.length; e++) {
    while (span + 1 < spans.length && nodes[e] >= spanEnds[span + 1] - tol) span++;
    const mass = perLength[e];
    if (mass < -1e-12 * largest) {
      throw invalid(`the mass per length between x = ${+nodes[e].toPrecision(12)} and ${+nodes[e + 1].toPrecision(12)} is negative; the loads that give the mass must act downward`);
    }
    const dofs: Element["dofs"] = [wDof[e], rightDof[e], wDof[e + 1], leftDof[e + 1]];
    const used = dofs.filter((d) => d >= 0);
    if (used.length > 0) bandwidth = Math.max(bandwidth, maxOf(used) - minOf(used));
    elements.push({ x0: nodes[e], length: nodes[e + 1] - nodes[e], ei: stiffness.length === 1 ? stiffness[0] : stiffness[span], mass: Math.max(mass, 0), dofs });
  }
  const pointMasses: Mesh["pointMasses"] = [];
  pointMass.forEach((mass, i) => {
    if (mass > 0 && wDof[i] >= 0) pointMasses.push({ dof: wDof[i], mass });
  });
  return { elements, size: next, springs, pointMasses, bandwidth, length };
}

function betaOf(element: Element, omega: number): number {
  return element.mass > 0 ? element.length * Math.sqrt(omega * Math.sqrt(element.mass / element.ei)) : 0;
}

/**
 * The assembled dynamic stiffness at omega, as a symmetric band (lower part, row-major), and
 * the elements' clamped-frequency count J0 at omega (from the same beta).
 */
function assembleBand(mesh: Mesh, omega: number, elements: Element[]): { band: Float64Array; j0: number } {
  const b = mesh.bandwidth;
  const w = b + 1;
  const band = new Float64Array(mesh.size * w);
  let j0 = 0;
  for (const element of elements) {
    const beta = betaOf(element, omega);
    if (beta > 0) j0 += clampedCount(beta);
    const d = element.dofs;
    if (d[0] < 0 && d[1] < 0 && d[2] < 0 && d[3] < 0) continue;
    const k = elementMatrix(element.ei, element.length, beta);
    for (let r = 0; r < 4; r++) {
      const dr = d[r];
      if (dr < 0) continue;
      for (let c = 0; c < 4; c++) {
        const dc = d[c];
        if (dc < 0 || dc > dr) continue;
        band[dr * w + (dr - dc)] += k[r * 4 + c];
      }
    }
  }
  for (const s of mesh.springs) band[s.dof * w] += s.stiffness;
  for (const p of mesh.pointMasses) band[p.dof * w] -= omega * omega * p.mass;
  return { band, j0 };
}

/** Negative pivots of the symmetric band's LDL^T factorisation (its count of negative eigenvalues). */
function negativePivots(band: Float64Array, n: number, b: number): number {
  const w = b + 1;
  let negatives = 0;
  let scale = 0;
  for (let i = 0; i < n; i++) scale = Math.max(scale, Math.abs(band[i * w]));
  const tiny = scale * 1e-300 || 1e-300;
  for (let j = 0; j < n; j++) {
    let d = band[j * w];
    if (!Number.isFinite(d)) throw tooFar();
    if (d === 0) d = tiny;
    if (d < 0) negatives++;
    const last = Math.min(n - 1, j + b);
    for (let i = j + 1; i <= last; i++) {
      const aij = band[i * w + (i - j)];
      if (aij === 0) continue;
      const f = aij / d;
      for (let k = j + 1; k <= i; k++) band[i * w + (i - k)] -= f * band[k * w + (k - j)];
    }
  }
  return negatives;
}

function tooFar() {
  return invalid("the natural frequencies cannot be computed reliably with these numbers (check the units of spans, EI, springs and mass)");
}

/** The Wittrick-Williams count: natural frequencies strictly below omega. */
function countBelow(mesh: Mesh, omega: number): number {
  const { band, j0 } = assembleBand(mesh, omega, mesh.elements);
  const count = mesh.size === 0 ? j0 : j0 + negativePivots(band, mesh.size, mesh.bandwidth);
  if (!Number.isSafeInteger(count)) throw tooFar();
  return count;
}

function prepare(model: VibrationModel): Mesh {
  const { member } = model;
  validateMember(member);
  if (member.stiffness === null) throw unavailable("EI: natural frequencies need the flexural stiffness; give EI for the member or each span");
  if (member.shear && member.shear.some((ga) => ga !== null)) {
    throw invalid("EI: natural frequencies are computed for Euler-Bernoulli spans only; leave the shear stiffness (shear GA) out of EI for this function");
  }
  checkStability(member);
  const mesh = buildMesh(model);
  for (const e of mesh.elements) {
    if (!(Number.isFinite(Math.sqrt(e.mass / e.ei)) && Number.isFinite(e.ei / e.length ** 3) && e.ei / e.length ** 3 > 0)) throw tooFar();
  }
  const massive = mesh.elements.some((e) => e.mass > 0) || mesh.pointMasses.length > 0;
  if (!massive) throw invalid("mass: the member carries no mass that can move; give a mass per length or loads that give one");
  return mesh;
}

function checkModeCount(count: number, name: string): void {
  if (!Number.isInteger(count) || count < 1 || count > MAX_MODES) {
    throw invalid(`${name}: give a whole number of modes from 1 to ${MAX_MODES}, got ${count}`);
  }
}

function search(mesh: Mesh, count: number): number[] {
  const elements = mesh.elements.length;
  if (elements > MAX_VIBRATION_ELEMENTS || elements * count > MAX_VIBRATION_WORK) {
    throw invalid(
      `modes: ${count} modes of a member of ${elements} elements (spans cut at mass boundaries) is more than one call takes (at most ${MAX_VIBRATION_ELEMENTS} elements, and elements x modes at most ${MAX_VIBRATION_WORK}); ${
        elements > MAX_VIBRATION_ELEMENTS ? `no call takes more than ${MAX_VIBRATION_ELEMENTS} elements` : `ask for at most ${Math.floor(MAX_VIBRATION_WORK / elements)} modes`
      }`,
    );
  }
  if (!mesh.elements.some((e) => e.mass > 0) && count > mesh.pointMasses.length) {
    throw invalid(`modes: the member's mass is all in point loads at ${mesh.pointMasses.length} free node(s), so it has only ${mesh.pointMasses.length} natural frequencies; ask for at most that many`);
  }
  let reference = Infinity;
  for (const e of mesh.elements) if (e.mass > 0) reference = Math.min(reference, Math.sqrt(e.ei / e.mass) / (mesh.length * mesh.length));
  if (!Number.isFinite(reference)) reference = 1;
  const samples: { omega: number; count: number }[] = [];
  const sample = (omega: number): number => {
    const j = countBelow(mesh, omega);
    samples.push({ omega, count: j });
    return j;
  };
  let hi = reference;
  for (let i = 0; sample(hi) < count; i++) {
    hi *= 2;
    if (!Number.isFinite(hi) || i > 2200) throw tooFar();
  }
  const out: number[] = [];
  for (let k = 1; k <= count; k++) {
    let lo = 0;
    let up = Infinity;
    for (const s of samples) {
      if (s.count < k && s.omega > lo) lo = s.omega;
      if (s.count >= k && s.omega < up) up = s.omega;
    }
    for (let i = 0; i < 400 && up - lo > FREQUENCY_TOLERANCE * up; i++) {
      const mid = 0.5 * (lo + up);
      if (mid <= lo || mid >= up) break;
      if (sample(mid) >= k) up = mid;
      else lo = mid;
    }
    const omega = 0.5 * (lo + up);
    if (!(Number.isFinite(omega) && omega > 0 && up - lo <= 1e-12 * up)) throw tooFar();
    out.push(omega);
  }
  return out;
}

/**
 * The first `count` circular natural frequencies (radians per unit time), ascending; a
 * repeated frequency appears as often as its multiplicity.
 */
export function naturalFrequencies(model: VibrationModel, count: number): number[] {
  checkModeCount(count, "modes");
  return search(prepare(model), count);
}

/** One stretch of a mode shape: w(x) = w0 k1 + theta0 k2 + curvature k3 + third k4 with s = x - x0. */
export interface ModePiece {
  x0: number;
  x1: number;
  lambda4: number;
  w0: number;
  theta0: number;
  curvature: number;
  third: number;
}

/** A mode shape normalised so that its largest |w| is 1 (the leftmost such peak positive). */
export interface ModeShape {
  mode: number;
  omega: number;
  pieces: ModePiece[];
}

/** Gaussian elimination with partial pivoting on a band (lower and upper half-bandwidth b). */
function solvePivoted(mesh: Mesh, band: Float64Array, rhs: Float64Array): Float64Array {
  const n = mesh.size;
  const b = mesh.bandwidth;
  const sw = b + 1;
  const W = 3 * b + 1;
  const m = new Float64Array(n * W);
  const at = (i: number, j: number) => i * W + (j - i + b);
  let scale = 0;
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(0, i - b); j <= i; j++) {
      const v = band[i * sw + (i - j)];
      m[at(i, j)] = v;
      m[at(j, i)] = v;
      scale = Math.max(scale, Math.abs(v));
    }
  }
  const x = Float64Array.from(rhs);
  for (let k = 0; k < n; k++) {
    let p = k;
    const last = Math.min(n - 1, k + b);
    for (let i = k + 1; i <= last; i++) if (Math.abs(m[at(i, k)]) > Math.abs(m[at(p, k)])) p = i;
    const right = Math.min(n - 1, k + 2 * b);
    if (p !== k) {
      for (let j = k; j <= right; j++) {
        const t = m[at(k, j)];
        m[at(k, j)] = m[at(p, j)];
        m[at(p, j)] = t;
      }
      const t = x[k];
      x[k] = x[p];
      x[p] = t;
    }
    if (m[at(k, k)] === 0) m[at(k, k)] = scale * 1e-17 || 1e-300;
    const pivot = m[at(k, k)];
    for (let i = k + 1; i <= last; i++) {
      const f = m[at(i, k)] / pivot;
      if (f === 0) continue;
      for (let j = k; j <= right; j++) m[at(i, j)] -= f * m[at(k, j)];
      x[i] -= f * x[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let sum = x[k];
    const right = Math.min(n - 1, k + 2 * b);
    for (let j = k + 1; j <= right; j++) sum -= m[at(k, j)] * x[j];
    x[k] = sum / m[at(k, k)];
  }
  return x;
}

/** The mesh with every element cut so that beta <= 1.5 at omega: no element has a clamped frequency below it. */
function refined(mesh: Mesh, omega: number): Mesh {
  const elements: Element[] = [];
  let next = mesh.size;
  for (const element of mesh.elements) {
    const parts = Math.max(1, Math.ceil(betaOf(element, omega) / 1.5));
    const step = element.length / parts;
    let left = element.dofs.slice(0, 2) as [number, number];
    for (let p = 0; p < parts; p++) {
      const last = p === parts - 1;
      const right: [number, number] = last ? [element.dofs[2], element.dofs[3]] : [next++, next++];
      elements.push({ ...element, x0: element.x0 + p * step, length: last ? element.length - p * step : step, dofs: [left[0], left[1], right[0], right[1]] });
      left = right;
    }
  }
  // New interior DOFs are numbered after the old ones, so the band is recomputed for the order used.
  const order = renumber(elements, next);
  for (const e of elements) e.dofs = e.dofs.map((d) => (d < 0 ? -1 : order[d])) as Element["dofs"];
  let bandwidth = 0;
  for (const e of elements) {
    const used = e.dofs.filter((d) => d >= 0);
    if (used.length > 0) bandwidth = Math.max(bandwidth, maxOf(used) - minOf(used));
  }
  return {
    elements,
    size: next,
    springs: mesh.springs.map((s) => ({ ...s, dof: order[s.dof] })),
    pointMasses: mesh.pointMasses.map((p) => ({ ...p, dof: order[p.dof] })),
    bandwidth,
    length: mesh.length,
  };
}

/** DOF numbers in order of first use along the member (keeps the band narrow). */
function renumber(elements: Element[], size: number): number[] {
  const order = new Array<number>(size).fill(-1);
  let next = 0;
  for (const e of elements) for (const d of e.dofs) if (d >= 0 && order[d] < 0) order[d] = next++;
  return order;
}

function pieceOf(element: Element, omega: number, d: Float64Array): ModePiece {
  const value = (dof: number) => (dof >= 0 ? d[dof] : 0);
  const [w0, theta0, w1, theta1] = element.dofs.map(value);
  const lambda4 = (omega * omega * element.mass) / element.ei;
  const [k1, k2, k3, k4] = krylov(lambda4, element.length);
  // w(L) = w0 k1 + theta0 k2 + P k3 + Q k4;  w'(L) = w0 lambda4 k4 + theta0 k1 + P k2 + Q k3.
  const r1 = w1 - w0 * k1 - theta0 * k2;
  const r2 = theta1 - w0 * lambda4 * k4 - theta0 * k1;
  const det = k3 * k3 - k2 * k4;
  return { x0: element.x0, x1: element.x0 + element.length, lambda4, w0, theta0, curvature: (r1 * k3 - r2 * k4) / det, third: (k3 * r2 - k2 * r1) / det };
}

/** w on a mode piece at x (not normalised). */
export function pieceDeflection(piece: ModePiece, x: number): number {
  const [k1, k2, k3, k4] = krylov(piece.lambda4, x - piece.x0);
  return piece.w0 * k1 + piece.theta0 * k2 + piece.curvature * k3 + piece.third * k4;
}

function pieceSlope(piece: ModePiece, x: number): number {
  const [k1, k2, k3, k4] = krylov(piece.lambda4, x - piece.x0);
  return piece.w0 * piece.lambda4 * k4 + piece.theta0 * k1 + piece.curvature * k2 + piece.third * k3;
}

/** Where |w| peaks on a piece: its ends and the roots of w' (sign changes over 16 steps, then bisection). */
function pieceCandidates(piece: ModePiece): number[] {
  const xs = [piece.x0, piece.x1];
  const steps = 16;
  const h = (piece.x1 - piece.x0) / steps;
  let a = piece.x0;
  let fa = pieceSlope(piece, a);
  for (let i = 1; i <= steps; i++) {
    const b = i === steps ? piece.x1 : piece.x0 + i * h;
    const fb = pieceSlope(piece, b);
    if (fa !== 0 && fb !== 0 && fa < 0 !== fb < 0) {
      let lo = a;
      let hi = b;
      let flo = fa;
      for (let k = 0; k < 200; k++) {
        const mid = 0.5 * (lo + hi);
        if (mid <= lo || mid >= hi) break;
        const fm = pieceSlope(piece, mid);
        if (fm === 0) {
          lo = hi = mid;
          break;
        }
        if (fm < 0 === flo < 0) {
          lo = mid;
          flo = fm;
        } else hi = mid;
      }
      xs.push(0.5 * (lo + hi));
    }
    a = b;
    fa = fb;
  }
  return xs;
}

/**
 * The shape of mode `mode` (1-based), normalised to a largest |w| of 1 with the leftmost
 * peak of that size positive (down +). Refused when a neighbouring frequency equals its own
 * to REPEATED_FREQUENCY, since the shape of a repeated frequency is not unique.
 */
export function modeShape(model: VibrationModel, mode: number): ModeShape {
  checkModeCount(mode, "mode");
  const mesh = prepare(model);
  const pointOnly = !mesh.elements.some((e) => e.mass > 0);
  const available = pointOnly ? mesh.pointMasses.length : Infinity;
  const omegas = search(mesh, Math.max(mode, Math.min(mode + 1, available)));
  const omega = omegas[mode - 1];
  const close = (other: number | undefined) => other !== undefined && Math.abs(other - omega) <= REPEATED_FREQUENCY * omega;
  if (close(omegas[mode - 2]) || close(omegas[mode])) {
    throw invalid(`mode ${mode}: its frequency equals a neighbouring mode's to 8 digits (a repeated frequency), so its shape is not unique`);
  }
  const fine = refined(mesh, omega);
  const { band } = assembleBand(fine, omega, fine.elements);
  let d: Float64Array = new Float64Array(fine.size);
  let seed = 12345;
  for (let i = 0; i < d.length; i++) {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    d[i] = 0.5 + seed / 2147483648;
  }
  for (let iteration = 0; iteration < 3; iteration++) {
    d = solvePivoted(fine, band, d);
    let size = 0;
    for (const v of d) size = Math.max(size, Math.abs(v));
    if (!(size > 0 && Number.isFinite(size))) throw invalid(`mode ${mode}: its shape could not be computed reliably`);
    for (let i = 0; i < d.length; i++) d[i] /= size;
  }
  const pieces = fine.elements.map((e) => pieceOf(e, omega, d));
  let peak = 0;
  const candidates: { x: number; w: number }[] = [];
  for (const piece of pieces) {
    for (const x of pieceCandidates(piece)) {
      const w = pieceDeflection(piece, x);
      candidates.push({ x, w });
      peak = Math.max(peak, Math.abs(w));
    }
  }
  if (!(peak > 0 && Number.isFinite(peak))) throw invalid(`mode ${mode}: its shape could not be computed reliably`);
  let signed = 0;
  let leftmost = Infinity;
  for (const c of candidates) {
    if (Math.abs(c.w) >= peak * (1 - 1e-9) && c.x < leftmost) {
      leftmost = c.x;
      signed = c.w;
    }
  }
  const factor = Math.abs(signed) > 0 ? 1 / signed : 1 / peak;
  return {
    mode,
    omega,
    pieces: pieces.map((p) => ({ ...p, w0: p.w0 * factor, theta0: p.theta0 * factor, curvature: p.curvature * factor, third: p.third * factor })),
  };
}

/** The normalised mode shape at x (from the member's left end). */
export function modeValue(shape: ModeShape, x: number): number {
  const { pieces } = shape;
  const length = pieces[pieces.length - 1].x1;
  const tol = POSITION_TOLERANCE * length;
  if (!(Number.isFinite(x) && x >= -tol && x <= length + tol)) throw invalid(`x = ${x} is outside the member, which runs from 0 to ${length}`);
  const at = Math.min(Math.max(x, 0), length);
  let lo = 0;
  let hi = pieces.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (pieces[mid].x0 <= at) lo = mid;
    else hi = mid - 1;
  }
  return pieceDeflection(pieces[lo], at);
}
