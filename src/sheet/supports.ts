/**
 * The supports argument: one entry per node (spans + 1). Words pin, fixed, free, hinge
 * (any case), or a positive number = vertical spring stiffness (force/length); with `rot K`
 * a rotational spring of K (moment per radian): `rot K` alone (vertically free), `pin+rot K`
 * or `pin rot K`, `spring S rot K` or `S rot K`. Omitted or
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

/** The word `rot` (after the start, a space or a +, before a space or the end): a rotational spring follows. */
const ROT = /(?:^|[\s+])rot(?=\s|$)/i;

/**
 * `rot K`, `pin+rot K` (or `pin rot K`), `spring S rot K` (or `S rot K`): a rotational spring
 * of K (moment per radian) alone, with a pin, or with a vertical spring of S (force/length).
 */
function withRotationalSpring(head: string, tail: string, where: string): Support {
  const rotational = numberFromText(tail);
  if (rotational === null || !(rotational > 0)) {
    throw invalid(`${where}: rot must be followed by a positive rotational spring stiffness (moment per radian), got ${JSON.stringify(tail.trim())} (use pin for none, fixed for full fixity)`);
  }
  let base = head.trim().toLowerCase();
  if (base.endsWith("+")) base = base.slice(0, -1).trim();
  if (base === "") return { kind: "free", rotational };
  if (base === "pin") return { kind: "pin", rotational };
  if (base.startsWith("spring")) base = base.slice("spring".length).trim();
  const stiffness = numberFromText(base);
  if (stiffness === null || !(stiffness > 0)) {
    throw invalid(`${where}: ${JSON.stringify(head.trim())} cannot take a rotational spring; write rot K, pin+rot K or spring S rot K (S and K positive)`);
  }
  return { kind: "spring", stiffness, rotational };
}

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
    const rot = ROT.exec(entry);
    if (rot) return withRotationalSpring(entry.slice(0, rot.index), entry.slice(rot.index + rot[0].length), where);
    const text = entry.trim();
    stiffness = numberFromText(/^spring\s/i.test(text) ? text.slice("spring".length) : text);
  }
  if (stiffness === null) {
    throw invalid(`${where}: ${show(entry)} is not a support; use pin, fixed, free, hinge, a spring stiffness (a positive number), or rot K for a rotational spring`);
  }
  if (!(stiffness > 0)) {
    throw invalid(`${where}: spring stiffness must be a positive number, got ${stiffness} (use free for no support)`);
  }
  return { kind: "spring", stiffness };
}

/**
 * In a one-cell list the words `spring`, `rot` and a token ending in `+rot` take the next
 * token as their stiffness: "fixed pin+rot 5000 spring 200+rot 5000 rot 800" has four nodes.
 */
function groupWords(tokens: string[]): string[] {
  const grouped: string[] = [];
  let i = 0;
  while (i < tokens.length) {
    let entry = tokens[i++];
    let last = entry.toLowerCase();
    while (i < tokens.length && (last === "spring" || last === "rot" || last.endsWith("+rot"))) {
      last = tokens[i++].toLowerCase();
      entry += ` ${last}`;
    }
    grouped.push(entry);
  }
  return grouped;
}

/** Reads the supports argument for a member of `spanCount` spans. */
export function readSupports(arg: unknown, spanCount: number): Support[] {
  const needed = spanCount + 1;
  if (isAllBlank(arg)) {
    const pins = new Array<Support>(needed);
    for (let i = 0; i < needed; i++) pins[i] = PIN;
    return pins;
  }
  const fromText = typeof singleCell(arg) === "string";
  const entries = fromText ? groupWords(listEntries(arg, "supports") as string[]) : listEntries(arg, "supports");
  let count = entries.length;
  while (count > needed && isBlank(entries[count - 1])) count--;
  if (count !== needed) {
    throw invalid(`supports: need ${needed} entries (one per node, spans + 1) for ${spanCount} span${spanCount === 1 ? "" : "s"}, got ${count}`);
  }
  const supports = new Array<Support>(needed);
  for (let i = 0; i < needed; i++) supports[i] = readSupport(entries[i], i, fromText);
  return supports;
}
