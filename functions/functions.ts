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
import {
  sheetCombinationSet,
  sheetConvert,
  sheetDeflectionCheck,
  sheetDiagram,
  sheetEnvelope,
  sheetExtremes,
  sheetInfluence,
  sheetMaxMoment,
  sheetMoving,
  sheetPeaks,
  sheetReactions,
  sheetSection,
  sheetShearStress,
  sheetStiffness,
  sheetStress,
  sheetUtilisation,
  sheetValuesAt,
} from "../src/sheet";
import { sheetCaseReactions, sheetFrequencies, sheetModeShape, sheetSpanPeaks } from "../src/sheet";

/**
 * Reactions at every node of a continuous beam: rows x, vertical reaction (up +), moment reaction (counter-clockwise +). An aid to a qualified engineer; local codes govern. Example: =SPAN.REACTIONS("6 8 6", "udl 2.5 D; point 10 at 3 L")
 * @customfunction REACTIONS
 * @helpurl https://localhost:3000/help/reactions.html
 * @remarks Reactions at every node of a continuous beam: one row per node (span end) with x, the vertical reaction (up +) and the moment reaction (counter-clockwise +); unsupported nodes give 0, a spring gives its force. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per node: x, vertical reaction, moment reaction.
 */
export function reactions(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetReactions(spans, loads, supports, EI, combo, units, headers);
}

/**
 * Shear force V at each x (V = dM/dx; just right of a jump). An aid to a qualified engineer; local codes govern. Example: =SPAN.SHEAR("6 8 6", "udl 2.5", A2:A20)
 * @customfunction SHEAR
 * @helpurl https://localhost:3000/help/shear.html
 * @remarks Shear force V at each x (V = dM/dx, so a simple span's left reaction gives positive shear). Where V jumps (point load, support) the value just right of x is returned; at the right end, just left. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @returns Shear at each x, in the shape of x.
 */
export function shear(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][]): any[][] {
  return sheetValuesAt("shear", spans, loads, x, supports, EI, combo, units);
}

/**
 * Bending moment M at each x (sagging +; just right of a jump). An aid to a qualified engineer; local codes govern. Example: =SPAN.MOMENT(A2:C2, E2:J5, 3)
 * @customfunction MOMENT
 * @helpurl https://localhost:3000/help/moment.html
 * @remarks Bending moment M at each x (sagging +). Where M jumps (a couple) the value just right of x is returned; at the right end, just left. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for slope, deflection and springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @returns Moment at each x, in the shape of x.
 */
export function moment(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][]): any[][] {
  return sheetValuesAt("moment", spans, loads, x, supports, EI, combo, units);
}

/**
 * Slope at each x in radians, d(deflection)/dx with deflection down +; needs EI. An aid to a qualified engineer; local codes govern. Example: =SPAN.SLOPE("6 8 6", "udl 2.5", 0, , 20000)
 * @customfunction SLOPE
 * @helpurl https://localhost:3000/help/slope.html
 * @remarks Slope at each x in radians: slope = d(deflection)/dx with deflection down +. With a shear stiffness (EI "2e5 shear 8e4") slope is the rotation of the section, and d(deflection)/dx = slope + V/GA. Needs EI (#N/A without it). Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Required here. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @returns Slope at each x, in the shape of x.
 */
export function slope(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][]): any[][] {
  return sheetValuesAt("slope", spans, loads, x, supports, EI, combo, units);
}

/**
 * Deflection at each x, down +; needs EI. An aid to a qualified engineer; local codes govern. Example: =SPAN.DEFLECTION("6 8 6", "udl 2.5", 3, , 20000)
 * @customfunction DEFLECTION
 * @helpurl https://localhost:3000/help/deflection.html
 * @remarks Deflection at each x, positive downward, in the length unit of spans when EI is in consistent units. With a shear stiffness (EI "2e5 shear 8e4") it adds the shear deflection; a settle load row moves its support by the settlement. Needs EI (#N/A without it). Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param x Position from the member's left end, in the length unit of spans: a cell, row, column or block. The result has the same shape; blank x cells give blank results.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Required here. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @returns Deflection at each x, in the shape of x.
 */
export function deflection(spans: any[][], loads: any[][], x: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][]): any[][] {
  return sheetValuesAt("deflection", spans, loads, x, supports, EI, combo, units);
}

