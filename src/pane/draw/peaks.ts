/** Where the max and min labels of a diagram panel go, and what they say. Pure. */
import { formatValue } from "./format";

export interface PeakLabel {
  kind: "max" | "min";
  value: number;
  x: number;
  /** The marked point, in pixels. */
  px: number;
  py: number;
  /** The text's anchor point and alignment. */
  tx: number;
  ty: number;
  anchor: "start" | "middle" | "end";
  text: string;
}

export interface PeakInput {
  max: number;
  xMax: number;
  min: number;
  xMin: number;
}

export interface PanelFrame {
  left: number;
  right: number;
  top: number;
  bottom: number;
  /** Pixel y of the zero line. */
  zeroY: number;
  xPixel(x: number): number;
  yPixel(v: number): number;
}

/**
 * Labels for the largest and smallest values. A peak that is zero within `tiny` is left
 * unlabelled (a simple span's end moments), and the min label is dropped when it would
 * say the same as the max.
 */
export function peakLabels(peak: PeakInput, frame: PanelFrame, units: { value: string; x: string }, tiny: number): PeakLabel[] {
  const out: PeakLabel[] = [];
  const entries: ["max" | "min", number, number][] = [
    ["max", peak.max, peak.xMax],
    ["min", peak.min, peak.xMin],
  ];
  for (const [kind, value, x] of entries) {
    if (Math.abs(value) <= tiny) continue;
    if (kind === "min" && value === peak.max) continue;
    if (kind === "max" && value < 0 && peak.min === value) continue;
    const px = frame.xPixel(x);
    const py = frame.yPixel(value);
    const span = frame.right - frame.left;
    const anchor = px < frame.left + span * 0.22 ? "start" : px > frame.right - span * 0.22 ? "end" : "middle";
    const tx = anchor === "start" ? px + 4 : anchor === "end" ? px - 4 : px;
    const above = py <= frame.zeroY;
    const ty = above ? Math.max(frame.top + 10, py - 6) : Math.min(frame.bottom - 3, py + 14);
    const valueText = units.value ? `${formatValue(value)} ${units.value}` : formatValue(value);
    const xText = units.x ? `${formatValue(x)} ${units.x}` : formatValue(x);
    out.push({ kind, value, x, px, py, tx, ty, anchor, text: `${kind} ${valueText} at x = ${xText}` });
  }
  if (out.length === 2 && Math.abs(out[0].ty - out[1].ty) < 12 && Math.abs(out[0].tx - out[1].tx) < 140) {
    const [a, b] = out;
    if (a.ty <= b.ty) b.ty = Math.min(frame.bottom - 3, a.ty + 13);
    else a.ty = Math.min(frame.bottom - 3, b.ty + 13);
  }
  return out;
}
