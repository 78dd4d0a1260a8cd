/**
 * A PrintDocument as one self-contained, print-ready HTML page: no scripts, no network, the page
 * size set by the CSS @page rule (A4 or letter) and the footer repeated on every printed page
 * (a fixed-position element is printed on each page by print engines that follow CSS paged
 * media; the footer is also written once at the end for those that do not).
 */
import { PAPER, type Block, type PaperSize, type PrintDocument, type Shape } from "./document";

export function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function shapeSvg(s: Shape): string {
  switch (s.kind) {
    case "line":
      return `<line x1="${s.x1}" y1="${s.y1}" x2="${s.x2}" y2="${s.y2}" stroke="#000" stroke-width="${s.width ?? 0.75}"${s.dash ? ' stroke-dasharray="3 2"' : ""}/>`;
    case "polyline": {
      const pts = s.points.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(" ");
      const tag = s.closed ? "polygon" : "polyline";
      return `<${tag} points="${pts}" fill="${s.fill ? "#000" : "none"}" stroke="#000" stroke-width="${s.width ?? 0.75}"/>`;
    }
    case "circle":
      return `<circle cx="${s.x}" cy="${s.y}" r="${s.r}" fill="${s.fill ? "#000" : "#fff"}" stroke="#000" stroke-width="0.75"/>`;
    case "text":
      return `<text x="${s.x}" y="${s.y}" font-size="${s.size ?? 8}" text-anchor="${s.anchor ?? "start"}">${escapeHtml(s.text)}</text>`;
  }
}

function blockHtml(b: Block): string {
  switch (b.kind) {
    case "heading":
      return `<h${b.level}>${escapeHtml(b.text)}</h${b.level}>`;
    case "text":
      return `<p class="${b.tone ?? "normal"}">${escapeHtml(b.text)}</p>`;
    case "table": {
      const align = (i: number) => (b.align?.[i] === "right" ? ' class="num"' : "");
      const head = b.columns.map((c, i) => `<th${align(i)}>${escapeHtml(c)}</th>`).join("");
      const rows = b.rows.map((r, k) => `<tr class="${b.tones?.[k] ?? "normal"}">${r.map((c, i) => `<td${align(i)}>${escapeHtml(c)}</td>`).join("")}</tr>`).join("\n");
      return `<table><thead><tr>${head}</tr></thead><tbody>\n${rows}\n</tbody></table>`;
    }
    case "figure": {
      const svg = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${b.width} ${b.height}" width="${b.width}pt" height="${b.height}pt" font-family="Helvetica, Arial, sans-serif">${b.shapes.map(shapeSvg).join("")}</svg>`;
      return `<figure>${svg}${b.caption ? `<figcaption>${escapeHtml(b.caption)}</figcaption>` : ""}</figure>`;
    }
    case "pageBreak":
      return `<div class="break"></div>`;
  }
}

export function renderHtml(doc: PrintDocument, paper: PaperSize = "A4"): string {
  const footer = doc.footer.map((line) => `<div>${escapeHtml(line)}</div>`).join("");
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<title>${escapeHtml(doc.title)}</title>
<style>
@page { size: ${PAPER[paper].css}; margin: 15mm 14mm 22mm 14mm; }
body { font-family: Helvetica, Arial, sans-serif; font-size: 9pt; color: #000; max-width: 190mm; margin: 0 auto; }
h1 { font-size: 15pt; margin: 0 0 6pt; } h2 { font-size: 12pt; margin: 12pt 0 4pt; } h3 { font-size: 10pt; margin: 9pt 0 3pt; }
p { margin: 2pt 0; } p.caution { border: 1pt solid #000; padding: 4pt; font-weight: bold; }
p.fail, tr.fail td { color: #b00000; font-weight: bold; } p.muted { color: #444; }
table { border-collapse: collapse; width: 100%; margin: 3pt 0 6pt; page-break-inside: auto; }
th, td { border: 0.5pt solid #888; padding: 1.5pt 3pt; text-align: left; vertical-align: top; }
th { background: #eee; } td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; }
tr { page-break-inside: avoid; } figure { margin: 4pt 0; page-break-inside: avoid; } figcaption { font-size: 8pt; }
.break { page-break-after: always; }
footer.print { position: fixed; bottom: -16mm; left: 0; right: 0; font-size: 7pt; border-top: 0.5pt solid #000; padding-top: 2pt; }
footer.end { font-size: 7pt; border-top: 0.5pt solid #000; margin-top: 12pt; padding-top: 2pt; }
@media screen { footer.print { display: none; } }
@media print { footer.end { display: none; } }
</style>
</head>
<body>
<footer class="print">${footer}</footer>
${doc.blocks.map(blockHtml).join("\n")}
<footer class="end">${footer}</footer>
</body>
</html>
`;
}
