/**
 * Pathological cell texts for every parser of cell text (issue 14): a long run of digits or
 * spaces and one bad character, grown to a given size. Shared by tests/hardening/linearParsers
 * (growth ratio) and tests/bench/parsers.bench.ts (time at 32,767 characters). Not a test file.
 */
import * as fx from "../../functions/functions";
import { numberFromText, readCombinations, readPsi0, readEffect, readMemberUnits } from "../../src/sheet";
import { parseCombination, parseUnit } from "../../src/core";
import { classifyArgument, parseSpanFormula } from "../../src/pane/formulaRefs";

/** Pads `head + run + tail` with the run character to exactly `size` characters. */
export function grown(size: number, head: string, run: string, tail: string): string {
  const room = Math.max(0, size - head.length - tail.length);
  return head + run.repeat(Math.ceil(room / run.length)).slice(0, room) + tail;
}

export type Case = [name: string, build: (size: number) => string, call: (text: string) => unknown];

export const CASES: Case[] = [
  ["number reader: digits then a letter", (n) => grown(n, "", "1", "x"), (t) => numberFromText(t)],
  ["number reader: digits, a point, then a letter", (n) => grown(n, "1.", "1", "x"), (t) => numberFromText(t)],
  ["spans text cell: one long bad number", (n) => grown(n, "", "9", "!"), (t) => fx.reactions([[t]], [["udl 1"]])],
  ["load notation: a long bad magnitude", (n) => grown(n, "udl ", "2", "q"), (t) => fx.reactions([[6]], [[t]])],
  ["load notation: a long bad settlement", (n) => grown(n, "settle ", "2", "q"), (t) => fx.reactions([[6]], [[t]])],
  ["EI text cell: many spans with shear, then a bad one", (n) => grown(n, "", "2e5 shear 8e4 ", "shear"), (t) => fx.reactions([["6"]], [["udl 1"]], null as never, [[t]])],
  ["EI text cell: a long bad shear stiffness", (n) => grown(n, "2e5 shear ", "8", "x"), (t) => fx.reactions([["6"]], [["udl 1"]], null as never, [[t]])],
  ["combination term: spaces after the factor", (n) => grown(n, "1.2", " ", "!"), (t) => parseCombination(t)],
  ["combination term: digits then a bad character", (n) => grown(n, "", "1", "!"), (t) => parseCombination(t)],
  ["combination: many distinct terms then a bad one", (n) => {
    let text = "D";
    for (let i = 0; text.length < n - 2; i++) text += `+A${i}`;
    return text.slice(0, n - 2) + "+!";
  }, (t) => parseCombination(t)],
  ["combo argument through a worksheet function", (n) => grown(n, "1.2D", " ", "?"), (t) => fx.maxMoment([[6]], [["udl 1 D"]], null as never, null as never, t)],
  ["psi0 pair: spaces between label and value", (n) => grown(n, "Q", " ", "!"), (t) => readPsi0(t)],
  ["psi0 pair: a long bad value", (n) => grown(n, "Q ", "7", "!"), (t) => readPsi0(t)],
  ["combinations argument with psi0", (n) => grown(n, "S ", " ", "0.5x"), (t) => readCombinations([["EN1990-6.10"]], t, [])],
  ["unit text: spaces then a bad character", (n) => grown(n, "m", " ", "!"), (t) => parseUnit(t, "unit")],
  ["unit text: many factors then a bad one", (n) => grown(n, "m", "*m", "/?"), (t) => parseUnit(t, "unit")],
  ["units argument: spaces in a pair", (n) => grown(n, "length", " ", "x"), (t) => readMemberUnits(t)],
  ["units argument: many pairs", (n) => grown(n, "length=m,", "x=m,", "!"), (t) => readMemberUnits(t)],
  ["effect text: a long bad position", (n) => grown(n, "shear at ", "4", "x"), (t) => readEffect(t, true)],
  ["effect text: a long bad node", (n) => grown(n, "reaction ", "2", "x"), (t) => readEffect(t, true)],
  ["pane formula reader: a long bad number", (n) => grown(n, "", "1", "x"), (t) => classifyArgument(t)],
  ["pane formula reader: a long name", (n) => grown(n, "a", "b", "-"), (t) => classifyArgument(t)],
  ["pane formula reader: a whole formula", (n) => grown(n, "=SPAN.MOMENT(6,\"udl 1\",", "1", "x)"), (t) => parseSpanFormula(t)],
];

