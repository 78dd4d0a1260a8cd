/**
 * Plain-text descriptions of a member and of numbers, shared by the verification document and
 * the member report (one wording for both). Pure: data in, text out.
 */
import type { Load, Member, Support } from "../core";

/** A number to 10 significant figures (enough to read a 1e-9 agreement), no trailing zeros. */
export function num(value: number): string {
  if (Number.isNaN(value)) return "n/a";
  if (!Number.isFinite(value)) return value > 0 ? "inf" : "-inf";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-4 && abs < 1e12) return String(Number(value.toPrecision(10)));
  return value.toExponential(9).replace(/\.?0+e/, "e");
}

/** A number to `digits` significant figures, for result tables meant to be read, not audited. */
export function short(value: number, digits = 5): string {
  if (!Number.isFinite(value)) return num(value);
  if (value === 0 || Math.abs(value) < 1e-300) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e9) return String(Number(value.toPrecision(digits)));
  return value.toExponential(digits - 1).replace(/\.?0+e/, "e");
}

export function supportText(s: Support): string {
  const base = s.kind === "spring" ? `spring k = ${num(s.stiffness)}` : s.kind;
  const rotational = "rotational" in s && typeof s.rotational === "number" ? s.rotational : undefined;
  if (rotational === undefined) return base;
  return `${s.kind === "free" ? "" : `${base} + `}rotational spring k = ${num(rotational)} per radian`;
}

export function loadText(l: Load): string {
  const at = `x = ${num(l.xStart)}`;
  const between = `x = ${num(l.xStart)} to ${num(l.xEnd)}`;
  const tag = l.loadCase ? ` [${l.loadCase}]` : "";
  switch (l.kind) {
    case "point":
      return `point ${num(l.magnitude)} at ${at}${tag}`;
    case "moment":
      return `couple ${num(l.magnitude)} at ${at}${tag}`;
    case "udl":
      return `uniform ${num(l.magnitude)} over ${between}${tag}`;
    case "linear":
      return `linear ${num(l.magnitude)} to ${num(l.magnitudeEnd)} over ${between}${tag}`;
    case "settle":
      return `settlement ${num(l.magnitude)} (down) at ${at}${tag}`;
  }
}

/** The member as input lines: spans, supports, EI, loads. */
export function memberLines(m: Member): string[] {
  const ei = m.stiffness === null ? "none (forces and moments only)" : new Set(m.stiffness).size === 1 ? num(m.stiffness[0]) : m.stiffness.map(num).join(", ");
  return [
    `spans: ${m.spans.map(num).join(", ")}`,
    `supports: ${m.supports.map(supportText).join(", ")}`,
    `EI: ${ei}`,
    `loads: ${m.loads.length ? m.loads.map(loadText).join("; ") : "none"}`,
  ];
}
