/**
 * A small table of structural units, by dimension vectors over length and force, so that any
 * product of table units parses: "kip/ft", "kN*m^2", "in^4", "N/mm^2", "kip-ft", "mm4".
 *
 * Every unit's factor converts it to the SI base (metre, newton). The customary factors are
 * those of NIST Special Publication 811 (2008 edition), Appendix B (from memory):
 * 1 ft = 0.3048 m and 1 in = 0.0254 m exactly (international foot and inch);
 * 1 lbf = 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly (international
 * avoirdupois pound under standard gravity, both exact by definition); 1 kip = 1000 lbf.
 * No unit has an offset (no temperatures), so conversion is one multiplication.
 */
import { invalid } from "./errors";

/** Exponents of length and force. Stress is [-2, 1], EI is [2, 1], I is [4, 0]. */
export type Dimension = readonly [length: number, force: number];

/** A parsed unit: its factor to metres and newtons, its dimension, and its text as written. */
export interface Unit {
  factor: number;
  dimension: Dimension;
  text: string;
}

/** NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m exactly. */
export const FOOT = 0.3048;
/** NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m exactly. */
export const INCH = 0.0254;
/** NIST SP 811 (2008), Appendix B: 1 lbf = 4.4482216152605 N exactly (0.45359237 kg x 9.80665 m/s^2). */
export const POUND_FORCE = 0.45359237 * 9.80665;
/** NIST SP 811 (2008), Appendix B: 1 kip = 1000 lbf. */
export const KIP = 1000 * POUND_FORCE;

const L: Dimension = [1, 0];
const F: Dimension = [0, 1];
const STRESS: Dimension = [-2, 1];
const LINE: Dimension = [-1, 1];

/** The table: every name a unit may be written with (matched ignoring case; unambiguous so). */
const TABLE: Record<string, { factor: number; dimension: Dimension }> = {
  m: { factor: 1, dimension: L },
  mm: { factor: 1e-3, dimension: L },
  cm: { factor: 1e-2, dimension: L },
  km: { factor: 1e3, dimension: L },
  ft: { factor: FOOT, dimension: L },
  in: { factor: INCH, dimension: L },
  n: { factor: 1, dimension: F },
  kn: { factor: 1e3, dimension: F },
  mn: { factor: 1e6, dimension: F },
  lbf: { factor: POUND_FORCE, dimension: F },
  lb: { factor: POUND_FORCE, dimension: F },
  kip: { factor: KIP, dimension: F },
  kips: { factor: KIP, dimension: F },
  pa: { factor: 1, dimension: STRESS },
  kpa: { factor: 1e3, dimension: STRESS },
  mpa: { factor: 1e6, dimension: STRESS },
  gpa: { factor: 1e9, dimension: STRESS },
  psi: { factor: POUND_FORCE / (INCH * INCH), dimension: STRESS },
  ksi: { factor: KIP / (INCH * INCH), dimension: STRESS },
  psf: { factor: POUND_FORCE / (FOOT * FOOT), dimension: STRESS },
  ksf: { factor: KIP / (FOOT * FOOT), dimension: STRESS },
  plf: { factor: POUND_FORCE / FOOT, dimension: LINE },
  klf: { factor: KIP / FOOT, dimension: LINE },
};

/** The unit names the table knows, as they are best written. */
export const UNIT_NAMES: readonly string[] = [
  "m", "mm", "cm", "km", "ft", "in", "N", "kN", "MN", "lbf", "lb", "kip", "kips",
  "Pa", "kPa", "MPa", "GPa", "psi", "ksi", "psf", "ksf", "plf", "klf",
];

/** Named dimensions of the structural quantities. */
export const DIMENSIONS = {
  length: [1, 0],
  force: [0, 1],
  "force/length": [-1, 1],
  "force x length": [1, 1],
  "force/length^2": [-2, 1],
  "length^2": [2, 0],
  "length^3": [3, 0],
  "length^4": [4, 0],
  "force x length^2": [2, 1],
} as const satisfies Record<string, Dimension>;

export type DimensionName = keyof typeof DIMENSIONS;

const SUPERSCRIPTS: Record<string, string> = { "⁻": "-", "¹": "1", "²": "2", "³": "3", "⁴": "4", "⁵": "5", "⁶": "6" };

/** "force/length^2" style name of a dimension; the named ones first. */
export function dimensionName(dimension: Dimension): string {
  for (const [name, d] of Object.entries(DIMENSIONS)) if (sameDimension(d, dimension)) return name;
  if (dimension[0] === 0 && dimension[1] === 0) return "a pure number";
  const part = (name: string, power: number): string => (power === 1 ? name : `${name}^${power}`);
  const up: string[] = [];
  const down: string[] = [];
  if (dimension[1] !== 0) (dimension[1] > 0 ? up : down).push(part("force", Math.abs(dimension[1])));
  if (dimension[0] !== 0) (dimension[0] > 0 ? up : down).push(part("length", Math.abs(dimension[0])));
  const top = up.length === 0 ? "1" : up.join(" x ");
  return down.length === 0 ? top : `${top}/${down.join(" x ")}`;
}

export function sameDimension(a: Dimension, b: Dimension): boolean {
  return a[0] === b[0] && a[1] === b[1];
}

/** One factor where the scan stands (sticky): a name, then an optional power "^2", "^-1" or "2". */
const FACTOR = /([A-Za-z]+)(?:\^([+-]?\d+)|(\d+))?/y;
const SPACES = /\s*/y;

