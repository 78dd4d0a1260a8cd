import { invalid } from "./errors";
import type { Load, Member } from "./model";
import { isOnMember, memberLength, nodeIndexAt, nodePositions, positionTolerance, shownLength } from "./positions";

export { memberLength };

/**
 * Most loads one member may carry. No real member has more; the limit keeps every call at the
 * member limits within the 200 ms the README's limits section promises (tests/bench/limits.bench.ts:
 * 1,000 spans and 5,000 loads read and solve in about 70 ms, 1 span and 10,000 loads took 115 ms)
 * and turns pasted garbage into a clear error instead of a long wait.
 */
export const MAX_LOADS = 5000;

/** The load kinds (comparisons, not a set lookup: checked for every load of every solve). */
function isLoadKind(kind: unknown): boolean {
  return kind === "point" || kind === "udl" || kind === "moment" || kind === "linear" || kind === "settle";
}

function isSupportKind(kind: unknown): boolean {
  return kind === "pin" || kind === "fixed" || kind === "free" || kind === "hinge" || kind === "spring";
}

function isFiniteNumber(value: unknown): value is number {
  return typeof value === "number" && Number.isFinite(value);
}

function show(value: unknown): string {
  return typeof value === "number" ? String(value) : JSON.stringify(value);
}

function validateSpans(spans: number[]): void {
  if (!Array.isArray(spans) || spans.length === 0) throw invalid("spans: give at least one span length");
  for (let i = 0; i < spans.length; i++) {
    const span = spans[i];
    if (!isFiniteNumber(span) || span <= 0) {
      throw invalid(`span ${i + 1}: length must be a positive number, got ${show(span)}`);
    }
  }
}

/** Names support i in a message: "support 2 (x = 6)" (only a message needs the node's position). */
function supportPlace(spans: number[], i: number, length: number): string {
  return `support ${i + 1} (x = ${shownLength(nodePositions(spans)[i] ?? length)})`;
}

function validateSupports(member: Member, length: number): void {
  const { spans, supports } = member;
  if (!Array.isArray(supports) || supports.length !== spans.length + 1) {
    const count = Array.isArray(supports) ? supports.length : 0;
    throw invalid(`supports: need ${spans.length + 1} entries (one per node, spans + 1), got ${count}`);
  }
  for (let i = 0; i < supports.length; i++) {
    const support = supports[i];
    if (!support || !isSupportKind(support.kind)) {
      throw invalid(`${supportPlace(spans, i, length)}: unknown support ${show(support && support.kind)}; use pin, fixed, free, hinge or a spring stiffness`);
    }
    if (support.kind === "spring") {
      if (!isFiniteNumber(support.stiffness) || support.stiffness <= 0) {
        throw invalid(`${supportPlace(spans, i, length)}: spring stiffness must be a positive number, got ${show(support.stiffness)}`);
      }
      if (member.stiffness === null) {
        throw invalid(`${supportPlace(spans, i, length)}: a spring support needs EI, since the result depends on EI relative to the spring`);
      }
    }
    const rotational: unknown = (support as { rotational?: unknown }).rotational;
    if (rotational !== undefined) {
      if (support.kind === "fixed" || support.kind === "hinge") {
        throw invalid(`${supportPlace(spans, i, length)}: a rotational spring belongs with pin, free or a vertical spring, not with ${support.kind}`);
      }
      if (!isFiniteNumber(rotational) || rotational < 0) {
        throw invalid(`${supportPlace(spans, i, length)}: rotational spring stiffness must be a positive number (moment per radian), got ${show(rotational)}`);
      }
      if (member.stiffness === null && rotational > 0) {
        throw invalid(`${supportPlace(spans, i, length)}: a rotational spring needs EI, since the result depends on EI relative to the spring`);
      }
    }
    if (support.kind === "hinge" && (i === 0 || i === spans.length)) {
      throw invalid(`${supportPlace(spans, i, length)}: a hinge joins two spans, so it belongs at an interior node, not at a member end`);
    }
  }
}

function validateStiffness(member: Member): void {
  const { stiffness, spans } = member;
  if (stiffness === null) return;
  if (!Array.isArray(stiffness) || (stiffness.length !== spans.length && stiffness.length !== 1)) {
    throw invalid(`EI: give one value for the member or one per span (${spans.length}), got ${Array.isArray(stiffness) ? stiffness.length : 0}`);
  }
  for (let i = 0; i < stiffness.length; i++) {
    const ei = stiffness[i];
    if (!isFiniteNumber(ei) || ei <= 0) throw invalid(`EI of span ${i + 1}: must be a positive number, got ${show(ei)}`);
    if (!Number.isFinite(1 / ei)) throw invalid(`EI of span ${i + 1}: ${show(ei)} is too small to compute with; check its units`);
  }
}

/** The common case, checked without building any message. */
function isPlainLoad(load: Load, length: number): boolean {
  if (!isLoadKind(load.kind) || !isFiniteNumber(load.magnitude) || !isFiniteNumber(load.xStart)) return false;
  if (!isOnMember(load.xStart, length)) return false;
  if (load.kind === "point" || load.kind === "moment") return true;
  if (load.kind === "settle") return false;
  if (!isFiniteNumber(load.xEnd) || !isOnMember(load.xEnd, length) || load.xEnd <= load.xStart) return false;
  return load.kind !== "linear" || isFiniteNumber(load.magnitudeEnd);
}

