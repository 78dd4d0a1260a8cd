/**
 * Section properties against closed forms, each with its source beside it, plus invariants:
 * an independent decomposition into rectangles (outer rectangle minus voids, where the code
 * adds flange and web rectangles), hollow = outer - inner, Z >= the smaller S, r^2 A = I,
 * scaling, and symmetric shapes' Q = Z/2.
 *
 * Sources: "Formulas for Stress and Strain" (Roark), table of properties of plane areas
 * (from memory) for the rectangle, circle, hollow circle and hollow rectangle; the I, channel
 * and tee forms are the parallel-axis theorem written out for their rectangles (mechanics of
 * materials texts, from memory); plastic moduli from the equal-area plastic axis (steel
 * design texts: Z = bh^2/4 for a rectangle, d^3/6 for a circle, from memory); shear stress
 * peaks 3V/(2A) in a rectangle, 4V/(3A) in a solid circle and 2V/A in a thin tube
 * (mechanics of materials texts, from memory).
 */
import fc from "fast-check";
import { blockProperties, sectionProperties, tolerance, type Block, type SectionProperties, type SectionShape } from "../../src/core";
import { thrown } from "./kit/errors";
import { runs } from "./kit/random";

const TOL = tolerance.HANDBOOK_TOLERANCE;

function expectProps(actual: SectionProperties, expected: Partial<SectionProperties>): void {
  for (const [key, value] of Object.entries(expected) as [keyof SectionProperties, number][]) {
    const diff = tolerance.relDiff(actual[key], value);
    if (diff > TOL) throw new Error(`${key}: got ${actual[key]}, expected ${value} (relative difference ${diff})`);
  }
}

