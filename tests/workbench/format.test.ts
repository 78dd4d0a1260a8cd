/**
 * Number display of the grid: up to 6 significant figures, never fewer integer digits than
 * the number has, E notation outside 1e-4 to 1e11, rounded to fit a narrow cell and ###
 * when nothing fits. Source for rounding to the column: Apache OpenOffice Wiki, "Calc/Features/
 * Automatic decimal place adjustment" (cells in General format "use as many decimal places as
 * the column width allows"); the 6-figure cap and the E thresholds are this project's choice.
 * Expected texts worked by hand.
 */
import { displayText, numberTexts } from "../../src/workbench/format";

describe("numberTexts", () => {
  const cases: [number, string][] = [
    [0, "0"],
    [4.687500000000001, "4.6875"],
    [49.09659090909091, "49.0966"],
    [-0.000307418, "-0.000307418"],
    [1234567, "1234567"],
    [1234567.89, "1234568"],
    [0.1 + 0.2, "0.3"],
    [2.5e-7, "2.5E-7"],
    [-3.39521e-5, "-3.39521E-5"],
    [123456789012, "1.23457E+11"],
    [18500, "18500"],
  ];
  it.each(cases)("%p shows as %s", (value, text) => expect(numberTexts(value)[0]).toBe(text));

  it("never shows more than 6 significant figures after the integer digits, and every candidate reads back close to the value (invariant)", () => {
    for (const v of [Math.PI, -Math.E * 1000, 1 / 3, 98765.4321, 7.2e-3, 6.02e23, -1.5e-9]) {
      const texts = numberTexts(v);
      expect(Number(texts[0])).toBeCloseTo(v, 0);
      for (const t of texts) {
        const digits = t.replace(/E.*$/, "").replace(/^-/, "").replace(".", "").replace(/^0+/, "");
        const integer = Math.abs(v) >= 1 && Math.abs(v) < 1e11 ? Math.floor(Math.log10(Math.abs(v))) + 1 : 0;
        expect(digits.length).toBeLessThanOrEqual(Math.max(6, integer));
        expect(Math.abs(Number(t) - v)).toBeLessThanOrEqual(0.5 * Math.abs(v) + 1e-300);
      }
    }
  });
});

describe("displayText", () => {
  const width = (t: string): number => 7 * t.length;
  it("takes the most precise text that fits, then ###", () => {
    expect(displayText(49.09659090909091, (t) => width(t) <= 70)).toBe("49.0966");
    expect(displayText(49.09659090909091, (t) => width(t) <= 28)).toBe("49.1");
    expect(displayText(1234567, (t) => width(t) <= 28)).toBe("1E+6");
    expect(displayText(1234567, (t) => width(t) <= 20)).toBe("###");
  });

  it("shows errors by code, booleans and text as they are, blanks empty", () => {
    expect(displayText({ error: "#VALUE!", message: "x" })).toBe("#VALUE!");
    expect(displayText(true)).toBe("TRUE");
    expect(displayText("pin")).toBe("pin");
    expect(displayText(null)).toBe("");
  });
});
