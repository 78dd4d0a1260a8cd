/**
 * The workbench's document (src/workbench/files/document.ts) and autosave
 * (src/workbench/files/autosave.ts): what changed is the difference from the cells first read,
 * a stored record restores the same book (values equal), undoing a change leaves nothing
 * changed, the open limits refuse with a message, and a failing store (a full quota) is
 * reported in the save state, never silently.
 */
import { Autosave, saveStateText, type SaveState } from "../../src/workbench/files/autosave";
import JSZip from "jszip";
import { declaredUnpackedSize, WorkbenchDocument } from "../../src/workbench/files/document";
import { LimitError, OPEN_LIMITS } from "../../src/workbench/files/limits";
import { storageProblem, type WorkStore } from "../../src/workbench/files/store";
import { decodeWork, encodeWorkText, type StoredWork } from "../../src/workbench/files/storedWork";
import { LOADS, SPANS, smallBook } from "./support/smallBook";

function record(doc: WorkbenchDocument): StoredWork {
  return { format: "spanwise-workbench", version: 1, name: doc.name, savedAt: new Date(0).toISOString(), origin: doc.origin, sheets: doc.sheetNames(), changes: doc.allChanges(), unsavedToFile: true };
}

async function restored(work: StoredWork): Promise<WorkbenchDocument> {
  const doc = work.origin.kind === "file" ? await WorkbenchDocument.fromFile(work.name, work.origin.bytes) : WorkbenchDocument.fromSheets(work.name, work.origin.sheets);
  doc.apply(work.sheets, work.changes);
  return doc;
}

function allValues(doc: WorkbenchDocument): unknown {
  return doc.sheetNames().map((name, id) => [name, doc.book.getSheetValues(id)]);
}

describe("the workbench document", () => {
  it("reports the cells changed from the origin, and nothing once a change is undone", async () => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook());
    const beam = doc.book.sheetId("Beam");
    expect(doc.allChanges()).toEqual([]);
    doc.book.setCell(beam, 0, 2, 7);
    doc.book.setCell(beam, 7, 0, null);
    doc.book.setCell(beam, 20, 5, "=C1*2");
    expect(doc.allChanges()).toEqual([
      [beam, 0, 2, 7],
      [beam, 7, 0, null],
      [beam, 20, 5, "=C1*2"],
    ]);
    doc.book.setCell(beam, 0, 2, 2);
    doc.book.setCell(beam, 7, 0, 1);
    doc.book.setCell(beam, 20, 5, null);
    expect(doc.allChanges()).toEqual([]);
    doc.destroy();
  });

  it.each(["object", "text"])("restores a file's book with renamed and added sheets from a stored record (%s form)", async (form) => {
    const doc = await WorkbenchDocument.fromFile("book.xlsx", await smallBook());
    doc.renameSheet("Beam", "Other"); // swapped names need the temporary names on restore
    doc.renameSheet("Other sheet", "Beam");
    doc.renameSheet("Other", "Other sheet");
    const added = doc.addSheet("Added");
    doc.book.setCells(added, 0, 0, [[SPANS, LOADS, "=SPAN.REACTIONS(A1,B1)"]]);
    doc.book.setCell(doc.book.sheetId("Other sheet"), 0, 2, 10);
    const stored = record(doc);
    const back = await restored(decodeWork(form === "text" ? encodeWorkText(stored) : stored));
    expect(back.sheetNames()).toEqual(["Other sheet", "Beam", "Added"]);
    expect(allValues(back)).toEqual(allValues(doc));
    expect(back.allChanges()).toEqual(doc.allChanges());
    back.destroy();
    doc.destroy();
  });

  it("restores a book of plain sheets", async () => {
    const doc = WorkbenchDocument.fromSheets("new.xlsx", [{ name: "Sheet1", cells: [[SPANS, LOADS], [null, "=SPAN.REACTIONS(A1,B1)"]] }]);
    doc.book.setCell(0, 0, 0, "5 5");
    const back = await restored(decodeWork(encodeWorkText(record(doc))));
    expect(allValues(back)).toEqual(allValues(doc));
    back.destroy();
    doc.destroy();
  });

  it("refuses a file beyond the open limits, and a book of too many cells, with the limit named", async () => {
    await expect(WorkbenchDocument.fromFile("big.xlsx", new Uint8Array(OPEN_LIMITS.fileBytes + 1))).rejects.toThrow(LimitError);
    await expect(WorkbenchDocument.fromFile("big.xlsx", new Uint8Array(OPEN_LIMITS.fileBytes + 1))).rejects.toThrow(/up to 20.0 MB/);
    const row = new Array(1000).fill(1);
    const cells = Array.from({ length: OPEN_LIMITS.cells / 1000 + 1 }, () => row);
    expect(() => WorkbenchDocument.fromSheets("many.xlsx", [{ name: "A", cells }])).toThrow(/301,000 non-empty cells; the workbench opens at most 300,000/);
  });

  it("reads the unpacked size the zip declares (what the unpacked-size limit is checked against)", async () => {
    const bytes = await smallBook();
    const zip = await JSZip.loadAsync(bytes);
    let total = 0;
    for (const file of Object.values(zip.files)) if (!file.dir) total += (await file.async("uint8array")).byteLength;
    expect(total).toBeGreaterThan(1000);
    expect(await declaredUnpackedSize(bytes)).toBe(total);
  });

  it("refuses a file that is not a workbook with the reader's reason", async () => {
    await expect(WorkbenchDocument.fromFile("notes.xlsx", new TextEncoder().encode("plain text"))).rejects.toThrow(/not a zip archive/);
  });
});