describe("closed forms", () => {
  test("rectangle b x h (Roark, properties of plane areas, from memory)", () => {
    const b = 0.3;
    const h = 0.5;
    expectProps(sectionProperties({ shape: "rectangle", b, h }), {
      area: b * h,
      Ix: (b * h ** 3) / 12,
      Iy: (h * b ** 3) / 12,
      SxTop: (b * h * h) / 6,
      SxBottom: (b * h * h) / 6,
      SyLeft: (h * b * b) / 6,
      Zx: (b * h * h) / 4,
      Zy: (h * b * b) / 4,
      rx: h / Math.sqrt(12),
      ry: b / Math.sqrt(12),
      Qx: (b * h * h) / 8,
      tx: b,
      shearFactor: (h * h) / 8,
      xBar: b / 2,
      yBar: h / 2,
    });
  });

  test("solid circle d (Roark, from memory)", () => {
    const d = 0.25;
    expectProps(sectionProperties({ shape: "circle", d }), {
      area: (Math.PI * d * d) / 4,
      Ix: (Math.PI * d ** 4) / 64,
      Iy: (Math.PI * d ** 4) / 64,
      SxTop: (Math.PI * d ** 3) / 32,
      Zx: d ** 3 / 6,
      rx: d / 4,
      Qx: d ** 3 / 12,
      tx: d,
    });
  });

  test("hollow circle D, wall t (Roark, from memory)", () => {
    const D = 168.3;
    const t = 7.1;
    const di = D - 2 * t;
    expectProps(sectionProperties({ shape: "tube", d: D, t }), {
      area: (Math.PI * (D * D - di * di)) / 4,
      Ix: (Math.PI * (D ** 4 - di ** 4)) / 64,
      SxBottom: (Math.PI * (D ** 4 - di ** 4)) / (32 * D),
      Zx: (D ** 3 - di ** 3) / 6,
      ry: Math.sqrt(D * D + di * di) / 4,
      tx: 2 * t,
    });
  });

  test("hollow rectangle b x h, wall t (Roark, from memory)", () => {
    const [b, h, t] = [6, 10, 0.375];
    const [bi, hi] = [b - 2 * t, h - 2 * t];
    expectProps(sectionProperties({ shape: "box", b, h, t }), {
      area: b * h - bi * hi,
      Ix: (b * h ** 3 - bi * hi ** 3) / 12,
      Iy: (h * b ** 3 - hi * bi ** 3) / 12,
      SxTop: (b * h ** 3 - bi * hi ** 3) / (6 * h),
      Zx: (b * h * h - bi * hi * hi) / 4,
      Zy: (h * b * b - hi * bi * bi) / 4,
      Qx: (b * h * h - bi * hi * hi) / 8,
      tx: 2 * t,
    });
  });

  test("symmetric I (parallel axis; plastic modulus bf tf (d - tf) + tw (d - 2tf)^2/4, from memory)", () => {
    const [d, bf, tf, tw] = [400, 180, 13.5, 8.6];
    const hw = d - 2 * tf;
    const Ix = (bf * d ** 3 - (bf - tw) * hw ** 3) / 12;
    expectProps(sectionProperties({ shape: "ibeam", d, bf, tf, tw }), {
      area: 2 * bf * tf + hw * tw,
      Ix,
      Iy: (2 * tf * bf ** 3) / 12 + (hw * tw ** 3) / 12,
      SxTop: Ix / (d / 2),
      SxBottom: Ix / (d / 2),
      Zx: bf * tf * (d - tf) + (tw * hw * hw) / 4,
      Zy: (tf * bf * bf) / 2 + (hw * tw * tw) / 4,
      Qx: (bf * tf * (d - tf)) / 2 + (tw * hw * hw) / 8,
      tx: tw,
      xBar: bf / 2,
      yBar: d / 2,
    });
  });

  test("channel: Iy about its own centroid, both fibres (parallel axis about the web's back, from memory)", () => {
    const [d, bf, tf, tw] = [10, 4, 0.5, 0.2];
    const hw = d - 2 * tf;
    const area = 2 * bf * tf + hw * tw;
    const xBar = (2 * bf * tf * (bf / 2) + hw * tw * (tw / 2)) / area;
    const Iy = (2 * tf * bf ** 3) / 3 + (hw * tw ** 3) / 3 - area * xBar * xBar;
    // plastic axis: equal areas left and right; here it lies in the flanges (d tw < area / 2)
    expect(d * tw).toBeLessThan(area / 2);
    const xp = tw + (area / 2 - d * tw) / (2 * tf);
    const Zy = d * tw * (xp - tw / 2) + 2 * tf * (((xp - tw) ** 2) / 2 + ((bf - xp) ** 2) / 2);
    expectProps(sectionProperties({ shape: "channel", d, bf, tf, tw }), {
      area,
      Ix: (bf * d ** 3 - (bf - tw) * hw ** 3) / 12,
      Iy,
      SyLeft: Iy / xBar,
      SyRight: Iy / (bf - xBar),
      Zy,
      Zx: bf * tf * (d - tf) + (tw * hw * hw) / 4,
      xBar,
      yBar: d / 2,
    });
  });

  test("tee with the plastic axis in the stem (parallel axis about the stem's foot, from memory)", () => {
    const [d, bf, tf, tw] = [300, 150, 12, 10];
    const hw = d - tf;
    const area = bf * tf + hw * tw;
    const yBar = (tw * hw * (hw / 2) + bf * tf * (hw + tf / 2)) / area;
    const Ix = (tw * hw ** 3) / 3 + (bf * tf ** 3) / 12 + bf * tf * (hw + tf / 2) ** 2 - area * yBar * yBar;
    const yp = area / (2 * tw);
    expect(yp).toBeLessThan(hw);
    const Zx = (tw * yp * yp) / 2 + (tw * (hw - yp) ** 2) / 2 + bf * tf * (hw - yp + tf / 2);
    const Qx = (tw * yBar * yBar) / 2;
    expect(yBar).toBeLessThan(hw);
    expectProps(sectionProperties({ shape: "tee", d, bf, tf, tw }), {
      area,
      yBar,
      Ix,
      SxTop: Ix / (d - yBar),
      SxBottom: Ix / yBar,
      Iy: (tf * bf ** 3) / 12 + (hw * tw ** 3) / 12,
      Zx,
      Qx,
      tx: tw,
      shearFactor: Qx / tw,
    });
  });

  test("tee with the neutral axis in the flange: the largest Q/t is at the stem's top, not the axis (first principles)", () => {
    const [d, bf, tf, tw] = [6, 12, 2, 1];
    const hw = d - tf;
    const area = bf * tf + hw * tw;
    const yBar = (tw * hw * (hw / 2) + bf * tf * (hw + tf / 2)) / area;
    expect(yBar).toBeGreaterThan(hw);
    const p = sectionProperties({ shape: "tee", d, bf, tf, tw });
    expectProps(p, { Qx: (bf * (d - yBar) ** 2) / 2, tx: bf, shearFactor: (tw * hw * (yBar - hw / 2)) / tw });
    expect(p.shearFactor).toBeGreaterThan(p.Qx / p.tx);
  });

  test("shear stress peaks: 3/2 V/A rectangle, 4/3 V/A circle, 2 V/A thin tube (from memory)", () => {
    const peak = (p: SectionProperties) => (p.shearFactor / p.Ix) * p.area;
    expect(peak(sectionProperties({ shape: "rectangle", b: 2, h: 7 }))).toBeCloseTo(1.5, 12);
    expect(peak(sectionProperties({ shape: "circle", d: 3 }))).toBeCloseTo(4 / 3, 12);
    expect(peak(sectionProperties({ shape: "tube", d: 100, t: 0.01 }))).toBeCloseTo(2, 3);
  });
});

