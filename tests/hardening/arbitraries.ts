/**
 * Host-shaped garbage for the worksheet functions, independent of src/: cells as the host
 * delivers them (numbers, text, booleans, blanks as "", null or 0, error values), ranges of
 * any shape, and member-shaped arguments built around a plan (spans and their node
 * positions) so that loads, x and supports land exactly on nodes and hinges, duplicate each
 * other, fall outside the member, or sit on zero-length spans. Not a test file.
 */
import fc from "fast-check";

export const ERROR_TEXTS = ["#N/A", "#VALUE!", "#REF!", "#DIV/0!", "#NUM!", "#NAME?", "#NULL!", "#SPILL!", "#CALC!", "#GETTING_DATA"] as const;

/** An error value from another cell, as a runtime error object (code + message). */
export const errorObject = fc.constantFrom(...ERROR_TEXTS).map((code) => ({ code, message: "error in the referenced cell" }));

/** Numbers that break naive arithmetic: signed zeros, NaN, infinities, the extremes of a double. */
export const specialNumber = fc.constantFrom(
  0, -0, NaN, Infinity, -Infinity, Number.MAX_VALUE, -Number.MAX_VALUE, Number.MIN_VALUE, -Number.MIN_VALUE,
  Number.EPSILON, 1e-300, 1e300, 1e-12, 1e12, 1e15, 2 ** 53, -1, 1e-3, 1e3, 1e6, 1e-6,
);

export const anyNumber: fc.Arbitrary<number> = fc.oneof(
  { weight: 4, arbitrary: fc.double({ min: -1e4, max: 1e4, noNaN: true }) },
  { weight: 2, arbitrary: fc.integer({ min: -20, max: 20 }) },
  { weight: 2, arbitrary: specialNumber },
  { weight: 1, arbitrary: fc.double() },
);

/** Text that looks like a number, or almost does. */
export const numberText: fc.Arbitrary<string> = fc.oneof(
  anyNumber.map((v) => String(v)),
  anyNumber.map((v) => ` ${v} `),
  fc.constantFrom(" 6 ", "6,5", "1e400", "-1e-400", "0x10", "Infinity", "NaN", "1_000", "3m", "1.2.3", "+.5", "-", "e5", "٦", "1/2"),
);

/** Words the functions know, in and out of place. */
export const keywordText: fc.Arbitrary<string> = fc.constantFrom(
  "pin", "PIN", " fixed ", "free", "hinge", "roller", "point", "moment", "udl", "UDL", "linear", "triangle",
  "D", "L", "Lr", "S", "W", "1.2D+1.6L", "D+L", "1.4D", "1.2D+1.6L+0.5S", "D+", "2*D", "L/360", "span/240", "360", "L/0",
  "kip", "kN*m", "m", "mm", "ft", "in^4", "ksi", "MPa", "kip*in^2", "length=ft, force=kip", "length=m", "force=kN, EI=kN*m^2",
  "reaction 2", "reaction 99", "moment reaction 1", "moment at 3", "shear at 0", "deflection at 1", "absolute moment", "slope at 2",
  "ASCE7-2.3.1", "ASCE7-2.4.1", "EN1990-6.10", "rectangle", "I", "tee", "circle", "box", "tube", "channel", "rect",
  "full L", "full", "standard", "standard L", "none", "shear", "deflection", "Q 0.7", "Q 0.7, S 0.5", "0.7", "Q S",
  "udl 2 D; point 10 at 3 L", "point 5 at 2", "moment 3 at 1", "linear 1 to 2", "6 8 6", "fixed pin pin free", "200 100",
  "settle", "settle 0.01 at 6", "settle 0.01 at 0 D", "2e5 shear 8e4", "shear", "shear 0", "1e4 shear 1e4, 2e4",
);

export const garbageText: fc.Arbitrary<string> = fc.oneof(fc.string({ maxLength: 12 }), fc.string({ unit: "binary", maxLength: 6 }));

export const blankCell = fc.constantFrom<unknown>(null, "", 0, " ");

/** Any one cell the host could deliver. */
export const anyCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: blankCell },
  { weight: 4, arbitrary: anyNumber },
  { weight: 2, arbitrary: numberText },
  { weight: 3, arbitrary: keywordText },
  { weight: 2, arbitrary: garbageText },
  { weight: 1, arbitrary: fc.boolean() },
  { weight: 1, arbitrary: errorObject },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(...ERROR_TEXTS) },
);

