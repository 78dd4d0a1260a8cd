/**
 * The workbench in real headless Chromium: the page is built (webpack, workbench config only)
 * and served on an ephemeral port; a SPAN formula typed into the formula bar spills values
 * equal to direct calls of the function; editing an input recalculates the spill. Saves the
 * README screenshot to assets/workbench.png.
 */
import fs from "fs";
import os from "os";
import path from "path";
import type http from "http";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import webpack from "webpack";
import { moment, reactions, shear } from "../../functions/functions";
import { createStaticServer, listen } from "../../src/cli/staticServer";
import { direct } from "../engine/support/direct";

const ROOT = path.resolve(__dirname, "..", "..");
const CHROMIUM = "/usr/bin/chromium";
const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

function buildWorkbench(): Promise<void> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const configure = require(path.join(ROOT, "webpack.config.js"));
  const config = configure.workbenchConfig({}, { mode: "development" });
  return new Promise((resolve, reject) =>
    webpack({ ...config, devtool: false }).run((error, stats) => {
      if (error) reject(error);
      else if (stats?.hasErrors()) reject(new Error(stats.toString("errors-only")));
      else resolve();
    }),
  );
}

async function typeInto(page: Page, address: string, text: string): Promise<void> {
  await page.click(`td[data-address="${address}"]`);
  await page.fill("#formula-bar", text);
  await page.press("#formula-bar", "Enter");
}

async function shown(page: Page, top: number, left: number, rows: number, cols: number): Promise<unknown[][]> {
  return page.evaluate(
    ({ top, left, rows, cols }) =>
      Array.from({ length: rows }, (_, r) =>
        Array.from({ length: cols }, (_, c) => {
          const td = document.querySelector(`td[data-row="${top + r}"][data-col="${left + c}"]`) as HTMLElement;
          const text = td.dataset.value ?? "";
          return text !== "" && !Number.isNaN(Number(text)) ? Number(text) : text;
        }),
      ),
    { top, left, rows, cols },
  );
}

