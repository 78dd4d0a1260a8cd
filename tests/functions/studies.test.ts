/**
 * The load-arrangement functions called exactly as the host calls them: 2-D arrays, blanks as
 * "", null or 0, skipped optional arguments as null. Values are checked against direct core
 * calls and closed forms.
 */
import { combos, envelope, influence, moment, moving, peaks } from "../../functions/functions";
import { relDiff } from "../../src/core/tolerance";

const loadTable = [
  ["udl", 3, "", "", "", "D"],
  ["udl", 4, 0, 0, null, "L"],
  ["point", 12, 10, "", "", "L"],
  ["", "", "", "", "", ""],
];
const spans = [[6, 8, 6]];

function codeOf(call: () => unknown): { code: string; message: string } {
  try {
    call();
  } catch (e) {
    return e as { code: string; message: string };
  }
  throw new Error("expected an error");
}

describe("SPAN.ENVELOPE", () => {
  it("equals the max and min of SPAN.MOMENT over the combinations, naming the governing one", () => {
    const list = [["1.4D"], ["1.2D+1.6L"], [""], ["0.9D"]];
    const xs = [[0], [3], [""], [6], [10.5], [20]];
    const rows = envelope(spans, loadTable, xs, list, null as any, null as any, null, null, null);
    expect(rows).toHaveLength(6);
    expect(rows[2]).toEqual(["", "", "", "", ""]);
    for (const row of rows.filter((r) => r[0] !== "")) {
      const each = ["1.4D", "1.2D+1.6L", "0.9D"].map((c) => moment(spans, loadTable, [[row[0]]], null as any, null as any, c)[0][0] as number);
      // Each case solved once and superposed: equal to each combination's own solve to rounding.
      const scale = Math.max(...each.map(Math.abs));
      expect(relDiff(row[1] as number, Math.max(...each), scale)).toBeLessThan(1e-12);
      expect(relDiff(row[3] as number, Math.min(...each), scale)).toBeLessThan(1e-12);
    }
    expect(rows[1][2]).toBe("1.2D + 1.6L");
  });

  it("expands named sets and reports the loaded spans of a patterned live case", () => {
    const rows = envelope(spans, loadTable, [[3], [6]], [["ASCE7-2.3.1"]], null as any, null as any, "moment", "full L", null);
    expect(String(rows[0][2])).toMatch(/^1\.2D \+ 1\.6L \+ 0\.5(Lr|S|R); live on span/);
    expect(String(rows[1][4])).toMatch(/live on spans 1, 2/);
  });

  it.each([
    ["no combinations", () => envelope(spans, loadTable, [[3]], [[""]], null as any, null as any, null, null, null), /give at least one combination/],
    ["bad combination text", () => envelope(spans, loadTable, [[3]], [["1.2D"], ["1.2D +"]], null as any, null as any, null, null, null), /combinations row 2, column 1: combination "1.2D \+"/],
    ["bad pattern", () => envelope(spans, loadTable, [[3]], [["D"]], null as any, null as any, null, "checker", null), /pattern: "checker" is not a pattern/],
    ["bad quantity", () => envelope(spans, loadTable, [[3]], [["D"]], null as any, null as any, "torsion", null, null), /quantity: "torsion" is not one of/],
    ["deflection without EI", () => envelope(spans, loadTable, [[3]], [["D"]], null as any, null as any, "deflection", null, null), /deflection needs EI/],
    ["EN 1990 without psi0", () => envelope(spans, loadTable, [[3]], [["EN1990-6.10"]], null as any, null as any, null, null, null), /psi0/],
    ["x off the member", () => envelope(spans, loadTable, [[21]], [["D"]], null as any, null as any, null, null, null), /x = 21 is outside the member/],
  ])("%s is #VALUE! with a message", (_name, call, message) => {
    const e = codeOf(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});

describe("SPAN.PEAKS", () => {
  it("rows for shear and moment, and slope and deflection with EI, each with x and the governing combination", () => {
    const rows = peaks(spans, loadTable, [["1.4D"], ["1.2D+1.6L"]], null as any, [[20000]], null, null);
    expect(rows.map((r) => r[0])).toEqual(["shear", "moment", "slope", "deflection"]);
    const m = rows[1];
    const each = ["1.4D", "1.2D+1.6L"].map((c) => moment(spans, loadTable, [[m[2]]], null as any, [[20000]], c)[0][0] as number);
    expect(relDiff(m[1] as number, Math.max(...each))).toBeLessThan(1e-12);
    expect(m[3]).toBe("1.2D + 1.6L");
  });
});

describe("SPAN.INFLUENCE", () => {
  it("simple span moment at midspan: xi/2 left of it, (L - xi)/2 right of it (Muller-Breslau, from memory), in the shape of positions", () => {
    const out = influence([[10]], "moment at 5", [[0, 2.5, ""], [5, 7.5, 10]], null as any, null as any);
    const exact = [[0, 1.25, ""], [2.5, 1.25, 0]];
    out.forEach((row, r) => row.forEach((v, c) => (exact[r][c] === "" ? expect(v).toBe("") : expect(relDiff(v as number, exact[r][c] as number, 1)).toBeLessThan(1e-12))));
  });

  it.each([
    ["unknown effect", "torque at 3", /effect: "torque at 3" is not an effect/],
    ["absolute moment", "absolute moment", /moving loads only/],
    ["node that does not exist", "reaction 4", /node 4 does not exist/],
  ])("%s is #VALUE!", (_name, effect, message) => {
    const e = codeOf(() => influence([[10]], effect, [[1]], null as any, null as any));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});

describe("SPAN.MOVING", () => {
  it("two equal axles on a simple span: absolute maximum moment by the textbook rule (axle at L/2 - s/4)", () => {
    const rows = moving([[12]], [[10, 10]], [[2]], "absolute moment", null as any, null as any);
    // Closed form: M = R (L/2 - d/2)^2 / L with R = 20 and d = s/2 = 1.
    expect(rows[0][0]).toBe("max");
    expect(relDiff(rows[0][1] as number, (20 * 5.5 ** 2) / 12)).toBeLessThan(1e-10);
    expect(rows[1][0]).toBe("min");
  });

  it("spacings must be one fewer than the axles", () => {
    const e = codeOf(() => moving([[12]], [[10, 10, 10]], [[2]], "moment at 6", null as any, null as any));
    expect(e.message).toMatch(/3 axles need 2 spacings, got 1/);
  });
});

describe("SPAN.COMBOS", () => {
  it("spills ASCE 7 strength combinations as a column (14 with the roof alternatives)", () => {
    const out = combos("ASCE7-2.3.1", null, null as any);
    expect(out).toHaveLength(14);
    expect(out[0]).toEqual(["1.4D"]);
  });
  it("EN 1990 with psi0 pairs and case labels", () => {
    expect(combos("EN1990-6.10", "Q 0.7, S 0.5", [["Q", "S"]])).toEqual([["1.35G"], ["1.35G + 1.5Q + 0.75S"], ["1.35G + 1.5S + 1.05Q"], ["1.0G + 1.5Q + 0.75S"], ["1.0G + 1.5S + 1.05Q"]]);
  });
  it("an unknown set is #VALUE!", () => {
    expect(codeOf(() => combos("NBC-1", null, null as any)).message).toMatch(/unknown combination set "NBC-1"/);
  });
});

describe("limits of the studies (src/core/limits.ts): one past each is #VALUE! naming the argument and the limit", () => {
  const text = [["udl 3 D; udl 4 L"]];
  const column = (n: number, value: (i: number) => unknown) => Array.from({ length: n }, (_, i) => [value(i)]);
  const combosOf = (n: number) => column(n, (i) => `${(1 + i / 1000).toFixed(3)}D + 1.6L`);
  it.each([
    ["ENVELOPE x cells", () => envelope(spans, text, column(10002, (i) => (i % 20) + 0.5), [["D"]], null as any, null as any, null, null, null), /^x: at most 10001 cells, got 10002/],
    ["ENVELOPE combinations", () => envelope(spans, text, [[3]], combosOf(65), null as any, null as any, null, null, null), /^combinations: at most 64 combinations \(named sets expanded\), got 65/],
    ["PEAKS combinations after sets are expanded", () => peaks(spans, text, [...combosOf(51), ["ASCE7-2.3.1"]], null as any, null as any, null, null), /^combinations: at most 64 combinations \(named sets expanded\), got 65/],
    ["PEAKS pattern spans", () => peaks([Array(13).fill(3)], text, [["D+L"]], null as any, null as any, "standard L", null), /^pattern "standard": at most 12 spans, got 13/],
    ["PEAKS case labels", () => peaks(spans, [[Array.from({ length: 33 }, (_, i) => `udl 1 C${i}`).join("; ")]], [["D"]], null as any, null as any, null, null), /^loads: at most 32 case labels in one study, got 33/],
    ["INFLUENCE positions", () => influence(spans, "moment at 3", [Array.from({ length: 10002 }, (_, i) => i / 1000)], null as any, null as any), /^positions: at most 10001 positions, got 10002/],
    ["MOVING axles", () => moving(spans, [Array(36).fill(10)], [Array(35).fill(1)], "moment at 3", null as any, null as any), /^axles: at most 35 axle loads, got 36/],
    ["MOVING size", () => moving([Array(12).fill(3)], [Array(14).fill(10)], [Array(13).fill(1)], "absolute moment", null as any, null as any), /^MOVING: this call is too large \(12 spans, 14 axles, absolute moment: size 1019200, at most 100000\)/],
    ["MOVING size at a section", () => moving([Array(120).fill(3)], [[10]], null as any, "moment at 3", null as any, null as any), /^MOVING: this call is too large \(120 spans, 1 axles: size 590724, at most 100000\)/],
    ["PEAKS size", () => peaks([Array(12).fill(3)], [[Array.from({ length: 600 }, (_, i) => `point 1 at ${(i * 36) / 600} ${i % 2 ? "D" : "L"}`).join("; ")]], combosOf(64), null as any, null as any, "full L", null), /^PEAKS: this call is too large \(12 spans, 600 loads, 2 case labels, 64 combinations, pattern full: size 1652400, at most 100000\)/],
    ["ENVELOPE size", () => envelope(spans, text, column(10001, (i) => i / 1000), combosOf(50), null as any, null as any, null, null, null), /^ENVELOPE: this call is too large \(3 spans, 2 loads, 2 case labels, 50 combinations, pattern none, 10001 positions: size 540154, at most 100000\)/],
    ["COMBOS variable cases", () => combos("EN1990-6.10", 0.7, [Array.from({ length: 17 }, (_, i) => `Q${i}`)]), /^cases: at most 16 variable cases, got 17/],
    ["ENVELOPE with EN 1990 over the loads' labels", () => envelope(spans, [[Array.from({ length: 17 }, (_, i) => `udl 1 Q${i}`).join("; ") + "; udl 2 G"]], [[3]], [["EN1990-6.10"]], null as any, null as any, null, null, 0.7), /EN1990-6.10: at most 16 variable cases, got 17 \(the cases argument, or the case labels of the loads other than G\)/],
    ["COMBOS psi0 pairs", () => combos("EN1990-6.10", Array.from({ length: 17 }, (_, i) => `Q${i} 0.5`).join(", "), [["Q0"]]), /^psi0: at most 16 pairs, got 17/],
    ["INFLUENCE size", () => influence([Array(1000).fill(3)], "moment at 3", [Array.from({ length: 101 }, (_, i) => i)], null as any, null as any), /^INFLUENCE: this call is too large \(1000 spans, 101 positions: size 1516515, at most 100000\)/],
  ])("%s", (_name, call, message) => {
    const e = codeOf(call);
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });

  it.each([
    ["ENVELOPE at 10001 x cells and 5 combinations (size 90109)", () => envelope(spans, text, column(10001, (i) => (i * 20) / 10000), combosOf(5), null as any, null as any, null, null, null)],
    ["PEAKS with pattern full at 12 spans", () => peaks([Array(12).fill(3)], text, [["D+L"]], null as any, null as any, "full L", null)],
    ["MOVING at 35 axles on one span (size 378000)", () => moving([[40]], [Array(35).fill(10)], [Array(34).fill(0.25)], "reaction 1", null as any, null as any)],
    ["COMBOS at 16 variable cases and 16 psi0 pairs", () => combos("EN1990-6.10", Array.from({ length: 16 }, (_, i) => `Q${i} 0.5`).join(", "), [Array.from({ length: 16 }, (_, i) => `Q${i}`)])],
  ])("%s answers", (_name, call) => {
    const rows = call() as unknown[][];
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) for (const v of row) expect(typeof v === "number" ? Number.isFinite(v) : typeof v === "string").toBe(true);
  });
});

describe("a case beyond trust on its own", () => {
  it("does not refuse a study its combinations answer: each combination is then solved as it is (found by the fuzz suite)", () => {
    // Magnitudes 1e-262 to 1e-60: the Lr and W cases alone fail the equilibrium check, D + ... does not.
    const member = "7.49, 2.05";
    const table = [
      ["udl", -3.6670743402630796e-141, 0, 2.1908856361928982e-60, "", "Lr"],
      ["moment", 4.1728784523260246e-175, 0, "", "", "W"],
      ["Point", 6.430875507401136e-101, 0, "", "", "D"],
      ["point", -2.4469682454937194e-262, 9.880045888774454e-291, "", "", "Lr"],
      ["point", 1.6493903751455516e-259, 5.802231153759241e-265, "", "", "W"],
    ];
    const xs = [[9.54], [7.49], [1.1915341120339112e-206], [2.95399450143343e-50]];
    const rows = envelope([[member]], table, xs, [["ASCE7-2.4.1"]], [["pin fixed free"]], null as any, null, "none", null);
    const list = combos("ASCE7-2.4.1", null, null as any).map((r) => r[0]);
    rows.forEach((row, i) => {
      const each = list.map((c) => {
        try {
          return moment([[member]], table, [xs[i]], [["pin fixed free"]], null as any, c)[0][0] as number;
        } catch {
          return null;
        }
      }).filter((v): v is number => v !== null);
      const scale = Math.max(...each.map(Math.abs));
      expect(Math.abs((row[1] as number) - Math.max(...each))).toBeLessThanOrEqual(1e-9 * scale);
      expect(Math.abs((row[3] as number) - Math.min(...each))).toBeLessThanOrEqual(1e-9 * scale);
    });
  });
});
