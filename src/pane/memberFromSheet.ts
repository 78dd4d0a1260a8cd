/**
 * Finds the member behind the selected cell: parses its SPAN formula, reads each member
 * argument through the host (ranges, spilled ranges, names, literals, array constants),
 * builds the member with the sheet layer's own readers and solves it with the core.
 */
import type { Member, Solution } from "../core";
import { describeError, memberInOwnUnits, readLoads, readMember, readMemberUnits, solvedMember, type MemberArgs } from "../sheet";
import { MEMBER_ARGUMENTS, parseSpanFormula, unresolvedArguments, type ArgSource, type MemberArgument, type SpanCall } from "./formulaRefs";
import { qualify, type Selection, type SheetHost } from "./host";
import { NO_UNITS, paneUnits, type Units } from "./units";

export type MemberSources = Record<MemberArgument, ArgSource>;

/**
 * What the selected cell computes, as the pane draws it: one member under one combination
 * (REACTIONS, SHEAR, ..., DIAGRAM, the checks), an envelope over combinations (ENVELOPE,
 * PEAKS), an influence line (INFLUENCE), a moving load (MOVING), or natural modes
 * (FREQUENCIES, MODESHAPE).
 */
export type CellKind = "member" | "envelope" | "peaks" | "influence" | "moving" | "vibration";

const KIND: Partial<Record<string, CellKind>> = { envelope: "envelope", peaks: "peaks", influence: "influence", moving: "moving", frequencies: "vibration", modeShape: "vibration" };

/** The arguments besides the member's that the pane needs to draw a study cell. */
export const STUDY_ARGUMENTS = ["combos", "pattern", "psi0", "effect", "axles", "spacings", "quantity", "x", "positions", "mass", "modes", "mode", "g"] as const;
/** Study arguments the drawing does not need: an expression there is skipped, not refused. */
const OPTIONAL_FOR_DRAWING: readonly string[] = ["x", "positions"];
export type StudyArgument = (typeof STUDY_ARGUMENTS)[number];

/** What a formula cell computes, from its function; undefined when it has no member (SECTION, CONVERT, ...). */
export function cellKindOf(call: SpanCall): CellKind | undefined {
  if (!call.entry.arguments.some((a) => a.name === "spans")) return undefined;
  return KIND[call.entry.exportName] ?? "member";
}

export interface ResolvedMember {
  /** Sheet and cell of the formula (or of the picked inputs). */
  sheet: string;
  cell: string;
  call: SpanCall | undefined;
  sources: MemberSources;
  /** Where each argument's values came from, sheet-qualified, when they came from a range. */
  ranges: Partial<Record<MemberArgument, string>>;
  /** The argument values as a worksheet function would receive them. */
  args: MemberArgs;
  /** Case labels of the load table, in order of first use. */
  cases: string[];
  units: Units;
  /** What the cell computes ("member" for picked inputs). */
  kind: CellKind;
  /** The study arguments' values (combos, pattern, psi0, effect, axles, spacings, quantity, and x or positions when the pane can read them) as the function receives them. */
  study: Partial<Record<StudyArgument, unknown>>;
}

export type Lookup =
  | { ok: true; member: ResolvedMember }
  | { ok: false; reason: "no-formula"; message: string }
  | { ok: false; reason: "no-member"; message: string }
  | { ok: false; reason: "unresolved"; message: string; unresolved: MemberArgument[]; call: SpanCall; sheet: string; cell: string }
  | { ok: false; reason: "invalid"; message: string };

const OMITTED: ArgSource = { kind: "omitted", text: "" };

function sheetOf(source: { sheet?: string }, sheet: string): string {
  return source.sheet ?? sheet;
}

/** The range an argument reads, sheet-qualified, or undefined for literals and skipped ones. */
async function rangeOf(host: SheetHost, source: ArgSource, sheet: string): Promise<string | undefined> {
  switch (source.kind) {
    case "range":
      return qualify(sheetOf(source, sheet), source.address);
    case "spill": {
      const spill = await host.spillRange(qualify(sheetOf(source, sheet), source.address));
      if (spill === undefined) throw new Error(`${source.text}: ${source.address} does not spill`);
      return spill;
    }
    case "name": {
      const range = await host.resolveName(source.name, sheetOf(source, sheet));
      if (range === undefined) throw new Error(`${source.text}: no range has that name`);
      return range;
    }
    default:
      return undefined;
  }
}

function literalValue(source: ArgSource): unknown {
  switch (source.kind) {
    case "omitted":
      return null;
    case "literal":
      return source.value;
    case "array":
      return source.rows;
    default:
      throw new Error(`${source.text}: the pane cannot work out this expression`);
  }
}

function casesOf(loads: unknown): string[] {
  try {
    const seen: string[] = [];
    for (const row of readLoads(loads)) if (row.loadCase && !seen.includes(row.loadCase)) seen.push(row.loadCase);
    return seen;
  } catch {
    return [];
  }
}

