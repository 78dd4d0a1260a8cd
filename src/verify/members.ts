/**
 * Builders for the core suite: members and loads written the way an engineer reads them.
 * `beam(spans, supports, loads, EI)` is the short positional form; `member({ ... })` the
 * keyword form whose supports default to a pin at every node. Load rows are numbered 1, 2, ...
 * in the order the loads are given, unless set.
 */
import { minOf } from "../core";
import type { Load, Member, Support } from "../core";

export type SupportWord = "pin" | "fixed" | "free" | "hinge" | number;

export function supportOf(word: SupportWord): Support {
  return typeof word === "number" ? { kind: "spring", stiffness: word } : { kind: word };
}

type LoadSpec = Omit<Load, "row" | "loadCase"> & { row?: number; loadCase?: string };

function load(spec: LoadSpec): Load {
  return { loadCase: "", row: 0, ...spec };
}

/** Downward point force P at x. */
export const point = (P: number, x: number, loadCase = ""): Load =>
  load({ kind: "point", magnitude: P, xStart: x, xEnd: x, magnitudeEnd: P, loadCase });

/** Clockwise couple C at x. */
export const couple = (C: number, x: number, loadCase = ""): Load =>
  load({ kind: "moment", magnitude: C, xStart: x, xEnd: x, magnitudeEnd: C, loadCase });

/** Uniform downward intensity w from a to b. */
export const udl = (w: number, a: number, b: number, loadCase = ""): Load =>
  load({ kind: "udl", magnitude: w, xStart: a, xEnd: b, magnitudeEnd: w, loadCase });

/** Linearly varying downward intensity, w0 at a to w1 at b. */
export const linear = (w0: number, w1: number, a: number, b: number, loadCase = ""): Load =>
  load({ kind: "linear", magnitude: w0, xStart: a, xEnd: b, magnitudeEnd: w1, loadCase });

/** A member from spans, support words (one per node), loads and EI (one value, one per span, or none). */
export function beam(spans: number[], supports: SupportWord[], loads: Load[], EI: number | number[] | null = null): Member {
  const stiffness = EI === null ? null : Array.isArray(EI) ? EI.slice() : spans.map(() => EI);
  return {
    spans: spans.slice(),
    supports: supports.map(supportOf),
    stiffness,
    loads: loads.map((l, i) => ({ ...l, row: l.row || i + 1 })),
  };
}

export interface MemberSpec {
  spans: number[];
  supports?: SupportWord[];
  EI?: number | number[] | null;
  loads?: Load[];
}

/** Keyword form of `beam`: supports default to a pin at every node, EI to none. */
export function member(spec: MemberSpec): Member {
  const supports = spec.supports ?? spec.spans.concat([0]).map(() => "pin" as const);
  return beam(spec.spans, supports, spec.loads ?? [], spec.EI ?? null);
}

export const lengthOf = (m: Member): number => m.spans.reduce((s, v) => s + v, 0);

export function nodesOf(m: Member): number[] {
  const xs = [0];
  for (const s of m.spans) xs.push(xs[xs.length - 1] + s);
  return xs;
}

export interface Scales {
  force: number;
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}

/** Force (= shear), moment, slope and deflection scales from the data alone (never from a solution). */
export function scalesOf(m: Member): Scales {
  const L = lengthOf(m);
  let force = 0;
  for (const l of m.loads) {
    if (l.kind === "point") force += Math.abs(l.magnitude);
    else if (l.kind === "moment") force += Math.abs(l.magnitude) / L;
    else force += ((Math.abs(l.magnitude) + Math.abs(l.magnitudeEnd)) / 2) * (l.xEnd - l.xStart);
  }
  const ei = m.stiffness ? minOf(m.stiffness) : 1;
  const springs = m.supports.flatMap((s) => (s.kind === "spring" ? [s.stiffness] : []));
  const soft = springs.length ? force / minOf(springs) : 0;
  return { force, shear: force, moment: force * L, slope: (force * L * L) / ei + soft / L, deflection: (force * L ** 3) / ei + soft };
}

/** Mirror image about the member's centre: x -> L - x, couples change sense. */
export function mirror(m: Member): Member {
  const L = lengthOf(m);
  return {
    spans: m.spans.slice().reverse(),
    supports: m.supports.slice().reverse(),
    stiffness: m.stiffness ? m.stiffness.slice().reverse() : null,
    loads: m.loads.map((l) => {
      if (l.kind === "point") return { ...l, xStart: L - l.xStart, xEnd: L - l.xStart };
      if (l.kind === "moment") return { ...l, magnitude: -l.magnitude, magnitudeEnd: -l.magnitude, xStart: L - l.xStart, xEnd: L - l.xStart };
      const end = l.kind === "udl" ? l.magnitude : l.magnitudeEnd;
      return { ...l, xStart: L - l.xEnd, xEnd: L - l.xStart, magnitude: end, magnitudeEnd: l.magnitude };
    }),
  };
}
