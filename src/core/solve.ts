import { elementDofs } from "./layout";
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
    else {
      const end = load.kind === "linear" ? load.magnitudeEnd : load.magnitude;
      scale += ((Math.abs(load.magnitude) + Math.abs(end)) / 2) * (load.xEnd - load.xStart);
    }
  }
  return scale;
}

/**
 * Physical scales of each quantity (the total load and reactions over the longest span),
 * never smaller than the values at the piece ends: rounding noise is judged against them.
 */
function scalesOf(pieces: Piece[], spans: number[], force: number): Record<Quantity, number> {
  const longest = spans.reduce((a, b) => Math.max(a, b), 0);
  let flexibility = 0;
  for (const p of pieces) flexibility = Math.max(flexibility, p.flexibility);
  const scales: Record<Quantity, number> = {
    shear: force,
    moment: force * longest,
    slope: force * longest * longest * flexibility,
    deflection: force * longest * longest * longest * flexibility,
  };
  for (const quantity of Object.keys(scales) as Quantity[]) {
    let largest = scales[quantity];
    for (const p of pieces) {
      largest = Math.max(largest, Math.abs(pieceValue(p, quantity, 0)), Math.abs(pieceValue(p, quantity, p.x1 - p.x0)));
    }
    scales[quantity] = largest;
  }
  return scales;
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
    "the reactions do not balance the loads to rounding (extreme ratios of span, EI or spring stiffness make the stiffness system ill-conditioned); results would not be trustworthy",
  );
}

/**
 * Solves a member exactly: validates it, checks it cannot move as a mechanism, assembles
 * the banded stiffness system with exact equivalent nodal loads, solves it, and integrates
 * every span from its solved end forces into exact polynomial pieces.
 * Throws a #VALUE! SpanError for bad input or an unstable member.
 */
export function solve(member: Member): Solution {
  validateMember(member);
  checkStability(member);
  const { layout, system, spanLoads, nodalLoads } = assembleMember(member);
  const d = system.size > 0 ? solveRefined(system) : new Float64Array(0);
  const value = (dof: number): number => (dof >= 0 ? d[dof] : 0);
  const nodeCount = layout.nodeX.length;
  const nodeForce = new Array<number>(nodeCount).fill(0);
  const nodeMoment = new Array<number>(nodeCount).fill(0);
  const pieces: Piece[] = [];
  for (let e = 0; e < member.spans.length; e++) {
    const span = member.spans[e];
    const ei = layout.stiffness[e];
    const k = elementMatrix(ei, span);
    const dofs = elementDofs(layout, e);
    const local = dofs.map(value);
    const end = [0, 0, 0, 0];
    for (let r = 0; r < 4; r++) end[r] = endForce(k, r, local, nodalLoads[e][r]);
    nodeForce[e] += end[0];
    nodeMoment[e] += end[1];
    nodeForce[e + 1] += end[2];
    nodeMoment[e + 1] += end[3];
    const start = { shear: -end[0], moment: end[1], slope: local[1], deflection: local[0] };
    integrateSpan(start, spanLoads[e], span, layout.nodeX[e], 1 / ei, pieces);
  }
  const loadScale = loadScaleOf(member, layout.length);
  const forceScale = loadScale;
  const momentScale = loadScale * layout.length;
  const reactions: Reaction[] = member.supports.map((support, i) => {
    const x = layout.nodeX[i];
    switch (support.kind) {
      case "pin":
        return { x, force: cleanZero(-nodeForce[i], forceScale), moment: 0 };
      case "fixed":
        return { x, force: cleanZero(-nodeForce[i], forceScale), moment: cleanZero(-nodeMoment[i], momentScale) };
      case "spring":
        return { x, force: support.stiffness * value(layout.deflectionDof[i]), moment: 0 };
      default:
        return { x, force: 0, moment: 0 };
    }
  });
  const scales = scalesOf(pieces, member.spans, loadScale + reactions.reduce((sum, r) => sum + Math.abs(r.force), 0));
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
