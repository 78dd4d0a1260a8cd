/**
 * The loading sketch: the beam, its supports and hinges, and its loads — point forces and
 * couples with their values, distributed loads drawn to one scale of intensity, settlements as
 * a dashed arrow beside their support. SVG text. Pure.
 */
import type { Load, Member, Support } from "../../core";
import { escapeXml, formatValue } from "./format";
import type { Layout } from "./layout";
import type { Palette } from "./palette";
import { rotationalSpringSvg } from "./rotationalSpring";

export interface SketchUnits {
  force: string;
  intensity: string;
  moment: string;
  /** The length unit, for a settlement (the pane's member holds it in the length unit). */
  length?: string;
}

const f = (n: number): string => (Math.round(n * 10) / 10).toString();

function supportSvg(support: Support, px: number, y: number, end: "left" | "right" | "inner", c: Palette): string {
  const stroke = `stroke="${c.support}" stroke-width="1.5" fill="none"`;
  switch (support.kind) {
    case "pin":
      return `<path class="support pin" d="M${f(px)},${f(y + 2)} l-8,13 h16 z M${f(px - 12)},${f(y + 18)} h24" ${stroke}/>`;
    case "fixed": {
      if (end === "inner") return `<rect class="support fixed" x="${f(px - 7)}" y="${f(y + 2)}" width="14" height="12" ${stroke}/>`;
      const dir = end === "left" ? -1 : 1;
      let hatch = "";
      for (let k = -12; k <= 8; k += 5) hatch += `M${f(px)},${f(y + k)} l${6 * dir},-5 `;
      return `<path class="support fixed" d="M${f(px)},${f(y - 15)} v28 ${hatch}" ${stroke}/>`;
    }
    case "spring":
      return `<path class="support spring" d="M${f(px)},${f(y + 2)} v3 l-6,3 l12,3 l-12,3 l12,3 l-6,3 v3 M${f(px - 10)},${f(y + 23)} h20" ${stroke}/>`;
    case "hinge":
      return `<circle class="support hinge" cx="${f(px)}" cy="${f(y)}" r="4" fill="${c.background}" stroke="${c.beam}" stroke-width="1.5"/>`;
    default:
      return "";
  }
}

function label(x: number, y: number, text: string, c: Palette, anchor = "middle"): string {
  return `<text x="${f(x)}" y="${f(y)}" text-anchor="${anchor}" fill="${c.load}" font-size="10" paint-order="stroke" stroke="${c.background}" stroke-width="3">${escapeXml(text)}</text>`;
}

/** Text alignment that keeps a label near the member's ends inside the drawing. */
function anchorAt(px: number, layout: Layout): "start" | "middle" | "end" {
  const span = layout.right - layout.left;
  return px < layout.left + span * 0.15 ? "start" : px > layout.right - span * 0.15 ? "end" : "middle";
}

function caseSuffix(load: Load): string {
  return load.loadCase ? ` ${load.loadCase}` : "";
}

