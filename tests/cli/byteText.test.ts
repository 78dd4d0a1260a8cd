/**
 * Byte strings (one character per byte) and the sink that gathers them into chunks: what a
 * big sheet is read and written through. Checked with Node's Buffer and with the fallback a
 * browser page would use (TextDecoder/TextEncoder, loops), against Buffer's UTF-8 codec
 * (Node documentation, "Buffers and character encodings") as the independent reference.
 */
import fc from "fast-check";
import * as nodeByteText from "../../src/cli/byteText";
import { scanSheet, rewriteSheetInto, rewriteSheetWith, type SheetRewrite, type XmlCell } from "../../src/cli/sheetXml";

type ByteText = typeof import("../../src/cli/byteText");

function withoutBuffer(): ByteText {
  let loaded: ByteText | undefined;
  const saved = global.Buffer;
  jest.isolateModules(() => {
    (global as { Buffer?: unknown }).Buffer = undefined;
    try {
      // eslint-disable-next-line @typescript-eslint/no-require-imports -- loaded again, without Buffer
      loaded = require("../../src/cli/byteText");
    } finally {
      global.Buffer = saved;
    }
  });
  return loaded!;
}

const IMPLEMENTATIONS: [string, ByteText][] = [
  ["Node Buffer", nodeByteText],
  ["browser fallback", withoutBuffer()],
];

const TEXTS = ["", "plain ascii", "Länge µm ±5 %", "梁の曲げ", "emoji 🧱 and \u0000 nul", "x".repeat(20_000) + "é"];

describe.each(IMPLEMENTATIONS)("byte strings (%s)", (name, bt) => {
  it("uses the implementation named", () => {
    expect(Buffer.isBuffer(bt.bytesOf("a"))).toBe(name === "Node Buffer");
  });

  it.each(TEXTS.map((t) => [t.slice(0, 20), t]))("UTF-8 round trip of %j", (_label, text) => {
    const binary = bt.utf8Of(text);
    expect(binary).toBe(Buffer.from(text, "utf8").toString("latin1"));
    expect(Buffer.from(bt.bytesOf(binary)).equals(Buffer.from(text, "utf8"))).toBe(true);
    expect(bt.textOfUtf8(binary)).toBe(text);
    expect(bt.binaryOf(Buffer.from(text, "utf8"))).toBe(binary);
  });

  it("keeps every byte value 0-255, including ones that are no UTF-8", () => {
    const bytes = Uint8Array.from({ length: 256 * 3 }, (_, i) => i % 256);
    const binary = bt.binaryOf(bytes);
    expect(binary.length).toBe(bytes.length);
    expect(Buffer.from(bt.bytesOf(binary)).equals(Buffer.from(bytes))).toBe(true);
  });

  it("refuses text that is no byte string instead of dropping the high byte", () => {
    expect(() => bt.bytesOf("a\u0100b")).toThrow(/not a byte string/);
    const sink = new bt.ByteSink();
    expect(() => {
      sink.push("梁");
      sink.chunks();
    }).toThrow(/not a byte string/);
  });

  it("a sink gives back exactly the bytes pushed, in chunks of about a megabyte", () => {
    fc.assert(
      fc.property(fc.array(fc.string({ unit: "binary", maxLength: 300 }), { maxLength: 200 }), fc.integer({ min: 0, max: 5000 }), (texts, repeat) => {
        const sink = new bt.ByteSink();
        const pieces = [...texts, "y".repeat(repeat * 300)].map(bt.utf8Of);
        pieces.forEach((piece) => sink.push(piece));
        const expected = Buffer.from([...texts, "y".repeat(repeat * 300)].join(""), "utf8");
        expect(sink.length).toBe(expected.length);
        const chunks = sink.chunks();
        // A chunk closes at the first piece that takes it to a megabyte: never more than that piece over.
        const largest = pieces.reduce((most, piece) => Math.max(most, piece.length), 0);
        expect(chunks.every((chunk) => chunk.length < (1 << 20) + largest)).toBe(true);
        expect(chunks.length).toBeLessThanOrEqual(Math.ceil(expected.length / (1 << 20)) + 1);
        expect(Buffer.from(bt.joinChunks(chunks)).equals(expected)).toBe(true);
        expect(sink.chunks()).toEqual([]);
      }),
      { numRuns: 40 },
    );
  });
});

