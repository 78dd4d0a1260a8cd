/**
 * The SPAN worksheet functions as the formula engine sees them: sheet name, the JS export
 * of functions/functions.ts that computes it, how each argument is passed (a 2-D block as the
 * spreadsheet host passes a range, or a single value), and how the size of the spilled result
 * is predicted from the formula text (see resultSize.ts).
 */

/** A worksheet function as functions/functions.ts exports it. */
export type SheetFunction = (...args: any[]) => unknown[][];

export type SpanExport =
  | "reactions"
  | "shear"
  | "moment"
  | "slope"
  | "deflection"
  | "maxMoment"
  | "extremes"
  | "diagram"
  | "envelope"
  | "peaks"
  | "influence"
  | "moving"
  | "combos"
  | "section"
  | "stress"
  | "shearStress"
  | "deflectionCheck"
  | "utilisation"
  | "convertUnits"
  | "stiffness"
  | "spanPeaks"
  | "caseReactions"
  | "frequencies"
  | "modeShape";

/** The function table the engine calls: the real exports, or a stand-in in tests. */
export type SpanFunctions = Record<SpanExport, SheetFunction>;

/** "block": a 2-D array like a range argument; "value": one cell value (combo, points). */
export type ArgumentKind = "block" | "value";

/** How the spill size is predicted from the formula text. */
export type SizeRule = "perNode" | "shapeOfX" | "twoByTwo" | "extremes" | "diagram" | "rowPerX" | "peaks" | "shapeOfPositions" | "twoByFive" | "learned";

export interface SpanFunctionEntry {
  sheetName: string;
  exportName: SpanExport;
  arguments: readonly { name: string; kind: ArgumentKind; optional: boolean }[];
  sizeRule: SizeRule;
}

const member = [
  { name: "spans", kind: "block", optional: false },
  { name: "loads", kind: "block", optional: false },
] as const;
const tail = [
  { name: "supports", kind: "block", optional: true },
  { name: "EI", kind: "block", optional: true },
  { name: "combo", kind: "value", optional: true },
] as const;
const withUnits = [...tail, { name: "units", kind: "block", optional: true }] as const;
/** The optional last argument of the tabular functions that adds a header row (src/sheet/headers.ts). */
const headers = { name: "headers", kind: "value", optional: true } as const;
const atX = [...member, { name: "x", kind: "block", optional: false }, ...withUnits] as const;

const block = (name: string, optional = false) => ({ name, kind: "block" as const, optional });
const value = (name: string, optional = false) => ({ name, kind: "value" as const, optional });

/** Functions that study load arrangements (envelopes, peaks, influence lines, moving loads). */
const STUDIES: SpanFunctionEntry[] = [
  {
    sheetName: "SPAN.ENVELOPE",
    exportName: "envelope",
    arguments: [...member, block("x"), block("combos"), block("supports", true), block("EI", true), value("quantity", true), value("pattern", true), value("psi0", true), block("units", true), value("headers", true)],
    sizeRule: "rowPerX",
  },
  {
    sheetName: "SPAN.PEAKS",
    exportName: "peaks",
    arguments: [...member, block("combos"), block("supports", true), block("EI", true), value("pattern", true), value("psi0", true), block("units", true), value("headers", true)],
    sizeRule: "peaks",
  },
  {
    sheetName: "SPAN.INFLUENCE",
    exportName: "influence",
    arguments: [block("spans"), value("effect"), block("positions"), block("supports", true), block("EI", true), block("units", true)],
    sizeRule: "shapeOfPositions",
  },
  {
    sheetName: "SPAN.MOVING",
    exportName: "moving",
    arguments: [block("spans"), block("axles"), block("spacings"), value("effect"), block("supports", true), block("EI", true), block("units", true), value("headers", true)],
    sizeRule: "twoByFive",
  },
  { sheetName: "SPAN.COMBOS", exportName: "combos", arguments: [value("set"), value("psi0", true), block("cases", true)], sizeRule: "learned" },
];


