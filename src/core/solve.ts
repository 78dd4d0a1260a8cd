import { isCollapsedPivot, type PivotStats } from "./banded";
import { elementDof, nodePositions, prescribedDisplacement, rotationalSpring, type Layout } from "./layout";
import { solvePrecise, worstStiffnessRatio } from "./precise";
import type { Member, PieceTable, Quantity, Reaction, Solution } from "./model";
import { deflectionAt, momentAt, shearAt, slopeAt } from "./polynomial";
import { cleanZero, EQUILIBRIUM_TOLERANCE } from "./tolerance";
import { elementEndForces, solveRefined, staticsResidual } from "./refine";
import { invalid } from "./errors";
import { integrateSpan, takePieces, type SpanStart } from "./pieces";
import { DEFLECTION0, FLEXIBILITY, MOMENT0, PIECE_FIELDS, Q0, Q1, SHEAR0, SHEAR_FLEXIBILITY, SLOPE0, X0, X1 } from "./pieceTable";
import { checkStability } from "./stability";
import { assembleMember, type Assembly } from "./stiffness";
import { validateMember } from "./validate";

function loadScaleOf(member: Member, length: number): number {
  let scale = 0;
  for (const load of member.loads) {
    if (load.kind === "point") scale += Math.abs(load.magnitude);
    else if (load.kind === "moment") scale += Math.abs(load.magnitude) / length;
    else if (load.kind !== "settle") {
      const end = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
      scale += ((Math.abs(load.magnitude) + Math.abs(end)) / 2) * (load.xEnd - load.xStart);
    }
  }
  return scale;
}

/**
 * A settlement loads the member through its supports alone (the reactions it causes balance
 * each other). The scale its forces are judged by is the largest they could be: Δ times the
 * stiffness that meets the node (12EI/L³ of each span beside it, and a spring's k).
 */
function settlementScale(member: Member, layout: Layout): number {
  const settlement = layout.settlement;
  if (settlement === null) return 0;
  let scale = 0;
  settlement.forEach((delta, node) => {
    if (delta === 0) return;
    let stiffness = 0;
    for (const e of [node - 1, node]) {
      if (e >= 0 && e < member.spans.length) stiffness += (12 * layout.stiffness[e]) / member.spans[e] ** 3;
    }
    const support = member.supports[node];
    if (support.kind === "spring") stiffness += support.stiffness;
    scale += Math.abs(delta) * stiffness;
  });
  return scale;
}

/**
 * Each quantity's own scale: its largest magnitude on the member (sampled at every piece's
 * ends and middle, within a small factor of the true largest for these low polynomials), but
 * never below 1% of the size of the terms it is computed from (the sum of the magnitudes of its
 * terms at the end of a piece, or of the end forces' terms in the solve), so that a quantity
 * that is zero throughout (to rounding) is not judged against its own noise. cleanZero against
 * this scale zeroes only values below 1e-11 of it. One sweep over the pieces for all four.
 */
