/**
 * Statics along a member, written from the sign conventions alone (src/core/model.ts): the load
 * intensity at x, and shear and moment from the equilibrium of the part left of x, integrating
 * each distributed load over its own (smooth) extent by Simpson's rule (quadrature.ts).
 */
import type { Load, Member, Reaction } from "../../../src/core";
import { integrate } from "./quadrature";

/** Load intensity of a distributed load at x (0 outside it). */
export function intensity(load: Load, x: number): number {
  if (load.kind === "point" || load.kind === "moment" || x < load.xStart || x > load.xEnd) return 0;
  const end = load.kind === "udl" ? load.magnitude : load.magnitudeEnd;
  return load.magnitude + ((end - load.magnitude) * (x - load.xStart)) / (load.xEnd - load.xStart);
}

/**
 * Shear and moment just right of x (just left at the member end) by statics of the part to
 * the left of x: reactions and point loads at or left of x, couples, and the integral of the
 * distributed load. Reaction moments are counter-clockwise +, so they enter M with a minus.
 */
export function statics(member: Member, reactions: Reaction[], x: number, atEnd: boolean): { shear: number; moment: number } {
  const left = (p: number) => (atEnd ? p < x : p <= x);
  let shear = 0;
  let moment = 0;
  for (const r of reactions) {
    if (!left(r.x)) continue;
    shear += r.force;
    moment += r.force * (x - r.x) - r.moment;
  }
  for (const load of member.loads) {
    if (load.kind === "point" && left(load.xStart)) {
      shear -= load.magnitude;
      moment -= load.magnitude * (x - load.xStart);
    } else if (load.kind === "moment" && left(load.xStart)) {
      moment += load.magnitude;
    } else if (load.kind === "udl" || load.kind === "linear") {
      const end = Math.min(x, load.xEnd);
      shear -= integrate((s) => intensity(load, s), load.xStart, end);
      moment -= integrate((s) => intensity(load, s) * (x - s), load.xStart, end);
    }
  }
  return { shear, moment };
}
