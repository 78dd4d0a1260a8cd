/**
 * Where each part of the drawing goes for a given width: the loading sketch on top, then one
 * panel per quantity, all on one x scale. Pure.
 */
import { linearScale, type LinearScale } from "./scale";

/** The member diagrams; an influence line has a panel of its own kind. */
export type DiagramQuantity = "shear" | "moment" | "deflection";
export type PanelQuantity = DiagramQuantity | "influence" | "mode";

export interface PanelBox {
  quantity: PanelQuantity;
  top: number;
  bottom: number;
}

export interface Layout {
  width: number;
  height: number;
  left: number;
  right: number;
  sketch: { top: number; bottom: number; beamY: number };
  panels: PanelBox[];
  axisY: number;
  x: LinearScale;
}

export const MIN_WIDTH = 320;
const SKETCH_HEIGHT = 124;
const PANEL_HEIGHT = 128;
const PANEL_GAP = 22;

export function layoutFor(width: number, length: number, quantities: readonly PanelQuantity[]): Layout {
  const w = Math.max(MIN_WIDTH, Math.floor(width));
  const left = w < 400 ? 46 : 56;
  const right = w - 14;
  const sketch = { top: 26, bottom: 26 + SKETCH_HEIGHT, beamY: 26 + 84 };
  const panels: PanelBox[] = [];
  let y = sketch.bottom + PANEL_GAP;
  for (const quantity of quantities) {
    panels.push({ quantity, top: y, bottom: y + PANEL_HEIGHT });
    y += PANEL_HEIGHT + PANEL_GAP;
  }
  const axisY = y - PANEL_GAP + 4;
  const x = linearScale([0, length > 0 ? length : 1], [left, right]);
  return { width: w, height: axisY + 30, left, right, sketch, panels, axisY, x };
}
