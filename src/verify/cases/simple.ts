/** Simple spans: pin at both ends. Numbers are invented; formulas as cited beside each case. */
import { beam, couple, linear, point, udl } from "../members";
import { ROARK, SCM, type HandbookCase } from "./case";

const sqrt = Math.sqrt;

function uniform(): HandbookCase {
  const [L, w, EI] = [7.5, 3.2, 2.5e4];
  const defl = (x: number) => (w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * EI);
  return {
    name: "simple span, uniform load",
    source: `${SCM}, case 1: simple beam, uniformly distributed load (from memory)`,
    member: beam([L], ["pin", "pin"], [udl(w, 0, L)], EI),
    checks: [
      { reaction: 0, force: (w * L) / 2, moment: 0 },
      { reaction: 1, force: (w * L) / 2, moment: 0 },
      { quantity: "shear", at: 0, value: (w * L) / 2 },
      { quantity: "shear", at: L, value: (-w * L) / 2 },
      { quantity: "moment", at: L / 3, value: (w * (L / 3) * (L - L / 3)) / 2 },
      { peak: "max", quantity: "moment", value: (w * L * L) / 8, x: L / 2 },
      { peak: "max", quantity: "shear", value: (w * L) / 2, x: 0 },
      { peak: "min", quantity: "shear", value: (-w * L) / 2, x: L },
      { peak: "max", quantity: "deflection", value: (5 * w * L ** 4) / (384 * EI), x: L / 2 },
      { quantity: "deflection", at: L / 4, value: defl(L / 4) },
      { quantity: "slope", at: 0, value: (w * L ** 3) / (24 * EI) },
      { quantity: "slope", at: L, value: (-w * L ** 3) / (24 * EI) },
      { quantity: "slope", at: L / 2, value: 0 },
    ],
  };
}

function centrePoint(): HandbookCase {
  const [L, P, EI] = [6, 10, 1.8e4];
  return {
    name: "simple span, point load at centre",
    source: `${SCM}, case 7: simple beam, concentrated load at center (from memory)`,
    member: beam([L], ["pin", "pin"], [point(P, L / 2)], EI),
    checks: [
      { reaction: 0, force: P / 2 },
      { reaction: 1, force: P / 2 },
      { quantity: "shear", at: L / 2 - 0.5, value: P / 2 },
      { quantity: "shear", at: L / 2, value: -P / 2 },
      { quantity: "moment", at: L / 2, value: (P * L) / 4 },
      { peak: "max", quantity: "moment", value: (P * L) / 4, x: L / 2 },
      { peak: "min", quantity: "shear", value: -P / 2, x: L / 2 },
      { peak: "max", quantity: "deflection", value: (P * L ** 3) / (48 * EI), x: L / 2 },
      { quantity: "slope", at: 0, value: (P * L * L) / (16 * EI) },
      { quantity: "deflection", at: L / 4, value: ((P * (L / 4)) / (48 * EI)) * (3 * L * L - 4 * (L / 4) ** 2) },
    ],
  };
}

function offCentrePoint(): HandbookCase {
  const [L, P, a, EI] = [8, 9, 5, 3e4];
  const b = L - a;
  const xPeak = sqrt((a * (a + 2 * b)) / 3);
  return {
    name: "simple span, point load off centre (a > b)",
    source: `${SCM}, case 8: simple beam, concentrated load at any point (from memory)`,
    member: beam([L], ["pin", "pin"], [point(P, a)], EI),
    checks: [
      { reaction: 0, force: (P * b) / L },
      { reaction: 1, force: (P * a) / L },
      { quantity: "moment", at: a, value: (P * a * b) / L },
      { peak: "max", quantity: "moment", value: (P * a * b) / L, x: a },
      { quantity: "deflection", at: a, value: (P * a * a * b * b) / (3 * EI * L) },
      { peak: "max", quantity: "deflection", value: (P * a * b * (a + 2 * b) * sqrt(3 * a * (a + 2 * b))) / (27 * EI * L), x: xPeak },
      { quantity: "slope", at: 0, value: (P * b * (L * L - b * b)) / (6 * EI * L) },
      { quantity: "slope", at: L, value: (-P * a * (L * L - a * a)) / (6 * EI * L) },
      { quantity: "slope", at: xPeak, value: 0 },
      { quantity: "deflection", at: 1, value: ((P * b * 1) / (6 * EI * L)) * (L * L - b * b - 1) },
    ],
  };
}

function partialUniform(): HandbookCase {
  const [L, w, a, b] = [10, 4, 2, 4];
  const c = L - a - b;
  const R1 = (w * b * (2 * c + b)) / (2 * L);
  return {
    name: "simple span, uniform load over part of the span",
    source: `${SCM}, case 4: simple beam, uniform load partially distributed (from memory)`,
    member: beam([L], ["pin", "pin"], [udl(w, a, a + b)]),
    checks: [
      { reaction: 0, force: R1 },
      { reaction: 1, force: (w * b * (2 * a + b)) / (2 * L) },
      { quantity: "shear", at: a / 2, value: R1 },
      { quantity: "shear", at: a + 1, value: R1 - w },
      { quantity: "moment", at: a, value: R1 * a },
      { peak: "max", quantity: "moment", value: R1 * (a + R1 / (2 * w)), x: a + R1 / w },
    ],
  };
}

