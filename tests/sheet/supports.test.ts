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
    ["spring S in a cell", [["spring 200", "pin"]], 1, [{ kind: "spring", stiffness: 200 }, pin]],
    ["rotational springs, one per cell", [["pin+rot 5000", "rot 800", "Spring 200 ROT 5e3", "pin rot 1", "300 + rot 4"]], 4, [
      { kind: "pin", rotational: 5000 },
      { kind: "free", rotational: 800 },
      { kind: "spring", stiffness: 200, rotational: 5000 },
      { kind: "pin", rotational: 1 },
      { kind: "spring", stiffness: 300, rotational: 4 },
    ]],
    ["rotational springs in a one-cell list", [["fixed pin+rot 5000 spring 200+rot 5000 rot 800 spring 50"]], 4, [
      fixed,
      { kind: "pin", rotational: 5000 },
      { kind: "spring", stiffness: 200, rotational: 5000 },
      { kind: "free", rotational: 800 },
      { kind: "spring", stiffness: 50 },
    ]],
    ["in a one-cell list, pin rot K is a pin and a free node with rot K", [["pin rot 5000"]], 1, [pin, { kind: "free", rotational: 5000 }]],
  ])("%s", (_label, arg, spans, expected) => {
    expect(readSupports(arg, spans)).toEqual(expected);
  });

  test.each([
    ["too few", [["pin pin"]], 2, /supports: need 3 entries \(one per node, spans \+ 1\) for 2 spans, got 2/],
    ["too many", [["pin", "pin", "pin"]], 1, /need 2 entries .* got 3/],
    ["unknown word", [["pin roller"]], 1, /supports entry 2: "roller" is not a support; use pin, fixed, free, hinge, a spring stiffness \(a positive number\), or rot K for a rotational spring/],
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
    ["rot without a stiffness", [["pin", "pin+rot"]], 1, /supports entry 2: rot must be followed by a positive rotational spring stiffness \(moment per radian\), got ""/],
    ["rot 0 (use pin)", [["pin", "pin+rot 0"]], 1, /supports entry 2: rot must be followed by a positive rotational spring stiffness .* got "0" \(use pin for none, fixed for full fixity\)/],
    ["rot with a negative stiffness", [["pin", "rot -4"]], 1, /got "-4"/],
    ["rot with a unit or typo", [["pin", "rot 5k"]], 1, /got "5k"/],
    ["fixed with rot", [["fixed+rot 5", "pin"]], 1, /supports entry 1: "fixed" cannot take a rotational spring; write rot K, pin\+rot K or spring S rot K/],
    ["hinge with rot", [["pin", "hinge rot 5", "pin"]], 2, /supports entry 2: "hinge" cannot take a rotational spring/],
    ["a spring of 0 with rot", [["spring 0 rot 5", "pin"]], 1, /supports entry 1: "spring 0" cannot take a rotational spring/],
    ["one-cell list ending in rot", [["pin pin+rot"]], 1, /supports entry 2: rot must be followed/],
  ])("%s is an error", (_label, arg, spans, message) => {
    expect(() => readSupports(arg, spans)).toThrow(message);
  });
});
