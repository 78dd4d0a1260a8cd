import fc from "fast-check";
import { MAX_LOADS } from "../../src/core";
import { formatLoad, formatLoadNotation, parseLoadNotation, parseLoadNotationFully } from "../../src/sheet/loadNotation";
import { readLoadRow } from "../../src/sheet/loadTable";
import type { LoadRow } from "../../src/sheet/loadRow";

function row(partial: Partial<LoadRow> & Pick<LoadRow, "kind">): LoadRow {
  return { magnitude: 0, xStart: 0, xEnd: null, magnitudeEnd: 0, loadCase: "", row: 1, fromText: true, ...partial };
}

describe("parseLoadNotation", () => {
  test.each([
    ["udl 2.5 D", [row({ kind: "udl", magnitude: 2.5, loadCase: "D" })]],
    ["udl 2.5 from 1 to 4 L", [row({ kind: "udl", magnitude: 2.5, xStart: 1, xEnd: 4, loadCase: "L" })]],
    ["UDL 2.5 FROM 1", [row({ kind: "udl", magnitude: 2.5, xStart: 1 })]],
    ["udl 2.5 to 4", [row({ kind: "udl", magnitude: 2.5, xEnd: 4 })]],
    ["udl 2.5 to 0", [row({ kind: "udl", magnitude: 2.5 })]],
    ["point 10 at 3 L", [row({ kind: "point", magnitude: 10, xStart: 3, loadCase: "L" })]],
    ["Point -1e3 At 0.5", [row({ kind: "point", magnitude: -1000, xStart: 0.5 })]],
    ["moment 5 at 2", [row({ kind: "moment", magnitude: 5, xStart: 2 })]],
    ["settle 0.01 at 6 D", [row({ kind: "settle", magnitude: 0.01, xStart: 6, loadCase: "D" })]],
    ["SETTLE -2e-3 AT 0", [row({ kind: "settle", magnitude: -0.002, xStart: 0 })]],
    ["linear 0 to 6 from 0 to 6 S", [row({ kind: "linear", magnitude: 0, magnitudeEnd: 6, xEnd: 6, loadCase: "S" })]],
    ["linear 2 to 1", [row({ kind: "linear", magnitude: 2, magnitudeEnd: 1 })]],
    ["linear 2 to 1 to 3 Lr", [row({ kind: "linear", magnitude: 2, magnitudeEnd: 1, xEnd: 3, loadCase: "Lr" })]],
    ["udl 1 to", [row({ kind: "udl", magnitude: 1, loadCase: "to" })]],
    [
      " udl 2.5 D ;  point 10 at 3 L ; ",
      [row({ kind: "udl", magnitude: 2.5, loadCase: "D" }), row({ kind: "point", magnitude: 10, xStart: 3, loadCase: "L", row: 2 })],
    ],
    ["", []],
    [" ; ", []],
  ])("%p", (text, expected) => {
    expect(parseLoadNotation(text)).toEqual(expected);
  });

  test.each([
    ["pont 10 at 3", /^load 1 of the loads text \("pont 10 at 3"\): "pont" is not a load type; start with point, moment, udl, linear or settle$/],
    ["udl 2; point 10 3", /load 2 of the loads text \("point 10 3"\): expected "at" and the position after the magnitude, found "3"/],
    ["point at 3", /expected the magnitude \(a number\), found "at"/],
    ["point 10 at", /expected the position after "at" \(a number\), found the end/],
    ["udl", /expected the magnitude \(a number\), found the end/],
    ["udl ten", /found "ten"/],
    ["linear 2 from 0 to 3", /expected "to" and the end magnitude/],
    ["udl 2 D L", /unexpected "L"/],
    ["udl 2 to 3 from 1", /unexpected "1"/],
    ["udl 2 dead-load", /"dead-load" is not a case label/],
    ["udl 2 5", /"5" is not a case label/],
    ["point 1e999 at 1", /expected the magnitude \(a number\), found "1e999"/],
    ["settle 0.01 from 6", /expected "at" and the position after the magnitude, found "from"/],
    ["settle 0.01 at 6 to 7", /unexpected "7"/],
    ["settle at 6", /expected the magnitude \(a number\), found "at"/],
  ])("%p is an error", (text, message) => {
    expect(() => parseLoadNotation(text)).toThrow(message);
  });
});

