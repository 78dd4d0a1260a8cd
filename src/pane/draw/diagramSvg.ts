/**
 * The whole picture of a solved member as one SVG document: the loading sketch, then shear,
 * moment and (with EI) deflection on a shared x axis, with peaks labelled. Pure: a string,
 * so the same text is drawn in the pane, exported as SVG, and tested in Node.
 */
import { diagram, extremes, valueAt, type DiagramRow, type Member, type Quantity, type Solution } from "../../core";
import { quantityUnits, withUnit, type Units } from "../units";
import { escapeXml, formatValue } from "./format";
import { layoutFor, type DiagramQuantity, type Layout } from "./layout";
import { palette, type Palette, type Theme } from "./palette";
import { panelSvg, type PanelResult } from "./panel";
import type { PeakLabel } from "./peaks";
import { sketchSvg } from "./sketch";
import { springMomentMarks } from "./rotationalSpring";

export interface DrawInput {
  member: Member;
  solution: Solution;
  units: Units;
  theme: Theme;
  width: number;
  /** A line under the title, e.g. the combination. */
  subtitle?: string;
}

export interface Drawing {
  svg: string;
  layout: Layout;
  panels: { quantity: DiagramQuantity; frame: PanelResult["frame"]; labels: PeakLabel[] }[];
  rows: DiagramRow[];
}

/**
 * Evenly spaced stations for drawing: about one per pixel of plot width (at least 12 per span),
 * on top of which the diagram adds every support, load point, jump and extreme exactly.
 */
export function drawingPoints(spanCount: number, plotWidth = 360): number {
  return Math.min(801, Math.max(121, Math.round(plotWidth), 12 * spanCount + 1));
}

const QUANTITY: Record<DiagramQuantity, Quantity> = { shear: "shear", moment: "moment", deflection: "deflection" };

/** The shared x axis under the panels: round-number ticks and the x title. */
export function axisSvg(layout: Layout, xUnit: string, c: Palette): string {
  const x = layout.x;
  const ticks = x.ticks(Math.max(3, Math.floor((layout.right - layout.left) / 64)));
  return (
    `<g class="x-axis"><line x1="${layout.left}" x2="${layout.right}" y1="${layout.axisY}" y2="${layout.axisY}" stroke="${c.muted}"/>` +
    ticks.map((t) => `<line x1="${x(t)}" x2="${x(t)}" y1="${layout.axisY}" y2="${layout.axisY + 4}" stroke="${c.muted}"/><text x="${x(t)}" y="${layout.axisY + 15}" text-anchor="middle" fill="${c.muted}" font-size="9.5">${escapeXml(formatValue(t))}</text>`).join("") +
    `<text x="${layout.right}" y="${layout.axisY + 27}" text-anchor="end" fill="${c.muted}" font-size="10">${escapeXml(withUnit("x", xUnit))}</text></g>`
  );
}

export function drawDiagrams(input: DrawInput, rows = diagram(input.solution, drawingPoints(input.member.spans.length, input.width - 70))): Drawing {
  const { member, solution } = input;
  const c = palette(input.theme);
  const u = quantityUnits(input.units);
  const quantities: DiagramQuantity[] = solution.hasStiffness ? ["shear", "moment", "deflection"] : ["shear", "moment"];
  const layout = layoutFor(input.width, solution.length, quantities);
  const specs = {
    shear: { title: withUnit("Shear V", u.shear), valueUnit: u.shear, colour: c.shear, fill: c.shearFill, downward: false },
    moment: { title: withUnit("Moment M, sagging +", u.moment), valueUnit: u.moment, colour: c.moment, fill: c.momentFill, downward: false },
    deflection: { title: withUnit("Deflection, down +", u.deflection), valueUnit: u.deflection, colour: c.deflection, fill: c.deflectionFill, downward: true },
  };
  const panels: Drawing["panels"] = [];
  const parts: string[] = [];
  for (const box of layout.panels) {
    const q = QUANTITY[box.quantity as DiagramQuantity];
    // Deflection comes out in the length unit; shown in the formula's deflection unit.
    const k = q === "deflection" ? input.units.deflectionFactor : 1;
    const values = rows.map((row) => row[q] * k);
    const raw = extremes(solution, q);
    const peak = { ...raw, max: raw.max * k, min: raw.min * k };
    const tiny = solution.scales[q] * k * 1e-9;
    const result = panelSvg({ box, xUnit: u.x, ...specs[box.quantity as DiagramQuantity] }, layout, rows, values, peak, c, tiny);
    panels.push({ quantity: box.quantity as DiagramQuantity, frame: result.frame, labels: result.labels });
    parts.push(result.svg);
    if (q === "moment") {
      // The moment at the node as valueAt reads it (just right of an inner node, just left of the right end).
      const at = (x: number): number => valueAt(solution, "moment", x);
      parts.push(springMomentMarks(member.supports, solution.nodeX, solution.reactions.map((r) => r.moment), (x) => at(x), result.frame, u.moment, c));
    }
  }
  const x = layout.x;
  const nodeLines = solution.nodeX
    .map((nx) => `<line x1="${Math.round(x(nx) * 10) / 10}" x2="${Math.round(x(nx) * 10) / 10}" y1="${layout.sketch.bottom}" y2="${layout.axisY}" stroke="${c.grid}" stroke-dasharray="2 3"/>`)
    .join("");
  const axis = axisSvg(layout, u.x, c);
  const title = `<text x="${layout.left}" y="12" fill="${c.muted}" font-size="10">${escapeXml(input.subtitle ?? "")}</text>`;
  const sketch = sketchSvg(member, layout, { force: u.shear, intensity: u.intensity, moment: u.moment, length: u.x }, c);
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" class="spanwise-diagram" width="${layout.width}" height="${layout.height}" viewBox="0 0 ${layout.width} ${layout.height}" font-family="system-ui, sans-serif" data-theme="${input.theme}">` +
    `<rect width="100%" height="100%" fill="${c.background}"/>` +
    title +
    nodeLines +
    sketch +
    parts.join("") +
    axis +
    `<g class="cursor" visibility="hidden"><line class="cursor-line" y1="${layout.sketch.top}" y2="${layout.axisY}" stroke="${c.cursor}" stroke-width="1"/></g>` +
    `</svg>`;
  return { svg, layout, panels, rows };
}
