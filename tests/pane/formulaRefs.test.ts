import { classifyArgument, parseSpanFormula, unresolvedArguments, type ArgSource } from "../../src/pane/formulaRefs";
import { SPAN_FUNCTIONS } from "../../src/engine/catalogue";

function parsed(formula: string) {
  const result = parseSpanFormula(formula);
  if (!result.ok) throw new Error(`expected a SPAN call in ${formula}: ${result.message}`);
  return result.call;
}

describe("classifyArgument", () => {
  const cases: [string, ArgSource][] = [
    ["", { kind: "omitted", text: "" }],
    ["  ", { kind: "omitted", text: "" }],
    ["B3:B5", { kind: "range", address: "B3:B5", text: "B3:B5" }],
    ["$b$3", { kind: "range", address: "B3", text: "$b$3" }],
    ["Loads!A2:F9", { kind: "range", sheet: "Loads", address: "A2:F9", text: "Loads!A2:F9" }],
    ["'Load table'!$A$2:$F$9", { kind: "range", sheet: "Load table", address: "A2:F9", text: "'Load table'!$A$2:$F$9" }],
    ["'O''Hara bay'!C4", { kind: "range", sheet: "O'Hara bay", address: "C4", text: "'O''Hara bay'!C4" }],
    ["A17#", { kind: "spill", address: "A17", text: "A17#" }],
    ["Member!$H$3#", { kind: "spill", sheet: "Member", address: "H3", text: "Member!$H$3#" }],
    ["B211_spans", { kind: "name", name: "B211_spans", text: "B211_spans" }],
    ["Member!loads.beam", { kind: "name", sheet: "Member", name: "loads.beam", text: "Member!loads.beam" }],
    ["6.5", { kind: "literal", value: 6.5, text: "6.5" }],
    ["-2e3", { kind: "literal", value: -2000, text: "-2e3" }],
    ["50%", { kind: "literal", value: 0.5, text: "50%" }],
    ['"1.2D+1.6L"', { kind: "literal", value: "1.2D+1.6L", text: '"1.2D+1.6L"' }],
    ['"say ""hi"""', { kind: "literal", value: 'say "hi"', text: '"say ""hi"""' }],
    ["TRUE", { kind: "literal", value: true, text: "TRUE" }],
    ["{6,8,6}", { kind: "array", rows: [[6, 8, 6]], text: "{6,8,6}" }],
    ['{"pin";"fixed";"free"}', { kind: "array", rows: [["pin"], ["fixed"], ["free"]], text: '{"pin";"fixed";"free"}' }],
    ['{"udl",2.5,0,6,0,"D";"point",10,3,,0,"L"}', { kind: "expression", text: '{"udl",2.5,0,6,0,"D";"point",10,3,,0,"L"}' }],
    ['{"udl",2.5,0,6,0,"D";"point",10,3,0,0,"L"}', { kind: "array", rows: [["udl", 2.5, 0, 6, 0, "D"], ["point", 10, 3, 0, 0, "L"]], text: '{"udl",2.5,0,6,0,"D";"point",10,3,0,0,"L"}' }],
    ["{1,2;3}", { kind: "expression", text: "{1,2;3}" }],
    ["B3*2", { kind: "expression", text: "B3*2" }],
    ["{0,1}*A6", { kind: "expression", text: "{0,1}*A6" }],
    ['B6&" "&C6', { kind: "expression", text: 'B6&" "&C6' }],
    ["OFFSET(A1,0,0,1,3)", { kind: "expression", text: "OFFSET(A1,0,0,1,3)" }],
    ["A:A", { kind: "expression", text: "A:A" }],
  ];
  it.each(cases)("%s", (text, expected) => {
    expect(classifyArgument(text)).toEqual(expected);
  });
});

