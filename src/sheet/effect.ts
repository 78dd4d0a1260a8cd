/**
 * The effect argument of influence lines and moving loads, in words of our own:
 * `reaction 2` (vertical reaction at node 2), `moment reaction 1`, `shear at 4.5`,
 * `moment at 6`, `deflection at 3`, and for moving loads `absolute moment`
 * (the largest moment anywhere). Case-insensitive.
 */
import { invalid, type MovingEffect } from "../core";
import { errorCodeOf, show } from "./cells";
import { singleCell } from "./ranges";

const NUMBER = "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)";
const AT_PATTERN = new RegExp(`^(shear|moment|deflection)\\s+at\\s+${NUMBER}$`, "i");
const NODE_PATTERN = new RegExp(`^(reaction|moment\\s+reaction)\\s+(?:at\\s+node\\s+|node\\s+)?${NUMBER}$`, "i");

export function readEffect(arg: unknown, allowAbsolute: boolean): MovingEffect {
  const cell = singleCell(arg);
  const hint = `write reaction 2, moment reaction 1, shear at 4.5, moment at 6, deflection at 3${allowAbsolute ? " or absolute moment" : ""}`;
  if (typeof cell !== "string" || errorCodeOf(cell) !== null || cell.trim() === "") {
    throw invalid(`effect: ${cell === undefined ? "a range" : show(cell)} is not an effect; ${hint}`);
  }
  const text = cell.trim().replace(/\s+/g, " ");
  if (/^absolute moment$/i.test(text)) {
    if (!allowAbsolute) throw invalid(`effect: absolute moment applies to moving loads only; ${hint}`);
    return { kind: "absolute-moment" };
  }
  const at = AT_PATTERN.exec(text);
  if (at) return { kind: at[1].toLowerCase() as "shear" | "moment" | "deflection", x: Number(at[2]) };
  const node = NODE_PATTERN.exec(text);
  if (node) {
    const kind = node[1].toLowerCase().startsWith("moment") ? "moment-reaction" : "reaction";
    return { kind, node: Number(node[2]) };
  }
  throw invalid(`effect: "${text}" is not an effect; ${hint}`);
}
