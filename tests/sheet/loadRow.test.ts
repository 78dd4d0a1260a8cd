import { isCaseLabel, placeOf, toLoad, type LoadRow } from "../../src/sheet/loadRow";

const base: LoadRow = { kind: "udl", magnitude: 2, xStart: 0, xEnd: null, magnitudeEnd: 0, loadCase: "D", row: 3, fromText: false };

describe("toLoad", () => {
  test.each([
    ["udl to the member end", base, { kind: "udl", magnitude: 2, xStart: 0, xEnd: 6, magnitudeEnd: 2, loadCase: "D", row: 3 }],
    ["partial udl", { ...base, xStart: 1, xEnd: 4 }, { kind: "udl", magnitude: 2, xStart: 1, xEnd: 4, magnitudeEnd: 2, loadCase: "D", row: 3 }],
    ["linear", { ...base, kind: "linear" as const, magnitude: 0, magnitudeEnd: 5 }, { kind: "linear", magnitude: 0, xStart: 0, xEnd: 6, magnitudeEnd: 5, loadCase: "D", row: 3 }],
    ["point at the end", { ...base, kind: "point" as const, xStart: 6 }, { kind: "point", magnitude: 2, xStart: 6, xEnd: 6, magnitudeEnd: 0, loadCase: "D", row: 3 }],
  ])("%s", (_label, row, load) => {
    expect(toLoad(row, 6)).toEqual(load);
  });

  test.each([
    ["x start beyond", { ...base, kind: "point" as const, xStart: 7 }, /^load row 3, column 3 \(x start\): 7 is beyond the member end 6$/],
    ["x start before", { ...base, xStart: -1 }, /^load row 3, column 3 \(x start\): -1 is before the member start 0$/],
    ["x end beyond", { ...base, xEnd: 6.5 }, /^load row 3, column 4 \(x end\): 6.5 is beyond the member end 6$/],
    ["no length", { ...base, xStart: 6 }, /^load row 3, column 4 \(x end\): 6 is not beyond x start 6/],
    ["from text", { ...base, xStart: 9, fromText: true, row: 2 }, /^load 2 of the loads text \(x start\): 9 is beyond the member end 6$/],
  ])("%s is an error", (_label, row, message) => {
    expect(() => toLoad(row, 6)).toThrow(message);
  });
});

describe("case labels and places", () => {
  test.each([
    ["D", true],
    ["Lr", true],
    ["W2", true],
    ["2W", false],
    ["dead load", false],
    ["", false],
    ["L-r", false],
  ])("%p is a label: %p", (text, ok) => {
    expect(isCaseLabel(text)).toBe(ok);
  });

  test("places name the row and column of the table, or the load of the text", () => {
    expect(placeOf(3, false, "case")).toBe("load row 3, column 6 (case)");
    expect(placeOf(1, false, "type")).toBe("load row 1, column 1 (type)");
    expect(placeOf(2, true, "x end")).toBe("load 2 of the loads text (x end)");
  });
});

describe("positions at the member end within rounding (spans 3.3 + 3.3 + 3.3 sum to 9.899999999999999 in binary)", () => {
  const length = 3.3 + 3.3 + 3.3;
  test("a point load typed at 9.9 is on the member and keeps the value typed", () => {
    expect(length).toBeLessThan(9.9);
    expect(toLoad({ ...base, kind: "point", xStart: 9.9 }, length).xStart).toBe(9.9);
    expect(toLoad({ ...base, xStart: 1, xEnd: 9.9 }, length).xEnd).toBe(9.9);
  });
  test("clearly beyond is still an error, with the end shown as typed", () => {
    expect(() => toLoad({ ...base, kind: "point", xStart: 9.901 }, length)).toThrow(/9.901 is beyond the member end 9.9$/);
  });
});
