/**
 * A node's rotational spring (partial fixity, `rot K` in the supports notation) in the member
 * sketch: a coil wound around the node above the beam, with its stiffness in moment per
 * radian. Drawn beside whatever else restrains the node (a pin, a vertical spring, or
 * nothing), so `rot K`, `pin+rot K` and `spring S rot K` each show both parts. SVG text. Pure.
 */
import type { Support } from "../../core";
import { escapeXml, formatValue } from "./format";
import type { Palette } from "./palette";

const f = (n: number): string => (Math.round(n * 10) / 10).toString();

/** The node's rotational stiffness, or undefined when it has none. */
export function rotationalOf(support: Support): number | undefined {
  return "rotational" in support && typeof support.rotational === "number" ? support.rotational : undefined;
}

/** A spiral of 1.5 turns around (px, y), opening to a tail that ends on a short ground line. */
export function rotationalSpringSvg(support: Support, px: number, y: number, momentUnit: string, c: Palette, end: "left" | "right" | "inner"): string {
  const k = rotationalOf(support);
  if (k === undefined) return "";
  const points: string[] = [];
  const turns = 1.5;
  for (let i = 0; i <= 36; i++) {
    const t = (i / 36) * turns * 2 * Math.PI;
    const r = 3 + (5 * i) / 36;
    points.push(`${f(px + r * Math.cos(t))},${f(y - 14 - r * Math.sin(t))}`);
  }
  const last = points[points.length - 1].split(",").map(Number);
  const tail = `M${f(last[0])},${f(last[1])} v-6 m-5,0 h10`;
  const unit = momentUnit ? ` ${momentUnit}/rad` : "";
  const anchor = end === "left" ? "start" : end === "right" ? "end" : "middle";
  const tx = end === "left" ? px - 4 : end === "right" ? px + 4 : px;
  return (
    `<g class="support rotational" data-k="${k}">` +
    `<path d="M${points.join(" L")} ${tail}" stroke="${c.support}" stroke-width="1.3" fill="none"/>` +
    `<line x1="${f(px)}" y1="${f(y - 2)}" x2="${f(px)}" y2="${f(y - 11)}" stroke="${c.support}" stroke-width="1.3"/>` +
    `<text x="${f(tx)}" y="${f(y - 38)}" text-anchor="${anchor}" fill="${c.support}" font-size="9.5" paint-order="stroke" stroke="${c.background}" stroke-width="3">${escapeXml(`kθ ${formatValue(k)}${unit}`)}</text>` +
    `</g>`
  );
}

/**
 * On the moment diagram, each rotational spring's moment reaction (k·θ, counter-clockwise +,
 * as SPAN.REACTIONS gives it) marked at its node on the moment curve, so a partially fixed end
 * reads as such. `momentAt` is the diagram's moment at the node (just inside the member).
 */
export function springMomentMarks(
  supports: readonly Support[],
  nodeX: readonly number[],
  reactionMoments: readonly number[],
  momentAt: (x: number, node: number) => number,
  frame: { xPixel(x: number): number; yPixel(v: number): number },
  momentUnit: string,
  c: Palette,
): string {
  return supports
    .map((support, i) => {
      if (rotationalOf(support) === undefined) return "";
      const px = frame.xPixel(nodeX[i]);
      const py = frame.yPixel(momentAt(nodeX[i], i));
      const unit = momentUnit ? ` ${momentUnit}` : "";
      const anchor = i === 0 ? "start" : i === supports.length - 1 ? "end" : "middle";
      const tx = i === 0 ? px + 5 : i === supports.length - 1 ? px - 5 : px;
      return (
        `<g class="spring-moment" data-node="${i + 1}" data-moment="${reactionMoments[i]}">` +
        `<rect x="${f(px - 3)}" y="${f(py - 3)}" width="6" height="6" fill="${c.background}" stroke="${c.support}" stroke-width="1.3"/>` +
        `<text x="${f(tx)}" y="${f(py - 7)}" text-anchor="${anchor}" fill="${c.support}" font-size="9.5" paint-order="stroke" stroke="${c.background}" stroke-width="3">${escapeXml(`spring moment ${formatValue(reactionMoments[i])}${unit} (ccw +)`)}</text>` +
        `</g>`
      );
    })
    .join("");
}
