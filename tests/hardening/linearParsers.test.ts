/**
 * Every parser of cell text runs in linear time (issue 14): a long run of digits or spaces
 * followed by one bad character must not make a regular expression backtrack quadratically.
 *
 * No absolute time is asserted (speed belongs to tests/bench). Each pathological input is
 * grown from 4,096 to 32,767 characters (the spreadsheet's cell limit) and the growth of
 * the best of several runs is compared: linear work grows about 8 times, quadratic work
 * about 64 times (the control below shows the check sees the difference); the bound of 32 separates the two with room for noise (interference from
 * other work only adds time, so the best run is the robust statistic). The 1,024 and 16,384
 * sizes are run too, so each parser sees every size the issue names.
 */
import * as fx from "../../functions/functions";
import { numberFromText, readCombinations, readPsi0, readEffect, readMemberUnits } from "../../src/sheet";
import { parseCombination, parseUnit } from "../../src/core";
import { classifyArgument, parseSpanFormula } from "../../src/pane/formulaRefs";

const SIZES = [1024, 4096, 16384, 32767];
const RUNS = 5;
/** Calls per timed run, so that even the fastest parser's run is long enough to time. */
const REPEAT = 10;
const GROWTH_BOUND = 32;

function quietly(call: () => unknown): void {
  try {
    call();
  } catch {
    // refusals are expected: only the time to reach them matters here
  }
}

function bestTime(call: () => unknown): number {
  let best = Infinity;
  for (let i = 0; i < RUNS; i++) {
    const start = process.hrtime.bigint();
    for (let k = 0; k < REPEAT; k++) quietly(call);
    best = Math.min(best, Number(process.hrtime.bigint() - start));
  }
  return best;
}

/** Pads `head + run + tail` with the run character to exactly `size` characters. */
function grown(size: number, head: string, run: string, tail: string): string {
  const room = Math.max(0, size - head.length - tail.length);
  return head + run.repeat(Math.ceil(room / run.length)).slice(0, room) + tail;
}

type Case = [name: string, build: (size: number) => string, call: (text: string) => unknown];

const CASES: Case[] = [
  ["number reader: digits then a letter", (n) => grown(n, "", "1", "x"), (t) => numberFromText(t)],
  ["number reader: digits, a point, then a letter", (n) => grown(n, "1.", "1", "x"), (t) => numberFromText(t)],
  ["spans text cell: one long bad number", (n) => grown(n, "", "9", "!"), (t) => fx.reactions([[t]], [["udl 1"]])],
  ["load notation: a long bad magnitude", (n) => grown(n, "udl ", "2", "q"), (t) => fx.reactions([[6]], [[t]])],
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

describe("every parser of cell text is linear in the length of the text", () => {
  test.each(CASES)("%s", (_name, build, call) => {
    const texts = SIZES.map(build);
    for (let i = 0; i < SIZES.length; i++) expect(texts[i].length).toBe(SIZES[i]);
    for (const text of texts) quietly(() => call(text)); // warm up the compiler at every size
    let times = texts.map((text) => bestTime(() => call(text)));
    let growth = times[3] / Math.max(times[1], 1);
    if (growth >= GROWTH_BOUND) {
      // one more measurement before failing: a pause of the garbage collector can land in one run of every batch
      times = texts.map((text) => bestTime(() => call(text)));
      growth = Math.min(growth, times[3] / Math.max(times[1], 1));
    }
    const microseconds = times.map((t) => Math.round(t / 1000 / REPEAT));
    expect({ microseconds, under: growth < GROWTH_BOUND }).toEqual({ microseconds, under: true });
  });

  test("control: the growth check catches a quadratic regular expression", () => {
    const quadratic = /^\s*\d*\s*x$/; // two overlapping runs of spaces: the classic backtracking trap
    const [small, large] = [SIZES[1] / 8, SIZES[1]].map((n) => grown(n, "", " ", "!"));
    const growth = bestTime(() => quadratic.test(large)) / bestTime(() => quadratic.test(small));
    expect(growth).toBeGreaterThan(GROWTH_BOUND);
  });
});
