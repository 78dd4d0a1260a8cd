/**
 * Editing the workbench grid in real headless Chromium, as a user does: fill a 100-row study
 * down from one row (values equal direct calls of the functions), paste a block of
 * tab-separated text from the clipboard, undo and redo it, copy, drag a column wider, type in
 * the name box, insert and delete rows, and only the rows in view are in the DOM.
 */
import type { Page } from "playwright-core";
import { deflection, maxMoment, reactions } from "../../functions/functions";
import { direct } from "../engine/support/direct";
import { buildWorkbench, openChromium, serve } from "./support/page";

jest.setTimeout(180000);

const LOADS = "udl 0.45 D; udl 0.8 L"; // Study!B3 of the demo
const EI = 650; // Study!B4

let browser: Awaited<ReturnType<typeof openChromium>>;
let server: { url: string; close(): Promise<void> };
let page: Page;
const problems: string[] = [];

async function api<T>(body: string, ...args: unknown[]): Promise<T> {
  return page.evaluate(([code, a]) => new Function("api", "args", code)((window as any).spanwiseWorkbench, a), [body, args] as const) as Promise<T>;
}

async function click(address: string, modifiers: ("Shift" | "Control")[] = []): Promise<void> {
  await api("api.reveal(args[0])", address);
  await page.click(`td[data-address="${address}"]`, { modifiers });
}