export function sketchSvg(member: Member, layout: Layout, units: SketchUnits, c: Palette): string {
  const { x } = layout;
  const y = layout.sketch.beamY;
  const length = member.spans.reduce((a, b) => a + b, 0);
  const nodes = [0];
  for (const span of member.spans) nodes.push(nodes[nodes.length - 1] + span);
  const parts: string[] = [];
  parts.push(`<line class="beam" x1="${f(x(0))}" y1="${y}" x2="${f(x(length))}" y2="${y}" stroke="${c.beam}" stroke-width="3"/>`);

  const distributed = member.loads.filter((l) => l.kind === "udl" || l.kind === "linear");
  const peakOf = (l: Load): number => Math.max(Math.abs(l.magnitude), Math.abs(l.magnitudeEnd));
  const totalPeak = distributed.reduce((sum, l) => sum + peakOf(l), 0);
  const room = y - layout.sketch.top - 22;
  const scale = totalPeak > 0 ? Math.min(22 / distributed.reduce((most, l) => Math.max(most, peakOf(l)), 0), (room - 12 * distributed.length - 14) / totalPeak) : 0;
  let base = y - 3;
  for (const load of distributed) {
    const x0 = x(load.xStart);
    const x1 = x(load.xEnd);
    const h0 = load.magnitude * scale;
    const h1 = load.magnitudeEnd * scale;
    const arrows: string[] = [];
    const count = Math.max(2, Math.floor((x1 - x0) / 18));
    for (let i = 0; i <= count; i++) {
      const t = i / count;
      const ax = x0 + (x1 - x0) * t;
      const h = h0 + (h1 - h0) * t;
      if (Math.abs(h) < 3) continue;
      arrows.push(h > 0 ? `M${f(ax)},${f(base - h)} V${f(base)} m-2.5,-4 l2.5,4 l2.5,-4` : `M${f(ax)},${f(base)} V${f(base - h)} m-2.5,4 l2.5,-4 l2.5,4`);
    }
    parts.push(
      `<g class="load distributed" data-kind="${load.kind}" data-w0="${load.magnitude}" data-w1="${load.magnitudeEnd}">` +
        `<path d="M${f(x0)},${f(base)} L${f(x0)},${f(base - h0)} L${f(x1)},${f(base - h1)} L${f(x1)},${f(base)} Z" fill="${c.loadFill}" stroke="${c.load}" stroke-width="1"/>` +
        `<path d="${arrows.join(" ")}" stroke="${c.load}" stroke-width="0.8" fill="none"/>` +
        label(
          x0 + 3,
          base - Math.max(h0, h1, 0) - 3,
          (load.kind === "udl" ? formatValue(load.magnitude) : `${formatValue(load.magnitude)}…${formatValue(load.magnitudeEnd)}`) + (units.intensity ? ` ${units.intensity}` : "") + caseSuffix(load),
          c,
          "start",
        ) +
        `</g>`,
    );
    base -= Math.max(Math.abs(h0), Math.abs(h1)) + 12;
  }

  const points = member.loads.filter((l) => l.kind === "point");
  const maxPoint = points.reduce((most, l) => Math.max(most, Math.abs(l.magnitude)), 0);
  for (const load of points) {
    const px = x(load.xStart);
    const down = load.magnitude >= 0;
    const len = (down ? y - base : 0) + 10 + (maxPoint > 0 ? (16 * Math.abs(load.magnitude)) / maxPoint : 0);
    const path = down ? `M${f(px)},${f(y - 2 - len)} V${f(y - 2)} m-4,-6 l4,6 l4,-6` : `M${f(px)},${f(y + 2 + len)} V${f(y + 2)} m-4,6 l4,-6 l4,6`;
    const ty = down ? y - 5 - len : y + 12 + len;
    parts.push(
      `<g class="load point" data-p="${load.magnitude}"><path d="${path}" stroke="${c.load}" stroke-width="1.8" fill="none"/>` +
        label(px, ty, formatValue(load.magnitude) + (units.force ? ` ${units.force}` : "") + caseSuffix(load), c, anchorAt(px, layout)) +
        `</g>`,
    );
  }

  for (const load of member.loads.filter((l) => l.kind === "moment")) {
    const px = x(load.xStart);
    const r = 11;
    const clockwise = load.magnitude >= 0;
    // An arc over the top from one side to the other; the arrowhead shows the sense.
    const [sx, ex] = clockwise ? [px - r, px + r] : [px + r, px - r];
    const head = clockwise ? `M${f(ex)},${f(y)} l-4,-5 M${f(ex)},${f(y)} l3,-6` : `M${f(ex)},${f(y)} l4,-5 M${f(ex)},${f(y)} l-3,-6`;
    parts.push(
      `<g class="load couple" data-m="${load.magnitude}"><path d="M${f(sx)},${f(y)} A${r},${r} 0 0 ${clockwise ? 1 : 0} ${f(ex)},${f(y)} ${head}" stroke="${c.load}" stroke-width="1.6" fill="none"/>` +
        label(px, y + 30, formatValue(load.magnitude) + (units.moment ? ` ${units.moment}` : "") + caseSuffix(load), c, anchorAt(px, layout)) +
        `</g>`,
    );
  }

  // A settlement: a short arrow below its support, down for a support that sinks.
  for (const load of member.loads.filter((l) => l.kind === "settle")) {
    const px = x(load.xStart) + 14;
    const down = load.magnitude >= 0;
    const path = down ? `M${f(px)},${f(y + 6)} V${f(y + 22)} m-3,-5 l3,5 l3,-5` : `M${f(px)},${f(y + 22)} V${f(y + 6)} m-3,5 l3,-5 l3,5`;
    parts.push(
      `<g class="load settlement" data-d="${load.magnitude}"><path d="${path}" stroke="${c.load}" stroke-width="1.4" fill="none" stroke-dasharray="3,2"/>` +
        label(px + 3, y + 34, `settles ${formatValue(load.magnitude)}` + (units.length ? ` ${units.length}` : "") + caseSuffix(load), c, anchorAt(px, layout)) +
        `</g>`,
    );
  }

  member.supports.forEach((support, i) => {
    const end = i === 0 ? "left" : i === member.supports.length - 1 ? "right" : "inner";
    parts.push(supportSvg(support, x(nodes[i]), y, end, c));
    parts.push(rotationalSpringSvg(support, x(nodes[i]), y, units.moment, c, end));
  });
  return `<g class="sketch">${parts.join("")}</g>`;
}
