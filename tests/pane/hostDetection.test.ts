/**
 * Start-up: inside the host the pane waits for Office however long it takes; it runs on the
 * workbench only where there is no host. Source for the signal: "once Office.js determines
 * that it is running outside of an Office host application, it will call the callback and
 * resolve the promise with null for both the host and platform"
 * (https://learn.microsoft.com/office/dev/add-ins/develop/initialize-add-in, "Initialize with
 * Office.onReady()"); ../shared/TOOLCHAIN.md ("Office libraries") saw the same on this machine.
 */
import * as fs from "fs";
import * as path from "path";
import { SLOW_START_MESSAGE, NO_OFFICE_JS_MESSAGE, SLOW_START_MS, detectHost, type OfficeReady } from "../../src/pane/hostDetection";

/** An Office global whose onReady answers after `ms` with `info` (or never, for Infinity). */
function office(ms: number, info: { host: unknown; platform?: unknown } | null): OfficeReady {
  return {
    onReady: () => new Promise((resolve) => (Number.isFinite(ms) ? setTimeout(() => resolve(info), ms) : undefined)),
    HostType: { Excel: "Excel" },
  };
}

beforeEach(() => jest.useFakeTimers());
afterEach(() => jest.useRealTimers());

async function settle<T>(promise: Promise<T>, ms: number): Promise<{ done: boolean; value?: T }> {
  let state: { done: boolean; value?: T } = { done: false };
  void promise.then((value) => (state = { done: true, value }));
  await jest.advanceTimersByTimeAsync(ms);
  return state;
}

describe("detectHost", () => {
  it.each([
    ["at once", 0],
    ["after the old 3 s limit", 3500],
    ["after a minute (a cold start of the desktop host)", 60000],
  ])("in Excel, answering %s, the pane uses Excel — never the workbench", async (_name, ms) => {
    const notices: string[] = [];
    const result = await settle(detectHost({ office: office(ms, { host: "Excel", platform: "PC" }), framedByOtherPage: true, onSlow: (m) => notices.push(m) }), ms + 1);
    expect(result).toEqual({ done: true, value: { kind: "excel", platform: "PC" } });
    expect(notices).toEqual(ms > SLOW_START_MS ? [SLOW_START_MESSAGE] : []);
  });

  it("while Office has not answered it keeps waiting, with one notice, and decides nothing", async () => {
    const notices: string[] = [];
    const result = await settle(detectHost({ office: office(Infinity, null), framedByOtherPage: true, onSlow: (m) => notices.push(m) }), 10 * 60000);
    expect(result.done).toBe(false);
    expect(notices).toEqual([SLOW_START_MESSAGE]);
  });

  it("office.js reporting no host (a page opened in a browser) means standalone", async () => {
    expect((await settle(detectHost({ office: office(20, { host: null, platform: null }), framedByOtherPage: false, onSlow: () => undefined }), 50)).value).toEqual({ kind: "standalone" });
  });

  it("without office.js: standalone on a page of its own, refused with a message inside another page's frame", async () => {
    expect(await detectHost({ office: undefined, framedByOtherPage: false, onSlow: () => undefined })).toEqual({ kind: "standalone" });
    expect(await detectHost({ office: undefined, framedByOtherPage: true, onSlow: () => undefined })).toEqual({ kind: "refused", message: NO_OFFICE_JS_MESSAGE });
  });

  it("another Office application, or onReady failing, is refused with a message, not an exception", async () => {
    expect((await settle(detectHost({ office: office(0, { host: "Word", platform: "PC" }), framedByOtherPage: true, onSlow: () => undefined }), 1)).value).toEqual({
      kind: "refused",
      message: "The Spanwise pane works in Excel; this is Word.",
    });
    const failing: OfficeReady = { onReady: () => Promise.reject(new Error("boom")) };
    expect(await detectHost({ office: failing, framedByOtherPage: true, onSlow: () => undefined })).toEqual({ kind: "refused", message: "Office did not start the pane: boom" });
  });
});

describe("taskpane.ts start-up", () => {
  it("decides through detectHost, with no race of Office against a timer", () => {
    const source = fs.readFileSync(path.join(__dirname, "../../src/pane/taskpane.ts"), "utf8");
    expect(source).toMatch(/detectHost\(/);
    expect(source).not.toMatch(/Promise\.race|onReady\(/);
  });
});
