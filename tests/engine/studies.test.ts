import { SpanWorkbook } from "../../src/engine";
import { combos, envelope, influence, moving, peaks } from "../../functions/functions";
import { block, direct } from "./support/direct";

const spans = "6 8 6";
const loads = "udl 2.5 D; udl 4 L; point 10 at 3 L";

describe("load-arrangement functions in the formula engine", () => {
  const wb = new SpanWorkbook([
    {
      name: "Study",
      cells: [
        [spans, loads, "ASCE7-2.3.1", "full L", 0, 3, 6, 10],
        ["=SPAN.COMBOS(C1)"],
        ...Array.from({ length: 14 }, () => []),
        ["=SPAN.ENVELOPE(A1,B1,E1:H1,A2#,,,\"moment\",D1)"],
        [], [], [],
        ["=SPAN.PEAKS(A1,B1,A2#)"],
        [],
        ["=SPAN.INFLUENCE(A1,\"moment at 6\",E1:H1)"],
        ["=SPAN.MOVING(A1,\"10 20\",\"3\",\"absolute moment\")"],
      ],
    },
  ]);
  const values = wb.getSheetValues(0);
  const list = direct(() => combos("ASCE7-2.3.1", null, null as any));

  it("COMBOS spills the expanded set, and A2# feeds it to other functions", () => {
    expect(block(values, 1, 0, 14, 1)).toEqual(list);
  });

  it("ENVELOPE, PEAKS, INFLUENCE and MOVING spill what direct calls return", () => {
    expect(block(values, 16, 0, 4, 5)).toEqual(direct(() => envelope([[spans]], [[loads]], [[0, 3, 6, 10]], list, null as any, null as any, "moment", "full L", null)));
    expect(block(values, 20, 0, 2, 7)).toEqual(direct(() => peaks([[spans]], [[loads]], list, null as any, null as any, null, null)));
    expect(block(values, 22, 0, 1, 4)).toEqual(direct(() => influence([[spans]], "moment at 6", [[0, 3, 6, 10]], null as any, null as any)));
    expect(block(values, 23, 0, 2, 5)).toEqual(direct(() => moving([[spans]], [["10 20"]], [["3"]], "absolute moment", null as any, null as any)));
  });
});
