/**
 * The member calculation report made from the pane, in real headless Chromium on the
 * workbench: the user fills the title block once, clicks "Report (PDF)" and "Report (HTML)"
 * on a member cell, and the files downloaded hold the member mark, every reaction by case and
 * factored, every per-span peak with its x, the caution and the version. The expected numbers
 * are the workbook's own: SPAN.CASEREACTIONS and SPAN.SPANPEAKS typed into the workbench on
 * the same member (computed by the engine, not by the report). On the Checks sheet the report
 * carries the member's checks and section; a cell that errors and no member at all are
 * refused with a message and no file.
 */
import fs from "fs";
import path from "path";
import type { BrowserContext, Frame, Page } from "playwright-core";
import { short } from "../../../src/report/describe";
import { CAUTION } from "../../../src/report/meta";
import { pdfTextLines } from "../../report/pdfText";
import { ARTIFACTS, clickCellIn, inWorkbench, openPaneOnWorkbench } from "./pages";

jest.setTimeout(240000);

// eslint-disable-next-line @typescript-eslint/no-require-imports
const VERSION = (require("../../../package.json") as { version: string }).version;

let context: BrowserContext;
let server: { url: string; close(): Promise<void> };
let page: Page;
let bench: Frame;

async function workbench<T>(body: string, ...args: unknown[]): Promise<T> {
  return inWorkbench<T>(bench, body, ...args);
}

async function clickCell(sheet: string, address: string): Promise<void> {
  await clickCellIn(page, bench, sheet, address);
}

/** Clicks a report button and returns the downloaded file's name and bytes. */
async function download(button: string): Promise<{ name: string; bytes: Buffer }> {
  const [file] = await Promise.all([page.waitForEvent("download"), page.click(`#pane ${button}`)]);
  const target = path.join(ARTIFACTS, `report-${process.pid}-${file.suggestedFilename()}`);
  await file.saveAs(target);
  const bytes = fs.readFileSync(target);
  fs.rmSync(target, { force: true });
  return { name: file.suggestedFilename(), bytes };
}

beforeAll(async () => {
  ({ context, server, page, bench } = await openPaneOnWorkbench("report"));
});

afterAll(async () => {
  await context?.close();
  await server?.close();
});

