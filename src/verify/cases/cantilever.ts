/** Cantilevers and overhangs. Numbers are invented; formulas as cited beside each case. */
import { beam, couple, linear, point, udl } from "../members";
import { SCM, type HandbookCase } from "./case";

const sqrt = Math.sqrt;

function uniform(): HandbookCase {
  const [L, w, EI] = [4, 5, 1.2e4];
  return {
    name: "cantilever, uniform load (fixed at the left end)",
    source: `${SCM}, case 19: cantilever beam, uniformly distributed load (from memory)`,
    member: beam([L], ["fixed", "free"], [udl(w, 0, L)], EI),
    checks: [
      { reaction: 0, force: w * L, moment: (w * L * L) / 2 },
      { reaction: 1, force: 0, moment: 0 },
      { quantity: "shear", at: 0, value: w * L },
      { quantity: "shear", at: L, value: 0 },
      { quantity: "moment", at: 0, value: (-w * L * L) / 2 },
      { quantity: "moment", at: L / 2, value: (-w * L * L) / 8 },
      { peak: "min", quantity: "moment", value: (-w * L * L) / 2, x: 0 },
      { quantity: "deflection", at: L, value: (w * L ** 4) / (8 * EI) },
      { peak: "max", quantity: "deflection", value: (w * L ** 4) / (8 * EI), x: L },
      { quantity: "slope", at: L, value: (w * L ** 3) / (6 * EI) },
      { quantity: "slope", at: 0, value: 0 },
      { quantity: "deflection", at: 0, value: 0 },
    ],
  };
}

function tipPoint(): HandbookCase {
  const [L, P, EI] = [3.5, 7, 9e3];
  const x = 1.25;
  return {
    name: "cantilever, point load at the free end",
    source: `${SCM}, case 22: cantilever beam, concentrated load at free end (from memory)`,
    member: beam([L], ["fixed", "free"], [point(P, L)], EI),
    checks: [
      { reaction: 0, force: P, moment: P * L },
      { quantity: "moment", at: 0, value: -P * L },
      { quantity: "shear", at: L / 2, value: P },
      { quantity: "shear", at: L, value: P },
      { quantity: "deflection", at: L, value: (P * L ** 3) / (3 * EI) },
      { quantity: "slope", at: L, value: (P * L * L) / (2 * EI) },
      { quantity: "deflection", at: x, value: (P * x * x * (3 * L - x)) / (6 * EI) },
    ],
  };
}

function tipPointFixedRight(): HandbookCase {
  const [L, P, EI] = [8, 10, 5000];
  return {
    name: "cantilever fixed at the right end, point load at the free left end",
    source: `${SCM}, case 22: cantilever beam, concentrated load at free end, mirrored (from memory)`,
    member: beam([L], ["free", "fixed"], [point(P, 0)], EI),
    checks: [
      { reaction: 0, force: 0, moment: 0 },
      { reaction: 1, force: P, moment: -P * L },
      { quantity: "shear", at: 0, value: -P },
      { quantity: "moment", at: L, value: -P * L },
      { quantity: "deflection", at: 0, value: (P * L ** 3) / (3 * EI) },
      { quantity: "slope", at: 0, value: (-P * L * L) / (2 * EI) },
    ],
  };
}

function tipCouple(): HandbookCase {
  const [L, C, EI] = [4, 6, 8e3];
  return {
    name: "cantilever, clockwise couple at the free end",
    source: `${SCM}: cantilever beam, couple at free end — constant moment, circular arc (from memory)`,
    member: beam([L], ["fixed", "free"], [couple(C, L)], EI),
    checks: [
      { reaction: 0, force: 0, moment: C },
      { quantity: "moment", at: 0, value: -C },
      { quantity: "moment", at: L, value: -C },
      { quantity: "shear", at: L / 2, value: 0 },
      { quantity: "deflection", at: L, value: (C * L * L) / (2 * EI) },
      { quantity: "slope", at: L, value: (C * L) / EI },
    ],
  };
}

function triangleToFixedEnd(): HandbookCase {
  const [L, w0, EI] = [5, 6, 1.5e4];
  const W = (w0 * L) / 2;
  return {
    name: "cantilever, load increasing uniformly to the fixed end",
    source: `${SCM}, case 18: cantilever beam, load increasing uniformly to fixed end (from memory)`,
    member: beam([L], ["fixed", "free"], [linear(w0, 0, 0, L)], EI),
    checks: [
      { reaction: 0, force: W, moment: (W * L) / 3 },
      { quantity: "moment", at: 0, value: (-W * L) / 3 },
      { quantity: "deflection", at: L, value: (W * L ** 3) / (15 * EI) },
      { quantity: "slope", at: L, value: (W * L * L) / (12 * EI) },
    ],
  };
}

