/**
 * Drawings of study cells, on the same layout, sketch and x axis as the member diagrams:
 * the envelope's upper and lower curves per quantity (PEAKS cells also label their governing
 * peaks), an influence line, and a moving load's extremes with the train placed on the member.
 * SVG text. Pure.
 */
import { maxOf, minOf } from "../../core";
import type { Member } from "../../core";
import type { EnvelopeCurve, MovingPlacement, PeakRow } from "../study";
import { axisSvg } from "./diagramSvg";
import { escapeXml, formatValue } from "./format";
import { layoutFor, type Layout, type PanelBox, type PanelQuantity } from "./layout";
import { palette, type Palette, type Theme } from "./palette";
import { invert, panelFrame, type PanelSpec } from "./panel";
import { peakLabels, type PanelFrame } from "./peaks";
import { areaTo, linearScale, polyline } from "./scale";
import { sketchSvg } from "./sketch";

export interface Figure {
  svg: string;
  layout: Layout;
  /** Each panel's frame, for tests and the pointer. */
  panels: { quantity: PanelQuantity; frame: PanelFrame }[];
}

const r1 = (n: number): number => Math.round(n * 10) / 10;
const NO_UNITS = { force: "", intensity: "", moment: "" };

function colours(quantity: PanelQuantity, c: Palette): { line: string; fill: string } {
  switch (quantity) {
    case "shear":
      return { line: c.shear, fill: c.shearFill };
    case "deflection":
      return { line: c.deflection, fill: c.deflectionFill };
    default:
      return { line: c.moment, fill: c.momentFill };
  }
}

function frameFor(box: PanelBox, layout: Layout, lo: number, hi: number): PanelFrame {
  const spec = { box, downward: box.quantity === "deflection" } as PanelSpec;
  return panelFrame(spec, layout, { max: hi, xMax: 0, min: lo, xMin: 0 });
}

export function ticksSvg(frame: PanelFrame, layout: Layout, c: Palette): string {
  const scale = linearScale([invert(frame, frame.bottom), invert(frame, frame.top)], [0, 1]);
  return scale
    .ticks(4)
    .filter((t) => frame.yPixel(t) >= frame.top + 4 && frame.yPixel(t) <= frame.bottom + 0.5)
    .map((t) => {
      const py = r1(frame.yPixel(t));
      return `<line x1="${layout.left}" x2="${layout.right}" y1="${py}" y2="${py}" stroke="${c.grid}" stroke-width="1"/><text x="${layout.left - 5}" y="${py + 3}" text-anchor="end" fill="${c.muted}" font-size="9.5">${escapeXml(formatValue(t))}</text>`;
    })
    .join("");
}

export function panelStart(box: PanelBox, layout: Layout, title: string, c: Palette): string {
  return `<g class="panel" data-quantity="${box.quantity}"><text class="panel-title" x="${layout.left}" y="${box.top + 6}" fill="${c.ink}" font-size="11" font-weight="600">${escapeXml(title)}</text>`;
}

export function zeroSvg(frame: PanelFrame, layout: Layout, c: Palette): string {
  return `<line class="zero" x1="${layout.left}" x2="${layout.right}" y1="${r1(frame.zeroY)}" y2="${r1(frame.zeroY)}" stroke="${c.zero}" stroke-width="1"/>`;
}

export function subtitleSvg(layout: Layout, text: string, c: Palette): string {
  return `<text class="subtitle" x="${layout.left}" y="12" fill="${c.muted}" font-size="10">${escapeXml(text)}</text>`;
}

export function svgDocument(layout: Layout, theme: Theme, c: Palette, kind: string, body: string): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" class="spanwise-diagram" data-kind="${kind}" width="${layout.width}" height="${layout.height}" viewBox="0 0 ${layout.width} ${layout.height}" font-family="system-ui, sans-serif" data-theme="${theme}">` +
    `<rect width="100%" height="100%" fill="${c.background}"/>` +
    body +
    `<g class="cursor" visibility="hidden"><line class="cursor-line" y1="${layout.sketch.top}" y2="${layout.axisY}" stroke="${c.cursor}" stroke-width="1"/></g>` +
    `</svg>`
  );
}

