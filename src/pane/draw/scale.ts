/**
 * A linear scale with round-number ticks: the little the pane needs from a charting library,
 * kept here so the drawing code runs unchanged in Node tests and the page stays small.
 */
export interface LinearScale {
  (value: number): number;
  invert(pixel: number): number;
  domain(): [number, number];
  range(): [number, number];
  /** Round-number values inside the domain, about `count` of them. */
  ticks(count: number): number[];
}

/** The round step (1, 2 or 5 times a power of ten) giving about `count` intervals over `span`. */
export function tickStep(span: number, count: number): number {
  const raw = Math.abs(span) / Math.max(1, count);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const ratio = raw / power;
  return power * (ratio >= 7.5 ? 10 : ratio >= 3.5 ? 5 : ratio >= 1.5 ? 2 : 1);
}

export function linearScale(domain: [number, number], range: [number, number]): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const k = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  const scale = ((value: number) => r0 + (value - d0) * k) as LinearScale;
  scale.invert = (pixel: number) => (k === 0 ? d0 : d0 + (pixel - r0) / k);
  scale.domain = () => [d0, d1];
  scale.range = () => [r0, r1];
  scale.ticks = (count: number) => {
    const lo = Math.min(d0, d1);
    const hi = Math.max(d0, d1);
    const step = tickStep(hi - lo, count);
    const out: number[] = [];
    const first = Math.ceil(lo / step - 1e-9);
    const last = Math.floor(hi / step + 1e-9);
    for (let i = first; i <= last && out.length < 100; i++) out.push(Number((i * step).toPrecision(12)));
    return out;
  };
  return scale;
}

/** SVG path through the points, straight segments. */
export function polyline(xs: ArrayLike<number>, ys: ArrayLike<number>): string {
  let d = "";
  for (let i = 0; i < xs.length; i++) d += `${i === 0 ? "M" : "L"}${Math.round(xs[i] * 10) / 10},${Math.round(ys[i] * 10) / 10}`;
  return d;
}

/** Closed SVG path of the area between the points and the line y = base. */
export function areaTo(xs: ArrayLike<number>, ys: ArrayLike<number>, base: number): string {
  if (xs.length === 0) return "";
  const b = Math.round(base * 10) / 10;
  return `M${Math.round(xs[0] * 10) / 10},${b}` + polyline(xs, ys).replace(/^M/, "L") + `L${Math.round(xs[xs.length - 1] * 10) / 10},${b}Z`;
}
