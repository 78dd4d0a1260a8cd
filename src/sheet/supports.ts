/**
 * The supports argument: one entry per node (spans + 1). Words pin, fixed, free, hinge
 * (any case), or a positive number = vertical spring stiffness (force/length). Omitted or
 * wholly blank = every node pin; a blank cell inside a supports range = pin.
 */
import { invalid, type Support } from "../core";
import { errorCodeOf, isBlank, numberFromText, show } from "./cells";
import { isAllBlank, listEntries, singleCell } from "./ranges";

const PIN: Support = { kind: "pin" };
const WORDS: Record<string, Support> = {
  pin: PIN,
  fixed: { kind: "fixed" },
  free: { kind: "free" },
  hinge: { kind: "hinge" },
};

function readSupport(entry: unknown, index: number, fromText: boolean): Support {
  const where = `supports entry ${index + 1}`;
  if (!fromText && isBlank(entry)) return PIN;
  const code = errorCodeOf(entry);
  if (code !== null) throw invalid(`${where}: the cell holds the error ${code}`);
  let stiffness: number | null = null;
  if (typeof entry === "number") stiffness = entry;
  else if (typeof entry === "string") {
    const word = WORDS[entry.trim().toLowerCase()];
    if (word) return word;
    stiffness = numberFromText(entry);
  }
  if (stiffness === null) {
    throw invalid(`${where}: ${show(entry)} is not a support; use pin, fixed, free, hinge or a spring stiffness (a positive number)`);
  }
  if (!(stiffness > 0)) {
    throw invalid(`${where}: spring stiffness must be a positive number, got ${stiffness} (use free for no support)`);
  }
  return { kind: "spring", stiffness };
}

/** Reads the supports argument for a member of `spanCount` spans. */
export function readSupports(arg: unknown, spanCount: number): Support[] {
  const needed = spanCount + 1;
  if (isAllBlank(arg)) return new Array<Support>(needed).fill(PIN);
  const fromText = typeof singleCell(arg) === "string";
  const entries = listEntries(arg, "supports");
  let count = entries.length;
  while (count > needed && isBlank(entries[count - 1])) count--;
  if (count !== needed) {
    throw invalid(`supports: need ${needed} entries (one per node, spans + 1) for ${spanCount} span${spanCount === 1 ? "" : "s"}, got ${count}`);
  }
  const supports = new Array<Support>(needed);
  for (let i = 0; i < needed; i++) supports[i] = readSupport(entries[i], i, fromText);
  return supports;
}
