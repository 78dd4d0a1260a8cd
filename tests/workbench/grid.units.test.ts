/**
 * The grid's pure parts: tab-separated clipboard text (the plain-text form spreadsheets put on
 * the clipboard: tabs between cells, CRLF between rows, cells with tabs, line breaks or quotes
 * in double quotes with quotes doubled: DevExpress documentation, "SpreadsheetClipboardOptions.
 * UnquoteTabDelimitedText": pasted tab-delimited `"A""B"` is the cell A"B), typed input, fill
 * tiling, the row window, the history and the table hints.
 */
import { SHEET_LIMITS, type CellInput } from "../../src/engine";
import { parseTsv, toTsv } from "../../src/workbench/grid/clipboard";
import { clampWidth } from "../../src/workbench/grid/columns";
import { filledBlock, fillDownSource, fillRightSource, seriesBlock } from "../../src/workbench/grid/fill";
import { tableHint } from "../../src/workbench/grid/headerHint";
import { History } from "../../src/workbench/grid/history";
import { inputOf, shownText } from "../../src/workbench/grid/inputs";
import { parseNameBox, type Block } from "../../src/workbench/grid/selection";
import { ROW_HEIGHT, rowWindow, scrollFor } from "../../src/workbench/grid/viewport";

describe("parseTsv", () => {
  const cases: [string, string, string[][]][] = [
    ["one cell", "5", [["5"]]],
    ["trailing newline is no extra row", "1\t2\r\n3\t4\r\n", [["1", "2"], ["3", "4"]]],
    ["LF rows", "1\t2\n3\t4", [["1", "2"], ["3", "4"]]],
    ["quoted tab, line break and quotes", '"a\tb"\t"line\r\nbreak"\t"say ""hi"""\r\n', [["a\tb", "line\r\nbreak", 'say "hi"']]],
    ["ragged rows padded", "1\t2\t3\r\n4\r\n", [["1", "2", "3"], ["4", "", ""]]],
    ["empty cells kept", "\t\tx\r\n", [["", "", "x"]]],
    ["a quote inside a cell is a character", 'a"b\tc', [['a"b', "c"]]],
    ["an unclosed quote is a character", '"abc', [['"abc']]],
    ["blank line in the middle", "1\r\n\r\n2", [["1"], [""], ["2"]]],
    ["the documented doubled quote", '"A""B"\t123', [['A"B', "123"]]],
    ["an odd quote still splits at the tab", '"A"B"\t123', [['"A"B"', "123"]]],
  ];
  it.each(cases)("%s", (_, text, rows) => expect(parseTsv(text)).toEqual(rows));

  it("reads back what it writes (invariant)", () => {
    for (const rows of [[["a", "b\tc"], ['"q"', "x\r\ny"]], [["1.5", ""], ["", "=SUM(A1:B2)"]]]) expect(parseTsv(toTsv(rows))).toEqual(rows);
  });

  it("refuses more than a million cells rather than truncating", () => {
    expect(() => parseTsv("1\t".repeat(1_000_001))).toThrow(/more than 1000000 cells/);
  });
});

describe("inputOf", () => {
  const cases: [string, unknown][] = [
    ["12.5", 12.5],
    [" -3e2 ", -300],
    [".5", 0.5],
    ["", null],
    ["   ", null],
    ["TRUE", true],
    ["false", false],
    ["=A1*2", "=A1*2"],
    ["0x10", "0x10"],
    ["Infinity", "Infinity"],
    ["1,5", "1,5"],
    ["12 m", "12 m"],
    ["6 8 6", "6 8 6"],
    ["1,234.5", "1,234.5"],
    ["12%", "12%"],
    ["'5", "'5"], // the engine shows the text 5 (tests/engine: apostrophe)
    ["'=A1", "'=A1"],
  ];
  it.each(cases)("%p is %p", (text, input) => expect(inputOf(text)).toEqual(input));
});

