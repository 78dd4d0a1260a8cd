/**
 * The files toolbar of workbench.html (its elements are in the page's "files toolbar" block):
 * buttons, the file picker, drag and drop of a file onto the page, renaming a sheet in place
 * (double-click its tab, or the Rename button for the active one), the save state and messages.
 */
import type { BookHost } from "./bookHost";
import { XLSX_TYPE, type FilesCommands, type FilesUi } from "./commands";

function byId<T extends HTMLElement>(id: string): T {
  const found = document.getElementById(id);
  if (!found) throw new Error(`workbench.html lacks #${id}`);
  return found as T;
}

/** The page's side of the commands: dialogs, downloads, the status texts. */
export function pageUi(): FilesUi {
  const message = byId("file-message");
  const state = byId("save-state");
  const name = byId("file-name");
  const buttons = () => Array.from(byId("files-bar").querySelectorAll("button"));
  return {
    confirm: (question) => window.confirm(question),
    download(fileName, bytes) {
      const url = URL.createObjectURL(new Blob([bytes as BlobPart], { type: XLSX_TYPE }));
      const link = document.createElement("a");
      link.href = url;
      link.download = fileName;
      document.body.appendChild(link);
      link.click();
      link.remove();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
    },
    message(text, kind = "info") {
      message.textContent = text;
      message.className = `file-message${kind === "error" ? " error" : ""}`;
    },
    saveState(text, kind) {
      state.textContent = text;
      state.dataset.state = kind;
    },
    fileName(text) {
      name.textContent = text;
      document.title = `${text} — Spanwise workbench`;
    },
    busy(on) {
      for (const button of buttons()) button.disabled = on;
      document.body.classList.toggle("busy", on);
    },
  };
}

async function readFile(file: File): Promise<Uint8Array> {
  return new Uint8Array(await file.arrayBuffer());
}

/** Binds the toolbar, drag and drop and the tab rename to the commands. */
export function bindToolbar(commands: FilesCommands, host: BookHost, ui: FilesUi): void {
  const input = byId<HTMLInputElement>("file-input");
  const openFile = (file: File | undefined) => {
    if (file) void commands.open(file.name, () => readFile(file));
  };
  byId("file-new").addEventListener("click", () => void commands.newBook());
  byId("file-open").addEventListener("click", () => input.click());
  input.addEventListener("change", () => {
    openFile(input.files?.[0]);
    input.value = "";
  });
  byId("file-save").addEventListener("click", () => void commands.save());
  byId("sheet-add").addEventListener("click", () => commands.addSheet());
  byId("file-discard").addEventListener("click", () => void commands.discard());

  const hasFiles = (event: DragEvent) => Array.from(event.dataTransfer?.types ?? []).includes("Files");
  document.addEventListener("dragover", (event) => {
    if (!hasFiles(event)) return;
    event.preventDefault();
    document.body.classList.add("dropping");
  });
  document.addEventListener("dragleave", (event) => {
    if (event.relatedTarget === null) document.body.classList.remove("dropping");
  });
  document.addEventListener("drop", (event) => {
    document.body.classList.remove("dropping");
    if (!event.dataTransfer || event.dataTransfer.files.length === 0) return;
    event.preventDefault();
    if (event.dataTransfer.files.length > 1) ui.message("Drop one .xlsx file at a time: the first is opened.");
    openFile(event.dataTransfer.files[0]);
  });

  const tabOf = (name: string): HTMLElement | undefined => Array.from(byId("tabs").querySelectorAll<HTMLElement>("button")).find((button) => button.textContent === name);
  const rename = (tab: HTMLElement) => {
    const from = tab.textContent ?? "";
    const field = document.createElement("input");
    field.className = "tab-rename";
    field.value = from;
    field.setAttribute("aria-label", `New name for sheet ${from}`);
    field.maxLength = 64;
    tab.replaceChildren(field);
    field.focus();
    field.select();
    let finished = false;
    /** Enter commits (a bad name keeps the field open with the reason); leaving the field commits a good name, else cancels. */
    const finish = (commit: boolean, leaving = false) => {
      if (finished) return;
      if (commit) {
        const problem = commands.renameSheet(from, field.value);
        if (problem) {
          ui.message(`Cannot rename "${from}": ${problem}.`, "error");
          if (!leaving) return;
        } else ui.message("");
      }
      finished = true;
      host.refresh();
    };
    // The grid listens for keys on the document: typing a name must not reach it.
    field.addEventListener("keydown", (event) => {
      event.stopPropagation();
      if (event.key === "Enter") finish(true);
      else if (event.key === "Escape") finish(false);
    });
    field.addEventListener("keypress", (event) => event.stopPropagation());
    field.addEventListener("mousedown", (event) => event.stopPropagation());
    field.addEventListener("click", (event) => event.stopPropagation());
    field.addEventListener("blur", () => finish(true, true));
  };
  // On the document: the grid may draw its tabs element anew.
  document.addEventListener("dblclick", (event) => {
    const tab = (event.target as HTMLElement).closest<HTMLElement>("#tabs button");
    if (tab && !tab.querySelector("input")) rename(tab);
  });
  byId("sheet-rename").addEventListener("click", () => {
    const tab = tabOf(host.activeSheet());
    if (tab) rename(tab);
  });
  // Leaving with changes neither stored in the browser nor saved as a file: the browser asks first
  // (the HTML standard's beforeunload prompt: preventDefault, and returnValue for older engines).
  window.addEventListener("beforeunload", (event) => {
    if (commands.safeToLeave()) return;
    void commands.flush();
    event.preventDefault();
    event.returnValue = "";
  });
}