describe("workbench page", () => {
  let server: http.Server;
  let context: BrowserContext;
  let page: Page;
  let profile: string;

  beforeAll(async () => {
    await buildWorkbench();
    server = createStaticServer(path.join(ROOT, "dist"));
    const port = await listen(server, 0, "127.0.0.1");
    profile = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-chromium-"));
    context = await chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: ARGS, viewport: { width: 1400, height: 820 } });
    page = await context.newPage();
    const problems: string[] = [];
    page.on("pageerror", (error) => problems.push(error.message));
    await page.goto(`http://127.0.0.1:${port}/workbench.html`);
    await page.waitForSelector("body[data-ready=true]", { timeout: 20000 });
    expect(problems).toEqual([]);
  }, 120000);

  afterAll(async () => {
    await context?.close();
    server?.close();
    if (profile) fs.rmSync(profile, { recursive: true, force: true });
  });

  it("opens with the demo schedule and the caution line", async () => {
    expect(await page.textContent("#caution")).toMatch(/qualified engineer/);
    const api = await page.evaluate(() => window.spanwiseWorkbench.sheets());
    expect(api).toEqual(["Schedule", "Member", "Study", "Arrangements", "Checks"]);
    expect(await page.textContent('td[data-address="A6"]')).toBe("J-201");
  });

  it("spills a typed SPAN.REACTIONS equal to the direct call, and respills after an edit", async () => {
    await page.click(".tabs button:has-text('Study')");
    await typeInto(page, "H3", "6 8 6");
    await typeInto(page, "I3", "udl 2.5 D; point 10 at 3 L");
    await typeInto(page, "H5", "=SPAN.REACTIONS(H3,I3)");
    const expected = direct(() => reactions([["6 8 6"]], [["udl 2.5 D; point 10 at 3 L"]]));
    expect(await shown(page, 4, 7, 4, 3)).toEqual(expected);
    expect(await page.evaluate(() => window.spanwiseWorkbench.getValues("Study!H5:J8"))).toEqual(expected);

    await typeInto(page, "H3", "5 5");
    const after = direct(() => reactions([["5 5"]], [["udl 2.5 D; point 10 at 3 L"]]));
    expect(await shown(page, 4, 7, 3, 3)).toEqual(after);
    expect(await shown(page, 7, 7, 1, 3)).toEqual([["", "", ""]]);
  });

  it("spills SHEAR over a typed row of x and sums it through the # reference", async () => {
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Study!H11:L11", [[0, 2.5, 5, 7.5, 10]]));
    await typeInto(page, "H12", "=SPAN.SHEAR(H3,I3,H11:L11)");
    await typeInto(page, "H13", "=SUM(H12#)");
    const expected = direct(() => shear([["5 5"]], [["udl 2.5 D; point 10 at 3 L"]], [[0, 2.5, 5, 7.5, 10]])) as number[][];
    expect(await shown(page, 11, 7, 1, 5)).toEqual(expected);
    const sum = (await shown(page, 12, 7, 1, 1))[0][0] as number;
    expect(sum).toBeCloseTo(expected[0].reduce((a, b) => a + b, 0), 9);
    expect(await page.evaluate(() => window.spanwiseWorkbench.getFormula("Study!H13"))).toBe("=SUM(H12#)");
  });

  it("spills a formula that is a # reference alone, and shows #SPILL! for a range over a blocked anchor until it is cleared", async () => {
    // Microsoft support, "Spilled range operator" (A2# is A2's whole spill) and Microsoft Learn,
    // "Handle dynamic arrays and spilling using the Excel JavaScript API" (=A4:D4 spills).
    const problems: string[] = [];
    const onError = (error: Error) => problems.push(error.message);
    page.on("pageerror", onError);
    await typeInto(page, "H17", "=H12#");
    const expected = direct(() => shear([["5 5"]], [["udl 2.5 D; point 10 at 3 L"]], [[0, 2.5, 5, 7.5, 10]]));
    expect(await shown(page, 16, 7, 1, 5)).toEqual(expected);
    expect(await page.evaluate(() => window.spanwiseWorkbench.getFormula("Study!H17"))).toBe("=H12#");

    // H5 spills REACTIONS of "5 5" into H5:J7; a value in I6 blocks it.
    await typeInto(page, "I6", "in the way");
    await typeInto(page, "H19", "=H5:H5");
    await typeInto(page, "I19", "=ROWS(H5#)");
    for (const address of ["H5", "H19", "I19"]) expect(await page.textContent(`td[data-address="${address}"]`)).toBe("#SPILL!");
    await page.click('td[data-address="H19"]');
    expect(await page.textContent("#status")).toContain("No space for array result");

    await page.click('td[data-address="I6"]');
    await page.keyboard.press("Delete");
    const table = direct(() => reactions([["5 5"]], [["udl 2.5 D; point 10 at 3 L"]]));
    expect(await shown(page, 4, 7, 3, 3)).toEqual(table);
    expect(await shown(page, 18, 7, 1, 2)).toEqual([[table[0][0], 3]]);
    page.off("pageerror", onError);
    expect(problems).toEqual([]);
  });

  it("shows an error with its message in the status line", async () => {
    await typeInto(page, "H15", "=SPAN.MOMENT(H3,I3,40)");
    const expected = direct(() => moment([["5 5"]], [["udl 2.5 D; point 10 at 3 L"]], [[40]]))[0][0] as { error: string; message: string };
    await page.click('td[data-address="H15"]');
    expect(await page.textContent('td[data-address="H15"]')).toBe("#VALUE!");
    expect(await page.textContent("#status")).toContain(expected.message);
  });

  it("reports the selection and its formula through window.spanwiseWorkbench", async () => {
    await page.click(".tabs button:has-text('Member')");
    await page.click('td[data-address="A17"]');
    await page.click('td[data-address="C19"]', { modifiers: ["Shift"] });
    const selection = await page.evaluate(() => window.spanwiseWorkbench.getSelection());
    expect(selection).toEqual({ sheet: "Member", address: "A17:C19", activeCell: "A17", formula: "=SPAN.REACTIONS(B3:C3,A10:F14,B4:D4,B5,B6)" });
    await page.click('td[data-address="A1"]');
    await page.screenshot({ path: path.join(ROOT, "assets", "workbench.png") });
  });
});
