import { expandSpillReferences, hasSpillReference, normalizeFormula, parseReference } from "../../src/engine";

describe("normalizeFormula", () => {
  it.each([
    ["=_xldudf_SPAN_MOMENT(A1,B1,C1)", "=SPAN.MOMENT(A1,B1,C1)"],
    ["=_xldudf_span_reactions(A1,B1)", "=SPAN.reactions(A1,B1)"],
    ["=_xll.SPAN.SHEAR(A1,B1,2)", "=SPAN.SHEAR(A1,B1,2)"],
    ["=_xlfn._xlws.SORT(A1:A4)", "=SORT(A1:A4)"],
    ["=SUM(_xlfn.ANCHORARRAY(C3))", "=SUM(C3#)"],
    ["=_xlfn.ANCHORARRAY('My sheet'!$C$3)*2", "='My sheet'!$C$3#*2"],
    ['="_xlfn. stays in text"&A1', '="_xlfn. stays in text"&A1'],
    ["=A1+B2", "=A1+B2"],
  ])("%s -> %s", (saved, typed) => {
    expect(normalizeFormula(saved)).toBe(typed);
  });
});

describe("spilled-range references", () => {
  it("finds A1# outside strings only, never error literals", () => {
    expect(hasSpillReference("=SUM(C3#)")).toBe(true);
    expect(hasSpillReference('="C3#"')).toBe(false);
    expect(hasSpillReference("=IFERROR(A1,#N/A)")).toBe(false);
  });

  it("replaces each reference by what the resolver gives", () => {
    const text = expandSpillReferences("=SUM(C3#)+Data!$A$1#+'Q 2'!B2#", (ref, written) => `[${ref.sheetName ?? ""}|${ref.row}|${ref.col}|${written}]`);
    expect(text).toBe("=SUM([|2|2|C3])+[Data|0|0|Data!$A$1]+[Q 2|1|1|'Q 2'!B2]");
  });

  it("parses sheet-qualified references", () => {
    expect(parseReference("'It''s'!AB10")).toEqual({ sheetName: "It's", row: 9, col: 27 });
  });
});
