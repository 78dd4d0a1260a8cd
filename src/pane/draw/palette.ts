/** The pane's own colours, light and dark. */
export interface Palette {
  background: string;
  ink: string;
  muted: string;
  grid: string;
  zero: string;
  beam: string;
  support: string;
  load: string;
  loadFill: string;
  shear: string;
  shearFill: string;
  moment: string;
  momentFill: string;
  deflection: string;
  deflectionFill: string;
  cursor: string;
}

export type Theme = "light" | "dark";

const LIGHT: Palette = {
  background: "#fbfbf8",
  ink: "#23262b",
  muted: "#6d737b",
  grid: "#e4e4dc",
  zero: "#8d9299",
  beam: "#2f3338",
  support: "#56606a",
  load: "#3d7a46",
  loadFill: "rgba(61,122,70,0.16)",
  shear: "#1d7f91",
  shearFill: "rgba(29,127,145,0.14)",
  moment: "#b4582b",
  momentFill: "rgba(180,88,43,0.14)",
  deflection: "#6b52b8",
  deflectionFill: "rgba(107,82,184,0.12)",
  cursor: "#c23b64",
};

const DARK: Palette = {
  background: "#1c1f23",
  ink: "#e7e8e4",
  muted: "#9aa1a9",
  grid: "#30353b",
  zero: "#737a83",
  beam: "#d8dbd6",
  support: "#a9b1b9",
  load: "#86c98d",
  loadFill: "rgba(134,201,141,0.18)",
  shear: "#56c2d3",
  shearFill: "rgba(86,194,211,0.16)",
  moment: "#f0915f",
  momentFill: "rgba(240,145,95,0.16)",
  deflection: "#a993f0",
  deflectionFill: "rgba(169,147,240,0.15)",
  cursor: "#f06a95",
};

export function palette(theme: Theme): Palette {
  return theme === "dark" ? DARK : LIGHT;
}

/** Dark when the colour is dark: what a host's background colour says about its theme. */
export function isDarkColour(hex: string): boolean {
  const match = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex.trim());
  if (!match) return false;
  const [r, g, b] = match.slice(1).map((h) => parseInt(h, 16) / 255);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b < 0.45;
}
