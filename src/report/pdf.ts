/**
 * A PrintDocument as PDF bytes, with pdf-lib and the standard Helvetica fonts (no font files, no
 * network, no browser). Lays the blocks out top to bottom, breaks pages before a table row or a
 * figure that would not fit (repeating a table's header), and writes the footer lines and
 * "page i of n" on every page. Characters the standard fonts cannot encode (WinAnsi) are
 * replaced by a readable ASCII form, never dropped silently.
 */
import { maxOf } from "../core";
import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import { PAPER, type Block, type PaperSize, type PrintDocument, type Shape, type Tone } from "./document";

const MARGIN = { left: 42, right: 42, top: 42, bottom: 64 };
const BLACK = rgb(0, 0, 0);
const RED = rgb(0.7, 0, 0);
const GREY = rgb(0.35, 0.35, 0.35);
const RULE = rgb(0.55, 0.55, 0.55);

const REPLACEMENTS: Record<string, string> = { "≤": "<=", "≥": ">=", "−": "-", "δ": "delta", "θ": "theta", "Σ": "sum", "→": "->", "≈": "~", "\t": " " };

interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
}

class Layout {
  page!: PDFPage;
  y = 0;
  readonly pages: PDFPage[] = [];
  private encodable = new Map<string, boolean>();

  constructor(
    readonly pdf: PDFDocument,
    readonly fonts: Fonts,
    readonly width: number,
    readonly height: number,
  ) {
    this.newPage();
  }

  get contentWidth(): number {
    return this.width - MARGIN.left - MARGIN.right;
  }

  newPage(): void {
    this.page = this.pdf.addPage([this.width, this.height]);
    this.pages.push(this.page);
    this.y = MARGIN.top;
  }

  /** Breaks the page unless `needed` points still fit above the footer. */
  ensure(needed: number): boolean {
    if (this.y + needed <= this.height - MARGIN.bottom) return false;
    this.newPage();
    return true;
  }

  clean(text: string): string {
    let out = "";
    for (const ch of text) {
      const mapped = REPLACEMENTS[ch];
      if (mapped !== undefined) {
        out += mapped;
        continue;
      }
      let ok = this.encodable.get(ch);
      if (ok === undefined) {
        try {
          this.fonts.regular.widthOfTextAtSize(ch, 10);
          ok = ch >= " ";
        } catch {
          ok = false;
        }
        this.encodable.set(ch, ok);
      }
      out += ok ? ch : "?";
    }
    return out;
  }

  wrap(text: string, font: PDFFont, size: number, width: number): string[] {
    const lines: string[] = [];
    for (const paragraph of this.clean(text).split("\n")) {
      let line = "";
      for (const word of paragraph.split(" ")) {
        const trial = line ? `${line} ${word}` : word;
        if (font.widthOfTextAtSize(trial, size) <= width) {
          line = trial;
          continue;
        }
        if (line) lines.push(line);
        line = word;
        while (font.widthOfTextAtSize(line, size) > width && line.length > 1) {
          let cut = line.length - 1;
          while (cut > 1 && font.widthOfTextAtSize(line.slice(0, cut), size) > width) cut--;
          lines.push(line.slice(0, cut));
          line = line.slice(cut);
        }
      }
      lines.push(line);
    }
    return lines;
  }

  /** Text with its top-left corner at (x, top), y measured down the page. */
  text(text: string, x: number, top: number, size: number, font: PDFFont, color = BLACK): void {
    this.page.drawText(text, { x, y: this.height - top - size * 0.8, size, font, color });
  }

  line(x1: number, y1: number, x2: number, y2: number, thickness = 0.5, color = BLACK, dash = false): void {
    this.page.drawLine({ start: { x: x1, y: this.height - y1 }, end: { x: x2, y: this.height - y2 }, thickness, color, dashArray: dash ? [3, 2] : undefined });
  }
}

function toneColor(tone: Tone | undefined) {
  return tone === "fail" ? RED : tone === "muted" ? GREY : BLACK;
}

function paragraph(l: Layout, text: string, size: number, font: PDFFont, tone?: Tone): void {
  const lines = l.wrap(text, font, size, l.contentWidth - (tone === "caution" ? 8 : 0));
  const lineH = size * 1.3;
  if (tone === "caution") {
    const h = lines.length * lineH + 6;
    l.ensure(h + 4);
    const top = l.y;
    lines.forEach((line, i) => l.text(line, MARGIN.left + 4, top + 3 + i * lineH, size, l.fonts.bold));
    l.page.drawRectangle({ x: MARGIN.left, y: l.height - top - h, width: l.contentWidth, height: h, borderWidth: 0.8, borderColor: BLACK });
    l.y = top + h + 4;
    return;
  }
  for (const line of lines) {
    l.ensure(lineH);
    l.text(line, MARGIN.left, l.y, size, tone === "fail" ? l.fonts.bold : font, toneColor(tone));
    l.y += lineH;
  }
  l.y += 2;
}