/**
 * Largest (sagging) and smallest (hogging) moment and where they occur: [[largest M, x], [smallest M, x]]. An aid to a qualified engineer; local codes govern. Example: =SPAN.MAXMOMENT("6 8 6", "udl 2.5 D; point 10 at 3 L", , , "1.2D+1.6L")
 * @customfunction MAXMOMENT
 * @helpurl https://localhost:3000/help/maxmoment.html
 * @remarks Largest (sagging) and smallest (hogging) bending moment along the member and where they occur, found exactly from the moment curve: [[largest M, x], [smallest M, x]]. Sagging moment +. Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Needed for springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Two rows: largest moment and its x; smallest moment and its x.
 */
export function maxMoment(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetMaxMoment(spans, loads, supports, EI, combo, units, headers);
}

/**
 * Rows label, max, x, min, x for shear and moment (slope and deflection with EI), found exactly. An aid to a qualified engineer; local codes govern. Example: =SPAN.EXTREMES(A2:C2, E2:J5, A3:D3, 20000)
 * @customfunction EXTREMES
 * @helpurl https://localhost:3000/help/extremes.html
 * @remarks Extremes of each quantity: rows label, max, x at max, min, x at min for shear and moment, and for slope and deflection when EI is given. Found exactly from the curves, never by sampling. Signs: loads down +, couples clockwise +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Adds the slope and deflection rows; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows shear, moment (then slope, deflection with EI): label, max, x at max, min, x at min.
 */
export function extremes(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetExtremes(spans, loads, supports, EI, combo, units, headers);
}

/**
 * Diagram table x, V, M, slope, deflection at even stations plus supports, loads and extremes, two rows at each jump. An aid to a qualified engineer; local codes govern. Example: =SPAN.DIAGRAM("6 8 6", "udl 2.5", 61)
 * @customfunction DIAGRAM
 * @helpurl https://localhost:3000/help/diagram.html
 * @remarks Diagram table: rows x, V, M, slope, deflection at evenly spaced stations plus every support, load point and extreme, with two rows (just left, just right) at every jump. Slope and deflection are blank without EI. Signs: loads down +, couples clockwise +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit, used for every x): a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table, one row per load: type (point, moment, udl, linear, settle), magnitude, x start, x end, magnitude at end, case. Or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +.
 * @param [points] Number of evenly spaced stations including both ends: a whole number from 2 to 10001. Blank (or 0) = 101.
 * @param [supports] One per node (spans + 1): pin, fixed, free, hinge, a number = vertical spring (force/length); rot K adds a rotational spring (moment/radian): pin+rot 5000, rot 5000, spring 200 rot 5000. Range or one text cell. Blank = all pin; blank/0 at a node: error.
 * @param [EI] Flexural stiffness (force x length^2, units consistent with the loads): one value or one per span. Fills the slope and deflection columns; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L+0.5S: factors on the case labels (exact spelling); a standard label (D, L, Lr, S, W, ...) not named is left out, any other must be named (+0X leaves it out). Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs are read and results given in those units (moments in force x length). Blank = your consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows x, shear, moment, slope, deflection.
 */
export function diagram(spans: any[][], loads: any[][], points?: any, supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetDiagram(spans, loads, points, supports, EI, combo, units, headers);
}

// ---------------------------------------------------------------------------------------
// Load arrangements: envelopes over combinations, governing peaks, pattern live load,
// influence lines and moving loads.
// ---------------------------------------------------------------------------------------

/**
 * Envelope over combinations: per x, largest and smallest shear, moment or deflection and the governing combination. An aid to a qualified engineer; local codes govern. Example: =SPAN.ENVELOPE("6 8 6", A2:F9, H2:H40, "ASCE7-2.3.1", , , "moment", "full L")
 * @customfunction ENVELOPE
 * @helpurl https://localhost:3000/help/envelope.html
 * @remarks Envelope of shear, moment or deflection over a list of load combinations: for each x, the largest and smallest value and the combination that produces it (with pattern live load, also the loaded spans). Combinations may be written out (1.2D+1.6L) or named as sets: ASCE7-2.3.1 (strength), ASCE7-2.4.1 (allowable stress), EN1990-6.10 (needs psi0). Signs: loads down +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit): a row or column, or one text cell such as "6 8 6".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell in the load notation; every load needs a case label. Forces down +, couples clockwise +. settle D at X: support settlement D.
 * @param x Positions from the member's left end: a cell, row, column or block; one result row per cell, in reading order (blank cells give blank rows).
 * @param combos Combinations: a cell or range of texts such as 1.2D+1.6L+0.5S, and/or set names ASCE7-2.3.1, ASCE7-2.4.1, EN1990-6.10 (each expanded). Labels match exactly; each typed combination must select a load.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, a spring stiffness, or with rot K a rotational spring (pin+rot 5000). Blank = every node pin.
 * @param [EI] Flexural stiffness: one value or one per span. Needed for deflection and springs. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [quantity] shear, moment (default) or deflection.
 * @param [pattern] Pattern live load: blank or none (loads as given), standard (classical span arrangements) or full (every subset of spans, none included, exact by superposition), then the live case label (default L), e.g. "full L". At most 12 spans.
 * @param [psi0] EN 1990 combination factor psi0 for the accompanying variable cases: one number, or pairs such as "Q 0.7, S 0.5".
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs read and results given in those units (moments in force x length, deflection in the deflection unit). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per x: x, largest value, governing combination, smallest value, governing combination.
 */
