import { invalid } from "./errors";
import { parseCombination, type Combination } from "./combination";
import { checkCount, LIMITS } from "./limits";

/**
 * Named sets of load combinations, each expanded to its individual combinations (an
 * "Lr or S or R" alternative becomes one combination per choice). Case labels follow the
 * standards: D dead, L live, Lr roof live, S snow, R rain, W wind; G permanent and any
 * other label variable for EN 1990.
 */

const ROOF = ["Lr", "S", "R"];

function expand(templates: string[]): string[] {
  const out: string[] = [];
  for (const template of templates) {
    if (!template.includes("{roof}")) {
      out.push(template);
      continue;
    }
    for (const roof of ROOF) out.push(template.split("{roof}").join(roof));
  }
  return out;
}

/** ASCE/SEI 7-16 section 2.3.1, strength design basic combinations 1 to 5. */
export const STRENGTH_TEMPLATES = [
  "1.4D",
  "1.2D + 1.6L + 0.5{roof}",
  "1.2D + 1.6{roof} + 1.0L",
  "1.2D + 1.6{roof} + 0.5W",
  "1.2D + 1.0W + 1.0L + 0.5{roof}",
  "0.9D + 1.0W",
];

/** ASCE/SEI 7-16 section 2.4.1, allowable stress design basic combinations 1 to 7. */
export const ALLOWABLE_TEMPLATES = [
  "1.0D",
  "1.0D + 1.0L",
  "1.0D + 1.0{roof}",
  "1.0D + 0.75L + 0.75{roof}",
  "1.0D + 0.6W",
  "1.0D + 0.75L + 0.45W + 0.75{roof}",
  "0.6D + 0.6W",
];

export interface SetOptions {
  /** EN 1990: the combination factor psi0, one value for every variable case or one per case label. */
  psi0?: number | Record<string, number>;
  /** EN 1990: the variable case labels (every label but G, when taken from a load table). */
  variableCases?: string[];
}

function psiFor(options: SetOptions, loadCase: string): number {
  const psi = options.psi0;
  const value = typeof psi === "number" ? psi : psi !== undefined && Object.prototype.hasOwnProperty.call(psi, loadCase) ? psi[loadCase] : undefined;
  if (value === undefined || !Number.isFinite(value) || value < 0 || value > 1) {
    throw invalid(`combination set EN1990-6.10: give psi0 between 0 and 1 for variable case ${loadCase}`);
  }
  return value;
}

function round(value: number): number {
  return +value.toPrecision(12);
}

/**
 * EN 1990 expression (6.10): sum of gamma_G G + gamma_Q,1 Q_k,1 + sum of gamma_Q,i psi_0,i Q_k,i,
 * with gamma_G = 1.35 (unfavourable) or 1.00 (favourable) and gamma_Q = 1.5 (EN 1990 table
 * A1.2(B)), each variable case leading in turn.
 */
function eurocodeTemplates(options: SetOptions): string[] {
  const variables = options.variableCases ?? [];
  // 2 n + 1 combinations of n + 1 terms each: the case list is bounded, the text grows as n^2.
  checkCount(variables.length, LIMITS.variableCases, "EN1990-6.10", "variable cases", "the cases argument, or the case labels of the loads other than G");
  if (typeof options.psi0 === "object" && options.psi0 !== null) {
    checkCount(Object.keys(options.psi0).length, LIMITS.psi0Pairs, "psi0", "pairs");
  }
  const out: string[] = ["1.35G"];
  for (const gamma of [1.35, 1.0]) {
    for (const lead of variables) {
      const terms = [`${gamma === 1 ? "1.0" : gamma}G`, `1.5${lead}`];
      for (const other of variables) if (other !== lead) terms.push(`${round(1.5 * psiFor(options, other))}${other}`);
      out.push(terms.join(" + "));
    }
  }
  return out;
}

export const COMBINATION_SETS = ["ASCE7-2.3.1", "ASCE7-2.4.1", "EN1990-6.10"] as const;

/**
 * The individual combinations of a named set: `ASCE7-2.3.1` (strength), `ASCE7-2.4.1`
 * (allowable stress) or `EN1990-6.10` (needs psi0 and the variable cases). Names are
 * case-insensitive; an unknown name is a #VALUE! error listing the known ones.
 */
export function expandCombinationSet(name: string, options: SetOptions = {}): Combination[] {
  const key = String(name).trim().toUpperCase().replace(/\s+/g, "");
  let templates: string[];
  if (key === "ASCE7-2.3.1" || key === "ASCE7-LRFD") templates = expand(STRENGTH_TEMPLATES);
  else if (key === "ASCE7-2.4.1" || key === "ASCE7-ASD") templates = expand(ALLOWABLE_TEMPLATES);
  else if (key === "EN1990-6.10") templates = eurocodeTemplates(options);
  else throw invalid(`unknown combination set "${name}"; use one of ${COMBINATION_SETS.join(", ")} or write combinations out`);
  return templates.map((text) => parseCombination(text));
}
