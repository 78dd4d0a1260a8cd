/**
 * One fuzz case generator per worksheet function: host-shaped arguments (from
 * arbitraries.ts) and the documented shape of a successful result, as the help text and
 * DESIGN.md section 2 state it. Shared by the jest fuzz test and the fuzz benchmark.
 * Not a test file.
 */
import fc from "fast-check";
import * as fx from "../../functions/functions";
import {
  anyArg, anyCell, anyNumber, block, keywordText, labelledMemberArgs, listArg, memberArgs, stiffMemberArgs, ordinaryPlan, plan, positionsArg, stiffnessArg, supportsArg, writtenList,
  type MemberArgs, type Plan,
} from "./arbitraries";
import { both, labels, numericColumn, shapeOfArg, type Shape } from "./outcome";

export interface FuzzCase {
  args: unknown[];
  /** Spans written faithfully: a result must have one row per node (or span). */
  spanCount: number | null;
}

export interface FunctionSpec {
  name: keyof typeof fx;
  cases: fc.Arbitrary<FuzzCase>;
  call(args: unknown[]): unknown;
  shape(c: FuzzCase): Shape;
}

const spanCountOf = (m: MemberArgs): number | null => (m.spans.intact ? m.plan.spans.length : null);
const call = (f: (...a: any[]) => unknown) => (args: unknown[]) => f(...args);

const QUANTITY_LABELS = [["shear", "moment"], ["shear", "moment", "slope", "deflection"]];
const allNumeric = (value: unknown[][]) => (value.every((row) => row.every((c) => typeof c === "number")) ? null : "a text cell among numbers");
const numbersOrBlank = (value: unknown[][]) => (value.every((row) => row.every((c) => typeof c === "number" || c === "")) ? null : "text other than blank");

function memberWith(extra: (m: MemberArgs) => fc.Arbitrary<unknown[]>, order: (m: MemberArgs, e: unknown[]) => unknown[], members = memberArgs): fc.Arbitrary<FuzzCase> {
  return members.chain((m) => extra(m).map((e) => ({ args: order(m, e), spanCount: spanCountOf(m) })));
}

const plainMember = memberArgs.map((m) => ({ args: [m.spans.value, m.loads, m.supports.value, m.EI, m.combo], spanCount: spanCountOf(m) }));

function atPositions(name: "shear" | "moment" | "slope" | "deflection"): FunctionSpec {
  return {
    name,
    cases: memberWith((m) => positionsArg(m.plan).map((x) => [x]), (m, [x]) => [m.spans.value, m.loads, x, m.supports.value, m.EI, m.combo]),
    call: call(fx[name]),
    shape: (c) => ({ ...shapeOfArg(c.args[2]), cells: numbersOrBlank }),
  };
}

const pointsArg = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<unknown>(null, 0, "", 2, 3, 11, 101, [[7]], "21") },
  { weight: 1, arbitrary: fc.integer({ min: -5, max: 20_000 }) },
  { weight: 1, arbitrary: anyArg() },
);
const pointsOf = (arg: unknown): number => {
  const v = Array.isArray(arg) ? (arg as unknown[][])[0]?.[0] : arg;
  const n = typeof v === "string" && v.trim() !== "" ? Number(v) : v;
  return typeof n === "number" && Number.isInteger(n) && n >= 2 ? n : 2;
};

const combosArg = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<unknown>("1.2D+1.6L", [["1.2D+1.6L"], ["D+L"]], "ASCE7-2.3.1", "ASCE7-2.4.1", "EN1990-6.10", [["1.4D", "0.9D+1.0W"]], "D") },
  { weight: 1, arbitrary: anyArg() },
);
const patternArg = fc.oneof(fc.constantFrom<unknown>(null, "", "none", "standard", "full", "full L", "standard Lr", "full X"), anyCell);
const psi0Arg = fc.oneof(fc.constantFrom<unknown>(null, 0.7, "Q 0.7, S 0.5", "Q 2", "0.7 0.5"), anyCell);

/** A plan with whether its arguments carry garbage (half of the cases each way). */
const planAndNoise: fc.Arbitrary<[Plan, boolean]> = fc.boolean().chain((noisy) => (noisy ? plan : ordinaryPlan).map((p) => [p, noisy] as [Plan, boolean]));