export function envelope(spans: any[][], loads: any[][], x: any[][], combos: any[][], supports?: any[][], EI?: any[][], quantity?: any, pattern?: any, psi0?: any, units?: any[][], headers?: any): any[][] {
  return sheetEnvelope(spans, loads, x, combos, supports, EI, quantity, pattern, psi0, units, headers);
}

/**
 * Governing peaks over combinations: largest and smallest shear, moment (slope, deflection with EI), where and which combination. An aid to a qualified engineer; local codes govern. Example: =SPAN.PEAKS("6 8 6", A2:F9, "ASCE7-2.3.1", , 20000, "standard L")
 * @customfunction PEAKS
 * @helpurl https://localhost:3000/help/peaks.html
 * @remarks Governing peaks over a list of load combinations: for shear, moment and (with EI) slope and deflection, the largest and smallest value anywhere on the member, where it occurs and the combination (and, with pattern live load, the loaded spans) that produces it. Found exactly from each combination's curves. Signs: loads down +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit): a row or column, or one text cell such as "6 8 6".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell in the load notation; every load needs a case label. Forces down +, couples clockwise +. settle D at X: support settlement D.
 * @param combos Combinations: a cell or range of texts such as 1.2D+1.6L+0.5S, and/or set names ASCE7-2.3.1, ASCE7-2.4.1, EN1990-6.10.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, a spring stiffness, or with rot K a rotational spring (pin+rot 5000). Blank = every node pin.
 * @param [EI] Flexural stiffness: one value or one per span. Adds the slope and deflection rows. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [pattern] Pattern live load: blank or none, standard (classical arrangements) or full (every subset of spans, none included, exact by superposition), optionally followed by the live case label (default L). At most 12 spans when patterned.
 * @param [psi0] EN 1990 combination factor psi0: one number, or pairs such as "Q 0.7, S 0.5".
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs read and results given in those units (moments in force x length, deflection in the deflection unit). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows shear, moment (slope, deflection with EI): label, max, x at max, governing combination, min, x at min, governing combination.
 */
export function peaks(spans: any[][], loads: any[][], combos: any[][], supports?: any[][], EI?: any[][], pattern?: any, psi0?: any, units?: any[][], headers?: any): any[][] {
  return sheetPeaks(spans, loads, combos, supports, EI, pattern, psi0, units, headers);
}

/**
 * Influence line: an effect (reaction, shear, moment, deflection) for a unit downward load at each position. An aid to a qualified engineer; local codes govern. Example: =SPAN.INFLUENCE("10 10", "moment at 10", A2:A42)
 * @customfunction INFLUENCE
 * @helpurl https://localhost:3000/help/influence.html
 * @remarks Influence line ordinates: the value of an effect caused by a unit downward load at each position, from an exact solve of the member (continuous spans, springs and hinges included). For shear at a section, a unit load exactly at the section counts as just left of it. Signs: reactions up +, moment reactions counter-clockwise +, sagging M +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit): a row or column, or one text cell such as "10 10".
 * @param effect What is measured: "reaction 2" (vertical reaction at node 2, nodes numbered from 1 at the left end), "moment reaction 1", "shear at 4.5", "moment at 6" or "deflection at 3" (needs EI).
 * @param positions Unit-load positions from the left end: a cell, row, column or block; the result has the same shape.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, a spring stiffness, or with rot K a rotational spring (pin+rot 5000). Blank = every node pin.
 * @param [EI] Flexural stiffness: one value or one per span. Needed for deflection and springs. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in". The unit load is one force unit: reaction and shear ordinates have no unit, moment ordinates are lengths, deflection is per force unit.
 * @returns The ordinate at each position, in the shape of positions.
 */
export function influence(spans: any[][], effect: any, positions: any[][], supports?: any[][], EI?: any[][], units?: any[][]): any[][] {
  return sheetInfluence(spans, effect, positions, supports, EI, units);
}

