/**
 * The diagram pane's page logic: follows the host's selection (debounced, asynchronous, so
 * typing is never held up), finds and solves the member, draws it, shows the readout under the
 * pointer, and writes the table and charts into the sheet on request. All host access goes
 * through SheetHost; all drawing is the pure draw/ code.
 */
import { debounce } from "./debounce";
import { drawDiagrams, type Drawing } from "./draw/diagramSvg";
import { escapeXml, formatValue } from "./draw/format";
import { drawEnvelope, drawInfluence, drawMoving, type Figure } from "./draw/studySvg";
import { drawModes } from "./draw/modeSvg";
import { computeStudy, envelopeAt, influenceAt, type Study } from "./study";
import type { Theme } from "./draw/palette";
import { readoutAt, readoutText, xAtPixel } from "./draw/readout";
import { MEMBER_ARGUMENTS, classifyArgument, type MemberArgument } from "./formulaRefs";
import { qualify, type SheetHost } from "./host";
import { findMember, resolveSources, solveMember, type MemberSources, type ResolvedMember, type Solved } from "./memberFromSheet";
import { blockText } from "./addresses";
import { cellMessage } from "./cellMessage";
import { chartRequests, diagramRows, planTable, tableInPlace, writeTable } from "./writeBack";
import { DEFAULT_POINTS, describeError } from "../sheet";
import { NO_UNITS, type Units } from "./units";
import { REPORT_HTML, ReportPanel } from "./reportPanel";

import { CAUTION } from "./caution";

export { CAUTION };

export interface PaneElements {
  root: HTMLElement;
}

const FORMULA_COMBO = "(formula)";

function el<T extends HTMLElement>(root: HTMLElement, selector: string): T {
  const found = root.querySelector(selector);
  if (!found) throw new Error(`the pane lacks ${selector}`);
  return found as T;
}

export const PANE_HTML = `
<div class="pane-head"><strong>Spanwise diagrams</strong> <span class="host-kind"></span></div>
<p class="caution">${escapeXml(CAUTION)}</p>
<p class="source" aria-live="polite">Select a cell holding a SPAN formula.</p>
<p class="message" role="status" hidden></p>
<p class="outcome" role="status" hidden></p>
<form class="pick" hidden>
  <p>Pick the member's input ranges (select a range in the sheet, then press its "use selection"):</p>
  ${MEMBER_ARGUMENTS.map((name) => `<label><span>${name}</span><input name="${name}" spellcheck="false" autocomplete="off"/><button type="button" data-use="${name}">use selection</button></label>`).join("")}
  <button type="submit" class="draw-picked">Draw</button>
</form>
<div class="controls" hidden>
  <label class="combo" hidden><span>Combination</span><select></select><input class="combo-text" spellcheck="false" autocomplete="off" aria-label="combination"/></label>
  <span class="units-note"></span>
</div>
<div class="figure"></div>
<div class="readout" aria-live="off"></div>
<div class="actions" hidden>
  <button type="button" class="write-table">Write diagram table</button>
  <button type="button" class="insert-charts">Insert charts</button>
  <span class="study-note" hidden>The cell's own result is its table: the pane writes diagram tables for cells of one member under one combination.</span>
  <button type="button" class="export-svg">Export SVG</button>
  <button type="button" class="export-png">Export PNG</button>
</div>
<div class="report-area" hidden>${REPORT_HTML}</div>
<div class="confirm" role="alertdialog" hidden><p></p><button type="button" class="confirm-yes">Write anyway</button> <button type="button" class="confirm-no">Cancel</button></div>
`;

export class Pane {
  private generation = 0;
  private resolved: ResolvedMember | undefined;
  private solved: Solved | undefined;
  private drawing: Drawing | Figure | undefined;
  private study: Study | undefined;
  private pendingConfirm: ((ok: boolean) => void) | undefined;
  /** The selected cell ("Sheet!A1") at the last refresh, and where the shown outcome was made. */
  private selectedAt: string | undefined;
  private outcomeAt: string | undefined;
  private readonly follow = debounce(() => void this.refresh(), 180);
  private unsubscribe: (() => void) | undefined;
  /** Milliseconds the last redraw took (solve, diagram, SVG, into the page). */
  lastDrawMs = 0;
  /** The formula text of the drawn cell (for its report). */
  private formulaText = "";
  readonly report: ReportPanel;

