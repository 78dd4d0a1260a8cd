import { isAllBlank, isOmitted, listEntries, rowsOf, singleCell, splitList, vectorCells } from "../../src/sheet/ranges";

describe("rowsOf and singleCell", () => {
  test.each([
    [5, [[5]], 5],
    [[[5]], [[5]], 5],
    [[5, 6], [[5, 6]], undefined],
    [[[1, 2]], [[1, 2]], undefined],
    [[], [], null],
    [[[]], [[]], null],
  ])("%j", (arg, rows, single) => {
    expect(rowsOf(arg)).toEqual(rows);
    expect(singleCell(arg)).toEqual(single);
  });
});

describe("vectorCells", () => {
  test.each([
    [[[6, 8, 6]], [6, 8, 6]],
    [[[6], [8], [6]], [6, 8, 6]],
    [[[6]], [6]],
    [6, [6]],
    [[[6], [8, ""]], [6, 8]],
  ])("%j -> %j", (arg, cells) => {
    expect(vectorCells(arg, "spans")).toEqual(cells);
  });

  test("a block is an error naming the argument and its size", () => {
    expect(() => vectorCells([[1, 2], [3, 4]], "spans")).toThrow(/spans: give a single row or column, got a block of 2 rows by 2 columns/);
  });
});

describe("lists in one cell", () => {
  test.each([
    ["6 8 6", ["6", "8", "6"]],
    ["6, 8,6", ["6", "8", "6"]],
    ["  fixed   pin\tfree ", ["fixed", "pin", "free"]],
    ["", []],
  ])("%p", (text, parts) => {
    expect(splitList(text)).toEqual(parts);
    expect(listEntries([[text]], "spans")).toEqual(parts);
  });

  test("error text in a single cell stays one entry", () => {
    expect(listEntries([["#N/A"]], "spans")).toEqual(["#N/A"]);
  });

  test("numbers and ranges give their cells", () => {
    expect(listEntries([[6]], "spans")).toEqual([6]);
    expect(listEntries([[6, "8"]], "spans")).toEqual([6, "8"]);
  });
});

describe("omitted arguments", () => {
  test.each([
    [null, true, true],
    [undefined, true, true],
    ["", true, true],
    [[[""]], true, true],
    [[[null, ""]], true, true],
    [[[0]], false, true],
    [0, false, true],
    [[["pin"]], false, false],
  ])("%j: omitted %p, all blank %p", (arg, omitted, allBlank) => {
    expect(isOmitted(arg)).toBe(omitted);
    expect(isAllBlank(arg)).toBe(allBlank);
  });
});
