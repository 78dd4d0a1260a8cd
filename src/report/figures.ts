/**
 * Vector figures of a member report, as plain shapes (document.ts): the dimensioned sketch of
 * the member (supports, hinges, springs, loads, span lengths) and the shear, moment and
 * deflection diagrams on one shared x axis, each peak marked and labelled with its value and x.
 */
import { maxOf, minOf } from "../core";
import type { DiagramRow, Load, Member, Support } from "../core";
import { short } from "./describe";
import type { Shape } from "./document";

export const FIGURE_WIDTH = 510;
const LEFT = 62;
const RIGHT = 495;

function xScale(length: number): (x: number) => number {
  return (x: number) => LEFT + ((RIGHT - LEFT) * x) / length;
}

function nodes(member: Member): number[] {
  const xs = [0];
  for (const s of member.spans) xs.push(xs[xs.length - 1] + s);
  return xs;
}

function supportShapes(s: Support, x: number, y: number): Shape[] {
  switch (s.kind) {
    case "pin":
      return [
        { kind: "polyline", points: [[x, y], [x - 7, y + 11], [x + 7, y + 11]], closed: true },
        { kind: "line", x1: x - 10, y1: y + 13, x2: x + 10, y2: y + 13 },
      ];
    case "fixed": {
      const hatch: Shape[] = [];
      for (let k = -12; k <= 8; k += 5) hatch.push({ kind: "line", x1: x, y1: y + k, x2: x - 5, y2: y + k + 5, width: 0.5 });
      return [{ kind: "line", x1: x, y1: y - 14, x2: x, y2: y + 14, width: 2 }, ...hatch];
    }
    case "hinge":
      return [{ kind: "circle", x, y, r: 3 }];
    case "spring": {
      const pts: [number, number][] = [[x, y]];
      for (let k = 1; k <= 6; k++) pts.push([x + (k % 2 ? -5 : 5), y + 2 * k]);
      pts.push([x, y + 15]);
      return [
        { kind: "polyline", points: pts },
        { kind: "line", x1: x - 9, y1: y + 15, x2: x + 9, y2: y + 15 },
        { kind: "text", x: x + 8, y: y + 24, text: `k=${short(s.stiffness, 4)}`, size: 6.5 },
      ];
    }
    case "free":
      return [];
  }
}

/** A node's rotational spring (partial fixity): a small coil left of the node, tied to it, with k per radian. */
function rotationalShapes(s: Support, x: number, y: number): Shape[] {
  const k = "rotational" in s && typeof s.rotational === "number" ? s.rotational : undefined;
  if (k === undefined) return [];
  const [cx, cy] = [x - 11, y - 8];
  const pts: [number, number][] = [];
  for (let i = 0; i <= 30; i++) {
    const t = (i / 30) * 3 * Math.PI;
    const r = 1.5 + (3.5 * i) / 30;
    pts.push([cx + r * Math.cos(t), cy + r * Math.sin(t)]);
  }
  return [
    { kind: "line", x1: x, y1: y - 1, x2: cx + 5, y2: cy, width: 0.8 },
    { kind: "polyline", points: pts, width: 0.8 },
    { kind: "text", x: cx - 6, y: cy + 2, text: `k_rot=${short(k, 4)}`, size: 6.5, anchor: "end" },
  ];
}

function loadShapes(l: Load, X: (x: number) => number, beamY: number, level: number): Shape[] {
  const top = beamY - 16 - level * 18;
  const label = `${l.loadCase ? l.loadCase + ": " : ""}`;
  if (l.kind === "point") {
    const x = X(l.xStart);
    return [
      { kind: "line", x1: x, y1: top - 8, x2: x, y2: beamY - 2, width: 1 },
      { kind: "polyline", points: [[x - 3, beamY - 7], [x, beamY - 2], [x + 3, beamY - 7]] },
      { kind: "text", x: x + 3, y: top - 9, text: `${label}P=${short(l.magnitude, 4)}`, size: 6.5 },
    ];
  }
  if (l.kind === "moment") {
    const x = X(l.xStart);
    // An arc over the beam with the arrowhead at the end the couple turns towards
    // (clockwise positive: head on the right, pointing down).
    const r = 9;
    const arc: [number, number][] = [];
    for (let k = 0; k <= 12; k++) {
      const t = Math.PI * (1.1 - (1.2 * k) / 12);
      arc.push([x + r * Math.cos(t), beamY - 4 - r * Math.sin(t)]);
    }
    const [hx, hy] = l.magnitude >= 0 ? arc[arc.length - 1] : arc[0];
    const side = l.magnitude >= 0 ? 1 : -1;
    return [
      { kind: "polyline", points: arc, width: 0.9 },
      { kind: "polyline", points: [[hx - 3.5 * side, hy - 2], [hx, hy + 1], [hx + 1.5 * side, hy - 4]], width: 0.9 },
      { kind: "text", x: x + 7, y: top, text: `${label}C=${short(l.magnitude, 4)}`, size: 6.5 },
    ];
  }
  if (l.kind === "settle") return [{ kind: "text", x: X(l.xStart) + 3, y: beamY + 14, text: `${label}settle ${short(l.magnitude, 4)}`, size: 6.5 }];
  const a = X(l.xStart);
  const b = X(l.xEnd);
  const big = Math.max(Math.abs(l.magnitude), Math.abs(l.magnitudeEnd)) || 1;
  const h = (w: number) => 3 + (8 * Math.abs(w)) / big;
  const text = l.kind === "udl" ? `w=${short(l.magnitude, 4)}` : `w=${short(l.magnitude, 4)} to ${short(l.magnitudeEnd, 4)}`;
  return [
    { kind: "polyline", points: [[a, top + 11], [a, top + 11 - h(l.magnitude)], [b, top + 11 - h(l.magnitudeEnd)], [b, top + 11]], closed: true, width: 0.6 },
    { kind: "text", x: (a + b) / 2, y: top - 1, text: `${label}${text}`, size: 6.5, anchor: "middle" },
  ];
}