/**
 * Moving axle loads in both directions: largest and smallest effect and where the train stands, found exactly. An aid to a qualified engineer; local codes govern. Example: =SPAN.MOVING("12", "35 145 145", "4.3 4.3", "absolute moment")
 * @customfunction MOVING
 * @helpurl https://localhost:3000/help/moving.html
 * @remarks Moving loads: a train of axle loads crossing the member in both directions; the largest and smallest value of an effect and where the train stands. Between positions where an axle meets a node or the section the effect is a polynomial in the train position, so peaks are found exactly, not by stepping. Signs: loads down +, sagging M +, reactions up +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (any length unit): a row or column, or one text cell such as "12".
 * @param axles Axle loads, first axle first (force, down +): a row or column, or one text cell such as "35 145 145". At most 35 axles.
 * @param spacings Distances between consecutive axles (length): one fewer than the axles; blank for one axle.
 * @param effect What is measured: "absolute moment" (largest moment anywhere), "moment at 6", "shear at 4.5", "reaction 2", "moment reaction 1" or "deflection at 3" (needs EI).
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, a spring stiffness, or with rot K a rotational spring (pin+rot 5000). Blank = every node pin.
 * @param [EI] Flexural stiffness: one value or one per span. Needed for deflection and springs. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [units] Unit labels such as "length=ft, force=kip, EI=kip*in^2, deflection=in": inputs read and results given in those units (moments in force x length, deflection in the deflection unit). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows max and min: label, value, x of the first axle, direction ("as given": the other axles follow at larger x; "reversed"), x where the effect is measured.
 */
export function moving(spans: any[][], axles: any[][], spacings: any[][], effect: any, supports?: any[][], EI?: any[][], units?: any[][], headers?: any): any[][] {
  return sheetMoving(spans, axles, spacings, effect, supports, EI, units, headers);
}

/**
 * The individual combinations of a named set (ASCE7-2.3.1, ASCE7-2.4.1, EN1990-6.10), one per row. An aid to a qualified engineer; local codes govern. Example: =SPAN.COMBOS("EN1990-6.10", "Q 0.7, S 0.5", "Q S")
 * @customfunction COMBOS
 * @helpurl https://localhost:3000/help/combos.html
 * @remarks The individual combinations of a named set, one per row, ready to feed ENVELOPE or PEAKS or to inspect: ASCE7-2.3.1 (ASCE/SEI 7 strength design basic combinations), ASCE7-2.4.1 (allowable stress design), EN1990-6.10 (EN 1990 expression 6.10 with gamma G 1.35 or 1.0 and gamma Q 1.5, each variable case leading in turn). "Lr or S or R" alternatives become separate combinations. Results are an aid to a qualified engineer: check them; local codes govern, and decide which combinations apply.
 * @param set The set name: ASCE7-2.3.1, ASCE7-2.4.1 or EN1990-6.10.
 * @param [psi0] EN 1990 only: psi0 for the accompanying variable cases, one number or pairs such as "Q 0.7, S 0.5".
 * @param [cases] EN 1990 only: the variable case labels (default Q); G is the permanent case.
 * @returns One combination per row.
 */
export function combos(set: any, psi0?: any, cases?: any[][]): any[][] {
  return sheetCombinationSet(set, psi0, cases);
}

// ---------------------------------------------------------------------------------------
// Sections, stresses, serviceability checks and units. These check the engineer's own
// numbers (section sizes, stated limits and capacities); they are not code design: the
// governing code and a qualified engineer decide which limits and capacities apply.
// ---------------------------------------------------------------------------------------

/**
 * Section properties (area, I, S, Z, r, Q, centroid) of a rectangle, circle, box, tube, I, channel or tee, sharp-cornered. An aid to a qualified engineer; local codes govern. Example: =SPAN.SECTION("I", "400 180 13.5 8.6", "mm")
 * @customfunction SECTION
 * @helpurl https://localhost:3000/help/section.html
 * @remarks Section properties of a rectangle, solid circle, box (hollow rectangle), tube (hollow circle), symmetric I, channel or tee, sharp-cornered: rows property, value, unit (area, Ix, Iy, Sx top, Sx bottom, Sy left, Sy right, Zx, Zy, rx, ry, Qx, width at axis, Q/t max, centroid x, centroid y). Axes: x horizontal (bending about x is the usual, strong-axis case), y vertical; centroid from the left and bottom edges; tee flange at the top, channel web at the left. S = I / (distance to that fibre); Z plastic (equal areas); Qx first moment of the area above the neutral axis. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param shape rectangle, circle, box, tube, I, channel or tee (also rect, round, hollow rectangle, pipe, hollow circle).
 * @param dimensions In order, a row, column or one text cell: rectangle b h; circle d; box b h t (wall); tube d t (wall); I, channel, tee: d (overall depth) bf (flange width) tf (flange thickness) tw (web or stem thickness).
 * @param [unit] Length unit of the dimensions, such as mm, cm, m, in or ft. Blank = no unit: results in the dimensions' unit.
 * @param [resultUnit] Length unit of the results (area in unit^2, I in unit^4, S, Z and Q in unit^3). Blank = the dimensions' unit.
 * @returns Rows property, value, unit.
 */