  constructor(
    private readonly host: SheetHost,
    private readonly root: HTMLElement,
    private readonly themeOf: () => Theme,
  ) {
    root.classList.add("spanwise-pane");
    root.innerHTML = PANE_HTML;
    el(root, ".host-kind").textContent = `(${host.kind})`;
    this.report = new ReportPanel(
      host,
      root,
      () => (this.resolved ? { member: this.resolved, formula: this.resolved.call ? this.formulaText : "(input ranges picked in the pane)" } : undefined),
      (text, kind) => this.outcome(text, kind),
      download,
    );
    this.bind();
  }

  start(): void {
    this.unsubscribe = this.host.onSelectionChange(() => this.follow());
    void this.refresh();
  }

  stop(): void {
    this.unsubscribe?.();
    this.follow.cancel();
  }

  get member(): ResolvedMember | undefined {
    return this.resolved;
  }

  get currentDrawing(): Drawing | Figure | undefined {
    return this.drawing;
  }

  private message(text: string | undefined, kind: "info" | "error" = "info"): void {
    const box = el<HTMLElement>(this.root, ".message");
    box.hidden = !text;
    box.textContent = text ?? "";
    box.dataset.kind = kind;
  }

  /**
   * What a write or export did, or why it could not: kept on screen through refreshes until
   * the user's next action (a pane button or control, or selecting another cell).
   */
  private outcome(text: string | undefined, kind: "info" | "error" = "info"): void {
    const box = el<HTMLElement>(this.root, ".outcome");
    box.hidden = !text;
    box.textContent = text ?? "";
    box.dataset.kind = kind;
    this.outcomeAt = text ? this.selectedAt : undefined;
  }

  /** Reads the selection and, when it holds a SPAN formula, finds, solves and draws its member. */
  async refresh(): Promise<void> {
    const generation = ++this.generation;
    try {
      await this.lookUp(generation);
    } finally {
      if (generation === this.generation) this.root.dataset.refreshed = String(generation);
    }
  }

  private async lookUp(generation: number): Promise<void> {
    try {
      const selection = await this.host.getSelection();
      if (generation !== this.generation) return;
      this.selectedAt = qualify(selection.sheet, selection.cell);
      if (this.outcomeAt !== undefined && this.outcomeAt !== this.selectedAt) this.outcome(undefined);
      if (!selection.formula || !/SPAN/i.test(selection.formula)) {
        if (!this.resolved) el(this.root, ".source").textContent = `${selection.cell}: select a cell holding a SPAN formula.`;
        return;
      }
      const lookup = await findMember(this.host, selection);
      if (generation !== this.generation) return;
      el(this.root, ".source").textContent = `${qualify(selection.sheet, selection.cell)}  ${selection.formula}`;
      if (!lookup.ok) {
        this.message(lookup.message, "error");
        if (lookup.reason === "unresolved") this.showPick(lookup.call.args as Partial<MemberSources>, lookup.unresolved);
        return;
      }
      this.formulaText = selection.formula;
      this.use(lookup.member);
      const why = await cellMessage(this.host, selection);
      if (generation !== this.generation) return;
      const shows = typeof selection.value === "string" ? /^#(SPILL|CALC|REF|NAME\?|VALUE|N\/A)!?/i.exec(selection.value)?.[0] : undefined;
      if (why) this.message(why, "error");
      else if (shows && el<HTMLElement>(this.root, ".message").hidden) {
        this.message(`${selection.cell} shows ${selection.value}: what is drawn is what its arguments give, not what the cell shows now`, "error");
      }
    } catch (error) {
      if (generation === this.generation) this.message(error instanceof Error ? error.message : String(error), "error");
    }
  }