/** A rectangular block of cells (what a range argument arrives as). */
export function block(cell: fc.Arbitrary<unknown>, maxRows = 4, maxCols = 6): fc.Arbitrary<unknown[][]> {
  return fc
    .tuple(fc.integer({ min: 1, max: maxRows }), fc.integer({ min: 1, max: maxCols }))
    .chain(([rows, cols]) => fc.array(fc.array(cell, { minLength: cols, maxLength: cols }), { minLength: rows, maxLength: rows }));
}

/** A range argument of any shape, a bare scalar (formula engines pass those) or a skipped argument. */
export function anyArg(cell: fc.Arbitrary<unknown> = anyCell): fc.Arbitrary<unknown> {
  return fc.oneof(
    { weight: 4, arbitrary: block(cell) },
    { weight: 2, arbitrary: cell.map((c) => [[c]]) },
    { weight: 1, arbitrary: cell },
    { weight: 1, arbitrary: fc.constant(null) },
  );
}

// ------------------------------------------------------------------------------------------
// Member-shaped arguments around a plan.
// ------------------------------------------------------------------------------------------

/** The spans a generated member means, and its node positions (left to right sums). */
export interface Plan {
  spans: number[];
  nodeX: number[];
}

/** Ordinary span lengths (two decimals, as typed). */
export const ordinarySpan: fc.Arbitrary<number> = fc.double({ min: 0.5, max: 20, noNaN: true }).map((v) => Math.round(v * 100) / 100);

/** One span length: mostly ordinary, sometimes zero, negative, tiny, huge or not a number. */
export const spanLength: fc.Arbitrary<number> = fc.oneof(
  { weight: 8, arbitrary: ordinarySpan },
  { weight: 1, arbitrary: fc.constantFrom(0, -0, -3, 1e-3, 1e3, 1e-9, 1e9, 1e-300, 1e300, NaN, Infinity) },
);

export function planOf(spans: number[]): Plan {
  const nodeX = [0];
  for (const s of spans) nodeX.push(nodeX[nodeX.length - 1] + s);
  return { spans, nodeX };
}

export const plan: fc.Arbitrary<Plan> = fc.array(spanLength, { minLength: 1, maxLength: 6 }).map(planOf);
export const ordinaryPlan: fc.Arbitrary<Plan> = fc.array(ordinarySpan, { minLength: 1, maxLength: 6 }).map(planOf);

/**
 * `noisy` generators mix garbage into every argument; quiet ones write well-formed
 * arguments (which can still describe a mechanism, a load beyond the end, a couple on a
 * hinge...), so the fuzz reaches the solver and the result shaping, not only the argument checks.
 */
function mix<T>(noisy: boolean, good: fc.WeightedArbitrary<T>[], bad: fc.WeightedArbitrary<T>[]): fc.Arbitrary<T> {
  return fc.oneof(...(noisy ? [...good, ...bad] : good));
}

/** A list of entries as the host passes it: a row, a column, or one text cell. */
export function listArg(entries: unknown[]): fc.Arbitrary<unknown> {
  return fc.constantFrom<unknown>([entries.slice()], entries.map((e) => [e]), [[entries.join(" ")]], entries.join(", "));
}

/** A list argument that was faithfully written (`intact`) or corrupted: wrong shape, a garbage cell. */
export interface Written {
  value: unknown;
  intact: boolean;
}

function corrupt(entries: unknown[]): fc.Arbitrary<unknown> {
  return fc.oneof(
    fc.tuple(fc.nat(), anyCell).map(([i, cell]) => {
      const copy = entries.slice();
      copy[i % Math.max(1, copy.length)] = cell;
      return [copy];
    }),
    fc.constant([entries.slice(), entries.slice()]),
    fc.constant<unknown>([]),
    anyArg(),
  );
}

export function writtenList(entries: unknown[], noisy = true): fc.Arbitrary<Written> {
  return mix<Written>(
    noisy,
    [{ weight: 6, arbitrary: listArg(entries).map((value) => ({ value, intact: true })) }],
    [{ weight: 1, arbitrary: corrupt(entries).map((value) => ({ value, intact: false })) }],
  );
}