/** No control characters (not allowed in XML text) nor the two non-characters. */
function xmlSafe(text: string): boolean {
  return [...text].every((ch) => ch.charCodeAt(0) >= 32 && ch !== "\uFFFE" && ch !== "\uFFFF");
}

/** A sheet with text cells (shared-string-free), a formula, and the content of each cell. */
function sheetOf(texts: string[]): string {
  const cells = texts.map((t, i) => `<c r="A${i + 1}" t="inlineStr"><is><t>${t.replace(/&/g, "&amp;").replace(/</g, "&lt;")}</t></is></c><c r="B${i + 1}"><f>LEN(A${i + 1})&amp;"é"</f><v>0</v></c>`);
  return `\uFEFF<?xml version="1.0" encoding="UTF-8"?>\r\n<worksheet><sheetData>${cells.map((c, i) => `<row r="${i + 1}">${c}</row>`).join("\r\n")}</sheetData><extLst>ünknown ✓</extLst></worksheet>`;
}

describe("sheet XML as a byte string", () => {
  const { utf8Of, textOfUtf8, ByteSink, joinChunks } = nodeByteText;
  const texts = fc.array(fc.string({ unit: "grapheme", maxLength: 12 }).filter(xmlSafe), { minLength: 1, maxLength: 20 });

  it("reads the same cells as the text form, at byte offsets, every text a UTF-8 decode", () => {
    fc.assert(
      fc.property(texts, (values) => {
        const text = sheetOf(values);
        const binary = utf8Of(text);
        const asText: XmlCell[] = [];
        const asBytes: XmlCell[] = [];
        scanSheet(text, (cell) => asText.push(cell));
        scanSheet(binary, (cell) => asBytes.push(cell), undefined, undefined, { bytes: true });
        expect(asBytes.map((c) => [c.row, c.col, c.inline, c.formula?.text, c.value])).toEqual(asText.map((c) => [c.row, c.col, c.inline, c.formula?.text, c.value]));
        asBytes.forEach((cell, i) => expect(textOfUtf8(binary.slice(cell.start, cell.end))).toBe(text.slice(asText[i].start, asText[i].end)));
      }),
      { numRuns: 60 },
    );
  });

  it("reads attribute values as UTF-8 before their character references", () => {
    const text = '<worksheet><sheetData><row r="1"><c r="A1" x:note="Größe &#233;&amp;ü"><f t="shared" si="é&#252;">1</f></c></row></sheetData></worksheet>';
    const cells: XmlCell[] = [];
    scanSheet(utf8Of(text), (cell) => cells.push(cell), undefined, undefined, { bytes: true });
    expect(cells[0].attrs.get("x:note")).toBe("Größe é&ü");
    expect(cells[0].formula?.si).toBe("éü");
  });

  it("a rewrite through a sink changes only the replaced cells' bytes", () => {
    fc.assert(
      fc.property(texts, fc.string({ unit: "grapheme", maxLength: 8 }).filter((t) => xmlSafe(t) && !/[<&]/.test(t)), (values, result) => {
        const text = sheetOf(values);
        const replaceIn = (encode: (s: string) => string): SheetRewrite => ({
          cell: (cell) => (cell.formula ? encode(`<c r="B${cell.row + 1}" t="str"><f>LEN(A${cell.row + 1})&amp;"é"</f><v>${result}</v></c>`) : undefined),
          adds: () => [],
          nextRow: () => undefined,
        });
        const sink = new ByteSink();
        rewriteSheetInto(utf8Of(text), replaceIn(utf8Of), (piece) => sink.push(piece), { bytes: true });
        const written = Buffer.from(joinChunks(sink.chunks()));
        const expected = text.replace(/<c r="B(\d+)"><f>([^<]*)<\/f><v>0<\/v><\/c>/g, (_, row, f) => `<c r="B${row}" t="str"><f>${f}</f><v>${result}</v></c>`);
        expect(written.toString("utf8")).toBe(expected);
        expect(written.equals(Buffer.from(rewriteSheetWith(text, replaceIn((s) => s)), "utf8"))).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});
