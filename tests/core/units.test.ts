/**
 * The structural units table. Outside values: NIST Special Publication 811 (2008 edition),
 * Appendix B (from memory): 1 ft = 0.3048 m, 1 in = 0.0254 m (exact); 1 lbf = 4.448 222 N
 * (exact value 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N); 1 kip = 1000 lbf;
 * 1 psi = 6.894 757 kPa; 1 ksi = 6.894 757 MPa; 1 psf = 47.880 26 Pa (all from the same
 * appendix, from memory, quoted to the digits given there).
 */
import { convert, DIMENSIONS, dimensionName, parseUnit, parseUnitOf, tolerance, type DimensionName } from "../../src/core";
import { thrown } from "./kit/errors";

const SI = (text: string) => parseUnit(text, "unit");
const factorOf = (text: string) => SI(text).factor;

describe("factors to SI, each against NIST SP 811 Appendix B (from memory)", () => {
  const cases: [string, number, number][] = [
    // unit, SI value, relative tolerance (exact factors at rounding; SP 811's 7-digit ones at 1e-6)
    ["ft", 0.3048, 1e-15],
    ["in", 0.0254, 1e-15],
    ["lbf", 4.4482216152605, 1e-15],
    ["kip", 4448.2216152605, 1e-15],
    ["psi", 6894.757, 1e-6],
    ["ksi", 6.894757e6, 1e-6],
    ["psf", 47.88026, 1e-6],
    ["kip/ft", 14593.90, 1e-6], // SP 811 lists lbf/ft = 14.593 90 N/m (from memory)
    ["lbf*ft", 1.355818, 1e-6], // SP 811: lbf·ft = 1.355 818 N·m (from memory)
    ["lbf*in", 0.1129848, 1e-6], // SP 811: lbf·in = 1.129 848 E-01 N·m (from memory)
    ["in^4", 4.162314e-7, 1e-6], // SP 811: in^4 = 4.162 314 E-07 m^4 (from memory)
    ["in^3", 1.6387064e-5, 1e-15], // 0.0254^3 exactly
  ];
  test.each(cases)("%s = %d SI", (unit, si, rel) => {
    expect(tolerance.relDiff(factorOf(unit), si)).toBeLessThanOrEqual(rel);
  });

  test("SI prefixes are powers of ten", () => {
    expect(factorOf("mm")).toBe(1e-3);
    expect(factorOf("kN")).toBe(1e3);
    expect(factorOf("MPa")).toBe(1e6);
    expect(factorOf("GPa")).toBe(1e9);
    expect(tolerance.relDiff(factorOf("N/mm^2"), factorOf("MPa"))).toBeLessThan(1e-15);
    expect(tolerance.relDiff(factorOf("kN/mm^2"), factorOf("GPa"))).toBeLessThan(1e-15);
  });
});

describe("spellings of one unit agree", () => {
  const groups: string[][] = [
    ["kip*ft", "kip-ft", "kip.ft", "kip·ft", "ft*kip", "ft-kip", "KIP-FT", "kips*ft"],
    ["kN*m^2", "kN*m2", "kN·m²", "kN.m^2", "m^2*kN", "kN*m*m"],
    ["kip/ft", "klf", "kip*ft^-1", "kip/ft^1", "kip*ft⁻¹"],
    ["lbf/ft", "plf", "lb/ft"],
    ["mm^4", "mm4", "mm⁴", "mm*mm*mm*mm", "MM^4"],
    ["ksi", "kip/in^2", "kip/in/in", "kip/in2"],
    ["kN/m", "N/mm"],
  ];
  test.each(groups)("%s and the rest of its group", (...spellings) => {
    const first = SI(spellings[0]);
    for (const text of spellings.slice(1)) {
      const unit = SI(text);
      expect(unit.dimension).toEqual(first.dimension);
      expect(tolerance.relDiff(unit.factor, first.factor)).toBeLessThan(1e-14);
    }
  });
});

describe("dimensions", () => {
  const cases: [string, DimensionName][] = [
    ["ft", "length"],
    ["kip", "force"],
    ["kN/m", "force/length"],
    ["kip*in", "force x length"],
    ["ksi", "force/length^2"],
    ["in^2", "length^2"],
    ["mm^3", "length^3"],
    ["cm^4", "length^4"],
    ["kip*in^2", "force x length^2"],
    ["N*mm^2", "force x length^2"],
    ["GPa*m^4", "force x length^2"],
    ["ksi*in^4", "force x length^2"],
  ];
  test.each(cases)("%s measures %s", (text, name) => {
    expect(SI(text).dimension).toEqual(DIMENSIONS[name]);
    expect(parseUnitOf(text, name, "arg").text).toBe(text);
    expect(dimensionName(SI(text).dimension)).toBe(name);
  });

  test("a unit of the wrong quantity is an error naming the argument and both quantities", () => {
    const e = thrown(() => parseUnitOf("kip", "length", "spans unit"));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(/^spans unit: "kip" measures force, not length$/);
    expect(thrown(() => parseUnitOf("kN*m", "force x length^2", "EI unit")).message).toMatch(/EI unit: "kN\*m" measures force x length, not force x length\^2/);
  });

  test("unnamed dimensions still read plainly", () => {
    expect(dimensionName([-3, 1])).toBe("force/length^3");
    expect(dimensionName([0, 0])).toBe("a pure number");
    expect(dimensionName([1, -1])).toBe("length/force");
  });
});

describe("conversion", () => {
  test("round trip and known values (NIST SP 811, from memory)", () => {
    expect(convert(1, SI("ft"), SI("in"))).toBeCloseTo(12, 12);
    expect(convert(1, SI("kip/ft"), SI("kN/m"))).toBeCloseTo(14.5939, 4);
    expect(convert(29000, SI("ksi"), SI("GPa"))).toBeCloseTo(199.948, 3);
    const there = convert(123.456, SI("kip*ft^2"), SI("kN*m^2"));
    expect(tolerance.relDiff(convert(there, SI("kN*m^2"), SI("kip*ft^2")), 123.456)).toBeLessThan(1e-14);
  });

  test("unlike dimensions do not convert", () => {
    expect(thrown(() => convert(1, SI("kip"), SI("ft"))).message).toMatch(/cannot convert force \("kip"\) to length \("ft"\)/);
  });
});

describe("bad unit text names the argument", () => {
  const cases: [string, RegExp][] = [
    ["", /unit: the unit is blank/],
    ["furlong", /unit: unknown unit "furlong"/],
    ["kN m", /unit: cannot read the unit "kN m" at " m"/],
    ["kN+m", /unit: cannot read the unit/],
    ["(kN)", /unit: cannot read the unit/],
    ["m^0", /unit: the power in "m\^0" must be a whole number other than 0/],
    ["kN/", /unit: cannot read the unit/],
    ["2 m", /unit: cannot read the unit/],
  ];
  test.each(cases)("%j", (text, message) => {
    const e = thrown(() => parseUnit(text, "unit"));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});
