/**
 * A printable document as plain data: blocks of headings, text, tables and vector figures, plus
 * the lines that go on every page. One model, two renderers (html.ts, pdf.ts), so the HTML and
 * the PDF of a report say the same things. Figure coordinates are points (1/72 inch), y down.
 */

export type Tone = "normal" | "caution" | "pass" | "fail" | "muted";

export type Shape =
  | { kind: "line"; x1: number; y1: number; x2: number; y2: number; width?: number; dash?: boolean }
  | { kind: "polyline"; points: [number, number][]; width?: number; closed?: boolean; fill?: boolean }
  | { kind: "circle"; x: number; y: number; r: number; fill?: boolean }
  | { kind: "text"; x: number; y: number; text: string; size?: number; anchor?: "start" | "middle" | "end" };

export type Block =
  | { kind: "heading"; text: string; level: 1 | 2 | 3 }
  | { kind: "text"; text: string; tone?: Tone; size?: number }
  | { kind: "table"; columns: string[]; rows: string[][]; widths?: number[]; tones?: Tone[]; align?: ("left" | "right")[] }
  | { kind: "figure"; width: number; height: number; shapes: Shape[]; caption?: string }
  | { kind: "pageBreak" };

export type PaperSize = "A4" | "letter";

export interface PrintDocument {
  title: string;
  /** Printed at the foot of every page (the caution, the version and the date). */
  footer: string[];
  blocks: Block[];
}

/** Page sizes in points: ISO 216 A4 is 210 x 297 mm; US letter is 8.5 x 11 in. */
export const PAPER: Record<PaperSize, { width: number; height: number; css: string }> = {
  A4: { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72, css: "A4" },
  letter: { width: 8.5 * 72, height: 11 * 72, css: "letter" },
};
