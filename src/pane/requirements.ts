/**
 * The Office requirement sets the pane's host adapter needs. One baseline every call may
 * assume (the manifest declares it, so a host without it never loads the add-in), and the
 * optional sets of single features, checked with `Office.context.requirements.isSetSupported`
 * before the feature is used; without them the feature is refused with a message, never an
 * exception from the host. Sets and versions as the office-js type declarations give them
 * ("[Api set: ExcelApi 1.12]"); tests/pane/requirements.test.ts checks every API call in
 * officeHost.ts against this file.
 * Source: https://learn.microsoft.com/office/dev/add-ins/develop/initialize-add-in (checking
 * sets at start-up) and the office-js reference pages of each API.
 */

export interface RequirementSet {
  name: string;
  version: string;
}

export interface Feature extends RequirementSet {
  /** What the user is refused without the set, for the message. */
  feature: string;
}

/**
 * What every part of the pane assumes: null-object look-ups (`getItemOrNullObject`,
 * `getRangeOrNullObject`) and sheet-scoped names are ExcelApi 1.4. The manifest must
 * declare at least this (with the functions' own sets).
 */
export const BASELINE: Feature = { name: "ExcelApi", version: "1.4", feature: "the diagram pane" };

/** Selection-change events through `Office.context.document.addHandlerAsync` (Common API). */
export const DOCUMENT_EVENTS: Feature = { name: "DocumentEvents", version: "1.1", feature: "following the selection" };

/** Optional features, checked before use. */
export const OPTIONAL = {
  /**
   * Dynamic arrays: `A1#` arguments (`Range.getSpillingToRangeOrNullObject`, refused without
   * the set) and the check before a write (`Range.getSpillParentOrNullObject`; without the set
   * there are no spills to break, so the check answers "none").
   */
  spill: { name: "ExcelApi", version: "1.12", feature: "reading a spilled range (A1#)" },
  /** Charts with x values and extra series: `ChartSeries.setXAxisValues`, `setValues`, `ChartSeriesCollection.add`. */
  chartSeries: { name: "ExcelApi", version: "1.7", feature: "inserting charts" },
  /**
   * Document settings (`Settings.get`, `set`, `saveAsync`): the Common API set "Settings",
   * version 1.1 ("All of these API requirement sets are version 1.1, unless otherwise
   * specified", https://learn.microsoft.com/javascript/api/requirement-sets/common/office-add-in-requirement-sets).
   * Without it the report's title block is asked for each report and not kept in the workbook.
   */
  settings: { name: "Settings", version: "1.1", feature: "keeping the title block in the workbook" },
} as const satisfies Record<string, Feature>;

export type IsSetSupported = (name: string, version: string) => boolean;

/** Compares dotted versions numerically ("1.12" > "1.7"). */
export function versionAtLeast(have: string, need: string): boolean {
  const a = have.split(".").map(Number);
  const b = need.split(".").map(Number);
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    if (d !== 0) return d > 0;
  }
  return true;
}

/** The user-facing refusal for a missing set. */
export function missingSetMessage(feature: Feature): string {
  return `${feature.feature} needs a newer Excel (requirement set ${feature.name} ${feature.version}, which this Excel does not support); update Office or use Excel on the web`;
}

/** `Office.context.requirements.isSetSupported` when office.js gives it; otherwise "supported" (outside the host nothing can be checked). */
export function officeRequirements(office: { context?: { requirements?: { isSetSupported(name: string, minVersion?: string): boolean } } } | undefined): IsSetSupported {
  const requirements = office?.context?.requirements;
  if (!requirements) return () => true;
  return (name, version) => {
    try {
      return requirements.isSetSupported(name, version) === true;
    } catch {
      return false;
    }
  };
}