/** Most factors in one unit expression ("kip*in^2/ft" has three). */
export const MAX_UNIT_FACTORS = 12;
/** Largest power of one factor ("m^4" is 4). */
export const MAX_UNIT_POWER = 12;

/** Index just past the spaces starting at `at`. */
function skipSpaces(text: string, at: number): number {
  SPACES.lastIndex = at;
  SPACES.exec(text);
  return SPACES.lastIndex;
}

/**
 * Parses a unit expression: table names joined by "*", "·", "." or "-" (product) and "/"
 * (each "/" divides by the factor after it), each with an optional power written "^2", "2"
 * or "²"; spaces may stand around an operator. At most MAX_UNIT_FACTORS factors, powers up
 * to MAX_UNIT_POWER. Throws #VALUE! naming `name` for anything else. One left-to-right scan:
 * linear in the length of the text.
 */
export function parseUnit(text: string, name: string): Unit {
  let source = text.trim();
  for (const [sup, plain] of Object.entries(SUPERSCRIPTS)) source = source.split(sup).join(sup === "⁻" ? "^-" : plain);
  source = source.split("^^").join("^");
  if (source === "") throw invalid(`${name}: the unit is blank; write one such as kN/m or kip/ft`);
  const shown = text.trim().length <= 40 ? text.trim() : `${text.trim().slice(0, 37)}...`;
  const near = (at: number) => source.slice(at, at + 12);
  const cannotRead = (at: number) => invalid(`${name}: cannot read the unit "${shown}" at "${near(at)}"; join units with * or / (for example kN*m^2, kip/ft)`);
  let factor = 1;
  let length = 0;
  let force = 0;
  let count = 0;
  let at = 0;
  while (at < source.length) {
    let sign = 1;
    if (count > 0) {
      const opAt = skipSpaces(source, at);
      const op = source[opAt];
      if (op === "/") sign = -1;
      else if (op !== "*" && op !== "·" && op !== "." && op !== "-") throw cannotRead(at);
      at = skipSpaces(source, opAt + 1);
    }
    FACTOR.lastIndex = at;
    const match = FACTOR.exec(source);
    if (!match) throw cannotRead(at);
    const entry = Object.prototype.hasOwnProperty.call(TABLE, match[1].toLowerCase()) ? TABLE[match[1].toLowerCase()] : undefined;
    if (!entry) throw invalid(`${name}: unknown unit "${match[1].length <= 20 ? match[1] : `${match[1].slice(0, 17)}...`}" in "${shown}"; known units: ${UNIT_NAMES.join(", ")}`);
    if (++count > MAX_UNIT_FACTORS) throw invalid(`${name}: the unit "${shown}" has more than ${MAX_UNIT_FACTORS} factors`);
    const written = match[2] ?? match[3];
    const power = sign * (written === undefined ? 1 : written.length > 3 ? Infinity : Number(written));
    if (power === 0 || !Number.isInteger(power) || Math.abs(power) > MAX_UNIT_POWER) {
      throw invalid(`${name}: the power in "${match[0].length <= 20 ? match[0] : `${match[0].slice(0, 17)}...`}" must be a whole number other than 0, from -${MAX_UNIT_POWER} to ${MAX_UNIT_POWER}`);
    }
    factor *= entry.factor ** power;
    length += entry.dimension[0] * power;
    force += entry.dimension[1] * power;
    at = FACTOR.lastIndex;
  }
  return { factor, dimension: [length, force], text: text.trim() };
}

/** Parses a unit and checks it measures the named quantity; the message names `name`. */
export function parseUnitOf(text: string, expected: DimensionName, name: string): Unit {
  const unit = parseUnit(text, name);
  if (!sameDimension(unit.dimension, DIMENSIONS[expected])) {
    throw invalid(`${name}: "${unit.text}" measures ${dimensionName(unit.dimension)}, not ${expected}`);
  }
  return unit;
}

/** Converts a value between two units of the same dimension. */
export function convert(value: number, from: Unit, to: Unit): number {
  if (!sameDimension(from.dimension, to.dimension)) {
    throw invalid(`cannot convert ${dimensionName(from.dimension)} ("${from.text}") to ${dimensionName(to.dimension)} ("${to.text}")`);
  }
  return (value * from.factor) / to.factor;
}

/** The unit length^a x force^b built from a length unit and a force unit (text joined with *). */
export function derivedUnit(lengthUnit: Unit, forceUnit: Unit, lengthPower: number, forcePower: number): Unit {
  const part = (u: Unit, p: number): string => (p === 1 ? u.text : `${u.text}^${p}`);
  const up: string[] = [];
  const down: string[] = [];
  if (forcePower !== 0) (forcePower > 0 ? up : down).push(part(forceUnit, Math.abs(forcePower)));
  if (lengthPower !== 0) (lengthPower > 0 ? up : down).push(part(lengthUnit, Math.abs(lengthPower)));
  const text = (up.length === 0 ? "1" : up.join("*")) + (down.length === 0 ? "" : "/" + down.join("/"));
  return {
    factor: lengthUnit.factor ** lengthPower * forceUnit.factor ** forcePower,
    dimension: [lengthPower * lengthUnit.dimension[0] + forcePower * forceUnit.dimension[0], lengthPower * lengthUnit.dimension[1] + forcePower * forceUnit.dimension[1]],
    text,
  };
}
