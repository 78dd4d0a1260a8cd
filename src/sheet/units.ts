/**
 * Unit labels as the sheet gives them: one unit in a cell ("kip/ft", "mm^4"), and the
 * `units` argument of the check functions, which labels a member's inputs and the results
 * wanted: key=unit pairs separated by commas, semicolons or spaces, in one cell or spread over
 * cells (a two-column range of key | unit also works), e.g. "length=ft, force=kip, EI=kip*in^2,
 * section=in, stress=ksi". No spaces inside a unit: write kip*ft or kip-ft.
 *
 * Keys: length (spans, x, load positions), force (loads: forces, force/length, force x length),
 * EI (stiffness; default force x length^2), section (the length unit of section properties;
 * default length), stress (results; default force/section^2), deflection (results; default length).
 * Without a units argument every value is taken in consistent units, as before.
 */
import { derivedUnit, invalid, parseUnitOf, rotationalSpring, type DimensionName, type Member, type Support, type Unit } from "../core";
import { errorCodeOf, isEmpty, show } from "./cells";
import { rowsOf, singleCell } from "./ranges";

/** Reads one unit cell: "" (blank) gives null; otherwise the unit, which must measure `quantity`. */
export function readUnit(arg: unknown, quantity: DimensionName, name: string): Unit | null {
  const cell = singleCell(arg);
  if (cell === undefined) throw invalid(`${name}: give one cell with a unit`);
  if (isEmpty(cell) || cell === 0) return null;
  const code = errorCodeOf(cell);
  if (code !== null) throw invalid(`${name}: the cell holds the error ${code}`);
  if (typeof cell !== "string") throw invalid(`${name}: ${show(cell)} is not a unit; write one such as ${example(quantity)}`);
  return parseUnitOf(cell, quantity, name);
}

function example(quantity: DimensionName): string {
  const examples: Record<DimensionName, string> = {
    length: "m, mm, ft or in",
    force: "kN or kip",
    "force/length": "kN/m or kip/ft",
    "force x length": "kN*m or kip*ft",
    "force/length^2": "MPa or ksi",
    "length^2": "mm^2 or in^2",
    "length^3": "mm^3 or in^3",
    "length^4": "mm^4 or in^4",
    "force x length^2": "kN*m^2 or kip*in^2",
  };
  return examples[quantity];
}

/** The keys of the units argument and the quantity each measures. */
export const UNIT_KEYS: Record<string, DimensionName> = {
  length: "length",
  force: "force",
  EI: "force x length^2",
  section: "length",
  stress: "force/length^2",
  deflection: "length",
};

/** The member's units, with the defaults filled in. Factors convert to metres and newtons. */
export interface MemberUnits {
  length: Unit;
  force: Unit;
  EI: Unit;
  section: Unit;
  stress: Unit;
  deflection: Unit;
}

function isSeparator(ch: string): boolean {
  return ch === "," || ch === ";" || ch.trim() === "";
}

function isSpace(ch: string): boolean {
  return ch !== "," && ch !== ";" && ch.trim() === "";
}

/**
 * The key=unit pairs of the text, one at a time (so that reading stops at the first bad
 * pair): pairs are separated by commas, semicolons or spaces; "=" or ":" joins key and unit,
 * with optional spaces around it. One left-to-right scan, linear in the length of the text.
 */
function* pairsIn(text: string): Generator<string> {
  const n = text.length;
  let i = 0;
  while (i < n) {
    while (i < n && isSeparator(text[i])) i++;
    if (i >= n) return;
    let j = i;
    while (j < n && !isSeparator(text[j]) && text[j] !== "=" && text[j] !== ":") j++;
    let k = j;
    while (k < n && isSpace(text[k])) k++;
    if (k < n && (text[k] === "=" || text[k] === ":")) {
      k++;
      while (k < n && isSpace(text[k])) k++;
      let m = k;
      while (m < n && !isSeparator(text[m])) m++;
      yield `${text.slice(i, j)}=${text.slice(k, m)}`;
      i = m;
    } else {
      yield text.slice(i, j === i ? i + 1 : j);
      i = j === i ? i + 1 : j;
    }
  }
}

function pairsOf(arg: unknown): Generator<string> {
  const parts: string[] = [];
  for (const row of rowsOf(arg)) {
    const cells = (Array.isArray(row) ? row : [row]).filter((cell) => !isEmpty(cell) && cell !== 0);
    for (const cell of cells) {
      const code = errorCodeOf(cell);
      if (code !== null) throw invalid(`units: a cell holds the error ${code}`);
      if (typeof cell !== "string") throw invalid(`units: ${show(cell)} is not a unit label; write pairs such as length=ft, force=kip`);
    }
    const texts = cells as string[];
    if (texts.length === 2 && !texts[0].includes("=") && !texts[1].includes("=")) parts.push(`${texts[0].trim()}=${texts[1].trim()}`);
    else for (const text of texts) parts.push(text);
  }
  return pairsIn(parts.join(","));
}

/**
 * How many units texts are kept read (a workbook gives its formulas a few labels; every
 * formula's call reads its units argument, including calls the member cache answers, and
 * reading one takes about 10 µs against well under 1 µs for a cached call without units).
 */
export const UNITS_MEMO = 32;

