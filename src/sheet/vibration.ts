/**
 * SPAN.FREQUENCIES and SPAN.MODESHAPE bodies. The member is read with the shared readers;
 * the mass is a mass per length given directly (one value or one per span), plus the loads
 * (under the combination) divided by g when loads are given. With the units argument EI is
 * converted to force x length^2 of the member's own length and force units, so the mass is
 * in force x s^2 / length^2 of those units (kg/m with N and m, t/m with kN and m) and g,
 * when not given, is standard gravity (9.80665 m/s^2) in the length unit per s^2.
 */
import {
  invalid,
  massesFromLoads,
  MAX_MODES,
  modeShape,
  modeValue,
  naturalFrequencies,
  spanMasses,
  type Mass,
  type VibrationModel,
} from "../core";
import { errorCodeOf, isBlank, readNumber, show } from "./cells";
import { COLUMNS, readHeaders, withHeaders } from "./headers";
import { guarded } from "./hostError";
import { readMember } from "./member";
import { isAllBlank, listEntries, rowsOf, singleCell } from "./ranges";
import { finite, mapPositions } from "./shape";
import { memberInOwnUnits, readMemberUnits, type MemberUnits } from "./units";

/** Standard acceleration of gravity, m/s^2 (CGPM 1901; NIST SP 811 lists it as exact). */
export const STANDARD_GRAVITY = 9.80665;

/** Most x cells one MODESHAPE call evaluates. */
export const MAX_MODE_POSITIONS = 10001;

/** The mass argument: null when blank; else one value for the member or one per span, each >= 0. */
export function readMass(arg: unknown, spanCount: number): number[] | null {
  if (isAllBlank(arg)) return null;
  const entries = listEntries(arg, "mass");
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  const values = entries.slice(0, count).map((e, i) => readNumber(e, () => (count === 1 ? "mass" : `mass entry ${i + 1}`), 0));
  if (values.length !== 1 && values.length !== spanCount) {
    throw invalid(`mass: give one mass per length for the member or one per span (${spanCount}), got ${values.length}`);
  }
  values.forEach((m, i) => {
    if (!(m >= 0)) throw invalid(`${values.length === 1 ? "mass" : `mass entry ${i + 1}`}: a mass per length must be 0 or more, got ${m}`);
  });
  return values;
}

/** A positive-number cell argument, or null when blank. */
function readPositive(arg: unknown, name: string): number | null {
  const cell = singleCell(arg ?? null);
  if (cell === undefined) throw invalid(`${name}: give one cell`);
  if (isBlank(cell)) return null;
  const value = readNumber(cell, () => name);
  if (!(value > 0)) throw invalid(`${name}: must be a positive number, got ${value}`);
  return value;
}

/** The modes argument: how many frequencies (blank = 1), a whole number from 1 to MAX_MODES. */
export function readModeCount(arg: unknown, name: string, blank: number | null): number {
  const cell = singleCell(arg ?? null);
  if (cell === undefined) throw invalid(`${name}: give one cell with a whole number of modes`);
  if (isBlank(cell)) {
    if (blank === null) throw invalid(`${name}: give the mode number, 1 for the first (lowest) mode`);
    return blank;
  }
  const code = errorCodeOf(cell);
  if (code !== null) throw invalid(`${name}: the cell holds the error ${code}`);
  const value = readNumber(cell, () => name);
  if (!Number.isInteger(value) || value < 1 || value > MAX_MODES) {
    throw invalid(`${name}: give a whole number from 1 to ${MAX_MODES}, got ${show(cell)}`);
  }
  return value;
}

interface VibrationArgs {
  spans: unknown;
  EI: unknown;
  mass: unknown;
  supports: unknown;
  loads: unknown;
  combo: unknown;
  units: unknown;
  g: unknown;
}

/** The vibration model in the member's own units (consistent, or the units argument's length and force). */
export function readVibrationModel(a: VibrationArgs): VibrationModel {
  const units: MemberUnits | null = readMemberUnits(a.units ?? null);
  const read = readMember({ spans: a.spans, loads: a.loads ?? null, supports: a.supports ?? null, EI: a.EI ?? null, combo: a.combo ?? null });
  const member = units === null ? read : memberInOwnUnits(read, units);
  const perLength = readMass(a.mass, member.spans.length);
  const given = readPositive(a.g, "g");
  const masses: Mass[] = perLength === null ? [] : spanMasses(member.spans, perLength);
  if (member.loads.length > 0) {
    const g = given ?? (units === null ? null : STANDARD_GRAVITY / units.length.factor);
    if (g === null) {
      throw invalid("g: the mass from the loads needs the acceleration of gravity in your length unit per s^2 (9.80665 for m, 32.174 for ft), or the units argument");
    }
    masses.push(...massesFromLoads(member.loads, g));
  }
  if (perLength === null && member.loads.length === 0) {
    throw invalid("mass: give a mass per length, or loads (with g) that give the mass");
  }
  return { member, masses };
}

/** SPAN.FREQUENCIES: rows [mode, frequency in Hz, circular frequency in rad/s]. */
export function sheetFrequencies(
  spans: unknown,
  EI: unknown,
  mass: unknown,
  modes: unknown,
  supports: unknown,
  loads: unknown,
  combo: unknown,
  units: unknown,
  g: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const count = readModeCount(modes, "modes", 1);
    const header = readHeaders(headers);
    const model = readVibrationModel({ spans, EI, mass, supports, loads, combo, units, g });
    const rows = naturalFrequencies(model, count).map((omega, i) => [i + 1, finite(omega / (2 * Math.PI), "a frequency"), finite(omega, "a circular frequency")]);
    return withHeaders(rows, header, COLUMNS.frequencies, null);
  });
}

/** SPAN.MODESHAPE: the mode's deflection at each x, normalised to a largest |w| of 1, in the shape of x. */
export function sheetModeShape(
  spans: unknown,
  EI: unknown,
  mass: unknown,
  mode: unknown,
  x: unknown,
  supports: unknown,
  loads: unknown,
  combo: unknown,
  units: unknown,
  g: unknown,
): (number | string)[][] {
  return guarded(() => {
    const number = readModeCount(mode, "mode", null);
    const cells = rowsOf(x).reduce((n, row) => n + (Array.isArray(row) ? row.length : 1), 0);
    if (cells > MAX_MODE_POSITIONS) throw invalid(`x: ${cells} cells; at most ${MAX_MODE_POSITIONS} positions are taken in one call`);
    const model = readVibrationModel({ spans, EI, mass, supports, loads, combo, units, g });
    // Positions are checked before the mode is solved, so a bad x cell is named quickly.
    mapPositions(x, () => 0);
    const shape = modeShape(model, number);
    return mapPositions(x, (position) => modeValue(shape, position));
  });
}
