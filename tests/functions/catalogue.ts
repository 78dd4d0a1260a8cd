/**
 * The SPAN catalogue of DESIGN.md section 2, written out by hand so the generated metadata
 * can be checked against the contract: sheet name, JS export, parameters in order with
 * their dimensionality and whether they are optional, and a matrix result.
 */
export type Dimensionality = "scalar" | "matrix";

export interface CatalogueEntry {
  id: string;
  exportName: string;
  parameters: [name: string, dimensionality: Dimensionality, optional: boolean][];
}

const member: CatalogueEntry["parameters"] = [
  ["spans", "matrix", false],
  ["loads", "matrix", false],
];
const trailing: CatalogueEntry["parameters"] = [
  ["supports", "matrix", true],
  ["EI", "matrix", true],
  ["combo", "scalar", true],
];
/** The analysis functions' trailing arguments: the member's own, then the units labels. */
const analysis: CatalogueEntry["parameters"] = [...trailing, ["units", "matrix", true]];
/** The optional last argument of the tabular functions: a header row. */
const headers: CatalogueEntry["parameters"][number] = ["headers", "scalar", true];

export const CATALOGUE: CatalogueEntry[] = [
  { id: "REACTIONS", exportName: "reactions", parameters: [...member, ...analysis, headers] },
  { id: "SHEAR", exportName: "shear", parameters: [...member, ["x", "matrix", false], ...analysis] },
  { id: "MOMENT", exportName: "moment", parameters: [...member, ["x", "matrix", false], ...analysis] },
  { id: "SLOPE", exportName: "slope", parameters: [...member, ["x", "matrix", false], ...analysis] },
  { id: "DEFLECTION", exportName: "deflection", parameters: [...member, ["x", "matrix", false], ...analysis] },
  { id: "MAXMOMENT", exportName: "maxMoment", parameters: [...member, ...analysis, headers] },
  { id: "EXTREMES", exportName: "extremes", parameters: [...member, ...analysis, headers] },
  { id: "DIAGRAM", exportName: "diagram", parameters: [...member, ["points", "scalar", true], ...analysis, headers] },
  // load arrangements: envelopes, peaks, influence lines, moving loads, combination sets
  {
    id: "ENVELOPE",
    exportName: "envelope",
    parameters: [...member, ["x", "matrix", false], ["combos", "matrix", false], ["supports", "matrix", true], ["EI", "matrix", true], ["quantity", "scalar", true], ["pattern", "scalar", true], ["psi0", "scalar", true], ["units", "matrix", true], headers],
  },
  {
    id: "PEAKS",
    exportName: "peaks",
    parameters: [...member, ["combos", "matrix", false], ["supports", "matrix", true], ["EI", "matrix", true], ["pattern", "scalar", true], ["psi0", "scalar", true], ["units", "matrix", true], headers],
  },
  { id: "INFLUENCE", exportName: "influence", parameters: [["spans", "matrix", false], ["effect", "scalar", false], ["positions", "matrix", false], ["supports", "matrix", true], ["EI", "matrix", true], ["units", "matrix", true]] },
  {
    id: "MOVING",
    exportName: "moving",
    parameters: [["spans", "matrix", false], ["axles", "matrix", false], ["spacings", "matrix", false], ["effect", "scalar", false], ["supports", "matrix", true], ["EI", "matrix", true], ["units", "matrix", true], headers],
  },
  { id: "COMBOS", exportName: "combos", parameters: [["set", "scalar", false], ["psi0", "scalar", true], ["cases", "matrix", true]] },
  // sections, stresses, serviceability checks and units
  { id: "SECTION", exportName: "section", parameters: [["shape", "scalar", false], ["dimensions", "matrix", false], ["unit", "scalar", true], ["resultUnit", "scalar", true]] },
  { id: "STRESS", exportName: "stress", parameters: [...member, ["section", "matrix", false], ...trailing, ["units", "matrix", true], headers] },
  { id: "SHEARSTRESS", exportName: "shearStress", parameters: [...member, ["section", "matrix", false], ...trailing, ["units", "matrix", true], headers] },
  { id: "DEFLECTIONCHECK", exportName: "deflectionCheck", parameters: [...member, ["limit", "matrix", false], ...trailing, ["units", "matrix", true], headers] },
  { id: "UTILISATION", exportName: "utilisation", parameters: [["demand", "matrix", false], ["capacity", "matrix", false], ["demandUnit", "scalar", true], ["capacityUnit", "scalar", true]] },
  { id: "CONVERT", exportName: "convertUnits", parameters: [["value", "matrix", false], ["from", "scalar", false], ["to", "scalar", false]] },
  { id: "STIFFNESS", exportName: "stiffness", parameters: [["E", "matrix", false], ["I", "matrix", false], ["EUnit", "scalar", true], ["IUnit", "scalar", true], ["resultUnit", "scalar", true]] },
  // results per span and per load case, natural frequencies and mode shapes
  { id: "SPANPEAKS", exportName: "spanPeaks", parameters: [...member, ...analysis, headers] },
  { id: "CASEREACTIONS", exportName: "caseReactions", parameters: [...member, ...analysis, ["reaction", "scalar", true], headers] },
  {
    id: "FREQUENCIES",
    exportName: "frequencies",
    parameters: [["spans", "matrix", false], ["EI", "matrix", false], ["mass", "matrix", false], ["modes", "scalar", true], ["supports", "matrix", true], ["loads", "matrix", true], ["combo", "scalar", true], ["units", "matrix", true], ["g", "scalar", true], headers],
  },
  {
    id: "MODESHAPE",
    exportName: "modeShape",
    parameters: [["spans", "matrix", false], ["EI", "matrix", false], ["mass", "matrix", false], ["mode", "scalar", false], ["x", "matrix", false], ["supports", "matrix", true], ["loads", "matrix", true], ["combo", "scalar", true], ["units", "matrix", true], ["g", "scalar", true]],
  },
];

