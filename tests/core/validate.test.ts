import { validateMember } from "../../src/core/validate";
import type { Member } from "../../src/core/model";
import { couple, linear, member, point, udl } from "./support/build";
import { caught } from "./support/expectError";

const good = () => member({ spans: [6, 8], EI: 2000, loads: [udl(2, 0, 14), point(10, 3), couple(5, 7), linear(0, 2, 3, 9)] });

function withLoadRow(load: Member["loads"][number], row = 3): Member {
  const m = good();
  m.loads = [{ ...load, row }];
  return m;
}

describe("validateMember accepts well-formed members", () => {
  const cases: [string, Member][] = [
    ["two spans, all pins, EI", good()],
    ["no EI", member({ spans: [5], loads: [point(1, 2)] })],
    ["EI per span", member({ spans: [5, 3], EI: [100, 200], loads: [] })],
    ["interior hinge", member({ spans: [4, 4], supports: ["fixed", "hinge", "pin"], loads: [] })],
    ["spring with EI", member({ spans: [4], supports: ["pin", 50], EI: 1000, loads: [] })],
    ["point load at each end", member({ spans: [4], loads: [point(1, 0), point(1, 4)] })],
    ["udl over the whole member", member({ spans: [4, 2], loads: [udl(1, 0, 6)] })],
    // 0.7 + 0.1 is 0.7999999999999999 in binary floating point; a load at the member end 0.8
    // as the user typed it must not be reported as beyond the end.
    ["point load at the end of spans 0.7 + 0.1", member({ spans: [0.7, 0.1], loads: [point(1, 0.8)] })],
    ["udl to the end of spans 0.7 + 0.1", member({ spans: [0.7, 0.1], loads: [udl(1, 0, 0.8)] })],
    ["a couple just beside a hinge", member({ spans: [4, 4], supports: ["fixed", "hinge", "pin"], loads: [couple(1, 4.001)] })],
  ];
  test.each(cases)("%s", (_name, m) => {
    expect(() => validateMember(m)).not.toThrow();
  });
});

describe("validateMember rejects bad members with #VALUE! and a message naming the problem", () => {
  const loadRow = (partial: Partial<Member["loads"][number]>) => withLoadRow({ ...point(1, 2), ...partial });
  const cases: [string, () => Member, RegExp][] = [
    ["no spans", () => member({ spans: [] }), /span/i],
    ["zero span", () => member({ spans: [4, 0] }), /span 2/i],
    ["negative span", () => member({ spans: [-4] }), /span 1/i],
    ["NaN span", () => member({ spans: [NaN] }), /span 1/i],
    ["infinite span", () => member({ spans: [Infinity] }), /span 1/i],
    ["too few supports", () => ({ ...member({ spans: [4, 4] }), supports: [{ kind: "pin" }, { kind: "pin" }] }), /supports/i],
    ["too many supports", () => ({ ...member({ spans: [4] }), supports: member({ spans: [1, 1, 1] }).supports }), /supports/i],
    ["unknown support", () => ({ ...member({ spans: [4] }), supports: [{ kind: "pin" }, { kind: "roller" } as never] }), /support 2/i],
    ["hinge at the left end", () => member({ spans: [4, 4], supports: ["hinge", "pin", "pin"] }), /support 1.*hinge/i],
    ["hinge at the right end", () => member({ spans: [4, 4], supports: ["pin", "pin", "hinge"] }), /support 3.*hinge/i],
    ["zero spring", () => member({ spans: [4], supports: ["pin", 0], EI: 1 }), /support 2.*spring/i],
    ["negative spring", () => member({ spans: [4], supports: ["pin", -3], EI: 1 }), /support 2.*spring/i],
    ["spring without EI", () => member({ spans: [4], supports: ["pin", 30] }), /support 2.*EI/i],
    ["EI count", () => member({ spans: [4, 4], EI: [1, 2, 3] }), /EI/],
    ["zero EI", () => member({ spans: [4, 4], EI: [1, 0] }), /EI of span 2/],
    ["negative EI", () => member({ spans: [4], EI: -1 }), /EI of span 1/],
    ["NaN EI", () => member({ spans: [4], EI: NaN }), /EI of span 1/],
    ["unknown load type", () => loadRow({ kind: "pressure" as never }), /load row 3.*type/i],
    ["NaN magnitude", () => loadRow({ magnitude: NaN }), /load row 3.*magnitude/i],
    ["infinite magnitude", () => loadRow({ magnitude: -Infinity }), /load row 3.*magnitude/i],
    ["point before the start", () => loadRow({ xStart: -0.5 }), /load row 3.*x start/i],
    ["point beyond the end", () => loadRow({ xStart: 15 }), /load row 3: x start 15 is beyond the member end 14/],
    ["NaN x start", () => loadRow({ xStart: NaN }), /load row 3.*x start/i],
    ["couple beyond the end", () => withLoadRow(couple(1, 14.5), 4), /load row 4.*x start/i],
    ["udl beyond the end", () => withLoadRow(udl(1, 2, 20), 2), /load row 2.*x end 20/i],
    ["udl ending where it starts", () => withLoadRow(udl(1, 5, 5), 2), /load row 2.*x end/i],
    ["udl running backwards", () => withLoadRow(udl(1, 5, 3), 2), /load row 2.*x end/i],
    ["udl ending at 0 (a blank read as zero)", () => withLoadRow(udl(1, 0, 0), 2), /load row 2.*x end/i],
    ["linear with NaN end magnitude", () => withLoadRow(linear(1, 0, NaN, 4), 5), /load row 5.*magnitude at end/i],
    [
      "a couple exactly on a hinge",
      () => member({ spans: [4, 4], supports: ["fixed", "hinge", "pin"], loads: [{ ...couple(1, 4), row: 6 }] }),
      /load row 6.*hinge/i,
    ],
    ["linear with NaN x end", () => withLoadRow(linear(1, 0, 2, NaN), 5), /load row 5.*x end/i],
  ];
  test.each(cases)("%s", (_name, make, message) => {
    const error = caught(() => validateMember(make()));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(message);
  });
});
