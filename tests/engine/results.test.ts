/** SPANPEAKS, CASEREACTIONS, FREQUENCIES and MODESHAPE in the formula engine (workbench and CLI): spills equal direct calls. */
import { SpanWorkbook } from "../../src/engine";
import { caseReactions, frequencies, modeShape, spanPeaks } from "../../functions/functions";
import { block, direct } from "./support/direct";

const spans = "6 8 6";
const loads = "udl 2.5 D; udl 4 L; point 10 at 3 L";

describe("results per span, per case and vibration in the formula engine", () => {
  const wb = new SpanWorkbook([
    {
      name: "Results",
      cells: [
        [spans, loads, 20000, 0.4, 0, 3, 6, 10],
        ["=SPAN.SPANPEAKS(A1,B1,,C1)"],
        [], [], [],
        ["=SPAN.CASEREACTIONS(A1,B1,,,\"1.2D+1.6L\")"],
        [], [], [], [],
        ["=SPAN.FREQUENCIES(A1,C1,D1,3)"],
        [], [], [],
        ["=SPAN.MODESHAPE(A1,C1,D1,2,E1:H1)"],
      ],
    },
  ]);
  const values = wb.getSheetValues(0);

  it("each spills what the direct call returns", () => {
    for (const [r, c] of [[3, 9], [8, 3], [12, 2], [14, 3]]) expect(typeof values[r][c]).toBe("number");
    expect(block(values, 1, 0, 3, 10)).toEqual(direct(() => spanPeaks([[spans]], [[loads]], null as any, [[20000]], null, null as any)));
    expect(block(values, 5, 0, 4, 4)).toEqual(direct(() => caseReactions([[spans]], [[loads]], null as any, null as any, "1.2D+1.6L", null as any, null)));
    expect(block(values, 10, 0, 3, 3)).toEqual(direct(() => frequencies([[spans]], [[20000]], [[0.4]], 3, null as any, null as any, null, null as any, null)));
    expect(block(values, 14, 0, 1, 4)).toEqual(direct(() => modeShape([[spans]], [[20000]], [[0.4]], 2, [[0, 3, 6, 10]], null as any, null as any, null, null as any, null)));
  });
});
