/**
 * What the pane draws for a cell that studies many load arrangements: the envelope of an
 * ENVELOPE or PEAKS cell, the influence line of an INFLUENCE cell, the extremes of a MOVING
 * cell with the train where it stands. Every number comes from the same sheet-layer function
 * the cell itself calls (sheetEnvelope, sheetPeaks, sheetInfluence, sheetMoving), with the
 * cell's own arguments (its units argument included); the pane only chooses the positions to evaluate at. Pure.
 */
import type { Load, Member, Quantity } from "../core";
import { describeError, readEffect, readMember, readTrain, sheetEnvelope, sheetInfluence, sheetMoving, sheetPeaks } from "../sheet";
import type { ResolvedMember } from "./memberFromSheet";
import { computeVibration, type Vibration } from "./vibrationStudy";

export type EnvelopeQuantity = "shear" | "moment" | "deflection";

/** Upper and lower bound of one quantity at each station. */
export interface EnvelopeCurve {
  quantity: EnvelopeQuantity;
  xs: number[];
  max: number[];
  min: number[];
}

/** One row of SPAN.PEAKS: the governing largest and smallest value, where, and by what. */
export interface PeakRow {
  quantity: Quantity;
  max: number;
  xMax: number;
  maxBy: string;
  min: number;
  xMin: number;
  minBy: string;
}

/** One extreme of SPAN.MOVING with the axles where they stand then. */
export interface MovingPlacement {
  label: "max" | "min";
  value: number;
  leadX: number;
  direction: string;
  /** Where the effect is measured. */
  x: number;
  /** The axles on the member at that position, as point loads (axles off the member are left out). */
  axles: Load[];
  /** Axles of the train in all. */
  axleCount: number;
}

export type Study =
  | Vibration
  | { kind: "envelope" | "peaks"; member: Member; curves: EnvelopeCurve[]; peaks: PeakRow[] | undefined }
  | { kind: "influence"; member: Member; effect: string; xs: number[]; values: number[] }
  | { kind: "moving"; member: Member; effect: string; placements: MovingPlacement[]; line: { xs: number[]; values: number[] } | undefined };

/** Most stations a study is evaluated at for drawing (plus both sides of each node and load point). */
export const STUDY_STATIONS = 240;

function memberLength(member: Member): number {
  let length = 0;
  for (const span of member.spans) length += span;
  return length;
}

/**
 * Evenly spaced stations plus both sides of every node and of the extra positions (point
 * loads, sections), so jumps are drawn as jumps. Sorted, inside [0, length].
 */
export function stationsFor(member: Member, extra: number[] = [], count = STUDY_STATIONS): number[] {
  const length = memberLength(member);
  const delta = length * 1e-7;
  const marks: number[] = [0];
  for (const span of member.spans) marks.push(marks[marks.length - 1] + span);
  marks[marks.length - 1] = length;
  marks.push(...extra, ...member.loads.flatMap((l) => (l.kind === "point" || l.kind === "moment" ? [l.xStart] : [l.xStart, l.xEnd])));
  const out = new Set<number>();
  for (let i = 0; i <= count; i++) out.add((length * i) / count);
  for (const m of marks) for (const x of [m - delta, m, m + delta]) if (x >= 0 && x <= length) out.add(x);
  return [...out].sort((a, b) => a - b);
}

const column = (xs: number[]): number[][] => xs.map((x) => [x]);

function text(value: unknown): string {
  if (Array.isArray(value)) return text(value[0]?.[0] ?? value[0]);
  return value === null || value === undefined ? "" : String(value);
}

function studyMember(resolved: ResolvedMember, withLoads: boolean): Member {
  const a = resolved.args;
  return readMember({ spans: a.spans, loads: withLoads ? a.loads : null, supports: a.supports, EI: a.EI, combo: null });
}

/** The envelope of one quantity at the stations, as SPAN.ENVELOPE gives it with the cell's arguments. */
function envelopeRows(resolved: ResolvedMember, xs: number[], quantity: EnvelopeQuantity): (number | string)[][] {
  const a = resolved.args;
  const s = resolved.study;
  return sheetEnvelope(a.spans, a.loads, column(xs), s.combos ?? null, a.supports, a.EI, quantity, s.pattern ?? null, s.psi0 ?? null, a.units ?? null);
}

/** The bounds at one x with what governs each, for the readout: [quantity, max, by, min, by]. */
export function envelopeAt(resolved: ResolvedMember, member: Member, x: number): [EnvelopeQuantity, number, string, number, string][] {
  const quantities: EnvelopeQuantity[] = member.stiffness === null ? ["shear", "moment"] : ["shear", "moment", "deflection"];
  return quantities.map((q) => {
    const [row] = envelopeRows(resolved, [x], q);
    return [q, row[1] as number, String(row[2]), row[3] as number, String(row[4])];
  });
}