interface MetadataParameter {
  name: string;
  description?: string;
  type?: string;
  dimensionality?: string;
  optional?: boolean;
}

export interface MetadataFunction {
  id: string;
  name: string;
  description?: string;
  parameters: MetadataParameter[];
  result?: { dimensionality?: string };
}

/** Every difference between generated metadata and the catalogue (empty when they agree). */
export function catalogueMismatches(functions: MetadataFunction[]): string[] {
  const out: string[] = [];
  const byId = new Map(functions.map((f) => [f.id, f]));
  if (functions.length !== CATALOGUE.length) out.push(`expected ${CATALOGUE.length} functions, got ${functions.length}`);
  for (const entry of CATALOGUE) {
    const f = byId.get(entry.id);
    if (!f) {
      out.push(`${entry.id}: missing`);
      continue;
    }
    if (f.name !== entry.id) out.push(`${entry.id}: name ${f.name}`);
    if (f.result?.dimensionality !== "matrix") out.push(`${entry.id}: result is not a matrix`);
    const got = f.parameters.map((p) => [p.name, p.dimensionality ?? "scalar", p.optional === true]);
    if (JSON.stringify(got) !== JSON.stringify(entry.parameters)) {
      out.push(`${entry.id}: parameters ${JSON.stringify(got)}, expected ${JSON.stringify(entry.parameters)}`);
    }
    for (const p of f.parameters) if (!p.description || p.description.length < 20) out.push(`${entry.id}.${p.name}: no help text`);
    if (!f.description || !/aid to a qualified engineer/.test(f.description) || !/local codes govern/.test(f.description)) {
      out.push(`${entry.id}: help lacks the caution`);
    }
    // The load sign convention sits in the loads argument's own help (the description is kept
    // within 255 characters; the full conventions are on the function's help page).
    const loads = f.parameters.find((p) => p.name === "loads");
    if (!f.description || (loads && !/down \+/.test(loads.description ?? "")) || !/Example: =SPAN\./.test(f.description)) {
      out.push(`${entry.id}: help lacks the sign convention or an example`);
    }
  }
  return out;
}
