/**
 * Entry of workbench.html: the demo workbook (or the work kept in this browser) in a grid, the
 * files toolbar (src/workbench/files), and window.spanwiseWorkbench.
 */
import { CAUTION, DEMO_SHEETS } from "../../assets/demo/floorFraming";
import { createApi, type WorkbenchApi } from "./api";
import type { BookHost } from "./files/bookHost";
import { FilesCommands } from "./files/commands";
import { WorkbenchDocument } from "./files/document";
import { openStore, type WorkStore } from "./files/store";
import { bindToolbar, pageUi } from "./files/toolbar";
import { Workbench } from "./workbench";

declare global {
  interface Window {
    spanwiseWorkbench: WorkbenchApi;
    /** The files commands (open, save, sheets, the work kept in this browser), for tests. */
    spanwiseFiles: FilesCommands;
  }
}

function element<T extends HTMLElement>(id: string): T {
  const found = document.getElementById(id);
  if (!found) throw new Error(`workbench.html lacks #${id}`);
  return found as T;
}

const DEMO = { name: "spanwise-demo.xlsx", sheets: DEMO_SHEETS };

async function main(): Promise<void> {
  element("caution").textContent = CAUTION;
  element("engine-note").textContent = "Formula engine: HyperFormula (GPL-3.0)";
  const demo = WorkbenchDocument.fromSheets(DEMO.name, DEMO.sheets);
  const bench = new Workbench(demo.book, {
    sheet: element("sheet"),
    tabs: element("tabs"),
    formulaBar: element<HTMLInputElement>("formula-bar"),
    nameBox: element("name-box"),
    status: element("status"),
  });
  window.spanwiseWorkbench = createApi(bench, element("charts"));
  const host: BookHost = {
    replace: (book, sheet) => bench.replaceBook(book, sheet),
    refresh: () => bench.refresh(),
    activeSheet: () => bench.activeSheet(),
    activate: (sheet) => bench.activate(sheet),
    onChange: (listener) => bench.onChange(listener),
  };
  const ui = pageUi();
  let store: WorkStore | undefined;
  let noStore: string | undefined;
  try {
    store = await openStore();
  } catch (error) {
    noStore = error instanceof Error ? error.message : String(error);
  }
  const commands = new FilesCommands(host, store, ui, DEMO, noStore);
  window.spanwiseFiles = commands;
  bindToolbar(commands, host, ui);
  await commands.start(demo);
  document.body.dataset.ready = "true";
}

void main().catch((error) => {
  const status = document.getElementById("status");
  if (status) status.textContent = `The workbench could not start: ${error instanceof Error ? error.message : String(error)}`;
  document.body.dataset.ready = "failed";
});