function triangular(): HandbookCase {
  const [L, w0, EI] = [9, 6, 4e4];
  const W = (w0 * L) / 2;
  const defl = (x: number) => (W * x * (3 * x ** 4 - 10 * L * L * x * x + 7 * L ** 4)) / (180 * EI * L * L);
  const xPeak = L * sqrt(1 - sqrt(8 / 15));
  return {
    name: "simple span, load increasing uniformly to the right end",
    source: `${SCM}, case 2: simple beam, load increasing uniformly to one end (from memory)`,
    member: beam([L], ["pin", "pin"], [linear(0, w0, 0, L)], EI),
    checks: [
      { reaction: 0, force: W / 3 },
      { reaction: 1, force: (2 * W) / 3 },
      { quantity: "shear", at: L / 2, value: W / 3 - W / 4 },
      { quantity: "moment", at: L / 3, value: (W * (L / 3) * (L * L - (L / 3) ** 2)) / (3 * L * L) },
      { peak: "max", quantity: "moment", value: (2 * W * L) / (9 * sqrt(3)), x: L / sqrt(3) },
      { quantity: "deflection", at: L / 3, value: defl(L / 3) },
      { peak: "max", quantity: "deflection", value: defl(xPeak), x: xPeak },
      { quantity: "slope", at: 0, value: (7 * W * L * L) / (180 * EI) },
      { quantity: "slope", at: L, value: (-2 * W * L * L) / (45 * EI) },
    ],
  };
}

function coupleAtEnd(): HandbookCase {
  const [L, C, EI] = [5, 8, 1e4];
  return {
    name: "simple span, clockwise couple at the left end",
    source: `${ROARK}: simply supported beam, end couple (from memory)`,
    member: beam([L], ["pin", "pin"], [couple(C, 0)], EI),
    checks: [
      { reaction: 0, force: -C / L },
      { reaction: 1, force: C / L },
      { quantity: "moment", at: 0, value: C },
      { quantity: "moment", at: L / 4, value: C * 0.75 },
      { quantity: "shear", at: L / 2, value: -C / L },
      { peak: "max", quantity: "moment", value: C, x: 0 },
      { quantity: "slope", at: 0, value: (C * L) / (3 * EI) },
      { quantity: "slope", at: L, value: (-C * L) / (6 * EI) },
      { peak: "max", quantity: "deflection", value: (C * L * L) / (9 * sqrt(3) * EI), x: L * (1 - 1 / sqrt(3)) },
    ],
  };
}

function coupleAtCentre(): HandbookCase {
  const [L, C, EI] = [6, 9, 2e4];
  return {
    name: "simple span, clockwise couple at midspan",
    source: `${ROARK}: simply supported beam, intermediate couple; slopes derived from the end-couple case by antisymmetry (from memory)`,
    member: beam([L], ["pin", "pin"], [couple(C, L / 2)], EI),
    checks: [
      { reaction: 0, force: -C / L },
      { reaction: 1, force: C / L },
      { quantity: "moment", at: L / 4, value: -C / 4 },
      { quantity: "moment", at: L / 2, value: C / 2 },
      { peak: "max", quantity: "moment", value: C / 2, x: L / 2 },
      { peak: "min", quantity: "moment", value: -C / 2, x: L / 2 },
      { quantity: "deflection", at: L / 2, value: 0 },
      { quantity: "slope", at: L / 2, value: (C * L) / (12 * EI) },
      { quantity: "slope", at: 0, value: (-C * L) / (24 * EI) },
    ],
  };
}

function triangleToCentre(): HandbookCase {
  const [L, w, EI] = [8, 3, 5000];
  const W = (w * L) / 2;
  return {
    name: "simple span, load increasing uniformly to the centre",
    source: `${SCM}, case 3: simple beam, load increasing uniformly to center (from memory)`,
    member: beam([L], ["pin", "pin"], [linear(0, w, 0, L / 2), linear(w, 0, L / 2, L)], EI),
    checks: [
      { reaction: 0, force: W / 2 },
      { reaction: 1, force: W / 2 },
      { quantity: "moment", at: L / 2, value: (W * L) / 6 },
      { quantity: "deflection", at: L / 2, value: (W * L ** 3) / (60 * EI) },
    ],
  };
}

function coupleOffCentre(): HandbookCase {
  const [L, C, a] = [8, 12, 3];
  return {
    name: "simple span, clockwise couple off centre",
    source: `${ROARK}: simply supported beam, intermediate couple (from memory)`,
    member: beam([L], ["pin", "pin"], [couple(C, a)], 5000),
    checks: [
      { reaction: 0, force: -C / L },
      { reaction: 1, force: C / L },
      { quantity: "moment", at: a - 1, value: (-C * (a - 1)) / L },
      { quantity: "moment", at: a, value: (C * (L - a)) / L },
      { quantity: "shear", at: a, value: -C / L },
    ],
  };
}

function springSupport(): HandbookCase {
  const [L, P, EI, k] = [8, 10, 5000, 400];
  return {
    name: "simple span on a pin and a spring, point load at centre",
    source: "derived by hand: reactions by statics; centre deflection PL³/48EI plus half the spring's settlement (P/2)/k",
    member: beam([L], ["pin", k], [point(P, L / 2)], EI),
    checks: [
      { reaction: 0, force: P / 2 },
      { reaction: 1, force: P / 2 },
      { quantity: "deflection", at: L, value: P / 2 / k },
      { quantity: "deflection", at: L / 2, value: (P * L ** 3) / (48 * EI) + P / 2 / k / 2 },
      { quantity: "moment", at: L / 2, value: (P * L) / 4 },
    ],
  };
}

export const simpleCases: HandbookCase[] = [uniform(), centrePoint(), offCentrePoint(), partialUniform(), triangular(), coupleAtEnd(), coupleAtCentre(), triangleToCentre(), coupleOffCentre(), springSupport()];
