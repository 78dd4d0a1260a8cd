/**
 * The workbench's files in real headless Chromium: the page is built (webpack, workbench
 * configuration, into test-artifacts/files-dist) and served on an ephemeral port, in a browser
 * profile of its own so that its storage lives across reloads. A user's .xlsx is opened (file
 * picker and drag and drop), its values equal direct calls of the worksheet functions (imported
 * from functions/ in this process), it is saved (a download) part for part as `spanwise calc`
 * writes it, reopened with equal values; the work survives a reload; sheets are added and
 * renamed; bad stored data, a too-large file and unsaved changes are handled with messages.
 */
import fs from "fs";
import os from "os";
import path from "path";
import type http from "http";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import webpack from "webpack";
import { reactions } from "../../functions/functions";
import { createStaticServer, listen } from "../../src/cli/staticServer";
import type { CellResult } from "../../src/engine";
import { direct } from "../engine/support/direct";
import { evaluateBook, readBook } from "../../src/cli/xlsxBook";
import { LOADS, SPANS, calcOutput, partsOf, smallBook } from "./support/smallBook";

const ROOT = path.resolve(__dirname, "..", "..");
const OUT = path.join(ROOT, "test-artifacts", "files-dist");
const DEMO = path.join(ROOT, "assets", "spanwise-demo.xlsx");
const CHROMIUM = "/usr/bin/chromium";
const ARGS = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

function buildWorkbench(): Promise<void> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const configure = require(path.join(ROOT, "webpack.config.js"));
  const config = configure.workbenchConfig({}, { mode: "development" });
  return new Promise((resolve, reject) =>
    webpack({ ...config, devtool: false, output: { ...config.output, path: OUT }, infrastructureLogging: { level: "error" } }).run((error, stats) => {
      if (error) reject(error);
      else if (stats?.hasErrors()) reject(new Error(stats.toString("errors-only")));
      else resolve();
    }),
  );
}

/** The A1 range of a block of `rows` x `cols` from a top-left cell (columns A to Z). */
function block(sheet: string, col: string, row: number, rows: number, cols: number): string {
  return `${sheet}!${col}${row}:${String.fromCharCode(col.charCodeAt(0) + cols - 1)}${row + rows - 1}`;
}

const blank = (v: CellResult) => (v === null ? "" : v);
const blanks = (rows: CellResult[][]) => rows.map((row) => row.map(blank));