export function section(shape: any, dimensions: any[][], unit?: any, resultUnit?: any): any[][] {
  return sheetSection(shape, dimensions, unit, resultUnit);
}

/**
 * Bending stress M/S at the top and bottom fibres: largest and smallest, with x (tension +). An aid to a qualified engineer; local codes govern. Example: =SPAN.STRESS("20 15", "udl 1.2 D; point 8 at 10 L", G2:I17, , , "1.2D+1.6L")
 * @customfunction STRESS
 * @helpurl https://localhost:3000/help/stress.html
 * @remarks Extreme-fibre bending stress M/S from the member's largest and smallest moments: rows top and bottom with the largest stress, its x, the smallest stress, its x. Tension +, compression -; sagging moment (+) compresses the top. Signs: loads down +, couples clockwise +. A check of the stated section only: the governing code and a qualified engineer decide the allowable stress. Results are an aid to a qualified engineer: check them; local codes govern. With unit labels, Example: =SPAN.STRESS("20 15", "udl 1.2 D; point 8 at 10 L", G2:I17, , , "1.2D+1.6L", "length=ft, force=kip, stress=ksi")
 * @param spans Span lengths left to right (the length unit of units, or any consistent unit): a row or column, or one text cell such as "20 15".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell in the load notation. Forces down +, couples clockwise +; forces in the force unit, intensities in force/length, couples in force x length.
 * @param section Section modulus S (one value, both fibres), or S top and S bottom; or a SPAN.SECTION result (its Sx top and Sx bottom rows, with their units). In section-unit^3.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [EI] Flexural stiffness, one value or one per span (EI unit of units, default force x length^2). Needed for springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L: factors on the case labels (exact spelling); a label other than the standard D, L, Lr, S, W, ... must be named. Blank = every load at factor 1.
 * @param [units] Unit labels, key=unit pairs: length=ft, force=kip (both needed when any is given), EI=kip*in^2, section=in (default length), stress=ksi (default force/section^2). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows top and bottom: fibre, largest stress, x, smallest stress, x.
 */
export function stress(spans: any[][], loads: any[][], section: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetStress(spans, loads, section, supports, EI, combo, units, headers);
}

/**
 * Shear stress at the largest |V|: average V/A and peak VQ/(It), with x. An aid to a qualified engineer; local codes govern. Example: =SPAN.SHEARSTRESS("6", "udl 20", "0.015 2.8e-5 2.8e-4 0.1", , , , "length=m, force=kN, stress=MPa")
 * @customfunction SHEARSTRESS
 * @helpurl https://localhost:3000/help/shearstress.html
 * @remarks Shear stress at the largest shear force |V|: the average V/A and the peak V Q/(I t), with x. With a SPAN.SECTION result the peak uses its Q/t max row (the largest Q/t over the depth: at the neutral axis except in a tee whose axis is in its flange). Sign follows V (V = dM/dx). Signs: loads down +, couples clockwise +. A check of the stated section only: the governing code and a qualified engineer decide the allowable stress. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (the length unit of units, or any consistent unit): a row or column, or one text cell such as "20 15".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell in the load notation. Forces down +, couples clockwise +. settle D at X: support settlement D.
 * @param section A (area: average only), or A I Q t (area, second moment, first moment about the neutral axis of the area beyond the point, width there), in section-unit powers; or a SPAN.SECTION result.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [EI] Flexural stiffness, one value or one per span (EI unit of units, default force x length^2). Needed for springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L: factors on the case labels (exact spelling); a label other than the standard D, L, Lr, S, W, ... must be named. Blank = every load at factor 1.
 * @param [units] Unit labels, key=unit pairs: length=m, force=kN (both needed when any is given), EI=kN*m^2, section=mm (default length), stress=MPa (default force/section^2). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns Rows average and peak: label, stress, x of the largest |V|.
 */
export function shearStress(spans: any[][], loads: any[][], section: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetShearStress(spans, loads, section, supports, EI, combo, units, headers);
}

