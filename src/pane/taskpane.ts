/**
 * Entry of taskpane.html. Where it runs is decided by hostDetection.ts: in Excel the pane
 * talks to the workbook through OfficeHost (after waiting for Office however long it takes);
 * only without a host does it run on the workbench: inside a workbench page that embeds it,
 * or, opened on its own, beside the workbench in a frame.
 */
import type { WorkbenchApi } from "../workbench/api";
import type { Theme } from "./draw/palette";
import type { SheetHost } from "./host";
import { detectHost, type Startup } from "./hostDetection";
import { OfficeHost } from "./officeHost";
import { Pane } from "./pane";
import { BASELINE, DOCUMENT_EVENTS, missingSetMessage, officeRequirements } from "./requirements";
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

/** True when another page (not the workbench) frames this one, as Excel on the web does. */
function framedByOtherPage(): boolean {
  return window.parent !== window && parentWorkbench() === undefined;
}

function startup(status: (text: string) => void): Promise<Startup> {
  const office = typeof Office === "undefined" ? undefined : Office;
  return detectHost({ office, framedByOtherPage: framedByOtherPage(), onSlow: status });
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
  const status = (text: string): void => {
    const line = root.querySelector("p:last-child");
    if (line) line.textContent = text;
  };
  try {
    let host: SheetHost;
    const bench = parentWorkbench();
    if (bench) host = new WorkbenchHost(bench);
    else {
      const where = await startup(status);
      if (where.kind === "refused") return status(where.message);
      if (where.kind === "excel") {
        const supports = officeRequirements(Office);
        const missing = [BASELINE, DOCUMENT_EVENTS].find((set) => !supports(set.name, set.version));
        if (missing) return status(missingSetMessage(missing));
        host = new OfficeHost(undefined, undefined, supports);
      } else host = new WorkbenchHost(await embeddedWorkbench());
    }
    const pane = new Pane(host, root, themeFor(host));
    window.spanwisePane = pane;
    window.matchMedia?.("(prefers-color-scheme: dark)").addEventListener?.("change", () => pane.redraw());
    pane.start();
    document.body.dataset.paneReady = "true";
  } catch (error) {
    status(`The pane could not start: ${error instanceof Error ? error.message : String(error)}`);
  }
}

void boot();
