/** The solver's whole public surface. Pure: plain data in, plain data out. */
export type { Member, Support, Load, LoadKind, Quantity, Reaction, Piece, Solution, Extreme, DiagramRow } from "./model";
export { SpanError, invalid, unavailable, isSpanError } from "./errors";
export type { ErrorCode } from "./errors";
export { validateMember } from "./validate";
export { checkStability } from "./stability";
export { assemble, toDense } from "./stiffness";
export type { StiffnessSystem } from "./stiffness";
export { solveBanded } from "./banded";
export { solve } from "./solve";
export { valueAt, valuesAt } from "./evaluate";
export { extremes } from "./extremes";
export { diagram } from "./diagram";
export { parseCombination, applyCombination, formatCombination } from "./combination";
export type { Combination, CombinationTerm } from "./combination";
export * as tolerance from "./tolerance";
export { parseUnit, parseUnitOf, convert, derivedUnit, dimensionName, sameDimension, DIMENSIONS, UNIT_NAMES, FOOT, INCH, POUND_FORCE, KIP } from "./units";
export type { Unit, Dimension, DimensionName } from "./units";
