/**
 * Properties of plane cross-sections: rectangle, solid circle, hollow rectangle (box),
 * hollow circle (tube), symmetric I, channel and tee, all with sharp corners (no root
 * fillets, no flange taper).
 *
 * Axes: x horizontal, y vertical; bending about x is the usual (strong-axis) bending.
 * The centroid is measured from the section's left edge (x) and bottom edge (y). The tee's
 * flange is at the top; the channel's web is at the left, its flanges reach right.
 * Plastic moduli Z take the plastic neutral axis where the areas either side are equal.
 * Qx is the first moment, about the elastic neutral axis, of the area above it; tx is the
 * section's width there; shearFactor is the largest Q(y)/t(y) over the depth, which gives
 * the largest shear stress V Q/(I t) (at the neutral axis for every shape here except a tee
 * whose neutral axis lies in its flange).
 */
import { maxOf } from "./tolerance";
import { invalid } from "./errors";

export type SectionShape =
  | { shape: "rectangle"; b: number; h: number }
  | { shape: "circle"; d: number }
  | { shape: "box"; b: number; h: number; t: number }
  | { shape: "tube"; d: number; t: number }
  | { shape: "ibeam"; d: number; bf: number; tf: number; tw: number }
  | { shape: "channel"; d: number; bf: number; tf: number; tw: number }
  | { shape: "tee"; d: number; bf: number; tf: number; tw: number };

export type SectionKind = SectionShape["shape"];

/** The dimensions each shape takes, in order, with what each means. */
export const SECTION_DIMENSIONS: Record<SectionKind, readonly (readonly [name: string, meaning: string])[]> = {
  rectangle: [["b", "width"], ["h", "depth"]],
  circle: [["d", "diameter"]],
  box: [["b", "outside width"], ["h", "outside depth"], ["t", "wall thickness"]],
  tube: [["d", "outside diameter"], ["t", "wall thickness"]],
  ibeam: [["d", "overall depth"], ["bf", "flange width"], ["tf", "flange thickness"], ["tw", "web thickness"]],
  channel: [["d", "overall depth"], ["bf", "flange width"], ["tf", "flange thickness"], ["tw", "web thickness"]],
  tee: [["d", "overall depth"], ["bf", "flange width"], ["tf", "flange thickness"], ["tw", "stem thickness"]],
};

export interface SectionProperties {
  area: number;
  Ix: number;
  Iy: number;
  /** Ix / (distance from the neutral axis to the top fibre). */
  SxTop: number;
  /** Ix / (distance from the neutral axis to the bottom fibre). */
  SxBottom: number;
  /** Iy / (distance from the neutral axis to the left fibre). */
  SyLeft: number;
  /** Iy / (distance from the neutral axis to the right fibre). */
  SyRight: number;
  Zx: number;
  Zy: number;
  rx: number;
  ry: number;
  Qx: number;
  tx: number;
  shearFactor: number;
  xBar: number;
  yBar: number;
  width: number;
  depth: number;
}

/** A rectangle from (x0, y0) to (x1, y1); sign -1 cuts a hole out of a rectangle it lies inside. */
export interface Block {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  sign: 1 | -1;
}

function positive(shape: SectionKind, name: string, value: number): void {
  if (!(Number.isFinite(value) && value > 0)) throw invalid(`${shape} ${name}: a dimension must be a positive number, got ${value}`);
}

function less(shape: SectionKind, name: string, value: number, limitText: string, limit: number): void {
  if (!(value < limit)) throw invalid(`${shape} ${name}: ${value} must be less than ${limitText} (${limit})`);
}

/** Checks the dimensions: all positive, walls thinner than the outer size. Messages name the dimension. */
export function validateSection(s: SectionShape): void {
  const kind = s.shape;
  for (const [name] of SECTION_DIMENSIONS[kind]) positive(kind, name, (s as unknown as Record<string, number>)[name]);
  switch (s.shape) {
    case "box":
      less(kind, "t", 2 * s.t, "half the width b", s.b);
      less(kind, "t", 2 * s.t, "half the depth h", s.h);
      break;
    case "tube":
      less(kind, "t", 2 * s.t, "half the diameter d", s.d);
      break;
    case "ibeam":
    case "channel":
      less(kind, "tf", 2 * s.tf, "half the depth d", s.d);
      less(kind, "tw", s.tw, "the flange width bf", s.bf);
      break;
    case "tee":
      less(kind, "tf", s.tf, "the depth d", s.d);
      less(kind, "tw", s.tw, "the flange width bf", s.bf);
      break;
  }
}