function table(l: Layout, b: Extract<Block, { kind: "table" }>): void {
  const size = 7.5;
  const lineH = size * 1.25;
  const pad = 2;
  const total = b.widths ? b.widths.reduce((s, v) => s + v, 0) : b.columns.length;
  const widths = b.columns.map((_, i) => ((b.widths ? b.widths[i] : 1) / total) * l.contentWidth);
  const lefts = widths.map((_, i) => MARGIN.left + widths.slice(0, i).reduce((s, v) => s + v, 0));
  const drawRow = (cells: string[], font: PDFFont, color: ReturnType<typeof rgb>, shade: boolean): void => {
    const wrapped = cells.map((c, i) => l.wrap(c, font, size, widths[i] - 2 * pad));
    const h = maxOf(wrapped.map((w) => w.length)) * lineH + 2 * pad;
    if (l.ensure(h) && !shade) drawRow(b.columns, l.fonts.bold, BLACK, true);
    const top = l.y;
    if (shade) l.page.drawRectangle({ x: MARGIN.left, y: l.height - top - h, width: l.contentWidth, height: h, color: rgb(0.92, 0.92, 0.92) });
    wrapped.forEach((lines, i) => {
      lines.forEach((line, k) => {
        const right = b.align?.[i] === "right";
        const x = right ? lefts[i] + widths[i] - pad - font.widthOfTextAtSize(line, size) : lefts[i] + pad;
        l.text(line, x, top + pad + k * lineH, size, font, color);
      });
    });
    l.line(MARGIN.left, top + h, MARGIN.left + l.contentWidth, top + h, 0.4, RULE);
    for (let i = 0; i <= widths.length; i++) {
      const x = i < widths.length ? lefts[i] : MARGIN.left + l.contentWidth;
      l.line(x, top, x, top + h, 0.4, RULE);
    }
    if (shade) l.line(MARGIN.left, top, MARGIN.left + l.contentWidth, top, 0.4, RULE);
    l.y = top + h;
  };
  l.ensure(3 * lineH + 4 * pad);
  drawRow(b.columns, l.fonts.bold, BLACK, true);
  b.rows.forEach((row, k) => {
    const tone = b.tones?.[k];
    drawRow(row, tone === "fail" ? l.fonts.bold : l.fonts.regular, toneColor(tone), false);
  });
  l.y += 6;
}

function figure(l: Layout, b: Extract<Block, { kind: "figure" }>): void {
  const scale = Math.min(1, l.contentWidth / b.width);
  l.ensure(b.height * scale + 14);
  const left = MARGIN.left;
  const top = l.y;
  const X = (x: number) => left + x * scale;
  const Y = (y: number) => top + y * scale;
  for (const s of b.shapes) drawShape(l, s, X, Y, scale);
  l.y = top + b.height * scale + 2;
  if (b.caption) paragraph(l, b.caption, 7.5, l.fonts.regular, "muted");
  l.y += 4;
}

function drawShape(l: Layout, s: Shape, X: (x: number) => number, Y: (y: number) => number, scale: number): void {
  switch (s.kind) {
    case "line":
      l.line(X(s.x1), Y(s.y1), X(s.x2), Y(s.y2), (s.width ?? 0.75) * scale, BLACK, s.dash);
      return;
    case "polyline": {
      const pts = s.closed ? [...s.points, s.points[0]] : s.points;
      for (let i = 1; i < pts.length; i++) l.line(X(pts[i - 1][0]), Y(pts[i - 1][1]), X(pts[i][0]), Y(pts[i][1]), (s.width ?? 0.75) * scale);
      return;
    }
    case "circle":
      l.page.drawCircle({ x: X(s.x), y: l.height - Y(s.y), size: s.r * scale, borderWidth: 0.75 * scale, borderColor: BLACK, color: s.fill ? BLACK : rgb(1, 1, 1) });
      return;
    case "text": {
      const size = (s.size ?? 8) * scale;
      const text = l.clean(s.text);
      const w = l.fonts.regular.widthOfTextAtSize(text, size);
      const x = s.anchor === "middle" ? X(s.x) - w / 2 : s.anchor === "end" ? X(s.x) - w : X(s.x);
      // SVG text sits on its baseline at y; pdf-lib's drawText does too.
      l.page.drawText(text, { x, y: l.height - Y(s.y), size, font: l.fonts.regular, color: BLACK });
      return;
    }
  }
}

export async function renderPdf(doc: PrintDocument, paper: PaperSize = "A4", date = new Date()): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.setTitle(doc.title);
  pdf.setCreator("Spanwise");
  pdf.setProducer("Spanwise (pdf-lib)");
  pdf.setCreationDate(date);
  pdf.setModificationDate(date);
  const fonts = { regular: await pdf.embedFont(StandardFonts.Helvetica), bold: await pdf.embedFont(StandardFonts.HelveticaBold) };
  const { width, height } = PAPER[paper];
  const l = new Layout(pdf, fonts, width, height);
  for (const b of doc.blocks) {
    switch (b.kind) {
      case "heading": {
        const size = b.level === 1 ? 15 : b.level === 2 ? 11.5 : 9.5;
        l.ensure(size * 3);
        if (l.y > MARGIN.top) l.y += size * 0.5;
        paragraph(l, b.text, size, fonts.bold);
        break;
      }
      case "text":
        paragraph(l, b.text, b.size ?? 8.5, fonts.regular, b.tone);
        break;
      case "table":
        table(l, b);
        break;
      case "figure":
        figure(l, b);
        break;
      case "pageBreak":
        if (l.y > MARGIN.top) l.newPage();
        break;
    }
  }
  const n = l.pages.length;
  l.pages.forEach((page, i) => {
    l.page = page;
    const top = height - MARGIN.bottom + 10;
    l.line(MARGIN.left, top, width - MARGIN.right, top, 0.5);
    const lines = doc.footer.flatMap((line) => l.wrap(line, fonts.regular, 7, l.contentWidth - 60));
    lines.forEach((line, k) => l.text(line, MARGIN.left, top + 4 + k * 8.5, 7, fonts.regular));
    const label = `page ${i + 1} of ${n}`;
    l.text(label, width - MARGIN.right - fonts.regular.widthOfTextAtSize(label, 7), top + 4, 7, fonts.regular);
  });
  return pdf.save({ useObjectStreams: false });
}
