/**
 * Parts handled as byte strings: one character per byte of the part (codes 0-255), so a
 * position in the string is a byte offset, copying a range copies its bytes exactly (whatever
 * the bytes are), and the engine's one-byte string representation holds a part in as many
 * bytes as the part has. Text read out of a byte string is decoded from UTF-8 into a fresh
 * string, which never keeps the whole part alive (a slice of a string may). Text written into
 * one is encoded to UTF-8 first.
 *
 * Node's Buffer does the conversions natively where it exists; elsewhere (a browser page)
 * TextDecoder and TextEncoder, and a loop for the byte strings themselves.
 */

const NodeBuffer: typeof Buffer | undefined = typeof Buffer === "function" ? Buffer : undefined;

/** Not only ASCII (a byte or character above 0x7f). */
const NON_ASCII = /[\u0080-\uffff]/;

/** A character that is no byte. */
const WIDE = /[\u0100-\uffff]/;

/** Characters per String.fromCharCode call in the loop fallback. */
const CHUNK = 0x2000;

/** The byte string of some bytes. */
export function binaryOf(bytes: Uint8Array): string {
  if (NodeBuffer) return NodeBuffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString("latin1");
  let out = "";
  for (let i = 0; i < bytes.length; i += CHUNK) out += String.fromCharCode(...bytes.subarray(i, i + CHUNK));
  return out;
}

/** The bytes of a byte string (characters above 0xff are not bytes: they are refused). */
export function bytesOf(binary: string): Uint8Array {
  if (NodeBuffer) {
    // latin1 encoding would keep the low byte of a wider character: a mistaken caller is caught here.
    if (WIDE.test(binary)) throw new RangeError("not a byte string");
    return NodeBuffer.from(binary, "latin1");
  }
  const out = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) {
    const code = binary.charCodeAt(i);
    if (code > 0xff) throw new RangeError("not a byte string");
    out[i] = code;
  }
  return out;
}

/** Text of a byte string read as UTF-8, as a fresh string (never a slice of the part it came from). */
export function textOfUtf8(binary: string): string {
  if (binary === "") return "";
  if (NodeBuffer) return NodeBuffer.from(binary, "latin1").toString("utf8");
  return new TextDecoder("utf-8").decode(bytesOf(binary));
}

/** The UTF-8 byte string of a text (ASCII text is its own byte string). */
export function utf8Of(text: string): string {
  if (!NON_ASCII.test(text)) return text;
  if (NodeBuffer) return NodeBuffer.from(text, "utf8").toString("latin1");
  return binaryOf(new TextEncoder().encode(text));
}

/** Bytes gathered from byte-string pieces into this many bytes per chunk. */
const CHUNK_BYTES = 1 << 20;

/**
 * Bytes written piece by piece (byte strings), kept as chunks of about a megabyte: a big part
 * written out never exists as one string, nor as a list of millions of small ones.
 */
export class ByteSink {
  private readonly done: Uint8Array[] = [];
  private pending: string[] = [];
  private pendingBytes = 0;
  private total = 0;

  push(piece: string): void {
    if (piece.length === 0) return;
    this.pending.push(piece);
    this.pendingBytes += piece.length;
    if (this.pendingBytes >= CHUNK_BYTES) this.flush();
  }

  /** Bytes written so far. */
  get length(): number {
    return this.total + this.pendingBytes;
  }

  /** Every byte written, as chunks in order; the sink is empty afterwards. */
  chunks(): Uint8Array[] {
    this.flush();
    const out = this.done.splice(0);
    this.total = 0;
    return out;
  }

  private flush(): void {
    if (this.pendingBytes === 0) return;
    this.done.push(bytesOf(this.pending.join("")));
    this.total += this.pendingBytes;
    this.pending = [];
    this.pendingBytes = 0;
  }
}

/** Chunks joined into one array of bytes. */
export function joinChunks(chunks: readonly Uint8Array[]): Uint8Array {
  if (chunks.length === 1) return chunks[0];
  let size = 0;
  for (const chunk of chunks) size += chunk.length;
  const out = new Uint8Array(size);
  let at = 0;
  for (const chunk of chunks) {
    out.set(chunk, at);
    at += chunk.length;
  }
  return out;
}
