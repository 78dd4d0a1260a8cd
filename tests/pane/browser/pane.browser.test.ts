/**
 * The diagram pane in real headless Chromium, on the workbench: the user clicks a cell
 * holding a SPAN formula; the pane draws the member and its peak labels equal the values
 * SPAN.EXTREMES gives in the same workbook. Screenshots go to test-artifacts/.
 */
import fs from "fs";
import path from "path";
import type { BrowserContext, Frame, Page } from "playwright-core";
import { formatValue } from "../../../src/pane/draw/format";
import { ARTIFACTS, clickCellIn, inWorkbench, openPaneOnWorkbench } from "./pages";

jest.setTimeout(240000);

let context: BrowserContext;
let server: { url: string; close(): Promise<void> };
let page: Page;
let bench: Frame;

async function workbench<T>(body: string, ...args: unknown[]): Promise<T> {
  return inWorkbench<T>(bench, body, ...args);
}

/** Clicks a sheet tab and a cell as a user would, then waits until the pane has followed. */
async function clickCell(sheet: string, address: string): Promise<void> {
  await clickCellIn(page, bench, sheet, address);
}

async function peaks(): Promise<{ quantity: string; kind: string; value: number; x: number; text: string }[]> {
  return page.$$eval(".figure svg g.peak", (nodes) =>
    nodes.map((n) => ({
      quantity: n.getAttribute("data-quantity") ?? "",
      kind: n.getAttribute("data-kind") ?? "",
      value: Number(n.getAttribute("data-value")),
      x: Number(n.getAttribute("data-x")),
      text: n.querySelector("text")?.textContent ?? "",
    })),
  );
}

async function waitForSource(text: string): Promise<void> {
  await page.waitForFunction((t) => document.querySelector("#pane .source")?.textContent?.includes(t), text);
}

beforeAll(async () => {
  ({ context, server, page, bench } = await openPaneOnWorkbench("pane"));
});

afterAll(async () => {
  await context?.close();
  await server?.close();
});