function effectFor(p: Plan, noisy: boolean): fc.Arbitrary<unknown> {
  const nodes = p.nodeX.length;
  if (!noisy) {
    return fc.oneof(
      fc.tuple(fc.constantFrom("reaction", "moment reaction"), fc.integer({ min: 1, max: nodes })).map(([w, i]) => `${w} ${i}`),
      fc.tuple(fc.constantFrom("moment at", "shear at", "deflection at"), fc.constantFrom(...p.nodeX, p.nodeX[p.nodeX.length - 1] / 3)).map(([w, x]) => `${w} ${x}`),
      fc.constant("absolute moment"),
    );
  }
  return fc.oneof(
    { weight: 4, arbitrary: fc.tuple(fc.constantFrom("reaction", "moment reaction", "REACTION"), fc.integer({ min: 0, max: nodes + 1 })).map(([w, i]) => `${w} ${i}`) },
    { weight: 4, arbitrary: fc.tuple(fc.constantFrom("moment at", "shear at", "deflection at", "slope at"), fc.constantFrom(...p.nodeX, p.nodeX[p.nodeX.length - 1] / 3)).map(([w, x]) => `${w} ${x}`) },
    { weight: 1, arbitrary: fc.constantFrom<unknown>("absolute moment", "moment", "at 3", "") },
    { weight: 1, arbitrary: anyCell },
  );
}

const axlesArg = fc.oneof(
  { weight: 3, arbitrary: fc.array(fc.double({ min: 0, max: 200, noNaN: true }), { minLength: 1, maxLength: 5 }) },
  { weight: 1, arbitrary: fc.array(anyNumber, { minLength: 0, maxLength: 4 }) },
);

const unitsArg = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<unknown>(null, "", "length=m, force=kN", "length=ft, force=kip, EI=kip*in^2, section=in, stress=ksi, deflection=in", [["length=m, force=N"]], "length=m") },
  { weight: 1, arbitrary: anyCell },
);

/** Section numbers (S, or S top and bottom; A, or A I Q t), a SECTION table, or garbage. */
function sectionArg(counts: number[]): fc.Arbitrary<unknown> {
  return fc.oneof(
    { weight: 3, arbitrary: fc.constantFrom(...counts).chain((n) => fc.array(fc.double({ min: 1e-6, max: 1, noNaN: true }), { minLength: n, maxLength: n })).chain(listArg) },
    { weight: 1, arbitrary: fc.constant<unknown>(fx.section("I", [["400 180 13.5 8.6"]], "mm")) },
    { weight: 1, arbitrary: anyArg() },
  );
}

/** Dimensions that make a real section of each shape (flanges thinner than half the depth...). */
const wellFormedSection: fc.Arbitrary<unknown[]> = fc
  .tuple(
    fc.constantFrom("rectangle", "circle", "box", "tube", "I", "channel", "tee"),
    fc.double({ min: 100, max: 600, noNaN: true }),
    fc.double({ min: 50, max: 300, noNaN: true }),
    fc.double({ min: 0.05, max: 0.2, noNaN: true }),
    fc.constantFrom<unknown>(null, "mm", "in"),
    fc.constantFrom<unknown>(null, "mm", "cm", "m", "in"),
  )
  .map(([shape, d, b, f, unit, resultUnit]) => {
    const t = f * Math.min(b, d);
    const dims: Record<string, number[]> = { rectangle: [b, d], circle: [d], box: [b, d, t], tube: [d, t], I: [d, b, t, t / 2], channel: [d, b, t, t / 2], tee: [d, b, t, t / 2] };
    return [shape, [dims[shape]], unit, resultUnit];
  });

const limitArg = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom<unknown>("L/360", "span/240", 360, [["L/240"]], " l/180 ") },
  { weight: 1, arbitrary: fc.constantFrom<unknown>([["L/360", "L/180"]], "L/0", "L/-5", "") },
  { weight: 1, arbitrary: anyArg() },
);

const unitText = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom<unknown>(null, "", "m", "mm", "ft", "in", "kN", "kip", "kN*m", "kip*ft", "kN/m", "kip/ft", "MPa", "ksi", "in^4", "mm^4", "kip*in^2", "kN*m^2", "GPa", "psf") },
  { weight: 1, arbitrary: keywordText },
  { weight: 1, arbitrary: anyCell },
);
const numbersBlock = fc.oneof({ weight: 3, arbitrary: block(anyNumber, 4, 4) }, { weight: 1, arbitrary: anyArg() });

