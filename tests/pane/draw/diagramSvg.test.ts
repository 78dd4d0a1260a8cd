import fs from "fs";
import path from "path";
import { extremes, solve, valueAt, type Member } from "../../../src/core";
import { readMember } from "../../../src/sheet";
import { drawDiagrams } from "../../../src/pane/draw/diagramSvg";
import { formatValue } from "../../../src/pane/draw/format";
import { isDarkColour, palette } from "../../../src/pane/draw/palette";
import { readoutAt, readoutText, xAtPixel } from "../../../src/pane/draw/readout";

/** An invented three-span member with every kind of load and support. */
function sampleMember(): Member {
  return readMember({
    spans: [[4.5, 6, 3]],
    loads: [
      ["udl", 5, null, null, null, "D"],
      ["linear", 0, 6, 10.5, 4, "L"],
      ["point", 18, 7.5, null, null, "L"],
      ["point", -4, 13.5, null, null, "D"],
      ["moment", 6, 2, null, null, "D"],
    ],
    supports: [["fixed", "pin", 5000, "free"]],
    EI: [[24000]],
    combo: null,
  });
}

const units = { length: "m", force: "kN", deflection: "m", deflectionFactor: 1 };

describe("drawDiagrams", () => {
  const member = sampleMember();
  const solution = solve(member);
  const drawing = drawDiagrams({ member, solution, units, theme: "light", width: 360, subtitle: "all loads" });

  it("labels the exact extremes of each quantity with value and x", () => {
    expect(drawing.panels.map((p) => p.quantity)).toEqual(["shear", "moment", "deflection"]);
    for (const panel of drawing.panels) {
      const e = extremes(solution, panel.quantity);
      const max = panel.labels.find((l) => l.kind === "max");
      const min = panel.labels.find((l) => l.kind === "min");
      expect(max).toMatchObject({ value: e.max, x: e.xMax });
      expect(min).toMatchObject({ value: e.min, x: e.xMin });
      expect(drawing.svg).toContain(`data-quantity="${panel.quantity}" data-kind="max" data-value="${e.max}" data-x="${e.xMax}"`);
      expect(max?.text).toBe(`max ${formatValue(e.max)} ${panel.quantity === "shear" ? "kN" : panel.quantity === "moment" ? "kN·m" : "m"} at x = ${formatValue(e.xMax)} m`);
    }
  });

  it("keeps every label and marked point inside its panel and the drawing", () => {
    for (const panel of drawing.panels) {
      for (const label of panel.labels) {
        expect(label.ty).toBeGreaterThanOrEqual(panel.frame.top);
        expect(label.ty).toBeLessThanOrEqual(panel.frame.bottom);
        expect(label.px).toBeGreaterThanOrEqual(drawing.layout.left - 0.01);
        expect(label.px).toBeLessThanOrEqual(drawing.layout.right + 0.01);
        expect(label.py).toBeGreaterThanOrEqual(panel.frame.top - 0.01);
        expect(label.py).toBeLessThanOrEqual(panel.frame.bottom + 0.01);
      }
    }
    expect(drawing.layout.width).toBe(360);
  });

  it("draws deflection downward and shear and moment upward, zero lines included", () => {
    const [shear, , deflection] = drawing.panels;
    expect(shear.frame.yPixel(1)).toBeLessThan(shear.frame.yPixel(0));
    expect(deflection.frame.yPixel(1)).toBeGreaterThan(deflection.frame.yPixel(0));
    expect(drawing.svg.match(/class="zero"/g)).toHaveLength(3);
  });

  it("sketches supports, hinges, springs and each load, distributed loads to one intensity scale", () => {
    expect(drawing.svg).toContain('class="support fixed"');
    expect(drawing.svg).toContain('class="support pin"');
    expect(drawing.svg).toContain('class="support spring"');
    expect(drawing.svg.match(/class="load point"/g)).toHaveLength(2);
    expect(drawing.svg.match(/class="load couple"/g)).toHaveLength(1);
    const bands = [...drawing.svg.matchAll(/class="load distributed"[^>]*><path d="M([\d.]+),([\d.]+) L[\d.]+,([\d.]+) L[\d.]+,([\d.]+)/g)].map((m) => ({
      base: Number(m[2]),
      h0: Number(m[2]) - Number(m[3]),
      h1: Number(m[2]) - Number(m[4]),
    }));
    expect(bands).toHaveLength(2);
    // udl 5 -> height h; linear 0..4 -> end height 4/5 h (to within the 0.1 px rounding)
    expect(bands[0].h0).toBeCloseTo(bands[0].h1, 5);
    expect(bands[1].h0).toBeCloseTo(0, 5);
    expect(bands[1].h1 / bands[0].h0).toBeCloseTo(4 / 5, 1);
  });

  it("marks a settlement beside its support, with its value, unit and case; the deflection panel reaches it", () => {
    const settled = readMember({ spans: "6 6", loads: "udl 2 D; settle 0.01 at 6 SD", supports: null, EI: [[24000]], combo: null });
    const d = drawDiagrams({ member: settled, solution: solve(settled), units, theme: "light", width: 360 });
    expect(d.svg.match(/class="load settlement" data-d="0.01"/g)).toHaveLength(1);
    expect(d.svg).toContain(`settles ${formatValue(0.01)} m SD`);
    expect(d.svg.match(/class="load distributed"/g)).toHaveLength(1);
    const lift = readMember({ spans: "6 6", loads: "settle -0.01 at 6", supports: null, EI: [[24000]], combo: null });
    expect(drawDiagrams({ member: lift, solution: solve(lift), units, theme: "light", width: 360 }).svg).toContain('class="load settlement" data-d="-0.01"');
  });

  it("leaves out deflection without EI and the dark theme changes colours", () => {
    const noEI = readMember({ spans: "6", loads: "udl 2", supports: null, EI: null, combo: null });
    const dark = drawDiagrams({ member: noEI, solution: solve(noEI), units, theme: "dark", width: 320 });
    expect(dark.panels.map((p) => p.quantity)).toEqual(["shear", "moment"]);
    expect(dark.svg).toContain(palette("dark").background);
    expect(dark.svg).not.toContain(palette("light").background);
    // a simple span's end moments are zero: only the max is labelled
    expect(dark.panels[1].labels.map((l) => l.kind)).toEqual(["max"]);
    expect(isDarkColour("#1e1e1e")).toBe(true);
    expect(isDarkColour("#ffffff")).toBe(false);
  });

  it("reads V, M, slope and deflection under the pointer", () => {
    const px = drawing.layout.x(7.2);
    const x = xAtPixel(drawing.layout, px);
    expect(x).toBeCloseTo(7.2, 10);
    const readout = readoutAt(solution, x);
    expect(readout).toEqual({
      x,
      shear: valueAt(solution, "shear", x),
      moment: valueAt(solution, "moment", x),
      slope: valueAt(solution, "slope", x),
      deflection: valueAt(solution, "deflection", x),
    });
    expect(readoutText(readout, units).map(([name]) => name)).toEqual(["x", "V", "M", "slope", "deflection"]);
    expect(xAtPixel(drawing.layout, -50)).toBe(0);
    expect(xAtPixel(drawing.layout, 5000)).toBe(13.5);
  });

  afterAll(() => {
    const dir = path.join(__dirname, "..", "..", "..", "test-artifacts");
    fs.mkdirSync(dir, { recursive: true });
    fs.writeFileSync(path.join(dir, "pane-draw-light.svg"), drawing.svg);
  });
});

describe("formatValue", () => {
  it.each([
    [0, "0"],
    [12.345678, "12.35"],
    [-0.0012346, "-0.001235"],
    [0.00001234, "1.234e-5"],
    [1234567, "1.235e+6"],
    [100, "100"],
  ])("%p -> %s", (value, text) => expect(formatValue(value)).toBe(text));
});