describe("formula bar text when not editing", () => {
  const cases: [string, string][] = [
    ["'5", "5"],
    ["'=A1", "=A1"],
    ["''x", "'x"],
    ["text", "text"],
    ["=A1", "=A1"],
  ];
  it.each(cases)("%p shows as %p", (edit, shown) => expect(shownText(edit)).toBe(shown));
});

describe("fill", () => {
  const source = { top: 0, left: 0, bottom: 0, right: 1 };
  const inputs = [[3, "=A1*$B$1+B1"]];
  it("tiles the source over the target, formulas moved by their offset", () => {
    const block = filledBlock(source, { top: 1, left: 0, bottom: 3, right: 1 }, (r, c) => inputs[r][c]);
    expect(block).toEqual([
      [3, "=A2*$B$1+B2"],
      [3, "=A3*$B$1+B3"],
      [3, "=A4*$B$1+B4"],
    ]);
    expect(shiftLimit()).toBe("=#REF!");
  });
  const shiftLimit = () => filledBlock({ top: 0, left: 0, bottom: 0, right: 0 }, { top: 1, left: 0, bottom: 1, right: 0 }, () => `=A${SHEET_LIMITS.rows}`)[0][0];

  // Expected series: the arithmetic continuation (1, 2 -> 3, 4, 5) and, for uneven numbers, the
  // least-squares line computed by hand (1, 3, 4 at x = 0, 1, 2: mean 8/3 at x = 1, slope 3/2,
  // so 8/3 + 2 * 3/2 = 17/3 at x = 3).
  const seriesCases: [string, CellInput[][], "down" | "right", Block, CellInput[][]][] = [
    ["1, 2 dragged down", [[1], [2]], "down", { top: 2, left: 0, bottom: 4, right: 0 }, [[3], [4], [5]]],
    ["10, 7.5 dragged down", [[10], [7.5]], "down", { top: 2, left: 0, bottom: 3, right: 0 }, [[5], [2.5]]],
    ["1, 3, 4 (uneven) dragged down", [[1], [3], [4]], "down", { top: 3, left: 0, bottom: 3, right: 0 }, [[17 / 3]]],
    ["2, 4 dragged right", [[2, 4]], "right", { top: 0, left: 2, bottom: 0, right: 3 }, [[6, 8]]],
    ["a number and a formula column: the formula is copied moved", [[1, "=A1"], [2, "=A2"]], "down", { top: 2, left: 0, bottom: 3, right: 1 }, [[3, "=A3"], [4, "=A4"]]],
    ["text and a number: copied", [["a"], [2]], "down", { top: 2, left: 0, bottom: 3, right: 0 }, [["a"], [2]]],
    ["one number: copied", [[5]], "down", { top: 1, left: 0, bottom: 2, right: 0 }, [[5], [5]]],
  ];
  // Decimal steps continue as the decimals typed, not their binary neighbours (exact equality).
  it.each([
    [[0.1, 0.2], [0.3, 0.4, 0.5, 0.6, 0.7]],
    [[1.2, 1.4, 1.6], [1.8, 2, 2.2, 2.4, 2.6]],
    [[0.05, 0.15], [0.25, 0.35, 0.45]],
  ])("fill handle: %p continues exactly as %p", (values, expected) => {
    const source = { top: 0, left: 0, bottom: values.length - 1, right: 0 };
    const target = { top: values.length, left: 0, bottom: values.length + expected.length - 1, right: 0 };
    expect(seriesBlock(source, target, "down", (r) => values[r]).map((row) => row[0])).toEqual(expected);
  });
  it.each(seriesCases)("fill handle: %s", (_, inputs, direction, target, expected) => {
    const source = { top: 0, left: 0, bottom: inputs.length - 1, right: inputs[0].length - 1 };
    const block = seriesBlock(source, target, direction, (r, c) => inputs[r]?.[c]);
    expected.forEach((row, i) => row.forEach((v, j) => (typeof v === "number" ? expect(block[i][j]).toBeCloseTo(v, 12) : expect(block[i][j]).toBe(v))));
  });

  it("Ctrl+D and Ctrl+R take the first row / column, or the one before a single cell", () => {
    expect(fillDownSource({ top: 4, left: 1, bottom: 9, right: 2 })).toEqual({ source: { top: 4, left: 1, bottom: 4, right: 2 }, target: { top: 5, left: 1, bottom: 9, right: 2 } });
    expect(fillDownSource({ top: 4, left: 1, bottom: 4, right: 1 })).toEqual({ source: { top: 3, left: 1, bottom: 3, right: 1 }, target: { top: 4, left: 1, bottom: 4, right: 1 } });
    expect(fillDownSource({ top: 0, left: 0, bottom: 0, right: 0 })).toBeUndefined();
    expect(fillRightSource({ top: 0, left: 2, bottom: 0, right: 5 })?.target).toEqual({ top: 0, left: 3, bottom: 0, right: 5 });
  });
});