function scalesOf(pieces: PieceTable, forceTerms: number, momentTerms: number): Record<Quantity, number> {
  let shear = 0;
  let moment = 0;
  let slope = 0;
  let deflection = 0;
  let shearTerms = 0;
  let momentTermsOfPieces = 0;
  let slopeTerms = 0;
  let deflectionTerms = 0;
  const d = pieces.data;
  for (let o = 0; o < pieces.count * PIECE_FIELDS; o += PIECE_FIELDS) {
    const span = d[o + X1] - d[o + X0];
    const half = 0.5 * span;
    const v = d[o + SHEAR0];
    const m = d[o + MOMENT0];
    const th = d[o + SLOPE0];
    const w = d[o + DEFLECTION0];
    const q0 = d[o + Q0];
    const q1 = d[o + Q1];
    const f = d[o + FLEXIBILITY];
    const g = d[o + SHEAR_FLEXIBILITY];
    // pieceValue's arithmetic without its quantity name (polynomial.ts): the same operations, so the same bits.
    // At the piece's start that arithmetic adds only signed zeros to the stored value (or NaN
    // from a non-finite field, which the end's value then carries too), so the start's
    // magnitude is the stored value's. Shear is linear in a piece without a varying load, so
    // its ends hold its largest value.
    shear = Math.max(shear, Math.abs(v), Math.abs(shearAt(v, q0, q1, span)));
    if (q1 !== 0) shear = Math.max(shear, Math.abs(shearAt(v, q0, q1, half)));
    moment = Math.max(moment, Math.abs(m), Math.abs(momentAt(m, v, q0, q1, span)));
    moment = Math.max(moment, Math.abs(momentAt(m, v, q0, q1, half)));
    slope = Math.max(slope, Math.abs(th), Math.abs(slopeAt(th, m, v, q0, q1, f, span)));
    slope = Math.max(slope, Math.abs(slopeAt(th, m, v, q0, q1, f, half)));
    deflection = Math.max(deflection, Math.abs(w), Math.abs(deflectionAt(w, th, m, v, q0, q1, f, g, span)));
    deflection = Math.max(deflection, Math.abs(deflectionAt(w, th, m, v, q0, q1, f, g, half)));
    // The sum of the magnitudes of each quantity's terms at the end of the piece: the size its rounding is relative to.
    const bendingMoment = Math.abs(m);
    const load = Math.abs(v) + Math.abs(q0) * span + Math.abs(q1) * span * span;
    const bending = f * span * (bendingMoment + load * span);
    shearTerms = Math.max(shearTerms, load);
    momentTermsOfPieces = Math.max(momentTermsOfPieces, bendingMoment + load * span);
    slopeTerms = Math.max(slopeTerms, Math.abs(th) + bending);
    let deflectionTerm = Math.abs(w) + Math.abs(th) * span + bending * span;
    // With shear deformation the deflection also sums V/(G·A_v) over the piece.
    if (g > 0) deflectionTerm += g * span * load;
    deflectionTerms = Math.max(deflectionTerms, deflectionTerm);
  }
  return {
    shear: Math.max(shear, 0.01 * Math.max(shearTerms, forceTerms)),
    moment: Math.max(moment, 0.01 * Math.max(momentTermsOfPieces, momentTerms)),
    slope: Math.max(slope, 0.01 * Math.max(slopeTerms, 0)),
    deflection: Math.max(deflection, 0.01 * Math.max(deflectionTerms, 0)),
  };
}

/** Numbers that overflowed (or underflowed into 0/0) must never reach the sheet. */
function requireFinite(d: Float64Array, size: number, pieces: PieceTable, reactions: Reaction[], scales: Record<Quantity, number>): void {
  let ok = Number.isFinite(scales.shear) && Number.isFinite(scales.moment) && Number.isFinite(scales.slope) && Number.isFinite(scales.deflection);
  for (let i = 0; ok && i < size; i++) ok = Number.isFinite(d[i]);
  const p = pieces.data;
  for (let o = 0; ok && o < pieces.count * PIECE_FIELDS; o += PIECE_FIELDS) {
    ok = Number.isFinite(p[o + SHEAR0]) && Number.isFinite(p[o + MOMENT0]) && Number.isFinite(p[o + SLOPE0]) && Number.isFinite(p[o + DEFLECTION0]) && Number.isFinite(p[o + FLEXIBILITY]);
  }
  for (let i = 0; ok && i < reactions.length; i++) ok = Number.isFinite(reactions[i].force) && Number.isFinite(reactions[i].moment);
  if (!ok) {
    throw invalid("the numbers are too large or too small to compute reliably (check the units of spans, loads and EI)");
  }
}

/**
 * The reactions must balance the loads (to EQUILIBRIUM_TOLERANCE of the load scale) before
 * anything is reported: when extreme stiffness ratios leave them out of balance even after
 * refinement, the member is refused rather than answered with untrustworthy numbers.
 */
function requireEquilibrium(member: Member, reactions: Reaction[], loadScale: number, length: number): void {
  if (!(loadScale > 0)) return;
  const { force, moment } = staticsResidual(member.loads, reactions);
  if (force <= EQUILIBRIUM_TOLERANCE * loadScale && moment <= EQUILIBRIUM_TOLERANCE * loadScale * length) return;
  throw invalid(
    `the reactions do not balance the loads to rounding (${worstStiffnessRatio(member)}: the stiffness system is too ill-conditioned); results would not be trustworthy`,
  );
}

/** Digits a pivot may lose in double elimination before the double-double solve takes over (1e-6: six digits). */
const PIVOT_RATIO_FOR_DOUBLE = 1e-6;
/**
 * How much larger than the end forces the terms of K d summed for them may be in double
 * before the double-double solve takes over: 1e3 x the scale keeps the cancellation error
 * (a few units of rounding of the terms) below 1e-12 of the scale.
 */
const CANCELLATION_FOR_DOUBLE = 1e3;

/**
 * The solved stiffness system: displacements and each span's end forces [force left, moment
 * left, force right, moment right] (K d - f, 4 from 4 e). One object, reused by every solve
 * (the solve is synchronous and never re-entered); its arrays may be scratch buffers longer
 * than the member needs, so what a solution keeps is copied out of them.
 */
interface StiffnessAnswer {
  d: Float64Array;
  ends: Float64Array;
  /** The largest sums of magnitudes of the terms the end forces and end moments came from: the size of their rounding. */
  forceTerms: number;
  momentTerms: number;
}