/** The influence ordinate at x, as SPAN.INFLUENCE gives it. */
export function influenceAt(resolved: ResolvedMember, x: number): number {
  const a = resolved.args;
  return sheetInfluence(a.spans, resolved.study.effect ?? null, [[x]], a.supports, a.EI, a.units ?? null)[0][0] as number;
}

function influenceLineOf(resolved: ResolvedMember, member: Member, effect: unknown): { xs: number[]; values: number[] } {
  const a = resolved.args;
  const parsed = readEffect(effect, false);
  const xs = stationsFor(member, "x" in parsed ? [parsed.x] : []);
  const values = sheetInfluence(a.spans, effect, column(xs), a.supports, a.EI, a.units ?? null).map((row) => row[0] as number);
  return { xs, values };
}

function placed(train: { loads: number[]; offsets: number[] }, leadX: number, direction: string, length: number): Load[] {
  const sign = direction === "reversed" ? -1 : 1;
  const tol = length * 1e-12;
  const out: Load[] = [];
  train.offsets.forEach((offset, i) => {
    const x = leadX + sign * offset;
    if (x < -tol || x > length + tol || train.loads[i] === 0) return;
    const at = Math.min(Math.max(x, 0), length);
    out.push({ kind: "point", magnitude: train.loads[i], xStart: at, xEnd: at, magnitudeEnd: 0, loadCase: "", row: i + 1 });
  });
  return out;
}

/**
 * Evaluates the cell itself, with all its own arguments, when the pane could read them (its x
 * or positions may be an expression the pane skips): a cell that shows an error is not drawn.
 */
function checkCell(resolved: ResolvedMember): void {
  const a = resolved.args;
  const s = resolved.study;
  if (resolved.kind === "envelope" && s.x !== undefined) {
    sheetEnvelope(a.spans, a.loads, s.x, s.combos ?? null, a.supports, a.EI, s.quantity ?? null, s.pattern ?? null, s.psi0 ?? null, a.units ?? null);
  }
  if (resolved.kind === "influence" && s.positions !== undefined) sheetInfluence(a.spans, s.effect ?? null, s.positions, a.supports, a.EI, a.units ?? null);
}

/** Computes what a study cell shows; bad input gives the sheet layer's code and message. */
export function computeStudy(resolved: ResolvedMember): Study | { error: string } {
  try {
    const a = resolved.args;
    const s = resolved.study;
    checkCell(resolved);
    switch (resolved.kind) {
      case "envelope":
      case "peaks": {
        const member = studyMember(resolved, true);
        const xs = stationsFor(member);
        const quantities: EnvelopeQuantity[] = member.stiffness === null ? ["shear", "moment"] : ["shear", "moment", "deflection"];
        const curves = quantities.map((quantity) => {
          const rows = envelopeRows(resolved, xs, quantity);
          return { quantity, xs, max: rows.map((r) => r[1] as number), min: rows.map((r) => r[3] as number) };
        });
        const peaks =
          resolved.kind === "peaks"
            ? sheetPeaks(a.spans, a.loads, s.combos ?? null, a.supports, a.EI, s.pattern ?? null, s.psi0 ?? null, a.units ?? null).map((r) => ({
                quantity: r[0] as Quantity,
                max: r[1] as number,
                xMax: r[2] as number,
                maxBy: String(r[3]),
                min: r[4] as number,
                xMin: r[5] as number,
                minBy: String(r[6]),
              }))
            : undefined;
        return { kind: resolved.kind, member, curves, peaks };
      }
      case "influence": {
        const member = studyMember(resolved, false);
        const line = influenceLineOf(resolved, member, s.effect ?? null);
        return { kind: "influence", member, effect: text(s.effect), ...line };
      }
      case "moving": {
        const member = studyMember(resolved, false);
        const rows = sheetMoving(a.spans, s.axles ?? null, s.spacings ?? null, s.effect ?? null, a.supports, a.EI, a.units ?? null);
        const train = readTrain(s.axles ?? null, s.spacings ?? null);
        const length = memberLength(member);
        const placements = rows.map((r) => ({
          label: r[0] as "max" | "min",
          value: r[1] as number,
          leadX: r[2] as number,
          direction: String(r[3]),
          x: r[4] as number,
          axles: placed(train, r[2] as number, String(r[3]), length),
          axleCount: train.loads.length,
        }));
        const effect = readEffect(s.effect ?? null, true);
        const line = effect.kind === "absolute-moment" ? undefined : influenceLineOf(resolved, member, s.effect ?? null);
        return { kind: "moving", member, effect: text(s.effect), placements, line };
      }
      case "vibration":
        return computeVibration(resolved);
      default:
        return { error: "this cell computes one member: it is drawn as a member" };
    }
  } catch (error) {
    const { code, message } = describeError(error);
    return { error: `${code} ${message}` };
  }
}