const ENVELOPE_TITLES: Record<string, string> = {
  shear: "Shear V envelope",
  moment: "Moment M envelope, sagging +",
  deflection: "Deflection envelope, down +",
};

export interface EnvelopeInput {
  member: Member;
  curves: EnvelopeCurve[];
  /** PEAKS cells: the governing peaks the cell computes, labelled on the curves. */
  peaks?: PeakRow[];
  theme: Theme;
  width: number;
  subtitle: string;
}

/** Upper and lower curves of each quantity, the band between them shaded. */
export function drawEnvelope(input: EnvelopeInput): Figure {
  const c = palette(input.theme);
  const length = input.member.spans.reduce((a, b) => a + b, 0);
  const layout = layoutFor(input.width, length, input.curves.map((curve) => curve.quantity));
  const parts: string[] = [subtitleSvg(layout, input.subtitle, c), sketchSvg(input.member, layout, NO_UNITS, c)];
  const panels: Figure["panels"] = [];
  input.curves.forEach((curve, i) => {
    const box = layout.panels[i];
    const lo = minOf(curve.min);
    const hi = maxOf(curve.max);
    const frame = frameFor(box, layout, lo, hi);
    panels.push({ quantity: box.quantity, frame });
    const { line, fill } = colours(box.quantity, c);
    const xs = curve.xs.map((x) => layout.x(x));
    const up = curve.max.map((v) => frame.yPixel(v));
    const down = curve.min.map((v) => frame.yPixel(v));
    const band = polyline([...xs, ...[...xs].reverse()], [...up, ...[...down].reverse()]) + "Z";
    let labels = "";
    const peak = input.peaks?.find((p) => p.quantity === curve.quantity);
    if (peak) {
      const tiny = 1e-9 * Math.max(Math.abs(peak.max), Math.abs(peak.min));
      labels = peakLabels(peak, frame, { value: "", x: "" }, tiny)
        .map((label) => {
          const by = label.kind === "max" ? peak.maxBy : peak.minBy;
          return (
            `<g class="peak ${label.kind}" data-quantity="${curve.quantity}" data-kind="${label.kind}" data-value="${label.value}" data-x="${label.x}" data-by="${escapeXml(by)}">` +
            `<title>${escapeXml(`${label.text}, governed by ${by}`)}</title>` +
            `<circle cx="${r1(label.px)}" cy="${r1(label.py)}" r="3" fill="${line}"/>` +
            `<text x="${r1(label.tx)}" y="${r1(label.ty)}" text-anchor="${label.anchor}" fill="${c.ink}" font-size="10" paint-order="stroke" stroke="${c.background}" stroke-width="3">${escapeXml(label.text)}</text></g>`
          );
        })
        .join("");
    }
    parts.push(
      panelStart(box, layout, ENVELOPE_TITLES[curve.quantity], c) +
        ticksSvg(frame, layout, c) +
        `<path class="band" d="${band}" fill="${fill}" stroke="none"/>` +
        zeroSvg(frame, layout, c) +
        `<path class="curve upper" d="${polyline(xs, up)}" fill="none" stroke="${line}" stroke-width="1.8" stroke-linejoin="round"/>` +
        `<path class="curve lower" d="${polyline(xs, down)}" fill="none" stroke="${line}" stroke-width="1.8" stroke-dasharray="5 3" stroke-linejoin="round"/>` +
        labels +
        `</g>`,
    );
  });
  parts.push(axisSvg(layout, "", c));
  return { svg: svgDocument(layout, input.theme, c, "envelope", parts.join("")), layout, panels };
}

