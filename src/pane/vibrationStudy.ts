/**
 * What the pane draws for a SPAN.FREQUENCIES or SPAN.MODESHAPE cell: the first modes'
 * shapes (at most MAX_DRAWN_MODES of a FREQUENCIES cell, the one mode of a MODESHAPE cell),
 * each with its frequency. Every number comes from the sheet-layer functions the cell calls
 * (sheetFrequencies, sheetModeShape) with the cell's own arguments; the pane only chooses the
 * stations (study.ts stationsFor: even steps plus both sides of every node and load point).
 * The cell itself is evaluated first (its own mode count or mode and x), so a cell that
 * errors is not drawn. Pure.
 */
import { readModeCount, readVibrationModel, sheetFrequencies, sheetModeShape, describeError } from "../sheet";
import type { ModeCurve } from "./draw/modeSvg";
import type { ResolvedMember } from "./memberFromSheet";
import { stationsFor } from "./study";
import type { Member } from "../core";

/** Modes a FREQUENCIES cell has drawn, at most (the cell may list up to 50). */
export const MAX_DRAWN_MODES = 4;

export interface Vibration {
  kind: "vibration";
  member: Member;
  modes: ModeCurve[];
  /** Modes the cell lists (FREQUENCIES) when more than are drawn. */
  listed: number;
}

export function computeVibration(resolved: ResolvedMember): Vibration {
  const a = resolved.args;
  const s = resolved.study;
  const name = resolved.call?.entry.exportName;
  const shape = name === "modeShape";
  const common = [a.supports ?? null, a.loads ?? null, a.combo ?? null, a.units ?? null, s.g ?? null] as const;
  const model = readVibrationModel({ spans: a.spans, EI: a.EI, mass: s.mass ?? null, supports: a.supports, loads: a.loads, combo: a.combo, units: a.units, g: s.g ?? null });
  const xs = stationsFor(model.member);
  const column = xs.map((x) => [x]);
  let numbers: number[];
  let frequencies: (number | string)[][];
  let listed: number;
  if (shape) {
    if (s.x !== undefined) sheetModeShape(a.spans, a.EI, s.mass ?? null, s.mode ?? null, s.x, ...common);
    const mode = readModeCount(s.mode ?? null, "mode", null);
    frequencies = sheetFrequencies(a.spans, a.EI, s.mass ?? null, mode, ...common);
    numbers = [mode];
    listed = 1;
  } else {
    frequencies = sheetFrequencies(a.spans, a.EI, s.mass ?? null, s.modes ?? null, ...common);
    listed = frequencies.length;
    numbers = frequencies.slice(0, MAX_DRAWN_MODES).map((row) => row[0] as number);
  }
  const modes = numbers.map((mode): ModeCurve => {
    const row = frequencies[mode - 1];
    const curve = { mode, hz: row[1] as number, omega: row[2] as number, xs, values: [] as number[] };
    try {
      return { ...curve, values: sheetModeShape(a.spans, a.EI, s.mass ?? null, mode, column, ...common).map((r) => r[0] as number) };
    } catch (error) {
      const { code, message } = describeError(error);
      return { ...curve, error: `${code} ${message}` };
    }
  });
  return { kind: "vibration", member: model.member, modes, listed };
}
