/** Propped cantilevers, fixed-fixed spans, continuous members and hinged (Gerber) members. */
import { beam, point, udl } from "../members";
import { COEFFICIENTS, SCM, type HandbookCase } from "./case";

const sqrt = Math.sqrt;
const proppedUniformDeflection = (w: number, L: number, EI: number, x: number) =>
  (w * x * (L ** 3 - 3 * L * x * x + 2 * x ** 3)) / (48 * EI);

function proppedUniform(): HandbookCase {
  const [L, w, EI] = [8, 2.5, 3e4];
  const xPeak = (L * (1 + sqrt(33))) / 16;
  return {
    name: "propped cantilever (pin left, fixed right), uniform load",
    source: `${SCM}, case 12: beam fixed at one end, supported at other, uniformly distributed load (from memory)`,
    member: beam([L], ["pin", "fixed"], [udl(w, 0, L)], EI),
    checks: [
      { reaction: 0, force: (3 * w * L) / 8, moment: 0 },
      { reaction: 1, force: (5 * w * L) / 8, moment: (-w * L * L) / 8 },
      { quantity: "moment", at: L, value: (-w * L * L) / 8 },
      { peak: "max", quantity: "moment", value: (9 * w * L * L) / 128, x: (3 * L) / 8 },
      { peak: "min", quantity: "moment", value: (-w * L * L) / 8, x: L },
      { peak: "max", quantity: "deflection", value: proppedUniformDeflection(w, L, EI, xPeak), x: xPeak },
      { quantity: "slope", at: 0, value: (w * L ** 3) / (48 * EI) },
      { quantity: "slope", at: L, value: 0 },
    ],
  };
}

function proppedCentrePoint(): HandbookCase {
  const [L, P, EI] = [6, 16, 2e4];
  return {
    name: "propped cantilever (fixed left, pin right), point load at centre",
    source: `${SCM}, case 13: beam fixed at one end, supported at other, concentrated load at center (from memory)`,
    member: beam([L], ["fixed", "pin"], [point(P, L / 2)], EI),
    checks: [
      { reaction: 0, force: (11 * P) / 16, moment: (3 * P * L) / 16 },
      { reaction: 1, force: (5 * P) / 16 },
      { quantity: "moment", at: L / 2, value: (5 * P * L) / 32 },
      { peak: "max", quantity: "moment", value: (5 * P * L) / 32, x: L / 2 },
      { quantity: "deflection", at: L / 2, value: (7 * P * L ** 3) / (768 * EI) },
      { peak: "max", quantity: "deflection", value: (P * L ** 3) / (48 * sqrt(5) * EI), x: L * (1 - 1 / sqrt(5)) },
    ],
  };
}

function fixedUniform(): HandbookCase {
  const [L, w, EI] = [6, 4, 2e4];
  return {
    name: "fixed at both ends, uniform load",
    source: `${SCM}, case 15: beam fixed at both ends, uniformly distributed load (from memory)`,
    member: beam([L], ["fixed", "fixed"], [udl(w, 0, L)], EI),
    checks: [
      { reaction: 0, force: (w * L) / 2, moment: (w * L * L) / 12 },
      { reaction: 1, force: (w * L) / 2, moment: (-w * L * L) / 12 },
      { quantity: "moment", at: 0, value: (-w * L * L) / 12 },
      { quantity: "moment", at: L, value: (-w * L * L) / 12 },
      { peak: "max", quantity: "moment", value: (w * L * L) / 24, x: L / 2 },
      { peak: "min", quantity: "moment", value: (-w * L * L) / 12, x: 0 },
      { peak: "max", quantity: "deflection", value: (w * L ** 4) / (384 * EI), x: L / 2 },
    ],
  };
}

function fixedCentrePoint(): HandbookCase {
  const [L, P, EI] = [5, 8, 1e4];
  return {
    name: "fixed at both ends, point load at centre",
    source: `${SCM}, case 16: beam fixed at both ends, concentrated load at center (from memory)`,
    member: beam([L], ["fixed", "fixed"], [point(P, L / 2)], EI),
    checks: [
      { reaction: 0, force: P / 2, moment: (P * L) / 8 },
      { reaction: 1, force: P / 2, moment: (-P * L) / 8 },
      { quantity: "moment", at: L / 2, value: (P * L) / 8 },
      { quantity: "deflection", at: L / 2, value: (P * L ** 3) / (192 * EI) },
    ],
  };
}

function fixedOffCentrePoint(): HandbookCase {
  const [L, a, P, EI] = [10, 4, 10, 5e4];
  const b = L - a;
  return {
    name: "fixed at both ends, point load off centre",
    source: `${SCM}, case 17: beam fixed at both ends, concentrated load at any point (from memory)`,
    member: beam([L], ["fixed", "fixed"], [point(P, a)], EI),
    checks: [
      { reaction: 0, force: (P * b * b * (3 * a + b)) / L ** 3, moment: (P * a * b * b) / (L * L) },
      { reaction: 1, force: (P * a * a * (a + 3 * b)) / L ** 3, moment: (-P * a * a * b) / (L * L) },
      { quantity: "moment", at: a, value: (2 * P * a * a * b * b) / L ** 3 },
      { quantity: "deflection", at: a, value: (P * a ** 3 * b ** 3) / (3 * EI * L ** 3) },
    ],
  };
}