function lineSvg(box: PanelBox, layout: Layout, title: string, xs: number[], values: number[], c: Palette): { svg: string; frame: PanelFrame } {
  const frame = frameFor(box, layout, minOf(values), maxOf(values));
  const px = xs.map((x) => layout.x(x));
  const py = values.map((v) => frame.yPixel(v));
  const svg =
    panelStart(box, layout, title, c) +
    ticksSvg(frame, layout, c) +
    `<path class="area" d="${areaTo(px, py, frame.zeroY)}" fill="${c.momentFill}" stroke="none"/>` +
    zeroSvg(frame, layout, c) +
    `<path class="curve influence" d="${polyline(px, py)}" fill="none" stroke="${c.moment}" stroke-width="1.8" stroke-linejoin="round"/>` +
    `</g>`;
  return { svg, frame };
}

export interface InfluenceInput {
  member: Member;
  effect: string;
  xs: number[];
  values: number[];
  theme: Theme;
  width: number;
  subtitle: string;
}

/** The influence line: the effect of a unit downward load at each position. */
export function drawInfluence(input: InfluenceInput): Figure {
  const c = palette(input.theme);
  const length = input.member.spans.reduce((a, b) => a + b, 0);
  const layout = layoutFor(input.width, length, ["influence"]);
  const { svg, frame } = lineSvg(layout.panels[0], layout, `Influence line: ${input.effect}, unit load at x`, input.xs, input.values, c);
  const body = subtitleSvg(layout, input.subtitle, c) + sketchSvg(input.member, layout, NO_UNITS, c) + svg + axisSvg(layout, "", c);
  return { svg: svgDocument(layout, input.theme, c, "influence", body), layout, panels: [{ quantity: "influence", frame }] };
}

export interface MovingInput {
  member: Member;
  effect: string;
  placements: MovingPlacement[];
  line: { xs: number[]; values: number[] } | undefined;
  theme: Theme;
  width: number;
  subtitle: string;
}

const SKETCH_STEP = 144;

/** What a placement's caption says, one line per ": " part: the value; where the first axle stands and where it is measured; how many axles are on the member when not all. */
export function placementText(p: MovingPlacement, effect: string): string {
  const on = p.axles.length === p.axleCount ? "" : `: ${p.axles.length} of ${p.axleCount} axles on the member`;
  return `${p.label} ${effect} = ${formatValue(p.value)}: first axle at x = ${formatValue(p.leadX)}, ${p.direction}, measured at x = ${formatValue(p.x)}${on}`;
}

/** One sketch per extreme with the axles where they stand, then the effect's influence line. */
export function drawMoving(input: MovingInput): Figure {
  const c = palette(input.theme);
  const length = input.member.spans.reduce((a, b) => a + b, 0);
  const base = layoutFor(input.width, length, input.line ? ["influence"] : []);
  const extra = SKETCH_STEP * (input.placements.length - 1);
  const layout: Layout = {
    ...base,
    panels: base.panels.map((p) => ({ ...p, top: p.top + extra, bottom: p.bottom + extra })),
    axisY: base.axisY + extra,
    height: base.height + extra,
  };
  const parts: string[] = [subtitleSvg(layout, input.subtitle, c)];
  input.placements.forEach((p, i) => {
    const dy = SKETCH_STEP * i;
    const sketch = { top: base.sketch.top + dy, bottom: base.sketch.bottom + dy, beamY: base.sketch.beamY + dy };
    parts.push(
      `<g class="placement" data-label="${p.label}" data-value="${p.value}" data-lead-x="${p.leadX}">` +
        placementText(p, input.effect)
          .split(": ")
          .map((line, k) => `<text class="placement-text" x="${layout.left}" y="${sketch.top + 8 + 12 * k}" fill="${c.ink}" font-size="10">${escapeXml(line)}</text>`)
          .join("") +
        sketchSvg({ ...input.member, loads: p.axles }, { ...layout, sketch }, NO_UNITS, c) +
        `</g>`,
    );
  });
  const panels: Figure["panels"] = [];
  if (input.line) {
    const { svg, frame } = lineSvg(layout.panels[0], layout, `Influence line: ${input.effect}, unit load at x`, input.line.xs, input.line.values, c);
    parts.push(svg);
    panels.push({ quantity: "influence", frame });
  }
  parts.push(axisSvg(layout, "", c));
  return { svg: svgDocument(layout, input.theme, c, "moving", parts.join("")), layout, panels };
}
