/**
 * The rules a sheet name must meet, as the spreadsheet host checks them when a sheet is
 * renamed. Its own refusal reads: "The name that you type does not exceed 31 characters. The
 * name does not contain any of the following characters: : \ / ? * [ or ]. You did not leave
 * the name blank." (the host's message, quoted in the question "Is there a limit on an Excel
 * worksheet's name length?", Stack Overflow). Further rules from third-party spreadsheet
 * documentation (DevExpress Office File API, "Worksheet.Name"): unique, and no apostrophe at
 * the start or end; "History" is reserved by the host (from third-party pages, not the host's
 * documentation). Names are compared case-insensitively, as the host and the formula engine
 * compare them. Control characters are refused too: a worksheet name is an XML attribute
 * (ECMA-376 Part 1 §18.2.19), where they cannot be stored.
 */

export const MAX_SHEET_NAME = 31;
const FORBIDDEN = [":", "\\", "/", "?", "*", "[", "]"];

/** Why `name` cannot name a sheet among `existing` (renaming `current`, if given), or undefined when it can. */
export function sheetNameProblem(name: string, existing: readonly string[], current?: string): string | undefined {
  if (name.trim() === "") return "a sheet name cannot be blank";
  if ([...name].length > MAX_SHEET_NAME) return `a sheet name has at most ${MAX_SHEET_NAME} characters (this one has ${[...name].length})`;
  const bad = FORBIDDEN.find((ch) => name.includes(ch));
  if (bad !== undefined) return `a sheet name cannot contain ${bad} (none of : \\ / ? * [ ] may appear)`;
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(name)) return "a sheet name cannot contain control characters (tabs, line breaks)";
  if (name.startsWith("'") || name.endsWith("'")) return "a sheet name cannot start or end with an apostrophe (')";
  if (name.toLowerCase() === "history") return `"History" is reserved by the spreadsheet host`;
  const lower = name.toLowerCase();
  const clash = existing.find((other) => other.toLowerCase() === lower && other !== current);
  if (clash !== undefined) return `there is a sheet named "${clash}" already (names are compared without regard to case)`;
  return undefined;
}

/** The first free name of the form SheetN (N from the sheet count + 1 upward). */
export function nextSheetName(existing: readonly string[]): string {
  const taken = new Set(existing.map((name) => name.toLowerCase()));
  for (let n = existing.length + 1; ; n++) if (!taken.has(`sheet${n}`)) return `Sheet${n}`;
}