/** Sends a paste event carrying `text` as the system clipboard's plain text, as Ctrl+V from another program does. */
async function pasteText(text: string): Promise<void> {
  await page.evaluate((t) => {
    const data = new DataTransfer();
    data.setData("text/plain", t);
    document.body.dispatchEvent(new ClipboardEvent("paste", { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

/** What a copy event puts on the clipboard (Ctrl+C). */
async function copiedText(): Promise<string> {
  return page.evaluate(() => {
    const data = new DataTransfer();
    document.body.dispatchEvent(new ClipboardEvent("copy", { clipboardData: data, bubbles: true, cancelable: true }));
    return data.getData("text/plain");
  });
}

beforeAll(async () => {
  const out = await buildWorkbench("development");
  server = await serve(out);
  browser = await openChromium("grid");
  await browser.context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: server.url });
  page = await browser.context.newPage();
  page.on("pageerror", (error) => problems.push(error.message));
  await page.goto(`${server.url}/workbench.html`);
  await page.waitForSelector("body[data-ready=true]", { timeout: 30000 });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

afterEach(() => expect(problems).toEqual([]));

describe("fill", () => {
  it("fills a 100-row study down from one row with Ctrl+D; every value equals the direct call", async () => {
    await page.click(".tabs button:has-text('Study')");
    const spans = Array.from({ length: 100 }, (_, i) => 2 + 0.05 * i);
    await api("api.setValues('Study!A20:A119', args[0].map((s) => [s]))", spans);
    await api("api.setValues('Study!B20:C20', [['=INDEX(SPAN.MAXMOMENT(A20,$B$3,,,\"1.2D+1.6L\"),1,1)', '=1000*SPAN.DEFLECTION(A20,$B$3,A20/2,,$B$4,\"D+L\")']])");
    await click("B20");
    await page.fill("#name-box", "B20:C119");
    await page.press("#name-box", "Enter");
    await page.keyboard.press("Control+d");
    expect(await api("return api.getFormula('Study!C119')")).toBe('=1000*SPAN.DEFLECTION(A119,$B$3,A119/2,,$B$4,"D+L")');
    const values = await api<number[][]>("return api.getValues('Study!B20:C119')");
    spans.forEach((span, i) => {
      const m = direct(() => maxMoment([[span]], [[LOADS]], undefined, undefined, "1.2D+1.6L"))[0][0];
      const d = direct(() => deflection([[span]], [[LOADS]], [[span / 2]], undefined, [[EI]], "D+L"))[0][0] as number;
      expect(values[i][0]).toBe(m);
      expect(Math.abs(values[i][1] - 1000 * d)).toBeLessThanOrEqual(1e-12 * Math.abs(1000 * d));
    });
    // One fill is one undo step.
    await page.keyboard.press("Control+z");
    expect(await api("return api.getValues('Study!B21:C119').flat().every((v) => v === null)")).toBe(true);
    await page.keyboard.press("Control+y");
    expect(await api("return api.getValues('Study!B20:C119')")).toEqual(values);
  });

  it("fills right with Ctrl+R and down by dragging the fill handle, relative references moved and $ kept", async () => {
    await api("api.setValues('Study!H20:H23', [[1], [2], [3], [4]]); api.setFormula('Study!I20', '=H20*$E$4')");
    await click("I20");
    const handle = await page.locator(".fill-handle").boundingBox();
    const target = await page.locator('td[data-address="I23"]').boundingBox();
    if (!handle || !target) throw new Error("no fill handle");
    await page.mouse.move(handle.x + 3, handle.y + 3);
    await page.mouse.down();
    await page.mouse.move(target.x + 10, target.y + 10, { steps: 4 });
    await page.mouse.up();
    expect(await api("return [20, 21, 22, 23].map((r) => api.getFormula('Study!I' + r))")).toEqual(["=H20*$E$4", "=H21*$E$4", "=H22*$E$4", "=H23*$E$4"]);
    expect(await api("return api.getValues('Study!I20:I23')")).toEqual([[360], [720], [1080], [1440]]);
    await page.fill("#name-box", "I20:K20");
    await page.press("#name-box", "Enter");
    await page.keyboard.press("Control+r");
    expect(await api("return api.getFormula('Study!K20')")).toBe("=J20*$E$4");
  });
});

describe("clipboard", () => {
  it("pastes tab-separated text from another program (quoted cells, CRLF, trailing newline), undoes and redoes it as one step", async () => {
    await page.click(".tabs button:has-text('Member')");
    const before = await api<unknown[][]>("return api.getValues('Member!H40:J43')");
    await click("H40");
    await pasteText('6 8 6\tudl 2.5 D; point 10 at 3 L\r\n"a ""quoted""\ttab"\t12.5\r\n=SPAN.REACTIONS(H40,I40)\r\n');
    expect(await api("return api.getValues('Member!I41')")).toEqual([[12.5]]);
    expect(await api("return api.getValues('Member!H41')")).toEqual([['a "quoted"\ttab']]);
    const expected = direct(() => reactions([["6 8 6"]], [["udl 2.5 D; point 10 at 3 L"]]));
    expect(await api("return api.getValues('Member!H42:J45')")).toEqual(expected);
    expect(await api("return api.getSelection().address")).toBe("H40:I42");
    await page.keyboard.press("Control+z");
    expect(await api("return api.getValues('Member!H40:J43')")).toEqual(before);
    await page.keyboard.press("Control+Shift+z");
    expect(await api("return api.getValues('Member!H42:J45')")).toEqual(expected);
  });

  it("goes through the system clipboard with the keys: Ctrl+V pastes what another program put there, Ctrl+C puts the range there", async () => {
    await click("H90");
    await page.evaluate(() => navigator.clipboard.writeText("1.5\t=H90*2\r\nx\t\r\n"));
    await page.keyboard.press("Control+v");
    expect(await api("return api.getValues('Member!H90:I91')")).toEqual([[1.5, 3], ["x", null]]);
    await page.fill("#name-box", "H90:I90");
    await page.press("#name-box", "Enter");
    await page.keyboard.press("Control+c");
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe("1.5\t3\r\n");
    // Cut and paste moves the cells: references into the moved block follow it, in it and elsewhere; one undo step.
    await api("api.setFormula('Member!J95', '=H90+I90+$H$90')");
    await page.keyboard.press("Control+x");
    expect(await api("return api.getValues('Member!H90:I90')")).toEqual([[1.5, 3]]);
    await click("H92");
    await page.keyboard.press("Control+v");
    expect(await api("return [api.getFormula('Member!I92'), api.getFormula('Member!J95'), api.getValues('Member!H90:I92')]")).toEqual([
      "=H92*2",
      "=H92+I92+$H$92",
      [[null, null], ["x", null], [1.5, 3]],
    ]);
    expect(await api("return api.getValues('Member!J95')")).toEqual([[6]]);
    await page.keyboard.press("Control+z");
    expect(await api("return [api.getFormula('Member!I90'), api.getFormula('Member!J95'), api.getValues('Member!H90:I92')]")).toEqual([
      "=H90*2",
      "=H90+I90+$H$90",
      [[1.5, 3], ["x", null], [null, null]],
    ]);
  });

  it("copies a range as tab-separated text in full precision, and pastes its formulas moved inside the workbench", async () => {
    await page.fill("#name-box", "H42:J43");
    await page.press("#name-box", "Enter");
    const text = await copiedText();
    const values = await api<unknown[][]>("return api.getValues('Member!H42:J43')");
    expect(text).toBe(values.map((row) => row.map(String).join("\t")).join("\r\n") + "\r\n");
    await page.fill("#name-box", "H40");
    await page.press("#name-box", "Enter");
    const formula = await copiedText();
    expect(formula).toBe("6 8 6\r\n");
    await click("H50");
    await pasteText(formula);
    expect(await api("return api.getValues('Member!H50')")).toEqual([["6 8 6"]]);
    await api("api.copy('Member!H42')");
    await api("api.paste(api.copy('Member!H42'), 'Member!L60')");
    expect(await api("return api.getFormula('Member!L60')")).toBe("=SPAN.REACTIONS(L58,M58)");
  });
});

describe("reading", () => {
  it("drags a column wider; a number in a narrow column rounds to fit or shows ###, the formula bar keeps it exact", async () => {
    await page.click(".tabs button:has-text('Member')");
    await api("api.reveal('Member!B5')");
    const start = await api<number>("return api.columnWidth('B')");
    const grip = await page.locator('thead th[data-col="1"] .resize').boundingBox();
    if (!grip) throw new Error("no column grip");
    await page.mouse.move(grip.x + grip.width / 2, grip.y + grip.height / 2);
    await page.mouse.down();
    await page.mouse.move(grip.x + grip.width / 2 + 80, grip.y + grip.height / 2, { steps: 5 });
    await page.mouse.up();
    expect(await api("return api.columnWidth('B')")).toBe(start + 80);
    expect(Math.round((await page.locator('td[data-address="B5"]').boundingBox())!.width)).toBe(start + 80);
    await api("api.setValues('Member!B40', [[1234.56789012]]); api.setColumnWidth('B', 48)");
    const narrow = await page.textContent('td[data-address="B40"]');
    expect(["1235", "1234.6", "###"]).toContain(narrow);
    await api("api.setColumnWidth('B', 24)");
    expect(await page.textContent('td[data-address="B40"]')).toBe("###");
    await click("B40");
    expect(await page.inputValue("#formula-bar")).toBe("1234.56789012");
    await api("api.setColumnWidth('B', 160)");
    expect(await page.textContent('td[data-address="B40"]')).toBe("1234.57");
  });

  it("names the columns of a spilled SPAN table and shows a selected error's message in full", async () => {
    await page.click(".tabs button:has-text('Member')");
    await click("B18");
    expect(await page.textContent("#status")).toContain("part of the spill of A17 (SPAN.REACTIONS: x | R | M reaction; this column: R)");
    expect(await page.getAttribute('td[data-address="B18"]', "title")).toBe("R: column 2 of the SPAN.REACTIONS table at A17");
    await api("api.setFormula('Member!H70', '=SPAN.MOMENT(B3:C3,A10:F14,40)')");
    await click("H70");
    const status = (await page.textContent("#status")) ?? "";
    const message = (await api<any[][]>("return api.getValues('Member!H70')"))[0][0].message as string;
    expect(message.length).toBeGreaterThan(20);
    expect(status).toBe(`H70: #VALUE! ${message}`);
  });

  it("selects from the name box, and says what it cannot read", async () => {
    await page.fill("#name-box", "Study!B2:D9");
    await page.press("#name-box", "Enter");
    expect(await api("return api.getSelection()")).toMatchObject({ sheet: "Study", address: "B2:D9", activeCell: "B2" });
    expect(await page.inputValue("#name-box")).toBe("B2:D9");
    await page.fill("#name-box", "B2:");
    await page.press("#name-box", "Enter");
    expect(await page.textContent("#status")).toMatch(/"B2:" is not a cell or range/);
    expect(await api("return api.getSelection().address")).toBe("B2:D9");
  });
});

describe("rows", () => {
  it("inserts and deletes rows with formulas following, each one undo step", async () => {
    await page.click(".tabs button:has-text('Study')");
    const values = await api<unknown[][]>("return api.getValues('Study!A6:F12')");
    await page.fill("#name-box", "A8:A9");
    await page.press("#name-box", "Enter");
    await page.click("#insert-rows");
    expect(await api("return api.getValues('Study!A8:F9').flat().every((v) => v === null)")).toBe(true);
    expect(await api("return api.getFormula('Study!B12')")).toBe('=INDEX(SPAN.MAXMOMENT(A12,$B$3,,,"1.2D+1.6L"),1,1)');
    expect(await api("return [...api.getValues('Study!A6:F7'), ...api.getValues('Study!A10:F14')]")).toEqual(values);
    await page.click("#delete-rows");
    expect(await api("return api.getValues('Study!A6:F12')")).toEqual(values);
    await page.fill("#name-box", "A6");
    await page.press("#name-box", "Enter");
    await page.click("#delete-rows");
    expect(await api("return api.getValues('Study!A6:F6')")).toEqual([values[1]]);
    await page.keyboard.press("Control+z");
    expect(await api("return api.getValues('Study!A6:F12')")).toEqual(values);
  });
});

describe("fill handle series and text cells", () => {
  it("extends two numbers dragged down by the fill handle as a series (1, 2 -> 3, 4, 5)", async () => {
    await page.click(".tabs button:has-text('Study')");
    await api("api.setValues('Study!H40:H41', [[1], [2]])");
    await click("H44");
    await click("H40");
    await click("H41", ["Shift"]);
    const handle = await page.locator(".fill-handle").boundingBox();
    const target = await page.locator('td[data-address="H44"]').boundingBox();
    if (!handle || !target) throw new Error("no fill handle");
    await page.mouse.move(handle.x + 3, handle.y + 3);
    await page.mouse.down();
    await page.mouse.move(target.x + 10, target.y + 10, { steps: 4 });
    await page.mouse.up();
    expect(await api("return api.getValues('Study!H40:H44')")).toEqual([[1], [2], [3], [4], [5]]);
  });

  it("shows a text cell's apostrophe in the formula bar only while editing, and the edit keeps it text", async () => {
    await api("api.setValues('Study!H50', [[\"'5\"]])");
    await click("H50");
    expect(await page.inputValue("#formula-bar")).toBe("5");
    await page.dblclick('td[data-address="H50"]');
    expect(await page.inputValue("#formula-bar")).toBe("'5");
    await page.keyboard.press("Enter");
    expect(await api("return api.getValues('Study!H50')")).toEqual([["5"]]);
    await click("H50");
    expect(await page.inputValue("#formula-bar")).toBe("5");
    await page.keyboard.type("7");
    expect(await page.inputValue("#formula-bar")).toBe("7");
    await page.keyboard.press("Enter");
    expect(await api("return api.getValues('Study!H50')")).toEqual([[7]]);
  });
});

describe("editing", () => {
  it("keeps a formula-bar edit when another cell is clicked, as a spreadsheet commits it", async () => {
    await page.click(".tabs button:has-text('Study')");
    await click("H30");
    await page.keyboard.type("42");
    expect(await page.inputValue("#formula-bar")).toBe("42");
    await click("H31");
    expect(await api("return api.getValues('Study!H30:H31')")).toEqual([[42], [null]]);
    expect(await api("return api.getSelection().activeCell")).toBe("H31");
  });
});

describe("delete", () => {
  it("empties a selected range with Delete, one undo step", async () => {
    await page.click(".tabs button:has-text('Study')");
    const before = await api<unknown[][]>("return api.getValues('Study!A6:F8')");
    await page.fill("#name-box", "A6:F8");
    await page.press("#name-box", "Enter");
    await page.keyboard.press("Delete");
    expect(await api("return api.getValues('Study!A6:F8').flat().every((v) => v === null)")).toBe(true);
    expect(await page.textContent('td[data-address="B7"]')).toBe("");
    await page.keyboard.press("Control+z");
    expect(await api("return api.getValues('Study!A6:F8')")).toEqual(before);
  });
});

describe("virtual rows", () => {
  it("keeps only the rows in view in the DOM, on a 2,000-row sheet", async () => {
    await page.click(".tabs button:has-text('Arrangements')");
    await api("api.setValues('Arrangements!J1:J2000', Array.from({ length: 2000 }, (_, i) => [i + 1]))");
    const count = (): Promise<number> => page.$$eval("#sheet tbody tr:not(.spacer)", (rows) => rows.length);
    expect(await count()).toBeLessThan(70);
    expect(await page.$('td[data-address="J1"]')).not.toBeNull();
    expect(await page.$('td[data-address="J2000"]')).toBeNull();
    await page.$eval("#sheet", (el) => (el.scrollTop = el.scrollHeight));
    await page.waitForSelector('td[data-address="J2000"]');
    expect(await page.textContent('td[data-address="J2000"]')).toBe("2000");
    expect(await page.$('td[data-address="J1"]')).toBeNull();
    expect(await count()).toBeLessThan(70);
    // Rows sit where the scroll height says: row 2000's top is 1999 rows below row 1's.
    const top = await page.$eval('td[data-address="J2000"]', (td) => (td as HTMLElement).offsetTop);
    expect(top).toBe(24 + 1999 * 22);
  });

  it("repaints the shown sheet when a write to another sheet changes its values", async () => {
    await page.click(".tabs button:has-text('Checks')");
    await api("api.setFormula('Checks!H3', '=Study!E4*2')");
    expect(await page.textContent('td[data-address="H3"]')).toBe("720");
    await api("api.setValues('Study!E4', [[250]])");
    expect(await page.textContent('td[data-address="H3"]')).toBe("500");
    await api("api.setValues('Study!E4', [[360]])");
  });

  it("grows the sheet to show a cell past its last row, when asked to reveal or select it", async () => {
    await page.click(".tabs button:has-text('Checks')");
    expect(await page.$('td[data-address="C300"]')).toBeNull();
    await api("api.reveal('Checks!C300')");
    expect(await page.$('td[data-address="C300"]')).not.toBeNull();
    await page.fill("#name-box", "D900");
    await page.press("#name-box", "Enter");
    expect(await page.getAttribute('td[data-address="D900"]', "class")).toContain("selected");
    // The whole sheet selected: rows stay virtual, columns stop at 512 (no 16,384 cells a row).
    await page.fill("#name-box", "A1:XFD1048576");
    await page.press("#name-box", "Enter");
    expect(await page.$$eval("#sheet thead th.col", (th) => th.length)).toBe(512);
    expect(await page.$$eval("#sheet tbody tr:not(.spacer)", (rows) => rows.length)).toBeLessThan(70);
    expect(await page.$('td[data-address="A1048576"]')).not.toBeNull();
  });
});