/** Units texts read recently, oldest first (Map keeps insertion order). Only texts that read without error are kept. */
const unitsByText = new Map<string, MemberUnits | null>();

/** The text of a units argument given as one text cell (alone or as a 1 x 1 range), the form kept read; else null. */
function unitsText(arg: unknown): string | null {
  if (typeof arg === "string") return arg;
  if (Array.isArray(arg) && arg.length === 1) {
    const row: unknown = arg[0];
    if (typeof row === "string") return row;
    if (Array.isArray(row) && row.length === 1 && typeof row[0] === "string") return row[0];
  }
  return null;
}

/**
 * Reads the units argument: null when it is blank (consistent units). A text read before
 * gives the same (frozen) result without reading it again; any other form is read each time.
 */
export function readMemberUnits(arg: unknown): MemberUnits | null {
  if (arg === null || arg === undefined) return null;
  const text = unitsText(arg);
  if (text === null) return parseMemberUnits(arg);
  const kept = unitsByText.get(text);
  if (kept !== undefined) return kept;
  const units = parseMemberUnits(text);
  if (units !== null) {
    Object.freeze(units);
    for (const unit of Object.values(units)) Object.freeze(unit);
  }
  if (unitsByText.size >= UNITS_MEMO) unitsByText.delete(unitsByText.keys().next().value as string);
  unitsByText.set(text, units);
  return units;
}

function parseMemberUnits(arg: unknown): MemberUnits | null {
  const given = new Map<string, Unit>();
  let pairs = 0;
  for (const pair of pairsOf(arg)) {
    pairs++;
    const [rawKey, text, extra] = pair.split("=");
    const key = Object.keys(UNIT_KEYS).find((k) => k.toLowerCase() === (rawKey ?? "").toLowerCase());
    if (extra !== undefined || text === undefined || text === "") {
      throw invalid(`units: cannot read "${pair}"; write key=unit pairs such as length=ft, force=kip`);
    }
    if (key === undefined) throw invalid(`units: unknown key "${rawKey}"; use ${Object.keys(UNIT_KEYS).join(", ")}`);
    if (given.has(key)) throw invalid(`units: ${key} is given twice`);
    given.set(key, parseUnitOf(text, UNIT_KEYS[key], `units ${key}`));
  }
  if (pairs === 0) return null;
  const length = given.get("length");
  const force = given.get("force");
  if (!length || !force) throw invalid(`units: give both length and force (for example length=ft, force=kip); got ${[...given.keys()].join(", ")}`);
  const section = given.get("section") ?? length;
  return {
    length,
    force,
    section,
    EI: given.get("EI") ?? derivedUnit(length, force, 2, 1),
    stress: given.get("stress") ?? derivedUnit(section, force, -2, 1),
    deflection: given.get("deflection") ?? length,
  };
}

/** A support in newtons and metres: a vertical spring is force/length, a rotational spring force x length per radian. */
function supportInSI(support: Support, F: number, L: number): Support {
  const rotational = rotationalSpring(support);
  const turned = rotational > 0 ? { rotational: rotational * F * L } : {};
  if (support.kind === "spring") return { kind: "spring", stiffness: (support.stiffness * F) / L, ...turned };
  if (support.kind === "pin" || support.kind === "free") return { kind: support.kind, ...turned };
  return support;
}

/** The member in metres and newtons, from a member read in the given units. */
export function memberInSI(member: Member, units: MemberUnits): Member {
  const L = units.length.factor;
  const F = units.force.factor;
  return {
    spans: member.spans.map((s) => s * L),
    supports: member.supports.map((s) => supportInSI(s, F, L)),
    stiffness: member.stiffness === null ? null : member.stiffness.map((ei) => ei * units.EI.factor),
    ...(member.shear ? { shear: member.shear.map((ga) => (ga === null ? null : ga * F)) } : {}),
    loads: member.loads.map((load) => {
      // A settlement is a displacement, given in the deflection unit.
      const scale = load.kind === "settle" ? units.deflection.factor : load.kind === "point" ? F : load.kind === "moment" ? F * L : F / L;
      return { ...load, magnitude: load.magnitude * scale, magnitudeEnd: load.magnitudeEnd * scale, xStart: load.xStart * L, xEnd: load.xEnd * L };
    }),
  };
}

/**
 * The member in the user's own length and force units: only EI changes (to force x length^2
 * of those units), and a settlement (from the deflection unit to the length unit; G·A_v is in
 * the force unit already), so every result comes out in the units the member was written in, with
 * deflection in the length unit. Used where results are drawn rather than converted.
 */
export function memberInOwnUnits(member: Member, units: MemberUnits): Member {
  const consistent = units.force.factor * units.length.factor * units.length.factor;
  const scale = units.EI.factor / consistent;
  const stiffness = member.stiffness === null ? null : member.stiffness.map((ei) => ei * scale);
  if (!member.loads.some((load) => load.kind === "settle")) return { ...member, stiffness };
  // A settlement is given in the deflection unit; in the member's own units it is a length.
  const toLength = units.deflection.factor / units.length.factor;
  return { ...member, stiffness, loads: member.loads.map((load) => (load.kind === "settle" ? { ...load, magnitude: load.magnitude * toLength } : load)) };
}
