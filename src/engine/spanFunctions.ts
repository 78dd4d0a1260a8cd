/** The real worksheet functions (functions/functions.ts) as the engine's function table. */
import { deflection, diagram, extremes, maxMoment, moment, reactions, shear, slope } from "../../functions/functions";
import type { SpanFunctions } from "./catalogue";

export const SPAN_EXPORTS: SpanFunctions = { reactions, shear, moment, slope, deflection, maxMoment, extremes, diagram };
