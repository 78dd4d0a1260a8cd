/**
 * Stored-results guard: the solver must reproduce, to 1e-12 of each quantity's own scale, the
 * results it gave for ~2,000 fixed well-conditioned random members when tests/core/stored/
 * results.json was written (by tests/core/stored/generate.ts, from the solver of 2026-12-02).
 * A restructuring of the solver (allocation-free core, fast paths) is judged against today's
 * answers, which the rest of the suite checks against closed forms.
 *
 * Read per member: reactions, shear / moment / slope / deflection at every node and load point
 * from both sides and at every mid-span, and the extremes (max, min and where) of each.
 */
import * as fs from "fs";
import * as path from "path";
import { isSpanError, solve } from "../../src/core";
import { ROUNDING_NOISE } from "../../src/core/tolerance";
import { decode, loadMember, QUANTITIES, readings, stations, type StoredMember } from "./stored/members";

interface Stored {
  seed: number;
  drawn: number;
  mirrorLimit: number;
  excluded: number;
  solved: [StoredMember, string][];
  refused: StoredMember[];
}

const stored: Stored = JSON.parse(fs.readFileSync(path.join(__dirname, "stored", "results.json"), "utf8"));

/** Relative tolerance against each quantity's scale (the exactness requirement). */
const VALUE_TOLERANCE = 1e-12;
/**
 * Positions of extremes: an interior peak is a root of the derivative, and a value exact to
 * rounding fixes a flat peak's position only to about the square root of rounding, so
 * positions are held to 1e-7 of the member length.
 */
const POSITION_TOLERANCE = 1e-7;

/** Equal within tol of scale, or both within the solver's zero band (values it shows as 0). */
function agrees(got: number, want: number, scale: number, tol: number): boolean {
  if (Math.abs(got - want) <= tol * scale) return true;
  const band = ROUNDING_NOISE * scale * (1 + 1e-9);
  return (got === 0 && Math.abs(want) <= band) || (want === 0 && Math.abs(got) <= band);
}

/** Mismatches of one member, as readable lines (empty when it agrees). */
function mismatches(entry: StoredMember, want: number[]): string[] {
  const member = loadMember(entry);
  const got = readings(member, solve(member));
  if (got.length !== want.length) return [`${got.length} readings, stored ${want.length}`];
  const nodes = member.spans.length + 1;
  const stationCount = stations(member).length;
  const length = member.spans.reduce((a, b) => a + b, 0);
  const maxAbs = (from: number, to: number, step = 1): number => {
    let m = 0;
    for (let i = from; i < to; i += step) m = Math.max(m, Math.abs(want[i]));
    return m;
  };
  const valuesStart = 2 * nodes;
  const extremesStart = valuesStart + 4 * stationCount;
  const quantityScale = QUANTITIES.map((_, q) => {
    const e = extremesStart + 4 * q;
    return Math.max(maxAbs(valuesStart + q * stationCount, valuesStart + (q + 1) * stationCount), Math.abs(want[e]), Math.abs(want[e + 2]));
  });
  const out: string[] = [];
  const check = (i: number, label: string, scale: number, tol: number): void => {
    if (!agrees(got[i], want[i], scale, tol)) out.push(`${label}: got ${got[i]}, stored ${want[i]} (scale ${scale})`);
  };
  const forceScale = Math.max(maxAbs(0, valuesStart, 2), quantityScale[0]);
  const momentScale = Math.max(maxAbs(1, valuesStart, 2), quantityScale[1]);
  for (let n = 0; n < nodes; n++) {
    check(2 * n, `reaction force at node ${n + 1}`, forceScale, VALUE_TOLERANCE);
    check(2 * n + 1, `reaction moment at node ${n + 1}`, momentScale, VALUE_TOLERANCE);
  }
  QUANTITIES.forEach((q, k) => {
    for (let s = 0; s < stationCount; s++) check(valuesStart + k * stationCount + s, `${q} at station ${s + 1}`, quantityScale[k], VALUE_TOLERANCE);
    const e = extremesStart + 4 * k;
    check(e, `${q} max`, quantityScale[k], VALUE_TOLERANCE);
    check(e + 1, `${q} xMax`, length, POSITION_TOLERANCE);
    check(e + 2, `${q} min`, quantityScale[k], VALUE_TOLERANCE);
    check(e + 3, `${q} xMin`, length, POSITION_TOLERANCE);
  });
  return out;
}

describe("stored results of fixed members", () => {
  test("the stored file is the one the generator describes (seed, count, every member read)", () => {
    expect(stored.solved.length + stored.refused.length + stored.excluded).toBe(stored.drawn);
    expect(stored.excluded).toBeLessThan(stored.drawn / 20);
    expect(stored.solved.length).toBeGreaterThan(1500);
  });

  test("every solved member reproduces its stored reactions, values and extremes", () => {
    const failures: string[] = [];
    stored.solved.forEach(([entry, text], i) => {
      const lines = mismatches(entry, decode(text));
      if (lines.length) failures.push(`member ${i + 1} ${JSON.stringify(entry)}:\n  ${lines.slice(0, 5).join("\n  ")}`);
    });
    expect(failures.slice(0, 5)).toEqual([]);
  });

  test("every refused member is still refused with a SpanError", () => {
    const accepted: string[] = [];
    for (const entry of stored.refused) {
      try {
        solve(loadMember(entry));
        accepted.push(JSON.stringify(entry));
      } catch (error) {
        if (!isSpanError(error)) throw error;
      }
    }
    expect(accepted).toEqual([]);
  });

  test("the comparison can fail: a changed load is caught", () => {
    const [entry, text] = stored.solved[0];
    const changed: StoredMember = [entry[0], entry[1], entry[2], entry[3].map((l, i) => (i === 0 ? [l[0], (l[1] as number) * (1 + 1e-9), l[2], l[3], l[4]] : l))];
    expect(mismatches(changed, decode(text)).length).toBeGreaterThan(0);
  });
});