function triangleToFreeEnd(): HandbookCase {
  const [L, w0, EI] = [5, 6, 1.5e4];
  const W = (w0 * L) / 2;
  return {
    name: "cantilever, load increasing uniformly to the free end",
    source: "derived by integrating the load twice (from memory), checked against the resultant at 2L/3",
    member: beam([L], ["fixed", "free"], [linear(0, w0, 0, L)], EI),
    checks: [
      { reaction: 0, force: W, moment: (2 * W * L) / 3 },
      { quantity: "deflection", at: L, value: (11 * w0 * L ** 4) / (120 * EI) },
      { quantity: "slope", at: L, value: (w0 * L ** 3) / (8 * EI) },
    ],
  };
}

function overhangUniform(): HandbookCase {
  const [L, a, w, EI] = [6, 2, 3, 2e4];
  const R1 = (w * (L * L - a * a)) / (2 * L);
  return {
    name: "beam overhanging one support, uniform load over the whole length",
    source: `${SCM}: beam overhanging one support, uniformly distributed load (from memory)`,
    member: beam([L, a], ["pin", "pin", "free"], [udl(w, 0, L + a)], EI),
    checks: [
      { reaction: 0, force: R1 },
      { reaction: 1, force: (w * (L + a) ** 2) / (2 * L) },
      { reaction: 2, force: 0 },
      { quantity: "moment", at: L, value: (-w * a * a) / 2 },
      { quantity: "shear", at: L, value: w * a },
      { peak: "max", quantity: "moment", value: (w * (L + a) ** 2 * (L - a) ** 2) / (8 * L * L), x: (L / 2) * (1 - (a * a) / (L * L)) },
      { peak: "min", quantity: "moment", value: (-w * a * a) / 2, x: L },
      { quantity: "deflection", at: L + a, value: (w * a * (4 * a * a * L - L ** 3 + 3 * a ** 3)) / (24 * EI) },
    ],
  };
}

function overhangTipPoint(): HandbookCase {
  const [L, a, P, EI] = [5, 1.5, 4, 1e4];
  return {
    name: "beam overhanging one support, point load at the end of the overhang",
    source: `${SCM}, case 26: beam overhanging one support, concentrated load at end of overhang (from memory)`,
    member: beam([L, a], ["pin", "pin", "free"], [point(P, L + a)], EI),
    checks: [
      { reaction: 0, force: (-P * a) / L },
      { reaction: 1, force: (P * (L + a)) / L },
      { quantity: "moment", at: L, value: -P * a },
      { quantity: "shear", at: L + a, value: P },
      { peak: "min", quantity: "moment", value: -P * a, x: L },
      { quantity: "deflection", at: L + a, value: (P * a * a * (L + a)) / (3 * EI) },
      { peak: "max", quantity: "deflection", value: (P * a * a * (L + a)) / (3 * EI), x: L + a },
      { peak: "min", quantity: "deflection", value: (-P * a * L * L) / (9 * sqrt(3) * EI), x: L / sqrt(3) },
    ],
  };
}

function springTip(): HandbookCase {
  const [L, P, EI, k] = [3, 12, 9000, 2000];
  const kBeam = (3 * EI) / L ** 3;
  const tip = P / (k + kBeam);
  return {
    name: "cantilever propped by a spring at the tip, tip load",
    source: "derived from the cantilever tip stiffness 3EI/L³ in parallel with the spring (from memory)",
    member: beam([L], ["fixed", k], [point(P, L)], EI),
    checks: [
      { reaction: 1, force: k * tip, moment: 0 },
      { reaction: 0, force: P - k * tip, moment: (P - k * tip) * L },
      { quantity: "deflection", at: L, value: tip },
      { quantity: "moment", at: 0, value: -(P - k * tip) * L },
    ],
  };
}

function steppedTipPoint(): HandbookCase {
  const [a, b, EI1, EI2, P] = [2, 3, 4e4, 1e4, 5];
  const L = a + b;
  return {
    name: "stepped cantilever (stiffer root span), tip load",
    source: "derived by the unit-load method over the two stiffnesses (from memory)",
    member: beam([a, b], ["fixed", "free", "free"], [point(P, L)], [EI1, EI2]),
    checks: [
      { reaction: 0, force: P, moment: P * L },
      { quantity: "deflection", at: L, value: (P * (L ** 3 - b ** 3)) / (3 * EI1) + (P * b ** 3) / (3 * EI2) },
      { quantity: "slope", at: L, value: (P * (L * L - b * b)) / (2 * EI1) + (P * b * b) / (2 * EI2) },
      { quantity: "slope", at: a, value: (P * (L * L - b * b)) / (2 * EI1) },
    ],
  };
}

export const cantileverCases: HandbookCase[] = [
  uniform(),
  tipPoint(),
  tipPointFixedRight(),
  tipCouple(),
  triangleToFixedEnd(),
  triangleToFreeEnd(),
  overhangUniform(),
  overhangTipPoint(),
  springTip(),
  steppedTipPoint(),
];
