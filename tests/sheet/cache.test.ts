import * as core from "../../src/core";
import { LruCache, memberKey, solvedMembers } from "../../src/sheet/cache";
import { solvedMember } from "../../src/sheet/worksheet";
import type { MemberArgs } from "../../src/sheet/member";

const args = (partial: Partial<MemberArgs> = {}): MemberArgs => ({ spans: [[6, 8]], loads: [["udl", 2, "", "", "", "D"]], supports: null, EI: null, combo: null, ...partial });

describe("memberKey", () => {
  test("equal inputs give equal keys", () => {
    expect(memberKey(args())).toBe(memberKey(args()));
  });

  test.each([
    ["a span", { spans: [[6, 9]] }],
    ["number vs text", { spans: [["6", 8]] }],
    ["row vs column", { spans: [[6], [8]] }],
    ["a load", { loads: [["udl", 2, "", "", "", "L"]] }],
    ["supports", { supports: [["fixed pin pin"]] }],
    ["EI", { EI: [[1]] }],
    ["combo", { combo: "1.2D" }],
    ["blank as \"\" vs null", { loads: [["udl", 2, null, "", "", "D"]] }],
  ])("differs when %s differs", (_label, change) => {
    expect(memberKey(args(change))).not.toBe(memberKey(args()));
  });

  test("text with separator characters cannot collide", () => {
    const a = memberKey(args({ loads: [["a,b", "c"]] }));
    const b = memberKey(args({ loads: [["a", "b,c"]] }));
    const c = memberKey(args({ loads: [["s1:a,", "b"]] }));
    expect(new Set([a, b, c]).size).toBe(3);
  });

  test("error objects are not keyed", () => {
    expect(memberKey(args({ spans: [[{ code: "#N/A" }]] }))).toBeNull();
  });
});

describe("LruCache", () => {
  test("drops the least recently used entry beyond capacity", () => {
    const cache = new LruCache<number>(2);
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

  test("the cache is bounded", () => {
    for (let i = 0; i < solvedMembers.capacity + 20; i++) solvedMember(args({ spans: [[6, 8 + i]] }));
    expect(solvedMembers.size).toBe(solvedMembers.capacity);
  });

  test("a bad member is not cached and fails every time", () => {
    expect(() => solvedMember(args({ spans: [["x"]] }))).toThrow(/spans entry 1/);
    expect(() => solvedMember(args({ spans: [["x"]] }))).toThrow(/spans entry 1/);
    expect(solvedMembers.size).toBe(0);
  });
});
