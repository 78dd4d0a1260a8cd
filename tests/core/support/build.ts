/**
 * Small builders for core test members: plain model data, written the way an engineer reads it.
 */
import type { Load, Member, Support } from "../../../src/core/model";

export type SupportWord = "pin" | "fixed" | "free" | "hinge" | number;

export function support(word: SupportWord): Support {
  return typeof word === "number" ? { kind: "spring", stiffness: word } : { kind: word };
}

let nextRow = 1;

function load(partial: Omit<Load, "row" | "loadCase"> & { loadCase?: string }): Load {
  return { loadCase: "", row: nextRow++, ...partial };
}

/** Downward point force P at x. */
export function point(magnitude: number, x: number, loadCase = ""): Load {
  return load({ kind: "point", magnitude, xStart: x, xEnd: x, magnitudeEnd: 0, loadCase });
}

/** Clockwise couple C at x. */
export function couple(magnitude: number, x: number, loadCase = ""): Load {
  return load({ kind: "moment", magnitude, xStart: x, xEnd: x, magnitudeEnd: 0, loadCase });
}

/** Uniform downward intensity w from a to b. */
export function udl(magnitude: number, a: number, b: number, loadCase = ""): Load {
  return load({ kind: "udl", magnitude, xStart: a, xEnd: b, magnitudeEnd: magnitude, loadCase });
}

/** Linearly varying downward intensity, w0 at a to w1 at b. */
export function linear(w0: number, a: number, w1: number, b: number, loadCase = ""): Load {
  return load({ kind: "linear", magnitude: w0, xStart: a, xEnd: b, magnitudeEnd: w1, loadCase });
}

export interface MemberSpec {
  spans: number[];
  supports?: SupportWord[];
  EI?: number | number[] | null;
  loads?: Load[];
}

/** A member; supports default to pin everywhere, EI to none. */
export function member(spec: MemberSpec): Member {
  const supports = (spec.supports ?? spec.spans.concat([0]).map(() => "pin" as const)).map(support);
  const ei = spec.EI ?? null;
  const stiffness = ei === null ? null : Array.isArray(ei) ? ei.slice() : spec.spans.map(() => ei);
  return { spans: spec.spans.slice(), supports, stiffness, loads: (spec.loads ?? []).map((l) => ({ ...l })) };
}

export function memberLength(m: Member): number {
  return m.spans.reduce((s, v) => s + v, 0);
}

/** Rough scales of force, moment, slope and deflection for tolerances, from the loads alone. */
export function scales(m: Member): { force: number; shear: number; moment: number; slope: number; deflection: number } {
  const length = memberLength(m);
  let force = 0;
  for (const l of m.loads) {
    if (l.kind === "point") force += Math.abs(l.magnitude);
    else if (l.kind === "moment") force += Math.abs(l.magnitude) / length;
    else force += ((Math.abs(l.magnitude) + Math.abs(l.magnitudeEnd)) / 2) * (l.xEnd - l.xStart);
  }
  const ei = m.stiffness ? Math.min(...m.stiffness) : 1;
  const springs = m.supports.flatMap((s) => (s.kind === "spring" ? [s.stiffness] : []));
  const softest = springs.length ? Math.min(...springs) : Infinity;
  const moment = force * length;
  const deflection = (force * length ** 3) / ei + force / softest;
  const slope = (force * length ** 2) / ei + force / softest / length;
  return { force, shear: force, moment, slope, deflection };
}