  private use(member: ResolvedMember): void {
    this.resolved = member;
    el<HTMLFormElement>(this.root, ".pick").hidden = true;
    this.message(undefined);
    el(this.root, ".units-note").textContent = member.units.length
      ? `units from the formula: length ${member.units.length}, force ${member.units.force}, deflection ${member.units.deflection}`
      : "no units argument: values in the member's own consistent units";
    this.fillCombos(member);
    el(this.root, ".controls").hidden = false;
    el(this.root, ".report-area").hidden = false;
    this.redraw();
  }

  private fillCombos(member: ResolvedMember): void {
    const label = el<HTMLElement>(this.root, ".combo");
    const select = el<HTMLSelectElement>(this.root, ".combo select");
    const formulaCombo = typeof member.args.combo === "string" ? member.args.combo : Array.isArray(member.args.combo) ? String(member.args.combo[0]?.[0] ?? "") : "";
    const options: [string, string][] = [[FORMULA_COMBO, formulaCombo ? `as in the formula: ${formulaCombo}` : "as in the formula: every load at 1"], ["", "every load at 1"]];
    for (const c of member.cases) options.push([c, `${c} alone`]);
    select.innerHTML = options.map(([value, text]) => `<option value="${escapeXml(value)}">${escapeXml(text)}</option>`).join("");
    select.value = FORMULA_COMBO;
    el<HTMLInputElement>(this.root, ".combo-text").value = formulaCombo;
    label.hidden = member.cases.length === 0 || member.kind !== "member";
  }

  /** The combination the user chose, or undefined for the formula's own. */
  private chosenCombo(): string | undefined {
    const select = el<HTMLSelectElement>(this.root, ".combo select");
    const text = el<HTMLInputElement>(this.root, ".combo-text").value.trim();
    if (select.value === FORMULA_COMBO && text === (this.formulaComboText() ?? "")) return undefined;
    return text;
  }

  private formulaComboText(): string | undefined {
    const combo = this.resolved?.args.combo;
    return typeof combo === "string" ? combo : Array.isArray(combo) ? String(combo[0]?.[0] ?? "") : "";
  }

  private units(): Units {
    return this.resolved?.units ?? NO_UNITS;
  }

  /** Solves (with the chosen combination) and draws; returns the time taken in ms. */
  redraw(): number {
    const member = this.resolved;
    if (!member) return 0;
    if (member.kind !== "member") return this.redrawStudy(member);
    const started = performance.now();
    this.study = undefined;
    this.showWrites(true);
    const solved = solveMember(member, this.chosenCombo());
    const figure = el<HTMLElement>(this.root, ".figure");
    if ("error" in solved) {
      this.solved = undefined;
      this.drawing = undefined;
      figure.innerHTML = "";
      el(this.root, ".actions").hidden = true;
      this.message(solved.error, "error");
      return performance.now() - started;
    }
    this.message(undefined);
    this.solved = solved;
    const width = Math.max(320, Math.floor(figure.clientWidth || this.root.clientWidth || 360));
    const theme = this.themeOf();
    this.root.dataset.theme = theme;
    this.drawing = drawDiagrams({
      member: solved.member,
      solution: solved.solution,
      units: this.units(),
      theme,
      width,
      subtitle: solved.comboText ? `combination ${solved.comboText}` : "every load at factor 1",
    });
    figure.innerHTML = this.drawing.svg;
    void figure.offsetHeight;
    el(this.root, ".actions").hidden = false;
    this.lastDrawMs = performance.now() - started;
    return this.lastDrawMs;
  }

  private showWrites(member: boolean): void {
    el(this.root, ".write-table").hidden = !member;
    el(this.root, ".insert-charts").hidden = !member;
    el(this.root, ".study-note").hidden = member;
  }

