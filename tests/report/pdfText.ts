/**
 * Text of a PDF written by src/report/pdf.ts, in drawing order, one string per text-showing
 * operator, read in plain JS: every stream is inflated (FlateDecode, node's zlib) and the hex
 * strings of `Tj` operators are decoded from WinAnsi (the standard fonts' encoding; PDF 32000-1
 * annex D.2). It reads what pdf-lib writes (hex strings, one Tj per line of text); it is not a
 * general PDF text extractor.
 */
import { inflateSync } from "zlib";

/** WinAnsi code points 0x80-0x9F that differ from Latin-1 (PDF 32000-1, annex D.2). */
const WIN_ANSI: Record<number, string> = { 0x80: "€", 0x85: "…", 0x91: "‘", 0x92: "’", 0x93: "“", 0x94: "”", 0x95: "•", 0x96: "–", 0x97: "—", 0x99: "™" };

export function pdfTextLines(bytes: Uint8Array): string[] {
  const raw = Buffer.from(bytes);
  const lines: string[] = [];
  let at = 0;
  for (;;) {
    const start = raw.indexOf("stream", at, "latin1");
    if (start < 0) break;
    let body = start + "stream".length;
    if (raw[body] === 0x0d) body++;
    if (raw[body] === 0x0a) body++;
    const end = raw.indexOf("endstream", body, "latin1");
    if (end < 0) break;
    at = end + "endstream".length;
    let content: string;
    try {
      content = inflateSync(raw.subarray(body, end)).toString("latin1");
    } catch {
      content = raw.subarray(body, end).toString("latin1");
    }
    for (const m of content.matchAll(/<([0-9A-Fa-f\s]*)>\s*Tj/g)) {
      const codes = Buffer.from(m[1].replace(/\s/g, ""), "hex");
      lines.push([...codes].map((c) => WIN_ANSI[c] ?? String.fromCharCode(c)).join(""));
    }
  }
  return lines;
}

export const pdfText = (bytes: Uint8Array): string => pdfTextLines(bytes).join("\n");

/** The page count and the MediaBox of the first page, read from the file's objects. */
export function pdfPages(bytes: Uint8Array): { count: number; mediaBox: number[] } {
  const text = Buffer.from(bytes).toString("latin1");
  const count = [...text.matchAll(/\/Type\s*\/Page[^s]/g)].length;
  const box = /\/MediaBox\s*\[\s*([-\d.\s]+)\]/.exec(text);
  return { count, mediaBox: box ? box[1].trim().split(/\s+/).map(Number) : [] };
}
