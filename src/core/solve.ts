import { isCollapsedPivot, type PivotStats } from "./banded";
import { elementDofs, prescribedDisplacement, rotationalSpring, type Layout } from "./layout";
import { solvePrecise, worstStiffnessRatio } from "./precise";
import type { Member, Piece, Quantity, Reaction, Solution } from "./model";
import { pieceValue } from "./polynomial";
import { cleanZero, EQUILIBRIUM_TOLERANCE } from "./tolerance";
import { endForce, solveRefined, staticsResidual } from "./refine";
import { invalid } from "./errors";
import { integrateSpan } from "./pieces";
import { checkStability } from "./stability";
import { assembleMember, elementMatrix } from "./stiffness";
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

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

/** The sum of the magnitudes of a quantity's terms at the end of a piece: the size its rounding is relative to. */
function termsAtEnd(p: Piece, quantity: Quantity): number {
  const s = p.x1 - p.x0;
  const v = Math.abs(p.shear0);
  const m = Math.abs(p.moment0);
  const q0 = Math.abs(p.q0) * s;
  const q1 = Math.abs(p.q1) * s * s;
  const load = v + q0 + q1;
  if (quantity === "shear") return load;
  if (quantity === "moment") return m + load * s;
  const bending = p.flexibility * s * (m + load * s);
  if (quantity === "slope") return Math.abs(p.slope0) + bending;
  return Math.abs(p.deflection0) + Math.abs(p.slope0) * s + bending * s + p.shearFlexibility * s * load;
}

/**
 * Each quantity's own scale: its largest magnitude on the member (sampled at every piece's
 * ends and middle, within a small factor of the true largest for these low polynomials), but never below 1% of the size of the terms it is computed from, so that a
 * quantity that is zero throughout (to rounding) is not judged against its own noise.
 * cleanZero against this scale zeroes only values below 1e-11 of it.
 */
function scalesOf(pieces: Piece[], answer: StiffnessAnswer): Record<Quantity, number> {
  const scales: Record<Quantity, number> = { shear: 0, moment: 0, slope: 0, deflection: 0 };
  const solveTerms: Record<Quantity, number> = { shear: answer.forceTerms, moment: answer.momentTerms, slope: 0, deflection: 0 };
  for (const quantity of QUANTITIES) {
    let largest = 0;
    let terms = 0;
    // Shear is linear in a piece without a varying load, so its ends hold its largest value.
    const middle = quantity !== "shear";
    for (const p of pieces) {
      const span = p.x1 - p.x0;
      largest = Math.max(largest, Math.abs(pieceValue(p, quantity, 0)), Math.abs(pieceValue(p, quantity, span)));
      if (middle || p.q1 !== 0) largest = Math.max(largest, Math.abs(pieceValue(p, quantity, 0.5 * span)));
      terms = Math.max(terms, termsAtEnd(p, quantity));
    }
    scales[quantity] = Math.max(largest, 0.01 * Math.max(terms, solveTerms[quantity]));
  }
  return scales;
}

/** Reactions with rounding noise (against the largest reaction of the kind, or 1% of the load scale) set to 0. */
function cleanReactions(reactions: Reaction[], loadScale: number, length: number): Reaction[] {
  let force = 0.01 * loadScale;
  let moment = 0.01 * loadScale * length;
  for (const r of reactions) {
    force = Math.max(force, Math.abs(r.force));
    moment = Math.max(moment, Math.abs(r.moment));
  }
  return reactions.map((r) => ({ x: r.x, force: cleanZero(r.force, force), moment: cleanZero(r.moment, moment) }));
}

