import { SpanWorkbook, SPAN_EXPORTS } from "../../src/engine";
import { RECENT_ANSWERS, ReusedResults, sameValue } from "../../src/engine/reusedResults";
import { extremes, maxMoment, reactions } from "../../functions/functions";
import { block, direct } from "./support/direct";

describe("ReusedResults", () => {
  it("matches arguments cell by cell, in shape, by Object.is", () => {
    expect(sameValue([[1, "a"], [null, true]], [[1, "a"], [null, true]])).toBe(true);
    expect(sameValue([[0]], [[-0]])).toBe(false);
    expect(sameValue([[1, 2]], [[1], [2]])).toBe(false);
    expect(sameValue([[6]], [["6"]])).toBe(false);
    expect(sameValue(null, [[null]])).toBe(false);
    expect(sameValue("", null)).toBe(false);
  });

  it("calls once for the same arguments, again for others, and keeps what was thrown", () => {
    const reused = new ReusedResults();
    let calls = 0;
    const table = (args: unknown[]) => () => (calls++, [[JSON.stringify(args)]]);
    const a = [[[6]], "D"];
    const first = reused.answer("f", a, table(a));
    expect(reused.answer("f", [[[6]], "D"], table(a))).toBe(first);
    expect(calls).toBe(1);
    reused.answer("f", [[[6]], "L"], table([[[6]], "L"]));
    reused.answer("g", a, table(a)); // another function is another question
    expect(calls).toBe(3);
    const thrown = { code: "#VALUE!", message: "no" };
    const failing = () => {
      calls++;
      throw thrown;
    };
    expect(reused.answer("f", [null], failing)).toEqual({ thrown });
    expect(reused.answer("f", [null], failing)).toEqual({ thrown });
    expect(calls).toBe(4);
  });

  it("keeps RECENT_ANSWERS answers per function, the oldest dropped first", () => {
    const reused = new ReusedResults();
    let calls = 0;
    const call = () => (calls++, [[calls]]);
    for (let i = 0; i <= RECENT_ANSWERS; i++) reused.answer("f", [i], call);
    expect(calls).toBe(RECENT_ANSWERS + 1);
    reused.answer("f", [RECENT_ANSWERS], call);
    reused.answer("f", [1], call);
    expect(calls).toBe(RECENT_ANSWERS + 1);
    reused.answer("f", [0], call); // dropped
    expect(calls).toBe(RECENT_ANSWERS + 2);
  });

  it("compares with the arguments as they were before the call, whatever the function did to them", () => {
    const reused = new ReusedResults();
    let calls = 0;
    const spans = [[6]];
    reused.answer("f", [spans], () => {
      calls++;
      spans[0][0] = 7;
      return [[1]];
    });
    reused.answer("f", [[[7]]], () => (calls++, [[2]]));
    expect(calls).toBe(2);
    expect(reused.answer("f", [[[6]]], () => (calls++, [[3]]))).toEqual({ returned: [[1]] });
    expect(calls).toBe(2);
  });
});

describe("SPAN calls with the same arguments in a workbook", () => {
  const spans = "6 8 6";
  const loads = "udl 2.5 D; point 10 at 3 L";

  function counted(): { functions: typeof SPAN_EXPORTS; calls: Record<string, number> } {
    const calls: Record<string, number> = {};
    const functions = Object.fromEntries(
      Object.entries(SPAN_EXPORTS).map(([name, fn]) => [name, (...args: unknown[]) => ((calls[name] = (calls[name] ?? 0) + 1), fn(...args))]),
    ) as typeof SPAN_EXPORTS;
    return { functions, calls };
  }

  it("a schedule row filled down calls each function once, and every cell holds the direct call's value", () => {
    const { functions, calls } = counted();
    const row = (r: number) => [spans, loads, `=INDEX(SPAN.MAXMOMENT(A${r},B${r}),1,1)`, `=INDEX(SPAN.MAXMOMENT(A${r},B${r}),1,2)`, `=MAX(SPAN.REACTIONS(A${r},B${r})*{0,1,0})`, `=INDEX(SPAN.EXTREMES(A${r},B${r}),2,2)`];
    const wb = new SpanWorkbook([{ name: "S", cells: [row(1)] }], { functions });
    wb.setCells(0, 1, 0, Array.from({ length: 50 }, (_, i) => row(i + 2)));
    expect(calls).toEqual({ maxMoment: 1, reactions: 1, extremes: 1 });
    const max = direct(() => maxMoment([[spans]], [[loads]]));
    const vertical = direct(() => reactions([[spans]], [[loads]])).reduce((most, r) => Math.max(most, r[1] as number), -Infinity);
    const moment = direct(() => extremes([[spans]], [[loads]]))[1][1];
    for (let r = 0; r < 51; r++) expect(block(wb.getSheetValues(0), r, 2, 1, 4)).toEqual([[max[0][0], max[0][1], vertical, moment]]);
    // One row's member changes: that row is asked again and only that row changes.
    wb.setCell(0, 20, 0, "6 8");
    expect(calls).toEqual({ maxMoment: 2, reactions: 2, extremes: 2 });
    expect(wb.getValue(0, 20, 2)).toEqual(direct(() => maxMoment([["6 8"]], [[loads]]))[0][0]);
    expect(wb.getValue(0, 20, 2)).not.toEqual(max[0][0]);
    expect(wb.getValue(0, 21, 2)).toEqual(max[0][0]);
    wb.destroy();
  });

  it("an error is given again for the same arguments, with its message", () => {
    const { functions, calls } = counted();
    const wb = new SpanWorkbook([{ name: "S", cells: [['=SPAN.MAXMOMENT("6","udl x")', null, null, '=SPAN.MAXMOMENT("6","udl x")']] }], { functions });
    const expected = direct(() => maxMoment([["6"]], [["udl x"]]))[0][0];
    expect((expected as { error: string }).error).toBe("#VALUE!");
    expect(wb.getValue(0, 0, 0)).toEqual(expected);
    expect(wb.getValue(0, 0, 3)).toEqual(expected);
    expect(calls).toEqual({ maxMoment: 1 });
    wb.destroy();
  });
});
