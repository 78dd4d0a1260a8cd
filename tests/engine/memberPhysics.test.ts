/** Settlement rows and the shear word of EI in the formula engine (workbench and CLI): spills equal direct calls. */
import { SpanWorkbook } from "../../src/engine";
import { caseReactions, deflection, reactions } from "../../functions/functions";
import { block, direct } from "./support/direct";

const spans = "6 6";
const loads = "udl 2 D; settle 0.01 at 6 SD";
const ei = "1.2e4 shear 5e3";

describe("settlement and shear deformation in the formula engine", () => {
  const wb = new SpanWorkbook([
    {
      name: "Physics",
      cells: [
        [spans, loads, ei, 3],
        ["=SPAN.REACTIONS(A1,B1,,C1)"],
        [], [],
        ["=SPAN.CASEREACTIONS(A1,B1,,C1)"],
        [], [],
        ["=SPAN.DEFLECTION(A1,B1,D1,,C1)"],
      ],
    },
  ]);
  const values = wb.getSheetValues(0);

  it("each spills what the direct call returns", () => {
    expect(typeof values[1][1]).toBe("number");
    expect(block(values, 1, 0, 3, 3)).toEqual(direct(() => reactions([[spans]], [[loads]], null as any, [[ei]])));
    expect(block(values, 4, 0, 3, 3)).toEqual(direct(() => caseReactions([[spans]], [[loads]], null as any, [[ei]])));
    expect(block(values, 7, 0, 1, 1)).toEqual(direct(() => deflection([[spans]], [[loads]], [[3]], null as any, [[ei]])));
  });
});
