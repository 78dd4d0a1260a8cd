/**
 * What a selection change will read, known from the formula text alone, so that a host with
 * round trips (Office) can read it all in one batch: every range the SPAN formula names, the
 * spills of its `A1#` arguments, its named ranges, and the label cells beside the member's
 * (what the pane reads to guess units). Pure; addresses are sheet-qualified A1 text.
 */
import { blockText, parseBlock } from "./addresses";
import { MEMBER_ARGUMENTS, classifyArgument, parseSpanFormula } from "./formulaRefs";
import { qualify, splitAddress, type Selection } from "./host";

/** At most this many label cells above a range are read (the pane's unit guess looks no further). */
export const LABEL_ROWS_ABOVE = 12;

export interface ReadPlan {
  /** Ranges whose values are read. */
  ranges: string[];
  /** Anchors (`Sheet!B3`) whose spilled range and values are read. */
  spills: string[];
  /** Names resolved to their range (sheet scope first, then the workbook) and read. */
  names: { name: string; scope: string }[];
}

/** A cache key for an address: sheet and cells upper-cased, `$` dropped (sheet names are case-insensitive in the host). */
export function addressKey(address: string, defaultSheet: string): string {
  const { sheet, address: cells } = splitAddress(address.replace(/^=/, ""));
  return `${(sheet ?? defaultSheet).toUpperCase()}!${cells.replace(/\$/g, "").toUpperCase()}`;
}

/** A name's key within its scope sheet. */
export function nameKey(name: string, scope: string): string {
  return `${scope.toUpperCase()}|${name.toUpperCase()}`;
}

/**
 * The label cells near a range: the cell left of its first cell, and up to
 * LABEL_ROWS_ABOVE cells above it in its column (the same cells memberFromSheet's unit
 * guess reads). Empty for an address that is not a block.
 */
export function labelWindows(qualified: string): string[] {
  try {
    const { sheet = "", address } = splitAddress(qualified);
    const block = parseBlock(address);
    const out: string[] = [];
    if (block.from.col > 0) {
      const left = { row: block.from.row, col: block.from.col - 1 };
      out.push(qualify(sheet, blockText({ from: left, to: left })));
    }
    if (block.from.row > 0) {
      const top = Math.max(0, block.from.row - LABEL_ROWS_ABOVE);
      out.push(qualify(sheet, blockText({ from: { row: top, col: block.from.col }, to: { row: block.from.row - 1, col: block.from.col } })));
    }
    return out;
  } catch {
    return [];
  }
}

/** The range a defined name's formula text ("=Beam!$A$10:$F$12") refers to, or undefined when it is not one range. */
export function rangeOfNameFormula(text: unknown, scope: string): string | undefined {
  if (typeof text !== "string") return undefined;
  const source = classifyArgument(text.replace(/^=/, ""));
  if (source.kind !== "range") return undefined;
  return qualify(source.sheet ?? scope, source.address);
}

/**
 * The reads a selection needs: nothing when its formula holds no SPAN call the pane can read.
 * `nameRange` tells where a name points when that is known before reading (for its labels).
 */
export function planReads(selection: Selection, nameRange: (name: string, scope: string) => string | undefined = () => undefined): ReadPlan {
  const plan: ReadPlan = { ranges: [], spills: [], names: [] };
  if (!selection.formula || !/SPAN/i.test(selection.formula)) return plan;
  const parsed = parseSpanFormula(selection.formula);
  if (!parsed.ok) return plan;
  const add = (list: string[], address: string): void => {
    if (!list.some((known) => addressKey(known, selection.sheet) === addressKey(address, selection.sheet))) list.push(address);
  };
  // Every argument is read (the member's, and x, points... for the cell's own message), and
  // the label cells of the member's arguments (for the unit guess).
  for (const [argument, source] of Object.entries(parsed.call.args)) {
    const labelled = (MEMBER_ARGUMENTS as readonly string[]).includes(argument);
    const sheet = "sheet" in source && source.sheet !== undefined ? source.sheet : selection.sheet;
    if (source.kind === "range") {
      const address = qualify(sheet, source.address);
      add(plan.ranges, address);
      if (labelled) for (const label of labelWindows(address)) add(plan.ranges, label);
    } else if (source.kind === "spill") {
      const anchor = qualify(sheet, source.address);
      add(plan.spills, anchor);
      // A spill starts at its anchor, so its label cells are the anchor's.
      if (labelled) for (const label of labelWindows(anchor)) add(plan.ranges, label);
    } else if (source.kind === "name") {
      if (!plan.names.some((n) => nameKey(n.name, n.scope) === nameKey(source.name, sheet))) plan.names.push({ name: source.name, scope: sheet });
      const known = nameRange(source.name, sheet);
      if (labelled && known !== undefined) for (const label of labelWindows(known)) add(plan.ranges, label);
    }
  }
  return plan;
}
