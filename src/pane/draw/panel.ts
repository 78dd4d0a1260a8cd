/** One diagram panel (shear, moment or deflection): curve, zero line, y ticks, peak labels. Pure. */
import type { DiagramRow, Extreme } from "../../core";
import { escapeXml, formatValue } from "./format";
import type { Layout, PanelBox } from "./layout";
import type { Palette } from "./palette";
import { peakLabels, type PanelFrame, type PeakLabel } from "./peaks";
import { areaTo, linearScale, polyline } from "./scale";

export interface PanelSpec {
  box: PanelBox;
  title: string;
  valueUnit: string;
  xUnit: string;
  /** Deflection is drawn positive downward, like the beam moves. */
  downward: boolean;
  colour: string;
  fill: string;
}

export interface PanelResult {
  svg: string;
  frame: PanelFrame;
  labels: PeakLabel[];
}

const r1 = (n: number): number => Math.round(n * 10) / 10;

export function panelFrame(spec: PanelSpec, layout: Layout, peak: Extreme): PanelFrame {
  const lo = Math.min(0, peak.min);
  const hi = Math.max(0, peak.max);
  const pad = (hi - lo) * 0.18 || 1;
  const domain: [number, number] = hi === lo ? [-1, 1] : [lo - (lo < 0 ? pad : 0), hi + (hi > 0 ? pad : 0)];
  const top = spec.box.top + 14;
  const bottom = spec.box.bottom;
  const y = linearScale(domain, spec.downward ? [top, bottom] : [bottom, top]);
  return { left: layout.left, right: layout.right, top, bottom, zeroY: y(0), xPixel: layout.x, yPixel: y };
}

export function panelSvg(spec: PanelSpec, layout: Layout, rows: DiagramRow[], values: number[], peak: Extreme, c: Palette, tiny: number): PanelResult {
  const frame = panelFrame(spec, layout, peak);
  const xs = rows.map((row) => layout.x(row.x));
  const ys = values.map((v) => frame.yPixel(v));
  const path = polyline(xs, ys);
  const fill = areaTo(xs, ys, frame.zeroY);
  const tickScale = linearScale([invert(frame, frame.bottom), invert(frame, frame.top)], [0, 1]);
  const ticks = tickScale.ticks(4).filter((t) => {
    const py = frame.yPixel(t);
    return py >= frame.top + 4 && py <= frame.bottom + 0.5;
  });
  const tickSvg = ticks
    .map((t) => {
      const py = r1(frame.yPixel(t));
      return `<line x1="${layout.left}" x2="${layout.right}" y1="${py}" y2="${py}" stroke="${c.grid}" stroke-width="1"/><text x="${layout.left - 5}" y="${py + 3}" text-anchor="end" fill="${c.muted}" font-size="9.5">${escapeXml(formatValue(t))}</text>`;
    })
    .join("");
  const labels = peakLabels(peak, frame, { value: spec.valueUnit, x: spec.xUnit }, tiny);
  const labelSvg = labels
    .map(
      (label) =>
        `<g class="peak ${label.kind}" data-quantity="${spec.box.quantity}" data-kind="${label.kind}" data-value="${label.value}" data-x="${label.x}">` +
        `<circle cx="${r1(label.px)}" cy="${r1(label.py)}" r="3" fill="${spec.colour}"/>` +
        `<text x="${r1(label.tx)}" y="${r1(label.ty)}" text-anchor="${label.anchor}" fill="${c.ink}" font-size="10" paint-order="stroke" stroke="${c.background}" stroke-width="3">${escapeXml(label.text)}</text></g>`,
    )
    .join("");
  const svg =
    `<g class="panel" data-quantity="${spec.box.quantity}">` +
    `<text class="panel-title" x="${layout.left}" y="${spec.box.top + 6}" fill="${c.ink}" font-size="11" font-weight="600">${escapeXml(spec.title)}</text>` +
    tickSvg +
    `<path class="area" d="${fill}" fill="${spec.fill}" stroke="none"/>` +
    `<line class="zero" x1="${layout.left}" x2="${layout.right}" y1="${r1(frame.zeroY)}" y2="${r1(frame.zeroY)}" stroke="${c.zero}" stroke-width="1"/>` +
    `<path class="curve" d="${path}" fill="none" stroke="${spec.colour}" stroke-width="1.8" stroke-linejoin="round"/>` +
    labelSvg +
    `</g>`;
  return { svg, frame, labels };
}

/** The value at a pixel height of the panel. */
export function invert(frame: PanelFrame, py: number): number {
  const a = frame.yPixel(0);
  const b = frame.yPixel(1);
  return (py - a) / (b - a);
}
