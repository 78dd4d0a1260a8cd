/**
 * The pane's drawing of natural modes (SPAN.FREQUENCIES and SPAN.MODESHAPE cells) and of
 * rotational springs (`rot K`, `pin+rot K`, `spring S rot K`), as SVG text.
 * Closed forms: a simply supported uniform beam has ω_n = (nπ/L)² √(EI/m) and the mode shape
 * sin(nπx/L) (Euler-Bernoulli beam, textbook result; e.g. the pinned-pinned case of the
 * natural-frequency tables for beams, from memory); two equal simple spans continuous over a
 * middle support have the single span's first frequency, its mode antisymmetric (one span
 * down, the other up).
 */
import { solve } from "../../../src/core";
import { readMember } from "../../../src/sheet";
import { drawDiagrams } from "../../../src/pane/draw/diagramSvg";
import { formatValue } from "../../../src/pane/draw/format";
import { drawModes, modeTitle } from "../../../src/pane/draw/modeSvg";
import { findMember, type ResolvedMember } from "../../../src/pane/memberFromSheet";
import { computeStudy } from "../../../src/pane/study";
import { MAX_DRAWN_MODES } from "../../../src/pane/vibrationStudy";
import { FakeHost } from "../support/fakeHost";

async function cell(formula: string): Promise<ResolvedMember> {
  const host = new FakeHost().put("Sheet1!A1", [[0], [1], [2], [3], [4]]).putFormula("Sheet1!C1", formula);
  host.select("Sheet1!C1");
  const found = await findMember(host, await host.getSelection());
  if (!found.ok) throw new Error(found.message);
  return found.member;
}

const [L, EI, m] = [6, 20000, 0.3];
const omega = (n: number) => ((n * Math.PI) / L) ** 2 * Math.sqrt(EI / m);

describe("mode shapes in the pane", () => {
  it("draws the first modes of a FREQUENCIES cell with the frequencies and shapes of the closed form", async () => {
    const member = await cell(`=SPAN.FREQUENCIES("${L}", ${EI}, ${m}, 3)`);
    expect(member.kind).toBe("vibration");
    const study = computeStudy(member);
    if ("error" in study || study.kind !== "vibration") throw new Error(JSON.stringify(study));
    expect(study.modes.map((c) => c.mode)).toEqual([1, 2, 3]);
    study.modes.forEach((c) => {
      expect(Math.abs(c.omega - omega(c.mode)) / omega(c.mode)).toBeLessThan(1e-9);
      expect(Math.abs(c.hz - omega(c.mode) / (2 * Math.PI)) / c.hz).toBeLessThan(1e-9);
      const worst = c.xs.reduce((w, x, i) => Math.max(w, Math.abs(c.values[i] - Math.sin((c.mode * Math.PI * x) / L))), 0);
      expect(worst).toBeLessThan(1e-9);
    });
    const figure = drawModes({ member: study.member, modes: study.modes, theme: "light", width: 360, subtitle: "modes" });
    const panels = [...figure.svg.matchAll(/<g class="panel" data-mode="(\d+)" data-hz="([^"]+)"/g)].map((p) => [Number(p[1]), Number(p[2])]);
    expect(panels).toEqual(study.modes.map((c) => [c.mode, c.hz]));
    for (const c of study.modes) expect(figure.svg).toContain(modeTitle(c));
    expect(figure.svg).toContain(formatValue(study.modes[0].hz));
    expect((figure.svg.match(/class="curve mode"/g) ?? []).length).toBe(3);
  });

  it("draws at most MAX_DRAWN_MODES of a long FREQUENCIES list, and says how many the cell lists", async () => {
    const study = computeStudy(await cell(`=SPAN.FREQUENCIES("${L}", ${EI}, ${m}, 7)`));
    if ("error" in study || study.kind !== "vibration") throw new Error("no modes");
    expect(study.modes).toHaveLength(MAX_DRAWN_MODES);
    expect(study.listed).toBe(7);
  });

  it("draws the one mode of a MODESHAPE cell: two equal spans, mode 1 at the single span's frequency, antisymmetric", async () => {
    const study = computeStudy(await cell(`=SPAN.MODESHAPE("${L} ${L}", ${EI}, ${m}, 1, A1:A5)`));
    if ("error" in study || study.kind !== "vibration") throw new Error(JSON.stringify(study));
    expect(study.modes).toHaveLength(1);
    const [mode] = study.modes;
    expect(Math.abs(mode.omega - omega(1)) / omega(1)).toBeLessThan(1e-9);
    const at = (x: number) => mode.values[mode.xs.findIndex((v) => Math.abs(v - x) < 1e-12)];
    expect(at(L / 2)).toBeCloseTo(1, 9);
    expect(at((3 * L) / 2)).toBeCloseTo(-1, 9);
  });

  it("a cell that errors is not drawn: the sheet layer's message comes back", async () => {
    const study = computeStudy(await cell(`=SPAN.MODESHAPE("${L}", ${EI}, ${m}, 0, A1:A5)`));
    expect(study).toEqual({ error: expect.stringMatching(/^#(VALUE!|N\/A) mode/) });
    const noMass = computeStudy(await cell(`=SPAN.FREQUENCIES("${L}", ${EI}, , 2)`));
    expect(noMass).toEqual({ error: expect.stringMatching(/mass/) });
  });
});

describe("rotational springs in the sketch and the moment diagram", () => {
  const member = readMember({ spans: [[5, 4]], loads: "udl 3", supports: [["pin+rot 5000", "spring 800 rot 300", "rot 2000"]], EI: [[24000]], combo: null });
  const solution = solve(member);
  const drawing = drawDiagrams({ member, solution, units: { length: "m", force: "kN", deflection: "m", deflectionFactor: 1 }, theme: "light", width: 400 });

  it("draws a coil with its stiffness at each node that has one, beside the node's other restraint", () => {
    const coils = [...drawing.svg.matchAll(/<g class="support rotational" data-k="([^"]+)">/g)].map((x) => Number(x[1]));
    expect(coils).toEqual([5000, 300, 2000]);
    expect(drawing.svg).toContain('class="support pin"');
    expect(drawing.svg).toContain('class="support spring"');
    for (const k of [5000, 300, 2000]) expect(drawing.svg).toContain(`kθ ${formatValue(k)} kN·m/rad`);
  });

  it("marks each spring's moment reaction (k·θ) on the moment diagram, as the solver gives it", () => {
    const marks = [...drawing.svg.matchAll(/<g class="spring-moment" data-node="(\d+)" data-moment="([^"]+)">/g)].map((x) => [Number(x[1]), Number(x[2])]);
    expect(marks).toEqual([1, 2, 3].map((n) => [n, solution.reactions[n - 1].moment]));
    expect(marks.every(([, moment]) => moment !== 0)).toBe(true);
  });

  it("a member without rotational springs draws no coil and no mark", () => {
    const plain = readMember({ spans: [[5, 4]], loads: "udl 3", supports: [["pin", "pin", "pin"]], EI: [[24000]], combo: null });
    const svg = drawDiagrams({ member: plain, solution: solve(plain), units: { length: "", force: "", deflection: "", deflectionFactor: 1 }, theme: "light", width: 400 }).svg;
    expect(svg).not.toContain("rotational");
    expect(svg).not.toContain("spring-moment");
  });
});
