/**
 * The check functions' bodies: bending and shear stress, deflection against a stated limit,
 * utilisation, unit conversion and E x I. Arguments as the host passes them; every body runs
 * guarded. With a units argument the member is solved in its own length and force units (see
 * solvedMember); moments and deflections are brought to metres and newtons here, checked
 * against the section in SI, and shown in the units asked for. Without one, everything is in
 * the user's consistent units.
 */
import {
  averageShearStress,
  checkCount,
  LIMITS,
  convert,
  extremes,
  fibreStresses,
  invalid,
  largestMagnitude,
  parseDeflectionLimit,
  parseUnit,
  parseUnitOf,
  peakShearStress,
  sameDimension,
  dimensionName,
  spanDeflections,
  unavailable,
  utilisation,
  type DimensionName,
  type Solution,
  type Unit,
} from "../core";
import { errorCodeOf, isBlank, isEmpty, numberFromText, readNumber, show } from "./cells";
import { COLUMNS, readHeaders, withHeaders } from "./headers";
import { guarded } from "./hostError";
import type { MemberArgs } from "./member";
import { listEntries, rowsOf } from "./ranges";
import { finite } from "./shape";
import { readMemberUnits, readUnit, type MemberUnits } from "./units";
import { solvedMember } from "./worksheet";

interface Solved {
  solution: Solution;
  units: MemberUnits | null;
}

function solvedWithUnits(spans: unknown, loads: unknown, supports: unknown, EI: unknown, combo: unknown, unitsArg: unknown): Solved {
  const args: MemberArgs = { spans, loads, supports: supports ?? null, EI: EI ?? null, combo: combo ?? null };
  const units = readMemberUnits(unitsArg ?? null);
  return { solution: solvedMember({ ...args, units: units === null ? null : unitsArg }, units), units };
}

/** A value of the section argument and the unit it came with (from a SECTION table's unit column). */
interface SectionValue {
  value: number;
  unit: Unit | null;
}

function isLabelTable(rows: unknown[][]): boolean {
  const first = rows[0]?.[0];
  return rows.length > 1 && typeof first === "string" && numberFromText(first) === null && errorCodeOf(first) === null;
}

/** Looks up a row of a SPAN.SECTION result by its label. */
function tableValue(rows: unknown[][], label: string, quantity: DimensionName): SectionValue {
  const index = rows.findIndex((row) => typeof row[0] === "string" && row[0].trim().toLowerCase() === label.toLowerCase());
  if (index < 0) throw invalid(`section: the table has no "${label}" row; give a SPAN.SECTION result or the numbers`);
  const row = rows[index];
  const value = readNumber(row[1], () => `section row ${index + 1} (${label})`);
  const unit = row.length > 2 && !isEmpty(row[2]) ? parseUnitOf(String(row[2]), quantity, `section row ${index + 1} (${label}) unit`) : null;
  return { value, unit };
}

/** The section argument: labelled rows picked by `labels`, or numbers in the order of `counts`' longest list. */
function readSection(arg: unknown, labels: readonly (readonly [string, DimensionName])[], counts: readonly number[], help: string): SectionValue[] {
  const rows = rowsOf(arg);
  if (isLabelTable(rows)) return labels.map(([label, quantity]) => tableValue(rows, label, quantity));
  const entries = listEntries(arg, "section");
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  if (!counts.includes(count)) throw invalid(`section: give ${help}, or a SPAN.SECTION result; got ${count} values`);
  return entries.slice(0, count).map((e, i) => ({ value: readNumber(e, () => `section entry ${i + 1}`), unit: null }));
}

/** A section value in SI (or as given without units); `power` is its power of the section length. */
function sectionSI(v: SectionValue, units: MemberUnits | null, power: number, name: string): number {
  if (!(v.value > 0)) throw invalid(`section: ${name} must be a positive number, got ${v.value}`);
  if (units === null) {
    if (v.unit !== null) throw invalid(`units: the section table carries units (${v.unit.text}); give the member's units too, such as length=ft, force=kip`);
    return v.value;
  }
  return v.value * (v.unit !== null ? v.unit.factor : units.section.factor ** power);
}

const out = (value: number, unit: Unit | null) => (unit === null ? value : value / unit.factor);

/** A moment (force x length of the member's own units) in SI, for checks against an SI section. */
const momentSI = (value: number, units: MemberUnits | null) => (units === null ? value : value * units.force.factor * units.length.factor);
const forceSI = (value: number, units: MemberUnits | null) => (units === null ? value : value * units.force.factor);
/** A deflection (in the member's length unit) in the deflection unit asked for. */
const deflectionShown = (value: number, units: MemberUnits | null) => (units === null ? value : (value * units.length.factor) / units.deflection.factor);

