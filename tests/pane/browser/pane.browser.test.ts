/**
 * The diagram pane in real headless Chromium, on the workbench: the user clicks a cell
 * holding a SPAN formula; the pane draws the member and its peak labels equal the values
 * SPAN.EXTREMES gives in the same workbook. Screenshots go to test-artifacts/.
 */
import fs from "fs";
import path from "path";
import type { BrowserContext, Frame, Page } from "playwright-core";
import { formatValue } from "../../../src/pane/draw/format";
import { ARTIFACTS, OUT, buildPages, openBrowser, serve } from "./pages";

jest.setTimeout(240000);

let context: BrowserContext;
let server: { url: string; close(): Promise<void> };
let page: Page;
let bench: Frame;

async function workbench<T>(body: string, ...args: unknown[]): Promise<T> {
  return bench.evaluate(([code, a]) => new Function("api", "args", code)((window as any).spanwiseWorkbench, a), [body, args] as const) as Promise<T>;
}

/** Clicks a sheet tab and a cell as a user would, then waits until the pane has followed. */
async function clickCell(sheet: string, address: string): Promise<void> {
  await bench.locator("#tabs button", { hasText: sheet }).click();
  const before = await page.$eval("#pane", (p) => Number((p as HTMLElement).dataset.refreshed ?? 0));
  await bench.locator(`td[data-address="${address}"]`).dispatchEvent("mousedown");
  await page.waitForFunction((b) => Number((document.querySelector("#pane") as HTMLElement).dataset.refreshed ?? 0) > b, before);
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
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  await buildPages();
  server = await serve(OUT);
  context = await openBrowser("pane");
  page = await context.newPage();
  page.on("pageerror", (error) => console.error("page error:", error.message));
  await page.goto(`${server.url}/taskpane.html`);
  await page.waitForSelector("body[data-pane-ready='true']", { timeout: 60000 });
  const frame = page.frames().find((f) => f.url().endsWith("/workbench.html"));
  if (!frame) throw new Error("the workbench frame is missing");
  bench = frame;
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

  it("asks before writing over cells that hold anything, and writes nothing on cancel", async () => {
    await clickCell("Member", "A25");
    await waitForSource("Member!A25");
    const before = await workbench<unknown[][]>("return api.getValues('Member!G25:K40')");
    await page.click("#pane .write-table");
    await page.waitForSelector("#pane .confirm:not([hidden])");
    expect(await page.textContent("#pane .confirm p")).toMatch(/^Member!G25:K\d+ already holds something/);
    await page.click("#pane .confirm-no");
    await page.waitForFunction(() => /nothing written/.test(document.querySelector("#pane .message")?.textContent ?? ""));
    expect(await workbench("return api.getValues('Member!G25:K40')")).toEqual(before);
  });

  it("writes a live DIAGRAM table into empty cells and charts over its columns", async () => {
    await workbench("api.setFormula('Member!A50', '=SPAN.MAXMOMENT(B3:C3,A10:F14,B4:D4,B5,B6)')");
    await clickCell("Member", "A50");
    await waitForSource("Member!A50");
    await page.waitForSelector(".figure svg g.peak");
    await page.click("#pane .insert-charts");
    await page.waitForFunction(() => /charts added/.test(document.querySelector("#pane .message")?.textContent ?? ""));
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