/** The shape as rectangles (holes negative), for the shapes made of rectangles. */
export function blocksOf(s: SectionShape): Block[] {
  const block = (x0: number, x1: number, y0: number, y1: number, sign: 1 | -1 = 1): Block => ({ x0, x1, y0, y1, sign });
  switch (s.shape) {
    case "rectangle":
      return [block(0, s.b, 0, s.h)];
    case "box":
      return [block(0, s.b, 0, s.h), block(s.t, s.b - s.t, s.t, s.h - s.t, -1)];
    case "ibeam": {
      const x0 = (s.bf - s.tw) / 2;
      return [block(0, s.bf, 0, s.tf), block(x0, x0 + s.tw, s.tf, s.d - s.tf), block(0, s.bf, s.d - s.tf, s.d)];
    }
    case "channel":
      return [block(0, s.bf, 0, s.tf), block(0, s.tw, s.tf, s.d - s.tf), block(0, s.bf, s.d - s.tf, s.d)];
    case "tee": {
      const x0 = (s.bf - s.tw) / 2;
      return [block(x0, x0 + s.tw, 0, s.d - s.tf), block(0, s.bf, s.d - s.tf, s.d)];
    }
    default:
      throw invalid(`${s.shape}: not made of rectangles`);
  }
}

/** One axis of a set of strips: [start, end) along the axis, the width across it, and the sign. */
interface Strip {
  a: number;
  b: number;
  w: number;
  sign: number;
}

interface AxisProperties {
  area: number;
  centroid: number;
  inertia: number;
  plastic: number;
  firstMoment: number;
  widthAtCentroid: number;
  shearFactor: number;
  extent: number;
}

/** ∫ |u - c| du from a to b. */
function absMoment(a: number, b: number, c: number): number {
  const F = (u: number) => ((u - c) * Math.abs(u - c)) / 2;
  return F(b) - F(a);
}

/** Section width at u: the strips covering u, counting a strip that starts at u (side +1) or ends at u (side -1). */
function widthAt(strips: Strip[], u: number, side: 1 | -1): number {
  let w = 0;
  for (const s of strips) if (side > 0 ? s.a <= u && u < s.b : s.a < u && u <= s.b) w += s.sign * s.w;
  return w;
}

/** First moment about c of the area beyond u (toward larger u). */
function firstMomentAbove(strips: Strip[], u: number, c: number): number {
  let q = 0;
  for (const s of strips) {
    const from = Math.max(s.a, u);
    if (s.b > from) q += (s.sign * s.w * ((s.b - c) ** 2 - (from - c) ** 2)) / 2;
  }
  return q;
}

function axisProperties(strips: Strip[]): AxisProperties {
  let area = 0;
  let moment = 0;
  for (const s of strips) {
    const a = s.sign * s.w * (s.b - s.a);
    area += a;
    moment += (a * (s.a + s.b)) / 2;
  }
  const centroid = moment / area;
  let inertia = 0;
  for (const s of strips) {
    const h = s.b - s.a;
    inertia += s.sign * s.w * (h ** 3 / 12 + h * ((s.a + s.b) / 2 - centroid) ** 2);
  }
  const cuts = [...new Set(strips.flatMap((s) => [s.a, s.b]))].sort((p, q) => p - q);
  const areaBelow = (u: number) => strips.reduce((sum, s) => sum + s.sign * s.w * Math.min(Math.max(u - s.a, 0), s.b - s.a), 0);
  let plasticAxis = centroid;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const lo = areaBelow(cuts[i]);
    const hi = areaBelow(cuts[i + 1]);
    if (hi >= area / 2 && hi > lo) {
      plasticAxis = cuts[i] + ((area / 2 - lo) / (hi - lo)) * (cuts[i + 1] - cuts[i]);
      break;
    }
  }
  let plastic = 0;
  for (const s of strips) plastic += s.sign * s.w * absMoment(s.a, s.b, plasticAxis);
  let shearFactor = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const w = widthAt(strips, (cuts[i] + cuts[i + 1]) / 2, 1);
    if (!(w > 0)) continue;
    const u = Math.min(Math.max(centroid, cuts[i]), cuts[i + 1]);
    shearFactor = Math.max(shearFactor, Math.abs(firstMomentAbove(strips, u, centroid)) / w);
  }
  return {
    area,
    centroid,
    inertia,
    plastic,
    firstMoment: firstMomentAbove(strips, centroid, centroid),
    widthAtCentroid: Math.min(widthAt(strips, centroid, 1), widthAt(strips, centroid, -1)),
    shearFactor,
    extent: cuts[cuts.length - 1] - cuts[0],
  };
}