/** SPAN.STRESS: rows [fibre, largest stress, x, smallest stress, x]; tension +. */
export function sheetStress(
  spans: unknown,
  loads: unknown,
  section: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, units: u } = solvedWithUnits(spans, loads, supports, EI, combo, units);
    const values = readSection(section, [["Sx top", "length^3"], ["Sx bottom", "length^3"]], [1, 2], "S (one value) or S top and S bottom");
    const top = sectionSI(values[0], u, 3, "S top");
    const bottom = values.length > 1 ? sectionSI(values[1], u, 3, "S bottom") : top;
    const m = extremes(solution, "moment");
    const moment = { ...m, max: momentSI(m.max, u), min: momentSI(m.min, u) };
    const rows = fibreStresses(moment, top, bottom).map((f) => [
      f.fibre,
      finite(out(f.max, u && u.stress), `the largest ${f.fibre} stress`),
      f.xMax,
      finite(out(f.min, u && u.stress), `the smallest ${f.fibre} stress`),
      f.xMin,
    ]);
    return withHeaders(rows, header, COLUMNS.stress, u);
  });
}

/** SPAN.SHEARSTRESS: rows [average, V/A, x] and [peak, V Q/(I t), x] at the largest |V|. */
export function sheetShearStress(
  spans: unknown,
  loads: unknown,
  section: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const header = readHeaders(headers);
    const { solution, units: u } = solvedWithUnits(spans, loads, supports, EI, combo, units);
    const values = readSection(section, [["area", "length^2"], ["Ix", "length^4"], ["Q/t max", "length^2"]], [1, 4], "A, or A I Q t");
    const peakV = largestMagnitude(extremes(solution, "shear"));
    const V = { value: forceSI(peakV.value, u), x: peakV.x };
    const x = V.x;
    const area = sectionSI(values[0], u, 2, "A");
    const average = finite(out(averageShearStress(V.value, area), u && u.stress), "the average shear stress");
    if (values.length === 1) return withHeaders([["average", average, x], ["peak", "", ""]], header, COLUMNS.shearStress, u);
    const I = sectionSI(values[1], u, 4, "I");
    const peak =
      values.length === 3
        ? peakShearStress(V.value, sectionSI(values[2], u, 2, "Q/t max"), I, 1)
        : peakShearStress(V.value, sectionSI(values[2], u, 3, "Q"), I, sectionSI(values[3], u, 1, "t"));
    return withHeaders([["average", average, x], ["peak", finite(out(peak, u && u.stress), "the peak shear stress"), x]], header, COLUMNS.shearStress, u);
  });
}

function readLimits(arg: unknown): number[] {
  const entries = listEntries(arg, "limit");
  let count = entries.length;
  while (count > 0 && isBlank(entries[count - 1])) count--;
  if (count === 0) throw invalid("limit: give a deflection limit such as L/360");
  return entries.slice(0, count).map((e, i) => {
    const where = count === 1 ? "limit" : `limit entry ${i + 1}`;
    const code = errorCodeOf(e);
    if (code !== null) throw invalid(`${where}: the cell holds the error ${code}`);
    if (typeof e !== "number" && typeof e !== "string") throw invalid(`${where}: ${show(e)} is not a limit; write L/360`);
    return parseDeflectionLimit(e, where);
  });
}

/** SPAN.DEFLECTIONCHECK: one row per span [span, length, deflection, x, span/deflection, limit, pass|fail]. */
export function sheetDeflectionCheck(
  spans: unknown,
  loads: unknown,
  limit: unknown,
  supports: unknown,
  EI: unknown,
  combo: unknown,
  units: unknown,
  headers?: unknown,
): (number | string)[][] {
  return guarded(() => {
    const limits = readLimits(limit);
    const header = readHeaders(headers);
    const { solution, units: u } = solvedWithUnits(spans, loads, supports, EI, combo, units);
    if (!solution.hasStiffness) throw unavailable("deflection needs EI: give EI for the member or each span");
    const rows = spanDeflections(solution, limits).map((r) => [
      r.span,
      r.length,
      finite(deflectionShown(r.deflection, u), `span ${r.span}'s deflection`),
      r.x,
      Number.isFinite(r.ratio) ? r.ratio : "",
      r.limit,
      r.pass ? "pass" : "fail",
    ]);
    return withHeaders(rows, header, COLUMNS.deflectionCheck, u);
  });
}

