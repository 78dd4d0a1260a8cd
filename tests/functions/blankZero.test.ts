/**
 * The blank and zero rule (issue 11, "Blank, zero and the structure"), called as the host
 * calls the functions: a computed 0 never silently changes the structure. A wholly blank
 * argument means its default; blank cells beyond what the member needs are ignored; any other
 * blank or 0 where 0 is not a valid value is #VALUE! naming the entry.
 *
 * Outside values: a simple span under a uniform load w has end reactions wL/2; two equal
 * spans have 3wL/8, 10wL/8, 3wL/8 (standard handbook beam diagrams, from memory).
 */
import * as fx from "../../functions/functions";
import { thrown } from "./host";

const messageOf = (call: () => unknown) => {
  const e = thrown(call);
  expect(e.code).toBe("#VALUE!");
  return e.message;
};

test('SPAN.REACTIONS(6, "udl 2", {"pin", 0}, 1000) is #VALUE!, not a simple span', () => {
  expect(messageOf(() => fx.reactions(6 as any, "udl 2" as any, [["pin", 0]], 1000 as any, null))).toMatch(/^supports entry 2: the cell is blank or 0/);
});

test('the same member with {"pin", "pin"} is the simple span: R = wL/2 = 6', () => {
  const r = fx.reactions(6 as any, "udl 2" as any, [["pin", "pin"]], 1000 as any, null);
  expect(r[0][1]).toBeCloseTo(6, 12);
  expect(r[1][1]).toBeCloseTo(6, 12);
});

test("EI {20000, 0} for two spans is not uniform EI: #VALUE! naming the cell", () => {
  expect(messageOf(() => fx.deflection([[5, 5]], [["udl 4"]], [[2.5]], null as any, [[20000, 0]], null))).toMatch(/^EI entry 2: EI must be positive, got 0/);
  expect(messageOf(() => fx.reactions([[5, 5]], [["udl 4"]], null as any, [[20000, ""]], null))).toMatch(/^EI entry 2: the cell is blank/);
});

test("a trailing 0 span is #VALUE!, trailing empty cells are ignored (3wL/8 on two spans)", () => {
  expect(messageOf(() => fx.reactions([[5, 5, 0]], [["udl 4"]], null as any, null as any, null))).toMatch(/^spans entry 3: a span length must be positive, got 0/);
  const r = fx.reactions([[5, 5, "", null]], [["udl 4"]], null as any, null as any, null);
  expect(r).toHaveLength(3);
  expect(r[0][1]).toBeCloseTo((3 * 4 * 5) / 8, 12);
});

test("a wholly blank supports or EI argument keeps its default (every node pin; uniform EI)", () => {
  for (const blank of [null, [[""]], [[0]], [["", 0, null]]]) {
    const r = fx.reactions([[5, 5]], [["udl 4"]], blank as any, blank as any, null);
    expect(r[1][1]).toBeCloseTo((10 * 4 * 5) / 8, 12);
  }
});