/**
 * Per span: largest deflection, span/deflection, pass/fail against your limit. An aid to a qualified engineer; local codes govern. Example: =SPAN.DEFLECTIONCHECK("20 15", "udl 0.8 L", "L/360", , 2.4e6, , "length=ft, force=kip, EI=kip*in^2, deflection=in")
 * @customfunction DEFLECTIONCHECK
 * @helpurl https://localhost:3000/help/deflectioncheck.html
 * @remarks Deflection check per span: the largest deflection in each span (by magnitude, down +, from the undeflected axis, spring settlement included), span/deflection, and pass when span/deflection >= the stated limit's divisor. The limit is the engineer's: typical floor limits (such as L/360 live, L/240 total) come from the governing building code's table of deflection limits, which also says how cantilevers count; the code and a qualified engineer decide. Needs EI (#N/A without it). Signs: loads down +, couples clockwise +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right (the length unit of units, or any consistent unit): a row or column, or one text cell such as "20 15".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell in the load notation. Forces down +, couples clockwise +. settle D at X: support settlement D.
 * @param limit The stated limit as L/360, span/360 or 360: one for the member or one per span (a row, column or text such as "L/360 L/180").
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [EI] Flexural stiffness, one value or one per span (EI unit of units, default force x length^2). Required here; SPAN.STIFFNESS builds it from E and I. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as D+L or L alone: factors on the case labels (exact spelling); a label other than the standard D, L, Lr, S, W, ... must be named. Blank = every load at factor 1.
 * @param [units] Unit labels, key=unit pairs: length=ft, force=kip (both needed when any is given), EI=kip*in^2, deflection=in (default length). Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per span: span number, span length, deflection, x, span/deflection ("" when 0), limit divisor, pass or fail.
 */
export function deflectionCheck(spans: any[][], loads: any[][], limit: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetDeflectionCheck(spans, loads, limit, supports, EI, combo, units, headers);
}

/**
 * Utilisation |demand| / capacity, cell by cell, with optional units. An aid to a qualified engineer; local codes govern. Example: =SPAN.UTILISATION(B4, 250, "kip*ft", "kN*m")
 * @customfunction UTILISATION
 * @helpurl https://localhost:3000/help/utilisation.html
 * @remarks Utilisation |demand| / capacity, cell by cell (one capacity for all, or one per demand); at most 1 means the demand is within the stated capacity. The capacity is the engineer's: the governing code and a qualified engineer decide it. Signs: loads down +, so demands may be negative; the ratio uses the magnitude. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param demand Demand values (moment, shear, stress, deflection...): a cell or range; the result has its shape.
 * @param capacity Capacity (> 0) in the same quantity: one cell, or a range the size of demand.
 * @param [demandUnit] Unit of the demand, such as kip*ft. Give both units or neither.
 * @param [capacityUnit] Unit of the capacity, such as kN*m; must measure the same quantity as the demand unit.
 * @returns The ratio for each demand.
 */
export function utilisation(demand: any[][], capacity: any[][], demandUnit?: any, capacityUnit?: any): any[][] {
  return sheetUtilisation(demand, capacity, demandUnit, capacityUnit);
}

/**
 * Converts values between units of the same quantity (NIST SP 811 factors). An aid to a qualified engineer; local codes govern. Example: =SPAN.CONVERT(1.2, "kip/ft", "kN/m")
 * @customfunction CONVERT
 * @helpurl https://localhost:3000/help/convert.html
 * @remarks Converts values between units of the same quantity: length (m, mm, cm, ft, in), force (N, kN, lbf, kip), force/length (kN/m, kip/ft, plf, klf), moment (kN*m, kip*ft, kip*in), stress (Pa, kPa, MPa, GPa, psi, ksi, psf), I (mm^4, in^4), EI (kN*m^2, kip*in^2) and any product of these; factors from NIST SP 811. Signs: loads down + is kept (values keep their sign). Results are an aid to a qualified engineer: check them; local codes govern.
 * @param value The values: a cell or range; the result has its shape.
 * @param from Unit of the values, such as kip*ft (no spaces inside a unit).
 * @param to Unit wanted, such as kN*m: must measure the same quantity.
 * @returns The converted values.
 */
export function convertUnits(value: any[][], from: any, to: any): any[][] {
  return sheetConvert(value, from, to);
}

