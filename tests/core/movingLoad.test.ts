import { influenceLine, measure, movingLoad, solve, trainFrom } from "../../src/core";
import { relDiff } from "../../src/core/tolerance";
import { beam, point } from "./kit/members";

describe("moving loads", () => {
  const L = 12;
  const simple = beam([L], ["pin", "pin"], []);

  it("one axle: largest midspan moment PL/4 with the axle at midspan (simple-beam formula, steel construction manual beam diagrams, concentrated load at centre)", () => {
    const r = movingLoad(simple, trainFrom([20], []), { kind: "moment", x: 6 });
    expect(relDiff(r.max.value, (20 * L) / 4)).toBeLessThan(1e-12);
    expect(r.max.leadX).toBeCloseTo(6, 9);
  });

  it.each([
    [10, 10, 2],
    [30, 10, 4],
    [8, 24, 3.5],
  ])(
    "two axles %d and %d at spacing %d: absolute maximum moment by the textbook rule (the span centreline bisects the distance between the resultant and the nearest heavy axle)",
    (p1, p2, s) => {
      // Independent closed form: heavy axle H, resultant R = p1 + p2 at distance d from H;
      // H sits at L/2 - d/2 (when H leads) and M = R (L/2 - d/2)^2 / L under H.
      const R = p1 + p2;
      const heavy = Math.max(p1, p2);
      const d = heavy === p1 ? (p2 * s) / R : (p1 * s) / R;
      const expected = (R * (L / 2 - d / 2) ** 2) / L;
      const r = movingLoad(simple, trainFrom([p1, p2], [s]), { kind: "absolute-moment" });
      expect(relDiff(r.max.value, expected)).toBeLessThan(1e-10);
      expect(Math.abs(r.max.x - (L / 2 - d / 2)) < 1e-6 || Math.abs(r.max.x - (L / 2 + d / 2)) < 1e-6).toBe(true);
    },
  );

  it("the peak of a moment at a section equals the best placement found from its influence line (independent dense scan)", () => {
    const member = beam([7, 9, 6], ["pin", "pin", "pin", "fixed"], [], 1);
    const train = trainFrom([14, 22, 22], [3, 1.4]);
    const r = movingLoad(member, train, { kind: "moment", x: 7 });
    const xs = Array.from({ length: 2201 }, (_, i) => (i * 22) / 2200);
    // In blocks of 1,000 positions: one call takes at most the size limit (src/core/limits.ts).
    const il: number[] = [];
    for (let i = 0; i < xs.length; i += 1000) il.push(...influenceLine(member, { kind: "moment", x: 7 }, xs.slice(i, i + 1000)));
    const at = (x: number) => (x < 0 || x > 22 ? 0 : il[Math.round((x * 2200) / 22)]);
    let scanMin = Infinity;
    for (let k = -440; k <= 2200; k++) {
      const lead = (k * 22) / 2200;
      for (const sign of [1, -1]) {
        const v = 14 * at(lead) + 22 * at(lead + sign * 3) + 22 * at(lead + sign * 4.4);
        scanMin = Math.min(scanMin, v);
      }
    }
    expect(r.min.value).toBeLessThanOrEqual(scanMin + 1e-9 * Math.abs(scanMin));
    expect(relDiff(r.min.value, scanMin)).toBeLessThan(1e-3);
  });

  it.each([
    ["shear at 5 (a jump under an axle)", { kind: "shear", x: 5 }],
    ["reaction at the spring", { kind: "reaction", node: 3 }],
    ["moment at the fixed end", { kind: "moment-reaction", node: 1 }],
    ["deflection at 12", { kind: "deflection", x: 12 }],
  ] as const)("%s: the peaks bound and approach an independent dense scan of exact solves, both directions", (_name, effect) => {
    const member = beam([6, 4, 8], ["fixed", "hinge", 900, "pin"], [], 3000);
    const train = trainFrom([12, 20, 20, 8], [1.5, 2.5, 1]);
    const r = movingLoad(member, train, effect);
    const offsets = [0, 1.5, 4, 5];
    let high = -Infinity;
    let low = Infinity;
    for (let k = -600; k <= 2400; k++) {
      const lead = (k * 18) / 2400;
      for (const sign of [1, -1]) {
        const loads = offsets
          .map((o, i) => ({ x: lead + sign * o, p: train.loads[i] }))
          .filter((a) => a.x >= 0 && a.x <= 18)
          .map((a) => point(a.p, a.x));
        const v = measure(solve({ ...member, loads }), effect);
        high = Math.max(high, v);
        low = Math.min(low, v);
      }
    }
    const scale = Math.max(Math.abs(high), Math.abs(low));
    expect(r.max.value).toBeGreaterThanOrEqual(high - 1e-9 * scale);
    expect(r.min.value).toBeLessThanOrEqual(low + 1e-9 * scale);
    expect(relDiff(r.max.value, high, scale)).toBeLessThan(2e-3);
    expect(relDiff(r.min.value, low, scale)).toBeLessThan(2e-3);
  });

  it("rejects a train with the wrong number of spacings or a negative spacing", () => {
    expect(() => trainFrom([10, 10], [])).toThrow(/2 axles need 1 spacings, got 0/);
    expect(() => trainFrom([10, 10], [-1])).toThrow(/spacing 1 must be a number of at least 0/);
  });
});