/** The units the formula's units argument names; none when it has none (or cannot be read: the solve then says why). */
function unitsOf(arg: unknown): Units {
  try {
    return paneUnits(readMemberUnits(arg ?? null));
  } catch {
    return NO_UNITS;
  }
}

/**
 * One argument's values as a worksheet function would receive them: a range, spill or name is
 * read through the host, a literal or array constant taken as written, a skipped one is null.
 * Rejects for an expression the pane cannot work out, a missing name or a range that does not spill.
 */
export async function argumentValue(host: SheetHost, source: ArgSource | undefined, sheet: string): Promise<{ value: unknown; range?: string }> {
  if (source === undefined) return { value: null };
  const range = await rangeOf(host, source, sheet);
  return range !== undefined ? { value: await host.getValues(range), range } : { value: literalValue(source) };
}

/** Reads every member argument's values through the host and builds the resolved member. */
export async function resolveSources(host: SheetHost, sheet: string, cell: string, sources: MemberSources, call?: SpanCall): Promise<Lookup> {
  const ranges: Partial<Record<MemberArgument, string>> = {};
  const values: Partial<Record<MemberArgument, unknown>> = {};
  const study: Partial<Record<StudyArgument, unknown>> = {};
  const kind = call ? (cellKindOf(call) ?? "member") : "member";
  try {
    for (const name of MEMBER_ARGUMENTS) {
      const source = sources[name];
      const range = await rangeOf(host, source, sheet);
      if (range !== undefined) {
        ranges[name] = range;
        values[name] = await host.getValues(range);
      } else values[name] = literalValue(source);
    }
    for (const name of STUDY_ARGUMENTS) {
      const source = call?.args[name];
      if (source === undefined || (source.kind === "expression" && OPTIONAL_FOR_DRAWING.includes(name))) continue;
      const range = await rangeOf(host, source, sheet);
      study[name] = range !== undefined ? await host.getValues(range) : literalValue(source);
    }
  } catch (error) {
    return { ok: false, reason: "invalid", message: error instanceof Error ? error.message : String(error) };
  }
  const args: MemberArgs = {
    spans: values.spans,
    loads: values.loads,
    supports: values.supports ?? null,
    EI: values.EI ?? null,
    combo: values.combo ?? null,
    units: values.units ?? null,
  };
  const units = unitsOf(args.units);
  return { ok: true, member: { sheet, cell, call, sources, ranges, args, cases: casesOf(args.loads), units, kind, study } };
}

/** The member behind a selection holding a SPAN formula. */
export async function findMember(host: SheetHost, selection: Selection): Promise<Lookup> {
  const parsed = parseSpanFormula(selection.formula);
  if (!parsed.ok) return { ok: false, reason: "no-formula", message: `${selection.cell}: ${parsed.message}` };
  const call = parsed.call;
  if (cellKindOf(call) === undefined) {
    return { ok: false, reason: "no-member", message: `${selection.cell}: ${call.functionName} computes no member, so the pane has nothing to draw for this cell` };
  }
  const unresolved = unresolvedArguments(call);
  if (unresolved.length > 0) {
    const list = unresolved.map((name) => `${name} (${call.args[name].text})`).join(", ");
    return {
      ok: false,
      reason: "unresolved",
      message: `${selection.cell}: the pane cannot work out ${list}; pick the input ranges instead`,
      unresolved,
      call,
      sheet: selection.sheet,
      cell: selection.cell,
    };
  }
  const sources = Object.fromEntries(MEMBER_ARGUMENTS.map((name) => [name, call.args[name] ?? OMITTED])) as MemberSources;
  return resolveSources(host, selection.sheet, selection.cell, sources, call);
}

export interface Solved {
  member: Member;
  solution: Solution;
  /** The combination applied ("" = every load at factor 1). */
  comboText: string;
}

/**
 * Solves the member, with `combo` in place of the formula's combination when given
 * (`""` = every load at 1). The solution is the sheet layer's own (solvedMember, the cached
 * solve every analysis function uses), so the combination box and every other input obey
 * exactly the rules the worksheet functions obey (case labels, combinations, blanks, units);
 * a refusal comes back as `{ error }` with the sheet layer's code and message. The member drawn
 * is read the same way, in the formula's own length and force units.
 */
export function solveMember(resolved: ResolvedMember, combo?: string): Solved | { error: string } {
  try {
    const args: MemberArgs = combo === undefined ? resolved.args : { ...resolved.args, combo };
    const units = readMemberUnits(args.units ?? null);
    const solution = solvedMember(args, units);
    const member = units === null ? readMember(args) : memberInOwnUnits(readMember(args), units);
    const comboText = combo ?? (typeof args.combo === "string" ? args.combo : Array.isArray(args.combo) ? String(args.combo[0]?.[0] ?? "") : "");
    return { member, solution, comboText };
  } catch (error) {
    const { code, message } = describeError(error);
    return { error: `${code} ${message}` };
  }
}