/** The member: beam line, supports, loads stacked one level each, and a dimension line of spans. */
export function memberSketch(member: Member, lengthUnit: string): { height: number; shapes: Shape[] } {
  const xs = nodes(member);
  const L = xs[xs.length - 1];
  const X = xScale(L);
  const levels = Math.min(member.loads.length, 12);
  const beamY = 24 + levels * 18;
  const shapes: Shape[] = [{ kind: "line", x1: X(0), y1: beamY, x2: X(L), y2: beamY, width: 2 }];
  member.loads.slice(0, 12).forEach((l, i) => shapes.push(...loadShapes(l, X, beamY, i)));
  member.supports.forEach((s, i) => shapes.push(...supportShapes(s, X(xs[i]), beamY), ...rotationalShapes(s, X(xs[i]), beamY)));
  const dimY = beamY + 34;
  const unit = lengthUnit ? ` ${lengthUnit}` : "";
  xs.forEach((x) => shapes.push({ kind: "line", x1: X(x), y1: dimY - 4, x2: X(x), y2: dimY + 4, width: 0.5 }));
  shapes.push({ kind: "line", x1: X(0), y1: dimY, x2: X(L), y2: dimY, width: 0.5 });
  member.spans.forEach((s, i) => shapes.push({ kind: "text", x: X(xs[i] + s / 2), y: dimY - 3, text: `${short(s, 6)}${unit}`, size: 7, anchor: "middle" }));
  xs.forEach((x, i) => shapes.push({ kind: "text", x: X(x), y: dimY + 12, text: String(i + 1), size: 6.5, anchor: "middle" }));
  if (member.loads.length > 12) shapes.push({ kind: "text", x: X(0), y: 10, text: `(${member.loads.length - 12} more loads in the load table)`, size: 6.5 });
  return { height: dimY + 20, shapes };
}

export interface Panel {
  title: string;
  values: number[];
  /** Draw positive values downward (deflection, down positive). */
  downward?: boolean;
}

const PANEL_H = 150;
const GAP = 22;

/** Panels on one x axis: zero line, the curve, supports as dashed verticals, max and min labelled. */
export function diagramPanels(rows: DiagramRow[], panels: Panel[], nodeX: number[], lengthUnit: string): { height: number; shapes: Shape[] } {
  const L = rows[rows.length - 1].x;
  const X = xScale(L);
  const shapes: Shape[] = [];
  panels.forEach((p, k) => {
    const top = k * (PANEL_H + GAP) + 14;
    const finite = p.values.filter(Number.isFinite);
    const max = maxOf(finite, 0);
    const min = minOf(finite, 0);
    const span = max - min || 1;
    const inner = PANEL_H - 30;
    const Y = (v: number) => top + 15 + (p.downward ? ((v - min) / span) * inner : ((max - v) / span) * inner);
    shapes.push({ kind: "text", x: 4, y: top, text: p.title, size: 8 });
    shapes.push({ kind: "line", x1: X(0), y1: Y(0), x2: X(L), y2: Y(0), width: 0.6 });
    for (const x of nodeX) shapes.push({ kind: "line", x1: X(x), y1: top + 8, x2: X(x), y2: top + PANEL_H - 10, width: 0.4, dash: true });
    const pts: [number, number][] = [[X(rows[0].x), Y(0)]];
    rows.forEach((r, i) => Number.isFinite(p.values[i]) && pts.push([X(r.x), Y(p.values[i])]));
    pts.push([X(L), Y(0)]);
    shapes.push({ kind: "polyline", points: pts, width: 1.1 });
    shapes.push({ kind: "text", x: LEFT - 4, y: Y(max) + 3, text: short(max, 4), size: 6.5, anchor: "end" });
    shapes.push({ kind: "text", x: LEFT - 4, y: Y(min) + 3, text: short(min, 4), size: 6.5, anchor: "end" });
    const marks = new Set<number>();
    for (const target of [max, min]) {
      if (target === 0) continue;
      const i = p.values.indexOf(target);
      if (i < 0 || marks.has(i)) continue;
      marks.add(i);
      const x = X(rows[i].x);
      const y = Y(target);
      // The label goes toward the middle of the panel, so it never runs into the axis below.
      const above = y > top + 15 + inner / 2;
      const anchor = x > (LEFT + RIGHT) / 2 ? "end" : "start";
      shapes.push({ kind: "circle", x, y, r: 1.8, fill: true });
      shapes.push({ kind: "text", x: anchor === "end" ? x - 6 : x + 6, y: above ? y - 5 : y + 11, text: `${target === max ? "max" : "min"} ${short(target)} at x = ${short(rows[i].x)}`, size: 7, anchor });
    }
  });
  const bottom = panels.length * (PANEL_H + GAP) - GAP + 14;
  for (let i = 0; i <= 4; i++) {
    const x = (L * i) / 4;
    shapes.push({ kind: "line", x1: X(x), y1: bottom - 8, x2: X(x), y2: bottom - 4, width: 0.5 });
    shapes.push({ kind: "text", x: X(x), y: bottom + 4, text: short(x, 4), size: 6.5, anchor: "middle" });
  }
  shapes.push({ kind: "text", x: (LEFT + RIGHT) / 2, y: bottom + 14, text: `x${lengthUnit ? ` (${lengthUnit})` : ""}, from the left end`, size: 7, anchor: "middle" });
  return { height: bottom + 20, shapes };
}
