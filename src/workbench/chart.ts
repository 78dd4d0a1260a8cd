/** A plain SVG line chart, the workbench's stand-in for a spreadsheet host's native chart. */
export interface ChartSpec {
  title: string;
  x: number[];
  series: { name: string; values: number[] }[];
}

const WIDTH = 360;
const HEIGHT = 180;
const PAD = 28;
const COLOURS = ["#2a6f97", "#c8553d", "#5b8e3e", "#7a5195"];
let counter = 0;

export function drawChart(container: HTMLElement, spec: ChartSpec): string {
  const id = `chart-${++counter}`;
  const ns = "http://www.w3.org/2000/svg";
  const figure = document.createElement("figure");
  figure.id = id;
  const caption = document.createElement("figcaption");
  caption.textContent = spec.title;
  const svg = document.createElementNS(ns, "svg");
  svg.setAttribute("width", String(WIDTH));
  svg.setAttribute("height", String(HEIGHT));
  const xs = spec.x;
  const all = spec.series.flatMap((s) => s.values).filter(Number.isFinite);
  const [xMin, xMax] = [xs.reduce((a, b) => Math.min(a, b), Infinity), xs.reduce((a, b) => Math.max(a, b), -Infinity)];
  const [yMin, yMax] = [all.reduce((a, b) => Math.min(a, b), 0), all.reduce((a, b) => Math.max(a, b), 0)];
  const sx = (x: number): number => PAD + ((x - xMin) / (xMax - xMin || 1)) * (WIDTH - 2 * PAD);
  const sy = (y: number): number => HEIGHT - PAD - ((y - yMin) / (yMax - yMin || 1)) * (HEIGHT - 2 * PAD);
  const axis = document.createElementNS(ns, "line");
  Object.entries({ x1: PAD, x2: WIDTH - PAD, y1: sy(0), y2: sy(0), stroke: "#999" }).forEach(([k, v]) => axis.setAttribute(k, String(v)));
  svg.appendChild(axis);
  spec.series.forEach((series, index) => {
    const line = document.createElementNS(ns, "polyline");
    line.setAttribute("points", series.values.map((y, i) => `${sx(xs[i])},${sy(y)}`).join(" "));
    line.setAttribute("fill", "none");
    line.setAttribute("stroke", COLOURS[index % COLOURS.length]);
    line.setAttribute("stroke-width", "1.5");
    const title = document.createElementNS(ns, "title");
    title.textContent = series.name;
    line.appendChild(title);
    svg.appendChild(line);
  });
  figure.append(caption, svg);
  container.appendChild(figure);
  return id;
}
