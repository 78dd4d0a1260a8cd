/**
 * Partial fixity through the worksheet functions: the supports notation's `rot K` reaches the
 * solver (a propped cantilever with a rotational spring at its pinned end under UDL; the closed
 * form by the force method is derived in tests/core/partialFixity.test.ts), with a units argument
 * K is in the member's own force x length per radian, and a rotational spring without EI is refused.
 */
import * as fx from "../../functions/functions";
import { close, thrown } from "./host";

const w = 2;
const L = 6;
const EI = 20000;
const spans = [[L]];
const loads = [["udl", w, "", "", "", "D"]];
/** Hogging moment at the spring end: (wL^2/8) / (1 + 3EI/(kL)). */
const springMoment = (k: number, ei: number) => (w * L * L) / 8 / (1 + (3 * ei) / (k * L));

describe("rotational spring in the supports argument", () => {
  test.each([
    ["a range", [["pin+rot 5000", "pin"]]],
    ["one text cell", [["pin+rot 5000 pin"]]],
  ])("REACTIONS with %s", (_name, supports) => {
    const r = fx.reactions(spans, loads, supports, [[EI]], null);
    const M = springMoment(5000, EI);
    expect(close(r[0][1], (w * L) / 2 + M / L)).toBe(true);
    expect(close(r[1][1], (w * L) / 2 - M / L)).toBe(true);
    expect(close(r[0][2], M, w * L * L)).toBe(true);
    expect(close(fx.moment(spans, loads, [[0]], supports, [[EI]], null)[0][0], -M, w * L * L)).toBe(true);
  });

  test("with units, k is read in the member's own force x length per radian", () => {
    // In m and kN (EI in kN*m^2) k is kN*m per radian.
    const r = fx.reactions(spans, loads, [["pin+rot 5000", "pin"]], [[EI]], null, [["length=m, force=kN"]]);
    expect(close(r[0][2], springMoment(5000, EI), w * L * L)).toBe(true);
    // In mm and N: k = 5e6 N*mm per radian against EI 2e10 N*mm^2 (the same member in other units).
    const mm = fx.reactions([[L * 1000]], [["udl", w, "", "", "", "D"]], [["pin+rot 5e6", "pin"]], [[2e10]], null, [["length=mm, force=N"]]);
    const M = (w * (L * 1000) ** 2) / 8 / (1 + (3 * 2e10) / (5e6 * L * 1000));
    expect(close(mm[0][2], M, w * (L * 1000) ** 2)).toBe(true);
  });

  test("without EI it is refused, naming the support", () => {
    const e = thrown(() => fx.reactions(spans, loads, [["pin+rot 5000", "pin"]], null as any, null));
    expect(e.message).toMatch(/support 1 \(x = 0\): a rotational spring needs EI/);
  });
});