/** Properties of a shape made of rectangles, by exact integration over the rectangles. */
export function blockProperties(blocks: Block[]): SectionProperties {
  const about = axisProperties(blocks.map((k) => ({ a: k.y0, b: k.y1, w: k.x1 - k.x0, sign: k.sign })));
  const across = axisProperties(blocks.map((k) => ({ a: k.x0, b: k.x1, w: k.y1 - k.y0, sign: k.sign })));
  const area = about.area;
  return {
    area,
    Ix: about.inertia,
    Iy: across.inertia,
    SxTop: about.inertia / (about.extent - about.centroid),
    SxBottom: about.inertia / about.centroid,
    SyLeft: across.inertia / across.centroid,
    SyRight: across.inertia / (across.extent - across.centroid),
    Zx: about.plastic,
    Zy: across.plastic,
    rx: Math.sqrt(about.inertia / area),
    ry: Math.sqrt(across.inertia / area),
    Qx: about.firstMoment,
    tx: about.widthAtCentroid,
    shearFactor: about.shearFactor,
    xBar: across.centroid,
    yBar: about.centroid,
    width: across.extent,
    depth: about.extent,
  };
}

/** Solid or hollow circle of outside diameter D and inside diameter d (0 when solid). */
function ringProperties(D: number, d: number): SectionProperties {
  const area = (Math.PI * (D * D - d * d)) / 4;
  const inertia = (Math.PI * (D ** 4 - d ** 4)) / 64;
  const modulus = inertia / (D / 2);
  const plastic = (D ** 3 - d ** 3) / 6;
  const q = (D ** 3 - d ** 3) / 12;
  const r = Math.sqrt(D * D + d * d) / 4;
  return {
    area,
    Ix: inertia,
    Iy: inertia,
    SxTop: modulus,
    SxBottom: modulus,
    SyLeft: modulus,
    SyRight: modulus,
    Zx: plastic,
    Zy: plastic,
    rx: r,
    ry: r,
    Qx: q,
    tx: D - d,
    shearFactor: q / (D - d),
    xBar: D / 2,
    yBar: D / 2,
    width: D,
    depth: D,
  };
}

/** The power of length each property carries (area 2, I 4, S, Z and Q 3, the rest 1). */
export const SECTION_POWERS: Record<keyof SectionProperties, number> = {
  area: 2, Ix: 4, Iy: 4, SxTop: 3, SxBottom: 3, SyLeft: 3, SyRight: 3, Zx: 3, Zy: 3,
  rx: 1, ry: 1, Qx: 3, tx: 1, shearFactor: 2, xBar: 1, yBar: 1, width: 1, depth: 1,
};

/** Smallest positive normal double: below it a value has lost digits (or become 0). */
const SMALLEST_NORMAL = 2.2250738585072014e-308;

function propertiesOf(s: SectionShape): SectionProperties {
  if (s.shape === "circle") return ringProperties(s.d, 0);
  if (s.shape === "tube") return ringProperties(s.d, s.d - 2 * s.t);
  return blockProperties(blocksOf(s));
}

/**
 * Properties of a validated shape (throws #VALUE! naming the dimension otherwise). They are
 * computed on the shape scaled by a power of two near its largest dimension (exact), then
 * scaled back, so dimensions of any size give full precision; a property whose value lies
 * outside the range of numbers (overflow, or underflow below 2.2e-308) is a #VALUE! naming it.
 */
export function sectionProperties(s: SectionShape): SectionProperties {
  validateSection(s);
  const dimensions = Object.entries(s).filter(([key]) => key !== "shape") as [string, number][];
  const largest = maxOf(dimensions.map(([, v]) => v));
  const exponent = Math.round(Math.log2(largest));
  if (exponent === 0) return propertiesOf(s);
  const unit = (power: number): number => Math.pow(2, exponent * power);
  const scaled = { ...s } as Record<string, number | string>;
  for (const [key, v] of dimensions) scaled[key] = v * Math.pow(2, -exponent);
  const base = propertiesOf(scaled as unknown as SectionShape);
  const out = {} as SectionProperties;
  for (const key of Object.keys(SECTION_POWERS) as (keyof SectionProperties)[]) {
    const power = SECTION_POWERS[key];
    // Two steps so the scale itself never overflows when the product would not.
    const value = base[key] * unit(power / 2) * unit(power / 2);
    if (!Number.isFinite(value) || (base[key] !== 0 && Math.abs(value) < SMALLEST_NORMAL)) {
      throw invalid(
        `${s.shape}: ${key} (length^${power}) is too ${Number.isFinite(value) ? "small" : "large"} to represent as a number (the dimensions reach ${largest}); give the dimensions in a ${largest > 1 ? "larger" : "smaller"} unit`,
      );
    }
    out[key] = value;
  }
  return out;
}