/**
 * Flexural stiffness EI from E and I, optionally in their own units and converted. An aid to a qualified engineer; local codes govern. Example: =SPAN.STIFFNESS(29000, 510, "ksi", "in^4", "kip*ft^2")
 * @customfunction STIFFNESS
 * @helpurl https://localhost:3000/help/stiffness.html
 * @remarks Flexural stiffness EI from E and I given separately, optionally in their own units and converted to the unit wanted (for example E in ksi and I in in^4 to EI in kip*ft^2), ready for the EI argument. Signs: loads down + (EI is positive). Results are an aid to a qualified engineer: check them; local codes govern.
 * @param E Modulus of elasticity (> 0): a cell or range.
 * @param I Second moment of area (> 0): one cell, or a range the size of E (one per span).
 * @param [EUnit] Unit of E, such as ksi, MPa or GPa. Give the units of both E and I, or neither.
 * @param [IUnit] Unit of I, such as in^4, mm^4 or cm^4.
 * @param [resultUnit] Unit of the result, such as kip*in^2 or kN*m^2. Blank = E unit x I unit.
 * @returns E x I for each cell.
 */
export function stiffness(E: any[][], I: any[][], EUnit?: any, IUnit?: any, resultUnit?: any): any[][] {
  return sheetStiffness(E, I, EUnit, IUnit, resultUnit);
}

// ---------------------------------------------------------------------------------------
// Results per span and per load case; natural frequencies and mode shapes.
// ---------------------------------------------------------------------------------------

/**
 * Each span's peaks: span, length, max M, x, min M, x, largest |V|, x, largest |deflection|, x ("" without EI); loads down +, sagging M +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.SPANPEAKS("6 8", "udl 2")
 * @customfunction SPANPEAKS
 * @helpurl https://localhost:3000/help/spanpeaks.html
 * @remarks Peaks of each span, one row per span: span number, length, largest moment and its x, smallest moment and its x, largest |V| (signed) and its x, largest |deflection| (signed) and its x (blank without EI). Each span's own exact pieces are searched, both ends included, so a hogging moment over an interior support is the smallest moment of both spans beside it; moment peaks come from the roots of V, deflection peaks from the roots of the slope, never from sampling. Signs: loads down +, couples clockwise +, sagging moment +, deflection down +. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right: a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +. settle D at X: support settlement D.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [EI] Flexural stiffness, one value or one per span. Adds the deflection columns; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L: factors on the case labels (exact spelling); a label other than the standard D, L, Lr, S, W, ... must be named. Blank = every load at factor 1.
 * @param [units] Unit labels, key=unit pairs such as "length=ft, force=kip, EI=kip*in^2, deflection=in", as for SPAN.REACTIONS. Blank = consistent units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per span: span, length, largest M, x, smallest M, x, largest |V|, x, largest |deflection|, x.
 */
export function spanPeaks(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], headers?: any): any[][] {
  return sheetSpanPeaks(spans, loads, supports, EI, combo, units, headers);
}

/**
 * Reactions per load case, unfactored: rows x, one column per case (in first-use order), then the combo's; loads down +, reactions up +. Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.CASEREACTIONS("6 8", A2:F9)
 * @customfunction CASEREACTIONS
 * @helpurl https://localhost:3000/help/casereactions.html
 * @remarks Reactions by load case, unfactored: one row per node with its x, then one column per case label in the order the loads first use the labels (loads without a label form one case of their own), then, when combo is given, the combination's reactions (the same numbers as SPAN.REACTIONS with that combination). reaction: blank or vertical for vertical reactions (up +), moment for moment reactions (counter-clockwise +). At most 50 case labels. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right: a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param loads Load table (type, magnitude, x start, x end, magnitude at end, case) or one text cell such as "udl 2.5 D; point 10 at 3 L". Forces down +, couples clockwise +. One column per case label; at most 50 labels. settle D at X: support settlement D.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [EI] Flexural stiffness, one value or one per span. Needed for springs; without it the member is taken as uniform. "2e5 shear 8e4" adds shear deformation (GA, force unit).
 * @param [combo] Load combination such as 1.2D+1.6L: adds a last column with the factored reactions. Blank = no combination column.
 * @param [units] Unit labels, key=unit pairs such as "length=ft, force=kip, EI=kip*in^2", as for SPAN.REACTIONS. Blank = consistent units.
 * @param [reaction] vertical (blank: vertical force, up +) or moment (moment reactions, counter-clockwise +; 0 where a node is not fixed).
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per node: x, one reaction per case, and the combination's.
 */
export function caseReactions(spans: any[][], loads: any[][], supports?: any[][], EI?: any[][], combo?: any, units?: any[][], reaction?: any, headers?: any): any[][] {
  return sheetCaseReactions(spans, loads, supports, EI, combo, units, reaction, headers);
}

