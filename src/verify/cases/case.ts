import type { Member } from "../../core";
import type { Check } from "../compare";

/** One handbook case: the member, where the expected values come from, and the checks. */
export interface HandbookCase {
  name: string;
  source: string;
  member: Member;
  checks: Check[];
}

export const SCM = "steel construction manual, beam diagrams and formulas";
export const ROARK = "formulas for stress and strain handbook, beam table";
export const COEFFICIENTS = "continuous-beam coefficient tables";
