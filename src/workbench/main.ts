/** Entry of workbench.html: the demo workbook in a grid, and window.spanwiseWorkbench. */
import { CAUTION, DEMO_SHEETS } from "../../assets/demo/floorFraming";
import { SpanWorkbook } from "../engine";
import { createApi, type WorkbenchApi } from "./api";
import { Workbench } from "./workbench";

declare global {
  interface Window {
    spanwiseWorkbench: WorkbenchApi;
  }
}

function element<T extends HTMLElement>(id: string): T {
  const found = document.getElementById(id);
  if (!found) throw new Error(`workbench.html lacks #${id}`);
  return found as T;
}

const book = new SpanWorkbook(DEMO_SHEETS);
const bench = new Workbench(book, {
  sheet: element("sheet"),
  tabs: element("tabs"),
  formulaBar: element<HTMLInputElement>("formula-bar"),
  nameBox: element("name-box"),
  status: element("status"),
});
element("caution").textContent = CAUTION;
element("engine-note").textContent = "Formula engine: HyperFormula (GPL-3.0)";
window.spanwiseWorkbench = createApi(bench, element("charts"));
document.body.dataset.ready = "true";