/** A position on the member: exactly at a node, inside, at the ends, just outside, blank or garbage. */
export function position(p: Plan, noisy = true): fc.Arbitrary<unknown> {
  const length = p.nodeX[p.nodeX.length - 1];
  return mix<unknown>(
    noisy,
    [
      { weight: 4, arbitrary: fc.constantFrom(...p.nodeX) },
      { weight: 4, arbitrary: fc.double({ min: 0, max: 1, noNaN: true }).map((f) => f * (Number.isFinite(length) ? length : 1)) },
    ],
    [
      { weight: 1, arbitrary: fc.constantFrom<unknown>(-1e-9, length + 1e-9, length * (1 + 1e-15), -length, 2 * length + 1, "") },
      { weight: 1, arbitrary: anyCell },
    ],
  );
}

export function supportEntry(noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(
    noisy,
    [
      { weight: 8, arbitrary: fc.constantFrom<unknown>("pin", "fixed", "free", "hinge", "PIN", " Fixed ", "pin", "fixed") },
      { weight: 2, arbitrary: fc.constantFrom<unknown>(1, 100, 1e4, 1e8, 1e12, 1e15, 1e-6) },
    ],
    [{ weight: 1, arbitrary: anyCell }],
  );
}

export function supportsArg(p: Plan, noisy = true): fc.Arbitrary<Written> {
  const n = p.spans.length + 1;
  return mix<Written>(
    noisy,
    [
      { weight: 1, arbitrary: fc.constantFrom<Written>({ value: null, intact: true }, { value: [[""]], intact: true }) },
      { weight: 5, arbitrary: fc.array(supportEntry(noisy), { minLength: n, maxLength: n }).chain((e) => writtenList(e, noisy)) },
    ],
    [{ weight: 1, arbitrary: fc.array(supportEntry(), { minLength: 0, maxLength: n + 2 }).chain((e) => writtenList(e)).map((w) => ({ ...w, intact: false })) }],
  );
}

export function stiffnessArg(p: Plan, noisy = true): fc.Arbitrary<unknown> {
  const n = p.spans.length;
  const ei = mix<unknown>(
    noisy,
    [
      { weight: 6, arbitrary: fc.double({ min: 10, max: 1e5, noNaN: true }) },
      { weight: 2, arbitrary: fc.constantFrom<unknown>(1, 1e-6, 1e6, 1e12) },
    ],
    [
      { weight: 1, arbitrary: fc.constantFrom<unknown>(1e-300, 1e300) },
      { weight: 1, arbitrary: anyCell },
    ],
  );
  return mix<unknown>(
    noisy,
    [
      { weight: 3, arbitrary: fc.constant(null) },
      { weight: 3, arbitrary: ei.map((v) => [[v]]) },
      { weight: 3, arbitrary: fc.array(ei, { minLength: n, maxLength: n }).chain(listArg) },
      { weight: 1, arbitrary: fc.tuple(ei, fc.double({ min: 1, max: 1e6, noNaN: true })).map(([v, ga]) => [[`${String(v)} shear ${ga}`]]) },
    ],
    [{ weight: 1, arbitrary: anyArg() }],
  );
}

export function loadKind(noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(noisy, [{ weight: 8, arbitrary: fc.constantFrom<unknown>("point", "moment", "udl", "linear", "Point", "UDL", " linear ") }], [{ weight: 1, arbitrary: anyCell }, { weight: 1, arbitrary: fc.constant<unknown>("settle") }]);
}

export function magnitude(noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(
    noisy,
    [{ weight: 6, arbitrary: fc.double({ min: -50, max: 50, noNaN: true }) }],
    [
      { weight: 2, arbitrary: fc.constantFrom<unknown>(0, "", null, 1e-12, 1e12, 1e300, -1e300) },
      { weight: 1, arbitrary: anyCell },
    ],
  );
}

export function caseLabel(noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(noisy, [{ weight: 6, arbitrary: fc.constantFrom<unknown>("", null, "D", "L", "S", "Lr", "W") }], [{ weight: 1, arbitrary: anyCell }]);
}

