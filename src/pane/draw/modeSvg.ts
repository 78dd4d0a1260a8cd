/**
 * The drawing of a FREQUENCIES or MODESHAPE cell: the member sketch, then one panel per mode
 * drawn (its shape, down +, normalised to a largest |w| of 1 as SPAN.MODESHAPE gives it),
 * titled with the mode's frequency, on the shared x axis. A mode whose shape is refused (a
 * repeated frequency) gets its panel with the sheet layer's message instead of a curve. SVG
 * text. Pure.
 */
import { maxOf, minOf, type Member } from "../../core";
import { axisSvg } from "./diagramSvg";
import { escapeXml, formatValue } from "./format";
import { layoutFor } from "./layout";
import { palette, type Theme } from "./palette";
import { panelFrame, type PanelSpec } from "./panel";
import { areaTo, polyline } from "./scale";
import { sketchSvg } from "./sketch";
import { panelStart, subtitleSvg, svgDocument, ticksSvg, zeroSvg, type Figure } from "./studySvg";

export interface ModeCurve {
  mode: number;
  /** Frequency in Hz and circular frequency in rad/s, as SPAN.FREQUENCIES gives them. */
  hz: number;
  omega: number;
  xs: number[];
  values: number[];
  /** Why the shape is not drawn (the sheet layer's code and message). */
  error?: string;
}

export interface ModesInput {
  member: Member;
  modes: ModeCurve[];
  theme: Theme;
  width: number;
  subtitle: string;
}

const r1 = (n: number): number => Math.round(n * 10) / 10;

export function modeTitle(m: ModeCurve): string {
  return `Mode ${m.mode}: f = ${formatValue(m.hz)} Hz (ω = ${formatValue(m.omega)} rad/s), shape down +`;
}

export function drawModes(input: ModesInput): Figure {
  const c = palette(input.theme);
  const length = input.member.spans.reduce((a, b) => a + b, 0);
  const layout = layoutFor(input.width, length, input.modes.map(() => "mode" as const));
  const parts: string[] = [subtitleSvg(layout, input.subtitle, c), sketchSvg(input.member, layout, { force: "", intensity: "", moment: "" }, c)];
  const panels: Figure["panels"] = [];
  input.modes.forEach((m, i) => {
    const box = layout.panels[i];
    const values = m.error ? [0] : m.values;
    const frame = panelFrame({ box, downward: true } as PanelSpec, layout, { max: maxOf(values, 0), xMax: 0, min: minOf(values, 0), xMin: 0 });
    panels.push({ quantity: "mode", frame });
    let body = "";
    if (m.error) body = `<text class="mode-refused" x="${layout.left}" y="${r1((frame.top + frame.bottom) / 2)}" fill="${c.muted}" font-size="10">${escapeXml(m.error)}</text>`;
    else {
      const px = m.xs.map((x) => layout.x(x));
      const py = m.values.map((v) => frame.yPixel(v));
      body =
        ticksSvg(frame, layout, c) +
        `<path class="area" d="${areaTo(px, py, frame.zeroY)}" fill="${c.deflectionFill}" stroke="none"/>` +
        zeroSvg(frame, layout, c) +
        `<path class="curve mode" d="${polyline(px, py)}" fill="none" stroke="${c.deflection}" stroke-width="1.8" stroke-linejoin="round"/>`;
    }
    parts.push(panelStart(box, layout, modeTitle(m), c).replace('<g class="panel"', `<g class="panel" data-mode="${m.mode}" data-hz="${m.hz}"`) + body + `</g>`);
  });
  parts.push(axisSvg(layout, "", c));
  return { svg: svgDocument(layout, input.theme, c, "modes", parts.join("")), layout, panels };
}
