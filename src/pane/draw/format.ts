/** Numbers as the pane shows them: four significant figures, no trailing zeros. */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0 || Object.is(value, -0)) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) return value.toExponential(3).replace(/\.?0+e/, "e");
  return String(Number(value.toPrecision(4)));
}

/** "12.5 kN" or "12.5" without a unit. */
export function withUnitValue(value: number, unit: string): string {
  return unit ? `${formatValue(value)} ${unit}` : formatValue(value);
}

/** Escapes text for SVG/HTML content and attributes. */
export function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}
