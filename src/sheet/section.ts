/**
 * SPAN.SECTION's arguments and result: a shape name, its dimensions (a row, column or one
 * text cell "d bf tf tw"), the dimensions' length unit and the results' length unit.
 * The result is a table of rows `property, value, unit` that the check functions also read
 * back as their section argument.
 */
import { invalid, isSpanError, SECTION_DIMENSIONS, sectionProperties, type SectionKind, type SectionProperties, type SectionShape, type Unit } from "../core";
import { isBlank, readNumber } from "./cells";
import { guarded } from "./hostError";
import { listEntries } from "./ranges";
import { readUnit } from "./units";

const SHAPE_NAMES: Record<string, SectionKind> = Object.assign(Object.create(null) as Record<string, SectionKind>, {
  rectangle: "rectangle",
  rect: "rectangle",
  circle: "circle",
  round: "circle",
  box: "box",
  hollowrectangle: "box",
  hollowrect: "box",
  tube: "tube",
  pipe: "tube",
  hollowcircle: "tube",
  i: "ibeam",
  ibeam: "ibeam",
  isection: "ibeam",
  channel: "channel",
  c: "channel",
  tee: "tee",
  t: "tee",
});

/** Rows of the result: label, property, power of length. The check functions find rows by these labels. */
export const SECTION_ROWS: readonly (readonly [label: string, key: keyof SectionProperties, power: number])[] = [
  ["area", "area", 2],
  ["Ix", "Ix", 4],
  ["Iy", "Iy", 4],
  ["Sx top", "SxTop", 3],
  ["Sx bottom", "SxBottom", 3],
  ["Sy left", "SyLeft", 3],
  ["Sy right", "SyRight", 3],
  ["Zx", "Zx", 3],
  ["Zy", "Zy", 3],
  ["rx", "rx", 1],
  ["ry", "ry", 1],
  ["Qx", "Qx", 3],
  ["width at axis", "tx", 1],
  ["Q/t max", "shearFactor", 2],
  ["centroid x", "xBar", 1],
  ["centroid y", "yBar", 1],
];

/** Reads the shape argument: rectangle, circle, box, tube, I, channel or tee (and a few plain synonyms). */
export function readShape(arg: unknown): SectionKind {
  const entries = listEntries(arg, "shape");
  const text = entries.map((e) => (typeof e === "string" ? e : "")).join("");
  const kind = SHAPE_NAMES[text.toLowerCase().replace(/[\s_-]+/g, "")];
  if (entries.length === 0 || kind === undefined) {
    throw invalid(`shape: ${entries.length === 0 ? "blank" : JSON.stringify(entries.join(" "))} is not a shape; use rectangle, circle, box, tube, I, channel or tee`);
  }
  return kind;
}

/** Reads the dimensions for a shape, in order, as numbers (scaled by `scale`). */
export function readDimensions(kind: SectionKind, arg: unknown, scale: number): SectionShape {
  const names = SECTION_DIMENSIONS[kind];
  const entries = listEntries(arg, "dimensions");
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  const expected = names.map(([n, meaning]) => `${n} (${meaning})`).join(", ");
  if (count !== names.length) throw invalid(`dimensions: a ${kind} takes ${names.length}: ${expected}; got ${count}`);
  const shape: Record<string, number | string> = { shape: kind };
  names.forEach(([n], i) => {
    shape[n] = readNumber(entries[i], () => `dimensions entry ${i + 1} (${n})`) * scale;
  });
  return shape as unknown as SectionShape;
}

function unitText(unit: Unit | null, power: number): string {
  if (unit === null) return "";
  return power === 1 ? unit.text : `${unit.text}^${power}`;
}

/** SPAN.SECTION: rows [property, value, unit]. */
export function sheetSection(shape: unknown, dimensions: unknown, unit: unknown, resultUnit: unknown): (number | string)[][] {
  return guarded(() => {
    const kind = readShape(shape);
    const from = readUnit(unit ?? null, "length", "unit");
    const to = readUnit(resultUnit ?? null, "length", "result unit");
    if (to !== null && from === null) throw invalid("result unit: give the dimensions' unit too, so they can be converted");
    const out = to ?? from;
    const scale = from !== null && out !== null ? from.factor / out.factor : 1;
    const dims = readDimensions(kind, dimensions, scale);
    let properties: SectionProperties;
    try {
      properties = sectionProperties(dims);
    } catch (error) {
      throw isSpanError(error) ? invalid(`dimensions: ${error.message}`) : error;
    }
    return SECTION_ROWS.map(([label, key, power]) => [label, properties[key], unitText(out, power)]);
  });
}
