import * as core from "../../src/core";
import { flatCopy, LruCache, matchesFlatCopy, MemberCache, memberHash, RECENT_MEMBERS, sameCells, solvedMembers } from "../../src/sheet/cache";
import { sheetMaxMoment, sheetReactions, sheetValuesAt, solvedMember } from "../../src/sheet/worksheet";
import type { MemberArgs } from "../../src/sheet/member";

const args = (partial: Partial<MemberArgs> = {}): MemberArgs => ({ spans: [[6, 8]], loads: [["udl", 2, "", "", "", "D"]], supports: null, EI: null, combo: null, ...partial });

const changes: [string, Partial<MemberArgs>][] = [
  ["a span", { spans: [[6, 9]] }],
  ["number vs text", { spans: [["6", 8]] }],
  ["row vs column", { spans: [[6], [8]] }],
  ["a load", { loads: [["udl", 2, "", "", "", "L"]] }],
  ["supports", { supports: [["fixed pin pin"]] }],
  ["EI", { EI: [[1]] }],
  ["combo", { combo: "1.2D" }],
  ["blank as \"\" vs null", { loads: [["udl", 2, null, "", "", "D"]] }],
  ["blank as \"\" vs 0", { loads: [["udl", 2, 0, "", "", "D"]] }],
  ["cells moved between rows", { loads: [["udl", 2, "", ""], ["", "", "D"]] }],
];

describe("memberHash and sameCells", () => {
  test("equal inputs (fresh arrays) give equal hashes and compare equal", () => {
    expect(memberHash(args())).toBe(memberHash(args()));
    expect(sameCells(args().loads, args().loads)).toBe(true);
  });

  test.each(changes)("%s: the cells compare different, and the hash differs", (_label, change) => {
    const changed = args(change);
    const base = args();
    const differs = (Object.keys(change) as (keyof MemberArgs)[]).some((k) => !sameCells(changed[k], base[k]));
    expect(differs).toBe(true);
    expect(memberHash(changed)).not.toBe(memberHash(base));
  });

  test("-0 and 0 hash alike; NaN never compares equal", () => {
    expect(memberHash(args({ spans: [[-0, 8]] }))).toBe(memberHash(args({ spans: [[0, 8]] })));
    expect(sameCells([[NaN]], [[NaN]])).toBe(false);
  });

  test("error objects are not keyed, in any argument and at any depth", () => {
    expect(memberHash(args({ spans: [[{ code: "#N/A" }]] }))).toBeNull();
    expect(memberHash(args({ combo: { code: "#N/A" } }))).toBeNull();
    expect(memberHash(args({ units: [[{ code: "#REF!" }]] }))).toBeNull();
    expect(memberHash(args({ loads: [{ code: "#N/A" }] }))).toBeNull();
    expect(memberHash(args({ loads: [[["udl", { code: "#N/A" }]]] }))).toBeNull();
    expect(memberHash(args({ supports: [[() => 1]] }))).toBeNull();
  });

  test("one-dimensional, bare and deeper-nested arguments hash and compare by their cells", () => {
    for (const spans of [[6, 8], 6, "6 8", [[[6, 8]]], [[6], [8]], [[[6], [8]]]]) {
      expect(memberHash(args({ spans }))).toBe(memberHash(args({ spans: JSON.parse(JSON.stringify(spans)) })));
    }
    expect(memberHash(args({ spans: [[[6, 8]]] }))).not.toBe(memberHash(args({ spans: [[[6, 9]]] })));
    expect(memberHash(args({ spans: [[6, 8]] }))).not.toBe(memberHash(args({ spans: [6, 8] })));
    expect(memberHash(args({ spans: [[6], [8]] }))).not.toBe(memberHash(args({ spans: [[6, 8]] })));
    // Text of odd and even lengths, differing in one character anywhere.
    const text = "udl 3.37 to 4.99; point 11.10 at 4.20; udl 3.63 from 4.99";
    const hashes = new Set<number | null>();
    for (let i = 0; i <= text.length; i++) {
      const cut = text.slice(0, i);
      hashes.add(memberHash(args({ loads: [[cut]] })));
      if (i < text.length) hashes.add(memberHash(args({ loads: [[`${cut}#${text.slice(i + 1)}`]] })));
    }
    expect(hashes.size).toBe(2 * text.length + 1);
  });
});

describe("LruCache", () => {
  test("drops the least recently used entry beyond capacity", () => {
    const cache = new LruCache<string, number>(2);
    cache.set("a", 1);
    cache.set("b", 2);
    expect(cache.get("a")).toBe(1);
    cache.set("c", 3);
    expect(cache.get("b")).toBeUndefined();
    expect(cache.get("a")).toBe(1);
    expect(cache.get("c")).toBe(3);
    expect(cache.size).toBe(2);
  });
});

