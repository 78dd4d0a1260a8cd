import fc from "fast-check";
import { solve } from "../../src/core/solve";
import { diagram } from "../../src/core/diagram";
import { extremes } from "../../src/core/extremes";
import type { DiagramRow, Member, Quantity } from "../../src/core/model";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { couple, member, memberLength, point, scales, udl } from "./support/build";
import { loadedMember } from "./support/arbitraries";
import { caught } from "./support/expectError";
import { referenceSolve } from "./support/reference";

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

function rowsAt(rows: DiagramRow[], x: number): DiagramRow[] {
  return rows.filter((r) => r.x === x);
}

describe("diagram on a hand-checked member", () => {
  // Two spans 4 + 6, pins, EI 100: a point load at 2, a couple at 7, a udl from 5 to 10.
  const m = member({ spans: [4, 6], EI: 100, loads: [point(8, 2), couple(5, 7), udl(3, 5, 10)] });
  const s = solve(m);
  const rows = diagram(s, 11);

  test("evenly spaced stations 0, 1, ..., 10 are all present, in order, starting at 0 and ending at the length", () => {
    for (let i = 0; i <= 10; i++) expect(rowsAt(rows, i).length).toBeGreaterThanOrEqual(1);
    expect(rows[0].x).toBe(0);
    expect(rows[rows.length - 1].x).toBe(10);
    for (let i = 1; i < rows.length; i++) expect(rows[i].x).toBeGreaterThanOrEqual(rows[i - 1].x);
  });

  test("two rows, left then right, where shear jumps (point load, interior support) and where moment jumps (couple)", () => {
    const atLoad = rowsAt(rows, 2);
    expect(atLoad).toHaveLength(2);
    expect(atLoad[0].shear - atLoad[1].shear).toBeCloseTo(8, 9);
    const atSupport = rowsAt(rows, 4);
    expect(atSupport).toHaveLength(2);
    expect(atSupport[1].shear - atSupport[0].shear).toBeCloseTo(s.reactions[1].force, 9);
    const atCouple = rowsAt(rows, 7);
    expect(atCouple).toHaveLength(2);
    expect(atCouple[1].moment - atCouple[0].moment).toBeCloseTo(5, 9);
  });

  test("one row where nothing jumps, and never more than two rows at one x", () => {
    expect(rowsAt(rows, 1)).toHaveLength(1);
    expect(rowsAt(rows, 5)).toHaveLength(1);
    const counts = new Map<number, number>();
    for (const r of rows) counts.set(r.x, (counts.get(r.x) ?? 0) + 1);
    for (const count of counts.values()) expect(count).toBeLessThanOrEqual(2);
  });

  test("every extreme's location is a row, with the extreme's value", () => {
    for (const q of QUANTITIES) {
      const e = extremes(s, q);
      expect(rows.some((r) => r.x === e.xMax && Math.abs(r[q] - e.max) <= HANDBOOK_TOLERANCE * scales(m)[q])).toBe(true);
      expect(rows.some((r) => r.x === e.xMin && Math.abs(r[q] - e.min) <= HANDBOOK_TOLERANCE * scales(m)[q])).toBe(true);
    }
  });

  test("without EI, slope and deflection are not numbers", () => {
    const plain = diagram(solve({ ...m, stiffness: null }), 5);
    for (const r of plain) {
      expect(Number.isNaN(r.slope)).toBe(true);
      expect(Number.isNaN(r.deflection)).toBe(true);
      expect(Number.isFinite(r.moment)).toBe(true);
    }
  });
});

describe("diagram: slope jumps at a hinge", () => {
  test("two rows at a hinge, where the slope (not the shear or moment) jumps", () => {
    // Hand derivation: fixed–hinge–pin, load on the suspended span; the hinge rotates, the slope jumps.
    const m = member({ spans: [3, 6], supports: ["fixed", "hinge", "pin"], EI: 100, loads: [udl(2, 3, 9)] });
    const rows = rowsAt(diagram(solve(m), 10), 3);
    expect(rows).toHaveLength(2);
    expect(Math.abs(rows[0].slope - rows[1].slope)).toBeGreaterThan(1e-3);
  });
});

describe("diagram: bad points", () => {
  const s = solve(member({ spans: [4], loads: [udl(1, 0, 4)] }));
  test.each([1, 0, -3, 2.5, NaN, Infinity])("points = %d is #VALUE! naming points", (n) => {
    const error = caught(() => diagram(s, n));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/points/);
  });
  test("points = 2 gives the two ends", () => {
    const rows = diagram(s, 2);
    expect(rows.map((r) => r.x)).toEqual([0, 2, 4]);
  });
});

describe("diagram against the independent reference on random members", () => {
  function check(m: Member, points: number): void {
    const rows = diagram(solve(m), points);
    const ref = referenceSolve(m);
    const length = memberLength(m);
    const scale = scales(m);
    for (let i = 0; i < rows.length; i++) {
      const r = rows[i];
      const paired = (i + 1 < rows.length && rows[i + 1].x === r.x) || (i > 0 && rows[i - 1].x === r.x);
      const first = i + 1 < rows.length && rows[i + 1].x === r.x;
      const side = r.x >= length ? "left" : paired && first ? "left" : "right";
      for (const q of QUANTITIES) {
        const expected = ref.at(q, r.x, side);
        if (Math.abs(r[q] - expected) > HANDBOOK_TOLERANCE * scale[q]) {
          throw new Error(`row ${i} x = ${r.x} (${side}) ${q}: got ${r[q]}, expected ${expected}`);
        }
      }
    }
    for (let k = 0; k < points; k++) {
      const x = k === points - 1 ? length : (length * k) / (points - 1);
      expect(rows.some((r) => Math.abs(r.x - x) <= HANDBOOK_TOLERANCE * length)).toBe(true);
    }
  }

  test("every row matches the reference on its side of any jump; the even stations are all there", () => {
    fc.assert(fc.property(loadedMember, fc.integer({ min: 2, max: 41 }), check), { numRuns: 150 });
  });
});
