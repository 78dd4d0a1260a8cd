/**
 * The files commands of the workbench: new book, open, save as .xlsx, add and rename sheets,
 * discard back to the demo, and the work kept in the browser (restored on load, autosaved
 * after changes). They hold the current document and tell the page what to show through `FilesUi`.
 *
 * Nothing typed is lost: replacing a book with changes not saved to a file asks first; a
 * record in storage that cannot be restored is set aside (not deleted) and the demo shown
 * with the reason; a failed autosave is shown until a save succeeds.
 */
import type { SheetInput } from "../../engine";
import { Autosave, saveStateText, type SaveState } from "./autosave";
import type { BookHost } from "./bookHost";
import { WorkbenchDocument } from "./document";
import { saveName, saveXlsx } from "./saveXlsx";
import { nextSheetName, sheetNameProblem } from "./sheetNames";
import type { WorkStore } from "./store";
import { decodeWork, WORK_FORMAT, WORK_VERSION, type StoredWork } from "./storedWork";

export const XLSX_TYPE = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

export interface FilesUi {
  confirm(question: string): boolean;
  download(fileName: string, bytes: Uint8Array): void;
  /** A message for the user (kind "error" is shown as one); "" clears it. */
  message(text: string, kind?: "info" | "error"): void;
  saveState(text: string, state: SaveState["kind"]): void;
  fileName(text: string): void;
  /** Busy while a file is read or written (buttons disabled). */
  busy(on: boolean): void;
}

export interface Demo {
  name: string;
  sheets: readonly SheetInput[];
}

function reasonOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** Lets the page paint a "busy" state before a long synchronous evaluation. */
function nextFrame(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

export class FilesCommands {
  private doc!: WorkbenchDocument;
  private unsavedToFile = false;
  private replacing = false;
  /** A file being read or written: another open or save waits for it. */
  private working = false;
  private readonly autosave: Autosave;

  constructor(
    private readonly host: BookHost,
    private readonly store: WorkStore | undefined,
    private readonly ui: FilesUi,
    private readonly demo: Demo,
    noStoreReason?: string,
  ) {
    this.autosave = new Autosave(store, () => this.snapshot(), (state) => ui.saveState(saveStateText(state, store?.kind ?? "none"), state.kind), noStoreReason);
    host.onChange(() => {
      if (this.replacing) return;
      this.unsavedToFile = true;
      this.autosave.changed();
    });
  }

  document(): WorkbenchDocument {
    return this.doc;
  }

  /** The first book: the stored work if there is one that can be restored, else `initial` (the demo, shown already). */
  async start(initial: WorkbenchDocument): Promise<void> {
    this.doc = initial;
    this.ui.fileName(initial.name);
    if (!this.store) {
      this.autosave.changed();
      return;
    }
    let stored: unknown;
    try {
      stored = await this.store.load();
    } catch (error) {
      this.ui.message(`The work kept in this browser could not be read (${reasonOf(error)}); the demo is shown.`, "error");
      return;
    }
    if (stored === undefined || stored === null) {
      this.ui.saveState("Nothing kept in this browser yet: changes are saved here as you work", "saved");
      return;
    }
    try {
      const work = decodeWork(stored);
      this.ui.message(`Restoring ${work.name}…`);
      await nextFrame();
      const doc = await this.restore(work);
      this.unsavedToFile = work.unsavedToFile;
      this.show(doc);
      this.ui.message(`Restored ${work.name} as you left it (${new Date(work.savedAt).toLocaleString("en-GB")}).`);
      this.ui.saveState(saveStateText({ kind: "saved", at: new Date(work.savedAt) }, this.store.kind), "saved");
    } catch (error) {
      const aside = await this.store.setAside(stored).then(
        () => "it was set aside",
        (failure: unknown) => `it could not be set aside either (${reasonOf(failure)}): your next change replaces it`,
      );
      this.ui.message(`The work kept in this browser could not be restored (${reasonOf(error)}); ${aside} and the demo is shown.`, "error");
    }
  }

  private async restore(work: StoredWork): Promise<WorkbenchDocument> {
    const doc = work.origin.kind === "file" ? await WorkbenchDocument.fromFile(work.name, work.origin.bytes) : WorkbenchDocument.fromSheets(work.name, work.origin.sheets);
    try {
      doc.apply(work.sheets, work.changes);
    } catch (error) {
      doc.destroy();
      throw error;
    }
    return doc;
  }

  private snapshot(): StoredWork {
    return {
      format: WORK_FORMAT,
      version: WORK_VERSION,
      name: this.doc.name,
      savedAt: new Date().toISOString(),
      origin: this.doc.origin,
      sheets: this.doc.sheetNames(),
      changes: this.doc.allChanges(),
      unsavedToFile: this.unsavedToFile,
    };
  }

  private show(doc: WorkbenchDocument, sheet?: string): void {
    const previous = this.doc;
    this.doc = doc;
    this.replacing = true;
    try {
      this.host.replace(doc.book, sheet);
    } finally {
      this.replacing = false;
    }
    if (previous && previous !== doc) previous.destroy();
    this.ui.fileName(doc.name);
  }

  /** Asks before a book with changes not saved to a file is replaced; true to go on. */
  private mayReplace(what: string): boolean {
    if (!this.unsavedToFile) return true;
    return this.ui.confirm(`${this.doc.name} has changes not saved to a file. ${what} replaces it here (the changes stay only if you save first). Go on?`);
  }

  private async replaceWith(doc: WorkbenchDocument, note: string): Promise<void> {
    this.show(doc);
    this.unsavedToFile = false;
    this.ui.message(note);
    this.autosave.changed();
    await this.autosave.flush();
  }

  async newBook(): Promise<void> {
    if (this.refuseWhileWorking()) return;
    if (!this.mayReplace("A new workbook")) return;
    await this.replaceWith(WorkbenchDocument.fromSheets("workbook.xlsx", [{ name: "Sheet1", cells: [] }]), "A new blank workbook.");
  }

  async discard(): Promise<void> {
    if (this.refuseWhileWorking()) return;
    if (!this.ui.confirm("Discard the work kept in this browser and show the demo again? This cannot be undone (save as a file first to keep it).")) return;
    try {
      await this.store?.clear();
    } catch (error) {
      this.ui.message(`The stored work could not be removed: ${reasonOf(error)}`, "error");
      return;
    }
    await this.replaceWith(WorkbenchDocument.fromSheets(this.demo.name, this.demo.sheets), "The demo workbook, as shipped.");
  }

  async open(fileName: string, read: () => Promise<Uint8Array>): Promise<void> {
    if (!/\.xlsx$/i.test(fileName)) {
      this.ui.message(`${fileName} is not an .xlsx workbook: the workbench opens .xlsx files (save other formats as .xlsx first).`, "error");
      return;
    }
    if (this.refuseWhileWorking()) return;
    if (!this.mayReplace(`Opening ${fileName}`)) return;
    this.working = true;
    this.ui.busy(true);
    this.ui.message(`Opening ${fileName}…`);
    await nextFrame();
    try {
      const doc = await WorkbenchDocument.fromFile(fileName, await read());
      await this.replaceWith(doc, `Opened ${fileName}: ${doc.sheetNames().length} sheets, evaluated in the browser.`);
    } catch (error) {
      this.ui.message(`Cannot open ${fileName}: ${reasonOf(error)}`, "error");
    } finally {
      this.working = false;
      this.ui.busy(false);
    }
  }

  async save(): Promise<void> {
    if (this.refuseWhileWorking()) return;
    this.working = true;
    this.ui.busy(true);
    await nextFrame();
    try {
      const bytes = await saveXlsx(this.doc);
      const name = saveName(this.doc.name);
      this.ui.download(name, bytes);
      this.unsavedToFile = false;
      this.ui.message(`Saved ${name} (${Math.ceil(bytes.byteLength / 1024)} KB) to your downloads.`);
      this.autosave.changed();
      await this.autosave.flush();
    } catch (error) {
      this.ui.message(`Cannot save: ${reasonOf(error)}`, "error");
    } finally {
      this.working = false;
      this.ui.busy(false);
    }
  }

  private refuseWhileWorking(): boolean {
    if (this.working) this.ui.message("A file is being read or written: wait for it to finish, then try again.", "error");
    return this.working;
  }

  addSheet(): string {
    const name = nextSheetName(this.doc.sheetNames());
    this.doc.addSheet(name);
    this.host.refresh();
    this.host.activate(name);
    this.changedStructure();
    return name;
  }

  /** Renames a sheet; returns the problem with the name instead when it cannot be used. */
  renameSheet(from: string, to: string): string | undefined {
    const problem = sheetNameProblem(to, this.doc.sheetNames(), from);
    if (problem) return problem;
    if (to === from) return undefined;
    const active = this.host.activeSheet();
    this.doc.renameSheet(from, to);
    this.host.refresh();
    this.host.activate(active === from ? to : active);
    this.changedStructure();
    return undefined;
  }

  private changedStructure(): void {
    this.unsavedToFile = true;
    this.autosave.changed();
  }

  /** Whether leaving the page now loses nothing: the work is stored in the browser, or saved as a file. */
  safeToLeave(): boolean {
    return this.autosave.stored() || !this.unsavedToFile;
  }

  /** Waits for the pending autosave (tests, and before the page is left). */
  flush(): Promise<void> {
    return this.autosave.flush();
  }
}
