/**
 * Cost of one solve against the number of spans: each span carries a UDL and a point load,
 * supports alternate pin / pin with fixed ends. The solve is meant to be O(n) in spans; the
 * ratio 1000-span / 10-span cost should be at most 200 (100x the spans, with some headroom).
 */
import { solve, type Load, type Member } from "../../src/core";
import { loadAverage, measure, printTable } from "./measure";

function member(spans: number): Member {
  const lengths = Array.from({ length: spans }, (_, i) => 4 + (i % 3));
  const loads: Load[] = [];
  let x = 0;
  lengths.forEach((l, i) => {
    loads.push({ kind: "udl", magnitude: 2 + (i % 5), xStart: x, xEnd: x + l, magnitudeEnd: 2 + (i % 5), loadCase: "D", row: 2 * i + 1 });
    loads.push({ kind: "point", magnitude: 10, xStart: x + l / 3, xEnd: x + l / 3, magnitudeEnd: 10, loadCase: "L", row: 2 * i + 2 });
    x += l;
  });
  const supports: Member["supports"] = lengths.concat([0]).map((_, i) => ({ kind: i === 0 || i === spans ? "fixed" : "pin" }));
  return { spans: lengths, supports, stiffness: lengths.map(() => 2.1e4), loads };
}

export function run(): void {
  const load = (): string => loadAverage(1);
  console.log(`load average ${load()}`);
  const counts = [1, 3, 10, 100, 1000];
  const results = counts.map((n) => {
    const m = member(n);
    const t = measure(() => solve(m), n >= 1000 ? 1000 : 300);
    return { n, ...t };
  });
  printTable(
    ["spans", "ms per solve", "µs per span", "calls"],
    results.map((r) => [r.n, r.perCallMs.toFixed(4), ((1000 * r.perCallMs) / r.n).toFixed(2), r.calls]),
  );
  const ratio = results[4].perCallMs / results[2].perCallMs;
  console.log(`ratio 1000-span / 10-span: ${ratio.toFixed(1)} (target: at most 200) ${ratio <= 200 ? "OK" : "OVER TARGET"}`);
  console.log(`load average after ${load()}`);
}
