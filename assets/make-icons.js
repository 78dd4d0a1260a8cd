/**
 * Writes the add-in icons (assets/icon-<size>.png): a beam on two supports under a uniform
 * load, drawn pixel by pixel and encoded with zlib. Our own drawing; run `node assets/make-icons.js`.
 */
const fs = require("fs");
const path = require("path");
const zlib = require("zlib");

const SIZES = [16, 32, 64, 80, 128];
const BACKGROUND = [31, 95, 122, 255];
const INK = [255, 255, 255, 255];
const LOAD = [244, 190, 80, 255];

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(buffer) {
  let c = 0xffffffff;
  for (const byte of buffer) c = crcTable[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

function encodePng(size, pixel) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0;
    for (let x = 0; x < size; x++) {
      const [r, g, b, a] = pixel(x + 0.5, y + 0.5);
      raw.set([r, g, b, a], y * (size * 4 + 1) + 1 + x * 4);
    }
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", zlib.deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

/** The drawing in unit coordinates (0..1 across the icon). */
function drawing(u, v) {
  const corner = 0.18;
  const cx = Math.min(Math.max(u, corner), 1 - corner);
  const cy = Math.min(Math.max(v, corner), 1 - corner);
  if (Math.hypot(u - cx, v - cy) > corner) return [0, 0, 0, 0];
  const beamTop = 0.5;
  const beamBottom = 0.58;
  if (u > 0.12 && u < 0.88 && v > beamTop && v < beamBottom) return INK;
  for (const x0 of [0.22, 0.78]) {
    const depth = v - beamBottom;
    if (depth > 0 && depth < 0.18 && Math.abs(u - x0) < depth * 0.75) return INK;
  }
  if (u > 0.16 && u < 0.84 && v > 0.24 && v < 0.44) {
    const band = v < 0.3;
    const arrow = Math.abs(((u - 0.16) % 0.17) - 0.085) < 0.025;
    if (band || arrow) return LOAD;
  }
  return BACKGROUND;
}

for (const size of SIZES) {
  const png = encodePng(size, (x, y) => drawing(x / size, y / size));
  fs.writeFileSync(path.join(__dirname, `icon-${size}.png`), png);
}
console.log(`wrote ${SIZES.map((s) => `icon-${s}.png`).join(", ")}`);
