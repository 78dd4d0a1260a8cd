/**
 * The units argument and unit cells at the sheet boundary. Factors: NIST SP 811 (2008),
 * Appendix B (from memory): 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N
 * (0.45359237 kg x 9.80665 m/s^2), 1 kip = 1000 lbf — written out here, not taken from the code.
 */
import { tolerance, type Member } from "../../src/core";
import { memberInOwnUnits, memberInSI, readMemberUnits, readUnit, solvedMember } from "../../src/sheet";
import { UNITS_MEMO } from "../../src/sheet/units";
import { thrown } from "../core/kit/errors";

const FT = 0.3048;
const IN = 0.0254;
const KIP = 4448.2216152605;

const near = (a: number, b: number) => expect(tolerance.relDiff(a, b)).toBeLessThan(1e-14);

describe("readUnit", () => {
  test("blank cells give no unit; text parses and must fit the quantity", () => {
    for (const blank of [null, "", 0, [[""]], [[null]]]) expect(readUnit(blank, "length", "unit")).toBeNull();
    near(readUnit([["in"]], "length", "unit")!.factor, IN);
    expect(thrown(() => readUnit("ksi", "length", "unit")).message).toBe('unit: "ksi" measures force/length^2, not length');
    expect(thrown(() => readUnit(12, "length", "unit")).message).toMatch(/^unit: 12 is not a unit; write one such as m, mm, ft or in/);
    expect(thrown(() => readUnit([["ft", "in"]], "length", "unit")).message).toMatch(/^unit: give one cell/);
    expect(thrown(() => readUnit("#N/A", "length", "unit")).message).toMatch(/^unit: the cell holds the error #N\/A/);
  });
});

describe("readMemberUnits", () => {
  test("blank means consistent units", () => {
    for (const blank of [null, "", [[""]], [["", null]]]) expect(readMemberUnits(blank)).toBeNull();
  });

  test("one cell of pairs, with defaults derived from length and force", () => {
    const u = readMemberUnits("length=ft, force=kip")!;
    near(u.length.factor, FT);
    near(u.force.factor, KIP);
    near(u.EI.factor, KIP * FT * FT);
    near(u.section.factor, FT);
    near(u.stress.factor, KIP / (FT * FT));
    expect(u.stress.text).toBe("kip/ft^2");
    near(u.deflection.factor, FT);
  });

  test("spellings: spaces, semicolons, colons, any key case, cells, a key | unit table", () => {
    const forms: unknown[] = [
      "length = ft; force: kip; EI=kip*in^2 section=in stress=ksi deflection=in",
      [["length=ft", "force=kip", "ei=kip*in^2"], ["SECTION=in", "stress=ksi", "deflection=in"]],
      [["length", "ft"], ["force", "kip"], ["EI", "kip*in^2"], ["section", "in"], ["stress", "ksi"], ["deflection", "in"]],
    ];
    for (const form of forms) {
      const u = readMemberUnits(form)!;
      near(u.EI.factor, KIP * IN * IN);
      near(u.section.factor, IN);
      near(u.stress.factor, KIP / (IN * IN));
      near(u.deflection.factor, IN);
    }
  });

  test.each([
    ["length=kip, force=kip", /^units length: "kip" measures force, not length$/],
    ["length=ft, force=kip/ft", /^units force: "kip\/ft" measures force\/length, not force$/],
    ["length=ft, force=kip, EI=ksi", /^units EI: "ksi" measures force\/length\^2, not force x length\^2$/],
    ["length=ft, force=kip, stress=kip", /^units stress: /],
    ["length=ft", /^units: give both length and force/],
    ["length=ft, force=kip, span=ft", /^units: unknown key "span"/],
    ["length=ft, force=kip, length=m", /^units: length is given twice/],
    ["length=ft force", /^units: cannot read "force"/],
    ["length=ft=m, force=kip", /^units: cannot read "length=ft=m"/],
    ["length=furlong, force=kip", /^units length: unknown unit "furlong"/],
  ])("%j is an error naming the argument", (text, message) => {
    const e = thrown(() => readMemberUnits(text));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });

  describe("texts read before are kept (every formula's call reads its units, cached members included)", () => {
    const text = "length=ft, force=kip, EI=kip*in^2, deflection=in";

    test("the same text, alone or as a 1 x 1 range, gives the one frozen result; other forms are read each time, to the same factors", () => {
      const first = readMemberUnits(text)!;
      expect(readMemberUnits([[text]])).toBe(first);
      expect(readMemberUnits([text])).toBe(first);
      expect(Object.isFrozen(first)).toBe(true);
      for (const unit of Object.values(first)) expect(Object.isFrozen(unit)).toBe(true);
      const table = readMemberUnits([["length", "ft"], ["force", "kip"], ["EI", "kip*in^2"], ["deflection", "in"]])!;
      expect(table).not.toBe(first);
      expect(table).toEqual(first);
    });

    test("a result kept is the result read afresh, for more texts than the memo keeps (the oldest give way), read twice over", () => {
      const units = ["in", "mm", "ft", "m"];
      const texts = Array.from({ length: UNITS_MEMO + 5 }, (_, i) => `${" ".repeat(i)}length=ft, force=kip, deflection=${units[i % 4]}`);
      for (let round = 0; round < 2; round++) {
        for (const t of texts) {
          const kept = readMemberUnits(t)!;
          // A 1 x 2 range is never kept: always read.
          const fresh = readMemberUnits([[t, ""]])!;
          expect(kept).toEqual(fresh);
        }
      }
    });

    test("a text that does not read is refused every time (errors are never kept)", () => {
      for (let k = 0; k < 3; k++) expect(thrown(() => readMemberUnits("length=ft, force=furlong")).message).toMatch(/^units force: unknown unit "furlong"/);
    });

    test("a solved member's results with the kept units equal those read afresh", () => {
      const args = { spans: [[20]], loads: [["udl 1.5 D"]], supports: null, EI: [[14790000]], combo: null, units: [[text]] };
      const kept = solvedMember(args, readMemberUnits(text));
      const fresh = solvedMember({ ...args, loads: [["udl 1.5 D "]] }, readMemberUnits([[text, ""]]));
      expect(kept.reactions).toEqual(fresh.reactions);
    });
  });

  test("numbers and error values in the units cells are errors", () => {
    expect(thrown(() => readMemberUnits([["length=ft", 3]])).message).toMatch(/^units: 3 is not a unit label/);
    expect(thrown(() => readMemberUnits([["#REF!"]])).message).toMatch(/^units: a cell holds the error #REF!/);
  });
});

describe("memberInSI", () => {
  test("a rotational spring scales as force x length per radian, a vertical one as force per length", () => {
    const m: Member = {
      spans: [20],
      supports: [{ kind: "pin", rotational: 7 }, { kind: "spring", stiffness: 50, rotational: 9 }],
      stiffness: [1e6],
      loads: [],
    };
    const si = memberInSI(m, readMemberUnits("length=ft, force=kip")!);
    expect(si.supports[0]).toEqual({ kind: "pin", rotational: expect.any(Number) });
    near((si.supports[0] as { rotational: number }).rotational, 7 * KIP * FT);
    near((si.supports[1] as { stiffness: number }).stiffness, (50 * KIP) / FT);
    near((si.supports[1] as { rotational: number }).rotational, 9 * KIP * FT);
    expect(memberInSI({ ...m, supports: [{ kind: "free" }, { kind: "fixed" }] }, readMemberUnits("length=ft, force=kip")!).supports).toEqual([{ kind: "free" }, { kind: "fixed" }]);
  });

  test("every load kind, springs and EI scale by their own dimension", () => {
    const m: Member = {
      spans: [20, 10],
      supports: [{ kind: "pin" }, { kind: "spring", stiffness: 50 }, { kind: "fixed" }],
      stiffness: [1e6, 2e6],
      loads: [
        { kind: "point", magnitude: 8, xStart: 5, xEnd: 5, magnitudeEnd: 0, loadCase: "L", row: 1 },
        { kind: "moment", magnitude: 3, xStart: 25, xEnd: 25, magnitudeEnd: 0, loadCase: "", row: 2 },
        { kind: "udl", magnitude: 1.5, xStart: 0, xEnd: 30, magnitudeEnd: 1.5, loadCase: "D", row: 3 },
        { kind: "linear", magnitude: 0, xStart: 2, xEnd: 12, magnitudeEnd: 2, loadCase: "", row: 4 },
      ],
    };
    const si = memberInSI(m, readMemberUnits("length=ft, force=kip, EI=kip*in^2")!);
    near(si.spans[0], 20 * FT);
    expect(si.supports[1]).toEqual({ kind: "spring", stiffness: expect.any(Number) });
    near((si.supports[1] as { stiffness: number }).stiffness, (50 * KIP) / FT);
    near(si.stiffness![1], 2e6 * KIP * IN * IN);
    near(si.loads[0].magnitude, 8 * KIP);
    near(si.loads[0].xStart, 5 * FT);
    near(si.loads[1].magnitude, 3 * KIP * FT);
    near(si.loads[2].magnitudeEnd, (1.5 * KIP) / FT);
    near(si.loads[3].xEnd, 12 * FT);
    expect(si.loads.map((l) => l.loadCase)).toEqual(["L", "", "D", ""]);
    expect(m.spans[0]).toBe(20);
  });
});

describe("the units path keeps nodes as nodes: the member is solved in its own length and force units", () => {
  // Only EI changes: kip*in^2 to kip*ft^2 is a division by 144 (1 ft = 12 in, NIST SP 811).
  const typedMember: Member = {
    spans: [12, 8],
    supports: [{ kind: "pin" }, { kind: "pin" }, { kind: "spring", stiffness: 50 }],
    stiffness: [144000, 288000],
    loads: [
      { kind: "point", magnitude: 3, xStart: 20, xEnd: 20, magnitudeEnd: 0, loadCase: "", row: 1 },
      { kind: "udl", magnitude: 1.5, xStart: 3.3, xEnd: 12, magnitudeEnd: 1.5, loadCase: "", row: 2 },
    ],
  };
  test.each([
    ["spans", (m: Member) => m.spans, [12, 8]],
    ["load positions", (m: Member) => m.loads.flatMap((l) => [l.xStart, l.xEnd]), [20, 20, 3.3, 12]],
    ["load magnitudes", (m: Member) => m.loads.map((l) => l.magnitude), [3, 1.5]],
    ["spring stiffness (kip/ft stays kip/ft)", (m: Member) => m.supports.map((s) => (s.kind === "spring" ? s.stiffness : 0)), [0, 0, 50]],
    ["EI in kip*ft^2 (to rounding of the unit factors)", (m: Member) => m.stiffness!.map((ei) => Number(ei.toPrecision(14))), [1000, 2000]],
  ] as [string, (m: Member) => unknown, unknown][])("%s", (_, pick, expected) => {
    const own = memberInOwnUnits(typedMember, readMemberUnits("length=ft, force=kip, EI=kip*in^2")!);
    expect(pick(own)).toEqual(expected);
  });

  test("a member read with units has the same nodes, as typed, as without", () => {
    const args = { spans: [["12 8"]], loads: [["point 3 at 20"]], supports: [["pin pin free"]], EI: null, combo: null };
    const withUnits = solvedMember({ ...args, units: [["length=ft, force=kip"]] }, readMemberUnits("length=ft, force=kip"));
    const without = solvedMember({ ...args, units: null }, null);
    expect(withUnits.nodeX).toEqual(without.nodeX);
    expect(withUnits.nodeX).toEqual([0, 12, 20]);
  });
});

describe("settlement and shear stiffness under units", () => {
  const m: Member = {
    spans: [6, 6],
    supports: [{ kind: "pin" }, { kind: "pin" }, { kind: "pin" }],
    stiffness: [1e4, 1e4],
    shear: [2e3, null],
    loads: [{ kind: "settle", magnitude: 10, xStart: 6, xEnd: 6, magnitudeEnd: 0, loadCase: "SD", row: 1 }],
  };

  test("memberInSI: Δ from the deflection unit (mm) to m, G·A_v from kN to N", () => {
    const si = memberInSI(m, readMemberUnits("length=m, force=kN, deflection=mm")!);
    expect(si.loads[0].magnitude).toBeCloseTo(0.01, 15);
    expect(si.shear).toEqual([2e6, null]);
  });

  test("memberInOwnUnits: Δ from the deflection unit (in) to the length unit (ft); G·A_v stays in the force unit", () => {
    const own = memberInOwnUnits(m, readMemberUnits("length=ft, force=kip, deflection=in")!);
    expect(own.loads[0].magnitude).toBeCloseTo(10 / 12, 14);
    expect(own.shear).toEqual([2e3, null]);
  });

  test("without a settlement, memberInOwnUnits keeps the loads as given", () => {
    const plain = { ...m, loads: [] };
    expect(memberInOwnUnits(plain, readMemberUnits("length=ft, force=kip, deflection=in")!).loads).toBe(plain.loads);
  });
});