function twoSpanUniform(): HandbookCase {
  const [L, w, EI] = [5, 2, 1e4];
  const xPeak = (L * (1 + sqrt(33))) / 16;
  return {
    name: "two equal spans, uniform load on both",
    source: `${COEFFICIENTS}: two equal spans, uniform load — reactions 3/8, 5/4, 3/8 wL, support moment -wL²/8 (from memory), as in ${SCM}, case 32; deflection as the propped cantilever in ${SCM}, case 12`,
    member: beam([L, L], ["pin", "pin", "pin"], [udl(w, 0, 2 * L)], EI),
    checks: [
      { reaction: 0, force: (3 * w * L) / 8 },
      { reaction: 1, force: (5 * w * L) / 4 },
      { reaction: 2, force: (3 * w * L) / 8 },
      { quantity: "moment", at: L, value: (-w * L * L) / 8 },
      { quantity: "shear", at: L, value: (5 * w * L) / 8 },
      { quantity: "shear", at: L / 2, value: (3 * w * L) / 8 - (w * L) / 2 },
      { peak: "max", quantity: "moment", value: (9 * w * L * L) / 128, x: (3 * L) / 8 },
      { peak: "min", quantity: "moment", value: (-w * L * L) / 8, x: L },
      { peak: "min", quantity: "shear", value: (-5 * w * L) / 8, x: L },
      { peak: "max", quantity: "deflection", value: proppedUniformDeflection(w, L, EI, xPeak), x: xPeak },
      { quantity: "slope", at: L, value: 0 },
      { quantity: "deflection", at: L, value: 0 },
    ],
  };
}

function twoSpanUniformOnOne(): HandbookCase {
  const [L, w] = [8, 3];
  return {
    name: "two equal spans, uniform load on one span",
    source: `${SCM}, case 29: continuous beam, two equal spans, uniform load on one span (from memory)`,
    member: beam([L, L], ["pin", "pin", "pin"], [udl(w, 0, L)], 5000),
    checks: [
      { reaction: 0, force: (7 * w * L) / 16 },
      { reaction: 1, force: (5 * w * L) / 8 },
      { reaction: 2, force: (-w * L) / 16 },
      { quantity: "moment", at: L, value: (-w * L * L) / 16 },
      { quantity: "moment", at: (7 * L) / 16, value: (49 * w * L * L) / 512 },
    ],
  };
}

function twoSpanPointOnOne(): HandbookCase {
  const [L, P] = [8, 10];
  return {
    name: "two equal spans, point load at the centre of one span",
    source: `${SCM}, case 30: continuous beam, two equal spans, concentrated load at center of one span (from memory)`,
    member: beam([L, L], ["pin", "pin", "pin"], [point(P, L / 2)], 5000),
    checks: [
      { reaction: 0, force: (13 * P) / 32 },
      { reaction: 1, force: (11 * P) / 16 },
      { reaction: 2, force: (-3 * P) / 32 },
      { quantity: "moment", at: L / 2, value: (13 * P * L) / 64 },
      { quantity: "moment", at: L, value: (-3 * P * L) / 32 },
    ],
  };
}

function threeSpanUniform(): HandbookCase {
  const [L, w, EI] = [4, 3, 1.5e4];
  return {
    name: "three equal spans, uniform load on all",
    source: `${COEFFICIENTS}: three equal spans, uniform load — reactions 0.4, 1.1, 1.1, 0.4 wL, support moments -0.1 wL² (from memory); centre deflection by superposition of ${SCM} cases`,
    member: beam([L, L, L], ["pin", "pin", "pin", "pin"], [udl(w, 0, 3 * L)], EI),
    checks: [
      { reaction: 0, force: 0.4 * w * L },
      { reaction: 1, force: 1.1 * w * L },
      { reaction: 2, force: 1.1 * w * L },
      { reaction: 3, force: 0.4 * w * L },
      { quantity: "moment", at: L, value: -0.1 * w * L * L },
      { quantity: "moment", at: 2 * L, value: -0.1 * w * L * L },
      { quantity: "moment", at: 1.5 * L, value: 0.025 * w * L * L },
      { peak: "max", quantity: "moment", value: 0.08 * w * L * L, x: 0.4 * L },
      { quantity: "deflection", at: 1.5 * L, value: (w * L ** 4) / (1920 * EI) },
    ],
  };
}

function twoSpanCentrePoints(): HandbookCase {
  const [L, P] = [6, 10];
  return {
    name: "two equal spans, point load at the centre of each",
    source: `${COEFFICIENTS}: two equal spans, central point loads — reactions 5/16, 22/16, 5/16 P, support moment -3PL/16 (from memory)`,
    member: beam([L, L], ["pin", "pin", "pin"], [point(P, L / 2), point(P, 1.5 * L)]),
    checks: [
      { reaction: 0, force: (5 * P) / 16 },
      { reaction: 1, force: (22 * P) / 16 },
      { reaction: 2, force: (5 * P) / 16 },
      { quantity: "moment", at: L, value: (-3 * P * L) / 16 },
      { quantity: "moment", at: L / 2, value: (5 * P * L) / 32 },
      { peak: "max", quantity: "moment", value: (5 * P * L) / 32, x: L / 2 },
    ],
  };
}

