/**
 * validateMember: every rejection path, with its code, its whole message, and that solve()
 * rejects the same member with the same error (validation runs before anything else).
 * Messages must name the span, support (with its x) or load row at fault. And a table of
 * members at the edges of what is allowed, which must pass.
 */
import { MAX_LOADS, solve, validateMember, type Load, type Member } from "../../src/core";
import { beam, couple, linear, point, udl } from "./kit/members";
import { thrown } from "./kit/errors";

const base = (): Member => beam([4, 4, 4], ["pin", "pin", "pin", "pin"], [udl(2, 0, 12)], 1e4);
const withSpans = (spans: number[]): Member => ({ ...base(), spans, supports: spans.concat([0]).map(() => ({ kind: "pin" })), stiffness: null });
const withLoad = (row: number, load: Load): Member => ({ ...base(), loads: [udl(1, 0, 12), { ...load, row }].map((l, i) => ({ ...l, row: i ? row : 1 })) });
const withSupport = (i: number, support: unknown): Member => {
  const m = base();
  m.supports[i] = support as Member["supports"][number];
  return m;
};

const cases: [string, () => Member, string][] = [
  ["no spans", () => withSpans([]), "spans: give at least one span length"],
  ["negative span", () => withSpans([4, -3]), "span 2: length must be a positive number, got -3"],
  ["zero span", () => withSpans([0]), "span 1: length must be a positive number, got 0"],
  ["NaN span", () => withSpans([4, 4, NaN]), "span 3: length must be a positive number, got NaN"],
  ["infinite span", () => withSpans([Infinity]), "span 1: length must be a positive number, got Infinity"],
  ["too few supports", () => ({ ...base(), supports: base().supports.slice(1) }), "supports: need 4 entries (one per node, spans + 1), got 3"],
  ["too many supports", () => ({ ...base(), supports: [...base().supports, { kind: "pin" }] }), "supports: need 4 entries (one per node, spans + 1), got 5"],
  ["unknown support kind", () => withSupport(3, { kind: "roller" }), 'support 4 (x = 12): unknown support "roller"; use pin, fixed, free, hinge or a spring stiffness'],
  ["zero spring", () => withSupport(1, { kind: "spring", stiffness: 0 }), "support 2 (x = 4): spring stiffness must be a positive number, got 0"],
  ["negative spring", () => withSupport(2, { kind: "spring", stiffness: -5 }), "support 3 (x = 8): spring stiffness must be a positive number, got -5"],
  ["NaN spring", () => withSupport(2, { kind: "spring", stiffness: NaN }), "support 3 (x = 8): spring stiffness must be a positive number, got NaN"],
  [
    "spring without EI",
    () => ({ ...withSupport(1, { kind: "spring", stiffness: 100 }), stiffness: null }),
    "support 2 (x = 4): a spring support needs EI, since the result depends on EI relative to the spring",
  ],
  ["hinge at the left end", () => withSupport(0, { kind: "hinge" }), "support 1 (x = 0): a hinge joins two spans, so it belongs at an interior node, not at a member end"],
  ["hinge at the right end", () => withSupport(3, { kind: "hinge" }), "support 4 (x = 12): a hinge joins two spans, so it belongs at an interior node, not at a member end"],
  ["EI count", () => ({ ...base(), stiffness: [1, 2] }), "EI: give one value for the member or one per span (3), got 2"],
  [
    "more loads than a member takes",
    () => ({ ...base(), loads: Array.from({ length: MAX_LOADS + 1 }, (_, i) => ({ ...point(1, (i % 12) + 0.5), row: i + 1 })) }),
    `loads: at most ${MAX_LOADS} loads on one member, got ${MAX_LOADS + 1} (combine loads that act together)`,
  ],
  ["zero EI", () => ({ ...base(), stiffness: [1, 0, 1] }), "EI of span 2: must be a positive number, got 0"],
  ["infinite EI", () => ({ ...base(), stiffness: [1, 1, Infinity] }), "EI of span 3: must be a positive number, got Infinity"],
  ["unknown load kind", () => withLoad(3, { ...point(1, 2), kind: "torque" as Load["kind"] }), 'load row 3: unknown load type "torque"; use point, moment, udl, linear or settle'],
  ["NaN magnitude", () => withLoad(2, point(NaN, 2)), "load row 2: magnitude must be a finite number, got NaN"],
  ["infinite magnitude", () => withLoad(2, udl(Infinity, 0, 2)), "load row 2: magnitude must be a finite number, got Infinity"],
  ["NaN x start", () => withLoad(4, couple(1, NaN)), "load row 4: x start must be a finite number, got NaN"],
  ["x start before the member", () => withLoad(2, point(1, -1)), "load row 2: x start -1 is before the member start 0"],
  ["point beyond the end", () => withLoad(3, point(1, 13)), "load row 3: x start 13 is beyond the member end 12"],
  ["couple beyond the end", () => withLoad(3, couple(1, 12.5)), "load row 3: x start 12.5 is beyond the member end 12"],
  ["udl starting beyond the end", () => withLoad(5, udl(1, 13, 14)), "load row 5: x start 13 is beyond the member end 12"],
  ["udl ending beyond the end", () => withLoad(2, udl(1, 2, 20)), "load row 2: x end 20 is beyond the member end 12"],
  ["udl ending before it starts", () => withLoad(2, udl(1, 4, 1)), "load row 2: x end 1 is not beyond x start 4"],
  ["udl of zero length", () => withLoad(2, udl(1, 4, 4)), "load row 2: x end 4 is not beyond x start 4"],
  ["linear with NaN x end", () => withLoad(6, linear(1, 2, 0, NaN)), "load row 6: x end must be a finite number, got NaN"],
  ["linear with NaN end magnitude", () => withLoad(6, linear(1, NaN, 0, 3)), "load row 6: magnitude at end must be a finite number, got NaN"],
  ["udl ending at 0 (a blank read as zero)", () => withLoad(2, udl(1, 0, 0)), "load row 2: x end 0 is not beyond x start 0"],
  ["NaN EI", () => ({ ...base(), stiffness: [1, NaN, 1] }), "EI of span 2: must be a positive number, got NaN"],
  ["negative EI", () => ({ ...base(), stiffness: [-1, 1, 1] }), "EI of span 1: must be a positive number, got -1"],
  [
    "a couple exactly on a hinge",
    () => beam([4, 4], ["fixed", "hinge", "pin"], [{ ...couple(1, 4), row: 6 }]),
    "load row 6: a couple exactly at the hinge at x = 4 has no side to act on; place it just left or just right of the hinge",
  ],
];