describe("autosave", () => {
  const stored: StoredWork[] = [];
  const store = (fail?: () => Error): WorkStore => ({
    kind: "IndexedDB",
    load: async () => undefined,
    save: async (work) => {
      if (fail) throw fail();
      stored.push(work);
    },
    setAside: async () => undefined,
    clear: async () => undefined,
  });
  const snapshot = (n: number) => ({ name: `v${n}` }) as unknown as StoredWork;

  it("saves nothing when nothing changed (leaving the page stores no stale state over newer work)", async () => {
    stored.length = 0;
    await new Autosave(store(), () => snapshot(1), () => undefined).flush();
    expect(stored).toEqual([]);
  });

  it("saves once after a burst of changes, the last state", async () => {
    stored.length = 0;
    const states: SaveState["kind"][] = [];
    let n = 0;
    const autosave = new Autosave(store(), () => snapshot(++n), (s) => states.push(s.kind), undefined, 20);
    autosave.changed();
    autosave.changed();
    autosave.changed();
    await new Promise((resolve) => setTimeout(resolve, 80));
    expect(stored.map((w) => w.name)).toEqual(["v1"]);
    expect(states).toEqual(["pending", "pending", "pending", "saving", "saved"]);
  });

  it("reports a full quota in the save state", async () => {
    const quota = Object.assign(new Error("The quota has been exceeded."), { name: "QuotaExceededError" });
    const states: SaveState[] = [];
    const autosave = new Autosave(store(() => quota), () => snapshot(1), (s) => states.push(s), undefined, 1);
    autosave.changed();
    await autosave.flush();
    const last = states[states.length - 1];
    expect(last.kind).toBe("failed");
    expect(saveStateText(last, "IndexedDB")).toBe("Not saved: the browser's storage for this page is full (free space, or save the workbook as a file)");
    expect(storageProblem(Object.assign(new Error("denied"), { name: "SecurityError" }))).toMatch(/does not allow storage/);
  });

  it("says why when there is no storage at all", async () => {
    const states: SaveState[] = [];
    const autosave = new Autosave(undefined, () => snapshot(1), (s) => states.push(s), "no browser storage for this page (blocked)");
    autosave.changed();
    await autosave.flush();
    expect(states).toEqual([{ kind: "pending" }, { kind: "failed", reason: "no browser storage for this page (blocked)" }]);
  });
});
