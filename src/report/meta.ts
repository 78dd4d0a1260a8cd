/** What every document states about the software that made it: version, commit, platform, date. */
export interface BuildInfo {
  version: string;
  /** The git commit the program ran from, or "unknown". */
  commit: string;
  platform: string;
  /** ISO 8601 date and time of calculation (UTC). */
  date: string;
}

export { CAUTION } from "../pane/caution";

/** The footer line of every page: the caution, then the version and the date. */
export function footerLines(info: BuildInfo, caution: string): string[] {
  return [caution, `Spanwise ${info.version} (commit ${info.commit}) · calculated ${info.date}`];
}
