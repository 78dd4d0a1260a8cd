/**
 * The pane's calculation report: buttons that make the member report of the selected cell
 * (print-ready HTML, or PDF), a print button for the HTML, and the title block form. The
 * report is the CLI's (src/pane/report.ts, one document model, src/report renders it); the
 * PDF writer (pdf-lib) is loaded on first use as a chunk of its own, so the pane's first
 * load stays small. The title block is read once from the workbook (titleSettings.ts) and
 * kept there on "Keep in workbook"; where the host cannot keep settings the pane says why and
 * keeps it for as long as the pane is open.
 */
import type { PaperSize, PrintDocument } from "../report/document";
import { renderHtml } from "../report/html";
import type { BuildInfo } from "../report/meta";
import { EMPTY_TITLE, TITLE_FIELDS, type TitleBlock } from "../report/titleBlock";
import { escapeXml } from "./draw/format";
import type { SheetHost } from "./host";
import type { ResolvedMember } from "./memberFromSheet";
import { memberReport } from "./report";
import { MAX_CANDIDATES, checksFor } from "./reportChecks";
import { TITLE_FIELD_LIMIT, cleanField, loadTitle, saveTitle } from "./titleSettings";
import { PANE_VERSION } from "./version";

export const REPORT_HTML = `
<div class="report-controls">
  <button type="button" class="report-html">Report (HTML)</button>
  <button type="button" class="report-pdf">Report (PDF)</button>
  <label class="report-paper-label"><span>Paper</span><select class="report-paper"><option value="A4">A4</option><option value="letter">US letter</option></select></label>
  <button type="button" class="report-print" hidden>Print report</button>
  <button type="button" class="edit-title">Title block…</button>
</div>
<form class="title-block" hidden>
  <p class="title-note"></p>
  ${TITLE_FIELDS.map(([key, label]) => `<label><span>${escapeXml(label)}</span><input name="${key}" maxlength="${TITLE_FIELD_LIMIT}" spellcheck="false" autocomplete="off"/></label>`).join("")}
  <button type="submit" class="title-keep">Keep in workbook</button> <button type="button" class="title-cancel">Cancel</button>
</form>
`;

export interface ReportTarget {
  member: ResolvedMember;
  /** The cell's formula text as the host shows it. */
  formula: string;
}

export interface MadeReport {
  format: "html" | "pdf";
  name: string;
  doc: PrintDocument;
  html?: string;
  pdf?: Uint8Array;
}

/** What the pane's documents say about the software: the version built in, the host, the date now. */
export function paneBuildInfo(host: SheetHost, date = new Date()): BuildInfo {
  const agent = typeof navigator === "undefined" ? "" : `, ${navigator.userAgent}`;
  return { version: PANE_VERSION, commit: "not recorded in the pane", platform: `Spanwise pane on the ${host.kind} host${agent}`, date: date.toISOString().replace(/\.\d{3}Z$/, "Z") };
}

/** A file name stem from the member mark or cell: letters, digits, '-' and '_' only. */
export function reportName(title: TitleBlock, cell: string): string {
  const stem = (title.mark || cell).toLowerCase().replace(/[^a-z0-9_-]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60);
  return `spanwise-report-${stem || "member"}`;
}

export class ReportPanel {
  private title: TitleBlock | undefined;
  /** The host's workbookKey when the title block was read. */
  private titleBook: unknown;
  /** Why the workbook cannot keep the title block, when it cannot. */
  private notKept: string | undefined;
  /** The last report made, for the print button and for tests. */
  last: MadeReport | undefined;

  constructor(
    private readonly host: SheetHost,
    private readonly root: HTMLElement,
    private readonly target: () => ReportTarget | undefined,
    private readonly outcome: (text: string, kind?: "info" | "error") => void,
    private readonly save: (blob: Blob, name: string) => void,
  ) {
    this.bind();
  }

  private q<T extends HTMLElement>(selector: string): T {
    const found = this.root.querySelector(selector);
    if (!found) throw new Error(`the pane lacks ${selector}`);
    return found as T;
  }

  /** The workbook's title block, read once per workbook (host.workbookKey: the workbench opens others in the same pane). */
  async titleBlock(): Promise<TitleBlock> {
    const book = this.host.workbookKey?.();
    if (this.title && book === this.titleBook) return this.title;
    this.titleBook = book;
    const loaded = await loadTitle(this.host);
    this.title = loaded.title;
    this.notKept = loaded.kept ? undefined : loaded.reason;
    return this.title;
  }