describe("validateMember: every rejection has code #VALUE! and a message naming the item", () => {
  it.each(cases)("%s", (_name, make, message) => {
    const error = thrown(() => validateMember(make()));
    expect([error.code, error.message]).toEqual(["#VALUE!", message]);
    expect(error.message).toMatch(/^(spans?|span \d+|supports|support \d+ \(x = [\d.]+\)|EI|EI of span \d+|load row \d+|loads)[:]/);
  });

  it.each(cases)("solve rejects the same member the same way: %s", (_name, make, message) => {
    const error = thrown(() => solve(make()));
    expect([error.code, error.message]).toEqual(["#VALUE!", message]);
  });
});

describe("validateMember accepts members at the edges of what is allowed", () => {
  const good: [string, Member][] = [
    ["loads exactly at both ends", beam([5], ["pin", "pin"], [point(1, 0), couple(2, 5), point(3, 5)])],
    ["udl over the whole member", beam([2, 3], ["pin", "pin", "pin"], [udl(1, 0, 5)])],
    ["negative and zero magnitudes", beam([5], ["pin", "pin"], [point(-1, 2), udl(0, 1, 2), linear(-2, 3, 0, 5)])],
    ["hinge and spring at interior nodes", beam([2, 3, 2], ["fixed", "hinge", 200, "pin"], [], [10, 20, 30])],
    ["no loads, no EI", beam([5], ["fixed", "free"], [])],
    ["EI per span", beam([5, 3], ["pin", "pin", "pin"], [], [100, 200])],
    ["spring with EI", beam([4], ["pin", 50], [], 1000)],
    // 0.7 + 0.1 is 0.7999999999999999 in binary floating point; a load at the member end 0.8
    // as the user typed it must not be reported as beyond the end.
    ["point load at the end of spans 0.7 + 0.1", beam([0.7, 0.1], ["pin", "pin", "pin"], [point(1, 0.8)])],
    ["udl to the end of spans 0.7 + 0.1", beam([0.7, 0.1], ["pin", "pin", "pin"], [udl(1, 0, 0.8)])],
    ["a couple just beside a hinge", beam([4, 4], ["fixed", "hinge", "pin"], [couple(1, 4.001)])],
  ];
  it.each(good)("%s", (_name, m) => {
    expect(() => validateMember(m)).not.toThrow();
  });
});
