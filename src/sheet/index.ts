/** The sheet layer's public surface: cell values <-> the solver's model, shapes, errors, cache. */
export { sheetReactions, sheetValuesAt, sheetMaxMoment, sheetExtremes, sheetDiagram, solvedMember, readPoints, DEFAULT_POINTS, MAX_POINTS } from "./worksheet";
export { readMember, readLoads, readComboText } from "./member";
export type { MemberArgs } from "./member";
export { readLoadTable, readLoadRow } from "./loadTable";
export { parseLoadNotation, formatLoad, formatLoadNotation } from "./loadNotation";
export { toLoad, isCaseLabel, placeOf, COLUMNS, LOAD_KINDS } from "./loadRow";
export type { LoadRow, ColumnName } from "./loadRow";
export { readSupports } from "./supports";
export { readSpans, readStiffness } from "./lists";
export { isEmpty, isBlank, errorCodeOf, numberFromText, readNumber, readText, show } from "./cells";
export { rowsOf, singleCell, isOmitted, isAllBlank, vectorCells, splitList, listEntries } from "./ranges";
export { mapPositions, orBlank, finite } from "./shape";
export { hostError, describeError, guarded, MESSAGE_LIMIT } from "./hostError";
export { memberHash, sameCells, LruCache, MemberCache, solvedMembers, MEMBER_CACHE_SIZE } from "./cache";
export { readUnit, readMemberUnits, memberInSI, UNIT_KEYS } from "./units";
export type { MemberUnits } from "./units";
export { sheetSection, readShape, readDimensions, SECTION_ROWS } from "./section";
export { sheetStress, sheetShearStress, sheetDeflectionCheck, sheetUtilisation, sheetConvert, sheetStiffness } from "./checks";