describe("workbench files", () => {
  let server: http.Server;
  let context: BrowserContext;
  let page: Page;
  let profile: string;
  let base: string;
  const problems: string[] = [];
  const dialogs: string[] = [];
  let answer: "accept" | "dismiss" = "accept";

  const values = (range: string) => page.evaluate((r) => window.spanwiseWorkbench.getValues(r), range);
  const sheets = () => page.evaluate(() => window.spanwiseWorkbench.sheets());
  const message = () => page.textContent("#file-message");

  async function load(): Promise<void> {
    await page.goto(`${base}/workbench.html`);
    await page.waitForSelector("body[data-ready=true]", { timeout: 30000 });
  }

  async function saved(): Promise<void> {
    await page.evaluate(() => window.spanwiseFiles.flush());
    await page.waitForFunction(() => /^Saved in this browser/.test(document.getElementById("save-state")?.textContent ?? ""));
  }

  async function download(): Promise<Uint8Array> {
    const [file] = await Promise.all([page.waitForEvent("download"), page.click("#file-save")]);
    return new Uint8Array(fs.readFileSync((await file.path())!));
  }

  async function openByPicker(name: string, bytes: Uint8Array): Promise<void> {
    await page.setInputFiles("#file-input", { name, mimeType: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", buffer: Buffer.from(bytes) });
    await page.waitForFunction((n) => (document.getElementById("file-message")?.textContent ?? "").match(new RegExp(`^(Opened|Cannot open) ${n}`)), name.replace(/\./g, "\\."));
  }

  beforeAll(async () => {
    await buildWorkbench();
    server = createStaticServer(OUT);
    base = `http://127.0.0.1:${await listen(server, 0, "127.0.0.1")}`;
    profile = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-files-"));
    context = await chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: ARGS, viewport: { width: 1400, height: 820 }, acceptDownloads: true });
    page = await context.newPage();
    page.on("pageerror", (error) => problems.push(error.message));
    page.on("dialog", (dialog) => {
      dialogs.push(dialog.type() === "beforeunload" ? "beforeunload" : dialog.message());
      void (answer === "accept" ? dialog.accept() : dialog.dismiss());
    });
    await load();
  }, 180000);

  afterAll(async () => {
    await context?.close();
    server?.close();
    if (profile) fs.rmSync(profile, { recursive: true, force: true });
  });

  afterEach(() => expect(problems).toEqual([]));

  it("starts on the demo with nothing stored", async () => {
    expect(await sheets()).toEqual(["Schedule", "Member", "Study", "Arrangements", "Checks"]);
    expect(await page.textContent("#save-state")).toMatch(/Nothing kept in this browser yet/);
    expect(await page.textContent("#file-name")).toBe("spanwise-demo.xlsx");
  });

  it("opens the demo .xlsx with the picker: values equal direct calls, and equal the CLI's evaluation of the file", async () => {
    const bytes = new Uint8Array(fs.readFileSync(DEMO));
    await openByPicker("spanwise-demo.xlsx", bytes);
    expect(await message()).toMatch(/^Opened spanwise-demo\.xlsx: 5 sheets/);
    const [spans, loads, supports, ei, combo] = await Promise.all(["Member!B3:C3", "Member!A10:F14", "Member!B4:D4", "Member!B5", "Member!B6"].map(values));
    const expected = direct(() => reactions(blanks(spans), blanks(loads), blanks(supports), blanks(ei), blank(combo[0][0])));
    expect(expected.length).toBeGreaterThan(1);
    expect(blanks(await values(block("Member", "A", 17, expected.length, expected[0].length)))).toEqual(expected);
    const cli = evaluateBook(await readBook(bytes));
    for (const [id, name] of cli.sheetNames().entries()) {
      const sheet = cli.getSheetValues(id);
      const last = `${String.fromCharCode(64 + Math.max(1, sheet[0]?.length ?? 1))}${Math.max(1, sheet.length)}`;
      expect(blanks(await values(`'${name}'!A1:${last}`))).toEqual(blanks(sheet));
    }
    cli.destroy();
  });

  it("saves the unchanged demo as a download, part for part as spanwise calc writes it", async () => {
    const bytes = await download();
    expect(await partsOf(bytes)).toEqual(await partsOf(await calcOutput(new Uint8Array(fs.readFileSync(DEMO)))));
    expect(await message()).toMatch(/^Saved spanwise-demo\.xlsx/);
  });

  it("opens a small workbook dropped onto the page, edits it, saves, and reopens the saved file with equal values", async () => {
    const bytes = await smallBook();
    await page.evaluate(
      ({ data }) => {
        const transfer = new DataTransfer();
        transfer.items.add(new File([new Uint8Array(data)], "small.xlsx"));
        document.dispatchEvent(new DragEvent("dragover", { dataTransfer: transfer, bubbles: true, cancelable: true }));
        document.dispatchEvent(new DragEvent("drop", { dataTransfer: transfer, bubbles: true, cancelable: true }));
      },
      { data: Array.from(bytes) },
    );
    await page.waitForFunction(() => /^Opened small\.xlsx/.test(document.getElementById("file-message")?.textContent ?? ""));
    expect(await sheets()).toEqual(["Beam", "Other sheet"]);
    const first = direct(() => reactions([[SPANS]], [[LOADS]]));
    expect(await values(block("Beam", "B", 3, first.length, first[0].length))).toEqual(first);

    await page.evaluate(() => window.spanwiseWorkbench.setValues("Beam!A1", [["5 5"]]));
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Beam!E1", [["=SPAN.REACTIONS(A1,A2)"]]));
    const after = direct(() => reactions([["5 5"]], [[LOADS]]));
    expect(await values(block("Beam", "B", 3, after.length, after[0].length))).toEqual(after);
    const savedBytes = await download();

    await openByPicker("small.xlsx", savedBytes);
    expect(await message()).toMatch(/^Opened small\.xlsx/);
    expect(await values(block("Beam", "B", 3, after.length, after[0].length))).toEqual(after);
    expect(await values(block("Beam", "E", 1, after.length, after[0].length))).toEqual(after);
    expect(await values("'Other sheet'!A1:B1")).toEqual([[6, 3]]);
  });

  it("adds a sheet and renames sheets by double-clicking a tab, refusing a bad name with the reason", async () => {
    await page.click("#sheet-add");
    expect(await sheets()).toEqual(["Beam", "Other sheet", "Sheet3"]);
    expect(await page.evaluate(() => window.spanwiseWorkbench.activeSheet())).toBe("Sheet3");

    await page.dblclick("#tabs button:has-text('Beam')");
    await page.fill("#tabs input.tab-rename", "a/b");
    await page.press("#tabs input.tab-rename", "Enter");
    expect(await message()).toMatch(/Cannot rename "Beam": a sheet name cannot contain \//);
    await page.fill("#tabs input.tab-rename", "other SHEET");
    await page.press("#tabs input.tab-rename", "Enter");
    expect(await message()).toMatch(/there is a sheet named "Other sheet" already/);
    await page.fill("#tabs input.tab-rename", "Level 2 beam");
    await page.press("#tabs input.tab-rename", "Enter");
    expect(await sheets()).toEqual(["Level 2 beam", "Other sheet", "Sheet3"]);
    // The formula naming the sheet follows it.
    expect(await page.evaluate(() => window.spanwiseWorkbench.getFormula("'Other sheet'!A1"))).toBe("='Level 2 beam'!C1*3");
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Sheet3!A1", [["='Level 2 beam'!C1+1"]]));
    expect(await values("Sheet3!A1")).toEqual([[3]]);
  });

  it("keeps the work across a reload", async () => {
    await saved();
    await load();
    expect(await sheets()).toEqual(["Level 2 beam", "Other sheet", "Sheet3"]);
    expect(await page.textContent("#file-name")).toBe("small.xlsx");
    expect(await message()).toMatch(/^Restored small\.xlsx/);
    const after = direct(() => reactions([["5 5"]], [[LOADS]]));
    expect(await values(block("'Level 2 beam'", "B", 3, after.length, after[0].length))).toEqual(after);
    expect(await values("Sheet3!A1")).toEqual([[3]]);
  });

  it("asks before the page is left with a change not stored yet, then stores it", async () => {
    dialogs.length = 0;
    await page.click("#formula-bar"); // the browser asks only after the user has interacted with the page
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Sheet3!C3", [[7]]));
    expect(await page.evaluate(() => window.spanwiseFiles.safeToLeave())).toBe(false);
    await load();
    expect(dialogs).toEqual(["beforeunload"]);
    await saved();
    expect(await page.evaluate(() => window.spanwiseFiles.safeToLeave())).toBe(true);
  });

  it("asks before replacing a book with changes not saved to a file, and keeps it when told no", async () => {
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Sheet3!B2", [[42]]));
    answer = "dismiss";
    dialogs.length = 0;
    await page.click("#file-new");
    expect(dialogs).toEqual([expect.stringMatching(/^small\.xlsx has changes not saved to a file/)]);
    expect(await sheets()).toEqual(["Level 2 beam", "Other sheet", "Sheet3"]);
    expect(await values("Sheet3!B2")).toEqual([[42]]);
    answer = "accept";
    await page.click("#file-new");
    await page.waitForFunction(() => window.spanwiseWorkbench.sheets().join() === "Sheet1");
    expect(await page.textContent("#file-name")).toBe("workbook.xlsx");
  });

  it("refuses a file beyond the size limit, and a file that is not a workbook, with messages", async () => {
    await openByPicker("huge.xlsx", new Uint8Array(21 * 1024 * 1024));
    expect(await message()).toBe("Cannot open huge.xlsx: the file is 21.0 MB; the workbench opens files up to 20.0 MB (use `spanwise calc` for larger workbooks)");
    await openByPicker("notes.xlsx", new TextEncoder().encode("just text"));
    expect(await message()).toMatch(/^Cannot open notes\.xlsx: the file is not a zip archive/);
    expect(await page.getAttribute("#file-message", "class")).toContain("error");
    expect(await sheets()).toEqual(["Sheet1"]);
  });

  it("falls back to the demo with a message when the stored work is damaged, setting it aside", async () => {
    await saved();
    await page.evaluate(
      () =>
        new Promise<void>((resolve, reject) => {
          const open = indexedDB.open("spanwise-workbench", 1);
          open.onsuccess = () => {
            const tx = open.result.transaction("work", "readwrite");
            tx.objectStore("work").put({ format: "spanwise-workbench", version: 1, name: "x.xlsx", savedAt: "", origin: { kind: "sheets", sheets: [{ name: "A", cells: [[{}]] }] }, sheets: ["A"], changes: [], unsavedToFile: false }, "current");
            tx.oncomplete = () => {
              open.result.close();
              resolve();
            };
            tx.onerror = () => reject(tx.error);
          };
        }),
    );
    await load();
    expect(await sheets()).toEqual(["Schedule", "Member", "Study", "Arrangements", "Checks"]);
    expect(await message()).toMatch(/could not be restored \(origin sheet "A" row 1 column 1: a cell holds object, not a value or formula\); it was set aside and the demo is shown/);
  });

  it("discards the stored work and shows the demo", async () => {
    await page.evaluate(() => window.spanwiseWorkbench.setValues("Schedule!A6", [["changed"]]));
    await saved();
    await page.click("#file-discard");
    await page.waitForFunction(() => document.getElementById("file-message")?.textContent === "The demo workbook, as shipped.");
    expect(await values("Schedule!A6")).toEqual([["J-201"]]);
    await saved();
    await load();
    expect(await values("Schedule!A6")).toEqual([["J-201"]]);
  });
});