describe("independent decomposition: outer rectangle minus voids", () => {
  const rect = (x0: number, x1: number, y0: number, y1: number, sign: 1 | -1 = 1): Block => ({ x0, x1, y0, y1, sign });
  const cases: [string, SectionShape, Block[]][] = [
    ["I", { shape: "ibeam", d: 12, bf: 8, tf: 0.6, tw: 0.35 }, [rect(0, 8, 0, 12), rect(0, 3.825, 0.6, 11.4, -1), rect(4.175, 8, 0.6, 11.4, -1)]],
    ["channel", { shape: "channel", d: 9, bf: 3, tf: 0.5, tw: 0.3 }, [rect(0, 3, 0, 9), rect(0.3, 3, 0.5, 8.5, -1)]],
    ["tee", { shape: "tee", d: 8, bf: 7, tf: 1, tw: 0.5 }, [rect(0, 7, 0, 8), rect(0, 3.25, 0, 7, -1), rect(3.75, 7, 0, 7, -1)]],
    ["box", { shape: "box", b: 5, h: 9, t: 0.5 }, [rect(0, 5, 0, 9), rect(0.5, 4.5, 0.5, 8.5, -1)]],
    ["rectangle", { shape: "rectangle", b: 4, h: 3 }, [rect(0, 4, 0, 1.5), rect(0, 4, 1.5, 3)]],
  ];
  test.each(cases)("%s", (_name, shape, blocks) => {
    const a = sectionProperties(shape);
    const b = blockProperties(blocks);
    for (const key of Object.keys(a) as (keyof SectionProperties)[]) {
      if (tolerance.relDiff(a[key], b[key]) > TOL) throw new Error(`${key}: ${a[key]} by parts, ${b[key]} by voids`);
    }
  });
});

describe("invariants (fast-check, fixed seed)", () => {
  const dims = fc.record({ d: fc.double({ min: 1, max: 100, noNaN: true }), f: fc.double({ min: 0.02, max: 0.45, noNaN: true }), g: fc.double({ min: 0.02, max: 0.95, noNaN: true }), r: fc.double({ min: 0.2, max: 3, noNaN: true }) });
  const shapeOf = (kind: "ibeam" | "channel" | "tee", v: { d: number; f: number; g: number; r: number }): SectionShape => {
    const bf = v.d * v.r;
    return { shape: kind, d: v.d, bf, tf: v.f * v.d, tw: v.g * bf };
  };

  test.each(["ibeam", "channel", "tee"] as const)("%s: Z >= smaller S, r^2 A = I, Q <= Z, centroid inside, scaling", (kind) => {
    fc.assert(
      fc.property(dims, fc.double({ min: 0.1, max: 10, noNaN: true }), (v, k) => {
        const s = shapeOf(kind, v);
        const p = sectionProperties(s);
        const minSx = Math.min(p.SxTop, p.SxBottom);
        const minSy = Math.min(p.SyLeft, p.SyRight);
        if (p.Zx < minSx * (1 - TOL) || p.Zy < minSy * (1 - TOL)) return false;
        if (!tolerance.relClose(p.rx * p.rx * p.area, p.Ix, TOL) || !tolerance.relClose(p.ry * p.ry * p.area, p.Iy, TOL)) return false;
        if (p.Qx > p.Zx * (1 + TOL) || p.shearFactor * p.tx < p.Qx * (1 - TOL)) return false;
        if (!(p.yBar > 0 && p.yBar < p.depth && p.xBar > 0 && p.xBar < p.width)) return false;
        const scaled = { ...s } as Record<string, number | string>;
        for (const key of Object.keys(scaled)) if (key !== "shape") scaled[key] = (scaled[key] as number) * k;
        const q = sectionProperties(scaled as unknown as SectionShape);
        return tolerance.relClose(q.Ix, p.Ix * k ** 4, 1e-9) && tolerance.relClose(q.Zx, p.Zx * k ** 3, 1e-9) && tolerance.relClose(q.area, p.area * k * k, 1e-9);
      }),
      runs(60),
    );
  });

  test("doubly symmetric shapes: Q = Z/2, S top = S bottom, plastic axis at the centroid", () => {
    const shapes: SectionShape[] = [
      { shape: "rectangle", b: 3, h: 11 },
      { shape: "box", b: 7, h: 4, t: 0.3 },
      { shape: "ibeam", d: 21, bf: 8.3, tf: 0.835, tw: 0.515 },
      { shape: "circle", d: 2 },
      { shape: "tube", d: 2, t: 0.2 },
    ];
    for (const s of shapes) {
      const p = sectionProperties(s);
      expect(tolerance.relDiff(p.Qx, p.Zx / 2)).toBeLessThan(TOL);
      expect(tolerance.relDiff(p.SxTop, p.SxBottom)).toBeLessThan(TOL);
      expect(tolerance.relDiff(p.SyLeft, p.SyRight)).toBeLessThan(TOL);
    }
  });

  test("hollow = outer - inner (area, I, Z) for box and tube", () => {
    const box = sectionProperties({ shape: "box", b: 8, h: 12, t: 0.5 });
    const outer = sectionProperties({ shape: "rectangle", b: 8, h: 12 });
    const inner = sectionProperties({ shape: "rectangle", b: 7, h: 11 });
    for (const key of ["area", "Ix", "Iy", "Zx", "Zy", "Qx"] as const) expect(tolerance.relDiff(box[key], outer[key] - inner[key])).toBeLessThan(TOL);
    const tube = sectionProperties({ shape: "tube", d: 10, t: 1 });
    const [o, i] = [sectionProperties({ shape: "circle", d: 10 }), sectionProperties({ shape: "circle", d: 8 })];
    for (const key of ["area", "Ix", "Zx", "Qx"] as const) expect(tolerance.relDiff(tube[key], o[key] - i[key])).toBeLessThan(TOL);
  });
});