/** Two optional unit cells that must measure the same thing: both blank, or both given. */
function unitPair(a: unknown, b: unknown, nameA: string, nameB: string): [Unit, Unit] | null {
  const read = (arg: unknown, name: string): Unit | null => {
    const cells = rowsOf(arg ?? null);
    const cell = cells.length === 1 && cells[0].length === 1 ? cells[0][0] : undefined;
    if (cell === undefined) throw invalid(`${name}: give one cell with a unit`);
    if (isEmpty(cell) || cell === 0) return null;
    if (typeof cell !== "string" || errorCodeOf(cell) !== null) throw invalid(`${name}: ${show(cell)} is not a unit`);
    return parseUnit(cell, name);
  };
  const ua = read(a, nameA);
  const ub = read(b, nameB);
  if (ua === null && ub === null) return null;
  if (ua === null || ub === null) throw invalid(`${ua === null ? nameA : nameB}: give both units or neither`);
  if (!sameDimension(ua.dimension, ub.dimension)) {
    throw invalid(`${nameB}: "${ub.text}" measures ${dimensionName(ub.dimension)}, but ${nameA} "${ua.text}" measures ${dimensionName(ua.dimension)}`);
  }
  return [ua, ub];
}

/** Applies f cell by cell over a and b, one of which may be a single cell; "" where either is blank. */
function pairwise(a: unknown, b: unknown, nameA: string, nameB: string, f: (x: number, y: number) => number): (number | string)[][] {
  const ra = rowsOf(a);
  const rb = rowsOf(b);
  const single = (r: unknown[][]) => r.length === 1 && r[0].length === 1;
  const cells = (r: unknown[][]) => r.reduce((n, row) => n + row.length, 0);
  checkCount(cells(ra), LIMITS.cells, nameA, "cells");
  if (nameB !== nameA) checkCount(cells(rb), LIMITS.cells, nameB, "cells");
  const shape = single(ra) ? rb : ra;
  if (!single(ra) && !single(rb) && (ra.length !== rb.length || ra.some((row, i) => row.length !== rb[i].length))) {
    throw invalid(`${nameB}: give one cell or a range the same size as ${nameA}`);
  }
  if (shape.length === 0) throw invalid(`${nameA}: give a cell or a range`);
  return shape.map((row, i) =>
    row.map((_, j) => {
      const x = single(ra) ? ra[0][0] : ra[i][j];
      const y = single(rb) ? rb[0][0] : rb[i][j];
      if (isEmpty(x) || isEmpty(y)) return "";
      const place = (name: string, r: unknown[][]) => (single(r) ? name : `${name} row ${i + 1}, column ${j + 1}`);
      return finite(f(readNumber(x, () => place(nameA, ra)), readNumber(y, () => place(nameB, rb))), "the result");
    }),
  );
}

/** SPAN.UTILISATION: |demand| / capacity, cell by cell. */
export function sheetUtilisation(demand: unknown, capacity: unknown, demandUnit: unknown, capacityUnit: unknown): (number | string)[][] {
  return guarded(() => {
    const units = unitPair(demandUnit, capacityUnit, "demand unit", "capacity unit");
    const factor = units === null ? 1 : units[0].factor / units[1].factor;
    return pairwise(demand, capacity, "demand", "capacity", (d, c) => {
      if (!(c > 0)) throw invalid(`capacity: must be a positive number, got ${c}`);
      return utilisation(d * factor, c);
    });
  });
}

/** SPAN.CONVERT: values from one unit to another of the same quantity, in the shape of value. */
export function sheetConvert(value: unknown, from: unknown, to: unknown): (number | string)[][] {
  return guarded(() => {
    const units = unitPair(from, to, "from", "to");
    if (units === null) throw invalid("from: give the unit the values are in, and to: the unit wanted");
    return pairwise(value, 0, "value", "value", (v) => convert(v, units[0], units[1]));
  });
}

/** SPAN.STIFFNESS: E x I cell by cell, converted to the result unit when units are given. */
export function sheetStiffness(E: unknown, I: unknown, EUnit: unknown, IUnit: unknown, resultUnit: unknown): (number | string)[][] {
  return guarded(() => {
    const eu = readUnit(EUnit ?? null, "force/length^2", "E unit");
    const iu = readUnit(IUnit ?? null, "length^4", "I unit");
    const ru = readUnit(resultUnit ?? null, "force x length^2", "result unit");
    if ((eu === null) !== (iu === null) || (ru !== null && eu === null)) {
      throw invalid(`${eu === null ? "E unit" : "I unit"}: give the units of both E and I, or neither`);
    }
    const factor = eu !== null && iu !== null && ru !== null ? (eu.factor * iu.factor) / ru.factor : 1;
    return pairwise(E, I, "E", "I", (e, i) => {
      if (!(e > 0)) throw invalid(`E: must be a positive number, got ${e}`);
      if (!(i > 0)) throw invalid(`I: must be a positive number, got ${i}`);
      return e * i * factor;
    });
  });
}
