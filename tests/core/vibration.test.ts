/**
 * Natural frequencies and mode shapes (src/core/vibration.ts) against closed forms and an
 * independent finite-element eigen solve (tests/core/kit/beamEigen.ts, ml-matrix).
 *
 * Closed forms, omega_n = (beta_n L)^2 sqrt(EI / (m L^4)), with beta_n L the roots of each
 * case's characteristic equation (Blevins, Formulas for Natural Frequency and Mode Shape,
 * table of single-span beams — from memory): simple span n pi; cantilever cos b cosh b = -1
 * (1.87510, 4.69409, 7.85476); fixed-fixed cos b cosh b = 1 (4.73004, 7.85320, 10.99561);
 * fixed-pinned tan b = tanh b (3.92660, 7.06858). The roots are solved here to full
 * precision by bisection of those equations (an independent computation), and the
 * recalled handbook digits are checked against them. Point masses on a massless span:
 * omega = sqrt(k / M) with the static stiffness k (3EI/L^3 at a cantilever tip, 48EI/L^3 at
 * mid-span of a simple span: handbook beam-deflection formulas, from memory).
 */
import { massesFromLoads, MAX_MODES, MAX_VIBRATION_ELEMENTS, MAX_VIBRATION_WORK, modeShape, modeValue, naturalFrequencies, spanMasses, type Member, type Support, type VibrationModel } from "../../src/core";
import { feFrequencies } from "./kit/beamEigen";
import { beam, point, udl, couple, linear, type SupportWord } from "./kit/members";

const TOL = 1e-12;

function root(f: (b: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  const fa0 = f(a);
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (a + b);
    if (f(mid) < 0 === fa0 < 0) a = mid;
    else b = mid;
  }
  return 0.5 * (a + b);
}

const cantileverRoots = [root((b) => Math.cos(b) * Math.cosh(b) + 1, 1, 3), root((b) => Math.cos(b) * Math.cosh(b) + 1, 4, 5), root((b) => Math.cos(b) * Math.cosh(b) + 1, 7, 8.5)];
const clampedRoots = [root((b) => Math.cos(b) - 1 / Math.cosh(b), 4, 5), root((b) => Math.cos(b) - 1 / Math.cosh(b), 7, 8.5), root((b) => Math.cos(b) - 1 / Math.cosh(b), 10, 12)];
const proppedRoots = [root((b) => Math.tan(b) - Math.tanh(b), 3.5, 4.5), root((b) => Math.tan(b) - Math.tanh(b), 6.5, 7.5)];