/** Sections, stress and serviceability checks, units: sizes are learned from a first evaluation. */
const CHECKS: SpanFunctionEntry[] = [
  { sheetName: "SPAN.SECTION", exportName: "section", arguments: [value("shape"), block("dimensions"), value("unit", true), value("resultUnit", true)], sizeRule: "learned" },
  ...(["stress", "shearStress"] as const).map((exportName) => ({
    sheetName: `SPAN.${exportName.toUpperCase()}`,
    exportName,
    arguments: [...member, block("section"), ...tail, block("units", true), headers],
    sizeRule: "learned" as const,
  })),
  { sheetName: "SPAN.DEFLECTIONCHECK", exportName: "deflectionCheck", arguments: [...member, block("limit"), ...tail, block("units", true), headers], sizeRule: "learned" },
  { sheetName: "SPAN.UTILISATION", exportName: "utilisation", arguments: [block("demand"), block("capacity"), value("demandUnit", true), value("capacityUnit", true)], sizeRule: "learned" },
  { sheetName: "SPAN.CONVERT", exportName: "convertUnits", arguments: [block("value"), value("from"), value("to")], sizeRule: "learned" },
  { sheetName: "SPAN.STIFFNESS", exportName: "stiffness", arguments: [block("E"), block("I"), value("EUnit", true), value("IUnit", true), value("resultUnit", true)], sizeRule: "learned" },
];

/** Results per span and per load case, natural frequencies and mode shapes. */
const RESULTS: SpanFunctionEntry[] = [
  { sheetName: "SPAN.SPANPEAKS", exportName: "spanPeaks", arguments: [...member, ...withUnits, headers], sizeRule: "learned" },
  { sheetName: "SPAN.CASEREACTIONS", exportName: "caseReactions", arguments: [...member, ...withUnits, value("reaction", true), headers], sizeRule: "learned" },
  {
    sheetName: "SPAN.FREQUENCIES",
    exportName: "frequencies",
    arguments: [block("spans"), block("EI"), block("mass"), value("modes", true), block("supports", true), block("loads", true), value("combo", true), block("units", true), value("g", true), headers],
    sizeRule: "learned",
  },
  {
    sheetName: "SPAN.MODESHAPE",
    exportName: "modeShape",
    arguments: [block("spans"), block("EI"), block("mass"), value("mode"), block("x"), block("supports", true), block("loads", true), value("combo", true), block("units", true), value("g", true)],
    sizeRule: "shapeOfX",
  },
];

export const SPAN_FUNCTIONS: readonly SpanFunctionEntry[] = [
  { sheetName: "SPAN.REACTIONS", exportName: "reactions", arguments: [...member, ...withUnits, headers], sizeRule: "perNode" },
  { sheetName: "SPAN.SHEAR", exportName: "shear", arguments: atX, sizeRule: "shapeOfX" },
  { sheetName: "SPAN.MOMENT", exportName: "moment", arguments: atX, sizeRule: "shapeOfX" },
  { sheetName: "SPAN.SLOPE", exportName: "slope", arguments: atX, sizeRule: "shapeOfX" },
  { sheetName: "SPAN.DEFLECTION", exportName: "deflection", arguments: atX, sizeRule: "shapeOfX" },
  { sheetName: "SPAN.MAXMOMENT", exportName: "maxMoment", arguments: [...member, ...withUnits, headers], sizeRule: "twoByTwo" },
  { sheetName: "SPAN.EXTREMES", exportName: "extremes", arguments: [...member, ...withUnits, headers], sizeRule: "extremes" },
  {
    sheetName: "SPAN.DIAGRAM",
    exportName: "diagram",
    arguments: [...member, { name: "points", kind: "value", optional: true }, ...withUnits, headers],
    sizeRule: "diagram",
  },
  ...STUDIES,
  ...CHECKS,
  ...RESULTS,
];

const BY_NAME = new Map(SPAN_FUNCTIONS.map((entry) => [entry.sheetName, entry]));

export function entryFor(sheetName: string): SpanFunctionEntry | undefined {
  return BY_NAME.get(sheetName) ?? BY_NAME.get(sheetName.toUpperCase());
}

const REQUIRED = new Map(SPAN_FUNCTIONS.map((entry) => [entry, entry.arguments.filter((arg) => !arg.optional).length]));

/** How many arguments a call must give: those not optional. */
export function requiredArguments(entry: SpanFunctionEntry): number {
  return REQUIRED.get(entry) ?? entry.arguments.filter((arg) => !arg.optional).length;
}

export function argumentRange(entry: SpanFunctionEntry): string {
  return `${requiredArguments(entry)} to ${entry.arguments.length}`;
}