describe("dimension checks name the dimension", () => {
  const cases: [SectionShape, RegExp][] = [
    [{ shape: "rectangle", b: 0, h: 1 }, /^rectangle b: a dimension must be a positive number, got 0$/],
    [{ shape: "rectangle", b: 1, h: NaN }, /^rectangle h: a dimension must be a positive number, got NaN$/],
    [{ shape: "circle", d: -2 }, /^circle d: /],
    [{ shape: "box", b: 4, h: 10, t: 2 }, /^box t: 4 must be less than half the width b \(4\)/],
    [{ shape: "box", b: 10, h: 4, t: 2.5 }, /^box t: 5 must be less than half the width b|^box t: 5 must be less than half the depth h/],
    [{ shape: "tube", d: 4, t: 2 }, /^tube t: 4 must be less than half the diameter d/],
    [{ shape: "ibeam", d: 10, bf: 5, tf: 5, tw: 1 }, /^ibeam tf: 10 must be less than half the depth d/],
    [{ shape: "ibeam", d: 10, bf: 5, tf: 1, tw: 5 }, /^ibeam tw: 5 must be less than the flange width bf/],
    [{ shape: "channel", d: 10, bf: 5, tf: 1, tw: 6 }, /^channel tw: /],
    [{ shape: "tee", d: 10, bf: 5, tf: 10, tw: 1 }, /^tee tf: 10 must be less than the depth d/],
    [{ shape: "tee", d: 10, bf: 5, tf: 1, tw: 0 }, /^tee tw: a dimension must be a positive number/],
  ];
  test.each(cases)("%j", (shape, message) => {
    const e = thrown(() => sectionProperties(shape));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});

describe("extreme dimensions: full precision across the range, or a #VALUE! naming the property", () => {
  // Expected: b h, b h^3/12, h b^3/12 (the closed forms above); scaling by powers of two is exact.
  test.each([
    ["1e-70 x 1e-70", 1e-70, 1e-70],
    ["1e70 x 2e70", 1e70, 2e70],
    ["3e-50 x 7e-50", 3e-50, 7e-50],
  ])("rectangle %s keeps every digit", (_, b, h) => {
    const p = sectionProperties({ shape: "rectangle", b, h });
    expect(p.area).toBeCloseTo(b * h, 0);
    expect(Math.abs(p.area / (b * h) - 1)).toBeLessThan(1e-15);
    expect(Math.abs(p.Ix / ((b * h * h * h) / 12) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(p.rx / (h / Math.sqrt(12)) - 1)).toBeLessThan(1e-14);
  });

  test.each([
    ["rectangle 1e-200 1e-200 (area 1e-400 underflows)", { shape: "rectangle", b: 1e-200, h: 1e-200 }, /area \(length\^2\) is too small.*smaller unit/],
    ["rectangle 1e200 1e200 (area 1e400 overflows)", { shape: "rectangle", b: 1e200, h: 1e200 }, /area \(length\^2\) is too large.*larger unit/],
    ["rectangle 1e-100 1e-100 (Ix 1e-400 underflows)", { shape: "rectangle", b: 1e-100, h: 1e-100 }, /Ix \(length\^4\) is too small/],
    ["ibeam 1e100 ... (Ix overflows)", { shape: "ibeam", d: 1e100, bf: 5e99, tf: 1e99, tw: 5e98 }, /Ix \(length\^4\) is too large/],
  ] as [string, SectionShape, RegExp][])("%s: #VALUE! naming the property", (_, shape, message) => {
    const e = thrown(() => sectionProperties(shape));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toMatch(message);
  });
});