/** One load-table row; noisy rows are sometimes too short or too long. */
export function loadRow(p: Plan, noisy = true): fc.Arbitrary<unknown[]> {
  return fc
    .tuple(loadKind(noisy), magnitude(noisy), position(p, noisy), position(p, noisy), magnitude(noisy), caseLabel(noisy), fc.integer({ min: 0, max: noisy ? 12 : 3 }))
    .map(([kind, m, a, b, m2, label, width]) => {
      const row: unknown[] = [kind, m, a, b, m2, label];
      if (!noisy) {
        // Well-formed: only the columns the kind uses, a distributed load from left to right.
        const k = String(kind).trim().toLowerCase();
        if (typeof a === "number" && typeof b === "number" && a > b) [row[2], row[3]] = [b, a];
        if (k === "point" || k === "moment") row[3] = "";
        if (k !== "linear") row[4] = "";
        return row;
      }
      if (width <= 1) return row.slice(0, 2 + width * 2);
      if (width === 2) return [...row, "extra"];
      return row;
    });
}

/** Writes a row in the one-cell load notation when it can be, else a nonsense clause. */
function notationOf(row: unknown[]): string {
  const [kind, m, a, b, m2, label] = row.map((c) => (c === null || c === undefined ? "" : String(c)));
  const tail = label ? ` ${label}` : "";
  switch ((kind ?? "").trim().toLowerCase()) {
    case "point":
    case "moment":
      return `${kind} ${m} at ${a}${tail}`;
    case "udl":
      return `udl ${m}${a ? ` from ${a}` : ""}${b ? ` to ${b}` : ""}${tail}`;
    case "linear":
      return `linear ${m} to ${m2}${a ? ` from ${a}` : ""}${b ? ` to ${b}` : ""}${tail}`;
    default:
      return `${kind} ${m} ${a}`;
  }
}

/** A load table: a few rows, duplicated rows, blank padding, or the one-cell notation. */
export function loadsArg(p: Plan, noisy = true): fc.Arbitrary<unknown> {
  const rows = fc.array(loadRow(p, noisy), { minLength: 0, maxLength: 6 });
  const padRow = (width: number, blank: unknown) => new Array<unknown>(width).fill(blank);
  const rectangular = (table: unknown[][]) => {
    const width = Math.max(1, ...table.map((r) => r.length));
    return table.map((r) => [...r, ...padRow(width - r.length, "")]);
  };
  return mix<unknown>(
    noisy,
    [
      { weight: 5, arbitrary: rows.map((t) => (t.length === 0 ? [[""]] : rectangular(t))) },
      { weight: 1, arbitrary: rows.map((t) => rectangular([...t, ...t])) },
      {
        weight: 1,
        arbitrary: fc.tuple(rows, blankCell, fc.integer({ min: 1, max: 40 })).map(([t, blank, pad]) => rectangular([...t, ...Array.from({ length: pad }, () => padRow(6, blank))])),
      },
      { weight: 2, arbitrary: rows.map((t) => [[t.map(notationOf).join("; ")]]) },
    ],
    [{ weight: 1, arbitrary: anyArg() }],
  );
}

/** x positions: a cell, a row, a column or a block, around the plan's nodes. */
export function positionsArg(p: Plan, noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(
    noisy,
    [
      { weight: 3, arbitrary: position(p, noisy).map((x) => [[x]]) },
      { weight: 3, arbitrary: block(position(p, noisy), 5, 5) },
      { weight: 1, arbitrary: position(p, noisy) },
    ],
    [{ weight: 1, arbitrary: anyArg() }],
  );
}

export function comboArg(noisy = true): fc.Arbitrary<unknown> {
  return mix<unknown>(
    noisy,
    [
      { weight: 3, arbitrary: fc.constant(null) },
      { weight: 3, arbitrary: fc.constantFrom<unknown>("", "1.2D+1.6L", "D+L", "1.4D", "L", "0.9D + 1.0W", "1.2D+1.6L+0.5S") },
    ],
    [{ weight: 1, arbitrary: anyCell }],
  );
}

/** The five member arguments, with whether spans were written faithfully (so the node count is known). */
export interface MemberArgs {
  plan: Plan;
  spans: Written;
  loads: unknown;
  supports: Written;
  EI: unknown;
  combo: unknown;
}

/**
 * Labels every row of a load table D or L (ENVELOPE and PEAKS need a case on every load, and
 * a label the combinations do not name is refused), D and L in turn from `label`, so that most tables carry both cases and a combination such as
 * 1.4D selects a load (a combination that selects none is refused).
 */
