/**
 * Where the pane is running, decided once at start-up. Inside the spreadsheet host the pane
 * waits for Office however long it takes (a slow start only earns a notice); it runs on the
 * workbench only where there is no host: office.js resolves `Office.onReady()` with a null
 * host when the page is opened outside an Office application
 * (https://learn.microsoft.com/office/dev/add-ins/develop/initialize-add-in, "Initialize with
 * Office.onReady()"; ../shared/TOOLCHAIN.md, "Office libraries"), or office.js is absent from
 * a page opened on its own. Plain data in, plain data out; the page wires it up (taskpane.ts).
 */

export type Startup =
  /** In Excel: use OfficeHost. */
  | { kind: "excel"; platform: string | null }
  /** No host: run on the workbench. */
  | { kind: "standalone" }
  /** Cannot work here; `message` says why (shown in the pane). */
  | { kind: "refused"; message: string };

export interface OfficeReady {
  onReady(): Promise<{ host: unknown; platform?: unknown } | null | undefined>;
  /** office.js's enum; its Excel member is compared with the host when present. */
  HostType?: { Excel?: unknown };
}

export interface DetectOptions {
  /** The `Office` global, or undefined when office.js did not load. */
  office: OfficeReady | undefined;
  /** True when the page sits in a frame of another page that is not the workbench (as in Excel on the web). */
  framedByOtherPage: boolean;
  /** Called once when Office has not answered after `slowAfterMs`; the wait goes on. */
  onSlow(message: string): void;
  slowAfterMs?: number;
}

/** Milliseconds before the pane says it is still waiting for Office. */
export const SLOW_START_MS = 3000;

export const SLOW_START_MESSAGE =
  "Waiting for Excel to start the pane… If you opened this page in a browser instead, office.js is not answering: open workbench.html to use the pane on the workbench.";

export const NO_OFFICE_JS_MESSAGE =
  "office.js did not load, so the pane cannot reach the workbook. Check the network connection (and that the page may load office.js), then reopen the pane.";

export async function detectHost(options: DetectOptions): Promise<Startup> {
  const { office } = options;
  if (office === undefined || typeof office.onReady !== "function") {
    return options.framedByOtherPage ? { kind: "refused", message: NO_OFFICE_JS_MESSAGE } : { kind: "standalone" };
  }
  const slow = setTimeout(() => options.onSlow(SLOW_START_MESSAGE), options.slowAfterMs ?? SLOW_START_MS);
  let info: Awaited<ReturnType<OfficeReady["onReady"]>>;
  try {
    info = await office.onReady();
  } catch (error) {
    return { kind: "refused", message: `Office did not start the pane: ${error instanceof Error ? error.message : String(error)}` };
  } finally {
    clearTimeout(slow);
  }
  const host = info?.host;
  if (host === null || host === undefined) return { kind: "standalone" };
  const excel = office.HostType?.Excel;
  if ((excel !== undefined && host === excel) || String(host) === "Excel") return { kind: "excel", platform: info?.platform == null ? null : String(info.platform) };
  return { kind: "refused", message: `The Spanwise pane works in Excel; this is ${String(host)}.` };
}