const EMPTY = new Float64Array(0);
const answer: StiffnessAnswer = { d: EMPTY, ends: EMPTY, forceTerms: 0, momentTerms: 0 };
const pivotStats: PivotStats = { smallestPivotRatio: 1 };
let scratchEnds = new Float64Array(16);
const local = new Float64Array(4);
const rowTerms = new Float64Array(4);

function endsBuffer(spanCount: number): Float64Array {
  if (scratchEnds.length < 4 * spanCount) scratchEnds = new Float64Array(Math.max(4 * spanCount, 2 * scratchEnds.length));
  return scratchEnds;
}

/** The double solve, or null when its accuracy is not assured (a pivot lost digits, or the end forces cancel). */
function solveInDouble(member: Member, assembly: Assembly): StiffnessAnswer | null {
  const { layout, system, matrices, nodalLoads } = assembly;
  pivotStats.smallestPivotRatio = 1;
  let d: Float64Array;
  try {
    d = system.size > 0 ? solveRefined(system, pivotStats) : EMPTY;
  } catch (error) {
    if (isCollapsedPivot(error)) return null;
    throw error;
  }
  if (pivotStats.smallestPivotRatio < PIVOT_RATIO_FOR_DOUBLE) return null;
  const spanCount = member.spans.length;
  const ends = endsBuffer(spanCount);
  let forceTerms = 0;
  let momentTerms = 0;
  let momentTermsRaw = 0;
  let forces = 0;
  let moments = 0;
  const { settlement } = layout;
  for (let e = 0; e < spanCount; e++) {
    const km = 16 * e;
    const span = member.spans[e];
    for (let c = 0; c < 4; c++) {
      const dof = elementDof(layout, e, c);
      // A restrained DOF moves by its settlement (prescribed), else not at all.
      local[c] = dof >= 0 ? d[dof] : settlement === null ? 0 : prescribedDisplacement(layout, e, c);
    }
    elementEndForces(matrices, km, local, nodalLoads, 4 * e, ends, 4 * e, rowTerms);
    for (let r = 0; r < 4; r++) {
      const end = ends[4 * e + r];
      const terms = rowTerms[r];
      if (r % 2 === 0) {
        forceTerms = Math.max(forceTerms, terms);
        forces = Math.max(forces, Math.abs(end));
      } else {
        momentTerms = Math.max(momentTerms, terms / span);
        momentTermsRaw = Math.max(momentTermsRaw, terms);
        moments = Math.max(moments, Math.abs(end) / span);
      }
    }
  }
  const scale = Math.max(forces, moments);
  if (forceTerms > CANCELLATION_FOR_DOUBLE * scale || momentTerms > CANCELLATION_FOR_DOUBLE * scale) return null;
  answer.d = d;
  answer.ends = ends;
  answer.forceTerms = forceTerms;
  answer.momentTerms = momentTermsRaw;
  return answer;
}

/** The double-double solve; its results are rounded once, so their rounding is relative to themselves. */
function preciseAnswer(member: Member, assembly: Assembly): StiffnessAnswer {
  const precise = solvePrecise(member, assembly.layout, assembly.spanLoads, assembly.system.halfBandwidth);
  const ends = endsBuffer(member.spans.length);
  precise.endForces.forEach((end, e) => {
    for (let r = 0; r < 4; r++) ends[4 * e + r] = end[r];
  });
  answer.d = precise.displacements;
  answer.ends = ends;
  answer.forceTerms = 0;
  answer.momentTerms = 0;
  return answer;
}

/** The values at a span's left node handed to integrateSpan: one object, reused. */
const start: SpanStart = { shear: 0, moment: 0, slope: 0, deflection: 0 };
let nodeForce = new Float64Array(8);
let nodeMoment = new Float64Array(8);

/**
 * Solves a member exactly: validates it, checks it cannot move as a mechanism, assembles
 * the banded stiffness system with exact equivalent nodal loads, solves it, and integrates
 * every span from its solved end forces into exact polynomial pieces. The solve runs in
 * double precision when that is assured to be accurate (no pivot lost more than six digits,
 * no end force cancels out of much larger terms), otherwise in double-double (precise.ts).
 * The layout, band, right-hand side, element matrices, end forces and node sums live in
 * scratch buffers reused across calls; the solution holds only its own fresh arrays.
 * Throws a #VALUE! SpanError for bad input or an unstable member.
 */
