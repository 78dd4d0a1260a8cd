/**
 * Hostile input classes of issue 14, through every worksheet function: each argument of a
 * valid call is replaced in turn by prototype-like keys (`constructor`, `__proto__`,
 * `toString` as units, labels, supports, effects, shapes, set names, combinations), long
 * pathological text (32,767 characters, the spreadsheet's cell limit: a run of digits or
 * spaces and one bad character) and huge counts (spans, loads, combinations). Every call must
 * return a well-formed result or a #VALUE!/#N/A of our own: never "unexpected problem",
 * never a thrown TypeError or RangeError (a stack overflow from spreading a huge array).
 * Speed is not asserted here (tests/hardening/linearParsers checks the growth of parsing time).
 */
import * as fx from "../../functions/functions";
import { MAX_LOADS } from "../../src/core";
import { MAX_SPANS } from "../../src/sheet/lists";
import { outcomeOf, violations } from "./outcome";

const CELL_LIMIT = 32767;
const run = (head: string, ch: string, tail: string) => head + ch.repeat(CELL_LIMIT - head.length - tail.length) + tail;

const PROTOTYPE_KEYS = ["constructor", "__proto__", "toString", "hasOwnProperty", "valueOf", "prototype", "__defineGetter__"];

const HOSTILE: [string, unknown][] = [
  ...PROTOTYPE_KEYS.flatMap((key): [string, unknown][] => [
    [key, key],
    [`${key} in a range`, [[key, key]]],
    [`1.2${key}`, `1.2${key}`],
    [`udl 1 ${key}`, `udl 1 ${key}`],
    [`length=${key}`, `length=${key}, force=kip`],
    [`${key}=m`, `${key}=m, length=m, force=kN`],
    [`${key} 0.5`, `${key} 0.5`],
    [`full ${key}`, `full ${key}`],
    [`pin ${key}`, `pin ${key}`],
    [`${key} at 3`, `${key} at 3`],
    [`rectangle as ${key}`, [[key, 0.1, 0.2]]],
  ]),
  ["digits and a letter", [[run("", "1", "x")]]],
  ["digits, a point and a letter", [[run("1.", "1", "x")]]],
  ["spaces and a bang", [[run("1", " ", "!")]]],
  ["a combination of spaces", [[run("1.2D", " ", "?")]]],
  ["a unit of spaces", [[run("m", " ", "!")]]],
  ["a units argument of spaces", [[run("length", " ", "x")]]],
  ["an effect with a long number", [[run("shear at ", "4", "x")]]],
  ["a load text with a long magnitude", [[run("udl ", "2", "q")]]],
  ["a psi0 pair with a long value", [[run("Q ", "7", "!")]]],
  ["a formula-like text", [[run("=SPAN.MOMENT(6,", "1", "x)")]]],
];

/** Huge counts, given as the spans or the loads of the member functions (other counts have their own limits and tests). */
const COUNTS: [string, unknown][] = [
  ["one span too many", [new Array(MAX_SPANS + 1).fill(1)]],
  ["200,000 spans in a text cell", [[Array(200000).fill("6").join(" ")]]],
  ["120,000 spans in a row (a spread of it would overflow the stack)", [new Array(120000).fill(2)]],
  ["a load table one row too long", Array.from({ length: MAX_LOADS + 1 }, () => ["udl", 1, "", "", "", "D"])],
  ["20,000 loads in a text cell", [[Array(20000).fill("udl 1 D").join("; ")]]],
];

const spans = [["6 4"]];
const loads = [["udl 2 D; point 5 at 6 L"]];
const x = [[1, 2]];