/** Numbers that overflowed (or underflowed into 0/0) must never reach the sheet. */
function requireFinite(d: Float64Array, pieces: Piece[], reactions: Reaction[], scales: Record<Quantity, number>): void {
  let ok = Object.values(scales).every(Number.isFinite);
  for (const v of d) ok = ok && Number.isFinite(v);
  for (const p of pieces) {
    ok = ok && Number.isFinite(p.shear0) && Number.isFinite(p.moment0) && Number.isFinite(p.slope0) && Number.isFinite(p.deflection0);
    ok = ok && Number.isFinite(p.flexibility);
  }
  for (const r of reactions) ok = ok && Number.isFinite(r.force) && Number.isFinite(r.moment);
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

interface StiffnessAnswer {
  d: Float64Array;
  endForces: number[][];
  /** The largest sums of magnitudes of the terms the end forces and end moments came from: the size of their rounding. */
  forceTerms: number;
  momentTerms: number;
}

/** The double solve, or null when its accuracy is not assured (a pivot lost digits, or the end forces cancel). */
function solveInDouble(member: Member, assembly: ReturnType<typeof assembleMember>): StiffnessAnswer | null {
  const { layout, system, nodalLoads } = assembly;
  const stats: PivotStats = { smallestPivotRatio: 1 };
  let d: Float64Array;
  try {
    d = system.size > 0 ? solveRefined(system, stats) : new Float64Array(0);
  } catch (error) {
    if (isCollapsedPivot(error)) return null;
    throw error;
  }
  if (stats.smallestPivotRatio < PIVOT_RATIO_FOR_DOUBLE) return null;
  const endForces: number[][] = [];
  let forceTerms = 0;
  let momentTerms = 0;
  let momentTermsRaw = 0;
  let forces = 0;
  let moments = 0;
  for (let e = 0; e < member.spans.length; e++) {
    const k = elementMatrix(layout.stiffness[e], member.spans[e], layout.shearFlexibility[e]);
    const local = elementDofs(layout, e).map((dof, r) => (dof >= 0 ? d[dof] : prescribedDisplacement(layout, e, r)));
    const end = [0, 0, 0, 0];
    for (let r = 0; r < 4; r++) {
      end[r] = endForce(k, r, local, nodalLoads[e][r]);
      let terms = Math.abs(nodalLoads[e][r]);
      for (let c = 0; c < 4; c++) terms += Math.abs(k[r * 4 + c] * local[c]);
      if (r % 2 === 0) {
        forceTerms = Math.max(forceTerms, terms);
        forces = Math.max(forces, Math.abs(end[r]));
      } else {
        momentTerms = Math.max(momentTerms, terms / member.spans[e]);
        momentTermsRaw = Math.max(momentTermsRaw, terms);
        moments = Math.max(moments, Math.abs(end[r]) / member.spans[e]);
      }
    }
    endForces.push(end);
  }
  const scale = Math.max(forces, moments);
  if (forceTerms > CANCELLATION_FOR_DOUBLE * scale || momentTerms > CANCELLATION_FOR_DOUBLE * scale) return null;
  return { d, endForces, forceTerms, momentTerms: momentTermsRaw };
}

/** The double-double solve; its results are rounded once, so their rounding is relative to themselves. */
function preciseAnswer(member: Member, assembly: ReturnType<typeof assembleMember>): StiffnessAnswer {
  const precise = solvePrecise(member, assembly.layout, assembly.spanLoads, assembly.system.halfBandwidth);
  return { d: precise.displacements, endForces: precise.endForces, forceTerms: 0, momentTerms: 0 };
}

/**
 * Solves a member exactly: validates it, checks it cannot move as a mechanism, assembles
 * the banded stiffness system with exact equivalent nodal loads, solves it, and integrates
 * every span from its solved end forces into exact polynomial pieces. The solve runs in
 * double precision when that is assured to be accurate (no pivot lost more than six digits,
 * no end force cancels out of much larger terms), otherwise in double-double (precise.ts).
 * Throws a #VALUE! SpanError for bad input or an unstable member.
 */
export function solve(member: Member): Solution {
  validateMember(member);
  checkStability(member);
  const assembly = assembleMember(member);
  const { layout, spanLoads } = assembly;
  const answer = solveInDouble(member, assembly) ?? preciseAnswer(member, assembly);
  const d = answer.d;
  const value = (dof: number): number => (dof >= 0 ? d[dof] : 0);
  const nodeCount = layout.nodeX.length;
  const nodeForce = new Array<number>(nodeCount).fill(0);
  const nodeMoment = new Array<number>(nodeCount).fill(0);
  const pieces: Piece[] = [];
  for (let e = 0; e < member.spans.length; e++) {
    const span = member.spans[e];
    const ei = layout.stiffness[e];
    const dofs = elementDofs(layout, e);
    const end = answer.endForces[e];
    nodeForce[e] += end[0];
    nodeMoment[e] += end[1];
    nodeForce[e + 1] += end[2];
    nodeMoment[e + 1] += end[3];
    const deflection = dofs[0] >= 0 ? d[dofs[0]] : prescribedDisplacement(layout, e, 0);
    const start = { shear: -end[0], moment: end[1], slope: value(dofs[1]), deflection };
    integrateSpan(start, spanLoads[e], span, layout.nodeX[e], layout.nodeX[e + 1], 1 / ei, pieces, layout.shearFlexibility[e]);
  }
  const settlement = layout.settlement;
  const raw: Reaction[] = member.supports.map((support, i) => {
    const x = layout.nodeX[i];
    // A rotational spring resists the clockwise rotation θ with a counter-clockwise moment kθ.
    const moment = rotationalSpring(support) * value(layout.rotationRightDof[i]);
    switch (support.kind) {
      case "pin":
        return { x, force: -nodeForce[i], moment };
      case "fixed":
        return { x, force: -nodeForce[i], moment: -nodeMoment[i] };
      case "spring":
        return { x, force: support.stiffness * (value(layout.deflectionDof[i]) - (settlement === null ? 0 : settlement[i])), moment };
      case "free":
        return { x, force: 0, moment };
      default:
        return { x, force: 0, moment: 0 };
    }
  });
  const loadScale = loadScaleOf(member, layout.length) + settlementScale(member, layout);
  const reactions = cleanReactions(raw, loadScale, layout.length);
  const scales = scalesOf(pieces, answer);
  requireFinite(d, pieces, reactions, scales);
  requireEquilibrium(member, reactions, loadScale, layout.length);
  return {
    length: layout.length,
    nodeX: layout.nodeX,
    reactions,
    pieces,
    hasStiffness: member.stiffness !== null,
    loadScale,
    scales,
    displacements: Array.from(d),
  };
}
