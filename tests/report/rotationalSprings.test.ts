/** Rotational springs (partial fixity) in the member report: named in the member's lines and drawn in its sketch. */
import { readMember } from "../../src/sheet";
import { memberLines, supportText } from "../../src/report/describe";
import { memberSketch } from "../../src/report/figures";

describe("rotational springs in the member report", () => {
  const member = readMember({ spans: [[5, 4]], loads: "udl 3", supports: [["pin+rot 5000", "spring 800 rot 300", "rot 2000"]], EI: [[24000]], combo: null });

  it.each([
    [0, "pin + rotational spring k = 5000 per radian"],
    [1, "spring k = 800 + rotational spring k = 300 per radian"],
    [2, "rotational spring k = 2000 per radian"],
  ])("support %i reads %s", (i, text) => {
    expect(supportText(member.supports[i])).toBe(text);
  });

  it("lists every support in the member lines and draws one coil per rotational spring", () => {
    expect(memberLines(member)[1]).toBe("supports: pin + rotational spring k = 5000 per radian, spring k = 800 + rotational spring k = 300 per radian, rotational spring k = 2000 per radian");
    const labels = memberSketch(member, "m").shapes.filter((s) => s.kind === "text" && s.text.startsWith("k_rot=")).map((s) => (s as { text: string }).text);
    expect(labels).toEqual(["k_rot=5000", "k_rot=300", "k_rot=2000"]);
    const plain = readMember({ spans: [[5]], loads: "udl 3", supports: [["pin", "pin"]], EI: null, combo: null });
    expect(memberSketch(plain, "").shapes.some((s) => s.kind === "text" && s.text.startsWith("k_rot"))).toBe(false);
  });
});
