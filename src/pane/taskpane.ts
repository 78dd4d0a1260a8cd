/**
 * Entry of taskpane.html. In the spreadsheet host the pane talks to the workbook through
 * OfficeHost. Outside it (Office.onReady reports no host), it runs on the workbench: inside a
 * workbench page that embeds it, or, opened on its own, beside the workbench in a frame.
 */
import type { WorkbenchApi } from "../workbench/api";
import type { Theme } from "./draw/palette";
import type { SheetHost } from "./host";
import { OfficeHost } from "./officeHost";
import { Pane } from "./pane";
import { WorkbenchHost } from "./workbenchHost";

declare global {
  interface Window {
    spanwisePane?: Pane;
  }
}

type BenchWindow = Window & { spanwiseWorkbench?: WorkbenchApi };

function parentWorkbench(): WorkbenchApi | undefined {
  try {
    if (window.parent !== window) return (window.parent as BenchWindow).spanwiseWorkbench;
  } catch {
    // a parent from another origin: not the workbench
  }
  return undefined;
}

/** The host Office reports, or null outside one (or when office.js is absent or silent). */
function officeHost(): Promise<string | null> {
  if (typeof Office === "undefined") return Promise.resolve(null);
  return Promise.race([
    Office.onReady().then((info) => (info.host ? String(info.host) : null)),
    new Promise<null>((resolve) => setTimeout(() => resolve(null), 3000)),
  ]);
}

function embeddedWorkbench(): Promise<WorkbenchApi> {
  document.body.classList.add("standalone");
  const frame = document.createElement("iframe");
  frame.title = "Spanwise workbench";
  frame.src = "workbench.html";
  document.body.insertBefore(frame, document.body.firstChild);
  return new Promise((resolve, reject) => {
    const started = Date.now();
    const poll = (): void => {
      const api = (frame.contentWindow as BenchWindow | null)?.spanwiseWorkbench;
      if (api && frame.contentDocument?.body.dataset.ready === "true") resolve(api);
      else if (Date.now() - started > 20000) reject(new Error("the workbench page did not load (workbench.html beside taskpane.html)"));
      else setTimeout(poll, 50);
    };
    poll();
  });
}

function themeFor(host: SheetHost): () => Theme {
  const forced = new URLSearchParams(location.search).get("theme");
  const media = window.matchMedia?.("(prefers-color-scheme: dark)");
  return () => {
    const theme: Theme = forced === "dark" || forced === "light" ? forced : host.theme() ?? (media?.matches ? "dark" : "light");
    document.body.classList.toggle("dark", theme === "dark");
    return theme;
  };
}

async function boot(): Promise<void> {
  const root = document.getElementById("pane");
  if (!root) return;
  try {
    let host: SheetHost;
    const bench = parentWorkbench();
    if (bench) host = new WorkbenchHost(bench);
    else if ((await officeHost()) === "Excel") host = new OfficeHost();
    else host = new WorkbenchHost(await embeddedWorkbench());
    const pane = new Pane(host, root, themeFor(host));
    window.spanwisePane = pane;
    window.matchMedia?.("(prefers-color-scheme: dark)").addEventListener?.("change", () => pane.redraw());
    pane.start();
    document.body.dataset.paneReady = "true";
  } catch (error) {
    root.querySelector("p:last-child")!.textContent = `The pane could not start: ${error instanceof Error ? error.message : String(error)}`;
  }
}

void boot();