describe("formatLoad: one text form per load-table row", () => {
  test.each([
    [["udl", 2.5, "", "", "", "D"], "udl 2.5 D"],
    [["udl", 2.5, 0, 0, 0, "D"], "udl 2.5 D"],
    [["udl", 2.5, 1, 4, "", "L"], "udl 2.5 from 1 to 4 L"],
    [["point", 10, 3, "", "", "L"], "point 10 at 3 L"],
    [["point", 10, "", "", "", ""], "point 10 at 0"],
    [["moment", -5, 2], "moment -5 at 2"],
    [["linear", 0, 0, 6, 6, "S"], "linear 0 to 6 to 6 S"],
    [["linear", 1, 2, "", "", ""], "linear 1 to 0 from 2"],
    [["settle", 0.012, 6, "", "", "SD"], "settle 0.012 at 6 SD"],
    [["Settle", -0.004, "", "", "", ""], "settle -0.004 at 0"],
  ])("%j -> %p", (cells, text) => {
    const parsed = readLoadRow(cells, 1);
    expect(formatLoad(parsed)).toBe(text);
    expect(parseLoadNotation(text)).toEqual([{ ...parsed, fromText: true }]);
  });

  test("a table formats as loads joined by '; '", () => {
    const rows = [readLoadRow(["udl", 2, "", "", "", "D"], 1), readLoadRow(["point", 3, 1, "", "", "L"], 2)];
    expect(formatLoadNotation(rows)).toBe("udl 2 D; point 3 at 1 L");
  });
});

describe("round trip (property)", () => {
  const finite = fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 });
  const position = fc.oneof(fc.constant(0), fc.double({ noNaN: true, min: 0, max: 100 }));
  const label = fc.oneof(fc.constant(""), fc.stringMatching(/^[A-Za-z][A-Za-z0-9]{0,3}$/));
  const loadRow = fc.record({
    kind: fc.constantFrom("point" as const, "moment" as const, "udl" as const, "linear" as const, "settle" as const),
    magnitude: finite,
    xStart: position,
    xEnd: fc.oneof(fc.constant(null), fc.double({ noNaN: true, min: 0.001, max: 100 })),
    magnitudeEnd: finite,
    loadCase: label,
  });

  test("parse(format(row)) gives the row back, and format is canonical", () => {
    fc.assert(
      fc.property(fc.array(loadRow, { maxLength: 5 }), (drafts) => {
        const rows: LoadRow[] = drafts.map((d, i) => {
          const distributed = d.kind === "udl" || d.kind === "linear";
          return {
            kind: d.kind,
            magnitude: d.magnitude === 0 ? 0 : d.magnitude,
            xStart: d.xStart === 0 ? 0 : d.xStart,
            xEnd: distributed ? d.xEnd : null,
            magnitudeEnd: d.kind === "linear" ? (d.magnitudeEnd === 0 ? 0 : d.magnitudeEnd) : 0,
            loadCase: d.loadCase,
            row: i + 1,
            fromText: true,
          };
        });
        const text = formatLoadNotation(rows);
        const parsed = parseLoadNotation(text);
        expect(parsed).toEqual(rows);
        expect(formatLoadNotation(parsed)).toBe(text);
      }),
      { numRuns: 500, seed: 20261201 },
    );
  });
});

/** The rows parsed (by `read`, parseLoadNotation unless told), or the message of the error thrown. */
function outcome(text: string, read: (text: string) => unknown = parseLoadNotation): unknown {
  try {
    return read(text);
  } catch (error) {
    return `error: ${(error as Error).message}`;
  }
}