describe("the member report from the pane, on the workbench", () => {
  it("with no member drawn yet, there is no report to make and the pane says why", async () => {
    expect(await page.isVisible("#pane .report-html")).toBe(false);
    const made = await page.evaluate(() => (window as any).spanwisePane.report.make("html").then((r: unknown) => r !== undefined));
    expect(made).toBe(false);
    expect(await page.textContent("#pane .outcome")).toMatch(/^No member to report: select a cell holding a SPAN formula/);
  });

  it("keeps the title block filled once in the workbench's workbook", async () => {
    await clickCell("Member", "A25");
    await page.waitForSelector(".figure svg g.peak");
    await page.click("#pane .edit-title");
    await page.fill("#pane .title-block input[name='project']", "Workshop bay");
    await page.fill("#pane .title-block input[name='job']", "J-2026-17");
    await page.fill("#pane .title-block input[name='mark']", "B-211");
    await page.fill("#pane .title-block input[name='by']", "AE");
    await (await page.$("#pane"))?.screenshot({ path: path.join(ARTIFACTS, "pane-report.png") });
    await page.click("#pane .title-keep");
    await page.waitForFunction(() => document.querySelector("#pane .outcome")?.textContent === "Title block kept in the workbook.");
    await page.click("#pane .edit-title");
    expect(await page.inputValue("#pane .title-block input[name='mark']")).toBe("B-211");
    await page.click("#pane .title-cancel");
  });

  it("makes the PDF report of the selected member: mark, every reaction, every peak, the caution, the version", async () => {
    // The workbook's own per-case reactions and per-span peaks of the same member, for comparison.
    await workbench("api.setFormula('Member!M40', '=SPAN.CASEREACTIONS(B3:C3,A10:F14,B4:D4,B5,B6)')");
    await workbench("api.setFormula('Member!M50', '=SPAN.SPANPEAKS(B3:C3,A10:F14,B4:D4,B5,B6)')");
    const reactions = await workbench<number[][]>("return api.getValues('Member!M40:P42')");
    const peaks = await workbench<number[][]>("return api.getValues('Member!M50:V51')");
    expect(reactions.flat().every((v) => typeof v === "number")).toBe(true);
    expect(peaks.flat().every((v) => typeof v === "number")).toBe(true);
    await clickCell("Member", "A25");
    const { name, bytes } = await download(".report-pdf");
    expect(name).toBe("spanwise-report-b-211.pdf");
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    const lines = pdfTextLines(bytes);
    const text = lines.join("\n");
    expect(text).toContain("Member calculation: B-211");
    for (const v of ["Workshop bay", "J-2026-17", "AE"]) expect(lines).toContain(v);
    expect(text).toContain(CAUTION);
    expect(text).toContain(`Spanwise ${VERSION}`);
    // Reactions: x, D, L, factored per support, in one table row.
    reactions.forEach((row, i) => {
      const at = lines.indexOf(`${i + 1} (pin)`);
      expect(at).toBeGreaterThanOrEqual(0);
      expect(lines.slice(at + 1, at + 5)).toEqual(row.map((v) => short(v)));
    });
    // Peaks per span: max M, x, min M, x, |V|, x, deflection, x (SPANPEAKS also gives span and length first).
    peaks.forEach((row) => {
      const at = lines.findIndex((l, k) => l === String(row[0]) && lines[k + 1] === short(row[2]));
      expect(at).toBeGreaterThanOrEqual(0);
      expect(lines.slice(at + 1, at + 9)).toEqual(row.slice(2).map((v) => short(v)));
    });
    expect(await page.textContent("#pane .outcome")).toMatch(/^Report of B-211 saved as spanwise-report-b-211\.pdf/);
  });

  it("makes the print-ready HTML report with the same contents, and offers to print it", async () => {
    const { name, bytes } = await download(".report-html");
    expect(name).toBe("spanwise-report-b-211.html");
    const html = bytes.toString("utf8");
    expect(html).toMatch(/^<!DOCTYPE html>/);
    expect(html).toContain("Member calculation: B-211");
    expect(html).toContain(CAUTION);
    expect(html).toContain(`Spanwise ${VERSION}`);
    expect(html).toMatch(/@page \{ size: A4;/);
    expect(html).not.toMatch(/<script/i);
    expect(await page.isVisible("#pane .report-print")).toBe(true);
    await page.selectOption("#pane .report-paper", "letter");
    expect((await download(".report-html")).bytes.toString("utf8")).toMatch(/@page \{ size: letter;/);
    await page.selectOption("#pane .report-paper", "A4");
  });

  it("puts the member's checks and section in its report (Checks sheet)", async () => {
    await clickCell("Checks", "E9");
    const lines = pdfTextLines((await download(".report-pdf")).bytes);
    for (const heading of ["Section", "Checks", "SPAN.STRESS at Checks!E9", "SPAN.SHEARSTRESS at Checks!E13", "SPAN.DEFLECTIONCHECK at Checks!E17", "SPAN.UTILISATION at Checks!F21"]) expect(lines).toContain(heading);
    const ratios = await workbench<number[][]>("return api.getValues('Checks!F21:F22')");
    for (const [r] of ratios) expect(lines).toContain(short(r, 6));
  });

  it("refuses a cell that errors, with the sheet layer's message, and writes no file", async () => {
    await workbench("api.setFormula('Member!M60', '=SPAN.REACTIONS(B3:C3,A10:F14,B4:D4,-5)')");
    await clickCell("Member", "M60");
    await page.waitForFunction(() => !(document.querySelector("#pane .message") as HTMLElement).hidden);
    let downloads = 0;
    page.on("download", () => downloads++);
    await page.click("#pane .report-pdf");
    await page.waitForFunction(() => /^No report: /.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    expect(await page.textContent("#pane .outcome")).toMatch(/^No report: Member!M60: #VALUE! .*EI/);
    expect(downloads).toBe(0);
  });
});

describe("mode shapes and rotational springs in the pane, on the workbench", () => {
  it("draws a FREQUENCIES cell's modes, each panel titled with the frequency the cell lists", async () => {
    await workbench("api.setFormula('Member!M70', '=SPAN.FREQUENCIES(B3:C3,B5,0.5,3,B4:D4)')");
    const listed = await workbench<number[][]>("return api.getValues('Member!M70:O72')");
    await clickCell("Member", "M70");
    await page.waitForSelector(".figure svg[data-kind='modes']");
    const panels = await page.$$eval(".figure svg g.panel[data-mode]", (g) => g.map((n) => [Number(n.getAttribute("data-mode")), Number(n.getAttribute("data-hz"))]));
    expect(panels).toEqual(listed.map((row) => [row[0], row[1]]));
    expect(await page.$$eval(".figure svg path.curve.mode", (p) => p.length)).toBe(3);
    expect(await page.textContent("#pane .figure svg .subtitle")).toMatch(/natural modes/);
  });

  it("draws each rotational spring's coil and its moment on the moment diagram", async () => {
    await workbench("api.setValues('Member!M80:O80', [['pin+rot 8000', 'pin', 'spring 900 rot 3000']])");
    await workbench("api.setFormula('Member!M82', '=SPAN.REACTIONS(B3:C3,A10:F14,M80:O80,B5,B6)')");
    const moments = await workbench<number[][]>("return api.getValues('Member!O82:O84')");
    await clickCell("Member", "M82");
    await page.waitForSelector(".figure svg g.support.rotational");
    expect(await page.$$eval(".figure svg g.support.rotational", (g) => g.map((n) => Number(n.getAttribute("data-k"))))).toEqual([8000, 3000]);
    const marks = await page.$$eval(".figure svg g.spring-moment", (g) => g.map((n) => [Number(n.getAttribute("data-node")), Number(n.getAttribute("data-moment"))]));
    expect(marks).toEqual([[1, moments[0][0]], [3, moments[2][0]]]);
    await (await page.$("#pane"))?.screenshot({ path: path.join(ARTIFACTS, "pane-rotational-springs.png") });
  });
});