/**
 * Natural frequencies in bending (exact, Euler-Bernoulli): rows mode, Hz, rad/s; loads down + (load/g adds mass). Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.FREQUENCIES("6 6", 2e5, 0.3, 3)
 * @customfunction FREQUENCIES
 * @helpurl https://localhost:3000/help/frequencies.html
 * @remarks Natural frequencies in bending of the member, lowest first: mode number, frequency in Hz, circular frequency in rad/s. Exact for an Euler-Bernoulli beam (no shear deformation, no rotary inertia): exact dynamic-stiffness elements with the Wittrick-Williams count, so no mode is missed. Mass per length in force x s^2 / length^2, plus the weight of the given loads divided by g. Whether a floor's vibration is acceptable is for the governing guide and the engineer to decide. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right: a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param EI Flexural stiffness, one value or one per span (force x length^2, or the EI unit of units). Required. Euler-Bernoulli only: a shear stiffness is refused.
 * @param mass Mass per length, one value or one per span, in force x s^2 / length^2 (t/m with kN and m, kg/m with N and m), so sqrt(EI/(m L^4)) is 1/s. Blank = 0 (mass from loads).
 * @param [modes] How many frequencies, lowest first: a whole number from 1 to 50. Blank = 1. Floor vibration acceptance is the governing guide's and the engineer's call, not checked here.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [loads] Loads whose weight adds mass (load / g): point loads give point masses, uniform loads uniform mass; couples and varying linear loads are refused. Table or text; forces down +.
 * @param [combo] Combination that gives the mass loads, such as D+0.1L. Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=m, force=kN, EI=kN*m^2": lengths, loads and EI in these units; mass in force x s^2 / length^2 of them. Blank = consistent units.
 * @param [g] Acceleration of gravity for loads/g, in the length unit per s^2 (9.80665 for m, 32.174 for ft). Blank = standard gravity in the units' length unit; needed with loads and no units.
 * @param [headers] TRUE (or 1, yes) adds a first row naming each column with its unit from units (just the names without units). Blank or FALSE = no header row.
 * @returns One row per mode: mode, frequency (Hz), circular frequency (rad/s). Floor vibration acceptance is the governing guide's and the engineer's call.
 */
export function frequencies(spans: any[][], EI: any[][], mass: any[][], modes?: any, supports?: any[][], loads?: any[][], combo?: any, units?: any[][], g?: any, headers?: any): any[][] {
  return sheetFrequencies(spans, EI, mass, modes, supports, loads, combo, units, g, headers);
}

/**
 * Mode shape: one mode's deflection at each x, scaled to a largest |w| of 1 (leftmost peak +); loads down + (load/g adds mass). Results are an aid to a qualified engineer: check them; local codes govern. Example: =SPAN.MODESHAPE("6 6", 2e5, 0.3, 1, A2:A40)
 * @customfunction MODESHAPE
 * @helpurl https://localhost:3000/help/modeshape.html
 * @remarks The shape of one natural mode at each x, scaled so that its largest |w| is 1 with the leftmost such peak positive (down +). A mode whose frequency equals a neighbour's to 8 digits has no unique shape and is refused. Mass as for SPAN.FREQUENCIES. Whether a floor's vibration is acceptable is for the governing guide and the engineer to decide. Results are an aid to a qualified engineer: check them; local codes govern.
 * @param spans Span lengths left to right: a row or column with one cell per span, or one text cell such as "6 8 6".
 * @param EI Flexural stiffness, one value or one per span (force x length^2, or the EI unit of units). Required. Euler-Bernoulli only: a shear stiffness is refused.
 * @param mass Mass per length, one value or one per span, in force x s^2 / length^2 (t/m with kN and m, kg/m with N and m). Blank = 0 (mass from loads).
 * @param mode Which mode: 1 for the lowest frequency, up to 50. A repeated frequency has no unique shape and is refused.
 * @param x Positions from the member's left end: a cell, row, column or block (at most 10001 cells); the result has its shape, blank cells give blanks.
 * @param [supports] One entry per node (spans + 1): pin, fixed, free, hinge, or a spring stiffness (force/length). Blank = every node pin.
 * @param [loads] Loads whose weight adds mass (load / g), as for SPAN.FREQUENCIES. Table or text; forces down +.
 * @param [combo] Combination that gives the mass loads, such as D+0.1L. Blank = every load at factor 1.
 * @param [units] Unit labels such as "length=m, force=kN, EI=kN*m^2", as for SPAN.FREQUENCIES. Blank = consistent units.
 * @param [g] Acceleration of gravity for loads/g in the length unit per s^2. Blank = standard gravity in the units' length unit.
 * @returns The normalised mode deflection at each x, in the shape of x.
 */
export function modeShape(spans: any[][], EI: any[][], mass: any[][], mode: any, x: any[][], supports?: any[][], loads?: any[][], combo?: any, units?: any[][], g?: any): any[][] {
  return sheetModeShape(spans, EI, mass, mode, x, supports, loads, combo, units, g);
}