export function solve(member: Member): Solution {
  validateMember(member);
  const nodeX = nodePositions(member.spans);
  checkStability(member, nodeX);
  const assembly = assembleMember(member, nodeX, true);
  const { layout, loads } = assembly;
  const solved = solveInDouble(member, assembly) ?? preciseAnswer(member, assembly);
  const { d, ends } = solved;
  const nodeCount = nodeX.length;
  if (nodeForce.length < nodeCount) {
    nodeForce = new Float64Array(Math.max(nodeCount, 2 * nodeForce.length));
    nodeMoment = new Float64Array(nodeForce.length);
  }
  for (let i = 0; i < nodeCount; i++) {
    nodeForce[i] = 0;
    nodeMoment[i] = 0;
  }
  let pieceCount = 0;
  const spanCount = member.spans.length;
  const { settlement } = layout;
  for (let e = 0; e < spanCount; e++) {
    const at = 4 * e;
    nodeForce[e] += ends[at];
    nodeMoment[e] += ends[at + 1];
    nodeForce[e + 1] += ends[at + 2];
    nodeMoment[e + 1] += ends[at + 3];
    const slopeDof = layout.rotationRightDof[e];
    const deflectionDof = layout.deflectionDof[e];
    start.shear = -ends[at];
    start.moment = ends[at + 1];
    start.slope = slopeDof >= 0 ? d[slopeDof] : 0;
    start.deflection = deflectionDof >= 0 ? d[deflectionDof] : settlement === null ? 0 : prescribedDisplacement(layout, e, 0);
    pieceCount = integrateSpan(start, loads, e, member.spans[e], nodeX[e], nodeX[e + 1], 1 / layout.stiffness[e], layout.shearFlexibility[e], pieceCount);
  }
  const pieces = takePieces(pieceCount);
  const loadScale = loadScaleOf(member, layout.length) + settlementScale(member, layout);
  const reactions = reactionsOf(member, layout, d, loadScale);
  const scales = scalesOf(pieces, solved.forceTerms, solved.momentTerms);
  requireFinite(d, layout.size, pieces, reactions, scales);
  requireEquilibrium(member, reactions, loadScale, layout.length);
  return {
    length: layout.length,
    nodeX,
    reactions,
    pieces,
    hasStiffness: member.stiffness !== null,
    loadScale,
    scales,
    displacements: copyOf(d, layout.size),
  };
}

/** The first `size` entries of a (scratch) array, as a fresh list. */
function copyOf(values: Float64Array, size: number): number[] {
  const list = new Array<number>(size);
  for (let i = 0; i < size; i++) list[i] = values[i];
  return list;
}

let rawForce = new Float64Array(8);
let rawMoment = new Float64Array(8);

/**
 * The reactions at every node (from the node sums of the end forces, or the springs), with
 * rounding noise (against the largest reaction of the kind, or 1% of the load scale) set to 0.
 */
function reactionsOf(member: Member, layout: Layout, d: Float64Array, loadScale: number): Reaction[] {
  const { supports } = member;
  const { settlement } = layout;
  const count = supports.length;
  if (rawForce.length < count) {
    rawForce = new Float64Array(Math.max(count, 2 * rawForce.length));
    rawMoment = new Float64Array(rawForce.length);
  }
  let forceScale = 0.01 * loadScale;
  let momentScale = 0.01 * loadScale * layout.length;
  for (let i = 0; i < count; i++) {
    const support = supports[i];
    const rotationDof = layout.rotationRightDof[i];
    // A rotational spring resists the clockwise rotation θ with a counter-clockwise moment kθ.
    const spring = rotationalSpring(support) * (rotationDof >= 0 ? d[rotationDof] : 0);
    let force = 0;
    let moment = 0;
    switch (support.kind) {
      case "pin":
        force = -nodeForce[i];
        moment = spring;
        break;
      case "fixed":
        force = -nodeForce[i];
        moment = -nodeMoment[i];
        break;
      case "spring": {
        const deflectionDof = layout.deflectionDof[i];
        const w = deflectionDof >= 0 ? d[deflectionDof] : 0;
        // The spring pushes on k(w - Δ) when its base settles by Δ.
        force = support.stiffness * (settlement === null ? w : w - settlement[i]);
        moment = spring;
        break;
      }
      case "free":
        moment = spring;
        break;
      default:
        break;
    }
    rawForce[i] = force;
    rawMoment[i] = moment;
    forceScale = Math.max(forceScale, Math.abs(force));
    momentScale = Math.max(momentScale, Math.abs(moment));
  }
  const reactions = new Array<Reaction>(count);
  for (let i = 0; i < count; i++) {
    reactions[i] = { x: layout.nodeX[i], force: cleanZero(rawForce[i], forceScale), moment: cleanZero(rawMoment[i], momentScale) };
  }
  return reactions;
}
