/**
 * The SPAN worksheet functions. One plain export per sheet function; the JSDoc below is the
 * help the host shows and the source of the generated functions.json. Conversion, shaping,
 * errors and caching live in src/sheet; these exports only forward.
 *
 * Conventions (every function): x from the member's left end in the length unit of spans;
 * loads down +, couples clockwise +; sagging moment +, V = dM/dx; deflection down +,
 * slope = d(deflection)/dx in radians; reactions up +, moment reactions counter-clockwise +;
 * units are the user's, consistently. Results are an aid to a qualified engineer, who checks
 * them; local codes govern.
 */
import { sheetDiagram, sheetExtremes, sheetMaxMoment, sheetReactions, sheetValuesAt } from "../src/sheet";

/**
 * Reactions at every node of a continuous beam: one row per node (span end) with x, the vertical reaction (up +) and the moment reaction (counter-clockwise +); unsupported nodes give 0, a spring gives its force. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.REACTIONS("6 8 6", "udl 2.5 D; point 10 at 3 L")
 * @customfunction REACTIONS
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns One row per node: x, vertical reaction, moment reaction.
 */
export function reactions(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetReactions(spans, loads, supports, EI, combo);
}

/**
 * Shear force V at each x (V = dM/dx, so a simple span's left reaction gives positive shear). Where V jumps (point load, support) the value just right of x is returned; at the right end, just left. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.SHEAR("6 8 6", "udl 2.5", A2:A20)
 * @customfunction SHEAR
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Shear at each x, in the shape of x.
 */
export function shear(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetValuesAt("shear", spans, loads, x, supports, EI, combo);
}

/**
 * Bending moment M at each x (sagging +). Where M jumps (a couple) the value just right of x is returned; at the right end, just left. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.MOMENT(A2:C2, E2:J5, 3)
 * @customfunction MOMENT
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Moment at each x, in the shape of x.
 */
export function moment(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetValuesAt("moment", spans, loads, x, supports, EI, combo);
}

/**
 * Slope at each x in radians: slope = d(deflection)/dx with deflection down +. Needs EI (#N/A without it). Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.SLOPE("6 8 6", "udl 2.5", 0, , 20000)
 * @customfunction SLOPE
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Required here.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Slope at each x, in the shape of x.
 */
export function slope(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetValuesAt("slope", spans, loads, x, supports, EI, combo);
}

/**
 * Deflection at each x, positive downward, in the length unit of spans when EI is in consistent units. Needs EI (#N/A without it). Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.DEFLECTION("6 8 6", "udl 2.5", 3, , 20000)
 * @customfunction DEFLECTION
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Required here.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Deflection at each x, in the shape of x.
 */
export function deflection(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetValuesAt("deflection", spans, loads, x, supports, EI, combo);
}

/**
 * Largest (sagging) and smallest (hogging) bending moment along the member and where they occur, found exactly from the moment curve: [[largest M, x], [smallest M, x]]. Sagging moment +. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.MAXMOMENT("6 8 6", "udl 2.5 D; point 10 at 3 L", , , "1.2D+1.6L")
 * @customfunction MAXMOMENT
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for springs; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Two rows: largest moment and its x; smallest moment and its x.
 */
export function maxMoment(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetMaxMoment(spans, loads, supports, EI, combo);
}

/**
 * Extremes of each quantity: rows label, max, x at max, min, x at min for shear and moment, and for slope and deflection when EI is given. Found exactly from the curves, never by sampling. Signs: loads down +, couples clockwise +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.EXTREMES(A2:C2, E2:J5, A3:D3, 20000)
 * @customfunction EXTREMES
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Adds the slope and deflection rows; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Rows shear, moment (then slope, deflection with EI): label, max, x at max, min, x at min.
 */
export function extremes(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetExtremes(spans, loads, supports, EI, combo);
}

/**
 * Diagram table: rows x, V, M, slope, deflection at evenly spaced stations plus every support, load point and extreme, with two rows (just left, just right) at every jump. Slope and deflection are blank without EI. Signs: loads down +, couples clockwise +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.DIAGRAM("6 8 6", "udl 2.5", 61)
 * @customfunction DIAGRAM
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Or one text cell, loads joined by ";": point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last. Forces down +, couples clockwise +.
 * @param [points] Number of evenly spaced stations including both ends: a whole number from 2 to 10001. Blank (or 0) = 101.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a number = vertical spring stiffness (force/length); a range or one text cell such as "fixed pin pin free". Blank = every node pin.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Fills the slope and deflection columns; without it the member is taken as uniform.
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors applied to the case labels of the loads; cases not named are left out. Blank = every load at factor 1.
 * @returns Rows x, shear, moment, slope, deflection.
 */
export function diagram(spans: any[][], loads: any[][], points?: any, supports?: any[][], EI?: any[][], combo?: any): any[][] {
  return sheetDiagram(spans, loads, points, supports, EI, combo);
}
