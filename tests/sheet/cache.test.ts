import * as core from "../../src/core";
import { LruCache, MemberCache, memberHash, sameCells, solvedMembers } from "../../src/sheet/cache";
import { solvedMember } from "../../src/sheet/worksheet";
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

  test("error objects are not keyed", () => {
    expect(memberHash(args({ spans: [[{ code: "#N/A" }]] }))).toBeNull();
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

  test("alternating members (two diagrams on one sheet) solve at most twice each: on first sight and when admitted", () => {
    const spy = jest.spyOn(core, "solve");
    try {
      solvedMember(args());
      solvedMember(args({ combo: "D" }));
      const a = solvedMember(args());
      const b = solvedMember(args({ combo: "D" }));
      expect(b).not.toBe(a);
      for (let i = 0; i < 20; i++) {
        expect(solvedMember(args())).toBe(a);
        expect(solvedMember(args({ combo: "D" }))).toBe(b);
      }
      expect(spy).toHaveBeenCalledTimes(4);
    } finally {
      spy.mockRestore();
    }
  });

  test("a schedule of distinct members keeps nothing (admission on second sight)", () => {
    for (let i = 0; i < 50; i++) solvedMember(args({ spans: [[6, 8 + i]] }));
    expect(solvedMembers.size).toBe(0);
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