/** Two cell-by-cell arguments: one cell pairs with every cell of the other (UTILISATION, STIFFNESS). */
function broadcast(a: unknown, b: unknown): { rows: number; cols: number } {
  const sa = shapeOfArg(a);
  return sa.rows === 1 && sa.cols === 1 ? shapeOfArg(b) : sa;
}

const massArg = fc.oneof({ weight: 4, arbitrary: fc.constantFrom<unknown>(1, 0.25, [[2.5]], "0.5 1", 1e-3) }, { weight: 1, arbitrary: fc.constantFrom<unknown>(null, "", 0, -1) }, { weight: 1, arbitrary: anyArg() });
const modesArg = fc.oneof({ weight: 4, arbitrary: fc.constantFrom<unknown>(null, 1, 2, 3, 12) }, { weight: 1, arbitrary: fc.constantFrom<unknown>(0, 51, 2.5, "3", "") }, { weight: 1, arbitrary: anyCell });
const gArg = fc.oneof({ weight: 3, arbitrary: fc.constantFrom<unknown>(null, 9.81, 32.17) }, { weight: 1, arbitrary: anyCell });

/** Every worksheet function, in the order of functions/functions.ts. */
export const SPECS: FunctionSpec[] = [
  {
    name: "reactions",
    cases: plainMember,
    call: call(fx.reactions),
    shape: (c) => ({ cols: 3, ...(c.spanCount === null ? { minRows: 2 } : { rows: c.spanCount + 1 }), cells: allNumeric }),
  },
  atPositions("shear"),
  atPositions("moment"),
  atPositions("slope"),
  atPositions("deflection"),
  { name: "maxMoment", cases: plainMember, call: call(fx.maxMoment), shape: () => ({ rows: 2, cols: 2, cells: allNumeric }) },
  {
    name: "extremes",
    cases: plainMember,
    call: call(fx.extremes),
    shape: () => ({ cols: 5, cells: both(labels(QUANTITY_LABELS), numericColumn(1, "max"), numericColumn(2, "x"), numericColumn(3, "min"), numericColumn(4, "x")) }),
  },
  {
    name: "diagram",
    cases: memberWith(() => pointsArg.map((p) => [p]), (m, [p]) => [m.spans.value, m.loads, p, m.supports.value, m.EI, m.combo]),
    call: call(fx.diagram),
    shape: (c) => ({ cols: 5, minRows: pointsOf(c.args[2]), cells: both(numericColumn(0, "x"), numericColumn(1, "V"), numericColumn(2, "M"), numbersOrBlank) }),
  },
  {
    name: "envelope",
    cases: memberWith(
      (m) => fc.tuple(positionsArg(m.plan), combosArg, fc.oneof({ weight: 6, arbitrary: fc.constantFrom<unknown>(null, "shear", "moment", "deflection", "") }, { weight: 1, arbitrary: fc.constantFrom<unknown>("slope", 3, "Moment ") }), patternArg, psi0Arg),
      (m, [x, combos, quantity, pattern, psi0]) => [m.spans.value, m.loads, x, combos, m.supports.value, m.EI, quantity, pattern, psi0],
      labelledMemberArgs,
    ),
    call: call(fx.envelope),
    shape: (c) => {
      const { rows, cols } = shapeOfArg(c.args[2]);
      return { rows: rows * cols, cols: 5, cells: both(numericColumn(0, "x"), numericColumn(1, "max"), numericColumn(3, "min")) };
    },
  },
  {
    name: "peaks",
    cases: memberWith(
      () => fc.tuple(combosArg, patternArg, psi0Arg),
      (m, [combos, pattern, psi0]) => [m.spans.value, m.loads, combos, m.supports.value, m.EI, pattern, psi0],
      labelledMemberArgs,
    ),
    call: call(fx.peaks),
    shape: () => ({ cols: 7, cells: both(labels(QUANTITY_LABELS), numericColumn(1, "max"), numericColumn(2, "x"), numericColumn(4, "min"), numericColumn(5, "x")) }),
  },
  {
    name: "influence",
    cases: planAndNoise.chain(([p, noisy]) =>
      fc.tuple(writtenList(p.spans, noisy), effectFor(p, noisy), positionsArg(p, noisy), supportsArg(p, noisy), stiffnessArg(p, noisy)).map(([spans, effect, positions, supports, EI]) => ({
        args: [spans.value, effect, positions, supports.value, EI],
        spanCount: spans.intact ? p.spans.length : null,
      })),
    ),
    call: call(fx.influence),
    shape: (c) => ({ ...shapeOfArg(c.args[2]), cells: numbersOrBlank }),
  },
  {
    name: "moving",
    cases: planAndNoise.chain(([p, noisy]) =>
      fc
        .tuple(writtenList(p.spans, noisy), noisy ? axlesArg : axlesArg.filter((a) => a.every((v) => v >= 0)), fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { maxLength: 4 }), effectFor(p, noisy), supportsArg(p, noisy), stiffnessArg(p, noisy))
        .chain(([spans, axles, spacings, effect, supports, EI]) =>
          fc.tuple(writtenList(axles, noisy), writtenList(spacings.slice(0, Math.max(0, axles.length - 1)), noisy)).map(([a, s]) => ({
            args: [spans.value, a.value, s.value, effect, supports.value, EI],
            spanCount: spans.intact ? p.spans.length : null,
          })),
        ),
    ),
    call: call(fx.moving),
    shape: () => ({ rows: 2, cols: 5, cells: both(labels([["max", "min"]]), numericColumn(1, "value"), numericColumn(2, "x")) }),
  },
  {
    name: "combos",
    cases: fc
      .tuple(fc.oneof(fc.constantFrom<unknown>("ASCE7-2.3.1", "ASCE7-2.4.1", "EN1990-6.10", "asce7-2.3.1", " EN1990-6.10 "), anyCell), psi0Arg, fc.oneof(fc.constantFrom<unknown>(null, [["Q S"]], [["Q", "S", "W"]], "Q"), anyArg()))
      .map((args) => ({ args, spanCount: null })),
    call: call(fx.combos),
    shape: () => ({ cols: 1, minRows: 1 }),
  },
  {
    name: "section",
    cases: fc
      .oneof(
        wellFormedSection,
        fc.tuple(
          fc.oneof(fc.constantFrom<unknown>("rectangle", "circle", "box", "tube", "I", "channel", "tee", "rect", "pipe", "hollow circle"), anyCell),
          fc.oneof({ weight: 3, arbitrary: fc.array(fc.oneof(fc.double({ min: 0.1, max: 500, noNaN: true }), anyNumber), { minLength: 1, maxLength: 5 }).chain(listArg) }, { weight: 1, arbitrary: anyArg() }),
          unitText,
          unitText,
        ),
      )
      .map((args) => ({ args, spanCount: null })),
    call: call(fx.section),
    shape: () => ({ rows: 16, cols: 3, cells: both(numericColumn(1, "value")) }),
  },
  {
    name: "stress",
    cases: memberWith(() => fc.tuple(sectionArg([1, 2]), unitsArg), (m, [section, units]) => [m.spans.value, m.loads, section, m.supports.value, m.EI, m.combo, units]),
    call: call(fx.stress),
    shape: () => ({ rows: 2, cols: 5, cells: both(labels([["top", "bottom"]]), numericColumn(1, "stress"), numericColumn(2, "x"), numericColumn(3, "stress"), numericColumn(4, "x")) }),
  },
  {
    name: "shearStress",
    cases: memberWith(() => fc.tuple(sectionArg([1, 4]), unitsArg), (m, [section, units]) => [m.spans.value, m.loads, section, m.supports.value, m.EI, m.combo, units]),
    call: call(fx.shearStress),
    shape: () => ({ rows: 2, cols: 3, cells: both(labels([["average", "peak"]]), numericColumn(1, "stress"), numericColumn(2, "x")) }),
  },
  {
    name: "deflectionCheck",
    cases: memberWith(() => fc.tuple(limitArg, unitsArg), (m, [limit, units]) => [m.spans.value, m.loads, limit, m.supports.value, m.EI, m.combo, units], stiffMemberArgs),
    call: call(fx.deflectionCheck),
    shape: (c) => ({
      cols: 7,
      ...(c.spanCount === null ? { minRows: 1 } : { rows: c.spanCount }),
      cells: (v) => (v.every((row) => row[6] === "pass" || row[6] === "fail") ? null : "a verdict other than pass or fail"),
    }),
  },
  {
    name: "utilisation",
    cases: fc
      .tuple(numbersBlock, fc.oneof(anyNumber, numbersBlock), unitText, unitText)
      .map((args) => ({ args, spanCount: null })),
    call: call(fx.utilisation),
    shape: (c) => ({ ...broadcast(c.args[0], c.args[1]), cells: numbersOrBlank }),
  },
  {
    name: "convertUnits",
    cases: fc.tuple(numbersBlock, unitText, unitText).map((args) => ({ args, spanCount: null })),
    call: call(fx.convertUnits),
    shape: (c) => ({ ...shapeOfArg(c.args[0]), cells: numbersOrBlank }),
  },
  {
    name: "stiffness",
    cases: fc.tuple(numbersBlock, fc.oneof(anyNumber, numbersBlock), unitText, unitText, unitText).map((args) => ({ args, spanCount: null })),
    call: call(fx.stiffness),
    shape: (c) => ({ ...broadcast(c.args[0], c.args[1]), cells: numbersOrBlank }),
  },
  {
    name: "spanPeaks",
    cases: memberWith(() => unitsArg.map((u) => [u]), (m, [units]) => [m.spans.value, m.loads, m.supports.value, m.EI, m.combo, units]),
    call: call(fx.spanPeaks),
    shape: (c) => ({ cols: 10, ...(c.spanCount === null ? { minRows: 1 } : { rows: c.spanCount }), cells: both(...[0, 1, 2, 3, 4, 5, 6, 7].map((i) => numericColumn(i, "peak")), numbersOrBlank) }),
  },
  {
    name: "caseReactions",
    cases: memberWith(
      () => fc.tuple(fc.oneof({ weight: 3, arbitrary: fc.constant<unknown>(null) }, { weight: 1, arbitrary: unitsArg }), fc.oneof({ weight: 4, arbitrary: fc.constantFrom<unknown>(null, "", "vertical", "moment", "Moment ") }, { weight: 1, arbitrary: anyCell })),
      (m, [units, reaction]) => [m.spans.value, m.loads, m.supports.value, m.EI, m.combo, units, reaction],
      labelledMemberArgs,
    ),
    call: call(fx.caseReactions),
    shape: (c) => ({ ...(c.spanCount === null ? { minRows: 2 } : { rows: c.spanCount + 1 }), cells: allNumeric }),
  },
  {
    name: "frequencies",
    cases: memberWith(
      (m) => fc.tuple(massArg, modesArg, fc.oneof({ weight: 3, arbitrary: fc.constant<unknown>(null) }, { weight: 1, arbitrary: fc.constant(m.loads) }), unitsArg, gArg),
      (m, [mass, modes, loads, units, g]) => [m.spans.value, m.EI, mass, modes, m.supports.value, loads, loads === null ? null : m.combo, units, g],
      stiffMemberArgs,
    ),
    call: call(fx.frequencies),
    shape: () => ({ cols: 3, minRows: 1, cells: allNumeric }),
  },
  {
    name: "modeShape",
    cases: memberWith(
      (m) => fc.tuple(massArg, modesArg, fc.oneof({ weight: 2, arbitrary: positionsArg(m.plan, false) }, { weight: 1, arbitrary: positionsArg(m.plan) }), fc.oneof({ weight: 4, arbitrary: fc.constant<unknown>(null) }, { weight: 1, arbitrary: fc.constant(m.loads) }), fc.oneof({ weight: 3, arbitrary: fc.constant<unknown>(null) }, { weight: 1, arbitrary: unitsArg }), gArg),
      (m, [mass, mode, x, loads, units, g]) => [m.spans.value, m.EI, mass, mode, x, m.supports.value, loads, loads === null ? null : m.combo, units, g],
      stiffMemberArgs,
    ),
    call: call(fx.modeShape),
    shape: (c) => ({ ...shapeOfArg(c.args[4]), cells: numbersOrBlank }),
  },
];