function model(spans: number[], supports: SupportWord[], EI: number | number[], mass: number | number[], extra: VibrationModel["masses"] = []): VibrationModel {
  const member: Member = beam(spans, supports, [], EI);
  return { member, masses: [...spanMasses(spans, Array.isArray(mass) ? mass : [mass]), ...extra] };
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("the characteristic roots solved here agree with the handbook digits (from memory)", () => {
  test.each([
    ["cantilever 1", cantileverRoots[0], 1.8751],
    ["cantilever 2", cantileverRoots[1], 4.69409],
    ["cantilever 3", cantileverRoots[2], 7.85476],
    ["fixed-fixed 1", clampedRoots[0], 4.73004],
    ["fixed-fixed 2", clampedRoots[1], 7.8532],
    ["fixed-fixed 3", clampedRoots[2], 10.99561],
    ["fixed-pinned 1", proppedRoots[0], 3.9266],
    ["fixed-pinned 2", proppedRoots[1], 7.06858],
  ])("%s", (_name, solved, recalled) => {
    expect(Math.abs(solved - recalled)).toBeLessThan(6e-6);
  });
});

describe("single spans: omega_n = (beta_n L)^2 sqrt(EI/(m L^4))", () => {
  const L = 7.3;
  const EI = 4.2e4;
  const m = 0.85;
  const unit = Math.sqrt(EI / (m * L ** 4));
  const cases: [string, SupportWord[], number[]][] = [
    ["simple span, n^2 scaling (Blevins, from memory)", ["pin", "pin"], [1, 2, 3, 4, 5, 6].map((n) => (n * Math.PI) ** 2)],
    ["cantilever", ["fixed", "free"], cantileverRoots.map((b) => b * b)],
    ["cantilever, free end on the left", ["free", "fixed"], cantileverRoots.map((b) => b * b)],
    ["fixed-fixed", ["fixed", "fixed"], clampedRoots.map((b) => b * b)],
    ["fixed-pinned", ["fixed", "pin"], proppedRoots.map((b) => b * b)],
  ];
  test.each(cases)("%s", (_name, supports, factors) => {
    const omega = naturalFrequencies(model([L], supports, EI, m), factors.length);
    omega.forEach((w, i) => expect(rel(w, factors[i] * unit)).toBeLessThan(TOL));
  });

  test("simple span: f1 = (pi/2) sqrt(EI/(m L^4)) in Hz", () => {
    const [omega] = naturalFrequencies(model([L], ["pin", "pin"], EI, m), 1);
    expect(rel(omega / (2 * Math.PI), (Math.PI / 2) * unit)).toBeLessThan(TOL);
  });

  test("high modes stay exact (the 50th mode of a simple span: beta = 50 pi, where cosh overflows nothing)", () => {
    const omega = naturalFrequencies(model([L], ["pin", "pin"], EI, m), MAX_MODES);
    expect(rel(omega[49], (50 * Math.PI) ** 2 * unit)).toBeLessThan(TOL);
    expect(rel(omega[30], (31 * Math.PI) ** 2 * unit)).toBeLessThan(TOL);
  });

  test("a very long fixed-fixed member: the scaled forms hold where cosh(beta L) would overflow", () => {
    const big = 2000;
    const omega = naturalFrequencies(model([big], ["fixed", "fixed"], EI, m), 3);
    const u = Math.sqrt(EI / (m * big ** 4));
    omega.forEach((w, i) => expect(rel(w, clampedRoots[i] ** 2 * u)).toBeLessThan(TOL));
  });
});

describe("scale: one member in N, m, kg and in N, mm, t (mass per length in N s^2/mm^2 = t/mm)", () => {
  test("gives one frequency", () => {
    const si = naturalFrequencies(model([6, 4], ["fixed", "pin", 5e6], [2e7, 1.2e7], [150, 90]), 3);
    const mm = naturalFrequencies(model([6000, 4000], ["fixed", "pin", 5e3], [2e13, 1.2e13], [150e-6, 90e-6]), 3);
    mm.forEach((w, i) => expect(rel(w, si[i])).toBeLessThan(1e-12));
  });
});

describe("continuous members", () => {
  const EI = 1.7e5;
  const m = 2.4;
  test("two equal spans on pins: mode 1 is the single span's, mode 2 the fixed-pinned span's (the symmetric mode has no slope at the middle)", () => {
    const L = 6;
    const u = Math.sqrt(EI / (m * L ** 4));
    const omega = naturalFrequencies(model([L, L], ["pin", "pin", "pin"], EI, m), 4);
    expect(rel(omega[0], Math.PI ** 2 * u)).toBeLessThan(TOL);
    expect(rel(omega[1], proppedRoots[0] ** 2 * u)).toBeLessThan(TOL);
    expect(rel(omega[2], (2 * Math.PI) ** 2 * u)).toBeLessThan(TOL);
    expect(rel(omega[3], proppedRoots[1] ** 2 * u)).toBeLessThan(TOL);
  });

  test("three equal spans on pins: the first frequency is again the single span's", () => {
    const L = 4.5;
    const [w1] = naturalFrequencies(model([L, L, L], ["pin", "pin", "pin", "pin"], EI, m), 1);
    expect(rel(w1, Math.PI ** 2 * Math.sqrt(EI / (m * L ** 4)))).toBeLessThan(TOL);
  });

  test("fixed-pin-fixed equal spans: mode 1 is the fixed-pinned span's, mode 2 the fixed-fixed span's (a mode with no nodal motion: only the J0 count finds it)", () => {
    const L = 5;
    const u = Math.sqrt(EI / (m * L ** 4));
    const omega = naturalFrequencies(model([L, L], ["fixed", "pin", "fixed"], EI, m), 2);
    expect(rel(omega[0], proppedRoots[0] ** 2 * u)).toBeLessThan(TOL);
    expect(rel(omega[1], clampedRoots[0] ** 2 * u)).toBeLessThan(TOL);
  });

  test("a span divided by free nodes (a mass boundary) gives the same frequencies", () => {
    const L = 8;
    const plain = naturalFrequencies(model([L], ["pin", "pin"], EI, m), 5);
    const split = naturalFrequencies(model([3, 5], ["pin", "free", "pin"], EI, m), 5);
    split.forEach((w, i) => expect(rel(w, plain[i])).toBeLessThan(TOL));
  });
});

describe("point masses on massless spans: omega = sqrt(k/M)", () => {
  const EI = 3.1e4;
  const L = 2.5;
  const M = 40;
  test("cantilever tip mass: k = 3EI/L^3", () => {
    const v: VibrationModel = { member: beam([L], ["fixed", "free"], [], EI), masses: [{ kind: "point", at: L, mass: M, row: 1 }] };
    const [w] = naturalFrequencies(v, 1);
    expect(rel(w, Math.sqrt((3 * EI) / (L ** 3 * M)))).toBeLessThan(TOL);
    expect(() => naturalFrequencies(v, 2)).toThrow(/only 1 natural frequencies/);
  });
  test("simple span, mass at mid-span: k = 48EI/L^3", () => {
    const v: VibrationModel = { member: beam([L], ["pin", "pin"], [], EI), masses: [{ kind: "point", at: L / 2, mass: M, row: 1 }] };
    const [w] = naturalFrequencies(v, 1);
    expect(rel(w, Math.sqrt((48 * EI) / (L ** 3 * M)))).toBeLessThan(TOL);
  });
});

describe("springs: between the pin and the free end", () => {
  const L = 5;
  const EI = 2e4;
  const m = 1.5;
  const u = Math.sqrt(EI / (m * L ** 4));
  test("fixed at the left, spring at the right: rises with the stiffness from the cantilever's to the fixed-pinned span's", () => {
    const ks = [1e-6, 1e-2, 1, 1e2, 1e4, 1e6, 1e9, 1e12].map((f) => (f * EI) / L ** 3);
    const w = ks.map((k) => naturalFrequencies(model([L], ["fixed", k], EI, m), 1)[0]);
    for (let i = 1; i < w.length; i++) expect(w[i]).toBeGreaterThan(w[i - 1]);
    expect(rel(w[0], cantileverRoots[0] ** 2 * u)).toBeLessThan(1e-6);
    expect(rel(w[w.length - 1], proppedRoots[0] ** 2 * u)).toBeLessThan(1e-8);
    expect(w[w.length - 1]).toBeLessThan(proppedRoots[0] ** 2 * u);
  });
});

describe("against an independent finite-element eigen solve (consistent mass, ml-matrix)", () => {
  const cases: [string, number[], SupportWord[], number[], number[], [number, number][]][] = [
    ["three spans, per-span EI and mass, an overhang", [4, 6, 2.5], ["pin", "pin", "pin", "free"], [2e4, 3.5e4, 1.2e4], [1.1, 2.3, 0.7], []],
    ["a hinge between two fixed ends", [5, 3], ["fixed", "hinge", "fixed"], [1e4, 1e4], [1, 1], []],
    ["springs and a point mass at a span end", [4, 4], [3000, 800, "fixed"], [1.5e4, 1.5e4], [1.2, 1.2], [[0, 6]]],
  ];
  test.each(cases)("%s: the finite elements converge toward the exact values", (_name, spans, words, EI, mass, points) => {
    const supports = words.map((w) => (typeof w === "number" ? ({ kind: "spring", stiffness: w } as Support) : ({ kind: w } as Support)));
    const extra: VibrationModel["masses"] = points.map(([at, pm]) => ({ kind: "point", at, mass: pm, row: 1 }));
    const exact = naturalFrequencies(model(spans, words, EI, mass, extra), 4);
    const fe = (n: number) => feFrequencies({ spans, supports, EI, mass, points }, n, 4);
    // Small meshes only: the dense eigen solve's own rounding reaches ~1e-7 beyond ~100 DOFs.
    const [f4, f8, f16] = [fe(4), fe(8), fe(16)];
    exact.forEach((w, i) => {
      const [e4, e8, e16] = [f4[i], f8[i], f16[i]].map((f) => rel(f, w));
      for (const f of [f4[i], f8[i], f16[i]]) expect(f).toBeGreaterThanOrEqual(w * (1 - 1e-9));
      // Error ~ h^4 toward these values (the observed order would drift away from 4 if the limit were another number).
      expect(Math.log2(e8 / e16)).toBeGreaterThan(3.8);
      expect(Math.log2(e8 / e16)).toBeLessThan(4.2);
      expect(e8).toBeLessThan(e4 / 10);
      expect(e16).toBeLessThan(5e-5);
      // Richardson extrapolation of the h^4 error lands on the exact value.
      expect(rel((16 * f16[i] - f8[i]) / 15, w)).toBeLessThan(2e-6);
    });
  });
});

describe("mode shapes", () => {
  const L = 6;
  const EI = 5e4;
  const m = 1.3;
  test("simple span: w = sin(n pi x / L), largest |w| 1, leftmost peak positive", () => {
    for (const n of [1, 2, 3, 7]) {
      const shape = modeShape(model([L], ["pin", "pin"], EI, m), n);
      for (const x of [0, 0.37, 1.2, 2.9, 3, 4.41, 6]) expect(Math.abs(modeValue(shape, x) - Math.sin((n * Math.PI * x) / L))).toBeLessThan(1e-9);
    }
  });
  test("cantilever mode 1: the handbook shape (cosh - cos) - s (sinh - sin), s = (sinh b - sin b)/(cosh b + cos b), scaled to 1 at the tip", () => {
    const b = cantileverRoots[0];
    const s = (Math.sinh(b) - Math.sin(b)) / (Math.cosh(b) + Math.cos(b));
    const f = (x: number) => Math.cosh((b * x) / L) - Math.cos((b * x) / L) - s * (Math.sinh((b * x) / L) - Math.sin((b * x) / L));
    const shape = modeShape(model([L], ["fixed", "free"], EI, m), 1);
    for (const x of [0, 1, 2.5, 4, 5.5, 6]) expect(Math.abs(modeValue(shape, x) - f(x) / f(L))).toBeLessThan(1e-9);
  });
  test("fixed-pin-fixed mode 2 (no nodal motion): each span in its clamped shape, symmetric", () => {
    const shape = modeShape(model([5, 5], ["fixed", "pin", "fixed"], EI, m), 2);
    expect(modeValue(shape, 2.5)).toBeCloseTo(1, 9);
    expect(Math.abs(modeValue(shape, 7.5)) - 1).toBeLessThan(1e-9);
    expect(Math.abs(modeValue(shape, 1.3) - modeValue(shape, 8.7) * Math.sign(modeValue(shape, 7.5)))).toBeLessThan(1e-9);
    expect(Math.abs(modeValue(shape, 5))).toBeLessThan(1e-9);
  });
  test("mass orthogonality of the shapes (sum of m phi_i phi_j over the member, point masses included, is 0 for i != j) on a member with a hinge, a spring, per-span EI and mass and a point mass", () => {
    const spans = [4, 5, 3];
    const masses = [...spanMasses(spans, [1.2, 0.8, 2]), { kind: "point" as const, at: 6.5, mass: 3, row: 1 }];
    const v: VibrationModel = { member: beam(spans, ["fixed", 2000, "hinge", "pin"], [], [3e4, 2e4, 4e4]), masses };
    const shapes = [1, 2, 3, 4].map((k) => modeShape(v, k));
    // Gauss-Legendre, 5 points per interval (exact for polynomials to degree 9), 100 intervals per span.
    const gx = [-0.906179845938664, -0.538469310105683, 0, 0.538469310105683, 0.906179845938664];
    const gw = [0.236926885056189, 0.478628670499366, 0.568888888888889, 0.478628670499366, 0.236926885056189];
    const inner = (a: (typeof shapes)[number], b: (typeof shapes)[number]) => {
      let sum = 3 * modeValue(a, 6.5) * modeValue(b, 6.5);
      let x0 = 0;
      spans.forEach((span, s) => {
        const m = [1.2, 0.8, 2][s];
        const h = span / 100;
        for (let i = 0; i < 100; i++) {
          const c = x0 + (i + 0.5) * h;
          gx.forEach((t, q) => (sum += ((gw[q] * h) / 2) * m * modeValue(a, c + (t * h) / 2) * modeValue(b, c + (t * h) / 2)));
        }
        x0 += span;
      });
      return sum;
    };
    for (let i = 0; i < 4; i++) {
      for (let j = i + 1; j < 4; j++) {
        const cosine = inner(shapes[i], shapes[j]) / Math.sqrt(inner(shapes[i], shapes[i]) * inner(shapes[j], shapes[j]));
        expect(Math.abs(cosine)).toBeLessThan(1e-9);
      }
    }
  });

  test("x off the member is refused", () => {
    const shape = modeShape(model([L], ["pin", "pin"], EI, m), 1);
    expect(() => modeValue(shape, 6.5)).toThrow(/outside the member/);
  });
});

describe("masses from loads and bad input", () => {
  test("loads / g: a udl of w gives m = w / g; a point load a point mass", () => {
    const g = 9.80665;
    const masses = massesFromLoads([udl(2 * g, 0, 6), point(3 * g, 2)], g);
    expect(masses).toEqual([
      { kind: "distributed", from: 0, to: 6, perLength: 2, row: 0 },
      { kind: "point", at: 2, mass: 3, row: 0 },
    ]);
  });
  test.each([
    ["a couple", () => massesFromLoads([couple(3, 2)], 9.81), /a couple carries no mass/],
    ["a varying linear load", () => massesFromLoads([linear(1, 2, 0, 3)], 9.81), /linearly varying/],
    ["g of 0", () => massesFromLoads([udl(1, 0, 3)], 0), /^g: /],
    ["no EI", () => naturalFrequencies({ member: beam([5], ["pin", "pin"], [], null), masses: spanMasses([5], [1]) }, 1), /EI/],
    ["no mass", () => naturalFrequencies(model([5], ["pin", "pin"], 1e4, 0), 1), /no mass/],
    ["a mechanism", () => naturalFrequencies(model([5], ["pin", "free"], 1e4, 1), 1), /./],
    ["too many modes", () => naturalFrequencies(model([5], ["pin", "pin"], 1e4, 1), MAX_MODES + 1), /modes: give a whole number of modes from 1 to 50/],
    ["too much work for one call", () => naturalFrequencies(model(Array.from({ length: 51 }, () => 1), Array.from({ length: 52 }, () => "pin" as const), 1e4, 1), 50), /modes: 50 modes of a member of 51 elements .* ask for at most 49 modes/],
    ["more elements than the limit: not even one mode", () => naturalFrequencies(model(Array.from({ length: 251 }, () => 1), Array.from({ length: 252 }, () => "pin" as const), 1e4, 1), 1), /modes: 1 modes of a member of 251 elements .*no call takes more than 250 elements/],
    ["EI and mass beyond double precision", () => naturalFrequencies(model([5], ["pin", "pin"], 1e-300, 1e300), 1), /cannot be computed reliably/],
    ["a huge EI and a tiny mass", () => naturalFrequencies(model([5], ["pin", "pin"], 1e300, 1e-300), 3), /cannot be computed reliably/],
    ["a negative mass", () => naturalFrequencies(model([5], ["pin", "pin"], 1e4, 0, [{ kind: "distributed", from: 0, to: 5, perLength: -1, row: 2 }]), 1), /negative/],
  ])("%s", (_name, call, message) => {
    expect(call).toThrow(message);
    try {
      call();
    } catch (e) {
      expect((e as { code: string }).code).toMatch(/^#(VALUE!|N\/A)$/);
    }
  });

  test("at the element limit: 250 elements take 10 modes (elements x modes 2,500)", () => {
    const v = model(Array.from({ length: MAX_VIBRATION_ELEMENTS }, () => 1), Array.from({ length: MAX_VIBRATION_ELEMENTS + 1 }, () => "pin" as const), 1e4, 1);
    expect(naturalFrequencies(v, MAX_VIBRATION_WORK / MAX_VIBRATION_ELEMENTS)).toHaveLength(10);
    expect(() => naturalFrequencies(v, 11)).toThrow(/ask for at most 10 modes/);
  });
});


describe("the work limit", () => {
  test("exactly at it (50 equal pinned spans x 50 modes) is solved: the lowest is the single span's first frequency, as for two equal spans above", () => {
    const L = 1;
    const [EI, m] = [1e4, 1];
    const f = naturalFrequencies(model(Array.from({ length: MAX_VIBRATION_WORK / MAX_MODES }, () => L), Array.from({ length: MAX_VIBRATION_WORK / MAX_MODES + 1 }, () => "pin" as const), EI, m), 50);
    expect(MAX_VIBRATION_WORK / MAX_MODES).toBe(50);
    // Equal pinned spans: the lowest mode is every span in its own first mode with alternating
    // signs, so it is the simple span's (closed form as in the checks above); none is lower.
    const omega1 = Math.PI ** 2 * Math.sqrt(EI / (m * L ** 4)); // 2 pi f1, f1 = (pi / 2) sqrt(EI / (m L^4))
    expect(f).toHaveLength(50);
    expect(Math.abs(f[0] - omega1) / omega1).toBeLessThan(1e-12);
    for (const w of f) expect(w).toBeGreaterThanOrEqual(omega1 * (1 - 1e-12));
  });
});