function validateLoad(load: Load, length: number): void {
  if (isPlainLoad(load, length)) return;
  const where = `load row ${load.row}`;
  const tol = positionTolerance(length);
  if (!isLoadKind(load.kind)) {
    throw invalid(`${where}: unknown load type ${show(load.kind)}; use point, moment, udl, linear or settle`);
  }
  if (!isFiniteNumber(load.magnitude)) throw invalid(`${where}: magnitude must be a finite number, got ${show(load.magnitude)}`);
  if (!isFiniteNumber(load.xStart)) throw invalid(`${where}: x start must be a finite number, got ${show(load.xStart)}`);
  if (load.xStart < -tol) throw invalid(`${where}: x start ${load.xStart} is before the member start 0`);
  if (load.xStart > length + tol) throw invalid(`${where}: x start ${load.xStart} is beyond the member end ${shownLength(length)}`);
  if (load.kind === "point" || load.kind === "moment" || load.kind === "settle") return;
  if (!isFiniteNumber(load.xEnd)) throw invalid(`${where}: x end must be a finite number, got ${show(load.xEnd)}`);
  if (load.xEnd > length + tol) throw invalid(`${where}: x end ${load.xEnd} is beyond the member end ${shownLength(length)}`);
  if (load.xEnd <= load.xStart) throw invalid(`${where}: x end ${load.xEnd} is not beyond x start ${load.xStart}`);
  if (load.kind === "linear" && !isFiniteNumber(load.magnitudeEnd)) {
    throw invalid(`${where}: magnitude at end must be a finite number, got ${show(load.magnitudeEnd)}`);
  }
}

/**
 * A settlement is the prescribed deflection of a node that is restrained vertically (pin,
 * fixed, or a spring, whose base settles), and its forces depend on the real EI.
 */
function validateSettlements(member: Member): void {
  const nodeX = nodePositions(member.spans);
  for (const load of member.loads) {
    if (load.kind !== "settle") continue;
    const where = `load row ${load.row}`;
    const node = nodeIndexAt(nodeX, load.xStart);
    if (node < 0) {
      throw invalid(`${where}: a settlement belongs at a support node; x = ${+load.xStart.toPrecision(12)} is not a node (nodes are at the span ends)`);
    }
    const kind = member.supports[node].kind;
    if (kind !== "pin" && kind !== "fixed" && kind !== "spring") {
      throw invalid(`${where}: the node at x = ${+nodeX[node].toPrecision(12)} is ${kind}, with no vertical restraint to settle; a settlement belongs at a pin, fixed or spring support`);
    }
    if (member.stiffness === null) {
      throw invalid(`${where}: the forces from a settlement depend on the real EI (without EI the member is taken as uniform); give EI`);
    }
  }
}

function validateShear(member: Member): void {
  const { shear, spans } = member;
  if (shear === undefined || shear === null) return;
  if (!Array.isArray(shear) || (shear.length !== spans.length && shear.length !== 1)) {
    throw invalid(`EI: give the shear stiffness once for the member or once per span (${spans.length}), got ${Array.isArray(shear) ? shear.length : 0}`);
  }
  shear.forEach((ga, i) => {
    if (ga === null) return;
    const where = shear.length === 1 ? "shear stiffness of the member" : `shear stiffness of span ${i + 1}`;
    if (!isFiniteNumber(ga) || ga <= 0) throw invalid(`${where}: GA must be a positive number (force units), got ${show(ga)}`);
    if (!Number.isFinite(1 / ga)) throw invalid(`${where}: ${show(ga)} is too small to compute with; check its units`);
    if (member.stiffness === null) throw invalid(`${where}: shear deformation needs EI, since the result depends on EI relative to GA`);
  });
}

/** A couple exactly at a hinge has no side to act on: the user must say which. */
function rejectCouplesOnHinges(member: Member): void {
  let hinges = false;
  for (let i = 0; i < member.supports.length; i++) hinges = hinges || member.supports[i].kind === "hinge";
  if (!hinges) return;
  const nodeX = nodePositions(member.spans);
  for (const load of member.loads) {
    if (load.kind !== "moment") continue;
    const node = nodeIndexAt(nodeX, load.xStart);
    const at = node >= 0 && member.supports[node].kind === "hinge" ? nodeX[node] : undefined;
    if (at !== undefined) {
      throw invalid(`load row ${load.row}: a couple exactly at the hinge at x = ${+at.toPrecision(12)} has no side to act on; place it just left or just right of the hinge`);
    }
  }
}

/**
 * Checks a member's data: positive finite spans, one support per node, known support kinds,
 * positive springs (which need EI), hinges only between spans, EI once or per span, a
 * positive shear stiffness (which needs EI), loads that lie on the member, and settlements
 * only at vertically restrained nodes of a member with EI. Throws a #VALUE! SpanError naming the offending item.
 */
export function validateMember(member: Member): void {
  validateSpans(member.spans);
  const length = memberLength(member.spans);
  validateStiffness(member);
  validateSupports(member, length);
  if (!Array.isArray(member.loads)) throw invalid("loads: expected a list of loads");
  if (member.loads.length > MAX_LOADS) {
    throw invalid(`loads: at most ${MAX_LOADS} loads on one member, got ${member.loads.length} (combine loads that act together)`);
  }
  let settles = false;
  for (let i = 0; i < member.loads.length; i++) {
    const load = member.loads[i];
    validateLoad(load, length);
    if (load.kind === "settle") settles = true;
  }
  rejectCouplesOnHinges(member);
  validateShear(member);
  if (settles) validateSettlements(member);
}