function labelled(loads: unknown, label: string): unknown {
  const other = label === "D" ? "L" : "D";
  const single = Array.isArray(loads) && loads.length === 1 && Array.isArray(loads[0]) && loads[0].length === 1 ? loads[0][0] : undefined;
  if (typeof single === "string") {
    // the load notation: a piece that ends in a number or a keyword has no label yet
    const unlabelled = (piece: string) => !/(^|\s)(D|L|S|Lr|W)\s*$/.test(piece);
    const text = single
      .split(";")
      .map((piece, i) => (piece.trim() !== "" && unlabelled(piece) ? `${piece} ${i % 2 === 0 ? label : other}` : piece))
      .join(";");
    return [[text.trim() === "" ? `udl 1 ${other}` : `${text}; udl 1 ${other}`]];
  }
  if (!Array.isArray(loads)) return loads;
  // one uniform load at the end, so that a table of blank rows still gives the combinations a load to select
  const rows = loads.every((row) => Array.isArray(row)) ? [...loads, ["udl", 1, "", "", "", other]] : loads;
  return rows.map((row, i) =>
    Array.isArray(row) && row.length >= 6 && row[5] !== "D" && row[5] !== "L" && typeof row[0] === "string" && row[0].trim() !== "" ? [...row.slice(0, 5), i % 2 === 0 ? label : other, ...row.slice(6)] : row,
  );
}

function memberArgsOf(noisy: boolean, options: { cases?: boolean; stiffness?: boolean }): fc.Arbitrary<MemberArgs> {
  return (noisy ? plan : ordinaryPlan).chain((p) =>
    fc.record({
      plan: fc.constant(p),
      spans: writtenList(p.spans, noisy),
      loads: options.cases && !noisy ? fc.tuple(loadsArg(p, noisy), fc.constantFrom("D", "L")).map(([l, c]) => labelled(l, c)) : loadsArg(p, noisy),
      supports: supportsArg(p, noisy),
      EI: options.stiffness && !noisy ? fc.double({ min: 10, max: 1e5, noNaN: true }).map((v) => [[v]]) : stiffnessArg(p, noisy),
      combo: comboArg(noisy),
    }),
  );
}

/** Half well-formed members, half members with garbage anywhere. */
export const memberArgs: fc.Arbitrary<MemberArgs> = fc.oneof(memberArgsOf(false, {}), memberArgsOf(true, {}));
/**
 * The same, with a case label on every well-formed load (for combinations over cases); two
 * well-formed members to one with garbage, since the case-label rule refuses most garbage labels.
 */
export const labelledMemberArgs: fc.Arbitrary<MemberArgs> = fc.oneof({ weight: 2, arbitrary: memberArgsOf(false, { cases: true }) }, { weight: 1, arbitrary: memberArgsOf(true, {}) });
/** The same, with EI on every well-formed member (for the deflection check). */
export const stiffMemberArgs: fc.Arbitrary<MemberArgs> = fc.oneof(memberArgsOf(false, { stiffness: true }), memberArgsOf(true, {}));

// ------------------------------------------------------------------------------------------
// Large tables: whole-column references and pasted schedules.
// ------------------------------------------------------------------------------------------

export const LARGE_ROWS = 100_000;

/** A 100,000-row load table: mostly blank (in one of the host's blank forms) with a few loads, or all loads. */
export function largeLoadTable(p: Plan): fc.Arbitrary<unknown[][]> {
  return fc
    .tuple(fc.array(loadRow(p), { minLength: 1, maxLength: 4 }), blankCell, fc.constantFrom("sparse", "repeated", "every row"))
    .map(([rows, blank, how]) => {
      const table: unknown[][] = new Array(LARGE_ROWS);
      const width = 6;
      const fit = (r: unknown[]) => [...r.slice(0, width), ...new Array<unknown>(Math.max(0, width - r.length)).fill("")];
      for (let i = 0; i < LARGE_ROWS; i++) {
        if (how === "sparse") table[i] = i % 25_000 === 7 ? fit(rows[((i / 25_000) | 0) % rows.length]) : new Array<unknown>(width).fill(blank);
        else if (how === "repeated") table[i] = fit(rows[0]);
        else table[i] = fit(rows[i % rows.length]);
      }
      return table;
    });
}