describe("the plain-ASCII reader (no strings built) gives what the general reader gives", () => {
  // The general reader: text.split(";"), each piece trimmed and read by parseOne's word tokens.
  const general = (text: string): unknown => outcome(text, parseLoadNotationFully);
  const word = fc.constantFrom(
    "point", "POINT", "Moment", "udl", "UdL", "linear", "settle", "SETTLE", "at", "AT", "to", "To", "from", "FROM", "D", "L", "Lr", "S2", "2S", "x", "-",
    "0", "-0", "2.5", "10", "1e3", ".5", "5.", "1e", "3..2", "+4", "12345678901234567", "udl5", "at3", "2.50", "1E+3", "kN", "pöint", "５",
  );
  const separator = fc.constantFrom(" ", "  ", "\t", " \n ", "\u00a0");
  const load = fc.array(fc.tuple(word, separator), { minLength: 0, maxLength: 9 }).map((parts) => parts.map(([w, s]) => w + s).join(""));
  const text = fc.array(fc.tuple(load, fc.constantFrom(";", " ; ", ";;")), { minLength: 1, maxLength: 4 }).map((loads) => loads.map(([l, s]) => l + s).join(""));

  test.each(["udl 2.5", "udl 2.5 from 1 to 4 L", "point 10 at 3 L", "linear 1 to 2 from 0 to 4 D", "udl 5 from", "udl 5 from D", "udl 5 to x", "point 1 at", "moment 2 at 3 D E", " ; udl 1 ;; ", "settle 0.01 at 6 D", "SETTLE -2e-3 AT 0", "settle 0.01 from 6", "settle 0.01 at 6 to 7"])(
    "%p",
    (t) => {
      expect(outcome(t)).toEqual(general(t));
    },
  );

  // The one-pass reader splits, trims and reads each piece itself, and sends a piece with any
  // character past ASCII to the general reader alone: blanks, decimals, exponents, negative
  // zero, whitespace of every kind, units labels and typos, each compared with the general
  // reader (the same rows, or the same message).
  test.each([
    "", ";", " ; ;", "\t\n", "udl 10", "UDL 10", "Udl 10 D", "P 20 @ 2.5", "point 20 @ 2.5", "point 20 at 2.5", "point 20 at 2.50", "point 2.50 at 002.500",
    "point -0 at -0", "udl -0 from -0 to -0", "point 1e3 at 2E0", "point 1E+3 at 2e-0", "point 1e at 2", "point 1e400 at 2", "point 5e-400 at 2", "point 0x10 at 2",
    "point .5 at 5.", "point 5 at 1.5.2", "point 5 at ,5", "point 5,5 at 2", "point 12345678901234567890 at 0.1234567890123456789", "point 5 at 2 1D", "point 5 at 2 D L",
    "point 5 at", "point 5 at x", "point 5", "point", "udl", "udl 10 kN/m", "udl 10 kN", "moment 5 at 3 kNm", "point 5 kN at 2 m", "udl 10 from 2 m to 4 m",
    "udl 10 from 0 to", "udl 10 to 0", "udl 10 from D", "udl 10 from 2 D to 3", "udl 3 from 1 to 2 to 3", "udl 3 to 2 from 1", "linear 1 to 2 from 0 to 4 D", "linear 1 2",
    "linear 1 to", "linear 1 to x", "settle 0.01 at 6", "settle 0.01 at 6 to 7", "udl\t10\nfrom\r1\vto\f4 D", "  point   5   at   2   ;  ", "point 5 at 2;;udl 1;",
    "pointt 5 at 2", "poin 5 at 2", "udl5", "udl 5from 1", "udl 5 from1", "linear 1 to 2 from 0 to 4 D E", "linear 1 to 2 from 0 to 4 D E F G H I J K",
    "point 5 at 2\u00a0", "point\u00a05 at 2", "udl 3; \u00a0 ; point 5 at 2", "\u00a0;udl 3 from 1", "point ５ at 2", "pöint 5 at 2", "point 5 at 2 Ł", "udl 1\u2028to 2",
    "point 5 at 2; pöint 5 at 2; udl 1", "udl 1; point 5 at 2\u3000D; udl 2 L", "\ufeffudl 1", "udl 1\u0001", "udl\u00001",
  ])("%p", (t) => {
    expect(outcome(t)).toEqual(general(t));
  });

  test("at most MAX_LOADS loads, the same message past it, with pieces of any kind", () => {
    for (const piece of ["udl 1", "pöint 1 at 0", "udl\u00a01"]) {
      for (const count of [MAX_LOADS, MAX_LOADS + 1]) {
        const t = Array.from({ length: count }, (_, i) => (i === count - 1 ? piece : "point 1 at 0")).join("; ");
        expect(outcome(t)).toEqual(general(t));
      }
    }
  });

  // Mostly rejections (compared by message); the next test covers the accepting paths.
  test("random word sequences: the same rows or the same message", () => {
    fc.assert(
      fc.property(text, (t) => {
        expect(outcome(t)).toEqual(general(t));
      }),
      { numRuns: 5000, seed: 15 },
    );
  });

  test("well-formed loads of every kind and option: the same rows", () => {
    const num = fc.constantFrom("0", "2.5", "-3", "1e3", ".5", "10");
    const label = fc.constantFrom("", " D", " Lr");
    const one = fc.oneof(
      fc.tuple(fc.constantFrom("point", "Moment", "settle", "Settle"), num, num, label).map(([k, m, x, c]) => `${k} ${m} at ${x}${c}`),
      fc.tuple(fc.constantFrom("udl", "LINEAR"), num, num, fc.option(num), fc.option(num), label).map(
        ([k, m, m2, a, b, c]) => `${k} ${m}${k === "LINEAR" ? ` to ${m2}` : ""}${a === null ? "" : ` from ${a}`}${b === null ? "" : ` to ${b}`}${c}`,
      ),
    );
    fc.assert(
      fc.property(fc.array(one, { minLength: 1, maxLength: 5 }), (loads) => {
        const t = loads.join("; ");
        const got = outcome(t);
        expect(Array.isArray(got)).toBe(true);
        expect(got).toEqual(general(t));
      }),
      { numRuns: 2000, seed: 16 },
    );
  });
});
