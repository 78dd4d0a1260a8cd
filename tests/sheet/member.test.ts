import { readComboText, readLoads, readMember } from "../../src/sheet/member";
import { readPoints } from "../../src/sheet/worksheet";

describe("readMember", () => {
  test("ranges: spans, supports, one EI expanded per span, loads resolved to the member end", () => {
    const member = readMember({
      spans: [[4, 6]],
      loads: [
        ["udl", 2, "", "", "", "D"],
        ["point", 10, 3, "", "", "L"],
      ],
      supports: [["fixed", "pin", "free"]],
      EI: [[5000]],
      combo: null,
    });
    expect(member.spans).toEqual([4, 6]);
    expect(member.supports).toEqual([{ kind: "fixed" }, { kind: "pin" }, { kind: "free" }]);
    expect(member.stiffness).toEqual([5000, 5000]);
    expect(member.loads).toEqual([
      { kind: "udl", magnitude: 2, xStart: 0, xEnd: 10, magnitudeEnd: 2, loadCase: "D", row: 1 },
      { kind: "point", magnitude: 10, xStart: 3, xEnd: 3, magnitudeEnd: 0, loadCase: "L", row: 2 },
    ]);
  });

  test("text cells and a combination", () => {
    const member = readMember({ spans: "4 6", loads: [["udl 2 D; point 10 at 3 L"]], supports: null, EI: null, combo: [["1.2D+1.6L"]] });
    expect(member.supports).toEqual([{ kind: "pin" }, { kind: "pin" }, { kind: "pin" }]);
    expect(member.stiffness).toBeNull();
    expect(member.loads.map((l) => [l.kind, l.magnitude])).toEqual([
      ["udl", 2.4],
      ["point", 16],
    ]);
  });

  test("the user's input is not changed", () => {
    const loads = [["udl", " 2 ", "", "", "", "D"]];
    const copy = JSON.parse(JSON.stringify(loads));
    readMember({ spans: [[6]], loads, supports: null, EI: null, combo: "1.5D" });
    expect(loads).toEqual(copy);
  });
});

describe("readLoads", () => {
  test.each([
    ["blank cell", [[""]], 0],
    ["blank as 0", [[0]], 0],
    ["null", null, 0],
    ["notation", [["udl 1; point 2 at 1"]], 2],
    ["table", [["udl", 1], ["point", 2, 1]], 2],
  ])("%s", (_label, arg, count) => {
    expect(readLoads(arg)).toHaveLength(count);
  });

  test("a single number cell is not a load", () => {
    expect(() => readLoads([[5]])).toThrow(/load row 1, column 1 \(type\): 5 is not a load type/);
  });
});

describe("readComboText and readPoints", () => {
  test.each([
    [null, ""],
    ["", ""],
    [0, ""],
    [[[""]], ""],
    ["1.2D+1.6L", "1.2D+1.6L"],
    [[["D"]], "D"],
  ])("combo %p -> %p", (arg, text) => {
    expect(readComboText(arg)).toBe(text);
  });

  test.each([
    [null, 101],
    ["", 101],
    [0, 101],
    [[[null]], 101],
    [2, 2],
    ["51", 51],
    [[[10001]], 10001],
  ])("points %p -> %p", (arg, points) => {
    expect(readPoints(arg)).toBe(points);
  });

  test.each([[1], [-3], [2.5], [10002], [[[1, 2]]], [true]])("points %p is an error", (arg) => {
    expect(() => readPoints(arg)).toThrow(/points/);
  });
});