describe("MemberCache", () => {
  const solution = {} as core.Solution;

  test("a hash collision is a miss, never another member's solution", () => {
    const cache = new MemberCache(4);
    cache.set(args(), 42, solution);
    expect(cache.get(args(), 42)).toBe(solution);
    for (const [, change] of changes) expect(cache.get(args(change), 42)).toBeUndefined();
  });

  test.each(changes)("recent tier: %s makes the flat copy differ, exactly when the cells differ", (_label, change) => {
    const copy = flatCopy(args());
    expect(matchesFlatCopy(args(), copy)).toBe(true);
    expect(matchesFlatCopy(args(change), copy)).toBe(false);
    expect(matchesFlatCopy(args(), flatCopy(args(change)))).toBe(false);
  });

  test("recent tier: numbers are compared as === compares them (-0 is 0, NaN never matches), never as text", () => {
    expect(matchesFlatCopy(args({ spans: [[-0, 8]] }), flatCopy(args({ spans: [[0, 8]] })))).toBe(true);
    expect(matchesFlatCopy(args({ spans: [[NaN, 8]] }), flatCopy(args({ spans: [[NaN, 8]] })))).toBe(false);
    expect(matchesFlatCopy(args({ spans: [["6", 8]] }), flatCopy(args({ spans: [[6, 8]] })))).toBe(false);
    expect(matchesFlatCopy(args({ spans: [[6, 8]] }), flatCopy(args({ spans: [["6", 8]] })))).toBe(false);
    expect(matchesFlatCopy(args({ spans: [[null, 8]] }), flatCopy(args({ spans: [[undefined, 8]] })))).toBe(true);
    expect(matchesFlatCopy(args({ spans: [[0, 8]] }), flatCopy(args({ spans: [[null, 8]] })))).toBe(false);
  });

  test("recent tier: a member of many number cells (past the slot's first number buffer) matches exactly", () => {
    const big = (last: number): MemberArgs => args({ loads: Array.from({ length: 40 }, (_, i) => ["point", i + 0.5, i === 39 ? last : i / 4, "", "", "D"]) });
    const copy = flatCopy(big(9.75));
    expect(matchesFlatCopy(big(9.75), copy)).toBe(true);
    expect(matchesFlatCopy(big(9.76), copy)).toBe(false);
    const cache = new MemberCache(4);
    cache.find(big(1));
    cache.keep(big(1), solution);
    cache.find(args());
    cache.keep(args(), solution);
    const other = {} as core.Solution;
    cache.find(big(2));
    cache.keep(big(2), other);
    expect(cache.find(big(1))).toBe(solution);
    expect(cache.find(big(2))).toBe(other);
    expect(cache.find(big(3))).toBeUndefined();
  });

  test("recent tier: deeper-nested and one-dimensional arguments match exactly", () => {
    for (const spans of [[[[6, 8]]], [6, 8], 6, [[6], [8]]]) {
      expect(matchesFlatCopy(args({ spans }), flatCopy(args({ spans: JSON.parse(JSON.stringify(spans)) })))).toBe(true);
    }
    expect(matchesFlatCopy(args({ spans: [[[6, 8]]] }), flatCopy(args({ spans: [[[6, 9]]] })))).toBe(false);
    expect(matchesFlatCopy(args({ spans: [[[6, 8]]] }), flatCopy(args({ spans: [[6, 8]] })))).toBe(false);
    expect(matchesFlatCopy(args({ spans: [6, 8] }), flatCopy(args({ spans: [[6, 8]] })))).toBe(false);
  });

  test("recent tier: a longer or shorter member never matches a copy's prefix", () => {
    const long = args({ spans: [[6, 8, 4]] });
    expect(matchesFlatCopy(args(), flatCopy(long))).toBe(false);
    expect(matchesFlatCopy(long, flatCopy(args()))).toBe(false);
  });

  test("recent tier: later edits to the caller's arrays do not change what was kept", () => {
    const cache = new MemberCache(4);
    const given = args();
    expect(cache.find(given)).toBeUndefined();
    cache.keep(given, solution);
    expect(cache.find(args())).toBe(solution);
    (given.spans as number[][])[0][0] = 99;
    expect(cache.find(given)).toBeUndefined();
    expect(cache.find(args())).toBe(solution);
  });

  test("recent tier is bounded by its capacity, reusing its slots", () => {
    const cache = new MemberCache(4, 3);
    for (let i = 0; i < 10; i++) {
      const a = args({ spans: [[6, 8 + i]] });
      cache.find(a);
      cache.keep(a, solution);
    }
    expect(cache.recentSize).toBe(3);
    expect(cache.find(args({ spans: [[6, 17]] }))).toBe(solution);
    expect(cache.find(args({ spans: [[6, 14]] }))).toBeUndefined();
  });

  test("later edits to the caller's arrays do not change what was cached", () => {
    const cache = new MemberCache(4);
    const given = args();
    cache.set(given, 7, solution);
    (given.spans as number[][])[0][0] = 99;
    expect(cache.get(given, 7)).toBeUndefined();
    expect(cache.get(args(), 7)).toBe(solution);
  });
});