  /** Makes the report of the selected member cell and offers it as a file; undefined when it cannot (the outcome says why). */
  async make(format: "html" | "pdf"): Promise<MadeReport | undefined> {
    const target = this.target();
    if (!target) {
      this.outcome("No member to report: select a cell holding a SPAN formula of a member (REACTIONS, MOMENT, DIAGRAM, a check, ...) first.", "error");
      return undefined;
    }
    const title = await this.titleBlock();
    const candidates = this.host.spanFormulas ? await this.host.spanFormulas(MAX_CANDIDATES + 1).catch(() => []) : [];
    const checks = target.member.kind === "member" ? await checksFor(this.host, target.member, candidates) : undefined;
    const doc = memberReport({ member: target.member, formula: target.formula, title, checks }, paneBuildInfo(this.host));
    if ("error" in doc) {
      this.outcome(`No report: ${doc.error}`, "error");
      return undefined;
    }
    const paper = this.q<HTMLSelectElement>(".report-paper").value === "letter" ? "letter" : ("A4" as PaperSize);
    const name = reportName(title, target.member.cell);
    let made: MadeReport;
    if (format === "html") {
      const html = renderHtml(doc, paper);
      made = { format, name: `${name}.html`, doc, html };
      this.save(new Blob([html], { type: "text/html" }), made.name);
      this.q(".report-print").hidden = false;
    } else {
      let pdf: Uint8Array;
      try {
        const { renderPdf } = await import(/* webpackChunkName: "report-pdf" */ "../report/pdf");
        pdf = await renderPdf(doc, paper);
      } catch (error) {
        this.outcome(`No PDF: ${error instanceof Error ? error.message : String(error)}`, "error");
        return undefined;
      }
      made = { format, name: `${name}.pdf`, doc, pdf };
      this.save(new Blob([pdf as BlobPart], { type: "application/pdf" }), made.name);
    }
    this.last = made;
    const notes = [...(checks?.problems ?? []), ...(this.notKept ? [`title block not kept in the workbook: ${this.notKept}`] : [])];
    const count = checks?.checks.length ?? 0;
    this.outcome(`Report of ${doc.title.replace(/^Member calculation /, "")} saved as ${made.name} (${count} check${count === 1 ? "" : "s"} of this member found in the workbook).${notes.length ? ` ${notes.join("; ")}.` : ""}`);
    return made;
  }

  /** Prints the last HTML report from a frame of its own (the page's own print is the pane's). */
  print(): boolean {
    const html = this.last?.html;
    if (!html) return false;
    const frame = document.createElement("iframe");
    frame.className = "report-frame";
    frame.setAttribute("aria-hidden", "true");
    frame.style.cssText = "position:fixed;width:0;height:0;border:0;left:-10px;top:-10px";
    frame.srcdoc = html;
    frame.onload = () => {
      try {
        frame.contentWindow?.print();
      } catch (error) {
        this.outcome(`The report could not be printed from the pane: ${error instanceof Error ? error.message : String(error)}; open the saved HTML file and print it from there.`, "error");
      }
      setTimeout(() => frame.remove(), 60000);
    };
    document.body.appendChild(frame);
    return true;
  }

  /** Shows the title block form filled with the workbook's title block. */
  async editTitle(): Promise<void> {
    const title = await this.titleBlock();
    const form = this.q<HTMLFormElement>(".title-block");
    for (const [key] of TITLE_FIELDS) {
      const input = form.querySelector<HTMLInputElement>(`input[name="${key}"]`);
      if (input) input.value = title[key];
    }
    this.q(".title-note").textContent = this.notKept
      ? `This workbook cannot keep it (${this.notKept}): it is kept in the pane until the pane closes.`
      : "Filled once per workbook and kept in it; every report of this workbook prints it. A blank member mark prints the cell.";
    form.hidden = false;
  }

  /** Keeps the form's title block (in the workbook when the host can keep it). */
  async keepTitle(): Promise<TitleBlock> {
    const form = this.q<HTMLFormElement>(".title-block");
    const title: TitleBlock = { ...EMPTY_TITLE };
    for (const [key] of TITLE_FIELDS) title[key] = cleanField(form.querySelector<HTMLInputElement>(`input[name="${key}"]`)?.value ?? "");
    this.title = title;
    form.hidden = true;
    if (this.notKept) {
      this.outcome(`Title block kept in the pane only: ${this.notKept}.`, "error");
      return title;
    }
    try {
      this.title = await saveTitle(this.host, title);
      this.outcome("Title block kept in the workbook.");
    } catch (error) {
      this.notKept = error instanceof Error ? error.message : String(error);
      this.outcome(`Title block kept in the pane only: ${this.notKept}.`, "error");
    }
    return this.title;
  }

  private bind(): void {
    const failed = (error: unknown): void => this.outcome(`No report: ${error instanceof Error ? error.message : String(error)}`, "error");
    this.q(".report-html").addEventListener("click", () => void this.make("html").catch(failed));
    this.q(".report-pdf").addEventListener("click", () => void this.make("pdf").catch(failed));
    this.q(".report-print").addEventListener("click", () => this.print());
    this.q(".edit-title").addEventListener("click", () => void this.editTitle().catch(failed));
    this.q(".title-cancel").addEventListener("click", () => (this.q(".title-block").hidden = true));
    this.q<HTMLFormElement>(".title-block").addEventListener("submit", (event) => {
      event.preventDefault();
      void this.keepTitle().catch(failed);
    });
  }
}
