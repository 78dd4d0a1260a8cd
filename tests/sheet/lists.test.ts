import { readFlexure, MAX_SPANS, readSpans, readSpansFully, readStiffness } from "../../src/sheet/lists";

describe("readSpans", () => {
  test.each([
    ["row of numbers", [[6, 8, 6]], [6, 8, 6]],
    ["column with numbers as text", [["6"], [" 8 "], [6]], [6, 8, 6]],
    ["text cell", [["6 8 6"]], [6, 8, 6]],
    ["text cell with commas", [["4.5,3"]], [4.5, 3]],
    ["single number", [[7.25]], [7.25]],
    ["bare number (Node caller)", 5, [5]],
    ["trailing empty cells", [[6, 8, "", null]], [6, 8]],
  ])("%s", (_label, arg, expected) => {
    expect(readSpans(arg)).toEqual(expected);
  });

  test.each([
    ["blank", [[""]], /spans: give at least one span length/],
    ["omitted", null, /spans: give at least one span length/],
    ["blank inside", [[6, "", 8]], /spans entry 2: the cell is blank; give a number/],
    ["zero inside", [[6, 0, 8]], /spans entry 2: a span length must be positive, got 0/],
    ["a trailing 0 (a computed 0 must not drop a span: issue 11)", [[6, 8, 0]], /spans entry 3: a span length must be positive, got 0/],
    ["a single 0", [[0]], /spans entry 1: a span length must be positive, got 0/],
    ["negative", [["6 -2"]], /spans entry 2: a span length must be positive, got -2/],
    ["text", [[6, "eight"]], /spans entry 2: "eight" is not a number/],
    ["unit in text", [["6m 8m"]], /spans entry 1: "6m" is not a number/],
    ["error value", [[6, { code: "#DIV/0!" }]], /spans entry 2: the cell holds the error #DIV\/0!/],
    ["error text", [["#N/A"]], /spans entry 1: the cell holds the error #N\/A/],
    ["block", [[6, 8], [6, 8]], /spans: give a single row or column/],
  ])("%s is an error", (_label, arg, message) => {
    expect(() => readSpans(arg)).toThrow(message);
  });

  test("at most 1,000 spans (MAX_SPANS): a row of that many is read, one more is #VALUE! naming the limit", () => {
    expect(readSpans([new Array(MAX_SPANS).fill(1)])).toHaveLength(MAX_SPANS);
    expect(() => readSpans([new Array(MAX_SPANS + 1).fill(1)])).toThrow(`spans: at most ${MAX_SPANS} spans on one member, got ${MAX_SPANS + 1}`);
    expect(() => readSpans(Array(200001).fill("6").join(" "))).toThrow(/^spans: at most 1000 spans on one member, got 200001$/);
  });
});

describe("readStiffness", () => {
  test.each([
    ["omitted", null, 3, null],
    ["blank cell", [[""]], 3, null],
    ["blank as 0", [[0]], 3, null],
    ["blank range", [["", null, 0]], 3, null],
    ["one value for the member", [[20000]], 3, [20000, 20000, 20000]],
    ["one per span", [[1, 2, "3"]], 3, [1, 2, 3]],
    ["text cell", [["1e4 2e4"]], 2, [10000, 20000]],
    ["blank cells beyond the spans' count", [[20000, "", 0]], 1, [20000]],
    ["one value per span, range wider than the member", [[1, 2, 0, ""]], 2, [1, 2]],
  ])("%s", (_label, arg, spans, expected) => {
    expect(readStiffness(arg, spans)).toEqual(expected);
  });

  test.each([
    ["wrong count", [[1, 2]], 3, /EI: give one value for the member or one per span \(3\), got 2/],
    ["text", [["stiff"]], 1, /EI entry 1: "stiff" is not a number/],
    ["error value", [[{ code: "#N/A" }]], 1, /EI entry 1: the cell holds the error #N\/A/],
    ["{20000, 0} for two spans is not uniform EI (issue 11)", [[20000, 0]], 2, /EI entry 2: EI must be positive, got 0/],
    ["one EI cell of two blank", [[20000, ""]], 2, /EI entry 2: the cell is blank; give a number/],
    ["one EI cell of three blank", [[20000, "", 30000]], 3, /EI entry 2: the cell is blank; give a number/],
    ["two cells for three spans, the second blank", [[20000, ""]], 3, /EI entry 2: the cell is blank or 0; give one EI per span \(3\)/],
    ["a 0 for the whole member among blanks", [[0, 5, 0]], 3, /EI entry 1: EI must be positive, got 0/],
    ["negative", [[-5]], 1, /EI entry 1: EI must be positive, got -5/],
  ])("%s is an error", (_label, arg, spans, message) => {
    expect(() => readStiffness(arg, spans)).toThrow(message);
  });
});

describe("readFlexure: EI with the shear stiffness G·A_v after the word shear", () => {
  test.each([
    ["no shear: as readStiffness", [["1e4 2e4"]], 2, { stiffness: [10000, 20000], shear: null }],
    ["one text cell for the member", "2.1e5 shear 8e4", 3, { stiffness: [210000, 210000, 210000], shear: [80000, 80000, 80000] }],
    ["one text cell per span, shear on the first only", [["2e5 SHEAR 8e4, 3e5"]], 2, { stiffness: [200000, 300000], shear: [80000, null] }],
    ["a range: one cell with shear, one plain number", [["2e5 shear 7e4", 3e5]], 2, { stiffness: [200000, 300000], shear: [70000, null] }],
    ["a range, each cell with shear", [["2e5 shear 7e4", "3e5 shear 9e4"]], 2, { stiffness: [200000, 300000], shear: [70000, 90000] }],
    ["a range wider than the one span", [["2e5 shear 7e4", "", 0]], 1, { stiffness: [200000], shear: [70000] }],
    ["omitted", null, 2, { stiffness: null, shear: null }],
  ])("%s", (_label, arg, spans, expected) => {
    expect(readFlexure(arg, spans)).toEqual(expected);
  });

  test.each([
    ["shear without a value", "2e5 shear", 1, /^EI entry 1: shear must be followed by a positive shear stiffness G·A_v \(force units\), got ""$/],
    ["shear of 0", "2e5 shear 0", 1, /^EI entry 1: shear must be followed by a positive shear stiffness G·A_v \(force units\), got "0"$/],
    ["shear negative", [["2e5 shear -3"]], 1, /got "-3"$/],
    ["shear text", "2e5 shear lots", 1, /got "lots"$/],
    ["shear first", "shear 8e4", 1, /^EI entry 1: "shear" must follow an EI value, as in 2.1e5 shear 8e4/],
    ["shear twice", "2e5 shear 8e4 shear 9e4", 1, /^EI entry 1: "shear" must follow an EI value/],
    ["two EI values in one range cell", [["2e5 3e5 shear 8e4", 1]], 2, /^EI entry 1: "2e5 3e5 shear 8e4" is not one EI; write EI or EI shear G·A_v in each cell$/],
    ["a shear entry counted wrongly", "2e5 shear 8e4 3e5 4e5", 2, /EI: give one value for the member or one per span \(2\), got 3/],
    ["EI of 0 with shear", "0 shear 8e4", 1, /EI entry 1: EI must be positive, got 0/],
  ])("%s is an error", (_label, arg, spans, message) => {
    expect(() => readFlexure(arg, spans)).toThrow(message);
  });

  test("2,000 spans, each with its shear stiffness, in one text cell", () => {
    const text = "2e5 shear 8e4 ".repeat(2000);
    expect(readFlexure(text, 2000).shear).toHaveLength(2000);
  });
});

/** The spans read (by `read`), or the message of the error thrown. */
function spansOutcome(arg: unknown, read: (arg: unknown) => number[]): unknown {
  try {
    return read(arg);
  } catch (error) {
    return `error: ${(error as Error).message}`;
  }
}

describe("readSpans' fast paths (one plain text cell, a plain row or column of numbers) give what the full reader gives", () => {
  const many = (count: number, sep = " "): string => Array.from({ length: count }, (_, i) => String(1 + (i % 7))).join(sep);
  test.each([
    "6 8 6", "6,8,6", " 6 , 8 ", "6,,8", ",6,", "2.50 3.00", "002.500", "1e1 2E-1", "1E+1", "+5", "-0", "0", "0.0", "-3", "6 -2", "6 x", "6 8 6 m", "6m 8m", "6 kN",
    "", "  ", ",", " , ", "6\t8\n6\r4\v2\f1", "6;8", "6\u00a08", "6\u30008", "\ufeff6", "6\u0001", "#N/A", "#6", " #N/A ", "1e400", "5e-400", "0x10", "1_0", ".5 5.",
    "5..0", ".", "e5", "1e", "12345678901234567890", "0.1234567890123456789", "١", "６", "Infinity", "NaN", many(MAX_SPANS), many(MAX_SPANS + 1), many(MAX_SPANS, ","),
  ])("text %p, as one cell and as a bare string", (text) => {
    expect(spansOutcome([[text]], readSpans)).toEqual(spansOutcome([[text]], readSpansFully));
    expect(spansOutcome(text, readSpans)).toEqual(spansOutcome(text, readSpansFully));
    expect(spansOutcome([text], readSpans)).toEqual(spansOutcome([text], readSpansFully));
  });

  const row = (count: number): number[][] => [Array.from({ length: count }, (_, i) => 1 + (i % 7))];
  test.each([
    [[[6, 8, 6]]], [[[6], [8], [6]]], [[[6, 8, ""]]], [[[6, 8, null]]], [[[6, "", 8]]], [[[6, 0]]], [[[0]]], [[[-0]]], [[[-2]]], [[[NaN]]], [[[Infinity]]], [[[-Infinity]]],
    [[[6, "8"]]], [[["6"], [8]]], [[[6, true]]], [[[6], [8, 9]]], [[[6, 8], [6, 8]]], [[]], [[[]]], [[[null]]], [[[""]]], [[[6], []]], [[[6], [""]]], [[[6], [0]]], [[[2.5e-300]]],
    [[[1.7976931348623157e308]]], [[6, 8]], [6], [null], [undefined], [[[6, { code: "#DIV/0!" }]]], [row(MAX_SPANS)], [row(MAX_SPANS + 1)],
    [Array.from({ length: MAX_SPANS + 1 }, () => [5])],
  ])("range %#", (arg) => {
    expect(spansOutcome(arg, readSpans)).toEqual(spansOutcome(arg, readSpansFully));
  });

  test("the fast paths return a fresh array (the caller's row is never the member's spans)", () => {
    const given = [[6, 8]];
    const spans = readSpans(given);
    expect(spans).toEqual([6, 8]);
    expect(spans).not.toBe(given[0]);
  });
});
