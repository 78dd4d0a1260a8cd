/**
 * The report's title block as the pane keeps it: one per workbook, in the host's settings
 * (SheetHost.readSetting / writeSetting: the document settings in the spreadsheet, the
 * workbench's own store on the workbench), under one name. What is read back is validated at
 * this boundary: only the known fields, only text, each at most TITLE_FIELD_LIMIT characters
 * (anything else in the stored value is ignored, never trusted).
 */
import { EMPTY_TITLE, TITLE_FIELDS, type TitleBlock } from "../report/titleBlock";
import { SheetHostError, type SheetHost } from "./host";

/** The setting's name (settings are per add-in and per document, so no workbook key is needed). */
export const TITLE_SETTING = "spanwise.titleBlock";
/** Characters kept per field. */
export const TITLE_FIELD_LIMIT = 200;

/** A title block from whatever a host hands back: unknown fields and non-text values are dropped. */
export function titleFromSetting(value: unknown): TitleBlock {
  const title: TitleBlock = { ...EMPTY_TITLE };
  let data = value;
  if (typeof data === "string") {
    try {
      data = JSON.parse(data);
    } catch {
      return title;
    }
  }
  if (data === null || typeof data !== "object" || Array.isArray(data)) return title;
  for (const [key] of TITLE_FIELDS) {
    const field = (data as Record<string, unknown>)[key];
    if (typeof field === "string" || typeof field === "number") title[key] = cleanField(String(field));
  }
  return title;
}

/** One field as kept: control characters to spaces, trimmed, cut to the limit. */
export function cleanField(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.replace(/[\u0000-\u001f\u007f]+/g, " ").trim().slice(0, TITLE_FIELD_LIMIT);
}

/** The stored form: a plain object of the seven text fields. */
export function settingFromTitle(title: TitleBlock): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key] of TITLE_FIELDS) out[key] = cleanField(title[key] ?? "");
  return out;
}

export type TitleLoad =
  | { kept: true; title: TitleBlock; stored: boolean }
  /** The host cannot keep settings: why, for the pane to say; the title block then lives in the pane only. */
  | { kept: false; title: TitleBlock; reason: string };

function reasonOf(error: unknown): string {
  if (error instanceof SheetHostError) return error.message;
  return `the title block could not be read from the workbook: ${error instanceof Error ? error.message : String(error)}`;
}

/** Reads the workbook's title block; `stored` is false when the workbook has none yet. */
export async function loadTitle(host: SheetHost): Promise<TitleLoad> {
  if (!host.readSetting) return { kept: false, title: { ...EMPTY_TITLE }, reason: "this host keeps no settings in the workbook" };
  try {
    const value = await host.readSetting(TITLE_SETTING);
    return { kept: true, title: titleFromSetting(value), stored: value !== undefined };
  } catch (error) {
    return { kept: false, title: { ...EMPTY_TITLE }, reason: reasonOf(error) };
  }
}

/** Keeps the title block in the workbook; rejects (SheetHostError where the host says why) when it cannot. */
export async function saveTitle(host: SheetHost, title: TitleBlock): Promise<TitleBlock> {
  const value = settingFromTitle(title);
  if (!host.writeSetting) throw new SheetHostError("this host keeps no settings in the workbook", "RequirementNotMet");
  await host.writeSetting(TITLE_SETTING, value);
  return titleFromSetting(value);
}