describe("the pane on the workbench", () => {
  it("draws the member behind a clicked SPAN.EXTREMES cell, its peak labels equal to the EXTREMES values", async () => {
    await clickCell("Member", "A25");
    await waitForSource("Member!A25");
    await page.waitForSelector(".figure svg g.peak");
    const table = await workbench<unknown[][]>("return api.getValues('Member!A25:E28')");
    const shown = await peaks();
    expect(table.map((row) => row[0])).toEqual(["shear", "moment", "slope", "deflection"]);
    for (const row of table) {
      const [quantity, max, xMax, min, xMin] = row as [string, number, number, number, number];
      if (quantity === "slope") continue;
      const labels = shown.filter((p) => p.quantity === quantity);
      expect(labels.find((p) => p.kind === "max")).toMatchObject({ value: max, x: xMax });
      const low = labels.find((p) => p.kind === "min");
      if (Math.abs(min) > 1e-9 * Math.abs(max)) expect(low).toMatchObject({ value: min, x: xMin });
      expect(labels.find((p) => p.kind === "max")?.text).toContain(formatValue(max));
    }
    expect(await page.textContent("#pane .caution")).toMatch(/aid to a qualified engineer/);
    expect(await page.$$eval("#pane .combo select option", (o) => o.map((x) => x.textContent))).toEqual(["as in the formula: 1.2D+1.6L", "every load at 1", "D alone", "L alone"]);
    expect(await page.textContent(".figure svg .panel[data-quantity='moment'] .panel-title")).toBe("Moment M, sagging +"); // no units argument: no units
    await page.screenshot({ path: path.join(ARTIFACTS, "pane-workbench.png") });
    await (await page.$("#pane"))?.screenshot({ path: path.join(ARTIFACTS, "pane-only.png") });
  });

  it("shows x, V, M, slope and deflection under the pointer", async () => {
    const box = await page.locator(".figure svg").boundingBox();
    if (!box) throw new Error("no drawing");
    await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.5);
    await page.waitForFunction(() => document.querySelectorAll("#pane .readout span").length === 5);
    const names = await page.$$eval("#pane .readout span", (s) => s.map((n) => n.getAttribute("data-name")));
    expect(names).toEqual(["x", "V", "M", "slope", "deflection"]);
  });

  it("redraws under another combination from the selector", async () => {
    const before = (await peaks()).find((p) => p.quantity === "moment" && p.kind === "max")?.value;
    await page.selectOption("#pane .combo select", "D");
    await page.waitForFunction((b) => Number(document.querySelector(".figure svg g.peak[data-quantity='moment'][data-kind='max']")?.getAttribute("data-value")) !== b, before);
    await workbench("api.setFormula('Member!G45', '=INDEX(SPAN.MAXMOMENT(B3:C3,A10:F14,B4:D4,B5,\"D\"),1,1)')");
    const expected = (await workbench<number[][]>("return api.getValues('Member!G45')"))[0][0];
    expect((await peaks()).find((p) => p.quantity === "moment" && p.kind === "max")?.value).toBe(expected);
    await page.selectOption("#pane .combo select", "(formula)");
  });

  it("refuses a write into cells another formula spills into, names it, and never leaves #SPILL!", async () => {
    // A25's table would go to G25:K126; the DIAGRAM at H3 spills over H3:L25, so H25:K25 are its cells.
    await clickCell("Member", "A25");
    await waitForSource("Member!A25");
    const before = await workbench<unknown[][]>("return api.getValues('Member!A1:L130')");
    await page.click("#pane .write-table");
    await page.waitForFunction(() => /nothing written/.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    expect(await page.textContent("#pane .outcome")).toMatch(/^nothing written: Member!G25:K\d+ takes cells that the result of Member!H3 spills into/);
    expect(await page.isVisible("#pane .confirm")).toBe(false);
    expect(await workbench("return api.getValues('Member!A1:L130')")).toEqual(before);
    expect(JSON.stringify(before)).not.toContain("#SPILL!");
    // The outcome stays through a refresh of the same selection.
    await page.evaluate(() => (window as any).spanwisePane.refresh());
    expect(await page.textContent("#pane .outcome")).toMatch(/^nothing written/);
  });

  it("asks before writing over plain values, writes nothing on cancel, and Write anyway leaves no #SPILL!", async () => {
    await workbench("api.setValues('Member!A200:C200', [['=SPAN.MAXMOMENT(B3:C3,A10:F14,B4:D4,B5,B6)', null, null]]); api.setValues('Member!F205', [['note']])");
    await clickCell("Member", "A200");
    await waitForSource("Member!A200");
    const before = await workbench<unknown[][]>("return api.getValues('Member!D200:H350')");
    await page.click("#pane .write-table");
    await page.waitForSelector("#pane .confirm:not([hidden])");
    expect(await page.textContent("#pane .confirm p")).toMatch(/^Member!D200:H\d+ already holds something/);
    await page.click("#pane .confirm-no");
    await page.waitForFunction(() => /nothing written/.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    expect(await workbench("return api.getValues('Member!D200:H350')")).toEqual(before);
    await page.click("#pane .write-table");
    await page.waitForSelector("#pane .confirm:not([hidden])");
    await page.click("#pane .confirm-yes");
    await page.waitForFunction(() => /Diagram table written to Member!D200:H\d+/.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    expect(await workbench("return api.getFormula('Member!D201')")).toBe("=SPAN.DIAGRAM(B3:C3,A10:F14,101,B4:D4,B5,B6)");
    expect(JSON.stringify(await workbench("return api.getValues('Member!A1:L350')"))).not.toContain("#SPILL!");
    await page.evaluate(() => (window as any).spanwisePane.refresh());
    await page.waitForFunction(() => Number((document.querySelector("#pane") as HTMLElement).dataset.refreshed ?? 0) > 0);
    expect(await page.textContent("#pane .outcome")).toMatch(/^Diagram table written to Member!D200:H\d+/);
  });

  it("writes a live DIAGRAM table into empty cells and charts over its columns", async () => {
    await workbench("api.setFormula('Member!A50', '=SPAN.MAXMOMENT(B3:C3,A10:F14,B4:D4,B5,B6)')");
    await clickCell("Member", "A50");
    await waitForSource("Member!A50");
    await page.waitForSelector(".figure svg g.peak");
    await page.click("#pane .insert-charts");
    await page.waitForFunction(() => /charts added/.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    expect(await page.isVisible("#pane .confirm")).toBe(false);
    const formula = await workbench<string>("return api.getFormula('Member!D51')");
    expect(formula).toBe("=SPAN.DIAGRAM(B3:C3,A10:F14,101,B4:D4,B5,B6)");
    const written = await workbench<unknown[][]>("return api.getValues('Member!D50:H51')");
    expect(written[0]).toEqual(["x", "V", "M", "slope (rad)", "deflection"]);
    expect(written[1][0]).toBe(0);
    const direct = await workbench<unknown[][]>("api.setFormula('Member!N51', '=SPAN.DIAGRAM(B3:C3,A10:F14,101,B4:D4,B5,B6)'); return api.getValues('Member!N51:R60')");
    expect(await workbench("return api.getValues('Member!D51:H60')")).toEqual(direct);
    expect(await bench.locator("#charts figure").count()).toBe(3);
    expect(await bench.locator("#charts figcaption").allTextContents()).toEqual(["Shear", "Moment", "Deflection"]);
    await page.screenshot({ path: path.join(ARTIFACTS, "pane-workbench-charts.png") });
  });

  it("says when an argument is an expression and draws from picked ranges", async () => {
    await workbench("api.setFormula('Member!A60', '=SPAN.REACTIONS(B3:C3*1,A10:F14,B4:D4,B5,B6)')");
    await clickCell("Member", "A60");
    await page.waitForFunction(() => /cannot work out spans \(B3:C3\*1\)/.test(document.querySelector("#pane .message")?.textContent ?? ""));
    expect(await page.isVisible("#pane .pick")).toBe(true);
    await page.fill("#pane .pick input[name='spans']", "Member!B3:C3");
    await page.click("#pane .pick .draw-picked");
    await page.waitForSelector("#pane .pick", { state: "hidden" });
    expect(await page.$$eval(".figure svg g.panel", (p) => p.length)).toBe(3);
  });

  it("writes a member with a units argument as a table and as charts that give the numbers of direct calls", async () => {
    const units = "length=ft, force=kip, EI=kip*in^2, deflection=in";
    await workbench(`api.setValues('Member!A400:D403', [[20, 12, null, null], ['udl 1.5 D; point 4 at 26 D', null, null, null], ['pin', 'pin', 'free', null], [14790000, '${units}', null, null]])`);
    await workbench("api.setFormula('Member!A405', '=SPAN.EXTREMES(A400:B400,A401,A402:C402,A403,,B403)')");
    await clickCell("Member", "A405");
    await waitForSource("Member!A405");
    await page.waitForSelector(".figure svg g.peak");
    // Labels in the formula's units, deflection in its own unit; peak values as SPAN.EXTREMES gives them.
    expect(await page.textContent(".figure svg .panel[data-quantity='deflection'] .panel-title")).toBe("Deflection, down + (in)");
    const extremes = await workbench<unknown[][]>("return api.getValues('Member!A405:E408')");
    const shown = await peaks();
    expect(shown.filter((p) => p.quantity === "deflection").length).toBeGreaterThan(0);
    for (const label of shown) {
      const row = extremes.find((r) => r[0] === label.quantity) as [string, number, number, number, number];
      const [value, x] = label.kind === "max" ? [row[1], row[2]] : [row[3], row[4]];
      expect(Math.abs(label.value - value)).toBeLessThanOrEqual(1e-12 * Math.max(Math.abs(row[1]), Math.abs(row[3])));
      expect(Math.abs(label.x - x)).toBeLessThanOrEqual(1e-12 * 32);
    }
    await page.click("#pane .insert-charts");
    await page.waitForFunction(() => /charts added/.test(document.querySelector("#pane .outcome")?.textContent ?? ""));
    const formula = await workbench<string>("return api.getFormula('Member!G406')");
    expect(formula).toBe("=SPAN.DIAGRAM(A400:B400,A401,101,A402:C402,A403,,B403)");
    const header = await workbench<unknown[][]>("return api.getValues('Member!G405:K405')");
    expect(header[0]).toEqual(["x (ft)", "V (kip)", "M (kip·ft)", "slope (rad)", "deflection (in)"]);
    const spill = await workbench<string>("return api.spillRange('Member!G406')");
    const last = Number(/:K(\d+)$/.exec(spill)![1]);
    const table = await workbench<number[][]>(`return api.getValues('Member!G406:K${last}')`);
    await workbench(`api.setFormula('Member!M406', '=SPAN.SHEAR(A400:B400,A401,G406:G${last},A402:C402,A403,,B403)'); api.setFormula('Member!N406', '=SPAN.MOMENT(A400:B400,A401,G406:G${last},A402:C402,A403,,B403)'); api.setFormula('Member!O406', '=SPAN.DEFLECTION(A400:B400,A401,G406:G${last},A402:C402,A403,,B403)')`);
    const direct = await workbench<number[][]>(`return api.getValues('Member!M406:O${last}')`);
    const repeated = (i: number): boolean => table[i - 1]?.[0] === table[i][0] || table[i + 1]?.[0] === table[i][0];
    table.forEach((row, i) => {
      const [v, m, d] = direct[i];
      // Deflection and moment are continuous here (no couples); shear is compared away from its jumps,
      // where the table lists both sides at one x and a single call gives one of them.
      expect(Math.abs(row[4] - d)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(d)));
      expect(Math.abs(row[2] - m)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(m)));
      if (!repeated(i)) expect(Math.abs(row[1] - v)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(v)));
    });
    // Deflection in inches: 12 times the same member's deflection in feet.
    await workbench(`api.setFormula('Member!P406', '=SPAN.DEFLECTION(A400:B400,A401,G406:G${last},A402:C402,A403,,"length=ft, force=kip, EI=kip*in^2")')`);
    const feet = await workbench<number[][]>(`return api.getValues('Member!P406:P${last}')`);
    table.forEach((row, i) => expect(Math.abs(row[4] - 12 * feet[i][0])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(row[4]))));
    expect(await bench.locator("#charts figure").count()).toBeGreaterThanOrEqual(3);
  });

  it("draws an ENVELOPE cell's upper and lower curves, with what governs under the pointer", async () => {
    await workbench("api.setValues('Member!A450:B453', [[6, null], ['udl 1 D; udl 2 L', null], ['1.2D+1.6L', null], ['0.9D', null]])");
    await workbench("api.setFormula('Member!A455', '=SPAN.ENVELOPE(A450,A451,3,A452:A453)')");
    await clickCell("Member", "A455");
    await waitForSource("Member!A455");
    await page.waitForSelector(".figure svg[data-kind='envelope']");
    expect(await page.$$eval(".figure svg .panel[data-quantity='moment'] path.curve", (p) => p.map((n) => n.getAttribute("class")))).toEqual(["curve upper", "curve lower"]);
    expect(await page.textContent(".figure svg")).not.toContain("every load at factor 1");
    expect(await page.isVisible("#pane .write-table")).toBe(false);
    const box = await page.locator(".figure svg").boundingBox();
    if (!box) throw new Error("no drawing");
    const layout = await page.evaluate(() => { const l = (window as any).spanwisePane.currentDrawing.layout; return { left: l.left, right: l.right, width: l.width }; });
    const px = layout.left + (layout.right - layout.left) * 0.5;
    await page.mouse.move(box.x + (px * box.width) / layout.width, box.y + box.height * 0.5);
    await page.waitForFunction(() => document.querySelector("#pane .readout span[data-name='M max']") !== null);
    const readout = await page.textContent("#pane .readout span[data-name='M max']");
    const x = Number((await page.textContent("#pane .readout span[data-name='x']"))!.replace(/^x\s*/, ""));
    await workbench(`api.setFormula('Member!A460', '=SPAN.ENVELOPE(A450,A451,${x},A452:A453)')`);
    const cell = await workbench<unknown[][]>("return api.getValues('Member!A460:E460')");
    expect(readout).toContain(formatValue(cell[0][1] as number));
    expect(readout).toContain(`(${cell[0][2]})`);
    await (await page.$("#pane"))?.screenshot({ path: path.join(ARTIFACTS, "pane-envelope.png") });
  });

  it("draws an INFLUENCE cell's influence line and a MOVING cell's train at its extremes", async () => {
    await workbench("api.setFormula('Member!A470', '=SPAN.INFLUENCE(10,\"reaction 1\",{0,5,10})'); api.setFormula('Member!A472', '=SPAN.MOVING(10,{10,10},2,\"moment at 5\")')");
    await clickCell("Member", "A470");
    await waitForSource("Member!A470");
    await page.waitForSelector(".figure svg[data-kind='influence'] path.curve.influence");
    expect(await page.textContent(".figure svg .panel-title")).toBe("Influence line: reaction 1, unit load at x");
    await clickCell("Member", "A472");
    await waitForSource("Member!A472");
    await page.waitForSelector(".figure svg[data-kind='moving']");
    const placements = await page.$$eval(".figure svg g.placement", (g) => g.map((n) => ({ label: n.getAttribute("data-label"), value: Number(n.getAttribute("data-value")) })));
    const cell = await workbench<unknown[][]>("return api.getValues('Member!A472:E473')");
    expect(placements).toEqual(cell.map((row) => ({ label: row[0], value: row[1] })));
  });

  it("says so when the selected cell itself shows #SPILL!", async () => {
    await workbench("api.setValues('Member!B481', [['in the way']]); api.setFormula('Member!A480', '=SPAN.REACTIONS(B3:C3,A10:F14,B4:D4,B5,B6)')");
    expect((await workbench<any[][]>("return api.getValues('Member!A480')"))[0][0]).toMatchObject({ error: "#SPILL!" });
    await clickCell("Member", "A480");
    await waitForSource("Member!A480");
    await page.waitForFunction(() => /^A480 shows #SPILL!/.test(document.querySelector("#pane .message")?.textContent ?? ""));
  });

  it("shows the sheet's message for a combination typed in the combination box", async () => {
    await clickCell("Member", "A25");
    await waitForSource("Member!A25");
    await page.fill("#pane .combo-text", "1.2D+");
    await page.dispatchEvent("#pane .combo-text", "change");
    await page.waitForFunction(() => /^#VALUE! /.test(document.querySelector("#pane .message")?.textContent ?? ""));
    await page.selectOption("#pane .combo select", "(formula)");
  });

  it("exports a PNG under the page's own policy (a data: image), as a download", async () => {
    await clickCell("Member", "A25");
    await waitForSource("Member!A25");
    await page.waitForSelector(".figure svg g.peak");
    const refused: string[] = [];
    page.on("console", (m) => { if (/Content Security Policy|Refused to load/i.test(m.text())) refused.push(m.text()); });
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("#pane .export-png")]);
    expect(download.suggestedFilename()).toBe("spanwise-a25.png");
    const file = path.join(ARTIFACTS, "pane-export.png");
    await download.saveAs(file);
    const bytes = fs.readFileSync(file);
    expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(bytes.length).toBeGreaterThan(2000);
    expect(refused).toEqual([]);
    expect(await page.textContent("#pane .outcome")).toBe("Saved spanwise-a25.png.");
    expect(await page.getAttribute("meta[http-equiv='Content-Security-Policy']", "content")).toContain("img-src 'self' data:;");
  });

  it("stays readable at 320 px and follows a dark theme", async () => {
    const dark = await context.newPage();
    await dark.setViewportSize({ width: 320, height: 900 });
    await dark.goto(`${server.url}/taskpane.html?theme=dark`);
    await dark.waitForSelector("body[data-pane-ready='true']", { timeout: 60000 });
    await dark.evaluate(() => document.querySelector("iframe")?.setAttribute("style", "display:none"));
    await dark.evaluate(() => {
      const style = document.createElement("style");
      style.textContent = "body.standalone #pane { width: 320px; }";
      document.head.appendChild(style);
    });
    const frame = dark.frames().find((f) => f.url().endsWith("/workbench.html"));
    await frame?.evaluate(() => (window as any).spanwiseWorkbench.select("Schedule!K11"));
    await dark.waitForSelector(".figure svg g.peak");
    await dark.evaluate(() => (window as any).spanwisePane.redraw());
    const svg = await dark.$eval(".figure svg", (s) => ({ width: s.getAttribute("width"), theme: s.getAttribute("data-theme"), shown: s.getBoundingClientRect().width }));
    expect(svg.theme).toBe("dark");
    expect(Number(svg.width)).toBeLessThanOrEqual(320);
    const outside = await dark.$$eval(".figure svg text", (texts) => {
      const box = document.querySelector(".figure svg")!.getBoundingClientRect();
      return texts.filter((t) => { const r = t.getBoundingClientRect(); return r.left < box.left - 1 || r.right > box.right + 1; }).map((t) => t.textContent);
    });
    expect(outside).toEqual([]);
    await dark.screenshot({ path: path.join(ARTIFACTS, "pane-dark-320.png"), fullPage: true });
    await dark.close();
  });
});
