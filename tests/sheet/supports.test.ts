import { readSupports } from "../../src/sheet/supports";

const pin = { kind: "pin" };
const fixed = { kind: "fixed" };
const free = { kind: "free" };
const hinge = { kind: "hinge" };

describe("readSupports", () => {
  test.each([
    ["omitted", null, 2, [pin, pin, pin]],
    ["blank cell", [[""]], 1, [pin, pin]],
    ["zero cell (blank as 0)", [[0]], 1, [pin, pin]],
    ["text cell", [["fixed pin pin free"]], 3, [fixed, pin, pin, free]],
    ["text with commas, any case", [["Fixed,HINGE, Pin"]], 2, [fixed, hinge, pin]],
    ["spring in text", [["pin 5000 pin"]], 2, [pin, { kind: "spring", stiffness: 5000 }, pin]],
    ["row range", [["fixed", "pin", "free"]], 2, [fixed, pin, free]],
    ["column range", [["pin"], ["pin"], ["pin"]], 2, [pin, pin, pin]],
    ["spring numbers and numbers as text", [[" fixed ", 250, "1e3"]], 2, [fixed, { kind: "spring", stiffness: 250 }, { kind: "spring", stiffness: 1000 }]],
    ["trailing blanks beyond the nodes", [["pin"], ["fixed"], [""], [null]], 1, [pin, fixed]],
  ])("%s", (_label, arg, spans, expected) => {
    expect(readSupports(arg, spans)).toEqual(expected);
  });

  test.each([
    ["too few", [["pin pin"]], 2, /supports: need 3 entries \(one per node, spans \+ 1\) for 2 spans, got 2/],
    ["too many", [["pin", "pin", "pin"]], 1, /need 2 entries .* got 3/],
    ["unknown word", [["pin roller"]], 1, /supports entry 2: "roller" is not a support; use pin, fixed, free, hinge or a spring stiffness/],
    ["negative spring", [["pin", -5]], 1, /supports entry 2: spring stiffness must be a positive number, got -5/],
    ["a 0 in a range (a spring of 0, or a blank delivered as 0: issue 11)", [["pin", 0]], 1, /supports entry 2: the cell is blank or 0; write pin, fixed, free or hinge, or a positive spring stiffness/],
    ["a blank cell for a node", [["fixed", "", "pin"]], 2, /supports entry 2: the cell is blank or 0/],
    ["a null cell for a node", [["fixed", null, "pin"]], 2, /supports entry 2: the cell is blank or 0/],
    ["prototype-like words", [["pin constructor"]], 1, /supports entry 2: "constructor" is not a support/],
    ["__proto__", [["__proto__", "pin"]], 1, /supports entry 1: "__proto__" is not a support/],
    ["zero spring written in text", [["pin 0"]], 1, /supports entry 2: spring stiffness must be a positive number, got 0/],
    ["error value", [["pin", { code: "#REF!" }]], 1, /supports entry 2: the cell holds the error #REF!/],
    ["error text", [["#N/A", "pin"]], 1, /supports entry 1: the cell holds the error #N\/A/],
    ["boolean", [[true, "pin"]], 1, /supports entry 1: TRUE is not a support/],
    ["block", [["pin", "pin"], ["pin", "pin"]], 3, /supports: give a single row or column/],
  ])("%s is an error", (_label, arg, spans, message) => {
    expect(() => readSupports(arg, spans)).toThrow(message);
  });
});
