/**
 * The title block of a member report: project, job number, member mark, by, checked, date,
 * revision. In a workbook file it is a sheet named "Title" holding label-value pairs in columns
 * A and B (labels matched without regard to case, spaces or punctuation, so "Job no." and
 * "Job number" both work). Unknown labels are ignored; missing ones print blank.
 */
export interface TitleBlock {
  project: string;
  job: string;
  mark: string;
  by: string;
  checked: string;
  date: string;
  revision: string;
}

export const TITLE_SHEET = "Title";
/** Rows of the Title sheet read, at most. */
export const TITLE_ROWS = 50;

export const TITLE_FIELDS: readonly [keyof TitleBlock, string, string[]][] = [
  ["project", "Project", ["project"]],
  ["job", "Job number", ["jobnumber", "jobno", "job"]],
  ["mark", "Member mark", ["membermark", "mark", "member"]],
  ["by", "By", ["by", "designedby", "calculatedby"]],
  ["checked", "Checked", ["checked", "checkedby"]],
  ["date", "Date", ["date"]],
  ["revision", "Revision", ["revision", "rev"]],
];

export const EMPTY_TITLE: TitleBlock = { project: "", job: "", mark: "", by: "", checked: "", date: "", revision: "" };

const key = (label: string): string => label.toLowerCase().replace(/[^a-z0-9]/g, "");

/** The title block from label-value rows; a date serial number is shown as an ISO date. */
export function titleFromRows(rows: readonly (readonly unknown[])[]): TitleBlock {
  const title: TitleBlock = { ...EMPTY_TITLE };
  for (const row of rows.slice(0, TITLE_ROWS)) {
    const label = typeof row[0] === "string" ? key(row[0]) : "";
    const field = TITLE_FIELDS.find(([, , aliases]) => aliases.includes(label));
    if (!field) continue;
    const value = row[1];
    title[field[0]] = field[0] === "date" && typeof value === "number" ? serialDate(value) : value === null || value === undefined ? "" : String(value);
  }
  return title;
}

/** A spreadsheet date serial (1900 system, days since 1899-12-30) as YYYY-MM-DD. */
export function serialDate(serial: number): string {
  if (!Number.isFinite(serial) || serial < 1 || serial > 2958465) return String(serial);
  return new Date(Date.UTC(1899, 11, 30) + Math.round(serial) * 86400000).toISOString().slice(0, 10);
}