describe("viewport, widths, name box, history, hints", () => {
  it("renders the rows in view plus the overscan, never past the sheet", () => {
    expect(rowWindow(0, 24 + 10 * ROW_HEIGHT, 2000, 8)).toEqual({ first: 0, last: 27 });
    expect(rowWindow(1000 * ROW_HEIGHT, 24 + 10 * ROW_HEIGHT, 2000, 8)).toEqual({ first: 992, last: 1019 });
    expect(rowWindow(1e9, 600, 50, 8).last).toBe(49);
    expect(rowWindow(0, 600, 0)).toEqual({ first: 0, last: -1 });
    expect(scrollFor(5, 0, 24 + 10 * ROW_HEIGHT)).toBeUndefined();
    expect(scrollFor(30, 0, 24 + 10 * ROW_HEIGHT)).toBe(31 * ROW_HEIGHT - 10 * ROW_HEIGHT);
    expect(scrollFor(3, 100 * ROW_HEIGHT, 600)).toBe(3 * ROW_HEIGHT);
  });

  it("keeps column widths within 24 to 800 px", () => {
    expect([clampWidth(3), clampWidth(96.4), clampWidth(5000), clampWidth(Number.NaN)]).toEqual([24, 96, 800, 96]);
  });

  it("reads the name box or says why not", () => {
    expect(parseNameBox(" b2:d9 ")).toEqual({ sheet: undefined, from: { row: 1, col: 1 }, to: { row: 8, col: 3 } });
    expect(parseNameBox("'My sheet'!A1")).toMatchObject({ sheet: "My sheet" });
    expect(parseNameBox("B2:")).toMatch(/is not a cell or range/);
    expect(parseNameBox("")).toMatch(/type a cell/);
    expect(parseNameBox("A0")).toMatch(/outside the sheet/);
    expect(parseNameBox("XFE1")).toMatch(/outside the sheet/);
    expect(parseNameBox("XFD1048576")).toMatchObject({ from: { row: 1048575, col: 16383 } });
    expect(parseNameBox("A1048577")).toMatch(/outside the sheet/);
  });

  it("undoes and redoes in order, a new step clears the redo list, at most 100 kept", () => {
    const h = new History();
    const step = (n: number) => ({ kind: "block" as const, sheet: "S", top: n, left: 0, before: [[null]], after: [[n]] });
    for (let i = 0; i < 105; i++) h.record(step(i));
    let undone = 0;
    while (h.undo()) undone++;
    expect(undone).toBe(100);
    expect((h.redo() as { top: number }).top).toBe(5);
    h.record(step(999));
    expect(h.canRedo).toBe(false);
  });

  it("names the columns of a SPAN table only for a formula whose outer call it is", () => {
    expect(tableHint("=SPAN.REACTIONS(B3:C3,A10:F14)")).toEqual({ name: "SPAN.REACTIONS", columns: ["x", "R", "M reaction"] });
    expect(tableHint("=span.diagram(A1,B1,11)")?.columns).toEqual(["x", "V", "M", "slope", "deflection"]);
    expect(tableHint("=INDEX(SPAN.REACTIONS(B3,C3),1,1)")).toBeUndefined();
    expect(tableHint("=SPAN.MOMENT(A1,B1,2)")).toBeUndefined();
    expect(tableHint(undefined)).toBeUndefined();
  });
});
