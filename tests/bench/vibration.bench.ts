/**
 * Cost of SPAN.FREQUENCIES and SPAN.MODESHAPE in the core: one span with 1, 10 and 50 modes,
 * 10 spans with 50 modes, and members at the work limit (elements x modes = 10,000: 200
 * spans with 50 modes, 1,000 spans with 10 modes), whose cost the limit is meant to keep
 * within the 200 ms per call of the limits section.
 */
import { modeShape, naturalFrequencies, spanMasses, type Member, type VibrationModel } from "../../src/core";
import { loadAverage, measure, printTable } from "./measure";

function model(spans: number): VibrationModel {
  const lengths = Array.from({ length: spans }, (_, i) => 4 + (i % 3));
  const supports: Member["supports"] = lengths.concat([0]).map((_, i) => ({ kind: i === 0 ? "fixed" : "pin" }));
  const member: Member = { spans: lengths, supports, stiffness: lengths.map((_, i) => 2e4 + 1e3 * (i % 4)), loads: [] };
  return { member, masses: spanMasses(lengths, [0.4]) };
}

export function run(): void {
  console.log(`load average ${loadAverage(1)}`);
  const cases: [number, number, number][] = [
    [1, 1, 300],
    [1, 10, 300],
    [1, 50, 300],
    [10, 50, 300],
    [200, 50, 1],
    [1000, 10, 1],
  ];
  const rows = cases.map(([spans, modes, minMs]) => {
    const v = model(spans);
    const f = measure(() => naturalFrequencies(v, modes), minMs);
    const s = measure(() => modeShape(v, modes - 1 || 1), minMs);
    return [spans, modes, f.perCallMs.toFixed(2), s.perCallMs.toFixed(2)];
  });
  printTable(["spans", "modes", "ms FREQUENCIES", "ms MODESHAPE (mode = modes - 1)"], rows);
}