  /** Draws what an ENVELOPE, PEAKS, INFLUENCE or MOVING cell computes, or says why it cannot. */
  private redrawStudy(member: ResolvedMember): number {
    const started = performance.now();
    this.solved = undefined;
    this.showWrites(false);
    const figure = el<HTMLElement>(this.root, ".figure");
    const study = computeStudy(member);
    if ("error" in study) {
      this.study = undefined;
      this.drawing = undefined;
      figure.innerHTML = "";
      el(this.root, ".actions").hidden = true;
      this.message(`The pane cannot draw this cell: ${study.error}`, "error");
      return performance.now() - started;
    }
    this.message(undefined);
    this.study = study;
    const width = Math.max(320, Math.floor(figure.clientWidth || this.root.clientWidth || 360));
    const theme = this.themeOf();
    this.root.dataset.theme = theme;
    const name = member.call?.functionName ?? "";
    if (study.kind === "envelope" || study.kind === "peaks") {
      const subtitle = `${name}: upper bound solid, lower dashed`;
      this.drawing = drawEnvelope({ member: study.member, curves: study.curves, peaks: study.peaks, theme, width, subtitle });
    } else if (study.kind === "influence") {
      this.drawing = drawInfluence({ member: study.member, effect: study.effect, xs: study.xs, values: study.values, theme, width, subtitle: `${name}: ${study.effect}` });
    } else if (study.kind === "moving") {
      this.drawing = drawMoving({ member: study.member, effect: study.effect, placements: study.placements, line: study.line, theme, width, subtitle: `${name}: the train's extremes of ${study.effect}` });
    } else if (study.kind === "vibration") {
      const more = study.listed > study.modes.length ? `, first ${study.modes.length} of ${study.listed} modes` : "";
      this.drawing = drawModes({ member: study.member, modes: study.modes, theme, width, subtitle: `${name}: natural modes${more}; vibration acceptance is the governing guide's and the engineer's call` });
    } else return performance.now() - started;
    figure.innerHTML = this.drawing.svg;
    el(this.root, ".actions").hidden = false;
    this.lastDrawMs = performance.now() - started;
    return this.lastDrawMs;
  }

  /** The readout of a study cell at x: the bounds and what governs them, or the ordinate. */
  private studyReadout(study: Study, x: number): [string, string][] {
    const member = this.resolved;
    if (!member) return [];
    try {
      if (study.kind === "envelope" || study.kind === "peaks") {
        const out: [string, string][] = [["x", formatValue(x)]];
        for (const [q, max, maxBy, min, minBy] of envelopeAt(member, study.member, x)) {
          const name = q === "shear" ? "V" : q === "moment" ? "M" : "deflection";
          out.push([`${name} max`, `${formatValue(max)} (${maxBy})`], [`${name} min`, `${formatValue(min)} (${minBy})`]);
        }
        return out;
      }
      if (study.kind === "influence" || (study.kind === "moving" && study.line)) return [["x", formatValue(x)], ["ordinate", formatValue(influenceAt(member, x))]];
      return [["x", formatValue(x)]];
    } catch (error) {
      return [["x", formatValue(x)], ["", describeError(error).message]];
    }
  }

  private showPick(known: Partial<MemberSources>, unresolved: MemberArgument[]): void {
    const form = el<HTMLFormElement>(this.root, ".pick");
    form.hidden = false;
    for (const name of MEMBER_ARGUMENTS) {
      const input = form.querySelector<HTMLInputElement>(`input[name="${name}"]`);
      if (!input) continue;
      const source = known[name];
      input.value = source && !unresolved.includes(name) && source.kind !== "omitted" ? source.text : "";
      input.classList.toggle("needed", unresolved.includes(name));
    }
  }

  private async drawPicked(): Promise<void> {
    const form = el<HTMLFormElement>(this.root, ".pick");
    const selection = await this.host.getSelection();
    const sources = {} as MemberSources;
    for (const name of MEMBER_ARGUMENTS) {
      const value = form.querySelector<HTMLInputElement>(`input[name="${name}"]`)?.value ?? "";
      sources[name] = classifyArgument(value);
      if (sources[name].kind === "expression") {
        this.message(`${name}: "${value}" is not a range, a name or a value`, "error");
        return;
      }
    }
    const lookup = await resolveSources(this.host, selection.sheet, selection.cell, sources);
    if (!lookup.ok) this.message(lookup.message, "error");
    else this.use(lookup.member);
  }

