/**
 * The plain data a member and its solution are made of.
 *
 * Conventions (the same everywhere in Spanwise):
 * - x runs from the member's left end, in the length unit of the spans.
 * - Loads act downward when positive; couples act clockwise when positive.
 * - Sagging moment is positive and V = dM/dx, so a simple span's left reaction gives positive shear.
 * - Deflection is positive downward and slope = d(deflection)/dx (radians).
 * - Reactions: vertical force up positive, moment counter-clockwise positive.
 */

/**
 * What restrains a node (a span end). `rotational` (pin, free, spring only) is a rotational
 * spring at the node, moment per radian (partial fixity); absent or 0 = none.
 */
export type Support =
  | { kind: "pin"; rotational?: number }
  | { kind: "fixed" }
  | { kind: "free"; rotational?: number }
  | { kind: "hinge" }
  | { kind: "spring"; stiffness: number; rotational?: number };

export type LoadKind = "point" | "moment" | "udl" | "linear" | "settle";

/**
 * One load. `row` is the 1-based row of the load table it came from (used in messages).
 * Point loads and couples use `xStart` only. Distributed loads run from `xStart` to `xEnd`
 * with intensity `magnitude` at the start and `magnitudeEnd` at the end (`udl`: equal).
 * A settlement (`settle`) is a prescribed downward displacement `magnitude` of the node at
 * `xStart` (a pin or fixed support sinking, or the base of a spring), in the deflection unit;
 * it is a load row so that combinations factor it like any other case.
 */
export interface Load {
  kind: LoadKind;
  magnitude: number;
  xStart: number;
  xEnd: number;
  magnitudeEnd: number;
  loadCase: string;
  row: number;
}

/**
 * A member: spans left to right, one support per node (spans.length + 1 entries),
 * flexural stiffness (one value for the whole member, or one per span), and loads. `stiffness` is null when the user gave no EI:
 * forces and moments then use a uniform EI of 1 and slope and deflection are unavailable.
 */
export interface Member {
  spans: number[];
  supports: Support[];
  stiffness: number[] | null;
  loads: Load[];
  /**
   * Optional shear stiffness G·A_v per span (force units; one value for the member or one per
   * span, null for a span without shear deformation). Absent or null: Euler–Bernoulli spans.
   */
  shear?: (number | null)[] | null;
}

/** The quantities that vary along the member. */
export type Quantity = "shear" | "moment" | "slope" | "deflection";

/** A reaction at one node: x, vertical force (up +), moment (counter-clockwise +). */
export interface Reaction {
  x: number;
  force: number;
  moment: number;
}

/**
 * A stretch of the member with no jump and a linear load inside. Values at its start are
 * those just right of `x0` (after any jump there); `q0 + q1 * s` is the downward load
 * intensity at `x0 + s`, `flexibility` is 1/EI and `shearFlexibility` 1/(G·A_v) (0 without
 * shear deformation). `slope0` is the rotation of the section; the deflection adds the shear
 * part, d(deflection)/dx = slope + V·shearFlexibility.
 */
export interface Piece {
  x0: number;
  x1: number;
  shear0: number;
  moment0: number;
  slope0: number;
  deflection0: number;
  q0: number;
  q1: number;
  flexibility: number;
  shearFlexibility: number;
}

/**
 * A member's pieces, left to right, as one list of numbers rather than an object each (a
 * member at the spans limit has thousands of pieces; a list of plain numbers is one object
 * the garbage collector never looks inside, where each piece object held ten boxed numbers):
 * piece i's fields are `data[i * PIECE_FIELDS + field]`, in the order of Piece's fields
 * (pieceTable.ts names them and converts to and from Piece objects). A plain list, not a
 * Float64Array: the engine keeps a typed array of more than 64 bytes outside its heap, and
 * allocating one for every solve of a schedule's small members measured slower (see the
 * README, issue 15 notes).
 */
export interface PieceTable {
  count: number;
  data: number[];
}

/** A solved member: exact piecewise polynomials plus reactions. */
export interface Solution {
  length: number;
  nodeX: number[];
  reactions: Reaction[];
  pieces: PieceTable;
  /** false when the member was solved without EI (slope and deflection unavailable). */
  hasStiffness: boolean;
  /** Largest load effect scale, used for tolerances (sum of |force| plus |couple|/length, plus each settlement Δ times the stiffness meeting its node). */
  loadScale: number;
  /** Largest magnitude of each quantity at the piece ends: the scale that rounding is judged by. */
  scales: Record<Quantity, number>;
  /** The solved free degrees of freedom (see assemble), for cross-checks. */
  displacements: number[];
}

/** Largest and smallest value of a quantity and where they occur. */
export interface Extreme {
  max: number;
  xMax: number;
  min: number;
  xMin: number;
}

/** One station of a diagram table. */
export interface DiagramRow {
  x: number;
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}
