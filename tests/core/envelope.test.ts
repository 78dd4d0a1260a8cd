import { applyCombination, envelope, extremes, governingPeaks, parseCombination, solve, standardArrangements, valueAt } from "../../src/core";
import type { Member, Quantity } from "../../src/core";
import { relDiff } from "../../src/core/tolerance";
import { beam, point, udl } from "./kit/members";

const combos = ["1.4D", "1.2D + 1.6L + 0.5S", "1.2D + 1.6S + 1.0L", "0.9D"].map(parseCombination);
const member = beam(
  [6, 8, 5, 7],
  ["pin", "pin", "pin", "pin", "fixed"],
  [udl(3, 0, 26, "D"), udl(4, 0, 26, "L"), point(12, 10, "L"), udl(1.5, 2, 20, "S"), point(-5, 24, "D")],
  [9000, 12000, 9000, 9000],
);
const stations = Array.from({ length: 27 }, (_, i) => i);

function combinedSolution(m: Member, text: string, spans?: number[]) {
  const loads = applyCombination(m.loads, parseCombination(text));
  const nodes = [0, 6, 14, 19, 26];
  const kept = spans
    ? loads.filter((l) => l.loadCase !== "L" || spans.some((i) => l.xStart >= nodes[i] && l.xStart < nodes[i + 1]))
    : loads;
  return solve({ ...m, loads: kept });
}

describe("envelope over combinations", () => {
  it("equals the max and min over individual combination solves at every station (no pattern)", () => {
    const env = envelope(member, combos, stations);
    for (const station of env) {
      for (const q of ["shear", "moment", "deflection"] as Quantity[]) {
        const values = combos.map((c) => valueAt(solve({ ...member, loads: applyCombination(member.loads, c) }), q, station.x));
        // Superposed case solutions agree with each combination solved on its own to rounding.
        const scale = Math.max(...values.map(Math.abs), 1e-300);
        expect(relDiff(station.max[q]!.value, Math.max(...values), scale)).toBeLessThan(1e-12);
        expect(relDiff(station.min[q]!.value, Math.min(...values), scale)).toBeLessThan(1e-12);
        const governing = combos[values.indexOf(Math.max(...values))];
        expect(station.max[q]!.combination).toBe(solveName(governing.text));
      }
    }
  });

  it("pattern 'full' equals the brute-force search over every subset of spans (independent solves)", () => {
    const m = beam([6, 8, 5, 7], ["pin", "pin", "pin", "pin", "pin"], [udl(3, 0, 26, "D"), udl(4, 0, 6, "L"), udl(4, 6, 14, "L"), udl(4, 14, 19, "L"), udl(4, 19, 26, "L")], 1);
    const c = parseCombination("1.2D + 1.6L");
    const env = envelope(m, [c], [3, 6, 10, 14, 17, 22], { pattern: "full" });
    const subsets = Array.from({ length: 16 }, (_, k) => [0, 1, 2, 3].filter((i) => (k >> i) & 1));
    for (const station of env) {
      const values = subsets.map((s) => valueAt(combinedSolution(m, c.text, s), "moment", station.x));
      expect(relDiff(station.max.moment!.value, Math.max(...values), 1)).toBeLessThan(1e-12);
      expect(relDiff(station.min.moment!.value, Math.min(...values), 1)).toBeLessThan(1e-12);
    }
  });

  it("pattern 'standard' finds the same support moment as the full search for equal spans under UDL (classical result)", () => {
    // Continuous-beam practice (common practice, no source): the largest negative moment at a
    // support comes from loading the two adjacent spans and alternate spans beyond.
    const m = beam([6, 6, 6, 6], ["pin", "pin", "pin", "pin", "pin"], [udl(2, 0, 24, "D"), udl(5, 0, 24, "L")]);
    const c = [parseCombination("1.2D + 1.6L")];
    const full = envelope(m, c, [6, 12, 18], { pattern: "full" });
    const standard = envelope(m, c, [6, 12, 18], { pattern: "standard" });
    full.forEach((f, i) => expect(relDiff(f.min.moment!.value, standard[i].min.moment!.value, 1)).toBeLessThan(1e-12));
    expect(full[0].min.moment!.arrangement).toBe("spans 1, 2, 4");
  });

  it("standard arrangements: all, alternates, and adjacent pairs with alternates beyond", () => {
    expect(standardArrangements(4)).toEqual([[0, 1, 2, 3], [0, 2], [1, 3], [0, 1, 3], [1, 2], [0, 2, 3]]);
    expect(standardArrangements(1)).toEqual([[0]]);
  });
});

function solveName(text: string): string {
  return text.replace(/\s*\+\s*/g, " + ").replace(/\b1\.0(?=[A-Za-z])/g, "");
}

describe("governing peaks over combinations", () => {
  it("each peak equals the largest over individual combination extremes, with its x and combination", () => {
    const peaks = governingPeaks(member, combos);
    for (const peak of peaks) {
      const each = combos.map((c) => extremes(solve({ ...member, loads: applyCombination(member.loads, c) }), peak.quantity));
      const best = Math.max(...each.map((e) => e.max));
      const scale = Math.max(...each.map((e) => Math.max(Math.abs(e.max), Math.abs(e.min))));
      expect(relDiff(peak.max.value, best, scale)).toBeLessThan(1e-12);
      const governing = each.findIndex((e) => relDiff(e.max, best, scale) < 1e-12);
      expect(peak.max.x).toBeCloseTo(each[governing].xMax, 9);
      expect(peak.max.combination).toBe(solveName(combos[governing].text));
      expect(relDiff(peak.min.value, Math.min(...each.map((e) => e.min)), scale)).toBeLessThan(1e-12);
    }
  });

  it("'full' pattern is limited to 12 spans", () => {
    const m = beam(Array(13).fill(3), Array(14).fill("pin"), [udl(1, 0, 39, "L")]);
    expect(() => governingPeaks(m, [parseCombination("1.6L")], { pattern: "full" })).toThrow(/pattern "full": at most 12 spans, got 13/);
  });
});
