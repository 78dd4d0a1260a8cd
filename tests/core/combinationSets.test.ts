import { expandCombinationSet, formatCombination } from "../../src/core";

const texts = (name: string, options = {}) => expandCombinationSet(name, options).map(formatCombination);

describe("named combination sets", () => {
  // ASCE/SEI 7-16, section 2.3.1, strength design, combinations 1-5 (from memory):
  // 1.4D; 1.2D + 1.6L + 0.5(Lr or S or R); 1.2D + 1.6(Lr or S or R) + (L or 0.5W);
  // 1.2D + 1.0W + L + 0.5(Lr or S or R); 0.9D + 1.0W.
  it("ASCE 7 strength combinations, each roof alternative separately", () => {
    expect(texts("ASCE7-2.3.1")).toEqual([
      "1.4D",
      "1.2D + 1.6L + 0.5Lr", "1.2D + 1.6L + 0.5S", "1.2D + 1.6L + 0.5R",
      "1.2D + 1.6Lr + L", "1.2D + 1.6S + L", "1.2D + 1.6R + L",
      "1.2D + 1.6Lr + 0.5W", "1.2D + 1.6S + 0.5W", "1.2D + 1.6R + 0.5W",
      "1.2D + W + L + 0.5Lr", "1.2D + W + L + 0.5S", "1.2D + W + L + 0.5R",
      "0.9D + W",
    ]);
  });

  // ASCE/SEI 7-16, section 2.4.1, allowable stress design, combinations 1-7 (from memory):
  // D; D + L; D + (Lr or S or R); D + 0.75L + 0.75(Lr or S or R); D + 0.6W;
  // D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R); 0.6D + 0.6W.
  it("ASCE 7 allowable stress combinations", () => {
    const all = texts("asce7-2.4.1");
    expect(all).toContain("D + 0.75L + 0.45W + 0.75S");
    expect(all).toContain("0.6D + 0.6W");
    expect(all.length).toBe(1 + 1 + 3 + 3 + 1 + 3 + 1);
  });

  // EN 1990:2002 expression (6.10) with table A1.2(B): gamma_G = 1.35 unfavourable,
  // 1.00 favourable, gamma_Q = 1.5 (from memory); accompanying actions take psi0.
  it("EN 1990 (6.10): each variable case leads once, the others carry 1.5 psi0", () => {
    const all = texts("EN1990-6.10", { psi0: { Q: 0.7, S: 0.5 }, variableCases: ["Q", "S"] });
    expect(all).toEqual(["1.35G", "1.35G + 1.5Q + 0.75S", "1.35G + 1.5S + 1.05Q", "G + 1.5Q + 0.75S", "G + 1.5S + 1.05Q"]);
  });

  it.each([
    ["unknown set", () => expandCombinationSet("CODE-1"), /unknown combination set "CODE-1"/],
    ["EN 1990 without psi0", () => expandCombinationSet("EN1990-6.10", { variableCases: ["Q", "S"] }), /psi0 between 0 and 1 for variable case S/],
    ["psi0 above 1", () => expandCombinationSet("EN1990-6.10", { psi0: 1.2, variableCases: ["Q", "S"] }), /psi0 between 0 and 1/],
  ])("%s is a #VALUE! error", (_name, call, message) => {
    expect(call).toThrow(message);
    try {
      call();
    } catch (e) {
      expect((e as { code: string }).code).toBe("#VALUE!");
    }
  });
});
