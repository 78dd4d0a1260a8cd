/** The formula-engine binding shared by the workbench page and the command-line calculator. */
export { SPAN_FUNCTIONS, entryFor, type SpanFunctions, type SpanExport, type SheetFunction, type SpanFunctionEntry } from "./catalogue";
export { SPAN_EXPORTS } from "./spanFunctions";
export { SpanWorkbook, SHEET_LIMITS, isCellError, type CellInput, type CellResult, type CellErrorValue, type SheetInput, type WorkbookOptions } from "./workbook";
export { mapCode, SPILL, normalizeFormula, expandSpillReferences, hasSpillReference, columnLetters, columnNumber, parseReference } from "./formulaText";
export { predictSize, type BlockSize } from "./resultSize";
export type { CellAddress } from "./learnedSizes";