function cantileversJoinedByHinge(): HandbookCase {
  const [L, w, EI] = [3, 2, 1e4];
  return {
    name: "two equal cantilevers joined by a hinge, uniform load (symmetric: the hinge carries no shear)",
    source: `derived by symmetry from ${SCM}: cantilever beam, uniformly distributed load (from memory)`,
    member: beam([L, L], ["fixed", "hinge", "fixed"], [udl(w, 0, 2 * L)], EI),
    checks: [
      { reaction: 0, force: w * L, moment: (w * L * L) / 2 },
      { reaction: 1, force: 0, moment: 0 },
      { reaction: 2, force: w * L, moment: (-w * L * L) / 2 },
      { quantity: "moment", at: L, value: 0 },
      { quantity: "shear", at: L, value: 0 },
      { quantity: "deflection", at: L, value: (w * L ** 4) / (8 * EI) },
      { quantity: "slope", at: 2, value: (w / (6 * EI)) * (3 * L * L * 2 - 3 * L * 2 ** 2 + 2 ** 3) },
      { quantity: "slope", at: L, value: (-w * L ** 3) / (6 * EI) },
    ],
  };
}

function unequalCantileversHingeLoad(): HandbookCase {
  const [a, b, EI1, EI2, P] = [2, 3, 1e4, 2e4, 10];
  const k1 = (3 * EI1) / a ** 3;
  const k2 = (3 * EI2) / b ** 3;
  const share = (P * k1) / (k1 + k2);
  return {
    name: "unequal cantilevers joined by a hinge, point load at the hinge",
    source: "derived from cantilever tip stiffnesses 3EI/L³ acting in parallel (from memory)",
    member: beam([a, b], ["fixed", "hinge", "fixed"], [point(P, a)], [EI1, EI2]),
    checks: [
      { reaction: 0, force: share, moment: share * a },
      { reaction: 2, force: P - share, moment: -(P - share) * b },
      { quantity: "deflection", at: a, value: P / (k1 + k2) },
      { quantity: "moment", at: a, value: 0 },
      { quantity: "moment", at: 0, value: -share * a },
    ],
  };
}

function suspendedSpan(): HandbookCase {
  const [a, L, w, EI] = [3, 8, 3, 5000];
  return {
    name: "cantilever carrying a suspended span through a hinge, uniform load on the suspended span",
    source: "derived by statics: the hinge passes the suspended span's end shear wL/2 to the cantilever tip; tip deflection as the cantilever with an end load",
    member: beam([a, L], ["fixed", "hinge", "pin"], [udl(w, a, a + L)], EI),
    checks: [
      { reaction: 0, force: (w * L) / 2, moment: ((w * L) / 2) * a },
      { reaction: 1, force: 0, moment: 0 },
      { reaction: 2, force: (w * L) / 2, moment: 0 },
      { quantity: "moment", at: a, value: 0 },
      { quantity: "moment", at: 0, value: ((-w * L) / 2) * a },
      { quantity: "moment", at: a + L / 2, value: (w * L * L) / 8 },
      { quantity: "deflection", at: a, value: (((w * L) / 2) * a ** 3) / (3 * EI) },
    ],
  };
}

function gerber(): HandbookCase {
  const w = 3;
  return {
    name: "hinged (Gerber) member: span 6 with a 2 overhang, hinge, suspended span 4; uniform load",
    source: "derived by statics: suspended simple span first, its end reaction carried on the overhang tip",
    member: beam([6, 2, 4], ["pin", "pin", "hinge", "pin"], [udl(w, 0, 12)], 1e4),
    checks: [
      { reaction: 0, force: 6 },
      { reaction: 1, force: 24 },
      { reaction: 2, force: 0 },
      { reaction: 3, force: 6 },
      { quantity: "moment", at: 6, value: -18 },
      { quantity: "moment", at: 8, value: 0 },
      { quantity: "shear", at: 8, value: 6 },
      { quantity: "moment", at: 10, value: 6 },
      { peak: "min", quantity: "moment", value: -18, x: 6 },
      { peak: "max", quantity: "moment", value: 6 },
    ],
  };
}

export const indeterminateCases: HandbookCase[] = [
  proppedUniform(),
  proppedCentrePoint(),
  fixedUniform(),
  fixedCentrePoint(),
  fixedOffCentrePoint(),
  twoSpanUniform(),
  twoSpanUniformOnOne(),
  twoSpanPointOnOne(),
  threeSpanUniform(),
  twoSpanCentrePoints(),
  cantileversJoinedByHinge(),
  unequalCantileversHingeLoad(),
  suspendedSpan(),
  gerber(),
];