describe("parseSpanFormula", () => {
  it("rejects more arguments than the function takes, naming the count", () => {
    const result = parseSpanFormula('=SPAN.MOMENT(B3:B5,Loads!A2:F9,C3,,D3:D6,E3,"1.2D+1.6L","length=m, force=kN",F1)');
    expect(result).toEqual({ ok: false, message: "SPAN.MOMENT takes at most 7 arguments, the formula gives 9" });
  });

  it("maps a full six-argument moment call", () => {
    const call = parsed('=SPAN.MOMENT(B3:B5,Loads!A2:F9,C3,D3:D6,E3,"1.2D+1.6L")');
    expect(call.args).toEqual({
      spans: { kind: "range", address: "B3:B5", text: "B3:B5" },
      loads: { kind: "range", sheet: "Loads", address: "A2:F9", text: "Loads!A2:F9" },
      x: { kind: "range", address: "C3", text: "C3" },
      supports: { kind: "range", address: "D3:D6", text: "D3:D6" },
      EI: { kind: "range", address: "E3", text: "E3" },
      combo: { kind: "literal", value: "1.2D+1.6L", text: '"1.2D+1.6L"' },
    });
  });

  it("maps DIAGRAM with points before the supports, and skipped arguments", () => {
    const call = parsed("=SPAN.DIAGRAM(Schedule!$B$4,Schedule!$C$4,101,,Schedule!E4)");
    expect(call.entry.arguments.map((a) => a.name)).toEqual(["spans", "loads", "points", "supports", "EI", "combo", "units", "headers"]);
    expect(call.args.points).toEqual({ kind: "literal", value: 101, text: "101" });
    expect(call.args.supports).toEqual({ kind: "omitted", text: "" });
    expect(call.args.EI).toEqual({ kind: "range", sheet: "Schedule", address: "E4", text: "Schedule!E4" });
    expect(call.args.combo).toBeUndefined();
  });

  it.each(SPAN_FUNCTIONS.map((entry) => [entry.sheetName, entry] as const))("%s names its member arguments", (name, entry) => {
    const texts = entry.arguments.map((_arg, i) => `Z${i + 1}`);
    const call = parsed(`=${name.toLowerCase()}(${texts.join(",")})`);
    expect(call.functionName).toBe(name);
    entry.arguments.forEach((arg, i) => expect(call.args[arg.name]).toEqual({ kind: "range", address: `Z${i + 1}`, text: `Z${i + 1}` }));
  });

  it("finds the SPAN call nested in another function", () => {
    const call = parsed("=INDEX(SPAN.MAXMOMENT(B6,J6,C6,D6,$B$3),1,1)");
    expect(call.functionName).toBe("SPAN.MAXMOMENT");
    expect(call.args.combo).toEqual({ kind: "range", address: "B3", text: "$B$3" });
    expect(unresolvedArguments(call)).toEqual([]);
  });

  it("reads the forms a saved workbook stores", () => {
    expect(parsed("=_xldudf_SPAN_REACTIONS(B3:C3,_xlfn.ANCHORARRAY(A10))").args.loads).toEqual({ kind: "spill", address: "A10", text: "A10#" });
    expect(parsed("=_xll.SPAN.EXTREMES(B3:C3,A10:F14)").functionName).toBe("SPAN.EXTREMES");
  });

  it("ignores SPAN text inside string literals", () => {
    const call = parsed('=IF(A1="SPAN.SHEAR(",SPAN.REACTIONS(B3,B4),0)');
    expect(call.functionName).toBe("SPAN.REACTIONS");
    expect(parseSpanFormula('="SPAN.MOMENT(A1,B1,2)"')).toEqual({ ok: false, message: "the formula holds no SPAN function" });
  });

  it("reports expressions among the member arguments, not among the others", () => {
    const call = parsed('=SPAN.SHEAR(A6*2,B3&"; point 4 at 1",{0,1}*A6,,,"1.2D+1.6L")');
    expect(call.args.x.kind).toBe("expression");
    expect(unresolvedArguments(call)).toEqual(["spans", "loads"]);
  });

  it.each([
    [null, "the cell holds no formula"],
    ["", "the cell holds no formula"],
    ["=SUM(A1:A4)", "the formula holds no SPAN function"],
    ["=SPAN.TORQUE(A1,B1)", "SPAN.TORQUE is not a SPAN function"],
    ["=SPAN.MOMENT(A1,(B1", "the formula's brackets do not close"],
  ])("%s -> %s", (formula, message) => {
    expect(parseSpanFormula(formula)).toEqual({ ok: false, message });
  });
});