/** One valid call of every worksheet function, argument by argument. */
const BASE: [string, (...args: any[]) => unknown, unknown[]][] = [
  ["reactions", fx.reactions, [spans, loads, null, null, "1.2D+1.6L", null]],
  ["shear", fx.shear, [spans, loads, x, null, null, "1.2D+1.6L", null]],
  ["moment", fx.moment, [spans, loads, x, null, null, null, "length=m, force=kN"]],
  ["slope", fx.slope, [spans, loads, x, null, [[100]], null, null]],
  ["deflection", fx.deflection, [spans, loads, x, null, [[100]], null, null]],
  ["maxMoment", fx.maxMoment, [spans, loads, null, null, null, null]],
  ["extremes", fx.extremes, [spans, loads, null, [[100]], null, null]],
  ["diagram", fx.diagram, [spans, loads, 11, null, null, null, null]],
  ["envelope", fx.envelope, [spans, loads, x, [["1.2D+1.6L"], ["D+L"]], null, null, null, null, null]],
  ["peaks", fx.peaks, [spans, loads, "ASCE7-2.3.1", null, [[100]], "full L", null]],
  ["influence", fx.influence, [spans, "moment at 3", x, null, null]],
  ["moving", fx.moving, [spans, "10 20", "2", "absolute moment", null, null]],
  ["combos", fx.combos, ["EN1990-6.10", "Q 0.7, S 0.5", [["Q", "S"]]]],
  ["section", fx.section, ["rectangle", [[0.1, 0.2]], "m", "mm"]],
  ["stress", fx.stress, [spans, loads, [[0.001]], null, null, null, null]],
  ["shearStress", fx.shearStress, [spans, loads, [[0.02]], null, null, null, null]],
  ["deflectionCheck", fx.deflectionCheck, [spans, loads, "L/360", null, [[100]], null, null]],
  ["utilisation", fx.utilisation, [[[1, 2]], [[4]], "kN*m", "kN*m"]],
  ["convertUnits", fx.convertUnits, [[[1]], "kip*ft", "kN*m"]],
  ["stiffness", fx.stiffness, [[[200]], [[1e6]], "GPa", "mm^4", "kN*m^2"]],
];

describe("every base call is valid (so the replacements below test the argument, not a broken call)", () => {
  test.each(BASE)("%s", (_name, call, args) => {
    expect(outcomeOf(() => call(...args)).kind).toBe("value");
  });
  test("the section argument as a SPAN.SECTION table", () => {
    expect(outcomeOf(() => fx.stress(spans, loads, fx.section("rectangle", [[0.1, 0.2]]), null as any, null as any, null, null as any)).kind).toBe("value");
  });
});

describe("no hostile argument reaches the sheet as an internal failure", () => {
  test.each(BASE)("%s, every argument in turn", (name, call, args) => {
    const problems: string[] = [];
    for (let position = 0; position < args.length; position++) {
      for (const [what, value] of HOSTILE) {
        const replaced = args.slice();
        replaced[position] = value;
        const found = violations(outcomeOf(() => call(...replaced)), {});
        if (found.length > 0) problems.push(`${name} argument ${position + 1} = ${what}: ${found.join("; ")}`);
      }
    }
    expect(problems).toEqual([]);
  });

  test.each(BASE.filter(([, , args]) => args[0] === spans && args[1] === loads))("%s, huge counts as spans and loads", (name, call, args) => {
    const problems: string[] = [];
    for (const position of [0, 1]) {
      for (const [what, value] of COUNTS) {
        const replaced = args.slice();
        replaced[position] = value;
        const outcome = outcomeOf(() => call(...replaced));
        const found = violations(outcome, {});
        if (outcome.kind === "value") found.push("a huge count was accepted");
        if (found.length > 0) problems.push(`${name} argument ${position + 1} = ${what}: ${found.join("; ")}`);
      }
    }
    expect(problems).toEqual([]);
  });

  test("prototype keys are named as what they are, not looked up on the object prototype", () => {
    const message = (call: () => unknown) => (outcomeOf(call) as { thrown?: { message?: string } }).thrown?.message ?? "no error";
    expect(message(() => fx.reactions(spans, [["constructor", 1, "", "", "", "D"]]))).toMatch(/"constructor" is not a load type/);
    expect(message(() => fx.reactions(spans, [["toString 1 at 2"]]))).toMatch(/"toString" is not a load type/);
    expect(message(() => fx.reactions(spans, loads, [["pin constructor pin"]]))).toMatch(/supports entry 2: "constructor" is not a support/);
    expect(message(() => fx.convertUnits([[1]], "constructor", "m"))).toMatch(/unknown unit "constructor"/);
    expect(message(() => fx.convertUnits([[1]], "__proto__", "m"))).toMatch(/from: cannot read the unit "__proto__"/);
    expect(message(() => fx.moment(spans, loads, x, null as any, null as any, null, "constructor=m" as any))).toMatch(/units: unknown key "constructor"/);
    expect(message(() => fx.section("constructor", [[1, 2]]))).toMatch(/constructor/);
    expect(message(() => fx.combos("EN1990-6.10", "constructor 0.5", [["Q", "S"]]))).toMatch(/psi0 between 0 and 1 for variable case/);
    expect(message(() => fx.combos("EN1990-6.10", "Q 0.5", [["Q", "constructor"]]))).toMatch(/variable case constructor/);
    expect(message(() => fx.reactions(spans, [["udl 1 constructor"]], null as any, null as any, "1.2D"))).toMatch(/case constructor is not named/);
  });
});
