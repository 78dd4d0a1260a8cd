import { SPAN_FUNCTIONS } from "../../src/engine";
import { SPAN_EXPORTS } from "../../src/engine/spanFunctions";
import { CATALOGUE } from "../functions/catalogue";
import { SpanWorkbook } from "../../src/engine";
import { convertUnits, section } from "../../functions/functions";
import { block, direct } from "./support/direct";

describe("the formula engine knows every worksheet function", () => {
  it("one engine entry per catalogue function, same export and the same parameters in order", () => {
    expect(SPAN_FUNCTIONS.map((e) => e.sheetName).sort()).toEqual(CATALOGUE.map((c) => `SPAN.${c.id}`).sort());
    for (const c of CATALOGUE) {
      const entry = SPAN_FUNCTIONS.find((e) => e.sheetName === `SPAN.${c.id}`)!;
      expect(entry.exportName).toBe(c.exportName);
      expect(entry.arguments.map((a) => [a.name, a.optional])).toEqual(c.parameters.map(([name, , optional]) => [name, optional]));
      expect(typeof SPAN_EXPORTS[entry.exportName]).toBe("function");
    }
  });

  it("SECTION and CONVERT spill in the workbench engine as direct calls return", () => {
    const wb = new SpanWorkbook([{ name: "S", cells: [["=SPAN.SECTION(\"rectangle\",\"0.3 0.6\",\"m\")"], ...Array.from({ length: 20 }, () => []), ["=SPAN.CONVERT(12,\"ft\",\"m\")"]] }]);
    const values = wb.getSheetValues(0);
    const expected = direct(() => section("rectangle", [["0.3 0.6"]], "m", null));
    expect(block(values, 0, 0, expected.length, expected[0].length)).toEqual(expected);
    expect(block(values, 21, 0, 1, 1)).toEqual(direct(() => convertUnits([[12]], "ft", "m")));
  });
});
