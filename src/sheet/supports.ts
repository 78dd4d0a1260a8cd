/**
 * The supports argument: one entry per node (spans + 1). Words pin, fixed, free, hinge
 * (any case), or a positive number = vertical spring stiffness (force/length). Omitted or
 * wholly blank = every node pin; blank cells beyond the last node are ignored. A blank cell or
 * a 0 for a node is an error naming the entry: the host can deliver a blank as 0, and a spring
 * of 0 is no support, so neither may silently become a pin or a free end.
 */
import { invalid, type Support } from "../core";
import { errorCodeOf, isBlank, numberFromText, show } from "./cells";
import { isAllBlank, listEntries, singleCell } from "./ranges";

const PIN: Support = { kind: "pin" };
const WORDS = new Map<string, Support>([
  ["pin", PIN],
  ["fixed", { kind: "fixed" }],
  ["free", { kind: "free" }],
  ["hinge", { kind: "hinge" }],
]);

function readSupport(entry: unknown, index: number, fromText: boolean): Support {
  const where = `supports entry ${index + 1}`;
  if (!fromText && isBlank(entry)) {
    throw invalid(`${where}: the cell is blank or 0; write pin, fixed, free or hinge, or a positive spring stiffness (a spring of 0 is no support)`);
  }
  const code = errorCodeOf(entry);
  if (code !== null) throw invalid(`${where}: the cell holds the error ${code}`);
  let stiffness: number | null = null;
  if (typeof entry === "number") stiffness = entry;
  else if (typeof entry === "string") {
    const word = WORDS.get(entry.trim().toLowerCase());
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