describe("solvedMember", () => {
  beforeEach(() => solvedMembers.clear());

  test("one solve for many calls with the same arguments; a new solve when they change", () => {
    const spy = jest.spyOn(core, "solve");
    try {
      const first = solvedMember(args());
      for (let i = 0; i < 50; i++) expect(solvedMember(args())).toBe(first);
      expect(spy).toHaveBeenCalledTimes(1);
      solvedMember(args({ combo: "D" }));
      expect(spy).toHaveBeenCalledTimes(2);
    } finally {
      spy.mockRestore();
    }
  });

  test("alternating members (two diagrams on one sheet) solve once each", () => {
    const spy = jest.spyOn(core, "solve");
    try {
      const a = solvedMember(args());
      const b = solvedMember(args({ combo: "D" }));
      expect(b).not.toBe(a);
      for (let i = 0; i < 20; i++) {
        expect(solvedMember(args())).toBe(a);
        expect(solvedMember(args({ combo: "D" }))).toBe(b);
      }
      expect(spy).toHaveBeenCalledTimes(2);
      expect(solvedMembers.counts.misses).toBe(2);
    } finally {
      spy.mockRestore();
    }
  });

  test(`up to ${RECENT_MEMBERS} members used in turn solve once each; one more and they come back through the cache`, () => {
    const member = (i: number): MemberArgs => args({ spans: [[6, 8 + i]] });
    for (let pass = 0; pass < 3; pass++) for (let i = 0; i < RECENT_MEMBERS; i++) solvedMember(member(i));
    expect(solvedMembers.counts.misses).toBe(RECENT_MEMBERS);
    expect(solvedMembers.size).toBe(0);
    solvedMembers.clear();
    const more = RECENT_MEMBERS + 1;
    for (let pass = 0; pass < 3; pass++) for (let i = 0; i < more; i++) solvedMember(member(i));
    // First pass: each solved once; second pass: each comes back after leaving the recent tier
    // and is admitted; third pass: all answered from the cache.
    expect(solvedMembers.counts.misses).toBe(2 * more);
    expect(solvedMembers.size).toBe(more);
  });

  test("a schedule row (MAXMOMENT, REACTIONS, DEFLECTION of another combination, SHEAR of one member) solves once per member", () => {
    const spy = jest.spyOn(core, "solve");
    try {
      const rows = 40;
      for (let r = 0; r < rows; r++) {
        const spans = [[6, 8 + r / 4, 5]];
        const loads = [["udl", 2, "", "", "", "D"], ["point", 10, 3 + r / 8, "", "", "L"]];
        expect(sheetMaxMoment(spans, loads, null, null, "1.2D+1.6L")[0][0]).toEqual(expect.any(Number));
        expect(sheetReactions(spans, loads, null, null, "1.2D+1.6L")).toHaveLength(4);
        expect(sheetValuesAt("deflection", spans, loads, [[3]], null, [[2e4]], "D+L")[0][0]).toEqual(expect.any(Number));
        expect(sheetValuesAt("shear", spans, loads, [[3]], null, null, "1.2D+1.6L")[0][0]).toEqual(expect.any(Number));
      }
      // Two members per row: the strength combination (three functions) and the other one.
      expect(solvedMembers.counts.misses).toBe(2 * rows);
      expect(spy).toHaveBeenCalledTimes(2 * rows);
      expect(solvedMembers.counts.recentHits).toBe(2 * rows);
      expect(solvedMembers.size).toBe(0);
    } finally {
      spy.mockRestore();
    }
  });

  test("a schedule of distinct members keeps nothing (admission on second sight)", () => {
    for (let i = 0; i < 50; i++) solvedMember(args({ spans: [[6, 8 + i]] }));
    expect(solvedMembers.size).toBe(0);
    expect(solvedMembers.recentSize).toBe(RECENT_MEMBERS);
  });

  test("the cache is bounded", () => {
    for (let pass = 0; pass < 2; pass++) {
      for (let i = 0; i < solvedMembers.capacity + 20; i++) solvedMember(args({ spans: [[6, 8 + i]] }));
    }
    expect(solvedMembers.size).toBe(solvedMembers.capacity);
  });

  test("a bad member is not cached and fails every time", () => {
    expect(() => solvedMember(args({ spans: [["x"]] }))).toThrow(/spans entry 1/);
    expect(() => solvedMember(args({ spans: [["x"]] }))).toThrow(/spans entry 1/);
    expect(solvedMembers.size).toBe(0);
  });
});
