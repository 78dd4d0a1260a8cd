/**
 * The report's title block kept in the workbook's document settings.
 * Host requirements, from the platform documentation:
 * - "Office.Settings interface" (https://learn.microsoft.com/javascript/api/office/office.settings):
 *   settings are "saved per add-in and per document"; `set` changes the in-memory copy and
 *   "The developer is responsible for calling the saveAsync method after adding or deleting
 *   settings to save the settings in the document"; get, set and saveAsync belong to the
 *   requirement set "Settings".
 * - "Office Common API requirement sets"
 *   (https://learn.microsoft.com/javascript/api/requirement-sets/common/office-add-in-requirement-sets):
 *   every Common set is version 1.1 unless stated otherwise.
 * So: a write must call saveAsync after set (and fail when the save fails), and a host
 * without Settings 1.1 must be refused before any settings call, with a message.
 */
import { SheetHostError } from "../../src/pane/host";
import { OfficeHost, type OfficeLike } from "../../src/pane/officeHost";
import { OPTIONAL } from "../../src/pane/requirements";
import { TITLE_FIELD_LIMIT, TITLE_SETTING, loadTitle, saveTitle, titleFromSetting } from "../../src/pane/titleSettings";
import { WorkbenchHost, type WorkbenchLike } from "../../src/pane/workbenchHost";
import { EMPTY_TITLE } from "../../src/report/titleBlock";

/** Office.context.document.settings as documented: an in-memory bag, persisted only by saveAsync. */
class FakeSettings {
  memory = new Map<string, unknown>();
  saved = new Map<string, unknown>();
  calls: string[] = [];
  failSave = false;
  get(name: string): unknown {
    this.calls.push(`get ${name}`);
    return this.memory.has(name) ? this.memory.get(name) : null;
  }
  set(name: string, value: unknown): void {
    this.calls.push(`set ${name}`);
    this.memory.set(name, structuredClone(value));
  }
  saveAsync(callback: (result: { status: string; error?: { message: string } }) => void): void {
    this.calls.push("saveAsync");
    setTimeout(() => {
      if (this.failSave) callback({ status: "failed", error: { message: "the document is read-only" } });
      else {
        this.saved = new Map(this.memory);
        callback({ status: "succeeded" });
      }
    }, 0);
  }
}

function officeHost(settings: FakeSettings | undefined, supported: (name: string, version: string) => boolean = () => true): OfficeHost {
  const office = {
    context: { document: { addHandlerAsync: () => undefined, removeHandlerAsync: () => undefined, settings } },
    EventType: { DocumentSelectionChanged: "documentSelectionChanged" },
  } as unknown as OfficeLike;
  return new OfficeHost(async () => {
    throw new Error("no Excel batch is needed for settings");
  }, office, supported);
}

const TITLE = { project: "Hall 3", job: "J-17", mark: "B-213", by: "AE", checked: "CK", date: "2026-12-02", revision: "A" };

describe("title block in the document settings (spreadsheet host)", () => {
  it("keeps it with set then saveAsync, and reads it back in a new pane of the same workbook", async () => {
    const settings = new FakeSettings();
    const host = officeHost(settings);
    expect(await loadTitle(host)).toEqual({ kept: true, title: EMPTY_TITLE, stored: false });
    await saveTitle(host, TITLE);
    expect(settings.calls.slice(-2)).toEqual([`set ${TITLE_SETTING}`, "saveAsync"]);
    expect(settings.saved.get(TITLE_SETTING)).toEqual(TITLE);
    // A later session loads the saved copy with the document.
    const reopened = new FakeSettings();
    reopened.memory = new Map(settings.saved);
    expect(await loadTitle(officeHost(reopened))).toEqual({ kept: true, title: TITLE, stored: true });
  });

  it("a failed save rejects with the host's reason (never reported as kept)", async () => {
    const settings = new FakeSettings();
    settings.failSave = true;
    await expect(saveTitle(officeHost(settings), TITLE)).rejects.toThrow(/did not save the setting in the workbook: the document is read-only/);
    expect(settings.saved.size).toBe(0);
  });

  it("without the Settings 1.1 requirement set nothing is called and the pane is told why", async () => {
    const settings = new FakeSettings();
    const asked: string[] = [];
    const host = officeHost(settings, (name, version) => {
      asked.push(`${name} ${version}`);
      return name !== "Settings";
    });
    const loaded = await loadTitle(host);
    expect(loaded.kept).toBe(false);
    expect(loaded.kept === false && loaded.reason).toMatch(/requirement set Settings 1\.1/);
    await expect(saveTitle(host, TITLE)).rejects.toMatchObject({ code: "RequirementNotMet" });
    expect(settings.calls).toEqual([]);
    expect(asked).toContain(`${OPTIONAL.settings.name} ${OPTIONAL.settings.version}`);
  });

  it("an office.js without document settings is refused like a missing set", async () => {
    await expect(officeHost(undefined).readSetting("x")).rejects.toBeInstanceOf(SheetHostError);
    expect((await loadTitle(officeHost(undefined))).kept).toBe(false);
  });
});

describe("title block on the workbench and at the boundary", () => {
  it("the workbench keeps it beside its workbook, as a copy", async () => {
    const host = new WorkbenchHost({} as WorkbenchLike);
    expect((await loadTitle(host)).title).toEqual(EMPTY_TITLE);
    const kept = { ...TITLE };
    await saveTitle(host, kept);
    kept.mark = "changed after keeping";
    expect(await loadTitle(host)).toEqual({ kept: true, title: TITLE, stored: true });
  });

  it("the workbench's title block belongs to its workbook: another book opened starts with none, as another document does", async () => {
    let serial = 0;
    const host = new WorkbenchHost({ bookSerial: () => serial } as WorkbenchLike);
    await saveTitle(host, TITLE);
    expect(host.workbookKey()).toBe(0);
    serial = 1; // what the workbench's replaceBook does when a file is opened or a new book started
    expect(host.workbookKey()).toBe(1);
    expect(await loadTitle(host)).toEqual({ kept: true, title: EMPTY_TITLE, stored: false });
    await saveTitle(host, { ...TITLE, mark: "B2" });
    expect((await loadTitle(host)).title.mark).toBe("B2");
  });

  it.each([
    ["a JSON text", JSON.stringify(TITLE), TITLE],
    ["unknown fields and non-text values dropped", { ...TITLE, extra: "x", by: { evil: 1 }, job: 42 }, { ...TITLE, by: "", job: "42" }],
    ["not an object", [1, 2], EMPTY_TITLE],
    ["broken JSON", "{not json", EMPTY_TITLE],
    ["null", null, EMPTY_TITLE],
    ["control characters and length cut", { project: `a\u0000b\nc${"x".repeat(300)}` }, { ...EMPTY_TITLE, project: `a b c${"x".repeat(TITLE_FIELD_LIMIT - 5)}` }],
  ])("what a host hands back is validated: %s", (_, value, expected) => {
    expect(titleFromSetting(value)).toEqual(expected);
  });
});
