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
import { CASES, grown } from "./pathological";

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
