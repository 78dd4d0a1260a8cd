/** The real worksheet functions (functions/functions.ts) as the engine's function table. */
import { combos, deflection, diagram, envelope, extremes, influence, maxMoment, moment, moving, peaks, reactions, shear, slope } from "../../functions/functions";
import type { SpanFunctions } from "./catalogue";

export const SPAN_EXPORTS: SpanFunctions = {
  reactions,
  shear,
  moment,
  slope,
  deflection,
  maxMoment,
  extremes,
  diagram,
  envelope,
  peaks,
  influence,
  moving,
  combos,
};
