/**
 * diagram(): evenly spaced stations plus load positions and peaks, two rows (left, then right)
 * where something jumps and one elsewhere, NaN slope and deflection without EI, bad station
 * counts, and every row against the independent force-method solution on random members.
 */
import fc from "fast-check";
import { candidates } from "../../src/core/extremes";
import { diagram, pieceList, extremes, solve, tolerance, valueAt, type DiagramRow, type Member, type Quantity } from "../../src/core";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { thrown } from "./kit/errors";
import { forceMethodSolve } from "./kit/forceMethod";
import { beam, couple, lengthOf, member, point, scalesOf, udl } from "./kit/members";
import { loadedMember, runs } from "./kit/random";

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
      expect(rows.some((r) => r.x === e.xMax && Math.abs(r[q] - e.max) <= HANDBOOK_TOLERANCE * scalesOf(m)[q])).toBe(true);
      expect(rows.some((r) => r.x === e.xMin && Math.abs(r[q] - e.min) <= HANDBOOK_TOLERANCE * scalesOf(m)[q])).toBe(true);
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
    const error = thrown(() => diagram(s, n));
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
    const ref = forceMethodSolve(m);
    const length = lengthOf(m);
    const scale = scalesOf(m);
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
    fc.assert(fc.property(loadedMember, fc.integer({ min: 2, max: 41 }), check), runs(120));
  });
});

describe("diagram stations: the priority rule where stations fall within rounding", () => {
  /**
   * The rule written the plain way: every even station (priority 1), piece boundary (2) and
   * peak candidate (a boundary's 2, else 0) sorted by x; a station within POSITION_TOLERANCE of
   * the length from the last one kept joins it, taking its x when its priority is higher.
   */
  function referenceStations(m: Member, points: number): number[] {
    const s = solve(m);
    const tol = tolerance.POSITION_TOLERANCE * s.length;
    const boundaries = new Set(pieceList(s.pieces).map((p) => p.x0));
    const marked: [number, number][] = [];
    for (let i = 0; i < points; i++) marked.push([i === points - 1 ? s.length : (s.length * i) / (points - 1), 1]);
    for (const p of pieceList(s.pieces)) marked.push([p.x0, 2]);
    for (const q of s.hasStiffness ? QUANTITIES : QUANTITIES.slice(0, 2)) for (const c of candidates(s, q)) marked.push([c.x, boundaries.has(c.x) ? 2 : 0]);
    marked.sort((a, b) => a[0] - b[0]);
    const kept: number[] = [];
    let priority = -1;
    for (const [x, p] of marked) {
      if (kept.length > 0 && x - kept[kept.length - 1] <= tol) {
        if (p <= priority) continue;
        kept[kept.length - 1] = x;
      } else kept.push(x);
      priority = p;
    }
    return kept;
  }

  test("the stations (distinct x of the rows) are the rule's, exactly, on random members", () => {
    fc.assert(
      fc.property(loadedMember, fc.integer({ min: 2, max: 300 }), (m, points) => {
        const xs = diagram(solve(m), points).map((r) => r.x);
        expect(xs.filter((x, i) => i === 0 || x !== xs[i - 1])).toEqual(referenceStations(m, points));
      }),
      runs(300),
    );
  });

  test("a load a hair from an even station: the load position is kept, not the station", () => {
    const m = member({ spans: [10], EI: 100, loads: [point(5, 5 + 1e-14), udl(1, 0, 10)] });
    const xs = diagram(solve(m), 11).map((r) => r.x);
    expect(xs).toContain(5 + 1e-14);
    expect(xs).not.toContain(5);
    expect(xs.filter((x, i) => i === 0 || x !== xs[i - 1])).toEqual(referenceStations(m, 11));
  });
});

const xsOf = (rows: DiagramRow[]) => rows.map((r) => r.x);
const has = (rows: DiagramRow[], x: number) => rows.some((r) => Math.abs(r.x - x) <= tolerance.POSITION_TOLERANCE * 10 * Math.max(1, x));

describe("diagram stations with a partial load and a point load", () => {
  // partial UDL: w = 4 on [2, 6] of a 10 span; peak M at 4.4 (steel construction manual, partial uniform load, from memory)
  const m = beam([10], ["pin", "pin"], [udl(4, 2, 6), point(3, 8.3)], 2e3);
  const sol = solve(m);
  const rows = diagram(sol, 11);

  it("includes load positions and the peak locations", () => {
    for (const x of [2, 6, 8.3]) expect(has(rows, x)).toBe(true);
    for (const q of ["moment", "deflection"] as const) {
      const e = extremes(sol, q);
      expect(has(rows, e.xMax)).toBe(true);
      expect(has(rows, e.xMin)).toBe(true);
    }
  });

  it("is sorted by x, and repeats an x only where something jumps (two rows: left, then right)", () => {
    const xs = xsOf(rows);
    for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeGreaterThanOrEqual(xs[i - 1]);
    const repeated = xs.filter((x, i) => i > 0 && xs[i - 1] === x);
    expect(repeated).toEqual([8.3]);
    const at = rows.filter((r) => r.x === 8.3);
    expect(at.length).toBe(2);
    expect(tolerance.relClose(at[0].shear - at[1].shear, 3, tolerance.HANDBOOK_TOLERANCE)).toBe(true);
    expect(at[1].shear).toBe(valueAt(sol, "shear", 8.3));
  });

  it("every row agrees with valueAt (right-hand rows) at its x", () => {
    const xs = xsOf(rows);
    rows.forEach((r, i) => {
      if (i + 1 < rows.length && xs[i + 1] === r.x) return; // the left row of a jump
      for (const q of ["shear", "moment", "slope", "deflection"] as const) {
        expect(tolerance.relClose(r[q], valueAt(sol, q, r.x), tolerance.HANDBOOK_TOLERANCE, 1e-12)).toBe(true);
      }
    });
  });

  it("N stations means N evenly spaced x, exactly, before extra points are added", () => {
    const plain = diagram(solve(beam([6], ["pin", "pin"], [udl(1, 0, 6)])), 7);
    expect(xsOf(plain)).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });
});

describe("doubled rows", () => {
  it("at an interior support (shear), at a couple (moment) and at a hinge (slope)", () => {
    const sol = solve(beam([4, 4, 3, 3], ["pin", "pin", "pin", "hinge", "fixed"], [udl(2, 0, 14), couple(5, 2)], 1e3));
    const rows = diagram(sol, 5);
    const pairs = (x: number) => rows.filter((r) => r.x === x);
    expect(pairs(4).length).toBe(2);
    expect(pairs(2).length).toBe(2);
    expect(tolerance.relClose(pairs(2)[1].moment - pairs(2)[0].moment, 5, tolerance.HANDBOOK_TOLERANCE)).toBe(true);
    expect(pairs(11).length).toBe(2);
    expect(pairs(11)[0].slope).not.toBeCloseTo(pairs(11)[1].slope, 8);
    expect(pairs(11)[0].deflection).toBeCloseTo(pairs(11)[1].deflection, 12);
  });

  it("not where nothing jumps (a free node joining two spans)", () => {
    const rows = diagram(solve(beam([2, 3], ["fixed", "free", "free"], [udl(1, 0, 5)], [20, 10])), 3);
    expect(rows.filter((r) => r.x === 2).length).toBe(1);
  });
});