  private ask(question: string): Promise<boolean> {
    const box = el<HTMLElement>(this.root, ".confirm");
    el(box, "p").textContent = question;
    box.hidden = false;
    return new Promise((resolve) => {
      this.pendingConfirm = (ok) => {
        box.hidden = true;
        this.pendingConfirm = undefined;
        resolve(ok);
      };
    });
  }

  /** Writes the DIAGRAM table beside the member (asking first over non-empty cells). */
  async writeTable(): Promise<{ address: string; rows: number } | undefined> {
    const member = this.resolved;
    const solved = this.solved;
    if (!member || !solved) return undefined;
    const rows = diagramRows(member, DEFAULT_POINTS, this.chosenCombo());
    const spill = await this.host.spillRange(qualify(member.sheet, member.cell)).catch(() => undefined);
    const plan = planTable(member, spill, rows, DEFAULT_POINTS, this.chosenCombo());
    const outcome = await writeTable(this.host, plan, (q) => this.ask(q));
    this.outcome(outcome.written ? `Diagram table written to ${outcome.address}.` : outcome.reason, outcome.written ? "info" : "error");
    return outcome.written ? { address: outcome.address, rows } : undefined;
  }

  /** Writes the table (same rules) and adds scatter-line charts over its columns. */
  async insertCharts(): Promise<number> {
    const member = this.resolved;
    const solved = this.solved;
    if (!member || !solved) return 0;
    const rows = diagramRows(member, DEFAULT_POINTS, this.chosenCombo());
    const spill = await this.host.spillRange(qualify(member.sheet, member.cell)).catch(() => undefined);
    const plan = planTable(member, spill, rows, DEFAULT_POINTS, this.chosenCombo());
    const outcome = (await tableInPlace(this.host, plan))
      ? ({ written: true, address: qualify(plan.sheet, blockText(plan.block)) } as const)
      : await writeTable(this.host, plan, (q) => this.ask(q));
    if (!outcome.written) {
      this.outcome(`${outcome.reason}; the charts need the table`, "error");
      return 0;
    }
    const requests = chartRequests(plan, solved.solution.hasStiffness, this.units());
    for (const request of requests) await this.host.addChart(request);
    this.outcome(`Diagram table written to ${outcome.address}, ${requests.length} charts added.`);
    return requests.length;
  }

  private fileStem(): string {
    return `spanwise-${(this.resolved?.cell ?? "member").toLowerCase()}`;
  }

  exportSvg(): void {
    if (!this.drawing) return;
    download(new Blob([this.drawing.svg], { type: "image/svg+xml" }), `${this.fileStem()}.svg`);
  }

  /**
   * PNG through a canvas. The SVG is loaded as a data: URL image, the one image source the
   * page's policy allows besides its own files (img-src 'self' data:); a blob: image would be
   * blocked. The file then downloads like the SVG.
   */
  async exportPng(): Promise<boolean> {
    const drawing = this.drawing;
    if (!drawing) return false;
    try {
      const image = new Image();
      await new Promise<void>((resolve, reject) => {
        image.onload = () => resolve();
        image.onerror = () => reject(new Error("the drawing could not be turned into an image"));
        image.src = svgDataUrl(drawing.svg);
      });
      const canvas = document.createElement("canvas");
      canvas.width = drawing.layout.width * 2;
      canvas.height = drawing.layout.height * 2;
      const context = canvas.getContext("2d");
      if (!context) throw new Error("no canvas in this browser");
      context.scale(2, 2);
      context.drawImage(image, 0, 0);
      const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
      if (!blob) throw new Error("the browser made no PNG from the drawing");
      download(blob, `${this.fileStem()}.png`);
      this.outcome(`Saved ${this.fileStem()}.png.`);
      return true;
    } catch (error) {
      this.outcome(`PNG not saved: ${error instanceof Error ? error.message : String(error)}`, "error");
      return false;
    }
  }

  private pointer(event: PointerEvent): void {
    const drawing = this.drawing;
    const solved = this.solved;
    const study = this.study;
    const svg = this.root.querySelector<SVGSVGElement>(".figure svg");
    if (!drawing || (!solved && !study) || !svg) return;
    const box = svg.getBoundingClientRect();
    const px = ((event.clientX - box.left) * drawing.layout.width) / (box.width || drawing.layout.width);
    const cursor = svg.querySelector<SVGGElement>(".cursor");
    if (px < drawing.layout.left - 4 || px > drawing.layout.right + 4) {
      cursor?.setAttribute("visibility", "hidden");
      return;
    }
    const x = xAtPixel(drawing.layout, px);
    const line = cursor?.querySelector("line");
    line?.setAttribute("x1", String(drawing.layout.x(x)));
    line?.setAttribute("x2", String(drawing.layout.x(x)));
    cursor?.setAttribute("visibility", "visible");
    const parts = solved ? readoutText(readoutAt(solved.solution, x, this.units().deflectionFactor), this.units()) : this.studyReadout(study!, x);
    el(this.root, ".readout").innerHTML = parts.map(([name, value]) => `<span data-name="${name}"><b>${escapeXml(name)}</b> ${escapeXml(value)}</span>`).join(" ");
  }

  private bind(): void {
    const root = this.root;
    // Every action of the user in the pane replaces the last outcome.
    root.addEventListener("click", (event) => {
      if ((event.target as HTMLElement).closest?.("button:not(.confirm-yes):not(.confirm-no)")) this.outcome(undefined);
    }, true);
    root.addEventListener("change", () => this.outcome(undefined), true);
    // Host refusals (SheetHostError) and the sheet layer's own errors both carry a message for the user.
    const failed = (error: unknown): void => this.outcome(`nothing written: ${error instanceof Error ? error.message : String(error)}`, "error");
    root.querySelector(".write-table")?.addEventListener("click", () => void this.writeTable().catch(failed));
    root.querySelector(".insert-charts")?.addEventListener("click", () => void this.insertCharts().catch(failed));
    root.querySelector(".export-svg")?.addEventListener("click", () => this.exportSvg());
    root.querySelector(".export-png")?.addEventListener("click", () => void this.exportPng());
    root.querySelector(".confirm-yes")?.addEventListener("click", () => this.pendingConfirm?.(true));
    root.querySelector(".confirm-no")?.addEventListener("click", () => this.pendingConfirm?.(false));
    const select = el<HTMLSelectElement>(root, ".combo select");
    select.addEventListener("change", () => {
      el<HTMLInputElement>(root, ".combo-text").value = select.value === FORMULA_COMBO ? (this.formulaComboText() ?? "") : select.value;
      this.redraw();
    });
    el<HTMLInputElement>(root, ".combo-text").addEventListener("change", () => this.redraw());
    const figure = el<HTMLElement>(root, ".figure");
    let frame = 0;
    figure.addEventListener("pointermove", (event) => {
      if (frame) return;
      frame = requestAnimationFrame(() => {
        frame = 0;
        this.pointer(event);
      });
    });
    figure.addEventListener("pointerleave", () => root.querySelector(".figure svg .cursor")?.setAttribute("visibility", "hidden"));
    const form = el<HTMLFormElement>(root, ".pick");
    form.addEventListener("submit", (event) => {
      event.preventDefault();
      void this.drawPicked();
    });
    form.addEventListener("click", (event) => {
      const name = (event.target as HTMLElement).dataset?.use;
      if (!name) return;
      void this.host.getSelection().then((s) => {
        const input = form.querySelector<HTMLInputElement>(`input[name="${name}"]`);
        if (input) input.value = qualify(s.sheet, s.range);
      });
    });
    let lastWidth = 0;
    const resize = debounce(() => {
      const width = figure.clientWidth;
      if (Math.abs(width - lastWidth) > 4) {
        lastWidth = width;
        this.redraw();
      }
    }, 120);
    if (typeof ResizeObserver !== "undefined") new ResizeObserver(() => resize()).observe(root);
  }
}

/** The SVG text as a data: URL (percent-encoded UTF-8). */
export function svgDataUrl(svg: string): string {
  return `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
}

function download(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
